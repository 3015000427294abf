#pragma once
// Everything a diagram shows, as plain data: the drawing is a function of this scene alone
// (widgets/diagram_renderer.h), so the screen, figure export and the command line render the
// same picture. Substance [0] is the primary one: its regions are filled and labelled; further
// substances (comparisons) are drawn as curves and fixed points in their own colours.
#include <QString>
#include <vector>

#include "core/path.h"
#include "widgets/document.h"
#include "widgets/settings.h"

namespace pw::ui {

struct GuideLine {
    enum class Kind { Isobar, Isotherm };
    Kind kind = Kind::Isobar;
    double value = 0.0;  // Pa for isobars, K for isotherms
    QString label;
};

struct ScenePath {
    std::vector<State> states;
    QString label;
};

struct DiagramScene {
    std::vector<DiagramPtr> substances;
    DisplayUnits units;
    ViewState view;
    bool showAtmosphere = true;  // the 1 atm isobar with the normal points
    bool fillRegions = true;
    bool labelRegions = true;
    bool labelFixedPoints = true;
    std::vector<StatePoint> points;
    std::vector<GuideLine> guides;
    std::vector<ScenePath> paths;
    QString title;  // empty: no title row
};

// From well below the (main) triple point to above the critical point; on a log axis from
// below the sublimation pressure at the lowest temperature to above the highest triple point.
ViewState defaultView(const PhaseDiagram &diagram, bool logPressure);
// The union of the substances' default views.
ViewState defaultView(const std::vector<DiagramPtr> &substances, bool logPressure);

}  // namespace pw::ui
