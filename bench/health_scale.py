#!/usr/bin/python3
"""Scale benchmark of `pumploss health` (issue 20): generate N field readings of an invented pump
from a known truth, and the pandas baseline that only reads the file and normalises the flow.

  health_scale.py generate N FILE   write N readings (demo data, invented) to FILE
  health_scale.py pandas FILE       read FILE with pandas and normalise the drain flow (the
                                    library's model: constant part plus a laminar part scaled by
                                    dp / mu at the oil temperature; ASTM D341 viscosity)
"""
import sys

import numpy as np

# the oil of examples/demo/oil.toml: ISO VG 46 (46 cSt at 40 degC) and 6.9 cSt at 100 degC
T1, NU1, T2, NU2 = 313.15, 46.0, 373.15, 6.9
Q_C = 0.3  # L/min, constant part (pump_p31_health.toml)
DP_REF, T_REF = 250.0, 323.15  # bar, K


def d341_cst(t_k):
    """ASTM D341 kinematic viscosity in cSt through the two points (Walther's form, Z = nu + 0.7)."""
    def y(nu):
        return np.log10(np.log10(nu + 0.7))
    b = (y(NU1) - y(NU2)) / (np.log10(T2) - np.log10(T1))
    a = y(NU1) + b * np.log10(T1)
    return 10 ** (10 ** (a - b * np.log10(t_k))) - 0.7


def generate(n, path):
    rng = np.random.default_rng(20)
    i = np.arange(n)
    hours = 600 + i * 0.03  # a reading every 108 s of running
    days = (np.datetime64("2022-01-01") + (hours / 24).astype("timedelta64[D]")).astype(str)
    t_c = 40 + 15 * rng.random(n)
    dp = 190 + 50 * rng.random(n)
    speed = 1490 + 10 * rng.random(n)
    q_ref = 3.1 * (1 + 2e-5 * (hours - 600))
    q_ref[n // 2:] *= 1.2  # a step half way
    t_drain = t_c + 4.0 * dp / DP_REF  # the pump file's clearance_temperature is the drain's
    mu_ratio = d341_cst(T_REF) / d341_cst(t_drain + 273.15)  # density ratio left out: a demo truth
    drain = (Q_C + (q_ref - Q_C) * (dp / DP_REF) * mu_ratio) * (1 + 0.01 * rng.standard_normal(n))
    drain[::997] = 0.0  # meter unplugged: refused rows
    with open(path, "w") as f:
        f.write("# invented readings for the scale benchmark (bench/health_scale.py)\n")
        f.write("date,operating hours,outlet pressure [bar],oil temperature [degC],speed [rpm],drain flow [L/min],"
                "drain temperature [degC]\n")
        for k in range(0, n, 100000):
            s = slice(k, k + 100000)
            rows = np.char.add(days[s], ",")
            cols = [np.char.mod("%.2f", hours[s]), np.char.mod("%.1f", dp[s]), np.char.mod("%.2f", t_c[s]),
                    np.char.mod("%.0f", speed[s]), np.char.mod("%.4f", drain[s]), np.char.mod("%.2f", t_drain[s])]
            for c in cols[:-1]:
                rows = np.char.add(np.char.add(rows, c), ",")
            rows = np.char.add(rows, cols[-1])
            f.write("\n".join(rows.tolist()) + "\n")


def pandas_normalise(path):
    import pandas as pd
    df = pd.read_csv(path, comment="#")
    t_k = df["drain temperature [degC]"].to_numpy() + 273.15
    dp = df["outlet pressure [bar]"].to_numpy()
    q = df["drain flow [L/min]"].to_numpy()
    q_ref = Q_C + (q - Q_C) * (DP_REF / dp) * (d341_cst(t_k) / d341_cst(T_REF))
    df["normalised drain flow [L/min]"] = q_ref
    print(f"pandas: {len(df)} rows, mean normalised drain flow {np.nanmean(q_ref[q > 0]):.4f} L/min")


if __name__ == "__main__":
    if sys.argv[1] == "generate":
        generate(int(sys.argv[2]), sys.argv[3])
    else:
        pandas_normalise(sys.argv[2])
