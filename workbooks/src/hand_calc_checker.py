"""Template: a checker for a hand calculation.

The engineer types the case exactly as the hand calculation used it
(geometry, flow, temperatures, the property values they looked up, the
methods they meant to use) and then their own intermediate results (Re, Pr,
f, Nu, h, T_out, q). The sheet computes the same chain with the TH.
functions beside them and flags every relative difference larger than the
tolerance. The first flag from the top is where the two calculations part.

Demo values (invented): water warmed in a 16 mm tube, 3 m long, running
through a hot-oil bath at 80 C (taken as a uniform wall temperature). The
"hand" values typed here used Dittus-Boelter for Nu, while the method cell
asks for Gnielinski: Nu and h are flagged, Re, Pr and f agree, and the
difference shrinks downstream (T_out, q) below the tolerance. Type
"Dittus-Boelter" into the method cell and every row agrees.
"""
from template import KELVIN, TableCol, Template

# key, quantity, tool formula, your (hand) value, unit, number format
ROWS = [
    ("re", "Reynolds number Re", "=TH.REYNOLDS.MASSFLOW({mdot}; {d_i}; {mu})", 11940.0, "-", "d1"),
    ("pr", "Prandtl number Pr", "=TH.PRANDTL({cp}; {mu}; {k})", 5.48, "-", "d4"),
    ("f", "Darcy friction factor f", "=TH.FRICTION({f_method}; {tool_re}; {rel_rough})", 0.0300,
     "-", "d5"),
    ("nu", "Nusselt number Nu",
     '=TH.NUSSELT({nu_method}; {tool_re}; {tool_pr}; {l_d_nu}; "T"; "mean"; "heating"; '
     '"combined"; 1; {rel_rough})', 82.9, "-", "d3"),
    ("h", "heat transfer coefficient h", "=TH.H.FROM.NUSSELT({tool_nu}; {k}; {d_i})", 3160.0,
     "W/(m2 K)", "d1"),
    ("t_out", "outlet temperature T_out",
     "=TH.OUTLET.TEMP.WALL({t_in}; {t_wall}; {tool_h}*PI()*{d_i}*{length}; {mdot}; {cp})", 328.0,
     "K", "d3"),
    ("q", "heat rate q", "=TH.HEAT.RATE({mdot}; {cp}; {t_in}; {tool_t_out})", 20000.0, "W", "d1"),
]


def build() -> Template:
    t = Template(
        stem="hand_calc_checker", sheet="HandCheck",
        title="Hand-calculation checker: your intermediate values beside the tool's",
        scenario=("water warmed in a 16 mm tube, 3 m long, running through a hot-oil bath at "
                  "80 C (uniform wall temperature). The hand values typed below used "
                  "Dittus-Boelter for Nu while the method cell asks for Gnielinski, so Nu and "
                  "h are flagged; type Dittus-Boelter into the method cell and every row "
                  "agrees."),
        checks=("each tool value against libtubeheat called directly, each relative difference "
                "and each verdict (agrees / CHECK) against the same comparison done in Python; "
                "temperatures compared on the rise T_out - T_in."))
    t.head()
    t.text("Temperatures are compared on the temperature rise T_out - T_in: a relative "
           "difference in kelvin would hide a real error. Leave a 'yours' cell empty to skip "
           "that row.", "note")

    t.section("Inputs: the case, as the hand calculation took it")
    t.input("d_i", "inside diameter", 0.016, "m")
    t.input("length", "heated length", 3.0, "m")
    t.input("mdot", "water mass flow", 0.12, "kg/s")
    t.input("t_in", "water inlet temperature", 288.15, "K", degc=True)
    t.input("t_wall", "wall temperature (uniform)", 353.15, "K", degc=True, note="bath temperature")
    t.input("rho", "density used", 995.0, "kg/m3", "looked up near 30 C")
    t.input("cp", "specific heat used", 4180.0, "J/(kg K)")
    t.input("mu", "viscosity used", 0.00080, "Pa s")
    t.input("k", "conductivity used", 0.610, "W/(m K)")
    t.input("rel_rough", "relative roughness eps/D", 0.0, "-", "0 = smooth")
    t.input("nu_method", "Nusselt method", "Gnielinski", "text", "any TH.NUSSELT method name")
    t.input("f_method", "friction method", "Petukhov", "text", "any TH.FRICTION method name")
    t.input("l_d_nu", "L/D used for Nu", "inf", "-", "inf = fully developed, or a number")
    t.input("tol", "tolerance on the relative difference", 0.02, "-", "0.02 = 2 %", fmt="pct")

    t.section("Comparison", columns=["", "quantity", "tool", "yours", "unit", "rel. diff.",
                                     "verdict"])
    for key, label, formula, yours, unit, fmt in ROWS:
        you, tool = f"{{you_{key}}}", f"{{tool_{key}}}"
        if key == "t_out":
            diff = (f"=IF(ISBLANK({you}); \"\"; (({you}-{{t_in}})-({tool}-{{t_in}}))"
                    f"/({tool}-{{t_in}}))")
        else:
            diff = f'=IF(ISBLANK({you}); ""; ({you}-{tool})/{tool})'
        verdict = (f'=IF(ISBLANK({you}); "not typed"; IF(ABS({{diff_{key}}})<={{tol}}; '
                   f'"agrees"; "CHECK"))')
        t.custom_row({0: ("check", "tag", None, None), 1: (label, "label", None, None),
                      2: (formula, "value", fmt, f"tool_{key}"),
                      3: (yours, "input", None, f"you_{key}"),
                      4: (unit, "unit", None, None),
                      5: (diff, "value", "pct", f"diff_{key}"),
                      6: (verdict, "flag", None, f"verdict_{key}")})
    t.calc("t_out_c", "tool outlet temperature in degC", f"={{tool_t_out}}-{KELVIN}", "degC",
           fmt="d2")

    t.section("Methods and warnings of the tool's values", columns=[])
    t.why("Nusselt number", "tool_nu")
    t.why("friction factor", "tool_f")
    t.why("outlet temperature", "tool_t_out")

    names = [label.rsplit(" ", 1)[-1] for _, label, *_ in ROWS]
    t.table("bars", [
        TableCol("name", "quantity", "", values=names, role="label"),
        TableCol("diff", "|difference|", "%",
                 values=[f'=IF(ISBLANK({{you_{k}}}); 0; ABS({{diff_{k}}})*100)' for k, *_ in ROWS],
                 fmt="d2"),
        TableCol("tol", "tolerance", "%", values=["={tol}*100"] * len(ROWS), fmt="d2"),
    ], len(ROWS), title="Differences at a glance", first_col=1, page_break=True)
    t.chart("Relative difference of each hand value from the tool", x="bars.name",
            ys=[("bars.diff", {}), ("bars.tol", {"line": True, "dashed": True})],
            x_title="quantity", y_title="|difference| [%]", kind="bar")
    return t
