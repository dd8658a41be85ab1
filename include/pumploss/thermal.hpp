/// @file thermal.hpp
/// @brief Heat from hydraulic losses: temperature rise of throttled oil, heat load of a pump or
/// motor, and the expected case drain temperature.
///
/// SI: pressure in Pa, density in kg/m^3, specific heat in J/(kg K), temperature in K, power in
/// W, flow in m^3/s. Results are engineering estimates.
#ifndef PUMPLOSS_THERMAL_HPP
#define PUMPLOSS_THERMAL_HPP

#include <cmath>

#include "efficiency.hpp"
#include "scalar_traits.hpp"
#include "status.hpp"

namespace pumploss {

/// Temperature rise of oil throttled across a pressure drop when all the dissipated work stays in
/// the oil (the trade's rule, about 0.56 K per 10 bar).
///
/// \f[ \Delta T = \frac{\Delta p}{\rho c_p} \f]
///
/// @param dp_pa pressure drop, Pa, >= 0
/// @param rho_kg_m3 density, kg/m^3, > 0
/// @param cp_j_kg_k specific heat at constant pressure, J/(kg K), > 0
/// @return temperature rise in K; status::domain for dp < 0 or rho, cp <= 0; status::nonfinite.
/// @par Validity
/// Adiabatic throttle; ignores the Joule-Thomson correction (see
/// throttle_temperature_rise_isenthalpic(), about 0.79 of this value at 50 degC).
/// @par Accuracy
/// Within 2 ulp of the 50-digit evaluation; check 10 bar, 880 kg/m^3, 2030 J/(kg K) -> 0.560 K
/// (self-calculated, tests/reference/SOURCES.md methods13_row18).
/// @par Source
/// Energy balance of an adiabatic throttle (docs/pages/theory_efficiency.md, Heat).
template <class T, detail::if_real<T> = 0>
inline result<T> throttle_temperature_rise(T dp_pa, T rho_kg_m3, T cp_j_kg_k) {
  if (!detail::all_finite(dp_pa, rho_kg_m3, cp_j_kg_k)) return detail::fail<T>(status::nonfinite);
  if (!(dp_pa >= T(0)) || !(rho_kg_m3 > T(0)) || !(cp_j_kg_k > T(0))) return detail::fail<T>(status::domain);
  return {dp_pa / (rho_kg_m3 * cp_j_kg_k), status::ok};
}

/// Temperature rise of an isenthalpic throttle of a liquid (Joule-Thomson coefficient
/// \f$ (v/c_p)(\alpha_p T - 1) \f$):
///
/// \f[ \Delta T = (1 - \alpha_p T)\,\frac{\Delta p}{\rho c_p} \f]
///
/// @param dp_pa pressure drop, Pa, >= 0
/// @param rho_kg_m3 density, kg/m^3, > 0
/// @param cp_j_kg_k specific heat, J/(kg K), > 0
/// @param alpha_per_k isobaric expansion coefficient alpha_p, 1/K, >= 0
/// @param t_k absolute temperature of the oil, K, > 0
/// @return temperature rise in K; status::domain for bad values or alpha_p T >= 1.
/// @par Validity
/// Constant properties over the throttle.
/// @par Accuracy
/// Within 4 ulp of the 50-digit evaluation.
/// @par Source
/// Standard thermodynamics of the Joule-Thomson coefficient (citation from memory),
/// Energy balance (docs/pages/theory_efficiency.md, Heat).
template <class T, detail::if_real<T> = 0>
inline result<T> throttle_temperature_rise_isenthalpic(T dp_pa, T rho_kg_m3, T cp_j_kg_k, T alpha_per_k, T t_k) {
  if (!detail::all_finite(dp_pa, rho_kg_m3, cp_j_kg_k, alpha_per_k, t_k)) return detail::fail<T>(status::nonfinite);
  if (!(dp_pa >= T(0)) || !(rho_kg_m3 > T(0)) || !(cp_j_kg_k > T(0)) || !(alpha_per_k >= T(0)) || !(t_k > T(0)))
    return detail::fail<T>(status::domain);
  const T f = T(1) - alpha_per_k * t_k;
  if (!(f > T(0))) return detail::fail<T>(status::domain);
  return {f * dp_pa / (rho_kg_m3 * cp_j_kg_k), status::ok};
}

/// Heat load of a pump or a motor from its input power and overall efficiency.
///
/// \f[ \Phi = P_\mathrm{in}\,(1 - \eta_t) \f] with \f$ P_\mathrm{in} = P_m \f$ (pump, shaft
/// power) or \f$ P_h \f$ (motor, hydraulic power taken in).
///
/// @param input_power_w power taken in, W, >= 0
/// @param eta_t overall efficiency, fraction, in [0, 1]
/// @return heat load in W; status::implausible for eta_t above 1 (negative heat, value kept);
///         status::domain for a negative power or efficiency.
/// @par Accuracy
/// Within 2 ulp.
/// @par Source
/// Energy balance (docs/pages/theory_efficiency.md, Heat); efficiency definitions of ISO 4409:2019.
template <class T, detail::if_real<T> = 0>
inline result<T> heat_load(T input_power_w, T eta_t) {
  if (!detail::all_finite(input_power_w, eta_t)) return detail::fail<T>(status::nonfinite);
  if (!(input_power_w >= T(0)) || !(eta_t >= T(0))) return detail::fail<T>(status::domain);
  const T phi = input_power_w * (T(1) - eta_t);
  if (eta_t > T(1)) return {phi, status::implausible};
  return {phi, status::ok};
}

/// Heat load of a pump or a motor from a measured operating point: \f$ P_m - P_h \f$ (pump) or
/// \f$ P_h - P_m \f$ (motor), via pump_efficiency() / motor_efficiency().
/// \f[ \Phi = P_\mathrm{in}(1 - \eta_t) \f]
/// @param kind machine::pump or machine::motor
/// @param displacement_m3_rev V_i, m^3/rev, > 0
/// @param speed_rev_s n, rev/s, > 0
/// @param dp_pa pressure difference, Pa, > 0
/// @param flow_m3_s pump outlet or motor inlet flow, m^3/s
/// @param torque_n_m pump input or motor output torque, N m
/// @return heat load in W with the status of the efficiency calculation.
/// @par Accuracy
/// Within a few ulp of P_in - P_out (one subtraction of the two powers).
/// @par Source
/// Energy balance (docs/pages/theory_efficiency.md, Heat).
template <class T>
inline result<T> machine_heat_load(machine kind, T displacement_m3_rev, T speed_rev_s, T dp_pa, T flow_m3_s,
                                   T torque_n_m) {
  const auto e = machine_efficiency(kind, displacement_m3_rev, speed_rev_s, dp_pa, flow_m3_s, torque_n_m);
  if (is_error(e.st)) return detail::fail<T>(e.st);
  return {e.heat_w, e.st};
}

/// Expected case drain temperature when a power is carried away by the drain flow.
///
/// \f[ T_3 = T_1 + \frac{P}{\rho c_p q_{V3}} \f]
///
/// With P the leakage power (dp times the leakage flow that leaves through the case) this is the
/// expected drain temperature; with P the whole heat load it is the upper bound reached when all
/// losses leave with the drain (docs/pages/theory_efficiency.md, Heat).
///
/// @param t_inlet_k temperature of the oil entering the machine, K, > 0
/// @param power_w power dissipated into the drain flow, W, >= 0
/// @param drain_flow_m3_s case drain flow q_V3, m^3/s, > 0
/// @param rho_kg_m3 density, kg/m^3, > 0
/// @param cp_j_kg_k specific heat, J/(kg K), > 0
/// @return drain temperature in K; status::regime when the rise exceeds 100 K (constant
///         properties no longer hold; our own limit); status::domain for bad values.
/// @par Validity
/// Adiabatic case (heat lost through the housing makes the real value lower).
/// @par Accuracy
/// Within 3 ulp of the 50-digit evaluation.
/// @par Source
/// Energy balance (docs/pages/theory_efficiency.md, Heat).
template <class T, detail::if_real<T> = 0>
inline result<T> case_drain_temperature(T t_inlet_k, T power_w, T drain_flow_m3_s, T rho_kg_m3, T cp_j_kg_k) {
  if (!detail::all_finite(t_inlet_k, power_w, drain_flow_m3_s, rho_kg_m3, cp_j_kg_k))
    return detail::fail<T>(status::nonfinite);
  if (!(t_inlet_k > T(0)) || !(power_w >= T(0)) || !(drain_flow_m3_s > T(0)) || !(rho_kg_m3 > T(0)) ||
      !(cp_j_kg_k > T(0)))
    return detail::fail<T>(status::domain);
  const T rise = power_w / (rho_kg_m3 * cp_j_kg_k * drain_flow_m3_s);
  if (!detail::finite(rise)) return detail::fail<T>(status::overflow);
  if (rise > T(100)) return {t_inlet_k + rise, status::regime};
  return {t_inlet_k + rise, status::ok};
}

/// Expected case drain temperature from the leakage power: the drain flow throttled from the
/// working pressure to case pressure, \f$ P = \Delta p\, q_{V3} \f$, so that
/// \f[ T_3 = T_1 + \frac{\Delta p}{\rho c_p} \f] plus, optionally, a share of the mechanical
/// losses that also leaves with the drain.
///
/// @param t_inlet_k inlet oil temperature, K, > 0
/// @param dp_pa pressure drop from the working port to the case, Pa, >= 0
/// @param drain_flow_m3_s case drain flow q_V3, m^3/s, > 0
/// @param extra_power_w further losses carried by the drain (e.g. friction in the case), W, >= 0
/// @param rho_kg_m3 density, kg/m^3, > 0
/// @param cp_j_kg_k specific heat, J/(kg K), > 0
/// @return drain temperature in K, statuses as case_drain_temperature().
/// @par Accuracy
/// Within 4 ulp of the 50-digit evaluation.
/// @par Source
/// Energy balance (docs/pages/theory_efficiency.md, Heat).
template <class T, detail::if_real<T> = 0>
inline result<T> case_drain_temperature_from_leakage(T t_inlet_k, T dp_pa, T drain_flow_m3_s, T extra_power_w,
                                                     T rho_kg_m3, T cp_j_kg_k) {
  if (!detail::all_finite(dp_pa, drain_flow_m3_s, extra_power_w)) return detail::fail<T>(status::nonfinite);
  if (!(dp_pa >= T(0)) || !(extra_power_w >= T(0))) return detail::fail<T>(status::domain);
  return case_drain_temperature(t_inlet_k, dp_pa * drain_flow_m3_s + extra_power_w, drain_flow_m3_s, rho_kg_m3,
                                cp_j_kg_k);
}

// Mixed argument types (an int literal beside doubles), promoted as Boost.Math promotes:
// one line per public template whose parameters are all scalars (promote.hpp).
PUMPLOSS_PROMOTE(case_drain_temperature)
PUMPLOSS_PROMOTE(case_drain_temperature_from_leakage)
PUMPLOSS_PROMOTE(heat_load)
PUMPLOSS_PROMOTE(throttle_temperature_rise)
PUMPLOSS_PROMOTE(throttle_temperature_rise_isenthalpic)

}  // namespace pumploss

#endif
