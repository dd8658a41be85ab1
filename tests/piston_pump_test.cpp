// Tests of piston_pump.hpp: geometry, validation, the leakage budget checked path by path by a
// hand calculation (textbook closed forms evaluated in 50 digits, independent of gap.hpp), the
// pressure and viscosity scaling of each path, and bad descriptions.
#include <gtest/gtest.h>

#include <cmath>
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
  p.slipper_pocket_radius_m = 6e-3;
  p.slipper_outer_radius_m = 11e-3;
  p.slipper_gap_m = 12e-6;
  p.slipper_feed_diameter_m = 0.8e-3;
  p.slipper_feed_length_m = 60e-3;
  p.ball_diameter_m = 14e-3;
  p.ball_clearance_m = 8e-6;
  p.ball_length_m = 4e-3;
  p.valve_inner_land_inner_radius_m = 36e-3;
  p.valve_inner_land_outer_radius_m = 39e-3;
  p.valve_outer_land_inner_radius_m = 45e-3;
  p.valve_outer_land_outer_radius_m = 48e-3;
  p.valve_kidney_arc_rad = 150.0 * 3.14159265358979323846 / 180.0;
  p.valve_gap_m = 10e-6;
  p.controller_flow_m3_s = 0.5e-3 / 60;
  p.bleed_orifice_diameter_m = 0.6e-3;
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
  p.valve_outer_land_inner_radius_m = 38e-3;  // overlaps the inner land
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

TEST(PistonPumpBudget, PathByPathHandCalculation) {
  const auto p = test_pump();
  const auto o = test_oil();
  const pumploss::pump_operating_point<double> op{250e5, 1e5, 25.0, 1.0, 323.15};
  const auto b = pumploss::piston_pump_budget(p, o, op);
  ASSERT_EQ(b.st, status::ok);
  // Hand calculation in 50 digits with the textbook forms (the same mu and rho as the budget).
  const mp50 dp = mp50(249e5), mu = mp50(b.mu_pa_s), rho = mp50(b.rho_kg_m3);
  const mp50 zhp = mp50(9) / 2;
  const mp50 beta = mp50(20) * kPi / 180;
  const mp50 stroke = 2 * mp50("0.034") * tan(beta);
  const mp50 leff = sqrt(mp50("0.020") * (mp50("0.020") + stroke));  // geometric mean of L_min, L_max
  const mp50 q_piston = zhp * annulus_textbook(dp, mu, mp50("0.010015"), mp50("0.010"), leff);
  // slipper: capillary R_c = 128 mu l/(pi d^4) in series with land R_L = 6 mu ln(ro/ri)/(pi h^3)
  const mp50 rc = 128 * mu * mp50("0.060") / (kPi * pow(mp50("0.0008"), 4));
  const mp50 rl = 6 * mu * log(mp50(11) / 6) / (kPi * pow(mp50("0.000012"), 3));
  const mp50 q_slipper = zhp * dp / (rc + rl);
  const mp50 q_ball = zhp * annulus_textbook(dp, mu, mp50("0.007008"), mp50("0.007"), mp50("0.004"));
  const mp50 arc = mp50(150) * kPi / 180;
  const mp50 h3 = pow(mp50("0.00001"), 3);
  const mp50 q_vin = arc * h3 * dp / (12 * mu * log(mp50(39) / 36));
  const mp50 q_vout = arc * h3 * dp / (12 * mu * log(mp50(48) / 45));
  const mp50 q_ctrl = mp50("0.0005") / 60;
  const mp50 q_bleed = mp50("0.611") * kPi * mp50("0.0006") * mp50("0.0006") / 4 * sqrt(2 * dp / rho);
  const mp50 q_xl = mp50("1e-17") * dp / mu;
  const mp50 q_xo = mp50("1e-8") * sqrt(2 * dp / rho);
  const mp50 want[] = {q_piston, q_slipper, q_ball, q_vin, q_vout, q_ctrl, q_bleed, q_xl, q_xo};
  mp50 total = 0;
  for (int i = 0; i < pumploss::leakage_path_count; ++i) {
    // (the textbook annulus form cancels, but 50 digits leave far more than enough)
    EXPECT_LE(pltest::rel_err(b.flow_m3_s[i], want[i]), 1e-12)
        << pumploss::leakage_path_name(static_cast<leakage_path>(i));
    total += want[i];
  }
  EXPECT_LE(pltest::rel_err(b.total_m3_s, total), 1e-12);
  double share_sum = 0;
  for (double s : b.share) share_sum += s;
  EXPECT_NEAR(share_sum, 1.0, 1e-14);
  EXPECT_NEAR(b.drain_fraction, b.total_m3_s / (pumploss::piston_pump_displacement(p).value * 25.0), 1e-17);
  EXPECT_GT(b.slipper_pocket_pa, 0.0);
  EXPECT_LT(b.slipper_pocket_pa, 249e5);
  EXPECT_LT(b.max_gap_reynolds, 2000.0);
  // A plausible pump: the total is a few per cent of the displacement flow at 250 bar.
  EXPECT_GT(b.drain_fraction, 0.001);
  EXPECT_LT(b.drain_fraction, 0.15);
}

TEST(PistonPumpBudget, LaminarPathsScaleAsDpOverMuOrificesAsSqrtDp) {
  const auto p = test_pump();
  const auto o = test_oil();
  const auto base = pumploss::piston_pump_budget(p, o, {100e5, 0.0, 25.0, 1.0, 323.15});
  ASSERT_EQ(base.st, status::ok);
  const int laminar[] = {0, 1, 2, 3, 4, 7};
  const int orifice[] = {6, 8};
  for (double dp : {25e5, 50e5, 200e5, 350e5}) {
    const auto b = pumploss::piston_pump_budget(p, o, {dp, 0.0, 25.0, 1.0, 323.15});
    for (int i : laminar) EXPECT_NEAR(b.flow_m3_s[i] / base.flow_m3_s[i], dp / 100e5, 1e-12) << i;
    for (int i : orifice) EXPECT_NEAR(b.flow_m3_s[i] / base.flow_m3_s[i], std::sqrt(dp / 100e5), 1e-12) << i;
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
  // Smaller displacement: shorter mean engagement, more piston leakage; other paths unchanged.
  const auto half = pumploss::piston_pump_budget(p, o, {100e5, 0.0, 25.0, 0.5, 323.15});
  EXPECT_GT(half.flow_m3_s[0], base.flow_m3_s[0]);
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
