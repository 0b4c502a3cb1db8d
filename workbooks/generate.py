#!/usr/bin/python3
"""Write the template workbooks workbooks/<stem>.fods from their readable
descriptions in workbooks/src/*.py (one module per template, each with a
build() returning a tools/template.py Template).

    /usr/bin/python3 workbooks/generate.py               # rewrite the committed .fods
    /usr/bin/python3 workbooks/generate.py --out DIR     # write them to DIR instead
    /usr/bin/python3 workbooks/generate.py --check       # fail if a committed file is stale
    /usr/bin/python3 workbooks/generate.py --list        # stems, one per line

Flat ODF, formulas stored by programmatic name, no cached values: Calc
computes every formula when the file is opened. The demo workbook
(demo_generate.py) is separate and not touched here.
"""
from __future__ import annotations

import argparse
import importlib.util
import pathlib
import sys

HERE = pathlib.Path(__file__).resolve().parent
sys.path.insert(0, str(HERE / "tools"))

import template as tpl  # noqa: E402

SRC = HERE / "src"


def load_templates() -> list:
    """Every workbooks/src/*.py built, in file-name order."""
    out = []
    for path in sorted(SRC.glob("*.py")):
        if path.name.startswith("_"):
            continue
        spec = importlib.util.spec_from_file_location(f"wb_src_{path.stem}", path)
        mod = importlib.util.module_from_spec(spec)
        spec.loader.exec_module(mod)
        t = mod.build()
        if t.stem != path.stem:
            raise tpl.TemplateError(f"{path.name}: stem {t.stem!r} differs from the file name")
        out.append(t)
    return out


def main() -> int:
    ap = argparse.ArgumentParser(description=__doc__.splitlines()[0])
    ap.add_argument("--out", help="folder to write to (default: workbooks/)")
    ap.add_argument("--check", action="store_true", help="compare with the committed files")
    ap.add_argument("--list", action="store_true", help="print the template stems")
    ns = ap.parse_args()
    templates = load_templates()
    if ns.list:
        for t in templates:
            print(t.stem)
        return 0
    out = pathlib.Path(ns.out) if ns.out else HERE
    out.mkdir(parents=True, exist_ok=True)
    stale = []
    for t in templates:
        text = t.render()
        path = HERE / f"{t.stem}.fods"
        if ns.check:
            if not path.exists() or path.read_text(encoding="utf-8") != text:
                stale.append(path.name)
            continue
        target = out / f"{t.stem}.fods"
        target.write_text(text, encoding="utf-8")
        print(f"wrote {target}")
    if stale:
        print("stale (regenerate with /usr/bin/python3 workbooks/generate.py): " + ", ".join(stale))
        return 1
    if ns.check:
        print(f"{len(templates)} template workbooks are fresh")
    return 0


if __name__ == "__main__":
    sys.exit(main())
