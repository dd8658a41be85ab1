// C API wrappers for test_stand.hpp: a setup handle (changed by its set functions) and a reduced
// test handle, computed completely in pumploss_test_stand_create() and only read afterwards.
#include <cmath>
#include <cstring>
#include <new>
#include <string>
#include <vector>

#include "capi_common.hpp"
#include "pumploss/fluid.hpp"
#include "pumploss/test_stand.hpp"

using pumploss::capi::call;
using pumploss::capi::kNaN;

struct pumploss_test_stand_setup {
  pumploss::test_stand_setup s;
};

struct pumploss_test_stand {
  pumploss::test_stand_result r;
  std::vector<std::string> messages;  // describe() of every message, made at creation
};

namespace {

using pumploss::status;

bool finite_all(std::initializer_list<double> v) {
  for (const double x : v)
    if (!std::isfinite(x)) return false;
  return true;
}

// Copy a sentence into a caller's buffer (cut to fit, always terminated).
int copy_text(const std::string& text, char* buf, std::size_t cap) {
  if (buf == nullptr || cap == 0) return text.empty() ? PUMPLOSS_OK : PUMPLOSS_EBUFFER;
  const std::size_t n = text.size() < cap - 1 ? text.size() : cap - 1;
  std::memcpy(buf, text.data(), n);
  buf[n] = '\0';
  return n < text.size() ? PUMPLOSS_EBUFFER : PUMPLOSS_OK;
}

// An optional column: all NaN (or none) means not measured.
std::vector<double> optional_column(const double* v, std::size_t n) {
  bool any = false;
  for (std::size_t i = 0; i < n; ++i) any = any || !std::isnan(v[i]);
  return any ? std::vector<double>(v, v + n) : std::vector<double>{};
}

const pumploss::test_stand_map* map_of(const pumploss_test_stand* ts, int model_kind) {
  for (const auto& m : ts->r.maps)
    if (static_cast<int>(m.model) == model_kind) return &m;
  return nullptr;
}

// Fill `count` elements of each array with NaN.
void nan_fill(std::size_t count, std::initializer_list<double*> outs) {
  for (double* p : outs)
    if (p != nullptr)
      for (std::size_t i = 0; i < count; ++i) p[i] = kNaN;
}

}  // namespace

extern "C" {

PUMPLOSS_API int PUMPLOSS_CALL pumploss_test_stand_setup_create(int machine_kind, double nominal_displacement_m3_rev,
                                                                double t1_k, double nu1_m2_s, double t2_k,
                                                                double nu2_m2_s, pumploss_test_stand_setup** out) {
  if (out == nullptr) return PUMPLOSS_EMISUSE;
  *out = nullptr;
  if (!finite_all({nominal_displacement_m3_rev, t1_k, nu1_m2_s, t2_k, nu2_m2_s})) return PUMPLOSS_ENONFINITE;
  if ((machine_kind != PUMPLOSS_PUMP && machine_kind != PUMPLOSS_MOTOR) || !(nominal_displacement_m3_rev > 0))
    return PUMPLOSS_EDOMAIN;
  pumploss::capi::fp_guard guard;
  const auto line = pumploss::d341_fit(t1_k, nu1_m2_s, t2_k, nu2_m2_s);
  if (!line.usable()) return static_cast<int>(line.st);
  auto* h = new (std::nothrow) pumploss_test_stand_setup();
  if (h == nullptr) return PUMPLOSS_ENOMEM;
  h->s.kind = static_cast<pumploss::machine>(machine_kind);
  h->s.nominal_displacement_m3_rev = nominal_displacement_m3_rev;
  h->s.fluid = pumploss::typical_mineral_oil(line.value);
  *out = h;
  return PUMPLOSS_OK;
}

PUMPLOSS_API void PUMPLOSS_CALL pumploss_test_stand_setup_destroy(pumploss_test_stand_setup* setup) { delete setup; }

PUMPLOSS_API int PUMPLOSS_CALL pumploss_test_stand_setup_set_oil(pumploss_test_stand_setup* setup, double rho_kg_m3,
                                                                 double t_ref_k, double alpha_per_k,
                                                                 double bulk_modulus_pa) {
  if (setup == nullptr) return PUMPLOSS_EMISUSE;
  if (!finite_all({rho_kg_m3, t_ref_k, alpha_per_k, bulk_modulus_pa})) return PUMPLOSS_ENONFINITE;
  if (!(rho_kg_m3 > 0) || !(t_ref_k > 0) || !(alpha_per_k >= 0 && alpha_per_k < 0.01) || !(bulk_modulus_pa > 0))
    return PUMPLOSS_EDOMAIN;
  auto& f = setup->s.fluid;
  f.rho_ref_kg_m3 = rho_kg_m3;
  f.t_ref_k = t_ref_k;
  f.alpha_per_k = alpha_per_k;
  f.bulk_modulus_pa = bulk_modulus_pa;
  return PUMPLOSS_OK;
}

PUMPLOSS_API int PUMPLOSS_CALL pumploss_test_stand_setup_set_method(pumploss_test_stand_setup* setup,
                                                                    int viscosity_temperature, int displacement,
                                                                    int fit_model) {
  if (setup == nullptr) return PUMPLOSS_EMISUSE;
  if (viscosity_temperature < PUMPLOSS_TS_VISCOSITY_INLET || viscosity_temperature > PUMPLOSS_TS_VISCOSITY_DRAIN ||
      displacement < PUMPLOSS_TS_DISPLACEMENT_SLOPE || displacement > PUMPLOSS_TS_DISPLACEMENT_NOMINAL ||
      (fit_model != PUMPLOSS_MODEL_WILSON && fit_model != PUMPLOSS_MODEL_SCHLOESSER))
    return PUMPLOSS_EDOMAIN;
  setup->s.viscosity_at = static_cast<pumploss::viscosity_temperature>(viscosity_temperature);
  setup->s.displacement = static_cast<pumploss::displacement_choice>(displacement);
  setup->s.fit_schloesser = fit_model == PUMPLOSS_MODEL_SCHLOESSER;
  return PUMPLOSS_OK;
}

PUMPLOSS_API int PUMPLOSS_CALL pumploss_test_stand_setup_set_meter(pumploss_test_stand_setup* setup,
                                                                   int meter_position, double meter_pressure_pa) {
  if (setup == nullptr) return PUMPLOSS_EMISUSE;
  if (!std::isfinite(meter_pressure_pa)) return PUMPLOSS_ENONFINITE;
  if ((meter_position != PUMPLOSS_TS_METER_AT_PORT && meter_position != PUMPLOSS_TS_METER_IN_RETURN) ||
      !(meter_pressure_pa > -1e5 && meter_pressure_pa < 1e8))
    return PUMPLOSS_EDOMAIN;
  setup->s.meter_at_port = meter_position == PUMPLOSS_TS_METER_AT_PORT;
  setup->s.meter_pressure_pa = meter_pressure_pa;
  return PUMPLOSS_OK;
}

PUMPLOSS_API int PUMPLOSS_CALL pumploss_test_stand_setup_set_instrument(pumploss_test_stand_setup* setup,
                                                                        int instrument, double reading_percent,
                                                                        double absolute_si, int distribution) {
  if (setup == nullptr) return PUMPLOSS_EMISUSE;
  if (!finite_all({reading_percent, absolute_si})) return PUMPLOSS_ENONFINITE;
  if (instrument < PUMPLOSS_TS_SPEED || instrument > PUMPLOSS_TS_TORQUE ||
      (distribution != PUMPLOSS_TS_LIMITS && distribution != PUMPLOSS_TS_STANDARD) ||
      !(reading_percent >= 0 && reading_percent < 50) || !(absolute_si >= 0))
    return PUMPLOSS_EDOMAIN;
  auto& s = setup->s;
  pumploss::instrument_limits* ins[] = {&s.speed, &s.pressure, &s.flow, &s.torque};
  *ins[instrument] = {reading_percent / 100.0, absolute_si, distribution == PUMPLOSS_TS_LIMITS};
  return PUMPLOSS_OK;
}

PUMPLOSS_API int PUMPLOSS_CALL pumploss_test_stand_setup_set_map(pumploss_test_stand_setup* setup,
                                                                 double speed_lo_rev_s, double speed_hi_rev_s,
                                                                 double dp_lo_pa, double dp_hi_pa, double t_k,
                                                                 size_t speeds, size_t pressures) {
  if (setup == nullptr) return PUMPLOSS_EMISUSE;
  if (!finite_all({speed_lo_rev_s, speed_hi_rev_s, dp_lo_pa, dp_hi_pa, t_k})) return PUMPLOSS_ENONFINITE;
  if (!(speed_lo_rev_s >= 0 && speed_hi_rev_s > speed_lo_rev_s && dp_lo_pa >= 0 && dp_hi_pa > dp_lo_pa && t_k > 0) ||
      speeds < 2 || pressures < 2 || speeds > 10000 || pressures > 10000)
    return PUMPLOSS_EDOMAIN;
  auto& s = setup->s;
  s.map_speed_lo_rev_s = speed_lo_rev_s;
  s.map_speed_hi_rev_s = speed_hi_rev_s;
  s.map_dp_lo_pa = dp_lo_pa;
  s.map_dp_hi_pa = dp_hi_pa;
  s.map_temperature_k = t_k;
  s.map_speeds = speeds;
  s.map_pressures = pressures;
  return PUMPLOSS_OK;
}

// Reading a setup back: const, no allocation; int outputs -1 on an error.
PUMPLOSS_API int PUMPLOSS_CALL pumploss_test_stand_setup_get_machine(const pumploss_test_stand_setup* setup,
                                                                     int* machine_kind,
                                                                     double* nominal_displacement_m3_rev) {
  if (machine_kind != nullptr) *machine_kind = -1;
  return call({nominal_displacement_m3_rev}, [&] {
    if (setup == nullptr || machine_kind == nullptr) return status::misuse;
    *machine_kind = static_cast<int>(setup->s.kind);
    *nominal_displacement_m3_rev = setup->s.nominal_displacement_m3_rev;
    return status::ok;
  });
}

PUMPLOSS_API int PUMPLOSS_CALL pumploss_test_stand_setup_viscosity(const pumploss_test_stand_setup* setup,
                                                                   double t_k, double* nu_m2_s) {
  return call({nu_m2_s}, [&] {
    if (setup == nullptr) return status::misuse;
    const auto r = pumploss::oil_kinematic_viscosity(setup->s.fluid, t_k);
    *nu_m2_s = r.value;
    return r.st;
  });
}

PUMPLOSS_API int PUMPLOSS_CALL pumploss_test_stand_setup_get_oil(const pumploss_test_stand_setup* setup,
                                                                 double* rho_kg_m3, double* t_ref_k,
                                                                 double* alpha_per_k, double* bulk_modulus_pa) {
  return call({rho_kg_m3, t_ref_k, alpha_per_k, bulk_modulus_pa}, [&] {
    if (setup == nullptr) return status::misuse;
    const auto& f = setup->s.fluid;
    *rho_kg_m3 = f.rho_ref_kg_m3;
    *t_ref_k = f.t_ref_k;
    *alpha_per_k = f.alpha_per_k;
    *bulk_modulus_pa = f.bulk_modulus_pa;
    return status::ok;
  });
}

PUMPLOSS_API int PUMPLOSS_CALL pumploss_test_stand_setup_get_method(const pumploss_test_stand_setup* setup,
                                                                    int* viscosity_temperature, int* displacement,
                                                                    int* fit_model) {
  for (int* p : {viscosity_temperature, displacement, fit_model})
    if (p != nullptr) *p = -1;
  if (setup == nullptr || viscosity_temperature == nullptr || displacement == nullptr || fit_model == nullptr)
    return PUMPLOSS_EMISUSE;
  *viscosity_temperature = static_cast<int>(setup->s.viscosity_at);
  *displacement = static_cast<int>(setup->s.displacement);
  *fit_model = setup->s.fit_schloesser ? PUMPLOSS_MODEL_SCHLOESSER : PUMPLOSS_MODEL_WILSON;
  return PUMPLOSS_OK;
}

PUMPLOSS_API int PUMPLOSS_CALL pumploss_test_stand_setup_get_meter(const pumploss_test_stand_setup* setup,
                                                                   int* meter_position, double* meter_pressure_pa) {
  if (meter_position != nullptr) *meter_position = -1;
  return call({meter_pressure_pa}, [&] {
    if (setup == nullptr || meter_position == nullptr) return status::misuse;
    *meter_position = setup->s.meter_at_port ? PUMPLOSS_TS_METER_AT_PORT : PUMPLOSS_TS_METER_IN_RETURN;
    *meter_pressure_pa = setup->s.meter_pressure_pa;
    return status::ok;
  });
}

PUMPLOSS_API int PUMPLOSS_CALL pumploss_test_stand_setup_get_instrument(const pumploss_test_stand_setup* setup,
                                                                        int instrument, double* reading_percent,
                                                                        double* absolute_si, int* distribution) {
  if (distribution != nullptr) *distribution = -1;
  const int code = call({reading_percent, absolute_si}, [&] {
    if (setup == nullptr || distribution == nullptr) return status::misuse;
    if (instrument < PUMPLOSS_TS_SPEED || instrument > PUMPLOSS_TS_TORQUE) return status::domain;
    const auto& s = setup->s;
    const pumploss::instrument_limits* ins[] = {&s.speed, &s.pressure, &s.flow, &s.torque};
    const auto& i = *ins[instrument];
    *reading_percent = i.reading_fraction * 100.0;
    *absolute_si = i.absolute;
    *distribution = i.rectangular ? PUMPLOSS_TS_LIMITS : PUMPLOSS_TS_STANDARD;
    return status::ok;
  });
  if (pumploss::is_error(static_cast<status>(code)) && distribution != nullptr) *distribution = -1;
  return code;
}

PUMPLOSS_API int PUMPLOSS_CALL pumploss_test_stand_setup_get_map(const pumploss_test_stand_setup* setup,
                                                                 double* speed_lo_rev_s, double* speed_hi_rev_s,
                                                                 double* dp_lo_pa, double* dp_hi_pa, double* t_k,
                                                                 size_t* speeds, size_t* pressures) {
  if (speeds != nullptr) *speeds = 0;
  if (pressures != nullptr) *pressures = 0;
  return call({speed_lo_rev_s, speed_hi_rev_s, dp_lo_pa, dp_hi_pa, t_k}, [&] {
    if (setup == nullptr || speeds == nullptr || pressures == nullptr) return status::misuse;
    const auto& s = setup->s;
    *speeds = s.map_speeds;
    *pressures = s.map_pressures;
    // set_map() refuses a range with hi <= lo, so hi > lo says it was set
    if (!(s.map_speed_hi_rev_s > s.map_speed_lo_rev_s)) return status::insufficient_data;
    *speed_lo_rev_s = s.map_speed_lo_rev_s;
    *speed_hi_rev_s = s.map_speed_hi_rev_s;
    *dp_lo_pa = s.map_dp_lo_pa;
    *dp_hi_pa = s.map_dp_hi_pa;
    *t_k = s.map_temperature_k;
    return status::ok;
  });
}

PUMPLOSS_API int PUMPLOSS_CALL pumploss_test_stand_create(const pumploss_test_stand_setup* setup, size_t count,
                                                          const double* speed_rev_s, const double* inlet_pressure_pa,
                                                          const double* outlet_pressure_pa, const double* flow_m3_s,
                                                          const double* torque_n_m, const double* drain_flow_m3_s,
                                                          const double* inlet_t_k, const double* outlet_t_k,
                                                          const double* drain_t_k, const double* meter_t_k,
                                                          char* message, size_t message_capacity,
                                                          pumploss_test_stand** out) {
  if (message != nullptr && message_capacity > 0) message[0] = '\0';
  if (out == nullptr) return PUMPLOSS_EMISUSE;
  *out = nullptr;
  if (setup == nullptr || speed_rev_s == nullptr || inlet_pressure_pa == nullptr || outlet_pressure_pa == nullptr ||
      flow_m3_s == nullptr || torque_n_m == nullptr || drain_flow_m3_s == nullptr || inlet_t_k == nullptr ||
      outlet_t_k == nullptr || drain_t_k == nullptr || meter_t_k == nullptr || (message == nullptr && message_capacity > 0))
    return PUMPLOSS_EMISUSE;
  pumploss_test_stand* h = nullptr;
  int code = PUMPLOSS_OK;
  {
    pumploss::capi::fp_guard guard;
    try {
      pumploss::test_stand_readings r;
      const std::size_t n = count;
      r.speed_rev_s.assign(speed_rev_s, speed_rev_s + n);
      r.inlet_pressure_pa.assign(inlet_pressure_pa, inlet_pressure_pa + n);
      r.outlet_pressure_pa.assign(outlet_pressure_pa, outlet_pressure_pa + n);
      r.flow_m3_s.assign(flow_m3_s, flow_m3_s + n);
      r.torque_n_m.assign(torque_n_m, torque_n_m + n);
      r.drain_flow_m3_s.assign(drain_flow_m3_s, drain_flow_m3_s + n);
      r.inlet_temperature_k.assign(inlet_t_k, inlet_t_k + n);
      r.outlet_temperature_k = optional_column(outlet_t_k, n);
      r.drain_temperature_k = optional_column(drain_t_k, n);
      r.meter_temperature_k = optional_column(meter_t_k, n);
      h = new pumploss_test_stand();
      h->r = pumploss::reduce_test_stand(setup->s, r);
      for (const auto& m : h->r.messages) h->messages.push_back(pumploss::describe(m, r));
      code = static_cast<int>(h->r.st);
      if (!h->messages.empty()) copy_text(h->messages.front(), message, message_capacity);
    } catch (const std::bad_alloc&) {
      code = PUMPLOSS_ENOMEM;
    } catch (...) {
      code = PUMPLOSS_EINTERNAL;
    }
  }
  if (pumploss::is_error(static_cast<status>(code))) {  // every create function: NULL on error
    delete h;
    return code;
  }
  *out = h;
  return code;
}

PUMPLOSS_API void PUMPLOSS_CALL pumploss_test_stand_destroy(pumploss_test_stand* ts) { delete ts; }

PUMPLOSS_API int PUMPLOSS_CALL pumploss_test_stand_message(const pumploss_test_stand* ts, size_t index, char* text,
                                                           size_t text_capacity) {
  if (text != nullptr && text_capacity > 0) text[0] = '\0';
  if (ts == nullptr || text == nullptr || text_capacity == 0) return PUMPLOSS_EMISUSE;
  if (index >= ts->messages.size()) return PUMPLOSS_EDATA;
  const int fit = copy_text(ts->messages[index], text, text_capacity);
  return fit != PUMPLOSS_OK ? fit : static_cast<int>(ts->r.messages[index].st);
}

PUMPLOSS_API int PUMPLOSS_CALL pumploss_test_stand_displacement(const pumploss_test_stand* ts, int which,
                                                                double* v_m3_rev, double* u_v_m3_rev) {
  return call({v_m3_rev, u_v_m3_rev}, [&] {
    if (ts == nullptr) return status::misuse;
    if (which == PUMPLOSS_TS_DISPLACEMENT_USED) {
      *v_m3_rev = ts->r.displacement_m3_rev;
      *u_v_m3_rev = ts->r.u_displacement_m3_rev;
      return status::ok;
    }
    if (which < PUMPLOSS_TS_DISPLACEMENT_SLOPE || which > PUMPLOSS_TS_DISPLACEMENT_TWO_STEP) return status::domain;
    const auto& e = ts->r.estimators[static_cast<std::size_t>(which)];
    *v_m3_rev = e.v_m3_rev;
    *u_v_m3_rev = e.u_v_m3_rev;
    return e.st;
  });
}

PUMPLOSS_API int PUMPLOSS_CALL pumploss_test_stand_points(const pumploss_test_stand* ts, size_t count,
                                                          double eta_v[], double U_eta_v[], double eta_hm[],
                                                          double U_eta_hm[], double eta_t[], double U_eta_t[],
                                                          int status_out[]) {
  const auto outs = {eta_v, U_eta_v, eta_hm, U_eta_hm, eta_t, U_eta_t};
  nan_fill(count, outs);
  if (status_out != nullptr)
    for (size_t i = 0; i < count; ++i) status_out[i] = PUMPLOSS_EMISUSE;
  if (ts == nullptr || status_out == nullptr) return PUMPLOSS_EMISUSE;
  for (double* p : outs)
    if (p == nullptr) return PUMPLOSS_EMISUSE;
  if (count != ts->r.points.size()) {
    for (size_t i = 0; i < count; ++i) status_out[i] = PUMPLOSS_EBUFFER;
    return PUMPLOSS_EBUFFER;
  }
  for (size_t i = 0; i < count; ++i) {
    const auto& g = ts->r.points[i].eta;
    eta_v[i] = g.eta_v.value;
    U_eta_v[i] = g.eta_v.U;
    eta_hm[i] = g.eta_hm.value;
    U_eta_hm[i] = g.eta_hm.U;
    eta_t[i] = g.eta_t.value;
    U_eta_t[i] = g.eta_t.U;
    status_out[i] = static_cast<int>(ts->r.points[i].st);
  }
  return PUMPLOSS_OK;
}

PUMPLOSS_API int PUMPLOSS_CALL pumploss_test_stand_point_flows(const pumploss_test_stand* ts, size_t count,
                                                               double flow_m3_s[], double dp_pa[], double mu_pa_s[],
                                                               double drain_fraction[]) {
  const auto outs = {flow_m3_s, dp_pa, mu_pa_s, drain_fraction};
  nan_fill(count, outs);
  if (ts == nullptr) return PUMPLOSS_EMISUSE;
  for (double* p : outs)
    if (p == nullptr) return PUMPLOSS_EMISUSE;
  if (count != ts->r.points.size()) return PUMPLOSS_EBUFFER;
  for (size_t i = 0; i < count; ++i) {
    const auto& p = ts->r.points[i];
    flow_m3_s[i] = p.flow_m3_s;
    dp_pa[i] = p.dp_pa;
    mu_pa_s[i] = p.mu_pa_s;
    drain_fraction[i] = ts->r.drain[i].fraction;
  }
  return PUMPLOSS_OK;
}

PUMPLOSS_API int PUMPLOSS_CALL pumploss_test_stand_model(const pumploss_test_stand* ts, int model_kind, double* c_s,
                                                         double* c_st, double* c_v, double* c_f, double* t_c_n_m,
                                                         double* c_h, double* r2_flow, double* r2_torque) {
  return call({c_s, c_st, c_v, c_f, t_c_n_m, c_h, r2_flow, r2_torque}, [&] {
    if (ts == nullptr) return status::misuse;
    if (model_kind != PUMPLOSS_MODEL_WILSON && model_kind != PUMPLOSS_MODEL_SCHLOESSER) return status::domain;
    for (const auto& m : ts->r.models) {
      if (static_cast<int>(m.model) != model_kind) continue;
      *c_s = m.c_s;
      *c_st = m.c_st;
      *c_v = m.c_v;
      *c_f = m.c_f;
      *t_c_n_m = m.t_c_n_m;
      *c_h = m.c_h;
      *r2_flow = m.r2_flow;
      *r2_torque = m.r2_torque;
      return m.st;
    }
    return status::insufficient_data;
  });
}

PUMPLOSS_API int PUMPLOSS_CALL pumploss_test_stand_map(const pumploss_test_stand* ts, int model_kind, size_t n_dp,
                                                       size_t n_speed, double eta_t[], int status_out[]) {
  const size_t total = n_dp * n_speed;
  nan_fill(total, {eta_t});
  if (status_out != nullptr)
    for (size_t i = 0; i < total; ++i) status_out[i] = PUMPLOSS_EMISUSE;
  if (ts == nullptr || eta_t == nullptr || status_out == nullptr) return PUMPLOSS_EMISUSE;
  const auto* m = map_of(ts, model_kind);
  const int refusal = model_kind != PUMPLOSS_MODEL_WILSON && model_kind != PUMPLOSS_MODEL_SCHLOESSER ? PUMPLOSS_EDOMAIN
                      : m == nullptr                                                                ? PUMPLOSS_EDATA
                      : (n_dp != ts->r.map_dp_pa.size() || n_speed != ts->r.map_speed_rev_s.size()) ? PUMPLOSS_EBUFFER
                                                                                                    : PUMPLOSS_OK;
  if (refusal != PUMPLOSS_OK) {
    for (size_t i = 0; i < total; ++i) status_out[i] = refusal;
    return refusal;
  }
  status summary = status::ok;
  bool failed = false;
  for (size_t k = 0; k < total; ++k) {
    eta_t[k] = pumploss::is_error(m->st[k]) ? kNaN : m->eta_t[k];
    status_out[k] = static_cast<int>(m->st[k]);
    if (pumploss::is_error(m->st[k])) failed = true;
    else if (summary == status::ok) summary = m->st[k];
  }
  return failed ? PUMPLOSS_WPARTIAL : static_cast<int>(summary);
}

PUMPLOSS_API int PUMPLOSS_CALL pumploss_test_stand_map_axis(const pumploss_test_stand* ts, int axis, size_t count,
                                                            double values_si[]) {
  nan_fill(count, {values_si});
  if (ts == nullptr || values_si == nullptr) return PUMPLOSS_EMISUSE;
  if (axis != PUMPLOSS_TS_AXIS_PRESSURE && axis != PUMPLOSS_TS_AXIS_SPEED) return PUMPLOSS_EDOMAIN;
  const auto& v = axis == PUMPLOSS_TS_AXIS_PRESSURE ? ts->r.map_dp_pa : ts->r.map_speed_rev_s;
  if (count != v.size()) return PUMPLOSS_EBUFFER;
  for (size_t i = 0; i < count; ++i) values_si[i] = v[i];
  return PUMPLOSS_OK;
}

}  // extern "C"

// ---- issue 16: logged data (set points, steady state, outliers) and acceptance

PUMPLOSS_API int PUMPLOSS_CALL pumploss_test_stand_setup_set_grouping(pumploss_test_stand_setup* setup,
                                                                      double speed_percent, double dp_percent,
                                                                      double dp_band_pa, double steady_speed_percent,
                                                                      double steady_pressure_percent,
                                                                      double steady_flow_percent,
                                                                      double steady_torque_percent,
                                                                      double steady_temperature_k, int drop_unsteady) {
  if (setup == nullptr) return PUMPLOSS_EMISUSE;
  if (!finite_all({speed_percent, dp_percent, dp_band_pa, steady_speed_percent, steady_pressure_percent,
                   steady_flow_percent, steady_torque_percent, steady_temperature_k}))
    return PUMPLOSS_ENONFINITE;
  if (!(speed_percent > 0 && speed_percent < 50 && dp_percent > 0 && dp_percent < 50 && dp_band_pa >= 0 &&
        steady_speed_percent > 0 && steady_pressure_percent > 0 && steady_flow_percent > 0 &&
        steady_torque_percent > 0 && steady_temperature_k > 0) ||
      (drop_unsteady != 0 && drop_unsteady != 1))
    return PUMPLOSS_EDOMAIN;
  auto& s = setup->s;
  s.group_speed_fraction = speed_percent / 100;
  s.group_dp_fraction = dp_percent / 100;
  s.group_dp_abs_pa = dp_band_pa;
  s.steady = {steady_speed_percent / 100, steady_pressure_percent / 100, steady_flow_percent / 100,
              steady_torque_percent / 100, steady_temperature_k};
  s.drop_unsteady = drop_unsteady == 1;
  return PUMPLOSS_OK;
}

PUMPLOSS_API int PUMPLOSS_CALL pumploss_test_stand_setup_set_outliers(pumploss_test_stand_setup* setup,
                                                                      double threshold, int rule) {
  if (setup == nullptr) return PUMPLOSS_EMISUSE;
  if (!std::isfinite(threshold)) return PUMPLOSS_ENONFINITE;
  if (!(threshold > 1 && threshold <= 1e6) || (rule != PUMPLOSS_TS_OUTLIERS_FLAG && rule != PUMPLOSS_TS_OUTLIERS_EXCLUDE))
    return PUMPLOSS_EDOMAIN;
  setup->s.outlier_threshold = threshold;
  setup->s.exclude_outliers = rule == PUMPLOSS_TS_OUTLIERS_EXCLUDE;
  return PUMPLOSS_OK;
}

PUMPLOSS_API int PUMPLOSS_CALL pumploss_test_stand_setup_add_exclude_row(pumploss_test_stand_setup* setup, size_t row) {
  if (setup == nullptr) return PUMPLOSS_EMISUSE;
  try {
    setup->s.exclude_rows.push_back(row);
  } catch (const std::bad_alloc&) {
    return PUMPLOSS_ENOMEM;
  }
  return PUMPLOSS_OK;
}

PUMPLOSS_API int PUMPLOSS_CALL pumploss_test_stand_setup_add_acceptance(pumploss_test_stand_setup* setup,
                                                                        int quantity, double speed_rev_s,
                                                                        double dp_pa, double limit) {
  if (setup == nullptr) return PUMPLOSS_EMISUSE;
  if (!finite_all({speed_rev_s, dp_pa, limit})) return PUMPLOSS_ENONFINITE;
  if (quantity < PUMPLOSS_TS_ACCEPT_ETA_V || quantity > PUMPLOSS_TS_ACCEPT_DRAIN_FLOW || !(speed_rev_s >= 0) ||
      !(dp_pa >= 0) || !(limit >= 0))
    return PUMPLOSS_EDOMAIN;
  try {
    setup->s.acceptance.push_back({static_cast<pumploss::acceptance_quantity>(quantity), speed_rev_s, dp_pa, limit, {}});
  } catch (const std::bad_alloc&) {
    return PUMPLOSS_ENOMEM;
  }
  return PUMPLOSS_OK;
}

PUMPLOSS_API int PUMPLOSS_CALL pumploss_test_stand_counts(const pumploss_test_stand* ts, size_t* set_points,
                                                          size_t* rows_unsteady, size_t* outliers, size_t* excluded,
                                                          size_t* criteria) {
  if (ts == nullptr || set_points == nullptr || rows_unsteady == nullptr || outliers == nullptr ||
      excluded == nullptr || criteria == nullptr)
    return PUMPLOSS_EMISUSE;
  *set_points = ts->r.points.size();
  *rows_unsteady = ts->r.rows_unsteady;
  *outliers = ts->r.outliers;
  *excluded = ts->r.excluded;
  *criteria = ts->r.acceptance.size();
  return PUMPLOSS_OK;
}

PUMPLOSS_API int PUMPLOSS_CALL pumploss_test_stand_set_points(const pumploss_test_stand* ts, size_t count,
                                                              size_t first_row[], size_t rows[],
                                                              size_t rows_unsteady[], double ua_flow_m3_s[],
                                                              double ua_torque_n_m[]) {
  nan_fill(count, {ua_flow_m3_s, ua_torque_n_m});
  if (ts == nullptr || first_row == nullptr || rows == nullptr || rows_unsteady == nullptr ||
      ua_flow_m3_s == nullptr || ua_torque_n_m == nullptr)
    return PUMPLOSS_EMISUSE;
  if (count != ts->r.points.size()) return PUMPLOSS_EBUFFER;
  for (size_t i = 0; i < count; ++i) {
    const auto& p = ts->r.points[i];
    first_row[i] = p.first_row;
    rows[i] = p.rows;
    rows_unsteady[i] = p.rows_unsteady;
    ua_flow_m3_s[i] = p.ua_flow_m3_s;
    ua_torque_n_m[i] = p.ua_torque_n_m;
  }
  return PUMPLOSS_OK;
}

PUMPLOSS_API int PUMPLOSS_CALL pumploss_test_stand_outliers(const pumploss_test_stand* ts, size_t count,
                                                            double t_flow[], double t_torque[], int outlier[],
                                                            int excluded[]) {
  nan_fill(count, {t_flow, t_torque});
  if (ts == nullptr || t_flow == nullptr || t_torque == nullptr || outlier == nullptr || excluded == nullptr)
    return PUMPLOSS_EMISUSE;
  if (count != ts->r.points.size()) return PUMPLOSS_EBUFFER;
  int st = PUMPLOSS_OK;
  for (size_t i = 0; i < count; ++i) {
    const auto& p = ts->r.points[i];
    t_flow[i] = p.t_flow;
    t_torque[i] = p.t_torque;
    if (std::isnan(p.t_flow) || std::isnan(p.t_torque)) st = PUMPLOSS_WUNDEFINED;
    outlier[i] = static_cast<int>(p.outlier);
    excluded[i] = p.excluded_by_list ? 2 : p.excluded ? 1 : 0;
  }
  return st;
}

PUMPLOSS_API int PUMPLOSS_CALL pumploss_test_stand_acceptance(const pumploss_test_stand* ts, size_t index, int* pass,
                                                              int* tested, double* value, double* U, double* margin,
                                                              size_t* point) {
  for (double* p : {value, U, margin})
    if (p != nullptr) *p = kNaN;
  if (ts == nullptr || pass == nullptr || tested == nullptr || value == nullptr || U == nullptr ||
      margin == nullptr || point == nullptr)
    return PUMPLOSS_EMISUSE;
  *pass = *tested = 0;
  *point = 0;
  if (index >= ts->r.acceptance.size()) return PUMPLOSS_EDATA;
  const auto& v = ts->r.acceptance[index];
  *pass = v.pass ? 1 : 0;
  *tested = v.tested ? 1 : 0;
  *point = v.point;
  if (!v.tested) return PUMPLOSS_WUNDEFINED;
  *value = v.value;
  *U = v.U;
  *margin = v.margin;
  return PUMPLOSS_OK;
}

// ---- the fit status per set point, the map's temperature (issue 16)
PUMPLOSS_API int PUMPLOSS_CALL pumploss_test_stand_point_fit(const pumploss_test_stand* ts, size_t count,
                                                             int fit_status[]) {
  if (ts == nullptr || fit_status == nullptr) return PUMPLOSS_EMISUSE;
  if (count != ts->r.points.size()) return PUMPLOSS_EBUFFER;
  for (size_t i = 0; i < count; ++i) fit_status[i] = static_cast<int>(ts->r.points[i].fit_st);
  return PUMPLOSS_OK;
}

PUMPLOSS_API int PUMPLOSS_CALL pumploss_test_stand_map_temperature(const pumploss_test_stand* ts, double* t_k,
                                                                   double* mu_pa_s, double* tested_lo_k,
                                                                   double* tested_hi_k) {
  return call({t_k, mu_pa_s, tested_lo_k, tested_hi_k}, [&] {
    if (ts == nullptr) return status::misuse;
    const auto& r = ts->r;
    *t_k = r.map_temperature_k;
    *mu_pa_s = r.map_mu_pa_s;
    *tested_lo_k = r.tested_temperature_lo_k;
    *tested_hi_k = r.tested_temperature_hi_k;
    return r.map_temperature_tested ? status::ok : status::extrapolated;
  });
}
