"""pumploss for Python through ctypes: no compiled extension, only the shared library.

    import pumploss
    lib = pumploss.load()                      # or load("/path/to/libpumploss.so")
    nu = lib.viscosity_d341(313.15, 46e-6, 373.15, 6.8e-6, 273.15)   # m^2/s
    status, nu = lib.raw("pumploss_viscosity_d341", 313.15, 46e-6, 373.15, 6.8e-6, 273.15)

Every C function ``pumploss_NAME(double..., double *out...)`` is reachable as ``lib.NAME(...)``:
it returns the output (a tuple when there are several), raises PumplossError on an error
status (1-99) and warns with PumplossWarning on a report (100 and up). ``lib.raw(...)`` returns
the status with the outputs and never raises. Units are SI, as in pumploss.h.
"""
import ctypes
import ctypes.util
import os
import warnings

__all__ = ["load", "Library", "PumplossError", "PumplossWarning", "OK"]

OK = 0

# Functions whose arguments are not all "double in, double* out": name -> (argtypes, n_out).
# Outputs are always the trailing double* parameters.
_D = ctypes.c_double
_PD = ctypes.POINTER(ctypes.c_double)
_SIGNATURES = {
    "pumploss_unit_convert": ([_D, ctypes.c_char_p, ctypes.c_char_p, _PD], 1),
    "pumploss_iso_vg": ([ctypes.c_int, _PD, _PD, _PD], 3),
    "pumploss_typical_mineral_oil": ([_PD] * 6, 6),
    # pumploss:py-signatures-gap
    # pumploss:py-signatures-friction
    "pumploss_pump_efficiency_batch": ([ctypes.c_size_t] + [_PD] * 8 + [ctypes.POINTER(ctypes.c_int)], 0),
    "pumploss_motor_efficiency_batch": ([ctypes.c_size_t] + [_PD] * 8 + [ctypes.POINTER(ctypes.c_int)], 0),
    "pumploss_leakage_scale_batch": ([ctypes.c_size_t] + [_PD] * 6 + [ctypes.POINTER(ctypes.c_int)], 0),
    "pumploss_leakage_fit_power_law": ([ctypes.c_size_t] + [_PD] * 7, 4),
    "pumploss_leakage_split": ([ctypes.c_size_t] + [_PD] * 6, 3),
    "pumploss_displacement_slope": ([ctypes.c_size_t] + [_PD] * 4, 2),
    "pumploss_displacement_intercept": ([ctypes.c_size_t, _D] + [_PD] * 4, 2),
    "pumploss_displacement_two_step": ([ctypes.c_size_t, ctypes.c_size_t] + [_PD] * 5, 2),
    "pumploss_standard_uncertainty": ([_D, ctypes.c_int, ctypes.c_int, _D, _PD], 1),
    "pumploss_model_create": ([ctypes.c_int, ctypes.c_int, _D, _D, ctypes.c_size_t] + [_PD] * 5
                              + [ctypes.POINTER(ctypes.c_void_p)], 0),
    "pumploss_model_coefficients": ([ctypes.c_void_p] + [_PD] * 6, 6),
    "pumploss_model_standard_errors": ([ctypes.c_void_p] + [_PD] * 6, 6),
    "pumploss_model_diagnostics": ([ctypes.c_void_p] + [_PD] * 6, 6),
    "pumploss_model_residuals": ([ctypes.c_void_p, ctypes.c_size_t, _PD, _PD], 0),
    "pumploss_model_predict": ([ctypes.c_void_p, _D, _D, _D] + [_PD] * 5, 5),
    "pumploss_model_map": ([ctypes.c_void_p, _D, ctypes.c_size_t, _PD, ctypes.c_size_t, _PD, _PD,
                            ctypes.POINTER(ctypes.c_int)], 0),
    # pumploss:py-signatures-efficiency
    # pumploss:py-signatures-pump
    # pumploss:py-signatures-capi
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
    # pumploss:py-scalar-gap
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
    # pumploss:py-scalar-pump
    # pumploss:py-scalar-capi
}


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
        argtypes, n_out = self._sigs[name]
        outs = [ctypes.c_double(0.0) for _ in range(n_out)]
        conv = []
        for a, t in zip(args, argtypes):
            conv.append(a.encode() if t is ctypes.c_char_p and isinstance(a, str) else a)
        status = getattr(self._dll, name)(*conv, *[ctypes.byref(o) for o in outs])
        return (status, *[o.value for o in outs])

    def __getattr__(self, short):
        name = "pumploss_" + short
        if short.startswith("_") or name not in self.__dict__.get("_sigs", {}):
            raise AttributeError(short)

        def call(*args):
            status, *outs = self.raw(name, *args)
            if 0 < status < 100:
                raise PumplossError(status, self.status_message(status))
            if status >= 100:
                warnings.warn(self.status_message(status), PumplossWarning, stacklevel=2)
            return outs[0] if len(outs) == 1 else tuple(outs)

        return call


def load(path=None):
    """Load the shared library (PUMPLOSS_LIBRARY, the linker's search path, or `path`)."""
    return Library(path)
