#!/usr/bin/python3
"""Laminar entry-region figure and convergence study, computed by the built
library through ctypes.

    /usr/bin/python3 docs/figures/make_entry_figure.py build-entry/lib/libtubeheat.so
        writes docs/figures/entry-nusselt.png: local and mean Nusselt numbers
        against x* = x/(D Re Pr) for a uniform wall temperature (T) and a
        uniform heat flux (H): the exact thermal entry and the combined entry
        at several Prandtl numbers, with the fully developed limits.

    /usr/bin/python3 docs/figures/make_entry_figure.py LIB --convergence
        prints the grid/step convergence study of the combined-entry solver
        (Markdown tables, as in docs/laminar-entry.md).
"""
import ctypes
import os
import sys
import time

TH_WALL_T, TH_WALL_H = 0, 1
TH_MEAN, TH_LOCAL = 0, 1
TH_ENTRY_THERMAL, TH_ENTRY_COMBINED = 0, 1


def load(path):
    lib = ctypes.CDLL(os.path.abspath(path))
    d, i, p = ctypes.c_double, ctypes.c_int, ctypes.POINTER(ctypes.c_double)
    lib.th_thermal_entry_nusselt.argtypes = [d, i, i, p]
    lib.th_combined_entry_nusselt.argtypes = [d, d, i, i, p]
    lib.th_entry_march_study.argtypes = [i, d, d, i, i, i, d, p]
    lib.th_combined_entry_friction.argtypes = [d, p]
    return lib


def call(fn, *args):
    out = ctypes.c_double()
    status = fn(*args, ctypes.byref(out))
    if status >= 10:
        raise RuntimeError("%s failed with status %d" % (fn.__name__, status))
    return out.value


def figure(lib, out_path):
    import matplotlib
    matplotlib.use("Agg")
    import matplotlib.pyplot as plt
    import numpy as np

    xs = np.logspace(-5, 0, 241)
    prs = [0.7, 7.0, 70.0]
    styles = {0.7: ("tab:red", "--"), 7.0: ("tab:orange", "-."), 70.0: ("tab:green", ":")}
    fig, axes = plt.subplots(2, 2, figsize=(10, 8), sharex=True)
    for row, wall in enumerate((TH_WALL_T, TH_WALL_H)):
        limit = 3.65679 if wall == TH_WALL_T else 48 / 11
        for col, avg in enumerate((TH_LOCAL, TH_MEAN)):
            ax = axes[row][col]
            exact = [call(lib.th_thermal_entry_nusselt, x, wall, avg) for x in xs]
            ax.loglog(xs, exact, color="black", lw=2.0,
                      label="thermal entry, exact (any Pr)")
            for pr in prs:
                c, ls = styles[pr]
                ys = [call(lib.th_combined_entry_nusselt, x, pr, wall, avg) for x in xs]
                ax.loglog(xs, ys, color=c, ls=ls, lw=1.6,
                          label="combined entry, Pr = %g" % pr)
            ax.axhline(limit, color="grey", lw=0.8)
            ax.text(1.5e-5, limit * 1.05, "fully developed %.4g" % limit, color="grey",
                    fontsize=8)
            ax.set_title("%s, %s" % ("uniform wall temperature (T)" if wall == TH_WALL_T
                                     else "uniform heat flux (H)",
                                     "local Nu_x" if avg == TH_LOCAL else "mean Nu_m"),
                         fontsize=10)
            ax.grid(True, which="both", lw=0.3, alpha=0.6)
            ax.set_ylim(3, 400)
            if row == 1:
                ax.set_xlabel("x* = x / (D Re Pr)")
            if col == 0:
                ax.set_ylabel("Nu")
    axes[0][0].legend(fontsize=8, loc="upper right")
    fig.suptitle("Laminar entry region, circular tube (tubeheat; constant properties)",
                 fontsize=11)
    fig.text(0.5, 0.005,
             "Mean = mean heat transfer coefficient over 0..x*. Engineering estimates: "
             "apply margins and have designs reviewed by a qualified engineer.",
             ha="center", fontsize=7)
    fig.tight_layout(rect=(0, 0.02, 1, 0.97))
    fig.savefig(out_path, dpi=120)
    print("wrote", out_path)


def convergence(lib):
    res = [(100, 0.04), (200, 0.02), (400, 0.01), (800, 0.005)]
    pts = [(TH_LOCAL, 1e-5), (TH_LOCAL, 1e-4), (TH_LOCAL, 1e-3), (TH_LOCAL, 1e-2),
           (TH_LOCAL, 0.1), (TH_MEAN, 1e-3), (TH_MEAN, 1e-2), (TH_LOCAL, 10.0)]
    for entry, pr, title in ((TH_ENTRY_COMBINED, 0.7, "combined entry, Pr = 0.7"),
                             (TH_ENTRY_THERMAL, 1.0, "thermal entry by the marcher (exact series known)")):
        for wall in (TH_WALL_T, TH_WALL_H):
            print("\n%s, wall %s\n" % (title, "T" if wall == TH_WALL_T else "H"))
            hdr = "| cells / growth | ms per march | " + " | ".join(
                "%s %g" % ("Nu_x" if a == TH_LOCAL else "Nu_m", x) for a, x in pts) + " |"
            print(hdr)
            print("|" + "---|" * (len(pts) + 2))
            table = []
            for cells, g in res:
                t0 = time.perf_counter()
                call(lib.th_entry_march_study, entry, 1e-3, pr, wall, TH_LOCAL, cells, g)
                ms = (time.perf_counter() - t0) * 1e3
                vals = [call(lib.th_entry_march_study, entry, x, pr, wall, a, cells, g)
                        for a, x in pts]
                table.append(vals)
                print("| %d / %.3f | %.0f | " % (cells, g, ms) +
                      " | ".join("%.5f" % v for v in vals) + " |")
            # Richardson (second order) from the two finest
            rich = [b + (b - a) / 3 for a, b in zip(table[-2], table[-1])]
            print("| Richardson 400/800 | | " + " | ".join("%.5f" % v for v in rich) + " |")
            if entry == TH_ENTRY_THERMAL:
                ex = [call(lib.th_thermal_entry_nusselt, x, wall, a) for a, x in pts]
                print("| exact series | | " + " | ".join("%.5f" % v for v in ex) + " |")
                ref = ex
            else:
                ref = rich
            print("| default vs reference | | " + " | ".join(
                "%+.1e" % (d / r - 1) for d, r in zip(table[1], ref)) + " |")


def main(argv):
    if len(argv) < 2:
        sys.exit(__doc__)
    lib = load(argv[1])
    if "--convergence" in argv:
        convergence(lib)
        return
    here = os.path.dirname(os.path.abspath(__file__))
    figure(lib, os.path.join(here, "entry-nusselt.png"))


if __name__ == "__main__":
    main(sys.argv)
