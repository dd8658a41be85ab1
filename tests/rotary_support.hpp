// Helpers shared by the gear/vane, flow test and inlet/motor tests: the test oil and the
// named check rows of tests/reference/flow_test/hand_motor_slip.ipp.
#ifndef PUMPLOSS_TESTS_ROTARY_SUPPORT_HPP
#define PUMPLOSS_TESTS_ROTARY_SUPPORT_HPP

#include <gtest/gtest.h>

#include <cstring>

#include "pumploss/fluid.hpp"

namespace pltest {

/// The oil of the reference rows: 32 mm2/s at 40 degC (5.4 at 100 degC), 870 kg/m3 at 40 degC,
/// so that at 40 degC mu = 870 x 32e-6 Pa s.
template <class T>
pumploss::oil<T> rotary_test_oil() {
  const auto line = pumploss::d341_fit(T(313.15), T(32e-6), T(373.15), T(5.4e-6));
  auto o = pumploss::typical_mineral_oil<T>(line.value);
  o.rho_ref_kg_m3 = T(870);
  o.t_ref_k = T(313.15);
  return o;
}

/// One named check value.
struct named_row {
  const char* key;
  const char* quantity;
  double expected, tol;
};
inline const named_row kFlowTestRows[] = {
#include "reference/flow_test/hand_motor_slip.ipp"
};
/// The check value of a quantity of hand_motor_slip.ipp.
inline double flow_test_row(const char* quantity) {
  for (const auto& r : kFlowTestRows)
    if (std::strcmp(r.quantity, quantity) == 0) return r.expected;
  ADD_FAILURE() << "no row " << quantity;
  return 0;
}

}  // namespace pltest

#endif
