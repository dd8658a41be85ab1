/// @file eccentric_annulus.hpp
/// @brief Internals of gap.hpp: the exact laminar flow through an eccentric annulus, rewritten
/// without cancellation (series, Euler-Maclaurin tail, trigamma remainder, coefficient tables).
///
/// Not public API: gap_annulus_flow(), gap_annulus_clearance() and gap_piston_leakage() are.
/// Formula: bipolar-coordinate series of N. A. V. Piercy, M. S. Hooper, H. F. Winny, Phil. Mag.
/// 15 (1933), as given in F. M. White, Viscous Fluid Flow (see docs/pages/theory_gap.md).
#ifndef PUMPLOSS_DETAIL_ECCENTRIC_ANNULUS_HPP
#define PUMPLOSS_DETAIL_ECCENTRIC_ANNULUS_HPP

#include <cmath>
#include <type_traits>

#include "../scalar_traits.hpp"
#include "gap_tables.hpp"

namespace pumploss {
namespace detail {

template <class T>
inline T tab(const table_entry& e) {
  return constant<T>(e.v, e.s);
}

/// sinh(d)/d - 1 without cancellation (series with positive terms for |d| <= 1).
template <class T>
inline T sinhc_m1(T d) {
  using std::fabs;
  using std::sinh;
  if (fabs(d) > T(1)) return sinh(d) / d - T(1);
  const T d2 = d * d;
  const T eps = scalar_traits<T>::epsilon();
  T term = d2 / T(6), sum = term;
  for (int k = 2; k < 60 && term > eps * sum; ++k) {
    term *= d2 / T((2 * k) * (2 * k + 1));
    sum += term;
  }
  return sum;
}

/// ln(1 + h/b) = ln(a/b).
template <class T>
inline T log1p_ratio(T h, T b) {
  using std::log1p;
  return log1p(h / b);
}

/// cosh(d) - 1 = 2 sinh^2(d/2).
template <class T>
inline T cosh_m1(T d) {
  using std::sinh;
  const T s = sinh(d / 2);
  return T(2) * s * s;
}

/// cosh(d) - sinh(d)/d = sum_k 2k d^(2k)/(2k+1)! (positive terms; no cancellation).
template <class T>
inline T cosh_minus_sinhc(T d) {
  using std::cosh;
  using std::fabs;
  using std::sinh;
  if (fabs(d) > T(2)) return cosh(d) - sinh(d) / d;
  const T d2 = d * d;
  const T eps = scalar_traits<T>::epsilon();
  T p = d2 / T(6);  // d^(2k)/(2k+1)!
  T sum = T(2) * p;
  for (int k = 2; k < 80; ++k) {
    p *= d2 / T((2 * k) * (2 * k + 1));
    const T term = T(2 * k) * p;
    sum += term;
    if (term <= eps * sum) break;
  }
  return sum;
}

/// r(w) = psi'(w + 1/2) - 1/w for w >= 1 (psi' = trigamma), without cancellation:
/// shift with psi'(z) = psi'(z+1) + 1/z^2, written so that each step adds
/// -1/(4 (w+1/2)^2 w (w+1)), then the asymptotic series
/// psi'(w+1/2) ~ 1/w - sum_k (1 - 2^(1-2k)) B_2k / w^(2k+1).
template <class T>
inline T trigamma_half_rem(T w) {
  using std::fabs;
  const int digits = scalar_traits<T>::digits10;
  const T w0 = T(digits <= 20 ? 12 : (digits * 9) / 10);
  const T eps = scalar_traits<T>::epsilon();
  T acc = T(0);
  while (w < w0) {
    const T wh = w + T(1) / 2;
    acc += T(1) / (wh * wh * w * (w + T(1)));
    w += T(1);
  }
  const T iw2 = T(1) / (w * w);
  T pw = T(1) / (w * w * w);
  T sum = T(0);
  for (int k = 0; k < 30; ++k) {
    const T term = tab<T>(kTrigammaHalfCoef[k]) * pw;
    sum -= term;
    if (fabs(term) <= eps * fabs(sum)) break;
    pw *= iw2;
  }
  return sum - acc / 4;
}

/// R = sum_{n>=2} x^n (n sinh D / sinh(nD) - 1), x = exp(-2 sigma), by direct summation with
/// a cancellation-free recurrence for u_n = sinh(nD) - n sinh(D) (sigma not small).
/// s1 = sinh(D), delta = cosh(D) - 1.
template <class T>
inline T ecc_sum_direct(T x, T s1, T delta) {
  const T eps = scalar_traits<T>::epsilon();
  T s = s1, d = s1, u = T(0), c = s1;  // s_n = sinh(nD), d_n = s_n - s_(n-1), u_n, C_n = sum s_j
  T xn = x, sum = T(0);
  const T two_delta = T(2) * delta;
  for (int n = 1; n < 4000; ++n) {
    d += two_delta * s;  // advance to n+1
    u += two_delta * c;
    s += d;
    c += s;
    xn *= x;
    const T term = xn * u / s;
    sum += term;
    // the term ratio tends to x < 1/e: the tail is below term/(1 - x)
    if (term <= eps * sum * (T(1) - x) / 16) break;
  }
  return -sum;
}

/// 1/m for m = 1..60 in T (exact table for built-in types, division otherwise).
template <class T>
inline T inv_int(int m) {
  if constexpr (std::is_arithmetic_v<T>) {
    static constexpr long double kInv[61] = {
        0.0L,      1.0L,      1.0L / 2,  1.0L / 3,  1.0L / 4,  1.0L / 5,  1.0L / 6,  1.0L / 7,  1.0L / 8,
        1.0L / 9,  1.0L / 10, 1.0L / 11, 1.0L / 12, 1.0L / 13, 1.0L / 14, 1.0L / 15, 1.0L / 16, 1.0L / 17,
        1.0L / 18, 1.0L / 19, 1.0L / 20, 1.0L / 21, 1.0L / 22, 1.0L / 23, 1.0L / 24, 1.0L / 25, 1.0L / 26,
        1.0L / 27, 1.0L / 28, 1.0L / 29, 1.0L / 30, 1.0L / 31, 1.0L / 32, 1.0L / 33, 1.0L / 34, 1.0L / 35,
        1.0L / 36, 1.0L / 37, 1.0L / 38, 1.0L / 39, 1.0L / 40, 1.0L / 41, 1.0L / 42, 1.0L / 43, 1.0L / 44,
        1.0L / 45, 1.0L / 46, 1.0L / 47, 1.0L / 48, 1.0L / 49, 1.0L / 50, 1.0L / 51, 1.0L / 52, 1.0L / 53,
        1.0L / 54, 1.0L / 55, 1.0L / 56, 1.0L / 57, 1.0L / 58, 1.0L / 59, 1.0L / 60};
    return static_cast<T>(kInv[m]);
  } else {
    return T(1) / T(m);
  }
}

/// The same sum R for small sigma by Euler-Maclaurin: integral (closed form with the trigamma
/// function) minus the endpoint corrections at y = 0 of g(y) = e^{-2 sigma y} phi(y),
/// phi(y) = y sinh(D)/sinh(yD) - 1.
template <class T>
inline T ecc_sum_em(T sigma, T dd, T g1) {
  using std::fabs;
  const T eps = scalar_traits<T>::epsilon();
  constexpr int kmax = 30;
  T phi[2 * kmax];  // Taylor coefficients of phi (even orders only are nonzero)
  T ex[2 * kmax];   // Taylor coefficients of exp(-2 sigma y)
  phi[0] = g1;
  ex[0] = T(1);
  const T dd2 = dd * dd;
  const T m2s = -T(2) * sigma;
  T dp = T(1);
  const T integral = g1 / (T(2) * sigma) + (T(1) + g1) * trigamma_half_rem(sigma / dd) / (T(2) * dd);
  T r = integral - g1 / 2;
  int have = 1;  // coefficients 0..have-1 are filled
  for (int k = 1; k <= kmax; ++k) {
    const int m = 2 * k - 1;
    for (; have <= m; ++have) {
      ex[have] = ex[have - 1] * m2s * inv_int<T>(have);
      if (have % 2 == 0) {
        dp *= dd2;
        phi[have] = (T(1) + g1) * tab<T>(kUSinhCoef[have / 2 - 1]) * dp;
      } else {
        phi[have] = T(0);
      }
    }
    T gm = T(0);
    for (int j = 0; j <= m; j += 2) gm += phi[j] * ex[m - j];
    const T term = tab<T>(kEmCoef[k - 1]) * gm;
    r -= term;
    if (k > 2 && fabs(term) <= eps * fabs(integral) / 16) break;
  }
  return r;
}

/// Bracket of the exact eccentric-annulus flow, B = a^4 - b^4 - 4c^2M^2/(beta-alpha) - 8 c^2 M^2
/// sum n e^{-n(beta+alpha)}/sinh(n(beta-alpha)), so that q = pi dp B/(8 mu L). Rewritten without
/// cancellation (sigma = (alpha+beta)/2, D = beta-alpha, P = sinh(alpha) sinh(beta) = M^2/(ab)):
/// B = a^3 b^3 c E / M^3 with
/// E = delta sinh(2 sigma)(cosh(2 sigma)+2) - delta^2 coth(sigma) - 4P^2 (g1 + 2R),
/// delta = cosh D - 1, g1 = sinh(D)/D - 1, R = sum_{n>=2} e^{-2n sigma}(n sinh D/sinh nD - 1).
/// sinh D = cM/(ab), sinh(2 sigma) = M(a+b)/(ab eps) and
/// cosh(2 sigma) = ((2-eps^2)(a+b)^2 - eps^2 h^2)/(4 eps^2 ab) are algebraic.
/// h = a - b is passed separately so that callers holding h exactly (the inverse problem) keep
/// its digits.
template <class T>
inline T eccentric_bracket_abh(T a, T b, T h, T eps) {
  using std::asinh;
  using std::sqrt;
  // concentric (and eccentricity too small to change the result at this precision)
  const T tiny = sqrt(scalar_traits<T>::epsilon()) / 100;
  if (eps < tiny) {
    const T dd = log1p_ratio(h, b);
    return T(2) * a * b * h * (a + b) * cosh_minus_sinhc(dd);
  }
  if (eps == T(1)) {
    // touching limit (M -> 0 with sigma/D -> w): closed form with the trigamma function
    const T w = (a + b) / (T(2) * h);
    const T f = T(1) - T(1) / (T(4) * w * w);
    const T w2 = w * w;
    const T e = T(3) / w2 - T(1) / (T(4) * w2 * w2) - T(4) * w * f * f * trigamma_half_rem(w);
    return a * a * b * b * e / (w * f * f);
  }
  const T c = eps * h;
  const T apb = a + b;
  const T m = sqrt((T(1) - eps) * (T(1) + eps) * (apb - c) * (apb + c)) / (T(2) * eps);
  const T ab = a * b;
  const T z = c * m / ab;                            // sinh D
  const T delta = z * z / (sqrt(T(1) + z * z) + T(1));  // cosh D - 1
  const T dd = asinh(z);
  const T g1 = sinhc_m1(dd);
  const T sh2 = m * apb / (ab * eps);                                                   // sinh(2 sigma)
  const T ch2 = ((T(2) - eps * eps) * apb * apb - eps * eps * h * h) / (T(4) * eps * eps * ab);  // cosh(2 sigma)
  const T p = m * m / ab;
  const int digits = scalar_traits<T>::digits10;
  const T sh2_em = digits <= 20 ? detail::constant<T>(1.1752011936438014569L, "1.17520119364380145688238185059560081515571798133409587022957")
                                : detail::constant<T>(0.6366535821482412711L, "0.636653582148241271123301400108017690050104935659658631296");
  // sinh(2 sigma) thresholds: sinh(1) (sigma = 1/2) for double, sinh(0.6) (sigma = 0.3) for wider types
  T r;
  if (sh2 < sh2_em) {
    const T sigma = asinh(sh2) / 2;
    r = ecc_sum_em(sigma, dd, g1);
  } else {
    r = ecc_sum_direct(T(1) / (ch2 + sh2), z, delta);
  }
  const T coth = (ch2 + T(1)) / sh2;
  const T e = delta * sh2 * (ch2 + T(2)) - delta * delta * coth - T(4) * p * p * (g1 + T(2) * r);
  return ab * ab * ab * c * e / (m * m * m);
}

/// eccentric_bracket_abh() with h = a - b.
template <class T>
inline T eccentric_bracket(T a, T b, T eps) {
  return eccentric_bracket_abh(a, b, T(a - b), eps);
}

/// The textbook concentric annulus bracket a^4 - b^4 - (a^2 - b^2)^2 / ln(a/b) as usually
/// written (cancels catastrophically for small gaps; kept for comparison and benchmarks).
template <class T>
inline T annulus_concentric_textbook_bracket(T a, T b) {
  using std::log;
  const T a2 = a * a, b2 = b * b;
  return a2 * a2 - b2 * b2 - (a2 - b2) * (a2 - b2) / log(a / b);
}

}  // namespace detail
}  // namespace pumploss

#endif
