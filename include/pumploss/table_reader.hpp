/// @file table_reader.hpp
/// @brief Reader for tables of readings whose header row carries the units ("outlet pressure
/// [bar]"), as people export them from spreadsheets and loggers; values converted to SI on
/// reading, every problem reported with line and column.
///
/// The workflows (test_stand.hpp, and the program's reports) take their readings from such
/// tables. The format: one header row naming the columns, each quantity column with its unit in
/// brackets or parentheses ("outlet pressure [bar]", "outlet pressure (bar)"); lines starting
/// with '#' are comments and blank lines are ignored; every other line is a complete row. Column
/// names are compared without case and outer blanks; their order is free. A field may be quoted
/// with '"' ('""' is a quote inside it). A UTF-8 byte order mark and CRLF line ends are accepted.
/// Units as exported are accepted (find_unit_written(): '°C', 'l/min', 'RPM', 'gpm', ...; the
/// Windows-1252 degree byte of a file that is not UTF-8, with a note).
///
/// Delimiter and decimal mark (csv_dialect): ',' between fields with '.' as the decimal point,
/// or ';' between fields with ',' (European spreadsheet export) or '.' as the decimal mark. By
/// default they are detected: the delimiter from the header row, the decimal mark from the
/// numbers; a ';' file gets a note in `table_data::notes` saying what was found. A file that stays
/// ambiguous is refused at the first field that makes it so: a header with both ',' and ';', a
/// number with a thousands separator ("1.500,5"), a ';' file with both "1,5" and "2.5", a
/// comma-separated row with more fields than the header or a quoted "1,500" (thousands or a
/// decimal comma?). Numbers are otherwise plain decimal ('inf', 'nan' and hexadecimal refused).
///
/// Nothing is skipped silently: a missing required column, an unknown column, a column twice, a
/// quantity without a unit or with a unit of another quantity, a field that is not a number, a
/// row with more or fewer fields than the header, a file separated by TAB or '|', an empty file
/// or one without data rows is an error naming line and column. Nothing here throws except
/// std::bad_alloc.
#ifndef PUMPLOSS_TABLE_READER_HPP
#define PUMPLOSS_TABLE_READER_HPP

#include <cstddef>
#include <istream>
#include <memory>
#include <optional>
#include <string>
#include <string_view>
#include <vector>

#include "export.hpp"
#include "status.hpp"
#include "units.hpp"

namespace pumploss {

/// What a column holds.
enum class column_kind : int {
  quantity = 0,  ///< a number with a unit of `dim` stated in the header; stored in SI
  number = 1,    ///< a plain number without unit (a count, a fraction)
  date = 2,      ///< an ISO 8601 calendar date YYYY-MM-DD; stored as days since 1970-01-01
  text = 3       ///< free text (value 0)
};

/// One expected column.
struct column_spec {
  std::string name;  ///< name in the header, compared without case and outer blanks
  column_kind kind = column_kind::quantity;  ///< what the column holds
  dimension dim = dimension::pressure;       ///< the quantity of a quantity column
  bool required = true;       ///< a missing optional column is fine; a missing required one is an error
  bool allow_missing = false; ///< an empty field is a missing value (NaN) instead of an error
};

/// How the fields and the decimals of a table are written.
enum class csv_dialect : int {
  detect = 0,           ///< from the header row (delimiter) and the numbers (decimal mark)
  comma = 1,            ///< ',' between fields, '.' as the decimal point
  semicolon_comma = 2,  ///< ';' between fields, ',' as the decimal mark (European spreadsheet export)
  semicolon_point = 3   ///< ';' between fields, '.' as the decimal point
};

/// Name of a dialect as the program's option takes it.
/// @param d the dialect
/// @return "detect", "comma", "semicolon-comma" or "semicolon-point"
PUMPLOSS_CXX_API const char* csv_dialect_name(csv_dialect d) noexcept;

/// Where and why a table could not be read.
struct table_error {
  status st = status::ok;  ///< ok, or the error (domain, unknown_unit, incompatible_units, insufficient_data, misuse)
  int line = 0;            ///< 1-based line, 0 for the whole file
  int column = 0;          ///< 1-based character column, 0 for the whole line
  std::string message;     ///< the sentence, without the place
};

/// A table after reading: per expected column (index as in the spec), SI values and the fields
/// as written, row by row. When `error.st` is an error the contents are unspecified.
struct table_data {
  std::string source;                         ///< the file name (or the name given), for messages
  std::vector<column_spec> spec;              ///< the expected columns
  std::vector<bool> present;                  ///< per spec column: in the file?
  std::vector<const unit_info*> unit;         ///< per spec column: unit of the header (quantity columns)
  std::vector<std::vector<double>> values;    ///< per spec column: SI value (date: days since 1970-01-01; missing: NaN)
  std::vector<std::vector<std::string>> texts;///< per spec column: the field as written
  std::vector<std::vector<int>> pos;          ///< per spec column: 1-based character column of each field
  std::vector<int> line;                      ///< per row: its 1-based line number in the file
  table_error error;                          ///< why reading failed (st ok when it did not)
  csv_dialect dialect = csv_dialect::detect;  ///< the dialect the file was read in (detect: not read)
  std::vector<std::string> notes;             ///< what was detected or assumed (a ';' file, a Windows-1252 degree sign), for the report

  /// @return the number of data rows
  std::size_t rows() const noexcept { return line.size(); }
  /// Index of a column by its spec name.
  /// @param name the name as in the spec
  /// @return the index, or spec.size() for a name not in the spec
  PUMPLOSS_CXX_API std::size_t find(std::string_view name) const noexcept;
  /// Whether a column of the spec is in the file.
  /// @param name the name as in the spec
  /// @return false also for a name not in the spec
  PUMPLOSS_CXX_API bool has(std::string_view name) const noexcept;
  /// SI values of a column (empty for a column absent from the file or not in the spec).
  /// @param name the name as in the spec
  /// @return the values, one per row
  PUMPLOSS_CXX_API const std::vector<double>& si(std::string_view name) const noexcept;
};

/// Read a table from text.
/// @param text the whole file
/// @param spec the expected columns
/// @param source a name for messages (the file name)
/// @return the table; `error.st` says whether it was read
PUMPLOSS_CXX_API table_data read_table(std::string_view text, const std::vector<column_spec>& spec, std::string source = {});

/// Read a table from text in a given dialect (csv_dialect::detect: as read_table() above).
/// @param text the whole file
/// @param spec the expected columns
/// @param source a name for messages (the file name)
/// @param dialect the delimiter and decimal mark, or detect
/// @return the table; `error.st` says whether it was read
PUMPLOSS_CXX_API table_data read_table(std::string_view text, const std::vector<column_spec>& spec, std::string source,
                                       csv_dialect dialect);

/// Read a table from a file.
/// @param path the file
/// @param spec the expected columns
/// @return as read_table(); status::misuse with line 0 when the file cannot be opened
PUMPLOSS_CXX_API table_data read_table_file(const std::string& path, const std::vector<column_spec>& spec);

/// Read a table from a file in a given dialect.
/// @param path the file
/// @param spec the expected columns
/// @param dialect the delimiter and decimal mark, or detect
/// @return as read_table()
PUMPLOSS_CXX_API table_data read_table_file(const std::string& path, const std::vector<column_spec>& spec,
                                            csv_dialect dialect);

/// Parse a finite plain decimal number filling the whole text (outer blanks allowed); 'inf',
/// 'nan', hexadecimal and out-of-range values are refused.
/// @param text the field
/// @return the number, or nullopt
PUMPLOSS_CXX_API std::optional<double> parse_number(std::string_view text);

/// Days since 1970-01-01 of a proleptic Gregorian date (no validation).
/// @param y year
/// @param m month 1-12
/// @param d day 1-31
/// @return the day number
/// @par Source
/// H. Hinnant, "chrono-Compatible Low-Level Date Algorithms" (public domain), days_from_civil.
PUMPLOSS_CXX_API long days_from_civil(int y, int m, int d) noexcept;
/// Calendar date "YYYY-MM-DD" from days since 1970-01-01 (same source, civil_from_days).
/// @param z the day number
/// @return the date text
PUMPLOSS_CXX_API std::string civil_from_days(long z);

/// Plain name of a dimension ("pressure", "volume flow", "speed", ...).
/// @param d the dimension
/// @return a static string
PUMPLOSS_CXX_API const char* dimension_name(dimension d) noexcept;
/// The symbols of the known units of a dimension, comma separated ("Pa, kPa, MPa, ...").
/// @param d the dimension
/// @return the list
PUMPLOSS_CXX_API std::string unit_symbols(dimension d);


// ---- streaming reader (issue 20): a table read row by row in bounded memory
/// One data row of a table read by table_stream: per spec column its SI value (date: days since
/// 1970-01-01; missing or absent: NaN), the field as written and its 1-based character column.
struct table_row {
  int line = 0;                    ///< 1-based line number in the file
  std::vector<double> values;      ///< per spec column
  std::vector<std::string> texts;  ///< per spec column (empty for a column absent from the file)
  std::vector<int> pos;            ///< per spec column (0 for a column absent from the file)
};

/// A table read row by row: the same format, checks and messages as read_table(), in memory
/// bounded by the longest line whatever the row count. The decimal mark of a ';' file is
/// detected from the first number that holds one (read_table() looks at every number first), so
/// a file that mixes marks is refused at the later row. Nothing here throws except std::bad_alloc.
class table_stream {
 public:
  /// Read the header row of a stream (not owned; it must outlive this reader).
  /// @param in the text
  /// @param spec the expected columns
  /// @param source a name for messages (the file name)
  /// @param dialect the delimiter and decimal mark, or detect
  PUMPLOSS_CXX_API table_stream(std::istream& in, const std::vector<column_spec>& spec, std::string source,
                                csv_dialect dialect = csv_dialect::detect);
  /// Open a file and read its header row (status::misuse with line 0 when it cannot be opened).
  /// @param path the file
  /// @param spec the expected columns
  /// @param dialect the delimiter and decimal mark, or detect
  PUMPLOSS_CXX_API table_stream(const std::string& path, const std::vector<column_spec>& spec,
                                csv_dialect dialect = csv_dialect::detect);
  PUMPLOSS_CXX_API ~table_stream();
  table_stream(const table_stream&) = delete;
  table_stream& operator=(const table_stream&) = delete;
  /// The next data row.
  /// @param row receives the row (its vectors are reused)
  /// @return true with `row` filled; false at the end of the table or on an error (see error())
  PUMPLOSS_CXX_API bool next(table_row& row);
  /// The table without rows: source, spec, present, unit, notes, error and (after the last row)
  /// the dialect read; `rows()` of it is 0.
  /// @return the header data
  PUMPLOSS_CXX_API const table_data& header() const noexcept;
  /// Why reading stopped (st ok while rows come and at a clean end). A file without data rows
  /// is status::insufficient_data, as in read_table().
  /// @return the error
  PUMPLOSS_CXX_API const table_error& error() const noexcept;
  /// @return the number of data rows read so far
  PUMPLOSS_CXX_API std::size_t rows() const noexcept;

 private:
  struct impl;
  std::unique_ptr<impl> p_;
};

}  // namespace pumploss

#endif
