#pragma once
// Inverse of a monotone boundary curve: T(p).
//
// solveBracketed(): TOMS748 (Alefeld, Potra & Shi 1995, Boost.Math) on a bracket whose ends
// have opposite signs; guaranteed to converge, never leaves the bracket.
//
// InverseTable: the fast path for repeated queries on one curve segment. A table of T at
// points evenly spaced in ln p (exact node values, with the exact slopes dT/d(ln p)) gives a
// cubic-Hermite value. Intervals whose Hermite error, measured at construction against the
// exact inverse at t = 1/4, 1/2, 3/4, is below kTableExact_K answer from the table alone.
// Elsewhere safeguarded Newton steps on ln p(T) − ln p refine the value inside the node
// bracket (the two nodes enclose the root because the curve is monotonic); a step that leaves
// the bracket, or no convergence in three steps, falls back to TOMS748 on that bracket.
#include <algorithm>
#include <boost/math/tools/toms748_solve.hpp>
#include <cmath>
#include <cstdint>
#include <optional>
#include <vector>

#include "core/boundary_model.h"
#include "core/models/curve.h"

namespace pw {

// Bracket width at which TOMS748 stops: 1e-13 relative (7e-11 K at 700 K).
inline constexpr double kSolverRelTol = 1e-13;
// Largest measured Hermite error (K) for which a table interval needs no refinement: a
// hundredth of the 1e-9 K guarantee.
inline constexpr double kTableExact_K = 1e-11;

// Root of f on [lo, hi]; nullopt when f(lo), f(hi) do not bracket a root (or are NaN).
template <class F>
std::optional<double> solveBracketed(F f, double lo, double hi) {
    const double flo = f(lo);
    const double fhi = f(hi);
    if (flo == 0.0) return lo;
    if (fhi == 0.0) return hi;
    if (!((flo < 0.0 && fhi > 0.0) || (flo > 0.0 && fhi < 0.0))) return std::nullopt;
    std::uintmax_t maxIter = 200;
    auto tol = [](double a, double b) {
        return std::abs(b - a) <= kSolverRelTol * std::min(std::abs(a), std::abs(b));
    };
    const auto r = boost::math::tools::toms748_solve(f, lo, hi, flo, fhi, tol, maxIter);
    return 0.5 * (r.first + r.second);
}

// ln p and d(ln p)/dT of any model: the CurveModel fast path or pressure()/dPdT().
LnPressure lnPressureOf(const BoundaryModel &model, double T);

// Temperature where `model` has ln p = lnp, within [lo, hi]; nullopt if not reached there.
std::optional<double> solveTemperature(const BoundaryModel &model, double lnp, double lo,
                                       double hi);

class InverseTable {
public:
    InverseTable() = default;
    // Table over [T_lo, T_hi] (inside the model's domain, where the curve is monotonic).
    InverseTable(BoundaryModelPtr model, double T_lo, double T_hi, int intervals = 4096);

    bool empty() const { return T_.empty(); }
    // ln p range covered by the table.
    double lnpMin() const { return lnpMin_; }
    double lnpMax() const { return lnpMax_; }
    // T at ln p; nullopt outside [lnpMin, lnpMax].
    std::optional<double> temperature(double lnp) const;

private:
    double hermite(std::size_t i, double t) const;
    // Newton from T0 inside [lo, hi] until the step is below tolK (or TOMS748).
    double refine(double lnp, double T0, double lo, double hi, double errK, double tolK) const;
    LnPressure eval(double T) const {
        return curve_ != nullptr ? curve_->lnPressure(T) : lnPressureOf(*model_, T);
    }

    BoundaryModelPtr model_;
    const CurveModel *curve_ = nullptr;
    double lnpMin_ = 0.0, lnpMax_ = 0.0, invStep_ = 0.0;
    std::vector<double> T_;     // node temperatures
    std::vector<double> m_;     // node slopes dT/d(ln p) times the node spacing
    std::vector<double> errK_;  // per interval: bound on |g''/(2 g')| (Newton error factor)
};

}  // namespace pw
