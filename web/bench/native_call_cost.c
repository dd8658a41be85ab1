/* The native side of the web call-cost benchmark: nanoseconds per call of two scalar C
 * functions (median of 7 runs). web/bench/call_cost.mjs times the same calls in WebAssembly. */
#define _POSIX_C_SOURCE 199309L
#include <stdio.h>
#include <stdlib.h>
#include <time.h>
#include "pumploss.h"

static double now(void) {
  struct timespec t;
  clock_gettime(CLOCK_MONOTONIC, &t);
  return (double)t.tv_sec + 1e-9 * (double)t.tv_nsec;
}
static int cmp(const void *a, const void *b) {
  double x = *(const double *)a, y = *(const double *)b;
  return (x > y) - (x < y);
}

int main(int argc, char **argv) {
  long n = argc > 1 ? atol(argv[1]) : 2000000L, i;
  int r, k;
  double runs[7], sink = 0.0, ev, ehm, et, nu;
  for (k = 0; k < 2; ++k) {
    for (r = 0; r < 7; ++r) {
      double t0 = now();
      for (i = 0; i < n; ++i) {
        double x = 1.0 + 1e-9 * (double)(i & 1023);
        if (k == 0) {
          pumploss_pump_efficiency(71e-6, 25.0 * x, 2e7, 1.7e-3, 240.0, &ev, &ehm, &et);
          sink += et;
        } else {
          pumploss_viscosity_d341(313.15, 46e-6, 373.15, 6.8e-6, 300.0 * x, &nu);
          sink += nu;
        }
      }
      runs[r] = (now() - t0) / (double)n * 1e9;
    }
    qsort(runs, 7, sizeof runs[0], cmp);
    printf("%s %.2f\n", k == 0 ? "pump_efficiency" : "viscosity_d341", runs[3]);
  }
  return sink == 0.0 ? 1 : 0;
}
