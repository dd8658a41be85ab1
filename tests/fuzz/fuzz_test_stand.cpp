// libFuzzer target: the test-stand reduction (pumploss/test_stand.hpp, reduce_test_stand) with
// what a program hands it after reading its files: the setup's choices, instrument limits, map
// range and the readings. (It replaces the earlier target on the program's TOML readers: the
// configuration format belongs to the program, what the library receives from it is this.)
//
// The first byte sets the choices (machine, viscosity temperature, displacement, meter, model,
// and whether the readings follow a test grid); the next two the grid size; then every value
// takes two bytes: on a grid, a perturbation of up to +/-5 % of a plausible reading, with three
// codes for NaN, infinity and a sign flip; off the grid, any value over a wide range. A crash,
// undefined behaviour, an exception, an error without a message, or a usable result with
// non-finite numbers is a finding; so is a streamed reduction (test_stand_stream, the same
// readings row by row) that breaks a rule or refuses otherwise before the set points are formed.
#include <cmath>
#include <cstdint>
#include <cstdio>
#include <cstdlib>
#include <limits>

#include "pumploss/test_stand.hpp"
#include "test_stand_feed.hpp"  // tests/

namespace {

class bytes {
 public:
  bytes(const std::uint8_t* d, std::size_t n) : d_(d), n_(n) {}
  unsigned byte() { return i_ < n_ ? d_[i_++] : 0u; }
  unsigned u16() { return i_ + 1 < n_ ? (byte() << 8) | byte() : 0x8000u; }
  // a plausible value perturbed by up to 5 %, or a special value
  double near(double v) {
    const unsigned u = u16();
    if (u == 0xFFFF) return std::numeric_limits<double>::quiet_NaN();
    if (u == 0xFFFE) return std::numeric_limits<double>::infinity();
    if (u == 0xFFFD) return -v;
    return v * (1.0 + 0.05 * (static_cast<double>(u) - 32768.0) / 32768.0);
  }
  // any value in [lo, hi] (and beyond, through the special codes)
  double any(double lo, double hi) { return near(lo + (hi - lo) * static_cast<double>(u16()) / 65535.0); }

 private:
  const std::uint8_t* d_;
  std::size_t n_, i_ = 0;
};

void check(bool ok, const char* what) {
  if (!ok) {
    std::fprintf(stderr, "fuzz_test_stand: %s\n", what);
    std::abort();
  }
}

}  // namespace

// The rules every result keeps (n readings given).
void check_result(const pumploss::test_stand_setup& s, std::size_t n, const pumploss::test_stand_result& res) {
  if (pumploss::is_error(res.st)) {
    check(!res.messages.empty() && pumploss::is_error(res.messages.front().st) && !res.messages.front().text.empty(),
          "an error without its message");
    return;
  }
  // every reading belongs to one set point or was dropped as settling (issue 16: rows are grouped)
  check(res.row_point.size() == n && res.drain.size() == res.points.size() && !res.points.empty() &&
            res.points.size() <= n,
        "a set point missing");
  std::size_t counted = res.rows_unsteady;
  for (const auto& p : res.points) counted += p.rows;
  check(counted == n, "readings lost between the set points and the settling rows");
  for (const std::size_t k : res.row_point)
    check(k == pumploss::test_stand_message::no_row || k < res.points.size(), "a reading in no set point");
  check(std::isfinite(res.displacement_m3_rev) && res.displacement_m3_rev > 0, "no displacement");
  for (const auto& p : res.points) {
    if (!pumploss::is_usable(p.st)) continue;  // an error status comes with NaN numbers, by the rule
    check(std::isfinite(p.eta.eta_t.value) && std::isfinite(p.eta.eta_t.U), "a usable point with a non-finite number");
    // the residuals: finite under a usable fit status, NaN under an error one (the missing fit, per point)
    check(pumploss::is_usable(p.fit_st) == (std::isfinite(p.flow_residual_m3_s) && std::isfinite(p.torque_residual_n_m)),
          "a point's residuals disagree with its fit status");
  }
  check(!res.models.empty() && res.maps.size() == res.models.size(), "no model");
  std::size_t outlier_reports = 0;  // every flagged set point has its outlier report, and the run says so
  for (const auto& m : res.messages) outlier_reports += m.st == pumploss::status::outlier ? 1u : 0u;
  check(outlier_reports == res.outliers && (res.outliers == 0 || res.st == pumploss::status::outlier),
        "outliers without their status");
  check(std::isfinite(res.map_temperature_k) && res.map_mu_pa_s > 0, "no map temperature");
  for (const auto& mp : res.maps) {
    check(mp.eta_t.size() == s.map_speeds * s.map_pressures, "map size");
    for (std::size_t k = 0; k < mp.eta_t.size(); ++k)
      check(pumploss::is_error(mp.st[k]) || std::isfinite(mp.eta_t[k]), "a usable map point with a non-finite number");
  }
}

extern "C" int LLVMFuzzerTestOneInput(const std::uint8_t* data, std::size_t size) {
  bytes b(data, size);
  const unsigned flags = b.byte();
  pumploss::test_stand_setup s;
  s.kind = (flags & 1u) ? pumploss::machine::motor : pumploss::machine::pump;
  s.viscosity_at = static_cast<pumploss::viscosity_temperature>((flags >> 1) % 3);
  s.displacement = static_cast<pumploss::displacement_choice>((flags >> 3) & 3u);
  s.meter_at_port = (flags & 32u) == 0;
  s.fit_schloesser = (flags & 64u) != 0;
  const bool grid = (flags & 128u) == 0;
  const std::size_t ns = 1 + b.byte() % 7, np = 1 + b.byte() % 7;
  const auto line = pumploss::d341_fit(313.15, 46e-6, 373.15, 6.9e-6);
  s.fluid = pumploss::typical_mineral_oil(line.value);
  s.nominal_displacement_m3_rev = b.near(71e-6);
  s.meter_pressure_pa = b.near(0.5e5);
  for (auto* ins : {&s.speed, &s.pressure, &s.flow, &s.torque}) {
    ins->reading_fraction = b.any(0.0, 0.01);
    ins->absolute = b.any(0.0, 1.0);
    ins->rectangular = (b.byte() & 1u) != 0;
  }
  s.pressure.absolute *= 1e5;
  s.flow.absolute *= 1e-5;
  s.map_speed_lo_rev_s = b.near(400.0 / 60);
  s.map_speed_hi_rev_s = b.near(1800.0 / 60);
  s.map_dp_lo_pa = b.near(20e5);
  s.map_dp_hi_pa = b.near(280e5);
  s.map_temperature_k = b.any(200.0, 450.0);
  s.map_speeds = 2 + b.byte() % 10;
  s.map_pressures = 2 + b.byte() % 10;

  pumploss::test_stand_readings r;
  const bool pump = s.kind == pumploss::machine::pump;
  for (std::size_t k = 0; k < ns; ++k)
    for (std::size_t j = 0; j < np; ++j) {
      const double n = grid ? b.near((500.0 + 250.0 * static_cast<double>(k)) / 60) : b.any(-1.0, 100.0);
      const double dp = grid ? 20e5 + 50e5 * static_cast<double>(j) : b.any(-1e5, 5e7);
      const double p_low = grid ? b.near(0.3e5) : b.any(-2e5, 1e6);
      r.speed_rev_s.push_back(n);
      r.inlet_pressure_pa.push_back(pump ? p_low : p_low + dp);
      r.outlet_pressure_pa.push_back(pump ? p_low + dp : p_low);
      const double q_th = 71e-6 * n;
      const double t_th = 71e-6 * dp / (2 * 3.141592653589793);
      r.flow_m3_s.push_back(grid ? b.near(pump ? q_th * (1 - 0.03 * dp / 25e6) : q_th * (1 + 0.03 * dp / 25e6))
                                 : b.any(-1e-3, 2e-3));
      r.torque_n_m.push_back(grid ? b.near(pump ? t_th * 1.05 + 2 : t_th * 0.95 - 2) : b.any(-10.0, 500.0));
      r.drain_flow_m3_s.push_back(grid ? b.near(0.01 * q_th) : b.any(-1e-5, 1e-4));
      r.inlet_temperature_k.push_back(grid ? b.near(318.15) : b.any(200.0, 500.0));
      r.outlet_temperature_k.push_back(grid ? b.near(319.15) : b.any(200.0, 500.0));
      r.drain_temperature_k.push_back(grid ? b.near(323.15) : b.any(200.0, 500.0));
      r.meter_temperature_k.push_back(grid ? b.near(313.15) : b.any(200.0, 500.0));
    }
  // an optional column left out, or one cut short
  const unsigned cut = b.byte();
  if (cut == 1) r.drain_temperature_k.clear();
  if (cut == 2) r.meter_temperature_k.clear();
  if (cut == 3 && !r.torque_n_m.empty()) r.torque_n_m.pop_back();

  const auto res = pumploss::reduce_test_stand(s, r);
  check_result(s, r.speed_rev_s.size(), res);
  // the streaming front end (issue 20) fed the same readings row by row, when no column is cut short:
  // the same rules, and the same refusal while the set points are not formed yet (the checks are shared)
  if (cut != 3) {
    pumploss::test_stand_stream st(s, pltest::columns_of(r), true);
    pltest::feed(st, r);
    const auto sres = st.finish();
    check_result(s, r.speed_rev_s.size(), sres);
    check(sres.st == res.st || !(res.row_point.empty() || sres.row_point.empty()), "the stream refuses differently");
    if (res.row_point.empty() || sres.row_point.empty()) {
      const auto &m1 = res.messages.front(), &m2 = sres.messages.front();
      check(m1.st == m2.st && m1.row == m2.row && m1.column == m2.column && m1.setting == m2.setting &&
                m1.text == m2.text && m1.follows_value == m2.follows_value,
            "the stream's refusal has another message");
    }
  }
  return 0;
}
