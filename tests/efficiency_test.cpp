// Tests of efficiency.hpp (efficiencies, powers, flow correction, derived displacement) and its C
// wrappers. Sources: tests/reference/SOURCES.md.
#include <gtest/gtest.h>

#include <cmath>
#include <random>
#include <string>
#include <vector>

#include "pumploss.h"
#include "pumploss/dual.hpp"
#include "pumploss/efficiency.hpp"
#include "test_support.hpp"

using pltest::kInf;
using pltest::kNaN;
using pltest::mp50;
using pumploss::status;

namespace {
struct eff_row {
  const char* source;
  int kind;
  double v, n, dp, q, t, eta_v, eta_hm, eta_t, tol;
};
const eff_row kRows[] = {
#include "reference/efficiency/efficiency_points.ipp"
};
constexpr double kPi = 3.14159265358979323846;
}  // namespace

TEST(PumpEfficiency, HandCaseArithmetic) {
  // hand_pump: V = 100 cm3/rev = 1e-4 m3/rev, n = 1500 rpm = 25 rev/s
  //   q_th = V n = 2.5e-3 m3/s (150 L/min); q = 2.4e-3 m3/s -> eta_v = 2.4/2.5 = 0.96
  //   T_th = V dp / (2 pi) = 1e-4 * 2e7 / (2 pi) = 2000 / (2 pi) = 318.30988618 N m
  //   T = 350 N m -> eta_hm = 318.30988618 / 350 = 0.90945681767
  //   eta_t = 0.96 * 0.90945681767 = 0.87307854496
  //   check by powers: P_h = 2.4e-3 * 2e7 = 48 000 W, P_m = 2 pi 25 350 = 54 977.871 W,
  //   48 000 / 54 977.871 = 0.87307854496.
  const auto r = pumploss::pump_efficiency(1e-4, 25.0, 2e7, 2.4e-3, 350.0);
  ASSERT_EQ(r.st, status::ok);
  EXPECT_NEAR(r.eta_v, 0.96, 1e-15);
  EXPECT_NEAR(r.torque_th, 2000.0 / (2 * kPi), 1e-12);
  EXPECT_NEAR(r.eta_hm, 0.90945681767, 1e-11);
  EXPECT_NEAR(r.eta_t, 0.87307854496, 1e-11);
  EXPECT_NEAR(r.p_hyd, 48000.0, 1e-9);
  EXPECT_NEAR(r.p_mech, 54977.871437821, 1e-8);
  EXPECT_NEAR(r.heat_w, 54977.871437821 - 48000.0, 1e-8);
  EXPECT_NEAR(r.q_loss, 1e-4, 1e-17);
  EXPECT_NEAR(r.torque_loss, 350.0 - 318.30988618379, 1e-10);
}

TEST(MotorEfficiency, HandCaseArithmetic) {
  // hand_motor: V = 1e-4 m3/rev, n = 20 rev/s: q_th = 2e-3 m3/s; q in = 2.1e-3 m3/s
  //   eta_v = 2.0/2.1 = 0.95238095238 (inverted against the pump definition)
  //   T_th = 318.30988618 N m; T out = 300 N m -> eta_hm = 300 / 318.30988618 = 0.3 pi = 0.94247779608
  //   eta_t = 0.95238095238 * 0.94247779608 = 0.89759790103
  //   check by powers: P_m = 2 pi 20 300 = 37 699.112 W out, P_h = 2.1e-3 * 2e7 = 42 000 W in.
  const auto r = pumploss::motor_efficiency(1e-4, 20.0, 2e7, 2.1e-3, 300.0);
  ASSERT_EQ(r.st, status::ok);
  EXPECT_NEAR(r.eta_v, 2.0 / 2.1, 1e-15);
  EXPECT_NEAR(r.eta_hm, 0.3 * kPi, 1e-15);
  EXPECT_NEAR(r.eta_t, 0.89759790103, 1e-11);
  EXPECT_NEAR(r.p_mech, 37699.111843078, 1e-8);
  EXPECT_NEAR(r.heat_w, 42000.0 - 37699.111843078, 1e-8);
  EXPECT_NEAR(r.q_loss, 1e-4, 1e-17);
  // The same numbers through the pump definitions would differ: the definitions are not symmetric.
  const auto p = pumploss::pump_efficiency(1e-4, 20.0, 2e7, 2.1e-3, 300.0);
  EXPECT_GT(p.eta_v, 1.0);
  EXPECT_EQ(p.st, status::implausible);
}

TEST(Efficiency, MatchesReferenceTable) {
  for (const auto& r : kRows) {
    const auto kind = r.kind == 0 ? pumploss::machine::pump : pumploss::machine::motor;
    const auto e = pumploss::machine_efficiency(kind, r.v, r.n, r.dp, r.q, r.t);
    ASSERT_EQ(e.st, status::ok) << r.source;
    EXPECT_NEAR(e.eta_v, r.eta_v, r.tol) << r.source;
    EXPECT_NEAR(e.eta_hm, r.eta_hm, r.tol) << r.source;
    EXPECT_NEAR(e.eta_t, r.eta_t, r.tol) << r.source;
    // C API gives the same numbers
    double ev = 0, eh = 0, et = 0;
    const int st = r.kind == 0 ? pumploss_pump_efficiency(r.v, r.n, r.dp, r.q, r.t, &ev, &eh, &et)
                               : pumploss_motor_efficiency(r.v, r.n, r.dp, r.q, r.t, &ev, &eh, &et);
    EXPECT_EQ(st, PUMPLOSS_OK);
    EXPECT_EQ(ev, e.eta_v);
    EXPECT_EQ(eh, e.eta_hm);
    EXPECT_EQ(et, e.eta_t);
  }
}

TEST(Efficiency, AgreesWith50DigitEvaluation) {
  std::mt19937_64 rng(11);
  std::uniform_real_distribution<double> v(1e-6, 1e-3), n(1, 60), dp(1e5, 4.5e7), eta(0.5, 0.999);
  double worst = 0;
  for (int i = 0; i < 3000; ++i) {
    const double vi = v(rng), ni = n(rng), dpi = dp(rng);
    const double q = vi * ni * eta(rng), t = vi * dpi / (2 * kPi) / eta(rng);
    for (auto kind : {pumploss::machine::pump, pumploss::machine::motor}) {
      const double qq = kind == pumploss::machine::pump ? q : vi * ni / eta(rng);
      const double tt = kind == pumploss::machine::pump ? t : vi * dpi / (2 * kPi) * eta(rng);
      const auto d = pumploss::machine_efficiency(kind, vi, ni, dpi, qq, tt);
      const auto m = pumploss::machine_efficiency<mp50>(kind, vi, ni, dpi, qq, tt);
      ASSERT_EQ(d.st, m.st);
      worst = std::max({worst, pltest::ulps(d.eta_v, m.eta_v), pltest::ulps(d.eta_hm, m.eta_hm),
                        pltest::ulps(d.eta_t, m.eta_t), pltest::ulps(d.p_mech, m.p_mech)});
    }
  }
  EXPECT_LE(worst, 3.0) << "worst ulp " << worst;
  RecordProperty("worst_ulp", std::to_string(worst));
}

TEST(Efficiency, AboveOneIsReportedNotHidden) {
  // A too small V_i: eta_hm of a pump above 1 (T_th > T).
  const auto r = pumploss::pump_efficiency(1e-4, 25.0, 2e7, 2.4e-3, 300.0);
  EXPECT_EQ(r.st, status::implausible);
  EXPECT_GT(r.eta_hm, 1.0);
  EXPECT_TRUE(pumploss::is_usable(r.st));
  double ev = 0, eh = 0, et = 0;
  EXPECT_EQ(pumploss_pump_efficiency(1e-4, 25.0, 2e7, 2.4e-3, 300.0, &ev, &eh, &et), PUMPLOSS_WIMPLAUSIBLE);
  EXPECT_GT(eh, 1.0);
  // motor with output torque above theoretical
  EXPECT_EQ(pumploss_motor_efficiency(1e-4, 20.0, 2e7, 2.1e-3, 330.0, &ev, &eh, &et), PUMPLOSS_WIMPLAUSIBLE);
  EXPECT_GT(eh, 1.0);
}

TEST(Efficiency, BadInput) {
  const double ok[5] = {1e-4, 25.0, 2e7, 2.4e-3, 350.0};
  for (int kind = 0; kind < 2; ++kind) {
    for (int i = 0; i < 5; ++i) {
      for (double bad : {kNaN, kInf, -kInf, -1.0}) {
        double a[5];
        std::copy(ok, ok + 5, a);
        a[i] = bad;
        double ev = 0, eh = 0, et = 0;
        const int st = kind == 0 ? pumploss_pump_efficiency(a[0], a[1], a[2], a[3], a[4], &ev, &eh, &et)
                                 : pumploss_motor_efficiency(a[0], a[1], a[2], a[3], a[4], &ev, &eh, &et);
        EXPECT_EQ(st, std::isfinite(bad) ? PUMPLOSS_EDOMAIN : PUMPLOSS_ENONFINITE) << kind << " arg " << i;
        EXPECT_TRUE(std::isnan(ev) && std::isnan(eh) && std::isnan(et));
      }
    }
  }
  // zero displacement, zero and negative speed
  EXPECT_EQ(pumploss::pump_efficiency(0.0, 25.0, 2e7, 2.4e-3, 350.0).st, status::domain);
  EXPECT_EQ(pumploss::motor_efficiency(0.0, 25.0, 2e7, 2.4e-3, 350.0).st, status::domain);
  EXPECT_EQ(pumploss::pump_efficiency(1e-4, -25.0, 2e7, 2.4e-3, 350.0).st, status::domain);
  EXPECT_EQ(pumploss::pump_efficiency(1e-4, 0.0, 2e7, 2.4e-3, 350.0).st, status::domain);
  EXPECT_TRUE(std::isnan(pumploss::pump_efficiency(1e-4, -25.0, 2e7, 2.4e-3, 350.0).eta_t));
  // zero flow is a valid pump reading (eta_v = 0); a motor cannot take in zero flow
  EXPECT_EQ(pumploss::pump_efficiency(1e-4, 25.0, 2e7, 0.0, 350.0).st, status::ok);
  EXPECT_EQ(pumploss::motor_efficiency(1e-4, 25.0, 2e7, 0.0, 350.0).st, status::domain);
  // overflow
  EXPECT_EQ(pumploss::pump_efficiency(1e300, 1e300, 2e7, 2.4e-3, 350.0).st, status::overflow);
  // NULL outputs
  double x = 0;
  EXPECT_EQ(pumploss_pump_efficiency(1e-4, 25.0, 2e7, 2.4e-3, 350.0, &x, NULL, &x), PUMPLOSS_EMISUSE);
  EXPECT_TRUE(std::isnan(x));
  EXPECT_EQ(pumploss_motor_efficiency(1e-4, 25.0, 2e7, 2.4e-3, 350.0, NULL, &x, &x), PUMPLOSS_EMISUSE);
}

TEST(EfficiencyBatch, MatchesScalarAndReportsPerElement) {
  const std::vector<double> v = {1e-4, 1e-4, 0.0, 1e-4, 1e-4};
  const std::vector<double> n = {25, 25, 25, kNaN, 25};
  const std::vector<double> dp = {2e7, 2e7, 2e7, 2e7, 2e7};
  const std::vector<double> q = {2.4e-3, 2.4e-3, 2.4e-3, 2.4e-3, 2.4e-3};
  const std::vector<double> t = {350, 300, 350, 350, 360};
  std::vector<double> ev(5), eh(5), et(5);
  std::vector<int> st(5);
  EXPECT_EQ(pumploss_pump_efficiency_batch(5, v.data(), n.data(), dp.data(), q.data(), t.data(), ev.data(), eh.data(),
                                           et.data(), st.data()),
            PUMPLOSS_EPARTIAL);
  EXPECT_EQ(st[0], PUMPLOSS_OK);
  EXPECT_EQ(st[1], PUMPLOSS_WIMPLAUSIBLE);
  EXPECT_EQ(st[2], PUMPLOSS_EDOMAIN);
  EXPECT_EQ(st[3], PUMPLOSS_ENONFINITE);
  EXPECT_TRUE(std::isnan(ev[2]) && std::isnan(et[3]));
  for (int i : {0, 1, 4}) {
    double a = 0, b = 0, c = 0;
    pumploss_pump_efficiency(v[i], n[i], dp[i], q[i], t[i], &a, &b, &c);
    EXPECT_EQ(a, ev[i]);
    EXPECT_EQ(b, eh[i]);
    EXPECT_EQ(c, et[i]);
  }
  // the pump's point through the motor definitions: eta_v = V n / q = 2.5/2.4 > 1, reported
  EXPECT_EQ(pumploss_motor_efficiency_batch(1, v.data(), n.data(), dp.data(), q.data(), t.data(), ev.data(), eh.data(),
                                            et.data(), st.data()),
            PUMPLOSS_WIMPLAUSIBLE);
  EXPECT_NEAR(ev[0], 2.5 / 2.4, 1e-15);
  // all good -> OK
  EXPECT_EQ(pumploss_pump_efficiency_batch(1, v.data(), n.data(), dp.data(), q.data(), t.data(), ev.data(), eh.data(),
                                           et.data(), st.data()),
            PUMPLOSS_OK);
  EXPECT_EQ(pumploss_pump_efficiency_batch(2, v.data(), n.data(), dp.data(), q.data(), t.data(), ev.data(), eh.data(),
                                           et.data(), st.data()),
            PUMPLOSS_WIMPLAUSIBLE);
  // NULL arrays
  EXPECT_EQ(pumploss_pump_efficiency_batch(5, v.data(), nullptr, dp.data(), q.data(), t.data(), ev.data(), eh.data(),
                                           et.data(), st.data()),
            PUMPLOSS_EMISUSE);
  EXPECT_TRUE(std::isnan(ev[0]));
  EXPECT_EQ(st[0], PUMPLOSS_EMISUSE);
  EXPECT_EQ(pumploss_pump_efficiency_batch(0, nullptr, nullptr, nullptr, nullptr, nullptr, nullptr, nullptr, nullptr,
                                           nullptr),
            PUMPLOSS_EMISUSE);
}

TEST(Powers, DefinitionsAndBadInput) {
  EXPECT_NEAR(pumploss::hydraulic_power(2.4e-3, 2e7).value, 48000.0, 1e-11);
  EXPECT_NEAR(pumploss::shaft_power(25.0, 350.0).value, 54977.871437821, 1e-8);
  EXPECT_NEAR(pumploss::theoretical_torque(1e-4, 2e7).value, 318.30988618379, 1e-10);
  EXPECT_EQ(pumploss::theoretical_flow(1e-4, 25.0).value, 2.5e-3);
  EXPECT_EQ(pumploss::theoretical_flow(0.0, 25.0).st, status::domain);
  EXPECT_EQ(pumploss::shaft_power(-1.0, 25.0).st, status::domain);
  EXPECT_EQ(pumploss::hydraulic_power(kNaN, 25.0).st, status::nonfinite);
  EXPECT_EQ(pumploss::hydraulic_power(1e300, 1e300).st, status::overflow);
  double a = 0, b = 0, c = 0, d = 0;
  EXPECT_EQ(pumploss_pump_powers(1e-4, 25.0, 2e7, 2.4e-3, 350.0, &a, &b, &c, &d), PUMPLOSS_OK);
  EXPECT_EQ(a, 2.5e-3);
  EXPECT_NEAR(c, 48000.0, 1e-11);
  EXPECT_EQ(pumploss_motor_powers(1e-4, 20.0, 2e7, 2.1e-3, 300.0, &a, &b, &c, &d), PUMPLOSS_OK);
  EXPECT_EQ(c, 42000.0);
  EXPECT_EQ(pumploss_motor_powers(1e-4, 20.0, 2e7, 2.1e-3, 300.0, &a, &b, &c, NULL), PUMPLOSS_EMISUSE);
  EXPECT_TRUE(std::isnan(a));
}

TEST(Efficiency, DualNumberSensitivities) {
  // d eta_t / d x_i for eta_t = q dp / (2 pi n T): relative sensitivities +1, +1, -1, -1, 0 (V).
  using D = pumploss::dual<double, 5>;
  const double x[5] = {107e-6, 25.0, 2.5e7, 152.0 / 60000.0, 450.0};
  D a[5];
  for (std::size_t i = 0; i < 5; ++i) a[i] = D::variable(x[i], i);
  const auto r = pumploss::pump_efficiency(a[0], a[1], a[2], a[3], a[4]);
  ASSERT_EQ(r.st, status::ok);
  const double et = r.eta_t.val;
  EXPECT_NEAR(r.eta_t.d[0] * x[0] / et, 0.0, 1e-15);
  EXPECT_NEAR(r.eta_t.d[1] * x[1] / et, -1.0, 1e-14);
  EXPECT_NEAR(r.eta_t.d[2] * x[2] / et, 1.0, 1e-14);
  EXPECT_NEAR(r.eta_t.d[3] * x[3] / et, 1.0, 1e-14);
  EXPECT_NEAR(r.eta_t.d[4] * x[4] / et, -1.0, 1e-14);
  // eta_v = q / (V n): relative sensitivity to V is -1
  EXPECT_NEAR(r.eta_v.d[0] * x[0] / r.eta_v.val, -1.0, 1e-14);
  // motor eta_hm = 2 pi T / (V dp)
  const auto m = pumploss::motor_efficiency(a[0], a[1], a[2], a[3], a[4]);
  EXPECT_NEAR(m.eta_hm.d[4] * x[4] / m.eta_hm.val, 1.0, 1e-14);
  EXPECT_NEAR(m.eta_hm.d[2] * x[2] / m.eta_hm.val, -1.0, 1e-14);
}

TEST(FlowAtPort, ExactAndLinearisedCorrection) {
  // methods_2_3_example (tests/reference/SOURCES.md): 250 bar between port and meter, 13 K warmer meter, K = 1.6 GPa,
  // alpha = 6.5e-4 1/K: linear factor 1 - 2.5e7/1.6e9 - 6.5e-4*13 = 1 - 0.015625 - 0.00845 = 0.975925.
  const double q_e = 2.5e-3, rho = 870, tr = 288.15;
  const auto lin = pumploss::flow_at_port_linear(q_e, 0.0, 333.15, 2.5e7, 320.15, 6.5e-4, 1.6e9);
  ASSERT_EQ(lin.st, status::ok);
  EXPECT_NEAR(lin.value / q_e, 0.975925, 1e-15);
  const auto ex = pumploss::flow_at_port(q_e, 0.0, 333.15, 2.5e7, 320.15, rho, tr, 6.5e-4, 1.6e9);
  ASSERT_EQ(ex.st, status::ok);
  // exact ratio: [1 - a(333.15 - tr)] / [1 - a(320.15 - tr)] * (1 - p2/K)
  const double exact = (1 - 6.5e-4 * (333.15 - tr)) / (1 - 6.5e-4 * (320.15 - tr)) * (1 - 2.5e7 / 1.6e9);
  EXPECT_NEAR(ex.value / q_e, exact, 1e-15);
  EXPECT_LT(std::fabs(ex.value - lin.value) / ex.value, 3e-4);  // second-order difference
  // 50-digit evaluation of the same template
  const auto m = pumploss::flow_at_port<mp50>(q_e, 0.0, 333.15, 2.5e7, 320.15, rho, tr, 6.5e-4, 1.6e9);
  EXPECT_LE(pltest::ulps(ex.value, m.value), 4.0);
  // same state -> unchanged
  EXPECT_EQ(pumploss::flow_at_port(q_e, 1e6, 320.0, 1e6, 320.0, rho, tr, 6.5e-4, 1.6e9).value, q_e);
  // large correction reported by the linear form
  EXPECT_EQ(pumploss::flow_at_port_linear(q_e, 0.0, 400.0, 1e8, 300.0, 6.5e-4, 1.6e9).st, status::regime);
  // bad input
  EXPECT_EQ(pumploss::flow_at_port(-1.0, 0.0, 333.15, 2.5e7, 320.15, rho, tr, 6.5e-4, 1.6e9).st, status::domain);
  EXPECT_EQ(pumploss::flow_at_port(kNaN, 0.0, 333.15, 2.5e7, 320.15, rho, tr, 6.5e-4, 1.6e9).st, status::nonfinite);
  EXPECT_EQ(pumploss::flow_at_port(q_e, 0.0, 333.15, 2e9, 320.15, rho, tr, 6.5e-4, 1.6e9).st, status::domain);
  double out = 0;
  EXPECT_EQ(pumploss_flow_at_port(q_e, 0.0, 333.15, 2.5e7, 320.15, rho, tr, 6.5e-4, 1.6e9, &out), PUMPLOSS_OK);
  EXPECT_EQ(out, ex.value);
  EXPECT_EQ(pumploss_flow_at_port_linear(q_e, 0.0, 333.15, 2.5e7, 320.15, -1.0, 1.6e9, &out), PUMPLOSS_EDOMAIN);
  EXPECT_TRUE(std::isnan(out));
}

namespace {
// Synthetic test-stand data: q = V n - k_l dp (1 + s dp) + noise, per ISO 8426 style grids.
struct grid {
  std::vector<double> n, dp, q;
};
grid make_grid(double v, std::size_t levels, std::size_t per_level, double noise, unsigned seed) {
  std::mt19937_64 rng(seed);
  std::normal_distribution<double> e(0.0, noise);
  grid g;
  for (std::size_t j = 0; j < levels; ++j) {
    const double dp = 2e6 + 6e6 * static_cast<double>(j);
    for (std::size_t i = 0; i < per_level; ++i) {
      const double n = 8.0 + 6.0 * static_cast<double>(i);
      // slope V_j = v (1 - 2e-10 dp) falls with pressure (compression), leakage 3e-12 dp
      g.n.push_back(n);
      g.dp.push_back(dp);
      g.q.push_back(v * (1 - 2e-10 * dp) * n - 3e-12 * dp + e(rng));
    }
  }
  return g;
}
}  // namespace

TEST(DerivedDisplacement, ExactDataRecovered) {
  const double v = 107e-6;
  // A: at one low pressure, q = V_j n + c
  const auto g = make_grid(v, 5, 6, 0.0, 1);
  const auto a = pumploss::displacement_slope(g.n.data(), g.q.data(), 6);
  ASSERT_EQ(a.st, status::ok);
  EXPECT_EQ(a.estimator, pumploss::displacement_estimator::slope_low_pressure);
  EXPECT_NEAR(a.v_m3_rev / (v * (1 - 2e-10 * 2e6)), 1.0, 1e-13);
  EXPECT_NEAR(a.aux, -3e-12 * 2e6, 1e-16);
  // C: two-step intercept removes leakage and the pressure effect -> exactly v
  const auto c = pumploss::displacement_two_step(g.n.data(), g.dp.data(), g.q.data(), 5, 6);
  ASSERT_EQ(c.st, status::ok);
  EXPECT_EQ(c.estimator, pumploss::displacement_estimator::two_step);
  EXPECT_NEAR(c.v_m3_rev / v, 1.0, 1e-13);
  EXPECT_NEAR(c.aux, -2e-10 * v, 1e-22);
  EXPECT_LT(c.u_v_m3_rev, 1e-12 * v);
  // B: at one speed, q(dp) = v n - (2e-10 v n + 3e-12) dp: intercept / n = v exactly
  std::vector<double> dp, q;
  for (std::size_t j = 0; j < 5; ++j) {
    dp.push_back(g.dp[j * 6 + 2]);
    q.push_back(g.q[j * 6 + 2]);
  }
  const auto b = pumploss::displacement_intercept(g.n[2], dp.data(), q.data(), 5);
  ASSERT_EQ(b.st, status::ok);
  EXPECT_EQ(b.estimator, pumploss::displacement_estimator::zero_pressure_intercept);
  EXPECT_NEAR(b.v_m3_rev / v, 1.0, 1e-13);
  EXPECT_STREQ(pumploss::displacement_estimator_name(b.estimator),
               "zero-pressure intercept at one speed (as ISO 8426-2:2025)");
  // C API
  double vv = 0, uu = 0;
  EXPECT_EQ(pumploss_displacement_two_step(5, 6, g.n.data(), g.dp.data(), g.q.data(), &vv, &uu), PUMPLOSS_OK);
  EXPECT_EQ(vv, c.v_m3_rev);
  EXPECT_EQ(pumploss_displacement_slope(6, g.n.data(), g.q.data(), &vv, &uu), PUMPLOSS_OK);
  EXPECT_EQ(vv, a.v_m3_rev);
  EXPECT_EQ(pumploss_displacement_intercept(5, g.n[2], dp.data(), q.data(), &vv, &uu), PUMPLOSS_OK);
  EXPECT_EQ(vv, b.v_m3_rev);
}

TEST(DerivedDisplacement, NoisyDataWithinReportedError) {
  // Over several seeds the two-step estimate lies within its reported standard errors of the
  // truth: 8 levels give a t distribution with 6 degrees of freedom (P(|t| > 5) = 0.25 %), and the
  // RMS z-score is near sqrt(6/4) = 1.22 when the reported errors have the right size.
  const double v = 107e-6;
  double z2 = 0;
  const int seeds = 40;
  for (int s = 0; s < seeds; ++s) {
    const auto g = make_grid(v, 8, 6, 2e-6, static_cast<unsigned>(100 + s));
    const auto c = pumploss::displacement_two_step(g.n.data(), g.dp.data(), g.q.data(), 8, 6);
    ASSERT_EQ(c.st, status::ok);
    const double z = (c.v_m3_rev - v) / c.u_v_m3_rev;
    EXPECT_LT(std::fabs(z), 5.0) << "seed " << s;
    z2 += z * z;
  }
  const double rms_z = std::sqrt(z2 / seeds);
  EXPECT_GT(rms_z, 0.7);
  EXPECT_LT(rms_z, 1.8);
  RecordProperty("two_step_rms_z", std::to_string(rms_z));
}

TEST(DerivedDisplacement, BadInputAndSmallGrids) {
  const auto g = make_grid(107e-6, 3, 3, 0.0, 1);
  EXPECT_EQ(pumploss::displacement_two_step(g.n.data(), g.dp.data(), g.q.data(), 3, 3).st, status::regime);
  EXPECT_EQ(pumploss::displacement_two_step(g.n.data(), g.dp.data(), g.q.data(), 2, 3).st, status::insufficient_data);
  EXPECT_EQ(pumploss::displacement_slope(g.n.data(), g.q.data(), 2).st, status::insufficient_data);
  const double same_n[3] = {10, 10, 10}, q3[3] = {1e-3, 1e-3, 1e-3};
  EXPECT_EQ(pumploss::displacement_slope(same_n, q3, 3).st, status::insufficient_data);
  const double neg_n[3] = {10, -10, 12};
  EXPECT_EQ(pumploss::displacement_slope(neg_n, q3, 3).st, status::domain);
  const double nan_q[3] = {1e-3, kNaN, 1e-3};
  EXPECT_EQ(pumploss::displacement_slope(g.n.data(), nan_q, 3).st, status::nonfinite);
  EXPECT_EQ(pumploss::displacement_intercept(0.0, g.dp.data(), g.q.data(), 3).st, status::domain);
  EXPECT_EQ(pumploss::displacement_slope<double>(nullptr, q3, 3).st, status::misuse);
  double vv = 0, uu = 0;
  EXPECT_EQ(pumploss_displacement_slope(3, NULL, q3, &vv, &uu), PUMPLOSS_EMISUSE);
  EXPECT_EQ(pumploss_displacement_slope(3, same_n, q3, &vv, &uu), PUMPLOSS_EDATA);
  EXPECT_TRUE(std::isnan(vv) && std::isnan(uu));
  EXPECT_EQ(pumploss_displacement_two_step(3, 3, g.n.data(), g.dp.data(), g.q.data(), &vv, NULL), PUMPLOSS_EMISUSE);
}
