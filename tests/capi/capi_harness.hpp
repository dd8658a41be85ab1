// Shared machinery of the table-driven C API tests (bad input, threads, no allocation).
//
// capi_table.inc is generated at build time by tools/capigen/capigen.py from pumploss.h: one entry per
// exported function with its parameter kinds and a thunk that calls it from an array of slots.
// Here: finding a valid ("baseline") input for each function by a deterministic search around
// the generator's first guess, building the call cases (special values in every scalar
// position, NULL in every pointer position, bad array elements, n = 0, random mixtures),
// executing a case, and checking the result against the conventions of pumploss.h.
#ifndef PUMPLOSS_CAPI_HARNESS_HPP
#define PUMPLOSS_CAPI_HARNESS_HPP

#include <cmath>
#include <cstddef>
#include <cstdint>
#include <cstdio>
#include <algorithm>
#include <cstring>
#include <limits>
#include <random>
#include <string>
#include <vector>

#include "pumploss.h"

namespace plcapi {

enum Kind { K_DIN, K_IIN, K_SIZE, K_BUFLEN, K_DARR, K_DOUT, K_IOUT, K_ZOUT, K_IARR, K_STR, K_CBUF, K_HIN, K_HOUT };
enum RetKind { R_INT, R_VALUE, R_VOID, R_STR };
enum FnClass { C_SCALAR, C_BATCH, C_CREATE, C_DESTROY, C_METHOD };

/// One argument as the thunks read it (only the member of the parameter's kind is used).
struct Slot {
  double d = 0.0;
  int i = 0;
  std::size_t z = 0;
  const double* cpd = nullptr;
  double* pd = nullptr;
  const int* cpi = nullptr;
  int* pi = nullptr;
  std::size_t* pz = nullptr;
  const char* s = nullptr;
  char* buf = nullptr;
  void* h = nullptr;
  void** ph = nullptr;
};
struct Ret {
  int code = 0;
  const char* str = nullptr;
};
struct Param {
  Kind kind;
  const char* name;
  int handle;    ///< handle type index for K_HIN / K_HOUT, else -1
  double guess;  ///< first guess of a valid value (from the unit suffix of the name)
  bool array;    ///< an array of n^k elements (k size_t parameters); else one value
  bool readonly; ///< K_HIN declared const: the function only reads the handle
};
/// True when the function changes a handle (a non-const handle parameter): such calls must not
/// run concurrently on one handle (documented), so the thread test leaves them out.
inline bool mutates_handle(const struct Fn& f);
struct Fn {
  const char* name;
  RetKind ret;
  FnClass cls;
  int nparams;
  const Param* params;
  void (*thunk)(Slot*, Ret*);
};

}  // namespace plcapi

#include "capi_table.inc"

namespace plcapi {

constexpr double kNaN = std::numeric_limits<double>::quiet_NaN();
constexpr double kInf = std::numeric_limits<double>::infinity();
constexpr double kSentinel = 777.25;  ///< pre-filled into outputs to see what was written
/// Storage behind an empty but valid input array (never read: its count is 0).
inline const double kEmptyDoubles[1] = {0.0};
inline const int kEmptyInts[1] = {0};
inline void* const kHandleSentinel = reinterpret_cast<void*>(static_cast<std::uintptr_t>(0x10));

inline bool is_error(int c) { return c > 0 && c < 100; }
inline bool documented(int c) {
  for (int k : kStatusCodes)
    if (k == c) return true;
  return false;
}
inline bool is_pointer(Kind k) {
  return k == K_DARR || k == K_DOUT || k == K_IOUT || k == K_ZOUT || k == K_IARR || k == K_STR || k == K_CBUF ||
         k == K_HIN || k == K_HOUT;
}
inline bool is_output(Kind k) { return k == K_DOUT || k == K_IOUT || k == K_ZOUT || k == K_CBUF || k == K_HOUT; }
inline bool mutates_handle(const Fn& f) {
  for (int p = 0; p < f.nparams; ++p)
    if (f.params[p].kind == K_HIN && !f.params[p].readonly) return true;
  return false;
}
inline bool has_size(const Fn& f) {
  for (int p = 0; p < f.nparams; ++p)
    if (f.params[p].kind == K_SIZE) return true;
  return false;
}
/// Length of the array parameters of a call with length n: n to the power of the number of
/// size_t parameters (each is set to n), so a map of n_dp x n_speed points gets n^2.
inline std::size_t array_length(const Fn& f, std::size_t n) {
  std::size_t len = 1;
  for (int p = 0; p < f.nparams; ++p)
    if (f.params[p].kind == K_SIZE) len *= n;
  return len;
}
/// The per-element status array of a batch function (an int array named "status"), or -1.
inline int status_param_of(const Fn& f) {
  for (int p = 0; p < f.nparams; ++p)
    if (f.params[p].kind == K_IOUT && f.params[p].array && std::strcmp(f.params[p].name, "status") == 0) return p;
  return -1;
}
/// Calls the tests check for statuses (int return with parameters).
inline bool returns_status(const Fn& f) { return f.ret == R_INT; }

/// The value of one argument of a case.
struct Arg {
  bool null = false;
  bool bare = false;         ///< K_HIN: the unconfigured handle of its kind (Context::bare)
  double d = 0.0;            ///< K_DIN; base of the elements of a K_DARR
  int i = 0;                 ///< K_IIN; base of a K_IARR
  std::vector<double> darr;  ///< K_DARR elements (size n)
  std::vector<int> iarr;     ///< K_IARR elements
  std::string s;             ///< K_STR
};

/// One call: the function, its arguments and, for functions with a size_t, the length n.
struct Case {
  int fn = 0;
  std::vector<Arg> args;
  std::size_t n = 0;
  std::string what;
};

/// Valid handles (one per handle type where a create function succeeded) and destroy functions.
struct Context {
  std::vector<void*> live = std::vector<void*>(static_cast<std::size_t>(kHandleTypeCount) + 1, nullptr);
  std::vector<int> destroy = std::vector<int>(static_cast<std::size_t>(kHandleTypeCount) + 1, -1);
  /// Per kind made by a builder: a handle straight from its create function, not configured
  /// (a health handle without its description), for the n = 0 rule; NULL where none.
  std::vector<void*> bare = std::vector<void*>(static_cast<std::size_t>(kHandleTypeCount) + 1, nullptr);
  Context() {
    for (int f = 0; f < kFunctionCount; ++f)
      if (kFunctions[f].cls == C_DESTROY) destroy[static_cast<std::size_t>(kFunctions[f].params[0].handle)] = f;
  }
  void destroy_handle(int type, void* h) const {
    const int f = destroy[static_cast<std::size_t>(type)];
    if (f < 0 || h == nullptr) return;
    Slot s;
    s.h = h;
    Ret r;
    kFunctions[f].thunk(&s, &r);
  }
  ~Context() {
    for (int t = 0; t < kHandleTypeCount; ++t) {
      destroy_handle(t, live[static_cast<std::size_t>(t)]);
      destroy_handle(t, bare[static_cast<std::size_t>(t)]);
    }
  }
  Context(const Context&) = delete;
  Context& operator=(const Context&) = delete;
};

/// Buffers of one execution. prepare() allocates; invoke() only calls (for the no-allocation
/// test); release() destroys a handle the call created.
struct Exec {
  std::vector<Slot> slots;
  std::vector<std::vector<double>> dbuf;
  std::vector<std::vector<int>> ibuf;
  std::vector<std::vector<std::size_t>> zbuf;
  std::vector<std::vector<char>> cbuf;
  std::vector<void*> hbuf;
  Ret ret;

  void prepare(const Case& c, const Context& ctx) {
    const Fn& f = kFunctions[c.fn];
    const std::size_t np = static_cast<std::size_t>(f.nparams);
    slots.assign(np, Slot{});
    dbuf.resize(np);
    ibuf.resize(np);
    zbuf.resize(np);
    cbuf.resize(np);
    hbuf.assign(np, nullptr);
    const std::size_t alen = array_length(f, c.n);
    for (std::size_t p = 0; p < np; ++p) {
      const Param& pr = f.params[p];
      const Arg& a = c.args[p];
      Slot& s = slots[p];
      const std::size_t len = pr.array ? alen : 1;
      switch (pr.kind) {
        case K_DIN: s.d = a.d; break;
        case K_IIN: s.i = a.i; break;
        case K_SIZE: s.z = c.n; break;
        case K_BUFLEN: s.z = 256; break;
        // a valid array is never NULL, also when it is empty (an empty vector's data() may be)
        case K_DARR: s.cpd = a.null ? nullptr : (a.darr.empty() ? &kEmptyDoubles[0] : a.darr.data()); break;
        case K_IARR: s.cpi = a.null ? nullptr : (a.iarr.empty() ? &kEmptyInts[0] : a.iarr.data()); break;
        case K_STR: s.s = a.null ? nullptr : a.s.c_str(); break;
        case K_DOUT:
          dbuf[p].assign(len == 0 ? 1 : len, kSentinel);
          s.pd = a.null ? nullptr : dbuf[p].data();
          break;
        case K_IOUT:
          ibuf[p].assign(len == 0 ? 1 : len, -777);
          s.pi = a.null ? nullptr : ibuf[p].data();
          break;
        case K_ZOUT:
          zbuf[p].assign(len == 0 ? 1 : len, 777u);
          s.pz = a.null ? nullptr : zbuf[p].data();
          break;
        case K_CBUF:
          cbuf[p].assign(256, 'x');
          s.buf = a.null ? nullptr : cbuf[p].data();
          break;
        case K_HIN: s.h = a.null ? nullptr : (a.bare ? ctx.bare : ctx.live)[static_cast<std::size_t>(pr.handle)]; break;
        case K_HOUT:
          hbuf[p] = kHandleSentinel;
          s.ph = a.null ? nullptr : &hbuf[p];
          break;
      }
    }
    ret = Ret{};
  }
  void invoke(const Case& c) { kFunctions[c.fn].thunk(slots.data(), &ret); }
  void release(const Case& c, const Context& ctx) {
    const Fn& f = kFunctions[c.fn];
    for (int p = 0; p < f.nparams; ++p) {
      const std::size_t q = static_cast<std::size_t>(p);
      if (f.params[p].kind == K_HOUT && hbuf[q] != kHandleSentinel && hbuf[q] != nullptr) {
        ctx.destroy_handle(f.params[p].handle, hbuf[q]);
        hbuf[q] = nullptr;
      }
    }
  }
  /// Everything observable, as bits, for bit-exact comparisons between threads.
  std::vector<std::uint64_t> outcome(const Case& c) const {
    const Fn& f = kFunctions[c.fn];
    std::vector<std::uint64_t> o;
    o.push_back(static_cast<std::uint64_t>(static_cast<std::int64_t>(ret.code)));
    o.push_back(static_cast<std::uint64_t>(reinterpret_cast<std::uintptr_t>(ret.str)));
    for (int p = 0; p < f.nparams; ++p) {
      const std::size_t q = static_cast<std::size_t>(p);
      switch (f.params[p].kind) {
        case K_DOUT:
          for (double v : dbuf[q]) {
            std::uint64_t b;
            std::memcpy(&b, &v, sizeof b);
            o.push_back(b);
          }
          break;
        case K_IOUT:
          for (int v : ibuf[q]) o.push_back(static_cast<std::uint64_t>(static_cast<std::int64_t>(v)));
          break;
        case K_ZOUT:
          for (std::size_t v : zbuf[q]) o.push_back(static_cast<std::uint64_t>(v));
          break;
        case K_CBUF:
          for (char ch : cbuf[q]) o.push_back(static_cast<std::uint64_t>(static_cast<unsigned char>(ch)));
          break;
        case K_HOUT: o.push_back(hbuf[q] == nullptr ? 0u : hbuf[q] == kHandleSentinel ? 1u : 2u); break;
        default: break;
      }
    }
    return o;
  }
};

/// Special scalar inputs: the list and a few more edges.
inline std::vector<double> special_doubles(double base) {
  return {kNaN, kInf, -kInf, 0.0, -0.0, -1.0, -base, 1e-300, -1e-300, 1e300, -1e300,
          std::numeric_limits<double>::denorm_min(), std::numeric_limits<double>::max()};
}
inline std::vector<int> special_ints() {
  return {0, -1, 1, 2, 100, 1000000, std::numeric_limits<int>::min(), std::numeric_limits<int>::max()};
}
inline std::vector<std::string> special_strings() {
  return {"", "?", std::string(300, 'a'), "\xc3\xa9", "bar ", "Pa\t", "%s%n"};
}
inline const std::vector<std::string>& unit_words() {
  static const std::vector<std::string> w = {"bar", "Pa",   "MPa", "psi",  "K",  "degC", "m3/s",
                                             "L/min", "mm2/s", "cSt", "rpm", "m",  "mm",   "kW"};
  return w;
}

/// Fill the arrays of a case from the per-argument bases (elements vary by 5 % each, so fits
/// see distinct points).
inline void expand(Case& c) {
  const Fn& f = kFunctions[c.fn];
  for (int p = 0; p < f.nparams; ++p) {
    Arg& a = c.args[static_cast<std::size_t>(p)];
    if (f.params[p].kind == K_DARR && !a.null) {
      a.darr.assign(std::max<std::size_t>(1, array_length(f, c.n)), 0.0);
      for (std::size_t j = 0; j < a.darr.size(); ++j) a.darr[j] = a.d * (1.0 + 0.05 * static_cast<double>(j));
    } else if (f.params[p].kind == K_IARR && !a.null) {
      a.iarr.assign(std::max<std::size_t>(1, array_length(f, c.n)), a.i);
    }
  }
}

/// Candidate k of a valid input: k = 0 is the generator's guess, later ones are deterministic
/// random spreads around it (factor 10^[-1.5, 1.5], unit words, small integers).
inline Case candidate(int fn, int k, std::size_t n) {
  const Fn& f = kFunctions[fn];
  Case c;
  c.fn = fn;
  c.n = n;
  c.args.resize(static_cast<std::size_t>(f.nparams));
  std::mt19937_64 rng(0x5eedu + 7919u * static_cast<unsigned>(fn) + 104729u * static_cast<unsigned>(k));
  std::uniform_real_distribution<double> u(-1.5, 1.5);
  const int small[] = {0, 1, 2, 3, 5, 7, 9, 10, 46, 68, 100};
  for (int p = 0; p < f.nparams; ++p) {
    Arg& a = c.args[static_cast<std::size_t>(p)];
    const Param& pr = f.params[p];
    if (pr.kind == K_DIN || pr.kind == K_DARR) {
      a.d = k == 0 ? pr.guess : pr.guess * std::pow(10.0, u(rng));
    } else if (pr.kind == K_IIN || pr.kind == K_IARR) {
      a.i = k == 0 ? static_cast<int>(pr.guess) : small[rng() % (sizeof small / sizeof small[0])];
    } else if (pr.kind == K_STR) {
      a.s = k == 0 ? "bar" : unit_words()[rng() % unit_words().size()];
    }
  }
  expand(c);
  return c;
}

/// Run a case once (prepare, invoke, release) and return its status code.
inline int run_once(const Case& c, const Context& ctx, Exec& e) {
  e.prepare(c, ctx);
  e.invoke(c);
  const int code = e.ret.code;
  e.release(c, ctx);
  return code;
}

/// The valid input of a function: the first candidate with PUMPLOSS_OK, else the first with a
/// report code. Returns false when none of `tries` candidates gives a usable status.
inline bool find_baseline(int fn, const Context& ctx, std::size_t n, Case& out, int tries = 600) {
  const Fn& f = kFunctions[fn];
  if (!returns_status(f)) {
    out = candidate(fn, 0, n);
    return true;
  }
  Exec e;
  bool have_report = false;
  for (int k = 0; k < tries; ++k) {
    Case c = candidate(fn, k, n);
    const int code = run_once(c, ctx, e);
    if (code == PUMPLOSS_OK) {
      out = c;
      return true;
    }
    if (!is_error(code) && !have_report) {
      out = c;
      have_report = true;
    }
  }
  return have_report;
}

// ---- Builders: valid handles of the kinds that guessed inputs cannot make ----
//
// A create function that needs a configured handle of another kind (the health monitor needs a
// described health handle) or arrays that agree with each other (a test stand needs readings of
// one pump) cannot be satisfied by the search around the generator's guesses; nor does an
// unconfigured handle show what its evaluations do. A builder makes such a handle through the C
// API, as an embedder would. Keyed by the handle type's name in pumploss.h; a kind with no
// builder is made by the generic search.

/// A health assessor of an invented 71 cm3/rev pump (data as tests/capi/c_caller.c's),
/// described for the version 2 model, with a baseline.
inline pumploss_health* build_health_raw() {
  pumploss_health* h = nullptr;
  if (pumploss_health_create(71e-6, 250e5, 323.15, 313.15, 46e-6, 373.15, 6.8e-6, 870.0, 1900.0, &h) != PUMPLOSS_OK)
    return nullptr;
  if (pumploss_health_set_description(h, 0.3e-3 / 60.0, 0.0, 25.0, 25.0) != PUMPLOSS_OK ||
      pumploss_health_set_baseline(h, 4.0e-3 / 60.0) != PUMPLOSS_OK) {
    pumploss_health_destroy(h);
    return nullptr;
  }
  return h;
}
inline void* build_health() { return build_health_raw(); }

/// A monitor of that pump that has learned its baseline and noise from 12 readings of a sound
/// pump (4 L/min at the reference state, +/- 0.1 %), so its state is readable.
inline void* build_health_monitor() {
  pumploss_health* h = build_health_raw();
  if (h == nullptr) return nullptr;
  pumploss_health_monitor* m = nullptr;
  const int st = pumploss_health_monitor_create(h, 8, 2, 0.05, &m);
  pumploss_health_destroy(h);  // the monitor keeps a copy
  if (st != PUMPLOSS_OK) return nullptr;
  const double nv = std::numeric_limits<double>::quiet_NaN();
  for (int i = 0; i < 12; ++i) {
    int level = 0, raw = 0, events = 0;
    double qn = 0.0;
    const double q = 4.0e-3 / 60.0 * (1.0 + 0.001 * (i % 3 - 1));
    if (pumploss_health_monitor_feed(m, static_cast<double>(i), q, 250e5, 0.0, 323.15, 25.0, nv, nv,
                                     PUMPLOSS_STATE_ON_STROKE, &level, &raw, &events, &qn) != PUMPLOSS_OK) {
      pumploss_health_monitor_destroy(m);
      return nullptr;
    }
  }
  return m;
}

/// Readings and map grid of the test-stand builder: 3 speeds x 3 pressures = 9 readings, and a
/// map of 9 x 9 (the harness calls an evaluation with every count equal to n).
constexpr std::size_t kTestStandReadings = 9;

/// A configured test-stand setup of the pump below: oil VG 46, instruments, a 9 x 9 map grid.
inline pumploss_test_stand_setup* build_test_stand_setup_raw() {
  pumploss_test_stand_setup* s = nullptr;
  if (pumploss_test_stand_setup_create(PUMPLOSS_PUMP, 71e-6, 313.15, 46e-6, 373.15, 6.9e-6, &s) != PUMPLOSS_OK)
    return nullptr;
  const bool ok = pumploss_test_stand_setup_set_oil(s, 872.0, 288.15, 7e-4, 1.6e9) == PUMPLOSS_OK &&
                  pumploss_test_stand_setup_set_instrument(s, PUMPLOSS_TS_FLOW, 0.3, 0.0, PUMPLOSS_TS_LIMITS) == PUMPLOSS_OK &&
                  pumploss_test_stand_setup_set_instrument(s, PUMPLOSS_TS_TORQUE, 0.2, 0.1, PUMPLOSS_TS_LIMITS) == PUMPLOSS_OK &&
                  pumploss_test_stand_setup_set_map(s, 500.0 / 60, 1500.0 / 60, 50e5, 250e5, 323.15, kTestStandReadings,
                                                    kTestStandReadings) == PUMPLOSS_OK;
  if (!ok) {
    pumploss_test_stand_setup_destroy(s);
    return nullptr;
  }
  return s;
}
inline void* build_test_stand_setup() { return build_test_stand_setup_raw(); }

/// A reduced test of a known pump (invented, self-calculated): 71 cm3/rev, slip 2e-12 m^3/(s Pa),
/// torque 1.05 x ideal + 2 N m, drain 1.5e-12 m^3/(s Pa), at 500, 1000 and 1500 rpm and 50, 150
/// and 250 bar, inlet 45 degC, drain 50 degC.
inline void* build_test_stand() {
  pumploss_test_stand_setup* s = build_test_stand_setup_raw();
  if (s == nullptr) return nullptr;
  constexpr std::size_t n = kTestStandReadings;
  double speed[n], p1[n], p2[n], q[n], torque[n], drain[n], t_in[n], t_drain[n], none[n];
  for (std::size_t k = 0; k < n; ++k) {
    speed[k] = (500.0 + 500.0 * static_cast<double>(k / 3)) / 60.0;
    p1[k] = 0.3e5;
    p2[k] = p1[k] + 50e5 + 100e5 * static_cast<double>(k % 3);
    const double dp = p2[k] - p1[k];
    q[k] = 71e-6 * speed[k] - 2e-12 * dp;
    torque[k] = 1.05 * 71e-6 * dp / (2.0 * 3.14159265358979324) + 2.0;
    drain[k] = 1.5e-12 * dp;
    t_in[k] = 318.15;
    t_drain[k] = 323.15;
    none[k] = std::numeric_limits<double>::quiet_NaN();
  }
  pumploss_test_stand* t = nullptr;
  char msg[256];
  const int st = pumploss_test_stand_create(s, n, speed, p1, p2, q, torque, drain, t_in, none, t_drain, none, msg,
                                            sizeof msg, &t);
  pumploss_test_stand_setup_destroy(s);  // the reduction keeps what it needs
  if (st > 0 && st < 100) return nullptr;
  return t;
}

struct Builder {
  const char* type;   ///< the handle type's name in pumploss.h
  void* (*make)();    ///< a valid handle, NULL when the C API refused (then the test fails: no handle)
  std::size_t n;      ///< the count its evaluations need in every size_t (0: the harness default)
};
inline const Builder kBuilders[] = {
    {"pumploss_health", &build_health, 0},
    {"pumploss_health_monitor", &build_health_monitor, PUMPLOSS_HEALTH_MONITOR_STATE_COUNT},
    {"pumploss_test_stand_setup", &build_test_stand_setup, 0},
    {"pumploss_test_stand", &build_test_stand, kTestStandReadings},
};
/// The builder of handle type t, or NULL.
inline const Builder* builder_of(int t) {
  for (const Builder& b : kBuilders)
    if (std::strcmp(b.type, kHandleTypes[t]) == 0) return &b;
  return nullptr;
}
/// The count n the tests give a function's size_t parameters: 0 without one; the builder's
/// count for an evaluation of a kind that needs its own (a test stand's readings, a monitor's
/// state length); else 5.
inline std::size_t count_for(const Fn& f) {
  if (!has_size(f)) return 0;
  for (int p = 0; p < f.nparams; ++p) {
    if (f.params[p].kind != K_HIN) continue;
    const Builder* b = builder_of(f.params[p].handle);
    if (b != nullptr && b->n > 0) return b->n;
  }
  return 5;
}

/// How a live handle was made: the create function, its input and the output position, so
/// that fresh handles can be made again without searching for valid inputs; or the builder.
struct Recipe {
  int type, fn, out_param;
  Case c;
  void* (*make)() = nullptr;
};

/// Run a recipe in ctx; true when it gave a handle (then ctx.live[type] holds it, or
/// ctx.bare[type] when `bare`).
inline bool cook(const Recipe& r, Context& ctx, Exec& e, bool bare = false) {
  if (r.make != nullptr) {
    void* h = r.make();
    if (h != nullptr) ctx.live[static_cast<std::size_t>(r.type)] = h;
    return h != nullptr;
  }
  e.prepare(r.c, ctx);
  e.invoke(r.c);
  void*& h = e.hbuf[static_cast<std::size_t>(r.out_param)];
  const bool made = !is_error(e.ret.code) && h != nullptr && h != kHandleSentinel;
  if (made) {
    (bare ? ctx.bare : ctx.live)[static_cast<std::size_t>(r.type)] = h;
    h = nullptr;
  }
  e.release(r.c, ctx);
  return made;
}

/// Create one live handle per handle type: by its builder, else from the first create function
/// with a valid input;
/// the recipes that worked go to `recipes` when given (make_from_recipes() repeats them).
inline void make_live_handles(Context& ctx, std::vector<std::string>* notes, std::vector<Recipe>* recipes = nullptr) {
  for (int t = 0; t < kHandleTypeCount; ++t) {
    if (const Builder* b = builder_of(t)) {
      Recipe r{t, -1, -1, Case{}, b->make};
      Exec e;
      if (cook(r, ctx, e)) {
        if (recipes) recipes->push_back(r);
      } else if (notes) {
        notes->push_back(std::string("the builder of ") + kHandleTypes[t] + " failed: the C API refused its data");
      }
    }
    // a kind with a builder also gets an unconfigured handle from its create function (bare)
    const bool bare = builder_of(t) != nullptr;
    auto& slot = (bare ? ctx.bare : ctx.live)[static_cast<std::size_t>(t)];
    for (int fn = 0; fn < kFunctionCount && slot == nullptr; ++fn) {
      const Fn& f = kFunctions[fn];
      if (f.cls != C_CREATE) continue;
      int out_param = -1;
      for (int p = 0; p < f.nparams; ++p)
        if (f.params[p].kind == K_HOUT && f.params[p].handle == t) out_param = p;
      if (out_param < 0) continue;
      Recipe r{t, fn, out_param, Case{}};
      if (!find_baseline(fn, ctx, 8, r.c)) continue;
      Exec e;
      if (cook(r, ctx, e, bare) && recipes && !bare) recipes->push_back(r);
    }
    if (ctx.live[static_cast<std::size_t>(t)] == nullptr && notes)
      notes->push_back(std::string("no valid ") + kHandleTypes[t] +
                       " could be created: its methods are tested with NULL handles only");
  }
}

/// A fresh handle of every type that make_live_handles() could make, from its recipes.
inline void make_from_recipes(const std::vector<Recipe>& recipes, Context& ctx, Exec& e) {
  for (const Recipe& r : recipes) cook(r, ctx, e);
}

/// All cases of one function: the baseline, special values in every scalar position, NULL in
/// every pointer position, bad array elements, n = 0, and `random_mix` random mixtures.
inline std::vector<Case> make_cases(int fn, const Case& base, const Context& ctx, int random_mix) {
  const Fn& f = kFunctions[fn];
  std::vector<Case> cases;
  const bool live_ok = [&] {
    for (int p = 0; p < f.nparams; ++p)
      if (f.params[p].kind == K_HIN && ctx.live[static_cast<std::size_t>(f.params[p].handle)] == nullptr) return false;
    return true;
  }();
  auto push = [&](Case c, std::string what) {
    c.what = std::move(what);
    cases.push_back(std::move(c));
  };
  if (f.cls == C_DESTROY) {  // only destroy(NULL): a no-op
    Case c = base;
    c.args[0].null = true;
    push(c, "destroy(NULL)");
    return cases;
  }
  // Handle arguments NULL (expect EMISUSE); everything else needs a live handle.
  for (int p = 0; p < f.nparams; ++p) {
    if (f.params[p].kind != K_HIN) continue;
    Case c = base;
    c.args[static_cast<std::size_t>(p)].null = true;
    push(c, std::string(f.params[p].name) + " = NULL");
  }
  if (!live_ok) return cases;
  push(base, "baseline");
  for (int p = 0; p < f.nparams; ++p) {
    const std::size_t q = static_cast<std::size_t>(p);
    const Param& pr = f.params[p];
    const Arg& b = base.args[q];
    if (pr.kind == K_DIN) {
      for (double v : special_doubles(b.d)) {
        Case c = base;
        c.args[q].d = v;
        char buf[96];
        std::snprintf(buf, sizeof buf, "%s = %.17g", pr.name, v);
        push(c, buf);
      }
    } else if (pr.kind == K_IIN) {
      for (int v : special_ints()) {
        Case c = base;
        c.args[q].i = v;
        push(c, std::string(pr.name) + " = " + std::to_string(v));
      }
    } else if (pr.kind == K_STR) {
      for (const std::string& v : special_strings()) {
        Case c = base;
        c.args[q].s = v;
        push(c, std::string(pr.name) + " = \"" + (v.size() > 20 ? v.substr(0, 20) + "..." : v) + "\"");
      }
    } else if (pr.kind == K_DARR && base.n > 0) {
      int j = 0;
      for (double v : special_doubles(b.d)) {
        Case c = base;
        c.args[q].darr[static_cast<std::size_t>(j) % c.n] = v;
        char buf[96];
        std::snprintf(buf, sizeof buf, "%s[%d] = %.17g", pr.name, j % static_cast<int>(c.n), v);
        push(c, buf);
        ++j;
      }
    } else if (pr.kind == K_IARR && base.n > 0) {
      for (int v : special_ints()) {
        Case c = base;
        c.args[q].iarr[1 % c.n] = v;
        push(c, std::string(pr.name) + "[1] = " + std::to_string(v));
      }
    }
    if (is_pointer(pr.kind) && pr.kind != K_HIN) {
      Case c = base;
      c.args[q].null = true;
      push(c, std::string(pr.name) + " = NULL");
      // NULL wins over every other problem: with all scalars bad as well, still EMISUSE
      for (int r = 0; r < f.nparams; ++r) {
        Arg& o = c.args[static_cast<std::size_t>(r)];
        if (f.params[r].kind == K_DIN) o.d = kNaN;
        if (f.params[r].kind == K_IIN) o.i = std::numeric_limits<int>::min();
      }
      push(c, std::string(pr.name) + " = NULL, every scalar NaN or INT_MIN");
    }
  }
  if (has_size(f)) {
    Case z = base;
    z.n = 0;
    expand(z);
    push(z, "n = 0");
    Case zn = z;
    for (int p = 0; p < f.nparams; ++p)
      if (is_pointer(f.params[p].kind) && f.params[p].kind != K_HIN) zn.args[static_cast<std::size_t>(p)].null = true;
    push(zn, "n = 0, all arrays NULL");
    // the counts come before the handle's state (pumploss.h): the same on an unconfigured handle
    Case zb = z;
    bool any_bare = false;
    for (int p = 0; p < f.nparams; ++p)
      if (f.params[p].kind == K_HIN && ctx.bare[static_cast<std::size_t>(f.params[p].handle)] != nullptr)
        any_bare = zb.args[static_cast<std::size_t>(p)].bare = true;
    if (any_bare) push(zb, "n = 0, unconfigured handle");
    Case one = base;
    one.n = 1;
    expand(one);
    push(one, "n = 1");
  }
  std::mt19937_64 rng(0xbadu + 31u * static_cast<unsigned>(fn));
  std::uniform_real_distribution<double> u(-3.0, 3.0);
  for (int k = 0; k < random_mix; ++k) {
    Case c = base;
    for (int p = 0; p < f.nparams; ++p) {
      const std::size_t q = static_cast<std::size_t>(p);
      if (f.params[p].kind == K_DIN) {
        const auto sp = special_doubles(base.args[q].d);
        c.args[q].d = rng() % 3 == 0 ? sp[rng() % sp.size()] : base.args[q].d * std::pow(10.0, u(rng));
      } else if (f.params[p].kind == K_IIN && rng() % 3 == 0) {
        const auto sp = special_ints();
        c.args[q].i = sp[rng() % sp.size()];
      } else if (f.params[p].kind == K_DARR) {
        for (double& v : c.args[q].darr) v *= std::pow(10.0, u(rng) / 3.0);
      }
    }
    push(c, "random mixture " + std::to_string(k));
  }
  return cases;
}

/// Check one executed case against the conventions of pumploss.h. Returns "" when it holds.
/// `inf_with_usable` counts usable results that are infinite (reported, not a failure).
inline std::string check(const Case& c, const Exec& e, int* inf_with_usable) {
  const Fn& f = kFunctions[c.fn];
  if (f.ret == R_STR) {
    if (e.ret.str == nullptr) return "returned NULL";
    if (std::strlen(e.ret.str) == 0) return "returned an empty string";
    return "";
  }
  if (f.ret != R_INT) return "";
  const int code = e.ret.code;
  char msg[256];
  if (!documented(code)) {
    std::snprintf(msg, sizeof msg, "status %d is not a documented PUMPLOSS_ code", code);
    return msg;
  }
  const std::size_t alen = array_length(f, c.n);
  // NULL where a pointer is required -> EMISUSE, NULL arrays with n = 0 included.
  bool null_required = false, null_n0 = false;
  for (int p = 0; p < f.nparams; ++p) {
    const Kind k = f.params[p].kind;
    if (!c.args[static_cast<std::size_t>(p)].null || !is_pointer(k)) continue;
    const bool array = f.params[p].array;
    if (array && c.n == 0) null_n0 = true; else null_required = true;
  }
  if (null_required && code != PUMPLOSS_EMISUSE) {
    std::snprintf(msg, sizeof msg, "a NULL pointer gave status %d, not PUMPLOSS_EMISUSE", code);
    return msg;
  }
  if (null_n0 && !null_required && code != PUMPLOSS_EMISUSE) {
    std::snprintf(msg, sizeof msg, "n = 0 with a NULL array gave status %d, not PUMPLOSS_EMISUSE (pumploss.h: NULL is never a valid array)", code);
    return msg;
  }
  bool any_null = false;
  for (int p = 0; p < f.nparams; ++p) any_null = any_null || (c.args[static_cast<std::size_t>(p)].null && is_pointer(f.params[p].kind));
  // the counts are checked before a handle's state (pumploss.h): n = 0 with valid arrays is
  // "too few data" or an empty batch, also on a handle that is not configured yet
  if (has_size(f) && c.n == 0 && !any_null && code == PUMPLOSS_EMISUSE)
    return "n = 0 with valid arrays gave PUMPLOSS_EMISUSE (pumploss.h: OK for a batch, the error for too few points otherwise)";
  const int status_param = status_param_of(f);
  for (int p = 0; p < f.nparams; ++p) {
    const std::size_t q = static_cast<std::size_t>(p);
    const Kind k = f.params[p].kind;
    const std::size_t len = f.params[p].array ? alen : 1;
    if (c.args[q].null) continue;
    if (len == 0 && (k == K_DOUT || k == K_IOUT)) {  // n = 0 writes nothing
      const bool touched = k == K_DOUT ? e.dbuf[q][0] != kSentinel : e.ibuf[q][0] != -777;
      if (touched) return std::string("n = 0 but ") + f.params[p].name + "[0] was written";
      continue;
    }
    if (k == K_HOUT) {
      void* h = e.hbuf[q];
      if (is_error(code) && h != nullptr)
        return std::string("error status but *") + f.params[p].name + " is not NULL";
      if (!is_error(code) && (h == nullptr || h == kHandleSentinel))
        return std::string("usable status but no handle in *") + f.params[p].name;
    }
    if (k == K_IOUT && p == status_param) {
      for (std::size_t i = 0; i < len; ++i) {
        const int s = e.ibuf[q][i];
        if (!documented(s)) {
          std::snprintf(msg, sizeof msg, "%s[%zu] = %d is not a documented code", f.params[p].name, i, s);
          return msg;
        }
        if (is_error(code) && code != PUMPLOSS_EPARTIAL && !is_error(s)) {
          std::snprintf(msg, sizeof msg, "summary %d is an error but %s[%zu] = %d", code, f.params[p].name, i, s);
          return msg;
        }
      }
    }
    if (k != K_DOUT) continue;
    for (std::size_t i = 0; i < len; ++i) {
      const double v = e.dbuf[q][i];
      // EPARTIAL: each element follows its own status; any other error: every output is NaN
      const bool per_element = status_param >= 0 && f.params[p].array && (!is_error(code) || code == PUMPLOSS_EPARTIAL);
      const bool elem_error = per_element ? is_error(e.ibuf[static_cast<std::size_t>(status_param)][i]) : is_error(code);
      if (elem_error && !std::isnan(v)) {
        std::snprintf(msg, sizeof msg, "error status but %s[%zu] = %.17g, not NaN", f.params[p].name, i, v);
        return msg;
      }
      if (!elem_error && std::isnan(v) && code != PUMPLOSS_WUNDEFINED) {
        std::snprintf(msg, sizeof msg, "usable status %d but %s[%zu] is NaN", code, f.params[p].name, i);
        return msg;
      }
      if (!elem_error && std::isinf(v) && inf_with_usable) ++*inf_with_usable;
    }
  }
  if (code == PUMPLOSS_EPARTIAL && (status_param < 0 || alen == 0))
    return "PUMPLOSS_EPARTIAL from a function without per-element statuses";
  if (code == PUMPLOSS_WUNDEFINED) {  // an undefined output is NaN, not all of them
    bool any_usable = false;
    for (int p = 0; p < f.nparams; ++p) {
      const std::size_t q = static_cast<std::size_t>(p);
      if (f.params[p].kind == K_DOUT && !c.args[q].null && !std::isnan(e.dbuf[q][0])) any_usable = true;
      if (f.params[p].kind == K_IOUT || f.params[p].kind == K_ZOUT) any_usable = true;
    }
    if (!any_usable) return "PUMPLOSS_WUNDEFINED but every output is NaN";
  }
  if (status_param >= 0 && (!is_error(code) || code == PUMPLOSS_EPARTIAL) && alen > 0) {  // the summary follows the elements
    bool any_error = false, all_ok = true;
    for (std::size_t i = 0; i < alen; ++i) {
      const int s = e.ibuf[static_cast<std::size_t>(status_param)][i];
      any_error = any_error || is_error(s);
      all_ok = all_ok && s == PUMPLOSS_OK;
    }
    if (any_error && code != PUMPLOSS_EPARTIAL) {
      std::snprintf(msg, sizeof msg, "some elements failed but the summary is %d, not PUMPLOSS_EPARTIAL", code);
      return msg;
    }
    if (!any_error && code == PUMPLOSS_EPARTIAL) return "summary PUMPLOSS_EPARTIAL but no element failed";
    if (all_ok && code != PUMPLOSS_OK) {
      std::snprintf(msg, sizeof msg, "every element OK but the summary is %d", code);
      return msg;
    }
  }
  return "";
}

}  // namespace plcapi

#endif
