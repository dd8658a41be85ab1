/* The README's C example: the same calculation through the C API. */
#include <stdio.h>

#include "pumploss.h"

int main(void) {
  double nu_m2_s, nu_cst;
  int st = pumploss_viscosity_d341(313.15, 46e-6, 373.15, 6.8e-6, 273.15, &nu_m2_s);
  if (PUMPLOSS_IS_ERROR(st)) { /* nu_m2_s is NaN */
    printf("error %d: %s\n", st, pumploss_status_message(st));
    return 1;
  }
  if (PUMPLOSS_IS_REPORT(st)) printf("note: %s\n", pumploss_status_message(st)); /* usable value */
  pumploss_unit_convert(nu_m2_s, "m2/s", "cSt", &nu_cst);
  printf("VG 46 at 0 degC: %.1f cSt\n", nu_cst);
  return 0;
}
