/// @file efficiency.hpp
/// @brief Efficiencies and powers of pumps and motors from steady-state test data, correction of
/// a flow reading to port conditions, and the derived displacement V_i by three estimators.
///
/// SI throughout: displacement in m^3/rev, speed in rev/s, pressure in Pa, flow in m^3/s, torque
/// in N m, power in W. Efficiencies are fractions. Results are engineering estimates.
#ifndef PUMPLOSS_EFFICIENCY_HPP
#define PUMPLOSS_EFFICIENCY_HPP

#include <cmath>
#include <cstddef>

#include "detail/lsq.hpp"
#include "fluid.hpp"
#include "scalar_traits.hpp"
#include "status.hpp"

namespace pumploss {

/// Which kind of machine: the efficiency definitions of a pump and a motor differ.
enum class machine : int {
  pump = 0,  ///< Pump: flow is the outlet flow q_V2 it delivers, torque the torque it takes in.
  motor = 1  ///< Motor: flow is the inlet flow q_V1 it takes in, torque the torque it gives out.
};

/// Efficiencies, ideal quantities, powers and losses of one operating point.
template <class T>
struct [[nodiscard]] efficiency_point {
  T eta_v;      ///< volumetric efficiency (ISO 4409 definition), fraction
  T eta_hm;     ///< hydromechanical efficiency, fraction
  T eta_t;      ///< overall (total) efficiency, fraction
  T q_th;       ///< theoretical flow V_i n, m^3/s
  T torque_th;  ///< theoretical torque V_i dp / (2 pi), N m
  T p_hyd;      ///< hydraulic power q dp, W
  T p_mech;     ///< mechanical (shaft) power 2 pi n T, W
  T q_loss;     ///< flow loss (pump: q_th - q; motor: q - q_th), m^3/s
  T torque_loss;///< torque loss (pump: T - T_th; motor: T_th - T), N m
  T heat_w;     ///< power lost to heat (pump: P_m - P_h; motor: P_h - P_m), W
  status st;    ///< ok, implausible (an efficiency above 1), or an error (all fields NaN)
  /// @return true when the status is exactly ok.
  bool ok() const noexcept { return st == pumploss::status::ok; }
  /// @return true when the results are usable (ok or a report such as regime).
  bool usable() const noexcept { return pumploss::is_usable(st); }
};

namespace detail {
template <class T>
inline efficiency_point<T> efficiency_fail(status s) {
  const T nan = scalar_traits<T>::nan();
  return {nan, nan, nan, nan, nan, nan, nan, nan, nan, nan, s};
}
/// Final checks shared by the pump and motor forms: overflow, efficiency above 1.
/// All terms are non-negative, so one finiteness test of their sum covers every field.
template <class T>
inline efficiency_point<T> efficiency_finish(const efficiency_point<T>& r) {
  if (!finite(r.eta_t + r.eta_v + r.eta_hm + r.q_th + r.torque_th + r.p_hyd + r.p_mech))
    return efficiency_fail<T>(status::overflow);
  efficiency_point<T> out = r;
  if (r.eta_v > T(1) || r.eta_hm > T(1)) out.st = status::implausible;
  return out;
}
/// 1 / (2 pi) in T.
template <class T>
inline T inv_two_pi() {
  return constant<T>(0.159154943091895335768883763372514362L,
                     "0.15915494309189533576888376337251436203445964574045644874766734");
}
}  // namespace detail

/// Efficiencies and powers of a pump at one operating point.
///
/// \f[ q_{th} = V_i n,\quad T_{th} = \frac{V_i \Delta p}{2\pi},\quad
///     \eta_v = \frac{q_{V2}}{V_i n},\quad \eta_{hm} = \frac{V_i \Delta p}{2\pi T},\quad
///     \eta_t = \eta_v \eta_{hm} = \frac{q_{V2}\Delta p}{2\pi n T} \f]
///
/// @param displacement_m3_rev derived displacement V_i, m^3/rev, > 0 (state how it was found)
/// @param speed_rev_s rotational frequency n, rev/s, > 0
/// @param dp_pa pressure rise dp = p_2 - p_1, Pa, > 0
/// @param flow_m3_s outlet flow q_V2 at outlet conditions, m^3/s, >= 0
/// @param torque_n_m measured input torque T, N m, > 0
/// @return all fields; status::implausible when an efficiency exceeds 1 (values kept: usually a
///         too small V_i or a flow reading not corrected to outlet conditions);
///         status::domain for a non-positive displacement, speed, pressure or torque or a
///         negative flow; status::nonfinite for NaN/inf (all fields NaN on error).
/// @par Validity
/// Steady state. eta_v is the ISO 4409 flow ratio: at high pressure it mixes leakage with
/// compression of the trapped volume (docs/pages/theory_efficiency.md).
/// @par Accuracy
/// A few ulp against a 50-digit evaluation (tests/efficiency_test.cpp: at most 3 ulp seen over 3 000 points).
/// @par Source
/// ISO 4409:2019 (test method) with the definitions of ISO 4391; pump eta_hm = eta_t / eta_v,
/// ISO 4409:2019 and ISO 4391 (docs/pages/theory_efficiency.md).
template <class T, detail::if_real<T> = 0>
inline efficiency_point<T> pump_efficiency(T displacement_m3_rev, T speed_rev_s, T dp_pa, T flow_m3_s,
                                           T torque_n_m) {
  if (!detail::all_finite(displacement_m3_rev, speed_rev_s, dp_pa, flow_m3_s, torque_n_m))
    return detail::efficiency_fail<T>(status::nonfinite);
  if (!(displacement_m3_rev > T(0)) || !(speed_rev_s > T(0)) || !(dp_pa > T(0)) ||
      !(flow_m3_s >= T(0)) || !(torque_n_m > T(0)))
    return detail::efficiency_fail<T>(status::domain);
  const T two_pi = 2 * detail::pi<T>();
  const T q_th = displacement_m3_rev * speed_rev_s;
  const T t_th = displacement_m3_rev * dp_pa * detail::inv_two_pi<T>();
  const T eta_v = flow_m3_s / q_th;
  const T eta_hm = t_th / torque_n_m;
  const T p_h = flow_m3_s * dp_pa;
  const T p_m = two_pi * speed_rev_s * torque_n_m;
  const efficiency_point<T> r{eta_v, eta_hm, eta_v * eta_hm, q_th, t_th, p_h, p_m,
                              q_th - flow_m3_s, torque_n_m - t_th, p_m - p_h, status::ok};
  return detail::efficiency_finish(r);
}

/// Efficiencies and powers of a hydraulic motor at one operating point.
///
/// \f[ q_{th} = V_i n,\quad T_{th} = \frac{V_i \Delta p}{2\pi},\quad
///     \eta_v = \frac{V_i n}{q_{V1}},\quad \eta_{hm} = \frac{2\pi T}{V_i \Delta p},\quad
///     \eta_t = \eta_v \eta_{hm} = \frac{2\pi n T}{q_{V1}\Delta p} \f]
///
/// @param displacement_m3_rev derived displacement V_i, m^3/rev, > 0
/// @param speed_rev_s rotational frequency n, rev/s, > 0
/// @param dp_pa pressure drop across the motor dp = p_1 - p_2, Pa, > 0
/// @param flow_m3_s inlet flow q_V1 taken in, at inlet conditions, m^3/s, > 0
/// @param torque_n_m measured output torque T, N m, >= 0
/// @return all fields; status::implausible when an efficiency exceeds 1 (for a motor this can
///         only be eta_hm with an underestimated V_i, or eta_v with a flow reading not corrected
///         to inlet conditions); status::domain for a non-positive displacement, speed, pressure
///         or flow or a negative torque; status::nonfinite for NaN/inf.
/// @par Validity
/// Steady state; eta_v as the ISO 4409 flow ratio.
/// @par Accuracy
/// A few ulp against a 50-digit evaluation (tests/efficiency_test.cpp: at most 3 ulp seen over 3 000 points).
/// @par Source
/// ISO 4409:2019 with the definitions of ISO 4391.
template <class T, detail::if_real<T> = 0>
inline efficiency_point<T> motor_efficiency(T displacement_m3_rev, T speed_rev_s, T dp_pa, T flow_m3_s,
                                            T torque_n_m) {
  if (!detail::all_finite(displacement_m3_rev, speed_rev_s, dp_pa, flow_m3_s, torque_n_m))
    return detail::efficiency_fail<T>(status::nonfinite);
  if (!(displacement_m3_rev > T(0)) || !(speed_rev_s > T(0)) || !(dp_pa > T(0)) ||
      !(flow_m3_s > T(0)) || !(torque_n_m >= T(0)))
    return detail::efficiency_fail<T>(status::domain);
  const T two_pi = 2 * detail::pi<T>();
  const T q_th = displacement_m3_rev * speed_rev_s;
  const T t_th = displacement_m3_rev * dp_pa * detail::inv_two_pi<T>();
  const T eta_v = q_th / flow_m3_s;
  const T eta_hm = torque_n_m / t_th;
  const T p_h = flow_m3_s * dp_pa;
  const T p_m = two_pi * speed_rev_s * torque_n_m;
  const efficiency_point<T> r{eta_v, eta_hm, eta_v * eta_hm, q_th, t_th, p_h, p_m,
                              flow_m3_s - q_th, t_th - torque_n_m, p_h - p_m, status::ok};
  return detail::efficiency_finish(r);
}

/// Efficiencies of a pump or a motor (dispatches to pump_efficiency() or motor_efficiency()).
/// \f[ \eta_t = \eta_v\,\eta_{hm} \f]
/// @param kind machine::pump or machine::motor
/// @param displacement_m3_rev derived displacement V_i, m^3/rev, > 0
/// @param speed_rev_s rotational frequency n, rev/s, > 0
/// @param dp_pa pressure difference across the machine, Pa, > 0
/// @param flow_m3_s pump outlet flow or motor inlet flow, m^3/s
/// @param torque_n_m pump input torque or motor output torque, N m
/// @return as pump_efficiency() or motor_efficiency()
/// @par Source
/// ISO 4409:2019.
template <class T>
inline efficiency_point<T> machine_efficiency(machine kind, T displacement_m3_rev, T speed_rev_s, T dp_pa,
                                              T flow_m3_s, T torque_n_m) {
  return kind == machine::motor
             ? motor_efficiency(displacement_m3_rev, speed_rev_s, dp_pa, flow_m3_s, torque_n_m)
             : pump_efficiency(displacement_m3_rev, speed_rev_s, dp_pa, flow_m3_s, torque_n_m);
}

/// Theoretical (displacement) flow \f$ q_{th} = V_i n \f$.
/// @param displacement_m3_rev V_i, m^3/rev, > 0
/// @param speed_rev_s n, rev/s, >= 0
/// @return q_th in m^3/s; status::domain for V_i <= 0 or n < 0; status::nonfinite for NaN/inf.
/// @par Accuracy
/// Correctly rounded (one multiplication).
/// @par Source
/// ISO 4391 definition.
template <class T, detail::if_real<T> = 0>
inline result<T> theoretical_flow(T displacement_m3_rev, T speed_rev_s) {
  if (!detail::all_finite(displacement_m3_rev, speed_rev_s)) return detail::fail<T>(status::nonfinite);
  if (!(displacement_m3_rev > T(0)) || !(speed_rev_s >= T(0))) return detail::fail<T>(status::domain);
  return {displacement_m3_rev * speed_rev_s, status::ok};
}

/// Theoretical torque \f$ T_{th} = V_i \Delta p / (2\pi) \f$.
/// @param displacement_m3_rev V_i, m^3/rev, > 0
/// @param dp_pa pressure difference, Pa, >= 0
/// @return T_th in N m; status::domain for V_i <= 0 or dp < 0; status::nonfinite for NaN/inf.
/// @par Accuracy
/// Within 2 ulp.
/// @par Source
/// ISO 4391 definition.
template <class T, detail::if_real<T> = 0>
inline result<T> theoretical_torque(T displacement_m3_rev, T dp_pa) {
  if (!detail::all_finite(displacement_m3_rev, dp_pa)) return detail::fail<T>(status::nonfinite);
  if (!(displacement_m3_rev > T(0)) || !(dp_pa >= T(0))) return detail::fail<T>(status::domain);
  return {displacement_m3_rev * dp_pa / (2 * detail::pi<T>()), status::ok};
}

/// Hydraulic power \f$ P_h = q \Delta p \f$.
/// @param flow_m3_s q, m^3/s, >= 0
/// @param dp_pa dp, Pa (any sign: negative for power taken in)
/// @return P_h in W; status::domain for a negative flow; status::nonfinite for NaN/inf;
///         status::overflow when the product overflows.
/// @par Accuracy
/// Correctly rounded.
/// @par Source
/// Definition (docs/pages/theory_efficiency.md).
template <class T, detail::if_real<T> = 0>
inline result<T> hydraulic_power(T flow_m3_s, T dp_pa) {
  if (!detail::all_finite(flow_m3_s, dp_pa)) return detail::fail<T>(status::nonfinite);
  if (!(flow_m3_s >= T(0))) return detail::fail<T>(status::domain);
  const T p = flow_m3_s * dp_pa;
  if (!detail::finite(p)) return detail::fail<T>(status::overflow);
  return {p, status::ok};
}

/// Mechanical (shaft) power \f$ P_m = 2\pi n T \f$.
/// @param speed_rev_s n, rev/s, >= 0
/// @param torque_n_m T, N m (any sign)
/// @return P_m in W; status::domain for a negative speed; status::nonfinite for NaN/inf;
///         status::overflow when the product overflows.
/// @par Accuracy
/// Within 2 ulp.
/// @par Source
/// Definition (docs/pages/theory_efficiency.md).
template <class T, detail::if_real<T> = 0>
inline result<T> shaft_power(T speed_rev_s, T torque_n_m) {
  if (!detail::all_finite(speed_rev_s, torque_n_m)) return detail::fail<T>(status::nonfinite);
  if (!(speed_rev_s >= T(0))) return detail::fail<T>(status::domain);
  const T p = 2 * detail::pi<T>() * speed_rev_s * torque_n_m;
  if (!detail::finite(p)) return detail::fail<T>(status::overflow);
  return {p, status::ok};
}

/// @name Correcting a flow reading to port conditions
/// @{


/// Flow at the port from a meter reading at another pressure and temperature, by the exact
/// density ratio (same mass flow):
/// \f[ q_{V2} = q_{Ve}\,\frac{\rho(p_e, \theta_e)}{\rho(p_2, \theta_2)} \f]
/// with \f$ \rho \f$ from oil_density().
///
/// @param q_meter_m3_s flow indicated by the meter q_Ve, m^3/s, >= 0
/// @param p_meter_pa gauge pressure at the meter p_e, Pa
/// @param t_meter_k temperature at the meter, K, > 0
/// @param p_port_pa gauge pressure at the port p_2, Pa
/// @param t_port_k temperature at the port, K, > 0
/// @param rho_ref_kg_m3 oil density at t_ref_k and zero gauge pressure, kg/m^3, > 0
/// @param t_ref_k reference temperature of the density, K, > 0
/// @param alpha_per_k isobaric expansion coefficient alpha_p, 1/K, >= 0
/// @param bulk_modulus_pa secant bulk modulus K, Pa, > |p|
/// @return q_V2 in m^3/s; errors of oil_density(); status::domain for a negative flow; the
///         report status of oil_density() (regime) when a state lies 150 K from the reference.
/// @par Accuracy
/// Within 4 ulp of the 50-digit evaluation (tests/efficiency_test.cpp).
/// @par Source
/// Mass conservation with the density model of docs/pages/theory_fluid.md; the approach of ISO 4409:2019
/// (clause text not seen).
template <class T, detail::if_real<T> = 0>
inline result<T> flow_at_port(T q_meter_m3_s, T p_meter_pa, T t_meter_k, T p_port_pa, T t_port_k,
                              T rho_ref_kg_m3, T t_ref_k, T alpha_per_k, T bulk_modulus_pa) {
  if (!detail::finite(q_meter_m3_s)) return detail::fail<T>(status::nonfinite);
  const auto rho_e = oil_density(rho_ref_kg_m3, t_ref_k, alpha_per_k, bulk_modulus_pa, t_meter_k, p_meter_pa);
  if (is_error(rho_e.st)) return detail::fail<T>(rho_e.st);
  const auto rho_2 = oil_density(rho_ref_kg_m3, t_ref_k, alpha_per_k, bulk_modulus_pa, t_port_k, p_port_pa);
  if (is_error(rho_2.st)) return detail::fail<T>(rho_2.st);
  if (!(q_meter_m3_s >= T(0))) return detail::fail<T>(status::domain);
  return {q_meter_m3_s * rho_e.value / rho_2.value, worst(rho_e.st, rho_2.st)};
}

/// Linearised correction of a flow reading to port conditions:
/// \f[ q_{V2} \approx q_{Ve}\,[1 - (p_2 - p_e)/K_T - \alpha_p(\theta_e - \theta_2)] \f]
///
/// @param q_meter_m3_s flow indicated by the meter q_Ve, m^3/s, >= 0
/// @param p_meter_pa gauge pressure at the meter p_e, Pa
/// @param t_meter_k temperature at the meter, K
/// @param p_port_pa gauge pressure at the port p_2, Pa
/// @param t_port_k temperature at the port, K
/// @param alpha_per_k isobaric expansion coefficient alpha_p, 1/K, >= 0
/// @param bulk_modulus_pa bulk modulus K_T, Pa, > 0
/// @return q_V2 in m^3/s; status::regime when the correction exceeds 5 % (the linear form then
///         differs from the exact ratio by more than about 0.1 %: use flow_at_port());
///         status::domain for a negative flow, negative alpha, non-positive K or a factor <= 0.
/// @par Accuracy
/// Differs from flow_at_port() by second-order terms: 0.03 % for 250 bar and 13 K
/// (tests/efficiency_test.cpp).
/// @par Source
/// First-order expansion of the density ratio (docs/pages/theory_efficiency.md).
template <class T, detail::if_real<T> = 0>
inline result<T> flow_at_port_linear(T q_meter_m3_s, T p_meter_pa, T t_meter_k, T p_port_pa, T t_port_k,
                                     T alpha_per_k, T bulk_modulus_pa) {
  using std::fabs;
  if (!detail::all_finite(q_meter_m3_s, p_meter_pa, t_meter_k, p_port_pa, t_port_k, alpha_per_k,
                          bulk_modulus_pa))
    return detail::fail<T>(status::nonfinite);
  if (!(q_meter_m3_s >= T(0)) || !(alpha_per_k >= T(0)) || !(bulk_modulus_pa > T(0)))
    return detail::fail<T>(status::domain);
  const T corr = -(p_port_pa - p_meter_pa) / bulk_modulus_pa - alpha_per_k * (t_meter_k - t_port_k);
  if (!(corr > T(-1))) return detail::fail<T>(status::domain);
  const T q = q_meter_m3_s * (T(1) + corr);
  if (fabs(corr) > detail::constant<T>(0.05L, "0.05")) return {q, status::regime};
  return {q, status::ok};
}
/// @}

/// @name Derived displacement V_i from test data (docs/pages/theory_efficiency.md)
/// @{


/// The estimator that produced a derived displacement.
enum class displacement_estimator : int {
  slope_low_pressure = 0,       ///< A: slope of flow over speed at one low pressure
  zero_pressure_intercept = 1,  ///< B: zero-pressure intercept at one speed (as ISO 8426-2:2025)
  two_step = 2                  ///< C: two-step method over speeds x pressures (as ISO 8426-1:2025)
};

/// A short English name of an estimator, for reports.
/// @param e the estimator
/// @return a static string such as "slope of flow over speed at one low pressure"
inline const char* displacement_estimator_name(displacement_estimator e) noexcept {
  switch (e) {
    case displacement_estimator::slope_low_pressure: return "slope of flow over speed at one low pressure";
    case displacement_estimator::zero_pressure_intercept:
      return "zero-pressure intercept at one speed (as ISO 8426-2:2025)";
    case displacement_estimator::two_step: return "two-step method over speeds and pressures (as ISO 8426-1:2025)";
  }
  return "unknown estimator";
}

/// A derived displacement with its standard error and the estimator that produced it.
template <class T>
struct [[nodiscard]] displacement_result {
  T v_m3_rev;                        ///< derived displacement V_i, m^3/rev
  T u_v_m3_rev;                      ///< standard error of V_i (from the fit residuals), m^3/rev
  T aux;                             ///< A: flow intercept c (m^3/s); B: slope dq/ddp (m^3/(s Pa)); C: slope dV/ddp (m^3/(rev Pa))
  T u_aux;                           ///< standard error of aux, same unit
  T s_r;                             ///< residual standard deviation of the (last) line fit
  std::size_t points;                ///< number of points used
  displacement_estimator estimator;  ///< the estimator used: always state it with V_i
  status st;                         ///< ok, regime (fewer points than the standard asks), or an error
  /// @return true when the status is exactly ok.
  bool ok() const noexcept { return st == pumploss::status::ok; }
  /// @return true when the results are usable (ok or a report such as regime).
  bool usable() const noexcept { return pumploss::is_usable(st); }
};

namespace detail {
template <class T>
inline displacement_result<T> displacement_fail(displacement_estimator e, std::size_t n, status s) {
  const T nan = scalar_traits<T>::nan();
  return {nan, nan, nan, nan, nan, n, e, s};
}
}  // namespace detail

/// Derived displacement, estimator A: least-squares slope of flow over speed at one low
/// pressure, \f$ q_k = V n_k + c \f$, \f$ V_i = V \f$.
///
/// \f[ V = \frac{S_{nq}}{S_{nn}},\quad u^2(V) = \frac{s_r^2}{S_{nn}},\quad
///     s_r^2 = \frac{\sum (q - c - V n)^2}{N - 2} \f]
///
/// @param speed_rev_s array of N speeds n_k, rev/s, > 0, not all equal
/// @param flow_m3_s array of N flows q_k (pump outlet or motor inlet), m^3/s, >= 0
/// @param count N, >= 3
/// @return V_i, u(V_i), the intercept c in aux (leakage at that pressure, negative for a pump),
///         estimator slope_low_pressure; status::insufficient_data for N < 3 or equal speeds;
///         status::domain / nonfinite for bad points; status::misuse for null arrays.
/// @par Validity
/// Assumes leakage independent of speed at the test pressure (keep it low).
/// @par Accuracy
/// Recovers an exact line to 1e-14 relative (tests/efficiency_test.cpp).
/// @par Source
/// Straight-line least squares (estimator A of docs/pages/theory_efficiency.md; self-derived, no standard text).
template <class T>
inline displacement_result<T> displacement_slope(const T* speed_rev_s, const T* flow_m3_s, std::size_t count) {
  const auto e = displacement_estimator::slope_low_pressure;
  if (speed_rev_s == nullptr || flow_m3_s == nullptr) return detail::displacement_fail<T>(e, count, status::misuse);
  for (std::size_t i = 0; i < count; ++i) {
    if (!detail::all_finite(speed_rev_s[i], flow_m3_s[i])) return detail::displacement_fail<T>(e, count, status::nonfinite);
    if (!(speed_rev_s[i] > T(0)) || !(flow_m3_s[i] >= T(0))) return detail::displacement_fail<T>(e, count, status::domain);
  }
  const auto f = detail::line_fit<T>(count, [&](std::size_t i) { return speed_rev_s[i]; },
                                     [&](std::size_t i) { return flow_m3_s[i]; });
  if (is_error(f.st)) return detail::displacement_fail<T>(e, count, f.st);
  if (!(f.slope > T(0))) return detail::displacement_fail<T>(e, count, status::domain);
  return {f.slope, f.u_slope, f.intercept, f.u_intercept, f.s_r, count, e, status::ok};
}

/// Derived displacement, estimator B: zero-pressure intercept of flow over pressure at one speed,
/// \f$ q(\Delta p) = a_0 + a_1 \Delta p \f$, \f$ V_i = a_0 / n \f$.
///
/// \f[ u(V_i) = \frac{u(a_0)}{n},\quad u^2(a_0) = s_r^2\left(\frac{1}{N} + \frac{\bar{\Delta p}^2}{S_{pp}}\right) \f]
///
/// @param speed_rev_s the one shaft speed n, rev/s, > 0
/// @param dp_pa array of N pressure differences, Pa, >= 0, not all equal
/// @param flow_m3_s array of N flows, m^3/s, >= 0
/// @param count N, >= 3
/// @return V_i, u(V_i), the slope a_1 in aux (negative for a pump: leakage), estimator
///         zero_pressure_intercept; errors as displacement_slope().
/// @par Validity
/// Straight line in dp (Wilson's laminar slip); curvature shows in the residuals (s_r).
/// @par Accuracy
/// Recovers an exact line to 1e-14 relative (tests/efficiency_test.cpp).
/// @par Source
/// ISO 8426-2:2025 (zero-pressure intercept at a single shaft speed; scope seen, clause text
/// not), estimator B of docs/pages/theory_efficiency.md.
template <class T>
inline displacement_result<T> displacement_intercept(T speed_rev_s, const T* dp_pa, const T* flow_m3_s,
                                                     std::size_t count) {
  const auto e = displacement_estimator::zero_pressure_intercept;
  if (dp_pa == nullptr || flow_m3_s == nullptr) return detail::displacement_fail<T>(e, count, status::misuse);
  if (!detail::finite(speed_rev_s)) return detail::displacement_fail<T>(e, count, status::nonfinite);
  if (!(speed_rev_s > T(0))) return detail::displacement_fail<T>(e, count, status::domain);
  for (std::size_t i = 0; i < count; ++i) {
    if (!detail::all_finite(dp_pa[i], flow_m3_s[i])) return detail::displacement_fail<T>(e, count, status::nonfinite);
    if (!(dp_pa[i] >= T(0)) || !(flow_m3_s[i] >= T(0))) return detail::displacement_fail<T>(e, count, status::domain);
  }
  const auto f = detail::line_fit<T>(count, [&](std::size_t i) { return dp_pa[i]; },
                                     [&](std::size_t i) { return flow_m3_s[i]; });
  if (is_error(f.st)) return detail::displacement_fail<T>(e, count, f.st);
  if (!(f.intercept > T(0))) return detail::displacement_fail<T>(e, count, status::domain);
  return {f.intercept / speed_rev_s, f.u_intercept / speed_rev_s, f.slope, f.u_slope, f.s_r, count, e, status::ok};
}

/// Derived displacement, estimator C: the two-step method over a grid of speeds and pressures.
/// Step 1, for each pressure level j: \f$ q = V_j n + c_j \f$ over the speeds; step 2:
/// \f$ V_j = V_i + k\,\overline{\Delta p}_j \f$, and V_i is the intercept.
///
/// \f[ u^2(V_i) = s_r^2\left(\frac{1}{J} + \frac{\bar{p}^2}{S_{pp}}\right) \f] (step-2 residuals)
///
/// @param speed_rev_s array of levels x per_level speeds, rev/s, > 0; the points of pressure
///        level j are the entries j*per_level ... (j+1)*per_level - 1
/// @param dp_pa array of the same layout, Pa, >= 0 (the level's pressure is their mean)
/// @param flow_m3_s array of the same layout, m^3/s, >= 0
/// @param levels J, number of pressure levels, >= 3
/// @param per_level number of speeds per level, >= 3
/// @return V_i, u(V_i), the slope k in aux, estimator two_step; status::regime when J or the
///         speeds per level are fewer than 5 (ISO 8426-1:2025 asks for at least 5 x 5);
///         errors as displacement_slope().
/// @par Validity
/// Unweighted step 2 (every level counts equally).
/// @par Accuracy
/// Recovers exact synthetic data to 1e-13 relative (tests/efficiency_test.cpp).
/// @par Source
/// Toet, Johnson, Montague, Torres, Garcia-Bravo, Energies 12(3):415 (2019); ISO 8426-1:2025
/// (scope seen), estimator C of docs/pages/theory_efficiency.md.
template <class T>
inline displacement_result<T> displacement_two_step(const T* speed_rev_s, const T* dp_pa, const T* flow_m3_s,
                                                    std::size_t levels, std::size_t per_level) {
  const auto e = displacement_estimator::two_step;
  const std::size_t count = levels * per_level;
  if (speed_rev_s == nullptr || dp_pa == nullptr || flow_m3_s == nullptr)
    return detail::displacement_fail<T>(e, count, status::misuse);
  for (std::size_t i = 0; i < count; ++i) {
    if (!detail::all_finite(speed_rev_s[i], dp_pa[i], flow_m3_s[i]))
      return detail::displacement_fail<T>(e, count, status::nonfinite);
    if (!(speed_rev_s[i] > T(0)) || !(dp_pa[i] >= T(0)) || !(flow_m3_s[i] >= T(0)))
      return detail::displacement_fail<T>(e, count, status::domain);
  }
  if (levels < 3 || per_level < 3) return detail::displacement_fail<T>(e, count, status::insufficient_data);
  bool bad = false;
  auto level_dp = [&](std::size_t j) {
    T s = T(0);
    for (std::size_t i = 0; i < per_level; ++i) s += dp_pa[j * per_level + i];
    return s / T(static_cast<double>(per_level));
  };
  auto level_slope = [&](std::size_t j) {
    const std::size_t o = j * per_level;
    const auto f = detail::line_fit<T>(per_level, [&](std::size_t i) { return speed_rev_s[o + i]; },
                                       [&](std::size_t i) { return flow_m3_s[o + i]; });
    if (is_error(f.st)) bad = true;
    return f.slope;
  };
  const auto g = detail::line_fit<T>(levels, level_dp, level_slope);
  if (bad) return detail::displacement_fail<T>(e, count, status::insufficient_data);
  if (is_error(g.st)) return detail::displacement_fail<T>(e, count, g.st);
  if (!(g.intercept > T(0))) return detail::displacement_fail<T>(e, count, status::domain);
  const status st = (levels < 5 || per_level < 5) ? status::regime : status::ok;
  return {g.intercept, g.u_intercept, g.slope, g.u_slope, g.s_r, count, e, st};
}
/// @}

// Mixed argument types (an int literal beside doubles), promoted as Boost.Math promotes:
// one line per public template whose parameters are all scalars (promote.hpp).
PUMPLOSS_PROMOTE(flow_at_port)
PUMPLOSS_PROMOTE(flow_at_port_linear)
PUMPLOSS_PROMOTE(hydraulic_power)
PUMPLOSS_PROMOTE(motor_efficiency)
PUMPLOSS_PROMOTE(pump_efficiency)
PUMPLOSS_PROMOTE(shaft_power)
PUMPLOSS_PROMOTE(theoretical_flow)
PUMPLOSS_PROMOTE(theoretical_torque)

}  // namespace pumploss

#endif
