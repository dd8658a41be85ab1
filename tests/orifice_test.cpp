// Tests of orifice.hpp and its C wrappers. Sources: tests/reference/SOURCES.md.
#include <gtest/gtest.h>

#include <cmath>
#include <random>

#include "pumploss.h"
#include "pumploss/orifice.hpp"
#include "test_support.hpp"

using pltest::kInf;
using pltest::kNaN;
using pltest::mp50;
using pltest::rel_err;
using pumploss::status;

TEST(OrificeFlow, MethodsRow17AndSampsonDelta) {
  // selfcalc_methods13 row 17: d 1 mm, Cd 0.61, 100 bar, 870 kg/m3 -> 4.35839249726714846 L/min
  EXPECT_NEAR(pumploss::orifice_flow(100e5, 870.0, 1e-3, 0.61).value * 60000.0 / 4.35839249726714846, 1.0, 2e-16 * 4);
  // row 22: delta = 1/sqrt(12 pi) = 0.162867503967639974
  EXPECT_NEAR(pumploss::orifice_sampson_delta<double>(), 0.162867503967639974, 1e-17);
}

TEST(OrificeFlow, Agrees50DigitAndInverses) {
  std::mt19937_64 rng(17);
  std::uniform_real_distribution<double> u(0.0, 1.0);
  double worst = 0, worst_inv = 0;
  for (int i = 0; i < 500; ++i) {
    const double dp = (u(rng) - 0.2) * 4e7, rho = 800 + 200 * u(rng), d = 1e-4 + 5e-3 * u(rng);
    const double cd = 0.5 + 0.4 * u(rng), mu = 0.005 + 0.1 * u(rng);
    if (dp == 0) continue;
    const double q = pumploss::orifice_flow(dp, rho, d, cd).value;
    worst = std::max(worst, rel_err(q, pumploss::orifice_flow<mp50>(dp, rho, d, cd).value));
    worst = std::max(worst, rel_err(pumploss::orifice_dp(q, rho, d, cd).value,
                                    pumploss::orifice_dp<mp50>(q, rho, d, cd).value));
    worst = std::max(worst, rel_err(pumploss::orifice_flow_viscous(dp, rho, mu, d, cd, 0.16).value,
                                    pumploss::orifice_flow_viscous<mp50>(dp, rho, mu, d, cd, 0.16).value));
    worst = std::max(worst, rel_err(pumploss::capillary_flow(dp, rho, mu, d, 0.05, 1.5).value,
                                    pumploss::capillary_flow<mp50>(dp, rho, mu, d, 0.05, 1.5).value));
    worst_inv = std::max(worst_inv, std::fabs(pumploss::orifice_dp(q, rho, d, cd).value / dp - 1));
    worst_inv = std::max(worst_inv, std::fabs(pumploss::orifice_diameter(q, dp, rho, cd).value / d - 1));
    const double qc = pumploss::capillary_flow(dp, rho, mu, d, 0.05, 1.5).value;
    worst_inv = std::max(worst_inv, std::fabs(pumploss::capillary_dp(qc, rho, mu, d, 0.05, 1.5).value / dp - 1));
  }
  EXPECT_LE(worst, 1e-14);
  EXPECT_LE(worst_inv, 1e-14);
  std::printf("[ orifice/capillary vs mp50: worst %.3g; round trips %.3g ]\n", worst, worst_inv);
}

TEST(OrificeFlow, LowReynoldsLimits) {
  // creeping limit: q -> 2 delta^2 A d dp / mu (Sampson: d^3 dp/(24 mu) with delta = 1/sqrt(12 pi))
  const double d = 0.5e-3, mu = 1.0, rho = 870, dp = 1.0;
  const double delta = pumploss::orifice_sampson_delta<double>();
  const double q = pumploss::orifice_flow_viscous(dp, rho, mu, d, 0.611, delta).value;
  EXPECT_NEAR(q / (d * d * d * dp / (24 * mu)), 1.0, 1e-3);
  // turbulent limit: equals the constant-Cd orifice
  const double qt = pumploss::orifice_flow_viscous(1e7, rho, 1e-6, d, 0.611, delta).value;
  EXPECT_NEAR(qt / pumploss::orifice_flow(1e7, rho, d, 0.611).value, 1.0, 1e-4);
  // the blended Cd is continuous and monotone in Re
  double prev = 0;
  for (double re = 1e-3; re < 1e7; re *= 1.7) {
    const double cd = pumploss::orifice_cd_low_re(re, 0.611, delta).value;
    EXPECT_GT(cd, prev);
    EXPECT_LT(cd, 0.611);
    prev = cd;
  }
  // consistency: q from orifice_flow_viscous gives back its own Cd at its own Re
  const double qv = pumploss::orifice_flow_viscous(2e4, rho, 0.04, d, 0.611, delta).value;
  const double re = pumploss::orifice_reynolds(qv, d, rho, 0.04).value;
  const double cd = pumploss::orifice_cd_low_re(re, 0.611, delta).value;
  EXPECT_NEAR(qv / pumploss::orifice_flow(2e4, rho, d, cd).value, 1.0, 1e-14);
  EXPECT_EQ(pumploss::orifice_reynolds(qv, d, rho, 0.04).st, status::regime);
}

TEST(OrificeCapillary, HagenPoiseuilleAndQuadratic) {
  // K = 0: Hagen-Poiseuille q = pi d^4 dp / (128 mu L)
  const double q = pumploss::capillary_flow(1e5, 870.0, 0.04, 1e-3, 0.05, 0.0).value;
  EXPECT_NEAR(q / (3.141592653589793 * 1e-12 * 1e5 / (128 * 0.04 * 0.05)), 1.0, 1e-15);
  // dominated by the K term at low viscosity: q -> A sqrt(2 dp/(K rho))
  const double qk = pumploss::capillary_flow(1e5, 870.0, 1e-9, 1e-3, 0.05, 2.0).value;
  EXPECT_NEAR(qk / (3.141592653589793 * 0.25e-6 * std::sqrt(2e5 / (2.0 * 870.0))), 1.0, 1e-6);
  EXPECT_EQ(pumploss::capillary_flow(1e7, 870.0, 1e-4, 1e-3, 0.05, 1.5).st, status::regime);
  EXPECT_LT(pumploss::capillary_flow(-1e5, 870.0, 0.04, 1e-3, 0.05, 1.0).value, 0.0);
}

TEST(OrificeNetwork, SeriesAndParallel) {
  EXPECT_DOUBLE_EQ(pumploss::orifice_series_cda(3e-6, 4e-6).value, 2.4e-6);
  EXPECT_DOUBLE_EQ(pumploss::orifice_parallel_cda(3e-6, 4e-6).value, 7e-6);
  // two equal orifices in series carry 1/sqrt(2) of one at the same total dp; the flow
  // through the equivalent equals the flow of each element at its own share of dp
  const double c = 0.61 * 3.141592653589793 * 0.25e-6;
  const double ceq = pumploss::orifice_series_cda(c, c).value;
  const double q = pumploss::orifice_flow_cda(1e7, 870.0, ceq).value;
  EXPECT_NEAR(q / pumploss::orifice_flow_cda(0.5e7, 870.0, c).value, 1.0, 1e-15);
  EXPECT_NEAR(pumploss::orifice_series_cda(1e-300, 1e300).value, 1e-300, 1e-314);  // no overflow
  EXPECT_EQ(pumploss::orifice_series_cda(0.0, 1.0).st, status::domain);
}

TEST(OrificeFlow, BadInput) {
  for (double v : {kNaN, kInf, -kInf}) {
    EXPECT_EQ(pumploss::orifice_flow(v, 870.0, 1e-3, 0.61).st, status::nonfinite);
    EXPECT_EQ(pumploss::orifice_dp(1e-4, v, 1e-3, 0.61).st, status::nonfinite);
    EXPECT_EQ(pumploss::capillary_flow(1e5, 870.0, v, 1e-3, 0.05, 0.0).st, status::nonfinite);
  }
  EXPECT_EQ(pumploss::orifice_flow(1e5, 870.0, 0.0, 0.61).st, status::domain);
  EXPECT_EQ(pumploss::orifice_flow(1e5, 870.0, -1e-3, 0.61).st, status::domain);
  EXPECT_EQ(pumploss::orifice_flow(1e5, 0.0, 1e-3, 0.61).st, status::domain);
  EXPECT_EQ(pumploss::orifice_flow(1e5, 870.0, 1e-3, 0.0).st, status::domain);
  EXPECT_TRUE(std::isnan(pumploss::orifice_flow(1e5, 870.0, 1e-3, 1.5).value));
  EXPECT_EQ(pumploss::orifice_diameter(1e-4, 0.0, 870.0, 0.61).st, status::domain);
  EXPECT_EQ(pumploss::orifice_cd_low_re(-1.0, 0.61, 0.16).st, status::domain);
  EXPECT_EQ(pumploss::orifice_flow_viscous(1e5, 870.0, 0.0, 1e-3, 0.61, 0.16).st, status::domain);
  EXPECT_EQ(pumploss::capillary_dp(1e-6, 870.0, 0.04, 1e-3, 0.0, 0.0).st, status::domain);
  double q = 0;
  EXPECT_EQ(pumploss_orifice_flow(1e5, 870.0, 1e-3, kNaN, &q), PUMPLOSS_ENONFINITE);
  EXPECT_TRUE(std::isnan(q));
  EXPECT_EQ(pumploss_orifice_flow(1e5, 870.0, 1e-3, 0.61, nullptr), PUMPLOSS_EMISUSE);
}
