#!/usr/bin/python3
"""Draw the method figures in docs/figures from the library's own output.

  nu-vs-re.png        Nu versus Re for each turbulent and transitional method
                      over its published range (range-warning parts dashed)
  friction-chart.png  Darcy friction factor versus Re across roughnesses

Usage: /usr/bin/python3 docs/figures/make_figures.py build/lib/libtubeheat.so [outdir]
"""
import ctypes as C
import math
import os
import sys

import matplotlib

matplotlib.use("Agg")
import matplotlib.pyplot as plt  # noqa: E402

TH_OK, TH_WARN = 0, 1


class Conditions(C.Structure):
    # Mirrors th_conditions in lib/include/tubeheat.h.
    _fields_ = [("re", C.c_double), ("pr", C.c_double), ("l_over_d", C.c_double),
                ("averaging", C.c_int), ("wall", C.c_int), ("direction", C.c_int),
                ("entry", C.c_int), ("mu_ratio", C.c_double), ("rel_roughness", C.c_double),
                ("correction", C.c_int), ("pr_wall", C.c_double), ("t_ratio", C.c_double),
                ("length_factor", C.c_int), ("duct", C.c_int), ("duct_ratio", C.c_double)]


class Result(C.Structure):
    _fields_ = [("nu", C.c_double), ("method", C.c_int), ("method_name", C.c_char_p),
                ("reason", C.c_char_p), ("range_note", C.c_char_p), ("f", C.c_double)]


def load(path):
    lib = C.CDLL(path)
    lib.th_nusselt.argtypes = [C.c_int, C.POINTER(Conditions), C.POINTER(Result)]
    lib.th_conditions_init.argtypes = [C.POINTER(Conditions)]
    lib.th_friction_factor.argtypes = [C.c_int, C.c_double, C.c_double, C.POINTER(C.c_double)]
    lib.th_nusselt_method_from_name.argtypes = [C.c_char_p, C.POINTER(C.c_int)]
    return lib


def nusselt(lib, name, re, pr):
    m = C.c_int()
    assert lib.th_nusselt_method_from_name(name.encode(), C.byref(m)) == TH_OK
    c = Conditions()
    lib.th_conditions_init(C.byref(c))
    c.re, c.pr = re, pr
    c.l_over_d = 60.0 if name == "Gnielinski 2013" else float("inf")
    r = Result()
    s = lib.th_nusselt(m.value, C.byref(c), C.byref(r))
    return (r.nu, s) if s in (TH_OK, TH_WARN) else (None, s)


def logspace(a, b, n):
    return [10 ** (math.log10(a) + (math.log10(b) - math.log10(a)) * i / (n - 1)) for i in range(n)]


def plot_segments(ax, xs, ys, oks, **kw):
    """Solid where the method is in range, dashed where it warns."""
    label = kw.pop("label")
    first = True
    for style, want in (("-", True), ("--", False)):
        seg_x, seg_y = [], []
        for x, y, ok in zip(xs, ys, oks):
            if y is not None and ok == want:
                seg_x.append(x)
                seg_y.append(y)
            elif seg_x:
                ax.plot(seg_x, seg_y, style, label=label if first else None, **kw)
                first = False
                seg_x, seg_y = [], []
        if seg_x:
            ax.plot(seg_x, seg_y, style, label=label if first else None, **kw)
            first = False


def nu_figure(lib, out):
    fig, axes = plt.subplots(1, 2, figsize=(11, 4.6))
    methods = ["Dittus-Boelter", "Sieder-Tate", "Petukhov", "Gnielinski", "Gnielinski 2013"]
    colors = ["tab:blue", "tab:orange", "tab:green", "tab:red", "tab:purple"]
    res = logspace(2300, 5e6, 160)
    for ax, pr in zip(axes, (0.7, 7.0)):
        for name, col in zip(methods, colors):
            # The transition interpolation means nothing beyond its ends.
            rng = [re for re in res if re <= 1e4] if name == "Gnielinski 2013" else res
            vals = [nusselt(lib, name, re, pr) for re in rng]
            plot_segments(ax, rng, [v[0] for v in vals], [v[1] == TH_OK for v in vals], color=col, label=name)
        ax.set_xscale("log")
        ax.set_yscale("log")
        ax.set_xlabel("Re")
        ax.set_ylabel("Nu (fully developed; transition at L/D = 60)")
        ax.set_title("Pr = %g" % pr)
        ax.grid(True, which="both", alpha=0.3)
        ax.legend(fontsize=8)
    fig.suptitle("tubeheat: turbulent and transitional Nusselt methods (dashed = outside published range)", fontsize=10)
    fig.tight_layout()
    fig.savefig(os.path.join(out, "nu-vs-re.png"), dpi=110, metadata={"Software": None})
    plt.close(fig)


def friction_figure(lib, out):
    fig, ax = plt.subplots(figsize=(8, 5.5))
    f = C.c_double()
    lam = logspace(600, 2300, 20)
    ys = []
    for re in lam:
        lib.th_friction_factor(1, re, 0.0, C.byref(f))
        ys.append(f.value)
    ax.plot(lam, ys, "k-", label="laminar 64/Re")
    for rr in (0.0, 1e-5, 1e-4, 1e-3, 5e-3, 1e-2, 3e-2, 5e-2):
        res = logspace(4000, 1e8, 120)
        ys = []
        for re in res:
            lib.th_friction_factor(2, re, rr, C.byref(f))
            ys.append(f.value)
        ax.plot(res, ys, "-", label="Colebrook eps/D = %g" % rr)
    res = logspace(600, 1e8, 300)
    ys = []
    for re in res:
        lib.th_friction_factor(5, re, 1e-3, C.byref(f))
        ys.append(f.value)
    ax.plot(res, ys, ":", color="grey", label="Churchill eps/D = 0.001 (all regimes)")
    ax.set_xscale("log")
    ax.set_yscale("log")
    ax.set_xlabel("Re")
    ax.set_ylabel("Darcy friction factor f")
    ax.set_title("tubeheat: friction factor across roughnesses")
    ax.grid(True, which="both", alpha=0.3)
    ax.legend(fontsize=7, loc="upper right")
    fig.tight_layout()
    fig.savefig(os.path.join(out, "friction-chart.png"), dpi=110, metadata={"Software": None})
    plt.close(fig)


def main():
    lib = load(sys.argv[1])
    out = sys.argv[2] if len(sys.argv) > 2 else os.path.dirname(os.path.abspath(__file__))
    os.makedirs(out, exist_ok=True)
    nu_figure(lib, out)
    friction_figure(lib, out)


if __name__ == "__main__":
    main()
