#!/usr/bin/env python3
"""Opens lineward-cli's DXF of a drawing in an independent reader (ezdxf, Debian's
python3-ezdxf) and checks what a CAD user relies on: the file audits clean, every layer is
named, every part's tag is a TEXT on the tag layer, each rating is a TEXT, the unit is inches.
The tags are read from the drawing's JSON here, not from Lineward.

usage: dxf_reader_check.py LINEWARD_CLI DRAWING OUT_DIR
"""
import json
import os
import subprocess
import sys

import ezdxf

KINDS = ["source", "transformer", "bus", "breaker", "inst_breaker", "fuse", "disconnect",
         "contactor", "overload", "vfd", "soft_starter", "cable", "motor", "load"]
OTHER_LAYERS = ["LW-WIRES", "LW-TEXT-TAGS", "LW-TEXT-RATINGS", "LW-BADGES", "LW-BUCKETS",
                "LW-TITLE-BLOCK"]


def fail(why):
    print("FAIL:", why)
    sys.exit(1)


def main():
    cli, drawing, out_dir = sys.argv[1:4]
    os.makedirs(out_dir, exist_ok=True)
    out = os.path.join(out_dir, os.path.basename(drawing) + ".dxf")
    if os.path.exists(out):
        os.remove(out)
    run = subprocess.run([cli, "export", drawing, "--dxf", out], capture_output=True, text=True)
    if run.returncode != 0:
        fail(f"lineward-cli export exited {run.returncode}: {run.stderr}")

    doc = ezdxf.readfile(out)
    auditor = doc.audit()
    if auditor.has_errors:
        fail(f"ezdxf audit: {[str(e.message) for e in auditor.errors]}")
    if doc.dxfversion != "AC1009":
        fail(f"DXF version {doc.dxfversion}, expected AC1009 (R12)")
    if doc.header.get("$INSUNITS") != 1:
        fail(f"$INSUNITS is {doc.header.get('$INSUNITS')}, expected 1 (inches)")

    layers = {layer.dxf.name for layer in doc.layers}
    wanted = ["LW-PART-" + k.upper() for k in KINDS] + OTHER_LAYERS
    missing = [name for name in wanted if name not in layers]
    if missing:
        fail(f"layers missing: {missing}")

    with open(drawing, encoding="utf-8") as f:
        parts = json.load(f)["parts"]
    msp = doc.modelspace()
    # R12 carries characters beyond ASCII as \U+XXXX; ezdxf's own decoder reads them back.
    def texts(layer):
        return [ezdxf.decode_dxf_unicode(t.dxf.text) for t in msp.query(f'TEXT[layer=="{layer}"]')]
    tags = texts("LW-TEXT-TAGS")
    ratings = set(texts("LW-TEXT-RATINGS"))
    part_tags = [part["tag"] for part in parts]  # a drawing may repeat a tag by mistake
    for part in parts:
        if tags.count(part["tag"]) != part_tags.count(part["tag"]):
            fail(f"tag {part['tag']!r} appears {tags.count(part['tag'])} times as text, "
                 f"{part_tags.count(part['tag'])} times in the drawing")
        kind_layer = "LW-PART-" + part["kind"].upper()
        if not msp.query(f'*[layer=="{kind_layer}"]'):
            fail(f"nothing drawn on {kind_layer} for {part['tag']}")
        for key, value in part.items():
            if key in ("id", "kind", "tag", "x", "y", "rot") or isinstance(value, (list, dict)):
                continue
            shown = ("yes" if value else "no") if isinstance(value, bool) else str(value)
            if not any(r.startswith(f"{key} = {shown}") for r in ratings):
                fail(f"{part['tag']}: rating {key} = {shown} is not written as text")
    if len(tags) != len(parts):
        fail(f"{len(tags)} tags written for {len(parts)} parts")
    wires = len(msp.query('POLYLINE[layer=="LW-WIRES"]'))
    title = [t.dxf.text for t in msp.query('TEXT[layer=="LW-TITLE-BLOCK"]')]
    if not any("inches" in t for t in title):
        fail("the title block does not state the unit")
    print(f"ok: {out}: {len(parts)} tags, {len(ratings)} rating texts, {wires} wires, "
          f"{len(layers)} layers, {len(msp)} entities; ezdxf {ezdxf.__version__} audit clean")


if __name__ == "__main__":
    main()
