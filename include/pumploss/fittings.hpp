/// @file fittings.hpp
/// @brief Fitting loss coefficients: constant K (entrance, exit, a maker's value), the
/// equivalent-length method K = f_T (L/D)_eq, Hooper's 2-K and Darby's 3-K methods, a table of
/// named fitting kinds with their published constants, and the exit loss with the kinetic energy
/// factor of laminar flow.
///
/// All quantities SI. Results are engineering estimates.
#ifndef PUMPLOSS_FITTINGS_HPP
#define PUMPLOSS_FITTINGS_HPP

#include <cmath>

#include "friction.hpp"
#include "scalar_traits.hpp"
#include "status.hpp"
#include "units.hpp"

namespace pumploss {

/// @name Fitting loss coefficients
/// @{

/// Entrance loss coefficient of a sharp-edged inlet from a tank (Rennels, as the python3-fluids
/// default): K = 0.57.
inline constexpr double k_entrance_sharp = 0.57;
/// Exit loss coefficient into a tank in turbulent flow: K = 1.0 (the whole velocity head is
/// lost). In laminar flow use k_exit_kinetic() (K = 2).
inline constexpr double k_exit = 1.0;

/// Smallest Reynolds number at which a constant loss coefficient is taken as valid. Tabulated
/// constant K values hold for fully turbulent flow; below Re = 1e4 the laminar term K_1/Re of
/// Hooper's table exceeds about 20 % of K for a 90 degree elbow (K_1 = 800, K_inf = 0.25 to 0.4;
/// self-calculated from Hooper 1981), so a constant K is reported (status::regime) there.
inline constexpr double constant_k_min_reynolds = 1e4;

/// Fully turbulent friction factor f_T of clean commercial steel pipe, used by the
/// equivalent-length fitting method \f$ K = f_T (L/D)_\mathrm{eq} \f$.
///
/// \f[ f_T = f_{CW}\!\left(Re = 7.5\cdot 10^6\, D,\ \varepsilon/D = 3.4126825352925\cdot 10^{-5} D^{-1.0112}\right) \f]
/// (D in m) - the fit of python3-fluids (ft_Crane) that reproduces the rounded f_T table of
/// Crane Technical Paper 410 with the Colebrook equation.
/// @param diameter_m inside diameter, m, > 0
/// @return f_T; status::domain for D <= 0; status::regime outside 5 mm to 1 m.
/// @par Accuracy
/// Colebrook solved as friction_colebrook() (2 ulp); within 3e-6 of python3-fluids' ft_Crane,
/// which takes a single Clamond iteration (tests/line_test.cpp).
/// @par Source
/// Crane Co., Flow of Fluids Through Valves, Fittings, and Pipe, Technical Paper 410, 2009 (the
/// f_T table); fit by C. Bell in python3-fluids 1.0.22 (fluids.fittings.ft_Crane).
template <class T, detail::if_real<T> = 0>
inline result<T> friction_factor_ft(T diameter_m) {
  using std::pow;
  if (!detail::finite(diameter_m)) return detail::fail<T>(status::nonfinite);
  if (!(diameter_m > T(0))) return detail::fail<T>(status::domain);
  const T re = detail::constant<T>(7.5e6L, "7500000") * diameter_m;
  const T rr = detail::constant<T>(3.4126825352925e-5L, "0.000034126825352925") *
               pow(diameter_m, -detail::constant<T>(1.0112L, "1.0112"));
  if (!(re >= T(1000)) || rr > T(1)) return detail::fail<T>(status::out_of_validity);
  const T f = detail::colebrook_unchecked(re, rr);
  const bool in_range = diameter_m >= detail::constant<T>(0.005L, "0.005") && diameter_m <= T(1);
  return {f, in_range ? status::ok : status::regime};
}

/// Hooper's 2-K loss coefficient of a fitting: \f[ K = \frac{K_1}{Re} + K_\infty\left(1 + \frac{1}{D_\mathrm{in}}\right) \f]
/// @param k1 K_1 (laminar constant), >= 0
/// @param k_inf K_infinity, >= 0
/// @param diameter_m inside diameter, m, > 0 (D_in is the same in inches)
/// @param reynolds Reynolds number in the fitting's bore, > 0
/// @return K; status::domain for negative constants or non-positive D or Re.
/// @par Accuracy
/// Rounding only; matches python3-fluids' Hooper2K to 1e-14 (tests/line_test.cpp).
/// @par Source
/// W. B. Hooper, "The two-K method predicts head losses in pipe fittings", Chem. Eng., 24 Aug
/// 1981, 96-100; constants as tabulated in python3-fluids (fluids.fittings.Hooper).
template <class T, detail::if_real<T> = 0>
inline result<T> k_hooper(T k1, T k_inf, T diameter_m, T reynolds) {
  if (!detail::all_finite(k1, k_inf, diameter_m, reynolds)) return detail::fail<T>(status::nonfinite);
  if (!(k1 >= T(0)) || !(k_inf >= T(0)) || !(diameter_m > T(0)) || !(reynolds > T(0)))
    return detail::fail<T>(status::domain);
  return {k1 / reynolds + k_inf * (T(1) + inch_m<T>() / diameter_m), status::ok};
}

/// Darby's 3-K loss coefficient of a fitting: \f[ K = \frac{K_1}{Re} + K_i\left(1 + \frac{K_d}{D_n^{0.3}}\right) \f]
/// @param k1 K_1, >= 0
/// @param k_i K_i, >= 0
/// @param k_d K_d, >= 0
/// @param nominal_size_in nominal size D_n in inches, > 0 (for tube and hose this library uses the
///        inside diameter in inches)
/// @param reynolds Reynolds number, > 0
/// @return K; status::domain for negative constants or non-positive size or Re.
/// @par Accuracy
/// Rounding only; matches python3-fluids' Darby3K to 1e-14 (tests/line_test.cpp).
/// @par Source
/// R. Darby, "Correlate pressure drops through fittings: three constants accurately calculate
/// flow through elbows, valves and tees", Chem. Eng. 106(7) (1999) 101; R. Darby, Chemical
/// Engineering Fluid Mechanics, 2nd ed., Marcel Dekker, 2001, Table 7-3; constants as tabulated
/// in python3-fluids (fluids.fittings.Darby).
template <class T, detail::if_real<T> = 0>
inline result<T> k_darby(T k1, T k_i, T k_d, T nominal_size_in, T reynolds) {
  using std::pow;
  if (!detail::all_finite(k1, k_i, k_d, nominal_size_in, reynolds)) return detail::fail<T>(status::nonfinite);
  if (!(k1 >= T(0)) || !(k_i >= T(0)) || !(k_d >= T(0)) || !(nominal_size_in > T(0)) || !(reynolds > T(0)))
    return detail::fail<T>(status::domain);
  return {k1 / reynolds + k_i * (T(1) + k_d * pow(nominal_size_in, -detail::constant<T>(0.3L, "0.3"))),
          status::ok};
}

/// Equivalent length of a loss coefficient: \f$ L_\mathrm{eq} = K D / f \f$.
/// @param k loss coefficient, >= 0
/// @param diameter_m bore, m, > 0
/// @param f_darcy the line's Darcy friction factor, > 0
/// @return L_eq in m; status::domain for invalid input.
/// @par Accuracy
/// Rounding only.
/// @par Source
/// Definition (K = f L/D; Crane Technical Paper 410, 2009).
template <class T, detail::if_real<T> = 0>
inline result<T> equivalent_length(T k, T diameter_m, T f_darcy) {
  if (!detail::all_finite(k, diameter_m, f_darcy)) return detail::fail<T>(status::nonfinite);
  if (!(k >= T(0)) || !(diameter_m > T(0)) || !(f_darcy > T(0))) return detail::fail<T>(status::domain);
  return {k * diameter_m / f_darcy, status::ok};
}

/// Exit loss coefficient into a large tank with the kinetic energy factor of the velocity
/// profile: \f$ K = \alpha \f$, \f$ \alpha = 2 \f$ for fully developed laminar flow
/// (Re <= 2000), 1 for turbulent flow (Re >= 4000), a straight line in Re between (reported as
/// status::transition).
/// @param reynolds Reynolds number in the bore, >= 0
/// @return K; status::domain for a negative Re.
/// @par Accuracy
/// The turbulent value 1 is about 5 % low against the 1.04 to 1.1 of a real turbulent profile
/// (from memory; the usual engineering value K = 1 is kept).
/// @par Source
/// F. M. White, Fluid Mechanics, 7th ed., McGraw-Hill, 2011, Sec. 3.7 (kinetic energy correction
/// factor alpha = 2 for laminar pipe flow), from memory.
template <class T, detail::if_real<T> = 0>
inline result<T> k_exit_kinetic(T reynolds) {
  if (!detail::finite(reynolds)) return detail::fail<T>(status::nonfinite);
  if (!(reynolds >= T(0))) return detail::fail<T>(status::domain);
  const T lo = T(laminar_reynolds_limit), hi = T(turbulent_reynolds_limit);
  if (reynolds <= lo) return {T(2), status::ok};
  if (reynolds >= hi) return {T(1), status::ok};
  return {T(2) - (reynolds - lo) / (hi - lo), status::transition};
}
/// @}

/// @name Named fitting kinds
/// @{

/// A fitting kind of the published 2-K and 3-K tables.
enum class fitting_type : int {
  elbow_90_threaded = 0,      ///< 90 degree elbow, threaded, standard (r/D = 1)
  elbow_90_flanged = 1,       ///< 90 degree elbow, flanged or welded, or bend, r/D = 1
  elbow_90_long_radius = 2,   ///< 90 degree elbow, long radius (r/D = 1.5)
  bend_90_r2 = 3,             ///< 90 degree tube bend, r/D = 2 (Darby only)
  bend_90_r4 = 4,             ///< 90 degree tube bend, r/D = 4 (Darby only)
  elbow_45_threaded = 5,      ///< 45 degree elbow, threaded, standard (r/D = 1); Hooper: standard, all types
  elbow_45_long_radius = 6,   ///< 45 degree elbow, long radius (r/D = 1.5)
  bend_180_r15 = 7,           ///< 180 degree return bend, r/D = 1.5
  tee_run_threaded = 8,       ///< tee, flow straight through the run, threaded
  tee_branch_threaded = 9,    ///< tee, flow through the branch (used as an elbow), threaded
  ball_valve_full_bore = 10,  ///< ball valve, full bore (beta = 1) (Darby only)
  swing_check = 11,           ///< swing check valve
  lift_check = 12             ///< lift check valve
};

/// Number of fitting_type values.
inline constexpr int fitting_type_count = 13;

/// How a named fitting's K is computed.
enum class fitting_method : int {
  darby_3k = 0,  ///< Darby's 3-K method (the default: fitted over a wider range of sizes)
  hooper_2k = 1  ///< Hooper's 2-K method (where Hooper tabulated the kind)
};

/// Published constants of a named fitting kind. A method the source did not tabulate has
/// negative constants.
struct fitting_constants {
  const char* name;     ///< short name used in input files, e.g. "elbow_90_long_radius"
  double hooper_k1;     ///< Hooper K_1 (negative: not tabulated)
  double hooper_k_inf;  ///< Hooper K_infinity
  double darby_k1;      ///< Darby K_1
  double darby_k_i;     ///< Darby K_i
  double darby_k_d;     ///< Darby K_d
};

/// Constants of the named fitting kinds, indexed by fitting_type. Hooper: Chem. Eng. 24 Aug
/// 1981, 96-100, Table 1; Darby: Chemical Engineering Fluid Mechanics, 2nd ed., 2001, Table 7-3;
/// both as tabulated in python3-fluids 1.0.22 (fluids.fittings.Hooper, fluids.fittings.Darby;
/// tests/reference/friction/fluids_named_fittings.ipp checks every entry).
inline constexpr fitting_constants fitting_table[fitting_type_count] = {
    {"elbow_90_threaded", 800.0, 0.4, 800.0, 0.14, 4.0},
    {"elbow_90_flanged", 800.0, 0.25, 800.0, 0.091, 4.0},
    {"elbow_90_long_radius", 800.0, 0.2, 800.0, 0.071, 4.2},
    {"bend_90_r2", -1.0, -1.0, 800.0, 0.056, 3.9},
    {"bend_90_r4", -1.0, -1.0, 800.0, 0.066, 3.9},
    {"elbow_45_threaded", 500.0, 0.2, 500.0, 0.071, 4.2},
    {"elbow_45_long_radius", 500.0, 0.15, 500.0, 0.052, 4.0},
    {"bend_180_r15", 1000.0, 0.3, 1000.0, 0.1, 4.0},
    {"tee_run_threaded", 200.0, 0.1, 200.0, 0.091, 4.0},
    {"tee_branch_threaded", 500.0, 0.7, 500.0, 0.274, 4.0},
    {"ball_valve_full_bore", -1.0, -1.0, 300.0, 0.017, 3.5},
    {"swing_check", 1500.0, 1.5, 1500.0, 0.46, 4.0},
    {"lift_check", 2000.0, 10.0, 2000.0, 2.85, 3.8}};

/// Loss coefficient of a named fitting kind at a Reynolds number.
/// @param type the kind
/// @param method Darby 3-K (default) or Hooper 2-K
/// @param diameter_m bore, m, > 0 (Darby's nominal size is taken as the bore in inches)
/// @param reynolds Reynolds number in the bore, > 0
/// @return K as k_darby() or k_hooper(); status::domain for an unknown kind or a method the
///         source did not tabulate for it.
/// @par Accuracy
/// As k_darby() and k_hooper(); the published constants reproduce measured K within about 10 to
/// 20 % (Darby 2001, from memory).
/// @par Source
/// As fitting_table.
template <class T>
inline result<T> k_fitting(fitting_type type, fitting_method method, T diameter_m, T reynolds) {
  const int i = static_cast<int>(type);
  if (i < 0 || i >= fitting_type_count) return detail::fail<T>(status::domain);
  const auto& c = fitting_table[i];
  if (method == fitting_method::hooper_2k) {
    if (!(c.hooper_k1 >= 0)) return detail::fail<T>(status::domain);
    return k_hooper(T(c.hooper_k1), T(c.hooper_k_inf), diameter_m, reynolds);
  }
  if (method != fitting_method::darby_3k) return detail::fail<T>(status::domain);
  if (!detail::finite(diameter_m)) return detail::fail<T>(status::nonfinite);
  if (!(diameter_m > T(0))) return detail::fail<T>(status::domain);
  return k_darby(T(c.darby_k1), T(c.darby_k_i), T(c.darby_k_d), diameter_m / inch_m<T>(), reynolds);
}
/// @}

// Mixed argument types (an int literal beside doubles), promoted as Boost.Math promotes:
// one line per public template whose parameters are all scalars (promote.hpp).
PUMPLOSS_PROMOTE(friction_factor_ft)
PUMPLOSS_PROMOTE(equivalent_length)
PUMPLOSS_PROMOTE(k_darby)
PUMPLOSS_PROMOTE(k_hooper)
PUMPLOSS_PROMOTE(k_exit_kinetic)

}  // namespace pumploss

#endif
