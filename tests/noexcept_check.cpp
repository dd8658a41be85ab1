// Compiled with -fno-exceptions -fno-rtti: the header core must not need exceptions.
// Instantiates the templates for double and float.
#include "pumploss/pumploss.hpp"

namespace {
template <class T>
T touch_all() {
  T sum = T(0);
  sum += pumploss::viscosity_d341(T(313.15), T(32e-6), T(373.15), T(5.4e-6), T(353.15)).value;
  sum += pumploss::sus_from_kinematic(T(46e-6)).value;
  sum += pumploss::kinematic_from_sus(T(700)).value;
  sum += pumploss::oil_density(T(870), T(288.15), T(6.5e-4), T(1.4e9), T(323.15), T(1e7)).value;
  sum += pumploss::viscosity_barus(T(0.04), T(2e-8), T(2.5e7)).value;
  sum += pumploss::dynamic_viscosity(T(46e-6), T(870)).value;
  sum += pumploss::kinematic_viscosity(T(0.04), T(870)).value;
  sum += pumploss::gap_annulus_flow(T(1e6), T(0.04), T(0.02002), T(0.02), T(0.03), T(0.9)).value;
  sum += pumploss::gap_plates_height_couette(T(1e-7), T(1e6), T(0.04), T(0.02), T(0.01), T(2)).value;
  sum += pumploss::gap_pad_orifice(T(2.5e7), T(870), T(0.04), T(4e-4), T(0.7), T(0.005), T(0.008), T(1.5e-5), T(0.02)).force_n;
  sum += pumploss::orifice_flow_viscous(T(1e7), T(870), T(0.04), T(1e-3), T(0.61), T(0.163)).value;
  return sum;
}
}  // namespace

double pumploss_noexcept_check_double() { return touch_all<double>(); }
float pumploss_noexcept_check_float() { return touch_all<float>(); }
