// Worked examples of a single-line pressure drop. Columns: source key, q m3/s, rho kg/m3,
// mu Pa s, D m, L m, roughness m, expected dp Pa, relative tolerance.
// cengel_cimbala_laminar (from memory, book not at hand): water at 40 degF, 0.12 in bore, 30 ft,
//   3.0 ft/s: Re = 1803, f = 0.0355, dp = 929 lbf/ft2 (6.45 psi). Converted exactly to SI
//   (1 ft = 0.3048 m, 1 lbm/ft3 = 16.018463 kg/m3, 1 lbm/(ft s) = 1.4881639 Pa s,
//   1 lbf/ft2 = 47.880259 Pa). Tolerance: half a unit of the printed 929 plus property rounding.
// cengel_cimbala_turbulent (from memory): water at 15 degC (rho 999.1, mu 1.138e-3), 5 cm
//   stainless steel pipe (epsilon 0.002 mm), 6 L/s, 60 m: dp = 96,540 Pa (f = 0.0172 read
//   from Colebrook). Tolerance 0.5 % (f printed to 3 digits).
// methods_row20 (self-calculated, tests/reference/SOURCES.md): VG 46 oil, 10 L/min, 1/2 in
//   bore, 5 m, rho 870, nu 133.8 mm2/s (20 degC) -> 1.52 bar; 577.3 mm2/s (0 degC) -> 6.56 bar.
{"cengel_cimbala_laminar", 3.0 * 0.3048 * 3.14159265358979323846 / 4 * (0.01 * 0.3048) * (0.01 * 0.3048),
 62.42 * 16.018463, 1.038e-3 * 1.4881639, 0.01 * 0.3048, 30 * 0.3048, 0.0, 929 * 47.880259, 0.0015},
{"cengel_cimbala_turbulent", 0.006, 999.1, 1.138e-3, 0.05, 60.0, 0.002e-3, 96540.0, 0.005},
{"methods_row20", 10e-3 / 60, 870.0, 133.8e-6 * 870.0, 0.0127, 5.0, 0.0, 1.52e5, 0.004},
{"methods_row20", 10e-3 / 60, 870.0, 577.3e-6 * 870.0, 0.0127, 5.0, 0.0, 6.56e5, 0.001},
