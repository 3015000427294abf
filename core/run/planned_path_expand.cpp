// Expansion of a Plan into timed states, and the plan written back as JSON.
#include <cmath>
#include <nlohmann/json.hpp>

#include "core/errors.h"
#include "core/run/planned_path.h"

namespace pw::run {
namespace {

struct Leg {
    double T1 = kNaN, P1 = kNaN, duration_s = 0.0;
};

std::string stepName(const PlanStep &s, std::size_t n) {
    if (!s.label.empty()) return s.label;
    return std::string(toString(s.kind)) + " " + std::to_string(n + 1);
}

Leg legOf(const PlanStep &s, const State &from, std::size_t n) {
    Leg leg;
    leg.T1 = (s.kind == StepKind::Isobaric || s.kind == StepKind::Ramp) ? s.T_K : from.T_K;
    leg.P1 = (s.kind == StepKind::Isothermal || s.kind == StepKind::Ramp) ? s.P_Pa : from.P_Pa;
    if (!std::isnan(s.duration_s)) {
        leg.duration_s = s.duration_s;
        return leg;
    }
    const double change = s.kind == StepKind::Isobaric ? leg.T1 - from.T_K : leg.P1 - from.P_Pa;
    const double rate = std::abs(s.kind == StepKind::Isobaric ? s.rateT_K_s : s.rateP_Pa_s);
    if (change == 0.0) return leg;
    if (!(rate > 0.0))
        throw DomainError("step '" + stepName(s, n) + "' has a zero rate but a change to make");
    leg.duration_s = std::abs(change) / rate;
    return leg;
}

}  // namespace

ExpandedPlan expandPlan(const Plan &plan, double resolution_s) {
    const double res = resolution_s > 0.0 ? resolution_s : plan.resolution_s;
    if (!(res > 0.0) || !std::isfinite(res))
        throw DomainError("the expansion resolution must be a positive number of seconds");
    ExpandedPlan out;
    State cur = plan.start;
    cur.time_s = 0.0;
    out.states.push_back(cur);
    for (std::size_t n = 0; n < plan.steps.size(); ++n) {
        const PlanStep &s = plan.steps[n];
        const Leg leg = legOf(s, cur, n);
        StepSpan span{stepName(s, n),       s.kind, cur.time_s, cur.time_s, out.states.size() - 1,
                      out.states.size() - 1};
        if (leg.duration_s > 0.0) {
            const auto parts =
                static_cast<std::size_t>(std::max(1.0, std::ceil(leg.duration_s / res - 1e-9)));
            const bool logP = s.scale == PressureScale::Log && leg.P1 != cur.P_Pa;
            const State from = cur;
            for (std::size_t i = 1; i <= parts; ++i) {
                const double f = static_cast<double>(i) / static_cast<double>(parts);
                State st;
                st.time_s = from.time_s + f * leg.duration_s;
                st.T_K = from.T_K + f * (leg.T1 - from.T_K);
                st.P_Pa = logP ? from.P_Pa * std::pow(leg.P1 / from.P_Pa, f)
                               : from.P_Pa + f * (leg.P1 - from.P_Pa);
                if (i == parts) st = State{from.time_s + leg.duration_s, leg.T1, leg.P1};
                out.states.push_back(st);
            }
            cur = out.states.back();
        }
        span.end_s = cur.time_s;
        span.lastIndex = out.states.size() - 1;
        out.spans.push_back(span);
    }
    return out;
}

std::string planToJson(const Plan &plan) {
    using nlohmann::ordered_json;
    const auto num = [](double v, const char *unit) {
        return nlohmann::json(v).dump() + " " + unit;
    };
    ordered_json doc;
    doc["format"] = "phasewright-plan";
    doc["version"] = 1;
    doc["name"] = plan.name;
    doc["substance"] = plan.substance;
    doc["resolution"] = num(plan.resolution_s, "s");
    doc["start"] = {{"T", num(plan.start.T_K, "K")}, {"P", num(plan.start.P_Pa, "Pa")}};
    ordered_json steps = ordered_json::array();
    for (const PlanStep &s : plan.steps) {
        ordered_json o;
        o["step"] = std::string(toString(s.kind));
        if (!s.label.empty()) o["label"] = s.label;
        if (!std::isnan(s.T_K)) o["T"] = num(s.T_K, "K");
        if (!std::isnan(s.P_Pa)) o["P"] = num(s.P_Pa, "Pa");
        if (!std::isnan(s.duration_s)) o["duration"] = num(s.duration_s, "s");
        if (!std::isnan(s.rateT_K_s)) o["rate"] = num(s.rateT_K_s, "K/s");
        if (!std::isnan(s.rateP_Pa_s)) o["rate"] = num(s.rateP_Pa_s, "Pa/s");
        if (s.scale == PressureScale::Log) o["scale"] = "log";
        steps.push_back(o);
    }
    doc["steps"] = steps;
    return doc.dump(2) + "\n";
}

}  // namespace pw::run
