// C API wrappers for friction.hpp: Darcy friction factor correlations and the Darcy-Weisbach
// pressure drop of a pipe, tube or hose segment, with batch variants.
#include <cmath>

#include "capi_common.hpp"
#include "pumploss/friction.hpp"

using pumploss::capi::call;
using pumploss::capi::call_batch;
using pumploss::capi::kNaN;
using pumploss::status;

namespace {
template <class Fn>
int friction_call(double* out, Fn&& fn) {
  return call({out}, [&] {
    const auto r = fn();
    *out = r.value;
    return r.st;
  });
}
}  // namespace

extern "C" {

PUMPLOSS_API int PUMPLOSS_CALL pumploss_friction_factor(double reynolds, double relative_roughness, double* f_darcy) {
  return friction_call(f_darcy, [&] { return pumploss::friction_factor(reynolds, relative_roughness); });
}

PUMPLOSS_API int PUMPLOSS_CALL pumploss_friction_factor_custom_laminar(double reynolds, double relative_roughness,
                                                                       double laminar_constant, double* f_darcy) {
  return friction_call(f_darcy,
                       [&] { return pumploss::friction_factor(reynolds, relative_roughness, laminar_constant); });
}

PUMPLOSS_API int PUMPLOSS_CALL pumploss_friction_laminar(double reynolds, double laminar_constant, double* f_darcy) {
  return friction_call(f_darcy, [&] { return pumploss::friction_laminar(reynolds, laminar_constant); });
}

PUMPLOSS_API int PUMPLOSS_CALL pumploss_friction_colebrook(double reynolds, double relative_roughness,
                                                           double* f_darcy) {
  return friction_call(f_darcy, [&] { return pumploss::friction_colebrook(reynolds, relative_roughness); });
}

PUMPLOSS_API int PUMPLOSS_CALL pumploss_friction_haaland(double reynolds, double relative_roughness, double* f_darcy) {
  return friction_call(f_darcy, [&] { return pumploss::friction_haaland(reynolds, relative_roughness); });
}

PUMPLOSS_API int PUMPLOSS_CALL pumploss_friction_swamee_jain(double reynolds, double relative_roughness,
                                                             double* f_darcy) {
  return friction_call(f_darcy, [&] { return pumploss::friction_swamee_jain(reynolds, relative_roughness); });
}

PUMPLOSS_API int PUMPLOSS_CALL pumploss_friction_churchill(double reynolds, double relative_roughness,
                                                           double* f_darcy) {
  return friction_call(f_darcy, [&] { return pumploss::friction_churchill(reynolds, relative_roughness); });
}

PUMPLOSS_API int PUMPLOSS_CALL pumploss_pipe_velocity(double q_m3_s, double diameter_m, double* v_m_s) {
  return friction_call(v_m_s, [&] { return pumploss::pipe_velocity(q_m3_s, diameter_m); });
}

PUMPLOSS_API int PUMPLOSS_CALL pumploss_pipe_reynolds(double q_m3_s, double rho_kg_m3, double mu_pa_s,
                                                      double diameter_m, double* reynolds) {
  return friction_call(reynolds, [&] { return pumploss::pipe_reynolds(q_m3_s, rho_kg_m3, mu_pa_s, diameter_m); });
}

PUMPLOSS_API int PUMPLOSS_CALL pumploss_pipe_pressure_drop(double q_m3_s, double rho_kg_m3, double mu_pa_s,
                                                           double diameter_m, double length_m, double roughness_m,
                                                           double* dp_pa) {
  return call({dp_pa}, [&] {
    const auto r = pumploss::pipe_pressure_drop(q_m3_s, rho_kg_m3, mu_pa_s, diameter_m, length_m, roughness_m);
    *dp_pa = r.dp_pa;
    return r.st;
  });
}

PUMPLOSS_API int PUMPLOSS_CALL pumploss_pipe_flow(double q_m3_s, double rho_kg_m3, double mu_pa_s, double diameter_m,
                                                  double length_m, double roughness_m, double laminar_constant,
                                                  double* v_m_s, double* reynolds, double* f_darcy, double* dp_pa) {
  // At zero flow the friction factor is undefined (C/Re grows without bound): it goes out as NaN
  // under PUMPLOSS_WUNDEFINED, the other outputs are exactly 0 (pumploss.h). It is kept out of
  // call()'s check, which rightly turns a non-finite output under a usable status into an overflow.
  if (f_darcy == nullptr) {
    for (double* p : {v_m_s, reynolds, dp_pa}) if (p != nullptr) *p = kNaN;
    return PUMPLOSS_EMISUSE;
  }
  *f_darcy = kNaN;
  double f = kNaN;
  bool zero_flow = false;
  const int code = call({v_m_s, reynolds, dp_pa}, [&] {
    const auto r = pumploss::pipe_pressure_drop(q_m3_s, rho_kg_m3, mu_pa_s, diameter_m, length_m, roughness_m,
                                                laminar_constant);
    *v_m_s = r.velocity_m_s;
    *reynolds = r.reynolds;
    *dp_pa = r.dp_pa;
    f = r.friction_factor;
    zero_flow = q_m3_s == 0.0 && !is_error(r.st);
    if (!is_error(r.st) && !zero_flow && !std::isfinite(f)) return status::overflow;
    return r.st;
  });
  if (is_error(static_cast<status>(code))) return code;
  if (zero_flow) return PUMPLOSS_WUNDEFINED;
  *f_darcy = f;
  return code;
}

PUMPLOSS_API int PUMPLOSS_CALL pumploss_friction_factor_batch(size_t n, const double* reynolds,
                                                              const double* relative_roughness, double* f_darcy,
                                                              int* status) {
  return call_batch(n, {f_darcy}, status, reynolds != nullptr && relative_roughness != nullptr, [&](size_t i) {
    const auto r = pumploss::friction_factor(reynolds[i], relative_roughness[i]);
    f_darcy[i] = r.value;
    return r.st;
  });
}

PUMPLOSS_API int PUMPLOSS_CALL pumploss_pipe_pressure_drop_batch(size_t n, const double* q_m3_s,
                                                                 const double* rho_kg_m3, const double* mu_pa_s,
                                                                 const double* diameter_m, const double* length_m,
                                                                 const double* roughness_m, double* dp_pa,
                                                                 int* status) {
  const bool in_ok = q_m3_s != nullptr && rho_kg_m3 != nullptr && mu_pa_s != nullptr && diameter_m != nullptr &&
                     length_m != nullptr && roughness_m != nullptr;
  return call_batch(n, {dp_pa}, status, in_ok, [&](size_t i) {
    const auto r = pumploss::pipe_pressure_drop(q_m3_s[i], rho_kg_m3[i], mu_pa_s[i], diameter_m[i], length_m[i],
                                                roughness_m[i]);
    dp_pa[i] = r.dp_pa;
    return r.st;
  });
}

}  // extern "C"
