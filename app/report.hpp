// Reports: an aligned text table for people and CSV for spreadsheets, both in the display units
// the user chose, with the cautions at the foot. Values are held in SI; units apply on output.
#ifndef PUMPLOSS_CLI_REPORT_HPP
#define PUMPLOSS_CLI_REPORT_HPP

#include <array>
#include <condition_variable>
#include <cstdio>
#include <mutex>
#include <string>
#include <thread>
#include <utility>
#include <variant>
#include <vector>

#include "pumploss/units.hpp"

namespace plcli {

/// The unit shown for each dimension.
class display_units {
 public:
  /// bar, L/min, cm3, cm3/rev, mPa.s, cSt, degC, kW, N.m, rpm, mm, kg/m3, m/s, kg/h, kJ/(kg.K), N.
  display_units();
  /// Show this unit for its dimension (throws std::invalid_argument for an unknown symbol).
  void choose(const std::string& symbol);
  const pumploss::unit_info& of(pumploss::dimension d) const;
  /// SI value in the display unit.
  double show(double si, pumploss::dimension d) const;
  /// Display value back to SI.
  double si(double shown, pumploss::dimension d) const;

 private:
  std::array<const pumploss::unit_info*, 16> unit_{};
  std::array<const pumploss::unit_info*, 16> si_{};  // the SI unit per dimension, looked up once
};

/// How a column is shown.
enum class cell_kind {
  quantity,  ///< SI value shown in the display unit of `dim`
  number,    ///< plain number
  percent,   ///< a fraction shown in per cent
  text       ///< text
};

/// One column of a table.
struct column {
  std::string title;
  cell_kind kind = cell_kind::quantity;
  pumploss::dimension dim = pumploss::dimension::pressure;
  int digits = 4;  ///< significant digits (text table); CSV keeps 10
};

using cell = std::variant<double, std::string>;

/// A table of a report; `name` gives the CSV file name.
struct table {
  std::string name;
  std::string title;
  std::vector<column> cols;
  std::vector<std::vector<cell>> rows;
  std::vector<std::string> row_classes;  ///< HTML only: a class per row ("outlier", "fail"), may be empty
  std::string streamed_csv;  ///< a scratch file holding the full CSV (csv_file_writer); the text shows `rows` only
};

/// A report: title, facts (label: value), tables and notes, with the cautions at the foot.
struct report {
  std::string title;
  std::vector<std::pair<std::string, std::string>> facts;
  std::vector<table> tables;
  std::vector<std::string> notes;
};

/// Column heading with its unit: "pressure [bar]", "overall efficiency [%]".
std::string heading(const column& c, const display_units& u);
/// A quantity as text with its unit: "250.0 bar".
std::string show_quantity(double si, pumploss::dimension d, const display_units& u, int digits = 4);
/// Format a number with `digits` significant digits (fixed notation where sensible).
std::string format_sig(double v, int digits);
/// Write a finite number as printf's "%.10g" does (the CSV's numbers), byte for byte, faster
/// than std::to_chars with a precision (issue 20: ten numbers a row on a million rows).
/// @return the end of the text written into [first, last)
char* format_g10(char* first, char* last, double v);

/// The report as aligned text, cautions at the foot.
std::string render_text(const report& r, const display_units& u);
/// One table as CSV (header 'name [unit]', full precision), cautions as '#' lines at the foot.
/// The CSV reads back with read_csv().
std::string render_csv(const table& t, const display_units& u);

// ---- the HTML report (issue 16, Deliver 8)
/// A figure of an HTML report: an SVG document as svg::plot::render() gives it, with a caption.
struct html_figure {
  std::string id;       ///< unique in the report (used for the figure's element id and its clip paths)
  std::string caption;
  std::string svg;
};
/// The report as one self-contained HTML file (inline CSS and SVG, no script, no external
/// resource): title, facts, the figures, the tables (the text table's digits; every number also
/// in a data-value attribute exactly as the CSV writes it), notes, the cautions; print CSS for A4
/// with tables and figures kept whole on a page. `verdict` (may be empty) is shown under the
/// title, `pass` colours it.
/// The first `lead_tables` tables come before the figures (e.g. the acceptance verdicts).
std::string render_html(const report& r, const display_units& u, const std::vector<html_figure>& figures,
                        const std::string& verdict = {}, bool pass = true, std::size_t lead_tables = 0);

/// Files to write at the end, so that nothing is written when a step fails.
class output_set {
 public:
  void add(std::string name, std::string content);
  /// Write every file into `dir` (created when missing); each file is written to a temporary
  /// name and renamed. Returns the paths written. Throws std::runtime_error on failure.
  std::vector<std::string> write_all(const std::string& dir) const;
  /// Move a file already written (a scratch file beside the output folder) in as `name`.
  void add_file(std::string name, std::string path);
  bool empty() const { return files_.empty() && moves_.empty(); }
  const std::vector<std::pair<std::string, std::string>>& items() const { return files_; }

 private:
  std::vector<std::pair<std::string, std::string>> files_;
  std::vector<std::pair<std::string, std::string>> moves_;  // (name, scratch path)
};

// ---- streamed tables (issue 20): the CSV of a long table written row by row
/// Header, one row, and the cautions foot of a table's CSV, as render_csv() writes them.
std::string csv_header(const table& t, const display_units& u);
void csv_row(std::string& out, const table& t, const std::vector<cell>& row, const display_units& u);
std::string csv_footer();

/// The CSV of a table written row by row into a scratch file, so that a long series never sits
/// in memory; output_set::add_file() then moves it into the output folder. An empty path writes
/// nothing. The scratch file is removed when the writer is dropped before release().
/// The rows are copied in batches to a second thread that formats and writes them (issue 20:
/// formatting is about a third of the work on a million readings); a write error is thrown by
/// the next row() or by release().
class csv_file_writer {
 public:
  csv_file_writer(const table& columns, const display_units& u, std::string path);
  ~csv_file_writer();
  csv_file_writer(const csv_file_writer&) = delete;
  csv_file_writer& operator=(const csv_file_writer&) = delete;
  void row(const std::vector<cell>& r);
  /// Whether rows go to a file (false without an output folder: row() does nothing).
  bool active() const noexcept { return f_ != nullptr; }
  /// Write the foot and close; the file stays (it is moved by output_set::write_all()).
  /// @return the path
  const std::string& release();

 private:
  table t_;  // the columns (a copy: the caller may change its table meanwhile)
  const display_units& u_;
  std::string path_, buf_;
  std::FILE* f_ = nullptr;
  std::vector<std::vector<cell>> batch_, work_;  // rows gathered here, rows being written
  std::size_t batch_n_ = 0, work_n_ = 0;
  bool ready_ = false, stop_ = false;  // guarded by m_
  std::string error_;                  // guarded by m_
  std::mutex m_;
  std::condition_variable cv_;
  std::thread worker_;
  void run();
  void hand_over();
  void stop();
  void flush();
};

}  // namespace plcli

#endif
