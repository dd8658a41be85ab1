"""Benchmark in the test suite: an array call goes through the C batch function at 0.8 or more
of the bare C batch's throughput on a million points (the fastest of nine interleaved
repetitions of each: the least disturbed by other work on the machine). The
bare call is the least a caller of the C batch does: fresh output arrays (np.empty) and one
ctypes call with the inputs' pointers made in advance. Both write into fresh memory; with
outputs reused, the first touch of 32 MB of new pages (about 10 ms here) is what separates
them."""
import ctypes
import os
import time

import numpy as np

import pumploss

N = 1_000_000
RATIO_MIN = float(os.environ.get("PUMPLOSS_PY_RATIO_MIN", "0.8"))


def test_array_call_throughput_against_the_bare_c_batch():
    rng = np.random.default_rng(7)
    v = np.full(N, 71e-6)
    n = rng.uniform(20.0, 30.0, N)
    dp = rng.uniform(5e6, 3e7, N)
    q = v * n * rng.uniform(0.9, 0.99, N)
    t = v * dp / (2 * np.pi) / rng.uniform(0.85, 0.95, N)
    c = pumploss.library().function("pumploss_pump_efficiency_batch")
    pd = ctypes.POINTER(ctypes.c_double)
    ins = [ctypes.c_size_t(N)] + [a.ctypes.data_as(pd) for a in (v, n, dp, q, t)]
    bare, wrapped = [], []
    for _ in range(9):
        t0 = time.perf_counter()
        outs = [np.empty(N) for _ in range(3)]
        st = np.empty(N, dtype=np.intc)
        c(*ins, *[o.ctypes.data_as(pd) for o in outs], st.ctypes.data_as(ctypes.POINTER(ctypes.c_int)))
        bare.append(time.perf_counter() - t0)
        t0 = time.perf_counter()
        r = pumploss.pump_efficiency(v, n, dp, q, t)
        wrapped.append(time.perf_counter() - t0)
    ratio = float(min(bare) / min(wrapped))
    print(f"python array call / bare C batch throughput, {N} points: {ratio:.3f} "
          f"(bare {1e3 * min(bare):.2f} ms, package {1e3 * min(wrapped):.2f} ms)")
    assert np.array_equal(r.eta_t, outs[2]) and np.array_equal(r.status, st)
    assert ratio >= RATIO_MIN
