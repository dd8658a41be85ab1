// The calculator page as Chromium rendered it (its DOM, taken by page_capture.mjs) against the same
// calculation run here in Node with the same module: every output's SI value (data-si) equal.
// Usage: node page_check.mjs DUMPED_DOM.html MODULE_DIR
import { readFileSync } from 'node:fs';
import { pathToFileURL } from 'node:url';
import path from 'node:path';
import assert from 'node:assert/strict';

const [domFile, dir] = process.argv.slice(2);
const dom = readFileSync(domFile, 'utf8');
const load = (await import(pathToFileURL(path.join(dir, 'pumploss.mjs')).href)).default;
const calc = await import(pathToFileURL(path.join(dir, 'calc.mjs')).href);
const pl = await load();

assert.match(dom, /data-ready="true"/, 'the page never finished its first computation');
assert.doesNotMatch(dom, /Cannot compute/, 'the page shows an error');
assert.match(dom, /Never block, cap or valve a\s+case drain/, 'the caution is missing');
const si = (id) => {
  const m = new RegExp(`id="${id}"[^>]*data-si="([^"]*)"`).exec(dom) || new RegExp(`data-si="([^"]*)"[^>]*id="${id}"`).exec(dom);
  assert.ok(m, `no data-si on #${id}`);
  return Number(m[1]);
};
const r = calc.reading(pl, calc.DEFAULTS), k = calc.leakageAt(pl, calc.DEFAULTS), d = calc.drainLine(pl, calc.DEFAULTS);
const checks = [
  ['out-drain-ref', r.drain_at_reference_m3_s], ['out-fraction-ref', r.fraction_at_reference], ['out-growth', r.growth],
  ['out-verdict', r.level], ['out-leakage', k.q_m3_s], ['out-line-verdict', d.worst_margin_pa],
];
for (const [id, want] of checks) assert.equal(si(id), want, `#${id}`);
const cells = [...dom.matchAll(/<td data-si="([^"]*)"/g)].map((m) => Number(m[1]));
assert.deepEqual(cells, d.case_pressure_pa, 'drain-line table');
console.log(`page: ${checks.length + cells.length} values in the DOM equal the module's (verdict '${r.verdict}', `
  + `cold-start case pressure ${(d.case_pressure_pa[0] / 1e5).toFixed(3)} bar)`);
