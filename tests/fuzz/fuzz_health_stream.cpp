// libFuzzer target: the streaming path of `pumploss health` (issue 20): the streaming table reader
// (pumploss::table_stream) with the field-readings columns, every row fed to one
// pumploss::health_series, then finish(). The first byte chooses the dialect, the rest is the
// file. Every problem must come out as a table_error or a status; a crash, undefined behaviour,
// an exception, a row handed back twice or never, a scored reading with a non-finite normalised
// flow, or counts that do not add up are findings.
#include <cmath>
#include <cstdint>
#include <cstdio>
#include <cstdlib>
#include <sstream>
#include <string>
#include <vector>

#include "columns.hpp"  // the program's columns (app/)
#include "pumploss/health_series.hpp"
#include "pumploss/table_reader.hpp"

namespace {
using pumploss::column_kind;
using D = pumploss::dimension;

[[noreturn]] void finding(const char* what) {
  std::fprintf(stderr, "fuzz_health_stream: %s\n", what);
  std::abort();
}

pumploss::health_reference<double> reference() {
  pumploss::health_reference<double> r{};
  r.max_displacement_m3_rev = 71e-6;
  r.reference_dp_pa = 250e5;
  r.reference_t_k = 323.15;
  r.fluid = pumploss::typical_mineral_oil(pumploss::d341_fit(313.15, 46e-6, 373.15, 6.9e-6).value);
  r.reference_speed_rev_s = 25.0;
  r.rated_speed_rev_s = 25.0;
  r.constant_m3_s = 0.3 / 60000;
  r.baseline_m3_s = 3.1 / 60000;
  r.baseline_rise_k = 4.0;
  return r;
}
}  // namespace

extern "C" int LLVMFuzzerTestOneInput(const std::uint8_t* data, std::size_t size) {
  if (size == 0) return 0;
  static const std::vector<pumploss::column_spec> spec = plcli::field_columns();  // the program's
  static const auto at = [](const char* name) {  // a column's index in the spec, by its name
    std::size_t k = 0;
    while (k < spec.size() && spec[k].name != name) ++k;
    if (k == spec.size()) std::abort();  // the program's columns changed: this target must follow
    return k;
  };
  static const std::size_t k_date = at("date"), k_out = at("outlet pressure"), k_oil = at("oil temperature"),
                           k_speed = at("speed"), k_drain = at("drain flow"), k_dt = at("drain temperature"),
                           k_case = at("case pressure"), k_hours = at("operating hours"), k_state = at("state"),
                           k_event = at("event");
  static const auto ref = reference();
  static const pumploss::health_bands<double> bands{};
  const auto dialect = static_cast<pumploss::csv_dialect>(data[0] % 4);
  std::istringstream in(std::string(reinterpret_cast<const char*>(data) + 1, size - 1));
  pumploss::table_stream s(in, spec, "fuzz.csv", dialect);
  std::size_t handed = 0;
  pumploss::health_series series(ref, bands, [&](const pumploss::health_series_row& r) {
    if (r.row != handed) finding("a row handed back out of order");
    ++handed;
    if (pumploss::is_usable(r.a.st) && !std::isfinite(r.a.drain_at_reference_m3_s))
      finding("a scored reading with a non-finite normalised flow");
  });
  pumploss::table_row row;
  std::size_t fed = 0;
  while (s.next(row)) {
    if (row.values.size() != spec.size() || row.texts.size() != spec.size()) finding("a row of the wrong width");
    pumploss::health_series_input x;
    const auto& v = row.values;
    x.reading = {v[k_drain], v[k_out], std::isnan(v[k_case]) ? 0.0 : v[k_case], v[k_oil], v[k_speed]};
    x.reading.drain_t_k = v[k_dt];
    x.reading.inlet_t_k = v[k_oil];
    if (row.texts[k_state] == "deadhead") x.reading.state = pumploss::operating_state::deadhead;
    if (row.texts[k_event] == "overhaul") x.event = pumploss::health_event::overhaul;
    if (row.texts[k_event] == "meter change") x.event = pumploss::health_event::meter_change;
    x.time = std::isnan(v[k_hours]) ? v[k_date] : v[k_hours];
    x.date = v[k_date];
    x.row = fed++;
    if (series.feed(x) != pumploss::status::ok) finding("feed refused before finish");
  }
  if (s.error().st != pumploss::status::ok && !pumploss::is_error(s.error().st)) finding("a stream error that is not an error");
  if (pumploss::is_error(s.error().st) && s.error().message.empty()) finding("an error without a sentence");
  const auto sum = series.finish();
  if (handed != fed || sum.rows != fed) finding("rows lost");
  if (sum.scored + sum.refused != sum.rows) finding("counts do not add up");
  if (sum.ok() && !(sum.in_state > 0)) finding("ok without readings in the baseline's state");
  return 0;
}
