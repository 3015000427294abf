#pragma once
// One boundary curve restricted to the part of the diagram where it applies (between triple
// points, or its validity range), with the fast inverse table over it. Internal to
// PhaseDiagram; kept in its own header so PhaseDiagram can hold segments by value.
#include <cstddef>

#include "core/boundary_model.h"
#include "core/solver.h"

namespace pw {

struct BoundarySegment {
    std::size_t index = 0;  // into Substance::boundaries
    TRange T;               // temperatures the segment covers
    double pLo = 0.0;       // lowest and highest pressure on the segment (Pa)
    double pHi = 0.0;
    InverseTable table;  // T(ln p) over the segment
};

}  // namespace pw
