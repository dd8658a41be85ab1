/* A C caller of the pumploss C API, built as C89 and as C11. Calls every function of
 * pumploss.h at least once with good input and once with bad input, and checks status codes
 * and NaN outputs. Check values: see tests/reference/SOURCES.md. */
#include <math.h>
#include <stdio.h>
#include <string.h>

#include "pumploss.h"

static int failures = 0;
static int checks = 0;

static int is_nan(double x) { return x != x; }

static void check_true(int cond, const char *what, int line) {
  ++checks;
  if (!cond) {
    ++failures;
    printf("FAIL line %d: %s\n", line, what);
  }
}
#define CHECK(c) check_true((c) ? 1 : 0, #c, __LINE__)

static int near_rel(double got, double want, double tol) {
  if (want == 0.0) return fabs(got) <= tol;
  return fabs((got - want) / want) <= tol;
}

static void test_core(void) {
  char buf[32];
  CHECK(strcmp(pumploss_version(), PUMPLOSS_VERSION) == 0);
  CHECK(pumploss_version_number() == PUMPLOSS_VERSION_NUMBER);
  sprintf(buf, "%d.%d.%d", PUMPLOSS_VERSION_MAJOR, PUMPLOSS_VERSION_MINOR, PUMPLOSS_VERSION_PATCH);
  CHECK(strcmp(buf, PUMPLOSS_VERSION) == 0);
  CHECK(strcmp(pumploss_status_message(PUMPLOSS_OK), "Success.") == 0);
  CHECK(pumploss_status_message(-12345) != NULL);
  CHECK(strlen(pumploss_status_message(PUMPLOSS_EUNIT)) > 10);
}

static void test_units(void) {
  double out = 0.0;
  /* NIST SP 811 (2008) B.8: 1 psi = 6.894757E+03 Pa */
  CHECK(pumploss_unit_convert(1.0, "psi", "Pa", &out) == PUMPLOSS_OK && near_rel(out, 6894.757, 1e-7));
  /* exact: 212 degF = 100 degC */
  CHECK(pumploss_unit_convert(212.0, "degF", "degC", &out) == PUMPLOSS_OK && fabs(out - 100.0) < 1e-12);
  CHECK(pumploss_unit_convert(1.0, "bar", "L/min", &out) == PUMPLOSS_EDIMENSION && is_nan(out));
  CHECK(pumploss_unit_convert(1.0, "BAR", "Pa", &out) == PUMPLOSS_EUNIT && is_nan(out));
  CHECK(pumploss_unit_convert(1.0, NULL, "Pa", &out) == PUMPLOSS_EMISUSE && is_nan(out));
  CHECK(pumploss_unit_convert(1.0, "bar", "Pa", NULL) == PUMPLOSS_EMISUSE);
}

static void test_fluid(void) {
  double nu = 0.0, a = 0.0, b = 0.0, mid = 0.0, lo = 0.0, hi = 0.0, sus = 0.0, mu = 0.0, rho = 0.0;
  double t_ref = 0.0, alpha = 0.0, kmod = 0.0, cp = 0.0, barus = 0.0;
  /* ASTM D341 worked example: 32 and 5.4 mm2/s at 40 and 100 degC give 8.5 mm2/s at 80 degC */
  CHECK(pumploss_viscosity_d341(313.15, 32e-6, 373.15, 5.4e-6, 353.15, &nu) == PUMPLOSS_OK &&
        fabs(nu - 8.53e-6) < 0.01e-6);
  CHECK(pumploss_viscosity_d341(313.15, -1.0, 373.15, 5.4e-6, 353.15, &nu) == PUMPLOSS_EDOMAIN && is_nan(nu));
  CHECK(pumploss_d341_coefficients(313.0, 32e-6, 373.0, 5.4e-6, &a, &b) == PUMPLOSS_OK &&
        fabs(a - 9.5259) < 1e-4 && fabs(b - 3.7449) < 1e-4);
  CHECK(pumploss_d341_coefficients(313.0, 32e-6, 313.0, 5.4e-6, &a, &b) == PUMPLOSS_EDOMAIN && is_nan(a) && is_nan(b));
  /* inverse D341: the line through 32 mm2/s at 313 K reaches 32 mm2/s at 313 K (self-calculated round trip) */
  CHECK(pumploss_d341_coefficients(313.0, 32e-6, 373.0, 5.4e-6, &a, &b) == PUMPLOSS_OK);
  CHECK(pumploss_d341_temperature(a, b, 32e-6, &nu) == PUMPLOSS_OK && fabs(nu - 313.0) < 1e-9);
  CHECK(pumploss_d341_temperature(a, b, -1.0, &nu) == PUMPLOSS_EDOMAIN && is_nan(nu));
  /* ISO 3448:1992: VG 46 spans 41.4 to 50.6 mm2/s */
  CHECK(pumploss_iso_vg(46, &mid, &lo, &hi) == PUMPLOSS_OK && near_rel(lo, 41.4e-6, 1e-12) &&
        near_rel(hi, 50.6e-6, 1e-12) && near_rel(mid, 46e-6, 1e-15));
  CHECK(pumploss_iso_vg(47, &mid, &lo, &hi) == PUMPLOSS_EDOMAIN && is_nan(mid) && is_nan(lo) && is_nan(hi));
  /* ASTM D2161 at 100 degF: 700 SUS = 151.0891 mm2/s */
  CHECK(pumploss_kinematic_from_sus(700.0, &nu) == PUMPLOSS_OK && near_rel(nu, 151.0891e-6, 1e-6));
  CHECK(pumploss_sus_from_kinematic(46e-6, &sus) == PUMPLOSS_OK && fabs(sus - 214.19) < 0.01);
  CHECK(pumploss_sus_from_kinematic(0.0, &sus) == PUMPLOSS_EDOMAIN && is_nan(sus));
  CHECK(pumploss_kinematic_from_sus(-5.0, &nu) == PUMPLOSS_EDOMAIN && is_nan(nu));
  CHECK(pumploss_dynamic_viscosity(46e-6, 870.0, &mu) == PUMPLOSS_OK && near_rel(mu, 0.04002, 1e-12));
  CHECK(pumploss_dynamic_viscosity(46e-6, 0.0, &mu) == PUMPLOSS_EDOMAIN && is_nan(mu));
  CHECK(pumploss_kinematic_viscosity(0.04002, 870.0, &nu) == PUMPLOSS_OK && near_rel(nu, 46e-6, 1e-12));
  CHECK(pumploss_kinematic_viscosity(0.04, -870.0, &nu) == PUMPLOSS_EDOMAIN && is_nan(nu));
  CHECK(pumploss_oil_density(870.0, 288.15, 6.5e-4, 1.4e9, 288.15, 1.4e7, &rho) == PUMPLOSS_OK &&
        near_rel(rho, 870.0 / 0.99, 1e-14));
  CHECK(pumploss_oil_density(870.0, 288.15, 6.5e-4, 1.4e9, 288.15, 1.4e9, &rho) == PUMPLOSS_EDOMAIN && is_nan(rho));
  CHECK(pumploss_viscosity_barus(0.04, 2e-8, 0.0, &mu) == PUMPLOSS_OK && mu == 0.04);
  CHECK(pumploss_viscosity_barus(0.04, 2e-8, -1.0, &mu) == PUMPLOSS_EDOMAIN && is_nan(mu));
  CHECK(pumploss_typical_mineral_oil(&rho, &t_ref, &alpha, &kmod, &cp, &barus) == PUMPLOSS_OK &&
        rho == 870.0 && t_ref == 288.15);
  CHECK(pumploss_typical_mineral_oil(&rho, NULL, &alpha, &kmod, &cp, &barus) == PUMPLOSS_EMISUSE && is_nan(rho));
}

static void test_gap(void) {
  double q = 0.0, h = 0.0, u = 0.0, f = 0.0, p = 0.0, re = 0.0, w = 0.0, pr = 0.0, bal = 0.0, cda = 0.0;
  double nan = 0.0;
  double dpv[3], muv[3], bv[3], pv[3], lv[3], ev[3], outv[3];
  int st[3];
  int i;
  nan = nan / nan;
  /* self-calculated (selfcalc_methods13, tests/reference/SOURCES.md): piston 20 mm, h 10 um, L 30 mm, 250 bar, 0.040 Pa s */
  CHECK(pumploss_gap_annulus_flow(250e5, 0.040, 0.02002, 0.02, 0.03, 0.0, &q) == PUMPLOSS_OK &&
        near_rel(q * 60000.0, 6.548257296354804e-3, 1e-12));
  CHECK(pumploss_gap_annulus_flow(250e5, 0.040, 0.02, 0.02002, 0.03, 0.0, &q) == PUMPLOSS_EDOMAIN && is_nan(q));
  CHECK(pumploss_gap_annulus_flow(250e5, 0.040, 0.02002, 0.02, 0.03, 1.5, &q) == PUMPLOSS_EDOMAIN && is_nan(q));
  CHECK(pumploss_gap_annulus_flow(250e5, nan, 0.02002, 0.02, 0.03, 0.5, &q) == PUMPLOSS_ENONFINITE && is_nan(q));
  CHECK(pumploss_gap_annulus_flow(250e5, 0.040, 0.02002, 0.02, 0.03, 0.5, NULL) == PUMPLOSS_EMISUSE);
  CHECK(pumploss_gap_annulus_narrow_flow(250e5, 0.040, 0.02002, 0.02, 0.03, 1.0, &q) == PUMPLOSS_OK &&
        near_rel(q, 2.5 * 3.141592653589793 * 0.02001 * 1e-15 * 250e5 / (12.0 * 0.040 * 0.03), 1e-12));
  CHECK(pumploss_gap_annulus_narrow_flow(250e5, 0.040, 0.03, 0.02, 0.03, 0.0, &q) == PUMPLOSS_WREGIME && q > 0.0);
  CHECK(pumploss_gap_annulus_drag_flow(0.02002, 0.02, 0.0, 1.0, &q) == PUMPLOSS_OK &&
        near_rel(q, 3.141592653589793 * 0.02001 * 1e-5 / 2.0, 1e-3));
  CHECK(pumploss_gap_annulus_drag_flow(0.02002, 0.02, -0.1, 1.0, &q) == PUMPLOSS_EDOMAIN && is_nan(q));
  CHECK(pumploss_gap_piston_leakage(250e5, 0.040, 0.02002, 0.02, 0.03, 0.0, 0.0, &q) == PUMPLOSS_OK &&
        near_rel(q * 60000.0, 6.548257296354804e-3, 1e-12));
  CHECK(pumploss_gap_piston_leakage(250e5, 0.0, 0.02002, 0.02, 0.03, 0.0, 0.0, &q) == PUMPLOSS_EDOMAIN && is_nan(q));
  CHECK(pumploss_gap_annulus_clearance(6.548257296354804e-3 / 60000.0, 250e5, 0.040, 0.02002, 0.03, 0.0, &h) ==
            PUMPLOSS_OK && near_rel(h, 10e-6, 1e-9));
  CHECK(pumploss_gap_annulus_clearance(-1e-6, 250e5, 0.040, 0.02002, 0.03, 0.0, &h) == PUMPLOSS_EDOMAIN && is_nan(h));
  /* plates: hand arithmetic b h^3 dp/(12 mu L) + b h U/2 */
  CHECK(pumploss_gap_plates_flow(1e6, 0.04, 0.01, 1e-5, 0.02, 2.0, &q) == PUMPLOSS_OK &&
        near_rel(q, 0.01 * 1e-15 * 1e6 / (12.0 * 0.04 * 0.02) + 0.01 * 1e-5, 1e-14));
  CHECK(pumploss_gap_plates_flow(1e6, 0.04, 0.01, -1e-5, 0.02, 2.0, &q) == PUMPLOSS_EDOMAIN && is_nan(q));
  CHECK(pumploss_gap_plates_height(0.01 * 1e-15 * 1e6 / (12.0 * 0.04 * 0.02), 1e6, 0.04, 0.01, 0.02, &h) ==
            PUMPLOSS_OK && near_rel(h, 1e-5, 1e-14));
  CHECK(pumploss_gap_plates_height(0.0, 1e6, 0.04, 0.01, 0.02, &h) == PUMPLOSS_EDOMAIN && is_nan(h));
  CHECK(pumploss_gap_plates_height_couette(0.01 * 1e-15 * 1e6 / (12.0 * 0.04 * 0.02) + 0.01 * 1e-5, 1e6, 0.04, 0.01,
                                           0.02, 2.0, &h) == PUMPLOSS_OK && near_rel(h, 1e-5, 1e-14));
  CHECK(pumploss_gap_plates_height_couette(1e-9, -1.0, 0.04, 0.01, 0.02, 2.0, &h) == PUMPLOSS_EDOMAIN && is_nan(h));
  CHECK(pumploss_gap_plates_velocity(1e6, 0.04, 1e-5, 0.02, 2.0, 1e-5, &u) == PUMPLOSS_OK && near_rel(u, 2.0, 1e-15));
  CHECK(pumploss_gap_plates_velocity(1e6, 0.04, 1e-5, 0.02, 2.0, 2e-5, &u) == PUMPLOSS_EDOMAIN && is_nan(u));
  CHECK(pumploss_gap_plates_shear_force(0.0, 0.04, 0.01, 1e-5, 0.02, 2.0, &f) == PUMPLOSS_OK &&
        near_rel(f, 0.04 * 2.0 * 0.01 * 0.02 / 1e-5, 1e-14));
  CHECK(pumploss_gap_plates_shear_force(0.0, 0.04, 0.01, 0.0, 0.02, 2.0, &f) == PUMPLOSS_EDOMAIN && is_nan(f));
  CHECK(pumploss_gap_plates_power_loss(1e6, 0.04, 0.01, 1e-5, 0.02, 0.0, &p) == PUMPLOSS_OK &&
        near_rel(p, 1e6 * 0.01 * 1e-15 * 1e6 / (12.0 * 0.04 * 0.02), 1e-14));
  CHECK(pumploss_gap_plates_power_loss(1e6, 0.04, 0.01, 1e-5, nan, 0.0, &p) == PUMPLOSS_ENONFINITE && is_nan(p));
  /* radial (selfcalc_methods13, self-calculated): 0.16344 L/min, W = 48.43 kN */
  CHECK(pumploss_gap_radial_flow(250e5, 0.040, 0.02, 0.03, 15e-6, &q) == PUMPLOSS_OK &&
        near_rel(q * 60000.0, 0.16343692394607145, 1e-13));
  CHECK(pumploss_gap_radial_flow(250e5, 0.040, 0.03, 0.02, 15e-6, &q) == PUMPLOSS_EDOMAIN && is_nan(q));
  CHECK(pumploss_gap_radial_sector_flow(250e5, 0.040, 0.02, 0.03, 15e-6, 3.141592653589793, &q) == PUMPLOSS_OK &&
        near_rel(q * 60000.0, 0.5 * 0.16343692394607145, 1e-13));
  CHECK(pumploss_gap_radial_sector_flow(250e5, 0.040, 0.02, 0.03, 15e-6, 7.0, &q) == PUMPLOSS_EDOMAIN && is_nan(q));
  CHECK(pumploss_gap_radial_height(0.16343692394607145 / 60000.0, 250e5, 0.040, 0.02, 0.03, &h) == PUMPLOSS_OK &&
        near_rel(h, 15e-6, 1e-13));
  CHECK(pumploss_gap_radial_height(1e-6, 0.0, 0.040, 0.02, 0.03, &h) == PUMPLOSS_EDOMAIN && is_nan(h));
  CHECK(pumploss_gap_radial_pressure(250e5, 0.0, 0.02, 0.03, 0.02, &p) == PUMPLOSS_OK && near_rel(p, 250e5, 1e-15));
  CHECK(pumploss_gap_radial_pressure(250e5, 0.0, 0.02, 0.03, 0.04, &p) == PUMPLOSS_EDOMAIN && is_nan(p));
  CHECK(pumploss_gap_radial_land_force(250e5, 0.0, 0.02, 0.03, 6.283185307179586, &f) == PUMPLOSS_OK &&
        near_rel(f + 250e5 * 3.141592653589793 * 0.0004, 48425.75524328043, 1e-13));
  CHECK(pumploss_gap_radial_land_force(250e5, 0.0, 0.02, 0.03, 0.0, &f) == PUMPLOSS_EDOMAIN && is_nan(f));
  /* pads: the force at the inverse gap equals the load */
  CHECK(pumploss_gap_pad_capillary(250e5, 0.04, 0.8e-3, 0.02, 0.005, 0.008, 15e-6, 0.02, &pr, &q, &w, &bal) ==
            PUMPLOSS_OK && pr > 0.0 && pr < 250e5 && q > 0.0 && bal > 0.0);
  CHECK(pumploss_gap_pad_capillary_height(250e5, 0.04, 0.8e-3, 0.02, 0.005, 0.008, w, &h) == PUMPLOSS_OK &&
        near_rel(h, 15e-6, 1e-13));
  CHECK(pumploss_gap_pad_capillary(250e5, 0.04, 0.8e-3, 0.02, 0.005, 0.004, 15e-6, 0.02, &pr, &q, &w, &bal) ==
            PUMPLOSS_EDOMAIN && is_nan(pr) && is_nan(q) && is_nan(w) && is_nan(bal));
  CHECK(pumploss_gap_pad_capillary_height(250e5, 0.04, 0.8e-3, 0.02, 0.005, 0.008, 1e9, &h) == PUMPLOSS_EDOMAIN &&
        is_nan(h));
  CHECK(pumploss_gap_pad_orifice(250e5, 870.0, 0.04, 0.5e-3, 0.7, 0.005, 0.008, 15e-6, 0.02, &pr, &q, &w, &bal) ==
            PUMPLOSS_OK && pr > 0.0 && pr < 250e5);
  CHECK(pumploss_gap_pad_orifice_height(250e5, 870.0, 0.04, 0.5e-3, 0.7, 0.005, 0.008, w, &h) == PUMPLOSS_OK &&
        near_rel(h, 15e-6, 1e-12));
  CHECK(pumploss_gap_pad_orifice(250e5, 870.0, 0.04, 0.5e-3, 0.7, 0.005, 0.008, 15e-6, 0.02, &pr, NULL, &w, &bal) ==
            PUMPLOSS_EMISUSE && is_nan(pr));
  CHECK(pumploss_gap_pad_orifice_height(250e5, 870.0, 0.04, 0.5e-3, 1.5, 0.005, 0.008, 1.0, &h) == PUMPLOSS_EDOMAIN &&
        is_nan(h));
  CHECK(pumploss_gap_reynolds(1e-6, 0.0628, 870.0, 0.04, &re) == PUMPLOSS_OK && near_rel(re, 2.0 * 870.0 * 1e-6 / (0.04 * 0.0628), 1e-14));
  CHECK(pumploss_gap_reynolds(1.0, 0.0628, 870.0, 0.04, &re) == PUMPLOSS_WREGIME && re > 2000.0);
  CHECK(pumploss_gap_reynolds(1e-6, 0.0, 870.0, 0.04, &re) == PUMPLOSS_EDOMAIN && is_nan(re));
  /* orifice (selfcalc_methods13, self-calculated): d 1 mm, Cd 0.61, 100 bar, 870 kg/m3 -> 4.3584 L/min */
  CHECK(pumploss_orifice_flow(100e5, 870.0, 1e-3, 0.61, &q) == PUMPLOSS_OK && near_rel(q * 60000.0, 4.358392497267148, 1e-14));
  CHECK(pumploss_orifice_flow(100e5, 870.0, 1e-3, 1.2, &q) == PUMPLOSS_EDOMAIN && is_nan(q));
  CHECK(pumploss_orifice_dp(4.358392497267148 / 60000.0, 870.0, 1e-3, 0.61, &p) == PUMPLOSS_OK && near_rel(p, 100e5, 1e-14));
  CHECK(pumploss_orifice_dp(1e-4, 0.0, 1e-3, 0.61, &p) == PUMPLOSS_EDOMAIN && is_nan(p));
  CHECK(pumploss_orifice_diameter(4.358392497267148 / 60000.0, 100e5, 870.0, 0.61, &h) == PUMPLOSS_OK && near_rel(h, 1e-3, 1e-14));
  CHECK(pumploss_orifice_diameter(-1e-4, 100e5, 870.0, 0.61, &h) == PUMPLOSS_EDOMAIN && is_nan(h));
  CHECK(pumploss_orifice_reynolds(1e-4, 1e-3, 870.0, 0.04, &re) == PUMPLOSS_OK && near_rel(re, 4.0 * 870.0 * 1e-4 / (3.141592653589793 * 1e-3 * 0.04), 1e-14));
  CHECK(pumploss_orifice_reynolds(1e-7, 1e-3, 870.0, 0.04, &re) == PUMPLOSS_WREGIME && re < 1000.0);
  CHECK(pumploss_orifice_flow_viscous(100e5, 870.0, 1e-6, 1e-3, 0.61, 0.16287, &q) == PUMPLOSS_OK &&
        near_rel(q * 60000.0, 4.358392497267148, 1e-3));
  CHECK(pumploss_orifice_flow_viscous(100e5, 870.0, -1.0, 1e-3, 0.61, 0.16287, &q) == PUMPLOSS_EDOMAIN && is_nan(q));
  CHECK(pumploss_capillary_flow(1e5, 870.0, 0.04, 1e-3, 0.05, 0.0, &q) == PUMPLOSS_OK &&
        near_rel(q, 1e5 * 3.141592653589793 * 1e-12 / (128.0 * 0.04 * 0.05), 1e-14));
  CHECK(pumploss_capillary_flow(1e5, 870.0, 0.04, 1e-3, 0.05, -1.0, &q) == PUMPLOSS_EDOMAIN && is_nan(q));
  CHECK(pumploss_capillary_dp(1e-6, 870.0, 0.04, 1e-3, 0.05, 0.0, &p) == PUMPLOSS_OK &&
        near_rel(p, 128.0 * 0.04 * 0.05 * 1e-6 / (3.141592653589793 * 1e-12), 1e-14));
  CHECK(pumploss_capillary_dp(1e-6, 870.0, 0.04, 0.0, 0.05, 0.0, &p) == PUMPLOSS_EDOMAIN && is_nan(p));
  CHECK(pumploss_orifice_series_cda(3e-6, 4e-6, &cda) == PUMPLOSS_OK && near_rel(cda, 12e-6 / 5.0, 1e-15));
  CHECK(pumploss_orifice_series_cda(0.0, 4e-6, &cda) == PUMPLOSS_EDOMAIN && is_nan(cda));
  CHECK(pumploss_orifice_parallel_cda(3e-6, 4e-6, &cda) == PUMPLOSS_OK && near_rel(cda, 7e-6, 1e-15));
  CHECK(pumploss_orifice_parallel_cda(-3e-6, 4e-6, &cda) == PUMPLOSS_EDOMAIN && is_nan(cda));
  CHECK(pumploss_orifice_flow_cda(100e5, 870.0, 0.61 * 3.141592653589793 * 0.25e-6, &q) == PUMPLOSS_OK &&
        near_rel(q * 60000.0, 4.358392497267148, 1e-14));
  CHECK(pumploss_orifice_flow_cda(100e5, 870.0, -1.0, &q) == PUMPLOSS_EDOMAIN && is_nan(q));
  /* batches: element 1 is bad (piston larger than bore, negative viscosity...) */
  for (i = 0; i < 3; ++i) {
    dpv[i] = 250e5; muv[i] = 0.04; bv[i] = 0.02002; pv[i] = 0.02; lv[i] = 0.03; ev[i] = 0.5 * i;
  }
  pv[1] = 0.03;
  CHECK(pumploss_gap_annulus_flow_batch(3, dpv, muv, bv, pv, lv, ev, outv, st) == PUMPLOSS_EPARTIAL &&
        st[0] == PUMPLOSS_OK && st[1] == PUMPLOSS_EDOMAIN && is_nan(outv[1]) && st[2] == PUMPLOSS_OK &&
        near_rel(outv[0] * 60000.0, 6.548257296354804e-3, 1e-12));
  CHECK(pumploss_gap_annulus_flow_batch(3, dpv, NULL, bv, pv, lv, ev, outv, st) == PUMPLOSS_EMISUSE && is_nan(outv[0]));
  lv[1] = 1e-5;
  CHECK(pumploss_gap_plates_flow_batch(3, dpv, muv, bv, lv, lv, ev, outv, st) == PUMPLOSS_OK && st[2] == PUMPLOSS_OK);
  CHECK(pumploss_gap_plates_flow_batch(3, dpv, muv, bv, lv, lv, ev, outv, NULL) == PUMPLOSS_EMISUSE);
  muv[2] = -1.0;
  pv[1] = 0.02;
  CHECK(pumploss_gap_radial_flow_batch(3, dpv, muv, pv, bv, lv, outv, st) == PUMPLOSS_EPARTIAL && st[2] == PUMPLOSS_EDOMAIN);
  CHECK(pumploss_gap_radial_flow_batch(2, dpv, muv, pv, bv, lv, outv, st) == PUMPLOSS_OK && st[1] == PUMPLOSS_OK);
  CHECK(pumploss_orifice_flow_batch(3, dpv, muv, pv, ev, outv, st) == PUMPLOSS_EPARTIAL && st[0] == PUMPLOSS_EDOMAIN);
  CHECK(pumploss_orifice_flow_batch(3, dpv, NULL, pv, ev, outv, st) == PUMPLOSS_EMISUSE);
}


static void test_friction(void) {
  double f = 0.0, dp = 0.0, v = 0.0, re = 0.0;
  double res[3], rrs[3], fs[3];
  double q[2], rho[2], mu[2], d[2], len[2], eps[2], dps[2];
  int sts[3];
  /* fluids_doc_friction (fluids documentation): Colebrook, Re = 1e5, eps/D = 1e-4 */
  CHECK(pumploss_friction_factor(1e5, 1e-4, &f) == PUMPLOSS_OK && fabs(f - 0.018513866077) < 1e-12);
  CHECK(pumploss_friction_factor(3000.0, 1e-4, &f) == PUMPLOSS_WTRANSITION && !is_nan(f));
  CHECK(pumploss_friction_factor(-1.0, 1e-4, &f) == PUMPLOSS_EDOMAIN && is_nan(f));
  CHECK(pumploss_friction_factor(1e5, 1e-4, NULL) == PUMPLOSS_EMISUSE);
  CHECK(pumploss_friction_factor_custom_laminar(1000.0, 0.0, 75.0, &f) == PUMPLOSS_OK && f == 0.075);
  CHECK(pumploss_friction_factor_custom_laminar(1000.0, 0.0, 0.0, &f) == PUMPLOSS_EDOMAIN && is_nan(f));
  CHECK(pumploss_friction_laminar(1000.0, 64.0, &f) == PUMPLOSS_OK && f == 0.064);
  CHECK(pumploss_friction_laminar(0.0, 64.0, &f) == PUMPLOSS_EDOMAIN && is_nan(f));
  CHECK(pumploss_friction_colebrook(1e4, 0.0, &f) == PUMPLOSS_OK && fabs(f - 0.030882950) < 1e-9);
  CHECK(pumploss_friction_colebrook(1e4, 2.0, &f) == PUMPLOSS_EDOMAIN && is_nan(f));
  /* fluids_doc_friction (fluids documentation) */
  CHECK(pumploss_friction_haaland(1e5, 1e-4, &f) == PUMPLOSS_OK && fabs(f - 0.018265053015) < 1e-12);
  CHECK(pumploss_friction_haaland(1e5, -1e-4, &f) == PUMPLOSS_EDOMAIN && is_nan(f));
  CHECK(pumploss_friction_swamee_jain(1e5, 1e-4, &f) == PUMPLOSS_OK && fabs(f - 0.018452424432) < 1e-7);
  CHECK(pumploss_friction_swamee_jain(HUGE_VAL, 1e-4, &f) == PUMPLOSS_ENONFINITE && is_nan(f));
  CHECK(pumploss_friction_churchill(1e5, 1e-4, &f) == PUMPLOSS_OK && fabs(f - 0.018462624566) < 1e-12);
  CHECK(pumploss_friction_churchill(0.0, 1e-4, &f) == PUMPLOSS_EDOMAIN && is_nan(f));
  CHECK(pumploss_pipe_velocity(1e-3, 0.02, &v) == PUMPLOSS_OK && near_rel(v, 3.183098861837907, 1e-14));
  CHECK(pumploss_pipe_velocity(1e-3, 0.0, &v) == PUMPLOSS_EDOMAIN && is_nan(v));
  CHECK(pumploss_pipe_reynolds(1e-3, 1000.0, 1e-3, 0.02, &re) == PUMPLOSS_OK && near_rel(re, 63661.97723675813, 1e-14));
  CHECK(pumploss_pipe_reynolds(1e-3, 1000.0, 0.0, 0.02, &re) == PUMPLOSS_EDOMAIN && is_nan(re));
  /* methods_row20 (self-calculated): 10 L/min, 1/2 in, 5 m, VG 46 at 20 degC: 1.52 bar */
  CHECK(pumploss_pipe_pressure_drop(10e-3 / 60, 870.0, 133.8e-6 * 870.0, 0.0127, 5.0, 0.0, &dp) == PUMPLOSS_OK &&
        fabs(dp - 1.52e5) < 0.006e5);
  CHECK(pumploss_pipe_pressure_drop(1e-4, 870.0, 0.04, 0.012, -1.0, 0.0, &dp) == PUMPLOSS_EDOMAIN && is_nan(dp));
  CHECK(pumploss_pipe_pressure_drop(1e-4, 870.0, 0.04, 0.012, 1.0, 0.02, &dp) == PUMPLOSS_EDOMAIN && is_nan(dp));
  CHECK(pumploss_pipe_flow(1e-4, 870.0, 0.04, 0.012, 2.0, 0.0, 64.0, &v, &re, &f, &dp) == PUMPLOSS_OK &&
        fabs(re * f - 64.0) < 1e-12);
  CHECK(pumploss_pipe_flow(1e-4, 870.0, 0.04, 0.012, 2.0, 0.0, 64.0, &v, &re, NULL, &dp) == PUMPLOSS_EMISUSE &&
        is_nan(v) && is_nan(dp));
  res[0] = 1e5; res[1] = 3000.0; res[2] = -5.0;
  rrs[0] = 1e-4; rrs[1] = 0.0; rrs[2] = 0.0;
  CHECK(pumploss_friction_factor_batch(3, res, rrs, fs, sts) == PUMPLOSS_EPARTIAL && sts[0] == PUMPLOSS_OK &&
        sts[1] == PUMPLOSS_WTRANSITION && sts[2] == PUMPLOSS_EDOMAIN && is_nan(fs[2]) &&
        fabs(fs[0] - 0.018513866077) < 1e-12);
  CHECK(pumploss_friction_factor_batch(3, res, NULL, fs, sts) == PUMPLOSS_EMISUSE && is_nan(fs[0]));
  q[0] = q[1] = 10e-3 / 60; rho[0] = rho[1] = 870.0; mu[0] = mu[1] = 133.8e-6 * 870.0;
  d[0] = 0.0127; d[1] = 0.0; len[0] = len[1] = 5.0; eps[0] = eps[1] = 0.0;
  CHECK(pumploss_pipe_pressure_drop_batch(2, q, rho, mu, d, len, eps, dps, sts) == PUMPLOSS_EPARTIAL &&
        fabs(dps[0] - 1.52e5) < 0.006e5 && sts[1] == PUMPLOSS_EDOMAIN && is_nan(dps[1]));
  CHECK(pumploss_pipe_pressure_drop_batch(1, q, rho, mu, d, len, eps, NULL, sts) == PUMPLOSS_EMISUSE);
}
static void test_line(void) {
  pumploss_line *h;
  double dp = 0.0, share = 0.0, q = 0.0, d = 0.0, v = 0.0, worst = 0.0, height = 0.0, k = 0.0;
  double t[3], pc[3], m[3], qs[2], dps[2];
  int pass[3], kind = 0;
  size_t n = 0;
  pumploss_line_destroy(NULL);
  CHECK(strlen(pumploss_line_last_message(NULL)) > 0);
  CHECK(pumploss_line_create(NULL) == PUMPLOSS_EMISUSE);
  CHECK(pumploss_line_create(&h) == PUMPLOSS_OK);
  CHECK(h != NULL);
  if (h == NULL) return;
  CHECK(pumploss_line_add_pipe(h, 0.0, 5.0, 0.0) == PUMPLOSS_EDOMAIN);
  CHECK(strlen(pumploss_line_last_message(h)) > 0);
  CHECK(pumploss_line_add_pipe(h, 0.0127, 5.0, 0.0) == PUMPLOSS_OK);
  CHECK(pumploss_line_add_fitting_k(h, 0.0127, -1.0) == PUMPLOSS_EDOMAIN);
  CHECK(pumploss_line_add_fitting_l_over_d(h, 0.0127, 8.0) == PUMPLOSS_OK);
  CHECK(pumploss_line_add_fitting_hooper(h, 0.0127, 800.0, 0.4) == PUMPLOSS_OK);
  CHECK(pumploss_line_add_fitting_darby(h, 0.0127, 800.0, 0.14, 4.0) == PUMPLOSS_OK);
  CHECK(pumploss_line_add_component_power(h, 1e-4, 0.0, 1.0, 46e-6, 1.0) == PUMPLOSS_OK);
  qs[0] = 1e-4; qs[1] = 2e-4; dps[0] = 0.0; dps[1] = 0.0;
  CHECK(pumploss_line_add_component_points(h, 2, qs, dps, 46e-6, 1.0) == PUMPLOSS_OK);
  CHECK(pumploss_line_add_component_points(h, 2, NULL, dps, 46e-6, 1.0) == PUMPLOSS_EMISUSE);
  CHECK(pumploss_line_add_fitting_k(h, 0.0127, 1.0) == PUMPLOSS_OK);
  CHECK(pumploss_line_element_count(h, &n) == PUMPLOSS_OK && n == 7);
  CHECK(pumploss_line_set_height(h, 0.0) == PUMPLOSS_OK);
  CHECK(pumploss_line_height(h, &height) == PUMPLOSS_OK && height == 0.0);
  /* methods_row20 (self-calculated): 1.52 bar in the pipe at 20 degC */
  CHECK(pumploss_line_element_pressure_drop(h, 0, 10e-3 / 60, 870.0, 133.8e-6 * 870.0, &dp, &share) ==
            PUMPLOSS_WREGIME && fabs(dp - 1.52e5) < 0.006e5 && share > 0.9 && share < 1.0);
  CHECK(pumploss_line_pressure_drop(h, 10e-3 / 60, 870.0, 0.0, &dp) == PUMPLOSS_EDOMAIN && is_nan(dp));
  CHECK(pumploss_line_pressure_drop_at(h, 10e-3 / 60, 293.15, &dp) == PUMPLOSS_EMISUSE && is_nan(dp));
  CHECK(pumploss_line_set_oil(h, 313.15, 46e-6, 373.15, 6.8e-6, 870.0, 288.15) == PUMPLOSS_OK);
  CHECK(pumploss_line_set_oil(h, 313.15, 46e-6, 313.15, 6.8e-6, 870.0, 288.15) == PUMPLOSS_EDOMAIN);
  CHECK(pumploss_line_pressure_drop_at(h, 10e-3 / 60, 293.15, &dp) == PUMPLOSS_WREGIME && dp > 1.5e5);
  CHECK(pumploss_line_flow_for_pressure(h, 1e5, 870.0, 0.04, &q) == PUMPLOSS_WREGIME && q > 0.0);
  CHECK(pumploss_line_flow_for_pressure(h, -1e5, 870.0, 0.04, &q) == PUMPLOSS_EVALIDITY && is_nan(q));
  CHECK(pumploss_line_drain_check(h, 10e-3 / 60, 273.15, 323.15, 3, 0.0, 2e5, t, pc, m, pass, &worst) ==
            PUMPLOSS_WREGIME && pass[0] == 0 && pass[2] == 1 && worst == m[0]);
  CHECK(pumploss_line_drain_check(h, 10e-3 / 60, 273.15, 323.15, 0, 0.0, 2e5, t, pc, m, pass, &worst) ==
            PUMPLOSS_EDOMAIN && is_nan(worst));
  CHECK(pumploss_line_size_drain(h, 10e-3 / 60, 273.15, 323.15, 6, 0.0, 2e5, 1.5, PUMPLOSS_BORE_TUBE | PUMPLOSS_BORE_HOSE, &d, &v, &worst) !=
            PUMPLOSS_EVALIDITY && d > 0.0127 && v <= 1.5 && worst >= 0.0);
  CHECK(pumploss_line_size_drain(h, 10e-3 / 60, 273.15, 323.15, 6, 0.0, -1.0, 1.5, 3, &d, &v, &worst) ==
            PUMPLOSS_EVALIDITY && is_nan(d));
  pumploss_line_destroy(h);
  {
    size_t nb = 0;
    CHECK(pumploss_standard_bore_count(&nb) == PUMPLOSS_OK && nb > 10);
    CHECK(pumploss_standard_bore_count(NULL) == PUMPLOSS_EMISUSE);
    CHECK(pumploss_standard_bore(0, &d, &kind) == PUMPLOSS_OK && d > 0.0 && (kind == 1 || kind == 2));
    CHECK(pumploss_standard_bore(nb, &d, &kind) == PUMPLOSS_EDOMAIN && is_nan(d));
    CHECK(pumploss_standard_bore((size_t)-1, &d, &kind) == PUMPLOSS_EDOMAIN && is_nan(d));
  }
  /* fluids_fittings (fluids documentation) */
  CHECK(pumploss_friction_factor_ft(0.1, &k) == PUMPLOSS_OK && fabs(k - 0.0162885) < 1e-7);
  CHECK(pumploss_friction_factor_ft(-0.1, &k) == PUMPLOSS_EDOMAIN && is_nan(k));
  CHECK(pumploss_k_hooper(1500.0, 4.0, 0.0508, 1e4, &k) == PUMPLOSS_OK && fabs(k - 6.15) < 1e-12);
  CHECK(pumploss_k_hooper(1500.0, 4.0, 0.0508, 0.0, &k) == PUMPLOSS_EDOMAIN && is_nan(k));
  CHECK(pumploss_k_darby(950.0, 0.25, 4.0, 12.0, 1e4, &k) == PUMPLOSS_OK && fabs(k - 0.8195103) < 1e-7);
  CHECK(pumploss_k_darby(950.0, 0.25, 4.0, -12.0, 1e4, &k) == PUMPLOSS_EDOMAIN && is_nan(k));
  CHECK(pumploss_equivalent_length(0.5, 0.02, 0.025, &d) == PUMPLOSS_OK && fabs(d - 0.4) < 1e-15);
  CHECK(pumploss_equivalent_length(0.5, 0.02, 0.0, &d) == PUMPLOSS_EDOMAIN && is_nan(d));
}

static void test_efficiency(void) {
  double ev = 0.0, eh = 0.0, et = 0.0, a = 0.0, b = 0.0, c = 0.0, d = 0.0, out = 0.0;
  double vv[3], nn[3], pp[3], qq[3], tt[3], o1[3], o2[3], o3[3];
  double gn[9], gp[9], gq[9];
  double lq[8], ldp[8], lmu[8];
  int st[3];
  int i, j;
  /* methods13_row19 (self-calculated): eta_v 0.94704, eta_hm 0.94609, eta_t 0.89598 */
  CHECK(pumploss_pump_efficiency(107e-6, 25.0, 2.5e7, 152.0 / 60000.0, 450.0, &ev, &eh, &et) == PUMPLOSS_OK &&
        fabs(ev - 0.94704) < 5e-6 && fabs(eh - 0.94609) < 5e-6 && fabs(et - 0.89598) < 5e-6);
  CHECK(pumploss_pump_efficiency(0.0, 25.0, 2.5e7, 2.5e-3, 450.0, &ev, &eh, &et) == PUMPLOSS_EDOMAIN && is_nan(ev));
  CHECK(pumploss_pump_efficiency(107e-6, 25.0, 2.5e7, 2.5e-3, 300.0, &ev, &eh, &et) == PUMPLOSS_WIMPLAUSIBLE && eh > 1.0);
  /* hand: motor 1e-4 m3/rev, 20 rev/s, 200 bar, 2.1e-3 m3/s, 300 N m: eta_hm = 0.3 pi */
  CHECK(pumploss_motor_efficiency(1e-4, 20.0, 2e7, 2.1e-3, 300.0, &ev, &eh, &et) == PUMPLOSS_OK &&
        near_rel(eh, 0.3 * 3.14159265358979324, 1e-14) && near_rel(ev, 2.0 / 2.1, 1e-14));
  CHECK(pumploss_motor_efficiency(1e-4, -20.0, 2e7, 2.1e-3, 300.0, &ev, &eh, &et) == PUMPLOSS_EDOMAIN && is_nan(et));
  CHECK(pumploss_motor_efficiency(1e-4, 20.0, 2e7, 2.1e-3, 300.0, &ev, NULL, &et) == PUMPLOSS_EMISUSE);
  for (i = 0; i < 3; ++i) {
    vv[i] = 1e-4; nn[i] = 25.0; pp[i] = 2e7; qq[i] = 2.4e-3; tt[i] = 350.0;
  }
  nn[1] = -1.0;
  CHECK(pumploss_pump_efficiency_batch(3, vv, nn, pp, qq, tt, o1, o2, o3, st) == PUMPLOSS_EPARTIAL &&
        st[0] == PUMPLOSS_OK && st[1] == PUMPLOSS_EDOMAIN && is_nan(o1[1]) && fabs(o1[0] - 0.96) < 1e-15);
  CHECK(pumploss_pump_efficiency_batch(3, vv, NULL, pp, qq, tt, o1, o2, o3, st) == PUMPLOSS_EMISUSE);
  nn[1] = 25.0;
  qq[0] = qq[1] = qq[2] = 2.6e-3;
  CHECK(pumploss_motor_efficiency_batch(3, vv, nn, pp, qq, tt, o1, o2, o3, st) == PUMPLOSS_WIMPLAUSIBLE &&
        st[2] == PUMPLOSS_WIMPLAUSIBLE && near_rel(o1[0], 2.5 / 2.6, 1e-14));
  CHECK(pumploss_motor_efficiency_batch(3, vv, nn, pp, qq, tt, o1, o2, o3, NULL) == PUMPLOSS_EMISUSE && is_nan(o1[0]));
  CHECK(pumploss_pump_powers(1e-4, 25.0, 2e7, 2.4e-3, 350.0, &a, &b, &c, &d) == PUMPLOSS_OK &&
        near_rel(c, 48000.0, 1e-14) && near_rel(a, 2.5e-3, 1e-15));
  CHECK(pumploss_pump_powers(1e-4, 25.0, 2e7, 2.4e-3, 0.0, &a, &b, &c, &d) == PUMPLOSS_EDOMAIN && is_nan(d));
  CHECK(pumploss_motor_powers(1e-4, 20.0, 2e7, 2.1e-3, 300.0, &a, &b, &c, &d) == PUMPLOSS_OK && near_rel(c, 42000.0, 1e-14));
  CHECK(pumploss_motor_powers(1e-4, 20.0, 2e7, 0.0, 300.0, &a, &b, &c, &d) == PUMPLOSS_EDOMAIN && is_nan(a));
  /* methods_2_3_example (self-calculated): 250 bar, 13 K, K = 1.6 GPa, alpha 6.5e-4: factor 0.975925 */
  CHECK(pumploss_flow_at_port_linear(1.0, 0.0, 333.15, 2.5e7, 320.15, 6.5e-4, 1.6e9, &out) == PUMPLOSS_OK &&
        fabs(out - 0.975925) < 1e-14);
  CHECK(pumploss_flow_at_port_linear(1.0, 0.0, 333.15, 2.5e7, 320.15, 6.5e-4, 0.0, &out) == PUMPLOSS_EDOMAIN && is_nan(out));
  CHECK(pumploss_flow_at_port(1.0, 0.0, 320.15, 0.0, 320.15, 870.0, 288.15, 6.5e-4, 1.6e9, &out) == PUMPLOSS_OK && out == 1.0);
  CHECK(pumploss_flow_at_port(1.0, 0.0, 320.15, 2e9, 320.15, 870.0, 288.15, 6.5e-4, 1.6e9, &out) == PUMPLOSS_EDOMAIN);
  /* laminar law: half the pressure and half the viscosity give the same leakage */
  CHECK(pumploss_leakage_scale(2e-5, 2.5e7, 0.04, 1.25e7, 0.02, &out) == PUMPLOSS_OK && near_rel(out, 2e-5, 1e-15));
  CHECK(pumploss_leakage_scale(2e-5, 2.5e7, 0.0, 1.25e7, 0.02, &out) == PUMPLOSS_EDOMAIN && is_nan(out));
  for (i = 0; i < 3; ++i) {
    vv[i] = 2e-5; nn[i] = 2.5e7; pp[i] = 0.04; qq[i] = 1.25e7; tt[i] = 0.02;
  }
  CHECK(pumploss_leakage_scale_batch(3, vv, nn, pp, qq, tt, o1, st) == PUMPLOSS_OK && near_rel(o1[2], 2e-5, 1e-15));
  CHECK(pumploss_leakage_scale_batch(3, vv, nn, pp, qq, tt, NULL, st) == PUMPLOSS_EMISUSE);
  CHECK(pumploss_leakage_scale_power_law(2e-5, 2e7, 0.04, 5e6, 0.01, 0.5, 0.0, &out) == PUMPLOSS_OK && near_rel(out, 1e-5, 1e-15));
  CHECK(pumploss_leakage_scale_power_law(2e-5, 2e7, 0.04, 5e6, 0.01, -0.5, 0.0, &out) == PUMPLOSS_EDOMAIN);
  /* same state: normalisation changes nothing */
  CHECK(pumploss_leakage_normalise(2e-5, 2e7, 323.15, 2e7, 323.15, 313.15, 46e-6, 373.15, 6.8e-6, 6.5e-4, 1.0, 1.0, &out) ==
        PUMPLOSS_OK && near_rel(out, 2e-5, 1e-14));
  CHECK(pumploss_leakage_normalise(2e-5, 0.0, 323.15, 2e7, 323.15, 313.15, 46e-6, 373.15, 6.8e-6, 6.5e-4, 1.0, 1.0, &out) ==
        PUMPLOSS_EDOMAIN && is_nan(out));
  CHECK(pumploss_leakage_series(1e12, 0.0, 2e7, &out) == PUMPLOSS_OK && near_rel(out, 2e-5, 1e-15));
  CHECK(pumploss_leakage_series(0.0, 0.0, 2e7, &out) == PUMPLOSS_EDOMAIN);
  /* methods13_row18 (self-calculated): 10 bar, 880 kg/m3, 2030 J/(kg K) -> 0.560 K */
  CHECK(pumploss_throttle_temperature_rise(1e6, 880.0, 2030.0, &out) == PUMPLOSS_OK && fabs(out - 0.560) < 5e-4);
  CHECK(pumploss_throttle_temperature_rise(1e6, 880.0, -1.0, &out) == PUMPLOSS_EDOMAIN && is_nan(out));
  CHECK(pumploss_throttle_temperature_rise_isenthalpic(1e6, 880.0, 2030.0, 6.5e-4, 323.15, &out) == PUMPLOSS_OK &&
        out < 0.45 && out > 0.43);
  CHECK(pumploss_throttle_temperature_rise_isenthalpic(1e6, 880.0, 2030.0, 6.5e-4, 0.0, &out) == PUMPLOSS_EDOMAIN);
  CHECK(pumploss_heat_load(1000.0, 0.9, &out) == PUMPLOSS_OK && fabs(out - 100.0) < 1e-12);
  CHECK(pumploss_heat_load(1000.0, 1.2, &out) == PUMPLOSS_WIMPLAUSIBLE && out < 0.0);
  CHECK(pumploss_case_drain_temperature(300.0, 870.0 * 1900.0 * 1e-4, 1e-4, 870.0, 1900.0, &out) == PUMPLOSS_OK &&
        fabs(out - 301.0) < 1e-12);
  CHECK(pumploss_case_drain_temperature(300.0, 100.0, 0.0, 870.0, 1900.0, &out) == PUMPLOSS_EDOMAIN && is_nan(out));
  CHECK(pumploss_case_drain_temperature_from_leakage(300.0, 870.0 * 1900.0, 1e-4, 0.0, 870.0, 1900.0, &out) == PUMPLOSS_OK &&
        fabs(out - 301.0) < 1e-12);
  CHECK(pumploss_case_drain_temperature_from_leakage(300.0, -1.0, 1e-4, 0.0, 870.0, 1900.0, &out) == PUMPLOSS_EDOMAIN);
  /* exact synthetic grid: q = V (1 - 2e-10 dp) n - 3e-12 dp, V = 107 cm3 */
  for (j = 0; j < 3; ++j) {
    for (i = 0; i < 3; ++i) {
      gn[j * 3 + i] = 10.0 + 5.0 * i;
      gp[j * 3 + i] = 2e6 + 1e7 * j;
      gq[j * 3 + i] = 107e-6 * (1.0 - 2e-10 * gp[j * 3 + i]) * gn[j * 3 + i] - 3e-12 * gp[j * 3 + i];
    }
  }
  CHECK(pumploss_displacement_two_step(3, 3, gn, gp, gq, &a, &b) == PUMPLOSS_WREGIME && near_rel(a, 107e-6, 1e-12));
  CHECK(pumploss_displacement_two_step(2, 3, gn, gp, gq, &a, &b) == PUMPLOSS_EDATA && is_nan(a) && is_nan(b));
  CHECK(pumploss_displacement_slope(3, gn, gq, &a, &b) == PUMPLOSS_OK && near_rel(a, 107e-6 * (1.0 - 4e-4), 1e-12));
  CHECK(pumploss_displacement_slope(3, NULL, gq, &a, &b) == PUMPLOSS_EMISUSE);
  for (j = 0; j < 3; ++j) {
    o1[j] = gp[j * 3];
    o2[j] = gq[j * 3];
  }
  CHECK(pumploss_displacement_intercept(3, 10.0, o1, o2, &a, &b) == PUMPLOSS_OK && near_rel(a, 107e-6, 1e-12));
  CHECK(pumploss_displacement_intercept(3, 0.0, o1, o2, &a, &b) == PUMPLOSS_EDOMAIN);
  /* exact power law q = 1e-15 dp^0.9 mu^-0.8 over two pressures x four viscosities */
  for (i = 0; i < 8; ++i) {
    ldp[i] = (i < 4) ? 1e7 : 3e7;
    lmu[i] = 0.01 * (1 + i % 4);
    lq[i] = 1e-15 * pow(ldp[i], 0.9) * pow(lmu[i], -0.8);
  }
  CHECK(pumploss_leakage_fit_power_law(8, lq, ldp, lmu, &a, &b, &c, &d) == PUMPLOSS_OK && fabs(b - 0.9) < 1e-12 &&
        fabs(c - 0.8) < 1e-12 && near_rel(a, 1e-15, 1e-10));
  CHECK(pumploss_leakage_fit_power_law(3, lq, ldp, lmu, &a, &b, &c, &d) == PUMPLOSS_EDATA && is_nan(a));
  for (i = 0; i < 8; ++i) lq[i] = 1e-15 * ldp[i] / lmu[i] + 2e-9 * sqrt(ldp[i]) + 1e-6;
  CHECK(pumploss_leakage_split(8, lq, ldp, lmu, &a, &b, &c) == PUMPLOSS_OK && near_rel(a, 1e-15, 1e-8) &&
        near_rel(b, 2e-9, 1e-8) && near_rel(c, 1e-6, 1e-6));
  CHECK(pumploss_leakage_split(8, lq, NULL, lmu, &a, &b, &c) == PUMPLOSS_EMISUSE && is_nan(a));
}

static void test_loss_model(void) {
  double dp[24], sp[24], mu[24], q[24], tq[24], rq[24], rt[24];
  double c[6], u[6], g[6], out[5], map[4], dps[2], ns[2];
  double d = 107e-6 / (2.0 * 3.14159265358979324), w;
  int st[4];
  int i, j, k, n = 0;
  pumploss_model *h = NULL;
  /* synthetic Wilson pump data from C_s 3.5e-9, C_v 6.5e4, C_f 0.03, T_c 3 N m (exact) */
  for (i = 0; i < 4; ++i) {
    for (j = 0; j < 3; ++j) {
      for (k = 0; k < 2; ++k) {
        dp[n] = 5e6 + 1e7 * i;
        sp[n] = 10.0 + 10.0 * j;
        mu[n] = 0.02 + 0.03 * k;
        w = 2.0 * 3.14159265358979324 * sp[n];
        q[n] = d * w - 3.5e-9 * d * dp[n] / mu[n];
        tq[n] = d * dp[n] + 6.5e4 * d * mu[n] * w + 0.03 * d * dp[n] + 3.0;
        ++n;
      }
    }
  }
  CHECK(pumploss_model_create(PUMPLOSS_PUMP, PUMPLOSS_MODEL_WILSON, 107e-6, 870.0, 24, dp, sp, mu, q, tq, &h) ==
        PUMPLOSS_OK && h != NULL);
  CHECK(pumploss_model_coefficients(h, &c[0], &c[1], &c[2], &c[3], &c[4], &c[5]) == PUMPLOSS_OK &&
        near_rel(c[0], 3.5e-9, 1e-10) && near_rel(c[2], 6.5e4, 1e-10) && near_rel(c[3], 0.03, 1e-10) &&
        near_rel(c[4], 3.0, 1e-10) && c[1] == 0.0 && c[5] == 0.0);
  CHECK(pumploss_model_standard_errors(h, &u[0], &u[1], &u[2], &u[3], &u[4], &u[5]) == PUMPLOSS_OK && u[2] < 1e-6);
  CHECK(pumploss_model_diagnostics(h, &g[0], &g[1], &g[2], &g[3], &g[4], &g[5]) == PUMPLOSS_OK &&
        fabs(g[1] - 1.0) < 1e-12 && g[5] >= 1.0);
  CHECK(pumploss_model_residuals(h, 24, rq, rt) == PUMPLOSS_OK && fabs(rt[3]) < 1e-10);
  CHECK(pumploss_model_residuals(h, 2, rq, rt) == PUMPLOSS_EBUFFER);
  CHECK(pumploss_model_predict(h, dp[5], sp[5], mu[5], &out[0], &out[1], &out[2], &out[3], &out[4]) == PUMPLOSS_OK &&
        near_rel(out[0], q[5], 1e-12) && near_rel(out[1], tq[5], 1e-12));
  CHECK(pumploss_model_predict(h, 9e7, 20.0, 0.03, &out[0], &out[1], &out[2], &out[3], &out[4]) == PUMPLOSS_WEXTRAPOLATED);
  CHECK(pumploss_model_predict(NULL, 2e7, 20.0, 0.03, &out[0], &out[1], &out[2], &out[3], &out[4]) == PUMPLOSS_EMISUSE &&
        is_nan(out[0]));
  dps[0] = 1e7; dps[1] = 2e7; ns[0] = 15.0; ns[1] = 25.0;
  CHECK(pumploss_model_map(h, 0.03, 2, dps, 2, ns, map, st) == PUMPLOSS_OK && map[3] > 0.5 && map[3] < 1.0);
  CHECK(pumploss_model_map(h, 0.03, 2, NULL, 2, ns, map, st) == PUMPLOSS_EMISUSE && is_nan(map[0]));
  CHECK(strlen(pumploss_model_last_message(h)) > 20);
  pumploss_model_destroy(h);
  pumploss_model_destroy(NULL);
  h = NULL;
  {
    /* the same data plus a constant 0.3 L/min and the compression of the delivered oil (C_k 1.06, K 1.4 GPa) */
    double q2[24], qc = 0, uqc = 0, ck = 0, uck = 0, ic[6];
    int terms = -1;
    for (i = 0; i < 24; ++i) q2[i] = q[i] - 0.3 / 60000.0 - 1.06 * 2.0 * 3.14159265358979324 * sp[i] * d * dp[i] / 1.4e9;
    CHECK(pumploss_model_create_terms(PUMPLOSS_PUMP, PUMPLOSS_MODEL_WILSON, 107e-6, 0.1e-6, 870.0, 1.4e9,
                                      PUMPLOSS_FLOW_TERM_CONSTANT | PUMPLOSS_FLOW_TERM_COMPRESSION,
                                      PUMPLOSS_CRITERION_BIC, 24, dp, sp, mu, q2, tq, &h) == PUMPLOSS_OK && h != NULL);
    CHECK(pumploss_model_flow_terms(h, &terms, &qc, &uqc, &ck, &uck) == PUMPLOSS_OK && terms == 3 &&
          near_rel(qc, 0.3 / 60000.0, 1e-8) && near_rel(ck, 1.06, 1e-8));
    CHECK(pumploss_model_coefficients(h, &c[0], &c[1], &c[2], &c[3], &c[4], &c[5]) == PUMPLOSS_OK &&
          near_rel(c[0], 3.5e-9, 1e-8));
    CHECK(pumploss_model_standard_errors(h, &u[0], &u[1], &u[2], &u[3], &u[4], &u[5]) == PUMPLOSS_OK && u[0] > 0.0);
    CHECK(pumploss_model_flow_diagnostics(h, &ic[0], &ic[1], &ic[2], &ic[3], &ic[4], &ic[5]) == PUMPLOSS_OK &&
          ic[1] > ic[0]);
    pumploss_model_destroy(h);
    h = NULL;
    CHECK(pumploss_model_create_terms(PUMPLOSS_PUMP, PUMPLOSS_MODEL_WILSON, 107e-6, 0.0, 870.0, 1.4e9, 8,
                                      PUMPLOSS_CRITERION_BIC, 24, dp, sp, mu, q2, tq, &h) == PUMPLOSS_EDOMAIN &&
          h == NULL);
  }
  CHECK(pumploss_model_create(PUMPLOSS_PUMP, PUMPLOSS_MODEL_SCHLOESSER, 107e-6, 870.0, 4, dp, sp, mu, q, tq, &h) ==
        PUMPLOSS_EDATA && h == NULL);
  CHECK(pumploss_model_coefficients(h, &c[0], &c[1], &c[2], &c[3], &c[4], &c[5]) == PUMPLOSS_EMISUSE && is_nan(c[0]));
  pumploss_model_destroy(h);
  CHECK(pumploss_model_create(PUMPLOSS_PUMP, PUMPLOSS_MODEL_WILSON, 107e-6, 870.0, 24, dp, sp, mu, q, tq, NULL) ==
        PUMPLOSS_EMISUSE);
  /* uncertainty: methods13_row19 (self-calculated), u_rel(eta_t) = 1.472 % */
  CHECK(pumploss_standard_uncertainty(1.5, 1, 1, 2.5e7, &u[0]) == PUMPLOSS_OK && near_rel(u[0], 3.75e5 / sqrt(3.0), 1e-14));
  CHECK(pumploss_standard_uncertainty(-1.5, 1, 1, 2.5e7, &u[0]) == PUMPLOSS_EDOMAIN && is_nan(u[0]));
  CHECK(pumploss_pressure_difference_uncertainty(3e4, 4e4, 0.0, &u[0]) == PUMPLOSS_OK && fabs(u[0] - 5e4) < 1e-9);
  CHECK(pumploss_pressure_difference_uncertainty(3e4, 4e4, 2.0, &u[0]) == PUMPLOSS_EDOMAIN);
  CHECK(pumploss_pump_efficiency_uncertainty(107e-6, 25.0, 2.5e7, 152.0 / 60000.0, 450.0, 0.0, 0.25 / sqrt(3.0),
                                             3.75e5 / sqrt(3.0), 0.015 * 152.0 / 60000.0 / sqrt(3.0),
                                             4.5 / sqrt(3.0), 0.0, &u[0], &u[1], &u[2]) == PUMPLOSS_OK &&
        fabs(u[2] / 0.895983383 - 0.01472) < 5e-6);
  CHECK(pumploss_pump_efficiency_uncertainty(107e-6, 25.0, 2.5e7, 2.5e-3, 450.0, -1.0, 0, 0, 0, 0, 0, &u[0], &u[1],
                                             &u[2]) == PUMPLOSS_EDOMAIN && is_nan(u[2]));
  CHECK(pumploss_motor_efficiency_uncertainty(107e-6, 20.0, 2e7, 2.3e-3, 300.0, 0, 0.1, 2e5, 2e-5, 2.0, 0.0, &u[0], &u[1],
                                              &u[2]) == PUMPLOSS_OK && u[2] > 0.0);
  CHECK(pumploss_motor_efficiency_uncertainty(107e-6, 20.0, 2e7, 2.3e-3, 300.0, 0, 0.1, 2e5, 2e-5, 2.0, 0.0, NULL, &u[1],
                                              &u[2]) == PUMPLOSS_EMISUSE);
}


/* health version 2 and the streaming monitor (h4) */
static void test_pump_health_v2(void) {
  pumploss_health *h = NULL;
  pumploss_health_monitor *m = NULL;
  double qn = 0.0, fr = 0.0, g = 0.0, qc = 0.0, qb = 0.0, b = 0.0, s = 0.0, l = 0.0, t = 0.0;
  double state[PUMPLOSS_HEALTH_MONITOR_STATE_COUNT];
  const double q2[2] = {0.3e-3 / 60.0 + 3.7e-3 / 60.0 * 0.4, 4.0e-3 / 60.0};
  const double dp2[2] = {100e5, 250e5};
  const double t2[2] = {323.15, 323.15};
  const double degf[3] = {104.0 + 273.15, 113.0 + 273.15, 122.0 + 273.15};
  int level = 0, reasons = 0, refused = 0, raw = 0, events = 0, looks = 0, i = 0;
  double nv = 0.0; /* a NaN ("not measured") without C99: an error output of the library is NaN */
  CHECK(pumploss_drain_fraction(1e-4, 71e-6, 0.0, &nv) == PUMPLOSS_EDOMAIN && is_nan(nv));
  CHECK(pumploss_health_create(71e-6, 250e5, 323.15, 313.15, 46e-6, 373.15, 6.8e-6, 870.0, 1900.0, &h) == PUMPLOSS_OK);
  CHECK(pumploss_health_set_description(h, 0.3e-3 / 60.0, 0.0, 25.0, 25.0) == PUMPLOSS_OK);
  CHECK(pumploss_health_set_baseline_rise(h, 4.0, PUMPLOSS_STATE_ON_STROKE) == PUMPLOSS_OK);
  CHECK(pumploss_health_fit_constant(h, q2, dp2, t2, 2, &qc, &qb) == PUMPLOSS_OK && fabs(qc / (0.3e-3 / 60.0) - 1) < 1e-10);
  CHECK(pumploss_health_set_baseline(h, qb) == PUMPLOSS_OK);
  /* at the reference state the baseline reads as itself: 4.0 / 106.5 L/min (hand) */
  CHECK(pumploss_health_assess_v2(h, 4.0e-3 / 60.0, 250e5, 0.0, 323.15, 25.0, nv, nv,
                                  PUMPLOSS_STATE_ON_STROKE, &level, &reasons, &refused, &qn, &fr, &g) == PUMPLOSS_OK &&
        fabs(fr - 4.0 / 106.5) < 1e-12 && level == PUMPLOSS_HEALTH_SOUND);
  CHECK(pumploss_health_assess_v2(h, 0.0, 250e5, 0.0, 323.15, 25.0, nv, nv, PUMPLOSS_STATE_ON_STROKE,
                                  &level, &reasons, &refused, &qn, &fr, &g) == PUMPLOSS_EVALIDITY &&
        refused == PUMPLOSS_REFUSE_DRAIN_NOT_POSITIVE && is_nan(qn));
  CHECK(strlen(pumploss_health_refusal_text(PUMPLOSS_REFUSE_DRAIN_NOT_POSITIVE)) > 10);
  CHECK(strstr(pumploss_health_caution(), "shaft seal") != NULL);
  CHECK(pumploss_health_looks_fahrenheit(degf, 3, &looks) == PUMPLOSS_OK && looks == 1);
  CHECK(pumploss_health_monitor_create(h, 4, 2, 0.05, &m) == PUMPLOSS_OK);
  for (i = 0; i < 10; ++i)
    CHECK(pumploss_health_monitor_feed(m, (double)i, 4.0e-3 / 60.0 * (1.0 + 0.001 * (i % 2)), 250e5, 0.0, 323.15, 25.0,
                                       nv, nv, PUMPLOSS_STATE_ON_STROKE, &level, &raw, &events,
                                       &qn) == PUMPLOSS_OK);
  CHECK(pumploss_health_monitor_state(m, &level, &b, &s, &l, &t) == PUMPLOSS_OK && level == PUMPLOSS_HEALTH_SOUND);
  CHECK(PUMPLOSS_IS_ERROR(pumploss_health_monitor_save(m, state, PUMPLOSS_HEALTH_MONITOR_STATE_COUNT)) == 0);
  CHECK(pumploss_health_monitor_restore(m, state, PUMPLOSS_HEALTH_MONITOR_STATE_COUNT) == PUMPLOSS_OK);
  pumploss_health_monitor_destroy(m);
  pumploss_health_monitor_destroy(NULL);
  pumploss_health_destroy(h);
}

static void test_pump_health(void) {
  pumploss_health *h = NULL;
  double f = 0.0, fref = 0.0, g = 0.0;
  int level = 0, reasons = 0;
  /* 71 cm3/rev at 1500 rpm = 106.5 L/min; 5.325 L/min drain = 5 % (hand calculation) */
  CHECK(pumploss_drain_fraction(5.325e-3 / 60.0, 71e-6, 25.0, &f) == PUMPLOSS_OK && fabs(f - 0.05) < 1e-15);
  CHECK(pumploss_drain_fraction(1e-4, 71e-6, 0.0, &f) == PUMPLOSS_EDOMAIN && is_nan(f));
  CHECK(pumploss_health_create(71e-6, 250e5, 323.15, 313.15, 46e-6, 373.15, 6.8e-6, 870.0, 1900.0, &h) == PUMPLOSS_OK);
  CHECK(pumploss_health_set_bands(h, 0.05, 0.10, 0.15, 0.25, 0.5, 1.0) == PUMPLOSS_OK);
  CHECK(pumploss_health_set_exponents(h, 1.0, 1.0) == PUMPLOSS_OK);
  CHECK(pumploss_health_set_baseline(h, 0.04 * 71e-6 * 25.0) == PUMPLOSS_OK);
  /* common practice bands: 16 % of displacement flow at the reference state is worn */
  CHECK(pumploss_health_assess(h, 0.16 * 71e-6 * 25.0, 250e5, 0.0, 323.15, 25.0, 330.0, 318.15,
                               &level, &reasons, &f, &fref) == PUMPLOSS_OK &&
        level == PUMPLOSS_HEALTH_WORN && (reasons & PUMPLOSS_REASON_FRACTION_WORN));
  CHECK(pumploss_health_growth(h, 0.16 * 71e-6 * 25.0, 250e5, 0.0, 323.15, &g) == PUMPLOSS_OK && fabs(g - 3.0) < 1e-12);
  CHECK(pumploss_health_growth(NULL, 0.16 * 71e-6 * 25.0, 250e5, 0.0, 323.15, &g) == PUMPLOSS_EMISUSE && is_nan(g));
  CHECK(strcmp(pumploss_health_level_name(level), "worn") == 0);
  CHECK(strlen(pumploss_health_reason_text(PUMPLOSS_REASON_FRACTION_WORN)) > 10);
  CHECK(pumploss_health_assess(NULL, 1e-4, 250e5, 0.0, 323.15, 25.0, 330.0, 318.15,
                               &level, &reasons, &f, &fref) == PUMPLOSS_EMISUSE && is_nan(f) && level == -1);
  pumploss_health_destroy(h);
  pumploss_health_destroy(NULL);
  test_pump_health_v2();
}

static void test_pump_budget(void) {
  pumploss_piston_pump *h = NULL;
  double v = 0.0, mis = 0.0, total = 0.0, frac = 0.0, q = 0.0, share = 0.0, dq = 0.0, el = 0.0, gr = 0.0, rms = 0.0;
  double sc = 0.0, se = 0.0, gg = 0.0, sum = 0.0;
  double drain[6], outlet[6], case_p[6], speed[6], disp[6], temp[6];
  int i = 0, confused = 0;
  const double pi = 3.14159265358979323846;
  /* invented pump: 9 pistons of 20 mm on a 34 mm pitch radius, 20 degrees: 69.97 cm3/rev (hand) */
  CHECK(pumploss_piston_pump_create(9, 20e-3, 15e-6, 20e-3, 34e-3, 20.0 * pi / 180.0, &h) == PUMPLOSS_OK);
  CHECK(pumploss_piston_pump_create(13, 20e-3, 15e-6, 20e-3, 34e-3, 20.0 * pi / 180.0, NULL) == PUMPLOSS_EMISUSE);
  CHECK(pumploss_piston_pump_set_piston(h, 0.0, 0.5) == PUMPLOSS_OK);
  CHECK(pumploss_piston_pump_set_slipper(h, 9.5e-3, 11.5e-3, 12e-6, 0.8e-3, 60e-3) == PUMPLOSS_OK);
  CHECK(pumploss_piston_pump_set_ball(h, 14e-3, 8e-6, 4e-3) == PUMPLOSS_OK);
  CHECK(pumploss_piston_pump_set_valve_plate(h, 31e-3, 34e-3, 44e-3, 47e-3, 150.0 * pi / 180.0, 10e-6) == PUMPLOSS_OK);
  CHECK(pumploss_piston_pump_set_controller(h, 0.5e-3 / 60.0, 0.6e-3, 0.611) == PUMPLOSS_OK);
  CHECK(pumploss_piston_pump_set_extra(h, 0.0, 0.0) == PUMPLOSS_OK);
  CHECK(pumploss_piston_pump_set_valve_plate(h, 36e-3, 39e-3, 38e-3, 48e-3, 2.6, 10e-6) == PUMPLOSS_EDOMAIN);
  CHECK(pumploss_piston_pump_budget(h, 250e5, 1e5, 25.0, 1.0, 323.15, &total, &frac) == PUMPLOSS_EMISUSE && is_nan(total));
  CHECK(pumploss_piston_pump_set_oil(h, 313.15, 46e-6, 373.15, 6.8e-6, 870.0) == PUMPLOSS_OK);
  CHECK(pumploss_piston_pump_displacement(h, 71e-6, &v, &mis) == PUMPLOSS_OK && fabs(v * 1e6 - 69.97) < 0.01);
  CHECK(pumploss_piston_pump_budget(h, 250e5, 1e5, 25.0, 1.0, 323.15, &total, &frac) == PUMPLOSS_OK && total > 0.0 &&
        frac > 0.001 && frac < 0.15);
  for (i = 0; i < PUMPLOSS_PATH_COUNT; ++i) {
    CHECK(pumploss_piston_pump_path_flow(h, i, 250e5, 1e5, 25.0, 1.0, 323.15, &q, &share) == PUMPLOSS_OK);
    sum += q;
  }
  CHECK(fabs(sum / total - 1.0) < 1e-14);
  CHECK(pumploss_piston_pump_path_flow(h, 99, 250e5, 1e5, 25.0, 1.0, 323.15, &q, &share) == PUMPLOSS_EDOMAIN && is_nan(q));
  CHECK(pumploss_piston_pump_gap_sensitivity(h, PUMPLOSS_GAP_VALVE, 250e5, 1e5, 25.0, 1.0, 323.15, &dq, &el) == PUMPLOSS_OK &&
        dq > 0.0 && el > 0.0 && el < 3.0);
  CHECK(pumploss_piston_pump_gap_growth(h, PUMPLOSS_GAP_BORE, total * 1.2, 250e5, 1e5, 25.0, 1.0, 323.15, &gr) == PUMPLOSS_OK &&
        gr > 0.0);
  for (i = 0; i < 6; ++i) {
    outlet[i] = 50e5 + 50e5 * i;
    case_p[i] = 1e5;
    speed[i] = 25.0;
    disp[i] = i % 2 ? 1.0 : 0.5;
    temp[i] = 313.15 + 5.0 * i;
    CHECK(pumploss_piston_pump_budget(h, outlet[i], case_p[i], speed[i], disp[i], temp[i], &drain[i], &frac) == PUMPLOSS_OK);
  }
  CHECK(pumploss_piston_pump_calibration_group(h, PUMPLOSS_GROUP_PISTON, &sc, &se, &gg, &confused) == PUMPLOSS_EDATA);
  CHECK(pumploss_piston_pump_calibrate(h, 6, drain, outlet, case_p, speed, disp, temp, &rms) == PUMPLOSS_OK ||
        pumploss_piston_pump_calibrate(h, 6, drain, outlet, case_p, speed, disp, temp, &rms) == PUMPLOSS_WILLCONDITIONED);
  CHECK(pumploss_piston_pump_calibration_group(h, PUMPLOSS_GROUP_PISTON, &sc, &se, &gg, &confused) == PUMPLOSS_OK &&
        fabs(sc - 1.0) < 1e-6);
  CHECK(pumploss_piston_pump_calibrate(h, 6, drain, NULL, case_p, speed, disp, temp, &rms) == PUMPLOSS_EMISUSE && is_nan(rms));
  {
    const int modes[6] = {PUMPLOSS_MODE_ON_STROKE, PUMPLOSS_MODE_ON_STROKE, PUMPLOSS_MODE_ON_STROKE,
                          PUMPLOSS_MODE_ON_STROKE, PUMPLOSS_MODE_ON_STROKE, PUMPLOSS_MODE_ON_STROKE};
    const int bad_modes[6] = {0, 0, 5, 0, 0, 0};
    const int st_m = pumploss_piston_pump_calibrate_modes(h, 6, drain, outlet, case_p, speed, disp, temp, modes, &rms);
    CHECK(st_m == PUMPLOSS_OK || st_m == PUMPLOSS_WILLCONDITIONED);
    CHECK(pumploss_piston_pump_calibrate_modes(h, 6, drain, outlet, case_p, speed, disp, temp, bad_modes, &rms) ==
              PUMPLOSS_EDOMAIN && is_nan(rms));
    CHECK(pumploss_piston_pump_calibrate_modes(h, 6, drain, outlet, case_p, speed, disp, temp, NULL, &rms) ==
              PUMPLOSS_EMISUSE && is_nan(rms));
  }
  CHECK(strcmp(pumploss_piston_pump_path_name(PUMPLOSS_PATH_SLIPPER), "slipper") == 0);
  CHECK(strcmp(pumploss_piston_pump_group_name(PUMPLOSS_GROUP_VALVE_PLATE), "valve-plate") == 0);
  {
    /* kinematics, controller modes, balance, non-case losses, share uncertainty */
    double st = 0, lo = 0, li = 0, le = 0, vd = 0, tf = 0, met = 0, sb = 0, hf = 0, bb = 0;
    double qd = 0, qc = 0, qv = 0, qx = 0, qt = 0, s1 = 0, us = 0;
    const double ug[PUMPLOSS_GAP_COUNT] = {1e-6, 0.5e-6, 0.5e-6, 0.8e-6};
    int w = -1;
    CHECK(pumploss_piston_pump_set_kinematics(h, 0.0, 1.5e-6) == PUMPLOSS_OK);
    CHECK(pumploss_piston_pump_set_kinematics(h, 1.0, 1.5e-6) == PUMPLOSS_EDOMAIN);
    CHECK(pumploss_piston_pump_set_control(h, 2e-17, 20e5, 3e-17, 0.0) == PUMPLOSS_OK);
    CHECK(pumploss_piston_pump_kinematics(h, 0.0, &st, &lo, &li, &le, &vd) == PUMPLOSS_OK && st == 0.0 && lo == li);
    CHECK(pumploss_piston_pump_budget_mode(h, PUMPLOSS_MODE_DEADHEAD, 250e5, 1e5, 25.0, 1.0, 323.15, 5.0, &total, &tf, &met,
                                    &w) == PUMPLOSS_OK && w == 0 && met > 0.0 && tf > 0.0);
    CHECK(pumploss_piston_pump_budget_mode(h, 7, 250e5, 1e5, 25.0, 1.0, 323.15, 5.0, &total, &tf, &met, &w) ==
              PUMPLOSS_EDOMAIN && is_nan(total));
    CHECK(pumploss_piston_pump_balance(h, 1.0, &sb, &hf, &bb, &w) == PUMPLOSS_OK && sb > 0.9 && sb < 1.1 && bb > 0.85 &&
          bb < 1.0 && hf > 0.0);
    CHECK(pumploss_piston_pump_flow_loss(h, PUMPLOSS_MODE_ON_STROKE, 250e5, 0.5e5, 1e5, 25.0, 1.0, 323.15, &qd, &qc, &qv, &qx,
                                  &qt) == PUMPLOSS_OK && fabs(qt - (qd + qc + qv + qx)) < 1e-15);
    CHECK(pumploss_piston_pump_share_uncertainty(h, PUMPLOSS_PATH_PISTON_BORE, ug, PUMPLOSS_GAP_COUNT, 250e5, 1e5, 25.0, 1.0,
                                          323.15, &s1, &us) == PUMPLOSS_OK && us > 0.0 && s1 > us);
    CHECK(pumploss_piston_pump_share_uncertainty(h, PUMPLOSS_PATH_PISTON_BORE, ug, 3, 250e5, 1e5, 25.0, 1.0, 323.15, &s1,
                                          &us) == PUMPLOSS_EDOMAIN && is_nan(us));
  }
  pumploss_piston_pump_destroy(h);
  pumploss_piston_pump_destroy(NULL);
}



/* Flow test with motor slip (hand calculation of tests/flow_test_test.cpp), gear and vane pump
   handles, motor drain and creep, pump inlet, shaft seal. */
static void test_flowtest(void) {
  double n1 = 0.0, v = 0.0, leak = 0.0, ev = 0.0, raw = 0.0, pon = 0.0, q = 0.0, total = 0.0, eta = 0.0;
  double dqdh = 0.0, el = 0.0, frac = 0.0, a = 0.0, b = 0.0, c = 0.0, d = 0.0;
  int verdict = 7, band = 7;
  pumploss_gear_pump *g = NULL;
  pumploss_vane_pump *vp = NULL;
  /* 18.0 L/min at 0 bar, 16.0 L/min at 170 bar, speeds from a 7.5 kW 1450 rpm motor: n1 = 1461.33 rpm */
  CHECK(pumploss_flow_test(18.0 / 60000, 0.0, 0.0, 16.0 / 60000, 170e5, 0.0, 0.0, 0.85, 25.0, 1450.0 / 60, 7500.0,
                           0.020, 0.028, 170e5, 1450.0 / 60, 0.95, 0.85, 0.05, &n1, &v, &leak, &ev, &raw, &pon,
                           &verdict) == PUMPLOSS_OK);
  CHECK(fabs(n1 * 60 - 1461.3333333333) < 1e-6 && fabs(leak * 60000 - 1.536) < 1e-9 && verdict == PUMPLOSS_FLOW_PASS);
  CHECK(pumploss_flow_test(16.0 / 60000, 170e5, 0.0, 18.0 / 60000, 0.0, 0.0, 0.0, 0.85, 25.0, 1450.0 / 60, 7500.0,
                           0.020, 0.028, 170e5, 1450.0 / 60, 0.95, 0.85, 0.05, &n1, &v, &leak, &ev, &raw, &pon,
                           &verdict) == PUMPLOSS_EDOMAIN && is_nan(pon) && verdict == -1);
  CHECK(pumploss_induction_motor_speed(25.0, 1450.0 / 60, 7500.0, 0.0, &n1) == PUMPLOSS_OK && n1 == 25.0);
  /* invented gear pump: 12 cm3/rev; budget at 150 bar, 25 rev/s, 40 degC VG 32 */
  CHECK(pumploss_gear_pump_create(12e-6, 9e-3, 3.5e-3, 4e-3, 18e-3, 1.2e-3, 5, 20e-6, 30e-6, &g) == PUMPLOSS_OK);
  CHECK(pumploss_gear_pump_path(g, 0, 150e5, 0.0, 25.0, 313.15, &q, &total, &eta, &dqdh, &el) == PUMPLOSS_EMISUSE &&
        is_nan(q));
  CHECK(pumploss_gear_pump_set_oil(g, 313.15, 32e-6, 373.15, 5.4e-6, 870.0) == PUMPLOSS_OK);
  CHECK(pumploss_gear_pump_set_lateral(g, 30e-6, 0, 0.2, 3.14159265358979) == PUMPLOSS_OK);
  CHECK(pumploss_gear_pump_set_lateral(g, 30e-6, 0, 1.0, 3.14159265358979) == PUMPLOSS_EDOMAIN);
  CHECK(pumploss_gear_pump_set_mesh(g, 5e-6, 2e-3) == PUMPLOSS_OK);
  CHECK(pumploss_gear_pump_path(g, PUMPLOSS_GEAR_PATH_LATERAL, 150e5, 0.0, 25.0, 313.15, &q, &total, &eta, &dqdh,
                                &el) == PUMPLOSS_OK);
  /* reference rows of tests/reference/rotary/ take 870 kg/m3 at 40 degC, here at 15 degC: about 2 % apart */
  CHECK(fabs(q / 6.4923465749206912496e-6 - 1.0) < 0.03 && eta > 0.9 && eta < 1.0 && dqdh > 0.0);
  CHECK(pumploss_gear_pump_path(g, 3, 150e5, 0.0, 25.0, 313.15, &q, &total, &eta, &dqdh, &el) == PUMPLOSS_EDOMAIN);
  pumploss_gear_pump_destroy(g);
  pumploss_gear_pump_destroy(NULL);
  CHECK(pumploss_vane_pump_create(16e-6, 12e-3, 23e-3, 3e-3, 20e-3, 2, 1, 1.5e-3, 15e-6, 12e-6, &vp) == PUMPLOSS_OK);
  CHECK(pumploss_vane_pump_set_slots(vp, 3, 8e-3, 10e-6) == PUMPLOSS_OK);
  CHECK(pumploss_vane_pump_set_sides(vp, 0.0) == PUMPLOSS_EDOMAIN);
  CHECK(pumploss_vane_pump_set_oil(vp, 313.15, 32e-6, 373.15, 5.4e-6, 870.0) == PUMPLOSS_OK);
  CHECK(pumploss_vane_pump_path(vp, PUMPLOSS_VANE_PATH_SLOT, 150e5, 0.0, 25.0, 313.15, &q, &total, &eta, &dqdh,
                                &el) == PUMPLOSS_OK);
  CHECK(fabs(q / 3.3674568965517241379e-7 - 1.0) < 0.03 && fabs(el * total / q - 3.0) < 1e-9);
  pumploss_vane_pump_destroy(vp);
  pumploss_vane_pump_destroy(NULL);
  /* motors */
  CHECK(pumploss_motor_drain_check(2.4, 60.0, 0.05, 0.10, 0.15, &frac, &band) == PUMPLOSS_OK &&
        band == PUMPLOSS_MOTOR_SOUND && fabs(frac - 0.04) < 1e-15);
  CHECK(pumploss_motor_drain_check(2.4, 0.0, 0.05, 0.10, 0.15, &frac, &band) == PUMPLOSS_EDOMAIN && band == -1);
  CHECK(pumploss_motor_creep(500e-6, 2000.0, 1.0, 0.8 / 60000, 200e5, 0.046, 0.023, 0.1, &a, &b, &c, &d) ==
            PUMPLOSS_WEXTRAPOLATED &&
        fabs(c * 60 - 4.0212385965949352) < 1e-9);
  /* inlet: 25 mm pipe, 1.5 m, 30 L/min, 0.5 m lift, VG 32 at 40 degC */
  CHECK(pumploss_inlet_pipe_check(0.025, 1.5, 0.0, 0.0, 0.5, 30.0 / 60000, 313.15, 313.15, 32e-6, 373.15, 5.4e-6,
                                  870.0, 101325.0, 80000.0, &a, &b) == PUMPLOSS_OK);
  CHECK(a > 90000.0 && a < 101325.0 && b > 0.0);
  /* with a fitting of K = 0.5: the flow is laminar (Re about 100 at the answer), where a constant K
     is a turbulent figure (the loss of a real fitting grows as K1/Re: W. B. Hooper, Chem. Eng.
     24 Aug 1981, 96-100; fittings.hpp's constant_k_min_reynolds), so the answer is a report, not OK: the true start temperature may be
     somewhat higher. The value is still the root of the stated model. */
  CHECK(pumploss_inlet_pipe_min_temperature(0.025, 1.5, 0.0, 0.5, 0.5, 30.0 / 60000, 313.15, 32e-6, 373.15, 5.4e-6,
                                            870.0, 101325.0, 80000.0, 233.15, 373.15, &c) == PUMPLOSS_WREGIME);
  CHECK(c > 233.15 && c < 313.15);
  CHECK(pumploss_shaft_seal_check(1.5e5, 7e5, 2e5, 6e5, &a, &b) == PUMPLOSS_OK && a == 0.5e5 && b == -1e5);
}



static void test_test_stand(void) {
  double n[30], p1[30], p2[30], q[30], tq[30], qd[30], ti[30], td[30], none[30];
  double ev[30], uv[30], eh[30], uh[30], et[30], ut[30], fl[30], dpo[30], mu[30], fr[30];
  double v, u, c[8], mdp[4], msp[5], meta[20];
  int st[30], mst[20];
  char msg[256];
  int i, j, k = 0, code;
  pumploss_test_stand_setup *s = NULL;
  pumploss_test_stand *t = NULL;
  /* a 71 cm3/rev pump on a 5 x 6 grid at one temperature: slip proportional to pressure, so
     every displacement estimator finds 71 cm3/rev exactly (self-calculated) */
  for (i = 0; i < 5; ++i) {
    for (j = 0; j < 6; ++j) {
      n[k] = (500.0 + 250.0 * i) / 60.0;
      p1[k] = 0.3e5;
      p2[k] = 0.3e5 + (j == 0 ? 20e5 : 50e5 * j);
      q[k] = 71e-6 * n[k] - 2e-12 * (p2[k] - p1[k]);
      tq[k] = 1.05 * 71e-6 * (p2[k] - p1[k]) / (2.0 * 3.14159265358979324) + 2.0;
      qd[k] = 1.5e-12 * (p2[k] - p1[k]);
      ti[k] = 318.15;
      td[k] = 323.15;
      ++k;
    }
  }
  /* "not measured": NaN, taken from the library's own NaN output of a refused call */
  CHECK(pumploss_iso_vg(47, &none[0], &v, &u) == PUMPLOSS_EDOMAIN && is_nan(none[0]));
  for (k = 1; k < 30; ++k) none[k] = none[0];
  CHECK(pumploss_test_stand_setup_create(PUMPLOSS_PUMP, 71e-6, 313.15, 46e-6, 373.15, 6.9e-6, &s) == PUMPLOSS_OK &&
        s != NULL);
  CHECK(pumploss_test_stand_setup_set_oil(s, 872.0, 288.15, 7e-4, 1.6e9) == PUMPLOSS_OK);
  CHECK(pumploss_test_stand_setup_set_method(s, PUMPLOSS_TS_VISCOSITY_DRAIN, PUMPLOSS_TS_DISPLACEMENT_TWO_STEP,
                                             PUMPLOSS_MODEL_WILSON) == PUMPLOSS_OK);
  CHECK(pumploss_test_stand_setup_set_method(s, 7, PUMPLOSS_TS_DISPLACEMENT_TWO_STEP, PUMPLOSS_MODEL_WILSON) ==
        PUMPLOSS_EDOMAIN);
  CHECK(pumploss_test_stand_setup_set_meter(s, PUMPLOSS_TS_METER_AT_PORT, 0.0) == PUMPLOSS_OK);
  CHECK(pumploss_test_stand_setup_set_instrument(s, PUMPLOSS_TS_FLOW, 0.3, 0.0, PUMPLOSS_TS_LIMITS) == PUMPLOSS_OK);
  CHECK(pumploss_test_stand_setup_set_instrument(s, PUMPLOSS_TS_TORQUE, 0.2, 0.1, PUMPLOSS_TS_LIMITS) == PUMPLOSS_OK);
  CHECK(pumploss_test_stand_setup_set_map(s, 500.0 / 60, 1500.0 / 60, 20e5, 250e5, 323.15, 5, 4) == PUMPLOSS_OK);
  CHECK(pumploss_test_stand_setup_set_map(s, 500.0 / 60, 1500.0 / 60, 20e5, 250e5, 323.15, 1, 4) == PUMPLOSS_EDOMAIN);
  /* acceptance (issue 16): overall efficiency of at least 0.5 at 1000 rpm, 150 bar; drain flow at most
     the largest of the data (met with margin 0); a point not tested (3000 rpm) */
  CHECK(pumploss_test_stand_setup_add_acceptance(s, PUMPLOSS_TS_ACCEPT_ETA_T, 1000.0 / 60, 150e5, 0.5) == PUMPLOSS_OK);
  CHECK(pumploss_test_stand_setup_add_acceptance(s, PUMPLOSS_TS_ACCEPT_DRAIN_FLOW, 0.0, 0.0, qd[29]) == PUMPLOSS_OK);
  CHECK(pumploss_test_stand_setup_add_acceptance(s, PUMPLOSS_TS_ACCEPT_ETA_V, 50.0, 150e5, 0.9) == PUMPLOSS_OK);
  CHECK(pumploss_test_stand_setup_add_acceptance(s, 9, 50.0, 150e5, 0.9) == PUMPLOSS_EDOMAIN);
  CHECK(pumploss_test_stand_setup_set_outliers(s, 3.0, PUMPLOSS_TS_OUTLIERS_EXCLUDE) == PUMPLOSS_OK);
  CHECK(pumploss_test_stand_setup_set_outliers(s, 0.5, PUMPLOSS_TS_OUTLIERS_EXCLUDE) == PUMPLOSS_EDOMAIN);
  CHECK(pumploss_test_stand_setup_set_grouping(s, 3.0, 5.0, 5e5, 1.0, 1.5, 1.5, 1.0, 2.0, 1) == PUMPLOSS_OK);
  CHECK(pumploss_test_stand_setup_set_grouping(s, 3.0, 5.0, 5e5, 1.0, 1.5, 1.5, 1.0, 2.0, 2) == PUMPLOSS_EDOMAIN);
  code = pumploss_test_stand_create(s, 30, n, p1, p2, q, tq, qd, ti, none, td, none, msg, sizeof msg, &t);
  CHECK(!(code > 0 && code < 100) && t != NULL);
  {
    size_t np = 0, nu = 9, no = 9, nx = 9, nc = 0, fr0[30], rw[30], ru[30], pt = 99;
    double uaq[30], uat[30], tfl[30], ttq[30], val, uu, mg;
    int ol[30], ex[30], pass, tested;
    CHECK(pumploss_test_stand_counts(t, &np, &nu, &no, &nx, &nc) == PUMPLOSS_OK && np == 30 && nu == 0 && no == 0 &&
          nx == 0 && nc == 3);
    CHECK(pumploss_test_stand_set_points(t, 30, fr0, rw, ru, uaq, uat) == PUMPLOSS_OK && fr0[7] == 7 && rw[7] == 1 &&
          ru[7] == 0 && uaq[7] == 0.0);
    CHECK(pumploss_test_stand_set_points(t, 29, fr0, rw, ru, uaq, uat) == PUMPLOSS_EBUFFER && is_nan(uaq[0]));
    CHECK(pumploss_test_stand_outliers(t, 30, tfl, ttq, ol, ex) == PUMPLOSS_OK && ol[5] == 0 && ex[5] == 0);
    CHECK(pumploss_test_stand_acceptance(t, 0, &pass, &tested, &val, &uu, &mg, &pt) == PUMPLOSS_OK && pass == 1 &&
          tested == 1 && pt == 15 && near_rel(mg, val - 0.5, 1e-15) && uu > 0.0);
    CHECK(pumploss_test_stand_acceptance(t, 1, &pass, &tested, &val, &uu, &mg, &pt) == PUMPLOSS_OK && pass == 1 &&
          val == qd[29] && mg == 0.0 && pt % 6 == 5);
    CHECK(pumploss_test_stand_acceptance(t, 2, &pass, &tested, &val, &uu, &mg, &pt) == PUMPLOSS_WUNDEFINED &&
          pass == 0 && tested == 0 && is_nan(mg));
    CHECK(pumploss_test_stand_acceptance(t, 3, &pass, &tested, &val, &uu, &mg, &pt) == PUMPLOSS_EDATA && is_nan(val));
  }
  { /* s16-report: the fit status per point; the map's temperature, stated or by default (no set_map) */
    int fs[30];
    double tm, mum, tlo, thi;
    pumploss_test_stand_setup *s2 = NULL;
    pumploss_test_stand *t2 = NULL;
    CHECK(pumploss_test_stand_point_fit(t, 30, fs) == PUMPLOSS_OK && !(fs[0] > 0 && fs[0] < 100) &&
          !(fs[29] > 0 && fs[29] < 100));
    CHECK(pumploss_test_stand_point_fit(t, 29, fs) == PUMPLOSS_EBUFFER);
    CHECK(pumploss_test_stand_map_temperature(t, &tm, &mum, &tlo, &thi) == PUMPLOSS_OK && tm == 323.15 &&
          near_rel(tlo, 323.15, 1e-12) && near_rel(thi, 323.15, 1e-12) && mum > 0.0);
    CHECK(pumploss_test_stand_map_temperature(NULL, &tm, &mum, &tlo, &thi) == PUMPLOSS_EMISUSE && is_nan(tm));
    CHECK(pumploss_test_stand_setup_create(PUMPLOSS_PUMP, 71e-6, 313.15, 46e-6, 373.15, 6.9e-6, &s2) == PUMPLOSS_OK);
    CHECK(pumploss_test_stand_create(s2, 30, n, p1, p2, q, tq, qd, ti, none, td, none, msg, sizeof msg, &t2) >= 0 &&
          t2 != NULL);
    /* the map at the drain temperature's tested mean; asked at the inlet's 318.15 K it is extrapolated */
    CHECK(pumploss_test_stand_map_temperature(t2, &tm, &mum, &tlo, &thi) == PUMPLOSS_OK && near_rel(tm, 323.15, 1e-12));
    pumploss_test_stand_destroy(t2);
    t2 = NULL;
    CHECK(pumploss_test_stand_setup_set_map(s2, 500.0 / 60, 1500.0 / 60, 20e5, 250e5, 318.15, 5, 4) == PUMPLOSS_OK);
    CHECK(pumploss_test_stand_create(s2, 30, n, p1, p2, q, tq, qd, ti, none, td, none, msg, sizeof msg, &t2) ==
          PUMPLOSS_WEXTRAPOLATED && t2 != NULL);
    CHECK(pumploss_test_stand_map_temperature(t2, &tm, &mum, &tlo, &thi) == PUMPLOSS_WEXTRAPOLATED && tm == 318.15);
    pumploss_test_stand_destroy(t2);
    pumploss_test_stand_setup_destroy(s2);
  }
  CHECK(pumploss_test_stand_displacement(t, PUMPLOSS_TS_DISPLACEMENT_USED, &v, &u) == PUMPLOSS_OK &&
        near_rel(v, 71e-6, 1e-10));
  CHECK(pumploss_test_stand_displacement(t, PUMPLOSS_TS_DISPLACEMENT_SLOPE, &v, &u) == PUMPLOSS_OK &&
        near_rel(v, 71e-6, 1e-10));
  CHECK(pumploss_test_stand_displacement(t, 9, &v, &u) == PUMPLOSS_EDOMAIN && is_nan(v));
  CHECK(pumploss_test_stand_points(t, 30, ev, uv, eh, uh, et, ut, st) == PUMPLOSS_OK &&
        near_rel(ev[7], q[7] / (71e-6 * n[7]), 1e-10) && ut[7] > 0.0 && st[7] == PUMPLOSS_OK);
  CHECK(pumploss_test_stand_points(t, 29, ev, uv, eh, uh, et, ut, st) == PUMPLOSS_EBUFFER && is_nan(ev[0]));
  CHECK(pumploss_test_stand_point_flows(t, 30, fl, dpo, mu, fr) == PUMPLOSS_OK && fl[3] == q[3] &&
        near_rel(fr[3], qd[3] / (71e-6 * n[3]), 1e-10));
  CHECK(pumploss_test_stand_model(t, PUMPLOSS_MODEL_WILSON, &c[0], &c[1], &c[2], &c[3], &c[4], &c[5], &c[6], &c[7]) ==
        PUMPLOSS_OK && c[1] == 0.0 && c[6] > 0.99);
  CHECK(pumploss_test_stand_model(t, PUMPLOSS_MODEL_SCHLOESSER, &c[0], &c[1], &c[2], &c[3], &c[4], &c[5], &c[6],
                                  &c[7]) == PUMPLOSS_EDATA && is_nan(c[0]));
  code = pumploss_test_stand_map(t, PUMPLOSS_MODEL_WILSON, 4, 5, meta, mst);
  CHECK(!(code > 0 && code < 100) && meta[19] > 0.5 && meta[19] < 1.0);
  CHECK(pumploss_test_stand_map(t, PUMPLOSS_MODEL_WILSON, 3, 5, meta, mst) == PUMPLOSS_EBUFFER && is_nan(meta[0]));
  CHECK(pumploss_test_stand_map_axis(t, PUMPLOSS_TS_AXIS_PRESSURE, 4, mdp) == PUMPLOSS_OK && mdp[0] == 20e5 &&
        mdp[3] == 250e5);
  CHECK(pumploss_test_stand_map_axis(t, PUMPLOSS_TS_AXIS_SPEED, 5, msp) == PUMPLOSS_OK && near_rel(msp[4], 25.0, 1e-15));
  CHECK(pumploss_test_stand_message(t, 99, msg, sizeof msg) == PUMPLOSS_EDATA && msg[0] == '\0');
  pumploss_test_stand_destroy(t);
  t = NULL;
  /* a negative speed: refused, the reading named in the message, no handle */
  n[7] = -n[7];
  CHECK(pumploss_test_stand_create(s, 30, n, p1, p2, q, tq, qd, ti, none, td, none, msg, sizeof msg, &t) ==
        PUMPLOSS_EDOMAIN && t == NULL && strstr(msg, "reading 8, speed") != NULL);
  CHECK(pumploss_test_stand_create(s, 30, NULL, p1, p2, q, tq, qd, ti, none, td, none, msg, sizeof msg, &t) ==
        PUMPLOSS_EMISUSE && t == NULL);
  pumploss_test_stand_destroy(NULL);
  pumploss_test_stand_setup_destroy(s);
  pumploss_test_stand_setup_destroy(NULL);
}

/* Drain line with the drain flow over temperature, a destroke peak, named fittings that take the
   bore of the element they follow, the laminar exit and the start temperature. */
static int usable(int st) { return st == PUMPLOSS_OK || st >= 100; }
static void test_drain_flow(void) {
  pumploss_line *h = NULL;
  double t[8], q[8], pc[8], pp[8], k = 0.0, ts = 0.0, tl = 0.0, tv = 0.0, d = 0.0, fixed = 0.0;
  int pass[8], dom = 0, exceeds = 0;
  char verdict[160];
  CHECK(pumploss_k_fitting(PUMPLOSS_FITTING_ELBOW_90_THREADED, PUMPLOSS_FITTING_METHOD_HOOPER_2K, 0.0508, 1e4, &k) ==
            PUMPLOSS_OK && fabs(k - 0.68) < 1e-12); /* python3-fluids Hooper2K, 2 in, Re 1e4 */
  CHECK(pumploss_k_fitting(PUMPLOSS_FITTING_BEND_90_R2, PUMPLOSS_FITTING_METHOD_HOOPER_2K, 0.02, 100.0, &k) ==
            PUMPLOSS_EDOMAIN && is_nan(k));
  CHECK(pumploss_k_exit_kinetic(500.0, &k) == PUMPLOSS_OK && k == 2.0);
  CHECK(pumploss_k_exit_kinetic(-1.0, &k) == PUMPLOSS_EDOMAIN && is_nan(k));
  CHECK(pumploss_line_create(&h) == PUMPLOSS_OK);
  CHECK(pumploss_line_add_pipe(h, 0.0254, 3.0, 5e-6) == PUMPLOSS_OK);
  CHECK(pumploss_line_add_fitting_named(h, 0.0, PUMPLOSS_FITTING_ELBOW_90_LONG_RADIUS,
                                        PUMPLOSS_FITTING_METHOD_DARBY_3K) == PUMPLOSS_OK);
  CHECK(pumploss_line_add_fitting_named(h, 0.0, 99, PUMPLOSS_FITTING_METHOD_DARBY_3K) == PUMPLOSS_EDOMAIN);
  CHECK(pumploss_line_add_pipe(h, 0.0127, 1.0, 1.5e-6) == PUMPLOSS_OK);
  CHECK(pumploss_line_add_exit(h, 0.0) == PUMPLOSS_OK);
  CHECK(pumploss_line_drain_check_flow(h, 0.3e-3 / 60, 3.7e-3 / 60, 323.15, 0.0, 0.0, 273.15, 343.15, 8, 0.0, 1e5,
                                       2e5, t, q, pc, pp, pass, verdict, sizeof verdict) == PUMPLOSS_EMISUSE);
  CHECK(pumploss_line_set_oil(h, 313.15, 46e-6, 373.15, 6.8e-6, 870.0, 288.15) == PUMPLOSS_OK);
  CHECK(usable(pumploss_line_drain_check_flow(h, 0.3e-3 / 60, 3.7e-3 / 60, 323.15, 0.2e-3, 0.1, 273.15, 343.15, 8, 0.0, 1e5,
                                       2e5, t, q, pc, pp, pass, verdict, sizeof verdict)) &&
        q[0] < q[7] && pp[0] > pc[0] && strlen(verdict) > 0);
  CHECK(pumploss_line_drain_check_flow(h, -1.0, 3.7e-3 / 60, 323.15, 0.0, 0.0, 273.15, 343.15, 8, 0.0, 1e5, 2e5, t,
                                       q, pc, pp, pass, verdict, sizeof verdict) == PUMPLOSS_EDOMAIN &&
        is_nan(pc[0]) && verdict[0] == '\0');
  CHECK(usable(pumploss_line_drain_start(h, 0.3e-3 / 60, 3.7e-3 / 60, 323.15, 0.0, 0.0, 253.15, 343.15, 30, 0.0, 1e5, 2e5,
                                  1000e-6, &ts, &tl, &tv)) && ts >= tl && ts >= tv && tv > 253.15);
  CHECK(usable(pumploss_line_size_drain_flow(h, 0.3e-3 / 60, 3.7e-3 / 60, 323.15, 0.0, 0.0, 273.15, 343.15, 8, 0.0, 1e5,
                                      2e5, 1.5, 3, &d, &fixed, &dom, &exceeds)) && d > 0.0 && dom >= 0 &&
        exceeds == 0);
  pumploss_line_destroy(h);
}
int main(void) {
  test_core();
  test_units();
  test_fluid();
  test_gap();
  test_friction();
  test_line();
  test_drain_flow();
  test_efficiency();
  test_loss_model();
  test_test_stand();
  test_pump_health();
  test_pump_budget();
  test_flowtest();
  printf("%d passed, %d failed\n", checks - failures, failures);
  return failures == 0 ? 0 : 1;
}
