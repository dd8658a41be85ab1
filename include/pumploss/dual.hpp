/// @file dual.hpp
/// @brief A forward-mode dual number with N directional derivatives, usable as the scalar type
/// T of every pumploss template (sensitivities for the GUM uncertainty propagation).
///
/// `dual<double, 5> x = dual<double, 5>::variable(3.0, 2)` seeds the third derivative slot; every
/// arithmetic operation and the math functions below (found by ADL after `using std::sqrt;`)
/// carry the derivatives along by the chain rule. Comparisons use the value only.
#ifndef PUMPLOSS_DUAL_HPP
#define PUMPLOSS_DUAL_HPP

#include <cmath>
#include <cstddef>
#include <limits>
#include <type_traits>

#include "scalar_traits.hpp"

namespace pumploss {

/// A forward-mode dual number: a value and N partial derivatives.
/// @tparam T the underlying floating type (double, long double, ...)
/// @tparam N the number of independent directions (inputs whose sensitivities are wanted)
template <class T, std::size_t N>
struct dual {
  T val{};       ///< The value.
  T d[N]{};      ///< The partial derivatives with respect to the N seeded inputs.

  /// Zero value, zero derivatives.
  constexpr dual() = default;
  /// A constant (all derivatives zero) from any arithmetic value.
  /// @param v the value
  template <class U, class = std::enable_if_t<std::is_arithmetic_v<U>>>
  constexpr dual(U v) : val(static_cast<T>(v)) {}  // NOLINT: implicit on purpose, like a scalar
  /// A constant from a value of the underlying type when it is not arithmetic (multiprecision).
  /// @param v the value
  template <class U = T, class = std::enable_if_t<!std::is_arithmetic_v<U>>, class = void>
  constexpr dual(const T& v) : val(v) {}  // NOLINT
  /// An independent variable: value v with derivative 1 in slot i.
  /// @param v the value
  /// @param i the slot (0 <= i < N)
  /// @return the seeded dual number
  static dual variable(const T& v, std::size_t i) {
    dual r;
    r.val = v;
    if (i < N) r.d[i] = T(1);
    return r;
  }

  /// Add another dual in place. @param o the other operand @return *this
  dual& operator+=(const dual& o) {
    val += o.val;
    for (std::size_t i = 0; i < N; ++i) d[i] += o.d[i];
    return *this;
  }
  /// Subtract another dual in place. @param o the other operand @return *this
  dual& operator-=(const dual& o) {
    val -= o.val;
    for (std::size_t i = 0; i < N; ++i) d[i] -= o.d[i];
    return *this;
  }
  /// Multiply by another dual in place. @param o the other operand @return *this
  dual& operator*=(const dual& o) {
    for (std::size_t i = 0; i < N; ++i) d[i] = d[i] * o.val + val * o.d[i];
    val *= o.val;
    return *this;
  }
  /// Divide by another dual in place. @param o the other operand @return *this
  dual& operator/=(const dual& o) {
    const T inv = T(1) / o.val;
    val *= inv;
    for (std::size_t i = 0; i < N; ++i) d[i] = (d[i] - val * o.d[i]) * inv;
    return *this;
  }
};

/// @name Arithmetic on dual numbers (value and derivatives by the chain rule)
/// @{

/// Unary plus. @param a operand @return a
template <class T, std::size_t N>
inline dual<T, N> operator+(const dual<T, N>& a) { return a; }
/// Negation. @param a operand @return -a
template <class T, std::size_t N>
inline dual<T, N> operator-(const dual<T, N>& a) {
  dual<T, N> r;
  r.val = -a.val;
  for (std::size_t i = 0; i < N; ++i) r.d[i] = -a.d[i];
  return r;
}
/// Sum. @param a left @param b right @return a + b
template <class T, std::size_t N>
inline dual<T, N> operator+(dual<T, N> a, const dual<T, N>& b) { return a += b; }
/// Difference. @param a left @param b right @return a - b
template <class T, std::size_t N>
inline dual<T, N> operator-(dual<T, N> a, const dual<T, N>& b) { return a -= b; }
/// Product. @param a left @param b right @return a * b
template <class T, std::size_t N>
inline dual<T, N> operator*(dual<T, N> a, const dual<T, N>& b) { return a *= b; }
/// Quotient. @param a left @param b right @return a / b
template <class T, std::size_t N>
inline dual<T, N> operator/(dual<T, N> a, const dual<T, N>& b) { return a /= b; }
/// Sum with a scalar. @param a left @param b right @return a + b
template <class T, std::size_t N, class U, class = std::enable_if_t<std::is_arithmetic_v<U>>>
inline dual<T, N> operator+(dual<T, N> a, U b) { a.val += static_cast<T>(b); return a; }
/// Sum with a scalar. @param a left @param b right @return a + b
template <class T, std::size_t N, class U, class = std::enable_if_t<std::is_arithmetic_v<U>>>
inline dual<T, N> operator+(U a, dual<T, N> b) { b.val += static_cast<T>(a); return b; }
/// Difference with a scalar. @param a left @param b right @return a - b
template <class T, std::size_t N, class U, class = std::enable_if_t<std::is_arithmetic_v<U>>>
inline dual<T, N> operator-(dual<T, N> a, U b) { a.val -= static_cast<T>(b); return a; }
/// Difference with a scalar. @param a left @param b right @return a - b
template <class T, std::size_t N, class U, class = std::enable_if_t<std::is_arithmetic_v<U>>>
inline dual<T, N> operator-(U a, const dual<T, N>& b) { dual<T, N> r = -b; r.val += static_cast<T>(a); return r; }
/// Product with a scalar. @param a left @param b right @return a * b
template <class T, std::size_t N, class U, class = std::enable_if_t<std::is_arithmetic_v<U>>>
inline dual<T, N> operator*(dual<T, N> a, U b) {
  const T s = static_cast<T>(b);
  a.val *= s;
  for (std::size_t i = 0; i < N; ++i) a.d[i] *= s;
  return a;
}
/// Product with a scalar. @param a left @param b right @return a * b
template <class T, std::size_t N, class U, class = std::enable_if_t<std::is_arithmetic_v<U>>>
inline dual<T, N> operator*(U a, dual<T, N> b) { return b * a; }
/// Quotient by a scalar. @param a left @param b right @return a / b
template <class T, std::size_t N, class U, class = std::enable_if_t<std::is_arithmetic_v<U>>>
inline dual<T, N> operator/(dual<T, N> a, U b) { return a * (T(1) / static_cast<T>(b)); }
/// Quotient of a scalar by a dual. @param a left @param b right @return a / b
template <class T, std::size_t N, class U, class = std::enable_if_t<std::is_arithmetic_v<U>>>
inline dual<T, N> operator/(U a, const dual<T, N>& b) { return dual<T, N>(a) / b; }
/// @}

/// @name Comparisons (on the value only)
/// @{

/// @param a left @param b right @return a.val < b.val
template <class T, std::size_t N>
inline bool operator<(const dual<T, N>& a, const dual<T, N>& b) { return a.val < b.val; }
/// @param a left @param b right @return a.val > b.val
template <class T, std::size_t N>
inline bool operator>(const dual<T, N>& a, const dual<T, N>& b) { return a.val > b.val; }
/// @param a left @param b right @return a.val <= b.val
template <class T, std::size_t N>
inline bool operator<=(const dual<T, N>& a, const dual<T, N>& b) { return a.val <= b.val; }
/// @param a left @param b right @return a.val >= b.val
template <class T, std::size_t N>
inline bool operator>=(const dual<T, N>& a, const dual<T, N>& b) { return a.val >= b.val; }
/// @param a left @param b right @return a.val == b.val
template <class T, std::size_t N>
inline bool operator==(const dual<T, N>& a, const dual<T, N>& b) { return a.val == b.val; }
/// @param a left @param b right @return a.val != b.val
template <class T, std::size_t N>
inline bool operator!=(const dual<T, N>& a, const dual<T, N>& b) { return a.val != b.val; }
/// @}

/// @name Math functions for dual numbers (found by argument-dependent lookup)
/// @{

/// Square root. @param a operand @return sqrt(a) with derivative d/(2 sqrt(a))
template <class T, std::size_t N>
inline dual<T, N> sqrt(const dual<T, N>& a) {
  using std::sqrt;
  dual<T, N> r;
  r.val = sqrt(a.val);
  const T k = T(1) / (2 * r.val);
  for (std::size_t i = 0; i < N; ++i) r.d[i] = a.d[i] * k;
  return r;
}
/// Cube root. @param a operand @return cbrt(a) with derivative d/(3 cbrt(a)^2)
template <class T, std::size_t N>
inline dual<T, N> cbrt(const dual<T, N>& a) {
  using std::cbrt;
  dual<T, N> r;
  r.val = cbrt(a.val);
  const T k = T(1) / (3 * r.val * r.val);
  for (std::size_t i = 0; i < N; ++i) r.d[i] = a.d[i] * k;
  return r;
}
/// Exponential. @param a operand @return exp(a)
template <class T, std::size_t N>
inline dual<T, N> exp(const dual<T, N>& a) {
  using std::exp;
  dual<T, N> r;
  r.val = exp(a.val);
  for (std::size_t i = 0; i < N; ++i) r.d[i] = a.d[i] * r.val;
  return r;
}
/// Natural logarithm. @param a operand (> 0) @return log(a)
template <class T, std::size_t N>
inline dual<T, N> log(const dual<T, N>& a) {
  using std::log;
  dual<T, N> r;
  r.val = log(a.val);
  for (std::size_t i = 0; i < N; ++i) r.d[i] = a.d[i] / a.val;
  return r;
}
/// log(1 + a). @param a operand (> -1) @return log1p(a)
template <class T, std::size_t N>
inline dual<T, N> log1p(const dual<T, N>& a) {
  using std::log1p;
  dual<T, N> r;
  r.val = log1p(a.val);
  for (std::size_t i = 0; i < N; ++i) r.d[i] = a.d[i] / (T(1) + a.val);
  return r;
}
/// exp(a) - 1. @param a operand @return expm1(a)
template <class T, std::size_t N>
inline dual<T, N> expm1(const dual<T, N>& a) {
  using std::exp;
  using std::expm1;
  dual<T, N> r;
  r.val = expm1(a.val);
  const T e = exp(a.val);
  for (std::size_t i = 0; i < N; ++i) r.d[i] = a.d[i] * e;
  return r;
}
/// Absolute value. @param a operand @return |a| (derivative sign(a) d, zero at a = 0)
template <class T, std::size_t N>
inline dual<T, N> fabs(const dual<T, N>& a) {
  if (a.val < T(0)) return -a;
  return a;
}
/// Absolute value. @param a operand @return |a|
template <class T, std::size_t N>
inline dual<T, N> abs(const dual<T, N>& a) { return fabs(a); }
/// Power with a dual exponent. @param a base (> 0 when b carries derivatives) @param b exponent
/// @return a^b
template <class T, std::size_t N>
inline dual<T, N> pow(const dual<T, N>& a, const dual<T, N>& b) {
  using std::log;
  using std::pow;
  dual<T, N> r;
  r.val = pow(a.val, b.val);
  const T da = (a.val == T(0)) ? T(0) : b.val * r.val / a.val;
  const T db = (a.val > T(0)) ? r.val * log(a.val) : T(0);
  for (std::size_t i = 0; i < N; ++i) r.d[i] = da * a.d[i] + db * b.d[i];
  return r;
}
/// Power with a scalar exponent. @param a base @param b exponent @return a^b
template <class T, std::size_t N, class U, class = std::enable_if_t<std::is_arithmetic_v<U>>>
inline dual<T, N> pow(const dual<T, N>& a, U b) {
  using std::pow;
  dual<T, N> r;
  const T e = static_cast<T>(b);
  r.val = pow(a.val, e);
  const T da = (a.val == T(0)) ? T(0) : e * pow(a.val, e - T(1));
  for (std::size_t i = 0; i < N; ++i) r.d[i] = da * a.d[i];
  return r;
}
/// Power of a scalar base. @param a base (> 0) @param b exponent @return a^b
template <class T, std::size_t N, class U, class = std::enable_if_t<std::is_arithmetic_v<U>>>
inline dual<T, N> pow(U a, const dual<T, N>& b) { return pow(dual<T, N>(a), b); }
/// Sine. @param a operand (rad) @return sin(a)
template <class T, std::size_t N>
inline dual<T, N> sin(const dual<T, N>& a) {
  using std::cos;
  using std::sin;
  dual<T, N> r;
  r.val = sin(a.val);
  const T c = cos(a.val);
  for (std::size_t i = 0; i < N; ++i) r.d[i] = a.d[i] * c;
  return r;
}
/// Cosine. @param a operand (rad) @return cos(a)
template <class T, std::size_t N>
inline dual<T, N> cos(const dual<T, N>& a) {
  using std::cos;
  using std::sin;
  dual<T, N> r;
  r.val = cos(a.val);
  const T s = -sin(a.val);
  for (std::size_t i = 0; i < N; ++i) r.d[i] = a.d[i] * s;
  return r;
}
/// Tangent. @param a operand (rad) @return tan(a)
template <class T, std::size_t N>
inline dual<T, N> tan(const dual<T, N>& a) {
  using std::tan;
  dual<T, N> r;
  r.val = tan(a.val);
  const T dv = T(1) + r.val * r.val;
  for (std::size_t i = 0; i < N; ++i) r.d[i] = a.d[i] * dv;
  return r;
}
/// Hyperbolic sine. @param a operand @return sinh(a)
template <class T, std::size_t N>
inline dual<T, N> sinh(const dual<T, N>& a) {
  using std::cosh;
  using std::sinh;
  dual<T, N> r;
  r.val = sinh(a.val);
  const T c = cosh(a.val);
  for (std::size_t i = 0; i < N; ++i) r.d[i] = a.d[i] * c;
  return r;
}
/// Hyperbolic cosine. @param a operand @return cosh(a)
template <class T, std::size_t N>
inline dual<T, N> cosh(const dual<T, N>& a) {
  using std::cosh;
  using std::sinh;
  dual<T, N> r;
  r.val = cosh(a.val);
  const T s = sinh(a.val);
  for (std::size_t i = 0; i < N; ++i) r.d[i] = a.d[i] * s;
  return r;
}
/// Inverse hyperbolic sine. @param a operand @return asinh(a)
template <class T, std::size_t N>
inline dual<T, N> asinh(const dual<T, N>& a) {
  using std::asinh;
  using std::sqrt;
  dual<T, N> r;
  r.val = asinh(a.val);
  const T dv = T(1) / sqrt(T(1) + a.val * a.val);
  for (std::size_t i = 0; i < N; ++i) r.d[i] = a.d[i] * dv;
  return r;
}
/// Inverse cosine. @param a operand in [-1, 1] @return acos(a)
template <class T, std::size_t N>
inline dual<T, N> acos(const dual<T, N>& a) {
  using std::acos;
  using std::sqrt;
  dual<T, N> r;
  r.val = acos(a.val);
  const T dv = -T(1) / sqrt(T(1) - a.val * a.val);
  for (std::size_t i = 0; i < N; ++i) r.d[i] = a.d[i] * dv;
  return r;
}
/// Finiteness of the value and every derivative. @param a operand @return true when all are finite
template <class T, std::size_t N>
inline bool isfinite(const dual<T, N>& a) {
  using std::isfinite;
  if (!isfinite(a.val)) return false;
  for (std::size_t i = 0; i < N; ++i)
    if (!isfinite(a.d[i])) return false;
  return true;
}
/// NaN test of the value. @param a operand @return true when the value is NaN
template <class T, std::size_t N>
inline bool isnan(const dual<T, N>& a) {
  using std::isnan;
  return isnan(a.val);
}
/// @}

/// Scalar facts for dual numbers: those of the underlying type.
template <class T, std::size_t N>
struct scalar_traits<dual<T, N>, void> {
  /// @return a dual whose value is NaN (derivatives zero).
  static dual<T, N> nan() { return dual<T, N>(scalar_traits<T>::nan()); }
  /// @return epsilon of the underlying type.
  static dual<T, N> epsilon() { return dual<T, N>(scalar_traits<T>::epsilon()); }
  /// @return the largest finite value of the underlying type.
  static dual<T, N> max() { return dual<T, N>(scalar_traits<T>::max()); }
  /// @return the smallest positive normal value of the underlying type.
  static dual<T, N> min_normal() { return dual<T, N>(scalar_traits<T>::min_normal()); }
  /// Decimal digits kept by the underlying type.
  static constexpr int digits10 = scalar_traits<T>::digits10;
  /// Iteration cap for iterative pieces.
  static constexpr int max_iterations = scalar_traits<T>::max_iterations;
};

namespace detail {
/// The value part of a dual number.
template <class T, std::size_t N>
inline const T& primal(const dual<T, N>& x) noexcept {
  return x.val;
}
/// A scalar in the scalar type U: itself (with its derivatives) when it already has that type,
/// else its value part converted to U (a constant: the derivative directions stay behind).
/// @param x the scalar
/// @return x as U
template <class U, class T>
inline decltype(auto) scalar_as(const T& x) {
  if constexpr (std::is_same_v<U, T>) {
    return (x);
  } else {
    return U(primal(x));
  }
}
}  // namespace detail

}  // namespace pumploss

#endif
