// Tests of line.hpp (fittings, lines, case drain check, sizing) and the line C API.
// Sources: tests/reference/SOURCES.md.
#include <gtest/gtest.h>

#include <cmath>
#include <string>
#include <vector>

#include "pumploss.h"
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
    const auto ft = pumploss::crane_ft(r.d);
    ASSERT_EQ(ft.st, status::ok);
    const double got = r.l_over_d == 0 ? ft.value : ft.value * r.l_over_d;
    // ft_Crane solves the same Colebrook equation with one Clamond iteration (fast=True) for
    // D >= 10 mm, accurate to about 5-8 digits by its own documentation: 5e-6 relative.
    EXPECT_NEAR(got / r.expected, 1, 5e-6) << r.source << " D " << r.d;
  }
  EXPECT_EQ(pumploss::crane_ft(0.0).st, status::domain);
  EXPECT_EQ(pumploss::crane_ft(2.0).st, status::regime);
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
  EXPECT_EQ(dp(pumploss::line_fitting_crane(0.012, kInf)), status::nonfinite);
  EXPECT_EQ(dp(pumploss::line_component_power(0.0, 1e5, 1.0, 46e-6, 1.0)), status::domain);
  EXPECT_EQ(dp(pumploss::line_component_power(1e-4, 1e5, 1.0, kNaN, 1.0)), status::nonfinite);
  // Crane's constant K in laminar flow is reported.
  EXPECT_EQ(dp(pumploss::line_fitting_crane(0.012, 8.0)), status::regime);
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
  EXPECT_EQ(pumploss_line_add_fitting_k(h, 0.0127, 1.0), PUMPLOSS_OK);
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
  EXPECT_EQ(pumploss_standard_bore(pumploss_standard_bore_count(), &d, &kind), PUMPLOSS_EDOMAIN);
  EXPECT_EQ(pumploss_standard_bore(0, &d, &kind), PUMPLOSS_OK);
  EXPECT_EQ(d, 0.004);
}
