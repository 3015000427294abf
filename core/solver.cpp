#include "core/solver.h"

#include <limits>

#include "core/errors.h"

namespace pw {

namespace {

// Newton is accepted once its predicted error K·step² is below this (K).
constexpr double kNewtonTol_K = 1e-11;
constexpr int kNewtonSteps = 3;

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

InverseTable::InverseTable(BoundaryModelPtr model, double T_lo, double T_hi, int intervals)
    : model_(std::move(model)), curve_(dynamic_cast<const CurveModel *>(model_.get())) {
    const LnPressure a = eval(T_lo);
    const LnPressure b = eval(T_hi);
    if (!(std::isfinite(a.lnp) && std::isfinite(b.lnp)) || a.lnp == b.lnp || intervals < 2) {
        throw DomainError("inverse table: the curve '" + std::string(model_->form()) +
                          "' is not monotonic and finite on its segment");
    }
    const bool rising = b.lnp > a.lnp;
    lnpMin_ = std::min(a.lnp, b.lnp);
    lnpMax_ = std::max(a.lnp, b.lnp);
    const double step = (lnpMax_ - lnpMin_) / intervals;
    invStep_ = 1.0 / step;
    T_.resize(static_cast<std::size_t>(intervals) + 1);
    m_.resize(T_.size());
    std::vector<double> slope(T_.size());
    const double Tend = rising ? T_hi : T_lo;
    const double infinity = std::numeric_limits<double>::infinity();
    for (std::size_t k = 0; k < T_.size(); ++k) {
        double T = k == 0 ? (rising ? T_lo : T_hi) : Tend;
        if (k > 0 && k + 1 < T_.size()) {
            const double target = lnpMin_ + step * static_cast<double>(k);
            const double guess = std::clamp(T_[k - 1] + m_[k - 1], std::min(T_[k - 1], Tend),
                                            std::max(T_[k - 1], Tend));
            T = refine(target, guess, std::min(T_[k - 1], Tend), std::max(T_[k - 1], Tend),
                       infinity, 0.0);
        }
        T_[k] = T;
        slope[k] = eval(T).slope;
        m_[k] = step / slope[k];
    }
    errK_.resize(T_.size() - 1);
    for (std::size_t k = 0; k + 1 < T_.size(); ++k) {
        const double dT = T_[k + 1] - T_[k];
        const double g2 = dT != 0.0 ? (slope[k + 1] - slope[k]) / dT : infinity;
        const double g1 = std::min(std::abs(slope[k]), std::abs(slope[k + 1]));
        // Safety factor 10 over the finite-difference estimate of |g''| / (2 |g'|).
        errK_[k] = 10.0 * std::abs(g2) / (2.0 * g1);
        if (!std::isfinite(errK_[k])) errK_[k] = infinity;
        // Measure the Hermite error inside the interval against the exact inverse.
        const double lo = std::min(T_[k], T_[k + 1]);
        const double hi = std::max(T_[k], T_[k + 1]);
        double worst = 0.0;
        for (double t : {0.25, 0.5, 0.75}) {
            const double target = lnpMin_ + step * (static_cast<double>(k) + t);
            const double h = hermite(k, t);
            worst = std::max(worst, std::abs(refine(target, h, lo, hi, infinity, 0.0) - h));
        }
        if (worst <= kTableExact_K) errK_[k] = -1.0;
    }
}

double InverseTable::hermite(std::size_t i, double t) const {
    const double t2 = t * t, t3 = t2 * t;
    return (2 * t3 - 3 * t2 + 1) * T_[i] + (t3 - 2 * t2 + t) * m_[i] +
           (-2 * t3 + 3 * t2) * T_[i + 1] + (t3 - t2) * m_[i + 1];
}

double InverseTable::refine(double lnp, double T, double lo, double hi, double errK,
                            double tolK) const {
    const int steps = std::isfinite(errK) ? kNewtonSteps : 20;
    T = std::clamp(T, lo, hi);
    for (int iter = 0; iter < steps; ++iter) {
        const LnPressure e = eval(T);
        const double g = e.lnp - lnp;
        if (g == 0.0) return T;
        // Shrink the bracket with the sign of g (ln p rises with T when slope > 0).
        if ((g > 0.0) == (e.slope > 0.0)) {
            hi = T;
        } else {
            lo = T;
        }
        const double stepT = g / e.slope;
        const double next = T - stepT;
        if (!(next >= lo && next <= hi)) break;
        T = next;
        // Quadratic convergence: the error after the step is about errK·step².
        if (std::isfinite(errK) ? errK * stepT * stepT <= tolK
                                : std::abs(stepT) <= kSolverRelTol * T) {
            return T;
        }
    }
    return solveTemperature(*model_, lnp, lo, hi).value_or(0.5 * (lo + hi));
}

std::optional<double> InverseTable::temperature(double lnp) const {
    if (T_.empty()) return std::nullopt;
    const double x = (lnp - lnpMin_) * invStep_;
    const std::size_t n = T_.size() - 1;
    if (!(x >= 0.0 && x <= static_cast<double>(n))) return std::nullopt;
    const std::size_t i = std::min(static_cast<std::size_t>(x), n - 1);
    const double T = hermite(i, x - static_cast<double>(i));
    const double lo = std::min(T_[i], T_[i + 1]);
    const double hi = std::max(T_[i], T_[i + 1]);
    if (errK_[i] < 0.0) return std::clamp(T, lo, hi);
    return refine(lnp, T, lo, hi, errK_[i], kNewtonTol_K);
}

}  // namespace pw
