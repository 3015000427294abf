// Piecewise Chebyshev tables (core/poly_table.h) on functions with known behaviour: the error
// between pieces stays within the tolerance, a singular end is refused (NaN, the caller
// computes), nothing is answered outside the range.
#include <gtest/gtest.h>

#include <cmath>
#include <random>

#include "core/poly_table.h"

namespace pw {
namespace {

// Worst |table - f| at many random points (not the build's check points).
template <class F>
double worstError(const PolyTable &t, F f, int n = 200000) {
    std::mt19937_64 rng(5);
    std::uniform_real_distribution<double> x(t.lo(), t.hi());
    double worst = 0.0;
    for (int i = 0; i < n; ++i) {
        const double v = x(rng);
        const double got = t(v);
        if (std::isnan(got)) continue;
        worst = std::max(worst, std::abs(got - f(v)));
    }
    return worst;
}

TEST(PolyTable, SmoothFunctionMeetsItsToleranceBetweenTheCheckPoints) {
    // A vapor-pressure-like curve: ln p = 20 - 5000 / T on 200-650 K.
    const auto f = [](double T) { return 20.0 - 5000.0 / T; };
    const PolyTable t(f, 200.0, 650.0, {64, 7, 1e-13, 0.0});
    EXPECT_EQ(t.missedCells(), 0u);
    EXPECT_LE(t.measuredError(), 1e-13);
    // Between the check points the interpolation error is of the same size (its peaks are at
    // the check points); allow a factor 2.
    EXPECT_LE(worstError(t, f), 2e-13);
    EXPECT_NEAR(t(300.0), f(300.0), 1e-13);
    EXPECT_NEAR(t(200.0), f(200.0), 1e-13);  // both ends are in the table
    EXPECT_NEAR(t(650.0), f(650.0), 1e-13);
}

TEST(PolyTable, RefinesCellsWhereTheFunctionBendsSharply) {
    // exp(-x) / x on [0.01, 10]: steep at the left end.
    const auto f = [](double x) { return std::exp(-x) / x; };
    const PolyTable t(f, 0.01, 10.0, {16, 10, 0.0, 1e-12});
    EXPECT_EQ(t.missedCells(), 0u);
    EXPECT_GT(t.pieceCount(), 16u);  // the first cells were split
    std::mt19937_64 rng(9);
    std::uniform_real_distribution<double> x(0.01, 10.0);
    for (int i = 0; i < 100000; ++i) {
        const double v = x(rng);
        ASSERT_NEAR(t(v) / f(v), 1.0, 4e-12) << v;
    }
}

TEST(PolyTable, SingularEndIsLeftToTheCaller) {
    // sqrt(1 - x) has an unbounded derivative at x = 1: no polynomial meets 1e-14 there.
    const auto f = [](double x) { return std::sqrt(1.0 - x); };
    const PolyTable t(f, 0.0, 1.0, {32, 6, 1e-14, 0.0});
    EXPECT_GE(t.missedCells(), 1u);
    EXPECT_TRUE(std::isnan(t(1.0)));
    EXPECT_TRUE(std::isnan(t(0.9999)));
    EXPECT_NEAR(t(0.5), f(0.5), 1e-14);  // the cells away from it answer
    EXPECT_LE(worstError(t, f), 2e-14);
}

TEST(PolyTable, AnswersNothingOutsideItsRangeOrWhenEmpty) {
    const PolyTable t([](double x) { return x * x; }, 1.0, 2.0, {8, 2, 1e-14, 0.0});
    EXPECT_TRUE(std::isnan(t(0.999)));
    EXPECT_TRUE(std::isnan(t(2.001)));
    EXPECT_TRUE(std::isnan(t(std::nan(""))));
    EXPECT_NEAR(t(1.5), 2.25, 1e-14);
    const PolyTable empty;
    EXPECT_TRUE(empty.empty());
    EXPECT_TRUE(std::isnan(empty(0.0)));
    EXPECT_TRUE(std::isnan(empty(1.0)));
}

}  // namespace
}  // namespace pw
