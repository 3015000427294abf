// Recovery of published equations from synthetic data: noise-free to 1e-6 relative in the
// coefficients, 0.1 % noise within the noise.
#include <gtest/gtest.h>

#include <cmath>
#include <functional>

#include "core/fit/fit.h"
#include "core/model_spec.h"
#include "tests/core/fit/fit_test_util.h"

namespace pw::fit {
namespace {

using test::sample;
using test::wagner;

// CO2 vapor pressure: Span & Wagner (1996), J. Phys. Chem. Ref. Data 25, 1509, eq. (3.13):
// T_c = 304.1282 K, p_c = 7.3773 MPa, exponents 1, 1.5, 2, 4.
constexpr double kTcCO2 = 304.1282;
constexpr double kPcCO2 = 7.3773e6;
const std::vector<double> kACO2{-7.0602087, 1.9391218, -1.6463597, -3.2995634};
const std::vector<double> kECO2{1.0, 1.5, 2.0, 4.0};
double pCO2(double T) { return wagner(T, kTcCO2, kPcCO2, kACO2, kECO2); }

// Water vapor pressure: IAPWS SR1-86 (1992) / Wagner & Pruss (1993), J. Phys. Chem. Ref. Data
// 22, 783, eq. (2.5): T_c = 647.096 K, p_c = 22.064 MPa (coefficients from memory; checked
// below against the IAPWS-95 normal boiling point).
const std::vector<double> kAH2O{-7.85951783, 1.84408259,  -11.7866497,
                                22.6807411,  -15.9618719, 1.80122502};
const std::vector<double> kEH2O{1.0, 1.5, 3.0, 3.5, 4.0, 7.5};
double pH2O(double T) { return wagner(T, 647.096, 22.064e6, kAH2O, kEH2O); }

FitRequest wagnerRequest(double Tc, double Pc, std::string exponents) {
    FitRequest r;
    r.kind = BoundaryKind::Vaporization;
    r.model = "wagner";
    r.Tc_K = Tc;
    r.Pc_Pa = Pc;
    r.exponents = std::move(exponents);
    return r;
}

void expectCoefficients(const FitResult &r, const std::vector<double> &expected, double rel) {
    ASSERT_EQ(r.parameters.size(), expected.size());
    for (std::size_t i = 0; i < expected.size(); ++i) {
        EXPECT_NEAR(r.parameters[i].value, expected[i], rel * std::abs(expected[i]))
            << r.parameters[i].name;
    }
}

// "Recovered within the noise": over the data span the fitted curve deviates from the true one
// by an RMS below half the noise level (the data scatter by the full level) and by at most
// 1.5 times the noise level anywhere (the ends of the span are the least constrained).
void expectWithinNoise(const FitResult &r, const std::function<double(double)> &truth, double T0,
                       double T1, double sigma) {
    double sum = 0.0;
    int n = 0;
    for (double T = T0; T <= T1; T += (T1 - T0) / 200.0, ++n) {
        const double dev = r.pressure(T) / truth(T) - 1.0;
        EXPECT_LT(std::abs(dev), 1.5 * sigma) << "T = " << T;
        sum += dev * dev;
    }
    EXPECT_LT(std::sqrt(sum / n), 0.5 * sigma);
    // The residual scatter is the injected noise.
    EXPECT_GT(r.rms_pct, 0.7 * 100.0 * sigma);
    EXPECT_LT(r.rms_pct, 1.3 * 100.0 * sigma);
}

TEST(FitRecovery, GeneratorsReproducePublishedValues) {
    // Span & Wagner (1996), Table 3.1 / eq. (3.13): p at the triple point 216.592 K = 0.51795 MPa.
    EXPECT_NEAR(pCO2(216.592) / 0.51795e6, 1.0, 2e-4);
    // IAPWS-95 normal boiling point 373.1243 K at 101325 Pa (Wagner & Pruss 2002, Table 13.1);
    // SR1-86 agrees with IAPWS-95 to better than 0.01 % here.
    EXPECT_NEAR(pH2O(373.1243) / 101325.0, 1.0, 1e-4);
}

TEST(FitRecovery, WagnerCO2NoiseFree) {
    const auto data = sample(pCO2, 216.592, 304.0, 40);
    const auto r = fitBoundary(data, wagnerRequest(kTcCO2, kPcCO2, "1,1.5,2,4"));
    expectCoefficients(r, kACO2, 1e-6);
    EXPECT_LT(r.maxAbs_pct, 1e-8);
    EXPECT_EQ(r.spec.form, "wagner");
    EXPECT_DOUBLE_EQ(r.validity.min_K, 216.592);
    EXPECT_DOUBLE_EQ(r.validity.max_K, 304.0);
}

TEST(FitRecovery, WagnerWaterSixTermsNoiseFree) {
    const auto data = sample(pH2O, 273.16, 645.0, 60);
    const auto r = fitBoundary(data, wagnerRequest(647.096, 22.064e6, "1,1.5,3,3.5,4,7.5"));
    expectCoefficients(r, kAH2O, 1e-6);
}

TEST(FitRecovery, WagnerCO2WithNoiseWithinTheNoise) {
    const auto data = sample(pCO2, 216.592, 304.0, 40, 1e-3);
    const auto r = fitBoundary(data, wagnerRequest(kTcCO2, kPcCO2, "1,1.5,2,4"));
    expectWithinNoise(r, pCO2, 216.592, 304.0, 1e-3);
    // Every coefficient within 4 of its standard errors of the published value.
    for (std::size_t i = 0; i < kACO2.size(); ++i) {
        EXPECT_LT(std::abs(r.parameters[i].value - kACO2[i]), 4.0 * r.parameters[i].stdError);
    }
}

// IAPWS R14-08 sublimation of ice Ih: T_t = 273.16 K, p_t = 611.657 Pa (Table 3 of R14-08).
const std::vector<double> kASub{-0.212144006e2, 0.273203819e2, -0.610598130e1};
const std::vector<double> kBSub{0.333333333e-2, 0.120666667e1, 0.170333333e1};
double pSub(double T) {
    const double th = T / 273.16;
    double s = 0.0;
    for (int i = 0; i < 3; ++i) s += kASub[i] * std::pow(th, kBSub[i]);
    return 611.657 * std::exp(s / th);
}

TEST(FitRecovery, IapwsSublimationNoiseFree) {
    // R14-08 check value: 230 K -> 8.94735e-6 MPa.
    EXPECT_NEAR(pSub(230.0) / 8.94735, 1.0, 1e-6);
    const auto data = sample(pSub, 190.0, 273.16, 30);
    FitRequest rq;
    rq.kind = BoundaryKind::Sublimation;
    rq.model = "iapws-sublimation";
    rq.Tt_K = 273.16;
    rq.Pt_Pa = 611.657;
    rq.exponents = "0.333333333e-2,0.120666667e1,0.170333333e1";
    const auto r = fitBoundary(data, rq);
    expectCoefficients(r, kASub, 1e-6);
}

// Water, Antoine form log10(p/bar) = 4.6543 - 1435.264 / (T/K - 64.848), 255.9-373 K
// (Bridgeman & Aldrich 1964, J. Heat Transfer 86, 279; from memory). In Pa: A + 5.
constexpr double kAntA = 4.6543 + 5.0, kAntB = 1435.264, kAntC = -64.848;
double pAntoine(double T) { return std::pow(10.0, kAntA - kAntB / (T + kAntC)); }

TEST(FitRecovery, AntoineNoiseFree) {
    // Plausibility of the recalled constants: IAPWS-95 gives 3536.8 Pa at 300 K (Wagner &
    // Pruss 2002, Table 13.1); an Antoine fit of that range is good to about 1 % (common practice).
    EXPECT_NEAR(pAntoine(300.0) / 3536.8, 1.0, 0.01);
    const auto data = sample(pAntoine, 256.0, 373.0, 30);
    FitRequest rq;
    rq.model = "antoine";
    const auto r = fitBoundary(data, rq);
    expectCoefficients(r, {kAntA, kAntB, kAntC}, 1e-6);
}

TEST(FitRecovery, AntoineWithNoiseWithinTheNoise) {
    const auto data = sample(pAntoine, 256.0, 373.0, 40, 1e-3, 7u);
    FitRequest rq;
    rq.model = "antoine";
    const auto r = fitBoundary(data, rq);
    expectWithinNoise(r, pAntoine, 256.0, 373.0, 1e-3);
    const std::vector<double> truth{kAntA, kAntB, kAntC};
    for (std::size_t i = 0; i < truth.size(); ++i) {
        EXPECT_LT(std::abs(r.parameters[i].value - truth[i]), 4.0 * r.parameters[i].stdError);
    }
}

TEST(FitRecovery, ClausiusClapeyronReportsEnthalpy) {
    // Self-consistency (invented coefficients): ln p = 25 - 5000 K / T.
    const auto data = sample([](double T) { return std::exp(25.0 - 5000.0 / T); }, 250, 300, 11);
    FitRequest rq;
    rq.kind = BoundaryKind::Sublimation;
    rq.model = "clausius-clapeyron";
    const auto r = fitBoundary(data, rq);
    expectCoefficients(r, {25.0, 5000.0}, 1e-9);
    ASSERT_TRUE(r.dH_J_mol.has_value());
    // dH = R B with R = 8.314462618 J/(mol K) (CODATA 2018).
    EXPECT_NEAR(*r.dH_J_mol, 8.314462618 * 5000.0, 1e-6);
    EXPECT_NEAR(r.spec.scalars.at("dH_J_mol"), *r.dH_J_mol, 1e-9);
}

// Ice VI melting line, IAPWS R14-08 eq. (6): p/p_ref = 1 - 1.07476 (1 - theta^4.6),
// T_ref = 273.31 K, p_ref = 632.4 MPa; as Simon–Glatzel: a = 1.07476 p_ref, c = 4.6.
double pIceVI(double T) { return 632.4e6 * (1.0 - 1.07476 * (1.0 - std::pow(T / 273.31, 4.6))); }

TEST(FitRecovery, SimonGlatzelIceVINoiseFree) {
    // R14-08 check value: ice VI at 320 K -> 1356.76 MPa.
    EXPECT_NEAR(pIceVI(320.0) / 1356.76e6, 1.0, 1e-5);
    const auto data = sample(pIceVI, 273.31, 355.0, 25);
    FitRequest rq;
    rq.kind = BoundaryKind::Melting;
    rq.model = "simon-glatzel";
    rq.Tt_K = 273.31;
    rq.Pt_Pa = 632.4e6;
    const auto r = fitBoundary(data, rq);
    expectCoefficients(r, {1.07476 * 632.4e6, 4.6}, 1e-6);
}

TEST(FitRecovery, SimonGlatzelIceVIWithNoise) {
    const auto data = sample(pIceVI, 273.31, 355.0, 25, 1e-3, 11u);
    FitRequest rq;
    rq.kind = BoundaryKind::Melting;
    rq.model = "simon-glatzel";
    rq.Tt_K = 273.31;
    rq.Pt_Pa = 632.4e6;
    const auto r = fitBoundary(data, rq);
    expectWithinNoise(r, pIceVI, 273.31, 355.0, 1e-3);
}

TEST(FitRecovery, MeltingPolynomialNoiseFree) {
    // Self-consistency (invented coefficients), a falling line as for ice Ih:
    // p/p_ref = 1 - 30 (theta - 1) + 50 (theta - 1)^2 ... below T_ref.
    const auto p = [](double T) {
        const double d = T / 273.16 - 1.0;
        return 611.657 * (1.0 - 3.0e5 * d + 4.0e6 * d * d - 1.0e7 * d * d * d);
    };
    const auto data = sample(p, 252.0, 273.0, 20);
    FitRequest rq;
    rq.kind = BoundaryKind::Melting;
    rq.model = "melting-polynomial";
    rq.Tt_K = 273.16;
    rq.Pt_Pa = 611.657;
    const auto r = fitBoundary(data, rq);
    expectCoefficients(r, {-3.0e5, 4.0e6, -1.0e7}, 1e-6);
}

TEST(FitRecovery, SpecEvaluatesWithMakeModel) {
    const auto data = sample(pCO2, 216.592, 304.0, 40, 1e-3);
    const auto r = fitBoundary(data, wagnerRequest(kTcCO2, kPcCO2, "1-1.5-3-6"));
    const auto model = makeModel(r.spec);
    for (double T = 220.0; T < 304.0; T += 7.0) {
        EXPECT_NEAR(model->pressure(T) / r.pressure(T), 1.0, 1e-12) << T;
    }
    FitRequest ant;
    ant.model = "antoine";
    const auto a = fitBoundary(data, ant);
    EXPECT_NEAR(makeModel(a.spec)->pressure(250.0) / a.pressure(250.0), 1.0, 1e-12);
}

}  // namespace
}  // namespace pw::fit
