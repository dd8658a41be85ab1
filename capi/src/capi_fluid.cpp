// C API wrappers for fluid.hpp.
#include "capi_common.hpp"
#include "pumploss/fluid.hpp"

using pumploss::capi::call;
using pumploss::capi::call_value;

extern "C" {

PUMPLOSS_API int PUMPLOSS_CALL pumploss_viscosity_d341(double t1_k, double nu1_m2_s, double t2_k,
                                                       double nu2_m2_s, double t_k, double* nu_m2_s) {
  return call_value(nu_m2_s, [&] { return pumploss::viscosity_d341(t1_k, nu1_m2_s, t2_k, nu2_m2_s, t_k); });
}

PUMPLOSS_API int PUMPLOSS_CALL pumploss_d341_coefficients(double t1_k, double nu1_m2_s, double t2_k,
                                                          double nu2_m2_s, double* a, double* b) {
  return call({a, b}, [&] {
    const auto r = pumploss::d341_fit(t1_k, nu1_m2_s, t2_k, nu2_m2_s);
    *a = r.value.a;
    *b = r.value.b;
    return r.st;
  });
}

PUMPLOSS_API int PUMPLOSS_CALL pumploss_d341_temperature(double a, double b, double nu_m2_s, double* t_k) {
  return call_value(t_k, [&] { return pumploss::d341_temperature(pumploss::d341_line<double>{a, b}, nu_m2_s); });
}

PUMPLOSS_API int PUMPLOSS_CALL pumploss_iso_vg(int grade, double* mid_m2_s, double* min_m2_s,
                                               double* max_m2_s) {
  return call({mid_m2_s, min_m2_s, max_m2_s}, [&] {
    const auto r = pumploss::iso_vg(grade);
    *mid_m2_s = r.value.mid_m2_s;
    *min_m2_s = r.value.min_m2_s;
    *max_m2_s = r.value.max_m2_s;
    return r.st;
  });
}

PUMPLOSS_API int PUMPLOSS_CALL pumploss_sus_from_kinematic(double nu_m2_s, double* sus) {
  return call_value(sus, [&] { return pumploss::sus_from_kinematic(nu_m2_s); });
}

PUMPLOSS_API int PUMPLOSS_CALL pumploss_kinematic_from_sus(double sus, double* nu_m2_s) {
  return call_value(nu_m2_s, [&] { return pumploss::kinematic_from_sus(sus); });
}

PUMPLOSS_API int PUMPLOSS_CALL pumploss_dynamic_viscosity(double nu_m2_s, double rho_kg_m3, double* mu_pa_s) {
  return call_value(mu_pa_s, [&] { return pumploss::dynamic_viscosity(nu_m2_s, rho_kg_m3); });
}

PUMPLOSS_API int PUMPLOSS_CALL pumploss_kinematic_viscosity(double mu_pa_s, double rho_kg_m3, double* nu_m2_s) {
  return call_value(nu_m2_s, [&] { return pumploss::kinematic_viscosity(mu_pa_s, rho_kg_m3); });
}

PUMPLOSS_API int PUMPLOSS_CALL pumploss_oil_density(double rho_ref_kg_m3, double t_ref_k, double alpha_per_k,
                                                    double bulk_modulus_pa, double t_k, double p_pa,
                                                    double* rho_kg_m3) {
  return call_value(rho_kg_m3, [&] {
    return pumploss::oil_density(rho_ref_kg_m3, t_ref_k, alpha_per_k, bulk_modulus_pa, t_k, p_pa);
  });
}

PUMPLOSS_API int PUMPLOSS_CALL pumploss_viscosity_barus(double mu0_pa_s, double alpha_per_pa, double p_pa,
                                                        double* mu_pa_s) {
  return call_value(mu_pa_s, [&] { return pumploss::viscosity_barus(mu0_pa_s, alpha_per_pa, p_pa); });
}

PUMPLOSS_API int PUMPLOSS_CALL pumploss_typical_mineral_oil(double* rho_kg_m3, double* t_ref_k,
                                                            double* alpha_per_k, double* bulk_modulus_pa,
                                                            double* cp_j_kg_k, double* barus_per_pa) {
  return call({rho_kg_m3, t_ref_k, alpha_per_k, bulk_modulus_pa, cp_j_kg_k, barus_per_pa}, [&] {
    const auto o = pumploss::typical_mineral_oil<double>({0.0, 0.0});
    *rho_kg_m3 = o.rho_ref_kg_m3;
    *t_ref_k = o.t_ref_k;
    *alpha_per_k = o.alpha_per_k;
    *bulk_modulus_pa = o.bulk_modulus_pa;
    *cp_j_kg_k = o.cp_j_kg_k;
    *barus_per_pa = o.barus_per_pa;
    return pumploss::status::ok;
  });
}

}  // extern "C"
