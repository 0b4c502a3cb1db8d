#!/usr/bin/python3
"""Instructions per call of the C API against the inline formula, from a
callgrind profile of bench/calc/instr_count.cpp (see bench/calc/run.sh).

    instr_table.py callgrind.out [calls per run, default 102400]

Prints a Markdown table: inclusive instructions of run_<pair>_inline,
run_<pair>_api and run_<pair>_array divided by the number of calls (rows),
and the ratios of the two API forms to the inline formula.
"""
import re
import subprocess
import sys


def main(path: str, calls: int) -> None:
    text = subprocess.run(["callgrind_annotate", "--inclusive=yes", "--threshold=100", path],
                          capture_output=True, text=True, check=True).stdout
    cost = {}
    for m in re.finditer(r"^\s*([\d,]+) .*?:run_(\w+)_(inline|api|array)\(\)", text, re.M):
        cost[(m.group(2), m.group(3))] = int(m.group(1).replace(",", "")) / calls
    print("## Library (callgrind, instructions per call, deterministic)")
    print()
    print("| function | inline formula | C API call | ratio | array, per row | ratio |")
    print("|---|---|---|---|---|---|")
    for pair in dict.fromkeys(p for p, _ in cost):
        a, b, c = (cost.get((pair, v)) for v in ("inline", "api", "array"))
        if a and b:
            arr = f"{c:.0f} | {c / a:.2f}" if c else "- | -"
            print(f"| {pair} | {a:.0f} | {b:.0f} | {b / a:.2f} | {arr} |")
    print()


if __name__ == "__main__":
    main(sys.argv[1], int(sys.argv[2]) if len(sys.argv) > 2 else 102400)
