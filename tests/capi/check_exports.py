#!/usr/bin/env python3
"""ABI tripwire: the functions declared in pumploss.h, listed in pumploss.def, listed in
tests/capi/exports.txt and (shared builds) exported by libpumploss.so must be the same set,
and the C caller test must call every one of them."""
import argparse
import re
import subprocess
import sys


def header_functions(path):
    text = open(path, encoding="utf-8").read()
    return set(re.findall(r"PUMPLOSS_CALL\s+(pumploss_\w+)\s*\(", text))


def def_functions(path):
    names = set()
    in_exports = False
    for line in open(path, encoding="utf-8"):
        line = line.split(";")[0].strip()
        if not line:
            continue
        if line.upper() == "EXPORTS":
            in_exports = True
            continue
        if in_exports:
            names.add(line.split()[0])
    return names


def main():
    ap = argparse.ArgumentParser()
    ap.add_argument("--header", required=True)
    ap.add_argument("--def", dest="deffile", required=True)
    ap.add_argument("--exports", required=True)
    ap.add_argument("--callers", action="append", default=[])
    ap.add_argument("--library")
    ap.add_argument("--dll", help="a Windows DLL: its export table (objdump -p) must equal the .def")
    ap.add_argument("--objdump", default="objdump")
    a = ap.parse_args()
    sets = {
        "pumploss.h": header_functions(a.header),
        "pumploss.def": def_functions(a.deffile),
        "exports.txt": {l.split("#")[0].strip() for l in open(a.exports) if l.split("#")[0].strip()},
    }
    if a.library:
        out = subprocess.run(["nm", "-D", "--defined-only", a.library], check=True,
                             capture_output=True, text=True).stdout
        syms = {l.split()[-1] for l in out.splitlines() if l.split() and l.split()[1] in "TtWwDdBbRr" and len(l.split()) == 3}
        syms = {s.split("@")[0] for s in syms}
        foreign = sorted(s for s in syms if not s.startswith("pumploss_"))
        if foreign:
            print("libpumploss.so exports non-pumploss_ symbols:", foreign[:20])
            return 1
        sets["libpumploss.so"] = syms
    if a.dll:
        out = subprocess.run([a.objdump, "-p", a.dll], check=True, capture_output=True, text=True).stdout
        names, in_table, imports = set(), False, []
        for line in out.splitlines():
            if "[Ordinal/Name Pointer] Table" in line:
                in_table = True
                continue
            m = re.match(r"\s*\[\s*\d+\]\s+(\S+)", line)
            if in_table and m:
                names.add(m.group(1))
            elif in_table and line.strip() == "":
                in_table = False
            m = re.match(r"\s*DLL Name:\s*(\S+)", line)
            if m:
                imports.append(m.group(1))
        if not names:
            print(f"no export table found in {a.dll}")
            return 1
        foreign = sorted(s for s in names if not s.startswith("pumploss_"))
        if foreign:
            print(f"{a.dll} exports non-pumploss_ symbols:", foreign[:20])
            return 1
        system = re.compile(r"^(kernel32|msvcrt|ucrtbase|api-ms-win-.*|user32|advapi32|ntdll)\.dll$", re.I)
        private = [d for d in imports if not system.match(d)]
        if private:
            print(f"{a.dll} needs DLLs a Windows machine lacks: {private} (link the runtime statically)")
            return 1
        print(f"{a.dll}: {len(names)} exports; imports only {sorted(set(imports))}")
        sets[a.dll] = names
    ref = sets["pumploss.h"]
    ok = True
    for name, s in sets.items():
        if s != ref:
            ok = False
            print(f"{name} differs from pumploss.h: missing {sorted(ref - s)}, extra {sorted(s - ref)}")
    called = set()
    for c in a.callers:
        called |= set(re.findall(r"\b(pumploss_\w+)\s*\(", open(c, encoding="utf-8").read()))
    if a.callers and ref - called:
        ok = False
        print("not called by any C caller test:", sorted(ref - called))
    print(f"{len(ref)} C API functions; sets agree: {ok}")
    return 0 if ok else 1


if __name__ == "__main__":
    sys.exit(main())
