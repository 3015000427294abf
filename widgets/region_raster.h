#pragma once
// The phase regions of a diagram as an image: every cell of a grid laid over the view is
// classified with core's classify(), so the fill always agrees with the readout and the
// table, for any number of solid forms. Labels go where each region is widest (the cell
// farthest from the region's edge, with vertical distance weighted because text is wide).
#include <QColor>
#include <QImage>
#include <QString>
#include <utility>
#include <vector>

#include "core/phase_diagram.h"
#include "widgets/document.h"

namespace pw::ui {

struct RegionLabel {
    QString name;  // "liquid", "ice III", "supercritical\nfluid" (may hold a line break)
    double T_K = 0.0;
    double P_Pa = 0.0;
};

struct RegionRaster {
    QImage image;  // ARGB32; row 0 is the top of the view (highest pressure)
    std::vector<RegionLabel> labels;
};

// The light fill colour of a region (own palette); alpha tuned for a light or dark background.
QColor regionColour(const QString &name, bool dark);

// What region labels keep clear of: marked states (their marker and the label to their right)
// and isobars drawn across the view (the 1 atm line).
struct LabelObstacles {
    std::vector<std::pair<double, double>> marks;  // (T_K, P_Pa)
    std::vector<double> isobars_Pa;
};

// `columns` x `rows` cells; `cellPx` is the size of one cell on screen, used to decide whether
// a label fits inside its region and how many cells an obstacle covers.
RegionRaster rasterRegions(const PhaseDiagram &diagram, const ViewState &view, int columns,
                           int rows, double cellPx, bool dark,
                           const LabelObstacles &obstacles = {});

}  // namespace pw::ui
