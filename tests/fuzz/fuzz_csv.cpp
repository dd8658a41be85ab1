// libFuzzer target: the library's table reader (pumploss/table_reader.hpp, read_table) with the
// column specs of the test-stand and field-reading files and a small mixed one. The first byte
// chooses the spec (byte % 3) and the dialect ((byte / 3) % 4: detected, or given as comma,
// semicolon with decimal comma, semicolon with decimal point), the rest is the file. The corpus holds the exported forms too (';' with a
// decimal comma, BOM + CRLF, degree signs in UTF-8 and Windows-1252, units in parentheses,
// ambiguous '1,500' and mixed decimal marks), so the detection paths are fuzzed from the start. Every problem must come out as a table_error with an
// error status; a crash, undefined behaviour, an exception, a non-finite SI value or columns of
// unequal length are findings.
#include <cmath>
#include <cstdint>
#include <cstdio>
#include <cstdlib>
#include <string_view>
#include <vector>

#include "columns.hpp"  // the program's columns (app/)
#include "pumploss/table_reader.hpp"

namespace {
using pumploss::column_kind;
using D = pumploss::dimension;
}  // namespace

extern "C" int LLVMFuzzerTestOneInput(const std::uint8_t* data, std::size_t size) {
  if (size == 0) return 0;
  static const std::vector<pumploss::column_spec> specs[3] = {
      plcli::stand_columns(),
      plcli::field_columns(),
      {{"p", column_kind::quantity, D::pressure, true},
       {"count", column_kind::number, D::pressure, false, true},
       {"day", column_kind::date, D::pressure, false},
       {"note", column_kind::text, D::pressure, false}},
  };
  const auto& spec = specs[data[0] % 3];
  const std::string_view text(reinterpret_cast<const char*>(data + 1), size - 1);
  const auto dialect = static_cast<pumploss::csv_dialect>((data[0] / 3) % 4);
  const auto d = pumploss::read_table(text, spec, "fuzz.csv", dialect);
  if (d.error.st != pumploss::status::ok) {
    if (!pumploss::is_error(d.error.st) || d.error.message.empty() || d.error.line < 0 || d.error.column < 0) {
      std::fprintf(stderr, "fuzz_csv: a refusal without an error status or message\n");
      std::abort();
    }
    return 0;
  }
  if (d.rows() == 0) std::abort();
  for (std::size_t k = 0; k < spec.size(); ++k) {
    const std::size_t want = d.present[k] ? d.rows() : 0;
    if (d.values[k].size() != want || d.texts[k].size() != want || d.pos[k].size() != want) std::abort();
    if (!d.present[k] || spec[k].kind != column_kind::quantity) continue;
    for (double v : d.values[k])
      if (!std::isfinite(v) && !(spec[k].allow_missing && std::isnan(v))) {
        std::fprintf(stderr, "fuzz_csv: non-finite SI value in column %s\n", spec[k].name.c_str());
        std::abort();
      }
  }
  return 0;
}
