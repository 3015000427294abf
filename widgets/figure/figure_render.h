#pragma once
// Lays a scene out as a figure: the diagram drawn by renderScene() (the same code as the
// desktop view) plus the figure's rows — title, legend, source caption, caution line — on a
// QCustomPlot that is never shown. figure_export.h paints it to PNG, SVG or PDF.
#include "widgets/diagram_renderer.h"
#include "widgets/figure/figure_spec.h"

class QCustomPlot;

namespace pw::ui {

// The scene as the figure shows it: the spec's title, point labels with their phase
// ("P1 · liquid") when spec.pointPhases.
DiagramScene figureScene(const DiagramScene &scene, const FigureSpec &spec);

// With heightMm <= 0 (and no pixel size): the height that gives the plot 0.68 x the width
// plus room for the title, legend, caption and caution rows at the spec's font size.
FigureSpec resolveFigureHeight(const DiagramScene &scene, const FigureSpec &spec);

// Light style with fonts and line widths for the spec's physical size.
SceneStyle figureStyle(const FigureSpec &spec);

// Sizes `plot` to the spec's logical canvas and builds everything on it.
void buildFigure(QCustomPlot &plot, const DiagramScene &scene, const FigureSpec &spec);

// `text` broken at spaces into lines no wider than `width` logical pixels in `font`.
QString wrapText(const QString &text, const QFont &font, double width);

}  // namespace pw::ui
