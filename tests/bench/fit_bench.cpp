// Time of a boundary fit (core/fit): Wagner (linear) and Antoine (Levenberg–Marquardt), with
// and without the leave-one-out refits, for 33 and 1000 points.
#include <benchmark/benchmark.h>

#include <cmath>

#include "core/fit/fit.h"

namespace {

// CO2 vapor pressure, Span & Wagner (1996) eq. (3.13), with a deterministic +/-0.05 % ripple.
pw::fit::FitData co2Data(int n) {
    pw::fit::FitData d;
    for (int i = 0; i < n; ++i) {
        const double T = 217.0 + 86.0 * i / (n - 1);
        const double tau = 1.0 - T / 304.1282;
        const double s = -7.0602087 * tau + 1.9391218 * std::pow(tau, 1.5) - 1.6463597 * tau * tau -
                         3.2995634 * std::pow(tau, 4.0);
        const double ripple = 1.0 + 5e-4 * std::sin(1.7 * i);
        d.points.push_back({T, 7.3773e6 * std::exp(304.1282 / T * s) * ripple, 1.0, i + 2});
    }
    return d;
}

void fitBench(benchmark::State &state, const char *model, bool loo) {
    const auto data = co2Data(static_cast<int>(state.range(0)));
    pw::fit::FitRequest rq;
    rq.model = model;
    rq.Tc_K = 304.1282;
    rq.Pc_Pa = 7.3773e6;
    rq.crossValidate = loo;
    for (auto _ : state) benchmark::DoNotOptimize(pw::fit::fitBoundary(data, rq).rms_pct);
}

void BM_FitWagner(benchmark::State &s) { fitBench(s, "wagner", false); }
void BM_FitWagnerLoo(benchmark::State &s) { fitBench(s, "wagner", true); }
void BM_FitAntoine(benchmark::State &s) { fitBench(s, "antoine", false); }
void BM_FitAntoineLoo(benchmark::State &s) { fitBench(s, "antoine", true); }

BENCHMARK(BM_FitWagner)->Arg(33)->Arg(1000)->Unit(benchmark::kMicrosecond);
BENCHMARK(BM_FitWagnerLoo)->Arg(33)->Arg(1000)->Unit(benchmark::kMillisecond);
BENCHMARK(BM_FitAntoine)->Arg(33)->Arg(1000)->Unit(benchmark::kMicrosecond);
BENCHMARK(BM_FitAntoineLoo)->Arg(33)->Arg(1000)->Unit(benchmark::kMillisecond);

}  // namespace

BENCHMARK_MAIN();
