#!/usr/bin/python3
"""Deterministic spreadsheet cost: instructions per row under callgrind.

Wall time on a shared machine is noisy; instruction counts are not. This
runs soffice.bin under `valgrind --tool=callgrind` on the workbooks of
calc_bench.py (baseline, native, addin, table) at two sizes and reports the
*marginal* instructions per row, (I(n2) - I(n1)) / (n2 - n1), minus the
baseline's: what one more row of each variant costs, without the one-time
costs (start-up, loading the add-in). It also reports how much of the add-in
row is spent inside the extension itself (inclusive cost of the UNO method,
which includes libtubeheat), the rest being Calc's import, formula compiler,
interpreter and UNO reflection.

    calc_callgrind.py --oxt build-perf/addin/tubeheat.oxt --work DIR [--sizes 4000 12000]

Takes several minutes (each soffice run is ~50x slower under callgrind).
Prints a Markdown table. Standard library + valgrind.
"""
from __future__ import annotations

import argparse
import pathlib
import re
import shutil
import subprocess
import sys

HERE = pathlib.Path(__file__).resolve().parent
sys.path.insert(0, str(HERE.parents[1] / "addin" / "tools"))
sys.path.insert(0, str(HERE))

import calc_bench  # noqa: E402
import lo_headless  # noqa: E402

SOFFICE_BIN = "/usr/lib/libreoffice/program/soffice.bin"
OWN = {"addin": r"th_addin::CalcFunctions::nusselt\(", "table": r"th_addin::CalcFunctions::nusseltTable\("}


def annotate(path: pathlib.Path) -> tuple[int, dict]:
    text = subprocess.run(["callgrind_annotate", "--inclusive=yes", "--threshold=100", str(path)],
                          capture_output=True, text=True, check=True).stdout
    total = int(re.search(r"([\d,]+) \(100.0%\)\s+PROGRAM TOTALS", text).group(1).replace(",", ""))
    own = {}
    for key, pat in OWN.items():
        m = re.search(r"^\s*([\d,]+) \([^)]*\)\s+\?\?\?:" + pat, text, re.M)
        if m:
            own[key] = int(m.group(1).replace(",", ""))
    return total, own


def main() -> int:
    ap = argparse.ArgumentParser(description=__doc__.splitlines()[0])
    ap.add_argument("--oxt", required=True)
    ap.add_argument("--work", required=True)
    ap.add_argument("--sizes", type=int, nargs=2, default=[4000, 12000])
    ns = ap.parse_args()
    if not shutil.which("valgrind"):
        print("valgrind not found: skipped")
        return 0
    work = pathlib.Path(ns.work)
    counts = {}
    with lo_headless.CalcSession(ns.oxt, timeout=3600) as calc:
        for n in ns.sizes:
            d = work / f"rows{n}"
            d.mkdir(parents=True, exist_ok=True)
            paths, _, _ = calc_bench.write_variants(d, n, True)
            staged = {k: calc.stage([p])[0] for k, p in paths.items()}
            calc.convert([staged["empty"]], lo_headless.CSV_ALL_SHEETS)  # profile warm-up
            for variant in ("baseline", "native", "addin", "table"):
                out = calc.root / "tmp" / f"cg_{variant}_{n}.out"
                calc._run(["valgrind", "--tool=callgrind", f"--callgrind-out-file={out}",
                           SOFFICE_BIN, "--headless", "--norestore", "--nolockcheck",
                           calc._env_arg(), "--convert-to", lo_headless.CSV_ALL_SHEETS,
                           "--outdir", str(calc.root / "out"), str(staged[variant])])
                shutil.copyfile(out, d / out.name)
                counts[(variant, n)] = annotate(d / out.name)
                print(f"{variant} {n} rows: {counts[(variant, n)][0]:,} instructions", flush=True)
    n1, n2 = ns.sizes
    per_row = {v: (counts[(v, n2)][0] - counts[(v, n1)][0]) / (n2 - n1)
               for v in ("baseline", "native", "addin", "table")}
    print()
    print(f"| variant | instructions per extra row (marginal, {n1} -> {n2} rows) | "
          "minus baseline | inside the extension | ratio to native |")
    print("|---|---|---|---|---|")
    nat = per_row["native"] - per_row["baseline"]
    for v in ("baseline", "native", "addin", "table"):
        extra = per_row[v] - per_row["baseline"]
        own = ""
        if v in OWN and v in counts[(v, n2)][1] and v in counts[(v, n1)][1]:
            own_row = (counts[(v, n2)][1][v] - counts[(v, n1)][1][v]) / (n2 - n1)
            own = f"{own_row:,.0f} ({own_row / extra:.0%})"
        ratio = f"{extra / nat:.2f}" if v != "baseline" else "-"
        print(f"| {v} | {per_row[v]:,.0f} | {extra:+,.0f} | {own or '-'} | {ratio} |")
    return 0


if __name__ == "__main__":
    sys.exit(main())
