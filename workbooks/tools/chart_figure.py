#!/usr/bin/python3
"""Cut one chart out of a rendered template PDF as a PNG (for docs/figures/).

    /usr/bin/python3 workbooks/tools/chart_figure.py PDF "chart title" OUT.png [--dpi 130]

Finds the page whose text holds the chart title (pdftotext), renders it
(pdftoppm), and crops to the chart's frame: the templates draw every chart
area with a border of one colour (odfsheet.CHART_FRAME), whose long
horizontal and vertical runs give the box. Needs poppler-utils and
python3-matplotlib (Debian).
"""
from __future__ import annotations

import argparse
import pathlib
import subprocess
import sys
import tempfile

import matplotlib

matplotlib.use("Agg")
import matplotlib.image as mpimg  # noqa: E402
import numpy as np  # noqa: E402

sys.path.insert(0, str(pathlib.Path(__file__).resolve().parent))
import odfsheet  # noqa: E402


def page_of(pdf: pathlib.Path, title: str) -> int:
    n = 1
    while True:
        r = subprocess.run(["pdftotext", "-f", str(n), "-l", str(n), str(pdf), "-"],
                           capture_output=True, text=True)
        if r.returncode != 0:
            raise SystemExit(f"chart {title!r} not found in {pdf}")
        if title in " ".join(r.stdout.split()):
            return n
        n += 1


def frame_box(img: np.ndarray) -> tuple:
    colour = np.array([int(odfsheet.CHART_FRAME[i:i + 2], 16) / 255 for i in (1, 3, 5)])
    rgb = img[..., :3]
    mask = np.all(np.abs(rgb - colour) < 0.12, axis=2)
    rows = np.where(mask.sum(axis=1) > 0.4 * img.shape[1])[0]
    cols = np.where(mask.sum(axis=0) > 0.2 * img.shape[0])[0]
    if len(rows) < 2 or len(cols) < 2:
        raise SystemExit("chart frame not found on the page")
    return rows.min(), rows.max(), cols.min(), cols.max()


def main() -> int:
    ap = argparse.ArgumentParser(description=__doc__.splitlines()[0])
    ap.add_argument("pdf")
    ap.add_argument("title")
    ap.add_argument("out")
    ap.add_argument("--dpi", type=int, default=130)
    ns = ap.parse_args()
    pdf = pathlib.Path(ns.pdf)
    page = page_of(pdf, ns.title)
    with tempfile.TemporaryDirectory() as tmp:
        stem = pathlib.Path(tmp) / "page"
        subprocess.run(["pdftoppm", "-r", str(ns.dpi), "-f", str(page), "-l", str(page),
                        "-singlefile", "-png", str(pdf), str(stem)], check=True)
        img = mpimg.imread(str(stem) + ".png")
    top, bottom, left, right = frame_box(img)
    mpimg.imsave(ns.out, img[top:bottom + 1, left:right + 1, :3])
    print(f"wrote {ns.out} (page {page}, {right - left + 1} x {bottom - top + 1} px)")
    return 0


if __name__ == "__main__":
    sys.exit(main())
