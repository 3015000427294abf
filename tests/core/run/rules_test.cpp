// Rules: parsing, verdicts and the first violating time on synthetic paths with known answers.
#include "core/run/rules.h"

#include <gtest/gtest.h>

#include "core/errors.h"
#include "core/library.h"
#include "reference_curves.h"

namespace pw::run {
namespace {

std::shared_ptr<const PhaseDiagram> diagram(const char *id) { return testref::diagramFor(id); }

// States every dt seconds from t = 0 to tEnd with T(t), P(t).
template <typename FT, typename FP>
std::vector<State> path(double tEnd, double dt, FT T, FP P) {
    std::vector<State> s;
    for (double t = 0.0; t <= tEnd + 1e-9; t += dt) s.push_back({t, T(t), P(t)});
    return s;
}

RuleSet rules(const std::string &json) {
    return parseRulesJson(
        R"({"format": "phasewright-rules", "version": 1, "rules": [)" + json + "]}", "rules.json");
}

std::vector<RuleVerdict> check(const RuleSet &r, const PhaseDiagram &d,
                               const std::vector<State> &s) {
    return checkRules(r, d, s, analysePath(d, s));
}

TEST(RunRules, TemperatureLimitWithInterpolatedFirstViolation) {
    const auto water = diagram("water");
    const auto s = path(
        300.0, 30.0, [](double t) { return 250.0 + 0.1 * t; }, [](double) { return 10.0; });
    const auto v = check(rules(R"({"id": "cap", "check": "temperature", "max": "260 K"},
                                   {"id": "late", "check": "temperature", "max": "260 K", "from": "200 s"},
                                   {"id": "early", "check": "temperature", "max": "260 K", "to": "90 s"},
                                   {"id": "never", "check": "temperature", "max": "260 K", "from": "1 h"})"),
                         *water, s);
    ASSERT_EQ(v.size(), 4u);
    EXPECT_EQ(v[0].verdict, Verdict::Fail);
    EXPECT_NEAR(v[0].firstViolation_s, 100.0, 1e-9);  // 250 K + 0.1 K/s * 100 s = 260 K
    EXPECT_NEAR(v[0].T_K, 260.0, 1e-9);
    EXPECT_EQ(v[0].index, 4u);  // the state at 120 s
    EXPECT_EQ(v[1].verdict, Verdict::Fail);
    EXPECT_DOUBLE_EQ(v[1].firstViolation_s,
                     210.0);  // violated at the first sample inside the window
    EXPECT_EQ(v[2].verdict, Verdict::Pass);
    EXPECT_EQ(v[2].statesChecked, 4u);
    EXPECT_EQ(v[3].verdict, Verdict::NoData);
    EXPECT_FALSE(allPassed(v));
}

TEST(RunRules, SublimationDrivingForceFirstFailsWhereTheCurveSaysSo) {
    // Product cooling at 10 Pa: the driving force P_ice(T) - P falls below 5 Pa where
    // P_ice(T) = 15 Pa (ice vapor pressure from IAPWS R14-08 eq. 6, tests' own copy).
    const auto water = diagram("water");
    const double rate = 0.01, T0 = 250.0, dt = 30.0;
    const auto s = path(
        4000.0, dt, [&](double t) { return T0 - rate * t; }, [](double) { return 10.0; });
    const double Tstar =
        testref::bisect([](double T) { return testref::iceSublimationPa(T) - 15.0; }, 200.0, 273.0);
    const double tStar = (T0 - Tstar) / rate;
    const auto v =
        check(rules(R"({"id": "df", "check": "sublimation_dP", "max": "-5 Pa"})"), *water, s);
    ASSERT_EQ(v[0].verdict, Verdict::Fail) << v[0].detail;
    EXPECT_NEAR(v[0].firstViolation_s, tStar, dt);   // within one sample (acceptance)
    EXPECT_NEAR(v[0].firstViolation_s, tStar, 1.0);  // linear interpolation does far better
}

TEST(RunRules, FrostPointMarginSign) {
    // dT_K = T - T_frost(P): the frost point of 10 Pa from IAPWS R14-08 eq. 6 (tests' copy).
    const auto water = diagram("water");
    const double Tfrost =
        testref::bisect([](double T) { return testref::iceSublimationPa(T) - 10.0; }, 200.0, 273.0);
    const auto s = path(
        2000.0, 30.0, [](double t) { return 250.0 - 0.01 * t; }, [](double) { return 10.0; });
    const auto v = check(rules(R"({"id": "m", "check": "sublimation_dT", "min": "3 K"},
                                   {"id": "warm", "check": "sublimation_dT", "min": "1 K", "to": "500 s"})"),
                         *water, s);
    ASSERT_EQ(v[0].verdict, Verdict::Fail) << v[0].detail;
    EXPECT_NEAR(v[0].firstViolation_s, (250.0 - (Tfrost + 3.0)) / 0.01, 30.0);
    EXPECT_NEAR(v[0].T_K, Tfrost + 3.0, 0.01);
    EXPECT_EQ(v[1].verdict, Verdict::Pass) << v[1].detail;
}

TEST(RunRules, SublimationRulesFailAboveTheTriplePoint) {
    const auto water = diagram("water");
    const std::vector<State> s{{0.0, 280.0, 10.0}, {30.0, 281.0, 10.0}};
    const auto v =
        check(rules(R"({"id": "df", "check": "sublimation_dP", "max": "-5 Pa"})"), *water, s);
    EXPECT_EQ(v[0].verdict, Verdict::Fail);
    EXPECT_DOUBLE_EQ(v[0].firstViolation_s, 0.0);
}

TEST(RunRules, ForbiddenTransitionsUseTheEventTime) {
    const auto water = diagram("water");
    const auto s = path(
        3000.0, 30.0, [](double t) { return 230.0 + 0.01 * t; }, [](double) { return 10.0; });
    const auto v =
        check(rules(R"({"id": "no-sub", "check": "no_transition", "transitions": ["sublimation"]},
                                   {"id": "no-melt", "check": "no_transition", "transitions": ["melting", "freezing"]})"),
              *water, s);
    const double Tfrost =
        testref::bisect([](double T) { return testref::iceSublimationPa(T) - 10.0; }, 200.0, 273.0);
    ASSERT_EQ(v[0].verdict, Verdict::Fail);
    EXPECT_NEAR(v[0].firstViolation_s, (Tfrost - 230.0) / 0.01, 30.0);
    EXPECT_EQ(v[1].verdict, Verdict::Pass);
}

TEST(RunRules, SupercriticalDuringAWindow) {
    // Isothermal vent of CO2 at 320 K from 10 MPa at 10 kPa/s: leaves the supercritical
    // region at pc = 7.3773 MPa (Span & Wagner 1996), t = 262.7 s.
    const auto co2 = diagram("carbon-dioxide");
    const auto s = path(
        600.0, 10.0, [](double) { return 320.0; }, [](double t) { return 10e6 - 1e4 * t; });
    const auto v = check(rules(R"({"id": "sc", "check": "supercritical"},
                                   {"id": "sc-early", "check": "supercritical", "to": "4 min"})"),
                         *co2, s);
    ASSERT_EQ(v[0].verdict, Verdict::Fail);
    EXPECT_NEAR(v[0].firstViolation_s, (10e6 - 7.3773e6) / 1e4, 0.5);
    EXPECT_EQ(v[1].verdict, Verdict::Pass);
}

void expectBad(const std::string &json, long row, const std::string &field) {
    try {
        rules(json);
        ADD_FAILURE() << json;
    } catch (const InputError &e) {
        EXPECT_EQ(e.file(), "rules.json");
        EXPECT_EQ(e.row(), row) << e.what();
        EXPECT_EQ(e.field(), field) << e.what();
    }
}

TEST(RunRules, BadRuleFilesNameRuleAndField) {
    expectBad(R"({"check": "temperature", "max": "1 K"}, {"check": "colour"})", 2, "check");
    expectBad(R"({"check": "temperature", "max": "-25"})", 1, "max");
    expectBad(R"({"check": "temperature"})", 1, "max");
    expectBad(R"({"check": "temperature", "min": "10 K", "max": "5 K"})", 1, "min");
    expectBad(R"({"check": "no_transition", "transitions": ["teleport"]})", 1, "transitions");
    expectBad(R"({"check": "no_transition", "transitions": []})", 1, "transitions");
    expectBad(R"({"check": "supercritical", "max": "1 K"})", 1, "max");
    expectBad(R"({"check": "pressure", "max": "1 bar", "from": "2 h", "to": "1 h"})", 1, "from");
    expectBad(R"({"check": "pressure", "max": "1 bar", "when": "always"})", 1, "when");
    EXPECT_THROW(parseRulesJson(R"({"format": "phasewright-rules", "version": 2, "rules": []})"),
                 InputError);
}

TEST(RunRules, UntimedPathWithAWindowIsRefused) {
    const auto water = diagram("water");
    const std::vector<State> s{{kNaN, 250.0, 10.0}, {kNaN, 251.0, 10.0}};
    EXPECT_THROW(
        check(rules(R"({"check": "temperature", "max": "1000 K", "from": "1 h"})"), *water, s),
        DomainError);
    EXPECT_EQ(check(rules(R"({"check": "temperature", "max": "1000 K"})"), *water, s)[0].verdict,
              Verdict::Pass);
}

}  // namespace
}  // namespace pw::run
