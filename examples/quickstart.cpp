// The README's C++ example: oil viscosity at a cold start, and a unit conversion.
#include <cstdio>

#include "pumploss/pumploss.hpp"

int main() {
  // ISO VG 46 oil: 46 mm^2/s at 40 degC, 6.8 mm^2/s at 100 degC (ASTM D341 line).
  const auto nu = pumploss::viscosity_d341(313.15, 46e-6, 373.15, 6.8e-6, 273.15);
  if (!nu.usable()) {
    std::printf("error: %s\n", pumploss::status_message(static_cast<int>(nu.st)));
    return 1;
  }
  const auto cst = pumploss::convert(nu.value, "m2/s", "cSt");
  std::printf("VG 46 at 0 degC: %.1f cSt\n", cst.value);
  return 0;
}
