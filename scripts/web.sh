#!/usr/bin/env bash
# Build the pumploss C API as WebAssembly (Debian's emscripten) and the calculator page.
#   out/web/pumploss_core.mjs   the compiled library, one file (the .wasm inlined): loads from
#                               any static file server or a file path, offline
#   out/web/pumploss.mjs        the ES module: every C function by its name without the prefix
#   out/web/pumploss.d.ts       its TypeScript declarations
#   out/web/index.html, app.mjs, style.css   the calculator page
# Both generated files come from capi/include/pumploss.h (web/gen_web.py), like every binding.
# Usage: scripts/web.sh [OUTPUT_FOLDER]          (default out/web; build folder build-web/)
set -euo pipefail
here="$(cd "$(dirname "${BASH_SOURCE[0]}")/.." && pwd)"
cd "$here"
out="${1:-out/web}"
build="${PUMPLOSS_WEB_BUILD:-build-web}"
python=/usr/bin/python3
header=capi/include/pumploss.h

bash scripts/setup.sh
# Debian's emscripten runs its JavaScript optimiser with node; acorn comes from Debian's
# node-acorn, which a node other than Debian's own does not search by default.
export NODE_PATH="/usr/share/nodejs${NODE_PATH:+:$NODE_PATH}"
mkdir -p "$build" "$out"

# The library itself through the project's CMake (same sources, same definitions as native).
flags="-fexceptions"
emcmake cmake -S . -B "$build/lib" -DCMAKE_BUILD_TYPE=MinSizeRel -DBUILD_SHARED_LIBS=OFF \
  -DPUMPLOSS_BUILD_TESTS=OFF -DPUMPLOSS_BUILD_BENCH=OFF -DPUMPLOSS_BUILD_DOCS=OFF \
  -DPUMPLOSS_BUILD_EXAMPLES=OFF -DPUMPLOSS_BUILD_APP=OFF -DPUMPLOSS_INSTALL=OFF \
  -DCMAKE_CXX_FLAGS="$flags" -DCMAKE_C_FLAGS="$flags" >/dev/null
cmake --build "$build/lib" -j "$(nproc 2>/dev/null || echo 2)" >/dev/null
mapfile -t archives < <(find "$build/lib" -maxdepth 1 -name 'libpumploss*.a' | sort)
[ ${#archives[@]} -gt 0 ] || { echo "web.sh: no libpumploss archive in $build/lib" >&2; exit 1; }

"$python" web/gen_web.py exports "$header" "$build/exports.json"
em++ -Os $flags "${archives[@]}" -o "$out/pumploss_core.mjs" \
  -sMODULARIZE=1 -sEXPORT_ES6=1 -sSINGLE_FILE=1 -sENVIRONMENT=web -sALLOW_MEMORY_GROWTH=1 \
  -sEXPORTED_FUNCTIONS=@"$build/exports.json" \
  -sEXPORTED_RUNTIME_METHODS='["UTF8ToString","stringToUTF8","lengthBytesUTF8"]'
"$python" web/gen_web.py module "$header" "$out/pumploss.mjs"
"$python" web/gen_web.py dts "$header" "$out/pumploss.d.ts"
cp web/page/index.html web/page/app.mjs web/page/calc.mjs web/page/style.css "$out/"

size="$(stat -c %s "$out/pumploss_core.mjs")"
echo "web: $out/pumploss_core.mjs $size bytes (the .wasm inlined); open $out/index.html through any static server"
