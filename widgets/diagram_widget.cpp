#include "widgets/diagram_widget.h"

#include <qcustomplot.h>

#include <QEvent>
#include <QMouseEvent>
#include <QVBoxLayout>

namespace pw::ui {

DiagramWidget::DiagramWidget(Document &doc, Settings &settings, QWidget *parent)
    : QWidget(parent), doc_(doc), settings_(settings), plot_(new QCustomPlot(this)) {
    auto *layout = new QVBoxLayout(this);
    layout->setContentsMargins(0, 0, 0, 0);
    layout->addWidget(plot_);
    plot_->setInteractions(QCP::iRangeDrag | QCP::iRangeZoom);
    plot_->setNoAntialiasingOnDrag(false);
    plot_->setMouseTracking(true);
    plot_->installEventFilter(this);
    plot_->setToolTip(tr("Drag to pan, wheel to zoom, Ctrl+click to add a point"));
    plot_->setMinimumSize(320, 240);
    rebuildTimer_.setSingleShot(true);
    rebuildTimer_.setInterval(60);
    connect(&rebuildTimer_, &QTimer::timeout, this, &DiagramWidget::rebuild);
    connect(plot_, &QCustomPlot::mouseMove, this, &DiagramWidget::onMouseMove);
    connect(plot_, &QCustomPlot::mousePress, this, &DiagramWidget::onMousePress);
    connect(plot_->xAxis, qOverload<const QCPRange &>(&QCPAxis::rangeChanged), this,
            &DiagramWidget::onRangeChanged);
    connect(plot_->yAxis, qOverload<const QCPRange &>(&QCPAxis::rangeChanged), this,
            &DiagramWidget::onRangeChanged);

    connect(&doc_, &Document::substancesChanged, this, &DiagramWidget::resetView);
    connect(&doc_, &Document::viewChanged, this, [this] {
        if (!applyingView_) rebuild();
    });
    connect(&doc_, &Document::pointsReset, this, &DiagramWidget::rebuild);
    connect(&doc_, &Document::pointsInserted, this, &DiagramWidget::rebuild);
    connect(&doc_, &Document::pointsRemoved, this, &DiagramWidget::rebuild);
    connect(&doc_, &Document::pointChanged, this, &DiagramWidget::rebuild);
    connect(&doc_, &Document::pointMoved, this, &DiagramWidget::rebuild);
    connect(&settings_, &Settings::unitsChanged, this, &DiagramWidget::rebuild);
    connect(&settings_, &Settings::showAtmosphereChanged, this, &DiagramWidget::rebuild);
    connect(&settings_, &Settings::logPressureChanged, this, [this](bool on) {
        ViewState v = defaultView(doc_.substances(), on);
        const ViewState &old = doc_.view();
        if (old.valid()) {
            v.T_min_K = old.T_min_K;  // keep the temperature range, rescale pressure only
            v.T_max_K = old.T_max_K;
        }
        doc_.setView(v);
    });
}

DiagramScene DiagramWidget::scene() const {
    DiagramScene s;
    s.substances = doc_.substances();
    s.units = settings_.units();
    s.view = doc_.view();
    if (!s.view.valid()) s.view = defaultView(s.substances, settings_.logPressure());
    s.showAtmosphere = settings_.showAtmosphere();
    s.points = doc_.points();
    s.guides = guides_;
    s.paths = paths_;
    return s;
}

SceneStyle DiagramWidget::style() const {
    SceneStyle st = SceneStyle::fromPalette(palette(), font());
    st.regionCellPx = 2.0;
    return st;
}

void DiagramWidget::setGuides(std::vector<GuideLine> guides) {
    guides_ = std::move(guides);
    rebuild();
}

void DiagramWidget::setPaths(std::vector<ScenePath> paths) {
    paths_ = std::move(paths);
    rebuild();
}

void DiagramWidget::resetView() {
    doc_.setView(defaultView(doc_.substances(), settings_.logPressure()));
    rebuild();
}

void DiagramWidget::rebuild() {
    rebuildTimer_.stop();
    applyingView_ = true;
    renderScene(*plot_, scene(), style());
    applyingView_ = false;
    plot_->replot();
}

void DiagramWidget::scheduleRebuild() { rebuildTimer_.start(); }

void DiagramWidget::onRangeChanged() {
    if (applyingView_) return;
    const DisplayUnits u = settings_.units();
    ViewState v = doc_.view();
    v.T_min_K = kelvinFromPlot(plot_->xAxis->range().lower, u);
    v.T_max_K = kelvinFromPlot(plot_->xAxis->range().upper, u);
    v.P_min_Pa = pascalFromPlot(plot_->yAxis->range().lower, u);
    v.P_max_Pa = pascalFromPlot(plot_->yAxis->range().upper, u);
    plot_->xAxis2->setRange(plot_->xAxis->range());
    plot_->yAxis2->setRange(plot_->yAxis->range());
    applyingView_ = true;
    doc_.setView(v);
    applyingView_ = false;
    scheduleRebuild();  // fills, labels and curve sampling follow the new view
}

std::pair<double, double> DiagramWidget::stateAt(QPointF pixel) const {
    const QPointF p = plot_->mapFrom(this, pixel.toPoint());
    const DisplayUnits u = settings_.units();
    return {kelvinFromPlot(plot_->xAxis->pixelToCoord(p.x()), u),
            pascalFromPlot(plot_->yAxis->pixelToCoord(p.y()), u)};
}

QPointF DiagramWidget::pixelAt(double T_K, double P_Pa) const {
    const DisplayUnits u = settings_.units();
    const QPointF p(plot_->xAxis->coordToPixel(plotX(T_K, u)),
                    plot_->yAxis->coordToPixel(plotY(P_Pa, u)));
    return plot_->mapTo(this, p.toPoint());
}

void DiagramWidget::onMouseMove(QMouseEvent *event) {
    const QPointF pos = event->position();
    if (!plot_->axisRect()->rect().contains(pos.toPoint())) {
        emit cursorLeft();
        return;
    }
    const auto [T, P] = stateAt(plot_->mapTo(this, pos.toPoint()));
    if (T > 0 && P > 0) emit cursorMoved(T, P);
}

void DiagramWidget::onMousePress(QMouseEvent *event) {
    if (event->button() != Qt::LeftButton || !(event->modifiers() & Qt::ControlModifier)) {
        return;
    }
    const QPoint pos = event->position().toPoint();
    if (!plot_->axisRect()->rect().contains(pos)) return;
    const auto [T, P] = stateAt(plot_->mapTo(this, pos));
    if (T > 0 && P > 0) emit pointRequested(T, P);
}

bool DiagramWidget::eventFilter(QObject *watched, QEvent *event) {
    if (watched == plot_ && event->type() == QEvent::Leave) emit cursorLeft();
    return QWidget::eventFilter(watched, event);
}

void DiagramWidget::changeEvent(QEvent *event) {
    if (event->type() == QEvent::PaletteChange || event->type() == QEvent::FontChange)
        scheduleRebuild();
    QWidget::changeEvent(event);
}

void DiagramWidget::resizeEvent(QResizeEvent *event) {
    QWidget::resizeEvent(event);
    scheduleRebuild();  // the region raster follows the plot's size
}

QImage DiagramWidget::toImage() const { return plot_->toPixmap().toImage(); }

}  // namespace pw::ui
