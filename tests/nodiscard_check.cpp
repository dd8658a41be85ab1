// Compiled (syntax only) by the ctest tests nodiscard_result and nodiscard_struct, which pass
// when the compiler warns that a result was thrown away: result<T> and the struct results are
// [[nodiscard]]. One of PUMPLOSS_DISCARD_RESULT / PUMPLOSS_DISCARD_STRUCT is defined.
#include "pumploss/pumploss.hpp"

void discard() {
#if defined(PUMPLOSS_DISCARD_RESULT)
  pumploss::gap_plates_flow(1e5, 0.04, 0.01, 10e-6, 0.02, 0.0);
#elif defined(PUMPLOSS_DISCARD_STRUCT)
  pumploss::pipe_pressure_drop(1e-4, 870.0, 0.04, 0.0127, 5.0, 0.0);
#endif
}
