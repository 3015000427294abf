// Throughput of the pieces of `classify --input`: classification with margins (water, the
// bundled data), CSV parsing and CSV formatting. Run: build/tests/bench/classify_bench.
// End to end against Python: tests/bench/classify_vs_python.py.
#include <benchmark/benchmark.h>

#include <charconv>
#include <cmath>
#include <cstdio>
#include <random>
#include <sstream>
#include <vector>

#include "core/classify.h"
#include "core/csv/number_text.h"
#include "core/csv/reader.h"
#include "core/csv/state_rows.h"
#include "core/csv/writer.h"
#include "core/library.h"

namespace {

struct Point {
    double T, P;
};

std::vector<Point> waterPoints(std::size_t n) {
    std::mt19937_64 rng(42);
    std::uniform_real_distribution<double> t(200.0, 700.0), lp(0.0, std::log(200e6));
    std::vector<Point> v(n);
    for (Point &p : v) p = {t(rng), std::exp(lp(rng))};
    return v;
}

void BM_ClassifyWater(benchmark::State &state) {
    const auto diagram = pw::SubstanceLibrary::bundled().find("water");
    const pw::Classifier classify(*diagram);
    const auto points = waterPoints(4096);
    std::size_t i = 0;
    for (auto _ : state) {
        const Point &p = points[i++ & 4095];
        benchmark::DoNotOptimize(classify(p.T, p.P));
    }
    state.SetItemsProcessed(state.iterations());
}
BENCHMARK(BM_ClassifyWater);

// The allocation-free form the command line uses for tables (texts as views).
void BM_ClassifyWaterView(benchmark::State &state) {
    const auto diagram = pw::SubstanceLibrary::bundled().find("water");
    const pw::Classifier classify(*diagram);
    const auto points = waterPoints(4096);
    std::size_t i = 0;
    for (auto _ : state) {
        const Point &p = points[i++ & 4095];
        benchmark::DoNotOptimize(classify.view(p.T, p.P));
    }
    state.SetItemsProcessed(state.iterations());
}
BENCHMARK(BM_ClassifyWaterView);

// The number conversions of the CSV path: the standard library's and core/csv/number_text.h's
// (the same results, see tests/core/csv/number_text_test.cpp).
// Margins as the classifier gives them: dT_K within +-400 K, dP_Pa from 1e-3 Pa to 200 MPa
// in size, either sign.
std::vector<double> marginLikeValues() {
    std::mt19937_64 rng(3);
    std::uniform_real_distribution<double> dT(-400.0, 400.0), lnP(std::log(1e-3), std::log(2e8));
    std::vector<double> v(4096);
    for (std::size_t i = 0; i < v.size(); i += 2) {
        v[i] = dT(rng);
        v[i + 1] = (rng() & 1 ? 1.0 : -1.0) * std::exp(lnP(rng));
    }
    return v;
}

void BM_FormatStdToChars(benchmark::State &state) {
    const auto values = marginLikeValues();
    char buf[64];
    std::size_t i = 0;
    for (auto _ : state) {
        benchmark::DoNotOptimize(std::to_chars(buf, buf + sizeof buf, values[i++ & 4095]).ptr);
        benchmark::ClobberMemory();
    }
    state.SetItemsProcessed(state.iterations());
}
BENCHMARK(BM_FormatStdToChars);

void BM_FormatShortest(benchmark::State &state) {
    const auto values = marginLikeValues();
    char buf[pw::csv::kShortestMaxBytes];
    std::size_t i = 0;
    for (auto _ : state) {
        benchmark::DoNotOptimize(pw::csv::writeShortest(buf, values[i++ & 4095]));
        benchmark::ClobberMemory();
    }
    state.SetItemsProcessed(state.iterations());
}
BENCHMARK(BM_FormatShortest);

// Margins as `classify --input` writes them by default: 12 significant digits.
void BM_FormatSignificant12(benchmark::State &state) {
    const auto values = marginLikeValues();
    char buf[pw::csv::kShortestMaxBytes];
    std::size_t i = 0;
    for (auto _ : state) {
        benchmark::DoNotOptimize(pw::csv::writeSignificant(buf, values[i++ & 4095], 12));
        benchmark::ClobberMemory();
    }
    state.SetItemsProcessed(state.iterations());
}
BENCHMARK(BM_FormatSignificant12);

void BM_FormatStdGeneral12(benchmark::State &state) {
    const auto values = marginLikeValues();
    char buf[64];
    std::size_t i = 0;
    for (auto _ : state) {
        benchmark::DoNotOptimize(
            std::to_chars(buf, buf + sizeof buf, values[i++ & 4095], std::chars_format::general, 12)
                .ptr);
        benchmark::ClobberMemory();
    }
    state.SetItemsProcessed(state.iterations());
}
BENCHMARK(BM_FormatStdGeneral12);

std::vector<std::string> logLikeText() {
    std::vector<std::string> v;
    for (const Point &p : waterPoints(2048)) {
        char buf[64];
        std::snprintf(buf, sizeof buf, "%.6f", p.T);
        v.emplace_back(buf);
        std::snprintf(buf, sizeof buf, "%.6g", p.P);
        v.emplace_back(buf);
    }
    return v;
}

void BM_ParseStdFromChars(benchmark::State &state) {
    const auto text = logLikeText();
    std::size_t i = 0;
    for (auto _ : state) {
        const std::string &s = text[i++ & 4095];
        double v = 0.0;
        std::from_chars(s.data(), s.data() + s.size(), v);
        benchmark::DoNotOptimize(v);
    }
    state.SetItemsProcessed(state.iterations());
}
BENCHMARK(BM_ParseStdFromChars);

void BM_ParseSimpleDecimal(benchmark::State &state) {
    const auto text = logLikeText();
    std::size_t i = 0;
    for (auto _ : state) {
        const std::string &s = text[i++ & 4095];
        double v = 0.0;
        pw::csv::parseSimpleDecimal(s.data(), s.data() + s.size(), v);
        benchmark::DoNotOptimize(v);
    }
    state.SetItemsProcessed(state.iterations());
}
BENCHMARK(BM_ParseSimpleDecimal);

// The parser of the state-row scanner: the numbers as they stand in a block, followed by a
// separator.
void BM_ParseDecimalAt(benchmark::State &state) {
    auto text = logLikeText();
    for (std::string &s : text) s += ',';
    std::size_t i = 0;
    for (auto _ : state) {
        const std::string &s = text[i++ & 4095];
        double v = 0.0;
        benchmark::DoNotOptimize(pw::csv::parseDecimalAt(s.data(), v));
        benchmark::DoNotOptimize(v);
    }
    state.SetItemsProcessed(state.iterations());
}
BENCHMARK(BM_ParseDecimalAt);

std::string csvText(std::size_t rows) {
    std::string s = "T [K],P [Pa]\n";
    for (const Point &p : waterPoints(rows))
        s += std::to_string(p.T) + "," + std::to_string(p.P) + "\n";
    return s;
}

void BM_CsvRead(benchmark::State &state) {
    const std::string text = csvText(100000);
    for (auto _ : state) {
        std::istringstream in(text);
        pw::csv::Reader r(in, "bench.csv");
        double sum = 0.0;
        while (r.next()) sum += r.number(0) + r.number(1);
        benchmark::DoNotOptimize(sum);
    }
    state.SetItemsProcessed(state.iterations() * 100000);
    state.SetBytesProcessed(state.iterations() * static_cast<long>(text.size()));
}
BENCHMARK(BM_CsvRead)->Unit(benchmark::kMillisecond);

// The same rows as classify --input reads them: blocks of whole records, scanned in place.
void BM_StateRowScan(benchmark::State &state) {
    const std::string text = csvText(100000);
    for (auto _ : state) {
        std::istringstream in(text);
        pw::csv::Reader r(in, "bench.csv");
        const pw::csv::StateColumns c = pw::csv::resolveStateColumns(r.header(), {}, "bench.csv");
        const pw::csv::StateRowScanner scanner(r, c, false);
        pw::csv::TextBlock block;
        double sum = 0.0;
        while (r.nextBlock(block, std::size_t{64} << 10))
            scanner.scan(
                block, [&](std::string_view, double T, double P) { sum += T + P; },
                [](pw::csv::BadRow &&) { return true; });
        benchmark::DoNotOptimize(sum);
    }
    state.SetItemsProcessed(state.iterations() * 100000);
    state.SetBytesProcessed(state.iterations() * static_cast<long>(text.size()));
}
BENCHMARK(BM_StateRowScan)->Unit(benchmark::kMillisecond);

void BM_CsvWrite(benchmark::State &state) {
    const auto points = waterPoints(100000);
    for (auto _ : state) {
        std::ostringstream out;
        pw::csv::Writer w(out);
        for (const Point &p : points) {
            w.raw("300,1e5");
            w.field("liquid");
            w.field(p.T);
            w.field(p.P);
            w.endRow();
        }
        w.flush();
        benchmark::DoNotOptimize(out.str().size());
    }
    state.SetItemsProcessed(state.iterations() * 100000);
}
BENCHMARK(BM_CsvWrite)->Unit(benchmark::kMillisecond);

// Per-row work of `classify --input` without the process start-up: parse T and P, classify,
// write the input record and the seven result columns (as app/cli/cmd_classify.cpp does).
void BM_ClassifyRows(benchmark::State &state) {
    const auto diagram = pw::SubstanceLibrary::bundled().find("water");
    const pw::Classifier classify(*diagram);
    const std::string text = csvText(100000);
    for (auto _ : state) {
        std::istringstream in(text);
        std::ostringstream out;
        pw::csv::Reader r(in, "bench.csv");
        pw::csv::Writer w(out);
        while (r.next()) {
            const pw::ClassificationView c = classify.view(r.number(0), r.number(1));
            w.raw(r.record());
            w.field(pw::toString(c.phase));
            w.field(c.solidForm);
            w.field(c.nearestLabel);
            w.field(c.dT_K);
            w.field(c.dP_Pa);
            w.field(c.onBoundary ? std::string_view("true") : std::string_view("false"));
            w.field(pw::flagsText(c));
            w.endRow();
        }
        w.flush();
        benchmark::DoNotOptimize(out.str().size());
    }
    state.SetItemsProcessed(state.iterations() * 100000);
}
BENCHMARK(BM_ClassifyRows)->Unit(benchmark::kMillisecond);

}  // namespace

BENCHMARK_MAIN();
