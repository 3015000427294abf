// Import of a generated 1 M-row run log (issue 10 target: <= 1.5 s), plus the drawing
// downsampler. Run: build/tests/bench/run_import_bench
#include <benchmark/benchmark.h>
#include <fmt/format.h>

#include <unistd.h>
#include <cmath>
#include <cstdio>
#include <filesystem>
#include <fstream>

#include "core/run/downsample.h"
#include "core/run/run_log.h"

namespace {

constexpr long kRows = 1'000'000;

// A freeze-drying-like log: 1 s samples, four columns, numeric or ISO time.
std::string generate(bool iso) {
    const auto path = std::filesystem::temp_directory_path() /
                      fmt::format("pw-run-bench-{}-{}.csv", iso ? "iso" : "num", ::getpid());
    std::ofstream out(path);
    out << (iso ? "timestamp" : "time [s]")
        << ",shelf_T [degC],product_T [degC],chamber_P [mTorr]\n";
    for (long i = 0; i < kRows; ++i) {
        const double t = static_cast<double>(i);
        const double product =
            -35.0 + 5.0 * std::sin(t / 5000.0) + 0.01 * static_cast<double>(i % 7);
        const double p = 75.0 + 0.3 * std::sin(t / 37.0);
        if (iso) {
            const long s = i % 60, m = (i / 60) % 60, h = (i / 3600) % 24, d = 14 + i / 86400;
            out << fmt::format("2026-03-{:02d}T{:02d}:{:02d}:{:02d}Z,{:.2f},{:.2f},{:.1f}\n", d, h,
                               m, s, -10.0, product, p);
        } else {
            out << fmt::format("{},{:.2f},{:.2f},{:.1f}\n", i, -10.0, product, p);
        }
    }
    return path.string();
}

void importLog(benchmark::State &state, bool iso) {
    const std::string path = generate(iso);
    state.counters["MB"] = static_cast<double>(std::filesystem::file_size(path)) / 1e6;
    for (auto _ : state) {
        const pw::run::RunLog log = pw::run::readRunLogFile(path);
        if (log.states.size() != static_cast<std::size_t>(kRows)) state.SkipWithError("row count");
        benchmark::DoNotOptimize(log.states.data());
    }
    state.SetItemsProcessed(state.iterations() * kRows);
    std::filesystem::remove(path);
}

void BM_ImportRunLog1M_NumericTime(benchmark::State &state) { importLog(state, false); }
void BM_ImportRunLog1M_IsoTime(benchmark::State &state) { importLog(state, true); }

void BM_Downsample1MTo6000(benchmark::State &state) {
    std::vector<pw::State> s(kRows);
    for (long i = 0; i < kRows; ++i)
        s[static_cast<std::size_t>(i)] = {static_cast<double>(i), 240.0 + std::sin(i / 5000.0),
                                          10.0 + std::sin(i / 37.0)};
    for (auto _ : state) benchmark::DoNotOptimize(pw::run::downsampleIndices(s, 6000));
    state.SetItemsProcessed(state.iterations() * kRows);
}

}  // namespace

BENCHMARK(BM_ImportRunLog1M_NumericTime)->Unit(benchmark::kMillisecond)->Iterations(5);
BENCHMARK(BM_ImportRunLog1M_IsoTime)->Unit(benchmark::kMillisecond)->Iterations(5);
BENCHMARK(BM_Downsample1MTo6000)->Unit(benchmark::kMillisecond);
BENCHMARK_MAIN();
