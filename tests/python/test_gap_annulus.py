"""Cross-checks of the gap functions through ctypes against independent implementations:
the textbook eccentric-annulus series (Piercy, Hooper and Winny 1933 as given in White, Viscous
Fluid Flow) and the textbook concentric annulus, both written here in mpmath at high precision
(not from pumploss's rearranged code), and an mpmath nsum evaluation near eps = 1."""
import math

import pytest
from mpmath import mp, mpf, sqrt, log, exp, sinh, pi, nsum, inf

mp.dps = 60


def textbook_q(dp, mu, bore, piston, length, eps, dps=90, method="r+s"):
    """q from the bipolar series as printed; dps covers the cancellation for tiny gaps."""
    with mp.workdps(dps):
        a, b = mpf(bore) / 2, mpf(piston) / 2
        if eps == 0:
            br = a**4 - b**4 - (a * a - b * b) ** 2 / log(a / b)
        else:
            c = mpf(eps) * (a - b)
            f = (a * a - b * b + c * c) / (2 * c)
            m = sqrt(f * f - a * a)
            al = log((f + m) / (f - m)) / 2
            be = log((f - c + m) / (f - c - m)) / 2
            s = nsum(lambda n: n * exp(-n * (be + al)) / sinh(n * (be - al)), [1, inf], method=method)
            br = a**4 - b**4 - 4 * c * c * m * m / (be - al) - 8 * c * c * m * m * s
        return pi * mpf(dp) * br / (8 * mpf(mu) * mpf(length))


@pytest.mark.parametrize("t", [1e-7, 1e-5, 1e-3, 0.05, 0.3, 0.9])
@pytest.mark.parametrize("eps", [0.0, 1e-6, 0.2, 0.5, 0.8, 0.9, 0.97])
def test_eccentric_annulus_matches_mpmath_series(lib, t, eps):
    piston = 0.02
    bore = piston * (1 + t)
    got = lib.gap_annulus_flow(250e5, 0.04, bore, piston, 0.03, eps)
    ref = textbook_q(250e5, 0.04, bore, piston, 0.03, eps)
    assert abs(got / float(ref) - 1) <= 1e-12


@pytest.mark.parametrize("t", [1e-4, 0.1, 0.9])
def test_touching_limit_matches_series_near_one(lib, t):
    # eps = 1 against the series at eps = 1 - 1e-12, summed by Euler-Maclaurin in mpmath (its
    # default Richardson/Shanks acceleration is not reliable this close to 1); the flow changes
    # by O(1 - eps) there (about 2e-11 relative at t = 0.9)
    piston = 0.02
    bore = piston * (1 + t)
    got = lib.gap_annulus_flow(1e6, 0.04, bore, piston, 0.02, 1.0)
    ref = textbook_q(1e6, 0.04, bore, piston, 0.02, 1 - mpf("1e-12"), dps=40, method="e")
    assert abs(got / float(ref) - 1) <= 5e-11


def test_methods_row15_self_calculated(lib):
    # selfcalc_methods13 (tests/reference/SOURCES.md): exact 6.5483e-3 L/min, narrow (D_m = 2 r_i) x 2.5 at eps = 1: 1.6362e-2
    q = lib.gap_annulus_flow(250e5, 0.040, 0.02002, 0.02, 0.03, 0.0) * 60000
    assert q == pytest.approx(6.5483e-3, rel=1e-4)
    ref = float(textbook_q(250e5, 0.040, 0.02002, 0.02, 0.03, 0.0))
    assert lib.gap_annulus_flow(250e5, 0.040, 0.02002, 0.02, 0.03, 0.0) == pytest.approx(ref, rel=1e-13)


def test_bad_input_raises(lib):
    import pumploss
    with pytest.raises(pumploss.PumplossError):
        lib.gap_annulus_flow(1e6, 0.04, 0.02, 0.021, 0.03, 0.0)
    with pytest.raises(pumploss.PumplossError):
        lib.gap_annulus_flow(1e6, 0.04, 0.021, 0.02, 0.03, 1.5)
    with pytest.raises(pumploss.PumplossError):
        lib.gap_annulus_flow(1e6, float("nan"), 0.021, 0.02, 0.03, 0.5)


def test_radial_and_plates_against_mpmath(lib):
    q = lib.gap_radial_flow(250e5, 0.04, 0.02, 0.03, 15e-6)
    ref = pi * mpf(15e-6) ** 3 * mpf(250e5) / (6 * mpf(0.04) * log(mpf(0.03) / mpf(0.02)))
    assert q == pytest.approx(float(ref), rel=1e-14)
    q = lib.gap_plates_flow(1e6, 0.04, 0.01, 1e-5, 0.02, 2.0)
    ref = mpf(0.01) * mpf(1e-5) ** 3 * mpf(1e6) / (12 * mpf(0.04) * mpf(0.02)) + mpf(0.01) * mpf(1e-5) * 2 / 2
    assert q == pytest.approx(float(ref), rel=1e-14)
    h = lib.gap_plates_height_couette(float(ref), 1e6, 0.04, 0.01, 0.02, 2.0)
    assert h == pytest.approx(1e-5, rel=1e-14)
