// C API wrappers for health.hpp (and, later, piston_pump.hpp).
#include <cmath>
#include <new>

#include "capi_common.hpp"
#include "pumploss/health.hpp"

using pumploss::capi::call;
using pumploss::capi::kNaN;
using pumploss::status;

static_assert(PUMPLOSS_HEALTH_SOUND == static_cast<int>(pumploss::health_level::sound), "level");
static_assert(PUMPLOSS_HEALTH_ACCEPTABLE == static_cast<int>(pumploss::health_level::acceptable), "level");
static_assert(PUMPLOSS_HEALTH_ELEVATED == static_cast<int>(pumploss::health_level::elevated), "level");
static_assert(PUMPLOSS_HEALTH_WORN == static_cast<int>(pumploss::health_level::worn), "level");
static_assert(PUMPLOSS_REASON_FRACTION_SOUND == pumploss::reason_fraction_sound, "reason");
static_assert(PUMPLOSS_REASON_FRACTION_ACCEPTABLE == pumploss::reason_fraction_acceptable, "reason");
static_assert(PUMPLOSS_REASON_FRACTION_ELEVATED == pumploss::reason_fraction_elevated, "reason");
static_assert(PUMPLOSS_REASON_FRACTION_WORN == pumploss::reason_fraction_worn, "reason");
static_assert(PUMPLOSS_REASON_GROWTH_MODERATE == pumploss::reason_growth_moderate, "reason");
static_assert(PUMPLOSS_REASON_GROWTH_LARGE == pumploss::reason_growth_large, "reason");
static_assert(PUMPLOSS_REASON_DRAIN_HOT == pumploss::reason_drain_hot, "reason");
static_assert(PUMPLOSS_REASON_LOW_PRESSURE == pumploss::reason_low_pressure_reading, "reason");
static_assert(PUMPLOSS_REASON_NO_BASELINE == pumploss::reason_no_baseline, "reason");
static_assert(PUMPLOSS_REASON_NO_TEMPERATURES == pumploss::reason_no_temperatures, "reason");

struct pumploss_health {
  pumploss::health_reference<double> ref;
  pumploss::health_bands<double> bands;
};

extern "C" {

PUMPLOSS_API int PUMPLOSS_CALL pumploss_drain_fraction(double drain_flow_m3_s, double max_displacement_m3_rev,
                                                       double speed_rev_s, double* fraction) {
  return call({fraction}, [&] {
    const auto r = pumploss::drain_fraction(drain_flow_m3_s, max_displacement_m3_rev, speed_rev_s);
    *fraction = r.value;
    return r.st;
  });
}

PUMPLOSS_API int PUMPLOSS_CALL pumploss_health_create(double max_displacement_m3_rev, double reference_dp_pa,
                                                      double reference_t_k, double t1_k, double nu1_m2_s,
                                                      double t2_k, double nu2_m2_s, double rho_kg_m3,
                                                      double cp_j_kg_k, pumploss_health** out) {
  if (out == nullptr) return PUMPLOSS_EMISUSE;
  *out = nullptr;
  pumploss::capi::fp_guard guard;
  if (!pumploss::detail::all_finite(max_displacement_m3_rev, reference_dp_pa, reference_t_k, rho_kg_m3, cp_j_kg_k))
    return PUMPLOSS_ENONFINITE;
  if (!(max_displacement_m3_rev > 0) || !(reference_dp_pa > 0) || !(reference_t_k > 0) || !(rho_kg_m3 > 0) ||
      !(cp_j_kg_k > 0))
    return PUMPLOSS_EDOMAIN;
  const auto line = pumploss::d341_fit(t1_k, nu1_m2_s, t2_k, nu2_m2_s);
  if (pumploss::is_error(line.st)) return static_cast<int>(line.st);
  if (pumploss::is_error(pumploss::d341_viscosity(line.value, reference_t_k).st)) return PUMPLOSS_EDOMAIN;
  auto* h = new (std::nothrow) pumploss_health{};
  if (h == nullptr) return PUMPLOSS_ENOMEM;
  h->ref.max_displacement_m3_rev = max_displacement_m3_rev;
  h->ref.reference_dp_pa = reference_dp_pa;
  h->ref.reference_t_k = reference_t_k;
  h->ref.viscosity = line.value;
  h->ref.rho_kg_m3 = rho_kg_m3;
  h->ref.cp_j_kg_k = cp_j_kg_k;
  *out = h;
  return PUMPLOSS_OK;
}

PUMPLOSS_API void PUMPLOSS_CALL pumploss_health_destroy(pumploss_health* h) { delete h; }

PUMPLOSS_API int PUMPLOSS_CALL pumploss_health_set_bands(pumploss_health* h, double sound_max, double acceptable_max,
                                                         double worn_min, double growth_moderate,
                                                         double growth_large, double hot_margin) {
  if (h == nullptr) return PUMPLOSS_EMISUSE;
  if (!pumploss::detail::all_finite(sound_max, acceptable_max, worn_min, growth_moderate, growth_large, hot_margin))
    return PUMPLOSS_ENONFINITE;
  if (!(sound_max > 0) || !(acceptable_max >= sound_max) || !(worn_min >= acceptable_max) ||
      !(growth_moderate > 0) || !(growth_large >= growth_moderate) || !(hot_margin > 0))
    return PUMPLOSS_EDOMAIN;
  h->bands = {sound_max, acceptable_max, worn_min, growth_moderate, growth_large, hot_margin};
  return PUMPLOSS_OK;
}

PUMPLOSS_API int PUMPLOSS_CALL pumploss_health_set_baseline(pumploss_health* h, double baseline_m3_s) {
  if (h == nullptr) return PUMPLOSS_EMISUSE;
  if (!pumploss::detail::finite(baseline_m3_s)) return PUMPLOSS_ENONFINITE;
  if (!(baseline_m3_s > 0)) return PUMPLOSS_EDOMAIN;
  h->ref.baseline_m3_s = baseline_m3_s;
  return PUMPLOSS_OK;
}

PUMPLOSS_API int PUMPLOSS_CALL pumploss_health_set_exponents(pumploss_health* h, double pressure_exponent,
                                                             double viscosity_exponent) {
  if (h == nullptr) return PUMPLOSS_EMISUSE;
  if (!pumploss::detail::all_finite(pressure_exponent, viscosity_exponent)) return PUMPLOSS_ENONFINITE;
  if (!(pressure_exponent >= 0) || !(viscosity_exponent >= 0)) return PUMPLOSS_EDOMAIN;
  h->ref.pressure_exponent = pressure_exponent;
  h->ref.viscosity_exponent = viscosity_exponent;
  return PUMPLOSS_OK;
}

PUMPLOSS_API int PUMPLOSS_CALL pumploss_health_assess(const pumploss_health* h, double drain_flow_m3_s,
                                                      double outlet_pa, double case_pa, double oil_t_k,
                                                      double speed_rev_s, double drain_t_k, double inlet_t_k,
                                                      int* level, int* reasons, double* fraction,
                                                      double* fraction_at_reference, double* growth) {
  if (level != nullptr) *level = -1;
  if (reasons != nullptr) *reasons = 0;
  const int st = call({fraction, fraction_at_reference, growth}, [&] {
    if (h == nullptr || level == nullptr || reasons == nullptr) return status::misuse;
    // NaN means "not measured" for the two temperatures; infinity is an error.
    if (std::isinf(drain_t_k) || std::isinf(inlet_t_k)) return status::nonfinite;
    pumploss::health_reading<double> r{drain_flow_m3_s, outlet_pa, case_pa, oil_t_k, speed_rev_s, drain_t_k, inlet_t_k};
    const auto a = pumploss::assess_health(h->ref, h->bands, r);
    if (pumploss::is_error(a.st)) return a.st;
    *level = static_cast<int>(a.level);
    *reasons = static_cast<int>(a.reasons);
    *fraction = a.fraction;
    *fraction_at_reference = a.fraction_at_reference;
    *growth = a.growth;
    return a.st;
  });
  if (st > 0 && st < 100) {
    if (level != nullptr) *level = -1;
    if (reasons != nullptr) *reasons = 0;
  }
  return st;
}

PUMPLOSS_API const char* PUMPLOSS_CALL pumploss_health_reason_text(int reason) {
  return pumploss::health_reason_text(static_cast<unsigned>(reason));
}

PUMPLOSS_API const char* PUMPLOSS_CALL pumploss_health_level_name(int level) {
  return pumploss::health_level_name(static_cast<pumploss::health_level>(level));
}

}  // extern "C"
