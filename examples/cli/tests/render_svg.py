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
    """Width, height and the raw (unfiltered scanline) bytes of an 8-bit RGB/RGBA PNG."""
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
        # not blank: a good share of the bytes are not white (lines, text, axes)
        dark = sum(1 for b in raw if b < 128)
        if depth != 8 or dark < 2000:
            print("FAIL: the picture looks blank (%d dark bytes, bit depth %d)" % (dark, depth))
            return 1
        print("browser rendering passed (%d dark bytes)" % dark)
        return 0
    finally:
        shutil.rmtree(tmp, ignore_errors=True)


if __name__ == "__main__":
    sys.exit(main())
