"""Template: a viscous-oil cooler tube in laminar flow, with entry effects
and the viscosity correction.

Scenario (invented demo data): a light process oil is cooled from 85 C in a
single 10 mm tube, 6 m long, whose wall is held near 35 C by cooling water
outside (taken as a uniform wall temperature). The oil's properties are the
user's own data at two temperatures; the sheet interpolates them (linear in
T for density, heat capacity and conductivity, ln(viscosity) linear in T).

Chain: properties at the mean bulk temperature (three passes), viscosity at
the wall for mu/mu_wall, Re, Pr, the laminar mean Nusselt number by the
design method the user names (Sieder-Tate laminar by default: it carries the
viscosity correction), UA and the outlet temperature; a comparison of the
laminar entry methods; the bulk temperature along the tube from the mean
coefficient over 0..x.
"""
from template import KELVIN, TableCol, Template

POINTS = 20
# Laminar methods compared, with the entry problem each one was built for.
METHODS = [
    ("Sieder-Tate laminar", "combined"),
    ("Hausen", "thermal"),
    ("Shah", "thermal"),
    ("Graetz exact", "thermal"),
    ("Gnielinski laminar", "combined"),
    ("combined entry numeric", "combined"),
    ("laminar developed", "thermal"),
]

PROPS = [  # key, label, value at point 1, value at point 2, unit, format
    ("t", "temperature of the data point", 293.15, 373.15, "K", "d2"),
    ("rho", "density", 872.0, 822.0, "kg/m3", None),
    ("cp", "specific heat", 1880.0, 2180.0, "J/(kg K)", None),
    ("mu", "viscosity", 0.065, 0.0055, "Pa s", None),
    ("k", "conductivity", 0.134, 0.127, "W/(m K)", None),
]


def interp(prop: str, at: str) -> str:
    """Linear interpolation of prop at temperature key `at` (log-linear for mu)."""
    frac = f"({{{at}}}-{{t1}})/({{t2}}-{{t1}})"
    if prop == "mu":
        return f"=EXP(LN({{mu1}})+(LN({{mu2}})-LN({{mu1}}))*{frac})"
    return f"={{{prop}1}}+({{{prop}2}}-{{{prop}1}})*{frac}"


def build() -> Template:
    t = Template(
        stem="oil_cooler_laminar", sheet="OilCooler",
        title="Viscous-oil cooler tube in laminar flow: entry effects and viscosity correction",
        scenario=("a light process oil is cooled from 85 C in one 10 mm tube, 6 m long, whose "
                  "wall is held near 35 C by cooling water outside (taken as a uniform wall "
                  "temperature). The oil data at 20 C and 100 C are the user's own (here "
                  "invented)."),
        checks=("property interpolation, every pass, mu/mu_wall, Re, Pr, Nu, h, UA, outlet "
                "temperature and heat rate against Python interpolation plus libtubeheat called "
                "directly; each row of the method comparison and of the temperature profile; "
                "every status cell ok or range."))
    t.head()

    t.section("Inputs: the oil (your data at two temperatures)",
              columns=["", "oil property", "point 1", "point 2", "unit", "", "note"])
    for key, label, v1, v2, unit, fmt in PROPS:
        t.custom_row({0: ("input", "tag", None, None), 1: (label, "label", None, None),
                      2: (v1, "input", fmt, f"{key}1"), 3: (v2, "input", fmt, f"{key}2"),
                      4: (unit, "unit", None, None)})
    t.custom_row({1: ("temperature of the data point in degC", "label", None, None),
                  2: (f"={{t1}}-{KELVIN}", "degc", "d2", "t1_c"),
                  3: (f"={{t2}}-{KELVIN}", "degc", "d2", "t2_c"), 4: ("degC", "unit", None, None)})

    t.section("Inputs: tube and flow")
    t.input("d_i", "inside diameter", 0.010, "m")
    t.input("length", "cooled length", 6.0, "m")
    t.input("mdot", "oil mass flow", 0.012, "kg/s")
    t.input("t_in", "oil inlet temperature", 358.15, "K", degc=True)
    t.input("t_wall", "wall temperature (uniform)", 308.15, "K", degc=True,
            note="cooling-water side assumed strong")
    t.input("method", "design Nusselt method", "Sieder-Tate laminar", "text",
            note="any TH.NUSSELT method name")
    t.input("entry", "entry problem for the design method", "combined", "text",
            note="thermal: velocity developed first")

    t.section("Derived")
    t.calc("l_d", "L/D", "={length}/{d_i}", "-", fmt="int")
    t.calc("mu_w", "oil viscosity at the wall temperature", interp("mu", "t_wall"), "Pa s",
           fmt="sci")
    t.flag("data_range", "wall and inlet within the data temperatures",
           '=IF(AND(MIN({t_wall};{t_in})>={t1}; MAX({t_wall};{t_in})<={t2}); "yes"; '
           '"CHECK: extrapolated")', "interpolation only between the two points")

    t.passes("Property iteration (pass 1 at the inlet, then at the mean bulk temperature)",
             page_break=True)
    t.pass_row("t_prop", "property temperature", "={t_in}", "=({t_in}+{prev.t_out})/2", "K", "d3")
    for prop, label, unit, fmt in (("rho", "density", "kg/m3", "d1"),
                                   ("cp", "specific heat", "J/(kg K)", "d1"),
                                   ("mu", "viscosity", "Pa s", "sci"),
                                   ("k", "conductivity", "W/(m K)", "d4")):
        f = interp(prop, "t_prop")
        t.pass_row(prop, label, f, unit=unit, fmt=fmt)
    t.pass_row("pr", "Prandtl number", "=TH.PRANDTL({cp}; {mu}; {k})", unit="-", fmt="d1")
    t.pass_row("re", "Reynolds number", "=TH.REYNOLDS.MASSFLOW({mdot}; {d_i}; {mu})", unit="-",
               fmt="d1")
    t.pass_row("mu_ratio", "viscosity ratio mu/mu_wall", "={mu}/{mu_w}", unit="-", fmt="d4")
    t.pass_row("nu", "mean Nusselt number (design method)",
               '=TH.NUSSELT({method}; {re}; {pr}; {l_d}; "T"; "mean"; "cooling"; {entry}; '
               '{mu_ratio})', unit="-", fmt="d3")
    t.pass_row("h", "mean coefficient h", "=TH.H.FROM.NUSSELT({nu}; {k}; {d_i})",
               unit="W/(m2 K)", fmt="d2")
    t.pass_row("ua", "conductance UA = h pi D L", "={h}*PI()*{d_i}*{length}", unit="W/K",
               fmt="d4")
    t.pass_row("t_out", "oil outlet temperature",
               "=TH.OUTLET.TEMP.WALL({t_in}; {t_wall}; {ua}; {mdot}; {cp})", unit="K", fmt="d3")

    t.section("Results (last pass)")
    t.calc("t_out_r", "oil outlet temperature", "={t_out}", "K", degc=True, fmt="d2",
           key_result=True)
    t.calc("q", "heat rate into the oil (negative: removed)",
           "=TH.HEAT.RATE({mdot}; {cp}; {t_in}; {t_out})", "W", fmt="d1", key_result=True)
    t.calc("regime", "flow regime", "=TH.REGIME({re})", "", text=True)
    t.calc("entry_state", "entry state at the outlet",
           '=TH.ENTRY.STATE({re}; {pr}; {l_d}; "T")', "", text=True)
    t.calc("x_star", "inverse Graetz number at the outlet x* = L/(D Re Pr)",
           "=TH.GRAETZ.INVERSE({length}; {d_i}; {re}; {pr})", "-", fmt="d5")
    t.calc("l_th", "thermal entry length / D", '=TH.ENTRY.LENGTH.THERMAL({re}; {pr}; "T")', "-",
           fmt="int", note="compare with L/D")
    t.calc("dp", "pressure drop (developed laminar friction)",
           "=TH.PRESSURE.DROP.MASSFLOW({mdot}; {d_i}; {length}; {rho}; {mu})", "Pa", fmt="int",
           note="no viscosity correction on friction")
    t.iteration_check()

    t.section("Methods and warnings", columns=[])
    t.why("design Nusselt number", "nu")
    t.why("Reynolds number", "re")

    t.table("methods", [
        TableCol("name", "laminar method", "text", values=[m for m, _ in METHODS], role="label"),
        TableCol("entry", "entry problem", "text", values=[e for _, e in METHODS], role="small"),
        TableCol("nu", "mean Nu", "-",
                 '=TH.NUSSELT({@name}; {re}; {pr}; {l_d}; "T"; "mean"; "cooling"; {@entry}; '
                 '{mu_ratio})', fmt="d2"),
        TableCol("h", "h", "W/(m2 K)", "=TH.H.FROM.NUSSELT({@nu}; {k}; {d_i})", fmt="d1"),
        TableCol("t_out_c", "oil out", "degC",
                 f"=TH.OUTLET.TEMP.WALL({{t_in}}; {{t_wall}}; {{@h}}*PI()*{{d_i}}*{{length}}; "
                 f"{{mdot}}; {{cp}})-{KELVIN}", fmt="d2"),
        TableCol("st", "status", "",
                 '=TH.STATUS("TH.NUSSELT"; {@name}; {re}; {pr}; {l_d}; "T"; "mean"; "cooling"; '
                 '{@entry}; {mu_ratio})', fmt="status", role="status"),
    ], len(METHODS), title="Laminar methods compared at the conditions of the last pass",
        first_col=1,
        note=("Only Sieder-Tate laminar uses mu/mu_wall; the spread between the methods is part "
              "of the uncertainty. 'laminar developed' ignores the entry region."))

    x = "={length}*({#}+1)/" + str(POINTS)
    t.table("profile", [
        TableCol("x", "x", "m", x, fmt="d2"),
        TableCol("x_star", "x*", "-", "=TH.GRAETZ.INVERSE({@x}; {d_i}; {re}; {pr})", fmt="d5"),
        TableCol("nu", "mean Nu 0..x", "-",
                 '=TH.NUSSELT({method}; {re}; {pr}; {@x}/{d_i}; "T"; "mean"; "cooling"; {entry}; '
                 '{mu_ratio})', fmt="d3"),
        TableCol("h", "mean h 0..x", "W/(m2 K)", "=TH.H.FROM.NUSSELT({@nu}; {k}; {d_i})",
                 fmt="d1"),
        TableCol("t_b", "bulk", "K",
                 "=TH.OUTLET.TEMP.WALL({t_in}; {t_wall}; {@h}*PI()*{d_i}*{@x}; {mdot}; {cp})",
                 fmt="d2"),
        TableCol("t_b_c", "oil (bulk)", "degC", f"={{@t_b}}-{KELVIN}", fmt="d2"),
        TableCol("t_w_c", "wall", "degC", f"={{t_wall}}-{KELVIN}", fmt="d2"),
    ], POINTS, title="Oil temperature along the tube (design method, properties of the last pass)",
        page_break=True,
        note=("T_b(x) = T_w + (T_in - T_w) exp(-h_m(x) pi D x / (mdot cp)) with h_m(x) the mean "
              "coefficient over 0..x: the steep start is the entry region."))
    t.chart("Oil cooling along the tube", x="profile.x",
            ys=[("profile.t_b_c", {"symbols": True}), ("profile.t_w_c", {"dashed": True}),
                ("profile.h", {"secondary": True, "symbols": True})],
            x_title="distance from the inlet x [m]", y_title="temperature [degC]",
            y2_title="mean coefficient over 0..x [W/(m2 K)]")
    return t
