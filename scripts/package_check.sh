#!/usr/bin/env bash
# The packages CPack builds (cmake/PumplossPackaging.cmake), checked as a user would get them:
#   scripts/package_check.sh deb BUILD   a shared Linux build: cpack -G DEB, list the .deb
#       (dpkg-deb -c) and check it holds the libraries, headers, the program, the docs, the
#       pkg-config and CMake files; unpack it into a scratch root, run the unpacked program
#       (--version, units, test-stand on the demo) and build and run tests/find-package's C and
#       C++ consumers against it (find_package with CMAKE_PREFIX_PATH=<root>/usr).
#   scripts/package_check.sh zip BUILD   the mingw build: cpack -G ZIP and check the zip holds
#       pumploss.dll, its import library, the generated .def, pumploss.h, the VBA module and the docs.
# Both take seconds on a built tree. scripts/check.sh calls them in its shared and Windows stages.
#
# The scratch root is made with `dpkg-deb -x`, not `dpkg --root=DIR --force-not-root -i`: dpkg
# with --root runs the package's maintainer scripts and triggers (ldconfig, from
# CPACK_DEBIAN_PACKAGE_GENERATE_SHLIBS) chrooted into DIR, which holds no shell or ldconfig, and
# it checks the Depends (libc6, libstdc++6, libfmt, ...) against DIR's empty package database;
# forcing both away leaves an unpack that `dpkg-deb -x` does directly. What dpkg would add (the
# ldconfig cache) the RUNPATHs make unnecessary: the program finds the libraries from its place.
set -euo pipefail
here="$(cd "$(dirname "${BASH_SOURCE[0]}")/.." && pwd)"
kind="${1:?usage: package_check.sh deb|zip BUILD}"
build="$(cd "${2:?usage: package_check.sh deb|zip BUILD}" && pwd)"

# need LISTING WHAT REGEX...: every extended regex matches a line of the listing
need() {
  local listing="$1" what="$2"
  shift 2
  for re in "$@"; do
    if ! grep -Eq "$re" <<<"$listing"; then
      echo "package_check: the $what lacks a file matching '$re'"
      exit 1
    fi
  done
}

case "$kind" in
  deb)
    rm -f "$build"/pumploss_*.deb
    (cd "$build" && cpack -G DEB >/dev/null 2>&1) || (cd "$build" && cpack -G DEB)
    deb="$(ls "$build"/pumploss_*.deb)"
    full="$(dpkg-deb -c "$deb")"
    listing="$(awk '{print $NF}' <<<"$full")"
    need "$listing" ".deb" \
      '^\./usr/lib/(.*/)?libpumploss\.so\.[0-9]+\.[0-9]+\.[0-9]+$' \
      '^\./usr/lib/(.*/)?libpumploss_cxx\.so\.[0-9]+\.[0-9]+\.[0-9]+$' \
      '^\./usr/include/pumploss\.h$' '^\./usr/include/pumploss/pumploss\.hpp$' \
      '^\./usr/include/pumploss/table_reader\.hpp$' '^\./usr/bin/pumploss$' \
      '^\./usr/share/doc/pumploss/README\.md$' '^\./usr/share/doc/pumploss/pages/.*\.md$' \
      '^\./usr/lib/(.*/)?pkgconfig/pumploss\.pc$' '^\./usr/lib/(.*/)?pkgconfig/pumploss-cxx\.pc$' \
      '^\./usr/lib/(.*/)?cmake/pumploss/pumploss-config\.cmake$' \
      '^\./usr/lib/(.*/)?cmake/pumploss/pumploss-targets\.cmake$' \
      '^\./usr/share/pumploss/spreadsheet/pumploss\.bas$'
    # symlinks show as "name -> target" in dpkg-deb -c: the unversioned development links
    grep -Eq '/libpumploss\.so -> ' <<<"$full" || { echo "package_check: no libpumploss.so link"; exit 1; }
    echo "$(basename "$deb"): $(wc -l <<<"$listing") entries; control:"
    dpkg-deb -f "$deb" Package Version Architecture Depends | sed 's/^/  /'
    root="$build/deb-package-install"
    rm -rf "$root"
    mkdir -p "$root"
    dpkg-deb -x "$deb" "$root"
    exe="$root/usr/bin/pumploss"
    # no LD_LIBRARY_PATH: the installed program finds the installed libraries by its RUNPATH
    "$exe" --version
    "$exe" units 250 bar psi
    # the whole report first (grep -q would close the pipe early: SIGPIPE under pipefail)
    report="$("$exe" test-stand "$here/examples/demo/test_stand.csv" --setup "$here/examples/demo/test_stand.toml")" ||
      { echo "package_check: the installed program's test-stand failed"; exit 1; }
    grep -q "Test-stand analysis" <<<"$report" || { echo "package_check: no test-stand report"; exit 1; }
    echo "installed program: --version, units and test-stand on the demo ran"
    consumer="$build/deb-consumer"
    rm -rf "$consumer"
    ctest --build-and-test "$here/tests/find-package" "$consumer" --build-generator "Unix Makefiles" \
      --build-options -DCMAKE_PREFIX_PATH="$root/usr" -DCMAKE_BUILD_TYPE=Release \
      --test-command ctest --output-on-failure >"$build/deb-consumer.log" 2>&1 ||
      { cat "$build/deb-consumer.log"; exit 1; }
    grep -E "found pumploss|tests passed" "$build/deb-consumer.log"
    ;;
  zip)
    rm -f "$build"/pumploss-*.zip
    (cd "$build" && cpack -G ZIP >/dev/null 2>&1) || (cd "$build" && cpack -G ZIP)
    zip="$(ls "$build"/pumploss-*.zip)"
    /usr/bin/python3 - "$zip" <<'EOF'
import re, sys, zipfile
names = zipfile.ZipFile(sys.argv[1]).namelist()
need = [r"/bin/pumploss\.dll$", r"/lib/libpumploss\.dll\.a$", r"/lib/pumploss\.def$", r"/include/pumploss\.h$",
        r"/include/pumploss/pumploss\.hpp$", r"/share/pumploss/spreadsheet/pumploss\.bas$",
        r"/share/doc/pumploss/README\.md$", r"/share/doc/pumploss/pages/.*\.md$"]
missing = [r for r in need if not any(re.search(r, n) for n in names)]
if missing:
    sys.exit("package_check: the zip lacks " + ", ".join(missing))
print(f"{sys.argv[1].rsplit('/', 1)[-1]}: {len(names)} entries, holds " +
      ", ".join(sorted({n.split('/', 1)[1] for n in names if re.search(r'\.(dll|a|def|h|bas)$', n)})))
EOF
    ;;
  *)
    echo "usage: package_check.sh deb|zip BUILD"
    exit 2
    ;;
esac
