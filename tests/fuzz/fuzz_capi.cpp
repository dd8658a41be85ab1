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

#include "capi_harness.hpp"

namespace {
using namespace plcapi;

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

double fuzz_double(FuzzedDataProvider& fdp, double base) {
  const std::uint8_t ctl = fdp.ConsumeIntegral<std::uint8_t>();
  switch (ctl % 4) {
    case 0: return base;
    case 1: {
      const auto sp = special_doubles(base);
      return sp[(ctl / 4u) % sp.size()];
    }
    case 2: {
      const std::uint64_t b = fdp.ConsumeIntegral<std::uint64_t>();
      double v;
      std::memcpy(&v, &b, sizeof v);
      return v;
    }
    default: return base * std::pow(10.0, fdp.ConsumeFloatingPointInRange<double>(-6.0, 6.0));
  }
}
int fuzz_int(FuzzedDataProvider& fdp, int base) {
  const std::uint8_t ctl = fdp.ConsumeIntegral<std::uint8_t>();
  switch (ctl % 3) {
    case 0: return base;
    case 1: {
      const auto sp = special_ints();
      return sp[(ctl / 3u) % sp.size()];
    }
    default: return fdp.ConsumeIntegral<int>();
  }
}
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
  for (int p = 0; p < f.nparams; ++p) {
    Arg& a = c.args[static_cast<std::size_t>(p)];
    const Param& pr = f.params[p];
    switch (pr.kind) {
      case K_DIN: a.d = fuzz_double(fdp, a.d); break;
      case K_IIN: a.i = fuzz_int(fdp, a.i); break;
      case K_STR:
        if (fdp.ConsumeBool()) a.s = fdp.ConsumeRandomLengthString(40);
        break;
      case K_DARR:
        for (double& v : a.darr) v = fuzz_double(fdp, v);
        break;
      case K_IARR:
        for (int& v : a.iarr) v = fuzz_int(fdp, v);
        break;
      default: break;
    }
    // a NULL pointer now and then (1 in 32)
    if (is_pointer(pr.kind) && (fdp.ConsumeIntegral<std::uint8_t>() & 31u) == 31u) a.null = true;
  }
  Exec e;
  e.prepare(c, st->ctx);
  e.invoke(c);
  int infinite = 0;
  std::string msg = check(c, e, &infinite);
  if (msg.empty() && infinite > 0) msg = "a usable status came with an infinite output";
  e.release(c, st->ctx);
  if (!msg.empty()) {
    std::fprintf(stderr, "fuzz_capi: %s: %s (n = %zu)\n", f.name, msg.c_str(), c.n);
    for (int p = 0; p < f.nparams; ++p) {
      const Arg& a = c.args[static_cast<std::size_t>(p)];
      std::fprintf(stderr, "  %s: null=%d d=%.17g i=%d s=\"%s\"", f.params[p].name, a.null ? 1 : 0, a.d, a.i,
                   a.s.c_str());
      for (double v : a.darr) std::fprintf(stderr, " %.17g", v);
      std::fprintf(stderr, "\n");
    }
    std::abort();
  }
  return 0;
}
