// The diagram's drawing inputs: boundary sampling, default views and the rendered scene.
#include <qcustomplot.h>

#include <cmath>

#include "gui_fixture.h"
#include "widgets/boundary_sampling.h"
#include "widgets/diagram_renderer.h"
#include "widgets/diagram_scene.h"
#include "widgets/region_raster.h"

namespace pw::ui::test {
namespace {

class SceneTest : public GuiTest {};

QStringList texts(const QCustomPlot &plot) {
    QStringList out;
    for (int i = 0; i < plot.itemCount(); ++i)
        if (auto *t = qobject_cast<QCPItemText *>(plot.item(i))) out << t->text();
    return out;
}

TEST_F(SceneTest, DefaultViewSpansTriplePointToAboveCriticalPoint) {
    for (const char *id : {"water", "carbon-dioxide", "nitrogen", "argon"}) {
        const auto d = library_.find(id);
        const ViewState v = defaultView(*d, true);
        const FixedPoint *tp = d->triplePoint();
        const FixedPoint *cp = d->criticalPoint();
        ASSERT_TRUE(tp && cp) << id;
        EXPECT_LT(v.T_min_K, 0.8 * tp->T_K) << id;
        EXPECT_GT(v.T_max_K, cp->T_K) << id;
        EXPECT_LT(v.P_min_Pa, tp->P_Pa) << id;
        EXPECT_GT(v.P_max_Pa, cp->P_Pa) << id;
        EXPECT_TRUE(v.valid()) << id;
    }
}

TEST_F(SceneTest, SampledBoundariesLieOnTheModelAndAreSmoothOnALogAxis) {
    const auto co2 = library_.find("carbon-dioxide");
    const ViewState v = defaultView(*co2, true);
    const auto runs = sampleBoundaries(*co2, v);
    ASSERT_FALSE(runs.empty());
    bool sawVaporization = false;
    for (const CurveRun &run : runs) {
        ASSERT_GE(run.T_K.size(), 2u);
        for (std::size_t i = 0; i < run.T_K.size(); ++i) {
            const double p = run.boundary->model->pressure(run.T_K[i]);
            EXPECT_NEAR(p / run.P_Pa[i], 1.0, 1e-6);
        }
        if (run.boundary->kind != BoundaryKind::Vaporization || run.extrapolated) continue;
        sawVaporization = true;
        for (std::size_t i = 1; i < run.P_Pa.size(); ++i)  // no step longer than 2 % in p
            EXPECT_LT(std::fabs(std::log(run.P_Pa[i] / run.P_Pa[i - 1])), 0.02);
    }
    EXPECT_TRUE(sawVaporization);
}

TEST_F(SceneTest, CarbonDioxideSceneHasLabelledRegionsAndFixedPoints) {
    QCustomPlot plot;
    plot.resize(900, 600);
    DiagramScene scene;
    scene.substances = {library_.find("carbon-dioxide")};
    scene.view = defaultView(*scene.substances[0], true);
    scene.points = {{QStringLiteral("vent"), 313.15, 1e5}};
    renderScene(plot, scene, SceneStyle{});
    const QStringList t = texts(plot);
    for (const char *region : {"solid", "liquid", "vapor", "gas", "supercritical\nfluid"})
        EXPECT_TRUE(t.contains(QString::fromUtf8(region)))
            << region << ": " << t.join('|').toStdString();
    // Span & Wagner (1996): triple point 216.592 K / 0.51795 MPa, critical point
    // 304.1282 K / 7.3773 MPa.
    EXPECT_TRUE(
        t.filter(QStringLiteral("triple point")).value(0).contains(QStringLiteral("216.59")));
    EXPECT_TRUE(
        t.filter(QStringLiteral("critical point")).value(0).contains(QStringLiteral("304.13")));
    EXPECT_TRUE(t.contains(QStringLiteral("vent")));
    EXPECT_EQ(plot.yAxis->scaleType(), QCPAxis::stLogarithmic);
    // Common practice: CO2 sublimes at 1 atm (about 194.7 K); it has no normal boiling point.
    EXPECT_FALSE(t.filter(QStringLiteral("normal sublimation point")).isEmpty());
    EXPECT_TRUE(t.filter(QStringLiteral("normal boiling point")).isEmpty());
}

TEST_F(SceneTest, WaterSceneLabelsIceIhLiquidAndVapor) {
    QCustomPlot plot;
    plot.resize(900, 600);
    DiagramScene scene;
    scene.substances = {library_.find("water")};
    scene.view = defaultView(*scene.substances[0], true);
    renderScene(plot, scene, SceneStyle{});
    const QStringList t = texts(plot);
    for (const char *region : {"ice Ih", "liquid", "vapor"})
        EXPECT_TRUE(t.contains(QString::fromUtf8(region)))
            << region << ": " << t.join('|').toStdString();
    bool solid = false;
    for (int i = 0; i < plot.plottableCount(); ++i)
        if (auto *c = qobject_cast<QCPCurve *>(plot.plottable(i)))
            solid = solid || c->pen().style() == Qt::SolidLine;
    EXPECT_TRUE(solid);
}

TEST_F(SceneTest, RegionRasterAgreesWithClassifyAndDecimationKeepsEnds) {
    const auto co2 = library_.find("carbon-dioxide");
    const ViewState v{200.0, 320.0, 1e5, 1e8, true};
    const RegionRaster r = rasterRegions(*co2, v, 120, 80, 5.0, false);
    ASSERT_EQ(r.image.width(), 120);
    // Top right cell: 319.5 K near 100 MPa is above Tc and pc: supercritical.
    EXPECT_EQ(QColor::fromRgba(r.image.pixel(119, 0)),
              regionColour(QStringLiteral("supercritical fluid"), false));
    std::vector<State> many(100000);
    for (std::size_t i = 0; i < many.size(); ++i)
        many[i] = {double(i), 250.0 + 50.0 * std::sin(i * 1e-4),
                   1e6 * (1.0 + 0.5 * std::cos(i * 1e-4))};
    const auto shown = decimateForDisplay(many, v);
    EXPECT_LT(shown.size(), 20000u);
    EXPECT_EQ(shown.front().time_s, 0.0);
    EXPECT_EQ(shown.back().time_s, 99999.0);
}

// A point label flips to the left of its point only when it would run past the right edge.
TEST_F(SceneTest, PointLabelsFlipOnlyWhenCutOff) {
    QCustomPlot plot;
    plot.resize(1000, 600);
    DiagramScene scene;
    scene.substances = {library_.find("carbon-dioxide")};
    scene.view = ViewState{200.0, 360.0, 5e4, 5e7, true};
    scene.points = {{QStringLiteral("short"), 330.0, 1e6},  // 81 % across: room to the right
                    {QStringLiteral("a rather long label near the edge"), 355.0, 1e5}};
    renderScene(plot, scene, SceneStyle{});
    int checked = 0;
    for (int i = 0; i < plot.itemCount(); ++i) {
        auto *t = qobject_cast<QCPItemText *>(plot.item(i));
        if (!t) continue;
        if (t->text() == QStringLiteral("short")) {
            EXPECT_TRUE(t->positionAlignment() & Qt::AlignLeft);
            ++checked;
        } else if (t->text().startsWith(QStringLiteral("a rather"))) {
            EXPECT_TRUE(t->positionAlignment() & Qt::AlignRight);
            ++checked;
        }
    }
    EXPECT_EQ(checked, 2);
}

// Region labels sit in the middle of a tall strip and keep clear of marked points.
TEST_F(SceneTest, RegionLabelsAvoidMarkedPoints) {
    const auto co2 = library_.find("carbon-dioxide");
    const ViewState v{178.15, 358.15, 5e4, 5e7, true};  // CO2 around its critical point
    auto gasLabel = [&](const LabelObstacles &o) {
        for (const RegionLabel &l : rasterRegions(*co2, v, 200, 120, 4.0, false, o).labels)
            if (l.name == QStringLiteral("gas")) return l;
        ADD_FAILURE() << "no gas label";
        return RegionLabel{};
    };
    const RegionLabel free = gasLabel({});
    // Span & Wagner (1996): Tc 304.13 K, pc 7.3773 MPa. The gas strip (T > Tc, p < pc) runs
    // from 50 kPa to pc; its label is not at the top, by the critical point's own label.
    EXPECT_GT(free.T_K, 304.13);
    EXPECT_LT(free.P_Pa, 2e6);
    LabelObstacles o;
    o.marks.emplace_back(free.T_K - 5.0, free.P_Pa);  // a point just left of the label
    const RegionLabel moved = gasLabel(o);
    EXPECT_GT(std::abs(std::log(moved.P_Pa / free.P_Pa)), 0.3) << moved.P_Pa << " Pa";
}

}  // namespace
}  // namespace pw::ui::test
