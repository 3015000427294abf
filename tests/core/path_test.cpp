// analysePath(): the transitions of a freeze-drying path for water and a supercritical drying
// path for carbon dioxide, their locations and times, and the summary.
#include "core/path.h"

#include <gtest/gtest.h>

#include <algorithm>
#include <cmath>
#include <vector>

#include "core/errors.h"
#include "models/reference_specs.h"

namespace pw {
namespace {

std::vector<Transition> transitions(const PathResult &r) {
    std::vector<Transition> t;
    for (const PathEvent &e : r.events) t.push_back(e.transition);
    return t;
}

bool visited(const PathResult &r, Phase p) {
    const auto &v = r.summary.phasesVisited;
    return std::find(v.begin(), v.end(), p) != v.end();
}

TEST(PathWater, FreezeDryingFreezesThenSublimesAndNeverMelts) {
    const PhaseDiagram d(testdata::water());
    // Cool from 20 °C to -45 °C at 1 atm, pump down to 10 Pa, warm to +25 °C at 10 Pa; one
    // hour a leg.
    const std::vector<State> path = {{0.0, 293.15, 101325.0},
                                     {3600.0, 228.15, 101325.0},
                                     {7200.0, 228.15, 10.0},
                                     {10800.0, 298.15, 10.0}};
    const PathResult r = analysePath(d, path);
    ASSERT_EQ(transitions(r),
              (std::vector<Transition>{Transition::Freezing, Transition::Sublimation}));
    // Freezing at the R14-08 melting temperature of 1 atm: 273.15252 K (python3-iapws
    // _Melting_Pressure inverted with brentq), on leg 1, at t = 3600 s (293.15 - T)/65 K.
    const PathEvent &f = r.events[0];
    EXPECT_NEAR(f.T_K, 273.1525190797695, 1e-6);
    EXPECT_NEAR(f.P_Pa, 101325.0, 1e-6);
    EXPECT_EQ(f.index, 1u);
    EXPECT_NEAR(f.time_s, 3600.0 * (293.15 - 273.1525190797695) / 65.0, 1e-3);
    EXPECT_EQ(f.detail, "liquid -> ice Ih");
    // Sublimation at the frost point of 10 Pa: 230.96066 K (python3-iapws
    // _Sublimation_Pressure inverted with brentq), on leg 3.
    const PathEvent &s = r.events[1];
    EXPECT_NEAR(s.T_K, 230.96066158810027, 1e-6);
    EXPECT_NEAR(s.P_Pa, 10.0, 1e-9);
    EXPECT_EQ(s.index, 3u);
    EXPECT_NEAR(s.time_s, 7200.0 + 3600.0 * (230.96066158810027 - 228.15) / 70.0, 1e-3);
    EXPECT_FALSE(r.summary.crossesLiquidVapor);
    EXPECT_FALSE(visited(r, Phase::Gas));
    EXPECT_EQ(r.summary.phasesVisited,
              (std::vector<Phase>{Phase::Liquid, Phase::Solid, Phase::Vapor}));
    EXPECT_EQ(r.summary.states, 4u);
    // The closest approach to the sublimation curve is state 2: -45 °C at 10 Pa, 2.81 K below
    // the frost point (python3-iapws as above).
    ASSERT_TRUE(r.summary.minMargins.count("sublimation (ice Ih)"));
    const MarginRecord &m = r.summary.minMargins.at("sublimation (ice Ih)");
    EXPECT_NEAR(m.minAbsDT_K, 230.96066158810027 - 228.15, 1e-6);
    EXPECT_EQ(m.index, 2u);
}

TEST(PathCo2, SupercriticalDryingNeverCrossesLiquidVapor) {
    const PhaseDiagram d(testdata::carbonDioxide());
    // Liquid at 6 MPa and 15 °C, pressurise to 10 MPa, heat to 40 °C, vent to 0.1 MPa at 40 °C.
    const std::vector<State> path = {
        {kNaN, 288.15, 6e6}, {kNaN, 288.15, 10e6}, {kNaN, 313.15, 10e6}, {kNaN, 313.15, 0.1e6}};
    const PathResult r = analysePath(d, path);
    ASSERT_EQ(transitions(r), (std::vector<Transition>{Transition::EnterSupercritical,
                                                       Transition::LeaveSupercritical}));
    EXPECT_FALSE(r.summary.crossesLiquidVapor);
    // Entering at Tc = 304.1282 K (Span & Wagner 1996) on the 10 MPa isobar; leaving at
    // pc = 7.3773 MPa on the 40 °C isotherm.
    EXPECT_NEAR(r.events[0].T_K, 304.1282, 1e-6);
    EXPECT_NEAR(r.events[0].P_Pa, 10e6, 1e-3);
    EXPECT_EQ(r.events[0].from, Phase::Liquid);
    EXPECT_NEAR(r.events[1].T_K, 313.15, 1e-9);
    EXPECT_NEAR(r.events[1].P_Pa, 7.3773e6, 1e-2);
    EXPECT_EQ(r.events[1].to, Phase::Gas);
    EXPECT_TRUE(std::isnan(r.events[0].time_s));  // untimed path
    EXPECT_EQ(r.summary.phasesVisited,
              (std::vector<Phase>{Phase::Liquid, Phase::Supercritical, Phase::Gas}));
}

TEST(PathCo2, VentingTheLiquidDoesCrossLiquidVapor) {
    const PhaseDiagram d(testdata::carbonDioxide());
    // 15 °C from 6 MPa to 1 MPa: boils at p_vap(288.15 K) = 5.086 MPa (Span & Wagner 1996,
    // eq. 3.13 evaluated: 5.0860 MPa; the table value 5.0867 MPa, from memory).
    const std::vector<State> path = {{kNaN, 288.15, 6e6}, {kNaN, 288.15, 1e6}};
    const PathResult r = analysePath(d, path);
    ASSERT_EQ(transitions(r), (std::vector<Transition>{Transition::Vaporization}));
    EXPECT_TRUE(r.summary.crossesLiquidVapor);
    EXPECT_NEAR(r.events[0].P_Pa, 5.086e6, 2e3);
}

TEST(PathWater, OneLegCanCrossSeveralBoundaries) {
    const PhaseDiagram d(testdata::water());
    // Ice at -13 °C heated to 107 °C at 1 atm in one step: melting, then vaporization.
    const std::vector<State> path = {{kNaN, 260.0, 101325.0}, {kNaN, 380.0, 101325.0}};
    const PathResult r = analysePath(d, path);
    ASSERT_EQ(transitions(r),
              (std::vector<Transition>{Transition::Melting, Transition::Vaporization}));
    EXPECT_NEAR(r.events[0].T_K, 273.1525190797695, 1e-6);  // python3-iapws, as above
    EXPECT_NEAR(r.events[1].T_K, 373.1242958054116, 1e-5);  // python3-iapws SR1-86
    EXPECT_EQ(r.summary.phasesVisited,
              (std::vector<Phase>{Phase::Solid, Phase::Liquid, Phase::Vapor}));
}

TEST(PathWater, GasToVaporIsNoTransition) {
    const PhaseDiagram d(testdata::water());
    // Cooling superheated steam through Tc at 1 bar stays one fluid region (common practice).
    const std::vector<State> path = {{kNaN, 700.0, 1e5}, {kNaN, 600.0, 1e5}};
    const PathResult r = analysePath(d, path);
    EXPECT_TRUE(r.events.empty());
    EXPECT_EQ(r.summary.phasesVisited, (std::vector<Phase>{Phase::Gas, Phase::Vapor}));
}

TEST(PathWater, DepositionAndCondensationWords) {
    const PhaseDiagram d(testdata::water());
    const std::vector<State> dep = {{kNaN, 260.0, 10.0}, {kNaN, 220.0, 10.0}};
    EXPECT_EQ(transitions(analysePath(d, dep)), (std::vector<Transition>{Transition::Deposition}));
    const std::vector<State> cond = {{kNaN, 380.0, 101325.0}, {kNaN, 360.0, 101325.0}};
    EXPECT_EQ(transitions(analysePath(d, cond)),
              (std::vector<Transition>{Transition::Condensation}));
    EXPECT_EQ(toString(Transition::EnterSupercritical), "enter_supercritical");
    EXPECT_EQ(toString(Transition::Sublimation), "sublimation");
}

TEST(PathWater, EmptyAndBadPaths) {
    const PhaseDiagram d(testdata::water());
    EXPECT_TRUE(analysePath(d, {}).events.empty());
    const std::vector<State> bad = {{kNaN, 300.0, 1e5}, {kNaN, -1.0, 1e5}};
    EXPECT_THROW(analysePath(d, bad), DomainError);
}

}  // namespace
}  // namespace pw
