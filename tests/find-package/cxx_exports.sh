#!/bin/sh
# cxx_exports.sh LIBRARY: every strong symbol a shared libpumploss_cxx defines for the dynamic
# linker is a function of namespace pumploss marked PUMPLOSS_CXX_API; at least one is (the macro
# works). Weak symbols of the standard library's templates (std::vector<...> members that the
# exported workflow functions instantiate: vague linkage, emitted wherever they are used) are
# listed apart and allowed; a weak symbol of any other namespace is not.
set -eu
lib="$1"
strong="$(nm -D --defined-only "$lib" | awk '$2 ~ /^[TtDdBbRr]$/ {print $3}' | c++filt)"
weak="$(nm -D --defined-only "$lib" | awk '$2 ~ /^[WwVvu]$/ {print $3}' | c++filt)"
n="$(printf '%s\n' "$strong" | grep -c '^pumploss::' || true)"
other="$(printf '%s\n' "$strong" | grep -v '^pumploss::' | grep -v '^$' || true)"
weak_other="$(printf '%s\n' "$weak" | grep -v '^$' | grep -v '^\(void \)\?std::\|^pumploss::' || true)"
if [ -n "$other" ] || [ -n "$weak_other" ]; then
  echo "$lib exports symbols outside namespace pumploss:"
  printf '%s\n' "$other" "$weak_other" | grep -v '^$'
  exit 1
fi
[ "$n" -gt 0 ] || { echo "$lib exports no pumploss:: function: PUMPLOSS_CXX_API has no effect"; exit 1; }
echo "$lib: $n functions of namespace pumploss exported; $(printf '%s\n' "$weak" | grep -c . || true) weak template instances of std"
printf '%s\n' "$strong" | sed 's/^/  /'
