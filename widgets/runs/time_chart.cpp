#include "widgets/runs/time_chart.h"

#include <qcustomplot.h>

#include <QMouseEvent>
#include <QVBoxLayout>
#include <algorithm>
#include <cmath>

#include "widgets/format.h"

namespace pw::ui {

namespace {

// dP spans from a few Pa (drying) to MPa (a liquid far from the melting line): drawn on a
// signed logarithmic scale, asinh(dP / 2 Pa) / ln 10, which is linear near 0 and log10 beyond.
double signedLog(double dP_Pa) { return std::asinh(dP_Pa / 2.0) / std::log(10.0); }

// Ticks at 0 and at +-10^k, every `stride` decades so that labels stay apart on a short axis.
QSharedPointer<QCPAxisTickerText> signedLogTicker(int stride) {
    auto ticker = QSharedPointer<QCPAxisTickerText>::create();
    ticker->addTick(0.0, QStringLiteral("0"));
    for (int k = stride > 1 ? stride : 0; k <= 9; k += std::max(1, stride)) {
        const double v = std::pow(10.0, k);
        const QString text = k == 0 ? QStringLiteral("1") : QStringLiteral("1e%1").arg(k);
        ticker->addTick(signedLog(v), text);
        ticker->addTick(signedLog(-v), QStringLiteral("−") + text);
    }
    return ticker;
}

// Decades between labels for `pixels` of axis showing `range` (in signed-log units, about one
// unit per decade): labels at least 16 px apart.
int decadeStride(double pixels, double range) {
    if (!(pixels > 0.0) || !(range > 0.0)) return 1;
    const double perDecade = pixels / range;
    return std::clamp(static_cast<int>(std::ceil(16.0 / perDecade)), 1, 9);
}

QCPAxisRect *addRect(QCustomPlot *plot, int row) {
    auto *rect = row == 0 ? plot->axisRect() : new QCPAxisRect(plot);
    if (row != 0) plot->plotLayout()->addElement(row, 0, rect);
    rect->axis(QCPAxis::atRight)->setVisible(true);
    rect->setRangeDrag(Qt::Horizontal);
    rect->setRangeZoom(Qt::Horizontal);
    return rect;
}

QCPItemStraightLine *addCursorLine(QCustomPlot *plot, QCPAxisRect *rect) {
    auto *line = new QCPItemStraightLine(plot);
    line->setClipAxisRect(rect);
    for (auto *pos : {line->point1, line->point2}) {
        pos->setAxes(rect->axis(QCPAxis::atBottom), rect->axis(QCPAxis::atLeft));
    }
    line->setPen(QPen(QColor(0x55, 0x22, 0x88), 1.2, Qt::DashLine));
    line->setVisible(false);
    return line;
}

}  // namespace

TimeChart::TimeChart(QWidget *parent) : QWidget(parent), plot_(new QCustomPlot(this)) {
    auto *layout = new QVBoxLayout(this);
    layout->setContentsMargins(0, 0, 0, 0);
    layout->addWidget(plot_);
    plot_->setMinimumHeight(220);
    plot_->setMouseTracking(true);
    plot_->installEventFilter(this);
    plot_->setInteractions(QCP::iRangeDrag | QCP::iRangeZoom);
    build();
}

void TimeChart::build() {
    top_ = addRect(plot_, 0);
    bottom_ = addRect(plot_, 1);
    auto *group = new QCPMarginGroup(plot_);
    top_->setMarginGroup(QCP::msLeft | QCP::msRight, group);
    bottom_->setMarginGroup(QCP::msLeft | QCP::msRight, group);
    // Panning or zooming one row moves the other.
    connect(top_->axis(QCPAxis::atBottom), qOverload<const QCPRange &>(&QCPAxis::rangeChanged),
            bottom_->axis(QCPAxis::atBottom), qOverload<const QCPRange &>(&QCPAxis::setRange));
    connect(bottom_->axis(QCPAxis::atBottom), qOverload<const QCPRange &>(&QCPAxis::rangeChanged),
            top_->axis(QCPAxis::atBottom), qOverload<const QCPRange &>(&QCPAxis::setRange));

    const QColor tColour(0xc0, 0x39, 0x2b), pColour(0x1f, 0x5f, 0xa8);
    gT_ = plot_->addGraph(top_->axis(QCPAxis::atBottom), top_->axis(QCPAxis::atLeft));
    gP_ = plot_->addGraph(top_->axis(QCPAxis::atBottom), top_->axis(QCPAxis::atRight));
    gDT_ = plot_->addGraph(bottom_->axis(QCPAxis::atBottom), bottom_->axis(QCPAxis::atLeft));
    gDP_ = plot_->addGraph(bottom_->axis(QCPAxis::atBottom), bottom_->axis(QCPAxis::atRight));
    gT_->setPen(QPen(tColour, 1.5));
    gP_->setPen(QPen(pColour, 1.5));
    gDT_->setPen(QPen(tColour, 1.5, Qt::SolidLine));
    gDP_->setPen(QPen(pColour, 1.5, Qt::SolidLine));
    top_->axis(QCPAxis::atLeft)->setLabelColor(tColour);
    top_->axis(QCPAxis::atRight)->setLabelColor(pColour);
    bottom_->axis(QCPAxis::atLeft)->setLabelColor(tColour);
    bottom_->axis(QCPAxis::atRight)->setLabelColor(pColour);
    auto *pAxis = top_->axis(QCPAxis::atRight);
    pAxis->setScaleType(QCPAxis::stLogarithmic);
    pAxis->setTicker(QSharedPointer<QCPAxisTickerLog>::create());
    pAxis->setNumberFormat(QStringLiteral("eb"));
    pAxis->setNumberPrecision(0);
    bottom_->axis(QCPAxis::atRight)->setTicker(signedLogTicker(1));
    connect(plot_, &QCustomPlot::afterLayout, this, &TimeChart::updateMarginTicks);
    // The zero line of the margins: the boundary itself.
    auto *zero = new QCPItemStraightLine(plot_);
    zero->setClipAxisRect(bottom_);
    for (auto *pos : {zero->point1, zero->point2})
        pos->setAxes(bottom_->axis(QCPAxis::atBottom), bottom_->axis(QCPAxis::atLeft));
    zero->point1->setCoords(0, 0);
    zero->point2->setCoords(1, 0);
    zero->setPen(QPen(QColor(0x80, 0x80, 0x80), 1, Qt::DotLine));
    lineTop_ = addCursorLine(plot_, top_);
    lineBottom_ = addCursorLine(plot_, bottom_);
    setUnits(units_);
}

void TimeChart::setUnits(const DisplayUnits &units) {
    units_ = units;
    top_->axis(QCPAxis::atLeft)->setLabel(tr("T [%1]").arg(unitLabel(units.temperature)));
    top_->axis(QCPAxis::atRight)->setLabel(tr("P [%1]").arg(unitLabel(units.pressure)));
    const QString dTunit = units.temperature == TemperatureUnit::Fahrenheit ||
                                   units.temperature == TemperatureUnit::Rankine
                               ? QStringLiteral("°R")
                               : QStringLiteral("K");
    // Short labels: the margin row is low. The tooltip says what the row shows.
    bottom_->axis(QCPAxis::atLeft)->setLabel(tr("ΔT [%1]").arg(dTunit));
    bottom_->axis(QCPAxis::atRight)->setLabel(tr("ΔP [Pa]"));
    plot_->setToolTip(
        tr("Upper row: temperature and pressure of the run. Lower row: margins "
           "to the nearest phase boundary, ΔT and ΔP (signed logarithmic scale); "
           "0 is on the boundary. Drag to pan, wheel to zoom the time axis."));
    fill();
}

void TimeChart::updateMarginTicks() {
    QCPAxis *axis = bottom_->axis(QCPAxis::atRight);
    const int stride = decadeStride(axis->axisRect()->height(), axis->range().size());
    if (stride == tickStride_) return;
    tickStride_ = stride;
    axis->setTicker(signedLogTicker(stride));
    // This replot's ticks are already made (before the layout, whose height this needs).
    plot_->replot(QCustomPlot::rpQueuedReplot);
}

void TimeChart::setRun(RunPtr run) {
    run_ = std::move(run);
    cursorTime_s_ = kNaN;
    fill();
}

void TimeChart::fill() {
    QVector<double> t, T, P, mt, dT, dP;
    const double span = run_ && !run_->states.empty() ? run_->states.back().time_s : 0.0;
    timeScale_s_ = span > 3 * 3600.0 ? 3600.0 : 60.0;
    if (run_) {
        for (std::size_t i : run_->drawIndices) {
            const State &s = run_->states[i];
            t.push_back(s.time_s / timeScale_s_);
            T.push_back(fromKelvin(s.T_K, units_.temperature));
            P.push_back(fromPascal(s.P_Pa, units_.pressure));
        }
        for (const run::MarginPoint &m : run_->margins) {
            mt.push_back(m.time_s / timeScale_s_);
            dT.push_back(std::isfinite(m.dT_K) ? differenceFromKelvin(m.dT_K, units_.temperature)
                                               : qQNaN());
            dP.push_back(std::isfinite(m.dP_Pa) ? signedLog(m.dP_Pa) : qQNaN());
        }
    }
    gT_->setData(t, T, true);
    gP_->setData(t, P, true);
    gDT_->setData(mt, dT, true);
    gDP_->setData(mt, dP, true);
    const QString unit = timeScale_s_ == 3600.0 ? tr("h") : tr("min");
    bottom_->axis(QCPAxis::atBottom)->setLabel(tr("time [%1]").arg(unit));
    top_->axis(QCPAxis::atBottom)->setTickLabels(false);
    for (QCPGraph *g : {gT_, gP_, gDT_, gDP_}) g->rescaleValueAxis(false, false);
    gT_->rescaleKeyAxis();
    bottom_->axis(QCPAxis::atBottom)->setRange(top_->axis(QCPAxis::atBottom)->range());
    gT_->setName(tr("T"));
    setCursorTime(cursorTime_s_);
}

void TimeChart::setCursorTime(double time_s) {
    cursorTime_s_ = time_s;
    const bool show = std::isfinite(time_s) && run_;
    for (QCPItemStraightLine *line : {lineTop_, lineBottom_}) {
        line->setVisible(show);
        if (!show) continue;
        line->point1->setCoords(time_s / timeScale_s_, 0);
        line->point2->setCoords(time_s / timeScale_s_, 1);
    }
    plot_->replot(QCustomPlot::rpQueuedReplot);
}

double TimeChart::timeAtPixel(double x) const {
    return bottom_->axis(QCPAxis::atBottom)->pixelToCoord(x) * timeScale_s_;
}

bool TimeChart::eventFilter(QObject *watched, QEvent *event) {
    if (watched == plot_ && run_) {
        if (event->type() == QEvent::MouseMove) {
            const auto *me = static_cast<QMouseEvent *>(event);
            const double t = timeAtPixel(me->position().x());
            const double end = run_->states.empty() ? 0.0 : run_->states.back().time_s;
            if (t >= 0 && t <= end) {
                setCursorTime(t);
                emit timeHovered(t);
            }
        } else if (event->type() == QEvent::Leave) {
            emit hoverLeft();
        }
    }
    return QWidget::eventFilter(watched, event);
}

}  // namespace pw::ui
