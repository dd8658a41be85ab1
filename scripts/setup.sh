#!/usr/bin/env bash
# Install what a fresh Debian machine lacks to build, test and document pumploss.
# Idempotent: when everything is present it only checks (a second or so) and changes nothing.
# Needs root (or sudo) only when something is missing.
set -euo pipefail

PACKAGES=(
  g++ gcc make cmake pkg-config binutils          # toolchain
  libboost-dev                                     # Boost.Multiprecision (test oracle)
  libgtest-dev libbenchmark-dev                    # GoogleTest, Google Benchmark
  doxygen graphviz                                 # docs
  python3 python3-pytest python3-fluids python3-mpmath python3-scipy  # binding generator (build), Python cross-checks
  gfortran                                         # Fortran caller test
  python3-numpy                                    # friction cross-checks (ulp distances)
  python3-pandas python3-dask python3-distributed  # Python package: pandas helper, Dask scale-out
  python3-venv python3-pip python3-setuptools python3-wheel  # pip install of the Python package
  libreoffice-calc-nogui python3-uno libreoffice-script-provider-python libreoffice-dev  # Calc extension and its test
  clang valgrind                                   # sanitizer builds (ASan, UBSan, TSan), memcheck
  g++-mingw-w64-x86-64                             # Windows x64 DLL cross-build
  wine64                                           # runs a C test against the DLL
  libclang-rt-dev gcovr linux-perf                 # libFuzzer runtime, coverage report, profiling
  libcli11-dev libfmt-dev libtomlplusplus-dev      # command-line program (app/)
  emscripten node-acorn chromium                   # WebAssembly module (scripts/web.sh), page tests
)

missing=()
for p in "${PACKAGES[@]}"; do
  if ! dpkg-query -W -f='${Status}' "$p" 2>/dev/null | grep -q "install ok installed"; then
    missing+=("$p")
  fi
done

if [ ${#missing[@]} -eq 0 ]; then
  echo "setup: all ${#PACKAGES[@]} packages present"
  exit 0
fi

echo "setup: missing packages: ${missing[*]}"
SUDO=""
if [ "$(id -u)" -ne 0 ]; then
  if command -v sudo >/dev/null 2>&1 && sudo -n true 2>/dev/null; then
    SUDO="sudo"
  else
    echo "setup: installing needs root. Run as root, or: sudo apt-get install ${missing[*]}" >&2
    exit 1
  fi
fi
export DEBIAN_FRONTEND=noninteractive
$SUDO apt-get update -qq
$SUDO apt-get install -y -qq --no-install-recommends "${missing[@]}"
echo "setup: installed ${missing[*]}"
