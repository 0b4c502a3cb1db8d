"""Template: a bare hot-water line losing heat through an unheated space.

Scenario (invented demo data): a 30 m run of bare carbon-steel pipe carries
domestic hot water at 60 C through an unventilated crawl space at 4 C. The
outside of the pipe loses heat by natural convection and radiation, lumped
into one assumed outside coefficient; the inside carries a thin scale layer
(an assumed fouling resistance). How warm does the water arrive, how much
heat does the line lose, and how does that change with the flow?

Chain: water properties (IAPWS-IF97 family) at the mean bulk temperature,
iterated over three passes; Re, automatic Nusselt choice, h inside;
overall conductance through fouling, wall and outside coefficient
(TH.UA.TUBE); outlet temperature with an outside fluid (TH.OUTLET.TEMP.WALL);
heat rate, LMTD closure check, friction and pressure drop; a flow sweep.
"""
from template import KELVIN, TableCol, Template

FLOWS = [0.005, 0.01, 0.02, 0.03, 0.045, 0.06, 0.09, 0.13, 0.2, 0.3]   # kg/s


# The case as the TH.TUBE functions take it: fluid; T_in; p; mdot; D; L;
# wall kind; outside temperature; roughness; method; solution; shape; second
# size; outside coefficient; wall conductivity; wall thickness; fouling in, out.
_TAIL = ('"outside"; {t_inf}; {rough}; "auto"; "one-shot"; "circle"; 0; {h_o}; {k_wall}; '
         '{wall_t}; {rf_i}; {rf_o}')
case = '"water"; {t_in}; {p_in}; {mdot}; {d_i}; {length}; ' + _TAIL
case_no_flow = '"water"; {t_in}; {p_in}; {d_i}; {length}; ' + _TAIL
case_no_length = '"water"; {t_in}; {p_in}; {mdot}; {d_i}; ' + _TAIL


def build() -> Template:
    t = Template(
        stem="hot_water_line", sheet="HotWaterLine",
        title="Hot-water line through an unheated space: water delivered and heat lost",
        scenario=("a 30 m run of bare carbon-steel pipe (DN20) carries domestic hot water at "
                  "60 C through a crawl space at 4 C. Outside: natural convection plus "
                  "radiation lumped into one assumed coefficient. Inside: a thin scale layer "
                  "(assumed fouling resistance). No insulation."),
        checks=("outlet temperature, heat rate, h, UA, Re, Pr, pressure drop and every pass of "
                "the property iteration against libtubeheat called directly; the flow sweep "
                "row by row; UA LMTD = -q closes to 1e-9; every status cell ok or range."))
    t.head()

    t.section("Inputs: pipe")
    t.input("d_i", "inside diameter", 0.0209, "m", "DN20 medium, approx.")
    t.input("d_o", "outside diameter", 0.0267, "m")
    t.input("length", "length of the run", 30.0, "m")
    t.input("rough", "inside roughness (absolute)", 4.5e-5, "m", "commercial steel, typical")
    t.input("k_wall", "wall conductivity", 45.0, "W/(m K)", "carbon steel, approx.")
    t.section("Inputs: water and surroundings")
    t.input("mdot", "water mass flow", 0.06, "kg/s", "about 3.6 l/min")
    t.input("p_in", "water pressure (absolute)", 300000.0, "Pa", "3 bar")
    t.input("t_in", "water temperature entering the space", 333.15, "K", degc=True)
    t.input("t_inf", "air temperature in the space", 277.15, "K", degc=True)
    t.input("h_o", "outside coefficient (convection + radiation)", 9.0, "W/(m2 K)",
            "assumed, still air")
    t.input("rf_i", "inside fouling resistance", 0.00018, "m2 K/W", "assumed, light scale")
    t.input("rf_o", "outside fouling resistance", 0.0, "m2 K/W", "clean")

    t.section("Derived geometry")
    t.calc("l_d", "L/D", "={length}/{d_i}", "-", fmt="int")
    t.calc("wall_t", "wall thickness", "=({d_o}-{d_i})/2", "m", fmt="d5")
    t.calc("rel_rough", "relative roughness eps/D", "={rough}/{d_i}", "-", fmt="sci")

    t.passes("Property iteration (pass 1 at the inlet temperature, then at the mean "
             "bulk temperature of the previous pass)", page_break=True)
    t.pass_row("t_prop", "property temperature", "={t_in}", "=({t_in}+{prev.t_out})/2", "K", "d3")
    t.pass_row("rho", "density", "=TH.WATER.DENSITY({t_prop}; {p_in})", unit="kg/m3", fmt="d2")
    t.pass_row("cp", "specific heat", "=TH.WATER.CP({t_prop}; {p_in})", unit="J/(kg K)", fmt="d1")
    t.pass_row("mu", "viscosity", "=TH.WATER.VISCOSITY({t_prop}; {p_in})", unit="Pa s", fmt="sci")
    t.pass_row("k", "conductivity", "=TH.WATER.CONDUCTIVITY({t_prop}; {p_in})", unit="W/(m K)",
               fmt="d4")
    t.pass_row("pr", "Prandtl number", "=TH.WATER.PRANDTL({t_prop}; {p_in})", unit="-", fmt="d3")
    t.pass_row("re", "Reynolds number", "=TH.REYNOLDS.MASSFLOW({mdot}; {d_i}; {mu})", unit="-",
               fmt="int")
    t.pass_row("nu", "Nusselt number (automatic choice)",
               '=TH.NUSSELT.AUTO({re}; {pr}; {l_d}; "T"; "mean"; "cooling")', unit="-", fmt="d2")
    t.pass_row("h_i", "inside coefficient h", "=TH.H.FROM.NUSSELT({nu}; {k}; {d_i})",
               unit="W/(m2 K)", fmt="d1")
    t.pass_row("ua", "overall conductance UA",
               "=TH.UA.TUBE({h_i}; {d_i}; {d_o}; {k_wall}; {length}; {h_o}; {rf_i}; {rf_o})",
               unit="W/K", fmt="d3")
    t.pass_row("t_out", "water temperature leaving",
               "=TH.OUTLET.TEMP.WALL({t_in}; {t_inf}; {ua}; {mdot}; {cp})", unit="K", fmt="d3")

    t.section("Results (last pass)")
    t.calc("t_deliv", "water temperature leaving the space", "={t_out}", "K", degc=True,
           fmt="d2", key_result=True)
    t.calc("drop", "temperature drop along the run", "={t_in}-{t_out}", "K", fmt="d2")
    t.calc("q", "heat rate into the water (negative: lost)",
           "=TH.HEAT.RATE({mdot}; {cp}; {t_in}; {t_out})", "W", fmt="d1", key_result=True)
    t.calc("q_per_m", "heat loss per metre of pipe", "=-{q}/{length}", "W/m", fmt="d2")
    t.calc("lmtd", "log-mean temperature difference",
           "=TH.LMTD({t_in}-{t_inf}; {t_out}-{t_inf})", "K", fmt="d3")
    t.calc("regime", "flow regime", "=TH.REGIME({re})", "", text=True)
    t.calc("entry", "entry state at the end of the run",
           '=TH.ENTRY.STATE({re}; {pr}; {l_d}; "T")', "", text=True)
    t.calc("velocity", "mean velocity", "={mdot}/({rho}*PI()*{d_i}^2/4)", "m/s", fmt="d3")
    t.calc("f", "Darcy friction factor", "=TH.FRICTION.AUTO({re}; {rel_rough})", "-", fmt="d5")
    t.calc("dp", "pressure drop of the run",
           "=TH.PRESSURE.DROP.MASSFLOW({mdot}; {d_i}; {length}; {rho}; {mu}; {rel_rough})",
           "Pa", fmt="int")
    t.flag("balance", "energy balance UA LMTD = -q",
           '=IF(ABS({ua}*{lmtd}/(-{q})-1)<1E-9; "closes"; "CHECK")',
           "identity for an outside fluid at one temperature")
    t.iteration_check()

    t.section("Methods and warnings (TH.WHY of the last pass)", columns=[])
    t.why("Nusselt number", "nu")
    t.why("water viscosity", "mu")
    t.why("friction factor", "f")
    t.why("pressure drop", "dp")

    t.section("Whole-tube solver (TH.TUBE.*): cross-check and a design question",
              page_break=True)
    t.text("The solver iterates the mean temperature itself, takes the heat rate from the water's "
           "enthalpy and corrects the Nusselt number for the wall-to-bulk Prandtl variation, "
           "so it may differ from the step-by-step result above by a fraction of a kelvin.", "note")
    t.calc("tube_t_out", "water leaving (solver)", f"=TH.TUBE.TOUT({case})", "K", degc=True,
           fmt="d2")
    t.calc("tube_diff", "solver minus step-by-step", "={tube_t_out}-{t_out}", "K", fmt="d3")
    t.calc("tube_q", "heat rate into the water (solver)", f"=TH.TUBE.DUTY({case})", "W", fmt="d1")
    t.calc("tube_dp", "pressure drop (solver)", f"=TH.TUBE.DP({case})", "Pa", fmt="int")
    t.input("t_min", "lowest temperature wanted at the far end", 329.15, "K", degc=True,
            note="design target (invented)")
    t.calc("flow_min", "flow that delivers exactly that",
           f"=TH.TUBE.FLOW.FOR.TOUT({{t_min}}; {case_no_flow})", "kg/s", fmt="d4",
           key_result=True, note="keep the flow above this")
    t.calc("len_max", "run length at which the water reaches it",
           f"=TH.TUBE.LENGTH.FOR.TOUT({{t_min}}; {case_no_length})", "m", fmt="d2",
           note="at the flow given above")
    t.why("solver, water leaving", "tube_t_out")
    t.why("solver, minimum flow", "flow_min")

    n = len(FLOWS)
    t.table("sweep", [
        TableCol("mdot", "flow", "kg/s", values=FLOWS, role="input", fmt="d3"),
        TableCol("re", "Re", "-", "=TH.REYNOLDS.MASSFLOW({@mdot}; {d_i}; {mu})", fmt="int"),
        TableCol("h", "h inside", "W/(m2 K)",
                 '=TH.H.FROM.NUSSELT(TH.NUSSELT.AUTO({@re}; {pr}; {l_d}; "T"; "mean"; "cooling"); '
                 '{k}; {d_i})', fmt="d1"),
        TableCol("t_out", "T leaving", "K",
                 "=TH.OUTLET.TEMP.WALL({t_in}; {t_inf}; TH.UA.TUBE({@h}; {d_i}; {d_o}; {k_wall}; "
                 "{length}; {h_o}; {rf_i}; {rf_o}); {@mdot}; {cp})", fmt="d2"),
        TableCol("t_out_c", "T leaving, degC", "degC", f"={{@t_out}}-{KELVIN}", fmt="d2"),
        TableCol("loss", "heat loss", "W", "={@mdot}*{cp}*({t_in}-{@t_out})", fmt="d1"),
        TableCol("st", "Nusselt status", "",
                 '=TH.STATUS("TH.NUSSELT.AUTO"; {@re}; {pr}; {l_d}; "T"; "mean"; "cooling")',
                 fmt="status", role="status"),
    ], n, title="Flow sweep: what arrives at other flows",
        note=("Properties of the last pass held for every flow (the mean temperature changes "
              "with the flow: a screening view; solve a flow of interest in the inputs above). "
              "The flows in the first column are inputs."))
    t.chart("Water leaving the crawl space, and heat lost, versus flow",
            x="sweep.mdot",
            ys=[("sweep.t_out_c", {"symbols": True}),
                ("sweep.loss", {"secondary": True, "dashed": True, "symbols": True})],
            x_title="water mass flow [kg/s]", y_title="water leaving [degC]",
            y2_title="heat lost by the line [W]")
    return t
