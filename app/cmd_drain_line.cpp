// pumploss drain-line (one library call, pumploss::check_drain_line()): the case pressure a drain line causes from cold start to hot, with the
// drain flow over temperature and an optional destroke peak, against the maker's continuous and
// peak case pressure limits (the failing temperature ranges named), the share of each element,
// the lowest start temperature, and with --size the smallest standard bore that passes (or why
// none can); SVG of case pressure over temperature with the limits drawn and the case-drain
// caution at its foot.
#include <CLI/CLI.hpp>
#include <fmt/format.h>

#include <algorithm>
#include <cmath>
#include <functional>

#include "commands.hpp"
#include "common.hpp"
#include "inputs.hpp"
#include "pumploss/drain_check.hpp"
#include "pumploss/line.hpp"
#include "pumploss/version.hpp"
#include "pumploss/workflows.hpp"
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

/// The case-drain caution, in every drain-line report and at the foot of its plot.
const char* const drain_caution[] = {
    "CASE DRAIN: never block, cap or valve a case drain. Filters, coolers, check valves or meters belong in it only",
    "where the pump maker allows them, sized for the cold-start flow. Case pressure over the maker's limit blows the",
    "shaft seal. Fit meters only with the machine stopped and the pressure relieved. A passing check is not a",
    "clearance to run: the maker's limits and instructions govern."};

/// A short status for the table columns (the notes explain).
std::string short_status(status st) {
  switch (st) {
    case status::ok: return "ok";
    case status::regime: return "outside a method's range";
    case status::transition: return "laminar-turbulent transition";
    case status::extrapolated: return "extrapolated";
    default: return status_text(st);
  }
}

std::string caution_text() {
  std::string s;
  for (const char* l : drain_caution) s += (s.empty() ? "" : " ") + std::string(l);
  return s;
}

/// The line in flow order: each segment followed by the fittings that follow it, then the
/// components. A fitting without its own bore takes the bore of the element it follows.
pumploss::line<double> build_line(const drain_line_spec& d, const std::string& file, std::vector<std::string>& names) {
  pumploss::line<double> l;
  l.height_m = d.outlet_height_m;
  for (std::size_t i = 0; i < d.segments.size(); ++i) {
    const auto& s = d.segments[i];
    l.elements.push_back(pumploss::line_pipe(s.inside_diameter_m, s.length_m, s.roughness_m));
    names.push_back(s.name + " (" + s.kind + ")");
    for (const auto& f : d.fittings) {
      if (f.after_segment != i) continue;
      pumploss::line_element<double> e;
      std::string how;
      if (f.type == "exit") {
        e = pumploss::line_exit(f.inside_diameter_m);
        how = "exit, K = 2 laminar / 1 turbulent";
      } else if (!f.type.empty()) {
        const int k = static_cast<int>(std::find_if(std::begin(pumploss::fitting_table), std::end(pumploss::fitting_table),
                                                    [&](const auto& c) { return f.type == c.name; }) -
                                       std::begin(pumploss::fitting_table));
        const auto m = f.method == "hooper" ? pumploss::fitting_method::hooper_2k : pumploss::fitting_method::darby_3k;
        const auto r = pumploss::line_fitting_named(f.inside_diameter_m, static_cast<pumploss::fitting_type>(k), m);
        if (!r.usable())
          throw std::runtime_error(file + ": fitting '" + f.name + "': no " + f.method + " constants for " + f.type);
        e = r.value;
        how = f.type + (f.method == "hooper" ? ", Hooper 2-K" : ", Darby 3-K");
      } else if (f.k1) {
        e = pumploss::line_fitting_hooper(f.inside_diameter_m, *f.k1, *f.k_inf);
        how = "2-K";
      } else {
        e = pumploss::line_fitting_k(f.inside_diameter_m, f.k);
        how = fmt::format("constant K = {}", f.k);
      }
      for (long c = 0; c < f.count; ++c) {
        l.elements.push_back(e);
        names.push_back((f.count > 1 ? fmt::format("{} ({} of {})", f.name, c + 1, f.count) : f.name) + " [" + how +
                        "]");
      }
    }
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
      throw std::runtime_error(file + ": component '" + c.name +
                               "': " + pumploss::status_message(static_cast<int>(e.st)));
    l.elements.push_back(e.value);
    names.push_back(c.name + " [component]");
  }
  return l;
}

pumploss::drain_flow<double> flow_model(const drain_line_spec& d, const std::string& file) {
  pumploss::drain_flow<double> f;
  if (d.flow_with_temperature == "table") {
    std::vector<double> ts, qs;
    for (const auto& [t, q] : d.flow_table) {
      ts.push_back(t);
      qs.push_back(q);
    }
    const auto r = pumploss::drain_flow_table(ts.size(), ts.data(), qs.data());
    if (!r.usable()) throw std::runtime_error(file + ": [flow] table: " + pumploss::status_message(static_cast<int>(r.st)));
    f = r.value;
  } else {
    f = pumploss::drain_flow_parts(d.flow_constant_m3_s, d.flow_laminar_m3_s, d.flow_reference_k.value_or(0.0));
  }
  return pumploss::with_destroke_peak(f, d.peak_volume_m3, d.peak_time_s);
}

/// "0.00 degC to 23.4 degC, 61.0 degC to 70.0 degC"
template <std::size_t N>
std::string ranges_text(int n, const std::array<pumploss::drain_range<double>, N>& r, const display_units& du) {
  std::string s;
  for (int i = 0; i < n; ++i)
    s += (i == 0 ? "" : ", ") + show_quantity(r[static_cast<std::size_t>(i)].from_k, D::temperature, du, 3) + " to " +
         show_quantity(r[static_cast<std::size_t>(i)].to_k, D::temperature, du, 3);
  return s;
}

std::string verdict_text(const pumploss::drain_summary<double>& s, double t0, double t1, const display_units& du) {
  if (s.pass && s.pass_peak)
    return fmt::format("PASS at every temperature from {} to {}; smallest margin {} at {}",
                       show_quantity(t0, D::temperature, du, 3), show_quantity(t1, D::temperature, du, 3),
                       show_quantity(s.worst_margin_pa, D::pressure, du, 3),
                       show_quantity(s.worst_t_k, D::temperature, du, 3));
  std::string v = "FAIL";
  if (!s.pass)
    v += fmt::format(" at {} (continuous limit; smallest margin {} at {})", ranges_text(s.n_fail, s.fail, du),
                     show_quantity(s.worst_margin_pa, D::pressure, du, 3),
                     show_quantity(s.worst_t_k, D::temperature, du, 3));
  if (!s.pass_peak)
    v += fmt::format("{} on destroke at {} (peak limit; smallest margin {} at {})", s.pass ? "" : ";",
                     ranges_text(s.n_fail_peak, s.fail_peak, du),
                     show_quantity(s.worst_margin_peak_pa, D::pressure, du, 3),
                     show_quantity(s.worst_peak_t_k, D::temperature, du, 3));
  if (s.ranges_truncated) v += " (and further ranges)";
  if (s.pass) v += "; the continuous limit holds at every temperature";
  if (s.pass_peak && s.peak_checked) v += "; the peak limit holds at every temperature";
  return v + fmt::format(" (checked from {} to {})", show_quantity(t0, D::temperature, du, 3),
                         show_quantity(t1, D::temperature, du, 3));
}

/// The fixed elements that alone exceed a limit, each named: "filter [component] (1.2 bar at 0 degC), the static height (...)"
std::string fixed_alone_text(const pumploss::drain_line_result& w, const std::function<std::string(int)>& element_name,
                             const display_units& du) {
  std::string s;
  int n = 0;
  for (const auto& a : w.fixed_alone) {
    if (!a.usable() || !a.exceeds) continue;
    s += (s.empty() ? "" : ", ") + element_name(a.element) + " (" + show_quantity(a.dp_pa, D::pressure, du, 3) +
         " at " + show_quantity(a.t_k, D::temperature, du, 3) + (a.at_peak ? " on destroke" : "") + ")";
    ++n;
  }
  if (n == 0) return "none of them alone exceeds a limit, only together";
  return (n == 1 ? "alone above the limit: " : fmt::format("each alone above the limit ({} of them): ", n)) + s;
}

int run_drain_line(const drain_options& o) {
  const display_units du = make_units(o.out);
  const auto d = read_drain_line(o.file);
  std::vector<std::string> names;
  pumploss::drain_line_case c;
  c.drain_line = build_line(d, o.file, names);
  c.fluid = d.oil.props;
  c.flow = flow_model(d, o.file);
  const bool peak = d.peak_volume_m3 > 0;
  c.limits = {d.tank_pressure_pa, d.max_case_pressure_pa, d.max_peak_case_pressure_pa.value_or(d.max_case_pressure_pa)};
  const auto temps = d.temperatures.values();
  c.t_cold_k = temps.front();
  c.t_max_k = temps.back();
  c.n_temps = static_cast<int>(temps.size());
  c.max_start_viscosity_m2_s = d.max_start_viscosity_m2_s.value_or(0.0);
  c.size = o.size;
  if (d.max_velocity_m_s) c.max_velocity_m_s = *d.max_velocity_m_s;
  c.sizing_kinds = d.sizing_kinds;
  const auto w = pumploss::check_drain_line(c);  // the one library call
  if (pumploss::is_error(w.st))
    throw std::runtime_error(o.file + ": the drain line cannot be evaluated: " +
                             pumploss::status_message(static_cast<int>(w.st)));
  const auto& l = c.drain_line;
  const auto& lim = c.limits;
  const auto& sum = w.summary;
  const auto& pts = w.points;
  const double t0 = c.t_cold_k, t1 = c.t_max_k;

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
  std::string flow_text;
  if (d.flow_with_temperature == "table")
    flow_text = fmt::format("given at {} temperatures (linear between; the end values held outside)",
                            d.flow_table.size());
  else if (d.flow_laminar_m3_s > 0)
    flow_text = fmt::format("{} constant (controller) + {} laminar at {}, scaled by mu({})/mu(T)",
                            show_quantity(d.flow_constant_m3_s, D::volume_flow, du, 3),
                            show_quantity(d.flow_laminar_m3_s, D::volume_flow, du, 3),
                            show_quantity(*d.flow_reference_k, D::temperature, du, 3),
                            show_quantity(*d.flow_reference_k, D::temperature, du, 3));
  else
    flow_text = show_quantity(d.flow_constant_m3_s, D::volume_flow, du) + ", the same at every temperature";
  r.facts.emplace_back("Drain flow", flow_text);
  if (peak)
    r.facts.emplace_back("Destroke peak",
                         fmt::format("{} dumped in {} s: {} on top of the drain flow",
                                     show_quantity(d.peak_volume_m3, D::volume, du, 3), format_sig(d.peak_time_s, 3),
                                     show_quantity(d.peak_volume_m3 / d.peak_time_s, D::volume_flow, du, 3)));
  r.facts.emplace_back("Allowed case pressure",
                       show_quantity(d.max_case_pressure_pa, D::pressure, du, 3) + " continuous" +
                           (peak ? ", " + show_quantity(lim.p_allowed_peak_pa, D::pressure, du, 3) + " peak" : "") +
                           " (tank " + show_quantity(d.tank_pressure_pa, D::pressure, du, 3) + ")");
  r.facts.emplace_back("Verdict", verdict_text(sum, t0, t1, du));

  const auto& start = w.start;
  if (start.st == status::out_of_validity) {
    r.facts.emplace_back("Lowest start temperature",
                         "none up to " + show_quantity(t1, D::temperature, du, 3) + ": the line fails at the top");
  } else if (!pumploss::is_error(start.st)) {
    std::string why = start.t_line_k > t0 ? "the line passes from " + show_quantity(start.t_line_k, D::temperature, du, 3)
                                          : "the line passes from " + show_quantity(t0, D::temperature, du, 3) + " up";
    if (d.max_start_viscosity_m2_s)
      why += "; the oil reaches the maker's start limit " +
             show_quantity(*d.max_start_viscosity_m2_s, D::kinematic_viscosity, du, 4) + " at " +
             show_quantity(start.t_viscosity_k, D::temperature, du, 3) + " (" + d.start_viscosity_source + ")";
    r.facts.emplace_back("Lowest start temperature",
                         show_quantity(start.t_start_k, D::temperature, du, 3) + " (" + why + ")");
  }
  std::string vel;
  for (std::size_t k = 0; k < d.segments.size() && k < w.pipe_velocity_m_s.size(); ++k)
    vel += (vel.empty() ? "" : "; ") + d.segments[k].name + " " +
           show_quantity(w.pipe_velocity_m_s[k], D::velocity, du, 3);
  r.facts.emplace_back("Mean velocity", vel + " (largest continuous drain flow)");

  table t;
  t.name = "check";
  t.title = "Case pressure per temperature";
  t.cols = {{"temperature", cell_kind::quantity, D::temperature, 3},
            {"viscosity", cell_kind::quantity, D::kinematic_viscosity, 4},
            {"drain flow", cell_kind::quantity, D::volume_flow, 3},
            {"case pressure", cell_kind::quantity, D::pressure, 3},
            {"allowed", cell_kind::quantity, D::pressure, 3},
            {"margin", cell_kind::quantity, D::pressure, 3},
            {"verdict", cell_kind::text, D::pressure, 0}};
  if (peak) {
    t.cols.push_back({"peak case pressure", cell_kind::quantity, D::pressure, 3});
    t.cols.push_back({"peak allowed", cell_kind::quantity, D::pressure, 3});
    t.cols.push_back({"peak verdict", cell_kind::text, D::pressure, 0});
  }
  t.cols.push_back({"status", cell_kind::text, D::pressure, 0});
  svg::series described{"continuous, line as described", {}, {}, true, true, false};
  svg::series described_peak{"on destroke, line as described", {}, {}, true, true, true};
  for (const auto& p : pts) {
    std::vector<cell> row{p.t_k, p.nu_m2_s, p.q_m3_s, p.case_pressure_pa, d.max_case_pressure_pa, p.margin_pa,
                          std::string(p.pass ? "pass" : "FAIL")};
    if (peak) {
      row.push_back(p.case_pressure_peak_pa);
      row.push_back(lim.p_allowed_peak_pa);
      row.push_back(std::string(p.pass_peak ? "pass" : "FAIL"));
    }
    row.push_back(short_status(p.st));
    t.rows.push_back(std::move(row));
    described.x.push_back(du.show(p.t_k, D::temperature));
    described.y.push_back(du.show(p.case_pressure_pa, D::pressure));
    described_peak.x.push_back(du.show(p.t_k, D::temperature));
    described_peak.y.push_back(du.show(p.case_pressure_peak_pa, D::pressure));
  }

  table te;
  te.name = "elements";
  te.title = "Pressure drop of each element at " + show_quantity(w.element_t_k, D::temperature, du, 3) + " and " +
             show_quantity(w.element_q_m3_s, D::volume_flow, du, 3) + (peak ? " (with the destroke peak)" : "");
  te.cols = {{"element", cell_kind::text, D::pressure, 0},
             {"pressure drop", cell_kind::quantity, D::pressure, 3},
             {"share", cell_kind::percent, D::pressure, 3},
             {"status", cell_kind::text, D::pressure, 0}};
  std::string constant_k_low;
  for (std::size_t k = 0; k < w.elements.size(); ++k) {
    const auto& e = w.elements[k];
    te.rows.push_back({names[k], e.dp_pa, e.share, short_status(e.st)});
    if (e.constant_k_laminar) constant_k_low += (constant_k_low.empty() ? "" : ", ") + names[k];
  }
  te.rows.push_back({std::string("static height"), w.dp_static_pa,
                     w.dp_total_pa > 0 ? w.dp_static_pa / w.dp_total_pa : 0.0, std::string("ok")});

  svg::plot p;
  p.title = "Case pressure of " + d.pump_name + " over oil temperature";
  p.subtitle = fmt::format("drain flow {} to {}{}; pumploss {}", show_quantity(w.q_min_m3_s, D::volume_flow, du, 3),
                           show_quantity(w.q_max_m3_s, D::volume_flow, du, 3),
                           peak ? ", destroke peak " + show_quantity(d.peak_volume_m3 / d.peak_time_s, D::volume_flow, du, 3) : "",
                           pumploss::version_string);
  p.x.label = std::string("oil temperature [") + du.of(D::temperature).symbol + "]";
  p.y.label = std::string("case pressure [") + du.of(D::pressure).symbol + "]";
  p.lines.push_back(described);
  if (peak) p.lines.push_back(described_peak);
  p.limits.push_back({du.show(d.max_case_pressure_pa, D::pressure),
                      "allowed " + show_quantity(d.max_case_pressure_pa, D::pressure, du, 3)});
  if (peak && lim.p_allowed_peak_pa != d.max_case_pressure_pa)
    p.limits.push_back({du.show(lim.p_allowed_peak_pa, D::pressure),
                        "peak allowed " + show_quantity(lim.p_allowed_peak_pa, D::pressure, du, 3)});
  for (const char* line : drain_caution) p.footer.emplace_back(line);

  if (w.sized) {
    const auto& z = w.sizing;
    const double v_max = c.max_velocity_m_s;
    const char* kinds = d.sizing_kinds == 1 ? "tubes" : (d.sizing_kinds == 2 ? "hoses" : "tubes and hoses");
    if (pumploss::is_error(z.st) && z.st != status::out_of_validity)
      throw std::runtime_error(o.file + ": sizing failed: " + pumploss::status_message(static_cast<int>(z.st)));
    const std::function<std::string(int)> element_name = [&](int k) {
      return k < 0 ? std::string("the static height") : names[static_cast<std::size_t>(k)];
    };
    if (z.fixed_exceeds) {
      r.facts.emplace_back(
          "Smallest standard bore",
          fmt::format("none can pass: the elements the bore does not change alone cause {} at {} (above the limit); "
                      "{}; the largest of them is {}: resize or replace it first (as its maker allows); no pipe or "
                      "fitting bore can make up for it",
                      show_quantity(z.fixed_dp_pa, D::pressure, du, 3), show_quantity(z.fixed_t_k, D::temperature, du, 3),
                      fixed_alone_text(w, element_name, du), element_name(z.fixed_dominant_element)));
    } else if (z.st == status::out_of_validity) {
      r.facts.emplace_back("Smallest standard bore",
                           fmt::format("none of the standard {} passes at most {}{}", kinds,
                                       show_quantity(v_max, D::velocity, du, 3),
                                       z.dominant_element >= 0
                                           ? "; with the largest bore tried, " + element_name(z.dominant_element) +
                                                 " dominates (" + show_quantity(z.dominant_dp_pa, D::pressure, du, 3) + ")"
                                           : std::string()));
    } else {
      const auto& b = pumploss::standard_bores[z.bore_index];
      r.facts.emplace_back(
          "Smallest standard bore",
          fmt::format("{} ({} inside) for every pipe and fitting: velocity {}, smallest margin {} at {}{} (of the "
                      "standard {}, at most {}; components keep their curves); largest drop then: {} ({} at {})",
                      b.name, show_quantity(z.diameter_m, D::length, du, 3),
                      show_quantity(z.velocity_m_s, D::velocity, du, 3),
                      show_quantity(z.worst_margin_pa, D::pressure, du, 3),
                      show_quantity(z.worst_t_k, D::temperature, du, 3),
                      peak ? ", peak margin " + show_quantity(z.worst_margin_peak_pa, D::pressure, du, 3) : "", kinds,
                      show_quantity(v_max, D::velocity, du, 3), element_name(z.dominant_element),
                      show_quantity(z.dominant_dp_pa, D::pressure, du, 3),
                      show_quantity(z.worst_t_k, D::temperature, du, 3)));
      const auto& p2 = w.sized_points;
      svg::series sized{std::string("continuous with ") + b.name, {}, {}, true, true, false};
      t.cols.insert(t.cols.end() - 1, {std::string("case pressure ") + b.name, cell_kind::quantity, D::pressure, 3});
      for (std::size_t i = 0; i < p2.size(); ++i) {
        sized.x.push_back(du.show(p2[i].t_k, D::temperature));
        sized.y.push_back(du.show(p2[i].case_pressure_pa, D::pressure));
        t.rows[i].insert(t.rows[i].end() - 1, p2[i].case_pressure_pa);
      }
      p.lines.push_back(sized);
    }
  }
  r.tables.push_back(std::move(t));
  r.tables.push_back(std::move(te));
  if (!constant_k_low.empty())
    r.notes.push_back("a constant K is a turbulent value, used here below Re = 10000 (status 'regime') for: " +
                      constant_k_low +
                      "; it understates the loss in laminar oil: give the fitting's kind (type = ...) for a "
                      "Reynolds-dependent K (Darby 3-K, Hooper 2-K)");
  else if (sum.st != status::ok)
    r.notes.push_back("some elements were evaluated outside their method's assumptions (see the status column)");
  r.notes.push_back("case pressure = tank pressure + static height + friction of pipes, fittings and components "
                    "(Darcy-Weisbach with the library's friction factor; fittings by Darby 3-K or Hooper 2-K; exit "
                    "with the kinetic energy factor); each fitting takes the bore of the element it follows unless "
                    "given its own; the drain flow is taken as independent of the case pressure");
  r.notes.push_back(caution_text());

  output_set files;
  files.add("drain_line.svg", p.render());
  emit(r, files, o.out, du, "drain_line");
  return exit_ok;
}

}  // namespace

void add_drain_line(CLI::App& app, int& rc) {
  auto o = std::make_shared<drain_options>();
  auto* sub = app.add_subcommand("drain-line",
                                 "Check a case drain line against the allowed continuous and peak case pressures "
                                 "from cold start to hot, find the lowest start temperature, and size the line. "
                                 "Never block, cap or valve a case drain.");
  sub->add_option("file", o->file, "Drain-line description (TOML)")->required()->check(CLI::ExistingFile);
  sub->add_flag("--size", o->size,
                "Also find the smallest standard tube or hose bore that passes over the whole temperature range");
  add_output_options(*sub, o->out);
  sub->callback([o, &rc] { rc = run_drain_line(*o); });
}

}  // namespace plcli
