#!/usr/bin/env bash
# Test the WebAssembly module and the calculator page, as CI does:
#   1. build them (scripts/web.sh) into OUT;
#   2. the module in Node against the native C library: every scalar and batch function of
#      pumploss.h at the same inputs, same status, outputs within a few ulp (web/tests/);
#   3. the page in headless Chromium (driven over the DevTools protocol, web/tests/page_capture.mjs),
#      served by a static file server on loopback: once the page marks itself ready, the values
#      in its DOM against the module's, and a screenshot (OUT/screenshot.png);
#   4. module size and call cost against native (ratios, for the performance page; report only).
# Usage: scripts/web_test.sh NATIVE_BUILD_DIR [OUT]   (a native build with libpumploss*.a)
set -euo pipefail
here="$(cd "$(dirname "${BASH_SOURCE[0]}")/.." && pwd)"
cd "$here"
native_build="$(cd "${1:?usage: scripts/web_test.sh NATIVE_BUILD_DIR [OUT]}" && pwd)"
out="${2:-out/web}"
python=/usr/bin/python3
header=capi/include/pumploss.h

bash scripts/web.sh "$out"
work="$out/test"
mkdir -p "$work"

mapfile -t libs < <(find "$native_build" -maxdepth 1 -name 'libpumploss*.a' | sort)
[ ${#libs[@]} -gt 0 ] || { echo "web_test: no static libpumploss in $native_build" >&2; exit 1; }
"$python" web/gen_web.py cases "$header" "$work/cases.json"
"$python" web/gen_web.py native "$header" "$work/native_cases.c"
cc -std=c99 -O2 -Wall -Werror -I capi/include "$work/native_cases.c" "${libs[@]}" -lstdc++ -lm -o "$work/native_cases"
"$work/native_cases" > "$work/native.jsonl"
PUMPLOSS_WEB_DIR="$out" PUMPLOSS_WEB_CASES="$work/cases.json" PUMPLOSS_WEB_NATIVE="$work/native.jsonl" \
  node --test web/tests/

# The page, from a static file server on loopback, in headless Chromium.
port="$("$python" -c 'import socket; s=socket.socket(); s.bind(("127.0.0.1", 0)); print(s.getsockname()[1])')"
"$python" -m http.server --bind 127.0.0.1 "$port" --directory "$out" >/dev/null 2>&1 &
server=$!
trap 'kill $server 2>/dev/null || true' EXIT
for _ in $(seq 50); do
  "$python" -c "import urllib.request; urllib.request.urlopen('http://127.0.0.1:$port/index.html')" 2>/dev/null && break
  sleep 0.1
done
# Chromium is driven over the DevTools protocol and waits, in real time, for the page's own
# data-ready mark before it takes the DOM and the screenshot (web/tests/page_capture.mjs).
timeout 180 node web/tests/page_capture.mjs "http://127.0.0.1:$port/index.html" "$work/page_dom.html" \
  "$work/screenshot.png" "$work/chrome-profile" 90
node web/tests/page_check.mjs "$work/page_dom.html" "$out"
[ -s "$work/screenshot.png" ] || { echo "web_test: no screenshot" >&2; exit 1; }
echo "web: screenshot $work/screenshot.png"

# Size and call cost (report only: timings scatter on a shared machine).
"$python" - "$out/pumploss_core.mjs" <<'PY'
import base64, gzip, re, sys
s = open(sys.argv[1]).read()
m = re.search(r"data:application/octet-stream;base64,([A-Za-z0-9+/=]+)", s)
wasm = base64.b64decode(m.group(1))
print(f"web: WebAssembly {len(wasm)} bytes (aim: under 500 kB); the one-file module {len(s)} bytes "
      f"(the .wasm inlined as base64), {len(gzip.compress(s.encode(), 9))} bytes gzipped as a server sends it")
PY
cc -std=c99 -O2 -I capi/include web/bench/native_call_cost.c "${libs[@]}" -lstdc++ -lm -o "$work/native_call_cost"
node web/bench/call_cost.mjs "$out" "$("$work/native_call_cost" 1000000)" 1000000
