#!/usr/bin/env python3
"""Installs the build into a scratch prefix with `cmake --install` and checks what the desktop
and the package rely on: both programs, the menu entry (desktop-file-validate), the .lineward
file type (by name and by its magic, as xdg-mime sees it once update-mime-database has run),
the icons at every hicolor size, the man pages (the same text as docs/man) and the samples.

usage: install_check.py BUILD_DIR SOURCE_DIR SCRATCH_DIR
"""
import gzip
import os
import shutil
import struct
import subprocess
import sys

errors = []
ICON_SIZES = [16, 22, 24, 32, 48, 64, 128, 256]


def run(cmd, env=None, check=True):
    r = subprocess.run(cmd, capture_output=True, text=True, env=env)
    if check and r.returncode != 0:
        errors.append(f"{' '.join(cmd)} exited {r.returncode}: {r.stdout}{r.stderr}")
    return r


def png_size(path):
    with open(path, "rb") as f:
        head = f.read(24)
    if head[:8] != b"\x89PNG\r\n\x1a\n":
        return None
    return struct.unpack(">II", head[16:24])


def main():
    build, source, scratch = sys.argv[1:4]
    shutil.rmtree(scratch, ignore_errors=True)
    prefix = os.path.join(scratch, "usr")
    run(["cmake", "--install", build, "--prefix", prefix])
    share = os.path.join(prefix, "share")

    for program in ("lineward", "lineward-cli"):
        path = os.path.join(prefix, "bin", program)
        if not os.access(path, os.X_OK):
            errors.append(f"{path} is not installed as a program")
    r = run([os.path.join(prefix, "bin", "lineward-cli"), "--help"])
    if "export" not in r.stdout:
        errors.append("the installed lineward-cli --help lists no export verb")

    desktop = os.path.join(share, "applications", "lineward.desktop")
    run(["desktop-file-validate", desktop])
    with open(desktop, encoding="utf-8") as f:
        entry = dict(line.rstrip("\n").split("=", 1) for line in f if "=" in line)
    if entry.get("Exec", "").split()[0] != "lineward" or entry.get("Icon") != "lineward":
        errors.append(f"desktop entry runs {entry.get('Exec')!r} with icon {entry.get('Icon')!r}")
    if "application/x-lineward" not in entry.get("MimeType", ""):
        errors.append("desktop entry does not open application/x-lineward")

    for context, name in (("apps", "lineward"), ("mimetypes", "application-x-lineward")):
        svg = os.path.join(share, "icons/hicolor/scalable", context, name + ".svg")
        if not os.path.isfile(svg):
            errors.append(f"missing {svg}")
        for size in ICON_SIZES:
            png = os.path.join(share, f"icons/hicolor/{size}x{size}", context, name + ".png")
            if not os.path.isfile(png) or png_size(png) != (size, size):
                errors.append(f"{png}: not a {size}x{size} PNG")

    for page in ("lineward.1", "lineward-cli.1"):
        gz = os.path.join(share, "man/man1", page + ".gz")
        with open(os.path.join(source, "docs/man", page), encoding="utf-8") as f:
            want = f.read()
        if not os.path.isfile(gz) or gzip.open(gz, "rt", encoding="utf-8").read() != want:
            errors.append(f"{gz} is missing or differs from docs/man/{page}")

    samples = os.path.join(share, "lineward/samples")
    sample = os.path.join(samples, "kestrel-mill-mcc1.lineward")
    if not os.path.isfile(sample):
        errors.append(f"missing {sample}")

    # The file type as a desktop sees it: by name, and by the first bytes alone.
    mime = os.path.join(share, "mime")
    run(["update-mime-database", mime])
    env = {k: v for k, v in os.environ.items()
           if k not in ("XDG_CURRENT_DESKTOP", "DESKTOP_SESSION", "KDE_FULL_SESSION",
                        "GNOME_DESKTOP_SESSION_ID")}
    env["XDG_DATA_DIRS"] = share + ":/usr/share"
    env["XDG_DATA_HOME"] = os.path.join(scratch, "home-share")  # none of the user's own types
    unnamed = os.path.join(scratch, "drawing-without-suffix")
    shutil.copyfile(sample, unnamed)
    for path, want in ((sample, "application/x-lineward"), (unnamed, "application/x-lineward"),
                       (os.path.join(source, "README.md"), None)):
        got = run(["xdg-mime", "query", "filetype", path], env=env).stdout.strip()
        if want and got != want:
            errors.append(f"xdg-mime says {path} is {got!r}, expected {want}")
        if not want and got == "application/x-lineward":
            errors.append(f"xdg-mime takes {path} for a drawing")

    if errors:
        print("FAIL:\n  " + "\n  ".join(errors))
        sys.exit(1)
    print(f"ok: installed into {prefix}; desktop entry valid; {sample} and a copy without "
          f"its suffix are application/x-lineward; {2 * len(ICON_SIZES)} PNG icons, 2 SVG")


if __name__ == "__main__":
    main()
