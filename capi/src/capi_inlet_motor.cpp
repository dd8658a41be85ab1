// C API wrappers for motor.hpp and inlet.hpp (motor drain and creep, pump inlet, shaft seal).
#include <cstddef>

#include "capi_common.hpp"
#include "pumploss/inlet.hpp"
#include "pumploss/motor.hpp"

using pumploss::capi::call;
using pumploss::status;

static_assert(PUMPLOSS_MOTOR_SOUND == static_cast<int>(pumploss::motor_drain_band::sound), "band");
static_assert(PUMPLOSS_MOTOR_WORN == static_cast<int>(pumploss::motor_drain_band::worn), "band");

namespace {

/// A suction line of one fitting of loss coefficient K at the pipe's bore and one pipe (no
/// allocation: a fixed array), and its oil.
struct suction_pipe {
  pumploss::line_element<double> elements[2];
  std::size_t count = 0;
};

status suction_line(double diameter_m, double length_m, double roughness_m, double k_fittings, double height_m,
                    double t1_k, double nu1_m2_s, double t2_k, double nu2_m2_s, double rho15_kg_m3,
                    suction_pipe& l, pumploss::oil<double>& o) {
  if (!pumploss::detail::all_finite(diameter_m, length_m, roughness_m, k_fittings, height_m, rho15_kg_m3))
    return status::nonfinite;
  if (!(diameter_m > 0) || !(length_m > 0) || !(roughness_m >= 0) || !(k_fittings >= 0) || !(rho15_kg_m3 > 0))
    return status::domain;
  const auto line = pumploss::d341_fit(t1_k, nu1_m2_s, t2_k, nu2_m2_s);
  if (pumploss::is_error(line.st)) return line.st;
  o = pumploss::typical_mineral_oil(line.value);
  o.rho_ref_kg_m3 = rho15_kg_m3;
  if (k_fittings > 0) l.elements[l.count++] = pumploss::line_fitting_k(diameter_m, k_fittings);
  l.elements[l.count++] = pumploss::line_pipe(diameter_m, length_m, roughness_m);
  return status::ok;
}

}  // namespace

extern "C" {

PUMPLOSS_API int PUMPLOSS_CALL pumploss_motor_drain_check(double drain_m3_s, double inlet_m3_s, double sound_max,
                                                          double acceptable_max, double worn_min, double* fraction,
                                                          int* band) {
  if (band != nullptr) *band = -1;
  const int st = call({fraction}, [&] {
    if (band == nullptr) return status::misuse;
    const auto r = pumploss::motor_drain_check(drain_m3_s, inlet_m3_s,
                                               pumploss::motor_drain_bands<double>{sound_max, acceptable_max, worn_min});
    if (pumploss::is_error(r.st)) return r.st;
    *fraction = r.fraction;
    *band = static_cast<int>(r.band);
    return r.st;
  });
  if (st > 0 && st < 100 && band != nullptr) *band = -1;
  return st;
}

PUMPLOSS_API int PUMPLOSS_CALL pumploss_motor_creep(double displacement_m3_rev, double load_torque_nm,
                                                    double hydromech_efficiency, double leak_test_m3_s,
                                                    double leak_test_dp_pa, double leak_test_mu_pa_s, double mu_pa_s,
                                                    double travel_per_rev_m, double* holding_pressure_pa,
                                                    double* leakage_m3_s, double* creep_speed_rev_s,
                                                    double* load_speed_m_s) {
  return call({holding_pressure_pa, leakage_m3_s, creep_speed_rev_s, load_speed_m_s}, [&] {
    const auto r = pumploss::motor_creep(displacement_m3_rev, load_torque_nm, hydromech_efficiency, leak_test_m3_s,
                                         leak_test_dp_pa, leak_test_mu_pa_s, mu_pa_s, travel_per_rev_m);
    *holding_pressure_pa = r.holding_pressure_pa;
    *leakage_m3_s = r.leakage_m3_s;
    *creep_speed_rev_s = r.creep_speed_rev_s;
    *load_speed_m_s = r.load_speed_m_s;
    return r.st;
  });
}

PUMPLOSS_API int PUMPLOSS_CALL pumploss_inlet_pipe_check(double diameter_m, double length_m, double roughness_m,
                                                         double k_fittings, double height_m, double q_m3_s,
                                                         double t_k, double t1_k, double nu1_m2_s, double t2_k,
                                                         double nu2_m2_s, double rho15_kg_m3, double p_tank_abs_pa,
                                                         double p_min_abs_pa, double* inlet_abs_pa,
                                                         double* margin_pa) {
  return call({inlet_abs_pa, margin_pa}, [&] {
    suction_pipe l;
    pumploss::oil<double> o{};
    const status ls = suction_line(diameter_m, length_m, roughness_m, k_fittings, height_m, t1_k, nu1_m2_s, t2_k,
                                   nu2_m2_s, rho15_kg_m3, l, o);
    if (pumploss::is_error(ls)) return ls;
    const auto r = pumploss::inlet_check(l.elements, l.count, height_m, o, q_m3_s, t_k, p_tank_abs_pa, p_min_abs_pa);
    *inlet_abs_pa = r.inlet_pa;
    *margin_pa = r.margin_pa;
    return r.st;
  });
}

PUMPLOSS_API int PUMPLOSS_CALL pumploss_inlet_pipe_min_temperature(double diameter_m, double length_m,
                                                                   double roughness_m, double k_fittings,
                                                                   double height_m, double q_m3_s, double t1_k,
                                                                   double nu1_m2_s, double t2_k, double nu2_m2_s,
                                                                   double rho15_kg_m3, double p_tank_abs_pa,
                                                                   double p_min_abs_pa, double t_lo_k, double t_hi_k,
                                                                   double* t_min_k) {
  return call({t_min_k}, [&] {
    suction_pipe l;
    pumploss::oil<double> o{};
    const status ls = suction_line(diameter_m, length_m, roughness_m, k_fittings, height_m, t1_k, nu1_m2_s, t2_k,
                                   nu2_m2_s, rho15_kg_m3, l, o);
    if (pumploss::is_error(ls)) return ls;
    const auto r = pumploss::inlet_min_temperature(l.elements, l.count, height_m, o, q_m3_s, p_tank_abs_pa, p_min_abs_pa, t_lo_k, t_hi_k);
    *t_min_k = r.value;
    return r.st;
  });
}

PUMPLOSS_API int PUMPLOSS_CALL pumploss_shaft_seal_check(double case_continuous_pa, double case_peak_pa,
                                                         double seal_continuous_pa, double seal_peak_pa,
                                                         double* margin_continuous_pa, double* margin_peak_pa) {
  return call({margin_continuous_pa, margin_peak_pa}, [&] {
    const auto r = pumploss::shaft_seal_check(case_continuous_pa, case_peak_pa, seal_continuous_pa, seal_peak_pa);
    *margin_continuous_pa = r.margin_continuous_pa;
    *margin_peak_pa = r.margin_peak_pa;
    return r.st;
  });
}

}  // extern "C"
