// Benchmarks of the gap and orifice formulas: each fast path next to the baseline a user would
// otherwise write. Accuracy counters: relative error against a 50-digit evaluation of the same
// case (computed once, outside the timed loop).
#include <benchmark/benchmark.h>

#include <boost/multiprecision/cpp_bin_float.hpp>
#include <cmath>

#include "pumploss.h"
#include "pumploss/gap.hpp"
#include "pumploss/orifice.hpp"

namespace {
using mp50 = boost::multiprecision::cpp_bin_float_50;

double rel(double got, const mp50& ref) { return static_cast<double>(abs((mp50(got) - ref) / ref)); }

// Concentric annulus at clearance/radius t = range(0) exponent: ours (stable) vs textbook.
void BM_AnnulusExact(benchmark::State& state) {
  const double t = std::pow(10.0, -static_cast<double>(state.range(0)));
  double b = 0.01, a = b * (1 + t);
  for (auto _ : state) {
    benchmark::DoNotOptimize(a);
    auto r = pumploss::gap_annulus_flow(250e5, 0.04, 2 * a, 2 * b, 0.03, 0.0);
    benchmark::DoNotOptimize(r);
  }
  const mp50 ref = pumploss::gap_annulus_flow<mp50>(250e5, 0.04, 2 * a, 2 * b, 0.03, 0.0).value;
  state.counters["rel_err"] = rel(pumploss::gap_annulus_flow(250e5, 0.04, 2 * a, 2 * b, 0.03, 0.0).value, ref);
}
BENCHMARK(BM_AnnulusExact)->Arg(7)->Arg(5)->Arg(3)->Arg(1);

void BM_AnnulusTextbook(benchmark::State& state) {
  const double t = std::pow(10.0, -static_cast<double>(state.range(0)));
  double b = 0.01, a = b * (1 + t);
  const double pi = 3.141592653589793;
  auto textbook = [&](double aa, double bb) {
    return pi * 250e5 / (8 * 0.04 * 0.03) * pumploss::detail::annulus_concentric_textbook_bracket(aa, bb);
  };
  for (auto _ : state) {
    benchmark::DoNotOptimize(a);
    double q = textbook(a, b);
    benchmark::DoNotOptimize(q);
  }
  const mp50 ref = pumploss::gap_annulus_flow<mp50>(250e5, 0.04, 2 * a, 2 * b, 0.03, 0.0).value;
  state.counters["rel_err"] = rel(textbook(a, b), ref);
}
BENCHMARK(BM_AnnulusTextbook)->Arg(7)->Arg(5)->Arg(3)->Arg(1);

// Narrow-gap form (what a user would write for a piston), for speed comparison.
void BM_AnnulusNarrow(benchmark::State& state) {
  double e = 0.5;
  for (auto _ : state) {
    benchmark::DoNotOptimize(e);
    auto r = pumploss::gap_annulus_narrow_flow(250e5, 0.04, 0.02002, 0.02, 0.03, e);
    benchmark::DoNotOptimize(r);
  }
}
BENCHMARK(BM_AnnulusNarrow);

// Eccentric series: eccentricity = range(0)/1000, clearance/radius = 10^-range(1).
void BM_AnnulusEccentric(benchmark::State& state) {
  const double e = static_cast<double>(state.range(0)) / 1000.0;
  const double t = std::pow(10.0, -static_cast<double>(state.range(1)));
  double b = 0.01, a = b * (1 + t);
  for (auto _ : state) {
    benchmark::DoNotOptimize(a);
    auto r = pumploss::gap_annulus_flow(250e5, 0.04, 2 * a, 2 * b, 0.03, e);
    benchmark::DoNotOptimize(r);
  }
  const mp50 ref = pumploss::gap_annulus_flow<mp50>(250e5, 0.04, 2 * a, 2 * b, 0.03, e).value;
  state.counters["rel_err"] = rel(pumploss::gap_annulus_flow(250e5, 0.04, 2 * a, 2 * b, 0.03, e).value, ref);
}
BENCHMARK(BM_AnnulusEccentric)
    ->ArgsProduct({{1, 300, 600, 800, 880, 900, 950, 990, 999, 1000}, {6, 2, 0}});

void BM_AnnulusDragFlow(benchmark::State& state) {
  double e = 0.6;
  for (auto _ : state) {
    benchmark::DoNotOptimize(e);
    auto r = pumploss::gap_annulus_drag_flow(0.02002, 0.02, e, 1.5);
    benchmark::DoNotOptimize(r);
  }
}
BENCHMARK(BM_AnnulusDragFlow);

void BM_AnnulusClearanceInverse(benchmark::State& state) {
  double q = 1e-7;
  for (auto _ : state) {
    benchmark::DoNotOptimize(q);
    auto r = pumploss::gap_annulus_clearance(q, 250e5, 0.04, 0.02002, 0.03, 0.5);
    benchmark::DoNotOptimize(r);
  }
}
BENCHMARK(BM_AnnulusClearanceInverse);

void BM_PlatesFlow(benchmark::State& state) {
  double h = 1e-5;
  for (auto _ : state) {
    benchmark::DoNotOptimize(h);
    auto r = pumploss::gap_plates_flow(1e6, 0.04, 0.02, h, 0.01, 2.0);
    benchmark::DoNotOptimize(r);
  }
}
BENCHMARK(BM_PlatesFlow);

void BM_PlatesHeightCouetteClosedForm(benchmark::State& state) {
  double q = 2e-7;
  for (auto _ : state) {
    benchmark::DoNotOptimize(q);
    auto r = pumploss::gap_plates_height_couette(q, 1e6, 0.04, 0.02, 0.01, 2.0);
    benchmark::DoNotOptimize(r);
  }
}
BENCHMARK(BM_PlatesHeightCouetteClosedForm);

// Baseline: Newton iteration from the pressure-only root, the usual way to solve the cubic (docs/pages/theory_gap.md).
void BM_PlatesHeightCouetteNewton(benchmark::State& state) {
  double q = 2e-7;
  const double A = 0.02 * 1e6 / (12 * 0.04 * 0.01), B = 0.02 * 2.0 / 2;
  for (auto _ : state) {
    benchmark::DoNotOptimize(q);
    double h = std::cbrt(q / A);
    for (int i = 0; i < 50; ++i) {
      const double f = A * h * h * h + B * h - q;
      const double dh = f / (3 * A * h * h + B);
      h -= dh;
      if (std::fabs(dh) <= 1e-16 * h) break;
    }
    benchmark::DoNotOptimize(h);
  }
}
BENCHMARK(BM_PlatesHeightCouetteNewton);

void BM_PlatesPowerLoss(benchmark::State& state) {
  double h = 1e-5;
  for (auto _ : state) {
    benchmark::DoNotOptimize(h);
    auto r = pumploss::gap_plates_power_loss(1e6, 0.04, 0.02, h, 0.01, 2.0);
    benchmark::DoNotOptimize(r);
  }
}
BENCHMARK(BM_PlatesPowerLoss);

void BM_RadialFlow(benchmark::State& state) {
  double h = 15e-6;
  for (auto _ : state) {
    benchmark::DoNotOptimize(h);
    auto r = pumploss::gap_radial_flow(250e5, 0.04, 0.02, 0.03, h);
    benchmark::DoNotOptimize(r);
  }
}
BENCHMARK(BM_RadialFlow);

void BM_RadialLandForce(benchmark::State& state) {
  double p = 250e5;
  for (auto _ : state) {
    benchmark::DoNotOptimize(p);
    auto r = pumploss::gap_radial_land_force(p, 0.0, 0.02, 0.03, 1.0);
    benchmark::DoNotOptimize(r);
  }
}
BENCHMARK(BM_RadialLandForce);

void BM_PadOrifice(benchmark::State& state) {
  double h = 15e-6;
  for (auto _ : state) {
    benchmark::DoNotOptimize(h);
    auto r = pumploss::gap_pad_orifice(250e5, 870.0, 0.04, 0.4e-3, 0.7, 0.005, 0.008, h, 0.02);
    benchmark::DoNotOptimize(r);
  }
}
BENCHMARK(BM_PadOrifice);

void BM_OrificeFlow(benchmark::State& state) {
  double dp = 100e5;
  for (auto _ : state) {
    benchmark::DoNotOptimize(dp);
    auto r = pumploss::orifice_flow(dp, 870.0, 1e-3, 0.61);
    benchmark::DoNotOptimize(r);
  }
}
BENCHMARK(BM_OrificeFlow);

void BM_OrificeFlowViscous(benchmark::State& state) {
  double dp = 100e5;
  for (auto _ : state) {
    benchmark::DoNotOptimize(dp);
    auto r = pumploss::orifice_flow_viscous(dp, 870.0, 0.04, 1e-3, 0.61, 0.16287);
    benchmark::DoNotOptimize(r);
  }
}
BENCHMARK(BM_OrificeFlowViscous);

void BM_CapillaryFlow(benchmark::State& state) {
  double dp = 1e5;
  for (auto _ : state) {
    benchmark::DoNotOptimize(dp);
    auto r = pumploss::capillary_flow(dp, 870.0, 0.04, 1e-3, 0.05, 1.5);
    benchmark::DoNotOptimize(r);
  }
}
BENCHMARK(BM_CapillaryFlow);

void BM_CapiGapAnnulusFlow(benchmark::State& state) {
  double e = 0.9, q = 0;
  for (auto _ : state) {
    benchmark::DoNotOptimize(e);
    benchmark::DoNotOptimize(pumploss_gap_annulus_flow(250e5, 0.04, 0.02002, 0.02, 0.03, e, &q));
  }
}
BENCHMARK(BM_CapiGapAnnulusFlow);

}  // namespace
