/// @file drain_check.hpp
/// @brief Case drain line check and sizing: the drain flow over temperature (a constant part plus
/// a laminar part, or a table) with an optional destroke peak, the case pressure it causes from
/// cold start to hot against separate continuous and peak limits, the failing temperature ranges,
/// drain line sizing from a table of standard bores (what dominates, and when no bore can pass),
/// and the lowest start temperature.
///
/// All quantities SI. Results are engineering estimates: the pump maker's allowed case
/// pressures and instructions govern. Never block, cap or valve a case drain: case pressure over
/// the maker's limit blows the shaft seal.
#ifndef PUMPLOSS_DRAIN_CHECK_HPP
#define PUMPLOSS_DRAIN_CHECK_HPP

#include <array>
#include <cmath>
#include <cstddef>

#include "fluid.hpp"
#include "line.hpp"
#include "promote.hpp"
#include "scalar_traits.hpp"
#include "status.hpp"

namespace pumploss {

/// @name Drain flow over temperature
/// @{

/// Largest number of points of a drain flow table.
inline constexpr int drain_flow_max_points = 16;

/// The case drain flow of a pump over oil temperature, and an optional destroke peak.
///
/// Continuous flow: either a table of (temperature, flow), linearly interpolated, or
/// \f[ q(\theta) = q_c + q_{l,\mathrm{ref}} \frac{\mu(\theta_\mathrm{ref})}{\mu(\theta)} \f]
/// (a constant part such as the controller's consumption, plus laminar gap leakage that scales
/// with the inverse dynamic viscosity). Peak: a compensator destroking dumps its control volume
/// V into the case over a time t, adding \f$ q_\mathrm{peak} = V/t \f$ to the continuous flow.
/// Build it with drain_flow_parts(), drain_flow_table() and with_destroke_peak().
template <class T>
struct drain_flow {
  T constant_m3_s{};     ///< part independent of viscosity, m^3/s, >= 0
  T laminar_ref_m3_s{};  ///< laminar part at t_ref_k, m^3/s, >= 0
  T t_ref_k{};           ///< temperature at which laminar_ref_m3_s holds, K (> 0 when laminar_ref > 0)
  int n_table = 0;       ///< > 0: the flow is given by the table instead
  std::array<T, drain_flow_max_points> table_t_k{};     ///< table temperatures, K, increasing
  std::array<T, drain_flow_max_points> table_q_m3_s{};  ///< table flows, m^3/s, >= 0
  T peak_volume_m3{};    ///< destroke: control volume dumped into the case, m^3 (0: no peak)
  T peak_time_s{};       ///< time over which it is dumped, s (> 0 when peak_volume > 0)
};

/// Drain flow as a constant part plus a laminar part given at a reference temperature.
/// @param constant_m3_s part independent of viscosity, m^3/s (controller consumption)
/// @param laminar_ref_m3_s laminar leakage at t_ref_k, m^3/s
/// @param t_ref_k reference temperature, K
/// @return the model (checked when evaluated)
template <class T, detail::if_real<T> = 0>
inline drain_flow<T> drain_flow_parts(T constant_m3_s, T laminar_ref_m3_s, T t_ref_k) {
  drain_flow<T> f;
  f.constant_m3_s = constant_m3_s;
  f.laminar_ref_m3_s = laminar_ref_m3_s;
  f.t_ref_k = t_ref_k;
  return f;
}

/// Drain flow given at temperatures (e.g. from a normalisation model), interpolated linearly;
/// outside the table the end value is held and reported (status::extrapolated).
/// @param n number of points, 1 to drain_flow_max_points
/// @param t_k temperatures, K, increasing
/// @param q_m3_s flows, m^3/s, >= 0
/// @return the model; status::domain for a bad count, NULL data, non-increasing temperatures or
///         negative flows; status::nonfinite for NaN or inf.
template <class T>
inline result<drain_flow<T>> drain_flow_table(std::size_t n, const T* t_k, const T* q_m3_s) {
  drain_flow<T> f;
  if (n < 1 || n > static_cast<std::size_t>(drain_flow_max_points) || t_k == nullptr || q_m3_s == nullptr)
    return {f, status::domain};
  for (std::size_t i = 0; i < n; ++i) {
    if (!detail::all_finite(t_k[i], q_m3_s[i])) return {f, status::nonfinite};
    if (!(t_k[i] > T(0)) || !(q_m3_s[i] >= T(0)) || (i > 0 && !(t_k[i] > t_k[i - 1]))) return {f, status::domain};
    f.table_t_k[i] = t_k[i];
    f.table_q_m3_s[i] = q_m3_s[i];
  }
  f.n_table = static_cast<int>(n);  // at most drain_flow_max_points
  return {f, status::ok};
}

/// Add a destroke peak: the control volume dumped into the case over a time.
/// @param f the continuous drain flow
/// @param volume_m3 control volume, m^3, >= 0 (0: no peak)
/// @param time_s dump time, s, > 0
/// @return f with the peak (checked when evaluated)
template <class T>
inline drain_flow<T> with_destroke_peak(drain_flow<T> f, T volume_m3, T time_s) {
  f.peak_volume_m3 = volume_m3;
  f.peak_time_s = time_s;
  return f;
}

/// Continuous drain flow at an oil temperature (see drain_flow).
/// @param f the model
/// @param o the oil (dynamic viscosity at zero gauge pressure)
/// @param t_k oil temperature, K
/// @return q in m^3/s; status::extrapolated outside a table; status::domain for negative parts
///         or a bad reference temperature; oil errors.
/// @par Validity
/// Laminar gap leakage at a fixed pressure and gap temperature equal to the oil temperature.
/// @par Source
/// Laminar gap flow \f$ q \propto h^3 \Delta p/\mu \f$ (Hagen-Poiseuille between plates; F. M.
/// White, Fluid Mechanics, 7th ed., 2011, Sec. 4.10) and @ref theory_gap.
template <class T>
inline result<T> drain_flow_at(const drain_flow<T>& f, const oil<T>& o, T t_k) {
  if (!detail::finite(t_k)) return detail::fail<T>(status::nonfinite);
  if (!(t_k > T(0))) return detail::fail<T>(status::domain);
  if (f.n_table > 0) {
    if (f.n_table > drain_flow_max_points) return detail::fail<T>(status::domain);
    const auto n = static_cast<std::size_t>(f.n_table);
    if (t_k <= f.table_t_k[0]) return {f.table_q_m3_s[0], n > 1 && t_k < f.table_t_k[0] ? status::extrapolated : status::ok};
    if (t_k >= f.table_t_k[n - 1]) return {f.table_q_m3_s[n - 1], t_k > f.table_t_k[n - 1] ? status::extrapolated : status::ok};
    std::size_t i = 1;
    while (t_k > f.table_t_k[i]) ++i;
    const T w = (t_k - f.table_t_k[i - 1]) / (f.table_t_k[i] - f.table_t_k[i - 1]);
    return {f.table_q_m3_s[i - 1] + w * (f.table_q_m3_s[i] - f.table_q_m3_s[i - 1]), status::ok};
  }
  if (!detail::all_finite(f.constant_m3_s, f.laminar_ref_m3_s)) return detail::fail<T>(status::nonfinite);
  if (!(f.constant_m3_s >= T(0)) || !(f.laminar_ref_m3_s >= T(0))) return detail::fail<T>(status::domain);
  if (f.laminar_ref_m3_s == T(0)) return {f.constant_m3_s, status::ok};
  if (!detail::finite(f.t_ref_k)) return detail::fail<T>(status::nonfinite);
  if (!(f.t_ref_k > T(0))) return detail::fail<T>(status::domain);
  const auto mu_ref = oil_dynamic_viscosity(o, f.t_ref_k, T(0));
  const auto mu = oil_dynamic_viscosity(o, t_k, T(0));
  if (is_error(mu_ref.st) || is_error(mu.st)) return detail::fail<T>(is_error(mu.st) ? mu.st : mu_ref.st);
  return {f.constant_m3_s + f.laminar_ref_m3_s * mu_ref.value / mu.value, worst(mu.st, mu_ref.st)};
}

/// Destroke peak flow \f$ q_\mathrm{peak} = V/t \f$ added to the continuous drain flow.
/// @param f the model
/// @return q_peak in m^3/s (0 without a peak); status::domain for a negative volume or a
///         non-positive time with a volume.
/// @par Source
/// Definition (mean flow of a volume dumped over a time).
template <class T>
inline result<T> drain_peak_flow(const drain_flow<T>& f) {
  if (!detail::all_finite(f.peak_volume_m3, f.peak_time_s)) return detail::fail<T>(status::nonfinite);
  if (!(f.peak_volume_m3 >= T(0))) return detail::fail<T>(status::domain);
  if (f.peak_volume_m3 == T(0)) return {T(0), status::ok};
  if (!(f.peak_time_s > T(0))) return detail::fail<T>(status::domain);
  return {f.peak_volume_m3 / f.peak_time_s, status::ok};
}
/// @}

/// @name Case drain check
/// @{

/// Largest number of failing temperature ranges a summary holds (more are flagged).
inline constexpr int drain_max_ranges = 4;

/// Allowed case pressures and the tank pressure (one reference: gauge or absolute).
template <class T>
struct drain_limits {
  T p_tank_pa{};          ///< pressure in the tank at the line's outlet, Pa
  T p_allowed_pa{};       ///< the maker's allowed continuous case pressure, Pa
  T p_allowed_peak_pa{};  ///< the maker's allowed peak (intermittent) case pressure, Pa; used when
                          ///< the drain flow has a destroke peak (must then be given)
};

/// Result of the case drain check at one temperature.
template <class T>
struct [[nodiscard]] drain_point {
  T t_k;               ///< oil temperature, K
  T nu_m2_s;           ///< kinematic viscosity at t_k, m^2/s
  T case_pressure_pa;  ///< case pressure p_tank + line drop at the continuous drain flow, Pa
  T margin_pa;         ///< allowed continuous case pressure minus case pressure, Pa (>= 0 passes)
  bool pass;           ///< margin >= 0
  pumploss::status st; ///< status of the calculation at this temperature
  T q_m3_s;            ///< continuous drain flow at t_k, m^3/s
  T q_peak_m3_s;       ///< destroke peak flow added on top, m^3/s (0 without a peak)
  T case_pressure_peak_pa;  ///< case pressure at continuous + peak flow, Pa (= case_pressure_pa without a peak)
  T margin_peak_pa;    ///< allowed peak case pressure minus the peak case pressure, Pa (= margin_pa without a peak)
  bool pass_peak;      ///< margin_peak >= 0 (true without a peak)
  /// @return true when the status is exactly ok.
  bool ok() const noexcept { return st == pumploss::status::ok; }
  /// @return true when the results are usable (ok or a report such as regime).
  bool usable() const noexcept { return pumploss::is_usable(st); }
};

/// A temperature range, K.
template <class T>
struct drain_range {
  T from_k;  ///< lower end, K
  T to_k;    ///< upper end, K
};

/// Summary of a case drain check over a temperature range.
template <class T>
struct [[nodiscard]] drain_summary {
  bool pass;               ///< the continuous case pressure passes at every temperature checked
  T worst_margin_pa;       ///< smallest continuous margin, Pa
  T worst_t_k;             ///< temperature of the smallest margin, K
  pumploss::status st;     ///< worst status
  bool peak_checked;       ///< the drain flow has a destroke peak, checked against the peak limit
  bool pass_peak;          ///< the peak case pressure passes at every temperature (true when not checked)
  T worst_margin_peak_pa;  ///< smallest peak margin, Pa (= worst_margin_pa when not checked)
  T worst_peak_t_k;        ///< temperature of the smallest peak margin, K
  int n_fail;              ///< number of temperature ranges where the continuous check fails
  std::array<drain_range<T>, drain_max_ranges> fail;       ///< those ranges, ascending
  int n_fail_peak;         ///< number of ranges where the peak check fails
  std::array<drain_range<T>, drain_max_ranges> fail_peak;  ///< those ranges, ascending
  int n_fail_any;          ///< number of ranges where either check fails
  std::array<drain_range<T>, drain_max_ranges> fail_any;   ///< those ranges, ascending
  bool ranges_truncated;   ///< more than drain_max_ranges ranges of a kind (the last ones are missing)
  /// @return true when the status is exactly ok.
  bool ok() const noexcept { return st == pumploss::status::ok; }
  /// @return true when the results are usable (ok or a report such as regime).
  bool usable() const noexcept { return pumploss::is_usable(st); }
};

namespace detail {

/// The drain check at one temperature (bore override as line_pressure_drop()).
template <class T>
inline drain_point<T> drain_eval(const line<T>& l, const oil<T>& o, const drain_flow<T>& f,
                                 const drain_limits<T>& lim, T t_k, T d_override) {
  const T nan = scalar_traits<T>::nan();
  drain_point<T> p{t_k, nan, nan, nan, false, status::ok, nan, nan, nan, nan, false};
  const auto rho = oil_density_at(o, t_k, T(0));
  const auto mu = oil_dynamic_viscosity(o, t_k, T(0));
  const auto nu = oil_kinematic_viscosity(o, t_k);
  const auto q = drain_flow_at(f, o, t_k);
  const auto qp = drain_peak_flow(f);
  for (status s : {rho.st, mu.st, nu.st, q.st, qp.st})
    if (is_error(s)) { p.st = s; return p; }
  const auto r = line_pressure_drop(l.elements.data(), l.elements.size(), l.height_m, q.value, rho.value, mu.value,
                                    static_cast<T*>(nullptr), d_override);
  if (is_error(r.st)) { p.st = r.st; return p; }
  p.nu_m2_s = nu.value;
  p.q_m3_s = q.value;
  p.q_peak_m3_s = qp.value;
  p.case_pressure_pa = lim.p_tank_pa + r.dp_pa;
  p.margin_pa = lim.p_allowed_pa - p.case_pressure_pa;
  p.pass = p.margin_pa >= T(0);
  p.st = worst(r.st, worst(worst(rho.st, mu.st), worst(q.st, qp.st)));
  if (qp.value > T(0)) {
    const auto rp = line_pressure_drop(l.elements.data(), l.elements.size(), l.height_m, q.value + qp.value,
                                       rho.value, mu.value, static_cast<T*>(nullptr), d_override);
    if (is_error(rp.st)) { p.st = rp.st; return p; }
    p.case_pressure_peak_pa = lim.p_tank_pa + rp.dp_pa;
    p.margin_peak_pa = lim.p_allowed_peak_pa - p.case_pressure_peak_pa;
    p.st = worst(p.st, rp.st);
  } else {
    p.case_pressure_peak_pa = p.case_pressure_pa;
    p.margin_peak_pa = p.margin_pa;
  }
  p.pass_peak = qp.value > T(0) ? p.margin_peak_pa >= T(0) : true;
  return p;
}

/// Collects failing ranges along the temperature grid; a boundary between a passing and a
/// failing grid point is located by bisection on the margin (60 halvings or 1e-9 K).
template <class T>
struct fail_range_builder {
  int n = 0;
  std::array<drain_range<T>, drain_max_ranges> r{};
  bool truncated = false;
  bool open = false;

  /// margin(t) returns the margin at t (NaN on error: the grid point is used).
  template <class M>
  void step(bool first, bool pass_prev, bool pass_now, T t_prev, T t_now, M&& margin) {
    if (first) {
      if (!pass_now) begin(t_now);
      return;
    }
    if (pass_prev == pass_now) return;
    T lo = t_prev, hi = t_now;
    for (int it = 0; it < 60 && hi - lo > constant<T>(1e-9L, "0.000000001"); ++it) {
      const T mid = lo + (hi - lo) / 2;
      const T m = margin(mid);
      if (!finite(m)) break;
      if ((m >= T(0)) == pass_prev) lo = mid; else hi = mid;
    }
    const T b = lo + (hi - lo) / 2;
    if (pass_now) end(b); else begin(b);
  }
  void begin(T t) {
    open = true;
    if (n < drain_max_ranges) r[static_cast<std::size_t>(n)] = {t, t};
    else truncated = true;
  }
  void end(T t) {
    if (!open) return;
    open = false;
    if (n < drain_max_ranges) r[static_cast<std::size_t>(n)].to_k = t;
    ++n;
  }
  int count() const { return n < drain_max_ranges ? n : drain_max_ranges; }
};

/// The check over the grid (shared by drain_check() and the sizing).
template <class T>
inline drain_summary<T> drain_run(const line<T>& l, const oil<T>& o, const drain_flow<T>& f,
                                  const drain_limits<T>& lim, T t_cold_k, T t_max_k, int n_temps,
                                  drain_point<T>* points, T d_override) {
  const T nan = scalar_traits<T>::nan();
  drain_summary<T> sum{};
  sum.pass = false;
  sum.worst_margin_pa = sum.worst_t_k = sum.worst_margin_peak_pa = sum.worst_peak_t_k = nan;
  auto fail = [&](status s) {
    if (points != nullptr)
      for (int i = 0; i < n_temps && i < 1000; ++i)
        points[i] = drain_point<T>{nan, nan, nan, nan, false, s, nan, nan, nan, nan, false};
    sum.st = s;
    return sum;
  };
  if (!all_finite(t_cold_k, t_max_k, lim.p_tank_pa, lim.p_allowed_pa)) return fail(status::nonfinite);
  if (n_temps < 1 || n_temps > 1000 || !(t_cold_k > T(0)) || !(t_max_k >= t_cold_k)) return fail(status::domain);
  const auto qp = drain_peak_flow(f);
  if (is_error(qp.st)) return fail(qp.st);
  sum.peak_checked = qp.value > T(0);
  if (sum.peak_checked && !finite(lim.p_allowed_peak_pa)) return fail(status::nonfinite);
  sum.pass = sum.pass_peak = true;
  sum.st = status::ok;
  fail_range_builder<T> cont, peak, any;
  auto at = [&](T t) { return drain_eval(l, o, f, lim, t, d_override); };
  bool err = false;
  auto m_cont = [&](T t) { return at(t).margin_pa; };
  auto m_peak = [&](T t) { return at(t).margin_peak_pa; };
  auto m_any = [&](T t) {
    const auto p = at(t);
    return p.margin_pa < p.margin_peak_pa || !sum.peak_checked ? p.margin_pa : p.margin_peak_pa;
  };
  drain_point<T> prev{};
  for (int i = 0; i < n_temps && !err; ++i) {
    const T t = n_temps == 1 ? t_cold_k : t_cold_k + (t_max_k - t_cold_k) * T(i) / T(n_temps - 1);
    const auto p = at(t);
    if (is_error(p.st)) return fail(p.st);
    if (points != nullptr) points[i] = p;
    sum.pass = sum.pass && p.pass;
    sum.pass_peak = sum.pass_peak && p.pass_peak;
    if (i == 0 || p.margin_pa < sum.worst_margin_pa) {
      sum.worst_margin_pa = p.margin_pa;
      sum.worst_t_k = t;
    }
    if (i == 0 || p.margin_peak_pa < sum.worst_margin_peak_pa) {
      sum.worst_margin_peak_pa = p.margin_peak_pa;
      sum.worst_peak_t_k = t;
    }
    sum.st = worst(sum.st, p.st);
    cont.step(i == 0, prev.pass, p.pass, prev.t_k, t, m_cont);
    if (sum.peak_checked) peak.step(i == 0, prev.pass_peak, p.pass_peak, prev.t_k, t, m_peak);
    any.step(i == 0, prev.pass && prev.pass_peak, p.pass && p.pass_peak, prev.t_k, t, m_any);
    prev = p;
  }
  cont.end(t_max_k);
  peak.end(t_max_k);
  any.end(t_max_k);
  sum.n_fail = cont.count();
  sum.fail = cont.r;
  sum.n_fail_peak = peak.count();
  sum.fail_peak = peak.r;
  sum.n_fail_any = any.count();
  sum.fail_any = any.r;
  sum.ranges_truncated = cont.truncated || peak.truncated || any.truncated;
  return sum;
}

}  // namespace detail

/// Case drain check: case pressure at the pump over an oil temperature range, with the drain
/// flow over temperature and an optional destroke peak, against separate continuous and peak
/// limits.
///
/// \f[ p_3(\theta) = p_\mathrm{tank} + \Delta p_\mathrm{line}(q(\theta), \rho(\theta), \mu(\theta)),
///     \qquad p_{3,\mathrm{peak}}(\theta) = p_\mathrm{tank} + \Delta p_\mathrm{line}(q(\theta) + V/t, \ldots) \f]
/// evaluated at n temperatures equally spaced from cold start to maximum; the ends of each
/// failing temperature range are located between grid points by bisection on the margin.
/// @param l the drain line (from the case port to the tank)
/// @param o the oil
/// @param f drain flow over temperature and destroke peak (drain_flow)
/// @param lim tank pressure, allowed continuous and peak case pressures
/// @param t_cold_k cold-start temperature, K
/// @param t_max_k maximum oil temperature, K, >= t_cold_k
/// @param n_temps number of temperatures, 1 (t_cold_k only) to 1000
/// @param points receives n_temps results (may be NULL)
/// @return the summary with the failing ranges; status::domain for bad counts, ranges or flow
///         model; oil, flow and line errors (NaN outputs); the worst report of any element
///         (e.g. status::regime for a constant K in laminar flow).
/// @par Validity
/// As line_pressure_drop(); the drain flow is taken as independent of the case pressure; the
/// peak is a mean over the dump time (pressure spikes of the dump itself are not modelled).
/// Engineering estimate: the maker's case pressure limits and instructions govern.
/// @par Accuracy
/// As line_pressure_drop() and d341_viscosity(); range ends to 1e-9 K of the model.
/// @par Source
/// Darcy-Weisbach and K method as line_pressure_drop(); @ref theory_friction.
template <class T>
inline drain_summary<T> drain_check(const line<T>& l, const oil<T>& o, const drain_flow<T>& f,
                                    const drain_limits<T>& lim, T t_cold_k, T t_max_k, int n_temps,
                                    drain_point<T>* points) {
  return detail::drain_run(l, o, f, lim, t_cold_k, t_max_k, n_temps, points, T(0));
}

/// Case drain check at a constant drain flow and one limit (see the drain_flow overload).
/// @param l the drain line (from the case port to the tank)
/// @param o the oil
/// @param q_drain_m3_s drain flow, m^3/s, >= 0
/// @param t_cold_k cold-start temperature, K
/// @param t_max_k maximum oil temperature, K, >= t_cold_k
/// @param n_temps number of temperatures, 1 to 1000
/// @param p_tank_pa tank pressure at the outlet, Pa
/// @param p_allowed_pa the maker's allowed case pressure, Pa
/// @param points receives n_temps results (may be NULL)
/// @return as the drain_flow overload.
/// @par Validity
/// A constant drain flow overstates the hot flow and understates the cold one when the leakage
/// is laminar; prefer the drain_flow overload.
/// @par Accuracy
/// As the drain_flow overload.
/// @par Source
/// As the drain_flow overload.
template <class T>
inline drain_summary<T> drain_check(const line<T>& l, const oil<T>& o, T q_drain_m3_s, T t_cold_k, T t_max_k,
                                    int n_temps, T p_tank_pa, T p_allowed_pa, drain_point<T>* points) {
  const T nan = scalar_traits<T>::nan();
  if (!detail::finite(q_drain_m3_s) || !(q_drain_m3_s >= T(0))) {
    if (points != nullptr)
      for (int i = 0; i < n_temps && i < 1000; ++i)
        points[i] = drain_point<T>{nan, nan, nan, nan, false, status::domain, nan, nan, nan, nan, false};
    drain_summary<T> s{};
    s.worst_margin_pa = s.worst_t_k = s.worst_margin_peak_pa = s.worst_peak_t_k = nan;
    s.st = detail::finite(q_drain_m3_s) ? status::domain : status::nonfinite;
    return s;
  }
  drain_flow<T> f;
  f.constant_m3_s = q_drain_m3_s;
  return drain_check(l, o, f, drain_limits<T>{p_tank_pa, p_allowed_pa, p_allowed_pa}, t_cold_k, t_max_k, n_temps,
                     points);
}

/// Lowest start temperature of a pump with its drain line.
template <class T>
struct [[nodiscard]] drain_start {
  T t_start_k;      ///< lowest start temperature: the larger of t_line_k and t_viscosity_k, K
  T t_line_k;       ///< lowest temperature from which the line passes (continuous and peak) at every
                    ///< temperature up to t_max, K
  T t_viscosity_k;  ///< temperature at which the oil reaches the maker's largest start viscosity, K
                    ///< (may lie below t_cold; t_cold when no viscosity limit is given)
  pumploss::status st;  ///< status; status::out_of_validity when the line fails at t_max itself
  /// @return true when the status is exactly ok.
  bool ok() const noexcept { return st == pumploss::status::ok; }
  /// @return true when the results are usable (ok or a report such as regime).
  bool usable() const noexcept { return pumploss::is_usable(st); }
};

/// The lowest oil temperature at which the pump may be started: the line passes the continuous
/// and the peak case pressure limits from there up to t_max, and the oil is no thicker than
/// the maker's largest start viscosity (d341_temperature()).
/// @param l the drain line
/// @param o the oil
/// @param f drain flow over temperature and destroke peak
/// @param lim tank pressure and limits
/// @param t_cold_k lowest temperature considered, K
/// @param t_max_k highest temperature, K
/// @param n_temps grid for the check, 2 to 1000 (range ends located between grid points)
/// @param nu_max_start_m2_s the maker's largest start viscosity, m^2/s (0: none)
/// @return the temperatures; status::out_of_validity (NaN) when the line fails at t_max;
///         status::domain for bad input; check errors.
/// @par Validity
/// As drain_check(); a failing range narrower than the grid spacing can be missed.
/// @par Accuracy
/// As drain_check() and d341_temperature().
/// @par Source
/// drain_check() and ASTM D341 (d341_temperature()).
template <class T>
inline drain_start<T> drain_start_temperature(const line<T>& l, const oil<T>& o, const drain_flow<T>& f,
                                              const drain_limits<T>& lim, T t_cold_k, T t_max_k, int n_temps,
                                              T nu_max_start_m2_s) {
  const T nan = scalar_traits<T>::nan();
  if (!detail::finite(nu_max_start_m2_s)) return {nan, nan, nan, status::nonfinite};
  if (!(nu_max_start_m2_s >= T(0)) || n_temps < 2) return {nan, nan, nan, status::domain};
  const auto s = drain_check(l, o, f, lim, t_cold_k, t_max_k, n_temps, static_cast<drain_point<T>*>(nullptr));
  if (is_error(s.st)) return {nan, nan, nan, s.st};
  T t_visc = t_cold_k;
  status st = s.st;
  if (nu_max_start_m2_s > T(0)) {
    const auto tv = d341_temperature(o.viscosity, nu_max_start_m2_s);
    if (is_error(tv.st)) return {nan, nan, nan, tv.st};
    t_visc = tv.value;
  }
  T t_line = t_cold_k;
  if (s.n_fail_any > 0) {
    if (s.ranges_truncated) return {nan, nan, t_visc, status::out_of_validity};
    const auto& last = s.fail_any[static_cast<std::size_t>(s.n_fail_any - 1)];
    if (!(last.to_k < t_max_k)) return {nan, nan, t_visc, status::out_of_validity};
    t_line = last.to_k;
  }
  return {t_line > t_visc ? t_line : t_visc, t_line, t_visc, st};
}
/// @}

/// @name Standard bores and velocities
/// @{

/// Kind of a standard bore.
enum class bore_kind : int {
  tube = 1,  ///< metric hydraulic tube, OD x wall (inside diameter = OD - 2 wall)
  hose = 2   ///< hose by dash size (inside diameter = dash/16 inch, a trade convention)
};

/// A standard inside diameter.
struct standard_bore {
  const char* name;          ///< e.g. "tube 12x1" or "hose -8"
  double inside_diameter_m;  ///< inside diameter, m
  bore_kind kind;            ///< tube or hose
};

/// Common tube and hose bores, ascending by inside diameter. Hose: dash sizes -4 to -32, inside
/// diameter = dash/16 in (trade convention). Tube: metric outside diameter x wall pairs often
/// stocked for low-pressure return and drain lines (common practice, no source; check the
/// tube maker's pressure rating for other duties).
inline constexpr standard_bore standard_bores[] = {
    {"tube 6x1", 0.004, bore_kind::tube},        {"tube 8x1", 0.006, bore_kind::tube},
    {"hose -4", 0.00635, bore_kind::hose},       {"hose -5", 0.0079375, bore_kind::hose},
    {"tube 10x1", 0.008, bore_kind::tube},       {"hose -6", 0.009525, bore_kind::hose},
    {"tube 12x1", 0.010, bore_kind::tube},       {"tube 15x1.5", 0.012, bore_kind::tube},
    {"hose -8", 0.0127, bore_kind::hose},        {"tube 18x1.5", 0.015, bore_kind::tube},
    {"hose -10", 0.015875, bore_kind::hose},     {"tube 22x1.5", 0.019, bore_kind::tube},
    {"hose -12", 0.01905, bore_kind::hose},      {"tube 28x2", 0.024, bore_kind::tube},
    {"hose -16", 0.0254, bore_kind::hose},       {"tube 35x2", 0.031, bore_kind::tube},
    {"hose -20", 0.03175, bore_kind::hose},      {"tube 42x2", 0.038, bore_kind::tube},
    {"hose -24", 0.0381, bore_kind::hose},       {"hose -32", 0.0508, bore_kind::hose}};

/// Number of entries of standard_bores.
inline constexpr int standard_bore_count = static_cast<int>(sizeof(standard_bores) / sizeof(standard_bores[0]));

/// Service of a line, for the recommended velocity.
enum class line_service : int {
  suction = 0,   ///< pump suction
  pressure = 1,  ///< pressure line
  return_ = 2,   ///< return line
  drain = 3      ///< case drain line
};

/// A velocity range, m/s.
struct velocity_range {
  double min_m_s;  ///< lower end, m/s
  double max_m_s;  ///< upper end, m/s
};

/// Recommended mean line velocities (common practice, no source; guidance, never a limit):
/// suction 0.6-1.2 m/s, pressure 2-5.5 m/s, return 1.5-4 m/s, drain up to 1.5 m/s (the low end
/// of the return range).
/// @param s the service
/// @return the range in m/s
/// @par Source
/// Common practice, no source.
constexpr velocity_range recommended_velocity(line_service s) noexcept {
  switch (s) {
    case line_service::suction: return {0.6, 1.2};
    case line_service::pressure: return {2.0, 5.5};
    case line_service::return_: return {1.5, 4.0};
    case line_service::drain: return {0.0, 1.5};
  }
  return {0.0, 0.0};
}

/// @}

/// @name Drain line sizing
/// @{

/// Result of drain line sizing.
template <class T>
struct [[nodiscard]] drain_sizing {
  int bore_index;          ///< index into standard_bores, -1 when none passes
  T diameter_m;            ///< the chosen inside diameter, m
  T velocity_m_s;          ///< mean velocity at the largest continuous drain flow, m/s
  T worst_margin_pa;       ///< smallest continuous case pressure margin over the temperature range, Pa
  T worst_t_k;             ///< temperature of the smallest margin, K
  pumploss::status st;     ///< status; status::out_of_validity when no standard bore passes
  T worst_margin_peak_pa;  ///< smallest peak margin, Pa (= worst_margin_pa without a peak)
  int dominant_element;    ///< element with the largest drop at the worst temperature, with the chosen
                           ///< bore (or the largest bore tried when none passes); -1 none
  T dominant_dp_pa;        ///< its pressure drop, Pa
  T fixed_dp_pa;           ///< largest drop of what the sizing cannot change (components and the
                           ///< static height) over the range, at continuous flow, Pa
  T fixed_t_k;             ///< temperature of that largest fixed drop, K
  bool fixed_exceeds;      ///< the fixed elements alone exceed a limit somewhere: no bore can pass
  int fixed_dominant_element;  ///< the component with the largest drop there (-1: the static height)
  int n_fixed_alone = 0;   ///< how many fixed elements (the static height counted) each alone exceed a
                           ///< limit somewhere (drain_fixed_alone(); 0 unless fixed_exceeds)
  /// @return true when the status is exactly ok.
  bool ok() const noexcept { return st == pumploss::status::ok; }
  /// @return true when the results are usable (ok or a report such as regime).
  bool usable() const noexcept { return pumploss::is_usable(st); }
};

namespace detail {

/// Largest-drop element at one temperature (bore override as line_pressure_drop()).
template <class T>
inline void dominant_at(const line<T>& l, T q, T rho, T mu, T d_override, bool fixed_only, int& index, T& dp) {
  index = -1;
  dp = T(0);
  const auto n = l.elements.size();
  for (std::size_t i = 0; i < n; ++i) {
    if (fixed_only && has_bore(l.elements[i])) continue;
    const T d = element_bore(l.elements.data(), n, i, d_override);
    const auto r = element_dp(l.elements[i], q, rho, mu, d);
    if (!is_error(r.st) && (index < 0 || r.value > dp)) {
      index = static_cast<int>(i);
      dp = r.value;
    }
  }
}

}  // namespace detail

/// One element the sizing cannot change (a component, or the static height), taken alone.
template <class T>
struct [[nodiscard]] drain_fixed_element {
  int element;          ///< index in the line; -1 for the static height
  T dp_pa;              ///< its drop where it comes closest to (or goes furthest over) a limit, Pa
  T t_k;                ///< temperature of that drop, K
  T excess_pa;          ///< p_tank + dp_pa minus the limit there, Pa (> 0: it alone exceeds it)
  bool exceeds;         ///< excess_pa > 0: this element alone exceeds a limit, whatever the bore
  bool at_peak;         ///< that worst case is the peak flow against the peak limit
  pumploss::status st;  ///< status
  /// @return true when the status is exactly ok.
  bool ok() const noexcept { return st == pumploss::status::ok; }
  /// @return true when the results are usable (ok or a report such as regime).
  bool usable() const noexcept { return pumploss::is_usable(st); }
};

/// Whether one element the sizing cannot change (a lumped component, or the static height)
/// alone exceeds the continuous or the peak case pressure limit somewhere in the temperature
/// range, whatever bore the pipes and fittings get:
/// \f[ e = \max_{\theta,\ q \in \{q(\theta),\ q(\theta)+V/t\}} \left(p_\mathrm{tank} + \Delta p_i(q, \theta) - p_\mathrm{allowed}(q)\right) \f]
/// (the continuous flow against the continuous limit, the peak flow against the peak limit);
/// \f$ e > 0 \f$: it alone exceeds. When no bore can pass (drain_sizing::fixed_exceeds), calling
/// this for every component and for the static height names each culprit, not only the largest.
/// @param l the drain line
/// @param o the oil
/// @param f drain flow over temperature and destroke peak
/// @param lim tank pressure and limits
/// @param t_cold_k cold-start temperature, K
/// @param t_max_k maximum oil temperature, K, >= t_cold_k
/// @param n_temps number of temperatures checked, 2 to 1000
/// @param index element index of a component, or -1 for the static height \f$ \rho g \Delta z \f$
/// @return the worst case of that element; status::domain for an index out of range, a pipe or
///         fitting (its drop depends on the bore the sizing picks), bad counts or ranges;
///         oil, flow and element errors (NaN outputs).
/// @par Validity
/// As drain_check(); grid points only (the worst case between two points is not searched).
/// @par Accuracy
/// As line_pressure_drop().
/// @par Source
/// Definition; component curves and the static part as line_pressure_drop().
template <class T>
inline drain_fixed_element<T> drain_fixed_alone(const line<T>& l, const oil<T>& o, const drain_flow<T>& f,
                                                const drain_limits<T>& lim, T t_cold_k, T t_max_k, int n_temps,
                                                int index) {
  const T nan = scalar_traits<T>::nan();
  drain_fixed_element<T> r{index, nan, nan, nan, false, false, status::ok};
  auto fail = [&](status s) {
    r.dp_pa = r.t_k = r.excess_pa = nan;
    r.exceeds = r.at_peak = false;
    r.st = s;
    return r;
  };
  if (!detail::all_finite(t_cold_k, t_max_k, lim.p_tank_pa, lim.p_allowed_pa)) return fail(status::nonfinite);
  if (!(t_cold_k > T(0)) || !(t_max_k >= t_cold_k) || n_temps < 2 || n_temps > 1000 || index < -1 ||
      (index >= 0 && (static_cast<std::size_t>(index) >= l.elements.size() ||
                      detail::has_bore(l.elements[static_cast<std::size_t>(index)]))))
    return fail(status::domain);
  const auto qp = drain_peak_flow(f);
  if (is_error(qp.st)) return fail(qp.st);
  if (qp.value > T(0) && !detail::finite(lim.p_allowed_peak_pa)) return fail(status::nonfinite);
  for (int i = 0; i < n_temps; ++i) {
    const T t = t_cold_k + (t_max_k - t_cold_k) * T(i) / T(n_temps - 1);
    const auto rho = oil_density_at(o, t, T(0));
    const auto mu = oil_dynamic_viscosity(o, t, T(0));
    const auto q = drain_flow_at(f, o, t);
    for (status s : {rho.st, mu.st, q.st})
      if (is_error(s)) return fail(s);
    r.st = worst(r.st, worst(rho.st, worst(mu.st, q.st)));
    for (int peak = 0; peak < (qp.value > T(0) ? 2 : 1); ++peak) {
      T dp = rho.value * standard_gravity<T>() * l.height_m;
      if (index >= 0) {
        const auto e = detail::element_dp(l.elements[static_cast<std::size_t>(index)],
                                          q.value + (peak != 0 ? qp.value : T(0)), rho.value, mu.value, T(0));
        if (is_error(e.st)) return fail(e.st);
        r.st = worst(r.st, e.st);
        dp = e.value;
      }
      const T excess = lim.p_tank_pa + dp - (peak != 0 ? lim.p_allowed_peak_pa : lim.p_allowed_pa);
      if ((i == 0 && peak == 0) || excess > r.excess_pa) {
        r.excess_pa = excess;
        r.dp_pa = dp;
        r.t_k = t;
        r.at_peak = peak != 0;
      }
    }
  }
  r.exceeds = r.excess_pa > T(0);
  return r;
}

/// Smallest standard bore for a case drain line that passes the drain check (continuous and
/// peak limits) over the whole temperature range and keeps the mean velocity at the largest
/// continuous drain flow at or below v_max; with the element that dominates, and whether the
/// elements the sizing cannot change (components, static height) alone exceed a limit.
///
/// Every pipe and fitting of the line takes the trial bore (one bore throughout, as a drain
/// line should be); components keep their curves. Bores are tried in ascending order of
/// standard_bores, restricted to the kinds in kinds_mask.
/// @param l the drain line (its pipes' and fittings' bores are replaced by the trial bore)
/// @param o the oil
/// @param f drain flow over temperature and destroke peak
/// @param lim tank pressure and limits
/// @param t_cold_k cold-start temperature, K
/// @param t_max_k maximum oil temperature, K
/// @param n_temps number of temperatures checked, 2 to 1000
/// @param v_max_m_s largest recommended velocity, m/s, > 0
///        (recommended_velocity(line_service::drain).max_m_s = 1.5 m/s, common practice)
/// @param kinds_mask 1 tubes, 2 hoses, 3 both
/// @return the bore with margins, velocity and the dominant element; status::out_of_validity
///         when none passes (then fixed_exceeds says whether any bore could, and n_fixed_alone
///         how many fixed elements each alone exceed a limit: drain_fixed_alone() names them).
/// @par Validity
/// As drain_check(). Engineering estimate: the maker's limits govern.
/// @par Accuracy
/// As drain_check().
/// @par Source
/// drain_check(); bore table: hose dash sizes (trade convention), tube sizes common practice,
/// no source.
template <class T>
inline drain_sizing<T> size_drain_line(const line<T>& l, const oil<T>& o, const drain_flow<T>& f,
                                       const drain_limits<T>& lim, T t_cold_k, T t_max_k, int n_temps, T v_max_m_s,
                                       int kinds_mask) {
  const T nan = scalar_traits<T>::nan();
  auto fail = [&](status s) { return drain_sizing<T>{-1, nan, nan, nan, nan, s, nan, -1, nan, nan, nan, false, -1, 0}; };
  if (!detail::all_finite(t_cold_k, t_max_k, lim.p_tank_pa, lim.p_allowed_pa, v_max_m_s))
    return fail(status::nonfinite);
  if (!(t_cold_k > T(0)) || !(t_max_k >= t_cold_k) || n_temps < 2 || n_temps > 1000 || !(v_max_m_s > T(0)) ||
      (kinds_mask & 3) == 0)
    return fail(status::domain);
  // largest continuous flow and the fixed part over the range
  const auto qp = drain_peak_flow(f);
  if (is_error(qp.st)) return fail(qp.st);
  drain_sizing<T> z = fail(status::out_of_validity);
  T q_max = T(0);
  z.fixed_dp_pa = T(0);
  z.fixed_t_k = t_cold_k;
  for (int i = 0; i < n_temps; ++i) {
    const T t = t_cold_k + (t_max_k - t_cold_k) * T(i) / T(n_temps - 1);
    const auto rho = oil_density_at(o, t, T(0));
    const auto mu = oil_dynamic_viscosity(o, t, T(0));
    const auto q = drain_flow_at(f, o, t);
    for (status s : {rho.st, mu.st, q.st})
      if (is_error(s)) return fail(s);
    if (q.value > q_max) q_max = q.value;
    for (int peak = 0; peak < (qp.value > T(0) ? 2 : 1); ++peak) {
      const T qq = q.value + (peak != 0 ? qp.value : T(0));
      T fixed = rho.value * standard_gravity<T>() * l.height_m;
      for (const auto& e : l.elements) {
        if (detail::has_bore(e)) continue;
        const auto r = detail::element_dp(e, qq, rho.value, mu.value, T(0));
        if (is_error(r.st)) return fail(r.st);
        fixed += r.value;
      }
      const T limit = peak != 0 ? lim.p_allowed_peak_pa : lim.p_allowed_pa;
      if (lim.p_tank_pa + fixed > limit && !z.fixed_exceeds) {
        z.fixed_exceeds = true;
        z.fixed_dp_pa = fixed;
        z.fixed_t_k = t;
        T dp_max;
        detail::dominant_at(l, qq, rho.value, mu.value, T(0), true, z.fixed_dominant_element, dp_max);
        if (!(dp_max > rho.value * standard_gravity<T>() * l.height_m)) z.fixed_dominant_element = -1;
      }
      if (peak == 0 && !z.fixed_exceeds && (i == 0 || fixed > z.fixed_dp_pa)) {
        z.fixed_dp_pa = fixed;
        z.fixed_t_k = t;
      }
    }
  }
  if (z.fixed_exceeds) {  // each culprit alone, not only the largest
    for (int k = -1; k < static_cast<int>(l.elements.size()); ++k) {
      if (k >= 0 && detail::has_bore(l.elements[static_cast<std::size_t>(k)])) continue;
      const auto a = drain_fixed_alone(l, o, f, lim, t_cold_k, t_max_k, n_temps, k);
      if (a.usable() && a.exceeds) ++z.n_fixed_alone;
    }
  }
  int tried = -1;
  drain_summary<T> sum{};
  for (int b = 0; b < standard_bore_count; ++b) {
    const auto& bore = standard_bores[b];
    if ((kinds_mask & static_cast<int>(bore.kind)) == 0) continue;
    const T d = T(bore.inside_diameter_m);
    const T v = q_max / (detail::pi<T>() * d * d / 4);
    if (!(v <= v_max_m_s)) continue;
    const auto s = detail::drain_run(l, o, f, lim, t_cold_k, t_max_k, n_temps, static_cast<drain_point<T>*>(nullptr), d);
    if (s.st == status::domain) continue;  // e.g. roughness larger than this bore
    if (is_error(s.st)) return fail(s.st);
    tried = b;
    sum = s;
    if (s.pass && s.pass_peak) {
      z.bore_index = b;
      z.diameter_m = d;
      z.velocity_m_s = v;
      z.st = s.st;
      break;
    }
  }
  if (tried >= 0) {
    z.worst_margin_pa = sum.worst_margin_pa;
    z.worst_t_k = sum.worst_t_k;
    z.worst_margin_peak_pa = sum.worst_margin_peak_pa;
    const T t = sum.worst_t_k;
    const auto rho = oil_density_at(o, t, T(0));
    const auto mu = oil_dynamic_viscosity(o, t, T(0));
    const auto q = drain_flow_at(f, o, t);
    detail::dominant_at(l, q.value, rho.value, mu.value, T(standard_bores[tried].inside_diameter_m), false,
                        z.dominant_element, z.dominant_dp_pa);
  }
  return z;
}

/// Drain line sizing at a constant drain flow and one limit (see the drain_flow overload).
/// @param l the drain line
/// @param o the oil
/// @param q_drain_m3_s drain flow, m^3/s, > 0
/// @param t_cold_k cold-start temperature, K
/// @param t_max_k maximum oil temperature, K
/// @param n_temps number of temperatures checked, 2 to 1000
/// @param p_tank_pa tank pressure at the outlet, Pa
/// @param p_allowed_pa allowed case pressure, Pa
/// @param v_max_m_s largest recommended velocity, m/s, > 0
/// @param kinds_mask 1 tubes, 2 hoses, 3 both
/// @return as the drain_flow overload.
/// @par Validity
/// As the drain_flow overload.
/// @par Accuracy
/// As the drain_flow overload.
/// @par Source
/// As the drain_flow overload.
template <class T>
inline drain_sizing<T> size_drain_line(const line<T>& l, const oil<T>& o, T q_drain_m3_s, T t_cold_k, T t_max_k,
                                       int n_temps, T p_tank_pa, T p_allowed_pa, T v_max_m_s, int kinds_mask) {
  const T nan = scalar_traits<T>::nan();
  if (!detail::finite(q_drain_m3_s))
    return drain_sizing<T>{-1, nan, nan, nan, nan, status::nonfinite, nan, -1, nan, nan, nan, false, -1, 0};
  if (!(q_drain_m3_s > T(0)))
    return drain_sizing<T>{-1, nan, nan, nan, nan, status::domain, nan, -1, nan, nan, nan, false, -1, 0};
  drain_flow<T> f;
  f.constant_m3_s = q_drain_m3_s;
  return size_drain_line(l, o, f, drain_limits<T>{p_tank_pa, p_allowed_pa, p_allowed_pa}, t_cold_k, t_max_k, n_temps,
                         v_max_m_s, kinds_mask);
}
/// @}

// Mixed argument types (an int literal beside doubles), promoted as Boost.Math promotes:
// one line per public template whose parameters are all scalars (promote.hpp).
PUMPLOSS_PROMOTE(drain_flow_parts)

}  // namespace pumploss

#endif
