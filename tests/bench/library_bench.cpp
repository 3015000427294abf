// Start-up cost of both programs: loading the bundled library, one cold look-up + classify
// (what `phasewright-cli classify --substance water ...` pays), the library listing (what
// `phasewright-cli list` pays), and PhaseDiagram construction for water with and without the
// first inverse query (the 4096-node inverse tables, docs/models.md).
// Run: build/tests/bench/library_bench.
#include <benchmark/benchmark.h>

#include <string>

#include "core/classify.h"
#include "core/library.h"
#include "core/substance_io.h"
#include "resources/bundled.h"

namespace {

void BM_LoadBundledLibrary(benchmark::State &state) {
    for (auto _ : state) {
        auto lib = pw::SubstanceLibrary::bundled();
        benchmark::DoNotOptimize(lib);
    }
}

// A new library each time: load, find water, classify one point (250 K, 100 Pa: ice).
void BM_ColdLookupAndClassifyWater(benchmark::State &state) {
    for (auto _ : state) {
        const auto lib = pw::SubstanceLibrary::bundled();
        const auto d = lib.find("water");
        auto c = pw::classify(*d, 250.0, 100.0);
        benchmark::DoNotOptimize(c);
    }
}

// A new library each time, every substance materialised (the listing).
void BM_ColdListAll(benchmark::State &state) {
    std::size_t n = 0;
    for (auto _ : state) {
        const auto lib = pw::SubstanceLibrary::bundled();
        for (const auto &d : lib.all()) n += d->substance().id.size();
        benchmark::DoNotOptimize(n);
    }
}

pw::Substance waterSubstance(benchmark::State &state) {
    auto r = pw::readSubstance(pw::bundled::file("substances/water.json"), "water.json");
    if (!r.substance) state.SkipWithError("water.json refused");
    return r.substance ? std::move(*r.substance) : pw::Substance{};
}

void BM_WaterDiagramConstruction(benchmark::State &state) {
    const pw::Substance water = waterSubstance(state);
    for (auto _ : state) {
        pw::PhaseDiagram d(water);
        benchmark::DoNotOptimize(d);
    }
}

// Construction plus one inverse query on every segment (every table built).
void BM_WaterDiagramConstructionAndAllTables(benchmark::State &state) {
    const pw::Substance water = waterSubstance(state);
    for (auto _ : state) {
        pw::PhaseDiagram d(water);
        for (double P : {1.0, 1e3, 1e8, 3e8, 5e8, 1e9, 5e9}) {
            auto v = d.temperaturesAt(P);
            benchmark::DoNotOptimize(v);
        }
    }
}

void BM_ReadWater(benchmark::State &state) {
    const std::string_view text = pw::bundled::file("substances/water.json");
    for (auto _ : state) {
        auto r = pw::readSubstance(text, "water.json");
        benchmark::DoNotOptimize(r);
    }
}

}  // namespace

BENCHMARK(BM_LoadBundledLibrary)->Unit(benchmark::kMillisecond);
BENCHMARK(BM_ColdLookupAndClassifyWater)->Unit(benchmark::kMillisecond);
BENCHMARK(BM_ColdListAll)->Unit(benchmark::kMillisecond);
BENCHMARK(BM_WaterDiagramConstruction)->Unit(benchmark::kMillisecond);
BENCHMARK(BM_WaterDiagramConstructionAndAllTables)->Unit(benchmark::kMillisecond);
BENCHMARK(BM_ReadWater)->Unit(benchmark::kMillisecond);
BENCHMARK_MAIN();
