// Tests of fittings.hpp, line.hpp and drain_check.hpp (fittings, lines, case drain check, sizing)
// and the line C API.
// Sources: tests/reference/SOURCES.md.
#include <gtest/gtest.h>

#include <cmath>
#include <string>
#include <vector>

#include "pumploss.h"
#include "pumploss/drain_check.hpp"
#include "pumploss/fittings.hpp"
#include "pumploss/line.hpp"
#include "test_support.hpp"

using pltest::kInf;
using pltest::kNaN;
using pltest::mp50;
using pumploss::status;

namespace {
struct fitting_row {
  const char* source;
  char method;
  double k1, k2, k3, size_in, re, k;
};
const fitting_row kFittingRows[] = {
#include "reference/friction/fluids_fittings.ipp"
};
struct crane_row {
  const char* source;
  double d, l_over_d, expected;
};
const crane_row kCraneRows[] = {
#include "reference/friction/fluids_crane.ipp"
};

constexpr double kPi = 3.14159265358979323846;

/// VG 46 with 6.8 mm2/s at 100 degC (selfcalc_vg46 in tests/reference/SOURCES.md), typical mineral oil, but with
/// density 870 kg/m3 at every temperature (no expansion) to match methods_row20 (tests/reference/SOURCES.md).
pumploss::oil<double> vg46_const_density() {
  auto o = pumploss::typical_mineral_oil(pumploss::d341_fit(313.15, 46e-6, 373.15, 6.8e-6).value);
  o.alpha_per_k = 0.0;
  return o;
}

/// The drain line of methods_row20 (tests/reference/SOURCES.md, self-calculated): 5 m of 12.7 mm bore (smooth), nothing else.
pumploss::line<double> row20_line() {
  pumploss::line<double> l;
  l.elements.push_back(pumploss::line_pipe(0.0127, 5.0, 0.0));
  return l;
}
}  // namespace

TEST(LineFittings, MatchFluidsHooperDarbyCrane) {
  for (const auto& r : kFittingRows) {
    if (r.method == 'h') {
      const auto k = pumploss::k_hooper(r.k1, r.k2, r.size_in * 0.0254, r.re);
      ASSERT_EQ(k.st, status::ok);
      EXPECT_NEAR(k.value / r.k, 1, 1e-14) << r.source << " Hooper " << r.k1;
    } else {
      const auto k = pumploss::k_darby(r.k1, r.k2, r.k3, r.size_in, r.re);
      ASSERT_EQ(k.st, status::ok);
      EXPECT_NEAR(k.value / r.k, 1, 1e-14) << r.source << " Darby " << r.k1;
    }
  }
  // fluids_fittings (tests/reference/SOURCES.md; fluids documentation).
  EXPECT_NEAR(pumploss::k_hooper(1500.0, 4.0, 2 * 0.0254, 1e4).value, 6.15, 1e-12);
  EXPECT_NEAR(pumploss::k_darby(950.0, 0.25, 4.0, 12.0, 1e4).value, 0.8195103, 0.5e-7);
  for (const auto& r : kCraneRows) {
    const auto ft = pumploss::friction_factor_ft(r.d);
    ASSERT_EQ(ft.st, status::ok);
    const double got = r.l_over_d == 0 ? ft.value : ft.value * r.l_over_d;
    // ft_Crane solves the same Colebrook equation with one Clamond iteration (fast=True) for
    // D >= 10 mm, accurate to about 5-8 digits by its own documentation: 5e-6 relative.
    EXPECT_NEAR(got / r.expected, 1, 5e-6) << r.source << " D " << r.d;
  }
  EXPECT_EQ(pumploss::friction_factor_ft(0.0).st, status::domain);
  EXPECT_EQ(pumploss::friction_factor_ft(2.0).st, status::regime);
  EXPECT_EQ(pumploss::k_hooper(-1.0, 4.0, 0.05, 1e4).st, status::domain);
  EXPECT_EQ(pumploss::k_darby(950.0, 0.25, 4.0, 12.0, kNaN).st, status::nonfinite);
  EXPECT_NEAR(pumploss::equivalent_length(0.5, 0.02, 0.025).value, 0.4, 1e-15);
  EXPECT_EQ(pumploss::equivalent_length(0.5, 0.02, 0.0).st, status::domain);
}

TEST(LinePressureDrop, SumOfPartsHandValuesAndStaticHead) {
  const double d = 0.02, q = 1e-3, rho = 870.0, mu = 0.01;
  pumploss::line<double> l;
  l.elements.push_back(pumploss::line_fitting_k(d, pumploss::k_entrance_sharp));
  l.elements.push_back(pumploss::line_pipe(d, 4.0, 1.5e-6));
  l.elements.push_back(pumploss::line_fitting_hooper(d, 800.0, 0.4));  // 90 deg screwed elbow
  l.elements.push_back(pumploss::line_component_power(1e-3, 0.5e5, 1.0, 32e-6, 1.0));
  l.elements.push_back(pumploss::line_fitting_k(d, pumploss::k_exit));
  l.height_m = 1.5;
  std::vector<double> parts(l.elements.size());
  const auto r = pumploss::line_pressure_drop(l, q, rho, mu, parts.data());
  ASSERT_TRUE(pumploss::is_usable(r.st));
  // Hand values: v = 4q/(pi d^2) = 3.1831 m/s, head = rho v^2/2, Re = 5538.
  const double v = 4 * q / (kPi * d * d), head = rho * v * v / 2, re = rho * v * d / mu;
  EXPECT_NEAR(parts[0], 0.57 * head, 1e-9 * head);
  EXPECT_NEAR(parts[4], 1.0 * head, 1e-9 * head);
  EXPECT_NEAR(parts[2], (800.0 / re + 0.4 * (1 + 0.0254 / d)) * head, 1e-9 * head);
  EXPECT_NEAR(parts[3], 0.5e5 * (mu / rho / 32e-6), 1e-9);
  EXPECT_EQ(parts[1], pumploss::pipe_pressure_drop(q, rho, mu, d, 4.0, 1.5e-6).dp_pa);
  double sum = r.dp_static_pa;
  for (double p : parts) sum += p;
  EXPECT_NEAR(r.dp_pa, sum, 1e-9 * r.dp_pa);
  EXPECT_NEAR(r.dp_static_pa, 870.0 * 9.80665 * 1.5, 1e-9);
  // 50-digit evaluation of the same line.
  pumploss::line<mp50> lm;
  for (const auto& e : l.elements) {
    pumploss::line_element<mp50> m;
    m.kind = e.kind;
    m.diameter_m = e.diameter_m; m.length_m = e.length_m; m.roughness_m = e.roughness_m;
    m.c1 = e.c1; m.c2 = e.c2; m.c3 = e.c3;
    m.q_ref_m3_s = e.q_ref_m3_s; m.dp_ref_pa = e.dp_ref_pa; m.exponent = e.exponent;
    m.nu_ref_m2_s = e.nu_ref_m2_s; m.nu_exponent = e.nu_exponent;
    lm.elements.push_back(m);
  }
  lm.height_m = 1.5;
  const auto rm = pumploss::line_pressure_drop<mp50>(lm, mp50(q), mp50(rho), mp50(mu));
  EXPECT_LE(pltest::rel_err(r.dp_pa, rm.dp_pa), 1e-14);
}

TEST(LinePressureDrop, ComponentPointsInterpolateAndScale) {
  const double q[3] = {1e-4, 2e-4, 4e-4}, dp[3] = {0.1e5, 0.3e5, 0.9e5};
  const auto e = pumploss::line_component_points(3, q, dp, 46e-6, 1.0);
  ASSERT_EQ(e.st, status::ok);
  const pumploss::line_element<double> el[1] = {e.value};
  auto at = [&](double qq, double nu) { return pumploss::line_pressure_drop(el, 1, 0.0, qq, 870.0, nu * 870.0); };
  EXPECT_NEAR(at(0.5e-4, 46e-6).dp_pa, 0.05e5, 1e-9);  // through (0, 0)
  EXPECT_NEAR(at(3e-4, 46e-6).dp_pa, 0.6e5, 1e-9);
  EXPECT_NEAR(at(3e-4, 92e-6).dp_pa, 1.2e5, 1e-9);    // laminar scaling with nu
  EXPECT_EQ(at(3e-4, 46e-6).st, status::ok);
  EXPECT_EQ(at(5e-4, 46e-6).st, status::extrapolated);
  EXPECT_NEAR(at(5e-4, 46e-6).dp_pa, 1.2e5, 1e-9);
  const double bad_q[2] = {2e-4, 1e-4};
  EXPECT_EQ(pumploss::line_component_points(2, bad_q, dp, 46e-6, 1.0).st, status::domain);
  EXPECT_EQ(pumploss::line_component_points(0, q, dp, 46e-6, 1.0).st, status::domain);
  EXPECT_EQ(pumploss::line_component_points<double>(2, nullptr, dp, 46e-6, 1.0).st, status::domain);
}

TEST(LineFlowForPressure, RoundTripAndStaticHead) {
  pumploss::line<double> l;
  l.elements.push_back(pumploss::line_fitting_k(0.0127, 0.57));
  l.elements.push_back(pumploss::line_pipe(0.0127, 6.0, 1.5e-6));
  l.elements.push_back(pumploss::line_fitting_hooper(0.0127, 800.0, 0.4));
  l.elements.push_back(pumploss::line_fitting_k(0.0127, 1.0));
  l.height_m = 0.8;
  for (double mu : {0.002, 0.04, 0.5}) {
    for (double q : {1e-6, 5e-5, 3e-4, 2e-3}) {
      const auto dp = pumploss::line_pressure_drop(l, q, 870.0, mu);
      const auto back = pumploss::line_flow_for_pressure(l.elements.data(), l.elements.size(), l.height_m, dp.dp_pa,
                                                         870.0, mu);
      ASSERT_TRUE(pumploss::is_usable(back.st)) << q << " " << mu;
      EXPECT_NEAR(back.value / q, 1, 1e-12) << q << " " << mu;
    }
  }
  // Less than the static head: no forward flow.
  EXPECT_EQ(pumploss::line_flow_for_pressure(l.elements.data(), l.elements.size(), 0.8, 1000.0, 870.0, 0.04).st,
            status::out_of_validity);
  EXPECT_EQ(pumploss::line_flow_for_pressure(l.elements.data(), l.elements.size(), 0.8, kNaN, 870.0, 0.04).st,
            status::nonfinite);
}

TEST(LineBadInput, NegativeLengthZeroDiameterRoughnessNaN) {
  auto dp = [](const pumploss::line_element<double>& e) {
    const pumploss::line_element<double> el[1] = {e};
    const auto r = pumploss::line_pressure_drop(el, 1, 0.0, 1e-4, 870.0, 0.04);
    EXPECT_TRUE(!is_error(r.st) || std::isnan(r.dp_pa));
    return r.st;
  };
  EXPECT_EQ(dp(pumploss::line_pipe(0.012, -1.0, 0.0)), status::domain);
  EXPECT_EQ(dp(pumploss::line_pipe(0.0, 1.0, 0.0)), status::domain);
  EXPECT_EQ(dp(pumploss::line_pipe(0.012, 1.0, 0.02)), status::domain);
  EXPECT_EQ(dp(pumploss::line_pipe(kNaN, 1.0, 0.0)), status::nonfinite);
  EXPECT_EQ(dp(pumploss::line_fitting_k(0.0, 0.5)), status::domain);
  EXPECT_EQ(dp(pumploss::line_fitting_k(0.012, -0.5)), status::domain);
  EXPECT_EQ(dp(pumploss::line_fitting_l_over_d(0.012, kInf)), status::nonfinite);
  EXPECT_EQ(dp(pumploss::line_component_power(0.0, 1e5, 1.0, 46e-6, 1.0)), status::domain);
  EXPECT_EQ(dp(pumploss::line_component_power(1e-4, 1e5, 1.0, kNaN, 1.0)), status::nonfinite);
  // Crane's constant K in laminar flow is reported.
  EXPECT_EQ(dp(pumploss::line_fitting_l_over_d(0.012, 8.0)), status::regime);
  const auto l = row20_line();
  EXPECT_EQ(pumploss::line_pressure_drop(l, 1e-4, 0.0, 0.04).st, status::domain);
  EXPECT_EQ(pumploss::line_pressure_drop(l, kNaN, 870.0, 0.04).st, status::nonfinite);
}

TEST(DrainCheck, MethodsRow20AndColdStartFailure) {
  const auto o = vg46_const_density();
  const auto l = row20_line();
  const double q = 10e-3 / 60;
  // methods_row20 (self-calculated): 1.52 bar at 20 degC, 6.56 bar at 0 degC.
  EXPECT_NEAR(pumploss::line_pressure_drop_at(l, q, o, 293.15).dp_pa, 1.52e5, 0.006e5);
  EXPECT_NEAR(pumploss::line_pressure_drop_at(l, q, o, 273.15).dp_pa, 6.56e5, 0.006e5);
  // Allowed case pressure 2 bar gauge, tank at 0: passes at 50 degC, fails at 0 degC.
  pumploss::drain_point<double> pts[6];
  const auto s = pumploss::drain_check(l, o, q, 273.15, 323.15, 6, 0.0, 2e5, pts);
  ASSERT_EQ(s.st, status::ok);
  EXPECT_FALSE(s.pass);
  EXPECT_FALSE(pts[0].pass);
  EXPECT_TRUE(pts[5].pass);
  EXPECT_NEAR(pts[0].t_k, 273.15, 1e-12);
  EXPECT_NEAR(pts[5].t_k, 323.15, 1e-12);
  EXPECT_NEAR(pts[0].margin_pa, 2e5 - 6.56e5, 0.006e5);
  EXPECT_EQ(s.worst_t_k, pts[0].t_k);
  EXPECT_EQ(s.worst_margin_pa, pts[0].margin_pa);
  EXPECT_GT(pts[5].margin_pa, 1e5);  // about 0.37 bar at 50 degC
  for (int i = 1; i < 6; ++i) EXPECT_GT(pts[i].margin_pa, pts[i - 1].margin_pa);
  // The same line checked at 50 degC only passes.
  const auto warm = pumploss::drain_check(l, o, q, 323.15, 323.15, 1, 0.0, 2e5, pts);
  EXPECT_TRUE(warm.pass);
  // Bad input
  EXPECT_EQ(pumploss::drain_check(l, o, q, 323.15, 273.15, 6, 0.0, 2e5, pts).st, status::domain);
  EXPECT_TRUE(std::isnan(pts[0].case_pressure_pa));
  EXPECT_EQ(pumploss::drain_check(l, o, -q, 273.15, 323.15, 6, 0.0, 2e5, pts).st, status::domain);
  EXPECT_EQ(pumploss::drain_check(l, o, q, 273.15, 323.15, 0, 0.0, 2e5, pts).st, status::domain);
  EXPECT_EQ(pumploss::drain_check(l, o, q, kNaN, 323.15, 6, 0.0, 2e5, pts).st, status::nonfinite);
}

TEST(DrainSizing, SmallestPassingBoreOverTheRange) {
  const auto o = vg46_const_density();
  auto l = row20_line();
  l.elements.push_back(pumploss::line_fitting_k(0.0127, pumploss::k_exit));
  const double q = 10e-3 / 60;
  const auto s = pumploss::size_drain_line(l, o, q, 273.15, 323.15, 6, 0.0, 2e5, 1.5, 3);
  ASSERT_TRUE(pumploss::is_usable(s.st));
  ASSERT_GE(s.bore_index, 0);
  EXPECT_GE(s.worst_margin_pa, 0.0);
  EXPECT_NEAR(s.worst_t_k, 273.15, 1e-9);  // cold start governs
  EXPECT_LE(s.velocity_m_s, 1.5);
  // Independent hand check at 0 degC, laminar: dp = 128 mu L q / (pi D^4) + exit K.
  const double nu0 = pumploss::oil_kinematic_viscosity(o, 273.15).value, mu0 = 870.0 * nu0;
  auto hand = [&](double d) {
    const double v = 4 * q / (kPi * d * d);
    return 128 * mu0 * 5.0 * q / (kPi * std::pow(d, 4)) + 870.0 * v * v / 2;
  };
  EXPECT_LE(hand(s.diameter_m), 2e5);
  // The next smaller bore of either kind fails the pressure or the velocity check.
  const int prev = s.bore_index - 1;
  ASSERT_GE(prev, 0);
  const double dprev = pumploss::standard_bores[prev].inside_diameter_m;
  EXPECT_TRUE(hand(dprev) > 2e5 || 4 * q / (kPi * dprev * dprev) > 1.5);
  std::printf("[sizing] 10 L/min, 5 m, 0..50 degC, 2 bar: %s (%.2f mm), margin %.3f bar, v %.2f m/s\n",
              pumploss::standard_bores[s.bore_index].name, s.diameter_m * 1e3, s.worst_margin_pa / 1e5,
              s.velocity_m_s);
  // Hoses only: dash sizes are ID in sixteenths of an inch.
  const auto h = pumploss::size_drain_line(l, o, q, 273.15, 323.15, 6, 0.0, 2e5, 1.5, 2);
  ASSERT_GE(h.bore_index, 0);
  EXPECT_EQ(pumploss::standard_bores[h.bore_index].kind, pumploss::bore_kind::hose);
  EXPECT_GE(h.diameter_m, s.diameter_m);
  // Nothing passes an impossible limit.
  EXPECT_EQ(pumploss::size_drain_line(l, o, q, 273.15, 323.15, 6, 0.0, -1e5, 1.5, 3).st, status::out_of_validity);
  EXPECT_EQ(pumploss::size_drain_line(l, o, q, 273.15, 323.15, 6, 0.0, 2e5, 1.5, 0).st, status::domain);
  // Table sanity: ascending, hose IDs are dash/16 inch.
  for (int i = 1; i < pumploss::standard_bore_count; ++i)
    EXPECT_GT(pumploss::standard_bores[i].inside_diameter_m, pumploss::standard_bores[i - 1].inside_diameter_m);
  for (const auto& b : pumploss::standard_bores) {
    if (b.kind != pumploss::bore_kind::hose) continue;
    const int dash = std::stoi(std::string(b.name).substr(6));
    EXPECT_NEAR(b.inside_diameter_m, dash * 0.0254 / 16, 1e-15) << b.name;
  }
  EXPECT_EQ(pumploss::recommended_velocity(pumploss::line_service::suction).max_m_s, 1.2);
}

TEST(LineCapi, HandleLifecycleAndCalls) {
  pumploss_line_destroy(nullptr);  // no-op
  EXPECT_EQ(pumploss_line_create(nullptr), PUMPLOSS_EMISUSE);
  pumploss_line* h = nullptr;
  ASSERT_EQ(pumploss_line_create(&h), PUMPLOSS_OK);
  ASSERT_NE(h, nullptr);
  EXPECT_EQ(pumploss_line_add_pipe(h, 0.0127, -5.0, 0.0), PUMPLOSS_EDOMAIN);
  EXPECT_NE(std::string(pumploss_line_last_message(h)).find("add_pipe"), std::string::npos);
  EXPECT_EQ(pumploss_line_add_pipe(h, 0.0127, 5.0, 0.0), PUMPLOSS_OK);
  EXPECT_EQ(pumploss_line_add_exit(h, 0.0127), PUMPLOSS_OK);  // a constant K would be reported in laminar oil
  size_t n = 0;
  EXPECT_EQ(pumploss_line_element_count(h, &n), PUMPLOSS_OK);
  EXPECT_EQ(n, 2u);
  double dp = 0, share = 0, q = 0;
  EXPECT_EQ(pumploss_line_pressure_drop_at(h, 1e-4, 300.0, &dp), PUMPLOSS_EMISUSE);  // no oil yet
  EXPECT_TRUE(std::isnan(dp));
  ASSERT_EQ(pumploss_line_set_oil(h, 313.15, 46e-6, 373.15, 6.8e-6, 870.0, 288.15), PUMPLOSS_OK);
  ASSERT_EQ(pumploss_line_pressure_drop(h, 10e-3 / 60, 870.0, 133.8e-6 * 870.0, &dp), PUMPLOSS_OK);
  ASSERT_EQ(pumploss_line_element_pressure_drop(h, 0, 10e-3 / 60, 870.0, 133.8e-6 * 870.0, &dp, &share), PUMPLOSS_OK);
  EXPECT_NEAR(dp, 1.52e5, 0.006e5);
  EXPECT_GT(share, 0.99);
  const std::string message_before = pumploss_line_last_message(h);
  EXPECT_EQ(pumploss_line_element_pressure_drop(h, 2, 1e-4, 870.0, 0.04, &dp, &share), PUMPLOSS_EDOMAIN);
  EXPECT_TRUE(std::isnan(dp) && std::isnan(share));
  // Evaluations never write the handle (pumploss.h, handle contract): a failed evaluation leaves
  // the message of the last add_ / set_ call.
  EXPECT_EQ(message_before, pumploss_line_last_message(h));
  ASSERT_EQ(pumploss_line_flow_for_pressure(h, 1.0e5, 870.0, 0.04, &q), PUMPLOSS_OK);
  ASSERT_EQ(pumploss_line_pressure_drop(h, q, 870.0, 0.04, &dp), PUMPLOSS_OK);
  EXPECT_NEAR(dp, 1.0e5, 1e-6);
  double t[3], pc[3], m[3], worst = 0;
  int pass[3];
  EXPECT_EQ(pumploss_line_drain_check(h, 10e-3 / 60, 273.15, 323.15, 3, 0.0, 2e5, t, pc, m, pass, &worst),
            PUMPLOSS_OK);
  EXPECT_EQ(pass[0], 0);
  EXPECT_EQ(pass[2], 1);
  EXPECT_EQ(worst, m[0]);
  EXPECT_EQ(pumploss_line_drain_check(h, 10e-3 / 60, 273.15, 323.15, 3, 0.0, 2e5, t, nullptr, m, pass, &worst),
            PUMPLOSS_EMISUSE);
  EXPECT_TRUE(std::isnan(worst));
  double d = 0, v = 0;
  EXPECT_EQ(pumploss_line_size_drain(h, 10e-3 / 60, 273.15, 323.15, 6, 0.0, 2e5, 1.5, 3, &d, &v, &worst),
            PUMPLOSS_OK);
  EXPECT_GT(d, 0.0127);
  EXPECT_EQ(pumploss_line_size_drain(nullptr, 1e-4, 273.15, 323.15, 6, 0.0, 2e5, 1.5, 3, &d, &v, &worst),
            PUMPLOSS_EMISUSE);
  EXPECT_TRUE(std::isnan(d));
  EXPECT_EQ(pumploss_line_set_height(h, 2.0), PUMPLOSS_OK);
  double height = 0;
  EXPECT_EQ(pumploss_line_height(h, &height), PUMPLOSS_OK);
  EXPECT_EQ(height, 2.0);
  pumploss_line_destroy(h);
  int kind = 0;
  std::size_t nb = 0;
  EXPECT_EQ(pumploss_standard_bore_count(&nb), PUMPLOSS_OK);
  EXPECT_EQ(nb, static_cast<std::size_t>(pumploss::standard_bore_count));
  EXPECT_EQ(pumploss_standard_bore(nb, &d, &kind), PUMPLOSS_EDOMAIN);
  EXPECT_EQ(pumploss_standard_bore(0, &d, &kind), PUMPLOSS_OK);
  EXPECT_EQ(d, 0.004);
}

// ---- fittings that follow a segment, Reynolds-dependent K, laminar exit, drain flow over
// temperature, destroke peak, failing ranges, sizing diagnosis, start temperature ----

namespace {
struct named_row {
  const char* source;
  int type;
  char method;
  double d, re, k;
};
const named_row kNamedRows[] = {
#include "reference/friction/fluids_named_fittings.ipp"
};

/// Darby 3-K K of a long-radius elbow by hand (Darby 2001 Table 7-3: 800, 0.071, 4.2).
double darby_lr_elbow(double d, double re) { return 800.0 / re + 0.071 * (1 + 4.2 / std::pow(d / 0.0254, 0.3)); }
}  // namespace

TEST(LineFittings, NamedKindsMatchPublishedTablesAtLowReynolds) {
  ASSERT_EQ(sizeof(kNamedRows) / sizeof(kNamedRows[0]), 184u);
  for (const auto& r : kNamedRows) {
    const auto m = r.method == 'h' ? pumploss::fitting_method::hooper_2k : pumploss::fitting_method::darby_3k;
    const auto k = pumploss::k_fitting(static_cast<pumploss::fitting_type>(r.type), m, r.d, r.re);
    ASSERT_EQ(k.st, status::ok) << r.type << r.method;
    EXPECT_LE(std::fabs(k.value / r.k - 1), 1e-14) << pumploss::fitting_table[r.type].name << " " << r.method
                                                    << " Re " << r.re;
    // the line element built from the same kind gives the same K at that Reynolds number
    const auto e = pumploss::line_fitting_named(r.d, static_cast<pumploss::fitting_type>(r.type), m);
    ASSERT_EQ(e.st, status::ok);
    const double rho = 870.0, mu = 0.05, v = r.re * mu / (rho * r.d), q = v * kPi * r.d * r.d / 4;
    const auto dp = pumploss::detail::element_dp(e.value, q, rho, mu, 0.0);
    EXPECT_LE(std::fabs(dp.value / (r.k * rho * v * v / 2) - 1), 1e-12);
  }
  // kinds the source did not tabulate, unknown kinds
  EXPECT_EQ(pumploss::k_fitting(pumploss::fitting_type::bend_90_r2, pumploss::fitting_method::hooper_2k, 0.01, 100.0).st,
            status::domain);
  EXPECT_EQ(pumploss::k_fitting(static_cast<pumploss::fitting_type>(99), pumploss::fitting_method::darby_3k, 0.01, 100.0).st,
            status::domain);
  EXPECT_EQ(pumploss::k_fitting(pumploss::fitting_type::swing_check, pumploss::fitting_method::darby_3k, kNaN, 100.0).st,
            status::nonfinite);
  EXPECT_TRUE(std::isnan(
      pumploss::k_fitting(pumploss::fitting_type::swing_check, pumploss::fitting_method::darby_3k, 0.0, 100.0).value));
  EXPECT_EQ(pumploss::line_fitting_named(0.01, pumploss::fitting_type::ball_valve_full_bore,
                                         pumploss::fitting_method::hooper_2k).st,
            status::domain);
  // 50 digits: the formula in cpp_bin_float_50 against double
  const auto k50 = pumploss::k_fitting(pumploss::fitting_type::elbow_90_long_radius, pumploss::fitting_method::darby_3k,
                                       mp50("0.0127"), mp50(37));
  const auto kd = pumploss::k_fitting(pumploss::fitting_type::elbow_90_long_radius, pumploss::fitting_method::darby_3k,
                                      0.0127, 37.0);
  EXPECT_LE(pltest::rel_err(kd.value, k50.value), 1e-15);
}

TEST(LineFittings, ConstantKReportedBelowItsRangeAndLaminarExit) {
  const double d = 0.013, rho = 870.0, mu = 0.05;
  auto at_re = [&](const pumploss::line_element<double>& e, double re) {
    const double q = re * mu / (rho * d) * kPi * d * d / 4;
    return pumploss::detail::element_dp(e, q, rho, mu, 0.0);
  };
  const auto k = pumploss::line_fitting_k(d, 0.3);
  EXPECT_EQ(at_re(k, 100.0).st, status::regime);   // a constant K in laminar oil
  EXPECT_EQ(at_re(k, 9000.0).st, status::regime);  // below 1e4 (constant_k_min_reynolds)
  EXPECT_EQ(at_re(k, 2e4).st, status::ok);
  // exit: K = 2 laminar (kinetic energy factor of the parabolic profile), 1 turbulent
  const auto ex = pumploss::line_exit(d);
  const double re = 300.0, v = re * mu / (rho * d);
  EXPECT_NEAR(at_re(ex, re).value, 2.0 * rho * v * v / 2, 1e-12 * rho * v * v);
  EXPECT_EQ(pumploss::k_exit_kinetic(1e5).value, 1.0);
  const auto tr = pumploss::k_exit_kinetic(3000.0);
  EXPECT_EQ(tr.st, status::transition);
  EXPECT_NEAR(tr.value, 1.5, 1e-15);
  EXPECT_EQ(pumploss::k_exit_kinetic(-1.0).st, status::domain);
  EXPECT_EQ(pumploss::k_exit_kinetic(kNaN).st, status::nonfinite);
}

TEST(LineFittings, FittingAfterAWideSegmentTakesThatBore) {
  // 2 m of 25.4 mm hose, three long-radius elbows given no bore, then a 0.5 m tail of 9.5 mm:
  // the elbows sit after the hose and take its bore, not the tail's.
  pumploss::line<double> l;
  l.elements.push_back(pumploss::line_pipe(0.0254, 2.0, 5e-6));
  for (int i = 0; i < 3; ++i)
    l.elements.push_back(
        pumploss::line_fitting_named(0.0, pumploss::fitting_type::elbow_90_long_radius).value);
  l.elements.push_back(pumploss::line_pipe(0.0095, 0.5, 5e-6));
  l.elements.push_back(pumploss::line_exit(0.0));
  const double q = 8.0 / 60000, rho = 870.0, mu = 870.0 * 46e-6;
  std::vector<double> parts(l.elements.size());
  const auto r = pumploss::line_pressure_drop(l, q, rho, mu, parts.data());
  ASSERT_TRUE(pumploss::is_usable(r.st));
  auto by_hand = [&](double d) {  // Darby 3-K at the bore's velocity and Reynolds number
    const double v = 4 * q / (kPi * d * d), re = rho * v * d / mu;
    return darby_lr_elbow(d, re) * rho * v * v / 2;
  };
  for (int i = 1; i <= 3; ++i) EXPECT_NEAR(parts[static_cast<std::size_t>(i)], by_hand(0.0254), 1e-9 * by_hand(0.0254));
  EXPECT_GT(by_hand(0.0095) / by_hand(0.0254), 20.0);  // what taking the tail's bore would have given
  // the exit follows the tail: 9.5 mm, Re = 1180 laminar, K = 2
  const double v9 = 4 * q / (kPi * 0.0095 * 0.0095);
  EXPECT_NEAR(parts[5], 2.0 * rho * v9 * v9 / 2, 1e-9 * rho * v9 * v9);
  // a fitting at the start of the line takes the bore of the first element after it
  pumploss::line<double> s;
  s.elements.push_back(pumploss::line_fitting_named(0.0, pumploss::fitting_type::elbow_90_long_radius).value);
  s.elements.push_back(pumploss::line_pipe(0.0254, 2.0, 5e-6));
  double p2[2];
  ASSERT_TRUE(pumploss::line_pressure_drop(s, q, rho, mu, p2).usable());
  EXPECT_NEAR(p2[0], by_hand(0.0254), 1e-9 * by_hand(0.0254));
  // nothing to follow: a domain error, NaN
  pumploss::line<double> lone;
  lone.elements.push_back(pumploss::line_exit(0.0));
  const auto bad = pumploss::line_pressure_drop(lone, q, rho, mu);
  EXPECT_EQ(bad.st, status::domain);
  EXPECT_TRUE(std::isnan(bad.dp_pa));
  // the same through the C API: a fitting added with bore 0
  pumploss_line* h = nullptr;
  ASSERT_EQ(pumploss_line_create(&h), PUMPLOSS_OK);
  EXPECT_EQ(pumploss_line_add_pipe(h, 0.0254, 2.0, 5e-6), PUMPLOSS_OK);
  EXPECT_EQ(pumploss_line_add_fitting_named(h, 0.0, PUMPLOSS_FITTING_ELBOW_90_LONG_RADIUS,
                                            PUMPLOSS_FITTING_METHOD_DARBY_3K),
            PUMPLOSS_OK);
  EXPECT_EQ(pumploss_line_add_pipe(h, 0.0095, 0.5, 5e-6), PUMPLOSS_OK);
  double dp = 0, share = 0;
  pumploss_line_element_pressure_drop(h, 1, q, rho, mu, &dp, &share);
  EXPECT_NEAR(dp, by_hand(0.0254), 1e-9 * by_hand(0.0254));
  pumploss_line_destroy(h);
}

TEST(FluidD341Temperature, InverseOfTheForwardLineTo50Digits) {
  // ASTM D341 worked example (as d341_fit's check): 32 mm2/s at 40 degC, 5.4 at 100 degC gives
  // 8.53 mm2/s at 80 degC (published, quoted as 8.5): the inverse returns 80 degC within the
  // rounding of 8.53 (d nu/dT is about -0.2 mm2/s per K there: 0.03 K).
  const auto line = pumploss::d341_fit(313.15, 32e-6, 373.15, 5.4e-6).value;
  const auto t80 = pumploss::d341_temperature(line, 8.53e-6);
  ASSERT_EQ(t80.st, status::ok);
  EXPECT_NEAR(t80.value, 353.15, 0.05);
  // Round trip through the forward function, and the 50-digit evaluation.
  const auto line50 = pumploss::d341_fit(mp50("313.15"), mp50("0.000032"), mp50("373.15"), mp50("0.0000054")).value;
  for (double nu : {2.5e-6, 5.4e-6, 46e-6, 400e-6, 1000e-6, 1e-2}) {  // away from the 2 mm2/s branch
    const auto t = pumploss::d341_temperature(line, nu);
    ASSERT_EQ(t.st, status::ok) << nu;
    EXPECT_LE(std::fabs(pumploss::d341_viscosity(line, t.value).value / nu - 1), 1e-12) << nu;
    const auto t50 = pumploss::d341_temperature(line50, mp50(nu));
    EXPECT_LE(pltest::rel_err(t.value, t50.value), 1e-14) << nu;
  }
  // the C wrapper
  double a = 0, b = 0, tk = 0;
  ASSERT_EQ(pumploss_d341_coefficients(313.15, 32e-6, 373.15, 5.4e-6, &a, &b), PUMPLOSS_OK);
  EXPECT_EQ(pumploss_d341_temperature(a, b, 8.53e-6, &tk), PUMPLOSS_OK);
  // the same line rebuilt from the C outputs a and b: equal but for the last bits (the compiler
  // may contract a multiply-add differently in the two paths)
  EXPECT_LE(std::fabs(tk / t80.value - 1), 1e-14);
  // bad input
  EXPECT_EQ(pumploss::d341_temperature(line, 0.0).st, status::domain);
  EXPECT_EQ(pumploss::d341_temperature(line, -1e-6).st, status::domain);
  EXPECT_EQ(pumploss::d341_temperature(line, 1e-9).st, status::domain);  // Z <= 1
  EXPECT_EQ(pumploss::d341_temperature(line, kNaN).st, status::nonfinite);
  EXPECT_EQ(pumploss::d341_temperature(pumploss::d341_line<double>{line.a, -1.0}, 46e-6).st, status::domain);
  EXPECT_EQ(pumploss_d341_temperature(a, b, kInf, &tk), PUMPLOSS_ENONFINITE);
  EXPECT_TRUE(std::isnan(tk));
}

namespace {
/// The demo-like drain line: 12.7 mm hose, 13 mm tube with three r/D = 2 bends, laminar exit,
/// a diffuser curve at 32 mm2/s.
pumploss::line<double> drain_demo_line() {
  pumploss::line<double> l;
  l.height_m = 0.6;
  l.elements.push_back(pumploss::line_pipe(0.0127, 1.8, 5e-6));
  l.elements.push_back(pumploss::line_pipe(0.013, 4.5, 1.5e-6));
  for (int i = 0; i < 3; ++i)
    l.elements.push_back(pumploss::line_fitting_named(0.0, pumploss::fitting_type::bend_90_r2).value);
  l.elements.push_back(pumploss::line_exit(0.0));
  const double qc[2] = {10.0 / 60000, 20.0 / 60000}, pc[2] = {0.05e5, 0.12e5};
  l.elements.push_back(pumploss::line_component_points(2, qc, pc, 32e-6, 1.0).value);
  return l;
}
pumploss::oil<double> vg46() {
  return pumploss::typical_mineral_oil(pumploss::d341_fit(313.15, 46e-6, 373.15, 6.9e-6).value);
}
/// drain_demo_line() through the C API, with vg46()'s oil (NULL when the API refuses a step).
pumploss_line* drain_demo_handle() {
  pumploss_line* h = nullptr;
  if (pumploss_line_create(&h) != PUMPLOSS_OK) return nullptr;
  const double qc[2] = {10.0 / 60000, 20.0 / 60000}, pc[2] = {0.05e5, 0.12e5};
  const auto o = vg46();
  bool ok = pumploss_line_add_pipe(h, 0.0127, 1.8, 5e-6) == PUMPLOSS_OK &&
            pumploss_line_add_pipe(h, 0.013, 4.5, 1.5e-6) == PUMPLOSS_OK;
  for (int i = 0; i < 3; ++i)
    ok = ok && pumploss_line_add_fitting_named(h, 0.0, PUMPLOSS_FITTING_BEND_90_R2, PUMPLOSS_FITTING_METHOD_DARBY_3K) ==
                   PUMPLOSS_OK;
  ok = ok && pumploss_line_add_exit(h, 0.0) == PUMPLOSS_OK &&
       pumploss_line_add_component_points(h, 2, qc, pc, 32e-6, 1.0) == PUMPLOSS_OK &&
       pumploss_line_set_height(h, 0.6) == PUMPLOSS_OK &&
       pumploss_line_set_oil(h, 313.15, 46e-6, 373.15, 6.9e-6, o.rho_ref_kg_m3, o.t_ref_k) == PUMPLOSS_OK;
  if (!ok) {
    pumploss_line_destroy(h);
    return nullptr;
  }
  return h;
}
/// Case pressure of the truth model at t: constant + laminar flow (+ peak) through the line.
double case_pressure_truth(const pumploss::line<double>& l, const pumploss::oil<double>& o, double qc, double ql,
                           double t_ref, double q_peak, double t) {
  const double mu = pumploss::oil_dynamic_viscosity(o, t, 0.0).value;
  const double mu_ref = pumploss::oil_dynamic_viscosity(o, t_ref, 0.0).value;
  return pumploss::line_pressure_drop_at(l, qc + ql * mu_ref / mu + q_peak, o, t).dp_pa;
}
}  // namespace

TEST(DrainCheck, FlowOverTemperaturePeakAndFailingRangesFromATruthModel) {
  const auto l = drain_demo_line();
  const auto o = vg46();
  const double qc = 0.5 / 60000, ql = 7.5 / 60000, t_ref = 323.15, vol = 25e-6, dt = 0.1;
  const auto f = pumploss::with_destroke_peak(pumploss::drain_flow_parts(qc, ql, t_ref), vol, dt);
  // the flow model: constant part + laminar part scaled with dynamic viscosity (self-calculated)
  for (double t : {273.15, 293.15, 323.15, 343.15}) {
    const double want = qc + ql * pumploss::oil_dynamic_viscosity(o, t_ref, 0.0).value /
                                 pumploss::oil_dynamic_viscosity(o, t, 0.0).value;
    EXPECT_NEAR(pumploss::drain_flow_at(f, o, t).value, want, 1e-15);
  }
  EXPECT_NEAR(pumploss::drain_peak_flow(f).value, 25e-5, 1e-18);
  const pumploss::drain_limits<double> lim{0.0, 1e5, 2e5};
  pumploss::drain_point<double> pts[8];
  const auto s = pumploss::drain_check(l, o, f, lim, 273.15, 343.15, 8, pts);
  ASSERT_TRUE(pumploss::is_usable(s.st));
  EXPECT_TRUE(s.peak_checked);
  // every point against the truth model evaluated directly
  for (const auto& p : pts) {
    EXPECT_NEAR(p.case_pressure_pa, case_pressure_truth(l, o, qc, ql, t_ref, 0.0, p.t_k), 1e-6);
    EXPECT_NEAR(p.case_pressure_peak_pa, case_pressure_truth(l, o, qc, ql, t_ref, 25e-5, p.t_k), 1e-6);
    EXPECT_EQ(p.pass, p.case_pressure_pa <= 1e5);
    EXPECT_EQ(p.pass_peak, p.case_pressure_peak_pa <= 2e5);
  }
  // the ranges: each end where the truth crosses its limit (a fine scan, 0.001 K)
  auto crossing = [&](double q_peak, double limit, double lo, double hi) {
    const bool below = case_pressure_truth(l, o, qc, ql, t_ref, q_peak, lo) <= limit;
    for (double t = lo; t <= hi; t += 0.001)
      if ((case_pressure_truth(l, o, qc, ql, t_ref, q_peak, t) <= limit) != below) return t;
    return hi;
  };
  std::printf("[drain] continuous %s (%d ranges), peak %s (%d ranges)\n", s.pass ? "pass" : "FAIL", s.n_fail,
              s.pass_peak ? "pass" : "FAIL", s.n_fail_peak);
  for (int i = 0; i < s.n_fail; ++i) {
    const auto& r = s.fail[static_cast<std::size_t>(i)];
    std::printf("[drain]   continuous fails %.3f to %.3f degC\n", r.from_k - 273.15, r.to_k - 273.15);
    if (r.to_k < 343.15) {
      EXPECT_NEAR(r.to_k, crossing(0.0, 1e5, r.from_k, 343.15), 0.0011);
    }
  }
  for (int i = 0; i < s.n_fail_peak; ++i) {
    const auto& r = s.fail_peak[static_cast<std::size_t>(i)];
    std::printf("[drain]   peak fails %.3f to %.3f degC\n", r.from_k - 273.15, r.to_k - 273.15);
    if (r.to_k < 343.15) {
      EXPECT_NEAR(r.to_k, crossing(25e-5, 2e5, r.from_k, 343.15), 0.0011);
    }
  }
  EXPECT_GE(s.n_fail_any, 1);
  // a constant flow overstates the cold case pressure of laminar leakage: the old verdict
  const auto c = pumploss::drain_check(l, o, 8.0 / 60000, 273.15, 343.15, 8, 0.0, 1e5, pts);
  EXPECT_GT(c.fail[0].to_k, s.n_fail > 0 ? s.fail[0].to_k : 273.15);
  // a table from the same truth at five temperatures reproduces it between its points
  double tt[5], qq[5];
  for (int i = 0; i < 5; ++i) {
    tt[i] = 273.15 + 17.5 * i;
    qq[i] = pumploss::drain_flow_at(f, o, tt[i]).value;
  }
  const auto tab = pumploss::drain_flow_table(5, tt, qq);
  ASSERT_EQ(tab.st, status::ok);
  EXPECT_EQ(pumploss::drain_flow_at(tab.value, o, tt[2]).value, qq[2]);
  EXPECT_NEAR(pumploss::drain_flow_at(tab.value, o, 300.0).value, pumploss::drain_flow_at(f, o, 300.0).value,
              0.15 * pumploss::drain_flow_at(f, o, 300.0).value);
  EXPECT_EQ(pumploss::drain_flow_at(tab.value, o, 350.0).st, status::extrapolated);
  // bad input: NaN outputs, clear status, no crash
  EXPECT_EQ(pumploss::drain_flow_table(0, tt, qq).st, status::domain);
  const double tbad[2] = {300.0, 290.0}, qbad[2] = {1e-4, 1e-4};
  EXPECT_EQ(pumploss::drain_flow_table(2, tbad, qbad).st, status::domain);
  EXPECT_EQ(pumploss::drain_flow_table(2, tt, static_cast<const double*>(nullptr)).st, status::domain);
  EXPECT_EQ(pumploss::drain_flow_at(pumploss::drain_flow_parts(-1e-4, 0.0, 300.0), o, 300.0).st, status::domain);
  EXPECT_EQ(pumploss::drain_flow_at(pumploss::drain_flow_parts(0.0, 1e-4, 0.0), o, 300.0).st, status::domain);
  EXPECT_EQ(pumploss::drain_peak_flow(pumploss::with_destroke_peak(f, 25e-6, 0.0)).st, status::domain);
  const auto bad = pumploss::drain_check(l, o, pumploss::with_destroke_peak(f, 25e-6, -1.0), lim, 273.15, 343.15, 8, pts);
  EXPECT_EQ(bad.st, status::domain);
  EXPECT_TRUE(std::isnan(pts[3].case_pressure_pa));
  EXPECT_EQ(pumploss::drain_check(l, o, f, pumploss::drain_limits<double>{0.0, 1e5, kNaN}, 273.15, 343.15, 8, pts).st,
            status::nonfinite);
}

TEST(DrainCheck, FailsColdAndHotNamesBothRanges) {
  // A line that fails cold (viscous) and hot (a table flow that grows steeply when the oil thins,
  // turbulent in a narrow bore): two ranges, each end against a fine scan of the same model.
  pumploss::line<double> l;
  l.elements.push_back(pumploss::line_pipe(0.008, 3.0, 1.5e-6));
  const auto o = vg46();
  const double tt[3] = {273.15, 313.15, 343.15}, qq[3] = {3.0 / 60000, 3.0 / 60000, 30.0 / 60000};
  const auto f = pumploss::drain_flow_table(3, tt, qq).value;
  const pumploss::drain_limits<double> lim{0.0, 1.5e5, 1.5e5};
  const auto s = pumploss::drain_check(l, o, f, lim, 273.15, 343.15, 15, static_cast<pumploss::drain_point<double>*>(nullptr));
  ASSERT_TRUE(pumploss::is_usable(s.st));
  ASSERT_EQ(s.n_fail, 2);
  EXPECT_EQ(s.fail[0].from_k, 273.15);
  EXPECT_EQ(s.fail[1].to_k, 343.15);
  auto cp = [&](double t) {
    return pumploss::line_pressure_drop_at(l, pumploss::drain_flow_at(f, o, t).value, o, t).dp_pa;
  };
  EXPECT_GT(cp(s.fail[0].to_k - 0.01), 1.5e5);
  EXPECT_LT(cp(s.fail[0].to_k + 0.01), 1.5e5);
  EXPECT_LT(cp(s.fail[1].from_k - 0.01), 1.5e5);
  EXPECT_GT(cp(s.fail[1].from_k + 0.01), 1.5e5);
  // no start temperature: the line fails at the top of the range
  EXPECT_EQ(pumploss::drain_start_temperature(l, o, f, lim, 273.15, 343.15, 15, 0.0).st, status::out_of_validity);
}

TEST(DrainSizing, DominantElementAndFixedElementsThatNoBoreCanBeat) {
  const auto o = vg46();
  const auto f = pumploss::drain_flow_parts(0.5 / 60000, 7.5 / 60000, 323.15);
  const pumploss::drain_limits<double> lim{0.0, 1e5, 1e5};
  auto l = drain_demo_line();
  const auto z = pumploss::size_drain_line(l, o, f, lim, 273.15, 343.15, 8, 1.5, 3);
  ASSERT_TRUE(pumploss::is_usable(z.st));
  ASSERT_GE(z.bore_index, 0);
  EXPECT_FALSE(z.fixed_exceeds);
  ASSERT_GE(z.dominant_element, 0);
  // the dominant element is the largest per-element drop with the chosen bore at the worst temperature
  auto l2 = l;
  for (auto& e : l2.elements)
    if (pumploss::detail::has_bore(e)) e.diameter_m = z.diameter_m;
  std::vector<double> parts(l2.elements.size());
  ASSERT_TRUE(
      pumploss::line_pressure_drop_at(l2, pumploss::drain_flow_at(f, o, z.worst_t_k).value, o, z.worst_t_k, parts.data())
          .usable());
  EXPECT_EQ(z.dominant_element, static_cast<int>(std::max_element(parts.begin(), parts.end()) - parts.begin()));
  EXPECT_NEAR(z.dominant_dp_pa, parts[static_cast<std::size_t>(z.dominant_element)], 1e-9 * z.dominant_dp_pa);
  // a filter in the line that alone exceeds 1 bar cold: no bore can pass, and it is named
  const double qf[1] = {8.0 / 60000}, pf[1] = {1.2e5};
  l.elements.push_back(pumploss::line_component_points(1, qf, pf, 46e-6, 1.0).value);  // laminar media
  const auto n = pumploss::size_drain_line(l, o, f, lim, 273.15, 343.15, 8, 1.5, 3);
  EXPECT_EQ(n.st, status::out_of_validity);
  EXPECT_TRUE(n.fixed_exceeds);
  EXPECT_EQ(n.fixed_dominant_element, static_cast<int>(l.elements.size()) - 1);
  EXPECT_NEAR(n.fixed_t_k, 273.15, 1e-9);
  EXPECT_GT(n.fixed_dp_pa, 1e5);
  EXPECT_TRUE(std::isnan(n.diameter_m));
}

TEST(DrainStart, LowestStartTemperatureFromTheLineAndTheViscosityLimit) {
  const auto l = drain_demo_line();
  const auto o = vg46();
  const auto f = pumploss::with_destroke_peak(pumploss::drain_flow_parts(0.5 / 60000, 7.5 / 60000, 323.15), 25e-6, 0.1);
  const pumploss::drain_limits<double> lim{0.0, 1e5, 2e5};
  const auto s = pumploss::drain_check(l, o, f, lim, 253.15, 343.15, 10, static_cast<pumploss::drain_point<double>*>(nullptr));
  const auto st = pumploss::drain_start_temperature(l, o, f, lim, 253.15, 343.15, 10, 1000e-6);
  ASSERT_TRUE(pumploss::is_usable(st.st));
  EXPECT_NEAR(st.t_viscosity_k, pumploss::d341_temperature(o.viscosity, 1000e-6).value, 1e-9);
  EXPECT_NEAR(pumploss::oil_kinematic_viscosity(o, st.t_viscosity_k).value, 1000e-6, 1e-12);
  ASSERT_GE(s.n_fail_any, 1);
  EXPECT_EQ(st.t_line_k, s.fail_any[static_cast<std::size_t>(s.n_fail_any - 1)].to_k);
  EXPECT_EQ(st.t_start_k, std::max(st.t_line_k, st.t_viscosity_k));
  std::printf("[start] line passes from %.2f degC, oil at 1000 cSt at %.2f degC: start from %.2f degC\n",
              st.t_line_k - 273.15, st.t_viscosity_k - 273.15, st.t_start_k - 273.15);
  // C API: the same figures
  pumploss_line* h = drain_demo_handle();
  ASSERT_NE(h, nullptr);
  double ts = 0, tl = 0, tv = 0;
  const int code = pumploss_line_drain_start(h, 0.5 / 60000, 7.5 / 60000, 323.15, 25e-6, 0.1, 253.15, 343.15, 10, 0.0,
                                             1e5, 2e5, 1000e-6, &ts, &tl, &tv);
  EXPECT_EQ(code, static_cast<int>(st.st));
  EXPECT_NEAR(ts, st.t_start_k, 1e-9);
  double t[10], q[10], p[10], pp[10];
  int pass[10];
  char verdict[200];
  EXPECT_EQ(pumploss_line_drain_check_flow(h, 0.5 / 60000, 7.5 / 60000, 323.15, 25e-6, 0.1, 253.15, 343.15, 10, 0.0,
                                           1e5, 2e5, t, q, p, pp, pass, verdict, sizeof verdict),
            static_cast<int>(s.st));
  EXPECT_EQ(std::string(verdict).rfind("FAIL", 0), 0u) << verdict;
  std::printf("[start] C verdict: %s\n", verdict);
  char tiny[8];
  pumploss_line_drain_check_flow(h, 0.5 / 60000, 7.5 / 60000, 323.15, 25e-6, 0.1, 253.15, 343.15, 10, 0.0, 1e5, 2e5, t,
                                 q, p, pp, pass, tiny, sizeof tiny);
  EXPECT_EQ(std::string(tiny), "FAIL: c");  // cut to fit, terminated
  double d = 0, fixed = 0;
  int dom = 0, exceeds = 1;
  const int zc = pumploss_line_size_drain_flow(h, 0.5 / 60000, 7.5 / 60000, 323.15, 25e-6, 0.1, 273.15,
                                                               343.15, 10, 0.0, 1e5, 2e5, 1.5, 3, &d, &fixed, &dom,
                                                               &exceeds);
  EXPECT_TRUE(zc == PUMPLOSS_OK || zc >= 100) << zc;
  EXPECT_GT(d, 0.0);
  EXPECT_EQ(exceeds, 0);
  pumploss_line_destroy(h);
  // bad input
  EXPECT_EQ(pumploss::drain_start_temperature(l, o, f, lim, 253.15, 343.15, 1, 0.0).st, status::domain);
  EXPECT_EQ(pumploss::drain_start_temperature(l, o, f, lim, 253.15, 343.15, 10, kNaN).st, status::nonfinite);
  EXPECT_EQ(pumploss_line_drain_start(nullptr, 0.5 / 60000, 7.5 / 60000, 323.15, 0, 0, 253.15, 343.15, 10, 0.0, 1e5,
                                      2e5, 0.0, &ts, &tl, &tv),
            PUMPLOSS_EMISUSE);
  EXPECT_TRUE(std::isnan(ts));
}

namespace {
/// A drain line with two lumped components that each alone exceed 1 bar cold (a filter and a
/// cooler, laminar media: dp = dp1 (q/q1) (nu/nu_ref), one curve point each), a check valve that
/// does not, a 12.7 mm hose and 0.5 m of height (invented data).
pumploss::line<double> two_culprits_line() {
  pumploss::line<double> l;
  l.height_m = 0.5;
  l.elements.push_back(pumploss::line_pipe(0.0127, 5.0, 5e-6));
  const double q1[1] = {10.0 / 60000}, filter[1] = {0.8e5}, cooler[1] = {0.7e5}, check[1] = {0.05e5};
  l.elements.push_back(pumploss::line_component_points(1, q1, filter, 46e-6, 1.0).value);
  l.elements.push_back(pumploss::line_component_points(1, q1, cooler, 46e-6, 1.0).value);
  l.elements.push_back(pumploss::line_component_points(1, q1, check, 46e-6, 0.0).value);
  return l;
}
}  // namespace

TEST(DrainSizing, NamesEachFixedElementThatAloneExceedsTheLimit) {
  const auto l = two_culprits_line();
  const auto o = vg46();
  const double q = 8.0 / 60000;
  const auto f = pumploss::drain_flow_parts(q, 0.0, 0.0);
  const pumploss::drain_limits<double> lim{0.0, 1e5, 1e5};
  const auto z = pumploss::size_drain_line(l, o, f, lim, 273.15, 343.15, 8, 1.5, 3);
  EXPECT_EQ(z.st, status::out_of_validity);
  EXPECT_TRUE(z.fixed_exceeds);
  EXPECT_EQ(z.n_fixed_alone, 2);           // the filter and the cooler, each alone
  EXPECT_EQ(z.fixed_dominant_element, 1);  // the filter is the larger
  // each element alone against the laminar-media law evaluated here (self-calculated): the
  // worst case is the coldest temperature, dp = dp1 (q/q1) (nu(0 degC)/46 mm2/s)
  const double nu_cold = pumploss::oil_kinematic_viscosity(o, 273.15).value;
  const double want[3] = {0.8e5 * 0.8 * nu_cold / 46e-6, 0.7e5 * 0.8 * nu_cold / 46e-6, 0.05e5 * 0.8};
  for (int k = 1; k <= 3; ++k) {
    const auto a = pumploss::drain_fixed_alone(l, o, f, lim, 273.15, 343.15, 8, k);
    ASSERT_TRUE(a.usable()) << k;
    EXPECT_EQ(a.element, k);
    EXPECT_NEAR(a.dp_pa, want[k - 1], 1e-9 * want[k - 1]) << k;
    EXPECT_EQ(a.exceeds, k != 3) << k;
    EXPECT_NEAR(a.excess_pa, want[k - 1] - 1e5, 1e-9 * want[k - 1]) << k;
    EXPECT_FALSE(a.at_peak);
    if (k != 3) {
      EXPECT_EQ(a.t_k, 273.15) << k;
    }
  }
  const auto h = pumploss::drain_fixed_alone(l, o, f, lim, 273.15, 343.15, 8, -1);  // the static height
  ASSERT_TRUE(h.usable());
  EXPECT_FALSE(h.exceeds);
  EXPECT_NEAR(h.dp_pa, pumploss::oil_density_at(o, 273.15, 0.0).value * 9.80665 * 0.5, 1e-9);
  // a peak limit of its own: the check valve alone exceeds it at continuous + peak flow
  const auto fp = pumploss::with_destroke_peak(f, 25e-6, 0.1);  // + 15 L/min
  const pumploss::drain_limits<double> tight{0.0, 1e5, 0.1e5};
  const auto cv = pumploss::drain_fixed_alone(l, o, fp, tight, 273.15, 343.15, 8, 3);
  ASSERT_TRUE(cv.usable());
  EXPECT_TRUE(cv.exceeds);
  EXPECT_TRUE(cv.at_peak);
  EXPECT_NEAR(cv.dp_pa, 0.05e5 * 23.0 / 10.0, 1e-6);
  // bad input: a pipe, an index out of range, NaN, a bad grid
  EXPECT_EQ(pumploss::drain_fixed_alone(l, o, f, lim, 273.15, 343.15, 8, 0).st, status::domain);
  EXPECT_EQ(pumploss::drain_fixed_alone(l, o, f, lim, 273.15, 343.15, 8, 4).st, status::domain);
  EXPECT_EQ(pumploss::drain_fixed_alone(l, o, f, lim, 273.15, 343.15, 8, -2).st, status::domain);
  EXPECT_EQ(pumploss::drain_fixed_alone(l, o, f, lim, 273.15, 343.15, 1, 1).st, status::domain);
  const auto bad = pumploss::drain_fixed_alone(l, o, f, lim, kNaN, 343.15, 8, 1);
  EXPECT_EQ(bad.st, status::nonfinite);
  EXPECT_TRUE(std::isnan(bad.dp_pa));
  EXPECT_FALSE(bad.exceeds);
  // the 50-digit evaluation of the same template (cold end only: the worst case)
  pumploss::line<mp50> lm;
  lm.height_m = mp50("0.5");
  for (const auto& e : l.elements) {
    pumploss::line_element<mp50> m;
    m.kind = e.kind;
    m.diameter_m = mp50(e.diameter_m);
    m.length_m = mp50(e.length_m);
    m.roughness_m = mp50(e.roughness_m);
    m.n_points = e.n_points;
    m.q_points[0] = mp50(e.q_points[0]);
    m.dp_points[0] = mp50(e.dp_points[0]);
    m.nu_ref_m2_s = mp50(e.nu_ref_m2_s);
    m.nu_exponent = mp50(e.nu_exponent);
    lm.elements.push_back(m);
  }
  const auto om = pumploss::typical_mineral_oil(pumploss::d341_fit(mp50("313.15"), mp50("46e-6"), mp50("373.15"),
                                                                   mp50("6.9e-6")).value);
  const auto am = pumploss::drain_fixed_alone(lm, om, pumploss::drain_flow_parts(mp50(q), mp50(0), mp50(0)),
                                              pumploss::drain_limits<mp50>{mp50(0), mp50(1e5), mp50(1e5)},
                                              mp50("273.15"), mp50("343.15"), 8, 1);
  ASSERT_TRUE(am.usable());
  const double a1 = pumploss::drain_fixed_alone(l, o, f, lim, 273.15, 343.15, 8, 1).dp_pa;
  EXPECT_LT(std::fabs(a1 - static_cast<double>(am.dp_pa)) / a1, 1e-12);
}

TEST(DrainSizing, CApiNamesEachFixedElement) {
  pumploss_line* h = nullptr;
  ASSERT_EQ(pumploss_line_create(&h), PUMPLOSS_OK);
  ASSERT_EQ(pumploss_line_add_pipe(h, 0.0127, 5.0, 5e-6), PUMPLOSS_OK);
  const double q1[1] = {10.0 / 60000}, filter[1] = {0.8e5}, cooler[1] = {0.7e5}, check[1] = {0.05e5};
  ASSERT_EQ(pumploss_line_add_component_points(h, 1, q1, filter, 46e-6, 1.0), PUMPLOSS_OK);
  ASSERT_EQ(pumploss_line_add_component_points(h, 1, q1, cooler, 46e-6, 1.0), PUMPLOSS_OK);
  ASSERT_EQ(pumploss_line_add_component_points(h, 1, q1, check, 46e-6, 0.0), PUMPLOSS_OK);
  ASSERT_EQ(pumploss_line_set_height(h, 0.5), PUMPLOSS_OK);
  const auto o = vg46();
  ASSERT_EQ(pumploss_line_set_oil(h, 313.15, 46e-6, 373.15, 6.9e-6, o.rho_ref_kg_m3, o.t_ref_k), PUMPLOSS_OK);
  double d = 0, fixed = 0;
  int dom = 0, exceeds = 0;
  EXPECT_EQ(pumploss_line_size_drain_flow(h, 8.0 / 60000, 0, 0, 0, 0, 273.15, 343.15, 8, 0.0, 1e5, 1e5, 1.5, 3, &d,
                                          &fixed, &dom, &exceeds),
            PUMPLOSS_EVALIDITY);
  EXPECT_EQ(exceeds, 1);
  // every element and the static height, as an embedder would loop: the filter and the cooler
  std::vector<int> culprits;
  size_t count = 0;
  ASSERT_EQ(pumploss_line_element_count(h, &count), PUMPLOSS_OK);
  const auto l = two_culprits_line();
  const auto f = pumploss::drain_flow_parts(8.0 / 60000, 0.0, 0.0);
  for (int k = -1; k < static_cast<int>(count); ++k) {
    double dp = 0, t = 0;
    int alone = -1;
    const int code = pumploss_line_drain_fixed_alone(h, 8.0 / 60000, 0, 0, 0, 0, 273.15, 343.15, 8, 0.0, 1e5, 1e5, k,
                                                     &dp, &t, &alone);
    if (k == 0) {  // the hose: its drop depends on the bore
      EXPECT_EQ(code, PUMPLOSS_EDOMAIN);
      EXPECT_TRUE(std::isnan(dp));
      EXPECT_EQ(alone, 0);
      continue;
    }
    EXPECT_FALSE(PUMPLOSS_IS_ERROR(code)) << k;
    const auto a = pumploss::drain_fixed_alone(l, o, f, pumploss::drain_limits<double>{0.0, 1e5, 1e5}, 273.15, 343.15,
                                               8, k);
    EXPECT_EQ(dp, a.dp_pa) << k;
    if (alone == 1) culprits.push_back(k);
  }
  EXPECT_EQ(culprits, (std::vector<int>{1, 2}));
  double dp = 0, t = 0;
  int alone = 0;
  EXPECT_EQ(pumploss_line_drain_fixed_alone(nullptr, 8.0 / 60000, 0, 0, 0, 0, 273.15, 343.15, 8, 0.0, 1e5, 1e5, 1, &dp,
                                            &t, &alone),
            PUMPLOSS_EMISUSE);
  EXPECT_EQ(pumploss_line_drain_fixed_alone(h, 8.0 / 60000, 0, 0, 0, 0, 273.15, 343.15, 8, 0.0, 1e5, 1e5, 1, &dp, &t,
                                            nullptr),
            PUMPLOSS_EMISUSE);
  EXPECT_TRUE(std::isnan(dp));
  pumploss_line_destroy(h);
}

TEST(DrainCheck, CApiDrainTableSetterGivesTheTableCheck) {
  const auto l = drain_demo_line();
  const auto o = vg46();
  // a drain flow table from the constant + laminar truth model at five temperatures
  const auto truth = pumploss::drain_flow_parts(0.5 / 60000, 7.5 / 60000, 323.15);
  double tt[5], qq[5];
  for (int i = 0; i < 5; ++i) {
    tt[i] = 273.15 + 17.5 * i;
    qq[i] = pumploss::drain_flow_at(truth, o, tt[i]).value;
  }
  const auto table = pumploss::with_destroke_peak(pumploss::drain_flow_table(5, tt, qq).value, 25e-6, 0.1);
  const pumploss::drain_limits<double> lim{0.0, 1e5, 2e5};
  pumploss::drain_point<double> pts[10];
  const auto s = pumploss::drain_check(l, o, table, lim, 253.15, 343.15, 10, pts);
  ASSERT_TRUE(s.usable());
  pumploss_line* h = drain_demo_handle();
  ASSERT_NE(h, nullptr);
  ASSERT_EQ(pumploss_line_set_drain_table(h, 5, tt, qq), PUMPLOSS_OK);
  double t[10], q[10], p[10], pp[10];
  int pass[10];
  char verdict[200];
  auto check = [&](double q_constant, double q_laminar) {
    return pumploss_line_drain_check_flow(h, q_constant, q_laminar, 323.15, 25e-6, 0.1, 253.15, 343.15, 10, 0.0, 1e5,
                                          2e5, t, q, p, pp, pass, verdict, sizeof verdict);
  };
  EXPECT_EQ(check(0.0, 0.0), static_cast<int>(s.st));
  for (int i = 0; i < 10; ++i) {  // the same numbers as the C++ check with the table
    EXPECT_EQ(q[i], pts[i].q_m3_s) << i;
    EXPECT_EQ(p[i], pts[i].case_pressure_pa) << i;
    EXPECT_EQ(pp[i], pts[i].case_pressure_peak_pa) << i;
  }
  EXPECT_EQ(q[0], qq[0]);  // below the table: its first value held
  // the start temperature and the sizing read the table too
  const auto st = pumploss::drain_start_temperature(l, o, table, lim, 253.15, 343.15, 10, 1000e-6);
  double ts = 0, tl = 0, tv = 0;
  EXPECT_EQ(pumploss_line_drain_start(h, 0, 0, 0, 25e-6, 0.1, 253.15, 343.15, 10, 0.0, 1e5, 2e5, 1000e-6, &ts, &tl, &tv),
            static_cast<int>(st.st));
  EXPECT_EQ(ts, st.t_start_k);
  const auto z = pumploss::size_drain_line(l, o, table, lim, 273.15, 343.15, 10, 1.5, 3);
  double d = 0, fixed = 0;
  int dom = 0, exceeds = 0;
  EXPECT_EQ(pumploss_line_size_drain_flow(h, 0, 0, 0, 25e-6, 0.1, 273.15, 343.15, 10, 0.0, 1e5, 2e5, 1.5, 3, &d, &fixed,
                                          &dom, &exceeds),
            static_cast<int>(z.st));
  EXPECT_EQ(d, z.diameter_m);
  // two flow models at once: a misuse, NaN outputs
  EXPECT_EQ(check(0.5 / 60000, 0.0), PUMPLOSS_EMISUSE);
  EXPECT_TRUE(std::isnan(p[3]));
  EXPECT_EQ(pumploss_line_drain_start(h, 0, 7.5 / 60000, 323.15, 25e-6, 0.1, 253.15, 343.15, 10, 0.0, 1e5, 2e5, 0.0,
                                      &ts, &tl, &tv),
            PUMPLOSS_EMISUSE);
  // a refused table leaves the table as it was
  const double t_bad[2] = {300.0, 290.0}, q_bad[2] = {1e-4, 1e-4}, q_nan[2] = {1e-4, kNaN}, q_neg[2] = {1e-4, -1e-4};
  const double t17[17] = {}, q17[17] = {};
  EXPECT_EQ(pumploss_line_set_drain_table(h, 2, t_bad, q_bad), PUMPLOSS_EDOMAIN);
  EXPECT_EQ(pumploss_line_set_drain_table(h, 2, tt, q_nan), PUMPLOSS_ENONFINITE);
  EXPECT_EQ(pumploss_line_set_drain_table(h, 2, tt, q_neg), PUMPLOSS_EDOMAIN);
  EXPECT_EQ(pumploss_line_set_drain_table(h, 17, t17, q17), PUMPLOSS_EDOMAIN);
  EXPECT_EQ(pumploss_line_set_drain_table(h, 2, nullptr, q_bad), PUMPLOSS_EMISUSE);
  EXPECT_EQ(pumploss_line_set_drain_table(nullptr, 2, tt, qq), PUMPLOSS_EMISUSE);
  EXPECT_NE(std::string(pumploss_line_last_message(h)), "no error");
  EXPECT_EQ(check(0.0, 0.0), static_cast<int>(s.st));
  EXPECT_EQ(p[9], pts[9].case_pressure_pa);
  // count 0 removes the table: the parts are read again
  ASSERT_EQ(pumploss_line_set_drain_table(h, 0, tt, qq), PUMPLOSS_OK);
  const auto parts = pumploss::drain_check(l, o, pumploss::with_destroke_peak(truth, 25e-6, 0.1), lim, 253.15, 343.15,
                                           10, pts);
  EXPECT_EQ(check(0.5 / 60000, 7.5 / 60000), static_cast<int>(parts.st));
  EXPECT_EQ(p[9], pts[9].case_pressure_pa);
  pumploss_line_destroy(h);
}
