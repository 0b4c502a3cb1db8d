"""Write flat ODF spreadsheets (.fods) from Python data, for test and demo
workbooks that diff well in git and carry no cached formula values (so
LibreOffice computes every formula on load).

A sheet is a list of rows; a cell is None (empty), a number, a str (text), or
F("of:=...") (a formula in ODF syntax: `;` between arguments, `[.B2]` for a
cell on the same sheet). Standard library only.
"""
from __future__ import annotations

import math
import pathlib
import sys
from xml.sax.saxutils import escape, quoteattr

sys.path.insert(0, str(pathlib.Path(__file__).resolve().parents[1] / "gen"))
from catalogue import SERVICE  # noqa: E402  (addin/gen/catalogue.py, the one place)

# How a saved workbook names every add-in call: the UNO service name, upper
# case, then the method id (e.g. ORG.TUBEHEAT.CALCFUNCTIONS.REYNOLDS).
PREFIX = SERVICE.upper() + "."


class F(str):
    """A formula cell, e.g. F("of:=ORG.TUBEHEAT.CALCFUNCTIONS.REYNOLDS([.B2];1;1;1)").
    matrix=(columns, rows) makes it an array formula over that block (the
    cells it covers must be left None)."""

    def __new__(cls, text, matrix=None):
        obj = super().__new__(cls, text)
        obj.matrix = matrix
        return obj


class Styled:
    """A cell with a style name (see HEAD styles): Styled(value, "bold")."""

    def __init__(self, value, style: str):
        self.value, self.style = value, style


def col_name(i: int) -> str:
    s = ""
    i += 1
    while i:
        i, r = divmod(i - 1, 26)
        s = chr(65 + r) + s
    return s


def ref(col: int, row: int) -> str:
    """ODF reference to a cell on the same sheet; col and row from 0."""
    return f"[.{col_name(col)}{row + 1}]"


HEAD = """<?xml version="1.0" encoding="UTF-8"?>
<office:document xmlns:office="urn:oasis:names:tc:opendocument:xmlns:office:1.0"
 xmlns:style="urn:oasis:names:tc:opendocument:xmlns:style:1.0"
 xmlns:text="urn:oasis:names:tc:opendocument:xmlns:text:1.0"
 xmlns:table="urn:oasis:names:tc:opendocument:xmlns:table:1.0"
 xmlns:fo="urn:oasis:names:tc:opendocument:xmlns:xsl-fo-compatible:1.0"
 xmlns:of="urn:oasis:names:tc:opendocument:xmlns:of:1.2"
 xmlns:number="urn:oasis:names:tc:opendocument:xmlns:datastyle:1.0"
 office:version="1.3" office:mimetype="application/vnd.oasis.opendocument.spreadsheet">
 <office:automatic-styles>
  <number:number-style style:name="N4">
   <number:number number:decimal-places="4" number:min-decimal-places="0" number:min-integer-digits="1"/>
  </number:number-style>
  <style:style style:name="num4" style:family="table-cell" style:data-style-name="N4"/>
  <style:page-layout style:name="pm1">
   <style:page-layout-properties style:scale-to-X="1" style:scale-to-Y="1" style:print-orientation="landscape" fo:page-width="11in" fo:page-height="8.5in"/>
  </style:page-layout>
  <style:style style:name="ta1" style:family="table" style:master-page-name="Default">
   <style:table-properties table:display="true"/>
  </style:style>
  <style:style style:name="bold" style:family="table-cell">
   <style:text-properties fo:font-weight="bold"/>
  </style:style>
  <style:style style:name="note" style:family="table-cell">
   <style:text-properties fo:font-style="italic"/>
  </style:style>
  <style:style style:name="wide" style:family="table-column">
   <style:table-column-properties style:column-width="1.6in"/>
  </style:style>
 </office:automatic-styles>
 <office:master-styles>
  <style:master-page style:name="Default" style:page-layout-name="pm1"/>
 </office:master-styles>
 <office:body>
  <office:spreadsheet>
"""
TAIL = """  </office:spreadsheet>
 </office:body>
</office:document>
"""


def _cell(value) -> str:
    style = ""
    if isinstance(value, Styled):
        style = f' table:style-name="{value.style}"'
        value = value.value
    if value is None:
        return f"<table:table-cell{style}/>"
    if isinstance(value, F):
        span = ""
        if value.matrix:
            span = (f' table:number-matrix-columns-spanned="{value.matrix[0]}"'
                    f' table:number-matrix-rows-spanned="{value.matrix[1]}"')
        return f"<table:table-cell{style} table:formula={quoteattr(str(value))}{span}/>"
    return literal_cell(style, value)


def literal_cell(attrs: str, value, extra: str = "") -> str:
    """A number or text cell (shared with workbooks/tools/odfsheet.py):
    `attrs` are the cell's attributes, `extra` XML placed before the text
    (e.g. a chart frame). Numbers are written with repr, so they round-trip
    exactly; text may hold several lines."""
    if isinstance(value, bool):
        raise TypeError("booleans are not used in these workbooks")
    if isinstance(value, (int, float)):
        v = float(value)
        if not math.isfinite(v):
            raise ValueError("non-finite cell value")
        text = repr(v)
        return (f'<table:table-cell{attrs} office:value-type="float" office:value="{text}">'
                f"{extra}<text:p>{text}</text:p></table:table-cell>")
    lines = "".join(f"<text:p>{escape(line)}</text:p>" for line in str(value).split("\n"))
    return (f'<table:table-cell{attrs} office:value-type="string">'
            f"{extra}{lines}</table:table-cell>")


def _column_styles(widths) -> str:
    return "".join(
        f'  <style:style style:name="co{i}" style:family="table-column">'
        f'<style:table-column-properties style:column-width="{w}in"/></style:style>\n'
        for i, w in enumerate(widths))


def render(sheets: dict, widths: dict | None = None) -> str:
    """sheets: name -> rows; widths: name -> column widths in inches (the
    first sheet with widths defines them; others use 1.6 in)."""
    widths = widths or {}
    all_widths = next(iter(widths.values()), [])
    head = HEAD.replace(" </office:automatic-styles>",
                        _column_styles(all_widths) + " </office:automatic-styles>")
    out = [head]
    for name, rows in sheets.items():
        width = max((len(r) for r in rows), default=1)
        out.append(f'   <table:table table:name={quoteattr(name)} table:style-name="ta1">\n')
        if name in widths:
            for i in range(len(widths[name])):
                out.append(f'    <table:table-column table:style-name="co{i}"/>\n')
            rest = width - len(widths[name])
            if rest > 0:
                out.append(f'    <table:table-column table:style-name="wide" '
                           f'table:number-columns-repeated="{rest}"/>\n')
        else:
            out.append(f'    <table:table-column table:style-name="wide" '
                       f'table:number-columns-repeated="{width}"/>\n')
        for r in rows:
            cells = "".join(_cell(v) for v in r) or "<table:table-cell/>"
            out.append(f"    <table:table-row>{cells}</table:table-row>\n")
        out.append("   </table:table>\n")
    out.append(TAIL)
    return "".join(out)


def write(path, sheets: dict, widths: dict | None = None) -> None:
    with open(path, "w", encoding="utf-8") as fh:
        fh.write(render(sheets, widths))
