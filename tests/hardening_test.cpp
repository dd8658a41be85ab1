// Findings of the fuzz targets of tests/fuzz (issue 20), each with the input that showed it:
// the fix is tested here in a plain build, so it holds without the fuzzer.
#include <gtest/gtest.h>

#include <cmath>
#include <cstring>
#include <limits>
#include <vector>

#include "pumploss.h"
#include "pumploss/loss_model.hpp"

namespace {

const double kNaN = std::numeric_limits<double>::quiet_NaN();

// fuzz_handles (tests/fuzz/corpus/fuzz_handles/finding-model-fit-overflow): five points of a
// motor, two flows near the largest double. The fit overflowed and the model was created with
// PUMPLOSS_OK while its residuals and diagnostics were NaN. Now: status overflow, no handle.
const double kDp[] = {1671271.8901911564, 10500000, 11000000, 11500000, 12000000};
const double kSpeed[] = {25, 26.25, 27.500000000000004, 28.749999999999996, 30};
const double kMu[] = {0.040000000000000001, 0.042000000000000003, 0.044000000000000004, 4.8642923123159486e-06,
                      0.048000000000000001};
const double kFlow[] = {1.7976931348623157e+308, 0.0010500000000000002, 4.061765612590171e+198, 0.00115,
                        0.0011999999999999999};
const double kTorque[] = {100, 105, 110.00000000000001, 114.99999999999999, 120};

TEST(Hardening, LossModelFitThatOverflowsIsAnError) {
  std::vector<double> work(pumploss::loss_fit_workspace(5)), rq(5, 0.0), rt(5, 0.0);
  pumploss::loss_fit_options<double> opt;
  opt.flow_terms = 1u;
  const auto m = pumploss::fit_loss_model(pumploss::machine::motor, pumploss::loss_model_kind::schloesser, 5e-5, 870.0,
                                          kDp, kSpeed, kMu, kFlow, kTorque, 5, work.data(), rq.data(), rt.data(), opt);
  EXPECT_EQ(m.st, pumploss::status::overflow);
  EXPECT_TRUE(std::isnan(m.c_s));
  for (int i = 0; i < 5; ++i) EXPECT_TRUE(std::isnan(rq[static_cast<std::size_t>(i)]) && std::isnan(rt[static_cast<std::size_t>(i)])) << i;

  pumploss_model* h = reinterpret_cast<pumploss_model*>(&work);  // must be set to NULL
  EXPECT_EQ(pumploss_model_create_terms(PUMPLOSS_MOTOR, PUMPLOSS_MODEL_SCHLOESSER, 5e-5, 5e-5, 870.0, 1e7, 1,
                                        PUMPLOSS_CRITERION_BIC, 5, kDp, kSpeed, kMu, kFlow, kTorque, &h),
            PUMPLOSS_EOVERFLOW);
  EXPECT_EQ(h, nullptr);
}

TEST(Hardening, LossModelOrdinaryFlowsStillFit) {
  // The same points with the two huge flows replaced by ordinary ones: a model (the check
  // above refuses overflow only). Self-calculated data, flows about 1.1 L/s.
  double flow[5];
  std::memcpy(flow, kFlow, sizeof flow);
  flow[0] = 0.00099;
  flow[2] = 0.0011;
  pumploss_model* h = nullptr;
  const int st = pumploss_model_create_terms(PUMPLOSS_MOTOR, PUMPLOSS_MODEL_SCHLOESSER, 5e-5, 5e-5, 870.0, 1e7, 1,
                                             PUMPLOSS_CRITERION_BIC, 5, kDp, kSpeed, kMu, flow, kTorque, &h);
  ASSERT_FALSE(st > 0 && st < 100) << st;
  double rq[6], rt[6];
  const int rs = pumploss_model_residuals(h, 5, rq, rt);
  EXPECT_FALSE(rs > 0 && rs < 100) << rs;
  for (int i = 0; i < 5; ++i) EXPECT_TRUE(std::isfinite(rq[i]) && std::isfinite(rt[i])) << i;
  // fuzz_handles (corpus finding-model-residuals-padding): arrays longer than the points came
  // back with PUMPLOSS_OK and NaN in the extra elements; a NaN output is PUMPLOSS_WUNDEFINED
  EXPECT_EQ(pumploss_model_residuals(h, 6, rq, rt), PUMPLOSS_WUNDEFINED);
  for (int i = 0; i < 5; ++i) EXPECT_TRUE(std::isfinite(rq[i]) && std::isfinite(rt[i])) << i;
  EXPECT_TRUE(std::isnan(rq[5]) && std::isnan(rt[5]));
  pumploss_model_destroy(h);
}

// ---- the health monitor's restore: states the monitor never holds are refused ----

struct monitor_fixture : ::testing::Test {
  pumploss_health* h = nullptr;
  std::vector<double> learned = std::vector<double>(PUMPLOSS_HEALTH_MONITOR_STATE_COUNT);
  std::vector<double> learning = learned;
  void SetUp() override {
    // the invented 71 cm3/rev pump of tests/capi/capi_harness.hpp, 4 L/min drain at reference
    ASSERT_EQ(pumploss_health_create(71e-6, 250e5, 323.15, 313.15, 46e-6, 373.15, 6.8e-6, 870.0, 1900.0, &h), PUMPLOSS_OK);
    ASSERT_EQ(pumploss_health_set_description(h, 0.3e-3 / 60.0, 0.0, 25.0, 25.0), PUMPLOSS_OK);
    pumploss_health_monitor* m = make();
    for (int i = 0; i < 30; ++i) {
      if (i == 5) {
        ASSERT_EQ(pumploss_health_monitor_save(m, learning.data(), learning.size()), PUMPLOSS_WUNDEFINED);
      }
      feed(m, i, 4e-3 / 60.0 * (1.0 + 0.001 * (i % 3 - 1)));
    }
    // WUNDEFINED: no step yet, so the last step time is NaN
    ASSERT_EQ(pumploss_health_monitor_save(m, learned.data(), learned.size()), PUMPLOSS_WUNDEFINED);
    pumploss_health_monitor_destroy(m);
  }
  void TearDown() override { pumploss_health_destroy(h); }
  pumploss_health_monitor* make() {
    pumploss_health_monitor* m = nullptr;
    EXPECT_EQ(pumploss_health_monitor_create(h, 12, 2, 0.05, &m), PUMPLOSS_OK);
    return m;
  }
  static int feed(pumploss_health_monitor* m, double t, double q) {
    int level = 0, raw = 0, events = 0;
    double qn = 0.0;
    return pumploss_health_monitor_feed(m, t, q, 250e5, 0.0, 323.15, 25.0, kNaN, kNaN, PUMPLOSS_STATE_ON_STROKE, &level,
                                        &raw, &events, &qn);
  }
};

TEST_F(monitor_fixture, OwnStatesAreRestored) {
  for (const auto* s : {&learned, &learning}) {
    pumploss_health_monitor* m = make();
    EXPECT_EQ(pumploss_health_monitor_restore(m, s->data(), s->size()), PUMPLOSS_OK);
    std::vector<double> again(s->size());
    pumploss_health_monitor_save(m, again.data(), again.size());
    EXPECT_EQ(std::memcmp(again.data(), s->data(), again.size() * sizeof(double)), 0);
    pumploss_health_monitor_destroy(m);
  }
}

TEST_F(monitor_fixture, StatesTheMonitorNeverHoldsAreRefused) {
  // Layout (include/pumploss/health_monitor.hpp, save()): [3] accepted count, [6] learning sum,
  // [9] noise, [10] baseline, [11] level, [15] CUSUM noise, [16]/[17] the cumulative sums,
  // [22] last step time, [24] held direction, [25..56] history, [57..88] times, [89] examined.
  struct edit {
    const std::vector<double>* base;
    std::size_t index;
    double value;
  };
  const double inf = std::numeric_limits<double>::infinity();
  const edit edits[] = {
      {&learned, 9, -1e-7},  {&learned, 9, kNaN},    {&learning, 9, 1e-7},    // noise
      {&learned, 10, -1e-4}, {&learned, 10, kNaN},   {&learning, 10, 6e-5},   // baseline
      {&learned, 15, -1.0},  {&learned, 16, -5.0},   {&learned, 17, -5.0},    // CUSUM
      {&learned, 22, inf},   {&learned, 22, -inf},   {&learned, 30, kNaN},    // times, history
      {&learned, 30, inf},   {&learned, 60, inf},
      // the checks that were there before: a count that is no whole number, a level outside
      // 0..3, a held direction outside -1, 0, 1, a damaged index, a non-finite learning sum
      {&learned, 3, 2.5},    {&learned, 11, 7.0},    {&learned, 24, 0.5},
      {&learned, 89, -1.0},  {&learned, 6, inf},
  };
  for (const edit& e : edits) {
    std::vector<double> bad = *e.base;
    bad[e.index] = e.value;
    pumploss_health_monitor* m = make();
    feed(m, 0.0, 4e-3 / 60.0);
    std::vector<double> before(bad.size()), after(bad.size());
    pumploss_health_monitor_save(m, before.data(), before.size());
    EXPECT_EQ(pumploss_health_monitor_restore(m, bad.data(), bad.size()), PUMPLOSS_EVALIDITY)
        << "[" << e.index << "] = " << e.value;
    pumploss_health_monitor_save(m, after.data(), after.size());
    EXPECT_EQ(std::memcmp(before.data(), after.data(), before.size() * sizeof(double)), 0) << e.index;
    pumploss_health_monitor_destroy(m);
  }
}

TEST_F(monitor_fixture, AGivenBaselineCannotBeReplaced) {
  ASSERT_EQ(pumploss_health_set_baseline(h, 4e-3 / 60.0), PUMPLOSS_OK);
  pumploss_health_monitor* m = make();
  for (int i = 0; i < 14; ++i) feed(m, i, 4e-3 / 60.0);
  std::vector<double> s(PUMPLOSS_HEALTH_MONITOR_STATE_COUNT);
  ASSERT_EQ(pumploss_health_monitor_save(m, s.data(), s.size()), PUMPLOSS_WUNDEFINED);
  EXPECT_EQ(pumploss_health_monitor_restore(m, s.data(), s.size()), PUMPLOSS_OK);
  s[10] *= 2.0;
  EXPECT_EQ(pumploss_health_monitor_restore(m, s.data(), s.size()), PUMPLOSS_EVALIDITY);
  pumploss_health_monitor_destroy(m);
}

// fuzz_handles (tests/fuzz/corpus/fuzz_handles/finding-drain-check-overflow): a drain check with
// a tank pressure of -1e300 Pa and the largest double as allowed case pressure. The margin
// overflowed to infinity: the status became EOVERFLOW, but the four arrays kept their numbers.
// Now every array is NaN (pass 0) on any error, and an infinite element is itself an overflow.
TEST(Hardening, DrainCheckThatOverflowsLeavesNaNArrays) {
  pumploss_line* line = nullptr;
  ASSERT_EQ(pumploss_line_create(&line), PUMPLOSS_OK);
  // ISO VG 46 mineral oil, typical catalogue points (common practice, no source)
  ASSERT_EQ(pumploss_line_set_oil(line, 313.15, 46e-6, 373.15, 6.8e-6, 870.0, 288.15), PUMPLOSS_OK);
  double t[5], cp[5], margin[5], worst = 0.0;
  int pass[5];
  for (int i = 0; i < 5; ++i) pass[i] = 7;
  const double huge = std::numeric_limits<double>::max();
  EXPECT_EQ(pumploss_line_drain_check(line, 0.001, 313.15, 313.15, 5, -1e300, huge, t, cp, margin, pass, &worst),
            PUMPLOSS_EOVERFLOW);
  EXPECT_TRUE(std::isnan(worst));
  for (int i = 0; i < 5; ++i) {
    EXPECT_TRUE(std::isnan(t[i]) && std::isnan(cp[i]) && std::isnan(margin[i])) << i;
    EXPECT_EQ(pass[i], 0) << i;
  }
  // the same line with ordinary limits: finite arrays, usable status
  const int st = pumploss_line_drain_check(line, 0.001, 273.15, 353.15, 5, 0.0, 2e5, t, cp, margin, pass, &worst);
  EXPECT_FALSE(st > 0 && st < 100) << st;
  for (int i = 0; i < 5; ++i) EXPECT_TRUE(std::isfinite(t[i]) && std::isfinite(cp[i]) && std::isfinite(margin[i])) << i;
  pumploss_line_destroy(line);
}

}  // namespace
