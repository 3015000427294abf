#!/usr/bin/env bash
# The sanitizer build: core, the CLI and their tests with AddressSanitizer and
# UndefinedBehaviorSanitizer (PW_SANITIZE, cmake/Warnings.cmake), without the GUI, in a build
# folder of its own; then its whole ctest (core and CLI tests, CLI checks, corpus replays).
# Any sanitizer report aborts the test that caused it (-fno-sanitize-recover=all).
#   tests/sanitize/run.sh [ctest arguments...]
# Environment: SANITIZE_BUILD_DIR (default build-sanitize), PW_JOBS (default: all cores).
set -euo pipefail
cd "$(dirname "$0")/../.."
build=${SANITIZE_BUILD_DIR:-build-sanitize}
jobs=${PW_JOBS:-$(nproc)}
say() { printf '\033[1m[sanitize]\033[0m %s\n' "$*"; }

launcher=()
command -v ccache >/dev/null && launcher=(-DCMAKE_CXX_COMPILER_LAUNCHER=ccache)
say "configuring $build (PW_SANITIZE=ON, no GUI, no benchmarks)"
cmake -S . -B "$build" -G Ninja "${launcher[@]}" -DCMAKE_BUILD_TYPE=RelWithDebInfo \
    -DPW_SANITIZE=ON -DPW_BUILD_GUI=OFF -DPW_BUILD_BENCHMARKS=OFF -DPW_WERROR=ON >/dev/null
cmake --build "$build" -j "$jobs"
say "running the test suite under ASan + UBSan"
export ASAN_OPTIONS=${ASAN_OPTIONS:-detect_leaks=1:abort_on_error=1:strict_string_checks=1}
export UBSAN_OPTIONS=${UBSAN_OPTIONS:-print_stacktrace=1:halt_on_error=1}
ctest --test-dir "$build" --output-on-failure -j "$jobs" "$@"
