#!/usr/bin/env bash
# tests/tsan/run_tsan.sh - configures build-tsan/ (library and test built
# with -fsanitize=thread, see tests/tsan/CMakeLists.txt), builds, and runs
# tests/tsan/tsan_api.cpp: every C API function from 8 threads at once,
# results compared bit for bit with a single-threaded run. Exit status 0
# only with no ThreadSanitizer report, no contract violation and no
# mismatch. Environment: TH_TSAN_BUILD_DIR (default build-tsan).
set -euo pipefail
cd "$(dirname "$0")/../.."
build=${TH_TSAN_BUILD_DIR:-build-tsan}

tests/fuzz/check_api_coverage.sh
cmake -S tests/tsan -B "$build" -DCMAKE_BUILD_TYPE=RelWithDebInfo >/dev/null
cmake --build "$build" -j2 --target th_tsan >/dev/null
# halt_on_error: the first data race fails the run (exit code 66).
TSAN_OPTIONS="halt_on_error=1 exitcode=66 second_deadlock_stack=1 history_size=4" \
  "$build/th_tsan"
