#!/usr/bin/env bash
# The sanitizer build: core, the CLI and their tests with AddressSanitizer and
# UndefinedBehaviorSanitizer (PW_SANITIZE, cmake/Warnings.cmake), without the GUI, then its
# whole ctest (core and CLI tests, CLI checks, seed-corpus replays). Any sanitizer report
# aborts the test that caused it (-fno-sanitize-recover=all). Then the ordered pipeline's
# test under ThreadSanitizer.
#   tests/sanitize/run.sh [ctest arguments...]
# With clang installed this is the same build folder as tests/fuzz/run-fuzzers.sh (clang,
# PW_FUZZ=ON, which sanitizes the whole build), so the core is compiled once for both;
# without clang, gcc with PW_SANITIZE=ON.
# Environment: FUZZ_BUILD_DIR (default build-fuzz; build-sanitize for gcc), PW_JOBS.
set -euo pipefail
cd "$(dirname "$0")/../.."
jobs=${PW_JOBS:-$(nproc)}
say() { printf '\033[1m[sanitize]\033[0m %s\n' "$*"; }

launcher=()
command -v ccache >/dev/null && launcher=(-DCMAKE_CXX_COMPILER_LAUNCHER=ccache)
if command -v clang++ >/dev/null; then
    build=${FUZZ_BUILD_DIR:-build-fuzz}
    # PW_FUZZ=ON compiles everything with ASan + UBSan (cmake/Fuzz.cmake): the sanitizer build.
    compiler=(-DCMAKE_CXX_COMPILER=clang++ -DPW_FUZZ=ON)
else
    build=${FUZZ_BUILD_DIR:-build-sanitize}
    compiler=(-DPW_SANITIZE=ON -DPW_WERROR=ON)
fi
say "configuring $build (${compiler[*]}, no GUI, no benchmarks)"
cmake -S . -B "$build" -G Ninja "${launcher[@]}" "${compiler[@]}" -DCMAKE_BUILD_TYPE=RelWithDebInfo \
    -DPW_BUILD_GUI=OFF -DPW_BUILD_BENCHMARKS=OFF >/dev/null
cmake --build "$build" -j "$jobs"
say "running the test suite under ASan + UBSan"
export ASAN_OPTIONS=${ASAN_OPTIONS:-detect_leaks=1:abort_on_error=1}
export UBSAN_OPTIONS=${UBSAN_OPTIONS:-print_stacktrace=1:halt_on_error=1}
ctest --test-dir "$build" --output-on-failure -j "$jobs" "$@"
# The classify command's worker threads go through core/ordered_pipeline.h (header only): its
# test under ThreadSanitizer catches data races there without a third full build.
say "ThreadSanitizer: the ordered pipeline's test"
g++ -std=c++20 -O1 -g -fsanitize=thread -I. tests/core/ordered_pipeline_test.cpp -lgtest \
    -lgtest_main -pthread -o "$build/ordered_pipeline_tsan"
TSAN_OPTIONS=halt_on_error=1 "$build/ordered_pipeline_tsan" --gtest_brief=1
