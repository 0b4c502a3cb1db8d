#!/usr/bin/python3
"""Write workbooks/demo.fods, the Calc demo workbook (flat ODF: diffs well,
formulas stored by programmatic name, no cached values, so LibreOffice
computes everything on load).

    /usr/bin/python3 workbooks/demo_generate.py          # rewrites demo.fods
    /usr/bin/python3 workbooks/demo_generate.py OUT      # writes OUT instead

Scenario (invented for the demo): process water warmed in a single
stainless-steel tube with condensing steam outside. Water properties are
typed in as constants near 30 C (approximate, demo only).
"""
from __future__ import annotations

import pathlib
import sys

HERE = pathlib.Path(__file__).resolve().parent
sys.path.insert(0, str(HERE.parent / "addin" / "tools"))

import fods  # noqa: E402
from fods import F, Styled  # noqa: E402
from fods import PREFIX as P  # noqa: E402

# Inputs: (key, label, value, unit, note). Cells are referenced by key.
INPUTS = [
    ("mdot", "mass flow", 0.25, "kg/s", ""),
    ("d_i", "inside diameter", 0.021, "m", ""),
    ("d_o", "outside diameter", 0.025, "m", ""),
    ("length", "tube length", 8.0, "m", ""),
    ("rough", "relative roughness eps/D", 2e-5, "-", "drawn tube"),
    ("k_wall", "wall conductivity", 16.0, "W/(m K)", "stainless steel"),
    ("t_in", "water inlet temperature", 288.15, "K", "15 C"),
    ("t_steam", "steam temperature", 383.15, "K", "110 C, condensing"),
    ("h_o", "steam-side coefficient", 8000.0, "W/(m2 K)", "assumed"),
    ("rho", "water density", 995.7, "kg/m3", "approx. at 30 C"),
    ("mu", "water viscosity", 0.000797, "Pa s", "approx. at 30 C"),
    ("k", "water conductivity", 0.615, "W/(m K)", "approx. at 30 C"),
    ("cp", "water specific heat", 4178.0, "J/(kg K)", "approx. at 30 C"),
    ("t_target", "wanted outlet temperature", 333.15, "K", "60 C"),
    ("p_in", "water inlet pressure", 300000.0, "Pa", "absolute"),
]

# The whole tube in one call (TH.TUBE.*): water properties from IAPWS-IF97
# iterated at the mean bulk temperature, wall temperature iterated for the
# property correction, steam outside through h_o and the wall.
TUBE = ('"water";{t_in};{p_in};{mdot};{d_i};{length};"outside";{t_steam};{rough}*{d_i};'
        '"auto";"one-shot";"circle";0;{h_o};{k_wall};({d_o}-{d_i})/2')

# Results: (key, label, formula template, unit, display name for TH.STATUS or
# None for a plain Calc formula). {key} is replaced by the cell reference.
RESULTS = [
    ("re", "Reynolds number", "REYNOLDSMASSFLOW({mdot};{d_i};{mu})", "-", "TH.REYNOLDS.MASSFLOW"),
    ("pr", "Prandtl number", "PRANDTL({cp};{mu};{k})", "-", "TH.PRANDTL"),
    ("regime", "flow regime", "REGIME({re})", "", "TH.REGIME"),
    ("l_d", "L/D", "={length}/{d_i}", "-", None),
    ("entry", "entry state at the outlet", 'ENTRYSTATE({re};{pr};{l_d};"T")', "", "TH.ENTRY.STATE"),
    ("nu", "Nusselt number (automatic)", 'NUSSELTAUTO({re};{pr};{l_d};"T")', "-", "TH.NUSSELT.AUTO"),
    ("why", "method chosen", 'WHY("TH.NUSSELT.AUTO";{re};{pr};{l_d};"T")', "", None),
    ("nu_g", "Nusselt, Gnielinski", 'NUSSELT("Gnielinski";{re};{pr};{l_d};"T")', "-", "TH.NUSSELT"),
    ("nu_db", "Nusselt, Dittus-Boelter", 'NUSSELT("Dittus-Boelter";{re};{pr})', "-", "TH.NUSSELT"),
    ("h_i", "inside coefficient h", "HFROMNUSSELT({nu};{k};{d_i})", "W/(m2 K)", "TH.H.FROM.NUSSELT"),
    ("f", "Darcy friction factor", "FRICTIONAUTO({re};{rough})", "-", "TH.FRICTION.AUTO"),
    ("dp", "pressure drop", "PRESSUREDROPMASSFLOW({mdot};{d_i};{length};{rho};{mu};{rough})",
     "Pa", "TH.PRESSURE.DROP.MASSFLOW"),
    ("ua", "overall conductance UA", "UATUBE({h_i};{d_i};{d_o};{k_wall};{length};{h_o})",
     "W/K", "TH.UA.TUBE"),
    ("t_out", "water outlet temperature", "OUTLETTEMPWALL({t_in};{t_steam};{ua};{mdot};{cp})",
     "K", "TH.OUTLET.TEMP.WALL"),
    ("t_out_c", "water outlet temperature", "={t_out}-273.15", "C", None),
    ("q", "heat rate", "HEATRATE({mdot};{cp};{t_in};{t_out})", "W", "TH.HEAT.RATE"),
    ("lmtd", "log-mean temperature difference", "LMTD({t_steam}-{t_in};{t_steam}-{t_out})",
     "K", "TH.LMTD"),
    ("check", "check: UA LMTD / q", "={ua}*{lmtd}/{q}", "-", None),
    ("l_need", "length for the wanted outlet", "LENGTHFOROUTLETWALL({t_in};{t_target};{t_steam};{ua}/{length};{mdot};{cp})",
     "m", "TH.LENGTH.FOR.OUTLET.WALL"),
    ("tube_t_out", "whole tube: outlet temperature", "TUBETOUT(" + TUBE + ")", "K", "TH.TUBE.TOUT"),
    ("tube_q", "whole tube: heat rate", "TUBEDUTY(" + TUBE + ")", "W", "TH.TUBE.DUTY"),
    ("tube_h", "whole tube: inside coefficient h", "TUBEH(" + TUBE + ")", "W/(m2 K)", "TH.TUBE.H"),
    ("tube_dp", "whole tube: pressure drop", "TUBEDP(" + TUBE + ")", "Pa", "TH.TUBE.DP"),
    ("tube_method", "whole tube: Nusselt method", "TUBEMETHOD(" + TUBE + ")", "", "TH.TUBE.METHOD"),
    ("tube_iter", "whole tube: iterations", "TUBEITERATIONS(" + TUBE + ")", "-", "TH.TUBE.ITERATIONS"),
]

SWEEP_RE = [3000, 6000, 10000, 20000, 50000, 100000]
SWEEP_METHODS = ["Dittus-Boelter", "Gnielinski", "Petukhov"]

CAUTION = ["Caution: results size equipment that can scald, burst or freeze.",
           "Correlations scatter by +-10 to +-25 % against data: apply margins,",
           "follow local codes, and have designs reviewed by a qualified, licensed engineer.",
           "Demo data are invented; temperatures in kelvin."]


def build() -> dict:
    rows = [[Styled("tubeheat demo: warming process water with steam in one tube", "bold")],
            *[[Styled(line, "note")] for line in CAUTION],
            [],
            [Styled("input", "bold"), Styled("value", "bold"), Styled("unit", "bold"),
             Styled("note", "bold")]]
    cell = {}
    for key, label, value, unit, note in INPUTS:
        cell[key] = fods.ref(1, len(rows))
        rows.append([label, value, unit, note])
    rows.append([])
    rows.append([Styled("result", "bold"), Styled("value", "bold"), Styled("unit", "bold"),
                 Styled("TH.STATUS", "bold")])
    for key, label, template, unit, display in RESULTS:
        r = len(rows)
        cell[key] = fods.ref(1, r)
        expr = template.format(**cell)
        formula = f"of:{expr}" if expr.startswith("=") else f"of:={P}{expr}"
        status = None
        if display:
            args = expr[expr.index("(") + 1:-1]
            status = F(f'of:={P}STATUS("{display}";{args})')
        style = "num4" if unit not in ("",) else None
        value = Styled(F(formula), style) if style else F(formula)
        rows.append([label, value, unit or None, status])
    rows.append([])
    rows.append([Styled("Nusselt number, fully developed, Pr of the inputs", "bold")])
    rows.append([Styled("Re", "bold")] + [Styled(m, "bold") for m in SWEEP_METHODS]
                + [Styled("automatic", "bold"), Styled("regime", "bold")])
    for re_value in SWEEP_RE:
        r = len(rows)
        re_ref = fods.ref(0, r)
        row = [float(re_value)]
        for m in SWEEP_METHODS:
            row.append(Styled(F(f'of:={P}NUSSELT("{m}";{re_ref};{cell["pr"]})'), "num4"))
        row.append(Styled(F(f"of:={P}NUSSELTAUTO({re_ref};{cell['pr']})"), "num4"))
        row.append(F(f"of:={P}REGIME({re_ref})"))
        rows.append(row)
    rows.append([Styled("Values outside a correlation's range are still shown;", "note")])
    rows.append([Styled("TH.WHY tells which limit they exceed.", "note")])
    return {"Demo": rows}


def main() -> int:
    out = pathlib.Path(sys.argv[1]) if len(sys.argv) > 1 else HERE / "demo.fods"
    fods.write(out, build(), widths={"Demo": [2.7, 1.3, 1.0, 1.4, 1.1, 1.1]})
    print(f"wrote {out}")
    return 0


if __name__ == "__main__":
    sys.exit(main())
