// The subcommands whose calculations live in modules that are not in this build yet: test-stand
// analysis, drain-line check and sizing, health trend and leakage budget. Argument parsing and
// input reading are complete and tested; each ends with exit code 3 (exit_pending) and names
// the library functions it will call. Nothing is computed or written in their place.
#include <CLI/CLI.hpp>
#include <fmt/format.h>

#include <algorithm>
#include <cmath>
#include <cstdio>

#include "commands.hpp"
#include "common.hpp"
#include "inputs.hpp"

namespace plcli {

namespace {

using D = pumploss::dimension;

// Distinct set-points of a column: sorted values closer than 3 % of the column's span to the
// previous one belong to the same level.
std::vector<double> levels(std::vector<double> v) {
  std::sort(v.begin(), v.end());
  const double tol = v.empty() ? 0.0 : 0.03 * (v.back() - v.front());
  std::vector<double> out;
  double prev = 0;
  for (std::size_t i = 0; i < v.size(); ++i) {
    if (i == 0 || v[i] - prev > tol) out.push_back(v[i]);
    prev = v[i];
  }
  return out;
}

std::string span(const std::vector<double>& v, D dim, const display_units& du) {
  const auto [lo, hi] = std::minmax_element(v.begin(), v.end());
  return show_quantity(*lo, dim, du, 4) + " to " + show_quantity(*hi, dim, du, 4);
}

// ---------------------------------------------------------------- test-stand
struct stand_options {
  std::string data, setup;
  output_options out;
};

int run_test_stand(const stand_options& o) {
  const display_units du = make_units(o.out);
  const auto setup = read_stand_setup(o.setup);
  const auto d = read_csv(o.data, stand_columns());
  d.check_range("speed", 1e-3, 1e3, "is not a speed above zero (and below 60000 rpm)");
  d.check_range("outlet flow", 0.0, 1.0, "is not a flow between zero and 60000 L/min");
  d.check_range("drain flow", 0.0, 1.0, "is not a flow between zero and 60000 L/min");
  d.check_range("torque", 0.0, 1e6, "is not a torque between zero and 1e6 N.m");
  for (const char* t : {"inlet temperature", "outlet temperature", "drain temperature"})
    d.check_range(t, 223.15, 473.15, "is not an oil temperature between -50 and 200 degC");
  const auto& p1 = d.si("inlet pressure");
  const auto& p2 = d.si("outlet pressure");
  for (std::size_t i = 0; i < d.rows(); ++i)
    if (setup.pump ? !(p2[i] > p1[i]) : !(p1[i] > p2[i]))
      throw d.error(i, "outlet pressure",
                    setup.pump ? "a pump's outlet pressure must lie above its inlet pressure"
                               : "a motor's outlet pressure must lie below its inlet pressure");
  if (!d.has(setup.viscosity_temperature + " temperature"))
    throw input_error(o.setup, 0, 0,
                      "viscosity_temperature = \"" + setup.viscosity_temperature + "\" but " + o.data +
                          " has no '" + setup.viscosity_temperature + " temperature' column");
  std::vector<double> dp(d.rows());
  for (std::size_t i = 0; i < d.rows(); ++i) dp[i] = setup.pump ? p2[i] - p1[i] : p1[i] - p2[i];
  const auto sl = levels(d.si("speed"));
  const auto pl = levels(dp);
  std::printf("test-stand: %s (%s), %zu operating points from %s\n", setup.machine_name.c_str(),
              setup.pump ? "pump" : "motor", d.rows(), o.data.c_str());
  std::printf("  %zu speed levels, %s; %zu pressure levels, %s\n", sl.size(), span(sl, D::rotational_speed, du).c_str(),
              pl.size(), span(pl, D::pressure, du).c_str());
  std::printf("  oil %s; viscosity from the %s temperature, %s\n", setup.oil.name.c_str(),
              setup.viscosity_temperature.c_str(), span(d.si(setup.viscosity_temperature + " temperature"),
                                                          D::temperature, du).c_str());
  if (sl.size() < 5 || pl.size() < 5)
    std::printf("  note: fewer than 5 speeds x 5 pressures; the two-step derived displacement (ISO 8426-1) "
                "needs that grid\n");
  return pending("test-stand", "efficiency / loss-model / uncertainty",
                 {"pumploss::pump_efficiency or motor_efficiency per point (eta_v, eta_hm, eta_t)",
                  "flow correction to port conditions with oil_density_at (fluid.hpp, available)",
                  "GUM expanded uncertainty per point from the [instruments] limits (k = 2)",
                  "derived displacement: two-step over the grid (ISO 8426-1), intercept (ISO 8426-2), slope",
                  "Wilson loss-model fit (QR) with R^2, RMS residual, standard errors, condition number",
                  "model prediction over the [map] grid for the overall-efficiency contour SVG"});
}

// ---------------------------------------------------------------- drain-line
struct drain_options {
  std::string file;
  bool size = false;
  output_options out;
};

int run_drain_line(const drain_options& o) {
  const display_units du = make_units(o.out);
  const auto d = read_drain_line(o.file);
  double length = 0;
  for (const auto& s : d.segments) length += s.length_m;
  long fittings = 0;
  for (const auto& f : d.fittings) fittings += f.count;
  const auto temps = d.temperatures.values();
  std::printf("drain-line: case drain of %s from %s\n", d.pump_name.c_str(), o.file.c_str());
  std::printf("  segments: %zu, %s in all; fittings: %ld; components: %zu; outlet %s above the case port\n",
              d.segments.size(), show_quantity(length, D::length, du, 3).c_str(), fittings, d.components.size(),
              show_quantity(d.outlet_height_m, D::length, du, 3).c_str());
  std::printf("  drain flow %s (%s with temperature); allowed case pressure %s; %zu temperatures %s\n",
              show_quantity(d.drain_flow_m3_s, D::volume_flow, du).c_str(), d.flow_with_temperature.c_str(),
              show_quantity(d.max_case_pressure_pa, D::pressure, du).c_str(), temps.size(),
              span(temps, D::temperature, du).c_str());
  if (o.size)
    std::printf("  sizing over %s\n", d.sizing_bores_m.empty() ? "the module's standard bore table"
                                                                : (std::to_string(d.sizing_bores_m.size()) +
                                                                   " candidate bores").c_str());
  return pending("drain-line", "line-loss / case-drain",
                 {"friction factor (laminar 64/Re, Colebrook-White, transition policy) per segment",
                  "pipe_pressure_drop per segment; fitting K (constant or Hooper 2-K); component curves scaled "
                  "with viscosity",
                  "a line of segments, fittings, components and static height: total and share per element",
                  "case drain check per temperature: case pressure, margin to the allowed value, pass/fail",
                  "sizing: smallest bore of the table that passes over the whole range (with --size)"});
}

// ---------------------------------------------------------------- health
struct health_options {
  std::string readings, pump;
  output_options out;
};

int run_health(const health_options& o) {
  const display_units du = make_units(o.out);
  const auto p = read_pump(o.pump);
  const auto d = read_csv(o.readings, field_columns());
  d.check_range("speed", 1e-3, 1e3, "is not a speed above zero");
  d.check_range("drain flow", 0.0, 1.0, "is not a flow between zero and 60000 L/min");
  d.check_range("outlet pressure", 0.0, 1e9, "is not a gauge pressure between zero and 10000 bar");
  d.check_range("oil temperature", 223.15, 473.15, "is not an oil temperature between -50 and 200 degC");
  d.check_range("drain temperature", 223.15, 473.15, "is not an oil temperature between -50 and 200 degC");
  const auto& dates = d.si("date");
  for (std::size_t i = 1; i < d.rows(); ++i)
    if (!(dates[i] >= dates[i - 1])) throw d.error(i, "date", "dates must not go back in time");
  std::printf("health: %s, %zu field readings from %s to %s (%s)\n", p.name.c_str(), d.rows(),
              d.texts[d.col("date")].front().c_str(), d.texts[d.col("date")].back().c_str(), o.readings.c_str());
  std::printf("  baseline drain flow %s at %s, %s, %s\n",
              show_quantity(p.baseline_drain_m3_s, D::volume_flow, du).c_str(),
              show_quantity(p.reference_dp_pa, D::pressure, du).c_str(),
              show_quantity(p.reference_temperature_k, D::temperature, du).c_str(),
              show_quantity(p.reference_speed_rev_s, D::rotational_speed, du).c_str());
  return pending("health", "pump leakage budget / health",
                 {"drain_fraction = drain flow / (maximum displacement x speed) per reading",
                  "normalisation of each reading to the reference pressure and temperature (laminar law, "
                  "viscosity by ASTM D341)",
                  "growth over the baseline, the drain temperature rise, and a verdict with its reasons "
                  "against the [health] bands",
                  "trend SVG: normalised drain flow over the dates with the band edges as limit lines"});
}

// ---------------------------------------------------------------- budget
struct budget_options {
  std::string pump;
  std::string from, to, step;
  output_options out;
};

int run_budget(const budget_options& o) {
  const display_units du = make_units(o.out);
  auto p = read_pump(o.pump);
  auto q = [&](const std::string& opt, const std::string& text, double& field) {
    if (text.empty()) return;
    try {
      field = quantity_si(text, D::pressure);
    } catch (const std::invalid_argument& e) {
      throw std::invalid_argument("budget " + opt + ": " + e.what());
    }
  };
  q("--from", o.from, p.sweep_from_pa);
  q("--to", o.to, p.sweep_to_pa);
  q("--step", o.step, p.sweep_step_pa);
  if (!(p.sweep_step_pa > 0) || !(p.sweep_to_pa > p.sweep_from_pa) ||
      (p.sweep_to_pa - p.sweep_from_pa) / p.sweep_step_pa > 1000)
    throw std::invalid_argument("budget: need step > 0, to > from and at most 1000 pressures");
  std::printf("budget: %s, %ld pistons, %s (geometry gives %s), from %s\n", p.name.c_str(), p.pistons,
              show_quantity(p.max_displacement_m3_rev, D::displacement, du).c_str(),
              show_quantity(p.geometric_displacement_m3_rev(), D::displacement, du).c_str(), o.pump.c_str());
  std::printf("  sweep %s to %s in steps of %s at %s, %s, displacement %.0f %%\n",
              show_quantity(p.sweep_from_pa, D::pressure, du).c_str(), show_quantity(p.sweep_to_pa, D::pressure, du).c_str(),
              show_quantity(p.sweep_step_pa, D::pressure, du).c_str(),
              show_quantity(p.sweep_speed_rev_s, D::rotational_speed, du).c_str(),
              show_quantity(p.sweep_temperature_k, D::temperature, du).c_str(), p.sweep_displacement_fraction * 100);
  return pending("budget", "pump leakage budget",
                 {"a piston-pump description built from [pump] and [geometry] (validated by the module)",
                  "the budget at each swept pressure: leakage of every path (piston bores, slippers, valve "
                  "plate lands, controller) and the predicted case drain flow",
                  "the share of each path and the sensitivity of the total to each gap",
                  "stacked-area SVG of the paths over pressure"});
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
  sub->add_option("--setup", o->setup, "Test-stand setup (TOML: machine, oil, instruments, fit, map)")
      ->required()
      ->check(CLI::ExistingFile);
  add_output_options(*sub, o->out);
  sub->callback([o, &rc] { rc = run_test_stand(*o); });
}

void add_drain_line(CLI::App& app, int& rc) {
  auto o = std::make_shared<drain_options>();
  auto* sub = app.add_subcommand("drain-line",
                                 "Check a case drain line against the allowed case pressure from cold start to "
                                 "hot, and size it");
  sub->add_option("file", o->file, "Drain-line description (TOML)")->required()->check(CLI::ExistingFile);
  sub->add_flag("--size", o->size, "Also find the smallest bore that passes over the whole temperature range");
  add_output_options(*sub, o->out);
  sub->callback([o, &rc] { rc = run_drain_line(*o); });
}

void add_health(CLI::App& app, int& rc) {
  auto o = std::make_shared<health_options>();
  auto* sub = app.add_subcommand("health", "Health verdict and trend of a pump from field readings of its case "
                                           "drain flow");
  sub->add_option("readings", o->readings, "CSV of field readings (date, pressure, temperature, speed, drain flow)")
      ->required()
      ->check(CLI::ExistingFile);
  sub->add_option("--pump", o->pump, "Pump file (TOML: [pump], [geometry], [health], [sweep], oil)")
      ->required()
      ->check(CLI::ExistingFile);
  add_output_options(*sub, o->out);
  sub->callback([o, &rc] { rc = run_health(*o); });
}

void add_budget(CLI::App& app, int& rc) {
  auto o = std::make_shared<budget_options>();
  auto* sub = app.add_subcommand("budget", "Leakage budget of a described piston pump over a pressure sweep");
  sub->add_option("pump", o->pump, "Pump file (TOML)")->required()->check(CLI::ExistingFile);
  sub->add_option("--from", o->from, "First pressure of the sweep (overrides [sweep])");
  sub->add_option("--to", o->to, "Last pressure of the sweep");
  sub->add_option("--step", o->step, "Pressure step");
  add_output_options(*sub, o->out);
  sub->callback([o, &rc] { rc = run_budget(*o); });
}

}  // namespace plcli
