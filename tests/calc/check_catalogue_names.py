#!/usr/bin/python3
"""Every method name the catalogue documents (addin/catalogue/*.toml,
[[methods]] names) must resolve through the library's own
th_*_method_from_name, so the Function Wizard never advertises a name the
spreadsheet then rejects."""
import argparse
import ctypes
import json
import sys

ap = argparse.ArgumentParser()
ap.add_argument("--lib", required=True)
ap.add_argument("--catalogue-json", required=True)
ns = ap.parse_args()
lib = ctypes.CDLL(ns.lib)
cat = json.load(open(ns.catalogue_json, encoding="utf-8"))
bad = []
count = 0
for key, m in cat["methods"].items():
    fn = getattr(lib, m["from_name"])
    for name in m["names"]:
        v = ctypes.c_int()
        count += 1
        if fn(name.encode(), ctypes.byref(v)) >= 10:
            bad.append(f"{key}: {name!r}")
if bad:
    print("names the library does not know:", ", ".join(bad))
    sys.exit(1)
print(f"{count} documented method names resolve")
