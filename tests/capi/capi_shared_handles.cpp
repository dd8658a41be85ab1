// The handle contract of pumploss.h, tested: evaluations (functions that take a const handle)
// never write the handle, so eight threads may evaluate ONE shared handle at once.
//
// For every handle kind of the table generated from pumploss.h (so a new kind is covered
// without editing this file): one handle is created (by the kind's builder in capi_harness.hpp
// when its create function needs more than guessed inputs), then configured on one thread by every
// function that changes it (add_ / set_ / calibrate, each with the first valid input the harness
// finds), then eight threads call every read-only function of that kind on that same handle,
// many times, with valid, special and random inputs, and compare each outcome bit for bit with
// the single-threaded one. Under ThreadSanitizer (scripts/check.sh) any write to the handle
// during an evaluation (a message, a cache) is a reported data race.
//
// Fails when a kind cannot be created, has no read-only function, or none of its evaluations
// gives a usable status (then the threads would test nothing but the error paths).
#include <atomic>
#include <cstdio>
#include <cstdlib>
#include <string>
#include <thread>
#include <vector>

#include "capi_harness.hpp"

namespace {

using namespace plcapi;

/// The handle kind a function works on (its first handle parameter), or -1.
int handle_kind(const Fn& f) {
  for (int p = 0; p < f.nparams; ++p)
    if (f.params[p].kind == K_HIN) return f.params[p].handle;
  return -1;
}

}  // namespace

int main(int argc, char** argv) {
  const int rounds = argc > 1 ? std::atoi(argv[1]) : 200;
  const int threads = argc > 2 ? std::atoi(argv[2]) : 8;
  Context ctx;
  make_live_handles(ctx, nullptr);
  int failures = 0;

  // 1. Configure every handle on this thread: each changing method once, in header order.
  std::vector<int> changers(static_cast<std::size_t>(kHandleTypeCount), 0);
  for (int fn = 0; fn < kFunctionCount; ++fn) {
    const Fn& f = kFunctions[fn];
    const int t = handle_kind(f);
    if (f.cls != C_METHOD || !mutates_handle(f) || t < 0 || ctx.live[static_cast<std::size_t>(t)] == nullptr) continue;
    Case base;
    if (find_baseline(fn, ctx, count_for(f), base)) ++changers[static_cast<std::size_t>(t)];
  }

  // 2. The evaluations of every kind: read-only methods, cases around a valid input.
  std::vector<Case> cases;
  std::vector<int> readers(static_cast<std::size_t>(kHandleTypeCount), 0);
  for (int fn = 0; fn < kFunctionCount; ++fn) {
    const Fn& f = kFunctions[fn];
    const int t = handle_kind(f);
    if (f.cls != C_METHOD || mutates_handle(f) || t < 0 || ctx.live[static_cast<std::size_t>(t)] == nullptr) continue;
    ++readers[static_cast<std::size_t>(t)];
    Case base;
    const std::size_t n = count_for(f);
    if (!find_baseline(fn, ctx, n, base)) base = candidate(fn, 0, n);
    for (Case& c : make_cases(fn, base, ctx, 30)) cases.push_back(std::move(c));
  }

  // 3. The single-threaded outcomes, and which kinds gave usable results.
  std::vector<std::vector<std::uint64_t>> want(cases.size());
  std::vector<int> usable(static_cast<std::size_t>(kHandleTypeCount), 0), per_kind(usable);
  {
    Exec e;
    for (std::size_t i = 0; i < cases.size(); ++i) {
      e.prepare(cases[i], ctx);
      e.invoke(cases[i]);
      want[i] = e.outcome(cases[i]);
      const Fn& f = kFunctions[cases[i].fn];
      const std::size_t t = static_cast<std::size_t>(handle_kind(f));
      ++per_kind[t];
      if (f.ret != R_INT || !is_error(e.ret.code)) ++usable[t];
      e.release(cases[i], ctx);
    }
  }
  for (int t = 0; t < kHandleTypeCount; ++t) {
    const std::size_t q = static_cast<std::size_t>(t);
    std::printf("%-18s %s: %d changing functions applied, %d read-only functions, %d cases (%d usable)\n",
                kHandleTypes[t], ctx.live[q] ? "one shared handle" : "NO HANDLE", changers[q], readers[q],
                per_kind[q], usable[q]);
    if (ctx.live[q] == nullptr) {
      std::printf("FAIL %s: no handle could be created from the header's create function\n", kHandleTypes[t]);
      ++failures;
    } else if (readers[q] == 0) {
      std::printf("FAIL %s: no read-only (const handle) function\n", kHandleTypes[t]);
      ++failures;
    } else if (usable[q] == 0) {
      std::printf("FAIL %s: no evaluation gave a usable status, so the threads would test error paths only\n",
                  kHandleTypes[t]);
      ++failures;
    }
  }

  // 4. Eight threads, one shared handle per kind, every evaluation many times, bit for bit.
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
      for (int r = 0; r < rounds && m > 0; ++r) {
        for (std::size_t k = 0; k < m; ++k) {
          const std::size_t i = (k * 7919u + static_cast<std::size_t>(t) * 104729u + static_cast<std::size_t>(r)) % m;
          e.prepare(cases[i], ctx);
          e.invoke(cases[i]);
          if (e.outcome(cases[i]) != want[i] && local_bad++ < 5)
            std::printf("MISMATCH thread %d: %s(%s) on the shared handle\n", t, kFunctions[cases[i].fn].name,
                        cases[i].what.c_str());
          e.release(cases[i], ctx);
          ++local_calls;
        }
      }
      calls += local_calls;
      mismatches += local_bad;
    });
  }
  for (std::thread& th : pool) th.join();
  std::printf("capi_shared_handles: %d handle kinds, %zu cases, %d threads x %d rounds = %ld calls on shared "
              "handles, %ld mismatches\n",
              kHandleTypeCount, cases.size(), threads, rounds, calls.load(), mismatches.load());
  return failures == 0 && mismatches.load() == 0 ? 0 : 1;
}
