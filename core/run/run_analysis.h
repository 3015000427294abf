#pragma once
// One call from a run log or a plan to everything the CLI and the desktop show: the crossing
// events and summary (pw::analysePath), the rule verdicts, and the margins over time for the
// time chart.
#include <span>
#include <string>
#include <vector>

#include "core/path.h"
#include "core/run/planned_path.h"
#include "core/run/rules.h"

namespace pw::run {

struct RunAnalysis {
    PathResult path;
    std::vector<RuleVerdict> verdicts;  // empty without rules
};

// analysePath on every state, then the rules (when given).
RunAnalysis analyseStates(const PhaseDiagram &diagram, std::span<const State> states,
                          const RuleSet *rules = nullptr, const ClassifyOptions &options = {});

// One point of the time chart: the state, its phase and the margins to the boundary of its
// region (classify() conventions: dT_K = T - T_boundary(P), dP_Pa = P - P_boundary(T)).
struct MarginPoint {
    std::size_t index = 0;
    double time_s = kNaN;
    double T_K = kNaN;
    double P_Pa = kNaN;
    Phase phase = Phase::Unknown;
    std::string nearest;  // boundary label, "critical point", or empty
    double dT_K = kNaN;
    double dP_Pa = kNaN;
};

// Margins at the given state indices (e.g. from downsampleIndices()); every index when
// `indices` is empty.
std::vector<MarginPoint> marginsOverTime(const PhaseDiagram &diagram, std::span<const State> states,
                                         std::span<const std::size_t> indices = {},
                                         const ClassifyOptions &options = {});

// Verdicts as a JSON array (for `path --json` and reports): id, check, verdict,
// first_violation_s (null when passed), index, T_K, P_Pa, states_checked, detail.
std::string verdictsJson(const std::vector<RuleVerdict> &verdicts);
// Human-readable lines: "PASS no-meniscus: no forbidden transition".
std::string verdictsText(const std::vector<RuleVerdict> &verdicts);

}  // namespace pw::run
