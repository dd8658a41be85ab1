// C API wrappers for health.hpp and piston_pump.hpp.
#include <cmath>
#include <new>
#include <vector>

#include "capi_common.hpp"
#include "pumploss/health.hpp"
#include "pumploss/health_monitor.hpp"
#include "pumploss/piston_pump.hpp"

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

static_assert(PUMPLOSS_HEALTH_MONITOR_STATE_COUNT == pumploss::health_monitor<double>::state_count, "state");
static_assert(PUMPLOSS_STATE_ON_STROKE == static_cast<int>(pumploss::operating_state::on_stroke), "state");
static_assert(PUMPLOSS_STATE_DEADHEAD == static_cast<int>(pumploss::operating_state::deadhead), "state");
static_assert(PUMPLOSS_STATE_UNKNOWN == static_cast<int>(pumploss::operating_state::unknown), "state");
static_assert(PUMPLOSS_REASON_BELOW_CONSTANT == pumploss::reason_below_constant_part, "reason");
static_assert(PUMPLOSS_REFUSE_FRACTION_ABOVE_ONE == pumploss::refuse_fraction_above_one, "refusal");
static_assert(PUMPLOSS_MONITOR_PENDING == pumploss::monitor_pending, "event");

static_assert(PUMPLOSS_PATH_COUNT == pumploss::leakage_path_count, "paths");
static_assert(PUMPLOSS_PATH_BLEED == static_cast<int>(pumploss::leakage_path::bleed), "paths");
static_assert(PUMPLOSS_PATH_EXTRA_ORIFICE == static_cast<int>(pumploss::leakage_path::extra_orifice), "paths");
static_assert(PUMPLOSS_GAP_COUNT == pumploss::pump_gap_count, "gaps");
static_assert(PUMPLOSS_GAP_VALVE == static_cast<int>(pumploss::pump_gap::valve), "gaps");
static_assert(PUMPLOSS_GROUP_COUNT == pumploss::path_group_count, "groups");
static_assert(PUMPLOSS_GROUP_EXTRA == static_cast<int>(pumploss::path_group::extra), "groups");
static_assert(PUMPLOSS_PATH_CONTROL_PISTON == static_cast<int>(pumploss::leakage_path::control_piston), "paths");
static_assert(PUMPLOSS_MODE_DEADHEAD == static_cast<int>(pumploss::controller_mode::deadhead), "modes");
static_assert(PUMPLOSS_BALANCE_SLIPPER_OVERCLAMPED == pumploss::warn_slipper_overclamped, "warnings");
static_assert(PUMPLOSS_BALANCE_SLIPPER_LIFTS == pumploss::warn_slipper_lifts, "warnings");
static_assert(PUMPLOSS_BALANCE_SLIPPER_NO_FILM == pumploss::warn_slipper_no_film, "warnings");
static_assert(PUMPLOSS_BALANCE_BARREL_LIFTS == pumploss::warn_barrel_lifts, "warnings");
static_assert(PUMPLOSS_BALANCE_BARREL_OVERCLAMPED == pumploss::warn_barrel_overclamped, "warnings");

struct pumploss_piston_pump {
  pumploss::piston_pump<double> pump;
  pumploss::oil<double> oil;
  bool has_oil = false;
  pumploss::pump_calibration calibration{};
  bool calibrated = false;
};

struct pumploss_health {
  pumploss::health_reference<double> ref;
  pumploss::health_bands<double> bands;
};

struct pumploss_health_monitor {
  pumploss::health_monitor<double> m;
};

namespace {
// pumploss_health_assess() of version 1: without a reference speed the drain fraction is taken
// at the reading's speed, and no reading is refused for its speed (there is no rated speed).
pumploss::health_reference<double> legacy_reference(pumploss::health_reference<double> ref, double speed_rev_s) {
  if (!std::isfinite(ref.reference_speed_rev_s)) {
    ref.reference_speed_rev_s = speed_rev_s > 0 && std::isfinite(speed_rev_s) ? speed_rev_s : 1.0;
    if (!std::isfinite(ref.rated_speed_rev_s)) ref.rated_speed_rev_s = ref.reference_speed_rev_s;
  }
  return ref;
}
pumploss::health_reading<double> make_reading(double drain_flow_m3_s, double outlet_pa, double case_pa, double oil_t_k,
                                              double speed_rev_s, double drain_t_k, double inlet_t_k, int state) {
  pumploss::health_reading<double> r{drain_flow_m3_s, outlet_pa, case_pa, oil_t_k, speed_rev_s, drain_t_k, inlet_t_k};
  r.state = static_cast<pumploss::operating_state>(state);
  return r;
}
bool state_ok(int state) { return state >= PUMPLOSS_STATE_UNKNOWN && state <= PUMPLOSS_STATE_DEADHEAD; }
}  // namespace

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
  // the oil: the given density at the reference temperature with a mineral oil's expansion, so
  // that the normalisation uses dynamic viscosity (pumploss::typical_mineral_oil)
  h->ref.fluid = pumploss::typical_mineral_oil(line.value);
  h->ref.fluid.rho_ref_kg_m3 = rho_kg_m3;
  h->ref.fluid.t_ref_k = reference_t_k;
  h->ref.fluid.cp_j_kg_k = cp_j_kg_k;
  h->ref.reference_speed_rev_s = kNaN;  // set by pumploss_health_set_description(); else the reading's
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
  h->bands.sound_max = sound_max;
  h->bands.acceptable_max = acceptable_max;
  h->bands.worn_min = worn_min;
  h->bands.growth_moderate = growth_moderate;
  h->bands.growth_large = growth_large;
  h->bands.hot_margin = hot_margin;
  return PUMPLOSS_OK;
}

PUMPLOSS_API int PUMPLOSS_CALL pumploss_health_set_baseline(pumploss_health* h, double baseline_m3_s) {
  if (h == nullptr) return PUMPLOSS_EMISUSE;
  if (!pumploss::detail::finite(baseline_m3_s)) return PUMPLOSS_ENONFINITE;
  if (!(baseline_m3_s > h->ref.constant_m3_s)) return PUMPLOSS_EDOMAIN;
  h->ref.baseline_m3_s = baseline_m3_s;
  return PUMPLOSS_OK;
}

PUMPLOSS_API int PUMPLOSS_CALL pumploss_health_set_exponents(pumploss_health* h, double pressure_exponent,
                                                             double viscosity_exponent) {
  if (h == nullptr) return PUMPLOSS_EMISUSE;
  if (!pumploss::detail::all_finite(pressure_exponent, viscosity_exponent)) return PUMPLOSS_ENONFINITE;
  if (!(pressure_exponent >= 0) || !(viscosity_exponent >= 0) || !(pressure_exponent <= 2) ||
      !(viscosity_exponent <= 2))
    return PUMPLOSS_EDOMAIN;
  h->ref.pressure_exponent = pressure_exponent;
  h->ref.viscosity_exponent = viscosity_exponent;
  return PUMPLOSS_OK;
}

PUMPLOSS_API int PUMPLOSS_CALL pumploss_health_assess(const pumploss_health* h, double drain_flow_m3_s,
                                                      double outlet_pa, double case_pa, double oil_t_k,
                                                      double speed_rev_s, double drain_t_k, double inlet_t_k,
                                                      int* level, int* reasons, double* fraction,
                                                      double* fraction_at_reference) {
  if (level != nullptr) *level = -1;
  if (reasons != nullptr) *reasons = 0;
  const int st = call({fraction, fraction_at_reference}, [&] {
    if (h == nullptr || level == nullptr || reasons == nullptr) return status::misuse;
    // NaN means "not measured" for the two temperatures; infinity is an error.
    if (std::isinf(drain_t_k) || std::isinf(inlet_t_k)) return status::nonfinite;
    pumploss::health_reading<double> r{drain_flow_m3_s, outlet_pa, case_pa, oil_t_k, speed_rev_s, drain_t_k, inlet_t_k};
    // version 1 answered these with EDOMAIN; a refused reading is now EVALIDITY
    if (drain_flow_m3_s < 0 || !(outlet_pa - case_pa > 0) || !(speed_rev_s > 0) || !(oil_t_k > 0)) return status::domain;
    const auto a = pumploss::assess_health(legacy_reference(h->ref, speed_rev_s), h->bands, r);
    if (pumploss::is_error(a.st)) return a.st;
    *level = static_cast<int>(a.level);
    *reasons = static_cast<int>(a.reasons);
    *fraction = a.fraction;
    *fraction_at_reference = a.fraction_at_reference;
    return a.st;
  });
  if (st > 0 && st < 100) {
    if (level != nullptr) *level = -1;
    if (reasons != nullptr) *reasons = 0;
  }
  return st;
}

PUMPLOSS_API int PUMPLOSS_CALL pumploss_health_growth(const pumploss_health* h, double drain_flow_m3_s,
                                                      double outlet_pa, double case_pa, double oil_t_k,
                                                      double* growth) {
  return call({growth}, [&] {
    if (h == nullptr) return status::misuse;
    if (!pumploss::detail::finite(h->ref.baseline_m3_s)) return status::insufficient_data;
    const pumploss::health_reading<double> r{drain_flow_m3_s, outlet_pa, case_pa, oil_t_k, 1.0};
    const auto q = pumploss::health_normalise(legacy_reference(h->ref, 1.0), r);
    if (is_error(q.st)) return q.st;
    *growth = q.value / h->ref.baseline_m3_s - 1.0;
    return q.st;
  });
}

PUMPLOSS_API const char* PUMPLOSS_CALL pumploss_health_reason_text(int reason) {
  return pumploss::health_reason_text(static_cast<unsigned>(reason));
}

PUMPLOSS_API const char* PUMPLOSS_CALL pumploss_health_level_name(int level) {
  return pumploss::health_level_name(static_cast<pumploss::health_level>(level));
}

PUMPLOSS_API int PUMPLOSS_CALL pumploss_health_set_description(pumploss_health* h, double constant_m3_s,
                                                               double orifice_share, double reference_speed_rev_s,
                                                               double rated_speed_rev_s) {
  if (h == nullptr) return PUMPLOSS_EMISUSE;
  if (!pumploss::detail::all_finite(constant_m3_s, orifice_share, reference_speed_rev_s, rated_speed_rev_s))
    return PUMPLOSS_ENONFINITE;
  pumploss::health_reference<double> r = h->ref;
  r.constant_m3_s = constant_m3_s;
  r.orifice_share = orifice_share;
  r.reference_speed_rev_s = reference_speed_rev_s;
  r.rated_speed_rev_s = rated_speed_rev_s;
  const status st = pumploss::detail::health_reference_check(r);
  if (pumploss::is_error(st)) return static_cast<int>(st);
  h->ref = r;
  return PUMPLOSS_OK;
}

PUMPLOSS_API int PUMPLOSS_CALL pumploss_health_set_baseline_rise(pumploss_health* h, double rise_k, int state) {
  if (h == nullptr) return PUMPLOSS_EMISUSE;
  if (!std::isfinite(rise_k)) return PUMPLOSS_ENONFINITE;
  if (!(rise_k >= 0) || !state_ok(state) || state == PUMPLOSS_STATE_UNKNOWN) return PUMPLOSS_EDOMAIN;
  h->ref.baseline_rise_k = rise_k;
  h->ref.baseline_state = static_cast<pumploss::operating_state>(state);
  return PUMPLOSS_OK;
}

PUMPLOSS_API int PUMPLOSS_CALL pumploss_health_assess_v2(const pumploss_health* h, double drain_flow_m3_s,
                                                         double outlet_pa, double case_pa, double oil_t_k,
                                                         double speed_rev_s, double drain_t_k, double inlet_t_k,
                                                         int state, int* level, int* reasons, int* refused,
                                                         double* drain_at_reference_m3_s,
                                                         double* fraction_at_reference, double* growth) {
  if (level != nullptr) *level = -1;
  if (reasons != nullptr) *reasons = 0;
  if (refused != nullptr) *refused = 0;
  unsigned refused_bits = 0;
  const int st = call({drain_at_reference_m3_s, fraction_at_reference, growth}, [&] {
    if (h == nullptr || level == nullptr || reasons == nullptr || refused == nullptr) return status::misuse;
    if (!std::isfinite(h->ref.reference_speed_rev_s)) return status::misuse;  // set_description() first
    if (!state_ok(state)) return status::domain;
    const auto a = pumploss::assess_health(
        h->ref, h->bands, make_reading(drain_flow_m3_s, outlet_pa, case_pa, oil_t_k, speed_rev_s, drain_t_k, inlet_t_k, state));
    refused_bits = a.refused;
    if (pumploss::is_error(a.st)) return a.st;
    *level = static_cast<int>(a.level);
    *reasons = static_cast<int>(a.reasons);
    *drain_at_reference_m3_s = a.drain_at_reference_m3_s;
    *fraction_at_reference = a.fraction_at_reference;
    // growth is 0 without a baseline (the reason bit PUMPLOSS_REASON_NO_BASELINE says so)
    *growth = std::isfinite(a.growth) ? a.growth : 0.0;
    return a.st;
  });
  if (st > 0 && st < 100) {
    if (level != nullptr) *level = -1;
    if (reasons != nullptr) *reasons = 0;
  }
  if (refused != nullptr) *refused = static_cast<int>(refused_bits);
  return st;
}

PUMPLOSS_API int PUMPLOSS_CALL pumploss_health_fit_constant(const pumploss_health* h, const double drain_flow_m3_s[],
                                                            const double dp_pa[], const double oil_t_k[],
                                                            size_t count, double* constant_m3_s,
                                                            double* baseline_m3_s) {
  return call({constant_m3_s, baseline_m3_s}, [&] {
    if (h == nullptr || drain_flow_m3_s == nullptr || dp_pa == nullptr || oil_t_k == nullptr) return status::misuse;
    if (count < 2) return status::insufficient_data;
    pumploss::health_reading<double> rs[64];  // a stack copy: baseline sets are short
    if (count > 64) return status::domain;
    for (size_t i = 0; i < count; ++i) rs[i] = {drain_flow_m3_s[i], dp_pa[i], 0.0, oil_t_k[i], 1.0};
    pumploss::health_reference<double> ref = h->ref;
    if (!std::isfinite(ref.reference_speed_rev_s)) ref.reference_speed_rev_s = 1.0;
    const auto f = pumploss::health_fit_constant(ref, rs, count);
    if (pumploss::is_error(f.st)) return f.st;
    *constant_m3_s = f.constant_m3_s;
    *baseline_m3_s = f.baseline_m3_s;
    return f.st;
  });
}

PUMPLOSS_API int PUMPLOSS_CALL pumploss_health_looks_fahrenheit(const double t_k[], size_t count, int* looks) {
  if (looks != nullptr) *looks = 0;
  if (t_k == nullptr || looks == nullptr) return PUMPLOSS_EMISUSE;
  if (count > 4096) return PUMPLOSS_EDOMAIN;
  double work[4096];
  *looks = pumploss::health_temperatures_look_fahrenheit(t_k, count, pumploss::health_bands<double>{}, work) ? 1 : 0;
  return PUMPLOSS_OK;
}

PUMPLOSS_API const char* PUMPLOSS_CALL pumploss_health_refusal_text(int refusal) {
  return pumploss::health_refusal_text(static_cast<unsigned>(refusal));
}

PUMPLOSS_API const char* PUMPLOSS_CALL pumploss_health_caution(void) { return pumploss::health_case_drain_caution(); }

PUMPLOSS_API int PUMPLOSS_CALL pumploss_health_monitor_create(const pumploss_health* h, size_t learn_count,
                                                              size_t debounce_count, double hysteresis,
                                                              pumploss_health_monitor** out) {
  if (out == nullptr) return PUMPLOSS_EMISUSE;
  *out = nullptr;
  if (h == nullptr) return PUMPLOSS_EMISUSE;
  pumploss::capi::fp_guard guard;
  pumploss::health_monitor_settings<double> s;
  s.learn_count = learn_count;
  s.debounce_count = debounce_count;
  s.hysteresis = hysteresis;
  using monitor = pumploss::health_monitor<double>;
  const status sc = monitor::check_counts(s);  // the counts before the handle's state (pumploss.h)
  if (pumploss::is_error(sc)) return static_cast<int>(sc);
  if (!std::isfinite(h->ref.reference_speed_rev_s)) return PUMPLOSS_EMISUSE;  // set_description() first
  monitor m;
  const status st = m.init(h->ref, h->bands, s);
  if (pumploss::is_error(st)) return static_cast<int>(st);
  auto* p = new (std::nothrow) pumploss_health_monitor{m};
  if (p == nullptr) return PUMPLOSS_ENOMEM;
  *out = p;
  return PUMPLOSS_OK;
}

PUMPLOSS_API void PUMPLOSS_CALL pumploss_health_monitor_destroy(pumploss_health_monitor* m) { delete m; }

PUMPLOSS_API int PUMPLOSS_CALL pumploss_health_monitor_feed(pumploss_health_monitor* m, double time,
                                                            double drain_flow_m3_s, double outlet_pa,
                                                            double case_pa, double oil_t_k, double speed_rev_s,
                                                            double drain_t_k, double inlet_t_k, int state,
                                                            int* level, int* raw_level, int* events,
                                                            double* drain_at_reference_m3_s) {
  if (level != nullptr) *level = -1;
  if (raw_level != nullptr) *raw_level = -1;
  if (events != nullptr) *events = 0;
  int lv = -1, raw = -1, ev = 0;
  const int st = call({drain_at_reference_m3_s}, [&] {
    if (m == nullptr || level == nullptr || raw_level == nullptr || events == nullptr) return status::misuse;
    if (!state_ok(state)) return status::domain;
    if (std::isinf(time)) return status::nonfinite;
    const auto o = m->m.feed(
        time, make_reading(drain_flow_m3_s, outlet_pa, case_pa, oil_t_k, speed_rev_s, drain_t_k, inlet_t_k, state));
    lv = static_cast<int>(o.level);
    ev = static_cast<int>(o.events);
    if (pumploss::is_error(o.assessment.st)) return o.assessment.st;
    raw = static_cast<int>(o.raw_level);
    *drain_at_reference_m3_s = o.assessment.drain_at_reference_m3_s;
    return o.assessment.st;
  });
  // a refused reading still reports the confirmed level and the refusal event
  if (level != nullptr) *level = lv;
  if (raw_level != nullptr) *raw_level = raw;
  if (events != nullptr) *events = ev;
  return st;
}

PUMPLOSS_API int PUMPLOSS_CALL pumploss_health_monitor_state(const pumploss_health_monitor* m, int* level,
                                                             double* baseline_m3_s, double* sigma_m3_s,
                                                             double* level_m3_s, double* last_step_time) {
  if (level != nullptr) *level = -1;
  const int st = call({baseline_m3_s, sigma_m3_s, level_m3_s, last_step_time}, [&] {
    if (m == nullptr || level == nullptr) return status::misuse;
    if (m->m.learning()) return status::insufficient_data;
    *level = static_cast<int>(m->m.level());
    *baseline_m3_s = m->m.baseline_m3_s();
    *sigma_m3_s = m->m.sigma_m3_s();
    *level_m3_s = m->m.level_m3_s();
    // no step yet: -inf would break the finite-output rule; the time of the first reading is not
    // kept, so say "none" with -1 (times are >= 0 by the documented contract)
    *last_step_time = std::isfinite(m->m.last_step_time()) ? m->m.last_step_time() : -1.0;
    return status::ok;
  });
  if (st > 0 && st < 100 && level != nullptr) *level = -1;
  return st;
}

PUMPLOSS_API int PUMPLOSS_CALL pumploss_health_monitor_save(const pumploss_health_monitor* m, double state[],
                                                            size_t capacity) {
  if (state == nullptr) return PUMPLOSS_EMISUSE;
  int st = m == nullptr ? PUMPLOSS_EMISUSE : static_cast<int>(m->m.save(state, capacity));
  if (st != PUMPLOSS_OK) {
    for (size_t i = 0; i < capacity; ++i) state[i] = kNaN;
    return st;
  }
  // A value the monitor has not learned yet is saved as NaN: a usable status with a NaN output
  // is PUMPLOSS_WUNDEFINED by the header's rule, and restore() takes the state as it is.
  for (size_t i = 0; i < PUMPLOSS_HEALTH_MONITOR_STATE_COUNT && i < capacity; ++i)
    if (std::isnan(state[i])) st = PUMPLOSS_WUNDEFINED;
  return st;
}

PUMPLOSS_API int PUMPLOSS_CALL pumploss_health_monitor_restore(pumploss_health_monitor* m, const double state[],
                                                               size_t count) {
  if (m == nullptr || state == nullptr) return PUMPLOSS_EMISUSE;
  return static_cast<int>(m->m.restore(state, count));
}


}  // extern "C"

namespace {
// Apply a change to a copy of the description and keep it only when it validates.
template <class F>
int update_pump(pumploss_piston_pump* h, F&& change) {
  if (h == nullptr) return PUMPLOSS_EMISUSE;
  pumploss::capi::fp_guard guard;
  pumploss::piston_pump<double> p = h->pump;
  change(p);
  const auto check = pumploss::validate_piston_pump(p);
  if (pumploss::is_error(check.st)) return static_cast<int>(check.st);
  h->pump = p;
  h->calibrated = false;
  return PUMPLOSS_OK;
}
// Finite-input check shared by the setters (NaN/inf is reported as such, not as a domain error).
template <class... Ts>
bool finite_inputs(Ts... xs) {
  return pumploss::detail::all_finite(xs...);
}
status operating_checks(const pumploss_piston_pump* h) {
  if (h == nullptr || !h->has_oil) return status::misuse;
  return status::ok;
}
}  // namespace

namespace {
// Calibration shared by pumploss_piston_pump_calibrate() (on stroke) and pumploss_piston_pump_calibrate_modes().
int calibrate(pumploss_piston_pump* h, size_t n, const double* drain_m3_s, const double* outlet_pa, const double* case_pa,
              const double* speed_rev_s, const double* displacement_fraction, const double* t_k, const int* mode,
              double* rms_residual_m3_s) {
  return call({rms_residual_m3_s}, [&] {
    // NULL is never a valid array, also with n = 0 (pumploss.h); no points: too few data, whatever
    // the state of the handle
    if (drain_m3_s == nullptr || outlet_pa == nullptr || case_pa == nullptr || speed_rev_s == nullptr ||
        displacement_fraction == nullptr || t_k == nullptr)
      return status::misuse;
    if (h != nullptr && n == 0) return status::insufficient_data;
    const status s = operating_checks(h);
    if (is_error(s)) return s;
    std::vector<pumploss::drain_measurement> m(n);
    for (size_t i = 0; i < n; ++i) {
      if (mode != nullptr && (mode[i] < 0 || mode[i] >= pumploss::controller_mode_count)) return status::domain;
      m[i] = {drain_m3_s[i], outlet_pa[i], case_pa[i], speed_rev_s[i], displacement_fraction[i], t_k[i],
              mode != nullptr ? static_cast<pumploss::controller_mode>(mode[i]) : pumploss::controller_mode::on_stroke};
    }
    h->calibrated = false;
    const auto c = pumploss::calibrate_piston_pump(h->pump, h->oil, m.data(), n);
    if (is_error(c.st)) return c.st;
    h->calibration = c;
    h->calibrated = true;
    *rms_residual_m3_s = c.rms_residual_m3_s;
    return c.st;
  });
}
}  // namespace

extern "C" {

PUMPLOSS_API int PUMPLOSS_CALL pumploss_piston_pump_create(int pistons, double piston_diameter_m, double bore_clearance_m,
                                                    double engaged_length_min_m, double pitch_radius_m,
                                                    double max_swash_angle_rad, pumploss_piston_pump** out) {
  if (out == nullptr) return PUMPLOSS_EMISUSE;
  *out = nullptr;
  pumploss::capi::fp_guard guard;
  pumploss::piston_pump<double> p;
  p.pistons = pistons;
  p.piston_diameter_m = piston_diameter_m;
  p.bore_clearance_m = bore_clearance_m;
  p.engaged_length_min_m = engaged_length_min_m;
  p.pitch_radius_m = pitch_radius_m;
  p.max_swash_angle_rad = max_swash_angle_rad;
  const auto check = pumploss::validate_piston_pump(p);
  if (pumploss::is_error(check.st)) return static_cast<int>(check.st);
  auto* h = new (std::nothrow) pumploss_piston_pump{};
  if (h == nullptr) return PUMPLOSS_ENOMEM;
  h->pump = p;
  *out = h;
  return PUMPLOSS_OK;
}

PUMPLOSS_API void PUMPLOSS_CALL pumploss_piston_pump_destroy(pumploss_piston_pump* h) { delete h; }

PUMPLOSS_API int PUMPLOSS_CALL pumploss_piston_pump_set_piston(pumploss_piston_pump* h, double eccentricity_ratio,
                                                        double high_pressure_share) {
  if (h != nullptr && !finite_inputs(eccentricity_ratio, high_pressure_share)) return PUMPLOSS_ENONFINITE;
  return update_pump(h, [&](pumploss::piston_pump<double>& p) {
    p.piston_eccentricity = eccentricity_ratio;
    p.high_pressure_share = high_pressure_share;
  });
}

PUMPLOSS_API int PUMPLOSS_CALL pumploss_piston_pump_set_slipper(pumploss_piston_pump* h, double pocket_radius_m,
                                                         double outer_radius_m, double gap_m, double feed_diameter_m,
                                                         double feed_length_m) {
  if (h != nullptr && !finite_inputs(pocket_radius_m, outer_radius_m, gap_m, feed_diameter_m, feed_length_m))
    return PUMPLOSS_ENONFINITE;
  return update_pump(h, [&](pumploss::piston_pump<double>& p) {
    p.slipper_pocket_radius_m = pocket_radius_m;
    p.slipper_outer_radius_m = outer_radius_m;
    p.slipper_gap_m = gap_m;
    p.slipper_feed_diameter_m = feed_diameter_m;
    p.slipper_feed_length_m = feed_length_m;
  });
}

PUMPLOSS_API int PUMPLOSS_CALL pumploss_piston_pump_set_ball(pumploss_piston_pump* h, double ball_diameter_m, double clearance_m,
                                                      double length_m) {
  if (h != nullptr && !finite_inputs(ball_diameter_m, clearance_m, length_m)) return PUMPLOSS_ENONFINITE;
  return update_pump(h, [&](pumploss::piston_pump<double>& p) {
    p.ball_diameter_m = ball_diameter_m;
    p.ball_clearance_m = clearance_m;
    p.ball_length_m = length_m;
  });
}

PUMPLOSS_API int PUMPLOSS_CALL pumploss_piston_pump_set_valve_plate(pumploss_piston_pump* h, double inner_land_inner_radius_m,
                                                             double inner_land_outer_radius_m,
                                                             double outer_land_inner_radius_m,
                                                             double outer_land_outer_radius_m, double kidney_arc_rad,
                                                             double gap_m) {
  if (h != nullptr && !finite_inputs(inner_land_inner_radius_m, inner_land_outer_radius_m, outer_land_inner_radius_m,
                                     outer_land_outer_radius_m, kidney_arc_rad, gap_m))
    return PUMPLOSS_ENONFINITE;
  return update_pump(h, [&](pumploss::piston_pump<double>& p) {
    p.valve_inner_land_inner_radius_m = inner_land_inner_radius_m;
    p.valve_inner_land_outer_radius_m = inner_land_outer_radius_m;
    p.valve_outer_land_inner_radius_m = outer_land_inner_radius_m;
    p.valve_outer_land_outer_radius_m = outer_land_outer_radius_m;
    p.valve_kidney_arc_rad = kidney_arc_rad;
    p.valve_gap_m = gap_m;
  });
}

PUMPLOSS_API int PUMPLOSS_CALL pumploss_piston_pump_set_controller(pumploss_piston_pump* h, double consumption_m3_s,
                                                            double bleed_diameter_m, double bleed_cd) {
  if (h != nullptr && !finite_inputs(consumption_m3_s, bleed_diameter_m, bleed_cd)) return PUMPLOSS_ENONFINITE;
  return update_pump(h, [&](pumploss::piston_pump<double>& p) {
    p.controller_flow_m3_s = consumption_m3_s;
    p.bleed_orifice_diameter_m = bleed_diameter_m;
    p.bleed_cd = bleed_cd;
  });
}

PUMPLOSS_API int PUMPLOSS_CALL pumploss_piston_pump_set_extra(pumploss_piston_pump* h, double conductance_m3, double orifice_cda_m2) {
  if (h != nullptr && !finite_inputs(conductance_m3, orifice_cda_m2)) return PUMPLOSS_ENONFINITE;
  return update_pump(h, [&](pumploss::piston_pump<double>& p) {
    p.extra_conductance_m3 = conductance_m3;
    p.extra_orifice_cda_m2 = orifice_cda_m2;
  });
}

PUMPLOSS_API int PUMPLOSS_CALL pumploss_piston_pump_set_oil(pumploss_piston_pump* h, double t1_k, double nu1_m2_s, double t2_k,
                                                     double nu2_m2_s, double rho15_kg_m3) {
  if (h == nullptr) return PUMPLOSS_EMISUSE;
  pumploss::capi::fp_guard guard;
  const auto line = pumploss::d341_fit(t1_k, nu1_m2_s, t2_k, nu2_m2_s);
  if (pumploss::is_error(line.st)) return static_cast<int>(line.st);
  if (!pumploss::detail::finite(rho15_kg_m3)) return PUMPLOSS_ENONFINITE;
  if (!(rho15_kg_m3 > 0)) return PUMPLOSS_EDOMAIN;
  h->oil = pumploss::typical_mineral_oil(line.value);
  h->oil.rho_ref_kg_m3 = rho15_kg_m3;
  h->has_oil = true;
  h->calibrated = false;
  return PUMPLOSS_OK;
}

PUMPLOSS_API int PUMPLOSS_CALL pumploss_piston_pump_displacement(const pumploss_piston_pump* h, double stated_m3_rev,
                                                          double* displacement_m3_rev, double* mismatch) {
  return call({displacement_m3_rev, mismatch}, [&] {
    if (h == nullptr) return status::misuse;
    if (!pumploss::detail::finite(stated_m3_rev)) return status::nonfinite;
    if (stated_m3_rev < 0) return status::domain;
    auto p = h->pump;
    p.stated_displacement_m3_rev = stated_m3_rev > 0 ? stated_m3_rev : pumploss::capi::kNaN;
    const auto c = pumploss::validate_piston_pump(p);
    *displacement_m3_rev = c.displacement_m3_rev;
    *mismatch = stated_m3_rev > 0 ? c.displacement_mismatch : 0.0;
    return c.st;
  });
}

PUMPLOSS_API int PUMPLOSS_CALL pumploss_piston_pump_budget(const pumploss_piston_pump* h, double outlet_pa, double case_pa,
                                                    double speed_rev_s, double displacement_fraction, double t_k,
                                                    double* total_m3_s, double* drain_fraction) {
  return call({total_m3_s, drain_fraction}, [&] {
    const status s = operating_checks(h);
    if (is_error(s)) return s;
    const auto b = pumploss::piston_pump_budget(h->pump, h->oil, {outlet_pa, case_pa, speed_rev_s, displacement_fraction, t_k});
    *total_m3_s = b.total_m3_s;
    *drain_fraction = b.drain_fraction;
    return b.st;
  });
}

PUMPLOSS_API int PUMPLOSS_CALL pumploss_piston_pump_path_flow(const pumploss_piston_pump* h, int path, double outlet_pa,
                                                       double case_pa, double speed_rev_s,
                                                       double displacement_fraction, double t_k, double* q_m3_s,
                                                       double* share) {
  return call({q_m3_s, share}, [&] {
    const status s = operating_checks(h);
    if (is_error(s)) return s;
    if (path < 0 || path >= pumploss::leakage_path_count) return status::domain;
    const auto b = pumploss::piston_pump_budget(h->pump, h->oil, {outlet_pa, case_pa, speed_rev_s, displacement_fraction, t_k});
    *q_m3_s = b.flow_m3_s[path];
    *share = b.share[path];
    if (!is_error(b.st) && b.total_m3_s == 0.0) *share = 0.0;  // no flow at all: no share
    return b.st;
  });
}

PUMPLOSS_API int PUMPLOSS_CALL pumploss_piston_pump_gap_sensitivity(const pumploss_piston_pump* h, int gap, double outlet_pa,
                                                             double case_pa, double speed_rev_s,
                                                             double displacement_fraction, double t_k,
                                                             double* d_total_d_gap_m2_s, double* elasticity) {
  return call({d_total_d_gap_m2_s, elasticity}, [&] {
    const status s = operating_checks(h);
    if (is_error(s)) return s;
    if (gap < 0 || gap >= pumploss::pump_gap_count) return status::domain;
    const auto r = pumploss::piston_pump_sensitivity(h->pump, h->oil,
                                                     {outlet_pa, case_pa, speed_rev_s, displacement_fraction, t_k});
    *d_total_d_gap_m2_s = r.d_total_d_gap[gap];
    *elasticity = r.elasticity[gap];
    return r.st;
  });
}

PUMPLOSS_API int PUMPLOSS_CALL pumploss_piston_pump_gap_growth(const pumploss_piston_pump* h, int gap, double measured_drain_m3_s,
                                                        double outlet_pa, double case_pa, double speed_rev_s,
                                                        double displacement_fraction, double t_k, double* growth) {
  return call({growth}, [&] {
    const status s = operating_checks(h);
    if (is_error(s)) return s;
    if (gap < 0 || gap >= pumploss::pump_gap_count) return status::domain;
    const auto r = pumploss::gap_growth_for_drain(h->pump, h->oil,
                                                  {outlet_pa, case_pa, speed_rev_s, displacement_fraction, t_k},
                                                  static_cast<pumploss::pump_gap>(gap), measured_drain_m3_s);
    *growth = r.value;
    return r.st;
  });
}

PUMPLOSS_API int PUMPLOSS_CALL pumploss_piston_pump_calibrate(pumploss_piston_pump* h, size_t n, const double* drain_m3_s,
                                                       const double* outlet_pa, const double* case_pa,
                                                       const double* speed_rev_s, const double* displacement_fraction,
                                                       const double* t_k, double* rms_residual_m3_s) {
  return calibrate(h, n, drain_m3_s, outlet_pa, case_pa, speed_rev_s, displacement_fraction, t_k, nullptr,
                   rms_residual_m3_s);
}

PUMPLOSS_API int PUMPLOSS_CALL pumploss_piston_pump_calibrate_modes(pumploss_piston_pump* h, size_t n, const double* drain_m3_s,
                                                             const double* outlet_pa, const double* case_pa,
                                                             const double* speed_rev_s,
                                                             const double* displacement_fraction, const double* t_k,
                                                             const int* mode, double* rms_residual_m3_s) {
  if (mode == nullptr) {  // NULL is never a valid array, also with n = 0 (pumploss.h)
    if (rms_residual_m3_s != nullptr) *rms_residual_m3_s = kNaN;
    return PUMPLOSS_EMISUSE;
  }
  return calibrate(h, n, drain_m3_s, outlet_pa, case_pa, speed_rev_s, displacement_fraction, t_k, mode,
                   rms_residual_m3_s);
}

PUMPLOSS_API int PUMPLOSS_CALL pumploss_piston_pump_calibration_group(const pumploss_piston_pump* h, int group, double* scale,
                                                               double* std_error, double* gap_growth,
                                                               int* confused_with) {
  if (confused_with != nullptr) *confused_with = 0;
  if (std_error == nullptr || gap_growth == nullptr) {
    for (double* p : {scale, std_error, gap_growth}) if (p != nullptr) *p = kNaN;
    return PUMPLOSS_EMISUSE;
  }
  *std_error = *gap_growth = kNaN;
  const int code = call({scale}, [&] {
    if (h == nullptr || confused_with == nullptr) return status::misuse;
    if (group < 0 || group >= pumploss::path_group_count) return status::domain;
    if (!h->calibrated) return status::insufficient_data;
    if (std::isnan(h->calibration.scale[group])) return status::insufficient_data;  // group absent
    *scale = h->calibration.scale[group];
    *confused_with = static_cast<int>(h->calibration.confused_with[group]);
    return status::ok;
  });
  if (code != PUMPLOSS_OK) return code;
  // Outputs that may be undefined for a present group (no gap; the unconstrained fit failed):
  // NaN under PUMPLOSS_WUNDEFINED. Kept out of call(), which turns a NaN under a usable status
  // into an error.
  const double se = h->calibration.std_error[group], growth = h->calibration.gap_growth[group];
  if (std::isinf(se) || std::isinf(growth)) {
    *scale = kNaN;
    *confused_with = 0;
    return PUMPLOSS_EOVERFLOW;
  }
  *std_error = se;
  *gap_growth = growth;
  return std::isnan(se) || std::isnan(growth) ? PUMPLOSS_WUNDEFINED : PUMPLOSS_OK;
}

PUMPLOSS_API const char* PUMPLOSS_CALL pumploss_piston_pump_path_name(int path) {
  return pumploss::leakage_path_name(static_cast<pumploss::leakage_path>(path));
}

PUMPLOSS_API const char* PUMPLOSS_CALL pumploss_piston_pump_group_name(int group) {
  return pumploss::path_group_name(static_cast<pumploss::path_group>(group));
}

}  // extern "C"

// ---- kinematics, controller modes, force balance, non-case losses
namespace {
bool mode_ok(int mode) { return mode >= 0 && mode < pumploss::controller_mode_count; }
pumploss::pump_operating_point<double> mode_point(int mode, double outlet_pa, double case_pa, double speed_rev_s,
                                                  double displacement_fraction, double t_k) {
  pumploss::pump_operating_point<double> op{outlet_pa, case_pa, speed_rev_s, displacement_fraction, t_k};
  op.mode = static_cast<pumploss::controller_mode>(mode);
  return op;
}
}  // namespace

extern "C" {

PUMPLOSS_API int PUMPLOSS_CALL pumploss_piston_pump_set_kinematics(pumploss_piston_pump* h, double pivot_offset_m,
                                                            double dead_volume_m3) {
  if (h != nullptr && !finite_inputs(pivot_offset_m, dead_volume_m3)) return PUMPLOSS_ENONFINITE;
  return update_pump(h, [&](pumploss::piston_pump<double>& p) {
    p.pivot_offset_m = pivot_offset_m;
    p.dead_volume_m3 = dead_volume_m3;
  });
}

PUMPLOSS_API int PUMPLOSS_CALL pumploss_piston_pump_set_control(pumploss_piston_pump* h, double control_piston_conductance_m3,
                                                         double control_pressure_pa, double cross_port_conductance_m3,
                                                         double barrel_spring_force_n) {
  if (h != nullptr && !finite_inputs(control_piston_conductance_m3, control_pressure_pa, cross_port_conductance_m3,
                                     barrel_spring_force_n))
    return PUMPLOSS_ENONFINITE;
  return update_pump(h, [&](pumploss::piston_pump<double>& p) {
    p.control_piston_conductance_m3 = control_piston_conductance_m3;
    p.control_pressure_pa = control_pressure_pa;
    p.cross_port_conductance_m3 = cross_port_conductance_m3;
    p.barrel_spring_force_n = barrel_spring_force_n;
  });
}

PUMPLOSS_API int PUMPLOSS_CALL pumploss_piston_pump_kinematics(const pumploss_piston_pump* h, double displacement_fraction,
                                                        double* stroke_m, double* engaged_odc_m,
                                                        double* engaged_idc_m, double* effective_length_m,
                                                        double* dead_volume_m3) {
  return call({stroke_m, engaged_odc_m, engaged_idc_m, effective_length_m, dead_volume_m3}, [&] {
    if (h == nullptr) return status::misuse;
    const auto k = pumploss::piston_pump_kinematics(h->pump, displacement_fraction);
    *stroke_m = k.stroke_m;
    *engaged_odc_m = k.engaged_odc_m;
    *engaged_idc_m = k.engaged_idc_m;
    *effective_length_m = k.effective_length_m;
    *dead_volume_m3 = k.dead_volume_m3;
    return k.st;
  });
}

PUMPLOSS_API int PUMPLOSS_CALL pumploss_piston_pump_budget_mode(const pumploss_piston_pump* h, int mode, double outlet_pa,
                                                         double case_pa, double speed_rev_s,
                                                         double displacement_fraction, double t_k, double film_rise_k,
                                                         double* total_m3_s, double* total_film_m3_s,
                                                         double* metering_flow_m3_s, int* warnings) {
  if (warnings != nullptr) *warnings = 0;
  return call({total_m3_s, total_film_m3_s, metering_flow_m3_s}, [&] {
    const status s = operating_checks(h);
    if (is_error(s) || warnings == nullptr) return status::misuse;
    if (!mode_ok(mode)) return status::domain;
    auto op = mode_point(mode, outlet_pa, case_pa, speed_rev_s, displacement_fraction, t_k);
    op.film_temperature_rise_k = film_rise_k;
    const auto b = pumploss::piston_pump_budget(h->pump, h->oil, op);
    *total_m3_s = b.total_m3_s;
    *total_film_m3_s = b.total_film_m3_s;
    *metering_flow_m3_s = b.metering_flow_m3_s;
    if (!is_error(b.st)) *warnings = static_cast<int>(b.warnings);
    return b.st;
  });
}

PUMPLOSS_API int PUMPLOSS_CALL pumploss_piston_pump_balance(const pumploss_piston_pump* h, double displacement_fraction,
                                                     double* slipper_balance, double* slipper_film_m,
                                                     double* barrel_balance, int* warnings) {
  if (warnings != nullptr) *warnings = 0;
  return call({slipper_balance, slipper_film_m, barrel_balance}, [&] {
    if (h == nullptr || warnings == nullptr) return status::misuse;
    const auto k = pumploss::piston_pump_kinematics(h->pump, displacement_fraction);
    if (is_error(k.st)) return k.st;
    if (!(h->pump.slipper_gap_m > 0) || !(h->pump.valve_gap_m > 0)) return status::insufficient_data;
    const auto b = pumploss::piston_pump_balance(h->pump, k.tan_beta, 0.0);  // the bores' hold-down alone
    *slipper_balance = b.slipper_balance;
    *slipper_film_m = b.slipper_film_m;
    *barrel_balance = b.barrel_balance;
    *warnings = static_cast<int>(b.warnings);
    return b.warnings != 0u ? status::implausible : status::ok;
  });
}

PUMPLOSS_API int PUMPLOSS_CALL pumploss_piston_pump_flow_loss(const pumploss_piston_pump* h, int mode, double outlet_pa,
                                                       double inlet_pa, double case_pa, double speed_rev_s,
                                                       double displacement_fraction, double t_k, double* drain_m3_s,
                                                       double* compression_m3_s, double* dead_volume_m3_s,
                                                       double* cross_port_m3_s, double* total_m3_s) {
  return call({drain_m3_s, compression_m3_s, dead_volume_m3_s, cross_port_m3_s, total_m3_s}, [&] {
    const status s = operating_checks(h);
    if (is_error(s)) return s;
    if (!mode_ok(mode)) return status::domain;
    auto op = mode_point(mode, outlet_pa, case_pa, speed_rev_s, displacement_fraction, t_k);
    op.inlet_pa = inlet_pa;
    const auto r = pumploss::piston_pump_flow_loss(h->pump, h->oil, op);
    *drain_m3_s = r.drain_m3_s;
    *compression_m3_s = r.compression_m3_s;
    *dead_volume_m3_s = r.dead_volume_m3_s;
    *cross_port_m3_s = r.cross_port_m3_s;
    *total_m3_s = r.total_m3_s;
    return r.st;
  });
}

PUMPLOSS_API int PUMPLOSS_CALL pumploss_piston_pump_share_uncertainty(const pumploss_piston_pump* h, int path,
                                                               const double* u_gap_m, size_t n_gaps,
                                                               double outlet_pa, double case_pa, double speed_rev_s,
                                                               double displacement_fraction, double t_k,
                                                               double* share, double* u_share) {
  return call({share, u_share}, [&] {
    if (u_gap_m == nullptr || h == nullptr) return status::misuse;
    if (n_gaps != pumploss::pump_gap_count) return status::domain;  // before the handle's state
    const status s = operating_checks(h);
    if (is_error(s)) return s;
    if (path < 0 || path >= pumploss::leakage_path_count) return status::domain;
    double u[pumploss::pump_gap_count];
    for (int g = 0; g < pumploss::pump_gap_count; ++g) u[g] = u_gap_m[g];
    const auto r = pumploss::piston_pump_budget_uncertainty(
        h->pump, h->oil, {outlet_pa, case_pa, speed_rev_s, displacement_fraction, t_k}, u);
    if (is_error(r.st)) return r.st;
    const bool none = r.total_m3_s == 0.0;  // no flow at all: no share
    *share = none ? 0.0 : r.share[path];
    *u_share = none ? 0.0 : r.u_share[path];
    return r.st;
  });
}

}  // extern "C"
