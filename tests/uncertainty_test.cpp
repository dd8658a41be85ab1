// Tests of uncertainty.hpp (GUM propagation with dual-number sensitivities) and its C wrappers.
// Sources: tests/reference/SOURCES.md (methods13_row19, gum_analytic, jcgm101_mc).
#include <gtest/gtest.h>

#include <cmath>
#include <random>
#include <string>

#include "pumploss.h"
#include "pumploss/uncertainty.hpp"
#include "test_support.hpp"

using pltest::kNaN;
using pumploss::machine;
using pumploss::status;
using pumploss::uncertainty_basis;
using pumploss::uncertainty_distribution;

namespace {
constexpr double kV = 107e-6, kN = 25.0, kDp = 2.5e7, kQ = 152.0 / 60000.0, kT = 450.0;
// methods13_row19 limits: 1.5 % flow, 1.5 % pressure, 1 % torque, 1 % speed, rectangular
pumploss::efficiency_inputs<double> row19() {
  auto u = [](double pct, double x) {
    return pumploss::standard_uncertainty(pct, uncertainty_basis::percent_of_reading,
                                          uncertainty_distribution::rectangular, x)
        .value;
  };
  return {kV, kN, kDp, kQ, kT, 0.0, u(1.0, kN), u(1.5, kDp), u(1.5, kQ), u(1.0, kT), 0.0};
}
}  // namespace

TEST(StandardUncertainty, RectangularPercentAndExpanded) {
  // 1.5 % of 250 bar as rectangular limits: a = 3.75e5 Pa, u = a / sqrt(3) = 2.1651e5 Pa
  const auto r = pumploss::standard_uncertainty(1.5, uncertainty_basis::percent_of_reading,
                                                uncertainty_distribution::rectangular, 2.5e7);
  ASSERT_EQ(r.st, status::ok);
  EXPECT_NEAR(r.value, 3.75e5 / std::sqrt(3.0), 1e-9);
  EXPECT_EQ(pumploss::standard_uncertainty(0.2, uncertainty_basis::absolute, uncertainty_distribution::expanded_k2, 5.0)
                .value,
            0.1);
  EXPECT_EQ(pumploss::standard_uncertainty(-0.2, uncertainty_basis::absolute, uncertainty_distribution::standard, 5.0)
                .st,
            status::domain);
  double u = 0;
  EXPECT_EQ(pumploss_standard_uncertainty(1.5, 1, 1, 2.5e7, &u), PUMPLOSS_OK);
  EXPECT_EQ(u, r.value);
  EXPECT_EQ(pumploss_standard_uncertainty(1.5, 1, 5, 2.5e7, &u), PUMPLOSS_EMISUSE);
  EXPECT_TRUE(std::isnan(u));
  // pressure difference of two transducers
  EXPECT_NEAR(pumploss::pressure_difference_uncertainty(3e4, 4e4, 0.0).value, 5e4, 1e-9);
  EXPECT_NEAR(pumploss::pressure_difference_uncertainty(3e4, 3e4, 1.0).value, 0.0, 1e-9);
  EXPECT_EQ(pumploss::pressure_difference_uncertainty(3e4, 3e4, 1.5).st, status::domain);
  EXPECT_EQ(pumploss_pressure_difference_uncertainty(3e4, 4e4, 0.0, &u), PUMPLOSS_OK);
  EXPECT_NEAR(u, 5e4, 1e-9);
}

TEST(EfficiencyGum, MethodsRow19) {
  // methods13_row19 (self-calculated): u_rel(eta_t) = sqrt(1.5^2 + 1.5^2 + 1^2 + 1^2)/sqrt(3) % =
  // sqrt(6.5/3) % = 1.472 %; U(k = 2) = 2.94 %.
  const auto r = pumploss::efficiency_gum(machine::pump, row19());
  ASSERT_EQ(r.st, status::ok);
  EXPECT_NEAR(r.eta_t.value, 0.89598, 0.5e-5);
  EXPECT_NEAR(100 * r.eta_t.u / r.eta_t.value, 1.472, 0.5e-3);
  EXPECT_NEAR(100 * r.eta_t.U / r.eta_t.value, 2.94, 0.005);
  EXPECT_NEAR(r.eta_t.u / r.eta_t.value, std::sqrt(6.5 / 3.0) / 100, 1e-15);
}

TEST(EfficiencyGum, AnalyticEqualsDual) {
  // gum_analytic: eta_v = q/(V n), eta_hm = V dp/(2 pi T), eta_t = q dp/(2 pi n T): the relative
  // sensitivities are +-1, so the relative variances add. With a V_i uncertainty too:
  auto x = row19();
  x.u_displacement = 0.004 * kV;
  const auto r = pumploss::efficiency_gum(machine::pump, x);
  const double rq = x.u_flow / kQ, rn = x.u_speed / kN, rp = x.u_dp / kDp, rt = x.u_torque / kT, rv = 0.004;
  EXPECT_NEAR(r.eta_v.u / r.eta_v.value, std::sqrt(rq * rq + rn * rn + rv * rv), 1e-15);
  EXPECT_NEAR(r.eta_hm.u / r.eta_hm.value, std::sqrt(rv * rv + rp * rp + rt * rt), 1e-15);
  EXPECT_NEAR(r.eta_t.u / r.eta_t.value, std::sqrt(rq * rq + rp * rp + rn * rn + rt * rt), 1e-15);
  EXPECT_NEAR(r.p_hyd.u / r.p_hyd.value, std::sqrt(rq * rq + rp * rp), 1e-15);
  EXPECT_NEAR(r.p_mech.u / r.p_mech.value, std::sqrt(rn * rn + rt * rt), 1e-15);
  // explicit sensitivity: d eta_t / d q = dp / (2 pi n T)
  EXPECT_NEAR(r.eta_t.c[3], kDp / (2 * 3.14159265358979323846 * kN * kT), 1e-15 * r.eta_t.c[3]);
  // motor: eta_hm = 2 pi T / (V dp): same relative variances
  const auto m = pumploss::efficiency_gum(machine::motor, pumploss::efficiency_inputs<double>{kV, 20.0, 2e7, 2.3e-3, 300.0, 0.004 * kV, 0.1, 2e5, 2e-5,
                                                           2.0, 0.0});
  ASSERT_EQ(m.st, status::ok);
  EXPECT_NEAR(m.eta_hm.u / m.eta_hm.value, std::sqrt(0.004 * 0.004 + 0.01 * 0.01 + (2.0 / 300) * (2.0 / 300)), 1e-15);
}

TEST(EfficiencyGum, CorrelatedFlowMeterAndDisplacementCancel) {
  // V_i derived with the same flow meter: the meter's relative error enters q and V_i alike
  // (r = 1, equal relative uncertainties) and cancels in eta_v = q / (V_i n).
  auto x = row19();
  x.u_displacement = kV * x.u_flow / kQ;
  x.r_flow_displacement = 1.0;
  const auto r = pumploss::efficiency_gum(machine::pump, x);
  EXPECT_NEAR(r.eta_v.u / r.eta_v.value, x.u_speed / kN, 1e-15);
  x.r_flow_displacement = 0.0;
  const auto r0 = pumploss::efficiency_gum(machine::pump, x);
  EXPECT_GT(r0.eta_v.u, 2 * r.eta_v.u);
  double a = 0, b = 0, c = 0;
  EXPECT_EQ(pumploss_pump_efficiency_uncertainty(kV, kN, kDp, kQ, kT, x.u_displacement, x.u_speed, x.u_dp, x.u_flow,
                                                 x.u_torque, 1.0, &a, &b, &c),
            PUMPLOSS_OK);
  EXPECT_EQ(a, r.eta_v.u);
  EXPECT_EQ(pumploss_motor_efficiency_uncertainty(kV, kN, kDp, 2.8e-3, 400.0, x.u_displacement, x.u_speed, x.u_dp,
                                                  x.u_flow, x.u_torque, 1.0, &a, &b, &c),
            PUMPLOSS_OK);
  EXPECT_GT(c, 0.0);
}

TEST(EfficiencyGum, MonteCarloAgreesWithinSamplingError) {
  // jcgm101_mc: draw the four readings from their rectangular distributions (fixed seed), compute
  // eta_t for each draw, compare the sample standard deviation with the GUM value. The relative
  // standard error of a standard deviation from N draws is about sqrt((kurtosis - 1)/(4N)); for the
  // near-normal sum of four rectangulars that is below 1/sqrt(2N) = 0.5 % at N = 20 000.
  const auto x = row19();
  const auto g = pumploss::efficiency_gum(machine::pump, x);
  std::mt19937_64 rng(20260101);
  std::uniform_real_distribution<double> u(-1.0, 1.0);
  const int n = 20000;
  double sum = 0, sum2 = 0;
  const double s3 = std::sqrt(3.0);
  for (int i = 0; i < n; ++i) {
    const double nn = kN + s3 * x.u_speed * u(rng), dp = kDp + s3 * x.u_dp * u(rng);
    const double q = kQ + s3 * x.u_flow * u(rng), t = kT + s3 * x.u_torque * u(rng);
    const double e = pumploss::pump_efficiency(kV, nn, dp, q, t).eta_t;
    sum += e;
    sum2 += e * e;
  }
  const double mean = sum / n, sd = std::sqrt((sum2 - n * mean * mean) / (n - 1));
  const double se_rel = 1 / std::sqrt(2.0 * n);
  EXPECT_NEAR(sd / g.eta_t.u, 1.0, 3 * se_rel) << "MC " << sd << " GUM " << g.eta_t.u;
  EXPECT_NEAR(mean / g.eta_t.value, 1.0, 3 * g.eta_t.u / std::sqrt(double(n)) / g.eta_t.value + 1e-4);
  RecordProperty("mc_over_gum", std::to_string(sd / g.eta_t.u));
}

TEST(EfficiencyGum, BadInput) {
  auto x = row19();
  x.u_flow = -1.0;
  EXPECT_EQ(pumploss::efficiency_gum(machine::pump, x).st, status::domain);
  x = row19();
  x.r_flow_displacement = 1.5;
  EXPECT_EQ(pumploss::efficiency_gum(machine::pump, x).st, status::domain);
  x = row19();
  x.speed_rev_s = -25.0;
  const auto r = pumploss::efficiency_gum(machine::pump, x);
  EXPECT_EQ(r.st, status::domain);
  EXPECT_TRUE(std::isnan(r.eta_t.u) && std::isnan(r.eta_t.value));
  x = row19();
  x.u_dp = kNaN;
  EXPECT_EQ(pumploss::efficiency_gum(machine::pump, x).st, status::nonfinite);
  // implausible point: value and uncertainty kept, status reported
  x = row19();
  x.torque_n_m = 400.0;
  const auto imp = pumploss::efficiency_gum(machine::pump, x);
  EXPECT_EQ(imp.st, status::implausible);
  EXPECT_GT(imp.eta_hm.value, 1.0);
  EXPECT_GT(imp.eta_hm.u, 0.0);
  double a = 0, b = 0, c = 0;
  EXPECT_EQ(pumploss_pump_efficiency_uncertainty(0.0, kN, kDp, kQ, kT, 0, 0, 0, 0, 0, 0, &a, &b, &c),
            PUMPLOSS_EDOMAIN);
  EXPECT_TRUE(std::isnan(a) && std::isnan(b) && std::isnan(c));
  EXPECT_EQ(pumploss_pump_efficiency_uncertainty(kV, kN, kDp, kQ, kT, 0, 0, 0, 0, 0, 0, &a, NULL, &c),
            PUMPLOSS_EMISUSE);
}
