"""libtubeheat called directly through ctypes for what the template
workbooks use beyond tests/calc/th_direct.py: the property sets of water and
air, and the whole-tube solver. Written by hand from lib/include/tubeheat.h
(the header is the reference), independently of the add-in's generated
dispatch, so a wiring mistake in a template or in the catalogue shows up as
a difference.

The tube result is read only through th_tube_result_value() (the header's
accessor for single values), so only th_tube_case is mirrored here.
"""
from __future__ import annotations

import ctypes as C
import math
import pathlib
import sys

sys.path.insert(0, str(pathlib.Path(__file__).resolve().parents[1] / "calc"))

import th_direct  # noqa: E402  (tests/calc/th_direct.py)

TH_FLUID_TABLE_MAX = 16
FLUID = {"water": 0, "air": 1, "user": 2}
SHAPE = {"circle": 0, "rectangle": 1, "parallel plates": 2, "annulus": 3}
TUBE_WALL = {"temperature": 0, "flux": 1, "outside": 2}
SOLUTION = {"one-shot": 0, "marching": 200}   # the catalogue's segment counts
OUT = {"t_out": 0, "q": 1, "h": 2, "nu": 3, "re": 4, "pr": 5, "regime": 6, "f": 7, "dp": 8,
       "ua": 9, "ntu": 10, "t_wall_in": 11, "t_wall_out": 12, "method": 13}


class FluidProps(C.Structure):
    _fields_ = [("rho", C.c_double), ("cp", C.c_double), ("mu", C.c_double),
                ("k", C.c_double), ("pr", C.c_double), ("h", C.c_double),
                ("range_note", C.c_char_p)]


class Fluid(C.Structure):
    _fields_ = [("kind", C.c_int), ("gas", C.c_int), ("n", C.c_int),
                ("t", C.c_double * TH_FLUID_TABLE_MAX), ("rho", C.c_double * TH_FLUID_TABLE_MAX),
                ("cp", C.c_double * TH_FLUID_TABLE_MAX), ("mu", C.c_double * TH_FLUID_TABLE_MAX),
                ("k", C.c_double * TH_FLUID_TABLE_MAX)]


class Geometry(C.Structure):
    _fields_ = [("shape", C.c_int), ("d", C.c_double), ("d_inner", C.c_double),
                ("a", C.c_double), ("b", C.c_double), ("length", C.c_double),
                ("roughness", C.c_double)]


class Wall(C.Structure):
    _fields_ = [("kind", C.c_int), ("t_wall", C.c_double), ("q_flux", C.c_double),
                ("t_outside", C.c_double), ("h_outside", C.c_double), ("k_wall", C.c_double),
                ("thickness", C.c_double), ("rf_inside", C.c_double), ("rf_outside", C.c_double)]


class Options(C.Structure):
    _fields_ = [("method", C.c_int), ("friction", C.c_int), ("entry", C.c_int),
                ("correction", C.c_int), ("nu_wall", C.c_int), ("length_factor", C.c_int),
                ("segments", C.c_int), ("tolerance", C.c_double), ("max_iterations", C.c_int)]


class TubeCase(C.Structure):
    _fields_ = [("fluid", Fluid), ("t_in", C.c_double), ("p_in", C.c_double),
                ("mdot", C.c_double), ("geometry", Geometry), ("wall", Wall),
                ("options", Options)]


class Lib(th_direct.Lib):
    def __init__(self, path: str):
        super().__init__(path)
        s = self.so
        for name in ("th_water_props", "th_air_props"):
            getattr(s, name).argtypes = [C.c_double, C.c_double, C.POINTER(FluidProps)]
        s.th_tube_case_init.argtypes = [C.POINTER(TubeCase)]
        s.th_tube_case_set.argtypes = [C.POINTER(TubeCase), C.c_int, C.c_int, C.c_double,
                                       C.c_double, C.c_int, C.c_double]
        # The result is opaque here: a buffer larger than th_tube_result.
        self._result_type = C.c_double * 256
        s.th_tube_solve.argtypes = [C.POINTER(TubeCase), C.c_void_p]
        s.th_tube_result_value.argtypes = [C.c_void_p, C.c_int, C.POINTER(C.c_double)]
        for name in ("th_tube_length_for_outlet", "th_tube_flow_for_outlet",
                     "th_tube_flow_for_duty"):
            getattr(s, name).argtypes = [C.POINTER(TubeCase), C.c_double,
                                         C.POINTER(C.c_double), C.c_void_p]

    # ------------------------------------------------------------ properties
    def props(self, fluid: str, t: float, p: float) -> FluidProps:
        out = FluidProps()
        st = getattr(self.so, f"th_{fluid}_props")(t, p, C.byref(out))
        assert st in (0, 1), f"th_{fluid}_props({t}, {p}) status {st}"
        return out

    def value(self, name: str, *args, sig: str | None = None, outs: str = "d") -> float:
        """th_<name>(args..., &out...) with every argument a double (or the
        types in sig); returns the first output; asserts ok or a range
        warning."""
        st, v = self.call(name, sig or "d" * len(args), *args, outs=outs)
        assert st in (0, 1), f"{name}{args} status {st}"
        return v

    def nu(self, method: str, re: float, pr: float, **fields) -> float:
        st, r = self.nusselt(method, re, pr, **fields)
        assert st in (0, 1), f"th_nusselt({method}, {re}, {pr}, {fields}) status {st}"
        return r.nu

    # ------------------------------------------------------------ tube solver
    def tube_case(self, fluid, t_in, p_in, mdot, size1, length, wall, wall_value,
                  roughness=0.0, method="auto", solution="one-shot", shape="circle", size2=0.0,
                  h_outside=math.inf, k_wall=None, thickness=0.0, rf_in=0.0, rf_out=0.0):
        c = TubeCase()
        assert self.so.th_tube_case_init(C.byref(c)) == 0
        assert self.so.th_tube_case_set(C.byref(c), FLUID[fluid], SHAPE[shape], size1, size2,
                                        TUBE_WALL[wall], wall_value) == 0
        c.t_in, c.p_in, c.mdot = t_in, p_in, mdot
        c.geometry.length, c.geometry.roughness = length, roughness
        c.options.method = self.method("nusselt", method)
        c.options.segments = SOLUTION[solution]
        c.wall.h_outside, c.wall.thickness = h_outside, thickness
        if k_wall is not None:
            c.wall.k_wall = k_wall
        c.wall.rf_inside, c.wall.rf_outside = rf_in, rf_out
        return c

    def _read(self, res, which: str) -> float:
        v = C.c_double()
        assert self.so.th_tube_result_value(res, OUT[which], C.byref(v)) == 0
        return v.value

    def tube(self, case: TubeCase, which: str) -> float:
        res = self._result_type()
        st = self.so.th_tube_solve(C.byref(case), res)
        assert st in (0, 1), f"th_tube_solve status {st}"
        return self._read(res, which)

    def tube_inverse(self, kind: str, case: TubeCase, target: float) -> float:
        res = self._result_type()
        out = C.c_double()
        fn = getattr(self.so, {"length": "th_tube_length_for_outlet",
                               "flow": "th_tube_flow_for_outlet",
                               "flow_duty": "th_tube_flow_for_duty"}[kind])
        st = fn(C.byref(case), target, C.byref(out), res)
        assert st in (0, 1), f"{kind} inverse status {st}"
        return out.value
