// Inlet line at a cold start (Hagen-Poiseuille and Bernoulli, tests/reference/flow_test/), the
// lowest start temperature, case pressure against the shaft seal, and hydraulic motors (drain
// bands, creep at stall): hand calculations, the 50-digit evaluation and bad input.
#include <gtest/gtest.h>

#include <cmath>
#include <cstring>

#include "pumploss/inlet.hpp"
#include "pumploss/motor.hpp"
#include "rotary_support.hpp"
#include "test_support.hpp"

namespace {

using pltest::mp50;
using pumploss::status;
using pltest::flow_test_row;

template <class T>
pumploss::line<T> suction_pipe() {
  pumploss::line<T> l;
  l.height_m = T(0.5);  // pump inlet 0.5 m above the oil level
  l.elements.push_back(pumploss::line_pipe(T(0.025), T(1.5), T(0)));
  return l;
}

TEST(InletCheck, LaminarPipeMatchesHagenPoiseuilleAndBernoulli) {
  const auto o = pltest::rotary_test_oil<double>();
  const auto p = pumploss::inlet_check(suction_pipe<double>(), o, 30.0 / 60000, 313.15, 101325.0, 80000.0);
  ASSERT_TRUE(pumploss::is_usable(p.st));
  EXPECT_NEAR(p.inlet_pa / flow_test_row("inlet pressure"), 1.0, 1e-11);
  EXPECT_NEAR(p.margin_pa, flow_test_row("inlet pressure") - 80000.0, 1e-4);
  EXPECT_TRUE(p.pass);
  const auto drop = pumploss::line_pressure_drop_at(suction_pipe<double>(), 30.0 / 60000, o, 313.15);
  EXPECT_NEAR((drop.dp_pa - drop.dp_static_pa) / flow_test_row("friction drop"), 1.0, 1e-9);
  // the 50-digit evaluation
  const auto pm = pumploss::inlet_check(suction_pipe<mp50>(), pltest::rotary_test_oil<mp50>(), mp50(30) / 60000, mp50(313.15),
                                        mp50(101325), mp50(80000));
  EXPECT_LT(pltest::rel_err(p.inlet_pa, pm.inlet_pa), 1e-13);
}

TEST(InletCheck, ColdOilFailsAndTheLowestStartTemperatureIsFound) {
  const auto o = pltest::rotary_test_oil<double>();
  const auto l = suction_pipe<double>();
  const double q = 30.0 / 60000;
  const auto cold = pumploss::inlet_check(l, o, q, 263.15, 101325.0, 80000.0);  // -10 degC
  EXPECT_FALSE(cold.pass);
  EXPECT_GT(cold.nu_m2_s, 500e-6);
  const auto t = pumploss::inlet_min_temperature(l, o, q, 101325.0, 80000.0, 243.15, 373.15);
  ASSERT_EQ(t.st, status::ok);
  const auto at = pumploss::inlet_check(l, o, q, t.value, 101325.0, 80000.0);
  EXPECT_NEAR(at.margin_pa, 0.0, 1.0);  // 1e-6 K of bisection is far below 1 Pa
  EXPECT_GT(t.value, 263.15);
  EXPECT_LT(t.value, 313.15);
  // warm enough at the low end: that end itself
  EXPECT_EQ(pumploss::inlet_min_temperature(l, o, q, 101325.0, 80000.0, 330.0, 373.15).value, 330.0);
  // never passes (the maker asks for more than the tank gives)
  EXPECT_EQ(pumploss::inlet_min_temperature(l, o, q, 101325.0, 101000.0, 243.15, 373.15).st,
            status::out_of_validity);
  // a line that cannot deliver the flow: the oil column breaks
  const auto broken = pumploss::inlet_check(l, o, 300.0 / 60000, 243.15, 101325.0, 80000.0);
  EXPECT_EQ(broken.st, status::out_of_validity);
  EXPECT_FALSE(broken.pass);
}

TEST(InletCheck, BadInputGivesAClearStatusAndNaN) {
  const auto o = pltest::rotary_test_oil<double>();
  pumploss::line<double> empty;
  const auto e = pumploss::inlet_check(empty, o, 1e-4, 300.0, 101325.0, 80000.0);
  EXPECT_EQ(e.st, status::domain);
  EXPECT_TRUE(std::isnan(e.inlet_pa));
  EXPECT_EQ(pumploss::inlet_check(suction_pipe<double>(), o, pltest::kNaN, 300.0, 101325.0, 80000.0).st,
            status::nonfinite);
  EXPECT_EQ(pumploss::inlet_check(suction_pipe<double>(), o, 1e-4, 300.0, 0.0, 80000.0).st, status::domain);
  EXPECT_EQ(pumploss::inlet_min_temperature(suction_pipe<double>(), o, 1e-4, 101325.0, 80000.0, 300.0, 290.0).st,
            status::domain);
}

TEST(ShaftSeal, MarginsAndVerdictsAgainstContinuousAndPeakRatings) {
  // hand: seal 2 bar continuous, 6 bar peak; case 1.5 bar steady, 7 bar at a destroke peak
  const auto r = pumploss::shaft_seal_check(1.5e5, 7e5, 2e5, 6e5);
  EXPECT_EQ(r.st, status::ok);
  EXPECT_DOUBLE_EQ(r.margin_continuous_pa, 0.5e5);
  EXPECT_DOUBLE_EQ(r.margin_peak_pa, -1e5);
  EXPECT_TRUE(r.pass_continuous);
  EXPECT_FALSE(r.pass_peak);
  EXPECT_EQ(pumploss::shaft_seal_check(2e5, 1e5, 2e5, 6e5).st, status::implausible);
  const auto bad = pumploss::shaft_seal_check(1e5, 2e5, 2e5, 1e5);
  EXPECT_EQ(bad.st, status::domain);
  EXPECT_TRUE(std::isnan(bad.margin_peak_pa));
  EXPECT_EQ(pumploss::shaft_seal_check(pltest::kNaN, 2e5, 2e5, 6e5).st, status::nonfinite);
}

TEST(MotorDrain, BandsAndHandValues) {
  const pumploss::motor_drain_bands<double> b{};
  // 2.4 L/min of drain against 60 L/min inlet: 4 % (hand) -> sound
  const auto r = pumploss::motor_drain_check(2.4, 60.0, b);
  EXPECT_NEAR(r.fraction, 0.04, 1e-16);
  EXPECT_EQ(r.band, pumploss::motor_drain_band::sound);
  EXPECT_EQ(pumploss::motor_drain_check(4.8, 60.0, b).band, pumploss::motor_drain_band::acceptable);
  EXPECT_EQ(pumploss::motor_drain_check(7.2, 60.0, b).band, pumploss::motor_drain_band::elevated);
  EXPECT_EQ(pumploss::motor_drain_check(9.0, 60.0, b).band, pumploss::motor_drain_band::worn);
  EXPECT_EQ(pumploss::motor_drain_check(61.0, 60.0, b).st, status::implausible);
  EXPECT_EQ(pumploss::motor_drain_check(1.0, 0.0, b).st, status::domain);
  EXPECT_TRUE(std::isnan(pumploss::motor_drain_check(pltest::kNaN, 1.0, b).fraction));
  pumploss::motor_drain_bands<double> wrong{0.1, 0.05, 0.2};
  EXPECT_EQ(pumploss::motor_drain_check(1.0, 60.0, wrong).st, status::domain);
  EXPECT_STREQ(pumploss::motor_drain_band_name(pumploss::motor_drain_band::elevated), "elevated");
}

// Hand calculation (self-calculated): a 500 cm3/rev winch motor holds 2000 N m; eta_hm 1.
//  dp_h = 2 pi 2000 / 500e-6 = 25.1327 MPa (251.3 bar)
//  leakage measured at stall 0.8 L/min at 200 bar and 0.046 Pa s; holding oil 0.023 Pa s (warmer):
//  q = 0.8 x 251.327/200 x 0.046/0.023 = 2.01062 L/min; creep n = 2.01062 / 0.5 L = 4.02124 rpm;
//  drum travel 0.1 m per motor revolution: 0.402124 m/min.
TEST(MotorCreep, HandCalculationAndExtrapolationReport) {
  const double q_test = 0.8 / 60000;
  const auto r = pumploss::motor_creep(500e-6, 2000.0, 1.0, q_test, 200e5, 0.046, 0.023, 0.1);
  const double pi = pumploss::detail::pi<double>();
  EXPECT_NEAR(r.holding_pressure_pa, 2 * pi * 2000 / 500e-6, 1e-6);
  EXPECT_NEAR(r.leakage_m3_s * 60000, 0.8 * (2 * pi * 2000 / 500e-6 / 200e5) * 2, 1e-13);
  EXPECT_NEAR(r.creep_speed_rev_s * 60, 4.0212385965949352, 1e-12);
  EXPECT_NEAR(r.load_speed_m_s * 60, 0.40212385965949352, 1e-13);
  EXPECT_EQ(r.st, status::extrapolated);  // 251 bar held, leakage measured at 200 bar
  const auto ok = pumploss::motor_creep(500e-6, 1500.0, 0.9, q_test, 200e5, 0.046, 0.046, 0.0);
  EXPECT_EQ(ok.st, status::ok);
  EXPECT_EQ(ok.load_speed_m_s, 0.0);
  const auto m = pumploss::motor_creep(mp50(500e-6), mp50(1500), mp50(0.9), mp50(0.8) / 60000, mp50(200e5), mp50(0.046),
                                       mp50(0.046), mp50(0));
  EXPECT_LT(pltest::rel_err(ok.creep_speed_rev_s, m.creep_speed_rev_s), 1e-15);
  const auto bad = pumploss::motor_creep(0.0, 1500.0, 0.9, q_test, 200e5, 0.046, 0.046, 0.0);
  EXPECT_EQ(bad.st, status::domain);
  EXPECT_TRUE(std::isnan(bad.creep_speed_rev_s));
  EXPECT_EQ(pumploss::motor_creep(500e-6, pltest::kInf, 0.9, q_test, 200e5, 0.046, 0.046, 0.0).st, status::nonfinite);
}

}  // namespace
