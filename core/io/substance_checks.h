#pragma once
// Physics checks run on a structurally valid substance (docs/substance-format.md,
// "Validation"): curves finite, positive and monotonic over their validity ranges, fixed
// points on the curves that reach them, and PhaseDiagram::consistency().
#include <memory>

#include "core/io/reader.h"
#include "core/phase_diagram.h"
#include "core/substance.h"

namespace pw::io {

// Thresholds for a fixed point off a curve (relative; see the format doc).
inline constexpr double kFixedPointWarnRel = 1e-3;   // 0.1 %
inline constexpr double kFixedPointErrorRel = 2e-2;  // 2 %
inline constexpr int kCurveSamples = 257;

void checkCurves(const Substance &s, Reader &reader);
void checkFixedPoints(const Substance &s, Reader &reader);
void checkConsistency(const Substance &s, Reader &reader);
// The same check on a diagram built from `s` (taken over), which is returned for reuse (null
// when the data cannot form a diagram; the error is recorded).
std::shared_ptr<PhaseDiagram> buildAndCheckConsistency(Substance s, Reader &reader);

}  // namespace pw::io
