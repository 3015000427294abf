// Substance files: parse + validate one file, and load the whole bundled library (the cost
// paid at every start of both programs). Run: build/tests/bench/substance_io_bench.
#include <benchmark/benchmark.h>

#include <string>

#include "core/library.h"
#include "core/substance_io.h"
#include "resources/bundled.h"

namespace {

void readFile(benchmark::State &state, const char *path) {
    const std::string_view text = pw::bundled::file(path);
    if (text.empty()) {
        state.SkipWithError("bundled file missing");
        return;
    }
    for (auto _ : state) {
        auto r = pw::readSubstance(text, path);
        benchmark::DoNotOptimize(r);
    }
    state.SetBytesProcessed(static_cast<int64_t>(state.iterations() * text.size()));
}

void BM_ReadWater(benchmark::State &state) { readFile(state, "substances/water.json"); }
void BM_ReadCarbonDioxide(benchmark::State &state) {
    readFile(state, "substances/carbon-dioxide.json");
}

void BM_LoadBundledLibrary(benchmark::State &state) {
    for (auto _ : state) {
        auto lib = pw::SubstanceLibrary::bundled();
        benchmark::DoNotOptimize(lib);
    }
}

void BM_WriteWater(benchmark::State &state) {
    const auto r = pw::readSubstance(pw::bundled::file("substances/water.json"), "water.json");
    if (!r.substance) {
        state.SkipWithError("water.json refused");
        return;
    }
    for (auto _ : state) benchmark::DoNotOptimize(pw::writeSubstance(*r.substance));
}

}  // namespace

BENCHMARK(BM_ReadWater)->Unit(benchmark::kMicrosecond);
BENCHMARK(BM_ReadCarbonDioxide)->Unit(benchmark::kMicrosecond);
BENCHMARK(BM_LoadBundledLibrary)->Unit(benchmark::kMillisecond);
BENCHMARK(BM_WriteWater)->Unit(benchmark::kMicrosecond);
BENCHMARK_MAIN();
