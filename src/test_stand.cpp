// Test-stand data reduction (test_stand.hpp): the steps of the header core in the order of a
// test report, with every refusal and report as a message naming the reading or setting.
#include "pumploss/test_stand.hpp"

#include <algorithm>
#include <cmath>
#include <cstdio>
#include <deque>
#include <limits>
#include <utility>

namespace pumploss {

namespace {

using msg = test_stand_message;
constexpr std::size_t no_row = msg::no_row;

// Level index of each value: sorted values closer than 3 % of the span to the previous one
// belong to the same level (set-points of a test grid). Returns the level of every value and
// the number of levels.
std::pair<std::vector<std::size_t>, std::size_t> level_of(const std::vector<double>& v) {
  std::vector<std::size_t> order(v.size());
  for (std::size_t i = 0; i < v.size(); ++i) order[i] = i;
  std::sort(order.begin(), order.end(), [&](std::size_t a, std::size_t b) { return v[a] < v[b]; });
  const double tol = v.empty() ? 0.0 : 0.03 * (v[order.back()] - v[order.front()]);
  std::vector<std::size_t> lev(v.size());
  std::size_t k = 0;
  for (std::size_t j = 0; j < order.size(); ++j) {
    if (j > 0 && v[order[j]] - v[order[j - 1]] > tol) ++k;
    lev[order[j]] = k;
  }
  return {lev, v.empty() ? 0 : k + 1};
}

const char* temperature_column(viscosity_temperature t) {
  switch (t) {
    case viscosity_temperature::inlet: return "inlet temperature";
    case viscosity_temperature::outlet: return "outlet temperature";
    case viscosity_temperature::drain: return "drain temperature";
  }
  return "?";
}

const std::vector<double>& temperatures(const test_stand_readings& r, viscosity_temperature t) {
  switch (t) {
    case viscosity_temperature::inlet: return r.inlet_temperature_k;
    case viscosity_temperature::outlet: return r.outlet_temperature_k;
    case viscosity_temperature::drain: break;
  }
  return r.drain_temperature_k;
}

std::string sentence(status s) { return status_message(static_cast<int>(s)); }

// The run: messages and the worst status so far.
struct run {
  test_stand_result& res;
  // Record an error; returns the result so the caller can `return r.fail(...)`.
  test_stand_result& fail(status s, std::size_t row, std::string column, std::string setting, std::string text) {
    res.st = is_error(s) ? s : status::domain;
    res.messages.push_back({res.st, row, std::move(column), std::move(setting), std::move(text), false});
    return res;
  }
  void report(status s, std::string text) {
    res.st = worst(res.st, s);
    res.messages.push_back({s, no_row, {}, {}, std::move(text), false});
  }
  // A note (status ok): a fact the report states, not a caution on the results.
  void note(std::string setting, std::string text) {
    res.messages.push_back({status::ok, no_row, {}, std::move(setting), std::move(text), false});
  }
};

// The name of column c (readings_member / row_member order): the flow is the outlet flow of a
// pump, the inlet flow of a motor.
const char* column_name(int c, bool pump) {
  static const char* const names[11] = {"speed",       "inlet pressure",    "outlet pressure",   nullptr,
                                        "torque",      "drain flow",        "inlet temperature", "outlet temperature",
                                        "drain temperature", "meter temperature", "case pressure"};
  return c == 3 ? (pump ? "outlet flow" : "inlet flow") : names[c];
}

// The column index of a name ("outlet flow" and "inlet flow" both name the flow); -1 for none.
int column_index(const std::string& name) {
  for (int c = 0; c < 11; ++c)
    if (name == column_name(c, true) || name == column_name(c, false)) return c;
  return -1;
}

// The columns of a reading by index (test_stand_row's order), in the readings and in a row.
constexpr std::vector<double> test_stand_readings::*readings_member[11] = {
    &test_stand_readings::speed_rev_s,         &test_stand_readings::inlet_pressure_pa,
    &test_stand_readings::outlet_pressure_pa,  &test_stand_readings::flow_m3_s,
    &test_stand_readings::torque_n_m,          &test_stand_readings::drain_flow_m3_s,
    &test_stand_readings::inlet_temperature_k, &test_stand_readings::outlet_temperature_k,
    &test_stand_readings::drain_temperature_k, &test_stand_readings::meter_temperature_k,
    &test_stand_readings::case_pressure_pa};
constexpr double test_stand_row::*row_member[11] = {
    &test_stand_row::speed_rev_s,         &test_stand_row::inlet_pressure_pa,    &test_stand_row::outlet_pressure_pa,
    &test_stand_row::flow_m3_s,           &test_stand_row::torque_n_m,           &test_stand_row::drain_flow_m3_s,
    &test_stand_row::inlet_temperature_k, &test_stand_row::outlet_temperature_k, &test_stand_row::drain_temperature_k,
    &test_stand_row::meter_temperature_k, &test_stand_row::case_pressure_pa};

// The range of every reading, in the order the checks run (a reader of the file meets them so).
struct range_check {
  int col;  // index of readings_member / row_member (its name: column_name())
  double lo, hi;
  const char* what;
};
std::array<range_check, 11> range_checks() {
  const char* temp = "is not an oil temperature between -50 and 200 degC";
  const char* gauge = "is not a gauge pressure between -1 and 10000 bar";
  const char* flow = "is not a flow between zero and 60000 L/min";
  return {{{0, 1e-3, 1e3, "is not a speed above zero (and below 60000 rpm)"},
           {3, 0.0, 1.0, flow},
           {5, 0.0, 1.0, flow},
           {4, 0.0, 1e6, "is not a torque between zero and 1e6 N.m"},
           {6, 223.15, 473.15, temp},
           {7, 223.15, 473.15, temp},
           {8, 223.15, 473.15, temp},
           {9, 223.15, 473.15, temp},
           {1, -1e5, 1e9, gauge},
           {2, -1e5, 1e9, gauge},
           {10, -1e5, 1e9, gauge}}};
}

// Check the setup's own values (a program's reader checks them too; an embedder may not).
bool setup_ok(const test_stand_setup& s, run& r) {
  auto bad = [&](const char* setting, const char* text) {
    r.fail(status::domain, no_row, {}, setting, text);
    return false;
  };
  if (!(s.nominal_displacement_m3_rev > 0 && std::isfinite(s.nominal_displacement_m3_rev)))
    return bad("nominal_displacement_m3_rev", "the nominal displacement must be above zero");
  if (s.kind != machine::pump && s.kind != machine::motor) return bad("kind", "the machine must be a pump or a motor");
  for (const auto* ins : {&s.speed, &s.pressure, &s.flow, &s.torque})
    if (!(ins->reading_fraction >= 0 && ins->reading_fraction < 0.5 && ins->absolute >= 0 &&
          std::isfinite(ins->absolute)))
      return bad("instruments", "instrument limits must be finite and not negative (reading part below 50 %)");
  if (!s.meter_at_port && !(s.meter_pressure_pa > -1e5 && s.meter_pressure_pa < 1e8))
    return bad("meter_pressure_pa", "the flow meter's pressure must be a gauge pressure between -1 bar and 1000 bar");
  // the map's ranges: both 0 for the tested envelope (the default), else 0 <= low < high
  const bool speeds_default = s.map_speed_lo_rev_s == 0 && s.map_speed_hi_rev_s == 0;
  const bool dps_default = s.map_dp_lo_pa == 0 && s.map_dp_hi_pa == 0;
  if (!speeds_default &&
      !(s.map_speed_lo_rev_s >= 0 && s.map_speed_hi_rev_s > s.map_speed_lo_rev_s && std::isfinite(s.map_speed_hi_rev_s)))
    return bad("map_speed_lo_rev_s", "the map's speeds must be [low, high] with 0 <= low < high (or both 0: the tested range)");
  if (!dps_default && !(s.map_dp_lo_pa >= 0 && s.map_dp_hi_pa > s.map_dp_lo_pa && std::isfinite(s.map_dp_hi_pa)))
    return bad("map_dp_lo_pa", "the map's pressures must be [low, high] with 0 <= low < high (or both 0: the tested range)");
  if (!(s.map_temperature_k == 0 || (s.map_temperature_k > 0 && std::isfinite(s.map_temperature_k))))
    return bad("map_temperature_k", "the map's temperature must be above 0 K (or 0: the tested mean)");
  if (!(s.group_speed_fraction > 0 && s.group_speed_fraction < 0.5 && s.group_dp_fraction > 0 &&
        s.group_dp_fraction < 0.5 && s.group_dp_abs_pa >= 0 && std::isfinite(s.group_dp_abs_pa)))
    return bad("group_speed_fraction", "the grouping tolerances must be fractions between 0 and 0.5 and a band >= 0");
  const auto& l = s.steady;
  if (!(l.speed_fraction > 0 && l.pressure_fraction > 0 && l.flow_fraction > 0 && l.torque_fraction > 0 &&
        l.temperature_k > 0 && std::isfinite(l.speed_fraction + l.pressure_fraction + l.flow_fraction +
                                             l.torque_fraction + l.temperature_k)))
    return bad("steady", "the steady-state limits must be finite and above zero");
  if (!(s.outlier_threshold > 1 && s.outlier_threshold <= 1e6) || (s.flow_terms & ~3u) != 0u)
    return bad("outlier_threshold", "the outlier threshold must lie above 1 (flow terms: bits 1 and 2 only)");
  for (const auto& c : s.acceptance)
    if (!(std::isfinite(c.limit) && c.limit >= 0 && c.speed_rev_s >= 0 && c.dp_pa >= 0 &&
          std::isfinite(c.speed_rev_s + c.dp_pa) && static_cast<int>(c.what) >= 0 && static_cast<int>(c.what) <= 3))
      return bad("acceptance", "an acceptance criterion needs a known quantity, a finite limit and a point >= 0");
  if (s.map_speeds < 2 || s.map_pressures < 2 || s.map_speeds > 10000 || s.map_pressures > 10000)
    return bad("map_speeds", "the map needs 2 to 10000 speeds and pressures");
  return true;
}

// The checks of the readings that do not look at values: the count, the columns given and their
// lengths (sizes: per column index, 0 for a column not given). Then the values (ranges, the pump's
// pressures), then columns_late_ok(): the columns the setup asks for.
bool columns_ok(const test_stand_setup& s, std::size_t n, const std::size_t (&sizes)[11], run& r) {
  const bool pump = s.kind == machine::pump;
  const char* names[11];
  for (int c = 0; c < 11; ++c) names[c] = column_name(c, pump);
  if (n == 0) return r.fail(status::insufficient_data, no_row, "speed", {}, "no readings"), false;
  for (const int c : {0, 1, 2, 3, 4, 5, 6, 7, 8, 10, 9}) {
    if (sizes[c] == 0 && c <= 6)
      return r.fail(status::insufficient_data, no_row, names[c], {},
                    std::string("missing column '") + names[c] + "' (the " + (pump ? "pump" : "motor") + "'s " +
                        names[c] + ")"),
             false;
    if (sizes[c] != 0 && sizes[c] != n)
      return r.fail(status::misuse, no_row, names[c], {},
                    std::string("column '") + names[c] + "' has " + std::to_string(sizes[c]) +
                        " readings, 'speed' has " + std::to_string(n)),
             false;
  }
  return true;
}

// A pump's outlet pressure above its inlet pressure (a motor's below).
bool pressures_in_order(bool pump, double p1, double p2) { return pump ? p2 > p1 : p1 > p2; }
test_stand_result& pressures_out_of_order(bool pump, std::size_t i, run& r) {
  return r.fail(status::domain, i, "outlet pressure", {},
                pump ? "a pump's outlet pressure must lie above its inlet pressure"
                     : "a motor's outlet pressure must lie below its inlet pressure");
}

// The column index of the temperature that sets the viscosity.
int viscosity_column(const test_stand_setup& s) {
  return s.viscosity_at == viscosity_temperature::inlet ? 6 : s.viscosity_at == viscosity_temperature::outlet ? 7 : 8;
}

bool columns_late_ok(const test_stand_setup& s, const std::size_t (&sizes)[11], run& r) {
  const bool pump = s.kind == machine::pump;
  const char* tvisc = temperature_column(s.viscosity_at);
  const int c_visc = viscosity_column(s);
  if (sizes[c_visc] == 0)
    return r.fail(status::insufficient_data, no_row, tvisc, "viscosity_at",
                  std::string("the viscosity is taken at the ") + tvisc + ", but there are no '" + tvisc + "' readings"),
           false;
  if (!s.meter_at_port) {
    const char* tport = pump ? "outlet temperature" : "inlet temperature";
    if (sizes[9] == 0)
      return r.fail(status::insufficient_data, no_row, "meter temperature", "meter_at_port",
                    "a flow meter in the return line needs the 'meter temperature' readings"),
             false;
    if (sizes[pump ? 7 : 6] == 0)
      return r.fail(status::insufficient_data, no_row, tport, "meter_at_port",
                    std::string("a flow meter in the return line needs the '") + tport +
                        "' readings (the port the flow is corrected to)"),
             false;
  }
  return true;
}

// Lengths and ranges of the readings, in the order a reader of the file would meet them.
bool readings_ok(const test_stand_setup& s, const test_stand_readings& d, run& r) {
  const bool pump = s.kind == machine::pump;
  const std::size_t n = d.speed_rev_s.size();
  std::size_t sizes[11];
  for (int c = 0; c < 11; ++c) sizes[c] = (d.*readings_member[c]).size();
  if (!columns_ok(s, n, sizes, r)) return false;
  for (const auto& c : range_checks()) {
    const auto& v = d.*readings_member[c.col];
    for (std::size_t i = 0; i < v.size(); ++i)
      if (!(v[i] >= c.lo && v[i] <= c.hi)) {
        r.fail(status::domain, i, column_name(c.col, pump), {}, c.what);
        r.res.messages.back().follows_value = true;
        return false;
      }
  }
  for (std::size_t i = 0; i < n; ++i)
    if (!pressures_in_order(pump, d.inlet_pressure_pa[i], d.outlet_pressure_pa[i]))
      return pressures_out_of_order(pump, i, r), false;
  return columns_late_ok(s, sizes, r);
}

// The pressure difference, the viscosity in the gaps and the flow at the port of reading i
// (t_visc the temperature that sets the viscosity; t_meter and t_port read for a return-line
// meter only); false with the failure recorded in r.
bool derive_row(const test_stand_setup& s, std::size_t i, double p1, double p2, double t_visc, double q_read,
                double t_meter, double t_port, double& dp, double& mu, double& q, bool& regime, run& r) {
  const bool pump = s.kind == machine::pump;
  const auto& oil = s.fluid;
  dp = pump ? p2 - p1 : p1 - p2;
  const auto m = oil_dynamic_viscosity(oil, t_visc, 0.0);
  if (!m.usable())
    return r.fail(m.st, i, temperature_column(s.viscosity_at), {}, "no oil viscosity at this temperature: " + sentence(m.st)),
           false;
  mu = m.value;
  if (s.meter_at_port) {
    q = q_read;
    return true;
  }
  const auto f = flow_at_port(q_read, s.meter_pressure_pa, t_meter, pump ? p2 : p1, t_port, oil.rho_ref_kg_m3,
                              oil.t_ref_k, oil.alpha_per_k, oil.bulk_modulus_pa);
  if (!f.usable())
    return r.fail(f.st, i, pump ? "outlet flow" : "inlet flow", {},
                  "cannot correct the flow to port conditions: " + sentence(f.st)),
           false;
  if (f.st != status::ok) regime = true;
  q = f.value;
  return true;
}

// Rows of one set point in the order read.
struct set_point_rows {
  std::vector<std::size_t> all;   // every row grouped here
  std::vector<std::size_t> rows;  // the steady ones
  std::size_t unsteady = 0;
};

// A reading (speed n, pressure difference dp) joins a set point of `count` rows whose speeds and
// pressure differences sum to sum_n and sum_p.
bool joins(const test_stand_setup& s, std::size_t count, double sum_n, double sum_p, double n, double dp) {
  const double c = static_cast<double>(count);
  const double mn = sum_n / c, mp = sum_p / c;
  return std::fabs(n - mn) <= s.group_speed_fraction * mn &&
         std::fabs(dp - mp) <= std::max(s.group_dp_fraction * std::fabs(mp), s.group_dp_abs_pa);
}

// Group rows into set points: a row joins the set point whose running means of speed and pressure
// difference it matches within the setup's tolerances (the previous row's set point tried first,
// as logged data stay on a set point for many rows), else it opens a new one.
std::vector<set_point_rows> group_rows(const test_stand_setup& s, const std::vector<double>& speed,
                                       const std::vector<double>& dp) {
  std::vector<set_point_rows> g;
  std::vector<double> sum_n, sum_p;
  auto fits = [&](std::size_t k, std::size_t i) { return joins(s, g[k].all.size(), sum_n[k], sum_p[k], speed[i], dp[i]); };
  std::size_t last = no_row;
  for (std::size_t i = 0; i < speed.size(); ++i) {
    std::size_t k = (last != no_row && fits(last, i)) ? last : no_row;
    for (std::size_t j = 0; k == no_row && j < g.size(); ++j)
      if (fits(j, i)) k = j;
    if (k == no_row) {
      k = g.size();
      g.emplace_back();
      sum_n.push_back(0.0);
      sum_p.push_back(0.0);
    }
    g[k].all.push_back(i);
    sum_n[k] += speed[i];
    sum_p[k] += dp[i];
    last = k;
  }
  return g;
}

// Median of values (the mean of the two middle ones for an even count).
double median_in(std::vector<double> x) {
  const std::size_t h = x.size() / 2;
  std::nth_element(x.begin(), x.begin() + static_cast<std::ptrdiff_t>(h), x.end());
  double med = x[h];
  if (x.size() % 2 == 0) med = 0.5 * (med + *std::max_element(x.begin(), x.begin() + static_cast<std::ptrdiff_t>(h)));
  return med;
}

double median_of(const std::vector<std::size_t>& rows, const std::vector<double>& v) {
  std::vector<double> x;
  x.reserve(rows.size());
  for (const std::size_t i : rows) x.push_back(v[i]);
  return median_in(std::move(x));
}

// A row within the steady-state limits about its set point's medians (speed, dp, flow, torque, temperature).
bool steady_about(const steady_state_limits& l, const double (&med)[5], double n, double dp, double q, double t,
                  double temp) {
  return std::fabs(n - med[0]) <= l.speed_fraction * med[0] && std::fabs(dp - med[1]) <= l.pressure_fraction * med[1] &&
         std::fabs(q - med[2]) <= l.flow_fraction * med[2] && std::fabs(t - med[3]) <= l.torque_fraction * med[3] &&
         std::fabs(temp - med[4]) <= l.temperature_k;
}

// The steady rows of a set point: every indicated value within the steady-state limits of its median.
set_point_rows steady_rows(const test_stand_setup& s, const set_point_rows& g, const std::vector<double>& speed,
                           const std::vector<double>& dp, const std::vector<double>& q,
                           const std::vector<double>& torque, const std::vector<double>& temp) {
  set_point_rows out;
  out.all = g.all;
  if (!s.drop_unsteady || g.all.size() < 3) {  // two rows have no majority to judge by
    out.rows = g.all;
    return out;
  }
  const double med[5] = {median_of(g.all, speed), median_of(g.all, dp), median_of(g.all, q), median_of(g.all, torque),
                         median_of(g.all, temp)};
  for (const std::size_t i : g.all) {
    if (steady_about(s.steady, med, speed[i], dp[i], q[i], torque[i], temp[i]))
      out.rows.push_back(i);
    else
      ++out.unsteady;
  }
  return out;
}

// Mean and sample standard deviation of v over rows (sd 0 for one row).
std::pair<double, double> mean_sd(const std::vector<std::size_t>& rows, const std::vector<double>& v) {
  double sum = 0;
  for (const std::size_t i : rows) sum += v[i];
  const double mean = sum / static_cast<double>(rows.size());
  if (rows.size() < 2) return {mean, 0.0};
  double ss = 0;
  for (const std::size_t i : rows) ss += (v[i] - mean) * (v[i] - mean);
  return {mean, std::sqrt(ss / static_cast<double>(rows.size() - 1))};
}

// The three displacement estimators on the included set points; the two-step one on the largest
// complete sub-grid, with a note naming the short level.
void estimate_displacement(test_stand_result& res, const std::vector<std::size_t>& inc, const std::vector<double>& sp,
                           const std::vector<double>& dpp, const std::vector<double>& qp,
                           const std::vector<std::size_t>& plev, const std::vector<std::size_t>& slev, std::size_t np,
                           std::size_t ns, std::string& note) {
  std::size_t pmin = no_row, smax = 0;
  for (const std::size_t k : inc) {
    pmin = std::min(pmin, plev[k]);
    smax = std::max(smax, slev[k]);
  }
  {  // A: slope of flow over speed at the lowest pressure level
    std::vector<double> xs, ys;
    for (const std::size_t k : inc)
      if (plev[k] == pmin) xs.push_back(sp[k]), ys.push_back(qp[k]);
    res.estimators[0] = displacement_slope(xs.data(), ys.data(), xs.size());
  }
  {  // B: zero-pressure intercept at the highest speed level
    std::vector<double> xs, ys;
    double nsum = 0;
    for (const std::size_t k : inc)
      if (slev[k] == smax) xs.push_back(dpp[k]), ys.push_back(qp[k]), nsum += sp[k];
    const double nmean = xs.empty() ? 0.0 : nsum / static_cast<double>(xs.size());
    res.estimators[1] = displacement_intercept(nmean, xs.data(), ys.data(), xs.size());
  }
  // C: two-step on the complete sub-grid. cell[p][s]: the first included set point there.
  std::vector<std::size_t> cell(np * ns, no_row);
  std::vector<double> lev_p(np, 0.0), lev_s(ns, 0.0);
  std::vector<std::size_t> cnt_p(np, 0), cnt_s(ns, 0);
  for (const std::size_t k : inc) {
    if (cell[plev[k] * ns + slev[k]] == no_row) cell[plev[k] * ns + slev[k]] = k;
    lev_p[plev[k]] += dpp[k], ++cnt_p[plev[k]];
    lev_s[slev[k]] += sp[k], ++cnt_s[slev[k]];
  }
  // drop, one at a time, the level with the largest share of missing cells until the grid is complete
  std::vector<bool> keep_p(np), keep_s(ns);
  for (std::size_t a = 0; a < np; ++a) keep_p[a] = cnt_p[a] > 0;
  for (std::size_t b = 0; b < ns; ++b) keep_s[b] = cnt_s[b] > 0;
  std::pair<std::size_t, std::size_t> dims{0, 0};
  for (;;) {
    std::vector<std::size_t> miss_p(np, 0), miss_s(ns, 0);
    std::size_t kp = 0, ks = 0, missing = 0;
    for (std::size_t a = 0; a < np; ++a) kp += keep_p[a] ? 1u : 0u;
    for (std::size_t b = 0; b < ns; ++b) ks += keep_s[b] ? 1u : 0u;
    for (std::size_t a = 0; a < np; ++a)
      for (std::size_t b = 0; b < ns; ++b)
        if (keep_p[a] && keep_s[b] && cell[a * ns + b] == no_row) ++miss_p[a], ++miss_s[b], ++missing;
    dims = {kp, ks};
    if (missing == 0) break;
    double worst_share = -1;
    bool drop_pressure = true;
    std::size_t which = 0;
    for (std::size_t a = 0; a < np; ++a)
      if (keep_p[a] && static_cast<double>(miss_p[a]) / static_cast<double>(ks) > worst_share)
        worst_share = static_cast<double>(miss_p[a]) / static_cast<double>(ks), drop_pressure = true, which = a;
    for (std::size_t b = 0; b < ns; ++b)
      if (keep_s[b] && static_cast<double>(miss_s[b]) / static_cast<double>(kp) > worst_share)
        worst_share = static_cast<double>(miss_s[b]) / static_cast<double>(kp), drop_pressure = false, which = b;
    if (drop_pressure)
      keep_p[which] = false;
    else
      keep_s[which] = false;
  }
  char buf[160];
  for (std::size_t a = 0; a < np; ++a)
    for (std::size_t b = 0; b < ns; ++b)
      if (cnt_p[a] > 0 && cnt_s[b] > 0 && cell[a * ns + b] == no_row && note.size() < 400) {
        std::snprintf(buf, sizeof buf, "%spressure level %zu (%.4g bar) lacks speed level %zu (%.4g rpm)",
                      note.empty() ? "" : "; ", a + 1, lev_p[a] / static_cast<double>(cnt_p[a]) / 1e5, b + 1,
                      lev_s[b] / static_cast<double>(cnt_s[b]) * 60);
        note += buf;
      }
  if (!note.empty()) {
    std::snprintf(buf, sizeof buf, ": the two-step estimator used the complete sub-grid of %zu speeds x %zu pressures",
                  dims.second, dims.first);
    note = "incomplete grid: " + note + buf;
  }
  std::vector<double> xs, ps, ys;
  for (std::size_t a = 0; a < np; ++a)
    for (std::size_t b = 0; b < ns; ++b)
      if (keep_p[a] && keep_s[b]) {
        const std::size_t k = cell[a * ns + b];
        xs.push_back(sp[k]), ps.push_back(dpp[k]), ys.push_back(qp[k]);
      }
  res.estimators[2] = displacement_two_step(xs.data(), ps.data(), ys.data(), dims.first, dims.second);
}

// Externally studentized residuals of the weighted regression y ~ A (m rows, p columns,
// column-major), each row weighted by 1 / u_i (the point's standard uncertainty: instruments'
// limits are per cent of reading, so the scatter grows with the reading):
// t_i = e_i / (s_(i) sqrt(1 - h_ii)), s_(i)^2 = ((m - p) s^2 - e_i^2 / (1 - h_ii)) / (m - p - 1)
// (Belsley, Kuh and Welsch 1980, 2.1). Columns scaled to unit norm, the Gram matrix factored by
// Cholesky (p <= 5; a diagnostic, the coefficients come from fit_loss_model()'s QR). `floor`: an
// unweighted RMS residual at or below it is rounding (exact data): every t is 0 then.
void externally_studentized(std::vector<double> x, std::size_t m, std::size_t p, const std::vector<double>& y,
                            const std::vector<double>& u, double floor, std::vector<double>& t) {
  const double nan = std::numeric_limits<double>::quiet_NaN();
  t.assign(m, nan);
  if (m < p + 2) return;
  std::vector<double> yw(m), g(p * p, 0.0), norm(p), beta(p, 0.0), z(p), h(m, 0.0);
  for (std::size_t i = 0; i < m; ++i) {
    if (!(u[i] > 0)) return;
    yw[i] = y[i] / u[i];
    for (std::size_t j = 0; j < p; ++j) x[j * m + i] /= u[i];
  }
  for (std::size_t j = 0; j < p; ++j) {
    double nn = 0;
    for (std::size_t i = 0; i < m; ++i) nn += x[j * m + i] * x[j * m + i];
    norm[j] = std::sqrt(nn);
    if (!(norm[j] > 0)) return;
    for (std::size_t i = 0; i < m; ++i) x[j * m + i] /= norm[j];
  }
  for (std::size_t j = 0; j < p; ++j)
    for (std::size_t k = 0; k <= j; ++k) {
      double sum = 0;
      for (std::size_t i = 0; i < m; ++i) sum += x[j * m + i] * x[k * m + i];
      g[j * p + k] = sum;
    }
  for (std::size_t j = 0; j < p; ++j) {  // Cholesky G = L L^T, lower triangle in place
    for (std::size_t k = 0; k < j; ++k) g[j * p + j] -= g[j * p + k] * g[j * p + k];
    if (!(g[j * p + j] > 1e-14)) return;
    g[j * p + j] = std::sqrt(g[j * p + j]);
    for (std::size_t i = j + 1; i < p; ++i) {
      for (std::size_t k = 0; k < j; ++k) g[i * p + j] -= g[i * p + k] * g[j * p + k];
      g[i * p + j] /= g[j * p + j];
    }
  }
  // beta = G^-1 X^T y: forward then back substitution
  for (std::size_t j = 0; j < p; ++j) {
    double v = 0;
    for (std::size_t i = 0; i < m; ++i) v += x[j * m + i] * yw[i];
    for (std::size_t k = 0; k < j; ++k) v -= g[j * p + k] * z[k];
    z[j] = v / g[j * p + j];
  }
  for (std::size_t j = p; j-- > 0;) {
    double v = z[j];
    for (std::size_t k = j + 1; k < p; ++k) v -= g[k * p + j] * beta[k];
    beta[j] = v / g[j * p + j];
  }
  std::vector<double> e(m);
  double rss = 0, rss_plain = 0;
  for (std::size_t i = 0; i < m; ++i) {
    double fit = 0;
    for (std::size_t j = 0; j < p; ++j) fit += x[j * m + i] * beta[j];
    e[i] = yw[i] - fit;
    rss += e[i] * e[i];
    rss_plain += e[i] * u[i] * e[i] * u[i];
    for (std::size_t j = 0; j < p; ++j) {  // h_ii = |L^-1 x_i|^2
      double v = x[j * m + i];
      for (std::size_t k = 0; k < j; ++k) v -= g[j * p + k] * z[k];
      z[j] = v / g[j * p + j];
      h[i] += z[j] * z[j];
    }
  }
  if (std::sqrt(rss_plain / static_cast<double>(m)) <= floor) {
    std::fill(t.begin(), t.end(), 0.0);
    return;
  }
  for (std::size_t i = 0; i < m; ++i) {
    const double omh = 1 - h[i];
    if (!(omh > 1e-12)) continue;
    const double s2i = (rss - e[i] * e[i] / omh) / static_cast<double>(m - p - 1);
    const double scale = std::sqrt(std::max(s2i, 0.0) * omh);
    t[i] = scale > 0 ? e[i] / scale : 0.0;
  }
}

// Studentized residuals of the flow and torque regressions of a fitted model (the columns of
// fit_loss_model()), weighted by each point's standard uncertainty of flow and torque.
void studentized(const loss_model<double>& mod, const std::vector<double>& dp, const std::vector<double>& n,
                 const std::vector<double>& mu, const std::vector<double>& q, const std::vector<double>& torque,
                 const std::vector<double>& uq, const std::vector<double>& ut, std::vector<double>& tq,
                 std::vector<double>& tt) {
  const std::size_t m = dp.size();
  const bool ext = mod.model == loss_model_kind::schloesser;
  const double dd = mod.displacement_m3_rev / (2 * 3.14159265358979323846);
  const double sign = mod.kind == machine::pump ? 1.0 : -1.0;
  std::vector<double> af, at, yq(m), yt(m);
  std::size_t pf = 0;
  const std::size_t pt = ext ? 4 : 3;
  auto col = [&](std::vector<double>& a, auto f) {
    for (std::size_t i = 0; i < m; ++i) a.push_back(f(detail::loss_columns(dd, mod.rho_kg_m3, dp[i], n[i], mu[i]), i));
  };
  col(af, [](const auto& c, std::size_t) { return c.flow_slip; }), ++pf;
  if (ext) col(af, [](const auto& c, std::size_t) { return c.flow_turb; }), ++pf;
  if (mod.flow_terms & flow_term_constant) col(af, [](const auto&, std::size_t) { return 1.0; }), ++pf;
  if (mod.flow_terms & flow_term_compression)
    col(af, [&](const auto& c, std::size_t i) { return c.d * c.omega * dp[i] / mod.bulk_modulus_pa; }), ++pf;
  col(at, [](const auto& c, std::size_t) { return c.tq_visc; });
  col(at, [](const auto& c, std::size_t) { return c.tq_coul; });
  col(at, [](const auto&, std::size_t) { return 1.0; });
  if (ext) col(at, [](const auto& c, std::size_t) { return c.tq_hydro; });
  for (std::size_t i = 0; i < m; ++i) {
    yq[i] = sign * (dd * 2 * 3.14159265358979323846 * n[i] - q[i]);
    yt[i] = sign * (torque[i] - dd * dp[i]);
  }
  const double rounding = 1e-10;  // relative RMS residual of exact data
  externally_studentized(std::move(af), m, pf, yq, uq, rounding * *std::max_element(q.begin(), q.end()), tq);
  externally_studentized(std::move(at), m, pt, yt, ut, rounding * *std::max_element(torque.begin(), torque.end()), tt);
}

// Verdicts of the acceptance criteria at the matching set points.
void judge_acceptance(const test_stand_setup& s, test_stand_result& res) {
  const double nan = std::numeric_limits<double>::quiet_NaN();
  res.accepted = true;
  for (const auto& c : s.acceptance) {
    acceptance_verdict v;
    v.criterion = c;
    v.value = v.margin = nan;
    const bool every = c.what == acceptance_quantity::drain_flow && c.speed_rev_s == 0;
    for (std::size_t k = 0; k < res.points.size(); ++k) {
      const auto& pt = res.points[k];
      if (!every && !(std::fabs(pt.speed_rev_s - c.speed_rev_s) <= s.group_speed_fraction * c.speed_rev_s &&
                      std::fabs(pt.dp_pa - c.dp_pa) <= std::max(s.group_dp_fraction * c.dp_pa, s.group_dp_abs_pa)))
        continue;
      double val = 0, u = 0;
      switch (c.what) {
        case acceptance_quantity::eta_v: val = pt.eta.eta_v.value, u = pt.eta.eta_v.U; break;
        case acceptance_quantity::eta_hm: val = pt.eta.eta_hm.value, u = pt.eta.eta_hm.U; break;
        case acceptance_quantity::eta_t: val = pt.eta.eta_t.value, u = pt.eta.eta_t.U; break;
        case acceptance_quantity::drain_flow: val = res.drain[k].drain_flow_m3_s; break;
      }
      const bool max = c.what == acceptance_quantity::drain_flow;
      const double margin = max ? c.limit - val : val - c.limit;
      // the nearest matching set point judges a stated point; every set point: the smallest margin
      const bool better = !v.tested || (every ? margin < v.margin
                                              : std::fabs(pt.dp_pa - c.dp_pa) + std::fabs(pt.speed_rev_s - c.speed_rev_s) * 1e5 <
                                                    std::fabs(res.points[v.point].dp_pa - c.dp_pa) +
                                                        std::fabs(res.points[v.point].speed_rev_s - c.speed_rev_s) * 1e5);
      if (better) v.tested = true, v.value = val, v.U = u, v.margin = margin, v.point = k;
    }
    v.pass = v.tested && v.margin >= 0;
    res.accepted = res.accepted && v.pass;
    res.acceptance.push_back(v);
  }
}

}  // namespace

double instrument_uncertainty(const instrument_limits& ins, double reading) {
  const auto dist = ins.rectangular ? uncertainty_distribution::rectangular : uncertainty_distribution::standard;
  const auto a = standard_uncertainty(ins.absolute, uncertainty_basis::absolute, dist, reading);
  const auto b = standard_uncertainty(ins.reading_fraction * 100.0, uncertainty_basis::percent_of_reading, dist, reading);
  return a.value + b.value;
}

std::string describe(const test_stand_message& m, const test_stand_readings& readings) {
  std::string out;
  if (!m.setting.empty()) out += "setting " + m.setting + ": ";
  if (m.row != no_row) out += "reading " + std::to_string(m.row + 1) + (m.column.empty() ? ": " : ", ");
  if (!m.column.empty()) {
    out += m.column;
    const int c = column_index(m.column);
    const auto* v = c < 0 ? nullptr : &(readings.*readings_member[c]);
    if (m.follows_value && m.row != no_row && v != nullptr && m.row < v->size()) {
      char buf[48];
      std::snprintf(buf, sizeof buf, " %.6g", (*v)[m.row]);
      out += buf;
      return out + " (SI) " + m.text;
    }
    out += ": ";
  }
  return out + m.text;
}

const char* displacement_choice_name(displacement_choice c) noexcept {
  switch (c) {
    case displacement_choice::slope: return "slope";
    case displacement_choice::intercept: return "intercept";
    case displacement_choice::two_step: return "two-step";
    case displacement_choice::nominal: return "nominal";
  }
  return "unknown";
}

const char* viscosity_temperature_name(viscosity_temperature t) noexcept {
  switch (t) {
    case viscosity_temperature::inlet: return "inlet";
    case viscosity_temperature::outlet: return "outlet";
    case viscosity_temperature::drain: return "drain";
  }
  return "unknown";
}

const char* acceptance_quantity_name(acceptance_quantity q) noexcept {
  switch (q) {
    case acceptance_quantity::eta_v: return "eta_v";
    case acceptance_quantity::eta_hm: return "eta_hm";
    case acceptance_quantity::eta_t: return "eta_t";
    case acceptance_quantity::drain_flow: return "drain_flow";
  }
  return "unknown";
}

const char* loss_model_name(loss_model_kind k) noexcept {
  return k == loss_model_kind::wilson ? "Wilson" : "Schloesser";
}

namespace {
// The means of every set point the reduction needs, one element per set point.
struct point_inputs {
  std::vector<double> sp, dpp, qp, tp, mup, drp, q_read_p, p1p, p2p, tvp;
  void resize(std::size_t m) {
    for (auto* v : {&sp, &dpp, &qp, &tp, &mup, &drp, &q_read_p, &p1p, &p2p, &tvp}) v->assign(m, 0.0);
  }
};
test_stand_result& reduce_points(const test_stand_setup& setup, run& r, const point_inputs& P, std::size_t n,
                                 double t_mid, bool regime_flow);
}  // namespace

test_stand_result reduce_test_stand(const test_stand_setup& setup, const test_stand_readings& d) {
  test_stand_result res;
  run r{res};
  if (!setup_ok(setup, r) || !readings_ok(setup, d, r)) return res;

  const bool pump = setup.kind == machine::pump;
  const auto& t_visc = temperatures(d, setup.viscosity_at);
  const auto& p1 = d.inlet_pressure_pa;
  const auto& p2 = d.outlet_pressure_pa;
  const std::size_t n = d.speed_rev_s.size();
  const auto& speed = d.speed_rev_s;
  const auto& torque = d.torque_n_m;
  const auto& q_read = d.flow_m3_s;

  // ---- flow at the port and viscosity in the gaps
  std::vector<double> dp(n), q(n), mu(n);
  bool regime_flow = false;
  res.flow_corrected = !setup.meter_at_port;
  for (std::size_t i = 0; i < n; ++i) {
    const double t_port = setup.meter_at_port ? 0.0 : pump ? d.outlet_temperature_k[i] : d.inlet_temperature_k[i];
    if (!derive_row(setup, i, p1[i], p2[i], t_visc[i], q_read[i],
                    setup.meter_at_port ? 0.0 : d.meter_temperature_k[i], t_port, dp[i], mu[i], q[i], regime_flow, r))
      return res;
  }

  // ---- set points: grouping, steady-state filter, averages with type A
  const auto groups = group_rows(setup, speed, dp);
  res.row_point.assign(n, no_row);
  const std::size_t m0 = groups.size();
  std::vector<set_point_rows> kept;
  kept.reserve(m0);
  for (const auto& g : groups) {
    set_point_rows k = steady_rows(setup, g, speed, dp, q, torque, t_visc);
    res.rows_unsteady += k.unsteady;
    if (!k.rows.empty()) kept.push_back(std::move(k));
  }
  const std::size_t m = kept.size();
  point_inputs P;
  P.resize(m);
  res.points.resize(m);
  for (std::size_t k = 0; k < m; ++k) {
    const auto& rows = kept[k].rows;
    auto& pt = res.points[k];
    pt.first_row = rows.front();
    pt.rows = rows.size();
    pt.rows_unsteady = kept[k].unsteady;
    for (const std::size_t i : rows) res.row_point[i] = k;
    const auto ms = mean_sd(rows, speed), md = mean_sd(rows, dp), mq = mean_sd(rows, q), mt = mean_sd(rows, torque);
    P.sp[k] = ms.first; P.dpp[k] = md.first; P.qp[k] = mq.first; P.tp[k] = mt.first;
    const double sq = std::sqrt(static_cast<double>(rows.size()));
    pt.ua_speed_rev_s = ms.second / sq;
    pt.ua_dp_pa = md.second / sq;
    pt.ua_flow_m3_s = mq.second / sq;
    pt.ua_torque_n_m = mt.second / sq;
    P.mup[k] = mean_sd(rows, mu).first;
    P.tvp[k] = mean_sd(rows, t_visc).first;
    P.drp[k] = mean_sd(rows, d.drain_flow_m3_s).first;
    P.q_read_p[k] = mean_sd(rows, q_read).first;
    P.p1p[k] = mean_sd(rows, p1).first;
    P.p2p[k] = mean_sd(rows, p2).first;
    for (const std::size_t x : setup.exclude_rows)
      if (x < n && std::find(kept[k].all.begin(), kept[k].all.end(), x) != kept[k].all.end()) pt.excluded_by_list = true;
    pt.excluded = pt.excluded_by_list;
  }
  reduce_points(setup, r, P, n, t_visc[n / 2], regime_flow);
  return res;
}

namespace {
// The reduction from the set points on (both front ends): res.points holds each set point's rows,
// type A and list exclusion; P its means; n the readings; t_mid the viscosity temperature of reading n / 2.
test_stand_result& reduce_points(const test_stand_setup& setup, run& r, const point_inputs& P, std::size_t n,
                                 double t_mid, bool regime_flow) {
  test_stand_result& res = r.res;
  const bool pump = setup.kind == machine::pump;
  const char* tvisc = temperature_column(setup.viscosity_at);
  const auto& oil = setup.fluid;
  const std::size_t m = res.points.size();
  res.drain.resize(m);
  const auto& sp = P.sp; const auto& dpp = P.dpp; const auto& qp = P.qp; const auto& tp = P.tp;
  const auto& mup = P.mup; const auto& drp = P.drp; const auto& q_read_p = P.q_read_p;
  const auto& p1p = P.p1p; const auto& p2p = P.p2p; const auto& tvp = P.tvp;
  for (const std::size_t x : setup.exclude_rows)
    if (x >= n)
      return r.fail(status::domain, no_row, {}, "exclude_rows",
                    "row " + std::to_string(x + 1) + " to exclude is past the last reading (" + std::to_string(n) + ")");
  if (m < 3) return r.fail(status::insufficient_data, no_row, "speed", {}, "fewer than 3 set points after grouping and the steady-state filter");
  const auto [plev, np] = level_of(dpp);
  const auto [slev, ns] = level_of(sp);
  res.pressure_levels = np;
  res.speed_levels = ns;
  for (std::size_t k = 0; k < m; ++k) {
    res.points[k].speed_level = slev[k];
    res.points[k].pressure_level = plev[k];
  }

  // standard uncertainties of each set point's flow and torque (type B with type A), the outlier test's weights
  auto rss = [](double a, double b) { return std::sqrt(a * a + b * b); };
  std::vector<double> u_flow(m), u_torque(m);
  for (std::size_t k = 0; k < m; ++k) {
    u_flow[k] = rss(instrument_uncertainty(setup.flow, q_read_p[k]), res.points[k].ua_flow_m3_s);
    u_torque[k] = rss(instrument_uncertainty(setup.torque, tp[k]), res.points[k].ua_torque_n_m);
    if (!(u_flow[k] > 0)) u_flow[k] = 1e-6 * qp[k] + 1e-300;  // no uncertainty stated: equal relative weights
    if (!(u_torque[k] > 0)) u_torque[k] = 1e-6 * tp[k] + 1e-300;
  }

  // ---- displacement, fit, outliers: repeated while the worst outlier is excluded by rule
  std::vector<double> work(loss_fit_workspace(m));
  const double rho = oil_density_at(oil, t_mid, 0.0).value;
  res.fit_density_kg_m3 = rho;
  std::vector<loss_model_kind> kinds = {loss_model_kind::wilson};
  if (setup.fit_schloesser) kinds.push_back(loss_model_kind::schloesser);
  const std::size_t max_rule = m / 5;
  std::size_t by_rule = 0;
  std::string short_note;
  bool ill = false;
  for (;;) {
    std::vector<std::size_t> inc;
    for (std::size_t k = 0; k < m; ++k)
      if (!res.points[k].excluded) inc.push_back(k);
    short_note.clear();
    estimate_displacement(res, inc, sp, dpp, qp, plev, slev, np, ns, short_note);
    res.displacement_used = setup.displacement;
    res.displacement_m3_rev = setup.nominal_displacement_m3_rev;
    res.u_displacement_m3_rev = 0.0;
    if (setup.displacement != displacement_choice::nominal) {
      const auto& e = res.estimators[static_cast<std::size_t>(setup.displacement)];
      if (!is_usable(e.st))
        return r.fail(e.st, no_row, {}, "displacement",
                      std::string("the estimator '") + displacement_choice_name(setup.displacement) +
                          "' found no displacement in these readings: " + sentence(e.st) +
                          (short_note.empty() ? "" : " (" + short_note + ")") +
                          " (choose another estimator or the nominal displacement)");
      res.displacement_m3_rev = e.v_m3_rev;
      res.u_displacement_m3_rev = e.u_v_m3_rev;
    }
    // fit on the included set points
    const std::size_t mi = inc.size();
    std::vector<double> xs(mi), xd(mi), xm(mi), xq(mi), xt(mi), rq(mi), rt(mi), xuq(mi), xut(mi);
    for (std::size_t j = 0; j < mi; ++j) {
      xs[j] = sp[inc[j]]; xd[j] = dpp[inc[j]]; xm[j] = mup[inc[j]]; xq[j] = qp[inc[j]]; xt[j] = tp[inc[j]];
      xuq[j] = u_flow[inc[j]];
      xut[j] = u_torque[inc[j]];
    }
    loss_fit_options<double> opt;
    opt.flow_terms = setup.flow_terms & 3u;
    opt.u_displacement_m3_rev = res.u_displacement_m3_rev;
    res.models.clear();
    ill = false;
    std::vector<double> tq_t(mi, 0.0), tt_t(mi, 0.0);
    for (const auto k : kinds) {
      const auto mod = fit_loss_model(setup.kind, k, res.displacement_m3_rev, rho, xd.data(), xs.data(), xm.data(),
                                      xq.data(), xt.data(), mi, work.data(), rq.data(), rt.data(), opt);
      if (is_error(mod.st))
        return r.fail(mod.st, no_row, {}, {},
                      std::string("the ") + loss_model_name(k) + " loss model cannot be fitted to these points: " +
                          sentence(mod.st));
      if (mod.st == status::ill_conditioned) ill = true;
      if (res.models.empty()) {
        for (std::size_t k2 = 0; k2 < m; ++k2) {
          // residuals of every set point (excluded ones too) against the fitted model
          const auto pr = loss_model_predict(mod, dpp[k2], sp[k2], mup[k2]);
          auto& pt = res.points[k2];
          pt.fit_st = pr.st;  // an error leaves the residuals NaN, and says so per point
          pt.flow_residual_m3_s = qp[k2] - pr.flow_m3_s;
          pt.torque_residual_n_m = tp[k2] - pr.torque_n_m;
          if (is_usable(pt.fit_st) && !(std::isfinite(pt.flow_residual_m3_s) && std::isfinite(pt.torque_residual_n_m)))
            pt.fit_st = status::overflow;  // never a NaN residual under a usable status
          if (is_error(pt.fit_st)) pt.flow_residual_m3_s = pt.torque_residual_n_m = std::numeric_limits<double>::quiet_NaN();
        }
        studentized(mod, xd, xs, xm, xq, xt, xuq, xut, tq_t, tt_t);
      }
      res.models.push_back(mod);
    }
    const double nan = std::numeric_limits<double>::quiet_NaN();
    for (auto& pt : res.points)  // an excluded set point keeps the flags of the fit that excluded it
      if (!pt.excluded) pt.t_flow = pt.t_torque = nan, pt.outlier = 0u;
    double worst_t = 0;
    std::size_t worst_k = no_row;
    for (std::size_t j = 0; j < mi; ++j) {
      auto& pt = res.points[inc[j]];
      pt.t_flow = tq_t[j];
      pt.t_torque = tt_t[j];
      if (std::fabs(tq_t[j]) > setup.outlier_threshold) pt.outlier |= 1u;
      if (std::fabs(tt_t[j]) > setup.outlier_threshold) pt.outlier |= 2u;
      const double w = std::max(std::fabs(tq_t[j]), std::fabs(tt_t[j]));
      if (pt.outlier != 0u && w > worst_t) worst_t = w, worst_k = inc[j];
    }
    if (!setup.exclude_outliers || worst_k == no_row || by_rule >= max_rule) break;
    res.points[worst_k].excluded = true;
    res.points[worst_k].outlier |= 4u;  // remembered: excluded by the rule
    ++by_rule;
  }
  for (std::size_t k = 0; k < m; ++k) {
    auto& pt = res.points[k];
    pt.outlier &= 3u;  // bit 4 marked the exclusion by the rule
    if (pt.outlier != 0u) ++res.outliers;
    if (pt.excluded) ++res.excluded;
  }
  const double v_used = res.displacement_m3_rev, u_v_used = res.u_displacement_m3_rev;

  // ---- efficiencies with GUM uncertainty per set point (type B of the instruments with type A), and the drain table
  bool implausible = false;
  for (std::size_t k = 0; k < m; ++k) {
    auto& pt = res.points[k];
    const double u_dp_b = pressure_difference_uncertainty(instrument_uncertainty(setup.pressure, p1p[k]),
                                                          instrument_uncertainty(setup.pressure, p2p[k]), 0.0)
                              .value;
    const efficiency_inputs<double> x{v_used, sp[k], dpp[k], qp[k], tp[k], u_v_used,
                                      rss(instrument_uncertainty(setup.speed, sp[k]), pt.ua_speed_rev_s),
                                      rss(u_dp_b, pt.ua_dp_pa),
                                      rss(instrument_uncertainty(setup.flow, q_read_p[k]), pt.ua_flow_m3_s),
                                      rss(instrument_uncertainty(setup.torque, tp[k]), pt.ua_torque_n_m), 0.0};
    const auto g = efficiency_gum(setup.kind, x);
    if (is_error(g.st))
      return r.fail(g.st, pt.first_row, "speed", {}, "no efficiencies for this set point: " + sentence(g.st));
    if (g.st == status::implausible) implausible = true;
    pt.speed_rev_s = sp[k];
    pt.dp_pa = dpp[k];
    pt.flow_m3_s = qp[k];
    pt.torque_n_m = tp[k];
    pt.mu_pa_s = mup[k];
    pt.eta = g;
    pt.st = g.st;
    const double q_th = v_used * sp[k];
    const double loss = pump ? q_th - qp[k] : qp[k] - q_th;
    auto& dr = res.drain[k];
    dr.drain_flow_m3_s = drp[k];
    dr.fraction = drp[k] / q_th;
    dr.loss_share = loss > 0 ? drp[k] / loss : std::numeric_limits<double>::quiet_NaN();
  }
  judge_acceptance(setup, res);

  // ---- the test envelope (included set points) and the map's defaults (issue 16)
  {
    bool first = true;
    for (std::size_t k = 0; k < m; ++k) {
      if (res.points[k].excluded) continue;
      auto widen = [&](double& lo, double& hi, double v) {
        lo = first ? v : std::min(lo, v);
        hi = first ? v : std::max(hi, v);
      };
      widen(res.tested_speed_lo_rev_s, res.tested_speed_hi_rev_s, sp[k]);
      widen(res.tested_dp_lo_pa, res.tested_dp_hi_pa, dpp[k]);
      widen(res.tested_temperature_lo_k, res.tested_temperature_hi_k, tvp[k]);
      first = false;
    }
  }
  double t_map = setup.map_temperature_k;
  if (t_map == 0) {  // the default: the mean of the viscosity temperature over the included set points
    double sum = 0;
    std::size_t cnt = 0;
    for (std::size_t k = 0; k < m; ++k)
      if (!res.points[k].excluded) sum += tvp[k], ++cnt;
    t_map = sum / static_cast<double>(cnt);
  }
  res.map_temperature_k = t_map;
  // a stated map temperature is read as the viscosity temperature; outside its tested range (with 0.5 K of
  // slack for the rounding of a stated figure) every map point is extrapolated in viscosity
  res.map_temperature_tested = t_map >= res.tested_temperature_lo_k - 0.5 && t_map <= res.tested_temperature_hi_k + 0.5;
  const auto mu_map = oil_dynamic_viscosity(oil, t_map, 0.0);
  if (!mu_map.usable())
    return r.fail(mu_map.st, no_row, {}, "map_temperature_k",
                  "no oil viscosity at the map temperature: " + sentence(mu_map.st));
  res.map_mu_pa_s = mu_map.value;
  const std::size_t nx = setup.map_speeds, ny = setup.map_pressures;
  const bool speeds_default = setup.map_speed_lo_rev_s == 0 && setup.map_speed_hi_rev_s == 0;
  const bool dps_default = setup.map_dp_lo_pa == 0 && setup.map_dp_hi_pa == 0;
  double s_lo = speeds_default ? res.tested_speed_lo_rev_s : setup.map_speed_lo_rev_s;
  double s_hi = speeds_default ? res.tested_speed_hi_rev_s : setup.map_speed_hi_rev_s;
  double d_lo = dps_default ? res.tested_dp_lo_pa : setup.map_dp_lo_pa;
  double d_hi = dps_default ? res.tested_dp_hi_pa : setup.map_dp_hi_pa;
  if (!(s_hi > s_lo)) s_lo *= 0.9, s_hi *= 1.1;  // one tested speed: a band about it
  if (!(d_hi > d_lo)) d_lo *= 0.9, d_hi = d_hi * 1.1 + 1e5;
  auto& gs = res.map_speed_rev_s;
  auto& gp = res.map_dp_pa;
  gs.resize(nx);
  gp.resize(ny);
  for (std::size_t j = 0; j < nx; ++j) gs[j] = s_lo + (s_hi - s_lo) * static_cast<double>(j) / static_cast<double>(nx - 1);
  for (std::size_t i = 0; i < ny; ++i) gp[i] = d_lo + (d_hi - d_lo) * static_cast<double>(i) / static_cast<double>(ny - 1);
  for (const auto& fitted : res.models) {
    test_stand_map mp;
    mp.model = fitted.model;
    mp.eta_t.resize(nx * ny);
    mp.st.resize(nx * ny);
    loss_model_map(fitted, mu_map.value, gp.data(), ny, gs.data(), nx, mp.eta_t.data(), mp.st.data());
    res.maps.push_back(std::move(mp));
  }
  for (std::size_t k = 0; k < nx * ny; ++k) {
    status w = status::ok;
    for (const auto& mp : res.maps) w = worst(w, mp.st[k]);
    if (w == status::extrapolated) ++res.map_extrapolated;
  }

  // ---- reports, in the order a report lists them: the outliers first (st is then outlier)
  for (std::size_t k = 0; k < m; ++k) {
    const auto& pt = res.points[k];
    if (pt.outlier == 0u && !pt.excluded) continue;
    char buf[200];
    std::snprintf(buf, sizeof buf, "set point %zu (reading %zu, %.4g rpm, %.4g bar): %s%s%s", k + 1, pt.first_row + 1,
                  pt.speed_rev_s * 60, pt.dp_pa / 1e5,
                  pt.outlier == 0u ? "" : (pt.outlier & 1u) ? ((pt.outlier & 2u) ? "flow and torque outlier" : "flow outlier") : "torque outlier",
                  pt.outlier != 0u && pt.excluded ? ", " : "",
                  pt.excluded_by_list ? "excluded from the fit by the setup's list" : pt.excluded ? "excluded from the fit by the outlier rule" : "");
    if (pt.outlier != 0u)
      r.report(status::outlier, buf);
    else
      r.note("exclude_rows", buf);
  }
  char t_note[400];  // which temperature the map is drawn at: a report when outside the tests, else a note at the end
  {
    char* buf = t_note;
    std::snprintf(buf, sizeof t_note,
                  "the map is drawn at %.4g degC of the %s, the temperature that sets the viscosity in the gaps "
                  "(tested %.4g to %.4g degC)%s",
                  t_map - 273.15, tvisc, res.tested_temperature_lo_k - 273.15, res.tested_temperature_hi_k - 273.15,
                  setup.map_temperature_k == 0 ? ", the tested mean (no map temperature stated)"
                  : res.map_temperature_tested ? ""
                                               : ": outside the tested range, so every map point is extrapolated in "
                                                 "viscosity (state the map temperature as that temperature)");
    if (!res.map_temperature_tested) r.report(status::extrapolated, buf);
  }
  if (res.map_extrapolated > 0)
    r.report(status::extrapolated,
             std::to_string(res.map_extrapolated) + " of " + std::to_string(nx * ny) +
                 " map points lie outside the tested pressures, speeds or viscosities: extrapolated by the model, "
                 "marked in the map CSV and shaded in the plot");
  if (implausible)
    r.report(status::implausible,
             "some efficiencies exceed 100 % (status 'implausible'): check the displacement used and the flow "
             "correction");
  if (regime_flow)
    r.report(status::regime, "some flow corrections span more than 150 K from the oil's reference temperature (flagged)");
  if (res.estimators[2].st == status::regime)
    r.report(status::regime,
             "the two-step estimator had fewer than 5 speeds x 5 pressures (ISO 8426-1 asks for that grid)");
  if (!short_note.empty()) r.report(status::regime, short_note);
  for (const auto& v : res.acceptance)
    if (!v.tested)
      r.report(status::undefined_output, "acceptance criterion not tested: no set point at its stated point");
  if (ill)
    r.report(status::ill_conditioned,
             "the test grid does not separate the loss terms well: the fitted coefficients are uncertain");
  if (res.map_temperature_tested) r.note("map_temperature_k", t_note);
  return res;
}
}  // namespace


// ---- the streaming front end (test_stand_stream, issue 20)
namespace {
// A reading held while its set point's run is open: its index, the values the steady-state filter
// judges (speed, dp, flow at the port, torque, viscosity temperature), the viscosity, and the row.
struct held_row {
  std::size_t i;
  double judged[5];
  double mu;
  test_stand_row row;
};

// One set point: the running sums of the grouping, and the sums of its steady rows.
struct stream_group {
  std::size_t count = 0;          // every row grouped here
  double sum_n = 0, sum_p = 0;    // their speeds and pressure differences (the grouping's running means)
  bool judged = false;            // the medians below are set (the steady-state filter ran on >= 3 rows)
  double med[5] = {0, 0, 0, 0, 0};
  std::vector<held_row> pending;  // rows of a group of fewer than 3 rows, not yet judged
  std::size_t steady = 0, unsteady = 0, first_row = no_row;
  bool excluded_by_list = false;
  double sum[5] = {0, 0, 0, 0, 0};  // steady rows: speed, dp, flow at the port, torque, viscosity temperature
  double sum_mu = 0;
  double sum_col[11] = {0, 0, 0, 0, 0, 0, 0, 0, 0, 0, 0};  // steady rows: every column as read
  double m2[4] = {0, 0, 0, 0};  // sums of squared deviations of speed, dp, flow, torque (type A)
};
}  // namespace

struct test_stand_stream::impl {
  test_stand_setup setup;
  unsigned columns = 0;
  bool keep_row_point = false, finished = false;
  bool setup_good = true;  // setup_ok(): else finish() refuses the setup and the rows are only counted
  std::size_t n = 0, max_held = 0;
  std::vector<std::size_t> excl;  // setup.exclude_rows, sorted
  std::vector<stream_group> groups;
  std::size_t open = no_row;     // the group of the previous row
  std::vector<held_row> run_rows;  // the rows of the open run
  std::deque<double> later_half;  // viscosity temperature of the rows n / 2 .. n - 1
  std::vector<std::size_t> row_group;  // per row: group, or no_row when dropped as settling (keep_row_point)
  bool regime_flow = false;
  // the first failure of the values: check (0..10 ranges, 11 pressures, 12 derive), row, and its message
  int fail_check = 13;
  std::size_t fail_row = no_row;
  test_stand_message fail_msg;
  double fail_value = 0;
  std::vector<test_stand_row> means;

  bool has(int c) const { return (columns >> c) & 1u; }

  void record_failure(int check, std::size_t i, const test_stand_message& m, double value) {
    if (check > fail_check || (check == fail_check && i >= fail_row)) return;
    fail_check = check;
    fail_row = i;
    fail_msg = m;
    fail_value = value;
  }

  // Fold steady rows (in row order) into their group's sums; the scatter merged by Chan, Golub and LeVeque (1983).
  void fold(stream_group& g, const std::vector<const held_row*>& rows) {
    if (rows.empty()) return;
    double bsum[4] = {0, 0, 0, 0};
    for (const auto* h : rows) {
      if (g.first_row == no_row) g.first_row = h->i;
      for (int c = 0; c < 5; ++c) g.sum[c] += h->judged[c];
      for (int c = 0; c < 4; ++c) bsum[c] += h->judged[c];
      g.sum_mu += h->mu;
      for (int c = 0; c < 11; ++c) g.sum_col[c] += h->row.*row_member[c];
    }
    const double nb = static_cast<double>(rows.size()), na = static_cast<double>(g.steady);
    for (int c = 0; c < 4; ++c) {
      const double mean_b = bsum[c] / nb;
      double ss = 0;
      for (const auto* h : rows) ss += (h->judged[c] - mean_b) * (h->judged[c] - mean_b);
      if (g.steady == 0) {
        g.m2[c] = ss;
      } else {
        const double delta = mean_b - (g.sum[c] - bsum[c]) / na;
        g.m2[c] += ss + delta * delta * na * nb / (na + nb);
      }
    }
    g.steady += rows.size();
  }

  void drop(stream_group& g, const held_row& h) {
    ++g.unsteady;
    if (keep_row_point) row_group[h.i] = no_row;
  }

  // The open run has ended: judge its rows by the steady-state criterion and fold the steady ones.
  void close_run() {
    if (open == no_row || run_rows.empty()) return;
    auto& g = groups[open];
    std::vector<held_row> rows;
    if (!g.judged && !g.pending.empty()) {
      rows = std::move(g.pending);
      g.pending.clear();
      rows.insert(rows.end(), run_rows.begin(), run_rows.end());
      run_rows.clear();
    } else {
      rows.swap(run_rows);  // no copy: the run's storage is handed over
    }
    std::vector<const held_row*> keep;
    if (!setup.drop_unsteady) {
      for (const auto& h : rows) keep.push_back(&h);
    } else if (!g.judged) {
      if (rows.size() < 3) {  // two rows have no majority to judge by: held until the set point grows or the end
        g.pending = std::move(rows);
        return;
      }
      std::vector<double> x(rows.size());
      for (int c = 0; c < 5; ++c) {
        for (std::size_t k = 0; k < rows.size(); ++k) x[k] = rows[k].judged[c];
        g.med[c] = median_in(x);
      }
      g.judged = true;
    }
    if (setup.drop_unsteady)
      for (const auto& h : rows) {
        if (steady_about(setup.steady, g.med, h.judged[0], h.judged[1], h.judged[2], h.judged[3], h.judged[4]))
          keep.push_back(&h);
        else
          drop(g, h);
      }
    fold(g, keep);
  }

  void add(const test_stand_row& row) {
    const std::size_t i = n++;
    if (!setup_good) return;
    const bool pump = setup.kind == machine::pump;
    const int c_visc = viscosity_column(setup);
    const double tv = has(c_visc) ? row.*row_member[c_visc] : 0.0;
    later_half.push_back(tv);
    while (later_half.size() > n - n / 2) later_half.pop_front();
    if (keep_row_point) row_group.push_back(no_row);
    // the values, in reduce_test_stand()'s order of checks
    int check = 0;
    for (const auto& c : range_checks()) {
      if (check >= fail_check) break;
      const double v = row.*row_member[c.col];
      if (has(c.col) && !(v >= c.lo && v <= c.hi)) {
        record_failure(check, i, {status::domain, i, column_name(c.col, pump), {}, c.what, true}, v);
        break;
      }
      ++check;
    }
    if (fail_check > 11 && (columns & required) == required &&
        !pressures_in_order(pump, row.inlet_pressure_pa, row.outlet_pressure_pa)) {
      test_stand_result scratch;
      run r{scratch};
      pressures_out_of_order(pump, i, r);
      record_failure(11, i, scratch.messages.back(), 0);
    }
    if (fail_check < 13 || (columns & required) != required || !has(c_visc) ||
        (!setup.meter_at_port && !(has(9) && has(pump ? 7 : 6))))
      return;  // the result is an error: only the checks go on
    held_row h{i, {row.speed_rev_s, 0, 0, row.torque_n_m, tv}, 0, row};
    {
      test_stand_result scratch;
      run r{scratch};
      const double t_port = setup.meter_at_port ? 0.0 : pump ? row.outlet_temperature_k : row.inlet_temperature_k;
      if (!derive_row(setup, i, row.inlet_pressure_pa, row.outlet_pressure_pa, tv, row.flow_m3_s,
                      row.meter_temperature_k, t_port, h.judged[1], h.mu, h.judged[2], regime_flow, r)) {
        record_failure(12, i, scratch.messages.back(), 0);
        return;
      }
    }
    // the grouping: the previous row's set point first, then every earlier one, else a new one
    auto fits = [&](std::size_t k) {
      return joins(setup, groups[k].count, groups[k].sum_n, groups[k].sum_p, row.speed_rev_s, h.judged[1]);
    };
    std::size_t k = (open != no_row && fits(open)) ? open : no_row;
    for (std::size_t j = 0; k == no_row && j < groups.size(); ++j)
      if (fits(j)) k = j;
    if (k != open) close_run();
    if (k == no_row) {
      k = groups.size();
      groups.emplace_back();
    }
    open = k;
    auto& g = groups[k];
    ++g.count;
    g.sum_n += row.speed_rev_s;
    g.sum_p += h.judged[1];
    if (!excl.empty() && std::binary_search(excl.begin(), excl.end(), i)) g.excluded_by_list = true;
    if (keep_row_point) row_group[i] = k;
    run_rows.push_back(h);
    max_held = std::max(max_held, run_rows.size() + g.pending.size());
  }

  test_stand_result finish() {
    test_stand_result res;
    run r{res};
    finished = true;
    if (!setup_ok(setup, r)) return res;
    std::size_t sizes[11];
    for (int c = 0; c < 11; ++c) sizes[c] = has(c) ? n : 0;
    if (!columns_ok(setup, n, sizes, r)) return res;
    if (fail_check <= 11) {
      res.st = fail_msg.st;
      res.messages.push_back(fail_msg);
      return res;
    }
    if (!columns_late_ok(setup, sizes, r)) return res;
    if (fail_check == 12) {
      res.st = fail_msg.st;
      res.messages.push_back(fail_msg);
      return res;
    }
    res.flow_corrected = !setup.meter_at_port;
    close_run();
    std::vector<const held_row*> keep;
    for (auto& g : groups)
      if (!g.pending.empty()) {  // fewer than 3 rows: every one kept
        keep.clear();
        for (const auto& h : g.pending) keep.push_back(&h);
        fold(g, keep);
        g.pending.clear();
      }
    std::vector<std::size_t> point_of(groups.size(), no_row);
    std::size_t m = 0;
    for (std::size_t j = 0; j < groups.size(); ++j) {
      res.rows_unsteady += groups[j].unsteady;
      if (groups[j].steady > 0) point_of[j] = m++;
    }
    point_inputs P;
    P.resize(m);
    res.points.resize(m);
    means.assign(m, test_stand_row{});
    const double nan = std::numeric_limits<double>::quiet_NaN();
    for (std::size_t j = 0; j < groups.size(); ++j) {
      if (point_of[j] == no_row) continue;
      const auto& g = groups[j];
      const std::size_t k = point_of[j];
      auto& pt = res.points[k];
      const double c = static_cast<double>(g.steady);
      pt.first_row = g.first_row;
      pt.rows = g.steady;
      pt.rows_unsteady = g.unsteady;
      P.sp[k] = g.sum[0] / c; P.dpp[k] = g.sum[1] / c; P.qp[k] = g.sum[2] / c; P.tp[k] = g.sum[3] / c;
      P.tvp[k] = g.sum[4] / c;
      P.mup[k] = g.sum_mu / c;
      P.drp[k] = g.sum_col[5] / c;
      P.q_read_p[k] = g.sum_col[3] / c;
      P.p1p[k] = g.sum_col[1] / c;
      P.p2p[k] = g.sum_col[2] / c;
      const double sq = std::sqrt(c);
      double* ua[4] = {&pt.ua_speed_rev_s, &pt.ua_dp_pa, &pt.ua_flow_m3_s, &pt.ua_torque_n_m};
      for (int q = 0; q < 4; ++q) *ua[q] = g.steady < 2 ? 0.0 : std::sqrt(g.m2[q] / (c - 1)) / sq;
      pt.excluded_by_list = pt.excluded = g.excluded_by_list;
      for (int q = 0; q < 11; ++q) means[k].*row_member[q] = has(q) ? g.sum_col[q] / c : nan;
    }
    if (keep_row_point) {
      res.row_point.resize(n);
      for (std::size_t i = 0; i < n; ++i)
        res.row_point[i] = row_group[i] == no_row ? no_row : point_of[row_group[i]];
    }
    reduce_points(setup, r, P, n, later_half.empty() ? 0.0 : later_half.front(), regime_flow);
    return res;
  }
};

test_stand_stream::test_stand_stream(const test_stand_setup& setup, unsigned columns, bool keep_row_point)
    : p_(new impl) {
  p_->setup = setup;
  p_->columns = columns;
  p_->keep_row_point = keep_row_point;
  p_->excl = setup.exclude_rows;
  std::sort(p_->excl.begin(), p_->excl.end());
  test_stand_result scratch;
  run r{scratch};
  p_->setup_good = setup_ok(setup, r);
}
test_stand_stream::~test_stand_stream() = default;
void test_stand_stream::add(const test_stand_row& row) {
  if (!p_->finished) p_->add(row);
}
test_stand_result test_stand_stream::finish() {
  if (p_->finished) {
    test_stand_result res;
    run r{res};
    r.fail(status::misuse, no_row, {}, {}, "the stream was finished already");
    return res;
  }
  return p_->finish();
}
std::size_t test_stand_stream::rows() const noexcept { return p_->n; }
std::size_t test_stand_stream::max_held_rows() const noexcept { return p_->max_held; }
const std::vector<test_stand_row>& test_stand_stream::point_means() const noexcept { return p_->means; }
std::string test_stand_stream::describe(const test_stand_message& m) const {
  test_stand_readings one;  // the failing reading's value in a readings of its row alone
  if (m.follows_value && m.row == p_->fail_row && m.row != no_row) {
    const int c = column_index(m.column);
    if (c >= 0) (one.*readings_member[c]).assign(m.row + 1, p_->fail_value);
  }
  return pumploss::describe(m, one);
}

}  // namespace pumploss
