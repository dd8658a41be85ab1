#include "csv.hpp"

#include <algorithm>
#include <cctype>
#include <fstream>
#include <set>
#include <sstream>

#include "common.hpp"

namespace plcli {

namespace {

std::string lower(std::string_view s) {
  std::string out(s);
  for (auto& c : out) c = static_cast<char>(std::tolower(static_cast<unsigned char>(c)));
  return out;
}

struct field {
  std::string text;
  int column;  // 1-based character column of the field's first character
};

// Split one line at commas; double quotes protect commas and "" is a quote.
std::vector<field> split_line(const std::string& file, int line_no, const std::string& line) {
  std::vector<field> out;
  std::size_t i = 0;
  while (true) {
    field f{{}, static_cast<int>(i) + 1};
    // skip leading blanks for the column position of the value itself
    std::size_t j = i;
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
      if (!closed) throw input_error(file, line_no, f.column, "opening quote without a closing quote");
      while (j < line.size() && (line[j] == ' ' || line[j] == '\t' || line[j] == '\r')) ++j;
      if (j < line.size() && line[j] != ',')
        throw input_error(file, line_no, static_cast<int>(j) + 1, "text after a closing quote");
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
  const int y = std::stoi(s.substr(0, 4));
  const int m = std::stoi(s.substr(5, 2));
  const int d = std::stoi(s.substr(8, 2));
  if (m < 1 || m > 12 || d < 1) return false;
  static const int mdays[] = {31, 28, 31, 30, 31, 30, 31, 31, 30, 31, 30, 31};
  const bool leap = (y % 4 == 0 && y % 100 != 0) || y % 400 == 0;
  const int dim = mdays[m - 1] + ((m == 2 && leap) ? 1 : 0);
  if (d > dim) return false;
  days = days_from_civil(y, m, d);
  return true;
}

}  // namespace

// Howard Hinnant's public-domain civil calendar algorithms.
long days_from_civil(int y, int m, int d) {
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

std::size_t csv_data::col(const std::string& name) const {
  for (std::size_t i = 0; i < spec.size(); ++i)
    if (spec[i].name == name) return i;
  throw std::logic_error("csv_data: no column '" + name + "' in the spec");
}

input_error csv_data::error(std::size_t row, const std::string& name, const std::string& what) const {
  const auto k = col(name);
  return input_error(file, line.at(row), present[k] ? pos[k].at(row) : 0, "column '" + name + "': " + what);
}

void csv_data::check_range(const std::string& name, double lo, double hi, const std::string& what) const {
  const auto k = col(name);
  if (!present[k]) return;
  for (std::size_t i = 0; i < rows(); ++i)
    if (!(values[k][i] >= lo && values[k][i] <= hi))
      throw error(i, name, "'" + texts[k][i] + "' " + what);
}

csv_data read_csv(const std::string& path, const std::vector<column_spec>& spec) {
  std::ifstream in(path, std::ios::binary);
  if (!in) throw input_error(path, 0, 0, "cannot open the file");
  csv_data data;
  data.file = path;
  data.spec = spec;
  data.present.assign(spec.size(), false);
  data.unit.assign(spec.size(), nullptr);
  data.values.assign(spec.size(), {});
  data.texts.assign(spec.size(), {});
  data.pos.assign(spec.size(), {});

  std::string line;
  int line_no = 0;
  bool header_done = false;
  std::vector<int> file_to_spec;  // per field of the file: spec index
  std::size_t n_fields = 0;
  while (std::getline(in, line)) {
    ++line_no;
    if (!line.empty() && line.back() == '\r') line.pop_back();
    if (line_no == 1 && line.size() >= 3 && static_cast<unsigned char>(line[0]) == 0xEF &&
        static_cast<unsigned char>(line[1]) == 0xBB && static_cast<unsigned char>(line[2]) == 0xBF)
      line.erase(0, 3);  // UTF-8 byte order mark written by some spreadsheets
    const auto t = trim(line);
    if (t.empty() || t.front() == '#') continue;

    if (!header_done) {
      header_done = true;
      auto fields = split_line(path, line_no, line);
      if (fields.size() == 1) {
        for (const char d : {';', '\t', '|'}) {
          const auto pos = line.find(d);
          if (pos != std::string::npos)
            throw input_error(path, line_no, static_cast<int>(pos) + 1,
                              std::string("the header row is separated by '") + (d == '\t' ? "TAB" : std::string(1, d)) +
                                  "'; pumploss reads comma-separated files (use ',' between fields and '.' "
                                  "as the decimal point)");
        }
      }
      std::set<std::size_t> seen;
      for (const auto& f : fields) {
        std::string name = f.text, unit;
        const auto lb = f.text.find('[');
        if (lb != std::string::npos) {
          const auto rb = f.text.find(']', lb);
          if (rb == std::string::npos || !trim(std::string_view(f.text).substr(rb + 1)).empty())
            throw input_error(path, line_no, f.column, "column '" + f.text + "': write the unit as 'name [unit]'");
          name = std::string(trim(std::string_view(f.text).substr(0, lb)));
          unit = std::string(trim(std::string_view(f.text).substr(lb + 1, rb - lb - 1)));
        }
        if (name.empty()) throw input_error(path, line_no, f.column, "empty column name in the header row");
        std::size_t k = 0;
        while (k < spec.size() && lower(spec[k].name) != lower(name)) ++k;
        if (k == spec.size()) {
          std::string expected;
          for (const auto& s : spec) expected += (expected.empty() ? "'" : ", '") + s.name + "'";
          throw input_error(path, line_no, f.column,
                            "unknown column '" + name + "' (this file may have: " + expected + ")");
        }
        if (!seen.insert(k).second)
          throw input_error(path, line_no, f.column, "column '" + name + "' appears twice");
        const auto& s = spec[k];
        if (s.kind == column_kind::quantity) {
          if (unit.empty())
            throw input_error(path, line_no, f.column,
                              "column '" + name + "' needs its unit in brackets, e.g. '" + s.name + " [" +
                                  pumploss::si_symbol(s.dim) + "]' (units of " + dimension_name(s.dim) + ": " +
                                  units_of(s.dim) + ")");
          const auto* u = pumploss::find_unit(unit);
          if (u == nullptr)
            throw input_error(path, line_no, f.column,
                              "column '" + name + "': unknown unit '" + unit + "' (units of " +
                                  dimension_name(s.dim) + ": " + units_of(s.dim) + ")");
          if (u->dim != s.dim)
            throw input_error(path, line_no, f.column,
                              "column '" + name + "': '" + unit + "' is a unit of " + dimension_name(u->dim) +
                                  ", this column holds " + dimension_name(s.dim) + " (" + units_of(s.dim) + ")");
          data.unit[k] = u;
        } else if (!unit.empty()) {
          throw input_error(path, line_no, f.column, "column '" + name + "' takes no unit");
        }
        data.present[k] = true;
        file_to_spec.push_back(static_cast<int>(k));
      }
      for (std::size_t k = 0; k < spec.size(); ++k)
        if (spec[k].required && !data.present[k])
          throw input_error(path, line_no, 0, "missing column '" + spec[k].name + "' in the header row");
      n_fields = fields.size();
      continue;
    }

    const auto fields = split_line(path, line_no, line);
    if (fields.size() != n_fields) {
      std::string hint;
      if (fields.size() > n_fields) hint = " (a decimal comma? write 12.5, not 12,5)";
      else if (line.find(';') != std::string::npos || line.find('\t') != std::string::npos)
        hint = " (this row is not separated by commas)";
      throw input_error(path, line_no, fields.size() > n_fields ? fields[n_fields].column : 0,
                        std::to_string(fields.size()) + " fields, the header row has " + std::to_string(n_fields) +
                            hint);
    }
    for (std::size_t i = 0; i < fields.size(); ++i) {
      const auto k = static_cast<std::size_t>(file_to_spec[i]);
      const auto& s = spec[k];
      const auto& f = fields[i];
      double v = 0.0;
      switch (s.kind) {
        case column_kind::quantity:
        case column_kind::number: {
          if (f.text.empty()) throw input_error(path, line_no, f.column, "column '" + s.name + "': empty field");
          const auto num = parse_number(f.text);
          if (!num)
            throw input_error(path, line_no, f.column,
                              "column '" + s.name + "': '" + f.text + "' is not a number");
          v = *num;
          if (s.kind == column_kind::quantity) {
            const auto r = pumploss::convert(v, *data.unit[k], *pumploss::find_unit(pumploss::si_symbol(s.dim)));
            if (!r.usable())
              throw input_error(path, line_no, f.column,
                                "column '" + s.name + "': " + pumploss::status_message(static_cast<int>(r.st)));
            v = r.value;
          }
          break;
        }
        case column_kind::date: {
          long days = 0;
          if (!parse_date(f.text, days))
            throw input_error(path, line_no, f.column,
                              "column '" + s.name + "': '" + f.text + "' is not a date YYYY-MM-DD");
          v = static_cast<double>(days);
          break;
        }
        case column_kind::text:
          v = 0.0;
          break;
      }
      data.values[k].push_back(v);
      data.texts[k].push_back(f.text);
      data.pos[k].push_back(f.column);
    }
    data.line.push_back(line_no);
  }
  if (!header_done) throw input_error(path, line_no > 0 ? line_no : 1, 0, "the file is empty: expected a header row");
  if (data.line.empty()) throw input_error(path, line_no, 0, "no data rows after the header row");
  return data;
}

}  // namespace plcli
