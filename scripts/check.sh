#!/usr/bin/env bash
# The whole test suite, as CI runs it: install what is missing, then build and test
#   1. the static library with warnings as errors, all tests (ctest), valgrind on the callers;
#   1a. the demo (scripts/demo.sh) on the static build's program, into a scratch folder;
#   1b. the WebAssembly module and the calculator page (scripts/web_test.sh);
#   2. the shared build of everything (libpumploss_cxx.so + libpumploss.so, tests, benchmarks,
#      examples) and all its tests: exported symbols, the Python ctypes tests, the installed
#      package's C and C++ consumers (find_package, pkg-config; the static build's ctest ran
#      them against an installed static package); the .deb (scripts/package_check.sh deb);
#   3. the whole test suite under AddressSanitizer + UndefinedBehaviorSanitizer and the C API
#      thread test under ThreadSanitizer (clang);
#   3a. the libFuzzer targets (tests/fuzz), PUMPLOSS_FUZZ_SECONDS (default 45) each;
#   3b. line coverage of include/, src/, capi/ by the test suite (gcc --coverage, gcovr), failing
#      under PUMPLOSS_COVERAGE_MIN (default 90) percent;
#   4. the Windows x64 DLL (mingw-w64): export table against the generated pumploss.def and
#      exports.txt, and the C caller run against it under wine when wine is installed;
#      pumploss_cxx.dll (export table: pumploss:: functions only) with a C++ consumer under wine;
#      the Windows zip (scripts/package_check.sh zip);
#   5. the docs (Doxygen, warnings as errors) and the citation check (scripts/check_citations.py);
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

step "demo: scripts/demo.sh on the static build, into $out/demo"
PUMPLOSS_DEMO_BUILD="$out/static" bash scripts/demo.sh "$out/demo"

step "WebAssembly module and calculator page: Node against the native library, headless Chromium"
bash scripts/web_test.sh "$out/static" "$out/web"

step "shared build (libpumploss_cxx.so, libpumploss.so): everything, all tests, installed-package consumers"
cmake -S . -B "$out/shared" -DCMAKE_BUILD_TYPE=Release -DBUILD_SHARED_LIBS=ON -DPUMPLOSS_WERROR=ON \
  -DPUMPLOSS_BUILD_DOCS=OFF >/dev/null
cmake --build "$out/shared" -j "$jobs"
major="$(sed -n 's/^#define PUMPLOSS_VERSION_MAJOR \([0-9]*\).*/\1/p' include/pumploss/version.hpp)"
for lib in libpumploss libpumploss_cxx; do
  soname="$(objdump -p "$out/shared/$lib.so" | awk '/SONAME/ {print $2}')"
  [ "$soname" = "$lib.so.$major" ] || { echo "SONAME is '$soname', expected $lib.so.$major"; exit 1; }
  ls "$out/shared/$lib".so.*.*.* >/dev/null || { echo "no versioned $lib.so.X.Y.Z"; exit 1; }
  echo "SONAME $soname; file $(basename "$(ls "$out/shared/$lib".so.*.*.*)")"
done
ctest --test-dir "$out/shared" --output-on-failure -j "$jobs"
# the .deb (CPack): contents, unpacked into a scratch root, its program and find_package consumers
bash scripts/package_check.sh deb "$out/shared"

step "Python package: pip install --no-build-isolation into a scratch environment, its tests there"
venv="$here/$out/python-venv"
rm -rf "$venv"
"$python" -m venv --system-site-packages "$venv"
"$venv/bin/python" -m pip install -q --no-build-isolation --no-index --no-deps ./python
(cd "$out" && PYTHONDONTWRITEBYTECODE=1 "$venv/bin/python" -m pytest -q -p no:cacheprovider "$here/python/tests")
rm -rf python/build

step "LibreOffice Calc extension: sheet functions in a real .ods, recalculated headless, against the C API"
lib="$("$venv/bin/python" -c 'import pumploss; print(pumploss.library().path)')"
"$python" spreadsheet/libreoffice/build_oxt.py capi/include/pumploss.h "$lib" "$out/pumploss.oxt"
"$python" spreadsheet/libreoffice/recalc_test.py "$out/pumploss.oxt" "$lib" "$out/spreadsheet"

step "sanitizers: the whole test suite under ASan+UBSan (clang)"
# Every ctest test of this build: the C++ unit tests, the C API tests (bad input, threads, the C
# callers), the CLI tests and examples. Not registered under sanitizers: the Python ctypes tests
# (the interpreter does not load the sanitizer runtime), valgrind (a second memory checker) and
# the counting-allocator test (the sanitizers bring their own malloc).
cmake --preset ci-linux-clang-asan -B "$out/asan" >/dev/null
cmake --build "$out/asan" -j "$jobs"
ASAN_OPTIONS=detect_leaks=1:abort_on_error=0:strict_string_checks=1:detect_stack_use_after_return=1 \
UBSAN_OPTIONS=print_stacktrace=1:halt_on_error=1 \
  ctest --test-dir "$out/asan" --output-on-failure -j "$jobs" -E '^capi_(threads|shared_handles)$'
# The thread test with fewer rounds (ASan makes it about 10 times slower; 8 threads still overlap).
ASAN_OPTIONS=detect_leaks=1 UBSAN_OPTIONS=print_stacktrace=1:halt_on_error=1 "$out/asan/tests/capi/capi_threads" 20 8
ASAN_OPTIONS=detect_leaks=1 UBSAN_OPTIONS=print_stacktrace=1:halt_on_error=1 "$out/asan/tests/capi/capi_shared_handles" 10 8

step "sanitizers: C API thread tests under TSan (clang)"
cmake --preset ci-linux-clang-tsan -B "$out/tsan" >/dev/null
cmake --build "$out/tsan" -j "$jobs" --target capi_threads capi_shared_handles
# Fewer rounds than the plain build: TSan is 5-15 times slower; 8 threads still overlap.
TSAN_OPTIONS=halt_on_error=1:second_deadlock_stack=1 "$out/tsan/tests/capi/capi_threads" 20 8
# The handle contract: 8 threads evaluate ONE shared handle of every kind (pumploss.h).
TSAN_OPTIONS=halt_on_error=1:second_deadlock_stack=1 "$out/tsan/tests/capi/capi_shared_handles" 10 8

fuzz_secs="${PUMPLOSS_FUZZ_SECONDS:-45}"  # 45 s: all targets and their build within about 8 min
step "fuzzing: libFuzzer + ASan/UBSan, ${fuzz_secs} s per target from the committed corpus"
PUMPLOSS_CHECK_DIR="$out" bash scripts/fuzz.sh "$fuzz_secs"

step "coverage: gcc --coverage build, all tests, gcovr line coverage of include/ src/ capi/ (>= 90 %)"
cmake --preset ci-linux-gcc-coverage -B "$out/coverage" >/dev/null
cmake --build "$out/coverage" -j "$jobs"
find "$out/coverage" -name '*.gcda' -delete
# Counters are updated atomically (-fprofile-update=atomic in the preset): the program reads and
# writes on helper threads. The C API thread tests stay out all the same (slow under atomic
# counters); capi_badinput covers the same functions single-threaded.
ctest --test-dir "$out/coverage" --output-on-failure -j "$jobs" -E 'valgrind|^capi_(threads|shared_handles)$'
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
"$python" tests/capi/check_exports.py --header=capi/include/pumploss.h --def="$out/win64/bindings/pumploss.def" \
  --exports=tests/capi/exports.txt --dll="$out/win64/pumploss.dll" --objdump=x86_64-w64-mingw32-objdump
x86_64-w64-mingw32-gcc -std=c89 -pedantic-errors -Wall -Wextra -Werror -DPUMPLOSS_SHARED \
  -Icapi/include tests/capi/c_caller.c "$out/win64/libpumploss.dll.a" -static -o "$out/win64/c_caller.exe"
# the Windows zip (CPack): DLL, import library, .def, header, VBA module, docs
bash scripts/package_check.sh zip "$out/win64"
# The C++ core as a DLL of its own (PUMPLOSS_SELF_CONTAINED off): its export table holds exactly
# the PUMPLOSS_CXX_API functions of namespace pumploss, and a C++ program links them (dllimport).
cmake --preset ci-windows-x64 -B "$out/win64-cxx" -DPUMPLOSS_SELF_CONTAINED=OFF >/dev/null
cmake --build "$out/win64-cxx" -j "$jobs" --target pumploss_cxx
cxx_exports="$(x86_64-w64-mingw32-objdump -p "$out/win64-cxx/pumploss_cxx.dll" |
  awk '/\[Ordinal\/Name Pointer\] Table/ {t = 1; next} t && /^\t\[/ {print $NF; next} t {t = 0}')"
if [ -z "$cxx_exports" ] || printf '%s\n' "$cxx_exports" | grep -qv '^_ZNK\{0,1\}8pumploss'; then
  echo "pumploss_cxx.dll must export pumploss:: functions only; it exports:"; echo "$cxx_exports"; exit 1
fi
echo "pumploss_cxx.dll exports $(printf '%s\n' "$cxx_exports" | wc -l) pumploss:: functions, nothing else"
version="$(sed -n 's/^#define PUMPLOSS_VERSION "\(.*\)"/\1/p' include/pumploss/version.hpp)"
x86_64-w64-mingw32-g++ -std=c++17 -Wall -Wextra -Werror -DPUMPLOSS_CXX_SHARED -DEXPECTED_SHARED=1 \
  -DEXPECTED_VERSION="\"$version\"" -Iinclude tests/find-package/consumer.cpp \
  "$out/win64-cxx/libpumploss_cxx.dll.a" -static -o "$out/win64-cxx/consumer_cxx.exe"
if command -v wine64 >/dev/null 2>&1 || [ -x /usr/lib/wine/wine64 ]; then
  wine="$(command -v wine64 || echo /usr/lib/wine/wine64)"
  export WINEPREFIX="$here/$out/wineprefix" WINEDEBUG=-all WINEDLLOVERRIDES="mscoree,mshtml="
  (cd "$out/win64" && timeout 300 "$wine" c_caller.exe </dev/null)
  (cd "$out/win64-cxx" && timeout 300 "$wine" consumer_cxx.exe </dev/null)
  # wait for this prefix's wineserver to exit, so nothing of ours keeps running
  ws="$(dirname "$(readlink -f "$wine")")/wineserver"
  if [ -x "$ws" ]; then timeout 60 "$ws" -w || true; fi
else
  echo "wine64 not installed: the DLLs' export tables were checked, the C caller and C++ consumer were not run"
fi

step "docs (Doxygen, warnings are errors)"
# every file a comment or page cites exists; the checker's own test first (tests/check_citations_test.py)
/usr/bin/python3 "$here/tests/check_citations_test.py"
/usr/bin/python3 "$here/scripts/check_citations.py"
cmake --build "$out/static" --target docs

step "benchmarks: ratios against the baselines in one run (scripts/bench.sh)"
PUMPLOSS_BENCH_REPS="${PUMPLOSS_BENCH_REPS:-5}" bash scripts/bench.sh "$out/static"

step "all checks passed"
timings+=("$(printf '%5ds  total' $((SECONDS - t_all)))")
printf '%s\n' "${timings[@]}"
