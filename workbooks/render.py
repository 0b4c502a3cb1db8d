#!/usr/bin/python3
"""Build the template workbooks for users and reviewers: each committed
workbooks/<stem>.fods recalculated headless with tubeheat.oxt installed and
saved as <stem>.ods (the file engineers open and hand around; it keeps the
computed values) and <stem>.pdf (for a reviewer without LibreOffice).

    /usr/bin/python3 workbooks/render.py --oxt build/addin/tubeheat.oxt --out build/workbooks

Called by the CMake target tubeheat_workbooks. Fails when a file was not
written or a rendered sheet shows an error value.
"""
from __future__ import annotations

import argparse
import pathlib
import shutil
import subprocess
import sys
import time

HERE = pathlib.Path(__file__).resolve().parent
sys.path.insert(0, str(HERE.parent / "addin" / "tools"))

import lo_headless  # noqa: E402

ERRORS = ("Err:", "#NAME?", "#VALUE!", "#NUM!", "#DIV/0!", "#N/A", "#REF!")


def main() -> int:
    ap = argparse.ArgumentParser(description=__doc__.splitlines()[0])
    ap.add_argument("--oxt", required=True)
    ap.add_argument("--out", required=True)
    ap.add_argument("--stamp", help="file to touch on success")
    ns = ap.parse_args()
    out = pathlib.Path(ns.out)
    out.mkdir(parents=True, exist_ok=True)
    sources = sorted(p for p in HERE.glob("*.fods") if not p.name.startswith("demo"))
    if not sources:
        print("no template workbooks found")
        return 1
    t0 = time.monotonic()
    with lo_headless.CalcSession(ns.oxt) as calc:
        calc.convert(sources, "ods", out)
        calc.convert(sources, "pdf", out)
    bad = []
    for src in sources:
        for ext in ("ods", "pdf"):
            if not (out / f"{src.stem}.{ext}").exists():
                bad.append(f"{src.stem}.{ext} not written")
        pdf = out / f"{src.stem}.pdf"
        if pdf.exists() and shutil.which("pdftotext"):
            text = subprocess.run(["pdftotext", str(pdf), "-"], capture_output=True, text=True,
                                  check=True).stdout
            bad += [f"{pdf.name} shows {e}" for e in ERRORS if e in text]
    for b in bad:
        print("FAIL:", b)
    print(f"{len(sources)} template workbooks -> {out} (.ods, .pdf) in "
          f"{time.monotonic() - t0:.1f} s")
    if bad:
        return 1
    if ns.stamp:
        pathlib.Path(ns.stamp).touch()
    return 0


if __name__ == "__main__":
    sys.exit(main())
