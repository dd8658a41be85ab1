#!/bin/sh
# cxx_exports.sh LIBRARY: every symbol a shared libpumploss_cxx defines for the dynamic linker
# is a function of namespace pumploss marked PUMPLOSS_CXX_API; at least one is (the macro works).
set -eu
lib="$1"
syms="$(nm -D --defined-only "$lib" | awk '$2 ~ /^[TtWwVvDdBbRr]$/ {print $3}' | c++filt)"
n="$(printf '%s\n' "$syms" | grep -c '^pumploss::' || true)"
other="$(printf '%s\n' "$syms" | grep -v '^pumploss::' | grep -v '^$' || true)"
if [ -n "$other" ]; then
  echo "$lib exports symbols outside namespace pumploss:"
  printf '%s\n' "$other"
  exit 1
fi
[ "$n" -gt 0 ] || { echo "$lib exports no pumploss:: function: PUMPLOSS_CXX_API has no effect"; exit 1; }
echo "$lib: $n functions of namespace pumploss exported, nothing else"
printf '%s\n' "$syms" | sed 's/^/  /'
