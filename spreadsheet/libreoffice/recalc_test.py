#!/usr/bin/env python3
"""The pumploss Calc extension in a real LibreOffice, headless: install pumploss.oxt into a
scratch user profile, write a spreadsheet (.ods) whose cells call the sheet functions on input
cells, close it, open the .ods again, recalculate, and compare every formula cell with the C API
called directly (ctypes, the same library). Bad input must show as an error cell.

    /usr/bin/python3 recalc_test.py pumploss.oxt LIBRARY OUT_DIR

Prints one line per cell (sheet value beside the C value) and '<N> passed, <M> failed'.
Exit status 0 only when every cell agrees. The .ods stays in OUT_DIR as the example layout.
"""
import ctypes
import os
import shutil
import subprocess
import sys
import tempfile
import time

import uno  # python3-uno: Debian's /usr/bin/python3 has it
from com.sun.star.beans import PropertyValue

HERE = os.path.dirname(os.path.abspath(__file__))
sys.path.insert(0, HERE)
from sheet_functions import FUNCTIONS  # noqa: E402

# Rows of the example sheet: (display name, inputs, expect an error cell). Inputs are SI except
# where a unit is asked for; values of an invented pump and an ISO VG 46 oil.
CASES = [
    ("PL_CONVERT", (250.0, "bar", "Pa"), False),
    ("PL_CONVERT", (60.0, "degC", "K"), False),
    ("PL_CONVERT", (12.0, "gpm", "L/min"), False),
    ("PL_CONVERT", (1.0, "bar", "furlong"), True),
    ("PL_VISCOSITY_D341", (313.15, 46e-6, 373.15, 6.8e-6, 273.15), False),
    ("PL_VISCOSITY_D341", (313.15, -46e-6, 373.15, 6.8e-6, 273.15), True),
    ("PL_DYNAMIC_VISCOSITY", (46e-6, 870.0), False),
    ("PL_PUMP_ETA_V", (71e-6, 25.0, 2e7, 1.7e-3, 240.0), False),
    ("PL_PUMP_ETA_HM", (71e-6, 25.0, 2e7, 1.7e-3, 240.0), False),
    ("PL_PUMP_ETA_T", (71e-6, 25.0, 2e7, 1.7e-3, 240.0), False),
    ("PL_PUMP_ETA_T", (71e-6, 0.0, 2e7, 1.7e-3, 240.0), True),
    ("PL_DRAIN_FRACTION", (3.2 / 60000, 71e-6, 25.0), False),
    ("PL_LEAKAGE_SCALE", (5e-5, 2e7, 0.04, 2.5e7, 0.02), False),
    ("PL_PIPE_PRESSURE_DROP", (10 / 60000, 870.0, 0.04, 0.0127, 5.0, 1.5e-6), False),
    ("PL_FRICTION_FACTOR", (1e5, 1e-4), False),
    ("PL_ORIFICE_FLOW", (2e6, 870.0, 1e-3, 0.62), False),
    ("PL_ANNULUS_FLOW", (2e7, 0.03, 0.02002, 0.02, 0.03, 0.5), False),
    ("PL_ANNULUS_FLOW", (2e7, 0.03, 0.019, 0.02, 0.03, 0.5), True),
]


def signature(cname):
    """The parameter kinds of a C function, from pumploss.h through tools/capigen."""
    import importlib.util
    root = os.path.dirname(os.path.dirname(HERE))
    spec = importlib.util.spec_from_file_location("capigen", os.path.join(root, "tools", "capigen", "capigen.py"))
    cg = importlib.util.module_from_spec(spec)
    spec.loader.exec_module(cg)
    f = next(f for f in cg.parse(os.path.join(root, "capi", "include", "pumploss.h"))[0] if f.name == cname)
    return [p.kind for p in f.params]


def c_value(lib, display, args):
    """The same calculation straight through the C API: (status, value)."""
    method, _d, cname, out_index, _x, _p = next(f for f in FUNCTIONS if f[1] == display)
    fn = getattr(lib, cname)
    conv = [a.encode() if isinstance(a, str) else ctypes.c_double(a) for a in args]
    fn.restype = ctypes.c_int
    n_out = len(signature(cname)) - len(args)
    outs = [ctypes.c_double() for _ in range(n_out)]
    st = fn(*conv, *[ctypes.byref(o) for o in outs])
    return st, outs[out_index].value


def prop(name, value):
    p = PropertyValue()
    p.Name, p.Value = name, value
    return p


def main(argv):
    oxt, library, out_dir = (os.path.abspath(a) for a in argv[1:4])
    os.makedirs(out_dir, exist_ok=True)
    profile = tempfile.mkdtemp(prefix="pl-lo-profile-")
    env = dict(os.environ, HOME=profile, SAL_USE_VCLPLUGIN="svp")
    # A scratch profile, and the "shared" extension store inside it: unopkg refuses a per-user
    # install as root, and a really shared one would write into LibreOffice's installation.
    user = ["-env:UserInstallation=" + uno.systemPathToFileUrl(profile),
            "-env:UNO_SHARED_PACKAGES_CACHE=" + uno.systemPathToFileUrl(os.path.join(profile, "shared"))]
    subprocess.run(["unopkg", "add", "--shared", "--suppress-license", *user, oxt], check=True, env=env,
                   stdout=subprocess.DEVNULL, timeout=300)
    pipe = f"pumploss{os.getpid()}"
    office = subprocess.Popen(["soffice", "--headless", "--invisible", "--norestore", "--nologo",
                               "--nodefault", *user, f"--accept=pipe,name={pipe};urp;"], env=env,
                              stdout=subprocess.DEVNULL, stderr=subprocess.DEVNULL)
    failed = passed = 0
    try:
        local = uno.getComponentContext()
        resolver = local.ServiceManager.createInstanceWithContext("com.sun.star.bridge.UnoUrlResolver", local)
        ctx = None
        for _ in range(120):
            try:
                ctx = resolver.resolve(f"uno:pipe,name={pipe};urp;StarOffice.ComponentContext")
                break
            except Exception:
                time.sleep(0.5)
        if ctx is None:
            print("recalc_test: LibreOffice did not answer")
            return 1
        desktop = ctx.ServiceManager.createInstanceWithContext("com.sun.star.frame.Desktop", ctx)
        hidden = (prop("Hidden", True),)

        # 1. write the example sheet: a header, inputs in B.., the formula in column A
        doc = desktop.loadComponentFromURL("private:factory/scalc", "_blank", 0, hidden)
        sheet = doc.Sheets.getByIndex(0)
        sheet.getCellByPosition(0, 0).setString("result (SI)")
        sheet.getCellByPosition(1, 0).setString("inputs (SI unless a unit is asked for) ->")
        for r, (display, args, _bad) in enumerate(CASES, start=1):
            refs = []
            for c, a in enumerate(args, start=1):
                cell = sheet.getCellByPosition(c, r)
                if isinstance(a, str):
                    cell.setString(a)
                else:
                    cell.setValue(a)
                refs.append(cell.AbsoluteName.split(".")[-1].replace("$", ""))
            sheet.getCellByPosition(0, r).setFormula(f"={display}({';'.join(refs)})")
        ods = os.path.join(out_dir, "pumploss_sheet_functions.ods")
        doc.storeToURL(uno.systemPathToFileUrl(ods), (prop("FilterName", "calc8"),))
        doc.close(True)

        # 2. open the .ods again, recalculate everything, read the formula cells
        doc = desktop.loadComponentFromURL(uno.systemPathToFileUrl(ods), "_blank", 0, hidden)
        doc.calculateAll()
        sheet = doc.Sheets.getByIndex(0)
        lib = ctypes.CDLL(library)
        for r, (display, args, bad) in enumerate(CASES, start=1):
            cell = sheet.getCellByPosition(0, r)
            err, value = cell.getError(), cell.getValue()
            # the inputs as the sheet holds them (a .ods keeps numbers to 15 digits or so)
            held = tuple(a if isinstance(a, str) else sheet.getCellByPosition(c, r).getValue()
                         for c, a in enumerate(args, start=1))
            st, want = c_value(lib, display, held)
            if bad:
                ok = err != 0 and 0 < st < 100
                line = f"{display}{args}: sheet error {err}, C status {st}"
            else:
                ok = err == 0 and st == 0 and value == want
                line = f"{display}{args}: sheet {value!r}, C {want!r}"
            print(("ok   " if ok else "FAIL ") + line)
            passed, failed = passed + ok, failed + (not ok)
        formula = sheet.getCellByPosition(0, 5).getFormula()
        print(f"example formula as stored: {formula}")
        doc.close(True)
        try:
            desktop.terminate()
        except Exception:
            pass  # the bridge closes as the office exits
    finally:
        try:
            office.wait(timeout=60)
        except subprocess.TimeoutExpired:
            office.kill()
        shutil.rmtree(profile, ignore_errors=True)
    print(f"{passed} passed, {failed} failed")
    return 0 if failed == 0 and passed == len(CASES) else 1


if __name__ == "__main__":
    sys.exit(main(sys.argv))
