"""Load and validate the spreadsheet function catalogue (addin/catalogue/*.toml).

Standard library only (Python 3.11+: tomllib). The format is described in
addin/catalogue/FORMAT.md; every rule written there is enforced here so that a
mistake in a catalogue entry fails the build with a message naming the entry,
instead of producing an add-in that shows ### or a wrong number.
"""
from __future__ import annotations

import copy
import math
import pathlib
import re
import tomllib
from dataclasses import dataclass, field

PREFIX = "TH."
SERVICE = "org.tubeheat.CalcFunctions"
INTERFACE = "org.tubeheat.XCalcFunctions"

# UNO IDL allows no '_' in method and parameter names: lowerCamelCase.
IDENT = re.compile(r"^[a-z][a-zA-Z0-9]*$")
C_IDENT = re.compile(r"^[A-Za-z_][A-Za-z0-9_]*$")
DISPLAY = re.compile(r"^TH(\.[A-Z][A-Z0-9]*)+$")
CHECKS = ("finite", "positive", "nonnegative", "positive_or_inf")
RESULT_TYPES = ("number", "text", "array")
CATEGORIES = ("Add-In", "Database", "Date&Time", "Financial", "Information",
              "Logical", "Mathematical", "Matrix", "Statistical",
              "Spreadsheet", "Text")
# Names that would clash with C++, UNO IDL or the generated code's own names.
RESERVED = set("""
alignas alignof and and_eq asm auto bitand bitor bool break case catch char
char16_t char32_t class compl const constexpr const_cast continue decltype
default delete do double dynamic_cast else enum explicit export extern false
float for friend goto if inline int long mutable namespace new noexcept not
not_eq nullptr operator or or_eq private protected public register
reinterpret_cast return short signed sizeof static static_assert static_cast
struct switch template this thread_local throw true try typedef typeid
typename union unsigned using virtual void volatile wchar_t while xor xor_eq
any attribute boolean bound byte constants constrained exception get hyper in
inout interface maybevoid module needs observes oneway optional out property
published raises readonly removable sequence service set singleton string
transient type
o args ctx a result
""".split())
# IDL keywords that are fine as C++ local names (locals never reach the IDL).
IDL_ONLY = {"out", "in", "inout", "get", "set", "type", "sequence", "string",
            "any", "property", "service", "module", "interface", "result"}
# Functions the generator adds itself (the companions of every function).
BUILTIN_IDS = {"why", "status"}


class CatalogueError(Exception):
    pass


@dataclass
class Choice:
    key: str
    values: list  # list of dicts: text, c, aliases, help


@dataclass
class Methods:
    key: str
    from_name: str
    name_of: str | None
    names: list


@dataclass
class Arg:
    name: str
    label: str
    unit: str
    help: str
    type: str = "number"        # number | choice:<key> | method:<key>
    check: str = "finite"
    optional: bool = False
    default: object = None      # None = no value (field keeps init value)
    default_doc: str | None = None
    field: str | None = None
    column: bool = False        # takes a range, one value per row (rows_of)

    @property
    def kind(self) -> str:
        return self.type.split(":", 1)[0]

    @property
    def ref(self) -> str | None:
        return self.type.split(":", 1)[1] if ":" in self.type else None

    @property
    def arrives_as_any(self) -> bool:
        """UNO type any (not double/string): optional arguments, and numbers
        that accept the text "inf" (a double parameter would make Calc
        reject the text before the add-in sees it)."""
        return self.optional or self.check == "positive_or_inf"


@dataclass
class Function:
    name: str
    id: str
    summary: str
    returns: str
    topic: str
    category: str = "Add-In"
    c: str | None = None
    adapter: str | None = None
    locals: list = field(default_factory=list)
    result: str = "out"
    result_type: str = "number"
    method_used: str | None = None
    reason: str | None = None
    range_note: str | None = None
    example: str | None = None
    notes: str | None = None
    args: list = field(default_factory=list)
    rows_of: str | None = None  # id of the function applied row by row
    report: str | None = None      # C call filling `rows`/`n_rows` (array results)
    report_row: str | None = None  # th_* row struct with label/value/unit/is_text/text
    report_max: str | None = None  # C constant: how many rows `rows` holds

    @property
    def required_count(self) -> int:
        return sum(1 for a in self.args if not a.optional)


@dataclass
class Topic:
    topic: str
    title: str
    order: int
    path: pathlib.Path
    functions: list = field(default_factory=list)


@dataclass
class Catalogue:
    topics: list
    choices: dict
    methods: dict

    @property
    def functions(self):
        for t in self.topics:
            yield from t.functions


def _err(where: str, msg: str):
    raise CatalogueError(f"{where}: {msg}")


def _arg_from_table(t: dict, where: str) -> Arg:
    known = {"name", "label", "unit", "help", "type", "check", "optional",
             "default", "default_doc", "field"}
    extra = set(t) - known
    if extra:
        _err(where, f"unknown argument keys {sorted(extra)}")
    for k in ("name", "unit", "help"):
        if k not in t:
            _err(where, f"argument lacks '{k}'")
    return Arg(name=t["name"], label=t.get("label", t["name"]), unit=t["unit"],
               help=t["help"], type=t.get("type", "number"),
               check=t.get("check", "finite"),
               optional=bool(t.get("optional", False)),
               default=t.get("default"), default_doc=t.get("default_doc"),
               field=t.get("field"))


def load(directory: pathlib.Path) -> Catalogue:
    topics = []
    choices: dict = {}
    methods: dict = {}
    raw_functions = []
    for path in sorted(directory.glob("*.toml")):
        with open(path, "rb") as fh:
            try:
                doc = tomllib.load(fh)
            except tomllib.TOMLDecodeError as e:
                _err(path.name, f"TOML syntax: {e}")
        for k in ("topic", "title"):
            if k not in doc:
                _err(path.name, f"missing top-level '{k}'")
        topic = Topic(doc["topic"], doc["title"], int(doc.get("order", 100)), path)
        if any(t.topic == topic.topic for t in topics):
            _err(path.name, f"topic '{topic.topic}' used twice")
        topics.append(topic)
        for ch in doc.get("choice", []):
            where = f"{path.name}: choice '{ch.get('key')}'"
            if not C_IDENT.match(str(ch.get("key", ""))):
                _err(where, "key must be a C identifier")
            if ch["key"] in choices:
                _err(where, "choice key defined twice")
            vals = ch.get("value", [])
            if not vals:
                _err(where, "no values")
            for v in vals:
                for k in ("text", "c", "help"):
                    if k not in v:
                        _err(where, f"value lacks '{k}'")
                v.setdefault("aliases", [])
            choices[ch["key"]] = Choice(ch["key"], vals)
        for m in doc.get("methods", []):
            where = f"{path.name}: methods '{m.get('key')}'"
            if not C_IDENT.match(str(m.get("key", ""))):
                _err(where, "key must be a C identifier")
            if m["key"] in methods:
                _err(where, "methods key defined twice")
            if "from_name" not in m or not m.get("names"):
                _err(where, "needs from_name and names")
            methods[m["key"]] = Methods(m["key"], m["from_name"], m.get("name_of"),
                                        list(m["names"]))
        for f in doc.get("function", []):
            raw_functions.append((topic, path, f))

    by_id: dict = {}
    for topic, path, f in raw_functions:
        where = f"{path.name}: function '{f.get('name', '?')}'"
        known = {"name", "id", "summary", "returns", "category", "c", "adapter",
                 "locals", "result", "result_type", "method_used", "reason",
                 "range_note", "example", "notes", "arg", "args_from", "args_drop",
                 "rows_of", "columns", "report", "report_row", "report_max"}
        extra = set(f) - known
        if extra:
            _err(where, f"unknown keys {sorted(extra)}")
        for k in ("name", "id", "summary", "returns"):
            if k not in f:
                _err(where, f"missing '{k}'")
        if f["id"] in by_id or f["id"] in BUILTIN_IDS:
            _err(where, f"id '{f['id']}' used twice (or reserved)")
        by_id[f["id"]] = (topic, path, f)

    def resolve_args(fid: str, seen: tuple) -> list:
        topic, path, f = by_id[fid]
        where = f"{path.name}: function '{f['name']}'"
        args = []
        if "args_from" in f:
            src = f["args_from"]
            if src not in by_id:
                _err(where, f"args_from '{src}' is not a function id")
            if src in seen:
                _err(where, "args_from cycle")
            drop = set(f.get("args_drop", []))
            inherited = resolve_args(src, seen + (fid,))
            unknown = drop - {a.name for a in inherited}
            if unknown:
                _err(where, f"args_drop names unknown arguments {sorted(unknown)}")
            args = [copy.deepcopy(a) for a in inherited if a.name not in drop]
        for i, t in enumerate(f.get("arg", [])):
            args.append(_arg_from_table(t, f"{where} argument {i + 1}"))
        return args

    names_seen = set()
    for fid, (topic, path, f) in by_id.items():
        where = f"{path.name}: function '{f['name']}'"
        if "rows_of" in f:
            _table_function(f, where, by_id, resolve_args)
        fn = Function(name=f["name"], id=f["id"], summary=f["summary"],
                      returns=f["returns"], topic=topic.topic,
                      category=f.get("category", "Add-In"), c=f.get("c"),
                      adapter=f.get("adapter"),
                      locals=[dict(x) for x in f.get("locals", [{"var": "out"}])],
                      result=f.get("result", "out"),
                      result_type=f.get("result_type", "number"),
                      method_used=f.get("method_used"), reason=f.get("reason"),
                      range_note=f.get("range_note"), example=f.get("example"),
                      notes=f.get("notes"), rows_of=f.get("rows_of"),
                      report=f.get("report"), report_row=f.get("report_row"),
                      report_max=f.get("report_max"),
                      args=f["_args"] if "rows_of" in f else resolve_args(fid, ()))
        _validate_function(fn, where, choices, methods)
        up = fn.name.upper()
        if up in names_seen:
            _err(where, "display name used twice")
        names_seen.add(up)
        topic.functions.append(fn)
    topics.sort(key=lambda t: (t.order, t.topic))
    return Catalogue(topics, choices, methods)


def _table_function(f: dict, where: str, by_id: dict, resolve_args) -> None:
    """A `rows_of` entry: the named function applied row by row to columns.

    Its arguments are those of the row function; the ones listed in
    `columns` (required numbers) take a range each, one value per row (a
    single value is used for every row). The result is an array of the
    common shape; a row whose input the row function rejects shows, in its
    own cell, the error that function would show. Only the generated code is
    involved: no adapter, no C expression of its own."""
    src = f["rows_of"]
    if src not in by_id:
        _err(where, f"rows_of '{src}' is not a function id")
    _, _, row = by_id[src]
    if "rows_of" in row:
        _err(where, "rows_of must name a function that is not itself a table")
    if row.get("result_type", "number") != "number":
        _err(where, "rows_of needs a function with a number result")
    for k in ("c", "adapter", "locals", "result", "arg", "args_from", "args_drop",
              "method_used", "reason", "range_note"):
        if k in f:
            _err(where, f"'{k}' is not allowed with rows_of (the row function has it)")
    if f.get("result_type", "array") != "array":
        _err(where, "rows_of functions return an array (result_type \"array\")")
    f["result_type"] = "array"
    columns = f.get("columns")
    if not isinstance(columns, list) or not columns:
        _err(where, "rows_of needs 'columns', the argument names taking a column")
    args = [copy.deepcopy(a) for a in resolve_args(src, ())]
    by_name = {a.name: a for a in args}
    for name in columns:
        a = by_name.get(name)
        if a is None:
            _err(where, f"columns names '{name}', not an argument of '{src}'")
        if a.kind != "number" or a.optional:
            _err(where, f"column '{name}' must be a required number argument")
        a.column = True
    f["_args"] = args


def _validate_function(fn: Function, where: str, choices: dict, methods: dict):
    if not DISPLAY.match(fn.name):
        _err(where, "name must be 'TH.' followed by dot-separated upper-case words")
    if fn.name.upper() in ("TH.WHY", "TH.STATUS"):
        _err(where, "TH.WHY and TH.STATUS are generated for every function")
    if not IDENT.match(fn.id):
        _err(where, "id must be lowerCamelCase ([a-z][a-zA-Z0-9]*)")
    if fn.category not in CATEGORIES:
        _err(where, f"category must be one of {CATEGORIES}")
    if fn.rows_of is None and (fn.c is None) == (fn.adapter is None):
        _err(where, "give exactly one of 'c' and 'adapter'")
    if fn.adapter is not None and not C_IDENT.match(fn.adapter):
        _err(where, "adapter must be an identifier")
    if fn.result_type not in RESULT_TYPES:
        _err(where, f"result_type must be one of {RESULT_TYPES}")
    if fn.result_type == "array" and fn.adapter is None and fn.rows_of is None:
        if not (fn.report and fn.report_row and fn.report_max):
            _err(where, "array results need an adapter, rows_of, or report + report_row + report_max")
        if not re.match(r"^th_[a-z0-9_]+$", fn.report_row):
            _err(where, "report_row must be a th_* struct type")
    elif fn.report or fn.report_row or fn.report_max:
        _err(where, "report keys belong to array results without an adapter")
    for loc in fn.locals:
        if not C_IDENT.match(str(loc.get("var", ""))) or loc["var"] in RESERVED - IDL_ONLY:
            _err(where, f"bad local variable {loc}")
        loc.setdefault("type", "double")
        if not re.match(r"^(double|int|th_[a-z0-9_]+)$", loc["type"]):
            _err(where, f"local type must be double, int or th_*: {loc}")
    names = set()
    seen_optional = False
    for a in fn.args:
        aw = f"{where} argument '{a.name}'"
        if not IDENT.match(a.name) or a.name in RESERVED:
            _err(aw, "name must be an identifier that is no C++/IDL keyword")
        if a.name in names or a.name in {l["var"] for l in fn.locals}:
            _err(aw, "name used twice (arguments and locals share one scope)")
        names.add(a.name)
        if a.kind not in ("number", "choice", "method"):
            _err(aw, "type must be number, choice:<key> or method:<key>")
        if a.kind == "choice" and a.ref not in choices:
            _err(aw, f"unknown choice '{a.ref}'")
        if a.kind == "method" and a.ref not in methods:
            _err(aw, f"unknown methods '{a.ref}'")
        if a.check not in CHECKS:
            _err(aw, f"check must be one of {CHECKS}")
        if a.kind != "number" and a.check != "finite":
            _err(aw, "check applies to numbers only")
        if a.optional:
            seen_optional = True
            if a.default is None:
                if a.field is None:
                    _err(aw, "optional argument without default needs 'field'")
                if not a.default_doc:
                    _err(aw, "optional argument without default needs 'default_doc'")
            else:
                _check_default(a, aw, choices, methods)
        else:
            if seen_optional:
                _err(aw, "required argument after an optional one")
            if a.default is not None:
                _err(aw, "required argument with a default")
        if not a.help.strip().endswith("."):
            _err(aw, "help must be a sentence ending with '.'")
    if not fn.summary.strip().endswith("."):
        _err(where, "summary must be a sentence ending with '.'")


def _check_default(a: Arg, aw: str, choices: dict, methods: dict):
    d = a.default
    if a.kind == "number":
        if isinstance(d, str):
            if d != "inf" or a.check != "positive_or_inf":
                _err(aw, "a text default must be \"inf\" with check positive_or_inf")
        elif isinstance(d, (int, float)) and not isinstance(d, bool):
            if not math.isfinite(float(d)):
                _err(aw, "default must be finite (use \"inf\")")
        else:
            _err(aw, "number default must be a number or \"inf\"")
    elif a.kind == "choice":
        if choice_value(choices[a.ref], str(d)) is None:
            _err(aw, f"default '{d}' is not a value of choice '{a.ref}'")
    elif a.kind == "method":
        if not isinstance(d, str):
            _err(aw, "method default must be a method name")


def normalise(text: str) -> str:
    """The matching rule shared with the C++ runtime and the library:
    case-insensitive, '-', '_', '.' and spaces ignored."""
    return re.sub(r"[-_. ]", "", text).lower()


def choice_value(ch: Choice, text: str):
    want = normalise(text)
    for v in ch.values:
        if want in [normalise(x) for x in [v["text"], *v["aliases"]]]:
            return v
    return None


def arg_doc(a: Arg, catalogue: Catalogue) -> str:
    """Full help of one argument: the sentence, accepted texts, unit, default."""
    parts = [a.help.strip()]
    if a.column:
        parts.append("A column (range) with one value per row; a single value "
                     "is used for every row.")
    if a.kind == "choice":
        ch = catalogue.choices[a.ref]
        parts.append("One of: " + "; ".join(
            f"\"{v['text']}\" {v['help']}" for v in ch.values) + ".")
    elif a.kind == "method":
        parts.append("Known names: " + ", ".join(catalogue.methods[a.ref].names) + ".")
    if a.unit not in ("text",):
        parts.append(f"Unit: {a.unit}.")
    if a.optional:
        d = a.default_doc if a.default_doc else _fmt_default(a.default)
        parts.append(f"Optional, default {d}.")
    return " ".join(parts)


def _fmt_default(d) -> str:
    if isinstance(d, str):
        return f"\"{d}\""
    if isinstance(d, float) and d.is_integer():
        return str(int(d))
    return str(d)
