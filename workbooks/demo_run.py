#!/usr/bin/python3
"""Demo stage for Calc: install tubeheat.oxt into a private LibreOffice
profile (as an unprivileged user), recalculate workbooks/demo.fods headless,
print its key results as a table and write a PDF of it.

    /usr/bin/python3 workbooks/demo_run.py --oxt build/addin/tubeheat.oxt --out out/demo
"""
from __future__ import annotations

import argparse
import csv
import pathlib
import shutil
import sys
import time

HERE = pathlib.Path(__file__).resolve().parent
sys.path.insert(0, str(HERE.parent / "addin" / "tools"))

import lo_headless  # noqa: E402


def main() -> int:
    ap = argparse.ArgumentParser(description=__doc__.splitlines()[0])
    ap.add_argument("--oxt", required=True)
    ap.add_argument("--out", required=True)
    ap.add_argument("--workbook", default=str(HERE / "demo.fods"))
    ns = ap.parse_args()
    out = pathlib.Path(ns.out)
    out.mkdir(parents=True, exist_ok=True)
    t0 = time.monotonic()
    with lo_headless.CalcSession(ns.oxt) as calc:
        csv_dir = calc.convert([ns.workbook], lo_headless.CSV_ALL_SHEETS)
        pdf_dir = calc.convert([ns.workbook], "pdf")
        stem = pathlib.Path(ns.workbook).stem
        shutil.copyfile(csv_dir / f"{stem}-Demo.csv", out / f"{stem}.csv")
        shutil.copyfile(pdf_dir / f"{stem}.pdf", out / f"{stem}.pdf")
    with open(out / f"{stem}.csv", newline="", encoding="utf-8") as fh:
        rows = list(csv.reader(fh))
    # Print the results block: from the "result" header to the first blank row.
    start = next(i for i, r in enumerate(rows) if r and r[0] == "result")
    print(f"{'result':34s} {'value':>22s}  {'unit':9s} status")
    for r in rows[start + 1:]:
        if not r or not r[0]:
            break
        label, value, unit = r[0], r[1], r[2]
        status = r[3] if len(r) > 3 else ""
        try:
            value = f"{float(value):.6g}"
        except ValueError:
            pass
        print(f"{label:34s} {value:>22s}  {unit:9s} {status}")
    bad = [c for r in rows for c in r if c.startswith(("Err:", "#NAME", "#VALUE", "#NUM"))]
    print(f"\nPDF: {out / (stem + '.pdf')}   CSV: {out / (stem + '.csv')}   "
          f"({time.monotonic() - t0:.1f} s)")
    if bad:
        print(f"error cells in the demo: {bad}")
        return 1
    return 0


if __name__ == "__main__":
    sys.exit(main())
