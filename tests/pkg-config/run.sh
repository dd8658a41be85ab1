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
# The package was installed with `cmake --install --prefix`, not at the configured prefix:
# --define-prefix takes the prefix from where pumploss.pc lies.
pc() { pkg-config --define-prefix "$@"; }
version="$(pc --modversion pumploss)"
libdir="$(pc --variable=libdir pumploss)"
mkdir -p "$work"
# shellcheck disable=SC2046
"$cc" -std=c99 -Wall -Wextra -Werror -DEXPECTED_VERSION="\"$version\"" \
  $(pc --cflags pumploss) "$here/../find-package/consumer.c" \
  $(pc --libs pumploss) -lm -Wl,-rpath,"$libdir" -o "$work/consumer"
"$work/consumer"
