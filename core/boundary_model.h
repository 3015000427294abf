#pragma once
// A phase-boundary model: an equation p(T) for one coexistence curve, with its derivative and
// its inverse T(p). All temperatures in K, all pressures in Pa.
//
// `domain()` is where the equation is mathematically defined (used to bracket the inverse);
// the published validity range lives on the Boundary that owns the model (core/boundary.h):
// evaluating outside it is allowed and flagged as extrapolated by the callers.
#include <memory>
#include <string>
#include <string_view>

namespace pw {

struct TRange {
    double min_K = 0.0;
    double max_K = 0.0;
    bool contains(double T) const { return T >= min_K && T <= max_K; }
    bool valid() const { return min_K > 0.0 && max_K > min_K; }
};

class BoundaryModel {
public:
    virtual ~BoundaryModel() = default;

    // Pressure on the curve at temperature T (Pa). T must lie inside domain().
    virtual double pressure(double T) const = 0;
    // dp/dT on the curve (Pa/K), analytic.
    virtual double dPdT(double T) const = 0;
    // Short name of the equation form, as used in substance files ("wagner", "antoine"...).
    virtual std::string_view form() const = 0;
    // Temperatures where the equation is defined and monotonic.
    virtual TRange domain() const = 0;

    // Inverse: the temperature on the curve at pressure p, searched within `within`
    // (defaults to domain()). Bracketed and guaranteed to converge (see core/solver.h);
    // |T - T(p(T))| <= 1e-9 K. Throws DomainError if p is not reached inside the bracket.
    double temperature(double p) const;
    double temperature(double p, TRange within) const;
};

using BoundaryModelPtr = std::shared_ptr<const BoundaryModel>;

}  // namespace pw
