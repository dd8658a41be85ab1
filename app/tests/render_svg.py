#!/usr/bin/env python3
"""Render one SVG of the pumploss program to PNG in a headless browser (Debian's chromium).

Exit 77 (ctest SKIP_RETURN_CODE) with a message when chromium is not installed; chromium is not
part of scripts/setup.sh (too large for CI). Checks that the PNG has the page's size and is not
blank.
"""
import argparse
import os
import shutil
import struct
import subprocess
import sys
import tempfile
import zlib


def png_pixels(path):
    """Width, height, bit depth, colour type and the decompressed (still filtered) scanlines."""
    with open(path, "rb") as f:
        data = f.read()
    if data[:8] != b"\x89PNG\r\n\x1a\n":
        raise ValueError("not a PNG file")
    pos, idat, w = 8, b"", None
    while pos < len(data):
        n, kind = struct.unpack(">I4s", data[pos:pos + 8])
        body = data[pos + 8:pos + 8 + n]
        if kind == b"IHDR":
            w, h, depth, color = struct.unpack(">IIBB", body[:10])
        elif kind == b"IDAT":
            idat += body
        pos += 12 + n
    return w, h, depth, color, zlib.decompress(idat)


def unfilter(w, h, bpp, raw):
    """Undo the PNG scanline filters (None, Sub, Up, Average, Paeth): the pixel bytes, row by row."""
    stride = w * bpp
    rows, prev, pos = [], bytearray(stride), 0
    for _ in range(h):
        ftype, line = raw[pos], bytearray(raw[pos + 1:pos + 1 + stride])
        pos += 1 + stride
        for i in range(stride):
            a = line[i - bpp] if i >= bpp else 0
            b = prev[i]
            c = prev[i - bpp] if i >= bpp else 0
            if ftype == 1:
                line[i] = (line[i] + a) & 255
            elif ftype == 2:
                line[i] = (line[i] + b) & 255
            elif ftype == 3:
                line[i] = (line[i] + (a + b) // 2) & 255
            elif ftype == 4:
                pa, pb, pc = abs(b - c), abs(a - c), abs(a + b - 2 * c)
                line[i] = (line[i] + (a if pa <= pb and pa <= pc else b if pb <= pc else c)) & 255
        rows.append(line)
        prev = line
    return rows


def main():
    ap = argparse.ArgumentParser()
    ap.add_argument("--cli", required=True)
    ap.add_argument("--demo", required=True)
    a = ap.parse_args()
    browser = shutil.which("chromium") or shutil.which("chromium-browser")
    if browser is None:
        print("SKIPPED: chromium is not installed (apt-get install chromium to run this test)")
        return 77
    tmp = tempfile.mkdtemp(prefix="pumploss_browser_")
    try:
        out = os.path.join(tmp, "out")
        subprocess.run([a.cli, "oil", os.path.join(a.demo, "oil.toml"), "--out", out], check=True,
                       stdout=subprocess.DEVNULL)
        svg = os.path.join(out, "oil_viscosity.svg")
        png = os.path.join(tmp, "oil_viscosity.png")
        profile = os.path.join(tmp, "profile")
        os.mkdir(profile)
        cmd = [browser, "--headless", "--no-sandbox", "--disable-gpu", "--disable-quic", "--no-first-run",
               "--disable-background-networking", "--disable-component-update", "--disable-sync",
               "--user-data-dir=" + profile, "--hide-scrollbars", "--window-size=860,520",
               "--screenshot=" + png, "file://" + svg]
        r = subprocess.run(cmd, stdout=subprocess.PIPE, stderr=subprocess.PIPE, timeout=90)
        if not os.path.exists(png):
            print("FAIL: chromium wrote no PNG (exit %d)\n%s" % (r.returncode, r.stderr.decode(errors="replace")))
            return 1
        w, h, depth, color, raw = png_pixels(png)
        print("rendered %s: %dx%d PNG" % (os.path.basename(svg), w, h))
        if (w, h) != (860, 520):
            print("FAIL: expected 860x520")
            return 1
        if depth != 8 or color not in (2, 6):
            print("FAIL: expected an 8-bit RGB or RGBA PNG (depth %d, colour type %d)" % (depth, color))
            return 1
        bpp = 3 if color == 2 else 4
        rows = unfilter(w, h, bpp, raw)
        # drawn, not blank: a white page with some dark pixels (axes, text) and some coloured
        # ones (the series in blue, the limit lines in red)
        dark = coloured = white = 0
        for line in rows:
            for i in range(0, len(line), bpp):
                r_, g_, b_ = line[i], line[i + 1], line[i + 2]
                if r_ > 245 and g_ > 245 and b_ > 245:
                    white += 1
                elif r_ < 100 and g_ < 100 and b_ < 100:
                    dark += 1
                elif abs(r_ - b_) > 80:
                    coloured += 1
        n = w * h
        print("pixels: %d white, %d dark, %d coloured of %d" % (white, dark, coloured, n))
        if not (white > 0.6 * n and dark > 500 and coloured > 500):
            print("FAIL: the picture does not look like a drawn plot on a white page")
            return 1
        print("browser rendering passed")
        return 0
    finally:
        shutil.rmtree(tmp, ignore_errors=True)


if __name__ == "__main__":
    sys.exit(main())
