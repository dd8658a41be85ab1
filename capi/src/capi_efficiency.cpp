// C API wrappers for efficiency.hpp, leakage.hpp and thermal.hpp.
#include <algorithm>
#include <cstdint>
#include <cstring>
#include <vector>

#include "capi_common.hpp"
#include "pumploss/efficiency.hpp"
#include "pumploss/leakage.hpp"
#include "pumploss/thermal.hpp"

using pumploss::capi::call;
using pumploss::capi::call_value;
using pumploss::capi::call_batch;
using pumploss::capi::call_batch_fast;

namespace {
template <class F>
int efficiency_scalar(F&& f, double v, double n, double dp, double q, double t, double* eta_v, double* eta_hm,
                      double* eta_t) {
  return call({eta_v, eta_hm, eta_t}, [&] {
    const auto r = f(v, n, dp, q, t);
    *eta_v = r.eta_v;
    *eta_hm = r.eta_hm;
    *eta_t = r.eta_t;
    return r.st;
  });
}

template <class F>
int efficiency_powers(F&& f, double v, double n, double dp, double q, double t, double* q_th_m3_s,
                      double* torque_th_n_m, double* p_hyd_w, double* p_mech_w) {
  return call({q_th_m3_s, torque_th_n_m, p_hyd_w, p_mech_w}, [&] {
    const auto r = f(v, n, dp, q, t);
    *q_th_m3_s = r.q_th;
    *torque_th_n_m = r.torque_th;
    *p_hyd_w = r.p_hyd;
    *p_mech_w = r.p_mech;
    return r.st;
  });
}

/// True when the byte ranges [a, a + la) and [b, b + lb) share memory.
bool overlap(const void* a, std::size_t la, const void* b, std::size_t lb) {
  const auto x = reinterpret_cast<std::uintptr_t>(a), y = reinterpret_cast<std::uintptr_t>(b);
  return la > 0 && lb > 0 && x < y + lb && y < x + la;
}

/// The bits of a double as an unsigned integer (monotonic in x for x >= +0).
inline std::uint64_t bits_of(double x) {
  std::uint64_t b;
  std::memcpy(&b, &x, sizeof b);
  return b;
}

/// A word whose sign bit is clear exactly when x lies in [lo, hi] (given as bits, 0 <= lo <= hi,
/// hi - lo < 2^63): (x - lo) | (hi - x) in wrapping 64-bit arithmetic. Negative numbers, NaNs
/// and infinities all fall outside. Branch-free and in integers, so the loop vectorises.
inline std::uint64_t outside(std::uint64_t x, std::uint64_t lo, std::uint64_t hi) { return (x - lo) | (hi - x); }

/// Fast path of the efficiency batches: the expressions of pump_efficiency() / motor_efficiency()
/// for eta_v, eta_hm and eta_t in one branch-free, vectorised loop, with the proof that the
/// template would return status::ok with exactly these values: every input in [1e-100, 1e100]
/// (finite, positive; then every product, quotient and the template's overflow sum are finite)
/// and both efficiencies in [0, 1] (not implausible). The proof is the sign bit of an OR of
/// outside() words, accumulated over the block; only when it fails somewhere does a second loop
/// set the per-element flags (0 proven, 1 to be redone by the template). The usual block just
/// gets its statuses zeroed. Returns 1 when any element is flagged.
template <bool Pump>
int efficiency_kernel(std::size_t i0, std::size_t i1, const double* __restrict v, const double* __restrict sp,
                      const double* __restrict dp, const double* __restrict q, const double* __restrict t,
                      double* __restrict eta_v, double* __restrict eta_hm, double* __restrict eta_t,
                      int* __restrict flag) {
  const std::uint64_t lo = bits_of(1e-100), hi = bits_of(1e100), zero = 0, one = bits_of(1.0);
  const double inv_two_pi = pumploss::detail::inv_two_pi<double>();
  auto word = [&](double vi, double ni, double dpi, double qi, double ti, double a, double b) {
    return outside(bits_of(vi), lo, hi) | outside(bits_of(ni), lo, hi) | outside(bits_of(dpi), lo, hi) |
           outside(bits_of(qi), lo, hi) | outside(bits_of(ti), lo, hi) | outside(bits_of(a), zero, one) |
           outside(bits_of(b), zero, one);
  };
  std::uint64_t any = 0;
  for (std::size_t i = i0; i < i1; ++i) {
    const double vi = v[i], ni = sp[i], dpi = dp[i], qi = q[i], ti = t[i];
    const double q_th = vi * ni;
    const double t_th = vi * dpi * inv_two_pi;
    const double a = Pump ? qi / q_th : q_th / qi;
    const double b = Pump ? t_th / ti : ti / t_th;
    eta_v[i] = a;
    eta_hm[i] = b;
    eta_t[i] = a * b;
    any |= word(vi, ni, dpi, qi, ti, a, b);
  }
  if ((any >> 63) == 0) {
    std::memset(flag + i0, 0, (i1 - i0) * sizeof(int));
    return 0;
  }
  for (std::size_t i = i0; i < i1; ++i)
    flag[i] = static_cast<int>(word(v[i], sp[i], dp[i], q[i], t[i], eta_v[i], eta_hm[i]) >> 63);
  return 1;
}

template <bool Pump, class F>
int efficiency_batch(F&& f, size_t n, const double* v, const double* sp, const double* dp, const double* q,
                     const double* t, double* eta_v, double* eta_hm, double* eta_t, int* status) {
  const bool in_ok = v != nullptr && sp != nullptr && dp != nullptr && q != nullptr && t != nullptr;
  auto elem = [&](std::size_t i) {
    const auto r = f(v[i], sp[i], dp[i], q[i], t[i]);
    eta_v[i] = r.eta_v;
    eta_hm[i] = r.eta_hm;
    eta_t[i] = r.eta_t;
    return r.st;
  };
  // The kernel's arrays are __restrict: an output over an input or over another output (or the
  // status array over any of them) takes the element-by-element path.
  bool aliased = false;
  if (in_ok && eta_v != nullptr && eta_hm != nullptr && eta_t != nullptr && status != nullptr) {
    const std::size_t d = n * sizeof(double), s = n * sizeof(int);
    const double* outs[] = {eta_v, eta_hm, eta_t};
    const double* ins[] = {v, sp, dp, q, t};
    for (int k = 0; k < 3; ++k) {
      for (const double* in : ins) aliased = aliased || overlap(in, d, outs[k], d);
      for (int j = k + 1; j < 3; ++j) aliased = aliased || overlap(outs[j], d, outs[k], d);
      aliased = aliased || overlap(outs[k], d, status, s);
    }
    for (const double* in : ins) aliased = aliased || overlap(in, d, status, s);
  }
  if (aliased) return call_batch(n, {eta_v, eta_hm, eta_t}, status, in_ok, elem);
  auto fast = [&](std::size_t i0, std::size_t i1, int* flag) {
    return efficiency_kernel<Pump>(i0, i1, v, sp, dp, q, t, eta_v, eta_hm, eta_t, flag);
  };
  return call_batch_fast(n, {eta_v, eta_hm, eta_t}, status, in_ok, fast, elem);
}

const auto kPump = [](double v, double n, double dp, double q, double t) {
  return pumploss::pump_efficiency(v, n, dp, q, t);
};
const auto kMotor = [](double v, double n, double dp, double q, double t) {
  return pumploss::motor_efficiency(v, n, dp, q, t);
};

}  // namespace

extern "C" {

PUMPLOSS_API int PUMPLOSS_CALL pumploss_pump_efficiency(double displacement_m3_rev, double speed_rev_s, double dp_pa,
                                                        double flow_m3_s, double torque_n_m, double* eta_v,
                                                        double* eta_hm, double* eta_t) {
  return efficiency_scalar(kPump, displacement_m3_rev, speed_rev_s, dp_pa, flow_m3_s, torque_n_m, eta_v, eta_hm, eta_t);
}

PUMPLOSS_API int PUMPLOSS_CALL pumploss_motor_efficiency(double displacement_m3_rev, double speed_rev_s, double dp_pa,
                                                         double flow_m3_s, double torque_n_m, double* eta_v,
                                                         double* eta_hm, double* eta_t) {
  return efficiency_scalar(kMotor, displacement_m3_rev, speed_rev_s, dp_pa, flow_m3_s, torque_n_m, eta_v, eta_hm,
                           eta_t);
}

PUMPLOSS_API int PUMPLOSS_CALL pumploss_pump_efficiency_batch(size_t n, const double* displacement_m3_rev,
                                                              const double* speed_rev_s, const double* dp_pa,
                                                              const double* flow_m3_s, const double* torque_n_m,
                                                              double* eta_v, double* eta_hm, double* eta_t,
                                                              int* status) {
  return efficiency_batch<true>(kPump, n, displacement_m3_rev, speed_rev_s, dp_pa, flow_m3_s, torque_n_m, eta_v, eta_hm,
                          eta_t, status);
}

PUMPLOSS_API int PUMPLOSS_CALL pumploss_motor_efficiency_batch(size_t n, const double* displacement_m3_rev,
                                                               const double* speed_rev_s, const double* dp_pa,
                                                               const double* flow_m3_s, const double* torque_n_m,
                                                               double* eta_v, double* eta_hm, double* eta_t,
                                                               int* status) {
  return efficiency_batch<false>(kMotor, n, displacement_m3_rev, speed_rev_s, dp_pa, flow_m3_s, torque_n_m, eta_v, eta_hm,
                          eta_t, status);
}

PUMPLOSS_API int PUMPLOSS_CALL pumploss_pump_powers(double displacement_m3_rev, double speed_rev_s, double dp_pa,
                                                    double flow_m3_s, double torque_n_m, double* q_th_m3_s,
                                                    double* torque_th_n_m, double* p_hyd_w, double* p_mech_w) {
  return efficiency_powers(kPump, displacement_m3_rev, speed_rev_s, dp_pa, flow_m3_s, torque_n_m, q_th_m3_s,
                           torque_th_n_m, p_hyd_w, p_mech_w);
}

PUMPLOSS_API int PUMPLOSS_CALL pumploss_motor_powers(double displacement_m3_rev, double speed_rev_s, double dp_pa,
                                                     double flow_m3_s, double torque_n_m, double* q_th_m3_s,
                                                     double* torque_th_n_m, double* p_hyd_w, double* p_mech_w) {
  return efficiency_powers(kMotor, displacement_m3_rev, speed_rev_s, dp_pa, flow_m3_s, torque_n_m, q_th_m3_s,
                           torque_th_n_m, p_hyd_w, p_mech_w);
}

PUMPLOSS_API int PUMPLOSS_CALL pumploss_flow_at_port(double q_meter_m3_s, double p_meter_pa, double t_meter_k,
                                                     double p_port_pa, double t_port_k, double rho_ref_kg_m3,
                                                     double t_ref_k, double alpha_per_k, double bulk_modulus_pa,
                                                     double* q_port_m3_s) {
  return call_value(q_port_m3_s, [&] {
    return pumploss::flow_at_port(q_meter_m3_s, p_meter_pa, t_meter_k, p_port_pa, t_port_k, rho_ref_kg_m3, t_ref_k,
                                  alpha_per_k, bulk_modulus_pa);
  });
}

PUMPLOSS_API int PUMPLOSS_CALL pumploss_flow_at_port_linear(double q_meter_m3_s, double p_meter_pa, double t_meter_k,
                                                            double p_port_pa, double t_port_k, double alpha_per_k,
                                                            double bulk_modulus_pa, double* q_port_m3_s) {
  return call_value(q_port_m3_s, [&] {
    return pumploss::flow_at_port_linear(q_meter_m3_s, p_meter_pa, t_meter_k, p_port_pa, t_port_k, alpha_per_k,
                                         bulk_modulus_pa);
  });
}

PUMPLOSS_API int PUMPLOSS_CALL pumploss_leakage_scale(double q_ref_m3_s, double dp_ref_pa, double mu_ref_pa_s,
                                                      double dp_pa, double mu_pa_s, double* q_m3_s) {
  return call_value(q_m3_s, [&] {
    return pumploss::leakage_scale(q_ref_m3_s, dp_ref_pa, mu_ref_pa_s, dp_pa, mu_pa_s);
  });
}

PUMPLOSS_API int PUMPLOSS_CALL pumploss_leakage_scale_batch(size_t n, const double* q_ref_m3_s, const double* dp_ref_pa,
                                                            const double* mu_ref_pa_s, const double* dp_pa,
                                                            const double* mu_pa_s, double* q_m3_s, int* status) {
  const bool in_ok =
      q_ref_m3_s != nullptr && dp_ref_pa != nullptr && mu_ref_pa_s != nullptr && dp_pa != nullptr && mu_pa_s != nullptr;
  return call_batch(n, {q_m3_s}, status, in_ok, [&](std::size_t i) {
    const auto r = pumploss::leakage_scale(q_ref_m3_s[i], dp_ref_pa[i], mu_ref_pa_s[i], dp_pa[i], mu_pa_s[i]);
    q_m3_s[i] = r.value;
    return r.st;
  });
}

PUMPLOSS_API int PUMPLOSS_CALL pumploss_leakage_scale_power_law(double q_ref_m3_s, double dp_ref_pa,
                                                                double mu_ref_pa_s, double dp_pa, double mu_pa_s,
                                                                double a, double b, double* q_m3_s) {
  return call_value(q_m3_s, [&] {
    return pumploss::leakage_scale_power_law(q_ref_m3_s, dp_ref_pa, mu_ref_pa_s, dp_pa, mu_pa_s, a, b);
  });
}

PUMPLOSS_API int PUMPLOSS_CALL pumploss_leakage_normalise(double q_m3_s, double dp_pa, double t_k, double dp_ref_pa,
                                                          double t_ref_k, double t1_k, double nu1_m2_s, double t2_k,
                                                          double nu2_m2_s, double alpha_per_k, double a, double b,
                                                          double* q_ref_m3_s) {
  return call_value(q_ref_m3_s, [&]() -> pumploss::result<double> {
    const auto line = pumploss::d341_fit(t1_k, nu1_m2_s, t2_k, nu2_m2_s);
    if (is_error(line.st)) return pumploss::detail::fail<double>(line.st);
    // The density's reference value cancels in the viscosity ratio; expand about t_ref_k.
    auto o = pumploss::typical_mineral_oil(line.value);
    o.alpha_per_k = alpha_per_k;
    o.t_ref_k = t_ref_k;
    o.barus_per_pa = 0.0;
    if (!pumploss::detail::all_finite(alpha_per_k, t_ref_k)) return pumploss::detail::fail<double>(pumploss::status::nonfinite);
    if (!(alpha_per_k >= 0.0)) return pumploss::detail::fail<double>(pumploss::status::domain);
    return pumploss::leakage_normalise(q_m3_s, dp_pa, t_k, dp_ref_pa, t_ref_k, o, a, b);
  });
}

PUMPLOSS_API int PUMPLOSS_CALL pumploss_leakage_series(double r_lam_pa_s_m3, double r_t_pa_s2_m6, double dp_pa,
                                                       double* q_m3_s) {
  return call_value(q_m3_s, [&] { return pumploss::leakage_series(r_lam_pa_s_m3, r_t_pa_s2_m6, dp_pa); });
}

PUMPLOSS_API int PUMPLOSS_CALL pumploss_throttle_temperature_rise(double dp_pa, double rho_kg_m3, double cp_j_kg_k,
                                                                  double* dt_k) {
  return call_value(dt_k, [&] { return pumploss::throttle_temperature_rise(dp_pa, rho_kg_m3, cp_j_kg_k); });
}

PUMPLOSS_API int PUMPLOSS_CALL pumploss_throttle_temperature_rise_isenthalpic(double dp_pa, double rho_kg_m3,
                                                                              double cp_j_kg_k, double alpha_per_k,
                                                                              double t_k, double* dt_k) {
  return call_value(dt_k, [&] {
    return pumploss::throttle_temperature_rise_isenthalpic(dp_pa, rho_kg_m3, cp_j_kg_k, alpha_per_k, t_k);
  });
}

PUMPLOSS_API int PUMPLOSS_CALL pumploss_heat_load(double input_power_w, double eta_t, double* heat_w) {
  return call_value(heat_w, [&] { return pumploss::heat_load(input_power_w, eta_t); });
}

PUMPLOSS_API int PUMPLOSS_CALL pumploss_case_drain_temperature(double t_inlet_k, double power_w, double drain_flow_m3_s,
                                                               double rho_kg_m3, double cp_j_kg_k, double* t_drain_k) {
  return call_value(t_drain_k, [&] {
    return pumploss::case_drain_temperature(t_inlet_k, power_w, drain_flow_m3_s, rho_kg_m3, cp_j_kg_k);
  });
}

PUMPLOSS_API int PUMPLOSS_CALL pumploss_case_drain_temperature_from_leakage(double t_inlet_k, double dp_pa,
                                                                            double drain_flow_m3_s,
                                                                            double extra_power_w, double rho_kg_m3,
                                                                            double cp_j_kg_k, double* t_drain_k) {
  return call_value(t_drain_k, [&] {
    return pumploss::case_drain_temperature_from_leakage(t_inlet_k, dp_pa, drain_flow_m3_s, extra_power_w, rho_kg_m3,
                                                         cp_j_kg_k);
  });
}

PUMPLOSS_API int PUMPLOSS_CALL pumploss_displacement_slope(size_t count, const double* speed_rev_s,
                                                           const double* flow_m3_s, double* v_m3_rev,
                                                           double* u_v_m3_rev) {
  return call({v_m3_rev, u_v_m3_rev}, [&] {
    const auto r = pumploss::displacement_slope(speed_rev_s, flow_m3_s, count);
    *v_m3_rev = r.v_m3_rev;
    *u_v_m3_rev = r.u_v_m3_rev;
    return r.st;
  });
}

PUMPLOSS_API int PUMPLOSS_CALL pumploss_displacement_intercept(size_t count, double speed_rev_s, const double* dp_pa,
                                                               const double* flow_m3_s, double* v_m3_rev,
                                                               double* u_v_m3_rev) {
  return call({v_m3_rev, u_v_m3_rev}, [&] {
    const auto r = pumploss::displacement_intercept(speed_rev_s, dp_pa, flow_m3_s, count);
    *v_m3_rev = r.v_m3_rev;
    *u_v_m3_rev = r.u_v_m3_rev;
    return r.st;
  });
}

PUMPLOSS_API int PUMPLOSS_CALL pumploss_displacement_two_step(size_t levels, size_t per_level,
                                                              const double* speed_rev_s, const double* dp_pa,
                                                              const double* flow_m3_s, double* v_m3_rev,
                                                              double* u_v_m3_rev) {
  return call({v_m3_rev, u_v_m3_rev}, [&] {
    const auto r = pumploss::displacement_two_step(speed_rev_s, dp_pa, flow_m3_s, levels, per_level);
    *v_m3_rev = r.v_m3_rev;
    *u_v_m3_rev = r.u_v_m3_rev;
    return r.st;
  });
}

PUMPLOSS_API int PUMPLOSS_CALL pumploss_leakage_fit_power_law(size_t count, const double* q_m3_s, const double* dp_pa,
                                                              const double* mu_pa_s, double* k, double* a, double* b,
                                                              double* cond) {
  return call({k, a, b, cond}, [&] {
    // never an empty workspace: its NULL data() would read as the caller's misuse at n = 0
    std::vector<double> work(pumploss::leakage_fit_workspace(count) + 1);
    const auto r = pumploss::leakage_fit_power_law(q_m3_s, dp_pa, mu_pa_s, count, work.data());
    *k = r.k;
    *a = r.a;
    *b = r.b;
    *cond = r.cond;
    return r.st;
  });
}

PUMPLOSS_API int PUMPLOSS_CALL pumploss_leakage_split(size_t count, const double* q_m3_s, const double* dp_pa,
                                                      const double* mu_pa_s, double* c_viscous_m3,
                                                      double* c_orifice_m3_s_pa05, double* c_constant_m3_s) {
  return call({c_viscous_m3, c_orifice_m3_s_pa05, c_constant_m3_s}, [&] {
    // never an empty workspace: its NULL data() would read as the caller's misuse at n = 0
    std::vector<double> work(pumploss::leakage_fit_workspace(count) + 1);
    const auto r = pumploss::leakage_split(q_m3_s, dp_pa, mu_pa_s, count, work.data());
    *c_viscous_m3 = r.c_viscous;
    *c_orifice_m3_s_pa05 = r.c_orifice;
    *c_constant_m3_s = r.c_constant;
    return r.st;
  });
}

}  // extern "C"
