"""Template: an electric process heater tube at uniform heat flux, with the
wall-temperature profile along the tube.

Scenario (invented demo data): a 4 m stainless tube of 15 mm bore is wrapped
with an electric heating element that puts a uniform 50 kW/m2 into process
water flowing at 0.15 kg/s and 4 bar. How hot does the water leave, how hot
does the wall get along the tube, and how far is the hottest wall from the
boiling point at the tube pressure?

Chain: the outlet temperature follows from the energy balance alone
(TH.OUTLET.TEMP.FLUX), with cp iterated at the mean bulk temperature; the
profile table takes water properties at the local bulk temperature, the
local Nusselt number at x/D (uniform flux, local value) and the wall
temperature T_w(x) = T_b(x) + q''/h(x); the whole-tube solver marches the
same case and answers the inverse question (heated length for a wanted
outlet temperature).
"""
from template import KELVIN, TableCol, Template

POINTS = 20


def build() -> Template:
    t = Template(
        stem="process_heater_flux", sheet="ProcessHeater",
        title="Electric process heater tube at uniform heat flux: bulk and wall temperature "
              "along the tube",
        scenario=("a 4 m stainless tube of 15 mm bore, wrapped with an electric heating element "
                  "that puts a uniform 50 kW/m2 into process water at 0.15 kg/s and 4 bar, "
                  "entering at 20 C."),
        checks=("outlet temperature against the energy balance q'' pi D L = mdot cp dT and "
                "libtubeheat; every profile row (bulk temperature, Re, h, wall temperature) "
                "against the library called directly; outlet wall temperature, saturation "
                "temperature, solver outlet and wall temperatures and the inverse length "
                "against the library; every status cell ok or range."))
    t.head()

    t.section("Inputs")
    t.input("d_i", "inside diameter", 0.015, "m")
    t.input("length", "heated length", 4.0, "m")
    t.input("rough", "inside roughness (absolute)", 1.5e-6, "m", "drawn tube, typical")
    t.input("q_flux", "heat flux into the water", 50000.0, "W/m2", "uniform, from the element")
    t.input("mdot", "water mass flow", 0.15, "kg/s")
    t.input("p_in", "water pressure (absolute)", 400000.0, "Pa", "4 bar")
    t.input("t_in", "water inlet temperature", 293.15, "K", degc=True)
    t.input("margin_min", "smallest wall-to-boiling margin accepted", 10.0, "K",
            "common practice, our choice")

    t.section("Derived")
    t.calc("perim", "heated perimeter pi D", "=PI()*{d_i}", "m", fmt="d5")
    t.calc("area", "heated area pi D L", "={perim}*{length}", "m2", fmt="d4")
    t.calc("power", "heater power q'' pi D L", "={q_flux}*{area}", "W", fmt="d1", key_result=True)
    t.calc("l_d", "L/D", "={length}/{d_i}", "-", fmt="int")
    t.calc("rel_rough", "relative roughness eps/D", "={rough}/{d_i}", "-", fmt="sci")

    t.passes("Property iteration for the outlet temperature (pass 1 at the inlet, then at "
             "the mean of inlet and outlet)")
    t.pass_row("t_prop", "property temperature", "={t_in}", "=({t_in}+{prev.t_out})/2", "K", "d3")
    t.pass_row("cp", "specific heat", "=TH.WATER.CP({t_prop}; {p_in})", unit="J/(kg K)", fmt="d1")
    t.pass_row("t_out", "water outlet temperature",
               "=TH.OUTLET.TEMP.FLUX({t_in}; {q_flux}; {perim}; {length}; {mdot}; {cp})",
               unit="K", fmt="d3")

    t.section("Results at the mean bulk temperature (last pass)")
    t.calc("t_out_r", "water outlet temperature", "={t_out}", "K", degc=True, fmt="d2",
           key_result=True)
    t.calc("q", "heat rate into the water", "=TH.HEAT.RATE({mdot}; {cp}; {t_in}; {t_out})", "W",
           fmt="d1")
    t.flag("balance", "energy balance: heat rate = heater power",
           '=IF(ABS({q}/{power}-1)<1E-9; "closes"; "CHECK")')
    t.calc("rho", "density", "=TH.WATER.DENSITY({t_prop}; {p_in})", "kg/m3", fmt="d2")
    t.calc("mu", "viscosity", "=TH.WATER.VISCOSITY({t_prop}; {p_in})", "Pa s", fmt="sci")
    t.calc("re", "Reynolds number", "=TH.REYNOLDS.MASSFLOW({mdot}; {d_i}; {mu})", "-", fmt="int")
    t.calc("regime", "flow regime", "=TH.REGIME({re})", "", text=True)
    t.calc("dp", "pressure drop",
           "=TH.PRESSURE.DROP.MASSFLOW({mdot}; {d_i}; {length}; {rho}; {mu}; {rel_rough})",
           "Pa", fmt="int")

    t.section("Wall temperature at the outlet (properties at the outlet temperature)",
              page_break=True)
    t.calc("mu_o", "viscosity at the outlet", "=TH.WATER.VISCOSITY({t_out}; {p_in})", "Pa s",
           fmt="sci")
    t.calc("k_o", "conductivity at the outlet", "=TH.WATER.CONDUCTIVITY({t_out}; {p_in})",
           "W/(m K)", fmt="d4")
    t.calc("pr_o", "Prandtl number at the outlet", "=TH.WATER.PRANDTL({t_out}; {p_in})", "-",
           fmt="d3")
    t.calc("re_o", "Reynolds number at the outlet", "=TH.REYNOLDS.MASSFLOW({mdot}; {d_i}; {mu_o})",
           "-", fmt="int")
    t.calc("nu_o", "local Nusselt number at x = L",
           '=TH.NUSSELT.AUTO({re_o}; {pr_o}; {l_d}; "H"; "local")', "-", fmt="d2")
    t.calc("h_o", "local coefficient at x = L", "=TH.H.FROM.NUSSELT({nu_o}; {k_o}; {d_i})",
           "W/(m2 K)", fmt="d1")
    t.calc("t_wall_o", "wall temperature at the outlet",
           "=TH.OUTLET.WALL.TEMP.FLUX({t_in}; {q_flux}; {perim}; {length}; {mdot}; {cp}; {h_o})",
           "K", degc=True, fmt="d2", key_result=True)
    t.calc("t_wall_max", "hottest wall in the profile below", "=MAX({profile.t_wall})", "K",
           degc=True, fmt="d2")
    t.calc("t_sat", "boiling point at the tube pressure", "=TH.WATER.SAT.TEMP({p_in})", "K",
           degc=True, fmt="d2")
    t.calc("margin", "margin from the hottest wall to boiling", "={t_sat}-{t_wall_max}", "K",
           fmt="d1")
    t.flag("boiling", "wall below boiling by the margin accepted",
           '=IF({margin}>={margin_min}; "yes"; "CHECK: subcooled boiling possible")',
           "single-phase correlations stop applying when the wall boils")

    t.section("Whole-tube solver (TH.TUBE.*, marching: local properties and coefficients)")
    t.text("The solver marches 200 segments and corrects the Nusselt number for the wall-to-bulk "
           "Prandtl variation, so its wall temperatures may differ from the profile by a few "
           "tenths of a kelvin.", "note")
    case = ('"water"; {t_in}; {p_in}; {mdot}; {d_i}; {length}; "flux"; {q_flux}; {rough}; '
            '"auto"; "marching"')
    t.calc("tube_t_out", "water outlet temperature (solver)", f"=TH.TUBE.TOUT({case})", "K",
           degc=True, fmt="d2")
    t.calc("tube_tw_in", "wall temperature at the inlet (solver)", f"=TH.TUBE.TWALL.IN({case})",
           "K", degc=True, fmt="d2", note="local mean of the first segment")
    t.calc("tube_tw_out", "wall temperature at the outlet (solver)",
           f"=TH.TUBE.TWALL.OUT({case})", "K", degc=True, fmt="d2")
    t.input("t_target", "outlet temperature wanted", 308.15, "K", degc=True,
            note="design target (invented)")
    t.calc("len_need", "heated length for it (solver)",
           '=TH.TUBE.LENGTH.FOR.TOUT({t_target}; "water"; {t_in}; {p_in}; {mdot}; {d_i}; '
           '"flux"; {q_flux}; {rough}; "auto"; "marching")', "m", fmt="d3", key_result=True)

    t.section("Methods and warnings", columns=[])
    t.why("Nusselt number at the outlet", "nu_o")
    t.why("water viscosity at the outlet", "mu_o")
    t.why("pressure drop", "dp")
    t.why("solver, outlet wall", "tube_tw_out")

    x = "={length}*({#}+1)/" + str(POINTS)
    t.table("profile", [
        TableCol("x", "x", "m", x, fmt="d2"),
        TableCol("t_b", "bulk", "K",
                 "=TH.OUTLET.TEMP.FLUX({t_in}; {q_flux}; {perim}; {@x}; {mdot}; {cp})", fmt="d2"),
        TableCol("re", "Re (local properties)", "-",
                 "=TH.REYNOLDS.MASSFLOW({mdot}; {d_i}; TH.WATER.VISCOSITY({@t_b}; {p_in}))",
                 fmt="int"),
        TableCol("h", "h local", "W/(m2 K)",
                 '=TH.H.FROM.NUSSELT(TH.NUSSELT.AUTO({@re}; TH.WATER.PRANDTL({@t_b}; {p_in}); '
                 '{@x}/{d_i}; "H"; "local"); TH.WATER.CONDUCTIVITY({@t_b}; {p_in}); {d_i})',
                 fmt="d1"),
        TableCol("t_wall", "wall", "K", "={@t_b}+{q_flux}/{@h}", fmt="d2"),
        TableCol("t_b_c", "bulk water", "degC", f"={{@t_b}}-{KELVIN}", fmt="d2"),
        TableCol("t_wall_c", "wall (inner surface)", "degC", f"={{@t_wall}}-{KELVIN}", fmt="d2"),
    ], POINTS, title="Profile along the tube", page_break=True,
        note=("Positions x from L/20 to L (at x = 0 the local coefficient of a developing flow "
              "is unbounded). Properties at the local bulk temperature; local Nusselt number "
              "at x/D for a uniform flux."))
    t.chart("Temperatures along the heater tube", x="profile.x",
            ys=[("profile.t_wall_c", {"symbols": True}), ("profile.t_b_c", {"symbols": True})],
            x_title="distance from the start of heating x [m]", y_title="temperature [degC]")
    return t
