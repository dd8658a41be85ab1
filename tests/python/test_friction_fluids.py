"""Cross-checks of the friction factor and pipe pressure drop against python3-fluids
(fluids.friction, fluids.core) and the root of the Colebrook equation found by mpmath at
50 digits (independent of pumploss's Clamond/Newton scheme)."""
import ctypes
import math

import fluids.friction as fr
import numpy as np
import pytest
from mpmath import mp, mpf, log, findroot

mp.dps = 50

RES = [4e3, 7.1e3, 2.3e4, 1e5, 6.5e5, 3e6, 2.2e7, 1e8]
RRS = [0.0, 1e-6, 3e-5, 1e-4, 1e-3, 1e-2, 0.05]


def _ulps(a, b):
    ia = np.float64(a).view(np.int64)
    ib = np.float64(b).view(np.int64)
    return abs(int(ia) - int(ib))


def _colebrook_root(re, rr):
    g = lambda x: x + 2 * log(mpf(rr) / mpf("3.7") + mpf("2.51") * x / mpf(re), 10)
    x = findroot(g, mpf(8), tol=mpf(10) ** -48)
    return float(1 / x ** 2)


@pytest.mark.parametrize("re", RES)
def test_colebrook_within_4_ulp_of_mpmath_root(lib, re):
    for rr in RRS:
        f = lib.friction_colebrook(re, rr)
        assert _ulps(f, _colebrook_root(re, rr)) <= 4, (re, rr)


@pytest.mark.parametrize("re", RES)
def test_colebrook_and_explicit_forms_match_fluids(lib, re):
    for rr in RRS:
        # fluids solves Colebrook by its own exact route: agreement to 1e-13 relative.
        assert lib.friction_colebrook(re, rr) == pytest.approx(fr.Colebrook(re, rr), rel=1e-13)
        assert lib.friction_colebrook(re, rr) == pytest.approx(fr.Clamond(re, rr), rel=1e-13)
        # explicit formulas: the same algebra, rounding only
        assert lib.raw("pumploss_friction_haaland", re, rr)[1] == pytest.approx(fr.Haaland(re, rr), rel=1e-14)
        assert lib.raw("pumploss_friction_churchill", re, rr)[1] == pytest.approx(fr.Churchill_1977(re, rr), rel=1e-13)
        # fluids writes (6.97/Re)^0.9 for the published 5.74/Re^0.9 (6.97^0.9 = 5.7399...)
        assert lib.raw("pumploss_friction_swamee_jain", re, rr)[1] == pytest.approx(
            fr.Swamee_Jain_1976(re, rr), rel=2e-5)


def test_laminar_and_churchill_laminar_limit(lib):
    for re in (10.0, 100.0, 1000.0, 1999.0):
        assert lib.friction_factor(re, 0.0) == pytest.approx(fr.friction_laminar(re), rel=1e-15)
        assert lib.raw("pumploss_friction_churchill", re, 0.0)[1] == pytest.approx(fr.Churchill_1977(re, 0.0), rel=1e-13)


def test_pipe_pressure_drop_matches_fluids_darcy_weisbach(lib):
    # fluids.friction.friction_factor(Method='Colebrook') and fluids.core.dP_from_K style
    # algebra: dp = f L/D rho v^2 / 2.
    rho, mu, d, length, eps = 870.0, 0.004, 0.0127, 5.0, 1.5e-6
    for q in (2e-4, 7e-4, 3e-3):
        v = q / (math.pi * d * d / 4)
        re = rho * v * d / mu
        f = fr.Colebrook(re, eps / d)
        want = f * length / d * rho * v * v / 2
        assert lib.pipe_pressure_drop(q, rho, mu, d, length, eps) == pytest.approx(want, rel=1e-13)


def test_batch_matches_scalar_and_reports_per_element(lib):
    # arrays in, per-element outputs and statuses out (ctypes module, typed from pumploss.h)
    summary, f, st = lib.raw("pumploss_friction_factor_batch", [1e5, 3000.0, -1.0, 1e7], [1e-4, 0.0, 0.0, 1e-3])
    assert summary == 13  # PUMPLOSS_EPARTIAL: an error, so the summary alone never passes NaN on
    assert list(st) == [0, 101, 1, 0]
    assert f[0] == lib.friction_factor(1e5, 1e-4)
    assert math.isnan(f[2])
    assert f[3] == pytest.approx(fr.Colebrook(1e7, 1e-3), rel=1e-13)
