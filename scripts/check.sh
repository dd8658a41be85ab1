#!/usr/bin/env bash
# The whole test suite, as CI runs it: install what is missing, then build and test
#   1. the static library with warnings as errors, all tests (ctest), valgrind on the callers;
#   1a. the WebAssembly module and the calculator page (scripts/web_test.sh);
#   2. the shared library (exported symbols checked), its callers and the installed-package
#      consumers (find_package, pkg-config);
#   3. the whole test suite under AddressSanitizer + UndefinedBehaviorSanitizer and the C API
#      thread test under ThreadSanitizer (clang);
#   3a. the libFuzzer targets (tests/fuzz), PUMPLOSS_FUZZ_SECONDS (default 60) each;
#   3b. line coverage of include/, src/, capi/ by the test suite (gcc --coverage, gcovr), failing
#      under PUMPLOSS_COVERAGE_MIN (default 90) percent;
#   4. the Windows x64 DLL (mingw-w64): export table against pumploss.def and exports.txt,
#      and the C caller run against it under wine when wine is installed;
#   5. the docs (Doxygen, warnings as errors);
#   6. the benchmarks of the performance page (scripts/bench.sh): their ratios are printed for
#      the record; they fail the run only with PUMPLOSS_BENCH_STRICT=1 (timings on a shared
#      machine scatter; correctness never depends on them).
# Usage: scripts/check.sh            (build folders under build-check/, reused between runs)
# Each stage prints its time; the sum is printed at the end.
set -euo pipefail
here="$(cd "$(dirname "${BASH_SOURCE[0]}")/.." && pwd)"
cd "$here"
jobs="$(nproc 2>/dev/null || echo 2)"
out="${PUMPLOSS_CHECK_DIR:-build-check}"
python=/usr/bin/python3

bash scripts/setup.sh

t_all=$SECONDS
t_stage=$SECONDS
timings=()
step() {
  if [ ${#timings[@]} -gt 0 ] || [ -n "${stage:-}" ]; then
    timings+=("$(printf '%5ds  %s' $((SECONDS - t_stage)) "$stage")")
  fi
  stage="$*"
  t_stage=$SECONDS
  printf '\n==== %s ====\n' "$*"
}

step "static build, warnings as errors"
cmake -S . -B "$out/static" -DCMAKE_BUILD_TYPE=Release -DPUMPLOSS_WERROR=ON >/dev/null
cmake --build "$out/static" -j "$jobs"
step "static build: tests (incl. valgrind memcheck of the C and Fortran callers)"
ctest --test-dir "$out/static" --output-on-failure -j "$jobs"

step "WebAssembly module and calculator page: Node against the native library, headless Chromium"
bash scripts/web_test.sh "$out/static" "$out/web"

step "shared build (libpumploss.so): exports, callers, installed-package consumers"
cmake -S . -B "$out/shared" -DCMAKE_BUILD_TYPE=Release -DBUILD_SHARED_LIBS=ON -DPUMPLOSS_WERROR=ON \
  -DPUMPLOSS_BUILD_BENCH=OFF -DPUMPLOSS_BUILD_DOCS=OFF -DPUMPLOSS_BUILD_EXAMPLES=OFF \
  -DCMAKE_INSTALL_PREFIX="$here/$out/shared-install" >/dev/null
# Only what the C API tests need (the C++ unit tests ran in the static build).
shared_targets=(pumploss capi_c_caller_c90 capi_c_caller_c11 capi_badinput capi_threads
  capi_noalloc pumploss_header_c90 pumploss_header_c99 pumploss_header_c11)
if [ -d "$out/shared/tests/capi/CMakeFiles/capi_fortran_caller.dir" ]; then  # gfortran found
  shared_targets+=(capi_fortran_caller)
fi
cmake --build "$out/shared" -j "$jobs" --target "${shared_targets[@]}"
soname="$(objdump -p "$out"/shared/libpumploss.so | awk '/SONAME/ {print $2}')"
major="$(sed -n 's/^#define PUMPLOSS_VERSION_MAJOR \([0-9]*\).*/\1/p' include/pumploss/version.hpp)"
[ "$soname" = "libpumploss.so.$major" ] || { echo "SONAME is '$soname', expected libpumploss.so.$major"; exit 1; }
ls "$out"/shared/libpumploss.so.*.*.* >/dev/null || { echo "no versioned libpumploss.so.X.Y.Z"; exit 1; }
echo "SONAME $soname; file $(basename "$(ls "$out"/shared/libpumploss.so.*.*.*)")"
ctest --test-dir "$out/shared" --output-on-failure -j "$jobs" -L capi

step "sanitizers: the whole test suite under ASan+UBSan (clang)"
# Every ctest test of this build: the C++ unit tests, the C API tests (bad input, threads, the C
# callers), the CLI tests and examples. Not registered under sanitizers: the Python ctypes tests
# (the interpreter does not load the sanitizer runtime), valgrind (a second memory checker) and
# the counting-allocator test (the sanitizers bring their own malloc).
cmake --preset ci-linux-clang-asan -B "$out/asan" >/dev/null
cmake --build "$out/asan" -j "$jobs"
ASAN_OPTIONS=detect_leaks=1:abort_on_error=0:strict_string_checks=1:detect_stack_use_after_return=1 \
UBSAN_OPTIONS=print_stacktrace=1:halt_on_error=1 \
  ctest --test-dir "$out/asan" --output-on-failure -j "$jobs" -E '^capi_threads$'
# The thread test with fewer rounds (ASan makes it about 10 times slower; 8 threads still overlap).
ASAN_OPTIONS=detect_leaks=1 UBSAN_OPTIONS=print_stacktrace=1:halt_on_error=1 "$out/asan/tests/capi/capi_threads" 20 8

step "sanitizers: C API thread test under TSan (clang)"
cmake --preset ci-linux-clang-tsan -B "$out/tsan" >/dev/null
cmake --build "$out/tsan" -j "$jobs" --target capi_threads
# Fewer rounds than the plain build: TSan is 5-15 times slower; 8 threads still overlap.
TSAN_OPTIONS=halt_on_error=1:second_deadlock_stack=1 "$out/tsan/tests/capi/capi_threads" 20 8

fuzz_secs="${PUMPLOSS_FUZZ_SECONDS:-60}"
step "fuzzing: libFuzzer + ASan/UBSan, ${fuzz_secs} s per target from the committed corpus"
PUMPLOSS_CHECK_DIR="$out" bash scripts/fuzz.sh "$fuzz_secs"

step "coverage: gcc --coverage build, all tests, gcovr line coverage of include/ src/ capi/ (>= 90 %)"
cmake --preset ci-linux-gcc-coverage -B "$out/coverage" >/dev/null
cmake --build "$out/coverage" -j "$jobs"
find "$out/coverage" -name '*.gcda' -delete
# Not the thread test: its 8 threads update the same counters without atomics (negative counts
# that gcovr refuses); capi_badinput covers the same functions single-threaded.
ctest --test-dir "$out/coverage" --output-on-failure -j "$jobs" -E 'valgrind|^capi_threads$'
mkdir -p "$out/coverage/report"
# CMake's compiler-identification objects have notes but never run: gcov would only complain.
find "$out/coverage/CMakeFiles" -path '*CompilerId*' -name '*.gcno' -delete
gcovr -r "$here" --object-directory "$out/coverage" --gcov-exclude '.*CompilerId.*' \
  --filter "$here/include/" --filter "$here/src/" --filter "$here/capi/src/" \
  --txt "$out/coverage/report/coverage.txt" --html-details "$out/coverage/report/index.html" \
  --print-summary --fail-under-line "${PUMPLOSS_COVERAGE_MIN:-90}"
echo "per-file figures: $out/coverage/report/coverage.txt, browsable: $out/coverage/report/index.html"

step "Windows x64 DLL (mingw-w64): export table, C caller under wine"
cmake --preset ci-windows-x64 -B "$out/win64" >/dev/null
cmake --build "$out/win64" -j "$jobs"
"$python" tests/capi/check_exports.py --header=capi/include/pumploss.h --def=capi/pumploss.def \
  --exports=tests/capi/exports.txt --dll="$out/win64/pumploss.dll" --objdump=x86_64-w64-mingw32-objdump
x86_64-w64-mingw32-gcc -std=c89 -pedantic-errors -Wall -Wextra -Werror -DPUMPLOSS_SHARED \
  -Icapi/include tests/capi/c_caller.c "$out/win64/libpumploss.dll.a" -static -o "$out/win64/c_caller.exe"
if command -v wine64 >/dev/null 2>&1 || [ -x /usr/lib/wine/wine64 ]; then
  wine="$(command -v wine64 || echo /usr/lib/wine/wine64)"
  export WINEPREFIX="$here/$out/wineprefix" WINEDEBUG=-all WINEDLLOVERRIDES="mscoree,mshtml="
  (cd "$out/win64" && timeout 300 "$wine" c_caller.exe </dev/null)
  # wait for this prefix's wineserver to exit, so nothing of ours keeps running
  ws="$(dirname "$(readlink -f "$wine")")/wineserver"
  if [ -x "$ws" ]; then timeout 60 "$ws" -w || true; fi
else
  echo "wine64 not installed: the DLL's export table was checked, the C caller was not run on it"
fi

step "docs (Doxygen, warnings are errors)"
cmake --build "$out/static" --target docs

step "benchmarks: ratios against the baselines in one run (scripts/bench.sh)"
PUMPLOSS_BENCH_REPS="${PUMPLOSS_BENCH_REPS:-5}" bash scripts/bench.sh "$out/static"

step "all checks passed"
timings+=("$(printf '%5ds  total' $((SECONDS - t_all)))")
printf '%s\n' "${timings[@]}"
