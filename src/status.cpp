// Status messages (status.hpp). One sentence per code; the C API returns the same strings.
#include "pumploss/status.hpp"

namespace pumploss {

const char* status_message(int code) noexcept {
  if (code == 104) return "Retired status code 104 (was: some elements of a batch call failed); no longer returned.";
  switch (static_cast<status>(code)) {
    case status::ok: return "Success.";
    case status::domain: return "An argument is outside its physical domain (for example a gap, length or viscosity that is zero or negative).";
    case status::nonfinite: return "An argument is NaN or infinite.";
    case status::overflow: return "The result is too large or too small to be represented.";
    case status::no_convergence: return "An iterative calculation did not converge within its iteration limit.";
    case status::misuse: return "A null pointer or an invalid handle was passed.";
    case status::unknown_unit: return "A unit symbol is not known (symbols are case-sensitive).";
    case status::incompatible_units: return "The two units measure different quantities.";
    case status::buffer_too_small: return "The output buffer is too small for the result.";
    case status::no_memory: return "Memory could not be allocated.";
    case status::internal: return "Internal error in pumploss; please report it with the inputs that caused it.";
    case status::out_of_validity: return "The inputs lie outside the range where the method is defined.";
    case status::insufficient_data: return "Too few or degenerate data points for this fit or estimate.";
    case status::regime: return "Value computed outside the model's assumptions (for example turbulent or non-narrow gap flow); treat it as indicative.";
    case status::transition: return "Value in the laminar-turbulent transition region, where friction is uncertain.";
    case status::ill_conditioned: return "The data are nearly collinear; the fitted coefficients are poorly determined.";
    case status::extrapolated: return "Value extrapolated beyond the data or table it is based on.";
    case status::partial: return "Some elements of a batch call failed; the per-element status says which elements hold values.";
    case status::undefined_output: return "Valid, but an output that is undefined for these inputs (for example the friction factor at zero flow) is NaN; the other outputs are usable.";
    case status::outlier: return "Valid, but some data points failed the outlier test; they are flagged (and excluded from the fit where the rule says so).";
    case status::implausible: return "Value is physically implausible (for example an efficiency above 1); check the measurements.";
  }
  return "Unknown status code.";
}

}  // namespace pumploss
