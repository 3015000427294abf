// Path analysis: transitions crossed between consecutive states, located by bisection on the
// straight leg between them (linear in T and in ln p), and a summary (core/path.h).
#include "core/path.h"

#include <fmt/format.h>

#include <algorithm>
#include <cmath>
#include <optional>

#include "core/errors.h"

namespace pw {
namespace {

// Below this many states every leg is also checked at interior points, so that a planned
// path with long legs does not step over a region it enters and leaves again.
constexpr std::size_t kDenseBelow = 1000;
constexpr int kInteriorSamples = 16;
constexpr int kBisections = 60;  // 2^-60 of a leg: far below any boundary's accuracy

bool lowFluid(Phase p) { return p == Phase::Vapor || p == Phase::Gas; }

// Gas and vapor are one region (crossing T = Tc below pc is no phase transition); solids of a
// form nobody knows are not told apart from their neighbours.
bool sameRegion(const Classification &a, const Classification &b) {
    if (a.phase != b.phase) return lowFluid(a.phase) && lowFluid(b.phase);
    if (a.phase != Phase::Solid) return true;
    return a.solidForm == b.solidForm || a.solidForm == "unknown" || b.solidForm == "unknown";
}

std::optional<Transition> transitionBetween(Phase from, Phase to) {
    using P = Phase;
    using T = Transition;
    if (from == P::Unknown || to == P::Unknown) return std::nullopt;
    if (to == P::Supercritical && from != P::Solid) return T::EnterSupercritical;
    if (from == P::Supercritical && to != P::Solid) return T::LeaveSupercritical;
    if (from == P::Solid) {
        if (to == P::Solid) return T::SolidSolid;
        return to == P::Liquid || to == P::Supercritical ? T::Melting : T::Sublimation;
    }
    if (to == P::Solid) return lowFluid(from) ? T::Deposition : T::Freezing;
    if (from == P::Liquid) return T::Vaporization;
    if (to == P::Liquid) return T::Condensation;
    return std::nullopt;
}

std::string regionName(const Classification &c) {
    if (c.phase == Phase::Solid && !c.solidForm.empty()) return c.solidForm;
    return std::string(toString(c.phase));
}

class LegScanner {
public:
    LegScanner(const Classifier &classify, const State &a, const State &b)
        : classify_(classify), a_(a), b_(b) {}

    State at(double s) const {
        State x;
        x.T_K = a_.T_K + s * (b_.T_K - a_.T_K);
        x.P_Pa = std::exp(std::log(a_.P_Pa) + s * (std::log(b_.P_Pa) - std::log(a_.P_Pa)));
        if (std::isfinite(a_.time_s) && std::isfinite(b_.time_s))
            x.time_s = a_.time_s + s * (b_.time_s - a_.time_s);
        return x;
    }
    Classification classifyAt(double s) const {
        const State x = at(s);
        return classify_(x.T_K, x.P_Pa);
    }
    // Crossings of the leg between s0 (region c0) and s1 (region c1), appended in order.
    void scan(double s0, Classification c0, double s1, const Classification &c1, std::size_t index,
              std::vector<PathEvent> &events) const {
        while (!sameRegion(c0, c1)) {
            double lo = s0, hi = s1;
            Classification cHi = c1;
            for (int i = 0; i < kBisections; ++i) {
                const double mid = 0.5 * (lo + hi);
                Classification cm = classifyAt(mid);
                if (sameRegion(cm, c0)) {
                    lo = mid;
                } else {
                    hi = mid;
                    cHi = std::move(cm);
                }
            }
            if (const auto t = transitionBetween(c0.phase, cHi.phase)) {
                const State x = at(0.5 * (lo + hi));
                events.push_back({index, x.time_s, x.T_K, x.P_Pa, *t, c0.phase, cHi.phase,
                                  regionName(c0) + " -> " + regionName(cHi)});
            }
            s0 = hi;
            c0 = std::move(cHi);
        }
    }

private:
    const Classifier &classify_;
    const State &a_;
    const State &b_;
};

void addPhase(std::vector<Phase> &visited, Phase p) {
    if (std::find(visited.begin(), visited.end(), p) == visited.end()) visited.push_back(p);
}

void recordMargin(PathSummary &summary, const Classification &c, std::size_t index) {
    if (c.nearestLabel.empty()) return;
    MarginRecord &r = summary.minMargins[c.nearestLabel];
    const double aT = std::abs(c.dT_K), aP = std::abs(c.dP_Pa);
    if (std::isfinite(aT) && !(aT >= r.minAbsDT_K)) {
        r.minAbsDT_K = aT;
        r.index = index;
    }
    if (std::isfinite(aP) && !(aP >= r.minAbsDP_Pa)) r.minAbsDP_Pa = aP;
}

Classification classifyState(const Classifier &classify, const State &s, std::size_t i) {
    try {
        return classify(s.T_K, s.P_Pa);
    } catch (const DomainError &e) {
        throw DomainError(fmt::format("state {}: {}", i, e.what()));
    }
}

}  // namespace

std::string_view toString(Transition t) {
    switch (t) {
        case Transition::Melting:
            return "melting";
        case Transition::Freezing:
            return "freezing";
        case Transition::Vaporization:
            return "vaporization";
        case Transition::Condensation:
            return "condensation";
        case Transition::Sublimation:
            return "sublimation";
        case Transition::Deposition:
            return "deposition";
        case Transition::EnterSupercritical:
            return "enter_supercritical";
        case Transition::LeaveSupercritical:
            return "leave_supercritical";
        case Transition::SolidSolid:
            return "solid_solid";
    }
    return "unknown";
}

PathResult analysePath(const PhaseDiagram &diagram, std::span<const State> states,
                       const ClassifyOptions &options) {
    const Classifier classify(diagram, options);
    PathResult result;
    result.summary.states = states.size();
    if (states.empty()) return result;
    const int samples = states.size() < kDenseBelow ? kInteriorSamples : 1;
    Classification prev = classifyState(classify, states[0], 0);
    addPhase(result.summary.phasesVisited, prev.phase);
    recordMargin(result.summary, prev, 0);
    for (std::size_t i = 1; i < states.size(); ++i) {
        Classification cur = classifyState(classify, states[i], i);
        const LegScanner leg(classify, states[i - 1], states[i]);
        const std::size_t firstEvent = result.events.size();
        Classification c0 = prev;
        for (int k = 1; k <= samples; ++k) {
            const double s0 = static_cast<double>(k - 1) / samples;
            const double s1 = static_cast<double>(k) / samples;
            Classification c1 = k == samples ? cur : leg.classifyAt(s1);
            leg.scan(s0, c0, s1, c1, i, result.events);
            c0 = std::move(c1);
        }
        for (std::size_t e = firstEvent; e < result.events.size(); ++e)
            addPhase(result.summary.phasesVisited, result.events[e].to);
        addPhase(result.summary.phasesVisited, cur.phase);
        recordMargin(result.summary, cur, i);
        prev = std::move(cur);
    }
    for (const PathEvent &e : result.events) {
        if (e.transition == Transition::Vaporization || e.transition == Transition::Condensation)
            result.summary.crossesLiquidVapor = true;
    }
    return result;
}

}  // namespace pw
