/// @file vane_pump.hpp
/// @brief Internal leakage budget of a vane pump from its clearances: vane tips against the cam
/// ring (pressure flow against the tips' drag), rotor faces against the side plates, and vanes
/// in their rotor slots; with the exact sensitivity of the total to each clearance (dual
/// numbers). Theory: @ref theory_rotary.
///
/// SI: flow in m^3/s, pressure in Pa, lengths in m, angles in rad, speed in rev/s, T in K.
#ifndef PUMPLOSS_VANE_PUMP_HPP
#define PUMPLOSS_VANE_PUMP_HPP

#include <cmath>

#include "clearance_budget.hpp"
#include "gap.hpp"

namespace pumploss {

/// The clearance paths of a vane pump budget (index into clearance_budget::flow_m3_s).
enum class vane_path : int {
  tip = 0,   ///< vane tips against the cam ring in the sealing arcs
  side = 1,  ///< rotor faces against the side plates (both faces)
  slot = 2   ///< vanes in their rotor slots (undervane oil to the suction chambers)
};

/// A vane pump (balanced or unbalanced) described by its clearances.
template <class T>
struct vane_pump {
  T displacement_m3_rev{};  ///< the maker's displacement, m^3/rev (> 0)
  T rotor_width_m{};        ///< b rotor (and vane) width, m (> 0)
  T cam_radius_m{};         ///< cam ring radius at the sealing arcs (sets the tip speed), m (> rotor radius)
  T rotor_radius_m{};       ///< r_r rotor outer radius, m (> hub radius)
  T hub_radius_m{};         ///< r_h hub (shaft bore) radius, drained to the inlet, m (> 0)
  int sealing_arcs = 0;     ///< arcs between an outlet and an inlet port sealed by vanes (1 unbalanced, 2 balanced)
  int vanes_per_arc = 0;    ///< vanes in series in each sealing arc (>= 1)
  T vane_tip_land_m{};      ///< sealing length across one vane tip (about the vane thickness), m (> 0)
  T tip_clearance_m{};      ///< h_v film between vane tip and cam ring, m (> 0)
  T side_clearance_m{};     ///< h_s film between a rotor face and its side plate, m (> 0)
  T pressure_arc_rad{};     ///< arc of each rotor face under outlet pressure, rad, (0, 2 pi]
  int vanes_in_suction = 0; ///< vanes whose slot (undervane at outlet pressure) faces a suction chamber (>= 0)
  T slot_length_m{};        ///< engaged depth of a vane in its slot (sealing length), m (> 0 when slots count)
  T slot_clearance_m{};     ///< h_sl clearance between vane and slot wall (one open side), m (>= 0; 0: no path)
};

namespace detail {
template <class T>
inline status vane_pump_check(const vane_pump<T>& v) {
  if (!all_finite(v.displacement_m3_rev, v.rotor_width_m, v.cam_radius_m, v.rotor_radius_m, v.hub_radius_m,
                  v.vane_tip_land_m, v.tip_clearance_m, v.side_clearance_m, v.pressure_arc_rad, v.slot_length_m,
                  v.slot_clearance_m))
    return status::nonfinite;
  const T two_pi = 2 * pi<T>();
  if (!(v.displacement_m3_rev > T(0)) || !(v.rotor_width_m > T(0)) || !(v.hub_radius_m > T(0)) ||
      !(v.rotor_radius_m > v.hub_radius_m) || !(v.cam_radius_m > v.rotor_radius_m) || v.sealing_arcs < 1 ||
      v.sealing_arcs > 8 || v.vanes_per_arc < 1 || v.vanes_per_arc > 50 || !(v.vane_tip_land_m > T(0)) ||
      !(v.tip_clearance_m > T(0)) || !(v.side_clearance_m > T(0)) || !(v.pressure_arc_rad > T(0)) ||
      !(v.pressure_arc_rad <= two_pi) || v.vanes_in_suction < 0 || v.vanes_in_suction > 100 ||
      !(v.slot_clearance_m >= T(0)) || !(v.slot_length_m >= T(0)) ||
      (v.slot_clearance_m > T(0) && v.vanes_in_suction > 0 && !(v.slot_length_m > T(0))))
    return status::domain;
  return status::ok;
}
}  // namespace detail

/// Internal leakage budget of a vane pump at one operating point.
///
/// With \f$\Delta p = p_{out} - p_{in}\f$, tip speed \f$U = 2\pi n r_c\f$ and viscosity
/// \f$\mu(\theta)\f$:
/// - vane tips (\f$k\f$ sealing arcs, \f$z_v\f$ tip lands of length \f$t\f$ in series in each,
///   the tips dragging oil towards the outlet against the pressure flow; gap_plates_flow()):
///   \f[ q_{tip} = k\left(\frac{b h_v^3 \Delta p}{12 \mu z_v t} - \frac{b h_v U}{2}\right) \f]
/// - side plates (two rotor faces, radial inward flow over the outlet arc \f$\varphi\f$ from the
///   rotor rim to the drained hub; gap_radial_sector_flow()):
///   \f[ q_{side} = 2\,\frac{\varphi h_s^3 \Delta p}{12\mu\ln(r_r/r_h)} \f]
/// - rotor slots (\f$z_s\f$ vanes whose undervane space at outlet pressure faces a suction
///   chamber; one open side of width \f$b\f$ and length \f$L_s\f$ each):
///   \f[ q_{slot} = z_s\,\frac{b h_{sl}^3 \Delta p}{12\mu L_s} \f]
///
/// @param v the pump
/// @param o the oil (viscosity by ASTM D341, density at the inlet pressure)
/// @param op the operating point
/// @return the budget; status::regime when a gap Reynolds number exceeds 2000; status::implausible
///         when the leakage exceeds the ideal flow; status::domain for a bad description,
///         outlet below inlet or speed <= 0; status::nonfinite.
/// @par Validity
/// Laminar, isothermal, rigid parallel gaps with one viscosity; vanes in full contact
/// with the cam ring except for the stated tip film; the radial sliding of the vanes in their
/// slots (drag averaging to zero over a revolution) and the chamfer of the tips are neglected.
/// A tip path can be negative at low pressure (drag exceeds pressure flow).
/// @par Accuracy
/// Each path as its gap law (a few ulp; tests/rotary_pump_test.cpp against self-calculated mpmath
/// values, and the hand-worked example of @ref theory_rotary to its four digits).
/// @par Source
/// Plane Poiseuille-Couette slot and radial disc flow (gap_plates_flow(), gap_radial_sector_flow();
/// Rabie, Fluid Power Engineering, McGraw-Hill 2009, ch. 2); the vane pump path breakdown
/// (tips, side plates, slots) as in Ivantysyn & Ivantysynova, Hydrostatic Pumps and Motors,
/// 2001 (from memory); see @ref theory_rotary.
template <class T>
inline clearance_budget<T> vane_pump_budget(const vane_pump<T>& v, const oil<T>& o, const rotary_operating_point<T>& op) {
  return detail::clearance_budget_of(detail::vane_pump_check(v), o, op, v.displacement_m3_rev, [&](auto& b, T dp) {
    // vane tips in each sealing arc: pressure flow back to the inlet, drag forward
    const T u = 2 * detail::pi<T>() * op.speed_rev_s * v.cam_radius_m;
    status st = detail::clearance_tip_path(b, static_cast<int>(vane_path::tip), T(v.sealing_arcs), dp,
                                           v.rotor_width_m, v.tip_clearance_m,
                                           T(v.vanes_per_arc) * v.vane_tip_land_m, u);
    if (is_error(st)) return st;
    // both rotor faces against the side plates
    const auto qs = detail::clearance_face_flow(b, dp, v.hub_radius_m, v.rotor_radius_m, v.side_clearance_m,
                                                v.pressure_arc_rad);
    if (is_error(qs.st)) return qs.st;
    b.flow_m3_s[static_cast<int>(vane_path::side)] = 2 * qs.value;
    // vanes in their slots with the undervane oil at outlet pressure facing a suction chamber
    if (v.slot_clearance_m > T(0) && v.vanes_in_suction > 0)
      st = detail::clearance_slot_path(b, static_cast<int>(vane_path::slot), T(v.vanes_in_suction), dp,
                                       v.rotor_width_m, v.slot_clearance_m, v.slot_length_m);
    return st;
  });
}

/// A vane pump description converted to another scalar type (for dual-number sensitivities).
/// @param v the description in T
/// @return the same description in U
template <class U, class T>
inline vane_pump<U> vane_pump_cast(const vane_pump<T>& v) {
  vane_pump<U> r;
  r.displacement_m3_rev = U(v.displacement_m3_rev);
  r.rotor_width_m = U(v.rotor_width_m);
  r.cam_radius_m = U(v.cam_radius_m);
  r.rotor_radius_m = U(v.rotor_radius_m);
  r.hub_radius_m = U(v.hub_radius_m);
  r.sealing_arcs = v.sealing_arcs;
  r.vanes_per_arc = v.vanes_per_arc;
  r.vane_tip_land_m = U(v.vane_tip_land_m);
  r.tip_clearance_m = U(v.tip_clearance_m);
  r.side_clearance_m = U(v.side_clearance_m);
  r.pressure_arc_rad = U(v.pressure_arc_rad);
  r.vanes_in_suction = v.vanes_in_suction;
  r.slot_length_m = U(v.slot_length_m);
  r.slot_clearance_m = U(v.slot_clearance_m);
  return r;
}

/// Sensitivity of a vane pump's total leakage to its three clearances (tip, side, slot; in the
/// order of vane_path), by forward-mode dual numbers through vane_pump_budget() (exact).
/// @param v the pump
/// @param o the oil
/// @param op the operating point
/// @return the sensitivities; statuses as vane_pump_budget().
/// @par Source
/// Differentiation of vane_pump_budget().
template <class T>
inline clearance_sensitivity<T> vane_pump_sensitivity(const vane_pump<T>& v, const oil<T>& o,
                                                      const rotary_operating_point<T>& op) {
  using D = dual<T, clearance_path_count>;
  auto vd = vane_pump_cast<D>(v);
  vd.tip_clearance_m = D::variable(v.tip_clearance_m, 0);
  vd.side_clearance_m = D::variable(v.side_clearance_m, 1);
  vd.slot_clearance_m = D::variable(v.slot_clearance_m, 2);
  const T gaps[clearance_path_count] = {v.tip_clearance_m, v.side_clearance_m, v.slot_clearance_m};
  return detail::clearance_sensitivity_through(vd, o, op, gaps, [](const auto& p, const auto& od, const auto& x) {
    return vane_pump_budget(p, od, x);
  });
}

/// Short name of a vane pump path ("vane-tip", "side-plates", "rotor-slots"), "unknown" otherwise.
/// @param path the path number (vane_path)
/// @return the name (static storage)
inline const char* vane_path_name(int path) noexcept {
  switch (path) {
    case 0: return "vane-tip";
    case 1: return "side-plates";
    case 2: return "rotor-slots";
    default: return "unknown";
  }
}

}  // namespace pumploss

#endif
