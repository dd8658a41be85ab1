// C API for fittings.hpp, line.hpp and drain_check.hpp: the opaque line handle (elements,
// height, oil), its pressure drop, the flow a pressure allows, the case drain check and drain
// line sizing; fitting coefficients.
#include <cstdio>
#include <string>
#include <vector>

#include "capi_common.hpp"
#include "pumploss/drain_check.hpp"
#include "pumploss/fittings.hpp"
#include "pumploss/line.hpp"

using pumploss::status;
using pumploss::capi::call;
using pumploss::capi::fp_guard;
using pumploss::capi::kNaN;

static_assert(PUMPLOSS_BORE_TUBE == static_cast<int>(pumploss::bore_kind::tube), "bore kind");
static_assert(PUMPLOSS_BORE_HOSE == static_cast<int>(pumploss::bore_kind::hose), "bore kind");

/// The message is changed by add_ / set_ calls only (they need exclusive use of the handle).
struct pumploss_line {
  pumploss::line<double> line;
  pumploss::oil<double> oil = pumploss::typical_mineral_oil<double>({0.0, 0.0});
  bool has_oil = false;
  pumploss::drain_flow<double> drain_table{};  ///< the drain flow table (n_table 0: none)
  std::string message = "no error";
};

namespace {

int set_message(pumploss_line* h, status st, const char* what) {
  if (h != nullptr) {
    h->message = std::string(what) + ": " + pumploss::status_message(static_cast<int>(st));
  }
  return static_cast<int>(st);
}

/// Validate an element by evaluating it once, then append it.
int add_element(pumploss_line* h, const pumploss::line_element<double>& e, const char* what) {
  if (h == nullptr) return PUMPLOSS_EMISUSE;
  try {
    fp_guard guard;
    // a fitting given bore 0 takes the bore of the element it follows: check it at a typical bore
    const bool follows = pumploss::detail::has_bore(e) && e.kind != pumploss::line_element_kind::pipe &&
                         e.diameter_m == 0.0;
    const auto r = pumploss::detail::element_dp(e, 1e-6, 870.0, 0.04, follows ? 0.01 : 0.0);
    if (is_error(r.st)) return set_message(h, r.st, what);
    h->line.elements.push_back(e);
    h->message = "no error";
    return PUMPLOSS_OK;
  } catch (const std::bad_alloc&) {
    return set_message(h, status::no_memory, what);
  } catch (...) {
    return set_message(h, status::internal, what);
  }
}

/// An evaluation: reads the handle only (pumploss.h's handle contract: no message, no cache).
template <std::size_t N, class Body>
int line_call(const pumploss_line* h, double* const (&outs)[N], Body&& body) {
  if (h == nullptr) {
    for (double* p : outs) if (p != nullptr) *p = kNaN;
    return PUMPLOSS_EMISUSE;
  }
  return call(outs, body);
}

}  // namespace

extern "C" {

PUMPLOSS_API int PUMPLOSS_CALL pumploss_line_create(pumploss_line** out) {
  if (out == nullptr) return PUMPLOSS_EMISUSE;
  *out = nullptr;
  try {
    *out = new pumploss_line();
    return PUMPLOSS_OK;
  } catch (...) {
    return PUMPLOSS_ENOMEM;
  }
}

PUMPLOSS_API void PUMPLOSS_CALL pumploss_line_destroy(pumploss_line* h) { delete h; }

PUMPLOSS_API const char* PUMPLOSS_CALL pumploss_line_last_message(const pumploss_line* h) {
  return h == nullptr ? "null line handle" : h->message.c_str();
}

PUMPLOSS_API int PUMPLOSS_CALL pumploss_line_add_pipe(pumploss_line* h, double diameter_m, double length_m,
                                                      double roughness_m) {
  return add_element(h, pumploss::line_pipe(diameter_m, length_m, roughness_m), "add_pipe");
}

PUMPLOSS_API int PUMPLOSS_CALL pumploss_line_add_fitting_k(pumploss_line* h, double diameter_m, double k) {
  return add_element(h, pumploss::line_fitting_k(diameter_m, k), "add_fitting_k");
}

PUMPLOSS_API int PUMPLOSS_CALL pumploss_line_add_fitting_l_over_d(pumploss_line* h, double diameter_m,
                                                                  double l_over_d) {
  return add_element(h, pumploss::line_fitting_l_over_d(diameter_m, l_over_d), "add_fitting_l_over_d");
}

PUMPLOSS_API int PUMPLOSS_CALL pumploss_line_add_fitting_hooper(pumploss_line* h, double diameter_m, double k1,
                                                                double k_inf) {
  return add_element(h, pumploss::line_fitting_hooper(diameter_m, k1, k_inf), "add_fitting_hooper");
}

PUMPLOSS_API int PUMPLOSS_CALL pumploss_line_add_fitting_darby(pumploss_line* h, double diameter_m, double k1,
                                                               double k_i, double k_d) {
  return add_element(h, pumploss::line_fitting_darby(diameter_m, k1, k_i, k_d), "add_fitting_darby");
}

PUMPLOSS_API int PUMPLOSS_CALL pumploss_line_add_component_power(pumploss_line* h, double q_ref_m3_s,
                                                                 double dp_ref_pa, double exponent,
                                                                 double nu_ref_m2_s, double nu_exponent) {
  return add_element(h, pumploss::line_component_power(q_ref_m3_s, dp_ref_pa, exponent, nu_ref_m2_s, nu_exponent),
                     "add_component_power");
}

PUMPLOSS_API int PUMPLOSS_CALL pumploss_line_add_component_points(pumploss_line* h, size_t n, const double* q_m3_s,
                                                                  const double* dp_pa, double nu_ref_m2_s,
                                                                  double nu_exponent) {
  if (h == nullptr) return PUMPLOSS_EMISUSE;
  if (q_m3_s == nullptr || dp_pa == nullptr) return set_message(h, status::misuse, "add_component_points");
  // an array length is a size_t (C API conventions); more points than a component holds is a domain error
  if (n < 1 || n > static_cast<size_t>(pumploss::component_max_points))
    return set_message(h, status::domain, "add_component_points");
  const auto e = pumploss::line_component_points(static_cast<int>(n), q_m3_s, dp_pa, nu_ref_m2_s, nu_exponent);
  if (is_error(e.st)) return set_message(h, e.st, "add_component_points");
  return add_element(h, e.value, "add_component_points");
}

PUMPLOSS_API int PUMPLOSS_CALL pumploss_line_set_height(pumploss_line* h, double height_m) {
  if (h == nullptr) return PUMPLOSS_EMISUSE;
  if (!pumploss::detail::finite(height_m)) return set_message(h, status::nonfinite, "set_height");
  h->line.height_m = height_m;
  h->message = "no error";
  return PUMPLOSS_OK;
}

PUMPLOSS_API int PUMPLOSS_CALL pumploss_line_set_oil(pumploss_line* h, double t1_k, double nu1_m2_s, double t2_k,
                                                     double nu2_m2_s, double rho_ref_kg_m3, double t_ref_k) {
  if (h == nullptr) return PUMPLOSS_EMISUSE;
  fp_guard guard;
  const auto fit = pumploss::d341_fit(t1_k, nu1_m2_s, t2_k, nu2_m2_s);
  if (is_error(fit.st)) return set_message(h, fit.st, "set_oil");
  if (!pumploss::detail::all_finite(rho_ref_kg_m3, t_ref_k)) return set_message(h, status::nonfinite, "set_oil");
  if (!(rho_ref_kg_m3 > 0) || !(t_ref_k > 0)) return set_message(h, status::domain, "set_oil");
  h->oil = pumploss::typical_mineral_oil(fit.value);
  h->oil.rho_ref_kg_m3 = rho_ref_kg_m3;
  h->oil.t_ref_k = t_ref_k;
  h->has_oil = true;
  h->message = "no error";
  return PUMPLOSS_OK;
}

PUMPLOSS_API int PUMPLOSS_CALL pumploss_line_element_count(const pumploss_line* h, size_t* count) {
  if (count == nullptr) return PUMPLOSS_EMISUSE;
  if (h == nullptr) {
    *count = 0;
    return PUMPLOSS_EMISUSE;
  }
  *count = h->line.elements.size();
  return PUMPLOSS_OK;
}

PUMPLOSS_API int PUMPLOSS_CALL pumploss_line_height(const pumploss_line* h, double* height_m) {
  if (height_m == nullptr) return PUMPLOSS_EMISUSE;
  if (h == nullptr) {
    *height_m = kNaN;
    return PUMPLOSS_EMISUSE;
  }
  *height_m = h->line.height_m;
  return PUMPLOSS_OK;
}

PUMPLOSS_API int PUMPLOSS_CALL pumploss_line_pressure_drop(const pumploss_line* h, double q_m3_s, double rho_kg_m3,
                                                           double mu_pa_s, double* dp_pa) {
  return line_call(h, {dp_pa}, [&] {
    const auto r = pumploss::line_pressure_drop(h->line, q_m3_s, rho_kg_m3, mu_pa_s);
    *dp_pa = r.dp_pa;
    return r.st;
  });
}

PUMPLOSS_API int PUMPLOSS_CALL pumploss_line_element_pressure_drop(const pumploss_line* h, int index, double q_m3_s,
                                                                   double rho_kg_m3, double mu_pa_s, double* dp_pa,
                                                                   double* share) {
  return line_call(h, {dp_pa, share}, [&] {
    if (index < 0 || static_cast<std::size_t>(index) >= h->line.elements.size()) return status::domain;
    std::vector<double> parts(h->line.elements.size());
    const auto r = pumploss::line_pressure_drop(h->line, q_m3_s, rho_kg_m3, mu_pa_s, parts.data());
    *dp_pa = parts[static_cast<std::size_t>(index)];
    *share = r.dp_pa != 0.0 ? *dp_pa / r.dp_pa : 0.0;
    return r.st;
  });
}

PUMPLOSS_API int PUMPLOSS_CALL pumploss_line_pressure_drop_at(const pumploss_line* h, double q_m3_s, double t_k,
                                                              double* dp_pa) {
  return line_call(h, {dp_pa}, [&] {
    if (!h->has_oil) return status::misuse;
    const auto r = pumploss::line_pressure_drop_at(h->line, q_m3_s, h->oil, t_k);
    *dp_pa = r.dp_pa;
    return r.st;
  });
}

PUMPLOSS_API int PUMPLOSS_CALL pumploss_line_flow_for_pressure(const pumploss_line* h, double dp_pa, double rho_kg_m3,
                                                               double mu_pa_s, double* q_m3_s) {
  return line_call(h, {q_m3_s}, [&] {
    const auto r = pumploss::line_flow_for_pressure(h->line.elements.data(), h->line.elements.size(),
                                                    h->line.height_m, dp_pa, rho_kg_m3, mu_pa_s);
    *q_m3_s = r.value;
    return r.st;
  });
}

PUMPLOSS_API int PUMPLOSS_CALL pumploss_line_drain_check(const pumploss_line* h, double q_drain_m3_s, double t_cold_k,
                                                         double t_max_k, size_t n_temps, double p_tank_pa,
                                                         double p_allowed_pa, double* t_k, double* case_pressure_pa,
                                                         double* margin_pa, int* pass, double* worst_margin_pa) {
  const bool arrays = t_k != nullptr && case_pressure_pa != nullptr && margin_pa != nullptr && pass != nullptr;
  const size_t n_fill = n_temps <= 1000 ? n_temps : 0;
  for (size_t i = 0; i < n_fill; ++i) {  // every array given is NaN (pass 0) until filled
    if (t_k != nullptr) t_k[i] = kNaN;
    if (case_pressure_pa != nullptr) case_pressure_pa[i] = kNaN;
    if (margin_pa != nullptr) margin_pa[i] = kNaN;
    if (pass != nullptr) pass[i] = 0;
  }
  const int code = line_call(h, {worst_margin_pa}, [&] {
    if (!arrays) return status::misuse;
    if (n_temps < 1 || n_temps > 1000) return status::domain;
    if (!h->has_oil) return status::misuse;
    std::vector<pumploss::drain_point<double>> pts(static_cast<std::size_t>(n_temps));
    const auto s = pumploss::drain_check(h->line, h->oil, q_drain_m3_s, t_cold_k, t_max_k, static_cast<int>(n_temps), p_tank_pa,
                                         p_allowed_pa, pts.data());
    if (is_error(s.st)) return s.st;
    for (size_t i = 0; i < n_temps; ++i) {
      const auto& p = pts[i];
      // a usable status never comes with a non-finite output (e.g. limits near the largest double)
      if (!std::isfinite(p.t_k) || !std::isfinite(p.case_pressure_pa) || !std::isfinite(p.margin_pa))
        return status::overflow;
      t_k[i] = p.t_k;
      case_pressure_pa[i] = p.case_pressure_pa;
      margin_pa[i] = p.margin_pa;
      pass[i] = p.pass ? 1 : 0;
    }
    *worst_margin_pa = s.worst_margin_pa;
    return s.st;
  });
  if (code > 0 && code < 100) {  // an error, also one call() found in the scalar output: NaN everywhere
    for (size_t i = 0; i < n_fill; ++i) {
      if (t_k != nullptr) t_k[i] = kNaN;
      if (case_pressure_pa != nullptr) case_pressure_pa[i] = kNaN;
      if (margin_pa != nullptr) margin_pa[i] = kNaN;
      if (pass != nullptr) pass[i] = 0;
    }
  }
  return code;
}

PUMPLOSS_API int PUMPLOSS_CALL pumploss_line_size_drain(const pumploss_line* h, double q_drain_m3_s, double t_cold_k,
                                                        double t_max_k, size_t n_temps, double p_tank_pa,
                                                        double p_allowed_pa, double v_max_m_s, int kinds_mask,
                                                        double* diameter_m, double* velocity_m_s,
                                                        double* worst_margin_pa) {
  return line_call(h, {diameter_m, velocity_m_s, worst_margin_pa}, [&] {
    if (n_temps < 2 || n_temps > 1000) return status::domain;  // the documented range, 2 to 1000
    if (!h->has_oil) return status::misuse;
    const auto s = pumploss::size_drain_line(h->line, h->oil, q_drain_m3_s, t_cold_k, t_max_k, static_cast<int>(n_temps), p_tank_pa,
                                             p_allowed_pa, v_max_m_s, kinds_mask);
    *diameter_m = s.diameter_m;
    *velocity_m_s = s.velocity_m_s;
    *worst_margin_pa = s.worst_margin_pa;
    return s.st;
  });
}

PUMPLOSS_API int PUMPLOSS_CALL pumploss_standard_bore_count(size_t* count) {
  if (count == nullptr) return PUMPLOSS_EMISUSE;
  *count = static_cast<size_t>(pumploss::standard_bore_count);
  return PUMPLOSS_OK;
}

PUMPLOSS_API int PUMPLOSS_CALL pumploss_standard_bore(size_t index, double* inside_diameter_m, int* kind) {
  if (inside_diameter_m == nullptr || kind == nullptr) {
    if (inside_diameter_m != nullptr) *inside_diameter_m = kNaN;
    return PUMPLOSS_EMISUSE;
  }
  if (index >= static_cast<size_t>(pumploss::standard_bore_count)) {
    *inside_diameter_m = kNaN;
    *kind = 0;
    return PUMPLOSS_EDOMAIN;
  }
  *inside_diameter_m = pumploss::standard_bores[index].inside_diameter_m;
  *kind = static_cast<int>(pumploss::standard_bores[index].kind);
  return PUMPLOSS_OK;
}

PUMPLOSS_API int PUMPLOSS_CALL pumploss_friction_factor_ft(double diameter_m, double* f_t) {
  return call({f_t}, [&] {
    const auto r = pumploss::friction_factor_ft(diameter_m);
    *f_t = r.value;
    return r.st;
  });
}

PUMPLOSS_API int PUMPLOSS_CALL pumploss_k_hooper(double k1, double k_inf, double diameter_m, double reynolds,
                                                 double* k) {
  return call({k}, [&] {
    const auto r = pumploss::k_hooper(k1, k_inf, diameter_m, reynolds);
    *k = r.value;
    return r.st;
  });
}

PUMPLOSS_API int PUMPLOSS_CALL pumploss_k_darby(double k1, double k_i, double k_d, double nominal_size_in,
                                                double reynolds, double* k) {
  return call({k}, [&] {
    const auto r = pumploss::k_darby(k1, k_i, k_d, nominal_size_in, reynolds);
    *k = r.value;
    return r.st;
  });
}

PUMPLOSS_API int PUMPLOSS_CALL pumploss_equivalent_length(double k, double diameter_m, double f_darcy,
                                                          double* length_m) {
  return call({length_m}, [&] {
    const auto r = pumploss::equivalent_length(k, diameter_m, f_darcy);
    *length_m = r.value;
    return r.st;
  });
}

// ---- drain line: named fittings, laminar exit, drain flow over temperature, peak, start ----

}  // extern "C"

namespace {

/// The drain flow of an evaluation: the handle's table when one is set (then the parts must be
/// 0: two flow models are a misuse), else the parts; the peak from the arguments.
pumploss::result<pumploss::drain_flow<double>> flow_of(const pumploss_line* h, double q_constant,
                                                       double q_laminar_ref, double t_ref, double v_peak,
                                                       double t_peak) {
  if (h->drain_table.n_table > 0) {
    if (q_constant != 0.0 || q_laminar_ref != 0.0) return {pumploss::drain_flow<double>{}, status::misuse};
    return {pumploss::with_destroke_peak(h->drain_table, v_peak, t_peak), status::ok};
  }
  return {pumploss::with_destroke_peak(pumploss::drain_flow_parts(q_constant, q_laminar_ref, t_ref), v_peak, t_peak),
          status::ok};
}

/// What every drain evaluation over a grid checks first (2 to 1000 temperatures, an oil set),
/// then its drain flow (flow_of()).
pumploss::result<pumploss::drain_flow<double>> grid_flow_of(const pumploss_line* h, size_t n_temps, double q_constant,
                                                            double q_laminar_ref, double t_ref, double v_peak,
                                                            double t_peak) {
  if (n_temps < 2 || n_temps > 1000) return {pumploss::drain_flow<double>{}, status::domain};
  if (!h->has_oil) return {pumploss::drain_flow<double>{}, status::misuse};
  return flow_of(h, q_constant, q_laminar_ref, t_ref, v_peak, t_peak);
}

/// "PASS ..." or "FAIL ..." naming the failing ranges in degC, into a caller buffer.
void write_verdict(const pumploss::drain_summary<double>& s, char* out, size_t cap) {
  if (out == nullptr || cap == 0) return;
  int used = 0;
  auto put = [&](const char* fmt, auto... args) {
    if (used < 0 || static_cast<size_t>(used) >= cap) return;
    const int n = std::snprintf(out + used, cap - static_cast<size_t>(used), fmt, args...);
    used = n < 0 ? -1 : used + n;
  };
  auto ranges = [&](const char* what, int n, const auto& r) {
    put("%s fails", what);
    for (int i = 0; i < n; ++i)
      put("%s %.1f to %.1f degC", i == 0 ? "" : ",", r[static_cast<size_t>(i)].from_k - 273.15,
          r[static_cast<size_t>(i)].to_k - 273.15);
  };
  out[0] = '\0';
  if (s.pass && s.pass_peak) {
    put("%s", "PASS at every temperature checked");
    return;
  }
  put("%s", "FAIL: ");
  if (!s.pass) ranges("continuous", s.n_fail, s.fail);
  if (!s.pass && !s.pass_peak) put("%s", "; ");
  if (!s.pass_peak) ranges("peak", s.n_fail_peak, s.fail_peak);
  if (s.ranges_truncated) put("%s", " (and more)");
}

}  // namespace

extern "C" {

PUMPLOSS_API int PUMPLOSS_CALL pumploss_k_fitting(int type, int method, double diameter_m, double reynolds,
                                                  double* k) {
  return call({k}, [&] {
    const auto r = pumploss::k_fitting(static_cast<pumploss::fitting_type>(type),
                                       static_cast<pumploss::fitting_method>(method), diameter_m, reynolds);
    *k = r.value;
    return r.st;
  });
}

PUMPLOSS_API int PUMPLOSS_CALL pumploss_k_exit_kinetic(double reynolds, double* k) {
  return call({k}, [&] {
    const auto r = pumploss::k_exit_kinetic(reynolds);
    *k = r.value;
    return r.st;
  });
}

PUMPLOSS_API int PUMPLOSS_CALL pumploss_line_add_fitting_named(pumploss_line* h, double diameter_m, int type,
                                                               int method) {
  if (h == nullptr) return PUMPLOSS_EMISUSE;
  const auto e = pumploss::line_fitting_named(diameter_m, static_cast<pumploss::fitting_type>(type),
                                              static_cast<pumploss::fitting_method>(method));
  if (is_error(e.st)) return static_cast<int>(e.st);
  return add_element(h, e.value, "add_fitting_named");
}

PUMPLOSS_API int PUMPLOSS_CALL pumploss_line_add_exit(pumploss_line* h, double diameter_m) {
  return add_element(h, pumploss::line_exit(diameter_m), "add_exit");
}

}  // extern "C"

namespace {

/// The drain check into caller arrays and a caller verdict buffer (shared by the parts and the
/// table form); make_flow() gives the drain flow model (or its error).
template <class MakeFlow>
int drain_check_into(const pumploss_line* h, MakeFlow&& make_flow, double t_cold_k, double t_max_k, size_t n_temps,
                     double p_tank_pa, double p_allowed_pa, double p_allowed_peak_pa, double t_k[], double q_m3_s[],
                     double case_pressure_pa[], double case_pressure_peak_pa[], int pass[], char* verdict,
                     size_t verdict_capacity) {
  if (verdict != nullptr && verdict_capacity > 0) verdict[0] = '\0';
  double* const arrays[] = {t_k, q_m3_s, case_pressure_pa, case_pressure_peak_pa};
  const size_t n_fill = n_temps <= 1000 ? n_temps : 0;
  for (double* a : arrays)
    if (a != nullptr) for (size_t i = 0; i < n_fill; ++i) a[i] = kNaN;
  if (pass != nullptr) for (size_t i = 0; i < n_fill; ++i) pass[i] = 0;
  if (h == nullptr || t_k == nullptr || q_m3_s == nullptr || case_pressure_pa == nullptr ||
      case_pressure_peak_pa == nullptr || pass == nullptr || (verdict == nullptr && verdict_capacity > 0))
    return PUMPLOSS_EMISUSE;
  double worst = 0.0;  // the smallest margin: gives call() one scalar output to guard
  double* const outs[] = {&worst};
  const int code = call(outs, [&] {
    if (n_temps < 1 || n_temps > 1000) return status::domain;  // before the handle's state: n = 0 is too few points
    if (!h->has_oil) return status::misuse;
    const pumploss::result<pumploss::drain_flow<double>> f = make_flow();
    if (is_error(f.st)) return f.st;
    const pumploss::drain_limits<double> lim{p_tank_pa, p_allowed_pa, p_allowed_peak_pa};
    const int n = static_cast<int>(n_temps);
    const auto s = pumploss::drain_check(h->line, h->oil, f.value, lim, t_cold_k, t_max_k, n,
                                         static_cast<pumploss::drain_point<double>*>(nullptr));
    if (is_error(s.st)) return s.st;
    for (int i = 0; i < n; ++i) {  // the grid of drain_check(), evaluated point by point (no allocation)
      const double t = n == 1 ? t_cold_k : t_cold_k + (t_max_k - t_cold_k) * i / (n - 1);
      const auto p = pumploss::detail::drain_eval(h->line, h->oil, f.value, lim, t, 0.0);
      if (is_error(p.st)) return p.st;
      const auto k = static_cast<size_t>(i);
      t_k[k] = t;
      q_m3_s[k] = p.q_m3_s;
      case_pressure_pa[k] = p.case_pressure_pa;
      case_pressure_peak_pa[k] = p.case_pressure_peak_pa;
      pass[k] = (p.pass ? 1 : 0) | (p.pass_peak ? 2 : 0);
    }
    write_verdict(s, verdict, verdict_capacity);
    worst = s.worst_margin_pa < s.worst_margin_peak_pa ? s.worst_margin_pa : s.worst_margin_peak_pa;
    return s.st;
  });
  if (code > 0 && code < 100) {  // an error: NaN everywhere, no verdict
    for (double* a : arrays) for (size_t i = 0; i < n_fill; ++i) a[i] = kNaN;
    for (size_t i = 0; i < n_fill; ++i) pass[i] = 0;
    if (verdict != nullptr && verdict_capacity > 0) verdict[0] = '\0';
  }
  return code;
}

}  // namespace

extern "C" {

PUMPLOSS_API int PUMPLOSS_CALL pumploss_line_drain_check_flow(
    const pumploss_line* h, double q_constant_m3_s, double q_laminar_ref_m3_s, double t_ref_k, double peak_volume_m3,
    double peak_time_s, double t_cold_k, double t_max_k, size_t n_temps, double p_tank_pa, double p_allowed_pa,
    double p_allowed_peak_pa, double t_k[], double q_m3_s[], double case_pressure_pa[],
    double case_pressure_peak_pa[], int pass[], char* verdict, size_t verdict_capacity) {
  auto make_flow = [&] { return flow_of(h, q_constant_m3_s, q_laminar_ref_m3_s, t_ref_k, peak_volume_m3, peak_time_s); };
  return drain_check_into(h, make_flow, t_cold_k, t_max_k, n_temps, p_tank_pa, p_allowed_pa, p_allowed_peak_pa, t_k,
                          q_m3_s, case_pressure_pa, case_pressure_peak_pa, pass, verdict, verdict_capacity);
}

PUMPLOSS_API int PUMPLOSS_CALL pumploss_line_drain_start(
    const pumploss_line* h, double q_constant_m3_s, double q_laminar_ref_m3_s, double t_ref_k, double peak_volume_m3,
    double peak_time_s, double t_cold_k, double t_max_k, size_t n_temps, double p_tank_pa, double p_allowed_pa,
    double p_allowed_peak_pa, double nu_max_start_m2_s, double* t_start_k, double* t_line_k, double* t_viscosity_k) {
  double* const outs[] = {t_start_k, t_line_k, t_viscosity_k};
  if (h == nullptr) {
    for (double* p : outs) if (p != nullptr) *p = kNaN;
    return PUMPLOSS_EMISUSE;
  }
  return call(outs, [&] {
    const auto f = grid_flow_of(h, n_temps, q_constant_m3_s, q_laminar_ref_m3_s, t_ref_k, peak_volume_m3, peak_time_s);
    if (is_error(f.st)) return f.st;
    const auto r = pumploss::drain_start_temperature(
        h->line, h->oil, f.value,
        pumploss::drain_limits<double>{p_tank_pa, p_allowed_pa, p_allowed_peak_pa}, t_cold_k, t_max_k,
        static_cast<int>(n_temps), nu_max_start_m2_s);
    *t_start_k = r.t_start_k;
    *t_line_k = r.t_line_k;
    *t_viscosity_k = r.t_viscosity_k;
    return r.st;
  });
}

PUMPLOSS_API int PUMPLOSS_CALL pumploss_line_size_drain_flow(
    const pumploss_line* h, double q_constant_m3_s, double q_laminar_ref_m3_s, double t_ref_k, double peak_volume_m3,
    double peak_time_s, double t_cold_k, double t_max_k, size_t n_temps, double p_tank_pa, double p_allowed_pa,
    double p_allowed_peak_pa, double v_max_m_s, int kinds_mask, double* diameter_m, double* fixed_dp_pa,
    int* dominant_element, int* fixed_exceeds) {
  double* const outs[] = {diameter_m, fixed_dp_pa};
  if (dominant_element != nullptr) *dominant_element = -1;
  if (fixed_exceeds != nullptr) *fixed_exceeds = 0;
  if (h == nullptr || dominant_element == nullptr || fixed_exceeds == nullptr) {
    for (double* p : outs) if (p != nullptr) *p = kNaN;
    return PUMPLOSS_EMISUSE;
  }
  return call(outs, [&] {
    const auto f = grid_flow_of(h, n_temps, q_constant_m3_s, q_laminar_ref_m3_s, t_ref_k, peak_volume_m3, peak_time_s);
    if (is_error(f.st)) return f.st;
    const auto z = pumploss::size_drain_line(
        h->line, h->oil, f.value,
        pumploss::drain_limits<double>{p_tank_pa, p_allowed_pa, p_allowed_peak_pa}, t_cold_k, t_max_k,
        static_cast<int>(n_temps), v_max_m_s, kinds_mask);
    *diameter_m = z.diameter_m;
    *fixed_dp_pa = z.fixed_dp_pa;
    *dominant_element = z.dominant_element;
    *fixed_exceeds = z.fixed_exceeds ? 1 : 0;
    return z.st;
  });
}

PUMPLOSS_API int PUMPLOSS_CALL pumploss_line_set_drain_table(pumploss_line* h, size_t count,
                                                             const double temperature_k[], const double drain_m3_s[]) {
  if (h == nullptr) return PUMPLOSS_EMISUSE;
  if (temperature_k == nullptr || drain_m3_s == nullptr) return set_message(h, status::misuse, "set_drain_table");
  fp_guard guard;
  if (count == 0) {  // valid arrays and no points: the table is removed
    h->drain_table = pumploss::drain_flow<double>{};
    h->message = "no error";
    return PUMPLOSS_OK;
  }
  if (count > static_cast<size_t>(pumploss::drain_flow_max_points)) return set_message(h, status::domain, "set_drain_table");
  const auto f = pumploss::drain_flow_table(count, temperature_k, drain_m3_s);
  if (is_error(f.st)) return set_message(h, f.st, "set_drain_table");
  h->drain_table = f.value;
  h->message = "no error";
  return PUMPLOSS_OK;
}

PUMPLOSS_API int PUMPLOSS_CALL pumploss_line_drain_fixed_alone(
    const pumploss_line* h, double q_constant_m3_s, double q_laminar_ref_m3_s, double t_ref_k, double peak_volume_m3,
    double peak_time_s, double t_cold_k, double t_max_k, size_t n_temps, double p_tank_pa, double p_allowed_pa,
    double p_allowed_peak_pa, int index, double* dp_pa, double* t_k, int* exceeds) {
  double* const outs[] = {dp_pa, t_k};
  if (exceeds != nullptr) *exceeds = 0;
  if (h == nullptr || exceeds == nullptr) {
    for (double* p : outs) if (p != nullptr) *p = kNaN;
    return PUMPLOSS_EMISUSE;
  }
  return call(outs, [&] {
    const auto f = grid_flow_of(h, n_temps, q_constant_m3_s, q_laminar_ref_m3_s, t_ref_k, peak_volume_m3, peak_time_s);
    if (is_error(f.st)) return f.st;
    const auto a = pumploss::drain_fixed_alone(h->line, h->oil, f.value,
                                               pumploss::drain_limits<double>{p_tank_pa, p_allowed_pa, p_allowed_peak_pa},
                                               t_cold_k, t_max_k, static_cast<int>(n_temps), index);
    *dp_pa = a.dp_pa;
    *t_k = a.t_k;
    *exceeds = a.usable() && a.exceeds ? 1 : 0;
    return a.st;
  });
}

}  // extern "C"
