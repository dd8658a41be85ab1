// The streaming health monitor allocates only at creation: a long series fed through
// pumploss_health_monitor_feed(), with its state read, saved and restored, must not call the
// allocator once (counting malloc of capi_noalloc_hook.c, which also sees operator new).
#include <cmath>
#include <cstdio>
#include <cstdlib>

#include "pumploss.h"

extern "C" {
extern volatile int pl_alloc_armed;
extern volatile long pl_alloc_count;
}

int main() {
  pl_alloc_armed = 1;
  void* volatile probe = std::malloc(16);
  pl_alloc_armed = 0;
  std::free(probe);
  if (pl_alloc_count < 1) {
    std::printf("the counting allocator is not in effect\n");
    return 1;
  }
  pumploss_health* h = nullptr;
  pumploss_health_monitor* m = nullptr;
  if (pumploss_health_create(71e-6, 250e5, 323.15, 313.15, 46e-6, 373.15, 6.8e-6, 870.0, 1900.0, &h) != PUMPLOSS_OK ||
      pumploss_health_set_description(h, 0.3e-3 / 60, 0.0, 25.0, 25.0) != PUMPLOSS_OK ||
      pumploss_health_monitor_create(h, 8, 3, 0.05, &m) != PUMPLOSS_OK) {
    std::printf("setup failed\n");
    return 1;
  }
  double state[PUMPLOSS_HEALTH_MONITOR_STATE_COUNT];
  long fed = 0, bad = 0;
  pl_alloc_count = 0;
  pl_alloc_armed = 1;
  for (int i = 0; i < 20000; ++i) {
    int level, raw, events;
    double q;
    // a slowly growing drain with a step at reading 12000, and a refused zero every 1000
    const double drain = (i % 1000 == 999) ? 0.0 : 6.7e-5 * (1 + 1e-5 * i + (i > 12000 ? 0.3 : 0.0) + 0.01 * std::sin(i));
    const int st = pumploss_health_monitor_feed(m, i, drain, 250e5, 1e5, 323.15, 25.0, NAN, NAN,
                                                PUMPLOSS_STATE_ON_STROKE, &level, &raw, &events, &q);
    if (st == PUMPLOSS_OK) ++fed;
    else ++bad;
    if (i % 5000 == 4999) {
      double b, s, l, t;
      pumploss_health_monitor_state(m, &level, &b, &s, &l, &t);
      pumploss_health_monitor_save(m, state, PUMPLOSS_HEALTH_MONITOR_STATE_COUNT);
      pumploss_health_monitor_restore(m, state, PUMPLOSS_HEALTH_MONITOR_STATE_COUNT);
    }
  }
  pl_alloc_armed = 0;
  const long count = pl_alloc_count;
  pumploss_health_monitor_destroy(m);
  pumploss_health_destroy(h);
  std::printf("%ld readings fed, %ld refused, %ld allocations\n", fed, bad, count);
  if (count != 0 || bad != 20 || fed != 19980) {
    std::printf("0 passed, 1 failed\n");
    return 1;
  }
  std::printf("1 passed, 0 failed\n");
  return 0;
}
