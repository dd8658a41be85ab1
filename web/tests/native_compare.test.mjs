// The WebAssembly module against the native C library: every scalar and batch function of
// pumploss.h at the same inputs (web/gen_web.py cases / native), same status, outputs within a
// few ulp (the two builds use different libm: glibc natively, musl in emscripten).
// Run by scripts/web_test.sh: PUMPLOSS_WEB_DIR (the built module), PUMPLOSS_WEB_CASES (JSON),
// PUMPLOSS_WEB_NATIVE (JSON lines printed by the native program).
import { test } from 'node:test';
import assert from 'node:assert/strict';
import { readFileSync } from 'node:fs';
import { pathToFileURL } from 'node:url';
import path from 'node:path';

const dir = process.env.PUMPLOSS_WEB_DIR;
const cases = JSON.parse(readFileSync(process.env.PUMPLOSS_WEB_CASES, 'utf8'));
const native = readFileSync(process.env.PUMPLOSS_WEB_NATIVE, 'utf8').trim().split('\n').map((l) => JSON.parse(l));
const mod = await import(pathToFileURL(path.join(dir, 'pumploss.mjs')).href);
const pl = await mod.default();

const MAX_ULP = 8;
function ulps(a, b) {
  if (Number.isNaN(a) && Number.isNaN(b)) return 0;
  if (a === b) return 0;
  const buf = new DataView(new ArrayBuffer(16));
  buf.setFloat64(0, a); buf.setFloat64(8, b);
  const ia = buf.getBigInt64(0), ib = buf.getBigInt64(8);
  const key = (x) => (x < 0n ? -(x & 0x7fffffffffffffffn) : x);
  const d = key(ia) - key(ib);
  return Number(d < 0n ? -d : d);
}
const hex = (s) => {  // C's %a (or nan/inf) to a number
  if (/nan/i.test(s)) return NaN;
  if (/inf/i.test(s)) return s.startsWith('-') ? -Infinity : Infinity;
  const m = /^(-?)0x([01])\.?([0-9a-f]*)p([+-]\d+)$/i.exec(s);
  assert.ok(m, `cannot read hex float ${s}`);
  const frac = m[3] ? parseInt(m[3], 16) / 16 ** m[3].length : 0;
  return (m[1] ? -1 : 1) * (parseInt(m[2], 16) + frac) * 2 ** parseInt(m[4], 10);
};

test('every case has a native result', () => {
  assert.equal(native.length, cases.length);
  assert.ok(cases.length > 200, `only ${cases.length} cases`);
});

test('module and native library agree on status and outputs', () => {
  let compared = 0, worst = 0, worstCase = '';
  for (let k = 0; k < cases.length; ++k) {
    const c = cases[k], n = native[k];
    assert.equal(n.fn, c.fn);
    const inputs = c.inputs.filter((v) => v !== null);
    let r, st;
    try {
      r = pl[c.fn](...inputs);
      st = r.status;
    } catch (e) {
      assert.ok(e instanceof mod.PumplossError, `${c.fn}: ${e}`);
      st = e.status;
    }
    assert.equal(st, n.status, `${c.fn} case ${k}: status ${st} in wasm, ${n.status} native`);
    if (st > 0 && st < 100) continue;  // error: no outputs to compare (NaN in C)
    for (const [key, vals] of Object.entries(n.out)) {
      const jsKey = key === 'status' ? 'element_status' : key;
      const got = r[jsKey];
      const arr = typeof got === 'number' ? [got] : Array.from(got);
      assert.equal(arr.length, vals.length, `${c.fn}.${key} length`);
      vals.forEach((v, i) => {
        const want = typeof v === 'number' ? v : hex(v);
        const u = typeof v === 'number' ? (arr[i] === v ? 0 : Infinity) : ulps(arr[i], want);
        if (u > worst) { worst = u; worstCase = `${c.fn}.${key}[${i}]`; }
        assert.ok(u <= MAX_ULP, `${c.fn} case ${k} ${key}[${i}]: ${arr[i]} vs ${want} (${u} ulp)`);
        ++compared;
      });
    }
  }
  console.log(`# compared ${compared} outputs of ${cases.length} cases; worst ${worst} ulp (${worstCase || 'none'})`);
  assert.ok(compared > 200);
});

test('errors throw PumplossError with the C status and sentence', () => {
  assert.throws(() => pl.viscosity_d341(313.15, -1, 373.15, 6.8e-6, 273.15),
    (e) => e instanceof mod.PumplossError && e.status === pl.STATUS.EDOMAIN && /viscosity_d341/.test(e.message));
  assert.throws(() => pl.unit_convert(1, 'bar', 'furlong'), (e) => e.status === pl.STATUS.EUNIT);
  assert.throws(() => pl.pump_efficiency_batch(2, [1], [1], [1], [1], [1]), RangeError);
});

test('handles: create, use, destroy, and a destroyed handle is refused', () => {
  const line = pl.line_create();
  assert.equal(line.type, 'pumploss_line');
  pl.line_add_pipe(line, 0.0127, 5, 1.5e-6);
  const r = pl.line_pressure_drop(line, 10 / 60000, 870, 0.04);
  const ref = pl.pipe_pressure_drop(10 / 60000, 870, 0.04, 0.0127, 5, 1.5e-6);
  assert.equal(r.dp_pa, ref.dp_pa);
  pl.line_destroy(line);
  assert.ok(line.destroyed);
  assert.throws(() => pl.line_pressure_drop(line, 1e-4, 870, 0.04), TypeError);
  pl.line_destroy(line);  // twice: a no-op, as destroying NULL in C
});
