#pragma once
// Path analysis: a sequence of states (a logged run or a planned path) -> the transitions it
// crosses, where and when, plus a summary with the minimum margins.
#include <map>
#include <span>
#include <string>
#include <vector>

#include "core/classify.h"

namespace pw {

struct State {
    double time_s = kNaN;  // NaN when the path is untimed
    double T_K = kNaN;
    double P_Pa = kNaN;
};

enum class Transition {
    Melting,
    Freezing,
    Vaporization,
    Condensation,
    Sublimation,
    Deposition,
    EnterSupercritical,
    LeaveSupercritical,
    SolidSolid
};
std::string_view toString(Transition t);  // "melting", ..., "enter_supercritical"

struct PathEvent {
    std::size_t index = 0;  // index of the state after the crossing
    double time_s = kNaN;   // interpolated along the leg (NaN for untimed paths)
    double T_K = kNaN;      // interpolated crossing point on the boundary
    double P_Pa = kNaN;
    Transition transition = Transition::Melting;
    Phase from = Phase::Unknown;
    Phase to = Phase::Unknown;
    std::string detail;  // e.g. "ice Ih -> liquid"
};

struct MarginRecord {
    double minAbsDT_K = kNaN;  // smallest |dT| seen with that boundary nearest
    double minAbsDP_Pa = kNaN;
    std::size_t index = 0;  // where the smallest |dT| occurred
};

struct PathSummary {
    std::vector<Phase> phasesVisited;  // in order of first visit
    bool crossesLiquidVapor = false;
    std::size_t states = 0;
    std::map<std::string, MarginRecord> minMargins;  // key: boundary label
};

struct PathResult {
    std::vector<PathEvent> events;
    PathSummary summary;
};

PathResult analysePath(const PhaseDiagram &diagram, std::span<const State> states,
                       const ClassifyOptions &options = {});

}  // namespace pw
