// ASTM D2161 check rows at 100 degF. Columns: source key, nu mm2/s, SUS, tolerance on the
// quantity the source printed, which one was printed ('n': the viscosity, 's': the SUS).
// chemicals_doc_d2161: the `chemicals` library documentation example of viscosity_converter
//   (700 SUS -> 151.0891 mm2/s at 100 degF), ASTM D2161-93 equation.
// selfcalc_d2161: the same equation evaluated with mpmath (self-consistency only).
{"chemicals_doc_d2161", 151.0891, 700.0, 0.00005, 'n'},
{"selfcalc_d2161", 46.0, 214.19, 0.005, 's'},
{"selfcalc_d2161", 2.0, 32.60, 0.005, 's'},
