// Benchmarks of the unit and fluid functions (C++ templates and their C wrappers).
#include <benchmark/benchmark.h>

#include "pumploss.h"
#include "pumploss/fluid.hpp"
#include "pumploss/units.hpp"

namespace {

void BM_UnitConvertBySymbol(benchmark::State& state) {
  double v = 250.0;
  for (auto _ : state) {
    benchmark::DoNotOptimize(v);
    auto r = pumploss::convert(v, "bar", "psi");
    benchmark::DoNotOptimize(r);
  }
}
BENCHMARK(BM_UnitConvertBySymbol);

void BM_UnitConvertByInfo(benchmark::State& state) {
  const auto& from = *pumploss::find_unit("L/min");
  const auto& to = *pumploss::find_unit("gpm");
  double v = 152.0;
  for (auto _ : state) {
    benchmark::DoNotOptimize(v);
    auto r = pumploss::convert(v, from, to);
    benchmark::DoNotOptimize(r);
  }
}
BENCHMARK(BM_UnitConvertByInfo);

void BM_CapiUnitConvert(benchmark::State& state) {
  double v = 250.0, out = 0.0;
  for (auto _ : state) {
    benchmark::DoNotOptimize(v);
    benchmark::DoNotOptimize(pumploss_unit_convert(v, "bar", "psi", &out));
  }
}
BENCHMARK(BM_CapiUnitConvert);

void BM_ViscosityD341(benchmark::State& state) {
  double t = 273.15;
  for (auto _ : state) {
    benchmark::DoNotOptimize(t);
    auto r = pumploss::viscosity_d341(313.15, 46e-6, 373.15, 6.8e-6, t);
    benchmark::DoNotOptimize(r);
  }
}
BENCHMARK(BM_ViscosityD341);

void BM_ViscosityD341FittedLine(benchmark::State& state) {
  const auto line = pumploss::d341_fit(313.15, 46e-6, 373.15, 6.8e-6).value;
  double t = 273.15;
  for (auto _ : state) {
    benchmark::DoNotOptimize(t);
    auto r = pumploss::d341_viscosity(line, t);
    benchmark::DoNotOptimize(r);
  }
}
BENCHMARK(BM_ViscosityD341FittedLine);

void BM_CapiViscosityD341(benchmark::State& state) {
  double t = 273.15, nu = 0.0;
  for (auto _ : state) {
    benchmark::DoNotOptimize(t);
    benchmark::DoNotOptimize(pumploss_viscosity_d341(313.15, 46e-6, 373.15, 6.8e-6, t, &nu));
  }
}
BENCHMARK(BM_CapiViscosityD341);

void BM_SusFromKinematic(benchmark::State& state) {
  double nu = 46e-6;
  for (auto _ : state) {
    benchmark::DoNotOptimize(nu);
    auto r = pumploss::sus_from_kinematic(nu);
    benchmark::DoNotOptimize(r);
  }
}
BENCHMARK(BM_SusFromKinematic);

void BM_KinematicFromSus(benchmark::State& state) {
  double sus = 700.0;
  for (auto _ : state) {
    benchmark::DoNotOptimize(sus);
    auto r = pumploss::kinematic_from_sus(sus);
    benchmark::DoNotOptimize(r);
  }
}
BENCHMARK(BM_KinematicFromSus);

void BM_IsoVg(benchmark::State& state) {
  int g = 46;
  for (auto _ : state) {
    benchmark::DoNotOptimize(g);
    auto r = pumploss::iso_vg(g);
    benchmark::DoNotOptimize(r);
  }
}
BENCHMARK(BM_IsoVg);

void BM_OilDensity(benchmark::State& state) {
  double t = 323.15, p = 2.5e7;
  for (auto _ : state) {
    benchmark::DoNotOptimize(t);
    benchmark::DoNotOptimize(p);
    auto r = pumploss::oil_density(870.0, 288.15, 6.5e-4, 1.4e9, t, p);
    benchmark::DoNotOptimize(r);
  }
}
BENCHMARK(BM_OilDensity);

void BM_ViscosityBarus(benchmark::State& state) {
  double p = 2.5e7;
  for (auto _ : state) {
    benchmark::DoNotOptimize(p);
    auto r = pumploss::viscosity_barus(0.04, 2e-8, p);
    benchmark::DoNotOptimize(r);
  }
}
BENCHMARK(BM_ViscosityBarus);

void BM_DynamicViscosity(benchmark::State& state) {
  double nu = 46e-6;
  for (auto _ : state) {
    benchmark::DoNotOptimize(nu);
    auto r = pumploss::dynamic_viscosity(nu, 870.0);
    benchmark::DoNotOptimize(r);
  }
}
BENCHMARK(BM_DynamicViscosity);

void BM_OilDynamicViscosity(benchmark::State& state) {
  const auto oil = pumploss::typical_mineral_oil(pumploss::d341_fit(313.15, 46e-6, 373.15, 6.8e-6).value);
  double t = 323.15;
  for (auto _ : state) {
    benchmark::DoNotOptimize(t);
    auto r = pumploss::oil_dynamic_viscosity(oil, t, 0.0);
    benchmark::DoNotOptimize(r);
  }
}
BENCHMARK(BM_OilDynamicViscosity);

}  // namespace

namespace {
void BM_KinematicViscosity(benchmark::State& state) {
  double mu = 0.04;
  for (auto _ : state) {
    benchmark::DoNotOptimize(mu);
    auto r = pumploss::kinematic_viscosity(mu, 870.0);
    benchmark::DoNotOptimize(r);
  }
}
BENCHMARK(BM_KinematicViscosity);

void BM_D341Fit(benchmark::State& state) {
  double nu = 46e-6;
  for (auto _ : state) {
    benchmark::DoNotOptimize(nu);
    auto r = pumploss::d341_fit(313.15, nu, 373.15, 6.8e-6);
    benchmark::DoNotOptimize(r);
  }
}
BENCHMARK(BM_D341Fit);
}  // namespace
