/// @file friction.hpp
/// @brief Darcy friction factor (laminar, Colebrook-White to the last digit, Haaland,
/// Swamee-Jain, Churchill), the transition policy, and the Darcy-Weisbach pressure drop of a
/// pipe, tube or hose segment.
///
/// All quantities SI: flow in m^3/s, density kg/m^3, dynamic viscosity Pa s, lengths m,
/// pressure Pa. The friction factor is the Darcy (Moody) factor, four times the Fanning factor.
#ifndef PUMPLOSS_FRICTION_HPP
#define PUMPLOSS_FRICTION_HPP

#include <cmath>
#include <limits>
#include <type_traits>

#include "scalar_traits.hpp"
#include "status.hpp"
#include "units.hpp"

namespace pumploss {

/// Reynolds number up to which friction_factor() uses the laminar law (docs/pages/theory_friction.md).
inline constexpr double laminar_reynolds_limit = 2000.0;
/// Reynolds number from which friction_factor() uses Colebrook-White (docs/pages/theory_friction.md).
inline constexpr double turbulent_reynolds_limit = 4000.0;

namespace detail {

/// Number of Newton correction steps after Clamond's two iterations: one for types up to
/// 64 significand bits, more for multiprecision types (each step doubles the digits).
template <class T>
constexpr int colebrook_newton_steps() {
  constexpr int digits = std::numeric_limits<T>::digits;
  return digits <= 64 ? 1 : digits <= 128 ? 2 : digits <= 256 ? 3 : digits <= 512 ? 4 : 6;
}

/// ln(ln 10 / 5.02), the constant of Clamond's X2.
template <class T>
inline T clamond_c2() {
  return constant<T>(-0.7793974884556819406441139701653776731705L,
                     "-0.7793974884556819406441139701653776731705");
}

/// Exact product a * b = p + e by one fused multiply-add (an instruction where the compiler
/// targets one, else the C library's fma, which uses the processor's FMA when it has one).
/// Exact when no partial product overflows or underflows (|a|, |b| within 1e-100..1e100 here).
/// (Dekker's split in place of a library fma was measured and removed: 24 % slower on a
/// processor with FMA; docs/pages/performance.md.)
inline void two_product(double a, double b, double& p, double& e) {
  p = a * b;
  e = std::fma(a, b, -p);
}

/// Colebrook-White in Clamond's variable F = (ln 10 / 2) / sqrt(f), no input checks.
/// Two iterations of Clamond's third-order scheme, then a fixed number of Newton steps on
/// G(F) = F + ln(s), s = rr/3.7 + 5.02 F/(Re ln 10). For double the one Newton step keeps the
/// correction d apart from F0 and forms f = (ln 10/2)^2/(F0 + d)^2 in double-double
/// arithmetic, so only the logarithm's own rounding and the last division remain.
///
/// Clamond's step, with N = ln(X1 + F) + F - X2, D = 1 + X1 + F and e = N/D,
/// F <- F - (D + e/2) e (X1 + F) / (D + e (1 + e/3)), is evaluated as
/// F <- F - [e (X1 + F)] [(D + e/2) / (D + e (1 + e/3))], so no intermediate overflows, up to
/// Re = DBL_MAX with epsilon/D = 1 (where the starting F is far from the root).
///
/// Speed (double): the reciprocals 1/D and 1/(s + c) are formed beside the logarithms, off the
/// chain of dependent operations. (A table-driven logarithm for the three starting logarithms
/// was tried and removed: no gain beyond the run-to-run scatter, docs/pages/performance.md.)
template <class T>
inline T colebrook_unchecked(T re, T rr) {
  using std::log;
  const T ln10 = detail::ln10<T>();
  const T x1 = rr * re * (ln10 / constant<T>(18.574L, "18.574"));
  const T x2 = log(re) + clamond_c2<T>();
  T f = x2 - constant<T>(0.2L, "0.2");
  const T third = T(1) / T(3);
  for (int i = 0; i < 2; ++i) {
    const T x1f = x1 + f;
    const T d = T(1) + x1f;
    const T e = (log(x1f) + f - x2) * (T(1) / d);
    f = f - (e * x1f) * ((d + e / 2) / (d + e * (T(1) + e * third)));
  }
  if constexpr (std::is_same_v<T, double>) {
    // rr/3.7 and 5.02/(Re ln 10) do not depend on F: their divisions run beside the iterations.
    // (rr times 1/3.7 would round once more: 2.5 instead of 2.2 ulp worst on the test grid.)
    const double c = 2.180158299154324 / re;  // 5.02 / ln 10 = 2.1801582991543241748...
    const double s = c * f + rr / 3.7;
    const double g = f + log(s);  // exact: log(s) is close to -f (Sterbenz)
    const double d = -g * s * (1.0 / (s + c));
    // (ln 10 / 2)^2 as a double-double, and 1/(ln 10 / 2)^2 for the last correction
    const double k_hi = 1.3254745276195996, k_lo = -1.0467943915251679e-16, inv_k = 0.7544467880464557;
    double p_hi, p_err;
    two_product(f, f, p_hi, p_err);
    const double p_lo = p_err + 2.0 * f * d;
    const double q = k_hi / p_hi;
    double qp_hi, qp_lo;
    two_product(q, p_hi, qp_hi, qp_lo);
    const double r = ((k_hi - qp_hi) - qp_lo) + (k_lo - q * p_lo);  // k - q p, r/p = r q/k to 1e-16 of r
    return q + r * (q * inv_k);
  } else {
    const T a = rr / constant<T>(3.7L, "3.7");
    const T c = constant<T>(5.02L, "5.02") / (ln10 * re);
    for (int i = 0; i < colebrook_newton_steps<T>(); ++i) {
      const T s = a + c * f;
      f = f - (f + log(s)) / (T(1) + c / s);
    }
    const T h = ln10 / (2 * f);
    return h * h;
  }
}

/// Shared checks of the turbulent correlations: status::nonfinite, status::domain
/// (Re <= 0, rr < 0, rr > 1: roughness larger than the diameter) or ok.
template <class T>
inline status friction_check(T re, T rr) {
  if (!all_finite(re, rr)) return status::nonfinite;
  if (!(re > T(0)) || !(rr >= T(0)) || rr > T(1)) return status::domain;
  return status::ok;
}

/// Report status of a turbulent correlation valid on [re_lo, re_hi] x [0, rr_hi].
template <class T>
inline status friction_range(T re, T rr, double re_lo, double re_hi, double rr_hi) {
  if (re < T(re_lo) || re > T(re_hi) || rr > T(rr_hi)) return status::regime;
  return status::ok;
}

}  // namespace detail

/// @name Darcy friction factor
/// @{

/// Laminar Darcy friction factor \f[ f = \frac{C}{Re} \f] (Hagen-Poiseuille for C = 64).
///
/// @param reynolds Reynolds number Re = rho v D / mu, > 0
/// @param laminar_constant C, > 0; 64 for a straight round pipe; some practitioners use 75 for
///        cold oil in hoses and tube lines (common practice, no source)
/// @return f; status::regime above Re = 2000 (laminar flow not assured); status::domain for
///         Re <= 0 or C <= 0; status::nonfinite for NaN/inf.
/// @par Validity
/// Fully developed laminar flow of a Newtonian fluid in a round pipe, Re below about 2000.
/// @par Accuracy
/// One rounding (0.5 ulp).
/// @par Source
/// Hagen-Poiseuille law; any fluid mechanics text (e.g. F. M. White, Fluid Mechanics, 7th ed.,
/// McGraw-Hill 2011, Eq. 6.47); docs/pages/theory_friction.md.
template <class T>
inline result<T> friction_laminar(T reynolds, T laminar_constant = T(64)) {
  if (!detail::all_finite(reynolds, laminar_constant)) return detail::fail<T>(status::nonfinite);
  if (!(reynolds > T(0)) || !(laminar_constant > T(0))) return detail::fail<T>(status::domain);
  const T f = laminar_constant / reynolds;
  if (!detail::finite(f)) return detail::fail<T>(status::overflow);
  return {f, reynolds > T(laminar_reynolds_limit) ? status::regime : status::ok};
}

/// Colebrook-White Darcy friction factor, solved to the last digit with a fixed amount of work.
///
/// \f[ \frac{1}{\sqrt f} = -2 \log_{10}\left( \frac{\varepsilon/D}{3.7} + \frac{2.51}{Re\sqrt f} \right) \f]
///
/// Solved in Clamond's variable \f$ F = \tfrac{\ln 10}{2}\, f^{-1/2} \f$, for which the equation
/// reads \f$ F + \ln(X_1 + F) = X_2 \f$ with \f$ X_1 = (\varepsilon/D)\,Re\,\ln 10/18.574 \f$ and
/// \f$ X_2 = \ln(Re \ln 10 / 5.02) \f$: two iterations of Clamond's third-order scheme from
/// \f$ F_0 = X_2 - 0.2 \f$, then one Newton step on
/// \f$ G(F) = F + \ln\!\left(\tfrac{\varepsilon/D}{3.7} + \tfrac{5.02\,F}{Re \ln 10}\right) \f$
/// whose correction is kept apart from \f$F_0\f$, and \f$ f = (\ln 10/2)^2/F^2 \f$ formed in
/// double-double arithmetic (exact products by fused multiply-add). No loop runs to a
/// tolerance: the work is always 4 logarithms and 8 divisions, 6 of them off the dependent
/// chain (more Newton steps, fixed in number, for multiprecision T). Finite for every Re up to the
/// largest double.
///
/// @param reynolds Reynolds number Re, > 0 (1000 or more; 4e3 to 1e8 is the tested range)
/// @param relative_roughness epsilon/D, 0 to 1 (0 to 0.05 is the tested range)
/// @return f; status::regime below Re = 4000 (not turbulent), above Re = 1e8 or above
///         epsilon/D = 0.05 (beyond the Moody chart); status::out_of_validity below Re = 1000
///         (the solver's starting point is not valid there); status::domain for Re <= 0,
///         epsilon/D < 0 or epsilon/D > 1 (roughness larger than the diameter);
///         status::nonfinite for NaN/inf.
/// @par Validity
/// Fully turbulent and transitional-rough flow in commercial pipes, Re >= 4000.
/// @par Accuracy
/// Against the 50-digit root of the Colebrook equation (Boost.Multiprecision Newton solve in
/// tests/friction_test.cpp, and an mpmath table), over Re 4e3..1e8 and epsilon/D 0..0.05
/// (8211 points): at most 2 ulp (x86-64, glibc libm). long double: within
/// 1e-18 relative; cpp_bin_float_50: within 1e-45.
/// @par Source
/// C. F. Colebrook, "Turbulent flow in pipes, with particular reference to the transition
/// region between the smooth and rough pipe laws", J. ICE 11(4) (1939) 133-156.
/// D. Clamond, "Efficient resolution of the Colebrook equation", Ind. Eng. Chem. Res. 48(7)
/// (2009) 3665-3671 (docs/pages/theory_friction.md).
template <class T, detail::if_real<T> = 0>
inline result<T> friction_colebrook(T reynolds, T relative_roughness) {
  const status s = detail::friction_check(reynolds, relative_roughness);
  if (is_error(s)) return detail::fail<T>(s);
  if (reynolds < T(1000)) return detail::fail<T>(status::out_of_validity);
  const T f = detail::colebrook_unchecked(reynolds, relative_roughness);
  if (!detail::finite(f)) return detail::fail<T>(status::internal);
  return {f, detail::friction_range(reynolds, relative_roughness, turbulent_reynolds_limit, 1e8, 0.05)};
}

/// Haaland's explicit approximation of Colebrook-White.
///
/// \f[ \frac{1}{\sqrt f} = -1.8 \log_{10}\left[ \left(\frac{\varepsilon/D}{3.7}\right)^{1.11} + \frac{6.9}{Re} \right] \f]
///
/// For users who must match a hand calculation; friction_colebrook() is both faster to trust
/// and exact.
/// @param reynolds Reynolds number, > 0
/// @param relative_roughness epsilon/D, 0 to 1
/// @return f; status::regime outside 4e3 <= Re <= 1e8, epsilon/D <= 0.05; errors as
///         friction_colebrook().
/// @par Validity
/// 4e3 <= Re <= 1e8, 0 <= epsilon/D <= 0.05 (range as documented by python3-fluids).
/// @par Accuracy
/// Haaland states about +/-1.5 % against Colebrook (from memory); measured here (test
/// FrictionExplicit.ErrorBoundsAgainstColebrook): at most 1.4 % over Re 4e3..1e8,
/// epsilon/D 1e-6..0.05, and 2.7 % for smooth pipes at Re = 1e8.
/// @par Source
/// S. E. Haaland, "Simple and explicit formulas for the friction factor in turbulent pipe
/// flow", J. Fluids Eng. 105(1) (1983) 89-90.
template <class T, detail::if_real<T> = 0>
inline result<T> friction_haaland(T reynolds, T relative_roughness) {
  using std::log;
  using std::pow;
  const status s = detail::friction_check(reynolds, relative_roughness);
  if (is_error(s)) return detail::fail<T>(s);
  const T arg = pow(relative_roughness / detail::constant<T>(3.7L, "3.7"), detail::constant<T>(1.11L, "1.11")) +
                detail::constant<T>(6.9L, "6.9") / reynolds;
  const T inv = -detail::constant<T>(1.8L, "1.8") * log(arg) / detail::ln10<T>();
  if (!(inv > T(0))) return detail::fail<T>(status::out_of_validity);
  return {T(1) / (inv * inv), detail::friction_range(reynolds, relative_roughness, 4e3, 1e8, 0.05)};
}

/// Swamee and Jain's explicit approximation of Colebrook-White.
///
/// \f[ f = \frac{0.25}{\left[\log_{10}\left(\frac{\varepsilon/D}{3.7} + \frac{5.74}{Re^{0.9}}\right)\right]^2} \f]
///
/// @param reynolds Reynolds number, > 0
/// @param relative_roughness epsilon/D, 0 to 1
/// @return f; status::regime outside 5e3 <= Re <= 1e8, 1e-6 <= epsilon/D <= 1e-2 (the
///         authors' range; smooth pipes, epsilon/D = 0, are accepted without a report);
///         errors as friction_colebrook().
/// @par Validity
/// 5e3 <= Re <= 1e8, 1e-6 <= epsilon/D <= 1e-2 (Swamee & Jain 1976).
/// @par Accuracy
/// Swamee & Jain state within 1 % of Colebrook in their range (from memory); measured here:
/// at most 2.8 % over Re 5e3..1e8, epsilon/D 0..1e-2, and 2.1 % for Re >= 1e4.
/// @par Source
/// P. K. Swamee, A. K. Jain, "Explicit equations for pipe-flow problems", J. Hydraulics Div.
/// ASCE 102(5) (1976) 657-664.
template <class T, detail::if_real<T> = 0>
inline result<T> friction_swamee_jain(T reynolds, T relative_roughness) {
  using std::log;
  using std::pow;
  const status s = detail::friction_check(reynolds, relative_roughness);
  if (is_error(s)) return detail::fail<T>(s);
  const T arg = relative_roughness / detail::constant<T>(3.7L, "3.7") +
                detail::constant<T>(5.74L, "5.74") / pow(reynolds, detail::constant<T>(0.9L, "0.9"));
  const T l = log(arg) / detail::ln10<T>();
  if (!(l < T(0))) return detail::fail<T>(status::out_of_validity);
  const bool in_range = reynolds >= T(5e3) && reynolds <= T(1e8) &&
                        (relative_roughness == T(0) ||
                         (relative_roughness >= detail::constant<T>(1e-6L, "0.000001") &&
                          relative_roughness <= detail::constant<T>(1e-2L, "0.01")));
  return {detail::constant<T>(0.25L, "0.25") / (l * l), in_range ? status::ok : status::regime};
}

/// Churchill's friction factor for all regimes (laminar, transition, turbulent) in one formula.
///
/// \f[ f = 8\left[\left(\frac{8}{Re}\right)^{12} + (A + B)^{-3/2}\right]^{1/12}, \quad
///     A = \left[2.457 \ln\frac{1}{(7/Re)^{0.9} + 0.27\,\varepsilon/D}\right]^{16}, \quad
///     B = \left(\frac{37530}{Re}\right)^{16} \f]
///
/// @param reynolds Reynolds number, > 0
/// @param relative_roughness epsilon/D, 0 to 1
/// @return f; status::transition for 2000 < Re < 4000 (the value is Churchill's interpolation
///         there, not a measured law); status::regime above epsilon/D = 0.05; errors as
///         friction_colebrook().
/// @par Validity
/// All Re; continuous across the transition. Laminar limit 64/Re.
/// @par Accuracy
/// Against Colebrook for Re >= 1e4: within 3 % measured here (test
/// FrictionExplicit.ErrorBoundsAgainstColebrook); laminar within 1e-6 of 64/Re for Re <= 1000.
/// @par Source
/// S. W. Churchill, "Friction-factor equation spans all fluid-flow regimes", Chem. Eng. 84(24)
/// (1977) 91-92 (journal details from memory; formula as in python3-fluids).
template <class T, detail::if_real<T> = 0>
inline result<T> friction_churchill(T reynolds, T relative_roughness) {
  using std::log;
  using std::pow;
  const status s = detail::friction_check(reynolds, relative_roughness);
  if (is_error(s)) return detail::fail<T>(s);
  const T a = pow(detail::constant<T>(2.457L, "2.457") *
                      log(T(1) / (pow(T(7) / reynolds, detail::constant<T>(0.9L, "0.9")) +
                                  detail::constant<T>(0.27L, "0.27") * relative_roughness)),
                  16);
  const T b = pow(T(37530) / reynolds, 16);
  const T lam = pow(T(8) / reynolds, 12);
  const T f = 8 * pow(lam + pow(a + b, detail::constant<T>(-1.5L, "-1.5")), T(1) / T(12));
  if (!detail::finite(f)) return detail::fail<T>(status::overflow);
  status st = status::ok;
  if (reynolds > T(laminar_reynolds_limit) && reynolds < T(turbulent_reynolds_limit)) st = status::transition;
  else if (relative_roughness > detail::constant<T>(0.05L, "0.05")) st = status::regime;
  return {f, st};
}

/// The library's Darcy friction factor for any Reynolds number: laminar below the transition,
/// Colebrook-White above it, and a documented continuous bridge in between.
///
/// \f[ f = \begin{cases} C/Re & Re \le 2000
///   \\ (1-w)\, C/2000 + w\, f_{CW}(4000, \varepsilon/D), \; w = \frac{Re - 2000}{2000} & 2000 < Re < 4000
///   \\ f_{CW}(Re, \varepsilon/D) & Re \ge 4000 \end{cases} \f]
///
/// The transition policy is a straight line in Re between the laminar value at Re = 2000 and
/// the Colebrook value at Re = 4000: continuous at both ends, and the pressure drop
/// \f$ \propto f\,Re^2 \f$ keeps rising with flow, so a line's flow for a given pressure stays
/// unique. Real flow in this region is intermittent; the value is a planning estimate.
///
/// @param reynolds Reynolds number, >= 0 (0 gives +infinity with status::ok only through
///        pipe_flow(); here Re must be > 0)
/// @param relative_roughness epsilon/D, 0 to 1
/// @param laminar_constant C of the laminar law, > 0 (default 64)
/// @return f; status::transition for 2000 < Re < 4000; status::regime above Re = 1e8 or
///         epsilon/D = 0.05; errors as friction_colebrook().
/// @par Validity
/// As the laminar law and Colebrook-White.
/// @par Accuracy
/// Colebrook branch as friction_colebrook() (at most 2 ulp measured on x86-64); laminar and
/// transition branches a few roundings.
/// @par Source
/// Laminar and Colebrook as above; the transition bridge is this library's own policy
/// (docs/pages/theory_friction.md: transition 2000-4000).
template <class T>
inline result<T> friction_factor(T reynolds, T relative_roughness, T laminar_constant = T(64)) {
  const status s = detail::friction_check(reynolds, relative_roughness);
  if (is_error(s)) return detail::fail<T>(s);
  if (!detail::finite(laminar_constant)) return detail::fail<T>(status::nonfinite);
  if (!(laminar_constant > T(0))) return detail::fail<T>(status::domain);
  const T lo = T(laminar_reynolds_limit), hi = T(turbulent_reynolds_limit);
  if (reynolds <= lo) {
    const T f = laminar_constant / reynolds;
    if (!detail::finite(f)) return detail::fail<T>(status::overflow);
    return {f, relative_roughness > detail::constant<T>(0.05L, "0.05") ? status::regime : status::ok};
  }
  if (reynolds < hi) {
    const T w = (reynolds - lo) / (hi - lo);
    const T f = (T(1) - w) * laminar_constant / lo + w * detail::colebrook_unchecked(hi, relative_roughness);
    return {f, status::transition};
  }
  const T f = detail::colebrook_unchecked(reynolds, relative_roughness);
  return {f, detail::friction_range(reynolds, relative_roughness, turbulent_reynolds_limit, 1e8, 0.05)};
}
/// @}

/// @name Pipe, tube or hose segment (Darcy-Weisbach)
/// @{

/// Flow state and pressure drop of one straight round segment.
template <class T>
struct [[nodiscard]] pipe_flow {
  T velocity_m_s;     ///< mean velocity v = 4q/(pi D^2), m/s (sign of q)
  T reynolds;         ///< Reynolds number rho |v| D / mu
  T friction_factor;  ///< Darcy friction factor (friction_factor()); +infinity at zero flow
  T dp_pa;            ///< pressure drop, Pa (sign of q)
  pumploss::status st;  ///< status of the calculation
  /// @return true when the status is exactly ok.
  bool ok() const noexcept { return st == pumploss::status::ok; }
  /// @return true when the results are usable (ok or a report such as regime).
  bool usable() const noexcept { return pumploss::is_usable(st); }
};

/// Mean velocity in a round bore: \f$ v = 4q/(\pi D^2) \f$.
/// @param q_m3_s volume flow, m^3/s (any sign)
/// @param diameter_m inside diameter D, m, > 0
/// @return v in m/s; status::domain for D <= 0; status::nonfinite for NaN/inf.
/// @par Accuracy
/// A few roundings.
/// @par Source
/// Definition (continuity).
template <class T, detail::if_real<T> = 0>
inline result<T> pipe_velocity(T q_m3_s, T diameter_m) {
  if (!detail::all_finite(q_m3_s, diameter_m)) return detail::fail<T>(status::nonfinite);
  if (!(diameter_m > T(0))) return detail::fail<T>(status::domain);
  const T v = 4 * q_m3_s / (detail::pi<T>() * diameter_m * diameter_m);
  if (!detail::finite(v)) return detail::fail<T>(status::overflow);
  return {v, status::ok};
}

/// Reynolds number of flow in a round bore: \f$ Re = \frac{4 \rho |q|}{\pi \mu D} \f$.
/// @param q_m3_s volume flow, m^3/s (any sign; |q| is used)
/// @param rho_kg_m3 density, kg/m^3, > 0
/// @param mu_pa_s dynamic viscosity, Pa s, > 0
/// @param diameter_m inside diameter, m, > 0
/// @return Re; status::domain for a non-positive density, viscosity or diameter.
/// @par Accuracy
/// A few roundings.
/// @par Source
/// Definition: Re = 4q/(pi D nu).
template <class T, detail::if_real<T> = 0>
inline result<T> pipe_reynolds(T q_m3_s, T rho_kg_m3, T mu_pa_s, T diameter_m) {
  using std::fabs;
  if (!detail::all_finite(q_m3_s, rho_kg_m3, mu_pa_s, diameter_m)) return detail::fail<T>(status::nonfinite);
  if (!(rho_kg_m3 > T(0)) || !(mu_pa_s > T(0)) || !(diameter_m > T(0))) return detail::fail<T>(status::domain);
  const T re = 4 * rho_kg_m3 * fabs(q_m3_s) / (detail::pi<T>() * mu_pa_s * diameter_m);
  if (!detail::finite(re)) return detail::fail<T>(status::overflow);
  return {re, status::ok};
}

/// Darcy-Weisbach pressure drop of a straight round pipe, tube or hose.
///
/// \f[ \Delta p = f(Re, \varepsilon/D)\,\frac{L}{D}\,\frac{\rho v |v|}{2}, \qquad
///     v = \frac{4q}{\pi D^2}, \qquad Re = \frac{\rho |v| D}{\mu} \f]
/// with f from friction_factor(); in the laminar branch the equivalent Hagen-Poiseuille form
/// \f$ \Delta p = \frac{C}{64}\,\frac{128 \mu L q}{\pi D^4} \f$ is used (exact at q -> 0).
///
/// @param q_m3_s volume flow q, m^3/s (any sign: the drop has the sign of q)
/// @param rho_kg_m3 density rho, kg/m^3, > 0
/// @param mu_pa_s dynamic viscosity mu, Pa s, > 0
/// @param diameter_m inside diameter D, m, > 0
/// @param length_m length L, m, >= 0
/// @param roughness_m absolute roughness epsilon, m, 0 <= epsilon <= D (drawn tube about
///        1.5e-6 m, commercial steel 4.5e-5 m; common practice values)
/// @param laminar_constant C of the laminar law, > 0 (default 64)
/// @return velocity, Reynolds number, friction factor and pressure drop with a status:
///         status::transition for 2000 < Re < 4000; status::regime for Re > 1e8 or
///         epsilon/D > 0.05; status::domain for D <= 0, L < 0, rho <= 0, mu <= 0, epsilon < 0
///         or epsilon > D; status::nonfinite for NaN/inf; status::overflow when not representable.
/// @par Validity
/// Incompressible, isothermal, fully developed flow of a Newtonian fluid; entrance effects
/// belong to fittings (entrance K).
/// @par Accuracy
/// Friction factor as friction_factor(); the rest a few roundings (within 1e-15 relative of
/// the 50-digit evaluation, tests/friction_test.cpp).
/// @par Source
/// Darcy-Weisbach equation (e.g. F. M. White, Fluid Mechanics, 7th ed., McGraw-Hill 2011,
/// Eq. 6.10); docs/pages/theory_friction.md.
template <class T>
inline pipe_flow<T> pipe_pressure_drop(T q_m3_s, T rho_kg_m3, T mu_pa_s, T diameter_m, T length_m, T roughness_m,
                                       T laminar_constant = T(64)) {
  using std::fabs;
  const T nan = scalar_traits<T>::nan();
  auto fail = [&](status s) { return pipe_flow<T>{nan, nan, nan, nan, s}; };
  if (!detail::all_finite(q_m3_s, rho_kg_m3, mu_pa_s, diameter_m, length_m, roughness_m, laminar_constant))
    return fail(status::nonfinite);
  if (!(rho_kg_m3 > T(0)) || !(mu_pa_s > T(0)) || !(diameter_m > T(0)) || !(length_m >= T(0)) ||
      !(roughness_m >= T(0)) || roughness_m > diameter_m || !(laminar_constant > T(0)))
    return fail(status::domain);
  const T area = detail::pi<T>() * diameter_m * diameter_m / 4;
  const T v = q_m3_s / area;
  const T re = rho_kg_m3 * fabs(v) * diameter_m / mu_pa_s;
  if (!detail::all_finite(v, re)) return fail(status::overflow);
  const T rr = roughness_m / diameter_m;
  if (q_m3_s == T(0)) {
    return {T(0), T(0), std::numeric_limits<T>::infinity(), T(0),
            rr > detail::constant<T>(0.05L, "0.05") ? status::regime : status::ok};
  }
  const auto f = friction_factor(re, rr, laminar_constant);
  if (is_error(f.st)) return fail(f.st);
  T dp;
  if (re <= T(laminar_reynolds_limit)) {
    // Hagen-Poiseuille: dp = (C/64) * 128 mu L q / (pi D^4) = C mu L v / (2 D^2)
    dp = laminar_constant * mu_pa_s * length_m * v / (2 * diameter_m * diameter_m);
  } else {
    dp = f.value * (length_m / diameter_m) * rho_kg_m3 * v * fabs(v) / 2;
  }
  if (!detail::finite(dp)) return fail(status::overflow);
  return {v, re, f.value, dp, f.st};
}
/// @}

// Mixed argument types (an int literal beside doubles), promoted as Boost.Math promotes:
// one line per public template whose parameters are all scalars (promote.hpp).
PUMPLOSS_PROMOTE(friction_churchill)
PUMPLOSS_PROMOTE(friction_colebrook)
PUMPLOSS_PROMOTE(friction_haaland)
PUMPLOSS_PROMOTE(friction_swamee_jain)
PUMPLOSS_PROMOTE(pipe_reynolds)
PUMPLOSS_PROMOTE(pipe_velocity)

}  // namespace pumploss

#endif
