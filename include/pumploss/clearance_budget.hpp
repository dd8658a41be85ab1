/// @file clearance_budget.hpp
/// @brief The shared shape of the internal leakage budgets of gear and vane pumps
/// (gear_pump.hpp, vane_pump.hpp): three clearance paths, their flows, shares and the
/// volumetric efficiency they give, and the sensitivity of the total to each clearance.
///
/// SI: flow in m^3/s, pressure in Pa, lengths in m, speed in rev/s, temperature in K.
#ifndef PUMPLOSS_CLEARANCE_BUDGET_HPP
#define PUMPLOSS_CLEARANCE_BUDGET_HPP

#include <cmath>

#include "dual.hpp"
#include "fluid.hpp"
#include "gap.hpp"
#include "scalar_traits.hpp"
#include "status.hpp"

namespace pumploss {

/// Number of clearance paths of a gear or vane pump budget (and of clearances it is sensitive to).
inline constexpr int clearance_path_count = 3;

/// The operating point of a gear or vane pump budget.
template <class T>
struct rotary_operating_point {
  T outlet_pa;    ///< outlet gauge pressure, Pa
  T inlet_pa;     ///< inlet gauge pressure, Pa (<= outlet; negative below atmosphere)
  T speed_rev_s;  ///< shaft speed, rev/s (> 0)
  T t_k;          ///< oil temperature in the clearances, K
};

/// The internal leakage (slip) budget of a gear or vane pump at one operating point: every
/// path returns oil from the outlet to the inlet side.
template <class T>
struct [[nodiscard]] clearance_budget {
  T flow_m3_s[clearance_path_count];  ///< each path's leakage, m^3/s (a tip path may be negative: drag exceeds pressure flow)
  T share[clearance_path_count];      ///< each path's flow over the gross leakage sum |q_i| (in [-1, 1]; NaN when all are 0)
  T total_m3_s;                       ///< total internal leakage, m^3/s
  T ideal_flow_m3_s;                  ///< displacement times speed, m^3/s
  T volumetric_efficiency;            ///< 1 - total / (V n)
  T mu_pa_s;                          ///< dynamic viscosity used, Pa s
  T rho_kg_m3;                        ///< density used, kg/m^3
  T max_gap_reynolds;                 ///< largest gap Reynolds number of the paths
  pumploss::status st;                ///< ok; regime when a path is not laminar (Re > 2000); errors
  /// @return true when the status is exactly ok.
  bool ok() const noexcept { return st == pumploss::status::ok; }
  /// @return true when the results are usable (ok or a report such as regime).
  bool usable() const noexcept { return pumploss::is_usable(st); }
};

/// Sensitivity of the total leakage of a gear or vane budget to each clearance.
template <class T>
struct [[nodiscard]] clearance_sensitivity {
  T d_total_d_gap[clearance_path_count];  ///< dQ/dh for each clearance, (m^3/s)/m (0 when the path is absent)
  T elasticity[clearance_path_count];     ///< (h / Q) dQ/dh (3 for a purely pressure-driven laminar path)
  pumploss::status st;                    ///< status of the budget
  /// @return true when the status is exactly ok.
  bool ok() const noexcept { return st == pumploss::status::ok; }
  /// @return true when the results are usable (ok or a report such as regime).
  bool usable() const noexcept { return pumploss::is_usable(st); }
};

namespace detail {

template <class T>
inline clearance_budget<T> clearance_budget_fail(status s) {
  clearance_budget<T> b{};
  const T nan = scalar_traits<T>::nan();
  for (int i = 0; i < clearance_path_count; ++i) b.flow_m3_s[i] = b.share[i] = nan;
  b.total_m3_s = b.ideal_flow_m3_s = b.volumetric_efficiency = b.mu_pa_s = b.rho_kg_m3 = b.max_gap_reynolds = nan;
  b.st = s;
  return b;
}

/// Common start of a budget: checks the operating point, fills viscosity and density.
template <class T>
inline clearance_budget<T> clearance_budget_start(const oil<T>& o, const rotary_operating_point<T>& op, T& dp) {
  if (!all_finite(op.outlet_pa, op.inlet_pa, op.speed_rev_s, op.t_k)) return clearance_budget_fail<T>(status::nonfinite);
  dp = op.outlet_pa - op.inlet_pa;
  if (!(dp >= T(0)) || !(op.speed_rev_s > T(0)) || !(op.t_k > T(0))) return clearance_budget_fail<T>(status::domain);
  const auto mu = oil_dynamic_viscosity(o, op.t_k, T(0));
  if (is_error(mu.st)) return clearance_budget_fail<T>(mu.st);
  const auto rho = oil_density_at(o, op.t_k, op.inlet_pa > T(0) ? op.inlet_pa : T(0));
  if (is_error(rho.st)) return clearance_budget_fail<T>(rho.st);
  clearance_budget<T> b{};
  for (int i = 0; i < clearance_path_count; ++i) b.flow_m3_s[i] = T(0);
  b.mu_pa_s = mu.value;
  b.rho_kg_m3 = rho.value;
  b.max_gap_reynolds = T(0);
  b.st = worst(mu.st, rho.st);
  return b;
}

/// Record the Reynolds number 2 rho |q| / (mu w) of a slot of width w (hydraulic diameter 2h).
template <class T>
inline void clearance_reynolds(clearance_budget<T>& b, T q_m3_s, T width_m) {
  using std::abs;
  if (!(width_m > T(0))) return;
  const T re = T(2) * b.rho_kg_m3 * abs(q_m3_s) / (b.mu_pa_s * width_m);
  if (re > b.max_gap_reynolds) b.max_gap_reynolds = re;
}

/// A tip path: slots of width w, height h and sealing length L (tip lands in series) whose moving
/// wall drags oil at speed u towards the outlet, against the pressure flow; `count` such slots in
/// parallel. Records the flow and the drag Reynolds numbers.
template <class T>
inline status clearance_tip_path(clearance_budget<T>& b, int path, T count, T dp, T width_m, T height_m, T length_m,
                                 T u_m_s) {
  const auto q = gap_plates_flow(dp, b.mu_pa_s, width_m, height_m, length_m, -u_m_s);
  if (is_error(q.st)) return q.st;
  b.flow_m3_s[path] = count * q.value;
  clearance_reynolds(b, q.value, width_m);
  const T re_drag = b.rho_kg_m3 * u_m_s * height_m / b.mu_pa_s;  // rho U h / mu of the dragged film
  if (re_drag > b.max_gap_reynolds) b.max_gap_reynolds = re_drag;
  return status::ok;
}

/// A still slot path (no moving wall): `count` slots of width w, height h and length L in parallel.
template <class T>
inline status clearance_slot_path(clearance_budget<T>& b, int path, T count, T dp, T width_m, T height_m, T length_m) {
  const auto q = gap_plates_flow(dp, b.mu_pa_s, width_m, height_m, length_m, T(0));
  if (is_error(q.st)) return q.st;
  b.flow_m3_s[path] = count * q.value;
  clearance_reynolds(b, q.value, width_m);
  return status::ok;
}

/// One face of a radial path: inward flow over an arc from r_out to the drained r_in; records its
/// Reynolds number at the inner radius, where the flow is fastest.
template <class T>
inline result<T> clearance_face_flow(clearance_budget<T>& b, T dp, T r_in_m, T r_out_m, T height_m, T arc_rad) {
  const auto q = gap_radial_sector_flow(dp, b.mu_pa_s, r_in_m, r_out_m, height_m, arc_rad);
  if (!is_error(q.st)) clearance_reynolds(b, q.value, arc_rad * r_in_m);
  return q;
}

/// Totals, shares, volumetric efficiency and the laminar check at the end of a budget.
template <class T>
inline clearance_budget<T> clearance_budget_finish(clearance_budget<T> b, T displacement_m3_rev, T speed_rev_s) {
  using std::abs;
  b.total_m3_s = T(0);
  T gross = T(0);  // shares of the gross leakage: a tip path may be negative (drag above pressure flow)
  for (int i = 0; i < clearance_path_count; ++i) {
    b.total_m3_s += b.flow_m3_s[i];
    gross += abs(b.flow_m3_s[i]);
  }
  for (int i = 0; i < clearance_path_count; ++i)
    b.share[i] = gross > T(0) ? b.flow_m3_s[i] / gross : scalar_traits<T>::nan();
  b.ideal_flow_m3_s = displacement_m3_rev * speed_rev_s;
  b.volumetric_efficiency = T(1) - b.total_m3_s / b.ideal_flow_m3_s;
  if (b.max_gap_reynolds > T(2000)) b.st = worst(b.st, status::regime);
  if (!finite(b.total_m3_s) || !finite(b.volumetric_efficiency)) return clearance_budget_fail<T>(status::overflow);
  if (b.volumetric_efficiency < T(0)) b.st = worst(b.st, status::implausible);
  return b;
}

/// A whole budget: the description's check, the common start, the pump's paths
/// (`paths(budget&, dp) -> status`) and the common finish.
template <class T, class Paths>
inline clearance_budget<T> clearance_budget_of(status check, const oil<T>& o, const rotary_operating_point<T>& op,
                                               T displacement_m3_rev, Paths paths) {
  if (is_error(check)) return clearance_budget_fail<T>(check);
  T dp{};
  auto b = clearance_budget_start(o, op, dp);
  if (is_error(b.st)) return b;
  const status st = paths(b, dp);
  if (is_error(st)) return clearance_budget_fail<T>(st);
  return clearance_budget_finish(b, displacement_m3_rev, op.speed_rev_s);
}

/// Sensitivities from a budget evaluated in dual numbers seeded on the three clearances.
template <class T, class D>
inline clearance_sensitivity<T> clearance_sensitivity_from(const clearance_budget<D>& b,
                                                           const T (&gaps)[clearance_path_count]) {
  clearance_sensitivity<T> s{};
  s.st = b.st;
  for (int i = 0; i < clearance_path_count; ++i) {
    if (is_error(b.st)) {
      s.d_total_d_gap[i] = s.elasticity[i] = scalar_traits<T>::nan();
      continue;
    }
    s.d_total_d_gap[i] = b.total_m3_s.d[i];
    s.elasticity[i] = b.total_m3_s.val != T(0) ? gaps[i] * b.total_m3_s.d[i] / b.total_m3_s.val : T(0);
  }
  return s;
}

/// Sensitivities of a budget to the three clearances: `seeded` is the pump in dual numbers with
/// its clearances seeded in path order, `budget(pump, oil, op)` the budget template.
template <class T, class Pump, class Budget>
inline clearance_sensitivity<T> clearance_sensitivity_through(const Pump& seeded, const oil<T>& o,
                                                              const rotary_operating_point<T>& op,
                                                              const T (&gaps)[clearance_path_count], Budget budget) {
  using D = dual<T, clearance_path_count>;
  const rotary_operating_point<D> opd{D(op.outlet_pa), D(op.inlet_pa), D(op.speed_rev_s), D(op.t_k)};
  return clearance_sensitivity_from<T>(budget(seeded, oil_cast<D>(o), opd), gaps);
}

}  // namespace detail
}  // namespace pumploss

#endif
