// The root-finding toolbox (include/pumploss/detail/roots.hpp) and the dual-number derivatives
// of the inverse functions built on it, checked against a 50-digit central finite difference
// of the same inverse (pltest::mp50).
#include <gtest/gtest.h>

#include <boost/multiprecision/cpp_bin_float.hpp>
#include <cmath>
#include <utility>
#include <vector>

#include "pumploss/detail/roots.hpp"
#include "pumploss/fluid.hpp"
#include "pumploss/gap.hpp"
#include "pumploss/line.hpp"
#include "pumploss/piston_pump.hpp"
#include "test_support.hpp"

using pltest::mp50;
using pumploss::status;
namespace detail = pumploss::detail;

namespace {
constexpr int kCap = pumploss::scalar_traits<double>::max_iterations;
const double kTol = 4 * std::numeric_limits<double>::epsilon();
}  // namespace

TEST(RootsBrent, CubeRootOfTwoToTheLastUlps) {
  auto f = [](double x) { return x * x * x - 2; };
  const auto r = detail::brent(f, 0.0, 2.0, f(0.0), f(2.0), kTol, 0.0, kCap);
  ASSERT_EQ(r.st, status::ok);
  EXPECT_LE(pltest::ulp_distance(r.x, std::cbrt(2.0)), 4.0);  // reference: the C library's cbrt
  EXPECT_GT(r.iterations, 0);
  EXPECT_LT(r.iterations, 20);
}

TEST(RootsBrent, FiftyDigitsInMultiprecision) {
  // the fixed point of cos, x = cos x (Dottie number), against a Newton solve in mp50
  auto f = [](mp50 x) { return x - cos(x); };
  const mp50 tol = 4 * std::numeric_limits<mp50>::epsilon();
  const auto r = detail::brent(f, mp50(0), mp50(1), f(mp50(0)), f(mp50(1)), tol, mp50(0), kCap);
  ASSERT_EQ(r.st, status::ok);
  mp50 x = mp50("0.74");
  for (int i = 0; i < 20; ++i) x -= (x - cos(x)) / (1 + sin(x));
  EXPECT_LT(abs(r.x - x), mp50("1e-48"));
}

TEST(RootsBrent, CapReachedReportsNoConvergenceAndTheIterationsUsed) {
  auto f = [](double x) { return std::exp(x) - 3; };
  const auto r = detail::brent(f, -50.0, 50.0, f(-50.0), f(50.0), kTol, 0.0, 3);
  EXPECT_EQ(r.st, status::no_convergence);
  EXPECT_EQ(r.iterations, 3);
}

TEST(RootsBrent, BadBracketsAndBadValues) {
  auto f = [](double x) { return x * x + 1; };
  EXPECT_EQ(detail::brent(f, -1.0, 1.0, f(-1.0), f(1.0), kTol, 0.0, kCap).st, status::domain);
  auto g = [](double x) { return x > 0.25 ? std::nan("") : x - 0.5; };
  EXPECT_EQ(detail::brent(g, 0.0, 1.0, -0.5, 0.5, kTol, 0.0, kCap).st, status::nonfinite);
  EXPECT_EQ(detail::brent(g, 0.0, 1.0, pltest::kNaN, 0.5, kTol, 0.0, kCap).st, status::nonfinite);
  // an end that is already a root
  const auto r = detail::brent(f, 0.0, 1.0, 0.0, 2.0, kTol, 0.0, kCap);
  EXPECT_EQ(r.st, status::ok);
  EXPECT_EQ(r.x, 0.0);
  EXPECT_EQ(r.iterations, 0);
}

TEST(RootsNewtonBisect, SafeguardedNewtonFindsTheRootAndKeepsInsideTheBracket) {
  // x^3 - 2 x - 5 = 0 (Wallis's cubic; root 2.0945514815423265..., checked here in mp50)
  auto fdf = [](double x) { return detail::value_slope<double>{x * x * x - 2 * x - 5, 3 * x * x - 2}; };
  const auto r = detail::newton_bisect(fdf, 2.0, 3.0, 2.0, kTol, kCap);
  ASSERT_EQ(r.st, status::ok);
  mp50 w = 2;
  for (int i = 0; i < 12; ++i) w -= (w * w * w - 2 * w - 5) / (3 * w * w - 2);
  EXPECT_LE(pltest::ulps(r.x, w), 2.0);
  // Newton from 0.8 on the same bracket would leave it at once: bisection steps keep it inside
  auto flat = [](double x) { return detail::value_slope<double>{std::atan(x - 1.2), 1 / (1 + (x - 1.2) * (x - 1.2))}; };
  const auto b = detail::newton_bisect(flat, -10.0, 30.0, 29.0, kTol, kCap);
  ASSERT_EQ(b.st, status::ok);
  EXPECT_NEAR(b.x, 1.2, 1e-15);
  EXPECT_EQ(detail::newton_bisect(fdf, 2.0, 3.0, 2.0, kTol, 1).st, status::no_convergence);
}

TEST(RootsExpandBracket, DoublesUntilTheSignChanges) {
  auto f = [](double q) { return q * q - 1e6; };
  const auto br = detail::expand_bracket(f, 1e-9, f(1e-9), [](double q) { return 2 * q; }, kCap);
  ASSERT_EQ(br.st, status::ok);
  EXPECT_LT(br.fa, 0.0);
  EXPECT_GE(br.fb, 0.0);
  EXPECT_EQ(br.b, 2 * br.a);
  EXPECT_EQ(detail::expand_bracket(f, 1e-9, f(1e-9), [](double q) { return 2 * q; }, 5).st, status::no_convergence);
}

namespace {

/// Relative difference, or absolute below 1e-300.
double rel_diff(double a, double b) {
  const double s = std::fabs(b) > 1e-300 ? std::fabs(b) : 1.0;
  return std::fabs(a - b) / s;
}

/// Central finite difference of F in 50 digits, step h (relative 1e-18 of the point).
template <class F>
double central_difference(F&& f, const mp50& x) {
  const mp50 h = (x == 0 ? mp50(1) : abs(x)) * mp50("1e-18");
  return pltest::to_double((f(x + h) - f(x - h)) / (2 * h));
}

}  // namespace

TEST(ImplicitDerivative, KinematicFromSusAgainst50DigitDifference) {
  using D1 = pumploss::dual<double, 1>;
  for (double sus : {33.0, 45.0, 214.19, 700.0, 5000.0}) {
    const auto r = pumploss::kinematic_from_sus(D1::variable(sus, 0));
    ASSERT_TRUE(r.usable()) << sus;
    EXPECT_EQ(r.value.val, pumploss::kinematic_from_sus(sus).value);
    const double ref = central_difference([](const mp50& s) { return pumploss::kinematic_from_sus(s).value; }, mp50(sus));
    EXPECT_LT(rel_diff(r.value.d[0], ref), 1e-13) << sus << " " << r.value.d[0] << " " << ref;
  }
}

TEST(ImplicitDerivative, AnnulusClearanceAgainst50DigitDifferenceInEveryInput) {
  using D6 = pumploss::dual<double, 6>;
  // piston 20 mm in a bore 20.02 mm (h = 10 um), 30 mm long, 250 bar, 0.040 Pa s
  for (double eps : {0.0, 0.3, 0.9}) {
    const double x[6] = {pumploss::gap_annulus_flow(250e5, 0.040, 0.02002, 0.020, 0.030, eps).value, 250e5, 0.040,
                         0.02002, 0.030, eps};
    D6 in[6];
    for (int i = 0; i < 6; ++i) in[i] = D6::variable(x[i], static_cast<std::size_t>(i));
    const auto r = pumploss::gap_annulus_clearance(in[0], in[1], in[2], in[3], in[4], in[5]);
    ASSERT_EQ(r.st, status::ok) << eps;
    EXPECT_EQ(r.value.val, pumploss::gap_annulus_clearance(x[0], x[1], x[2], x[3], x[4], x[5]).value);
    EXPECT_NEAR(r.value.val, 1e-5, 1e-5 * 1e-12);
    for (int i = 0; i < 6; ++i) {
      if (i == 5 && eps == 0.0) continue;  // eps >= 0: no central difference at the edge
      auto h_of = [&](const mp50& v) {
        mp50 a[6];
        for (int k = 0; k < 6; ++k) a[k] = mp50(x[k]);
        a[i] = v;
        return pumploss::gap_annulus_clearance(a[0], a[1], a[2], a[3], a[4], a[5]).value;
      };
      const double ref = central_difference(h_of, mp50(x[i]));
      EXPECT_LT(rel_diff(r.value.d[i], ref), 1e-10) << "eps " << eps << " input " << i << ": " << r.value.d[i]
                                                    << " vs " << ref;
    }
  }
}

TEST(ImplicitDerivative, LineFlowForPressureAgainst50DigitDifferenceInEveryInput) {
  // An invented drain line: entrance K, 6 m of 12.7 mm tube, a Hooper elbow, exit; 0.8 m rise.
  // Inputs seeded: height, dp, rho, mu and the tube's bore (an element in dual numbers).
  using D5 = pumploss::dual<double, 5>;
  auto make = [](auto d, auto k_in) {
    using U = decltype(d);
    return std::vector<pumploss::line_element<U>>{
        pumploss::line_fitting_k(U(0.0127), k_in), pumploss::line_pipe(d, U(6.0), U(1.5e-6)),
        pumploss::line_fitting_hooper(U(0.0127), U(800.0), U(0.4)), pumploss::line_fitting_k(U(0.0127), U(1.0))};
  };
  // laminar (0.5 Pa s) and turbulent (0.002 Pa s) flow, away from the transition bridge
  for (const auto& c : {std::pair<double, double>{0.5, 3e-4}, std::pair<double, double>{0.002, 2e-3}}) {
    const double mu = c.first;
    const auto line_d = make(0.0127, 0.57);
    const double dp = pumploss::line_pressure_drop(line_d.data(), line_d.size(), 0.8, c.second, 870.0, mu).dp_pa;
    const double x[5] = {0.8, dp, 870.0, mu, 0.0127};
    const auto line_dual = make(D5::variable(x[4], 4), D5(0.57));
    const auto r = pumploss::line_flow_for_pressure(line_dual.data(), line_dual.size(), D5::variable(x[0], 0),
                                                    D5::variable(x[1], 1), D5::variable(x[2], 2), D5::variable(x[3], 3));
    ASSERT_TRUE(r.usable()) << mu;
    EXPECT_EQ(r.value.val,
              pumploss::line_flow_for_pressure(line_d.data(), line_d.size(), x[0], x[1], x[2], x[3]).value);
    for (int i = 0; i < 5; ++i) {
      auto q_of = [&](const mp50& v) {
        mp50 a[5];
        for (int k = 0; k < 5; ++k) a[k] = mp50(x[k]);
        a[i] = v;
        const auto l = make(a[4], mp50(0.57));
        return pumploss::line_flow_for_pressure(l.data(), l.size(), a[0], a[1], a[2], a[3]).value;
      };
      const double ref = central_difference(q_of, mp50(x[i]));
      EXPECT_LT(rel_diff(r.value.d[i], ref), 1e-10) << "mu " << mu << " input " << i << ": " << r.value.d[i]
                                                    << " vs " << ref;
    }
  }
  // errors pass through with NaN
  const auto l = make(D5(0.0127), D5(0.57));
  const auto e = pumploss::line_flow_for_pressure(l.data(), l.size(), D5(0.8), D5(1000.0), D5(870.0), D5(0.04));
  EXPECT_EQ(e.st, status::out_of_validity);
  EXPECT_TRUE(std::isnan(e.value.val));
}

TEST(ImplicitDerivative, GapGrowthForDrainAgainst50DigitDifference) {
  // An invented pump of about 70 cm3/rev (plausible dimensions, no real product; as
  // piston_pump_test.cpp's). Seeded: the measured drain, the outlet pressure, the oil
  // temperature and the bore clearance (a member of the description).
  pumploss::piston_pump<double> base;
  base.pistons = 9;
  base.piston_diameter_m = 20e-3;
  base.engaged_length_min_m = 20e-3;
  base.pitch_radius_m = 34e-3;
  base.max_swash_angle_rad = 0.3490658503988659;  // 20 degrees
  base.slipper_pocket_radius_m = 9.5e-3;
  base.slipper_outer_radius_m = 11.5e-3;
  base.slipper_gap_m = 12e-6;
  base.slipper_feed_diameter_m = 0.8e-3;
  base.slipper_feed_length_m = 60e-3;
  base.ball_diameter_m = 14e-3;
  base.ball_clearance_m = 8e-6;
  base.ball_length_m = 4e-3;
  base.valve_inner_land_inner_radius_m = 31e-3;
  base.valve_inner_land_outer_radius_m = 34e-3;
  base.valve_outer_land_inner_radius_m = 44e-3;
  base.valve_outer_land_outer_radius_m = 47e-3;
  base.valve_kidney_arc_rad = 2.6179938779914944;  // 150 degrees
  base.valve_gap_m = 10e-6;
  base.controller_flow_m3_s = 0.5e-3 / 60;
  auto make_pump = [&](auto bore) {
    auto p = pumploss::piston_pump_cast<decltype(bore)>(base);
    p.bore_clearance_m = bore;
    return p;
  };
  const auto oil = pumploss::typical_mineral_oil(pumploss::d341_fit(313.15, 46e-6, 373.15, 6.8e-6).value);
  using D4 = pumploss::dual<double, 4>;
  const pumploss::pump_operating_point<double> op{250e5, 1e5, 25.0, 1.0, 323.15};
  auto worn = make_pump(15e-6);
  worn.valve_gap_m *= 1.25;
  const double x[4] = {pumploss::piston_pump_budget(worn, oil, op).total_m3_s, 250e5, 323.15, 15e-6};
  auto op_in = [&](auto outlet, auto t) {
    using U = decltype(outlet);
    return pumploss::pump_operating_point<U>{outlet, U(1e5), U(25.0), U(1.0), t};
  };
  const auto r = pumploss::gap_growth_for_drain(make_pump(D4::variable(x[3], 3)), pumploss::detail::oil_cast<D4>(oil),
                                                op_in(D4::variable(x[1], 1), D4::variable(x[2], 2)),
                                                pumploss::pump_gap::valve, D4::variable(x[0], 0));
  ASSERT_EQ(r.st, status::ok);
  EXPECT_NEAR(r.value.val, 0.25, 1e-9);
  EXPECT_EQ(r.value.val,
            pumploss::gap_growth_for_drain(make_pump(x[3]), oil, op_in(x[1], x[2]), pumploss::pump_gap::valve, x[0]).value);
  const auto oil50 = pumploss::detail::oil_cast<mp50>(oil);
  for (int i = 0; i < 4; ++i) {
    auto g_of = [&](const mp50& v) {
      mp50 a[4];
      for (int k = 0; k < 4; ++k) a[k] = mp50(x[k]);
      a[i] = v;
      return pumploss::gap_growth_for_drain(make_pump(a[3]), oil50, op_in(a[1], a[2]), pumploss::pump_gap::valve, a[0])
          .value;
    };
    const double ref = central_difference(g_of, mp50(x[i]));
    EXPECT_LT(rel_diff(r.value.d[i], ref), 1e-9) << "input " << i << ": " << r.value.d[i] << " vs " << ref;
  }
  const auto e = pumploss::gap_growth_for_drain(make_pump(D4(15e-6)), pumploss::detail::oil_cast<D4>(oil),
                                                op_in(D4(250e5), D4(323.15)), pumploss::pump_gap::valve, D4(-1.0));
  EXPECT_EQ(e.st, status::domain);
  EXPECT_TRUE(std::isnan(e.value.val));
}

TEST(ImplicitDerivative, ErrorsPassThroughWithNaN) {
  using D1 = pumploss::dual<double, 1>;
  const auto r = pumploss::kinematic_from_sus(D1::variable(-1.0, 0));
  EXPECT_EQ(r.st, status::domain);
  EXPECT_TRUE(std::isnan(r.value.val));
  const auto g = pumploss::gap_annulus_clearance(D1(1e3), D1(1e6), D1(0.04), D1(0.02), D1(0.02), D1::variable(0.0, 0));
  EXPECT_EQ(g.st, status::domain);
}
