// The program's view of a CSV table: the library's reader (pumploss/table_reader.hpp) with
// problems raised as input_error (file, line, column) for the command line.
#ifndef PUMPLOSS_CLI_CSV_HPP
#define PUMPLOSS_CLI_CSV_HPP

#include <string>
#include <vector>

#include "common.hpp"
#include "pumploss/table_reader.hpp"
#include "report.hpp"

namespace CLI {
class App;
}

namespace plcli {

using pumploss::civil_from_days;
using pumploss::column_kind;
using pumploss::column_spec;
using pumploss::days_from_civil;

/// The file after reading: per expected column, SI values or texts, row by row.
struct csv_data : pumploss::table_data {
  /// Index of a column by its spec name (throws std::logic_error for a name not in the spec).
  std::size_t col(const std::string& name) const;
  /// An input_error at one field (row index, column name).
  input_error error(std::size_t row, const std::string& name, const std::string& what) const;
  /// Throw when a value of a column is outside [lo, hi] (SI); `what` names the limit.
  void check_range(const std::string& name, double lo, double hi, const std::string& what) const;
};

/// Read a file of readings separated by ',' or ';' (dialect detected unless given). Throws input_error.
csv_data read_csv(const std::string& path, const std::vector<column_spec>& spec,
                  pumploss::csv_dialect dialect = pumploss::csv_dialect::detect);

/// Add --csv-format (detect, comma, semicolon-comma, semicolon-point) to a subcommand that reads a CSV.
void add_csv_format_option(CLI::App& sub, pumploss::csv_dialect& dialect);

/// Put what the reader detected or assumed about the file (a ';' export, a Windows-1252 degree
/// sign) into the report's notes, naming the file.
void add_input_notes(report& r, const pumploss::table_data& d);

}  // namespace plcli

#endif
