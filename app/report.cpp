#include "report.hpp"

#include <fmt/format.h>

#include <algorithm>
#include <charconv>
#include <cmath>
#include <cstdint>
#include <cstring>
#include <filesystem>
#include <fstream>
#include <stdexcept>

#include "common.hpp"

namespace plcli {

display_units::display_units() {
  const char* defaults[16] = {"bar", "L/min", "cm3", "cm3/rev", "mPa.s", "cSt", "degC", "kW",
                              "N.m", "rpm", "mm", "kg/m3", "m/s", "kg/h", "kJ/(kg.K)", "N"};
  for (std::size_t i = 0; i < 16; ++i) unit_[i] = pumploss::find_unit(defaults[i]);
  for (std::size_t i = 0; i < 16; ++i)
    si_[i] = pumploss::find_unit(pumploss::si_symbol(static_cast<pumploss::dimension>(i)));
}

void display_units::choose(const std::string& symbol) {
  const auto* u = pumploss::find_unit(symbol);
  if (u == nullptr) throw std::invalid_argument("unknown unit '" + symbol + "' (see 'pumploss units --list')");
  unit_[static_cast<std::size_t>(u->dim)] = u;
}

const pumploss::unit_info& display_units::of(pumploss::dimension d) const {
  return *unit_[static_cast<std::size_t>(d)];
}

double display_units::show(double si, pumploss::dimension d) const {
  if (!std::isfinite(si)) return si;
  return pumploss::convert(si, *si_[static_cast<std::size_t>(d)], of(d)).value;
}

double display_units::si(double shown, pumploss::dimension d) const {
  if (!std::isfinite(shown)) return shown;
  return pumploss::convert(shown, of(d), *si_[static_cast<std::size_t>(d)]).value;
}

std::string format_sig(double v, int digits) {
  if (std::isnan(v)) return "-";
  if (std::isinf(v)) return v > 0 ? "inf" : "-inf";
  if (v == 0.0) return fmt::format("{:.{}f}", 0.0, std::max(0, digits - 1));
  const int mag = static_cast<int>(std::floor(std::log10(std::fabs(v))));
  if (mag >= 7 || mag < -4) return fmt::format("{:.{}e}", v, std::max(0, digits - 1));
  const int decimals = std::max(0, digits - 1 - mag);
  return fmt::format("{:.{}f}", v, decimals);
}

std::string heading(const column& c, const display_units& u) {
  switch (c.kind) {
    case cell_kind::quantity: return c.title + " [" + u.of(c.dim).symbol + "]";
    case cell_kind::percent: return c.title + " [%]";
    default: return c.title;
  }
}

std::string show_quantity(double si, pumploss::dimension d, const display_units& u, int digits) {
  return format_sig(u.show(si, d), digits) + " " + u.of(d).symbol;
}

namespace {

double shown_value(const column& c, double v, const display_units& u) {
  if (c.kind == cell_kind::quantity) return u.show(v, c.dim);
  if (c.kind == cell_kind::percent) return v * 100.0;
  return v;
}

// Decimals for a column so that its largest value shows `digits` significant digits.
int column_decimals(const table& t, std::size_t j, const display_units& u) {
  double maxabs = 0.0;
  for (const auto& row : t.rows)
    if (const auto* d = std::get_if<double>(&row[j]))
      if (std::isfinite(*d)) maxabs = std::max(maxabs, std::fabs(shown_value(t.cols[j], *d, u)));
  if (maxabs == 0.0) return std::max(0, t.cols[j].digits - 1);
  const int mag = static_cast<int>(std::floor(std::log10(maxabs)));
  return std::clamp(t.cols[j].digits - 1 - mag, 0, 9);
}

}  // namespace

std::string render_text(const report& r, const display_units& u) {
  std::string out = r.title + "\n" + std::string(r.title.size(), '=') + "\n\n";
  std::size_t w = 0;
  for (const auto& f : r.facts) w = std::max(w, f.first.size());
  for (const auto& f : r.facts) out += fmt::format("{:<{}}  {}\n", f.first + ":", w + 1, f.second);
  if (!r.facts.empty()) out += "\n";
  for (const auto& t : r.tables) {
    if (!t.title.empty()) out += t.title + "\n\n";
    const std::size_t nc = t.cols.size();
    std::vector<std::vector<std::string>> cells(t.rows.size(), std::vector<std::string>(nc));
    std::vector<std::size_t> width(nc);
    std::vector<bool> right(nc, true);
    for (std::size_t j = 0; j < nc; ++j) {
      const int dec = column_decimals(t, j, u);
      width[j] = heading(t.cols[j], u).size();
      right[j] = t.cols[j].kind != cell_kind::text;
      for (std::size_t i = 0; i < t.rows.size(); ++i) {
        const auto& c = t.rows[i][j];
        if (const auto* s = std::get_if<std::string>(&c)) {
          cells[i][j] = *s;
        } else {
          const double v = shown_value(t.cols[j], std::get<double>(c), u);
          cells[i][j] = std::isfinite(v) ? fmt::format("{:.{}f}", v, dec) : "-";
        }
        width[j] = std::max(width[j], cells[i][j].size());
      }
    }
    auto line = [&](const std::vector<std::string>& row) {
      std::string s;
      for (std::size_t j = 0; j < nc; ++j) {
        if (j > 0) s += "  ";
        s += right[j] ? fmt::format("{:>{}}", row[j], width[j]) : fmt::format("{:<{}}", row[j], width[j]);
      }
      while (!s.empty() && s.back() == ' ') s.pop_back();
      return s + "\n";
    };
    std::vector<std::string> head;
    for (const auto& c : t.cols) head.push_back(heading(c, u));
    out += line(head);
    std::vector<std::string> rule;
    for (std::size_t j = 0; j < nc; ++j) rule.push_back(std::string(width[j], '-'));
    out += line(rule);
    for (const auto& row : cells) out += line(row);
    out += "\n";
  }
  for (const auto& n : r.notes) out += "Note: " + n + "\n";
  if (!r.notes.empty()) out += "\n";
  out += cautions;
  return out;
}

char* format_g10(char* first, char* last, double v) {
  // %.10g: the value rounded to 10 significant digits d0.d1...d9 x 10^X, written in fixed notation
  // for -4 <= X < 10 with the trailing zeros removed. Computed as m = round(|v| 10^(9-e)) in
  // double: 10^k (k <= 15) is exact and the product is within half an ulp (< 1e-6 for m < 2^34),
  // so m is the correctly rounded mantissa unless the fraction lies within 1e-5 of one half;
  // those values, zero, and the exponent notation go to std::to_chars.
  static const double p10[] = {1e0, 1e1, 1e2, 1e3, 1e4, 1e5, 1e6, 1e7, 1e8, 1e9, 1e10, 1e11, 1e12, 1e13, 1e14, 1e15};
  auto slow = [&] { return std::to_chars(first, last, v, std::chars_format::general, 10).ptr; };
  const double a = std::fabs(v);
  if (!(a >= 1e-4 && a < 9e9) || last - first < 24) return slow();
  // decimal exponent from the binary one k: floor(k log10 2) = (k 1233) >> 12 for |k| < 1000 is
  // the exponent or one below it, and one comparison with the next power decides (an inexact
  // power below 1 misplaces only values within an ulp of it, which the mantissa check mends)
  static const double up[] = {1e-3, 1e-2, 1e-1, 1e0, 1e1, 1e2, 1e3, 1e4, 1e5, 1e6, 1e7, 1e8, 1e9, 1e10};
  int e = (std::ilogb(a) * 1233) >> 12;
  e = std::min(std::max(e, -4), 9);
  if (a >= up[e + 4]) e = std::min(e + 1, 9);
  double s = a * p10[9 - e];
  if (s < 1e9 && e > -4) s = a * p10[9 - --e];
  if (!(s >= 1e9 && s < 1e10)) return slow();
  const double fl = std::floor(s), fr = s - fl;
  if (std::fabs(fr - 0.5) < 1e-5) return slow();
  auto m = static_cast<std::uint64_t>(fl) + (fr > 0.5 ? 1u : 0u);
  if (m == 10000000000u) m = 1000000000u, ++e;
  if (e > 9) return slow();
  char d[10];
  auto hi = static_cast<std::uint32_t>(m / 100000u), lo = static_cast<std::uint32_t>(m % 100000u);
  for (int i = 4; i >= 0; --i, hi /= 10, lo /= 10) {
    d[i] = static_cast<char>('0' + hi % 10);
    d[i + 5] = static_cast<char>('0' + lo % 10);
  }
  int nd = 10;  // significant digits left after the trailing zeros
  while (nd > 1 && d[nd - 1] == '0') --nd;
  char* p = first;
  if (v < 0) *p++ = '-';
  if (e >= 0) {
    for (int i = 0; i <= e; ++i) *p++ = d[i];
    if (nd > e + 1) {
      *p++ = '.';
      for (int i = e + 1; i < nd; ++i) *p++ = d[i];
    }
  } else {
    *p++ = '0';
    *p++ = '.';
    for (int i = -1; i > e; --i) *p++ = '0';
    for (int i = 0; i < nd; ++i) *p++ = d[i];
  }
  return p;
}

namespace {
// Whether a field goes out as it is: no ',', '"' or line end (three memchr scans: fast on long
// text fields).
bool csv_plain(const std::string& s) {
  return std::memchr(s.data(), ',', s.size()) == nullptr && std::memchr(s.data(), '"', s.size()) == nullptr &&
         std::memchr(s.data(), '\n', s.size()) == nullptr;
}

// Append a field, quoted unless it is plain.
void csv_quote(std::string& out, const std::string& s) {
  if (csv_plain(s)) {
    out += s;
    return;
  }
  out += '"';
  for (const char c : s) {
    if (c == '"') out += '"';
    out += c;
  }
  out += '"';
}
}  // namespace

std::string csv_header(const table& t, const display_units& u) {
  std::string out;
  for (std::size_t j = 0; j < t.cols.size(); ++j) {
    if (j > 0) out += ",";
    // percent columns go out as plain numbers with their own name so the file reads back
    const auto& c = t.cols[j];
    csv_quote(out, c.kind == cell_kind::percent ? c.title + " percent" : heading(c, u));
  }
  return out + "\n";
}

void csv_row(std::string& out, const table& t, const std::vector<cell>& row, const display_units& u) {
  // gathered in a local line and appended once (a million rows: no append call per cell)
  char line[512];
  std::size_t n = 0;
  auto spill = [&] {
    out.append(line, n);
    n = 0;
  };
  for (std::size_t j = 0; j < row.size(); ++j) {
    if (n + 40 > sizeof line) spill();  // room for a delimiter and a number
    if (j > 0) line[n++] = ',';
    if (const auto* s = std::get_if<std::string>(&row[j])) {
      if (n + s->size() < sizeof line && csv_plain(*s)) {
        std::memcpy(line + n, s->data(), s->size());
        n += s->size();
      } else {
        spill();
        csv_quote(out, *s);
      }
    } else {
      const double v = shown_value(t.cols[j], std::get<double>(row[j]), u);
      if (std::isfinite(v))  // as "{:.10g}" (printf's %.10g), without the slow precision paths
        n = static_cast<std::size_t>(format_g10(line + n, line + sizeof line, v) - line);
    }
  }
  line[n++] = '\n';
  spill();
}

std::string csv_footer() {
  std::string out;
  std::string c = cautions;
  std::size_t pos = 0;
  while (pos < c.size()) {
    const auto nl = c.find('\n', pos);
    out += "# " + c.substr(pos, nl - pos) + "\n";
    pos = nl == std::string::npos ? c.size() : nl + 1;
  }
  return out;
}

std::string render_csv(const table& t, const display_units& u) {
  std::string out = csv_header(t, u);
  for (const auto& row : t.rows) csv_row(out, t, row, u);
  return out + csv_footer();
}

csv_file_writer::csv_file_writer(const table& columns, const display_units& u, std::string path)
    : u_(u), path_(std::move(path)) {
  t_.name = columns.name;
  t_.cols = columns.cols;
  if (path_.empty()) return;
  f_ = std::fopen(path_.c_str(), "wb");
  if (f_ == nullptr) throw std::runtime_error(path_ + ": cannot write");
  std::setvbuf(f_, nullptr, _IONBF, 0);  // buf_ is the buffer: no second copy in stdio
  buf_ = csv_header(t_, u_);
  worker_ = std::thread([this] { run(); });
}

csv_file_writer::~csv_file_writer() {
  stop();
  if (f_ != nullptr) {
    std::fclose(f_);
    std::remove(path_.c_str());
  }
}

namespace {
constexpr std::size_t csv_batch = 512;  // rows handed to the writing thread at once
}

void csv_file_writer::run() {
  std::unique_lock<std::mutex> lk(m_);
  while (true) {
    cv_.wait(lk, [&] { return ready_ || stop_; });
    if (!ready_) return;  // stopped with nothing left
    lk.unlock();
    std::string failed;
    try {
      for (std::size_t i = 0; i < work_n_; ++i) {
        csv_row(buf_, t_, work_[i], u_);
        if (buf_.size() > (1u << 16)) flush();
      }
    } catch (const std::exception& e) {
      failed = e.what();
    }
    lk.lock();
    if (error_.empty()) error_ = failed;
    ready_ = false;
    cv_.notify_all();
  }
}

void csv_file_writer::hand_over() {
  std::unique_lock<std::mutex> lk(m_);
  cv_.wait(lk, [&] { return !ready_; });
  if (!error_.empty()) throw std::runtime_error(error_);
  std::swap(batch_, work_);
  work_n_ = batch_n_;
  batch_n_ = 0;
  ready_ = true;
  cv_.notify_all();
}

void csv_file_writer::stop() {
  {
    std::lock_guard<std::mutex> lk(m_);
    stop_ = true;
  }
  cv_.notify_all();
  if (worker_.joinable()) worker_.join();
}

void csv_file_writer::flush() {
  if (!buf_.empty() && std::fwrite(buf_.data(), 1, buf_.size(), f_) != buf_.size())
    throw std::runtime_error(path_ + ": cannot write");
  buf_.clear();
}

void csv_file_writer::row(const std::vector<cell>& r) {
  if (f_ == nullptr) return;
  if (batch_n_ == batch_.size()) batch_.emplace_back();
  batch_[batch_n_++] = r;  // copy-assignment keeps the strings' storage
  if (batch_n_ == csv_batch) hand_over();
}

const std::string& csv_file_writer::release() {
  if (f_ != nullptr) {
    if (batch_n_ > 0) hand_over();
    stop();  // the last batch is written before the thread ends
    if (!error_.empty()) throw std::runtime_error(error_);
    buf_ += csv_footer();
    flush();
    const bool bad = std::fclose(f_) != 0;
    f_ = nullptr;
    if (bad) throw std::runtime_error(path_ + ": cannot write");
  }
  return path_;
}

void output_set::add(std::string name, std::string content) { files_.emplace_back(std::move(name), std::move(content)); }
void output_set::add_file(std::string name, std::string path) { moves_.emplace_back(std::move(name), std::move(path)); }

std::vector<std::string> output_set::write_all(const std::string& dir) const {
  namespace fs = std::filesystem;
  std::error_code ec;
  fs::create_directories(dir, ec);
  if (ec) throw std::runtime_error(dir + ": cannot create the output folder: " + ec.message());
  std::vector<std::string> written;
  for (const auto& [name, content] : files_) {
    const fs::path final_path = fs::path(dir) / name;
    const fs::path tmp = fs::path(dir) / ("." + name + ".tmp");
    {
      std::ofstream out(tmp, std::ios::binary | std::ios::trunc);
      out << content;
      out.flush();
      if (!out) throw std::runtime_error(tmp.string() + ": cannot write");
    }
    fs::rename(tmp, final_path, ec);
    if (ec) throw std::runtime_error(final_path.string() + ": cannot write: " + ec.message());
    written.push_back(final_path.string());
  }
  for (const auto& [name, path] : moves_) {
    const fs::path final_path = fs::path(dir) / name;
    fs::rename(path, final_path, ec);
    if (ec) throw std::runtime_error(final_path.string() + ": cannot write: " + ec.message());
    written.push_back(final_path.string());
  }
  return written;
}

// ---- the HTML report (issue 16, Deliver 8)
namespace {

std::string html_escape(const std::string& s) {
  std::string o;
  o.reserve(s.size());
  for (const char c : s) {
    switch (c) {
      case '&': o += "&amp;"; break;
      case '<': o += "&lt;"; break;
      case '>': o += "&gt;"; break;
      case '"': o += "&quot;"; break;
      default: o += c;
    }
  }
  return o;
}

// An SVG document inlined: without its XML declaration, its clip paths renamed per figure (ids are
// unique in one HTML document), scaled to the page width.
std::string inline_svg(const std::string& svg, const std::string& id) {
  std::string s = svg;
  if (s.rfind("<?xml", 0) == 0) s.erase(0, s.find("?>") + 2);
  auto replace_all = [&](const std::string& from, const std::string& to) {
    for (std::size_t p = s.find(from); p != std::string::npos; p = s.find(from, p + to.size())) s.replace(p, from.size(), to);
  };
  replace_all("\"plotarea\"", "\"" + id + "-area\"");
  replace_all("url(#plotarea)", "url(#" + id + "-area)");
  replace_all("<svg ", "<svg class=\"plot\" preserveAspectRatio=\"xMidYMid meet\" ");
  return s;
}

constexpr const char* kHtmlStyle = R"css(
body { font-family: "DejaVu Sans", Arial, Helvetica, sans-serif; font-size: 10pt; color: #111; margin: 16px auto; max-width: 1000px; }
h1 { font-size: 16pt; margin: 0 0 4px 0; }
h2 { font-size: 11.5pt; margin: 14px 0 4px 0; }
.verdict { font-size: 13pt; font-weight: bold; padding: 4px 8px; display: inline-block; border: 2px solid; }
.verdict.pass { color: #0b6b0b; border-color: #0b6b0b; }
.verdict.fail { color: #b00000; border-color: #b00000; }
table { border-collapse: collapse; margin: 4px 0 10px 0; font-size: 8pt; }
th, td { border: 1px solid #bbb; padding: 1px 4px; vertical-align: top; }
th { background: #eee; font-weight: bold; text-align: center; }
td.num { text-align: right; white-space: nowrap; font-variant-numeric: tabular-nums; }
table.facts td { font-size: 9pt; }
table.facts td:first-child { font-weight: bold; white-space: nowrap; }
table.wide { font-size: 6.5pt; }
table.wide th, table.wide td { padding: 1px 2px; }
tr.outlier td { background: #fff1cc; }
tr.excluded td { background: #ffe0e0; }
tr.fail td { background: #ffd6d6; font-weight: bold; }
figure { margin: 8px 0; }
figcaption { font-size: 9pt; color: #333; }
svg.plot { width: 100%; height: auto; }
.notes li { font-size: 8.5pt; }
.cautions { border: 2px solid #7a2e00; padding: 6px 10px; margin-top: 12px; font-size: 9pt; }
.cautions h2 { color: #7a2e00; margin-top: 0; }
section.block, figure, table, .cautions { break-inside: avoid; page-break-inside: avoid; }
h2 { break-after: avoid; page-break-after: avoid; }
@page { size: A4; margin: 12mm; }
@media print {
  body { margin: 0; max-width: none; font-size: 9pt; }
  table { font-size: 7pt; }
  svg.plot { max-height: 120mm; }
  section.figures { break-before: page; }
}
)css";

}  // namespace

std::string render_html(const report& r, const display_units& u, const std::vector<html_figure>& figures,
                        const std::string& verdict, bool pass, std::size_t lead_tables) {
  std::string o = "<!DOCTYPE html>\n<html lang=\"en\">\n<head>\n<meta charset=\"utf-8\">\n<title>" +
                  html_escape(r.title) + "</title>\n<style>" + kHtmlStyle + "</style>\n</head>\n<body>\n";
  o += "<header><h1>" + html_escape(r.title) + "</h1>\n";
  if (!verdict.empty())
    o += fmt::format("<p class=\"verdict {}\" id=\"verdict\">{}</p>\n", pass ? "pass" : "fail", html_escape(verdict));
  o += "</header>\n<section class=\"block\" id=\"facts\"><h2>Job and test</h2>\n<table class=\"facts\">\n";
  for (const auto& f : r.facts)
    o += "<tr><td>" + html_escape(f.first) + "</td><td>" + html_escape(f.second) + "</td></tr>\n";
  o += "</table></section>\n";
  auto put_table = [&](const table& t) {
    o += "<section class=\"block\"><h2>" + html_escape(t.title.empty() ? t.name : t.title) + "</h2>\n";
    // more than ten columns: a smaller font, so that the table fits the width of an A4 page
    o += "<table data-name=\"" + html_escape(t.name) + "\"" + (t.cols.size() > 10 ? " class=\"wide\"" : "") +
         ">\n<thead><tr>";
    for (const auto& c : t.cols) o += "<th>" + html_escape(heading(c, u)) + "</th>";
    o += "</tr></thead>\n<tbody>\n";
    std::vector<int> dec(t.cols.size());
    for (std::size_t j = 0; j < t.cols.size(); ++j) dec[j] = column_decimals(t, j, u);
    for (std::size_t i = 0; i < t.rows.size(); ++i) {
      const std::string cls = i < t.row_classes.size() ? t.row_classes[i] : std::string();
      o += cls.empty() ? "<tr>" : "<tr class=\"" + html_escape(cls) + "\">";
      for (std::size_t j = 0; j < t.rows[i].size(); ++j) {
        const auto& c = t.rows[i][j];
        if (const auto* s = std::get_if<std::string>(&c)) {
          o += "<td>" + html_escape(*s) + "</td>";
        } else {
          const double v = shown_value(t.cols[j], std::get<double>(c), u);
          o += std::isfinite(v) ? fmt::format("<td class=\"num\" data-value=\"{:.10g}\">{:.{}f}</td>", v, v, dec[j])
                                : std::string("<td class=\"num\" data-value=\"\">-</td>");
        }
      }
      o += "</tr>\n";
    }
    o += "</tbody></table></section>\n";
  };
  for (std::size_t k = 0; k < r.tables.size() && k < lead_tables; ++k) put_table(r.tables[k]);
  if (!figures.empty()) {
    o += "<section class=\"figures\">\n";
    for (const auto& f : figures)
      o += "<figure id=\"" + html_escape(f.id) + "\">" + inline_svg(f.svg, f.id) + "<figcaption>" +
           html_escape(f.caption) + "</figcaption></figure>\n";
    o += "</section>\n";
  }
  for (std::size_t k = lead_tables; k < r.tables.size(); ++k) put_table(r.tables[k]);
  if (!r.notes.empty()) {
    o += "<section class=\"block notes\"><h2>Notes</h2><ul>\n";
    for (const auto& n : r.notes) o += "<li>" + html_escape(n) + "</li>\n";
    o += "</ul></section>\n";
  }
  // the cautions: the program's own, line by line, and the case drain's
  o += "<section class=\"cautions\" id=\"cautions\"><h2>Cautions</h2><ul>\n";
  std::string item;
  const std::string c = cautions;
  std::size_t pos = c.find('\n') + 1;  // after the heading line
  while (pos < c.size()) {
    const auto nl = c.find('\n', pos);
    const std::string line = c.substr(pos, nl - pos);
    pos = nl == std::string::npos ? c.size() : nl + 1;
    if (line.rfind("- ", 0) == 0) {
      if (!item.empty()) o += "<li>" + html_escape(item) + "</li>\n";
      item = line.substr(2);
    } else {
      item += " " + std::string(trim(line));
    }
  }
  if (!item.empty()) o += "<li>" + html_escape(item) + "</li>\n";
  o += "<li>Never block or throttle a case drain line: the case pressure rises at once and can burst the shaft "
       "seal or the housing.</li>\n</ul></section>\n</body>\n</html>\n";
  return o;
}

}  // namespace plcli
