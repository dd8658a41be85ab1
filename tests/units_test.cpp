// Tests of units.hpp and pumploss_unit_convert.
// Check values: NIST SP 811 (2008) Appendix B (key nist_sp811), exact definitions; every
// factor is also checked against its exact decimal definition in 50 digits.
#include <gtest/gtest.h>

#include <cstring>
#include <random>
#include <string>

#include "pumploss.h"
#include "pumploss/units.hpp"
#include "test_support.hpp"

using pltest::mp50;
using pumploss::status;

TEST(Units, EveryFactorIsTheCorrectlyRoundedExactValue) {
  for (int i = 0; i < pumploss::unit_count(); ++i) {
    const pumploss::unit_info& u = *pumploss::unit_at(i);
    const mp50 exact = pumploss::unit_factor<mp50>(u);
    EXPECT_EQ(u.factor, pltest::to_double(exact)) << u.symbol;
    EXPECT_EQ(u.offset, pltest::to_double(pumploss::unit_offset<mp50>(u))) << u.symbol;
    EXPECT_EQ(pumploss::find_unit(u.symbol), &u) << u.symbol << " is listed twice";
  }
  EXPECT_EQ(pumploss::unit_at(-1), nullptr);
  EXPECT_EQ(pumploss::unit_at(pumploss::unit_count()), nullptr);
}

TEST(Units, RequiredSymbolsAreKnown) {
  // The symbols the C API promises (issue list), case-sensitive.
  const char* required[] = {"Pa", "kPa", "MPa", "bar", "psi", "m3/s", "L/min", "gpm", "m3", "cm3",
                            "L", "in3", "m3/rev", "cm3/rev", "in3/rev", "Pa.s", "mPa.s", "cP",
                            "m2/s", "mm2/s", "cSt", "K", "degC", "degF", "W", "kW", "hp", "N.m",
                            "lbf.ft", "lbf.in", "rev/s", "rev/min", "rpm", "rad/s", "m", "mm",
                            "um", "in", "kg/m3", "m/s"};
  for (const char* s : required) EXPECT_NE(pumploss::find_unit(s), nullptr) << s;
  EXPECT_EQ(pumploss::find_unit("pa"), nullptr);
  EXPECT_EQ(pumploss::find_unit("BAR"), nullptr);
  EXPECT_EQ(pumploss::find_unit(""), nullptr);
  EXPECT_EQ(pumploss::find_unit("bar "), nullptr);
}

struct nist_row {
  const char* source;
  const char* from;
  const char* to;
  double value;
  double expected;
  double rel_tol;  // half a unit in the last printed digit of the source
};

TEST(Units, MatchesNistSp811AndExactDefinitions) {
  const nist_row rows[] = {
      // NIST SP 811 (2008) Appendix B.8 factors, printed to 7 digits
      {"nist_sp811", "psi", "Pa", 1.0, 6.894757e3, 0.5e-6 / 6.894757},
      {"nist_sp811", "lbf.ft", "N.m", 1.0, 1.355818, 0.5e-6 / 1.355818},
      {"nist_sp811", "lbf.in", "N.m", 1.0, 1.129848e-1, 0.5e-6 / 1.129848},
      {"nist_sp811", "hp", "W", 1.0, 7.456999e2, 0.5e-6 / 7.456999},
      {"nist_sp811", "gpm", "m3/s", 1.0, 6.309020e-5, 0.5e-6 / 6.309020},
      {"nist_sp811", "in3", "m3", 1.0, 1.6387064e-5, 1e-15},  // exact
      {"nist_sp811", "lbf", "N", 1.0, 4.4482216152605, 1e-15},  // exact
      {"nist_sp811", "cP", "Pa.s", 1.0, 1e-3, 1e-15},
      {"nist_sp811", "cSt", "m2/s", 1.0, 1e-6, 1e-15},
      // exact definitions of the temperature scales (ISO 80000-5)
      {"iso_80000_5", "degC", "K", 0.0, 273.15, 1e-16},
      {"iso_80000_5", "degF", "degC", 212.0, 100.0, 1e-15},
      {"iso_80000_5", "degF", "degC", -40.0, -40.0, 1e-15},
      {"iso_80000_5", "degF", "K", 32.0, 273.15, 1e-15},
      {"iso_80000_5", "K", "degF", 0.0, -459.67, 1e-15},
      // exact: 1 bar = 1e5 Pa, 1 rev/min = 2 pi/60 rad/s
      {"si_brochure", "bar", "psi", 1.0, 14.503773773020923, 1e-15},
      {"si_brochure", "rpm", "rad/s", 60.0, 6.283185307179586, 1e-15},
      {"si_brochure", "L/min", "m3/s", 60.0, 1e-3, 1e-15},
  };
  for (const auto& r : rows) {
    const auto got = pumploss::convert(r.value, r.from, r.to);
    ASSERT_EQ(got.st, status::ok) << r.from << "->" << r.to;
    const double rel = r.expected == 0 ? std::fabs(got.value) : std::fabs(got.value / r.expected - 1);
    EXPECT_LE(rel, r.rel_tol) << r.source << ": " << r.value << " " << r.from << " -> " << r.to
                              << " gave " << got.value;
  }
}

TEST(Units, ConversionWithin2UlpOfThe50DigitEvaluation) {
  std::mt19937_64 rng(20261201);
  std::uniform_real_distribution<double> mant(1.0, 10.0);
  std::uniform_int_distribution<int> ex(-8, 8);
  const int n = pumploss::unit_count();
  int compared = 0;
  for (int i = 0; i < n; ++i) {
    for (int j = 0; j < n; ++j) {
      const auto& a = *pumploss::unit_at(i);
      const auto& b = *pumploss::unit_at(j);
      if (a.dim != b.dim) continue;
      for (int k = 0; k < 20; ++k) {
        const double v = mant(rng) * std::pow(10.0, ex(rng));
        const auto got = pumploss::convert(v, a, b);
        const auto ref = pumploss::convert<mp50>(mp50(v), a, b);
        ASSERT_EQ(got.st, status::ok);
        if (a.offset == 0.0 && b.offset == 0.0) {
          EXPECT_LE(pltest::ulps(got.value, ref.value), 2.0) << v << " " << a.symbol << "->" << b.symbol;
        } else {
          // Offsets: the error is bounded by a few ulp of the largest intermediate term.
          const double scale = std::fabs(v) + 500.0;
          EXPECT_LE(std::fabs(got.value - pltest::to_double(ref.value)), 8e-16 * scale * 4)
              << v << " " << a.symbol << "->" << b.symbol;
        }
        ++compared;
      }
    }
  }
  EXPECT_GT(compared, 1000);
}

TEST(Units, RoundTripIsClose) {
  const auto there = pumploss::convert(123.456, "L/min", "gpm");
  const auto back = pumploss::convert(there.value, "gpm", "L/min");
  EXPECT_LE(pltest::ulp_distance(back.value, 123.456), 2.0);
}

TEST(Units, RefusesBadInput) {
  EXPECT_EQ(pumploss::convert(1.0, "bar", "m").st, status::incompatible_units);
  EXPECT_TRUE(std::isnan(pumploss::convert(1.0, "bar", "m").value));
  EXPECT_EQ(pumploss::convert(1.0, "furlong", "m").st, status::unknown_unit);
  EXPECT_EQ(pumploss::convert(pltest::kNaN, "bar", "Pa").st, status::nonfinite);
  EXPECT_EQ(pumploss::convert(pltest::kInf, "bar", "Pa").st, status::nonfinite);
  EXPECT_EQ(pumploss::convert(-pltest::kInf, "bar", "Pa").st, status::nonfinite);
  EXPECT_EQ(pumploss::convert(1e300, "GPa", "Pa").st, status::overflow);
  // zero and negative values are legitimate (gauge pressure, temperatures)
  EXPECT_EQ(pumploss::convert(-1.0, "bar", "Pa").value, -1e5);
  EXPECT_EQ(pumploss::convert(0.0, "degC", "K").value, 273.15);
}

TEST(UnitsCapi, StatusAndNaNOutputs) {
  double out = 0;
  EXPECT_EQ(pumploss_unit_convert(1.0, "bar", "kPa", &out), PUMPLOSS_OK);
  EXPECT_EQ(out, 100.0);
  EXPECT_EQ(pumploss_unit_convert(1.0, "bar", "kg/m3", &out), PUMPLOSS_EDIMENSION);
  EXPECT_TRUE(std::isnan(out));
  out = 0;
  EXPECT_EQ(pumploss_unit_convert(1.0, "xyz", "Pa", &out), PUMPLOSS_EUNIT);
  EXPECT_TRUE(std::isnan(out));
  out = 0;
  EXPECT_EQ(pumploss_unit_convert(1.0, "bar", nullptr, &out), PUMPLOSS_EMISUSE);
  EXPECT_TRUE(std::isnan(out));
  EXPECT_EQ(pumploss_unit_convert(1.0, "bar", "Pa", nullptr), PUMPLOSS_EMISUSE);
  EXPECT_EQ(pumploss_unit_convert(pltest::kNaN, "bar", "Pa", &out), PUMPLOSS_ENONFINITE);
  EXPECT_TRUE(std::isnan(out));
}
