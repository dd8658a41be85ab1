// pumploss health: a verdict with its reasons for every field reading of a pump's case drain
// flow (checked for plausibility, normalised to the reference pressure and temperature with the
// library's one model, against the pump's baseline and the bands of the pump file), steps by the
// tabular CUSUM, the trend after the last step, a table and an SVG with the case-drain caution.
#include <CLI/CLI.hpp>
#include <fmt/format.h>

#include <cctype>
#include <cmath>
#include <limits>
#include <vector>

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
  pumploss::csv_dialect csv_format = pumploss::csv_dialect::detect;
};

// The column of the readings file that a refusal points at.
const char* refusal_column(unsigned bit, bool clearance_from_drain) {
  switch (bit) {
    case pumploss::refuse_oil_temperature: return clearance_from_drain ? "drain temperature" : "oil temperature";
    case pumploss::refuse_drain_temperature: return "drain temperature";
    case pumploss::refuse_speed_far_from_rated: return "speed";
    case pumploss::refuse_pressure_too_low: return "outlet pressure";
    default: return "drain flow";
  }
}

// Events of the optional 'event' column.
enum class event_kind { none, oil_change, overhaul, meter_change };

std::string projection_text(const pumploss::health_projection_result<double>& pr, const std::string& unit,
                            double last_time, bool dates) {
  using K = pumploss::projection_kind;
  switch (pr.kind) {
    case K::already_worn: return "the latest verdict is worn: no projection";
    case K::not_rising: return "not rising: no crossing projected";
    case K::beyond_span: return "the worn band lies further ahead than the span of the fitted readings: not projected";
    case K::at_band_edge: return "the fitted line is at the worn band: inspect now";
    case K::unavailable: return "too few readings after the last step or event";
    case K::projected: break;
  }
  std::string s = fmt::format("reaches the worn band in about {:.0f} {}", pr.time_to_worn, unit);
  if (dates) s += " (" + civil_from_days(static_cast<long>(std::lround(last_time + pr.time_to_worn))) + ")";
  return s;
}

int run_health(const health_options& o) {
  const display_units du = make_units(o.out);
  const auto p = read_pump(o.pump);
  auto spec = field_columns();
  const auto d = read_csv(o.readings, spec, o.csv_format);
  // hard limits of the file only; what oil and pump can be at is the library's plausibility check
  d.check_range("case pressure", -1e5, 1e7, "is not a case pressure between -1 and 100 bar");
  const auto& dates = d.si("date");
  for (std::size_t i = 1; i < d.rows(); ++i)
    if (!(dates[i] >= dates[i - 1])) throw d.error(i, "date", "dates must not go back in time");
  const bool hours = d.has("operating hours");
  if (hours)
    for (std::size_t i = 0; i < d.rows(); ++i) {
      if (!(d.si("operating hours")[i] >= 0)) throw d.error(i, "operating hours", "must not be negative");
      if (i > 0 && !(d.si("operating hours")[i] >= d.si("operating hours")[i - 1]))
        throw d.error(i, "operating hours", "operating hours must not go back");
    }

  pumploss::health_bands<double> bands;
  bands.sound_max = p.fraction_bands[0];
  bands.acceptable_max = p.fraction_bands[1];
  bands.worn_min = p.fraction_bands[2];
  bands.growth_moderate = p.growth_bands[0];
  bands.growth_large = p.growth_bands[1];
  bands.hot_margin = p.hot_margin;
  bands.hot_baseline_factor = p.hot_baseline_factor;

  // a temperature column that looks like degF under a degC header is refused as a whole
  for (const char* col : {"oil temperature", "drain temperature"}) {
    if (!d.has(col)) continue;
    const auto* u = d.unit[d.col(col)];
    if (u == nullptr || std::string(u->symbol) != "degC") continue;
    std::vector<double> work(d.rows());
    if (pumploss::health_temperatures_look_fahrenheit(d.si(col).data(), d.rows(), bands, work.data()))
      throw d.error(0, col, "the values look like degF under a degC header (median above 85 degC, plausible oil "
                            "temperatures when read as degF): fix the header's unit or the values");
  }

  if (p.clearance_from_drain && !d.has("drain temperature"))
    throw input_error(o.pump, 0, 0,
                      "[health] clearance_temperature = \"drain\" needs a 'drain temperature' column in " + o.readings);

  pumploss::health_reference<double> ref{};
  ref.max_displacement_m3_rev = p.max_displacement_m3_rev;
  ref.reference_dp_pa = p.reference_dp_pa;
  ref.reference_t_k = p.reference_temperature_k;
  ref.fluid = p.oil.props;
  ref.reference_speed_rev_s = p.reference_speed_rev_s;
  ref.rated_speed_rev_s = p.rated_speed_rev_s;
  ref.constant_m3_s = p.controller_consumption_m3_s;
  ref.baseline_m3_s = p.baseline_drain_m3_s;
  ref.baseline_rise_k = p.baseline_rise_k;
  ref.baseline_state = p.baseline_deadhead ? pumploss::operating_state::deadhead : pumploss::operating_state::on_stroke;
  std::string constant_source = "controller consumption from the pump file";
  std::string baseline_source = "from the pump file";
  if (!p.fit_pressures_pa.empty()) {
    std::vector<pumploss::health_reading<double>> base;
    for (std::size_t k = 0; k < p.fit_pressures_pa.size(); ++k)
      base.push_back({p.fit_drain_m3_s[k], p.fit_pressures_pa[k], 0.0, p.fit_temperatures_k[k], p.reference_speed_rev_s});
    const auto f = pumploss::health_fit_constant(ref, base.data(), base.size());
    if (pumploss::is_error(f.st))
      throw input_error(o.pump, 0, 0, std::string("[health] baseline_fit_*: the constant part cannot be fitted: ") +
                                          status_text(f.st));
    ref.constant_m3_s = f.constant_m3_s;
    ref.baseline_m3_s = f.baseline_m3_s;
    constant_source = fmt::format("fitted from {} baseline readings{}", base.size(),
                                  f.st == status::implausible ? " (a negative fit was set to zero)" : "");
    baseline_source = constant_source;
  }
  {
    const auto chk = pumploss::assess_health(ref, bands, {ref.baseline_m3_s, ref.reference_dp_pa, 0.0,
                                                          ref.reference_t_k, ref.reference_speed_rev_s});
    if (pumploss::is_error(chk.st))
      throw input_error(o.pump, 0, 0, std::string("[health] the description cannot be used: ") + status_text(chk.st) +
                                          " (is the constant part below the baseline?)");
  }

  const std::size_t n = d.rows();
  const auto& date_text = d.texts[d.col("date")];
  const bool has_note = d.has("note");
  auto text_of = [&](const char* col, std::size_t i) { return d.has(col) ? d.texts[d.col(col)][i] : std::string(); };
  auto lower = [](std::string s) {
    for (auto& c : s) c = static_cast<char>(std::tolower(static_cast<unsigned char>(c)));
    return std::string(trim(s));
  };
  std::vector<event_kind> events(n, event_kind::none);
  std::vector<pumploss::operating_state> states(n, pumploss::operating_state::on_stroke);
  for (std::size_t i = 0; i < n; ++i) {
    const auto e = lower(text_of("event", i));
    if (e == "oil change") events[i] = event_kind::oil_change;
    else if (e == "overhaul") events[i] = event_kind::overhaul;
    else if (e == "meter change") events[i] = event_kind::meter_change;
    else if (!e.empty()) throw d.error(i, "event", "unknown event '" + e + "' (oil change, overhaul, meter change)");
    const auto st = lower(text_of("state", i));
    if (st == "deadhead") states[i] = pumploss::operating_state::deadhead;
    else if (!st.empty() && st != "on stroke") throw d.error(i, "state", "unknown state '" + st + "' (on stroke, deadhead)");
  }
  auto reading_at = [&](std::size_t i) {
    pumploss::health_reading<double> rd{d.si("drain flow")[i], d.si("outlet pressure")[i],
                                        d.has("case pressure") ? d.si("case pressure")[i] : 0.0,
                                        p.clearance_from_drain ? d.si("drain temperature")[i] : d.si("oil temperature")[i],
                                        d.si("speed")[i]};
    rd.inlet_t_k = d.si("oil temperature")[i];
    if (d.has("drain temperature")) rd.drain_t_k = d.si("drain temperature")[i];
    rd.state = states[i];
    return rd;
  };

  // pass 1: normalise (the baseline plays no part); an overhaul starts a new baseline from the
  // mean of its first three accepted readings
  std::vector<double> base_of(n, ref.baseline_m3_s);
  {
    double current = ref.baseline_m3_s;
    for (std::size_t i = 0; i < n; ++i) {
      if (events[i] == event_kind::overhaul) {
        double sum = 0;
        int k = 0;
        for (std::size_t j = i; j < n && k < 3; ++j) {
          const auto a = pumploss::assess_health(ref, bands, reading_at(j));
          if (!pumploss::is_error(a.st)) {
            sum += a.drain_at_reference_m3_s;
            ++k;
          }
        }
        if (k > 0) current = sum / k;
      }
      base_of[i] = current;
    }
  }

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
            {"drain rise [K]", cell_kind::number, D::pressure, 3},
            {"expected rise [K]", cell_kind::number, D::pressure, 3},
            {"state", cell_kind::text, D::pressure, 0},
            {"verdict", cell_kind::text, D::pressure, 0}};
  table tr;
  tr.name = "reasons";
  tr.title = "Verdicts and their reasons";
  tr.cols = {{"date", cell_kind::text, D::pressure, 0},
             {"verdict", cell_kind::text, D::pressure, 0},
             {"reasons", cell_kind::text, D::pressure, 0},
             {"note", cell_kind::text, D::pressure, 0}};
  table tx;
  tx.name = "refused";
  tx.title = "Readings refused (not scored)";
  tx.cols = {{"date", cell_kind::text, D::pressure, 0},
             {"where", cell_kind::text, D::pressure, 0},
             {"reason", cell_kind::text, D::pressure, 0}};
  // accepted readings: index, time, normalised flow, fraction, segment
  std::vector<std::size_t> acc;
  std::vector<double> time, qn, frac;
  std::vector<int> seg;
  int segment = 0;
  std::size_t scored = 0;
  svg::series normalised{"normalised drain flow", {}, {}, true, true, false};
  svg::series as_read{"drain flow as read", {}, {}, false, true, false};
  pumploss::health_assessment<double> last{};
  std::string last_date;
  std::vector<std::string> event_notes;
  for (std::size_t i = 0; i < n; ++i) {
    if (events[i] == event_kind::overhaul || events[i] == event_kind::meter_change) ++segment;
    if (events[i] != event_kind::none)
      event_notes.push_back(date_text[i] + " " + lower(text_of("event", i)) +
                            (events[i] == event_kind::overhaul      ? " (new baseline, steps and trend restart)"
                             : events[i] == event_kind::meter_change ? " (steps and trend restart)"
                                                                     : " (annotated)"));
    auto ri = ref;
    ri.baseline_m3_s = base_of[i];
    const auto rd = reading_at(i);
    const auto a = pumploss::assess_health(ri, bands, rd);
    std::string note = has_note ? d.texts[d.col("note")][i] : std::string();
    if (events[i] != event_kind::none) note += (note.empty() ? "" : "; ") + std::string("event: ") + lower(text_of("event", i));
    if (a.st == status::out_of_validity) {
      for (unsigned bit = 1; bit != 0 && bit <= a.refused; bit <<= 1)
        if (a.refused & bit) {
          const auto e = d.error(i, refusal_column(bit, p.clearance_from_drain), pumploss::health_refusal_text(bit));
          tx.rows.push_back({date_text[i], std::string(e.what()).substr(0, std::string(e.what()).find(": ")),
                             std::string(pumploss::health_refusal_text(bit))});
        }
      t.rows.push_back({date_text[i], rd.outlet_pa, d.si("oil temperature")[i], rd.speed_rev_s, rd.drain_flow_m3_s,
                        std::string("-"), std::string("-"), std::string("-"), std::string("-"), std::string("-"),
                        std::string(pumploss::operating_state_name(rd.state)), std::string("refused")});
      tr.rows.push_back({date_text[i], std::string("refused"), std::string("see the refused readings"), note});
      continue;
    }
    if (pumploss::is_error(a.st))
      throw d.error(i, "drain flow", std::string("this reading cannot be assessed: ") +
                                         pumploss::status_message(static_cast<int>(a.st)));
    last = a;
    last_date = date_text[i];
    t.rows.push_back({date_text[i], rd.outlet_pa, d.si("oil temperature")[i], rd.speed_rev_s, rd.drain_flow_m3_s,
                      a.drain_at_reference_m3_s, a.fraction_at_reference, a.growth, a.drain_rise_k, a.throttling_rise_k,
                      std::string(pumploss::operating_state_name(rd.state)),
                      std::string(pumploss::health_level_name(a.level))});
    std::string why;
    for (unsigned bit = 1; bit != 0 && bit <= a.reasons; bit <<= 1)
      if (a.reasons & bit) why += (why.empty() ? "" : " ") + std::string(pumploss::health_reason_text(bit));
    tr.rows.push_back({date_text[i], std::string(pumploss::health_level_name(a.level)), why, note});
    ++scored;
    normalised.x.push_back(dates[i]);
    normalised.y.push_back(du.show(a.drain_at_reference_m3_s, D::volume_flow));
    as_read.x.push_back(dates[i]);
    as_read.y.push_back(du.show(rd.drain_flow_m3_s, D::volume_flow));
    if (rd.state != ref.baseline_state) continue;  // steps and trend compare like with like
    acc.push_back(i);
    time.push_back(hours ? d.si("operating hours")[i] : dates[i]);
    qn.push_back(a.drain_at_reference_m3_s);
    frac.push_back(a.fraction_at_reference);
    seg.push_back(segment);
  }
  if (scored == 0) throw input_error(o.readings, 0, 0, "every reading was refused: nothing to score");
  if (acc.empty())
    throw input_error(o.readings, 0, 0, "no scored reading is in the baseline's operating state: no steps or trend");

  // steps: tabular CUSUM per segment (between overhauls and meter changes), noise from the
  // moving ranges of all accepted readings
  const std::size_t m = acc.size();
  std::vector<double> work(m);
  const auto sig = pumploss::health_noise_sigma(qn.data(), m, work.data());
  table ts;
  ts.name = "steps";
  ts.title = "Steps in the normalised drain flow (tabular CUSUM, k = 0.5, h = 5)";
  ts.cols = {{"date", cell_kind::text, D::pressure, 0},
             {"level before", cell_kind::quantity, D::volume_flow, 3},
             {"level after", cell_kind::quantity, D::volume_flow, 3},
             {"change", cell_kind::percent, D::pressure, 3},
             {"found at", cell_kind::text, D::pressure, 0}};
  std::size_t trend_from = 0, gradual = 0;
  for (std::size_t k = 0; k < m; ++k)
    if (k > 0 && seg[k] != seg[k - 1]) trend_from = k;
  if (pumploss::is_usable(sig.st) && sig.value > 0) {
    std::size_t b0 = 0;
    while (b0 < m) {
      std::size_t b1 = b0;
      while (b1 < m && seg[b1] == seg[b0]) ++b1;
      std::vector<pumploss::health_step<double>> steps(b1 - b0);
      std::size_t found = 0;
      const auto st = pumploss::health_detect_steps(qn.data() + b0, b1 - b0, std::numeric_limits<double>::quiet_NaN(),
                                                    sig.value, 0.5, 5.0, steps.data(), steps.size(), work.data(), found);
      if (pumploss::is_usable(st))
        for (std::size_t k = 0; k < found && k < steps.size(); ++k) {
          if (!steps[k].abrupt) {
            ++gradual;
            continue;
          }
          const std::size_t at = b0 + steps[k].index;
          ts.rows.push_back({date_text[acc[at]], steps[k].before, steps[k].after, steps[k].after / steps[k].before - 1,
                             date_text[acc[b0 + steps[k].signal_index]]});
          if (at > trend_from) trend_from = at;
        }
      b0 = b1;
    }
  }
  const std::size_t k_trend = m - trend_from;
  const auto trend = pumploss::fit_health_trend(time.data() + trend_from, frac.data() + trend_from, k_trend,
                                                bands.worn_min);
  const auto proj = pumploss::health_projection(trend, last.level);
  const std::string tunit = hours ? "operating hours" : "days";

  report r;
  add_input_notes(r, d);
  r.title = "Pump health from field readings: " + p.name;
  r.facts.emplace_back("Readings", fmt::format("{} ({} readings, {} to {}; {} scored, {} refused; {} in the "
                                               "baseline's state ({}) for steps and trend)",
                                               o.readings, n, date_text.front(), date_text.back(), scored, n - scored, m,
                                               pumploss::operating_state_name(ref.baseline_state)));
  r.facts.emplace_back("Pump", show_quantity(p.max_displacement_m3_rev, D::displacement, du, 3) + " maximum, rated " +
                                   show_quantity(p.rated_speed_rev_s, D::rotational_speed, du, 4) +
                                   (p.has_geometry ? "" : " (no geometry needed for the verdict)"));
  r.facts.emplace_back("Model", "drain = constant part + laminar part x (dp / dp_ref)(mu_ref / mu), mu the dynamic "
                                "viscosity at the " + std::string(p.clearance_from_drain ? "drain" : "oil") +
                                    " temperature");
  r.facts.emplace_back("Constant part", show_quantity(ref.constant_m3_s, D::volume_flow, du, 3) + " (" +
                                            constant_source + ")");
  r.facts.emplace_back("Reference state",
                       show_quantity(p.reference_dp_pa, D::pressure, du, 3) + " outlet to case, " +
                           show_quantity(p.reference_temperature_k, D::temperature, du, 3) + "; drain fraction against " +
                           show_quantity(p.max_displacement_m3_rev * p.reference_speed_rev_s, D::volume_flow, du, 4) +
                           " (maximum displacement at " + show_quantity(p.reference_speed_rev_s, D::rotational_speed, du, 4) +
                           ", whatever the reading's speed)");
  r.facts.emplace_back("Baseline", show_quantity(ref.baseline_m3_s, D::volume_flow, du, 3) + fmt::format(
                                       " ({:.2f} %, {})", 100 * ref.baseline_m3_s /
                                                              (p.max_displacement_m3_rev * p.reference_speed_rev_s),
                                       baseline_source) +
                                       (std::isfinite(ref.baseline_rise_k)
                                            ? fmt::format("; drain rise {:.1f} K {}", ref.baseline_rise_k,
                                                          pumploss::operating_state_name(ref.baseline_state))
                                            : std::string("; no baseline drain rise: heat against throttling")));
  r.facts.emplace_back("Bands", fmt::format("drain fraction sound up to {:.3g} %, acceptable up to {:.3g} %, worn from "
                                            "{:.3g} %; growth moderate above {:.3g} %, large above {:.3g} % ({})",
                                            100 * bands.sound_max, 100 * bands.acceptable_max, 100 * bands.worn_min,
                                            100 * bands.growth_moderate, 100 * bands.growth_large, p.bands_source));
  r.facts.emplace_back("Latest verdict", fmt::format("{} on {}: drain fraction {:.2f} %, growth {:+.0f} % over the baseline",
                                                     pumploss::health_level_name(last.level), last_date,
                                                     100 * last.fraction_at_reference, 100 * last.growth));
  r.facts.emplace_back("Steps", ts.rows.empty()
                                    ? fmt::format("none found ({} gradual level shifts)", gradual)
                                    : fmt::format("{} abrupt (see the steps table; {} gradual level shifts)",
                                                  ts.rows.size(), gradual));
  const std::string since = date_text[acc[trend_from]];
  if (pumploss::is_error(trend.st) || k_trend < 3)
    r.facts.emplace_back("Trend", "not available: fewer than 3 readings since " + since);
  else
    r.facts.emplace_back(
        "Trend", fmt::format("{:+.3g} percentage points per {} over the {} readings since {}; {}",
                             100 * trend.slope_per_day * (hours ? 1000.0 : 365.25), hours ? "1000 h" : "year", k_trend,
                             since, projection_text(proj, tunit, time.back(), !hours)));
  if (!event_notes.empty()) {
    std::string ev;
    for (const auto& e : event_notes) ev += (ev.empty() ? "" : "; ") + e;
    r.facts.emplace_back("Events", ev);
  }
  r.tables.push_back(std::move(t));
  r.tables.push_back(std::move(tr));
  if (!ts.rows.empty()) r.tables.push_back(std::move(ts));
  if (!tx.rows.empty()) r.tables.push_back(std::move(tx));
  r.notes.push_back("steps: tabular CUSUM (Page 1954; Montgomery, Introduction to Statistical Quality Control, 6th ed., "
                    "9.1) on the normalised drain flow; a shift is an abrupt step only when it is a jump beyond the local "
                    "quadratic trend (level-shift z test, z > 5, confirmed by 5 readings; Box and Tiao 1975), so that "
                    "accelerating wear is not called a step; level before and after are the trend at the step without "
                    "and with the jump; the trend is fitted after the last step or event and projected no further than "
                    "its span");
  r.notes.push_back("the verdict bands are common practice, no source, unless the pump file names the maker's figures");
  std::vector<std::string> caution_lines;
  {
    std::string c = pumploss::health_case_drain_caution();
    std::size_t b = 0;
    while (b <= c.size()) {
      const auto e = c.find('\n', b);
      caution_lines.push_back(c.substr(b, e == std::string::npos ? std::string::npos : e - b));
      if (e == std::string::npos) break;
      b = e + 1;
    }
    std::string joined;
    for (const auto& l : caution_lines) joined += (joined.empty() ? "" : " ") + l;
    r.notes.push_back(joined);
  }

  // the plot: normalised drain flow over time, the baseline and the fraction bands as flows at the
  // reference speed (the growth bands are in the table), the trend since the last step
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
  if (pumploss::is_usable(trend.st) && k_trend >= 3) {
    svg::series tl{"trend since " + since, {dates[acc[trend_from]], dates[acc.back()]}, {}, true, false, true};
    const double t0 = time[trend_from], t1 = time.back();
    for (const double x : {t0, t1}) tl.y.push_back(du.show((trend.intercept + trend.slope_per_day * x) * q_ref_speed, D::volume_flow));
    pl.lines.push_back(tl);
  }
  auto flow_line = [&](double q, const std::string& label) { pl.limits.push_back({du.show(q, D::volume_flow), label}); };
  flow_line(ref.baseline_m3_s, "baseline " + show_quantity(ref.baseline_m3_s, D::volume_flow, du, 3));
  flow_line(bands.sound_max * q_ref_speed, fmt::format("sound up to {:.3g} %", 100 * bands.sound_max));
  flow_line(bands.acceptable_max * q_ref_speed, fmt::format("acceptable up to {:.3g} %", 100 * bands.acceptable_max));
  flow_line(bands.worn_min * q_ref_speed, fmt::format("worn from {:.3g} %", 100 * bands.worn_min));
  pl.footer = caution_lines;

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
  sub->add_option("readings", o->readings,
                  "CSV of field readings (date, pressure, temperature, speed, drain flow; optional drain temperature, "
                  "case pressure, operating hours, state, event, note)")
      ->required()
      ->check(CLI::ExistingFile);
  sub->add_option("--pump", o->pump, "Pump file (TOML: [pump] and [health] with oil; [geometry] not needed)")
      ->required()
      ->check(CLI::ExistingFile);
  add_output_options(*sub, o->out);
  add_csv_format_option(*sub, o->csv_format);
  sub->callback([o, &rc] { rc = run_health(*o); });
}

}  // namespace plcli
