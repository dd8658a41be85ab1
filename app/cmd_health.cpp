// pumploss health: a verdict with its reasons for every field reading of a pump's case drain
// flow (checked for plausibility, normalised to the reference pressure and temperature with the
// library's one model, against the pump's baseline and the bands of the pump file), steps by the
// tabular CUSUM, the trend after the last step, a table and an SVG with the case-drain caution.
#include <CLI/CLI.hpp>
#include <fmt/format.h>

#include <algorithm>
#include <array>
#include <cctype>
#include <deque>
#include <filesystem>
#include <map>
#include <optional>
#include <string_view>
#include <tuple>
#include <variant>
#include <cmath>
#include <condition_variable>
#include <exception>
#include <limits>
#include <mutex>
#include <thread>
#include <vector>

#include "commands.hpp"
#include "common.hpp"
#include "inputs.hpp"
#include "pumploss/health.hpp"
#include "pumploss/health_series.hpp"
#include "pumploss/table_reader.hpp"
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

// The short code of one reason bit in the reasons CSV (the library's enumerator without its
// "reason_" prefix); the legend file of the codes pairs each code with its sentence.
const char* reason_code(unsigned bit) {
  switch (bit) {
    case pumploss::reason_fraction_sound: return "fraction_sound";
    case pumploss::reason_fraction_acceptable: return "fraction_acceptable";
    case pumploss::reason_fraction_elevated: return "fraction_elevated";
    case pumploss::reason_fraction_worn: return "fraction_worn";
    case pumploss::reason_growth_moderate: return "growth_moderate";
    case pumploss::reason_growth_large: return "growth_large";
    case pumploss::reason_drain_hot: return "drain_hot";
    case pumploss::reason_low_pressure_reading: return "low_pressure_reading";
    case pumploss::reason_no_baseline: return "no_baseline";
    case pumploss::reason_no_temperatures: return "no_temperatures";
    case pumploss::reason_speed_off_rated: return "speed_off_rated";
    case pumploss::reason_drain_colder: return "drain_colder";
    case pumploss::reason_state_differs: return "state_differs";
    case pumploss::reason_below_constant_part: return "below_constant_part";
    default: return "unknown";
  }
}
constexpr const char* refused_code = "refused";

// The legend file of the codes: every code of the reasons CSV with its sentence.
table reason_code_legend() {
  table t;
  t.name = "reason_codes";
  t.cols = {{"code", cell_kind::text, D::pressure, 0}, {"meaning", cell_kind::text, D::pressure, 0}};
  for (unsigned bit = 1; bit <= pumploss::reason_below_constant_part; bit <<= 1)
    t.rows.push_back({std::string(reason_code(bit)), std::string(pumploss::health_reason_text(bit))});
  t.rows.push_back({std::string(refused_code), std::string("The reading was not scored; health_refused.csv says why.")});
  return t;
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

// The plot's points: every scored reading up to this count, above it a median and a 10-90 %
// band per period (a plot of a million points is a solid block).
constexpr std::size_t plot_points_max = 3000;
constexpr std::size_t plot_periods = 120;

// Median and the 10 % and 90 % quantiles (nearest rank) of `v`, which is reordered.
std::array<double, 3> median_band(std::vector<float>& v) {
  auto at = [&](double q) {
    const auto k = static_cast<std::size_t>(std::lround(q * static_cast<double>(v.size() - 1)));
    std::nth_element(v.begin(), v.begin() + static_cast<std::ptrdiff_t>(k), v.end());
    return static_cast<double>(v[k]);
  };
  return {at(0.5), at(0.1), at(0.9)};
}

// Per-period median and band of (x, y) pairs: x the date, periods of equal length.
struct period_stats {
  std::vector<double> x, median, lo, hi;
  double days = 0;
};
period_stats aggregate(const std::vector<float>& x, const std::vector<float>& y) {
  period_stats out;
  const auto [mn, mx] = std::minmax_element(x.begin(), x.end());
  const double x0 = static_cast<double>(*mn), span = std::max(1.0, static_cast<double>(*mx) - x0);
  out.days = span / plot_periods;
  std::vector<std::vector<float>> bins(plot_periods);
  for (std::size_t i = 0; i < x.size(); ++i) {
    auto b = static_cast<std::size_t>((static_cast<double>(x[i]) - x0) / out.days);
    bins[std::min(b, plot_periods - 1)].push_back(y[i]);
  }
  for (std::size_t b = 0; b < plot_periods; ++b) {
    if (bins[b].empty()) continue;
    const auto m = median_band(bins[b]);
    out.x.push_back(x0 + (static_cast<double>(b) + 0.5) * out.days);
    out.median.push_back(m[0]);
    out.lo.push_back(m[1]);
    out.hi.push_back(m[2]);
    std::vector<float>().swap(bins[b]);
  }
  return out;
}

// A scratch file beside the output folder (the folder itself is made only when all went well).
std::string scratch_path(const output_options& out, const std::string& name) {
  if (out.out_dir.empty()) return {};
  namespace fs = std::filesystem;
  fs::path dir(out.out_dir);
  if (!dir.has_filename()) dir = dir.parent_path();
  const fs::path parent = dir.parent_path();
  if (!parent.empty()) fs::create_directories(parent);
  return (parent / ("." + dir.filename().string() + "." + name + ".partial")).string();
}

// Rows of a long table shown in the text report: all up to this count, else the head and tail.
constexpr std::size_t text_rows_max = 60;
constexpr std::size_t text_rows_end = 10;

// Keep the head and the tail of a table's rows for the text (the CSV holds every row). The items
// are kept as they come (a table's cells, or what makes them) and turned into cells at the end,
// so a long run without CSV files makes cells for the rows shown only.
template <class Item>
struct head_tail_of {
  std::vector<Item> head, ring;  // the first items, the last ones in a ring (reused)
  std::size_t count = 0;
  void add(Item item) {
    if (head.size() < text_rows_max) {
      head.push_back(std::move(item));
    } else {
      const std::size_t k = (count - text_rows_max) % text_rows_end;
      if (ring.size() <= k) ring.push_back(std::move(item));
      else ring[k] = std::move(item);
    }
    ++count;
  }
  /// The rows of the text table: every item up to text_rows_max, else head, a gap row and tail.
  /// `cells(item)` gives an item's row of cells.
  template <class Cells>
  void into(table& t, const std::string& csv_name, Cells&& cells) const {
    t.rows.clear();
    if (count <= text_rows_max) {
      for (const auto& it : head) t.rows.push_back(cells(it));
      return;
    }
    for (std::size_t i = 0; i < text_rows_end; ++i) t.rows.push_back(cells(head[i]));
    std::vector<cell> gap(t.cols.size(), std::string());
    gap[0] = fmt::format("... {} rows", count - 2 * text_rows_end);
    if (gap.size() > 1) gap[1] = "(all in " + csv_name + ")";
    t.rows.push_back(gap);
    // the last text_rows_end items: the end of the head, then the ring in the order written
    for (std::size_t k = count - text_rows_end; k < count; ++k) {
      if (k < text_rows_max) t.rows.push_back(cells(head[k]));
      else t.rows.push_back(cells(ring[(k - text_rows_max) % text_rows_end]));
    }
  }
  /// The same for items that are rows of cells already.
  void into(table& t, const std::string& csv_name) const {
    into(t, csv_name, [](const Item& c) { return c; });
  }
};
using head_tail = head_tail_of<std::vector<cell>>;

// The rows of a table_stream read ahead on a second thread, in batches handed over by swapping
// (no copy): reading and parsing is about a third of the work on a million readings. The stream
// belongs to that thread from start() until stop(); after stop() (also on the way out of an
// exception) the caller may ask it for its error and header again.
class prefetched_rows {
 public:
  explicit prefetched_rows(pumploss::table_stream& in) : in_(in), front_(batch), back_(batch) {}
  ~prefetched_rows() { stop(); }
  prefetched_rows(const prefetched_rows&) = delete;
  prefetched_rows& operator=(const prefetched_rows&) = delete;
  void start() { worker_ = std::thread([this] { run(); }); }
  /// The next row (valid until the next call), or null at the end of the table or on an error.
  const pumploss::table_row* next() {
    if (front_i_ < front_n_) return &front_[front_i_++];
    if (last_) return nullptr;
    std::unique_lock<std::mutex> lk(m_);
    cv_.wait(lk, [&] { return ready_; });
    std::swap(front_, back_);
    front_n_ = back_n_;
    front_i_ = 0;
    last_ = done_;
    ready_ = false;
    if (failure_) std::rethrow_exception(failure_);
    cv_.notify_all();
    lk.unlock();
    return front_i_ < front_n_ ? &front_[front_i_++] : nullptr;
  }
  void stop() {
    {
      std::lock_guard<std::mutex> lk(m_);
      stop_ = true;
    }
    cv_.notify_all();
    if (worker_.joinable()) worker_.join();
  }

 private:
  static constexpr std::size_t batch = 1024;
  void run() {
    std::vector<pumploss::table_row> mine(batch);
    for (bool end = false; !end;) {
      std::size_t n = 0;
      std::exception_ptr failure;
      try {
        while (n < batch && in_.next(mine[n])) ++n;
      } catch (...) {  // std::bad_alloc: rethrown on the caller's thread by next()
        failure = std::current_exception();
      }
      end = n < batch;
      std::unique_lock<std::mutex> lk(m_);
      cv_.wait(lk, [&] { return !ready_ || stop_; });
      if (stop_) return;
      std::swap(mine, back_);
      back_n_ = n;
      done_ = end;
      failure_ = failure;
      ready_ = true;
      cv_.notify_all();
    }
  }
  pumploss::table_stream& in_;
  std::vector<pumploss::table_row> front_, back_;  // the reader's batch, the one handed over
  std::size_t front_n_ = 0, front_i_ = 0, back_n_ = 0;
  bool last_ = false;                         // the reader's batch is the last
  bool ready_ = false, done_ = false, stop_ = false;  // guarded by m_
  std::exception_ptr failure_;                // guarded by m_
  std::mutex m_;
  std::condition_variable cv_;
  std::thread worker_;
};

// Set a cell to a text, keeping its storage when it holds one already.
void set_text(cell& c, std::string_view s) {
  if (auto* p = std::get_if<std::string>(&c)) p->assign(s.data(), s.size());
  else c = std::string(s);
}

int run_health(const health_options& o) {
  const display_units du = make_units(o.out);
  const auto p = read_pump(o.pump);
  const auto spec = field_columns();
  pumploss::table_stream in(o.readings, spec, o.csv_format);
  if (pumploss::is_error(in.error().st)) throw input_error(o.readings, in.error().line, in.error().column, in.error().message);
  const auto& hd = in.header();
  auto has = [&](const char* c) { return hd.has(c); };
  auto k_of = [&](const char* c) { return hd.find(c); };
  const std::size_t k_date = k_of("date"), k_out = k_of("outlet pressure"), k_oil = k_of("oil temperature"),
                    k_speed = k_of("speed"), k_drain = k_of("drain flow"), k_dt = k_of("drain temperature"),
                    k_case = k_of("case pressure"), k_note = k_of("note"), k_hours = k_of("operating hours"),
                    k_state = k_of("state"), k_event = k_of("event");
  const bool hours = has("operating hours");
  // looked up once: the row loop runs a million times
  const bool has_case = has("case pressure"), has_event = has("event"), has_state = has("state"),
             has_dt = has("drain temperature"), has_note = has("note");

  pumploss::health_bands<double> bands;
  bands.sound_max = p.fraction_bands[0];
  bands.acceptable_max = p.fraction_bands[1];
  bands.worn_min = p.fraction_bands[2];
  bands.growth_moderate = p.growth_bands[0];
  bands.growth_large = p.growth_bands[1];
  bands.hot_margin = p.hot_margin;
  bands.hot_baseline_factor = p.hot_baseline_factor;


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
      base.push_back({p.fit_drain_m3_s[k], p.fit_pressures_pa[k], k < p.fit_case_pa.size() ? p.fit_case_pa[k] : 0.0,
                      p.fit_temperatures_k[k], p.reference_speed_rev_s});
    const auto f = pumploss::health_fit_constant(ref, base.data(), base.size());
    if (pumploss::is_error(f.st))
      throw input_error(o.pump, 0, 0, std::string("[health] baseline_fit_*: the constant part cannot be fitted: ") +
                                          status_text(f.st));
    ref.constant_m3_s = f.constant_m3_s;
    ref.baseline_m3_s = f.baseline_m3_s;
    constant_source = fmt::format("fitted from {} baseline readings{}{}", base.size(),
                                  p.baseline_file.empty() ? "" : " of " + p.baseline_file,
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
  // the CSV gives each row's reasons as short codes (the legend file says what they mean:
  // a million rows of sentences were most of the bytes written); the text table keeps the sentences
  table tr_csv;
  tr_csv.name = tr.name;
  tr_csv.cols = tr.cols;
  tr_csv.cols[2].title = "reason codes";
  table tx;
  tx.name = "refused";
  tx.title = "Readings refused (not scored)";
  tx.cols = {{"date", cell_kind::text, D::pressure, 0},
             {"where", cell_kind::text, D::pressure, 0},
             {"reason", cell_kind::text, D::pressure, 0}};
  // the per-row CSVs go out as the rows are judged; the text keeps head and tail
  csv_file_writer w_t(t, du, scratch_path(o.out, "readings")), w_tr(tr_csv, du, scratch_path(o.out, "reasons")),
      w_tx(tx, du, scratch_path(o.out, "refused"));
  head_tail h_tx;

  // what a row's result needs once the series hands it back (rows after an overhaul wait a little)
  struct row_info {
    int line;
    std::string date, note, event;
    int pos_drain, pos_oil, pos_dt, pos_speed, pos_out;
    double date_days, oil_t_k;
    pumploss::health_reading<double> rd;
  };
  std::deque<row_info> waiting;
  struct reading_rec {  // what makes a reading's rows of the text tables
    row_info ri;
    pumploss::health_assessment<double> a;
  };
  head_tail_of<reading_rec> h_rd;
  std::map<unsigned, std::pair<std::string, std::string>> reasons_of;  // sentences and codes of a combination
  std::vector<cell> row_cells(t.cols.size(), 0.0), code_cells(tr.cols.size(), std::string());
  std::optional<input_error> failure;
  std::vector<float> plot_x, plot_qn, plot_q;  // scored readings, display units
  auto lower = [](std::string s) {
    for (auto& c : s) c = static_cast<char>(std::tolower(static_cast<unsigned char>(c)));
    return std::string(trim(s));
  };
  auto err_at = [&](const row_info& ri, int pos, const char* col, const std::string& what) {
    return input_error(o.readings, ri.line, pos, std::string("column '") + col + "': " + what);
  };
  // a reading's row of the readings table, and of the reasons table (sentences for the text,
  // codes for the CSV)
  auto fill_reading = [&](const row_info& ri, const pumploss::health_assessment<double>& a, std::vector<cell>& c) {
    const auto& rd = ri.rd;
    const bool refused = a.st == status::out_of_validity;
    set_text(c[0], ri.date);
    c[1] = rd.outlet_pa;
    c[2] = ri.oil_t_k;
    c[3] = rd.speed_rev_s;
    c[4] = rd.drain_flow_m3_s;
    if (refused) {
      for (std::size_t j = 5; j < 10; ++j) set_text(c[j], "-");
    } else {
      c[5] = a.drain_at_reference_m3_s;
      c[6] = a.fraction_at_reference;
      c[7] = a.growth;
      c[8] = a.drain_rise_k;
      c[9] = a.throttling_rise_k;
    }
    set_text(c[10], pumploss::operating_state_name(rd.state));
    set_text(c[11], refused ? "refused" : pumploss::health_level_name(a.level));
  };
  auto fill_why = [&](const row_info& ri, const pumploss::health_assessment<double>& a, std::vector<cell>& wr,
                      bool codes) {
    const bool refused = a.st == status::out_of_validity;
    set_text(wr[0], ri.date);
    set_text(wr[1], refused ? "refused" : pumploss::health_level_name(a.level));
    if (refused) {
      set_text(wr[2], codes ? refused_code : "see the refused readings");
    } else {
      auto& why = reasons_of[a.reasons];  // the sentences and codes of a combination of reasons, made once
      if (why.first.empty())
        for (unsigned bit = 1; bit != 0 && bit <= a.reasons; bit <<= 1)
          if (a.reasons & bit) {
            why.first += (why.first.empty() ? "" : " ") + std::string(pumploss::health_reason_text(bit));
            why.second += (why.second.empty() ? "" : " ") + std::string(reason_code(bit));
          }
      set_text(wr[2], codes ? why.second : why.first);
    }
    if (ri.event.empty()) {
      set_text(wr[3], ri.note);
    } else {
      set_text(wr[3], ri.note + (ri.note.empty() ? "" : "; ") + "event: " + ri.event);
    }
  };
  auto on_row = [&](const pumploss::health_series_row& res) {
    row_info ri = std::move(waiting.front());
    waiting.pop_front();
    if (failure) return;
    const auto& a = res.a;
    const auto& rd = ri.rd;
    const bool refused = a.st == status::out_of_validity;
    if (refused) {
      for (unsigned bit = 1; bit != 0 && bit <= a.refused; bit <<= 1)
        if (a.refused & bit) {
          const char* col = refusal_column(bit, p.clearance_from_drain);
          const std::string c(col);
          const int pos = c == "drain temperature" ? ri.pos_dt : c == "oil temperature" ? ri.pos_oil
                          : c == "speed" ? ri.pos_speed : c == "outlet pressure" ? ri.pos_out : ri.pos_drain;
          const std::string at = where(o.readings, ri.line, pos);
          std::vector<cell> row{ri.date, at.substr(0, at.size() - 2), std::string(pumploss::health_refusal_text(bit))};
          w_tx.row(row);
          h_tx.add(row);
        }
    } else if (pumploss::is_error(a.st)) {
      failure = err_at(ri, ri.pos_drain, "drain flow", std::string("this reading cannot be assessed: ") +
                                                           pumploss::status_message(static_cast<int>(a.st)));
      return;
    }
    if (w_t.active()) {  // one reused row of cells per table: no allocation per reading
      fill_reading(ri, a, row_cells);
      w_t.row(row_cells);
    }
    if (w_tr.active()) {
      fill_why(ri, a, code_cells, true);
      w_tr.row(code_cells);
    }
    if (!refused) {
      plot_x.push_back(static_cast<float>(ri.date_days));
      plot_qn.push_back(static_cast<float>(du.show(a.drain_at_reference_m3_s, D::volume_flow)));
      plot_q.push_back(static_cast<float>(du.show(rd.drain_flow_m3_s, D::volume_flow)));
    }
    h_rd.add({std::move(ri), a});  // the text's cells are made at the end, for the rows it shows
  };
  pumploss::health_series series(ref, bands, on_row);

  // a temperature column that looks like degF under a degC header is refused as a whole: kept
  // until the end (8 bytes a reading)
  std::vector<double> t_oil, t_drain;
  std::vector<std::string> event_notes;
  std::size_t n = 0;
  double last_date = 0, last_hours = 0;
  std::string first_date_text, last_date_text;
  const auto is_degc = [&](std::size_t k) {
    return hd.present[k] && hd.unit[k] != nullptr && std::string(hd.unit[k]->symbol) == "degC";
  };
  const bool keep_oil = is_degc(k_oil), keep_drain = has("drain temperature") && is_degc(k_dt);
  int first_line = 0, first_pos_oil = 0, first_pos_dt = 0;
  auto check_fahrenheit = [&] {
    for (const auto& [col, vals, pos] : {std::tuple<const char*, const std::vector<double>*, int>{"oil temperature", &t_oil, first_pos_oil},
                                         {"drain temperature", &t_drain, first_pos_dt}}) {
      if (vals->empty()) continue;
      std::vector<double> work(vals->size());
      if (pumploss::health_temperatures_look_fahrenheit(vals->data(), vals->size(), bands, work.data()))
        throw input_error(o.readings, first_line, pos,
                          std::string("column '") + col + "': the values look like degF under a degC header (median "
                          "above 85 degC, plausible oil temperatures when read as degF): fix the header's unit or the values");
    }
  };
  if (p.clearance_from_drain && !has("drain temperature")) {  // the file's units are checked first
    for (pumploss::table_row scan; in.next(scan); ++n) {
      if (n == 0) first_line = scan.line, first_pos_oil = scan.pos[k_oil];
      if (keep_oil) t_oil.push_back(scan.values[k_oil]);
    }
    if (pumploss::is_error(in.error().st)) throw input_error(o.readings, in.error().line, in.error().column, in.error().message);
    check_fahrenheit();
    throw input_error(o.pump, 0, 0,
                      "[health] clearance_temperature = \"drain\" needs a 'drain temperature' column in " + o.readings);
  }

  prefetched_rows rows(in);
  rows.start();
  while (const auto* next_row = rows.next()) {
    const auto& row = *next_row;
    const auto& v = row.values;
    auto fail = [&](std::size_t k, const std::string& what) {
      return input_error(o.readings, row.line, row.pos[k], "column '" + spec[k].name + "': " + what);
    };
    // hard limits of the file only; what oil and pump can be at is the library's plausibility check
    if (has_case && !(v[k_case] >= -1e5 && v[k_case] <= 1e7))
      throw fail(k_case, "'" + row.texts[k_case] + "' is not a case pressure between -1 and 100 bar");
    if (n > 0 && !(v[k_date] >= last_date)) throw fail(k_date, "dates must not go back in time");
    if (hours) {
      if (!(v[k_hours] >= 0)) throw fail(k_hours, "must not be negative");
      if (n > 0 && !(v[k_hours] >= last_hours)) throw fail(k_hours, "operating hours must not go back");
      last_hours = v[k_hours];
    }
    last_date = v[k_date];
    pumploss::health_series_input x;
    const std::string e = has_event ? lower(row.texts[k_event]) : std::string();
    if (e == "oil change") x.event = pumploss::health_event::oil_change;
    else if (e == "overhaul") x.event = pumploss::health_event::overhaul;
    else if (e == "meter change") x.event = pumploss::health_event::meter_change;
    else if (!e.empty()) throw fail(k_event, "unknown event '" + e + "' (oil change, overhaul, meter change)");
    const std::string st = has_state ? lower(row.texts[k_state]) : std::string();
    auto state = pumploss::operating_state::on_stroke;
    if (st == "deadhead") state = pumploss::operating_state::deadhead;
    else if (!st.empty() && st != "on stroke") throw fail(k_state, "unknown state '" + st + "' (on stroke, deadhead)");
    x.reading = {v[k_drain], v[k_out], has_case ? v[k_case] : 0.0,
                 p.clearance_from_drain ? v[k_dt] : v[k_oil], v[k_speed]};
    x.reading.inlet_t_k = v[k_oil];
    if (has_dt) x.reading.drain_t_k = v[k_dt];
    x.reading.state = state;
    x.time = hours ? v[k_hours] : v[k_date];
    x.date = v[k_date];
    x.row = n;
    if (x.event != pumploss::health_event::none)
      event_notes.push_back(row.texts[k_date] + " " + e +
                            (x.event == pumploss::health_event::overhaul       ? " (new baseline, steps and trend restart)"
                             : x.event == pumploss::health_event::meter_change ? " (steps and trend restart)"
                                                                               : " (annotated)"));
    if (n == 0) {
      first_line = row.line;
      first_pos_oil = row.pos[k_oil];
      first_pos_dt = has_dt ? row.pos[k_dt] : 0;
      first_date_text = row.texts[k_date];
    }
    last_date_text = row.texts[k_date];
    if (keep_oil) t_oil.push_back(v[k_oil]);
    if (keep_drain) t_drain.push_back(v[k_dt]);
    waiting.push_back({row.line, row.texts[k_date], has_note ? row.texts[k_note] : std::string(), e,
                       row.pos[k_drain], row.pos[k_oil], has_dt ? row.pos[k_dt] : 0,
                       row.pos[k_speed], row.pos[k_out], v[k_date], v[k_oil], x.reading});
    (void)series.feed(x);
    if (failure) throw *failure;
    ++n;
  }
  rows.stop();  // the stream is this thread's again
  if (pumploss::is_error(in.error().st)) throw input_error(o.readings, in.error().line, in.error().column, in.error().message);
  const auto sum = series.finish();
  if (failure) throw *failure;
  check_fahrenheit();
  std::vector<double>().swap(t_oil);
  std::vector<double>().swap(t_drain);
  if (sum.scored == 0) throw input_error(o.readings, 0, 0, "every reading was refused: nothing to score");
  if (sum.in_state == 0)
    throw input_error(o.readings, 0, 0, "no scored reading is in the baseline's operating state: no steps or trend");

  table ts;
  ts.name = "steps";
  ts.title = "Steps in the normalised drain flow (tabular CUSUM, k = 0.5, h = 5)";
  ts.cols = {{"date", cell_kind::text, D::pressure, 0},
             {"level before", cell_kind::quantity, D::volume_flow, 3},
             {"level after", cell_kind::quantity, D::volume_flow, 3},
             {"change", cell_kind::percent, D::pressure, 3},
             {"found at", cell_kind::text, D::pressure, 0}};
  auto day_text = [](double d) { return civil_from_days(static_cast<long>(std::lround(d))); };
  for (const auto& s : sum.steps)
    ts.rows.push_back({day_text(s.date), s.before, s.after, s.after / s.before - 1, day_text(s.signal_date)});
  table tc;
  tc.name = "changes";
  tc.title = "Verdict changes";
  tc.cols = {{"date", cell_kind::text, D::pressure, 0},
             {"from", cell_kind::text, D::pressure, 0},
             {"to", cell_kind::text, D::pressure, 0}};
  for (const auto& c : sum.changes)
    tc.rows.push_back({day_text(c.date), std::string(pumploss::health_level_name(c.from)),
                       std::string(pumploss::health_level_name(c.to))});
  const auto& trend = sum.trend;
  const std::size_t k_trend = sum.trend_count;
  const std::string tunit = hours ? "operating hours" : "days";
  const auto& last = sum.latest;

  report r;
  add_input_notes(r, hd);
  r.title = "Pump health from field readings: " + p.name;
  std::string refusals;
  for (unsigned b = 0; b < 8; ++b)
    if (sum.refused_by[b] > 0)
      refusals += fmt::format("{}{} x {}", refusals.empty() ? "" : "; ", sum.refused_by[b],
                              pumploss::health_refusal_text(1u << b));
  r.facts.emplace_back("Readings", fmt::format("{} ({} readings, {} to {}; {} scored, {} refused, {} flagged; {} in the "
                                               "baseline's state ({}) for steps and trend)",
                                               o.readings, n, first_date_text, last_date_text, sum.scored, sum.refused,
                                               sum.flagged, sum.in_state,
                                               pumploss::operating_state_name(ref.baseline_state)));
  if (!refusals.empty()) r.facts.emplace_back("Refused", refusals);
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
                                                     pumploss::health_level_name(last.level), day_text(sum.latest_date),
                                                     100 * last.fraction_at_reference, 100 * last.growth));
  r.facts.emplace_back("Verdict changes", sum.changes.empty() ? std::string("none")
                                                              : fmt::format("{} (see the verdict changes table)",
                                                                            sum.changes.size()));
  r.facts.emplace_back("Steps", ts.rows.empty()
                                    ? fmt::format("none found ({} gradual level shifts)", sum.gradual)
                                    : fmt::format("{} abrupt (see the steps table; {} gradual level shifts)",
                                                  ts.rows.size(), sum.gradual));
  const std::string since = day_text(sum.trend_from_date);
  if (pumploss::is_error(trend.st) || k_trend < 3)
    r.facts.emplace_back("Trend", "not available: fewer than 3 readings since " + since);
  else
    r.facts.emplace_back(
        "Trend", fmt::format("{:+.3g} percentage points per {} over the {} readings since {}; {}",
                             100 * trend.slope_per_day * (hours ? 1000.0 : 365.25), hours ? "1000 h" : "year", k_trend,
                             since, projection_text(sum.projection, tunit, sum.trend_t1, !hours)));
  if (!event_notes.empty()) {
    std::string ev;
    for (std::size_t i = 0; i < event_notes.size() && i < text_rows_max; ++i) ev += (ev.empty() ? "" : "; ") + event_notes[i];
    if (event_notes.size() > text_rows_max) ev += fmt::format("; and {} more", event_notes.size() - text_rows_max);
    r.facts.emplace_back("Events", ev);
  }
  h_rd.into(t, "health_readings.csv", [&](const reading_rec& rec) {
    std::vector<cell> c(t.cols.size(), 0.0);
    fill_reading(rec.ri, rec.a, c);
    return c;
  });
  h_rd.into(tr, "health_reasons.csv", [&](const reading_rec& rec) {
    std::vector<cell> c(tr.cols.size(), std::string());
    fill_why(rec.ri, rec.a, c, false);
    return c;
  });
  h_tx.into(tx, "health_refused.csv");
  t.streamed_csv = w_t.release();
  tr.streamed_csv = w_tr.release();
  tx.streamed_csv = w_tx.release();
  const bool any_refused = h_tx.count > 0;
  r.tables.push_back(std::move(t));
  r.tables.push_back(std::move(tr));
  if (!ts.rows.empty()) r.tables.push_back(std::move(ts));
  if (tc.rows.size() > text_rows_max) {  // the text shows head and tail, the CSV every change
    tc.streamed_csv = scratch_path(o.out, "changes");
    csv_file_writer w(tc, du, tc.streamed_csv);
    head_tail ht;
    for (const auto& rw : tc.rows) {
      w.row(rw);
      ht.add(rw);
    }
    ht.into(tc, "health_changes.csv");
    tc.streamed_csv = w.release();
  }
  if (!tc.rows.empty()) r.tables.push_back(std::move(tc));
  if (any_refused) r.tables.push_back(std::move(tx));
  r.notes.push_back("steps: tabular CUSUM (Page 1954; Montgomery, Introduction to Statistical Quality Control, 6th ed., "
                    "9.1) on the normalised drain flow; a shift is an abrupt step only when it is a jump beyond the local "
                    "quadratic trend (level-shift z test, z > 5, confirmed by 5 readings; Box and Tiao 1975), so that "
                    "accelerating wear is not called a step; level before and after are the trend at the step without "
                    "and with the jump; the trend is fitted after the last step or event and projected no further than "
                    "its span");
  r.notes.push_back("the verdict bands are common practice, no source, unless the pump file names the maker's figures");
  if (n > text_rows_max)
    r.notes.push_back(fmt::format("the tables show the first and last {} of {} readings; the CSV files hold every row",
                                  text_rows_end, n));
  r.notes.push_back("health_reasons.csv gives each reading's reasons as codes separated by spaces; "
                    "health_reason_codes.csv pairs every code with its sentence");
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
  // reference speed (the growth bands are in the table), the trend since the last step; above a
  // few thousand readings a median and a 10-90 % band per period, said in the legend
  const double q_ref_speed = p.max_displacement_m3_rev * p.reference_speed_rev_s;
  svg::plot pl;
  pl.title = "Case drain flow of " + p.name;
  pl.subtitle = fmt::format("normalised to {} and {}; pumploss {}", show_quantity(p.reference_dp_pa, D::pressure, du, 3),
                            show_quantity(p.reference_temperature_k, D::temperature, du, 3), pumploss::version_string);
  pl.x.label = "date";
  pl.x.dates = true;
  pl.y.label = std::string("drain flow [") + du.of(D::volume_flow).symbol + "]";
  if (plot_x.size() <= plot_points_max) {
    svg::series normalised{"normalised drain flow", {}, {}, true, true, false};
    svg::series as_read{"drain flow as read", {}, {}, false, true, false};
    for (std::size_t i = 0; i < plot_x.size(); ++i) {
      normalised.x.push_back(static_cast<double>(plot_x[i]));
      normalised.y.push_back(static_cast<double>(plot_qn[i]));
      as_read.x.push_back(static_cast<double>(plot_x[i]));
      as_read.y.push_back(static_cast<double>(plot_q[i]));
    }
    pl.lines.push_back(normalised);
    pl.lines.push_back(as_read);
  } else {
    const auto a = aggregate(plot_x, plot_qn);
    const auto b = aggregate(plot_x, plot_q);
    const std::string per = fmt::format("per {:.3g}-day period, {} readings", a.days, plot_x.size());
    pl.lines.push_back({"normalised drain flow: median " + per, a.x, a.median, true, false, false});
    pl.lines.push_back({"normalised: 10 % of the period", a.x, a.lo, true, false, true});
    pl.lines.push_back({"normalised: 90 % of the period", a.x, a.hi, true, false, true});
    pl.lines.push_back({"drain flow as read: median per period", b.x, b.median, false, true, false});
  }
  std::vector<float>().swap(plot_x);
  std::vector<float>().swap(plot_qn);
  std::vector<float>().swap(plot_q);
  if (pumploss::is_usable(trend.st) && k_trend >= 3) {
    svg::series tl{"trend since " + since, {sum.trend_from_date, sum.last_date}, {}, true, false, true};
    for (const double x : {sum.trend_t0, sum.trend_t1})
      tl.y.push_back(du.show((trend.intercept + trend.slope_per_day * x) * q_ref_speed, D::volume_flow));
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
  files.add("health_reason_codes.csv", render_csv(reason_code_legend(), du));
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
