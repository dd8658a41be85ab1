"""Cross-checks of the flow test, the pump inlet and the rotary budgets through ctypes against
independent implementations written here: the flow test with motor slip solved in mpmath with its
own root finder (findroot, not the library's fixed-point iteration), the suction pipe with
python3-fluids (Colebrook friction factor, a reference library), and the gear pump's lateral path
by the radial disc law in mpmath."""
import ctypes
import math

import pytest
from mpmath import mp, mpf, pi, findroot, log

import fluids

mp.dps = 40


def flow_test_mpmath(q0, p0, q1, p1, eta, ns, nr, prated, mut, mur, pref, nref, enew):
    """Two readings, speeds from the motor (slip proportional to torque), displacement derived."""
    q0, p0, q1, p1, eta, ns, nr, prated = map(mpf, (q0, p0, q1, p1, eta, ns, nr, prated))
    mr = prated / (2 * pi * nr)

    def speed(v, p):
        return ns - (ns - nr) * (v * p / (2 * pi * eta)) / mr

    # the displacement solves V = (q0 p1 - q1 p0) / (n0(V) p1 - n1(V) p0)
    v = findroot(lambda v: v * (speed(v, p0) * p1 - speed(v, p1) * p0) - (q0 * p1 - q1 * p0), q0 / ns)
    n1 = speed(v, p1)
    leak = v * n1 - q1
    lref = leak / p1 * mpf(mut) / mpf(mur) * mpf(pref)
    evr = 1 - lref / (v * mpf(nref))
    return v, n1, leak, q1 / (v * n1), evr / mpf(enew)


@pytest.mark.parametrize("p0", [0.0, 5e5, 20e5])
def test_flow_test_with_motor_slip_matches_mpmath(lib, p0):
    args = dict(q0=18.0 / 60000, p0=p0, q1=16.0 / 60000, p1=170e5, eta=0.85, ns=25.0, nr=1450.0 / 60,
                prated=7500.0, mut=0.020, mur=0.028, pref=170e5, nref=1450.0 / 60, enew=0.95)
    v, n1, leak, ev, pon = flow_test_mpmath(**args)
    st, n1_got, v_got, leak_got, ev_got, raw, pon_got, verdict = lib.raw(
        "pumploss_flow_test", args["q0"], p0, 0.0, args["q1"], 170e5, 0.0, 0.0, 0.85, 25.0, 1450.0 / 60, 7500.0,
        0.020, 0.028, 170e5, 1450.0 / 60, 0.95, 0.85, 0.05)
    assert st == 0
    assert v_got == pytest.approx(float(v), rel=1e-13)
    assert n1_got == pytest.approx(float(n1), rel=1e-14)
    assert leak_got == pytest.approx(float(leak), rel=1e-11)
    assert ev_got == pytest.approx(float(ev), rel=1e-14)
    assert pon_got == pytest.approx(float(pon), rel=1e-13)
    assert raw == pytest.approx(16.0 / 18.0, rel=1e-15)
    assert verdict == 0


def test_inlet_pipe_matches_fluids_colebrook(lib):
    # a thin oil (10 and 2.6 mm2/s) at 15 degC, where the density is the stated 870 kg/m3
    t1, nu1, t2, nu2, rho = 313.15, 10e-6, 373.15, 2.6e-6, 870.0
    d, length, rough, k, z, q = 0.05, 2.0, 5e-5, 0.5, 0.8, 400.0 / 60000
    nu = lib.viscosity_d341(t1, nu1, t2, nu2, 288.15)
    v = q / (math.pi * d * d / 4)
    re = v * d / nu
    assert re > 5000  # turbulent: the Colebrook range
    fd = fluids.friction.Colebrook(re, rough / d)
    dp = (fd * length / d + k) * rho * v * v / 2 + rho * 9.80665 * z
    ref = 101325.0 - dp - rho * v * v / 2
    st, p_in, margin = lib.raw("pumploss_inlet_pipe_check", d, length, rough, k, z, q, 288.15, t1, nu1, t2, nu2, rho,
                               101325.0, 80000.0)
    assert st in (0, 100)
    assert p_in == pytest.approx(ref, rel=1e-9)
    assert margin == pytest.approx(ref - 80000.0, rel=1e-9)


def test_gear_pump_lateral_path_matches_radial_disc_law(lib):
    st, h = lib.raw("pumploss_gear_pump_create", 12e-6, 9e-3, 3.5e-3, 4e-3, 18e-3, 1.2e-3, 5, 20e-6, 30e-6)
    assert st == 0
    try:
        assert lib.raw("pumploss_gear_pump_set_oil", h, 288.15, 32e-6, 373.15, 5.4e-6, 870.0)[0] == 0
        assert lib.raw("pumploss_gear_pump_set_lateral", h, 10e-6, 1, 0.0, 3.0)[0] == 0
        st, q, total, eta, dqdh, el = lib.raw("pumploss_gear_pump_path", h, 1, 150e5, 0.0, 25.0, 288.15)
        assert st == 0
        mu = mpf(870) * mpf(32e-6)  # at the first viscosity point and the density's own 15 degC
        ref = 2 * 2 * 3 * mpf(10e-6) ** 3 * mpf(150e5) / (12 * mu * log(mpf("12.5e-3") / mpf("9e-3")))
        assert q == pytest.approx(float(ref), rel=1e-11)
        assert dqdh == pytest.approx(float(3 * ref / mpf(10e-6)), rel=1e-11)
        assert 0 < eta < 1
    finally:
        lib._dll.pumploss_gear_pump_destroy(ctypes.c_void_p(h))  # void: not typed by raw()
