// ASTM D341 check rows. Columns: source key (tests/reference/SOURCES.md), t1 degC, nu1 mm2/s,
// t2 degC, nu2 mm2/s, t degC, expected nu mm2/s, absolute tolerance mm2/s, kelvin offset used.
// astm_d341_example: worked example of ASTM D341 (32 cSt at 40 degC, 5.4 cSt at 100 degC
//   -> 8.5 cSt at 80 degC, uses T = t + 273); quoted to 2 decimals as 8.53 (tolerance 0.005).
// selfcalc_vg46: VG 46 with 6.8 cSt assumed at 100 degC, computed independently with mpmath
//   (tests/python/test_fluid_reference.py repeats it): a self-consistency value, not published.
{"astm_d341_example", 40.0, 32.0, 100.0, 5.4, 80.0, 8.53, 0.005, 273.0},
{"selfcalc_vg46", 40.0, 46.0, 100.0, 6.8, 0.0, 577.3, 0.05, 273.15},
{"selfcalc_vg46", 40.0, 46.0, 100.0, 6.8, 20.0, 133.8, 0.05, 273.15},
{"selfcalc_vg46", 40.0, 46.0, 100.0, 6.8, 60.0, 20.62, 0.005, 273.15},
{"selfcalc_vg46", 40.0, 46.0, 100.0, 6.8, 80.0, 11.10, 0.005, 273.15},
