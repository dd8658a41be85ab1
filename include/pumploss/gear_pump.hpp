/// @file gear_pump.hpp
/// @brief Internal leakage budget of an external gear pump from its clearances: tooth tips
/// against the housing (pressure flow against the tips' drag), lateral gaps at side plates or
/// pressure-balanced bushings, and a stated estimate for the mesh; with the exact sensitivity
/// of the total to each clearance (dual numbers). Theory: @ref theory_rotary.
///
/// SI: flow in m^3/s, pressure in Pa, lengths in m, angles in rad, speed in rev/s, T in K.
#ifndef PUMPLOSS_GEAR_PUMP_HPP
#define PUMPLOSS_GEAR_PUMP_HPP

#include <cmath>

#include "clearance_budget.hpp"
#include "gap.hpp"

namespace pumploss {

/// The clearance paths of a gear pump budget (index into clearance_budget::flow_m3_s).
enum class gear_path : int {
  tip = 0,      ///< tooth tips against the housing bore, both gears
  lateral = 1,  ///< gear faces against side plates or bushings, both gears, both sides
  mesh = 2      ///< the mesh between the gears (stated estimate)
};

/// An external gear pump with two equal gears, described by its clearances.
template <class T>
struct gear_pump {
  T displacement_m3_rev{};    ///< the maker's displacement, m^3/rev (> 0)
  T tip_radius_m{};           ///< r_a tooth tip radius, m (> root radius)
  T root_radius_m{};          ///< r_f root radius: outer edge of the lateral sealing land, m
  T shaft_radius_m{};         ///< r_s shaft (bearing bore) radius, drained to the inlet, m (> 0, < r_f)
  T face_width_m{};           ///< b gear face width, m (> 0)
  T tip_land_m{};             ///< s_a width of one tooth's tip land along the circumference, m (> 0)
  int teeth_sealing = 0;      ///< teeth of one gear sealing against the housing in series (>= 1)
  T tip_clearance_m{};        ///< h_t radial clearance between tips and housing bore, m (> 0)
  T lateral_clearance_m{};    ///< side plates: total end float e of a gear; bushings: film per side, m (> 0)
  bool balanced_bushings = false;  ///< true: pressure-balanced bushings (film per side); false: fixed side plates
  T lateral_offset{};         ///< side plates: axial offset of a gear in its end float, 0 centred .. <1, ratio
  T lateral_arc_rad{};        ///< arc of each gear face under outlet pressure, rad, (0, 2 pi]
  T mesh_clearance_m{};       ///< effective slot height at the mesh, m (0: the contacting flanks seal)
  T mesh_length_m{};          ///< effective sealing length of the mesh slot, m (> 0 when the clearance is)
};

namespace detail {
template <class T>
inline status gear_pump_check(const gear_pump<T>& g) {
  if (!all_finite(g.displacement_m3_rev, g.tip_radius_m, g.root_radius_m, g.shaft_radius_m, g.face_width_m,
                  g.tip_land_m, g.tip_clearance_m, g.lateral_clearance_m, g.lateral_offset, g.lateral_arc_rad,
                  g.mesh_clearance_m, g.mesh_length_m))
    return status::nonfinite;
  const T two_pi = 2 * pi<T>();
  if (!(g.displacement_m3_rev > T(0)) || !(g.shaft_radius_m > T(0)) || !(g.root_radius_m > g.shaft_radius_m) ||
      !(g.tip_radius_m > g.root_radius_m) || !(g.face_width_m > T(0)) || !(g.tip_land_m > T(0)) ||
      g.teeth_sealing < 1 || g.teeth_sealing > 100 || !(g.tip_clearance_m > T(0)) || !(g.lateral_clearance_m > T(0)) ||
      !(g.lateral_offset >= T(0)) || !(g.lateral_offset < T(1)) || !(g.lateral_arc_rad > T(0)) ||
      !(g.lateral_arc_rad <= two_pi) || !(g.mesh_clearance_m >= T(0)) ||
      (g.mesh_clearance_m > T(0) && !(g.mesh_length_m > T(0))) || !(g.mesh_length_m >= T(0)))
    return status::domain;
  return status::ok;
}
}  // namespace detail

/// Internal leakage budget of an external gear pump at one operating point.
///
/// With \f$\Delta p = p_{out} - p_{in}\f$, tip speed \f$U = 2\pi n r_a\f$ and viscosity
/// \f$\mu(\theta)\f$ of the oil at zero gauge pressure:
/// - tooth tips (two gears; \f$z_s\f$ tip lands of width \f$s_a\f$ in series, the housing still,
///   the tips dragging oil towards the outlet, against the pressure flow; gap_plates_flow()):
///   \f[ q_{tip} = 2\left(\frac{b h_t^3 \Delta p}{12 \mu z_s s_a} - \frac{b h_t U}{2}\right) \f]
/// - lateral gaps (two gears, two faces each; radial inward flow over the arc \f$\varphi\f$ from
///   the root circle to the drained shaft bore; gap_radial_sector_flow()):
///   \f[ q_{lat} = 2\,\frac{\varphi (h_1^3 + h_2^3)\Delta p}{12\mu\ln(r_f/r_s)} \f]
///   side plates: \f$h_{1,2} = e(1 \pm \epsilon)/2\f$ from the end float \f$e\f$ and offset
///   \f$\epsilon\f$; balanced bushings: \f$h_1 = h_2\f$ = the film;
/// - mesh (stated estimate): one plane slot across the face width,
///   \f$ q_{mesh} = b h_m^3 \Delta p / (12 \mu L_m) \f$ (0 when the flanks seal, \f$h_m = 0\f$).
///
/// @param g the pump
/// @param o the oil (viscosity by ASTM D341, density at the inlet pressure)
/// @param op the operating point (outlet, inlet, speed, oil temperature in the gaps)
/// @return the budget; status::regime when a gap Reynolds number exceeds 2000; status::implausible
///         when the leakage exceeds the ideal flow; status::domain for a bad description,
///         outlet below inlet or speed <= 0; status::nonfinite.
/// @par Validity
/// Laminar, isothermal, rigid parallel gaps with one viscosity; tip gaps in series with the
/// tooth spaces between them at intermediate pressures; lateral leakage taken from the
/// outlet-pressure arc straight to the drained shaft bore (the bore at inlet pressure). The
/// mesh slot is an assumption stated by the user, not a model of the tooth contact. Clearances
/// are those under load (housing and shaft deflection shift the gears towards the inlet).
/// A tip path can be negative at low pressure (drag exceeds pressure flow).
/// @par Accuracy
/// Each path as its gap law (a few ulp; tests/rotary_pump_test.cpp against self-calculated mpmath
/// values, and the hand-worked example of @ref theory_rotary to its four digits).
/// @par Source
/// Plane Poiseuille-Couette slot and radial disc flow (gap_plates_flow(), gap_radial_sector_flow();
/// Rabie, Fluid Power Engineering, McGraw-Hill 2009, ch. 2); the path breakdown of external
/// gear machines follows Ivantysyn & Ivantysynova, Hydrostatic Pumps and Motors, 2001 (from
/// memory); see @ref theory_rotary.
template <class T>
inline clearance_budget<T> gear_pump_budget(const gear_pump<T>& g, const oil<T>& o, const rotary_operating_point<T>& op) {
  return detail::clearance_budget_of(detail::gear_pump_check(g), o, op, g.displacement_m3_rev, [&](auto& b, T dp) {
    // tooth tips of both gears: pressure flow back to the inlet, drag forward
    const T u = 2 * detail::pi<T>() * op.speed_rev_s * g.tip_radius_m;
    status st = detail::clearance_tip_path(b, static_cast<int>(gear_path::tip), T(2), dp, g.face_width_m,
                                           g.tip_clearance_m, T(g.teeth_sealing) * g.tip_land_m, u);
    if (is_error(st)) return st;
    // lateral gaps: both faces of a gear (side plates: the end float split by the offset)
    T h1 = g.lateral_clearance_m, h2 = g.lateral_clearance_m;
    if (!g.balanced_bushings) {
      h1 = g.lateral_clearance_m * (T(1) + g.lateral_offset) / 2;
      h2 = g.lateral_clearance_m * (T(1) - g.lateral_offset) / 2;
    }
    T q_lat = T(0);
    for (const T& h : {h1, h2}) {
      if (!(h > T(0))) continue;
      const auto q = detail::clearance_face_flow(b, dp, g.shaft_radius_m, g.root_radius_m, h, g.lateral_arc_rad);
      if (is_error(q.st)) return q.st;
      q_lat += q.value;
    }
    b.flow_m3_s[static_cast<int>(gear_path::lateral)] = 2 * q_lat;
    // mesh (stated estimate)
    if (g.mesh_clearance_m > T(0))
      st = detail::clearance_slot_path(b, static_cast<int>(gear_path::mesh), T(1), dp, g.face_width_m,
                                       g.mesh_clearance_m, g.mesh_length_m);
    return st;
  });
}

/// A gear pump description converted to another scalar type (for dual-number sensitivities).
/// @param g the description in T
/// @return the same description in U
template <class U, class T>
inline gear_pump<U> gear_pump_cast(const gear_pump<T>& g) {
  gear_pump<U> r;
  r.displacement_m3_rev = U(g.displacement_m3_rev);
  r.tip_radius_m = U(g.tip_radius_m);
  r.root_radius_m = U(g.root_radius_m);
  r.shaft_radius_m = U(g.shaft_radius_m);
  r.face_width_m = U(g.face_width_m);
  r.tip_land_m = U(g.tip_land_m);
  r.teeth_sealing = g.teeth_sealing;
  r.tip_clearance_m = U(g.tip_clearance_m);
  r.lateral_clearance_m = U(g.lateral_clearance_m);
  r.balanced_bushings = g.balanced_bushings;
  r.lateral_offset = U(g.lateral_offset);
  r.lateral_arc_rad = U(g.lateral_arc_rad);
  r.mesh_clearance_m = U(g.mesh_clearance_m);
  r.mesh_length_m = U(g.mesh_length_m);
  return r;
}

/// Sensitivity of a gear pump's total leakage to its three clearances (tip, lateral, mesh; in the
/// order of gear_path), by forward-mode dual numbers through gear_pump_budget() (exact).
/// @param g the pump
/// @param o the oil
/// @param op the operating point
/// @return the sensitivities; statuses as gear_pump_budget(). The mesh entry is 0 when the
///         mesh is sealed (h_m = 0).
/// @par Source
/// Differentiation of gear_pump_budget().
template <class T>
inline clearance_sensitivity<T> gear_pump_sensitivity(const gear_pump<T>& g, const oil<T>& o,
                                                      const rotary_operating_point<T>& op) {
  using D = dual<T, clearance_path_count>;
  auto gd = gear_pump_cast<D>(g);
  gd.tip_clearance_m = D::variable(g.tip_clearance_m, 0);
  gd.lateral_clearance_m = D::variable(g.lateral_clearance_m, 1);
  gd.mesh_clearance_m = D::variable(g.mesh_clearance_m, 2);
  const T gaps[clearance_path_count] = {g.tip_clearance_m, g.lateral_clearance_m, g.mesh_clearance_m};
  return detail::clearance_sensitivity_through(gd, o, op, gaps, [](const auto& p, const auto& od, const auto& x) {
    return gear_pump_budget(p, od, x);
  });
}

/// Short name of a gear pump path ("tooth-tip", "lateral", "mesh"), "unknown" otherwise.
/// @param path the path number (gear_path)
/// @return the name (static storage)
inline const char* gear_path_name(int path) noexcept {
  switch (path) {
    case 0: return "tooth-tip";
    case 1: return "lateral";
    case 2: return "mesh";
    default: return "unknown";
  }
}

}  // namespace pumploss

#endif
