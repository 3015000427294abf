#pragma once
// Draws a DiagramScene into a QCustomPlot: clears what is there and builds regions, labels,
// boundaries, fixed points, the 1 atm line, guides, paths and points. A plain function of
// (scene, style, plot size): the interactive widget, figure export and the command line call
// it the same way (headless: a QCustomPlot that is never shown, then savePng/toPainter).
#include <QColor>
#include <QFont>
#include <QPalette>

#include "widgets/diagram_scene.h"

class QCustomPlot;

namespace pw::ui {

struct SceneStyle {
    QColor background{Qt::white};
    QColor text{0x22, 0x27, 0x30};
    QColor grid{0xd8, 0xdc, 0xe2};
    QColor pointColour{0xc0, 0x2f, 0x4b};
    bool dark = false;
    QFont font;
    double scale = 1.0;       // line widths and marker sizes (figures at high DPI)
    double regionCellPx = 2;  // size of one region-raster cell on screen

    // Colours that read well on the palette's base colour (light or dark).
    static SceneStyle fromPalette(const QPalette &palette, const QFont &font);
};

// Boundary colour of the scene's substance number `index`.
QColor substanceColour(int index, bool dark);

// Plot coordinates of a state in the scene's units.
double plotX(double T_K, const DisplayUnits &units);
double plotY(double P_Pa, const DisplayUnits &units);
double kelvinFromPlot(double x, const DisplayUnits &units);
double pascalFromPlot(double y, const DisplayUnits &units);

void renderScene(QCustomPlot &plot, const DiagramScene &scene, const SceneStyle &style);

// Apply only the axis ranges and scale of `view` (cheap; used while panning).
void applyView(QCustomPlot &plot, const ViewState &view, const DisplayUnits &units);

// Reduce a long path for drawing: keep a state only when it moves at least 1/1200 of the
// view in either direction from the last kept one (never used for computation).
std::vector<State> decimateForDisplay(const std::vector<State> &states, const ViewState &view);

}  // namespace pw::ui
