// pumploss_demo: the oil part of the demo scenario (examples/demo/). Reads an oil description
// (key = value lines), prints its viscosity and density over the temperature range, and checks
// the grade against ISO 3448. Bad input: a message naming file, line and column, exit code 2.
#include <cerrno>
#include <cmath>
#include <cstdio>
#include <cstdlib>
#include <fstream>
#include <map>
#include <string>

#include "pumploss/pumploss.hpp"

namespace {

const char* const kCaution =
    "CAUTION: engineering estimates only. Hydraulic systems store energy: pressurised lines and\n"
    "hot oil can injure (fluid injection injuries need emergency treatment). Follow the pump\n"
    "maker's limits, local codes and licensed practice.\n";

struct reader {
  std::string file;
  std::map<std::string, std::pair<double, int>> values;  // key -> (value, line)

  bool load() {
    std::ifstream in(file);
    if (!in) {
      std::fprintf(stderr, "%s: cannot open file\n", file.c_str());
      return false;
    }
    std::string line;
    int no = 0;
    while (std::getline(in, line)) {
      ++no;
      const auto first = line.find_first_not_of(" \t\r");
      if (first == std::string::npos || line[first] == '#') continue;
      const auto eq = line.find('=');
      if (eq == std::string::npos) {
        std::fprintf(stderr, "%s:%d:%zu: expected 'key = value'\n", file.c_str(), no, first + 1);
        return false;
      }
      std::string key = line.substr(first, eq - first);
      key.erase(key.find_last_not_of(" \t") + 1);
      const auto vpos = line.find_first_not_of(" \t", eq + 1);
      if (vpos == std::string::npos) {
        std::fprintf(stderr, "%s:%d:%zu: missing value for '%s'\n", file.c_str(), no, eq + 2, key.c_str());
        return false;
      }
      const char* start = line.c_str() + vpos;
      char* end = nullptr;
      errno = 0;
      const double v = std::strtod(start, &end);
      const std::string rest = std::string(end).substr(0, std::string(end).find_last_not_of(" \t\r") + 1);
      if (end == start || errno != 0 || !rest.empty() || !std::isfinite(v)) {
        std::fprintf(stderr, "%s:%d:%zu: '%s' is not a number\n", file.c_str(), no, vpos + 1, start);
        return false;
      }
      if (!values.emplace(key, std::make_pair(v, no)).second) {
        std::fprintf(stderr, "%s:%d:%zu: '%s' given twice\n", file.c_str(), no, first + 1, key.c_str());
        return false;
      }
    }
    return true;
  }

  bool get(const char* key, double& out) const {
    const auto it = values.find(key);
    if (it == values.end()) {
      std::fprintf(stderr, "%s: missing key '%s'\n", file.c_str(), key);
      return false;
    }
    out = it->second.first;
    return true;
  }
};

}  // namespace

int main(int argc, char** argv) {
  if (argc != 2) {
    std::fprintf(stderr, "usage: pumploss_demo OIL.ini\n\n%s", kCaution);
    return 2;
  }
  reader r{argv[1], {}};
  if (!r.load()) return 2;
  double grade, t1, nu1, t2, nu2, tmin, tmax, tstep;
  if (!r.get("grade", grade) || !r.get("t1_degC", t1) || !r.get("nu1_cSt", nu1) || !r.get("t2_degC", t2) ||
      !r.get("nu2_cSt", nu2) || !r.get("t_min_degC", tmin) || !r.get("t_max_degC", tmax) ||
      !r.get("t_step_degC", tstep))
    return 2;
  if (!(tstep > 0) || !(tmax >= tmin)) {
    std::fprintf(stderr, "%s: need t_step_degC > 0 and t_max_degC >= t_min_degC\n", r.file.c_str());
    return 2;
  }
  const auto k = [](double c) { return pumploss::convert(c, "degC", "K").value; };
  const auto line = pumploss::d341_fit(k(t1), nu1 * 1e-6, k(t2), nu2 * 1e-6);
  if (!line.usable()) {
    std::fprintf(stderr, "%s: oil viscosity points rejected: %s\n", r.file.c_str(),
                 pumploss::status_message(static_cast<int>(line.st)));
    return 2;
  }
  const auto oil = pumploss::typical_mineral_oil(line.value);
  std::printf("pumploss %s - demo oil report (%s)\n\n", pumploss::version_string, r.file.c_str());
  const auto vg = pumploss::iso_vg(static_cast<int>(grade));
  const auto nu40 = pumploss::d341_viscosity(line.value, k(40.0));
  if (vg.usable()) {
    const bool in = nu40.value >= vg.value.min_m2_s && nu40.value <= vg.value.max_m2_s;
    std::printf("ISO VG %d: %.1f cSt at 40 degC, band %.1f-%.1f cSt: %s\n", vg.value.grade, nu40.value * 1e6,
                vg.value.min_m2_s * 1e6, vg.value.max_m2_s * 1e6, in ? "inside" : "OUTSIDE");
  } else {
    std::printf("grade %g is not an ISO 3448 grade\n", grade);
  }
  std::printf("ASTM D341 line: A = %.4f, B = %.4f\n\n", line.value.a, line.value.b);
  std::printf("%8s %12s %12s %12s %10s\n", "t degC", "nu cSt", "rho kg/m3", "mu mPa.s", "SUS@100F");
  for (double t = tmin; t <= tmax + 1e-9; t += tstep) {
    const auto nu = pumploss::oil_kinematic_viscosity(oil, k(t));
    const auto rho = pumploss::oil_density_at(oil, k(t), 0.0);
    const auto mu = pumploss::oil_dynamic_viscosity(oil, k(t), 0.0);
    const auto sus = pumploss::sus_from_kinematic(nu.value);
    std::printf("%8.1f %12.2f %12.1f %12.2f %10.1f\n", t, nu.value * 1e6, rho.value, mu.value * 1e3, sus.value);
  }
  std::printf("\n%s", kCaution);
  return 0;
}
