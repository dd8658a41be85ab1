/// @file scalar_traits.hpp
/// @brief Per-type facts for the scalar type T of the formula templates: NaN, epsilon,
/// finiteness tests, iteration caps and exact decimal constants.
///
/// The core templates run for float, double, long double, Boost.Multiprecision types (the test
/// oracle) and pumploss::dual (sensitivities). Specialise scalar_traits for other types.
#ifndef PUMPLOSS_SCALAR_TRAITS_HPP
#define PUMPLOSS_SCALAR_TRAITS_HPP

#include <cmath>
#include <limits>
#include <type_traits>

#include "promote.hpp"
#include "status.hpp"

namespace pumploss {

/// Facts about a scalar type. The primary template serves any type with a
/// std::numeric_limits specialisation (built-ins and Boost.Multiprecision).
template <class T, class Enable = void>
struct scalar_traits {
  /// @return a quiet NaN of type T.
  static T nan() { return std::numeric_limits<T>::quiet_NaN(); }
  /// @return machine epsilon of T.
  static T epsilon() { return std::numeric_limits<T>::epsilon(); }
  /// @return the largest finite value of T.
  static T max() { return (std::numeric_limits<T>::max)(); }
  /// @return the smallest positive normal value of T.
  static T min_normal() { return (std::numeric_limits<T>::min)(); }
  /// Decimal digits T keeps.
  static constexpr int digits10 = std::numeric_limits<T>::digits10;
  /// Iteration cap for iterative pieces working in T.
  static constexpr int max_iterations = 200;
};

namespace detail {

/// The underlying floating value of a scalar (identity here; dual overloads its own).
template <class T>
inline const T& primal(const T& x) noexcept {
  return x;
}

/// True when x is finite (works through ADL for multiprecision and dual types).
template <class T>
inline bool finite(const T& x) {
  using std::isfinite;
  return isfinite(primal(x));
}

/// A decimal constant: the spelling is parsed for types that can parse it (multiprecision),
/// the literal is used otherwise. Boost's BIG_CONSTANT idea.
template <class T>
inline T constant(long double literal, const char* spelling) {
  if constexpr (std::is_arithmetic_v<T>) {
    (void)spelling;
    return static_cast<T>(literal);
  } else if constexpr (std::is_constructible_v<T, const char*>) {
    (void)literal;
    return T(spelling);
  } else {
    (void)spelling;
    return T(literal);
  }
}

/// pi in T.
template <class T>
inline T pi() {
  return constant<T>(3.141592653589793238462643383279502884L,
                     "3.14159265358979323846264338327950288419716939937510582097494459");
}

/// ln(10) in T.
template <class T>
inline T ln10() {
  return constant<T>(2.302585092994045684017991454684364208L,
                     "2.30258509299404568401799145468436420760110148862877297603332790");
}

/// True when every argument is finite.
template <class... Ts>
inline bool all_finite(const Ts&... xs) {
  return (finite(xs) && ...);
}

/// A result carrying a NaN value and the given error status.
template <class T>
inline result<T> fail(status s) {
  return result<T>{scalar_traits<T>::nan(), s};
}

}  // namespace detail
}  // namespace pumploss

#endif
