// C API: version, status messages, and the check that C and C++ codes agree.
#include "capi_common.hpp"
#include "pumploss/version.hpp"

namespace {
using pumploss::status;
#define PUMPLOSS_SAME(c, e) static_assert(c == static_cast<int>(status::e), #c " differs from status::" #e)
PUMPLOSS_SAME(PUMPLOSS_OK, ok);
PUMPLOSS_SAME(PUMPLOSS_EDOMAIN, domain);
PUMPLOSS_SAME(PUMPLOSS_ENONFINITE, nonfinite);
PUMPLOSS_SAME(PUMPLOSS_EOVERFLOW, overflow);
PUMPLOSS_SAME(PUMPLOSS_ENOCONVERGE, no_convergence);
PUMPLOSS_SAME(PUMPLOSS_EMISUSE, misuse);
PUMPLOSS_SAME(PUMPLOSS_EUNIT, unknown_unit);
PUMPLOSS_SAME(PUMPLOSS_EDIMENSION, incompatible_units);
PUMPLOSS_SAME(PUMPLOSS_EBUFFER, buffer_too_small);
PUMPLOSS_SAME(PUMPLOSS_ENOMEM, no_memory);
PUMPLOSS_SAME(PUMPLOSS_EINTERNAL, internal);
PUMPLOSS_SAME(PUMPLOSS_EVALIDITY, out_of_validity);
PUMPLOSS_SAME(PUMPLOSS_EDATA, insufficient_data);
PUMPLOSS_SAME(PUMPLOSS_WREGIME, regime);
PUMPLOSS_SAME(PUMPLOSS_WTRANSITION, transition);
PUMPLOSS_SAME(PUMPLOSS_WILLCONDITIONED, ill_conditioned);
PUMPLOSS_SAME(PUMPLOSS_WEXTRAPOLATED, extrapolated);
PUMPLOSS_SAME(PUMPLOSS_EPARTIAL, partial);
PUMPLOSS_SAME(PUMPLOSS_WUNDEFINED, undefined_output);
PUMPLOSS_SAME(PUMPLOSS_WOUTLIER, outlier);
PUMPLOSS_SAME(PUMPLOSS_WIMPLAUSIBLE, implausible);
#undef PUMPLOSS_SAME
static_assert(PUMPLOSS_VERSION_NUMBER == pumploss::version_number, "pumploss.h and version.hpp disagree");
}  // namespace

extern "C" {

PUMPLOSS_API const char* PUMPLOSS_CALL pumploss_version(void) { return pumploss::version_string; }

PUMPLOSS_API int PUMPLOSS_CALL pumploss_version_number(void) { return pumploss::version_number; }

PUMPLOSS_API const char* PUMPLOSS_CALL pumploss_status_message(int status) {
  return pumploss::status_message(status);
}

}  // extern "C"
