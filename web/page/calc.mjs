// The calculator's arithmetic, apart from the page so that the tests run it in Node too.
// Everything is SI inside; every number comes from the pumploss module (its C functions).
// Results are engineering estimates: the pump maker's limits, local codes and licensed
// practice take precedence.

/** The default inputs (SI): an invented pump and drain line, for the first view of the page. */
export const DEFAULTS = Object.freeze({
  // the reading
  max_displacement_m3_rev: 71e-6, rated_speed_rev_s: 1500 / 60, drain_m3_s: 3.2 / 60000,
  outlet_pa: 200e5, case_pa: 0.5e5, oil_t_k: 273.15 + 50, speed_rev_s: 1500 / 60,
  baseline_m3_s: 3.0 / 60000, reference_dp_pa: 200e5, reference_t_k: 273.15 + 50,
  // the oil: two points of its ASTM D341 line, density
  t1_k: 273.15 + 40, nu1_m2_s: 46e-6, t2_k: 273.15 + 100, nu2_m2_s: 6.8e-6, rho_kg_m3: 870,
  cp_j_kg_k: 1900,
  // leakage at another state
  other_dp_pa: 250e5, other_t_k: 273.15 + 70,
  // the drain line at cold start
  bore_m: 0.0127, length_m: 4.0, bends: 4, t_cold_k: 273.15 + 0, t_max_k: 273.15 + 70,
  p_tank_pa: 0, p_allowed_pa: 2e5,
});

function viscosity(pl, s, t_k) {
  const nu = pl.viscosity_d341(s.t1_k, s.nu1_m2_s, s.t2_k, s.nu2_m2_s, t_k).nu_m2_s;
  return { nu, mu: pl.dynamic_viscosity(nu, s.rho_kg_m3).mu_pa_s };
}

/** One reading: drain fraction as read and at the reference state, and the health verdict. */
export function reading(pl, s) {
  const h = pl.health_create(s.max_displacement_m3_rev, s.reference_dp_pa, s.reference_t_k,
    s.t1_k, s.nu1_m2_s, s.t2_k, s.nu2_m2_s, s.rho_kg_m3, s.cp_j_kg_k);
  try {
    pl.health_set_baseline(h, s.baseline_m3_s);
    const a = pl.health_assess(h, s.drain_m3_s, s.outlet_pa, s.case_pa, s.oil_t_k,
      s.speed_rev_s, NaN, NaN);
    const g = pl.health_growth(h, s.drain_m3_s, s.outlet_pa, s.case_pa, s.oil_t_k);
    return {
      fraction: a.fraction, fraction_at_reference: a.fraction_at_reference, growth: g.growth,
      level: a.level, verdict: pl.health_level_name(a.level), status: a.status,
    };
  } finally {
    pl.health_destroy(h);
  }
}

/** The same leakage at another pressure and oil temperature (laminar: q ~ dp / mu). */
export function leakageAt(pl, s) {
  const a = viscosity(pl, s, s.oil_t_k), b = viscosity(pl, s, s.other_t_k);
  const r = pl.leakage_scale(s.drain_m3_s, s.outlet_pa - s.case_pa, a.mu, s.other_dp_pa - s.case_pa, b.mu);
  return { q_m3_s: r.q_m3_s, mu_from_pa_s: a.mu, mu_to_pa_s: b.mu, status: r.status };
}

/** The drain line's case pressure from cold start to the hottest oil, against the limit. */
export function drainLine(pl, s, n = 8) {
  const line = pl.line_create();
  try {
    pl.line_add_pipe(line, s.bore_m, s.length_m, 1.5e-6);
    for (let i = 0; i < s.bends; ++i) pl.line_add_fitting_hooper(line, s.bore_m, 800, 0.25);
    pl.line_set_oil(line, s.t1_k, s.nu1_m2_s, s.t2_k, s.nu2_m2_s, s.rho_kg_m3, 288.15);
    const r = pl.line_drain_check(line, s.drain_m3_s, s.t_cold_k, s.t_max_k, n, s.p_tank_pa, s.p_allowed_pa);
    return {
      t_k: Array.from(r.t_k), case_pressure_pa: Array.from(r.case_pressure_pa),
      pass: Array.from(r.pass), worst_margin_pa: r.worst_margin_pa, status: r.status,
    };
  } finally {
    pl.line_destroy(line);
  }
}
