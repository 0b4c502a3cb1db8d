#!/usr/bin/env bash
# tests/fuzz/check_api_coverage.sh - fails when a function declared TH_API
# in lib/include/tubeheat.h has no row in tests/fuzz/api_calls.hpp, the
# table the fuzz harness and the TSan test both drive. Run by run_fuzz.sh
# and tests/tsan/run_tsan.sh before they build.
set -euo pipefail
root="$(cd "$(dirname "$0")/../.." && pwd)"
header="$root/lib/include/tubeheat.h"
table="$root/tests/fuzz/api_calls.hpp"

# Every declaration keeps "TH_API <type> <name>(" on one line.
declared=$(grep -oE 'TH_API[^(]*\bth_[a-z0-9_]+[[:space:]]*\(' "$header" |
           grep -oE 'th_[a-z0-9_]+[[:space:]]*\($' | tr -d '( ' | sort -u)
missing=()
for fn in $declared; do
  grep -qE "TH_ROB_(CACHED_)?ROW\($fn\)" "$table" || missing+=("$fn")
done
count=$(echo "$declared" | wc -w)
if [ ${#missing[@]} -gt 0 ]; then
  echo "check_api_coverage: ${#missing[@]} of $count C API functions are not driven by" >&2
  echo "  tests/fuzz/api_calls.hpp (add a call_xxx() and a row): ${missing[*]}" >&2
  exit 1
fi
echo "check_api_coverage: all $count C API functions of tubeheat.h are in the fuzz/TSan table"
