/// @file units.hpp
/// @brief Exact SI conversion factors and unit conversion at the edges.
///
/// The core works in SI only (Pa, m, m^3/s, m^3/rev, rev/s, Pa s, m^2/s, kg/m^3, K, N m, W).
/// People see their own units at the edges; this header holds the exact factors and a
/// conversion that refuses incompatible dimensions.
///
/// @par Source
/// NIST Special Publication 811 (2008 edition), Appendix B; ISO 80000-1:2022. Exact by
/// definition: inch = 0.0254 m, pound-force = 4.4482216152605 N, US gallon = 231 in^3 =
/// 3.785411784 L, mechanical horsepower = 550 ft lbf/s = 745.69987158227022 W,
/// T[K] = t[degC] + 273.15, T[K] = (t[degF] + 459.67) * 5/9.
#ifndef PUMPLOSS_UNITS_HPP
#define PUMPLOSS_UNITS_HPP

#include <string_view>

#include "export.hpp"
#include "scalar_traits.hpp"
#include "status.hpp"

namespace pumploss {

/// @name Exact physical constants and conversion factors (SI value of one unit)
/// @{

/// Standard acceleration of free fall.
/// @return standard acceleration of free fall g_n = 9.80665 m/s^2 (exact; CGPM 1901, NIST SP 811).
template <class T>
inline T standard_gravity() {
  return detail::constant<T>(9.80665L, "9.80665");
}
/// @return one inch in metres: 0.0254 (exact).
template <class T>
inline T inch_m() {
  return detail::constant<T>(0.0254L, "0.0254");
}
/// @return one pound-force in newtons: 4.4482216152605 (exact).
template <class T>
inline T lbf_n() {
  return detail::constant<T>(4.4482216152605L, "4.4482216152605");
}
/// @return one psi (lbf/in^2) in pascals: 4.4482216152605 / 0.0254^2 = 6894.757293168361... (exact ratio).
template <class T>
inline T psi_pa() {
  return lbf_n<T>() / (inch_m<T>() * inch_m<T>());
}
/// @return one US liquid gallon in cubic metres: 3.785411784e-3 (exact).
template <class T>
inline T us_gallon_m3() {
  return detail::constant<T>(3.785411784e-3L, "0.003785411784");
}
/// @return one mechanical horsepower in watts: 745.69987158227022 (550 ft lbf/s, exact).
template <class T>
inline T horsepower_w() {
  return detail::constant<T>(745.69987158227022L, "745.69987158227022");
}
/// @return 0 degC in kelvin: 273.15 (exact).
template <class T>
inline T celsius_zero_k() {
  return detail::constant<T>(273.15L, "273.15");
}
/// @}

/// The quantity a unit measures.
enum class dimension : int {
  pressure = 0,            ///< SI unit Pa
  volume_flow = 1,         ///< SI unit m^3/s
  volume = 2,              ///< SI unit m^3
  displacement = 3,        ///< SI unit m^3/rev
  dynamic_viscosity = 4,   ///< SI unit Pa s
  kinematic_viscosity = 5, ///< SI unit m^2/s
  temperature = 6,         ///< SI unit K
  power = 7,               ///< SI unit W
  torque = 8,              ///< SI unit N m
  rotational_speed = 9,    ///< SI unit rev/s (the core's unit for speed n)
  length = 10,             ///< SI unit m
  density = 11,            ///< SI unit kg/m^3
  velocity = 12,           ///< SI unit m/s
  mass_flow = 13,          ///< SI unit kg/s
  specific_heat = 14,      ///< SI unit J/(kg K)
  force = 15               ///< SI unit N
};

/// One unit: its symbol and how it maps to SI.
///
/// The SI value is si = (value + offset) * factor. `factor` is the correctly rounded double;
/// `factor_num / factor_den * (2 pi)^two_pi_power` and `offset_text` give the exact decimal
/// definition for types with more precision.
struct unit_info {
  const char* symbol;      ///< Case-sensitive symbol, e.g. "L/min".
  dimension dim;           ///< Quantity measured.
  double factor;           ///< SI value of one unit (after the offset).
  const char* factor_num;  ///< Exact numerator of the factor (decimal text).
  const char* factor_den;  ///< Exact denominator of the factor (decimal text).
  int two_pi_power;        ///< The factor is multiplied by (2 pi)^two_pi_power.
  double offset;           ///< Added to the value before scaling (temperatures), else 0.
  const char* offset_text; ///< Exact decimal text of the offset.
  const char* name;        ///< Plain English name.
};

/// Look a unit up by its case-sensitive symbol.
/// @param symbol the unit symbol, e.g. "L/min"
/// @return the unit, or nullptr when unknown.
PUMPLOSS_CXX_API const unit_info* find_unit(std::string_view symbol) noexcept;

/// Look a unit up as people write it in the header of an exported file: first as find_unit(),
/// then with the spellings of spreadsheets and instruments mapped to the symbols:
/// - the degree sign: '°C', '°F' (UTF-8), '℃', '℉', 'deg C', 'deg F';
/// - superscripts and signs: '³' -> '3', '²' -> '2', 'µ'/'μ' -> 'u', '·' -> '.' ('cm³/rev', 'mm²/s', 'N·m');
/// - case-insensitive trade spellings: 'l/min', 'lpm', 'l/s', 'l', 'rpm', 'r/min', 'U/min', '1/min',
///   'gpm'; and 'Nm', 'mPas'.
/// A text that is not valid UTF-8 is taken as Windows-1252 (the single bytes 0xB0 degree,
/// 0xB2, 0xB3 superscripts, 0xB5 micro, 0xB7 middle dot, as Windows-1252 and ISO 8859-1 both
/// define them); `*windows_1252` (when given) is set true then, so the caller can say so. Any
/// other byte outside ASCII stays an unknown unit.
/// @param written the unit as written (outer blanks allowed)
/// @param windows_1252 optional: set to whether the Windows-1252 reading was needed
/// @return the unit, or nullptr when unknown
PUMPLOSS_CXX_API const unit_info* find_unit_written(std::string_view written, bool* windows_1252 = nullptr) noexcept;

/// @return the number of units known to find_unit().
PUMPLOSS_CXX_API int unit_count() noexcept;

/// The i-th known unit.
/// @param i index, 0 <= i < unit_count()
/// @return the unit, or nullptr for an index out of range.
PUMPLOSS_CXX_API const unit_info* unit_at(int i) noexcept;

/// The SI unit symbol of a dimension.
/// @param d the dimension
/// @return "Pa", "m3/s", ...
PUMPLOSS_CXX_API const char* si_symbol(dimension d) noexcept;

/// The SI value of one unit in T (exact decimal definition for types that can parse it).
/// @param u the unit
/// @return its factor
template <class T>
inline T unit_factor(const unit_info& u) {
  if constexpr (std::is_arithmetic_v<T>) {
    return static_cast<T>(u.factor);
  } else {
    T f = detail::constant<T>(0.0L, u.factor_num) / detail::constant<T>(1.0L, u.factor_den);
    const T two_pi = 2 * detail::pi<T>();
    for (int i = 0; i < u.two_pi_power; ++i) f *= two_pi;
    for (int i = 0; i > u.two_pi_power; --i) f /= two_pi;
    return f;
  }
}

/// The offset of a unit in T.
/// @param u the unit
/// @return its offset (non-zero for degC and degF only)
template <class T>
inline T unit_offset(const unit_info& u) {
  if constexpr (std::is_arithmetic_v<T>) {
    return static_cast<T>(u.offset);
  } else {
    return detail::constant<T>(0.0L, u.offset_text);
  }
}

/// Convert a value between two units of the same dimension.
///
/// \f[ x_\mathrm{to} = \frac{(x_\mathrm{from} + o_\mathrm{from})\, f_\mathrm{from}}{f_\mathrm{to}} - o_\mathrm{to} \f]
///
/// @param value value in unit `from` (any finite number)
/// @param from  unit of the value
/// @param to    wanted unit
/// @return the converted value; status::nonfinite for NaN/inf input,
///         status::incompatible_units when the dimensions differ,
///         status::domain for a temperature below absolute zero (0 K, -273.15 degC, -459.67 degF),
///         status::overflow when the result is not finite.
/// @par Accuracy
/// Within 2 ulp of the exact conversion for double (tests: units_test.cpp, 50-digit oracle).
/// @par Source
/// NIST SP 811 (2008), Appendix B.
template <class T>
inline result<T> convert(T value, const unit_info& from, const unit_info& to) {
  if (!detail::finite(value)) return detail::fail<T>(status::nonfinite);
  if (from.dim != to.dim) return detail::fail<T>(status::incompatible_units);
  // Temperatures are absolute: below 0 K a temperature does not exist (ISO 80000-5).
  if (from.dim == dimension::temperature && value + unit_offset<T>(from) < T(0))
    return detail::fail<T>(status::domain);
  T out;
  if (from.offset == 0.0 && to.offset == 0.0) {
    if (&from == &to) {
      out = value;
    } else {
      out = value * unit_factor<T>(from) / unit_factor<T>(to);
    }
  } else {
    out = (value + unit_offset<T>(from)) * unit_factor<T>(from) / unit_factor<T>(to) -
          unit_offset<T>(to);
  }
  if (!detail::finite(out)) return detail::fail<T>(status::overflow);
  return {out, status::ok};
}

/// Convert a value between two unit symbols (see find_unit()).
/// @param value value in the unit from_symbol
/// @param from_symbol case-sensitive symbol of the value's unit
/// @param to_symbol case-sensitive symbol of the wanted unit
/// @return status::unknown_unit when a symbol is not known, otherwise as convert().
PUMPLOSS_CXX_API result<double> convert(double value, std::string_view from_symbol, std::string_view to_symbol) noexcept;

}  // namespace pumploss

#endif
