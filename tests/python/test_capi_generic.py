"""The ctypes module against the bindings generated from pumploss.h at build time
(the ctypes table that tools/capigen/capigen.py writes into the build folder): every function is reachable without a
header at run time, and every status-returning function keeps the NaN/status conventions when
called with NaN, infinities and zeros. New functions are picked up without editing this file."""
import math

import pytest

import pumploss
import pumploss_signatures

PROTOS = pumploss_signatures.FUNCTIONS
CODES = set(pumploss_signatures.STATUS_CODES.values())
STATUS_FUNCS = sorted(n for n, (ret, params, _arrays) in PROTOS.items() if ret == "int" and params)


def test_generated_table_is_complete(lib):
    assert len(PROTOS) >= 14 and 0 in CODES and 5 in CODES
    kinds = set(pumploss._KIND_CTYPES)
    assert all(k in kinds for _, params, _arrays in PROTOS.values() for k, _, _ in params), \
        "a parameter kind the ctypes module cannot map"
    # status codes and option constants are module attributes
    assert pumploss.PUMPLOSS_EMISUSE == 5 and pumploss.PUMPLOSS_EPARTIAL == 13
    assert pumploss.PUMPLOSS_MODEL_WILSON == 0 and pumploss.PUMPLOSS_BORE_HOSE == 2
    assert pumploss.is_error(pumploss.PUMPLOSS_EPARTIAL) and pumploss.is_report(pumploss.PUMPLOSS_WREGIME)
    assert not pumploss.is_error(0) and not pumploss.is_report(0)


def test_no_header_needed_at_run_time(lib, monkeypatch):
    monkeypatch.delenv("PUMPLOSS_HEADER", raising=False)
    again = pumploss.load(lib.path)
    assert again.raw("pumploss_viscosity_d341", 313.15, 46e-6, 373.15, 6.8e-6, 313.15)[0] == 0
    st, n = again.raw("pumploss_line_element_count", None)  # size_t* output, NULL handle
    assert st == pumploss.PUMPLOSS_EMISUSE


def test_every_header_function_is_reachable(lib):
    assert set(STATUS_FUNCS) <= set(lib.functions())
    for name in PROTOS:
        assert hasattr(lib._dll, name), f"{name} is declared but not exported"


def _args(params, value, arrays):
    """Inputs for raw(): `value` in every double, 0 in ints, 'bar' for strings, arrays of 3.
    `batch` is true when the outputs are per-element arrays (each element has its own status)."""
    batch = bool(arrays)
    args = []
    for kind, _, _ in params:
        if kind == "DIN":
            args.append(value)
        elif kind == "IIN":
            args.append(0)
        elif kind == "STR":
            args.append("bar")
        elif kind == "DARR":
            args.append([value] * 3)
        elif kind == "IARR":
            args.append([0] * 3)
        elif kind == "HIN":
            args.append(None)  # NULL handle
    return args, batch


@pytest.mark.parametrize("name", STATUS_FUNCS)
@pytest.mark.parametrize("value", [math.nan, math.inf, -math.inf, 0.0, -1.0, 1e300])
def test_conventions_hold_for_every_function(lib, name, value):
    params = PROTOS[name][1]
    args, batch = _args(params, value, PROTOS[name][2])
    status, *outs = lib.raw(name, *args)
    assert status in CODES, f"{name}: undocumented status {status}"
    if any(k == "HIN" for k, _, _ in params):
        assert status == 5, f"{name}(NULL handle) gave {status}, not PUMPLOSS_EMISUSE"
    kinds = [k for k, _, _ in params if k in ("DOUT", "IOUT", "ZOUT", "CBUF", "HOUT")]
    flat = []
    for kind, out in zip(kinds, outs):
        if kind == "DOUT":
            flat += out if isinstance(out, list) else [out]
    if pumploss.is_error(status) and status != pumploss.PUMPLOSS_EPARTIAL:
        assert all(math.isnan(v) for v in flat), f"{name}: error {status} with non-NaN output {flat}"
    elif not batch and status != pumploss.PUMPLOSS_WUNDEFINED:
        assert not any(math.isnan(v) for v in flat), f"{name}: status {status} with NaN output"
    if not pumploss.is_error(status):
        assert not any(math.isinf(v) for v in flat), f"{name}: usable status {status} with an infinite output"
    if math.isnan(value) and any(k == "DIN" for k, _, _ in params) and not batch:
        assert 0 < status < 100, f"{name}: NaN inputs everywhere but status {status}"


def test_status_messages_cover_every_code(lib):
    unknown = lib.status_message(-12345)
    for code in CODES:
        msg = lib.status_message(code)
        assert msg and msg != unknown and msg.endswith("."), (code, msg)


def test_vba_module_declares_every_function_type_for_type(lib):
    """The VBA module generated beside the ctypes table: a 64-bit Declare PtrSafe per function,
    outputs ByRef, pointers and size_t as LongPtr, within the VBA limits (24 line continuations
    per statement, 1023 characters per line)."""
    import os
    import re
    path = os.path.join(os.path.dirname(pumploss_signatures.__file__), "pumploss.bas")
    text = open(path, encoding="utf-8", newline="").read()
    assert "\r\n" in text and "\n" not in text.replace("\r\n", ""), "VBA modules are CRLF text"
    lines = text.split("\r\n")
    assert max(len(l) for l in lines) <= 1023
    statements = re.findall(r"^Public Declare PtrSafe (Function|Sub) (pumploss_\w+) Lib \"pumploss.dll\" \((.*?)\)( As \w+)?$",
                            text.replace("\r\n", "\n").replace(" _\n    ", " "), re.M)
    decl = {name: (kind, args, ret) for kind, name, args, ret in statements}
    assert set(decl) == set(PROTOS)
    want = {"DIN": "ByVal Double", "IIN": "ByVal Long", "SIZE": "ByVal LongPtr", "BUFLEN": "ByVal LongPtr",
            "DARR": "ByRef Double", "DOUT": "ByRef Double", "IOUT": "ByRef Long", "ZOUT": "ByRef LongPtr",
            "IARR": "ByRef Long", "STR": "ByVal String", "CBUF": "ByVal String", "HIN": "ByVal LongPtr",
            "HOUT": "ByRef LongPtr"}
    for name, (ret, params, _arrays) in PROTOS.items():
        kind, args, vret = decl[name]
        got = [re.sub(r"^(ByVal|ByRef) \w+ As (\w+)$", r"\1 \2", a.strip()) for a in args.split(",") if a.strip()]
        assert got == [want[k] for k, _, _ in params], name
        assert (kind == "Sub") == (ret == "void"), name
        if ret != "void":
            assert vret == (" As LongPtr" if ret == "const char*" else " As Long"), name
    for n, v in pumploss_signatures.STATUS_CODES.items():
        assert f"Public Const {n} As Long = {v}\r\n" in text
