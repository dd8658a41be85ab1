"""Cross-checks of the efficiency and uncertainty C API against independent mpmath evaluations
written here from the definitions (docs/pages/theory_efficiency.md: ISO 4409 / ISO 4391 efficiencies, JCGM 100:2008): pump and motor hand cases, tests/reference/SOURCES.md
13 row 19 (self-calculated there) and its GUM uncertainty, row 18 (throttle heating)."""
import ctypes
import math

import pytest
from mpmath import mp, mpf, pi, sqrt

mp.dps = 30


def _pump(v, n, dp, q, t):
    return q / (v * n), v * dp / (2 * pi * t), q * dp / (2 * pi * n * t)


def _motor(v, n, dp, q, t):
    return v * n / q, 2 * pi * t / (v * dp), 2 * pi * n * t / (q * dp)


CASES = [
    ("pump", "107e-6", "25", "2.5e7", "152/60000", "450"),   # methods13_row19
    ("pump", "1e-4", "25", "2e7", "2.4e-3", "350"),          # hand_pump
    ("motor", "1e-4", "20", "2e7", "2.1e-3", "300"),         # hand_motor
    ("pump", "28e-6", "40", "3.2e7", "1.05e-3", "155"),
    ("motor", "250e-6", "5", "3.5e7", "1.33e-3", "1300"),
]


@pytest.mark.parametrize("kind, v, n, dp, q, t", CASES)
def test_efficiency_matches_mpmath(lib, kind, v, n, dp, q, t):
    args = [mpf(eval(x)) if "/" in x else mpf(x) for x in (v, n, dp, q, t)]
    ref = (_pump if kind == "pump" else _motor)(*args)
    got = getattr(lib, f"{kind}_efficiency")(*[float(a) for a in args])
    for g, r in zip(got, ref):
        assert g == pytest.approx(float(r), rel=4e-16)


def test_row19_values_and_gum(lib):
    ev, eh, et = lib.pump_efficiency(107e-6, 25.0, 2.5e7, 152.0 / 60000.0, 450.0)
    assert (round(ev, 5), round(eh, 5), round(et, 5)) == (0.94704, 0.94609, 0.89598)
    # GUM by hand in mpmath: relative sensitivities of eta_t are +-1, rectangular limits
    lim = [mpf("1.5"), mpf("1.5"), mpf("1"), mpf("1")]  # q, p, T, n (per cent)
    u_rel = sqrt(sum(x * x for x in lim) / 3) / 100
    assert float(u_rel) == pytest.approx(0.01472, abs=5e-6)
    s3 = math.sqrt(3.0)
    uv, uh, ut = lib.pump_efficiency_uncertainty(
        107e-6, 25.0, 2.5e7, 152.0 / 60000.0, 450.0,
        0.0, 0.25 / s3, 3.75e5 / s3, 0.015 * 152.0 / 60000.0 / s3, 4.5 / s3, 0.0)
    assert ut / et == pytest.approx(float(u_rel), rel=1e-14)
    assert 2 * ut / et == pytest.approx(0.0294, abs=5e-5)
    assert uv / ev == pytest.approx(math.sqrt(1.5 ** 2 + 1.0) / s3 / 100, rel=1e-14)


def test_row18_throttle_heating(lib):
    ref = mpf(10) ** 6 / (880 * 2030)
    assert lib.throttle_temperature_rise(1e6, 880.0, 2030.0) == pytest.approx(float(ref), rel=2e-16)
    assert round(lib.throttle_temperature_rise(1e6, 880.0, 2030.0), 3) == 0.560


def test_batch_matches_scalar(lib):
    n = 50
    arr = ctypes.c_double * n
    v = arr(*[107e-6] * n)
    sp = arr(*[10.0 + i for i in range(n)])
    dp = arr(*[2e6 + 6e5 * i for i in range(n)])
    q = arr(*[107e-6 * (10.0 + i) * 0.95 for i in range(n)])
    t = arr(*[107e-6 * (2e6 + 6e5 * i) / (2 * math.pi) / 0.9 for i in range(n)])
    ev, eh, et = arr(), arr(), arr()
    st = (ctypes.c_int * n)()
    s = lib.function("pumploss_pump_efficiency_batch")(n, v, sp, dp, q, t, ev, eh, et, st)
    assert s == 0
    for i in range(n):
        assert (ev[i], eh[i], et[i]) == lib.pump_efficiency(v[i], sp[i], dp[i], q[i], t[i])
