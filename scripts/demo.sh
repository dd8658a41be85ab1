#!/usr/bin/env bash
# Build the pumploss command-line program and run every subcommand on the demo scenario of
# examples/demo/ (invented data). Reports (text, CSV) and plots (SVG) go into one folder.
# Usage: scripts/demo.sh [OUTPUT_FOLDER]        (default: out/demo)
# First installs what is missing through scripts/setup.sh (idempotent: a second run only checks).
# PUMPLOSS_DEMO_BUILD=DIR reuses an existing, configured build folder (CI passes its static
# build) instead of configuring build-demo/; only the program's target is built there.
set -euo pipefail
here="$(cd "$(dirname "${BASH_SOURCE[0]}")/.." && pwd)"
cd "$here"
out="${1:-out/demo}"
demo=examples/demo
program=app/pumploss   # the program inside a build folder (target pumploss_cli)

bash scripts/setup.sh
build="${PUMPLOSS_DEMO_BUILD:-build-demo}"
if [ -z "${PUMPLOSS_DEMO_BUILD:-}" ]; then
  cmake -S . -B "$build" -DCMAKE_BUILD_TYPE=Release -DPUMPLOSS_BUILD_TESTS=OFF \
    -DPUMPLOSS_BUILD_BENCH=OFF -DPUMPLOSS_BUILD_DOCS=OFF >/dev/null
fi
cmake --build "$build" -j "$(nproc 2>/dev/null || echo 2)" --target pumploss_cli >/dev/null
pl="$build/$program"
[ -x "$pl" ] || { echo "demo: $pl was not built" >&2; exit 1; }
mkdir -p "$out"

run() {  # run one subcommand; stop at the first failure
  printf '\n==== pumploss %s ====\n' "$*"
  "$pl" "$@" || { rc=$?; echo "demo: 'pumploss $*' failed (exit code $rc)" >&2; exit "$rc"; }
}

run units 250 bar psi
run oil "$demo/oil.toml" --out "$out"
run test-stand "$demo/test_stand.csv" --setup "$demo/test_stand.toml" --out "$out"
run drain-line "$demo/drain_line.toml" --size --out "$out"
run health "$demo/field_readings.csv" --pump "$demo/pump_p31.toml" --out "$out"
run budget "$demo/pump_p31.toml" --out "$out"
run flow-test "$demo/flow_test_g12.toml" --out "$out"
run rotary-budget "$demo/flow_test_g12.toml" --out "$out"

printf '\n==== demo done ====\n'
echo "Reports and plots: $(cd "$out" && pwd)/"
ls -1 "$out" | sed 's/^/  /'
