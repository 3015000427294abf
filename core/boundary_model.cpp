#include "core/boundary_model.h"

#include <cmath>

#include <fmt/format.h>

#include "core/errors.h"
#include "core/solver.h"

namespace pw {

double BoundaryModel::temperature(double p) const { return temperature(p, domain()); }

double BoundaryModel::temperature(double p, TRange within) const {
    if (!(std::isfinite(p) && p > 0.0)) {
        throw DomainError(fmt::format("pressure must be positive and finite, got {:g} Pa", p));
    }
    if (!within.valid()) throw DomainError("temperature range for the inverse is empty");
    const auto T = solveTemperature(*this, std::log(p), within.min_K, within.max_K);
    if (!T) {
        throw DomainError(
            fmt::format("pressure {:g} Pa is not reached by the '{}' curve between "
                        "{:g} K and {:g} K",
                        p, form(), within.min_K, within.max_K));
    }
    return *T;
}

}  // namespace pw
