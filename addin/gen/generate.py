#!/usr/bin/python3
"""Generate the Calc add-in sources from the function catalogue.

    generate.py --catalogue addin/catalogue --out <dir>   # write all outputs
    generate.py --catalogue addin/catalogue --check       # validate only

Outputs (in <dir>): XCalcFunctions.idl, dispatch.hpp, dispatch.cpp,
CalcAddIns.xcu, functions.md, functions.json (the catalogue, resolved, for the
tests). Files are rewritten only when their content changes, so an unchanged
catalogue does not rebuild the component. Standard library only.
"""
from __future__ import annotations

import argparse
import json
import pathlib
import sys

sys.path.insert(0, str(pathlib.Path(__file__).resolve().parent))

import catalogue as cat  # noqa: E402
from emit_cpp import emit_dispatch_cpp, emit_dispatch_hpp  # noqa: E402
from emit_docs import emit_markdown  # noqa: E402
from emit_uno import emit_idl, emit_xcu  # noqa: E402


def write_if_changed(path: pathlib.Path, text: str) -> None:
    if path.exists() and path.read_text(encoding="utf-8") == text:
        return
    path.write_text(text, encoding="utf-8")


def resolved_json(c: cat.Catalogue) -> str:
    """The catalogue after args_from/defaults are resolved, for the tests."""
    out = {"service": cat.SERVICE, "functions": [], "choices": {}, "methods": {}}
    for fn in c.functions:
        out["functions"].append({
            "name": fn.name, "id": fn.id, "topic": fn.topic, "example": fn.example,
            "result_type": fn.result_type, "rows_of": fn.rows_of,
            "args": [{"name": a.name, "type": a.type, "check": a.check,
                      "optional": a.optional, "default": a.default,
                      "arrives_as_any": a.arrives_as_any,
                      "unit": a.unit, "column": a.column} for a in fn.args]})
    for k, ch in c.choices.items():
        out["choices"][k] = [{"text": v["text"], "aliases": v["aliases"]} for v in ch.values]
    for k, m in c.methods.items():
        out["methods"][k] = {"from_name": m.from_name, "names": m.names}
    return json.dumps(out, indent=1, sort_keys=True) + "\n"


def main() -> int:
    ap = argparse.ArgumentParser(description=__doc__.splitlines()[0])
    ap.add_argument("--catalogue", required=True, type=pathlib.Path)
    ap.add_argument("--out", type=pathlib.Path)
    ap.add_argument("--check", action="store_true")
    ns = ap.parse_args()
    try:
        c = cat.load(ns.catalogue)
    except cat.CatalogueError as e:
        print(f"catalogue error: {e}", file=sys.stderr)
        return 1
    n = sum(1 for _ in c.functions)
    if ns.check or ns.out is None:
        print(f"catalogue ok: {n} functions in {len(c.topics)} topic file(s)")
        return 0
    ns.out.mkdir(parents=True, exist_ok=True)
    write_if_changed(ns.out / "XCalcFunctions.idl", emit_idl(c))
    write_if_changed(ns.out / "dispatch.hpp", emit_dispatch_hpp(c))
    write_if_changed(ns.out / "dispatch.cpp", emit_dispatch_cpp(c))
    write_if_changed(ns.out / "CalcAddIns.xcu", emit_xcu(c))
    write_if_changed(ns.out / "functions.md", emit_markdown(c))
    write_if_changed(ns.out / "functions.json", resolved_json(c))
    return 0


if __name__ == "__main__":
    sys.exit(main())
