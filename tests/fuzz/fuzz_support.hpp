// Shared by the libFuzzer targets that drive pumploss.h through the generated C API table
// (fuzz_capi, fuzz_handles): fuzzed doubles, ints and whole argument lists around a valid case.
#ifndef PUMPLOSS_FUZZ_SUPPORT_HPP
#define PUMPLOSS_FUZZ_SUPPORT_HPP

#include <cmath>
#include <cstdint>
#include <cstdio>
#include <cstring>
#include <string>

#include <fuzzer/FuzzedDataProvider.h>

#include "capi_harness.hpp"

namespace plfuzz {
using namespace plcapi;

/// A double: the valid value, a special value (NaN, +/-inf, 0, -0, negative, 1e-300, 1e300,
/// subnormal, DBL_MAX), the raw bits of a double, or the valid value scaled by 10^[-6, 6].
inline double fuzz_double(FuzzedDataProvider& fdp, double base) {
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

/// An int: the valid value, a special one (0, -1, 1, 2, 100, 1e6, INT_MIN, INT_MAX) or any.
inline int fuzz_int(FuzzedDataProvider& fdp, int base) {
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

/// Fuzz every argument of case c in place (its n already set and expanded): scalars, array
/// elements, strings, and a NULL pointer now and then (1 in 32).
inline void fuzz_args(FuzzedDataProvider& fdp, Case& c) {
  const Fn& f = kFunctions[c.fn];
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
    if (is_pointer(pr.kind) && (fdp.ConsumeIntegral<std::uint8_t>() & 31u) == 31u) a.null = true;
  }
}

/// Print a failed case (function, message, every argument) and abort: a finding.
[[noreturn]] inline void report(const char* target, const Case& c, const std::string& msg) {
  const Fn& f = kFunctions[c.fn];
  std::fprintf(stderr, "%s: %s: %s (n = %zu)\n", target, f.name, msg.c_str(), c.n);
  for (int p = 0; p < f.nparams; ++p) {
    const Arg& a = c.args[static_cast<std::size_t>(p)];
    std::fprintf(stderr, "  %s: null=%d d=%.17g i=%d s=\"%s\"", f.params[p].name, a.null ? 1 : 0, a.d, a.i,
                 a.s.c_str());
    for (double v : a.darr) std::fprintf(stderr, " %.17g", v);
    std::fprintf(stderr, "\n");
  }
  std::abort();
}

}  // namespace plfuzz

#endif
