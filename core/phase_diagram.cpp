#include "core/phase_diagram.h"

#include <fmt/format.h>
#include <algorithm>
#include <cmath>
#include <limits>

#include "core/errors.h"
#include "core/units.h"

namespace pw {

namespace {

bool finitePoint(const FixedPoint &p) { return std::isfinite(p.T_K) && std::isfinite(p.P_Pa); }

// The published range if given, else the equation's domain; always inside the domain.
TRange usableRange(const Boundary &b) {
    const TRange d = b.model->domain();
    TRange r = b.validity.valid() ? b.validity : d;
    r.min_K = std::max(r.min_K, d.min_K);
    r.max_K = std::min(r.max_K, d.max_K);
    return r;
}

}  // namespace

PhaseDiagram::PhaseDiagram(Substance substance) : substance_(std::move(substance)) {
    if (substance_.boundaries.empty()) {
        throw Error("substance '" + substance_.id + "' has no boundary curves: no phase diagram");
    }
    for (std::size_t i = 0; i < substance_.boundaries.size(); ++i) {
        const Boundary &b = substance_.boundaries[i];
        if (!b.model) {
            throw Error(fmt::format("substance '{}': boundary {} ({}) has no model", substance_.id,
                                    i + 1, b.label()));
        }
    }
    buildSegments();
    relink();
}

PhaseDiagram::PhaseDiagram(const PhaseDiagram &other)
    : substance_(other.substance_),
      segments_(other.segments_),
      vaporizationSeg_(other.vaporizationSeg_),
      sublimationSeg_(other.sublimationSeg_),
      meltingSegs_(other.meltingSegs_) {
    relink();
}

PhaseDiagram::PhaseDiagram(PhaseDiagram &&other) noexcept
    : substance_(std::move(other.substance_)),
      segments_(std::move(other.segments_)),
      vaporizationSeg_(other.vaporizationSeg_),
      sublimationSeg_(other.sublimationSeg_),
      meltingSegs_(std::move(other.meltingSegs_)) {
    relink();
}

PhaseDiagram &PhaseDiagram::operator=(const PhaseDiagram &other) {
    if (this != &other) *this = PhaseDiagram(other);
    return *this;
}

PhaseDiagram &PhaseDiagram::operator=(PhaseDiagram &&other) noexcept {
    substance_ = std::move(other.substance_);
    segments_ = std::move(other.segments_);
    vaporizationSeg_ = other.vaporizationSeg_;
    sublimationSeg_ = other.sublimationSeg_;
    meltingSegs_ = std::move(other.meltingSegs_);
    relink();
    return *this;
}

void PhaseDiagram::relink() {
    melting_.clear();
    for (int s : meltingSegs_) melting_.push_back(&boundaryOf(s));
}

void PhaseDiagram::buildSegments() {
    const FixedPoint *tp = triplePoint();
    const FixedPoint *cp = criticalPoint();
    std::vector<std::pair<double, int>> melting;  // (lowest pressure, segment)
    for (std::size_t i = 0; i < substance_.boundaries.size(); ++i) {
        const Boundary &b = substance_.boundaries[i];
        const TRange d = b.model->domain();
        TRange r = usableRange(b);
        const bool mainVap = b.kind == BoundaryKind::Vaporization && vaporizationSeg_ < 0;
        const bool mainSub = b.kind == BoundaryKind::Sublimation && sublimationSeg_ < 0;
        if (mainVap) {
            if (tp != nullptr) r.min_K = std::max(tp->T_K, d.min_K);
            if (cp != nullptr) r.max_K = std::min(cp->T_K, d.max_K);
        } else if (mainSub) {
            r.min_K = d.min_K;  // below the validity range: extrapolated, flagged
            if (tp != nullptr) r.max_K = std::min(tp->T_K, d.max_K);
        }
        if (!r.valid()) continue;
        BoundarySegment seg;
        seg.index = i;
        seg.T = r;
        const double pa = b.model->pressure(r.min_K);
        const double pb = b.model->pressure(r.max_K);
        seg.pLo = std::min(pa, pb);
        seg.pHi = std::max(pa, pb);
        const int id = static_cast<int>(segments_.size());
        if (mainVap) vaporizationSeg_ = id;
        if (mainSub) sublimationSeg_ = id;
        if (b.kind == BoundaryKind::Melting) melting.emplace_back(seg.pLo, id);
        segments_.push_back(std::move(seg));
    }
    std::stable_sort(melting.begin(), melting.end(),
                     [](const auto &x, const auto &y) { return x.first < y.first; });
    for (const auto &m : melting) meltingSegs_.push_back(m.second);
    if (!meltingSegs_.empty()) {
        // The last melting curve continues (extrapolated) toward higher pressure.
        BoundarySegment &last = segments_[static_cast<std::size_t>(meltingSegs_.back())];
        const BoundaryModel &model = *substance_.boundaries[last.index].model;
        const TRange d = model.domain();
        if (model.dPdT(0.5 * (last.T.min_K + last.T.max_K)) > 0.0) {
            last.T.max_K = d.max_K;
        } else {
            last.T.min_K = d.min_K;
        }
        last.pHi = std::max(model.pressure(last.T.min_K), model.pressure(last.T.max_K));
    }
    for (BoundarySegment &seg : segments_) {
        // The table covers the published part of the segment; the extrapolated rest is
        // answered by the bracketed solver alone.
        const Boundary &b = substance_.boundaries[seg.index];
        TRange t = seg.T;
        if (b.validity.valid()) {
            t.min_K = std::max(t.min_K, b.validity.min_K);
            t.max_K = std::min(t.max_K, b.validity.max_K);
        }
        if (!t.valid()) t = seg.T;
        // Built on the first query on this segment (core/boundary_segment.h).
        seg.table = LazyCurveTable(b.model, t.min_K, t.max_K);
    }
}

const FixedPoint *PhaseDiagram::triplePoint() const {
    if (substance_.triplePoints.empty() || !finitePoint(substance_.triplePoints.front())) {
        return nullptr;
    }
    return &substance_.triplePoints.front();
}

const FixedPoint *PhaseDiagram::criticalPoint() const {
    if (!substance_.critical || !finitePoint(*substance_.critical)) return nullptr;
    return &*substance_.critical;
}

const Boundary *PhaseDiagram::vaporization() const {
    return vaporizationSeg_ < 0 ? nullptr : &boundaryOf(vaporizationSeg_);
}

const Boundary *PhaseDiagram::sublimation() const {
    return sublimationSeg_ < 0 ? nullptr : &boundaryOf(sublimationSeg_);
}

// A pressure in a gap between two melting segments whose ends do not quite meet: the lower
// segment's curve, continued over its whole domain (flagged extrapolated).
void PhaseDiagram::badTemperature(double T) {
    throw DomainError(fmt::format("temperature must be above 0 K and finite, got {:g} K", T));
}

void PhaseDiagram::badPressure(double P) {
    throw DomainError(fmt::format("pressure must be positive and finite, got {:g} Pa", P));
}

// The table did not answer (outside its range or a cell that missed its tolerance): the
// bracketed solver on the segment.
std::optional<BoundaryValue> PhaseDiagram::solveOnSegment(int seg, double lnP) const {
    const BoundarySegment &s = segments_[static_cast<std::size_t>(seg)];
    const Boundary &b = boundaryOf(seg);
    const auto T = solveTemperature(*b.model, lnP, s.T.min_K, s.T.max_K);
    if (!T) return std::nullopt;
    return BoundaryValue{&b, *T, b.extrapolated(*T)};
}

std::optional<BoundaryValue> PhaseDiagram::solveOutside(int seg, double P_Pa) const {
    const Boundary &b = boundaryOf(seg);
    const TRange d = b.model->domain();
    const auto T = solveTemperature(*b.model, std::log(P_Pa), d.min_K, d.max_K);
    if (!T) return std::nullopt;
    return BoundaryValue{&b, *T, true};
}

std::vector<BoundaryValue> PhaseDiagram::pressuresAt(double T_K) const {
    requireTemperature(T_K);
    std::vector<BoundaryValue> out;
    for (int i = 0; i < static_cast<int>(segments_.size()); ++i) {
        if (auto v = segmentPressure(i, T_K)) out.push_back(*v);
    }
    return out;
}

std::vector<BoundaryValue> PhaseDiagram::temperaturesAt(double P_Pa) const {
    requirePressure(P_Pa);
    std::vector<BoundaryValue> out;
    for (int i = 0; i < static_cast<int>(segments_.size()); ++i) {
        if (auto v = segmentTemperature(i, P_Pa, std::log(P_Pa))) out.push_back(*v);
    }
    return out;
}

double PhaseDiagram::meltingTemperatureCeiling(double P_lo_Pa, double P_hi_Pa) const {
    double ceiling = -std::numeric_limits<double>::infinity();
    for (std::size_t k = 0; k < meltingSegs_.size(); ++k) {
        const BoundarySegment &s = segments_[static_cast<std::size_t>(meltingSegs_[k])];
        // A gap below this segment (after the previous one) inside the range: extrapolated.
        if (k > 0) {
            const BoundarySegment &prev = segments_[static_cast<std::size_t>(meltingSegs_[k - 1])];
            if (prev.pHi < s.pLo && s.pLo > P_lo_Pa && prev.pHi < P_hi_Pa)
                return std::numeric_limits<double>::infinity();
        }
        if (s.pLo > P_hi_Pa || s.pHi < P_lo_Pa) continue;
        // T(p) is monotonic on a segment: its largest value in the range is at an end. The
        // margin covers the inverse's accuracy (1e-9 K).
        for (const double p : {std::max(s.pLo, P_lo_Pa), std::min(s.pHi, P_hi_Pa)}) {
            const auto T = segmentTemperature(meltingSegs_[k], p, std::log(p));
            if (!T) return std::numeric_limits<double>::infinity();
            ceiling = std::max(ceiling, T->value + 1e-6);
        }
    }
    return ceiling;
}

namespace {
std::optional<double> valueOf(const std::optional<BoundaryValue> &v) {
    if (!v) return std::nullopt;
    return v->value;
}
}  // namespace

std::optional<double> PhaseDiagram::normalMeltingPoint() const {
    return valueOf(meltingTemperature(kStandardAtmosphere_Pa));
}

std::optional<double> PhaseDiagram::normalBoilingPoint() const {
    return valueOf(vaporizationTemperature(kStandardAtmosphere_Pa));
}

std::optional<double> PhaseDiagram::normalSublimationPoint() const {
    return valueOf(sublimationTemperature(kStandardAtmosphere_Pa));
}

std::optional<int> PhaseDiagram::meltSlopeSign() const {
    if (meltingSegs_.empty()) return std::nullopt;
    const BoundarySegment &s = segments_[static_cast<std::size_t>(meltingSegs_.front())];
    const BoundaryModel &m = *boundaryOf(meltingSegs_.front()).model;
    const FixedPoint *tp = triplePoint();
    double T = m.pressure(s.T.min_K) <= m.pressure(s.T.max_K) ? s.T.min_K : s.T.max_K;
    if (tp != nullptr && m.domain().contains(tp->T_K)) T = tp->T_K;
    const double slope = m.dPdT(T);
    if (!(slope != 0.0) || std::isnan(slope)) return std::nullopt;
    return slope > 0.0 ? 1 : -1;
}

std::optional<bool> PhaseDiagram::solidDenserThanLiquid() const {
    const auto sign = meltSlopeSign();
    if (!sign) return std::nullopt;
    return *sign > 0;
}

std::optional<double> PhaseDiagram::dHvapTriple() const {
    const FixedPoint *tp = triplePoint();
    const Boundary *b = vaporization();
    if (tp == nullptr || b == nullptr || !b->model->domain().contains(tp->T_K)) return std::nullopt;
    return kGasConstant * tp->T_K * tp->T_K * lnPressureOf(*b->model, tp->T_K).slope;
}

std::optional<double> PhaseDiagram::dHsubTriple() const {
    const FixedPoint *tp = triplePoint();
    const Boundary *b = sublimation();
    if (tp == nullptr || b == nullptr || !b->model->domain().contains(tp->T_K)) return std::nullopt;
    return kGasConstant * tp->T_K * tp->T_K * lnPressureOf(*b->model, tp->T_K).slope;
}

std::optional<double> PhaseDiagram::dHfusTriple() const {
    const FixedPoint *tp = triplePoint();
    const double dV = substance_.dVfusTriple_m3_mol;
    if (tp == nullptr || melting_.empty() || !std::isfinite(dV) || dV == 0.0) return std::nullopt;
    const BoundaryModel &m = *melting_.front()->model;
    if (!m.domain().contains(tp->T_K)) return std::nullopt;
    return tp->T_K * dV * m.dPdT(tp->T_K);
}

}  // namespace pw
