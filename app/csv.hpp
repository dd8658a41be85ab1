// CSV reader for operating-point and field-reading files. One header row names the columns with
// their units in brackets ("outlet pressure [bar]"); values are converted to SI on reading.
// Every problem is an input_error naming file, line and column; nothing is skipped silently:
// lines starting with '#' are comments and blank lines are ignored, everything else must be a
// complete row.
#ifndef PUMPLOSS_CLI_CSV_HPP
#define PUMPLOSS_CLI_CSV_HPP

#include <optional>
#include <string>
#include <vector>

#include "common.hpp"
#include "pumploss/units.hpp"

namespace plcli {

/// What a column holds.
enum class column_kind {
  quantity,  ///< a number with a unit of `dim` stated in the header
  number,    ///< a plain number without unit (a count, a fraction)
  date,      ///< an ISO 8601 calendar date YYYY-MM-DD
  text       ///< free text
};

/// One expected column.
struct column_spec {
  std::string name;        ///< name in the header, compared without case and outer blanks
  column_kind kind = column_kind::quantity;
  pumploss::dimension dim = pumploss::dimension::pressure;  ///< for quantity columns
  bool required = true;    ///< a missing optional column is fine; a missing required one is an error
};

/// The file after reading: per expected column, SI values or texts, row by row.
struct csv_data {
  std::string file;
  std::vector<column_spec> spec;
  std::vector<bool> present;                      ///< per spec column: in the file?
  std::vector<const pumploss::unit_info*> unit;   ///< per spec column: unit in the header
  std::vector<std::vector<double>> values;        ///< per spec column: SI value (date: days since 1970-01-01)
  std::vector<std::vector<std::string>> texts;    ///< per spec column: the field as written
  std::vector<std::vector<int>> pos;              ///< per spec column: character column of each field
  std::vector<int> line;                          ///< per row: its line number in the file

  std::size_t rows() const { return line.size(); }
  /// Index of a column by its spec name (throws std::logic_error for a name not in the spec).
  std::size_t col(const std::string& name) const;
  bool has(const std::string& name) const { return present[col(name)]; }
  const std::vector<double>& si(const std::string& name) const { return values[col(name)]; }
  /// An input_error at one field (row index, column name).
  input_error error(std::size_t row, const std::string& name, const std::string& what) const;
  /// Throw when a value of a column is outside [lo, hi] (SI); `what` names the limit.
  void check_range(const std::string& name, double lo, double hi, const std::string& what) const;
};

/// Read a comma-separated file. Throws input_error.
csv_data read_csv(const std::string& path, const std::vector<column_spec>& spec);

/// Days since 1970-01-01 of a proleptic Gregorian date (no validation).
long days_from_civil(int y, int m, int d);
/// Calendar date "YYYY-MM-DD" from days since 1970-01-01.
std::string civil_from_days(long z);

}  // namespace plcli

#endif
