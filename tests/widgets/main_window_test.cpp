// The main window as a user drives it: choose a substance, add points through the API and by
// Ctrl+clicking the diagram, read the classification in the table, undo and redo.
#include <qcustomplot.h>

#include <QTableView>
#include <QTest>
#include <cmath>

#include "core/classify.h"
#include "gui_fixture.h"
#include "widgets/commands.h"
#include "widgets/diagram_widget.h"
#include "widgets/main_window.h"
#include "widgets/points_model.h"
#include "widgets/points_table.h"
#include "widgets/substance_chooser.h"

namespace pw::ui::test {
namespace {

class MainWindowTest : public GuiTest {
protected:
    void SetUp() override {
        GuiTest::SetUp();
        window_ = std::make_unique<MainWindow>(*settings_, library_, path("recovery.pwsession"));
        window_->resize(1200, 800);
    }
    QString cell(int row, int column) const {
        const PointsModel *m = window_->pointsTable()->model();
        return m->data(m->index(row, column), Qt::DisplayRole).toString();
    }
    std::unique_ptr<MainWindow> window_;
};

TEST_F(MainWindowTest, StartsWithWaterAndChoosesCarbonDioxideBySearch) {
    Document &doc = window_->document();
    ASSERT_TRUE(doc.primary());
    EXPECT_EQ(doc.primary()->substance().id, "water");
    EXPECT_TRUE(doc.undoStack().isClean());

    SubstanceChooser *chooser = window_->chooser();
    chooser->setFilter(QStringLiteral("CO2"));  // by formula
    EXPECT_EQ(chooser->visibleCount(), 1);
    ASSERT_TRUE(chooser->chooseFirstVisible());
    EXPECT_EQ(doc.primary()->substance().id, "carbon-dioxide");
    EXPECT_FALSE(doc.undoStack().isClean());
    EXPECT_TRUE(window_->isWindowModified());

    doc.undoStack().undo();  // choosing a substance is one undoable step
    EXPECT_EQ(doc.primary()->substance().id, "water");
    EXPECT_FALSE(window_->isWindowModified());
}

TEST_F(MainWindowTest, PointAddedThroughTheApiIsClassifiedInTheTable) {
    Document &doc = window_->document();
    // IAPWS R14-08, check value: sublimation pressure of ice Ih at 230 K = 8.94735e-6 MPa.
    const double pSub230 = 8.94735;
    edit::addPoint(doc, {QStringLiteral("below"), 230.0, 5.0});
    edit::addPoint(doc, {QStringLiteral("above"), 230.0, 20.0});
    ASSERT_EQ(doc.pointCount(), 2);
    EXPECT_EQ(cell(0, PointsModel::Label), QStringLiteral("below"));
    EXPECT_EQ(cell(0, PointsModel::PhaseCol), QStringLiteral("vapor"));
    EXPECT_EQ(cell(0, PointsModel::Nearest), QStringLiteral("sublimation (ice Ih)"));
    const Classification &c = window_->pointsTable()->model()->classification(0);
    EXPECT_NEAR(c.dP_Pa, 5.0 - pSub230, 1e-3);
    EXPECT_EQ(cell(0, PointsModel::DeltaP), QStringLiteral("−3.947\u202FPa"));
    EXPECT_EQ(cell(1, PointsModel::PhaseCol), QStringLiteral("solid (ice Ih)"));
    EXPECT_NEAR(window_->pointsTable()->model()->classification(1).dP_Pa, 20.0 - pSub230, 1e-3);
}

TEST_F(MainWindowTest, CtrlClickOnTheDiagramAddsAClassifiedPointAndUndoRedoWork) {
    window_->show();
    ASSERT_TRUE(QTest::qWaitForWindowExposed(window_.get()));
    DiagramWidget *diagram = window_->diagram();
    diagram->rebuild();
    QCustomPlot *plot = diagram->plot();
    // Common practice: 250 K and 1 kPa lies above the ice sublimation curve (76 Pa at 250 K,
    // IAPWS R14-08) and far left of the melting curve, so it is ice Ih.
    const QPointF target = plot->mapFrom(diagram, diagram->pixelAt(250.0, 1000.0).toPoint());
    QTest::mouseClick(plot, Qt::LeftButton, Qt::ControlModifier, target.toPoint());

    Document &doc = window_->document();
    ASSERT_EQ(doc.pointCount(), 1);
    EXPECT_NEAR(doc.point(0).T_K, 250.0, 2.0);  // within a pixel or two
    EXPECT_NEAR(std::log10(doc.point(0).P_Pa), 3.0, 0.05);
    EXPECT_EQ(doc.point(0).label, QStringLiteral("P1"));
    EXPECT_EQ(cell(0, PointsModel::PhaseCol), QStringLiteral("solid (ice Ih)"));
    EXPECT_TRUE(window_->isWindowModified());

    // A plain click pans or does nothing; it never adds a point.
    QTest::mouseClick(plot, Qt::LeftButton, Qt::NoModifier, target.toPoint());
    EXPECT_EQ(doc.pointCount(), 1);

    doc.undoStack().undo();
    EXPECT_EQ(doc.pointCount(), 0);
    EXPECT_EQ(window_->pointsTable()->model()->rowCount(), 0);
    EXPECT_FALSE(window_->isWindowModified());
    doc.undoStack().redo();
    ASSERT_EQ(doc.pointCount(), 1);
    EXPECT_EQ(cell(0, PointsModel::PhaseCol), QStringLiteral("solid (ice Ih)"));
}

TEST_F(MainWindowTest, TableEditsDeletesAndReordersThroughTheUndoStack) {
    Document &doc = window_->document();
    edit::addPoint(doc, {QStringLiteral("a"), 300.0, 101325.0});
    edit::addPoint(doc, {QStringLiteral("b"), 400.0, 101325.0});
    PointsModel *m = window_->pointsTable()->model();
    // Typing 250 (K, the default unit) in the table turns liquid water at 1 atm into ice
    // (common practice: water freezes at 273.15 K at 1 atm).
    ASSERT_TRUE(
        m->setData(m->index(0, PointsModel::Temperature), QStringLiteral("250"), Qt::EditRole));
    EXPECT_DOUBLE_EQ(doc.point(0).T_K, 250.0);
    EXPECT_EQ(cell(0, PointsModel::PhaseCol), QStringLiteral("solid (ice Ih)"));
    // Common practice: water at 400 K and 1 atm is vapor (boils at 373.1 K).
    EXPECT_EQ(cell(1, PointsModel::PhaseCol), QStringLiteral("vapor"));
    EXPECT_FALSE(
        m->setData(m->index(0, PointsModel::Pressure), QStringLiteral("-3"), Qt::EditRole));

    edit::movePoint(doc, 1, 0);
    EXPECT_EQ(cell(0, PointsModel::Label), QStringLiteral("b"));
    edit::removePoints(doc, {0, 1});
    EXPECT_EQ(m->rowCount(), 0);
    doc.undoStack().undo();  // delete
    doc.undoStack().undo();  // move
    ASSERT_EQ(m->rowCount(), 2);
    EXPECT_EQ(cell(0, PointsModel::Label), QStringLiteral("a"));
    doc.undoStack().undo();  // edit
    EXPECT_DOUBLE_EQ(doc.point(0).T_K, 300.0);
    EXPECT_EQ(cell(0, PointsModel::PhaseCol), QStringLiteral("liquid"));
}

TEST_F(MainWindowTest, UnitsChangeTheTableButNotTheStoredValues) {
    Document &doc = window_->document();
    edit::addPoint(doc, {QStringLiteral("a"), 273.15, 101325.0});
    settings_->setUnits({TemperatureUnit::Celsius, PressureUnit::kPa});
    EXPECT_EQ(cell(0, PointsModel::Temperature), QStringLiteral("0.00"));
    EXPECT_EQ(cell(0, PointsModel::Pressure), QStringLiteral("101.3"));
    EXPECT_DOUBLE_EQ(doc.point(0).T_K, 273.15);
    const PointsModel *m = window_->pointsTable()->model();
    EXPECT_EQ(m->headerData(PointsModel::Temperature, Qt::Horizontal, Qt::DisplayRole).toString(),
              QStringLiteral("T [°C]"));
}

}  // namespace
}  // namespace pw::ui::test
