// No heap allocation in any scalar C call (issue 9 item 7): every function of the generated
// table except the handle create/destroy functions is called with the bad-input test's cases
// while a counting malloc (capi_noalloc_hook.c, which also sees operator new) is armed; any
// allocation during a call fails the test.
#include <cstdio>
#include <cstdlib>
#include <string>
#include <vector>

#include "capi_harness.hpp"

extern "C" {
extern volatile int pl_alloc_armed;
extern volatile long pl_alloc_count;
}

// operator new of libstdc++ allocates through malloc, so the hook sees it too (the probe below
// checks that).

int main() {
  using namespace plcapi;
  // The counter must see allocations at all, or the test proves nothing.
  pl_alloc_armed = 1;
  void* volatile probe = std::malloc(16);
  int* volatile probe2 = new int(3);
  pl_alloc_armed = 0;
  std::free(probe);
  delete probe2;
  if (pl_alloc_count < 2) {
    std::printf("the counting allocator is not in effect (%ld counted)\n0 passed, 1 failed\n", pl_alloc_count);
    return 1;
  }
  Context ctx;
  make_live_handles(ctx, nullptr);
  long passed = 0, failed = 0;
  int functions = 0;
  for (int fn = 0; fn < kFunctionCount; ++fn) {
    const Fn& f = kFunctions[fn];
    if (f.cls == C_CREATE || f.cls == C_DESTROY) continue;  // exempt: they own memory
    // Fits over arrays (a size_t count, not a per-point *_batch function) may allocate their
    // work space; per-point functions, scalar or batch, must not.
    if (has_size(f) && f.cls != C_BATCH) continue;
    // Functions that change a handle (add an element to a line, record a calibration) may grow
    // it; reading functions on const handles may not allocate.
    if (mutates_handle(f)) continue;
    ++functions;
    Case base;
    const std::size_t n = count_for(f);
    if (!find_baseline(fn, ctx, n, base)) base = candidate(fn, 0, n);
    int shown = 0;
    for (const Case& c : make_cases(fn, base, ctx, 50)) {
      Exec e;
      e.prepare(c, ctx);
      pl_alloc_count = 0;
      pl_alloc_armed = 1;
      e.invoke(c);
      pl_alloc_armed = 0;
      const long count = pl_alloc_count;
      e.release(c, ctx);
      if (count == 0) {
        ++passed;
      } else {
        ++failed;
        if (shown++ < 5) std::printf("FAIL %s(%s): %ld heap allocations\n", f.name, c.what.c_str(), count);
      }
    }
  }
  std::printf("capi_noalloc: %d functions checked (handle create/destroy exempt)\n", functions);
  std::printf("%ld passed, %ld failed\n", passed, failed);
  return failed == 0 ? 0 : 1;
}
