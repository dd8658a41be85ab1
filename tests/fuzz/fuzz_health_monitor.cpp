// libFuzzer target: the streaming health monitor through its C handle (pumploss.h), as an
// embedder drives it. One input: a health description (pump, oil, reference state, its
// normalisation, optional baseline, bands and exponents), the monitor's settings, then a series
// of readings: a plausible pump with noise, wear and steps, or any value (NaN, infinities, raw
// bits), in any operating state, at any time. Part way, the state is saved and restored into a
// second monitor of the same description; both are then fed the same readings. At the end a
// damaged copy of the saved state (some values replaced by fuzzed ones, or cut short) is
// restored into a third monitor.
// Checks: every status is documented; a refused reading gives NaN and level -1 for its raw
// level; a usable reading gives levels 0..3 and a finite, non-negative normalised drain; the state
// read back is finite when usable; save then restore then save gives the same bits, and the
// restored monitor answers every later reading exactly as the original; a restore that fails
// is EVALIDITY or EBUFFER and leaves the monitor as it was; a restore that succeeds leaves a
// monitor whose later answers keep every rule above (a damaged state that is accepted must not
// give infinite or NaN figures with a usable status).
#include <cmath>
#include <cstdint>
#include <cstdio>
#include <cstdlib>
#include <cstring>
#include <vector>

#include <fuzzer/FuzzedDataProvider.h>

#include "pumploss.h"

namespace {
constexpr std::size_t kN = PUMPLOSS_HEALTH_MONITOR_STATE_COUNT;
const double kNaN = std::nan("");

[[noreturn]] void fail(const char* what, int code) {
  std::fprintf(stderr, "fuzz_health_monitor: %s (status %d)\n", what, code);
  std::abort();
}

bool is_error(int c) { return c > 0 && c < 100; }
bool documented(int c) { return (c >= 0 && c <= 13) || (c >= 100 && c <= 106); }

/// Any double: special values, raw bits, or v scaled by 10^[-6, 6].
double any(FuzzedDataProvider& fdp, double v) {
  const std::uint8_t ctl = fdp.ConsumeIntegral<std::uint8_t>();
  switch (ctl % 4) {
    case 0: {
      const double sp[] = {kNaN, INFINITY, -INFINITY, 0.0, -0.0, -1.0, -v, 1e-300, 1e300, 4.9e-324, 1.7976931348623157e308};
      return sp[(ctl / 4u) % (sizeof sp / sizeof sp[0])];
    }
    case 1: {
      const std::uint64_t b = fdp.ConsumeIntegral<std::uint64_t>();
      double x;
      std::memcpy(&x, &b, sizeof x);
      return x;
    }
    case 2: return v;
    default: return v * std::pow(10.0, fdp.ConsumeFloatingPointInRange<double>(-6.0, 6.0));
  }
}
/// Mostly a plausible value near v (within a factor 10^+/-0.25), 1 in 8 any().
double near(FuzzedDataProvider& fdp, double v) {
  const std::uint8_t ctl = fdp.ConsumeIntegral<std::uint8_t>();
  if (ctl >= 224) return any(fdp, v);
  return v * std::pow(10.0, (static_cast<int>(ctl % 32) - 16) / 64.0);
}

struct reading {
  double time, q, p, pc, t, n, td, ti;
  int state;
};

struct fed {
  int st, level, raw, events;
  double q;
};

fed feed(pumploss_health_monitor* m, const reading& r) {
  fed f{};
  f.st = pumploss_health_monitor_feed(m, r.time, r.q, r.p, r.pc, r.t, r.n, r.td, r.ti, r.state, &f.level, &f.raw,
                                      &f.events, &f.q);
  if (!documented(f.st)) fail("feed: undocumented status", f.st);
  if (is_error(f.st)) {
    if (!std::isnan(f.q) || f.raw != -1) fail("feed: a refused reading without NaN and raw level -1", f.st);
    if (f.st == PUMPLOSS_EVALIDITY && (f.level < 0 || f.level > 3)) fail("feed: a refused reading without the confirmed level", f.st);
    if (f.level < -1 || f.level > 3) fail("feed: a level outside -1..3", f.st);
  } else {
    if (f.level < 0 || f.level > 3 || f.raw < 0 || f.raw > 3) fail("feed: a level outside 0..3", f.st);
    if (!std::isfinite(f.q) || f.q < 0) fail("feed: a usable reading with a non-finite or negative drain", f.st);
  }
  if (f.events < 0 || f.events > 0xff) fail("feed: unknown event bits", f.st);
  return f;
}

void check_state(const pumploss_health_monitor* m) {
  int level = 0;
  double v[4];
  const int st = pumploss_health_monitor_state(m, &level, &v[0], &v[1], &v[2], &v[3]);
  if (!documented(st)) fail("state: undocumented status", st);
  for (double x : v) {
    if (is_error(st) && !std::isnan(x)) fail("state: an error without NaN outputs", st);
    if (!is_error(st) && !std::isfinite(x)) fail("state: a usable status with a non-finite output", st);
  }
  if (!is_error(st) && (level < 0 || level > 3)) fail("state: a level outside 0..3", st);
}

bool same_bits(const double* a, const double* b, std::size_t n) { return std::memcmp(a, b, n * sizeof(double)) == 0; }

reading make_reading(FuzzedDataProvider& fdp, std::size_t i, double q0, double wear) {
  reading r{};
  const std::uint8_t kind = fdp.ConsumeIntegral<std::uint8_t>();
  r.time = static_cast<double>(i);
  r.q = q0 * wear * (1.0 + (static_cast<int>(fdp.ConsumeIntegral<std::uint8_t>()) - 128) / 12800.0);
  r.p = 250e5;
  r.pc = 0.5e5;
  r.t = 323.15;
  r.n = 25.0;
  r.td = (kind & 1) ? 328.15 : kNaN;
  r.ti = (kind & 1) ? 318.15 : kNaN;
  r.state = PUMPLOSS_STATE_ON_STROKE;
  if (kind < 192) return r;  // most readings: the plausible pump
  switch (kind % 8) {
    case 0: r.q = any(fdp, r.q); break;
    case 1: r.p = near(fdp, r.p); r.pc = near(fdp, r.pc); break;
    case 2: r.t = near(fdp, r.t); r.td = any(fdp, r.td); r.ti = any(fdp, 318.15); break;
    case 3: r.n = any(fdp, r.n); break;
    case 4: r.time = any(fdp, r.time); break;
    case 5: r.state = fdp.ConsumeIntegral<int>(); break;
    case 6: r.state = PUMPLOSS_STATE_DEADHEAD; r.q = near(fdp, r.q); break;
    default:
      r.time = any(fdp, r.time); r.q = any(fdp, r.q); r.p = any(fdp, r.p); r.pc = any(fdp, r.pc);
      r.t = any(fdp, r.t); r.n = any(fdp, r.n); r.td = any(fdp, r.td); r.ti = any(fdp, r.ti);
      r.state = fdp.ConsumeIntegralInRange<int>(-1, 3);
  }
  return r;
}
}  // namespace

extern "C" int LLVMFuzzerTestOneInput(const std::uint8_t* data, std::size_t size) {
  FuzzedDataProvider fdp(data, size);
  // 1. The health description (an invented 71 cm3/rev pump, VG 46 oil).
  pumploss_health* h = nullptr;
  int st = pumploss_health_create(near(fdp, 71e-6), near(fdp, 250e5), near(fdp, 323.15), near(fdp, 313.15),
                                  near(fdp, 46e-6), near(fdp, 373.15), near(fdp, 6.8e-6), near(fdp, 870.0),
                                  near(fdp, 1900.0), &h);
  if (!documented(st) || is_error(st) != (h == nullptr)) fail("health_create: status and handle disagree", st);
  if (h == nullptr) return 0;
  pumploss_health_set_description(h, near(fdp, 0.3e-3 / 60.0), fdp.ConsumeFloatingPointInRange<double>(0.0, 1.0),
                                  near(fdp, 25.0), near(fdp, 25.0));
  const std::uint8_t opts = fdp.ConsumeIntegral<std::uint8_t>();
  if (opts & 1) pumploss_health_set_baseline(h, near(fdp, 4e-3 / 60.0));
  if (opts & 2) pumploss_health_set_bands(h, near(fdp, 0.05), near(fdp, 0.10), near(fdp, 0.25), near(fdp, 0.5),
                                          near(fdp, 1.0), near(fdp, 1.0));
  if (opts & 4) pumploss_health_set_exponents(h, fdp.ConsumeFloatingPointInRange<double>(-0.5, 2.5),
                                              fdp.ConsumeFloatingPointInRange<double>(-0.5, 2.5));
  if (opts & 8) pumploss_health_set_baseline_rise(h, near(fdp, 5.0), fdp.ConsumeIntegralInRange<int>(0, 3));

  // 2. The monitor's settings.
  const std::size_t learn = (opts & 16) ? fdp.ConsumeIntegral<std::size_t>() : fdp.ConsumeIntegralInRange<std::size_t>(0, 40);
  const std::size_t debounce = fdp.ConsumeIntegralInRange<std::size_t>(0, 6);
  const double hysteresis = (opts & 32) ? any(fdp, 0.05) : fdp.ConsumeFloatingPointInRange<double>(0.0, 0.5);
  pumploss_health_monitor* m = nullptr;
  st = pumploss_health_monitor_create(h, learn, debounce, hysteresis, &m);
  if (!documented(st) || is_error(st) != (m == nullptr)) fail("monitor_create: status and handle disagree", st);
  if (m == nullptr) {
    pumploss_health_destroy(h);
    return 0;
  }

  // 3. The readings; the state saved and restored into a twin part way.
  const std::size_t count = fdp.ConsumeIntegralInRange<std::size_t>(0, 400);
  const std::size_t save_at = fdp.ConsumeIntegralInRange<std::size_t>(0, count);
  const std::size_t wear_from = fdp.ConsumeIntegralInRange<std::size_t>(0, count);
  const double rate = fdp.ConsumeFloatingPointInRange<double>(-0.01, 0.05), jump = fdp.ConsumeFloatingPointInRange<double>(0.0, 2.0);
  const double q0 = 4e-3 / 60.0;
  std::vector<double> saved(kN, kNaN);
  bool have_saved = false;
  pumploss_health_monitor* twin = nullptr;
  for (std::size_t i = 0; i < count; ++i) {
    if (i == save_at) {
      st = pumploss_health_monitor_save(m, saved.data(), kN);
      if (st != PUMPLOSS_OK && st != PUMPLOSS_WUNDEFINED) fail("save: refused a full buffer", st);
      have_saved = true;
      if (pumploss_health_monitor_create(h, learn, debounce, hysteresis, &twin) != PUMPLOSS_OK)
        fail("a second monitor of the same description was refused", 0);
      st = pumploss_health_monitor_restore(twin, saved.data(), kN);
      if (st != PUMPLOSS_OK) fail("restore refused the monitor's own saved state", st);
      std::vector<double> again(kN, 0.0);
      pumploss_health_monitor_save(twin, again.data(), kN);
      if (!same_bits(saved.data(), again.data(), kN)) fail("save, restore, save gave other bits", 0);
    }
    const double wear = i < wear_from ? 1.0 : (1.0 + jump) * (1.0 + rate * static_cast<double>(i - wear_from));
    const reading r = make_reading(fdp, i, q0, wear);
    const fed a = feed(m, r);
    if (twin != nullptr) {
      const fed b = feed(twin, r);
      if (a.st != b.st || a.level != b.level || a.raw != b.raw || a.events != b.events ||
          std::memcmp(&a.q, &b.q, sizeof a.q) != 0)
        fail("the restored monitor answered a reading otherwise than the original", b.st);
    }
    if (i % 16 == 0) check_state(m);
  }
  check_state(m);
  if (!have_saved) {
    st = pumploss_health_monitor_save(m, saved.data(), kN);
    if (st != PUMPLOSS_OK && st != PUMPLOSS_WUNDEFINED) fail("save: refused a full buffer", st);
  }

  // 4. A damaged state restored into a third monitor (which must stay as it was on refusal).
  std::vector<double> bad = saved;
  const int edits = fdp.ConsumeIntegralInRange<int>(0, 4);
  for (int k = 0; k < edits; ++k) {
    const std::size_t j = fdp.ConsumeIntegralInRange<std::size_t>(0, kN - 1);
    bad[j] = any(fdp, std::isnan(bad[j]) ? 1.0 : bad[j]);
  }
  const std::size_t bad_count = fdp.ConsumeIntegral<std::uint8_t>() >= 240 ? fdp.ConsumeIntegralInRange<std::size_t>(0, kN) : kN;
  pumploss_health_monitor* third = nullptr;
  if (pumploss_health_monitor_create(h, learn, debounce, hysteresis, &third) != PUMPLOSS_OK)
    fail("a third monitor of the same description was refused", 0);
  for (std::size_t i = 0; i < 3; ++i) feed(third, make_reading(fdp, i, q0, 1.0));
  std::vector<double> before(kN, 0.0), after(kN, 0.0);
  pumploss_health_monitor_save(third, before.data(), kN);
  st = pumploss_health_monitor_restore(third, bad.data(), bad_count);
  if (is_error(st)) {
    if (st != PUMPLOSS_EVALIDITY && st != PUMPLOSS_EBUFFER) fail("restore: a refusal other than EVALIDITY or EBUFFER", st);
    pumploss_health_monitor_save(third, after.data(), kN);
    if (!same_bits(before.data(), after.data(), kN)) fail("restore: a refused state changed the monitor", st);
  } else if (st != PUMPLOSS_OK) {
    fail("restore: a status other than OK or an error", st);
  }
  check_state(third);
  const std::size_t more = fdp.ConsumeIntegralInRange<std::size_t>(0, 64);
  for (std::size_t i = 0; i < more; ++i) {
    feed(third, make_reading(fdp, count + i, q0, 1.0 + jump));
    check_state(third);
  }

  pumploss_health_monitor_destroy(third);
  pumploss_health_monitor_destroy(twin);
  pumploss_health_monitor_destroy(m);
  pumploss_health_destroy(h);
  return 0;
}
