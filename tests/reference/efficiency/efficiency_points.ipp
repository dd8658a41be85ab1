// Efficiency check rows. Columns: source key (tests/reference/SOURCES.md), machine (0 pump,
// 1 motor), V_i m3/rev, n rev/s, dp Pa, q m3/s, torque N m, expected eta_v, eta_hm, eta_t,
// absolute tolerance.
// methods13_row19 (tests/reference/SOURCES.md; self-calculated, printed to 5 decimals,
//   tolerance half a unit in the last digit): 107 cm3, 1500 rpm, 152 L/min, 250 bar, 450 N m.
// hand_pump / hand_motor: arithmetic written out in tests/efficiency_test.cpp, confirmed with
//   mpmath at 30 digits (tests/python/test_efficiency_reference.py repeats it).
{"methods13_row19", 0, 107e-6, 25.0, 2.5e7, 152.0 / 60000.0, 450.0, 0.94704, 0.94609, 0.89598, 0.5e-5},
{"hand_pump", 0, 1e-4, 25.0, 2e7, 2.4e-3, 350.0, 0.96, 0.909456817667973347, 0.873078544961254413, 1e-15},
{"hand_motor", 1, 1e-4, 20.0, 2e7, 2.1e-3, 300.0, 0.952380952380952381, 0.942477796076937972, 0.897597901025655211, 1e-15},
