// pumploss oil: kinematic and dynamic viscosity and density of a hydraulic oil over temperature
// (ASTM D341 line through two points, or an ISO VG grade plus one point), checked against the
// pump maker's viscosity limits when the oil file gives them (pumploss::tabulate_oil); table,
// CSV and an SVG plot.
#include <CLI/CLI.hpp>
#include <fmt/format.h>

#include <cmath>
#include <cstdio>

#include "commands.hpp"
#include "common.hpp"
#include "inputs.hpp"
#include "pumploss/fluid.hpp"
#include "pumploss/workflows.hpp"
#include "pumploss/version.hpp"
#include "svg.hpp"

namespace plcli {

namespace {

using D = pumploss::dimension;

struct oil_options {
  std::string file;
  int grade = 0;
  std::vector<std::string> points;  // pairs: temperature, viscosity
  std::string from, to, step;
  std::vector<std::string> at;
  output_options out;
};

double cli_quantity(const std::string& option, const std::string& text, D dim) {
  try {
    return quantity_si(text, dim);
  } catch (const std::invalid_argument& e) {
    throw std::invalid_argument("oil " + option + ": " + e.what());
  }
}

int run_oil(const oil_options& o) {
  const display_units du = make_units(o.out);
  oil_file f;
  if (!o.file.empty()) {
    if (o.grade != 0 || !o.points.empty())
      throw std::invalid_argument("oil: give the oil either in a file or by --grade/--point, not both");
    f = read_oil_file(o.file);
  } else {
    std::vector<std::pair<double, double>> pts;
    if (o.points.size() % 2 != 0) throw std::invalid_argument("oil --point: give TEMPERATURE VISCOSITY pairs");
    for (std::size_t k = 0; k + 1 < o.points.size(); k += 2)
      pts.emplace_back(cli_quantity("--point", o.points[k], D::temperature),
                       cli_quantity("--point", o.points[k + 1], D::kinematic_viscosity));
    std::optional<int> grade;
    if (o.grade != 0) {
      if (!pumploss::iso_vg(o.grade).usable())
        throw std::invalid_argument("oil --grade: " + std::to_string(o.grade) + " is not an ISO 3448 grade");
      grade = o.grade;
    }
    try {
      f.oil = make_oil(grade, pts);
    } catch (const std::invalid_argument& e) {
      throw std::invalid_argument(std::string("oil: ") + e.what());
    }
  }

  std::vector<double> temps;
  if (!o.at.empty()) {
    if (!o.from.empty() || !o.to.empty() || !o.step.empty())
      throw std::invalid_argument("oil: give either --at or --from/--to/--step");
    for (const auto& a : o.at) temps.push_back(cli_quantity("--at", a, D::temperature));
  } else if (!o.from.empty() || !o.to.empty() || !o.step.empty()) {
    if (o.from.empty() || o.to.empty() || o.step.empty())
      throw std::invalid_argument("oil: --from, --to and --step go together");
    temperature_range r;
    r.from_k = cli_quantity("--from", o.from, D::temperature);
    r.to_k = cli_quantity("--to", o.to, D::temperature);
    try {
      r.step_k = temperature_difference_k(o.step);
    } catch (const std::invalid_argument& e) {
      throw std::invalid_argument(std::string("oil --step: ") + e.what());
    }
    if (!(r.step_k > 0) || !(r.to_k >= r.from_k) || (r.to_k - r.from_k) / r.step_k > 1000)
      throw std::invalid_argument("oil: need --step > 0, --to >= --from and at most 1000 temperatures");
    temps = r.values();
  } else if (f.temperatures) {
    temps = f.temperatures->values();
  } else {
    temps = temperature_range{}.values();  // 0 to 100 degC in 10 K steps
  }

  const auto& oil = f.oil.props;
  report r;
  r.title = "Oil properties: " + f.oil.name;
  if (!f.oil.file.empty()) r.facts.emplace_back("Oil file", f.oil.file);
  r.facts.emplace_back("Viscosity points", show_quantity(f.oil.nu1_m2_s, D::kinematic_viscosity, du) + " at " +
                                               show_quantity(f.oil.t1_k, D::temperature, du) + ", " +
                                               show_quantity(f.oil.nu2_m2_s, D::kinematic_viscosity, du) + " at " +
                                               show_quantity(f.oil.t2_k, D::temperature, du));
  r.facts.emplace_back("ASTM D341 line", fmt::format("log10 log10 Z = {:.5f} - {:.5f} log10 T, T in K", oil.viscosity.a,
                                                     oil.viscosity.b));
  pumploss::viscosity_limits lim;
  if (f.min_nu_m2_s) lim.min_m2_s = *f.min_nu_m2_s;
  if (f.max_nu_m2_s) lim.max_m2_s = *f.max_nu_m2_s;
  if (f.max_start_nu_m2_s) lim.max_start_m2_s = *f.max_start_nu_m2_s;
  const auto tab = pumploss::tabulate_oil(oil, temps, lim, f.oil.grade.value_or(0));
  if (pumploss::is_error(tab.st)) {
    if (tab.failed_row < temps.size())
      throw std::invalid_argument(fmt::format("oil: no properties at {}: {}",
                                              show_quantity(temps[tab.failed_row], D::temperature, du),
                                              pumploss::status_message(static_cast<int>(tab.st))));
    throw std::invalid_argument(std::string("oil: ") + pumploss::status_message(static_cast<int>(tab.st)));
  }
  if (f.oil.grade) {
    const auto g = pumploss::iso_vg(*f.oil.grade).value;
    r.facts.emplace_back(
        "ISO 3448 grade",
        fmt::format("VG {}: {} at {}, band {} to {}: {}", g.grade,
                    show_quantity(tab.nu40_m2_s, D::kinematic_viscosity, du), show_quantity(313.15, D::temperature, du, 3),
                    show_quantity(g.min_m2_s, D::kinematic_viscosity, du),
                    show_quantity(g.max_m2_s, D::kinematic_viscosity, du), tab.inside_grade ? "inside" : "OUTSIDE"));
  }
  r.facts.emplace_back("Density", show_quantity(oil.rho_ref_kg_m3, D::density, du) + " at " +
                                      show_quantity(oil.t_ref_k, D::temperature, du) +
                                      fmt::format(", expansion {:.2e} 1/K", oil.alpha_per_k));
  if (!f.oil.assumed.empty()) {
    std::string a;
    for (const auto& s : f.oil.assumed) a += (a.empty() ? "" : ", ") + s;
    r.facts.emplace_back("Typical values used for", a + " (typical mineral oil, see pumploss::typical_mineral_oil)");
  }
  const bool have_limits = f.min_nu_m2_s || f.max_nu_m2_s || f.max_start_nu_m2_s;
  if (have_limits) {
    std::string l;
    if (f.min_nu_m2_s) l += "min " + show_quantity(*f.min_nu_m2_s, D::kinematic_viscosity, du);
    if (f.max_nu_m2_s) l += (l.empty() ? "" : ", ") + ("max running " + show_quantity(*f.max_nu_m2_s, D::kinematic_viscosity, du));
    if (f.max_start_nu_m2_s)
      l += (l.empty() ? "" : ", ") + ("max at start " + show_quantity(*f.max_start_nu_m2_s, D::kinematic_viscosity, du));
    if (!f.limits_source.empty()) l += "; source: " + f.limits_source;
    r.facts.emplace_back("Viscosity limits", l);
  }

  table t;
  t.name = "properties";
  t.cols = {{"temperature", cell_kind::quantity, D::temperature, 3},
            {"kinematic viscosity", cell_kind::quantity, D::kinematic_viscosity, 4},
            {"dynamic viscosity", cell_kind::quantity, D::dynamic_viscosity, 4},
            {"density", cell_kind::quantity, D::density, 4}};
  if (have_limits) t.cols.push_back({"viscosity check", cell_kind::text, D::pressure, 0});
  svg::series nu_series{"kinematic viscosity", {}, {}, true, true, false};
  for (const auto& row : tab.rows) {
    std::vector<cell> cells = {row.t_k, row.nu_m2_s, row.mu_pa_s, row.rho_kg_m3};
    if (have_limits) {
      using V = pumploss::viscosity_verdict;
      cells.emplace_back(row.verdict == V::too_thick_to_start ? "TOO THICK to start"
                         : row.verdict == V::start_only       ? "start only (above running max)"
                         : row.verdict == V::too_thin         ? "TOO THIN (below min)"
                                                              : "ok");
    }
    t.rows.push_back(std::move(cells));
    nu_series.x.push_back(du.show(row.t_k, D::temperature));
    nu_series.y.push_back(du.show(row.nu_m2_s, D::kinematic_viscosity));
  }
  const bool regime = tab.st != pumploss::status::ok;
  r.tables.push_back(std::move(t));
  if (regime)
    r.notes.push_back("some temperatures lie outside the range where the viscosity or density relation is stated "
                      "(values shown, flagged by the library)");
  r.notes.push_back("viscosity by ASTM D341 through the two points; density by a linear expansion from the "
                    "reference temperature; at zero gauge pressure");

  svg::plot p;
  p.title = "Viscosity of " + f.oil.name;
  p.subtitle = fmt::format("ASTM D341 line; pumploss {}", pumploss::version_string);
  p.x.label = std::string("oil temperature [") + du.of(D::temperature).symbol + "]";
  p.y.label = std::string("kinematic viscosity [") + du.of(D::kinematic_viscosity).symbol + "]";
  p.y.log = true;
  p.lines.push_back(nu_series);
  auto limit = [&](const std::optional<double>& v, const char* what) {
    if (v)
      p.limits.push_back({du.show(*v, D::kinematic_viscosity),
                          std::string(what) + " " + show_quantity(*v, D::kinematic_viscosity, du, 3)});
  };
  limit(f.min_nu_m2_s, "min");
  limit(f.max_nu_m2_s, "max running");
  limit(f.max_start_nu_m2_s, "max at start");
  output_set files;
  files.add("oil_viscosity.svg", p.render());
  emit(r, files, o.out, du, "oil");
  return exit_ok;
}

}  // namespace

void add_oil(CLI::App& app, int& rc) {
  auto o = std::make_shared<oil_options>();
  auto* sub = app.add_subcommand(
      "oil", "Oil viscosity and density at temperature (ASTM D341), from an oil file or from the command line");
  sub->add_option("file", o->file, "Oil file (TOML with [oil], optional [temperatures] and [limits])")
      ->check(CLI::ExistingFile);
  sub->add_option("--grade", o->grade, "ISO 3448 viscosity grade (its mid-point sets the 40 degC point)");
  sub->add_option("--point", o->points,
                  "A known point: TEMPERATURE VISCOSITY, e.g. --point \"100 degC\" \"6.9 cSt\" (once with "
                  "--grade, twice without)")
      ->expected(2)
      ->multi_option_policy(CLI::MultiOptionPolicy::TakeAll);
  sub->add_option("--from", o->from, "First temperature, e.g. \"0 degC\"");
  sub->add_option("--to", o->to, "Last temperature, e.g. \"80 degC\"");
  sub->add_option("--step", o->step, "Temperature step, e.g. \"5 K\"");
  sub->add_option("--at", o->at, "Single temperatures instead of a range (repeatable)");
  add_output_options(*sub, o->out);
  sub->callback([o, &rc] { rc = run_oil(*o); });
}

}  // namespace plcli
