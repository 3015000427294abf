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
std::optional<BoundaryValue> Classifier::pressureOn(const Boundary *b, double T) const {
    OptValue v;
    switch (b->kind) {
        case BoundaryKind::Vaporization:
            v = diagram_->vaporizationPressure(T);
            break;
        case BoundaryKind::Sublimation:
            v = diagram_->sublimationPressure(T);
            break;
        case BoundaryKind::Melting:
            if (b->validity.valid() && b->validity.contains(T))
                return BoundaryValue{b, b->model->pressure(T), false};
            if (segments_.size() == 1) v = diagram_->meltingPressure(T);
            break;
        case BoundaryKind::SolidSolid:
            break;
    }
    if (v && v->boundary != b) v.reset();
    return v;
}

void Classifier::fillMargins(ClassificationView &c, double T, double P,
                             std::span<const Candidate> candidates) const {
    const Candidate *best = nullptr;
    for (const Candidate &k : candidates) {
        c.extrapolated = c.extrapolated || k.extrapolated;
        if (std::isfinite(k.T_K) && (!best || std::abs(T - k.T_K) < std::abs(T - best->T_K)))
            best = &k;
    }
    if (!best) return;
    double pOnCurve = kNaN;
    c.dT_K = T - best->T_K;
    c.nearest = best->boundary;
    if (best->boundary == nullptr) {
        c.nearestLabel = "critical point";
        pOnCurve = pc_;
    } else {
        c.nearestLabel = labelOf(best->boundary);
        if (const OptValue v = pressureOn(best->boundary, T)) {
            pOnCurve = v->value;
            c.extrapolated = c.extrapolated || v->extrapolated;
        }
    }
    c.dP_Pa = P - pOnCurve;
    const bool hasDP = std::isfinite(c.dP_Pa);
    c.onBoundary = std::abs(c.dT_K) <= options_.onBoundary_K ||
                   (hasDP && std::abs(c.dP_Pa) <= options_.onBoundaryRel * pOnCurve);
    if (best->boundary && hasDP && std::isfinite(best->boundary->uncertaintyRel))
        c.withinUncertainty = std::abs(c.dP_Pa) <= best->boundary->uncertaintyRel * pOnCurve;
}

Classifier::Candidate Classifier::fromValue(const std::optional<BoundaryValue> &v) {
    if (!v) return {};
    return {v->boundary, v->value, v->extrapolated};
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
    const Candidate critical{nullptr, Tc_, false};
    ClassificationView c;
    if (T >= Tc_ && P < pc_) {
        c.phase = Phase::Gas;
        fillMargins(c, T, P, {&critical, 1});
        return c;
    }
    const double lnP = std::log(P);  // once: every boundary lookup below is in ln p
    if (P <= pt_) {
        const OptValue sub = diagram_->sublimationTemperature(P, lnP);
        if (!sub) return unknown(fmt::format("no sublimation curve at {} Pa", P));
        const Candidate k = fromValue(sub);
        c.phase = T < sub->value ? Phase::Solid : Phase::Vapor;
        if (c.phase == Phase::Solid) c.solidForm = vaporSolidForm_;
        fillMargins(c, T, P, {&k, 1});
        return c;
    }
    // A fluid point at pt < p < pc that is warmer than any melting temperature there is
    // vapor or liquid: the melting curve is looked up only when needed.
    const bool meltLooked = !(P < pc_ && T >= meltCeilingBelowPc_);
    OptValue melt;
    if (meltLooked) melt = diagram_->meltingTemperature(P, lnP);
    if (melt && T < melt->value) {
        const Candidate k = fromValue(melt);
        c.phase = Phase::Solid;
        c.solidForm = solidFormAt(T, P, melt->boundary);
        fillMargins(c, T, P, {&k, 1});
        return c;
    }
    if (P < pc_) return belowPc(T, P, lnP, melt, meltLooked);
    return abovePc(T, P, melt);
}

// pt < p < pc, not solid: vapor (margin to vaporization) or liquid (margins to vaporization
// and melting).
ClassificationView Classifier::belowPc(double T, double P, double lnP, OptValue melt,
                                       bool meltLooked) const {
    const OptValue vap = diagram_->vaporizationTemperature(P, lnP);
    if (!vap) return unknown(fmt::format("no vaporization curve at {} Pa", P));
    ClassificationView c;
    if (T >= vap->value) {
        const Candidate k = fromValue(vap);
        c.phase = Phase::Vapor;
        fillMargins(c, T, P, {&k, 1});
        return c;
    }
    if (!meltLooked) melt = diagram_->meltingTemperature(P, lnP);
    if (!melt)
        return unknown(fmt::format("no melting curve at {} Pa: solid or liquid not known", P));
    const Candidate k[2] = {fromValue(vap), fromValue(melt)};
    c.phase = Phase::Liquid;
    fillMargins(c, T, P, k);
    return c;
}

// p >= pc, not solid: compressed liquid (margins to melting or the critical point) or
// supercritical (margins to the critical point).
ClassificationView Classifier::abovePc(double T, double P, const OptValue &melt) const {
    if (!melt)
        return unknown(fmt::format("no melting curve at {} Pa: a solid cannot be ruled out", P));
    const Candidate critical{nullptr, Tc_, false};
    const Candidate k[2] = {fromValue(melt), critical};
    ClassificationView c;
    c.phase = T < Tc_ ? Phase::Liquid : Phase::Supercritical;
    c.extrapolated = melt->extrapolated;
    fillMargins(c, T, P,
                c.phase == Phase::Liquid ? std::span<const Candidate>(k)
                                         : std::span<const Candidate>(&critical, 1));
    return c;
}

Classification classify(const PhaseDiagram &diagram, double T_K, double P_Pa,
                        const ClassifyOptions &options) {
    return Classifier(diagram, options)(T_K, P_Pa);
}

}  // namespace pw
