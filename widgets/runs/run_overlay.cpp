#include "widgets/runs/run_overlay.h"

#include <qcustomplot.h>

#include <QLinearGradient>
#include <QPainter>
#include <cmath>

#include "widgets/diagram_renderer.h"
#include "widgets/diagram_widget.h"

namespace pw::ui {

namespace {

constexpr int kSegments = 48;

QString hoursText(double time_s) {
    return time_s >= 3 * 3600.0 ? QObject::tr("%1 h").arg(time_s / 3600.0, 0, 'f', 1)
                                : QObject::tr("%1 min").arg(time_s / 60.0, 0, 'f', 0);
}

QCPGraph *scatterGraph(QCustomPlot &plot, QCPScatterStyle::ScatterShape shape, QColor pen,
                       QColor brush, double size) {
    auto *g = plot.addGraph(plot.xAxis, plot.yAxis);
    g->setLineStyle(QCPGraph::lsNone);
    g->setScatterStyle(QCPScatterStyle(shape, QPen(pen, 1.6), QBrush(brush), size));
    g->setSelectable(QCP::stNone);
    g->removeFromLegend();
    return g;
}

QCPItemText *label(QCustomPlot &plot, double x, double y, const QString &text, QColor colour,
                   Qt::Alignment align) {
    auto *t = new QCPItemText(&plot);
    t->position->setCoords(x, y);
    t->setText(text);
    t->setColor(colour);
    t->setPositionAlignment(align);
    t->setPadding(QMargins(6, 2, 6, 2));
    QFont f = plot.font();
    f.setPointSizeF(f.pointSizeF() * 0.85);
    f.setBold(true);
    t->setFont(f);
    t->setClipToAxisRect(true);
    t->setSelectable(false);
    return t;
}

}  // namespace

QColor timeColour(double fraction) {
    // Indigo -> teal -> amber -> crimson.
    static constexpr std::array<std::array<int, 3>, 4> stops{
        {{0x31, 0x2e, 0x9a}, {0x12, 0x8a, 0x8c}, {0xe3, 0x9b, 0x1b}, {0xb3, 0x1b, 0x3c}}};
    const double f = std::clamp(fraction, 0.0, 1.0) * 3.0;
    const int i = std::min(2, static_cast<int>(f));
    const double u = f - i;
    auto mix = [&](int c) {
        return static_cast<int>(std::lround(stops[i][c] + u * (stops[i + 1][c] - stops[i][c])));
    };
    return {mix(0), mix(1), mix(2)};
}

RunOverlay::RunOverlay(DiagramWidget &diagram, Settings &settings, QObject *parent)
    : QObject(parent), diagram_(diagram), settings_(settings) {
    connect(diagram_.plot(), &QCustomPlot::beforeReplot, this, &RunOverlay::ensureDrawn);
    connect(diagram_.plot(), &QCustomPlot::mouseMove, this, &RunOverlay::onMouseMove);
}

void RunOverlay::setRun(RunPtr run) {
    run_ = std::move(run);
    marker_ = {};
    removeScale();
    diagram_.rebuild();  // clears the old overlay; ensureDrawn adds the new one
}

void RunOverlay::ensureDrawn() {
    if (!run_ || run_->states.empty() || sentinel_) return;
    draw();
}

void RunOverlay::draw() {
    drawPath();
    drawMarks();
    drawScale();
    placeMarker();
}

void RunOverlay::drawPath() {
    QCustomPlot &plot = *diagram_.plot();
    const DisplayUnits u = settings_.units();
    const auto &idx = run_->drawIndices;
    const double end = std::max(1e-9, run_->states.back().time_s);
    const std::size_t n = idx.size();
    const std::size_t per = std::max<std::size_t>(1, (n + kSegments - 1) / kSegments);
    for (std::size_t a = 0; a + 1 < n; a += per) {
        const std::size_t b = std::min(n - 1, a + per);
        QVector<double> xs, ys;
        for (std::size_t k = a; k <= b; ++k) {
            const State &s = run_->states[idx[k]];
            xs.push_back(plotX(s.T_K, u));
            ys.push_back(plotY(s.P_Pa, u));
        }
        auto *curve = new QCPCurve(plot.xAxis, plot.yAxis);
        curve->setData(xs, ys);
        const double mid = 0.5 * (run_->states[idx[a]].time_s + run_->states[idx[b]].time_s);
        curve->setPen(QPen(timeColour(mid / end), 2.4, Qt::SolidLine, Qt::RoundCap));
        curve->setSelectable(QCP::stNone);
        curve->removeFromLegend();
    }
}

void RunOverlay::drawMarks() {
    QCustomPlot &plot = *diagram_.plot();
    const DisplayUnits u = settings_.units();
    const State &first = run_->states.front();
    const State &last = run_->states.back();
    const QColor dark(0x20, 0x20, 0x28);
    auto *start = scatterGraph(plot, QCPScatterStyle::ssCircle, dark, timeColour(0), 11);
    start->addData(plotX(first.T_K, u), plotY(first.P_Pa, u));
    label(plot, plotX(first.T_K, u), plotY(first.P_Pa, u), tr("start"), dark,
          Qt::AlignRight | Qt::AlignBottom);
    auto *stop = scatterGraph(plot, QCPScatterStyle::ssSquare, dark, timeColour(1), 10);
    stop->addData(plotX(last.T_K, u), plotY(last.P_Pa, u));
    label(plot, plotX(last.T_K, u), plotY(last.P_Pa, u), tr("end"), dark,
          Qt::AlignLeft | Qt::AlignTop);
    const QColor eventColour(0xc0, 0x10, 0x60);
    auto *events =
        scatterGraph(plot, QCPScatterStyle::ssDiamond, eventColour, QColor(Qt::white), 12);
    for (const PathEvent &e : run_->analysis.path.events) {
        events->addData(plotX(e.T_K, u), plotY(e.P_Pa, u));
        label(plot, plotX(e.T_K, u), plotY(e.P_Pa, u),
              QStringLiteral("%1 · %2").arg(
                  QString::fromStdString(std::string(toString(e.transition))), hoursText(e.time_s)),
              eventColour, Qt::AlignLeft | Qt::AlignTop)
            ->setBrush(QColor(255, 255, 255, 215));  // below-right: point labels sit above-right
    }
    markerGraph_ = scatterGraph(plot, QCPScatterStyle::ssCrossCircle, QColor(0x55, 0x22, 0x88),
                                QColor(255, 255, 255, 160), 16);
    sentinel_ = start;
}

// The time key of the path colours: a colour bar under the diagram, in its own layout row so
// that it never covers a region, label or point.
void RunOverlay::drawScale() {
    QCustomPlot &plot = *diagram_.plot();
    removeScale();
    QCPColorGradient gradient;
    QMap<double, QColor> stops;
    for (int k = 0; k <= 3; ++k) stops.insert(k / 3.0, timeColour(k / 3.0));
    gradient.setColorStops(stops);
    gradient.setColorInterpolation(QCPColorGradient::ciRGB);
    scale_ = new QCPColorScale(&plot);
    scale_->setType(QCPAxis::atBottom);
    scale_->setGradient(gradient);
    scale_->setBarWidth(7);
    scale_->setRangeDrag(false);
    scale_->setRangeZoom(false);
    const double end_s = run_->states.back().time_s;
    const bool hours = end_s >= 3 * 3600.0;
    scale_->setDataRange(QCPRange(0.0, end_s / (hours ? 3600.0 : 60.0)));
    scale_->axis()->setLabel(
        tr("run %1: path colour = time [%2]").arg(run_->title, hours ? tr("h") : tr("min")));
    scale_->axis()->setLabelColor(plot.xAxis->labelColor());
    scale_->axis()->setTickLabelColor(plot.xAxis->tickLabelColor());
    auto *layout = plot.plotLayout();
    layout->addElement(layout->rowCount(), 0, scale_);
    layout->setRowStretchFactor(layout->rowCount() - 1, 0.001);
    // Line the bar up with the diagram's axis rect.
    group_ = new QCPMarginGroup(&plot);
    plot.axisRect()->setMarginGroup(QCP::msLeft | QCP::msRight, group_);
    scale_->setMarginGroup(QCP::msLeft | QCP::msRight, group_);
}

void RunOverlay::removeScale() {
    QCustomPlot &plot = *diagram_.plot();
    if (scale_) {
        plot.axisRect()->setMarginGroup(QCP::msLeft | QCP::msRight, nullptr);
        plot.plotLayout()->remove(scale_);  // deletes it
        plot.plotLayout()->simplify();
    }
    delete group_;  // one group per key: none left behind by redraws
}

bool RunOverlay::markerVisible() const {
    return markerGraph_ && std::isfinite(marker_.T_K) && markerGraph_->dataCount() == 1;
}

void RunOverlay::setCursorTime(double time_s) {
    marker_ = run_ && std::isfinite(time_s) ? stateAtTime(run_->states, time_s) : State{};
    placeMarker();
    diagram_.plot()->replot(QCustomPlot::rpQueuedReplot);
}

void RunOverlay::placeMarker() {
    if (!markerGraph_) return;
    markerGraph_->data()->clear();
    if (!std::isfinite(marker_.T_K)) return;
    const DisplayUnits u = settings_.units();
    markerGraph_->addData(plotX(marker_.T_K, u), plotY(marker_.P_Pa, u));
}

double RunOverlay::timeNearPixel(QPointF pixel, double maxPx) const {
    if (!run_) return kNaN;
    double best = maxPx * maxPx;
    double time = kNaN;
    for (std::size_t i : run_->drawIndices) {
        const State &s = run_->states[i];
        const QPointF p = diagram_.pixelAt(s.T_K, s.P_Pa);
        const double d = QPointF::dotProduct(p - pixel, p - pixel);
        if (d <= best) {
            best = d;
            time = s.time_s;
        }
    }
    return time;
}

void RunOverlay::onMouseMove(QMouseEvent *event) {
    if (!run_) return;
    const QPoint inWidget = diagram_.plot()->mapTo(&diagram_, event->position().toPoint());
    const double t = timeNearPixel(inWidget);
    if (std::isfinite(t)) {
        hovering_ = true;
        setCursorTime(t);
        emit pathTimeHovered(t);
    } else if (hovering_) {
        hovering_ = false;
        emit pathHoverLeft();
    }
}

}  // namespace pw::ui
