/// @file fluid.hpp
/// @brief Hydraulic oil properties: ASTM D341 viscosity-temperature, ISO 3448 grades, ASTM D2161
/// Saybolt seconds, density with temperature and pressure, Barus pressure-viscosity, and a
/// typical mineral oil property set.
///
/// All quantities SI: kinematic viscosity nu in m^2/s, dynamic viscosity mu in Pa s, temperature
/// in K, pressure in Pa (gauge, relative to the reference state), density in kg/m^3.
#ifndef PUMPLOSS_FLUID_HPP
#define PUMPLOSS_FLUID_HPP

#include <cmath>

#include "export.hpp"
#include "detail/roots.hpp"
#include "scalar_traits.hpp"
#include "status.hpp"
#include "units.hpp"

namespace pumploss {

/// @name ASTM D341 viscosity-temperature relation
/// @{

/// ASTM D341 transform variable Z of a kinematic viscosity given in mm^2/s.
///
/// \f[ Z = \nu + 0.7 \quad (\nu \ge 2.0), \qquad
///     Z = \nu + 0.7 + e^{-1.47 - 1.84\nu - 0.51\nu^2} \quad (\nu < 2.0) \f]
///
/// @param nu_mm2_s kinematic viscosity in mm^2/s (cSt), > 0
/// @return Z (dimensionless)
/// @par Validity
/// The low-viscosity term extends the relation below 2 mm^2/s; the two branches differ by
/// 7.5e-4 in Z (0.03 %) at 2 mm^2/s, as in the standard. Z must exceed 1 for the double
/// logarithm, which holds for nu above about 0.2 mm^2/s.
/// @par Source
/// ASTM D341, "Standard Practice for Viscosity-Temperature Equations and Charts for Liquid
/// Petroleum or Hydrocarbon Products" (form with the low-viscosity term).
template <class T, detail::if_real<T> = 0>
inline T d341_z(T nu_mm2_s) {
  using std::exp;
  T z = nu_mm2_s + detail::constant<T>(0.7L, "0.7");
  if (nu_mm2_s < T(2)) {
    z += exp(-detail::constant<T>(1.47L, "1.47") - detail::constant<T>(1.84L, "1.84") * nu_mm2_s -
             detail::constant<T>(0.51L, "0.51") * nu_mm2_s * nu_mm2_s);
  }
  return z;
}

/// Inverse of d341_z(): kinematic viscosity in mm^2/s from Z.
///
/// \f[ \nu = Z - 0.7 \quad (Z - 0.7 \ge 2.0), \qquad
///     \nu = (Z-0.7) - e^{-0.7487 - 3.295 (Z-0.7) + 0.6119 (Z-0.7)^2 - 0.3193 (Z-0.7)^3} \f]
///
/// @param z the D341 variable Z (> 1)
/// @return kinematic viscosity in mm^2/s
/// @par Validity
/// The low-viscosity inverse is the standard's own approximation, not the exact inverse of
/// d341_z(); the round trip differs by up to about 1e-3 mm^2/s below 2 mm^2/s.
/// @par Source
/// ASTM D341 (docs/pages/theory_fluid.md).
template <class T, detail::if_real<T> = 0>
inline T d341_nu_from_z(T z) {
  using std::exp;
  const T x = z - detail::constant<T>(0.7L, "0.7");
  if (x >= T(2)) return x;
  return x - exp(-detail::constant<T>(0.7487L, "0.7487") - detail::constant<T>(3.295L, "3.295") * x +
                 detail::constant<T>(0.6119L, "0.6119") * x * x -
                 detail::constant<T>(0.3193L, "0.3193") * x * x * x);
}

/// Constants of the ASTM D341 line \f$\log_{10}\log_{10} Z = A - B \log_{10} T\f$ (T in K).
template <class T>
struct d341_line {
  T a;  ///< A (dimensionless)
  T b;  ///< B (dimensionless, positive for a real oil)
};

namespace detail {
template <class T>
inline T log10_log10(T z) {
  using std::log;
  return log(log(z) / ln10<T>()) / ln10<T>();
}
/// Shared argument checks of the D341 two-point functions.
template <class T>
inline status d341_check(T t1_k, T nu1_m2_s, T t2_k, T nu2_m2_s) {
  if (!all_finite(t1_k, nu1_m2_s, t2_k, nu2_m2_s)) return status::nonfinite;
  if (!(t1_k > T(0)) || !(t2_k > T(0)) || !(nu1_m2_s > T(0)) || !(nu2_m2_s > T(0)))
    return status::domain;
  if (t1_k == t2_k) return status::domain;
  return status::ok;
}
}  // namespace detail

/// Fit the ASTM D341 line through two (temperature, kinematic viscosity) points.
///
/// \f[ B = \frac{\log_{10}\log_{10} Z_1 - \log_{10}\log_{10} Z_2}{\log_{10} T_2 - \log_{10} T_1},
///     \qquad A = \log_{10}\log_{10} Z_1 + B \log_{10} T_1 \f]
///
/// @param t1_k     temperature of point 1 in K, > 0
/// @param nu1_m2_s kinematic viscosity at t1 in m^2/s, > 0
/// @param t2_k     temperature of point 2 in K, > 0 and != t1
/// @param nu2_m2_s kinematic viscosity at t2 in m^2/s, > 0
/// @return A and B; status::domain when a value is not positive, the temperatures are equal,
///         a viscosity is too low for the relation (Z <= 1), or viscosity does not fall with
///         temperature (B <= 0); status::nonfinite for NaN/inf.
/// @par Source
/// ASTM D341 (docs/pages/theory_fluid.md). Check: 32 mm^2/s at 40 degC and 5.4 mm^2/s at 100 degC give
/// A = 9.5259, B = 3.7449 with T = theta + 273 (published worked example).
template <class T, detail::if_real<T> = 0>
inline result<d341_line<T>> d341_fit(T t1_k, T nu1_m2_s, T t2_k, T nu2_m2_s) {
  using std::log;
  const T nan = scalar_traits<T>::nan();
  const status s = detail::d341_check(t1_k, nu1_m2_s, t2_k, nu2_m2_s);
  if (is_error(s)) return {{nan, nan}, s};
  const T mm2 = detail::constant<T>(1e6L, "1000000");
  const T z1 = d341_z(nu1_m2_s * mm2);
  const T z2 = d341_z(nu2_m2_s * mm2);
  if (!detail::all_finite(z1, z2)) return {{nan, nan}, status::overflow};
  if (!(z1 > T(1)) || !(z2 > T(1))) return {{nan, nan}, status::domain};
  const T l1 = detail::log10_log10(z1);
  const T l2 = detail::log10_log10(z2);
  const T lt1 = log(t1_k) / detail::ln10<T>();
  const T lt2 = log(t2_k) / detail::ln10<T>();
  const T b = (l1 - l2) / (lt2 - lt1);
  if (!(b > T(0))) return {{nan, nan}, status::domain};
  const T a = l1 + b * lt1;
  if (!detail::all_finite(a, b)) return {{nan, nan}, status::overflow};
  return {{a, b}, status::ok};
}

/// Kinematic viscosity at temperature t from a D341 line.
///
/// \f[ Z = 10^{10^{A - B\log_{10} T}}, \qquad \nu = \nu(Z) \f] (see d341_nu_from_z()).
///
/// @param line A and B from d341_fit()
/// @param t_k  temperature in K, > 0
/// @return nu in m^2/s; status::regime when the result is below 0.2 mm^2/s, where the
///         low-viscosity form is no longer defined (threshold from memory);
///         status::overflow when Z overflows (very cold).
/// @par Source
/// ASTM D341 (docs/pages/theory_fluid.md).
template <class T>
inline result<T> d341_viscosity(const d341_line<T>& line, T t_k) {
  using std::log;
  using std::pow;
  if (!detail::all_finite(line.a, line.b, t_k)) return detail::fail<T>(status::nonfinite);
  if (!(t_k > T(0)) || !(line.b > T(0))) return detail::fail<T>(status::domain);
  const T ten = T(10);
  const T ll = line.a - line.b * log(t_k) / detail::ln10<T>();
  const T z = pow(ten, pow(ten, ll));
  if (!detail::finite(z)) return detail::fail<T>(status::overflow);
  const T nu_mm2 = d341_nu_from_z(z);
  const T nu = nu_mm2 / detail::constant<T>(1e6L, "1000000");
  if (!(nu_mm2 > T(0))) return detail::fail<T>(status::out_of_validity);
  if (nu_mm2 < detail::constant<T>(0.2L, "0.2")) return {nu, status::regime};
  return {nu, status::ok};
}

/// Temperature at which an oil reaches a stated kinematic viscosity: the inverse of
/// d341_viscosity() on the same D341 line, in closed form.
///
/// \f[ T = 10^{(A - \log_{10}\log_{10} Z(\nu))/B} \f] with Z from d341_z().
///
/// Used for the lowest start temperature at which an oil meets a maker's largest start
/// viscosity.
/// @param line A and B from d341_fit(), B > 0
/// @param nu_m2_s kinematic viscosity, m^2/s, > 0 with Z > 1 (above about 0.2 mm^2/s)
/// @return T in K; status::domain for B <= 0, nu <= 0 or Z <= 1; status::overflow when T
///         overflows.
/// @par Accuracy
/// Within 1e-14 relative of the 50-digit evaluation; d341_viscosity() at the result returns nu
/// within 1e-12 relative (viscosities from 2.5 mm^2/s; tests/line_test.cpp, FluidD341Temperature).
/// @par Source
/// ASTM D341-20, Standard Practice for Viscosity-Temperature Equations and Charts for Liquid
/// Petroleum or Hydrocarbon Products, Eq. (1) solved for T.
template <class T>
inline result<T> d341_temperature(const d341_line<T>& line, T nu_m2_s) {
  using std::log;
  using std::pow;
  if (!detail::all_finite(line.a, line.b, nu_m2_s)) return detail::fail<T>(status::nonfinite);
  if (!(line.b > T(0)) || !(nu_m2_s > T(0))) return detail::fail<T>(status::domain);
  const T z = d341_z(nu_m2_s * detail::constant<T>(1e6L, "1000000"));
  if (!(z > T(1))) return detail::fail<T>(status::domain);
  const T t = pow(T(10), (line.a - detail::log10_log10(z)) / line.b);
  if (!detail::finite(t)) return detail::fail<T>(status::overflow);
  return {t, status::ok};
}

/// Kinematic viscosity at t_k from two known points (ASTM D341).
///
/// Combines d341_fit() and d341_viscosity(). Interpolation and extrapolation (cold start)
/// use the same straight line on the D341 chart.
///
/// @param t1_k, nu1_m2_s first point (K, m^2/s)
/// @param t2_k, nu2_m2_s second point (K, m^2/s)
/// @param t_k  temperature wanted, K
/// @return nu in m^2/s, statuses as d341_fit() and d341_viscosity().
/// @par Accuracy
/// Within 1e-13 relative of the 50-digit evaluation of the same formula (tests/fluid_test.cpp);
/// the double logarithm amplifies input rounding by up to ln(Z) ln(10).
/// @par Source
/// ASTM D341 (docs/pages/theory_fluid.md); check value 8.53 mm^2/s at 80 degC for 32 mm^2/s at 40 degC and
/// 5.4 mm^2/s at 100 degC (published worked example, quoted as 8.5).
template <class T, detail::if_real<T> = 0>
inline result<T> viscosity_d341(T t1_k, T nu1_m2_s, T t2_k, T nu2_m2_s, T t_k) {
  const auto line = d341_fit(t1_k, nu1_m2_s, t2_k, nu2_m2_s);
  if (is_error(line.st)) return detail::fail<T>(line.st);
  if (!detail::finite(t_k)) return detail::fail<T>(status::nonfinite);
  return d341_viscosity(line.value, t_k);
}

/// Slope of the D341 relation in Z: \f$ dZ/dT = -B\, Z \ln Z / T \f$ (per K). Used for
/// sensitivities.
/// @param line the D341 line
/// @param z Z at the temperature
/// @param t_k temperature, K
/// @return dZ/dT in 1/K
/// @par Source
/// Differentiation of the ASTM D341 relation.
template <class T>
inline T d341_dz_dt(const d341_line<T>& line, T z, T t_k) {
  using std::log;
  return -line.b * z * log(z) / t_k;
}
/// @}

/// @name ISO 3448 viscosity grades
/// @{

/// An ISO 3448 viscosity grade: mid-point and limits of kinematic viscosity at 40 degC.
struct iso_vg_grade {
  int grade;        ///< Grade number (VG 2 ... VG 1500).
  double mid_m2_s;  ///< Mid-point kinematic viscosity at 40 degC, m^2/s.
  double min_m2_s;  ///< Lower limit (mid-point - 10 %), m^2/s.
  double max_m2_s;  ///< Upper limit (mid-point + 10 %), m^2/s.
};

/// The ISO 3448 grade with this number.
///
/// @param grade one of 2, 3, 5, 7, 10, 15, 22, 32, 46, 68, 100, 150, 220, 320, 460, 680, 1000, 1500
/// @return the grade; status::domain for any other number (value fields NaN).
/// @par Source
/// ISO 3448:1992, Industrial liquid lubricants - ISO viscosity classification, Table 1
/// (18 grades; mid-points 2.2, 3.2, 4.6, 6.8, 10, ... 1500 mm^2/s; limits +/-10 %).
PUMPLOSS_CXX_API result<iso_vg_grade> iso_vg(int grade) noexcept;

/// The ISO 3448 grade whose limits contain a kinematic viscosity measured at 40 degC.
/// @param nu40_m2_s kinematic viscosity at 40 degC, m^2/s
/// @return the grade; status::out_of_validity when the value lies in no grade's band.
PUMPLOSS_CXX_API result<iso_vg_grade> iso_vg_classify(double nu40_m2_s) noexcept;
/// @}

/// @name ASTM D2161 Saybolt Universal Seconds
/// @{

/// Saybolt Universal Seconds at 100 degF from kinematic viscosity at 100 degF.
///
/// \f[ \mathrm{SUS} = 4.6324\,\nu + \frac{1.0 + 0.03264\,\nu}
///     {(3930.2 + 262.7\nu + 23.97\nu^2 + 1.646\nu^3)\cdot 10^{-5}} \f] (nu in mm^2/s)
///
/// @param nu_m2_s kinematic viscosity at 100 degF in m^2/s, > 0
/// @return SUS (s); status::regime below 1.8 mm^2/s (about 32 SUS), the lower end of the scale.
/// @par Source
/// ASTM D2161-93, Eq. for 100 degF (as implemented in the `chemicals` library's
/// viscosity_converter); check 46 mm^2/s -> 214.19 SUS, 2 mm^2/s -> 32.60 SUS.
template <class T, detail::if_real<T> = 0>
inline result<T> sus_from_kinematic(T nu_m2_s) {
  if (!detail::finite(nu_m2_s)) return detail::fail<T>(status::nonfinite);
  if (!(nu_m2_s > T(0))) return detail::fail<T>(status::domain);
  const T v = nu_m2_s * detail::constant<T>(1e6L, "1000000");
  const T den = (detail::constant<T>(3930.2L, "3930.2") +
                 v * (detail::constant<T>(262.7L, "262.7") +
                      v * (detail::constant<T>(23.97L, "23.97") + v * detail::constant<T>(1.646L, "1.646")))) *
                detail::constant<T>(1e-5L, "0.00001");
  const T sus = detail::constant<T>(4.6324L, "4.6324") * v +
                (T(1) + detail::constant<T>(0.03264L, "0.03264") * v) / den;
  if (!detail::finite(sus)) return detail::fail<T>(status::overflow);
  if (v < detail::constant<T>(1.8L, "1.8")) return {sus, status::regime};
  return {sus, status::ok};
}

/// Kinematic viscosity at 100 degF (m^2/s) from Saybolt Universal Seconds at 100 degF: the
/// inverse of sus_from_kinematic(), solved by Newton's method safeguarded by bisection on the
/// bracket \f$[(\mathrm{SUS}-25.5)/4.6324,\ \mathrm{SUS}/4.6324]\f$ (mm^2/s).
///
/// @param sus Saybolt Universal Seconds at 100 degF, > 0
/// @return nu in m^2/s; status::domain for SUS <= 0; status::regime below 32 SUS;
///         status::no_convergence if the iteration cap is reached (not seen in tests).
/// @par Source
/// ASTM D2161-93; check 700 SUS -> 151.0891 mm^2/s (`chemicals` documentation).
template <class T, detail::if_real<T> = 0>
inline result<T> kinematic_from_sus(T sus) {
  if (!detail::finite(sus)) return detail::fail<T>(status::nonfinite);
  if (!(sus > T(0))) return detail::fail<T>(status::domain);
  const T mm2 = detail::constant<T>(1e6L, "1000000");
  if constexpr (detail::is_dual_v<T>) {  // root in the value type, derivatives by the implicit rule
    const auto v = kinematic_from_sus(detail::primal(sus));
    if (is_error(v.st)) return detail::fail<T>(v.st);
    auto residual = [](auto nu, auto s) { return sus_from_kinematic(nu).value - s; };
    return {detail::implicit_root<T>(v.value, residual, sus), v.st};
  } else {
    const T a = detail::constant<T>(4.6324L, "4.6324");
    T lo = (sus - detail::constant<T>(25.5L, "25.5")) / a;
    if (lo < T(0)) lo = T(0);
    const T hi = sus / a;
    // SUS - sus and its analytic derivative in nu (mm^2/s)
    auto f = [&](T x) {
      const T den = detail::constant<T>(3930.2L, "3930.2") +
                    x * (detail::constant<T>(262.7L, "262.7") +
                         x * (detail::constant<T>(23.97L, "23.97") + x * detail::constant<T>(1.646L, "1.646")));
      const T dden = detail::constant<T>(262.7L, "262.7") +
                     x * (2 * detail::constant<T>(23.97L, "23.97") + 3 * x * detail::constant<T>(1.646L, "1.646"));
      const T num = T(1) + detail::constant<T>(0.03264L, "0.03264") * x;
      const T dfx = a + (detail::constant<T>(0.03264L, "0.03264") * den - num * dden) / (den * den) *
                            detail::constant<T>(1e5L, "100000");
      return detail::value_slope<T>{sus_from_kinematic(x / mm2).value - sus, dfx};
    };
    const auto r = detail::newton_bisect(f, lo, hi, (lo + hi) / 2, 4 * scalar_traits<T>::epsilon(),
                                         scalar_traits<T>::max_iterations);
    if (r.st != status::ok) return detail::fail<T>(r.st == status::nonfinite ? status::overflow : r.st);
    const T nu = r.x / mm2;
    if (r.x < detail::constant<T>(1.8L, "1.8")) return {nu, status::regime};
    return {nu, status::ok};
  }
}
/// @}

/// @name Density, dynamic and kinematic viscosity, pressure effects
/// @{

/// Dynamic viscosity from kinematic viscosity and density: \f$ \mu = \rho \nu \f$.
/// @param nu_m2_s kinematic viscosity, m^2/s, > 0
/// @param rho_kg_m3 density, kg/m^3, > 0
/// @return mu in Pa s; status::overflow when the product is not representable.
/// @par Source
/// Definition (ISO 80000-11).
template <class T, detail::if_real<T> = 0>
inline result<T> dynamic_viscosity(T nu_m2_s, T rho_kg_m3) {
  if (!detail::all_finite(nu_m2_s, rho_kg_m3)) return detail::fail<T>(status::nonfinite);
  if (!(nu_m2_s > T(0)) || !(rho_kg_m3 > T(0))) return detail::fail<T>(status::domain);
  const T mu = nu_m2_s * rho_kg_m3;
  if (!detail::finite(mu) || !(mu > T(0))) return detail::fail<T>(status::overflow);
  return {mu, status::ok};
}

/// Kinematic viscosity from dynamic viscosity and density: \f$ \nu = \mu / \rho \f$.
/// @param mu_pa_s dynamic viscosity, Pa s, > 0
/// @param rho_kg_m3 density, kg/m^3, > 0
/// @return nu in m^2/s; status::overflow when the quotient is not representable.
/// @par Source
/// Definition (ISO 80000-11).
template <class T, detail::if_real<T> = 0>
inline result<T> kinematic_viscosity(T mu_pa_s, T rho_kg_m3) {
  if (!detail::all_finite(mu_pa_s, rho_kg_m3)) return detail::fail<T>(status::nonfinite);
  if (!(mu_pa_s > T(0)) || !(rho_kg_m3 > T(0))) return detail::fail<T>(status::domain);
  const T nu = mu_pa_s / rho_kg_m3;
  if (!detail::finite(nu) || !(nu > T(0))) return detail::fail<T>(status::overflow);
  return {nu, status::ok};
}

/// Density of an oil at temperature and pressure.
///
/// \f[ \rho(p, \theta) = \rho_\mathrm{ref}\,
///     \frac{1 - \alpha_p (\theta - \theta_\mathrm{ref})}{1 - p / K} \f]
///
/// @param rho_ref_kg_m3 density at the reference state (t_ref_k, zero gauge pressure), > 0
/// @param t_ref_k reference temperature, K, > 0
/// @param alpha_per_k isobaric cubic expansion coefficient alpha_p, 1/K, >= 0 (mineral oil 6.5e-4 to 7e-4)
/// @param bulk_modulus_pa secant bulk modulus K over 0..p, Pa, > 0 (mineral oil about 1.4e9 to 1.8e9)
/// @param t_k temperature, K, > 0
/// @param p_pa gauge pressure, Pa, in (-K, K)
/// @return rho in kg/m^3; status::domain if p >= K or the thermal factor is not positive;
///         status::overflow when the result is not representable;
///         status::regime when the linearised thermal expansion is stretched beyond 150 K from
///         the reference (a limit of our own choosing, no source).
/// @par Source
/// Definitions of the secant bulk modulus and expansion coefficient: Vacca & Franzoni,
/// Hydraulic Fluid Power, Wiley 2021, sections 2.4-2.5; model in docs/pages/theory_fluid.md.
template <class T, detail::if_real<T> = 0>
inline result<T> oil_density(T rho_ref_kg_m3, T t_ref_k, T alpha_per_k, T bulk_modulus_pa, T t_k, T p_pa) {
  using std::fabs;
  if (!detail::all_finite(rho_ref_kg_m3, t_ref_k, alpha_per_k, bulk_modulus_pa, t_k, p_pa))
    return detail::fail<T>(status::nonfinite);
  if (!(rho_ref_kg_m3 > T(0)) || !(t_ref_k > T(0)) || !(alpha_per_k >= T(0)) ||
      !(bulk_modulus_pa > T(0)) || !(t_k > T(0)) || !(p_pa < bulk_modulus_pa) ||
      !(p_pa > -bulk_modulus_pa))
    return detail::fail<T>(status::domain);
  const T thermal = T(1) - alpha_per_k * (t_k - t_ref_k);
  if (!(thermal > T(0))) return detail::fail<T>(status::domain);
  const T rho = rho_ref_kg_m3 * thermal / (T(1) - p_pa / bulk_modulus_pa);
  if (!detail::finite(rho) || !(rho > T(0))) return detail::fail<T>(status::overflow);
  if (fabs(t_k - t_ref_k) > T(150)) return {rho, status::regime};
  return {rho, status::ok};
}

/// Barus pressure-viscosity relation: \f$ \mu = \mu_0\, e^{\alpha p} \f$.
///
/// @param mu0_pa_s dynamic viscosity at zero gauge pressure, Pa s, > 0
/// @param alpha_per_pa pressure-viscosity coefficient, 1/Pa, >= 0 (mineral oils about 1.5e-8 to
///        3e-8 near 40 degC, from memory)
/// @param p_pa gauge pressure, Pa, >= 0
/// @return mu in Pa s; status::regime above 100 MPa, where other laws are preferred.
/// @par Source
/// C. Barus, Am. J. Sci. 45 (1893) 87-96; limits from memory.
template <class T, detail::if_real<T> = 0>
inline result<T> viscosity_barus(T mu0_pa_s, T alpha_per_pa, T p_pa) {
  using std::exp;
  if (!detail::all_finite(mu0_pa_s, alpha_per_pa, p_pa)) return detail::fail<T>(status::nonfinite);
  if (!(mu0_pa_s > T(0)) || !(alpha_per_pa >= T(0)) || !(p_pa >= T(0)))
    return detail::fail<T>(status::domain);
  const T mu = mu0_pa_s * exp(alpha_per_pa * p_pa);
  if (!detail::finite(mu)) return detail::fail<T>(status::overflow);
  if (p_pa > detail::constant<T>(1e8L, "100000000")) return {mu, status::regime};
  return {mu, status::ok};
}
/// @}

/// @name Oil description
/// @{

/// The properties of one hydraulic oil needed by the rest of the library.
template <class T>
struct oil {
  d341_line<T> viscosity;  ///< ASTM D341 line (kinematic viscosity against temperature)
  T rho_ref_kg_m3;         ///< density at t_ref_k and zero gauge pressure, kg/m^3
  T t_ref_k;               ///< reference temperature of the density, K
  T alpha_per_k;           ///< isobaric cubic expansion coefficient, 1/K
  T bulk_modulus_pa;       ///< secant bulk modulus, Pa
  T cp_j_kg_k;             ///< specific heat capacity, J/(kg K)
  T barus_per_pa;          ///< Barus pressure-viscosity coefficient, 1/Pa (0 to ignore)
};

namespace detail {
/// An oil in another scalar type: the same oil for the same type, else its value parts as
/// constants (no derivatives; see scalar_as()).
/// @param o the oil
/// @return the oil in U
template <class U, class T>
inline oil<U> oil_cast(const oil<T>& o) {
  return oil<U>{{scalar_as<U>(o.viscosity.a), scalar_as<U>(o.viscosity.b)}, scalar_as<U>(o.rho_ref_kg_m3),
                scalar_as<U>(o.t_ref_k), scalar_as<U>(o.alpha_per_k), scalar_as<U>(o.bulk_modulus_pa),
                scalar_as<U>(o.cp_j_kg_k), scalar_as<U>(o.barus_per_pa)};
}
}  // namespace detail

/// Typical property set of a mineral hydraulic oil (HM/HLP type) without the viscosity line.
///
/// | property | value | source |
/// |---|---|---|
/// | density at 15 degC | 870 kg/m^3 | low end of 870-900 kg/m^3, Vacca & Franzoni, Hydraulic Fluid Power (Wiley 2021) 2.4 |
/// | expansion coefficient | 6.5e-4 1/K | docs/pages/theory_fluid.md, typical 6.5e-4 to 7e-4 (common practice, no source) |
/// | secant bulk modulus | 1.4e9 Pa | about 0.7 % volume loss per 100 bar, Vacca & Franzoni 2.5 |
/// | specific heat | 1.9e3 J/(kg K) | mid of 1.8-2.1 kJ/(kg K) (from memory) |
/// | Barus coefficient | 2.0e-8 1/Pa | mid of 1.5e-8 to 3e-8 near 40 degC (from memory) |
///
/// The values are typical; use the oil maker's data sheet where it is at hand.
/// @param viscosity the oil's D341 line (from d341_fit())
/// @return the property set
template <class T>
inline oil<T> typical_mineral_oil(d341_line<T> viscosity) {
  return oil<T>{viscosity,
                T(870),
                celsius_zero_k<T>() + T(15),
                detail::constant<T>(6.5e-4L, "0.00065"),
                detail::constant<T>(1.4e9L, "1400000000"),
                T(1900),
                detail::constant<T>(2e-8L, "0.00000002")};
}

/// Kinematic viscosity of an oil at temperature t_k and zero gauge pressure (ASTM D341 line).
/// @param o the oil
/// @param t_k temperature, K
/// @return nu in m^2/s (as d341_viscosity())
template <class T>
inline result<T> oil_kinematic_viscosity(const oil<T>& o, T t_k) {
  return d341_viscosity(o.viscosity, t_k);
}

/// Density of an oil at temperature and gauge pressure (oil_density()).
/// @param o the oil
/// @param t_k temperature, K
/// @param p_pa gauge pressure, Pa
/// @return rho in kg/m^3 (as oil_density())
template <class T>
inline result<T> oil_density_at(const oil<T>& o, T t_k, T p_pa) {
  return oil_density(o.rho_ref_kg_m3, o.t_ref_k, o.alpha_per_k, o.bulk_modulus_pa, t_k, p_pa);
}

/// Dynamic viscosity of an oil at temperature and gauge pressure:
/// \f$ \mu = \rho(0, T)\, \nu_{D341}(T)\, e^{\alpha_B p} \f$.
///
/// The Barus coefficient describes the dynamic viscosity's rise with pressure as measured, which
/// already contains the oil's compression; the density therefore enters at zero gauge pressure
/// only (taking \f$\rho(p)\f$ as well would count the compression twice, about +1.8 % at
/// 250 bar).
/// @param o the oil
/// @param t_k temperature, K
/// @param p_pa gauge pressure, Pa (the Barus factor uses max(p, 0))
/// @return mu in Pa s, with the worst status of the parts.
/// @par Source
/// Barus 1893 (see viscosity_barus()); D341 line at atmospheric pressure.
template <class T>
inline result<T> oil_dynamic_viscosity(const oil<T>& o, T t_k, T p_pa) {
  const auto nu = d341_viscosity(o.viscosity, t_k);
  if (is_error(nu.st)) return nu;
  if (!detail::finite(p_pa)) return detail::fail<T>(status::nonfinite);
  const auto rho = oil_density_at(o, t_k, T(0));
  if (is_error(rho.st)) return rho;
  const auto mu = viscosity_barus(nu.value * rho.value, o.barus_per_pa, p_pa < T(0) ? T(0) : p_pa);
  if (is_error(mu.st)) return mu;
  return {mu.value, worst(worst(nu.st, rho.st), mu.st)};
}
/// @}

// Mixed argument types (an int literal beside doubles), promoted as Boost.Math promotes:
// one line per public template whose parameters are all scalars (promote.hpp).
PUMPLOSS_PROMOTE(d341_fit)
PUMPLOSS_PROMOTE(d341_nu_from_z)
PUMPLOSS_PROMOTE(d341_z)
PUMPLOSS_PROMOTE(dynamic_viscosity)
PUMPLOSS_PROMOTE(kinematic_from_sus)
PUMPLOSS_PROMOTE(kinematic_viscosity)
PUMPLOSS_PROMOTE(oil_density)
PUMPLOSS_PROMOTE(sus_from_kinematic)
PUMPLOSS_PROMOTE(viscosity_barus)
PUMPLOSS_PROMOTE(viscosity_d341)

}  // namespace pumploss

#endif
