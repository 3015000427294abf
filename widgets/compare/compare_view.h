#pragma once
// Two substances in one view, three ways (docs/compare.md):
//   Overlay     both diagrams on one set of axes (A filled and solid, B dash-dotted), a legend;
//   SideBySide  two panels with linked axes (pan or zoom one, the other follows);
//   Reduced     both in corresponding-states coordinates T/Tc and p/pc, meeting at (1, 1).
// Overlay and the panels are drawn by renderScene(); the reduced plot by renderReduced().
#include <QWidget>
#include <array>

#include "widgets/diagram_renderer.h"
#include "widgets/document.h"
#include "widgets/settings.h"

class QCustomPlot;
class QStackedLayout;

namespace pw::ui {

enum class CompareMode { Overlay, SideBySide, Reduced };

// The reduced-coordinate plot of `a` and `b`: their boundaries divided by (Tc, pc), triple
// points and the common critical point (1, 1), a legend. Log p/pc axis when `logPressure`.
void renderReduced(QCustomPlot &plot, const std::vector<DiagramPtr> &substances, bool logPressure,
                   const SceneStyle &style);

class CompareView : public QWidget {
    Q_OBJECT
public:
    explicit CompareView(QWidget *parent = nullptr);

    void setSubstances(DiagramPtr a, DiagramPtr b);
    void setUnits(DisplayUnits units, bool logPressure);
    void setMode(CompareMode mode);
    CompareMode mode() const { return mode_; }

    QCustomPlot *overlayPlot() const { return overlay_; }
    QCustomPlot *panel(int i) const { return panels_.at(static_cast<std::size_t>(i)); }
    QCustomPlot *reducedPlot() const { return reduced_; }
    // The scene of the overlay (both substances) or of one panel (0, 1).
    DiagramScene overlayScene() const;
    DiagramScene panelScene(int i) const;

public slots:
    void rebuild();

private:
    void linkAxes();
    void follow(QCustomPlot *from, QCustomPlot *to);
    SceneStyle style() const;

    DiagramPtr a_, b_;
    DisplayUnits units_;
    bool logPressure_ = true;
    CompareMode mode_ = CompareMode::Overlay;
    QStackedLayout *stack_;
    QCustomPlot *overlay_;
    std::array<QCustomPlot *, 2> panels_{};
    QCustomPlot *reduced_;
    bool following_ = false;
};

}  // namespace pw::ui
