// The columns of the program's two logged-data files: the test-stand CSV and the field-readings
// CSV (names, kinds, units, whether each is required). Header-only and built on the library's
// table reader alone, so the fuzz targets (tests/fuzz) read their inputs with the very columns
// the program uses.
#ifndef PUMPLOSS_CLI_COLUMNS_HPP
#define PUMPLOSS_CLI_COLUMNS_HPP

#include <vector>

#include "pumploss/table_reader.hpp"

namespace plcli {

/// Columns of the test-stand CSV.
inline std::vector<pumploss::column_spec> stand_columns() {
  using pumploss::column_kind;
  using D = pumploss::dimension;
  return {
      {"speed", column_kind::quantity, D::rotational_speed, true},
      {"inlet pressure", column_kind::quantity, D::pressure, true},
      {"outlet pressure", column_kind::quantity, D::pressure, true},
      {"outlet flow", column_kind::quantity, D::volume_flow, false},  // a pump's flow
      {"inlet flow", column_kind::quantity, D::volume_flow, false},   // a motor's flow
      {"torque", column_kind::quantity, D::torque, true},
      {"drain flow", column_kind::quantity, D::volume_flow, true},
      {"inlet temperature", column_kind::quantity, D::temperature, true},
      {"outlet temperature", column_kind::quantity, D::temperature, false},
      {"drain temperature", column_kind::quantity, D::temperature, false},
      {"case pressure", column_kind::quantity, D::pressure, false},
      {"meter temperature", column_kind::quantity, D::temperature, false},
  };
}

/// Columns of the field-readings CSV.
inline std::vector<pumploss::column_spec> field_columns() {
  using pumploss::column_kind;
  using D = pumploss::dimension;
  return {
      {"date", column_kind::date, D::pressure, true},
      {"outlet pressure", column_kind::quantity, D::pressure, true},
      {"oil temperature", column_kind::quantity, D::temperature, true},
      {"speed", column_kind::quantity, D::rotational_speed, true},
      {"drain flow", column_kind::quantity, D::volume_flow, true},
      {"drain temperature", column_kind::quantity, D::temperature, false},
      {"case pressure", column_kind::quantity, D::pressure, false},
      {"note", column_kind::text, D::pressure, false},
      {"operating hours", column_kind::number, D::pressure, false},
      {"state", column_kind::text, D::pressure, false},
      {"event", column_kind::text, D::pressure, false},
  };
}

}  // namespace plcli

#endif
