#include "common.hpp"

#include <cctype>
#include <cerrno>
#include <cmath>
#include <cstdlib>
#include <string>

namespace plcli {

const char* const cautions =
    "CAUTIONS\n"
    "- Hydraulic systems store energy: lines and accumulators stay pressurised after the pump\n"
    "  stops. Relieve pressure and secure loads before opening any connection.\n"
    "- Never feel for leaks with a hand: a pinhole jet of oil can penetrate skin. A fluid\n"
    "  injection injury is a surgical emergency, even when it looks small.\n"
    "- Oil, drain lines and pump cases run hot enough to burn.\n"
    "- These results are engineering estimates from models and measurements with uncertainty.\n"
    "  The pump maker's data and limits, local codes and licensed engineering practice always\n"
    "  take precedence.\n";

std::string where(const std::string& file, int line, int column) {
  std::string s = file;
  if (line > 0) {
    s += ":" + std::to_string(line);
    if (column > 0) s += ":" + std::to_string(column);
  }
  return s + ": ";
}

input_error::input_error(std::string file, int line, int column, const std::string& what)
    : std::runtime_error(where(file, line, column) + what),
      file_(std::move(file)),
      line_(line),
      column_(column) {}

std::string_view trim(std::string_view s) {
  const auto b = s.find_first_not_of(" \t\r");
  if (b == std::string_view::npos) return {};
  const auto e = s.find_last_not_of(" \t\r");
  return s.substr(b, e - b + 1);
}

std::optional<quantity_text> split_quantity(std::string_view text) {
  const std::string_view t = trim(text);
  // The number ends where a character no number can hold begins (but "e" only before a digit
  // or sign, so "5 em" would not happen: units never start with e+digit).
  std::size_t i = 0;
  while (i < t.size()) {
    const char c = t[i];
    if (std::isdigit(static_cast<unsigned char>(c)) || c == '.' || c == '-' || c == '+') {
      ++i;
    } else if ((c == 'e' || c == 'E') && i + 1 < t.size() &&
               (std::isdigit(static_cast<unsigned char>(t[i + 1])) || t[i + 1] == '-' || t[i + 1] == '+')) {
      ++i;
    } else {
      break;
    }
  }
  const auto num = parse_number(t.substr(0, i));
  if (!num) return std::nullopt;
  return quantity_text{*num, std::string(trim(t.substr(i)))};
}

double quantity_si(std::string_view text, pumploss::dimension dim) {
  const auto q = split_quantity(text);
  if (!q) throw std::invalid_argument("'" + std::string(text) + "' is not a number with a unit, e.g. '" +
                                      std::string("12.5 ") + pumploss::si_symbol(dim) + "'");
  if (q->unit.empty())
    throw std::invalid_argument("'" + std::string(text) + "' needs a unit of " + dimension_name(dim) + " (" +
                                units_of(dim) + ")");
  const auto* u = pumploss::find_unit(q->unit);
  if (u == nullptr)
    throw std::invalid_argument("unknown unit '" + q->unit + "'; units of " + dimension_name(dim) + ": " +
                                units_of(dim));
  if (u->dim != dim)
    throw std::invalid_argument("'" + q->unit + "' is a unit of " + dimension_name(u->dim) + ", expected " +
                                dimension_name(dim) + " (" + units_of(dim) + ")");
  const auto r = pumploss::convert(q->value, *u, *pumploss::find_unit(pumploss::si_symbol(dim)));
  if (!r.usable()) throw std::invalid_argument(pumploss::status_message(static_cast<int>(r.st)));
  return r.value;
}

double temperature_difference_k(std::string_view text) {
  const auto q = split_quantity(text);
  if (!q || q->unit.empty())
    throw std::invalid_argument("'" + std::string(text) + "' is not a temperature difference such as '5 K'");
  const auto* u = pumploss::find_unit(q->unit);
  if (u == nullptr || u->dim != pumploss::dimension::temperature)
    throw std::invalid_argument("'" + q->unit + "' is not a temperature unit (K, degC, degF)");
  return q->value * u->factor;  // a difference: scale only, no offset
}

}  // namespace plcli
