#!/usr/bin/python3
"""Fail when the committed docs/functions.md differs from what the catalogue
generates now (refresh: cmake --build <dir> --target tubeheat_docs)."""
import argparse
import difflib
import pathlib
import subprocess
import sys
import tempfile

ap = argparse.ArgumentParser()
ap.add_argument("--catalogue", required=True)
ap.add_argument("--committed", required=True)
ns = ap.parse_args()
gen = pathlib.Path(__file__).resolve().parents[2] / "addin" / "gen" / "generate.py"
with tempfile.TemporaryDirectory() as out:
    subprocess.run([sys.executable, str(gen), "--catalogue", ns.catalogue, "--out", out],
                   check=True)
    fresh = (pathlib.Path(out) / "functions.md").read_text(encoding="utf-8")
committed_path = pathlib.Path(ns.committed)
committed = committed_path.read_text(encoding="utf-8") if committed_path.exists() else ""
if fresh != committed:
    diff = difflib.unified_diff(committed.splitlines(), fresh.splitlines(),
                                "committed docs/functions.md", "generated", lineterm="", n=1)
    print("\n".join(list(diff)[:60]))
    print("docs/functions.md is stale: run cmake --build <dir> --target tubeheat_docs")
    sys.exit(1)
print("docs/functions.md matches the catalogue")
