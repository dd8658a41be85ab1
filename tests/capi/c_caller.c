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

/* pumploss:c-caller-gap */

/* pumploss:c-caller-friction */

static void test_efficiency(void) {
  double ev = 0.0, eh = 0.0, et = 0.0, a = 0.0, b = 0.0, c = 0.0, d = 0.0, out = 0.0;
  double vv[3], nn[3], pp[3], qq[3], tt[3], o1[3], o2[3], o3[3];
  double gn[9], gp[9], gq[9];
  double lq[8], ldp[8], lmu[8];
  int st[3];
  int i, j;
  /* methods.md 13 row 19 (self-calculated): eta_v 0.94704, eta_hm 0.94609, eta_t 0.89598 */
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
  CHECK(pumploss_pump_efficiency_batch(3, vv, nn, pp, qq, tt, o1, o2, o3, st) == PUMPLOSS_WPARTIAL &&
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
  /* methods.md 2.3 example (self-calculated): 250 bar, 13 K, K = 1.6 GPa, alpha 6.5e-4: factor 0.975925 */
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
  /* methods.md 13 row 18 (self-calculated): 10 bar, 880 kg/m3, 2030 J/(kg K) -> 0.560 K */
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
  CHECK(pumploss_model_create(PUMPLOSS_PUMP, PUMPLOSS_MODEL_SCHLOESSER, 107e-6, 870.0, 4, dp, sp, mu, q, tq, &h) ==
        PUMPLOSS_EDATA && h != NULL);
  CHECK(pumploss_model_coefficients(h, &c[0], &c[1], &c[2], &c[3], &c[4], &c[5]) == PUMPLOSS_EDATA && is_nan(c[0]));
  pumploss_model_destroy(h);
  CHECK(pumploss_model_create(PUMPLOSS_PUMP, PUMPLOSS_MODEL_WILSON, 107e-6, 870.0, 24, dp, sp, mu, q, tq, NULL) ==
        PUMPLOSS_EMISUSE);
  /* uncertainty: methods.md 13 row 19 (self-calculated), u_rel(eta_t) = 1.472 % */
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

/* pumploss:c-caller-efficiency */

/* pumploss:c-caller-pump */

/* pumploss:c-caller-capi */

/* pumploss:c-caller-tests (new subjects add their test functions above this line) */

int main(void) {
  test_core();
  test_units();
  test_fluid();
  /* pumploss:c-caller-calls-gap */
  /* pumploss:c-caller-calls-friction */
  test_efficiency();
  test_loss_model();
  /* pumploss:c-caller-calls-efficiency */
  /* pumploss:c-caller-calls-pump */
  /* pumploss:c-caller-calls-capi */
  printf("%d passed, %d failed\n", checks - failures, failures);
  return failures == 0 ? 0 : 1;
}
