// Event times on synthetic paths whose true crossing time follows from the boundary equation:
// the detected time must lie within one sample of it (issue 10 acceptance).
#include <gtest/gtest.h>

#include "core/library.h"
#include "core/run/planned_path.h"
#include "reference_curves.h"

namespace pw::run {
namespace {

std::vector<State> sampled(double tEnd, double dt, double (*T)(double), double (*P)(double)) {
    std::vector<State> s;
    for (double t = 0.0; t <= tEnd + 1e-9; t += dt) s.push_back({t, T(t), P(t)});
    return s;
}

TEST(RunCrossingTime, ReferenceCurvesReproducePublishedValues) {
    // IAPWS R14-08 check value (FIELD-NOTES): sublimation pressure at 230 K = 8.94735e-6 MPa.
    EXPECT_NEAR(testref::iceSublimationPa(230.0), 8.94735, 5e-5);
    // python3-iapws _Sublimation_Pressure(233.15) = 1.284117e-5 MPa (12.84 Pa at -40 degC).
    EXPECT_NEAR(testref::iceSublimationPa(233.15), 12.84117, 1e-4);
    // Span & Wagner (1996) eq. 3.13 ends at the critical point by construction.
    EXPECT_NEAR(testref::co2VaporPa(304.1282), 7.3773e6, 1e-3);
}

TEST(RunCrossingTime, IceSublimesWithinOneSampleOfTheFrostPoint) {
    // Ice warmed at 10 Pa, 0.01 K/s, sampled every 30 s (0.3 K).
    const auto water = testref::diagramFor("water");
    const auto states = sampled(
        4000.0, 30.0, [](double t) { return 230.0 + 0.01 * t; }, [](double) { return 10.0; });
    const double Tstar =
        testref::bisect([](double T) { return testref::iceSublimationPa(T) - 10.0; }, 200.0, 273.0);
    const double tStar = (Tstar - 230.0) / 0.01;
    const PathResult r = analysePath(*water, states);
    ASSERT_EQ(r.events.size(), 1u);
    EXPECT_EQ(r.events[0].transition, Transition::Sublimation);
    EXPECT_NEAR(r.events[0].time_s, tStar, 30.0);
    EXPECT_NEAR(r.events[0].T_K, Tstar, 0.3);
}

TEST(RunCrossingTime, LiquidCo2BoilsWithinOneSampleOfTheVaporPressure) {
    // Isothermal depressurisation of liquid CO2 at 280 K, 1 kPa/s, sampled every 10 s.
    const auto co2 = testref::diagramFor("carbon-dioxide");
    const auto states = sampled(
        2500.0, 10.0, [](double) { return 280.0; }, [](double t) { return 6e6 - 1e3 * t; });
    const double tStar = (6e6 - testref::co2VaporPa(280.0)) / 1e3;
    const PathResult r = analysePath(*co2, states);
    ASSERT_EQ(r.events.size(), 1u);
    EXPECT_EQ(r.events[0].transition, Transition::Vaporization);
    EXPECT_NEAR(r.events[0].time_s, tStar, 10.0);
    EXPECT_TRUE(r.summary.crossesLiquidVapor);
}

TEST(RunCrossingTime, PlannedHeatingAboveTcEntersTheSupercriticalRegion) {
    // Liquid CO2 at 10 MPa heated 290 K -> 320 K over 30 min: Tc = 304.1282 K (Span &
    // Wagner 1996) is reached after (304.1282 - 290) / 30 * 1800 s = 847.7 s.
    const auto co2 = testref::diagramFor("carbon-dioxide");
    Plan plan;
    plan.start = {0.0, 290.0, 10e6};
    PlanStep heat;
    heat.kind = StepKind::Isobaric;
    heat.T_K = 320.0;
    heat.duration_s = 1800.0;
    plan.steps.push_back(heat);
    const ExpandedPlan e = expandPlan(plan, 60.0);
    const PathResult r = analysePath(*co2, e.states);
    ASSERT_EQ(r.events.size(), 1u);
    EXPECT_EQ(r.events[0].transition, Transition::EnterSupercritical);
    EXPECT_NEAR(r.events[0].time_s, (304.1282 - 290.0) / 30.0 * 1800.0, 60.0);
    EXPECT_FALSE(r.summary.crossesLiquidVapor);
}

}  // namespace
}  // namespace pw::run
