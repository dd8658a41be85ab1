// The calculator page: inputs in the units the user picks, SI inside, every number from the
// pumploss WebAssembly module (calc.mjs). Outputs carry their SI value in data-si for the tests.
import loadPumploss from './pumploss.mjs';
import { DEFAULTS, reading, leakageAt, drainLine } from './calc.mjs';

const pl = await loadPumploss();
const state = { ...DEFAULTS };
const SI = { pressure: 'Pa', flow: 'm3/s', temperature: 'K', displacement: 'm3/rev', length: 'm', speed: 'rev/s' };
const FIXED = { metre: [1, 'm'], count: [1, ''], kinematic: [1e6, 'mm2/s'], density: [1, 'kg/m3'], cm3: [1e6, 'cm3'] };
const unit = {};
document.querySelectorAll('#units select').forEach((s) => { unit[s.dataset.q] = s.value; });

const toUser = (q, v) => (q in FIXED ? v * FIXED[q][0] : pl.unit_convert(v, SI[q], unit[q]).out);
const toSi = (q, v) => (q in FIXED ? v / FIXED[q][0] : pl.unit_convert(v, unit[q], SI[q]).out);
const fmt = (v, digits = 4) => (Number.isFinite(v) ? Number(v.toPrecision(digits)).toString() : '-');

function showInputs() {
  document.querySelectorAll('input[data-key]').forEach((el) => {
    el.value = fmt(toUser(el.dataset.q, state[el.dataset.key]), 5);
    el.removeAttribute('aria-invalid');
  });
}

function put(id, si, text) {
  const el = document.getElementById(id);
  el.textContent = text;
  el.dataset.si = String(si);
}

function compute() {
  const err = document.getElementById('error');
  err.textContent = '';
  try {
    const r = reading(pl, state);
    put('out-drain-ref', r.drain_at_reference_m3_s, `${fmt(toUser('flow', r.drain_at_reference_m3_s), 4)} ${unit.flow}`);
    put('out-fraction-ref', r.fraction_at_reference, `${(100 * r.fraction_at_reference).toFixed(2)} %`);
    put('out-growth', r.growth, `${r.growth >= 0 ? '+' : ''}${(100 * r.growth).toFixed(1)} %`);
    const v = document.getElementById('out-verdict');
    put('out-verdict', r.level, r.refused
      ? `refused: ${pl.status_message(r.status)} Check the reading (a drain meter not connected, a wrong unit).`
      : r.verdict + (r.status ? ` (${pl.status_message(r.status)})` : ''));
    v.dataset.level = String(r.level);

    const k = leakageAt(pl, state);
    put('out-leakage', k.q_m3_s, `${fmt(toUser('flow', k.q_m3_s), 4)} ${unit.flow}`);

    const d = drainLine(pl, state);
    const body = document.querySelector('#out-line tbody');
    body.replaceChildren(...d.t_k.map((t, i) => {
      const tr = document.createElement('tr');
      tr.innerHTML = `<td>${fmt(toUser('temperature', t), 4)} ${unit.temperature}</td>`
        + `<td data-si="${d.case_pressure_pa[i]}">${fmt(toUser('pressure', d.case_pressure_pa[i]), 3)} ${unit.pressure}</td>`
        + `<td class="${d.pass[i] ? 'pass' : 'fail'}">${d.pass[i] ? 'pass' : 'FAIL'}</td>`;
      return tr;
    }));
    const fails = d.pass.some((p) => !p);
    const verdict = document.getElementById('out-line-verdict');
    verdict.dataset.level = fails ? '3' : '0';
    verdict.dataset.si = String(d.worst_margin_pa);
    verdict.textContent = fails
      ? `${d.verdict.replace(/\.?\s*$/, '.')} Do not start the pump cold on this line; never block, cap or valve a case drain.`
      : `${d.verdict.replace(/\.?\s*$/, '.')} Smallest margin ${fmt(toUser('pressure', d.worst_margin_pa), 3)} ${unit.pressure}.`;
  } catch (e) {
    err.textContent = `Cannot compute: ${e.message}`;
  }
  document.body.dataset.ready = 'true';
}

document.querySelectorAll('input[data-key]').forEach((el) => {
  el.addEventListener('change', () => {
    const v = Number(el.value.replace(',', '.'));
    if (!Number.isFinite(v)) { el.setAttribute('aria-invalid', 'true'); return; }
    el.removeAttribute('aria-invalid');
    state[el.dataset.key] = toSi(el.dataset.q, v);
    compute();
  });
});
document.querySelectorAll('#units select').forEach((s) => {
  s.addEventListener('change', () => { unit[s.dataset.q] = s.value; showInputs(); compute(); });
});
document.getElementById('version').textContent = pl.version();
showInputs();
compute();
