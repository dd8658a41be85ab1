// pumploss test-stand: efficiencies per operating point with their expanded uncertainty (GUM,
// k = 2), the flow corrected to port conditions where the setup says so, the derived
// displacement by three estimators, a fitted Wilson (and Schloesser) loss model with its
// diagnostics, and an overall-efficiency map (CSV and SVG contour plot).
#include <CLI/CLI.hpp>
#include <fmt/format.h>

#include <algorithm>
#include <cmath>
#include <map>

#include "commands.hpp"
#include "common.hpp"
#include "inputs.hpp"
#include "pumploss/efficiency.hpp"
#include "pumploss/loss_model.hpp"
#include "pumploss/uncertainty.hpp"
#include "pumploss/version.hpp"
#include "svg.hpp"

namespace plcli {

namespace {

using D = pumploss::dimension;
using pumploss::status;

struct stand_options {
  std::string data, setup;
  output_options out;
};

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

// Standard uncertainty of one reading: the stated limits (per cent of reading plus absolute,
// added as the calibration sheets state them) as a rectangular or a standard uncertainty.
double instrument_u(const instrument& ins, double reading) {
  using pumploss::uncertainty_basis;
  using pumploss::uncertainty_distribution;
  const auto dist = ins.rectangular ? uncertainty_distribution::rectangular : uncertainty_distribution::standard;
  const auto a = pumploss::standard_uncertainty(ins.absolute_si, uncertainty_basis::absolute, dist, reading);
  const auto b = pumploss::standard_uncertainty(ins.reading_fraction * 100.0, uncertainty_basis::percent_of_reading,
                                                dist, reading);
  return a.value + b.value;
}

const char* model_name(pumploss::loss_model_kind k) {
  return k == pumploss::loss_model_kind::wilson ? "Wilson" : "Schloesser";
}

int run_test_stand(const stand_options& o) {
  const display_units du = make_units(o.out);
  const auto setup = read_stand_setup(o.setup);
  const auto d = read_csv(o.data, stand_columns());
  const char* flow_col = setup.pump ? "outlet flow" : "inlet flow";
  if (!d.has(flow_col))
    throw input_error(o.data, 0, 0,
                      std::string("missing column '") + flow_col + "' (the " + (setup.pump ? "pump's outlet" : "motor's inlet") +
                          " flow, as " + o.setup + " says kind = \"" + (setup.pump ? "pump" : "motor") + "\")");
  d.check_range("speed", 1e-3, 1e3, "is not a speed above zero (and below 60000 rpm)");
  d.check_range(flow_col, 0.0, 1.0, "is not a flow between zero and 60000 L/min");
  d.check_range("drain flow", 0.0, 1.0, "is not a flow between zero and 60000 L/min");
  d.check_range("torque", 0.0, 1e6, "is not a torque between zero and 1e6 N.m");
  for (const char* t : {"inlet temperature", "outlet temperature", "drain temperature", "meter temperature"})
    d.check_range(t, 223.15, 473.15, "is not an oil temperature between -50 and 200 degC");
  const auto& p1 = d.si("inlet pressure");
  const auto& p2 = d.si("outlet pressure");
  for (std::size_t i = 0; i < d.rows(); ++i)
    if (setup.pump ? !(p2[i] > p1[i]) : !(p1[i] > p2[i]))
      throw d.error(i, "outlet pressure",
                    setup.pump ? "a pump's outlet pressure must lie above its inlet pressure"
                               : "a motor's outlet pressure must lie below its inlet pressure");
  const std::string tvisc = setup.viscosity_temperature + " temperature";
  if (!d.has(tvisc))
    throw input_error(o.setup, 0, 0,
                      "viscosity_temperature = \"" + setup.viscosity_temperature + "\" but " + o.data +
                          " has no '" + tvisc + "' column");
  const std::string tport = setup.pump ? "outlet temperature" : "inlet temperature";
  if (!setup.meter_at_port) {
    if (!d.has("meter temperature"))
      throw input_error(o.setup, 0, 0,
                        "[flow_meter] position = \"return\" needs a 'meter temperature' column in " + o.data);
    if (!d.has(tport))
      throw input_error(o.setup, 0, 0, "[flow_meter] position = \"return\" needs an '" + tport + "' column in " +
                                           o.data + " (the port the flow is corrected to)");
  }

  const auto kind = setup.pump ? pumploss::machine::pump : pumploss::machine::motor;
  const auto& oil = setup.oil.props;
  const std::size_t n = d.rows();
  const auto& speed = d.si("speed");
  const auto& torque = d.si("torque");
  const auto& q_read = d.si(flow_col);
  std::vector<double> dp(n), q(n), mu(n);
  bool regime_flow = false;
  for (std::size_t i = 0; i < n; ++i) {
    dp[i] = setup.pump ? p2[i] - p1[i] : p1[i] - p2[i];
    const auto m = pumploss::oil_dynamic_viscosity(oil, d.si(tvisc)[i], 0.0);
    if (!m.usable())
      throw d.error(i, tvisc, std::string("no oil viscosity at this temperature: ") +
                                  pumploss::status_message(static_cast<int>(m.st)));
    mu[i] = m.value;
    if (setup.meter_at_port) {
      q[i] = q_read[i];
      continue;
    }
    const double p_port = setup.pump ? p2[i] : p1[i];
    const auto r = pumploss::flow_at_port(q_read[i], setup.meter_pressure_pa, d.si("meter temperature")[i], p_port,
                                          d.si(tport)[i], oil.rho_ref_kg_m3, oil.t_ref_k, oil.alpha_per_k,
                                          oil.bulk_modulus_pa);
    if (!r.usable())
      throw d.error(i, flow_col, std::string("cannot correct the flow to port conditions: ") +
                                     pumploss::status_message(static_cast<int>(r.st)));
    if (r.st != status::ok) regime_flow = true;
    q[i] = r.value;
  }

  // ---- derived displacement by the three estimators
  const auto [plev, np] = level_of(dp);
  const auto [slev, ns] = level_of(speed);
  std::vector<pumploss::displacement_result<double>> est;
  {  // A: slope of flow over speed at the lowest pressure level
    std::vector<double> xs, ys;
    for (std::size_t i = 0; i < n; ++i)
      if (plev[i] == 0) {
        xs.push_back(speed[i]);
        ys.push_back(q[i]);
      }
    est.push_back(pumploss::displacement_slope(xs.data(), ys.data(), xs.size()));
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
    est.push_back(pumploss::displacement_intercept(nmean, xs.data(), ys.data(), xs.size()));
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
      est.push_back(pumploss::displacement_two_step(xs.data(), ps.data(), ys.data(), np, per));
    } else {
      const double nan = std::nan("");
      est.push_back({nan, nan, nan, nan, nan, n, pumploss::displacement_estimator::two_step,
                     status::insufficient_data});
    }
  }
  double v_used = setup.nominal_displacement_m3_rev, u_v_used = 0.0;
  std::string v_source = "the maker's nominal displacement (no uncertainty propagated for it)";
  if (setup.displacement_for_efficiency != "nominal") {
    const std::size_t k = setup.displacement_for_efficiency == "slope" ? 0
                          : setup.displacement_for_efficiency == "intercept" ? 1
                                                                              : 2;
    if (!pumploss::is_usable(est[k].st))
      throw std::runtime_error(o.setup + ": displacement_for_efficiency = \"" + setup.displacement_for_efficiency +
                               "\", but that estimator found no displacement in " + o.data + ": " +
                               pumploss::status_message(static_cast<int>(est[k].st)) +
                               " (choose another estimator or \"nominal\")");
    v_used = est[k].v_m3_rev;
    u_v_used = est[k].u_v_m3_rev;
    v_source = std::string("estimator '") + pumploss::displacement_estimator_name(est[k].estimator) + "'";
  }

  // ---- efficiencies with GUM uncertainty per point
  report r;
  r.title = std::string("Test-stand analysis: ") + setup.machine_name;
  r.facts.emplace_back("Data", o.data + fmt::format(" ({} operating points; {} speed levels x {} pressure levels)", n,
                                                    ns, np));
  r.facts.emplace_back("Machine", std::string(setup.pump ? "pump" : "motor") + ", nominal displacement " +
                                      show_quantity(setup.nominal_displacement_m3_rev, D::displacement, du));
  r.facts.emplace_back("Oil", setup.oil.name + "; viscosity in the gaps at the " + setup.viscosity_temperature +
                                  " temperature (ASTM D341)");
  r.facts.emplace_back("Flow", setup.meter_at_port
                                   ? std::string("read at the port (no correction)")
                                   : "meter in the return line at " +
                                         show_quantity(setup.meter_pressure_pa, D::pressure, du) +
                                         " and the meter temperature, corrected to the " +
                                         (setup.pump ? "outlet" : "inlet") +
                                         " port by the density ratio (pumploss::flow_at_port)");
  r.facts.emplace_back("Displacement used", show_quantity(v_used, D::displacement, du, 5) + " from " + v_source);

  table tp;
  tp.name = "points";
  tp.title = "Efficiencies per operating point (U: expanded uncertainty, k = 2, GUM first order)";
  tp.cols = {{"point", cell_kind::number, D::pressure, 2},
             {"speed", cell_kind::quantity, D::rotational_speed, 4},
             {"pressure difference", cell_kind::quantity, D::pressure, 4},
             {"flow at port", cell_kind::quantity, D::volume_flow, 4},
             {"torque", cell_kind::quantity, D::torque, 4},
             {"viscosity", cell_kind::quantity, D::dynamic_viscosity, 3},
             {"volumetric eff", cell_kind::percent, D::pressure, 4},
             {"U vol", cell_kind::percent, D::pressure, 2},
             {"hydromech eff", cell_kind::percent, D::pressure, 4},
             {"U hm", cell_kind::percent, D::pressure, 2},
             {"overall eff", cell_kind::percent, D::pressure, 4},
             {"U overall", cell_kind::percent, D::pressure, 2},
             {"status", cell_kind::text, D::pressure, 0}};
  bool implausible = false;
  svg::series measured{"test points", {}, {}, false, true, false};
  for (std::size_t i = 0; i < n; ++i) {
    const double u_dp =
        pumploss::pressure_difference_uncertainty(instrument_u(setup.pressure, p1[i]), instrument_u(setup.pressure, p2[i]), 0.0)
            .value;
    const pumploss::efficiency_inputs<double> x{v_used, speed[i], dp[i], q[i], torque[i], u_v_used,
                                                instrument_u(setup.speed, speed[i]), u_dp,
                                                instrument_u(setup.flow, q_read[i]), instrument_u(setup.torque, torque[i]),
                                                0.0};
    const auto g = pumploss::efficiency_gum(kind, x);
    if (pumploss::is_error(g.st))
      throw d.error(i, "speed", std::string("no efficiencies for this point: ") +
                                    pumploss::status_message(static_cast<int>(g.st)));
    if (g.st == status::implausible) implausible = true;
    tp.rows.push_back({static_cast<double>(i + 1), speed[i], dp[i], q[i], torque[i], mu[i], g.eta_v.value, g.eta_v.U,
                       g.eta_hm.value, g.eta_hm.U, g.eta_t.value, g.eta_t.U, status_text(g.st)});
    measured.x.push_back(du.show(speed[i], D::rotational_speed));
    measured.y.push_back(du.show(dp[i], D::pressure));
  }

  table td;
  td.name = "displacement";
  td.title = "Derived displacement V_i by three estimators (standard error from the fit residuals)";
  td.cols = {{"estimator", cell_kind::text, D::pressure, 0},
             {"V_i", cell_kind::quantity, D::displacement, 5},
             {"u(V_i)", cell_kind::quantity, D::displacement, 2},
             {"points", cell_kind::number, D::pressure, 2},
             {"status", cell_kind::text, D::pressure, 0}};
  for (const auto& e : est)
    td.rows.push_back({std::string(pumploss::displacement_estimator_name(e.estimator)), e.v_m3_rev, e.u_v_m3_rev,
                       static_cast<double>(e.points), status_text(e.st)});

  // ---- loss models
  const double rho = pumploss::oil_density_at(oil, d.si(tvisc)[n / 2], 0.0).value;
  std::vector<pumploss::loss_model_kind> kinds = {pumploss::loss_model_kind::wilson};
  if (setup.schloesser) kinds.push_back(pumploss::loss_model_kind::schloesser);
  std::vector<pumploss::loss_model<double>> models;
  std::vector<double> work(pumploss::loss_fit_workspace(n));
  std::vector<std::vector<double>> res_q, res_t;
  for (const auto k : kinds) {
    std::vector<double> rq(n), rt(n);
    const auto m = pumploss::fit_loss_model(kind, k, v_used, rho, dp.data(), speed.data(), mu.data(), q.data(),
                                            torque.data(), n, work.data(), rq.data(), rt.data());
    if (pumploss::is_error(m.st))
      throw std::runtime_error(o.data + ": the " + model_name(k) + " loss model cannot be fitted to these points: " +
                               pumploss::status_message(static_cast<int>(m.st)));
    models.push_back(m);
    res_q.push_back(rq);
    res_t.push_back(rt);
  }
  tp.cols.push_back({"flow residual", cell_kind::quantity, D::volume_flow, 2});
  tp.cols.push_back({"torque residual", cell_kind::quantity, D::torque, 2});
  for (std::size_t i = 0; i < n; ++i) {
    tp.rows[i].push_back(res_q[0][i]);
    tp.rows[i].push_back(res_t[0][i]);
  }

  table tm;
  tm.name = "loss_model";
  tm.title = "Loss-model coefficients (dimensionless unless a unit is given) with standard errors";
  tm.cols = {{"coefficient", cell_kind::text, D::pressure, 0}, {"unit", cell_kind::text, D::pressure, 0}};
  for (const auto& m : models) {
    // coefficients span many decades: written as text in scientific notation
    tm.cols.push_back({model_name(m.model), cell_kind::text, D::pressure, 0});
    tm.cols.push_back({std::string("u ") + model_name(m.model), cell_kind::text, D::pressure, 0});
  }
  struct coef {
    const char* name;
    const char* unit;
    double pumploss::loss_model<double>::*v;
    double pumploss::loss_model<double>::*u;
  };
  const coef coefs[] = {{"C_s laminar slip", "-", &pumploss::loss_model<double>::c_s, &pumploss::loss_model<double>::u_c_s},
                        {"C_st turbulent slip", "-", &pumploss::loss_model<double>::c_st,
                         &pumploss::loss_model<double>::u_c_st},
                        {"C_v viscous drag", "-", &pumploss::loss_model<double>::c_v, &pumploss::loss_model<double>::u_c_v},
                        {"C_f Coulomb friction", "-", &pumploss::loss_model<double>::c_f,
                         &pumploss::loss_model<double>::u_c_f},
                        {"T_c constant torque loss", "N.m", &pumploss::loss_model<double>::t_c_n_m,
                         &pumploss::loss_model<double>::u_t_c_n_m},
                        {"C_h hydrodynamic torque", "-", &pumploss::loss_model<double>::c_h,
                         &pumploss::loss_model<double>::u_c_h}};
  for (const auto& c : coefs) {
    std::vector<cell> row = {std::string(c.name), std::string(c.unit)};
    for (const auto& m : models) {
      row.emplace_back(fmt::format("{:.5g}", m.*(c.v)));
      row.emplace_back(fmt::format("{:.2g}", m.*(c.u)));
    }
    tm.rows.push_back(std::move(row));
  }
  for (const auto& m : models)
    r.facts.emplace_back(
        std::string(model_name(m.model)) + " fit",
        fmt::format("R^2 flow {:.5f}, torque {:.5f}; RMS residual {}, {}; condition numbers {:.3g}, {:.3g}; {}",
                    m.r2_flow, m.r2_torque, show_quantity(m.rms_flow_m3_s, D::volume_flow, du, 3),
                    show_quantity(m.rms_torque_n_m, D::torque, du, 3), m.cond_flow, m.cond_torque,
                    status_text(m.st)));

  // ---- efficiency map from the fitted model(s)
  const auto mu_map = pumploss::oil_dynamic_viscosity(oil, setup.map_temperature_k, 0.0);
  if (!mu_map.usable())
    throw input_error(o.setup, 0, 0, "[map] temperature: no oil viscosity there: " +
                                         std::string(pumploss::status_message(static_cast<int>(mu_map.st))));
  const std::size_t nx = 29, ny = 27;
  std::vector<double> gs(nx), gp(ny);
  for (std::size_t j = 0; j < nx; ++j)
    gs[j] = setup.map_speed_lo + (setup.map_speed_hi - setup.map_speed_lo) * static_cast<double>(j) / (nx - 1);
  for (std::size_t i = 0; i < ny; ++i)
    gp[i] = setup.map_dp_lo + (setup.map_dp_hi - setup.map_dp_lo) * static_cast<double>(i) / (ny - 1);
  std::vector<std::vector<double>> maps;
  std::vector<std::vector<status>> map_st;
  for (const auto& m : models) {
    std::vector<double> eta(nx * ny);
    std::vector<status> st(nx * ny);
    pumploss::loss_model_map(m, mu_map.value, gp.data(), ny, gs.data(), nx, eta.data(), st.data());
    maps.push_back(eta);
    map_st.push_back(st);
  }
  table tmap;
  tmap.name = "map";
  tmap.cols = {{"pressure difference", cell_kind::quantity, D::pressure, 4},
               {"speed", cell_kind::quantity, D::rotational_speed, 4}};
  for (const auto& m : models) tmap.cols.push_back({std::string("overall eff ") + model_name(m.model), cell_kind::percent, D::pressure, 4});
  tmap.cols.push_back({"status", cell_kind::text, D::pressure, 0});
  std::size_t extrapolated = 0;
  for (std::size_t i = 0; i < ny; ++i)
    for (std::size_t j = 0; j < nx; ++j) {
      std::vector<cell> row = {gp[i], gs[j]};
      status worst_st = status::ok;
      for (std::size_t k = 0; k < models.size(); ++k) {
        row.emplace_back(maps[k][i * nx + j]);
        worst_st = pumploss::worst(worst_st, map_st[k][i * nx + j]);
      }
      if (worst_st == status::extrapolated) ++extrapolated;
      row.emplace_back(status_text(worst_st));
      tmap.rows.push_back(std::move(row));
    }

  svg::plot p;
  p.title = "Overall efficiency of " + setup.machine_name;
  p.subtitle = fmt::format("{} loss model at {}; pumploss {}", model_name(models.back().model),
                           show_quantity(setup.map_temperature_k, D::temperature, du, 3), pumploss::version_string);
  p.x.label = std::string("speed [") + du.of(D::rotational_speed).symbol + "]";
  p.y.label = std::string("pressure difference [") + du.of(D::pressure).symbol + "]";
  svg::contour c;
  for (const double s : gs) c.x.push_back(du.show(s, D::rotational_speed));
  for (const double pp : gp) c.y.push_back(du.show(pp, D::pressure));
  for (std::size_t i = 0; i < ny; ++i) {
    std::vector<double> row;
    for (std::size_t j = 0; j < nx; ++j) row.push_back(maps.back()[i * nx + j] * 100.0);
    c.z.push_back(row);
  }
  for (const double l : setup.map_levels) c.levels.push_back(l * 100.0);
  c.level_format = "{:.0f} %";
  p.contours = c;
  p.lines.push_back(measured);

  r.tables.push_back(std::move(td));
  r.tables.push_back(std::move(tm));
  r.tables.push_back(std::move(tp));
  r.facts.emplace_back("Efficiency map", fmt::format("{} speeds x {} pressures at {}, {} model; in test_stand_map.csv "
                                                     "and test_stand_map.svg",
                                                     nx, ny, show_quantity(setup.map_temperature_k, D::temperature, du, 3),
                                                     model_name(models.back().model)));
  r.notes.push_back("uncertainties: the stated instrument limits (per cent of reading plus absolute) as rectangular "
                    "distributions (GUM 4.3.7) unless given as standard; u(V_i) is the estimator's standard error; "
                    "flow and V_i taken as uncorrelated (JCGM 100:2008, first order)");
  if (extrapolated > 0)
    r.notes.push_back(fmt::format("{} of {} map points lie outside the tested pressures, speeds or viscosities: "
                                  "extrapolated by the model, marked in the map CSV",
                                  extrapolated, nx * ny));
  if (implausible)
    r.notes.push_back("some efficiencies exceed 100 % (status 'implausible'): check the displacement used and the "
                      "flow correction");
  if (regime_flow)
    r.notes.push_back("some flow corrections span more than 150 K from the oil's reference temperature (flagged)");
  if (est[2].st == status::regime)
    r.notes.push_back("the two-step estimator had fewer than 5 speeds x 5 pressures (ISO 8426-1 asks for that grid)");

  output_set files;
  files.add("test_stand_map.csv", render_csv(tmap, du));
  files.add("test_stand_map.svg", p.render());
  emit(r, files, o.out, du, "test_stand");
  return exit_ok;
}

}  // namespace

void add_test_stand(CLI::App& app, int& rc) {
  auto o = std::make_shared<stand_options>();
  auto* sub = app.add_subcommand("test-stand",
                                 "Analyse a test-stand data set: efficiencies with uncertainty, derived displacement, "
                                 "loss-model fit, efficiency map");
  sub->add_option("data", o->data, "CSV, one operating point per row, units in the header")
      ->required()
      ->check(CLI::ExistingFile);
  sub->add_option("--setup", o->setup, "Test-stand setup (TOML: machine, oil, flow meter, instruments, fit, map)")
      ->required()
      ->check(CLI::ExistingFile);
  add_output_options(*sub, o->out);
  sub->callback([o, &rc] { rc = run_test_stand(*o); });
}

}  // namespace plcli
