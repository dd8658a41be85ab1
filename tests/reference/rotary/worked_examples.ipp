// Worked examples of the gear and vane pump leakage models. Columns: source key
// (tests/reference/SOURCES.md), quantity, expected value (SI), relative tolerance.
//
// esposito_gear_example (from memory): A. Esposito, Fluid Power with Applications, 7th ed.,
//   Pearson 2009, ch. 5 (hydraulic pumps), the first gear pump example: outside diameter 3 in,
//   inside diameter 2 in, width 1 in, 1800 rpm, actual flow 28 gpm at rated pressure; the book
//   rounds V_D = pi/4 (3^2 - 2^2) 1 = 3.93 in^3, Q_T = 30.6 gpm and eta_v = 91.5 %. Tolerance: the
//   book's three digits (0.915 +- 0.0005).
// hand_rotary_worked_example (self-calculated): the gap laws of theory_rotary written out by hand
//   for the pumps of docs/pages/theory_rotary.md (section "Worked examples"), mu = 870 x 32e-6
//   = 0.02784 Pa s (the test oil at 40 degC), dp = 100 bar, n = 25 rev/s, each step rounded to
//   four digits; repeated in mpmath (tests/python/test_rotary_worked_examples.py). Tolerance
//   1e-3: the hand rounding (a difference of two rounded terms for the tips).
{"esposito_gear_example", "esposito gear eta_v", 0.915, 0.0005 / 0.915},
// vane_pump_exercise (published problem, answers self-calculated): a vane pump of 115 cm3
//   displacement, rotor 63.5 mm, cam ring 89.0 mm, vanes 50.8 mm wide, delivering 0.09315 m3/min at
//   70 bar with 90 % volumetric efficiency and 12.7 kW input (the metric form of the vane pump
//   examples of Esposito, Fluid Power with Applications, ch. 5; the problem statement as published
//   on the web, see tests/reference/SOURCES.md). Answers worked by hand from the definitions:
//   e = 2 V / (pi (D_c + D_r) L) = 9.450 mm, n = Q_A / (eta_v V) = 900 rpm, T = P / (2 pi n)
//   = 134.75 N m, eta_hm = dp V / (2 pi T) = 0.9508, eta_t = dp Q_A / P = 0.8557. Tolerance: the
//   four digits of the hand values.
{"vane_pump_exercise", "vane exercise speed rev/s", 15.0, 1e-4},
{"vane_pump_exercise", "vane exercise eta_v", 0.9000, 1e-4},
{"vane_pump_exercise", "vane exercise eta_hm", 0.9508, 1e-4},
{"vane_pump_exercise", "vane exercise eta_t", 0.8557, 1e-4},
{"vane_pump_exercise", "vane exercise leakage m3/s", 1.725e-4, 1e-4},
// gear: b 20 mm, h_t 20 um, 4 tip lands of 1.5 mm in series, r_a 20 mm, r_f 15 mm, r_s 10 mm,
// side plates with end float 40 um centred (20 um each side), arc pi, mesh sealed, V 10 cm3/rev
{"hand_rotary_worked_example", "gear tip pressure term per gear", 7.982e-7, 1e-3},
{"hand_rotary_worked_example", "gear tip drag term per gear", 6.283e-7, 1e-3},
{"hand_rotary_worked_example", "gear tip path", 3.398e-7, 1e-3},
{"hand_rotary_worked_example", "gear lateral per face", 1.855e-6, 1e-3},
{"hand_rotary_worked_example", "gear lateral path", 7.422e-6, 1e-3},
{"hand_rotary_worked_example", "gear total", 7.761e-6, 1e-3},
{"hand_rotary_worked_example", "gear eta_v", 0.9690, 1e-4},
// vane: b 25 mm, h_v 15 um, 2 arcs of 1 vane, tip land 2 mm, r_c 36 mm, r_r 35 mm, r_h 15 mm,
// side film 15 um over arc pi, 3 vanes in suction, slot 10 mm, slot clearance 10 um, V 16 cm3/rev
{"hand_rotary_worked_example", "vane tip pressure term per arc", 1.263e-6, 1e-3},
{"hand_rotary_worked_example", "vane tip drag term per arc", 1.060e-6, 1e-3},
{"hand_rotary_worked_example", "vane tip path", 4.050e-7, 1e-3},
{"hand_rotary_worked_example", "vane side per face", 3.746e-7, 1e-3},
{"hand_rotary_worked_example", "vane side path", 7.491e-7, 1e-3},
{"hand_rotary_worked_example", "vane slot per vane", 7.483e-8, 1e-3},
{"hand_rotary_worked_example", "vane slot path", 2.245e-7, 1e-3},
{"hand_rotary_worked_example", "vane total", 1.379e-6, 1e-3},
{"hand_rotary_worked_example", "vane eta_v", 0.99655, 1e-5},
