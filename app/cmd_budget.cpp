// pumploss budget: the case drain leakage budget of a described piston pump over a pressure
// sweep: every path's flow and share, the sensitivity of the total to each gap, a table and a
// stacked SVG.
#include <CLI/CLI.hpp>
#include <fmt/format.h>

#include <cmath>

#include "commands.hpp"
#include "common.hpp"
#include "inputs.hpp"
#include "pumploss/piston_pump.hpp"
#include "pumploss/version.hpp"
#include "pumploss/workflows.hpp"
#include "svg.hpp"

namespace plcli {

namespace {

using D = pumploss::dimension;
using pumploss::status;

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
  const auto& g = p.geometry;

  // the one library call: the sweep and everything at the health reference state
  pumploss::pump_sweep sw;
  sw.from_pa = p.sweep_from_pa;
  sw.to_pa = p.sweep_to_pa;
  sw.step_pa = p.sweep_step_pa;
  sw.case_pa = p.sweep_case_pa;
  sw.speed_rev_s = p.sweep_speed_rev_s;
  sw.displacement_fraction = p.sweep_displacement_fraction;
  sw.temperature_k = p.sweep_temperature_k;
  sw.inlet_pa = p.sweep_inlet_pa;
  sw.film_temperature_rise_k = p.sweep_film_rise_k;
  sw.with_reference = true;
  sw.reference = {p.reference_dp_pa + p.sweep_case_pa, p.sweep_case_pa, p.reference_speed_rev_s, 1.0,
                  p.reference_temperature_k};
  sw.reference.inlet_pa = p.sweep_inlet_pa;
  sw.reference.film_temperature_rise_k = p.sweep_film_rise_k;
  for (int k = 0; k < pumploss::pump_gap_count; ++k) sw.u_gap_m[k] = p.gap_tolerance[k];
  const auto res = pumploss::sweep_piston_pump(g, p.oil.props, sw);
  if (res.st == status::domain && res.failed_point == static_cast<std::size_t>(-1))
    throw std::invalid_argument(
        "budget: need step > 0, to > from > the case pressure, and at most 1000 pressures");
  if (pumploss::is_error(res.st))
    throw std::runtime_error(
        o.pump + ": no leakage budget at " +
        show_quantity(p.sweep_from_pa + static_cast<double>(res.failed_point) * p.sweep_step_pa, D::pressure, du) +
        ": " + pumploss::status_message(static_cast<int>(res.st)));

  // the paths the description has (a path with no geometry is left out of the tables)
  using pumploss::leakage_path;
  std::vector<int> paths;
  auto present = [&](leakage_path lp) {
    switch (lp) {
      case leakage_path::piston_bore: return true;
      case leakage_path::slipper: return g.slipper_gap_m > 0;
      case leakage_path::ball_socket: return g.ball_clearance_m > 0;
      case leakage_path::valve_inner:
      case leakage_path::valve_outer: return g.valve_gap_m > 0;
      case leakage_path::controller: return g.controller_flow_m3_s > 0;
      case leakage_path::bleed: return g.bleed_orifice_diameter_m > 0;
      case leakage_path::extra_laminar: return g.extra_conductance_m3 > 0;
      case leakage_path::extra_orifice: return g.extra_orifice_cda_m2 > 0;
      case leakage_path::control_piston: return g.control_piston_conductance_m3 > 0;
    }
    return false;
  };
  for (int k = 0; k < pumploss::leakage_path_count; ++k)
    if (present(static_cast<leakage_path>(k))) paths.push_back(k);
  const double gaps[pumploss::pump_gap_count] = {g.bore_clearance_m, g.slipper_gap_m, g.ball_clearance_m, g.valve_gap_m};
  const char* gap_names[pumploss::pump_gap_count] = {"piston-bore clearance", "slipper gap", "ball clearance",
                                                     "valve plate gap"};

  table tf, ts, tz;
  tf.name = "flows";
  tf.title = "Leakage of each path to the case";
  ts.name = "shares";
  ts.title = "Share of each path in the case drain flow";
  tz.name = "sensitivity";
  tz.title = "Sensitivity of the drain flow to each gap: elasticity (h/Q) dQ/dh (3 for a purely laminar path) and "
             "dQ/dh";
  tf.cols = {{"outlet pressure", cell_kind::quantity, D::pressure, 3}};
  ts.cols = tf.cols;
  tz.cols = tf.cols;
  for (const int k : paths) {
    const std::string nm = pumploss::leakage_path_name(static_cast<leakage_path>(k));
    tf.cols.push_back({nm, cell_kind::quantity, D::volume_flow, 3});
    ts.cols.push_back({nm, cell_kind::percent, D::pressure, 3});
  }
  tf.cols.push_back({"total", cell_kind::quantity, D::volume_flow, 3});
  tf.cols.push_back({"total film viscosity", cell_kind::quantity, D::volume_flow, 3});
  tf.cols.push_back({"drain fraction", cell_kind::percent, D::pressure, 3});
  tf.cols.push_back({"status", cell_kind::text, D::pressure, 0});
  std::vector<int> gap_cols;
  for (int k = 0; k < pumploss::pump_gap_count; ++k)
    if (gaps[k] > 0) gap_cols.push_back(k);
  for (const int k : gap_cols)
    tz.cols.push_back({std::string("elasticity ") + gap_names[k], cell_kind::number, D::pressure, 3});
  for (const int k : gap_cols)
    tz.cols.push_back({std::string("dQ/dh ") + gap_names[k] + " [" + du.of(D::volume_flow).symbol + " per um]",
                       cell_kind::number, D::pressure, 3});

  table tl;
  tl.name = "flow_loss";
  tl.title = "The test stand's flow loss: case drain plus the losses that never reach the case";
  tl.cols = {{"outlet pressure", cell_kind::quantity, D::pressure, 3},
             {"case drain", cell_kind::quantity, D::volume_flow, 3},
             {"compression of delivered oil", cell_kind::quantity, D::volume_flow, 3},
             {"dead volume", cell_kind::quantity, D::volume_flow, 3},
             {"cross-port", cell_kind::quantity, D::volume_flow, 3},
             {"flow loss", cell_kind::quantity, D::volume_flow, 3},
             {"volumetric efficiency", cell_kind::percent, D::pressure, 3}};

  svg::stack st;
  for (const int k : paths) st.names.push_back(pumploss::leakage_path_name(static_cast<leakage_path>(k)));
  st.layers.resize(paths.size());
  const double one_um_flow = du.show(1.0, D::volume_flow) * 1e-6;  // display flow per m^3/s, times 1 um
  for (const auto& pt : res.points) {
    const double pout = pt.outlet_pa;
    const auto& b = pt.budget;
    const auto& fl = pt.flow_loss;
    const auto& s = pt.sensitivity;
    std::vector<cell> rf = {pout}, rs = {pout}, rz = {pout};
    for (std::size_t j = 0; j < paths.size(); ++j) {
      rf.emplace_back(b.flow_m3_s[paths[j]]);
      rs.emplace_back(b.share[paths[j]]);
      st.layers[j].push_back(du.show(b.flow_m3_s[paths[j]], D::volume_flow));
    }
    rf.emplace_back(b.total_m3_s);
    rf.emplace_back(b.total_film_m3_s);
    rf.emplace_back(b.drain_fraction);
    tl.rows.push_back({pout, fl.drain_m3_s, fl.compression_m3_s, fl.dead_volume_m3_s, fl.cross_port_m3_s, fl.total_m3_s,
                       fl.theoretical_m3_s > 0 ? 1 - fl.total_m3_s / fl.theoretical_m3_s : 0.0});
    rf.emplace_back(status_text(b.st));
    for (const int k : gap_cols) rz.emplace_back(s.elasticity[k]);
    for (const int k : gap_cols) rz.emplace_back(s.d_total_d_gap[k] * one_um_flow);
    tf.rows.push_back(std::move(rf));
    ts.rows.push_back(std::move(rs));
    tz.rows.push_back(std::move(rz));
    st.x.push_back(du.show(pout, D::pressure));
  }

  report r;
  r.title = "Leakage budget: " + p.name;
  r.facts.emplace_back("Pump", fmt::format("{} ({} pistons, {} stated, {} from the geometry)", o.pump, g.pistons,
                                           show_quantity(p.max_displacement_m3_rev, D::displacement, du),
                                           show_quantity(p.geometric_displacement_m3_rev(), D::displacement, du)));
  r.facts.emplace_back("Gaps", fmt::format("piston-bore {}, slipper {}, ball {}, valve plate {}",
                                           show_quantity(g.bore_clearance_m, D::length, du, 3),
                                           show_quantity(g.slipper_gap_m, D::length, du, 3),
                                           show_quantity(g.ball_clearance_m, D::length, du, 3),
                                           show_quantity(g.valve_gap_m, D::length, du, 3)));
  r.facts.emplace_back("Sweep", fmt::format("{} to {} in steps of {}; case {}, {}, {}, displacement {:.0f} %",
                                            show_quantity(p.sweep_from_pa, D::pressure, du, 3),
                                            show_quantity(p.sweep_to_pa, D::pressure, du, 3),
                                            show_quantity(p.sweep_step_pa, D::pressure, du, 3),
                                            show_quantity(p.sweep_case_pa, D::pressure, du, 3),
                                            show_quantity(p.sweep_speed_rev_s, D::rotational_speed, du),
                                            show_quantity(p.sweep_temperature_k, D::temperature, du, 3),
                                            100 * p.sweep_displacement_fraction));
  // the budget at the health reference state, next to the measured baseline
  const auto& ref = res.at_reference;
  const auto& br = ref.budget;
  if (pumploss::is_usable(br.st))
    r.facts.emplace_back("At the health reference",
                         fmt::format("{} predicted at {}, {}, {}; measured baseline {} ({:+.0f} %)",
                                     show_quantity(br.total_m3_s, D::volume_flow, du, 3),
                                     show_quantity(p.reference_dp_pa, D::pressure, du, 3),
                                     show_quantity(p.reference_temperature_k, D::temperature, du, 3),
                                     show_quantity(p.reference_speed_rev_s, D::rotational_speed, du),
                                     show_quantity(p.baseline_drain_m3_s, D::volume_flow, du, 3),
                                     100 * (p.baseline_drain_m3_s / br.total_m3_s - 1)));
  // force balance, viscosity band, deadhead and the reconciliation at the reference state
  {
    const auto& b1 = ref.balance_full;
    const auto& b0 = ref.balance_zero;
    if (g.slipper_gap_m > 0)
      r.facts.emplace_back(
          "Slipper balance",
          fmt::format("{:.3f} at full stroke, {:.3f} at zero stroke (window {:.2f} to {:.2f}, common practice); the "
                      "film at which it carries the piston force: {} (stated {})",
                      b1.slipper_balance, b0.slipper_balance, pumploss::slipper_balance_min,
                      pumploss::slipper_balance_max, show_quantity(b1.slipper_film_m, D::length, du, 3),
                      show_quantity(g.slipper_gap_m, D::length, du, 3)));
    if (g.valve_gap_m > 0)
      r.facts.emplace_back("Barrel balance",
                           fmt::format("{:.3f}: valve-plate separating force / hold-down (window {:.2f} to {:.2f}, "
                                       "common practice; above 1 the barrel lifts off)",
                                       b1.barrel_balance, pumploss::barrel_balance_min, pumploss::barrel_balance_max));
    if ((b1.warnings | b0.warnings) != 0u)
      r.notes.push_back("FORCE BALANCE outside its design window: the stated films are not the ones this geometry "
                        "would run at; the budget's shares are not credible until the geometry is corrected");
    const auto& fl = ref.flow_loss;
    const auto& bb = ref.budget;
    if (pumploss::is_usable(fl.st)) {
      r.facts.emplace_back(
          "Flow loss at the reference",
          fmt::format("case drain {} + compression {} + dead volume {} + cross-port {} = {} of {} ({:.2f} %)",
                      show_quantity(fl.drain_m3_s, D::volume_flow, du, 3),
                      show_quantity(fl.compression_m3_s, D::volume_flow, du, 3),
                      show_quantity(fl.dead_volume_m3_s, D::volume_flow, du, 3),
                      show_quantity(fl.cross_port_m3_s, D::volume_flow, du, 3),
                      show_quantity(fl.total_m3_s, D::volume_flow, du, 3),
                      show_quantity(fl.theoretical_m3_s, D::volume_flow, du, 4),
                      100 * fl.total_m3_s / fl.theoretical_m3_s));
      r.facts.emplace_back(
          "Viscosity band at the reference",
          fmt::format("{} isoviscous (bulk temperature, case pressure) to {} with the film viscosity "
                      "(pressure-viscosity over the film, film {:.1f} K warmer)",
                      show_quantity(bb.total_m3_s, D::volume_flow, du, 3),
                      show_quantity(bb.total_film_m3_s, D::volume_flow, du, 3), p.sweep_film_rise_k));
    }
    const auto& dh = ref.deadhead;
    if (pumploss::is_usable(dh.st))
      r.facts.emplace_back("Deadhead (compensating at zero stroke)",
                           fmt::format("{} to the case, of which the controller {} (metering {} into the control "
                                       "chamber); pistons {} (deeper in their bores than at full stroke)",
                                       show_quantity(dh.total_m3_s, D::volume_flow, du, 3),
                                       show_quantity(dh.flow_m3_s[5] + dh.flow_m3_s[6] + dh.flow_m3_s[9],
                                                     D::volume_flow, du, 3),
                                       show_quantity(dh.metering_flow_m3_s, D::volume_flow, du, 3),
                                       show_quantity(dh.flow_m3_s[0], D::volume_flow, du, 3)));
    if (ref.with_uncertainty) {
      const auto& u = ref.uncertainty;
      if (pumploss::is_usable(u.st)) {
        table tu;
        tu.name = "share_uncertainty";
        tu.title = "Shares at the reference with their standard uncertainty from the gap tolerances";
        tu.cols = {{"path", cell_kind::text, D::pressure, 0},
                   {"flow", cell_kind::quantity, D::volume_flow, 3},
                   {"u(flow)", cell_kind::quantity, D::volume_flow, 2},
                   {"share", cell_kind::percent, D::pressure, 3},
                   {"u(share)", cell_kind::percent, D::pressure, 2}};
        for (const int k : paths)
          tu.rows.push_back({std::string(pumploss::leakage_path_name(static_cast<leakage_path>(k))), u.flow_m3_s[k],
                             u.u_flow_m3_s[k], u.share[k], u.u_share[k]});
        tu.rows.push_back({std::string("total"), u.total_m3_s, u.u_total_m3_s, 1.0, 0.0});
        r.tables.push_back(std::move(tu));
      }
    }
  }
  r.facts.emplace_back("Largest gap Reynolds number", fmt::format("{:.3g} (laminar below about 2000)", res.max_gap_reynolds));
  r.tables.push_back(std::move(tf));
  r.tables.push_back(std::move(ts));
  r.tables.push_back(std::move(tz));
  r.tables.push_back(std::move(tl));
  if (res.st != status::ok)
    r.notes.push_back("some paths were evaluated outside their model's assumptions (see the status column)");
  r.notes.push_back("laminar clearance flows; 'total' with the oil at the sweep temperature and case pressure "
                    "(isoviscous), 'total film viscosity' with the pressure-viscosity over the film and the stated "
                    "film temperature rise: the two bound the drain; the sweep is on stroke (spool leakage only); "
                    "swash plate pivoting on the shaft axis unless an offset is stated; a model of the described "
                    "geometry, not a measurement");

  svg::plot pl;
  pl.title = "Leakage budget of " + p.name;
  pl.subtitle = fmt::format("{}, {}; pumploss {}", show_quantity(p.sweep_speed_rev_s, D::rotational_speed, du),
                            show_quantity(p.sweep_temperature_k, D::temperature, du, 3), pumploss::version_string);
  pl.x.label = std::string("outlet pressure [") + du.of(D::pressure).symbol + "]";
  pl.y.label = std::string("case drain flow [") + du.of(D::volume_flow).symbol + "]";
  pl.areas = st;

  output_set files;
  files.add("budget.svg", pl.render());
  emit(r, files, o.out, du, "budget");
  return exit_ok;
}

}  // namespace

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
