#!/usr/bin/python3
"""Reference table for dry air from python3-iapws (Debian package), class
iapws.humidAir.Air: the full Lemmon, Jacobsen, Penoncello & Friend (2000)
equation of state for air and the full Lemmon & Jacobsen (2004) viscosity
and thermal-conductivity equations, including the density-dependent
(residual and critical) terms that tubeheat leaves out. Written
independently of tubeheat.

Columns per state (t [K], p [Pa]):
  rho, cp, h, mu, k   the full real-gas formulation at (t, p)
                      [kg/m3, J/(kg K), J/kg, Pa s, W/(m K)];
  cp0_molar           ideal-gas heat capacity [J/(mol K)] (python3-iapws
                      uses the IAPWS humid-air molar mass 28.96546 g/mol
                      for air, Lemmon et al. use 28.9586 g/mol, so compare
                      per mole);
  mu0, k0             the dilute-gas (zero-density) terms alone
                      [Pa s, W/(m K)].

Regenerate with:  /usr/bin/python3 tests/reference/gen_air_iapws.py
(run from the repository root; the output depends only on python3-iapws).
"""
import os

import iapws
from iapws.humidAir import Air, Ma

HERE = os.path.dirname(os.path.abspath(__file__))
CMD = "/usr/bin/python3 tests/reference/gen_air_iapws.py"

# The library's in-range box is 200-2000 K at p <= 0.2 MPa; 150-200 K,
# 2000-3000 K and 0.2-1 MPa are its warning band (the reference formulation
# stops at 2000 K, so the band above it is not tabulated).
TEMPS = [150.0, 175.0, 200.0, 225.0, 250.0, 273.15, 300.0, 325.0, 350.0,
         400.0, 450.0, 500.0, 600.0, 700.0, 800.0, 900.0, 1000.0, 1100.0,
         1200.0, 1300.0, 1400.0, 1500.0, 1750.0, 2000.0]
PRESSURES = [101325.0, 200000.0, 1000000.0]


def g(x):
    return "%.17g" % x


def main():
    path = os.path.join(HERE, "air_iapws.csv")
    n = 0
    with open(path, "w") as f:
        f.write("# Dry air, full Lemmon et al. (2000) EOS and Lemmon & "
                "Jacobsen (2004) transport, from python3-iapws %s "
                "(iapws.humidAir.Air, M = %s g/mol).\n"
                % (iapws.__version__, Ma))
        f.write("# Regenerate: %s\n" % CMD)
        f.write("# Units: t K, p Pa, rho kg/m3, cp J/(kg K), h J/kg, "
                "mu Pa s, k W/(m K), cp0_molar J/(mol K), mu0 Pa s, "
                "k0 W/(m K).\n")
        f.write("t,p,rho,cp,h,mu,k,cp0_molar,mu0,k0\n")
        zero_density = Air()
        for p in PRESSURES:
            for t in TEMPS:
                a = Air(T=t, P=p / 1e6)
                row = [t, p, a.rho, a.cp * 1e3, a.h * 1e3, a.mu, a.k,
                       a.cp0 * Ma, Air._visco(0.0, t),
                       zero_density._thermo(0.0, t)]
                f.write(",".join(g(x) for x in row) + "\n")
                n += 1
    print("air_iapws.csv: %d states" % n)


if __name__ == "__main__":
    main()
