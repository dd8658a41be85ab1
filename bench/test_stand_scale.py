#!/usr/bin/python3
"""Scale benchmark of `pumploss test-stand` (issue 20): a logged test of N rows generated from the
30 set points of examples/demo/test_stand.csv (invented data): each set point logged for N / 30
consecutive rows, its first 5 % still settling (flow 3 % low, torque 3 % high, drain 4 K warm),
every reading with noise (speed 0.1 %, pressure 0.2 %, flow and torque 0.15 %, temperatures 0.1 K).

  test_stand_scale.py generate N FILE   write the N rows to FILE (the demo's columns and units)
"""
import sys

import numpy as np


def generate(n, path, demo):
    lines = [line for line in open(demo, encoding="utf-8").read().splitlines() if line and not line.startswith("#")]
    header, rows = lines[0], np.array([[float(x) for x in line.split(",")] for line in lines[1:]])
    m = len(rows)
    per = max(n // m, 1)
    idx = np.minimum(np.arange(n) // per, m - 1)
    settle = (np.arange(n) - idx * per) < max(per // 20, 1)
    rng = np.random.default_rng(20)
    x = rows[idx].copy()
    rel = {0: 0.001, 2: 0.002, 3: 0.0015, 4: 0.0015}  # speed, outlet pressure, flow, torque
    for c, s in rel.items():
        x[:, c] *= 1 + s * rng.standard_normal(n)
    for c in range(6, x.shape[1]):  # temperatures
        x[:, c] += 0.1 * rng.standard_normal(n)
    x[settle, 3] *= 0.97
    x[settle, 4] *= 1.03
    x[settle, 8] += 4.0
    fmt = ["%.2f", "%.3f", "%.3f", "%.4f", "%.3f", "%.4f"] + ["%.2f"] * (x.shape[1] - 6)
    with open(path, "w", encoding="utf-8") as f:
        f.write("# logged test of the demo pump (invented data, bench/test_stand_scale.py)\n" + header + "\n")
        np.savetxt(f, x, fmt=fmt, delimiter=",")


if __name__ == "__main__":
    if len(sys.argv) == 5 and sys.argv[1] == "generate":
        generate(int(sys.argv[2]), sys.argv[3], sys.argv[4])
    else:
        sys.exit(__doc__)
