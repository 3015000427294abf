#include "widgets/compare/compare_view.h"

#include <qcustomplot.h>

#include <QHBoxLayout>
#include <QStackedLayout>

namespace pw::ui {
namespace {

QCustomPlot *makePlot(QWidget *parent, const QString &name) {
    auto *plot = new QCustomPlot(parent);
    plot->setObjectName(name);
    plot->setInteractions(QCP::iRangeDrag | QCP::iRangeZoom);
    plot->setMinimumSize(240, 200);
    return plot;
}

}  // namespace

CompareView::CompareView(QWidget *parent)
    : QWidget(parent),
      stack_(new QStackedLayout(this)),
      overlay_(makePlot(this, QStringLiteral("compareOverlay"))),
      reduced_(makePlot(this, QStringLiteral("compareReduced"))) {
    auto *pair = new QWidget(this);
    auto *row = new QHBoxLayout(pair);
    row->setContentsMargins(0, 0, 0, 0);
    for (std::size_t i = 0; i < panels_.size(); ++i) {
        panels_[i] = makePlot(pair, QStringLiteral("comparePanel%1").arg(i));
        row->addWidget(panels_[i], 1);
    }
    stack_->addWidget(overlay_);
    stack_->addWidget(pair);
    stack_->addWidget(reduced_);
    linkAxes();
}

SceneStyle CompareView::style() const { return SceneStyle::fromPalette(palette(), font()); }

void CompareView::follow(QCustomPlot *from, QCustomPlot *to) {
    if (following_) return;
    following_ = true;
    to->xAxis->setRange(from->xAxis->range());
    to->yAxis->setRange(from->yAxis->range());
    to->xAxis2->setRange(from->xAxis->range());
    to->yAxis2->setRange(from->yAxis->range());
    to->replot(QCustomPlot::rpQueuedReplot);
    following_ = false;
}

void CompareView::linkAxes() {
    // Pan or zoom one panel and the other follows: the same T and p ranges side by side.
    for (std::size_t i = 0; i < panels_.size(); ++i) {
        QCustomPlot *from = panels_[i];
        QCustomPlot *to = panels_[1 - i];
        auto sync = [this, from, to] { follow(from, to); };
        connect(from->xAxis, qOverload<const QCPRange &>(&QCPAxis::rangeChanged), this, sync);
        connect(from->yAxis, qOverload<const QCPRange &>(&QCPAxis::rangeChanged), this, sync);
    }
}

void CompareView::setSubstances(DiagramPtr a, DiagramPtr b) {
    a_ = std::move(a);
    b_ = std::move(b);
    rebuild();
}

void CompareView::setUnits(DisplayUnits units, bool logPressure) {
    units_ = units;
    logPressure_ = logPressure;
    rebuild();
}

void CompareView::setMode(CompareMode mode) {
    mode_ = mode;
    stack_->setCurrentIndex(static_cast<int>(mode));
    rebuild();
}

DiagramScene CompareView::overlayScene() const {
    DiagramScene s;
    s.substances = {a_, b_};
    s.units = units_;
    s.view = defaultView(s.substances, logPressure_);
    // Neither substance's regions are filled: the two sets of curves carry the comparison.
    s.fillRegions = false;
    s.labelRegions = false;
    s.showAtmosphere = true;
    // Two sets of labels would sit on top of each other: the table carries the numbers.
    s.labelFixedPoints = false;
    if (a_ && b_)
        s.title = tr("%1 and %2")
                      .arg(QString::fromStdString(a_->substance().name),
                           QString::fromStdString(b_->substance().name));
    return s;
}

DiagramScene CompareView::panelScene(int i) const {
    DiagramScene s;
    const DiagramPtr &d = i == 0 ? a_ : b_;
    s.substances = {d};
    s.units = units_;
    s.view = defaultView(std::vector<DiagramPtr>{a_, b_}, logPressure_);  // linked: one view
    if (d) s.title = QString::fromStdString(d->substance().name);
    return s;
}

void CompareView::rebuild() {
    const SceneStyle st = style();
    following_ = true;  // drawing sets the ranges of both panels itself
    switch (mode_) {
        case CompareMode::Overlay:
            renderScene(*overlay_, overlayScene(), st);
            overlay_->replot();
            break;
        case CompareMode::SideBySide:
            for (int i = 0; i < 2; ++i) {
                renderScene(*panels_[static_cast<std::size_t>(i)], panelScene(i), st);
                panels_[static_cast<std::size_t>(i)]->replot();
            }
            break;
        case CompareMode::Reduced:
            renderReduced(*reduced_, {a_, b_}, logPressure_, st);
            reduced_->replot();
            break;
    }
    following_ = false;
}

}  // namespace pw::ui
