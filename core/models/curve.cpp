#include "core/models/curve.h"

#include <cmath>
#include <limits>

#include "core/model_spec.h"

namespace pw {

namespace {

constexpr int kNoQuarter = std::numeric_limits<int>::min();
constexpr int kGridPoints = 512;  // per side of the anchor, for the domain scan

double ipow(double x, int n) {
    if (n < 0) return 1.0 / ipow(x, -n);
    double result = 1.0;
    while (n != 0) {
        if ((n & 1) != 0) result *= x;
        x *= x;
        n >>= 1;
    }
    return result;
}

bool usable(const LnPressure &e, int sign) {
    if (!std::isfinite(e.lnp) || std::isnan(e.slope) || e.slope == 0.0) return false;
    return (e.slope > 0.0) == (sign > 0);
}

}  // namespace

double CurveModel::pressure(double T) const { return std::exp(lnPressure(T).lnp); }

double CurveModel::dPdT(double T) const {
    const LnPressure e = lnPressure(T);
    return std::exp(e.lnp) * e.slope;
}

void CurveModel::findDomain(TRange candidate, double anchor, const std::string &parameter) {
    if (!candidate.valid()) {
        throw ModelSpecError(parameter, "model '" + form_ + "': no positive temperature range");
    }
    std::vector<double> grid;
    const bool anchored = std::isfinite(anchor) && candidate.contains(anchor);
    if (anchored) {
        // Two linear grids that meet exactly at the anchor.
        for (int i = 0; i <= kGridPoints; ++i) {
            grid.push_back(candidate.min_K + (anchor - candidate.min_K) * i / kGridPoints);
        }
        for (int i = 1; i <= kGridPoints; ++i) {
            grid.push_back(anchor + (candidate.max_K - anchor) * i / kGridPoints);
        }
    } else {
        for (int i = 0; i <= 2 * kGridPoints; ++i) {
            grid.push_back(candidate.min_K +
                           (candidate.max_K - candidate.min_K) * i / (2 * kGridPoints));
        }
    }
    // Longest run of usable points with one slope sign (through the anchor when given).
    std::vector<LnPressure> evals;
    evals.reserve(grid.size());
    for (double T : grid) evals.push_back(lnPressure(T));
    std::size_t bestLo = 0, bestHi = 0;
    bool found = false;
    for (int sign : {+1, -1}) {
        std::size_t i = 0;
        while (i < grid.size()) {
            if (!usable(evals[i], sign)) {
                ++i;
                continue;
            }
            std::size_t j = i;
            while (j + 1 < grid.size() && usable(evals[j + 1], sign)) ++j;
            const bool holdsAnchor = !anchored || (grid[i] <= anchor && grid[j] >= anchor);
            if (holdsAnchor && j > i && (!found || j - i > bestHi - bestLo)) {
                bestLo = i;
                bestHi = j;
                found = true;
            }
            i = j + 1;
        }
    }
    if (!found) {
        throw ModelSpecError(parameter, "model '" + form_ +
                                            "': the coefficients give no finite, monotonic "
                                            "curve near the reference temperature");
    }
    domain_ = TRange{grid[bestLo], grid[bestHi]};
}

PowerSet::PowerSet(std::vector<double> exponents) : exponents_(std::move(exponents)) {
    for (double e : exponents_) {
        const double q = e * 4.0;
        const bool quarter = std::abs(q) <= 1024.0 && q == std::round(q);
        quarters_.push_back(quarter ? static_cast<int>(q) : kNoQuarter);
        if (!quarter) needLog_ = true;
        if (quarter && static_cast<int>(q) % 4 != 0) needRoot_ = true;
        if (e != std::round(e)) allIntegers_ = false;
    }
}

SumValue PowerSet::sum(const std::vector<double> &a, double x) const {
    const double root = needRoot_ ? std::sqrt(std::sqrt(x)) : 0.0;
    const double lx = needLog_ ? std::log(x) : 0.0;
    SumValue s;
    for (std::size_t i = 0; i < exponents_.size(); ++i) {
        const double e = exponents_[i];
        const int q = quarters_[i];
        double v = 0.0;
        if (q == kNoQuarter) {
            v = std::exp(e * lx);
        } else if (q % 4 == 0) {
            v = ipow(x, q / 4);
        } else {
            v = ipow(root, q);
        }
        double d = 0.0;
        if (x != 0.0) {
            d = e * v / x;
        } else if (e == 1.0) {
            d = 1.0;
        } else if (e < 1.0 && e != 0.0) {
            d = std::numeric_limits<double>::infinity();
        }
        s.value += a[i] * v;
        s.deriv += a[i] * d;
    }
    return s;
}

}  // namespace pw
