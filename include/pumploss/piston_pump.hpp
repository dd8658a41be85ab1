/// @file piston_pump.hpp
/// @brief Case drain leakage budget of a swashplate axial piston pump: the laminar clearance
/// flows (piston in bore, slipper pad, ball socket, valve plate sealing lands) and the
/// controller's consumption and bleed, summed for a real geometry at the pressure, speed,
/// displacement and oil temperature of the moment.
#ifndef PUMPLOSS_PISTON_PUMP_HPP
#define PUMPLOSS_PISTON_PUMP_HPP

#include <cmath>
#include <cstddef>

#include "export.hpp"
#include "detail/roots.hpp"
#include "dual.hpp"
#include "fluid.hpp"
#include "gap.hpp"
#include "orifice.hpp"
#include "scalar_traits.hpp"
#include "status.hpp"

namespace pumploss {

/// Geometry and clearances of a swashplate axial piston pump (all SI).
///
/// Set a clearance to 0 to leave its path out (for example a pump without a bleed orifice).
template <class T>
struct piston_pump {
  int pistons = 9;                  ///< number of pistons z (usually 7 or 9)
  T piston_diameter_m{};            ///< piston diameter d, m
  T bore_clearance_m{};             ///< radial clearance piston-bore h_K, m
  T piston_eccentricity = T(0);     ///< eccentricity ratio of the piston in its bore, 0..1
  T engaged_length_min_m{};         ///< engaged piston-bore length at outer dead centre (shortest), m
  T pitch_radius_m{};               ///< pitch radius of the bores R, m
  T max_swash_angle_rad{};          ///< maximum swash angle beta_max, rad (0 < beta < pi/4)
  T high_pressure_share = detail::constant<T>(0.5L, "0.5");  ///< share of pistons on the high-pressure side
  T slipper_pocket_radius_m{};      ///< slipper pocket (recess) radius, m
  T slipper_outer_radius_m{};       ///< slipper land outer radius, m
  T slipper_gap_m{};                ///< slipper land gap h_S, m (0: no slipper path)
  T slipper_feed_diameter_m{};      ///< diameter of the feed bore through piston and slipper, m
  T slipper_feed_length_m{};        ///< length of the feed bore (a capillary), m
  T ball_diameter_m{};              ///< piston ball diameter, m
  T ball_clearance_m{};             ///< radial clearance of the ball in its socket, m (0: no path)
  T ball_length_m{};                ///< sealing length of the ball-socket clearance, m
  T valve_inner_land_inner_radius_m{};  ///< valve plate inner sealing land, inner radius, m
  T valve_inner_land_outer_radius_m{};  ///< valve plate inner sealing land, outer radius (kidney edge), m
  T valve_outer_land_inner_radius_m{};  ///< valve plate outer sealing land, inner radius (kidney edge), m
  T valve_outer_land_outer_radius_m{};  ///< valve plate outer sealing land, outer radius, m
  T valve_kidney_arc_rad{};         ///< arc of the high-pressure kidney (and its lands), rad
  T valve_gap_m{};                  ///< barrel to valve plate gap h_V, m (0: no path)
  T controller_flow_m3_s = T(0);    ///< compensator pilot consumption to case, m^3/s (constant)
  T bleed_orifice_diameter_m = T(0);  ///< controller bleed orifice diameter, m (0: none)
  T bleed_cd = detail::constant<T>(0.611L, "0.611");  ///< bleed orifice discharge coefficient
  T extra_conductance_m3 = T(0);    ///< user path, laminar: q = k dp / mu, k in m^3
  T extra_orifice_cda_m2 = T(0);    ///< user path, orifice: q = (Cd A) sqrt(2 dp / rho), m^2
  T stated_displacement_m3_rev = scalar_traits<T>::nan();  ///< maker's stated maximum displacement (NaN: none)
};

/// Geometric maximum displacement of a swashplate axial piston pump.
///
/// \f[ V_{max} = z\,\frac{\pi d^2}{4}\; 2 R \tan\beta_{max} \f]
///
/// @param p the pump description
/// @return V_max in m^3/rev; status::domain for a non-positive diameter, radius or angle, an
///         angle of pi/4 or more, or fewer than 3 pistons.
/// @par Source
/// Kinematics of the swashplate pump: stroke 2 R tan(beta) per revolution (e.g. Ivantysyn &
/// Ivantysynova, Hydrostatic Pumps and Motors, 2001, ch. 5; derivation standard).
template <class T>
inline result<T> piston_pump_displacement(const piston_pump<T>& p) {
  using std::tan;
  if (!detail::all_finite(p.piston_diameter_m, p.pitch_radius_m, p.max_swash_angle_rad))
    return detail::fail<T>(status::nonfinite);
  if (p.pistons < 3 || !(p.piston_diameter_m > T(0)) || !(p.pitch_radius_m > T(0)) ||
      !(p.max_swash_angle_rad > T(0)) || !(p.max_swash_angle_rad < detail::pi<T>() / 4))
    return detail::fail<T>(status::domain);
  const T area = detail::pi<T>() * p.piston_diameter_m * p.piston_diameter_m / 4;
  return {T(p.pistons) * area * 2 * p.pitch_radius_m * tan(p.max_swash_angle_rad), status::ok};
}

/// What validate_piston_pump() found.
template <class T>
struct [[nodiscard]] piston_pump_check {
  T displacement_m3_rev;   ///< geometric maximum displacement, m^3/rev
  T displacement_mismatch; ///< geometric / stated - 1 (NaN without a stated value)
  pumploss::status st;     ///< ok; domain / nonfinite for an impossible description;
  /// @return true when the status is exactly ok.
  bool ok() const noexcept { return st == pumploss::status::ok; }
  /// @return true when the results are usable (ok or a report such as regime).
  bool usable() const noexcept { return pumploss::is_usable(st); }
                           ///< implausible when geometric and stated displacement differ by more than 5 %
};

/// Validate a pump description: every dimension finite and in its domain, the bores fit on the
/// pitch circle, the slipper pocket inside its land, the valve plate lands ordered, and the
/// geometric displacement against the stated one.
///
/// Bores fit when the chord between neighbouring bore centres exceeds the bore diameter:
/// \f$ 2R\sin(\pi/z) > d + 2h_K \f$.
/// @param p the description
/// @return the check
/// @par Source
/// Geometry; the 5 % displacement tolerance is our own choice (no source).
template <class T>
inline piston_pump_check<T> validate_piston_pump(const piston_pump<T>& p) {
  using std::sin;
  using std::fabs;
  const T nan = scalar_traits<T>::nan();
  piston_pump_check<T> out{nan, nan, status::ok};
  const auto v = piston_pump_displacement(p);
  if (is_error(v.st)) {
    out.st = v.st;
    return out;
  }
  if (!detail::all_finite(p.bore_clearance_m, p.piston_eccentricity, p.engaged_length_min_m, p.high_pressure_share,
                          p.slipper_pocket_radius_m, p.slipper_outer_radius_m, p.slipper_gap_m,
                          p.slipper_feed_diameter_m, p.slipper_feed_length_m, p.ball_diameter_m,
                          p.ball_clearance_m, p.ball_length_m, p.valve_inner_land_inner_radius_m,
                          p.valve_inner_land_outer_radius_m, p.valve_outer_land_inner_radius_m,
                          p.valve_outer_land_outer_radius_m, p.valve_kidney_arc_rad, p.valve_gap_m,
                          p.controller_flow_m3_s, p.bleed_orifice_diameter_m, p.bleed_cd,
                          p.extra_conductance_m3, p.extra_orifice_cda_m2)) {
    out.st = status::nonfinite;
    return out;
  }
  auto bad = [&]() {
    out.st = status::domain;
    return out;
  };
  // piston in bore
  if (!(p.bore_clearance_m > T(0)) || !(p.engaged_length_min_m > T(0)) || !(p.piston_eccentricity >= T(0)) ||
      !(p.piston_eccentricity <= T(1)) || !(p.high_pressure_share > T(0)) || !(p.high_pressure_share <= T(1)))
    return bad();
  if (!(2 * p.pitch_radius_m * sin(detail::pi<T>() / T(p.pistons)) > p.piston_diameter_m + 2 * p.bore_clearance_m))
    return bad();  // more pistons than fit the pitch circle
  // slipper pad with its feed bore
  if (p.slipper_gap_m < T(0)) return bad();
  if (p.slipper_gap_m > T(0) &&
      (!(p.slipper_pocket_radius_m > T(0)) || !(p.slipper_outer_radius_m > p.slipper_pocket_radius_m) ||
       !(p.slipper_feed_diameter_m > T(0)) || !(p.slipper_feed_length_m > T(0))))
    return bad();
  // ball socket
  if (p.ball_clearance_m < T(0)) return bad();
  if (p.ball_clearance_m > T(0) && (!(p.ball_diameter_m > T(0)) || !(p.ball_length_m > T(0)))) return bad();
  // valve plate lands: inner land inside the kidney, outer land outside it
  if (p.valve_gap_m < T(0)) return bad();
  if (p.valve_gap_m > T(0) &&
      (!(p.valve_inner_land_inner_radius_m > T(0)) ||
       !(p.valve_inner_land_outer_radius_m > p.valve_inner_land_inner_radius_m) ||
       !(p.valve_outer_land_inner_radius_m > p.valve_inner_land_outer_radius_m) ||
       !(p.valve_outer_land_outer_radius_m > p.valve_outer_land_inner_radius_m) ||
       !(p.valve_kidney_arc_rad > T(0)) || !(p.valve_kidney_arc_rad <= 2 * detail::pi<T>())))
    return bad();
  // controller and user paths
  if (p.controller_flow_m3_s < T(0) || p.bleed_orifice_diameter_m < T(0) || !(p.bleed_cd > T(0)) ||
      p.bleed_cd > T(1) || p.extra_conductance_m3 < T(0) || p.extra_orifice_cda_m2 < T(0))
    return bad();
  out.displacement_m3_rev = v.value;
  if (detail::finite(p.stated_displacement_m3_rev)) {
    if (!(p.stated_displacement_m3_rev > T(0))) return bad();
    out.displacement_mismatch = v.value / p.stated_displacement_m3_rev - T(1);
    if (fabs(out.displacement_mismatch) > detail::constant<T>(0.05L, "0.05")) out.st = status::implausible;
  }
  return out;
}

/// Effective engaged length of a piston over the delivery stroke, for a flow proportional to
/// 1/L: \f$ L(\varphi) = L_{min} + R\tan\beta\,(1 - \cos\varphi) \f$ averaged as
/// \f$ \overline{1/L} = 1/\sqrt{L_{min} (L_{min} + 2R\tan\beta)} \f$ over \f$ 0..\pi \f$.
/// @param p the description
/// @param displacement_fraction swash angle as a share of the maximum displacement, 0..1
/// @return the effective length (geometric mean of the shortest and longest engagement), m
/// @par Source
/// Exact mean of 1/(a - b cos phi) over 0..pi, which is 1/sqrt(a^2 - b^2).
template <class T>
inline T piston_effective_length(const piston_pump<T>& p, T displacement_fraction) {
  using std::sqrt;
  using std::tan;
  const T stroke = 2 * p.pitch_radius_m * tan(p.max_swash_angle_rad) * displacement_fraction;
  return sqrt(p.engaged_length_min_m * (p.engaged_length_min_m + stroke));
}


/// The leakage paths of the budget.
enum class leakage_path : int {
  piston_bore = 0,    ///< pistons in their bores (share on the high-pressure side)
  slipper = 1,        ///< slipper pads fed through the pistons
  ball_socket = 2,    ///< piston balls in their sockets
  valve_inner = 3,    ///< valve plate inner sealing land of the high-pressure kidney
  valve_outer = 4,    ///< valve plate outer sealing land of the high-pressure kidney
  controller = 5,     ///< compensator pilot consumption
  bleed = 6,          ///< controller bleed orifice
  extra_laminar = 7,  ///< user path, laminar conductance
  extra_orifice = 8   ///< user path, orifice
};
/// Number of leakage paths.
inline constexpr int leakage_path_count = 9;

/// Short name of a path ("piston-bore", "slipper", ...), "unknown" for another number.
/// @param path the path
/// @return the name (static storage)
PUMPLOSS_CXX_API const char* leakage_path_name(leakage_path path) noexcept;

/// The gaps whose size the budget's sensitivity and diagnosis speak of.
enum class pump_gap : int {
  bore = 0,     ///< piston-bore radial clearance
  slipper = 1,  ///< slipper land gap
  ball = 2,     ///< ball-socket clearance
  valve = 3     ///< barrel-valve plate gap
};
/// Number of gaps.
inline constexpr int pump_gap_count = 4;

/// The operating point of a budget evaluation.
template <class T>
struct pump_operating_point {
  T outlet_pa;              ///< outlet (high-pressure) gauge pressure, Pa
  T case_pa;                ///< case gauge pressure, Pa
  T speed_rev_s;            ///< shaft speed, rev/s (> 0)
  T displacement_fraction;  ///< swash setting as a share of maximum displacement, 0..1
  T t_k;                    ///< oil temperature in the clearances, K
};

/// The leakage budget at one operating point.
template <class T>
struct [[nodiscard]] leakage_budget {
  T flow_m3_s[leakage_path_count];  ///< flow of each path to the case, m^3/s
  T share[leakage_path_count];      ///< each path's share of the total (NaN when the total is 0)
  T total_m3_s;                     ///< predicted case drain flow, m^3/s
  T drain_fraction;                 ///< total / (V_max n)
  T mu_pa_s;                        ///< dynamic viscosity used, Pa s
  T rho_kg_m3;                      ///< density used, kg/m^3
  T slipper_pocket_pa;              ///< slipper pocket pressure, Pa (NaN without slipper path)
  T max_gap_reynolds;               ///< largest gap Reynolds number of the laminar paths
  pumploss::status st;              ///< status (regime when a laminar path is not laminar)
  /// @return true when the status is exactly ok.
  bool ok() const noexcept { return st == pumploss::status::ok; }
  /// @return true when the results are usable (ok or a report such as regime).
  bool usable() const noexcept { return pumploss::is_usable(st); }
};

namespace detail {
template <class T>
inline leakage_budget<T> budget_fail(status s) {
  leakage_budget<T> b{};
  const T nan = scalar_traits<T>::nan();
  for (int i = 0; i < leakage_path_count; ++i) b.flow_m3_s[i] = b.share[i] = nan;
  b.total_m3_s = b.drain_fraction = b.mu_pa_s = b.rho_kg_m3 = b.slipper_pocket_pa = b.max_gap_reynolds = nan;
  b.st = s;
  return b;
}
}  // namespace detail

/// Leakage budget of a piston pump: every path's flow to the case at one operating point.
///
/// With \f$\Delta p = p_{out} - p_{case}\f$, \f$z_{hp} = z \cdot s_{hp}\f$ pistons on the
/// high-pressure side and the oil's viscosity \f$\mu(T)\f$ at case pressure:
/// - piston-bore: \f$ z_{hp}\, q_{annulus}(\Delta p, \mu, d + 2h_K, d, L_{eff}, \varepsilon) \f$,
///   \f$ L_{eff} = \sqrt{L_{min}(L_{min} + 2R\tan\beta_{max}\,x)} \f$ (piston_effective_length());
/// - slipper: \f$ z_{hp}\, q_{pad}\f$ of a hydrostatic pad fed through the feed capillary
///   (gap_pad_capillary());
/// - ball socket: \f$ z_{hp}\, q_{annulus}(\Delta p, \mu, d_b + 2c_b, d_b, l_b, 0) \f$;
/// - valve plate lands: \f$ \varphi h_V^3 \Delta p / (12 \mu \ln(r_o/r_i)) \f$ for the inner and the
///   outer land (gap_radial_sector_flow());
/// - controller: its constant consumption; bleed orifice
///   \f$ C_d (\pi d^2/4) \sqrt{2\Delta p/\rho} \f$; user paths \f$ k\Delta p/\mu \f$ and
///   \f$ (C_dA)\sqrt{2\Delta p/\rho} \f$.
///
/// @param p the pump (validated with validate_piston_pump())
/// @param o the oil (viscosity by ASTM D341, density at case pressure)
/// @param op the operating point
/// @return the budget; status::regime when a gap Reynolds number exceeds 2000 or a
///         narrow-gap assumption fails; errors as validate_piston_pump() and for a negative
///         pressure difference, a displacement fraction outside [0, 1] or a non-positive speed.
/// @par Validity
/// Laminar, isothermal clearance flow with one viscosity for all gaps (the oil at the given
/// temperature and case pressure: a conservative, high estimate where viscosity rises with
/// pressure); parallel paths, each from the high-pressure side straight to the case. The drag
/// flows of the delivery and suction strokes cancel over a revolution and are not included.
/// @par Accuracy
/// Each path as its gap model (1e-12 relative or better); the sum within a few ulp.
/// @par Source
/// Gap and orifice models of gap.hpp and orifice.hpp (docs/pages/theory_gap.md); the path list follows
/// the usual breakdown of swashplate pump leakage (e.g. Ivantysyn & Ivantysynova, Hydrostatic
/// Pumps and Motors, 2001, ch. 5 (from memory)).
template <class T>
inline leakage_budget<T> piston_pump_budget(const piston_pump<T>& p, const oil<T>& o,
                                            const pump_operating_point<T>& op) {
  using std::sqrt;
  const auto check = validate_piston_pump(p);
  if (is_error(check.st)) return detail::budget_fail<T>(check.st);
  if (!detail::all_finite(op.outlet_pa, op.case_pa, op.speed_rev_s, op.displacement_fraction, op.t_k))
    return detail::budget_fail<T>(status::nonfinite);
  const T dp = op.outlet_pa - op.case_pa;
  if (!(dp >= T(0)) || !(op.speed_rev_s > T(0)) || !(op.displacement_fraction >= T(0)) ||
      !(op.displacement_fraction <= T(1)))
    return detail::budget_fail<T>(status::domain);
  const auto mu = oil_dynamic_viscosity(o, op.t_k, T(0));
  if (is_error(mu.st)) return detail::budget_fail<T>(mu.st);
  const auto rho = oil_density_at(o, op.t_k, op.case_pa);
  if (is_error(rho.st)) return detail::budget_fail<T>(rho.st);

  leakage_budget<T> b{};
  status st = worst(mu.st, rho.st);
  b.mu_pa_s = mu.value;
  b.rho_kg_m3 = rho.value;
  b.slipper_pocket_pa = scalar_traits<T>::nan();
  b.max_gap_reynolds = T(0);
  for (int i = 0; i < leakage_path_count; ++i) b.flow_m3_s[i] = T(0);
  const T zhp = T(p.pistons) * p.high_pressure_share;
  const T pi = detail::pi<T>();
  bool failed = false;
  auto take = [&](leakage_path path, const result<T>& q, T width_m) {
    if (is_error(q.st)) {
      failed = true;
      st = worst(st, q.st);
      return;
    }
    st = worst(st, q.st);
    b.flow_m3_s[static_cast<int>(path)] = q.value;
    if (width_m > T(0) && q.value > T(0)) {
      const T re = T(2) * b.rho_kg_m3 * q.value / (b.mu_pa_s * width_m);  // 2 rho q / (mu b), D_h = 2h
      if (re > b.max_gap_reynolds) b.max_gap_reynolds = re;
    }
  };
  const T d = p.piston_diameter_m;
  // piston in bore
  {
    const T len = piston_effective_length(p, op.displacement_fraction);
    const auto q1 = gap_annulus_flow(dp, b.mu_pa_s, d + 2 * p.bore_clearance_m, d, len, p.piston_eccentricity);
    take(leakage_path::piston_bore, result<T>{zhp * q1.value, q1.st}, pi * (d + p.bore_clearance_m));
  }
  // slipper pad fed through the piston
  if (p.slipper_gap_m > T(0) && dp > T(0)) {
    const auto pad = gap_pad_capillary(dp, b.mu_pa_s, p.slipper_feed_diameter_m, p.slipper_feed_length_m,
                                       p.slipper_pocket_radius_m, p.slipper_outer_radius_m, p.slipper_gap_m, d);
    b.slipper_pocket_pa = pad.pocket_pressure_pa;
    take(leakage_path::slipper, result<T>{zhp * pad.q_m3_s, pad.st}, 2 * pi * p.slipper_pocket_radius_m);
  }
  // ball in socket
  if (p.ball_clearance_m > T(0)) {
    const auto q1 = gap_annulus_flow(dp, b.mu_pa_s, p.ball_diameter_m + 2 * p.ball_clearance_m, p.ball_diameter_m,
                                     p.ball_length_m, T(0));
    take(leakage_path::ball_socket, result<T>{zhp * q1.value, q1.st}, pi * (p.ball_diameter_m + p.ball_clearance_m));
  }
  // valve plate sealing lands of the high-pressure kidney
  if (p.valve_gap_m > T(0)) {
    take(leakage_path::valve_inner,
         gap_radial_sector_flow(dp, b.mu_pa_s, p.valve_inner_land_inner_radius_m, p.valve_inner_land_outer_radius_m,
                                p.valve_gap_m, p.valve_kidney_arc_rad),
         p.valve_kidney_arc_rad * p.valve_inner_land_inner_radius_m);
    take(leakage_path::valve_outer,
         gap_radial_sector_flow(dp, b.mu_pa_s, p.valve_outer_land_inner_radius_m, p.valve_outer_land_outer_radius_m,
                                p.valve_gap_m, p.valve_kidney_arc_rad),
         p.valve_kidney_arc_rad * p.valve_outer_land_inner_radius_m);
  }
  // controller, bleed and user paths
  b.flow_m3_s[static_cast<int>(leakage_path::controller)] = dp > T(0) ? p.controller_flow_m3_s : T(0);
  if (p.bleed_orifice_diameter_m > T(0)) {
    take(leakage_path::bleed, orifice_flow(dp, b.rho_kg_m3, p.bleed_orifice_diameter_m, p.bleed_cd), T(0));
  }
  b.flow_m3_s[static_cast<int>(leakage_path::extra_laminar)] = p.extra_conductance_m3 * dp / b.mu_pa_s;
  if (p.extra_orifice_cda_m2 > T(0)) {
    take(leakage_path::extra_orifice, orifice_flow_cda(dp, b.rho_kg_m3, p.extra_orifice_cda_m2), T(0));
  }
  if (failed) return detail::budget_fail<T>(st);
  if (b.max_gap_reynolds > T(2000)) st = worst(st, status::regime);
  b.total_m3_s = T(0);
  for (int i = 0; i < leakage_path_count; ++i) b.total_m3_s += b.flow_m3_s[i];
  for (int i = 0; i < leakage_path_count; ++i)
    b.share[i] = b.total_m3_s > T(0) ? b.flow_m3_s[i] / b.total_m3_s : scalar_traits<T>::nan();
  b.drain_fraction = b.total_m3_s / (check.displacement_m3_rev * op.speed_rev_s);
  b.st = st;
  return b;
}

/// A pump description converted to another scalar type (for dual-number sensitivities).
/// @param p the description in T
/// @return the same description in U
template <class U, class T>
inline piston_pump<U> piston_pump_cast(const piston_pump<T>& p) {
  piston_pump<U> q;
  q.pistons = p.pistons;
  q.piston_diameter_m = U(p.piston_diameter_m);
  q.bore_clearance_m = U(p.bore_clearance_m);
  q.piston_eccentricity = U(p.piston_eccentricity);
  q.engaged_length_min_m = U(p.engaged_length_min_m);
  q.pitch_radius_m = U(p.pitch_radius_m);
  q.max_swash_angle_rad = U(p.max_swash_angle_rad);
  q.high_pressure_share = U(p.high_pressure_share);
  q.slipper_pocket_radius_m = U(p.slipper_pocket_radius_m);
  q.slipper_outer_radius_m = U(p.slipper_outer_radius_m);
  q.slipper_gap_m = U(p.slipper_gap_m);
  q.slipper_feed_diameter_m = U(p.slipper_feed_diameter_m);
  q.slipper_feed_length_m = U(p.slipper_feed_length_m);
  q.ball_diameter_m = U(p.ball_diameter_m);
  q.ball_clearance_m = U(p.ball_clearance_m);
  q.ball_length_m = U(p.ball_length_m);
  q.valve_inner_land_inner_radius_m = U(p.valve_inner_land_inner_radius_m);
  q.valve_inner_land_outer_radius_m = U(p.valve_inner_land_outer_radius_m);
  q.valve_outer_land_inner_radius_m = U(p.valve_outer_land_inner_radius_m);
  q.valve_outer_land_outer_radius_m = U(p.valve_outer_land_outer_radius_m);
  q.valve_kidney_arc_rad = U(p.valve_kidney_arc_rad);
  q.valve_gap_m = U(p.valve_gap_m);
  q.controller_flow_m3_s = U(p.controller_flow_m3_s);
  q.bleed_orifice_diameter_m = U(p.bleed_orifice_diameter_m);
  q.bleed_cd = U(p.bleed_cd);
  q.extra_conductance_m3 = U(p.extra_conductance_m3);
  q.extra_orifice_cda_m2 = U(p.extra_orifice_cda_m2);
  q.stated_displacement_m3_rev = U(p.stated_displacement_m3_rev);
  return q;
}

/// Sensitivity of the predicted drain flow to each gap height.
template <class T>
struct [[nodiscard]] budget_sensitivity {
  T d_total_d_gap[pump_gap_count];  ///< dQ_total/dh for each pump_gap, m^3/s per m (0 when the path is absent)
  T elasticity[pump_gap_count];     ///< (h / Q_total) dQ_total/dh: the share-weighted power of h (3 for a pure laminar path)
  pumploss::status st;              ///< status of the budget
  /// @return true when the status is exactly ok.
  bool ok() const noexcept { return st == pumploss::status::ok; }
  /// @return true when the results are usable (ok or a report such as regime).
  bool usable() const noexcept { return pumploss::is_usable(st); }
};

/// Sensitivity of the budget's total to the four gap heights, by forward-mode dual numbers
/// through the same budget template (exact derivatives, no finite differences).
/// @param p the pump
/// @param o the oil
/// @param op the operating point
/// @return the sensitivities; statuses as piston_pump_budget().
/// @par Source
/// Differentiation of piston_pump_budget().
template <class T>
inline budget_sensitivity<T> piston_pump_sensitivity(const piston_pump<T>& p, const oil<T>& o,
                                                     const pump_operating_point<T>& op) {
  using D = dual<T, pump_gap_count>;
  auto pd = piston_pump_cast<D>(p);
  pd.bore_clearance_m = D::variable(p.bore_clearance_m, 0);
  pd.slipper_gap_m = D::variable(p.slipper_gap_m, 1);
  pd.ball_clearance_m = D::variable(p.ball_clearance_m, 2);
  pd.valve_gap_m = D::variable(p.valve_gap_m, 3);
  const oil<D> od{{D(o.viscosity.a), D(o.viscosity.b)}, D(o.rho_ref_kg_m3), D(o.t_ref_k), D(o.alpha_per_k),
                  D(o.bulk_modulus_pa), D(o.cp_j_kg_k), D(o.barus_per_pa)};
  const pump_operating_point<D> opd{D(op.outlet_pa), D(op.case_pa), D(op.speed_rev_s), D(op.displacement_fraction),
                                    D(op.t_k)};
  const auto b = piston_pump_budget(pd, od, opd);
  budget_sensitivity<T> s{};
  s.st = b.st;
  const T gaps[pump_gap_count] = {p.bore_clearance_m, p.slipper_gap_m, p.ball_clearance_m, p.valve_gap_m};
  for (int i = 0; i < pump_gap_count; ++i) {
    if (is_error(b.st)) {
      s.d_total_d_gap[i] = s.elasticity[i] = scalar_traits<T>::nan();
      continue;
    }
    s.d_total_d_gap[i] = b.total_m3_s.d[i];
    s.elasticity[i] = b.total_m3_s.val > T(0) ? gaps[i] * b.total_m3_s.d[i] / b.total_m3_s.val : T(0);
  }
  return s;
}


/// Path groups: the unit of calibration (one scale factor each).
enum class path_group : int {
  piston = 0,       ///< pistons in their bores
  slipper = 1,      ///< slipper pads and ball sockets (the slipper assembly)
  valve_plate = 2,  ///< valve plate sealing lands
  controller = 3,   ///< controller consumption and bleed orifice
  extra = 4         ///< user paths
};
/// Number of path groups.
inline constexpr int path_group_count = 5;

/// The group a path belongs to.
/// @param path the path
/// @return its group
constexpr path_group group_of(leakage_path path) noexcept {
  switch (path) {
    case leakage_path::piston_bore: return path_group::piston;
    case leakage_path::slipper:
    case leakage_path::ball_socket: return path_group::slipper;
    case leakage_path::valve_inner:
    case leakage_path::valve_outer: return path_group::valve_plate;
    case leakage_path::controller:
    case leakage_path::bleed: return path_group::controller;
    case leakage_path::extra_laminar:
    case leakage_path::extra_orifice: return path_group::extra;
  }
  return path_group::extra;
}

/// Short name of a group ("piston", "slipper", "valve-plate", "controller", "extra").
/// @param group the group
/// @return the name (static storage), "unknown" for another number
PUMPLOSS_CXX_API const char* path_group_name(path_group group) noexcept;

/// The pump with the gaps selected by `mask` (bit i for pump_gap i) multiplied by `factor`.
/// @param p the pump
/// @param mask bit set of pump_gap values
/// @param factor the factor (> 0)
/// @return the modified description
template <class T>
inline piston_pump<T> scale_gaps(piston_pump<T> p, unsigned mask, T factor) {
  if (mask & 1u) p.bore_clearance_m *= factor;
  if (mask & 2u) p.slipper_gap_m *= factor;
  if (mask & 4u) p.ball_clearance_m *= factor;
  if (mask & 8u) p.valve_gap_m *= factor;
  return p;
}

/// One measured case drain flow with its operating point (calibration input).
struct drain_measurement {
  double drain_m3_s;             ///< measured case drain flow, m^3/s
  double outlet_pa;              ///< outlet gauge pressure, Pa
  double case_pa;                ///< case gauge pressure, Pa
  double speed_rev_s;            ///< shaft speed, rev/s
  double displacement_fraction;  ///< displacement setting, 0..1
  double t_k;                    ///< oil temperature, K
};

/// Result of calibrate_piston_pump().
struct [[nodiscard]] pump_calibration {
  double scale[path_group_count];        ///< fitted factor on each group's flow (1: as described; NaN: group absent)
  double std_error[path_group_count];    ///< standard error of each factor (unconstrained fit of the same columns)
  double gap_growth[path_group_count];   ///< equivalent gap change h_fit/h - 1 of the group (NaN: no gap or not reachable)
  unsigned confused_with[path_group_count];  ///< bit j set: the data cannot tell group i from group j
  double rms_residual_m3_s;              ///< root-mean-square residual of the fit, m^3/s
  double condition_number;               ///< condition number of the scaled design (distinct groups)
  std::size_t points;                    ///< measurements used
  pumploss::status st;                   ///< status of the calibration
  /// @return true when the status is exactly ok.
  bool ok() const noexcept { return st == pumploss::status::ok; }
  /// @return true when the results are usable (ok or a report such as regime).
  bool usable() const noexcept { return pumploss::is_usable(st); }
};

/// Calibrate the budget to measured drain flows: one non-negative scale factor per path group
/// by constrained least squares, \f$ \min_{s \ge 0} \sum_i (\sum_g s_g q_g(x_i) - q_i)^2 \f$.
///
/// Groups whose predicted flows are proportional over the measurements (for example the slipper
/// and the valve plate: both laminar, both \f$\propto \Delta p/\mu\f$) cannot be told apart by
/// any such data; they are merged, given one common factor, and reported in confused_with.
/// Measurements at several displacement settings separate the pistons (whose engaged length
/// changes with stroke) from the other laminar paths; the controller's constant and the
/// orifice paths separate by their pressure dependence. Each factor is then translated into the
/// gap change of its group that would produce it (at the highest-pressure measurement).
///
/// @param p the pump
/// @param o the oil
/// @param m the measurements
/// @param n number of measurements (more than the number of distinct groups)
/// @return the calibration; status::insufficient_data for too few points, status::misuse for a
///         null array, errors of the budget for a bad measurement, status::ill_conditioned
///         when the distinct groups are nearly collinear.
/// @par Source
/// Lawson and Hanson, Solving Least Squares Problems (1974), ch. 23 (NNLS); the grouping rule
/// is ours.
PUMPLOSS_CXX_API pump_calibration calibrate_piston_pump(const piston_pump<double>& p, const oil<double>& o,
                                       const drain_measurement* m, std::size_t n) noexcept;

/// The change of one gap alone that would explain a measured drain flow: the factor k on that
/// gap for which the budget's total equals the measurement (other gaps as described).
/// @param p the pump
/// @param o the oil
/// @param op the operating point of the measurement
/// @param gap the gap to change
/// @param measured_drain_m3_s measured case drain flow, m^3/s (> 0)
/// @return k - 1 (0.2: the gap must be 20 % larger); status::out_of_validity (NaN) when no
///         change of that gap alone can explain the measurement (the other paths already
///         exceed it, or the gap's path cannot carry enough), status::domain when the pump has
///         no such path.
/// @par Source
/// Monotone one-dimensional root of the budget in log k on [ln(1/20), ln 20], found by Brent's
/// method (detail/roots.hpp).
template <class T>
inline result<T> gap_growth_for_drain(const piston_pump<T>& p, const oil<T>& o, const pump_operating_point<T>& op,
                                      pump_gap gap, T measured_drain_m3_s) {
  using std::exp;
  using std::log;
  if (!detail::finite(measured_drain_m3_s)) return detail::fail<T>(status::nonfinite);
  if (!(measured_drain_m3_s > T(0))) return detail::fail<T>(status::domain);
  const int g = static_cast<int>(gap);
  if (g < 0 || g >= pump_gap_count) return detail::fail<T>(status::domain);
  const T gaps[pump_gap_count] = {p.bore_clearance_m, p.slipper_gap_m, p.ball_clearance_m, p.valve_gap_m};
  if (!(gaps[g] > T(0))) return detail::fail<T>(status::domain);
  const unsigned mask = 1u << g;
  auto total = [&](T k) { return piston_pump_budget(scale_gaps(p, mask, k), o, op); };
  const auto nominal = total(T(1));
  if (is_error(nominal.st)) return detail::fail<T>(nominal.st);
  // bracket in log k: the total rises monotonically with any gap
  T lo = -log(T(20)), hi = log(T(20));
  const auto blo = total(exp(lo));
  const auto bhi = total(exp(hi));
  if (is_error(blo.st) || is_error(bhi.st) || !(blo.total_m3_s <= measured_drain_m3_s) ||
      !(bhi.total_m3_s >= measured_drain_m3_s))
    return detail::fail<T>(status::out_of_validity);
  status st = nominal.st;
  auto f = [&](T x) {
    const auto b = total(exp(x));
    st = worst(st, b.st);
    return is_error(b.st) ? scalar_traits<T>::nan() : T(b.total_m3_s - measured_drain_m3_s);
  };
  const T tol = 4 * scalar_traits<T>::epsilon();
  const auto r = detail::brent(f, lo, hi, T(blo.total_m3_s - measured_drain_m3_s),
                               T(bhi.total_m3_s - measured_drain_m3_s), tol, tol, scalar_traits<T>::max_iterations);
  if (is_error(st)) return detail::fail<T>(st);
  if (r.st != status::ok) return detail::fail<T>(r.st);
  using std::expm1;
  return {expm1(r.x), st};
}

}  // namespace pumploss

#endif
