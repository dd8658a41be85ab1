// Shared pieces of the pumploss command-line program: exit codes, the cautions text, input
// errors that name file, line and column, and quantities written as "12.7 mm".
#ifndef PUMPLOSS_CLI_COMMON_HPP
#define PUMPLOSS_CLI_COMMON_HPP

#include <optional>
#include <stdexcept>
#include <string>
#include <string_view>

#include "pumploss/table_reader.hpp"
#include "pumploss/units.hpp"

namespace plcli {

/// Exit codes of the program (also in docs/pages/cli.md).
enum exit_code : int {
  exit_ok = 0,         ///< the job is done
  exit_usage = 1,      ///< bad command line
  exit_input = 2,      ///< bad input file or a calculation refused the inputs
};

/// The cautions printed at the foot of every report and of every --help.
extern const char* const cautions;

/// A problem with an input: where it is and what is wrong.
class input_error : public std::runtime_error {
 public:
  /// @param file path as the user gave it; @param line 1-based or 0 (whole file);
  /// @param column 1-based or 0 (whole line); @param what the sentence.
  input_error(std::string file, int line, int column, const std::string& what);
  const std::string& file() const noexcept { return file_; }
  int line() const noexcept { return line_; }
  int column() const noexcept { return column_; }

 private:
  std::string file_;
  int line_;
  int column_;
};

/// "file:line:column: " (parts that are 0 are left out).
std::string where(const std::string& file, int line, int column);

/// A quantity text "250 bar", "12.7mm", "-0.5 m" split into number and unit.
struct quantity_text {
  double value = 0.0;
  std::string unit;  // empty when only a number was written
};

/// Split a quantity text; nullopt when it does not start with a finite number.
std::optional<quantity_text> split_quantity(std::string_view text);

/// Parse "250 bar" into SI for the given dimension. Throws std::invalid_argument with a sentence
/// (the caller adds file, line and column).
double quantity_si(std::string_view text, pumploss::dimension dim);

/// A temperature difference ("5 K", "5 degC", "9 degF") in kelvin: the unit's factor only.
double temperature_difference_k(std::string_view text);

/// Plain name of a dimension ("pressure", "volume flow", ...).
using pumploss::dimension_name;

/// Known unit symbols of a dimension, comma separated.
inline std::string units_of(pumploss::dimension d) { return pumploss::unit_symbols(d); }

/// Parse a finite number filling the whole text (leading/trailing blanks allowed).
using pumploss::parse_number;

/// Trim blanks (space, tab, CR).
std::string_view trim(std::string_view s);

}  // namespace plcli

#endif
