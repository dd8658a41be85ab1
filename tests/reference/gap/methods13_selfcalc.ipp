// Check rows of the gap and orifice models. Columns: source key (tests/reference/SOURCES.md),
// model, six inputs (SI, unused = 0), expected value (SI), relative tolerance.
// selfcalc_methods13: check values computed here with
//   mpmath at 30 digits from the formulas (self-consistency values, not published).
// Models: "annulus" (dp, mu, bore, piston, L, eps) -> q; "narrow" same -> q; "radial" (dp, mu,
// ri, ro, h, -) -> q; "padforce" (p_r, 0, ri, ro, 2 pi, -) land force + p_r pi ri^2 -> W;
// "orifice" (dp, rho, d, cd, -, -) -> q. The annulus rows allow 1e-12: the diameters 0.02002 and
// 0.02 are not exact in binary, and their rounding is amplified by r/h = 2000 in h^3.
{"selfcalc_methods13", "annulus", {250e5, 0.040, 0.02002, 0.02, 0.03, 0.0}, 6.54825729635480351e-3 / 60000.0, 1e-12},
{"selfcalc_methods13", "narrow", {250e5, 0.040, 0.02002, 0.02, 0.03, 0.0}, 6.54825718732622528e-3 / 60000.0, 1e-12},
{"selfcalc_methods13", "narrow", {250e5, 0.040, 0.02002, 0.02, 0.03, 1.0}, 2.5 * 6.54825718732622528e-3 / 60000.0, 1e-12},
{"selfcalc_methods13", "radial", {250e5, 0.040, 0.02, 0.03, 15e-6, 0.0}, 0.163436923946071451 / 60000.0, 1e-13},
{"selfcalc_methods13", "padforce", {250e5, 0.0, 0.02, 0.03, 6.283185307179586477, 0.0}, 48425.7552432804301, 1e-13},
{"selfcalc_methods13", "orifice", {100e5, 870.0, 1e-3, 0.61, 0.0, 0.0}, 4.35839249726714846 / 60000.0, 1e-14},
// methods13_rounded: the same values rounded to 5 significant digits.
{"methods13_rounded", "annulus", {250e5, 0.040, 0.02002, 0.02, 0.03, 0.0}, 6.5483e-3 / 60000.0, 1e-4},
{"methods13_rounded", "radial", {250e5, 0.040, 0.02, 0.03, 15e-6, 0.0}, 0.16344 / 60000.0, 1e-4},
{"methods13_rounded", "padforce", {250e5, 0.0, 0.02, 0.03, 6.283185307179586477, 0.0}, 48430.0, 2e-4},
{"methods13_rounded", "orifice", {100e5, 870.0, 1e-3, 0.61, 0.0, 0.0}, 4.3584 / 60000.0, 2e-5},
