// The subcommands of the pumploss program. Each add_* registers one subcommand, its options
// and its --help; the job runs in the callback and leaves its exit code in `rc`.
#ifndef PUMPLOSS_CLI_COMMANDS_HPP
#define PUMPLOSS_CLI_COMMANDS_HPP

#include <functional>
#include <string>
#include <vector>

#include "pumploss/status.hpp"
#include "report.hpp"

namespace CLI {
class App;
}

namespace plcli {

void add_units(CLI::App& app, int& rc);
void add_oil(CLI::App& app, int& rc);
void add_test_stand(CLI::App& app, int& rc);
void add_drain_line(CLI::App& app, int& rc);
void add_health(CLI::App& app, int& rc);
void add_budget(CLI::App& app, int& rc);
void add_flow_test(CLI::App& app, int& rc);      // cmd_flow_test.cpp
void add_rotary_budget(CLI::App& app, int& rc);  // cmd_rotary_budget.cpp

/// Options every reporting subcommand has.
struct output_options {
  std::string out_dir;             ///< --out: folder for the report files (none: screen only)
  std::vector<std::string> units;  ///< --unit: display units
};
/// Add --out and --unit to a subcommand.
void add_output_options(CLI::App& sub, output_options& o);
/// A subcommand that reads one input file and writes a report (file, --out, --unit):
/// `run(file, out)` does the job and returns the exit code.
void add_file_command(CLI::App& app, int& rc, const std::string& name, const std::string& help,
                      const std::string& file_help,
                      std::function<int(const std::string& file, const output_options& out)> run);
/// Display units from --unit (throws std::invalid_argument).
display_units make_units(const output_options& o);
/// Print the report, write the files when --out is given, print where they are.
void emit(const report& r, const output_set& files, const output_options& o, const display_units& u,
          const std::string& stem);

/// "ok" or the library's sentence for a status.
std::string status_text(pumploss::status st);

}  // namespace plcli

#endif
