// libFuzzer target: every handle kind of pumploss.h through the generated C API table, so a
// kind added later is fuzzed without editing this file. One input: two bytes choose a create
// function; its arguments are fuzzed around the valid (baseline) ones as in fuzz_capi; when it
// gives a handle, up to three of the kind's changing functions (set_ / add_ / calibrate) are
// applied with fuzzed arguments, then every read-only function of the kind is called on it,
// with its valid arguments or fuzzed ones, twice; then the handle is destroyed (ASan's leak
// check sees a handle that leaks). Checks: every call keeps the conventions (as capi_badinput
// checks them), no usable status comes with an infinite output, and the two calls of a
// read-only function give the same outcome bit for bit (an evaluation never writes the handle).
#include <cstdint>
#include <cstdio>
#include <optional>
#include <string>
#include <vector>

#include "fuzz_support.hpp"

namespace {
using namespace plcapi;

int handle_of(const Fn& f, Kind k) {
  for (int p = 0; p < f.nparams; ++p)
    if (f.params[p].kind == k) return f.params[p].handle;
  return -1;
}

struct state {
  Context ctx;  // one valid handle of every kind (the other handle arguments of a call)
  std::vector<int> creates;
  std::vector<std::vector<int>> changers, readers;  // per handle kind
  std::vector<std::optional<Case>> base;
  state() : changers(static_cast<std::size_t>(kHandleTypeCount)), readers(changers) {
    make_live_handles(ctx, nullptr);
    for (int fn = 0; fn < kFunctionCount; ++fn) {
      const Fn& f = kFunctions[fn];
      if (f.cls == C_CREATE && handle_of(f, K_HOUT) >= 0) creates.push_back(fn);
      const int t = handle_of(f, K_HIN);
      if (f.cls != C_METHOD || t < 0) continue;
      (mutates_handle(f) ? changers : readers)[static_cast<std::size_t>(t)].push_back(fn);
    }
    base.resize(static_cast<std::size_t>(kFunctionCount));
  }
  Case baseline(int fn) {
    auto& b = base[static_cast<std::size_t>(fn)];
    if (!b) {
      const std::size_t n = count_for(kFunctions[fn]);
      Case c;
      if (!find_baseline(fn, ctx, n, c, 200)) c = candidate(fn, 0, n);
      b = c;
    }
    return *b;
  }
};

/// Print the case that made the handle, then the failed one, and abort.
[[noreturn]] void report_on(const Case& made, const Case& c, const std::string& msg) {
  std::fprintf(stderr, "fuzz_handles: the handle came from %s (n = %zu):\n", kFunctions[made.fn].name, made.n);
  for (int p = 0; p < kFunctions[made.fn].nparams; ++p) {
    const Arg& a = made.args[static_cast<std::size_t>(p)];
    std::fprintf(stderr, "  %s: d=%.17g i=%d s=\"%s\"", kFunctions[made.fn].params[p].name, a.d, a.i, a.s.c_str());
    for (double v : a.darr) std::fprintf(stderr, " %.17g", v);
    std::fprintf(stderr, "\n");
  }
  plfuzz::report("fuzz_handles", c, msg);
}

/// Run one case in ctx and check it; returns the outcome bits.
std::vector<std::uint64_t> run_checked(const Case& made, const Case& c, Context& ctx) {
  Exec e;
  e.prepare(c, ctx);
  e.invoke(c);
  int infinite = 0;
  std::string msg = check(c, e, &infinite);
  if (msg.empty() && infinite > 0) msg = "a usable status came with an infinite output";
  if (!msg.empty()) report_on(made, c, msg);
  std::vector<std::uint64_t> out = e.outcome(c);
  e.release(c, ctx);
  return out;
}
}  // namespace

extern "C" int LLVMFuzzerTestOneInput(const std::uint8_t* data, std::size_t size) {
  static state* st = new state();  // lives for the whole run
  FuzzedDataProvider fdp(data, size);
  const int fn = st->creates[fdp.ConsumeIntegral<std::uint16_t>() % st->creates.size()];
  const Fn& f = kFunctions[fn];
  const int type = handle_of(f, K_HOUT);
  Case c = st->baseline(fn);
  if (has_size(f) && fdp.ConsumeBool()) {
    c.n = fdp.ConsumeIntegralInRange<std::size_t>(0, 12);
    expand(c);
  }
  plfuzz::fuzz_args(fdp, c);
  Exec e;
  e.prepare(c, st->ctx);
  e.invoke(c);
  int infinite = 0;
  std::string msg = check(c, e, &infinite);
  if (!msg.empty()) plfuzz::report("fuzz_handles", c, msg);
  int out_param = -1;
  for (int p = 0; p < f.nparams; ++p)
    if (f.params[p].kind == K_HOUT) out_param = p;
  void*& made = e.hbuf[static_cast<std::size_t>(out_param)];
  if (is_error(e.ret.code) || made == nullptr || made == kHandleSentinel) return 0;

  // The new handle in a context of its own; the other kinds are the valid ones of the state.
  Context local;
  for (int t = 0; t < kHandleTypeCount; ++t) local.live[static_cast<std::size_t>(t)] = st->ctx.live[static_cast<std::size_t>(t)];
  local.live[static_cast<std::size_t>(type)] = made;
  made = nullptr;  // owned by `local` now (its destructor destroys it)

  const auto& changers = st->changers[static_cast<std::size_t>(type)];
  const int n_changes = changers.empty() ? 0 : fdp.ConsumeIntegralInRange<int>(0, 3);
  for (int k = 0; k < n_changes; ++k) {
    Case m = st->baseline(changers[fdp.ConsumeIntegral<std::uint8_t>() % changers.size()]);
    if (fdp.ConsumeBool()) plfuzz::fuzz_args(fdp, m);
    run_checked(c, m, local);
  }
  for (int r : st->readers[static_cast<std::size_t>(type)]) {
    Case q = st->baseline(r);
    if (fdp.ConsumeBool()) plfuzz::fuzz_args(fdp, q);
    if (run_checked(c, q, local) != run_checked(c, q, local))
      report_on(c, q, "two calls of a read-only function on one handle differ");
  }
  for (int t = 0; t < kHandleTypeCount; ++t)
    if (t != type) local.live[static_cast<std::size_t>(t)] = nullptr;
  return 0;
}
