"""pumploss for Python through ctypes: no compiled extension, only the shared library.

    import pumploss
    lib = pumploss.load()                      # or load("/path/to/libpumploss.so")
    nu = lib.viscosity_d341(313.15, 46e-6, 373.15, 6.8e-6, 273.15)   # m^2/s
    status, nu = lib.raw("pumploss_viscosity_d341", 313.15, 46e-6, 373.15, 6.8e-6, 273.15)

Every C function ``pumploss_NAME(double..., double *out...)`` is reachable as ``lib.NAME(...)``:
it returns the output (a tuple when there are several), raises PumplossError on an error
status (1-99) and warns with PumplossWarning on a report (100 and up). ``lib.raw(...)`` returns
the status with the outputs and never raises. Units are SI, as in pumploss.h.

Signatures come from the tables below and, when pumploss.h can be found (``load(path,
header=...)``, the PUMPLOSS_HEADER environment variable, or ``include/pumploss.h`` beside the
library's ``lib`` folder), from the header itself, so functions newer than these tables work too:
batch functions take sequences for their arrays (``n`` is their length) and return lists, a
handle-creating function returns the handle (an int) and ``char *buf, size_t len`` outputs
return a str.
"""
import ctypes
import ctypes.util
import os
import re
import warnings

__all__ = ["load", "Library", "PumplossError", "PumplossWarning", "OK"]

OK = 0

# Functions whose arguments are not all "double in, double* out": name -> (argtypes, n_out).
# Outputs are always the trailing double* parameters. Functions with arrays or handles are not
# listed: they are typed from pumploss.h (see parse_header() and Library.raw()).
_D = ctypes.c_double
_PD = ctypes.POINTER(ctypes.c_double)
_SIGNATURES = {
    "pumploss_unit_convert": ([_D, ctypes.c_char_p, ctypes.c_char_p, _PD], 1),
    "pumploss_iso_vg": ([ctypes.c_int, _PD, _PD, _PD], 3),
    "pumploss_typical_mineral_oil": ([_PD] * 6, 6),
    # pumploss:py-signatures-gap
    # pumploss:py-signatures-friction
    "pumploss_standard_uncertainty": ([_D, ctypes.c_int, ctypes.c_int, _D, _PD], 1),
    # pumploss:py-signatures-efficiency
    # pumploss:py-signatures-pump
    # pumploss:py-signatures-capi
    # pumploss_flow_test and pumploss_motor_drain_check (int * outputs) are typed from pumploss.h
    # pumploss:py-signatures-flowtest
}
# "double in, double* out" functions: name -> (n_in, n_out).
_SCALAR = {
    "pumploss_viscosity_d341": (5, 1),
    "pumploss_d341_coefficients": (4, 2),
    "pumploss_sus_from_kinematic": (1, 1),
    "pumploss_kinematic_from_sus": (1, 1),
    "pumploss_dynamic_viscosity": (2, 1),
    "pumploss_kinematic_viscosity": (2, 1),
    "pumploss_oil_density": (6, 1),
    "pumploss_viscosity_barus": (3, 1),
    "pumploss_gap_plates_flow": (6, 1),
    "pumploss_gap_plates_height": (5, 1),
    "pumploss_gap_plates_height_couette": (6, 1),
    "pumploss_gap_plates_velocity": (6, 1),
    "pumploss_gap_plates_shear_force": (6, 1),
    "pumploss_gap_plates_power_loss": (6, 1),
    "pumploss_gap_annulus_flow": (6, 1),
    "pumploss_gap_annulus_narrow_flow": (6, 1),
    "pumploss_gap_annulus_drag_flow": (4, 1),
    "pumploss_gap_piston_leakage": (7, 1),
    "pumploss_gap_annulus_clearance": (6, 1),
    "pumploss_gap_radial_flow": (5, 1),
    "pumploss_gap_radial_sector_flow": (6, 1),
    "pumploss_gap_radial_height": (5, 1),
    "pumploss_gap_radial_pressure": (5, 1),
    "pumploss_gap_radial_land_force": (5, 1),
    "pumploss_gap_pad_capillary_height": (7, 1),
    "pumploss_gap_pad_orifice_height": (8, 1),
    "pumploss_gap_reynolds": (4, 1),
    "pumploss_orifice_flow": (4, 1),
    "pumploss_orifice_dp": (4, 1),
    "pumploss_orifice_diameter": (4, 1),
    "pumploss_orifice_reynolds": (4, 1),
    "pumploss_orifice_flow_viscous": (6, 1),
    "pumploss_capillary_flow": (6, 1),
    "pumploss_capillary_dp": (6, 1),
    "pumploss_orifice_series_cda": (2, 1),
    "pumploss_orifice_parallel_cda": (2, 1),
    "pumploss_orifice_flow_cda": (3, 1),
    "pumploss_gap_pad_capillary": (8, 4),
    "pumploss_gap_pad_orifice": (9, 4),
    # pumploss:py-scalar-gap
    "pumploss_friction_factor": (2, 1),
    "pumploss_friction_factor_custom_laminar": (3, 1),
    "pumploss_friction_laminar": (2, 1),
    "pumploss_friction_colebrook": (2, 1),
    "pumploss_friction_haaland": (2, 1),
    "pumploss_friction_swamee_jain": (2, 1),
    "pumploss_friction_churchill": (2, 1),
    "pumploss_pipe_velocity": (2, 1),
    "pumploss_pipe_reynolds": (4, 1),
    "pumploss_pipe_pressure_drop": (6, 1),
    "pumploss_pipe_flow": (7, 4),
    "pumploss_crane_ft": (1, 1),
    "pumploss_k_hooper": (4, 1),
    "pumploss_k_darby": (5, 1),
    "pumploss_equivalent_length": (3, 1),
    # pumploss:py-scalar-friction
    "pumploss_pump_efficiency": (5, 3),
    "pumploss_motor_efficiency": (5, 3),
    "pumploss_pump_powers": (5, 4),
    "pumploss_motor_powers": (5, 4),
    "pumploss_flow_at_port": (9, 1),
    "pumploss_flow_at_port_linear": (7, 1),
    "pumploss_leakage_scale": (5, 1),
    "pumploss_leakage_scale_power_law": (7, 1),
    "pumploss_leakage_normalise": (12, 1),
    "pumploss_leakage_series": (3, 1),
    "pumploss_throttle_temperature_rise": (3, 1),
    "pumploss_throttle_temperature_rise_isenthalpic": (5, 1),
    "pumploss_heat_load": (2, 1),
    "pumploss_case_drain_temperature": (5, 1),
    "pumploss_case_drain_temperature_from_leakage": (6, 1),
    "pumploss_pressure_difference_uncertainty": (3, 1),
    "pumploss_pump_efficiency_uncertainty": (11, 3),
    "pumploss_motor_efficiency_uncertainty": (11, 3),
    # pumploss:py-scalar-efficiency
    "pumploss_drain_fraction": (3, 1),
    # pumploss:py-scalar-pump
    # pumploss:py-scalar-capi
    "pumploss_induction_motor_speed": (4, 1),
    "pumploss_motor_creep": (8, 4),
    "pumploss_inlet_pipe_check": (14, 2),
    "pumploss_inlet_pipe_min_temperature": (15, 1),
    "pumploss_shaft_seal_check": (4, 2),
    # pumploss:py-scalar-flowtest
}


def parse_header(text):
    """Prototypes of pumploss.h: {name: (return type, [(kind, ctype, param name), ...])}.

    Kinds (as tests/capi/gen_capi.py): DIN double, IIN int, SIZE size_t length, BUFLEN size_t
    after a char* buffer, DARR const double*, DOUT double*, IOUT int*, IARR const int*,
    STR const char*, CBUF char*, HIN handle*, HOUT handle**."""
    text = re.sub(r"/\*.*?\*/", " ", text, flags=re.S)
    handles = set(re.findall(r"typedef\s+struct\s+\w+\s+(\w+)\s*;", text))
    simple = {"double": "DIN", "int": "IIN", "size_t": "SIZE", "const double*": "DARR",
              "double*": "DOUT", "int*": "IOUT", "const int*": "IARR", "const char*": "STR",
              "char*": "CBUF"}
    protos = {}
    for m in re.finditer(r"PUMPLOSS_API\s+([^;{}()]*?)\s*PUMPLOSS_CALL\s+(pumploss_\w+)\s*\(([^)]*)\)\s*;", text):
        def norm(t):
            return re.sub(r"\s+", " ", re.sub(r"\s*\*\s*", "*", t.strip()))
        ret, name, args = norm(m.group(1)), m.group(2), m.group(3).strip()
        params, declared = [], []
        if args and args != "void":
            for a in args.split(","):
                a = a.strip()
                is_array = re.search(r"\[\s*\]", a) is not None  # double x[] is double *x
                declared.append(is_array)
                a = re.sub(r"\[\s*\]", "", a).strip()
                pm = re.match(r"^(.*?)([A-Za-z_]\w*)$", a)
                ctype, pname = norm(pm.group(1) + ("*" if is_array else "")), pm.group(2)
                kind = simple.get(ctype)
                if kind is None:
                    hm = re.match(r"^(?:const )?(\w+)(\*+)$", ctype)
                    if hm and hm.group(1) in handles:
                        kind = "HIN" if hm.group(2) == "*" else "HOUT"
                    else:
                        kind = "UNKNOWN"
                params.append((kind, ctype, pname))
        for i, (kind, ctype, pname) in enumerate(params):
            if kind == "SIZE" and i > 0 and params[i - 1][0] == "CBUF":
                params[i] = ("BUFLEN", ctype, pname)
        # Array outputs: every output of a *_batch function, and outputs declared with [];
        # their length (like that of input arrays) is the product of the size_t parameters.
        arrays = {pname for (kind, ctype, pname), decl in zip(params, declared)
                  if kind in ("DOUT", "IOUT") and (name.endswith("_batch") or decl)}
        protos[name] = (ret, params, arrays)
    return protos


_KIND_CTYPES = {
    "DIN": _D, "IIN": ctypes.c_int, "SIZE": ctypes.c_size_t, "BUFLEN": ctypes.c_size_t,
    "DARR": _PD, "DOUT": _PD, "IOUT": ctypes.POINTER(ctypes.c_int),
    "IARR": ctypes.POINTER(ctypes.c_int), "STR": ctypes.c_char_p, "CBUF": ctypes.c_char_p,
    "HIN": ctypes.c_void_p, "HOUT": ctypes.POINTER(ctypes.c_void_p),
}


def _find_header(lib_path):
    env = os.environ.get("PUMPLOSS_HEADER")
    if env:
        return env
    if lib_path and os.path.sep in lib_path:
        cand = os.path.join(os.path.dirname(os.path.abspath(lib_path)), os.pardir, "include", "pumploss.h")
        if os.path.exists(cand):
            return cand
    return None


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

    def __init__(self, path=None, header=None):
        self.path = path or _default_path()
        self._dll = ctypes.CDLL(self.path)
        self.header = header or _find_header(self.path)
        self._all_protos = {}
        if self.header:
            with open(self.header, encoding="utf-8") as f:
                self._all_protos = parse_header(f.read())
        self._protos = {n: p for n, p in self._all_protos.items()
                        if p[0] == "int" and p[1] and all(k != "UNKNOWN" for k, _, _ in p[1])}
        self._dll.pumploss_version.restype = ctypes.c_char_p
        self._dll.pumploss_version.argtypes = []
        self._dll.pumploss_version_number.restype = ctypes.c_int
        self._dll.pumploss_status_message.restype = ctypes.c_char_p
        self._dll.pumploss_status_message.argtypes = [ctypes.c_int]
        self._sigs = dict(_SIGNATURES)
        for name, (n_in, n_out) in _SCALAR.items():
            self._sigs[name] = ([_D] * n_in + [_PD] * n_out, n_out)
        for name, (argtypes, _) in self._sigs.items():
            fn = getattr(self._dll, name)
            fn.argtypes = argtypes
            fn.restype = ctypes.c_int
        for name, (_, params, _arrays) in self._protos.items():
            if name not in self._sigs:  # newer than the tables: typed from the header
                fn = getattr(self._dll, name)
                fn.argtypes = [_KIND_CTYPES[k] for k, _, _ in params]
                fn.restype = ctypes.c_int
        self._destroy = {}
        for name, (ret, params, _arrays) in self._all_protos.items():
            if ret == "void" and [k for k, _, _ in params] == ["HIN"]:
                fn = getattr(self._dll, name)
                fn.argtypes = [ctypes.c_void_p]
                fn.restype = None
                self._destroy[name] = fn

    def functions(self):
        """Names of the status-returning functions callable through raw()."""
        return sorted(set(self._sigs) | set(self._protos))

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
        if name not in self._sigs:
            return self._raw_generic(name, *args)
        argtypes, n_out = self._sigs[name]
        outs = [ctypes.c_double(0.0) for _ in range(n_out)]
        conv = []
        for a, t in zip(args, argtypes):
            conv.append(a.encode() if t is ctypes.c_char_p and isinstance(a, str) else a)
        status = getattr(self._dll, name)(*conv, *[ctypes.byref(o) for o in outs])
        return (status, *[o.value for o in outs])

    def _raw_generic(self, name, *args):
        """raw() for a function known only from the header: inputs in declaration order (a
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
            elif kind in ("DOUT", "IOUT"):
                array = pname in arrays
                typ = _D if kind == "DOUT" else ctypes.c_int
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
            if tag in ("D", "I", "H"):
                vals.append(o.value)
            elif tag in ("DA", "IA"):
                vals.append(list(o[:alen]))
            else:
                vals.append(o.value.decode(errors="replace"))
        return (status, *vals)

    def __getattr__(self, short):
        name = "pumploss_" + short
        if short.startswith("_") or (name not in self.__dict__.get("_sigs", {})
                                     and name not in self.__dict__.get("_protos", {})):
            raise AttributeError(short)

        def call(*args):
            status, *outs = self.raw(name, *args)
            if 0 < status < 100:
                raise PumplossError(status, self.status_message(status))
            if status >= 100:
                warnings.warn(self.status_message(status), PumplossWarning, stacklevel=2)
            return outs[0] if len(outs) == 1 else tuple(outs)

        return call


def load(path=None, header=None):
    """Load the shared library (PUMPLOSS_LIBRARY, the linker's search path, or `path`);
    `header` (or PUMPLOSS_HEADER) names pumploss.h for functions newer than the tables."""
    return Library(path, header)
