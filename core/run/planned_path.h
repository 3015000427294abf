#pragma once
// Planned paths: a start state and a list of steps in a small step language of our own
// (docs/runs.md), expanded into timed states for pw::analysePath.
//
// JSON form:
//   {"format": "phasewright-plan", "version": 1, "name": "...", "substance": "water",
//    "resolution": "60 s",
//    "start": {"T": "20 degC", "P": "1 atm"},
//    "steps": [{"step": "isobaric", "T": "-45 degC", "rate": "0.5 K/min", "label": "freezing"},
//              {"step": "isothermal", "P": "10 Pa", "duration": "30 min", "scale": "log"},
//              {"step": "hold", "duration": "20 h"},
//              {"step": "ramp", "T": "-25 degC", "P": "10 Pa", "duration": "2 h"}]}
// Text form (one step per line, '#' starts a comment; values without blanks or quoted):
//   start T=20degC P=1atm
//   isobaric T=-45degC rate=0.5K/min label="freezing"
#include <string>
#include <string_view>
#include <vector>

#include "core/path.h"

namespace pw::run {

enum class StepKind { Isobaric, Isothermal, Hold, Ramp };
std::string_view toString(StepKind kind);  // "isobaric", "isothermal", "hold", "ramp"

enum class PressureScale { Linear, Log };

struct PlanStep {
    StepKind kind = StepKind::Hold;
    std::string label;                            // optional, shown in tables ("primary drying")
    double T_K = kNaN;                            // target temperature (isobaric, ramp)
    double P_Pa = kNaN;                           // target pressure (isothermal, ramp)
    double duration_s = kNaN;                     // either a duration ...
    double rateT_K_s = kNaN;                      // ... or a rate: isobaric (K/s) ...
    double rateP_Pa_s = kNaN;                     // ... isothermal (Pa/s)
    PressureScale scale = PressureScale::Linear;  // how P moves along isothermal/ramp steps
    int line = 0;  // 1-based step number (JSON) or line (text), for messages
};

struct Plan {
    std::string name;
    std::string substance;       // id or alias (optional; the caller may override)
    double resolution_s = 60.0;  // default sampling interval of the expansion
    State start;                 // time_s = 0
    std::vector<PlanStep> steps;
};

// A step's place in the expanded path.
struct StepSpan {
    std::string label;  // the step's label, or "<kind> <n>" when it has none
    StepKind kind = StepKind::Hold;
    double start_s = 0.0;
    double end_s = 0.0;
    std::size_t firstIndex = 0;  // index of the step's start state in ExpandedPlan::states
    std::size_t lastIndex = 0;   // index of its end state
};

struct ExpandedPlan {
    std::vector<State> states;  // timed, start at t = 0, strictly increasing time
    std::vector<StepSpan> spans;
};

// Parse; `file` is used in messages. Throw InputError naming file, step (as row) and field.
Plan parsePlanJson(std::string_view content, const std::string &file = {});
Plan parsePlanText(std::string_view content, const std::string &file = {});
// Picks JSON when the first non-blank character is '{', else the text form.
Plan parsePlan(std::string_view content, const std::string &file = {});
Plan readPlanFile(const std::string &path);

// Expand at `resolution_s` (<= 0: the plan's own). Each step gets ceil(duration/resolution)
// equal sub-intervals (at least one); step ends are always states. Throws DomainError for a
// step that cannot be reached (a rate of the wrong sign is taken by its magnitude; a zero
// rate with a change to make throws).
ExpandedPlan expandPlan(const Plan &plan, double resolution_s = 0.0);

// The plan back as JSON text (canonical units K, Pa, s), for saving an edited plan.
std::string planToJson(const Plan &plan);

}  // namespace pw::run
