// Table-driven bad-input test of the whole C API (issue 7 item 8). Every function of pumploss.h
// (the table is generated from the header at build time) is called with NaN, +/-inf, 0, -0,
// negative values, 1e-300, 1e300, subnormals and DBL_MAX in each scalar position, NULL in each
// pointer position, bad elements in each input array, n = 0 and random mixtures of these, and
// each result is checked against the conventions: documented status codes, EMISUSE for NULL,
// NaN in every output on an error, no NaN on OK or a report, batch summaries that follow the
// per-element statuses, NULL handles refused, destroy(NULL) a no-op. Also built with ASan+UBSan.
#include <cstdio>
#include <cstdlib>
#include <string>
#include <vector>

#include "capi_harness.hpp"

int main(int argc, char** argv) {
  using namespace plcapi;
  const int random_mix = argc > 1 ? std::atoi(argv[1]) : 300;
  Context ctx;
  std::vector<std::string> notes;
  make_live_handles(ctx, &notes);
  long passed = 0, failed = 0;
  int infinite = 0;
  std::vector<std::string> inf_shown;
  int classes[5] = {0, 0, 0, 0, 0};
  for (int fn = 0; fn < kFunctionCount; ++fn) {
    const Fn& f = kFunctions[fn];
    ++classes[f.cls];
    Case base;
    const std::size_t n = count_for(f);
    if (!find_baseline(fn, ctx, n, base)) {
      notes.push_back(std::string(f.name) + ": no valid input found; only error paths exercised");
      base = candidate(fn, 0, n);
    }
    const std::vector<Case> cases = make_cases(fn, base, ctx, random_mix);
    int shown = 0;
    for (const Case& c : cases) {
      Exec e;
      e.prepare(c, ctx);
      e.invoke(c);
      const int inf_before = infinite;
      const std::string msg = check(c, e, &infinite);
      if (infinite > inf_before && inf_shown.size() < 8) inf_shown.push_back(std::string(f.name) + "(" + c.what + ")");
      e.release(c, ctx);
      if (msg.empty()) {
        ++passed;
      } else {
        ++failed;
        if (shown++ < 10) std::printf("FAIL %s(%s): %s\n", f.name, c.what.c_str(), msg.c_str());
      }
    }
  }
  std::printf("capi_badinput: %d functions (%d scalar, %d batch, %d create, %d destroy, %d method), "
              "%d handle types\n",
              kFunctionCount, classes[C_SCALAR], classes[C_BATCH], classes[C_CREATE], classes[C_DESTROY],
              classes[C_METHOD], kHandleTypeCount);
  for (const std::string& s : notes) std::printf("note: %s\n", s.c_str());
  if (infinite > 0) {
    std::printf("note: %d usable results were infinite (not a failure; EOVERFLOW may suit better), e.g.\n", infinite);
    for (const std::string& s : inf_shown) std::printf("  %s\n", s.c_str());
  }
  std::printf("%ld passed, %ld failed\n", passed, failed);
  return failed == 0 ? 0 : 1;
}
