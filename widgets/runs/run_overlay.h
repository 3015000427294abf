#pragma once
// Draws a run on the interactive diagram, on top of what renderScene() draws: the path
// coloured by time (with a small colour scale), start and end marked, the crossing events
// marked and labelled, and a cursor marker for a time chosen on the time chart. The diagram
// rebuilds its plot often (pan, zoom, units); the overlay redraws itself before each replot
// when its items were cleared. Hovering near the path emits the time of the nearest sample.
#include <QColor>
#include <QObject>
#include <QPointer>

#include "widgets/runs/run_data.h"
#include "widgets/settings.h"

class QCPColorScale;
class QCPMarginGroup;
class QCPGraph;
class QMouseEvent;

namespace pw::ui {

class DiagramWidget;

// The overlay's time colour (0 = start, 1 = end): a gradient of our own.
QColor timeColour(double fraction);

class RunOverlay : public QObject {
    Q_OBJECT
public:
    RunOverlay(DiagramWidget &diagram, Settings &settings, QObject *parent = nullptr);

    void setRun(RunPtr run);  // nullptr removes the overlay
    RunPtr run() const { return run_; }

    // The cursor marker's state (K, Pa) when visible.
    bool markerVisible() const;
    State markerState() const { return marker_; }
    // Time of the sample nearest to a pixel of the diagram widget within `maxPx`, or NaN.
    double timeNearPixel(QPointF pixel, double maxPx = 12.0) const;

public slots:
    void setCursorTime(double time_s);  // NaN hides the marker
    void clearCursor() { setCursorTime(kNaN); }

signals:
    void pathTimeHovered(double time_s);
    void pathHoverLeft();

private:
    void ensureDrawn();
    void draw();
    void drawPath();
    void drawMarks();
    void drawScale();
    void removeScale();
    void placeMarker();
    void onMouseMove(QMouseEvent *event);

    DiagramWidget &diagram_;
    Settings &settings_;
    RunPtr run_;
    State marker_;
    QPointer<QCPGraph> sentinel_;  // cleared by renderScene -> redraw
    QPointer<QCPGraph> markerGraph_;
    QPointer<QCPColorScale> scale_;   // the time key, a layout row under the diagram
    QPointer<QCPMarginGroup> group_;  // lines the key up with the axis rect
    bool hovering_ = false;
};

}  // namespace pw::ui
