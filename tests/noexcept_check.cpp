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
  // flow test, gear and vane pumps, motors, shaft seal
  const pumploss::flow_test_setup<T> fs{T(0), T(0.85), {T(25), T(24), T(7500)}, T(0.02), T(0.028), T(1.7e7), T(24),
                                        T(0.95), T(0.85), T(0.05)};
  sum += pumploss::flow_test_evaluate(pumploss::flow_reading<T>{T(3e-4), T(0), T(0)},
                                      pumploss::flow_reading<T>{T(2.6e-4), T(1.7e7), T(0)}, fs)
             .percent_of_new;
  const auto oil = pumploss::typical_mineral_oil<T>(pumploss::d341_fit(T(313.15), T(32e-6), T(373.15), T(5.4e-6)).value);
  sum += pumploss::gear_pump_budget(pumploss::gear_pump<T>{}, oil, pumploss::rotary_operating_point<T>{}).total_m3_s;
  sum += pumploss::vane_pump_budget(pumploss::vane_pump<T>{}, oil, pumploss::rotary_operating_point<T>{}).total_m3_s;
  sum += pumploss::motor_creep(T(5e-4), T(2000), T(1), T(1e-5), T(2e7), T(0.046), T(0.023), T(0.1)).creep_speed_rev_s;
  sum += pumploss::shaft_seal_check(T(1e5), T(2e5), T(2e5), T(6e5)).margin_peak_pa;
  return sum;
}
}  // namespace

double pumploss_noexcept_check_double() { return touch_all<double>(); }
float pumploss_noexcept_check_float() { return touch_all<float>(); }
