// Desktop speed targets (issue 7):
//   BM_Replot*: QCustomPlot::replotTime() of water + heavy water with a 100 k-point path,
//               target <= 16 ms (one frame at 60 Hz).
//   BM_ColdStart: the phasewright executable from launch to the diagram's first paint
//               (offscreen platform, --demo), target <= 0.5 s.
// Run: QT_QPA_PLATFORM=offscreen build/tests/bench/gui/desktop_bench
#include <benchmark/benchmark.h>
#include <qcustomplot.h>

#include <QApplication>
#include <QElapsedTimer>
#include <QProcess>
#include <QTemporaryDir>
#include <cmath>

#include "core/library.h"
#include "widgets/diagram_renderer.h"
#include "widgets/diagram_scene.h"

namespace {

using namespace pw;
using namespace pw::ui;

// A long logged run wandering over the view (a freeze-drying-like loop with noise).
std::vector<State> syntheticRun(std::size_t n) {
    std::vector<State> s(n);
    for (std::size_t i = 0; i < n; ++i) {
        const double x = static_cast<double>(i) / static_cast<double>(n);
        const double noise = 0.3 * std::sin(static_cast<double>(i) * 0.37);
        s[i] = {static_cast<double>(i), 230.0 + 80.0 * x + noise,
                std::exp(std::log(5.0) + 8.0 * (0.5 + 0.5 * std::sin(6.283 * x)))};
    }
    return s;
}

DiagramScene twoSubstanceScene(const SubstanceLibrary &lib) {
    DiagramScene scene;
    scene.substances = {lib.find("water"), lib.find("heavy-water")};
    scene.view = defaultView(scene.substances, true);
    scene.paths = {{syntheticRun(100000), QStringLiteral("run")}};
    scene.points = {{QStringLiteral("A"), 240.0, 10.0}, {QStringLiteral("B"), 300.0, 1e5}};
    return scene;
}

void replotBench(benchmark::State &state, bool decimate) {
    const SubstanceLibrary lib = SubstanceLibrary::bundled();
    QCustomPlot plot;
    plot.resize(1200, 800);
    plot.show();
    DiagramScene scene = twoSubstanceScene(lib);
    renderScene(plot, scene, SceneStyle{});
    if (!decimate) {  // replace the drawn path by all 100 k raw points
        for (int i = 0; i < plot.plottableCount(); ++i)
            if (plot.plottable(i)->name() == QStringLiteral("run")) {
                QVector<double> xs, ys;
                for (const State &s : scene.paths[0].states) {
                    xs.push_back(s.T_K);
                    ys.push_back(s.P_Pa);
                }
                qobject_cast<QCPCurve *>(plot.plottable(i))->setData(xs, ys);
            }
    }
    plot.replot(QCustomPlot::rpImmediateRefresh);
    double total = 0.0;
    for (auto _ : state) {
        plot.replot(QCustomPlot::rpImmediateRefresh);
        total += plot.replotTime();
    }
    state.counters["replotTime_ms"] = total / static_cast<double>(state.iterations());
}

void BM_ReplotTwoSubstances100kPath(benchmark::State &state) { replotBench(state, true); }
void BM_ReplotTwoSubstances100kPathUndecimated(benchmark::State &state) {
    replotBench(state, false);
}

void BM_SceneRender(benchmark::State &state) {  // full rebuild after a pan or zoom
    const SubstanceLibrary lib = SubstanceLibrary::bundled();
    QCustomPlot plot;
    plot.resize(1200, 800);
    const DiagramScene scene = twoSubstanceScene(lib);
    for (auto _ : state) renderScene(plot, scene, SceneStyle{});
}

void BM_ColdStart(benchmark::State &state) {
    QTemporaryDir config;
    QProcessEnvironment env = QProcessEnvironment::systemEnvironment();
    env.insert(QStringLiteral("QT_QPA_PLATFORM"), QStringLiteral("offscreen"));
    env.insert(QStringLiteral("XDG_CONFIG_HOME"), config.path());
    env.insert(QStringLiteral("XDG_DATA_HOME"), config.path());
    double firstPaint = 0.0;
    for (auto _ : state) {
        QProcess p;
        p.setProcessEnvironment(env);
        QElapsedTimer t;
        t.start();
        p.start(QStringLiteral(PW_DESKTOP_EXE),
                {QStringLiteral("--demo"), QStringLiteral("--quit-after-first-paint")});
        if (!p.waitForFinished(20000)) {
            state.SkipWithError("phasewright did not finish");
            break;
        }
        state.SetIterationTime(static_cast<double>(t.nsecsElapsed()) * 1e-9);
        const QByteArray out = p.readAllStandardOutput();
        firstPaint += out.mid(out.indexOf(' ') + 1).trimmed().toDouble();
    }
    state.counters["first_paint_ms"] = firstPaint / static_cast<double>(state.iterations());
}

BENCHMARK(BM_ReplotTwoSubstances100kPath)->Unit(benchmark::kMillisecond);
BENCHMARK(BM_ReplotTwoSubstances100kPathUndecimated)->Unit(benchmark::kMillisecond);
BENCHMARK(BM_SceneRender)->Unit(benchmark::kMillisecond);
BENCHMARK(BM_ColdStart)->UseManualTime()->Iterations(5)->Unit(benchmark::kMillisecond);

}  // namespace

int main(int argc, char **argv) {
    if (qEnvironmentVariableIsEmpty("QT_QPA_PLATFORM")) qputenv("QT_QPA_PLATFORM", "offscreen");
    QApplication app(argc, argv);
    benchmark::Initialize(&argc, argv);
    benchmark::RunSpecifiedBenchmarks();
    benchmark::Shutdown();
    return 0;
}
