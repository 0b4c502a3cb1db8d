#!/usr/bin/python3
"""End-to-end test of the Calc extension in a real, headless LibreOffice.

1. Writes the test workbooks (flat ODF, formulas stored by programmatic name,
   no cached values) from cases.py.
2. Installs tubeheat.oxt into a throw-away profile as an unprivileged user.
3. Recalculates the workbooks headless and exports every sheet to CSV.
4. Compares every add-in cell with libtubeheat called directly (ctypes) and
   with the external references named in cases.py; asserts the exact error,
   TH.STATUS and TH.WHY of every bad-input cell.
5. Saves a workbook as .ods through LibreOffice, changes an input inside the
   saved file, reloads it with recalculation and checks the new result
   (the round trip a user does: save, reopen, recompute).

    run_calc_tests.py --oxt build/addin/tubeheat.oxt --lib build/lib/libtubeheat.so
                      --catalogue-json build/addin/generated/functions.json --work DIR

Prints the time each stage took. Exit status 0 only when every check passed.
"""
from __future__ import annotations

import argparse
import json
import math
import pathlib
import re
import sys
import time
import zipfile

HERE = pathlib.Path(__file__).resolve().parent
sys.path.insert(0, str(HERE))
sys.path.insert(0, str(HERE.parents[1] / "addin" / "tools"))
sys.path.insert(0, str(HERE.parent / "workbooks"))

import fods  # noqa: E402
import lo_headless  # noqa: E402
import th_direct  # noqa: E402
import th_direct_more  # noqa: E402  (tests/workbooks: superset with the tube solver)
from cases import ARRAY_CASES, BAD_CASES, EMPTY, VALUE_CASES, RangeRef, Raw  # noqa: E402
from check_report import Report, as_number, read_csv  # noqa: E402
from fods import F  # noqa: E402

from fods import PREFIX  # noqa: E402
FIRST_INPUT_COL = 4  # E
RANGE_BLOCK = "[.Z1:.AA2]"  # 2 x 2 numbers on every sheet (RangeRef)


def build_row(display: dict, case, row: int) -> list:
    """Cells of one case row: label, result, TH.STATUS, TH.WHY, inputs."""
    cells = [case.label, None, None, None]
    tokens = []
    args = list(case.args)
    while args and args[-1] is None:
        args.pop()
    for i, a in enumerate(args):
        col = FIRST_INPUT_COL + i
        if a is None:
            tokens.append("")
            cells.append(None)
        elif a is EMPTY:
            tokens.append(fods.ref(col, row))
            cells.append(None)
        elif isinstance(a, Raw):
            tokens.append(a.expr)
            cells.append(None)
        elif isinstance(a, RangeRef):
            tokens.append(RANGE_BLOCK)
            cells.append(None)
        else:
            tokens.append(fods.ref(col, row))
            cells.append(a)
    joined = ";".join(tokens)
    name = display[case.fid]
    cells[1] = F(f"of:={PREFIX}{case.fid.upper()}({joined})")
    tail = (";" + joined) if tokens else ""
    cells[2] = F(f'of:={PREFIX}STATUS("{name}"{tail})')
    cells[3] = F(f'of:={PREFIX}WHY("{name}"{tail})')
    return cells


def with_range_block(rows: list) -> list:
    # Columns Z:AA of rows 1-2 hold the 2 x 2 block RangeRef points at.
    for r, vals in ((0, (1.0, 2.0)), (1, (3.0, 4.0))):
        row = rows[r]
        row += [None] * (25 - len(row))
        row[25:27] = list(vals)
    return rows


def example_rows(catalogue: dict) -> list:
    """One row per catalogue `example`: the formula as documented, with each
    display name turned into its programmatic name (as a saved file stores
    it), then TH.STATUS of the same call."""
    names = sorted(((f["name"], f["id"]) for f in catalogue["functions"]),
                   key=lambda x: -len(x[0]))
    rows = [["function", "example", "TH.STATUS"]]
    for f in catalogue["functions"]:
        if not f.get("example"):
            continue
        expr = f["example"]
        for display, fid in names:
            expr = re.sub(re.escape(display) + r"(?=\()", PREFIX + fid.upper(), expr)
        args = f["example"][f["example"].index("(") + 1:-1]
        tail = f";{args}" if args.strip() else ""
        rows.append([f["name"], F(f"of:={expr}"),
                     F(f'of:={PREFIX}STATUS("{f["name"]}"{tail})')])
    return rows


def array_arg(a) -> str:
    """An inline argument of an array case: text, a number, or a list as an
    inline column array {a|b|c} (ODF formula: '|' separates rows)."""
    if isinstance(a, str):
        return '"%s"' % a
    if isinstance(a, (list, tuple)):
        return "{" + "|".join(repr(float(x)) for x in a) + "}"
    return repr(float(a))


def write_workbooks(work: pathlib.Path, display: dict, catalogue: dict) -> dict:
    header = ["case", "result", "TH.STATUS", "TH.WHY", "inputs..."]
    values = [header] + [build_row(display, c, i + 1) for i, c in enumerate(VALUE_CASES)]
    bad = [header] + [build_row(display, c, i + 1) for i, c in enumerate(BAD_CASES)]
    array_rows = [["case", "table"]]
    for c in ARRAY_CASES:
        base = len(array_rows)
        args = ";".join(array_arg(a) for a in c.args)
        array_rows.append([c.label, F(f"of:={PREFIX}{c.fid.upper()}({args})", matrix=c.array)])
        for _ in range(c.array[1] - 1):
            array_rows.append([None])
        c.first_row = base
    paths = {"values": work / "calc_values.fods", "bad": work / "calc_bad_input.fods",
             "round": work / "calc_roundtrip.fods"}
    fods.write(paths["values"], {"Values": with_range_block(values), "Array": array_rows,
                                 "Examples": example_rows(catalogue)})
    fods.write(paths["bad"], {"Bad": with_range_block(bad)})
    # Round trip: inputs in cells, results computed from them.
    rt = [["density", "velocity", "diameter", "viscosity", "Re", "Nu", "regime"],
          [998.25, 1.5, 0.025, 0.001,
           F(f"of:={PREFIX}REYNOLDS([.A2];[.B2];[.C2];[.D2])"),
           F(f'of:={PREFIX}NUSSELT("Gnielinski";[.E2];5;30;"H")'),
           F(f"of:={PREFIX}REGIME([.E2])")]]
    fods.write(paths["round"], {"Round": rt})
    return paths


# What a cell shows for a failed library status (addin/catalogue/FORMAT.md).
CELL_FOR_STATUS = {10: "Err:502", 11: "Err:502", 12: "Err:523", 13: "#NUM!",
                   14: "#NUM!", 15: "#VALUE!"}


def check_values(rep: Report, lib: th_direct.Lib, rows: list):
    for i, case in enumerate(VALUE_CASES):
        row = rows[i + 1]
        cell, status, why = row[1], row[2], row[3]
        st, want = case.direct(lib)
        where = f"Values row {i + 2} {case.label!r}"
        rep.check(status == str(st), f"{where}: TH.STATUS {status!r}, library {st}")
        rep.check(why.startswith({0: "OK", 1: "WARNING"}.get(st, "ERROR")),
                  f"{where}: TH.WHY {why!r} for library status {st}")
        if st >= 10:
            # The library itself refuses these inputs: the cell must show
            # the documented error, never a number.
            rep.check(cell == CELL_FOR_STATUS[st],
                      f"{where}: cell {cell!r}, library status {st}")
        elif isinstance(want, str):
            rep.check(cell == want, f"{where}: cell {cell!r}, library {want!r}")
        else:
            got = as_number(cell)
            # CSV carries 15 significant digits.
            ok = got is not None and th_direct.close(got, want, 1e-13)
            rep.check(ok, f"{where}: cell {cell!r}, library {want!r}")
        for ref_value, rtol, source in case.ext:
            if isinstance(ref_value, str):
                rep.check(cell == ref_value, f"{where}: cell {cell!r}, {source} {ref_value!r}")
                continue
            got = as_number(cell)
            dev = abs(got - ref_value) / abs(ref_value) if got is not None else math.inf
            rep.check(dev <= rtol, f"{where}: cell {cell!r} vs {ref_value!r} ({source}), "
                                   f"deviation {dev:.3g} > {rtol:g}")
            rep.record(f"Calc cell {case.fid}: {case.label}", source, dev, rtol)


# Report rows checked against libtubeheat's th_tube_solve called directly
# (tests/workbooks/th_direct_more.py): label in the report -> output id.
TUBE_REPORT_ROWS = {"Reynolds number Re": "re", "Prandtl number Pr": "pr",
                    "Darcy friction factor f": "f", "pressure drop p_in - p_out": "dp",
                    "mean Nusselt number Nu = h D_h/k": "nu", "mean inside coefficient h": "h",
                    "overall conductance UA": "ua", "number of transfer units NTU = UA/(mdot cp)": "ntu",
                    "outlet temperature": "t_out", "heat rate into the fluid q": "q",
                    "wall temperature at the outlet": "t_wall_out"}


def check_tube_report(rep: Report, lib_path: str, c, block: list):
    sys.path.insert(0, str(HERE.parent / "workbooks"))
    import th_direct_more  # noqa: E402
    more = th_direct_more.Lib(lib_path)
    fluid, t_in, p_in, mdot, d, length, wall, wall_value = c.args
    case = more.tube_case(fluid, t_in, p_in, mdot, d, length, wall, wall_value)
    seen = set()
    for row in block:
        label, value = row[1], row[2]
        if label in TUBE_REPORT_ROWS:
            want = more.tube(case, TUBE_REPORT_ROWS[label])
            g = as_number(value)
            rep.check(g is not None and th_direct.close(g, want, 1e-13),
                      f"Array tube report row {label!r}: {value!r} != {want!r}")
            seen.add(label)
    rep.check(seen == set(TUBE_REPORT_ROWS), f"tube report rows missing: {set(TUBE_REPORT_ROWS) - seen}")
    rep.check(any(r[1] == "Nusselt method" and r[2] == "Gnielinski" for r in block),
              "tube report: method row")
    rep.check(block[-1][1] == "#N/A", "tube report: rows beyond the report show #N/A")


def check_nusselt_table(rep: Report, lib: th_direct.Lib, c, block: list):
    """One Nusselt number per row: th_nusselt called directly (1e-13) and the
    external reference of the case for that row."""
    method, res, prs = c.args
    rep.check(len(block) == len(res), f"Array {c.label!r}: {len(block)} rows")
    for i, (re_, pr, row) in enumerate(zip(res, prs, block)):
        where = f"Array {c.label!r} row {i + 1} (Re {re_:g}, Pr {pr:g})"
        st, r = lib.nusselt(method, re_, pr)
        g = as_number(row[1]) if len(row) > 1 else None
        rep.check(st in (0, 1) and g is not None and th_direct.close(g, r.nu, 1e-13),
                  f"{where}: {row[1:2]!r} != library {r.nu!r} (status {st})")
        if i < len(c.ext):
            ref_value, rtol, source = c.ext[i]
            dev = abs(g - ref_value) / abs(ref_value) if g is not None else math.inf
            rep.check(dev <= rtol, f"{where}: {g!r} vs {ref_value!r} ({source}), "
                                   f"deviation {dev:.3g} > {rtol:g}")
            rep.record(f"Calc array cell {c.fid}: {c.label} row {i + 1}", source, dev, rtol)


def check_arrays(rep: Report, lib: th_direct.Lib, rows: list, lib_path: str):
    for c in ARRAY_CASES:
        block = rows[c.first_row:c.first_row + c.array[1]]
        if c.fid == "tubeReport":
            check_tube_report(rep, lib_path, c, block)
            continue
        if c.fid == "nusseltTable":
            check_nusselt_table(rep, lib, c, block)
            continue
        st, info = lib.entry_state("auto", *c.args)
        regime = lib.so.th_regime_name(info.regime).decode()
        want = [("regime", regime),
                ("velocity developed", "yes" if info.hydro_developed else "no"),
                ("temperature developed", "yes" if info.thermal_developed else "no"),
                ("x_fd,h / D", info.x_fd_hydro_over_d),
                ("x_fd,t / D", info.x_fd_thermal_over_d),
                ("x* = x/(D Re Pr)", info.x_star)]
        for (label, value), row in zip(want, block):
            got_label, got_value = row[1], row[2]
            where = f"Array {c.label!r} row {label!r}"
            rep.check(got_label == label, f"{where}: label {got_label!r}")
            if isinstance(value, str):
                rep.check(got_value == value, f"{where}: {got_value!r} != {value!r}")
            else:
                g = as_number(got_value)
                rep.check(g is not None and th_direct.close(g, value, 1e-13),
                          f"{where}: {got_value!r} != {value!r}")


def check_bad(rep: Report, rows: list):
    for i, case in enumerate(BAD_CASES):
        row = rows[i + 1]
        cell, status, why = row[1], row[2], row[3]
        where = f"Bad row {i + 2} {case.label!r}"
        if case.cell == "number":
            rep.check(as_number(cell) is not None, f"{where}: cell {cell!r} is not a number")
        else:
            rep.check(cell == case.cell, f"{where}: cell {cell!r}, expected {case.cell!r}")
        rep.check(status == case.status, f"{where}: TH.STATUS {status!r}, expected {case.status!r}")
        rep.check(why.startswith(case.why), f"{where}: TH.WHY {why!r}, expected to start {case.why!r}")


def edit_saved_ods(path: pathlib.Path, old: str, new: str) -> str:
    """Change one input value inside a saved .ods; returns content.xml."""
    with zipfile.ZipFile(path) as z:
        items = [(i, z.read(i.filename)) for i in z.infolist()]
    content = None
    with zipfile.ZipFile(path, "w") as z:
        for info, data in items:
            if info.filename == "content.xml":
                text = data.decode("utf-8")
                content = text
                text = text.replace(f'office:value="{old}"', f'office:value="{new}"')
                text = text.replace(f"<text:p>{old}</text:p>", f"<text:p>{new}</text:p>")
                data = text.encode("utf-8")
            # mimetype must stay first and stored uncompressed
            z.writestr(info, data, compress_type=info.compress_type)
    return content


def check_round_trip(rep: Report, lib: th_direct.Lib, calc, paths: dict, out: pathlib.Path):
    saved = calc.convert([paths["round"]], "ods")
    ods = saved / "calc_roundtrip.ods"
    rep.check(ods.exists(), "round trip: LibreOffice did not write calc_roundtrip.ods")
    if not ods.exists():
        return
    content = edit_saved_ods(ods, "998.25", "1100.5")
    calls = re.findall(r'table:formula="of:=([A-Z.]+)\(', content)
    rep.check(calls.count(PREFIX + "REYNOLDS") == 1 and calls.count(PREFIX + "NUSSELT") == 1,
              f"round trip: saved formulas are not stored by programmatic name: {calls}")
    rep.check("#NAME" not in content, "round trip: saved file contains #NAME?")
    edited = out / "calc_roundtrip_edited.ods"
    edited.write_bytes(ods.read_bytes())
    csv_dir = calc.convert([edited], lo_headless.CSV_ALL_SHEETS)
    rows = read_csv(csv_dir / "calc_roundtrip_edited-Round.csv")
    st, want_re = lib.call("th_reynolds", "dddd", 1100.5, 1.5, 0.025, 0.001)
    got_re = as_number(rows[1][4])
    rep.check(got_re is not None and th_direct.close(got_re, want_re, 1e-13),
              f"round trip: Re after reload {rows[1][4]!r}, expected {want_re!r} "
              "(the saved file was not recomputed?)")
    st, r = lib.nusselt("Gnielinski", want_re, 5, l_over_d=30, wall=1)
    got_nu = as_number(rows[1][5])
    rep.check(got_nu is not None and th_direct.close(got_nu, r.nu, 1e-12),
              f"round trip: Nu after reload {rows[1][5]!r}, expected {r.nu!r}")
    rep.check(rows[1][6] == lib.regime_name(want_re), f"round trip: regime {rows[1][6]!r}")


def check_coverage(rep: Report, catalogue: dict):
    covered = {c.fid for c in VALUE_CASES + ARRAY_CASES} | {c.fid for c in BAD_CASES}
    for fn in catalogue["functions"]:
        if fn["id"] in covered:
            continue
        # Every catalogue function, whatever its topic, needs a case.
        rep.check(False, f"coverage: {fn['name']} ({fn['id']}, topic {fn['topic']}) "
                         "has no Calc test case in tests/calc/cases.py")


def check_examples(rep: Report, rows: list):
    """Every documented example computes: no error, status ok or warning."""
    for row in rows[1:]:
        rep.check(as_number(row[1]) is not None or not row[1].startswith(("Err:", "#")),
                  f"example of {row[0]} shows {row[1]!r}")
        rep.check(row[2] in ("0", "1"), f"example of {row[0]}: TH.STATUS {row[2]!r}")


def check_demo(rep: Report, rows: list):
    """The committed demo workbook computes without an error cell, and its
    energy balance closes (UA LMTD = q for a uniform wall temperature:
    analytic identity)."""
    for r, row in enumerate(rows):
        for c, v in enumerate(row):
            rep.check(not v.startswith(("Err:", "#")),
                      f"demo.fods row {r + 1} column {c + 1} shows {v!r}")
    check = [row for row in rows if row and row[0] == "check: UA LMTD / q"]
    rep.check(len(check) == 1 and as_number(check[0][1]) is not None
              and abs(as_number(check[0][1]) - 1) < 1e-12,
              f"demo.fods energy balance check {check}")


def main() -> int:
    ap = argparse.ArgumentParser(description=__doc__.splitlines()[0])
    ap.add_argument("--oxt", required=True)
    ap.add_argument("--lib", required=True)
    ap.add_argument("--catalogue-json", required=True)
    ap.add_argument("--work", required=True)
    ap.add_argument("--keep", action="store_true", help="keep the LibreOffice profile")
    ns = ap.parse_args()
    t_start = time.monotonic()
    work = pathlib.Path(ns.work)
    work.mkdir(parents=True, exist_ok=True)
    catalogue = json.loads(pathlib.Path(ns.catalogue_json).read_text())
    display = {f["id"]: f["name"] for f in catalogue["functions"]}
    rep = Report()
    lib = th_direct_more.Lib(ns.lib)
    check_coverage(rep, catalogue)
    paths = write_workbooks(work, display, catalogue)
    timings = {}
    with lo_headless.CalcSession(ns.oxt, keep=ns.keep) as calc:
        calc.set_recalc_on_load_always()
        t0 = time.monotonic()
        demo = HERE.parents[1] / "workbooks" / "demo.fods"
        out = calc.convert([paths["values"], paths["bad"], demo], lo_headless.CSV_ALL_SHEETS,
                           work / "csv")
        timings["recalculate test workbooks and demo.fods"] = time.monotonic() - t0
        check_values(rep, lib, read_csv(out / "calc_values-Values.csv"))
        check_arrays(rep, lib, read_csv(out / "calc_values-Array.csv"), ns.lib)
        check_bad(rep, read_csv(out / "calc_bad_input-Bad.csv"))
        check_demo(rep, read_csv(out / "demo-Demo.csv"))
        check_examples(rep, read_csv(out / "calc_values-Examples.csv"))
        t0 = time.monotonic()
        check_round_trip(rep, lib, calc, paths, work)
        timings["save, edit, reload round trip"] = time.monotonic() - t0
        timings["install the .oxt"] = calc.timings.get("install", 0.0)
    timings["total (incl. workbook generation and checks)"] = time.monotonic() - t_start
    return rep.finish("Calc stage", timings,
                      [f"  ({len(VALUE_CASES)} value cases, {len(ARRAY_CASES)} array, "
                       f"{len(BAD_CASES)} bad-input)"])


if __name__ == "__main__":
    sys.exit(main())
