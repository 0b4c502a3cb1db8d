"""The template description layer: what workbooks/src/*.py use to describe a
template workbook in readable terms, and what the generator and the CI test
read back (cell positions by key, input values).

A template is one sheet laid out in seven columns:

    A tag | B quantity | C value | D unit | E degC | F status | G note

- `input(...)` rows hold a value the user types (tinted, tagged "input");
- `calc(...)` rows hold a formula; when the formula is one TH. call, column
  F gets TH.STATUS of the same call, shown as ok / range / error n;
- `why(...)` rows write TH.WHY of a calc row (method used, reason, any
  validity-range warning) across C..G;
- `passes(...)` blocks iterate the property temperature in columns C, D, E
  (pass 1, 2, 3): pass 1 takes properties at the inlet, each later pass at
  the mean of the inlet and the previous pass's outlet;
- `table(...)` blocks hold a profile or a sweep, `chart(...)` plots table
  columns (XY chart embedded in the file).

Formulas are written as a Calc user types them, with the display names
(`=TH.REYNOLDS.MASSFLOW({mdot}; {d_i}; {mu})`) and `{key}` for another row's
value; they are stored by programmatic name (ORG.TUBEHEAT.CALCFUNCTIONS.<ID>)
in ODF syntax, and every TH. call's argument count is checked against the
function catalogue (addin/catalogue/*.toml) when the template is built.
"""
from __future__ import annotations

import pathlib
import re
import sys
from dataclasses import dataclass, field

HERE = pathlib.Path(__file__).resolve().parent
ROOT = HERE.parents[1]
sys.path.insert(0, str(ROOT / "addin" / "gen"))
sys.path.insert(0, str(ROOT / "addin" / "tools"))
sys.path.insert(0, str(HERE))

import catalogue as _cat  # noqa: E402  (addin/gen/catalogue.py)
import odfsheet as odf  # noqa: E402
from fods import col_name as col_letter  # noqa: E402  (addin/tools/fods.py)
from fods import ref as odf_ref  # noqa: E402

from fods import PREFIX  # noqa: E402,F401  (also imported from here by the templates)
WIDTHS = [0.48, 2.32, 0.88, 0.84, 0.84, 0.60, 1.04]   # inches, A..G: 7.0 in
COL = {"tag": 0, "label": 1, "value": 2, "unit": 3, "degc": 4, "status": 5, "note": 6}
KELVIN = 273.15

CAUTION = (
    "CAUTION. Results from this sheet size equipment that can scald, burst or freeze. "
    "The heat-transfer correlations scatter against measurements by about +-10 % "
    "(Gnielinski) to +-25 % (Dittus-Boelter); property data and fouling add more. "
    "Treat every result as an engineering estimate, apply design margins, follow the "
    "codes and standards that apply where the equipment is built and operated, and "
    "have the design reviewed by a qualified, licensed engineer.")
HOW_TO = (
    "Type only into the tinted cells tagged \"input\"; everything else is computed. "
    "Temperatures are in kelvin, as the TH. functions take them, with degC beside. "
    "Column F shows each TH. function's status: ok, range (computed outside the "
    "method's validity range: an extrapolation, read the warning below) or error n. "
    "Needs the tubeheat extension (tubeheat.oxt) in LibreOffice Calc.")


_CATALOGUE = None


def catalogue() -> dict:
    """Display name -> catalogue Function, loaded once from addin/catalogue."""
    global _CATALOGUE
    if _CATALOGUE is None:
        c = _cat.load(ROOT / "addin" / "catalogue")
        _CATALOGUE = {f.name: f for f in c.functions}
    return _CATALOGUE


def has_function(name: str) -> bool:
    return name in catalogue()


class TemplateError(Exception):
    pass


# ------------------------------------------------------------ formula text
_TH_CALL = re.compile(r"TH(?:\.[A-Z][A-Z0-9]*)+(?=\()")


def _split_top(args: str) -> list:
    """Split an argument list at top-level ';' (outside quotes/parentheses)."""
    out, depth, cur, quoted = [], 0, [], False
    for ch in args:
        if quoted:
            cur.append(ch)
            if ch == '"':
                quoted = False
            continue
        if ch == '"':
            quoted = True
        elif ch == "(":
            depth += 1
        elif ch == ")":
            depth -= 1
        elif ch == ";" and depth == 0:
            out.append("".join(cur))
            cur = []
            continue
        cur.append(ch)
    out.append("".join(cur))
    return out


def _matching(text: str, open_at: int) -> int:
    depth, quoted = 0, False
    for i in range(open_at, len(text)):
        ch = text[i]
        if quoted:
            quoted = ch != '"'
            continue
        if ch == '"':
            quoted = True
        elif ch == "(":
            depth += 1
        elif ch == ")":
            depth -= 1
            if depth == 0:
                return i
    raise TemplateError(f"unbalanced parentheses in {text!r}")


def _strip_spaces(text: str) -> str:
    out, quoted = [], False
    for ch in text:
        if ch == '"':
            quoted = not quoted
        if ch.isspace() and not quoted:
            continue
        out.append(ch)
    return "".join(out)


def _check_arity(name: str, args: list, where: str):
    cat = catalogue()
    if name in ("TH.WHY", "TH.STATUS"):
        if not args or not re.fullmatch(r'"TH(\.[A-Z0-9]+)+"', args[0]):
            raise TemplateError(f"{where}: {name} needs the function name as text first")
        name, args = args[0].strip('"'), args[1:]
        if args == [""]:
            args = []
    if name not in cat:
        raise TemplateError(f"{where}: {name} is not in the function catalogue")
    fn = cat[name]
    n = 0 if args == [""] else len(args)
    if not fn.required_count <= n <= len(fn.args):
        raise TemplateError(f"{where}: {name} takes {fn.required_count}..{len(fn.args)} "
                            f"arguments, got {n}: {args}")


def to_odf(formula: str, where: str = "") -> str:
    """'=TH.X([.B2];2)+1' (references already resolved) -> 'of:=ORG...X([.B2];2)+1',
    with every TH. call checked against the catalogue."""
    text = _strip_spaces(formula)
    if not text.startswith("="):
        raise TemplateError(f"{where}: a formula starts with '=': {formula!r}")
    out, i = [], 0
    quoted = False
    while i < len(text):
        ch = text[i]
        if ch == '"':
            quoted = not quoted
            out.append(ch)
            i += 1
            continue
        m = None if quoted else _TH_CALL.match(text, i)
        if m and (i == 0 or not (text[i - 1].isalnum() or text[i - 1] == ".")):
            name = m.group(0)
            close = _matching(text, m.end())
            _check_arity(name, _split_top(text[m.end() + 1:close]), where)
            fid = {"TH.WHY": "why", "TH.STATUS": "status"}.get(name) or catalogue()[name].id
            out.append(PREFIX + fid.upper())
            i = m.end()
            continue
        out.append(ch)
        i += 1
    return "of:" + "".join(out)


def single_call(formula: str):
    """(name, argument text) when the formula is exactly one TH. call."""
    text = _strip_spaces(formula)
    m = re.match(r"=(TH(?:\.[A-Z][A-Z0-9]*)+)\(", text)
    if not m:
        return None
    if _matching(text, m.end() - 1) != len(text) - 1:
        return None
    return m.group(1), text[m.end():-1]


# ------------------------------------------------------------------ model
@dataclass
class Item:
    """A placed cell whose content may hold {references} to resolve later."""
    row: int
    col: int
    content: object          # number, text, or ("formula", template, context)
    role: str = "plain"
    fmt: str | None = None
    span: int = 1


@dataclass
class TableCol:
    name: str
    header: str
    unit: str
    formula: object = None   # str template, or callable(i) -> str template
    values: list | None = None
    fmt: str | None = None
    role: str = "value"      # "input" for values the user may change


@dataclass
class Template:
    stem: str                 # file name without .fods
    sheet: str                # sheet name (letters, digits, _)
    title: str
    scenario: str
    checks: str = ""          # one line: what the CI test asserts (docs)
    items: list = field(default_factory=list)
    rows: int = 0
    keys: dict = field(default_factory=dict)       # key -> (col, row) or list per pass
    pass_keys: dict = field(default_factory=dict)  # key -> [(col, row) per pass]
    formulas: dict = field(default_factory=dict)   # key -> formula template
    inputs: dict = field(default_factory=dict)     # key -> value
    tables: dict = field(default_factory=dict)     # "tbl.col" -> (col, first, last, header_row)
    table_values: dict = field(default_factory=dict)  # "tbl.col" -> values given (not formulas)
    row_breaks: set = field(default_factory=set)
    row_heights: dict = field(default_factory=dict)
    charts: dict = field(default_factory=dict)     # row -> odf.Chart
    chart_titles: list = field(default_factory=list)
    status_keys: list = field(default_factory=list)
    why_rows: dict = field(default_factory=dict)   # key -> row of its TH.WHY
    _pass_count: int = 0

    # ---------------------------------------------------------- placing
    def _place(self, col, content, role="plain", fmt=None, span=1, row=None):
        r = self.rows if row is None else row
        self.items.append(Item(r, col, content, role, fmt, span))

    def _newrow(self, page_break=False, height=None) -> int:
        r = self.rows
        self.rows += 1
        if page_break:
            self.row_breaks.add(r)
        if height is not None:
            self.row_heights[r] = height
        return r

    def _key(self, key, col, row):
        if key in self.keys or key in self.pass_keys:
            raise TemplateError(f"{self.stem}: key {key!r} used twice")
        self.keys[key] = (col, row)

    # ---------------------------------------------------------- blocks
    def head(self):
        """Title, scenario, how-to line and the caution box."""
        r = self._newrow()
        self._place(0, self.title, "title", span=7, row=r)
        r = self._newrow()
        self._place(0, "Scenario (invented demo data, not a real installation): " + self.scenario,
                    "scenario", span=7, row=r)
        r = self._newrow()
        self._place(0, HOW_TO, "text", span=7, row=r)
        self.caution()

    def caution(self):
        r = self._newrow()
        self._place(0, CAUTION, "caution", span=7, row=r)

    def blank(self, n=1):
        for _ in range(n):
            self._newrow()

    def section(self, text, page_break=False, columns=None):
        """A heading; columns=None gives the standard column captions."""
        self.blank()
        r = self._newrow(page_break=page_break)
        self._place(0, text, "section", span=7, row=r)
        if columns is None:
            columns = ["", "quantity", "value", "unit", "degC", "status", "note"]
        if columns:
            r = self._newrow()
            for c, text in enumerate(columns):
                if text:
                    self._place(c, text, "headc" if c >= 2 else "head", row=r)

    def text(self, text, role="text"):
        r = self._newrow()
        self._place(0, text, role, span=7, row=r)

    def input(self, key, label, value, unit, note="", degc=False, fmt=None):
        r = self._newrow()
        self._key(key, COL["value"], r)
        self.inputs[key] = value
        self._place(0, "input", "tag", row=r)
        self._place(1, label, "label", row=r)
        if isinstance(value, str):
            # text (a method name, "inf"): two columns wide, no unit
            self._place(2, value, "inputtext", span=2, row=r)
        else:
            self._place(2, value, "input", fmt, row=r)
            self._place(3, unit, "unit", row=r)
        if degc:
            self._place(4, ("formula", f"={{{key}}}-{KELVIN}", None), "degc", "d2", row=r)
        if note:
            self._place(6, note, "note", row=r)

    def calc(self, key, label, formula, unit, note="", degc=False, fmt=None, key_result=False,
             tag="", status=True, text=False):
        """text=True: a text result (regime, entry state) spread over C..E."""
        r = self._newrow()
        self._key(key, COL["value"], r)
        self.formulas[key] = formula
        if tag:
            self._place(0, tag, "tag", row=r)
        self._place(1, label, "label", row=r)
        if text:
            self._place(2, ("formula", formula, None), "textresult", span=3, row=r)
        else:
            self._place(2, ("formula", formula, None), "key" if key_result else "value", fmt, row=r)
            self._place(3, unit, "unit", row=r)
        if degc:
            self._place(4, ("formula", f"={{{key}}}-{KELVIN}", None), "degc", "d2", row=r)
        call = single_call(formula)
        if status and call:
            name, args = call
            tail = f";{args}" if args else ""
            self._place(5, ("formula", f'=TH.STATUS("{name}"{tail})', None), "status", "status",
                        row=r)
            self.status_keys.append(key)
        if note:
            self._place(6, note, "note", row=r)

    def flag(self, key, label, formula, note=""):
        """A check whose formula gives a short text; "CHECK" is highlighted."""
        r = self._newrow()
        self._key(key, COL["value"], r)
        self.formulas[key] = formula
        self._place(0, "check", "tag", row=r)
        self._place(1, label, "label", row=r)
        self._place(2, ("formula", formula, None), "flag", span=2, row=r)
        if note:
            self._place(4, note, "note", span=3, row=r)

    def iteration_check(self, t_in="t_in", t_out="t_out"):
        """Flag whether the last pass still moved the outlet temperature by
        more than 0.5 % of the temperature change along the tube."""
        n = len(self.pass_keys[t_out])
        self.flag("converged", "property iteration converged",
                  f'=IF(ABS({{{t_out}@{n}}}-{{{t_out}@{n - 1}}})'
                  f'<=0.005*ABS({{{t_out}}}-{{{t_in}}}); '
                  f'"yes"; "CHECK: add a pass")',
                  "last pass moved T_out by under 0.5 % of T_out - T_in")

    def custom_row(self, cells):
        """cells: {column: (content, role, fmt, key)}; content a number, a
        text, or a formula string starting with '='. Returns the row."""
        r = self._newrow()
        for c, (content, role, fmt, key) in cells.items():
            if isinstance(content, str) and content.startswith("="):
                if key:
                    self.formulas[key] = content
                content = ("formula", content, None)
            elif key and role in ("input", "inputtext"):
                self.inputs[key] = content
            if key:
                self._key(key, c, r)
            self._place(c, content, role, fmt, row=r)
        return r

    def why(self, label, of_key):
        """TH.WHY of the calc row `of_key` (its last pass in a pass block)."""
        formula = self.formulas.get(of_key)
        context = None
        if formula is None and of_key in self.pass_keys:
            formula = self.formulas[of_key + "@rest"]
            context = len(self.pass_keys[of_key]) - 1
        call = single_call(formula or "")
        if not call:
            raise TemplateError(f"{self.stem}: why({of_key!r}) needs a single TH. call")
        name, args = call
        tail = f";{args}" if args else ""
        r = self._newrow()
        self.why_rows[of_key] = r
        self._place(1, label, "label", row=r)
        self._place(2, ("formula", f'=TH.WHY("{name}"{tail})', context), "why", span=5, row=r)

    # ------------------------------------------------------ pass blocks
    def passes(self, title, n=3, note="", page_break=False):
        """Start a block that repeats each row in n pass columns (C, D, E)."""
        self.section(title, columns=["", "quantity"] + [f"pass {i + 1}" for i in range(n)]
                     + ["unit", "status (last pass)"], page_break=page_break)
        self._pass_count = n
        if note:
            self.text(note, "note")

    def pass_row(self, key, label, first, rest=None, unit="", fmt=None, status=True, note=None):
        """first: formula of pass 1; rest: formula of the later passes (default
        the same). {k} refers to row k in the same pass, {prev.k} to row k in
        the previous pass."""
        n = self._pass_count
        rest = rest or first
        r = self._newrow()
        if key in self.keys or key in self.pass_keys:
            raise TemplateError(f"{self.stem}: key {key!r} used twice")
        self.pass_keys[key] = [(2 + i, r) for i in range(n)]
        self.formulas[key + "@first"] = first
        self.formulas[key + "@rest"] = rest
        self._place(1, label, "label", row=r)
        for i in range(n):
            f = first if i == 0 else rest
            self._place(2 + i, ("formula", f, i), "value", fmt, row=r)
        self._place(5, unit, "unit", row=r)
        call = single_call(rest)
        if status and call:
            name, args = call
            tail = f";{args}" if args else ""
            self._place(6, ("formula", f'=TH.STATUS("{name}"{tail})', n - 1), "status", "status",
                        row=r)
            self.status_keys.append(key)

    # ---------------------------------------------------------- tables
    def table(self, key, columns, n, title=None, note="", page_break=False, first_col=0):
        """n rows; column i of row j: values[j] or formula (str with {@col}
        for the same row's cell of another column and {#} for j, or a
        callable(j) giving the template)."""
        if title:
            self.section(title, columns=[], page_break=page_break)
        if note:
            self.text(note, "note")
        if first_col + len(columns) > 7:
            raise TemplateError("a table ends at column G")
        hr = self._newrow()
        ur = self._newrow()
        for i, col in enumerate(columns):
            self._place(first_col + i, col.header, "headc", row=hr)
            self._place(first_col + i, col.unit, "unit", row=ur)
        first = self.rows
        for j in range(n):
            r = self._newrow()
            for i, col in enumerate(columns):
                c = first_col + i
                if col.values is not None:
                    v = col.values[j]
                    if isinstance(v, str) and v.startswith("="):
                        v = ("formula", v, None)
                    self._place(c, v, col.role, col.fmt, row=r)
                else:
                    tpl = col.formula(j) if callable(col.formula) else col.formula
                    tpl = tpl.replace("{#}", str(j))
                    for other_i, other in enumerate(columns):
                        tpl = tpl.replace("{@" + other.name + "}",
                                          odf_ref(first_col + other_i, r))
                    self._place(c, ("formula", tpl, None), col.role, col.fmt, row=r)
        last = self.rows - 1
        for i, col in enumerate(columns):
            self.tables[f"{key}.{col.name}"] = (first_col + i, first, last, hr)
            if col.values is not None:
                self.table_values[f"{key}.{col.name}"] = list(col.values)

    def chart(self, title, x, ys, x_title, y_title, y2_title=None, height_cm=8.5, width_cm=17.0,
              x_log=False, page_break=False, kind="scatter"):
        """ys: list of (table column "tbl.col", options dict: secondary,
        dashed, symbols); x: "tbl.col". Reserves rows under the anchor."""
        self.blank()
        row_h = 0.5
        nrows = int(-(-height_cm // row_h)) + 1
        anchor = self._newrow(page_break=page_break, height=row_h)
        for _ in range(nrows - 1):
            self._newrow(height=row_h)
        self.charts[anchor] = (title, x, ys, x_title, y_title, y2_title, height_cm, width_cm, x_log,
                               kind)
        self.chart_titles.append(title)

    # ------------------------------------------------------- resolution
    def address(self, key) -> str:
        """'C12' of a key's value cell (the last pass of a pass row)."""
        if key in self.keys:
            c, r = self.keys[key]
        else:
            c, r = self.pass_keys[key][-1]
        return f"{col_letter(c)}{r + 1}"

    def pass_addresses(self, key) -> list:
        return [f"{col_letter(c)}{r + 1}" for c, r in self.pass_keys[key]]

    def table_len(self, name) -> int:
        c, first, last, hr = self.tables[name]
        return last - first + 1

    def cell(self, where: str) -> tuple:
        """(column, row) from 0 of 'key', 'key@N' (pass N) or 'tbl.col[i]'."""
        if "[" in where:
            name, i = where[:-1].split("[")
            c, first, last, hr = self.tables[name]
            if not 0 <= int(i) <= last - first:
                raise TemplateError(f"{where}: row out of the table")
            return c, first + int(i)
        if "@" in where:
            k, n = where.split("@")
            return self.pass_keys[k][int(n) - 1]
        if where in self.keys:
            return self.keys[where]
        return self.pass_keys[where][-1]

    def status_cells(self) -> list:
        """(column, row) of every TH.STATUS cell of the sheet."""
        out = []
        for it in self.items:
            if it.role == "status" and isinstance(it.content, tuple):
                out.append((it.col, it.row))
        return out

    def why_cells(self) -> list:
        return [(2, r) for r in self.why_rows.values()]

    def table_range(self, name) -> tuple:
        c, first, last, hr = self.tables[name]
        return col_letter(c), first + 1, last + 1

    def _resolve(self, template: str, context, where: str) -> str:
        def sub(m):
            name = m.group(1)
            if name.startswith("prev."):
                k = name[5:]
                if context is None or context == 0 or k not in self.pass_keys:
                    raise TemplateError(f"{where}: {{{name}}} outside a later pass")
                c, r = self.pass_keys[k][context - 1]
                return odf_ref(c, r)
            if "@" in name:
                k, n = name.split("@")
                if k not in self.pass_keys or not 1 <= int(n) <= len(self.pass_keys[k]):
                    raise TemplateError(f"{where}: unknown pass reference {{{name}}}")
                c, r = self.pass_keys[k][int(n) - 1]
                return odf_ref(c, r)
            if name in self.pass_keys:
                idx = context if context is not None else -1
                c, r = self.pass_keys[name][idx]
                return odf_ref(c, r)
            if name in self.keys:
                c, r = self.keys[name]
                return odf_ref(c, r)
            if name.endswith("#last") and name[:-5] in self.tables:
                c, first, last, hr = self.tables[name[:-5]]
                return odf_ref(c, last)
            if name in self.tables:
                c, first, last, hr = self.tables[name]
                return f"[.{col_letter(c)}{first + 1}:.{col_letter(c)}{last + 1}]"
            raise TemplateError(f"{where}: unknown reference {{{name}}}")
        text = re.sub(r"\{([A-Za-z_][\w.@#]*)\}", sub, template)
        return to_odf(text, where)

    def build_sheet(self) -> odf.Sheet:
        grid = [dict() for _ in range(self.rows)]
        for it in self.items:
            content = it.content
            if isinstance(content, tuple) and content[0] == "formula":
                where = f"{self.stem} row {it.row + 1} column {col_letter(it.col)}"
                content = odf.Formula(self._resolve(content[1], content[2], where))
            if it.col in grid[it.row]:
                raise TemplateError(f"{self.stem}: two items in row {it.row + 1} column {it.col}")
            grid[it.row][it.col] = odf.Cell(content, it.role, it.fmt, it.span)
        rows = []
        for r in range(self.rows):
            cells, c = [], 0
            placed = grid[r]
            last = max(placed) if placed else -1
            while c <= last:
                cell = placed.get(c, odf.Cell())
                cells.append(cell)
                c += cell.span
            chart = None
            if r in self.charts:
                chart = self._chart(*self.charts[r])
            rows.append(odf.Row(cells, r in self.row_breaks, self.row_heights.get(r), chart))
        return odf.Sheet(self.sheet_name(), WIDTHS, rows, self.title)

    def sheet_name(self):
        return self.sheet

    def _chart(self, title, x, ys, x_title, y_title, y2_title, height_cm, width_cm, x_log, kind):
        s = self.sheet
        xc, xf, xl = self.table_range(x)
        series = []
        for name, opts in ys:
            c, first, last, hr = self.tables[name]
            yl = col_letter(c)
            series.append(odf.Series(
                label_cell=f"{s}.{yl}{hr + 1}",
                x_range=f"{s}.{xc}{xf}:{s}.{xc}{xl}",
                y_range=f"{s}.{yl}{first + 1}:{s}.{yl}{last + 1}",
                secondary=opts.get("secondary", False), dashed=opts.get("dashed", False),
                symbols=opts.get("symbols", False), line=opts.get("line", False)))
        categories = f"{s}.{xc}{xf}:{s}.{xc}{xl}" if kind == "bar" else None
        return odf.Chart(title, x_title, y_title, series, width_cm, height_cm, y2_title, x_log,
                         kind, categories)

    def render(self) -> str:
        return odf.render([self.build_sheet()], footer=f"{self.stem}.fods, invented demo data",
                          doc_title=self.title)

