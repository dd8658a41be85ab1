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
  constant_m3_s: 0.3 / 60000,  // the controller's consumption: not scaled with pressure or viscosity
  // the oil: two points of its ASTM D341 line, density
  t1_k: 273.15 + 40, nu1_m2_s: 46e-6, t2_k: 273.15 + 100, nu2_m2_s: 6.8e-6, rho_kg_m3: 870,
  cp_j_kg_k: 1900,
  // leakage at another state
  other_dp_pa: 250e5, other_t_k: 273.15 + 70,
  // the drain line at cold start
  bore_m: 0.0127, length_m: 4.0, bends: 4, t_cold_k: 273.15 + 0, t_max_k: 273.15 + 70,
  p_tank_pa: 0, p_allowed_pa: 2e5, p_allowed_peak_pa: 5e5,
  peak_volume_m3: 0, peak_time_s: 0.25,  // destroke: control volume dumped into the case
});

function viscosity(pl, s, t_k) {
  const nu = pl.viscosity_d341(s.t1_k, s.nu1_m2_s, s.t2_k, s.nu2_m2_s, t_k).nu_m2_s;
  return { nu, mu: pl.dynamic_viscosity(nu, s.rho_kg_m3).mu_pa_s };
}

/** One reading: checked, then the drain fraction at the reference state and the health verdict,
 *  by the library's one normalisation model (constant part + laminar part scaled by dp/mu with
 *  the dynamic viscosity at the gap temperature). A refused reading throws with its reason. */
export function reading(pl, s) {
  const h = pl.health_create(s.max_displacement_m3_rev, s.reference_dp_pa, s.reference_t_k,
    s.t1_k, s.nu1_m2_s, s.t2_k, s.nu2_m2_s, s.rho_kg_m3, s.cp_j_kg_k);
  try {
    pl.health_set_description(h, s.constant_m3_s, 0, s.rated_speed_rev_s, s.rated_speed_rev_s);
    pl.health_set_baseline(h, s.baseline_m3_s);
    let a;
    try {
      a = pl.health_assess_v2(h, s.drain_m3_s, s.outlet_pa, s.case_pa, s.oil_t_k, s.speed_rev_s, NaN, NaN,
        pl.CONSTANTS.STATE_ON_STROKE);
    } catch (e) {
      if (e.status !== pl.STATUS.EVALIDITY) throw e;
      return { refused: true, level: -1, verdict: 'refused', status: e.status, fraction_at_reference: NaN,
        drain_at_reference_m3_s: NaN, growth: NaN };
    }
    return {
      refused: false, fraction_at_reference: a.fraction_at_reference, drain_at_reference_m3_s: a.drain_at_reference_m3_s,
      growth: a.growth, level: a.level, verdict: pl.health_level_name(a.level), status: a.status,
    };
  } finally {
    pl.health_destroy(h);
  }
}

/** The same pump's drain at another pressure and oil temperature: the constant part as it is,
 *  the laminar rest scaled by dp/mu (dynamic viscosity). */
export function leakageAt(pl, s) {
  const a = viscosity(pl, s, s.oil_t_k), b = viscosity(pl, s, s.other_t_k);
  const lam = Math.max(s.drain_m3_s - s.constant_m3_s, 0);
  const r = pl.leakage_scale(lam, s.outlet_pa - s.case_pa, a.mu, s.other_dp_pa - s.case_pa, b.mu);
  return { q_m3_s: s.constant_m3_s + r.q_m3_s, mu_from_pa_s: a.mu, mu_to_pa_s: b.mu, status: r.status };
}

/** The drain line's case pressure from cold start to the hottest oil, against the maker's
 *  continuous (and, with a destroke volume, peak) limit: the drain flow over temperature from the
 *  same model (laminar part larger in hot oil), bends by Darby's 3-K method, the exit into the tank. */
export function drainLine(pl, s, n = 8) {
  const line = pl.line_create();
  try {
    pl.line_add_pipe(line, s.bore_m, s.length_m, 1.5e-6);
    for (let i = 0; i < s.bends; ++i) {
      pl.line_add_fitting_named(line, 0, pl.CONSTANTS.FITTING_BEND_90_R2, pl.CONSTANTS.FITTING_METHOD_DARBY_3K);
    }
    pl.line_add_exit(line, 0);
    pl.line_set_oil(line, s.t1_k, s.nu1_m2_s, s.t2_k, s.nu2_m2_s, s.rho_kg_m3, 288.15);
    const lam = Math.max(s.drain_m3_s - s.constant_m3_s, 0);
    const r = pl.line_drain_check_flow(line, s.constant_m3_s, lam, s.oil_t_k, s.peak_volume_m3, s.peak_time_s,
      s.t_cold_k, s.t_max_k, n, s.p_tank_pa, s.p_allowed_pa, s.p_allowed_peak_pa);
    const margins = Array.from(r.case_pressure_pa, (p) => s.p_allowed_pa - p);
    return {
      t_k: Array.from(r.t_k), q_m3_s: Array.from(r.q_m3_s), case_pressure_pa: Array.from(r.case_pressure_pa),
      pass: Array.from(r.pass), worst_margin_pa: Math.min(...margins), verdict: r.verdict, status: r.status,
    };
  } finally {
    pl.line_destroy(line);
  }
}
