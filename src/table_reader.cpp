// Reader of comma- or semicolon-separated tables with unit-suffixed headers (table_reader.hpp).
#include "pumploss/table_reader.hpp"

#include <cctype>
#include <cerrno>
#include <cmath>
#include <cstdio>
#include <cstdlib>
#include <fstream>
#include <set>
#include <sstream>

namespace pumploss {

namespace {

std::string_view trim(std::string_view s) {
  const auto b = s.find_first_not_of(" \t\r");
  if (b == std::string_view::npos) return {};
  const auto e = s.find_last_not_of(" \t\r");
  return s.substr(b, e - b + 1);
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
std::vector<field> split_line(int line_no, const std::string& line, char delim, table_error& err) {
  std::vector<field> out;
  std::size_t i = 0;
  while (true) {
    field f{{}, static_cast<int>(i) + 1};
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
        return out;
      }
      while (j < line.size() && (line[j] == ' ' || line[j] == '\t' || line[j] == '\r')) ++j;
      if (j < line.size() && line[j] != delim) {
        err = {status::domain, line_no, static_cast<int>(j) + 1, "text after a closing quote"};
        return out;
      }
      i = j;
    } else {
      const auto comma = line.find(delim, i);
      const std::size_t end = comma == std::string::npos ? line.size() : comma;
      f.text = std::string(trim(std::string_view(line).substr(i, end - i)));
      if (j < end) f.column = static_cast<int>(j) + 1;
      i = end;
    }
    out.push_back(std::move(f));
    if (i >= line.size()) break;
    ++i;  // past the delimiter
    if (i == line.size()) {  // trailing delimiter: an empty last field
      out.push_back(field{{}, static_cast<int>(i) + 1});
      break;
    }
  }
  return out;
}

bool parse_date(const std::string& s, long& days) {
  if (s.size() != 10 || s[4] != '-' || s[7] != '-') return false;
  for (std::size_t k : {0u, 1u, 2u, 3u, 5u, 6u, 8u, 9u})
    if (!std::isdigit(static_cast<unsigned char>(s[k]))) return false;
  const int y = std::atoi(s.substr(0, 4).c_str());
  const int m = std::atoi(s.substr(5, 2).c_str());
  const int d = std::atoi(s.substr(8, 2).c_str());
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

// The decimal mark of the numbers ('.' or ','), detected or checked against the dialect; 0 with
// `data.error` set when the numbers make it ambiguous.
char decimal_mark(char delim, csv_dialect dialect, const std::vector<raw_row>& rows,
                  const std::vector<std::size_t>& file_to_spec, table_data& data) {
  auto& err = data.error;
  const field* first_comma = nullptr;
  const field* first_point = nullptr;
  int comma_line = 0, point_line = 0;
  for (const auto& r : rows)
    for (std::size_t i = 0; i < r.fields.size(); ++i) {
      const auto& f = r.fields[i];
      if (!numeric(data.spec[file_to_spec[i]])) continue;
      const bool comma = f.text.find(',') != std::string::npos;
      const bool point = f.text.find('.') != std::string::npos;
      const std::string col = "column '" + data.spec[file_to_spec[i]].name + "': '" + f.text + "' ";
      if (comma && delim == ',') {
        err = {status::domain, r.line, f.column,
               col + "could be a thousands separator or a decimal comma in a comma-separated file; write the number "
                     "without grouping and with '.' as the decimal point, or export with ';' between fields"};
        return 0;
      }
      if (comma && point) {
        err = {status::domain, r.line, f.column,
               col + "holds both ',' and '.' (a thousands separator?); export the numbers without thousands "
                     "grouping"};
        return 0;
      }
      if (comma && first_comma == nullptr) first_comma = &f, comma_line = r.line;
      if (point && first_point == nullptr) first_point = &f, point_line = r.line;
      const bool wrong = (dialect == csv_dialect::semicolon_comma && point) ||
                         (dialect == csv_dialect::semicolon_point && comma);
      const bool mixed = dialect == csv_dialect::detect && first_comma != nullptr && first_point != nullptr;
      if (wrong || mixed) {
        const field* other = comma ? first_point : first_comma;
        const int other_line = comma ? point_line : comma_line;
        err = {status::domain, r.line, f.column,
               wrong ? col + "has a '" + (point ? "." : ",") + "' but the format given says '" +
                           (point ? "," : ".") + "' is the decimal mark; a thousands separator? export the numbers " +
                           "without grouping, or give the other format"
                     : col + "has a '" + (comma ? "," : ".") + "' but line " + std::to_string(other_line) +
                           " has '" + other->text + "': one of them is a thousands separator or the file mixes " +
                           "decimal marks; export the numbers without grouping, or give the format " +
                           "(--csv-format semicolon-comma or semicolon-point)"};
        return 0;
      }
    }
  if (delim == ',') return '.';
  if (dialect == csv_dialect::semicolon_comma) return ',';
  if (dialect == csv_dialect::semicolon_point) return '.';
  const char mark = first_comma != nullptr ? ',' : '.';
  data.notes.push_back(
      "read as separated by ';' with " +
      std::string(first_comma != nullptr   ? "',' as the decimal mark"
                  : first_point != nullptr ? "'.' as the decimal point"
                                           : "whole numbers only (no decimal mark)") +
      " (detected from the header row and the numbers)");
  return mark;
}

// Read the numbers of one data row; false (and data.error set) on a bad field.
bool read_row(const raw_row& row, char decimal, table_data& data, const std::vector<std::size_t>& file_to_spec) {
  auto& err = data.error;
  const int line_no = row.line;
  const auto& fields = row.fields;
  for (std::size_t i = 0; i < fields.size(); ++i) {
    const auto k = file_to_spec[i];
    const auto& s = data.spec[k];
    const auto& f = fields[i];
    double v = 0.0;
    const std::string col = "column '" + s.name + "': ";
    if (f.text.empty() && s.allow_missing && s.kind != column_kind::text) {
      v = std::nan("");
    } else {
      switch (s.kind) {
        case column_kind::quantity:
        case column_kind::number: {
          if (f.text.empty()) {
            err = {status::domain, line_no, f.column, col + "empty field"};
            return false;
          }
          std::string number = f.text;
          if (decimal == ',')
            for (auto& c : number)
              if (c == ',') c = '.';
          const auto num = parse_number(number);
          if (!num) {
            err = {status::domain, line_no, f.column, col + "'" + f.text + "' is not a number"};
            return false;
          }
          v = *num;
          if (s.kind == column_kind::quantity) {
            const auto r = convert(v, *data.unit[k], *find_unit(si_symbol(s.dim)));
            if (!r.usable()) {
              err = {r.st, line_no, f.column, col + status_message(static_cast<int>(r.st))};
              return false;
            }
            v = r.value;
          }
          break;
        }
        case column_kind::date: {
          long days = 0;
          if (!parse_date(f.text, days)) {
            err = {status::domain, line_no, f.column, col + "'" + f.text + "' is not a date YYYY-MM-DD"};
            return false;
          }
          v = static_cast<double>(days);
          break;
        }
        case column_kind::text:
          break;
      }
    }
    data.values[k].push_back(v);
    data.texts[k].push_back(f.text);
    data.pos[k].push_back(f.column);
  }
  data.line.push_back(line_no);
  return true;
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
  const std::string t(trim(text));
  if (t.empty()) return std::nullopt;
  // strtod also reads "inf", "nan" and hexadecimal floats: refuse them in data files.
  for (const char c : t)
    if (!(std::isdigit(static_cast<unsigned char>(c)) || c == '.' || c == '-' || c == '+' || c == 'e' || c == 'E'))
      return std::nullopt;
  const char* start = t.c_str();
  char* end = nullptr;
  errno = 0;
  const double v = std::strtod(start, &end);
  if (end == start || *end != '\0' || errno == ERANGE || !std::isfinite(v)) return std::nullopt;
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
  table_data data;
  data.source = std::move(source);
  data.spec = spec;
  data.present.assign(spec.size(), false);
  data.unit.assign(spec.size(), nullptr);
  data.values.assign(spec.size(), {});
  data.texts.assign(spec.size(), {});
  data.pos.assign(spec.size(), {});

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
    if (!line.empty() && line.back() == '\r') line.pop_back();
    if (line_no == 1 && line.size() >= 3 && static_cast<unsigned char>(line[0]) == 0xEF &&
        static_cast<unsigned char>(line[1]) == 0xBB && static_cast<unsigned char>(line[2]) == 0xBF)
      line.erase(0, 3);  // UTF-8 byte order mark written by some spreadsheets
    const auto t = trim(line);
    if (t.empty() || t.front() == '#') continue;
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
  for (const auto& r : rows)
    if (!read_row(r, decimal, data, file_to_spec)) return data;
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

}  // namespace pumploss
