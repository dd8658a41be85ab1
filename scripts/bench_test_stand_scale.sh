#!/usr/bin/env bash
# Scale benchmark of `pumploss test-stand` (issue 20): a logged test of N rows (default 1 000 000)
# generated into a scratch folder from the demo's set points (bench/test_stand_scale.py), then
# `pumploss test-stand` on it with the demo's setup; prints the wall and CPU seconds and the peak
# memory (max RSS, /usr/bin/time -v). Not run in CI.
# Usage: scripts/bench_test_stand_scale.sh [pumploss binary] [N]   (default build/app/pumploss)
set -euo pipefail
here="$(cd "$(dirname "${BASH_SOURCE[0]}")/.." && pwd)"
source "$here/scripts/time_v.sh"
bin="${1:-$here/build/app/pumploss}"
n="${2:-1000000}"
scratch="$(mktemp -d)"
trap 'rm -rf "$scratch"' EXIT
cp "$here/examples/demo/test_stand.toml" "$here/examples/demo/oil.toml" "$scratch/"
/usr/bin/python3 "$here/bench/test_stand_scale.py" generate "$n" "$scratch/logged.csv" "$here/examples/demo/test_stand.csv"
echo "logged test: $n rows, $(du -h "$scratch/logged.csv" | cut -f1)"
/usr/bin/time -v -o "$scratch/time" "$bin" test-stand "$scratch/logged.csv" --setup "$scratch/test_stand.toml" \
  --out "$scratch/out" >"$scratch/stdout" 2>&1 || { cat "$scratch/stdout"; exit 2; }
echo "command: $bin test-stand logged.csv --setup test_stand.toml --out out   (N = $n)"
grep -E "^Set points:" "$scratch/out/test_stand.txt" || true
read -r wall kb cpu < <(time_v_summary "$scratch/time")
awk -v w="$wall" -v kb="$kb" -v c="$cpu" 'BEGIN {printf "pumploss test-stand: %.2f s wall, %.2f s CPU, peak RSS %.0f MB\n", w, c, kb/1024}'
