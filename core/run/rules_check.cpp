// Evaluation of rules against a timed path (see rules.h for the signs).
#include <fmt/format.h>
#include <algorithm>
#include <cmath>
#include <functional>

#include "core/errors.h"
#include "core/phase_diagram.h"
#include "core/run/rules.h"

namespace pw::run {
namespace {

// One scalar condition: value(state) within [min, max]; NaN value = undefined = violated.
struct Constraint {
    std::string name;  // "T", "dP to sublimation"...
    const char *unit;  // "K", "Pa"
    std::function<double(const State &)> value;
    double min = kNaN;
    double max = kNaN;
    bool ok(double v) const { return !std::isnan(v) && !(v < min) && !(v > max); }
};

bool inWindow(const Rule &r, double t) { return !(t < r.from_s) && !(t > r.to_s); }

std::vector<Constraint> constraintsFor(const Rule &r, const PhaseDiagram &d) {
    switch (r.check) {
        case RuleCheck::Temperature:
            return {{"T", "K", [](const State &s) { return s.T_K; }, r.min, r.max}};
        case RuleCheck::Pressure:
            return {{"P", "Pa", [](const State &s) { return s.P_Pa; }, r.min, r.max}};
        case RuleCheck::SublimationDP:
            return {{"dP to sublimation", "Pa",
                     [&d](const State &s) {
                         const auto b = d.sublimationPressure(s.T_K);
                         return b ? s.P_Pa - b->value : kNaN;
                     },
                     r.min, r.max}};
        case RuleCheck::SublimationDT:
            return {{"dT to sublimation", "K",
                     [&d](const State &s) {
                         const auto b = d.sublimationTemperature(s.P_Pa);
                         return b ? s.T_K - b->value : kNaN;
                     },
                     r.min, r.max}};
        case RuleCheck::Supercritical: {
            const FixedPoint *c = d.criticalPoint();
            if (!c) throw DomainError("rule '" + r.id + "': the substance has no critical point");
            return {{"T", "K", [](const State &s) { return s.T_K; }, c->T_K, kNaN},
                    {"P", "Pa", [](const State &s) { return s.P_Pa; }, c->P_Pa, kNaN}};
        }
        case RuleCheck::NoTransition:
            break;
    }
    return {};
}

std::string limitText(const Constraint &c, double v) {
    if (std::isnan(v)) return c.name + " is undefined (no such boundary at this state)";
    if (v < c.min)
        return fmt::format("{} = {:.6g} {} below the minimum {:.6g} {}", c.name, v, c.unit, c.min,
                           c.unit);
    return fmt::format("{} = {:.6g} {} above the maximum {:.6g} {}", c.name, v, c.unit, c.max,
                       c.unit);
}

// Fraction along (a, b) where the constraint is first violated, by linear interpolation;
// 1 when it cannot be interpolated.
double crossingFraction(const Constraint &c, double va, double vb) {
    if (std::isnan(va) || std::isnan(vb) || va == vb) return 1.0;
    const double limit = vb < c.min ? c.min : c.max;
    return std::clamp((limit - va) / (vb - va), 0.0, 1.0);
}

void checkStates(const Rule &r, const std::vector<Constraint> &cs, std::span<const State> states,
                 RuleVerdict &out) {
    const State *prev = nullptr;
    std::vector<double> worst(cs.size(), kNaN);
    for (std::size_t i = 0; i < states.size(); ++i) {
        const State &s = states[i];
        if (!inWindow(r, s.time_s)) continue;
        ++out.statesChecked;
        double frac = 2.0;
        const Constraint *hit = nullptr;
        double hitValue = kNaN;
        for (std::size_t k = 0; k < cs.size(); ++k) {
            const double v = cs[k].value(s);
            const bool towardMax = !std::isnan(cs[k].max);
            if (!std::isnan(v) &&
                (std::isnan(worst[k]) || (towardMax ? v > worst[k] : v < worst[k])))
                worst[k] = v;
            if (cs[k].ok(v)) continue;
            const double f = prev ? crossingFraction(cs[k], cs[k].value(*prev), v) : 0.0;
            if (f < frac) {
                frac = f;
                hit = &cs[k];
                hitValue = v;
            }
        }
        if (hit) {
            const State a = prev ? *prev : s;
            out.verdict = Verdict::Fail;
            out.index = i;
            out.firstViolation_s = a.time_s + frac * (s.time_s - a.time_s);
            out.T_K = a.T_K + frac * (s.T_K - a.T_K);
            out.P_Pa = a.P_Pa + frac * (s.P_Pa - a.P_Pa);
            out.detail = limitText(*hit, hitValue);
            return;
        }
        prev = &s;
    }
    if (out.statesChecked == 0) return;
    out.verdict = Verdict::Pass;
    for (std::size_t k = 0; k < cs.size(); ++k) {
        const bool hasMax = !std::isnan(cs[k].max);
        out.detail += fmt::format("{}{} {} = {:.6g} {} (limit {} {:.6g} {})", k ? "; " : "",
                                  hasMax ? "highest" : "lowest", cs[k].name, worst[k], cs[k].unit,
                                  hasMax ? "<=" : ">=", hasMax ? cs[k].max : cs[k].min, cs[k].unit);
    }
}

void checkTransitions(const Rule &r, std::span<const State> states, const PathResult &analysis,
                      RuleVerdict &out) {
    out.statesChecked = static_cast<std::size_t>(std::count_if(
        states.begin(), states.end(), [&r](const State &s) { return inWindow(r, s.time_s); }));
    if (out.statesChecked == 0) return;
    for (const PathEvent &e : analysis.events) {
        if (!inWindow(r, e.time_s)) continue;
        if (std::find(r.transitions.begin(), r.transitions.end(), e.transition) ==
            r.transitions.end())
            continue;
        out.verdict = Verdict::Fail;
        out.firstViolation_s = e.time_s;
        out.index = e.index;
        out.T_K = e.T_K;
        out.P_Pa = e.P_Pa;
        out.detail =
            fmt::format("{} ({} -> {})", toString(e.transition), toString(e.from), toString(e.to));
        return;
    }
    out.verdict = Verdict::Pass;
    out.detail = "no forbidden transition";
}

}  // namespace

std::vector<RuleVerdict> checkRules(const RuleSet &rules, const PhaseDiagram &diagram,
                                    std::span<const State> states, const PathResult &analysis) {
    std::vector<RuleVerdict> out;
    const bool untimed = std::any_of(states.begin(), states.end(),
                                     [](const State &s) { return std::isnan(s.time_s); });
    for (const Rule &r : rules.rules) {
        if (untimed && (!std::isnan(r.from_s) || !std::isnan(r.to_s)))
            throw DomainError("rule '" + r.id + "' has a time window but the path has no times");
        RuleVerdict v;
        v.ruleId = r.id;
        v.check = r.check;
        if (r.check == RuleCheck::NoTransition)
            checkTransitions(r, states, analysis, v);
        else
            checkStates(r, constraintsFor(r, diagram), states, v);
        if (v.verdict == Verdict::NoData) v.detail = "no state inside the rule's window";
        out.push_back(std::move(v));
    }
    return out;
}

}  // namespace pw::run
