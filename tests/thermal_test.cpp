// Tests of thermal.hpp and its C wrappers. Sources: tests/reference/SOURCES.md.
#include <gtest/gtest.h>

#include <cmath>
#include <string>

#include "pumploss.h"
#include "pumploss/thermal.hpp"
#include "test_support.hpp"

using pltest::kInf;
using pltest::kNaN;
using pltest::mp50;
using pumploss::status;

TEST(ThrottleTemperatureRise, MethodsRow18) {
  // methods13_row18 (self-calculated, tests/reference/SOURCES.md): 10 bar, 880 kg/m3, 2030 J/(kg K) -> 0.560 K
  // hand: 1e6 / (880 * 2030) = 1e6 / 1 786 400 = 0.55978504 K
  const auto r = pumploss::throttle_temperature_rise(1e6, 880.0, 2030.0);
  ASSERT_EQ(r.st, status::ok);
  EXPECT_NEAR(r.value, 0.560, 0.5e-3);
  EXPECT_NEAR(r.value, 0.5597850425436632, 1e-15);
  const auto m = pumploss::throttle_temperature_rise<mp50>(1e6, 880.0, 2030.0);
  EXPECT_LE(pltest::ulps(r.value, m.value), 2.0);
  double dt = 0;
  EXPECT_EQ(pumploss_throttle_temperature_rise(1e6, 880.0, 2030.0, &dt), PUMPLOSS_OK);
  EXPECT_EQ(dt, r.value);
  EXPECT_EQ(pumploss_throttle_temperature_rise(-1.0, 880.0, 2030.0, &dt), PUMPLOSS_EDOMAIN);
  EXPECT_TRUE(std::isnan(dt));
  EXPECT_EQ(pumploss_throttle_temperature_rise(1e6, kNaN, 2030.0, &dt), PUMPLOSS_ENONFINITE);
  EXPECT_EQ(pumploss_throttle_temperature_rise(1e6, 880.0, 0.0, &dt), PUMPLOSS_EDOMAIN);
  EXPECT_EQ(pumploss_throttle_temperature_rise(1e6, 880.0, 2030.0, NULL), PUMPLOSS_EMISUSE);
}

TEST(ThrottleTemperatureRise, IsenthalpicIsAbout079AtFiftyDegrees) {
  // isenthalpic throttle, self-calculated: (1 - alpha T) = 1 - 6.5e-4 * 323.15 = 0.78995 at 50 degC
  const auto s = pumploss::throttle_temperature_rise(2.5e7, 870.0, 1900.0);
  const auto i = pumploss::throttle_temperature_rise_isenthalpic(2.5e7, 870.0, 1900.0, 6.5e-4, 323.15);
  ASSERT_EQ(i.st, status::ok);
  EXPECT_NEAR(i.value / s.value, 1 - 6.5e-4 * 323.15, 1e-15);
  EXPECT_NEAR(i.value / s.value, 0.79, 0.005);
  const auto m = pumploss::throttle_temperature_rise_isenthalpic<mp50>(2.5e7, 870.0, 1900.0, 6.5e-4, 323.15);
  EXPECT_LE(pltest::ulps(i.value, m.value), 4.0);
  EXPECT_EQ(pumploss::throttle_temperature_rise_isenthalpic(2.5e7, 870.0, 1900.0, 4e-3, 323.15).st, status::domain);
  double dt = 0;
  EXPECT_EQ(pumploss_throttle_temperature_rise_isenthalpic(2.5e7, 870.0, 1900.0, 6.5e-4, 323.15, &dt), PUMPLOSS_OK);
  EXPECT_EQ(dt, i.value);
}

TEST(HeatLoad, PumpAndMotor) {
  // pump: P_m = 54 977.87 W, eta_t = 0.873078545 -> 6 977.87 W = P_m - P_h (hand case of efficiency_test)
  const auto p = pumploss::machine_heat_load(pumploss::machine::pump, 1e-4, 25.0, 2e7, 2.4e-3, 350.0);
  ASSERT_EQ(p.st, status::ok);
  EXPECT_NEAR(p.value, 54977.871437821 - 48000.0, 1e-8);
  EXPECT_NEAR(pumploss::heat_load(54977.871437821, 0.873078544961254).value, p.value, 1e-8);
  // motor: P_h = 42 000 W in, P_m = 37 699.11 W out
  const auto m = pumploss::machine_heat_load(pumploss::machine::motor, 1e-4, 20.0, 2e7, 2.1e-3, 300.0);
  ASSERT_EQ(m.st, status::ok);
  EXPECT_NEAR(m.value, 42000.0 - 37699.111843078, 1e-8);
  EXPECT_NEAR(pumploss::heat_load(42000.0, 0.897597901025655).value, m.value, 1e-8);
  // eta above 1: reported, value kept (negative heat)
  const auto bad = pumploss::heat_load(1000.0, 1.1);
  EXPECT_EQ(bad.st, status::implausible);
  EXPECT_NEAR(bad.value, -100.0, 1e-12);
  EXPECT_EQ(pumploss::machine_heat_load(pumploss::machine::pump, 0.0, 25.0, 2e7, 2.4e-3, 350.0).st, status::domain);
  double h = 0;
  EXPECT_EQ(pumploss_heat_load(1000.0, 0.9, &h), PUMPLOSS_OK);
  EXPECT_NEAR(h, 100.0, 1e-12);
  EXPECT_EQ(pumploss_heat_load(-1000.0, 0.9, &h), PUMPLOSS_EDOMAIN);
  EXPECT_TRUE(std::isnan(h));
}

TEST(CaseDrainTemperature, FromLeakagePowerAndUpperBound) {
  // 3 L/min drain throttled from 250 bar: rise = dp / (rho cp) = 2.5e7 / (870 * 1900) = 15.124 K
  const double q3 = 3.0 / 60000.0;
  const auto r = pumploss::case_drain_temperature_from_leakage(323.15, 2.5e7, q3, 0.0, 870.0, 1900.0);
  ASSERT_EQ(r.st, status::ok);
  EXPECT_NEAR(r.value - 323.15, 2.5e7 / (870.0 * 1900.0), 1e-12);
  // all of a 6 978 W heat load leaving with the drain: upper bound 323.15 + 6978 / (870 1900 5e-5)
  const auto ub = pumploss::case_drain_temperature(323.15, 6977.871437821, q3, 870.0, 1900.0);
  ASSERT_EQ(ub.st, status::ok);
  EXPECT_NEAR(ub.value - 323.15, 6977.871437821 / (870.0 * 1900.0 * q3), 1e-10);
  const auto m = pumploss::case_drain_temperature<mp50>(323.15, 6977.871437821, q3, 870.0, 1900.0);
  EXPECT_LE(pltest::ulps(ub.value, m.value), 3.0);
  // a tiny drain flow carrying a large power: rise above 100 K reported
  EXPECT_EQ(pumploss::case_drain_temperature(323.15, 6977.0, 1e-6, 870.0, 1900.0).st, status::regime);
  EXPECT_EQ(pumploss::case_drain_temperature(323.15, 100.0, 0.0, 870.0, 1900.0).st, status::domain);
  EXPECT_EQ(pumploss::case_drain_temperature(323.15, kInf, q3, 870.0, 1900.0).st, status::nonfinite);
  double t = 0;
  EXPECT_EQ(pumploss_case_drain_temperature(323.15, 6977.871437821, q3, 870.0, 1900.0, &t), PUMPLOSS_OK);
  EXPECT_EQ(t, ub.value);
  EXPECT_EQ(pumploss_case_drain_temperature_from_leakage(323.15, 2.5e7, q3, 0.0, 870.0, 1900.0, &t), PUMPLOSS_OK);
  EXPECT_EQ(t, r.value);
  EXPECT_EQ(pumploss_case_drain_temperature_from_leakage(323.15, 2.5e7, q3, -5.0, 870.0, 1900.0, &t),
            PUMPLOSS_EDOMAIN);
  EXPECT_TRUE(std::isnan(t));
}
