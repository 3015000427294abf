#pragma once
// Polylines of a diagram's boundaries for drawing, sampled from the model densely enough to
// look smooth on a log pressure axis: uniformly in 1/T (for p(T)) and uniformly in ln p (or p
// on a linear axis) for T(p), merged per boundary. Each boundary comes back as runs of
// constant `extrapolated` flag so the extrapolated parts can be drawn distinctly; consecutive
// runs share their end point so the curve has no gap.
#include <vector>

#include "core/phase_diagram.h"
#include "widgets/document.h"

namespace pw::ui {

struct CurveRun {
    const Boundary *boundary = nullptr;
    bool extrapolated = false;
    std::vector<double> T_K;
    std::vector<double> P_Pa;
};

// `samples` per sweep (two sweeps). The sweeps cover the view with a small margin.
std::vector<CurveRun> sampleBoundaries(const PhaseDiagram &diagram, const ViewState &view,
                                       int samples = 700);

}  // namespace pw::ui
