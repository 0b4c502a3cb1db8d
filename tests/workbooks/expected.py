"""What each template workbook must show, computed here without the
spreadsheet: libtubeheat called directly (ctypes), the same chain of steps
each template's description states (workbooks/src/<stem>.py docstring),
written again in Python from that description rather than from the sheet's
formulas, so a wrong cell reference, argument order or unit in a template
shows up as a difference. A few checks compare with a source outside the
project (python3-iapws, python3-fluids, an analytic identity); each names
its source.

Each function takes the direct library and the Template (for its input
values and table sizes) and returns a list of checks:
    Num(key or "table.col[i]", expected, rtol, atol, source)
    Text(key, expected text)
"""
from __future__ import annotations

import math
from dataclasses import dataclass

KELVIN = 273.15
RTOL = 1e-9   # the sheet and this file run the same double arithmetic; CSV has 15 digits


@dataclass
class Num:
    where: str
    value: float
    rtol: float = RTOL
    atol: float = 0.0
    source: str = ""   # set for checks against a source outside the project


@dataclass
class Text:
    where: str
    value: str


def _passes(n, t_in, step):
    """The sheets' property iteration: pass 1 at t_in, then at the mean of
    t_in and the previous pass's outlet. step(t_prop) -> dict with 't_out'."""
    out, t_prop = [], t_in
    for _ in range(n):
        r = step(t_prop)
        r["t_prop"] = t_prop
        out.append(r)
        t_prop = (t_in + r["t_out"]) / 2
    return out


def _pass_checks(passes, keys):
    checks = []
    for i, r in enumerate(passes):
        for k in keys:
            checks.append(Num(f"{k}@{i + 1}", r[k]))
    return checks


# --------------------------------------------------------------------- (a)
def hot_water_line(L, t) -> list:
    v = t.inputs
    d_i, d_o, length, mdot, p = v["d_i"], v["d_o"], v["length"], v["mdot"], v["p_in"]
    t_in, t_inf = v["t_in"], v["t_inf"]
    l_d, rel = length / d_i, v["rough"] / d_i

    def step(tp):
        w = L.props("water", tp, p)
        re = L.value("th_reynolds_mass_flow", mdot, d_i, w.mu)
        nu = L.nu("auto", re, w.pr, l_over_d=l_d, wall=0, averaging=0, direction=1)
        h = L.value("th_h_from_nusselt", nu, w.k, d_i)
        ua = L.value("th_ua_tube", h, d_i, d_o, v["k_wall"], v["h_o"], v["rf_i"], v["rf_o"],
                     length)
        t_out = L.value("th_outlet_temperature_ua", t_in, t_inf, ua, mdot, w.cp)
        return dict(rho=w.rho, cp=w.cp, mu=w.mu, k=w.k, pr=w.pr, re=re, nu=nu, h_i=h, ua=ua,
                    t_out=t_out)

    ps = _passes(3, t_in, step)
    last = ps[-1]
    c = _pass_checks(ps, ["t_prop", "rho", "cp", "mu", "k", "pr", "re", "nu", "h_i", "ua",
                          "t_out"])
    q = L.value("th_heat_rate", mdot, last["cp"], t_in, last["t_out"])
    lmtd = L.value("th_lmtd", t_in - t_inf, last["t_out"] - t_inf)
    f = L.value("th_friction_factor", L.method("friction", "auto"), last["re"], rel, sig="idd")
    c += [Num("t_deliv", last["t_out"]), Num("q", q), Num("q_per_m", -q / length),
          Num("lmtd", lmtd), Num("f", f),
          Num("velocity", mdot / (last["rho"] * math.pi * d_i ** 2 / 4)),
          Text("regime", L.regime_name(last["re"])), Text("balance", "closes"),
          Text("converged", "yes"),
          # analytic identity for an outside fluid at one temperature: q = -UA LMTD
          Num("q", -last["ua"] * lmtd, 1e-9, source="identity q = UA LMTD (analytic)")]
    c += _dp_check(L, "dp", mdot, d_i, length, rel, last["rho"], last["mu"])
    # the whole-tube solver with the same case
    thick = (d_o - d_i) / 2
    case = dict(roughness=v["rough"], h_outside=v["h_o"], k_wall=v["k_wall"], thickness=thick,
                rf_in=v["rf_i"], rf_out=v["rf_o"])
    tc = L.tube_case("water", t_in, p, mdot, d_i, length, "outside", t_inf, **case)
    t_solver = L.tube(tc, "t_out")
    c += [Num("tube_t_out", t_solver), Num("tube_q", L.tube(tc, "q")),
          Num("tube_dp", L.tube(tc, "dp")),
          Num("tube_diff", t_solver - last["t_out"], 0.0, 1e-9)]
    flow_case = L.tube_case("water", t_in, p, 0.1, d_i, length, "outside", t_inf, **case)
    c.append(Num("flow_min", L.tube_inverse("flow", flow_case, v["t_min"])))
    len_case = L.tube_case("water", t_in, p, mdot, d_i, 1.0, "outside", t_inf, **case)
    c.append(Num("len_max", L.tube_inverse("length", len_case, v["t_min"])))
    # flow sweep with the last pass's properties
    for i, m in enumerate(t.table_values["sweep.mdot"]):
        re = L.value("th_reynolds_mass_flow", m, d_i, last["mu"])
        nu = L.nu("auto", re, last["pr"], l_over_d=l_d, direction=1)
        h = L.value("th_h_from_nusselt", nu, last["k"], d_i)
        ua = L.value("th_ua_tube", h, d_i, d_o, v["k_wall"], v["h_o"], v["rf_i"], v["rf_o"],
                     length)
        t_out = L.value("th_outlet_temperature_ua", t_in, t_inf, ua, m, last["cp"])
        c += [Num(f"sweep.re[{i}]", re), Num(f"sweep.h[{i}]", h), Num(f"sweep.t_out[{i}]", t_out),
              Num(f"sweep.t_out_c[{i}]", t_out - KELVIN),
              Num(f"sweep.loss[{i}]", m * last["cp"] * (t_in - t_out))]
    # python3-iapws (IAPWS-IF97, independent implementation): density at the inlet
    from iapws import IAPWS97
    ref = IAPWS97(T=t_in, P=p / 1e6)
    c.append(Num("rho@1", ref.rho, 1e-6, source="python3-iapws IAPWS97 density (IF97 region 1)"))
    return c


def _dp_check(L, key, mdot, d, length, rel, rho, mu):
    import ctypes as C
    f, dp = C.c_double(), C.c_double()
    fn = L.so.th_pressure_drop_mass_flow
    fn.argtypes = [C.c_int, C.c_double, C.c_double, C.c_double, C.c_double, C.c_double,
                   C.c_double, C.POINTER(C.c_double), C.POINTER(C.c_double)]
    st = fn(L.method("friction", "auto"), mdot, d, length, rel, rho, mu, C.byref(f), C.byref(dp))
    assert st in (0, 1)
    return [Num(key, dp.value)]


# --------------------------------------------------------------------- (b)
def process_heater_flux(L, t) -> list:
    v = t.inputs
    d, length, qf = v["d_i"], v["length"], v["q_flux"]
    mdot, p, t_in = v["mdot"], v["p_in"], v["t_in"]
    perim = math.pi * d
    power = qf * perim * length

    def step(tp):
        cp = L.value("th_water_cp", tp, p)
        t_out = L.value("th_outlet_temperature_flux", t_in, qf, perim, length, mdot, cp, 1.0,
                        outs="dd")
        return dict(cp=cp, t_out=t_out)

    ps = _passes(3, t_in, step)
    last = ps[-1]
    c = _pass_checks(ps, ["t_prop", "cp", "t_out"])
    cp, t_out = last["cp"], last["t_out"]
    # energy balance q'' pi D L = mdot cp (T_out - T_in) (analytic)
    c.append(Num("t_out_r", t_in + power / (mdot * cp), 1e-12,
                 source="energy balance T_out = T_in + q'' pi D L/(mdot cp) (analytic)"))
    c += [Num("power", power), Num("q", L.value("th_heat_rate", mdot, cp, t_in, t_out)),
          Text("balance", "closes")]
    w = L.props("water", last["t_prop"], p)
    re = L.value("th_reynolds_mass_flow", mdot, d, w.mu)
    c += [Num("rho", w.rho), Num("mu", w.mu), Num("re", re), Text("regime", L.regime_name(re))]
    c += _dp_check(L, "dp", mdot, d, length, v["rough"] / d, w.rho, w.mu)
    wo = L.props("water", t_out, p)
    re_o = L.value("th_reynolds_mass_flow", mdot, d, wo.mu)
    nu_o = L.nu("auto", re_o, wo.pr, l_over_d=length / d, wall=1, averaging=1)
    h_o = L.value("th_h_from_nusselt", nu_o, wo.k, d)
    import ctypes as C
    tout_, tw_ = C.c_double(), C.c_double()
    st = L.so.th_outlet_temperature_flux(C.c_double(t_in), C.c_double(qf), C.c_double(perim),
                                         C.c_double(length), C.c_double(mdot), C.c_double(cp),
                                         C.c_double(h_o), C.byref(tout_), C.byref(tw_))
    assert st in (0, 1)
    c += [Num("re_o", re_o), Num("nu_o", nu_o), Num("h_o", h_o), Num("t_wall_o", tw_.value),
          # uniform flux: T_w = T_b + q''/h at the outlet (analytic)
          Num("t_wall_o", t_out + qf / h_o, 1e-12, source="T_wall = T_bulk + q''/h (analytic)")]
    t_sat = L.value("th_water_saturation_temperature", p)
    from iapws.iapws97 import _TSat_P
    c += [Num("t_sat", t_sat),
          Num("t_sat", _TSat_P(p / 1e6), 1e-8, source="python3-iapws _TSat_P (IF97 region 4)")]
    # profile
    walls = []
    n = t.table_len("profile.x")
    for i in range(n):
        x = length * (i + 1) / n
        tb = L.value("th_outlet_temperature_flux", t_in, qf, perim, x, mdot, cp, 1.0, outs="dd")
        wx = L.props("water", tb, p)
        re_x = L.value("th_reynolds_mass_flow", mdot, d, wx.mu)
        h = L.value("th_h_from_nusselt",
                    L.nu("auto", re_x, wx.pr, l_over_d=x / d, wall=1, averaging=1), wx.k, d)
        walls.append(tb + qf / h)
        c += [Num(f"profile.x[{i}]", x), Num(f"profile.t_b[{i}]", tb),
              Num(f"profile.re[{i}]", re_x),
              Num(f"profile.h[{i}]", h), Num(f"profile.t_wall[{i}]", tb + qf / h),
              Num(f"profile.t_wall_c[{i}]", tb + qf / h - KELVIN)]
    c += [Num("t_wall_max", max(walls)), Num("margin", t_sat - max(walls)),
          Text("boiling", "yes" if t_sat - max(walls) >= v["margin_min"] else
               "CHECK: subcooled boiling possible")]
    tc = L.tube_case("water", t_in, p, mdot, d, length, "flux", qf, roughness=v["rough"],
                     solution="marching")
    c += [Num("tube_t_out", L.tube(tc, "t_out")), Num("tube_tw_in", L.tube(tc, "t_wall_in")),
          Num("tube_tw_out", L.tube(tc, "t_wall_out"))]
    lc = L.tube_case("water", t_in, p, mdot, d, 1.0, "flux", qf, roughness=v["rough"],
                     solution="marching")
    c.append(Num("len_need", L.tube_inverse("length", lc, v["t_target"])))
    return c


# --------------------------------------------------------------------- (c)
def oil_cooler_laminar(L, t) -> list:
    v = t.inputs
    t1, t2 = v["t1"], v["t2"]

    def interp(prop, at):
        frac = (at - t1) / (t2 - t1)
        if prop == "mu":
            return math.exp(math.log(v["mu1"]) + (math.log(v["mu2"]) - math.log(v["mu1"])) * frac)
        return v[prop + "1"] + (v[prop + "2"] - v[prop + "1"]) * frac

    d, length, mdot, t_in, t_w = v["d_i"], v["length"], v["mdot"], v["t_in"], v["t_wall"]
    method, entry = v["method"], v["entry"]
    entry_i = {"thermal": 0, "combined": 1}
    l_d = length / d
    mu_w = interp("mu", t_w)

    def step(tp):
        r = {p: interp(p, tp) for p in ("rho", "cp", "mu", "k")}
        r["pr"] = L.value("th_prandtl", r["cp"], r["mu"], r["k"])
        r["re"] = L.value("th_reynolds_mass_flow", mdot, d, r["mu"])
        r["mu_ratio"] = r["mu"] / mu_w
        r["nu"] = L.nu(method, r["re"], r["pr"], l_over_d=l_d, wall=0, averaging=0, direction=1,
                       entry=entry_i[entry], mu_ratio=r["mu_ratio"])
        r["h"] = L.value("th_h_from_nusselt", r["nu"], r["k"], d)
        r["ua"] = r["h"] * math.pi * d * length
        r["t_out"] = L.value("th_outlet_temperature_ua", t_in, t_w, r["ua"], mdot, r["cp"])
        return r

    ps = _passes(3, t_in, step)
    last = ps[-1]
    c = _pass_checks(ps, ["t_prop", "rho", "cp", "mu", "k", "pr", "re", "mu_ratio", "nu", "h",
                          "ua", "t_out"])
    c += [Num("mu_w", mu_w), Num("t_out_r", last["t_out"]),
          Num("q", L.value("th_heat_rate", mdot, last["cp"], t_in, last["t_out"])),
          Num("x_star", L.value("th_inverse_graetz", length, d, last["re"], last["pr"])),
          Text("regime", L.regime_name(last["re"])), Text("data_range", "yes"),
          Text("converged", "yes")]
    c += _dp_check(L, "dp", mdot, d, length, 0.0, last["rho"], last["mu"])
    names = t.table_values["methods.name"]
    entries = t.table_values["methods.entry"]
    for i, (m, e) in enumerate(zip(names, entries)):
        nu = L.nu(m, last["re"], last["pr"], l_over_d=l_d, wall=0, averaging=0, direction=1,
                  entry=entry_i[e], mu_ratio=last["mu_ratio"])
        h = L.value("th_h_from_nusselt", nu, last["k"], d)
        t_o = L.value("th_outlet_temperature_ua", t_in, t_w, h * math.pi * d * length, mdot,
                      last["cp"])
        c += [Num(f"methods.nu[{i}]", nu), Num(f"methods.h[{i}]", h),
              Num(f"methods.t_out_c[{i}]", t_o - KELVIN)]
    n = t.table_len("profile.x")
    for i in range(n):
        x = length * (i + 1) / n
        nu = L.nu(method, last["re"], last["pr"], l_over_d=x / d, wall=0, averaging=0,
                  direction=1, entry=entry_i[entry], mu_ratio=last["mu_ratio"])
        h = L.value("th_h_from_nusselt", nu, last["k"], d)
        tb = L.value("th_outlet_temperature_ua", t_in, t_w, h * math.pi * d * x, mdot, last["cp"])
        c += [Num(f"profile.x_star[{i}]", x / (d * last["re"] * last["pr"]), 1e-12,
                  source="x* = x/(D Re Pr) (definition)"),
              Num(f"profile.nu[{i}]", nu), Num(f"profile.h[{i}]", h), Num(f"profile.t_b[{i}]", tb)]
    # the last profile row is the whole tube: same as the design result
    c.append(Num(f"profile.t_b[{n - 1}]", last["t_out"], 1e-12))
    return c


# --------------------------------------------------------------------- (d)
def air_duct_heating(L, t) -> list:
    v = t.inputs
    a, b, length, mdot, p, t_in, t_w = (v["side_a"], v["side_b"], v["length"], v["mdot"],
                                        v["p_in"], v["t_in"], v["t_wall"])
    d_h = L.value("th_hydraulic_diameter_rectangle", a, b)
    area, perim = a * b, 2 * (a + b)
    ratio, l_d, rel = min(a, b) / max(a, b), length / d_h, v["rough"] / d_h
    common = dict(wall=0, averaging=0, direction=0, entry=1, mu_ratio=1.0, rel_roughness=rel,
                  correction=2, length_factor=1, duct=1, duct_ratio=ratio)

    def step(tp):
        w = L.props("air", tp, p)
        re = L.value("th_reynolds_mass_flow_duct", mdot, d_h, area, w.mu)
        t_ratio = tp / t_w
        nu = L.nu("auto", re, w.pr, l_over_d=l_d, t_ratio=t_ratio, **common)
        h = L.value("th_h_from_nusselt", nu, w.k, d_h)
        ua = h * perim * length
        t_out = L.value("th_outlet_temperature_ua", t_in, t_w, ua, mdot, w.cp)
        return dict(rho=w.rho, cp=w.cp, mu=w.mu, k=w.k, pr=w.pr, re=re, t_ratio=t_ratio, nu=nu,
                    h=h, ua=ua, t_out=t_out)

    ps = _passes(3, t_in, step)
    last = ps[-1]
    c = _pass_checks(ps, ["t_prop", "rho", "cp", "mu", "k", "pr", "re", "t_ratio", "nu", "h",
                          "ua", "t_out"])
    q = L.value("th_heat_rate", mdot, last["cp"], t_in, last["t_out"])
    lmtd = L.value("th_lmtd", t_w - t_in, t_w - last["t_out"])
    u = mdot / (last["rho"] * area)
    f = L.value("th_friction_factor", L.method("friction", "auto"), last["re"], rel, sig="idd")
    c += [Num("d_h", 2 * a * b / (a + b), 1e-15, source="D_h = 2ab/(a+b) (analytic)"),
          Num("d_h", d_h), Num("t_out_r", last["t_out"]), Num("q", q), Num("lmtd", lmtd),
          Num("q", last["ua"] * lmtd, 1e-9, source="identity q = UA LMTD (analytic)"),
          Num("velocity", u), Num("f", f),
          Num("dp", L.value("th_pressure_drop", f, length, d_h, last["rho"], u)),
          Text("regime", L.regime_name(last["re"])), Text("balance", "closes"),
          Text("converged", "yes")]
    case = dict(roughness=v["rough"], shape="rectangle", size2=b)
    tc = L.tube_case("air", t_in, p, mdot, a, length, "temperature", t_w, **case)
    c += [Num("tube_t_out", L.tube(tc, "t_out")), Num("tube_q", L.tube(tc, "q")),
          Num("tube_dp", L.tube(tc, "dp"))]
    fc = L.tube_case("air", t_in, p, 0.1, a, length, "temperature", t_w, **case)
    c.append(Num("flow_duty", L.tube_inverse("flow_duty", fc, v["q_target"])))
    for i, m in enumerate(t.table_values["sweep.mdot"]):
        re = L.value("th_reynolds_mass_flow_duct", m, d_h, area, last["mu"])
        nu = L.nu("auto", re, last["pr"], l_over_d=l_d, t_ratio=last["t_ratio"], **common)
        h = L.value("th_h_from_nusselt", nu, last["k"], d_h)
        t_o = L.value("th_outlet_temperature_ua", t_in, t_w, h * perim * length, m, last["cp"])
        fi = L.value("th_friction_factor", L.method("friction", "auto"), re, rel, sig="idd")
        dp = L.value("th_pressure_drop", fi, length, d_h, last["rho"], m / (last["rho"] * area))
        c += [Num(f"sweep.re[{i}]", re), Num(f"sweep.nu[{i}]", nu), Num(f"sweep.h[{i}]", h),
              Num(f"sweep.t_out_c[{i}]", t_o - KELVIN), Num(f"sweep.dp[{i}]", dp)]
    return c


# --------------------------------------------------------------------- (e)
def hand_calc_checker(L, t) -> list:
    v = t.inputs
    d, length, mdot, t_in, t_w = v["d_i"], v["length"], v["mdot"], v["t_in"], v["t_wall"]
    rho, cp, mu, k, rel = v["rho"], v["cp"], v["mu"], v["k"], v["rel_rough"]
    re = L.value("th_reynolds_mass_flow", mdot, d, mu)
    pr = L.value("th_prandtl", cp, mu, k)
    f = L.value("th_friction_factor", L.method("friction", v["f_method"]), re, rel, sig="idd")
    l_d = math.inf if v["l_d_nu"] == "inf" else float(v["l_d_nu"])
    nu = L.nu(v["nu_method"], re, pr, l_over_d=l_d, wall=0, averaging=0, direction=0, entry=1,
              rel_roughness=rel)
    h = L.value("th_h_from_nusselt", nu, k, d)
    t_out = L.value("th_outlet_temperature_ua", t_in, t_w, h * math.pi * d * length, mdot, cp)
    q = L.value("th_heat_rate", mdot, cp, t_in, t_out)
    tool = dict(re=re, pr=pr, f=f, nu=nu, h=h, t_out=t_out, q=q)
    from fluids.core import Prandtl, Reynolds
    c = [Num("tool_re", Reynolds(V=mdot / (rho * math.pi * d * d / 4), D=d, rho=rho, mu=mu), 1e-12,
             source="python3-fluids fluids.core.Reynolds"),
         Num("tool_pr", Prandtl(Cp=cp, mu=mu, k=k), 1e-12,
             source="python3-fluids fluids.core.Prandtl")]
    for key, val in tool.items():
        yours = v[f"you_{key}"]
        if key == "t_out":
            diff = ((yours - t_in) - (val - t_in)) / (val - t_in)
        else:
            diff = (yours - val) / val
        c += [Num(f"tool_{key}", val), Num(f"diff_{key}", diff, 1e-9, 1e-15),
              Text(f"verdict_{key}", "agrees" if abs(diff) <= v["tol"] else "CHECK")]
    return c


CHECKS = {
    "hot_water_line": hot_water_line,
    "process_heater_flux": process_heater_flux,
    "oil_cooler_laminar": oil_cooler_laminar,
    "air_duct_heating": air_duct_heating,
    "hand_calc_checker": hand_calc_checker,
}
