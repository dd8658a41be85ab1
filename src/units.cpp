// Unit table and symbol lookup for pumploss::convert (units.hpp).
// Factors: NIST SP 811 (2008), Appendix B; exact definitions noted in units.hpp.
// The double `factor` of each row is the correctly rounded value of num/den*(2 pi)^k;
// tests/units_test.cpp checks every row against a 50-digit evaluation of the exact text.
#include "pumploss/units.hpp"

#include <iterator>

namespace pumploss {
namespace {

using D = dimension;

// symbol, dimension, factor, exact numerator, exact denominator, (2 pi) power, offset, offset text, name
constexpr unit_info kUnits[] = {
    // pressure, SI Pa
    {"Pa", D::pressure, 1.0, "1", "1", 0, 0.0, "0", "pascal"},
    {"kPa", D::pressure, 1e3, "1000", "1", 0, 0.0, "0", "kilopascal"},
    {"MPa", D::pressure, 1e6, "1000000", "1", 0, 0.0, "0", "megapascal"},
    {"GPa", D::pressure, 1e9, "1000000000", "1", 0, 0.0, "0", "gigapascal"},
    {"bar", D::pressure, 1e5, "100000", "1", 0, 0.0, "0", "bar"},
    {"mbar", D::pressure, 1e2, "100", "1", 0, 0.0, "0", "millibar"},
    {"psi", D::pressure, 6894.757293168362, "4.4482216152605", "0.00064516", 0, 0.0, "0",
     "pound-force per square inch"},
    // volume flow, SI m3/s
    {"m3/s", D::volume_flow, 1.0, "1", "1", 0, 0.0, "0", "cubic metre per second"},
    {"L/min", D::volume_flow, 1.6666666666666667e-05, "0.001", "60", 0, 0.0, "0", "litre per minute"},
    {"L/s", D::volume_flow, 1e-3, "0.001", "1", 0, 0.0, "0", "litre per second"},
    {"m3/h", D::volume_flow, 0.0002777777777777778, "1", "3600", 0, 0.0, "0", "cubic metre per hour"},
    {"cm3/s", D::volume_flow, 1e-6, "0.000001", "1", 0, 0.0, "0", "cubic centimetre per second"},
    {"gpm", D::volume_flow, 6.30901964e-05, "0.003785411784", "60", 0, 0.0, "0",
     "US gallon per minute"},
    // volume, SI m3
    {"m3", D::volume, 1.0, "1", "1", 0, 0.0, "0", "cubic metre"},
    {"cm3", D::volume, 1e-6, "0.000001", "1", 0, 0.0, "0", "cubic centimetre"},
    {"L", D::volume, 1e-3, "0.001", "1", 0, 0.0, "0", "litre"},
    {"in3", D::volume, 1.6387064e-05, "0.000016387064", "1", 0, 0.0, "0", "cubic inch"},
    {"gal", D::volume, 3.785411784e-3, "0.003785411784", "1", 0, 0.0, "0", "US liquid gallon"},
    // displacement, SI m3/rev
    {"m3/rev", D::displacement, 1.0, "1", "1", 0, 0.0, "0", "cubic metre per revolution"},
    {"cm3/rev", D::displacement, 1e-6, "0.000001", "1", 0, 0.0, "0", "cubic centimetre per revolution"},
    {"in3/rev", D::displacement, 1.6387064e-05, "0.000016387064", "1", 0, 0.0, "0",
     "cubic inch per revolution"},
    // dynamic viscosity, SI Pa s
    {"Pa.s", D::dynamic_viscosity, 1.0, "1", "1", 0, 0.0, "0", "pascal second"},
    {"mPa.s", D::dynamic_viscosity, 1e-3, "0.001", "1", 0, 0.0, "0", "millipascal second"},
    {"cP", D::dynamic_viscosity, 1e-3, "0.001", "1", 0, 0.0, "0", "centipoise"},
    // kinematic viscosity, SI m2/s
    {"m2/s", D::kinematic_viscosity, 1.0, "1", "1", 0, 0.0, "0", "square metre per second"},
    {"mm2/s", D::kinematic_viscosity, 1e-6, "0.000001", "1", 0, 0.0, "0", "square millimetre per second"},
    {"cSt", D::kinematic_viscosity, 1e-6, "0.000001", "1", 0, 0.0, "0", "centistokes"},
    // temperature, SI K
    {"K", D::temperature, 1.0, "1", "1", 0, 0.0, "0", "kelvin"},
    {"degC", D::temperature, 1.0, "1", "1", 0, 273.15, "273.15", "degree Celsius"},
    {"degF", D::temperature, 0.5555555555555556, "5", "9", 0, 459.67, "459.67", "degree Fahrenheit"},
    // power, SI W
    {"W", D::power, 1.0, "1", "1", 0, 0.0, "0", "watt"},
    {"kW", D::power, 1e3, "1000", "1", 0, 0.0, "0", "kilowatt"},
    {"hp", D::power, 745.69987158227022, "745.69987158227022", "1", 0, 0.0, "0",
     "mechanical horsepower (550 ft lbf/s)"},
    // torque, SI N m
    {"N.m", D::torque, 1.0, "1", "1", 0, 0.0, "0", "newton metre"},
    {"lbf.ft", D::torque, 1.3558179483314004, "1.35581794833140040", "1", 0, 0.0, "0",
     "pound-force foot"},
    {"lbf.in", D::torque, 0.1129848290276167, "0.11298482902761670", "1", 0, 0.0, "0",
     "pound-force inch"},
    // rotational speed, SI rev/s
    {"rev/s", D::rotational_speed, 1.0, "1", "1", 0, 0.0, "0", "revolution per second"},
    {"rev/min", D::rotational_speed, 0.016666666666666666, "1", "60", 0, 0.0, "0",
     "revolution per minute"},
    {"rpm", D::rotational_speed, 0.016666666666666666, "1", "60", 0, 0.0, "0", "revolution per minute"},
    {"rad/s", D::rotational_speed, 0.15915494309189535, "1", "1", -1, 0.0, "0", "radian per second"},
    // length, SI m
    {"m", D::length, 1.0, "1", "1", 0, 0.0, "0", "metre"},
    {"cm", D::length, 1e-2, "0.01", "1", 0, 0.0, "0", "centimetre"},
    {"mm", D::length, 1e-3, "0.001", "1", 0, 0.0, "0", "millimetre"},
    {"um", D::length, 1e-6, "0.000001", "1", 0, 0.0, "0", "micrometre"},
    {"in", D::length, 0.0254, "0.0254", "1", 0, 0.0, "0", "inch"},
    {"ft", D::length, 0.3048, "0.3048", "1", 0, 0.0, "0", "foot"},
    // density, SI kg/m3
    {"kg/m3", D::density, 1.0, "1", "1", 0, 0.0, "0", "kilogram per cubic metre"},
    {"g/cm3", D::density, 1e3, "1000", "1", 0, 0.0, "0", "gram per cubic centimetre"},
    // velocity, SI m/s
    {"m/s", D::velocity, 1.0, "1", "1", 0, 0.0, "0", "metre per second"},
    {"ft/s", D::velocity, 0.3048, "0.3048", "1", 0, 0.0, "0", "foot per second"},
    // mass flow, SI kg/s
    {"kg/s", D::mass_flow, 1.0, "1", "1", 0, 0.0, "0", "kilogram per second"},
    {"kg/h", D::mass_flow, 0.0002777777777777778, "1", "3600", 0, 0.0, "0", "kilogram per hour"},
    // specific heat, SI J/(kg K)
    {"J/(kg.K)", D::specific_heat, 1.0, "1", "1", 0, 0.0, "0", "joule per kilogram kelvin"},
    {"kJ/(kg.K)", D::specific_heat, 1e3, "1000", "1", 0, 0.0, "0", "kilojoule per kilogram kelvin"},
    // force, SI N
    {"N", D::force, 1.0, "1", "1", 0, 0.0, "0", "newton"},
    {"kN", D::force, 1e3, "1000", "1", 0, 0.0, "0", "kilonewton"},
    {"lbf", D::force, 4.4482216152605, "4.4482216152605", "1", 0, 0.0, "0", "pound-force"},
};

constexpr const char* kSiSymbols[] = {"Pa",   "m3/s", "m3", "m3/rev", "Pa.s", "m2/s",
                                      "K",    "W",    "N.m", "rev/s", "m",    "kg/m3",
                                      "m/s", "kg/s", "J/(kg.K)", "N"};

}  // namespace

const unit_info* find_unit(std::string_view symbol) noexcept {
  for (const unit_info& u : kUnits) {
    if (symbol == u.symbol) return &u;
  }
  return nullptr;
}

namespace {

// Spellings of exported files -> symbols (compared after the normalisation below).
struct alias {
  const char* written;
  const char* symbol;
};
// compared exactly (case matters: 'nm' would be a nanometre)
constexpr alias kExactAliases[] = {{"degreeC", "degC"}, {"degreeF", "degF"}, {"deg C", "degC"}, {"deg F", "degF"},
                                   {"Nm", "N.m"},       {"mPas", "mPa.s"},   {"Pas", "Pa.s"}};
// compared without case
constexpr alias kCaselessAliases[] = {{"l/min", "L/min"}, {"lpm", "L/min"}, {"l/s", "L/s"},   {"l", "L"},
                                      {"rpm", "rpm"},     {"r/min", "rpm"}, {"u/min", "rpm"}, {"1/min", "rpm"},
                                      {"gpm", "gpm"}};

bool same_caseless(std::string_view a, std::string_view b) noexcept {
  if (a.size() != b.size()) return false;
  for (std::size_t i = 0; i < a.size(); ++i) {
    auto lo = [](char c) { return (c >= 'A' && c <= 'Z') ? static_cast<char>(c - 'A' + 'a') : c; };
    if (lo(a[i]) != lo(b[i])) return false;
  }
  return true;
}

// Whether the text is well-formed UTF-8 (no overlong forms checked: only the mapping below matters).
bool valid_utf8(std::string_view s) noexcept {
  for (std::size_t i = 0; i < s.size();) {
    const auto c = static_cast<unsigned char>(s[i]);
    std::size_t n = 0;
    if (c < 0x80) n = 0;
    else if ((c >> 5) == 0x6) n = 1;
    else if ((c >> 4) == 0xE) n = 2;
    else if ((c >> 3) == 0x1E) n = 3;
    else return false;
    for (std::size_t k = 1; k <= n; ++k)
      if (i + k >= s.size() || (static_cast<unsigned char>(s[i + k]) >> 6) != 0x2) return false;
    i += n + 1;
  }
  return true;
}

}  // namespace

const unit_info* find_unit_written(std::string_view written, bool* windows_1252) noexcept {
  if (windows_1252 != nullptr) *windows_1252 = false;
  while (!written.empty() && (written.front() == ' ' || written.front() == '\t')) written.remove_prefix(1);
  while (!written.empty() && (written.back() == ' ' || written.back() == '\t')) written.remove_suffix(1);
  if (const unit_info* u = find_unit(written)) return u;
  if (written.size() > 32) return nullptr;
  // normalise into a small buffer: UTF-8 signs, or Windows-1252 single bytes when not UTF-8
  static constexpr struct {
    const char* from;
    const char* to;
  } kUtf8[] = {{"\xC2\xB0", "deg"}, {"\xE2\x84\x83", "degC"}, {"\xE2\x84\x89", "degF"}, {"\xC2\xB3", "3"},
               {"\xC2\xB2", "2"},   {"\xC2\xB5", "u"},        {"\xCE\xBC", "u"},        {"\xC2\xB7", "."}};
  static constexpr struct {
    char from;
    const char* to;
  } kCp1252[] = {{'\xB0', "deg"}, {'\xB2', "2"}, {'\xB3', "3"}, {'\xB5', "u"}, {'\xB7', "."}};
  char buf[128];
  std::size_t n = 0;
  const bool utf8 = valid_utf8(written);
  bool used_1252 = false;
  for (std::size_t i = 0; i < written.size();) {
    const char* to = nullptr;
    std::size_t step = 1;
    if (static_cast<unsigned char>(written[i]) >= 0x80) {
      if (utf8) {
        for (const auto& m : kUtf8) {
          const std::string_view f(m.from);
          if (written.substr(i, f.size()) == f) {
            to = m.to;
            step = f.size();
            break;
          }
        }
      } else {
        for (const auto& m : kCp1252)
          if (written[i] == m.from) {
            to = m.to;
            used_1252 = true;
            break;
          }
      }
      if (to == nullptr) return nullptr;  // any other non-ASCII character: not a unit we know
    }
    if (to != nullptr) {
      for (const char* c = to; *c != '\0'; ++c) buf[n++] = *c;
    } else {
      buf[n++] = written[i];
    }
    i += step;
  }
  const std::string_view norm(buf, n);
  const unit_info* u = find_unit(norm);
  for (const auto& a : kExactAliases)
    if (u == nullptr && norm == a.written) u = find_unit(a.symbol);
  for (const auto& a : kCaselessAliases)
    if (u == nullptr && same_caseless(norm, a.written)) u = find_unit(a.symbol);
  if (u != nullptr && windows_1252 != nullptr) *windows_1252 = used_1252;
  return u;
}

int unit_count() noexcept { return static_cast<int>(std::size(kUnits)); }

const unit_info* unit_at(int i) noexcept {
  if (i < 0 || i >= unit_count()) return nullptr;
  return &kUnits[i];
}

const char* si_symbol(dimension d) noexcept {
  const int i = static_cast<int>(d);
  if (i < 0 || i >= static_cast<int>(std::size(kSiSymbols))) return "?";
  return kSiSymbols[i];
}

result<double> convert(double value, std::string_view from_symbol, std::string_view to_symbol) noexcept {
  const unit_info* from = find_unit(from_symbol);
  const unit_info* to = find_unit(to_symbol);
  if (from == nullptr || to == nullptr) return detail::fail<double>(status::unknown_unit);
  return convert<double>(value, *from, *to);
}

}  // namespace pumploss
