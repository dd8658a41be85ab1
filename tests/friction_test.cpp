// Tests of friction.hpp and its C wrappers. Sources: tests/reference/SOURCES.md.
#include <gtest/gtest.h>

#include <algorithm>
#include <cmath>
#include <string>

#include "pumploss.h"
#include "pumploss/friction.hpp"
#include "test_support.hpp"

using pltest::kInf;
using pltest::colebrook_root;
using pltest::kNaN;
using pltest::mp50;
using pumploss::status;

namespace {
struct colebrook_row {
  const char* source;
  double re, rr;
  const char* f;  // 25 digits
};
const colebrook_row kColebrookRows[] = {
#include "reference/friction/colebrook_mpmath.ipp"
};
struct fluids_row {
  const char* source;
  double re, rr, colebrook, haaland, swamee_jain, churchill;
};
const fluids_row kFluidsRows[] = {
#include "reference/friction/fluids_friction.ipp"
};
struct line_row {
  const char* source;
  double q, rho, mu, d, l, eps, dp, tol;
};
const line_row kLineRows[] = {
#include "reference/friction/published_lines.ipp"
};

}  // namespace

TEST(FrictionColebrook, Within4UlpOf50DigitRootOverTheMoodyChart) {
  // Re 4e3..1e8 (161 values, log-spaced) x epsilon/D in {0} and 1e-8..0.05 (50 values).
  double worst = 0, wre = 0, wrr = 0;
  int n = 0;
  for (int i = 0; i <= 160; ++i) {
    const double re = 4e3 * std::pow(1e8 / 4e3, i / 160.0);
    for (int j = 0; j <= 50; ++j) {
      const double rr = j == 0 ? 0.0 : 1e-8 * std::pow(0.05 / 1e-8, (j - 1) / 49.0);
      const auto got = pumploss::friction_colebrook(re, rr);
      ASSERT_EQ(got.st, status::ok) << re << " " << rr;
      const double u = pltest::ulps(got.value, colebrook_root(re, rr));
      if (u > worst) { worst = u; wre = re; wrr = rr; }
      ++n;
    }
  }
  EXPECT_LE(worst, 4.0) << "at Re " << wre << ", eps/D " << wrr;
  RecordProperty("worst_ulp", std::to_string(worst));
  RecordProperty("points", std::to_string(n));
  std::printf("[colebrook] worst %.0f ulp over %d points (at Re %.6g, eps/D %.3g)\n", worst, n, wre, wrr);
}

TEST(FrictionColebrook, MatchesMpmathRootTable) {
  for (const auto& r : kColebrookRows) {
    const auto got = pumploss::friction_colebrook(r.re, r.rr);
    ASSERT_TRUE(got.usable()) << r.source;
    EXPECT_LE(pltest::ulps(got.value, mp50(r.f)), 4.0) << r.source << " Re " << r.re << " eps/D " << r.rr;
  }
}

TEST(FrictionColebrook, MultiprecisionTemplateReachesFiftyDigits) {
  // The same template in cpp_bin_float_50 runs extra Newton steps (fixed in number).
  for (double re : {4e3, 1e5, 1e8}) {
    for (double rr : {0.0, 1e-4, 0.05}) {
      const auto got = pumploss::friction_colebrook<mp50>(mp50(re), mp50(rr));
      const mp50 ref = colebrook_root(re, rr);
      EXPECT_LT(abs(got.value - ref) / ref, mp50("1e-45")) << re << " " << rr;
      const auto ld = pumploss::friction_colebrook<long double>(re, rr);
      EXPECT_LT(abs(mp50(ld.value) - ref) / ref, mp50("1e-18")) << re << " " << rr;
    }
  }
}

TEST(FrictionColebrook, FiniteUpToTheLargestReynoldsNumber) {
  // Beyond the Moody chart (status regime) the solve must still converge and never overflow:
  // the starting F is far from the root there. Checked against the same 50-digit Newton root;
  // at Re >= 1e50 this is the fully rough limit 1/sqrt(f) = -2 log10(eps/D / 3.7) for eps/D > 0.
  const double res[] = {1e9, 1e12, 1e20, 1e50, 1e100, 1e200, 1e300, 1.7976931348623157e308};
  const double rrs[] = {0.0, 1e-6, 0.03, 0.05, 0.5, 1.0};
  for (double re : res) {
    for (double rr : rrs) {
      const auto got = pumploss::friction_colebrook(re, rr);
      EXPECT_EQ(got.st, status::regime) << re << " " << rr;
      EXPECT_LE(pltest::ulps(got.value, colebrook_root(re, rr)), 4.0) << "Re " << re << ", eps/D " << rr;
    }
  }
}

TEST(FrictionColebrook, MethodsCheckValues) {
  // fluids_doc_friction and mpmath_colebrook_root (tests/reference/SOURCES.md; fluids documentation / mpmath).
  EXPECT_NEAR(pumploss::friction_colebrook(1e5, 1e-4).value, 0.018513866077, 0.5e-12);
  EXPECT_NEAR(pumploss::friction_colebrook(1e4, 0.0).value, 0.030882950, 0.5e-9);
  EXPECT_NEAR(pumploss::friction_colebrook(1e7, 1e-2).value, 0.037909826, 0.5e-9);
}

TEST(FrictionExplicit, MatchFluidsReferenceLibrary) {
  // fluids_friction: same formulas in python3-fluids; Colebrook is solved there by a
  // different method, so 1e-13; the explicit formulas agree to rounding (fluids writes
  // Swamee-Jain with (6.97/Re)^0.9 for 5.74/Re^0.9: 6.97^0.9 = 5.7399, hence 1e-5).
  for (const auto& r : kFluidsRows) {
    EXPECT_NEAR(pumploss::friction_colebrook(r.re, r.rr).value / r.colebrook, 1, 1e-13) << r.re << " " << r.rr;
    EXPECT_NEAR(pumploss::friction_haaland(r.re, r.rr).value / r.haaland, 1, 1e-14) << r.re;
    EXPECT_NEAR(pumploss::friction_swamee_jain(r.re, r.rr).value / r.swamee_jain, 1, 1e-5) << r.re;
    EXPECT_NEAR(pumploss::friction_churchill(r.re, r.rr).value / r.churchill, 1, 1e-13) << r.re;
  }
  // fluids_doc_friction (tests/reference/SOURCES.md; fluids documentation).
  EXPECT_NEAR(pumploss::friction_haaland(1e5, 1e-4).value, 0.018265053015, 0.5e-12);
  EXPECT_NEAR(pumploss::friction_swamee_jain(1e5, 1e-4).value, 0.018452424432, 1e-7);
  EXPECT_NEAR(pumploss::friction_churchill(1e5, 1e-4).value, 0.018462624566, 0.5e-12);
  EXPECT_NEAR(pumploss::friction_churchill(1000.0, 0.0).value, 0.0640, 0.5e-4);
}

TEST(FrictionExplicit, ErrorBoundsAgainstColebrook) {
  double haaland = 0, sj = 0, sj1e4 = 0, churchill = 0;
  for (int i = 0; i <= 100; ++i) {
    const double re = 4e3 * std::pow(1e8 / 4e3, i / 100.0);
    for (double rr : {0.0, 1e-6, 1e-5, 1e-4, 1e-3, 1e-2, 0.05}) {
      const double cw = pumploss::friction_colebrook(re, rr).value;
      if (rr >= 1e-6) haaland = std::max(haaland, std::fabs(pumploss::friction_haaland(re, rr).value / cw - 1));
      if (re >= 5e3 && rr <= 1e-2) {
        const double e = std::fabs(pumploss::friction_swamee_jain(re, rr).value / cw - 1);
        sj = std::max(sj, e);
        if (re >= 1e4) sj1e4 = std::max(sj1e4, e);
      }
      if (re >= 1e4) churchill = std::max(churchill, std::fabs(pumploss::friction_churchill(re, rr).value / cw - 1));
    }
  }
  std::printf("[explicit] max rel. deviation from Colebrook: Haaland %.4f, Swamee-Jain %.4f (Re>=1e4: %.4f), "
              "Churchill %.4f\n", haaland, sj, sj1e4, churchill);
  EXPECT_LE(haaland, 0.015);
  EXPECT_LE(sj, 0.028);
  EXPECT_LE(sj1e4, 0.021);
  EXPECT_LE(churchill, 0.03);
  EXPECT_GT(haaland, 0.005);  // the approximation is visible: the test can fail
  // Smooth pipe at Re = 1e8: Haaland's largest departure.
  EXPECT_LE(std::fabs(pumploss::friction_haaland(1e8, 0.0).value / pumploss::friction_colebrook(1e8, 0.0).value - 1),
            0.027);
}

TEST(FrictionFactor, LaminarTransitionTurbulentPolicy) {
  EXPECT_EQ(pumploss::friction_factor(1000.0, 0.0).value, 0.064);
  EXPECT_EQ(pumploss::friction_factor(1000.0, 0.0).st, status::ok);
  EXPECT_EQ(pumploss::friction_factor(1000.0, 0.0, 75.0).value, 0.075);
  // Continuous at both ends of the bridge.
  const double lo = pumploss::friction_factor(2000.0, 1e-3).value;
  const double lo_plus = pumploss::friction_factor(std::nextafter(2000.0, 3000.0), 1e-3).value;
  EXPECT_NEAR(lo_plus, lo, 1e-14);
  const double hi = pumploss::friction_factor(4000.0, 1e-3).value;
  const double hi_minus = pumploss::friction_factor(std::nextafter(4000.0, 0.0), 1e-3).value;
  EXPECT_NEAR(hi_minus, hi, 1e-14);
  const auto mid = pumploss::friction_factor(3000.0, 1e-3);
  EXPECT_EQ(mid.st, status::transition);
  EXPECT_NEAR(mid.value, 0.5 * (0.032 + hi), 1e-15);
  EXPECT_EQ(pumploss::friction_factor(4000.0, 1e-3).st, status::ok);
  EXPECT_EQ(pumploss::friction_factor(2e8, 1e-3).st, status::regime);
  EXPECT_EQ(pumploss::friction_factor(1e5, 0.1).st, status::regime);
  // f Re^2 (pressure drop at fixed pipe) rises monotonically with Re through the bridge.
  double prev = 0;
  for (double re = 100; re < 1e6; re *= 1.01) {
    const double v = pumploss::friction_factor(re, 1e-4).value * re * re;
    EXPECT_GT(v, prev) << re;
    prev = v;
  }
  EXPECT_EQ(pumploss::friction_laminar(2500.0).st, status::regime);
  EXPECT_EQ(pumploss::friction_churchill(3000.0, 0.0).st, status::transition);
  EXPECT_EQ(pumploss::friction_colebrook(3000.0, 0.0).st, status::regime);
  EXPECT_EQ(pumploss::friction_colebrook(500.0, 0.0).st, status::out_of_validity);
  EXPECT_EQ(pumploss::friction_swamee_jain(1e5, 0.03).st, status::regime);
  EXPECT_EQ(pumploss::friction_haaland(1e9, 0.0).st, status::regime);
}

TEST(FrictionFactor, BadInput) {
  for (double bad : {kNaN, kInf, -kInf}) {
    EXPECT_EQ(pumploss::friction_factor(bad, 0.0).st, status::nonfinite);
    EXPECT_EQ(pumploss::friction_factor(1e5, bad).st, status::nonfinite);
    EXPECT_EQ(pumploss::friction_colebrook(bad, 0.0).st, status::nonfinite);
    EXPECT_EQ(pumploss::friction_haaland(1e5, bad).st, status::nonfinite);
    EXPECT_EQ(pumploss::friction_churchill(bad, 1e-3).st, status::nonfinite);
    EXPECT_TRUE(std::isnan(pumploss::friction_factor(bad, 0.0).value));
  }
  for (double re : {0.0, -1e5}) {
    EXPECT_EQ(pumploss::friction_factor(re, 0.0).st, status::domain);
    EXPECT_EQ(pumploss::friction_swamee_jain(re, 0.0).st, status::domain);
  }
  EXPECT_EQ(pumploss::friction_factor(1e5, -1e-3).st, status::domain);
  EXPECT_EQ(pumploss::friction_factor(1e5, 1.5).st, status::domain);  // roughness > diameter
  EXPECT_EQ(pumploss::friction_factor(1e5, 0.0, 0.0).st, status::domain);
  EXPECT_EQ(pumploss::friction_laminar(1e3, -64.0).st, status::domain);
  EXPECT_TRUE(std::isnan(pumploss::friction_colebrook(1e5, 2.0).value));
}

TEST(PipePressureDrop, PublishedAndSelfCalculatedExamples) {
  for (const auto& r : kLineRows) {
    const auto got = pumploss::pipe_pressure_drop(r.q, r.rho, r.mu, r.d, r.l, r.eps);
    ASSERT_TRUE(pumploss::is_usable(got.st)) << r.source;
    EXPECT_NEAR(got.dp_pa / r.dp, 1, r.tol) << r.source << " got " << got.dp_pa;
  }
  // cengel_cimbala_laminar: Re = 1803 printed (from memory).
  const auto& lam = kLineRows[0];
  EXPECT_NEAR(pumploss::pipe_pressure_drop(lam.q, lam.rho, lam.mu, lam.d, lam.l, lam.eps).reynolds, 1803, 1.5);
}

TEST(PipePressureDrop, HagenPoiseuilleAndOracle) {
  // Laminar: dp = 128 mu L q / (pi D^4) exactly (hand formula).
  const double q = 1e-4, mu = 0.05, d = 0.012, l = 3.0;
  const auto r = pumploss::pipe_pressure_drop(q, 870.0, mu, d, l, 0.0);
  ASSERT_EQ(r.st, status::ok);
  EXPECT_NEAR(r.dp_pa / (128 * mu * l * q / (3.14159265358979323846 * std::pow(d, 4))), 1, 1e-15);
  EXPECT_EQ(pumploss::pipe_pressure_drop(-q, 870.0, mu, d, l, 0.0).dp_pa, -r.dp_pa);
  // Same template at 50 digits (laminar, transition and turbulent points).
  double worst = 0;
  for (double qq : {1e-5, 1e-4, 7e-4, 2e-3, 1e-2}) {
    const auto got = pumploss::pipe_pressure_drop(qq, 870.0, 0.004, 0.0127, 5.0, 1.5e-6);
    const auto ref = pumploss::pipe_pressure_drop<mp50>(mp50(qq), mp50(870), mp50(0.004), mp50(0.0127), mp50(5),
                                                        mp50(1.5e-6));
    ASSERT_EQ(got.st, ref.st);
    worst = std::max(worst, pltest::rel_err(got.dp_pa, ref.dp_pa));
  }
  EXPECT_LE(worst, 2e-15);
  const auto zero = pumploss::pipe_pressure_drop(0.0, 870.0, mu, d, l, 0.0);
  EXPECT_EQ(zero.st, status::ok);
  EXPECT_EQ(zero.dp_pa, 0.0);
  EXPECT_TRUE(std::isinf(zero.friction_factor));
}

TEST(PipePressureDrop, BadInput) {
  auto st = [](double q, double rho, double mu, double d, double l, double e) {
    const auto r = pumploss::pipe_pressure_drop(q, rho, mu, d, l, e);
    EXPECT_TRUE(!is_error(r.st) || (std::isnan(r.dp_pa) && std::isnan(r.velocity_m_s)));
    return r.st;
  };
  EXPECT_EQ(st(1e-4, 870, 0.04, 0.012, -1.0, 0.0), status::domain);    // negative length
  EXPECT_EQ(st(1e-4, 870, 0.04, 0.0, 1.0, 0.0), status::domain);       // zero diameter
  EXPECT_EQ(st(1e-4, 870, 0.04, -0.012, 1.0, 0.0), status::domain);
  EXPECT_EQ(st(1e-4, 870, 0.04, 0.012, 1.0, 0.013), status::domain);   // roughness > diameter
  EXPECT_EQ(st(1e-4, 870, 0.04, 0.012, 1.0, -1e-6), status::domain);
  EXPECT_EQ(st(1e-4, 0.0, 0.04, 0.012, 1.0, 0.0), status::domain);
  EXPECT_EQ(st(1e-4, 870, 0.0, 0.012, 1.0, 0.0), status::domain);
  EXPECT_EQ(st(kNaN, 870, 0.04, 0.012, 1.0, 0.0), status::nonfinite);
  EXPECT_EQ(st(1e-4, 870, 0.04, kNaN, 1.0, 0.0), status::nonfinite);
  EXPECT_EQ(st(1e-4, 870, 0.04, 0.012, kInf, 0.0), status::nonfinite);
  EXPECT_EQ(st(1e-4, 870, 0.04, 0.012, 0.0, 0.0), status::ok);         // zero length: no drop
  EXPECT_EQ(st(1e-4, 870, 0.04, 0.012, 1.0, 0.0012), status::regime);  // eps/D = 0.1
  EXPECT_EQ(pumploss::pipe_velocity(1e-4, 0.0).st, status::domain);
  EXPECT_EQ(pumploss::pipe_reynolds(1e-4, 870.0, -0.04, 0.012).st, status::domain);
}

TEST(FrictionCapi, ScalarAndBatchWrappers) {
  double f = 0, dp = 0, v = 0, re = 0;
  ASSERT_EQ(pumploss_friction_factor(1e5, 1e-4, &f), PUMPLOSS_OK);
  EXPECT_EQ(f, pumploss::friction_colebrook(1e5, 1e-4).value);
  EXPECT_EQ(pumploss_friction_factor(3000.0, 1e-4, &f), PUMPLOSS_WTRANSITION);
  EXPECT_FALSE(std::isnan(f));
  EXPECT_EQ(pumploss_friction_factor(kNaN, 1e-4, &f), PUMPLOSS_ENONFINITE);
  EXPECT_TRUE(std::isnan(f));
  EXPECT_EQ(pumploss_friction_factor(1e5, 1e-4, nullptr), PUMPLOSS_EMISUSE);
  EXPECT_EQ(pumploss_friction_factor_custom_laminar(1000.0, 0.0, 75.0, &f), PUMPLOSS_OK);
  EXPECT_EQ(f, 0.075);
  EXPECT_EQ(pumploss_pipe_pressure_drop(1e-4, 870, 0.04, 0.0, 1.0, 0.0, &dp), PUMPLOSS_EDOMAIN);
  EXPECT_TRUE(std::isnan(dp));
  ASSERT_EQ(pumploss_pipe_flow(1e-4, 870, 0.04, 0.012, 2.0, 0.0, 64.0, &v, &re, &f, &dp), PUMPLOSS_OK);
  EXPECT_NEAR(re * f, 64.0, 1e-12);
  EXPECT_EQ(pumploss_pipe_flow(1e-4, 870, 0.04, 0.012, 2.0, 0.0, 64.0, &v, &re, nullptr, &dp), PUMPLOSS_EMISUSE);
  EXPECT_TRUE(std::isnan(v) && std::isnan(dp));

  const double res[4] = {1e5, 3000.0, -1.0, 1e6};
  const double rrs[4] = {1e-4, 0.0, 0.0, 1e-5};
  double fs[4];
  int sts[4];
  EXPECT_EQ(pumploss_friction_factor_batch(4, res, rrs, fs, sts), PUMPLOSS_EPARTIAL);
  EXPECT_EQ(sts[0], PUMPLOSS_OK);
  EXPECT_EQ(sts[1], PUMPLOSS_WTRANSITION);
  EXPECT_EQ(sts[2], PUMPLOSS_EDOMAIN);
  EXPECT_TRUE(std::isnan(fs[2]));
  EXPECT_EQ(fs[3], pumploss::friction_factor(1e6, 1e-5).value);
  EXPECT_EQ(pumploss_friction_factor_batch(2, res, rrs, fs, sts), PUMPLOSS_WTRANSITION);
  EXPECT_EQ(pumploss_friction_factor_batch(2, nullptr, rrs, fs, sts), PUMPLOSS_EMISUSE);
  EXPECT_TRUE(std::isnan(fs[0]));
  const double q[2] = {1e-4, 1e-4}, rho[2] = {870, 870}, mu[2] = {0.04, 0.04}, d[2] = {0.012, 0.012},
               l[2] = {2.0, -2.0}, e[2] = {0.0, 0.0};
  double dps[2];
  EXPECT_EQ(pumploss_pipe_pressure_drop_batch(2, q, rho, mu, d, l, e, dps, sts), PUMPLOSS_EPARTIAL);
  EXPECT_EQ(dps[0], pumploss::pipe_pressure_drop(1e-4, 870.0, 0.04, 0.012, 2.0, 0.0).dp_pa);
  EXPECT_EQ(sts[1], PUMPLOSS_EDOMAIN);
  EXPECT_TRUE(std::isnan(dps[1]));
  EXPECT_EQ(pumploss_pipe_pressure_drop_batch(1, q, rho, mu, d, l, e, dps, nullptr), PUMPLOSS_EMISUSE);
}
