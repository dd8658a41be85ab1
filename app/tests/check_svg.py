#!/usr/bin/env python3
"""The SVG files of the pumploss program are well-formed XML and hold the expected series.

Runs every reporting subcommand on the demo files (each plot kind appears there: lines with limit
lines and a log axis, markers over contour lines, a date axis, stacked areas), then parses every
SVG with xml.etree (standard library) and checks the series each plot must hold, the legends,
the contour paths and the date ticks.
Exit code 0 when all checks pass.
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
    ap.add_argument("--demo", required=True)
    a = ap.parse_args()
    tmp = tempfile.mkdtemp(prefix="pumploss_svg_")
    try:
        out = os.path.join(tmp, "out")
        subprocess.run([a.cli, "oil", os.path.join(a.demo, "oil.toml"), "--out", out], check=True,
                       stdout=subprocess.DEVNULL)

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

        demo = a.demo
        for args in (["test-stand", os.path.join(demo, "test_stand.csv"), "--setup", os.path.join(demo, "test_stand.toml")],
                     ["drain-line", os.path.join(demo, "drain_line.toml"), "--size"],
                     ["health", os.path.join(demo, "field_readings.csv"), "--pump", os.path.join(demo, "pump_p31.toml")],
                     ["budget", os.path.join(demo, "pump_p31.toml")]):
            subprocess.run([a.cli] + args + ["--out", out], check=True, stdout=subprocess.DEVNULL)

        def npoints(g):
            line = g.find(SVG + "polyline")
            if line is not None:
                return len(line.get("points").split())
            return len(g.findall(SVG + "circle"))

        # test-stand: a contour line per level of test_stand.toml and the 30 test points as markers
        root = ET.parse(os.path.join(out, "test_stand_map.svg")).getroot()
        got = list(groups(root, "contour"))
        check(got == ["80 %", "85 %", "88 %", "90 %", "91 %", "92 %"], "map: contour levels %r" % got)
        for name in ["85 %", "88 %", "90 %"]:
            g = groups(root, "contour").get(name)
            check(g is not None and g.find(SVG + "path") is not None and "M" in g.find(SVG + "path").get("d"),
                  "map: level %s drawn" % name)
        pts = groups(root, "series").get("test points")
        check(pts is not None and len(pts.findall(SVG + "circle")) == 30 and pts.find(SVG + "polyline") is None,
              "map: 30 test points as markers")

        # drain-line: continuous and destroke case pressure of the described line and the sized bore
        # over 8 temperatures, the continuous and peak limits, the case-drain caution at the foot
        root = ET.parse(os.path.join(out, "drain_line.svg")).getroot()
        series = groups(root, "series")
        names = list(series)
        check(len(names) == 3 and names[0] == "continuous, line as described" and
              names[1] == "on destroke, line as described" and names[2].startswith("continuous with "),
              "drain-line: series %r" % names)
        check(all(npoints(g) == 8 for g in series.values()), "drain-line: 8 temperatures per series")
        check(list(groups(root, "limit")) == ["allowed 1.00 bar", "peak allowed 2.00 bar"],
              "drain-line: limits %r" % list(groups(root, "limit")))
        # the described line fails cold on destroke: its first peak point lies above the peak limit
        # line (smaller SVG y)
        lim_y = float(groups(root, "limit")["peak allowed 2.00 bar"].find(SVG + "line").get("y1"))
        first_y = float(series["on destroke, line as described"].find(SVG + "polyline").get("points").split()[0]
                        .split(",")[1])
        check(first_y < lim_y, "drain-line: cold-start peak case pressure above the peak limit")
        texts = " ".join(t.text or "" for t in root.iter(SVG + "text"))
        check("never block, cap or valve a case drain" in texts, "drain-line: case-drain caution in the footer")

        # health: normalised and raw drain flow of the 41 scored readings (one refused), the trend
        # since the last step, baseline and bands, the case-drain caution in the footer
        root = ET.parse(os.path.join(out, "health.svg")).getroot()
        series = groups(root, "series")
        names = list(series)
        check(names[:2] == ["normalised drain flow", "drain flow as read"] and len(names) == 3
              and names[2].startswith("trend since "), "health: series %r" % names)
        check(npoints(series["normalised drain flow"]) == 41, "health: 41 scored readings")
        lims = list(groups(root, "limit"))
        check(len(lims) == 4 and lims[0].startswith("baseline") and lims[3].startswith("worn"),
              "health: limits %r" % lims)
        footer = " ".join(t.text or "" for t in root.iter(SVG + "text"))
        check("blows the shaft seal" in footer and "not a clearance to run" in footer, "health: caution in the footer")

        # budget: one stacked area per leakage path of the pump file
        root = ET.parse(os.path.join(out, "budget.svg")).getroot()
        got = list(groups(root, "area"))
        check(got == ["piston-bore", "slipper", "ball-socket", "valve-plate-inner", "valve-plate-outer", "controller",
                      "bleed-orifice", "control-piston"],
              "budget: areas %r" % got)

        # every plot lists its series and limit lines in its legend
        kinds = {"oil_viscosity.svg": "series", "drain_line.svg": "series", "health.svg": "series",
                 "budget.svg": "area"}
        for name, cls in kinds.items():
            root = ET.parse(os.path.join(out, name)).getroot()
            names = list(groups(root, cls)) + list(groups(root, "limit"))
            legend = [t.text for g in root.iter(SVG + "g") if g.get("class") == "legend" for t in g.iter(SVG + "text")]
            check(names and all(n in legend for n in names), "%s: legend lists %r, has %r" % (name, names, legend))
        # contour lines are drawn (non-empty paths) for every level the map's efficiency reaches
        with open(os.path.join(out, "test_stand_map.csv")) as f:
            lines = [l.rstrip("\n").split(",") for l in f if not l.startswith("#")]
        col = lines[0].index("overall eff Schloesser percent")
        top = max(float(r[col]) for r in lines[1:])
        root = ET.parse(os.path.join(out, "test_stand_map.svg")).getroot()
        for name, g in groups(root, "contour").items():
            if float(name.split()[0]) >= top:
                continue
            path = g.find(SVG + "path")
            check(path is not None and path.get("d").count("M") >= 1, "contour level %s drawn" % name)
        # date ticks are labelled YYYY-MM
        root = ET.parse(os.path.join(out, "health.svg")).getroot()
        ticks = [t.text for g in root.iter(SVG + "g") if g.get("class") == "ticks" for t in g.iter(SVG + "text")]
        check(any(t and len(t) == 7 and t[4] == "-" for t in ticks), "health: YYYY-MM tick labels %r" % ticks)
    finally:
        shutil.rmtree(tmp, ignore_errors=True)
    if failures:
        print("%d check(s) failed" % len(failures))
        return 1
    print("all SVG checks passed")
    return 0


if __name__ == "__main__":
    sys.exit(main())
