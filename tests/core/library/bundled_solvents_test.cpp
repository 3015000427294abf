// The bundled solvent and refrigerant files (ammonia, ethanol, diethyl ether, acetone,
// tert-butanol) checked against values from outside the project: handbook boiling and melting
// points, published triple points, and vapor-pressure equations from other handbooks than the
// one each file uses. Every check names its source and its tolerance beside it.
#include <gtest/gtest.h>

#include <algorithm>
#include <cmath>
#include <memory>
#include <optional>
#include <stdexcept>
#include <string>
#include <string_view>

#include "core/library.h"
#include "core/substance_io.h"
#include "resources/bundled.h"

namespace {

constexpr double kMmHg = 101325.0 / 760.0;  // Pa per mmHg (common practice)
constexpr double kZeroC = 273.15;           // K

constexpr std::string_view kIds[] = {"ammonia",      "ethanol", "diethyl-ether", "acetone",
                                     "tert-butanol", "propane", "methanol"};

std::shared_ptr<const pw::PhaseDiagram> diagram(std::string_view key) {
    return pw::SubstanceLibrary::bundled().find(key);
}

// The vapor pressure of the bundled curve, also outside its published range.
double vapor(const pw::PhaseDiagram &d, double T) { return d.vaporization()->model->pressure(T); }

double normalBoilingPoint(const pw::PhaseDiagram &d) {
    const auto nbp = d.normalBoilingPoint();
    if (!nbp) throw std::runtime_error("no normal boiling point for " + d.substance().id);
    return *nbp;
}

// Reid, Prausnitz and Sherwood (1977), The Properties of Gases and Liquids, 3rd ed., Appendix
// A: ln(P/mmHg) = A - B/(T/K + C).
double rpsAntoine(double A, double B, double C, double T) {
    return std::exp(A - B / (T + C)) * kMmHg;
}

// Smith, Van Ness, Abbott and Swihart, Introduction to Chemical Engineering Thermodynamics,
// Table B.2: ln(P/kPa) = A - B/(t/degC + C).
double svnaAntoine(double A, double B, double C, double T) {
    return 1000.0 * std::exp(A - B / (T - kZeroC + C));
}

bool anyHazardMentions(const pw::Substance &s, std::string_view word) {
    return std::any_of(s.hazards.begin(), s.hazards.end(),
                       [&](const std::string &h) { return h.find(word) != std::string::npos; });
}

}  // namespace

// ---------------------------------------------------------------------------------------------
// The files load through the library and validate with no error.

TEST(BundledSolvents, FilesValidateWithoutErrors) {
    for (const auto id : kIds) {
        const std::string path = "substances/" + std::string(id) + ".json";
        const auto content = pw::bundled::file(path);
        ASSERT_FALSE(content.empty()) << path << " is not bundled";
        const auto result = pw::readSubstance(content, path);
        for (const auto &issue : result.issues)
            EXPECT_NE(issue.severity, pw::Severity::Error) << issue.text();
        ASSERT_TRUE(result.substance.has_value()) << path;
        EXPECT_EQ(result.substance->id, id);
        EXPECT_FALSE(result.substance->hazards.empty()) << id;
    }
}

TEST(BundledSolvents, FoundByIdAndCommonNames) {
    const auto lib = pw::SubstanceLibrary::bundled();
    // Names and codes used in the trade (common practice).
    const std::pair<const char *, const char *> expected[] = {
        {"NH3", "ammonia"},         {"R-717", "ammonia"},
        {"EtOH", "ethanol"},        {"ethyl alcohol", "ethanol"},
        {"ether", "diethyl-ether"}, {"propanone", "acetone"},
        {"TBA", "tert-butanol"},    {"tert-butyl alcohol", "tert-butanol"},
        {"R-290", "propane"},       {"C3H8", "propane"},
        {"MeOH", "methanol"},       {"CH3OH", "methanol"}};
    for (const auto &[key, id] : expected) {
        ASSERT_NO_THROW((void)lib.find(key)) << key;
        EXPECT_EQ(lib.find(key)->substance().id, id) << key;
    }
}

TEST(BundledSolvents, TriplePointsLieOnTheirCurves) {
    // Each curve that ends at the triple point must pass through it (the file format's rule;
    // ammonia's vapor curve comes from a different source than its triple point, so 0.5 %).
    for (const auto id : kIds) {
        const auto d = diagram(id);
        const auto *tp = d->triplePoint();
        ASSERT_NE(tp, nullptr) << id;
        EXPECT_NEAR(vapor(*d, tp->T_K) / tp->P_Pa, 1.0, 5e-3) << id;
        ASSERT_NE(d->sublimation(), nullptr) << id;
        EXPECT_NEAR(d->sublimation()->model->pressure(tp->T_K) / tp->P_Pa, 1.0, 1e-9) << id;
    }
}

// ---------------------------------------------------------------------------------------------
// Ammonia

TEST(BundledSolvents, AmmoniaBoilingPointAndTriplePoint) {
    const auto d = diagram("ammonia");
    // Normal boiling point 239.82 K (-33.33 degC; CRC Handbook of Chemistry and Physics, and
    // 239.823 K from Tillner-Roth et al. 1993; both from memory). Tolerance 0.15 K.
    EXPECT_NEAR(normalBoilingPoint(*d), 239.82, 0.15);
    // Triple-point pressure 0.06060 bar (Fonseca and Lobo 1989, as compiled in the NIST
    // Chemistry WebBook, TRC data) at the triple-point temperature 195.495 K (Tillner-Roth et
    // al. 1993, from memory). Tolerance 1.5 %.
    EXPECT_NEAR(vapor(*d, 195.495) / 6060.0, 1.0, 0.015);
    // Saturation pressure at 0 degC: 429.4 kPa (refrigeration tables for R-717, e.g. ASHRAE
    // Handbook - Fundamentals; from memory). Tolerance 1.5 %.
    EXPECT_NEAR(vapor(*d, kZeroC) / 429.4e3, 1.0, 0.015);
}

TEST(BundledSolvents, AmmoniaSolidSinksInItsLiquid) {
    const auto d = diagram("ammonia");
    // Solid ammonia (0.817 g/cm3 at -80 degC, handbook value, from memory) is denser than the
    // liquid at the triple point (0.733 g/cm3, Tillner-Roth et al. 1993), so the melting line
    // rises with temperature (Clapeyron).
    EXPECT_EQ(d->meltSlopeSign(), 1);
    EXPECT_EQ(d->solidDenserThanLiquid(), true);
    // Toxicity and pressure are the cautions of the trade (common practice).
    EXPECT_TRUE(anyHazardMentions(d->substance(), "Toxic"));
    EXPECT_TRUE(anyHazardMentions(d->substance(), "pressure"));
}

// ---------------------------------------------------------------------------------------------
// Ethanol

TEST(BundledSolvents, EthanolBoilsAt78_3C) {
    const auto d = diagram("ethanol");
    // Ethanol boils at 78.3 degC at 760 mmHg (common practice). Tolerance 0.15 K.
    EXPECT_NEAR(normalBoilingPoint(*d) - kZeroC, 78.3, 0.15);
}

TEST(BundledSolvents, EthanolVaporCurveAgreesWithOtherHandbooks) {
    const auto d = diagram("ethanol");
    for (double T : {290.0, 298.15, 323.15, 350.0}) {
        // Smith, Van Ness, Abbott and Swihart, Table B.2: A = 16.8958, B = 3795.17,
        // C = 230.918, 3 to 96 degC. Tolerance 0.5 %.
        EXPECT_NEAR(vapor(*d, T) / svnaAntoine(16.8958, 3795.17, 230.918, T), 1.0, 5e-3) << T;
    }
    for (double T : {298.15, 323.15, 350.0}) {
        // Reid, Prausnitz and Sherwood (1977), Appendix A: A = 18.5242, B = 3578.91,
        // C = -50.50, 270 to 369 K. Tolerance 1 %.
        EXPECT_NEAR(vapor(*d, T) / rpsAntoine(18.5242, 3578.91, -50.50, T), 1.0, 0.01) << T;
    }
}

// ---------------------------------------------------------------------------------------------
// Acetone

TEST(BundledSolvents, AcetoneBoilsAt56_1C) {
    const auto d = diagram("acetone");
    // Normal boiling point 56.05 degC (CRC Handbook of Chemistry and Physics, from memory;
    // ~56.1 degC in common practice). Tolerance 0.1 K.
    EXPECT_NEAR(normalBoilingPoint(*d) - kZeroC, 56.05, 0.1);
}

TEST(BundledSolvents, AcetoneVaporCurveAgreesWithOtherHandbooks) {
    const auto d = diagram("acetone");
    for (double T : {273.15, 298.15, 323.15, 345.0}) {
        // Smith, Van Ness, Abbott and Swihart, Table B.2: A = 14.3145, B = 2756.22,
        // C = 228.060, -26 to 77 degC. Tolerance 1 %.
        EXPECT_NEAR(vapor(*d, T) / svnaAntoine(14.3145, 2756.22, 228.060, T), 1.0, 0.01) << T;
        // Reid, Prausnitz and Sherwood (1977), Appendix A: A = 16.6513, B = 2940.46,
        // C = -35.93, 241 to 350 K. Tolerance 1 %.
        EXPECT_NEAR(vapor(*d, T) / rpsAntoine(16.6513, 2940.46, -35.93, T), 1.0, 0.01) << T;
    }
}

// ---------------------------------------------------------------------------------------------
// Diethyl ether

TEST(BundledSolvents, DiethylEtherBoilsAt34_6C) {
    const auto d = diagram("diethyl-ether");
    // Diethyl ether boils at 34.6 degC at 760 mmHg (common practice). The Table B.2 equation
    // of the file gives 34.4 degC (the table lists 34.4 degC itself). Tolerance 0.3 K.
    EXPECT_NEAR(normalBoilingPoint(*d) - kZeroC, 34.6, 0.3);
    // Vapor pressure 440 mmHg at 20 degC (handbook value, from memory). Tolerance 2 %.
    EXPECT_NEAR(vapor(*d, kZeroC + 20.0) / (440.0 * kMmHg), 1.0, 0.02);
}

TEST(BundledSolvents, DiethylEtherCarriesItsPeroxideCaution) {
    const auto d = diagram("ether");
    // Ether forms explosive peroxides and is extremely flammable (common practice).
    EXPECT_TRUE(anyHazardMentions(d->substance(), "peroxide"));
    EXPECT_TRUE(anyHazardMentions(d->substance(), "flammable"));
}

// ---------------------------------------------------------------------------------------------
// tert-Butanol (a freeze-drying co-solvent)

TEST(BundledSolvents, TertButanolBoilsAt82_4CAndMeltsAt25_7C) {
    const auto d = diagram("tert-butanol");
    // Boiling point 82.4 degC (CRC Handbook of Chemistry and Physics, from memory).
    // Tolerance 0.3 K.
    EXPECT_NEAR(normalBoilingPoint(*d) - kZeroC, 82.4, 0.3);
    // Melting point about 25.7 degC (common practice; the CRC Handbook lists 25.82 degC, from
    // memory). Tolerance 0.35 K.
    const auto nmp = d->normalMeltingPoint();
    ASSERT_TRUE(nmp.has_value());
    EXPECT_NEAR(*nmp - kZeroC, 25.7, 0.35);
    // Vapor pressure 4.1 kPa at 20 degC (handbook value, from memory). Tolerance 3 %.
    EXPECT_NEAR(vapor(*d, kZeroC + 20.0) / 4100.0, 1.0, 0.03);
}

TEST(BundledSolvents, TertButanolSolidIsDenserAndSublimesBelowItsTriplePoint) {
    const auto d = diagram("TBA");
    // Melting lines of tert-butyl compounds rise with pressure, dT/dp = (0.64 +/- 0.14) K/MPa
    // (Reuter et al. 1997): the slope of the file must lie in that band.
    const auto *melt = d->melting().empty() ? nullptr : d->melting().front();
    ASSERT_NE(melt, nullptr);
    const double dTdp_K_MPa = 1e6 / melt->model->dPdT(d->triplePoint()->T_K);
    EXPECT_NEAR(dTdp_K_MPa, 0.64, 0.14);
    EXPECT_EQ(d->solidDenserThanLiquid(), true);
    // A freeze-drying shelf at -20 degC: frozen tert-butanol has a vapor pressure below its
    // triple-point pressure and above zero, and the frost point of that pressure comes back.
    const auto sub = d->sublimationPressure(253.15);
    ASSERT_TRUE(sub.has_value());
    EXPECT_GT(sub->value, 0.0);
    EXPECT_LT(sub->value, d->triplePoint()->P_Pa);
    EXPECT_NEAR(d->sublimationTemperature(sub->value)->value, 253.15, 1e-6);
}

// ---------------------------------------------------------------------------------------------
// Propane

TEST(BundledSolvents, PropaneBoilingPointAndStoragePressure) {
    const auto d = diagram("R-290");
    // Normal boiling point -42.1 degC (CRC Handbook of Chemistry and Physics, from memory).
    // Tolerance 0.1 K.
    EXPECT_NEAR(normalBoilingPoint(*d) - kZeroC, -42.1, 0.1);
    // Vapor pressure of liquid propane at 20 degC: 8.36 bar absolute (LPG and R-290 tables,
    // common practice, from memory). Tolerance 1 %.
    EXPECT_NEAR(vapor(*d, kZeroC + 20.0) / 8.36e5, 1.0, 0.01);
    // Triple point 85.525 K at about 1.7e-4 Pa (Lemmon, McLinden and Wagner 2009, from
    // memory). Tolerance 5 %.
    EXPECT_NEAR(vapor(*d, 85.525) / 1.7e-4, 1.0, 0.05);
}

// ---------------------------------------------------------------------------------------------
// Methanol

TEST(BundledSolvents, MethanolBoilingPointVaporCurveAndToxicity) {
    const auto d = diagram("methanol");
    // Normal boiling point 64.6 degC (CRC Handbook of Chemistry and Physics, from memory).
    // Tolerance 0.2 K.
    EXPECT_NEAR(normalBoilingPoint(*d) - kZeroC, 64.6, 0.2);
    for (double T : {298.15, 320.0, 337.85, 360.0}) {
        // Reid, Prausnitz and Sherwood (1977), Appendix A: A = 18.5875, B = 3626.55,
        // C = -34.29, 257 to 364 K. Tolerance 0.5 %.
        EXPECT_NEAR(vapor(*d, T) / rpsAntoine(18.5875, 3626.55, -34.29, T), 1.0, 5e-3) << T;
    }
    // Methanol is toxic as well as flammable (common practice).
    EXPECT_TRUE(anyHazardMentions(d->substance(), "Toxic"));
}
