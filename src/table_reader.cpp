// Reader of comma- or semicolon-separated tables with unit-suffixed headers (table_reader.hpp).
#include "pumploss/table_reader.hpp"

#include <cctype>
#include <charconv>
#include <cerrno>
#include <cmath>
#include <cstdio>
#include <cstdlib>
#include <fstream>
#include <set>
#include <sstream>

namespace pumploss {

namespace {

std::string_view trim(std::string_view s) {  // plain loops: called for every field of a million rows
  auto blank = [](char c) { return c == ' ' || c == '\t' || c == '\r'; };
  std::size_t b = 0, e = s.size();
  while (b < e && blank(s[b])) ++b;
  while (e > b && blank(s[e - 1])) --e;
  return s.substr(b, e - b);
}

std::string lower(std::string_view s) {
  std::string out(s);
  for (auto& c : out) c = static_cast<char>(std::tolower(static_cast<unsigned char>(c)));
  return out;
}

struct field {
  std::string text;
  int column;  // 1-based character column of the field's first character
};

// Split one line at the delimiter; double quotes protect it and "" is a quote. On a malformed
// line `err` is set and the fields read so far are returned.
// `out` is reused from row to row (its strings keep their capacity).
void split_line(int line_no, const std::string& line, char delim, table_error& err, std::vector<field>& out) {
  std::size_t n = 0;
  auto take = [&](field&& f) {
    if (n == out.size()) out.emplace_back();
    out[n].text.swap(f.text);
    out[n++].column = f.column;
  };
  std::size_t i = 0;
  field f;
  while (true) {
    f.text.clear();
    f.column = static_cast<int>(i) + 1;
    std::size_t j = i;  // the value itself starts after leading blanks
    while (j < line.size() && (line[j] == ' ' || line[j] == '\t')) ++j;
    if (j < line.size() && line[j] == '"') {
      f.column = static_cast<int>(j) + 1;
      ++j;
      bool closed = false;
      while (j < line.size()) {
        if (line[j] == '"') {
          if (j + 1 < line.size() && line[j + 1] == '"') {
            f.text += '"';
            j += 2;
          } else {
            closed = true;
            ++j;
            break;
          }
        } else {
          f.text += line[j++];
        }
      }
      if (!closed) {
        err = {status::domain, line_no, f.column, "opening quote without a closing quote"};
        out.resize(n);
        return;
      }
      while (j < line.size() && (line[j] == ' ' || line[j] == '\t' || line[j] == '\r')) ++j;
      if (j < line.size() && line[j] != delim) {
        err = {status::domain, line_no, static_cast<int>(j) + 1, "text after a closing quote"};
        out.resize(n);
        return;
      }
      i = j;
      take(std::move(f));
    } else {  // unquoted (nearly every field): written straight into the reused slot
      const auto comma = line.find(delim, i);
      const std::size_t end = comma == std::string::npos ? line.size() : comma;
      if (n == out.size()) out.emplace_back();
      out[n].text.assign(trim(std::string_view(line).substr(i, end - i)));
      out[n++].column = j < end ? static_cast<int>(j) + 1 : f.column;
      i = end;
    }
    if (i >= line.size()) break;
    ++i;  // past the delimiter
    if (i == line.size()) {  // trailing delimiter: an empty last field
      take(field{{}, static_cast<int>(i) + 1});
      break;
    }
  }
  out.resize(n);
}

std::vector<field> split_line(int line_no, const std::string& line, char delim, table_error& err) {
  std::vector<field> out;
  split_line(line_no, line, delim, err, out);
  return out;
}

bool parse_date(const std::string& s, long& days) {
  if (s.size() != 10 || s[4] != '-' || s[7] != '-') return false;
  for (std::size_t k : {0u, 1u, 2u, 3u, 5u, 6u, 8u, 9u})
    if (!std::isdigit(static_cast<unsigned char>(s[k]))) return false;
  auto num = [&](std::size_t at, std::size_t len) {
    int v = 0;
    for (std::size_t k = at; k < at + len; ++k) v = 10 * v + (s[k] - '0');
    return v;
  };
  const int y = num(0, 4), m = num(5, 2), d = num(8, 2);
  if (m < 1 || m > 12 || d < 1) return false;
  static const int mdays[] = {31, 28, 31, 30, 31, 30, 31, 31, 30, 31, 30, 31};
  const bool leap = (y % 4 == 0 && y % 100 != 0) || y % 400 == 0;
  const int dim = mdays[m - 1] + ((m == 2 && leap) ? 1 : 0);
  if (d > dim) return false;
  days = days_from_civil(y, m, d);
  return true;
}

// Split "name [unit]" or "name (unit)" into name and unit; false when the brackets are malformed.
bool split_name_unit(const std::string& text, std::string& name, std::string& unit) {
  name = text;
  unit.clear();
  const auto lb = text.find('[');
  if (lb != std::string::npos) {
    const auto rb = text.find(']', lb);
    if (rb == std::string::npos || !trim(std::string_view(text).substr(rb + 1)).empty()) return false;
    name = std::string(trim(std::string_view(text).substr(0, lb)));
    unit = std::string(trim(std::string_view(text).substr(lb + 1, rb - lb - 1)));
    return true;
  }
  const auto t = trim(text);
  if (t.empty() || t.back() != ')') return true;
  // the '(' matching the final ')': units such as J/(kg.K) hold parentheses themselves
  int depth = 0;
  for (std::size_t k = t.size(); k-- > 0;) {
    if (t[k] == ')') ++depth;
    if (t[k] == '(' && --depth == 0) {
      name = std::string(trim(t.substr(0, k)));
      unit = std::string(trim(t.substr(k + 1, t.size() - k - 2)));
      return true;
    }
  }
  return false;
}

std::string delimiter_text(char d) { return d == '\t' ? std::string("TAB") : std::string(1, d); }

// Count of a character outside double quotes, and the 1-based column of its first such place.
std::size_t count_unquoted(const std::string& line, char c, int& first) {
  std::size_t n = 0;
  bool quoted = false;
  first = 0;
  for (std::size_t i = 0; i < line.size(); ++i) {
    if (line[i] == '"') quoted = !quoted;
    if (!quoted && line[i] == c && n++ == 0) first = static_cast<int>(i) + 1;
  }
  return n;
}

// The delimiter of the file from the header row (',' or ';'); 0 with `err` set when the row holds both.
char header_delimiter(int line_no, const std::string& line, csv_dialect dialect, table_error& err) {
  if (dialect == csv_dialect::comma) return ',';
  if (dialect == csv_dialect::semicolon_comma || dialect == csv_dialect::semicolon_point) return ';';
  int at_comma = 0, at_semicolon = 0;
  const auto commas = count_unquoted(line, ',', at_comma);
  const auto semicolons = count_unquoted(line, ';', at_semicolon);
  if (commas > 0 && semicolons > 0) {
    err = {status::domain, line_no, commas < semicolons ? at_comma : at_semicolon,
           "the header row holds both ',' and ';' between names: the delimiter cannot be told; export with one "
           "delimiter or give the format (--csv-format comma or semicolon-comma)"};
    return 0;
  }
  return semicolons > 0 ? ';' : ',';
}

// Read the header row into `data` (present, unit, notes) and the field-to-spec map.
void read_header(int line_no, const std::string& line, char delim, table_data& data,
                 std::vector<std::size_t>& file_to_spec) {
  const auto& spec = data.spec;
  auto& err = data.error;
  auto fields = split_line(line_no, line, delim, err);
  if (is_error(err.st)) return;
  if (fields.size() == 1) {
    for (const char d : {',', ';', '\t', '|'}) {
      const auto at = line.find(d);
      if (d != delim && at != std::string::npos) {
        err = {status::domain, line_no, static_cast<int>(at) + 1,
               "the header row is separated by '" + delimiter_text(d) + "'; pumploss reads files separated by ',' " +
                   "(with '.' as the decimal point) or by ';' (with ',' or '.')" +
                   (d == ',' || d == ';' ? std::string(": give the format to match (--csv-format)") : std::string())};
        return;
      }
    }
  }
  std::set<std::size_t> seen;
  for (const auto& f : fields) {
    std::string name, unit;
    if (!split_name_unit(f.text, name, unit)) {
      err = {status::domain, line_no, f.column, "column '" + f.text + "': write the unit as 'name [unit]' or 'name (unit)'"};
      return;
    }
    if (name.empty()) {
      err = {status::domain, line_no, f.column, "empty column name in the header row"};
      return;
    }
    std::size_t k = 0;
    while (k < spec.size() && lower(spec[k].name) != lower(name)) ++k;
    if (k == spec.size()) {
      std::string expected;
      for (const auto& s : spec) expected += (expected.empty() ? "'" : ", '") + s.name + "'";
      err = {status::domain, line_no, f.column, "unknown column '" + name + "' (this file may have: " + expected + ")"};
      return;
    }
    if (!seen.insert(k).second) {
      err = {status::domain, line_no, f.column, "column '" + name + "' appears twice"};
      return;
    }
    const auto& s = spec[k];
    const std::string units = std::string(" (units of ") + dimension_name(s.dim) + ": " + unit_symbols(s.dim) + ")";
    if (s.kind == column_kind::quantity) {
      if (unit.empty()) {
        err = {status::domain, line_no, f.column,
               "column '" + name + "' needs its unit in brackets, e.g. '" + s.name + " [" + si_symbol(s.dim) + "]'" +
                   units};
        return;
      }
      bool windows_1252 = false;
      const auto* u = find_unit_written(unit, &windows_1252);
      if (u == nullptr) {
        err = {status::unknown_unit, line_no, f.column, "column '" + name + "': unknown unit '" + unit + "'" + units};
        return;
      }
      if (u->dim != s.dim) {
        err = {status::incompatible_units, line_no, f.column,
               "column '" + name + "': '" + unit + "' is a unit of " + dimension_name(u->dim) + ", this column holds " +
                   dimension_name(s.dim) + " (" + unit_symbols(s.dim) + ")"};
        return;
      }
      if (windows_1252)
        data.notes.push_back("column '" + name + "': the unit is written in Windows-1252, not UTF-8; read as '" +
                             u->symbol + "'");
      data.unit[k] = u;
    } else if (!unit.empty()) {
      err = {status::domain, line_no, f.column, "column '" + name + "' takes no unit"};
      return;
    }
    data.present[k] = true;
    file_to_spec.push_back(k);
  }
  for (std::size_t k = 0; k < spec.size(); ++k)
    if (spec[k].required && !data.present[k]) {
      err = {status::insufficient_data, line_no, 0, "missing column '" + spec[k].name + "' in the header row"};
      return;
    }
}

// A data row as split, before its numbers are read.
struct raw_row {
  int line;
  std::vector<field> fields;
};

// Split one data row and check its field count; false (and data.error set) when it does not fit.
bool split_row(int line_no, const std::string& line, char delim, std::size_t n_fields,
               std::vector<raw_row>& rows, table_error& err) {
  auto fields = split_line(line_no, line, delim, err);
  if (is_error(err.st)) return false;
  if (fields.size() != n_fields) {
    std::string hint;
    if (fields.size() > n_fields && delim == ',')
      hint = " (a decimal comma or a thousands separator in a comma-separated file: '1,500' could be 1.5 or 1500; "
             "write 1.5 or 1500, or export with ';' between fields)";
    else if (fields.size() > n_fields)
      hint = " (a ';' inside a field? quote the field)";
    else if (line.find(delim == ',' ? ';' : ',') != std::string::npos || line.find('\t') != std::string::npos)
      hint = std::string(" (this row is not separated by '") + delim + "' as the header row is)";
    err = {status::domain, line_no, fields.size() > n_fields ? fields[n_fields].column : 0,
           std::to_string(fields.size()) + " fields, the header row has " + std::to_string(n_fields) + hint};
    return false;
  }
  rows.push_back({line_no, std::move(fields)});
  return true;
}

bool numeric(const column_spec& s) { return s.kind == column_kind::quantity || s.kind == column_kind::number; }

// What the numbers seen so far say about the decimal mark.
struct decimal_state {
  std::string comma_text, point_text;  // first field with ',' / with '.'
  int comma_line = 0, point_line = 0;
  bool comma = false, point = false;
};

// Check the numbers of one split row for their decimal marks (delimiter `delim`, dialect as
// given); false with `data.error` set when they make the file ambiguous.
bool check_decimals(int line_no, const std::vector<field>& fields, char delim, csv_dialect dialect,
                    const std::vector<std::size_t>& file_to_spec, table_data& data, decimal_state& ds) {
  auto& err = data.error;
  for (std::size_t i = 0; i < fields.size(); ++i) {
    const auto& f = fields[i];
    if (!numeric(data.spec[file_to_spec[i]])) continue;
    const bool comma = f.text.find(',') != std::string::npos;
    const bool point = f.text.find('.') != std::string::npos;
    if (!comma && !point) continue;
    auto col = [&] { return "column '" + data.spec[file_to_spec[i]].name + "': '" + f.text + "' "; };
    if (comma && delim == ',') {
      err = {status::domain, line_no, f.column,
             col() + "could be a thousands separator or a decimal comma in a comma-separated file; write the number "
                   "without grouping and with '.' as the decimal point, or export with ';' between fields"};
      return false;
    }
    if (comma && point) {
      err = {status::domain, line_no, f.column,
             col() + "holds both ',' and '.' (a thousands separator?); export the numbers without thousands "
                   "grouping"};
      return false;
    }
    if (comma && !ds.comma) ds.comma = true, ds.comma_text = f.text, ds.comma_line = line_no;
    if (point && !ds.point) ds.point = true, ds.point_text = f.text, ds.point_line = line_no;
    const bool wrong = (dialect == csv_dialect::semicolon_comma && point) ||
                       (dialect == csv_dialect::semicolon_point && comma);
    const bool mixed = dialect == csv_dialect::detect && ds.comma && ds.point;
    if (wrong || mixed) {
      const std::string& other = comma ? ds.point_text : ds.comma_text;
      const int other_line = comma ? ds.point_line : ds.comma_line;
      err = {status::domain, line_no, f.column,
             wrong ? col() + "has a '" + (point ? "." : ",") + "' but the format given says '" +
                         (point ? "," : ".") + "' is the decimal mark; a thousands separator? export the numbers " +
                         "without grouping, or give the other format"
                   : col() + "has a '" + (comma ? "," : ".") + "' but line " + std::to_string(other_line) +
                         " has '" + other + "': one of them is a thousands separator or the file mixes " +
                         "decimal marks; export the numbers without grouping, or give the format " +
                         "(--csv-format semicolon-comma or semicolon-point)"};
      return false;
    }
  }
  return true;
}

// The decimal mark once the numbers are checked ('.' or ','), with the note for a ';' file.
char decided_mark(char delim, csv_dialect dialect, const decimal_state& ds, table_data& data) {
  if (delim == ',') return '.';
  if (dialect == csv_dialect::semicolon_comma) return ',';
  if (dialect == csv_dialect::semicolon_point) return '.';
  data.notes.push_back("read as separated by ';' with " +
                       std::string(ds.comma   ? "',' as the decimal mark"
                                   : ds.point ? "'.' as the decimal point"
                                              : "whole numbers only (no decimal mark)") +
                       " (detected from the header row and the numbers)");
  return ds.comma ? ',' : '.';
}

// The decimal mark of the numbers ('.' or ','), detected or checked against the dialect; 0 with
// `data.error` set when the numbers make it ambiguous.
char decimal_mark(char delim, csv_dialect dialect, const std::vector<raw_row>& rows,
                  const std::vector<std::size_t>& file_to_spec, table_data& data) {
  decimal_state ds;
  for (const auto& r : rows)
    if (!check_decimals(r.line, r.fields, delim, dialect, file_to_spec, data, ds)) return 0;
  return decided_mark(delim, dialect, ds, data);
}

// Read the numbers of one data row into `put(spec index, SI value, field)`; false (and `err`
// set) on a bad field. `si_unit` holds the SI unit of every quantity column of the spec.
template <class Put>
bool read_fields(int line_no, const std::vector<field>& fields, char decimal, const table_data& data,
                 const std::vector<std::size_t>& file_to_spec, const std::vector<const unit_info*>& si_unit,
                 table_error& err, std::string& number, Put&& put) {
  for (std::size_t i = 0; i < fields.size(); ++i) {
    const auto k = file_to_spec[i];
    const auto& s = data.spec[k];
    const auto& f = fields[i];
    double v = 0.0;
    auto col = [&] { return "column '" + s.name + "': "; };
    if (f.text.empty() && s.allow_missing && s.kind != column_kind::text) {
      v = std::nan("");
    } else {
      switch (s.kind) {
        case column_kind::quantity:
        case column_kind::number: {
          if (f.text.empty()) {
            err = {status::domain, line_no, f.column, col() + "empty field"};
            return false;
          }
          std::string_view text = f.text;
          if (decimal == ',' && f.text.find(',') != std::string::npos) {
            number = f.text;
            for (auto& c : number)
              if (c == ',') c = '.';
            text = number;
          }
          const auto num = parse_number(text);
          if (!num) {
            err = {status::domain, line_no, f.column, col() + "'" + f.text + "' is not a number"};
            return false;
          }
          v = *num;
          if (s.kind == column_kind::quantity) {
            const auto r = convert(v, *data.unit[k], *si_unit[k]);
            if (!r.usable()) {
              err = {r.st, line_no, f.column, col() + status_message(static_cast<int>(r.st))};
              return false;
            }
            v = r.value;
          }
          break;
        }
        case column_kind::date: {
          long days = 0;
          if (!parse_date(f.text, days)) {
            err = {status::domain, line_no, f.column, col() + "'" + f.text + "' is not a date YYYY-MM-DD"};
            return false;
          }
          v = static_cast<double>(days);
          break;
        }
        case column_kind::text:
          break;
      }
    }
    put(k, v, f);
  }
  return true;
}

// The SI unit of every quantity column of the spec (null for the others).
std::vector<const unit_info*> si_units(const std::vector<column_spec>& spec) {
  std::vector<const unit_info*> out(spec.size(), nullptr);
  for (std::size_t k = 0; k < spec.size(); ++k)
    if (spec[k].kind == column_kind::quantity) out[k] = find_unit(si_symbol(spec[k].dim));
  return out;
}

// Read the numbers of one data row; false (and data.error set) on a bad field.
bool read_row(const raw_row& row, char decimal, table_data& data, const std::vector<std::size_t>& file_to_spec,
              const std::vector<const unit_info*>& si_unit, std::string& number) {
  const bool ok = read_fields(row.line, row.fields, decimal, data, file_to_spec, si_unit, data.error, number,
                              [&](std::size_t k, double v, const field& f) {
                                data.values[k].push_back(v);
                                data.texts[k].push_back(f.text);
                                data.pos[k].push_back(f.column);
                              });
  if (ok) data.line.push_back(row.line);
  return ok;
}

// A line as read: CR and a first line's UTF-8 byte order mark removed; true for a line to skip
// (blank or a '#' comment).
bool skip_line(int line_no, std::string& line) {
  if (!line.empty() && line.back() == '\r') line.pop_back();
  if (line_no == 1 && line.size() >= 3 && static_cast<unsigned char>(line[0]) == 0xEF &&
      static_cast<unsigned char>(line[1]) == 0xBB && static_cast<unsigned char>(line[2]) == 0xBF)
    line.erase(0, 3);  // UTF-8 byte order mark written by some spreadsheets
  const auto t = trim(line);
  return t.empty() || t.front() == '#';
}

// The start of a table: the data without rows, for read_table and table_stream.
table_data empty_table(std::string source, const std::vector<column_spec>& spec) {
  table_data data;
  data.source = std::move(source);
  data.spec = spec;
  data.present.assign(spec.size(), false);
  data.unit.assign(spec.size(), nullptr);
  data.values.assign(spec.size(), {});
  data.texts.assign(spec.size(), {});
  data.pos.assign(spec.size(), {});
  return data;
}

}  // namespace

long days_from_civil(int y, int m, int d) noexcept {
  y -= m <= 2;
  const long era = (y >= 0 ? y : y - 399) / 400;
  const long yoe = y - era * 400;
  const long doy = (153 * (m + (m > 2 ? -3 : 9)) + 2) / 5 + d - 1;
  const long doe = yoe * 365 + yoe / 4 - yoe / 100 + doy;
  return era * 146097 + doe - 719468;
}

std::string civil_from_days(long z) {
  z += 719468;
  const long era = (z >= 0 ? z : z - 146096) / 146097;
  const long doe = z - era * 146097;
  const long yoe = (doe - doe / 1460 + doe / 36524 - doe / 146096) / 365;
  long y = yoe + era * 400;
  const long doy = doe - (365 * yoe + yoe / 4 - yoe / 100);
  const long mp = (5 * doy + 2) / 153;
  const long d = doy - (153 * mp + 2) / 5 + 1;
  const long m = mp + (mp < 10 ? 3 : -9);
  y += (m <= 2);
  char buf[64];
  std::snprintf(buf, sizeof buf, "%04ld-%02ld-%02ld", y, m, d);
  return buf;
}

std::optional<double> parse_number(std::string_view text) {
  std::string_view t = trim(text);
  if (t.empty()) return std::nullopt;
  // refuse "inf", "nan" and hexadecimal floats in data files
  for (const char c : t)
    if (!(std::isdigit(static_cast<unsigned char>(c)) || c == '.' || c == '-' || c == '+' || c == 'e' || c == 'E'))
      return std::nullopt;
  if (t.front() == '+') {  // as strtod: one leading '+' (from_chars takes none)
    t.remove_prefix(1);
    if (t.empty() || t.front() == '+' || t.front() == '-') return std::nullopt;
  }
  double v = 0.0;
#if defined(__cpp_lib_to_chars) && __cpp_lib_to_chars >= 201611L
  // correctly rounded as strtod, without its locale and copies (issue 20: a million rows)
  const auto r = std::from_chars(t.data(), t.data() + t.size(), v, std::chars_format::general);
  if (r.ec != std::errc() || r.ptr != t.data() + t.size() || !std::isfinite(v)) return std::nullopt;
#else
  // standard libraries without floating-point from_chars (emscripten's libc++): strtod on a copy,
  // in the C locale such builds run in; out of range refused as from_chars refuses it
  const std::string copy(t);
  char* end = nullptr;
  errno = 0;
  v = std::strtod(copy.c_str(), &end);
  if (errno == ERANGE || end != copy.c_str() + copy.size() || !std::isfinite(v)) return std::nullopt;
#endif
  return v;
}

const char* dimension_name(dimension d) noexcept {
  using D = dimension;
  switch (d) {
    case D::pressure: return "pressure";
    case D::volume_flow: return "volume flow";
    case D::volume: return "volume";
    case D::displacement: return "displacement";
    case D::dynamic_viscosity: return "dynamic viscosity";
    case D::kinematic_viscosity: return "kinematic viscosity";
    case D::temperature: return "temperature";
    case D::power: return "power";
    case D::torque: return "torque";
    case D::rotational_speed: return "speed";
    case D::length: return "length";
    case D::density: return "density";
    case D::velocity: return "velocity";
    case D::mass_flow: return "mass flow";
    case D::specific_heat: return "specific heat";
    case D::force: return "force";
  }
  return "?";
}

std::string unit_symbols(dimension d) {
  std::string s;
  for (int i = 0; i < unit_count(); ++i) {
    const auto* u = unit_at(i);
    if (u->dim != d) continue;
    if (!s.empty()) s += ", ";
    s += u->symbol;
  }
  return s;
}

std::size_t table_data::find(std::string_view name) const noexcept {
  for (std::size_t i = 0; i < spec.size(); ++i)
    if (spec[i].name == name) return i;
  return spec.size();
}

bool table_data::has(std::string_view name) const noexcept {
  const auto k = find(name);
  return k < present.size() && present[k];
}

const std::vector<double>& table_data::si(std::string_view name) const noexcept {
  static const std::vector<double> none;
  const auto k = find(name);
  return k < values.size() ? values[k] : none;
}

const char* csv_dialect_name(csv_dialect d) noexcept {
  switch (d) {
    case csv_dialect::detect: return "detect";
    case csv_dialect::comma: return "comma";
    case csv_dialect::semicolon_comma: return "semicolon-comma";
    case csv_dialect::semicolon_point: return "semicolon-point";
  }
  return "?";
}

table_data read_table(std::string_view text, const std::vector<column_spec>& spec, std::string source) {
  return read_table(text, spec, std::move(source), csv_dialect::detect);
}

table_data read_table(std::string_view text, const std::vector<column_spec>& spec, std::string source,
                      csv_dialect dialect) {
  table_data data = empty_table(std::move(source), spec);

  std::vector<std::size_t> file_to_spec;  // per field of the file: spec index
  std::vector<raw_row> rows;
  char delim = ',';
  int line_no = 0;
  bool header_done = false;
  std::size_t at = 0;
  while (at < text.size()) {
    const auto nl = text.find('\n', at);
    std::string line(text.substr(at, nl == std::string_view::npos ? std::string_view::npos : nl - at));
    at = nl == std::string_view::npos ? text.size() : nl + 1;
    ++line_no;
    if (skip_line(line_no, line)) continue;
    if (!header_done) {
      header_done = true;
      delim = header_delimiter(line_no, line, dialect, data.error);
      if (delim == 0) return data;
      read_header(line_no, line, delim, data, file_to_spec);
      if (is_error(data.error.st)) return data;
      continue;
    }
    if (!split_row(line_no, line, delim, file_to_spec.size(), rows, data.error)) return data;
  }
  if (!header_done) {
    data.error = {status::insufficient_data, line_no > 0 ? line_no : 1, 0, "the file is empty: expected a header row"};
    return data;
  }
  if (rows.empty()) {
    data.error = {status::insufficient_data, line_no, 0, "no data rows after the header row"};
    return data;
  }
  const char decimal = decimal_mark(delim, dialect, rows, file_to_spec, data);
  if (decimal == 0) return data;
  const auto si_unit = si_units(spec);
  std::string number;
  for (const auto& r : rows)
    if (!read_row(r, decimal, data, file_to_spec, si_unit, number)) return data;
  data.dialect = delim == ',' ? csv_dialect::comma : decimal == ',' ? csv_dialect::semicolon_comma : csv_dialect::semicolon_point;
  return data;
}

table_data read_table_file(const std::string& path, const std::vector<column_spec>& spec) {
  return read_table_file(path, spec, csv_dialect::detect);
}

table_data read_table_file(const std::string& path, const std::vector<column_spec>& spec, csv_dialect dialect) {
  std::ifstream in(path, std::ios::binary);
  if (!in) {
    table_data data;
    data.source = path;
    data.spec = spec;
    data.error = {status::misuse, 0, 0, "cannot open the file"};
    return data;
  }
  std::ostringstream ss;
  ss << in.rdbuf();
  return read_table(ss.str(), spec, path, dialect);
}


// ---- streaming reader (issue 20)
struct table_stream::impl {
  std::unique_ptr<std::istream> owned;
  std::istream* in = nullptr;
  table_data data;
  csv_dialect dialect = csv_dialect::detect;
  std::vector<std::size_t> file_to_spec;
  std::vector<const unit_info*> si_unit;
  std::vector<field> fields;
  decimal_state ds;
  std::string line, number;
  char delim = ',';
  char decimal = 0;  // 0 while a ';' file has shown no decimal mark yet
  int line_no = 0;
  std::size_t rows = 0;
  bool done = false;

  bool get_line() {
    while (std::getline(*in, line)) {
      ++line_no;
      if (!skip_line(line_no, line)) return true;
    }
    return false;
  }
  void start() {
    si_unit = si_units(data.spec);
    if (!get_line()) {
      data.error = {status::insufficient_data, line_no > 0 ? line_no : 1, 0, "the file is empty: expected a header row"};
      done = true;
      return;
    }
    delim = header_delimiter(line_no, line, dialect, data.error);
    if (delim == 0) {
      done = true;
      return;
    }
    read_header(line_no, line, delim, data, file_to_spec);
    if (is_error(data.error.st)) done = true;
    if (delim == ',') decimal = '.';
    if (dialect == csv_dialect::semicolon_comma) decimal = ',';
    if (dialect == csv_dialect::semicolon_point) decimal = '.';
  }
  void finish_dialect() {
    if (delim == ';' && dialect == csv_dialect::detect && !ds.comma && !ds.point) decided_mark(delim, dialect, ds, data);
    const char mark = decimal == 0 ? '.' : decimal;
    data.dialect = delim == ',' ? csv_dialect::comma : mark == ',' ? csv_dialect::semicolon_comma : csv_dialect::semicolon_point;
  }
};

table_stream::table_stream(std::istream& in, const std::vector<column_spec>& spec, std::string source,
                           csv_dialect dialect)
    : p_(new impl) {
  p_->in = &in;
  p_->data = empty_table(std::move(source), spec);
  p_->dialect = dialect;
  p_->start();
}

table_stream::table_stream(const std::string& path, const std::vector<column_spec>& spec, csv_dialect dialect)
    : p_(new impl) {
  p_->data = empty_table(path, spec);
  p_->dialect = dialect;
  auto f = std::make_unique<std::ifstream>(path, std::ios::binary);
  if (!*f) {
    p_->data.error = {status::misuse, 0, 0, "cannot open the file"};
    p_->done = true;
    return;
  }
  p_->in = f.get();
  p_->owned = std::move(f);
  p_->start();
}

table_stream::~table_stream() = default;

bool table_stream::next(table_row& row) {
  auto& s = *p_;
  if (s.done) return false;
  if (!s.get_line()) {
    s.done = true;
    if (s.rows == 0)
      s.data.error = {status::insufficient_data, s.line_no, 0, "no data rows after the header row"};
    else
      s.finish_dialect();
    return false;
  }
  auto& err = s.data.error;
  split_line(s.line_no, s.line, s.delim, err, s.fields);
  if (!is_error(err.st) && s.fields.size() != s.file_to_spec.size()) {
    std::vector<raw_row> one;  // the message of read_table
    split_row(s.line_no, s.line, s.delim, s.file_to_spec.size(), one, err);
  }
  if (!is_error(err.st) && s.decimal != '.' && s.decimal != ',' ) {
    // a ';' file still detecting: the first number with a mark decides
    if (check_decimals(s.line_no, s.fields, s.delim, s.dialect, s.file_to_spec, s.data, s.ds) && (s.ds.comma || s.ds.point))
      s.decimal = decided_mark(s.delim, s.dialect, s.ds, s.data);
  } else if (!is_error(err.st)) {
    check_decimals(s.line_no, s.fields, s.delim, s.dialect, s.file_to_spec, s.data, s.ds);
  }
  if (is_error(err.st)) {
    s.done = true;
    return false;
  }
  const std::size_t n = s.data.spec.size();
  row.line = s.line_no;
  row.values.assign(n, std::nan(""));
  row.texts.resize(n);
  for (auto& t : row.texts) t.clear();
  row.pos.assign(n, 0);
  const bool ok = read_fields(s.line_no, s.fields, s.decimal == 0 ? '.' : s.decimal, s.data, s.file_to_spec, s.si_unit,
                              err, s.number, [&](std::size_t k, double v, const field& f) {
                                row.values[k] = v;
                                row.pos[k] = f.column;
                              });
  if (!ok) {
    s.done = true;
    return false;
  }
  // the texts change places with the split fields (no copy; split_line assigns them anew)
  for (std::size_t i = 0; i < s.fields.size(); ++i) row.texts[s.file_to_spec[i]].swap(s.fields[i].text);
  ++s.rows;
  return true;
}

const table_data& table_stream::header() const noexcept { return p_->data; }
const table_error& table_stream::error() const noexcept { return p_->data.error; }
std::size_t table_stream::rows() const noexcept { return p_->rows; }

}  // namespace pumploss
