// The report workflows (workflows.hpp): the oil table over temperature with the maker's limits,
// and the piston-pump pressure sweep, checked row by row against the functions they run and
// against their refusals.
#include <gtest/gtest.h>

#include <cmath>

#include "pumploss/workflows.hpp"

namespace {

using pumploss::status;
using pumploss::viscosity_verdict;

pumploss::oil<double> vg46() {
  // ISO VG 46 mid-point at 40 degC (ISO 3448:1992) and 6.9 cSt at 100 degC (invented data sheet)
  return pumploss::typical_mineral_oil(pumploss::d341_fit(313.15, 46e-6, 373.15, 6.9e-6).value);
}

}  // namespace

TEST(OilTable, RowsLimitsAndGrade) {
  const auto oil = vg46();
  pumploss::viscosity_limits lim;
  lim.min_m2_s = 10e-6;
  lim.max_m2_s = 400e-6;
  lim.max_start_m2_s = 1000e-6;
  const std::vector<double> t = {253.15, 273.15, 313.15, 373.15, 393.15};
  const auto tab = pumploss::tabulate_oil(oil, t, lim, 46);
  ASSERT_TRUE(pumploss::is_usable(tab.st));
  ASSERT_EQ(tab.rows.size(), t.size());
  EXPECT_NEAR(tab.nu40_m2_s, 46e-6, 1e-15);  // the line runs through the grade's mid-point
  EXPECT_TRUE(tab.inside_grade);
  for (std::size_t i = 0; i < t.size(); ++i) {
    const auto& r = tab.rows[i];
    EXPECT_EQ(r.nu_m2_s, pumploss::oil_kinematic_viscosity(oil, t[i]).value);
    EXPECT_EQ(r.mu_pa_s, pumploss::oil_dynamic_viscosity(oil, t[i], 0.0).value);
    EXPECT_EQ(r.rho_kg_m3, pumploss::oil_density_at(oil, t[i], 0.0).value);
  }
  EXPECT_EQ(tab.rows[0].verdict, viscosity_verdict::too_thick_to_start);  // -20 degC: thousands of cSt
  EXPECT_EQ(tab.rows[1].verdict, viscosity_verdict::start_only);          // 0 degC: about 500 cSt
  EXPECT_EQ(tab.rows[2].verdict, viscosity_verdict::ok);
  EXPECT_EQ(tab.rows[3].verdict, viscosity_verdict::too_thin);            // 6.9 cSt at 100 degC
  // no limits: not checked; another grade's band: outside
  const auto plain = pumploss::tabulate_oil(oil, {313.15}, {}, 68);
  EXPECT_EQ(plain.rows[0].verdict, viscosity_verdict::not_checked);
  EXPECT_FALSE(plain.inside_grade);
  // a temperature where the oil is not defined stops the table there; a grade that does not exist
  const auto bad = pumploss::tabulate_oil(oil, {313.15, -5.0}, lim);
  EXPECT_TRUE(pumploss::is_error(bad.st));
  EXPECT_EQ(bad.failed_row, 1u);
  EXPECT_EQ(bad.rows.size(), 1u);
  EXPECT_EQ(pumploss::tabulate_oil(oil, {313.15}, lim, 47).st, status::domain);
}

TEST(PumpSweep, EveryPressureAsTheBudgetGivesIt) {
  // a 9-piston pump of about 71 cm3/rev with slipper and valve plate (the demo's dimensions)
  pumploss::piston_pump<double> p;
  p.pistons = 9;
  p.piston_diameter_m = 0.017;
  p.bore_clearance_m = 15e-6;
  p.engaged_length_min_m = 0.021;
  p.pitch_radius_m = 0.0568;
  p.max_swash_angle_rad = 17 * 3.14159265358979323846 / 180;
  p.slipper_pocket_radius_m = 0.0055;
  p.slipper_outer_radius_m = 0.010;
  p.slipper_gap_m = 21e-6;
  p.slipper_feed_diameter_m = 0.8e-3;
  p.slipper_feed_length_m = 6e-3;
  const auto oil = vg46();
  pumploss::pump_sweep s;
  s.from_pa = 20e5;
  s.to_pa = 260e5;
  s.step_pa = 20e5;
  s.case_pa = 0.5e5;
  s.speed_rev_s = 25;
  s.temperature_k = 323.15;
  s.with_reference = true;
  s.reference = {250.5e5, 0.5e5, 25.0, 1.0, 323.15};
  const auto r = pumploss::sweep_piston_pump(p, oil, s);
  ASSERT_TRUE(pumploss::is_usable(r.st));
  ASSERT_EQ(r.points.size(), 13u);  // 20 to 260 bar in steps of 20, both ends included
  double re = 0;
  for (std::size_t i = 0; i < r.points.size(); ++i) {
    const pumploss::pump_operating_point<double> op{20e5 + 20e5 * static_cast<double>(i), 0.5e5, 25.0, 1.0, 323.15};
    const auto b = pumploss::piston_pump_budget(p, oil, op);
    EXPECT_EQ(r.points[i].outlet_pa, op.outlet_pa);
    EXPECT_EQ(r.points[i].budget.total_m3_s, b.total_m3_s);
    EXPECT_EQ(r.points[i].sensitivity.elasticity[0], pumploss::piston_pump_sensitivity(p, oil, op).elasticity[0]);
    re = std::max(re, b.max_gap_reynolds);
  }
  EXPECT_EQ(r.max_gap_reynolds, re);
  EXPECT_EQ(r.reference.total_m3_s, pumploss::piston_pump_budget(p, oil, s.reference).total_m3_s);
  // sweeps that are not a sweep
  auto bad = s;
  bad.step_pa = 0;
  EXPECT_EQ(pumploss::sweep_piston_pump(p, oil, bad).st, status::domain);
  bad = s;
  bad.from_pa = 0.2e5;  // below the case pressure
  EXPECT_EQ(pumploss::sweep_piston_pump(p, oil, bad).st, status::domain);
  bad = s;
  bad.step_pa = 1.0;  // more than 1000 pressures
  EXPECT_EQ(pumploss::sweep_piston_pump(p, oil, bad).st, status::domain);
  bad = s;
  bad.temperature_k = -1.0;  // no oil there: the first pressure fails
  const auto f = pumploss::sweep_piston_pump(p, oil, bad);
  EXPECT_TRUE(pumploss::is_error(f.st));
  EXPECT_EQ(f.failed_point, 0u);
}
