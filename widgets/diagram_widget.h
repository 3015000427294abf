#pragma once
// The interactive phase diagram: a QCustomPlot drawn by renderScene() from a scene assembled
// from the Document (substances, points, view) and the Settings (units, axis scale, 1 atm
// line). Mouse: drag to pan, wheel to zoom, Ctrl+click to add a point. Emits the cursor's
// state for the readout. Guides and paths are scene inputs for later features.
#include <QTimer>
#include <QWidget>

#include "widgets/diagram_renderer.h"
#include "widgets/diagram_scene.h"
#include "widgets/document.h"
#include "widgets/settings.h"

class QCustomPlot;
class QMouseEvent;

namespace pw::ui {

class DiagramWidget : public QWidget {
    Q_OBJECT
public:
    DiagramWidget(Document &doc, Settings &settings, QWidget *parent = nullptr);

    QCustomPlot *plot() const { return plot_; }
    // The scene as currently drawn (what an export would render).
    DiagramScene scene() const;
    SceneStyle style() const;
    void setGuides(std::vector<GuideLine> guides);
    void setPaths(std::vector<ScenePath> paths);

    // The diagram as an image at the widget's size and the screen's pixel ratio.
    QImage toImage() const;
    // State at a widget pixel position (plot coordinates converted to K and Pa).
    std::pair<double, double> stateAt(QPointF pixel) const;
    // Widget pixel position of a state.
    QPointF pixelAt(double T_K, double P_Pa) const;

public slots:
    void resetView();
    void rebuild();  // render the scene now and replot

signals:
    void cursorMoved(double T_K, double P_Pa);
    void cursorLeft();
    void pointRequested(double T_K, double P_Pa);

protected:
    void changeEvent(QEvent *event) override;
    void resizeEvent(QResizeEvent *event) override;
    bool eventFilter(QObject *watched, QEvent *event) override;

private:
    void onMouseMove(QMouseEvent *event);
    void onMousePress(QMouseEvent *event);
    void onRangeChanged();
    void scheduleRebuild();

    Document &doc_;
    Settings &settings_;
    QCustomPlot *plot_;
    std::vector<GuideLine> guides_;
    std::vector<ScenePath> paths_;
    QTimer rebuildTimer_;
    bool applyingView_ = false;
};

}  // namespace pw::ui
