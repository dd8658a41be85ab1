// Tests of fluid.hpp and its C wrappers. Sources: tests/reference/SOURCES.md.
#include <gtest/gtest.h>

#include <cmath>
#include <random>
#include <string>

#include "pumploss.h"
#include "pumploss/fluid.hpp"
#include "test_support.hpp"

using pltest::kInf;
using pltest::kNaN;
using pltest::mp50;
using pumploss::status;

namespace {
struct d341_row {
  const char* source;
  double t1_c, nu1, t2_c, nu2, t_c, expected, tol, k_offset;
};
const d341_row kD341Rows[] = {
#include "reference/fluid/d341_published.ipp"
};
struct sus_row {
  const char* source;
  double nu, sus, tol;
  char printed;
};
const sus_row kSusRows[] = {
#include "reference/fluid/d2161_sus.ipp"
};
}  // namespace

TEST(FluidD341, MatchesReferenceTable) {
  for (const auto& r : kD341Rows) {
    const auto got = pumploss::viscosity_d341(r.t1_c + r.k_offset, r.nu1 * 1e-6, r.t2_c + r.k_offset,
                                              r.nu2 * 1e-6, r.t_c + r.k_offset);
    ASSERT_EQ(got.st, status::ok) << r.source;
    EXPECT_NEAR(got.value * 1e6, r.expected, r.tol) << r.source << " at " << r.t_c << " degC";
  }
}

TEST(FluidD341, PublishedCoefficients) {
  // astm_d341_example: A = 9.5259, B = 3.7449 with T = t + 273 (printed to 4 decimals).
  const auto line = pumploss::d341_fit(313.0, 32e-6, 373.0, 5.4e-6);
  ASSERT_EQ(line.st, status::ok);
  EXPECT_NEAR(line.value.a, 9.5259, 0.5e-4);
  EXPECT_NEAR(line.value.b, 3.7449, 0.5e-4);
}

TEST(FluidD341, ReproducesItsTwoPointsAndIsMonotone) {
  const double t1 = 313.15, t2 = 373.15;
  const auto a = pumploss::viscosity_d341(t1, 46e-6, t2, 6.8e-6, t1);
  const auto b = pumploss::viscosity_d341(t1, 46e-6, t2, 6.8e-6, t2);
  EXPECT_LE(std::fabs(a.value / 46e-6 - 1), 1e-14);
  EXPECT_LE(std::fabs(b.value / 6.8e-6 - 1), 1e-14);
  double prev = kInf;
  for (double t = 243.15; t <= 423.15; t += 5) {
    const auto v = pumploss::viscosity_d341(t1, 46e-6, t2, 6.8e-6, t);
    ASSERT_TRUE(v.usable());
    EXPECT_LT(v.value, prev);
    prev = v.value;
  }
}

TEST(FluidD341, AgreesWith50DigitEvaluation) {
  // Same formula in cpp_bin_float_50: the double result may only lose what the double
  // logarithm amplifies (a factor ln(Z) ln(10) on the rounding of the inputs).
  std::mt19937_64 rng(7);
  std::uniform_real_distribution<double> nu40(3.0, 1500.0), ratio(3.0, 12.0), tc(-30.0, 150.0);
  double worst = 0;
  for (int i = 0; i < 2000; ++i) {
    const double n1 = nu40(rng), n2 = n1 / ratio(rng), t = tc(rng) + 273.15;
    const auto got = pumploss::viscosity_d341(313.15, n1 * 1e-6, 373.15, n2 * 1e-6, t);
    const auto ref = pumploss::viscosity_d341<mp50>(mp50(313.15), mp50(n1 * 1e-6), mp50(373.15),
                                                     mp50(n2 * 1e-6), mp50(t));
    if (n2 < 0.5) continue;
    ASSERT_EQ(static_cast<int>(got.st), static_cast<int>(ref.st));
    if (is_error(got.st)) continue;
    worst = std::max(worst, pltest::rel_err(got.value, ref.value));
  }
  EXPECT_LE(worst, 2e-13) << "worst relative error " << worst;
  RecordProperty("worst_rel_err", std::to_string(worst));
}

TEST(FluidD341, LowViscosityBranch) {
  // Below 2 mm2/s the low-viscosity term applies; the standard's inverse is an approximation.
  for (double v : {0.3, 0.5, 1.0, 1.5, 1.99}) {
    const double z = pumploss::d341_z(v);
    EXPECT_GT(z, v + 0.7);
    EXPECT_NEAR(pumploss::d341_nu_from_z(z), v, 2e-3) << v;
  }
  EXPECT_EQ(pumploss::d341_z(2.0), 2.7);
  EXPECT_EQ(pumploss::d341_nu_from_z(2.7 + 1.0), 3.0);
  // The jump at the branch point is 7.5e-4 in Z, as in the standard.
  EXPECT_NEAR(pumploss::d341_z(std::nextafter(2.0, 0.0)) - pumploss::d341_z(2.0), 7.5e-4, 0.1e-4);
}

TEST(FluidD341, BadInput) {
  const double ok[5] = {313.15, 46e-6, 373.15, 6.8e-6, 353.15};
  for (int i = 0; i < 5; ++i) {
    for (double bad : {kNaN, kInf, -kInf, 0.0, -1.0}) {
      double a[5];
      std::copy(ok, ok + 5, a);
      a[i] = bad;
      const auto r = pumploss::viscosity_d341(a[0], a[1], a[2], a[3], a[4]);
      EXPECT_TRUE(is_error(r.st)) << "arg " << i << " = " << bad;
      EXPECT_TRUE(std::isnan(r.value));
      const status want = std::isfinite(bad) ? status::domain : status::nonfinite;
      EXPECT_EQ(r.st, want) << "arg " << i << " = " << bad;
    }
  }
  // equal temperatures, viscosity rising with temperature, viscosity too low for log log Z
  EXPECT_EQ(pumploss::viscosity_d341(313.15, 46e-6, 313.15, 6.8e-6, 300.0).st, status::domain);
  EXPECT_EQ(pumploss::viscosity_d341(313.15, 6.8e-6, 373.15, 46e-6, 300.0).st, status::domain);
  EXPECT_EQ(pumploss::viscosity_d341(313.15, 0.1e-6, 373.15, 0.05e-6, 300.0).st, status::domain);
  // viscosities too large for Z: an overflow, never an infinite coefficient
  EXPECT_EQ(pumploss::d341_fit(313.15, 46e-6, 373.15, std::numeric_limits<double>::max()).st, status::overflow);
  EXPECT_EQ(pumploss::d341_fit(313.15, std::numeric_limits<double>::max(), 373.15, 6.8e-6).st, status::overflow);
  // extreme cold overflows Z rather than returning garbage
  EXPECT_EQ(pumploss::viscosity_d341(313.15, 1500e-6, 373.15, 20e-6, 1.0).st, status::overflow);
}

TEST(FluidIso3448, GradesAndLimits) {
  // iso_3448_1992 Table 1: 18 grades, limits +/-10 % of the mid-point.
  const int grades[] = {2, 3, 5, 7, 10, 15, 22, 32, 46, 68, 100, 150, 220, 320, 460, 680, 1000, 1500};
  const double mids[] = {2.2, 3.2, 4.6, 6.8, 10, 15, 22, 32, 46, 68, 100, 150, 220, 320, 460, 680, 1000, 1500};
  for (int i = 0; i < 18; ++i) {
    const auto g = pumploss::iso_vg(grades[i]);
    ASSERT_EQ(g.st, status::ok);
    EXPECT_DOUBLE_EQ(g.value.mid_m2_s, mids[i] * 1e-6);
    EXPECT_DOUBLE_EQ(g.value.min_m2_s, 0.9 * mids[i] * 1e-6);
    EXPECT_DOUBLE_EQ(g.value.max_m2_s, 1.1 * mids[i] * 1e-6);
  }
  const auto vg46 = pumploss::iso_vg(46);  // iso_3448_1992: 41.4 to 50.6 mm2/s
  EXPECT_NEAR(vg46.value.min_m2_s, 41.4e-6, 1e-15);
  EXPECT_NEAR(vg46.value.max_m2_s, 50.6e-6, 1e-15);
  const auto vg2 = pumploss::iso_vg(2);  // iso_3448_1992: 1.98 to 2.42 mm2/s
  EXPECT_NEAR(vg2.value.min_m2_s, 1.98e-6, 1e-18);
  EXPECT_NEAR(vg2.value.max_m2_s, 2.42e-6, 1e-18);
  EXPECT_EQ(pumploss::iso_vg(45).st, status::domain);
  EXPECT_TRUE(std::isnan(pumploss::iso_vg(45).value.mid_m2_s));
  EXPECT_EQ(pumploss::iso_vg_classify(44e-6).value.grade, 46);
  EXPECT_EQ(pumploss::iso_vg_classify(55e-6).st, status::out_of_validity);
  EXPECT_EQ(pumploss::iso_vg_classify(kNaN).st, status::nonfinite);
  EXPECT_EQ(pumploss::iso_vg_classify(-1.0).st, status::domain);
}

TEST(FluidD2161, MatchesReferenceTable) {
  for (const auto& r : kSusRows) {
    if (r.printed == 'n') {
      const auto nu = pumploss::kinematic_from_sus(r.sus);
      ASSERT_EQ(nu.st, status::ok);
      EXPECT_NEAR(nu.value * 1e6, r.nu, r.tol) << r.source;
    } else {
      const auto sus = pumploss::sus_from_kinematic(r.nu * 1e-6);
      ASSERT_EQ(sus.st, status::ok);
      EXPECT_NEAR(sus.value, r.sus, r.tol) << r.source;
    }
  }
}

TEST(FluidD2161, AgreesWith50DigitsAndInvertsExactly) {
  double worst = 0, worst_inv = 0;
  for (double v = 1.8; v < 5000; v *= 1.07) {
    const auto got = pumploss::sus_from_kinematic(v * 1e-6);
    const auto ref = pumploss::sus_from_kinematic<mp50>(mp50(v) / 1000000);
    worst = std::max(worst, pltest::rel_err(got.value, ref.value));
    const auto back = pumploss::kinematic_from_sus(got.value);
    const auto back_mp = pumploss::kinematic_from_sus<mp50>(mp50(got.value));
    ASSERT_TRUE(back.usable());
    ASSERT_TRUE(back_mp.usable());
    worst_inv = std::max(worst_inv, pltest::rel_err(back.value, back_mp.value));
  }
  EXPECT_LE(worst, 4e-16);
  EXPECT_LE(worst_inv, 4e-15);
}

TEST(FluidD2161, BadInputAndRange) {
  EXPECT_EQ(pumploss::sus_from_kinematic(0.0).st, status::domain);
  EXPECT_EQ(pumploss::sus_from_kinematic(-1e-6).st, status::domain);
  EXPECT_EQ(pumploss::sus_from_kinematic(kNaN).st, status::nonfinite);
  EXPECT_EQ(pumploss::sus_from_kinematic(1e-6).st, status::regime);  // below 1.8 mm2/s
  EXPECT_EQ(pumploss::kinematic_from_sus(0.0).st, status::domain);
  EXPECT_EQ(pumploss::kinematic_from_sus(kInf).st, status::nonfinite);
  EXPECT_EQ(pumploss::kinematic_from_sus(30.0).st, status::regime);
  EXPECT_TRUE(std::isnan(pumploss::kinematic_from_sus(-3.0).value));
}

TEST(FluidDensity, HandValuesAndOracle) {
  // Hand calculation: 870 kg/m3 at 15 degC, alpha 6.5e-4/K, K = 1.4 GPa, 65 degC, 140 bar:
  // 870 * (1 - 6.5e-4 * 50) / (1 - 0.01) = 870 * 0.9675 / 0.99 = 850.2272727...
  const auto r = pumploss::oil_density(870.0, 288.15, 6.5e-4, 1.4e9, 338.15, 1.4e7);
  ASSERT_EQ(r.st, status::ok);
  EXPECT_NEAR(r.value, 850.22727272727272, 1e-10);
  const auto ref = pumploss::oil_density<mp50>(mp50(870), mp50(288.15), mp50(6.5e-4), mp50(1.4e9),
                                               mp50(338.15), mp50(1.4e7));
  EXPECT_LE(pltest::rel_err(r.value, ref.value), 1e-14);
  // Vacca & Franzoni 2021 (vacca_franzoni_2021): about 0.7 % volume loss per 100 bar at 1.4 GPa.
  const auto p100 = pumploss::oil_density(870.0, 288.15, 6.5e-4, 1.4e9, 288.15, 1e7);
  EXPECT_NEAR(p100.value / 870.0 - 1, 0.0072, 0.0005);
  EXPECT_EQ(pumploss::oil_density(870.0, 288.15, 6.5e-4, 1.4e9, 500.0, 0.0).st, status::regime);
  EXPECT_EQ(pumploss::oil_density(870.0, 288.15, 6.5e-4, 1.4e9, 288.15, 1.4e9).st, status::domain);
  EXPECT_EQ(pumploss::oil_density(0.0, 288.15, 6.5e-4, 1.4e9, 288.15, 0.0).st, status::domain);
  EXPECT_EQ(pumploss::oil_density(870.0, 288.15, -1.0, 1.4e9, 288.15, 0.0).st, status::domain);
  EXPECT_EQ(pumploss::oil_density(870.0, 288.15, 6.5e-4, kNaN, 288.15, 0.0).st, status::nonfinite);
  EXPECT_EQ(pumploss::oil_density(870.0, 288.15, 0.01, 1.4e9, 400.0, 0.0).st, status::domain);
  // extreme but finite inputs must not give an infinite density with a usable status
  const double big = std::numeric_limits<double>::max();
  EXPECT_EQ(pumploss::oil_density(big, 288.15, 6.5e-4, 1.4e9, 288.15, 1e9).st, status::overflow);
}

TEST(FluidViscosity, DynamicKinematicAndBarus) {
  EXPECT_EQ(pumploss::dynamic_viscosity(46e-6, 870.0).value, 46e-6 * 870.0);
  EXPECT_EQ(pumploss::kinematic_viscosity(0.04, 870.0).value, 0.04 / 870.0);
  EXPECT_EQ(pumploss::dynamic_viscosity(0.0, 870.0).st, status::domain);
  EXPECT_EQ(pumploss::kinematic_viscosity(0.04, kInf).st, status::nonfinite);
  const auto b = pumploss::viscosity_barus(0.04, 2e-8, 2.5e7);
  const auto bref = pumploss::viscosity_barus<mp50>(mp50(0.04), mp50(2e-8), mp50(2.5e7));
  EXPECT_LE(pltest::rel_err(b.value, bref.value), 2e-16);
  EXPECT_NEAR(b.value, 0.04 * std::exp(0.5), 1e-17);
  EXPECT_EQ(pumploss::viscosity_barus(0.04, 2e-8, 2e8).st, status::regime);
  EXPECT_EQ(pumploss::viscosity_barus(0.04, 2e-8, 1e12).st, status::overflow);
  EXPECT_EQ(pumploss::viscosity_barus(0.04, -2e-8, 1e7).st, status::domain);
}

TEST(FluidOil, TypicalMineralOilChainsTheParts) {
  const auto line = pumploss::d341_fit(313.15, 46e-6, 373.15, 6.8e-6);
  const auto oil = pumploss::typical_mineral_oil(line.value);
  const auto mu = pumploss::oil_dynamic_viscosity(oil, 313.15, 0.0);
  ASSERT_EQ(mu.st, status::ok);
  const double rho40 = 870.0 * (1 - 6.5e-4 * 25.0);
  EXPECT_NEAR(mu.value, 46e-6 * rho40, 1e-12);
  const auto mu_hp = pumploss::oil_dynamic_viscosity(oil, 313.15, 2.5e7);
  // Barus exp(0.5) alone: the coefficient describes the measured dynamic viscosity, so the
  // density stays at zero gauge pressure (no second count of the compression)
  EXPECT_NEAR(mu_hp.value / mu.value, std::exp(0.5), 1e-14);
  EXPECT_EQ(pumploss::oil_dynamic_viscosity(oil, -1.0, 0.0).st, status::domain);
}

TEST(FluidCapi, WrappersMatchCoreAndReturnNaNOnError) {
  double nu = 0, a = 0, b = 0;
  ASSERT_EQ(pumploss_viscosity_d341(313.15, 46e-6, 373.15, 6.8e-6, 273.15, &nu), PUMPLOSS_OK);
  EXPECT_EQ(nu, pumploss::viscosity_d341(313.15, 46e-6, 373.15, 6.8e-6, 273.15).value);
  EXPECT_EQ(pumploss_viscosity_d341(kNaN, 46e-6, 373.15, 6.8e-6, 273.15, &nu), PUMPLOSS_ENONFINITE);
  EXPECT_TRUE(std::isnan(nu));
  EXPECT_EQ(pumploss_viscosity_d341(313.15, 46e-6, 373.15, 6.8e-6, 273.15, nullptr), PUMPLOSS_EMISUSE);
  EXPECT_EQ(pumploss_d341_coefficients(313.15, 46e-6, 373.15, 6.8e-6, &a, nullptr), PUMPLOSS_EMISUSE);
  EXPECT_TRUE(std::isnan(a));
  double mid, lo, hi;
  EXPECT_EQ(pumploss_iso_vg(-46, &mid, &lo, &hi), PUMPLOSS_EDOMAIN);
  EXPECT_TRUE(std::isnan(mid) && std::isnan(lo) && std::isnan(hi));
  double sus;
  EXPECT_EQ(pumploss_sus_from_kinematic(1e-6, &sus), PUMPLOSS_WREGIME);
  EXPECT_FALSE(std::isnan(sus));  // reports keep their value
  EXPECT_EQ(pumploss_kinematic_from_sus(kInf, &nu), PUMPLOSS_ENONFINITE);
  double rho;
  EXPECT_EQ(pumploss_oil_density(870, 288.15, 6.5e-4, 1.4e9, 288.15, kNaN, &rho), PUMPLOSS_ENONFINITE);
  EXPECT_TRUE(std::isnan(rho));
  double mu;
  EXPECT_EQ(pumploss_viscosity_barus(0.04, 2e-8, kInf, &mu), PUMPLOSS_ENONFINITE);
  EXPECT_EQ(pumploss_dynamic_viscosity(1e-300, 1e-300, &mu), PUMPLOSS_EOVERFLOW);  // underflows to 0
  EXPECT_TRUE(std::isnan(mu));
  EXPECT_EQ(pumploss_kinematic_viscosity(1e300, 1e-300, &nu), PUMPLOSS_EOVERFLOW);
  EXPECT_TRUE(std::isnan(nu));
  EXPECT_EQ(pumploss_dynamic_viscosity(1e-150, 1e-150, &mu), PUMPLOSS_OK);
  (void)b;
}
