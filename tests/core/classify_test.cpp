// classify(): phase, solid form, nearest boundary and margins for water (IAPWS) and carbon
// dioxide (Span & Wagner 1996), on both sides of every boundary, next to the triple and
// critical points, and in every ice region of IAPWS R14-08.
#include "core/classify.h"

#include <gtest/gtest.h>

#include <cmath>
#include <limits>
#include <string>

#include "core/errors.h"
#include "core/library.h"
#include "models/reference_specs.h"

namespace pw {
namespace {

// Reference boundary temperatures T_b(p): python3-iapws 1.5.2 (Debian), the R14-08 functions
// iapws._iapws._Sublimation_Pressure / _Melting_Pressure and the SR1-86 auxiliary equation
// IAPWS95._Vapor_Pressure, inverted with scipy.optimize.brentq (xtol 1e-13).
struct Crossing {
    const char *boundary;
    double p_Pa, Tb_K;
    Phase below, above;
    const char *solidForm;
};
constexpr Crossing kWater[] = {
    {"sublimation (ice Ih)", 1.0, 212.5733568341578, Phase::Solid, Phase::Vapor, "ice Ih"},
    {"sublimation (ice Ih)", 10.0, 230.96066158810027, Phase::Solid, Phase::Vapor, "ice Ih"},
    {"sublimation (ice Ih)", 100.0, 252.81830639561767, Phase::Solid, Phase::Vapor, "ice Ih"},
    {"sublimation (ice Ih)", 600.0, 272.9265468095201, Phase::Solid, Phase::Vapor, "ice Ih"},
    {"vaporization", 1000.0, 280.12047953814124, Phase::Liquid, Phase::Vapor, ""},
    {"vaporization", 101325.0, 373.1242958054116, Phase::Liquid, Phase::Vapor, ""},
    {"vaporization", 1e6, 453.02797054821673, Phase::Liquid, Phase::Vapor, ""},
    {"vaporization", 20e6, 638.8971822988512, Phase::Liquid, Phase::Vapor, ""},
    {"melting (ice Ih)", 101325.0, 273.1525190797695, Phase::Solid, Phase::Liquid, "ice Ih"},
    {"melting (ice Ih)", 1e6, 273.0856240392605, Phase::Solid, Phase::Liquid, "ice Ih"},
    {"melting (ice Ih)", 100e6, 264.2087463240427, Phase::Solid, Phase::Liquid, "ice Ih"},
    {"melting (ice III)", 300e6, 254.96426160965245, Phase::Solid, Phase::Liquid, "ice III"},
    {"melting (ice V)", 500e6, 266.21729613628384, Phase::Solid, Phase::Liquid, "ice V"},
    {"melting (ice VI)", 1000e6, 300.2428228760331, Phase::Solid, Phase::Liquid, "ice VI"},
    {"melting (ice VII)", 5000e6, 511.29501161976066, Phase::Solid, Phase::Liquid, "ice VII"},
};

class WaterClassify : public ::testing::Test {
protected:
    PhaseDiagram d{testdata::water()};
};

TEST_F(WaterClassify, BothSidesOfEveryBoundaryAndEveryIceRegion) {
    for (const Crossing &x : kWater) {
        SCOPED_TRACE(std::string(x.boundary) + " at " + std::to_string(x.p_Pa) + " Pa");
        const Classification lo = classify(d, x.Tb_K - 0.05, x.p_Pa);
        const Classification hi = classify(d, x.Tb_K + 0.05, x.p_Pa);
        EXPECT_EQ(lo.phase, x.below);
        EXPECT_EQ(hi.phase, x.above);
        const Classification &solid = x.below == Phase::Solid ? lo : hi;
        if (*x.solidForm) {
            EXPECT_EQ(solid.solidForm, x.solidForm);
        }
        for (const Classification *c : {&lo, &hi}) {
            EXPECT_EQ(c->nearestLabel, x.boundary);
            EXPECT_FALSE(c->onBoundary);
        }
        // dT = T - T_b(p); the auxiliary equations agree with python3-iapws to 1e-6 K.
        EXPECT_NEAR(lo.dT_K, -0.05, 2e-6);
        EXPECT_NEAR(hi.dT_K, 0.05, 2e-6);
    }
}

TEST_F(WaterClassify, FreezeDryingMarginsMatchR1408) {
    // -40 °C product at 10 Pa chamber: ice sublimes (vapor side). python3-iapws R14-08:
    // p_sub(233.15 K) = 12.841171771 Pa; T_sub(10 Pa) = 230.96066159 K.
    const Classification c = classify(d, 233.15, 10.0);
    EXPECT_EQ(c.phase, Phase::Vapor);
    EXPECT_EQ(c.nearestLabel, "sublimation (ice Ih)");
    EXPECT_NEAR(c.dT_K, 233.15 - 230.96066158810027, 1e-6);
    EXPECT_NEAR(c.dP_Pa, 10.0 - 12.841171771034436, 1e-6);
    // -45 °C at 10 Pa: below the frost point of 10 Pa, the ice stays (p_sub = 7.2032 Pa).
    const Classification s = classify(d, 228.15, 10.0);
    EXPECT_EQ(s.phase, Phase::Solid);
    EXPECT_EQ(s.solidForm, "ice Ih");
    EXPECT_NEAR(s.dP_Pa, 10.0 - 7.203241334308151, 1e-6);
}

TEST_F(WaterClassify, NextToTheTriplePoint) {
    // Triple point 273.16 K / 611.657 Pa (IAPWS R14-08).
    EXPECT_EQ(classify(d, 273.17, 611.0).phase, Phase::Vapor);   // below pt: above T_sub
    EXPECT_EQ(classify(d, 273.14, 611.0).phase, Phase::Solid);   // T_sub(611 Pa) = 273.15 K
    EXPECT_EQ(classify(d, 273.15, 612.0).phase, Phase::Solid);   // T_melt(612 Pa) ~ 273.16 K
    EXPECT_EQ(classify(d, 273.17, 700.0).phase, Phase::Liquid);  // T_vap(700 Pa) ~ 274.9 K
    EXPECT_EQ(classify(d, 275.5, 700.0).phase, Phase::Vapor);
    const Classification c = classify(d, 273.16, 611.657);
    EXPECT_TRUE(c.onBoundary);
}

TEST_F(WaterClassify, NextToTheCriticalPoint) {
    // Critical point 647.096 K / 22.064 MPa (IAPWS R6-95).
    const Classification gas = classify(d, 647.1, 22.06e6);
    EXPECT_EQ(gas.phase, Phase::Gas);
    EXPECT_EQ(gas.nearestLabel, "critical point");
    EXPECT_NEAR(gas.dT_K, 647.1 - 647.096, 1e-9);
    EXPECT_NEAR(gas.dP_Pa, 22.06e6 - 22.064e6, 1e-3);
    EXPECT_EQ(classify(d, 647.1, 22.07e6).phase, Phase::Supercritical);
    EXPECT_EQ(classify(d, 647.09, 22.07e6).phase, Phase::Liquid);  // compressed liquid
    // T_vap(22.0 MPa) = 646.86 K (SR1-86 slope ~0.27 MPa/K near Tc): vapor just above it.
    EXPECT_EQ(classify(d, 647.09, 22.0e6).phase, Phase::Vapor);
    EXPECT_EQ(classify(d, 646.5, 22.0e6).phase, Phase::Liquid);
    // Far above Tc at low pressure: gas, not vapor (T >= Tc, p < pc).
    EXPECT_EQ(classify(d, 700.0, 100.0).phase, Phase::Gas);
}

TEST_F(WaterClassify, SolidFormWhereNoDataFixesIt) {
    // R14-08 gives only melting lines: at 300 MPa below the ice III segment (251.165 K) the
    // solid form is not fixed by any data; below the Ih-III-liquid triple point pressure
    // (208.566 MPa) a cold solid is ice Ih.
    const Classification unknownForm = classify(d, 240.0, 300e6);
    EXPECT_EQ(unknownForm.phase, Phase::Solid);
    EXPECT_EQ(unknownForm.solidForm, "unknown");
    const Classification ih = classify(d, 200.0, 100e6);
    EXPECT_EQ(ih.phase, Phase::Solid);
    EXPECT_EQ(ih.solidForm, "ice Ih");
    EXPECT_EQ(classify(d, 253.0, 300e6).solidForm, "ice III");  // inside the III segment
}

TEST_F(WaterClassify, OnBoundaryToleranceIsSettable) {
    const double Tb = 373.1242958054116;                        // python3-iapws, see kWater
    EXPECT_TRUE(classify(d, Tb + 0.005, 101325.0).onBoundary);  // default 0.01 K
    EXPECT_FALSE(classify(d, Tb + 0.05, 101325.0).onBoundary);
    ClassifyOptions wide;
    wide.onBoundary_K = 0.1;
    EXPECT_TRUE(classify(d, Tb + 0.05, 101325.0, wide).onBoundary);
    ClassifyOptions none;
    none.onBoundary_K = 0.0;
    none.onBoundaryRel = 0.0;
    EXPECT_FALSE(classify(d, Tb + 0.005, 101325.0, none).onBoundary);
    EXPECT_NE(flagsText(classify(d, Tb + 0.005, 101325.0)).find("on_boundary"), std::string::npos);
}

TEST_F(WaterClassify, WithinTheStatedUncertainty) {
    Substance w = testdata::water();
    for (Boundary &b : w.boundaries)
        if (b.kind == BoundaryKind::Vaporization) b.uncertaintyRel = 0.01;  // test value
    const PhaseDiagram wd(std::move(w));
    // 1 atm boils at 373.124 K; dp/dT there is 3.6 kPa/K (common practice: ~3.6 % per K).
    EXPECT_TRUE(classify(wd, 373.124 + 0.1, 101325.0).withinUncertainty);   // ~0.36 %
    EXPECT_FALSE(classify(wd, 373.124 + 1.0, 101325.0).withinUncertainty);  // ~3.6 %
    EXPECT_FALSE(classify(d, 373.124 + 0.1, 101325.0).withinUncertainty);   // none stated
}

TEST_F(WaterClassify, ExtrapolationIsFlaggedAndNoDataIsUnknown) {
    // The ice VII melting line is valid to 715 K, 20.62 GPa (R14-08); 20.65 GPa lies just beyond
    // (its equation still answers: flagged), 25 GPa beyond where the equation is used at all.
    const Classification c = classify(d, 300.0, 20.65e9);
    EXPECT_EQ(c.phase, Phase::Solid);
    EXPECT_TRUE(c.extrapolated);
    EXPECT_NE(flagsText(c).find("extrapolated"), std::string::npos);
    EXPECT_FALSE(classify(d, 300.0, 1e5).extrapolated);
    const Classification u = classify(d, 300.0, 25e9);
    EXPECT_EQ(u.phase, Phase::Unknown);
    EXPECT_FALSE(u.reason.empty());
}

TEST_F(WaterClassify, RefusesNonPhysicalInput) {
    EXPECT_THROW(classify(d, 0.0, 1e5), DomainError);
    EXPECT_THROW(classify(d, -5.0, 1e5), DomainError);
    EXPECT_THROW(classify(d, 300.0, 0.0), DomainError);
    EXPECT_THROW(classify(d, std::numeric_limits<double>::quiet_NaN(), 1e5), DomainError);
    EXPECT_THROW(classify(d, 300.0, std::numeric_limits<double>::infinity()), DomainError);
}

// Carbon dioxide, Span & Wagner (1996): boundary pressures evaluated here directly from the
// published auxiliary equations (3.10 melting, 3.12 sublimation, 3.13 vapor pressure), so
// that T_b(p) = T by construction.
constexpr double kTt = 216.592, kPt = 0.51795e6, kTc = 304.1282, kPc = 7.3773e6;
double co2Vapor(double T) {
    const double t = 1.0 - T / kTc;
    return kPc * std::exp(kTc / T *
                          (-7.0602087 * t + 1.9391218 * std::pow(t, 1.5) - 1.6463597 * t * t -
                           3.2995634 * std::pow(t, 4)));
}
double co2Sublimation(double T) {
    const double t = 1.0 - T / kTt;
    return kPt *
           std::exp(kTt / T *
                    (-14.740846 * t + 2.4327015 * std::pow(t, 1.9) - 5.3061778 * std::pow(t, 2.9)));
}
double co2Melting(double T) {
    const double x = T / kTt - 1.0;
    return kPt * (1.0 + 1955.5390 * x + 2055.4593 * x * x);
}

class Co2Classify : public ::testing::Test {
protected:
    PhaseDiagram d{testdata::carbonDioxide()};
    void sides(double T, double p, Phase below, Phase above, const char *label) {
        SCOPED_TRACE(std::string(label) + " at " + std::to_string(T) + " K");
        const Classification lo = classify(d, T - 0.05, p), hi = classify(d, T + 0.05, p);
        EXPECT_EQ(lo.phase, below);
        EXPECT_EQ(hi.phase, above);
        EXPECT_EQ(lo.nearestLabel, label);
        EXPECT_NEAR(lo.dT_K, -0.05, 1e-6);
        EXPECT_NEAR(hi.dT_K, 0.05, 1e-6);
    }
};

TEST_F(Co2Classify, BothSidesOfEveryBoundary) {
    for (double T : {160.0, 194.7, 210.0})
        sides(T, co2Sublimation(T), Phase::Solid, Phase::Vapor, "sublimation");
    for (double T : {220.0, 273.15, 300.0})
        sides(T, co2Vapor(T), Phase::Liquid, Phase::Vapor, "vaporization");
    for (double T : {220.0, 250.0, 290.0})
        sides(T, co2Melting(T), Phase::Solid, Phase::Liquid, "melting");
    // Above Tc the melting line borders the supercritical fluid.
    const double p = co2Melting(320.0);
    EXPECT_EQ(classify(d, 319.9, p).phase, Phase::Solid);
    EXPECT_EQ(classify(d, 320.1, p).phase, Phase::Supercritical);
}

TEST_F(Co2Classify, DryIceAndTheTriplePoint) {
    // Common practice: dry ice sublimes at -78.5 °C (194.7 K) at 1 atm.
    EXPECT_EQ(classify(d, 194.0, 101325.0).phase, Phase::Solid);
    EXPECT_EQ(classify(d, 195.5, 101325.0).phase, Phase::Vapor);
    EXPECT_EQ(classify(d, 194.0, 101325.0).solidForm, "solid");
    // Around the triple point 216.592 K / 0.51795 MPa.
    // T_sub(0.50 MPa) = 216.07 K (eq. 3.12).
    EXPECT_EQ(classify(d, 215.9, 0.50e6).phase, Phase::Solid);
    EXPECT_EQ(classify(d, 216.3, 0.50e6).phase, Phase::Vapor);
    // Below the sublimation equation's range (150 K in these data): answered, flagged.
    const Classification cold = classify(d, 139.0, 70.0);
    EXPECT_EQ(cold.phase, Phase::Vapor);
    EXPECT_TRUE(cold.extrapolated);
    EXPECT_EQ(classify(d, 216.62, 0.52e6).phase, Phase::Liquid);
    EXPECT_EQ(classify(d, 216.58, 0.52e6).phase, Phase::Solid);
}

TEST_F(Co2Classify, SupercriticalAndCompressedLiquid) {
    const Classification sc = classify(d, 313.15, 10e6);
    EXPECT_EQ(sc.phase, Phase::Supercritical);
    EXPECT_EQ(sc.nearestLabel, "critical point");
    EXPECT_NEAR(sc.dT_K, 313.15 - kTc, 1e-9);
    EXPECT_NEAR(sc.dP_Pa, 10e6 - kPc, 1e-3);
    EXPECT_EQ(classify(d, 288.15, 10e6).phase, Phase::Liquid);
    EXPECT_EQ(classify(d, 288.15, 6e6).phase, Phase::Liquid);  // p_vap(15 °C) = 5.09 MPa
    EXPECT_EQ(classify(d, 313.15, 0.1e6).phase, Phase::Gas);
    EXPECT_EQ(classify(d, 304.2, 7.38e6).phase, Phase::Supercritical);
    EXPECT_EQ(classify(d, 304.1, 7.38e6).phase, Phase::Liquid);
}

TEST(ClassifyMissingData, UnknownWithAReasonNeverAGuess) {
    Substance c = testdata::carbonDioxide();
    std::erase_if(c.boundaries, [](const Boundary &b) { return b.kind == BoundaryKind::Melting; });
    const PhaseDiagram d(std::move(c));
    // 2 MPa: T_vap = 253.6 K (eq. 3.13). Below it, solid or liquid cannot be told.
    const Classification u = classify(d, 240.0, 2e6);
    EXPECT_EQ(u.phase, Phase::Unknown);
    EXPECT_NE(u.reason.find("melting"), std::string::npos);
    EXPECT_EQ(classify(d, 260.0, 2e6).phase, Phase::Vapor);     // above T_vap: vapor regardless
    EXPECT_EQ(classify(d, 350.0, 20e6).phase, Phase::Unknown);  // above pc: no melting data
    EXPECT_EQ(toString(Phase::Unknown), "unknown");
}

// The melting lookup is skipped for points at pt < p < pc at least as warm as the ceiling;
// that is exact only if no melting temperature there reaches it. Checked on every bundled
// substance at 2000 pressures (water's whole grid is also checked against python3-iapws by
// water_margins_check.py).
TEST(ClassifyMeltCeiling, NoMeltingTemperatureBetweenPtAndPcReachesIt) {
    const SubstanceLibrary library = SubstanceLibrary::bundled();
    for (const auto &d : library.all()) {
        SCOPED_TRACE(d->substance().id);
        const double ceiling = Classifier(*d).meltCeilingBelowPc();
        if (!d->triplePoint() || !d->criticalPoint()) continue;
        const double pt = d->triplePoint()->P_Pa, pc = d->criticalPoint()->P_Pa;
        for (int i = 1; i < 2000; ++i) {
            const double p = pt * std::pow(pc / pt, i / 2000.0);
            const auto melt = d->meltingTemperature(p);
            if (!melt) continue;
            ASSERT_LE(melt->value, ceiling) << p << " Pa";
        }
    }
    // Water: the ice Ih melting curve falls from the triple point, 273.16 K (IAPWS R14-08).
    const auto water = library.find("water");
    EXPECT_NEAR(Classifier(*water).meltCeilingBelowPc(), 273.16, 2e-6);  // 1e-6 K margin
    // CO2: the melting temperature at pc (Span & Wagner 1996 melting equation, 7.3773 MPa:
    // about 218 K), so the shortcut applies to most fluid points below pc.
    const double co2 = Classifier(*library.find("carbon-dioxide")).meltCeilingBelowPc();
    EXPECT_GT(co2, 216.59);
    EXPECT_LT(co2, 220.0);
}

}  // namespace
}  // namespace pw
