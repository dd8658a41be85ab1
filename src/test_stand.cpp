// Test-stand data reduction (test_stand.hpp): the steps of the header core in the order of a
// test report, with every refusal and report as a message naming the reading or setting.
#include "pumploss/test_stand.hpp"

#include <algorithm>
#include <cmath>
#include <cstdio>
#include <limits>
#include <utility>

namespace pumploss {

namespace {

using msg = test_stand_message;
constexpr std::size_t no_row = msg::no_row;

// Level index of each value: sorted values closer than 3 % of the span to the previous one
// belong to the same level (set-points of a test grid). Returns the level of every value and
// the number of levels.
std::pair<std::vector<std::size_t>, std::size_t> level_of(const std::vector<double>& v) {
  std::vector<std::size_t> order(v.size());
  for (std::size_t i = 0; i < v.size(); ++i) order[i] = i;
  std::sort(order.begin(), order.end(), [&](std::size_t a, std::size_t b) { return v[a] < v[b]; });
  const double tol = v.empty() ? 0.0 : 0.03 * (v[order.back()] - v[order.front()]);
  std::vector<std::size_t> lev(v.size());
  std::size_t k = 0;
  for (std::size_t j = 0; j < order.size(); ++j) {
    if (j > 0 && v[order[j]] - v[order[j - 1]] > tol) ++k;
    lev[order[j]] = k;
  }
  return {lev, v.empty() ? 0 : k + 1};
}

const char* temperature_column(viscosity_temperature t) {
  switch (t) {
    case viscosity_temperature::inlet: return "inlet temperature";
    case viscosity_temperature::outlet: return "outlet temperature";
    case viscosity_temperature::drain: return "drain temperature";
  }
  return "?";
}

const std::vector<double>& temperatures(const test_stand_readings& r, viscosity_temperature t) {
  switch (t) {
    case viscosity_temperature::inlet: return r.inlet_temperature_k;
    case viscosity_temperature::outlet: return r.outlet_temperature_k;
    case viscosity_temperature::drain: break;
  }
  return r.drain_temperature_k;
}

std::string sentence(status s) { return status_message(static_cast<int>(s)); }

// The run: messages and the worst status so far.
struct run {
  test_stand_result& res;
  // Record an error; returns the result so the caller can `return r.fail(...)`.
  test_stand_result& fail(status s, std::size_t row, std::string column, std::string setting, std::string text) {
    res.st = is_error(s) ? s : status::domain;
    res.messages.push_back({res.st, row, std::move(column), std::move(setting), std::move(text), false});
    return res;
  }
  void report(status s, std::string text) {
    res.st = worst(res.st, s);
    res.messages.push_back({s, no_row, {}, {}, std::move(text), false});
  }
};

struct column_ref {
  const char* name;
  const std::vector<double>* v;
  bool required;
};

// The readings of a column by its name ("outlet flow" and "inlet flow" both name the flow).
const std::vector<double>* column_of(const test_stand_readings& d, const std::string& name) {
  const std::pair<const char*, const std::vector<double>*> cols[] = {
      {"speed", &d.speed_rev_s},
      {"inlet pressure", &d.inlet_pressure_pa},
      {"outlet pressure", &d.outlet_pressure_pa},
      {"outlet flow", &d.flow_m3_s},
      {"inlet flow", &d.flow_m3_s},
      {"torque", &d.torque_n_m},
      {"drain flow", &d.drain_flow_m3_s},
      {"inlet temperature", &d.inlet_temperature_k},
      {"outlet temperature", &d.outlet_temperature_k},
      {"drain temperature", &d.drain_temperature_k},
      {"meter temperature", &d.meter_temperature_k},
      {"case pressure", &d.case_pressure_pa},
  };
  for (const auto& c : cols)
    if (name == c.first) return c.second;
  return nullptr;
}

// Check the setup's own values (a program's reader checks them too; an embedder may not).
bool setup_ok(const test_stand_setup& s, run& r) {
  auto bad = [&](const char* setting, const char* text) {
    r.fail(status::domain, no_row, {}, setting, text);
    return false;
  };
  if (!(s.nominal_displacement_m3_rev > 0 && std::isfinite(s.nominal_displacement_m3_rev)))
    return bad("nominal_displacement_m3_rev", "the nominal displacement must be above zero");
  if (s.kind != machine::pump && s.kind != machine::motor) return bad("kind", "the machine must be a pump or a motor");
  for (const auto* ins : {&s.speed, &s.pressure, &s.flow, &s.torque})
    if (!(ins->reading_fraction >= 0 && ins->reading_fraction < 0.5 && ins->absolute >= 0 &&
          std::isfinite(ins->absolute)))
      return bad("instruments", "instrument limits must be finite and not negative (reading part below 50 %)");
  if (!s.meter_at_port && !(s.meter_pressure_pa > -1e5 && s.meter_pressure_pa < 1e8))
    return bad("meter_pressure_pa", "the flow meter's pressure must be a gauge pressure between -1 bar and 1000 bar");
  if (!(s.map_speed_lo_rev_s >= 0 && s.map_speed_hi_rev_s > s.map_speed_lo_rev_s && std::isfinite(s.map_speed_hi_rev_s)))
    return bad("map_speed_lo_rev_s", "the map's speeds must be [low, high] with 0 <= low < high");
  if (!(s.map_dp_lo_pa >= 0 && s.map_dp_hi_pa > s.map_dp_lo_pa && std::isfinite(s.map_dp_hi_pa)))
    return bad("map_dp_lo_pa", "the map's pressures must be [low, high] with 0 <= low < high");
  if (s.map_speeds < 2 || s.map_pressures < 2 || s.map_speeds > 10000 || s.map_pressures > 10000)
    return bad("map_speeds", "the map needs 2 to 10000 speeds and pressures");
  return true;
}

// Lengths and ranges of the readings, in the order a reader of the file would meet them.
bool readings_ok(const test_stand_setup& s, const test_stand_readings& d, run& r) {
  const bool pump = s.kind == machine::pump;
  const char* flow_col = pump ? "outlet flow" : "inlet flow";
  const std::size_t n = d.speed_rev_s.size();
  const column_ref cols[] = {
      {"speed", &d.speed_rev_s, true},
      {"inlet pressure", &d.inlet_pressure_pa, true},
      {"outlet pressure", &d.outlet_pressure_pa, true},
      {flow_col, &d.flow_m3_s, true},
      {"torque", &d.torque_n_m, true},
      {"drain flow", &d.drain_flow_m3_s, true},
      {"inlet temperature", &d.inlet_temperature_k, true},
      {"outlet temperature", &d.outlet_temperature_k, false},
      {"drain temperature", &d.drain_temperature_k, false},
      {"case pressure", &d.case_pressure_pa, false},
      {"meter temperature", &d.meter_temperature_k, false},
  };
  if (n == 0) return r.fail(status::insufficient_data, no_row, "speed", {}, "no readings"), false;
  for (const auto& c : cols) {
    if (c.v->empty() && c.required)
      return r.fail(status::insufficient_data, no_row, c.name, {},
                    std::string("missing column '") + c.name + "' (the " + (pump ? "pump" : "motor") + "'s " +
                        (c.name == flow_col ? (pump ? "outlet flow" : "inlet flow") : c.name) + ")"),
             false;
    if (!c.v->empty() && c.v->size() != n)
      return r.fail(status::misuse, no_row, c.name, {},
                    std::string("column '") + c.name + "' has " + std::to_string(c.v->size()) +
                        " readings, 'speed' has " + std::to_string(n)),
             false;
  }
  struct range {
    const char* name;
    const std::vector<double>* v;
    double lo, hi;
    const char* what;
  };
  const char* temp = "is not an oil temperature between -50 and 200 degC";
  const range ranges[] = {
      {"speed", &d.speed_rev_s, 1e-3, 1e3, "is not a speed above zero (and below 60000 rpm)"},
      {flow_col, &d.flow_m3_s, 0.0, 1.0, "is not a flow between zero and 60000 L/min"},
      {"drain flow", &d.drain_flow_m3_s, 0.0, 1.0, "is not a flow between zero and 60000 L/min"},
      {"torque", &d.torque_n_m, 0.0, 1e6, "is not a torque between zero and 1e6 N.m"},
      {"inlet temperature", &d.inlet_temperature_k, 223.15, 473.15, temp},
      {"outlet temperature", &d.outlet_temperature_k, 223.15, 473.15, temp},
      {"drain temperature", &d.drain_temperature_k, 223.15, 473.15, temp},
      {"meter temperature", &d.meter_temperature_k, 223.15, 473.15, temp},
      {"inlet pressure", &d.inlet_pressure_pa, -1e5, 1e9, "is not a gauge pressure between -1 and 10000 bar"},
      {"outlet pressure", &d.outlet_pressure_pa, -1e5, 1e9, "is not a gauge pressure between -1 and 10000 bar"},
      {"case pressure", &d.case_pressure_pa, -1e5, 1e9, "is not a gauge pressure between -1 and 10000 bar"},
  };
  for (const auto& c : ranges)
    for (std::size_t i = 0; i < c.v->size(); ++i)
      if (!((*c.v)[i] >= c.lo && (*c.v)[i] <= c.hi)) {
        r.fail(status::domain, i, c.name, {}, c.what);
        r.res.messages.back().follows_value = true;
        return false;
      }
  const auto& p1 = d.inlet_pressure_pa;
  const auto& p2 = d.outlet_pressure_pa;
  for (std::size_t i = 0; i < n; ++i)
    if (pump ? !(p2[i] > p1[i]) : !(p1[i] > p2[i]))
      return r.fail(status::domain, i, "outlet pressure", {},
                    pump ? "a pump's outlet pressure must lie above its inlet pressure"
                         : "a motor's outlet pressure must lie below its inlet pressure"),
             false;
  const char* tvisc = temperature_column(s.viscosity_at);
  if (temperatures(d, s.viscosity_at).empty())
    return r.fail(status::insufficient_data, no_row, tvisc, "viscosity_at",
                  std::string("the viscosity is taken at the ") + tvisc + ", but there are no '" + tvisc + "' readings"),
           false;
  if (!s.meter_at_port) {
    const char* tport = pump ? "outlet temperature" : "inlet temperature";
    if (d.meter_temperature_k.empty())
      return r.fail(status::insufficient_data, no_row, "meter temperature", "meter_at_port",
                    "a flow meter in the return line needs the 'meter temperature' readings"),
             false;
    if ((pump ? d.outlet_temperature_k : d.inlet_temperature_k).empty())
      return r.fail(status::insufficient_data, no_row, tport, "meter_at_port",
                    std::string("a flow meter in the return line needs the '") + tport +
                        "' readings (the port the flow is corrected to)"),
             false;
  }
  return true;
}

}  // namespace

double instrument_uncertainty(const instrument_limits& ins, double reading) {
  const auto dist = ins.rectangular ? uncertainty_distribution::rectangular : uncertainty_distribution::standard;
  const auto a = standard_uncertainty(ins.absolute, uncertainty_basis::absolute, dist, reading);
  const auto b = standard_uncertainty(ins.reading_fraction * 100.0, uncertainty_basis::percent_of_reading, dist, reading);
  return a.value + b.value;
}

std::string describe(const test_stand_message& m, const test_stand_readings& readings) {
  std::string out;
  if (!m.setting.empty()) out += "setting " + m.setting + ": ";
  if (m.row != no_row) out += "reading " + std::to_string(m.row + 1) + (m.column.empty() ? ": " : ", ");
  if (!m.column.empty()) {
    out += m.column;
    const auto* v = column_of(readings, m.column);
    if (m.follows_value && m.row != no_row && v != nullptr && m.row < v->size()) {
      char buf[48];
      std::snprintf(buf, sizeof buf, " %.6g", (*v)[m.row]);
      out += buf;
      return out + " (SI) " + m.text;
    }
    out += ": ";
  }
  return out + m.text;
}

const char* displacement_choice_name(displacement_choice c) noexcept {
  switch (c) {
    case displacement_choice::slope: return "slope";
    case displacement_choice::intercept: return "intercept";
    case displacement_choice::two_step: return "two-step";
    case displacement_choice::nominal: return "nominal";
  }
  return "unknown";
}

const char* viscosity_temperature_name(viscosity_temperature t) noexcept {
  switch (t) {
    case viscosity_temperature::inlet: return "inlet";
    case viscosity_temperature::outlet: return "outlet";
    case viscosity_temperature::drain: return "drain";
  }
  return "unknown";
}

const char* loss_model_name(loss_model_kind k) noexcept {
  return k == loss_model_kind::wilson ? "Wilson" : "Schloesser";
}

test_stand_result reduce_test_stand(const test_stand_setup& setup, const test_stand_readings& d) {
  test_stand_result res;
  run r{res};
  if (!setup_ok(setup, r) || !readings_ok(setup, d, r)) return res;

  const bool pump = setup.kind == machine::pump;
  const char* flow_col = pump ? "outlet flow" : "inlet flow";
  const char* tvisc = temperature_column(setup.viscosity_at);
  const auto& t_visc = temperatures(d, setup.viscosity_at);
  const auto& oil = setup.fluid;
  const auto& p1 = d.inlet_pressure_pa;
  const auto& p2 = d.outlet_pressure_pa;
  const std::size_t n = d.speed_rev_s.size();
  const auto& speed = d.speed_rev_s;
  const auto& torque = d.torque_n_m;
  const auto& q_read = d.flow_m3_s;

  // ---- flow at the port and viscosity in the gaps
  std::vector<double> dp(n), q(n), mu(n);
  bool regime_flow = false;
  res.flow_corrected = !setup.meter_at_port;
  for (std::size_t i = 0; i < n; ++i) {
    dp[i] = pump ? p2[i] - p1[i] : p1[i] - p2[i];
    const auto m = oil_dynamic_viscosity(oil, t_visc[i], 0.0);
    if (!m.usable()) return r.fail(m.st, i, tvisc, {}, "no oil viscosity at this temperature: " + sentence(m.st));
    mu[i] = m.value;
    if (setup.meter_at_port) {
      q[i] = q_read[i];
      continue;
    }
    const double p_port = pump ? p2[i] : p1[i];
    const double t_port = pump ? d.outlet_temperature_k[i] : d.inlet_temperature_k[i];
    const auto f = flow_at_port(q_read[i], setup.meter_pressure_pa, d.meter_temperature_k[i], p_port, t_port,
                                oil.rho_ref_kg_m3, oil.t_ref_k, oil.alpha_per_k, oil.bulk_modulus_pa);
    if (!f.usable())
      return r.fail(f.st, i, flow_col, {}, "cannot correct the flow to port conditions: " + sentence(f.st));
    if (f.st != status::ok) regime_flow = true;
    q[i] = f.value;
  }

  // ---- derived displacement by the three estimators
  const auto [plev, np] = level_of(dp);
  const auto [slev, ns] = level_of(speed);
  res.pressure_levels = np;
  res.speed_levels = ns;
  {  // A: slope of flow over speed at the lowest pressure level
    std::vector<double> xs, ys;
    for (std::size_t i = 0; i < n; ++i)
      if (plev[i] == 0) {
        xs.push_back(speed[i]);
        ys.push_back(q[i]);
      }
    res.estimators[0] = displacement_slope(xs.data(), ys.data(), xs.size());
  }
  {  // B: zero-pressure intercept at the highest speed level
    std::vector<double> xs, ys;
    double nsum = 0;
    for (std::size_t i = 0; i < n; ++i)
      if (slev[i] == ns - 1) {
        xs.push_back(dp[i]);
        ys.push_back(q[i]);
        nsum += speed[i];
      }
    const double nmean = xs.empty() ? 0.0 : nsum / static_cast<double>(xs.size());
    res.estimators[1] = displacement_intercept(nmean, xs.data(), ys.data(), xs.size());
  }
  {  // C: two-step over the grid, every pressure level with the same number of speeds
    std::vector<std::vector<std::size_t>> by_level(np);
    for (std::size_t i = 0; i < n; ++i) by_level[plev[i]].push_back(i);
    const std::size_t per = by_level.empty() ? 0 : by_level[0].size();
    bool grid = per > 0;
    for (const auto& l : by_level) grid = grid && l.size() == per;
    if (grid) {
      std::vector<double> xs, ps, ys;
      for (const auto& l : by_level)
        for (const std::size_t i : l) {
          xs.push_back(speed[i]);
          ps.push_back(dp[i]);
          ys.push_back(q[i]);
        }
      res.estimators[2] = displacement_two_step(xs.data(), ps.data(), ys.data(), np, per);
    } else {
      const double nan = std::numeric_limits<double>::quiet_NaN();
      res.estimators[2] = {nan, nan, nan, nan, nan, n, displacement_estimator::two_step, status::insufficient_data};
    }
  }
  res.displacement_used = setup.displacement;
  res.displacement_m3_rev = setup.nominal_displacement_m3_rev;
  res.u_displacement_m3_rev = 0.0;
  if (setup.displacement != displacement_choice::nominal) {
    const auto& e = res.estimators[static_cast<std::size_t>(setup.displacement)];
    if (!is_usable(e.st))
      return r.fail(e.st, no_row, {}, "displacement",
                    std::string("the estimator '") + displacement_choice_name(setup.displacement) +
                        "' found no displacement in these readings: " + sentence(e.st) +
                        " (choose another estimator or the nominal displacement)");
    res.displacement_m3_rev = e.v_m3_rev;
    res.u_displacement_m3_rev = e.u_v_m3_rev;
  }
  const double v_used = res.displacement_m3_rev, u_v_used = res.u_displacement_m3_rev;

  // ---- efficiencies with GUM uncertainty per point, and the drain table
  bool implausible = false;
  res.points.resize(n);
  res.drain.resize(n);
  for (std::size_t i = 0; i < n; ++i) {
    const double u_dp = pressure_difference_uncertainty(instrument_uncertainty(setup.pressure, p1[i]),
                                                        instrument_uncertainty(setup.pressure, p2[i]), 0.0)
                            .value;
    const efficiency_inputs<double> x{v_used, speed[i], dp[i], q[i], torque[i], u_v_used,
                                      instrument_uncertainty(setup.speed, speed[i]), u_dp,
                                      instrument_uncertainty(setup.flow, q_read[i]),
                                      instrument_uncertainty(setup.torque, torque[i]), 0.0};
    const auto g = efficiency_gum(setup.kind, x);
    if (is_error(g.st)) return r.fail(g.st, i, "speed", {}, "no efficiencies for this point: " + sentence(g.st));
    if (g.st == status::implausible) implausible = true;
    auto& pt = res.points[i];
    pt.speed_rev_s = speed[i];
    pt.dp_pa = dp[i];
    pt.flow_m3_s = q[i];
    pt.torque_n_m = torque[i];
    pt.mu_pa_s = mu[i];
    pt.eta = g;
    pt.speed_level = slev[i];
    pt.pressure_level = plev[i];
    pt.st = g.st;
    const double q_th = v_used * speed[i];
    const double loss = pump ? q_th - q[i] : q[i] - q_th;
    auto& dr = res.drain[i];
    dr.drain_flow_m3_s = d.drain_flow_m3_s[i];
    dr.fraction = d.drain_flow_m3_s[i] / q_th;
    dr.loss_share = loss > 0 ? d.drain_flow_m3_s[i] / loss : std::numeric_limits<double>::quiet_NaN();
  }

  // ---- loss models
  const double rho = oil_density_at(oil, t_visc[n / 2], 0.0).value;
  res.fit_density_kg_m3 = rho;
  std::vector<loss_model_kind> kinds = {loss_model_kind::wilson};
  if (setup.fit_schloesser) kinds.push_back(loss_model_kind::schloesser);
  std::vector<double> work(loss_fit_workspace(n));
  bool ill = false;
  for (const auto k : kinds) {
    std::vector<double> rq(n), rt(n);
    const auto m = fit_loss_model(setup.kind, k, v_used, rho, dp.data(), speed.data(), mu.data(), q.data(),
                                  torque.data(), n, work.data(), rq.data(), rt.data());
    if (is_error(m.st))
      return r.fail(m.st, no_row, {}, {},
                    std::string("the ") + loss_model_name(k) + " loss model cannot be fitted to these points: " +
                        sentence(m.st));
    if (m.st == status::ill_conditioned) ill = true;
    if (res.models.empty())
      for (std::size_t i = 0; i < n; ++i) {
        res.points[i].flow_residual_m3_s = rq[i];
        res.points[i].torque_residual_n_m = rt[i];
      }
    res.models.push_back(m);
  }

  // ---- efficiency map from the fitted model(s)
  const auto mu_map = oil_dynamic_viscosity(oil, setup.map_temperature_k, 0.0);
  if (!mu_map.usable())
    return r.fail(mu_map.st, no_row, {}, "map_temperature_k",
                  "no oil viscosity at the map temperature: " + sentence(mu_map.st));
  res.map_mu_pa_s = mu_map.value;
  const std::size_t nx = setup.map_speeds, ny = setup.map_pressures;
  auto& gs = res.map_speed_rev_s;
  auto& gp = res.map_dp_pa;
  gs.resize(nx);
  gp.resize(ny);
  for (std::size_t j = 0; j < nx; ++j)
    gs[j] = setup.map_speed_lo_rev_s + (setup.map_speed_hi_rev_s - setup.map_speed_lo_rev_s) * static_cast<double>(j) /
                                           static_cast<double>(nx - 1);
  for (std::size_t i = 0; i < ny; ++i)
    gp[i] = setup.map_dp_lo_pa + (setup.map_dp_hi_pa - setup.map_dp_lo_pa) * static_cast<double>(i) /
                                     static_cast<double>(ny - 1);
  for (const auto& m : res.models) {
    test_stand_map mp;
    mp.model = m.model;
    mp.eta_t.resize(nx * ny);
    mp.st.resize(nx * ny);
    loss_model_map(m, mu_map.value, gp.data(), ny, gs.data(), nx, mp.eta_t.data(), mp.st.data());
    res.maps.push_back(std::move(mp));
  }
  for (std::size_t k = 0; k < nx * ny; ++k) {
    status w = status::ok;
    for (const auto& mp : res.maps) w = worst(w, mp.st[k]);
    if (w == status::extrapolated) ++res.map_extrapolated;
  }

  // ---- reports, in the order a report lists them
  if (res.map_extrapolated > 0)
    r.report(status::extrapolated,
             std::to_string(res.map_extrapolated) + " of " + std::to_string(nx * ny) +
                 " map points lie outside the tested pressures, speeds or viscosities: extrapolated by the model, "
                 "marked in the map CSV");
  if (implausible)
    r.report(status::implausible,
             "some efficiencies exceed 100 % (status 'implausible'): check the displacement used and the flow "
             "correction");
  if (regime_flow)
    r.report(status::regime, "some flow corrections span more than 150 K from the oil's reference temperature (flagged)");
  if (res.estimators[2].st == status::regime)
    r.report(status::regime,
             "the two-step estimator had fewer than 5 speeds x 5 pressures (ISO 8426-1 asks for that grid)");
  if (ill)
    r.report(status::ill_conditioned,
             "the test grid does not separate the loss terms well: the fitted coefficients are uncertain");
  return res;
}

}  // namespace pumploss
