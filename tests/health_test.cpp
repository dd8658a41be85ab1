// Tests of health.hpp and its C wrappers.
// Bands: common practice of the trade, no source (SOURCES.md key common_practice_drain).
#include <gtest/gtest.h>

#include <cmath>
#include <vector>

#include "pumploss.h"
#include "pumploss/health.hpp"
#include "test_support.hpp"

using pltest::kInf;
using pltest::kNaN;
using pltest::mp50;
using pumploss::health_level;
using pumploss::status;

namespace {
// An invented pump for the tests: 71 cm3/rev, reference 250 bar at 50 degC, VG 46 oil.
constexpr double kV = 71e-6;
constexpr double kN = 25.0;  // 1500 rpm
constexpr double kDpRef = 250e5;
constexpr double kTRef = 323.15;

pumploss::health_reference<double> reference() {
  pumploss::health_reference<double> r{};
  r.max_displacement_m3_rev = kV;
  r.reference_dp_pa = kDpRef;
  r.reference_t_k = kTRef;
  r.viscosity = pumploss::d341_fit(313.15, 46e-6, 373.15, 6.8e-6).value;
  r.rho_kg_m3 = 870.0;
  r.cp_j_kg_k = 1900.0;
  return r;
}
pumploss::health_reading<double> at_reference(double fraction) {
  return {fraction * kV * kN, kDpRef, 0.0, kTRef, kN};
}
}  // namespace

TEST(HealthDrainFraction, HandCalculationAndOracle) {
  // Hand: 71 cm3/rev x 1500 rpm = 106.5 L/min; 5.325 L/min of drain is 5 %.
  const auto f = pumploss::drain_fraction(5.325e-3 / 60, 71e-6, 25.0);
  ASSERT_EQ(f.st, status::ok);
  EXPECT_NEAR(f.value, 0.05, 1e-15);
  const auto ref = pumploss::drain_fraction<mp50>(mp50(5.325e-3 / 60), mp50(71e-6), mp50(25.0));
  EXPECT_LE(pltest::rel_err(f.value, ref.value), 2.3e-16);
  EXPECT_EQ(pumploss::drain_fraction(0.0, 71e-6, 25.0).value, 0.0);
  EXPECT_EQ(pumploss::drain_fraction(2e-3, 71e-6, 25.0).st, status::implausible);  // 113 %
}

TEST(HealthDrainFraction, BadInput) {
  for (double bad : {kNaN, kInf, -kInf}) {
    EXPECT_EQ(pumploss::drain_fraction(bad, kV, kN).st, status::nonfinite);
    EXPECT_EQ(pumploss::drain_fraction(1e-4, bad, kN).st, status::nonfinite);
    EXPECT_EQ(pumploss::drain_fraction(1e-4, kV, bad).st, status::nonfinite);
  }
  EXPECT_EQ(pumploss::drain_fraction(-1e-4, kV, kN).st, status::domain);
  EXPECT_EQ(pumploss::drain_fraction(1e-4, 0.0, kN).st, status::domain);
  EXPECT_EQ(pumploss::drain_fraction(1e-4, kV, 0.0).st, status::domain);
  EXPECT_EQ(pumploss::drain_fraction(1e-4, kV, -25.0).st, status::domain);
  EXPECT_TRUE(std::isnan(pumploss::drain_fraction(1e-4, kV, -25.0).value));
}

TEST(HealthVerdict, CommonPracticeBandsAtAndAroundEachEdge) {
  // common_practice_drain: ~5 % high-quality, up to ~10 % very large pumps, 15 % or more worn.
  const auto ref = reference();
  const pumploss::health_bands<double> bands{};
  struct edge {
    double fraction;
    health_level want;
  };
  const edge edges[] = {{0.02, health_level::sound},        {0.05 * (1 - 1e-9), health_level::sound},
                        {0.05 * (1 + 1e-9), health_level::acceptable}, {0.08, health_level::acceptable},
                        {0.10 * (1 - 1e-9), health_level::acceptable}, {0.10 * (1 + 1e-9), health_level::elevated},
                        {0.15 * (1 - 1e-9), health_level::elevated},   {0.15 * (1 + 1e-9), health_level::worn},
                        {0.30, health_level::worn}};
  for (const auto& e : edges) {
    const auto a = pumploss::assess_health(ref, bands, at_reference(e.fraction));
    ASSERT_EQ(a.st, status::ok) << e.fraction;
    EXPECT_EQ(a.level, e.want) << e.fraction;
    EXPECT_NEAR(a.fraction_at_reference, e.fraction, 1e-14);
    EXPECT_TRUE(a.reasons & pumploss::reason_no_baseline);
    EXPECT_TRUE(a.reasons & pumploss::reason_no_temperatures);
    EXPECT_TRUE(std::isnan(a.growth));
  }
  // Configurable: a maker's own bands move the verdict.
  pumploss::health_bands<double> strict{};
  strict.sound_max = 0.03;
  strict.acceptable_max = 0.04;
  strict.worn_min = 0.06;
  EXPECT_EQ(pumploss::assess_health(ref, strict, at_reference(0.045)).level, health_level::elevated);
  EXPECT_EQ(pumploss::assess_health(ref, strict, at_reference(0.065)).level, health_level::worn);
}

TEST(HealthVerdict, NormalisationCollapsesReadingsFromOneLaminarLeak) {
  // Invented truth: a laminar drain of 4 % at the reference state. Readings at other pressures
  // and temperatures follow q = q_ref (dp/dp_ref) (nu_ref/nu); normalising must undo it.
  const auto ref = reference();
  const double q_ref = 0.04 * kV * kN;
  const double nu_ref = pumploss::d341_viscosity(ref.viscosity, kTRef).value;
  for (double dp : {60e5, 120e5, 250e5, 300e5}) {
    for (double t : {293.15, 313.15, 333.15, 353.15}) {
      const double nu = pumploss::d341_viscosity(ref.viscosity, t).value;
      const double q = q_ref * (dp / kDpRef) * (nu_ref / nu);
      const pumploss::health_reading<double> r{q, dp + 1e5, 1e5, t, kN};
      const auto n = pumploss::health_normalise(ref, r);
      ASSERT_EQ(n.st, status::ok);
      EXPECT_NEAR(n.value / q_ref, 1.0, 1e-13) << dp << " " << t;
      const auto a = pumploss::assess_health(ref, pumploss::health_bands<double>{}, r);
      EXPECT_EQ(a.level, health_level::sound);
      EXPECT_EQ(static_cast<bool>(a.reasons & pumploss::reason_low_pressure_reading), dp < kDpRef / 2);
      const auto n50 = pumploss::health_normalise<mp50>(
          {mp50(kV), mp50(kDpRef), mp50(kTRef), pumploss::d341_fit<mp50>(mp50(313.15), mp50(46e-6), mp50(373.15), mp50(6.8e-6)).value,
           mp50(870), mp50(1900)},
          {mp50(q), mp50(dp + 1e5), mp50(1e5), mp50(t), mp50(kN)});
      EXPECT_LE(pltest::rel_err(n.value, n50.value), 1e-13);
    }
  }
}

TEST(HealthVerdict, GrowthOverBaselineAndHotDrain) {
  auto ref = reference();
  ref.baseline_m3_s = 0.03 * kV * kN;
  const pumploss::health_bands<double> bands{};
  auto a = pumploss::assess_health(ref, bands, at_reference(0.033));  // +10 %
  EXPECT_EQ(a.level, health_level::sound);
  EXPECT_NEAR(a.growth, 0.1, 1e-12);
  a = pumploss::assess_health(ref, bands, at_reference(0.040));  // +33 %
  EXPECT_EQ(a.level, health_level::acceptable);
  EXPECT_TRUE(a.reasons & pumploss::reason_growth_moderate);
  a = pumploss::assess_health(ref, bands, at_reference(0.048));  // +60 %: sound band but worn by growth
  EXPECT_EQ(a.level, health_level::worn);
  EXPECT_TRUE(a.reasons & pumploss::reason_growth_large);
  EXPECT_TRUE(a.reasons & pumploss::reason_fraction_sound);
  // Throttling 250 bar: 25e6 / (870 * 1900) = 15.124 K (hand). A 20 K rise is flagged, 12 K not.
  auto r = at_reference(0.03);
  r.inlet_t_k = 318.15;
  r.drain_t_k = 338.15;
  a = pumploss::assess_health(ref, bands, r);
  EXPECT_NEAR(a.throttling_rise_k, 25e6 / (870.0 * 1900.0), 1e-12);
  EXPECT_EQ(a.level, health_level::elevated);
  EXPECT_TRUE(a.reasons & pumploss::reason_drain_hot);
  r.drain_t_k = 330.15;
  a = pumploss::assess_health(ref, bands, r);
  EXPECT_EQ(a.level, health_level::sound);
  EXPECT_FALSE(a.reasons & pumploss::reason_drain_hot);
  EXPECT_FALSE(a.reasons & pumploss::reason_no_temperatures);
}

TEST(HealthVerdict, BadReadings) {
  const auto ref = reference();
  const pumploss::health_bands<double> bands{};
  auto r = at_reference(0.05);
  r.drain_flow_m3_s = kNaN;
  auto a = pumploss::assess_health(ref, bands, r);
  EXPECT_EQ(a.st, status::nonfinite);
  EXPECT_TRUE(std::isnan(a.fraction) && std::isnan(a.fraction_at_reference));
  r = at_reference(0.05);
  r.outlet_pa = 0.0;  // no pressure difference: cannot normalise
  EXPECT_EQ(pumploss::assess_health(ref, bands, r).st, status::domain);
  r = at_reference(0.05);
  r.speed_rev_s = -1.0;
  EXPECT_EQ(pumploss::assess_health(ref, bands, r).st, status::domain);
  r = at_reference(0.05);
  r.oil_t_k = -5.0;
  EXPECT_EQ(pumploss::assess_health(ref, bands, r).st, status::domain);
  pumploss::health_bands<double> crossed{};
  crossed.worn_min = 0.01;  // worn band below the acceptable band
  EXPECT_EQ(pumploss::assess_health(ref, crossed, at_reference(0.05)).st, status::domain);
}

TEST(HealthTrend, RecoversALinearRiseAndProjectsTheWornBand) {
  std::vector<double> days, f;
  for (int i = 0; i < 10; ++i) {
    days.push_back(30.0 * i);
    f.push_back(0.04 + 1e-4 * 30.0 * i);  // +0.01 % per day
  }
  const auto t = pumploss::fit_health_trend(days.data(), f.data(), days.size(), 0.15);
  ASSERT_EQ(t.st, status::ok);
  EXPECT_NEAR(t.slope_per_day, 1e-4, 1e-15);
  EXPECT_NEAR(t.intercept, 0.04, 1e-14);
  // last day 270: 0.067; reaches 0.15 after (0.15 - 0.067) / 1e-4 = 830 days
  EXPECT_NEAR(t.days_to_worn, 830.0, 1e-8);
  const double flat[] = {0.05, 0.05, 0.05};
  const double d3[] = {0.0, 1.0, 2.0};
  EXPECT_TRUE(std::isinf(pumploss::fit_health_trend(d3, flat, 3, 0.15).days_to_worn));
  EXPECT_EQ(pumploss::fit_health_trend(d3, flat, 0, 0.15).st, status::insufficient_data);  // empty set
  EXPECT_EQ(pumploss::fit_health_trend(d3, flat, 1, 0.15).st, status::insufficient_data);
  const double same_day[] = {5.0, 5.0, 5.0};
  EXPECT_EQ(pumploss::fit_health_trend(same_day, flat, 3, 0.15).st, status::insufficient_data);
  const double with_nan[] = {0.05, kNaN, 0.05};
  EXPECT_EQ(pumploss::fit_health_trend(d3, with_nan, 3, 0.15).st, status::nonfinite);
  EXPECT_EQ(pumploss::fit_health_trend<double>(nullptr, flat, 3, 0.15).st, status::misuse);
}

TEST(HealthCapi, HandleLifecycleAndAssessment) {
  pumploss_health* h = nullptr;
  ASSERT_EQ(pumploss_health_create(kV, kDpRef, kTRef, 313.15, 46e-6, 373.15, 6.8e-6, 870.0, 1900.0, &h), PUMPLOSS_OK);
  ASSERT_NE(h, nullptr);
  int level = 7, reasons = 7;
  double f, fref, g;
  ASSERT_EQ(pumploss_health_assess(h, 0.12 * kV * kN, kDpRef, 0.0, kTRef, kN, kNaN, kNaN, &level, &reasons, &f, &fref),
            PUMPLOSS_OK);
  EXPECT_EQ(level, PUMPLOSS_HEALTH_ELEVATED);
  EXPECT_TRUE(reasons & PUMPLOSS_REASON_FRACTION_ELEVATED);
  EXPECT_TRUE(reasons & PUMPLOSS_REASON_NO_BASELINE);
  EXPECT_NEAR(fref, 0.12, 1e-14);
  EXPECT_EQ(pumploss_health_growth(h, 0.12 * kV * kN, kDpRef, 0.0, kTRef, &g), PUMPLOSS_EDATA);  // no baseline
  EXPECT_TRUE(std::isnan(g));
  ASSERT_EQ(pumploss_health_set_baseline(h, 0.06 * kV * kN), PUMPLOSS_OK);
  ASSERT_EQ(pumploss_health_assess(h, 0.12 * kV * kN, kDpRef, 0.0, kTRef, kN, kNaN, kNaN, &level, &reasons, &f, &fref),
            PUMPLOSS_OK);
  ASSERT_EQ(pumploss_health_growth(h, 0.12 * kV * kN, kDpRef, 0.0, kTRef, &g), PUMPLOSS_OK);
  EXPECT_NEAR(g, 1.0, 1e-12);
  EXPECT_EQ(level, PUMPLOSS_HEALTH_WORN);
  EXPECT_STREQ(pumploss_health_level_name(level), "worn");
  EXPECT_STREQ(pumploss_health_level_name(99), "unknown");
  EXPECT_STRNE(pumploss_health_reason_text(PUMPLOSS_REASON_GROWTH_LARGE), pumploss_health_reason_text(0));
  EXPECT_EQ(pumploss_health_set_bands(h, 0.05, 0.04, 0.15, 0.25, 0.5, 1.0), PUMPLOSS_EDOMAIN);
  EXPECT_EQ(pumploss_health_set_bands(h, 0.03, 0.04, 0.06, 0.25, 0.5, 1.0), PUMPLOSS_OK);
  EXPECT_EQ(pumploss_health_set_exponents(h, 1.0, -1.0), PUMPLOSS_EDOMAIN);
  EXPECT_EQ(pumploss_health_set_exponents(h, 2.5, 1.0), PUMPLOSS_EDOMAIN);
  EXPECT_EQ(pumploss_health_set_baseline(h, kNaN), PUMPLOSS_ENONFINITE);
  // errors: outputs NaN, level -1
  EXPECT_EQ(pumploss_health_assess(h, -1.0, kDpRef, 0.0, kTRef, kN, kNaN, kNaN, &level, &reasons, &f, &fref),
            PUMPLOSS_EDOMAIN);
  EXPECT_EQ(level, -1);
  EXPECT_TRUE(std::isnan(f) && std::isnan(fref));
  EXPECT_EQ(pumploss_health_assess(h, 1e-4, kDpRef, 0.0, kTRef, kN, kInf, 300.0, &level, &reasons, &f, &fref),
            PUMPLOSS_ENONFINITE);
  EXPECT_EQ(pumploss_health_assess(nullptr, 1e-4, kDpRef, 0.0, kTRef, kN, kNaN, kNaN, &level, &reasons, &f, &fref),
            PUMPLOSS_EMISUSE);
  EXPECT_EQ(pumploss_health_assess(h, 1e-4, kDpRef, 0.0, kTRef, kN, kNaN, kNaN, nullptr, &reasons, &f, &fref),
            PUMPLOSS_EMISUSE);
  EXPECT_TRUE(std::isnan(f));
  pumploss_health_destroy(h);
  pumploss_health_destroy(nullptr);
  pumploss_health* bad = reinterpret_cast<pumploss_health*>(&level);
  EXPECT_EQ(pumploss_health_create(kV, kDpRef, kTRef, 313.15, 46e-6, 313.15, 6.8e-6, 870.0, 1900.0, &bad),
            PUMPLOSS_EDOMAIN);
  EXPECT_EQ(bad, nullptr);
  EXPECT_EQ(pumploss_health_create(kV, kDpRef, kTRef, 313.15, 46e-6, 373.15, 6.8e-6, 870.0, 1900.0, nullptr),
            PUMPLOSS_EMISUSE);
  double frac;
  EXPECT_EQ(pumploss_drain_fraction(5.325e-3 / 60, 71e-6, 25.0, &frac), PUMPLOSS_OK);
  EXPECT_NEAR(frac, 0.05, 1e-15);
  EXPECT_EQ(pumploss_drain_fraction(5.325e-3 / 60, 71e-6, 25.0, nullptr), PUMPLOSS_EMISUSE);
}
