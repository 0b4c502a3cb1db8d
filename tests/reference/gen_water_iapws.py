#!/usr/bin/python3
"""Reference tables for liquid water from python3-iapws (Debian package),
an implementation of IAPWS-IF97 (R7-97), R12-08 viscosity (used without the
critical enhancement, as its IAPWS97 class does) and R15-11 thermal
conductivity (industrial form) written independently of tubeheat.

Writes, next to this script:
  water_iapws.csv             t, p -> rho, cp, h, mu, k, pr over region 1
  water_saturation_iapws.csv  t -> p_sat and p -> t_sat (region 4)

Regenerate with:  /usr/bin/python3 tests/reference/gen_water_iapws.py
(run from the repository root; the output depends only on python3-iapws).
"""
import os

import iapws
from iapws import IAPWS97
from iapws.iapws97 import _PSat_T, _TSat_P

HERE = os.path.dirname(os.path.abspath(__file__))
CMD = "/usr/bin/python3 tests/reference/gen_water_iapws.py"

# Temperatures over the whole of region 1, 273.15 K .. 623.15 K, denser
# where property gradients are steep (near 0 C and near the upper end).
TEMPS = [273.15, 273.16, 278.15, 283.15, 293.15, 303.15, 313.15, 323.15,
         343.15, 363.15, 373.15, 393.15, 423.15, 453.15, 473.15, 503.15,
         523.15, 553.15, 573.15, 593.15, 613.15, 623.15]
# Pressures [MPa] from near atmospheric to the region's 100 MPa limit; only
# those above p_sat(T) (liquid) are used, plus one point just above p_sat.
PRESSURES = [0.101325, 1.0, 5.0, 20.0, 50.0, 100.0]


def g(x):
    return "%.17g" % x


def water_grid():
    rows = []
    for t in TEMPS:
        psat = _PSat_T(t)
        ps = [psat * 1.001] + [p for p in PRESSURES if p > psat * 1.001]
        for p in ps:
            w = IAPWS97(T=t, P=p)
            assert w.region == 1, (t, p, w.region)
            rows.append([t, p * 1e6, w.rho, w.cp * 1e3, w.h * 1e3, w.mu,
                         w.k, w.Prandt])
    path = os.path.join(HERE, "water_iapws.csv")
    with open(path, "w") as f:
        f.write("# Liquid water, IAPWS-IF97 region 1 + R12-08 viscosity "
                "(no critical enhancement) + R15-11 conductivity "
                "(industrial form), from python3-iapws %s (IAPWS97 class).\n"
                % iapws.__version__)
        f.write("# Regenerate: %s\n" % CMD)
        f.write("# Units: t K, p Pa, rho kg/m3, cp J/(kg K), h J/kg, "
                "mu Pa s, k W/(m K), pr -.\n")
        f.write("t,p,rho,cp,h,mu,k,pr\n")
        for r in rows:
            f.write(",".join(g(x) for x in r) + "\n")
    return len(rows)


def saturation():
    path = os.path.join(HERE, "water_saturation_iapws.csv")
    temps = [273.15, 280.0, 300.0, 325.0, 350.0, 373.15, 400.0, 450.0,
             500.0, 550.0, 600.0, 623.15, 640.0, 647.0]
    press = [611.213e-6, 0.001, 0.01, 0.05, 0.101325, 0.5, 1.0, 2.0, 5.0,
             10.0, 16.5292, 20.0, 22.0]
    with open(path, "w") as f:
        f.write("# Water saturation line, IAPWS-IF97 region 4 (Eqs. 30, 31), "
                "from python3-iapws %s (_PSat_T, _TSat_P).\n"
                % iapws.__version__)
        f.write("# Regenerate: %s\n" % CMD)
        f.write("# kind 0: t given [K], value = p_sat [Pa]; "
                "kind 1: p given [Pa], value = t_sat [K].\n")
        f.write("kind,given,value\n")
        for t in temps:
            f.write("0,%s,%s\n" % (g(t), g(_PSat_T(t) * 1e6)))
        for p in press:
            f.write("1,%s,%s\n" % (g(p * 1e6), g(_TSat_P(p))))
    return len(temps) + len(press)


if __name__ == "__main__":
    n = water_grid()
    m = saturation()
    print("water_iapws.csv: %d states; water_saturation_iapws.csv: %d rows"
          % (n, m))
