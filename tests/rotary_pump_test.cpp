// Gear and vane pump clearance budgets: each path against its laminar gap law (self-calculated in
// mpmath, tests/reference/rotary/), the dual-number sensitivities against the same derivatives,
// the 50-digit evaluation, scaling laws that must hold, and bad input.
#include <gtest/gtest.h>

#include <cmath>
#include <cstring>
#include <string>

#include "pumploss.h"
#include "pumploss/efficiency.hpp"
#include "pumploss/flow_test.hpp"
#include "pumploss/gap.hpp"
#include "pumploss/gear_pump.hpp"
#include "pumploss/vane_pump.hpp"
#include "rotary_support.hpp"
#include "test_support.hpp"

namespace {

using pltest::mp50;
using pumploss::status;

struct rotary_row {
  const char* key;
  const char* pump;
  const char* quantity;
  int path;
  double expected, tol;
};
const rotary_row kRows[] = {
#include "reference/rotary/gap_law_selfcalc.ipp"
};

const pltest::named_row kWorkedRows[] = {
#include "reference/rotary/worked_examples.ipp"
};

/// The worked-example row of a quantity (tests/reference/rotary/worked_examples.ipp).
const pltest::named_row& worked(const char* quantity) {
  for (const auto& r : kWorkedRows)
    if (std::strcmp(r.quantity, quantity) == 0) return r;
  ADD_FAILURE() << "no row " << quantity;
  return kWorkedRows[0];
}

void expect_worked(double got, const char* quantity) {
  const auto& r = worked(quantity);
  EXPECT_NEAR(got / r.expected, 1.0, r.tol) << r.key << ": " << quantity << " = " << got;
}

template <class T>
pumploss::gear_pump<T> test_gear() {
  pumploss::gear_pump<T> g;
  g.displacement_m3_rev = T(12e-6);
  g.tip_radius_m = T(0.0165);
  g.root_radius_m = T(0.0125);
  g.shaft_radius_m = T(0.009);
  g.face_width_m = T(0.018);
  g.tip_land_m = T(0.0012);
  g.teeth_sealing = 5;
  g.tip_clearance_m = T(20e-6);
  g.lateral_clearance_m = T(30e-6);
  g.balanced_bushings = false;
  g.lateral_offset = T(0.2);
  g.lateral_arc_rad = pumploss::detail::pi<T>();
  g.mesh_clearance_m = T(5e-6);
  g.mesh_length_m = T(2e-3);
  return g;
}

template <class T>
pumploss::vane_pump<T> test_vane() {
  pumploss::vane_pump<T> v;
  v.displacement_m3_rev = T(16e-6);
  v.rotor_width_m = T(0.020);
  v.cam_radius_m = T(0.038);
  v.rotor_radius_m = T(0.035);
  v.hub_radius_m = T(0.012);
  v.sealing_arcs = 2;
  v.vanes_per_arc = 1;
  v.vane_tip_land_m = T(0.0015);
  v.tip_clearance_m = T(15e-6);
  v.side_clearance_m = T(12e-6);
  v.pressure_arc_rad = pumploss::detail::pi<T>();
  v.vanes_in_suction = 3;
  v.slot_length_m = T(0.008);
  v.slot_clearance_m = T(10e-6);
  return v;
}

template <class T>
pumploss::rotary_operating_point<T> test_op() {
  return {T(150e5), T(0), T(25), T(313.15)};
}

TEST(RotaryBudget, EachPathMatchesItsLaminarGapLaw) {
  const auto o = pltest::rotary_test_oil<double>();
  const auto gb = pumploss::gear_pump_budget(test_gear<double>(), o, test_op<double>());
  const auto vb = pumploss::vane_pump_budget(test_vane<double>(), o, test_op<double>());
  ASSERT_EQ(gb.st, status::ok);
  ASSERT_EQ(vb.st, status::ok);
  EXPECT_NEAR(gb.mu_pa_s / (870 * 32e-6), 1.0, 1e-13);
  const auto gs = pumploss::gear_pump_sensitivity(test_gear<double>(), o, test_op<double>());
  const auto vs = pumploss::vane_pump_sensitivity(test_vane<double>(), o, test_op<double>());
  int n = 0;
  for (const auto& r : kRows) {
    const bool gear = std::strcmp(r.pump, "gear") == 0;
    const bool flow = std::strcmp(r.quantity, "flow") == 0;
    const double got = flow ? (gear ? gb.flow_m3_s[r.path] : vb.flow_m3_s[r.path])
                            : (gear ? gs.d_total_d_gap[r.path] : vs.d_total_d_gap[r.path]);
    EXPECT_NEAR(got / r.expected, 1.0, r.tol) << r.key << " " << r.pump << " " << r.quantity << " " << r.path;
    ++n;
  }
  EXPECT_EQ(n, 12);
  // totals and efficiency from the parts
  EXPECT_NEAR(gb.total_m3_s, gb.flow_m3_s[0] + gb.flow_m3_s[1] + gb.flow_m3_s[2], 1e-20);
  EXPECT_NEAR(gb.volumetric_efficiency, 1 - gb.total_m3_s / (12e-6 * 25), 1e-15);
  EXPECT_NEAR(gb.share[0] + gb.share[1] + gb.share[2], 1.0, 1e-15);  // all positive at 150 bar
}

// Esposito's gear pump example (from memory, tests/reference/SOURCES.md): the volumetric efficiency
// of a gear pump from its geometric displacement and the flow it gives, through the flow test
// (speed measured, the no-load flow the geometric flow).
TEST(RotaryWorkedExample, EspositoGearPumpVolumetricEfficiency) {
  const double in = 0.0254, gpm = 231 * in * in * in / 60;  // US gallon = 231 in^3
  const double v = pumploss::detail::pi<double>() / 4 * (3 * 3 - 2 * 2) * in * in * in;  // 3.93 in^3
  const double n = 1800.0 / 60;
  pumploss::flow_test_setup<double> s{};
  s.displacement_m3_rev = v;
  s.mu_test_pa_s = s.mu_ref_pa_s = 0.03;
  s.ref_pressure_pa = 100e5;
  s.ref_speed_rev_s = n;
  s.new_volumetric_efficiency = 0.95;
  s.limit = pumploss::flow_test_default_limit;
  s.watch_band = pumploss::flow_test_default_watch_band;
  const pumploss::flow_reading<double> no_load{v * n, 0.0, n}, loaded{28 * gpm, 100e5, n};
  const auto r = pumploss::flow_test_evaluate(no_load, loaded, s);
  ASSERT_EQ(r.st, status::ok);
  EXPECT_NEAR(v * n / gpm, 30.6, 0.05);  // the book's theoretical flow
  expect_worked(r.volumetric_efficiency, "esposito gear eta_v");
  EXPECT_NEAR(r.leakage_m3_s / gpm, 30.6 - 28, 0.05);
}

// A published vane pump problem (vane_pump_exercise, tests/reference/SOURCES.md; answers worked by
// hand): the speed that gives the stated flow at 90 % volumetric efficiency, then the flow test and
// the efficiencies of the library at that speed with the input torque of 12.7 kW.
TEST(RotaryWorkedExample, VanePumpExerciseEfficiencies) {
  const double v = 115e-6, q_actual = 0.09315 / 60, dp = 70e5, power = 12.7e3;
  const double n = q_actual / (0.90 * v);  // the problem's step (ii)
  expect_worked(n, "vane exercise speed rev/s");
  const double torque = power / (2 * pumploss::detail::pi<double>() * n);
  const auto e = pumploss::pump_efficiency(v, n, dp, q_actual, torque);
  ASSERT_EQ(e.st, status::ok);
  expect_worked(e.eta_v, "vane exercise eta_v");
  expect_worked(e.eta_hm, "vane exercise eta_hm");
  expect_worked(e.eta_t, "vane exercise eta_t");
  // the same pump through the field flow test: the no-load flow the geometric flow
  pumploss::flow_test_setup<double> s{};
  s.displacement_m3_rev = v;
  s.mu_test_pa_s = s.mu_ref_pa_s = 0.03;
  s.ref_pressure_pa = dp;
  s.ref_speed_rev_s = n;
  s.new_volumetric_efficiency = 0.95;
  s.limit = pumploss::flow_test_default_limit;
  s.watch_band = pumploss::flow_test_default_watch_band;
  const pumploss::flow_reading<double> no_load{v * n, 0.0, n}, loaded{q_actual, dp, n};
  const auto r = pumploss::flow_test_evaluate(no_load, loaded, s);
  ASSERT_EQ(r.st, status::ok);
  expect_worked(r.volumetric_efficiency, "vane exercise eta_v");
  expect_worked(r.leakage_m3_s, "vane exercise leakage m3/s");
}

// The hand-worked examples of docs/pages/theory_rotary.md (self-calculated): each step of the
// written calculation, from the gap primitives and from the budgets.
TEST(RotaryWorkedExample, GearPumpByHand) {
  const auto o = pltest::rotary_test_oil<double>();
  pumploss::gear_pump<double> g;
  g.displacement_m3_rev = 10e-6;
  g.tip_radius_m = 0.020;
  g.root_radius_m = 0.015;
  g.shaft_radius_m = 0.010;
  g.face_width_m = 0.020;
  g.tip_land_m = 1.5e-3;
  g.teeth_sealing = 4;
  g.tip_clearance_m = 20e-6;
  g.lateral_clearance_m = 40e-6;
  g.lateral_arc_rad = pumploss::detail::pi<double>();
  const pumploss::rotary_operating_point<double> op{100e5, 0.0, 25.0, 313.15};
  const double mu = 870 * 32e-6, u = 2 * pumploss::detail::pi<double>() * 25 * 0.020;
  expect_worked(pumploss::gap_plates_flow(100e5, mu, 0.020, 20e-6, 4 * 1.5e-3, 0.0).value,
                "gear tip pressure term per gear");
  expect_worked(-pumploss::gap_plates_flow(0.0, mu, 0.020, 20e-6, 4 * 1.5e-3, -u).value, "gear tip drag term per gear");
  expect_worked(pumploss::gap_radial_sector_flow(100e5, mu, 0.010, 0.015, 20e-6, pumploss::detail::pi<double>()).value,
                "gear lateral per face");
  const auto b = pumploss::gear_pump_budget(g, o, op);
  ASSERT_EQ(b.st, status::ok);
  expect_worked(b.flow_m3_s[static_cast<int>(pumploss::gear_path::tip)], "gear tip path");
  expect_worked(b.flow_m3_s[static_cast<int>(pumploss::gear_path::lateral)], "gear lateral path");
  EXPECT_EQ(b.flow_m3_s[static_cast<int>(pumploss::gear_path::mesh)], 0.0);
  expect_worked(b.total_m3_s, "gear total");
  const auto& e = worked("gear eta_v");
  EXPECT_NEAR(b.volumetric_efficiency, e.expected, e.tol);
}

TEST(RotaryWorkedExample, VanePumpByHand) {
  const auto o = pltest::rotary_test_oil<double>();
  pumploss::vane_pump<double> v;
  v.displacement_m3_rev = 16e-6;
  v.rotor_width_m = 0.025;
  v.cam_radius_m = 0.036;
  v.rotor_radius_m = 0.035;
  v.hub_radius_m = 0.015;
  v.sealing_arcs = 2;
  v.vanes_per_arc = 1;
  v.vane_tip_land_m = 2e-3;
  v.tip_clearance_m = 15e-6;
  v.side_clearance_m = 15e-6;
  v.pressure_arc_rad = pumploss::detail::pi<double>();
  v.vanes_in_suction = 3;
  v.slot_length_m = 0.010;
  v.slot_clearance_m = 10e-6;
  const pumploss::rotary_operating_point<double> op{100e5, 0.0, 25.0, 313.15};
  const double mu = 870 * 32e-6, u = 2 * pumploss::detail::pi<double>() * 25 * 0.036;
  expect_worked(pumploss::gap_plates_flow(100e5, mu, 0.025, 15e-6, 2e-3, 0.0).value, "vane tip pressure term per arc");
  expect_worked(-pumploss::gap_plates_flow(0.0, mu, 0.025, 15e-6, 2e-3, -u).value, "vane tip drag term per arc");
  expect_worked(pumploss::gap_radial_sector_flow(100e5, mu, 0.015, 0.035, 15e-6, pumploss::detail::pi<double>()).value,
                "vane side per face");
  expect_worked(pumploss::gap_plates_flow(100e5, mu, 0.025, 10e-6, 0.010, 0.0).value, "vane slot per vane");
  const auto b = pumploss::vane_pump_budget(v, o, op);
  ASSERT_EQ(b.st, status::ok);
  expect_worked(b.flow_m3_s[static_cast<int>(pumploss::vane_path::tip)], "vane tip path");
  expect_worked(b.flow_m3_s[static_cast<int>(pumploss::vane_path::side)], "vane side path");
  expect_worked(b.flow_m3_s[static_cast<int>(pumploss::vane_path::slot)], "vane slot path");
  expect_worked(b.total_m3_s, "vane total");
  const auto& e = worked("vane eta_v");
  EXPECT_NEAR(b.volumetric_efficiency, e.expected, e.tol);
}

// The same hand-worked pumps through the C handles (the oil's first D341 point at 15 degC, where
// its density is the stated 870 kg/m3, so that mu = 870 x 32e-6 Pa s there).
TEST(RotaryWorkedExample, CHandlesGiveTheHandWorkedPaths) {
  const double t = 288.15;
  pumploss_gear_pump* g = nullptr;
  ASSERT_EQ(pumploss_gear_pump_create(10e-6, 0.010, 0.005, 0.005, 0.020, 1.5e-3, 4, 20e-6, 40e-6, &g), PUMPLOSS_OK);
  ASSERT_EQ(pumploss_gear_pump_set_oil(g, t, 32e-6, 373.15, 5.4e-6, 870), PUMPLOSS_OK);
  double q = 0, total = 0, eta = 0, dqdh = 0, el = 0;
  ASSERT_EQ(pumploss_gear_pump_path(g, PUMPLOSS_GEAR_PATH_TIP, 100e5, 0, 25, t, &q, &total, &eta, &dqdh, &el),
            PUMPLOSS_OK);
  expect_worked(q, "gear tip path");
  expect_worked(total, "gear total");
  EXPECT_NEAR(eta, worked("gear eta_v").expected, worked("gear eta_v").tol);
  ASSERT_EQ(pumploss_gear_pump_path(g, PUMPLOSS_GEAR_PATH_LATERAL, 100e5, 0, 25, t, &q, &total, &eta, &dqdh, &el),
            PUMPLOSS_OK);
  expect_worked(q, "gear lateral path");
  pumploss_gear_pump_destroy(g);

  pumploss_vane_pump* v = nullptr;
  ASSERT_EQ(pumploss_vane_pump_create(16e-6, 0.015, 0.020, 0.001, 0.025, 2, 1, 2e-3, 15e-6, 15e-6, &v), PUMPLOSS_OK);
  ASSERT_EQ(pumploss_vane_pump_set_oil(v, t, 32e-6, 373.15, 5.4e-6, 870), PUMPLOSS_OK);
  ASSERT_EQ(pumploss_vane_pump_set_slots(v, 3, 0.010, 10e-6), PUMPLOSS_OK);
  const struct {
    int path;
    const char* row;
  } paths[] = {{PUMPLOSS_VANE_PATH_TIP, "vane tip path"},
               {PUMPLOSS_VANE_PATH_SIDE, "vane side path"},
               {PUMPLOSS_VANE_PATH_SLOT, "vane slot path"}};
  for (const auto& p : paths) {
    ASSERT_EQ(pumploss_vane_pump_path(v, p.path, 100e5, 0, 25, t, &q, &total, &eta, &dqdh, &el), PUMPLOSS_OK);
    expect_worked(q, p.row);
  }
  expect_worked(total, "vane total");
  pumploss_vane_pump_destroy(v);
}

TEST(RotaryBudget, AgreesWithTheFiftyDigitEvaluation) {
  const auto gd = pumploss::gear_pump_budget(test_gear<double>(), pltest::rotary_test_oil<double>(), test_op<double>());
  const auto gm = pumploss::gear_pump_budget(test_gear<mp50>(), pltest::rotary_test_oil<mp50>(), test_op<mp50>());
  const auto vd = pumploss::vane_pump_budget(test_vane<double>(), pltest::rotary_test_oil<double>(), test_op<double>());
  const auto vm = pumploss::vane_pump_budget(test_vane<mp50>(), pltest::rotary_test_oil<mp50>(), test_op<mp50>());
  ASSERT_EQ(gm.st, status::ok);
  ASSERT_EQ(vm.st, status::ok);
  for (int i = 0; i < pumploss::clearance_path_count; ++i) {
    // the tip path subtracts drag from pressure flow: cancellation of about 1 digit
    EXPECT_LT(pltest::rel_err(gd.flow_m3_s[i], gm.flow_m3_s[i]), 1e-13) << i;
    EXPECT_LT(pltest::rel_err(vd.flow_m3_s[i], vm.flow_m3_s[i]), 1e-13) << i;
  }
  EXPECT_LT(pltest::rel_err(gd.total_m3_s, gm.total_m3_s), 1e-13);
  EXPECT_LT(pltest::rel_err(vd.total_m3_s, vm.total_m3_s), 1e-13);
}

TEST(RotaryBudget, SensitivityMatchesFiniteDifferencesAndPureLaminarPathsHaveElasticityThree) {
  const auto o = pltest::rotary_test_oil<double>();
  const auto op = test_op<double>();
  const auto g = test_gear<double>();
  const auto s = pumploss::gear_pump_sensitivity(g, o, op);
  ASSERT_EQ(s.st, status::ok);
  // central differences of the budget in each clearance (step 1e-4 relative)
  auto total = [&](int k, double f) {
    auto x = g;
    if (k == 0) x.tip_clearance_m *= f;
    if (k == 1) x.lateral_clearance_m *= f;
    if (k == 2) x.mesh_clearance_m *= f;
    return pumploss::gear_pump_budget(x, o, op).total_m3_s;
  };
  const double hs[3] = {g.tip_clearance_m, g.lateral_clearance_m, g.mesh_clearance_m};
  for (int k = 0; k < 3; ++k) {
    const double fd = (total(k, 1 + 1e-4) - total(k, 1 - 1e-4)) / (2e-4 * hs[k]);
    EXPECT_NEAR(s.d_total_d_gap[k] / fd, 1.0, 1e-6) << k;
  }
  // a pump with only the lateral path (tip drag balanced out by a huge tip land, no mesh):
  // elasticity of the lateral gap is 3
  auto only = g;
  only.mesh_clearance_m = 0;
  const auto b = pumploss::gear_pump_budget(only, o, op);
  const auto so = pumploss::gear_pump_sensitivity(only, o, op);
  const double lat_share = b.flow_m3_s[1] / b.total_m3_s;
  EXPECT_NEAR(so.elasticity[1], 3 * lat_share, 1e-12);
  EXPECT_EQ(so.d_total_d_gap[2], 0.0);  // sealed mesh
}

TEST(RotaryBudget, ScalingLawsHold) {
  const auto o = pltest::rotary_test_oil<double>();
  auto op = test_op<double>();
  auto g = test_gear<double>();
  g.mesh_clearance_m = 0;
  // lateral path proportional to pressure; tip path affine in pressure with the drag at dp = 0
  const auto b1 = pumploss::gear_pump_budget(g, o, op);
  op.outlet_pa *= 2;
  const auto b2 = pumploss::gear_pump_budget(g, o, op);
  EXPECT_NEAR(b2.flow_m3_s[1] / b1.flow_m3_s[1], 2.0, 1e-14);
  op.outlet_pa = 0;
  const auto b0 = pumploss::gear_pump_budget(g, o, op);
  EXPECT_NEAR(b2.flow_m3_s[0] - b1.flow_m3_s[0], b1.flow_m3_s[0] - b0.flow_m3_s[0], 1e-18);
  // at zero pressure the tips carry oil forward: negative "leakage" of -b h U per gear pair
  const double u = 2 * pumploss::detail::pi<double>() * 25 * g.tip_radius_m;
  EXPECT_NEAR(b0.flow_m3_s[0], -2 * g.face_width_m * g.tip_clearance_m * u / 2, 1e-18);
  // shares of the gross leakage: the negative tip path keeps its sign, |shares| sum to 1
  EXPECT_LT(b0.share[0], 0.0);
  EXPECT_NEAR(std::fabs(b0.share[0]) + std::fabs(b0.share[1]) + std::fabs(b0.share[2]), 1.0, 1e-15);
  // side plates centred give less leakage than offset (h1^3 + h2^3 grows with the offset)
  auto c = g;
  c.lateral_offset = 0;
  EXPECT_LT(pumploss::gear_pump_budget(c, o, test_op<double>()).flow_m3_s[1], b1.flow_m3_s[1]);
  // balanced bushings with a film e/2 equal the centred side plates
  auto bb = c;
  bb.balanced_bushings = true;
  bb.lateral_clearance_m = c.lateral_clearance_m / 2;
  EXPECT_NEAR(pumploss::gear_pump_budget(bb, o, test_op<double>()).flow_m3_s[1] /
                  pumploss::gear_pump_budget(c, o, test_op<double>()).flow_m3_s[1],
              1.0, 1e-14);
}

TEST(RotaryBudget, ReportsLeavingTheModelsRange) {
  const auto o = pltest::rotary_test_oil<double>();
  // huge clearances: not laminar, leakage above the ideal flow
  auto g = test_gear<double>();
  g.tip_clearance_m = 400e-6;
  g.lateral_clearance_m = 600e-6;
  const auto b = pumploss::gear_pump_budget(g, o, test_op<double>());
  EXPECT_TRUE(pumploss::is_usable(b.st));
  EXPECT_NE(b.st, status::ok);
  EXPECT_GT(b.max_gap_reynolds, 2000.0);
}

TEST(RotaryBudget, BadInputGivesAClearStatusAndNaN) {
  const auto o = pltest::rotary_test_oil<double>();
  auto expect_fail = [](const pumploss::clearance_budget<double>& b, status st) {
    EXPECT_EQ(b.st, st);
    EXPECT_TRUE(std::isnan(b.total_m3_s));
    EXPECT_TRUE(std::isnan(b.flow_m3_s[0]));
    EXPECT_TRUE(std::isnan(b.volumetric_efficiency));
  };
  auto g = test_gear<double>();
  g.tip_clearance_m = 0;
  expect_fail(pumploss::gear_pump_budget(g, o, test_op<double>()), status::domain);
  g = test_gear<double>();
  g.root_radius_m = g.tip_radius_m;
  expect_fail(pumploss::gear_pump_budget(g, o, test_op<double>()), status::domain);
  g = test_gear<double>();
  g.teeth_sealing = 0;
  expect_fail(pumploss::gear_pump_budget(g, o, test_op<double>()), status::domain);
  g = test_gear<double>();
  g.mesh_length_m = 0;
  expect_fail(pumploss::gear_pump_budget(g, o, test_op<double>()), status::domain);
  g = test_gear<double>();
  g.lateral_offset = 1;
  expect_fail(pumploss::gear_pump_budget(g, o, test_op<double>()), status::domain);
  g = test_gear<double>();
  g.face_width_m = pltest::kNaN;
  expect_fail(pumploss::gear_pump_budget(g, o, test_op<double>()), status::nonfinite);
  auto op = test_op<double>();
  op.inlet_pa = op.outlet_pa + 1;
  expect_fail(pumploss::gear_pump_budget(test_gear<double>(), o, op), status::domain);
  op = test_op<double>();
  op.speed_rev_s = 0;
  expect_fail(pumploss::vane_pump_budget(test_vane<double>(), o, op), status::domain);
  op.speed_rev_s = pltest::kInf;
  expect_fail(pumploss::vane_pump_budget(test_vane<double>(), o, op), status::nonfinite);
  auto v = test_vane<double>();
  v.cam_radius_m = v.rotor_radius_m;
  expect_fail(pumploss::vane_pump_budget(v, o, test_op<double>()), status::domain);
  v = test_vane<double>();
  v.slot_length_m = 0;
  expect_fail(pumploss::vane_pump_budget(v, o, test_op<double>()), status::domain);
  const auto s = pumploss::vane_pump_sensitivity(v, o, test_op<double>());
  EXPECT_EQ(s.st, status::domain);
  EXPECT_TRUE(std::isnan(s.d_total_d_gap[0]));
  EXPECT_STREQ(pumploss::gear_path_name(0), "tooth-tip");
  EXPECT_STREQ(pumploss::vane_path_name(2), "rotor-slots");
  EXPECT_STREQ(pumploss::vane_path_name(3), "unknown");
  EXPECT_STREQ(pumploss::gear_path_name(-1), "unknown");
}

}  // namespace
