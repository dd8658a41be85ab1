// Benchmarks of the pump health verdict and the piston pump leakage budget.
#include <benchmark/benchmark.h>

#include <cmath>
#include "pumploss.h"

#include "pumploss/health.hpp"
#include "pumploss/health_monitor.hpp"
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

pumploss::health_reference<double> bench_health_reference() {
  pumploss::health_reference<double> ref{};
  ref.max_displacement_m3_rev = 71e-6;
  ref.reference_dp_pa = 250e5;
  ref.reference_t_k = 323.15;
  ref.fluid = pumploss::typical_mineral_oil(pumploss::d341_fit(313.15, 46e-6, 373.15, 6.8e-6).value);
  ref.reference_speed_rev_s = 25.0;
  ref.constant_m3_s = 5e-6;
  ref.baseline_m3_s = 4e-5;
  return ref;
}

void BM_HealthAssess(benchmark::State& state) {
  const auto ref = bench_health_reference();
  const pumploss::health_bands<double> bands{};
  pumploss::health_reading<double> r{6e-5, 200e5, 1e5, 318.15, 25.0, 330.0, 315.0};
  for (auto _ : state) {
    benchmark::DoNotOptimize(r);
    auto a = pumploss::assess_health(ref, bands, r);
    benchmark::DoNotOptimize(a);
  }
}
BENCHMARK(BM_HealthAssess);

// The baseline of the monitor: the plain normalisation of one reading (two viscosities).
void BM_HealthNormalise(benchmark::State& state) {
  const auto ref = bench_health_reference();
  pumploss::health_reading<double> r{6e-5, 200e5, 1e5, 318.15, 25.0};
  for (auto _ : state) {
    benchmark::DoNotOptimize(r);
    auto q = pumploss::health_normalise(ref, r);
    benchmark::DoNotOptimize(q);
  }
}
BENCHMARK(BM_HealthNormalise);

// One reading fed to the streaming monitor (checks, normalisation, verdict, debounce, CUSUM).
void BM_HealthMonitorFeed(benchmark::State& state) {
  pumploss::health_monitor<double> m;
  if (pumploss::is_error(m.init(bench_health_reference(), pumploss::health_bands<double>{}, {}))) {
    state.SkipWithError("monitor init failed");
    return;
  }
  pumploss::health_reading<double> r{6e-5, 200e5, 1e5, 318.15, 25.0, 330.0, 315.0};
  double t = 0;
  for (auto _ : state) {
    r.drain_flow_m3_s = 6e-5 * (1 + 1e-3 * std::sin(t));
    benchmark::DoNotOptimize(r);
    auto o = m.feed(t, r);
    benchmark::DoNotOptimize(o);
    t += 1;
  }
}
BENCHMARK(BM_HealthMonitorFeed);

// The same through the C API handle.
void BM_CapiHealthMonitorFeed(benchmark::State& state) {
  pumploss_health* h = nullptr;
  pumploss_health_monitor* m = nullptr;
  if (pumploss_health_create(71e-6, 250e5, 323.15, 313.15, 46e-6, 373.15, 6.8e-6, 870.0, 1900.0, &h) != PUMPLOSS_OK ||
      pumploss_health_set_description(h, 5e-6, 0.0, 25.0, 25.0) != PUMPLOSS_OK ||
      pumploss_health_monitor_create(h, 8, 3, 0.05, &m) != PUMPLOSS_OK) {
    state.SkipWithError("monitor create failed");
    pumploss_health_destroy(h);
    return;
  }
  double t = 0, q = 0;
  int level = 0, raw = 0, events = 0;
  for (auto _ : state) {
    benchmark::DoNotOptimize(pumploss_health_monitor_feed(m, t, 6e-5 * (1 + 1e-3 * std::sin(t)), 200e5, 1e5, 318.15,
                                                          25.0, 330.0, 315.0, PUMPLOSS_STATE_ON_STROKE, &level, &raw,
                                                          &events, &q));
    t += 1;
  }
  pumploss_health_monitor_destroy(m);
  pumploss_health_destroy(h);
}
BENCHMARK(BM_CapiHealthMonitorFeed);

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
