// The desktop side of logged runs: the import dialog and its worker, the time chart, the
// overlay on the diagram and the linked cursor, on the bundled demo run (resources/demo).
#include <qcustomplot.h>

#include <QSignalSpy>
#include <cmath>
#include <fstream>

#include "../gui_fixture.h"
#include "core/run/demo.h"
#include "widgets/diagram_widget.h"
#include "widgets/document.h"
#include "widgets/runs/run_import_dialog.h"
#include "widgets/runs/run_overlay.h"
#include "widgets/runs/runs_panel.h"
#include "widgets/runs/time_chart.h"

namespace pw::ui::test {
namespace {

class RunsUiTest : public GuiTest {
protected:
    QString demoRun() const {
        return QStringLiteral(PW_SOURCE_DIR "/resources/demo/freeze-drying-run.csv");
    }
    RunPtr importThroughDialog(const QString &file) {
        RunImportDialog dialog(library_.find("water"));
        EXPECT_TRUE(dialog.setPath(file)) << dialog.status()->text().toStdString();
        QSignalSpy spy(&dialog, &RunImportDialog::imported);
        RunImportJob *job = dialog.startImport();
        EXPECT_NE(job, nullptr);
        if (!job) return nullptr;
        EXPECT_TRUE(spy.wait(60000)) << dialog.status()->text().toStdString();
        return spy.isEmpty() ? nullptr : spy.front().front().value<RunPtr>();
    }
};

TEST_F(RunsUiTest, DialogGuessesColumnsAndShowsThePreview) {
    RunImportDialog dialog(library_.find("water"));
    ASSERT_TRUE(dialog.setPath(demoRun())) << dialog.status()->text().toStdString();
    // docs/runs.md: product probes are preferred over the shelf, the capacitance (chamber)
    // gauge over the Pirani gauge, which reads high in water vapor (common practice).
    EXPECT_EQ(dialog.temperatureColumn()->currentText(), QStringLiteral("product_T [degC]"));
    EXPECT_EQ(dialog.pressureColumn()->currentText(), QStringLiteral("chamber_P [mTorr]"));
    EXPECT_EQ(dialog.timeColumn()->currentText(), QStringLiteral("timestamp"));
    EXPECT_EQ(dialog.previewTable()->columnCount(), 5);
    EXPECT_GT(dialog.previewTable()->rowCount(), 5);
    // The demo file's first row, as written in it.
    EXPECT_EQ(dialog.previewTable()->item(0, 2)->text(), QStringLiteral("19.94"));
}

TEST_F(RunsUiTest, ImportedDemoRunFreezesThenSublimesAndNeverMelts) {
    const RunPtr run = importThroughDialog(demoRun());
    ASSERT_TRUE(run);
    const auto &events = run->analysis.path.events;
    ASSERT_GE(events.size(), 2u);
    EXPECT_EQ(events.front().transition, Transition::Freezing);
    // Water at 1 atm freezes at 273.152519 K (IAPWS R14-08, normal melting point of ice Ih).
    EXPECT_NEAR(events.front().T_K, 273.1525, 0.01);
    EXPECT_NEAR(events.front().P_Pa, 101325.0, 2000.0);
    bool sublimation = false;
    for (const PathEvent &e : events) {
        EXPECT_NE(e.transition, Transition::Melting) << e.time_s;
        if (e.transition == Transition::Sublimation) {
            sublimation = true;
            EXPECT_GT(e.time_s, events.front().time_s);
            // Below the triple point of water, 273.16 K / 611.657 Pa (IAPWS R14-08).
            EXPECT_LT(e.P_Pa, 611.657);
            EXPECT_LT(e.T_K, 273.16);
        }
    }
    EXPECT_TRUE(sublimation);
    // The computation used every row of the file (4321 data rows), drawing a subset.
    EXPECT_EQ(run->states.size(), 4321u);
    EXPECT_LT(run->drawIndices.size(), run->states.size());
    EXPECT_EQ(run->margins.size(), run->drawIndices.size());
}

TEST_F(RunsUiTest, CancelledImportLoadsNothing) {
    const QString file = path("big.csv");
    {
        std::ofstream out(file.toStdString());
        out << "time [s],T [K],P [Pa]\n";
        for (int i = 0; i < 400000; ++i) out << i << ',' << 250.0 + (i % 100) * 0.1 << ",50\n";
    }
    RunImportDialog dialog(library_.find("water"));
    ASSERT_TRUE(dialog.setPath(file));
    QSignalSpy imported(&dialog, &RunImportDialog::imported);
    RunImportJob *job = dialog.startImport();
    ASSERT_NE(job, nullptr);
    QSignalSpy cancelled(job, &RunImportJob::cancelled);
    dialog.reject();  // Cancel while running: the worker stops, the dialog stays open
    ASSERT_TRUE(cancelled.wait(60000));
    QCoreApplication::processEvents();
    EXPECT_EQ(imported.count(), 0);
    EXPECT_EQ(dialog.job(), nullptr);
    EXPECT_TRUE(dialog.status()->text().contains(QStringLiteral("cancelled")));
}

TEST_F(RunsUiTest, TimeChartSeriesAndLinkedCursor) {
    Document doc;
    DiagramWidget diagram(doc, *settings_);
    diagram.resize(900, 650);
    doc.setSubstances({library_.find("water")});
    RunsPanel panel(diagram, doc, *settings_, library_);
    panel.loadDemo("freeze-drying");
    diagram.show();
    diagram.rebuild();
    const RunPtr run = panel.currentRun();
    ASSERT_TRUE(run);
    TimeChart *chart = panel.chart();
    const int n = static_cast<int>(run->drawIndices.size());
    EXPECT_EQ(chart->temperatureGraph()->dataCount(), n);
    EXPECT_EQ(chart->pressureGraph()->dataCount(), n);
    EXPECT_EQ(chart->marginTGraph()->dataCount(), static_cast<int>(run->margins.size()));
    EXPECT_EQ(chart->marginPGraph()->dataCount(), static_cast<int>(run->margins.size()));
    // The demo rules (resources/demo/freeze-drying-rules.json) all pass on the demo run.
    EXPECT_EQ(panel.verdictsTable()->rowCount(), 5);
    EXPECT_EQ(panel.eventsTable()->rowCount(), static_cast<int>(run->analysis.path.events.size()));

    // Chart -> diagram: 2 h into the run is the file's row at 08:00:00 (30 s sampling).
    emit chart->timeHovered(7200.0);
    ASSERT_TRUE(panel.overlay()->markerVisible());
    const State at = panel.overlay()->markerState();
    EXPECT_DOUBLE_EQ(at.T_K, run->states[240].T_K);
    EXPECT_DOUBLE_EQ(at.P_Pa, run->states[240].P_Pa);
    EXPECT_DOUBLE_EQ(run->states[240].time_s, 7200.0);
    // Diagram -> chart: hovering the pixel of a sample finds that sample's time.
    const State s = run->states[run->drawIndices[n / 2]];
    const double t = panel.overlay()->timeNearPixel(diagram.pixelAt(s.T_K, s.P_Pa), 1.0);
    ASSERT_TRUE(std::isfinite(t));
    const State near = stateAtTime(run->states, t);
    EXPECT_NEAR(diagram.pixelAt(near.T_K, near.P_Pa).x(), diagram.pixelAt(s.T_K, s.P_Pa).x(), 1.5);
    emit panel.overlay()->pathTimeHovered(t);
    EXPECT_DOUBLE_EQ(chart->cursorTime(), t);
    // The overlay survives a rebuild of the diagram (pan, zoom, units).
    diagram.rebuild();
    EXPECT_TRUE(panel.overlay()->markerVisible());
}

TEST_F(RunsUiTest, PlanTextShowsAPlannedPath) {
    Document doc;
    DiagramWidget diagram(doc, *settings_);
    doc.setSubstances({library_.find("water")});
    RunsPanel panel(diagram, doc, *settings_, library_);
    QString error;
    ASSERT_TRUE(panel.showPlan(QStringLiteral("start T=20degC P=1atm\n"
                                              "isobaric T=-40degC rate=1K/min\n"
                                              "isothermal P=10Pa duration=30min scale=log\n"
                                              "isobaric T=-20degC duration=2h\n"),
                               &error))
        << error.toStdString();
    const RunPtr run = panel.currentRun();
    ASSERT_TRUE(run);
    // Cooling water through 0 degC at 1 atm freezes it; pumping down at -40 degC below the ice
    // vapor pressure (12.84 Pa at -40 degC, IAPWS R14-08) sublimes it.
    ASSERT_EQ(run->analysis.path.events.size(), 2u);
    EXPECT_EQ(run->analysis.path.events[0].transition, Transition::Freezing);
    EXPECT_EQ(run->analysis.path.events[1].transition, Transition::Sublimation);
    EXPECT_NEAR(run->analysis.path.events[1].P_Pa, 12.84, 0.05);
    EXPECT_FALSE(panel.showPlan(QStringLiteral("start T=20degC\nwobble T=3K\n"), &error));
    EXPECT_FALSE(error.isEmpty());
}

}  // namespace
}  // namespace pw::ui::test
