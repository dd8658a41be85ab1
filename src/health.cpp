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
    case reason_drain_hot: return "Drain oil rise over the inlet is above the pump's own baseline rise (or, without one, above what throttling from outlet to case pressure explains).";
    case reason_low_pressure_reading: return "Reading taken well below the reference pressure; the normalisation is less certain.";
    case reason_no_baseline: return "No baseline given; growth over the pump's own baseline was not assessed.";
    case reason_no_temperatures: return "Drain or inlet temperature not given; the heat indicator was not assessed.";
    case reason_speed_off_rated: return "Speed is away from the rated speed; the reading is scored but compares less well.";
    case reason_drain_colder: return "Drain oil is colder than the inlet oil; check that the two sensors are not swapped.";
    case reason_state_differs: return "Operating state differs from the baseline's (or is deadhead without a baseline rise); the heat indicator was not assessed.";
    case reason_below_constant_part: return "Most of the reading is the controller's constant consumption; the normalised laminar part is uncertain.";
    default: return "Unknown reason.";
  }
}

const char* health_refusal_text(unsigned refusal) noexcept {
  switch (refusal) {
    case refuse_drain_not_positive: return "Drain flow is zero or negative: meter not connected, stopped or wrongly signed; not scored.";
    case refuse_drain_below_constant: return "Drain flow is below the controller's constant consumption: not possible for a running pump; not scored.";
    case refuse_oil_temperature: return "Oil temperature is outside what the oil can be at in service (check the unit, e.g. degF under a degC header); not scored.";
    case refuse_drain_temperature: return "Drain temperature is outside what the oil can be at in service (check the unit); not scored.";
    case refuse_speed_far_from_rated: return "Speed is far from the rated speed; not scored.";
    case refuse_pressure_too_low: return "Outlet-to-case pressure is too low to judge the clearances; not scored.";
    case refuse_fraction_above_one: return "Normalised drain flow exceeds the whole displacement flow: not a plausible reading; not scored.";
    default: return "Unknown refusal.";
  }
}

const char* health_case_drain_caution() noexcept {
  return "CASE DRAIN: never block, cap or valve a case drain line; a blocked drain over-pressurises the case and\n"
         "blows the shaft seal. Filters, coolers, check valves or flow meters in a drain only where the pump maker\n"
         "allows them, sized for the cold-start flow; keep case pressure within the maker's limit. Fit or remove a\n"
         "meter only with the machine stopped and the pressure relieved; drain oil runs hot enough to burn.\n"
         "A \"sound\" verdict is an engineering estimate, not a clearance to run: the maker's limits, local codes\n"
         "and licensed practice govern.";
}

const char* operating_state_name(operating_state s) noexcept {
  switch (s) {
    case operating_state::on_stroke: return "on stroke";
    case operating_state::deadhead: return "deadhead";
    case operating_state::unknown: return "unknown";
  }
  return "unknown";
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
