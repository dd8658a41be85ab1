// The field flow test: a hand calculation with motor slip (step by step below, repeated in
// mpmath: tests/reference/flow_test/), the speed fall that must not read as leakage, the
// 50-digit evaluation, scenarios generated from a known pump with meter noise and wear, messy
// inputs, and bad input.
#include <gtest/gtest.h>

#include <cmath>
#include <cstring>
#include <random>
#include <string>

#include "pumploss/flow_test.hpp"
#include "rotary_support.hpp"
#include "test_support.hpp"

namespace {

using pltest::mp50;
using pumploss::status;
using pltest::flow_test_row;

constexpr double kLmin = 1.0 / 60000.0;  // m^3/s per L/min
constexpr double kRpm = 1.0 / 60.0;      // rev/s per rpm

template <class T>
pumploss::flow_test_setup<T> hand_setup() {
  pumploss::flow_test_setup<T> s{};
  s.displacement_m3_rev = T(0);  // derived from the readings
  s.hydromech_efficiency = T(0.85);
  s.motor = {T(25), T(1450) / T(60), T(7500)};
  s.mu_test_pa_s = T(0.020);
  s.mu_ref_pa_s = T(0.028);
  s.ref_pressure_pa = T(170e5);
  s.ref_speed_rev_s = T(1450) / T(60);
  s.new_volumetric_efficiency = T(0.95);
  s.limit = T(pumploss::flow_test_default_limit);
  s.watch_band = T(pumploss::flow_test_default_watch_band);
  return s;
}

// Hand calculation (self-calculated), a 4-pole 50 Hz motor of 7.5 kW at 1450 rpm driving a gear
// pump; flow meter readings 18.0 L/min at 0 bar and 16.0 L/min at 170 bar, speeds not measured.
//  1. rated torque M_r = P / (2 pi n_r) = 7500 / (2 pi 1450/60) = 49.3929 N m
//  2. no load: torque 0, so n_0 = n_s = 1500 rpm; displacement V = q_0 / n_0 = 18.0 L/min /
//     1500 rpm = 12.0 cm3/rev (with p_0 = 0 the two-point formula reduces to this)
//  3. loaded torque M_1 = V dp / (2 pi eta_hm) = 12e-6 x 170e5 / (2 pi 0.85) = 38.1972 N m
//  4. slip in proportion: (1500 - 1450) x 38.1972 / 49.3929 = 50 x 0.773333 = 38.667 rpm, so
//     n_1 = 1461.333 rpm
//  5. ideal flow at n_1: 12.0 x 1461.333 = 17.536 L/min; leakage 17.536 - 16.0 = 1.536 L/min;
//     volumetric efficiency 16.0 / 17.536 = 0.912409 (the raw ratio 16/18 = 0.8889 would have
//     blamed the pump for the motor's slip as well)
//  6. to the reference: 1.536 x (170/170) x (0.020/0.028) = 1.097143 L/min; ideal flow at
//     1450 rpm 17.4 L/min; efficiency 1 - 1.097143/17.4 = 0.936946; percent of new
//     0.936946 / 0.95 = 0.986259 -> pass (limit 0.85 + watch band 0.05).
TEST(FlowTestHandCalculation, MotorSlipIsNotLeakage) {
  const pumploss::flow_reading<double> r0{18.0 * kLmin, 0.0, 0.0}, r1{16.0 * kLmin, 170e5, 0.0};
  const auto s = hand_setup<double>();
  const auto r = pumploss::flow_test_evaluate(r0, r1, s);
  ASSERT_EQ(r.st, status::ok);
  const auto m1 = pumploss::induction_motor_speed(s.motor, flow_test_row("loaded torque"));
  EXPECT_NEAR(m1.value / flow_test_row("loaded speed"), 1.0, 1e-14);
  EXPECT_NEAR(s.motor.rated_power_w / (2 * pumploss::detail::pi<double>() * s.motor.rated_speed_rev_s) /
                  flow_test_row("rated torque"),
              1.0, 1e-14);
  EXPECT_NEAR(r.speed_no_load_rev_s, 25.0, 1e-14);
  EXPECT_NEAR(r.speed_loaded_rev_s / flow_test_row("loaded speed"), 1.0, 1e-14);
  EXPECT_NEAR(r.displacement_m3_rev / flow_test_row("displacement"), 1.0, 1e-14);
  EXPECT_NEAR(r.leakage_m3_s / flow_test_row("leakage"), 1.0, 1e-12);
  EXPECT_NEAR(r.volumetric_efficiency / flow_test_row("volumetric efficiency"), 1.0, 1e-14);
  EXPECT_NEAR(r.leakage_ref_m3_s / flow_test_row("leakage at reference"), 1.0, 1e-12);
  EXPECT_NEAR(r.volumetric_efficiency_ref / flow_test_row("volumetric efficiency at reference"), 1.0, 1e-14);
  EXPECT_NEAR(r.percent_of_new / flow_test_row("percent of new"), 1.0, 1e-14);
  EXPECT_NEAR(r.uncorrected_ratio / flow_test_row("uncorrected ratio"), 1.0, 1e-14);
  EXPECT_EQ(r.verdict, pumploss::flow_verdict::pass);
}

// A pump without leakage on a drive that falls from 1480 to 1450 rpm under load: the flow falls
// by 2 % with the speed, the volumetric efficiency stays 1 (self-calculated: q = V n exactly).
TEST(FlowTestHandCalculation, ASpeedFallFrom1480To1450IsNotAVolumetricLoss) {
  const double v = 40e-6;
  const pumploss::flow_reading<double> r0{v * 1480 * kRpm, 0.0, 1480 * kRpm}, r1{v * 1450 * kRpm, 200e5, 1450 * kRpm};
  auto s = hand_setup<double>();
  const auto r = pumploss::flow_test_evaluate(r0, r1, s);
  EXPECT_TRUE(pumploss::is_usable(r.st));
  EXPECT_NEAR(r.uncorrected_ratio, 1450.0 / 1480.0, 1e-15);  // the raw readings say 2.03 % lost
  EXPECT_NEAR(r.volumetric_efficiency, 1.0, 1e-14);
  EXPECT_NEAR(r.leakage_m3_s, 0.0, 1e-18);
  EXPECT_NEAR(r.displacement_m3_rev / v, 1.0, 1e-14);
  EXPECT_EQ(r.verdict, pumploss::flow_verdict::pass);
  // the same with speeds from the motor: the motor's slip is taken out in the same way
  const pumploss::flow_reading<double> m0{v * 25.0, 0.0, 0.0};
  const double tq = v * 200e5 / (2 * pumploss::detail::pi<double>() * s.hydromech_efficiency);
  const double n1 = pumploss::induction_motor_speed(s.motor, tq).value;
  const pumploss::flow_reading<double> m1{v * n1, 200e5, 0.0};
  const auto rm = pumploss::flow_test_evaluate(m0, m1, s);
  EXPECT_NEAR(rm.volumetric_efficiency, 1.0, 1e-14);
  EXPECT_LT(rm.uncorrected_ratio, 0.97);
}

TEST(FlowTest, AgreesWithTheFiftyDigitEvaluation) {
  const pumploss::flow_reading<mp50> m0{mp50(18) / 60000, mp50(3e5), mp50(0)}, m1{mp50(16) / 60000, mp50(170e5), mp50(0)};
  const pumploss::flow_reading<double> d0{18.0 * kLmin, 3e5, 0.0}, d1{16.0 * kLmin, 170e5, 0.0};
  const auto rm = pumploss::flow_test_evaluate(m0, m1, hand_setup<mp50>());
  const auto rd = pumploss::flow_test_evaluate(d0, d1, hand_setup<double>());
  ASSERT_EQ(rm.st, status::ok);
  ASSERT_EQ(rd.st, status::ok);
  // with p_0 > 0 the displacement and speeds come from the fixed-point iteration
  EXPECT_LT(pltest::rel_err(rd.displacement_m3_rev, rm.displacement_m3_rev), 1e-14);
  EXPECT_LT(pltest::rel_err(rd.speed_loaded_rev_s, rm.speed_loaded_rev_s), 1e-14);
  EXPECT_LT(pltest::rel_err(rd.leakage_m3_s, rm.leakage_m3_s), 1e-12);
  EXPECT_LT(pltest::rel_err(rd.percent_of_new, rm.percent_of_new), 1e-14);
}

// Scenarios from a known truth: a pump of displacement V and leak conductance G (at the
// reference viscosity), driven by the nameplate motor, oil at a test viscosity; readings with
// 0.5 % flow meter noise. The evaluation recovers the percent of new within the noise, and the
// verdict follows the wear.
TEST(FlowTestScenario, RecoversTheKnownPumpThroughMeterNoiseAndSlip) {
  std::mt19937 rng(20261203u);
  std::normal_distribution<double> noise(0.0, 0.005);
  const auto s = hand_setup<double>();
  const double v_true = 12.3e-6, eta_new = 0.95, p1 = 170e5, p0 = 5e5;
  const double n_ref = s.ref_speed_rev_s;
  const double g_new = (1 - eta_new) * v_true * n_ref / s.ref_pressure_pa;  // conductance at mu_ref
  const double two_pi_eta = 2 * pumploss::detail::pi<double>() * s.hydromech_efficiency;
  int right = 0, total = 0;
  for (const double wear : {1.0, 1.5, 2.0, 3.0, 4.0, 5.0}) {  // leak conductance times the new one
    const double g_test = wear * g_new * s.mu_ref_pa_s / s.mu_test_pa_s;
    const double n0 = pumploss::induction_motor_speed(s.motor, v_true * p0 / two_pi_eta).value;
    const double n1 = pumploss::induction_motor_speed(s.motor, v_true * p1 / two_pi_eta).value;
    const double truth = (1 - wear * (1 - eta_new)) / eta_new;
    for (int k = 0; k < 20; ++k) {
      const pumploss::flow_reading<double> r0{(v_true * n0 - g_test * p0) * (1 + noise(rng)), p0, 0.0};
      const pumploss::flow_reading<double> r1{(v_true * n1 - g_test * p1) * (1 + noise(rng)), p1, 0.0};
      const auto r = pumploss::flow_test_evaluate(r0, r1, s);
      ASSERT_TRUE(pumploss::is_usable(r.st)) << wear;
      // 0.5 % noise on each reading moves the percent of new by about 0.7 % / (1 - leak share)
      EXPECT_NEAR(r.percent_of_new, truth, 0.03) << "wear " << wear;
      const auto expected = truth < s.limit - 0.02 ? pumploss::flow_verdict::fail
                            : truth > s.limit + s.watch_band + 0.02 ? pumploss::flow_verdict::pass
                                                                     : r.verdict;
      right += r.verdict == expected;
      ++total;
    }
  }
  EXPECT_EQ(right, total);
}

TEST(FlowTest, MessyInputsAreReportedNotHidden) {
  auto s = hand_setup<double>();
  // loaded flow above the ideal flow (meter read high, or readings swapped in the log sheet)
  const pumploss::flow_reading<double> r0{18.0 * kLmin, 0.0, 25.0}, hi{18.5 * kLmin, 170e5, 24.0};
  const auto r = pumploss::flow_test_evaluate(r0, hi, s);
  s.displacement_m3_rev = 12e-6;
  const auto rs = pumploss::flow_test_evaluate(r0, hi, s);
  EXPECT_EQ(rs.st, status::implausible);
  EXPECT_LT(rs.leakage_m3_s, 0.0);
  EXPECT_TRUE(r.st == status::implausible || r.st == status::out_of_validity) << static_cast<int>(r.st);
  // stated displacement far from what the no-load reading says (wrong pump on the sheet)
  s.displacement_m3_rev = 16e-6;
  const pumploss::flow_reading<double> l1{16.0 * kLmin, 170e5, 1440 * kRpm}, l0{18.0 * kLmin, 0.0, 1500 * kRpm};
  EXPECT_EQ(pumploss::flow_test_evaluate(l0, l1, s).st, status::implausible);
  // reference pressure far above the test pressure (test run at half pressure)
  s = hand_setup<double>();
  s.ref_pressure_pa = 250e5;
  const pumploss::flow_reading<double> h1{16.0 * kLmin, 100e5, 1460 * kRpm};
  EXPECT_EQ(pumploss::flow_test_evaluate(l0, h1, s).st, status::extrapolated);
  // very cold test oil against a hot reference
  s = hand_setup<double>();
  s.mu_test_pa_s = 0.2;
  EXPECT_EQ(pumploss::flow_test_evaluate(l0, l1, s).st, status::extrapolated);
  // a motor loaded far over its rating: outside the linear slip region
  s = hand_setup<double>();
  s.motor.rated_power_w = 2000;
  const pumploss::flow_reading<double> n0{18.0 * kLmin, 0.0, 0.0}, n1{16.0 * kLmin, 170e5, 0.0};
  EXPECT_EQ(pumploss::flow_test_evaluate(n0, n1, s).st, status::regime);
  // a worn pump fails, one near the limit is "watch"
  s = hand_setup<double>();
  const pumploss::flow_reading<double> w1{12.5 * kLmin, 170e5, 1460 * kRpm}, k1{13.4 * kLmin, 170e5, 1460 * kRpm};
  EXPECT_EQ(pumploss::flow_test_evaluate(l0, w1, s).verdict, pumploss::flow_verdict::fail);
  const auto wk = pumploss::flow_test_evaluate(l0, k1, s);
  EXPECT_EQ(wk.verdict, pumploss::flow_verdict::watch) << wk.percent_of_new;
  EXPECT_STREQ(pumploss::flow_verdict_name(pumploss::flow_verdict::fail), "FAIL");
  EXPECT_STREQ(pumploss::flow_verdict_name(static_cast<pumploss::flow_verdict>(7)), "unknown");
}

TEST(FlowTest, BadInputGivesAClearStatusAndNaN) {
  const auto s = hand_setup<double>();
  const pumploss::flow_reading<double> r0{18.0 * kLmin, 0.0, 25.0}, r1{16.0 * kLmin, 170e5, 24.0};
  auto expect_fail = [](const pumploss::flow_test_result<double>& r, status st) {
    EXPECT_EQ(r.st, st);
    EXPECT_TRUE(std::isnan(r.volumetric_efficiency));
    EXPECT_TRUE(std::isnan(r.percent_of_new));
    EXPECT_TRUE(std::isnan(r.speed_loaded_rev_s));
    EXPECT_EQ(r.verdict, pumploss::flow_verdict::fail);
  };
  expect_fail(pumploss::flow_test_evaluate(r1, r0, s), status::domain);  // loaded below no-load pressure
  expect_fail(pumploss::flow_test_evaluate(r0, r0, s), status::domain);
  auto bad = r1;
  bad.flow_m3_s = pltest::kNaN;
  expect_fail(pumploss::flow_test_evaluate(r0, bad, s), status::nonfinite);
  bad = r1;
  bad.flow_m3_s = 0;
  expect_fail(pumploss::flow_test_evaluate(r0, bad, s), status::domain);
  bad = r1;
  bad.speed_rev_s = -1;
  expect_fail(pumploss::flow_test_evaluate(r0, bad, s), status::domain);
  auto sb = s;
  sb.new_volumetric_efficiency = 1.2;
  expect_fail(pumploss::flow_test_evaluate(r0, r1, sb), status::domain);
  sb = s;
  sb.mu_ref_pa_s = pltest::kInf;
  expect_fail(pumploss::flow_test_evaluate(r0, r1, sb), status::nonfinite);
  // speeds from a motor with no valid nameplate
  sb = s;
  sb.motor.rated_speed_rev_s = sb.motor.sync_speed_rev_s;
  const pumploss::flow_reading<double> z0{18.0 * kLmin, 0.0, 0.0};
  expect_fail(pumploss::flow_test_evaluate(z0, r1, sb), status::domain);
  sb = s;
  sb.hydromech_efficiency = 0;
  expect_fail(pumploss::flow_test_evaluate(z0, r1, sb), status::domain);
  const auto m = pumploss::induction_motor_speed(s.motor, -1.0);
  EXPECT_EQ(m.st, status::domain);
  EXPECT_TRUE(std::isnan(m.value));
  // a torque that would stop the motor
  EXPECT_EQ(pumploss::induction_motor_speed(s.motor, 1e6).st, status::out_of_validity);
}

}  // namespace
