// Bad data and bad requests give clear errors naming the row; warnings for under-determined,
// ill-conditioned, extrapolated and over-fitted cases.
#include <gtest/gtest.h>

#include <cmath>
#include <sstream>

#include "core/errors.h"
#include "core/fit/fit.h"
#include "tests/core/fit/fit_test_util.h"

namespace pw::fit {
namespace {

FitData csv(const std::string &text) {
    std::istringstream in(text);
    return readFitCsv(in, "data.csv");
}

FitRequest antoine() {
    FitRequest r;
    r.model = "antoine";
    return r;
}

// Expects fitBoundary (or the CSV read) to throw an InputError whose message contains `what`.
template <typename F>
void expectInputError(F f, long row, const std::string &what) {
    try {
        f();
        ADD_FAILURE() << "no error; expected: " << what;
    } catch (const InputError &e) {
        EXPECT_EQ(e.row(), row) << e.what();
        EXPECT_NE(std::string(e.what()).find(what), std::string::npos) << e.what();
        EXPECT_NE(std::string(e.what()).find("data.csv"), std::string::npos) << e.what();
    }
}

TEST(FitInput, ReadsUnitsFromHeaderBrackets) {
    const auto d = csv("T [degC]; P [kPa]; weight\n0; 0.611657; 2\n\n25;3.1698;1\n");
    ASSERT_EQ(d.points.size(), 2u);
    EXPECT_DOUBLE_EQ(d.points[0].T_K, 273.15);
    EXPECT_DOUBLE_EQ(d.points[0].P_Pa, 611.657);
    EXPECT_DOUBLE_EQ(d.points[0].weight, 2.0);
    EXPECT_EQ(d.points[0].row, 2);
    EXPECT_EQ(d.points[1].row, 4);
    EXPECT_DOUBLE_EQ(d.points[1].P_Pa, 3169.8);
}

TEST(FitInput, UnitOptionsApplyWithoutBrackets) {
    std::istringstream in("temperature,pressure\n-40,12.84\n");
    FitCsvOptions o;
    o.tUnit = "degC";
    o.pUnit = "Pa";
    const auto d = readFitCsv(in, "data.csv", o);
    ASSERT_EQ(d.points.size(), 1u);
    EXPECT_DOUBLE_EQ(d.points[0].T_K, 233.15);
}

TEST(FitInput, UnknownUnitNamesTheHeader) {
    expectInputError([] { csv("T [furlong],P [Pa]\n300,1000\n"); }, 1, "furlong");
}

TEST(FitInput, NotANumberNamesRowAndField) {
    expectInputError([] { csv("T [K],P [Pa]\n300,1000\n310,abc\n"); }, 3, "not a number");
    expectInputError([] { csv("T [K],P [Pa]\n300,1000\nnan,2000\n"); }, 3, "T [K]");
}

TEST(FitInput, NonPositivePressureIsRefused) {
    const auto d = csv("T [K],P [Pa]\n300,1000\n310,0\n320,3000\n330,4000\n");
    expectInputError([&] { fitBoundary(d, antoine()); }, 3, "pressure must be finite and above");
}

TEST(FitInput, DuplicateTemperatureNamesBothRows) {
    const auto d = csv("T [K],P [Pa]\n300,1000\n310,2000\n300,1100\n320,3000\n");
    expectInputError([&] { fitBoundary(d, antoine()); }, 4, "same as row 2");
}

TEST(FitInput, SinglePointIsRefused) {
    const auto d = csv("T [K],P [Pa]\n300,1000\n");
    expectInputError([&] { fitBoundary(d, antoine()); }, 2, "single data point");
}

TEST(FitInput, FewerPointsThanParameters) {
    const auto d = csv("T [K],P [Pa]\n300,1000\n310,2000\n");
    expectInputError([&] { fitBoundary(d, antoine()); }, 0, "fewer than the 3 parameters");
}

TEST(FitInput, WagnerPointAtOrAboveTcNamesTheRow) {
    const auto d = csv("T [K],P [MPa]\n280,4\n290,5\n300,6.7\n305,7.5\n310,8\n");
    FitRequest rq;
    rq.model = "wagner";
    rq.Tc_K = 304.1282;
    rq.Pc_Pa = 7.3773e6;
    expectInputError([&] { fitBoundary(d, rq); }, 5, "not below the reference temperature");
}

TEST(FitInput, BadRequestsAreErrors) {
    const auto d = test::sample([](double T) { return std::exp(20.0 - 4000.0 / T); }, 250, 300, 8);
    FitRequest rq;
    rq.model = "wagner";  // no T_c, p_c
    EXPECT_THROW(fitBoundary(d, rq), Error);
    rq.model = "simon-glatzel";  // not a vaporization form
    EXPECT_THROW(fitBoundary(d, rq), Error);
    rq.model = "no-such-form";
    EXPECT_THROW(fitBoundary(d, rq), Error);
    rq.kind = BoundaryKind::Sublimation;
    rq.model = "iapws-sublimation";  // no exponents
    rq.Tt_K = 300.0;
    rq.Pt_Pa = 1000.0;
    EXPECT_THROW(fitBoundary(d, rq), Error);
    rq.exponents = "1,x";
    EXPECT_THROW(fitBoundary(d, rq), Error);
}

double pCO2(double T) {
    // Span & Wagner (1996) eq. (3.13), as in fit_recovery_test.cpp.
    return test::wagner(T, 304.1282, 7.3773e6, {-7.0602087, 1.9391218, -1.6463597, -3.2995634},
                        {1.0, 1.5, 2.0, 4.0});
}

FitRequest wagner(const std::string &exponents) {
    FitRequest rq;
    rq.model = "wagner";
    rq.Tc_K = 304.1282;
    rq.Pc_Pa = 7.3773e6;
    rq.exponents = exponents;
    return rq;
}

bool hasWarning(const FitResult &r, const std::string &what) {
    for (const auto &w : r.warnings) {
        if (w.find(what) != std::string::npos) return true;
    }
    return false;
}

TEST(FitWarnings, ExactlyDeterminedHasNoStandardErrors) {
    const auto r = fitBoundary(test::sample(pCO2, 220.0, 300.0, 4), wagner("1,1.5,2,4"));
    EXPECT_EQ(r.degreesOfFreedom, 0);
    EXPECT_TRUE(hasWarning(r, "exactly determined"));
    EXPECT_TRUE(std::isnan(r.parameters[0].stdError));
}

TEST(FitWarnings, IllConditionedReportsConditionNumber) {
    const auto r = fitBoundary(test::sample(pCO2, 220.0, 300.0, 30), wagner("1,1.0001,2,4"));
    EXPECT_GT(r.conditionNumber, 1e5);
    EXPECT_TRUE(hasWarning(r, "ill-conditioned fit (condition number"));
    const auto good = fitBoundary(test::sample(pCO2, 220.0, 300.0, 30), wagner("1,1.5,2,4"));
    EXPECT_LT(good.conditionNumber, 1e5);
    EXPECT_FALSE(hasWarning(good, "ill-conditioned"));
}

TEST(FitWarnings, ExtrapolationToTheCriticalPoint) {
    const auto r = fitBoundary(test::sample(pCO2, 250.0, 280.0, 10), wagner(""));
    EXPECT_TRUE(hasWarning(r, "does not reach the critical temperature"));
    EXPECT_DOUBLE_EQ(r.validity.max_K, 280.0);
}

TEST(FitWarnings, LeaveOneOutFlagsOverFitting) {
    // Eight free exponents for ten points with 0.1 % noise: the fit follows the noise.
    const auto noisy = test::sample(pCO2, 220.0, 300.0, 10, 1e-3, 3u);
    const auto r = fitBoundary(noisy, wagner("1,1.5,2,2.5,3,4,5,6"));
    EXPECT_GT(r.looRms_pct, 3.0 * r.rms_pct);
    EXPECT_TRUE(hasWarning(r, "over-fitting"));
    // The four-term form on the same data passes the check.
    const auto ok = fitBoundary(noisy, wagner("1,1.5,2,4"));
    EXPECT_LT(ok.looRms_pct, 3.0 * ok.rms_pct);
    EXPECT_FALSE(hasWarning(ok, "over-fitting"));
}

TEST(FitWarnings, WeightsChangeTheFit) {
    auto d = test::sample(pCO2, 220.0, 300.0, 12, 1e-3, 5u);
    const auto plain = fitBoundary(d, wagner("1,1.5,2,4"));
    d.points[3].weight = 100.0;
    const auto weighted = fitBoundary(d, wagner("1,1.5,2,4"));
    EXPECT_LT(std::abs(weighted.residuals[3].dev_pct), std::abs(plain.residuals[3].dev_pct));
}

TEST(FitWarnings, AbsoluteResidualsFavourHighPressures) {
    const auto d = test::sample(pCO2, 220.0, 300.0, 20, 1e-3, 9u);
    auto rq = wagner("1,1.5,2,4");
    rq.residuals = ResidualKind::Absolute;
    const auto abs = fitBoundary(d, rq);
    const auto rel = fitBoundary(d, wagner("1,1.5,2,4"));
    EXPECT_LT(abs.rms_Pa, rel.rms_Pa);
    EXPECT_GT(abs.rms_pct, rel.rms_pct);
}

}  // namespace
}  // namespace pw::fit
