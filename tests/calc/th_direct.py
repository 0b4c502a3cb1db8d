"""Call libtubeheat directly through ctypes: the reference the spreadsheet
results are compared with (same library, no add-in, no LibreOffice).
Written by hand from lib/include/tubeheat.h, independently of the add-in's
generated dispatch, so a mapping mistake in the catalogue shows up."""
from __future__ import annotations

import ctypes as C
import math

TH_WARN_RANGE = 1


class Conditions(C.Structure):
    _fields_ = [("re", C.c_double), ("pr", C.c_double), ("l_over_d", C.c_double),
                ("averaging", C.c_int), ("wall", C.c_int), ("direction", C.c_int),
                ("entry", C.c_int), ("mu_ratio", C.c_double),
                ("rel_roughness", C.c_double), ("correction", C.c_int),
                ("pr_wall", C.c_double), ("t_ratio", C.c_double),
                ("length_factor", C.c_int), ("duct", C.c_int),
                ("duct_ratio", C.c_double)]


class NusseltResult(C.Structure):
    _fields_ = [("nu", C.c_double), ("method", C.c_int),
                ("method_name", C.c_char_p), ("reason", C.c_char_p),
                ("range_note", C.c_char_p), ("f", C.c_double)]


class EntryInfo(C.Structure):
    _fields_ = [("regime", C.c_int), ("hydro_developed", C.c_int),
                ("thermal_developed", C.c_int), ("x_fd_hydro_over_d", C.c_double),
                ("x_fd_thermal_over_d", C.c_double), ("x_star", C.c_double)]


# Enum values from tubeheat.h, by the texts the spreadsheet uses.
WALL = {"T": 0, "H": 1}
AVERAGING = {"mean": 0, "local": 1}
DIRECTION = {"heating": 0, "cooling": 1}
ENTRY_KIND = {"thermal": 0, "combined": 1}
CORRECTION = {"none": 0, "liquid": 1, "gas": 2}
DUCT = {"circle": 0, "rectangle": 1, "parallel plates": 2, "annulus": 3}
ENTRY_METHOD = {"auto": 0, "common": 1, "Shah-London": 2, "Durst": 3,
                "turbulent 10D": 4, "turbulent 60D": 5}
GRAETZ = {"diameter": 0, "mass flow": 1}


class Lib:
    def __init__(self, path: str):
        self.so = C.CDLL(path)
        self.so.th_status_message.restype = C.c_char_p
        self.so.th_regime_name.restype = C.c_char_p
        self.so.th_version_string.restype = C.c_char_p
        self.so.th_friction_method_name.restype = C.c_char_p
        self.so.th_nusselt_method_name.restype = C.c_char_p

    def call(self, name: str, sig: str, *args, outs: str = "d"):
        """Call th_<name>(args..., &out...) where sig gives each input's C
        type ('d' double, 'i' int) and outs the outputs. Returns (status,
        first output value)."""
        assert len(sig) == len(args), (name, sig, args)
        conv = [C.c_double(float(a)) if t == "d" else C.c_int(int(a))
                for t, a in zip(sig, args)]
        out_objs = [C.c_double() if t == "d" else C.c_int() for t in outs]
        fn = getattr(self.so, name)
        fn.restype = C.c_int
        st = fn(*conv, *[C.byref(o) for o in out_objs])
        return st, out_objs[0].value

    def method(self, kind: str, text: str) -> int:
        v = C.c_int()
        st = getattr(self.so, f"th_{kind}_method_from_name")(text.encode(), C.byref(v))
        if st >= 10:
            raise KeyError(f"{kind} method {text!r}: status {st}")
        return v.value

    def nusselt(self, method: str, re: float, pr: float, **fields):
        c = Conditions()
        assert self.so.th_conditions_init(C.byref(c)) == 0
        c.re, c.pr = re, pr
        for k, v in fields.items():
            setattr(c, k, v)
        r = NusseltResult()
        st = self.so.th_nusselt(self.method("nusselt", method), C.byref(c), C.byref(r))
        return st, r

    def entry_state(self, method: str, re, pr, x_over_d, wall="T"):
        info = EntryInfo()
        self.so.th_entry_state.argtypes = [C.c_int, C.c_double, C.c_double,
                                           C.c_double, C.c_int, C.POINTER(EntryInfo)]
        st = self.so.th_entry_state(ENTRY_METHOD[method], re, pr, x_over_d,
                                    WALL[wall], C.byref(info))
        return st, info

    def regime_name(self, re: float) -> str:
        st, reg = self.call("th_regime_of", "d", re, outs="i")
        assert st == 0
        return self.so.th_regime_name(reg).decode()

    def version(self) -> str:
        return self.so.th_version_string().decode()


def close(a: float, b: float, rtol: float) -> bool:
    return math.isfinite(a) and math.isfinite(b) and abs(a - b) <= rtol * max(abs(a), abs(b), 1e-300)
