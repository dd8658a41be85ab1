// Reason sentences and level names of the health verdict (health.hpp).
#include "pumploss/health.hpp"

namespace pumploss {

const char* health_reason_text(unsigned reason) noexcept {
  switch (reason) {
    case reason_fraction_sound: return "Normalised drain fraction is within the band of a sound pump.";
    case reason_fraction_acceptable: return "Normalised drain fraction is above the sound band but within the acceptable band.";
    case reason_fraction_elevated: return "Normalised drain fraction is between the acceptable band and the worn band.";
    case reason_fraction_worn: return "Normalised drain fraction is at or beyond the worn band.";
    case reason_growth_moderate: return "Normalised drain flow has grown over the pump's baseline beyond the watch limit.";
    case reason_growth_large: return "Normalised drain flow has grown over the pump's baseline beyond the worn limit.";
    case reason_drain_hot: return "Drain oil is hotter than throttling from outlet to case pressure alone explains.";
    case reason_low_pressure_reading: return "Reading taken below half the reference pressure; the normalisation is less certain.";
    case reason_no_baseline: return "No baseline given; growth over the pump's own baseline was not assessed.";
    case reason_no_temperatures: return "Drain or inlet temperature not given; the heat indicator was not assessed.";
    default: return "Unknown reason.";
  }
}

const char* health_level_name(health_level level) noexcept {
  switch (level) {
    case health_level::sound: return "sound";
    case health_level::acceptable: return "acceptable";
    case health_level::elevated: return "elevated";
    case health_level::worn: return "worn";
  }
  return "unknown";
}

}  // namespace pumploss
