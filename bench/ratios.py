#!/usr/bin/python3
"""Pair benchmark results and print API / baseline ratios.

Benchmarks are named run_x/<pair>/<variant>; within a pair the variant
starting with "inline" is the baseline measured in the same run. Reads
Google Benchmark JSON (--benchmark_out=... --benchmark_out_format=json,
ideally with --benchmark_repetitions and medians) and prints a Markdown
table of calls per second and ratios (CPU time per call or per array row,
median where present).

Usage: /usr/bin/python3 bench/ratios.py results.json
"""
import collections
import json
import sys


def main(path):
    data = json.load(open(path))
    rows = collections.OrderedDict()
    # Registration order (family_index), not run order: with
    # --benchmark_enable_random_interleaving the runs come shuffled.
    benchmarks = sorted(data["benchmarks"], key=lambda b: b.get("family_index", 0))
    for b in benchmarks:
        if b.get("run_type") == "aggregate" and b.get("aggregate_name") != "median":
            continue
        name = b.get("run_name", b["name"])
        parts = name.split("/")
        if len(parts) < 3:
            continue
        pair, variant = parts[1], "/".join(parts[2:])
        # Time per call or row: array benchmarks process many rows per
        # iteration and report them as items (a rate over CPU time).
        if b.get("items_per_second"):
            ns = 1e9 / b["items_per_second"]
        else:
            ns = b["cpu_time"]
        rows.setdefault(pair, {})[variant] = ns
    print("| function | variant | ns per call (CPU) | calls per second | ratio to baseline |")
    print("|---|---|---|---|---|")
    for pair, vs in rows.items():
        base = next((t for v, t in vs.items() if v.startswith("inline")), None)
        for v, t in sorted(vs.items(), key=lambda vt: not vt[0].startswith("inline")):
            ratio = "%.2f" % (t / base) if base else "-"
            print("| %s | %s | %.1f | %.3g | %s |" % (pair, v, t, 1e9 / t, ratio))


if __name__ == "__main__":
    main(sys.argv[1])
