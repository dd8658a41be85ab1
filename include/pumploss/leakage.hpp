/// @file leakage.hpp
/// @brief Leakage scaling with pressure and viscosity: the laminar law, a fitted power law,
/// normalising case drain readings to a reference state, laminar plus square-law paths in series,
/// and splitting drain readings into viscous, orifice-like and constant parts.
///
/// SI: flow in m^3/s, pressure in Pa, dynamic viscosity in Pa s, temperature in K.
#ifndef PUMPLOSS_LEAKAGE_HPP
#define PUMPLOSS_LEAKAGE_HPP

#include <cmath>
#include <cstddef>

#include "detail/lsq.hpp"
#include "fluid.hpp"
#include "scalar_traits.hpp"
#include "status.hpp"

namespace pumploss {

/// Laminar leakage law: leakage at another pressure and viscosity from one known reading.
///
/// \f[ q = q_\mathrm{ref}\,\frac{\Delta p}{\Delta p_\mathrm{ref}}\,\frac{\mu_\mathrm{ref}}{\mu} \f]
///
/// @param q_ref_m3_s known leakage, m^3/s, >= 0
/// @param dp_ref_pa pressure difference of the known reading, Pa, > 0
/// @param mu_ref_pa_s dynamic viscosity of the known reading, Pa s, > 0
/// @param dp_pa pressure difference wanted, Pa, >= 0
/// @param mu_pa_s dynamic viscosity wanted, Pa s, > 0
/// @return leakage in m^3/s; status::domain for out-of-range values; status::nonfinite;
///         status::overflow.
/// @par Validity
/// Laminar gap flow at unchanged gap (thermal change of clearances ignored).
/// @par Accuracy
/// Within 3 ulp of the 50-digit evaluation (tests/leakage_test.cpp).
/// @par Source
/// Laminar gap flow q = G h^3 dp / mu (docs/pages/theory_efficiency.md, leakage scaling).
template <class T, detail::if_real<T> = 0>
inline result<T> leakage_scale(T q_ref_m3_s, T dp_ref_pa, T mu_ref_pa_s, T dp_pa, T mu_pa_s) {
  if (!detail::all_finite(q_ref_m3_s, dp_ref_pa, mu_ref_pa_s, dp_pa, mu_pa_s)) return detail::fail<T>(status::nonfinite);
  if (!(q_ref_m3_s >= T(0)) || !(dp_ref_pa > T(0)) || !(mu_ref_pa_s > T(0)) || !(dp_pa >= T(0)) || !(mu_pa_s > T(0)))
    return detail::fail<T>(status::domain);
  const T q = q_ref_m3_s * (dp_pa / dp_ref_pa) * (mu_ref_pa_s / mu_pa_s);
  if (!detail::finite(q)) return detail::fail<T>(status::overflow);
  return {q, status::ok};
}

/// Power-law leakage scaling \f$ q = k\,\Delta p^a \mu^{-b} \f$ from one known reading:
///
/// \f[ q = q_\mathrm{ref}\left(\frac{\Delta p}{\Delta p_\mathrm{ref}}\right)^a
///         \left(\frac{\mu_\mathrm{ref}}{\mu}\right)^b \f]
///
/// @param q_ref_m3_s known leakage, m^3/s, >= 0
/// @param dp_ref_pa its pressure difference, Pa, > 0
/// @param mu_ref_pa_s its dynamic viscosity, Pa s, > 0
/// @param dp_pa pressure difference wanted, Pa, >= 0
/// @param mu_pa_s dynamic viscosity wanted, Pa s, > 0
/// @param a pressure exponent (1 laminar, 0.5 orifice-like), in [0, 2]
/// @param b viscosity exponent (1 laminar, 0 orifice-like), in [0, 2]
/// @return leakage in m^3/s; status::domain for exponents outside [0, 2] or bad values.
/// @par Accuracy
/// Within 8 ulp of the 50-digit evaluation.
/// @par Source
/// Empirical power law (docs/pages/theory_efficiency.md, leakage scaling).
template <class T, detail::if_real<T> = 0>
inline result<T> leakage_scale_power_law(T q_ref_m3_s, T dp_ref_pa, T mu_ref_pa_s, T dp_pa, T mu_pa_s, T a, T b) {
  using std::pow;
  if (!detail::all_finite(q_ref_m3_s, dp_ref_pa, mu_ref_pa_s, dp_pa, mu_pa_s, a, b))
    return detail::fail<T>(status::nonfinite);
  if (!(q_ref_m3_s >= T(0)) || !(dp_ref_pa > T(0)) || !(mu_ref_pa_s > T(0)) || !(dp_pa >= T(0)) ||
      !(mu_pa_s > T(0)) || !(a >= T(0)) || !(a <= T(2)) || !(b >= T(0)) || !(b <= T(2)))
    return detail::fail<T>(status::domain);
  const T q = q_ref_m3_s * pow(dp_pa / dp_ref_pa, a) * pow(mu_ref_pa_s / mu_pa_s, b);
  if (!detail::finite(q)) return detail::fail<T>(status::overflow);
  return {q, status::ok};
}

/// Normalise a case drain reading to a reference pressure and temperature so readings taken on
/// different days compare: viscosity from the oil's ASTM D341 line and density model.
///
/// \f[ q_\mathrm{ref} = q\left(\frac{\Delta p_\mathrm{ref}}{\Delta p}\right)^a
///     \left(\frac{\mu(\theta)}{\mu(\theta_\mathrm{ref})}\right)^b,\qquad
///     \mu(\theta) = \rho(\theta)\,\nu_{D341}(\theta) \f]
///
/// @param q_m3_s drain reading, m^3/s, >= 0
/// @param dp_pa pressure difference of the reading, Pa, > 0
/// @param t_k oil temperature governing the gaps at the reading (case or drain), K, > 0
/// @param dp_ref_pa reference pressure difference, Pa, > 0
/// @param t_ref_k reference temperature, K, > 0
/// @param o the oil (D341 line and density model; fluid.hpp); viscosity taken at zero gauge
///        pressure
/// @param a pressure exponent, in [0, 2] (1 for the laminar law)
/// @param b viscosity exponent, in [0, 2] (1 for the laminar law)
/// @return the normalised drain flow in m^3/s; statuses of oil_dynamic_viscosity() (e.g. regime
///         for very thin oil) and leakage_scale_power_law().
/// @par Validity
/// Laminar gaps (a = b = 1) unless fitted exponents are given; gap changes with temperature
/// ignored.
/// @par Accuracy
/// Readings generated at 20-80 degC from one laminar leakage collapse to 1e-14 relative
/// (tests/leakage_test.cpp).
/// @par Source
/// docs/pages/theory_efficiency.md (normalisation) with ASTM D341 and the density model of docs/pages/theory_fluid.md.
template <class T>
inline result<T> leakage_normalise(T q_m3_s, T dp_pa, T t_k, T dp_ref_pa, T t_ref_k, const oil<T>& o, T a, T b) {
  if (!detail::all_finite(q_m3_s, dp_pa, t_k, dp_ref_pa, t_ref_k)) return detail::fail<T>(status::nonfinite);
  if (!(dp_pa > T(0)) || !(dp_ref_pa > T(0)) || !(t_k > T(0)) || !(t_ref_k > T(0)))
    return detail::fail<T>(status::domain);
  const auto mu = oil_dynamic_viscosity(o, t_k, T(0));
  if (is_error(mu.st)) return mu;
  const auto mu_ref = oil_dynamic_viscosity(o, t_ref_k, T(0));
  if (is_error(mu_ref.st)) return mu_ref;
  const auto q = leakage_scale_power_law(q_m3_s, dp_pa, mu.value, dp_ref_pa, mu_ref.value, a, b);
  if (is_error(q.st)) return q;
  return {q.value, worst(q.st, worst(mu.st, mu_ref.st))};
}

/// Leakage through a laminar resistance and a square-law (orifice-like) resistance in series,
/// \f$ \Delta p = R_\mathrm{lam} q + R_t q^2 \f$, solved in the cancellation-free form
///
/// \f[ q = \frac{2\Delta p}{R_\mathrm{lam} + \sqrt{R_\mathrm{lam}^2 + 4 R_t \Delta p}} \f]
///
/// @param r_lam_pa_s_m3 laminar resistance, Pa s/m^3, >= 0
/// @param r_t_pa_s2_m6 square-law resistance, Pa s^2/m^6, >= 0 (not both zero)
/// @param dp_pa pressure difference, Pa, >= 0
/// @return flow in m^3/s; status::domain for negative values or both resistances zero.
/// @par Accuracy
/// Within 4 ulp of the 50-digit evaluation, also where R_t dp << R_lam^2.
/// @par Source
/// Quadratic of laminar and square-law resistances in series (docs/pages/theory_efficiency.md), rearranged to avoid cancellation.
template <class T, detail::if_real<T> = 0>
inline result<T> leakage_series(T r_lam_pa_s_m3, T r_t_pa_s2_m6, T dp_pa) {
  using std::sqrt;
  if (!detail::all_finite(r_lam_pa_s_m3, r_t_pa_s2_m6, dp_pa)) return detail::fail<T>(status::nonfinite);
  if (!(r_lam_pa_s_m3 >= T(0)) || !(r_t_pa_s2_m6 >= T(0)) || !(dp_pa >= T(0)) ||
      !(r_lam_pa_s_m3 > T(0) || r_t_pa_s2_m6 > T(0)))
    return detail::fail<T>(status::domain);
  const T den = r_lam_pa_s_m3 + sqrt(r_lam_pa_s_m3 * r_lam_pa_s_m3 + 4 * r_t_pa_s2_m6 * dp_pa);
  if (!(den > T(0))) return {T(0), status::ok};
  return {2 * dp_pa / den, status::ok};
}

/// A fitted leakage power law \f$ q = k\,\Delta p^a \mu^{-b} \f$ with its diagnostics.
template <class T>
struct [[nodiscard]] leakage_power_law {
  T k;        ///< coefficient k, m^3/s / (Pa^a (Pa s)^-b)
  T a;        ///< pressure exponent
  T b;        ///< viscosity exponent
  T u_ln_k;   ///< standard error of ln k
  T u_a;      ///< standard error of a
  T u_b;      ///< standard error of b
  T rms_log;  ///< RMS residual of ln q (about the relative RMS error)
  T cond;     ///< condition number of the column-scaled design matrix (1-norm of R)
  status st;  ///< ok, ill_conditioned (report), or an error (insufficient_data, domain, ...)
  /// @return true when the status is exactly ok.
  bool ok() const noexcept { return st == pumploss::status::ok; }
  /// @return true when the results are usable (ok or a report such as regime).
  bool usable() const noexcept { return pumploss::is_usable(st); }
};

/// Workspace (number of T values) that leakage_fit_power_law() and leakage_split() need for
/// `count` readings.
/// @param count number of readings
/// @return the workspace length, 7 * count
constexpr std::size_t leakage_fit_workspace(std::size_t count) noexcept { return 7 * count; }

/// Fit the power law \f$ q = k\,\Delta p^a \mu^{-b} \f$ to drain readings by linear least squares
/// in logarithms (relative-error weighting):
///
/// \f[ \ln q = \ln k + a \ln \Delta p - b \ln \mu \f]
///
/// Householder QR with column scaling; never the normal equations.
///
/// @param q_m3_s array of readings, m^3/s, > 0
/// @param dp_pa array of pressure differences, Pa, > 0
/// @param mu_pa_s array of dynamic viscosities at the gaps, Pa s, > 0
/// @param count number of readings, >= 4; pressure and viscosity must both vary
/// @param work caller's workspace of leakage_fit_workspace(count) values
/// @return the fit; status::ill_conditioned when the condition number exceeds 1e8 (pressure and
///         viscosity varied together); status::insufficient_data for too few or degenerate points
///         (e.g. one viscosity only); status::domain for non-positive readings; status::misuse for
///         null arrays.
/// @par Accuracy
/// Exact synthetic data recovered to 1e-12 (tests/leakage_test.cpp); agrees with
/// numpy.linalg.lstsq (tests/python/test_efficiency_lsq.py).
/// @par Source
/// docs/pages/theory_efficiency.md (empirical power law fitted in logarithms).
template <class T>
inline leakage_power_law<T> leakage_fit_power_law(const T* q_m3_s, const T* dp_pa, const T* mu_pa_s, std::size_t count,
                                                  T* work) {
  using std::exp;
  using std::log;
  using std::sqrt;
  const T nan = scalar_traits<T>::nan();
  leakage_power_law<T> r{nan, nan, nan, nan, nan, nan, nan, nan, status::misuse};
  if (q_m3_s == nullptr || dp_pa == nullptr || mu_pa_s == nullptr || work == nullptr) return r;
  for (std::size_t i = 0; i < count; ++i) {
    if (!detail::all_finite(q_m3_s[i], dp_pa[i], mu_pa_s[i])) {
      r.st = status::nonfinite;
      return r;
    }
    if (!(q_m3_s[i] > T(0)) || !(dp_pa[i] > T(0)) || !(mu_pa_s[i] > T(0))) {
      r.st = status::domain;
      return r;
    }
  }
  if (count < 4) {
    r.st = status::insufficient_data;
    return r;
  }
  T* a = work;
  T* y = work + 3 * count;
  for (std::size_t i = 0; i < count; ++i) {
    a[i] = T(1);
    a[count + i] = log(dp_pa[i]);
    a[2 * count + i] = -log(mu_pa_s[i]);
    y[i] = log(q_m3_s[i]);
  }
  const auto f = detail::householder_lsq(a, count, 3, y, detail::constant<T>(1e8L, "100000000"));
  if (is_error(f.st)) {
    r.st = f.st;
    return r;
  }
  r.k = exp(f.x[0]);
  r.a = f.x[1];
  r.b = f.x[2];
  r.u_ln_k = f.se[0];
  r.u_a = f.se[1];
  r.u_b = f.se[2];
  r.rms_log = sqrt(f.rss / T(static_cast<double>(count)));
  r.cond = f.cond;
  r.st = f.st;
  return r;
}

/// Drain readings split into a viscous, an orifice-like and a constant part.
template <class T>
struct [[nodiscard]] leakage_split_result {
  T c_viscous;   ///< coefficient of dp/mu, m^3 (q_visc = c dp / mu)
  T c_orifice;   ///< coefficient of sqrt(dp), m^3/(s Pa^0.5)
  T c_constant;  ///< constant part, m^3/s
  T rms;         ///< RMS residual, m^3/s
  int iterations;///< active-set iterations used
  status st;     ///< ok or an error (no_convergence, insufficient_data, domain, misuse, nonfinite)
  /// @return true when the status is exactly ok.
  bool ok() const noexcept { return st == pumploss::status::ok; }
  /// @return true when the results are usable (ok or a report such as regime).
  bool usable() const noexcept { return pumploss::is_usable(st); }
};

/// Split drain readings into a viscous part (laminar gaps, dp/mu), an orifice-like part
/// (sqrt(dp)) and a constant part by non-negative least squares:
///
/// \f[ \min_{c \ge 0} \sum_k \left(q_k - c_v \frac{\Delta p_k}{\mu_k} - c_o \sqrt{\Delta p_k} - c_0\right)^2 \f]
///
/// Lawson-Hanson active-set algorithm with at most 9 outer and 9 inner iterations; each
/// sub-problem by Householder QR.
///
/// @param q_m3_s array of readings, m^3/s, >= 0
/// @param dp_pa array of pressure differences, Pa, > 0
/// @param mu_pa_s array of dynamic viscosities, Pa s, > 0
/// @param count number of readings, >= 4
/// @param work caller's workspace of leakage_fit_workspace(count) values
/// @return the three non-negative parts; status::no_convergence at the iteration cap;
///         status::insufficient_data for too few or degenerate readings.
/// @par Validity
/// The three shapes must be distinguishable: vary pressure and temperature.
/// @par Accuracy
/// Agrees with scipy.optimize.nnls to 1e-9 relative (tests/python/test_efficiency_lsq.py).
/// @par Source
/// C. L. Lawson, R. J. Hanson, Solving Least Squares Problems, Prentice-Hall 1974, ch. 23
/// (algorithm NNLS); model terms of docs/pages/theory_efficiency.md.
template <class T>
inline leakage_split_result<T> leakage_split(const T* q_m3_s, const T* dp_pa, const T* mu_pa_s, std::size_t count,
                                             T* work) {
  using std::sqrt;
  const T nan = scalar_traits<T>::nan();
  leakage_split_result<T> r{nan, nan, nan, nan, 0, status::misuse};
  if (q_m3_s == nullptr || dp_pa == nullptr || mu_pa_s == nullptr || work == nullptr) return r;
  for (std::size_t i = 0; i < count; ++i) {
    if (!detail::all_finite(q_m3_s[i], dp_pa[i], mu_pa_s[i])) {
      r.st = status::nonfinite;
      return r;
    }
    if (!(q_m3_s[i] >= T(0)) || !(dp_pa[i] > T(0)) || !(mu_pa_s[i] > T(0))) {
      r.st = status::domain;
      return r;
    }
  }
  if (count < 4) {
    r.st = status::insufficient_data;
    return r;
  }
  T* a = work;
  for (std::size_t i = 0; i < count; ++i) {
    a[i] = dp_pa[i] / mu_pa_s[i];
    a[count + i] = sqrt(dp_pa[i]);
    a[2 * count + i] = T(1);
  }
  const auto f = detail::nnls(a, count, 3, q_m3_s, work + 3 * count);
  r.iterations = f.iterations;
  if (is_error(f.st)) {
    r.st = f.st;
    return r;
  }
  r.c_viscous = f.x[0];
  r.c_orifice = f.x[1];
  r.c_constant = f.x[2];
  r.rms = sqrt(f.rss / T(static_cast<double>(count)));
  r.st = f.st;
  return r;
}

// Mixed argument types (an int literal beside doubles), promoted as Boost.Math promotes:
// one line per public template whose parameters are all scalars (promote.hpp).
PUMPLOSS_PROMOTE(leakage_scale)
PUMPLOSS_PROMOTE(leakage_scale_power_law)
PUMPLOSS_PROMOTE(leakage_series)

}  // namespace pumploss

#endif
