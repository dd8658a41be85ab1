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

/* pumploss:c-caller-efficiency */

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
                               &level, &reasons, &f, &fref, &g) == PUMPLOSS_OK &&
        level == PUMPLOSS_HEALTH_WORN && (reasons & PUMPLOSS_REASON_FRACTION_WORN) && fabs(g - 3.0) < 1e-12);
  CHECK(strcmp(pumploss_health_level_name(level), "worn") == 0);
  CHECK(strlen(pumploss_health_reason_text(PUMPLOSS_REASON_FRACTION_WORN)) > 10);
  CHECK(pumploss_health_assess(NULL, 1e-4, 250e5, 0.0, 323.15, 25.0, 330.0, 318.15,
                               &level, &reasons, &f, &fref, &g) == PUMPLOSS_EMISUSE && is_nan(f) && level == -1);
  pumploss_health_destroy(h);
  pumploss_health_destroy(NULL);
}

/* pumploss:c-caller-pump */

/* pumploss:c-caller-capi */

/* pumploss:c-caller-tests (new subjects add their test functions above this line) */

int main(void) {
  test_core();
  test_units();
  test_fluid();
  /* pumploss:c-caller-calls-gap */
  /* pumploss:c-caller-calls-friction */
  /* pumploss:c-caller-calls-efficiency */
  test_pump_health();
  /* pumploss:c-caller-calls-pump */
  /* pumploss:c-caller-calls-capi */
  printf("%d passed, %d failed\n", checks - failures, failures);
  return failures == 0 ? 0 : 1;
}
