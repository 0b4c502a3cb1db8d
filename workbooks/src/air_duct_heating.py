"""Template: a rectangular duct heating air, with properties of dry air and
the hydraulic diameter.

Scenario (invented demo data): process air for a drying line is warmed in
an 8 m run of 300 x 150 mm galvanised duct whose walls are held at 150 C by
a steam jacket. How warm does the air leave, what does the duct transfer,
what does it cost in pressure drop, and how do the coefficient and the
pressure drop change with the air flow?

Chain: hydraulic diameter, flow area and perimeter of the rectangle; dry-air
properties (TH.AIR.*) at the mean bulk temperature and the inlet pressure,
three passes; Re on the hydraulic diameter; automatic Nusselt choice with
the gas temperature-ratio correction and the duct shape (used by laminar
flow); UA = h P L; outlet temperature, duty, friction and pressure drop;
the whole-tube solver as a cross-check; a flow sweep with its chart.
"""
from template import KELVIN, TableCol, Template

FLOWS = [0.005, 0.01, 0.02, 0.04, 0.08, 0.15, 0.25, 0.4, 0.6, 1.0]   # kg/s


def build() -> Template:
    t = Template(
        stem="air_duct_heating", sheet="AirDuct",
        title="Rectangular duct heating air: outlet temperature, duty, pressure drop, "
              "h versus flow",
        scenario=("process air for a drying line is warmed in an 8 m run of 300 x 150 mm "
                  "galvanised duct whose walls are held at 150 C by a steam jacket; the air "
                  "enters at 15 C and 1.1 bar."),
        checks=("hydraulic diameter against 2ab/(a+b); air properties, Re, Nu, h, UA, outlet "
                "temperature, duty and pressure drop of every pass against libtubeheat called "
                "directly; the flow sweep row by row; UA LMTD = q closes; the solver cells "
                "against the library; every status cell ok or range."))
    t.head()

    t.section("Inputs")
    t.input("side_a", "duct side a (inside)", 0.30, "m")
    t.input("side_b", "duct side b (inside)", 0.15, "m")
    t.input("length", "heated length", 8.0, "m")
    t.input("rough", "inside roughness (absolute)", 1.5e-4, "m", "galvanised sheet, typical")
    t.input("mdot", "air mass flow", 0.25, "kg/s")
    t.input("p_in", "air pressure (absolute)", 110000.0, "Pa")
    t.input("t_in", "air inlet temperature", 288.15, "K", degc=True)
    t.input("t_wall", "duct wall temperature", 423.15, "K", degc=True, note="steam jacket")

    t.section("Derived geometry")
    t.calc("d_h", "hydraulic diameter 2ab/(a+b)",
           "=TH.HYDRAULIC.DIAMETER.RECT({side_a}; {side_b})", "m", fmt="d4", key_result=True)
    t.calc("area", "flow area a b", "={side_a}*{side_b}", "m2", fmt="d4")
    t.calc("perim", "heated perimeter 2(a+b)", "=2*({side_a}+{side_b})", "m", fmt="d3")
    t.calc("ratio", "aspect ratio short/long side",
           "=MIN({side_a};{side_b})/MAX({side_a};{side_b})", "-", fmt="d3")
    t.calc("l_d", "L/D_h", "={length}/{d_h}", "-", fmt="d1")
    t.calc("rel_rough", "relative roughness eps/D_h", "={rough}/{d_h}", "-", fmt="sci")

    t.passes("Property iteration (pass 1 at the inlet, then at the mean bulk temperature)")
    t.pass_row("t_prop", "property temperature", "={t_in}", "=({t_in}+{prev.t_out})/2", "K", "d3")
    t.pass_row("rho", "density", "=TH.AIR.DENSITY({t_prop}; {p_in})", unit="kg/m3", fmt="d4")
    t.pass_row("cp", "specific heat", "=TH.AIR.CP({t_prop}; {p_in})", unit="J/(kg K)", fmt="d1")
    t.pass_row("mu", "viscosity", "=TH.AIR.VISCOSITY({t_prop}; {p_in})", unit="Pa s", fmt="sci")
    t.pass_row("k", "conductivity", "=TH.AIR.CONDUCTIVITY({t_prop}; {p_in})", unit="W/(m K)",
               fmt="d5")
    t.pass_row("pr", "Prandtl number", "=TH.AIR.PRANDTL({t_prop}; {p_in})", unit="-", fmt="d4")
    t.pass_row("re", "Reynolds number on D_h",
               "=TH.REYNOLDS.DUCT({mdot}; {d_h}; {area}; {mu})", unit="-", fmt="int")
    t.pass_row("t_ratio", "T_bulk / T_wall (gas correction)", "={t_prop}/{t_wall}", unit="-",
               fmt="d4")
    t.pass_row("nu", "Nusselt number (automatic choice)",
               '=TH.NUSSELT.AUTO({re}; {pr}; {l_d}; "T"; "mean"; "heating"; "combined"; 1; '
               '{rel_rough}; "gas"; ; {t_ratio}; "yes"; "rectangle"; {ratio})', unit="-", fmt="d2")
    t.pass_row("h", "mean coefficient h", "=TH.H.FROM.NUSSELT({nu}; {k}; {d_h})",
               unit="W/(m2 K)", fmt="d3")
    t.pass_row("ua", "conductance UA = h P L", "={h}*{perim}*{length}", unit="W/K", fmt="d2")
    t.pass_row("t_out", "air outlet temperature",
               "=TH.OUTLET.TEMP.WALL({t_in}; {t_wall}; {ua}; {mdot}; {cp})", unit="K", fmt="d3")

    t.section("Results (last pass)", page_break=True)
    t.calc("t_out_r", "air outlet temperature", "={t_out}", "K", degc=True, fmt="d2",
           key_result=True)
    t.calc("q", "duty (heat rate into the air)", "=TH.HEAT.RATE({mdot}; {cp}; {t_in}; {t_out})",
           "W", fmt="d1", key_result=True)
    t.calc("lmtd", "log-mean temperature difference",
           "=TH.LMTD({t_wall}-{t_in}; {t_wall}-{t_out})", "K", fmt="d3")
    t.flag("balance", "energy balance UA LMTD = q",
           '=IF(ABS({ua}*{lmtd}/{q}-1)<1E-9; "closes"; "CHECK")')
    t.calc("regime", "flow regime", "=TH.REGIME({re})", "", text=True)
    t.calc("velocity", "mean velocity", "={mdot}/({rho}*{area})", "m/s", fmt="d3")
    t.calc("f", "Darcy friction factor", "=TH.FRICTION.AUTO({re}; {rel_rough})", "-", fmt="d5")
    t.calc("dp", "pressure drop", "=TH.PRESSURE.DROP({f}; {length}; {d_h}; {rho}; {velocity})",
           "Pa", fmt="d2", key_result=True)
    t.iteration_check()

    t.section("Whole-tube solver (TH.TUBE.*): cross-check")
    t.text("The solver iterates the mean temperature itself and adds the momentum change of the "
           "expanding air to the pressure drop, so it may differ slightly from the rows above.",
           "note")
    case = ('"air"; {t_in}; {p_in}; {mdot}; {side_a}; {length}; "temperature"; {t_wall}; '
            '{rough}; "auto"; "one-shot"; "rectangle"; {side_b}')
    t.calc("tube_t_out", "air outlet temperature (solver)", f"=TH.TUBE.TOUT({case})", "K",
           degc=True, fmt="d2")
    t.calc("tube_q", "duty (solver)", f"=TH.TUBE.DUTY({case})", "W", fmt="d1")
    t.calc("tube_dp", "pressure drop (solver)", f"=TH.TUBE.DP({case})", "Pa", fmt="d2")
    t.input("q_target", "duty wanted", 40000.0, "W", note="design target (invented)")
    t.calc("flow_duty", "air flow for that duty (solver)",
           '=TH.TUBE.FLOW.FOR.DUTY({q_target}; "air"; {t_in}; {p_in}; {side_a}; {length}; '
           '"temperature"; {t_wall}; {rough}; "auto"; "one-shot"; "rectangle"; {side_b})',
           "kg/s", fmt="d4", key_result=True)

    t.section("Methods and warnings", columns=[])
    t.why("Nusselt number", "nu")
    t.why("air viscosity", "mu")
    t.why("pressure drop", "dp")
    t.why("solver, outlet", "tube_t_out")

    t.table("sweep", [
        TableCol("mdot", "flow", "kg/s", values=FLOWS, role="input", fmt="d3"),
        TableCol("re", "Re", "-", "=TH.REYNOLDS.DUCT({@mdot}; {d_h}; {area}; {mu})", fmt="int"),
        TableCol("nu", "Nu", "-",
                 '=TH.NUSSELT.AUTO({@re}; {pr}; {l_d}; "T"; "mean"; "heating"; "combined"; 1; '
                 '{rel_rough}; "gas"; ; {t_ratio}; "yes"; "rectangle"; {ratio})', fmt="d2"),
        TableCol("h", "h mean", "W/(m2 K)", "=TH.H.FROM.NUSSELT({@nu}; {k}; {d_h})", fmt="d2"),
        TableCol("t_out_c", "air out", "degC",
                 f"=TH.OUTLET.TEMP.WALL({{t_in}}; {{t_wall}}; {{@h}}*{{perim}}*{{length}}; "
                 f"{{@mdot}}; {{cp}})-{KELVIN}", fmt="d1"),
        TableCol("dp", "dp", "Pa",
                 "=TH.PRESSURE.DROP(TH.FRICTION.AUTO({@re}; {rel_rough}); {length}; {d_h}; "
                 "{rho}; {@mdot}/({rho}*{area}))", fmt="d2"),
        TableCol("st", "Nusselt status", "",
                 '=TH.STATUS("TH.NUSSELT.AUTO"; {@re}; {pr}; {l_d}; "T"; "mean"; "heating"; '
                 '"combined"; 1; {rel_rough}; "gas"; ; {t_ratio}; "yes"; "rectangle"; {ratio})',
                 fmt="status", role="status"),
    ], len(FLOWS), title="Flow sweep: coefficient and pressure drop versus air flow",
        page_break=True,
        note=("Properties of the last pass held for every flow (screening view). Laminar rows "
              "use the developed value of the rectangle (no entry effect); the jump between "
              "laminar and transitional flow is real uncertainty, not a smooth law. Flows in "
              "the first column are inputs."))
    t.chart("Heat transfer coefficient and pressure drop versus air flow", x="sweep.mdot",
            ys=[("sweep.h", {"symbols": True}),
                ("sweep.dp", {"secondary": True, "dashed": True, "symbols": True})],
            x_title="air mass flow [kg/s] (logarithmic)", y_title="mean coefficient h [W/(m2 K)]",
            y2_title="pressure drop [Pa]", x_log=True)
    return t
