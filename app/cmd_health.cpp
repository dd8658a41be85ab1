// pumploss health: a verdict with its reasons for every field reading of a pump's case drain
// flow (normalised to the reference pressure and temperature, against the pump's baseline and
// the bands of the pump file), the trend over time, a table and an SVG.
#include <CLI/CLI.hpp>
#include <fmt/format.h>

#include <cmath>
#include <limits>

#include "commands.hpp"
#include "common.hpp"
#include "inputs.hpp"
#include "pumploss/health.hpp"
#include "pumploss/version.hpp"
#include "svg.hpp"

namespace plcli {

namespace {

using D = pumploss::dimension;
using pumploss::status;

struct health_options {
  std::string readings, pump;
  output_options out;
};

// "in 412 days (about 2026-08-05)", "already reached", "not rising".
std::string projection(const pumploss::health_trend<double>& t, double last_day) {
  if (!std::isfinite(t.days_to_worn)) return "not rising: no crossing projected";
  if (t.days_to_worn <= 0) return "the fitted line has already reached the worn band";
  if (t.days_to_worn > 36500) return "more than 100 years away";
  return fmt::format("reaches the worn band in about {:.0f} days ({})", t.days_to_worn,
                     civil_from_days(static_cast<long>(std::lround(last_day + t.days_to_worn))));
}

int run_health(const health_options& o) {
  const display_units du = make_units(o.out);
  const auto p = read_pump(o.pump);
  const auto d = read_csv(o.readings, field_columns());
  d.check_range("speed", 1e-3, 1e3, "is not a speed above zero");
  d.check_range("drain flow", 0.0, 1.0, "is not a flow between zero and 60000 L/min");
  d.check_range("outlet pressure", 0.0, 1e9, "is not a gauge pressure between zero and 10000 bar");
  d.check_range("case pressure", -1e5, 1e7, "is not a case pressure between -1 and 100 bar");
  d.check_range("oil temperature", 223.15, 473.15, "is not an oil temperature between -50 and 200 degC");
  d.check_range("drain temperature", 223.15, 473.15, "is not an oil temperature between -50 and 200 degC");
  const auto& dates = d.si("date");
  for (std::size_t i = 1; i < d.rows(); ++i)
    if (!(dates[i] >= dates[i - 1])) throw d.error(i, "date", "dates must not go back in time");
  if (p.clearance_from_drain && !d.has("drain temperature"))
    throw input_error(o.pump, 0, 0,
                      "[health] clearance_temperature = \"drain\" needs a 'drain temperature' column in " + o.readings);

  const auto& oil = p.oil.props;
  const auto rho = pumploss::oil_density_at(oil, p.reference_temperature_k, 0.0);
  if (!rho.usable()) throw input_error(o.pump, 0, 0, "[health] reference_temperature: no oil density there");
  pumploss::health_reference<double> ref{p.max_displacement_m3_rev,
                                         p.reference_dp_pa,
                                         p.reference_temperature_k,
                                         oil.viscosity,
                                         rho.value,
                                         oil.cp_j_kg_k,
                                         1.0,
                                         1.0,
                                         p.baseline_drain_m3_s};
  pumploss::health_bands<double> bands;
  bands.sound_max = p.fraction_bands[0];
  bands.acceptable_max = p.fraction_bands[1];
  bands.worn_min = p.fraction_bands[2];
  bands.growth_moderate = p.growth_bands[0];
  bands.growth_large = p.growth_bands[1];
  bands.hot_margin = p.hot_margin;

  const std::size_t n = d.rows();
  const auto& date_text = d.texts[d.col("date")];
  const bool has_note = d.has("note");
  table t;
  t.name = "readings";
  t.title = "Readings normalised to the reference state";
  t.cols = {{"date", cell_kind::text, D::pressure, 0},
            {"outlet pressure", cell_kind::quantity, D::pressure, 3},
            {"oil temperature", cell_kind::quantity, D::temperature, 3},
            {"speed", cell_kind::quantity, D::rotational_speed, 4},
            {"drain flow", cell_kind::quantity, D::volume_flow, 3},
            {"normalised drain flow", cell_kind::quantity, D::volume_flow, 3},
            {"drain fraction", cell_kind::percent, D::pressure, 3},
            {"growth", cell_kind::percent, D::pressure, 3},
            {"drain rise [K]", cell_kind::number, D::pressure, 2},
            {"throttling rise [K]", cell_kind::number, D::pressure, 2},
            {"verdict", cell_kind::text, D::pressure, 0}};
  table tr;
  tr.name = "reasons";
  tr.title = "Verdicts and their reasons";
  tr.cols = {{"date", cell_kind::text, D::pressure, 0},
             {"verdict", cell_kind::text, D::pressure, 0},
             {"reasons", cell_kind::text, D::pressure, 0},
             {"note", cell_kind::text, D::pressure, 0}};
  std::vector<double> days(n), frac(n);
  svg::series normalised{"normalised drain flow", {}, {}, true, true, false};
  svg::series as_read{"drain flow as read", {}, {}, false, true, false};
  pumploss::health_assessment<double> last{};
  for (std::size_t i = 0; i < n; ++i) {
    pumploss::health_reading<double> rd;
    rd.drain_flow_m3_s = d.si("drain flow")[i];
    rd.outlet_pa = d.si("outlet pressure")[i];
    rd.case_pa = d.has("case pressure") ? d.si("case pressure")[i] : 0.0;
    rd.oil_t_k = p.clearance_from_drain ? d.si("drain temperature")[i] : d.si("oil temperature")[i];
    rd.speed_rev_s = d.si("speed")[i];
    rd.inlet_t_k = d.si("oil temperature")[i];
    if (d.has("drain temperature")) rd.drain_t_k = d.si("drain temperature")[i];
    const auto a = pumploss::assess_health(ref, bands, rd);
    if (pumploss::is_error(a.st))
      throw d.error(i, "drain flow", std::string("this reading cannot be assessed: ") +
                                         pumploss::status_message(static_cast<int>(a.st)));
    last = a;
    t.rows.push_back({date_text[i], rd.outlet_pa, d.si("oil temperature")[i], rd.speed_rev_s, rd.drain_flow_m3_s,
                      a.drain_at_reference_m3_s, a.fraction_at_reference, a.growth, a.drain_rise_k,
                      a.throttling_rise_k, std::string(pumploss::health_level_name(a.level))});
    std::string why;
    for (unsigned bit = 1; bit != 0 && bit <= a.reasons; bit <<= 1)
      if (a.reasons & bit) why += (why.empty() ? "" : " ") + std::string(pumploss::health_reason_text(bit));
    tr.rows.push_back({date_text[i], std::string(pumploss::health_level_name(a.level)), why,
                       has_note ? d.texts[d.col("note")][i] : std::string()});
    days[i] = dates[i];
    frac[i] = a.fraction_at_reference;
    normalised.x.push_back(dates[i]);
    normalised.y.push_back(du.show(a.drain_at_reference_m3_s, D::volume_flow));
    as_read.x.push_back(dates[i]);
    as_read.y.push_back(du.show(rd.drain_flow_m3_s, D::volume_flow));
  }

  const auto all = pumploss::fit_health_trend(days.data(), frac.data(), n, bands.worn_min);
  const std::size_t k_recent = n >= 12 ? 12 : n;
  const auto recent = pumploss::fit_health_trend(days.data() + (n - k_recent), frac.data() + (n - k_recent), k_recent,
                                                 bands.worn_min);

  report r;
  r.title = "Pump health from field readings: " + p.name;
  r.facts.emplace_back("Readings", fmt::format("{} ({} readings, {} to {})", o.readings, n, date_text.front(),
                                               date_text.back()));
  r.facts.emplace_back("Reference state",
                       show_quantity(p.reference_dp_pa, D::pressure, du, 3) + " outlet to case, " +
                           show_quantity(p.reference_temperature_k, D::temperature, du, 3) + " (viscosity at the " +
                           (p.clearance_from_drain ? "drain" : "oil") +
                           " temperature; drain flow scaled as pressure / viscosity, laminar leakage)");
  r.facts.emplace_back("Baseline", show_quantity(p.baseline_drain_m3_s, D::volume_flow, du, 3) + fmt::format(
                                       " ({:.2f} % of {} at {})",
                                       100 * p.baseline_drain_m3_s / (p.max_displacement_m3_rev * p.reference_speed_rev_s),
                                       show_quantity(p.max_displacement_m3_rev, D::displacement, du, 3),
                                       show_quantity(p.reference_speed_rev_s, D::rotational_speed, du, 4)));
  r.facts.emplace_back("Bands", fmt::format("drain fraction sound up to {:.3g} %, acceptable up to {:.3g} %, worn from "
                                            "{:.3g} %; growth moderate above {:.3g} %, large above {:.3g} % ({})",
                                            100 * bands.sound_max, 100 * bands.acceptable_max, 100 * bands.worn_min,
                                            100 * bands.growth_moderate, 100 * bands.growth_large, p.bands_source));
  r.facts.emplace_back("Latest verdict", fmt::format("{} on {}: drain fraction {:.2f} %, growth {:+.0f} % over the baseline",
                                                     pumploss::health_level_name(last.level), date_text.back(),
                                                     100 * last.fraction_at_reference, 100 * last.growth));
  auto trend_text = [&](const pumploss::health_trend<double>& tr_, const std::string& k) {
    if (pumploss::is_error(tr_.st)) return std::string("not available: ") + status_text(tr_.st);
    return fmt::format("{:+.2f} percentage points per year over {} readings; {}", 100 * 365.25 * tr_.slope_per_day,
                       k, projection(tr_, days.back()));
  };
  r.facts.emplace_back("Trend, all readings", trend_text(all, "all " + std::to_string(n)));
  r.facts.emplace_back("Trend, recent", trend_text(recent, "the last " + std::to_string(k_recent)));
  r.tables.push_back(std::move(t));
  r.tables.push_back(std::move(tr));
  r.notes.push_back("a straight-line trend of the normalised drain fraction; wear often accelerates, so compare the "
                    "recent trend with the whole");
  r.notes.push_back("the verdict bands are common practice, no source, unless the pump file names the maker's figures");

  // the plot: normalised drain flow over time, the baseline and the fraction bands as flows at the
  // reference speed (the growth bands are in the table)
  const double q_ref_speed = p.max_displacement_m3_rev * p.reference_speed_rev_s;
  svg::plot pl;
  pl.title = "Case drain flow of " + p.name;
  pl.subtitle = fmt::format("normalised to {} and {}; pumploss {}", show_quantity(p.reference_dp_pa, D::pressure, du, 3),
                            show_quantity(p.reference_temperature_k, D::temperature, du, 3), pumploss::version_string);
  pl.x.label = "date";
  pl.x.dates = true;
  pl.y.label = std::string("drain flow [") + du.of(D::volume_flow).symbol + "]";
  pl.lines.push_back(normalised);
  pl.lines.push_back(as_read);
  if (pumploss::is_usable(all.st)) {
    svg::series tl{"trend, all readings", {days.front(), days.back()}, {}, true, false, true};
    for (const double x : tl.x) tl.y.push_back(du.show((all.intercept + all.slope_per_day * x) * q_ref_speed, D::volume_flow));
    pl.lines.push_back(tl);
  }
  auto flow_line = [&](double q, const std::string& label) { pl.limits.push_back({du.show(q, D::volume_flow), label}); };
  flow_line(p.baseline_drain_m3_s, "baseline " + show_quantity(p.baseline_drain_m3_s, D::volume_flow, du, 3));
  flow_line(bands.sound_max * q_ref_speed, fmt::format("sound up to {:.3g} %", 100 * bands.sound_max));
  flow_line(bands.acceptable_max * q_ref_speed, fmt::format("acceptable up to {:.3g} %", 100 * bands.acceptable_max));
  flow_line(bands.worn_min * q_ref_speed, fmt::format("worn from {:.3g} %", 100 * bands.worn_min));

  output_set files;
  files.add("health.svg", pl.render());
  emit(r, files, o.out, du, "health");
  return exit_ok;
}

}  // namespace

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

}  // namespace plcli
