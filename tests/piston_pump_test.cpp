// Tests of piston_pump.hpp: geometry, validation, the leakage budget checked path by path by a
// hand calculation (textbook closed forms evaluated in 50 digits, independent of gap.hpp), the
// pressure and viscosity scaling of each path, and bad descriptions.
#include <gtest/gtest.h>

#include <cmath>
#include <random>
#include <vector>

#include "pumploss/piston_pump.hpp"
#include "test_support.hpp"

using pltest::kInf;
using pltest::kNaN;
using pltest::mp50;
using pumploss::leakage_path;
using pumploss::status;

namespace {
// An invented pump of about 70 cm3/rev, 9 pistons (plausible dimensions, no real product).
pumploss::piston_pump<double> test_pump() {
  pumploss::piston_pump<double> p;
  p.pistons = 9;
  p.piston_diameter_m = 20e-3;
  p.bore_clearance_m = 15e-6;
  p.engaged_length_min_m = 20e-3;
  p.pitch_radius_m = 34e-3;
  p.max_swash_angle_rad = 20.0 * 3.14159265358979323846 / 180.0;
  p.slipper_pocket_radius_m = 9.5e-3;  // balanced: see PistonPumpBalance
  p.slipper_outer_radius_m = 11.5e-3;
  p.slipper_gap_m = 12e-6;
  p.slipper_feed_diameter_m = 0.8e-3;
  p.slipper_feed_length_m = 60e-3;
  p.ball_diameter_m = 14e-3;
  p.ball_clearance_m = 8e-6;
  p.ball_length_m = 4e-3;
  p.valve_inner_land_inner_radius_m = 31e-3;
  p.valve_inner_land_outer_radius_m = 34e-3;
  p.valve_outer_land_inner_radius_m = 44e-3;
  p.valve_outer_land_outer_radius_m = 47e-3;
  p.valve_kidney_arc_rad = 150.0 * 3.14159265358979323846 / 180.0;
  p.valve_gap_m = 10e-6;
  p.controller_flow_m3_s = 0.5e-3 / 60;
  p.bleed_orifice_diameter_m = 0.6e-3;
  p.control_piston_conductance_m3 = 2e-17;
  p.control_pressure_pa = 20e5;
  p.extra_conductance_m3 = 1e-17;
  p.extra_orifice_cda_m2 = 1e-8;
  return p;
}
pumploss::oil<double> test_oil() {
  return pumploss::typical_mineral_oil(pumploss::d341_fit(313.15, 46e-6, 373.15, 6.8e-6).value);
}
const mp50 kPi = boost::math::constants::pi<mp50>();
mp50 annulus_textbook(mp50 dp, mp50 mu, mp50 ro, mp50 ri, mp50 len) {
  // Hagen-Poiseuille annulus: q = pi dp/(8 mu L) [ro^4 - ri^4 - (ro^2 - ri^2)^2 / ln(ro/ri)]
  return kPi * dp / (8 * mu * len) * (pow(ro, 4) - pow(ri, 4) - pow(ro * ro - ri * ri, 2) / log(ro / ri));
}
}  // namespace

TEST(PistonPumpGeometry, DisplacementByHand) {
  // V = z (pi d^2/4) 2 R tan(beta) = 9 * 314.159 mm2 * 2 * 34 mm * tan 20 deg = 69.97 cm3/rev
  const auto p = test_pump();
  const auto v = pumploss::piston_pump_displacement(p);
  ASSERT_EQ(v.st, status::ok);
  const mp50 beta = mp50(20) * kPi / 180;
  const mp50 want = 9 * kPi * mp50("0.02") * mp50("0.02") / 4 * 2 * mp50("0.034") * tan(beta);
  EXPECT_LE(pltest::rel_err(v.value, want), 1e-15);
  EXPECT_NEAR(v.value * 1e6, 69.97, 0.01);
  auto stated = p;
  stated.stated_displacement_m3_rev = 71e-6;  // within 5 %
  EXPECT_EQ(pumploss::validate_piston_pump(stated).st, status::ok);
  EXPECT_NEAR(pumploss::validate_piston_pump(stated).displacement_mismatch, 69.97 / 71 - 1, 2e-4);
  stated.stated_displacement_m3_rev = 90e-6;  // 22 % off: reported, not hidden
  EXPECT_EQ(pumploss::validate_piston_pump(stated).st, status::implausible);
}

TEST(PistonPumpGeometry, BadDescriptions) {
  auto p = test_pump();
  p.pistons = 13;  // 2 R sin(pi/13) = 16.3 mm < 20.03 mm bore: more pistons than fit the pitch circle
  EXPECT_EQ(pumploss::validate_piston_pump(p).st, status::domain);
  p = test_pump();
  p.bore_clearance_m = -1e-6;
  EXPECT_EQ(pumploss::validate_piston_pump(p).st, status::domain);
  p = test_pump();
  p.bore_clearance_m = 0.0;
  EXPECT_EQ(pumploss::validate_piston_pump(p).st, status::domain);
  p = test_pump();
  p.slipper_gap_m = -5e-6;
  EXPECT_EQ(pumploss::validate_piston_pump(p).st, status::domain);
  p = test_pump();
  p.valve_outer_land_inner_radius_m = 33e-3;  // overlaps the inner land
  EXPECT_EQ(pumploss::validate_piston_pump(p).st, status::domain);
  p = test_pump();
  p.piston_eccentricity = 1.5;
  EXPECT_EQ(pumploss::validate_piston_pump(p).st, status::domain);
  p = test_pump();
  p.piston_diameter_m = kNaN;
  EXPECT_EQ(pumploss::validate_piston_pump(p).st, status::nonfinite);
  p = test_pump();
  p.valve_gap_m = kInf;
  EXPECT_EQ(pumploss::validate_piston_pump(p).st, status::nonfinite);
  p = test_pump();
  p.max_swash_angle_rad = 1.0;  // beyond 45 degrees
  EXPECT_EQ(pumploss::validate_piston_pump(p).st, status::domain);
  p = test_pump();
  p.pistons = 2;
  EXPECT_EQ(pumploss::piston_pump_displacement(p).st, status::domain);
}

namespace {
// Density of the typical mineral oil by hand (870 kg/m3 at 15 degC, 6.5e-4 1/K, K = 1.4 GPa).
mp50 rho_hand(mp50 t_k, mp50 p_pa) {
  return 870 * (1 - mp50("0.00065") * (t_k - mp50("288.15"))) / (1 - p_pa / mp50("1.4e9"));
}
}  // namespace

TEST(PistonPumpBudget, PathByPathHandCalculationAtZeroHalfAndFullStroke) {
  const auto p = test_pump();
  const auto o = test_oil();
  for (double x : {0.0, 0.5, 1.0}) {
    pumploss::pump_operating_point<double> op{250e5, 1e5, 25.0, x, 323.15};
    op.mode = x == 0.0 ? pumploss::controller_mode::deadhead : pumploss::controller_mode::compensating;
    const auto b = pumploss::piston_pump_budget(p, o, op);
    ASSERT_EQ(b.st, status::ok) << x;
    // Hand calculation in 50 digits with the textbook forms (the viscosity as the budget's).
    const mp50 dp = mp50(249e5), mu = mp50(b.mu_pa_s);
    const mp50 rho_out = rho_hand(mp50("323.15"), mp50(250e5));
    EXPECT_LE(pltest::rel_err(b.rho_kg_m3, rho_out), 1e-14);
    const mp50 zhp = mp50(9) / 2;
    const mp50 t = mp50(x) * tan(mp50(20) * kPi / 180);
    // pivot on the shaft axis: mid-stroke engagement L_min + R tan(beta_max) fixed,
    // ODC/IDC at -/+ R tan(beta) from it (Manring 2013, piston position, from memory)
    const mp50 l0 = mp50("0.020") + mp50("0.034") * tan(mp50(20) * kPi / 180);
    const mp50 leff = sqrt((l0 - mp50("0.034") * t) * (l0 + mp50("0.034") * t));
    EXPECT_LE(pltest::rel_err(b.engaged_length_m, leff), 1e-14);
    // eccentric annulus: concentric form times (1 + 1.5 eps^2) (narrow gap) - eps = 0 here
    const mp50 q_piston = zhp * annulus_textbook(dp, mu, mp50("0.010015"), mp50("0.010"), leff);
    // slipper: capillary R_c = 128 mu l/(pi d^4) in series with land R_L = 6 mu ln(ro/ri)/(pi h^3)
    const mp50 rc = 128 * mu * mp50("0.060") / (kPi * pow(mp50("0.0008"), 4));
    const mp50 rl = 6 * mu * log(mp50("11.5") / mp50("9.5")) / (kPi * pow(mp50("0.000012"), 3));
    const mp50 q_slipper = zhp * dp / (rc + rl);
    const mp50 q_ball = zhp * annulus_textbook(dp, mu, mp50("0.007008"), mp50("0.007"), mp50("0.004"));
    const mp50 arc = mp50(150) * kPi / 180;
    const mp50 h3 = pow(mp50("0.00001"), 3);
    const mp50 q_vin = arc * h3 * dp / (12 * mu * log(mp50(34) / 31));
    const mp50 q_vout = arc * h3 * dp / (12 * mu * log(mp50(47) / 44));
    const mp50 q_ctrl = mp50("0.0005") / 60;
    // compensating: bleed and control piston at the control pressure (20 bar above the case),
    // the orifice at the control chamber's density
    const mp50 pc = mp50(20e5);
    const mp50 q_bleed =
        mp50("0.611") * kPi * mp50("0.0006") * mp50("0.0006") / 4 * sqrt(2 * pc / rho_hand(mp50("323.15"), mp50(21e5)));
    const mp50 q_cp = mp50("2e-17") * pc / mu;
    const mp50 q_xl = mp50("1e-17") * dp / mu;
    const mp50 q_xo = mp50("1e-8") * sqrt(2 * dp / rho_out);
    const mp50 want[] = {q_piston, q_slipper, q_ball, q_vin, q_vout, q_ctrl, q_bleed, q_xl, q_xo, q_cp};
    mp50 total = 0;
    for (int i = 0; i < pumploss::leakage_path_count; ++i) {
      EXPECT_LE(pltest::rel_err(b.flow_m3_s[i], want[i]), 1e-12)
          << pumploss::leakage_path_name(static_cast<leakage_path>(i)) << " x=" << x;
      total += want[i];
    }
    EXPECT_LE(pltest::rel_err(b.total_m3_s, total), 1e-12);
    EXPECT_LE(pltest::rel_err(b.metering_flow_m3_s, q_bleed + q_cp), 1e-12);
    double share_sum = 0;
    for (double s : b.share) share_sum += s;
    EXPECT_NEAR(share_sum, 1.0, 1e-14);
    EXPECT_NEAR(b.drain_fraction, b.total_m3_s / (pumploss::piston_pump_displacement(p).value * 25.0), 1e-17);
    EXPECT_GT(b.slipper_pocket_pa, 0.0);
    EXPECT_LT(b.slipper_pocket_pa, 249e5);
    EXPECT_LT(b.max_gap_reynolds, 2000.0);
    EXPECT_GT(b.drain_fraction, 0.001);
    EXPECT_LT(b.drain_fraction, 0.15);
  }
  // On stroke the control chamber is vented: neither bleed nor control piston flow.
  const auto on = pumploss::piston_pump_budget(p, o, {250e5, 1e5, 25.0, 1.0, 323.15});
  ASSERT_EQ(on.st, status::ok);
  EXPECT_EQ(on.flow_m3_s[static_cast<int>(leakage_path::bleed)], 0.0);
  EXPECT_EQ(on.flow_m3_s[static_cast<int>(leakage_path::control_piston)], 0.0);
  EXPECT_EQ(on.metering_flow_m3_s, 0.0);
}

TEST(PistonPumpKinematics, PivotOnTheAxisAndOffset) {
  // Against an independent evaluation: the ball centre on the tilted plane z = (R cos(phi) - e) tan(beta)
  // (Manring 2013 / Ivantysyn & Ivantysynova 2001 piston position, from memory), the mean of
  // 1/L over the delivery half-revolution by Simpson's rule (2000 intervals), dead volume by the
  // swept-volume difference at inner dead centre.
  auto p = test_pump();
  p.dead_volume_m3 = 1.5e-6;
  const double tmax = std::tan(20.0 * 3.14159265358979323846 / 180.0);
  for (double e : {0.0, 8e-3, -8e-3}) {
    p.pivot_offset_m = e;
    const double l0 = 20e-3 + (34e-3 + e) * tmax;
    for (double x : {0.0, 0.25, 0.5, 1.0}) {
      const auto k = pumploss::piston_pump_kinematics(p, x);
      ASSERT_EQ(k.st, status::ok);
      const double t = x * tmax;
      auto len = [&](double phi) { return l0 + (34e-3 * std::cos(phi) - e) * t; };
      const int n = 2000;
      double s = 0;
      for (int i = 0; i <= n; ++i) {
        const double w = (i == 0 || i == n) ? 1 : (i % 2 ? 4 : 2);
        s += w / len(3.14159265358979323846 * i / n);
      }
      const double mean_inv = s / (3.0 * n);
      EXPECT_NEAR(k.effective_length_m * mean_inv, 1.0, 1e-12) << e << " " << x;
      EXPECT_NEAR(k.stroke_m, len(0) - len(3.14159265358979323846), 1e-15);
      EXPECT_NEAR(k.engaged_odc_m, len(3.14159265358979323846), 1e-15);
      EXPECT_NEAR(k.engaged_idc_m, len(0), 1e-15);
      const double area = 3.14159265358979323846 * 1e-4;
      const double idc_full = l0 + (34e-3 - e) * tmax;
      EXPECT_NEAR(k.dead_volume_m3, 1.5e-6 + area * (idc_full - len(0)), 1e-18);
    }
  }
  // pivot on the axis: mid-stroke engagement fixed; deeper pistons as the stroke shrinks
  p.pivot_offset_m = 0.0;
  const auto full = pumploss::piston_pump_kinematics(p, 1.0);
  const auto zero = pumploss::piston_pump_kinematics(p, 0.0);
  EXPECT_NEAR(full.engaged_mid_m, zero.engaged_mid_m, 1e-16);
  EXPECT_GT(zero.effective_length_m, full.effective_length_m);
  EXPECT_EQ(zero.stroke_m, 0.0);
  // bad input
  EXPECT_EQ(pumploss::piston_pump_kinematics(p, 1.2).st, status::domain);
  EXPECT_EQ(pumploss::piston_pump_kinematics(p, kNaN).st, status::nonfinite);
  EXPECT_TRUE(std::isnan(pumploss::piston_pump_kinematics(p, -0.1).effective_length_m));
  p.pivot_offset_m = 40e-3;  // beyond the pitch radius
  EXPECT_EQ(pumploss::validate_piston_pump(p).st, status::domain);
  p.pivot_offset_m = 0.0;
  p.dead_volume_m3 = -1e-7;
  EXPECT_EQ(pumploss::validate_piston_pump(p).st, status::domain);
}

TEST(PistonPumpBalance, RatiosByHandAndWarnings) {
  // Slipper: p_r/dp = R_L/(R_L + R_c), A_eff = pi (ro^2 - ri^2)/(2 ln(ro/ri)), balance
  // p_r A_eff cos(beta)/(dp A_K); barrel: phi [(r4^2-r3^2)/(4 ln(r4/r3)) - (r2^2-r1^2)/(4 ln(r2/r1))]
  // over z_hp A_K (slipper and valve-plate balance as Ivantysyn & Ivantysynova 2001, ch. 6, and
  // Manring 2013, from memory; evaluated here self-calculated in 50 digits).
  const auto p = test_pump();
  const mp50 ri("0.0095"), ro("0.0115"), h("0.000012"), dc("0.0008"), lc("0.060");
  const mp50 ak = kPi * mp50("0.02") * mp50("0.02") / 4;
  const mp50 aeff = kPi * (ro * ro - ri * ri) / (2 * log(ro / ri));
  const mp50 rl = 6 * log(ro / ri) / (kPi * h * h * h), rc = 128 * lc / (kPi * pow(dc, 4));
  const mp50 tmax = tan(mp50(20) * kPi / 180);
  const mp50 r1("0.031"), r2("0.034"), r3("0.044"), r4("0.047");
  const mp50 sep = mp50(150) * kPi / 180 * ((r4 * r4 - r3 * r3) / (4 * log(r4 / r3)) - (r2 * r2 - r1 * r1) / (4 * log(r2 / r1)));
  const mp50 barrel = sep / (mp50(9) / 2 * ak);
  for (double x : {0.0, 1.0}) {
    const mp50 cb = 1 / sqrt(1 + pow(mp50(x) * tmax, 2));
    const mp50 slipper = rl / (rl + rc) * aeff * cb / ak;
    const mp50 need = ak / (aeff * cb);
    const mp50 heq = cbrt(6 * log(ro / ri) * (1 - need) * pow(dc, 4) / (128 * lc * need));
    pumploss::pump_operating_point<double> op{250e5, 1e5, 25.0, x, 323.15};
    const auto b = pumploss::piston_pump_budget(p, test_oil(), op);
    EXPECT_LE(pltest::rel_err(b.slipper_balance, slipper), 1e-13) << x;
    EXPECT_LE(pltest::rel_err(b.slipper_film_m, heq), 1e-12) << x;
    EXPECT_LE(pltest::rel_err(b.barrel_balance, barrel), 1e-13);
    EXPECT_EQ(b.warnings, 0u);
    EXPECT_EQ(b.st, status::ok);
  }
  EXPECT_NEAR(static_cast<double>(barrel), 0.939, 0.001);
  // The film at which the slipper balances carries the piston force exactly (gap.hpp's pad model).
  {
    const auto b = pumploss::piston_pump_budget(p, test_oil(), {250e5, 1e5, 25.0, 1.0, 323.15});
    auto q = p;
    q.slipper_gap_m = b.slipper_film_m;
    EXPECT_NEAR(pumploss::piston_pump_budget(q, test_oil(), {250e5, 1e5, 25.0, 1.0, 323.15}).slipper_balance, 1.0, 1e-12);
  }
  // The old, unbalanced geometry: slipper over-clamped, barrel lifting; reported, not hidden.
  auto bad = p;
  bad.slipper_pocket_radius_m = 6e-3;
  bad.slipper_outer_radius_m = 11e-3;
  bad.valve_inner_land_inner_radius_m = 26e-3;
  bad.valve_inner_land_outer_radius_m = 29e-3;
  const auto b = pumploss::piston_pump_budget(bad, test_oil(), {250e5, 1e5, 25.0, 1.0, 323.15});
  EXPECT_EQ(b.st, status::implausible);
  EXPECT_TRUE(b.warnings & pumploss::warn_slipper_overclamped);
  EXPECT_TRUE(b.warnings & pumploss::warn_slipper_no_film);
  EXPECT_EQ(b.slipper_film_m, 0.0);
  EXPECT_TRUE(b.warnings & pumploss::warn_barrel_lifts);
  EXPECT_GT(b.total_m3_s, 0.0);  // the flows stay valid
}

TEST(PistonPumpBudget, FiftyDigitTemplateAgrees) {
  // The same templates in cpp_bin_float_50: kinematics, balance, budget and flow loss.
  auto p = test_pump();
  p.pivot_offset_m = 3e-3;
  p.dead_volume_m3 = 2e-6;
  p.cross_port_conductance_m3 = 3e-17;
  const auto o = test_oil();
  const auto pm = pumploss::piston_pump_cast<mp50>(p);
  const pumploss::oil<mp50> om{{mp50(o.viscosity.a), mp50(o.viscosity.b)}, mp50(o.rho_ref_kg_m3), mp50(o.t_ref_k),
                               mp50(o.alpha_per_k), mp50(o.bulk_modulus_pa), mp50(o.cp_j_kg_k), mp50(o.barus_per_pa)};
  for (double x : {0.0, 0.5, 1.0}) {
    pumploss::pump_operating_point<double> op{250e5, 1e5, 25.0, x, 323.15};
    op.mode = pumploss::controller_mode::compensating;
    op.inlet_pa = 0.5e5;
    op.film_temperature_rise_k = 5.0;
    pumploss::pump_operating_point<mp50> opm{mp50(250e5), mp50(1e5), mp50(25), mp50(x), mp50("323.15")};
    opm.mode = op.mode;
    opm.inlet_pa = mp50(0.5e5);
    opm.film_temperature_rise_k = mp50(5);
    const auto k = pumploss::piston_pump_kinematics(p, x);
    const auto km = pumploss::piston_pump_kinematics(pm, mp50(x));
    EXPECT_LE(pltest::rel_err(k.effective_length_m, km.effective_length_m), 1e-15);
    EXPECT_LE(pltest::rel_err(k.dead_volume_m3, km.dead_volume_m3), 1e-14);
    const auto b = pumploss::piston_pump_budget(p, o, op);
    const auto bm = pumploss::piston_pump_budget(pm, om, opm);
    ASSERT_EQ(b.st, bm.st);
    EXPECT_LE(pltest::rel_err(b.total_m3_s, bm.total_m3_s), 1e-13) << x;
    EXPECT_LE(pltest::rel_err(b.total_film_m3_s, bm.total_film_m3_s), 1e-13) << x;
    EXPECT_LE(pltest::rel_err(b.slipper_balance, bm.slipper_balance), 1e-14) << x;
    EXPECT_LE(pltest::rel_err(b.barrel_balance, bm.barrel_balance), 1e-14) << x;
    EXPECT_LE(pltest::rel_err(b.slipper_film_m, bm.slipper_film_m), 1e-13) << x;
    const auto f = pumploss::piston_pump_flow_loss(p, o, op);
    const auto fm = pumploss::piston_pump_flow_loss(pm, om, opm);
    // 1 - rho_s/rho_h cancels about 2 digits
    EXPECT_LE(pltest::rel_err(f.total_m3_s, fm.total_m3_s), 1e-12) << x;
  }
}

TEST(PistonPumpFilm, ViscosityBandPressureAndHeating) {
  const auto p = test_pump();
  const auto o = test_oil();
  pumploss::pump_operating_point<double> op{251e5, 1e5, 25.0, 1.0, 323.15};
  const auto iso = pumploss::piston_pump_budget(p, o, op);
  ASSERT_EQ(iso.st, status::ok);
  // pressure only: laminar flow ~ integral dp/mu(p) = (1 - exp(-a dp))/(a mu0) under Barus
  const double a = 2e-8, dp = 250e5;
  const double factor = a * dp / -std::expm1(-a * dp);
  EXPECT_NEAR(iso.mu_film_pa_s / (iso.mu_pa_s * factor), 1.0, 1e-14);
  EXPECT_NEAR(factor / std::exp(a * dp / 2), 1.0, 0.011);  // the mean film pressure, within 1.1 %
  EXPECT_LT(iso.total_film_m3_s, iso.total_m3_s);
  // the constant controller flow and the orifice paths are not scaled
  const double ctrl = iso.flow_m3_s[static_cast<int>(leakage_path::controller)] +
                      iso.flow_m3_s[static_cast<int>(leakage_path::extra_orifice)];
  EXPECT_NEAR((iso.total_film_m3_s - ctrl) / (iso.total_m3_s - ctrl), 1.0 / factor, 1e-12);
  // heated film: 7 K warmer outweighs the pressure at 250 bar in a VG 46 oil
  op.film_temperature_rise_k = 7.0;
  const auto hot = pumploss::piston_pump_budget(p, o, op);
  ASSERT_EQ(hot.st, status::ok);
  EXPECT_EQ(hot.total_m3_s, iso.total_m3_s);
  const double mu_hot = pumploss::oil_dynamic_viscosity(o, 330.15, 1e5).value;
  EXPECT_NEAR(hot.mu_film_pa_s / (mu_hot * factor), 1.0, 1e-14);
  EXPECT_GT(hot.total_film_m3_s, iso.total_film_m3_s);
  op.film_temperature_rise_k = -1.0;
  EXPECT_EQ(pumploss::piston_pump_budget(p, o, op).st, status::domain);
}

TEST(PistonPumpFlowLoss, BudgetPlusNonCaseLossesIsTheStandsFlowLoss) {
  auto p = test_pump();
  p.dead_volume_m3 = 2e-6;
  p.cross_port_conductance_m3 = 3e-17;
  const auto o = test_oil();
  pumploss::pump_operating_point<double> op{250e5, 1e5, 25.0, 1.0, 323.15};
  op.inlet_pa = 0.5e5;
  const auto r = pumploss::piston_pump_flow_loss(p, o, op);
  ASSERT_EQ(r.st, status::ok);
  // mass balance of one chamber (self-calculated): loss = (A s + V_dead)(1 - rho_s/rho_h) per piston
  const double rho_s = pumploss::oil_density_at(o, 323.15, 0.5e5).value;
  const double rho_h = pumploss::oil_density_at(o, 323.15, 250e5).value;
  const double v = pumploss::piston_pump_displacement(p).value;
  EXPECT_NEAR(r.compression_m3_s / (v * 25.0 * (1 - rho_s / rho_h)), 1.0, 1e-13);
  EXPECT_NEAR(r.dead_volume_m3_s / (9 * 25.0 * 2e-6 * (1 - rho_s / rho_h)), 1.0, 1e-13);
  EXPECT_NEAR(r.compression_m3_s / (v * 25.0 * 249.5e5 / 1.4e9), 1.0, 0.02);  // ~ dp/K
  const auto b = pumploss::piston_pump_budget(p, o, op);
  EXPECT_NEAR(r.cross_port_m3_s, 3e-17 * 249.5e5 / b.mu_pa_s, 1e-20);
  EXPECT_EQ(r.drain_m3_s, b.total_m3_s);
  EXPECT_NEAR(r.total_m3_s, r.drain_m3_s + r.compression_m3_s + r.dead_volume_m3_s + r.cross_port_m3_s, 1e-18);
  EXPECT_NEAR(r.delivered_m3_s + r.total_m3_s, r.theoretical_m3_s, 1e-18);
  // deadhead: nothing delivered; the dead volume is still cycled between the kidneys
  op.mode = pumploss::controller_mode::deadhead;
  const auto dh = pumploss::piston_pump_flow_loss(p, o, op);
  ASSERT_EQ(dh.st, status::ok);
  EXPECT_EQ(dh.theoretical_m3_s, 0.0);
  EXPECT_EQ(dh.compression_m3_s, 0.0);
  EXPECT_GT(dh.dead_volume_m3_s, r.dead_volume_m3_s);  // larger chamber at zero stroke
  op.inlet_pa = 300e5;
  EXPECT_EQ(pumploss::piston_pump_flow_loss(p, o, op).st, status::domain);
  EXPECT_TRUE(std::isnan(pumploss::piston_pump_flow_loss(p, o, op).total_m3_s));
}

TEST(PistonPumpUncertainty, SharesFromGapTolerancesAgainstMonteCarlo) {
  const auto p = test_pump();
  const auto o = test_oil();
  const pumploss::pump_operating_point<double> op{250e5, 1e5, 25.0, 1.0, 323.15};
  const double u[4] = {1e-6, 0.5e-6, 0.5e-6, 0.8e-6};
  const auto r = pumploss::piston_pump_budget_uncertainty(p, o, op, u);
  ASSERT_EQ(r.st, status::ok);
  // Monte Carlo over normal gaps (fixed seed), 20000 draws: standard deviations of share and total
  std::mt19937_64 rng(15);
  std::normal_distribution<double> n01(0.0, 1.0);
  const int draws = 20000;
  double s1[pumploss::leakage_path_count] = {}, s2[pumploss::leakage_path_count] = {}, t1 = 0, t2 = 0;
  for (int k = 0; k < draws; ++k) {
    auto q = p;
    q.bore_clearance_m += u[0] * n01(rng);
    q.slipper_gap_m += u[1] * n01(rng);
    q.ball_clearance_m += u[2] * n01(rng);
    q.valve_gap_m += u[3] * n01(rng);
    const auto b = pumploss::piston_pump_budget(q, o, op);
    for (int i = 0; i < pumploss::leakage_path_count; ++i) {
      s1[i] += b.share[i];
      s2[i] += b.share[i] * b.share[i];
    }
    t1 += b.total_m3_s;
    t2 += b.total_m3_s * b.total_m3_s;
  }
  auto sd = [&](double a, double b2) { return std::sqrt(b2 / draws - (a / draws) * (a / draws)); };
  EXPECT_NEAR(r.u_total_m3_s / sd(t1, t2), 1.0, 0.05);
  for (int i : {0, 1, 3, 4})
    EXPECT_NEAR(r.u_share[i] / sd(s1[i], s2[i]), 1.0, 0.08) << i;
  double bad[4] = {1e-6, -1e-7, 0, 0};
  EXPECT_EQ(pumploss::piston_pump_budget_uncertainty(p, o, op, bad).st, status::domain);
  bad[1] = kNaN;
  EXPECT_TRUE(std::isnan(pumploss::piston_pump_budget_uncertainty(p, o, op, bad).u_total_m3_s));
}

TEST(PistonPumpBudget, LaminarPathsScaleAsDpOverMuOrificesAsSqrtDp) {
  const auto p = test_pump();
  const auto o = test_oil();
  const auto base = pumploss::piston_pump_budget(p, o, {100e5, 0.0, 25.0, 1.0, 323.15});
  ASSERT_EQ(base.st, status::ok);
  const int laminar[] = {0, 1, 2, 3, 4, 7};
  const int orifice[] = {8};  // the user orifice, at the outlet density
  for (double dp : {25e5, 50e5, 200e5, 350e5}) {
    const auto b = pumploss::piston_pump_budget(p, o, {dp, 0.0, 25.0, 1.0, 323.15});
    for (int i : laminar) EXPECT_NEAR(b.flow_m3_s[i] / base.flow_m3_s[i], dp / 100e5, 1e-12) << i;
    for (int i : orifice)
      EXPECT_NEAR(b.flow_m3_s[i] * std::sqrt(b.rho_kg_m3) / (base.flow_m3_s[i] * std::sqrt(base.rho_kg_m3)),
                  std::sqrt(dp / 100e5), 1e-12)
          << i;
    EXPECT_EQ(b.flow_m3_s[5], base.flow_m3_s[5]);  // constant consumption
  }
  for (double t : {293.15, 313.15, 353.15}) {
    const auto b = pumploss::piston_pump_budget(p, o, {100e5, 0.0, 25.0, 1.0, t});
    // laminar: q * mu constant (mu from the same oil); orifice: q * sqrt(rho) constant
    for (int i : laminar)
      EXPECT_NEAR(b.flow_m3_s[i] * b.mu_pa_s / (base.flow_m3_s[i] * base.mu_pa_s), 1.0, 1e-12) << i;
    for (int i : orifice)
      EXPECT_NEAR(b.flow_m3_s[i] * std::sqrt(b.rho_kg_m3) / (base.flow_m3_s[i] * std::sqrt(base.rho_kg_m3)), 1.0,
                  1e-12);
  }
  // Smaller displacement, pivot on the shaft axis: the pistons sit deeper, less piston leakage
  // (the trend the calibration uses); other paths unchanged.
  const auto half = pumploss::piston_pump_budget(p, o, {100e5, 0.0, 25.0, 0.5, 323.15});
  EXPECT_LT(half.flow_m3_s[0], base.flow_m3_s[0]);
  EXPECT_EQ(half.flow_m3_s[3], base.flow_m3_s[3]);
  // No pressure difference: no leakage at all.
  const auto zero = pumploss::piston_pump_budget(p, o, {1e5, 1e5, 25.0, 1.0, 323.15});
  ASSERT_EQ(zero.st, status::ok);
  EXPECT_EQ(zero.total_m3_s, 0.0);
}

TEST(PistonPumpBudget, BadOperatingPoints) {
  const auto p = test_pump();
  const auto o = test_oil();
  EXPECT_EQ(pumploss::piston_pump_budget(p, o, {1e5, 2e5, 25.0, 1.0, 323.15}).st, status::domain);
  EXPECT_EQ(pumploss::piston_pump_budget(p, o, {250e5, 0.0, 25.0, 1.5, 323.15}).st, status::domain);
  EXPECT_EQ(pumploss::piston_pump_budget(p, o, {250e5, 0.0, 25.0, -0.1, 323.15}).st, status::domain);
  EXPECT_EQ(pumploss::piston_pump_budget(p, o, {250e5, 0.0, 0.0, 1.0, 323.15}).st, status::domain);
  const auto b = pumploss::piston_pump_budget(p, o, {kNaN, 0.0, 25.0, 1.0, 323.15});
  EXPECT_EQ(b.st, status::nonfinite);
  EXPECT_TRUE(std::isnan(b.total_m3_s) && std::isnan(b.flow_m3_s[0]));
  auto bad = p;
  bad.pistons = 15;
  EXPECT_EQ(pumploss::piston_pump_budget(bad, o, {250e5, 0.0, 25.0, 1.0, 323.15}).st, status::domain);
}

TEST(PistonPumpSensitivity, DualNumbersMatchTheLaminarPowerLaw) {
  // A pump of pure laminar paths (no controller, no orifices). The valve lands are exactly cubic
  // in h; the annuli nearly so; the slipper's capillary in series damps its power of h.
  auto p = test_pump();
  p.controller_flow_m3_s = 0.0;
  p.bleed_orifice_diameter_m = 0.0;
  p.extra_conductance_m3 = 0.0;
  p.extra_orifice_cda_m2 = 0.0;
  const auto o = test_oil();
  const pumploss::pump_operating_point<double> op{250e5, 0.0, 25.0, 1.0, 323.15};
  const auto b = pumploss::piston_pump_budget(p, o, op);
  const auto s = pumploss::piston_pump_sensitivity(p, o, op);
  ASSERT_EQ(s.st, status::ok);
  // Annuli: q ~ h^3 (D + h) for a bore of D + 2h, so d ln q / d ln h = 3 + h / (D + h) (narrow gap).
  EXPECT_NEAR(s.d_total_d_gap[0] / (b.flow_m3_s[0] / p.bore_clearance_m * (3 + 15e-6 / 20.015e-3)), 1.0, 1e-6);
  EXPECT_NEAR(s.d_total_d_gap[2] / (b.flow_m3_s[2] / p.ball_clearance_m * (3 + 8e-6 / 14.008e-3)), 1.0, 1e-6);
  EXPECT_NEAR(s.d_total_d_gap[3] / (3 * (b.flow_m3_s[3] + b.flow_m3_s[4]) / p.valve_gap_m), 1.0, 1e-12);
  // slipper: q = dp / (R_c + R_L), R_L ~ h^-3: dq/dh = 3 q R_L / (h (R_c + R_L)) < 3 q / h
  EXPECT_GT(s.d_total_d_gap[1], 0.0);
  EXPECT_LT(s.d_total_d_gap[1], 3 * b.flow_m3_s[1] / p.slipper_gap_m);
  // central differences agree with the dual numbers for every gap
  for (unsigned g = 0; g < 4; ++g) {
    const double gaps[] = {p.bore_clearance_m, p.slipper_gap_m, p.ball_clearance_m, p.valve_gap_m};
    const double rel = 1e-5;
    const double fd = (pumploss::piston_pump_budget(pumploss::scale_gaps(p, 1u << g, 1 + rel), o, op).total_m3_s -
                       pumploss::piston_pump_budget(pumploss::scale_gaps(p, 1u << g, 1 - rel), o, op).total_m3_s) /
                      (2 * rel * gaps[g]);
    EXPECT_NEAR(s.d_total_d_gap[g] / fd, 1.0, 1e-7) << g;
  }
  double elasticity_sum = 0;
  for (double e : s.elasticity) elasticity_sum += e;
  EXPECT_LE(elasticity_sum, 3.0 + 1e-12);  // a laminar budget is at most cubic in a common gap scale
}

namespace {
std::vector<pumploss::drain_measurement> synthetic_measurements(const pumploss::piston_pump<double>& truth,
                                                               const pumploss::oil<double>& o) {
  std::vector<pumploss::drain_measurement> m;
  for (double dp : {80e5, 160e5, 250e5, 320e5})
    for (double t : {308.15, 328.15, 348.15})
      for (double x : {0.3, 0.65, 1.0}) {
        const auto b = pumploss::piston_pump_budget(truth, o, {dp + 1e5, 1e5, 25.0, x, t});
        m.push_back({b.total_m3_s, dp + 1e5, 1e5, 25.0, x, t});
      }
  return m;
}
}  // namespace

TEST(PistonPumpCalibration, IdentifiesTheWornPistonBores) {
  const auto p = test_pump();
  const auto o = test_oil();
  auto worn = p;
  worn.bore_clearance_m *= 1.3;  // invented wear: bores 30 % larger clearance
  const auto m = synthetic_measurements(worn, o);
  const auto c = pumploss::calibrate_piston_pump(p, o, m.data(), m.size());
  ASSERT_TRUE(c.st == status::ok || c.st == status::ill_conditioned) << static_cast<int>(c.st);
  const int piston = static_cast<int>(pumploss::path_group::piston);
  // expected factor: the worn bore path over the nominal one (the same at every point)
  const pumploss::pump_operating_point<double> op{250e5, 0.0, 25.0, 1.0, 323.15};
  const double ratio = pumploss::piston_pump_budget(worn, o, op).flow_m3_s[0] / pumploss::piston_pump_budget(p, o, op).flow_m3_s[0];
  EXPECT_NEAR(ratio, 1.3 * 1.3 * 1.3, 0.002);  // nearly cubic
  EXPECT_NEAR(c.scale[piston] / ratio, 1.0, 1e-9);
  EXPECT_NEAR(c.gap_growth[piston], 0.3, 1e-9);
  for (int g = 1; g < pumploss::path_group_count; ++g) EXPECT_NEAR(c.scale[g], 1.0, 1e-6) << g;
  EXPECT_LT(c.rms_residual_m3_s, 1e-12);
  // Slipper and valve plate are both laminar dp/mu paths: no drain data can tell them apart.
  const int slipper = static_cast<int>(pumploss::path_group::slipper);
  const int valve = static_cast<int>(pumploss::path_group::valve_plate);
  EXPECT_TRUE(c.confused_with[slipper] & (1u << valve));
  EXPECT_TRUE(c.confused_with[valve] & (1u << slipper));
  EXPECT_EQ(c.confused_with[piston], 0u);  // separated by the displacement settings
  EXPECT_EQ(c.scale[slipper], c.scale[valve]);
}

TEST(PistonPumpCalibration, WithoutDisplacementChangesThePistonsMergeWithTheOtherLaminarPaths) {
  const auto p = test_pump();
  const auto o = test_oil();
  std::vector<pumploss::drain_measurement> m;
  for (const auto& x : synthetic_measurements(p, o))
    if (x.displacement_fraction == 1.0) m.push_back(x);
  const auto c = pumploss::calibrate_piston_pump(p, o, m.data(), m.size());
  ASSERT_TRUE(pumploss::is_usable(c.st));
  const int piston = static_cast<int>(pumploss::path_group::piston);
  EXPECT_TRUE(c.confused_with[piston] & (1u << static_cast<int>(pumploss::path_group::slipper)));
  for (int g = 0; g < pumploss::path_group_count; ++g) EXPECT_NEAR(c.scale[g], 1.0, 1e-6) << g;
}

TEST(PistonPumpCalibration, TwoTemperaturesThreePressuresOnStrokeAndDeadhead) {
  // The readings a test stand can take of a compensated pump: 2 temperatures x 3 pressures, on
  // stroke and at deadhead (scenario from a known truth: bores worn 25 %), exact and with 1 % noise.
  const auto p = test_pump();
  const auto o = test_oil();
  auto worn = p;
  worn.bore_clearance_m *= 1.25;
  std::mt19937_64 rng(7);
  std::normal_distribution<double> noise(0.0, 0.01);
  std::vector<pumploss::drain_measurement> m, noisy;
  for (double t : {313.15, 333.15})
    for (double dp : {100e5, 180e5, 250e5})
      for (auto mode : {pumploss::controller_mode::on_stroke, pumploss::controller_mode::deadhead}) {
        pumploss::pump_operating_point<double> op{dp + 1e5, 1e5, 25.0, 1.0, t};
        op.mode = mode;
        const auto b = pumploss::piston_pump_budget(worn, o, op);
        ASSERT_EQ(b.st, status::ok);
        m.push_back({b.total_m3_s, dp + 1e5, 1e5, 25.0, 1.0, t, mode});
        noisy.push_back({b.total_m3_s * (1 + noise(rng)), dp + 1e5, 1e5, 25.0, 1.0, t, mode});
      }
  const int piston = static_cast<int>(pumploss::path_group::piston);
  const int slipper = static_cast<int>(pumploss::path_group::slipper);
  const int valve = static_cast<int>(pumploss::path_group::valve_plate);
  const int ctrl = static_cast<int>(pumploss::path_group::controller);
  const pumploss::pump_operating_point<double> ref{251e5, 1e5, 25.0, 1.0, 323.15};
  const double ratio =
      pumploss::piston_pump_budget(worn, o, ref).flow_m3_s[0] / pumploss::piston_pump_budget(p, o, ref).flow_m3_s[0];
  const auto c = pumploss::calibrate_piston_pump(p, o, m.data(), m.size());
  ASSERT_TRUE(pumploss::is_usable(c.st)) << static_cast<int>(c.st);
  // what the data separate: pistons (deeper at deadhead) and the controller (its mode-dependent constant)
  EXPECT_EQ(c.confused_with[piston], 0u);
  EXPECT_EQ(c.confused_with[ctrl], 0u);
  EXPECT_NEAR(c.scale[piston] / ratio, 1.0, 1e-8);
  EXPECT_NEAR(c.gap_growth[piston], 0.25, 1e-6);
  EXPECT_NEAR(c.scale[slipper], 1.0, 1e-8);
  EXPECT_NEAR(c.scale[ctrl], 1.0, 1e-8);
  // what they cannot: slippers and valve plate (both dp/mu at every reading)
  EXPECT_TRUE(c.confused_with[slipper] & (1u << valve));
  // and how well: the stroke moves the piston engagement by only 8 % here, so 1 % noise leaves the
  // piston factor uncertain by tens of per cent; the truth stays within 4 reported standard errors
  const auto cn = pumploss::calibrate_piston_pump(p, o, noisy.data(), noisy.size());
  ASSERT_TRUE(pumploss::is_usable(cn.st));
  EXPECT_LT(std::fabs(cn.scale[piston] - ratio), 4 * cn.std_error[piston]);
  EXPECT_LT(std::fabs(cn.scale[slipper] - 1.0), 4 * cn.std_error[slipper]);
  EXPECT_GT(cn.std_error[piston], 0.05);
  RecordProperty("piston_factor_se_1pct_noise", std::to_string(cn.std_error[piston]));
  // on stroke alone the pistons merge with the other laminar paths
  std::vector<pumploss::drain_measurement> on;
  for (const auto& x : m)
    if (x.mode == pumploss::controller_mode::on_stroke) on.push_back(x);
  const auto c2 = pumploss::calibrate_piston_pump(p, o, on.data(), on.size());
  ASSERT_TRUE(pumploss::is_usable(c2.st));
  EXPECT_TRUE(c2.confused_with[piston] & (1u << slipper));
}

TEST(PistonPumpCalibration, BadInput) {
  const auto p = test_pump();
  const auto o = test_oil();
  EXPECT_EQ(pumploss::calibrate_piston_pump(p, o, nullptr, 3).st, status::misuse);
  const pumploss::drain_measurement one{1e-5, 250e5, 0.0, 25.0, 1.0, 323.15};
  EXPECT_EQ(pumploss::calibrate_piston_pump(p, o, &one, 1).st, status::insufficient_data);
  EXPECT_EQ(pumploss::calibrate_piston_pump(p, o, &one, 0).st, status::insufficient_data);  // empty set
  auto m = synthetic_measurements(p, o);
  m[3].drain_m3_s = kNaN;
  const auto c = pumploss::calibrate_piston_pump(p, o, m.data(), m.size());
  EXPECT_EQ(c.st, status::nonfinite);
  EXPECT_TRUE(std::isnan(c.scale[0]));
  m = synthetic_measurements(p, o);
  m[2].displacement_fraction = 1.2;
  EXPECT_EQ(pumploss::calibrate_piston_pump(p, o, m.data(), m.size()).st, status::domain);
}

TEST(PistonPumpDiagnosis, ExcessDrainAsGapGrowthPerPath) {
  const auto p = test_pump();
  const auto o = test_oil();
  const pumploss::pump_operating_point<double> op{250e5, 1e5, 25.0, 1.0, 323.15};
  auto worn = p;
  worn.valve_gap_m *= 1.25;
  const double measured = pumploss::piston_pump_budget(worn, o, op).total_m3_s;
  const auto g = pumploss::gap_growth_for_drain(p, o, op, pumploss::pump_gap::valve, measured);
  ASSERT_EQ(g.st, status::ok);
  EXPECT_NEAR(g.value, 0.25, 1e-9);
  // The same excess explained by the bores alone needs a larger relative change there.
  const auto gb = pumploss::gap_growth_for_drain(p, o, op, pumploss::pump_gap::bore, measured);
  ASSERT_EQ(gb.st, status::ok);
  EXPECT_GT(gb.value, 0.0);
  const auto back = pumploss::piston_pump_budget(pumploss::scale_gaps(p, 1u, 1.0 + gb.value), o, op);
  EXPECT_NEAR(back.total_m3_s / measured, 1.0, 1e-9);
  // A drain far above what one gap can explain, or below what the other paths already leak.
  EXPECT_EQ(pumploss::gap_growth_for_drain(p, o, op, pumploss::pump_gap::slipper, measured * 1e4).st,
            status::out_of_validity);
  EXPECT_EQ(pumploss::gap_growth_for_drain(p, o, op, pumploss::pump_gap::valve, measured * 1e-6).st,
            status::out_of_validity);
  EXPECT_EQ(pumploss::gap_growth_for_drain(p, o, op, pumploss::pump_gap::valve, -1.0).st, status::domain);
  auto no_ball = p;
  no_ball.ball_clearance_m = 0.0;
  EXPECT_EQ(pumploss::gap_growth_for_drain(no_ball, o, op, pumploss::pump_gap::ball, measured).st, status::domain);
}
