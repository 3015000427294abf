#pragma once
// Rules a run or a planned path is checked against (docs/runs.md), each with a pass/fail
// verdict and the first violating time.
//
// Rule file (JSON):
//   {"format": "phasewright-rules", "version": 1, "name": "...", "substance": "water",
//    "rules": [
//      {"id": "no-melting", "check": "no_transition", "transitions": ["melting"], "from": "4 h"},
//      {"id": "driving-force", "check": "sublimation_dP", "max": "-5 Pa", "from": "5 h", "to": "24
//      h"},
//      {"id": "frost-margin", "check": "sublimation_dT", "min": "2 K"},
//      {"id": "collapse", "check": "temperature", "max": "-24 degC"},
//      {"id": "above-critical", "check": "supercritical", "from": "2 h", "to": "3 h"}]}
// Signs: dT_K = T - T_boundary(P) and dP_Pa = P - P_boundary(T), as in core/classify.h.
// For the sublimation curve, dP_Pa < 0 means the point is in the vapor region (ice sublimes,
// the driving force is -dP_Pa); dT_K > 0 means the product is warmer than the frost point of
// the pressure (again the vapor side).
#include <string>
#include <string_view>
#include <vector>

#include "core/path.h"

namespace pw::run {

enum class RuleCheck {
    NoTransition,   // none of `transitions` happens in the window
    SublimationDP,  // dP_Pa to the sublimation curve within [min, max] (Pa)
    SublimationDT,  // dT_K to the sublimation curve within [min, max] (K)
    Temperature,    // T within [min, max] (K)
    Pressure,       // P within [min, max] (Pa)
    Supercritical   // T >= Tc and P >= Pc
};
std::string_view toString(RuleCheck check);  // "no_transition", "sublimation_dP", ...

struct Rule {
    std::string id;
    std::string description;  // optional free text
    RuleCheck check = RuleCheck::Temperature;
    std::vector<Transition> transitions;  // NoTransition only
    double min = kNaN;                    // SI: K, Pa; NaN = no bound
    double max = kNaN;
    double from_s = kNaN;  // window on the path's time axis; NaN = open
    double to_s = kNaN;
};

struct RuleSet {
    std::string name;
    std::string substance;
    std::vector<Rule> rules;
};

RuleSet parseRulesJson(std::string_view content, const std::string &file = {});
RuleSet readRulesFile(const std::string &path);

enum class Verdict { Pass, Fail, NoData };
std::string_view toString(Verdict v);  // "pass", "fail", "no_data"

struct RuleVerdict {
    std::string ruleId;
    RuleCheck check = RuleCheck::Temperature;
    Verdict verdict = Verdict::NoData;
    double firstViolation_s = kNaN;  // interpolated where the limit was crossed
    std::size_t index = 0;           // first violating state (events: the state after it)
    double T_K = kNaN;               // at the first violation
    double P_Pa = kNaN;
    std::size_t statesChecked = 0;
    std::string detail;  // one sentence with the numbers, for tables and figures
};

// Checks every rule. `analysis` must be analysePath(diagram, states) (transition rules use
// its events). Windows need timed states (throws DomainError on an untimed path).
std::vector<RuleVerdict> checkRules(const RuleSet &rules, const PhaseDiagram &diagram,
                                    std::span<const State> states, const PathResult &analysis);

// True when every verdict passed.
bool allPassed(const std::vector<RuleVerdict> &verdicts);

}  // namespace pw::run
