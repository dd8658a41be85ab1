#!/usr/bin/env bash
# Build the libFuzzer targets (tests/fuzz, clang with ASan+UBSan) and run each for a while,
# starting from the committed seed corpus tests/fuzz/corpus/<target>/ (new inputs go to the
# build folder, the committed corpus is not changed).
# Usage: scripts/fuzz.sh [seconds per target (default 60); 0 replays the committed corpus only] [target...]
#   PUMPLOSS_CHECK_DIR  build folder root (default build-check)
# A finding stops the run with the crashing input saved as crash-* in the build folder; replay it
# with: build-check/fuzz/tests/fuzz/<target> <crash file>
set -euo pipefail
here="$(cd "$(dirname "${BASH_SOURCE[0]}")/.." && pwd)"
cd "$here"
secs="${1:-60}"
shift || true
targets=("$@")
[ ${#targets[@]} -gt 0 ] || targets=(fuzz_units fuzz_capi fuzz_csv fuzz_test_stand fuzz_handles fuzz_health_monitor fuzz_health_stream)
out="${PUMPLOSS_CHECK_DIR:-build-check}/fuzz"
cmake --preset ci-linux-clang-fuzz -B "$out" >/dev/null
cmake --build "$out" -j "$(nproc 2>/dev/null || echo 2)" --target "${targets[@]}"
export ASAN_OPTIONS=detect_leaks=1:abort_on_error=1 UBSAN_OPTIONS=print_stacktrace=1:halt_on_error=1
for t in "${targets[@]}"; do
  work="$out/corpus/$t"
  mkdir -p "$work"
  echo "---- $t: ${secs} s from tests/fuzz/corpus/$t ($(ls tests/fuzz/corpus/$t | wc -l) seeds)"
  log="$out/$t.log"
  if [ "$secs" = 0 ]; then limit="-runs=0"; else limit="-max_total_time=$secs"; fi
  if ! (cd "$out" && "tests/fuzz/$t" "$limit" -timeout=10 -rss_limit_mb=2048 -max_len=4096 \
          -print_final_stats=1 "corpus/$t" "$here/tests/fuzz/corpus/$t" >"$t.log" 2>&1); then
    tail -n 60 "$log"
    echo "fuzz: $t found a problem (log $log, input saved as $out/crash-*)"
    exit 1
  fi
  grep -E '^#[0-9]+[[:space:]]+DONE|stat::number_of_executed_units|stat::peak_rss_mb' "$log" | tr -s ' ' | paste -sd' '
  echo "     corpus now $(ls "$work" | wc -l) new inputs"
done
