// Speed of the boundary models: p(T) and T(p) of every equation form (bracketed TOMS748
// inverse and the table-guided inverse), and PhaseDiagram's segment queries, which the
// classifier calls once per logged row. Run: build/tests/bench/models_bench
#include <benchmark/benchmark.h>

#include <cmath>
#include <vector>

#include "../core/models/reference_specs.h"
#include "core/phase_diagram.h"
#include "core/solver.h"

namespace {

using pw::ModelSpec;
using pw::testdata::spec;

struct Case {
    const char *name;
    ModelSpec spec;
    double Tmin, Tmax;
};

ModelSpec withBase(ModelSpec s, const char *base) {
    s.strings["base"] = base;
    return s;
}

std::vector<Case> cases() {
    ModelSpec antoine =
        withBase(spec("antoine", {{"A", 8.07131}, {"B", 1730.63}, {"C", 233.426}}), "10");
    antoine.tUnit = pw::TemperatureUnit::Celsius;
    antoine.pUnit = pw::PressureUnit::mmHg;
    ModelSpec ext = withBase(
        spec("antoine-extended",
             {{"A", 20.0}, {"B", 4000.0}, {"C", -40.0}, {"D", -1e-3}, {"E", 1e-6}, {"F", -0.5}}),
        "e");
    return {
        {"wagner", pw::testdata::waterVaporization(), 273.16, 647.0},
        {"iapws-sublimation", pw::testdata::waterSublimation(), 50.0, 273.16},
        {"antoine", antoine, 274.15, 373.15},
        {"antoine-extended", ext, 250.0, 400.0},
        {"clausius-clapeyron",
         spec("clausius-clapeyron",
              {{"T_ref", 373.124}, {"P_ref", 101325.0}, {"dH_J_mol", 40650.0}}),
         300.0, 450.0},
        {"lee-kesler", spec("lee-kesler", {{"T_c", 304.1282}, {"P_c", 7.3773e6}, {"omega", 0.225}}),
         216.6, 304.0},
        {"ambrose-walton",
         spec("ambrose-walton", {{"T_c", 304.1282}, {"P_c", 7.3773e6}, {"omega", 0.225}}), 216.6,
         304.0},
        {"clapeyron-linear",
         spec("clapeyron-linear", {{"T_ref", 273.16},
                                   {"P_ref", 611.657},
                                   {"dH_J_mol", 6007.0},
                                   {"dV_m3_mol", -1.634e-6}}),
         252.0, 273.16},
        {"clapeyron-integrated",
         spec("clapeyron-integrated", {{"T_ref", 216.592},
                                       {"P_ref", 0.51795e6},
                                       {"dH_J_mol", 9020.0},
                                       {"dV_m3_mol", 3.3e-6}}),
         216.592, 300.0},
        {"simon-glatzel",
         spec("simon-glatzel",
              {{"T_ref", 273.31}, {"P_ref", 632.4e6}, {"a", 1.07476 * 632.4e6}, {"c", 4.6}}),
         273.31, 355.0},
        {"melting-polynomial", pw::testdata::co2Melting(), 216.592, 327.0},
        {"iapws-melting", pw::testdata::waterMeltingIh(), 251.165, 273.16},
        {"iapws-melting-log", pw::testdata::waterMeltingVII(), 355.0, 715.0},
    };
}

constexpr std::size_t kPoints = 4096;

std::vector<double> spread(double lo, double hi) {
    std::vector<double> v(kPoints);
    // A scrambled order so branch predictors and the table cache see realistic variety.
    for (std::size_t i = 0; i < kPoints; ++i) {
        v[i] = lo + (hi - lo) * static_cast<double>((i * 2654435761u) % kPoints) / (kPoints - 1);
    }
    return v;
}

void pressureBench(benchmark::State &state, const Case &c) {
    const auto m = pw::makeModel(c.spec);
    const auto T = spread(c.Tmin, c.Tmax);
    std::size_t i = 0;
    for (auto _ : state) {
        benchmark::DoNotOptimize(m->pressure(T[i++ % kPoints]));
    }
}

void temperatureBench(benchmark::State &state, const Case &c) {
    const auto m = pw::makeModel(c.spec);
    std::vector<double> p;
    for (double T : spread(c.Tmin, c.Tmax)) p.push_back(m->pressure(T));
    std::size_t i = 0;
    for (auto _ : state) {
        benchmark::DoNotOptimize(m->temperature(p[i++ % kPoints]));
    }
}

void tableBench(benchmark::State &state, const Case &c) {
    const auto m = pw::makeModel(c.spec);
    const pw::CurveTable table(m, c.Tmin, c.Tmax);
    std::vector<double> lnp;
    for (double T : spread(c.Tmin, c.Tmax)) lnp.push_back(std::log(m->pressure(T)));
    std::size_t i = 0;
    for (auto _ : state) {
        benchmark::DoNotOptimize(table.temperature(lnp[i++ % kPoints]));
    }
}

enum class Query { Melting, Vaporization, Sublimation };

void diagramBench(benchmark::State &state, Query q) {
    const pw::PhaseDiagram d(pw::testdata::water());
    std::vector<double> p;
    if (q == Query::Melting) {
        for (double x : spread(std::log(700.0), std::log(9e9))) p.push_back(std::exp(x));
    } else if (q == Query::Vaporization) {
        for (double x : spread(std::log(612.0), std::log(22e6))) p.push_back(std::exp(x));
    } else {
        for (double x : spread(std::log(1e-3), std::log(611.0))) p.push_back(std::exp(x));
    }
    std::size_t i = 0;
    for (auto _ : state) {
        const double P = p[i++ % kPoints];
        switch (q) {
            case Query::Melting:
                benchmark::DoNotOptimize(d.meltingTemperature(P));
                break;
            case Query::Vaporization:
                benchmark::DoNotOptimize(d.vaporizationTemperature(P));
                break;
            case Query::Sublimation:
                benchmark::DoNotOptimize(d.sublimationTemperature(P));
                break;
        }
    }
}

void diagramPressureBench(benchmark::State &state) {
    const pw::PhaseDiagram d(pw::testdata::water());
    const auto T = spread(200.0, 640.0);
    std::size_t i = 0;
    for (auto _ : state) benchmark::DoNotOptimize(d.pressuresAt(T[i++ % kPoints]));
}

void diagramBuildBench(benchmark::State &state) {
    const pw::Substance w = pw::testdata::water();
    for (auto _ : state) benchmark::DoNotOptimize(pw::PhaseDiagram(w));
}

int registerAll() {
    static const std::vector<Case> all = cases();
    for (const Case &c : all) {
        benchmark::RegisterBenchmark((std::string("pressure/") + c.name).c_str(), pressureBench, c);
        benchmark::RegisterBenchmark((std::string("temperature_toms748/") + c.name).c_str(),
                                     temperatureBench, c);
        benchmark::RegisterBenchmark((std::string("temperature_table/") + c.name).c_str(),
                                     tableBench, c);
    }
    benchmark::RegisterBenchmark("water_diagram/meltingTemperature", diagramBench, Query::Melting);
    benchmark::RegisterBenchmark("water_diagram/vaporizationTemperature", diagramBench,
                                 Query::Vaporization);
    benchmark::RegisterBenchmark("water_diagram/sublimationTemperature", diagramBench,
                                 Query::Sublimation);
    benchmark::RegisterBenchmark("water_diagram/pressuresAt", diagramPressureBench);
    benchmark::RegisterBenchmark("water_diagram/construct", diagramBuildBench)
        ->Unit(benchmark::kMillisecond);
    return 0;
}

const int registered = registerAll();

}  // namespace

BENCHMARK_MAIN();
