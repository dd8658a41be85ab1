// Reading a test-stand setup back through pumploss.h: every getter returns what its setter
// stored (or the documented default before it), bad input gives a clear status and NaN, and the
// setup's oil line passes through the two viscosity points it was made from (ASTM D341: the
// line is defined by those points) and agrees with pumploss_viscosity_d341() between them.
#include <gtest/gtest.h>

#include <cmath>
#include <limits>

#include "pumploss.h"

namespace {

const double kNaN = std::numeric_limits<double>::quiet_NaN();

struct OwnedSetup {
  pumploss_test_stand_setup* s = nullptr;
  OwnedSetup() { EXPECT_EQ(pumploss_test_stand_setup_create(PUMPLOSS_MOTOR, 71e-6, 313.15, 46e-6, 373.15, 6.9e-6, &s), PUMPLOSS_OK); }
  ~OwnedSetup() { pumploss_test_stand_setup_destroy(s); }
  OwnedSetup(const OwnedSetup&) = delete;
  OwnedSetup& operator=(const OwnedSetup&) = delete;
};

}  // namespace

TEST(CapiTestStandSetup, DefaultsBeforeAnySet) {
  OwnedSetup h;
  ASSERT_NE(h.s, nullptr);
  int kind = -2, vt = -2, disp = -2, fit = -2, pos = -2, dist = -2;
  double v = 0, p = 1, pct = 1, abs_si = 1;
  EXPECT_EQ(pumploss_test_stand_setup_get_machine(h.s, &kind, &v), PUMPLOSS_OK);
  EXPECT_EQ(kind, PUMPLOSS_MOTOR);
  EXPECT_EQ(v, 71e-6);
  // the defaults stated at pumploss_test_stand_setup_create()
  EXPECT_EQ(pumploss_test_stand_setup_get_method(h.s, &vt, &disp, &fit), PUMPLOSS_OK);
  EXPECT_EQ(vt, PUMPLOSS_TS_VISCOSITY_DRAIN);
  EXPECT_EQ(disp, PUMPLOSS_TS_DISPLACEMENT_TWO_STEP);
  EXPECT_EQ(fit, PUMPLOSS_MODEL_WILSON);
  EXPECT_EQ(pumploss_test_stand_setup_get_meter(h.s, &pos, &p), PUMPLOSS_OK);
  EXPECT_EQ(pos, PUMPLOSS_TS_METER_AT_PORT);
  EXPECT_EQ(pumploss_test_stand_setup_get_instrument(h.s, PUMPLOSS_TS_TORQUE, &pct, &abs_si, &dist), PUMPLOSS_OK);
  EXPECT_EQ(pct, 0.0);
  EXPECT_EQ(abs_si, 0.0);
  // no map range yet: EDATA, the range NaN, the default grid counts 29 x 27
  double a = 0, b = 0, c = 0, d = 0, t = 0;
  size_t ns = 0, np = 0;
  EXPECT_EQ(pumploss_test_stand_setup_get_map(h.s, &a, &b, &c, &d, &t, &ns, &np), PUMPLOSS_EDATA);
  EXPECT_TRUE(std::isnan(a) && std::isnan(b) && std::isnan(c) && std::isnan(d) && std::isnan(t));
  EXPECT_EQ(ns, 29u);
  EXPECT_EQ(np, 27u);
}

TEST(CapiTestStandSetup, GettersReturnWhatWasSet) {
  OwnedSetup h;
  ASSERT_NE(h.s, nullptr);
  ASSERT_EQ(pumploss_test_stand_setup_set_oil(h.s, 872.0, 288.15, 7e-4, 1.6e9), PUMPLOSS_OK);
  ASSERT_EQ(pumploss_test_stand_setup_set_method(h.s, PUMPLOSS_TS_VISCOSITY_INLET, PUMPLOSS_TS_DISPLACEMENT_SLOPE,
                                                 PUMPLOSS_MODEL_SCHLOESSER), PUMPLOSS_OK);
  ASSERT_EQ(pumploss_test_stand_setup_set_meter(h.s, PUMPLOSS_TS_METER_IN_RETURN, 3e5), PUMPLOSS_OK);
  ASSERT_EQ(pumploss_test_stand_setup_set_instrument(h.s, PUMPLOSS_TS_FLOW, 0.3, 1e-6, PUMPLOSS_TS_STANDARD), PUMPLOSS_OK);
  ASSERT_EQ(pumploss_test_stand_setup_set_map(h.s, 500.0 / 60, 1500.0 / 60, 20e5, 250e5, 323.15, 5, 4), PUMPLOSS_OK);
  double rho = 0, tr = 0, al = 0, k = 0;
  EXPECT_EQ(pumploss_test_stand_setup_get_oil(h.s, &rho, &tr, &al, &k), PUMPLOSS_OK);
  EXPECT_EQ(rho, 872.0);
  EXPECT_EQ(tr, 288.15);
  EXPECT_EQ(al, 7e-4);
  EXPECT_EQ(k, 1.6e9);
  int vt = -1, disp = -1, fit = -1, pos = -1, dist = -1;
  EXPECT_EQ(pumploss_test_stand_setup_get_method(h.s, &vt, &disp, &fit), PUMPLOSS_OK);
  EXPECT_EQ(vt, PUMPLOSS_TS_VISCOSITY_INLET);
  EXPECT_EQ(disp, PUMPLOSS_TS_DISPLACEMENT_SLOPE);
  EXPECT_EQ(fit, PUMPLOSS_MODEL_SCHLOESSER);
  double p = 0, pct = 0, abs_si = 0;
  EXPECT_EQ(pumploss_test_stand_setup_get_meter(h.s, &pos, &p), PUMPLOSS_OK);
  EXPECT_EQ(pos, PUMPLOSS_TS_METER_IN_RETURN);
  EXPECT_EQ(p, 3e5);
  EXPECT_EQ(pumploss_test_stand_setup_get_instrument(h.s, PUMPLOSS_TS_FLOW, &pct, &abs_si, &dist), PUMPLOSS_OK);
  EXPECT_NEAR(pct, 0.3, 1e-15);  // stored as a fraction: 0.3 / 100 * 100
  EXPECT_EQ(abs_si, 1e-6);
  EXPECT_EQ(dist, PUMPLOSS_TS_STANDARD);
  double a = 0, b = 0, c = 0, d = 0, t = 0;
  size_t ns = 0, np = 0;
  EXPECT_EQ(pumploss_test_stand_setup_get_map(h.s, &a, &b, &c, &d, &t, &ns, &np), PUMPLOSS_OK);
  EXPECT_EQ(a, 500.0 / 60);
  EXPECT_EQ(b, 1500.0 / 60);
  EXPECT_EQ(c, 20e5);
  EXPECT_EQ(d, 250e5);
  EXPECT_EQ(t, 323.15);
  EXPECT_EQ(ns, 5u);
  EXPECT_EQ(np, 4u);
}

TEST(CapiTestStandSetup, ViscosityFollowsTheD341LineOfItsPoints) {
  OwnedSetup h;
  ASSERT_NE(h.s, nullptr);
  double nu = 0;
  // the line passes through its two points (ASTM D341, the line through two known points)
  ASSERT_EQ(pumploss_test_stand_setup_viscosity(h.s, 313.15, &nu), PUMPLOSS_OK);
  EXPECT_NEAR(nu / 46e-6, 1.0, 1e-12);
  ASSERT_EQ(pumploss_test_stand_setup_viscosity(h.s, 373.15, &nu), PUMPLOSS_OK);
  EXPECT_NEAR(nu / 6.9e-6, 1.0, 1e-12);
  double ref = 0;
  ASSERT_EQ(pumploss_viscosity_d341(313.15, 46e-6, 373.15, 6.9e-6, 323.15, &ref), PUMPLOSS_OK);
  ASSERT_EQ(pumploss_test_stand_setup_viscosity(h.s, 323.15, &nu), PUMPLOSS_OK);
  EXPECT_NEAR(nu / ref, 1.0, 1e-14);
}

TEST(CapiTestStandSetup, BadInputGivesAClearStatusAndNaN) {
  OwnedSetup h;
  ASSERT_NE(h.s, nullptr);
  double nu = 0, v = 0, pct = 0, abs_si = 0, rho = 0, tr = 0, al = 0, k = 0;
  int kind = 0, dist = 0, vt = 0, disp = 0, fit = 0;
  EXPECT_EQ(pumploss_test_stand_setup_viscosity(h.s, kNaN, &nu), PUMPLOSS_ENONFINITE);
  EXPECT_TRUE(std::isnan(nu));
  EXPECT_EQ(pumploss_test_stand_setup_viscosity(h.s, -1.0, &nu), PUMPLOSS_EDOMAIN);
  EXPECT_TRUE(std::isnan(nu));
  EXPECT_EQ(pumploss_test_stand_setup_viscosity(nullptr, 300.0, &nu), PUMPLOSS_EMISUSE);
  EXPECT_EQ(pumploss_test_stand_setup_get_machine(nullptr, &kind, &v), PUMPLOSS_EMISUSE);
  EXPECT_EQ(kind, -1);
  EXPECT_TRUE(std::isnan(v));
  EXPECT_EQ(pumploss_test_stand_setup_get_machine(h.s, nullptr, &v), PUMPLOSS_EMISUSE);
  EXPECT_TRUE(std::isnan(v));
  EXPECT_EQ(pumploss_test_stand_setup_get_instrument(h.s, 4, &pct, &abs_si, &dist), PUMPLOSS_EDOMAIN);
  EXPECT_TRUE(std::isnan(pct) && std::isnan(abs_si));
  EXPECT_EQ(dist, -1);
  EXPECT_EQ(pumploss_test_stand_setup_get_oil(h.s, &rho, &tr, nullptr, &k), PUMPLOSS_EMISUSE);
  EXPECT_TRUE(std::isnan(rho) && std::isnan(k));
  EXPECT_EQ(pumploss_test_stand_setup_get_method(h.s, &vt, nullptr, &fit), PUMPLOSS_EMISUSE);
  EXPECT_EQ(vt, -1);
  EXPECT_EQ(fit, -1);
  (void)al;
  (void)disp;
}
