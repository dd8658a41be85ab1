// libFuzzer target: the command-line program's CSV reader (examples/cli/csv.cpp, read_csv) with
// the column specs of the test-stand and field-reading files and a small mixed one. The first
// byte chooses the spec, the rest is the file. Every problem must come out as plcli::input_error
// (file, line, column); any other exception, a crash or undefined behaviour is a finding.
#include <cmath>
#include <cstdint>
#include <cstdio>
#include <cstdlib>
#include <vector>

#include "csv.hpp"
#include "fuzz_file.hpp"
#include "inputs.hpp"

extern "C" int LLVMFuzzerTestOneInput(const std::uint8_t* data, std::size_t size) {
  if (size == 0) return 0;
  using plcli::column_kind;
  using D = pumploss::dimension;
  static const std::vector<plcli::column_spec> specs[3] = {
      plcli::stand_columns(),
      plcli::field_columns(),
      {{"p", column_kind::quantity, D::pressure, true},
       {"count", column_kind::number, D::pressure, false},
       {"day", column_kind::date, D::pressure, false},
       {"note", column_kind::text, D::pressure, false}},
  };
  const auto& spec = specs[data[0] % 3];
  plfuzz::memory_file file(data + 1, size - 1);
  try {
    const plcli::csv_data d = plcli::read_csv(file.path(), spec);
    for (std::size_t k = 0; k < spec.size(); ++k) {
      if (d.values[k].size() != (d.present[k] ? d.rows() : d.values[k].size())) std::abort();
      if (!d.present[k] || spec[k].kind != column_kind::quantity) continue;
      for (double v : d.si(spec[k].name))
        if (!std::isfinite(v)) {
          std::fprintf(stderr, "fuzz_csv: non-finite SI value in column %s\n", spec[k].name.c_str());
          std::abort();
        }
      try {
        d.check_range(spec[k].name, 0.0, 1e9, "a fuzz limit");
      } catch (const plcli::input_error&) {
      }
    }
  } catch (const plcli::input_error&) {
  }
  return 0;
}
