#!/usr/bin/python3
"""Robustness of the Calc extension in a real, headless LibreOffice.

1. Hostile input (hostile.py, generated from functions.json): every catalogue
   function, one argument at a time, given text, numeric text, an empty cell,
   "" , #DIV/0!, #N/A, TRUE, 0, -1, 1e308, 1e-308 and a whole-column range,
   plus too few and too many arguments; the exact cell, TH.STATUS and TH.WHY
   of each are asserted by the rules written in hostile.py.
2. Save and reload: a workbook with a valid call of every function (and a
   table function as an array formula) is saved as .ods by LibreOffice,
   reloaded with recalculation, and must show identical cells; the saved file
   stores every call by its programmatic name.
3. Remove and reinstall: after `unopkg remove` the same workbook shows #NAME?
   in every add-in cell (and nothing else changes); after reinstalling it
   shows the original values again.
4. LibreOffice never crashes: every soffice / unopkg run must exit 0 within
   its timeout and write every expected output file, complete.

    run_calc_robust.py --oxt build/addin/tubeheat.oxt
                       --catalogue-json build/addin/generated/functions.json --work DIR

Prints the coverage (functions x input kinds), any suspicious values the
library returned without a warning, and the time of each stage. Exit status 0
only when every check passed.
"""
from __future__ import annotations

import argparse
import collections
import json
import pathlib
import re
import sys
import time
import zipfile

HERE = pathlib.Path(__file__).resolve().parent
ROOT = HERE.parents[1]
sys.path.insert(0, str(HERE))
sys.path.insert(0, str(ROOT / "addin" / "tools"))
sys.path.insert(0, str(ROOT / "tests" / "calc"))

import fods  # noqa: E402
import hostile as H  # noqa: E402
import lo_headless  # noqa: E402
from check_report import Report, as_number, read_csv  # noqa: E402
from fods import F  # noqa: E402

from fods import PREFIX  # noqa: E402
FIRST_INPUT = 5                  # column F
WHOLE_NUMBERS, WHOLE_TEXTS = 60, 61   # columns BI, BJ: whole-column sources
ERR_RANGE = 62                        # columns BK:BL: a number and an error
HEADER = ["case", "kind", "result", "TH.STATUS", "TH.WHY", "inputs..."]


def load_value_cases() -> list:
    """The plain-valued cases of tests/calc/cases.py, as a second source of
    valid base calls (it needs python3-fluids/iapws; optional)."""
    try:
        import cases  # noqa: WPS433
        return list(cases.VALUE_CASES)
    except Exception as e:  # noqa: BLE001 - any import problem: do without
        print(f"note: tests/calc/cases.py not used ({e})")
        return []


# ------------------------------------------------------------ workbooks
def whole_ref(col: int) -> str:
    c = fods.col_name(col)
    return f"[.${c}$1:.${c}$1048576]"


def sheet_row(row: H.Row, r: int, companions: bool) -> list:
    """Cells of one row (r from 0): label, kind, result, STATUS, WHY, inputs;
    the whole-column source values go into their columns of this row."""
    cells = [row.label, row.kind, None, None, None]
    tokens = []
    inputs = list(row.inputs)
    while inputs and inputs[-1] is H.OMIT:
        inputs.pop()
    extra = {}
    for i, v in enumerate(inputs):
        col = FIRST_INPUT + i
        if v is H.OMIT:
            tokens.append("")
            cells.append(None)
        elif isinstance(v, H.ErrRange):
            a, b = fods.col_name(ERR_RANGE), fods.col_name(ERR_RANGE + 1)
            tokens.append(f"[.{a}{r + 1}:.{b}{r + 1}]")
            extra[ERR_RANGE] = v.value
            extra[ERR_RANGE + 1] = F("of:=1/0")
            cells.append(None)
        elif isinstance(v, H.Whole):
            src = WHOLE_TEXTS if isinstance(v.value, str) else WHOLE_NUMBERS
            tokens.append(whole_ref(src))
            extra[src] = v.value
            cells.append(None)
        else:
            tokens.append(fods.ref(col, r))
            if isinstance(v, H.Formula):
                cells.append(F(v.text))
            elif isinstance(v, H.Empty):
                cells.append(None)
            else:
                cells.append(v)
    joined = ";".join(tokens)
    fn = row.fn
    cells[2] = F(f"of:={PREFIX}{fn['id'].upper()}({joined})")
    if companions:
        tail = (";" + joined) if tokens else ""
        cells[3] = F(f'of:={PREFIX}STATUS("{fn["name"]}"{tail})')
        cells[4] = F(f'of:={PREFIX}WHY("{fn["name"]}"{tail})')
    if extra:
        cells += [None] * (max(extra) + 1 - len(cells))
        for c, v in extra.items():
            cells[c] = v
    return cells


def build_hostile(catalogue: dict, value_cases: list) -> tuple[list, list, dict]:
    rows, sources, signatures, costly = [], {}, set(), set()
    for fn in catalogue["functions"]:
        sig = tuple((a["name"], a["type"], a["check"], a["optional"], bool(a.get("column")))
                    for a in fn["args"])
        fr, src = H.rows_for_function(fn, catalogue, value_cases, reduced=sig in signatures,
                                      costly_done=costly)
        signatures.add(sig)
        rows += fr
        sources[fn["name"]] = src
    # TH.STATUS / TH.WHY of whole-column rows: one representative per class.
    seen = set()
    for row in rows:
        if row.kind == "whole_column":
            cls = next(H.arg_class(a) for a, v in zip(row.fn["args"], row.inputs)
                       if isinstance(v, H.Whole))
            if cls not in seen and cls != "CN":
                seen.add(cls)
                row.companions = True
    sheet = [HEADER] + [sheet_row(row, r + 1, row.companions) for r, row in enumerate(rows)]
    return rows, sheet, sources


def companion_rows() -> list:
    """TH.WHY / TH.STATUS themselves given a name that is no function."""
    return [
        ["STATUS unknown function", "companion", F(f'of:={PREFIX}STATUS("TH.NO.SUCH";1)'),
         "Err:502"],
        ["WHY unknown function", "companion", F(f'of:={PREFIX}WHY("TH.NO.SUCH";1)'),
         'ERROR: no function named "TH.NO.SUCH"'],
        ["WHY number as function name", "companion", F(f"of:={PREFIX}WHY(42)"),
         'ERROR: no function named "42"'],
        ["WHY without arguments", "companion", F(f"of:={PREFIX}WHY()"), "Err:504"],
    ]


def build_round(catalogue: dict, value_cases: list) -> list:
    """A valid call (with TH.STATUS and TH.WHY) of every function, and the
    table functions as array formulas over a few rows."""
    sheet = [HEADER]
    for fn in catalogue["functions"]:
        base, _ = H.base_values(fn, catalogue, value_cases)
        row = H.Row(fn["name"], fn, "base", base, H.Expect())
        sheet.append(sheet_row(row, len(sheet), True))
    for fn in catalogue["functions"]:
        if not fn.get("rows_of"):
            continue
        base, _ = H.base_values(fn, catalogue, value_cases)
        first = len(sheet)
        cols = [i for i, a in enumerate(fn["args"]) if a.get("column")]
        for k in range(5):
            line = [f"{fn['name']} table row {k + 1}", "table", None, None, None]
            for i, v in enumerate(base):
                line.append(v * (1 + 0.25 * k) if i in cols and isinstance(v, float) else None)
            sheet.append(line)
        tokens = []
        for i, v in enumerate(base):
            col = fods.col_name(FIRST_INPUT + i)
            if i in cols:
                tokens.append(f"[.{col}{first + 1}:.{col}{first + 5}]")
            elif v is None:
                tokens.append("")
            else:
                tokens.append(f'"{v}"' if isinstance(v, str) else repr(v))
        sheet[first][2] = F(f"of:={PREFIX}{fn['id'].upper()}({';'.join(tokens)})",
                            matrix=(1, 5))
    return sheet


# ------------------------------------------------------------ checks
def is_error(text: str) -> bool:
    return text.startswith(("Err:", "#"))


def check_consistent(rep: Report, where: str, fn: dict, cell: str, status: str, why: str,
                     findings: list):
    try:
        st = int(status)
    except ValueError:
        rep.check(False, f"{where}: TH.STATUS {status!r} is not a status code")
        return
    if st in (0, 1):
        rep.check(not is_error(cell), f"{where}: status {st} but the cell shows {cell!r}")
        if fn["result_type"] == "number" or fn.get("rows_of"):
            v = as_number(cell)
            rep.check(v is not None, f"{where}: status {st} but the cell {cell!r} is no number")
            if v is not None and st == 0 and v != 0 and not 1e-100 < abs(v) < 1e100:
                findings.append((f"{where}: {cell} with status 0 (no range warning)", v))
        rep.check(why.startswith("OK" if st == 0 else "WARNING"),
                  f"{where}: status {st} but TH.WHY {why!r}")
    else:
        want = H.CELL_FOR_STATUS.get(st)
        rep.check(cell == want, f"{where}: status {st}: cell {cell!r}, expected {want!r}")
        rep.check(why.startswith(f"ERROR {want}"), f"{where}: status {st}: TH.WHY {why!r}")


def check_hostile(rep: Report, rows: list, csv_rows: list) -> tuple[list, dict]:
    rep.check(len(csv_rows) >= len(rows) + 1,
              f"hostile CSV has {len(csv_rows)} lines for {len(rows)} rows (incomplete output)")
    by_label = {}
    findings = []
    coverage = collections.defaultdict(collections.Counter)
    for k, row in enumerate(rows):
        line = csv_rows[k + 1] if k + 1 < len(csv_rows) else []
        line += [""] * (5 - len(line))
        label, cell, status, why = line[0], line[2], line[3], line[4]
        where = f"row {k + 2} {row.label!r}"
        rep.check(label == row.label, f"{where}: CSV row is {label!r} (rows out of order?)")
        by_label[row.label] = cell
        e = row.expect
        coverage[row.fn["name"]][row.kind] += 1
        if e.cell is not None:
            rep.check(cell == e.cell, f"{where}: cell {cell!r}, expected {e.cell!r} {e.note}")
        if e.same_as is not None:
            rep.check(cell == by_label.get(e.same_as),
                      f"{where}: cell {cell!r}, expected the same as {e.same_as!r} "
                      f"({by_label.get(e.same_as)!r}) {e.note}")
        if row.companions:
            if e.status is not None:
                rep.check(status == e.status,
                          f"{where}: TH.STATUS {status!r}, expected {e.status!r} {e.note}")
            if e.why is not None:
                rep.check(why.startswith(e.why),
                          f"{where}: TH.WHY {why!r}, expected to start {e.why!r} {e.note}")
            if e.decides:
                check_consistent(rep, where, row.fn, cell, status, why, findings)
            if row.kind == "base":
                rep.check(status in ("0", "1"),
                          f"{where}: the base call does not compute (status {status!r}, "
                          f"{why!r}); give {row.fn['name']} a catalogue example")
    return findings, coverage


def check_companions(rep: Report, sheet: list, csv_rows: list):
    for want, got in zip(sheet[1:], csv_rows[1:]):
        rep.check(got[2].startswith(want[3]), f"{want[0]}: {got[2]!r}, expected {want[3]!r}")


def saved_calls(ods: pathlib.Path) -> tuple[list, str]:
    with zipfile.ZipFile(ods) as z:
        content = z.read("content.xml").decode("utf-8")
    return re.findall(r'table:formula="of:=([A-Z.]+)\(', content), content


def addin_cells(sheet: list) -> set:
    """(row, column) of every formula cell that calls the add-in."""
    out = set()
    for r, line in enumerate(sheet):
        for c, v in enumerate(line):
            if isinstance(v, F) and PREFIX in v:
                out.add((r, c))
                if v.matrix:
                    for k in range(v.matrix[1]):
                        out.add((r + k, c))
    return out


def compare_sheets(rep: Report, what: str, a: list, b: list):
    rep.check(len(a) == len(b), f"{what}: {len(a)} rows against {len(b)}")
    diffs = [(r, c, x, y) for r, (la, lb) in enumerate(zip(a, b))
             for c, (x, y) in enumerate(zip(la, lb)) if x != y]
    diffs += [(r, -1, la, lb) for r, (la, lb) in enumerate(zip(a, b)) if len(la) != len(lb)]
    rep.check(not diffs, f"{what}: {len(diffs)} cells differ, first {diffs[:3]}")


# ------------------------------------------------------------ main
def oxt_identifier(oxt: pathlib.Path) -> str:
    with zipfile.ZipFile(oxt) as z:
        text = z.read("description.xml").decode("utf-8")
    return re.search(r'<identifier value="([^"]+)"', text).group(1)


def expect_outputs(rep: Report, out: pathlib.Path, names: list, what: str) -> bool:
    missing = [n for n in names if not (out / n).exists() or (out / n).stat().st_size == 0]
    rep.check(not missing, f"{what}: soffice exited 0 but wrote no (or an empty) {missing}")
    return not missing


def main() -> int:
    ap = argparse.ArgumentParser(description=__doc__.splitlines()[0])
    ap.add_argument("--oxt", required=True)
    ap.add_argument("--catalogue-json", required=True)
    ap.add_argument("--work", required=True)
    ap.add_argument("--keep", action="store_true", help="keep the LibreOffice profile")
    ns = ap.parse_args()
    t_start = time.monotonic()
    work = pathlib.Path(ns.work)
    work.mkdir(parents=True, exist_ok=True)
    for f in work.glob("*"):
        if f.is_file():
            f.unlink()
    catalogue = json.loads(pathlib.Path(ns.catalogue_json).read_text())
    value_cases = load_value_cases()
    rep = Report()
    timings = {}

    rows, hostile_sheet, sources = build_hostile(catalogue, value_cases)
    comp_sheet = [["case", "kind", "result", "expected"]] + companion_rows()
    hostile_path = work / "robust_hostile.fods"
    fods.write(hostile_path, {"Hostile": hostile_sheet, "Companions": comp_sheet})
    round_sheet = build_round(catalogue, value_cases)
    round_path = work / "robust_round.fods"
    fods.write(round_path, {"Round": round_sheet})
    timings["write the workbooks"] = time.monotonic() - t_start

    identifier = oxt_identifier(pathlib.Path(ns.oxt))
    oxt_name = pathlib.Path(ns.oxt).name
    with lo_headless.CalcSession(ns.oxt, keep=ns.keep, timeout=240) as calc:
        timings["install the .oxt (unopkg add)"] = calc.timings.get("install", 0.0)
        calc.set_recalc_on_load_always()
        staged_hostile, staged_round = calc.stage([hostile_path, round_path])

        # -- 1. hostile input, and the round-trip workbook's first values
        t0 = time.monotonic()
        out = calc.convert([staged_hostile, staged_round], lo_headless.CSV_ALL_SHEETS,
                           work / "csv1")
        timings["recalculate hostile + round workbooks"] = time.monotonic() - t0
        names = ["robust_hostile-Hostile.csv", "robust_hostile-Companions.csv",
                 "robust_round-Round.csv"]
        findings, coverage = [], {}
        if expect_outputs(rep, out, names, "hostile run"):
            findings, coverage = check_hostile(rep, rows, read_csv(out / names[0]))
            check_companions(rep, comp_sheet, read_csv(out / names[1]))
        first_round = read_csv(out / names[2]) if (out / names[2]).exists() else []
        for line in first_round[1:]:
            if line[1] == "base":
                rep.check(line[3] in ("0", "1"),
                          f"round workbook: {line[0]} does not compute ({line[2]!r}, {line[4]!r})")

        # -- 2. save as .ods by LibreOffice, reload with recalculation
        t0 = time.monotonic()
        for f in (calc.root / "out").iterdir():
            f.unlink()
        saved_dir = calc.convert([staged_round], "ods", work / "saved")
        saved = saved_dir / "robust_round.ods"
        if expect_outputs(rep, saved_dir, ["robust_round.ods"], "save as .ods"):
            calls, content = saved_calls(saved)
            n_calls = sum(1 for c in calls if c.startswith(PREFIX))
            rep.check(n_calls >= len(catalogue["functions"]),
                      f"saved .ods stores {n_calls} add-in calls by programmatic name "
                      f"for {len(catalogue['functions'])} functions: {calls[:5]}")
            rep.check("#NAME" not in content, "saved .ods contains #NAME?")
            for f in (calc.root / "out").iterdir():
                f.unlink()
            reloaded = calc.stage([saved])[0]
            out = calc.convert([reloaded], lo_headless.CSV_ALL_SHEETS, work / "csv2")
            if expect_outputs(rep, out, ["robust_round-Round.csv"], "reload of the .ods"):
                compare_sheets(rep, "saved, reloaded and recalculated against the original",
                               first_round, read_csv(out / "robust_round-Round.csv"))
        timings["save as .ods, reload, recalculate"] = time.monotonic() - t0

        # -- 3. remove the extension, recalculate; reinstall, recalculate
        t0 = time.monotonic()
        calc._run([lo_headless.UNOPKG, "remove", calc._env_arg(), identifier])
        listing = calc._run([lo_headless.UNOPKG, "list", calc._env_arg()]).stdout
        rep.check(identifier not in listing, f"unopkg list still shows {identifier} after removal")
        for f in (calc.root / "out").iterdir():
            f.unlink()
        out = calc.convert([staged_round], lo_headless.CSV_ALL_SHEETS, work / "csv3")
        if expect_outputs(rep, out, ["robust_round-Round.csv"], "after removal"):
            removed = read_csv(out / "robust_round-Round.csv")
            addin = addin_cells(round_sheet)
            shown = collections.Counter()
            for r, line in enumerate(removed):
                for c, v in enumerate(line):
                    if (r, c) in addin:
                        shown[v] += 1
                        rep.check(v == "#NAME?", f"after removal: row {r + 1} column {c + 1} "
                                                 f"shows {v!r}, expected #NAME?")
                    elif r < len(first_round) and c < len(first_round[r]):
                        rep.check(v == first_round[r][c],
                                  f"after removal: a cell without the add-in changed: "
                                  f"row {r + 1} column {c + 1} {v!r}")
            print(f"after removal the {sum(shown.values())} add-in cells show: {dict(shown)}")
        timings["remove (unopkg remove), recalculate"] = time.monotonic() - t0
        t0 = time.monotonic()
        again = calc.root / "in" / oxt_name
        calc._run([lo_headless.UNOPKG, "add", "-f", "-s", calc._env_arg(), str(again)])
        for f in (calc.root / "out").iterdir():
            f.unlink()
        out = calc.convert([staged_round], lo_headless.CSV_ALL_SHEETS, work / "csv4")
        if expect_outputs(rep, out, ["robust_round-Round.csv"], "after reinstalling"):
            compare_sheets(rep, "reinstalled against the first installation",
                           first_round, read_csv(out / "robust_round-Round.csv"))
        timings["reinstall (unopkg add), recalculate"] = time.monotonic() - t0
    timings["total"] = time.monotonic() - t_start

    kinds = H.KINDS + ["too_few", "too_many"]
    print(f"coverage: {len(coverage)} functions, {len(rows)} hostile rows, "
          f"{sum(3 if r.companions else 1 for r in rows)} formula cells; functions per "
          "input kind (a kind needs an argument it applies to):")
    print("  " + ", ".join(f"{k} {sum(1 for f in coverage if coverage[f][k])}" for k in kinds))
    synth = [f for f, s in sources.items() if s != "catalogue example"]
    if synth:
        print(f"  base calls not from a catalogue example: {len(synth)} ({', '.join(synth[:6])}...)")
    if findings:
        (work / "findings.txt").write_text("\n".join(w for w, _ in findings) + "\n")
        odd = [w for w, v in findings if abs(v) >= 1e100 or abs(v) < 2.2250738585072014e-308]
        print(f"findings (no failure): {len(findings)} results beyond 1e+-100 with status 0 "
              f"(no range warning), listed in {work / 'findings.txt'}; beyond 1e100 or "
              f"subnormal ({len(odd)}):")
        for w in odd[:30]:
            print("  ", w)
    return rep.finish("Calc robustness stage", timings)


if __name__ == "__main__":
    sys.exit(main())
