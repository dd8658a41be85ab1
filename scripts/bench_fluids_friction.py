#!/usr/bin/python3
"""Time python3-fluids' Colebrook friction factor for comparison with bench/friction_bench.cpp
(BM_FrictionColebrook). Run with Debian's interpreter:

    /usr/bin/python3 scripts/bench_fluids_friction.py

Uses the same 64 (Re, epsilon/D) pairs as the C++ benchmark. Python call overhead dominates;
the figure shows what a spreadsheet-style Python user pays per call, not an algorithm race.
"""
import timeit

import fluids.friction as fr

PTS = [(4e3 * (1e8 / 4e3) ** ((i % 16) / 15.0), [0.0, 1e-5, 1e-3, 0.03][i // 16]) for i in range(64)]


def run(fn):
    for re, rr in PTS:
        fn(re, rr)


def main():
    for name, fn in [("Colebrook (exact, fluids)", fr.Colebrook),
                     ("Clamond (fluids)", fr.Clamond),
                     ("Haaland (fluids)", fr.Haaland)]:
        n = 200
        t = min(timeit.repeat(lambda: run(fn), number=n, repeat=5)) / (n * len(PTS))
        print(f"{name:28s} {t * 1e9:9.1f} ns/call")


if __name__ == "__main__":
    main()
