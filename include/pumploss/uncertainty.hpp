/// @file uncertainty.hpp
/// @brief Measurement uncertainty of efficiencies and powers by the GUM law of propagation
/// (JCGM 100:2008, first order), with sensitivities from dual numbers through the same templates.
///
/// The user states each instrument's uncertainty (absolute or per cent of reading; rectangular
/// limits, a standard uncertainty or an expanded one). No accuracy-class presets are shipped: the
/// ISO 4409 class table is not confirmed from a source at hand (so none is shipped).
#ifndef PUMPLOSS_UNCERTAINTY_HPP
#define PUMPLOSS_UNCERTAINTY_HPP

#include <cmath>
#include <cstddef>

#include "dual.hpp"
#include "efficiency.hpp"
#include "scalar_traits.hpp"
#include "status.hpp"

namespace pumploss {

/// How an instrument's uncertainty figure is stated.
enum class uncertainty_basis : int {
  absolute = 0,           ///< in the unit of the reading (SI)
  percent_of_reading = 1  ///< per cent of the reading
};

/// What the figure means statistically.
enum class uncertainty_distribution : int {
  standard = 0,     ///< already a standard uncertainty u
  rectangular = 1,  ///< limits +/- a with no distribution given: u = a / sqrt(3) (GUM 4.3.7)
  expanded_k2 = 2   ///< an expanded uncertainty U with k = 2: u = U / 2
};

/// Standard uncertainty of one reading from an instrument's stated figure.
///
/// \f[ u = \frac{a}{\sqrt{3}} \;\text{(rectangular)},\quad u = \frac{U}{2}\;(k = 2),\quad
///     a = \mathrm{figure}\cdot|x|/100 \;\text{(per cent of reading)} \f]
///
/// @param figure the stated figure (absolute in SI, or per cent), >= 0
/// @param basis absolute or per cent of reading
/// @param dist standard, rectangular limits or expanded (k = 2)
/// @param reading the reading x (SI), used for per cent of reading
/// @return u in the unit of the reading; status::domain for a negative figure; status::nonfinite.
/// @par Accuracy
/// Within 2 ulp.
/// @par Source
/// JCGM 100:2008 (GUM), 4.3.7 (rectangular distribution) and 6.2 (expanded uncertainty).
template <class T>
inline result<T> standard_uncertainty(T figure, uncertainty_basis basis, uncertainty_distribution dist, T reading) {
  using std::fabs;
  using std::sqrt;
  if (!detail::all_finite(figure, reading)) return detail::fail<T>(status::nonfinite);
  if (!(figure >= T(0))) return detail::fail<T>(status::domain);
  T a = basis == uncertainty_basis::percent_of_reading ? figure * fabs(reading) / T(100) : figure;
  switch (dist) {
    case uncertainty_distribution::rectangular: a = a / sqrt(T(3)); break;
    case uncertainty_distribution::expanded_k2: a = a / T(2); break;
    case uncertainty_distribution::standard: break;
  }
  return {a, status::ok};
}

/// Standard uncertainty of a pressure difference from two transducers:
/// \f[ u^2(\Delta p) = u^2(p_2) + u^2(p_1) - 2 r\, u(p_1) u(p_2) \f]
/// @param u_p1_pa standard uncertainty of p_1, Pa, >= 0
/// @param u_p2_pa standard uncertainty of p_2, Pa, >= 0
/// @param r12 correlation coefficient of the two readings, [-1, 1] (0 for independent transducers)
/// @return u(dp) in Pa; status::domain for negative uncertainties or |r| > 1.
/// @par Accuracy
/// Within a few ulp (cancellation only when r = 1 and u_p1 = u_p2, where the result is 0).
/// @par Source
/// JCGM 100:2008, 5.2.2 Eq. (13).
template <class T, detail::if_real<T> = 0>
inline result<T> pressure_difference_uncertainty(T u_p1_pa, T u_p2_pa, T r12) {
  using std::sqrt;
  if (!detail::all_finite(u_p1_pa, u_p2_pa, r12)) return detail::fail<T>(status::nonfinite);
  if (!(u_p1_pa >= T(0)) || !(u_p2_pa >= T(0)) || !(r12 >= T(-1)) || !(r12 <= T(1)))
    return detail::fail<T>(status::domain);
  T v = u_p1_pa * u_p1_pa + u_p2_pa * u_p2_pa - 2 * r12 * u_p1_pa * u_p2_pa;
  if (v < T(0)) v = T(0);
  return {sqrt(v), status::ok};
}

/// One output quantity with its GUM uncertainty.
template <class T>
struct gum_value {
  T value;    ///< the estimate y
  T u;        ///< combined standard uncertainty u_c(y)
  T U;        ///< expanded uncertainty k u_c(y), k = 2
  T c[5];     ///< sensitivity coefficients dy/dx_i for x = (V_i, n, dp, q, T)
};

/// Efficiencies and powers of one operating point with their GUM uncertainties.
template <class T>
struct [[nodiscard]] efficiency_uncertainty {
  gum_value<T> eta_v;   ///< volumetric efficiency
  gum_value<T> eta_hm;  ///< hydromechanical efficiency
  gum_value<T> eta_t;   ///< overall efficiency
  gum_value<T> p_hyd;   ///< hydraulic power, W
  gum_value<T> p_mech;  ///< shaft power, W
  status st;            ///< the efficiency status (ok, implausible) or an error
  /// @return true when the status is exactly ok.
  bool ok() const noexcept { return st == pumploss::status::ok; }
  /// @return true when the results are usable (ok or a report such as regime).
  bool usable() const noexcept { return pumploss::is_usable(st); }
};

/// Inputs of efficiency_gum(): the five readings and their standard uncertainties.
template <class T>
struct efficiency_inputs {
  T displacement_m3_rev;  ///< V_i, m^3/rev
  T speed_rev_s;          ///< n, rev/s
  T dp_pa;                ///< pressure difference, Pa
  T flow_m3_s;            ///< pump outlet or motor inlet flow, m^3/s
  T torque_n_m;           ///< torque, N m
  T u_displacement;       ///< standard uncertainty of V_i, m^3/rev
  T u_speed;              ///< standard uncertainty of n, rev/s
  T u_dp;                 ///< standard uncertainty of dp, Pa
  T u_flow;               ///< standard uncertainty of the flow, m^3/s
  T u_torque;             ///< standard uncertainty of the torque, N m
  T r_flow_displacement;  ///< correlation of flow and V_i, [-1, 1]: near 1 when V_i came from the same flow meter
};

/// GUM first-order uncertainty of every efficiency and power of a pump or motor point.
///
/// \f[ u_c^2(y) = \sum_i c_i^2 u^2(x_i) + 2 c_q c_V\, r_{qV}\, u(q) u(V_i),\qquad
///     c_i = \frac{\partial y}{\partial x_i},\qquad U = 2 u_c \f]
///
/// The sensitivities c_i are exact derivatives of pump_efficiency() / motor_efficiency(),
/// evaluated with pumploss::dual<T, 5>. For \f$ \eta_t = q\Delta p/(2\pi n T) \f$ (uncorrelated)
/// this is \f$ (u/\eta_t)^2 = (u_{\Delta p}/\Delta p)^2 + (u_q/q)^2 + (u_n/n)^2 + (u_T/T)^2 \f$.
///
/// @param kind machine::pump or machine::motor
/// @param x the readings, their standard uncertainties (>= 0) and the flow/V_i correlation
/// @return values, standard and expanded (k = 2) uncertainties and sensitivities; the status of
///         the efficiency calculation (implausible kept); status::domain for a negative
///         uncertainty or |r| > 1.
/// @par Validity
/// First order: adequate while every relative uncertainty is small (a few per cent); check larger
/// ones by Monte Carlo (JCGM 101:2008).
/// @par Accuracy
/// Equals the analytic propagation to 1e-15 relative; agrees with a 20 000-draw Monte Carlo
/// within its sampling error (tests/uncertainty_test.cpp).
/// @par Source
/// JCGM 100:2008, 5.1.2 Eq. (10) and 5.2.2 Eq. (13); check value: tests/reference/SOURCES.md methods13_row19 (self-calculated).
template <class T>
inline efficiency_uncertainty<T> efficiency_gum(machine kind, const efficiency_inputs<T>& x) {
  using std::sqrt;
  using D = dual<T, 5>;
  efficiency_uncertainty<T> r{};
  const T nan = scalar_traits<T>::nan();
  auto blank = [&](gum_value<T>& g) {
    g.value = g.u = g.U = nan;
    for (auto& c : g.c) c = nan;
  };
  for (auto* g : {&r.eta_v, &r.eta_hm, &r.eta_t, &r.p_hyd, &r.p_mech}) blank(*g);
  const T u[5] = {x.u_displacement, x.u_speed, x.u_dp, x.u_flow, x.u_torque};
  if (!detail::all_finite(u[0], u[1], u[2], u[3], u[4], x.r_flow_displacement)) {
    r.st = status::nonfinite;
    return r;
  }
  for (const T& ui : u)
    if (!(ui >= T(0))) {
      r.st = status::domain;
      return r;
    }
  if (!(x.r_flow_displacement >= T(-1)) || !(x.r_flow_displacement <= T(1))) {
    r.st = status::domain;
    return r;
  }
  const auto e = machine_efficiency(kind, D::variable(x.displacement_m3_rev, 0), D::variable(x.speed_rev_s, 1),
                                    D::variable(x.dp_pa, 2), D::variable(x.flow_m3_s, 3),
                                    D::variable(x.torque_n_m, 4));
  r.st = e.st;
  if (is_error(e.st)) return r;
  auto fill = [&](gum_value<T>& g, const D& y) {
    T v = T(0);
    for (std::size_t i = 0; i < 5; ++i) {
      g.c[i] = y.d[i];
      v += y.d[i] * y.d[i] * u[i] * u[i];
    }
    v += 2 * y.d[3] * y.d[0] * x.r_flow_displacement * u[3] * u[0];
    if (v < T(0)) v = T(0);
    g.value = y.val;
    g.u = sqrt(v);
    g.U = 2 * g.u;
  };
  fill(r.eta_v, e.eta_v);
  fill(r.eta_hm, e.eta_hm);
  fill(r.eta_t, e.eta_t);
  fill(r.p_hyd, e.p_hyd);
  fill(r.p_mech, e.p_mech);
  return r;
}

// Mixed argument types (an int literal beside doubles), promoted as Boost.Math promotes:
// one line per public template whose parameters are all scalars (promote.hpp).
PUMPLOSS_PROMOTE(pressure_difference_uncertainty)

}  // namespace pumploss

#endif
