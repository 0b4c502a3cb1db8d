#!/usr/bin/env bash
# bench/calc/instructions.sh - the C API's cost in instructions per call and
# per array row against the inline formulas (bench/calc/instr_count.cpp under
# callgrind), as a Markdown table on stdout. Deterministic and independent
# of the machine's load, so it is the quick before/after check for a change
# to the hot path (about 20 s):
#
#   bench/calc/instructions.sh [build dir, default build-perf]
#
# Builds the Release library in the build dir if needed; run.sh calls it too.
set -euo pipefail
cd "$(dirname "$0")/../.."
build=${1:-build-perf}
out="$build/perf"
mkdir -p "$out"
cmake -S . -B "$build" -DCMAKE_BUILD_TYPE=Release -DCMAKE_CXX_FLAGS=-g >/dev/null
cmake --build "$build" -j2 --target tubeheat >/dev/null
c++ -std=c++17 -O2 -Wall -Wextra -I lib/include -I lib/src -I bench bench/calc/instr_count.cpp -L"$build/lib" \
   -Wl,-rpath,"$PWD/$build/lib" -ltubeheat -o "$out/instr_count"
valgrind --tool=callgrind --callgrind-out-file="$out/callgrind.out" "$out/instr_count" \
  >/dev/null 2>"$out/callgrind.log"
/usr/bin/python3 bench/calc/instr_table.py "$out/callgrind.out"
