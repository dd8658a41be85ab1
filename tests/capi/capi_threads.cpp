// Thread test of the C API: every function of the generated table is called from 8 threads at
// once, many thousand times, with a deterministic set of inputs (valid, special and random
// ones), and every result is compared bit for bit with the single-threaded result. Scalar and
// batch functions, create functions and the read-only handle methods share one set of handles
// between all threads; the methods that change a handle (which pumploss.h allows on one thread
// per handle) run on fresh handles of their own for every call, concurrently with all the rest.
// Also built with TSan.
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
  std::vector<Recipe> recipes;
  make_live_handles(ctx, nullptr, &recipes);
  std::vector<Case> cases;
  for (int fn = 0; fn < kFunctionCount; ++fn) {
    // Handles may be read, not changed, from several threads at once (pumploss.h): functions
    // that change a handle are called from one thread only, in the other tests.
    if (mutates_handle(kFunctions[fn])) continue;
    Case base;
    const std::size_t n = count_for(kFunctions[fn]);
    if (!find_baseline(fn, ctx, n, base)) base = candidate(fn, 0, n);
    for (Case& c : make_cases(fn, base, ctx, 40)) cases.push_back(std::move(c));
  }
  // Methods that change a handle: cases found on fresh handles, run on fresh handles.
  std::vector<Case> mcases;
  for (int fn = 0; fn < kFunctionCount; ++fn) {
    if (!mutates_handle(kFunctions[fn])) continue;
    Context fresh;
    Exec maker;
    make_from_recipes(recipes, fresh, maker);
    Case base;
    const std::size_t n = count_for(kFunctions[fn]);
    if (!find_baseline(fn, fresh, n, base)) base = candidate(fn, 0, n);
    for (Case& c : make_cases(fn, base, fresh, 6)) mcases.push_back(std::move(c));
  }
  auto run_on_fresh_handles = [&recipes](const Case& c, Exec& e) {
    Context fresh;
    make_from_recipes(recipes, fresh, e);
    e.prepare(c, fresh);
    e.invoke(c);
    std::vector<std::uint64_t> o = e.outcome(c);
    e.release(c, fresh);
    return o;
  };
  // Twice per thread (first round and half way) all the handle-changing cases (each builds a
  // full set of handles, so they cost far more than a scalar call).
  const int mutating_every = rounds > 1 ? rounds / 2 : 1;
  std::vector<std::vector<std::uint64_t>> want(cases.size()), mwant(mcases.size());
  {
    Exec e;
    for (std::size_t i = 0; i < cases.size(); ++i) {
      e.prepare(cases[i], ctx);
      e.invoke(cases[i]);
      want[i] = e.outcome(cases[i]);
      e.release(cases[i], ctx);
    }
    for (std::size_t i = 0; i < mcases.size(); ++i) mwant[i] = run_on_fresh_handles(mcases[i], e);
  }
  std::atomic<long> mcalls{0};
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
        if (r % mutating_every != 0) continue;
        const std::size_t mm = mcases.size();
        for (std::size_t k = 0; k < mm; ++k) {
          const std::size_t i = (k * 7919u + static_cast<std::size_t>(t) * 104729u) % mm;
          if (run_on_fresh_handles(mcases[i], e) != mwant[i]) {
            if (local_bad++ < 5)
              std::printf("MISMATCH thread %d: %s(%s) on its own handles\n", t, kFunctions[mcases[i].fn].name,
                          mcases[i].what.c_str());
          }
          ++local_calls;
          mcalls.fetch_add(1);
        }
      }
      calls += local_calls;
      mismatches += local_bad;
    });
  }
  for (std::thread& th : pool) th.join();
  std::printf("capi_threads: %d functions, %zu cases on shared handles and %zu on own handles, %d threads x %d "
              "rounds = %ld calls (%ld of them changing a handle)\n",
              kFunctionCount, cases.size(), mcases.size(), threads, rounds, calls.load(), mcalls.load());
  std::printf("%ld passed, %ld failed\n", calls.load() - mismatches.load(), mismatches.load());
  return mismatches.load() == 0 ? 0 : 1;
}
