#!/usr/bin/python3
"""Reference whole-tube solutions for water in a circular tube, computed
independently of tubeheat from its documented one-shot definition
(docs/tube-solve.md) with Debian's python3-iapws (IAPWS-IF97 with R12-08
viscosity and R15-11 conductivity), python3-fluids (Colebrook friction
factor) and python3-scipy (brentq root finding).

The one-shot definition reproduced here:
  - properties at the mean bulk temperature (t_in + t_out)/2, inlet pressure;
  - Gnielinski (1976) with Petukhov's smooth-tube f (Colebrook f when the
    tube is rough), the mean length factor 1 + (D/L)^(2/3) and the liquid
    property correction (Pr/Pr_w)^0.11, Pr_w at the mean wall temperature;
  - wall temperature: the given one (T); t_m + q''/h (flux); for an
    outside fluid t_m + (t_inf - t_m)/(1 + h R_rest), R_rest the resistance
    beyond the inside film per unit inner area;
  - t_out: exponential relation with cp_mean = (h(t_out) - h(t_in))/dT (T,
    outside) or h(t_out) = h(t_in) + q'' pi D L/mdot (flux);
  - q = mdot (h(t_out) - h(t_in)); end wall temperatures with the mean h;
  - dp = f_Colebrook (L/D) G^2/(2 rho_m) + G^2 (1/rho_out - 1/rho_in).
Every case has Re > 1e4 and 0.5 < Pr < 2000, so the library's automatic
choice is Gnielinski (1976).

Regenerate with:  /usr/bin/python3 tests/reference/gen_tube_water_iapws.py
(run from the repository root).
"""
import math
import os

import fluids
import iapws
import scipy
from fluids.friction import Colebrook
from iapws import IAPWS97
from scipy.optimize import brentq

HERE = os.path.dirname(os.path.abspath(__file__))
CMD = "/usr/bin/python3 tests/reference/gen_tube_water_iapws.py"
XTOL = 1e-12

# kind: 0 wall temperature, 1 flux, 2 outside fluid (columns as in the CSV)
CASES = [
    # d,     L,    eps,    mdot, t_in,   p,     kind, t_w/t_inf, q_flux, h_o,   k_w,  thick,  rf_i,  rf_o
    (0.022, 3.0,  0.0,    0.30, 288.15, 3e5,   0, 343.15, 0.0,     0.0,    0.0,  0.0,    0.0,   0.0),
    (0.022, 12.0, 0.0,    0.50, 288.15, 3e5,   0, 363.15, 0.0,     0.0,    0.0,  0.0,    0.0,   0.0),
    (0.015, 4.0,  4.5e-5, 0.25, 353.15, 5e5,   0, 293.15, 0.0,     0.0,    0.0,  0.0,    0.0,   0.0),
    (0.030, 6.0,  0.0,    0.80, 293.15, 2e5,   1, 0.0,    40000.0, 0.0,    0.0,  0.0,    0.0,   0.0),
    (0.020, 2.5,  1.5e-6, 0.20, 333.15, 4e5,   1, 0.0,   -25000.0, 0.0,    0.0,  0.0,    0.0,   0.0),
    (0.022, 5.0,  0.0,    0.30, 288.15, 3e5,   2, 373.15, 0.0,     5000.0, 16.0, 0.001,  1e-4,  2e-4),
    (0.025, 8.0,  1.5e-6, 0.60, 343.15, 3e5,   2, 283.15, 0.0,     800.0,  380.0, 0.0015, 0.0,  0.0),
]


def props(t, p):
    w = IAPWS97(T=t, P=p / 1e6)
    assert w.region == 1, (t, p)
    return dict(rho=w.rho, cp=w.cp * 1e3, h=w.h * 1e3, mu=w.mu, k=w.k,
                pr=w.cp * 1e3 * w.mu / w.k)


def petukhov_f(re):
    return (0.790 * math.log(re) - 1.64) ** -2


def gnielinski(re, pr, pr_w, d, length, rel_rough):
    f = Colebrook(re, rel_rough) if rel_rough > 0 else petukhov_f(re)
    f8 = f / 8.0
    nu = f8 * (re - 1000.0) * pr / (1.0 + 12.7 * math.sqrt(f8) * (pr ** (2.0 / 3.0) - 1.0))
    return nu * (1.0 + (d / length) ** (2.0 / 3.0)) * (pr / pr_w) ** 0.11


def solve(case):
    d, L, eps, mdot, t_in, p, kind, t_lim, qf, h_o, k_w, thick, rf_i, rf_o = case
    area = math.pi * d * d / 4.0
    per = math.pi * d
    g_flux = mdot / area
    h_in = props(t_in, p)["h"]
    if kind == 2:
        d_o = d + 2.0 * thick
        r_wall = d * math.log(d_o / d) / (2.0 * k_w) if thick > 0 else 0.0
        r_rest = rf_i + r_wall + (d / d_o) * (rf_o + 1.0 / h_o)
    else:
        r_rest = 0.0

    def film(t_m):
        b = props(t_m, p)
        re = 4.0 * mdot / (math.pi * d * b["mu"])

        def h_for(t_w):
            w = props(t_w, p)
            return gnielinski(re, b["pr"], w["pr"], d, L, eps / d) * b["k"] / d

        def surface(h):
            if kind == 0:
                return t_lim
            if kind == 1:
                return t_m + qf / h
            return t_m + (t_lim - t_m) / (1.0 + h * r_rest)

        if kind == 0:
            t_w = t_lim
        else:
            # wall temperature: root of surface(h(t_w)) - t_w
            lo, hi = (t_m, t_lim) if kind == 2 else sorted((t_m, t_m + 3.0 * qf / h_for(t_m)))
            if kind == 2 and lo > hi:
                lo, hi = hi, lo
            t_w = brentq(lambda tw: surface(h_for(tw)) - tw, lo, hi, xtol=XTOL)
        h = h_for(t_w)
        return b, re, h, surface

    def cp_mean(t_out):
        if abs(t_out - t_in) < 1e-3:
            return props(0.5 * (t_in + t_out), p)["cp"]
        return (props(t_out, p)["h"] - h_in) / (t_out - t_in)

    if kind == 1:
        dh = qf * per * L / mdot
        guess = t_in + dh / props(t_in, p)["cp"]
        lo, hi = sorted((t_in + 0.5 * (guess - t_in), t_in + 2.0 * (guess - t_in)))
        t_out = brentq(lambda t: props(t, p)["h"] - h_in - dh, lo, hi, xtol=XTOL)
    else:
        def g(t):
            b, re, h, surface = film(0.5 * (t_in + t))
            u = h / (1.0 + h * r_rest)
            ntu = u * per * L / (mdot * cp_mean(t))
            return t_lim - (t_lim - t_in) * math.exp(-ntu) - t
        lo, hi = sorted((t_in, t_lim))
        t_out = brentq(g, lo, hi, xtol=XTOL)
    t_m = 0.5 * (t_in + t_out)
    b, re, h, surface = film(t_m)
    q = mdot * (props(t_out, p)["h"] - h_in)
    f = Colebrook(re, eps / d)
    rho_in, rho_out = props(t_in, p)["rho"], props(t_out, p)["rho"]
    dp = f * (L / d) * g_flux ** 2 / (2.0 * b["rho"]) + g_flux ** 2 * (1.0 / rho_out - 1.0 / rho_in)
    tw_in = surface(h) if kind == 0 else (t_in + qf / h if kind == 1 else t_in + (t_lim - t_in) / (1.0 + h * r_rest))
    tw_out = surface(h) if kind == 0 else (t_out + qf / h if kind == 1 else t_out + (t_lim - t_out) / (1.0 + h * r_rest))
    return [t_out, q, h, re, dp, tw_in, tw_out]


def g17(x):
    return "%.17g" % x


def main():
    path = os.path.join(HERE, "tube_water_iapws.csv")
    with open(path, "w") as f:
        f.write("# Whole-tube one-shot solutions, water in circular tubes, computed "
                "from the definition in docs/tube-solve.md with python3-iapws %s, "
                "python3-fluids %s (Colebrook), python3-scipy %s (brentq).\n"
                % (iapws.__version__, fluids.__version__, scipy.__version__))
        f.write("# Regenerate: %s\n" % CMD)
        f.write("# kind: 0 wall temperature (t_lim = wall), 1 uniform flux, "
                "2 outside fluid (t_lim = outside). Units SI, K.\n")
        f.write("d,length,eps,mdot,t_in,p,kind,t_lim,q_flux,h_o,k_w,thickness,rf_i,rf_o,"
                "t_out,q,h,re,dp,t_wall_in,t_wall_out\n")
        for c in CASES:
            f.write(",".join(g17(x) for x in list(c) + solve(c)) + "\n")
    print("wrote", path)


if __name__ == "__main__":
    main()
