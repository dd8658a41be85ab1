// Reader of comma-separated tables with unit-suffixed headers (table_reader.hpp).
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

// Split one line at commas; double quotes protect commas and "" is a quote. On a malformed line
// `err` is set and the fields read so far are returned.
std::vector<field> split_line(int line_no, const std::string& line, table_error& err) {
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
      if (j < line.size() && line[j] != ',') {
        err = {status::domain, line_no, static_cast<int>(j) + 1, "text after a closing quote"};
        return out;
      }
      i = j;
    } else {
      const auto comma = line.find(',', i);
      const std::size_t end = comma == std::string::npos ? line.size() : comma;
      f.text = std::string(trim(std::string_view(line).substr(i, end - i)));
      if (j < end) f.column = static_cast<int>(j) + 1;
      i = end;
    }
    out.push_back(std::move(f));
    if (i >= line.size()) break;
    ++i;  // past the comma
    if (i == line.size()) {  // trailing comma: an empty last field
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

// Read the header row into `data` (present, unit) and the field-to-spec map.
void read_header(int line_no, const std::string& line, table_data& data, std::vector<std::size_t>& file_to_spec) {
  const auto& spec = data.spec;
  auto& err = data.error;
  auto fields = split_line(line_no, line, err);
  if (is_error(err.st)) return;
  if (fields.size() == 1) {
    for (const char d : {';', '\t', '|'}) {
      const auto at = line.find(d);
      if (at != std::string::npos) {
        err = {status::domain, line_no, static_cast<int>(at) + 1,
               std::string("the header row is separated by '") + (d == '\t' ? "TAB" : std::string(1, d)) +
                   "'; pumploss reads comma-separated files (use ',' between fields and '.' as the decimal point)"};
        return;
      }
    }
  }
  std::set<std::size_t> seen;
  for (const auto& f : fields) {
    std::string name = f.text, unit;
    const auto lb = f.text.find('[');
    if (lb != std::string::npos) {
      const auto rb = f.text.find(']', lb);
      if (rb == std::string::npos || !trim(std::string_view(f.text).substr(rb + 1)).empty()) {
        err = {status::domain, line_no, f.column, "column '" + f.text + "': write the unit as 'name [unit]'"};
        return;
      }
      name = std::string(trim(std::string_view(f.text).substr(0, lb)));
      unit = std::string(trim(std::string_view(f.text).substr(lb + 1, rb - lb - 1)));
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
      const auto* u = find_unit(unit);
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

// Read one data row; false (and data.error set) on a bad field.
bool read_row(int line_no, const std::string& line, table_data& data, const std::vector<std::size_t>& file_to_spec) {
  auto& err = data.error;
  const auto fields = split_line(line_no, line, err);
  if (is_error(err.st)) return false;
  const std::size_t n_fields = file_to_spec.size();
  if (fields.size() != n_fields) {
    std::string hint;
    if (fields.size() > n_fields) hint = " (a decimal comma? write 12.5, not 12,5)";
    else if (line.find(';') != std::string::npos || line.find('\t') != std::string::npos)
      hint = " (this row is not separated by commas)";
    err = {status::domain, line_no, fields.size() > n_fields ? fields[n_fields].column : 0,
           std::to_string(fields.size()) + " fields, the header row has " + std::to_string(n_fields) + hint};
    return false;
  }
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
          const auto num = parse_number(f.text);
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

table_data read_table(std::string_view text, const std::vector<column_spec>& spec, std::string source) {
  table_data data;
  data.source = std::move(source);
  data.spec = spec;
  data.present.assign(spec.size(), false);
  data.unit.assign(spec.size(), nullptr);
  data.values.assign(spec.size(), {});
  data.texts.assign(spec.size(), {});
  data.pos.assign(spec.size(), {});

  std::vector<std::size_t> file_to_spec;  // per field of the file: spec index
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
      read_header(line_no, line, data, file_to_spec);
      if (is_error(data.error.st)) return data;
      continue;
    }
    if (!read_row(line_no, line, data, file_to_spec)) return data;
  }
  if (!header_done)
    data.error = {status::insufficient_data, line_no > 0 ? line_no : 1, 0, "the file is empty: expected a header row"};
  else if (data.line.empty())
    data.error = {status::insufficient_data, line_no, 0, "no data rows after the header row"};
  return data;
}

table_data read_table_file(const std::string& path, const std::vector<column_spec>& spec) {
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
  return read_table(ss.str(), spec, path);
}

}  // namespace pumploss
