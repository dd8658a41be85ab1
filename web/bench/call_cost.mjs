// Call cost of the WebAssembly module against native, in one run: nanoseconds per call of two
// scalar C functions through the ES module (pumploss.mjs), straight into the WebAssembly export
// (pumploss_core.mjs), and natively (the program built from native_call_cost.c, whose output is
// passed in). Prints the ratios for the performance page. Usage:
//   node call_cost.mjs MODULE_DIR "NATIVE_OUTPUT" [CALLS]
import { pathToFileURL } from 'node:url';
import path from 'node:path';

const [dir, nativeText, callsArg] = process.argv.slice(2);
const n = Number(callsArg || 2000000);
const native = Object.fromEntries(nativeText.trim().split('\n').map((l) => l.split(' ')).map(([k, v]) => [k, Number(v)]));
const pl = await (await import(pathToFileURL(path.join(dir, 'pumploss.mjs')).href)).default();
const core = await (await import(pathToFileURL(path.join(dir, 'pumploss_core.mjs')).href)).default();
const out = core._malloc(64);

function median(f) {
  const runs = [];
  for (let r = 0; r < 7; ++r) {
    const t0 = process.hrtime.bigint();
    f();
    runs.push(Number(process.hrtime.bigint() - t0) / n);
  }
  return runs.sort((a, b) => a - b)[3];
}
let sink = 0;
const results = {
  pump_efficiency: {
    module: median(() => { for (let i = 0; i < n; ++i) sink += pl.pump_efficiency(71e-6, 25 * (1 + 1e-9 * (i & 1023)), 2e7, 1.7e-3, 240).eta_t; }),
    raw: median(() => { for (let i = 0; i < n; ++i) { core._pumploss_pump_efficiency(71e-6, 25 * (1 + 1e-9 * (i & 1023)), 2e7, 1.7e-3, 240, out, out + 8, out + 16); sink += core.HEAPF64[(out + 16) >> 3]; } }),
  },
  viscosity_d341: {
    module: median(() => { for (let i = 0; i < n; ++i) sink += pl.viscosity_d341(313.15, 46e-6, 373.15, 6.8e-6, 300 * (1 + 1e-9 * (i & 1023))).nu_m2_s; }),
    raw: median(() => { for (let i = 0; i < n; ++i) { core._pumploss_viscosity_d341(313.15, 46e-6, 373.15, 6.8e-6, 300 * (1 + 1e-9 * (i & 1023)), out); sink += core.HEAPF64[out >> 3]; } }),
  },
};
for (const [fn, r] of Object.entries(results)) {
  const nat = native[fn];
  console.log(`web bench ${fn}: native ${nat.toFixed(1)} ns, wasm export ${r.raw.toFixed(1)} ns (${(r.raw / nat).toFixed(2)}x native), `
    + `ES module ${r.module.toFixed(1)} ns (${(r.module / nat).toFixed(2)}x native)`);
}
if (!Number.isFinite(sink)) process.exit(1);
