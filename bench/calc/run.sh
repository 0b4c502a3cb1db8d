#!/usr/bin/env bash
# bench/calc/run.sh - every figure of docs/performance.md, in one command:
#
#   bench/calc/run.sh [build dir, default build-perf] [runs, default 5]
#
# 1. configures and builds a Release tree (library, benchmarks, .oxt);
# 2. library: Google Benchmark (3 runs x 5 repetitions, medians) ->
#    bench/calc/merge_runs.py -> bench/ratios.py,
#    and instruction counts under callgrind (bench/calc/instr_count.cpp);
# 3. spreadsheet: bench/calc/calc_bench.py - 200,000 rows of Gnielinski Nu
#    as native formulas, as TH.NUSSELT per row and as one TH.NUSSELT.TABLE,
#    each recalculated headless `runs` times, plus every workbook in
#    workbooks/;
# 4. spreadsheet, deterministic: bench/calc/calc_callgrind.py - instructions
#    per row of the same workbooks under callgrind (about 15 minutes; set
#    TH_BENCH_NO_CALLGRIND=1 to skip it).
# Results land in <build dir>/perf/ (report.md, JSON). Nothing is installed
# outside the build dir; LibreOffice runs on a throw-away profile.
set -euo pipefail
cd "$(dirname "$0")/../.."
build=${1:-build-perf}
runs=${2:-5}
out="$build/perf"
mkdir -p "$out"

cmake -S . -B "$build" -DCMAKE_BUILD_TYPE=Release -DCMAKE_CXX_FLAGS=-g >/dev/null
cmake --build "$build" -j2 --target tubeheat_bench tubeheat_oxt

report="$out/report.md"
{
  echo "# tubeheat performance run $(date -u +%Y-%m-%dT%H:%MZ)"
  echo
  echo "- machine: $(lscpu | sed -n 's/^Model name: *//p'), $(nproc) CPUs;" \
       "$(lscpu | sed -n 's/^L3 cache: *//p') L3; $(uname -sr)"
  echo "- LibreOffice: $(soffice --version 2>/dev/null | head -1)"
  echo "- load average at start: $(cut -d' ' -f1-3 /proc/loadavg)"
  echo
} >"$report"

# ---- library: CPU time, three separate runs of 5 repetitions ------------------
for k in 1 2 3; do
  "$build/bench/tubeheat_bench" --benchmark_repetitions=5 --benchmark_enable_random_interleaving=true \
    --benchmark_report_aggregates_only=true \
    --benchmark_out="$out/lib_bench_$k.json" --benchmark_out_format=json >"$out/lib_bench_$k.txt"
done
/usr/bin/python3 bench/calc/merge_runs.py "$out/lib_bench.json" "$out"/lib_bench_[123].json
{
  echo "## Library (Google Benchmark: CPU time, median of 3 runs x 5 repetitions)"
  echo
  /usr/bin/python3 bench/ratios.py "$out/lib_bench.json"
  echo
} >>"$report"

# ---- library: instruction counts (deterministic) -----------------------------
if command -v valgrind >/dev/null; then
  bench/calc/instructions.sh "$build" >>"$report"
fi

# ---- spreadsheet ------------------------------------------------------------------
/usr/bin/python3 bench/calc/calc_bench.py --oxt "$build/addin/tubeheat.oxt" \
  --catalogue-json "$build/addin/generated/functions.json" \
  --work "$out/calc" --rows 200000 --runs "$runs"
{
  echo "## Spreadsheet (200,000 rows, whole-file headless conversion)"
  echo
  cat "$out/calc/results.md"
} >>"$report"

if [ -z "${TH_BENCH_NO_CALLGRIND:-}" ] && command -v valgrind >/dev/null; then
  {
    echo
    echo "## Spreadsheet under callgrind (instructions per row, deterministic)"
    echo
    /usr/bin/python3 bench/calc/calc_callgrind.py --oxt "$build/addin/tubeheat.oxt" \
      --work "$out/calc_callgrind" | sed -n '/^|/p'
  } >>"$report"
fi
echo "report: $report"
