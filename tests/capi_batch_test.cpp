// The fast path of the efficiency batch functions (capi::call_batch_fast) against the scalar C
// functions, element by element and bit for bit: valid points, the edges of the fast path's
// proof (1e-100, 1e100, zero flow or torque, efficiencies just above 1), NaN, infinities,
// subnormals, overflowing products, blocks of 1024 with and without flagged elements, and
// in-place calls where an output array is also an input array.
#include <gtest/gtest.h>

#include <cmath>
#include <cstdint>
#include <cstring>
#include <limits>
#include <random>
#include <vector>

#include "pumploss.h"

namespace {

using scalar_fn = int (*)(double, double, double, double, double, double*, double*, double*);
using batch_fn = int (*)(size_t, const double*, const double*, const double*, const double*, const double*, double*,
                         double*, double*, int*);

std::uint64_t bits(double x) {
  std::uint64_t b;
  std::memcpy(&b, &x, sizeof b);
  return b;
}

struct columns {
  std::vector<double> in[5];
  explicit columns(std::size_t n) {
    for (auto& c : in) c.resize(n);
  }
};

/// n points: mostly valid pump/motor points, with a share `bad` of special values mixed in.
columns make_points(std::size_t n, double bad, unsigned seed, bool motor) {
  columns c(n);
  std::mt19937_64 rng(seed);
  std::uniform_real_distribution<double> u(0.0, 1.0);
  const double nan = std::numeric_limits<double>::quiet_NaN(), inf = std::numeric_limits<double>::infinity();
  const double special[] = {nan, inf, -inf, 0.0, -0.0, -1.0, 1e-100, 1e100, 9.99e-101, 1.01e100,
                            std::numeric_limits<double>::denorm_min(), 1e-300, 1e300,
                            std::numeric_limits<double>::max()};
  for (std::size_t i = 0; i < n; ++i) {
    const double v = 107e-6 * (0.5 + u(rng)), sp = 10.0 + 30.0 * u(rng), dp = 2e6 + 3e7 * u(rng);
    // eta_v and eta_hm mostly below 1, some just above (implausible, a report)
    const double ev = 0.8 + 0.21 * u(rng), eh = 0.8 + 0.21 * u(rng);
    double q = motor ? v * sp / ev : v * sp * ev;
    double t = motor ? v * dp / 6.283185307179586 * eh : v * dp / 6.283185307179586 / eh;
    double x[5] = {v, sp, dp, q, t};
    if (u(rng) < bad) x[rng() % 5] = special[rng() % (sizeof special / sizeof special[0])];
    if (u(rng) < bad / 4) x[rng() % 5] = special[rng() % (sizeof special / sizeof special[0])];
    for (int k = 0; k < 5; ++k) c.in[k][i] = x[k];
  }
  return c;
}

void expect_same_as_scalar(batch_fn batch, scalar_fn scalar, const columns& c, const char* what) {
  const std::size_t n = c.in[0].size();
  std::vector<double> ev(n, 777.0), eh(n, 777.0), et(n, 777.0);
  std::vector<int> st(n, -777);
  const int summary = batch(n, c.in[0].data(), c.in[1].data(), c.in[2].data(), c.in[3].data(), c.in[4].data(),
                            ev.data(), eh.data(), et.data(), st.data());
  int expect_summary = PUMPLOSS_OK;
  bool failed = false;
  std::size_t mismatches = 0;
  for (std::size_t i = 0; i < n; ++i) {
    double a = 0, b = 0, t = 0;
    const int s = scalar(c.in[0][i], c.in[1][i], c.in[2][i], c.in[3][i], c.in[4][i], &a, &b, &t);
    if (s > 0 && s < 100) failed = true;
    else if (s != PUMPLOSS_OK && expect_summary == PUMPLOSS_OK) expect_summary = s;
    if (st[i] != s || bits(ev[i]) != bits(a) || bits(eh[i]) != bits(b) || bits(et[i]) != bits(t)) {
      if (++mismatches <= 5)
        ADD_FAILURE() << what << " element " << i << ": batch status " << st[i] << " (" << ev[i] << ", " << eh[i]
                      << ", " << et[i] << "), scalar status " << s << " (" << a << ", " << b << ", " << t << ")";
    }
  }
  EXPECT_EQ(mismatches, 0u) << what;
  EXPECT_EQ(summary, failed ? PUMPLOSS_EPARTIAL : expect_summary) << what;
}

TEST(CapiEfficiencyBatch, FastPathEqualsScalarBitForBit) {
  for (double bad : {0.0, 0.001, 0.05, 0.5}) {
    for (std::size_t n : {1u, 7u, 1023u, 1024u, 1025u, 5000u}) {
      expect_same_as_scalar(pumploss_pump_efficiency_batch, pumploss_pump_efficiency,
                            make_points(n, bad, static_cast<unsigned>(n) + 17u, false), "pump");
      expect_same_as_scalar(pumploss_motor_efficiency_batch, pumploss_motor_efficiency,
                            make_points(n, bad, static_cast<unsigned>(n) + 29u, true), "motor");
    }
  }
}

TEST(CapiEfficiencyBatch, AllValidGivesOkAndOnlyOneBadElementGivesPartial) {
  columns c = make_points(3000, 0.0, 5u, false);
  std::vector<double> ev(3000), eh(3000), et(3000);
  std::vector<int> st(3000);
  // make every point plausible
  for (std::size_t i = 0; i < 3000; ++i) c.in[3][i] = 0.9 * c.in[0][i] * c.in[1][i];
  for (std::size_t i = 0; i < 3000; ++i) c.in[4][i] = c.in[0][i] * c.in[2][i] / 6.283185307179586 / 0.9;
  auto run = [&] {
    return pumploss_pump_efficiency_batch(3000, c.in[0].data(), c.in[1].data(), c.in[2].data(), c.in[3].data(),
                                          c.in[4].data(), ev.data(), eh.data(), et.data(), st.data());
  };
  EXPECT_EQ(run(), PUMPLOSS_OK);
  c.in[2][2500] = -1.0;  // in the third block
  EXPECT_EQ(run(), PUMPLOSS_EPARTIAL);
  EXPECT_EQ(st[2500], PUMPLOSS_EDOMAIN);
  EXPECT_TRUE(std::isnan(ev[2500]) && std::isnan(eh[2500]) && std::isnan(et[2500]));
  EXPECT_EQ(st[2499], PUMPLOSS_OK);
  EXPECT_NEAR(ev[2499], 0.9, 1e-15);
}

TEST(CapiEfficiencyBatch, InPlaceOutputOverInputGivesTheSameResults) {
  const columns c = make_points(2100, 0.05, 11u, false);
  std::vector<double> ev(2100), eh(2100), et(2100);
  std::vector<int> st(2100), st2(2100);
  pumploss_pump_efficiency_batch(2100, c.in[0].data(), c.in[1].data(), c.in[2].data(), c.in[3].data(),
                                 c.in[4].data(), ev.data(), eh.data(), et.data(), st.data());
  // eta_v written over the flow column, eta_hm over the torque column
  std::vector<double> q = c.in[3], t = c.in[4], et2(2100);
  const int s = pumploss_pump_efficiency_batch(2100, c.in[0].data(), c.in[1].data(), c.in[2].data(), q.data(),
                                               t.data(), q.data(), t.data(), et2.data(), st2.data());
  EXPECT_NE(s, PUMPLOSS_EMISUSE);
  for (std::size_t i = 0; i < 2100; ++i) {
    ASSERT_EQ(st2[i], st[i]) << i;
    ASSERT_EQ(bits(q[i]), bits(ev[i])) << i;
    ASSERT_EQ(bits(t[i]), bits(eh[i])) << i;
    ASSERT_EQ(bits(et2[i]), bits(et[i])) << i;
  }
}

}  // namespace

namespace {
// Array lengths in the C API are size_t (found under ASan: an int count let the table-driven
// test pass 1000000 with one-element arrays). Counts above the limit are refused without
// reading the arrays.
TEST(CapiArrayLength, ComponentPointsCountIsSizeTAndBounded) {
  pumploss_line* h = nullptr;
  ASSERT_EQ(pumploss_line_create(&h), PUMPLOSS_OK);
  const double q[2] = {1e-4, 2e-4}, dp[2] = {1e4, 3e4};
  EXPECT_EQ(pumploss_line_add_component_points(h, 2, q, dp, 46e-6, 1.0), PUMPLOSS_OK);
  EXPECT_EQ(pumploss_line_add_component_points(h, 0, q, dp, 46e-6, 1.0), PUMPLOSS_EDOMAIN);
  EXPECT_EQ(pumploss_line_add_component_points(h, 17, q, dp, 46e-6, 1.0), PUMPLOSS_EDOMAIN);
  EXPECT_EQ(pumploss_line_add_component_points(h, static_cast<size_t>(-1), q, dp, 46e-6, 1.0), PUMPLOSS_EDOMAIN);
  // 2^32 + 2 must not wrap to 2 on its way to the template
  EXPECT_EQ(pumploss_line_add_component_points(h, (static_cast<size_t>(1) << 32) + 2u, q, dp, 46e-6, 1.0),
            PUMPLOSS_EDOMAIN);
  pumploss_line_destroy(h);
}
}  // namespace
