// C API wrappers for gear_pump.hpp and vane_pump.hpp (clearance budgets as handles).
#include <new>
#include <type_traits>

#include "capi_common.hpp"
#include "pumploss/gear_pump.hpp"
#include "pumploss/vane_pump.hpp"

using pumploss::capi::call;
using pumploss::status;

static_assert(PUMPLOSS_ROTARY_PATH_COUNT == pumploss::clearance_path_count, "paths");
static_assert(PUMPLOSS_GEAR_PATH_MESH == static_cast<int>(pumploss::gear_path::mesh), "paths");
static_assert(PUMPLOSS_VANE_PATH_SLOT == static_cast<int>(pumploss::vane_path::slot), "paths");

namespace {
/// What a gear or vane handle holds: the description and its oil.
template <class Pump>
struct rotary_handle {
  Pump pump;
  pumploss::oil<double> oil{};
  bool has_oil = false;
};
}  // namespace

struct pumploss_gear_pump : rotary_handle<pumploss::gear_pump<double>> {};
struct pumploss_vane_pump : rotary_handle<pumploss::vane_pump<double>> {};

namespace {

// The description's check, budget and sensitivity of each kind, so that one helper serves both.
status check_of(const pumploss::gear_pump<double>& g) { return pumploss::detail::gear_pump_check(g); }
status check_of(const pumploss::vane_pump<double>& v) { return pumploss::detail::vane_pump_check(v); }
template <class Pump>
pumploss::clearance_budget<double> budget_of(const Pump& p, const pumploss::oil<double>& o,
                                             const pumploss::rotary_operating_point<double>& op) {
  if constexpr (std::is_same_v<Pump, pumploss::gear_pump<double>>)
    return pumploss::gear_pump_budget(p, o, op);
  else
    return pumploss::vane_pump_budget(p, o, op);
}
template <class Pump>
pumploss::clearance_sensitivity<double> sensitivity_of(const Pump& p, const pumploss::oil<double>& o,
                                                       const pumploss::rotary_operating_point<double>& op) {
  if constexpr (std::is_same_v<Pump, pumploss::gear_pump<double>>)
    return pumploss::gear_pump_sensitivity(p, o, op);
  else
    return pumploss::vane_pump_sensitivity(p, o, op);
}

/// A new handle: the two radial increments of the create function (land and tooth height, land
/// and ring gap) checked, the description built by `build()` from them and checked; NULL in *out
/// on every error.
template <class Handle, class Build>
int create_handle(Handle** out, double increment1_m, double increment2_m, Build build) {
  if (out == nullptr) return PUMPLOSS_EMISUSE;
  *out = nullptr;
  pumploss::capi::fp_guard guard;
  if (!pumploss::detail::all_finite(increment1_m, increment2_m)) return PUMPLOSS_ENONFINITE;
  if (!(increment1_m > 0) || !(increment2_m > 0)) return PUMPLOSS_EDOMAIN;
  const auto pump = build();
  const status st = check_of(pump);
  if (pumploss::is_error(st)) return static_cast<int>(st);
  auto* h = new (std::nothrow) Handle{};
  if (h == nullptr) return PUMPLOSS_ENOMEM;
  h->pump = pump;
  *out = h;
  return PUMPLOSS_OK;
}

/// The oil from two D341 points and the density at 15 degC (typical mineral oil otherwise).
int make_oil(double t1_k, double nu1_m2_s, double t2_k, double nu2_m2_s, double rho15_kg_m3,
             pumploss::oil<double>& out) {
  pumploss::capi::fp_guard guard;
  const auto line = pumploss::d341_fit(t1_k, nu1_m2_s, t2_k, nu2_m2_s);
  if (pumploss::is_error(line.st)) return static_cast<int>(line.st);
  if (!pumploss::detail::finite(rho15_kg_m3)) return PUMPLOSS_ENONFINITE;
  if (!(rho15_kg_m3 > 0)) return PUMPLOSS_EDOMAIN;
  out = pumploss::typical_mineral_oil(line.value);
  out.rho_ref_kg_m3 = rho15_kg_m3;
  return PUMPLOSS_OK;
}

/// Set a handle's oil from two D341 points and the density at 15 degC.
template <class Handle>
int set_oil(Handle* h, double t1_k, double nu1_m2_s, double t2_k, double nu2_m2_s, double rho15_kg_m3) {
  if (h == nullptr) return PUMPLOSS_EMISUSE;
  const int st = make_oil(t1_k, nu1_m2_s, t2_k, nu2_m2_s, rho15_kg_m3, h->oil);
  if (st == PUMPLOSS_OK) h->has_oil = true;
  return st;
}

/// Change a handle's description by `change(copy)`; the copy replaces it when it is valid.
template <class Handle, class Change>
int change_pump(Handle* h, Change change) {
  if (h == nullptr) return PUMPLOSS_EMISUSE;
  pumploss::capi::fp_guard guard;
  auto changed = h->pump;
  change(changed);
  const status st = check_of(changed);
  if (pumploss::is_error(st)) return static_cast<int>(st);
  h->pump = changed;
  return PUMPLOSS_OK;
}

/// One path of a budget and its clearance's sensitivity.
template <class Handle>
int path_call(const Handle* h, int path, double outlet_pa, double inlet_pa, double speed_rev_s, double t_k,
              double* q_m3_s, double* total_m3_s, double* volumetric_efficiency, double* d_total_d_gap_m2_s,
              double* elasticity) {
  return call({q_m3_s, total_m3_s, volumetric_efficiency, d_total_d_gap_m2_s, elasticity}, [&] {
    if (h == nullptr || !h->has_oil) return status::misuse;
    if (path < 0 || path >= pumploss::clearance_path_count) return status::domain;
    const pumploss::rotary_operating_point<double> op{outlet_pa, inlet_pa, speed_rev_s, t_k};
    const auto b = budget_of(h->pump, h->oil, op);
    if (pumploss::is_error(b.st)) return b.st;
    const auto s = sensitivity_of(h->pump, h->oil, op);
    if (pumploss::is_error(s.st)) return s.st;
    *q_m3_s = b.flow_m3_s[path];
    *total_m3_s = b.total_m3_s;
    *volumetric_efficiency = b.volumetric_efficiency;
    *d_total_d_gap_m2_s = s.d_total_d_gap[path];
    *elasticity = s.elasticity[path];
    return b.st;
  });
}

}  // namespace

extern "C" {

PUMPLOSS_API int PUMPLOSS_CALL pumploss_gear_pump_create(double displacement_m3_rev, double shaft_radius_m,
                                                         double lateral_land_m, double tooth_height_m,
                                                         double face_width_m, double tip_land_m, int teeth_sealing,
                                                         double tip_clearance_m, double lateral_clearance_m,
                                                         pumploss_gear_pump** out) {
  return create_handle(out, lateral_land_m, tooth_height_m, [&] {
    pumploss::gear_pump<double> g;
    g.displacement_m3_rev = displacement_m3_rev;
    g.shaft_radius_m = shaft_radius_m;
    g.root_radius_m = shaft_radius_m + lateral_land_m;
    g.tip_radius_m = g.root_radius_m + tooth_height_m;
    g.face_width_m = face_width_m;
    g.tip_land_m = tip_land_m;
    g.teeth_sealing = teeth_sealing;
    g.tip_clearance_m = tip_clearance_m;
    g.lateral_clearance_m = lateral_clearance_m;
    g.lateral_arc_rad = pumploss::detail::pi<double>();
    return g;
  });
}

PUMPLOSS_API void PUMPLOSS_CALL pumploss_gear_pump_destroy(pumploss_gear_pump* h) { delete h; }

PUMPLOSS_API int PUMPLOSS_CALL pumploss_gear_pump_set_lateral(pumploss_gear_pump* h, double clearance_m,
                                                              int balanced_bushings, double offset_ratio,
                                                              double arc_rad) {
  if (h != nullptr && balanced_bushings != 0 && balanced_bushings != 1) return PUMPLOSS_EDOMAIN;
  return change_pump(h, [&](pumploss::gear_pump<double>& g) {
    g.lateral_clearance_m = clearance_m;
    g.balanced_bushings = balanced_bushings == 1;
    g.lateral_offset = offset_ratio;
    g.lateral_arc_rad = arc_rad;
  });
}

PUMPLOSS_API int PUMPLOSS_CALL pumploss_gear_pump_set_mesh(pumploss_gear_pump* h, double clearance_m,
                                                           double length_m) {
  return change_pump(h, [&](pumploss::gear_pump<double>& g) {
    g.mesh_clearance_m = clearance_m;
    g.mesh_length_m = length_m;
  });
}

PUMPLOSS_API int PUMPLOSS_CALL pumploss_gear_pump_set_oil(pumploss_gear_pump* h, double t1_k, double nu1_m2_s,
                                                          double t2_k, double nu2_m2_s, double rho15_kg_m3) {
  return set_oil(h, t1_k, nu1_m2_s, t2_k, nu2_m2_s, rho15_kg_m3);
}

PUMPLOSS_API int PUMPLOSS_CALL pumploss_gear_pump_path(const pumploss_gear_pump* h, int path, double outlet_pa,
                                                       double inlet_pa, double speed_rev_s, double t_k,
                                                       double* q_m3_s, double* total_m3_s,
                                                       double* volumetric_efficiency, double* d_total_d_gap_m2_s,
                                                       double* elasticity) {
  return path_call(h, path, outlet_pa, inlet_pa, speed_rev_s, t_k, q_m3_s, total_m3_s, volumetric_efficiency,
                   d_total_d_gap_m2_s, elasticity);
}

PUMPLOSS_API int PUMPLOSS_CALL pumploss_vane_pump_create(double displacement_m3_rev, double hub_radius_m,
                                                         double face_land_m, double ring_gap_m, double rotor_width_m,
                                                         int sealing_arcs, int vanes_per_arc, double vane_tip_land_m,
                                                         double tip_clearance_m, double side_clearance_m,
                                                         pumploss_vane_pump** out) {
  return create_handle(out, face_land_m, ring_gap_m, [&] {
    pumploss::vane_pump<double> v;
    v.displacement_m3_rev = displacement_m3_rev;
    v.hub_radius_m = hub_radius_m;
    v.rotor_radius_m = hub_radius_m + face_land_m;
    v.cam_radius_m = v.rotor_radius_m + ring_gap_m;
    v.rotor_width_m = rotor_width_m;
    v.sealing_arcs = sealing_arcs;
    v.vanes_per_arc = vanes_per_arc;
    v.vane_tip_land_m = vane_tip_land_m;
    v.tip_clearance_m = tip_clearance_m;
    v.side_clearance_m = side_clearance_m;
    v.pressure_arc_rad = pumploss::detail::pi<double>();
    return v;
  });
}

PUMPLOSS_API void PUMPLOSS_CALL pumploss_vane_pump_destroy(pumploss_vane_pump* h) { delete h; }

PUMPLOSS_API int PUMPLOSS_CALL pumploss_vane_pump_set_sides(pumploss_vane_pump* h, double pressure_arc_rad) {
  return change_pump(h, [&](pumploss::vane_pump<double>& v) { v.pressure_arc_rad = pressure_arc_rad; });
}

PUMPLOSS_API int PUMPLOSS_CALL pumploss_vane_pump_set_slots(pumploss_vane_pump* h, int vanes_in_suction,
                                                            double slot_length_m, double slot_clearance_m) {
  return change_pump(h, [&](pumploss::vane_pump<double>& v) {
    v.vanes_in_suction = vanes_in_suction;
    v.slot_length_m = slot_length_m;
    v.slot_clearance_m = slot_clearance_m;
  });
}

PUMPLOSS_API int PUMPLOSS_CALL pumploss_vane_pump_set_oil(pumploss_vane_pump* h, double t1_k, double nu1_m2_s,
                                                          double t2_k, double nu2_m2_s, double rho15_kg_m3) {
  return set_oil(h, t1_k, nu1_m2_s, t2_k, nu2_m2_s, rho15_kg_m3);
}

PUMPLOSS_API int PUMPLOSS_CALL pumploss_vane_pump_path(const pumploss_vane_pump* h, int path, double outlet_pa,
                                                       double inlet_pa, double speed_rev_s, double t_k,
                                                       double* q_m3_s, double* total_m3_s,
                                                       double* volumetric_efficiency, double* d_total_d_gap_m2_s,
                                                       double* elasticity) {
  return path_call(h, path, outlet_pa, inlet_pa, speed_rev_s, t_k, q_m3_s, total_m3_s, volumetric_efficiency,
                   d_total_d_gap_m2_s, elasticity);
}

}  // extern "C"
