#!/bin/sh
# Consumers of the INSTALLED pumploss package through pkg-config only:
#   run.sh PREFIX WORKDIR [CC] [CXX]
# compiles tests/find-package/consumer.c with `pkg-config --cflags --libs pumploss` and
# tests/find-package/consumer.cpp with `pkg-config --cflags --libs pumploss-cxx`, and runs both.
# A static package (no libpumploss.so) is linked with `pkg-config --static`, which adds the C++
# core and runtime a C program needs (Libs.private).
set -eu
prefix="$1"; work="$2"; cc="${3:-cc}"; cxx="${4:-c++}"
here="$(cd "$(dirname "$0")" && pwd)"
pc="$(find "$prefix" -name pumploss.pc | head -n 1)"
[ -n "$pc" ] || { echo "no pumploss.pc under $prefix"; exit 1; }
export PKG_CONFIG_PATH="$(dirname "$pc")"
# The package was installed with `cmake --install --prefix`, not at the configured prefix:
# --define-prefix takes the prefix from where pumploss.pc lies.
pc() { pkg-config --define-prefix "$@"; }
version="$(pc --modversion pumploss)"
[ "$(pc --modversion pumploss-cxx)" = "$version" ] || { echo "pumploss-cxx.pc and pumploss.pc differ in version"; exit 1; }
libdir="$(pc --variable=libdir pumploss)"
static="--static"; ls "$libdir"/libpumploss.so* >/dev/null 2>&1 && static=""
shared=0; ls "$libdir"/libpumploss_cxx.so* >/dev/null 2>&1 && shared=1
mkdir -p "$work"
# shellcheck disable=SC2046,SC2086
"$cc" -std=c99 -Wall -Wextra -Werror -DEXPECTED_VERSION="\"$version\"" \
  $(pc --cflags pumploss) "$here/../find-package/consumer.c" \
  $(pc $static --libs pumploss) -lm -Wl,-rpath,"$libdir" -o "$work/consumer_c"
# shellcheck disable=SC2046,SC2086
"$cxx" -std=c++17 -Wall -Wextra -Werror -DEXPECTED_VERSION="\"$version\"" -DEXPECTED_SHARED=$shared \
  $(pc --cflags pumploss-cxx) "$here/../find-package/consumer.cpp" \
  $(pc $static --libs pumploss-cxx) -Wl,-rpath,"$libdir" -o "$work/consumer_cxx"
"$work/consumer_c"
"$work/consumer_cxx"
