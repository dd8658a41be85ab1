// libFuzzer target: the unit-name parser and conversion (C++ find_unit / convert and the C
// pumploss_unit_convert). Input: a control byte, 8 bytes of a double, then two unit names
// separated by a NUL or newline. Checks: no crash, no undefined behaviour (ASan + UBSan),
// documented status codes, NaN on every error, a usable status only with a finite value, and
// the C result equal to the C++ one.
#include <cmath>
#include <cstdint>
#include <cstdio>
#include <cstdlib>
#include <cstring>
#include <string>

#include <fuzzer/FuzzedDataProvider.h>

#include "pumploss.h"
#include "pumploss/units.hpp"

namespace {
[[noreturn]] void fail(const char* what, const std::string& a, const std::string& b, double v, int code) {
  std::fprintf(stderr, "fuzz_units: %s (from \"%s\" to \"%s\", value %.17g, status %d)\n", what, a.c_str(), b.c_str(),
               v, code);
  std::abort();
}
bool is_error(int c) { return c > 0 && c < 100; }
}  // namespace

extern "C" int LLVMFuzzerTestOneInput(const std::uint8_t* data, std::size_t size) {
  FuzzedDataProvider fdp(data, size);
  const std::uint8_t ctl = fdp.ConsumeIntegral<std::uint8_t>();
  double v;
  switch (ctl % 4) {
    case 0: v = fdp.ConsumeFloatingPoint<double>(); break;
    case 1: {
      const std::uint64_t b = fdp.ConsumeIntegral<std::uint64_t>();
      std::memcpy(&v, &b, sizeof v);
      break;
    }
    default: v = static_cast<double>(fdp.ConsumeIntegralInRange<int>(-1000, 1000)); break;
  }
  const std::string rest = fdp.ConsumeRemainingBytesAsString();
  std::size_t cut = rest.find_first_of(std::string("\n\0", 2));
  const std::string from = rest.substr(0, cut);
  const std::string to = cut == std::string::npos ? std::string("Pa") : rest.substr(cut + 1);

  // The parser alone: a found unit has a symbol that finds itself again.
  if (const pumploss::unit_info* u = pumploss::find_unit(from)) {
    if (pumploss::find_unit(u->symbol) != u) fail("a unit's own symbol finds another unit", from, to, v, 0);
  }
  const pumploss::result<double> r = pumploss::convert(v, from, to);
  const int code = static_cast<int>(r.st);
  if (is_error(code) && !std::isnan(r.value)) fail("C++ error without NaN", from, to, v, code);
  double out = 0.0;
  // the C function reads C strings: names with an embedded NUL end there
  const int c = pumploss_unit_convert(v, from.c_str(), to.c_str(), &out);
  if (!(c == PUMPLOSS_OK || (c > 0 && c < 100) || c >= 100)) fail("negative status", from, to, v, c);
  if (std::strlen(pumploss_status_message(c)) == 0) fail("empty status message", from, to, v, c);
  if (is_error(c) && !std::isnan(out)) fail("C error without NaN", from, to, v, c);
  if (!is_error(c) && !std::isfinite(out)) fail("usable C status with a non-finite value", from, to, v, c);
  if (from.find('\0') == std::string::npos && to.find('\0') == std::string::npos && !is_error(c) &&
      std::memcmp(&out, &r.value, sizeof out) != 0 && !(std::isinf(r.value)))
    fail("C and C++ results differ", from, to, v, c);
  if (pumploss_unit_convert(v, from.c_str(), to.c_str(), nullptr) != PUMPLOSS_EMISUSE)
    fail("NULL output not refused", from, to, v, c);
  return 0;
}
