// Classification of a state point and its margins (conventions: core/classify.h and
// docs/classification.md).
#include "core/classify.h"

#include <fmt/format.h>

#include <algorithm>
#include <cmath>
#include <limits>
#include <optional>

#include "core/errors.h"

namespace pw {
namespace {

using OptValue = std::optional<BoundaryValue>;

void checkState(double T, double P) {
    if (!std::isfinite(T) || T <= 0.0)
        throw DomainError(
            fmt::format("temperature must be a finite number above 0 K (got {} K)", T));
    if (!std::isfinite(P) || P <= 0.0)
        throw DomainError(
            fmt::format("pressure must be a finite number above 0 Pa (got {} Pa)", P));
}

std::string_view formOf(const Boundary *b) {
    return (b == nullptr || b->solidForm.empty()) ? std::string_view("solid")
                                                  : std::string_view(b->solidForm);
}

ClassificationView unknown(std::string reason) {
    ClassificationView c;
    c.phase = Phase::Unknown;
    c.reason = std::move(reason);
    return c;
}

// Every combination of the three flags, indexed by on_boundary + 2 within + 4 extrapolated.
constexpr std::string_view kFlags[8] = {"",
                                        "on_boundary",
                                        "within_uncertainty",
                                        "on_boundary within_uncertainty",
                                        "extrapolated",
                                        "on_boundary extrapolated",
                                        "within_uncertainty extrapolated",
                                        "on_boundary within_uncertainty extrapolated"};

std::string_view flagsOf(bool onBoundary, bool within, bool extrapolated) {
    return kFlags[(onBoundary ? 1 : 0) + (within ? 2 : 0) + (extrapolated ? 4 : 0)];
}

}  // namespace

std::string_view toString(Phase phase) {
    switch (phase) {
        case Phase::Solid:
            return "solid";
        case Phase::Liquid:
            return "liquid";
        case Phase::Vapor:
            return "vapor";
        case Phase::Gas:
            return "gas";
        case Phase::Supercritical:
            return "supercritical";
        case Phase::Unknown:
            break;
    }
    return "unknown";
}

std::string flagsText(const Classification &c) {
    return std::string(flagsOf(c.onBoundary, c.withinUncertainty, c.extrapolated));
}

std::string_view flagsText(const ClassificationView &c) {
    return flagsOf(c.onBoundary, c.withinUncertainty, c.extrapolated);
}

Classifier::Classifier(const PhaseDiagram &diagram, ClassifyOptions options)
    : diagram_(&diagram), options_(options) {
    if (const FixedPoint *tp = diagram.triplePoint()) {
        Tt_ = tp->T_K;
        pt_ = tp->P_Pa;
    }
    Tc_ = pc_ = std::numeric_limits<double>::infinity();  // no critical point: never gas
    if (const FixedPoint *cp = diagram.criticalPoint()) {
        Tc_ = cp->T_K;
        pc_ = cp->P_Pa;
    }
    for (const Boundary *b : diagram.melting()) {
        TRange r = b->validity.valid() ? b->validity : b->model->domain();
        const double p1 = b->model->pressure(r.min_K);
        const double p2 = b->model->pressure(r.max_K);
        segments_.push_back({b, std::min(p1, p2), std::max(p1, p2), r.min_K, r.max_K});
    }
    findMeltCeiling();
    const auto &tps = diagram.substance().triplePoints;
    for (std::size_t i = 1; i < tps.size(); ++i)
        if (!std::isfinite(lowestSolidSolidLiquid_Pa) || tps[i].P_Pa < lowestSolidSolidLiquid_Pa)
            lowestSolidSolidLiquid_Pa = tps[i].P_Pa;
    if (!std::isfinite(lowestSolidSolidLiquid_Pa) && segments_.size() > 1)
        lowestSolidSolidLiquid_Pa = segments_.front().pHigh;
    if (const Boundary *s = diagram.sublimation(); s && !s->solidForm.empty())
        vaporSolidForm_ = s->solidForm;
    else if (!diagram.melting().empty())
        vaporSolidForm_ = formOf(diagram.melting().front());
    else
        vaporSolidForm_ = "solid";
    for (const Boundary &b : diagram.substance().boundaries) labels_.push_back(b.label());
}

// The diagram's own bound on its melting temperatures between pt and pc (its segments'
// temperatures; no bound when a gap there is bridged by extrapolation).
void Classifier::findMeltCeiling() {
    if (!std::isfinite(pt_) || !std::isfinite(pc_)) return;
    meltCeilingBelowPc_ = diagram_->meltingTemperatureCeiling(pt_, pc_);
}

std::string_view Classifier::labelOf(const Boundary *b) const {
    return labels_[static_cast<std::size_t>(b - diagram_->substance().boundaries.data())];
}

std::string_view Classifier::solidFormAt(double T, double P, const Boundary *melt) const {
    if (segments_.size() <= 1) return melt ? formOf(melt) : vaporSolidForm_;
    for (const Segment &s : segments_)
        if (P >= s.pLow && P <= s.pHigh && T >= s.tLow) return formOf(s.boundary);
    if (P < lowestSolidSolidLiquid_Pa) return vaporSolidForm_;
    return "unknown";
}

// The pressure of `b` at T where its segment exists at T (melting: inside its validity
// range, or anywhere in its domain when it is the only melting curve).
Classifier::OnCurve Classifier::pressureOn(const Boundary *b, double T) const {
    OptValue v;
    switch (b->kind) {
        case BoundaryKind::Vaporization:
            v = diagram_->vaporizationPressure(T);
            break;
        case BoundaryKind::Sublimation:
            v = diagram_->sublimationPressure(T);
            break;
        case BoundaryKind::Melting:
            if (b->validity.valid() && b->validity.contains(T)) return {b->model->pressure(T)};
            if (segments_.size() == 1) v = diagram_->meltingPressure(T);
            break;
        case BoundaryKind::SolidSolid:
            break;
    }
    if (!v || v->boundary != b) return {};
    return {v->value, v->extrapolated};
}

void Classifier::fillMargins(ClassificationView &c, double T, double P, const Candidate &a,
                             const Candidate &b) const {
    c.extrapolated = c.extrapolated || a.extrapolated || b.extrapolated;
    // NaN temperatures never win; on a tie the first does.
    const bool second = std::isfinite(b.T_K) && !(std::abs(T - a.T_K) <= std::abs(T - b.T_K));
    fillMargins(c, T, P, second ? b : a);
}

void Classifier::fillMargins(ClassificationView &c, double T, double P,
                             const Candidate &best) const {
    c.extrapolated = c.extrapolated || best.extrapolated;
    if (!std::isfinite(best.T_K)) return;
    if (best.boundary == nullptr) {
        criticalMargins(c, T, P);
        return;
    }
    c.dT_K = T - best.T_K;
    c.nearest = best.boundary;
    c.nearestLabel = labelOf(best.boundary);
    const OnCurve on = pressureOn(best.boundary, T);
    c.extrapolated = c.extrapolated || on.extrapolated;
    c.dP_Pa = P - on.P_Pa;
    const bool hasDP = std::isfinite(c.dP_Pa);
    c.onBoundary = std::abs(c.dT_K) <= options_.onBoundary_K ||
                   (hasDP && std::abs(c.dP_Pa) <= options_.onBoundaryRel * on.P_Pa);
    if (hasDP && std::isfinite(best.boundary->uncertaintyRel))
        c.withinUncertainty = std::abs(c.dP_Pa) <= best.boundary->uncertaintyRel * on.P_Pa;
}

// The critical point as the reference: dT = T - Tc, dP = p - pc.
void Classifier::criticalMargins(ClassificationView &c, double T, double P) const {
    c.dT_K = T - Tc_;
    c.nearest = nullptr;
    c.nearestLabel = "critical point";
    c.dP_Pa = P - pc_;
    c.onBoundary = std::abs(c.dT_K) <= options_.onBoundary_K ||
                   std::abs(c.dP_Pa) <= options_.onBoundaryRel * pc_;
}

Classification Classifier::operator()(double T, double P) const {
    ClassificationView v = view(T, P);
    Classification c;
    c.phase = v.phase;
    c.solidForm = std::string(v.solidForm);
    c.nearest = v.nearest;
    c.nearestLabel = std::string(v.nearestLabel);
    c.dT_K = v.dT_K;
    c.dP_Pa = v.dP_Pa;
    c.onBoundary = v.onBoundary;
    c.withinUncertainty = v.withinUncertainty;
    c.extrapolated = v.extrapolated;
    c.reason = std::move(v.reason);
    return c;
}

ClassificationView Classifier::view(double T, double P) const {
    checkState(T, P);
    if (!std::isfinite(pt_)) return unknown("no triple-point data for this substance");
    ClassificationView c;
    if (T >= Tc_ && P < pc_) {
        c.phase = Phase::Gas;
        criticalMargins(c, T, P);
        return c;
    }
    const double lnP = std::log(P);  // once: every boundary lookup below is in ln p
    if (P <= pt_) {
        const Candidate sub = fromValue(diagram_->sublimationTemperature(P, lnP));
        if (!sub.boundary) return unknown(fmt::format("no sublimation curve at {} Pa", P));
        c.phase = T < sub.T_K ? Phase::Solid : Phase::Vapor;
        if (c.phase == Phase::Solid) c.solidForm = vaporSolidForm_;
        fillMargins(c, T, P, sub);
        return c;
    }
    // A fluid point at pt < p < pc that is warmer than any melting temperature there is
    // vapor or liquid: the melting curve is looked up only when needed.
    const bool meltLooked = !(P < pc_ && T >= meltCeilingBelowPc_);
    Candidate melt;
    if (meltLooked) melt = fromValue(diagram_->meltingTemperature(P, lnP));
    if (melt.boundary && T < melt.T_K) {
        c.phase = Phase::Solid;
        c.solidForm = solidFormAt(T, P, melt.boundary);
        fillMargins(c, T, P, melt);
        return c;
    }
    if (P < pc_)
        belowPc(c, T, P, lnP, melt, meltLooked);
    else
        abovePc(c, T, P, melt);
    return c;
}

// pt < p < pc, not solid: vapor (margin to vaporization) or liquid (margins to vaporization
// and melting).
void Classifier::belowPc(ClassificationView &c, double T, double P, double lnP, Candidate melt,
                         bool meltLooked) const {
    const Candidate vap = fromValue(diagram_->vaporizationTemperature(P, lnP));
    if (!vap.boundary) {
        c = unknown(fmt::format("no vaporization curve at {} Pa", P));
        return;
    }
    if (T >= vap.T_K) {
        c.phase = Phase::Vapor;
        fillMargins(c, T, P, vap);
        return;
    }
    if (!meltLooked) melt = fromValue(diagram_->meltingTemperature(P, lnP));
    if (!melt.boundary) {
        c = unknown(fmt::format("no melting curve at {} Pa: solid or liquid not known", P));
        return;
    }
    c.phase = Phase::Liquid;
    fillMargins(c, T, P, vap, melt);
}

// p >= pc, not solid: compressed liquid (margins to melting or the critical point) or
// supercritical (margins to the critical point).
void Classifier::abovePc(ClassificationView &c, double T, double P, const Candidate &melt) const {
    if (!melt.boundary) {
        c = unknown(fmt::format("no melting curve at {} Pa: a solid cannot be ruled out", P));
        return;
    }
    c.phase = T < Tc_ ? Phase::Liquid : Phase::Supercritical;
    c.extrapolated = melt.extrapolated;
    if (c.phase == Phase::Liquid)
        fillMargins(c, T, P, melt, Candidate{nullptr, Tc_, false});
    else
        criticalMargins(c, T, P);
}

Classification classify(const PhaseDiagram &diagram, double T_K, double P_Pa,
                        const ClassifyOptions &options) {
    return Classifier(diagram, options)(T_K, P_Pa);
}

}  // namespace pw
