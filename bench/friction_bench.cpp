// Benchmarks of friction.hpp: the library's Colebrook-White solve next to the plain
// fixed-point iteration a user would write by hand, the explicit approximations, and the C
// wrappers. All cycle through the same 64 (Re, epsilon/D) pairs spread over the Moody chart.
#include <benchmark/benchmark.h>

#include <array>
#include <cmath>
#include <cstddef>

#include "pumploss.h"
#include "pumploss/friction.hpp"
#include "test_support.hpp"

namespace {

struct point {
  double re, rr;
};

const std::array<point, 64>& points() {
  static const std::array<point, 64> pts = [] {
    std::array<point, 64> p{};
    for (std::size_t i = 0; i < p.size(); ++i) {
      const double re = 4e3 * std::pow(1e8 / 4e3, static_cast<double>(i % 16) / 15.0);
      const double rrs[4] = {0.0, 1e-5, 1e-3, 0.03};
      p[i] = {re, rrs[i / 16]};
    }
    return p;
  }();
  return pts;
}

/// What a user writes by hand: fixed-point iteration on x = 1/sqrt(f),
/// x <- -2 log10(eps/(3.7 D) + 2.51 x / Re), until the change is below 1e-14 relative.
double colebrook_fixed_point(double re, double rr) {
  double x = 8.0;
  for (int i = 0; i < 200; ++i) {
    const double xn = -2.0 * std::log10(rr / 3.7 + 2.51 * x / re);
    if (std::fabs(xn - x) <= 1e-14 * xn) {
      x = xn;
      break;
    }
    x = xn;
  }
  return 1.0 / (x * x);
}

/// The library's Colebrook solve (detail::colebrook_unchecked<double>) with its last step in
/// plain double instead of double-double arithmetic, f = (ln 10/2)^2/(F0 + d)^2: what the
/// double-double finish costs (docs/pages/performance.md; it buys 2 ulp worst instead of 4).
double colebrook_plain_finish(double re, double rr) {
  const double ln10 = 2.302585092994045684;
  const double x1 = rr * re * (ln10 / 18.574);
  const double x2 = std::log(re) + pumploss::detail::clamond_c2<double>();
  double f = x2 - 0.2;
  for (int i = 0; i < 2; ++i) {
    const double x1f = x1 + f;
    const double d = 1.0 + x1f;
    const double e = (std::log(x1f) + f - x2) * (1.0 / d);
    f = f - (e * x1f) * ((d + e / 2) / (d + e * (1.0 + e * (1.0 / 3))));
  }
  const double c = 2.180158299154324 / re;
  const double s = c * f + rr / 3.7;
  const double g = f + std::log(s);
  const double d = -g * s * (1.0 / (s + c));
  const double k_hi = 1.3254745276195996;
  const double fd = f + d;
  return k_hi / (fd * fd);
}

/// Worst ulp distance from the 50-digit root over the 64 benchmark points.
template <class F>
double worst_ulp(F&& f) {
  double worst = 0;
  for (const point& q : points()) worst = std::fmax(worst, pltest::ulps(f(q.re, q.rr), pltest::colebrook_root(q.re, q.rr)));
  return worst;
}

void BM_FrictionColebrook(benchmark::State& state) {
  const auto& p = points();
  std::size_t i = 0;
  for (auto _ : state) {
    const auto r = pumploss::friction_colebrook(p[i].re, p[i].rr);
    benchmark::DoNotOptimize(r);
    i = (i + 1) & 63;
  }
  state.counters["max_ulp"] = worst_ulp([](double re, double rr) { return pumploss::friction_colebrook(re, rr).value; });
}
BENCHMARK(BM_FrictionColebrook);

/// A Colebrook solve written here (double in, double out) over the 64 points, with its worst ulp.
template <double (*Solve)(double, double)>
void BM_ColebrookHere(benchmark::State& state) {
  const auto& p = points();
  std::size_t i = 0;
  for (auto _ : state) {
    const double f = Solve(p[i].re, p[i].rr);
    benchmark::DoNotOptimize(f);
    i = (i + 1) & 63;
  }
  state.counters["max_ulp"] = worst_ulp(Solve);
}
BENCHMARK_TEMPLATE(BM_ColebrookHere, colebrook_fixed_point)->Name("BM_FrictionColebrookFixedPoint");
BENCHMARK_TEMPLATE(BM_ColebrookHere, colebrook_plain_finish)->Name("BM_FrictionColebrookPlainFinish");

void BM_FrictionHaaland(benchmark::State& state) {
  const auto& p = points();
  std::size_t i = 0;
  for (auto _ : state) {
    const auto r = pumploss::friction_haaland(p[i].re, p[i].rr);
    benchmark::DoNotOptimize(r);
    i = (i + 1) & 63;
  }
}
BENCHMARK(BM_FrictionHaaland);

void BM_FrictionSwameeJain(benchmark::State& state) {
  const auto& p = points();
  std::size_t i = 0;
  for (auto _ : state) {
    const auto r = pumploss::friction_swamee_jain(p[i].re, p[i].rr);
    benchmark::DoNotOptimize(r);
    i = (i + 1) & 63;
  }
}
BENCHMARK(BM_FrictionSwameeJain);

void BM_FrictionChurchill(benchmark::State& state) {
  const auto& p = points();
  std::size_t i = 0;
  for (auto _ : state) {
    const auto r = pumploss::friction_churchill(p[i].re, p[i].rr);
    benchmark::DoNotOptimize(r);
    i = (i + 1) & 63;
  }
}
BENCHMARK(BM_FrictionChurchill);

void BM_CapiFrictionFactor(benchmark::State& state) {
  const auto& p = points();
  std::size_t i = 0;
  double f = 0.0;
  for (auto _ : state) {
    benchmark::DoNotOptimize(pumploss_friction_factor(p[i].re, p[i].rr, &f));
    i = (i + 1) & 63;
  }
}
BENCHMARK(BM_CapiFrictionFactor);

void BM_CapiFrictionFactorBatch(benchmark::State& state) {
  const auto& p = points();
  double re[64], rr[64], f[64];
  int st[64];
  for (std::size_t i = 0; i < 64; ++i) {
    re[i] = p[i].re;
    rr[i] = p[i].rr;
  }
  for (auto _ : state) {
    benchmark::DoNotOptimize(pumploss_friction_factor_batch(64, re, rr, f, st));
    benchmark::ClobberMemory();
  }
  state.SetItemsProcessed(state.iterations() * 64);
}
BENCHMARK(BM_CapiFrictionFactorBatch);

void BM_PipePressureDrop(benchmark::State& state) {
  double q = 2e-4;
  for (auto _ : state) {
    benchmark::DoNotOptimize(q);
    const auto r = pumploss::pipe_pressure_drop(q, 870.0, 0.004, 0.0127, 5.0, 1.5e-6);
    benchmark::DoNotOptimize(r);
  }
}
BENCHMARK(BM_PipePressureDrop);

}  // namespace
