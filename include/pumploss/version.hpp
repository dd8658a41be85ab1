/// @file version.hpp
/// @brief The library version, defined here once (CMake reads it from this file).
#ifndef PUMPLOSS_VERSION_HPP
#define PUMPLOSS_VERSION_HPP

/// Major version: the ABI of the C API changes only when this changes.
#define PUMPLOSS_VERSION_MAJOR 0
/// Minor version: new functions, compatible.
#define PUMPLOSS_VERSION_MINOR 1
/// Patch version: fixes only.
#define PUMPLOSS_VERSION_PATCH 0
/// MAJOR*1000000 + MINOR*1000 + PATCH, written out (pumploss.h repeats these macros token for
/// token, so including both is legal; the assertion below keeps the sum honest).
#define PUMPLOSS_VERSION_NUMBER 1000
/// "MAJOR.MINOR.PATCH".
#define PUMPLOSS_VERSION "0.1.0"

static_assert(PUMPLOSS_VERSION_NUMBER ==
                  PUMPLOSS_VERSION_MAJOR * 1000000 + PUMPLOSS_VERSION_MINOR * 1000 + PUMPLOSS_VERSION_PATCH,
              "PUMPLOSS_VERSION_NUMBER does not match MAJOR.MINOR.PATCH");

namespace pumploss {
/// The version as "MAJOR.MINOR.PATCH".
inline constexpr const char* version_string = PUMPLOSS_VERSION;
/// The version as MAJOR*1000000 + MINOR*1000 + PATCH.
inline constexpr int version_number = PUMPLOSS_VERSION_NUMBER;
}  // namespace pumploss

#endif
