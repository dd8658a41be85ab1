/// @file inlet.hpp
/// @brief The pump's inlet at a cold start and the case against the shaft seal: the absolute
/// pressure at the pump's inlet port through a suction line (the line model of line.hpp) at cold
/// viscosity against the maker's minimum, the lowest oil temperature at which it passes, and the
/// case pressure against the shaft seal's continuous and peak ratings. Theory: @ref theory_flow_test.
///
/// SI: pressure in Pa (absolute for the inlet, gauge for the case), flow in m^3/s, T in K.
#ifndef PUMPLOSS_INLET_HPP
#define PUMPLOSS_INLET_HPP

#include <cmath>
#include <cstddef>

#include "fluid.hpp"
#include "line.hpp"
#include "promote.hpp"
#include "scalar_traits.hpp"
#include "status.hpp"

namespace pumploss {

/// Result of the inlet check at one temperature.
template <class T>
struct [[nodiscard]] inlet_point {
  T t_k;              ///< oil temperature, K
  T nu_m2_s;          ///< kinematic viscosity at t_k, m^2/s
  T inlet_pa;         ///< absolute static pressure at the pump's inlet port, Pa
  T margin_pa;        ///< inlet pressure minus the maker's minimum, Pa (>= 0 passes)
  bool pass;          ///< margin >= 0
  pumploss::status st;///< status at this temperature
  /// @return true when the status is exactly ok.
  bool ok() const noexcept { return st == pumploss::status::ok; }
  /// @return true when the results are usable (ok or a report such as regime).
  bool usable() const noexcept { return pumploss::is_usable(st); }
};

/// Absolute pressure at a pump's inlet port at one oil temperature (Bernoulli from the oil at
/// rest in the tank along the suction line):
///
/// \f[ p_{in} = p_{tank} - \Delta p_{line}(q, \rho(\theta), \mu(\theta)) - \frac{\rho v^2}{2},
///     \qquad v = \frac{4 q}{\pi d_{last}^2} \f]
/// where \f$\Delta p_{line}\f$ includes friction, fittings (the tank outlet's entrance loss is
/// one of them), components and the static part \f$\rho g z\f$ (z: height of the pump's inlet
/// above the oil level, negative for a flooded inlet), from line_pressure_drop_at().
///
/// @param elements the suction line's elements from the tank (first) to the pump's inlet port
///        (last; its bore sets the velocity head)
/// @param count number of elements (>= 1)
/// @param height_m height of the pump's inlet port above the oil level, m (negative: flooded)
/// @param o the oil
/// @param q_m3_s suction flow, m^3/s (>= 0; the pump's displacement times speed)
/// @param t_k oil temperature, K
/// @param p_tank_abs_pa absolute pressure over the oil in the tank, Pa (> 0; 101325 vented)
/// @param p_min_abs_pa the maker's minimum absolute inlet pressure, Pa (> 0)
/// @return the point; status::domain for an empty line or bad values; status::out_of_validity
///         when the computed pressure is not positive (the line cannot deliver that flow: the
///         oil column breaks; the value is still returned with pass = false); oil and line statuses.
/// @par Validity
/// Steady, isothermal, incompressible, no air release (below the oil's air release pressure the
/// real inlet pressure is lower than computed). Engineering estimate: the maker's inlet limits
/// (minimum pressure, maximum cold-start viscosity) govern.
/// @par Accuracy
/// As line_pressure_drop() (tests/inlet_motor_test.cpp checks a laminar pipe by Hagen-Poiseuille).
/// @par Source
/// Bernoulli with losses along a suction line (e.g. F. M. White, Fluid Mechanics, 7th ed.,
/// McGraw-Hill 2011, section 6.9 (from memory)); line model of line.hpp.
template <class T>
inline inlet_point<T> inlet_check(const line_element<T>* elements, std::size_t count, T height_m, const oil<T>& o,
                                  T q_m3_s, T t_k, T p_tank_abs_pa, T p_min_abs_pa) {
  const T nan = scalar_traits<T>::nan();
  auto fail = [&](status s) { return inlet_point<T>{nan, nan, nan, nan, false, s}; };
  if (!detail::all_finite(q_m3_s, t_k, p_tank_abs_pa, p_min_abs_pa, height_m)) return fail(status::nonfinite);
  if (elements == nullptr || count == 0 || !(q_m3_s >= T(0)) || !(t_k > T(0)) || !(p_tank_abs_pa > T(0)) ||
      !(p_min_abs_pa > T(0)))
    return fail(status::domain);
  const auto nu = oil_kinematic_viscosity(o, t_k);
  if (is_error(nu.st)) return fail(nu.st);
  const auto rho = oil_density_at(o, t_k, T(0));
  if (is_error(rho.st)) return fail(rho.st);
  const auto mu = oil_dynamic_viscosity(o, t_k, T(0));
  if (is_error(mu.st)) return fail(mu.st);
  const auto drop = line_pressure_drop(elements, count, height_m, q_m3_s, rho.value, mu.value);
  if (is_error(drop.st)) return fail(drop.st);
  const T d = elements[count - 1].diameter_m;
  if (!(d > T(0))) return fail(status::domain);
  const T v = 4 * q_m3_s / (detail::pi<T>() * d * d);
  const T p = p_tank_abs_pa - drop.dp_pa - rho.value * v * v / 2;
  status st = worst(drop.st, worst(nu.st, worst(rho.st, mu.st)));
  if (!(p > T(0))) st = status::out_of_validity;
  const T margin = p - p_min_abs_pa;
  return {t_k, nu.value, p, margin, margin >= T(0) && p > T(0), st};
}

/// The inlet check of a line object (see the element-array overload, which allocates nothing).
/// @param l the suction line from the tank to the pump's inlet port; height_m is the port's
///        height above the oil level
/// @param o the oil
/// @param q_m3_s suction flow, m^3/s
/// @param t_k oil temperature, K
/// @param p_tank_abs_pa absolute pressure over the oil, Pa
/// @param p_min_abs_pa the maker's minimum absolute inlet pressure, Pa
/// @return as the element-array overload.
template <class T>
inline inlet_point<T> inlet_check(const line<T>& l, const oil<T>& o, T q_m3_s, T t_k, T p_tank_abs_pa,
                                  T p_min_abs_pa) {
  return inlet_check(l.elements.data(), l.elements.size(), l.height_m, o, q_m3_s, t_k, p_tank_abs_pa, p_min_abs_pa);
}

/// Lowest oil temperature at which the inlet passes (inlet pressure equal to the maker's minimum),
/// by bisection on the temperature between t_lo_k and t_hi_k (the inlet pressure rises as the oil
/// warms and thins).
///
/// @param elements the suction line's elements (as inlet_check())
/// @param count number of elements
/// @param height_m height of the pump's inlet port above the oil level, m
/// @param o the oil
/// @param q_m3_s suction flow, m^3/s
/// @param p_tank_abs_pa absolute tank pressure, Pa
/// @param p_min_abs_pa the maker's minimum absolute inlet pressure, Pa
/// @param t_lo_k lower end of the search, K (> 0)
/// @param t_hi_k upper end, K (> t_lo_k)
/// @return the temperature in K (t_lo_k itself when the inlet passes there, status::ok);
///         status::out_of_validity when it does not pass even at t_hi_k; errors of inlet_check().
/// @par Validity
/// As inlet_check(); the inlet pressure must rise with temperature over the range (true for
/// laminar and turbulent friction with a falling viscosity).
/// @par Accuracy
/// Bisection to 1e-6 K.
/// @par Source
/// Root of inlet_check() in temperature.
template <class T>
inline result<T> inlet_min_temperature(const line_element<T>* elements, std::size_t count, T height_m,
                                       const oil<T>& o, T q_m3_s, T p_tank_abs_pa, T p_min_abs_pa, T t_lo_k,
                                       T t_hi_k) {
  auto check = [&](T t) { return inlet_check(elements, count, height_m, o, q_m3_s, t, p_tank_abs_pa, p_min_abs_pa); };
  if (!detail::all_finite(t_lo_k, t_hi_k)) return detail::fail<T>(status::nonfinite);
  if (!(t_lo_k > T(0)) || !(t_hi_k > t_lo_k)) return detail::fail<T>(status::domain);
  const auto lo = check(t_lo_k);
  if (is_error(lo.st) && lo.st != status::out_of_validity) return detail::fail<T>(lo.st);
  if (lo.pass) return {t_lo_k, status::ok};
  const auto hi = check(t_hi_k);
  if (is_error(hi.st) && hi.st != status::out_of_validity) return detail::fail<T>(hi.st);
  if (!hi.pass) return detail::fail<T>(status::out_of_validity);
  T a = t_lo_k, b = t_hi_k;
  status st = hi.st;
  for (int it = 0; it < 200 && b - a > detail::constant<T>(1e-6L, "1e-6"); ++it) {
    const T m = (a + b) / 2;
    const auto r = check(m);
    if (is_error(r.st) && r.st != status::out_of_validity) return detail::fail<T>(r.st);
    if (r.pass) {
      b = m;
      st = r.st;
    } else {
      a = m;
    }
  }
  return {b, st};
}

/// The lowest start temperature of a line object (see the element-array overload).
/// @param l the suction line
/// @param o the oil
/// @param q_m3_s suction flow, m^3/s
/// @param p_tank_abs_pa absolute tank pressure, Pa
/// @param p_min_abs_pa the maker's minimum absolute inlet pressure, Pa
/// @param t_lo_k lower end of the search, K
/// @param t_hi_k upper end, K
/// @return as the element-array overload.
template <class T>
inline result<T> inlet_min_temperature(const line<T>& l, const oil<T>& o, T q_m3_s, T p_tank_abs_pa, T p_min_abs_pa,
                                       T t_lo_k, T t_hi_k) {
  return inlet_min_temperature(l.elements.data(), l.elements.size(), l.height_m, o, q_m3_s, p_tank_abs_pa,
                               p_min_abs_pa, t_lo_k, t_hi_k);
}

/// Result of the case pressure check against the shaft seal.
template <class T>
struct [[nodiscard]] shaft_seal_result {
  T margin_continuous_pa;  ///< continuous rating minus continuous case pressure, Pa
  T margin_peak_pa;        ///< peak rating minus peak case pressure, Pa
  bool pass_continuous;    ///< margin_continuous >= 0
  bool pass_peak;          ///< margin_peak >= 0
  pumploss::status st;     ///< ok; implausible when the peak case pressure is below the continuous one; errors
  /// @return true when the status is exactly ok.
  bool ok() const noexcept { return st == pumploss::status::ok; }
  /// @return true when the results are usable (ok or a report such as regime).
  bool usable() const noexcept { return pumploss::is_usable(st); }
};

/// Case pressure against the shaft seal's ratings (gauge, against atmosphere outside the seal):
/// continuous (steady running: tank pressure plus the drain line's drop, drain_check() in
/// line.hpp) and peak (short events: destroke, cold start, pressure spikes).
///
/// \f[ m_c = p_{seal,c} - p_{case,c}, \qquad m_p = p_{seal,p} - p_{case,p} \f]
///
/// @param case_continuous_pa continuous case pressure, Pa gauge
/// @param case_peak_pa peak case pressure, Pa gauge (>= continuous)
/// @param seal_continuous_pa the maker's continuous case (shaft seal) rating, Pa gauge (> 0)
/// @param seal_peak_pa the maker's peak rating, Pa gauge (>= continuous rating)
/// @return margins and passes; status::implausible when the peak case pressure is below the
///         continuous one; status::domain for bad ratings; status::nonfinite.
/// @par Validity
/// A blocked or undersized drain raises the case pressure until the shaft seal blows out:
/// the maker's maximum case pressure governs, and some makers rate the seal lower at high
/// speed. Engineering estimate.
/// @par Source
/// Comparison with the maker's rating; that makers set a maximum case pressure is common
/// practice, no source.
template <class T, detail::if_real<T> = 0>
inline shaft_seal_result<T> shaft_seal_check(T case_continuous_pa, T case_peak_pa, T seal_continuous_pa,
                                             T seal_peak_pa) {
  const T nan = scalar_traits<T>::nan();
  if (!detail::all_finite(case_continuous_pa, case_peak_pa, seal_continuous_pa, seal_peak_pa))
    return {nan, nan, false, false, status::nonfinite};
  if (!(seal_continuous_pa > T(0)) || !(seal_peak_pa >= seal_continuous_pa)) return {nan, nan, false, false, status::domain};
  const T mc = seal_continuous_pa - case_continuous_pa;
  const T mp = seal_peak_pa - case_peak_pa;
  return {mc, mp, mc >= T(0), mp >= T(0), case_peak_pa < case_continuous_pa ? status::implausible : status::ok};
}

// Mixed argument types (an int literal beside doubles), promoted as Boost.Math promotes:
// one line per public template whose parameters are all scalars (promote.hpp).
PUMPLOSS_PROMOTE(shaft_seal_check)

}  // namespace pumploss

#endif
