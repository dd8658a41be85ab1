// Consumer of the installed package's C++ target (pumploss::cxx, or pkg-config pumploss-cxx):
// a header template and the compiled functions of libpumploss_cxx, which a shared package
// exports through PUMPLOSS_CXX_API. EXPECTED_VERSION and EXPECTED_SHARED come from the build.
#include <cmath>
#include <cstdio>
#include <cstring>

#include <pumploss/pumploss.hpp>

namespace {
int failures = 0;
void check(bool ok, const char* what) {
  if (!ok) {
    std::printf("FAILED: %s\n", what);
    ++failures;
  }
}
}  // namespace

int main() {
  check(std::strcmp(pumploss::version_string, EXPECTED_VERSION) == 0, "header version equals the package version");
#ifdef PUMPLOSS_CXX_SHARED
  check(EXPECTED_SHARED == 1, "PUMPLOSS_CXX_SHARED is defined only for a shared package");
#else
  check(EXPECTED_SHARED == 0, "a shared package defines PUMPLOSS_CXX_SHARED for its users");
#endif
  // Header template. ASTM D341 worked example: 32 and 5.4 mm2/s at 40 and 100 degC give
  // 8.5 mm2/s at 80 degC (the same check as consumer.c).
  const auto nu = pumploss::viscosity_d341(313.15, 32e-6, 373.15, 5.4e-6, 353.15);
  check(nu.st == pumploss::status::ok && std::fabs(nu.value - 8.53e-6) < 0.01e-6, "viscosity_d341");
  // Compiled functions. 1 psi = 0.45359237 kg * 9.80665 m/s2 / (0.0254 m)^2 = 6894.757293168 Pa
  // (NIST SP 811, 2008 edition, appendix B.8, from the exact definitions of pound and inch).
  const auto pa = pumploss::convert(1.0, "psi", "Pa");
  check(pa.st == pumploss::status::ok && std::fabs(pa.value - 6894.757293168) < 1e-6, "convert psi to Pa");
  const pumploss::unit_info* bar = pumploss::find_unit("bar");
  check(bar != nullptr && bar->factor == 1e5, "find_unit(\"bar\"): 1 bar = 100 kPa (ISO 80000-4)");
  // ISO 3448:1992 Table 1: VG 46 has the mid-point 46 mm2/s and the limits 41.4 and 50.6 mm2/s.
  const auto vg = pumploss::iso_vg(46);
  check(vg.st == pumploss::status::ok && std::fabs(vg.value.min_m2_s - 41.4e-6) < 1e-12 &&
            std::fabs(vg.value.max_m2_s - 50.6e-6) < 1e-12,
        "iso_vg(46)");
  const char* msg = pumploss::status_message(static_cast<int>(pumploss::status::domain));
  check(msg != nullptr && std::strlen(msg) > 0, "status_message");
  if (failures != 0) return 1;
  std::printf("pumploss %s C++ core from the installed %s package: OK\n", pumploss::version_string,
              EXPECTED_SHARED ? "shared" : "static");
  return 0;
}
