// libFuzzer target: the command-line program's TOML configuration readers (examples/cli:
// load_config and the section accessors in config.cpp, and the typed readers of inputs.cpp for
// oil, test-stand, drain-line and pump files). The first byte chooses the reader, the rest is the
// file. Every problem must come out as plcli::input_error (file, line, column); any other
// exception, a crash or undefined behaviour is a finding.
#include <cstdint>
#include <cstdlib>
#include <string>

#include "config.hpp"
#include "fuzz_file.hpp"
#include "inputs.hpp"

namespace {
/// Read every key a generic walker can: quantities of a few dimensions, numbers, texts, lists.
void walk(plcli::section& s, int depth) {
  using D = pumploss::dimension;
  static const char* const keys[] = {"pressure", "speed", "displacement", "flow", "temperature", "viscosity",
                                     "grade",    "name",  "kind",         "points", "length",    "diameter"};
  static const D dims[] = {D::pressure, D::rotational_speed, D::volume_flow, D::temperature, D::length};
  for (const char* k : keys) {
    if (!s.has(k)) continue;
    for (D d : dims) {
      try { (void)s.quantity_opt(k, d); } catch (const plcli::input_error&) {}
      try { (void)s.quantity_list(k, d); } catch (const plcli::input_error&) {}
      try { (void)s.pair_list(k, d, D::pressure); } catch (const plcli::input_error&) {}
    }
    try { (void)s.number_opt(k); } catch (const plcli::input_error&) {}
    try { (void)s.integer_opt(k); } catch (const plcli::input_error&) {}
    try { (void)s.text_opt(k); } catch (const plcli::input_error&) {}
    try { (void)s.number_list(k); } catch (const plcli::input_error&) {}
    try { (void)s.temperature_step(k); } catch (const plcli::input_error&) {}
    if (depth < 3) {
      try {
        if (auto t = s.table_opt(k)) walk(*t, depth + 1);
      } catch (const plcli::input_error&) {}
      try {
        for (auto& t : s.tables(k)) walk(t, depth + 1);
      } catch (const plcli::input_error&) {}
    }
  }
  try { s.finish(); } catch (const plcli::input_error&) {}
}
}  // namespace

extern "C" int LLVMFuzzerTestOneInput(const std::uint8_t* data, std::size_t size) {
  if (size == 0) return 0;
  plfuzz::memory_file file(data + 1, size - 1);
  try {
    switch (data[0] % 5) {
      case 0: {
        plcli::section s = plcli::load_config(file.path());
        walk(s, 0);
        break;
      }
      case 1: (void)plcli::read_oil_file(file.path()); break;
      case 2: (void)plcli::read_stand_setup(file.path()); break;
      case 3: (void)plcli::read_drain_line(file.path()); break;
      default: (void)plcli::read_pump(file.path()); break;
    }
  } catch (const plcli::input_error&) {
  }
  return 0;
}
