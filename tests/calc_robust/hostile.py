"""Hostile input for every spreadsheet function, and what each must show.

Generated from functions.json (written by addin/gen/generate.py from the
catalogue), so a new catalogue function is covered without editing this
file. For every function a *base* call is built from valid values (the
catalogue `example`, else the first plain-valued case of tests/calc/cases.py,
else values synthesised from the declared checks); then, one argument at a
time, the value is replaced by each input kind below, and three cells are
computed: the function itself, TH.STATUS and TH.WHY of the same arguments.

Argument classes: how Calc hands the argument over, i.e. the IDL type the
generator declares for it.

  RN  required number   IDL double    Calc converts the cell itself
  ON  optional number   IDL any       the add-in converts it (Args::number)
  CN  column number     IDL sequence< sequence< any > >  (rows_of tables)
  RT  required text     IDL string    choice or method name
  OT  optional text     IDL any

Expectations. "check" is the argument's declared `check` (finite, positive,
nonnegative, positive_or_inf). "Library decides" = the check passes and
libtubeheat decides: the cell, TH.STATUS and TH.WHY must agree (status 0 or 1
with a finite value or a text, or status >= 10 with exactly the documented
error: 10/11 Err:502, 12 Err:523, 13/14 #NUM!, 15 #VALUE!; TH.WHY starting
OK / WARNING / ERROR <that error>).

  kind          RN                        ON, CN                  RT, OT
  ------------  ------------------------  ----------------------  -------------------------
  text "xyz.."  #VALUE!, 10               #VALUE!, 10             Err:502, 11 (unknown name)
  numeric text  = base row (Calc          = base row (Args::      (not applicable)
  "20000"       converts it; companions   number converts it)
                convert it too)
  empty cell    = the number 0            = the number 0          RT Err:502, 10 "is empty";
                                                                  OT #VALUE!, 10
  ="" (text)    #VALUE!, 10               ON #VALUE!, 10;         Err:502, 10 "is empty"
                                          CN = the number 0
  #DIV/0!, #N/A the same error in the cell, TH.STATUS and TH.WHY (Calc passes
                errors through without calling)
  range with an (CN only) Err:504: Calc passes no range holding an error cell,
  error cell    so the whole table shows Err:504
  TRUE          = the number 1            = the number 1          RT Err:502, 11; OT #VALUE!, 10
  0, -1, 1e308, check fails: Err:502, 10  as RN                   RT Err:502, 11 (0: 10, gap 2);
  1e-308        "must be ..."; else the                           OT #VALUE!, 10
                library decides
  whole column  = base row (Calc          ON #VALUE!, 10 "a       RT = base row (Calc
  ($X$1:$X$     intersects with the       cell range"; CN a       intersects) [gap 3];
  1048576)      formula's row) [gap 3]    table, first row shown  OT #VALUE!, 10
  too few args  Err:504 (Calc refuses the call); TH.STATUS 10, TH.WHY Err:502 [gap 4];
                when the missing argument arrives as any, Err:502 in the cell too
  too many args Err:504; TH.STATUS 10, TH.WHY "takes at most"

Known gaps, asserted as they are, so that a fix shows up as a failing check
that points here:
  1. TH.STATUS / TH.WHY do not convert numeric text the way Calc does for a
     required number argument: the cell computes, the companions say #VALUE!.
  2. A required text argument given the number 0: Calc hands the text "0" to
     the function (unknown name, 11); TH.STATUS reads the raw 0 as an empty
     cell (10). Both cells show Err:502.
  3. A whole-column reference: Calc intersects it with the formula's row for
     a required number; TH.STATUS / TH.WHY receive the whole column (10).
  4. With too few arguments Calc refuses the call (Err:504); TH.STATUS /
     TH.WHY see a missing argument and name Err:502.
  5. A table function treats "" in a column like an empty cell (0: Calc hands
     empty cells of a range over as ""), TH.WHY / TH.STATUS of it explain the
     row with the row function, which calls "" text (#VALUE!, still 10).
Functions with the same argument list as an earlier one (the TH.TUBE.*
family copies one list with args_from) run the same conversion code on the
same library call: they get every input kind on the first argument of each
class rather than on every argument.
Whole-column references are expensive for `any` arguments (Calc builds all
1,048,576 cells for every call, ~0.4 s), and the add-in's handling of them is
the same code for every function: every required argument gets one (cheap:
Calc intersects), but an optional or column argument only the first of its
class in the workbook (and a function with no required argument one), and
TH.STATUS / TH.WHY are computed for one whole-column row per class.
"""
from __future__ import annotations

import math
from dataclasses import dataclass

CELL_FOR_STATUS = {10: "Err:502", 11: "Err:502", 12: "Err:523", 13: "#NUM!",
                   14: "#NUM!", 15: "#VALUE!"}
KINDS = ["text", "numeric_text", "empty", "empty_text", "div0", "na", "true",
         "zero", "negative", "huge", "tiny", "whole_column", "error_in_range"]
NUMBER_VALUES = {"zero": 0.0, "negative": -1.0, "huge": 1e308, "tiny": 1e-308}
UNKNOWN_TEXT = "xyz-no-such-name"
ERR502, VALUE = "ERROR Err:502: ", "ERROR #VALUE!: "


# Cell contents of an argument (the formula refers to the cell):
@dataclass(frozen=True)
class Formula:        # a formula cell, e.g. =1/0
    text: str


@dataclass(frozen=True)
class Empty:          # an empty cell, referenced
    pass


@dataclass(frozen=True)
class Whole:          # a whole-column reference; `value` sits in this row
    value: object


@dataclass(frozen=True)
class ErrRange:       # a two-cell range: a valid number and an error cell
    value: float


OMIT = None           # an empty place in the argument list (;;)


@dataclass
class Expect:
    cell: str | None = None       # exact cell text
    status: str | None = None     # exact TH.STATUS text
    why: str | None = None        # start of the TH.WHY text
    same_as: str | None = None    # label of the row whose cell this one equals
    decides: bool = False         # library decides (consistency only)
    note: str = ""


@dataclass
class Row:
    label: str
    fn: dict
    kind: str
    inputs: list                  # one entry per argument token
    expect: Expect
    companions: bool = True       # TH.STATUS / TH.WHY computed in this row


def arg_class(a: dict) -> str:
    if a.get("column"):
        return "CN"
    # What Calc does with an argument depends on its UNO type: any (optional
    # ones, and numbers taking the text "inf") or double/string.
    if a["type"] == "number":
        return "ON" if a["arrives_as_any"] else "RN"
    return "OT" if a["arrives_as_any"] else "RT"


def passes(check: str, v: float) -> bool:
    if check == "positive":
        return math.isfinite(v) and v > 0
    if check == "nonnegative":
        return math.isfinite(v) and v >= 0
    if check == "positive_or_inf":
        return not math.isnan(v) and v > 0
    return math.isfinite(v)


# ------------------------------------------------------------ base values
def split_args(text: str) -> list:
    """Arguments of an example formula: numbers, "texts" or empty places;
    ValueError for anything else (a nested formula)."""
    inner = text[text.index("(") + 1:text.rindex(")")]
    if not inner.strip():
        return []
    parts, cur, quoted = [], "", False
    for ch in inner:
        if ch == '"':
            quoted = not quoted
        if ch == ";" and not quoted:
            parts.append(cur.strip())
            cur = ""
        else:
            cur += ch
    parts.append(cur.strip())
    out = []
    for p in parts:
        if p == "":
            out.append(OMIT)
        elif len(p) >= 2 and p[0] == '"' and p[-1] == '"':
            out.append(p[1:-1])
        else:
            out.append(float(p))
    return out


def synthesise(fn: dict, catalogue: dict) -> list:
    vals = []
    for a in fn["args"]:
        if a["optional"]:
            break
        kind, _, ref = a["type"].partition(":")
        if kind == "number":
            vals.append(1.0)
        elif kind == "choice":
            vals.append(catalogue["choices"][ref][0]["text"])
        else:
            vals.append(catalogue["methods"][ref]["names"][0])
    return vals


def base_values(fn: dict, catalogue: dict, value_cases: list) -> tuple[list, str]:
    if fn.get("example"):
        try:
            return split_args(fn["example"]), "catalogue example"
        except ValueError:
            pass
    for case in value_cases:
        if case.fid == fn["id"] and all(
                x is None or isinstance(x, (int, float, str)) for x in case.args):
            return [x if x is None or isinstance(x, str) else float(x) for x in case.args], \
                "tests/calc/cases.py"
    return synthesise(fn, catalogue), "synthesised from the checks"


def a_valid_value(a: dict, catalogue: dict):
    """Some valid value of an argument the base call leaves out."""
    kind, _, ref = a["type"].partition(":")
    if kind == "choice":
        return catalogue["choices"][ref][0]["text"]
    if kind == "method":
        return catalogue["methods"][ref]["names"][0]
    d = a.get("default")
    if isinstance(d, (int, float)) and not isinstance(d, bool) and passes(a["check"], float(d)):
        return float(d)
    return 1.0


def numeric_text(v: float) -> str:
    return str(int(v)) if float(v).is_integer() and abs(v) < 1e15 else repr(v)


# ------------------------------------------------------------ expectations
def expect_for(fn: dict, i: int, kind: str, base_label: str) -> Expect | None:
    a = fn["args"][i]
    cls = arg_class(a)
    at = f"argument {i + 1} ("
    text_arg = cls in ("RT", "OT")
    if kind in ("div0", "na"):
        err = "#DIV/0!" if kind == "div0" else "#N/A"
        return Expect(cell=err, status=err, why=err)
    if kind == "text":
        if text_arg:
            return Expect(cell="Err:502", status="11", why=ERR502 + at)
        return Expect(cell="#VALUE!", status="10", why=VALUE + at)
    if kind == "numeric_text":
        if text_arg:
            return None
        # Calc converts numeric text for double parameters; the add-in does
        # the same for any parameters (Args::number), so cell and companions
        # agree with the base row.
        # (An omitted optional argument gets a valid value of its own here,
        # so only a required one must reproduce the base row exactly.)
        if cls == "RN":
            return Expect(same_as=base_label, decides=True)
        return Expect(decides=True)
    if kind == "whole_column":
        if cls == "RN":
            return Expect(same_as=base_label, status="10", why=VALUE + at, note="gap 3")
        if cls == "ON":
            return Expect(cell="#VALUE!", status="10", why=VALUE + at)
        if cls == "CN":
            # A table over all 1,048,576 rows; a non-array cell shows its
            # first row, and the column's first cell is empty (0).
            e = number_expect(a, i, 0.0)
            e.note = "table over a whole column, first row empty"
            return e
        if cls == "RT":
            return Expect(same_as=base_label, status="10", why=VALUE + at, note="gap 3")
        return Expect(cell="#VALUE!", status="10", why=VALUE + at)
    if kind == "empty":
        if cls == "RT":
            return Expect(cell="Err:502", status="10", why=ERR502 + at)
        if cls == "OT":
            return Expect(cell="#VALUE!", status="10", why=VALUE + at)
        return number_expect(a, i, 0.0)
    if kind == "empty_text":
        if text_arg:
            return Expect(cell="Err:502", status="10", why=ERR502 + at)
        if cls == "CN":
            e = number_expect(a, i, 0.0)
            if e.cell is not None:
                e.why, e.note = VALUE + at, "gap 5"
            return e
        return Expect(cell="#VALUE!", status="10", why=VALUE + at)
    if kind == "error_in_range":
        if cls != "CN":
            return None
        return Expect(cell="Err:504", note="Calc passes no range holding an error cell")
    if kind == "true":
        if cls == "RT":
            return Expect(cell="Err:502", status="11", why=ERR502 + at)
        if cls == "OT":
            return Expect(cell="#VALUE!", status="10", why=VALUE + at)
        return number_expect(a, i, 1.0)
    if kind in NUMBER_VALUES:
        v = NUMBER_VALUES[kind]
        if cls == "RT":
            if v == 0.0:
                return Expect(cell="Err:502", status="10", why=ERR502 + at, note="gap 2")
            return Expect(cell="Err:502", status="11", why=ERR502 + at)
        if cls == "OT":
            return Expect(cell="#VALUE!", status="10", why=VALUE + at)
        return number_expect(a, i, v)
    raise ValueError(kind)


def number_expect(a: dict, i: int, v: float) -> Expect:
    if not passes(a["check"], v):
        return Expect(cell="Err:502", status="10", why=f"{ERR502}argument {i + 1} (",
                      note=f"check {a['check']}")
    return Expect(decides=True)


def hostile_input(kind: str, a: dict, base_value, catalogue: dict):
    cls = arg_class(a)
    if kind == "text":
        return UNKNOWN_TEXT
    if kind == "numeric_text":
        v = base_value if isinstance(base_value, float) else a_valid_value(a, catalogue)
        return numeric_text(v)
    if kind == "empty":
        return Empty()
    if kind == "empty_text":
        return Formula('of:=""')
    if kind == "div0":
        return Formula("of:=1/0")
    if kind == "na":
        return Formula("of:=NA()")
    if kind == "true":
        return Formula("of:=TRUE()")
    if kind in NUMBER_VALUES:
        return NUMBER_VALUES[kind]
    if kind == "error_in_range":
        return ErrRange(base_value if isinstance(base_value, float) else 1.0)
    if kind == "whole_column":
        v = base_value if base_value is not OMIT else a_valid_value(a, catalogue)
        if cls == "CN":
            v = a_valid_value(a, catalogue)
        return Whole(v)
    raise ValueError(kind)


# ------------------------------------------------------------ rows
def rows_for_function(fn: dict, catalogue: dict, value_cases: list,
                      reduced: bool = False, costly_done: set | None = None
                      ) -> tuple[list, str]:
    """Rows of one function. `reduced`: another function with the same
    argument list (names, types, checks) already had every argument tested,
    so each input kind goes to the first argument of each class only.
    `costly_done`: the classes (ON, OT, CN) that already had their one
    whole-column row in this workbook (see the module text)."""
    costly_done = set() if costly_done is None else costly_done
    cheap = any(arg_class(a) in ("RN", "RT") for a in fn["args"])
    base, source = base_values(fn, catalogue, value_cases)
    nargs = len(fn["args"])
    base = (list(base) + [OMIT] * nargs)[:nargs]
    base_label = f"{fn['name']} base"
    rows = [Row(base_label, fn, "base", list(base),
                Expect(decides=True, note=f"base from {source}"))]
    whole_any_done = False
    classes_done = set()
    for i, a in enumerate(fn["args"]):
        cls = arg_class(a)
        if reduced:
            if cls in classes_done:
                continue
            classes_done.add(cls)
        for kind in KINDS:
            if kind == "whole_column" and cls in ("ON", "OT", "CN"):
                # ~0.4 s each in Calc: one per class in the workbook, and one
                # for a function that has no required argument to take it.
                if whole_any_done or (cls in costly_done and cheap):
                    continue
                whole_any_done = True
                costly_done.add(cls)
            e = expect_for(fn, i, kind, base_label)
            if e is None:
                continue
            inputs = list(base)
            # Places before the hostile one that the base leaves out stay
            # empty places (;;): their defaults apply.
            inputs[i] = hostile_input(kind, a, base[i], catalogue)
            rows.append(Row(f"{fn['name']} arg {i + 1} {a['name']} {kind}", fn, kind,
                            inputs, e, companions=kind != "whole_column"))
    # Argument counts: Calc refuses the call itself.
    req = sum(1 for a in fn["args"] if not a["optional"])
    if req > 0:
        # Calc refuses a call missing a double/string parameter (Err:504);
        # a missing any parameter reaches the add-in, which says so (Err:502).
        missing_any = fn["args"][req - 1]["arrives_as_any"]
        rows.append(Row(f"{fn['name']} too few arguments", fn, "too_few", base[:req - 1],
                        Expect(cell="Err:502" if missing_any else "Err:504", status="10",
                               why=ERR502, note="" if missing_any else "gap 4")))
    rows.append(Row(f"{fn['name']} too many arguments", fn, "too_many", base + [1.0],
                    Expect(cell="Err:504", status="10",
                           why=f"{ERR502}{fn['name']} takes at most")))
    return rows, source
