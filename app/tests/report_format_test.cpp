// The CSV number format of the program's reports (app/report.hpp, format_g10) against the
// standard library's std::to_chars with precision 10 (the C++ standard defines it as printf's
// "%.10g"): byte for byte on random values of every magnitude, on decimals as readings carry them
// after a unit conversion, on near-ties and on the edges of the fixed notation. Self-calculated
// reference: the standard library itself.
#include <gtest/gtest.h>

#include <charconv>
#include <cmath>
#include <cstdint>
#include <limits>
#include <random>
#include <string>

#include "report.hpp"

namespace {

std::string reference(double v) {
  char buf[64];
  return std::string(buf, std::to_chars(buf, buf + sizeof buf, v, std::chars_format::general, 10).ptr);
}

std::string fast(double v) {
  char buf[32];
  return std::string(buf, plcli::format_g10(buf, buf + sizeof buf, v));
}

TEST(ReportFormat, G10MatchesToCharsOnRandomValues) {
  std::mt19937_64 rng(20);
  std::uniform_real_distribution<double> mant(1.0, 10.0);
  std::uniform_int_distribution<int> ex(-7, 11);
  std::size_t bad = 0;
  for (int i = 0; i < 400000; ++i) {
    const double v = (i % 2 ? -1 : 1) * mant(rng) * std::pow(10.0, ex(rng));
    if (fast(v) != reference(v) && ++bad < 10) ADD_FAILURE() << reference(v) << " written as " << fast(v);
  }
  EXPECT_EQ(bad, 0u);
}

TEST(ReportFormat, G10MatchesToCharsOnConvertedDecimals) {
  // readings with a few decimals, converted to SI and back (bar <-> Pa, L/min <-> m3/s, degC <-> K)
  std::size_t bad = 0;
  for (int k = 0; k < 300000; ++k) {
    for (const double v : {k / 10.0 * 1e5 / 1e5, k / 1e4 / 60000.0 * 60000.0, (k / 100.0 + 273.15) - 273.15,
                           k / 1e4 * 100.0, k * 1e-9, k * 0.0001 / 3.0}) {
      if (fast(v) != reference(v) && ++bad < 10) ADD_FAILURE() << reference(v) << " written as " << fast(v);
    }
  }
  EXPECT_EQ(bad, 0u);
}

TEST(ReportFormat, G10EdgesAndTies) {
  const double edges[] = {0.0, -0.0, 1.0, -1.0, 0.5, 1e-4, 9.99999999995e-5, 1e-5, 0.000123456789012,
                          9999999999.0, 9999999999.5, 9999999998.5, 1e10, 1e9, 999999999.95, 8999999999.9,
                          9e9, 1.00000000005, 2.00000000005, 1.23456789015, 0.1, 0.3, 1.0 / 3.0, 2.0 / 3.0,
                          123456.78905, 4.0645e-5, std::numeric_limits<double>::max(),
                          std::numeric_limits<double>::min(), std::numeric_limits<double>::denorm_min()};
  for (const double v : edges) {
    EXPECT_EQ(fast(v), reference(v)) << v;
    EXPECT_EQ(fast(-v), reference(-v)) << v;
    for (double w = v, n = 0; n < 50; ++n, w = std::nextafter(w, 1e300)) EXPECT_EQ(fast(w), reference(w)) << w;
  }
}

}  // namespace
