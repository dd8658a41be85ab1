// Configuration files (TOML, read with toml++). Quantities are written with their unit as text,
// "12.7 mm", "10 L/min", "0 degC"; bare numbers only where the value has no unit (a K factor, a
// count). Every key is checked: an unknown or misspelt key is an error, never ignored.
// Errors name file, line and column.
#ifndef PUMPLOSS_CLI_CONFIG_HPP
#define PUMPLOSS_CLI_CONFIG_HPP

#include <initializer_list>
#include <memory>
#include <optional>
#include <set>
#include <string>
#include <vector>

#include "common.hpp"
#include "pumploss/units.hpp"

namespace plcli {

/// One TOML table with a record of the keys read from it.
class section {
 public:
  /// Internal: made by load_config() and by table()/tables(). `table` is a toml::table.
  section(std::shared_ptr<const void> root, const void* table, std::string file, std::string name, int line,
          int column);

  const std::string& file() const { return file_; }
  const std::string& name() const { return name_; }
  bool has(const std::string& key) const;

  /// A quantity with a unit ("250 bar") in SI; required.
  double quantity(const std::string& key, pumploss::dimension dim);
  /// Optional quantity: nullopt when the key is absent.
  std::optional<double> quantity_opt(const std::string& key, pumploss::dimension dim);
  /// A temperature difference ("5 K", "5 degC") in K.
  double temperature_step(const std::string& key);
  /// A plain number (integer or float in the file).
  double number(const std::string& key);
  std::optional<double> number_opt(const std::string& key);
  /// A whole number.
  long integer(const std::string& key);
  std::optional<long> integer_opt(const std::string& key);
  /// A string.
  std::string text(const std::string& key);
  std::optional<std::string> text_opt(const std::string& key);
  /// A string from a closed list (default when absent, if given).
  std::string choice(const std::string& key, std::initializer_list<const char*> options,
                     const char* fallback = nullptr);
  /// A list of quantities ["9.5 mm", "12.7 mm"].
  std::vector<double> quantity_list(const std::string& key, pumploss::dimension dim);
  /// A list of plain numbers [80, 85, 90].
  std::vector<double> number_list(const std::string& key);
  /// A pair ["40 degC", "46 cSt"].
  std::pair<double, double> quantity_pair(const std::string& key, pumploss::dimension d1, pumploss::dimension d2);
  /// A list of pairs [["0 L/min", "0 bar"], ["10 L/min", "0.2 bar"]].
  std::vector<std::pair<double, double>> pair_list(const std::string& key, pumploss::dimension d1,
                                                   pumploss::dimension d2);
  /// A sub-table [name.key].
  section table(const std::string& key);
  std::optional<section> table_opt(const std::string& key);
  /// An array of tables [[key]] (empty when absent).
  std::vector<section> tables(const std::string& key);
  /// Whether the key holds a string (used where a table or a file name may be given).
  bool is_text(const std::string& key) const;

  /// Throw for the first key that was never read: nothing in a file is skipped silently.
  void finish() const;

  /// An input_error at the key's value (or at the table when the key is absent).
  input_error error(const std::string& key, const std::string& what) const;
  /// An input_error at the table itself.
  input_error error_here(const std::string& what) const;

 private:
  struct impl;
  std::shared_ptr<const void> root_;  // keeps the parsed document alive
  const void* table_;                 // the toml::table of this section
  std::string file_, name_;
  int line_, column_;
  std::set<std::string> used_;
};

/// Parse a TOML file; syntax errors become input_error with line and column.
section load_config(const std::string& path);

/// The directory part of a path ("" for a bare name), with a trailing '/'.
std::string directory_of(const std::string& path);

}  // namespace plcli

#endif
