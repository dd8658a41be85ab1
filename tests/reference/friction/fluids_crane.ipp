// python3-fluids 1.0.22 (fluids.fittings), source key fluids_fittings. Columns: source key,
// D m, (L/D)_eq used (0: f_T only), expected f_T or K. ft_Crane(D); K_gate_valve_Crane(D, D, 0)
// (L/D 8); K_ball_valve_Crane(D, D, 0) (L/D 3); K_globe_valve_Crane(D, D) (L/D 340).
// fluids_fittings (tests/reference/SOURCES.md): D = 0.1 m -> f_T = 0.0162885, K(gate) = 0.13031.
{"fluids_fittings", 0.1, 0.0, 0.01628845962146481},
{"fluids_fittings", 0.0127, 0.0, 0.027141189802131194},
{"fluids_fittings", 0.5, 0.0, 0.011782458726227104},
{"fluids_fittings", 0.1, 8.0, 0.13030767697171847},
{"fluids_fittings", 0.0127, 3.0, 0.08142356940639359},
{"fluids_fittings", 0.025, 340.0, 7.689950128266794},
