"""pumploss for Python: hydraulic pump leakage and efficiency calculations (the pumploss C API).

    import numpy as np, pumploss
    nu = pumploss.viscosity_d341(313.15, 46e-6, 373.15, 6.8e-6, 273.15)          # m^2/s, a float
    r = pumploss.pump_efficiency(71e-6, 25.0, np.array([1e7, 2e7]), 1.7e-3, 240.0)
    r.eta_t, r.status                                                           # arrays

Every C function ``pumploss_NAME`` of pumploss.h is ``pumploss.NAME``. Units are SI and part of
each parameter name (dp_pa, mu_pa_s, q_m3_s, t_k); ``pumploss.convert(value, "bar", "Pa")``
converts at the edges.

Scalars and arrays (the rules, stated once):
- All-scalar inputs call the scalar C function. One output comes back as a float, several as a
  named tuple. An error status (1-99) raises ``PumplossError`` (``.status``, ``.function``); a
  report status (100 and up: valid, but outside a stated assumption) warns with
  ``PumplossWarning``.
- Any numpy array or sequence among the inputs of a scalar function: the inputs broadcast by
  numpy's rules (incompatible shapes raise ``ValueError``) and the result is a named tuple of
  float arrays of the broadcast shape plus ``status``, an int32 array of per-element statuses:
  nothing is raised for an element; an element with an error status has NaN outputs. Where the
  C API has a ``_batch`` function for it, the whole array goes through one C call; otherwise
  the scalar function is called per element.
- Functions that take arrays themselves (fits, batches, grids) take sequences; a ``size_t``
  count is taken from the arrays that follow it (all of them must have that length, else
  ``ValueError``); two counts in a row (a levels x per-level grid) are passed explicitly.
- Handles are classes (``pumploss.Line``, ``pumploss.Model``, ...): the constructor takes the
  create function's inputs, methods are the functions of that handle kind, ``close()`` frees
  it, and a ``with`` block closes it. A handle's evaluations never change it (pumploss.h), so a
  configured handle may be shared by threads.

The shared library is inside the package (``PUMPLOSS_LIBRARY`` overrides it). Results are
engineering estimates: the pump maker's data and limits, local codes and licensed engineering
practice take precedence.
"""
import collections
import ctypes
import os
import warnings

import numpy as np

from ._ctypes_api import (Library, PumplossError, PumplossWarning, is_error, is_report, load,
                          _KIND_CTYPES, _signatures)

FUNCTIONS = _signatures.FUNCTIONS
COUNTS = _signatures.COUNTS
ARRAY_COUNTS = _signatures.ARRAY_COUNTS
STATUS_CODES = _signatures.STATUS_CODES
CONSTANTS = _signatures.CONSTANTS
DOCS = getattr(_signatures, "DOCS", {})
globals().update(STATUS_CODES)
globals().update(CONSTANTS)

OK = 0
_PREFIX = "pumploss_"
_OUT_KINDS = ("DOUT", "IOUT", "ZOUT")
_lib = None


def library():
    """The loaded shared library (a pumploss._ctypes_api.Library), loaded on first use."""
    global _lib
    if _lib is None:
        path = os.environ.get("PUMPLOSS_LIBRARY")
        if not path:
            here = os.path.dirname(os.path.abspath(__file__))
            for name in ("libpumploss.so", "pumploss.dll", "libpumploss.dylib"):
                if os.path.exists(os.path.join(here, name)):
                    path = os.path.join(here, name)
                    break
        _lib = Library(path)
    return _lib


def version():
    """The library's version, "MAJOR.MINOR.PATCH"."""
    return library().version()


def status_message(status):
    """The library's one-sentence description of a status code."""
    return library().status_message(int(status))


def _raise_or_warn(fname, status):
    if is_error(status):
        err = PumplossError(status, f"{fname}: {status_message(status)}")
        err.function = fname
        raise err
    if is_report(status):
        warnings.warn(f"{fname}: {status_message(status)}", PumplossWarning, stacklevel=3)


def _is_array(v):
    return isinstance(v, (np.ndarray, list, tuple)) and not isinstance(v, (str, bytes))


_TUPLES = {}


def _result_type(fname, fields):
    key = (fname, tuple(fields))
    if key not in _TUPLES:
        _TUPLES[key] = collections.namedtuple(fname + "_result", fields)
    return _TUPLES[key]


class _Fn:
    """One C function with its parameter kinds, called with ctypes."""

    def __init__(self, name):
        self.name = name
        self.short = name[len(_PREFIX):]
        self.ret, self.params, arrays = FUNCTIONS[name]
        self.arrays = set(arrays)
        self.outs = [p for p in self.params if p[0] in _OUT_KINDS or p[0] in ("CBUF", "HOUT")]
        self.out_names = ["element_status" if p[2] == "status" and p[0] == "IOUT" and p[2] in self.arrays
                          else p[2] for p in self.outs if p[0] != "HOUT"]
        self.ins = [p for p in self.params if p[0] in ("DIN", "IIN", "STR", "HIN", "DARR", "IARR", "SIZE")]
        self.scalar = all(p[0] in ("DIN", "IIN", "STR", "HIN") for p in self.ins)
        # where each count comes from (the arrays after it, the arrays before it, or the caller):
        # the rule is stated once, in tools/capigen/capigen.py, and comes with the generated table
        src = COUNTS.get(name, {})
        self.explicit_sizes = {k for k, v in src.items() if v == "explicit"}
        self.sizes_after = {k for k, v in src.items() if v == "before"}  # the count follows its arrays
        # input arrays counted by explicit counts only (a levels x per_level grid): checked
        # against the product of those counts before the call
        self.grid_arrays = {a: dims for a, dims in ARRAY_COUNTS.get(name, {}).items()
                            if dims and all(d in self.explicit_sizes for d in dims)}
        self.user_ins = [p for p in self.ins if not (p[0] == "SIZE" and p[2] not in self.explicit_sizes)]
        self._c = None

    @property
    def c(self):
        if self._c is None:
            self._c = library().function(self.name)
        return self._c

    def call_raw(self, args, handle=None):
        """Call with the user's inputs (scalars; sequences for array parameters)."""
        it = iter(args)
        conv, outs, sizes, keep = [], [], [], []
        pending = []  # counts to be filled from the arrays after them
        given = {}  # explicit counts by name
        last_arrays = []  # lengths of the arrays since the last count
        for kind, _ctype, pname in self.params:
            if kind == "HIN":
                conv.append(handle if handle is not None else next(it))
            elif kind == "DIN":
                conv.append(float(next(it)))
            elif kind == "IIN":
                conv.append(int(next(it)))
            elif kind == "STR":
                v = next(it)
                conv.append(v.encode() if isinstance(v, str) else v)
            elif kind == "SIZE":
                if pname in self.explicit_sizes:
                    n = int(next(it))
                    given[pname] = n
                    conv.append(n)
                    sizes.append(n)
                elif pname in self.sizes_after:
                    n = last_arrays[0] if last_arrays else 0
                    if any(m != n for m in last_arrays):
                        raise ValueError(f"{self.short}: the arrays before {pname} differ in length {last_arrays}")
                    conv.append(n)
                    sizes.append(n)
                    last_arrays = []
                else:
                    pending = [len(conv), None]
                    conv.append(None)
                    sizes.append(None)
            elif kind == "BUFLEN":
                conv.append(4096)
            elif kind in ("DARR", "IARR"):
                dtype = np.float64 if kind == "DARR" else np.intc
                a = np.ascontiguousarray(next(it), dtype=dtype).ravel()
                keep.append(a)
                last_arrays.append(a.size)
                if pname in self.grid_arrays:
                    want = int(np.prod([given[d] for d in self.grid_arrays[pname]]))
                    if a.size != want:
                        raise ValueError(f"{self.short}: {pname} has {a.size} elements, "
                                         f"{' x '.join(self.grid_arrays[pname])} = {want} expected")
                if pending:
                    if pending[1] is None:
                        pending[1] = a.size
                        conv[pending[0]] = a.size
                        sizes[sizes.index(None)] = a.size
                    elif a.size != pending[1]:
                        raise ValueError(f"{self.short}: {pname} has {a.size} elements, the arrays before it {pending[1]}")
                ptype = ctypes.POINTER(ctypes.c_double if kind == "DARR" else ctypes.c_int)
                conv.append(a.ctypes.data_as(ptype))
            elif kind in _OUT_KINDS:
                n = 1
                if pname in self.arrays:
                    for s in sizes:
                        n *= s if s is not None else 0
                dtype = {"DOUT": np.float64, "IOUT": np.intc, "ZOUT": np.uintp}[kind]
                o = np.empty(max(n, 1), dtype=dtype)
                outs.append((pname in self.arrays, o, n))
                conv.append(o.ctypes.data_as(_KIND_CTYPES[kind]))
            elif kind == "CBUF":
                o = ctypes.create_string_buffer(4096)
                outs.append(("str", o, 0))
                conv.append(o)
            elif kind == "HOUT":
                o = ctypes.c_void_p(None)
                outs.append(("handle", o, 0))
                conv.append(ctypes.byref(o))
        if any(v is None for v in conv):
            raise ValueError(f"{self.short}: a count has no array after it to take its length from")
        status = self.c(*conv)
        vals = []
        for kind, o, n in outs:
            if kind == "str":
                vals.append(o.value.decode(errors="replace"))
            elif kind == "handle":
                vals.append(o.value)
            elif kind:
                vals.append(o[:n] if o.dtype != np.intc else o[:n].astype(np.int32, copy=False))
            else:
                vals.append(o[0].item())
        return status, vals


class _Function(_Fn):
    """A module-level function: scalars, or numpy arrays broadcast together."""

    def __init__(self, name):
        super().__init__(name)
        batch = name + "_batch"
        self.batch = None
        if self.scalar and batch in FUNCTIONS:
            b = _Fn(batch)
            din = [p[2] for p in self.ins]
            darr = [p[2] for p in b.params if p[0] == "DARR"]
            if all(p[0] == "DIN" for p in self.ins) and din == darr:
                self.batch = b

    def __call__(self, *args):
        if len(args) != len(self.user_ins):
            raise TypeError(f"{self.short}() takes {len(self.user_ins)} arguments "
                            f"({', '.join(p[2] for p in self.user_ins)}), {len(args)} given")
        if self.scalar and any(_is_array(a) for a in args):
            return self._broadcast(args)
        status, vals = self.call_raw(args)
        if self.ret == "int":
            _raise_or_warn(self.short, status)
        return self._pack(vals)

    def _pack(self, vals, status=None):
        names = list(self.out_names)
        if status is not None:
            names.append("status")
            vals = list(vals) + [status]
        if not names:
            return None
        if len(names) == 1:
            return vals[0]
        return _result_type(self.short, names)(*vals)

    def _broadcast(self, args):
        for p, a in zip(self.ins, args):
            if p[0] in ("STR", "HIN") and _is_array(a):
                raise ValueError(f"{self.short}: {p[2]} cannot be an array")
        idx = [i for i, p in enumerate(self.ins) if p[0] in ("DIN", "IIN")]
        arrays = np.broadcast_arrays(*[np.asarray(args[i], dtype=np.float64 if self.ins[i][0] == "DIN" else np.intc)
                                       for i in idx])  # ValueError on shapes that do not broadcast
        shape = arrays[0].shape if arrays else ()
        n = int(np.prod(shape)) if shape else 1
        if self.batch is not None:
            flat = [np.ascontiguousarray(a).reshape(-1) for a in arrays]
            status, vals = self.batch.call_raw(flat)
            if is_error(status) and status != STATUS_CODES.get("PUMPLOSS_EPARTIAL", -1):
                _raise_or_warn(self.short, status)
            *outs, elem = vals
            outs = [o.reshape(shape) for o in outs]
            return self._pack(outs, elem.reshape(shape))
        outs = [np.full(n, np.nan) for _ in self.out_names]
        elem = np.zeros(n, dtype=np.int32)
        flat = [a.reshape(-1) for a in arrays]
        row = list(args)
        for k in range(n):
            for j, i in enumerate(idx):
                row[i] = flat[j][k]
            st, vals = self.call_raw(row)
            elem[k] = st
            if not is_error(st):
                for o, v in zip(outs, vals):
                    o[k] = v
        return self._pack([o.reshape(shape) for o in outs], elem.reshape(shape))


class Handle:
    """Base of the handle classes: owns one C handle, closed by close() or a with block."""

    _type = None
    _destroy = None
    _create = None

    def __init__(self, *args):
        if self._create is None:
            raise TypeError(f"{type(self).__name__} has no create function")
        status, vals = self._create.call_raw(args)
        _raise_or_warn(self._create.short, status)
        self._ptr = vals[-1]
        self.create_status = status

    @classmethod
    def _from_create(cls, fn, args):
        obj = cls.__new__(cls)
        status, vals = fn.call_raw(args)
        _raise_or_warn(fn.short, status)
        obj._ptr = vals[-1]
        obj.create_status = status
        return obj

    @property
    def closed(self):
        return getattr(self, "_ptr", None) is None

    def close(self):
        """Free the C handle (closing twice is a no-op)."""
        ptr, self._ptr = getattr(self, "_ptr", None), None
        if ptr is not None and self._destroy is not None:
            self._destroy.c(ctypes.c_void_p(ptr))

    def __enter__(self):
        return self

    def __exit__(self, *exc):
        self.close()

    def __del__(self):
        try:
            self.close()
        except Exception:  # interpreter shutdown
            pass

    def _handle(self):
        if self.closed:
            raise ValueError(f"{type(self).__name__}: the handle is closed")
        return ctypes.c_void_p(self._ptr)


def _method(fn):
    def method(self, *args):
        if len(args) != len(fn.user_ins) - 1:
            raise TypeError(f"{fn.short}() takes {len(fn.user_ins) - 1} arguments "
                            f"({', '.join(p[2] for p in fn.user_ins if p[0] != 'HIN')}), {len(args)} given")
        status, vals = fn.call_raw(args, handle=self._handle())
        if fn.ret == "int":
            _raise_or_warn(fn.short, status)
            return _Function._pack(fn, vals)
        return vals
    method.__name__ = fn.short
    method.__doc__ = DOCS.get(fn.name, "")
    return method


def _class_name(handle_type):
    return "".join(w.capitalize() for w in handle_type[len(_PREFIX):].split("_"))


def _build():
    names = {}
    handles = _signatures.HANDLES
    classes = {h: type(_class_name(h), (Handle,), {"__doc__": f"A {h} handle of the C API.", "_type": h})
               for h in handles}
    # longest prefix first, so pumploss_health_monitor_* is not taken for pumploss_health_*
    prefixes = sorted(((h, h + "_") for h in handles), key=lambda x: -len(x[1]))
    for name, (ret, params, _arrays) in FUNCTIONS.items():
        fn = _Function(name) if ret != "void" else _Fn(name)
        hin = [p for p in params if p[0] in ("HIN", "HOUT")]
        if hin:
            htype = hin[0][1].replace("const ", "").rstrip("*").strip()
            cls = classes[htype]
            short = name
            for h, pre in prefixes:
                if name.startswith(pre):
                    short = name[len(pre):]
                    break
            if hin[0][0] == "HOUT":
                if short == "create":
                    cls._create = fn
                else:
                    setattr(cls, short, classmethod(lambda c, *a, _fn=fn: c._from_create(_fn, a)))
            elif ret == "void" and short == "destroy":
                cls._destroy = fn
            else:
                setattr(cls, short, _method(fn))
            continue
        if ret == "void":
            continue
        fn.__doc__ = DOCS.get(name, "")
        names[fn.short] = fn
    for h, cls in classes.items():
        names[cls.__name__] = cls
    return names


_API = _build()
globals().update({k: v for k, v in _API.items() if k not in ("version", "status_message")})


def convert(value, from_unit, to_unit):
    """Convert a value, or an array of values, between units of one quantity (the symbols of
    pumploss.h: "bar", "psi", "L/min", "degC", ...). Raises PumplossError when a value fails."""
    r = _API["unit_convert"](value, from_unit, to_unit)
    if isinstance(r, float):
        return r
    bad = np.flatnonzero(np.vectorize(is_error)(r.status))
    if bad.size:
        _raise_or_warn("unit_convert", int(r.status.flat[bad[0]]))
    return r.out


__all__ = sorted(set(_API) | {"PumplossError", "PumplossWarning", "Handle", "convert", "library",
                              "version", "status_message", "is_error", "is_report", "OK", "load",
                              "Library"} | set(STATUS_CODES) | set(CONSTANTS))
