// Benchmarks of the pump health verdict and the piston pump leakage budget.
#include <benchmark/benchmark.h>

#include "pumploss.h"
#include "pumploss/health.hpp"
#include "pumploss/piston_pump.hpp"

namespace {

pumploss::piston_pump<double> bench_pump() {
  pumploss::piston_pump<double> p;
  p.pistons = 9;
  p.piston_diameter_m = 20e-3;
  p.bore_clearance_m = 15e-6;
  p.engaged_length_min_m = 20e-3;
  p.pitch_radius_m = 34e-3;
  p.max_swash_angle_rad = 0.349;
  p.slipper_pocket_radius_m = 6e-3;
  p.slipper_outer_radius_m = 11e-3;
  p.slipper_gap_m = 12e-6;
  p.slipper_feed_diameter_m = 0.8e-3;
  p.slipper_feed_length_m = 60e-3;
  p.valve_inner_land_inner_radius_m = 36e-3;
  p.valve_inner_land_outer_radius_m = 39e-3;
  p.valve_outer_land_inner_radius_m = 45e-3;
  p.valve_outer_land_outer_radius_m = 48e-3;
  p.valve_kidney_arc_rad = 2.618;
  p.valve_gap_m = 10e-6;
  p.bleed_orifice_diameter_m = 0.6e-3;
  return p;
}

void BM_DrainFraction(benchmark::State& state) {
  double q = 5e-5;
  for (auto _ : state) {
    benchmark::DoNotOptimize(q);
    auto r = pumploss::drain_fraction(q, 71e-6, 25.0);
    benchmark::DoNotOptimize(r);
  }
}
BENCHMARK(BM_DrainFraction);

void BM_CapiDrainFraction(benchmark::State& state) {
  double q = 5e-5, f = 0;
  for (auto _ : state) {
    benchmark::DoNotOptimize(q);
    benchmark::DoNotOptimize(pumploss_drain_fraction(q, 71e-6, 25.0, &f));
  }
}
BENCHMARK(BM_CapiDrainFraction);

void BM_HealthAssess(benchmark::State& state) {
  pumploss::health_reference<double> ref{};
  ref.max_displacement_m3_rev = 71e-6;
  ref.reference_dp_pa = 250e5;
  ref.reference_t_k = 323.15;
  ref.viscosity = pumploss::d341_fit(313.15, 46e-6, 373.15, 6.8e-6).value;
  ref.rho_kg_m3 = 870;
  ref.cp_j_kg_k = 1900;
  ref.baseline_m3_s = 4e-5;
  const pumploss::health_bands<double> bands{};
  pumploss::health_reading<double> r{6e-5, 200e5, 1e5, 318.15, 25.0, 330.0, 315.0};
  for (auto _ : state) {
    benchmark::DoNotOptimize(r);
    auto a = pumploss::assess_health(ref, bands, r);
    benchmark::DoNotOptimize(a);
  }
}
BENCHMARK(BM_HealthAssess);

void BM_PistonPumpBudget(benchmark::State& state) {
  const auto p = bench_pump();
  const auto o = pumploss::typical_mineral_oil(pumploss::d341_fit(313.15, 46e-6, 373.15, 6.8e-6).value);
  pumploss::pump_operating_point<double> op{250e5, 1e5, 25.0, 1.0, 323.15};
  for (auto _ : state) {
    benchmark::DoNotOptimize(op);
    auto b = pumploss::piston_pump_budget(p, o, op);
    benchmark::DoNotOptimize(b);
  }
}
BENCHMARK(BM_PistonPumpBudget);

void BM_PistonPumpSensitivity(benchmark::State& state) {
  const auto p = bench_pump();
  const auto o = pumploss::typical_mineral_oil(pumploss::d341_fit(313.15, 46e-6, 373.15, 6.8e-6).value);
  pumploss::pump_operating_point<double> op{250e5, 1e5, 25.0, 1.0, 323.15};
  for (auto _ : state) {
    benchmark::DoNotOptimize(op);
    auto s = pumploss::piston_pump_sensitivity(p, o, op);
    benchmark::DoNotOptimize(s);
  }
}
BENCHMARK(BM_PistonPumpSensitivity);

}  // namespace
