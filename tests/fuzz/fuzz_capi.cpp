// libFuzzer target: every function of pumploss.h through the generated C API table
// (tools/capigen/capigen.py), so functions added later are fuzzed without editing this file.
// Input: two bytes choose the function; then, per parameter, a control byte and its payload:
// keep the function's valid (baseline) value, one of the special values (NaN, +/-inf, 0, -0,
// negative, 1e-300, 1e300, subnormal, DBL_MAX), the raw bits of a double (any NaN payload,
// subnormals), or the baseline scaled by 10^[-6, 6]; arrays element by element; strings from
// the bytes; n from 0 to 6 for functions with a size_t; NULL for a pointer now and then.
// Each call is checked against the conventions exactly as capi_badinput checks them, and in
// addition a usable status must never come with an infinite output.
#include <cmath>
#include <cstdint>
#include <cstdio>
#include <cstdlib>
#include <cstring>
#include <memory>
#include <optional>
#include <string>
#include <vector>

#include <fuzzer/FuzzedDataProvider.h>

#include "fuzz_support.hpp"

namespace {
using namespace plcapi;
using plfuzz::fuzz_args;

struct state {
  Context ctx;
  std::vector<int> fns;                    // functions that can be fuzzed (not destroy)
  std::vector<std::optional<Case>> base;  // baseline per function, found on first use
  state() {
    make_live_handles(ctx, nullptr);
    for (int f = 0; f < kFunctionCount; ++f)
      if (kFunctions[f].cls != C_DESTROY) fns.push_back(f);
    base.resize(static_cast<std::size_t>(kFunctionCount));
  }
  const Case& baseline(int fn, std::size_t n) {
    auto& b = base[static_cast<std::size_t>(fn)];
    if (!b) {
      Case c;
      if (!find_baseline(fn, ctx, n, c, 200)) c = candidate(fn, 0, n);
      b = c;
    }
    return *b;
  }
};

}  // namespace

extern "C" int LLVMFuzzerTestOneInput(const std::uint8_t* data, std::size_t size) {
  static state* st = new state();  // lives for the whole run (handles stay valid)
  FuzzedDataProvider fdp(data, size);
  const int fn = st->fns[fdp.ConsumeIntegral<std::uint16_t>() % st->fns.size()];
  const Fn& f = kFunctions[fn];
  const std::size_t n0 = has_size(f) ? 5 : 0;
  Case c = st->baseline(fn, n0);
  if (has_size(f)) {
    c.n = fdp.ConsumeIntegralInRange<std::size_t>(0, 6);
    expand(c);
  }
  fuzz_args(fdp, c);
  Exec e;
  e.prepare(c, st->ctx);
  e.invoke(c);
  int infinite = 0;
  std::string msg = check(c, e, &infinite);
  if (msg.empty() && infinite > 0) msg = "a usable status came with an infinite output";
  e.release(c, st->ctx);
  if (!msg.empty()) plfuzz::report("fuzz_capi", c, msg);
  return 0;
}
