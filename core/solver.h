#pragma once
// Inverse of a monotone boundary curve, T(p), and the fast tables of a curve segment.
//
// solveBracketed(): TOMS748 (Alefeld, Potra & Shi 1995, Boost.Math) on a bracket whose ends
// have opposite signs; guaranteed to converge, never leaves the bracket.
//
// CurveTable: the fast path for repeated queries on one curve segment, both ways: p(T) and
// T(ln p) as piecewise polynomials (core/poly_table.h) whose error was measured against the
// equation when built, at the points where the error peaks: p within kTablePressureRel
// relative, T within kTableExact_K. The exact inverse behind the table is safeguarded
// Newton on ln p(T) (the curve is monotonic on the segment); where a table cell missed its
// tolerance (next to a critical point, where the equations have a fractional power of T_c - T)
// queries solve the equation itself.
#include <algorithm>
#include <boost/math/tools/toms748_solve.hpp>
#include <cmath>
#include <cstdint>
#include <limits>
#include <optional>
#include <vector>

#include "core/boundary_model.h"
#include "core/models/curve.h"
#include "core/poly_table.h"

namespace pw {

// Bracket width at which TOMS748 stops: 1e-13 relative (7e-11 K at 700 K).
inline constexpr double kSolverRelTol = 1e-13;
// Error the inverse table allows (K): a hundredth of the 1e-9 K guarantee.
inline constexpr double kTableExact_K = 1e-11;
// Relative error the forward table p(T) allows.
inline constexpr double kTablePressureRel = 1e-13;

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

class CurveTable {
public:
    CurveTable() = default;
    // Tables over [T_lo, T_hi] (inside the model's domain, where the curve is monotonic).
    // Throws DomainError when the curve is not finite and monotonic there.
    CurveTable(BoundaryModelPtr model, double T_lo, double T_hi);

    bool empty() const { return model_ == nullptr; }
    double lnpMin() const { return lnpMin_; }  // ln p range covered
    double lnpMax() const { return lnpMax_; }
    // T at ln p; nullopt outside [lnpMin, lnpMax].
    std::optional<double> temperature(double lnp) const {
        if (!(lnp >= lnpMin_ && lnp <= lnpMax_)) return std::nullopt;
        const double T = inverse_(lnp);
        if (!std::isnan(T)) return std::clamp(T, T_lo_, T_hi_);
        return exactTemperature(lnp);
    }
    // p at T (Pa); NaN outside [T_lo, T_hi].
    double pressure(double T) const {
        if (!(T >= T_lo_ && T <= T_hi_)) return std::numeric_limits<double>::quiet_NaN();
        const double p = forward_(T);
        return std::isnan(p) ? model_->pressure(T) : p;
    }
    // The tables themselves (tests and benchmarks).
    const PolyTable &forward() const { return forward_; }
    const PolyTable &inverse() const { return inverse_; }

private:
    LnPressure exact(double T) const {
        return curve_ != nullptr ? curve_->lnPressure(T) : lnPressureOf(*model_, T);
    }
    // Safeguarded Newton inside [T_lo, T_hi] from a guess by the coarse node table.
    double exactTemperature(double lnp) const;

    BoundaryModelPtr model_;
    const CurveModel *curve_ = nullptr;
    // Empty: ranges no value is in.
    double T_lo_ = std::numeric_limits<double>::infinity();
    double T_hi_ = -std::numeric_limits<double>::infinity();
    double lnpMin_ = std::numeric_limits<double>::infinity();
    double lnpMax_ = -std::numeric_limits<double>::infinity();
    std::vector<double> nodeT_, nodeLnp_;  // coarse (T, ln p) nodes, by increasing ln p
    PolyTable forward_;                    // p(T)
    PolyTable inverse_;                    // T(ln p)
};

}  // namespace pw
