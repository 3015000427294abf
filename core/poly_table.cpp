#include "core/poly_table.h"

#include <algorithm>
#include <array>
#include <cmath>
#include <numbers>

namespace pw {
namespace {

constexpr int kN = PolyTable::kCoefficients;
constexpr int kChecks = kN + 1;  // the extrema of T_8 on [-1, 1], ends included

using Row = std::array<double, kN>;

// Interpolation points u_j = cos(pi (j + 1/2) / 8) and check points cos(pi j / 8).
struct Points {
    std::array<double, kN> nodes{};
    std::array<double, kChecks> checks{};
    std::array<Row, kN> cosTable{};   // cos(pi k (j + 1/2) / 8), [k][j]
    std::array<Row, kN> monomials{};  // T_k(u) = sum_i monomials[k][i] u^i
    Points() {
        for (int j = 0; j < kN; ++j) nodes[j] = std::cos(std::numbers::pi * (j + 0.5) / kN);
        for (int j = 0; j < kChecks; ++j) checks[j] = std::cos(std::numbers::pi * j / kN);
        for (int k = 0; k < kN; ++k)
            for (int j = 0; j < kN; ++j)
                cosTable[k][j] = std::cos(std::numbers::pi * k * (j + 0.5) / kN);
        monomials[0][0] = 1.0;
        monomials[1][1] = 1.0;
        for (int k = 2; k < kN; ++k)  // T_k = 2 u T_{k-1} - T_{k-2}
            for (int i = 0; i < kN; ++i)
                monomials[k][i] =
                    (i > 0 ? 2.0 * monomials[k - 1][i - 1] : 0.0) - monomials[k - 2][i];
    }
};

const Points &points() {
    static const Points p;  // constant tables, built once (thread-safe static)
    return p;
}

// From level 3 on, a cell gives up when halving its pieces shrinks the error by less than
// this: noise in f or a singular point (at x^(1/2) the error shrinks by 2^(1/2) a level; a
// smooth f gives 2^8).
constexpr double kMinShrink = 1.5;
constexpr int kShrinkFromLevel = 3;

}  // namespace

double PolyTable::fitPiece(const std::function<double(double)> &f, double a, double b,
                           const Options &o, double *m, double &worstAbs) const {
    const Points &pts = points();
    const double mid = 0.5 * (a + b), half = 0.5 * (b - a);
    Row values{};
    for (int j = 0; j < kN; ++j) values[j] = f(mid + half * pts.nodes[j]);
    Row cheb{};
    for (int k = 0; k < kN; ++k) {
        double sum = 0.0;
        for (int j = 0; j < kN; ++j) sum += values[j] * pts.cosTable[k][j];
        cheb[k] = (k == 0 ? 1.0 : 2.0) * sum / kN;
    }
    std::fill(m, m + kN, 0.0);
    for (int k = 0; k < kN; ++k)
        for (int i = 0; i <= k; ++i) m[i] += cheb[k] * pts.monomials[k][i];
    double worst = 0.0;
    for (const double u : pts.checks) {
        const double x = u == 1.0 ? b : u == -1.0 ? a : mid + half * u;
        const double exact = f(x);
        const double err = std::abs(estrin(m, u) - exact);
        if (!std::isfinite(err)) return std::numeric_limits<double>::infinity();
        worstAbs = std::max(worstAbs, err);
        worst = std::max(worst, err / (o.tolAbs + o.tolRel * std::abs(exact)));
    }
    return worst;
}

PolyTable::PolyTable(const std::function<double(double)> &f, double lo, double hi, Options options)
    : lo_(lo), hi_(hi) {
    if (!(lo < hi) || options.cells < 1) return;
    cellsPerUnit_ = options.cells / (hi - lo);
    lastCell_ = options.cells - 1;
    cells_.resize(static_cast<std::size_t>(options.cells));
    const double width = (hi - lo) / options.cells;
    std::vector<double> trial;
    for (int i = 0; i < options.cells; ++i) {
        const double a = lo + width * i;
        const double b = i + 1 == options.cells ? hi : lo + width * (i + 1);
        double previous = std::numeric_limits<double>::infinity();
        for (int level = 0; level <= options.maxLevel; ++level) {
            const int pieces = 1 << level;
            trial.assign(static_cast<std::size_t>(pieces) * kN, 0.0);
            double worst = 0.0, worstAbs = 0.0;
            for (int j = 0; j < pieces && worst <= 1.0; ++j) {
                const double pa = a + (b - a) * j / pieces;
                const double pb = j + 1 == pieces ? b : a + (b - a) * (j + 1) / pieces;
                worst = std::max(worst, fitPiece(f, pa, pb, options, &trial[j * kN], worstAbs));
            }
            if (worst <= 1.0) {
                cells_[i] = {static_cast<std::uint32_t>(coef_.size() / kN), level};
                coef_.insert(coef_.end(), trial.begin(), trial.end());
                measuredError_ = std::max(measuredError_, worstAbs);
                break;
            }
            if (level >= kShrinkFromLevel && !(worst * kMinShrink <= previous)) break;
            previous = worst;
        }
    }
}

std::size_t PolyTable::missedCells() const {
    return static_cast<std::size_t>(
        std::count_if(cells_.begin(), cells_.end(), [](const Cell &c) { return c.level < 0; }));
}

}  // namespace pw
