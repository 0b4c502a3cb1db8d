#!/usr/bin/python3
"""Static checks of the packaged tubeheat.oxt, no LibreOffice run needed:

- the type library shipped (tubeheat.rdb, read back with the SDK's
  unoidl-read) and CalcAddIns.xcu name the same methods and, per method, the
  same parameters in the same order: otherwise the Function Wizard shows ###;
- every function and parameter has an English display name and a description,
  and every number parameter's description states its unit;
- the manifest lists the type library, the components file and the xcu;
- description.xml carries identifier, version, publisher, licence and the
  LibreOffice 7.4 minimum; the LICENSE, the component and libtubeheat are in.
"""
import argparse
import re
import subprocess
import sys
import tempfile
import xml.etree.ElementTree as ET
import zipfile
from pathlib import Path

sys.path.insert(0, str(Path(__file__).resolve().parents[2] / "addin" / "gen"))
from catalogue import SERVICE  # noqa: E402

ap = argparse.ArgumentParser()
ap.add_argument("--oxt", required=True)
ap.add_argument("--sdk", default="/usr/lib/libreoffice/sdk")
ap.add_argument("--program", default="/usr/lib/libreoffice/program")
ns = ap.parse_args()
fail = []
OOR = "{http://openoffice.org/2001/registry}"

with zipfile.ZipFile(ns.oxt) as z, tempfile.TemporaryDirectory() as tmp:
    names = set(z.namelist())
    for need in ("META-INF/manifest.xml", "description.xml", "LICENSE", "tubeheat.rdb",
                 "tubeheat.components", "CalcAddIns.xcu", "tubeheat_calc.so", "libtubeheat.so.0"):
        if need not in names:
            fail.append(f"missing in the .oxt: {need}")
    z.extractall(tmp)
    idl = subprocess.run([f"{ns.sdk}/bin/unoidl-read", f"{ns.program}/types.rdb",
                          f"{ns.program}/types/offapi.rdb", f"{tmp}/tubeheat.rdb"],
                         capture_output=True, text=True, check=True).stdout
    methods = {}
    for m in re.finditer(r"^\s+\S+ (\w+)\(([^)]*)\)", idl, re.M):
        params = [p.strip().split()[-1] for p in m.group(2).split(",") if p.strip()]
        types = [" ".join(p.strip().split()[1:-1]) for p in m.group(2).split(",") if p.strip()]
        methods[m.group(1)] = (params, types)
    xcu = ET.parse(f"{tmp}/CalcAddIns.xcu").getroot()
    service = xcu.find(f"node/node[@{OOR}name='{SERVICE}']")
    funcs = service.find("node") if service is not None else None
    if funcs is None:
        fail.append(f"CalcAddIns.xcu has no AddInInfo/{SERVICE}/AddInFunctions")
        funcs = []

    def prop(node, name):
        p = node.find(f"prop[@{OOR}name='{name}']/value")
        return (p.text or "").strip() if p is not None else ""

    seen = set()
    for fn in funcs:
        fid = fn.get(f"{OOR}name")
        seen.add(fid)
        if fid not in methods:
            fail.append(f"xcu function {fid} is not in the type library")
            continue
        for key in ("DisplayName", "Description", "Category"):
            if not prop(fn, key):
                fail.append(f"{fid}: empty {key}")
        if not prop(fn, "DisplayName").startswith("TH."):
            fail.append(f"{fid}: display name without the TH. prefix")
        params = [p.get(f"{OOR}name") for p in fn.find("node")]
        idl_params, idl_types = methods[fid]
        if params != idl_params:
            fail.append(f"{fid}: xcu parameters {params} != type library {idl_params}")
        for p, t in zip(fn.find("node"), idl_types):
            if not prop(p, "DisplayName") or not prop(p, "Description"):
                fail.append(f"{fid}.{p.get(OOR + 'name')}: no display name or description")
            desc = prop(p, "Description")
            if t == "double" and "Unit:" not in desc:
                fail.append(f"{fid}.{p.get(OOR + 'name')}: number without a unit in its help")
    for fid in methods:
        if fid not in seen:
            fail.append(f"type library method {fid} has no Function Wizard entry")
    man = open(f"{tmp}/META-INF/manifest.xml", encoding="utf-8").read()
    for t in ("uno-typelibrary;type=RDB", "uno-components;platform=", "configuration-data"):
        if t not in man:
            fail.append(f"manifest lacks {t}")
    desc = open(f"{tmp}/description.xml", encoding="utf-8").read()
    for t in ('identifier value="org.tubeheat.calc"', "<version value=", "<publisher>",
              "simple-license", 'LibreOffice-minimal-version value="7.4"'):
        if t not in desc:
            fail.append(f"description.xml lacks {t}")
    if "MIT License" not in open(f"{tmp}/LICENSE", encoding="utf-8").read():
        fail.append("LICENSE is not the MIT licence")
    readelf = subprocess.run(["readelf", "-d", f"{tmp}/tubeheat_calc.so"],
                             capture_output=True, text=True).stdout
    if "[$ORIGIN]" not in readelf or "libtubeheat.so.0" not in readelf:
        fail.append("the component does not load libtubeheat.so.0 through rpath $ORIGIN")

for f in fail:
    print("FAIL:", f)
print(f"{len(methods)} methods checked in the type library and CalcAddIns.xcu")
sys.exit(1 if fail else 0)
