#pragma once
// The time chart under the diagram: temperature and pressure over time (top) and the margins
// dT, dP to the nearest boundary over time (bottom, from run::marginsOverTime at the drawing
// indices). A vertical cursor line is shared by both rows; hovering emits the time, and
// setCursorTime() moves the line from outside (the diagram).
#include <QWidget>

#include "widgets/runs/run_data.h"
#include "widgets/settings.h"

class QCustomPlot;
class QCPAxisRect;
class QCPItemStraightLine;
class QCPGraph;

namespace pw::ui {

class TimeChart : public QWidget {
    Q_OBJECT
public:
    explicit TimeChart(QWidget *parent = nullptr);

    void setUnits(const DisplayUnits &units);
    void setRun(RunPtr run);  // nullptr clears
    RunPtr run() const { return run_; }
    QCustomPlot *plot() const { return plot_; }

    // Series, for tests: temperature, pressure, dT, dP.
    QCPGraph *temperatureGraph() const { return gT_; }
    QCPGraph *pressureGraph() const { return gP_; }
    QCPGraph *marginTGraph() const { return gDT_; }
    QCPGraph *marginPGraph() const { return gDP_; }

    double cursorTime() const { return cursorTime_s_; }  // NaN when hidden
    // The time (s) at a pixel x of the chart widget.
    double timeAtPixel(double x) const;

public slots:
    void setCursorTime(double time_s);  // NaN hides the line
    void clearCursor() { setCursorTime(kNaN); }

signals:
    void timeHovered(double time_s);
    void hoverLeft();

protected:
    bool eventFilter(QObject *watched, QEvent *event) override;

private:
    void build();
    void fill();
    void updateMarginTicks();  // ΔP labels thinned to the axis height

    QCustomPlot *plot_;
    QCPAxisRect *top_ = nullptr;
    QCPAxisRect *bottom_ = nullptr;
    QCPGraph *gT_ = nullptr, *gP_ = nullptr, *gDT_ = nullptr, *gDP_ = nullptr;
    QCPItemStraightLine *lineTop_ = nullptr, *lineBottom_ = nullptr;
    RunPtr run_;
    DisplayUnits units_;
    double cursorTime_s_ = kNaN;
    double timeScale_s_ = 3600.0;  // seconds per axis unit
    int tickStride_ = 1;           // decades between ΔP labels
};

}  // namespace pw::ui
