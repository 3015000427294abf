#!/usr/bin/env bash
# Build the libFuzzer targets with clang and run each for a given time.
#   tests/fuzz/run-fuzzers.sh [TARGET...] SECONDS
# TARGET: csv units substance run_log session (none: all but session; session needs the Qt
# build, PW_FUZZ_GUI=1). Each target first replays its seed corpus (tests/fuzz/corpus/TARGET,
# read-only), then fuzzes for SECONDS, keeping new inputs in BUILD/fuzz-corpus/TARGET and
# crash inputs in BUILD/fuzz-artifacts/TARGET. Prints the executions per target; exits 1 on
# any crash, leak, sanitizer report or timeout.
# Environment: FUZZ_BUILD_DIR (default build-fuzz), PW_FUZZ_GUI=1 (Qt build, session target),
# PW_JOBS (build jobs, default 2), PW_FUZZ_ARGS (extra libFuzzer flags).
set -euo pipefail
cd "$(dirname "$0")/../.."
say() { printf '\033[1m[fuzz]\033[0m %s\n' "$*"; }

if (($# < 1)) || ! [[ ${!#} =~ ^[0-9]+$ ]]; then
    sed -n '2,11p' "$0"
    exit 2
fi
seconds=${!#}
targets=("${@:1:$#-1}")
gui=${PW_FUZZ_GUI:-0}
((${#targets[@]})) || targets=(csv units substance run_log)
for t in "${targets[@]}"; do [ "$t" != session ] || gui=1; done
build=${FUZZ_BUILD_DIR:-build-fuzz}
gui_flag=-DPW_BUILD_GUI=OFF
[ "$gui" = 1 ] && gui_flag=-DPW_BUILD_GUI=ON

launcher=()
command -v ccache >/dev/null && launcher=(-DCMAKE_CXX_COMPILER_LAUNCHER=ccache)
say "configuring $build (clang, PW_FUZZ=ON, $gui_flag)"
# The same settings as tests/sanitize/run.sh, which shares this folder (one core build).
cmake -S . -B "$build" -G Ninja "${launcher[@]}" -DCMAKE_CXX_COMPILER=clang++ \
    -DCMAKE_BUILD_TYPE=RelWithDebInfo -DPW_FUZZ=ON "$gui_flag" \
    -DPW_BUILD_BENCHMARKS=OFF >/dev/null
cmake --build "$build" -j "${PW_JOBS:-2}" --target "${targets[@]/%/_fuzz}"

status=0
summary=()
for t in "${targets[@]}"; do
    corpus="$build/fuzz-corpus/$t" artifacts="$build/fuzz-artifacts/$t"
    mkdir -p "$corpus" "$artifacts"
    log="$build/fuzz-$t.log"
    say "$t: replaying tests/fuzz/corpus/$t, then fuzzing for $seconds s"
    # shellcheck disable=SC2086
    if QT_QPA_PLATFORM=offscreen "$build/tests/fuzz/${t}_fuzz" -max_total_time="$seconds" \
        -timeout=10 -rss_limit_mb=2048 -max_len=65536 -print_final_stats=1 \
        -artifact_prefix="$artifacts/" ${PW_FUZZ_ARGS:-} "$corpus" "tests/fuzz/corpus/$t" \
        >"$log" 2>&1; then
        result=ok
    else
        result="FAILED (see $log and $artifacts/)"
        status=1
        tail -n 40 "$log"
    fi
    runs=$(sed -n 's/^stat::number_of_executed_units: *//p' "$log" | tail -n 1)
    summary+=("$t: ${runs:-?} executions in $seconds s: $result")
done
for line in "${summary[@]}"; do say "$line"; done
exit "$status"
