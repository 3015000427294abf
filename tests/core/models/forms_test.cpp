// Every equation form of docs/substance-format.md: analytic dp/dT, round trip of the inverse,
// unit conversion of the published parameters, and the spec errors.
#include <gtest/gtest.h>

#include <cmath>
#include <limits>

#include "core/errors.h"
#include "core/solver.h"
#include "reference_specs.h"

namespace pw {
namespace {

using testdata::spec;

ModelSpec withStrings(ModelSpec s, std::map<std::string, std::string> strings) {
    s.strings = std::move(strings);
    return s;
}

ModelSpec inUnits(ModelSpec s, TemperatureUnit t, PressureUnit p) {
    s.tUnit = t;
    s.pUnit = p;
    return s;
}

// Water Antoine constants, 1–100 °C, p in mmHg, t in °C: A = 8.07131, B = 1730.63,
// C = 233.426 (Lange's Handbook of Chemistry, from memory).
ModelSpec waterAntoine() {
    return inUnits(withStrings(spec("antoine", {{"A", 8.07131}, {"B", 1730.63}, {"C", 233.426}}),
                               {{"base", "10"}}),
                   TemperatureUnit::Celsius, PressureUnit::mmHg);
}

struct FormCase {
    const char *name;
    ModelSpec spec;
    TRange range;  // where to check (inside the validity of the published curve)
};

std::vector<FormCase> allForms() {
    using testdata::spec;
    ModelSpec extended = withStrings(
        spec("antoine-extended",
             {{"A", 20.0}, {"B", 4000.0}, {"C", -40.0}, {"D", -1e-3}, {"E", 1e-6}, {"F", -0.5}}),
        {{"base", "e"}});
    ModelSpec named = withStrings(spec("wagner", {{"T_ref", 190.564}, {"P_ref", 4.5992}},
                                       {{"a", {-6.036219, 1.409353, -0.4945199, -1.443048}}}),
                                  {{"exponent_set", "1-1.5-2.5-5"}});
    named.pUnit = PressureUnit::MPa;
    return {
        {"wagner (water, IAPWS SR1-86)", testdata::waterVaporization(), {273.16, 647.0}},
        {"wagner 1-1.5-2.5-5 (illustrative coefficients)", named, {90.7, 190.5}},
        {"wagner (CO2 sublimation)", testdata::co2Sublimation(), {150.0, 216.592}},
        {"iapws-sublimation", testdata::waterSublimation(), {50.0, 273.16}},
        {"antoine", waterAntoine(), {274.15, 373.15}},
        {"antoine-extended", extended, {250.0, 400.0}},
        {"clausius-clapeyron",
         spec("clausius-clapeyron",
              {{"T_ref", 373.124}, {"P_ref", 101325.0}, {"dH_J_mol", 40650.0}}),
         {300.0, 450.0}},
        {"lee-kesler",
         spec("lee-kesler", {{"T_c", 304.1282}, {"P_c", 7.3773e6}, {"omega", 0.225}}),
         {216.6, 304.0}},
        {"ambrose-walton",
         spec("ambrose-walton", {{"T_c", 304.1282}, {"P_c", 7.3773e6}, {"omega", 0.225}}),
         {216.6, 304.1282}},
        {"clapeyron-linear",
         spec("clapeyron-linear", {{"T_ref", 273.16},
                                   {"P_ref", 611.657},
                                   {"dH_J_mol", 6007.0},
                                   {"dV_m3_mol", -1.634e-6}}),
         {252.0, 273.16}},
        {"clapeyron-integrated",
         spec("clapeyron-integrated", {{"T_ref", 216.592},
                                       {"P_ref", 0.51795e6},
                                       {"dH_J_mol", 9020.0},
                                       {"dV_m3_mol", 3.3e-6}}),
         {216.592, 300.0}},
        {"simon-glatzel",
         spec("simon-glatzel",
              {{"T_ref", 273.31}, {"P_ref", 632.4}, {"a", 1.07476 * 632.4}, {"c", 4.6}}, {},
              PressureUnit::MPa),
         {273.31, 355.0}},
        {"melting-polynomial", testdata::co2Melting(), {216.592, 327.0}},
        {"iapws-melting Ih", testdata::waterMeltingIh(), {251.165, 273.16}},
        {"iapws-melting III", testdata::waterMeltingIII(), {251.165, 256.164}},
        {"iapws-melting V", testdata::waterMeltingV(), {256.164, 273.31}},
        {"iapws-melting VI", testdata::waterMeltingVI(), {273.31, 355.0}},
        {"iapws-melting log (VII)", testdata::waterMeltingVII(), {355.0, 715.0}},
    };
}

TEST(Forms, EveryFormIsCovered) {
    std::set<std::string> seen;
    for (const auto &c : allForms()) seen.insert(c.spec.form);
    for (const auto &f : modelForms()) EXPECT_TRUE(seen.count(f)) << f;
}

TEST(Forms, AnalyticSlopeMatchesCentralDifference) {
    // Mathematical identity (no outside source): dp/dT = lim Δp/ΔT.
    for (const auto &c : allForms()) {
        const auto m = makeModel(c.spec);
        for (int i = 1; i < 20; ++i) {
            const double T = c.range.min_K + (c.range.max_K - c.range.min_K) * i / 20.0;
            const double h = 1e-5 * T;
            const double numeric = (m->pressure(T + h) - m->pressure(T - h)) / (2 * h);
            EXPECT_NEAR(m->dPdT(T) / numeric, 1.0, 1e-5) << c.name << " at " << T;
        }
    }
}

TEST(Forms, RoundTripWithinOneNanokelvin) {
    // Acceptance criterion of issue 3: |T − T(p(T))| <= 1e-9 K over the range, both by the
    // bracketed solver and by the table-guided inverse used by PhaseDiagram.
    for (const auto &c : allForms()) {
        const auto m = makeModel(c.spec);
        ASSERT_TRUE(m->domain().contains(c.range.min_K) && m->domain().contains(c.range.max_K))
            << c.name << ": domain " << m->domain().min_K << "-" << m->domain().max_K;
        const CurveTable table(m, c.range.min_K, c.range.max_K);
        double worst = 0.0, worstTable = 0.0;
        for (int i = 0; i <= 400; ++i) {
            const double T = c.range.min_K + (c.range.max_K - c.range.min_K) * i / 400.0;
            const double p = m->pressure(T);
            worst = std::max(worst, std::abs(m->temperature(p) - T));
            const auto Tt = table.temperature(std::log(p));
            ASSERT_TRUE(Tt) << c.name << " at " << T;
            worstTable = std::max(worstTable, std::abs(*Tt - T));
        }
        EXPECT_LE(worst, 1e-9) << c.name;
        EXPECT_LE(worstTable, 1e-9) << c.name;
    }
}

TEST(Forms, TablePressureAgreesWithTheEquation) {
    // The fast table of each form (core/solver.h, CurveTable) against the equation it was
    // built from: within 1e-13 relative at the build's check points, so allow 3e-13 between
    // them (the interpolation error peaks at the check points). Where a cell missed its
    // tolerance the table answers with the equation itself.
    for (const auto &c : allForms()) {
        const auto m = makeModel(c.spec);
        const CurveTable table(m, c.range.min_K, c.range.max_K);
        double worst = 0.0;
        for (int i = 0; i <= 4000; ++i) {
            const double T = c.range.min_K + (c.range.max_K - c.range.min_K) * i / 4000.0;
            const double p = table.pressure(T);
            ASSERT_TRUE(std::isfinite(p)) << c.name << " at " << T;
            worst = std::max(worst, std::abs(p / m->pressure(T) - 1.0));
        }
        EXPECT_LE(worst, 3e-13) << c.name;
        EXPECT_TRUE(std::isnan(table.pressure(c.range.min_K * 0.999))) << c.name;
        EXPECT_FALSE(table.temperature(table.lnpMax() + 1.0)) << c.name;
    }
}

TEST(Forms, AntoineInPublishedUnits) {
    // Common practice: 760 mmHg = 1 atm = 101 325 Pa, and water boils at 100 °C at 1 atm.
    const auto m = makeModel(waterAntoine());
    EXPECT_NEAR(m->pressure(373.15) / 101325.0, 1.0, 5e-4);
    EXPECT_NEAR(m->temperature(101325.0), 373.15, 0.02);
    // The same equation in natural-log form: ln p = ln(10)·(A − B/(t + C)).
    ModelSpec ln = waterAntoine();
    ln.strings["base"] = "e";
    ln.scalars = {{"A", 8.07131 * std::log(10.0)}, {"B", 1730.63 * std::log(10.0)}, {"C", 233.426}};
    EXPECT_NEAR(makeModel(ln)->pressure(330.0) / m->pressure(330.0), 1.0, 1e-12);
}

TEST(Forms, TemperatureUnitsOfParameters) {
    // The IAPWS SR1-86 curve written with T_ref in °C and P_ref in bar gives the same curve.
    ModelSpec c = testdata::waterVaporization();
    c.scalars = {{"T_ref", 647.096 - 273.15}, {"P_ref", 220.64}};
    c.tUnit = TemperatureUnit::Celsius;
    c.pUnit = PressureUnit::bar;
    const auto a = makeModel(testdata::waterVaporization());
    const auto b = makeModel(c);
    EXPECT_NEAR(b->pressure(400.0) / a->pressure(400.0), 1.0, 1e-12);
}

TEST(Forms, NamedExponentSetsEqualTheExplicitExponents) {
    // Wagner 3-6 form, exponents 1, 1.5, 3, 6 (docs/substance-format.md).
    ModelSpec named = withStrings(
        spec("wagner", {{"T_ref", 500.0}, {"P_ref", 4e6}}, {{"a", {-7.0, 1.5, -2.0, -3.0}}}),
        {{"exponent_set", "1-1.5-3-6"}});
    ModelSpec explicitSet = spec("wagner", {{"T_ref", 500.0}, {"P_ref", 4e6}},
                                 {{"a", {-7.0, 1.5, -2.0, -3.0}}, {"exponents", {1, 1.5, 3, 6}}});
    EXPECT_DOUBLE_EQ(makeModel(named)->pressure(350.0), makeModel(explicitSet)->pressure(350.0));
}

TEST(Forms, CorrespondingStatesMeetTheAcentricFactorDefinition) {
    // Pitzer's definition (Poling, Prausnitz & O'Connell, 5th ed., eq. 2-3.1):
    // ω = −log10(p_r at T_r = 0.7) − 1; and p_r = 1 at T_r = 1.
    for (const char *form : {"lee-kesler", "ambrose-walton"}) {
        const double omega = 0.225;
        const auto m =
            makeModel(spec(form, {{"T_c", 304.1282}, {"P_c", 7.3773e6}, {"omega", omega}}));
        EXPECT_NEAR(-std::log10(m->pressure(0.7 * 304.1282) / 7.3773e6) - 1.0, omega, 0.01) << form;
        EXPECT_NEAR(m->pressure(304.1282) / 7.3773e6, 1.0, 1e-4) << form;
    }
}

TEST(Forms, CorrespondingStatesNearCo2ReferenceCurve) {
    // CO2 with ω = 0.225 (Poling et al., 5th ed., Appendix A, from memory) against Span & Wagner
    // (1996) eq. (3.13): corresponding-states estimates are good to a few percent.
    const auto ref = makeModel(testdata::co2Vaporization());
    for (const char *form : {"lee-kesler", "ambrose-walton"}) {
        const auto m =
            makeModel(spec(form, {{"T_c", 304.1282}, {"P_c", 7.3773e6}, {"omega", 0.225}}));
        for (double T : {220.0, 250.0, 280.0, 300.0}) {
            EXPECT_NEAR(m->pressure(T) / ref->pressure(T), 1.0, 0.03) << form << " " << T;
        }
    }
}

TEST(Forms, ClapeyronMatchesTheIapwsMeltingSlope) {
    // Clapeyron with handbook ΔH = 6007 J/mol, ΔV = −1.634e-6 m³/mol (from memory) against
    // the slope of IAPWS R14-08 eq. (1) at the triple point (−13.47 MPa/K).
    const auto ih = makeModel(testdata::waterMeltingIh());
    for (const char *form : {"clapeyron-linear", "clapeyron-integrated"}) {
        const auto m = makeModel(spec(form, {{"T_ref", 273.16},
                                             {"P_ref", 611.657},
                                             {"dH_J_mol", 6007.0},
                                             {"dV_m3_mol", -1.634e-6}}));
        EXPECT_NEAR(m->dPdT(273.16) / ih->dPdT(273.16), 1.0, 5e-3) << form;
        EXPECT_DOUBLE_EQ(m->pressure(273.16), 611.657);
    }
}

TEST(Forms, SimonGlatzelReproducesIceVI) {
    // IAPWS R14-08 eq. (4) is a Simon–Glatzel curve: check value 1356.76 MPa at 320 K.
    const auto m = makeModel(spec(
        "simon-glatzel", {{"T_ref", 273.31}, {"P_ref", 632.4}, {"a", 1.07476 * 632.4}, {"c", 4.6}},
        {}, PressureUnit::MPa));
    EXPECT_NEAR(m->pressure(320.0) / 1e6, 1356.76, 0.005);
}

TEST(Forms, ClausiusClapeyronSlope) {
    // Clausius–Clapeyron with ΔHvap = 40.65 kJ/mol at 100 °C (handbook, from memory) against
    // IAPWS SR1-86 between 90 and 110 °C: within 1 %.
    const auto cc = makeModel(spec(
        "clausius-clapeyron", {{"T_ref", 373.124}, {"P_ref", 101325.0}, {"dH_J_mol", 40650.0}}));
    const auto ref = makeModel(testdata::waterVaporization());
    for (double T : {363.15, 383.15}) EXPECT_NEAR(cc->pressure(T) / ref->pressure(T), 1.0, 0.01);
}

void expectSpecError(const ModelSpec &s, const std::string &parameter) {
    try {
        makeModel(s);
        ADD_FAILURE() << "no error for " << s.form << " / " << parameter;
    } catch (const ModelSpecError &e) {
        EXPECT_EQ(e.parameter(), parameter) << e.what();
        EXPECT_NE(std::string(e.what()).find(parameter), std::string::npos) << e.what();
    }
}

TEST(Forms, BadSpecsNameTheParameter) {
    const double nan = std::numeric_limits<double>::quiet_NaN();
    expectSpecError(spec("wagnr", {}), "model");
    ModelSpec s = testdata::waterVaporization();
    s.scalars.erase("T_ref");
    expectSpecError(s, "T_ref");
    s = testdata::waterVaporization();
    s.scalars["P_ref"] = -1.0;
    expectSpecError(s, "P_ref");
    s = testdata::waterVaporization();
    s.scalars["Tref"] = 647.0;
    expectSpecError(s, "Tref");
    s = testdata::waterVaporization();
    s.arrays["exponents"].pop_back();
    expectSpecError(s, "exponents");
    s = testdata::waterVaporization();
    s.arrays["a"][2] = nan;
    expectSpecError(s, "a");
    s = testdata::waterVaporization();
    s.arrays["a"] = {};
    expectSpecError(s, "a");
    s = testdata::waterVaporization();
    s.strings["exponent_set"] = "1-1.5-3-6";
    expectSpecError(s, "exponents");
    s = testdata::waterVaporization();
    s.arrays.erase("exponents");
    s.strings["exponent_set"] = "1-2-3";
    expectSpecError(s, "exponent_set");
    s = waterAntoine();
    s.strings["base"] = "2";
    expectSpecError(s, "base");
    s = waterAntoine();
    s.scalars["D"] = 1.0;  // only antoine-extended has D
    expectSpecError(s, "D");
    expectSpecError(
        spec("clausius-clapeyron", {{"T_ref", 300.0}, {"P_ref", 1e5}, {"dH_J_mol", -5.0}}),
        "dH_J_mol");
    expectSpecError(spec("clapeyron-linear",
                         {{"T_ref", 300.0}, {"P_ref", 1e5}, {"dH_J_mol", 5.0}, {"dV_m3_mol", 0.0}}),
                    "dV_m3_mol");
    s = testdata::waterMeltingIh();
    s.arrays["b"] = {3.0};
    expectSpecError(s, "b");
    // Coefficients that give no monotonic curve at all.
    expectSpecError(
        spec("wagner", {{"T_ref", 500.0}, {"P_ref", 1e6}}, {{"a", {0.0}}, {"exponents", {1.0}}}),
        "a");
}

TEST(Forms, InverseOutsideTheCurveThrows) {
    const auto m = makeModel(testdata::waterVaporization());
    EXPECT_THROW(m->temperature(30e6), DomainError);  // above pc
    EXPECT_THROW(m->temperature(0.0), DomainError);
    EXPECT_THROW(m->temperature(std::numeric_limits<double>::quiet_NaN()), DomainError);
    EXPECT_THROW(m->temperature(1e5, TRange{400.0, 500.0}), DomainError);  // not in bracket
}

}  // namespace
}  // namespace pw
