// C API wrappers for flow_test.hpp (field flow test, induction motor slip).
#include "capi_common.hpp"
#include "pumploss/flow_test.hpp"

using pumploss::capi::call;
using pumploss::status;

static_assert(PUMPLOSS_FLOW_PASS == static_cast<int>(pumploss::flow_verdict::pass), "verdict");
static_assert(PUMPLOSS_FLOW_WATCH == static_cast<int>(pumploss::flow_verdict::watch), "verdict");
static_assert(PUMPLOSS_FLOW_FAIL == static_cast<int>(pumploss::flow_verdict::fail), "verdict");

extern "C" {

PUMPLOSS_API int PUMPLOSS_CALL pumploss_induction_motor_speed(double sync_speed_rev_s, double rated_speed_rev_s,
                                                              double rated_power_w, double torque_nm,
                                                              double* speed_rev_s) {
  return call({speed_rev_s}, [&] {
    const auto r = pumploss::induction_motor_speed(
        pumploss::induction_motor<double>{sync_speed_rev_s, rated_speed_rev_s, rated_power_w}, torque_nm);
    *speed_rev_s = r.value;
    return r.st;
  });
}

PUMPLOSS_API int PUMPLOSS_CALL pumploss_flow_test(double no_load_flow_m3_s, double no_load_pressure_pa,
                                                  double no_load_speed_rev_s, double loaded_flow_m3_s,
                                                  double loaded_pressure_pa, double loaded_speed_rev_s,
                                                  double displacement_m3_rev, double hydromech_efficiency,
                                                  double motor_sync_speed_rev_s, double motor_rated_speed_rev_s,
                                                  double motor_rated_power_w, double mu_test_pa_s,
                                                  double mu_ref_pa_s, double ref_pressure_pa, double ref_speed_rev_s,
                                                  double new_volumetric_efficiency, double limit, double watch_band,
                                                  double* speed_loaded_rev_s, double* displacement_out_m3_rev,
                                                  double* leakage_m3_s, double* volumetric_efficiency,
                                                  double* uncorrected_ratio, double* percent_of_new, int* verdict) {
  if (verdict != nullptr) *verdict = -1;
  const int st = call({speed_loaded_rev_s, displacement_out_m3_rev, leakage_m3_s, volumetric_efficiency,
                       uncorrected_ratio, percent_of_new},
                      [&] {
                        if (verdict == nullptr) return status::misuse;
                        pumploss::flow_test_setup<double> s{};
                        s.displacement_m3_rev = displacement_m3_rev;
                        s.hydromech_efficiency = hydromech_efficiency;
                        s.motor = {motor_sync_speed_rev_s, motor_rated_speed_rev_s, motor_rated_power_w};
                        s.mu_test_pa_s = mu_test_pa_s;
                        s.mu_ref_pa_s = mu_ref_pa_s;
                        s.ref_pressure_pa = ref_pressure_pa;
                        s.ref_speed_rev_s = ref_speed_rev_s;
                        s.new_volumetric_efficiency = new_volumetric_efficiency;
                        s.limit = limit;
                        s.watch_band = watch_band;
                        const auto r = pumploss::flow_test_evaluate(
                            pumploss::flow_reading<double>{no_load_flow_m3_s, no_load_pressure_pa, no_load_speed_rev_s},
                            pumploss::flow_reading<double>{loaded_flow_m3_s, loaded_pressure_pa, loaded_speed_rev_s}, s);
                        if (pumploss::is_error(r.st)) return r.st;
                        *speed_loaded_rev_s = r.speed_loaded_rev_s;
                        *displacement_out_m3_rev = r.displacement_m3_rev;
                        *leakage_m3_s = r.leakage_m3_s;
                        *volumetric_efficiency = r.volumetric_efficiency;
                        *uncorrected_ratio = r.uncorrected_ratio;
                        *percent_of_new = r.percent_of_new;
                        *verdict = static_cast<int>(r.verdict);
                        return r.st;
                      });
  if (st > 0 && st < 100 && verdict != nullptr) *verdict = -1;
  return st;
}

}  // extern "C"
