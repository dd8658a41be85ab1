// Helpers shared by the test suite: the 50-digit oracle type, ulp and relative-error measures.
#ifndef PUMPLOSS_TEST_SUPPORT_HPP
#define PUMPLOSS_TEST_SUPPORT_HPP

#include <boost/multiprecision/cpp_bin_float.hpp>
#include <cmath>
#include <cstdint>
#include <cstring>
#include <limits>

namespace pltest {

/// The reference oracle: 50 decimal digits.
using mp50 = boost::multiprecision::cpp_bin_float_50;

inline double to_double(const mp50& x) { return x.convert_to<double>(); }

/// Relative error of a double against the oracle (absolute when the oracle is 0).
inline double rel_err(double got, const mp50& ref) {
  if (ref == 0) return std::fabs(got);
  const mp50 e = abs((mp50(got) - ref) / ref);
  return e.convert_to<double>();
}

/// Distance in units in the last place between two doubles (0 for equal, huge across signs).
inline double ulp_distance(double a, double b) {
  if (a == b) return 0.0;
  if (std::isnan(a) || std::isnan(b)) return std::numeric_limits<double>::infinity();
  auto key = [](double x) {
    std::int64_t i;
    std::memcpy(&i, &x, sizeof i);
    return i < 0 ? std::numeric_limits<std::int64_t>::min() - i : i;
  };
  const long double d = static_cast<long double>(key(a)) - static_cast<long double>(key(b));
  return static_cast<double>(d < 0 ? -d : d);
}

/// ulp distance of a double from the correctly rounded oracle value.
inline double ulps(double got, const mp50& ref) { return ulp_distance(got, to_double(ref)); }

/// The 50-digit root of the Colebrook equation in x = 1/sqrt(f), by plain Newton iteration
/// to 1e-45: independent of the library's Clamond/Newton scheme (friction tests and benchmarks).
inline mp50 colebrook_root(double re, double rr) {
  using boost::multiprecision::log;
  const mp50 r(re), k(rr), ln10 = log(mp50(10)), a = k / mp50("3.7"), b = mp50("2.51") / r;
  mp50 x = 8;
  for (int i = 0; i < 200; ++i) {
    const mp50 s = a + b * x;
    const mp50 dx = (x + 2 * log(s) / ln10) / (1 + 2 * b / (s * ln10));
    x -= dx;
    if (abs(dx) < mp50("1e-46")) break;
  }
  return 1 / (x * x);
}

inline const double kNaN = std::numeric_limits<double>::quiet_NaN();
inline const double kInf = std::numeric_limits<double>::infinity();

}  // namespace pltest

#endif
