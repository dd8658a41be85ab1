// pumploss drain-line: the case pressure a drain line causes from cold start to hot, against the
// maker's allowed case pressure (pass or fail with margin per temperature), the share of each
// element, and with --size the smallest standard bore that passes; SVG of case pressure over
// temperature with the allowed value drawn.
#include <CLI/CLI.hpp>
#include <fmt/format.h>

#include <algorithm>
#include <cmath>

#include "commands.hpp"
#include "common.hpp"
#include "inputs.hpp"
#include "pumploss/line.hpp"
#include "pumploss/version.hpp"
#include "svg.hpp"

namespace plcli {

namespace {

using D = pumploss::dimension;
using pumploss::status;

struct drain_options {
  std::string file;
  bool size = false;
  output_options out;
};

// Case pressure at every temperature of the range for a line (drain flow constant, or scaled as
// 1/viscosity from the reference temperature).
std::vector<pumploss::drain_point<double>> check_line(const pumploss::line<double>& l, const drain_line_spec& d,
                                                      const std::vector<double>& temps,
                                                      const std::vector<double>& flows,
                                                      pumploss::drain_summary<double>& sum) {
  std::vector<pumploss::drain_point<double>> pts(temps.size());
  const auto& oil = d.oil.props;
  if (d.flow_with_temperature == "constant") {
    sum = pumploss::drain_check(l, oil, flows.front(), temps.front(), temps.back(), static_cast<int>(temps.size()),
                                d.tank_pressure_pa, d.max_case_pressure_pa, pts.data());
    return pts;
  }
  sum = {true, 0.0, 0.0, status::ok};
  for (std::size_t i = 0; i < temps.size(); ++i) {
    const auto s = pumploss::drain_check(l, oil, flows[i], temps[i], temps[i], 1, d.tank_pressure_pa,
                                         d.max_case_pressure_pa, &pts[i]);
    if (pumploss::is_error(s.st)) {
      sum = s;
      return pts;
    }
    sum.pass = sum.pass && s.pass;
    if (i == 0 || s.worst_margin_pa < sum.worst_margin_pa) {
      sum.worst_margin_pa = s.worst_margin_pa;
      sum.worst_t_k = s.worst_t_k;
    }
    sum.st = pumploss::worst(sum.st, s.st);
  }
  return pts;
}

int run_drain_line(const drain_options& o) {
  const display_units du = make_units(o.out);
  const auto d = read_drain_line(o.file);
  const auto& oil = d.oil.props;

  // the line, element by element, with a name for each
  pumploss::line<double> l;
  l.height_m = d.outlet_height_m;
  std::vector<std::string> names;
  for (const auto& s : d.segments) {
    l.elements.push_back(pumploss::line_pipe(s.inside_diameter_m, s.length_m, s.roughness_m));
    names.push_back(s.name + " (" + s.kind + ")");
  }
  for (const auto& f : d.fittings)
    for (long k = 0; k < f.count; ++k) {
      l.elements.push_back(f.k1 ? pumploss::line_fitting_hooper(f.inside_diameter_m, *f.k1, *f.k_inf)
                                : pumploss::line_fitting_k(f.inside_diameter_m, f.k));
      names.push_back(f.count > 1 ? fmt::format("{} ({} of {})", f.name, k + 1, f.count) : f.name);
    }
  for (const auto& c : d.components) {
    std::vector<double> qs, ps;
    for (const auto& [qq, pp] : c.curve) {
      qs.push_back(qq);
      ps.push_back(pp);
    }
    const auto e = pumploss::line_component_points(static_cast<int>(qs.size()), qs.data(), ps.data(), c.curve_nu_m2_s,
                                                   c.scaling == "laminar" ? 1.0 : 0.0);
    if (!e.usable())
      throw std::runtime_error(o.file + ": component '" + c.name +
                               "': " + pumploss::status_message(static_cast<int>(e.st)));
    l.elements.push_back(e.value);
    names.push_back(c.name);
  }

  // temperatures and the drain flow at each
  const auto temps = d.temperatures.values();
  std::vector<double> flows(temps.size(), d.drain_flow_m3_s);
  if (d.flow_with_temperature == "laminar") {
    const auto nu_ref = pumploss::oil_kinematic_viscosity(oil, *d.flow_reference_k);
    for (std::size_t i = 0; i < temps.size(); ++i) {
      const auto nu = pumploss::oil_kinematic_viscosity(oil, temps[i]);
      if (!nu.usable() || !nu_ref.usable())
        throw std::runtime_error(o.file + ": no oil viscosity at " + show_quantity(temps[i], D::temperature, du));
      flows[i] = d.drain_flow_m3_s * nu_ref.value / nu.value;
    }
  }

  pumploss::drain_summary<double> sum{};
  const auto pts = check_line(l, d, temps, flows, sum);
  if (pumploss::is_error(sum.st))
    throw std::runtime_error(o.file + ": the drain line cannot be evaluated: " +
                             pumploss::status_message(static_cast<int>(sum.st)));

  report r;
  r.title = "Case drain line check: " + d.pump_name;
  double length = 0;
  for (const auto& s : d.segments) length += s.length_m;
  r.facts.emplace_back("Line", fmt::format("{} ({} segments, {} in all; {} fittings and components; outlet {} above "
                                           "the case port)",
                                           o.file, d.segments.size(), show_quantity(length, D::length, du, 3),
                                           l.elements.size() - d.segments.size(),
                                           show_quantity(d.outlet_height_m, D::length, du, 3)));
  r.facts.emplace_back("Oil", d.oil.name);
  r.facts.emplace_back("Drain flow",
                       show_quantity(d.drain_flow_m3_s, D::volume_flow, du) +
                           (d.flow_with_temperature == "constant"
                                ? std::string(", the same at every temperature")
                                : " at " + show_quantity(*d.flow_reference_k, D::temperature, du, 3) +
                                      ", scaled as 1/viscosity (laminar leakage)"));
  r.facts.emplace_back("Allowed case pressure", show_quantity(d.max_case_pressure_pa, D::pressure, du, 3) +
                                                    " (tank " + show_quantity(d.tank_pressure_pa, D::pressure, du, 3) +
                                                    ")");
  r.facts.emplace_back("Verdict",
                       fmt::format("{} from {} to {}; smallest margin {} at {}", sum.pass ? "PASS" : "FAIL",
                                   show_quantity(temps.front(), D::temperature, du, 3),
                                   show_quantity(temps.back(), D::temperature, du, 3),
                                   show_quantity(sum.worst_margin_pa, D::pressure, du, 3),
                                   show_quantity(sum.worst_t_k, D::temperature, du, 3)));
  std::string vel;
  for (const auto& s : d.segments) {
    const auto v = pumploss::pipe_velocity(*std::max_element(flows.begin(), flows.end()), s.inside_diameter_m);
    vel += (vel.empty() ? "" : "; ") + s.name + " " + show_quantity(v.value, D::velocity, du, 3);
  }
  r.facts.emplace_back("Mean velocity", vel);

  table t;
  t.name = "check";
  t.title = "Case pressure per temperature";
  t.cols = {{"temperature", cell_kind::quantity, D::temperature, 3},
            {"viscosity", cell_kind::quantity, D::kinematic_viscosity, 4},
            {"drain flow", cell_kind::quantity, D::volume_flow, 3},
            {"case pressure", cell_kind::quantity, D::pressure, 3},
            {"allowed", cell_kind::quantity, D::pressure, 3},
            {"margin", cell_kind::quantity, D::pressure, 3},
            {"verdict", cell_kind::text, D::pressure, 0},
            {"status", cell_kind::text, D::pressure, 0}};
  svg::series described{"line as described", {}, {}, true, true, false};
  for (std::size_t i = 0; i < pts.size(); ++i) {
    t.rows.push_back({pts[i].t_k, pts[i].nu_m2_s, flows[i], pts[i].case_pressure_pa, d.max_case_pressure_pa,
                      pts[i].margin_pa, std::string(pts[i].pass ? "pass" : "FAIL"), status_text(pts[i].st)});
    described.x.push_back(du.show(pts[i].t_k, D::temperature));
    described.y.push_back(du.show(pts[i].case_pressure_pa, D::pressure));
  }

  // share of each element at the coldest temperature (the worst case for a laminar line)
  std::vector<double> edp(l.elements.size());
  const auto drop = pumploss::line_pressure_drop_at(l, flows.front(), oil, temps.front(), edp.data());
  table te;
  te.name = "elements";
  te.title = "Pressure drop of each element at " + show_quantity(temps.front(), D::temperature, du, 3);
  te.cols = {{"element", cell_kind::text, D::pressure, 0},
             {"pressure drop", cell_kind::quantity, D::pressure, 3},
             {"share", cell_kind::percent, D::pressure, 3}};
  const double friction = drop.dp_pa - drop.dp_static_pa;
  for (std::size_t k = 0; k < l.elements.size(); ++k)
    te.rows.push_back({names[k], edp[k], friction > 0 ? edp[k] / drop.dp_pa : 0.0});
  te.rows.push_back({std::string("static height"), drop.dp_static_pa, drop.dp_pa > 0 ? drop.dp_static_pa / drop.dp_pa : 0.0});

  svg::plot p;
  p.title = "Case pressure of " + d.pump_name + " over oil temperature";
  p.subtitle = fmt::format("drain flow {}; pumploss {}", show_quantity(d.drain_flow_m3_s, D::volume_flow, du, 3),
                           pumploss::version_string);
  p.x.label = std::string("oil temperature [") + du.of(D::temperature).symbol + "]";
  p.y.label = std::string("case pressure [") + du.of(D::pressure).symbol + "]";
  p.lines.push_back(described);
  p.limits.push_back({du.show(d.max_case_pressure_pa, D::pressure),
                      "allowed " + show_quantity(d.max_case_pressure_pa, D::pressure, du, 3)});

  if (o.size) {
    const double q_size = *std::max_element(flows.begin(), flows.end());
    const double v_max =
        d.max_velocity_m_s.value_or(pumploss::recommended_velocity(pumploss::line_service::drain).max_m_s);
    const auto z = pumploss::size_drain_line(l, oil, q_size, temps.front(), temps.back(),
                                             std::max(2, static_cast<int>(temps.size())), d.tank_pressure_pa,
                                             d.max_case_pressure_pa, v_max, d.sizing_kinds);
    const char* kinds = d.sizing_kinds == 1 ? "tubes" : (d.sizing_kinds == 2 ? "hoses" : "tubes and hoses");
    if (z.st == status::out_of_validity) {
      r.facts.emplace_back("Smallest standard bore",
                           fmt::format("none of the standard {} passes at {} and at most {}", kinds,
                                       show_quantity(q_size, D::volume_flow, du, 3),
                                       show_quantity(v_max, D::velocity, du, 3)));
    } else if (pumploss::is_error(z.st)) {
      throw std::runtime_error(o.file + ": sizing failed: " + pumploss::status_message(static_cast<int>(z.st)));
    } else {
      const auto& b = pumploss::standard_bores[z.bore_index];
      r.facts.emplace_back(
          "Smallest standard bore",
          fmt::format("{} ({} inside) for every pipe and fitting: velocity {}, smallest margin {} at {} (of the "
                      "standard {}, at most {}; components keep their curves)",
                      b.name, show_quantity(z.diameter_m, D::length, du, 3),
                      show_quantity(z.velocity_m_s, D::velocity, du, 3),
                      show_quantity(z.worst_margin_pa, D::pressure, du, 3),
                      show_quantity(z.worst_t_k, D::temperature, du, 3), kinds,
                      show_quantity(v_max, D::velocity, du, 3)));
      auto l2 = l;
      for (auto& e : l2.elements)
        if (e.kind != pumploss::line_element_kind::component_points &&
            e.kind != pumploss::line_element_kind::component_power)
          e.diameter_m = z.diameter_m;
      pumploss::drain_summary<double> s2{};
      const auto p2 = check_line(l2, d, temps, flows, s2);
      svg::series sized{std::string("with ") + b.name, {}, {}, true, true, true};
      t.cols.push_back({std::string("case pressure ") + b.name, cell_kind::quantity, D::pressure, 3});
      for (std::size_t i = 0; i < p2.size(); ++i) {
        sized.x.push_back(du.show(p2[i].t_k, D::temperature));
        sized.y.push_back(du.show(p2[i].case_pressure_pa, D::pressure));
        t.rows[i].push_back(p2[i].case_pressure_pa);
      }
      p.lines.push_back(sized);
    }
    if (d.flow_with_temperature == "laminar")
      r.notes.push_back("sizing used the largest drain flow of the range at every temperature (conservative)");
  }
  r.tables.push_back(std::move(t));
  r.tables.push_back(std::move(te));
  if (sum.st != status::ok)
    r.notes.push_back("some elements were evaluated outside their method's assumptions (see the status column)");
  r.notes.push_back("case pressure = tank pressure + static height + friction of pipes, fittings and components "
                    "(Darcy-Weisbach with the library's friction factor); the drain flow is taken as independent of "
                    "the case pressure");

  output_set files;
  files.add("drain_line.svg", p.render());
  emit(r, files, o.out, du, "drain_line");
  return exit_ok;
}

}  // namespace

void add_drain_line(CLI::App& app, int& rc) {
  auto o = std::make_shared<drain_options>();
  auto* sub = app.add_subcommand("drain-line",
                                 "Check a case drain line against the allowed case pressure from cold start to "
                                 "hot, and size it");
  sub->add_option("file", o->file, "Drain-line description (TOML)")->required()->check(CLI::ExistingFile);
  sub->add_flag("--size", o->size,
                "Also find the smallest standard tube or hose bore that passes over the whole temperature range");
  add_output_options(*sub, o->out);
  sub->callback([o, &rc] { rc = run_drain_line(*o); });
}

}  // namespace plcli
