"""Cross-checks of the fitting loss coefficients and a line through the C API against
python3-fluids (fluids.fittings: Hooper2K, Darby3K, ft_Crane and the Crane valve K functions,
entrance_sharp, exit_normal)."""
import ctypes
import math

import fluids.fittings as ft
import pytest

IN = 0.0254


@pytest.mark.parametrize("name", list(ft.Hooper.keys()))
def test_hooper_table_matches_fluids(lib, name):
    k1, kinf = ft.Hooper[name]
    for di_in, re in [(0.5, 150.0), (1.0, 3e3), (4.0, 1e6)]:
        assert lib.k_hooper(k1, kinf, di_in * IN, re) == pytest.approx(
            ft.Hooper2K(Di=di_in, Re=re, name=name), rel=1e-14)


@pytest.mark.parametrize("name", list(ft.Darby.keys()))
def test_darby_table_matches_fluids(lib, name):
    k1, ki, kd = ft.Darby[name]
    for nps, re in [(0.5, 150.0), (2.0, 3e4)]:
        assert lib.k_darby(k1, ki, kd, nps, re) == pytest.approx(
            ft.Darby3K(NPS=nps, Re=re, name=name), rel=1e-14)


@pytest.mark.parametrize("d", [0.006, 0.0127, 0.025, 0.1, 0.5])
def test_friction_factor_ft_and_valves_match_fluids(lib, d):
    # ft_Crane takes one Clamond iteration for D >= 10 mm (documented 5-8 digits).
    tol = 5e-6 if d >= 1e-2 else 1e-12
    f_t = lib.friction_factor_ft(d)
    assert f_t == pytest.approx(ft.ft_Crane(d), rel=tol)
    assert 8 * f_t == pytest.approx(ft.K_gate_valve_Crane(d, d, 0), rel=tol)
    assert 3 * f_t == pytest.approx(ft.K_ball_valve_Crane(d, d, 0), rel=tol)
    assert 340 * f_t == pytest.approx(ft.K_globe_valve_Crane(d, d), rel=tol)


def test_entrance_exit_line_through_handle(lib):
    create = lib.function("pumploss_line_create")
    create.restype = ctypes.c_int
    create.argtypes = [ctypes.POINTER(ctypes.c_void_p)]
    destroy = lib.function("pumploss_line_destroy")
    destroy.restype = None
    destroy.argtypes = [ctypes.c_void_p]
    handle = ctypes.c_void_p()
    assert create(ctypes.byref(handle)) == 0
    h = handle.value
    try:
        # Re = 27700: constant K values hold (below Re = 1e4 they are reported, status 100)
        d, q, rho, mu = 0.02, 1e-3, 870.0, 0.002
        assert lib.raw("pumploss_line_add_fitting_k", h, d, ft.entrance_sharp())[0] == 0
        assert lib.raw("pumploss_line_add_fitting_k", h, d, ft.exit_normal())[0] == 0
        st, dp = lib.raw("pumploss_line_pressure_drop", h, q, rho, mu)
        v = q / (math.pi * d * d / 4)
        assert st == 0
        assert dp == pytest.approx((0.57 + 1.0) * rho * v * v / 2, rel=1e-14)
        st, q_back = lib.raw("pumploss_line_flow_for_pressure", h, dp, rho, mu)
        assert st == 0 and q_back == pytest.approx(q, rel=1e-12)
    finally:
        destroy(h)
        destroy(None)
