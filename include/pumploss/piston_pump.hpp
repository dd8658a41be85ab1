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
  T pivot_offset_m = T(0);          ///< swash-plate pivot line's distance e from the shaft axis, towards the
                                    ///< inner-dead-centre side, in the plane of the ball centres, m (0: on the axis)
  T dead_volume_m3 = T(0);          ///< chamber volume at inner dead centre at full displacement (bore floor,
                                    ///< barrel port), m^3
  T cross_port_conductance_m3 = T(0);      ///< laminar path high- to low-pressure kidney (valve-plate bridges,
                                           ///< silencing grooves), q = k dp / mu, m^3; never reaches the case
  T control_piston_conductance_m3 = T(0);  ///< laminar path of the control (stroking) piston clearance to the
                                           ///< case, q = k p_c / mu, m^3
  T control_pressure_pa = T(0);     ///< control-piston chamber gauge pressure while compensating, Pa
  T barrel_spring_force_n = T(0);   ///< hold-down spring force on the barrel, N
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
  // kinematics, controller and user paths
  if (!detail::all_finite(p.pivot_offset_m, p.dead_volume_m3, p.cross_port_conductance_m3,
                          p.control_piston_conductance_m3, p.control_pressure_pa, p.barrel_spring_force_n)) {
    out.st = status::nonfinite;
    return out;
  }
  {
    using std::fabs;
    using std::tan;
    const T tmax = tan(p.max_swash_angle_rad);
    const T area = detail::pi<T>() * p.piston_diameter_m * p.piston_diameter_m / 4;
    // |e| < R; the piston stays engaged at outer dead centre and the chamber volume stays
    // positive at every displacement (both are linear in tan(beta): check the two ends)
    if (!(fabs(p.pivot_offset_m) < p.pitch_radius_m) || p.dead_volume_m3 < T(0) ||
        !(p.engaged_length_min_m + (p.pitch_radius_m + p.pivot_offset_m) * tmax > T(0)) ||
        !(p.dead_volume_m3 + area * (p.pitch_radius_m - p.pivot_offset_m) * tmax >= T(0)))
      return bad();
  }
  if (p.cross_port_conductance_m3 < T(0) || p.control_piston_conductance_m3 < T(0) ||
      p.control_pressure_pa < T(0) || p.barrel_spring_force_n < T(0))
    return bad();
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

/// Swash-plate kinematics at one displacement setting (piston_pump_kinematics()).
template <class T>
struct [[nodiscard]] swash_kinematics {
  T tan_beta;            ///< tangent of the swash angle, x tan(beta_max)
  T stroke_m;            ///< piston stroke 2 R tan(beta), m
  T engaged_odc_m;       ///< engaged piston-bore length at outer dead centre (shortest), m
  T engaged_idc_m;       ///< engaged length at inner dead centre (longest), m
  T engaged_mid_m;       ///< engaged length at mid-stroke, m
  T effective_length_m;  ///< length that gives the mean annulus leakage over the delivery stroke, m
  T dead_volume_m3;      ///< chamber volume at inner dead centre, m^3
  pumploss::status st;   ///< ok; domain / nonfinite as validate_piston_pump() or for x outside [0, 1]
  /// @return true when the status is exactly ok.
  bool ok() const noexcept { return st == pumploss::status::ok; }
  /// @return true when the results are usable (ok or a report such as regime).
  bool usable() const noexcept { return pumploss::is_usable(st); }
};

/// Kinematics of a swash-plate pump whose plate tilts about a pivot line at distance e from the
/// shaft axis: engaged length, stroke and dead volume over the displacement fraction.
///
/// The ball centre of the piston at angle \f$\varphi\f$ from inner dead centre sits on the plane
/// \f$ z = (R\cos\varphi - e)\tan\beta \f$ (z: insertion into the bore), so with
/// \f$ \tan\beta = x \tan\beta_{max} \f$ and \f$ L_0 = L_{min} + (R + e)\tan\beta_{max} \f$
/// (\f$L_{min}\f$: engagement at outer dead centre at full displacement):
/// \f[ L(\varphi) = L_0 - e\tan\beta + R\tan\beta\cos\varphi,\quad
///     L_{ODC} = L_0 - (R + e)\tan\beta,\quad L_{IDC} = L_0 + (R - e)\tan\beta,\quad s = 2R\tan\beta \f]
/// \f[ L_{eff} = \Big(\frac{1}{\pi}\int_0^\pi \frac{d\varphi}{L(\varphi)}\Big)^{-1} = \sqrt{L_{ODC} L_{IDC}},\qquad
///     V_{dead} = V_{dead,max} + \frac{\pi d^2}{4}(R - e)(\tan\beta_{max} - \tan\beta) \f]
/// With the pivot on the shaft axis (e = 0, the usual design) the mid-stroke engagement stays
/// fixed and the pistons sit deeper as the stroke shrinks; at zero stroke (deadhead) every piston
/// stands at \f$ L_0 \f$.
///
/// @param p the pump (validated with validate_piston_pump())
/// @param displacement_fraction x = V / V_max, 0..1
/// @return the kinematics
/// @par Validity
/// Rigid parts, ball centres in one plane, bore axes parallel to the shaft (no barrel cone
/// angle); the displacement is proportional to tan(beta).
/// @par Accuracy
/// Closed forms; within a few ulp of the 50-digit evaluation (tests/piston_pump_test.cpp).
/// @par Source
/// Piston position \f$ R\tan\beta(1 - \cos\varphi) \f$ of the swash-plate pump: N. D. Manring,
/// Fluid Power Pumps and Motors, McGraw-Hill 2013, ch. on axial-piston kinematics; Ivantysyn &
/// Ivantysynova, Hydrostatic Pumps and Motors, 2001, sec. 5.1 (both from memory); the pivot
/// offset and the mean of 1/L (\f$\int_0^\pi d\varphi/(a + b\cos\varphi) = \pi/\sqrt{a^2 - b^2}\f$)
/// self-derived.
template <class T>
inline swash_kinematics<T> piston_pump_kinematics(const piston_pump<T>& p, T displacement_fraction) {
  using std::sqrt;
  using std::tan;
  const T nan = scalar_traits<T>::nan();
  swash_kinematics<T> k{nan, nan, nan, nan, nan, nan, nan, status::ok};
  const auto check = validate_piston_pump(p);
  if (is_error(check.st)) {
    k.st = check.st;
    return k;
  }
  if (!detail::finite(displacement_fraction)) {
    k.st = status::nonfinite;
    return k;
  }
  if (!(displacement_fraction >= T(0)) || !(displacement_fraction <= T(1))) {
    k.st = status::domain;
    return k;
  }
  const T tmax = tan(p.max_swash_angle_rad);
  const T t = displacement_fraction * tmax;
  const T r = p.pitch_radius_m, e = p.pivot_offset_m;
  const T l0 = p.engaged_length_min_m + (r + e) * tmax;
  k.tan_beta = t;
  k.stroke_m = 2 * r * t;
  k.engaged_odc_m = l0 - (r + e) * t;
  k.engaged_idc_m = l0 + (r - e) * t;
  k.engaged_mid_m = l0 - e * t;
  k.effective_length_m = sqrt(k.engaged_odc_m * k.engaged_idc_m);
  k.dead_volume_m3 = p.dead_volume_m3 + detail::pi<T>() * p.piston_diameter_m * p.piston_diameter_m / 4 * (r - e) * (tmax - t);
  return k;
}

/// Effective engaged length of a piston over the delivery stroke (piston_pump_kinematics()).
/// @param p the description
/// @param displacement_fraction displacement as a share of the maximum, 0..1
/// @return \f$ \sqrt{L_{ODC} L_{IDC}} \f$, m (NaN for a bad description or fraction)
/// @par Source
/// As piston_pump_kinematics().
template <class T>
inline T piston_effective_length(const piston_pump<T>& p, T displacement_fraction) {
  return piston_pump_kinematics(p, displacement_fraction).effective_length_m;
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
  extra_orifice = 8,  ///< user path, orifice
  control_piston = 9  ///< control (stroking) piston clearance, at control pressure (compensating)
};
/// Number of leakage paths.
inline constexpr int leakage_path_count = 10;

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

/// What the controller of a pressure-compensated pump is doing.
enum class controller_mode : int {
  on_stroke = 0,     ///< below the compensator setting: spool closed, control chamber vented to the case
  compensating = 1,  ///< at the setting, destroked to some displacement: the spool meters oil into the
                     ///< control chamber, which leaks through the control piston and the bleed orifice
  deadhead = 2       ///< compensating at zero displacement (no delivery: the standby state)
};
/// Number of controller modes.
inline constexpr int controller_mode_count = 3;

/// Short name of a mode ("on-stroke", "compensating", "deadhead"), "unknown" for another number.
/// @param mode the mode
/// @return the name (static storage)
PUMPLOSS_CXX_API const char* controller_mode_name(controller_mode mode) noexcept;

/// The operating point of a budget evaluation.
template <class T>
struct pump_operating_point {
  T outlet_pa;              ///< outlet (high-pressure) gauge pressure, Pa
  T case_pa;                ///< case gauge pressure, Pa
  T speed_rev_s;            ///< shaft speed, rev/s (> 0)
  T displacement_fraction;  ///< swash setting as a share of maximum displacement, 0..1 (taken as 0 at deadhead)
  T t_k;                    ///< oil temperature in the clearances (bulk), K
  controller_mode mode = controller_mode::on_stroke;  ///< what the controller is doing
  T inlet_pa = T(0);                  ///< inlet (low-pressure kidney) gauge pressure, Pa (compression, cross-port)
  T film_temperature_rise_k = T(0);   ///< film temperature above the bulk for the heated bound of the band, K (>= 0)
};

/// Bits of leakage_budget::warnings: force balance outside its design window.
enum budget_warning : unsigned {
  warn_slipper_overclamped = 1u,  ///< slipper balance below 0.90: the stated film cannot be held (thinner, contact)
  warn_slipper_lifts = 2u,        ///< slipper balance above 1.10: the slipper would lift (thicker film, more leakage)
  warn_slipper_no_film = 4u,      ///< the pocket pressure cannot carry the piston force at any film
  warn_barrel_lifts = 8u,         ///< barrel balance above 1.00: the valve-plate pressure field lifts the barrel
  warn_barrel_overclamped = 16u   ///< barrel balance below 0.85: heavily over-clamped (wear, heat)
};

/// Design windows of the balance ratios (common practice, no source; see theory_pump.md).
/// @{
inline constexpr double slipper_balance_min = 0.90;  ///< lower edge of the slipper balance window
inline constexpr double slipper_balance_max = 1.10;  ///< upper edge of the slipper balance window
inline constexpr double barrel_balance_min = 0.85;   ///< lower edge of the barrel balance window
inline constexpr double barrel_balance_max = 1.00;   ///< upper edge of the barrel balance window
/// @}

/// The leakage budget at one operating point.
template <class T>
struct [[nodiscard]] leakage_budget {
  T flow_m3_s[leakage_path_count];  ///< flow of each path to the case, m^3/s (isoviscous)
  T share[leakage_path_count];      ///< each path's share of the total (NaN when the total is 0)
  T total_m3_s;                     ///< predicted case drain flow, m^3/s (isoviscous bound of the band)
  T total_film_m3_s;                ///< the same with the film viscosity (heated, pressurised bound), m^3/s
  T drain_fraction;                 ///< total / (V_max n)
  T mu_pa_s;                        ///< isoviscous viscosity: bulk temperature, case pressure, Pa s
  T mu_film_pa_s;                   ///< film viscosity: pressure-viscosity over the film, film temperature, Pa s
  T rho_kg_m3;                      ///< density at the outlet (upstream of the orifice paths), kg/m^3
  T slipper_pocket_pa;              ///< slipper pocket pressure, Pa (NaN without slipper path)
  T max_gap_reynolds;               ///< largest gap Reynolds number of the laminar paths
  T engaged_length_m;               ///< effective piston engagement used (piston_pump_kinematics()), m
  T slipper_balance;                ///< hydrostatic slipper force / (piston force / cos beta) at the stated film (NaN: no slipper)
  T slipper_film_m;                 ///< film at which the slipper balance is 1, m (0: none; NaN: no slipper)
  T barrel_balance;                 ///< valve-plate separating force / barrel hold-down (NaN: no valve path)
  T metering_flow_m3_s;             ///< compensating: oil the spool meters into the control chamber, m^3/s
  unsigned warnings;                ///< budget_warning bits
  pumploss::status st;              ///< status (regime when a laminar path is not laminar; implausible
                                    ///< when a balance ratio leaves its design window)
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
  b.total_m3_s = b.total_film_m3_s = b.drain_fraction = b.mu_pa_s = b.mu_film_pa_s = b.rho_kg_m3 = nan;
  b.slipper_pocket_pa = b.max_gap_reynolds = b.engaged_length_m = nan;
  b.slipper_balance = b.slipper_film_m = b.barrel_balance = b.metering_flow_m3_s = nan;
  b.warnings = 0u;
  b.st = s;
  return b;
}
// Ratio mu_eff / mu(p_low) of a laminar path from p_low to p_low + dp under Barus,
// q ~ integral dp / mu(p) (Kirchhoff): a dp / (1 - exp(-a dp)).
template <class T>
inline T barus_film_factor(T a_dp) {
  using std::expm1;
  if (!(a_dp > T(1e-8))) return T(1) + a_dp / 2;
  return a_dp / -expm1(-a_dp);
}
// Laminar paths: their flow scales as 1/mu.
constexpr bool path_is_laminar(leakage_path path) noexcept {
  return path == leakage_path::piston_bore || path == leakage_path::slipper || path == leakage_path::ball_socket ||
         path == leakage_path::valve_inner || path == leakage_path::valve_outer ||
         path == leakage_path::extra_laminar || path == leakage_path::control_piston;
}
}  // namespace detail

/// Force balance of the slipper and of the barrel on the valve plate (every budget reports it).
template <class T>
struct [[nodiscard]] pump_balance {
  T slipper_balance;  ///< \f$ F_{hs} \cos\beta / (\Delta p A_K) \f$ at the stated film
  T slipper_film_m;   ///< film at which the slipper balance is 1 (capillary feed), m; 0 when none
  T barrel_balance;   ///< \f$ F_{sep} / F_{hold} \f$
  unsigned warnings;  ///< budget_warning bits
  pumploss::status st;  ///< ok; implausible when a ratio leaves its design window (warnings); nonfinite input
  /// @return true when the status is exactly ok.
  bool ok() const noexcept { return st == pumploss::status::ok; }
  /// @return true when the results are usable (ok or a report such as implausible).
  bool usable() const noexcept { return pumploss::is_usable(st); }
};

/// Balance ratios of a pump at one displacement (independent of pressure and viscosity: every
/// force is proportional to the pressure difference and the capillary and land resistances to
/// the viscosity).
///
/// Slipper, capillary-fed, pocket pressure \f$ p_r = \Delta p R_L/(R_L + R_c) \f$ at the stated
/// film h, effective area \f$ A_{eff} = \pi (r_o^2 - r_i^2) / (2\ln(r_o/r_i)) \f$ (pocket and land):
/// \f[ \kappa_S = \frac{p_r A_{eff}\cos\beta}{\Delta p\, \pi d^2/4},\qquad
///     h_{eq} = \sqrt[3]{\frac{6\ln(r_o/r_i)\,(1 - r)\, d_c^4}{128\, l_c\, r}},\quad
///     r = \frac{\pi d^2/4}{A_{eff}\cos\beta} \f]
/// (\f$h_{eq}\f$: film at which the pad carries the piston force; 0 when r >= 1).
/// Barrel: separating force of the kidney and its two sealing lands over the arc
/// \f$\varphi_k\f$ (linear-log pressure fall across each land, radii \f$r_1 < r_2 < r_3 < r_4\f$)
/// against the hold-down of the pressurised bores and the spring:
/// \f[ F_{sep} = \varphi_k \Delta p \Big[\frac{r_4^2 - r_3^2}{4\ln(r_4/r_3)} - \frac{r_2^2 - r_1^2}{4\ln(r_2/r_1)}\Big],\qquad
///     F_{hold} = z_{hp}\,\Delta p\,\frac{\pi d^2}{4} + F_{spring} \f]
/// Design windows (common practice, no source): slipper 0.90..1.10 (a slipper balanced at full
/// stroke sits 1/cos(beta) higher at zero stroke), barrel 0.85..1.00.
/// @param p the pump
/// @param tan_beta tangent of the swash angle
/// @param dp_pa pressure difference, Pa (>= 0; the spring's share vanishes as dp grows)
/// @return the ratios (NaN where the path is absent) and warnings; status implausible when a
///         warning is set, nonfinite (NaN ratios) for a non-finite tan_beta or dp_pa
/// @par Validity
/// Static, parallel films; the kidney's end regions and the barrel's tilting moment are left out.
/// @par Source
/// Slipper and valve-plate balance as in Ivantysyn & Ivantysynova, Hydrostatic Pumps and Motors,
/// 2001, ch. 6 and N. D. Manring, Fluid Power Pumps and Motors, 2013 (both from memory); the
/// land-force integral is gap_radial_land_force().
template <class T>
inline pump_balance<T> piston_pump_balance(const piston_pump<T>& p, T tan_beta, T dp_pa) {
  using std::cbrt;
  using std::log1p;
  using std::sqrt;
  const T nan = scalar_traits<T>::nan();
  pump_balance<T> r{nan, nan, nan, 0u, status::ok};
  if (!detail::all_finite(tan_beta, dp_pa)) {
    r.st = status::nonfinite;
    return r;
  }
  const T pi = detail::pi<T>();
  const T area = pi * p.piston_diameter_m * p.piston_diameter_m / 4;
  const T cos_beta = T(1) / sqrt(T(1) + tan_beta * tan_beta);
  if (p.slipper_gap_m > T(0)) {
    const T ri = p.slipper_pocket_radius_m, ro = p.slipper_outer_radius_m;
    const T ln = log1p((ro - ri) / ri);
    const T aeff = detail::pad_effective_area(ri, ro);
    const T d2 = p.slipper_feed_diameter_m * p.slipper_feed_diameter_m;
    // resistances per unit viscosity
    const T rl = T(6) * ln / (pi * p.slipper_gap_m * p.slipper_gap_m * p.slipper_gap_m);
    const T rc = T(128) * p.slipper_feed_length_m / (pi * d2 * d2);
    r.slipper_balance = rl / (rl + rc) * aeff * cos_beta / area;
    const T need = area / (aeff * cos_beta);
    r.slipper_film_m = need < T(1) ? cbrt(T(6) * ln * (T(1) - need) * d2 * d2 / (T(128) * p.slipper_feed_length_m * need)) : T(0);
    if (!(need < T(1))) r.warnings |= warn_slipper_no_film;
    if (r.slipper_balance < T(slipper_balance_min)) r.warnings |= warn_slipper_overclamped;
    if (r.slipper_balance > T(slipper_balance_max)) r.warnings |= warn_slipper_lifts;
  }
  if (p.valve_gap_m > T(0)) {
    const T one(1), zero(0);
    const auto inner = gap_radial_land_force(zero, one, p.valve_inner_land_inner_radius_m,
                                             p.valve_inner_land_outer_radius_m, p.valve_kidney_arc_rad);
    const auto outer = gap_radial_land_force(one, zero, p.valve_outer_land_inner_radius_m,
                                             p.valve_outer_land_outer_radius_m, p.valve_kidney_arc_rad);
    const T kidney = p.valve_kidney_arc_rad *
                     (p.valve_outer_land_inner_radius_m * p.valve_outer_land_inner_radius_m -
                      p.valve_inner_land_outer_radius_m * p.valve_inner_land_outer_radius_m) / 2;
    const T sep = inner.value + outer.value + kidney;  // per pascal
    const T zhp = T(p.pistons) * p.high_pressure_share;
    const T hold = zhp * area + (dp_pa > T(0) ? p.barrel_spring_force_n / dp_pa : T(0));
    r.barrel_balance = hold > T(0) ? sep / hold : nan;
    if (r.barrel_balance > T(barrel_balance_max)) r.warnings |= warn_barrel_lifts;
    if (r.barrel_balance < T(barrel_balance_min)) r.warnings |= warn_barrel_overclamped;
  }
  if (r.warnings != 0u) r.st = status::implausible;
  return r;
}

/// Leakage budget of a piston pump: every path's flow to the case at one operating point,
/// with the force balance and a viscosity band.
///
/// With \f$\Delta p = p_{out} - p_{case}\f$, \f$z_{hp} = z \cdot s_{hp}\f$ pistons on the
/// high-pressure side and the isoviscous \f$\mu\f$ (bulk temperature, case pressure):
/// - piston-bore: \f$ z_{hp}\, q_{annulus}(\Delta p, \mu, d + 2h_K, d, L_{eff}(x), \varepsilon) \f$ with
///   \f$ L_{eff} = \sqrt{L_{ODC} L_{IDC}} \f$ of piston_pump_kinematics() (zero stroke at deadhead);
/// - slipper: \f$ z_{hp}\, q_{pad}\f$ of a hydrostatic pad fed through the feed capillary
///   (gap_pad_capillary());
/// - ball socket: \f$ z_{hp}\, q_{annulus}(\Delta p, \mu, d_b + 2c_b, d_b, l_b, 0) \f$;
/// - valve plate lands: \f$ \varphi h_V^3 \Delta p / (12 \mu \ln(r_o/r_i)) \f$ for the inner and the
///   outer land (gap_radial_sector_flow());
/// - controller by mode: on stroke the spool's constant leakage only (control chamber vented);
///   compensating and deadhead also the control piston \f$ k_c\,p_c/\mu \f$ and the bleed orifice
///   \f$ C_d (\pi d^2/4) \sqrt{2 p_c/\rho(p_c)} \f$, both at the control pressure \f$p_c\f$ (the
///   spool meters their sum into the chamber: metering_flow_m3_s);
/// - user paths \f$ k\Delta p/\mu \f$ and \f$ (C_dA)\sqrt{2\Delta p/\rho(p_{out})} \f$.
/// Orifice paths take the density upstream (outlet or control chamber).
///
/// Viscosity band: the laminar paths again with the film viscosity
/// \f$ \mu_f = \mu(T + \Delta T_f, p_{case})\,\alpha\Delta p / (1 - e^{-\alpha\Delta p}) \f$, the
/// Barus law averaged over the film as the flow sees it (\f$ q \propto \int dp/\mu(p) \f$; within
/// 1.1 % of \f$ e^{\alpha\bar p} \f$ at the mean film pressure up to 250 bar for
/// \f$\alpha = 2\cdot 10^{-8}\f$/Pa) and the film temperature rise \f$\Delta T_f\f$:
/// total_film_m3_s. Pressure lowers, heating raises the leakage: the two totals bound it.
/// The force balance (piston_pump_balance()) comes with every budget; a ratio outside its design
/// window sets a warning bit and status::implausible.
///
/// @param p the pump (validated with validate_piston_pump())
/// @param o the oil (viscosity by ASTM D341 with Barus, density by oil_density_at())
/// @param op the operating point
/// @return the budget; status::regime when a gap Reynolds number exceeds 2000 or a
///         narrow-gap assumption fails; status::implausible for a balance ratio outside its
///         window; errors as validate_piston_pump() and for a negative pressure difference, a
///         displacement fraction outside [0, 1], a non-positive speed, an unknown mode or a
///         negative film temperature rise.
/// @par Validity
/// Laminar clearance flow, parallel paths, each from the high-pressure side straight to the case.
/// The drag flows of the delivery and suction strokes cancel over a revolution and are not
/// included. Losses that never reach the case: piston_pump_flow_loss().
/// @par Accuracy
/// Each path as its gap model (1e-12 relative or better); the sum within a few ulp.
/// @par Source
/// Gap and orifice models of gap.hpp and orifice.hpp (see @ref theory_gap); the path list follows
/// the usual breakdown of swashplate pump leakage (Ivantysyn & Ivantysynova, Hydrostatic Pumps
/// and Motors, 2001, ch. 5 (from memory)); kinematics piston_pump_kinematics().
template <class T>
inline leakage_budget<T> piston_pump_budget(const piston_pump<T>& p, const oil<T>& o,
                                            const pump_operating_point<T>& op) {
  using std::sqrt;
  const auto check = validate_piston_pump(p);
  if (is_error(check.st)) return detail::budget_fail<T>(check.st);
  if (!detail::all_finite(op.outlet_pa, op.case_pa, op.speed_rev_s, op.displacement_fraction, op.t_k, op.inlet_pa,
                          op.film_temperature_rise_k))
    return detail::budget_fail<T>(status::nonfinite);
  const int mode = static_cast<int>(op.mode);
  if (mode < 0 || mode >= controller_mode_count) return detail::budget_fail<T>(status::domain);
  const T dp = op.outlet_pa - op.case_pa;
  if (!(dp >= T(0)) || !(op.speed_rev_s > T(0)) || !(op.displacement_fraction >= T(0)) ||
      !(op.displacement_fraction <= T(1)) || !(op.film_temperature_rise_k >= T(0)))
    return detail::budget_fail<T>(status::domain);
  const bool compensating = op.mode != controller_mode::on_stroke;
  const T x = op.mode == controller_mode::deadhead ? T(0) : op.displacement_fraction;
  const auto kin = piston_pump_kinematics(p, x);
  if (is_error(kin.st)) return detail::budget_fail<T>(kin.st);
  const auto mu = oil_dynamic_viscosity(o, op.t_k, op.case_pa);
  if (is_error(mu.st)) return detail::budget_fail<T>(mu.st);
  const auto mu_hot = oil_dynamic_viscosity(o, op.t_k + op.film_temperature_rise_k, op.case_pa);
  if (is_error(mu_hot.st)) return detail::budget_fail<T>(mu_hot.st);
  const auto rho = oil_density_at(o, op.t_k, op.outlet_pa);
  if (is_error(rho.st)) return detail::budget_fail<T>(rho.st);

  leakage_budget<T> b = detail::budget_fail<T>(status::ok);
  status st = worst(worst(mu.st, mu_hot.st), rho.st);
  b.mu_pa_s = mu.value;
  b.mu_film_pa_s = mu_hot.value * detail::barus_film_factor(o.barus_per_pa * dp);
  b.rho_kg_m3 = rho.value;
  b.max_gap_reynolds = T(0);
  b.engaged_length_m = kin.effective_length_m;
  b.metering_flow_m3_s = T(0);
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
    const auto q1 = gap_annulus_flow(dp, b.mu_pa_s, d + 2 * p.bore_clearance_m, d, kin.effective_length_m,
                                     p.piston_eccentricity);
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
  // controller by mode: spool leakage always; control piston and bleed at control pressure
  // while compensating (the chamber is vented on stroke)
  b.flow_m3_s[static_cast<int>(leakage_path::controller)] = dp > T(0) ? p.controller_flow_m3_s : T(0);
  if (compensating && dp > T(0)) {
    const T pc = p.control_pressure_pa < dp ? p.control_pressure_pa : dp;  // the spool cannot exceed the outlet
    b.flow_m3_s[static_cast<int>(leakage_path::control_piston)] = p.control_piston_conductance_m3 * pc / b.mu_pa_s;
    if (p.bleed_orifice_diameter_m > T(0) && pc > T(0)) {
      const auto rho_c = oil_density_at(o, op.t_k, op.case_pa + pc);
      if (is_error(rho_c.st)) return detail::budget_fail<T>(rho_c.st);
      take(leakage_path::bleed, orifice_flow(pc, rho_c.value, p.bleed_orifice_diameter_m, p.bleed_cd), T(0));
    }
    b.metering_flow_m3_s = b.flow_m3_s[static_cast<int>(leakage_path::control_piston)] +
                           b.flow_m3_s[static_cast<int>(leakage_path::bleed)];
  }
  b.flow_m3_s[static_cast<int>(leakage_path::extra_laminar)] = p.extra_conductance_m3 * dp / b.mu_pa_s;
  if (p.extra_orifice_cda_m2 > T(0)) {
    take(leakage_path::extra_orifice, orifice_flow_cda(dp, b.rho_kg_m3, p.extra_orifice_cda_m2), T(0));
  }
  if (failed) return detail::budget_fail<T>(st);
  if (b.max_gap_reynolds > T(2000)) st = worst(st, status::regime);
  b.total_m3_s = T(0);
  b.total_film_m3_s = T(0);
  const T film_scale = b.mu_pa_s / b.mu_film_pa_s;
  for (int i = 0; i < leakage_path_count; ++i) {
    b.total_m3_s += b.flow_m3_s[i];
    b.total_film_m3_s += detail::path_is_laminar(static_cast<leakage_path>(i)) ? b.flow_m3_s[i] * film_scale
                                                                                : b.flow_m3_s[i];
  }
  for (int i = 0; i < leakage_path_count; ++i)
    b.share[i] = b.total_m3_s > T(0) ? b.flow_m3_s[i] / b.total_m3_s : scalar_traits<T>::nan();
  b.drain_fraction = b.total_m3_s / (check.displacement_m3_rev * op.speed_rev_s);
  const auto bal = piston_pump_balance(p, kin.tan_beta, dp);
  b.slipper_balance = bal.slipper_balance;
  b.slipper_film_m = bal.slipper_film_m;
  b.barrel_balance = bal.barrel_balance;
  b.warnings = bal.warnings;
  if (bal.warnings != 0u) st = worst(st, status::implausible);
  b.st = st;
  return b;
}

/// Flow losses of a piston pump that never reach the case, beside the drain budget.
template <class T>
struct [[nodiscard]] pump_flow_loss {
  T theoretical_m3_s;  ///< x V_max n, m^3/s
  T drain_m3_s;        ///< case drain (piston_pump_budget(), isoviscous), m^3/s
  T compression_m3_s;  ///< compression of the delivered oil (swept volume), m^3/s
  T dead_volume_m3_s;  ///< oil compressed in the dead volume and expanded back to the inlet, m^3/s
  T cross_port_m3_s;   ///< laminar leakage high- to low-pressure kidney, m^3/s
  T total_m3_s;        ///< the test stand's flow loss: theoretical minus outlet flow (at outlet pressure), m^3/s
  T delivered_m3_s;    ///< outlet flow at outlet pressure and the given temperature, m^3/s
  pumploss::status st; ///< status of the budget, or an error
  /// @return true when the status is exactly ok.
  bool ok() const noexcept { return st == pumploss::status::ok; }
  /// @return true when the results are usable (ok or a report such as regime).
  bool usable() const noexcept { return pumploss::is_usable(st); }
};

/// The test stand's flow loss split into the case drain and the losses that never reach the
/// case: compression of the delivered oil and of the dead volume, and cross-port leakage.
///
/// Per piston and revolution the chamber holds \f$ A s + V_{dead} \f$ of oil at inlet density
/// \f$\rho_s\f$ at outer dead centre; the mass delivered is
/// \f$ \rho_s (A s + V_{dead}) - \rho_h V_{dead} \f$ (the dead volume's oil expands back), so the
/// outlet flow at outlet density falls short of \f$ A s\f$ by \f$ (A s + V_{dead})(1 - \rho_s/\rho_h) \f$
/// (\f$\approx (A s + V_{dead})\,\Delta p/K\f$):
/// \f[ Q_{comp} = x V_{max} n\,(1 - \rho_s/\rho_h),\quad Q_{dead} = z n V_{dead}(x)\,(1 - \rho_s/\rho_h),\quad
///     Q_{cross} = k_x (p_{out} - p_{in})/\mu \f]
/// \f[ Q_{loss} = Q_{drain} + Q_{comp} + Q_{dead} + Q_{cross} \f]
/// @param p the pump
/// @param o the oil
/// @param op the operating point (inlet_pa for the low-pressure side)
/// @return the split; statuses as piston_pump_budget(); status::domain when the inlet pressure
///         exceeds the outlet pressure.
/// @par Validity
/// Steady, isothermal compression at the bulk temperature; the drain volume is counted at
/// outlet conditions; the leakage's own density change is left out (below 2 % of it).
/// @par Source
/// Mass balance of the displacement chamber (self-derived); compression loss of swash-plate pumps
/// as in Ivantysyn & Ivantysynova, Hydrostatic Pumps and Motors, 2001, ch. 4 (from memory).
template <class T>
inline pump_flow_loss<T> piston_pump_flow_loss(const piston_pump<T>& p, const oil<T>& o,
                                               const pump_operating_point<T>& op) {
  const T nan = scalar_traits<T>::nan();
  pump_flow_loss<T> r{nan, nan, nan, nan, nan, nan, nan, status::ok};
  const auto b = piston_pump_budget(p, o, op);
  if (is_error(b.st)) {
    r.st = b.st;
    return r;
  }
  if (!(op.inlet_pa <= op.outlet_pa)) {
    r.st = status::domain;
    return r;
  }
  const T x = op.mode == controller_mode::deadhead ? T(0) : op.displacement_fraction;
  const auto kin = piston_pump_kinematics(p, x);
  const auto rho_s = oil_density_at(o, op.t_k, op.inlet_pa);
  if (is_error(rho_s.st)) {
    r.st = rho_s.st;
    return r;
  }
  const T c = T(1) - rho_s.value / b.rho_kg_m3;
  const T vmax = piston_pump_displacement(p).value;
  r.theoretical_m3_s = x * vmax * op.speed_rev_s;
  r.drain_m3_s = b.total_m3_s;
  r.compression_m3_s = r.theoretical_m3_s * c;
  r.dead_volume_m3_s = T(p.pistons) * op.speed_rev_s * kin.dead_volume_m3 * c;
  r.cross_port_m3_s = p.cross_port_conductance_m3 * (op.outlet_pa - op.inlet_pa) / b.mu_pa_s;
  r.total_m3_s = r.drain_m3_s + r.compression_m3_s + r.dead_volume_m3_s + r.cross_port_m3_s;
  r.delivered_m3_s = r.theoretical_m3_s - r.total_m3_s;
  r.st = b.st;
  return r;
}

/// A pump description converted to another scalar type (for dual-number sensitivities): the
/// same description for the same type, else its value parts as constants (detail::scalar_as()).
/// @param p the description in T
/// @return the same description in U
template <class U, class T>
inline piston_pump<U> piston_pump_cast(const piston_pump<T>& p) {
  piston_pump<U> q;
  q.pistons = p.pistons;
  q.piston_diameter_m = detail::scalar_as<U>(p.piston_diameter_m);
  q.bore_clearance_m = detail::scalar_as<U>(p.bore_clearance_m);
  q.piston_eccentricity = detail::scalar_as<U>(p.piston_eccentricity);
  q.engaged_length_min_m = detail::scalar_as<U>(p.engaged_length_min_m);
  q.pitch_radius_m = detail::scalar_as<U>(p.pitch_radius_m);
  q.max_swash_angle_rad = detail::scalar_as<U>(p.max_swash_angle_rad);
  q.high_pressure_share = detail::scalar_as<U>(p.high_pressure_share);
  q.slipper_pocket_radius_m = detail::scalar_as<U>(p.slipper_pocket_radius_m);
  q.slipper_outer_radius_m = detail::scalar_as<U>(p.slipper_outer_radius_m);
  q.slipper_gap_m = detail::scalar_as<U>(p.slipper_gap_m);
  q.slipper_feed_diameter_m = detail::scalar_as<U>(p.slipper_feed_diameter_m);
  q.slipper_feed_length_m = detail::scalar_as<U>(p.slipper_feed_length_m);
  q.ball_diameter_m = detail::scalar_as<U>(p.ball_diameter_m);
  q.ball_clearance_m = detail::scalar_as<U>(p.ball_clearance_m);
  q.ball_length_m = detail::scalar_as<U>(p.ball_length_m);
  q.valve_inner_land_inner_radius_m = detail::scalar_as<U>(p.valve_inner_land_inner_radius_m);
  q.valve_inner_land_outer_radius_m = detail::scalar_as<U>(p.valve_inner_land_outer_radius_m);
  q.valve_outer_land_inner_radius_m = detail::scalar_as<U>(p.valve_outer_land_inner_radius_m);
  q.valve_outer_land_outer_radius_m = detail::scalar_as<U>(p.valve_outer_land_outer_radius_m);
  q.valve_kidney_arc_rad = detail::scalar_as<U>(p.valve_kidney_arc_rad);
  q.valve_gap_m = detail::scalar_as<U>(p.valve_gap_m);
  q.controller_flow_m3_s = detail::scalar_as<U>(p.controller_flow_m3_s);
  q.bleed_orifice_diameter_m = detail::scalar_as<U>(p.bleed_orifice_diameter_m);
  q.bleed_cd = detail::scalar_as<U>(p.bleed_cd);
  q.extra_conductance_m3 = detail::scalar_as<U>(p.extra_conductance_m3);
  q.extra_orifice_cda_m2 = detail::scalar_as<U>(p.extra_orifice_cda_m2);
  q.stated_displacement_m3_rev = detail::scalar_as<U>(p.stated_displacement_m3_rev);
  q.pivot_offset_m = detail::scalar_as<U>(p.pivot_offset_m);
  q.dead_volume_m3 = detail::scalar_as<U>(p.dead_volume_m3);
  q.cross_port_conductance_m3 = detail::scalar_as<U>(p.cross_port_conductance_m3);
  q.control_piston_conductance_m3 = detail::scalar_as<U>(p.control_piston_conductance_m3);
  q.control_pressure_pa = detail::scalar_as<U>(p.control_pressure_pa);
  q.barrel_spring_force_n = detail::scalar_as<U>(p.barrel_spring_force_n);
  return q;
}

namespace detail {
/// An operating point in another scalar type (as piston_pump_cast()).
/// @param op the operating point in T
/// @return the same point in U
template <class U, class T>
inline pump_operating_point<U> operating_point_cast(const pump_operating_point<T>& op) {
  return {scalar_as<U>(op.outlet_pa), scalar_as<U>(op.case_pa), scalar_as<U>(op.speed_rev_s),
          scalar_as<U>(op.displacement_fraction), scalar_as<U>(op.t_k), op.mode, scalar_as<U>(op.inlet_pa),
          scalar_as<U>(op.film_temperature_rise_k)};
}

// The budget in dual numbers with the four gaps as the variables (pump_gap order).
template <class T>
inline leakage_budget<dual<T, pump_gap_count>> gap_dual_budget(const piston_pump<T>& p, const oil<T>& o,
                                                                const pump_operating_point<T>& op) {
  using D = dual<T, pump_gap_count>;
  auto pd = piston_pump_cast<D>(p);
  pd.bore_clearance_m = D::variable(p.bore_clearance_m, 0);
  pd.slipper_gap_m = D::variable(p.slipper_gap_m, 1);
  pd.ball_clearance_m = D::variable(p.ball_clearance_m, 2);
  pd.valve_gap_m = D::variable(p.valve_gap_m, 3);
  return piston_pump_budget(pd, oil_cast<D>(o), operating_point_cast<D>(op));
}
}  // namespace detail

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
  const auto b = detail::gap_dual_budget(p, o, op);
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


/// Standard uncertainty of every path's flow and share from the tolerances of the gaps.
template <class T>
struct [[nodiscard]] budget_uncertainty {
  T flow_m3_s[leakage_path_count];    ///< nominal flow of each path, m^3/s
  T share[leakage_path_count];        ///< nominal share of each path
  T u_flow_m3_s[leakage_path_count];  ///< standard uncertainty of each path's flow, m^3/s
  T u_share[leakage_path_count];      ///< standard uncertainty of each path's share (absolute, 0..1)
  T total_m3_s;                       ///< nominal total, m^3/s
  T u_total_m3_s;                     ///< standard uncertainty of the total, m^3/s
  pumploss::status st;                ///< status of the budget; domain for a negative tolerance
  /// @return true when the status is exactly ok.
  bool ok() const noexcept { return st == pumploss::status::ok; }
  /// @return true when the results are usable (ok or a report such as regime).
  bool usable() const noexcept { return pumploss::is_usable(st); }
};

/// Uncertainty of the budget's flows and shares propagated from independent standard
/// uncertainties of the four gaps, to first order with exact derivatives (dual numbers through
/// piston_pump_budget()):
/// \f[ u^2(y) = \sum_g \Big(\frac{\partial y}{\partial h_g}\Big)^2 u^2(h_g),\qquad
///     y \in \{q_i,\; q_i/Q,\; Q\} \f]
/// A drawing tolerance \f$\pm t\f$ of a uniformly spread clearance is \f$ u = t/\sqrt3 \f$ (GUM 4.3.7).
/// @param p the pump
/// @param o the oil
/// @param op the operating point
/// @param u_gap_m standard uncertainty of each pump_gap, m (>= 0)
/// @return the uncertainties; statuses as piston_pump_budget()
/// @par Validity
/// First order (the flows are nearly cubic in the gaps: for u/h above about 0.1 the second-order
/// term adds a few per cent of u); gaps independent.
/// @par Source
/// JCGM 100:2008 (GUM), law of propagation of uncertainty, eq. (10).
template <class T>
inline budget_uncertainty<T> piston_pump_budget_uncertainty(const piston_pump<T>& p, const oil<T>& o,
                                                            const pump_operating_point<T>& op,
                                                            const T (&u_gap_m)[pump_gap_count]) {
  using std::sqrt;
  using D = dual<T, pump_gap_count>;
  budget_uncertainty<T> r{};
  const T nan = scalar_traits<T>::nan();
  auto fail = [&](status s) {
    for (int i = 0; i < leakage_path_count; ++i) r.flow_m3_s[i] = r.share[i] = r.u_flow_m3_s[i] = r.u_share[i] = nan;
    r.total_m3_s = r.u_total_m3_s = nan;
    r.st = s;
    return r;
  };
  for (int g = 0; g < pump_gap_count; ++g) {
    if (!detail::finite(u_gap_m[g])) return fail(status::nonfinite);
    if (!(u_gap_m[g] >= T(0))) return fail(status::domain);
  }
  const auto b = detail::gap_dual_budget(p, o, op);
  if (is_error(b.st)) return fail(b.st);
  auto u_of = [&](const D& y) {
    T s2 = T(0);
    for (int g = 0; g < pump_gap_count; ++g) s2 += y.d[g] * u_gap_m[g] * y.d[g] * u_gap_m[g];
    return sqrt(s2);
  };
  for (int i = 0; i < leakage_path_count; ++i) {
    r.flow_m3_s[i] = b.flow_m3_s[i].val;
    r.u_flow_m3_s[i] = u_of(b.flow_m3_s[i]);
    const bool any = b.total_m3_s.val > T(0);
    r.share[i] = any ? b.share[i].val : nan;
    r.u_share[i] = any ? u_of(b.share[i]) : nan;
  }
  r.total_m3_s = b.total_m3_s.val;
  r.u_total_m3_s = u_of(b.total_m3_s);
  r.st = b.st;
  return r;
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
    case leakage_path::bleed:
    case leakage_path::control_piston: return path_group::controller;
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
  controller_mode mode = controller_mode::on_stroke;  ///< what the controller was doing (deadhead: zero stroke)
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

namespace detail {
/// gap_growth_for_drain() for a scalar type that is not a dual number: Brent's method in ln k.
template <class T>
inline result<T> gap_growth_solve(const piston_pump<T>& p, const oil<T>& o, const pump_operating_point<T>& op,
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
}  // namespace detail

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
/// For dual numbers (in the description, the oil, the point or the measurement) the root is
/// found in the value type and the derivatives follow from the implicit-function rule
/// (dx/dp = -F_p/F_x with x = ln k, detail::implicit_root()).
/// @par Source
/// Monotone one-dimensional root of the budget in log k on [ln(1/20), ln 20], found by Brent's
/// method (detail/roots.hpp).
template <class T>
inline result<T> gap_growth_for_drain(const piston_pump<T>& p, const oil<T>& o, const pump_operating_point<T>& op,
                                      pump_gap gap, T measured_drain_m3_s) {
  using std::exp;
  using std::log;
  if constexpr (detail::is_dual_v<T>) {  // root in the value type, derivatives by the implicit rule
    using V = detail::value_type_of_t<T>;
    const auto v = gap_growth_for_drain(piston_pump_cast<V>(p), detail::oil_cast<V>(o),
                                        detail::operating_point_cast<V>(op), gap, detail::primal(measured_drain_m3_s));
    if (is_error(v.st)) return detail::fail<T>(v.st);
    const unsigned mask = 1u << static_cast<int>(gap);
    // F(x) = budget total with the gap scaled by k = e^x, less the measurement
    auto residual = [&](auto x, auto q) {
      using std::exp;
      using U = decltype(x);
      return U(piston_pump_budget(scale_gaps(piston_pump_cast<U>(p), mask, U(exp(x))), detail::oil_cast<U>(o),
                                  detail::operating_point_cast<U>(op))
                   .total_m3_s -
               q);
    };
    using std::expm1;
    using std::log1p;
    return {expm1(detail::implicit_root<T>(log1p(v.value), residual, measured_drain_m3_s)), v.st};
  } else {
    return detail::gap_growth_solve(p, o, op, gap, measured_drain_m3_s);
  }
}

}  // namespace pumploss

#endif
