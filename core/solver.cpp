#include "core/solver.h"

#include <algorithm>
#include <limits>
#include <string>

#include "core/errors.h"

namespace pw {

namespace {

// The curve tables: cells per table, refinement levels, coarse nodes.
constexpr int kCells = 256;
constexpr int kMaxLevel = 5;
constexpr int kNodes = 256;
// The exact inverse stops when a Newton step (or the bracket) is below 1e-15 T (about 4 ulp).
constexpr double kNewtonStopRel = 1e-15;
constexpr int kMaxNewton = 60;

}  // namespace

LnPressure lnPressureOf(const BoundaryModel &model, double T) {
    if (const auto *curve = dynamic_cast<const CurveModel *>(&model)) return curve->lnPressure(T);
    const double p = model.pressure(T);
    if (!(p > 0.0)) return {std::numeric_limits<double>::quiet_NaN(), 0.0};
    return {std::log(p), model.dPdT(T) / p};
}

std::optional<double> solveTemperature(const BoundaryModel &model, double lnp, double lo,
                                       double hi) {
    const auto *curve = dynamic_cast<const CurveModel *>(&model);
    if (curve != nullptr) {
        return solveBracketed([&](double T) { return curve->lnPressure(T).lnp - lnp; }, lo, hi);
    }
    return solveBracketed([&](double T) { return lnPressureOf(model, T).lnp - lnp; }, lo, hi);
}

CurveTable::CurveTable(BoundaryModelPtr model, double T_lo, double T_hi)
    : model_(std::move(model)), curve_(dynamic_cast<const CurveModel *>(model_.get())) {
    // Coarse nodes, even in T: the monotonicity check and the brackets of the exact inverse.
    nodeT_.resize(kNodes + 1);
    nodeLnp_.resize(kNodes + 1);
    for (int k = 0; k <= kNodes; ++k) {
        nodeT_[k] = k == kNodes ? T_hi : T_lo + (T_hi - T_lo) * k / kNodes;
        nodeLnp_[k] = exact(nodeT_[k]).lnp;
    }
    const bool rising = nodeLnp_.back() > nodeLnp_.front();
    for (int k = 0; k < kNodes; ++k) {
        const double step = nodeLnp_[k + 1] - nodeLnp_[k];
        if (!std::isfinite(nodeLnp_[k]) || !std::isfinite(nodeLnp_[k + 1]) ||
            !(rising ? step > 0.0 : step < 0.0)) {
            throw DomainError("curve table: the curve '" +
                              std::string(curve_ ? curve_->form() : "") +
                              "' is not monotonic and finite on its segment");
        }
    }
    if (!rising) {
        std::reverse(nodeT_.begin(), nodeT_.end());
        std::reverse(nodeLnp_.begin(), nodeLnp_.end());
    }
    T_lo_ = T_lo;
    T_hi_ = T_hi;
    lnpMin_ = nodeLnp_.front();
    lnpMax_ = nodeLnp_.back();
    // p itself, not ln p: a query then needs no exp() (p of the vapor-pressure forms, near
    // exponential in T, takes more pieces at low T than ln p would).
    forward_ = PolyTable([this](double T) { return model_->pressure(T); }, T_lo, T_hi,
                         {kCells, kMaxLevel, 0.0, kTablePressureRel});
    inverse_ = PolyTable([this](double lnp) { return exactTemperature(lnp); }, lnpMin_, lnpMax_,
                         {kCells, kMaxLevel, kTableExact_K, 0.0});
}

double CurveTable::exactTemperature(double lnp) const {
    const auto it = std::upper_bound(nodeLnp_.begin(), nodeLnp_.end(), lnp);
    const auto k = static_cast<std::size_t>(
        std::clamp<std::ptrdiff_t>(it - nodeLnp_.begin() - 1, 0, kNodes - 1));
    double lo = std::min(nodeT_[k], nodeT_[k + 1]);
    double hi = std::max(nodeT_[k], nodeT_[k + 1]);
    const double span = nodeLnp_[k + 1] - nodeLnp_[k];
    double T = nodeT_[k] + (nodeT_[k + 1] - nodeT_[k]) * (lnp - nodeLnp_[k]) / span;
    for (int iter = 0; iter < kMaxNewton; ++iter) {
        const LnPressure e = exact(T);
        const double g = e.lnp - lnp;
        if (g == 0.0) return T;
        if ((g > 0.0) == (e.slope > 0.0)) {
            hi = T;
        } else {
            lo = T;
        }
        double next = T - g / e.slope;
        if (!(next > lo && next < hi)) next = 0.5 * (lo + hi);  // bisect: Newton left the bracket
        if (std::abs(next - T) <= kNewtonStopRel * T || hi - lo <= kNewtonStopRel * T) return next;
        T = next;
    }
    return T;
}

}  // namespace pw
