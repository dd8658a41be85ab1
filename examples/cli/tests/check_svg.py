#!/usr/bin/env python3
"""The SVG files of the pumploss program are well-formed XML and hold the expected series.

Runs `pumploss oil` on the demo oil file and the sample writer for the other plot kinds, then
parses every SVG with xml.etree (standard library). Exit code 0 when all checks pass.
"""
import argparse
import os
import shutil
import subprocess
import sys
import tempfile
import xml.etree.ElementTree as ET

SVG = "{http://www.w3.org/2000/svg}"
failures = []


def check(cond, what):
    if not cond:
        failures.append(what)
        print("FAIL:", what)


def groups(root, cls):
    return {g.get("data-name"): g for g in root.iter(SVG + "g") if g.get("class") == cls}


def main():
    ap = argparse.ArgumentParser()
    ap.add_argument("--cli", required=True)
    ap.add_argument("--samples", required=True)
    ap.add_argument("--demo", required=True)
    a = ap.parse_args()
    tmp = tempfile.mkdtemp(prefix="pumploss_svg_")
    try:
        out = os.path.join(tmp, "out")
        subprocess.run([a.cli, "oil", os.path.join(a.demo, "oil.toml"), "--out", out], check=True,
                       stdout=subprocess.DEVNULL)
        subprocess.run([a.samples, tmp], check=True)

        # the oil plot: one viscosity series with one point per tabulated temperature, three limits
        root = ET.parse(os.path.join(out, "oil_viscosity.svg")).getroot()
        check(root.tag == SVG + "svg", "oil: root element is svg")
        series = groups(root, "series")
        check(list(series) == ["kinematic viscosity"], "oil: series names %r" % list(series))
        pts = series["kinematic viscosity"].find(SVG + "polyline").get("points").split()
        check(len(pts) == 15, "oil: 15 points (0..70 degC step 5), got %d" % len(pts))
        ys = [float(p.split(",")[1]) for p in pts]
        check(all(b > a for a, b in zip(ys, ys[1:])), "oil: viscosity falls with temperature (SVG y grows)")
        limits = groups(root, "limit")
        check(sorted(limits) == sorted(["min 10.0 cSt", "max running 400 cSt", "max at start 1.00e+03 cSt"])
              or len(limits) == 3, "oil: three limit lines, got %r" % list(limits))
        check(root.find(SVG + "title").text.startswith("Viscosity of"), "oil: title")
        # rows of the CSV appear in the same order as the plotted points
        with open(os.path.join(out, "oil_properties.csv")) as f:
            rows = [l for l in f if l[0].isdigit()]
        check(len(rows) == 15, "oil: CSV has 15 rows")

        expected = {
            "lines.svg": ("series", ["12.7 mm line", "19.1 mm line"], ["allowed 1.0 bar"]),
            "dates.svg": ("series", ["normalised drain flow"], ["watch", "plan overhaul"]),
            "stack.svg": ("area", ["path A", "path B", "path C"], []),
            "contour.svg": ("contour", ["0.86", "0.88", "0.90", "0.91"], []),
        }
        for name, (cls, names, lims) in expected.items():
            root = ET.parse(os.path.join(tmp, name)).getroot()
            got = list(groups(root, cls))
            check(got == names, "%s: %s groups %r, expected %r" % (name, cls, got, names))
            check(sorted(groups(root, "limit")) == sorted(lims), "%s: limit lines" % name)
            legend = [t.text for g in root.iter(SVG + "g") if g.get("class") == "legend" for t in g.iter(SVG + "text")]
            check(all(n in legend for n in names + lims), "%s: legend lists %r" % (name, names + lims))
        # contour lines are drawn (non-empty paths) for every level
        root = ET.parse(os.path.join(tmp, "contour.svg")).getroot()
        for g in groups(root, "contour").values():
            path = g.find(SVG + "path")
            check(path is not None and path.get("d").count("M") > 3, "contour level %s drawn" % g.get("data-name"))
        # date ticks are labelled YYYY-MM
        root = ET.parse(os.path.join(tmp, "dates.svg")).getroot()
        ticks = [t.text for g in root.iter(SVG + "g") if g.get("class") == "ticks" for t in g.iter(SVG + "text")]
        check(any(t and len(t) == 7 and t[4] == "-" for t in ticks), "dates: YYYY-MM tick labels %r" % ticks)
    finally:
        shutil.rmtree(tmp, ignore_errors=True)
    if failures:
        print("%d check(s) failed" % len(failures))
        return 1
    print("all SVG checks passed")
    return 0


if __name__ == "__main__":
    sys.exit(main())
