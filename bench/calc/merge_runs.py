#!/usr/bin/python3
"""Merge several Google Benchmark JSON files (each with
--benchmark_repetitions and aggregates) into one whose median entries are the
median over the runs, for bench/ratios.py. On a shared machine one run's
medians move by tens of percent with the load; the median of separate runs
is steadier.

    merge_runs.py out.json run1.json run2.json run3.json
"""
import json
import statistics
import sys


def main(out_path, paths):
    runs = [json.load(open(p)) for p in paths]
    merged = dict(runs[0])
    by_name = {}
    for data in runs:
        for b in data["benchmarks"]:
            if b.get("run_type") == "aggregate" and b.get("aggregate_name") != "median":
                continue
            by_name.setdefault(b["name"], []).append(b)
    benchmarks = []
    for name, entries in by_name.items():
        b = dict(entries[0])
        for key in ("cpu_time", "real_time", "items_per_second"):
            if all(key in e for e in entries):
                b[key] = statistics.median(e[key] for e in entries)
        b["runs_merged"] = len(entries)
        benchmarks.append(b)
    merged["benchmarks"] = benchmarks
    with open(out_path, "w") as fh:
        json.dump(merged, fh, indent=1)


if __name__ == "__main__":
    main(sys.argv[1], sys.argv[2:])
