// The pump file of flow-test and rotary-budget: one file may hold the field flow test ([drive],
// [test], [verdict]) and the clearances ([gear] or [vane], [sweep]) of the same pump
// (examples/demo/flow_test_g12.toml). Both commands open it the same way here.
#ifndef PUMPLOSS_CLI_PUMP_FILE_HPP
#define PUMPLOSS_CLI_PUMP_FILE_HPP

#include <initializer_list>
#include <string>
#include <utility>

#include "config.hpp"
#include "inputs.hpp"

namespace plcli {

/// An opened pump file: the file, its oil, and its [pump] table with name and kind read.
struct pump_file {
  section root;            ///< the file; the caller reads its own tables and calls finish()
  section pump;            ///< [pump]; the caller reads the rest and calls finish()
  oil_spec oil;            ///< `oil = "file"` or [oil]
  std::string name, kind;  ///< kind: gear, vane, piston or other
};

/// Open a pump file: read the oil, mark the other command's tables (`other_tables`) as read,
/// open [pump] and read its name and kind. Throws input_error.
inline pump_file open_pump_file(const std::string& path, std::initializer_list<const char*> other_tables) {
  auto root = load_config(path);
  auto oil = read_oil_ref(root);
  for (const char* t : other_tables) (void)root.table_opt(t);  // read by the other command
  auto pump = root.table("pump");
  auto name = pump.text("name");
  auto kind = pump.choice("kind", {"gear", "vane", "piston", "other"});
  return pump_file{std::move(root), std::move(pump), std::move(oil), std::move(name), std::move(kind)};
}

}  // namespace plcli

#endif
