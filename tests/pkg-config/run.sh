#!/bin/sh
# A consumer of the INSTALLED pumploss package through pkg-config only:
#   run.sh PREFIX WORKDIR [CC]
# compiles tests/find-package/consumer.c with `pkg-config --cflags --libs pumploss` and runs it.
set -eu
prefix="$1"; work="$2"; cc="${3:-cc}"
here="$(cd "$(dirname "$0")" && pwd)"
pc="$(find "$prefix" -name pumploss.pc | head -n 1)"
[ -n "$pc" ] || { echo "no pumploss.pc under $prefix"; exit 1; }
export PKG_CONFIG_PATH="$(dirname "$pc")"
version="$(pkg-config --modversion pumploss)"
libdir="$(pkg-config --variable=libdir pumploss)"
mkdir -p "$work"
# shellcheck disable=SC2046
"$cc" -std=c99 -Wall -Wextra -Werror -DEXPECTED_VERSION="\"$version\"" \
  $(pkg-config --cflags pumploss) "$here/../find-package/consumer.c" \
  $(pkg-config --libs pumploss) -lm -Wl,-rpath,"$libdir" -o "$work/consumer"
"$work/consumer"
