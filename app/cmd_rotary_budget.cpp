// pumploss rotary-budget: the internal leakage budget of a gear or vane pump from its clearances
// over a pressure sweep: each path's flow and share, the volumetric efficiency, and the
// sensitivity of the total to each clearance. Read the pump file, one library call per pressure
// (gear_pump_budget / vane_pump_budget and their sensitivities), render text and CSV.
#include <CLI/CLI.hpp>
#include <fmt/format.h>

#include <algorithm>
#include <cmath>

#include "commands.hpp"
#include "common.hpp"
#include "config.hpp"
#include "inputs.hpp"
#include "pump_file.hpp"
#include "pumploss/gear_pump.hpp"
#include "pumploss/vane_pump.hpp"

namespace plcli {

namespace {

using D = pumploss::dimension;
using pumploss::status;

constexpr double kPi = 3.14159265358979323846;

struct rotary_file {
  std::string name, kind;
  oil_spec oil;
  bool gear = true;
  pumploss::gear_pump<double> g{};
  pumploss::vane_pump<double> v{};
  double from_pa = 0, to_pa = 0, step_pa = 0, inlet_pa = 0, speed_rev_s = 0, t_k = 0;
};

double pos(section& s, const std::string& key, D dim) {
  const double v = s.quantity(key, dim);
  if (!(v > 0)) throw s.error(key, "must be above zero");
  return v;
}

int count(section& s, const std::string& key, long lo, long hi, long fallback) {
  const long v = s.integer_opt(key).value_or(fallback);
  if (v < lo || v > hi) throw s.error(key, fmt::format("must lie between {} and {}", lo, hi));
  return static_cast<int>(v);
}

double arc(section& s, const std::string& key) {
  const double deg = s.number_opt(key).value_or(180.0);
  if (!(deg > 0 && deg <= 360)) throw s.error(key, "must lie above 0 and at most 360 degrees");
  return deg * kPi / 180;
}

void read_gear(section& s, pumploss::gear_pump<double>& g) {
  g.tip_radius_m = pos(s, "tip_radius", D::length);
  g.root_radius_m = pos(s, "root_radius", D::length);
  g.shaft_radius_m = pos(s, "shaft_radius", D::length);
  if (!(g.tip_radius_m > g.root_radius_m && g.root_radius_m > g.shaft_radius_m))
    throw s.error("root_radius", "needs tip_radius > root_radius > shaft_radius");
  g.face_width_m = pos(s, "face_width", D::length);
  g.tip_land_m = pos(s, "tip_land", D::length);
  g.teeth_sealing = count(s, "teeth_sealing", 1, 100, 0);
  g.tip_clearance_m = pos(s, "tip_clearance", D::length);
  g.balanced_bushings = s.choice("lateral", {"side plates", "balanced bushings"}) == "balanced bushings";
  g.lateral_clearance_m = pos(s, "lateral_clearance", D::length);
  g.lateral_offset = s.number_opt("lateral_offset").value_or(0.0);
  if (!(g.lateral_offset >= 0 && g.lateral_offset < 1)) throw s.error("lateral_offset", "must lie in [0, 1)");
  g.lateral_arc_rad = arc(s, "lateral_arc_deg");
  g.mesh_clearance_m = s.quantity_opt("mesh_clearance", D::length).value_or(0.0);
  if (!(g.mesh_clearance_m >= 0)) throw s.error("mesh_clearance", "must not be negative");
  if (g.mesh_clearance_m > 0) g.mesh_length_m = pos(s, "mesh_length", D::length);
  s.finish();
}

void read_vane(section& s, pumploss::vane_pump<double>& v) {
  v.rotor_width_m = pos(s, "rotor_width", D::length);
  v.cam_radius_m = pos(s, "cam_radius", D::length);
  v.rotor_radius_m = pos(s, "rotor_radius", D::length);
  v.hub_radius_m = pos(s, "hub_radius", D::length);
  if (!(v.cam_radius_m > v.rotor_radius_m && v.rotor_radius_m > v.hub_radius_m))
    throw s.error("rotor_radius", "needs cam_radius > rotor_radius > hub_radius");
  v.sealing_arcs = count(s, "sealing_arcs", 1, 8, 0);
  v.vanes_per_arc = count(s, "vanes_per_arc", 1, 50, 1);
  v.vane_tip_land_m = pos(s, "vane_tip_land", D::length);
  v.tip_clearance_m = pos(s, "tip_clearance", D::length);
  v.side_clearance_m = pos(s, "side_clearance", D::length);
  v.pressure_arc_rad = arc(s, "pressure_arc_deg");
  v.vanes_in_suction = count(s, "vanes_in_suction", 0, 100, 0);
  if (v.vanes_in_suction > 0) {
    v.slot_length_m = pos(s, "slot_length", D::length);
    v.slot_clearance_m = pos(s, "slot_clearance", D::length);
  }
  s.finish();
}

rotary_file read_rotary(const std::string& path) {
  auto file = open_pump_file(path, {"drive", "test", "verdict"});  // the flow test of flow-test
  auto& root = file.root;
  auto& p = file.pump;
  rotary_file f;
  f.oil = std::move(file.oil);
  f.name = std::move(file.name);
  f.kind = std::move(file.kind);
  if (f.kind != "gear" && f.kind != "vane")
    throw p.error("kind", "rotary-budget describes gear and vane pumps (use 'budget' for a piston pump)");
  f.gear = f.kind == "gear";
  const double disp = pos(p, "displacement", D::displacement);
  const double rated_speed = pos(p, "rated_speed", D::rotational_speed);
  const double ref_t = p.quantity("reference_temperature", D::temperature);
  (void)p.quantity_opt("rated_pressure", D::pressure);
  (void)p.number_opt("new_volumetric_efficiency_percent");
  p.finish();
  if (f.gear) {
    auto g = root.table("gear");
    read_gear(g, f.g);
    f.g.displacement_m3_rev = disp;
  } else {
    auto v = root.table("vane");
    read_vane(v, f.v);
    f.v.displacement_m3_rev = disp;
  }
  auto s = root.table("sweep");
  f.from_pa = s.quantity("from", D::pressure);
  f.to_pa = s.quantity("to", D::pressure);
  f.step_pa = pos(s, "step", D::pressure);
  f.inlet_pa = s.quantity_opt("inlet_pressure", D::pressure).value_or(0.0);
  f.speed_rev_s = s.quantity_opt("speed", D::rotational_speed).value_or(rated_speed);
  f.t_k = s.quantity_opt("temperature", D::temperature).value_or(ref_t);
  if (!(f.to_pa > f.from_pa) || !(f.from_pa >= f.inlet_pa) || (f.to_pa - f.from_pa) / f.step_pa > 1000)
    throw s.error("to", "needs to > from >= inlet pressure and at most 1000 pressures");
  s.finish();
  root.finish();
  return f;
}

int run_rotary(const std::string& file, const output_options& out) {
  const display_units du = make_units(out);
  const auto f = read_rotary(file);
  const auto& oil = f.oil.props;
  const char* gap_names_gear[3] = {"tip clearance", "lateral clearance", "mesh clearance"};
  const char* gap_names_vane[3] = {"tip clearance", "side clearance", "slot clearance"};
  const char* const* gap_names = f.gear ? gap_names_gear : gap_names_vane;
  auto path_name = [&](int k) { return f.gear ? pumploss::gear_path_name(k) : pumploss::vane_path_name(k); };

  table tf, tz;
  tf.name = "flows";
  tf.title = "Internal leakage of each path (outlet to inlet; shares of the gross leakage, the sum of |q|)";
  tz.name = "sensitivity";
  tz.title = "Sensitivity of the total leakage to each clearance: elasticity (h/Q) dQ/dh and dQ/dh";
  tf.cols = {{"outlet pressure", cell_kind::quantity, D::pressure, 3}};
  tz.cols = tf.cols;
  for (int k = 0; k < pumploss::clearance_path_count; ++k) tf.cols.push_back({path_name(k), cell_kind::quantity, D::volume_flow, 3});
  for (int k = 0; k < pumploss::clearance_path_count; ++k)
    tf.cols.push_back({std::string("share ") + path_name(k), cell_kind::percent, D::pressure, 3});  // of sum |q|
  tf.cols.push_back({"total", cell_kind::quantity, D::volume_flow, 3});
  tf.cols.push_back({"volumetric efficiency", cell_kind::percent, D::pressure, 4});
  tf.cols.push_back({"status", cell_kind::text, D::pressure, 0});
  for (int k = 0; k < 3; ++k) tz.cols.push_back({std::string("elasticity ") + gap_names[k], cell_kind::number, D::pressure, 3});
  for (int k = 0; k < 3; ++k)
    tz.cols.push_back({std::string("dQ/dh ") + gap_names[k] + " [" + du.of(D::volume_flow).symbol + " per um]",
                       cell_kind::number, D::pressure, 3});
  const double one_um_flow = du.show(1.0, D::volume_flow) * 1e-6;
  status worst_st = status::ok;
  double max_re = 0;
  for (int i = 0;; ++i) {
    const double pout = f.from_pa + i * f.step_pa;
    if (pout > f.to_pa * (1 + 1e-12)) break;
    const pumploss::rotary_operating_point<double> op{pout, f.inlet_pa, f.speed_rev_s, f.t_k};
    const auto b = f.gear ? pumploss::gear_pump_budget(f.g, oil, op) : pumploss::vane_pump_budget(f.v, oil, op);
    const auto s = f.gear ? pumploss::gear_pump_sensitivity(f.g, oil, op) : pumploss::vane_pump_sensitivity(f.v, oil, op);
    if (pumploss::is_error(b.st))
      throw std::runtime_error(file + ": no leakage budget at " + show_quantity(pout, D::pressure, du) + ": " +
                               pumploss::status_message(static_cast<int>(b.st)));
    worst_st = pumploss::worst(worst_st, b.st);
    max_re = std::max(max_re, b.max_gap_reynolds);
    std::vector<cell> rf = {pout}, rz = {pout};
    for (int k = 0; k < 3; ++k) rf.emplace_back(b.flow_m3_s[k]);
    for (int k = 0; k < 3; ++k) rf.emplace_back(std::isnan(b.share[k]) ? 0.0 : b.share[k]);
    rf.emplace_back(b.total_m3_s);
    rf.emplace_back(b.volumetric_efficiency);
    rf.emplace_back(status_text(b.st));
    for (int k = 0; k < 3; ++k) rz.emplace_back(s.elasticity[k]);
    for (int k = 0; k < 3; ++k) rz.emplace_back(s.d_total_d_gap[k] * one_um_flow);
    tf.rows.push_back(std::move(rf));
    tz.rows.push_back(std::move(rz));
  }

  const auto q = [&](double v, D dim, int digits = 3) { return show_quantity(v, dim, du, digits); };
  report r;
  r.title = "Clearance leakage budget: " + f.name;
  if (f.gear)
    r.facts.emplace_back(
        "Gear pump", fmt::format("{}; tips {} on {} teeth in series of {} land, {} wide; lateral {} {}{}; "
                                 "mesh {}",
                                 q(f.g.displacement_m3_rev, D::displacement, 4), q(f.g.tip_clearance_m, D::length),
                                 f.g.teeth_sealing, q(f.g.tip_land_m, D::length), q(f.g.face_width_m, D::length),
                                 f.g.balanced_bushings ? "balanced bushings, film" : "side plates, end float",
                                 q(f.g.lateral_clearance_m, D::length),
                                 f.g.balanced_bushings ? std::string() : fmt::format(" (offset {:.2f})", f.g.lateral_offset),
                                 f.g.mesh_clearance_m > 0 ? "slot " + q(f.g.mesh_clearance_m, D::length) + " (stated estimate)"
                                                          : std::string("sealed by the flanks (stated estimate)")));
  else
    r.facts.emplace_back("Vane pump", fmt::format("{}; {} sealing arcs of {} vanes, tip film {}; side film {}; {} vanes "
                                                  "in suction, slot clearance {}",
                                                  q(f.v.displacement_m3_rev, D::displacement, 4), f.v.sealing_arcs,
                                                  f.v.vanes_per_arc, q(f.v.tip_clearance_m, D::length),
                                                  q(f.v.side_clearance_m, D::length), f.v.vanes_in_suction,
                                                  q(f.v.slot_clearance_m, D::length)));
  r.facts.emplace_back("Sweep", fmt::format("{} to {} in steps of {}; inlet {}, {}, oil {} ({})", q(f.from_pa, D::pressure),
                                            q(f.to_pa, D::pressure), q(f.step_pa, D::pressure), q(f.inlet_pa, D::pressure),
                                            q(f.speed_rev_s, D::rotational_speed, 4), q(f.t_k, D::temperature),
                                            f.oil.name));
  r.facts.emplace_back("Largest gap Reynolds number", fmt::format("{:.3g} (laminar below about 2000)", max_re));
  r.tables.push_back(std::move(tf));
  r.tables.push_back(std::move(tz));
  if (worst_st != status::ok)
    r.notes.push_back("some points were evaluated outside the model's assumptions (see the status column)");
  r.notes.push_back("laminar clearance flows at one viscosity; the tips drag oil towards the outlet against the "
                    "pressure flow (a tip path can be negative at low pressure); clearances are those under load; a "
                    "model of the described geometry, not a measurement");
  emit(r, output_set{}, out, du, f.gear ? "gear_budget" : "vane_budget");
  return exit_ok;
}

}  // namespace

void add_rotary_budget(CLI::App& app, int& rc) {
  add_file_command(app, rc, "rotary-budget",
                   "Internal leakage budget of a gear or vane pump from its clearances over a pressure sweep, with "
                   "the sensitivity to each clearance",
                   "Pump file with a [gear] or [vane] table and a [sweep] (TOML)", run_rotary);
}

}  // namespace plcli
