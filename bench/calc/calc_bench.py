#!/usr/bin/python3
"""Spreadsheet benchmark: the Calc extension against native formulas.

Writes flat ODF workbooks of N rows (default 200,000) that all hold the same
Re and Pr columns and differ only in how the third column, the Gnielinski
Nusselt number (Petukhov smooth-tube friction, fully developed), is made:

  baseline  the results typed in as plain numbers (no formula at all)
  native    one native formula per row:
            ((0.79 LN(Re) - 1.64)^-2 / 8)(Re - 1000) Pr /
            (1 + 12.7 SQRT((0.79 LN(Re) - 1.64)^-2 / 8)(Pr^(2/3) - 1))
  addin     one TH.NUSSELT("Gnielinski"; Re; Pr) per row
  table     one array formula TH.NUSSELT.TABLE("Gnielinski"; Re column;
            Pr column) over all rows (when the catalogue has it)

Each file is loaded, recalculated and exported to CSV by its own headless
soffice run (whole-file conversion: start, load, compute, export, exit),
round-robin over the variants, `--runs` times. The report gives the median
wall time of each, the median minus the baseline (what the formulas cost),
the per-row cost and the ratio add-in / native, plus the CPU time of the
soffice processes (less sensitive to other load on a shared machine). Every
computed column is checked against the same formula evaluated here in Python
(relative 1e-12), so a fast wrong answer cannot pass.

It also times every workbook in workbooks/ (.fods and .ods; .ods recomputed
on load) the same way, minus an empty workbook's time (start-up and exit).

    calc_bench.py --oxt build-perf/addin/tubeheat.oxt --work build-perf/bench-calc
                  [--rows 200000] [--runs 3] [--workbooks workbooks]
                  [--catalogue-json build-perf/addin/generated/functions.json]

Writes <work>/results.json and <work>/results.md (Markdown tables) and
prints the Markdown. Standard library only (+ the repo's addin/tools).
"""
from __future__ import annotations

import argparse
import csv
import json
import math
import os
import pathlib
import resource
import statistics
import sys
import time

HERE = pathlib.Path(__file__).resolve().parent
ROOT = HERE.parents[1]
sys.path.insert(0, str(ROOT / "addin" / "tools"))

import fods  # noqa: E402
import lo_headless  # noqa: E402
from fods import F  # noqa: E402

from fods import PREFIX  # noqa: E402


# ------------------------------------------------------------------ inputs
def inputs(rows: int) -> tuple[list, list]:
    """Re in 1e4..5e6 (log-spaced, permuted), Pr in 0.7..100 (log-spaced,
    another permutation): inside the correlation's range, varied so no
    cache of repeated arguments can help either side."""
    re, pr = [], []
    for i in range(rows):
        a = (i * 7919) % rows / rows
        b = (i * 104729) % rows / rows
        re.append(float(f"{1e4 * (500.0 ** a):.6g}"))
        pr.append(float(f"{0.7 * ((100 / 0.7) ** b):.5g}"))
    return re, pr


def gnielinski(re: float, pr: float) -> float:
    """Gnielinski (1976) with the Petukhov (1970) smooth-tube f, as typed in
    the native formula (the reference for the check)."""
    f8 = (0.79 * math.log(re) - 1.64) ** -2 / 8
    return f8 * (re - 1000) * pr / (1 + 12.7 * math.sqrt(f8) * (pr ** (2 / 3) - 1))


def native_formula(r: int) -> str:
    a, b = f"[.A{r}]", f"[.B{r}]"
    f8 = f"(0.79*LN({a})-1.64)^-2/8"
    return f"of:=({f8})*({a}-1000)*{b}/(1+12.7*SQRT({f8})*({b}^(2/3)-1))"


def write_variants(work: pathlib.Path, rows: int, with_table: bool) -> tuple:
    re, pr = inputs(rows)
    header = ["Re", "Pr", "Nu"]
    variants = {
        "baseline": lambda r, i: float(f"{gnielinski(re[i], pr[i]):.15g}"),
        "native": lambda r, i: F(native_formula(r)),
        "addin": lambda r, i: F(f'of:={PREFIX}NUSSELT("Gnielinski";[.A{r}];[.B{r}])'),
    }
    if with_table:
        def table(r, i):
            if i:
                return None
            return F(f'of:={PREFIX}NUSSELTTABLE("Gnielinski";[.A2:.A{rows + 1}];'
                     f'[.B2:.B{rows + 1}])', matrix=(1, rows))
        variants["table"] = table
    paths = {}
    for name, third in variants.items():
        body = [header] + [[re[i], pr[i], third(i + 2, i)] for i in range(rows)]
        path = work / f"bench_{name}.fods"
        fods.write(path, {"Bench": body})
        paths[name] = path
    empty = work / "bench_empty.fods"
    fods.write(empty, {"Empty": [[None]]})
    paths["empty"] = empty
    return paths, re, pr


# ------------------------------------------------------------------ timing
def timed_convert(calc: lo_headless.CalcSession, path: pathlib.Path) -> tuple[float, float, pathlib.Path]:
    """One soffice run on one file: wall seconds, CPU seconds (user+sys of
    the finished child processes), and the CSV folder."""
    before = resource.getrusage(resource.RUSAGE_CHILDREN)
    t0 = time.monotonic()
    out = calc.convert([path], lo_headless.CSV_ALL_SHEETS)
    wall = time.monotonic() - t0
    after = resource.getrusage(resource.RUSAGE_CHILDREN)
    cpu = (after.ru_utime - before.ru_utime) + (after.ru_stime - before.ru_stime)
    return wall, cpu, out


def check_column(csv_path: pathlib.Path, re: list, pr: list) -> tuple[int, float]:
    """Rows whose Nu differs from the Python reference by more than 1e-12
    relative (CSV carries 15 significant digits), and the largest deviation."""
    bad, worst = 0, 0.0
    with open(csv_path, newline="", encoding="utf-8") as fh:
        rd = csv.reader(fh)
        next(rd)
        n = 0
        for i, row in enumerate(rd):
            if i >= len(re):
                break
            n += 1
            want = gnielinski(re[i], pr[i])
            try:
                got = float(row[2])
                dev = abs(got - want) / abs(want)
            except (ValueError, IndexError):
                dev = math.inf
            worst = max(worst, dev)
            if not dev <= 1e-12:
                bad += 1
    bad += len(re) - n
    return bad, worst


def lscpu_summary() -> str:
    keys = ("Model name", "CPU(s)", "Thread(s) per core", "L2 cache", "L3 cache")
    out = []
    try:
        import subprocess
        text = subprocess.run(["lscpu"], capture_output=True, text=True).stdout
        for line in text.splitlines():
            k, _, v = line.partition(":")
            if k.strip() in keys:
                out.append(f"{k.strip()}: {v.strip()}")
    except OSError:
        pass
    return "; ".join(out)


def lo_version() -> str:
    import subprocess
    try:
        return subprocess.run([lo_headless.SOFFICE, "--version"], capture_output=True,
                              text=True, timeout=60).stdout.strip()
    except (OSError, subprocess.SubprocessError):
        return "unknown"


def main() -> int:
    ap = argparse.ArgumentParser(description=__doc__.splitlines()[0])
    ap.add_argument("--oxt", required=True)
    ap.add_argument("--work", required=True)
    ap.add_argument("--rows", type=int, default=200_000)
    ap.add_argument("--runs", type=int, default=3)
    ap.add_argument("--workbooks", default=str(ROOT / "workbooks"))
    ap.add_argument("--catalogue-json", default=None,
                    help="functions.json; TH.NUSSELT.TABLE is timed when it lists it")
    ns = ap.parse_args()
    work = pathlib.Path(ns.work)
    work.mkdir(parents=True, exist_ok=True)
    with_table = False
    if ns.catalogue_json:
        cat = json.loads(pathlib.Path(ns.catalogue_json).read_text())
        with_table = any(f["id"] == "nusseltTable" for f in cat["functions"])

    t0 = time.monotonic()
    paths, re, pr = write_variants(work, ns.rows, with_table)
    print(f"wrote {len(paths)} workbooks of {ns.rows} rows in {time.monotonic() - t0:.1f} s",
          flush=True)
    books = sorted(p for p in pathlib.Path(ns.workbooks).iterdir()
                   if p.suffix in (".fods", ".ods")) if pathlib.Path(ns.workbooks).is_dir() else []

    names = list(paths)
    wall = {n: [] for n in names}
    cpu = {n: [] for n in names}
    book_wall = {b.name: [] for b in books}
    book_errors = {}
    failures = []
    loads = []
    with lo_headless.CalcSession(ns.oxt, timeout=1800) as calc:
        calc.set_recalc_on_load_always()  # .ods templates: recompute on load
        staged = {n: calc.stage([p])[0] for n, p in paths.items()}
        staged_books = {b.name: calc.stage([b])[0] for b in books}
        # Warm-up: the first start of a fresh profile initialises it (slow);
        # it is not part of any measurement.
        timed_convert(calc, staged["empty"])
        for f in (calc.root / "out").iterdir():
            f.unlink()
        for run in range(ns.runs):
            loads.append(os.getloadavg()[0])
            for n in names:
                w, c, out = timed_convert(calc, staged[n])
                wall[n].append(w)
                cpu[n].append(c)
                print(f"run {run + 1}/{ns.runs} {n:9s} wall {w:7.2f} s  cpu {c:7.2f} s",
                      flush=True)
                csv_path = out / f"bench_{n}-Bench.csv"
                if n != "empty":
                    if not csv_path.exists():
                        failures.append(f"{n}: soffice wrote no CSV")
                    elif run == 0:
                        bad, worst = check_column(csv_path, re, pr)
                        if bad:
                            failures.append(f"{n}: {bad} rows differ from the Python "
                                            f"reference (worst {worst:.3g})")
                        print(f"  checked {n}: {ns.rows - bad} of {ns.rows} rows agree "
                              f"with Python to 1e-12 (worst {worst:.2g})", flush=True)
                for f in out.iterdir():
                    f.unlink()
            for b, p in staged_books.items():
                w, c, out = timed_convert(calc, p)
                book_wall[b].append(w)
                errs = 0
                produced = list(out.iterdir())
                if not produced:
                    failures.append(f"{b}: soffice wrote no CSV")
                for f in produced:
                    with open(f, newline="", encoding="utf-8") as fh:
                        errs += sum(1 for r in csv.reader(fh) for v in r
                                    if v.startswith(("Err:", "#NAME", "#VALUE", "#NUM", "#REF",
                                                     "#DIV", "#N/A")))
                    f.unlink()
                book_errors[b] = errs
                print(f"run {run + 1}/{ns.runs} {b:24s} wall {w:7.2f} s  ({errs} error cells)",
                      flush=True)

    med = {n: statistics.median(v) for n, v in wall.items()}
    med_cpu = {n: statistics.median(v) for n, v in cpu.items()}
    base, base_cpu = med["baseline"], med_cpu["baseline"]
    res = {"rows": ns.rows, "runs": ns.runs, "machine": lscpu_summary(),
           "libreoffice": lo_version(), "load_average_at_runs": loads,
           "wall": wall, "cpu": cpu, "median_wall": med, "median_cpu": med_cpu,
           "workbooks": {b: {"wall": v, "median": statistics.median(v),
                             "minus_empty": statistics.median(v) - med["empty"],
                             "error_cells": book_errors.get(b)}
                         for b, v in book_wall.items()},
           "failures": failures}
    lines = [f"Rows: {ns.rows}; runs: {ns.runs}; load average (1 min) at the start of each "
             f"run: {', '.join(f'{x:.1f}' for x in loads)}", "",
             "| variant | median wall [s] | minus baseline [s] | per row [us] | "
             "median CPU [s] | CPU minus baseline [s] | runs (wall) |",
             "|---|---|---|---|---|---|---|"]
    for n in names:
        extra = med[n] - base
        per_row = extra / ns.rows * 1e6 if n not in ("baseline", "empty") else float("nan")
        lines.append(f"| {n} | {med[n]:.2f} | {extra:+.2f} | "
                     f"{'-' if math.isnan(per_row) else f'{per_row:.2f}'} | {med_cpu[n]:.2f} | "
                     f"{med_cpu[n] - base_cpu:+.2f} | "
                     f"{', '.join(f'{x:.2f}' for x in wall[n])} |")
    lines.append("")
    nat = med["native"] - base
    nat_cpu = med_cpu["native"] - base_cpu
    for n in ("addin", "table"):
        if n in med:
            r = (med[n] - base) / nat if nat > 0 else float("nan")
            rc = (med_cpu[n] - base_cpu) / nat_cpu if nat_cpu > 0 else float("nan")
            res[f"ratio_{n}_to_native"] = r
            res[f"ratio_{n}_to_native_cpu"] = rc
            lines.append(f"- {n} / native (formula cost, baseline subtracted): wall "
                         f"{r:.2f}x, CPU {rc:.2f}x; whole-file wall "
                         f"{med[n] / med['native']:.2f}x")
    if book_wall:
        lines += ["", "| workbook | median wall [s] | minus empty workbook [s] | error cells | runs |",
                  "|---|---|---|---|---|"]
        for b, v in book_wall.items():
            m = statistics.median(v)
            lines.append(f"| {b} | {m:.2f} | {m - med['empty']:+.2f} | {book_errors.get(b)} | "
                         f"{', '.join(f'{x:.2f}' for x in v)} |")
    if failures:
        lines += ["", "FAILURES:"] + [f"- {f}" for f in failures]
    md = "\n".join(lines) + "\n"
    (work / "results.json").write_text(json.dumps(res, indent=1) + "\n")
    (work / "results.md").write_text(md)
    print()
    print(f"LibreOffice: {res['libreoffice']}; machine: {res['machine']}")
    print(md)
    return 1 if failures else 0


if __name__ == "__main__":
    sys.exit(main())
