// C API wrappers for loss_model.hpp (the opaque fitted-model handle) and uncertainty.hpp.
#include <cstdio>
#include <new>
#include <string>
#include <vector>

#include "capi_common.hpp"
#include "pumploss/loss_model.hpp"
#include "pumploss/uncertainty.hpp"

using pumploss::capi::call;
using pumploss::capi::kNaN;

// The option constants of pumploss.h equal the C++ enums.
static_assert(PUMPLOSS_PUMP == static_cast<int>(pumploss::machine::pump), "machine");
static_assert(PUMPLOSS_MOTOR == static_cast<int>(pumploss::machine::motor), "machine");
static_assert(PUMPLOSS_MODEL_WILSON == static_cast<int>(pumploss::loss_model_kind::wilson), "model");
static_assert(PUMPLOSS_MODEL_SCHLOESSER == static_cast<int>(pumploss::loss_model_kind::schloesser), "model");
static_assert(PUMPLOSS_FIGURE_ABSOLUTE == static_cast<int>(pumploss::uncertainty_basis::absolute), "basis");
static_assert(PUMPLOSS_FIGURE_PERCENT_OF_READING == static_cast<int>(pumploss::uncertainty_basis::percent_of_reading),
              "basis");
static_assert(PUMPLOSS_DIST_STANDARD == static_cast<int>(pumploss::uncertainty_distribution::standard), "dist");
static_assert(PUMPLOSS_DIST_RECTANGULAR == static_cast<int>(pumploss::uncertainty_distribution::rectangular), "dist");
static_assert(PUMPLOSS_DIST_EXPANDED_K2 == static_cast<int>(pumploss::uncertainty_distribution::expanded_k2), "dist");

struct pumploss_model {
  pumploss::loss_model<double> m;
  std::vector<double> flow_residual;
  std::vector<double> torque_residual;
  std::string message;
};

namespace {
std::string describe(const pumploss::loss_model<double>& m) {
  char buf[512];
  const char* kind = m.kind == pumploss::machine::pump ? "pump" : "motor";
  const char* model = m.model == pumploss::loss_model_kind::wilson ? "Wilson" : "Schloesser";
  if (pumploss::is_error(m.st)) {
    std::snprintf(buf, sizeof buf, "%s %s model, %zu points: not fitted: %s", model, kind, m.points,
                  pumploss::status_message(static_cast<int>(m.st)));
  } else {
    std::snprintf(buf, sizeof buf,
                  "%s %s model fitted to %zu points: R2 flow %.6g, torque %.6g; RMS residual flow %.4g m3/s, "
                  "torque %.4g N m; condition numbers %.3g (flow), %.3g (torque)%s",
                  model, kind, m.points, m.r2_flow, m.r2_torque, m.rms_flow_m3_s, m.rms_torque_n_m, m.cond_flow,
                  m.cond_torque,
                  m.st == pumploss::status::ill_conditioned
                      ? "; ill-conditioned: the test grid does not separate the loss terms, coefficients are uncertain"
                      : "");
  }
  return buf;
}

int model_status(const pumploss_model* h) {
  if (h == nullptr) return PUMPLOSS_EMISUSE;
  return static_cast<int>(h->m.st);
}

template <class F>
int gum_wrapper(pumploss::machine kind, double v, double n, double dp, double q, double t, double u_v, double u_n,
                double u_dp, double u_q, double u_t, double r_qv, double* u_eta_v, double* u_eta_hm, double* u_eta_t,
                F&&) {
  return call({u_eta_v, u_eta_hm, u_eta_t}, [&] {
    const pumploss::efficiency_inputs<double> x{v, n, dp, q, t, u_v, u_n, u_dp, u_q, u_t, r_qv};
    const auto r = pumploss::efficiency_gum(kind, x);
    *u_eta_v = r.eta_v.u;
    *u_eta_hm = r.eta_hm.u;
    *u_eta_t = r.eta_t.u;
    return r.st;
  });
}
}  // namespace

namespace {
int create_model(int machine_kind, int model_kind, double displacement_m3_rev, double rho_kg_m3, size_t count,
                 const double* dp_pa, const double* speed_rev_s, const double* mu_pa_s, const double* flow_m3_s,
                 const double* torque_n_m, const pumploss::loss_fit_options<double>& opt, pumploss_model** model) {
  if (model == nullptr) return PUMPLOSS_EMISUSE;
  *model = nullptr;
  // NULL arrays are misuse whatever else is wrong (the convention of pumploss.h), so before the enums.
  if (dp_pa == nullptr || speed_rev_s == nullptr || mu_pa_s == nullptr || flow_m3_s == nullptr || torque_n_m == nullptr)
    return PUMPLOSS_EMISUSE;
  if ((machine_kind != 0 && machine_kind != 1) || (model_kind != 0 && model_kind != 1)) return PUMPLOSS_EDOMAIN;
  if (count == 0) return PUMPLOSS_EDATA;  // no points (empty buffers below would read as NULL arrays)
  pumploss::status st = pumploss::status::ok;
  pumploss_model* h = nullptr;
  {
    pumploss::capi::fp_guard guard;
    try {
      h = new pumploss_model();
      h->flow_residual.assign(count, kNaN);
      h->torque_residual.assign(count, kNaN);
      std::vector<double> work(pumploss::loss_fit_workspace(count));
      h->m = pumploss::fit_loss_model(static_cast<pumploss::machine>(machine_kind),
                                      static_cast<pumploss::loss_model_kind>(model_kind), displacement_m3_rev,
                                      rho_kg_m3, dp_pa, speed_rev_s, mu_pa_s, flow_m3_s, torque_n_m, count,
                                      work.data(), h->flow_residual.data(), h->torque_residual.data(), opt);
      st = h->m.st;
      h->message = describe(h->m);
    } catch (const std::bad_alloc&) {
      delete h;
      return PUMPLOSS_ENOMEM;
    } catch (...) {
      delete h;
      return PUMPLOSS_EINTERNAL;
    }
  }
  if (pumploss::is_error(st)) {  // every create function: NULL on error
    delete h;
    return static_cast<int>(st);
  }
  *model = h;
  return static_cast<int>(st);
}
}  // namespace

extern "C" {

PUMPLOSS_API int PUMPLOSS_CALL pumploss_model_create(int machine_kind, int model_kind, double displacement_m3_rev,
                                                     double rho_kg_m3, size_t count, const double* dp_pa,
                                                     const double* speed_rev_s, const double* mu_pa_s,
                                                     const double* flow_m3_s, const double* torque_n_m,
                                                     pumploss_model** model) {
  return create_model(machine_kind, model_kind, displacement_m3_rev, rho_kg_m3, count, dp_pa, speed_rev_s, mu_pa_s,
                      flow_m3_s, torque_n_m, {}, model);
}

PUMPLOSS_API int PUMPLOSS_CALL pumploss_model_create_terms(int machine_kind, int model_kind,
                                                           double displacement_m3_rev, double u_displacement_m3_rev,
                                                           double rho_kg_m3, double bulk_modulus_pa, int flow_terms,
                                                           int criterion, size_t count, const double* dp_pa,
                                                           const double* speed_rev_s, const double* mu_pa_s,
                                                           const double* flow_m3_s, const double* torque_n_m,
                                                           pumploss_model** model) {
  if (model != nullptr) *model = nullptr;
  if (model != nullptr && dp_pa != nullptr && speed_rev_s != nullptr && mu_pa_s != nullptr && flow_m3_s != nullptr &&
      torque_n_m != nullptr && (flow_terms < 0 || flow_terms > 3 || (criterion != 0 && criterion != 1)))
    return PUMPLOSS_EDOMAIN;
  pumploss::loss_fit_options<double> opt;
  opt.flow_terms = static_cast<unsigned>(flow_terms) & 3u;
  opt.criterion = static_cast<pumploss::info_criterion>(criterion == 0 ? 0 : 1);
  opt.bulk_modulus_pa = bulk_modulus_pa;
  opt.u_displacement_m3_rev = u_displacement_m3_rev;
  return create_model(machine_kind, model_kind, displacement_m3_rev, rho_kg_m3, count, dp_pa, speed_rev_s, mu_pa_s,
                      flow_m3_s, torque_n_m, opt, model);
}

PUMPLOSS_API int PUMPLOSS_CALL pumploss_model_flow_terms(const pumploss_model* model, int* flow_terms,
                                                         double* q_c_m3_s, double* u_q_c_m3_s, double* c_k,
                                                         double* u_c_k) {
  if (flow_terms != nullptr) *flow_terms = 0;
  return call({q_c_m3_s, u_q_c_m3_s, c_k, u_c_k}, [&] {
    if (model == nullptr || flow_terms == nullptr) return pumploss::status::misuse;
    const auto& m = model->m;
    *flow_terms = static_cast<int>(m.flow_terms);
    *q_c_m3_s = m.q_c_m3_s;
    *u_q_c_m3_s = m.u_q_c_m3_s;
    *c_k = m.c_k;
    *u_c_k = m.u_c_k;
    return m.st;
  });
}

PUMPLOSS_API int PUMPLOSS_CALL pumploss_model_flow_diagnostics(const pumploss_model* model, double* aic, double* bic,
                                                               double* corr_dp, double* corr_speed, double* corr_mu,
                                                               double* max_std_residual) {
  return call({aic, bic, corr_dp, corr_speed, corr_mu, max_std_residual}, [&] {
    if (model == nullptr) return pumploss::status::misuse;
    const auto& m = model->m;
    *aic = m.aic_flow;
    *bic = m.bic_flow;
    *corr_dp = m.resid_corr_dp;
    *corr_speed = m.resid_corr_speed;
    *corr_mu = m.resid_corr_mu;
    *max_std_residual = m.max_std_resid_flow;
    return m.st;
  });
}

PUMPLOSS_API void PUMPLOSS_CALL pumploss_model_destroy(pumploss_model* model) { delete model; }

PUMPLOSS_API const char* PUMPLOSS_CALL pumploss_model_last_message(const pumploss_model* model) {
  if (model == nullptr) return "no model (NULL handle)";
  return model->message.c_str();
}

PUMPLOSS_API int PUMPLOSS_CALL pumploss_model_coefficients(const pumploss_model* model, double* c_s, double* c_st,
                                                           double* c_v, double* c_f, double* t_c_n_m, double* c_h) {
  return call({c_s, c_st, c_v, c_f, t_c_n_m, c_h}, [&] {
    if (model == nullptr) return pumploss::status::misuse;
    const auto& m = model->m;
    *c_s = m.c_s;
    *c_st = m.c_st;
    *c_v = m.c_v;
    *c_f = m.c_f;
    *t_c_n_m = m.t_c_n_m;
    *c_h = m.c_h;
    return m.st;
  });
}

PUMPLOSS_API int PUMPLOSS_CALL pumploss_model_standard_errors(const pumploss_model* model, double* u_c_s,
                                                              double* u_c_st, double* u_c_v, double* u_c_f,
                                                              double* u_t_c_n_m, double* u_c_h) {
  return call({u_c_s, u_c_st, u_c_v, u_c_f, u_t_c_n_m, u_c_h}, [&] {
    if (model == nullptr) return pumploss::status::misuse;
    const auto& m = model->m;
    *u_c_s = m.u_c_s;
    *u_c_st = m.u_c_st;
    *u_c_v = m.u_c_v;
    *u_c_f = m.u_c_f;
    *u_t_c_n_m = m.u_t_c_n_m;
    *u_c_h = m.u_c_h;
    return m.st;
  });
}

PUMPLOSS_API int PUMPLOSS_CALL pumploss_model_diagnostics(const pumploss_model* model, double* r2_flow,
                                                          double* r2_torque, double* rms_flow_m3_s,
                                                          double* rms_torque_n_m, double* cond_flow,
                                                          double* cond_torque) {
  return call({r2_flow, r2_torque, rms_flow_m3_s, rms_torque_n_m, cond_flow, cond_torque}, [&] {
    if (model == nullptr) return pumploss::status::misuse;
    const auto& m = model->m;
    *r2_flow = m.r2_flow;
    *r2_torque = m.r2_torque;
    *rms_flow_m3_s = m.rms_flow_m3_s;
    *rms_torque_n_m = m.rms_torque_n_m;
    *cond_flow = m.cond_flow;
    *cond_torque = m.cond_torque;
    return m.st;
  });
}

PUMPLOSS_API int PUMPLOSS_CALL pumploss_model_residuals(const pumploss_model* model, size_t count,
                                                        double* flow_residual_m3_s, double* torque_residual_n_m) {
  if (model == nullptr || flow_residual_m3_s == nullptr || torque_residual_n_m == nullptr) {
    if (flow_residual_m3_s != nullptr) for (size_t i = 0; i < count; ++i) flow_residual_m3_s[i] = kNaN;
    if (torque_residual_n_m != nullptr) for (size_t i = 0; i < count; ++i) torque_residual_n_m[i] = kNaN;
    return PUMPLOSS_EMISUSE;
  }
  const size_t m = model->flow_residual.size();
  if (count < m) {
    for (size_t i = 0; i < count; ++i) flow_residual_m3_s[i] = torque_residual_n_m[i] = kNaN;
    return PUMPLOSS_EBUFFER;
  }
  for (size_t i = 0; i < count; ++i) {
    flow_residual_m3_s[i] = i < m ? model->flow_residual[i] : kNaN;
    torque_residual_n_m[i] = i < m ? model->torque_residual[i] : kNaN;
  }
  // elements beyond the points are NaN: a usable status with NaN outputs is WUNDEFINED (found
  // by tests/fuzz/fuzz_handles: PUMPLOSS_OK came with them)
  const int st = model_status(model);
  return count > m && !(st > 0 && st < 100) ? PUMPLOSS_WUNDEFINED : st;
}

PUMPLOSS_API int PUMPLOSS_CALL pumploss_model_predict(const pumploss_model* model, double dp_pa, double speed_rev_s,
                                                      double mu_pa_s, double* flow_m3_s, double* torque_n_m,
                                                      double* eta_v, double* eta_hm, double* eta_t) {
  return call({flow_m3_s, torque_n_m, eta_v, eta_hm, eta_t}, [&] {
    if (model == nullptr) return pumploss::status::misuse;
    const auto p = pumploss::loss_model_predict(model->m, dp_pa, speed_rev_s, mu_pa_s);
    *flow_m3_s = p.flow_m3_s;
    *torque_n_m = p.torque_n_m;
    *eta_v = p.eta_v;
    *eta_hm = p.eta_hm;
    *eta_t = p.eta_t;
    return p.st;
  });
}

PUMPLOSS_API int PUMPLOSS_CALL pumploss_model_map(const pumploss_model* model, double mu_pa_s, size_t n_dp,
                                                  const double* dp_pa, size_t n_speed, const double* speed_rev_s,
                                                  double* eta_t, int* status) {
  const size_t total = n_dp * n_speed;
  if (model == nullptr || dp_pa == nullptr || speed_rev_s == nullptr || eta_t == nullptr || status == nullptr) {
    if (eta_t != nullptr) for (size_t i = 0; i < total; ++i) eta_t[i] = kNaN;
    if (status != nullptr) for (size_t i = 0; i < total; ++i) status[i] = PUMPLOSS_EMISUSE;
    return PUMPLOSS_EMISUSE;
  }
  pumploss::capi::fp_guard guard;
  try {
    pumploss::status summary = pumploss::status::ok;
    bool failed = false;
    for (size_t i = 0; i < n_dp; ++i) {
      for (size_t j = 0; j < n_speed; ++j) {
        const auto p = pumploss::loss_model_predict(model->m, dp_pa[i], speed_rev_s[j], mu_pa_s);
        // a usable status never comes with a non-finite output (as call_batch() does)
        const auto st = !is_error(p.st) && !std::isfinite(p.eta_t) ? pumploss::status::overflow : p.st;
        eta_t[i * n_speed + j] = is_error(st) ? kNaN : p.eta_t;
        status[i * n_speed + j] = static_cast<int>(st);
        if (is_error(st)) failed = true;
        else if (summary == pumploss::status::ok) summary = st;
      }
    }
    return failed ? PUMPLOSS_EPARTIAL : static_cast<int>(summary);
  } catch (...) {  // keep the promise: on an error every output is NaN
    for (size_t i = 0; i < total; ++i) {
      eta_t[i] = kNaN;
      status[i] = PUMPLOSS_EINTERNAL;
    }
    return PUMPLOSS_EINTERNAL;
  }
}

PUMPLOSS_API int PUMPLOSS_CALL pumploss_standard_uncertainty(double figure, int percent_of_reading, int distribution,
                                                             double reading, double* u) {
  return call({u}, [&] {
    if ((percent_of_reading != 0 && percent_of_reading != 1) || distribution < 0 || distribution > 2)
      return pumploss::status::misuse;
    const auto r = pumploss::standard_uncertainty(figure, static_cast<pumploss::uncertainty_basis>(percent_of_reading),
                                                  static_cast<pumploss::uncertainty_distribution>(distribution),
                                                  reading);
    *u = r.value;
    return r.st;
  });
}

PUMPLOSS_API int PUMPLOSS_CALL pumploss_pressure_difference_uncertainty(double u_p1_pa, double u_p2_pa, double r12,
                                                                        double* u_dp_pa) {
  return call({u_dp_pa}, [&] {
    const auto r = pumploss::pressure_difference_uncertainty(u_p1_pa, u_p2_pa, r12);
    *u_dp_pa = r.value;
    return r.st;
  });
}

PUMPLOSS_API int PUMPLOSS_CALL pumploss_pump_efficiency_uncertainty(
    double displacement_m3_rev, double speed_rev_s, double dp_pa, double flow_m3_s, double torque_n_m,
    double u_displacement_m3_rev, double u_speed_rev_s, double u_dp_pa, double u_flow_m3_s, double u_torque_n_m,
    double r_flow_displacement, double* u_eta_v, double* u_eta_hm, double* u_eta_t) {
  return gum_wrapper(pumploss::machine::pump, displacement_m3_rev, speed_rev_s, dp_pa, flow_m3_s, torque_n_m,
                     u_displacement_m3_rev, u_speed_rev_s, u_dp_pa, u_flow_m3_s, u_torque_n_m, r_flow_displacement,
                     u_eta_v, u_eta_hm, u_eta_t, 0);
}

PUMPLOSS_API int PUMPLOSS_CALL pumploss_motor_efficiency_uncertainty(
    double displacement_m3_rev, double speed_rev_s, double dp_pa, double flow_m3_s, double torque_n_m,
    double u_displacement_m3_rev, double u_speed_rev_s, double u_dp_pa, double u_flow_m3_s, double u_torque_n_m,
    double r_flow_displacement, double* u_eta_v, double* u_eta_hm, double* u_eta_t) {
  return gum_wrapper(pumploss::machine::motor, displacement_m3_rev, speed_rev_s, dp_pa, flow_m3_s, torque_n_m,
                     u_displacement_m3_rev, u_speed_rev_s, u_dp_pa, u_flow_m3_s, u_torque_n_m, r_flow_displacement,
                     u_eta_v, u_eta_hm, u_eta_t, 0);
}

}  // extern "C"
