// The oil table, the piston-pump pressure sweep and the case drain line check (workflows.hpp).
#include "pumploss/workflows.hpp"

#include <algorithm>
#include <cmath>

namespace pumploss {

oil_property_table tabulate_oil(const oil<double>& o, const std::vector<double>& t_k, const viscosity_limits& limits,
                                int iso_grade) {
  oil_property_table t;
  if (iso_grade != 0) {
    const auto g = iso_vg(iso_grade);
    if (!g.usable()) {
      t.st = g.st;
      return t;
    }
    t.nu40_m2_s = d341_viscosity(o.viscosity, 313.15).value;
    t.inside_grade = t.nu40_m2_s >= g.value.min_m2_s && t.nu40_m2_s <= g.value.max_m2_s;
  }
  const bool have_limits =
      !std::isnan(limits.min_m2_s) || !std::isnan(limits.max_m2_s) || !std::isnan(limits.max_start_m2_s);
  for (std::size_t i = 0; i < t_k.size(); ++i) {
    const double tk = t_k[i];
    const auto nu = oil_kinematic_viscosity(o, tk);
    const auto rho = oil_density_at(o, tk, 0.0);
    const auto mu = oil_dynamic_viscosity(o, tk, 0.0);
    if (!nu.usable() || !rho.usable() || !mu.usable()) {
      t.st = !nu.usable() ? nu.st : (!rho.usable() ? rho.st : mu.st);
      t.failed_row = i;
      return t;
    }
    oil_property_row r;
    r.t_k = tk;
    r.nu_m2_s = nu.value;
    r.mu_pa_s = mu.value;
    r.rho_kg_m3 = rho.value;
    r.st = nu.st != status::ok ? nu.st : rho.st;
    if (r.st != status::ok) t.st = worst(t.st, status::regime);
    if (have_limits) {
      r.verdict = viscosity_verdict::ok;
      if (nu.value > limits.max_start_m2_s) r.verdict = viscosity_verdict::too_thick_to_start;
      else if (nu.value > limits.max_m2_s) r.verdict = viscosity_verdict::start_only;
      else if (nu.value < limits.min_m2_s) r.verdict = viscosity_verdict::too_thin;
    }
    t.rows.push_back(r);
  }
  return t;
}

pump_sweep_result sweep_piston_pump(const piston_pump<double>& p, const oil<double>& o, const pump_sweep& s) {
  pump_sweep_result r;
  if (!(s.step_pa > 0) || !(s.to_pa > s.from_pa) || !(s.from_pa > s.case_pa) ||
      (s.to_pa - s.from_pa) / s.step_pa > 1000 || !std::isfinite(s.to_pa)) {
    r.st = status::domain;
    return r;
  }
  for (int i = 0;; ++i) {
    const double pout = s.from_pa + i * s.step_pa;
    if (pout > s.to_pa * (1 + 1e-12)) break;
    pump_operating_point<double> op{pout, s.case_pa, s.speed_rev_s, s.displacement_fraction, s.temperature_k};
    op.inlet_pa = s.inlet_pa;
    op.film_temperature_rise_k = s.film_temperature_rise_k;
    pump_sweep_point pt;
    pt.outlet_pa = pout;
    pt.budget = piston_pump_budget(p, o, op);
    if (is_error(pt.budget.st)) {
      r.st = pt.budget.st;
      r.failed_point = r.points.size();
      return r;
    }
    pt.sensitivity = piston_pump_sensitivity(p, o, op);
    pt.flow_loss = piston_pump_flow_loss(p, o, op);
    r.st = worst(r.st, pt.budget.st);
    r.max_gap_reynolds = std::max(r.max_gap_reynolds, pt.budget.max_gap_reynolds);
    r.points.push_back(pt);
  }
  if (s.with_reference) {
    auto& a = r.at_reference;
    a.budget = r.reference = piston_pump_budget(p, o, s.reference);
    a.flow_loss = piston_pump_flow_loss(p, o, s.reference);
    auto dh = s.reference;
    dh.mode = controller_mode::deadhead;
    a.deadhead = piston_pump_budget(p, o, dh);
    const double dp = s.reference.outlet_pa - s.reference.case_pa;
    a.balance_full = piston_pump_balance(p, piston_pump_kinematics(p, 1.0).tan_beta, dp);
    a.balance_zero = piston_pump_balance(p, 0.0, dp);
    for (const double u : s.u_gap_m) a.with_uncertainty = a.with_uncertainty || u > 0;
    if (a.with_uncertainty) a.uncertainty = piston_pump_budget_uncertainty(p, o, s.reference, s.u_gap_m);
  }
  return r;
}

drain_line_result check_drain_line(const drain_line_case& c) {
  drain_line_result r;
  const auto& l = c.drain_line;
  if (l.elements.empty() || c.n_temps < 1 || c.n_temps > 1000) {
    r.st = status::domain;
    return r;
  }
  const int n = c.n_temps;
  const double t0 = c.t_cold_k, t1 = c.t_max_k;
  r.points.resize(static_cast<std::size_t>(n));
  r.summary = drain_check(l, c.fluid, c.flow, c.limits, t0, t1, n, r.points.data());
  r.st = r.summary.st;
  if (is_error(r.st)) {
    r.points.clear();
    return r;
  }
  r.q_min_m3_s = r.q_max_m3_s = r.points.front().q_m3_s;
  for (const auto& p : r.points) {
    r.q_min_m3_s = std::min(r.q_min_m3_s, p.q_m3_s);
    r.q_max_m3_s = std::max(r.q_max_m3_s, p.q_m3_s);
  }
  for (const auto& e : l.elements)
    if (e.kind == line_element_kind::pipe) r.pipe_velocity_m_s.push_back(pipe_velocity(r.q_max_m3_s, e.diameter_m).value);

  // the lowest start temperature: the line passes from there up, and the oil meets the start limit
  r.start = drain_start_temperature(l, c.fluid, c.flow, c.limits, t0, t1, std::max(2, n), c.max_start_viscosity_m2_s);

  // share of each element at the coldest temperature (the worst case for a laminar line)
  std::vector<double> edp(l.elements.size());
  std::vector<status> est(l.elements.size(), status::ok);
  const auto rho0 = oil_density_at(c.fluid, t0, 0.0);
  const auto mu0 = oil_dynamic_viscosity(c.fluid, t0, 0.0);
  r.element_t_k = t0;
  r.element_q_m3_s = r.points.front().q_m3_s + r.points.front().q_peak_m3_s;
  const auto drop = line_pressure_drop(l.elements.data(), l.elements.size(), l.height_m, r.element_q_m3_s, rho0.value,
                                       mu0.value, edp.data(), 0.0, est.data());
  r.elements_st = drop.st;
  r.dp_static_pa = drop.dp_static_pa;
  r.dp_total_pa = drop.dp_pa;
  for (std::size_t k = 0; k < l.elements.size(); ++k) {
    drain_element_drop e;
    e.dp_pa = edp[k];
    e.share = drop.dp_pa > 0 ? edp[k] / drop.dp_pa : 0.0;
    e.st = est[k];
    e.constant_k_laminar = est[k] == status::regime && l.elements[k].kind == line_element_kind::fitting_k;
    r.elements.push_back(e);
  }

  if (c.size) {
    r.sized = true;
    r.sizing = size_drain_line(l, c.fluid, c.flow, c.limits, t0, t1, std::max(2, n), c.max_velocity_m_s, c.sizing_kinds);
    if (r.sizing.fixed_exceeds) {
      for (int k = -1; k < static_cast<int>(l.elements.size()); ++k)
        if (k < 0 || !detail::has_bore(l.elements[static_cast<std::size_t>(k)]))
          r.fixed_alone.push_back(drain_fixed_alone(l, c.fluid, c.flow, c.limits, t0, t1, std::max(2, n), k));
    } else if (r.sizing.bore_index >= 0 && !is_error(r.sizing.st)) {
      auto l2 = l;
      for (auto& e : l2.elements)
        if (detail::has_bore(e)) e.diameter_m = r.sizing.diameter_m;
      r.sized_points.resize(r.points.size());
      // the summary is in the sizing result already; each point carries its own status here
      static_cast<void>(drain_check(l2, c.fluid, c.flow, c.limits, t0, t1, n, r.sized_points.data()));
    }
  }
  return r;
}

}  // namespace pumploss
