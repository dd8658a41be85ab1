// pumploss test-stand: reads the data (CSV) and the setup (TOML), hands them to the library's
// reduction (pumploss::reduce_test_stand, include/pumploss/test_stand.hpp) and renders what it
// returns: efficiencies per operating point with their expanded uncertainty, the derived
// displacement by three estimators, the fitted loss models, the drain table and the
// overall-efficiency map (CSV and SVG contour plot).
#include <algorithm>
#include <cmath>
#include <limits>
#include <CLI/CLI.hpp>
#include <fmt/format.h>

#include "commands.hpp"
#include "common.hpp"
#include "inputs.hpp"
#include "pumploss/test_stand.hpp"
#include "pumploss/version.hpp"
#include "svg.hpp"

namespace plcli {

namespace {

// The outlier and exclusion flag of a set point for the points table.
std::string point_flag(const pumploss::test_stand_point& p) {
  std::string f = (p.outlier & 1u) && (p.outlier & 2u) ? "flow+torque outlier"
                  : (p.outlier & 1u)                   ? "flow outlier"
                  : (p.outlier & 2u)                   ? "torque outlier"
                                                       : "";
  if (p.excluded) f += std::string(f.empty() ? "" : ", ") + (p.excluded_by_list ? "excluded (list)" : "excluded (rule)");
  if (pumploss::is_error(p.fit_st)) f += std::string(f.empty() ? "" : ", ") + "no fit here";
  return f;
}

// ---- the figures of the HTML report (issue 16, Deliver 8)
// One series per speed level of a quantity over the pressure difference, the outliers and the
// excluded set points as their own marker series.
svg::plot per_speed_plot(const pumploss::test_stand_result& res, const display_units& du, const std::string& title,
                         const std::string& ylabel, double (*value)(const pumploss::test_stand_result&, std::size_t),
                         double scale) {
  using D = pumploss::dimension;
  svg::plot p;
  p.title = title;
  p.x.label = std::string("pressure difference [") + du.of(D::pressure).symbol + "]";
  p.y.label = ylabel;
  svg::series flagged{"outlier or excluded", {}, {}, false, true, false};
  for (std::size_t lev = 0; lev < res.speed_levels; ++lev) {
    std::vector<std::size_t> idx;
    for (std::size_t k = 0; k < res.points.size(); ++k)
      if (res.points[k].speed_level == lev) idx.push_back(k);
    if (idx.empty()) continue;
    std::sort(idx.begin(), idx.end(), [&](std::size_t a, std::size_t b) { return res.points[a].dp_pa < res.points[b].dp_pa; });
    double mean_n = 0;
    for (const auto k : idx) mean_n += res.points[k].speed_rev_s / static_cast<double>(idx.size());
    svg::series s{show_quantity(mean_n, D::rotational_speed, du, 4), {}, {}, true, true, false};
    for (const auto k : idx) {
      const double y = value(res, k) * scale;
      if (!std::isfinite(y)) continue;
      s.x.push_back(du.show(res.points[k].dp_pa, D::pressure));
      s.y.push_back(y);
      if (res.points[k].outlier != 0u || res.points[k].excluded) {
        flagged.x.push_back(s.x.back());
        flagged.y.push_back(y);
      }
    }
    p.lines.push_back(std::move(s));
  }
  if (!flagged.x.empty()) p.lines.push_back(std::move(flagged));
  return p;
}

// Contour levels when the setup names none: nice steps inside the map's range (in per cent).
std::vector<double> default_levels(const pumploss::test_stand_map& mp) {
  double lo = 1e300, hi = -1e300;
  for (std::size_t k = 0; k < mp.eta_t.size(); ++k)
    if (mp.st[k] == pumploss::status::ok && std::isfinite(mp.eta_t[k])) lo = std::min(lo, mp.eta_t[k]), hi = std::max(hi, mp.eta_t[k]);
  if (!(hi > lo))
    for (const double v : mp.eta_t)
      if (std::isfinite(v)) lo = std::min(lo, v), hi = std::max(hi, v);
  std::vector<double> out;
  if (!(hi > lo)) return out;
  for (const double t : svg::nice_ticks(100 * lo, 100 * hi, 7))
    if (t > 100 * lo && t < 100 * hi) out.push_back(t);
  return out;
}

using D = pumploss::dimension;
using pumploss::status;

struct stand_options {
  std::string data, setup;
  output_options out;
  pumploss::csv_dialect csv_format = pumploss::csv_dialect::detect;
};

// The columns of the CSV (names of stand_columns()) that fill each field of a reading, with the
// library's column bit; the flow is the outlet flow of a pump, the inlet flow of a motor.
struct stand_column {
  const char* name;
  double pumploss::test_stand_row::*field;
  unsigned bit;
};
std::vector<stand_column> stand_fields(bool pump) {
  using R = pumploss::test_stand_row;
  using S = pumploss::test_stand_stream;
  return {{"speed", &R::speed_rev_s, S::speed},
          {"inlet pressure", &R::inlet_pressure_pa, S::inlet_pressure},
          {"outlet pressure", &R::outlet_pressure_pa, S::outlet_pressure},
          {pump ? "outlet flow" : "inlet flow", &R::flow_m3_s, S::flow},
          {"torque", &R::torque_n_m, S::torque},
          {"drain flow", &R::drain_flow_m3_s, S::drain_flow},
          {"inlet temperature", &R::inlet_temperature_k, S::inlet_temperature},
          {"outlet temperature", &R::outlet_temperature_k, S::outlet_temperature},
          {"drain temperature", &R::drain_temperature_k, S::drain_temperature},
          {"meter temperature", &R::meter_temperature_k, S::meter_temperature},
          {"case pressure", &R::case_pressure_pa, S::case_pressure}};
}

[[noreturn]] void throw_table_error(const std::string& file, const pumploss::table_error& e) {
  throw input_error(file, e.line, e.column, e.message);
}

// A refusal of the library as an input_error at the file, line and column it concerns; the
// reading it names is found by reading the file again up to it (the stream kept no rows).
[[noreturn]] void refuse(const pumploss::test_stand_message& m, const stand_options& o) {
  if (!m.setting.empty()) throw input_error(o.setup, 0, 0, m.text);
  if (m.row != pumploss::test_stand_message::no_row) {
    pumploss::table_stream in(o.data, stand_columns(), o.csv_format);
    const auto k = in.header().find(m.column);
    pumploss::table_row row;
    if (k < in.header().spec.size() && in.header().present[k])
      while (in.next(row))
        if (in.rows() == m.row + 1)
          throw input_error(o.data, row.line, row.pos[k],
                            "column '" + m.column + "': " + (m.follows_value ? "'" + row.texts[k] + "' " + m.text : m.text));
  }
  throw input_error(o.data, 0, 0, m.text);
}

int run_test_stand(const stand_options& o) {
  const display_units du = make_units(o.out);
  const auto setup = read_stand_setup(o.setup);
  const auto& s = setup.run;
  const bool pump = s.kind == pumploss::machine::pump;
  // the data streamed row by row into the reduction: memory bounded by the longest set point (issue 20)
  pumploss::table_stream in(o.data, stand_columns(), o.csv_format);
  if (pumploss::is_error(in.error().st)) throw_table_error(o.data, in.error());
  const auto& hd = in.header();
  struct field_at {
    std::size_t k;
    double pumploss::test_stand_row::*field;
  };
  std::vector<field_at> fields;
  unsigned bits = 0;
  for (const auto& c : stand_fields(pump))
    if (hd.has(c.name)) {
      fields.push_back({hd.find(c.name), c.field});
      bits |= c.bit;
    }
  pumploss::test_stand_stream stream(s, bits);
  pumploss::table_row line;
  while (in.next(line)) {
    pumploss::test_stand_row reading;
    for (const auto& f : fields) reading.*(f.field) = line.values[f.k];
    stream.add(reading);
  }
  if (pumploss::is_error(in.error().st)) throw_table_error(o.data, in.error());

  const auto res = stream.finish();
  if (pumploss::is_error(res.st)) refuse(res.messages.front(), o);

  const std::size_t n = res.points.size();
  const auto& est = res.estimators;
  const auto& models = res.models;
  const std::string v_source = s.displacement == pumploss::displacement_choice::nominal
                                   ? std::string("the maker's nominal displacement (no uncertainty propagated for it)")
                                   : std::string("estimator '") +
                                         pumploss::displacement_estimator_name(
                                             est[static_cast<std::size_t>(s.displacement)].estimator) +
                                         "'";
  const std::string vt = pumploss::viscosity_temperature_name(s.viscosity_at);

  report r;
  add_input_notes(r, hd);
  r.title = std::string("Test-stand analysis: ") + setup.machine_name;
  for (const auto& j : setup.job) r.facts.emplace_back(j.first, j.second);
  r.facts.emplace_back("Data", o.data + fmt::format(" ({} operating points; {} speed levels x {} pressure levels)", n,
                                                    res.speed_levels, res.pressure_levels));
  r.facts.emplace_back("Machine", std::string(pump ? "pump" : "motor") + ", nominal displacement " +
                                      show_quantity(s.nominal_displacement_m3_rev, D::displacement, du));
  r.facts.emplace_back("Oil", setup.oil.name + "; viscosity in the gaps at the " + vt + " temperature (ASTM D341)");
  r.facts.emplace_back("Flow", s.meter_at_port
                                   ? std::string("read at the port (no correction)")
                                   : "meter in the return line at " + show_quantity(s.meter_pressure_pa, D::pressure, du) +
                                         " and the meter temperature, corrected to the " + (pump ? "outlet" : "inlet") +
                                         " port by the density ratio (pumploss::flow_at_port)");
  r.facts.emplace_back(
      "Set points",
      fmt::format("{} from {} readings grouped by speed ({:.3g} %) and pressure ({:.3g} % or {:.3g} bar); {} settling "
                  "readings dropped (steady-state limits of ISO 4409 class B, from memory); type A s/sqrt(n) of the "
                  "scatter with the instruments' type B",
                  n, stream.rows(), 100 * s.group_speed_fraction, 100 * s.group_dp_fraction,
                  s.group_dp_abs_pa / 1e5, res.rows_unsteady));
  r.facts.emplace_back("Outliers", fmt::format("{} set points flagged (externally studentized residual above {:.3g}), {} "
                                               "excluded from the fit; see the 'flag' column",
                                               res.outliers, s.outlier_threshold, res.excluded));
  r.facts.emplace_back("Displacement used",
                       show_quantity(res.displacement_m3_rev, D::displacement, du, 5) + " from " + v_source);

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
             {"status", cell_kind::text, D::pressure, 0},
             {"flow residual", cell_kind::quantity, D::volume_flow, 2},
             {"torque residual", cell_kind::quantity, D::torque, 2},
             {"readings", cell_kind::number, D::pressure, 3},
             {"flag", cell_kind::text, D::pressure, 0}};
  svg::series measured{"test points", {}, {}, false, true, false};
  for (std::size_t i = 0; i < n; ++i) {
    const auto& p = res.points[i];
    const auto& g = p.eta;
    tp.rows.push_back({static_cast<double>(i + 1), p.speed_rev_s, p.dp_pa, p.flow_m3_s, p.torque_n_m, p.mu_pa_s,
                       g.eta_v.value, g.eta_v.U, g.eta_hm.value, g.eta_hm.U, g.eta_t.value, g.eta_t.U,
                       status_text(p.st), p.flow_residual_m3_s, p.torque_residual_n_m, static_cast<double>(p.rows),
                       point_flag(p)});
    tp.row_classes.push_back(p.excluded ? "excluded" : p.outlier != 0u ? "outlier" : "");
    measured.x.push_back(du.show(p.speed_rev_s, D::rotational_speed));
    measured.y.push_back(du.show(p.dp_pa, D::pressure));
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

  table tdr;
  tdr.name = "drain";
  tdr.title = "Case drain flow per operating point: share of the theoretical flow V_i n and of the volumetric loss";
  tdr.cols = {{"point", cell_kind::number, D::pressure, 2},
              {"speed", cell_kind::quantity, D::rotational_speed, 4},
              {"pressure difference", cell_kind::quantity, D::pressure, 4},
              {"drain flow", cell_kind::quantity, D::volume_flow, 4},
              {"drain fraction", cell_kind::percent, D::pressure, 3},
              {"share of volumetric loss", cell_kind::percent, D::pressure, 3}};
  for (std::size_t i = 0; i < n; ++i)
    tdr.rows.push_back({static_cast<double>(i + 1), res.points[i].speed_rev_s, res.points[i].dp_pa,
                        res.drain[i].drain_flow_m3_s, res.drain[i].fraction, res.drain[i].loss_share});

  table tm;
  tm.name = "loss_model";
  tm.title = "Loss-model coefficients (dimensionless unless a unit is given) with standard errors";
  tm.cols = {{"coefficient", cell_kind::text, D::pressure, 0}, {"unit", cell_kind::text, D::pressure, 0}};
  for (const auto& m : models) {
    // coefficients span many decades: written as text in scientific notation
    tm.cols.push_back({pumploss::loss_model_name(m.model), cell_kind::text, D::pressure, 0});
    tm.cols.push_back({std::string("u ") + pumploss::loss_model_name(m.model), cell_kind::text, D::pressure, 0});
  }
  using lm = pumploss::loss_model<double>;
  struct coef {
    const char* name;
    const char* unit;
    double lm::*v;
    double lm::*u;
  };
  const coef coefs[] = {{"C_s laminar slip", "-", &lm::c_s, &lm::u_c_s},
                        {"C_st turbulent slip", "-", &lm::c_st, &lm::u_c_st},
                        {"C_v viscous drag", "-", &lm::c_v, &lm::u_c_v},
                        {"C_f Coulomb friction", "-", &lm::c_f, &lm::u_c_f},
                        {"T_c constant torque loss", "N.m", &lm::t_c_n_m, &lm::u_t_c_n_m},
                        {"C_h hydrodynamic torque", "-", &lm::c_h, &lm::u_c_h}};
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
        std::string(pumploss::loss_model_name(m.model)) + " fit",
        fmt::format("R^2 flow {:.5f}, torque {:.5f}; RMS residual {}, {}; condition numbers {:.3g}, {:.3g}; {}",
                    m.r2_flow, m.r2_torque, show_quantity(m.rms_flow_m3_s, D::volume_flow, du, 3),
                    show_quantity(m.rms_torque_n_m, D::torque, du, 3), m.cond_flow, m.cond_torque,
                    status_text(m.st)));

  // ---- the map: CSV of every model, contour plot of the last
  const auto& gs = res.map_speed_rev_s;
  const auto& gp = res.map_dp_pa;
  const std::size_t nx = gs.size(), ny = gp.size();
  const char* map_model = pumploss::loss_model_name(models.back().model);
  table tmap;
  tmap.name = "map";
  tmap.cols = {{"pressure difference", cell_kind::quantity, D::pressure, 4},
               {"speed", cell_kind::quantity, D::rotational_speed, 4}};
  for (const auto& mp : res.maps)
    tmap.cols.push_back({std::string("overall eff ") + pumploss::loss_model_name(mp.model), cell_kind::percent,
                         D::pressure, 4});
  tmap.cols.push_back({"status", cell_kind::text, D::pressure, 0});
  for (std::size_t i = 0; i < ny; ++i)
    for (std::size_t j = 0; j < nx; ++j) {
      std::vector<cell> row = {gp[i], gs[j]};
      status worst_st = status::ok;
      for (const auto& mp : res.maps) {
        row.emplace_back(mp.eta_t[i * nx + j]);
        worst_st = pumploss::worst(worst_st, mp.st[i * nx + j]);
      }
      row.emplace_back(status_text(worst_st));
      tmap.rows.push_back(std::move(row));
    }

  svg::plot p;
  p.title = "Overall efficiency of " + setup.machine_name;
  p.subtitle = fmt::format("{} loss model at {} ({} temperature); pumploss {}", map_model,
                           show_quantity(res.map_temperature_k, D::temperature, du, 3), vt, pumploss::version_string);
  p.x.label = std::string("speed [") + du.of(D::rotational_speed).symbol + "]";
  p.y.label = std::string("pressure difference [") + du.of(D::pressure).symbol + "]";
  svg::contour c;
  for (const double sp : gs) c.x.push_back(du.show(sp, D::rotational_speed));
  for (const double pp : gp) c.y.push_back(du.show(pp, D::pressure));
  for (std::size_t i = 0; i < ny; ++i) {
    std::vector<double> row;
    for (std::size_t j = 0; j < nx; ++j) row.push_back(res.maps.back().eta_t[i * nx + j] * 100.0);
    c.z.push_back(row);
  }
  for (const double l : setup.map_levels) c.levels.push_back(l * 100.0);
  if (c.levels.empty()) c.levels = default_levels(res.maps.back());  // [map] levels_percent not given
  c.level_format = "{:g} %";
  p.contours = c;
  p.lines.push_back(measured);
  {  // the extrapolated cells shaded, the test envelope drawn, the outliers marked
    svg::shade sh{"extrapolated by the model", {}};
    const auto& st = res.maps.back().st;
    auto cell_out = [&](std::size_t i, std::size_t j) { return st[i * nx + j] != status::ok; };
    for (std::size_t i = 0; i < ny; ++i)
      for (std::size_t j = 0; j < nx; ++j) {
        if (!cell_out(i, j)) continue;  // a half cell about each extrapolated grid point
        const double x0 = c.x[j > 0 ? j - 1 : 0], x1 = c.x[j + 1 < nx ? j + 1 : nx - 1];
        const double y0 = c.y[i > 0 ? i - 1 : 0], y1 = c.y[i + 1 < ny ? i + 1 : ny - 1];
        sh.rects.push_back({(x0 + c.x[j]) / 2, (y0 + c.y[i]) / 2, (x1 + c.x[j]) / 2, (y1 + c.y[i]) / 2});
      }
    if (!sh.rects.empty()) p.shades.push_back(std::move(sh));
    const double sx0 = du.show(res.tested_speed_lo_rev_s, D::rotational_speed);
    const double sx1 = du.show(res.tested_speed_hi_rev_s, D::rotational_speed);
    const double sy0 = du.show(res.tested_dp_lo_pa, D::pressure), sy1 = du.show(res.tested_dp_hi_pa, D::pressure);
    p.lines.push_back({"test envelope", {sx0, sx1, sx1, sx0, sx0}, {sy0, sy0, sy1, sy1, sy0}, true, false, true});
    svg::series fl{"outlier or excluded", {}, {}, false, true, false};
    for (const auto& pt : res.points)
      if (pt.outlier != 0u || pt.excluded) {
        fl.x.push_back(du.show(pt.speed_rev_s, D::rotational_speed));
        fl.y.push_back(du.show(pt.dp_pa, D::pressure));
      }
    if (!fl.x.empty()) p.lines.push_back(std::move(fl));
  }

  if (!res.acceptance.empty()) {  // the acceptance verdicts, one row per criterion
    table ta;
    ta.name = "acceptance";
    ta.title = "Acceptance criteria: verdict and margin at the matching set point (U: expanded uncertainty, k = 2)";
    ta.cols = {{"criterion", cell_kind::text, D::pressure, 0},
               {"quantity", cell_kind::text, D::pressure, 0},
               {"limit", cell_kind::text, D::pressure, 0},
               {"set point", cell_kind::number, D::pressure, 2},
               {"measured", cell_kind::text, D::pressure, 0},
               {"margin", cell_kind::text, D::pressure, 0},
               {"verdict", cell_kind::text, D::pressure, 0}};
    for (std::size_t i = 0; i < res.acceptance.size(); ++i) {
      const auto& v = res.acceptance[i];
      const bool drain = v.criterion.what == pumploss::acceptance_quantity::drain_flow;
      auto shown = [&](double x) {
        return drain ? show_quantity(x, D::volume_flow, du, 4) : fmt::format("{:.2f} %", 100 * x);
      };
      ta.rows.push_back({v.criterion.label.empty() ? fmt::format("{}", i + 1) : v.criterion.label,
                         std::string(pumploss::acceptance_quantity_name(v.criterion.what)),
                         (drain ? "max " : "min ") + shown(v.criterion.limit),
                         v.tested ? static_cast<double>(v.point + 1) : std::numeric_limits<double>::quiet_NaN(),
                         v.tested ? shown(v.value) + (drain ? "" : fmt::format(" +- {:.2f} %", 100 * v.U)) : "not tested",
                         v.tested ? shown(v.margin) : "-",
                         std::string(!v.tested ? "NOT TESTED" : v.pass ? "pass" : "FAIL")});
      ta.row_classes.push_back(v.tested && v.pass ? "" : "fail");
    }
    r.tables.push_back(std::move(ta));
    r.facts.emplace_back("Acceptance", res.accepted ? "every criterion met (see the acceptance table)"
                                                    : "NOT accepted: a criterion failed or was not tested (see the table)");
  }
  r.tables.push_back(std::move(td));
  r.tables.push_back(std::move(tm));
  r.tables.push_back(std::move(tp));
  r.tables.push_back(std::move(tdr));
  r.facts.emplace_back("Efficiency map",
                       fmt::format("{} speeds x {} pressures at {} of the {} temperature (it sets the viscosity; tested "
                                   "{} to {}{}), {} model; {} of {} points extrapolated; in test_stand_map.csv and "
                                   "test_stand_map.svg",
                                   nx, ny, show_quantity(res.map_temperature_k, D::temperature, du, 4), vt,
                                   show_quantity(res.tested_temperature_lo_k, D::temperature, du, 4),
                                   show_quantity(res.tested_temperature_hi_k, D::temperature, du, 4),
                                   s.map_temperature_k == 0 ? ", the tested mean: no [map] temperature given" : "",
                                   map_model, res.map_extrapolated, nx * ny));
  r.notes.push_back("uncertainties: the stated instrument limits (per cent of reading plus absolute) as rectangular "
                    "distributions (GUM 4.3.7) unless given as standard; u(V_i) is the estimator's standard error; "
                    "flow and V_i taken as uncorrelated (JCGM 100:2008, first order)");
  for (const auto& m : res.messages) r.notes.push_back(m.text);

  output_set files;
  files.add("test_stand_map.csv", render_csv(tmap, du));
  const std::string map_svg = p.render();
  files.add("test_stand_map.svg", map_svg);
  {  // ---- the customer's HTML report beside the text report (issue 16, Deliver 8)
    std::vector<html_figure> figs;
    const struct { const char* id; const char* name; double (*f)(const pumploss::test_stand_result&, std::size_t); } effs[] = {
        {"fig-eta-t", "Overall efficiency", +[](const pumploss::test_stand_result& rr, std::size_t k) { return rr.points[k].eta.eta_t.value; }},
        {"fig-eta-v", "Volumetric efficiency", +[](const pumploss::test_stand_result& rr, std::size_t k) { return rr.points[k].eta.eta_v.value; }},
        {"fig-eta-hm", "Hydromechanical efficiency", +[](const pumploss::test_stand_result& rr, std::size_t k) { return rr.points[k].eta.eta_hm.value; }}};
    for (const auto& e : effs) {
      auto pe = per_speed_plot(res, du, std::string(e.name) + " over pressure, per speed", std::string(e.name) + " [%]", e.f, 100.0);
      figs.push_back({e.id, std::string(e.name) + " of each set point (averaged steady readings) over the pressure "
                            "difference, one line per speed; outliers and excluded set points ringed.",
                      pe.render(860, 440)});
    }
    auto pd = per_speed_plot(res, du, "Case drain flow over pressure, per speed",
                             std::string("drain flow [") + du.of(D::volume_flow).symbol + "]",
                             +[](const pumploss::test_stand_result& rr, std::size_t k) { return rr.drain[k].drain_flow_m3_s; },
                             du.show(1.0, D::volume_flow));
    figs.push_back({"fig-drain", "Case drain flow of each set point over the pressure difference, one line per speed.",
                    pd.render(860, 440)});
    figs.push_back({"fig-map", fmt::format("Overall-efficiency map of the {} model at {} of the {} temperature (the "
                                           "temperature that sets the viscosity); grey: extrapolated by the model "
                                           "({} of {} grid points); dashed: the test envelope.",
                                           map_model, show_quantity(res.map_temperature_k, D::temperature, du, 4), vt,
                                           res.map_extrapolated, nx * ny),
                    map_svg});
    const std::string verdict = res.acceptance.empty() ? std::string("No acceptance criteria stated")
                                : res.accepted          ? std::string("ACCEPTED: every criterion met")
                                                        : std::string("NOT ACCEPTED: a criterion failed or was not tested");
    files.add("test_stand_report.html", render_html(r, du, figs, verdict, res.acceptance.empty() || res.accepted,
                                                     res.acceptance.empty() ? 0 : 1));
  }
  files.add("test_stand_baseline.toml", baseline_file_text(setup, o.data, stream.point_means(), res));  // health's baseline (issue 16)
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
  add_csv_format_option(*sub, o->csv_format);
  sub->callback([o, &rc] { rc = run_test_stand(*o); });
}

}  // namespace plcli
