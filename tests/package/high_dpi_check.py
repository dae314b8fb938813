#!/usr/bin/env python3
"""High-DPI: the editor's window picture (`lineward FILE --screenshot PNG`, offscreen) taken at
a device pixel ratio of 2 has twice the pixels each way of the one at 1, and more distinct
detail than the 1x picture scaled up would have: the Sheet, symbols and text are drawn at the
device's resolution, not enlarged.

usage: high_dpi_check.py LINEWARD SAMPLE SCRATCH_DIR
"""
import os
import shutil
import struct
import subprocess
import sys
import zlib


def read_png(path):
    """(width, height, rows of RGBA bytes) of an 8-bit RGB/RGBA PNG, with the filters undone."""
    with open(path, "rb") as f:
        data = f.read()
    assert data[:8] == b"\x89PNG\r\n\x1a\n", path
    pos, idat, width = 8, b"", 0
    while pos < len(data):
        length, kind = struct.unpack(">I4s", data[pos:pos + 8])
        body = data[pos + 8:pos + 8 + length]
        if kind == b"IHDR":
            width, height, depth, colour = struct.unpack(">IIBB", body[:10])
            assert depth == 8 and colour in (2, 6), f"{path}: depth {depth} colour {colour}"
            bpp = 4 if colour == 6 else 3
        elif kind == b"IDAT":
            idat += body
        pos += 12 + length
    raw = zlib.decompress(idat)
    stride = width * bpp
    rows, prev = [], bytearray(stride)
    for y in range(height):
        f = raw[y * (stride + 1)]
        line = bytearray(raw[y * (stride + 1) + 1:(y + 1) * (stride + 1)])
        for i in range(stride):
            a = line[i - bpp] if i >= bpp else 0
            b = prev[i]
            c = prev[i - bpp] if i >= bpp else 0
            if f == 1:
                line[i] = (line[i] + a) & 0xFF
            elif f == 2:
                line[i] = (line[i] + b) & 0xFF
            elif f == 3:
                line[i] = (line[i] + (a + b) // 2) & 0xFF
            elif f == 4:
                p = a + b - c
                pa, pb, pc = abs(p - a), abs(p - b), abs(p - c)
                line[i] = (line[i] + (a if pa <= pb and pa <= pc else b if pb <= pc else c)) & 0xFF
        rows.append(bytes(line))
        prev = line
    return width, height, bpp, rows


def shot(lineward, sample, scratch, scale):
    out = os.path.join(scratch, f"window-{scale}x.png")
    env = dict(os.environ, QT_QPA_PLATFORM="offscreen", QT_SCALE_FACTOR=str(scale),
               XDG_CONFIG_HOME=os.path.join(scratch, "config"),
               XDG_DATA_HOME=os.path.join(scratch, "data"))
    r = subprocess.run([lineward, sample, "--screenshot", out], env=env, capture_output=True,
                       text=True, timeout=120)
    if r.returncode != 0 or not os.path.isfile(out):
        sys.exit(f"FAIL: lineward --screenshot at {scale}x exited {r.returncode}: {r.stderr}")
    return read_png(out)


def main():
    lineward, sample, scratch = sys.argv[1:4]
    shutil.rmtree(scratch, ignore_errors=True)
    os.makedirs(scratch)
    w1, h1, _, _ = shot(lineward, sample, scratch, 1)
    w2, h2, bpp, rows = shot(lineward, sample, scratch, 2)
    if (w2, h2) != (2 * w1, 2 * h1):
        sys.exit(f"FAIL: 1x picture {w1}x{h1}, 2x picture {w2}x{h2}: not twice the pixels")
    # A picture enlarged from 1x has every 2x2 block of one colour; one drawn at 2x does not.
    split = 0
    for y in range(0, h2 - 1, 2):
        top, bottom = rows[y], rows[y + 1]
        for x in range(0, w2 - 1, 2):
            i = x * bpp
            block = {top[i:i + bpp], top[i + bpp:i + 2 * bpp], bottom[i:i + bpp],
                     bottom[i + bpp:i + 2 * bpp]}
            split += len(block) > 1
    if split < 2000:
        sys.exit(f"FAIL: only {split} 2x2 blocks of the 2x picture differ inside: enlarged, "
                 f"not drawn at 2x")
    print(f"ok: {w1}x{h1} at 1x, {w2}x{h2} at 2x; {split} 2x2 blocks hold finer detail")


if __name__ == "__main__":
    main()
