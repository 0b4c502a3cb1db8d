"""What the Calc end-to-end test computes, and what it expects.

VALUE_CASES: one spreadsheet call each; the cell is compared with
  (a) libtubeheat called directly through ctypes (th_direct.py), and
  (b) where one exists, an external reference: python3-fluids (Debian) for
      friction and dimensionless groups, or the analytic formula or limit
      named beside it.
BAD_CASES: bad or borderline input; the exact cell text, the TH.STATUS code
  and the start of the TH.WHY text are asserted.
All inputs are our own scenarios.
"""
from __future__ import annotations

import csv
import ctypes as C
import math
import pathlib
import sys
from dataclasses import dataclass, field

from fluids.core import Prandtl, Reynolds
from fluids.friction import Churchill_1977, Colebrook, Haaland, Swamee_Jain_1976
from iapws import IAPWS97
from scipy.integrate import quad
from iapws.humidAir import Air, Ma
from iapws.iapws97 import _PSat_T, _TSat_P

import th_direct as D

REPO = pathlib.Path(__file__).resolve().parents[2]
sys.path.insert(0, str(REPO / "tests" / "workbooks"))
import th_direct_more as M  # noqa: E402  (tube solver and property sets)

EMPTY = object()  # a reference to an empty cell


@dataclass
class Raw:
    """An inline formula expression as an argument, e.g. Raw("1/0")."""
    expr: str


@dataclass
class RangeRef:
    """A reference to a 2 x 2 block of numbers."""


@dataclass
class Case:
    label: str
    fid: str
    args: list
    direct: object = None          # callable(Lib) -> (status, value)
    ext: list = field(default_factory=list)  # [(value, rtol, source)]
    array: tuple | None = None     # (columns, rows) for an array formula


@dataclass
class Bad:
    label: str
    fid: str
    args: list
    cell: str        # exact CSV text of the result cell, or "number"
    status: str      # exact CSV text of the TH.STATUS cell
    why: str         # start of the TH.WHY text


# ---------------------------------------------------------------- helpers
def gnielinski(re, pr):
    """Gnielinski (1976) fully developed, with the Petukhov (1970) smooth-tube
    friction factor f = (0.790 ln Re - 1.64)^-2, evaluated independently."""
    f = (0.790 * math.log(re) - 1.64) ** -2
    return (f / 8) * (re - 1000) * pr / (1 + 12.7 * math.sqrt(f / 8) * (pr ** (2 / 3) - 1))


def dp_darcy(f, length, d, rho, u):
    return f * length / d * rho * u * u / 2


def entry_text(L, method, re, pr, x, wall="T"):
    st, info = L.entry_state(method, re, pr, x, wall)
    regime = L.so.th_regime_name(info.regime).decode()
    h, t = info.hydro_developed, info.thermal_developed
    state = ("fully developed" if h and t else
             "developing (velocity and temperature)" if not h and not t else
             "thermally developing" if h else "hydrodynamically developing")
    return st, f"{regime}, {state}"


def _pdm_dp(L):
    import ctypes as C
    f, dp = C.c_double(), C.c_double()
    fn = L.so.th_pressure_drop_mass_flow
    st = fn(C.c_int(L.method("friction", "Colebrook")), *[C.c_double(x) for x in
            (mdot, d, 6, 1e-4, rho, mu)], C.byref(f), C.byref(dp))
    return st, dp.value


def _nu(L, method, re, pr, **fields):
    st, r = L.nusselt(method, re, pr, **fields)
    return st, r.nu


def _flux_wall(L):
    import ctypes as C
    t, tw = C.c_double(), C.c_double()
    st = L.so.th_outlet_temperature_flux(*[C.c_double(x) for x in
                                           (293.15, 5000, 0.0785, 10, 0.2, 4180, 2000)],
                                         C.byref(t), C.byref(tw))
    return st, tw.value



PI = math.pi
mdot, d, mu, rho = 0.5, 0.025, 0.001, 998.0
re_m = 4 * mdot / (PI * d * mu)
u_m = 4 * mdot / (rho * PI * d * d)

VALUE_CASES = [
    # -- groups
    Case("Reynolds", "reynolds", [998, 1.5, 0.025, 0.001],
         lambda L: L.call("th_reynolds", "dddd", 998, 1.5, 0.025, 0.001),
         [(Reynolds(V=1.5, D=0.025, rho=998, mu=0.001), 1e-13, "python3-fluids fluids.core.Reynolds")]),
    Case("Reynolds from mass flow", "reynoldsMassFlow", [mdot, d, mu],
         lambda L: L.call("th_reynolds_mass_flow", "ddd", mdot, d, mu),
         [(re_m, 1e-13, "analytic 4 mdot/(pi D mu)")]),
    # A square duct 0.02 m x 0.02 m: D_h = 0.02 m, A = 4e-4 m2.
    Case("Reynolds of a duct", "reynoldsDuct", [0.5, 0.02, 4.0e-4, 0.001],
         lambda L: L.call("th_reynolds_mass_flow_duct", "dddd", 0.5, 0.02, 4.0e-4, 0.001),
         [(0.5 * 0.02 / (4.0e-4 * 0.001), 1e-13, "analytic mdot D_h/(A mu)")]),
    Case("Prandtl", "prandtl", [4180, 0.001, 0.6],
         lambda L: L.call("th_prandtl", "ddd", 4180, 0.001, 0.6),
         [(Prandtl(Cp=4180, k=0.6, mu=0.001), 1e-13, "python3-fluids fluids.core.Prandtl")]),
    Case("Peclet", "peclet", [37425, 6.5],
         lambda L: L.call("th_peclet", "dd", 37425, 6.5),
         [(37425 * 6.5, 1e-13, "analytic Re Pr")]),
    Case("Graetz, diameter convention", "graetz", [1000, 5, 0.02, 0.5],
         lambda L: L.call("th_graetz", "ddddi", 1000, 5, 0.02, 0.5, 0),
         [(0.02 / 0.5 * 1000 * 5, 1e-13, "analytic (D/x) Re Pr")]),
    Case("Graetz, mass-flow convention", "graetz", [1000, 5, 0.02, 0.5, "Mass Flow"],
         lambda L: L.call("th_graetz", "ddddi", 1000, 5, 0.02, 0.5, 1),
         [(PI / 4 * 0.02 / 0.5 * 1000 * 5, 1e-13, "analytic (pi/4)(D/x) Re Pr")]),
    Case("inverse Graetz", "graetzInverse", [0.5, 0.02, 1000, 5],
         lambda L: L.call("th_inverse_graetz", "dddd", 0.5, 0.02, 1000, 5),
         [(0.5 / (0.02 * 1000 * 5), 1e-13, "analytic x/(D Re Pr)")]),
    Case("hydraulic diameter", "hydraulicDiameter", [3e-4, 0.07],
         lambda L: L.call("th_hydraulic_diameter", "dd", 3e-4, 0.07),
         [(4 * 3e-4 / 0.07, 1e-13, "analytic 4A/P")]),
    Case("hydraulic diameter, rectangle", "hydraulicDiameterRect", [0.02, 0.01],
         lambda L: L.call("th_hydraulic_diameter_rectangle", "dd", 0.02, 0.01),
         [(2 * 0.02 * 0.01 / 0.03, 1e-13, "analytic 2ab/(a+b)")]),
    Case("hydraulic diameter, annulus", "hydraulicDiameterAnnulus", [0.02, 0.05],
         lambda L: L.call("th_hydraulic_diameter_annulus", "dd", 0.02, 0.05),
         [(0.03, 1e-13, "analytic d_o - d_i")]),
    Case("h from Nu", "hFromNusselt", [120, 0.6, 0.025],
         lambda L: L.call("th_h_from_nusselt", "ddd", 120, 0.6, 0.025),
         [(120 * 0.6 / 0.025, 1e-13, "analytic Nu k/D")]),
    Case("Nu from h", "nusseltFromH", [2880, 0.025, 0.6],
         lambda L: L.call("th_nusselt_from_h", "ddd", 2880, 0.025, 0.6),
         [(2880 * 0.025 / 0.6, 1e-13, "analytic h D/k")]),
    # -- regime and entry
    Case("regime laminar", "regime", [1500], lambda L: (0, L.regime_name(1500)),
         [("laminar", 0, "thresholds 2300/10000 stated in tubeheat.h (common practice)")]),
    Case("regime transitional", "regime", [5000], lambda L: (0, L.regime_name(5000)),
         [("transitional", 0, "thresholds 2300/10000 stated in tubeheat.h (common practice)")]),
    Case("regime turbulent", "regime", [20000], lambda L: (0, L.regime_name(20000)),
         [("turbulent", 0, "thresholds 2300/10000 stated in tubeheat.h (common practice)")]),
    Case("hydrodynamic entry, auto", "entryLengthHydro", [1000],
         lambda L: L.call("th_entry_length_hydro", "id", 0, 1000),
         [(0.0565 * 1000, 1e-12, "Shah & London (1978) 0.0565 Re, as documented in tubeheat.h")]),
    Case("hydrodynamic entry, common", "entryLengthHydro", [1000, "common"],
         lambda L: L.call("th_entry_length_hydro", "id", 1, 1000),
         [(0.05 * 1000, 1e-12, "0.05 Re (common practice)")]),
    Case("thermal entry, Shah-London H", "entryLengthThermal", [1000, 5, "H", "shah london"],
         lambda L: L.call("th_entry_length_thermal", "iddi", 2, 1000, 5, 1),
         [(0.0430 * 5000, 1e-12, "Shah & London (1978) 0.0430 Re Pr (H), as documented in tubeheat.h")]),
    Case("entry state text", "entryState", [1000, 5, 10],
         lambda L: entry_text(L, "auto", 1000, 5, 10)),
    Case("entry state text, far downstream", "entryState", [1000, 0.7, 5000, "H"],
         lambda L: entry_text(L, "auto", 1000, 0.7, 5000, "H")),
    # -- friction and pressure drop
    Case("friction Colebrook", "friction", ["Colebrook", 5e4, 1e-4],
         lambda L: L.call("th_friction_factor", "idd", L.method("friction", "Colebrook"), 5e4, 1e-4),
         [(Colebrook(5e4, 1e-4), 1e-9, "python3-fluids Colebrook")]),
    Case("friction Haaland", "friction", ["HAALAND", 5e4, 1e-4],
         lambda L: L.call("th_friction_factor", "idd", L.method("friction", "Haaland"), 5e4, 1e-4),
         [(Haaland(5e4, 1e-4), 1e-12, "python3-fluids Haaland")]),
    Case("friction Swamee-Jain, spelled loosely", "friction", ["swamee jain", 1e5, 1e-5],
         lambda L: L.call("th_friction_factor", "idd", L.method("friction", "Swamee-Jain"), 1e5, 1e-5),
         # fluids writes Swamee-Jain's 5.74 as 6.97^0.9 = 5.7397: ~2e-6 apart.
         [(Swamee_Jain_1976(1e5, 1e-5), 5e-6, "python3-fluids Swamee_Jain_1976")]),
    Case("friction Churchill, laminar", "friction", ["Churchill", 1000, 0],
         lambda L: L.call("th_friction_factor", "idd", L.method("friction", "Churchill"), 1000, 0),
         [(Churchill_1977(1000, 0), 1e-12, "python3-fluids Churchill_1977")]),
    Case("friction laminar", "friction", ["laminar", 1000],
         lambda L: L.call("th_friction_factor", "idd", L.method("friction", "laminar"), 1000, 0),
         [(64 / 1000, 1e-13, "analytic 64/Re (Hagen-Poiseuille)")]),
    Case("friction auto, laminar", "frictionAuto", [1000],
         lambda L: L.call("th_friction_factor", "idd", 0, 1000, 0),
         [(64 / 1000, 1e-13, "analytic 64/Re (Hagen-Poiseuille)")]),
    Case("friction auto, rough turbulent", "frictionAuto", [1e5, 1e-4],
         lambda L: L.call("th_friction_factor", "idd", 0, 1e5, 1e-4),
         [(Colebrook(1e5, 1e-4), 1e-9, "python3-fluids Colebrook")]),
    Case("pressure drop", "pressureDrop", [0.02, 10, 0.025, 998, 1.5],
         lambda L: L.call("th_pressure_drop", "ddddd", 0.02, 10, 0.025, 998, 1.5),
         [(dp_darcy(0.02, 10, 0.025, 998, 1.5), 1e-13, "analytic Darcy-Weisbach")]),
    Case("pressure drop from mass flow", "pressureDropMassFlow",
         [mdot, d, 6, rho, mu, 1e-4, "Colebrook"],
         lambda L: _pdm_dp(L),
         [(dp_darcy(Colebrook(re_m, 1e-4), 6, d, rho, u_m), 1e-9,
           "python3-fluids Colebrook + analytic Darcy-Weisbach")]),
    # -- Nusselt
    Case("Nu Dittus-Boelter heating", "nusselt", ["Dittus-Boelter", 2e4, 5],
         lambda L: _nu(L, "Dittus-Boelter", 2e4, 5),
         [(0.023 * 2e4 ** 0.8 * 5 ** 0.4, 1e-12, "Dittus-Boelter formula 0.023 Re^0.8 Pr^0.4, evaluated here")]),
    Case("Nu Dittus-Boelter cooling", "nusselt", ["dittus boelter", 2e4, 5, None, None, None, "cooling"],
         lambda L: _nu(L, "Dittus-Boelter", 2e4, 5, direction=1),
         [(0.023 * 2e4 ** 0.8 * 5 ** 0.3, 1e-12, "Dittus-Boelter formula 0.023 Re^0.8 Pr^0.3, evaluated here")]),
    Case("Nu Gnielinski developed", "nusselt", ["Gnielinski", 2e4, 5],
         lambda L: _nu(L, "Gnielinski", 2e4, 5),
         [(gnielinski(2e4, 5), 1e-9, "Gnielinski (1976) with Petukhov f, evaluated here")]),
    Case("Nu Sieder-Tate with mu ratio", "nusselt",
         ["Sieder-Tate", 2e4, 5, None, None, None, None, None, 2.0],
         lambda L: _nu(L, "Sieder-Tate", 2e4, 5, mu_ratio=2.0),
         [(0.027 * 2e4 ** 0.8 * 5 ** (1 / 3) * 2.0 ** 0.14, 1e-12,
           "Sieder-Tate formula 0.027 Re^0.8 Pr^(1/3) (mu/mu_w)^0.14, evaluated here")]),
    Case("Nu auto laminar developed T", "nusseltAuto", [1000, 5],
         lambda L: _nu(L, "auto", 1000, 5),
         [(3.6568, 1e-4, "analytic limit Nu_T = 3.6568 (Graetz eigenvalue; from memory)")]),
    Case("Nu auto laminar developed H", "nusseltAuto", [1000, 5, "inf", "H"],
         lambda L: _nu(L, "auto", 1000, 5, wall=1),
         [(48 / 11, 1e-9, "analytic limit Nu_H = 48/11")]),
    Case("Nu Dittus-Boelter outside range (warning)", "nusselt", ["Dittus-Boelter", 1500, 5],
         lambda L: _nu(L, "Dittus-Boelter", 1500, 5),
         [(0.023 * 1500 ** 0.8 * 5 ** 0.4, 1e-12, "Dittus-Boelter formula, evaluated here")]),
    Case("Nu Gnielinski, every option given", "nusselt",
         ["Gnielinski", 2e4, 5, 30, "H", "mean", "cooling", "thermal", 1.2, 1e-4,
          "liquid", 4.0, 1.0, "no", "circle", 1.0],
         lambda L: _nu(L, "Gnielinski", 2e4, 5, l_over_d=30, wall=1, averaging=0, direction=1,
                       entry=0, mu_ratio=1.2, rel_roughness=1e-4, correction=1, pr_wall=4.0,
                       t_ratio=1.0, length_factor=0, duct=0, duct_ratio=1.0)),
    Case("Nu Shah local H", "nusselt", ["Shah", 500, 5, 20, "H", "local"],
         lambda L: _nu(L, "Shah", 500, 5, l_over_d=20, wall=1, averaging=1)),
    Case("Nu auto rectangle duct", "nusseltAuto",
         [500, 5, None, None, None, None, None, None, None, None, None, None, None, "rectangle", 0.5],
         lambda L: _nu(L, "auto", 500, 5, duct=1, duct_ratio=0.5)),
    Case("Nu auto entry region mean", "nusseltAuto", [1000, 5, 40],
         lambda L: _nu(L, "auto", 1000, 5, l_over_d=40)),
    # -- energy balance
    Case("heat rate", "heatRate", [0.2, 4180, 293.15, 313.15],
         lambda L: L.call("th_heat_rate", "dddd", 0.2, 4180, 293.15, 313.15),
         [(0.2 * 4180 * 20, 1e-12, "analytic mdot cp dT")]),
    Case("LMTD", "lmtd", [60, 20], lambda L: L.call("th_lmtd", "dd", 60, 20),
         [(40 / math.log(3), 1e-13, "analytic (a-b)/ln(a/b)")]),
    Case("LMTD equal ends", "lmtd", [20, 20], lambda L: L.call("th_lmtd", "dd", 20, 20),
         [(20, 1e-13, "analytic limit a = b")]),
    Case("outlet T, wall temperature", "outletTempWall", [293.15, 353.15, 450, 0.2, 4180],
         lambda L: L.call("th_outlet_temperature_ua", "ddddd", 293.15, 353.15, 450, 0.2, 4180),
         [(353.15 - 60 * math.exp(-450 / (0.2 * 4180)), 1e-13, "analytic exp(-UA/(mdot cp))")]),
    Case("outlet T, uniform flux", "outletTempFlux", [293.15, 5000, 0.0785, 10, 0.2, 4180],
         lambda L: L.call("th_outlet_temperature_flux", "ddddddd", 293.15, 5000, 0.0785, 10,
                          0.2, 4180, 1000.0, outs="dd"),
         [(293.15 + 5000 * 0.0785 * 10 / (0.2 * 4180), 1e-13, "analytic q P L/(mdot cp)")]),
    Case("outlet wall T, uniform flux", "outletWallTempFlux",
         [293.15, 5000, 0.0785, 10, 0.2, 4180, 2000],
         lambda L: _flux_wall(L),
         [(293.15 + 5000 * 0.0785 * 10 / (0.2 * 4180) + 5000 / 2000, 1e-13,
           "analytic T_out + q/h")]),
    Case("UA tube, all resistances", "uaTube", [2000, 0.02, 0.025, 16, 10, 500, 2e-4, 1e-4],
         lambda L: L.call("th_ua_tube", "dddddddd", 2000, 0.02, 0.025, 16, 500, 2e-4, 1e-4, 10),
         [(1 / (1 / (2000 * PI * 0.02 * 10) + 2e-4 / (PI * 0.02 * 10)
                + math.log(0.025 / 0.02) / (2 * PI * 16 * 10) + 1e-4 / (PI * 0.025 * 10)
                + 1 / (500 * PI * 0.025 * 10)), 1e-12, "analytic series resistances")]),
    Case("UA tube, outer surface held", "uaTube", [2000, 0.02, 0.025, 16, 10],
         lambda L: L.call("th_ua_tube", "dddddddd", 2000, 0.02, 0.025, 16, math.inf, 0, 0, 10),
         [(1 / (1 / (2000 * PI * 0.02 * 10) + math.log(0.025 / 0.02) / (2 * PI * 16 * 10)),
           1e-12, "analytic series resistances, h_o infinite")]),
    Case("UA tube, h outside as text inf", "uaTube", [2000, 0.02, 0.025, 16, 10, "inf"],
         lambda L: L.call("th_ua_tube", "dddddddd", 2000, 0.02, 0.025, 16, math.inf, 0, 0, 10)),
    Case("length for outlet, wall T", "lengthForOutletWall", [293.15, 333.15, 353.15, 100, 0.2, 4180],
         lambda L: L.call("th_length_for_outlet_ua", "dddddd", 293.15, 333.15, 353.15, 100, 0.2, 4180),
         [(0.2 * 4180 / 100 * math.log(60 / 20), 1e-12, "analytic mdot cp/(UA/L) ln(...)")]),
    Case("length for outlet, flux", "lengthForOutletFlux", [293.15, 313.15, 5000, 0.0785, 0.2, 4180],
         lambda L: L.call("th_length_for_outlet_flux", "dddddd", 293.15, 313.15, 5000, 0.0785, 0.2, 4180),
         [(0.2 * 4180 * 20 / (5000 * 0.0785), 1e-12, "analytic mdot cp dT/(q P)")]),
    Case("version", "version", [], lambda L: (0, L.version())),
    # -- properties (catalogue topic "properties")
    Case("water density 20 C, 1 atm", "waterDensity", [293.15, 101325],
         lambda L: L.call("th_water_density", "dd", 293.15, 101325),
         [(IAPWS97(T=293.15, P=0.101325).rho, 1e-9, "python3-iapws IAPWS97 (IF97 region 1)")]),
    Case("water cp 60 C, 3 bar", "waterCp", [333.15, 3e5],
         lambda L: L.call("th_water_cp", "dd", 333.15, 3e5),
         [(IAPWS97(T=333.15, P=0.3).cp * 1000, 1e-9, "python3-iapws IAPWS97 (IF97 region 1)")]),
    Case("water saturation pressure 100 C", "waterSatPressure", [373.15],
         lambda L: L.call("th_water_saturation_pressure", "d", 373.15),
         [(_PSat_T(373.15) * 1e6, 1e-9, "python3-iapws iapws97._PSat_T (IF97 region 4)")]),
    Case("water saturation temperature 1 atm", "waterSatTemp", [101325],
         lambda L: L.call("th_water_saturation_temperature", "d", 101325),
         [(_TSat_P(0.101325), 1e-9, "python3-iapws iapws97._TSat_P (IF97 region 4)")]),
]

# ------------------------------------------------ properties, entry, tubes
def _ref_rows(name: str) -> list:
    """Rows of a reference CSV in tests/reference/ ('#' lines skipped)."""
    with open(REPO / "tests" / "reference" / name, newline="") as fh:
        lines = [ln for ln in fh if not ln.startswith("#")]
    return [{k: float(v) for k, v in r.items()} for r in csv.DictReader(lines)]


def _props(L, fluid, t, p, what):
    out = M.FluidProps()
    st = getattr(L.so, f"th_{fluid}_props")(t, p, C.byref(out))
    return st, getattr(out, what)


def _eigen(L, wall, n, which):
    lam, coef = C.c_double(), C.c_double()
    fn = L.so.th_graetz_eigen
    fn.argtypes = [C.c_int, C.c_int, C.POINTER(C.c_double), C.POINTER(C.c_double)]
    st = fn(D.WALL[wall], n, C.byref(lam), C.byref(coef))
    return st, (lam if which == "lambda" else coef).value


def _duct(L, duct, ratio, which):
    fre, nut, nuh = C.c_double(), C.c_double(), C.c_double()
    fn = L.so.th_duct_laminar
    fn.argtypes = [C.c_int, C.c_double] + [C.POINTER(C.c_double)] * 3
    st = fn(D.DUCT[duct], ratio, C.byref(fre), C.byref(nut), C.byref(nuh))
    return st, {"fre": fre, "T": nut, "H": nuh}[which].value


ANNULUS = {"inner": 0, "outer": 1}   # th_annulus_wall in tubeheat.h


def _annulus(L, ratio, heated, wall):
    fre, nut, nuh = C.c_double(), C.c_double(), C.c_double()
    fn = L.so.th_annulus_laminar
    fn.argtypes = [C.c_double, C.c_int] + [C.POINTER(C.c_double)] * 3
    st = fn(ratio, ANNULUS[heated], C.byref(fre), C.byref(nut), C.byref(nuh))
    return st, (nut if wall == "T" else nuh).value


# Invented tube scenario (also row 1 of tests/reference/tube_water_iapws.csv):
# water at 288.15 K, 3 bar, 0.3 kg/s in a 22 mm smooth tube 3 m long whose
# wall is held at 343.15 K.
TUBE = ["water", 288.15, 300000, 0.3, 0.022, 3, "temperature", 343.15]
TUBE_REF = next(r for r in _ref_rows("tube_water_iapws.csv")
                if r["d"] == 0.022 and r["length"] == 3 and r["mdot"] == 0.3
                and r["t_in"] == 288.15 and r["kind"] == 0 and r["t_lim"] == 343.15)
TUBE_ITERATIONS = 14  # TH_TUBE_OUT_ITERATIONS in tubeheat.h


def _tube(L, which, args=TUBE):
    case = L.tube_case(*args)
    res = L._result_type()
    st = L.so.th_tube_solve(C.byref(case), res)
    v = C.c_double()
    L.so.th_tube_result_value(res, M.OUT.get(which, TUBE_ITERATIONS), C.byref(v))
    if which == "regime":
        return st, L.so.th_regime_name(int(v.value)).decode()
    if which == "method":
        return st, L.so.th_nusselt_method_name(int(v.value)).decode()
    return st, v.value


def _tube_inverse(L, kind, target, args):
    case = L.tube_case(*args)
    res = L._result_type()
    out = C.c_double()
    fn = getattr(L.so, {"length": "th_tube_length_for_outlet", "flow": "th_tube_flow_for_outlet",
                        "flow_duty": "th_tube_flow_for_duty"}[kind])
    st = fn(C.byref(case), target, C.byref(out), res)
    return st, out.value


# Whole-tube reference values (python3-iapws + python3-fluids + scipy, written
# independently of tubeheat; tests/reference/gen_tube_water_iapws.py).
# The unit tests hold the library to 1e-8 K and 1e-9 relative against them.
TR = TUBE_REF
TUBE_SRC = "tube_water_iapws.csv (python3-iapws/fluids/scipy, independent solution)"
# Uniform wall temperature: NTU = ln((Tw - Tin)/(Tw - Tout)) and
# UA = q / LMTD (analytic identities), with T_out and q from the reference.
NTU_REF = math.log((TR["t_lim"] - TR["t_in"]) / (TR["t_lim"] - TR["t_out"]))
UA_REF = TR["q"] / ((TR["t_out"] - TR["t_in"]) / NTU_REF)

# Air: python3-iapws Air (Lemmon et al. 2000 EOS, Lemmon & Jacobsen 2004
# transport). tubeheat uses the ideal-gas / dilute-gas parts with M =
# 28.9586 g/mol; python3-iapws uses 28.96546 g/mol, so cp is compared per mole
# (as tests/reference/gen_air_iapws.py and test_properties_air.cpp do).
M_AIR = 28.9586e-3
AIR_T = 300.0
_air0 = Air()
AIR_MU0 = Air._visco(0.0, AIR_T)
AIR_K0 = _air0._thermo(0.0, AIR_T)
AIR_CP0 = Air(T=AIR_T, P=0.101325).cp0 * Ma / M_AIR  # kJ/(kg K) * g/mol -> J/(mol K) -> J/(kg K)
AIR_DH_400 = quad(lambda t: Air(T=t, P=0.101325).cp0, 273.15, 400, epsabs=0,
                  epsrel=1e-12)[0] * Ma / M_AIR       # kJ/kg * g/mol = J/mol -> J/kg
AIR_SRC = "python3-iapws Air (Lemmon & Jacobsen 2004 dilute gas / Lemmon et al. 2000 ideal part)"
W20 = IAPWS97(T=293.15, P=0.101325)
W80 = IAPWS97(T=353.15, P=0.2)
IF97 = "python3-iapws IAPWS97 (IF97 region 1, R12-08, R15-11)"
GRAETZ = {(int(r["wall"]), int(r["n"])): r for r in _ref_rows("graetz_scipy.csv")}
DUCTS = {(int(r["shape"]), r["ratio"]): r for r in _ref_rows("ducts_scipy.csv")}

VALUE_CASES += [
    # -- properties: water (IAPWS-IF97 + R12-08 + R15-11 via python3-iapws;
    #    the unit tests hold the library to 1e-9 relative on water_iapws.csv)
    Case("water enthalpy 80 C, 2 bar", "waterEnthalpy", [353.15, 2e5],
         lambda L: L.call("th_water_enthalpy", "dd", 353.15, 2e5),
         [(W80.h * 1000, 1e-9, IF97)]),
    Case("water viscosity 20 C, 1 atm", "waterViscosity", [293.15, 101325],
         lambda L: _props(L, "water", 293.15, 101325, "mu"), [(W20.mu, 1e-9, IF97)]),
    Case("water conductivity 20 C, 1 atm", "waterConductivity", [293.15, 101325],
         lambda L: _props(L, "water", 293.15, 101325, "k"), [(W20.k, 1e-9, IF97)]),
    Case("water Prandtl 20 C, 1 atm", "waterPrandtl", [293.15, 101325],
         lambda L: _props(L, "water", 293.15, 101325, "pr"), [(W20.Prandt, 1e-9, IF97)]),
    # -- properties: dry air at 300 K, default pressure 1 atm
    Case("air density 300 K", "airDensity", [AIR_T],
         lambda L: _props(L, "air", AIR_T, 101325, "rho"),
         # Real-gas compressibility of air at 300 K, 1 atm is ~3e-4; the
         # molar masses differ by 2.4e-4: 1e-3 covers both.
         [(Air(T=AIR_T, P=0.101325).rho, 1e-3, "python3-iapws Air full real-gas EOS (Lemmon et al. 2000)")]),
    Case("air cp 300 K", "airCp", [AIR_T],
         lambda L: _props(L, "air", AIR_T, 101325, "cp"), [(AIR_CP0, 1e-9, AIR_SRC)]),
    Case("air enthalpy 400 K, 1 atm", "airEnthalpy", [400, 101325],
         lambda L: _props(L, "air", 400, 101325, "h"),
         # Library zero is 273.15 K: h = integral of the ideal-gas cp0 from
         # 273.15 K (scipy quad, rel 1e-12), per mole as above.
         [(AIR_DH_400, 1e-9, AIR_SRC + ", integral of cp0 (scipy quad)")]),
    Case("air viscosity 300 K", "airViscosity", [AIR_T],
         lambda L: _props(L, "air", AIR_T, 101325, "mu"), [(AIR_MU0, 1e-9, AIR_SRC)]),
    Case("air conductivity 300 K", "airConductivity", [AIR_T],
         lambda L: _props(L, "air", AIR_T, 101325, "k"), [(AIR_K0, 1e-9, AIR_SRC)]),
    Case("air Prandtl 300 K", "airPrandtl", [AIR_T],
         lambda L: _props(L, "air", AIR_T, 101325, "pr"),
         [(AIR_CP0 * AIR_MU0 / AIR_K0, 1e-9, AIR_SRC + ", cp0 mu0 / k0")]),
    # -- entry region (exact series) and laminar ducts
    Case("thermal entry local Nu_T far downstream", "entryThermalNu", [1.0, "T", "local"],
         lambda L: L.call("th_thermal_entry_nusselt", "dii", 1.0, 0, 1),
         [(3.6567935, 1e-6, "analytic limit Nu_T = 3.6567935 (Shah & London 1978; from memory)")]),
    # The text "inf" means fully developed (x* and x+ arrive as any).
    Case("thermal entry local Nu_T, x* = \"inf\"", "entryThermalNu", ["inf", "T", "local"],
         lambda L: L.call("th_thermal_entry_nusselt", "dii", float("inf"), 0, 1),
         [(3.6567935, 1e-6, "analytic limit Nu_T = 3.6567935 (Shah & London 1978; from memory)")]),
    Case("apparent friction, x+ = \"inf\"", "entryFrictionApparent", ["inf"],
         lambda L: L.call("th_combined_entry_friction", "d", float("inf")),
         [(64.0, 1e-15, "analytic limit 64 (Hagen-Poiseuille)")]),
    Case("thermal entry local Nu_H far downstream", "entryThermalNu", [1.0, "H", "local"],
         lambda L: L.call("th_thermal_entry_nusselt", "dii", 1.0, 1, 1),
         # series terms beyond the first decay like exp(-2 beta_1^2 x*): < 1e-20 at x* = 1
         [(48 / 11, 1e-9, "analytic limit Nu_H = 48/11")]),
    Case("combined entry local Nu_T at x* = 5, Pr 0.7", "entryCombinedNu", [5.0, 0.7, "T", "local"],
         lambda L: L.call("th_combined_entry_nusselt", "ddii", 5.0, 0.7, 0, 1),
         # marched solution, 5e-4 as in test_entry_combined.cpp
         [(3.6567935, 5e-4, "analytic limit Nu_T = 3.6567935 (from memory)")]),
    Case("apparent friction, x+ = 1e6", "entryFrictionApparent", [1e6],
         lambda L: L.call("th_combined_entry_friction", "d", 1e6),
         # f_app Re = 64 + K(inf)/x+ far downstream; K(inf) ~ 1.2 (Shah &
         # London 1978, from memory) leaves 2e-8 relative at x+ = 1e6.
         [(64, 1e-7, "analytic Hagen-Poiseuille f Re = 64 (limit x+ -> inf)")]),
    Case("apparent friction, x+ = 0.01", "entryFrictionApparent", [0.01],
         lambda L: L.call("th_combined_entry_friction", "d", 0.01)),
    Case("first Graetz eigenvalue, T", "graetzEigenvalue", ["T", 0],
         lambda L: _eigen(L, "T", 0, "lambda"),
         [(GRAETZ[(0, 0)]["lambda_ode"], 1e-11, "scipy ODE shooting (graetz_scipy.csv)")]),
    Case("third SSH eigenvalue, H", "graetzEigenvalue", ["H", 2],
         lambda L: _eigen(L, "H", 2, "lambda"),
         [(GRAETZ[(1, 2)]["lambda_ode"], 1e-11, "scipy ODE shooting (graetz_scipy.csv)")]),
    Case("first Graetz coefficient, T", "graetzCoefficient", ["T", 0],
         lambda L: _eigen(L, "T", 0, "coef"),
         [(GRAETZ[(0, 0)]["coef_ode"], 1e-8, "scipy ODE shooting + norm (graetz_scipy.csv)")]),
    Case("duct f Re, parallel plates", "ductFrictionRe", ["parallel plates"],
         lambda L: _duct(L, "parallel plates", 1.0, "fre"),
         [(96, 1e-13, "analytic plane Poiseuille f Re = 96")]),
    Case("duct f Re, rectangle 1:2", "ductFrictionRe", ["rectangle", 0.5],
         lambda L: _duct(L, "rectangle", 0.5, "fre"),
         # the library uses the Shah & London fit: 1e-3 as in test_ducts.cpp
         [(DUCTS[(1, 0.5)]["f_re"], 1e-3, "scipy Fourier series (ducts_scipy.csv)")]),
    Case("duct Nu_T, parallel plates", "ductNu", ["parallel plates", 1, "T"],
         lambda L: _duct(L, "parallel plates", 1.0, "T"),
         [(DUCTS[(2, 0.0)]["nu_t"], 1e-6, "scipy shooting (ducts_scipy.csv)"),
          (7.541, 1e-4, "Shah & London 1978, 7.541 (from memory)")]),
    Case("duct Nu_H, parallel plates", "ductNu", ["parallel plates", 1, "H"],
         lambda L: _duct(L, "parallel plates", 1.0, "H"),
         [(140 / 17, 1e-9, "analytic 140/17 = 8.235")]),
    Case("annulus Nu_T, inner heated, 0.5", "annulusNu", [0.5, "inner", "T"],
         lambda L: _annulus(L, 0.5, "inner", "T"),
         # tabulated and interpolated: 2.5e-3 as in test_ducts.cpp
         [(DUCTS[(3, 0.5)]["nu_t"], 2.5e-3, "scipy ODE solution (ducts_scipy.csv)")]),
    Case("annulus Nu_H, outer heated, 0.5", "annulusNu", [0.5, "outer", "H"],
         lambda L: _annulus(L, 0.5, "outer", "H"),
         [(DUCTS[(4, 0.5)]["nu_h"], 2.5e-3, "scipy quadrature (ducts_scipy.csv)")]),
    # -- whole tube (same scenario for every output)
    Case("tube outlet T", "tubeTOut", TUBE, lambda L: _tube(L, "t_out"),
         [(TR["t_out"], 1e-10, TUBE_SRC)]),   # 1e-8 K absolute in the unit test = 3e-11 relative
    Case("tube duty", "tubeDuty", TUBE, lambda L: _tube(L, "q"), [(TR["q"], 1e-9, TUBE_SRC)]),
    Case("tube h", "tubeH", TUBE, lambda L: _tube(L, "h"), [(TR["h"], 1e-9, TUBE_SRC)]),
    Case("tube Nu", "tubeNu", TUBE, lambda L: _tube(L, "nu")),
    Case("tube Re", "tubeRe", TUBE, lambda L: _tube(L, "re"), [(TR["re"], 1e-9, TUBE_SRC)]),
    Case("tube regime", "tubeRegime", TUBE, lambda L: _tube(L, "regime"),
         [("turbulent", 0, "Re of tube_water_iapws.csv > 10000, thresholds in tubeheat.h (common practice)")]),
    Case("tube friction", "tubeFriction", TUBE, lambda L: _tube(L, "f"),
         [(Colebrook(TR["re"], 0), 1e-9, "python3-fluids Colebrook at the reference Re, smooth tube")]),
    Case("tube pressure drop", "tubeDp", TUBE, lambda L: _tube(L, "dp"), [(TR["dp"], 1e-9, TUBE_SRC)]),
    Case("tube wall T at inlet", "tubeTWallIn", TUBE, lambda L: _tube(L, "t_wall_in"),
         [(343.15, 1e-13, "analytic: uniform wall temperature given"), (TR["t_wall_in"], 1e-10, TUBE_SRC)]),
    Case("tube wall T at outlet", "tubeTWallOut", TUBE, lambda L: _tube(L, "t_wall_out"),
         [(TR["t_wall_out"], 1e-10, TUBE_SRC)]),
    Case("tube UA", "tubeUa", TUBE, lambda L: _tube(L, "ua"),
         [(UA_REF, 1e-8, TUBE_SRC + " + analytic UA = q/LMTD")]),
    Case("tube NTU", "tubeNtu", TUBE, lambda L: _tube(L, "ntu"),
         [(NTU_REF, 1e-8, TUBE_SRC + " + analytic NTU = ln(dT_in/dT_out)")]),
    Case("tube method", "tubeMethod", TUBE, lambda L: _tube(L, "method"),
         [("Gnielinski", 0, "auto choice for turbulent flow documented in tubeheat.h")]),
    Case("tube iterations", "tubeIterations", TUBE, lambda L: _tube(L, "iterations")),
    # -- inverse design: targets from the reference solution, so the answer
    #    is the reference's own input (root-search tolerance: the unit tests
    #    hold round trips to 1e-7 K; 1e-6 relative on L and mdot covers it).
    # (the direct call starts from the catalogue's default guesses:
    #  lengthGuess 1 m, flowGuess 0.1 kg/s)
    Case("tube length for outlet T", "tubeLengthForTOut",
         [TR["t_out"], "water", 288.15, 300000, 0.3, 0.022, "temperature", 343.15],
         lambda L: _tube_inverse(L, "length", TR["t_out"],
                                 ["water", 288.15, 300000, 0.3, 0.022, 1.0, "temperature", 343.15]),
         [(3.0, 1e-6, TUBE_SRC + " (input length)")]),
    Case("tube flow for outlet T", "tubeFlowForTOut",
         [TR["t_out"], "water", 288.15, 300000, 0.022, 3, "temperature", 343.15],
         lambda L: _tube_inverse(L, "flow", TR["t_out"],
                                 ["water", 288.15, 300000, 0.1, 0.022, 3, "temperature", 343.15]),
         [(0.3, 1e-6, TUBE_SRC + " (input mass flow)")]),
    Case("tube flow for duty", "tubeFlowForDuty",
         [TR["q"], "water", 288.15, 300000, 0.022, 3, "temperature", 343.15],
         lambda L: _tube_inverse(L, "flow_duty", TR["q"],
                                 ["water", 288.15, 300000, 0.1, 0.022, 3, "temperature", 343.15]),
         [(0.3, 1e-6, TUBE_SRC + " (input mass flow)")]),
]

# nusseltTable: Re and Pr columns as inline arrays (lists); every row is
# compared with th_nusselt called directly (1e-13) and with Gnielinski's
# formula evaluated here (1e-9).
NU_TABLE_RE = [1e4, 2e4, 5e4, 1e5]
NU_TABLE_PR = [0.7, 5, 5, 20]

ARRAY_CASES = [
    Case("entry state table", "entryStateTable", [1000, 5, 10], array=(2, 6)),
    # Invented case: water heated in a 22 mm tube with its wall at 70 degC.
    Case("tube report", "tubeReport",
         ["water", 288.15, 300000, 0.3, 0.022, 3, "temperature", 343.15], array=(3, 40)),
    Case("Nusselt table, Gnielinski", "nusseltTable", ["Gnielinski", NU_TABLE_RE, NU_TABLE_PR],
         array=(1, len(NU_TABLE_RE)),
         ext=[(gnielinski(r, p), 1e-9, "Gnielinski (1976) with Petukhov f, evaluated here")
              for r, p in zip(NU_TABLE_RE, NU_TABLE_PR)]),
]


ERR = "ERROR Err:502: "
BAD_CASES = [
    Bad("text where a number is due", "reynolds", [998, "fast", 0.025, 0.001],
        "#VALUE!", "10", "ERROR #VALUE!: argument 2 (velocity [m/s]) expects a number"),
    Bad("empty cell as diameter", "reynolds", [998, 1.5, EMPTY, 0.001],
        "Err:502", "10", ERR + "argument 3 (diameter [m]) must be > 0; got the number 0 (an empty cell counts as 0)"),
    Bad("zero cp", "prandtl", [0, 0.001, 0.6], "Err:502", "10", ERR + "argument 1 (cp [J/(kg K)]) must be > 0"),
    Bad("negative density", "reynolds", [-998, 1.5, 0.025, 0.001],
        "Err:502", "10", ERR + "argument 1 (density [kg/m3]) must be > 0"),
    # Re = 1e308 * 1e308 / 1e-3 overflows; the library reports inputs
    # whose result is not representable as bad input (10), Err:502.
    Bad("huge values overflow", "reynolds", [1e308, 1e308, 1.0, 1e-3],
        "Err:502", "10", "ERROR Err:502: "),
    Bad("huge but finite result", "reynolds", [1e308, 1.0, 1.0, 1.0], "number", "0", "OK: value "),
    Bad("error value as argument", "reynolds", [998, Raw("1/0"), 0.025, 0.001],
        "#DIV/0!", "#DIV/0!", "#DIV/0!"),
    Bad("#N/A as argument", "prandtl", [Raw("NA()"), 0.001, 0.6], "#N/A", "#N/A", "#N/A"),
    Bad("unknown method name", "nusselt", ["Smith-Jones", 2e4, 5],
        "Err:502", "11", ERR + "argument 1 (method) names no known method: \"Smith-Jones\""),
    Bad("unknown wall text", "nusselt", ["Gnielinski", 2e4, 5, None, "X"],
        "Err:502", "11", ERR + "argument 5 (wall) does not know \"X\""),
    Bad("zero viscosity ratio", "nusselt", ["Dittus-Boelter", 2e4, 5, None, None, None, None, None, 0],
        "Err:502", "10", ERR + "argument 9 (mu/mu_wall) must be > 0; got the number 0"),
    Bad("empty cell as viscosity ratio", "nusselt",
        ["Dittus-Boelter", 2e4, 5, None, None, None, None, None, EMPTY],
        "Err:502", "10", ERR + "argument 9 (mu/mu_wall) must be > 0; got the number 0 (an empty cell counts as 0)"),
    Bad("empty cell as optional choice", "nusselt", ["Gnielinski", 2e4, 5, None, EMPTY],
        "#VALUE!", "10", "ERROR #VALUE!: argument 5 (wall) expects text such as \"T\", \"H\""),
    Bad("liquid correction without Pr_wall", "nusselt",
        ["Gnielinski", 2e4, 5, None, None, None, None, None, None, None, "liquid"],
        "Err:502", "10", ERR + "bad input"),
    Bad("zero L/D", "nusselt", ["Gnielinski", 2e4, 5, 0], "Err:502", "10",
        ERR + "argument 4 (L/D) must be > 0 (or the text \"inf\")"),
    Bad("text L/D", "nusselt", ["Gnielinski", 2e4, 5, "long"], "#VALUE!", "10",
        "ERROR #VALUE!: argument 4 (L/D) expects a number; got the text \"long\""),
    Bad("empty Re", "nusseltAuto", [EMPTY, 5], "Err:502", "10",
        ERR + "argument 1 (Re) must be > 0; got the number 0"),
    Bad("empty cell as method", "friction", [EMPTY, 1e4], "Err:502", "10",
        ERR + "argument 1 (method) is empty (an empty cell?)"),
    Bad("number as method", "friction", [3, 1e4], "Err:502", "11",
        ERR + "argument 1 (method) names no known method: \"3\""),
    Bad("range where one number is due", "friction", ["Colebrook", 1e4, RangeRef()],
        "#VALUE!", "10", "ERROR #VALUE!: argument 3 (eps/D) expects a single number; got a cell range"),
    Bad("zero Re", "friction", ["Colebrook", 0], "Err:502", "10", ERR + "argument 2 (Re) must be > 0"),
    Bad("relative roughness above 1", "friction", ["Colebrook", 1e4, 1.5], "Err:502", "10", ERR + "bad input"),
    Bad("target beyond the wall temperature", "lengthForOutletWall",
        [293.15, 363.15, 353.15, 100, 0.2, 4180], "#NUM!", "13", "ERROR #NUM!: target unreachable"),
    Bad("heating flux, target below inlet", "lengthForOutletFlux",
        [313.15, 293.15, 5000, 0.0785, 0.2, 4180], "#NUM!", "13", "ERROR #NUM!: target unreachable"),
    Bad("LMTD ends of opposite sign", "lmtd", [10, -5], "Err:502", "10", ERR + "bad input"),
    Bad("LMTD zero end", "lmtd", [0, 10], "Err:502", "10", ERR + "bad input"),
    Bad("outer diameter below inner", "uaTube", [2000, 0.025, 0.02, 16, 10], "Err:502", "10", ERR + "bad input"),
    Bad("zero outside h is not 'not given'", "uaTube", [2000, 0.02, 0.025, 16, 10, 0],
        "Err:502", "10", ERR + "argument 6 (h_outside [W/(m2 K)]) must be > 0 (or the text \"inf\")"),
    Bad("annulus inner above outer", "hydraulicDiameterAnnulus", [0.05, 0.02], "Err:502", "10", ERR + "bad input"),
    Bad("negative kelvin temperature", "heatRate", [0.2, 4180, -5, 300], "Err:502", "10",
        ERR + "argument 3 (T_in [K]) must be > 0"),
    Bad("unknown Graetz convention", "graetz", [1000, 5, 0.02, 0.5, "radius"], "Err:502", "11",
        ERR + "argument 5 (convention) does not know \"radius\""),
    Bad("unknown entry method", "entryState", [1000, 5, 10, "T", "guess"], "Err:502", "11",
        ERR + "argument 5 (method) does not know \"guess\""),
    Bad("range warning shows its value", "nusselt", ["Dittus-Boelter", 1500, 5], "number", "1",
        "WARNING: value "),
    Bad("transitional friction warns", "frictionAuto", [3000], "number", "1", "WARNING: value "),
    Bad("within range is plain ok", "nusselt", ["Gnielinski", 2e4, 5], "number", "0", "OK: value "),
]
