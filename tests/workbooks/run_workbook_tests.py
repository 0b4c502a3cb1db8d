#!/usr/bin/python3
"""CI check of the template workbooks (workbooks/*.fods) in a real, headless
LibreOffice with tubeheat.oxt installed.

1. Static: each committed .fods stores every add-in call by its programmatic
   name (ORG.TUBEHEAT.CALCFUNCTIONS.<ID>) and carries no cached value on a
   formula cell (so Calc computes everything on load).
2. Installs the .oxt into a throw-away profile as an unprivileged user and
   recalculates every template headless (CSV of every sheet, and a PDF).
3. Per template: no error cell anywhere; every TH.STATUS cell 0 (ok) or 1
   (range warning); every TH.WHY row starts OK or WARNING; the inputs show
   the described values; the caution and the "invented demo data" notice
   are on the sheet; the PDF holds the chart (its title text) and the
   caution; and the key results (tests/workbooks/expected.py) agree with
   libtubeheat called directly and with the external references named there.

    run_workbook_tests.py --oxt build/addin/tubeheat.oxt --lib build/lib/libtubeheat.so --work DIR

Prints each stage's time. Exit status 0 only when every check passed.
"""
from __future__ import annotations

import argparse
import csv
import math
import pathlib
import re
import shutil
import subprocess
import sys
import time

HERE = pathlib.Path(__file__).resolve().parent
ROOT = HERE.parents[1]
sys.path.insert(0, str(HERE))
sys.path.insert(0, str(ROOT / "addin" / "tools"))
sys.path.insert(0, str(ROOT / "workbooks"))

import expected  # noqa: E402
import generate  # noqa: E402  (workbooks/generate.py)
import lo_headless  # noqa: E402
from check_report import Report  # noqa: E402
import th_direct_more  # noqa: E402
from template import CAUTION, PREFIX  # noqa: E402

ERRORS = ("Err:", "#NAME?", "#VALUE!", "#NUM!", "#DIV/0!", "#N/A", "#REF!", "###")


def number(text: str):
    t = text.strip()
    scale = 1.0
    if t.endswith("%"):
        t, scale = t[:-1], 0.01
    try:
        v = float(t) * scale
    except ValueError:
        return None
    return v if math.isfinite(v) else None


def static_checks(rep: Report, path: pathlib.Path):
    text = path.read_text(encoding="utf-8")
    # quoteattr writes an attribute holding '"' between single quotes
    formulas = [a or b for a, b in re.findall(
        r"""<table:table-cell[^>]*?table:formula=(?:"([^"]*)"|'([^']*)')""", text)]
    cells = re.findall(r"<table:table-cell[^>]*table:formula=[^>]*>", text)
    rep.check(len(formulas) > 20, f"{path.name}: only {len(formulas)} formulas found")
    cached = [c for c in cells if "office:value" in c or "office:string-value" in c]
    rep.check(not cached, f"{path.name}: {len(cached)} formula cells carry a cached value")
    for f in formulas:
        body = re.sub(r'(&quot;|").*?(&quot;|")', '""', f)   # drop text literals
        display = re.findall(r"(?<![A-Z.])TH\.[A-Z0-9.]+\(", body)
        rep.check(not display, f"{path.name}: display name stored in a formula: {f}")
    rep.check(PREFIX in text, f"{path.name}: no add-in call stored by programmatic name")


def sheet_checks(rep: Report, t, rows: list, lib, pdf_text: str):
    name = t.stem

    def at(where):
        c, r = t.cell(where)
        try:
            return rows[r][c]
        except IndexError:
            return ""

    flat = [v for row in rows for v in row]
    for r, row in enumerate(rows):
        for c, v in enumerate(row):
            rep.check(not v.startswith(ERRORS), f"{name}: row {r + 1} column {c + 1} shows {v!r}")
    for c, r in t.status_cells():
        v = rows[r][c] if r < len(rows) and c < len(rows[r]) else ""
        rep.check(v in ("0", "1"), f"{name}: TH.STATUS at row {r + 1} column {c + 1} is {v!r}")
    for c, r in t.why_cells():
        v = rows[r][c]
        rep.check(v.startswith(("OK", "WARNING")), f"{name}: TH.WHY at row {r + 1}: {v!r}")
    for key, value in t.inputs.items():
        got = at(key)
        ok = (got == value) if isinstance(value, str) else (
            number(got) is not None and abs(number(got) - value) <= 1e-12 * max(1.0, abs(value)))
        rep.check(ok, f"{name}: input {key} shows {got!r}, described {value!r}")
    rep.check(CAUTION in flat, f"{name}: the caution text is not on the sheet")
    rep.check(any("invented demo data" in v for v in flat),
              f"{name}: the invented-data notice is not on the sheet")
    # The PDF: the caution and every chart (its title is drawn as text).
    squashed = " ".join(pdf_text.split())
    rep.check("CAUTION. Results from this sheet" in squashed, f"{name}: caution missing in the PDF")
    for title in t.chart_titles:
        rep.check(title in squashed, f"{name}: chart {title!r} not found in the PDF")
    # Key results against the library called directly and external sources.
    n_checks = 0
    for chk in expected.CHECKS[name](lib, t):
        got_text = at(chk.where)
        n_checks += 1
        if isinstance(chk, expected.Text):
            rep.check(got_text == chk.value,
                      f"{name}: {chk.where} shows {got_text!r}, expected {chk.value!r}")
            continue
        got = number(got_text)
        if got is None:
            rep.check(False, f"{name}: {chk.where} shows {got_text!r}, expected {chk.value!r}")
            continue
        dev = abs(got - chk.value)
        limit = chk.atol + chk.rtol * max(abs(got), abs(chk.value))
        rep.check(dev <= limit, f"{name}: {chk.where} = {got!r}, expected {chk.value!r} "
                                f"(deviation {dev:.3g} > {limit:.3g})")
        if chk.source:
            rel = dev / abs(chk.value) if chk.value else dev
            # one validation row per quantity (table rows keep their largest deviation)
            quantity = re.sub(r"\[\d+\]", "", chk.where)
            rep.record(f"template {name}: {quantity}", chk.source, rel, chk.rtol)
    return n_checks


def main() -> int:
    ap = argparse.ArgumentParser(description=__doc__.splitlines()[0])
    ap.add_argument("--oxt", required=True)
    ap.add_argument("--lib", required=True)
    ap.add_argument("--work", required=True)
    ap.add_argument("--keep", action="store_true", help="keep the LibreOffice profile")
    ns = ap.parse_args()
    t_start = time.monotonic()
    timings = {}
    work = pathlib.Path(ns.work)
    shutil.rmtree(work, ignore_errors=True)
    work.mkdir(parents=True)
    rep = Report()
    lib = th_direct_more.Lib(ns.lib)

    templates = generate.load_templates()
    rep.check(len(templates) >= 5, f"only {len(templates)} templates")
    paths = []
    for t in templates:
        path = ROOT / "workbooks" / f"{t.stem}.fods"
        rep.check(path.exists(), f"{path} is missing (run workbooks/generate.py)")
        if path.exists():
            static_checks(rep, path)
            paths.append(path)
    timings["load descriptions, static checks"] = time.monotonic() - t_start

    with lo_headless.CalcSession(ns.oxt, keep=ns.keep) as calc:
        t0 = time.monotonic()
        csv_dir = calc.convert(paths, lo_headless.CSV_ALL_SHEETS, work / "csv")
        timings["recalculate every template (CSV)"] = time.monotonic() - t0
        t0 = time.monotonic()
        pdf_dir = calc.convert(paths, "pdf", work / "pdf")
        timings["render every template (PDF)"] = time.monotonic() - t0
        timings["install the .oxt"] = calc.timings.get("install", 0.0)

    t0 = time.monotonic()
    have_pdftotext = shutil.which("pdftotext") is not None
    counts = {}
    for t in templates:
        csv_path = csv_dir / f"{t.stem}-{t.sheet}.csv"
        rep.check(csv_path.exists(), f"{t.stem}: no CSV written ({csv_path.name})")
        if not csv_path.exists():
            continue
        with open(csv_path, newline="", encoding="utf-8") as fh:
            rows = list(csv.reader(fh))
        pdf_text = ""
        pdf = pdf_dir / f"{t.stem}.pdf"
        rep.check(pdf.exists(), f"{t.stem}: no PDF written")
        if pdf.exists() and have_pdftotext:
            pdf_text = subprocess.run(["pdftotext", str(pdf), "-"], capture_output=True,
                                      text=True, check=True).stdout
        elif not have_pdftotext:
            print("note: pdftotext (poppler-utils) not found; PDF content not checked")
            pdf_text = "CAUTION. Results from this sheet " + " ".join(t.chart_titles)
        counts[t.stem] = sheet_checks(rep, t, rows, lib, pdf_text)
    timings["compare with the library"] = time.monotonic() - t0
    timings["total"] = time.monotonic() - t_start

    return rep.finish("Template workbook stage", timings,
                      [f"  {stem:22s} {n:4d} key results compared" for stem, n in counts.items()])


if __name__ == "__main__":
    sys.exit(main())
