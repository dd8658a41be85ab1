// C API wrappers for gap.hpp and orifice.hpp (clearance flows, hydrostatic pads, orifices).
#include <cstddef>

#include "capi_common.hpp"
#include "pumploss/gap.hpp"
#include "pumploss/orifice.hpp"

using pumploss::capi::call;
using pumploss::capi::call_value;
using pumploss::capi::call_batch;

extern "C" {

PUMPLOSS_API int PUMPLOSS_CALL pumploss_gap_plates_flow(double dp_pa, double mu_pa_s, double width_m, double height_m, double length_m, double wall_speed_m_s, double* q_m3_s) {
  return call_value(q_m3_s, [&] {
    return pumploss::gap_plates_flow(dp_pa, mu_pa_s, width_m, height_m, length_m, wall_speed_m_s);
  });
}

PUMPLOSS_API int PUMPLOSS_CALL pumploss_gap_plates_height(double q_m3_s, double dp_pa, double mu_pa_s, double width_m, double length_m, double* height_m) {
  return call_value(height_m, [&] { return pumploss::gap_plates_height(q_m3_s, dp_pa, mu_pa_s, width_m, length_m); });
}

PUMPLOSS_API int PUMPLOSS_CALL pumploss_gap_plates_height_couette(double q_m3_s, double dp_pa, double mu_pa_s, double width_m, double length_m, double wall_speed_m_s, double* height_m) {
  return call_value(height_m, [&] {
    return pumploss::gap_plates_height_couette(q_m3_s, dp_pa, mu_pa_s, width_m, length_m, wall_speed_m_s);
  });
}

PUMPLOSS_API int PUMPLOSS_CALL pumploss_gap_plates_velocity(double dp_pa, double mu_pa_s, double height_m, double length_m, double wall_speed_m_s, double y_m, double* u_m_s) {
  return call_value(u_m_s, [&] {
    return pumploss::gap_plates_velocity(dp_pa, mu_pa_s, height_m, length_m, wall_speed_m_s, y_m);
  });
}

PUMPLOSS_API int PUMPLOSS_CALL pumploss_gap_plates_shear_force(double dp_pa, double mu_pa_s, double width_m, double height_m, double length_m, double wall_speed_m_s, double* force_n) {
  return call_value(force_n, [&] {
    return pumploss::gap_plates_shear_force(dp_pa, mu_pa_s, width_m, height_m, length_m, wall_speed_m_s);
  });
}

PUMPLOSS_API int PUMPLOSS_CALL pumploss_gap_plates_power_loss(double dp_pa, double mu_pa_s, double width_m, double height_m, double length_m, double wall_speed_m_s, double* power_w) {
  return call_value(power_w, [&] {
    return pumploss::gap_plates_power_loss(dp_pa, mu_pa_s, width_m, height_m, length_m, wall_speed_m_s);
  });
}

PUMPLOSS_API int PUMPLOSS_CALL pumploss_gap_annulus_flow(double dp_pa, double mu_pa_s, double bore_diameter_m, double piston_diameter_m, double length_m, double eccentricity_ratio, double* q_m3_s) {
  return call_value(q_m3_s, [&] {
    return pumploss::gap_annulus_flow(dp_pa, mu_pa_s, bore_diameter_m, piston_diameter_m, length_m, eccentricity_ratio);
  });
}

PUMPLOSS_API int PUMPLOSS_CALL pumploss_gap_annulus_narrow_flow(double dp_pa, double mu_pa_s, double bore_diameter_m, double piston_diameter_m, double length_m, double eccentricity_ratio, double* q_m3_s) {
  return call_value(q_m3_s, [&] {
    return pumploss::gap_annulus_narrow_flow(dp_pa, mu_pa_s, bore_diameter_m, piston_diameter_m, length_m, eccentricity_ratio);
  });
}

PUMPLOSS_API int PUMPLOSS_CALL pumploss_gap_annulus_drag_flow(double bore_diameter_m, double piston_diameter_m, double eccentricity_ratio, double piston_speed_m_s, double* q_m3_s) {
  return call_value(q_m3_s, [&] {
    return pumploss::gap_annulus_drag_flow(bore_diameter_m, piston_diameter_m, eccentricity_ratio, piston_speed_m_s);
  });
}

PUMPLOSS_API int PUMPLOSS_CALL pumploss_gap_piston_leakage(double dp_pa, double mu_pa_s, double bore_diameter_m, double piston_diameter_m, double length_m, double eccentricity_ratio, double piston_speed_m_s, double* q_m3_s) {
  return call_value(q_m3_s, [&] {
    return pumploss::gap_piston_leakage(dp_pa, mu_pa_s, bore_diameter_m, piston_diameter_m, length_m, eccentricity_ratio, piston_speed_m_s);
  });
}

PUMPLOSS_API int PUMPLOSS_CALL pumploss_gap_annulus_clearance(double q_m3_s, double dp_pa, double mu_pa_s, double bore_diameter_m, double length_m, double eccentricity_ratio, double* clearance_m) {
  return call_value(clearance_m, [&] {
    return pumploss::gap_annulus_clearance(q_m3_s, dp_pa, mu_pa_s, bore_diameter_m, length_m, eccentricity_ratio);
  });
}

PUMPLOSS_API int PUMPLOSS_CALL pumploss_gap_radial_flow(double dp_pa, double mu_pa_s, double inner_radius_m, double outer_radius_m, double height_m, double* q_m3_s) {
  return call_value(q_m3_s, [&] {
    return pumploss::gap_radial_flow(dp_pa, mu_pa_s, inner_radius_m, outer_radius_m, height_m);
  });
}

PUMPLOSS_API int PUMPLOSS_CALL pumploss_gap_radial_sector_flow(double dp_pa, double mu_pa_s, double inner_radius_m, double outer_radius_m, double height_m, double angle_rad, double* q_m3_s) {
  return call_value(q_m3_s, [&] {
    return pumploss::gap_radial_sector_flow(dp_pa, mu_pa_s, inner_radius_m, outer_radius_m, height_m, angle_rad);
  });
}

PUMPLOSS_API int PUMPLOSS_CALL pumploss_gap_radial_height(double q_m3_s, double dp_pa, double mu_pa_s, double inner_radius_m, double outer_radius_m, double* height_m) {
  return call_value(height_m, [&] {
    return pumploss::gap_radial_height(q_m3_s, dp_pa, mu_pa_s, inner_radius_m, outer_radius_m);
  });
}

PUMPLOSS_API int PUMPLOSS_CALL pumploss_gap_radial_pressure(double inner_pressure_pa, double outer_pressure_pa, double inner_radius_m, double outer_radius_m, double radius_m, double* p_pa) {
  return call_value(p_pa, [&] {
    return pumploss::gap_radial_pressure(inner_pressure_pa, outer_pressure_pa, inner_radius_m, outer_radius_m, radius_m);
  });
}

PUMPLOSS_API int PUMPLOSS_CALL pumploss_gap_radial_land_force(double inner_pressure_pa, double outer_pressure_pa, double inner_radius_m, double outer_radius_m, double angle_rad, double* force_n) {
  return call_value(force_n, [&] {
    return pumploss::gap_radial_land_force(inner_pressure_pa, outer_pressure_pa, inner_radius_m, outer_radius_m, angle_rad);
  });
}

PUMPLOSS_API int PUMPLOSS_CALL pumploss_gap_pad_capillary_height(double supply_pressure_pa, double mu_pa_s, double capillary_diameter_m, double capillary_length_m, double inner_radius_m, double outer_radius_m, double load_n, double* height_m) {
  return call_value(height_m, [&] {
    return pumploss::gap_pad_capillary_height(supply_pressure_pa, mu_pa_s, capillary_diameter_m, capillary_length_m, inner_radius_m, outer_radius_m, load_n);
  });
}

PUMPLOSS_API int PUMPLOSS_CALL pumploss_gap_pad_orifice_height(double supply_pressure_pa, double rho_kg_m3, double mu_pa_s, double orifice_diameter_m, double cd, double inner_radius_m, double outer_radius_m, double load_n, double* height_m) {
  return call_value(height_m, [&] {
    return pumploss::gap_pad_orifice_height(supply_pressure_pa, rho_kg_m3, mu_pa_s, orifice_diameter_m, cd, inner_radius_m, outer_radius_m, load_n);
  });
}

PUMPLOSS_API int PUMPLOSS_CALL pumploss_gap_reynolds(double q_m3_s, double width_m, double rho_kg_m3, double mu_pa_s, double* re) {
  return call_value(re, [&] { return pumploss::gap_reynolds(q_m3_s, width_m, rho_kg_m3, mu_pa_s); });
}

PUMPLOSS_API int PUMPLOSS_CALL pumploss_orifice_flow(double dp_pa, double rho_kg_m3, double diameter_m, double cd, double* q_m3_s) {
  return call_value(q_m3_s, [&] { return pumploss::orifice_flow(dp_pa, rho_kg_m3, diameter_m, cd); });
}

PUMPLOSS_API int PUMPLOSS_CALL pumploss_orifice_dp(double q_m3_s, double rho_kg_m3, double diameter_m, double cd, double* dp_pa) {
  return call_value(dp_pa, [&] { return pumploss::orifice_dp(q_m3_s, rho_kg_m3, diameter_m, cd); });
}

PUMPLOSS_API int PUMPLOSS_CALL pumploss_orifice_diameter(double q_m3_s, double dp_pa, double rho_kg_m3, double cd, double* diameter_m) {
  return call_value(diameter_m, [&] { return pumploss::orifice_diameter(q_m3_s, dp_pa, rho_kg_m3, cd); });
}

PUMPLOSS_API int PUMPLOSS_CALL pumploss_orifice_reynolds(double q_m3_s, double diameter_m, double rho_kg_m3, double mu_pa_s, double* re) {
  return call_value(re, [&] { return pumploss::orifice_reynolds(q_m3_s, diameter_m, rho_kg_m3, mu_pa_s); });
}

PUMPLOSS_API int PUMPLOSS_CALL pumploss_orifice_flow_viscous(double dp_pa, double rho_kg_m3, double mu_pa_s, double diameter_m, double cd_inf, double delta, double* q_m3_s) {
  return call_value(q_m3_s, [&] {
    return pumploss::orifice_flow_viscous(dp_pa, rho_kg_m3, mu_pa_s, diameter_m, cd_inf, delta);
  });
}

PUMPLOSS_API int PUMPLOSS_CALL pumploss_capillary_flow(double dp_pa, double rho_kg_m3, double mu_pa_s, double diameter_m, double length_m, double loss_coefficient, double* q_m3_s) {
  return call_value(q_m3_s, [&] {
    return pumploss::capillary_flow(dp_pa, rho_kg_m3, mu_pa_s, diameter_m, length_m, loss_coefficient);
  });
}

PUMPLOSS_API int PUMPLOSS_CALL pumploss_capillary_dp(double q_m3_s, double rho_kg_m3, double mu_pa_s, double diameter_m, double length_m, double loss_coefficient, double* dp_pa) {
  return call_value(dp_pa, [&] {
    return pumploss::capillary_dp(q_m3_s, rho_kg_m3, mu_pa_s, diameter_m, length_m, loss_coefficient);
  });
}

PUMPLOSS_API int PUMPLOSS_CALL pumploss_orifice_series_cda(double cda1_m2, double cda2_m2, double* cda_m2) {
  return call_value(cda_m2, [&] { return pumploss::orifice_series_cda(cda1_m2, cda2_m2); });
}

PUMPLOSS_API int PUMPLOSS_CALL pumploss_orifice_parallel_cda(double cda1_m2, double cda2_m2, double* cda_m2) {
  return call_value(cda_m2, [&] { return pumploss::orifice_parallel_cda(cda1_m2, cda2_m2); });
}

PUMPLOSS_API int PUMPLOSS_CALL pumploss_orifice_flow_cda(double dp_pa, double rho_kg_m3, double cda_m2, double* q_m3_s) {
  return call_value(q_m3_s, [&] { return pumploss::orifice_flow_cda(dp_pa, rho_kg_m3, cda_m2); });
}

PUMPLOSS_API int PUMPLOSS_CALL pumploss_gap_pad_capillary(double supply_pressure_pa, double mu_pa_s, double capillary_diameter_m, double capillary_length_m, double inner_radius_m, double outer_radius_m, double height_m, double piston_diameter_m, double* pocket_pressure_pa, double* q_m3_s, double* force_n, double* balance_ratio) {
  return call({pocket_pressure_pa, q_m3_s, force_n, balance_ratio}, [&] {
    const auto r = pumploss::gap_pad_capillary(supply_pressure_pa, mu_pa_s, capillary_diameter_m, capillary_length_m, inner_radius_m, outer_radius_m, height_m, piston_diameter_m);
    *pocket_pressure_pa = r.pocket_pressure_pa;
    *q_m3_s = r.q_m3_s;
    *force_n = r.force_n;
    *balance_ratio = r.balance_ratio;
    return r.st;
  });
}

PUMPLOSS_API int PUMPLOSS_CALL pumploss_gap_pad_orifice(double supply_pressure_pa, double rho_kg_m3, double mu_pa_s, double orifice_diameter_m, double cd, double inner_radius_m, double outer_radius_m, double height_m, double piston_diameter_m, double* pocket_pressure_pa, double* q_m3_s, double* force_n, double* balance_ratio) {
  return call({pocket_pressure_pa, q_m3_s, force_n, balance_ratio}, [&] {
    const auto r = pumploss::gap_pad_orifice(supply_pressure_pa, rho_kg_m3, mu_pa_s, orifice_diameter_m, cd, inner_radius_m, outer_radius_m, height_m, piston_diameter_m);
    *pocket_pressure_pa = r.pocket_pressure_pa;
    *q_m3_s = r.q_m3_s;
    *force_n = r.force_n;
    *balance_ratio = r.balance_ratio;
    return r.st;
  });
}

PUMPLOSS_API int PUMPLOSS_CALL pumploss_gap_plates_flow_batch(size_t n, const double* dp_pa, const double* mu_pa_s, const double* width_m, const double* height_m, const double* length_m, const double* wall_speed_m_s, double* q_m3_s, int* status) {
  return call_batch(n, {q_m3_s}, status, dp_pa != nullptr && mu_pa_s != nullptr && width_m != nullptr && height_m != nullptr && length_m != nullptr && wall_speed_m_s != nullptr, [&](std::size_t i) {
    const auto r = pumploss::gap_plates_flow(dp_pa[i], mu_pa_s[i], width_m[i], height_m[i], length_m[i], wall_speed_m_s[i]);
    q_m3_s[i] = r.value;
    return r.st;
  });
}

PUMPLOSS_API int PUMPLOSS_CALL pumploss_gap_annulus_flow_batch(size_t n, const double* dp_pa, const double* mu_pa_s, const double* bore_diameter_m, const double* piston_diameter_m, const double* length_m, const double* eccentricity_ratio, double* q_m3_s, int* status) {
  return call_batch(n, {q_m3_s}, status, dp_pa != nullptr && mu_pa_s != nullptr && bore_diameter_m != nullptr && piston_diameter_m != nullptr && length_m != nullptr && eccentricity_ratio != nullptr, [&](std::size_t i) {
    const auto r = pumploss::gap_annulus_flow(dp_pa[i], mu_pa_s[i], bore_diameter_m[i], piston_diameter_m[i], length_m[i], eccentricity_ratio[i]);
    q_m3_s[i] = r.value;
    return r.st;
  });
}

PUMPLOSS_API int PUMPLOSS_CALL pumploss_gap_radial_flow_batch(size_t n, const double* dp_pa, const double* mu_pa_s, const double* inner_radius_m, const double* outer_radius_m, const double* height_m, double* q_m3_s, int* status) {
  return call_batch(n, {q_m3_s}, status, dp_pa != nullptr && mu_pa_s != nullptr && inner_radius_m != nullptr && outer_radius_m != nullptr && height_m != nullptr, [&](std::size_t i) {
    const auto r = pumploss::gap_radial_flow(dp_pa[i], mu_pa_s[i], inner_radius_m[i], outer_radius_m[i], height_m[i]);
    q_m3_s[i] = r.value;
    return r.st;
  });
}

PUMPLOSS_API int PUMPLOSS_CALL pumploss_orifice_flow_batch(size_t n, const double* dp_pa, const double* rho_kg_m3, const double* diameter_m, const double* cd, double* q_m3_s, int* status) {
  return call_batch(n, {q_m3_s}, status, dp_pa != nullptr && rho_kg_m3 != nullptr && diameter_m != nullptr && cd != nullptr, [&](std::size_t i) {
    const auto r = pumploss::orifice_flow(dp_pa[i], rho_kg_m3[i], diameter_m[i], cd[i]);
    q_m3_s[i] = r.value;
    return r.st;
  });
}

}  // extern "C"
