// The corresponding-states plot of CompareView: T/Tc against p/pc for every substance.
#include <qcustomplot.h>

#include <algorithm>
#include <cmath>

#include "core/compare.h"
#include "widgets/boundary_sampling.h"
#include "widgets/compare/compare_view.h"
#include "widgets/diagram_scene.h"

namespace pw::ui {
namespace {

struct ReducedRange {
    double xMin = 1.0, xMax = 1.3, yMin = 1.0, yMax = 1.4;
};

ReducedRange rangeOf(const std::vector<DiagramPtr> &substances, bool logPressure) {
    ReducedRange r;
    for (const auto &d : substances) {
        const FixedPoint *cp = d ? d->criticalPoint() : nullptr;
        if (!cp) continue;
        const ViewState v = defaultView(*d, logPressure);
        r.xMin = std::min(r.xMin, v.T_min_K / cp->T_K);
        if (logPressure) {
            r.yMin = std::min(r.yMin, v.P_min_Pa / cp->P_Pa);
            r.yMax = std::max(r.yMax, v.P_max_Pa / cp->P_Pa);
        }
    }
    if (!logPressure) r.yMin = 0.0;
    return r;
}

void styleAxes(QCustomPlot &plot, const SceneStyle &s, bool logPressure) {
    plot.xAxis->setLabel(QObject::tr("Reduced temperature T / Tc"));
    plot.yAxis->setLabel(QObject::tr("Reduced pressure p / pc"));
    QFont label = s.font;
    label.setPointSizeF(s.font.pointSizeF() * 1.05 * s.scale);
    for (QCPAxis *axis : {plot.xAxis, plot.yAxis}) {
        axis->setBasePen(QPen(s.text, s.scale));
        axis->setTickPen(QPen(s.text, s.scale));
        axis->setSubTickPen(QPen(s.text, 0.8 * s.scale));
        axis->setTickLabelColor(s.text);
        axis->setLabelColor(s.text);
        axis->setLabelFont(label);
        axis->grid()->setPen(QPen(s.grid, 0.8 * s.scale, Qt::DotLine));
    }
    if (logPressure) {
        plot.yAxis->setScaleType(QCPAxis::stLogarithmic);
        plot.yAxis->setTicker(QSharedPointer<QCPAxisTickerLog>(new QCPAxisTickerLog));
        plot.yAxis->setNumberFormat(QStringLiteral("eb"));
        plot.yAxis->setNumberPrecision(0);
    } else {
        plot.yAxis->setScaleType(QCPAxis::stLinear);
        plot.yAxis->setTicker(QSharedPointer<QCPAxisTicker>(new QCPAxisTicker));
        plot.yAxis->setNumberFormat(QStringLiteral("gb"));
    }
    plot.setBackground(QBrush(s.background));
    plot.axisRect()->setBackground(QBrush(s.background));
}

// Solid for A, dash-dot for B; extrapolated parts thinner, dashed (A) or dotted (B), so the
// four kinds of line stay apart in greyscale print.
QPen reducedPen(int index, bool extrapolated, const SceneStyle &s) {
    const QColor colour = substanceColour(index, s.dark);
    if (extrapolated) return QPen(colour, 1.4 * s.scale, index == 0 ? Qt::DashLine : Qt::DotLine);
    return QPen(colour, 2.2 * s.scale, index == 0 ? Qt::SolidLine : Qt::DashDotLine);
}

void addSubstance(QCustomPlot &plot, const PhaseDiagram &d, int index, bool logPressure,
                  const SceneStyle &s) {
    const FixedPoint *cp = d.criticalPoint();
    if (!cp) return;
    // The vaporization curve from the core, which ends exactly at (1, 1); the legend entry.
    const std::vector<ReducedPoint> vap = reducedVaporizationCurve(d, 400);
    QVector<double> vx, vy;
    for (const ReducedPoint &p : vap) {
        vx.push_back(p.Tr);
        vy.push_back(p.Pr);
    }
    auto *vapCurve = new QCPCurve(plot.xAxis, plot.yAxis);
    vapCurve->setData(vx, vy);
    vapCurve->setPen(reducedPen(index, false, s));
    vapCurve->setName(QString::fromStdString(d.substance().name));
    bool legendDone = !vap.empty();
    if (!legendDone) vapCurve->removeFromLegend();
    for (const CurveRun &run : sampleBoundaries(d, defaultView(d, logPressure))) {
        if (run.boundary && run.boundary->kind == BoundaryKind::Vaporization && !vap.empty() &&
            !run.extrapolated)
            continue;
        QVector<double> xs, ys;
        for (std::size_t i = 0; i < run.T_K.size(); ++i) {
            xs.push_back(run.T_K[i] / cp->T_K);
            ys.push_back(run.P_Pa[i] / cp->P_Pa);
        }
        auto *curve = new QCPCurve(plot.xAxis, plot.yAxis);
        curve->setData(xs, ys);
        curve->setPen(reducedPen(index, run.extrapolated, s));
        curve->setName(QString::fromStdString(d.substance().name));
        if (legendDone || run.extrapolated)
            curve->removeFromLegend();
        else
            legendDone = true;
    }
    QCPGraph *tps = plot.addGraph();
    tps->setLineStyle(QCPGraph::lsNone);
    const QColor colour = substanceColour(index, s.dark);
    tps->setScatterStyle(
        QCPScatterStyle(index == 0 ? QCPScatterStyle::ssDiamond : QCPScatterStyle::ssTriangle,
                        QPen(colour, 1.4 * s.scale), QBrush(s.background), 9 * s.scale));
    for (const auto &tp : d.substance().triplePoints)
        tps->addData(tp.T_K / cp->T_K, tp.P_Pa / cp->P_Pa);
    tps->removeFromLegend();
}

void addCriticalPoint(QCustomPlot &plot, const SceneStyle &s) {
    QCPGraph *g = plot.addGraph();
    g->setLineStyle(QCPGraph::lsNone);
    g->setScatterStyle(QCPScatterStyle(QCPScatterStyle::ssCircle, QPen(s.text, 1.4 * s.scale),
                                       QBrush(s.text), 8 * s.scale));
    g->addData(1.0, 1.0);
    g->removeFromLegend();
    auto *t = new QCPItemText(&plot);
    t->position->setCoords(1.0, 1.0);
    t->setPositionAlignment(Qt::AlignRight | Qt::AlignBottom);
    t->setPadding(QMargins(0, 0, 8, 4));
    t->setText(QObject::tr("critical point (1, 1)"));
    t->setColor(s.text);
    QFont f = s.font;
    f.setPointSizeF(s.font.pointSizeF() * 0.9 * s.scale);
    t->setFont(f);
}

}  // namespace

void renderReduced(QCustomPlot &plot, const std::vector<DiagramPtr> &substances, bool logPressure,
                   const SceneStyle &style) {
    plot.clearItems();
    plot.clearPlottables();
    styleAxes(plot, style, logPressure);
    for (std::size_t i = 0; i < substances.size(); ++i)
        if (substances[i])
            addSubstance(plot, *substances[i], static_cast<int>(i), logPressure, style);
    addCriticalPoint(plot, style);
    const ReducedRange r = rangeOf(substances, logPressure);
    plot.xAxis->setRange(r.xMin, r.xMax);
    plot.yAxis->setRange(r.yMin, r.yMax);
    plot.legend->setVisible(true);
    plot.legend->setBrush(QBrush(style.background));
    plot.legend->setTextColor(style.text);
    plot.axisRect()->insetLayout()->setInsetAlignment(0, Qt::AlignTop | Qt::AlignLeft);
}

}  // namespace pw::ui
