#!/usr/bin/env bash
# The whole test suite, as CI runs it: install what is missing, then build and test
#   1. the static library with warnings as errors, all tests (ctest);
#   2. the shared library (exported symbols checked) and the installed-package consumers;
#   3. the docs (Doxygen, warnings as errors).
# Usage: scripts/check.sh            (build folders under build-check/)
set -euo pipefail
here="$(cd "$(dirname "${BASH_SOURCE[0]}")/.." && pwd)"
cd "$here"
jobs="$(nproc 2>/dev/null || echo 2)"
out="${PUMPLOSS_CHECK_DIR:-build-check}"

bash scripts/setup.sh

step() { printf '\n==== %s ====\n' "$*"; }

step "static build, warnings as errors"
cmake -S . -B "$out/static" -DCMAKE_BUILD_TYPE=Release -DPUMPLOSS_WERROR=ON >/dev/null
cmake --build "$out/static" -j "$jobs"
step "static build: tests"
ctest --test-dir "$out/static" --output-on-failure -j "$jobs"

step "shared build (libpumploss.so): exports and callers"
cmake -S . -B "$out/shared" -DCMAKE_BUILD_TYPE=Release -DBUILD_SHARED_LIBS=ON -DPUMPLOSS_WERROR=ON \
  -DPUMPLOSS_BUILD_BENCH=OFF -DPUMPLOSS_BUILD_DOCS=OFF -DPUMPLOSS_BUILD_EXAMPLES=OFF \
  -DCMAKE_INSTALL_PREFIX="$here/$out/shared-install" >/dev/null
cmake --build "$out/shared" -j "$jobs"
ctest --test-dir "$out/shared" --output-on-failure -j "$jobs" -L capi

step "docs (Doxygen, warnings are errors)"
cmake --build "$out/static" --target docs

step "all checks passed"
