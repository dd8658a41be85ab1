// Load the calculator page in headless Chromium over the DevTools protocol (on a pipe: no port,
// no package), wait in real time until the page marks its first computation done
// (body data-ready="true"), then write its DOM and a PNG screenshot. Waiting on the page itself
// replaces a fixed virtual-time budget, which could run out while the WebAssembly compiled.
// Usage: node page_capture.mjs URL DOM_OUT PNG_OUT PROFILE_DIR [SECONDS (default 60)]
import { spawn } from 'node:child_process';
import { writeFileSync } from 'node:fs';

const [url, domOut, pngOut, profile, secondsArg] = process.argv.slice(2);
if (!url || !domOut || !pngOut || !profile) {
  console.error('usage: node page_capture.mjs URL DOM_OUT PNG_OUT PROFILE_DIR [SECONDS]');
  process.exit(2);
}
const limitMs = 1000 * Number(secondsArg || 60);
const chrome = spawn('chromium', ['--headless', '--no-sandbox', '--disable-gpu', '--disable-quic', '--no-first-run',
  '--disable-background-networking', '--disable-component-update', '--disable-sync', '--hide-scrollbars',
  '--remote-debugging-pipe', `--user-data-dir=${profile}`, 'about:blank'],
{ stdio: ['ignore', 'ignore', 'ignore', 'pipe', 'pipe'] });
const toChrome = chrome.stdio[3];
const fromChrome = chrome.stdio[4];
const fail = (why) => {
  console.error(`page_capture: ${why}`);
  chrome.kill('SIGKILL');
  process.exit(1);
};
chrome.on('error', (e) => fail(`cannot start chromium: ${e.message}`));
const timer = setTimeout(() => fail(`the page was not ready within ${limitMs / 1000} s`), limitMs + 30000);

// messages are JSON texts, each ended by a NUL byte
let nextId = 0;
const pending = new Map();
let buf = Buffer.alloc(0);
fromChrome.on('data', (chunk) => {
  buf = Buffer.concat([buf, chunk]);
  for (let end = buf.indexOf(0); end >= 0; end = buf.indexOf(0)) {
    const msg = JSON.parse(buf.subarray(0, end).toString('utf8'));
    buf = buf.subarray(end + 1);
    const p = msg.id !== undefined && pending.get(msg.id);
    if (!p) continue;
    pending.delete(msg.id);
    if (msg.error) p.reject(new Error(`${p.method}: ${JSON.stringify(msg.error)}`));
    else p.resolve(msg.result);
  }
});
const send = (method, params = {}, sessionId = undefined) => new Promise((resolve, reject) => {
  const id = ++nextId;
  pending.set(id, { resolve, reject, method });
  toChrome.write(JSON.stringify(sessionId ? { id, method, params, sessionId } : { id, method, params }) + '\0');
});
const sleep = (ms) => new Promise((r) => setTimeout(r, ms));

try {
  const { targetId } = await send('Target.createTarget', { url: 'about:blank' });
  const { sessionId } = await send('Target.attachToTarget', { targetId, flatten: true });
  const page = (method, params) => send(method, params, sessionId);
  await page('Page.enable');
  await page('Emulation.setDeviceMetricsOverride', { width: 1280, height: 1400, deviceScaleFactor: 1, mobile: false });
  await page('Page.navigate', { url });
  const evaluate = async (expression) => (await page('Runtime.evaluate', { expression, returnByValue: true })).result.value;
  const t0 = Date.now();
  let ready = false;
  while (!ready && Date.now() - t0 < limitMs) {
    ready = await evaluate("document.body !== null && document.body.dataset.ready === 'true'");
    if (!ready) await sleep(100);
  }
  if (!ready) fail(`the page was not ready within ${limitMs / 1000} s`);
  writeFileSync(domOut, '<!DOCTYPE html>\n' + await evaluate('document.documentElement.outerHTML') + '\n');
  const shot = await page('Page.captureScreenshot', { format: 'png' });
  writeFileSync(pngOut, Buffer.from(shot.data, 'base64'));
  console.log(`page_capture: ready after ${((Date.now() - t0) / 1000).toFixed(1)} s`);
  await send('Browser.close').catch(() => {});
} catch (e) {
  fail(e.message);
}
clearTimeout(timer);
chrome.kill();
process.exit(0);
