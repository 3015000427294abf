// The comparison widgets: the three views (overlay, linked side-by-side panels, reduced
// coordinates), the comparison table and the extra phase columns of the points table.
// Set PW_SCREENSHOT_DIR to also save the three views as PNG files (docs/screenshots).
#include <qcustomplot.h>

#include <QMainWindow>
#include <QMenu>
#include <QStackedWidget>
#include <QTableView>
#include <QTableWidget>
#include <cmath>
#include <cstdlib>
#include <set>

#include "../gui_fixture.h"
#include "widgets/compare/compare_controller.h"
#include "widgets/compare/compare_points_proxy.h"
#include "widgets/compare/compare_table.h"
#include "widgets/compare/compare_view.h"
#include "widgets/points_model.h"

namespace pw::ui::test {
namespace {

class CompareWidgets : public GuiTest {
protected:
    DiagramPtr find(const char *key) { return library_.find(key); }
    static void save(QWidget &w, const char *name) {
        const char *dir = std::getenv("PW_SCREENSHOT_DIR");
        if (dir == nullptr) return;
        EXPECT_TRUE(w.grab().save(QString::fromUtf8(dir) + "/" + name));
    }
};

// The legend names both substances.
QStringList legendNames(QCustomPlot &plot) {
    QStringList out;
    for (int i = 0; i < plot.legend->itemCount(); ++i)
        if (auto *item = qobject_cast<QCPPlottableLegendItem *>(plot.legend->item(i)))
            out << item->plottable()->name();
    return out;
}

TEST_F(CompareWidgets, OverlayDrawsBothSubstancesWithDistinctLineStylesAndALegend) {
    CompareView view;
    view.resize(900, 600);
    view.setSubstances(find("water"), find("heavy-water"));
    view.setMode(CompareMode::Overlay);
    QCustomPlot &plot = *view.overlayPlot();
    EXPECT_TRUE(plot.legend->visible());
    EXPECT_EQ(legendNames(plot), (QStringList{"Water", "Heavy water"}));
    // Solid lines for A, a different pen style for B: readable in greyscale print.
    std::set<Qt::PenStyle> styles;
    for (int i = 0; i < plot.plottableCount(); ++i)
        if (auto *c = qobject_cast<QCPCurve *>(plot.plottable(i)); c && c->pen().widthF() >= 2.0)
            styles.insert(c->pen().style());
    EXPECT_TRUE(styles.contains(Qt::SolidLine));
    EXPECT_TRUE(styles.contains(Qt::DashDotLine));
    view.show();
    save(view, "compare-overlay.png");
}

TEST_F(CompareWidgets, SideBySidePanelsShareTheirAxes) {
    CompareView view;
    view.resize(1100, 520);
    view.setSubstances(find("CO2"), find("N2"));
    view.setMode(CompareMode::SideBySide);
    QCustomPlot &left = *view.panel(0), &right = *view.panel(1);
    EXPECT_EQ(left.xAxis->range(), right.xAxis->range());
    EXPECT_EQ(left.yAxis->range(), right.yAxis->range());
    // Zoom the left panel: the right one follows.
    left.xAxis->setRange(60.0, 140.0);
    left.yAxis->setRange(1e3, 1e7);
    EXPECT_DOUBLE_EQ(right.xAxis->range().lower, 60.0);
    EXPECT_DOUBLE_EQ(right.xAxis->range().upper, 140.0);
    EXPECT_DOUBLE_EQ(right.yAxis->range().upper, 1e7);
    right.xAxis->setRange(100.0, 320.0);
    EXPECT_DOUBLE_EQ(left.xAxis->range().upper, 320.0);
    view.rebuild();  // back to the common default view
    view.show();
    save(view, "compare-side-by-side.png");
}

TEST_F(CompareWidgets, ReducedCurvesMeetAtOneOne) {
    CompareView view;
    view.resize(900, 600);
    view.setSubstances(find("CO2"), find("N2"));
    view.setMode(CompareMode::Reduced);
    QCustomPlot &plot = *view.reducedPlot();
    EXPECT_EQ(legendNames(plot), (QStringList{"Carbon dioxide", "Nitrogen"}));
    // Each substance's vaporization curve ends at the critical point: (1, 1) in reduced
    // coordinates (Span & Wagner 1996; Span et al. 2000: Wagner equations give pc at Tc).
    int ending = 0;
    for (int i = 0; i < plot.plottableCount(); ++i) {
        auto *c = qobject_cast<QCPCurve *>(plot.plottable(i));
        if (!c) continue;
        for (auto it = c->data()->constBegin(); it != c->data()->constEnd(); ++it)
            if (std::abs(it->key - 1.0) < 2e-3 && std::abs(it->value - 1.0) < 5e-3) {
                ++ending;
                break;
            }
    }
    EXPECT_GE(ending, 2);
    EXPECT_LT(plot.xAxis->range().lower, 63.151 / 126.192);  // N2 reduced triple point, Span 2000
    EXPECT_GT(plot.xAxis->range().upper, 1.0);
    view.show();
    save(view, "compare-reduced.png");
}

TEST_F(CompareWidgets, TableShowsBothSubstancesAndTheDifference) {
    CompareTable table;
    table.setUnits({TemperatureUnit::Kelvin, PressureUnit::Pa});
    table.setConditions(250.0, kStandardAtmosphere_Pa);
    table.setSubstances(find("CO2"), find("N2"));
    QTableWidget &t = *table.table();
    ASSERT_GT(t.rowCount(), 10);
    EXPECT_EQ(t.horizontalHeaderItem(1)->text(), "Carbon dioxide");
    EXPECT_EQ(t.horizontalHeaderItem(2)->text(), "Nitrogen");
    int critical = -1;
    for (int r = 0; r < t.rowCount(); ++r)
        if (t.item(r, 0)->text() == "Critical temperature") critical = r;
    ASSERT_GE(critical, 0);
    // 304.1282 K (Span & Wagner 1996), 126.192 K (Span et al. 2000).
    EXPECT_TRUE(t.item(critical, 1)->text().startsWith("304.1"))
        << t.item(critical, 1)->text().toStdString();
    EXPECT_TRUE(t.item(critical, 2)->text().startsWith("126.1"))
        << t.item(critical, 2)->text().toStdString();
    EXPECT_TRUE(t.item(critical, 3)->text().contains("177.9"))
        << t.item(critical, 3)->text().toStdString();
    // N2 is above its critical temperature at 250 K: the more volatile.
    EXPECT_TRUE(table.verdictText().contains("Nitrogen")) << table.verdictText().toStdString();
    table.resize(900, 520);
    table.show();
    save(table, "compare-table.png");
}

TEST_F(CompareWidgets, PointsGetAPhaseColumnPerSubstance) {
    Document doc;
    doc.setSubstances({find("water"), find("CO2")});
    // 250 K, 1 atm: ice for water (below the 273.1525 K normal melting point, IAPWS R14-08);
    // vapor for CO2 (below its 1.785 MPa vapor pressure at 250 K, Span & Wagner 1996).
    doc.insertPoints(0, {{"P1", 250.0, kStandardAtmosphere_Pa}, {"P2", 300.0, 8e6}});
    PointsModel model(doc, *settings_);
    ComparePointsProxy proxy(doc, PointsModel::PhaseCol);
    proxy.setSourceModel(&model);
    ASSERT_EQ(proxy.columnCount(), PointsModel::Count + 1);
    EXPECT_EQ(proxy.headerData(PointsModel::PhaseCol, Qt::Horizontal, Qt::DisplayRole).toString(),
              "Phase: Water");
    EXPECT_EQ(proxy.headerData(PointsModel::Count, Qt::Horizontal, Qt::DisplayRole).toString(),
              "Phase: Carbon dioxide");
    const auto phase = [&](int row, int col) { return proxy.index(row, col).data().toString(); };
    EXPECT_TRUE(phase(0, PointsModel::PhaseCol).startsWith("solid"))
        << phase(0, PointsModel::PhaseCol).toStdString();
    EXPECT_EQ(phase(0, PointsModel::Count), "vapor");
    // 300 K, 8 MPa: liquid water (SR1-86: 3.5 kPa vapor pressure), CO2 at 8 MPa above pc =
    // 7.3773 MPa but below Tc = 304.1282 K: liquid by the convention of docs/classification.md.
    EXPECT_EQ(phase(1, PointsModel::PhaseCol), "liquid");
    EXPECT_EQ(phase(1, PointsModel::Count), "liquid");
    // Removing the second substance removes its column and the substance names.
    doc.setSubstances({find("water")});
    EXPECT_EQ(proxy.columnCount(), PointsModel::Count);
    EXPECT_EQ(proxy.headerData(PointsModel::PhaseCol, Qt::Horizontal, Qt::DisplayRole).toString(),
              model.headerData(PointsModel::PhaseCol, Qt::Horizontal, Qt::DisplayRole).toString());
}

TEST_F(CompareWidgets, ControllerSwitchesModesAndAddsThePhaseColumn) {
    QMainWindow window;
    auto *central = new QWidget;
    window.setCentralWidget(central);
    Document doc;
    doc.setSubstances({find("water")});
    PointsModel model(doc, *settings_);
    QTableView table;
    table.setModel(&model);
    CompareController cmp(window, doc, *settings_, library_, &table, PointsModel::PhaseCol);
    auto *stack = qobject_cast<QStackedWidget *>(window.centralWidget());
    ASSERT_NE(stack, nullptr);
    EXPECT_EQ(stack->currentWidget(), central);
    EXPECT_FALSE(cmp.comparing());
    EXPECT_EQ(table.model()->columnCount(), PointsModel::Count);
    // Choosing a second substance is one undoable step and opens the overlay.
    cmp.setSecondSubstance(find("heavy-water"));
    EXPECT_TRUE(cmp.comparing());
    EXPECT_NE(stack->currentWidget(), central);
    EXPECT_EQ(cmp.view()->mode(), CompareMode::Overlay);
    EXPECT_EQ(table.model()->columnCount(), PointsModel::Count + 1);
    ASSERT_TRUE(cmp.table()->comparison().has_value());
    EXPECT_EQ(cmp.table()->comparison()->b.id, "heavy-water");
    cmp.showMode(CompareMode::Reduced);
    EXPECT_EQ(cmp.view()->mode(), CompareMode::Reduced);
    doc.undoStack().undo();  // back to water alone: the single diagram
    EXPECT_FALSE(cmp.comparing());
    EXPECT_EQ(stack->currentWidget(), central);
    EXPECT_EQ(table.model()->columnCount(), PointsModel::Count);
}

}  // namespace
}  // namespace pw::ui::test
