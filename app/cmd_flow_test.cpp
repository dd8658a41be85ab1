// pumploss flow-test: the field flow test of any pump (gear, vane, piston) with an inline flow
// meter and a loading valve. Read the test file, one library call (flow_test_evaluate), render
// the report (text and CSV) with its cautions.
#include <CLI/CLI.hpp>
#include <fmt/format.h>

#include <optional>

#include "commands.hpp"
#include "common.hpp"
#include "config.hpp"
#include "inputs.hpp"
#include "pump_file.hpp"
#include "pumploss/flow_test.hpp"
#include "pumploss/version.hpp"

namespace plcli {

namespace {

using D = pumploss::dimension;
using pumploss::status;

// What the flow test file holds, in SI.
struct flow_test_file {
  std::string pump_name, pump_kind;
  oil_spec oil;
  double reference_t_k = 0, test_t_k = 0;
  std::string drive;  // "measured" or "induction motor"
  pumploss::flow_test_setup<double> setup{};
  pumploss::flow_reading<double> no_load{}, loaded{};
};

double read_fraction(section& s, const std::string& key, double fallback, bool& given) {
  given = s.has(key);
  if (!given) return fallback;
  const double v = s.number(key);
  if (!(v > 0 && v <= 100)) throw s.error(key, "must lie above 0 and at most 100 (per cent)");
  return v / 100;
}

pumploss::flow_reading<double> read_reading(section& r, bool measured) {
  pumploss::flow_reading<double> x{};
  x.flow_m3_s = r.quantity("flow", D::volume_flow);
  if (!(x.flow_m3_s > 0)) throw r.error("flow", "must be above zero");
  x.pressure_pa = r.quantity("pressure", D::pressure);
  if (!(x.pressure_pa >= 0)) throw r.error("pressure", "must not be negative (gauge, outlet against inlet)");
  if (measured) {
    x.speed_rev_s = r.quantity("speed", D::rotational_speed);
    if (!(x.speed_rev_s > 0)) throw r.error("speed", "must be above zero");
  } else if (r.has("speed")) {
    throw r.error("speed", "is taken from the motor's nameplate: set [drive] kind = \"measured\" to give speeds");
  }
  r.finish();
  return x;
}

flow_test_file read_flow_test(const std::string& path, bool& limit_given) {
  auto file = open_pump_file(path, {"gear", "vane", "sweep"});  // the clearances of rotary-budget
  auto& root = file.root;
  auto& p = file.pump;
  flow_test_file f;
  f.oil = std::move(file.oil);
  f.pump_name = std::move(file.name);
  f.pump_kind = std::move(file.kind);
  auto& s = f.setup;
  s.displacement_m3_rev = p.quantity_opt("displacement", D::displacement).value_or(0.0);
  if (!(s.displacement_m3_rev >= 0)) throw p.error("displacement", "must be above zero");
  s.ref_pressure_pa = p.quantity("rated_pressure", D::pressure);
  s.ref_speed_rev_s = p.quantity("rated_speed", D::rotational_speed);
  f.reference_t_k = p.quantity("reference_temperature", D::temperature);
  bool given = false;
  s.new_volumetric_efficiency = read_fraction(p, "new_volumetric_efficiency_percent", 0.0, given);
  if (!given) throw p.error_here("needs new_volumetric_efficiency_percent (the maker's figure at the rated point)");
  p.finish();

  auto d = root.table("drive");
  f.drive = d.choice("kind", {"measured", "induction motor"});
  if (f.drive == "induction motor") {
    s.motor.sync_speed_rev_s = d.quantity("synchronous_speed", D::rotational_speed);
    s.motor.rated_speed_rev_s = d.quantity("rated_speed", D::rotational_speed);
    s.motor.rated_power_w = d.quantity("rated_power", D::power);
    s.hydromech_efficiency = read_fraction(d, "hydromechanical_efficiency_percent", 0.85, given);
  }
  d.finish();

  auto t = root.table("test");
  f.test_t_k = t.quantity("oil_temperature", D::temperature);
  auto n0 = t.table("no_load");
  f.no_load = read_reading(n0, f.drive == "measured");
  auto n1 = t.table("loaded");
  f.loaded = read_reading(n1, f.drive == "measured");
  t.finish();

  s.limit = pumploss::flow_test_default_limit;
  s.watch_band = pumploss::flow_test_default_watch_band;
  if (auto v = root.table_opt("verdict")) {
    s.limit = read_fraction(*v, "limit_percent_of_new", s.limit, limit_given);
    bool band_given = false;
    s.watch_band = read_fraction(*v, "watch_band_percent", s.watch_band, band_given);
    v->finish();
  }
  root.finish();

  const auto mu_t = pumploss::oil_dynamic_viscosity(f.oil.props, f.test_t_k, 0.0);
  const auto mu_r = pumploss::oil_dynamic_viscosity(f.oil.props, f.reference_t_k, 0.0);
  if (!mu_t.usable() || !mu_r.usable())
    throw input_error(path, 0, 0, "the oil has no viscosity at the test or reference temperature");
  s.mu_test_pa_s = mu_t.value;
  s.mu_ref_pa_s = mu_r.value;
  return f;
}

int run_flow_test(const std::string& file, const output_options& out) {
  const display_units du = make_units(out);
  bool limit_given = false;
  const auto f = read_flow_test(file, limit_given);
  const auto& s = f.setup;

  const auto r = pumploss::flow_test_evaluate(f.no_load, f.loaded, s);  // the one library call
  if (pumploss::is_error(r.st))
    throw std::runtime_error(file + ": the flow test cannot be evaluated: " +
                             pumploss::status_message(static_cast<int>(r.st)));

  const auto q = [&](double v, D dim, int digits = 4) { return show_quantity(v, dim, du, digits); };
  report rep;
  rep.title = "Flow test: " + f.pump_name;
  rep.facts.emplace_back("Pump", fmt::format("{} pump; rated {} at {}; new {:.1f} % volumetric at {}", f.pump_kind,
                                             q(s.ref_pressure_pa, D::pressure, 3),
                                             q(s.ref_speed_rev_s, D::rotational_speed),
                                             100 * s.new_volumetric_efficiency, q(f.reference_t_k, D::temperature, 3)));
  rep.facts.emplace_back(
      "Drive", f.drive == "measured"
                   ? std::string("speeds measured at each reading")
                   : fmt::format("induction motor {} at {} ({} synchronous); speed under load from its slip, "
                                 "proportional to torque, with {:.0f} % hydromechanical efficiency assumed",
                                 q(s.motor.rated_power_w, D::power, 3), q(s.motor.rated_speed_rev_s, D::rotational_speed),
                                 q(s.motor.sync_speed_rev_s, D::rotational_speed), 100 * s.hydromech_efficiency));
  rep.facts.emplace_back("Oil", fmt::format("{}: {} at the test ({}), {} at the reference ({})", f.oil.name,
                                            q(s.mu_test_pa_s, D::dynamic_viscosity), q(f.test_t_k, D::temperature, 3),
                                            q(s.mu_ref_pa_s, D::dynamic_viscosity),
                                            q(f.reference_t_k, D::temperature, 3)));
  rep.facts.emplace_back("Displacement",
                         fmt::format("{} used ({}); {} from the two readings",
                                     q(r.displacement_m3_rev, D::displacement),
                                     s.displacement_m3_rev > 0 ? "stated" : "derived",
                                     q(r.derived_displacement_m3_rev, D::displacement)));
  rep.facts.emplace_back("Raw flow ratio", fmt::format("{:.1f} % (loaded over no-load flow: includes the drive's "
                                                       "speed fall of {})",
                                                       100 * r.uncorrected_ratio,
                                                       q(r.speed_no_load_rev_s - r.speed_loaded_rev_s,
                                                         D::rotational_speed, 3)));
  rep.facts.emplace_back("Volumetric efficiency", fmt::format("{:.1f} % at the test; {:.1f} % at the reference",
                                                              100 * r.volumetric_efficiency,
                                                              100 * r.volumetric_efficiency_ref));
  rep.facts.emplace_back("Percent of new", fmt::format("{:.1f} %", 100 * r.percent_of_new));
  rep.facts.emplace_back(
      "Verdict", fmt::format("{} (limit {:.0f} % of new{}, watch band {:.0f} points above it)",
                             pumploss::flow_verdict_name(r.verdict), 100 * s.limit,
                             limit_given ? "" : ": common practice, no source", 100 * s.watch_band));
  rep.facts.emplace_back("Status", status_text(r.st));

  table t;
  t.name = "readings";
  t.title = "Readings and the leakage they give";
  t.cols = {{"reading", cell_kind::text, D::pressure, 0},
            {"pressure", cell_kind::quantity, D::pressure, 4},
            {"flow", cell_kind::quantity, D::volume_flow, 4},
            {"speed", cell_kind::quantity, D::rotational_speed, 5},
            {"speed from", cell_kind::text, D::pressure, 0},
            {"ideal flow V n", cell_kind::quantity, D::volume_flow, 4},
            {"leakage", cell_kind::quantity, D::volume_flow, 3},
            {"volumetric efficiency", cell_kind::percent, D::pressure, 4}};
  const double v = r.displacement_m3_rev;
  const std::string from0 = f.no_load.speed_rev_s > 0 ? "measured" : "motor slip";
  const std::string from1 = f.loaded.speed_rev_s > 0 ? "measured" : "motor slip";
  t.rows.push_back({std::string("no load"), f.no_load.pressure_pa, f.no_load.flow_m3_s, r.speed_no_load_rev_s, from0,
                    v * r.speed_no_load_rev_s, v * r.speed_no_load_rev_s - f.no_load.flow_m3_s,
                    f.no_load.flow_m3_s / (v * r.speed_no_load_rev_s)});
  t.rows.push_back({std::string("loaded"), f.loaded.pressure_pa, f.loaded.flow_m3_s, r.speed_loaded_rev_s, from1,
                    v * r.speed_loaded_rev_s, r.leakage_m3_s, r.volumetric_efficiency});
  t.rows.push_back({std::string("reference (corrected)"), s.ref_pressure_pa,
                    v * s.ref_speed_rev_s - r.leakage_ref_m3_s, s.ref_speed_rev_s, std::string("rated"),
                    v * s.ref_speed_rev_s, r.leakage_ref_m3_s, r.volumetric_efficiency_ref});
  rep.tables.push_back(std::move(t));

  if (r.st != status::ok)
    rep.notes.push_back("the result carries a report: " + status_text(r.st) + " Read it with care.");
  rep.notes.push_back("leakage taken as laminar: proportional to pressure, inversely to viscosity, independent of "
                      "speed; corrected to the reference with the oil's ASTM D341 viscosity");
  rep.notes.push_back("the meter's own temperature and the oil's compressibility between pump and meter are not "
                      "corrected; hold the loading valve steady and let the flow settle before reading");
  rep.notes.push_back("a loading valve against a relief or compensator setting makes heat fast: watch the oil "
                      "temperature and keep the test short; never close the loading valve fully on a fixed pump "
                      "without a relief valve between pump and valve");

  emit(rep, output_set{}, out, du, "flow_test");
  return exit_ok;
}

}  // namespace

void add_flow_test(CLI::App& app, int& rc) {
  add_file_command(app, rc, "flow-test",
                   "Judge any pump from a field flow test (no-load and loaded flow), with the drive's speed fall "
                   "taken out and the leakage corrected to the rated state",
                   "Flow test file (TOML)", run_flow_test);
}

}  // namespace plcli
