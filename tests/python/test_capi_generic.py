"""The ctypes module against the header: its hand-written signature tables agree with
pumploss.h, every status-returning function of the header is reachable, and every one keeps
the NaN/status conventions when called with NaN, infinities and zeros. New functions are picked
up from the header (PUMPLOSS_HEADER, set by ctest) without editing this file."""
import math
import os
import re

import pytest

import pumploss

HEADER = os.environ.get("PUMPLOSS_HEADER")
PROTOS = pumploss.parse_header(open(HEADER, encoding="utf-8").read()) if HEADER else {}
CODES = {int(v) for v in re.findall(r"#define\s+PUMPLOSS_(?:OK|E\w+|W\w+)\s+(\d+)\b",
                                     open(HEADER, encoding="utf-8").read())} if HEADER else set()
STATUS_FUNCS = sorted(n for n, (ret, params, _arrays) in PROTOS.items() if ret == "int" and params)


def test_header_found_and_parsed(lib):
    assert HEADER, "PUMPLOSS_HEADER is not set; run these tests through ctest"
    assert len(PROTOS) >= 14 and 0 in CODES and 5 in CODES
    assert all(k != "UNKNOWN" for _, params, _arrays in PROTOS.values() for k, _, _ in params), \
        "a parameter type the ctypes module cannot map"


def test_tables_agree_with_header(lib):
    """The hand tables (_SIGNATURES, _SCALAR) must match the header's prototypes exactly."""
    tables = dict(pumploss._SIGNATURES)
    for name, (n_in, n_out) in pumploss._SCALAR.items():
        tables[name] = ([pumploss._D] * n_in + [pumploss._PD] * n_out, n_out)
    for name, (argtypes, n_out) in tables.items():
        assert name in PROTOS, f"{name} is in the ctypes tables but not in pumploss.h"
        want = [pumploss._KIND_CTYPES[k] for k, _, _ in PROTOS[name][1]]
        assert argtypes == want, f"{name}: table {argtypes} != header {want}"
        assert n_out == sum(k == "DOUT" for k, _, _ in PROTOS[name][1]), name


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
    kinds = [k for k, _, _ in params if k in ("DOUT", "IOUT", "CBUF", "HOUT")]
    flat = []
    for kind, out in zip(kinds, outs):
        if kind == "DOUT":
            flat += out if isinstance(out, list) else [out]
    if 0 < status < 100:
        assert all(math.isnan(v) for v in flat), f"{name}: error {status} with non-NaN output {flat}"
    elif not batch:
        assert not any(math.isnan(v) for v in flat), f"{name}: status {status} with NaN output"
    if math.isnan(value) and any(k == "DIN" for k, _, _ in params) and not batch:
        assert 0 < status < 100, f"{name}: NaN inputs everywhere but status {status}"


def test_status_messages_cover_every_code(lib):
    unknown = lib.status_message(-12345)
    for code in CODES:
        msg = lib.status_message(code)
        assert msg and msg != unknown and msg.endswith("."), (code, msg)
