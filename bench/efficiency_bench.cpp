// Benchmarks of the efficiency module: one point, the C batch against the same formula in a
// plain C++ loop (the baseline a user would write), and a Wilson loss-model fit.
// Figures and the commands that give them: docs/pages/performance.md (scripts/bench.sh).
#include <benchmark/benchmark.h>

#include <cstddef>
#include <random>
#include <vector>

#include "pumploss.h"
#include "pumploss/efficiency.hpp"
#include "pumploss/loss_model.hpp"

namespace {

struct points {
  std::vector<double> v, n, dp, q, t, ev, eh, et;
  std::vector<int> st;
  explicit points(std::size_t count) : v(count), n(count), dp(count), q(count), t(count), ev(count), eh(count),
                                       et(count), st(count) {
    std::mt19937_64 rng(1);
    std::uniform_real_distribution<double> u(0.0, 1.0);
    for (std::size_t i = 0; i < count; ++i) {
      v[i] = 107e-6;
      n[i] = 10.0 + 30.0 * u(rng);
      dp[i] = 2e6 + 3e7 * u(rng);
      q[i] = v[i] * n[i] * (0.9 + 0.09 * u(rng));
      t[i] = v[i] * dp[i] / 6.283185307179586 / (0.85 + 0.14 * u(rng));
    }
  }
};

// Payload per point: five inputs and three outputs (the per-element status is extra for the batch).
constexpr std::int64_t kBytesPerPoint = 8 * sizeof(double);

void BM_PumpEfficiency(benchmark::State& state) {
  double v = 107e-6, n = 25.0, dp = 2.5e7, q = 2.5333e-3, t = 450.0;
  for (auto _ : state) {
    benchmark::DoNotOptimize(n);
    auto r = pumploss::pump_efficiency(v, n, dp, q, t);
    benchmark::DoNotOptimize(r);
  }
}
BENCHMARK(BM_PumpEfficiency);

void BM_CapiPumpEfficiency(benchmark::State& state) {
  double n = 25.0, ev = 0, eh = 0, et = 0;
  for (auto _ : state) {
    benchmark::DoNotOptimize(n);
    benchmark::DoNotOptimize(pumploss_pump_efficiency(107e-6, n, 2.5e7, 2.5333e-3, 450.0, &ev, &eh, &et));
  }
}
BENCHMARK(BM_CapiPumpEfficiency);

void BM_PumpEfficiencyBatchCapi(benchmark::State& state) {
  const auto count = static_cast<std::size_t>(state.range(0));
  points p(count);
  for (auto _ : state) {
    const int s = pumploss_pump_efficiency_batch(count, p.v.data(), p.n.data(), p.dp.data(), p.q.data(), p.t.data(),
                                                 p.ev.data(), p.eh.data(), p.et.data(), p.st.data());
    benchmark::DoNotOptimize(s);
    benchmark::ClobberMemory();
  }
  state.SetBytesProcessed(state.iterations() * state.range(0) * kBytesPerPoint);
  state.SetItemsProcessed(state.iterations() * state.range(0));
}
BENCHMARK(BM_PumpEfficiencyBatchCapi)->Arg(1000000)->Unit(benchmark::kMillisecond);

/// The same formula in a plain C++ loop (the baseline a user would write); with WithStatus it
/// also writes one int per point, as the batch writes its status: the floor for any batch that
/// reports per element (its extra memory traffic is the status array).
template <bool WithStatus>
void inline_loop(benchmark::State& state) {
  const auto count = static_cast<std::size_t>(state.range(0));
  points p(count);
  const double two_pi = 6.283185307179586;
  for (auto _ : state) {
    for (std::size_t i = 0; i < count; ++i) {
      const double ev = p.q[i] / (p.v[i] * p.n[i]);
      const double eh = p.v[i] * p.dp[i] / (two_pi * p.t[i]);
      p.ev[i] = ev;
      p.eh[i] = eh;
      p.et[i] = ev * eh;
      if constexpr (WithStatus) p.st[i] = 0;
    }
    benchmark::ClobberMemory();
  }
  state.SetBytesProcessed(state.iterations() * state.range(0) * kBytesPerPoint);
  state.SetItemsProcessed(state.iterations() * state.range(0));
}

void BM_PumpEfficiencyInlineLoop(benchmark::State& state) { inline_loop<false>(state); }
BENCHMARK(BM_PumpEfficiencyInlineLoop)->Arg(1000000)->Unit(benchmark::kMillisecond);

void BM_PumpEfficiencyInlineLoopWithStatus(benchmark::State& state) { inline_loop<true>(state); }
BENCHMARK(BM_PumpEfficiencyInlineLoopWithStatus)->Arg(1000000)->Unit(benchmark::kMillisecond);

// The same pair on 4 000 points, which stay in cache: the cost of the batch's checks without
// the memory system in between.
BENCHMARK(BM_PumpEfficiencyBatchCapi)->Arg(4000)->Unit(benchmark::kMicrosecond);
BENCHMARK(BM_PumpEfficiencyInlineLoop)->Arg(4000)->Unit(benchmark::kMicrosecond);

}  // namespace

namespace {
struct wilson_data {
  std::vector<double> dp, n, mu, q, t, work;
  explicit wilson_data(std::size_t count) : dp(count), n(count), mu(count), q(count), t(count),
                                            work(pumploss::loss_fit_workspace(count)) {
    std::mt19937_64 rng(2);
    std::uniform_real_distribution<double> u(0.0, 1.0);
    std::normal_distribution<double> e(0.0, 1.0);
    const double d = 107e-6 / 6.283185307179586;
    for (std::size_t i = 0; i < count; ++i) {
      dp[i] = 2e6 + 3.3e7 * u(rng);
      n[i] = 8.0 + 35.0 * u(rng);
      mu[i] = 0.012 + 0.05 * u(rng);
      const double w = 6.283185307179586 * n[i];
      q[i] = d * w - 3.5e-9 * d * dp[i] / mu[i] + 2e-6 * e(rng);
      t[i] = d * dp[i] + 6.5e4 * d * mu[i] * w + 0.03 * d * dp[i] + 3.0 + 0.3 * e(rng);
    }
  }
};

void BM_WilsonFit(benchmark::State& state) {
  const auto count = static_cast<std::size_t>(state.range(0));
  wilson_data s(count);
  for (auto _ : state) {
    auto m = pumploss::fit_loss_model(pumploss::machine::pump, pumploss::loss_model_kind::wilson, 107e-6, 870.0,
                                      s.dp.data(), s.n.data(), s.mu.data(), s.q.data(), s.t.data(), count,
                                      s.work.data());
    benchmark::DoNotOptimize(m);
  }
  state.SetItemsProcessed(state.iterations() * state.range(0));
}
BENCHMARK(BM_WilsonFit)->Arg(10000)->Unit(benchmark::kMicrosecond);

void BM_CapiModelCreate(benchmark::State& state) {
  const auto count = static_cast<std::size_t>(state.range(0));
  wilson_data s(count);
  for (auto _ : state) {
    pumploss_model* h = nullptr;
    const int st = pumploss_model_create(PUMPLOSS_PUMP, PUMPLOSS_MODEL_WILSON, 107e-6, 870.0, count, s.dp.data(),
                                         s.n.data(), s.mu.data(), s.q.data(), s.t.data(), &h);
    benchmark::DoNotOptimize(st);
    pumploss_model_destroy(h);
  }
  state.SetItemsProcessed(state.iterations() * state.range(0));
}
BENCHMARK(BM_CapiModelCreate)->Arg(10000)->Unit(benchmark::kMicrosecond);
}  // namespace
