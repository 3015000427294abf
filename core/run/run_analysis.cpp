#include "core/run/run_analysis.h"

#include <fmt/format.h>
#include <cctype>
#include <cmath>
#include <nlohmann/json.hpp>

#include "core/classify.h"

namespace pw::run {

RunAnalysis analyseStates(const PhaseDiagram &diagram, std::span<const State> states,
                          const RuleSet *rules, const ClassifyOptions &options) {
    RunAnalysis out;
    out.path = analysePath(diagram, states, options);
    if (rules) out.verdicts = checkRules(*rules, diagram, states, out.path);
    return out;
}

std::vector<MarginPoint> marginsOverTime(const PhaseDiagram &diagram, std::span<const State> states,
                                         std::span<const std::size_t> indices,
                                         const ClassifyOptions &options) {
    std::vector<MarginPoint> out;
    const std::size_t n = indices.empty() ? states.size() : indices.size();
    out.reserve(n);
    for (std::size_t k = 0; k < n; ++k) {
        const std::size_t i = indices.empty() ? k : indices[k];
        const State &s = states[i];
        const Classification c = classify(diagram, s.T_K, s.P_Pa, options);
        out.push_back({i, s.time_s, s.T_K, s.P_Pa, c.phase, c.nearestLabel, c.dT_K, c.dP_Pa});
    }
    return out;
}

std::string verdictsJson(const std::vector<RuleVerdict> &verdicts) {
    const auto num = [](double v) { return std::isnan(v) ? nlohmann::json() : nlohmann::json(v); };
    nlohmann::ordered_json arr = nlohmann::ordered_json::array();
    for (const RuleVerdict &v : verdicts) {
        const bool failed = v.verdict == Verdict::Fail;
        nlohmann::ordered_json o;
        o["id"] = v.ruleId;
        o["check"] = std::string(toString(v.check));
        o["verdict"] = std::string(toString(v.verdict));
        o["first_violation_s"] = failed ? num(v.firstViolation_s) : nlohmann::json();
        o["index"] = failed ? nlohmann::json(v.index) : nlohmann::json();
        o["T_K"] = failed ? num(v.T_K) : nlohmann::json();
        o["P_Pa"] = failed ? num(v.P_Pa) : nlohmann::json();
        o["states_checked"] = v.statesChecked;
        o["detail"] = v.detail;
        arr.push_back(o);
    }
    return arr.dump(2);
}

std::string verdictsText(const std::vector<RuleVerdict> &verdicts) {
    std::string out;
    for (const RuleVerdict &v : verdicts) {
        std::string verdict(toString(v.verdict));
        for (char &c : verdict) c = static_cast<char>(std::toupper(static_cast<unsigned char>(c)));
        out += fmt::format("{:7} {}: {}", verdict, v.ruleId, v.detail);
        if (v.verdict == Verdict::Fail)
            out += fmt::format(" (first at t = {:.1f} s, T = {:.3f} K, P = {:.6g} Pa)",
                               v.firstViolation_s, v.T_K, v.P_Pa);
        out += "\n";
    }
    return out;
}

}  // namespace pw::run
