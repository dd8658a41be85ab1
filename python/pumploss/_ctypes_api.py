"""The low-level layer of the pumploss package: the C API through ctypes, one call at a time.
The package's module-level functions (pumploss.NAME) are built on it; this layer is for the
cross-check tests and for callers who want the raw statuses.

    import pumploss
    lib = pumploss.load()                      # or load("/path/to/libpumploss.so")
    nu = lib.viscosity_d341(313.15, 46e-6, 373.15, 6.8e-6, 273.15)   # m^2/s
    status, nu = lib.raw("pumploss_viscosity_d341", 313.15, 46e-6, 373.15, 6.8e-6, 273.15)

Every C function ``pumploss_NAME`` is reachable as ``lib.NAME(...)``: it returns the output (a
tuple when there are several), raises PumplossError on an error status (1-99) and warns with
PumplossWarning on a report (100 and up). ``lib.raw(...)`` returns the status with the outputs
and never raises. Units are SI, as in pumploss.h.

Signatures come from pumploss_signatures.py, generated from pumploss.h at build time by
tools/capigen/capigen.py (installed beside this module): no header is read at run time. Inputs
go in declaration order; batch functions take sequences for their arrays (``n`` is their length)
and return lists, a handle-creating function returns the handle (an int), ``char *buf, size_t
len`` outputs return a str. Status codes and option constants are module attributes
(``pumploss.PUMPLOSS_EMISUSE``, ``pumploss.PUMPLOSS_MODEL_WILSON``).

Handles follow pumploss.h's contract: evaluations never change a handle, so one configured
handle may be used from many threads at once. Results are engineering estimates; defer to the
pump maker's limits and local codes.
"""
import ctypes
import ctypes.util
import os
import warnings

__all__ = ["load", "Library", "PumplossError", "PumplossWarning", "OK", "is_error", "is_report"]

OK = 0

try:  # the installed package carries the signatures generated when it was built
    from . import _signatures
except ImportError:  # the build tree: pumploss_signatures.py in the build's bindings folder
    import pumploss_signatures as _signatures

CONSTANTS, FUNCTIONS, STATUS_CODES = _signatures.CONSTANTS, _signatures.FUNCTIONS, _signatures.STATUS_CODES

globals().update(STATUS_CODES)
globals().update(CONSTANTS)

_D = ctypes.c_double
_PD = ctypes.POINTER(ctypes.c_double)

_KIND_CTYPES = {
    "DIN": _D, "IIN": ctypes.c_int, "SIZE": ctypes.c_size_t, "BUFLEN": ctypes.c_size_t,
    "DARR": _PD, "DOUT": _PD, "IOUT": ctypes.POINTER(ctypes.c_int), "ZOUT": ctypes.POINTER(ctypes.c_size_t),
    "IARR": ctypes.POINTER(ctypes.c_int), "STR": ctypes.c_char_p, "CBUF": ctypes.c_char_p,
    "HIN": ctypes.c_void_p, "HOUT": ctypes.POINTER(ctypes.c_void_p),
}


def is_error(status):
    """PUMPLOSS_IS_ERROR: an error status (1-99); outputs are NaN (batches: see EPARTIAL)."""
    return 0 < status < 100


def is_report(status):
    """PUMPLOSS_IS_REPORT: a report status (100 and up); outputs are usable."""
    return status >= 100


class PumplossError(RuntimeError):
    """An error status (1-99) from the C API; .status holds the code."""

    def __init__(self, status, message):
        super().__init__(f"pumploss status {status}: {message}")
        self.status = status


class PumplossWarning(UserWarning):
    """A report status (100 and up): the value is valid but outside a stated assumption."""


def _default_path():
    env = os.environ.get("PUMPLOSS_LIBRARY")
    if env:
        return env
    found = ctypes.util.find_library("pumploss")
    if found:
        return found
    return "libpumploss.so"


class Library:
    """A loaded pumploss shared library."""

    def __init__(self, path=None):
        self.path = path or _default_path()
        self._dll = ctypes.CDLL(self.path)
        self._protos = {n: p for n, p in FUNCTIONS.items() if p[0] == "int" and p[1]}
        self._dll.pumploss_version.restype = ctypes.c_char_p
        self._dll.pumploss_version.argtypes = []
        self._dll.pumploss_version_number.restype = ctypes.c_int
        self._dll.pumploss_status_message.restype = ctypes.c_char_p
        self._dll.pumploss_status_message.argtypes = [ctypes.c_int]
        self._destroy = {}
        for name, (ret, params, _arrays) in FUNCTIONS.items():
            fn = getattr(self._dll, name)
            fn.argtypes = [_KIND_CTYPES[k] for k, _, _ in params]
            if ret == "int":
                fn.restype = ctypes.c_int
            elif ret == "void":
                fn.restype = None
                self._destroy[name] = fn
            else:  # const char*: static strings
                fn.restype = ctypes.c_char_p

    def functions(self):
        """Names of the status-returning functions callable through raw()."""
        return sorted(self._protos)

    def destroy(self, name, handle):
        """Call a destroy function (pumploss_X_destroy) on a handle from raw()."""
        self._destroy[name](handle)

    def version(self):
        return self._dll.pumploss_version().decode()

    def version_number(self):
        return self._dll.pumploss_version_number()

    def status_message(self, status):
        return self._dll.pumploss_status_message(status).decode()

    def function(self, name):
        """The raw ctypes function (argtypes and restype set)."""
        return getattr(self._dll, name)

    def raw(self, name, *args):
        """Call pumploss_NAME with the inputs; returns (status, outputs...) and never raises."""
        return self._raw_generic(name, *args)

    def _raw_generic(self, name, *args):
        """raw(): inputs in declaration order (a
        sequence for each array; size_t lengths are taken from the arrays), outputs returned in
        declaration order (lists for arrays, an int for a handle, a str for a char buffer)."""
        _, params, arrays = self._protos[name]
        n = next((len(a) for a in args if not isinstance(a, (str, bytes)) and hasattr(a, "__len__")), 0)
        # Every size_t is set to n; arrays hold n^k elements for k size_t parameters (a map
        # over n_dp x n_speed points); input sequences shorter than that repeat.
        alen = n ** sum(1 for k, _, _ in params if k == "SIZE")
        it = iter(args)
        conv, outs = [], []
        for kind, _, pname in params:
            if kind == "DIN":
                conv.append(float(next(it)))
            elif kind in ("IIN", "HIN"):
                conv.append(next(it))
            elif kind == "STR":
                v = next(it)
                conv.append(v.encode() if isinstance(v, str) else v)
            elif kind == "SIZE":
                conv.append(n)
            elif kind == "BUFLEN":
                conv.append(len(outs[-1][1]))
            elif kind in ("DARR", "IARR"):
                seq = list(next(it))
                full = [seq[i % len(seq)] for i in range(alen)] if seq else []
                typ = _D if kind == "DARR" else ctypes.c_int
                conv.append((typ * max(alen, 1))(*full))
            elif kind in ("DOUT", "IOUT", "ZOUT"):
                array = pname in arrays
                typ = {"DOUT": _D, "IOUT": ctypes.c_int, "ZOUT": ctypes.c_size_t}[kind]
                o = (typ * max(alen, 1))() if array else typ(0)
                outs.append(((kind[0] + "A") if array else kind[0], o))
                conv.append(o if array else ctypes.byref(o))
            elif kind == "CBUF":
                o = ctypes.create_string_buffer(1024)
                outs.append(("S", o))
                conv.append(o)
            elif kind == "HOUT":
                o = ctypes.c_void_p(None)
                outs.append(("H", o))
                conv.append(ctypes.byref(o))
        status = getattr(self._dll, name)(*conv)
        vals = []
        for tag, o in outs:
            if tag in ("D", "I", "Z", "H"):
                vals.append(o.value)
            elif tag in ("DA", "IA", "ZA"):
                vals.append(list(o[:alen]))
            else:
                vals.append(o.value.decode(errors="replace"))
        return (status, *vals)

    def __getattr__(self, short):
        name = "pumploss_" + short
        if short.startswith("_") or name not in self.__dict__.get("_protos", {}):
            raise AttributeError(short)

        def call(*args):
            status, *outs = self.raw(name, *args)
            if is_error(status):
                raise PumplossError(status, self.status_message(status))
            if is_report(status):
                warnings.warn(self.status_message(status), PumplossWarning, stacklevel=2)
            return outs[0] if len(outs) == 1 else tuple(outs)

        return call


def load(path=None):
    """Load the shared library (PUMPLOSS_LIBRARY, the linker's search path, or `path`)."""
    return Library(path)
