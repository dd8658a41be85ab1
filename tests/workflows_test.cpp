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

pumploss::piston_pump<double> sweep_pump() {
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
  return p;
}

// A sweep at 0.5 bar case pressure, 1500 rpm, 50 degC, with the reference at 250 bar.
pumploss::pump_sweep sweep_from(double from_pa, double to_pa, double step_pa) {
  pumploss::pump_sweep s;
  s.from_pa = from_pa;
  s.to_pa = to_pa;
  s.step_pa = step_pa;
  s.case_pa = 0.5e5;
  s.speed_rev_s = 25;
  s.temperature_k = 323.15;
  s.with_reference = true;
  s.reference = {250.5e5, 0.5e5, 25.0, 1.0, 323.15};
  return s;
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
  const auto p = sweep_pump();
  const auto oil = vg46();
  const auto s = sweep_from(20e5, 260e5, 20e5);
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

TEST(PumpSweep, FlowLossAndReferenceAsTheirFunctionsGiveThem) {
  // The sweep's additions (each point's flow loss, and at the reference the flow loss, the
  // deadhead budget, the balance at full and zero stroke and the share uncertainty) are the
  // functions they run, evaluated with the sweep's inlet pressure and film temperature rise.
  const auto p = sweep_pump();
  const auto oil = vg46();
  auto s = sweep_from(50e5, 250e5, 100e5);
  s.inlet_pa = 0.3e5;
  s.film_temperature_rise_k = 7;
  s.reference.inlet_pa = 0.3e5;
  s.reference.film_temperature_rise_k = 7;
  const auto plain = pumploss::sweep_piston_pump(p, oil, s);
  ASSERT_TRUE(plain.usable());
  EXPECT_FALSE(plain.at_reference.with_uncertainty);  // no gap uncertainty given
  s.u_gap_m[0] = 2e-6;                                   // piston-bore clearance +-3.5 um drawn: u = t / sqrt(3)
  s.u_gap_m[1] = 1.5e-6;
  const auto r = pumploss::sweep_piston_pump(p, oil, s);
  ASSERT_TRUE(r.usable());
  ASSERT_EQ(r.points.size(), 3u);
  for (const auto& pt : r.points) {
    pumploss::pump_operating_point<double> op{pt.outlet_pa, 0.5e5, 25.0, 1.0, 323.15};
    op.inlet_pa = 0.3e5;
    op.film_temperature_rise_k = 7;
    const auto b = pumploss::piston_pump_budget(p, oil, op);
    const auto fl = pumploss::piston_pump_flow_loss(p, oil, op);
    EXPECT_EQ(pt.budget.total_film_m3_s, b.total_film_m3_s);
    EXPECT_NE(pt.budget.total_film_m3_s, pt.budget.total_m3_s);  // the film viscosity bound differs
    EXPECT_EQ(pt.flow_loss.total_m3_s, fl.total_m3_s);
    EXPECT_EQ(pt.flow_loss.cross_port_m3_s, fl.cross_port_m3_s);
    // the flow loss is the case drain plus what never reaches the case
    EXPECT_EQ(pt.flow_loss.drain_m3_s, pt.budget.total_m3_s);
    EXPECT_NEAR(pt.flow_loss.total_m3_s,
                pt.flow_loss.drain_m3_s + pt.flow_loss.compression_m3_s + pt.flow_loss.dead_volume_m3_s +
                    pt.flow_loss.cross_port_m3_s,
                1e-12 * pt.flow_loss.total_m3_s);
    EXPECT_GT(pt.flow_loss.compression_m3_s, 0.0);
  }
  const auto& a = r.at_reference;
  EXPECT_EQ(a.budget.total_m3_s, r.reference.total_m3_s);
  EXPECT_EQ(a.budget.total_film_m3_s, pumploss::piston_pump_budget(p, oil, s.reference).total_film_m3_s);
  EXPECT_EQ(a.flow_loss.total_m3_s, pumploss::piston_pump_flow_loss(p, oil, s.reference).total_m3_s);
  auto dh = s.reference;
  dh.mode = pumploss::controller_mode::deadhead;
  EXPECT_EQ(a.deadhead.total_m3_s, pumploss::piston_pump_budget(p, oil, dh).total_m3_s);
  EXPECT_NE(a.deadhead.total_m3_s, a.budget.total_m3_s);  // pistons deeper in their bores at zero stroke
  const auto full = pumploss::piston_pump_kinematics(p, 1.0);
  ASSERT_TRUE(full.ok());
  const auto b1 = pumploss::piston_pump_balance(p, full.tan_beta, 250e5);
  const auto b0 = pumploss::piston_pump_balance(p, 0.0, 250e5);
  EXPECT_EQ(a.balance_full.slipper_balance, b1.slipper_balance);
  EXPECT_EQ(a.balance_zero.slipper_balance, b0.slipper_balance);
  // a slipper balanced at full stroke sits 1/cos(beta) higher at zero stroke (piston_pump.hpp)
  EXPECT_NEAR(a.balance_zero.slipper_balance / a.balance_full.slipper_balance,
              std::sqrt(1 + full.tan_beta * full.tan_beta), 1e-12);
  ASSERT_TRUE(a.with_uncertainty);
  const auto u = pumploss::piston_pump_budget_uncertainty(p, oil, s.reference, s.u_gap_m);
  ASSERT_TRUE(a.uncertainty.usable());
  EXPECT_EQ(a.uncertainty.u_total_m3_s, u.u_total_m3_s);
  EXPECT_EQ(a.uncertainty.u_share[0], u.u_share[0]);
  EXPECT_GT(a.uncertainty.u_total_m3_s, 0.0);
  // a reference the oil does not reach: the sweep stands, the reference's parts report the error
  s.reference.t_k = -1;
  const auto badref = pumploss::sweep_piston_pump(p, oil, s);
  EXPECT_TRUE(badref.usable());
  EXPECT_TRUE(pumploss::is_error(badref.at_reference.budget.st));
  EXPECT_TRUE(pumploss::is_error(badref.at_reference.flow_loss.st));
  EXPECT_TRUE(std::isnan(badref.at_reference.flow_loss.total_m3_s));
}
