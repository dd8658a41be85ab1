/* Consumer of the installed package: header and library agree, and a call works. */
#include <math.h>
#include <stdio.h>
#include <string.h>

#include <pumploss.h>

int main(void) {
  double nu = 0.0;
  int st;
  if (strcmp(pumploss_version(), PUMPLOSS_VERSION) != 0 || strcmp(PUMPLOSS_VERSION, EXPECTED_VERSION) != 0) {
    printf("version mismatch: library %s, header %s, package %s\n", pumploss_version(), PUMPLOSS_VERSION,
           EXPECTED_VERSION);
    return 1;
  }
  /* ASTM D341 worked example: 32 and 5.4 mm2/s at 40 and 100 degC give 8.5 mm2/s at 80 degC */
  st = pumploss_viscosity_d341(313.15, 32e-6, 373.15, 5.4e-6, 353.15, &nu);
  if (st != PUMPLOSS_OK || fabs(nu - 8.53e-6) > 0.01e-6) {
    printf("pumploss_viscosity_d341: status %d, %g\n", st, nu);
    return 1;
  }
  printf("pumploss %s from the installed package: OK\n", pumploss_version());
  return 0;
}
