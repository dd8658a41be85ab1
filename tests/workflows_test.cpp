// The report workflows (workflows.hpp): the oil table over temperature with the maker's limits,
// the piston-pump pressure sweep and the case drain line check, checked row by row against the functions they run and
// against their refusals.
#include <gtest/gtest.h>

#include <algorithm>
#include <cmath>
#include <cstdio>
#include <limits>
#include <random>
#include <vector>

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

// ---- the case drain line check in one call (check_drain_line) ----

namespace {

/// The demo's drain line (examples/demo/drain_line.toml, invented): hose, steel tube with three
/// r/D = 2 bends, a constant-K bulkhead, the laminar exit and a diffuser curve.
pumploss::drain_line_case demo_drain_case() {
  pumploss::drain_line_case c;
  auto& l = c.drain_line;
  l.height_m = 0.6;
  l.elements.push_back(pumploss::line_pipe(0.0127, 1.8, 5e-6));
  l.elements.push_back(pumploss::line_pipe(0.013, 4.5, 1.5e-6));
  for (int k = 0; k < 3; ++k)
    l.elements.push_back(pumploss::line_fitting_named(0.0, pumploss::fitting_type::bend_90_r2).value);
  l.elements.push_back(pumploss::line_fitting_k(0.0, 0.5));
  l.elements.push_back(pumploss::line_exit(0.0));
  const double qc[2] = {10.0 / 60000, 20.0 / 60000}, pc[2] = {0.05e5, 0.12e5};
  l.elements.push_back(pumploss::line_component_points(2, qc, pc, 32e-6, 1.0).value);
  c.fluid = vg46();
  c.flow = pumploss::with_destroke_peak(pumploss::drain_flow_parts(0.5 / 60000, 7.5 / 60000, 323.15), 25e-6, 0.25);
  c.limits = {0.0, 1e5, 2e5};
  c.t_cold_k = 273.15;
  c.t_max_k = 343.15;
  c.n_temps = 8;
  c.max_start_viscosity_m2_s = 1000e-6;
  c.size = true;
  return c;
}

}  // namespace

TEST(DrainLineWorkflow, SameNumbersAsTheSeparateCalls) {
  const auto c = demo_drain_case();
  const auto w = pumploss::check_drain_line(c);
  ASSERT_TRUE(w.usable()) << pumploss::status_message(w.st);
  const auto& l = c.drain_line;
  // the calls the program made one by one before (bit for bit: the same functions, the same order)
  std::vector<pumploss::drain_point<double>> pts(8);
  const auto s = pumploss::drain_check(l, c.fluid, c.flow, c.limits, 273.15, 343.15, 8, pts.data());
  EXPECT_EQ(w.st, s.st);
  EXPECT_EQ(w.summary.worst_margin_pa, s.worst_margin_pa);
  EXPECT_EQ(w.summary.n_fail_any, s.n_fail_any);
  ASSERT_EQ(w.points.size(), 8u);
  for (std::size_t i = 0; i < 8; ++i) {
    EXPECT_EQ(w.points[i].case_pressure_pa, pts[i].case_pressure_pa) << i;
    EXPECT_EQ(w.points[i].case_pressure_peak_pa, pts[i].case_pressure_peak_pa) << i;
    EXPECT_EQ(w.points[i].st, pts[i].st) << i;
  }
  const auto st = pumploss::drain_start_temperature(l, c.fluid, c.flow, c.limits, 273.15, 343.15, 8, 1000e-6);
  EXPECT_EQ(w.start.t_start_k, st.t_start_k);
  EXPECT_EQ(w.start.st, st.st);
  // the element table at 0 degC and continuous + peak flow
  const double q0 = pts[0].q_m3_s + pts[0].q_peak_m3_s;
  EXPECT_EQ(w.element_q_m3_s, q0);
  std::vector<double> parts(l.elements.size());
  const auto drop = pumploss::line_pressure_drop_at(l, q0, c.fluid, 273.15, parts.data());
  EXPECT_NEAR(w.dp_total_pa, drop.dp_pa, 1e-9 * drop.dp_pa);
  double sum_parts = w.dp_static_pa, sum_share = w.dp_static_pa / w.dp_total_pa;
  for (std::size_t k = 0; k < parts.size(); ++k) {
    EXPECT_NEAR(w.elements[k].dp_pa, parts[k], 1e-9 * drop.dp_pa) << k;
    sum_parts += w.elements[k].dp_pa;
    sum_share += w.elements[k].share;
  }
  EXPECT_NEAR(sum_parts, w.dp_total_pa, 1e-9 * w.dp_total_pa);
  EXPECT_NEAR(sum_share, 1.0, 1e-12);
  EXPECT_TRUE(w.elements[5].constant_k_laminar);  // the bulkhead's constant K in laminar oil
  EXPECT_EQ(w.elements[5].st, status::regime);
  // velocities: q = v pi d^2 / 4 at the largest continuous flow
  ASSERT_EQ(w.pipe_velocity_m_s.size(), 2u);
  double q_max = 0;
  for (const auto& p : pts) q_max = std::max(q_max, p.q_m3_s);
  EXPECT_EQ(w.q_max_m3_s, q_max);
  EXPECT_NEAR(w.pipe_velocity_m_s[1] * 3.14159265358979323846 * 0.013 * 0.013 / 4, q_max, 1e-12 * q_max);
  // the sizing and the check with the chosen bore
  const auto z = pumploss::size_drain_line(l, c.fluid, c.flow, c.limits, 273.15, 343.15, 8, 1.5, 3);
  ASSERT_TRUE(w.sized);
  EXPECT_EQ(w.sizing.bore_index, z.bore_index);
  EXPECT_EQ(w.sizing.worst_margin_pa, z.worst_margin_pa);
  EXPECT_TRUE(w.fixed_alone.empty());
  ASSERT_EQ(w.sized_points.size(), 8u);
  auto l2 = l;
  for (auto& e : l2.elements)
    if (pumploss::detail::has_bore(e)) e.diameter_m = z.diameter_m;
  static_cast<void>(pumploss::drain_check(l2, c.fluid, c.flow, c.limits, 273.15, 343.15, 8, pts.data()));
  for (std::size_t i = 0; i < 8; ++i) EXPECT_EQ(w.sized_points[i].case_pressure_pa, pts[i].case_pressure_pa) << i;
}

TEST(DrainLineWorkflow, RecoversTheCrossingOfAGeneratedLine) {
  // Truth: one smooth 8 mm tube, 4 m, laminar at every temperature (Hagen-Poiseuille,
  // dp = 128 mu L q / (pi d^4); F. M. White, Fluid Mechanics, 7th ed., 2011, Sec. 6.4), no
  // height, vented tank; drain flow q = qc + ql mu_ref/mu. Then
  // p(T) = K (qc mu(T) + ql mu_ref) with K = 128 L / (pi d^4), and the line fails below the T*
  // where mu(T*) = (p_allowed / K - ql mu_ref) / qc (self-calculated).
  const double d = 0.008, len = 4.0, qc = 1.0 / 60000, ql = 2.0 / 60000, t_ref = 323.15, p_allowed = 1e5;
  const auto o = vg46();
  pumploss::drain_line_case c;
  c.drain_line.elements.push_back(pumploss::line_pipe(d, len, 0.0));
  c.fluid = o;
  c.flow = pumploss::drain_flow_parts(qc, ql, t_ref);
  c.limits = {0.0, p_allowed, p_allowed};
  c.t_cold_k = 263.15;
  c.t_max_k = 353.15;
  c.n_temps = 10;
  const double kk = 128 * len / (3.14159265358979323846 * d * d * d * d);
  const double mu_ref = pumploss::oil_dynamic_viscosity(o, t_ref, 0.0).value;
  const double mu_star = (p_allowed / kk - ql * mu_ref) / qc;
  double lo = 263.15, hi = 353.15;  // mu falls with T: bisection on the truth
  for (int i = 0; i < 200; ++i) {
    const double mid = (lo + hi) / 2;
    (pumploss::oil_dynamic_viscosity(o, mid, 0.0).value > mu_star ? lo : hi) = mid;
  }
  const double t_star = (lo + hi) / 2;
  ASSERT_GT(t_star, 270.0);
  ASSERT_LT(t_star, 340.0);
  const auto w = pumploss::check_drain_line(c);
  ASSERT_TRUE(w.usable()) << pumploss::status_message(w.st);
  ASSERT_EQ(w.summary.n_fail, 1);
  EXPECT_EQ(w.summary.fail[0].from_k, 263.15);
  EXPECT_NEAR(w.summary.fail[0].to_k, t_star, 1e-6);
  EXPECT_NEAR(w.start.t_line_k, t_star, 1e-6);
  for (const auto& p : w.points) {
    const double mu = pumploss::oil_dynamic_viscosity(o, p.t_k, 0.0).value;
    EXPECT_NEAR(p.case_pressure_pa, kk * (qc * mu + ql * mu_ref), 1e-9 * p.case_pressure_pa) << p.t_k;
  }
  // measured drain flows with 1 % noise and a missing reading, as a table: the crossing within
  // what 1 % of flow and linear interpolation move it (about 0.2 K per %, here under 1 K)
  std::mt19937 rng(20261203);
  std::normal_distribution<double> noise(0.0, 0.01);
  std::vector<double> tt, qq;
  for (int i = 0; i < 10; ++i) {
    if (i == 4) continue;  // a gap: that reading was lost
    const double t = 263.15 + 10.0 * i;
    tt.push_back(t);
    qq.push_back((qc + ql * mu_ref / pumploss::oil_dynamic_viscosity(o, t, 0.0).value) * (1 + noise(rng)));
  }
  const auto tab = pumploss::drain_flow_table(tt.size(), tt.data(), qq.data());
  ASSERT_TRUE(tab.ok());
  c.flow = tab.value;
  c.n_temps = 91;
  const auto wn = pumploss::check_drain_line(c);
  ASSERT_TRUE(wn.usable());
  ASSERT_EQ(wn.summary.n_fail, 1);
  EXPECT_NEAR(wn.summary.fail[0].to_k, t_star, 1.0);
  std::printf("[drain-line] truth crossing %.3f degC; from the parts %.3f degC; from noisy table %.3f degC\n",
              t_star - 273.15, w.summary.fail[0].to_k - 273.15, wn.summary.fail[0].to_k - 273.15);
}

TEST(DrainLineWorkflow, NamesEachFixedElementWhenNoBoreCanPass) {
  auto c = demo_drain_case();
  // a filter and a cooler, laminar media, each alone above 1 bar cold (invented data)
  const double q1[1] = {10.0 / 60000}, filter[1] = {0.8e5}, cooler[1] = {0.7e5};
  c.drain_line.elements.push_back(pumploss::line_component_points(1, q1, filter, 46e-6, 1.0).value);
  c.drain_line.elements.push_back(pumploss::line_component_points(1, q1, cooler, 46e-6, 1.0).value);
  const auto w = pumploss::check_drain_line(c);
  ASSERT_TRUE(w.usable());
  EXPECT_EQ(w.sizing.st, status::out_of_validity);
  ASSERT_TRUE(w.sizing.fixed_exceeds);
  EXPECT_TRUE(w.sized_points.empty());
  // the static height and the three components, each alone; the filter and the cooler exceed
  ASSERT_EQ(w.fixed_alone.size(), 4u);
  EXPECT_EQ(w.fixed_alone[0].element, -1);
  std::vector<int> culprits;
  for (const auto& a : w.fixed_alone)
    if (a.exceeds) culprits.push_back(a.element);
  EXPECT_EQ(culprits, (std::vector<int>{8, 9}));
  EXPECT_EQ(w.sizing.n_fixed_alone, 2);
  EXPECT_EQ(w.sizing.fixed_dominant_element, 8);
}

TEST(DrainLineWorkflow, MessyInputsGiveAStatusNeverACrash) {
  const auto good = demo_drain_case();
  auto c = good;
  c.n_temps = 0;  // no temperatures
  auto w = pumploss::check_drain_line(c);
  EXPECT_EQ(w.st, status::domain);
  EXPECT_TRUE(w.points.empty());
  c = good;
  c.n_temps = 1001;
  EXPECT_EQ(pumploss::check_drain_line(c).st, status::domain);
  c = good;
  c.drain_line.elements.clear();  // nothing described
  EXPECT_EQ(pumploss::check_drain_line(c).st, status::domain);
  c = good;
  c.t_cold_k = std::numeric_limits<double>::quiet_NaN();  // a temperature that did not parse
  w = pumploss::check_drain_line(c);
  EXPECT_EQ(w.st, status::nonfinite);
  EXPECT_TRUE(w.points.empty());
  c = good;
  c.t_max_k = 250.0;  // the range upside down
  EXPECT_EQ(pumploss::check_drain_line(c).st, status::domain);
  c = good;
  c.drain_line.elements[1].length_m = -4.5;  // a negative length
  EXPECT_TRUE(pumploss::is_error(pumploss::check_drain_line(c).st));
  c = good;
  c.drain_line.elements[1].length_m = 0.0;  // a zero length
  w = pumploss::check_drain_line(c);
  ASSERT_TRUE(w.usable());  // allowed (a fitting straight on the port): the tube adds nothing
  EXPECT_EQ(w.elements[1].dp_pa, 0.0);
  EXPECT_LT(w.points[0].case_pressure_pa, pumploss::check_drain_line(good).points[0].case_pressure_pa);
  c = good;
  c.limits.p_allowed_peak_pa = std::numeric_limits<double>::quiet_NaN();  // a peak without its limit
  EXPECT_EQ(pumploss::check_drain_line(c).st, status::nonfinite);
  c = good;
  c.flow = pumploss::drain_flow_parts(-1e-5, 0.0, 0.0);  // a negative drain flow
  EXPECT_EQ(pumploss::check_drain_line(c).st, status::domain);
  c = good;
  c.sizing_kinds = 0;  // no bore kind to try: the sizing says so, the check stands
  w = pumploss::check_drain_line(c);
  EXPECT_TRUE(w.usable());
  EXPECT_EQ(w.sizing.st, status::domain);
  c = good;
  c.max_start_viscosity_m2_s = -1;  // the start carries its own status
  w = pumploss::check_drain_line(c);
  EXPECT_TRUE(w.usable());
  EXPECT_EQ(w.start.st, status::domain);
}
