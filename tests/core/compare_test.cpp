// The comparison table (core/compare.h) for water vs heavy water and carbon dioxide vs
// nitrogen, checked against the sources the library tests use (tests/core/library/
// bundled_reference_test.cpp): IAPWS releases, the reference-equation papers' fixed points,
// handbook boiling points and python3-iapws (Debian's package, run with /usr/bin/python3 as a
// reference library). Every check names its source beside it.
#include "core/compare.h"

#include <gtest/gtest.h>

#include <cmath>
#include <cstdio>
#include <memory>
#include <optional>
#include <sstream>
#include <string>
#include <vector>

#include "core/errors.h"
#include "core/library.h"

namespace {

// Runs each expression with python3-iapws in one interpreter; returns the printed numbers.
std::vector<double> iapws(const std::vector<std::string> &exprs) {
    std::string script = "import iapws._iapws as I; from iapws import IAPWS95, D2O, _Ice";
    for (const auto &e : exprs) script += "; print(repr(" + e + "))";
    const std::string cmd = "/usr/bin/python3 -c \"" + script + "\" 2>&1";
    struct Closer {
        void operator()(FILE *f) const { pclose(f); }
    };
    std::unique_ptr<FILE, Closer> pipe(popen(cmd.c_str(), "r"));
    if (!pipe) throw std::runtime_error("cannot run /usr/bin/python3");
    std::string out;
    char buf[256];
    while (std::fgets(buf, sizeof buf, pipe.get()) != nullptr) out += buf;
    std::vector<double> values;
    std::istringstream lines(out);
    for (std::string line; std::getline(lines, line);) values.push_back(std::stod(line));
    if (values.size() != exprs.size()) throw std::runtime_error("python3-iapws failed: " + out);
    return values;
}

std::string num(double x) {
    char buf[64];
    std::snprintf(buf, sizeof buf, "%.17g", x);
    return buf;
}

const pw::CompareRow &row(const pw::Comparison &c, const std::string &key) {
    for (const auto &r : c.rows)
        if (r.key == key) return r;
    throw std::runtime_error("no row " + key);
}

class CompareTest : public ::testing::Test {
protected:
    static void SetUpTestSuite() { library_.emplace(pw::SubstanceLibrary::bundled()); }
    static void TearDownTestSuite() { library_.reset(); }
    static std::shared_ptr<const pw::PhaseDiagram> diagram(std::string_view key) {
        return library_->find(key);
    }
    static inline std::optional<pw::SubstanceLibrary> library_;
};

}  // namespace

// ---------------------------------------------------------------------------------------------
// Water (A) vs heavy water (B) at T = 300 K and P = 10 Pa (a freeze-drying chamber pressure).

TEST_F(CompareTest, WaterVsHeavyWaterFixedAndNormalPoints) {
    const auto c = pw::compare(*diagram("water"), *diagram("heavy-water"), {300.0, 10.0});
    const auto &tT = row(c, "triple_point_T_K");
    const auto &tP = row(c, "triple_point_P_Pa");
    EXPECT_NEAR(*tT.a, 273.16, 1e-9);             // IAPWS R6-95 (definition of the kelvin scale)
    EXPECT_NEAR(*tP.a, 611.657, 0.001);           // IAPWS R6-95
    EXPECT_NEAR(*tT.b, 276.969, 0.001);           // IAPWS R16-17
    EXPECT_NEAR(*tP.b / 661.59, 1.0, 1e-3);       // IAPWS R16-17
    EXPECT_NEAR(*tT.difference(), 3.809, 0.001);  // 276.969 - 273.16 (both IAPWS)
    const auto &cT = row(c, "critical_point_T_K");
    const auto &cP = row(c, "critical_point_P_Pa");
    EXPECT_NEAR(*cT.a, 647.096, 1e-6);          // IAPWS R6-95
    EXPECT_NEAR(*cP.a, 22.064e6, 1.0);          // IAPWS R6-95
    EXPECT_NEAR(*cT.b, 643.847, 1e-3);          // IAPWS R16-17 (Herrig et al. 2018)
    EXPECT_NEAR(*cP.b / 21.6618e6, 1.0, 1e-4);  // IAPWS R16-17 (Herrig et al. 2018)
    EXPECT_LT(*cT.difference(), 0.0);           // heavy water's Tc is lower (same sources)
    // Normal boiling points: 373.124 K (IAPWS R6-95), 374.549 K (Herrig et al. 2018, from
    // memory) with the library tests' tolerances.
    const auto &nbp = row(c, "normal_boiling_point_K");
    EXPECT_NEAR(*nbp.a, 373.124, 0.002);
    EXPECT_NEAR(*nbp.b, 374.549, 0.01);
    EXPECT_NEAR(*nbp.difference(), 1.425, 0.012);
    // Normal melting point of water 273.1525 K (IAPWS R14-08 ice Ih line).
    EXPECT_NEAR(*row(c, "normal_melting_point_K").a, 273.1525, 0.0002);
    // Neither sublimes at 1 atm (the triple-point pressures are far below 101 325 Pa).
    EXPECT_FALSE(row(c, "normal_sublimation_point_K").a.has_value());
    EXPECT_FALSE(row(c, "normal_sublimation_point_K").b.has_value());
    // Both ices float on their own liquid: the melting lines fall (common practice).
    EXPECT_EQ(*row(c, "melt_slope_sign").a, -1.0);
    EXPECT_EQ(*row(c, "melt_slope_sign").b, -1.0);
    EXPECT_EQ(*row(c, "melt_slope_sign").difference(), 0.0);
    EXPECT_EQ(c.a.solidDenserThanLiquid, false);
    EXPECT_EQ(c.b.solidDenserThanLiquid, false);
}

TEST_F(CompareTest, WaterVsHeavyWaterAgainstPythonIapws) {
    const auto c = pw::compare(*diagram("water"), *diagram("heavy-water"), {300.0, 10.0});
    const auto &pv = row(c, "vapor_pressure_at_T_Pa");
    const auto &ts = row(c, "saturation_temperature_at_P_K");
    const double dMelt = *row(c, "normal_melting_point_K").b;
    const auto ref = iapws({
        "IAPWS95(T=300.0, x=0).P",                                                 // 0
        "D2O(T=300.0, x=0).P",                                                     // 1
        "I._Sublimation_Pressure(" + num(*ts.a) + ")",                             // 2
        "I._D2O_Sublimation_Pressure(" + num(*ts.b) + ")",                         // 3
        "I._D2O_Melting_Pressure(" + num(dMelt) + ", 'Ih')",                       // 4
        "(IAPWS95(T=273.16, x=1).h - IAPWS95(T=273.16, x=0).h) * 18.015268",       // 5
        "(IAPWS95(T=273.16, x=1).h - _Ice(273.16, 611.657e-6)['h']) * 18.015268",  // 6
        "(D2O(T=276.97, x=1).h - D2O(T=276.97, x=0).h) * 20.027508",               // 7
    });
    // Vapor pressure at 300 K: IAPWS-95 (0.01 %) and IAPWS R16-17 (0.1 %), python3-iapws.
    EXPECT_NEAR(*pv.a / (ref[0] * 1e6), 1.0, 1e-4);
    EXPECT_NEAR(*pv.b / (ref[1] * 1e6), 1.0, 1e-3);
    EXPECT_NEAR(*pv.ratio(), ref[1] / ref[0], 2e-3);
    EXPECT_EQ(c.moreVolatileAtT, 0);  // water is the more volatile (IAPWS-95 vs R16-17 above)
    // Frost points at 10 Pa: the R14-08 (water) and Herrig et al. 2018 (heavy water)
    // sublimation pressures at the returned temperatures are 10 Pa (python3-iapws).
    EXPECT_EQ(c.a.saturationTAtP->kind, pw::BoundaryKind::Sublimation);
    EXPECT_NEAR(ref[2] * 1e6, 10.0, 1e-6);
    EXPECT_NEAR(ref[3] * 1e6, 10.0, 1e-6);
    EXPECT_GT(*ts.difference(), 0.0);  // heavy ice needs a warmer shelf for the same pressure
    // Normal melting point of heavy ice: the Herrig et al. 2018 ice Ih line gives 101 325 Pa.
    EXPECT_NEAR(ref[4] * 1e6, 101325.0, 1.0);
    // Enthalpies at the triple point (Clausius-Clapeyron on the curves, ideal vapor) against
    // IAPWS-95 (vaporization), IAPWS-95 + IAPWS R10-06 ice (sublimation) and R16-17, from
    // python3-iapws (kJ/kg times g/mol = J/mol): within 0.2 % at these low pressures.
    EXPECT_NEAR(*row(c, "dH_vap_triple_J_mol").a / ref[5], 1.0, 2e-3);
    EXPECT_NEAR(*row(c, "dH_sub_triple_J_mol").a / ref[6], 1.0, 2e-3);
    EXPECT_NEAR(*row(c, "dH_vap_triple_J_mol").b / ref[7], 1.0, 2e-3);
}

// ---------------------------------------------------------------------------------------------
// Carbon dioxide (A) vs nitrogen (B) at T = 250 K (nitrogen is supercritical there) and at
// P = 101 325 Pa (carbon dioxide sublimes, nitrogen boils).

TEST_F(CompareTest, CarbonDioxideVsNitrogen) {
    const auto c = pw::compare(*diagram("CO2"), *diagram("N2"), {250.0, 101325.0});
    // Span & Wagner 1996: triple point 216.592 K / 0.51795 MPa, critical 304.1282 K /
    // 7.3773 MPa.
    EXPECT_NEAR(*row(c, "triple_point_T_K").a, 216.592, 1e-3);
    EXPECT_NEAR(*row(c, "triple_point_P_Pa").a / 0.51795e6, 1.0, 1e-4);
    EXPECT_NEAR(*row(c, "critical_point_T_K").a, 304.1282, 1e-4);
    EXPECT_NEAR(*row(c, "critical_point_P_Pa").a / 7.3773e6, 1.0, 1e-4);
    // Span et al. 2000: triple point 63.151 K / 12.5198 kPa, critical 126.192 K / 3.3958 MPa.
    EXPECT_NEAR(*row(c, "triple_point_T_K").b, 63.151, 1e-3);
    EXPECT_NEAR(*row(c, "triple_point_P_Pa").b / 12519.8, 1.0, 1e-4);
    EXPECT_NEAR(*row(c, "critical_point_T_K").b, 126.192, 1e-3);
    EXPECT_NEAR(*row(c, "critical_point_P_Pa").b / 3.3958e6, 1.0, 1e-4);
    EXPECT_NEAR(*row(c, "critical_point_T_K").difference(), 126.192 - 304.1282, 2e-3);
    // Normal points: CO2 sublimes at 194.686 K (Span & Wagner 1996) and has no normal boiling
    // point; N2 boils at 77.355 K (Span et al. 2000).
    EXPECT_NEAR(*row(c, "normal_sublimation_point_K").a, 194.686, 0.01);
    EXPECT_FALSE(row(c, "normal_boiling_point_K").a.has_value());
    EXPECT_NEAR(*row(c, "normal_boiling_point_K").b, 77.355, 0.005);
    EXPECT_FALSE(row(c, "normal_boiling_point_K").difference().has_value());
    // At the chosen 1 atm: the same two numbers, with the kind of equilibrium named.
    const auto &ts = row(c, "saturation_temperature_at_P_K");
    EXPECT_NEAR(*ts.a, 194.686, 0.01);  // Span & Wagner 1996
    EXPECT_EQ(c.a.saturationTAtP->kind, pw::BoundaryKind::Sublimation);
    EXPECT_NEAR(*ts.b, 77.355, 0.005);  // Span et al. 2000
    EXPECT_EQ(c.b.saturationTAtP->kind, pw::BoundaryKind::Vaporization);
    // Vapor pressure of CO2 at 250 K: 1.7851 MPa (Span & Wagner 1996, Table 34; from memory,
    // 0.1 %). Nitrogen is above its critical temperature, so it is the more volatile.
    const auto &pv = row(c, "vapor_pressure_at_T_Pa");
    EXPECT_NEAR(*pv.a / 1.7851e6, 1.0, 1e-3);
    EXPECT_FALSE(pv.b.has_value());
    EXPECT_TRUE(c.b.aboveCriticalAtT);
    EXPECT_EQ(pv.noteB, "T above Tc");
    EXPECT_EQ(c.moreVolatileAtT, 1);
    // Both solids sink in their liquids: rising melting lines (common practice).
    EXPECT_EQ(*row(c, "melt_slope_sign").a, 1.0);
    EXPECT_EQ(*row(c, "melt_slope_sign").b, 1.0);
    // Sublimation takes more enthalpy than vaporization at the triple point (Hess: the
    // difference is the enthalpy of fusion, positive; common practice).
    EXPECT_GT(*row(c, "dH_sub_triple_J_mol").a, *row(c, "dH_vap_triple_J_mol").a);
    EXPECT_GT(*row(c, "dH_sub_triple_J_mol").b, *row(c, "dH_vap_triple_J_mol").b);
}

TEST_F(CompareTest, VolatilityFollowsTheHigherVaporPressure) {
    // At 80 K both are below their critical temperatures: N2 boils (77.355 K at 1 atm, Span et
    // al. 2000) so its vapor pressure is above 1 atm, CO2 is a solid far below its 194.686 K
    // sublimation point (Span & Wagner 1996): nitrogen is the more volatile.
    const auto c = pw::compare(*diagram("CO2"), *diagram("N2"), {80.0, {}});
    EXPECT_GT(*row(c, "vapor_pressure_at_T_Pa").b, 101325.0);
    EXPECT_LT(*row(c, "vapor_pressure_at_T_Pa").a, 101325.0);
    EXPECT_EQ(c.moreVolatileAtT, 1);
    // Swapping A and B swaps the verdict.
    EXPECT_EQ(pw::compare(*diagram("N2"), *diagram("CO2"), {80.0, {}}).moreVolatileAtT, 0);
}

TEST_F(CompareTest, RowsWithoutConditionsAreLeftOutAndBadConditionsThrow) {
    const auto c = pw::compare(*diagram("water"), *diagram("CO2"));
    for (const auto &r : c.rows) {
        EXPECT_NE(r.key, "vapor_pressure_at_T_Pa");
        EXPECT_NE(r.key, "saturation_temperature_at_P_K");
    }
    EXPECT_FALSE(c.moreVolatileAtT.has_value());
    EXPECT_THROW(pw::compare(*diagram("water"), *diagram("CO2"), {-5.0, {}}), pw::DomainError);
    EXPECT_THROW(pw::compare(*diagram("water"), *diagram("CO2"), {{}, 0.0}), pw::DomainError);
}

// ---------------------------------------------------------------------------------------------
// Corresponding states: every vaporization curve ends at (1, 1) in reduced coordinates, and
// the reduced triple points come from the published fixed points.

TEST_F(CompareTest, ReducedVaporizationCurvesPassThroughOneOne) {
    for (const char *id : {"water", "heavy-water", "carbon-dioxide", "nitrogen"}) {
        const auto curve = pw::reducedVaporizationCurve(*diagram(id), 100);
        ASSERT_GE(curve.size(), 90u) << id;
        // Wagner-type vapor-pressure equations are built to give pc at Tc (IAPWS SR1-86,
        // Herrig et al. 2018, Span & Wagner 1996, Span et al. 2000).
        EXPECT_NEAR(curve.back().Tr, 1.0, 1e-12) << id;
        EXPECT_NEAR(curve.back().Pr, 1.0, 1e-3) << id;
        for (std::size_t i = 1; i < curve.size(); ++i) {
            EXPECT_GT(curve[i].Tr, curve[i - 1].Tr) << id;
            EXPECT_GT(curve[i].Pr, curve[i - 1].Pr) << id;
        }
    }
    const auto c = pw::compare(*diagram("CO2"), *diagram("N2"));
    // Reduced triple points: 216.592 / 304.1282 (Span & Wagner 1996) and 63.151 / 126.192
    // (Span et al. 2000).
    EXPECT_NEAR(*row(c, "triple_point_T_reduced").a, 216.592 / 304.1282, 1e-5);
    EXPECT_NEAR(*row(c, "triple_point_T_reduced").b, 63.151 / 126.192, 1e-5);
    EXPECT_NEAR(*row(c, "triple_point_P_reduced").a, 0.51795 / 7.3773, 1e-4);
    const auto r = pw::reduced(*diagram("water"), 647.096, 22.064e6);  // IAPWS R6-95
    ASSERT_TRUE(r.has_value());
    EXPECT_NEAR(r->Tr, 1.0, 1e-9);
    EXPECT_NEAR(r->Pr, 1.0, 1e-6);
}
