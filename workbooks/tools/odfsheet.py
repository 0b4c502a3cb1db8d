"""Flat ODF (.fods) writer for the template workbooks.

addin/tools/fods.py writes plain test sheets (cells, a few styles). Templates
that an engineer reads and prints need more, so this module adds, in the
same spirit (standard library only, no cached formula values, diffs well):

- cell styles by role (input tint, headings, wrapped notes, captions, a
  status display) combined with a number format;
- cells merged across columns, fixed row heights, manual page breaks;
- a page layout (A4 portrait, 100 %, our own header and footer);
- embedded charts: an office:chart document inline in a draw:frame anchored
  to a cell, with XY (scatter) series that read their data from sheet
  ranges, so the chart follows the formulas when an input changes.

Formulas arrive here already in ODF syntax (`of:=...`, `[.B2]`); the
template layer (template.py) builds them.
"""
from __future__ import annotations

import pathlib
import sys
from dataclasses import dataclass, field
from xml.sax.saxutils import escape, quoteattr

sys.path.insert(0, str(pathlib.Path(__file__).resolve().parents[2] / "addin" / "tools"))
import fods  # noqa: E402  (addin/tools/fods.py: the shared cell writer)

# ------------------------------------------------------------------ colours
# Our own palette, chosen for print legibility in colour and in grey.
INPUT_TINT = "#dcefe9"     # pale teal: cells the user types into
CAUTION_TINT = "#fbeee6"   # pale sand: the caution box
FLAG_TINT = "#f4c7b4"      # light terracotta: a status or check that needs a look
HEAD_RULE = "#3d5a6c"      # slate: rules under headings
CHART_FRAME = "#7d8f99"    # border of every chart area (chart_figure.py finds it)
SERIES_COLOURS = ["#1f5f8b", "#b5462a", "#4f7f3a", "#7a4f9a", "#8a6d1c"]

# ------------------------------------------------------------ number formats
# name -> (ODF data style XML body, description)
NUMBER_FORMATS = {
    "int": '<number:number number:decimal-places="0" number:min-integer-digits="1" number:grouping="true"/>',
    "d1": '<number:number number:decimal-places="1" number:min-integer-digits="1"/>',
    "d2": '<number:number number:decimal-places="2" number:min-integer-digits="1"/>',
    "d3": '<number:number number:decimal-places="3" number:min-integer-digits="1"/>',
    "d4": '<number:number number:decimal-places="4" number:min-integer-digits="1"/>',
    "d5": '<number:number number:decimal-places="5" number:min-integer-digits="1"/>',
    "sci": ('<number:scientific-number number:decimal-places="3" number:min-integer-digits="1" '
            'number:min-exponent-digits="2"/>'),
    "pct": '<number:number number:decimal-places="1" number:min-integer-digits="1"/><number:text>%</number:text>',
}


def _number_styles() -> str:
    out = []
    for name, body in NUMBER_FORMATS.items():
        if name == "pct":
            out.append(f'  <number:percentage-style style:name="N_{name}">{body}</number:percentage-style>\n')
        else:
            out.append(f'  <number:number-style style:name="N_{name}">{body}</number:number-style>\n')
    # TH.STATUS codes shown as words: 0 ok, 1 range (an extrapolation),
    # anything else "error <code>". The cell keeps the number.
    out.append('  <number:number-style style:name="N_st0" style:volatile="true">'
               '<number:text>ok</number:text></number:number-style>\n')
    out.append('  <number:number-style style:name="N_st1" style:volatile="true">'
               '<number:text>range</number:text></number:number-style>\n')
    out.append('  <number:number-style style:name="N_status"><number:text>error </number:text>'
               '<number:number number:decimal-places="0" number:min-integer-digits="1"/>'
               '<style:map style:condition="value()=0" style:apply-style-name="N_st0"/>'
               '<style:map style:condition="value()=1" style:apply-style-name="N_st1"/>'
               '</number:number-style>\n')
    return "".join(out)


# ---------------------------------------------------------------- cell roles
# role -> (table-cell-properties, text-properties, paragraph-properties)
ROLES = {
    "plain": ("", "", ""),
    "title": ('fo:wrap-option="wrap"', 'fo:font-size="14pt" fo:font-weight="bold" fo:color="#1d3441"', ""),
    "scenario": ('fo:wrap-option="wrap" style:vertical-align="top"', 'fo:font-style="italic"', ""),
    "text": ('fo:wrap-option="wrap" style:vertical-align="top"', "", ""),
    "caution": (f'fo:wrap-option="wrap" style:vertical-align="top" fo:background-color="{CAUTION_TINT}" '
                'fo:border="0.06pt solid #8a5a44" fo:padding="0.08cm"', 'fo:font-size="9pt"', ""),
    "section": (f'fo:wrap-option="wrap" fo:border-bottom="1.2pt solid {HEAD_RULE}" style:vertical-align="bottom"',
                'fo:font-size="11pt" fo:font-weight="bold" fo:color="#1d3441"', ""),
    "head": (f'fo:wrap-option="wrap" style:vertical-align="bottom" fo:border-bottom="0.5pt solid {HEAD_RULE}"',
             'fo:font-size="8.5pt" fo:font-weight="bold"', ""),
    "headc": (f'fo:wrap-option="wrap" style:vertical-align="bottom" fo:border-bottom="0.5pt solid {HEAD_RULE}"',
              'fo:font-size="8.5pt" fo:font-weight="bold"', 'fo:text-align="center"'),
    "tag": ("", 'fo:font-size="7.5pt" fo:color="#40606e"', ""),
    "label": ('fo:wrap-option="wrap" style:vertical-align="top"', "", ""),
    "input": (f'fo:background-color="{INPUT_TINT}" fo:border="0.5pt solid #9cc7bb"', "", ""),
    "inputtext": (f'fo:background-color="{INPUT_TINT}" fo:border="0.5pt solid #9cc7bb"', "", 'fo:text-align="start"'),
    "value": ("", "", ""),
    "key": ('fo:border="0.5pt solid #3d5a6c"', 'fo:font-weight="bold"', ""),
    "unit": ("", 'fo:font-size="8.5pt" fo:color="#303030"', ""),
    "degc": ("", 'fo:font-size="8.5pt" fo:color="#40606e"', ""),
    "note": ('fo:wrap-option="wrap" style:vertical-align="top"', 'fo:font-size="8pt" fo:color="#303030"', ""),
    "why": ('fo:wrap-option="wrap" style:vertical-align="top"', 'fo:font-size="8pt"', ""),
    "textresult": ('fo:wrap-option="wrap" style:vertical-align="top"', "", ""),
    "status": ("", 'fo:font-size="8pt"', 'fo:text-align="center"'),
    "flag": ("", 'fo:font-weight="bold"', 'fo:text-align="center"'),
    "small": ("", 'fo:font-size="8pt"', ""),
}
# Roles that get a conditional highlight (style:map to the named style
# "th_flag"): a status other than ok, a check that says CHECK.
CONDITIONS = {
    "status": "cell-content()!=0",
    "flag": 'cell-content()="CHECK"',
}


@dataclass
class Cell:
    """One cell: value is None, a number, a str (text) or Formula; role and
    fmt choose the style; span merges it with the cells to its right."""
    value: object = None
    role: str = "plain"
    fmt: str | None = None
    span: int = 1


class Formula(str):
    """A formula already in ODF syntax, e.g. Formula('of:=[.B2]*2')."""


@dataclass
class Series:
    label_cell: str      # "Sheet.B10" (the legend text)
    x_range: str         # "Sheet.A11:Sheet.A31"
    y_range: str
    secondary: bool = False
    dashed: bool = False
    symbols: bool = False
    line: bool = False   # in a bar chart: draw this series as a line


@dataclass
class Chart:
    title: str
    x_title: str
    y_title: str
    series: list
    width_cm: float = 17.0
    height_cm: float = 8.5
    y2_title: str | None = None
    x_log: bool = False
    kind: str = "scatter"          # "scatter" (XY) or "bar" (categories on x)
    categories: str | None = None  # bar: range of the category labels


@dataclass
class Row:
    cells: list = field(default_factory=list)
    page_break: bool = False
    height_cm: float | None = None
    chart: Chart | None = None     # anchored in column A of this row


@dataclass
class Sheet:
    name: str
    widths_in: list                 # column widths in inches
    rows: list = field(default_factory=list)
    title: str = ""                 # page header text


def quote_sheet(name: str) -> str:
    if all(c.isalnum() or c == "_" for c in name):
        return name
    return "'" + name.replace("'", "''") + "'"


# ------------------------------------------------------------------ styles
class _Styles:
    def __init__(self):
        self.cell: dict = {}
        self.rows: dict = {}

    def cell_style(self, role: str, fmt: str | None) -> str:
        if role not in ROLES:
            raise ValueError(f"unknown cell role {role!r}")
        if fmt is not None and fmt not in NUMBER_FORMATS and fmt != "status":
            raise ValueError(f"unknown number format {fmt!r}")
        key = (role, fmt)
        if key not in self.cell:
            self.cell[key] = f"c_{role}" + (f"_{fmt}" if fmt else "")
        return self.cell[key]

    def row_style(self, page_break: bool, height_cm: float | None) -> str | None:
        if not page_break and height_cm is None:
            return None
        key = (page_break, height_cm)
        if key not in self.rows:
            self.rows[key] = f"r{len(self.rows) + 1}"
        return self.rows[key]

    def xml(self, sheets) -> str:
        out = []
        for (role, fmt), name in self.cell.items():
            cellp, textp, parp = ROLES[role]
            data = f' style:data-style-name="N_{fmt}"' if fmt else ""
            body = ""
            if cellp:
                body += f"<style:table-cell-properties {cellp}/>"
            if parp:
                body += f"<style:paragraph-properties {parp}/>"
            if textp:
                body += f"<style:text-properties {textp}/>"
            if role in CONDITIONS:
                base = f"{quote_sheet(sheets[0].name)}.A1"
                body += (f'<style:map style:condition={quoteattr(CONDITIONS[role])} '
                         f'style:apply-style-name="th_flag" style:base-cell-address="{base}"/>')
            out.append(f'  <style:style style:name="{name}" style:family="table-cell" '
                       f'style:parent-style-name="Default"{data}>{body}</style:style>\n')
        for (page_break, height), name in self.rows.items():
            props = 'fo:break-before="page"' if page_break else ""
            if height is not None:
                props += f' style:row-height="{height:.3f}cm" style:use-optimal-row-height="false"'
            else:
                props += ' style:use-optimal-row-height="true"'
            out.append(f'  <style:style style:name="{name}" style:family="table-row">'
                       f"<style:table-row-properties {props.strip()}/></style:style>\n")
        return "".join(out)


NS = """xmlns:office="urn:oasis:names:tc:opendocument:xmlns:office:1.0"
 xmlns:style="urn:oasis:names:tc:opendocument:xmlns:style:1.0"
 xmlns:text="urn:oasis:names:tc:opendocument:xmlns:text:1.0"
 xmlns:table="urn:oasis:names:tc:opendocument:xmlns:table:1.0"
 xmlns:draw="urn:oasis:names:tc:opendocument:xmlns:drawing:1.0"
 xmlns:fo="urn:oasis:names:tc:opendocument:xmlns:xsl-fo-compatible:1.0"
 xmlns:xlink="http://www.w3.org/1999/xlink"
 xmlns:dc="http://purl.org/dc/elements/1.1/"
 xmlns:meta="urn:oasis:names:tc:opendocument:xmlns:meta:1.0"
 xmlns:svg="urn:oasis:names:tc:opendocument:xmlns:svg-compatible:1.0"
 xmlns:chart="urn:oasis:names:tc:opendocument:xmlns:chart:1.0"
 xmlns:of="urn:oasis:names:tc:opendocument:xmlns:of:1.2"
 xmlns:number="urn:oasis:names:tc:opendocument:xmlns:datastyle:1.0\""""


def _page_styles(footer: str) -> tuple:
    layout = ('  <style:page-layout style:name="pm1"><style:page-layout-properties '
              'fo:page-width="21cm" fo:page-height="29.7cm" style:print-orientation="portrait" '
              'fo:margin-top="1.2cm" fo:margin-bottom="1.2cm" fo:margin-left="1.6cm" '
              'fo:margin-right="1.4cm" style:scale-to="100%" style:print="objects charts drawings zero-values"/>'
              '<style:header-style><style:header-footer-properties fo:min-height="0.6cm" '
              'fo:margin-bottom="0.25cm"/></style:header-style>'
              '<style:footer-style><style:header-footer-properties fo:min-height="0.6cm" '
              'fo:margin-top="0.25cm"/></style:footer-style></style:page-layout>\n'
              '  <style:style style:name="ta1" style:family="table" style:master-page-name="TH">'
              '<style:table-properties table:display="true"/></style:style>\n')
    master = ('  <style:master-page style:name="TH" style:page-layout-name="pm1">'
              '<style:header><text:p><text:span text:style-name="T_hf">tubeheat template - '
              '<text:sheet-name>?</text:sheet-name></text:span></text:p></style:header>'
              f'<style:footer><text:p><text:span text:style-name="T_hf">{escape(footer)} - page '
              '<text:page-number>1</text:page-number></text:span></text:p></style:footer>'
              '</style:master-page>\n')
    return layout, master


# ------------------------------------------------------------------- charts
def _chart_xml(ch: Chart) -> str:
    styles = [
        '<style:style style:name="k_area" style:family="chart"><style:graphic-properties '
        f'draw:stroke="solid" svg:stroke-color="{CHART_FRAME}" svg:stroke-width="0.03cm" draw:fill="solid" '
        'draw:fill-color="#ffffff"/></style:style>',
        '<style:style style:name="k_title" style:family="chart"><style:text-properties '
        'fo:font-size="11pt" fo:font-weight="bold"/></style:style>',
        '<style:style style:name="k_axtitle" style:family="chart"><style:text-properties '
        'fo:font-size="9pt"/></style:style>',
        '<style:style style:name="k_legend" style:family="chart"><style:graphic-properties '
        'draw:stroke="none" draw:fill="none"/><style:text-properties fo:font-size="8.5pt"/></style:style>',
        '<style:style style:name="k_wall" style:family="chart"><style:graphic-properties '
        'draw:stroke="solid" svg:stroke-color="#b9c3c8" draw:fill="solid" draw:fill-color="#ffffff"/>'
        '</style:style>',
        '<style:style style:name="k_grid" style:family="chart"><style:graphic-properties '
        'svg:stroke-color="#dde3e6" svg:stroke-width="0.01cm"/></style:style>',
    ]
    # Axis numbers in the general format (not the 2-4 decimals of the cells).
    styles.append('<number:number-style style:name="KN"><number:number '
                  'number:min-integer-digits="1"/></number:number-style>')
    for name, log in (("k_x", ch.x_log), ("k_y", False)):
        styles.append(f'<style:style style:name="{name}" style:family="chart" '
                      'style:data-style-name="KN"><style:chart-properties '
                      f'chart:display-label="true" chart:logarithmic="{"true" if log else "false"}" '
                      'chart:link-data-style-to-source="false" '
                      'chart:tick-marks-major-outer="true"/><style:graphic-properties '
                      'svg:stroke-color="#404040"/><style:text-properties fo:font-size="8.5pt"/>'
                      '</style:style>')
    for i, s in enumerate(ch.series):
        colour = SERIES_COLOURS[i % len(SERIES_COLOURS)]
        stroke = "dash" if s.dashed else "solid"
        dash = ' draw:stroke-dash="k_dash"' if s.dashed else ""
        symbol = 'chart:symbol-type="automatic"' if s.symbols else 'chart:symbol-type="none"'
        if ch.kind == "bar" and not s.line:
            styles.append(f'<style:style style:name="k_s{i}" style:family="chart"><style:graphic-properties '
                          f'draw:stroke="none" draw:fill="solid" draw:fill-color="{colour}"/></style:style>')
            continue
        styles.append(f'<style:style style:name="k_s{i}" style:family="chart"><style:chart-properties '
                      f'{symbol} chart:symbol-width="0.18cm" chart:symbol-height="0.18cm"/>'
                      f'<style:graphic-properties draw:stroke="{stroke}"{dash} svg:stroke-width="0.05cm" '
                      f'svg:stroke-color="{colour}" draw:fill-color="{colour}"/></style:style>')
    dash_def = ('<office:styles><draw:stroke-dash draw:name="k_dash" draw:style="rect" draw:dots1="1" '
                'draw:dots1-length="0.2cm" draw:distance="0.12cm"/></office:styles>')
    series = []
    bar = ch.kind == "bar"
    for i, s in enumerate(ch.series):
        axis = "secondary-y" if s.secondary else "primary-y"
        cls = ("chart:line" if s.line else "chart:bar") if bar else "chart:scatter"
        domain = "" if bar else f'<chart:domain table:cell-range-address="{s.x_range}"/>'
        series.append(f'<chart:series chart:class="{cls}" chart:style-name="k_s{i}" '
                      f'chart:attached-axis="{axis}" chart:values-cell-range-address="{s.y_range}" '
                      f'chart:label-cell-address="{s.label_cell}">{domain}</chart:series>')
    categories = (f'<chart:categories table:cell-range-address="{ch.categories}"/>'
                  if bar and ch.categories else "")
    y2 = ""
    if ch.y2_title:
        y2 = ('<chart:axis chart:dimension="y" chart:name="secondary-y" chart:style-name="k_y">'
              f'<chart:title chart:style-name="k_axtitle"><text:p>{escape(ch.y2_title)}</text:p>'
              '</chart:title></chart:axis>')
    w, h = f"{ch.width_cm:.2f}cm", f"{ch.height_cm:.2f}cm"
    grid = '<chart:grid chart:class="major" chart:style-name="k_grid"/>'
    return (
        '<office:document office:version="1.3" '
        'office:mimetype="application/vnd.oasis.opendocument.chart">'
        f'{dash_def}<office:automatic-styles>{"".join(styles)}</office:automatic-styles>'
        f'<office:body><office:chart><chart:chart svg:width="{w}" svg:height="{h}" '
        f'chart:class="chart:{"bar" if bar else "scatter"}" chart:style-name="k_area">'
        f'<chart:title chart:style-name="k_title"><text:p>{escape(ch.title)}</text:p></chart:title>'
        '<chart:legend chart:legend-position="bottom" chart:style-name="k_legend"/>'
        '<chart:plot-area>'
        '<chart:axis chart:dimension="x" chart:name="primary-x" chart:style-name="k_x">'
        f'<chart:title chart:style-name="k_axtitle"><text:p>{escape(ch.x_title)}</text:p></chart:title>'
        f'{categories}{"" if bar else grid}</chart:axis>'
        '<chart:axis chart:dimension="y" chart:name="primary-y" chart:style-name="k_y">'
        f'<chart:title chart:style-name="k_axtitle"><text:p>{escape(ch.y_title)}</text:p></chart:title>'
        '<chart:grid chart:class="major" chart:style-name="k_grid"/></chart:axis>'
        f'{y2}{"".join(series)}<chart:wall chart:style-name="k_wall"/>'
        '</chart:plot-area></chart:chart></office:chart></office:body></office:document>')


def _chart_frame(ch: Chart, z: int) -> str:
    ranges = " ".join(f"{s.label_cell} {s.x_range} {s.y_range}" for s in ch.series)
    if ch.categories:
        ranges = f"{ch.categories} {ranges}"
    return (f'<draw:frame draw:z-index="{z}" svg:width="{ch.width_cm:.2f}cm" '
            f'svg:height="{ch.height_cm:.2f}cm" svg:x="0cm" svg:y="0.1cm">'
            f'<draw:object draw:notify-on-update-of-ranges="{ranges}">{_chart_xml(ch)}'
            '</draw:object></draw:frame>')


# -------------------------------------------------------------------- cells
def _cell_xml(c: Cell, styles: _Styles, extra: str = "") -> str:
    attrs = ""
    if c.role != "plain" or c.fmt:
        attrs += f' table:style-name="{styles.cell_style(c.role, c.fmt)}"'
    if c.span > 1:
        attrs += f' table:number-columns-spanned="{c.span}" table:number-rows-spanned="1"'
    v = c.value
    if v is None:
        body = extra
        return f"<table:table-cell{attrs}>{body}</table:table-cell>" if body else f"<table:table-cell{attrs}/>"
    if isinstance(v, Formula):
        return f"<table:table-cell{attrs} table:formula={quoteattr(str(v))}>{extra}</table:table-cell>"
    return fods.literal_cell(attrs, v, extra)


def render(sheets: list, footer: str, doc_title: str = "") -> str:
    styles = _Styles()
    body = []
    z = 0
    for sh in sheets:
        ncols = len(sh.widths_in)
        body.append(f'   <table:table table:name={quoteattr(sh.name)} table:style-name="ta1">\n')
        for i in range(ncols):
            body.append(f'    <table:table-column table:style-name="co_{sh.name}_{i}"/>\n')
        for r in sh.rows:
            used = sum(c.span for c in r.cells)
            if used > ncols:
                raise ValueError(f"sheet {sh.name}: a row is {used} columns wide, the sheet {ncols}")
            rs = styles.row_style(r.page_break, r.height_cm)
            rattr = f' table:style-name="{rs}"' if rs else ""
            parts = []
            cells = list(r.cells) or [Cell()]
            for j, c in enumerate(cells):
                extra = ""
                if j == 0 and r.chart is not None:
                    extra = _chart_frame(r.chart, z)
                    z += 1
                parts.append(_cell_xml(c, styles, extra))
                if c.span > 1:
                    parts.append(f'<table:covered-table-cell table:number-columns-repeated="{c.span - 1}"/>')
            body.append(f"    <table:table-row{rattr}>{''.join(parts)}</table:table-row>\n")
        body.append("   </table:table>\n")
    columns = "".join(
        f'  <style:style style:name="co_{sh.name}_{i}" style:family="table-column">'
        f'<style:table-column-properties style:column-width="{w:.3f}in"/></style:style>\n'
        for sh in sheets for i, w in enumerate(sh.widths_in))
    layout, master = _page_styles(footer)
    cell_styles = styles.xml(sheets)
    meta = ""
    if doc_title:
        meta = f" <office:meta><dc:title>{escape(doc_title)}</dc:title></office:meta>\n"
    return (
        '<?xml version="1.0" encoding="UTF-8"?>\n'
        f'<office:document {NS}\n office:version="1.3" '
        'office:mimetype="application/vnd.oasis.opendocument.spreadsheet">\n'
        f"{meta}"
        " <office:styles>\n"
        '  <style:style style:name="Default" style:family="table-cell">'
        '<style:table-cell-properties style:vertical-align="top"/>'
        '<style:text-properties fo:font-size="9.5pt"/></style:style>\n'
        f'  <style:style style:name="th_flag" style:family="table-cell" style:parent-style-name="Default">'
        f'<style:table-cell-properties fo:background-color="{FLAG_TINT}"/>'
        '<style:text-properties fo:font-weight="bold"/></style:style>\n'
        " </office:styles>\n"
        " <office:automatic-styles>\n"
        f"{_number_styles()}{columns}{cell_styles}{layout}"
        '  <style:style style:name="T_hf" style:family="text"><style:text-properties '
        'fo:font-size="8pt" fo:color="#40606e"/></style:style>\n'
        " </office:automatic-styles>\n"
        f" <office:master-styles>\n{master} </office:master-styles>\n"
        " <office:body>\n  <office:spreadsheet>\n"
        + "".join(body) +
        "  </office:spreadsheet>\n </office:body>\n</office:document>\n")
