/// @file status.hpp
/// @brief The one status code set shared by the C++ core and the C API, and the result type.
///
/// Codes 0 (ok), 1-99 (errors: every output is NaN) and 100 and up (reports: the value is
/// valid but was computed outside a stated assumption, or needs the caller's attention).
/// The numbers equal the PUMPLOSS_* macros of pumploss.h and are never renumbered; new codes
/// may be added.
#ifndef PUMPLOSS_STATUS_HPP
#define PUMPLOSS_STATUS_HPP

#include <cstdlib>
#include <limits>
#include <type_traits>

#include "export.hpp"
#if defined(__cpp_exceptions) || defined(__EXCEPTIONS)
#include <stdexcept>
#endif

namespace pumploss {

/// Status of a calculation. Values equal the C API's PUMPLOSS_* codes.
enum class status : int {
  ok = 0,                ///< Success.
  domain = 1,            ///< An argument is outside its physical domain (e.g. gap <= 0, viscosity <= 0).
  nonfinite = 2,         ///< An argument is NaN or infinite.
  overflow = 3,          ///< The result is not representable (overflow or total underflow).
  no_convergence = 4,    ///< An iteration reached its cap without meeting its tolerance.
  misuse = 5,            ///< A null pointer or a bad handle was passed.
  unknown_unit = 6,      ///< A unit symbol is not known.
  incompatible_units = 7,///< The two units measure different quantities.
  buffer_too_small = 8,  ///< An output buffer is too small for the result.
  no_memory = 9,         ///< Memory could not be allocated.
  internal = 10,         ///< An internal error (a bug): please report it.
  out_of_validity = 11,  ///< The inputs lie outside the range where the method is defined at all.
  insufficient_data = 12,///< Too few or degenerate data points for the requested fit or estimate.
  partial = 13,          ///< Batch call: some elements failed; the per-element status says which hold values.
  regime = 100,          ///< Valid value, computed outside the model's assumptions (e.g. laminar flow).
  transition = 101,      ///< Valid value in the laminar-turbulent transition region (interpolated).
  ill_conditioned = 102, ///< Valid value, but the data are nearly collinear: coefficients are uncertain.
  extrapolated = 103,    ///< Valid value, extrapolated beyond the data or table it came from.
  // 104 is retired (it was "partial" as a report code, which came with NaN outputs).
  implausible = 105,     ///< Valid value that is physically implausible (e.g. an efficiency above 1).
  undefined_output = 106,///< Valid, but an output undefined for these inputs (named in its documentation) is NaN.
  outlier = 107          ///< Valid, but some data points failed an outlier test (flagged, and excluded from a fit where the rule says so).
};

/// True for error codes (1-99): every output is NaN.
/// @param s a status
/// @return whether s is an error
constexpr bool is_error(status s) noexcept {
  return static_cast<int>(s) > 0 && static_cast<int>(s) < 100;
}
/// True when the value is usable: ok or a report (100 and up).
/// @param s a status
/// @return whether a value computed with status s may be used
constexpr bool is_usable(status s) noexcept { return !is_error(s); }

/// Combine two statuses: the first error wins, else the first report, else ok.
/// @param a first status
/// @param b second status
/// @return the combined status
constexpr status worst(status a, status b) noexcept {
  if (is_error(a)) return a;
  if (is_error(b)) return b;
  if (a != status::ok) return a;
  return b;
}

/// A one-sentence English description of a status code.
/// @param code a status code (pumploss::status value or PUMPLOSS_* constant)
/// @return the sentence (static storage, never null); unknown codes give a sentence saying so.
PUMPLOSS_CXX_API const char* status_message(int code) noexcept;

/// A one-sentence English description of a status (the same sentence the C API's
/// pumploss_status_message() returns).
/// @param s a status
/// @return the sentence (static storage, never null)
inline const char* status_message(status s) noexcept { return status_message(static_cast<int>(s)); }

/// A value together with the status of the calculation that produced it. [[nodiscard]]: a
/// result that is thrown away is a status nobody looked at.
///
/// Every struct result of the library follows the same convention: a `pumploss::status st`
/// member (NaN fields on an error), `ok()` and `usable()`; see DEVELOPERS.md.
///
/// On an error status the value is a quiet NaN (where T has one). C++ callers test ok() or
/// usable(); value_or_throw() throws std::domain_error at the caller's own site (when
/// exceptions are enabled; otherwise it aborts).
template <class T>
struct [[nodiscard]] result {
  T value{};                  ///< The computed value (NaN on error).
  pumploss::status st = pumploss::status::ok;  ///< How the value was obtained.

  /// @return true when the status is exactly ok.
  constexpr bool ok() const noexcept { return st == pumploss::status::ok; }
  /// @return true when the value is usable (ok or a report such as regime).
  constexpr bool usable() const noexcept { return is_usable(st); }
  /// The value, or an exception (or abort, without exceptions) on an error status.
  /// @return the value when the status is not an error
  const T& value_or_throw() const {
    if (is_error(st)) {
#if defined(__cpp_exceptions) || defined(__EXCEPTIONS)
      throw std::domain_error(status_message(static_cast<int>(st)));
#else
      std::abort();
#endif
    }
    return value;
  }
};

}  // namespace pumploss

#endif
