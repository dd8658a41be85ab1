// The root-finding toolbox (include/pumploss/detail/roots.hpp) and the dual-number derivatives
// of the inverse functions built on it, checked against a 50-digit central finite difference
// of the same inverse (pltest::mp50).
#include <gtest/gtest.h>

#include <boost/multiprecision/cpp_bin_float.hpp>
#include <cmath>

#include "pumploss/detail/roots.hpp"
#include "pumploss/fluid.hpp"
#include "pumploss/gap.hpp"
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

TEST(ImplicitDerivative, ErrorsPassThroughWithNaN) {
  using D1 = pumploss::dual<double, 1>;
  const auto r = pumploss::kinematic_from_sus(D1::variable(-1.0, 0));
  EXPECT_EQ(r.st, status::domain);
  EXPECT_TRUE(std::isnan(r.value.val));
  const auto g = pumploss::gap_annulus_clearance(D1(1e3), D1(1e6), D1(0.04), D1(0.02), D1(0.02), D1::variable(0.0, 0));
  EXPECT_EQ(g.st, status::domain);
}
