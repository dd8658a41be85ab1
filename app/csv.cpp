#include "csv.hpp"

#include <CLI/CLI.hpp>

#include <map>
#include <stdexcept>

namespace plcli {

std::size_t csv_data::col(const std::string& name) const {
  const auto k = find(name);
  if (k == spec.size()) throw std::logic_error("csv_data: no column '" + name + "' in the spec");
  return k;
}

input_error csv_data::error(std::size_t row, const std::string& name, const std::string& what) const {
  const auto k = col(name);
  return input_error(source, line.at(row), present[k] ? pos[k].at(row) : 0, "column '" + name + "': " + what);
}

void csv_data::check_range(const std::string& name, double lo, double hi, const std::string& what) const {
  const auto k = col(name);
  if (!present[k]) return;
  for (std::size_t i = 0; i < rows(); ++i)
    if (!(values[k][i] >= lo && values[k][i] <= hi)) throw error(i, name, "'" + texts[k][i] + "' " + what);
}

csv_data read_csv(const std::string& path, const std::vector<column_spec>& spec, pumploss::csv_dialect dialect) {
  csv_data d;
  static_cast<pumploss::table_data&>(d) = pumploss::read_table_file(path, spec, dialect);
  const pumploss::table_error& e = d.pumploss::table_data::error;
  if (pumploss::is_error(e.st)) throw input_error(path, e.line, e.column, e.message);
  return d;
}

void add_csv_format_option(CLI::App& sub, pumploss::csv_dialect& dialect) {
  using pumploss::csv_dialect;
  std::map<std::string, csv_dialect> names;
  for (const auto d : {csv_dialect::detect, csv_dialect::comma, csv_dialect::semicolon_comma, csv_dialect::semicolon_point})
    names[pumploss::csv_dialect_name(d)] = d;
  sub.add_option("--csv-format", dialect,
                 "How the CSV is written: detect (default: ',' or ';' from the header row, the decimal mark from the "
                 "numbers), comma (',' and decimal point), semicolon-comma (';' and decimal comma, a European "
                 "spreadsheet export), semicolon-point")
      ->transform(CLI::CheckedTransformer(names, CLI::ignore_case))
      ->option_text("FORMAT");
}

void add_input_notes(report& r, const pumploss::table_data& d) {
  for (const auto& n : d.notes) r.notes.push_back(d.source + ": " + n + " (--csv-format sets the format)");
}

}  // namespace plcli
