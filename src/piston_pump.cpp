// Names of the leakage paths and groups, and the calibration of the budget to measured drain
// flows (piston_pump.hpp).
#include "pumploss/piston_pump.hpp"

#include <cmath>
#include <limits>
#include <new>
#include <vector>

#include "pumploss/detail/lsq.hpp"
#include "pumploss/detail/roots.hpp"

namespace pumploss {

const char* leakage_path_name(leakage_path path) noexcept {
  switch (path) {
    case leakage_path::piston_bore: return "piston-bore";
    case leakage_path::slipper: return "slipper";
    case leakage_path::ball_socket: return "ball-socket";
    case leakage_path::valve_inner: return "valve-plate-inner";
    case leakage_path::valve_outer: return "valve-plate-outer";
    case leakage_path::controller: return "controller";
    case leakage_path::bleed: return "bleed-orifice";
    case leakage_path::extra_laminar: return "extra-laminar";
    case leakage_path::extra_orifice: return "extra-orifice";
    case leakage_path::control_piston: return "control-piston";
  }
  return "unknown";
}

const char* controller_mode_name(controller_mode mode) noexcept {
  switch (mode) {
    case controller_mode::on_stroke: return "on-stroke";
    case controller_mode::compensating: return "compensating";
    case controller_mode::deadhead: return "deadhead";
  }
  return "unknown";
}

}  // namespace pumploss

// Calibration of the budget to measured drain flows.
namespace pumploss {

const char* path_group_name(path_group group) noexcept {
  switch (group) {
    case path_group::piston: return "piston";
    case path_group::slipper: return "slipper";
    case path_group::valve_plate: return "valve-plate";
    case path_group::controller: return "controller";
    case path_group::extra: return "extra";
  }
  return "unknown";
}

namespace {

constexpr int G = path_group_count;
const double kNaN = std::numeric_limits<double>::quiet_NaN();

// Gaps (pump_gap bits) that belong to each group.
constexpr unsigned kGroupGaps[G] = {1u, 2u | 4u, 8u, 0u, 0u};

pump_calibration empty_calibration(status st) {
  pump_calibration c{};
  for (int g = 0; g < G; ++g) {
    c.scale[g] = c.std_error[g] = c.gap_growth[g] = kNaN;
    c.confused_with[g] = 0u;
  }
  c.rms_residual_m3_s = kNaN;
  c.condition_number = kNaN;
  c.points = 0;
  c.st = st;
  return c;
}

// Group flows of the budget at one measurement.
status group_flows(const piston_pump<double>& p, const oil<double>& o, const drain_measurement& m, double out[G]) {
  if (!detail::finite(m.drain_m3_s)) return status::nonfinite;
  if (!(m.drain_m3_s >= 0.0)) return status::domain;
  const auto b =
      piston_pump_budget(p, o, {m.outlet_pa, m.case_pa, m.speed_rev_s, m.displacement_fraction, m.t_k, m.mode});
  if (is_error(b.st)) return b.st;
  for (int g = 0; g < G; ++g) out[g] = 0.0;
  for (int i = 0; i < leakage_path_count; ++i) out[static_cast<int>(group_of(static_cast<leakage_path>(i)))] += b.flow_m3_s[i];
  return b.st;
}

// Factor k on the group's gaps for which the group's flow at `m` becomes `scale` times the
// nominal one; NaN when not reachable within k in [1/20, 20].
double gap_factor_for_scale(const piston_pump<double>& p, const oil<double>& o, const drain_measurement& m, int g,
                            double scale) {
  if (kGroupGaps[g] == 0u || !(scale > 0.0)) return kNaN;
  double nominal[G];
  if (is_error(group_flows(p, o, m, nominal))) return kNaN;
  const double target = scale * nominal[g];
  auto flow = [&](double k) {
    double f[G];
    if (is_error(group_flows(scale_gaps(p, kGroupGaps[g], k), o, m, f))) return kNaN;
    return f[g];
  };
  const double lo = -std::log(20.0), hi = std::log(20.0);
  const double flo = flow(std::exp(lo)) - target, fhi = flow(std::exp(hi)) - target;
  if (!(flo <= 0.0) || !(fhi >= 0.0)) return kNaN;
  const double tol = 4 * scalar_traits<double>::epsilon();
  const auto r = detail::brent([&](double x) { return flow(std::exp(x)) - target; }, lo, hi, flo, fhi, tol, tol,
                               scalar_traits<double>::max_iterations);
  return r.st == status::ok ? std::exp(r.x) : kNaN;
}

}  // namespace

pump_calibration calibrate_piston_pump(const piston_pump<double>& p, const oil<double>& o,
                                       const drain_measurement* m, std::size_t n) noexcept {
  if (m == nullptr) return empty_calibration(status::misuse);
  try {
    const auto check = validate_piston_pump(p);
    if (is_error(check.st)) return empty_calibration(check.st);
    std::vector<double> cols(static_cast<std::size_t>(G) * n), q(n);
    status st = status::ok;
    std::size_t best = 0;
    for (std::size_t i = 0; i < n; ++i) {
      double f[G];
      const status s = group_flows(p, o, m[i], f);
      if (is_error(s)) return empty_calibration(s);
      st = worst(st, s);
      for (int g = 0; g < G; ++g) cols[static_cast<std::size_t>(g) * n + i] = f[g];
      q[i] = m[i].drain_m3_s;
      if (m[i].outlet_pa - m[i].case_pa > m[best].outlet_pa - m[best].case_pa) best = i;
    }
    pump_calibration c = empty_calibration(status::ok);
    c.points = n;
    // Present groups and their norms.
    double norm[G];
    bool present[G];
    for (int g = 0; g < G; ++g) {
      double ss = 0.0;
      for (std::size_t i = 0; i < n; ++i) ss += cols[static_cast<std::size_t>(g) * n + i] * cols[static_cast<std::size_t>(g) * n + i];
      norm[g] = std::sqrt(ss);
      present[g] = norm[g] > 0.0;
    }
    // Groups with proportional columns cannot be told apart: cluster them (cosine > 1 - 1e-9).
    int cluster[G];
    for (int g = 0; g < G; ++g) cluster[g] = g;
    for (int a = 0; a < G; ++a) {
      if (!present[a]) continue;
      for (int b = a + 1; b < G; ++b) {
        if (!present[b]) continue;
        double dot = 0.0;
        for (std::size_t i = 0; i < n; ++i)
          dot += cols[static_cast<std::size_t>(a) * n + i] * cols[static_cast<std::size_t>(b) * n + i];
        if (dot / (norm[a] * norm[b]) > 1.0 - 1e-9) {
          c.confused_with[a] |= 1u << b;
          c.confused_with[b] |= 1u << a;
          const int from = cluster[b], to = cluster[a];
          for (int g = 0; g < G; ++g)
            if (cluster[g] == from) cluster[g] = to;
        }
      }
    }
    // Close the confusion relation over each cluster.
    for (int a = 0; a < G; ++a)
      for (int b = 0; b < G; ++b)
        if (a != b && present[a] && present[b] && cluster[a] == cluster[b]) c.confused_with[a] |= 1u << b;
    // Merged columns, one per cluster.
    int index_of[G];
    std::size_t k = 0;
    for (int g = 0; g < G; ++g) index_of[g] = -1;
    for (int g = 0; g < G; ++g) {
      if (!present[g] || index_of[cluster[g]] >= 0) continue;
      index_of[cluster[g]] = static_cast<int>(k++);
    }
    if (k == 0 || n <= k) return empty_calibration(status::insufficient_data);
    std::vector<double> a(k * n, 0.0), work(n * (k + 1)), a2, b2(q);
    for (int g = 0; g < G; ++g) {
      if (!present[g]) continue;
      const std::size_t j = static_cast<std::size_t>(index_of[cluster[g]]);
      for (std::size_t i = 0; i < n; ++i) a[j * n + i] += cols[static_cast<std::size_t>(g) * n + i];
    }
    a2 = a;
    const auto fit = detail::nnls(a.data(), n, k, q.data(), work.data());
    if (is_error(fit.st)) return empty_calibration(fit.st);
    const auto ls = detail::householder_lsq(a2.data(), n, k, b2.data(), 1e10);
    c.condition_number = ls.cond;
    if (ls.st == status::ill_conditioned) st = worst(st, status::ill_conditioned);
    double rss = 0.0;
    for (std::size_t i = 0; i < n; ++i) {
      double pred = 0.0;
      for (std::size_t j = 0; j < k; ++j) pred += a[j * n + i] * fit.x[j];
      rss += (pred - q[i]) * (pred - q[i]);
    }
    c.rms_residual_m3_s = std::sqrt(rss / static_cast<double>(n));
    for (int g = 0; g < G; ++g) {
      if (!present[g]) continue;
      const std::size_t j = static_cast<std::size_t>(index_of[cluster[g]]);
      c.scale[g] = fit.x[j];
      c.std_error[g] = is_error(ls.st) ? kNaN : ls.se[j];
      const double factor = gap_factor_for_scale(p, o, m[best], g, c.scale[g]);
      c.gap_growth[g] = factor - 1.0;
    }
    c.st = st;
    return c;
  } catch (const std::bad_alloc&) {
    return empty_calibration(status::no_memory);
  }
}

}  // namespace pumploss
