// Names of the leakage paths (piston_pump.hpp).
#include "pumploss/piston_pump.hpp"

namespace pumploss {

const char* leakage_path_name(leakage_path path) noexcept {
  switch (path) {
    case leakage_path::piston_bore: return "piston-bore";
    case leakage_path::slipper: return "slipper";
    case leakage_path::ball_socket: return "ball-socket";
    case leakage_path::valve_inner: return "valve-plate-inner";
    case leakage_path::valve_outer: return "valve-plate-outer";
    case leakage_path::controller: return "controller";
    case leakage_path::bleed: return "bleed-orifice";
    case leakage_path::extra_laminar: return "extra-laminar";
    case leakage_path::extra_orifice: return "extra-orifice";
  }
  return "unknown";
}

}  // namespace pumploss
