"""Cross-checks of the least-squares fits against numpy and scipy: the Wilson and Schloesser
loss-model fits (through the C model handle) against numpy.linalg.lstsq on the same design
matrix, the power-law leakage fit against numpy.linalg.lstsq in logarithms, and the non-negative
split of drain readings against scipy.optimize.nnls (Lawson-Hanson)."""
import ctypes
import math

import numpy as np
import pytest
from scipy.optimize import nnls

D_ARR = ctypes.c_double


def _arr(x):
    return (D_ARR * len(x))(*[float(v) for v in x])


def _synthetic(seed, schloesser):
    rng = np.random.default_rng(seed)
    v, rho = 107e-6, 870.0
    d = v / (2 * math.pi)
    dp = rng.uniform(3e6, 3.5e7, 60)
    n = rng.uniform(8.0, 40.0, 60)
    mu = rng.uniform(0.012, 0.06, 60)
    w = 2 * math.pi * n
    q = d * w - 3.5e-9 * d * dp / mu + 2e-6 * rng.standard_normal(60)
    t = d * dp + 6.5e4 * d * mu * w + 0.03 * d * dp + 3.0 + 0.3 * rng.standard_normal(60)
    if schloesser:
        q -= 6e-5 * d ** (2 / 3) * np.sqrt(2 * dp / rho)
        t += 2.0 * rho * w ** 2 * d ** (5 / 3)
    return v, rho, d, dp, n, mu, w, q, t


@pytest.mark.parametrize("seed, schloesser", [(1, False), (2, False), (3, True), (4, True)])
def test_loss_model_matches_numpy_lstsq(lib, seed, schloesser):
    v, rho, d, dp, n, mu, w, q, t = _synthetic(seed, schloesser)
    create = lib.function("pumploss_model_create")
    destroy = lib.function("pumploss_model_destroy")
    destroy.argtypes = [ctypes.c_void_p]
    destroy.restype = None
    h = ctypes.c_void_p()
    st = create(0, 1 if schloesser else 0, v, rho, len(dp), _arr(dp), _arr(n), _arr(mu), _arr(q), _arr(t),
                ctypes.byref(h))
    assert st == 0 and h.value
    try:
        status, c_s, c_st, c_v, c_f, t_c, c_h = lib.raw("pumploss_model_coefficients", h)
        assert status == 0
        status, u_s, u_st, u_v, u_f, u_tc, u_h = lib.raw("pumploss_model_standard_errors", h)
        # numpy on the same design matrices (loss-model regressors, docs/pages/theory_efficiency.md)
        af = [d * dp / mu] + ([d ** (2 / 3) * np.sqrt(2 * dp / rho)] if schloesser else [])
        at = [d * mu * w, d * dp, np.ones_like(dp)] + ([rho * w ** 2 * d ** (5 / 3)] if schloesser else [])
        for cols, y, got, ses in ((af, d * w - q, [c_s] + ([c_st] if schloesser else []),
                                   [u_s] + ([u_st] if schloesser else [])),
                                  (at, t - d * dp, [c_v, c_f, t_c] + ([c_h] if schloesser else []),
                                   [u_v, u_f, u_tc] + ([u_h] if schloesser else []))):
            a = np.column_stack(cols)
            x, res, rank, sv = np.linalg.lstsq(a, y, rcond=None)
            s2 = res[0] / (len(y) - a.shape[1])
            cov = s2 * np.linalg.inv(a.T @ a)   # fine in numpy for these well-conditioned checks
            for g, r in zip(got, x):
                assert g == pytest.approx(r, rel=1e-9)
            for g, r in zip(ses, np.sqrt(np.diag(cov))):
                assert g == pytest.approx(r, rel=1e-7)
            # condition number: ours is kappa_1 of R of the column-scaled matrix, within a
            # factor p of kappa_2
            scaled = a / np.linalg.norm(a, axis=0)
            k2 = np.linalg.cond(scaled)
            diag = lib.raw("pumploss_model_diagnostics", h)
            ours = diag[6] if len(cols) >= 3 else diag[5]
            assert k2 / a.shape[1] <= ours * (1 + 1e-9) and ours <= k2 * a.shape[1] * (1 + 1e-9)
    finally:
        destroy(h)


def test_power_law_fit_matches_numpy(lib):
    rng = np.random.default_rng(7)
    dp = rng.uniform(5e6, 3e7, 30)
    mu = rng.uniform(0.01, 0.07, 30)
    q = 3e-15 * dp ** 0.9 * mu ** -0.8 * np.exp(0.03 * rng.standard_normal(30))
    k, a, b, cond = lib.leakage_fit_power_law([float(v) for v in q], [float(v) for v in dp], [float(v) for v in mu])
    x, *_ = np.linalg.lstsq(np.column_stack([np.ones(30), np.log(dp), -np.log(mu)]), np.log(q), rcond=None)
    assert a == pytest.approx(x[1], rel=1e-10)
    assert b == pytest.approx(x[2], rel=1e-10)
    assert math.log(k) == pytest.approx(x[0], rel=1e-10)


@pytest.mark.parametrize("seed", [1, 2, 3, 4, 5])
def test_leakage_split_matches_scipy_nnls(lib, seed):
    rng = np.random.default_rng(seed)
    dp = rng.uniform(2e6, 3.5e7, 25)
    mu = rng.uniform(0.01, 0.08, 25)
    # some seeds with a negative unconstrained part, so the constraint is active
    c0 = 3e-6 if seed % 2 else -2e-6
    q = 1.5e-15 * dp / mu + 2e-9 * np.sqrt(dp) * (seed % 3) + c0 + 1e-7 * rng.standard_normal(25)
    q = np.maximum(q, 0.0)
    a = np.column_stack([dp / mu, np.sqrt(dp), np.ones(25)])
    scale = np.linalg.norm(a, axis=0)
    xs, _ = nnls(a / scale, q)
    ref = xs / scale
    got = lib.leakage_split([float(v) for v in q], [float(v) for v in dp], [float(v) for v in mu])
    for g, r in zip(got, ref):
        if r == 0.0:
            assert g == 0.0
        else:
            assert g == pytest.approx(r, rel=1e-9)
