// Check rows of the flow test (tests/flow_test_test.cpp). Columns: source key
// (tests/reference/SOURCES.md), quantity, expected value (SI), relative tolerance.
// hand_flow_test_slip: the hand calculation written out step by step in
//   tests/flow_test_test.cpp (FlowTestHandCalculation): gear pump, no load 18.0 L/min at 0 bar,
//   loaded 16.0 L/min at 170 bar, speeds from a 7.5 kW 1450 rpm motor (1500 rpm synchronous),
//   eta_hm 0.85; reference 0.028 Pa s, 170 bar, 1450 rpm; test viscosity 0.020 Pa s; new 95 %.
//   Repeated in mpmath (40 digits).
{"hand_flow_test_slip", "rated torque", 49.392913373346828342, 1e-14},
{"hand_flow_test_slip", "loaded torque", 38.197186342054880585, 1e-14},
{"hand_flow_test_slip", "loaded speed", 1461.3333333333333333 / 60.0, 1e-14},
{"hand_flow_test_slip", "displacement", 12e-6, 1e-14},
{"hand_flow_test_slip", "leakage", 1.536 / 60000.0, 1e-12},
{"hand_flow_test_slip", "volumetric efficiency", 0.91240875912408759124, 1e-14},
{"hand_flow_test_slip", "leakage at reference", 1.0971428571428571429 / 60000.0, 1e-12},
{"hand_flow_test_slip", "volumetric efficiency at reference", 0.9369458128078817734, 1e-14},
{"hand_flow_test_slip", "percent of new", 0.98625875032408607726, 1e-14},
{"hand_flow_test_slip", "uncorrected ratio", 0.88888888888888888889, 1e-14},
// hagen_poiseuille_inlet: a laminar suction pipe (Re 796) checked by Hagen-Poiseuille and
//   Bernoulli, mpmath (tests/inlet_motor_test.cpp): 25 mm bore, 1.5 m, 30 L/min, pump inlet
//   0.5 m above the oil, 870 kg/m3, 32 mm2/s, vented tank 101325 Pa.
{"hagen_poiseuille_inlet", "friction drop", 2177.862999578230529, 1e-9},
{"hagen_poiseuille_inlet", "inlet pressure", 94429.919170005340102, 1e-11},
