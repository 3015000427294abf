#pragma once
// A smooth function of one variable tabulated as piecewise polynomials whose error is
// measured against the function when the table is built: the fast path of the boundary
// curves (ln p(T) and its inverse T(ln p)) for tables of millions of state points.
//
// [lo, hi] is cut into equal cells; each cell into 2^k equal pieces, k the smallest level
// (up to Options::maxLevel) at which, on every piece of the cell, the degree-7 polynomial
// interpolating f at the 8 Chebyshev points of the first kind is within the tolerance of f
// at the 9 points where the error of such an interpolant peaks (the extrema of T_8, ends
// included). Chebyshev interpolation: L. N. Trefethen, Approximation Theory and
// Approximation Practice (SIAM 2013), chapters 3, 4 and 8. A cell that does not get there
// (a singular point, noise in f) answers NaN and the caller evaluates f itself.
#include <cstddef>
#include <cstdint>
#include <functional>
#include <limits>
#include <vector>

namespace pw {

class PolyTable {
public:
    static constexpr int kDegree = 7;
    static constexpr int kCoefficients = kDegree + 1;
    static_assert(kCoefficients == 8, "estrin() is written for 8 coefficients");

    struct Options {
        int cells = 256;
        int maxLevel = 7;     // at most 2^7 pieces in a cell
        double tolAbs = 0.0;  // |p(x) - f(x)| <= tolAbs + tolRel |f(x)| at every check point
        double tolRel = 0.0;
    };

    PolyTable() = default;
    // Tabulates f on [lo, hi] (lo < hi, f finite there). f is called about 17 times per piece.
    PolyTable(const std::function<double(double)> &f, double lo, double hi, Options options);

    bool empty() const { return cells_.empty(); }
    double lo() const { return lo_; }
    double hi() const { return hi_; }
    std::size_t pieceCount() const { return coef_.size() / kCoefficients; }
    // Cells that missed the tolerance (they answer NaN).
    std::size_t missedCells() const;
    // Largest error measured at the check points over the cells that met the tolerance.
    double measuredError() const { return measuredError_; }

    // The table's value at x; NaN outside [lo, hi] or in a cell that missed the tolerance.
    double operator()(double x) const {
        const double t = (x - lo_) * cellsPerUnit_;
        if (!(t >= 0.0 && t <= lastCell_ + 1.0)) return kNoValue;
        const auto i = static_cast<std::size_t>(t < lastCell_ ? t : lastCell_);
        const Cell c = cells_[i];
        if (c.level < 0) return kNoValue;
        const int pieces = 1 << c.level;
        const double s = (t - static_cast<double>(i)) * pieces;
        const int j = s < pieces - 1 ? static_cast<int>(s) : pieces - 1;
        const double u = 2.0 * (s - j) - 1.0;
        const double *m = &coef_[(c.first + static_cast<std::size_t>(j)) * kCoefficients];
        return estrin(m, u);
    }

    // Σ m[k] u^k for the 8 coefficients, by Estrin's scheme: a shorter chain of dependent
    // operations than Horner's rule (the latency of that chain is what a query waits for).
    static double estrin(const double *m, double u) {
        const double u2 = u * u, u4 = u2 * u2;
        const double a0 = m[0] + m[1] * u, a1 = m[2] + m[3] * u;
        const double a2 = m[4] + m[5] * u, a3 = m[6] + m[7] * u;
        return (a0 + a1 * u2) + (a2 + a3 * u2) * u4;
    }

private:
    static constexpr double kNoValue = std::numeric_limits<double>::quiet_NaN();
    struct Cell {
        std::uint32_t first = 0;  // index of its first piece
        std::int32_t level = -1;  // 2^level pieces; -1: missed the tolerance
    };
    // Fits f on [a, b] into coefficients m (monomial in u = (2x - a - b) / (b - a)); returns
    // the largest error at the check points relative to the tolerance (<= 1: met).
    double fitPiece(const std::function<double(double)> &f, double a, double b, const Options &o,
                    double *m, double &worstAbs) const;

    double lo_ = 0.0, hi_ = 0.0, cellsPerUnit_ = 0.0;
    double lastCell_ = -2.0;  // index of the last cell (empty: -2, every query answers NaN)
    std::vector<Cell> cells_;
    std::vector<double> coef_;  // kCoefficients per piece, lowest power first
    double measuredError_ = 0.0;
};

}  // namespace pw
