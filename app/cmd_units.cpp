// pumploss units: convert a value between units; list the units.
#include <CLI/CLI.hpp>
#include <fmt/format.h>

#include <cstdio>
#include <map>

#include "commands.hpp"
#include "common.hpp"

namespace plcli {

namespace {
struct units_options {
  std::vector<std::string> args;
  bool list = false;
};

int run_units(const units_options& o) {
  if (o.list) {
    std::map<int, std::string> by_dim;
    std::printf("%-20s %-10s %s\n", "quantity", "unit", "name");
    for (int i = 0; i < pumploss::unit_count(); ++i) {
      const auto* u = pumploss::unit_at(i);
      std::printf("%-20s %-10s %s\n", dimension_name(u->dim), u->symbol, u->name);
    }
    return exit_ok;
  }
  if (o.args.size() != 3 && o.args.size() != 2)
    throw std::invalid_argument("units: give VALUE FROM TO (e.g. 250 bar psi) or \"250 bar\" psi, or --list");
  double value = 0;
  std::string from, to;
  if (o.args.size() == 3) {
    const auto v = parse_number(o.args[0]);
    if (!v) throw std::invalid_argument("units: '" + o.args[0] + "' is not a number");
    value = *v;
    from = o.args[1];
    to = o.args[2];
  } else {
    const auto q = split_quantity(o.args[0]);
    if (!q || q->unit.empty()) throw std::invalid_argument("units: '" + o.args[0] + "' is not a value with a unit");
    value = q->value;
    from = q->unit;
    to = o.args[1];
  }
  const auto* uf = pumploss::find_unit(from);
  const auto* ut = pumploss::find_unit(to);
  if (uf == nullptr) throw std::invalid_argument("units: unknown unit '" + from + "' (see --list)");
  if (ut == nullptr) throw std::invalid_argument("units: unknown unit '" + to + "' (see --list)");
  const auto r = pumploss::convert(value, *uf, *ut);
  if (!r.usable()) {
    if (r.st == pumploss::status::incompatible_units)
      throw std::invalid_argument(std::string("units: ") + uf->symbol + " is a unit of " + dimension_name(uf->dim) +
                                  ", " + ut->symbol + " of " + dimension_name(ut->dim));
    throw std::invalid_argument(std::string("units: ") + pumploss::status_message(static_cast<int>(r.st)));
  }
  std::printf("%s\n", fmt::format("{:.12g} {} = {:.12g} {}", value, uf->symbol, r.value, ut->symbol).c_str());
  return exit_ok;
}
}  // namespace

void add_units(CLI::App& app, int& rc) {
  auto o = std::make_shared<units_options>();
  auto* sub = app.add_subcommand("units", "Convert a value between units (exact factors), or list the units");
  sub->add_option("value", o->args, "VALUE FROM TO, e.g. 250 bar psi; or \"250 bar\" psi")->expected(0, 3);
  sub->add_flag("--list", o->list, "List every unit known to pumploss");
  sub->footer(cautions);
  sub->callback([o, &rc] { rc = run_units(*o); });
}

}  // namespace plcli
