// Tests of gap.hpp (clearance flows) and the gap part of the C API.
// Sources: tests/reference/SOURCES.md.
#include <gtest/gtest.h>

#include <boost/multiprecision/cpp_bin_float.hpp>
#include <cmath>
#include <cstring>
#include <random>

#include "pumploss.h"
#include "pumploss/gap.hpp"
#include "pumploss/orifice.hpp"
#include "test_support.hpp"

using pltest::kInf;
using pltest::kNaN;
using pltest::mp50;
using pltest::rel_err;
using pumploss::status;
using mp100 = boost::multiprecision::cpp_bin_float_100;

namespace {
struct ref_row {
  const char* source;
  const char* model;
  double x[6];
  double expected, tol;
};
const ref_row kRows[] = {
#include "reference/gap/methods13_selfcalc.ipp"
};

const double kPi = 3.141592653589793238;

// The textbook eccentric-annulus bracket (series as printed), evaluated in 100 digits: an
// independent oracle for the rearranged double evaluation. eps in (0, 1).
mp100 textbook_bracket(double ad, double bd, double epsd) {
  const mp100 a(ad), b(bd), eps(epsd);
  const mp100 c = eps * (a - b);
  const mp100 f = (a * a - b * b + c * c) / (2 * c);
  const mp100 m = sqrt(f * f - a * a);
  const mp100 al = log((f + m) / (f - m)) / 2;
  const mp100 be = log((f - c + m) / (f - c - m)) / 2;
  mp100 s = 0;
  const mp100 tol = std::numeric_limits<mp100>::epsilon() * 1e-5;
  for (int n = 1; n < 200000; ++n) {
    const mp100 term = n * exp(-n * (be + al)) / sinh(n * (be - al));
    s += term;
    if (term < tol * s) break;
  }
  return a * a * a * a - b * b * b * b - 4 * c * c * m * m / (be - al) - 8 * c * c * m * m * s;
}
// Textbook concentric form in 100 digits.
mp100 textbook_concentric(double ad, double bd) {
  const mp100 a(ad), b(bd);
  const mp100 a2 = a * a, b2 = b * b;
  return a2 * a2 - b2 * b2 - (a2 - b2) * (a2 - b2) / log(a / b);
}
double rel100(double got, const mp100& ref) { return static_cast<double>(abs((mp100(got) - ref) / ref)); }

const double kTs[] = {1e-7, 3e-7, 1e-6, 1e-5, 1e-4, 1e-3, 4e-3, 1e-2, 3e-2, 0.1, 0.2, 0.35, 0.5, 0.7, 0.9};
const double kEps[] = {0.0, 1e-14, 1e-10, 1e-8, 1e-6, 1e-3, 0.01, 0.1, 0.3, 0.5, 0.6, 0.7, 0.8,
                       0.85, 0.9, 0.95, 0.99, 0.999, 0.9999, 1 - 1e-6, 1 - 1e-9, 1 - 1e-12, 1 - 1e-15, 1.0};
}  // namespace

TEST(GapReference, MatchesReferenceTable) {
  for (const auto& r : kRows) {
    double got = kNaN;
    const double* x = r.x;
    if (!std::strcmp(r.model, "annulus")) {
      got = pumploss::gap_annulus_flow(x[0], x[1], x[2], x[3], x[4], x[5]).value;
    } else if (!std::strcmp(r.model, "narrow")) {
      // the table's narrow value uses D_m = 2 r_i + h = the mean diameter
      got = pumploss::gap_annulus_narrow_flow(x[0], x[1], x[2], x[3], x[4], x[5]).value;
    } else if (!std::strcmp(r.model, "radial")) {
      got = pumploss::gap_radial_flow(x[0], x[1], x[2], x[3], x[4]).value;
    } else if (!std::strcmp(r.model, "padforce")) {
      got = pumploss::gap_radial_land_force(x[0], x[1], x[2], x[3], x[4]).value + x[0] * kPi * x[2] * x[2];
    } else if (!std::strcmp(r.model, "orifice")) {
      got = pumploss::orifice_flow(x[0], x[1], x[2], x[3]).value;
    } else {
      FAIL() << "unknown model " << r.model;
    }
    EXPECT_LE(std::fabs(got / r.expected - 1), r.tol) << r.source << " " << r.model;
  }
}

TEST(GapAnnulus, ExactAgrees50DigitOverWholeRange) {
  // double against the same algorithm in cpp_bin_float_50 (cancellation-free, so the 50-digit
  // run is accurate to far below 1e-30): clearance/radius 1e-7..0.9, eps 0..1 inclusive.
  double worst = 0;
  for (double t : kTs) {
    for (double e : kEps) {
      const double b = 0.01, a = b * (1 + t);
      const auto got = pumploss::gap_annulus_flow(250e5, 0.04, 2 * a, 2 * b, 0.03, e);
      const auto ref = pumploss::gap_annulus_flow<mp50>(mp50(250e5), mp50(0.04), mp50(2 * a), mp50(2 * b), mp50(0.03),
                                                        mp50(e));
      ASSERT_EQ(got.st, status::ok);
      const double err = rel_err(got.value, ref.value);
      worst = std::max(worst, err);
      EXPECT_LE(err, 1e-12) << "t=" << t << " eps=" << e;
    }
  }
  RecordProperty("worst_rel_err", std::to_string(worst));
  std::printf("[ annulus exact vs mp50: worst relative error %.3g ]\n", worst);
}

TEST(GapAnnulus, RandomPointsAgree50Digit) {
  std::mt19937_64 rng(3);
  std::uniform_real_distribution<double> lt(std::log(1e-7), std::log(0.9)), ue(0.0, 1.0);
  double worst = 0;
  for (int i = 0; i < 600; ++i) {
    const double t = std::exp(lt(rng));
    const double u = ue(rng);
    const double e = i % 3 == 0 ? 1 - std::pow(10.0, -12 * u) : u;  // crowd towards 1 too
    const double b = 0.005 + 0.02 * ue(rng), a = b * (1 + t);
    const auto got = pumploss::gap_annulus_flow(1e6, 0.03, 2 * a, 2 * b, 0.02, e);
    const auto ref = pumploss::gap_annulus_flow<mp50>(mp50(1e6), mp50(0.03), mp50(2 * a), mp50(2 * b), mp50(0.02), mp50(e));
    const double err = rel_err(got.value, ref.value);
    worst = std::max(worst, err);
    EXPECT_LE(err, 1e-12) << "t=" << t << " eps=" << e;
  }
  std::printf("[ annulus random vs mp50: worst relative error %.3g ]\n", worst);
}

TEST(GapAnnulus, OracleAgreesWithTextbookSeriesIn100Digits) {
  // The 50-digit oracle (our rearrangement) against the textbook series in 100 digits (which
  // loses about 2 log10(1/t) digits to cancellation, leaving more than 80).
  const double ts[] = {1e-7, 1e-4, 1e-2, 0.3, 0.9};
  const double es[] = {0.0, 1e-6, 0.3, 0.7, 0.9, 0.99};
  double worst = 0;
  for (double t : ts) {
    for (double e : es) {
      const double b = 0.01, a = b * (1 + t);
      const mp100 tb = e == 0.0 ? textbook_concentric(a, b) : textbook_bracket(a, b, e);
      const mp50 ours = pumploss::detail::eccentric_bracket(mp50(a), mp50(b), mp50(e));
      const double err = static_cast<double>(abs((mp100(ours) - tb) / tb));
      worst = std::max(worst, err);
      EXPECT_LE(err, 1e-40) << "t=" << t << " eps=" << e;
      // and the double evaluation directly against the textbook oracle
      EXPECT_LE(rel100(pumploss::detail::eccentric_bracket(a, b, e), tb), 1e-12) << "t=" << t << " eps=" << e;
    }
  }
  std::printf("[ mp50 oracle vs 100-digit textbook series: worst %.3g ]\n", worst);
}

TEST(GapAnnulus, TextbookConcentricLosesDigitsOursDoesNot) {
  // The point of the rewrite: at t = 1e-6 the textbook double form has lost most digits.
  const double b = 0.01, a = b * (1 + 1e-6);
  const mp100 ref = textbook_concentric(a, b);
  const double textbook = pumploss::detail::annulus_concentric_textbook_bracket(a, b);
  EXPECT_GT(rel100(textbook, ref), 1e-6);
  EXPECT_LE(rel100(pumploss::detail::eccentric_bracket(a, b, 0.0), ref), 1e-15);
}

TEST(GapAnnulus, LimitsConcentricNarrowAndTouching) {
  // eps -> 0: continuous into the concentric formula
  for (double t : {1e-6, 1e-3, 0.5}) {
    const double b = 0.01, a = b * (1 + t);
    const double q0 = pumploss::gap_annulus_flow(1e6, 0.04, 2 * a, 2 * b, 0.02, 0.0).value;
    const double qs = pumploss::gap_annulus_flow(1e6, 0.04, 2 * a, 2 * b, 0.02, 1e-7).value;
    EXPECT_LE(std::fabs(qs / q0 - 1), 1e-13) << t;
    // eps -> 1: continuous into the touching closed form
    const double q1 = pumploss::gap_annulus_flow(1e6, 0.04, 2 * a, 2 * b, 0.02, 1.0).value;
    const double qn = pumploss::gap_annulus_flow(1e6, 0.04, 2 * a, 2 * b, 0.02, 1 - 1e-13).value;
    EXPECT_LE(std::fabs(qn / q1 - 1), 1e-11) << t;
  }
  // narrow-gap limit: exact / concentric -> 1 + 1.5 eps^2 (difference O(t))
  for (double e : {0.3, 0.6, 0.9, 1.0}) {
    const double b = 0.01, a = b * (1 + 1e-6);
    const double q0 = pumploss::gap_annulus_flow(1e6, 0.04, 2 * a, 2 * b, 0.02, 0.0).value;
    const double qe = pumploss::gap_annulus_flow(1e6, 0.04, 2 * a, 2 * b, 0.02, e).value;
    EXPECT_NEAR(qe / q0, 1 + 1.5 * e * e, 1e-5) << e;
    const double qn = pumploss::gap_annulus_narrow_flow(1e6, 0.04, 2 * a, 2 * b, 0.02, e).value;
    EXPECT_NEAR(qe / qn, 1.0, 1e-5) << e;
  }
  // wide gap, concentric: exact / narrow(D_m mean) = 1 + t^2/60 - t^3/60 + ... (docs/pages/theory_gap.md,
  // with D_m = 2 r_i + h)
  for (double t : {1e-3, 1e-2, 0.05}) {
    const double b = 0.01, a = b * (1 + t);
    const double qe = pumploss::gap_annulus_flow(1e6, 0.04, 2 * a, 2 * b, 0.02, 0.0).value;
    const double qn = pumploss::gap_annulus_narrow_flow(1e6, 0.04, 2 * a, 2 * b, 0.02, 0.0).value;
    const double series = 1 + t * t / 60 - t * t * t / 60 + 37 * t * t * t * t / 2520;
    EXPECT_NEAR(qe / qn, series, 0.02 * t * t * t * t * t + 1e-14) << t;  // next term about -0.0126 t^5
  }
  // self-calculated check (finite-difference Poisson solution): a = 7, b = 5, c = 1 differs from the narrow factor by
  // about 0.5 % and from a finite-difference Poisson solution by 0.07 %: here exact/narrow.
  const double qe = pumploss::gap_annulus_flow(1.0, 1.0, 14.0, 10.0, 1.0, 0.5).value;
  const double qn = pumploss::gap_annulus_narrow_flow(1.0, 1.0, 14.0, 10.0, 1.0, 0.5).value;
  EXPECT_GT(std::fabs(qe / qn - 1), 1e-3);
  EXPECT_LT(std::fabs(qe / qn - 1), 5e-2);
}

TEST(GapAnnulus, MonotoneInEccentricityAndLinearInDp) {
  const double b = 0.01, a = b * 1.001;
  double prev = 0;
  for (double e = 0; e <= 1.0; e += 0.05) {
    const double q = pumploss::gap_annulus_flow(1e6, 0.04, 2 * a, 2 * b, 0.02, std::min(e, 1.0)).value;
    EXPECT_GT(q, prev);
    prev = q;
  }
  const double q1 = pumploss::gap_annulus_flow(1e6, 0.04, 2 * a, 2 * b, 0.02, 0.4).value;
  const double q2 = pumploss::gap_annulus_flow(2e6, 0.02, 2 * a, 2 * b, 0.02, 0.4).value;
  EXPECT_NEAR(q2 / q1, 4.0, 1e-14);
  EXPECT_EQ(pumploss::gap_annulus_flow(0.0, 0.04, 2 * a, 2 * b, 0.02, 0.4).value, 0.0);
  EXPECT_LT(pumploss::gap_annulus_flow(-1e6, 0.04, 2 * a, 2 * b, 0.02, 0.4).value, 0.0);
}

TEST(GapAnnulus, BadInput) {
  const double bad[] = {kNaN, kInf, -kInf};
  for (double v : bad) {
    EXPECT_EQ(pumploss::gap_annulus_flow(v, 0.04, 0.02002, 0.02, 0.03, 0.0).st, status::nonfinite);
    EXPECT_EQ(pumploss::gap_annulus_flow(1e6, 0.04, 0.02002, 0.02, 0.03, v).st, status::nonfinite);
    EXPECT_TRUE(std::isnan(pumploss::gap_annulus_flow(1e6, 0.04, v, 0.02, 0.03, 0.0).value));
  }
  EXPECT_EQ(pumploss::gap_annulus_flow(1e6, 0.04, 0.02, 0.02, 0.03, 0.0).st, status::domain);    // zero gap
  EXPECT_EQ(pumploss::gap_annulus_flow(1e6, 0.04, 0.019, 0.02, 0.03, 0.0).st, status::domain);   // piston > bore
  EXPECT_EQ(pumploss::gap_annulus_flow(1e6, 0.04, 0.02002, 0.02, 0.03, -1e-300).st, status::domain);
  EXPECT_EQ(pumploss::gap_annulus_flow(1e6, 0.04, 0.02002, 0.02, 0.03, 1.0000000000000002).st, status::domain);
  EXPECT_EQ(pumploss::gap_annulus_flow(1e6, 0.0, 0.02002, 0.02, 0.03, 0.0).st, status::domain);
  EXPECT_EQ(pumploss::gap_annulus_flow(1e6, 0.04, 0.02002, -0.02, 0.03, 0.0).st, status::domain);
  EXPECT_EQ(pumploss::gap_annulus_flow(1e6, 0.04, 0.02002, 0.02, 0.0, 0.0).st, status::domain);
  EXPECT_TRUE(std::isnan(pumploss::gap_annulus_flow(1e6, 0.04, 0.02, 0.02, 0.03, 0.0).value));
  EXPECT_EQ(pumploss::gap_annulus_narrow_flow(1e6, 0.04, 0.03, 0.02, 0.03, 0.0).st, status::regime);
  EXPECT_EQ(pumploss::gap_annulus_drag_flow(0.02, 0.02002, 0.0, 1.0).st, status::domain);
  EXPECT_EQ(pumploss::gap_narrow_ratio(0.03, 0.02).st, status::regime);
  EXPECT_EQ(pumploss::gap_narrow_ratio(0.02002, 0.02).st, status::ok);
}

TEST(GapAnnulusDrag, Agrees50DigitAndLimits) {
  double worst = 0;
  for (double t : kTs) {
    for (double e : kEps) {
      const double b = 0.01, a = b * (1 + t);
      const double got = pumploss::gap_annulus_drag_flow(2 * a, 2 * b, e, 1.5).value;
      const mp50 ref = pumploss::gap_annulus_drag_flow(mp50(2 * a), mp50(2 * b), mp50(e), mp50(1.5)).value;
      worst = std::max(worst, rel_err(got, ref));
    }
  }
  EXPECT_LE(worst, 1e-14);
  std::printf("[ drag flow vs mp50: worst %.3g ]\n", worst);
  // concentric closed form pi U [(a^2-b^2)/(2 ln(a/b)) - b^2] in 100 digits (wide gap)
  const double a = 0.019, b = 0.01;
  const mp100 ma(a), mb(b);
  const mp100 ref = boost::math::constants::pi<mp100>() * 2 * ((ma * ma - mb * mb) / (2 * log(ma / mb)) - mb * mb);
  EXPECT_LE(rel100(pumploss::gap_annulus_drag_flow(2 * a, 2 * b, 0.0, 2.0).value, ref), 1e-14);
  // narrow gap: pi D_m h U / 2; touching: pi U b h
  const double qn = pumploss::gap_annulus_drag_flow(0.02000002, 0.02, 0.3, 1.0).value;
  EXPECT_NEAR(qn / (kPi * 0.02000001 * 1e-8 / 2), 1.0, 1e-6);
  EXPECT_NEAR(pumploss::gap_annulus_drag_flow(0.03, 0.02, 1.0, 1.0).value / (kPi * 0.01 * 0.005), 1.0, 1e-14);
  // piston leakage = pressure part + drag part
  const auto pl = pumploss::gap_piston_leakage(1e6, 0.04, 0.02002, 0.02, 0.03, 0.5, 0.2);
  EXPECT_DOUBLE_EQ(pl.value, pumploss::gap_annulus_flow(1e6, 0.04, 0.02002, 0.02, 0.03, 0.5).value +
                                 pumploss::gap_annulus_drag_flow(0.02002, 0.02, 0.5, 0.2).value);
}

TEST(GapAnnulusClearance, RoundTrip) {
  double worst = 0;
  for (double t : {1e-6, 1e-4, 1e-3, 0.05, 0.3, 0.8}) {
    for (double e : {0.0, 0.5, 1.0}) {
      const double a = 0.01, b = a - a * t / (1 + t), h = a - b;  // h exact
      const double q = pumploss::gap_annulus_flow(1e6, 0.04, 2 * a, 2 * b, 0.02, e).value;
      const auto hh = pumploss::gap_annulus_clearance(q, 1e6, 0.04, 2 * a, 0.02, e);
      ASSERT_EQ(hh.st, status::ok) << t << " " << e;
      worst = std::max(worst, std::fabs(hh.value / h - 1));
    }
  }
  EXPECT_LE(worst, 1e-14);
  EXPECT_EQ(pumploss::gap_annulus_clearance(1e3, 1e6, 0.04, 0.02, 0.02, 0.0).st, status::domain);  // too big
  EXPECT_EQ(pumploss::gap_annulus_clearance(-1e-6, 1e6, 0.04, 0.02, 0.02, 0.0).st, status::domain);
  EXPECT_EQ(pumploss::gap_annulus_clearance(kNaN, 1e6, 0.04, 0.02, 0.02, 0.0).st, status::nonfinite);
}

TEST(GapPlates, Agrees50DigitAndIdentities) {
  std::mt19937_64 rng(11);
  std::uniform_real_distribution<double> u(0.0, 1.0);
  double worst = 0, worst_pow = 0;
  for (int i = 0; i < 500; ++i) {
    const double dp = 1e4 + 4e7 * u(rng), mu = 0.005 + 0.2 * u(rng), w = 0.001 + 0.05 * u(rng);
    const double h = 1e-6 * std::pow(100.0, u(rng)), L = 0.001 + 0.05 * u(rng), U = 20 * u(rng);
    const double q = pumploss::gap_plates_flow(dp, mu, w, h, L, U).value;
    const mp50 qr = pumploss::gap_plates_flow<mp50>(dp, mu, w, h, L, U).value;
    worst = std::max(worst, rel_err(q, qr));
    const double p = pumploss::gap_plates_power_loss(dp, mu, w, h, L, U).value;
    const mp50 pr = pumploss::gap_plates_power_loss<mp50>(dp, mu, w, h, L, U).value;
    worst_pow = std::max(worst_pow, rel_err(p, pr));
    // P = dp q + F U (cross terms cancel)
    const mp50 f = pumploss::gap_plates_shear_force<mp50>(dp, mu, w, h, L, U).value;
    EXPECT_LE(static_cast<double>(abs((mp50(dp) * qr + f * mp50(U) - pr) / pr)), 1e-40);
  }
  EXPECT_LE(worst, 1e-14);
  EXPECT_LE(worst_pow, 1e-14);
  // velocity profile integrates to q/b (Simpson is exact for a quadratic)
  const double h = 2e-5, L = 0.01, U = 3.0, dp = 5e6, mu = 0.03;
  auto uu = [&](double y) { return pumploss::gap_plates_velocity(dp, mu, h, L, U, y).value; };
  const double integral = h / 6 * (uu(0) + 4 * uu(h / 2) + uu(h));
  EXPECT_NEAR(integral / (pumploss::gap_plates_flow(dp, mu, 1.0, h, L, U).value), 1.0, 1e-14);
  EXPECT_EQ(uu(0), 0.0);
  EXPECT_NEAR(uu(h), U, 1e-15);
}

TEST(GapPlates, HeightInversesClosedForm) {
  double worst = 0;
  const double ratios[] = {1e-8, 1e-4, 0.01, 0.3, 1.0, 3.0, 100.0, 1e4, 1e8};
  for (double rr : ratios) {
    for (double sign : {1.0, -0.5}) {
      // choose U so that Couette/pressure flow ratio at h = 1e-5 is rr (sign < 0: wall against flow)
      const double w = 0.02, L = 0.01, mu = 0.04, dp = 1e6, h = 1e-5;
      const double qp = w * h * h * h * dp / (12 * mu * L);
      const double U = sign * rr * qp * 2 / (w * h);
      const double q = pumploss::gap_plates_flow(dp, mu, w, h, L, U).value;
      if (!(q > 0)) continue;
      const auto hh = pumploss::gap_plates_height_couette(q, dp, mu, w, L, U);
      ASSERT_EQ(hh.st, status::ok) << rr << " " << sign;
      const mp50 hr = pumploss::gap_plates_height_couette<mp50>(mp50(q), mp50(dp), mp50(mu), mp50(w), mp50(L), mp50(U)).value;
      worst = std::max(worst, rel_err(hh.value, hr));
      // the 50-digit root reproduces the flow
      const mp50 qr = pumploss::gap_plates_flow<mp50>(mp50(dp), mp50(mu), mp50(w), hr, mp50(L), mp50(U)).value;
      EXPECT_LE(rel_err(q, qr), 1e-40);
      EXPECT_LE(std::fabs(hh.value / h - 1), 1e-9) << rr << " " << sign;
    }
  }
  EXPECT_LE(worst, 1e-14);
  std::printf("[ Couette cubic inverse vs mp50: worst %.3g ]\n", worst);
  // pure pressure inverse
  const double q = pumploss::gap_plates_flow(1e6, 0.04, 0.02, 1e-5, 0.01, 0.0).value;
  EXPECT_NEAR(pumploss::gap_plates_height(q, 1e6, 0.04, 0.02, 0.01).value / 1e-5, 1.0, 1e-15);
  EXPECT_NEAR(pumploss::gap_plates_height_couette(q, 1e6, 0.04, 0.02, 0.01, 0.0).value / 1e-5, 1.0, 1e-15);
  // dp = 0: Couette only
  EXPECT_NEAR(pumploss::gap_plates_height_couette(1e-6, 0.0, 0.04, 0.02, 0.01, 1.0).value, 1e-4, 1e-19);
  EXPECT_EQ(pumploss::gap_plates_height_couette(1e-6, 0.0, 0.04, 0.02, 0.01, -1.0).st, status::domain);
  EXPECT_EQ(pumploss::gap_plates_height_couette(0.0, 1e6, 0.04, 0.02, 0.01, 1.0).st, status::domain);
  EXPECT_EQ(pumploss::gap_plates_height(1e-6, -1e6, 0.04, 0.02, 0.01).st, status::domain);
  EXPECT_EQ(pumploss::gap_plates_height(kNaN, 1e6, 0.04, 0.02, 0.01).st, status::nonfinite);
}

TEST(GapPlates, BadInput) {
  EXPECT_EQ(pumploss::gap_plates_flow(1e6, 0.04, 0.02, 0.0, 0.01, 0.0).st, status::domain);
  EXPECT_EQ(pumploss::gap_plates_flow(1e6, 0.04, 0.02, -1e-5, 0.01, 0.0).st, status::domain);
  EXPECT_EQ(pumploss::gap_plates_flow(1e6, -0.04, 0.02, 1e-5, 0.01, 0.0).st, status::domain);
  EXPECT_EQ(pumploss::gap_plates_flow(kNaN, 0.04, 0.02, 1e-5, 0.01, 0.0).st, status::nonfinite);
  EXPECT_EQ(pumploss::gap_plates_flow(1e6, 0.04, 0.02, 1e-5, 0.01, kInf).st, status::nonfinite);
  EXPECT_TRUE(std::isnan(pumploss::gap_plates_flow(1e6, 0.04, 0.02, 0.0, 0.01, 0.0).value));
  EXPECT_EQ(pumploss::gap_plates_velocity(1e6, 0.04, 1e-5, 0.01, 0.0, -1e-9).st, status::domain);
  EXPECT_EQ(pumploss::gap_plates_shear_force(1e6, 0.04, 0.02, 0.0, 0.01, 0.0).st, status::domain);
  EXPECT_EQ(pumploss::gap_plates_power_loss(1e6, 0.04, 0.0, 1e-5, 0.01, 0.0).st, status::domain);
}

TEST(GapRadial, Agrees50DigitAndIdentities) {
  std::mt19937_64 rng(5);
  std::uniform_real_distribution<double> u(0.0, 1.0);
  double worst = 0;
  for (int i = 0; i < 400; ++i) {
    const double ri = 0.002 + 0.03 * u(rng);
    const double ro = ri * (1 + std::pow(10.0, -6 + 6.3 * u(rng)));
    const double h = 1e-6 * std::pow(100.0, u(rng)), dp = 1e7 * u(rng) + 1, mu = 0.01 + 0.1 * u(rng);
    const double phi = 0.1 + 6 * u(rng);
    worst = std::max(worst, rel_err(pumploss::gap_radial_flow(dp, mu, ri, ro, h).value,
                                    pumploss::gap_radial_flow<mp50>(dp, mu, ri, ro, h).value));
    worst = std::max(worst, rel_err(pumploss::gap_radial_sector_flow(dp, mu, ri, ro, h, phi).value,
                                    pumploss::gap_radial_sector_flow<mp50>(dp, mu, ri, ro, h, phi).value));
    worst = std::max(worst, rel_err(pumploss::gap_radial_land_force(dp, 2e5, ri, ro, phi).value,
                                    pumploss::gap_radial_land_force<mp50>(dp, 2e5, ri, ro, phi).value));
    const double q = pumploss::gap_radial_flow(dp, mu, ri, ro, h).value;
    EXPECT_LE(std::fabs(pumploss::gap_radial_height(q, dp, mu, ri, ro).value / h - 1), 1e-15);
    // land force against the textbook closed form in 100 digits (p_o = 0)
    const mp100 mri(ri), mro(ro), mdp(dp), mphi(phi);
    const mp100 fr = mphi * mdp * ((mro * mro - mri * mri) / (4 * log(mro / mri)) - mri * mri / 2);
    EXPECT_LE(rel100(pumploss::gap_radial_land_force(dp, 0.0, ri, ro, phi).value, fr), 1e-14);
  }
  EXPECT_LE(worst, 1e-14);
  std::printf("[ radial flow/sector/force vs mp50: worst %.3g ]\n", worst);
  // p(r) at the ends and the sector = full disc at 2 pi
  EXPECT_EQ(pumploss::gap_radial_pressure(5e6, 1e5, 0.01, 0.02, 0.02).value, 1e5);
  EXPECT_NEAR(pumploss::gap_radial_pressure(5e6, 1e5, 0.01, 0.02, std::sqrt(0.01 * 0.02)).value, 2.55e6, 1e-8);
  EXPECT_DOUBLE_EQ(pumploss::gap_radial_sector_flow(1e6, 0.04, 0.01, 0.02, 1e-5, 2 * kPi).value,
                   pumploss::gap_radial_flow(1e6, 0.04, 0.01, 0.02, 1e-5).value);
}

TEST(GapRadial, BadInput) {
  EXPECT_EQ(pumploss::gap_radial_flow(1e6, 0.04, 0.02, 0.02, 1e-5).st, status::domain);
  EXPECT_EQ(pumploss::gap_radial_flow(1e6, 0.04, 0.0, 0.02, 1e-5).st, status::domain);
  EXPECT_EQ(pumploss::gap_radial_flow(1e6, 0.04, 0.01, 0.02, 0.0).st, status::domain);
  EXPECT_EQ(pumploss::gap_radial_flow(1e6, kNaN, 0.01, 0.02, 1e-5).st, status::nonfinite);
  EXPECT_EQ(pumploss::gap_radial_sector_flow(1e6, 0.04, 0.01, 0.02, 1e-5, -1.0).st, status::domain);
  EXPECT_EQ(pumploss::gap_radial_pressure(1e6, 0.0, 0.01, 0.02, 0.005).st, status::domain);
  EXPECT_EQ(pumploss::gap_radial_land_force(1e6, 0.0, 0.01, 0.02, 7.0).st, status::domain);
  EXPECT_EQ(pumploss::gap_radial_height(1e-6, 1e6, 0.04, 0.02, 0.01).st, status::domain);
}

TEST(GapPad, CapillaryAndOrificeAgree50DigitAndRoundTrip) {
  double worst = 0;
  for (double h : {2e-6, 8e-6, 15e-6, 40e-6}) {
    const auto c = pumploss::gap_pad_capillary(250e5, 0.04, 0.8e-3, 0.02, 0.005, 0.008, h, 0.02);
    const auto cm = pumploss::gap_pad_capillary<mp50>(250e5, 0.04, 0.8e-3, 0.02, 0.005, 0.008, h, 0.02);
    ASSERT_EQ(c.st, status::ok);
    worst = std::max({worst, rel_err(c.pocket_pressure_pa, cm.pocket_pressure_pa), rel_err(c.q_m3_s, cm.q_m3_s),
                      rel_err(c.force_n, cm.force_n), rel_err(c.balance_ratio, cm.balance_ratio)});
    // flow balance: capillary flow = land flow
    const double qland = pumploss::gap_radial_flow(c.pocket_pressure_pa, 0.04, 0.005, 0.008, h).value;
    EXPECT_NEAR(qland / c.q_m3_s, 1.0, 1e-14);
    // force = p_r pi ri^2 + land force
    const double w = c.pocket_pressure_pa * kPi * 0.005 * 0.005 +
                     pumploss::gap_radial_land_force(c.pocket_pressure_pa, 0.0, 0.005, 0.008, 2 * kPi).value;
    EXPECT_NEAR(w / c.force_n, 1.0, 1e-14);
    // the inverse is ill-conditioned when p_r approaches p_s (small gaps): p_s - p_r cancels
    const double cond = 250e5 / (250e5 - c.pocket_pressure_pa);
    EXPECT_NEAR(pumploss::gap_pad_capillary_height(250e5, 0.04, 0.8e-3, 0.02, 0.005, 0.008, c.force_n).value / h, 1.0, 1e-15 * cond);

    const auto o = pumploss::gap_pad_orifice(250e5, 870.0, 0.04, 0.4e-3, 0.7, 0.005, 0.008, h, 0.02);
    const auto om = pumploss::gap_pad_orifice<mp50>(250e5, 870.0, 0.04, 0.4e-3, 0.7, 0.005, 0.008, h, 0.02);
    ASSERT_EQ(o.st, status::ok);
    worst = std::max({worst, rel_err(o.pocket_pressure_pa, om.pocket_pressure_pa), rel_err(o.q_m3_s, om.q_m3_s),
                      rel_err(o.force_n, om.force_n)});
    const double qor = pumploss::orifice_flow(250e5 - o.pocket_pressure_pa, 870.0, 0.4e-3, 0.7).value;
    const double ocond = 250e5 / (250e5 - o.pocket_pressure_pa);
    EXPECT_NEAR(qor / o.q_m3_s, 1.0, 2e-15 * ocond);
    EXPECT_NEAR(pumploss::gap_pad_orifice_height(250e5, 870.0, 0.04, 0.4e-3, 0.7, 0.005, 0.008, o.force_n).value / h,
                1.0, 2e-15 * ocond);
  }
  EXPECT_LE(worst, 1e-14);
  // a larger gap lowers the pocket pressure; the load that can be carried is below p_s A_eff
  const auto lo = pumploss::gap_pad_capillary(250e5, 0.04, 0.8e-3, 0.02, 0.005, 0.008, 5e-6, 0.02);
  const auto hi = pumploss::gap_pad_capillary(250e5, 0.04, 0.8e-3, 0.02, 0.005, 0.008, 50e-6, 0.02);
  EXPECT_GT(lo.pocket_pressure_pa, hi.pocket_pressure_pa);
  EXPECT_EQ(pumploss::gap_pad_capillary_height(250e5, 0.04, 0.8e-3, 0.02, 0.005, 0.008, 1e7).st, status::domain);
  EXPECT_EQ(pumploss::gap_pad_orifice(250e5, 870.0, 0.04, 0.4e-3, 0.0, 0.005, 0.008, 1e-5, 0.02).st, status::domain);
  EXPECT_TRUE(std::isnan(pumploss::gap_pad_orifice(kNaN, 870.0, 0.04, 0.4e-3, 0.7, 0.005, 0.008, 1e-5, 0.02).force_n));
}

TEST(GapValidity, ReynoldsNumbers) {
  EXPECT_EQ(pumploss::gap_reynolds(1e-5, 0.06, 870.0, 0.04).st, status::ok);
  EXPECT_EQ(pumploss::gap_reynolds(1.0, 0.06, 870.0, 0.04).st, status::regime);
  EXPECT_EQ(pumploss::gap_reduced_reynolds(1e-4, 0.06, 1e-3, 1e-3, 870.0, 0.001).st, status::regime);
  EXPECT_EQ(pumploss::gap_reduced_reynolds(1e-6, 0.06, 1e-5, 0.03, 870.0, 0.04).st, status::ok);
  // selfcalc_methods13 (tests/reference/SOURCES.md): Re_Dh = 0.076 at q = 6.5483e-3 L/min, b = pi * 20 mm, rho 870
  const double q = 6.5483e-3 / 60000.0;
  EXPECT_NEAR(pumploss::gap_reynolds(q, kPi * 0.02001, 870.0, 0.040).value, 0.076, 0.0005);
  EXPECT_EQ(pumploss::gap_reynolds(q, 0.0, 870.0, 0.04).st, status::domain);
}

TEST(GapCapi, MatchesTemplatesAndNaNOnError) {
  double q = 0;
  ASSERT_EQ(pumploss_gap_annulus_flow(250e5, 0.04, 0.02002, 0.02, 0.03, 0.7, &q), PUMPLOSS_OK);
  EXPECT_EQ(q, pumploss::gap_annulus_flow(250e5, 0.04, 0.02002, 0.02, 0.03, 0.7).value);
  EXPECT_EQ(pumploss_gap_annulus_flow(250e5, 0.04, 0.02002, 0.02, 0.03, kNaN, &q), PUMPLOSS_ENONFINITE);
  EXPECT_TRUE(std::isnan(q));
  EXPECT_EQ(pumploss_gap_plates_flow(1e6, 0.04, 0.01, 1e-5, 0.02, 0.0, nullptr), PUMPLOSS_EMISUSE);
  ASSERT_EQ(pumploss_gap_radial_flow(250e5, 0.04, 0.02, 0.03, 15e-6, &q), PUMPLOSS_OK);
  EXPECT_EQ(q, pumploss::gap_radial_flow(250e5, 0.04, 0.02, 0.03, 15e-6).value);
  const double dp[2] = {1e6, 1e6}, mu[2] = {0.04, 0.04}, w[2] = {0.01, 0.01}, h[2] = {1e-5, -1.0},
               l[2] = {0.02, 0.02}, u[2] = {0.0, 0.0};
  double out[2];
  int st[2];
  EXPECT_EQ(pumploss_gap_plates_flow_batch(2, dp, mu, w, h, l, u, out, st), PUMPLOSS_EPARTIAL);
  EXPECT_EQ(st[0], PUMPLOSS_OK);
  EXPECT_EQ(st[1], PUMPLOSS_EDOMAIN);
  EXPECT_TRUE(std::isnan(out[1]));
}

TEST(GapTypes, CompilesForLongDouble) {
  const long double q = pumploss::gap_annulus_flow<long double>(1e6L, 0.04L, 0.02002L, 0.02L, 0.03L, 0.5L).value;
  const mp50 r = pumploss::gap_annulus_flow<mp50>(1e6, 0.04, 0.02002L, 0.02L, 0.03, 0.5).value;
  EXPECT_LE(static_cast<double>(abs((mp50(q) - r) / r)), 1e-15);
}
