#include <CLI/CLI.hpp>

#include <cstdio>
#include <memory>

#include "commands.hpp"
#include "common.hpp"

namespace plcli {

void add_output_options(CLI::App& sub, output_options& o) {
  sub.add_option("--out", o.out_dir, "Folder for the report files (text, CSV, SVG); created when missing")
      ->option_text("DIR");
  sub.add_option("--unit", o.units,
                 "Show a quantity in this unit, e.g. --unit psi --unit gpm --unit degF (repeatable; "
                 "'pumploss units --list' lists them)")
      ->option_text("UNIT");
  sub.footer(cautions);
}

void add_file_command(CLI::App& app, int& rc, const std::string& name, const std::string& help,
                      const std::string& file_help,
                      std::function<int(const std::string& file, const output_options& out)> run) {
  struct options {
    std::string file;
    output_options out;
  };
  auto o = std::make_shared<options>();
  auto* sub = app.add_subcommand(name, help);
  sub->add_option("file", o->file, file_help)->required()->check(CLI::ExistingFile);
  add_output_options(*sub, o->out);
  sub->callback([o, &rc, run = std::move(run)] { rc = run(o->file, o->out); });
}

display_units make_units(const output_options& o) {
  display_units u;
  for (const auto& s : o.units) u.choose(s);
  return u;
}

void emit(const report& r, const output_set& files, const output_options& o, const display_units& u,
          const std::string& stem) {
  const std::string text = render_text(r, u);
  if (o.out_dir.empty()) {
    std::fputs(text.c_str(), stdout);
    return;
  }
  output_set all;
  all.add(stem + ".txt", text);
  for (const auto& t : r.tables) {
    if (t.streamed_csv.empty())
      all.add(stem + "_" + t.name + ".csv", render_csv(t, u));
    else
      all.add_file(stem + "_" + t.name + ".csv", t.streamed_csv);
  }
  for (const auto& [name, content] : files.items()) all.add(name, content);
  const auto written = all.write_all(o.out_dir);
  std::fputs(text.c_str(), stdout);
  std::printf("\nWritten:\n");
  for (const auto& w : written) std::printf("  %s\n", w.c_str());
}

std::string status_text(pumploss::status st) {
  return st == pumploss::status::ok ? std::string("ok") : std::string(pumploss::status_message(static_cast<int>(st)));
}

}  // namespace plcli
