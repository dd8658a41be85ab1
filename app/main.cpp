// pumploss: the command-line program. Subcommands in plain trade words; see `pumploss --help`
// and docs/pages/cli.md. Built on the public C++ API of the library only.
#include <CLI/CLI.hpp>

#include <cstdio>
#include <exception>

#include "commands.hpp"
#include "common.hpp"
#include "pumploss/version.hpp"

int main(int argc, char** argv) {
  using namespace plcli;
  CLI::App app{
      "pumploss - hydraulic pump and motor leakage and efficiency from files.\n"
      "Reads test-stand data, drain-line descriptions and field readings; writes text and CSV reports\n"
      "and SVG plots. Units are written in the files ('pressure [bar]', \"12.7 mm\").",
      "pumploss"};
  app.footer(std::string("\nExit codes: 0 done, 1 bad command line, 2 bad input file or values (nothing written).\n\n") +
             cautions);
  app.set_version_flag("--version", std::string("pumploss ") + pumploss::version_string);
  app.require_subcommand(1, 1);
  int rc = exit_ok;
  add_units(app, rc);
  add_oil(app, rc);
  add_test_stand(app, rc);
  add_drain_line(app, rc);
  add_health(app, rc);
  add_budget(app, rc);
  add_flow_test(app, rc);
  add_rotary_budget(app, rc);
  try {
    app.parse(argc, argv);
  } catch (const CLI::ParseError& e) {
    const int code = app.exit(e);
    return code == 0 ? exit_ok : exit_usage;
  } catch (const input_error& e) {
    std::fprintf(stderr, "pumploss: %s\n", e.what());
    return exit_input;
  } catch (const std::invalid_argument& e) {
    std::fprintf(stderr, "pumploss: %s\n", e.what());
    return exit_usage;
  } catch (const std::exception& e) {
    std::fprintf(stderr, "pumploss: %s\n", e.what());
    return exit_input;
  }
  return rc;
}
