/// @file roots.hpp
/// @brief The one root-finding toolbox of the library: bracket expansion, Brent's method,
/// Newton's method safeguarded by bisection, and the implicit-function rule that carries
/// dual-number derivatives through a root found in the value type.
///
/// Every solver takes its iteration cap from the caller (callers pass
/// scalar_traits<T>::max_iterations, never a literal) and reports the iterations it used and a
/// status: ok, no_convergence at the cap, nonfinite when the function returned NaN or infinity
/// (the caller's own status then says why), domain when the bracket holds no sign change.
#ifndef PUMPLOSS_DETAIL_ROOTS_HPP
#define PUMPLOSS_DETAIL_ROOTS_HPP

#include <cmath>
#include <cstddef>
#include <type_traits>

#include "../dual.hpp"
#include "../scalar_traits.hpp"
#include "../status.hpp"

namespace pumploss {
namespace detail {

/// A root and how it was found.
template <class T>
struct [[nodiscard]] root_result {
  T x;             ///< the root (the last iterate on no_convergence)
  int iterations;  ///< function evaluations used by the iteration itself
  pumploss::status st;  ///< ok, no_convergence, nonfinite or domain
};

/// A bracket [a, b] with f(a) and f(b) of opposite signs (or one of them zero).
template <class T>
struct [[nodiscard]] bracket {
  T a;             ///< the end moved from
  T fa;            ///< f(a)
  T b;             ///< the end that closed the bracket
  T fb;            ///< f(b)
  int iterations;  ///< steps taken
  pumploss::status st;  ///< ok, no_convergence (no sign change within the cap) or nonfinite
};

/// A function value with its derivative, for newton_bisect().
template <class T>
struct value_slope {
  T f;   ///< f(x)
  T df;  ///< f'(x)
};

/// Widens a bracket: from x with f(x) = fx, steps x -> step(x) until f changes sign.
/// @param f the function (returns NaN or infinity on failure)
/// @param x the start
/// @param fx f(x)
/// @param step the next trial point (x * 2, x - 1, ...)
/// @param max_iterations the cap on steps
/// @return the last two points; st ok when f(b) has the other sign than f(x) (or is zero)
template <class T, class F, class Step>
inline bracket<T> expand_bracket(F&& f, T x, T fx, Step&& step, int max_iterations) {
  if (!finite(fx)) return {x, fx, x, fx, 0, status::nonfinite};
  const bool positive = fx > T(0);
  T a = x, fa = fx;
  for (int i = 1; i <= max_iterations; ++i) {
    const T b = step(a);
    const T fb = f(b);
    if (!finite(fb)) return {a, fa, b, fb, i, status::nonfinite};
    if (fb == T(0) || (fb > T(0)) != positive) return {a, fa, b, fb, i, status::ok};
    a = b;
    fa = fb;
  }
  return {a, fa, a, fa, max_iterations, status::no_convergence};
}

/// Brent's method (inverse quadratic interpolation, secant and bisection) on a bracket.
/// @param f the function (returns NaN or infinity on failure)
/// @param a one end
/// @param b the other end
/// @param fa f(a)
/// @param fb f(b), of the opposite sign of fa (or one of them zero)
/// @param rel_tol relative tolerance on x (4 epsilon is the usual choice)
/// @param abs_tol absolute tolerance on x (for roots near zero)
/// @param max_iterations the cap on evaluations
/// @return the root; status::domain without a sign change
/// @par Source
/// R. P. Brent, Algorithms for Minimization without Derivatives, Prentice-Hall 1973, ch. 4
/// (algorithm zero).
template <class T, class F>
inline root_result<T> brent(F&& f, T a, T b, T fa, T fb, T rel_tol, T abs_tol, int max_iterations) {
  using std::fabs;
  if (!all_finite(a, b, fa, fb)) return {scalar_traits<T>::nan(), 0, status::nonfinite};
  if (fa == T(0)) return {a, 0, status::ok};
  if (fb == T(0)) return {b, 0, status::ok};
  if ((fa > T(0)) == (fb > T(0))) return {scalar_traits<T>::nan(), 0, status::domain};
  T c = a, fc = fa, d = b - a, e = d;
  for (int it = 1; it <= max_iterations; ++it) {
    if ((fb > T(0)) == (fc > T(0))) {
      c = a;
      fc = fa;
      d = e = b - a;
    }
    if (fabs(fc) < fabs(fb)) {
      a = b;
      b = c;
      c = a;
      fa = fb;
      fb = fc;
      fc = fa;
    }
    const T tol = rel_tol * fabs(b) / 2 + abs_tol / 2;
    const T m = (c - b) / 2;
    if (fabs(m) <= tol || fb == T(0)) return {b, it - 1, status::ok};
    if (fabs(e) >= tol && fabs(fa) > fabs(fb)) {
      T p, q;
      const T s = fb / fa;
      if (a == c) {  // secant
        p = 2 * m * s;
        q = T(1) - s;
      } else {  // inverse quadratic interpolation
        const T qa = fa / fc, r = fb / fc;
        p = s * (2 * m * qa * (qa - r) - (b - a) * (r - T(1)));
        q = (qa - T(1)) * (r - T(1)) * (s - T(1));
      }
      if (p > T(0)) q = -q; else p = -p;
      if (2 * p < 3 * m * q - fabs(tol * q) && p < fabs(e * q / 2)) {
        e = d;
        d = p / q;
      } else {
        d = m;
        e = m;
      }
    } else {
      d = m;
      e = m;
    }
    a = b;
    fa = fb;
    b += (fabs(d) > tol) ? d : (m > T(0) ? tol : -tol);
    fb = f(b);
    if (!finite(fb)) return {b, it, status::nonfinite};
  }
  return {b, max_iterations, status::no_convergence};
}

/// Newton's method kept inside a bracket: a step that leaves [lo, hi] becomes a bisection.
/// Precondition: f(lo) <= 0 <= f(hi) (negate a decreasing function).
/// @param fdf returns f(x) and f'(x) (NaN or infinity on failure)
/// @param lo lower end
/// @param hi upper end
/// @param x the start, inside [lo, hi]
/// @param rel_tol relative tolerance on x
/// @param max_iterations the cap on evaluations
/// @return the root
template <class T, class FDF>
inline root_result<T> newton_bisect(FDF&& fdf, T lo, T hi, T x, T rel_tol, int max_iterations) {
  using std::fabs;
  for (int it = 1; it <= max_iterations; ++it) {
    const value_slope<T> v = fdf(x);
    if (!finite(v.f)) return {x, it, status::nonfinite};
    if (v.f == T(0)) return {x, it, status::ok};
    if (v.f > T(0)) hi = x; else lo = x;
    T xn = x - v.f / v.df;
    if (!(xn > lo && xn < hi)) xn = (lo + hi) / 2;
    if (fabs(xn - x) <= rel_tol * fabs(xn) || hi - lo <= rel_tol * fabs(hi)) return {xn, it, status::ok};
    x = xn;
  }
  return {x, max_iterations, status::no_convergence};
}

/// The implicit-function rule: given the root x0 (found in the value type) of F(x, p...) = 0,
/// the root in T with derivatives dx/dp = -F_p / F_x, where F_p comes from one evaluation of F
/// in T at the constant x0 and F_x from one evaluation with x seeded in a one-direction dual
/// number of the value type. For a T that is not a dual number x0 is returned unchanged.
/// @param x0 the root in the value type
/// @param residual a generic callable residual(x, p...) evaluated for each scalar type
/// @param p the parameters in T (their derivative parts are the seeds)
/// @return x0 with the derivatives of the root
/// @par Source
/// Implicit function theorem (e.g. W. Rudin, Principles of Mathematical Analysis, 3rd ed.,
/// McGraw-Hill 1976, theorem 9.28); forward-mode use as in A. Griewank, A. Walther,
/// Evaluating Derivatives, 2nd ed., SIAM 2008, section 15.1.
template <class T, class R, class... P>
inline T implicit_root(const value_type_of_t<T>& x0, R&& residual, const P&... p) {
  if constexpr (!is_dual_v<T>) {
    return x0;
  } else {
    using V = value_type_of_t<T>;
    using D1 = dual<V, 1>;
    const T fp = residual(T(x0), p...);
    const D1 fx = residual(D1::variable(x0, 0), D1(primal(p))...);
    T x(x0);
    for (std::size_t i = 0; i < sizeof(x.d) / sizeof(x.d[0]); ++i) x.d[i] = -fp.d[i] / fx.d[0];
    return x;
  }
}

}  // namespace detail
}  // namespace pumploss

#endif
