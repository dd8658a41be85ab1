#!/usr/bin/env bash
# Build pumploss and run the demo scenario of examples/demo/ (invented data).
set -euo pipefail
here="$(cd "$(dirname "${BASH_SOURCE[0]}")/.." && pwd)"
cd "$here"
cmake -S . -B build-demo -DCMAKE_BUILD_TYPE=Release -DPUMPLOSS_BUILD_TESTS=OFF \
  -DPUMPLOSS_BUILD_BENCH=OFF -DPUMPLOSS_BUILD_DOCS=OFF >/dev/null
cmake --build build-demo -j "$(nproc 2>/dev/null || echo 2)" --target pumploss_demo >/dev/null
./build-demo/examples/pumploss_demo examples/demo/oil.ini
