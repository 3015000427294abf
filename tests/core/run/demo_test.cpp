// The bundled demo scenario (invented data, resources/demo): acceptance checks of issue 10.
#include <gtest/gtest.h>

#include <algorithm>

#include "core/library.h"
#include "core/run/demo.h"
#include "core/run/downsample.h"
#include "core/run/run_analysis.h"
#include "reference_curves.h"

namespace pw::run {
namespace {

std::vector<Transition> transitions(const PathResult &r) {
    std::vector<Transition> out;
    for (const auto &e : r.events) out.push_back(e.transition);
    return out;
}

struct Loaded {
    DemoScenario scenario;
    std::shared_ptr<const PhaseDiagram> diagram;
    RunLog log;
    RuleSet rules;
};

Loaded load(const std::string &id) {
    Loaded l{demoScenario(id), nullptr, {}, {}};
    l.diagram = testref::diagramFor(l.scenario.substance);
    l.log = readDemoRun(l.scenario);
    l.rules = readDemoRules(l.scenario);
    return l;
}

TEST(RunDemo, ListsBothScenarios) {
    const auto s = demoScenarios();
    ASSERT_EQ(s.size(), 2u);
    EXPECT_THROW(demoScenario("no-such-demo"), Error);
}

TEST(RunDemo, FreezeDryingFreezesThenSublimesAndNeverMelts) {
    const Loaded d = load("freeze-drying");
    EXPECT_EQ(d.log.layout.header[d.log.layout.temperatureColumn], "product_T [degC]");
    EXPECT_EQ(d.log.layout.header[d.log.layout.pressureColumn], "chamber_P [mTorr]");
    ASSERT_GT(d.log.states.size(), 4000u);
    const RunAnalysis a = analyseStates(*d.diagram, d.log.states, &d.rules);
    EXPECT_EQ(transitions(a.path),
              (std::vector<Transition>{Transition::Freezing, Transition::Sublimation}));
    // Freezing at atmospheric pressure happens near 0 degC (water's normal melting point,
    // 273.15 K, common practice), sublimation once the product is warmer than the frost point
    // of 10 Pa (230.96 K = -42.19 degC from IAPWS R14-08 eq. 6, solved by bisection).
    ASSERT_EQ(a.path.events.size(), 2u);
    EXPECT_NEAR(a.path.events[0].T_K, 273.15, 0.01);
    EXPECT_NEAR(a.path.events[1].T_K, 230.96, 0.3);
    EXPECT_FALSE(a.path.summary.crossesLiquidVapor);
    for (const auto &v : a.verdicts)
        EXPECT_EQ(v.verdict, Verdict::Pass) << v.ruleId << ": " << v.detail;
    ASSERT_EQ(a.verdicts.size(), 5u);
}

TEST(RunDemo, AMeltBackInTheFreezeDryingRunFailsTheRule) {
    // Pressure rise to 1 kPa (above the triple-point pressure 611.657 Pa, IAPWS R14-08) with
    // the product at -0.5 degC and then +1 degC, 10 h into the run: the frozen product melts.
    Loaded d = load("freeze-drying");
    auto &s = d.log.states;
    const std::size_t i = 10 * 120;  // 30 s samples
    s[i] = {s[i].time_s, 272.65, 1000.0};
    s[i + 1] = {s[i + 1].time_s, 274.15, 1000.0};
    const RunAnalysis a = analyseStates(*d.diagram, s, &d.rules);
    const auto melt = std::find_if(a.verdicts.begin(), a.verdicts.end(), [](const RuleVerdict &v) {
        return v.ruleId == "no-melting-during-drying";
    });
    ASSERT_NE(melt, a.verdicts.end());
    EXPECT_EQ(melt->verdict, Verdict::Fail);
    EXPECT_GE(melt->firstViolation_s, s[i].time_s);
    EXPECT_LE(melt->firstViolation_s, s[i + 1].time_s);
    EXPECT_FALSE(allPassed(a.verdicts));
}

TEST(RunDemo, Co2DryingGoesSupercriticalWithoutCrossingLiquidVapor) {
    const Loaded d = load("co2-drying");
    EXPECT_EQ(d.log.layout.header[d.log.layout.temperatureColumn], "vessel_T [degC]");
    const RunAnalysis a = analyseStates(*d.diagram, d.log.states, &d.rules);
    EXPECT_EQ(transitions(a.path), (std::vector<Transition>{Transition::EnterSupercritical,
                                                            Transition::LeaveSupercritical}));
    EXPECT_FALSE(a.path.summary.crossesLiquidVapor);
    const auto &visited = a.path.summary.phasesVisited;
    EXPECT_NE(std::find(visited.begin(), visited.end(), Phase::Supercritical), visited.end());
    EXPECT_EQ(visited.front(), Phase::Liquid);
    for (const auto &v : a.verdicts)
        EXPECT_EQ(v.verdict, Verdict::Pass) << v.ruleId << ": " << v.detail;
}

TEST(RunDemo, PlansShowTheSameTransitionsAndPassTheirRules) {
    for (const std::string id : {"freeze-drying", "co2-drying"}) {
        const Loaded d = load(id);
        const ExpandedPlan e = expandPlan(readDemoPlan(d.scenario));
        const RunAnalysis planned = analyseStates(*d.diagram, e.states, &d.rules);
        const RunAnalysis run = analyseStates(*d.diagram, d.log.states);
        EXPECT_EQ(transitions(planned.path), transitions(run.path)) << id;
        for (const auto &v : planned.verdicts)
            EXPECT_EQ(v.verdict, Verdict::Pass) << id << " " << v.ruleId << ": " << v.detail;
    }
}

TEST(RunDemo, DownsampledRunKeepsExtremesAndEnds) {
    const Loaded d = load("freeze-drying");
    const auto &s = d.log.states;
    const auto idx = downsampleIndices(s, 600);
    EXPECT_LE(idx.size(), 600u);
    EXPECT_EQ(idx.front(), 0u);
    EXPECT_EQ(idx.back(), s.size() - 1);
    EXPECT_TRUE(std::is_sorted(idx.begin(), idx.end()));
    const auto byT = [](const State &a, const State &b) { return a.T_K < b.T_K; };
    const auto byP = [](const State &a, const State &b) { return a.P_Pa < b.P_Pa; };
    const auto kept = downsample(s, 600);
    EXPECT_EQ(std::min_element(kept.begin(), kept.end(), byT)->T_K,
              std::min_element(s.begin(), s.end(), byT)->T_K);
    EXPECT_EQ(std::max_element(kept.begin(), kept.end(), byT)->T_K,
              std::max_element(s.begin(), s.end(), byT)->T_K);
    EXPECT_EQ(std::min_element(kept.begin(), kept.end(), byP)->P_Pa,
              std::min_element(s.begin(), s.end(), byP)->P_Pa);
    EXPECT_EQ(std::max_element(kept.begin(), kept.end(), byP)->P_Pa,
              std::max_element(s.begin(), s.end(), byP)->P_Pa);
}

TEST(RunDemo, MarginsInPrimaryDryingAreToTheSublimationCurve) {
    const Loaded d = load("freeze-drying");
    // 12 h into the run: product near -32 degC at 10 Pa, vapor side of the sublimation curve.
    const std::size_t i = 12 * 120;
    const std::vector<std::size_t> idx{i};
    const auto m = marginsOverTime(*d.diagram, d.log.states, idx);
    ASSERT_EQ(m.size(), 1u);
    EXPECT_EQ(m[0].phase, Phase::Vapor);
    EXPECT_EQ(m[0].nearest.rfind("sublimation", 0), 0u) << m[0].nearest;
    EXPECT_LT(m[0].dP_Pa, -15.0);  // P_ice(-32 degC) = 31 Pa (IAPWS R14-08) vs 10 Pa
    EXPECT_GT(m[0].dT_K, 8.0);
}

}  // namespace
}  // namespace pw::run
