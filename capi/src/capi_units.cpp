// C API wrappers for units.hpp.
#include "capi_common.hpp"
#include "pumploss/units.hpp"

extern "C" {

PUMPLOSS_API int PUMPLOSS_CALL pumploss_unit_convert(double value, const char* from_unit,
                                                     const char* to_unit, double* out) {
  if (from_unit == nullptr || to_unit == nullptr) {
    if (out != nullptr) *out = pumploss::capi::kNaN;
    return PUMPLOSS_EMISUSE;
  }
  return pumploss::capi::call({out}, [&] {
    const auto r = pumploss::convert(value, from_unit, to_unit);
    *out = r.value;
    return r.st;
  });
}

}  // extern "C"
