#!/usr/bin/env bash
# tests/fuzz/run_fuzz.sh <seconds> [libFuzzer flags...]
#
# Configures build-fuzz/ (clang-14; library with -fsanitize=fuzzer-no-link,
# address,undefined; see tests/fuzz/CMakeLists.txt), builds the harness
# tests/fuzz/fuzz_api.cpp, writes one seed per API function and fuzzes the
# whole C API for <seconds> with one job. Prints the number of executions.
# Exit status: 0 when nothing was found; non-zero on a crash, sanitizer
# report, contract violation (see api_calls.hpp), timeout (> 60 s for one
# input) or out-of-memory (> 2 GB), with the reproducer saved in
# build-fuzz/artifacts/ (replay: build-fuzz/th_fuzz <file>).
#
# The corpus grown by a run is kept in build-fuzz/corpus/ and replayed first
# by the next run; tests/fuzz/corpus/ holds a few committed inputs.
# Long runs that should go on after a finding: add
#   -fork=1 -ignore_crashes=1 -ignore_timeouts=1 -ignore_ooms=1
# (every reproducer is still saved; the exit status is then 0).
# Environment: TH_FUZZ_BUILD_DIR (default build-fuzz), TH_FUZZ_REPORT_KNOWN=1
# to stop skipping inputs that reproduce known open issues (api_calls.hpp).
set -euo pipefail
secs=${1:?usage: tests/fuzz/run_fuzz.sh <seconds> [libFuzzer flags...]}
shift
cd "$(dirname "$0")/../.."
build=${TH_FUZZ_BUILD_DIR:-build-fuzz}

tests/fuzz/check_api_coverage.sh
cmake -S tests/fuzz -B "$build" -DCMAKE_BUILD_TYPE=RelWithDebInfo \
  -DCMAKE_C_COMPILER=clang-14 -DCMAKE_CXX_COMPILER=clang++-14 >/dev/null
cmake --build "$build" -j2 --target th_fuzz >/dev/null
mkdir -p "$build/corpus" "$build/seeds" "$build/artifacts"
TH_FUZZ_WRITE_SEEDS="$build/seeds" "$build/th_fuzz"

log="$build/fuzz-$(date +%Y%m%d-%H%M%S).log"
echo "fuzzing the C API for $secs s (log: $log)"
rc=0
ASAN_OPTIONS=detect_leaks=1:abort_on_error=0 \
UBSAN_OPTIONS=print_stacktrace=1:halt_on_error=1 \
  "$build/th_fuzz" -max_total_time="$secs" -timeout=60 -rss_limit_mb=2048 \
  -max_len=1024 -dict=tests/fuzz/th_api.dict -print_final_stats=1 \
  -artifact_prefix="$build/artifacts/" "$@" \
  "$build/corpus" tests/fuzz/corpus "$build/seeds" >"$log" 2>&1 || rc=$?

execs=$(sed -n 's/^stat::number_of_executed_units: *//p' "$log" | tail -1)
# -fork=N mode prints no final stats: take the last "#<execs>: cov:" line.
[ -n "$execs" ] || execs=$(sed -n 's/^#\([0-9][0-9]*\): cov:.*/\1/p' "$log" | tail -1)
crashes=$(sed -n 's/.*oom\/timeout\/crash: *\([0-9/]*\).*/\1/p' "$log" | tail -1)
[ -z "$crashes" ] || echo "fork mode oom/timeout/crash counts: $crashes (artifacts in $build/artifacts/)"
corpus=$(find "$build/corpus" -type f | wc -l)
echo "fuzz executions: ${execs:-unknown} in $secs s; corpus: $corpus inputs"
if [ "$rc" -ne 0 ]; then
  echo "FUZZER FOUND A PROBLEM (exit $rc); report:" >&2
  grep -E "contract violation|runtime error|ERROR: |SUMMARY|Test unit written|#[0-9]+ 0x.* in th" "$log" | head -40 >&2
  exit "$rc"
fi
