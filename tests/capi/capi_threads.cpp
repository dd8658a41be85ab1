// Thread test of the C API (issue 9 item 2): every function of the generated table (scalar,
// batch, handle methods on one shared handle, create) is called from 8 threads at once, many
// thousand times, with a deterministic set of inputs (valid, special and random ones), and
// every result is compared bit for bit with the single-threaded result. Also built with TSan.
#include <atomic>
#include <cstdio>
#include <cstdlib>
#include <string>
#include <thread>
#include <vector>

#include "capi_harness.hpp"

int main(int argc, char** argv) {
  using namespace plcapi;
  const int rounds = argc > 1 ? std::atoi(argv[1]) : 100;
  const int threads = argc > 2 ? std::atoi(argv[2]) : 8;
  Context ctx;
  make_live_handles(ctx, nullptr);
  std::vector<Case> cases;
  for (int fn = 0; fn < kFunctionCount; ++fn) {
    // Handles may be read, not changed, from several threads at once (pumploss.h): functions
    // that change a handle are called from one thread only, in the other tests.
    if (mutates_handle(kFunctions[fn])) continue;
    Case base;
    const std::size_t n = has_size(kFunctions[fn]) ? 5 : 0;
    if (!find_baseline(fn, ctx, n, base)) base = candidate(fn, 0, n);
    for (Case& c : make_cases(fn, base, ctx, 40)) cases.push_back(std::move(c));
  }
  std::vector<std::vector<std::uint64_t>> want(cases.size());
  {
    Exec e;
    for (std::size_t i = 0; i < cases.size(); ++i) {
      e.prepare(cases[i], ctx);
      e.invoke(cases[i]);
      want[i] = e.outcome(cases[i]);
      e.release(cases[i], ctx);
    }
  }
  std::atomic<long> calls{0}, mismatches{0};
  std::atomic<int> ready{0};
  std::vector<std::thread> pool;
  for (int t = 0; t < threads; ++t) {
    pool.emplace_back([&, t] {
      ready.fetch_add(1);
      while (ready.load() < threads) std::this_thread::yield();  // start together
      Exec e;
      long local_calls = 0, local_bad = 0;
      const std::size_t m = cases.size();
      for (int r = 0; r < rounds; ++r) {
        for (std::size_t k = 0; k < m; ++k) {
          const std::size_t i = (k * 7919u + static_cast<std::size_t>(t) * 104729u + static_cast<std::size_t>(r)) % m;
          e.prepare(cases[i], ctx);
          e.invoke(cases[i]);
          if (e.outcome(cases[i]) != want[i]) {
            if (local_bad++ < 5)
              std::printf("MISMATCH thread %d: %s(%s)\n", t, kFunctions[cases[i].fn].name, cases[i].what.c_str());
          }
          e.release(cases[i], ctx);
          ++local_calls;
        }
      }
      calls += local_calls;
      mismatches += local_bad;
    });
  }
  for (std::thread& th : pool) th.join();
  std::printf("capi_threads: %d functions, %zu cases, %d threads x %d rounds = %ld calls\n", kFunctionCount,
              cases.size(), threads, rounds, calls.load());
  std::printf("%ld passed, %ld failed\n", calls.load() - mismatches.load(), mismatches.load());
  return mismatches.load() == 0 ? 0 : 1;
}
