// Check rows of the gear and vane pump budgets. Columns: source key (tests/reference/SOURCES.md),
// pump ("gear" or "vane"), quantity ("flow" m^3/s or "dQ/dh" (m^3/s)/m), path index, expected
// value (SI), relative tolerance.
// selfcalc_rotary_gap_law: each path's laminar gap law (plane Poiseuille minus the Couette drag of
//   the tips, radial disc flow over an arc) evaluated in mpmath at 40 digits for the test pumps of
//   tests/rotary_pump_test.cpp at dp = 150 bar, n = 25 rev/s, mu = 870 kg/m3 x 32 mm2/s.
//   Gear: V 12 cm3, r_a 16.5 mm, r_f 12.5 mm, r_s 9 mm, b 18 mm, tip land 1.2 mm, 5 teeth sealing,
//   tip 20 um, end float 30 um offset 0.2, arc pi, mesh 5 um over 2 mm.
//   Vane: V 16 cm3, b 20 mm, cam 38 mm, rotor 35 mm, hub 12 mm, 2 arcs of 1 vane, tip land 1.5 mm,
//   tip 15 um, side 12 um, arc pi, 3 vanes in suction, slot 8 mm, slot clearance 10 um.
//   Tolerance 1e-11: the viscosity comes back from the oil's ASTM D341 line at its own point.
{"selfcalc_rotary_gap_law", "gear", "flow", 0, 1.2221193956769348565e-6, 1e-11},
{"selfcalc_rotary_gap_law", "gear", "flow", 1, 6.4923465749206912496e-6, 1e-11},
{"selfcalc_rotary_gap_law", "gear", "flow", 2, 5.0511853448275862069e-8, 1e-11},
{"selfcalc_rotary_gap_law", "gear", "dQ/dh", 0, 0.27662321116315708765, 1e-11},
{"selfcalc_rotary_gap_law", "gear", "dQ/dh", 1, 0.64923465749206912496, 1e-11},
{"selfcalc_rotary_gap_law", "gear", "dQ/dh", 2, 0.030307112068965517241, 1e-11},
{"selfcalc_rotary_gap_law", "vane", "flow", 0, 2.2502404633158868196e-6, 1e-11},
{"selfcalc_rotary_gap_law", "vane", "flow", 1, 4.5540887140882428421e-7, 1e-11},
{"selfcalc_rotary_gap_law", "vane", "flow", 2, 3.3674568965517241379e-7, 1e-11},
{"selfcalc_rotary_gap_law", "vane", "dQ/dh", 0, 0.68880913433600165004, 1e-11},
{"selfcalc_rotary_gap_law", "vane", "dQ/dh", 1, 0.11385221785220607105, 1e-11},
{"selfcalc_rotary_gap_law", "vane", "dQ/dh", 2, 0.10102370689655172414, 1e-11},
