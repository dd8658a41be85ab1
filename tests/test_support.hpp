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

inline const double kNaN = std::numeric_limits<double>::quiet_NaN();
inline const double kInf = std::numeric_limits<double>::infinity();

}  // namespace pltest

#endif
