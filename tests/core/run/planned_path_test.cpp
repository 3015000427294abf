// Planned paths: parsing the step language and expanding it into timed states.
#include "core/run/planned_path.h"

#include <gtest/gtest.h>

#include <cmath>

#include "core/errors.h"

namespace pw::run {
namespace {

constexpr const char *kJson = R"({
  "format": "phasewright-plan", "version": 1, "name": "t", "substance": "water",
  "resolution": "60 s",
  "start": {"T": "20 degC", "P": "1 atm"},
  "steps": [
    {"step": "isobaric", "T": "-40 degC", "rate": "1 K/min", "label": "freezing"},
    {"step": "isothermal", "P": "10 Pa", "duration": "10 min", "scale": "log"},
    {"step": "hold", "duration": "90 s"},
    {"step": "ramp", "T": "-20 degC", "P": "20 Pa", "duration": "1 h"}
  ]})";

constexpr const char *kText = R"(# the same plan in the text form
plan name=t substance=water resolution=60s
start T=20degC P=1atm
isobaric T=-40degC rate=1K/min label="freezing"
isothermal P=10Pa duration=10min scale=log
hold duration="90 s"
ramp T=-20degC P=20Pa duration=1h
)";

TEST(PlannedPath, ExpandsStepsAtTheResolution) {
    const ExpandedPlan e = expandPlan(parsePlanJson(kJson));
    // isobaric: 60 K at 1 K/min = 60 min -> 60 states; isothermal 10 min -> 10; hold 90 s at
    // 60 s -> 2 intervals; ramp 1 h -> 60. Plus the start.
    ASSERT_EQ(e.states.size(), 1u + 60u + 10u + 2u + 60u);
    ASSERT_EQ(e.spans.size(), 4u);
    EXPECT_EQ(e.spans[0].label, "freezing");
    EXPECT_EQ(e.spans[2].label, "hold 3");
    EXPECT_DOUBLE_EQ(e.spans[0].end_s, 3600.0);
    EXPECT_DOUBLE_EQ(e.spans[1].end_s, 4200.0);
    EXPECT_DOUBLE_EQ(e.spans[2].end_s, 4290.0);
    EXPECT_DOUBLE_EQ(e.states.back().time_s, 4290.0 + 3600.0);
    EXPECT_DOUBLE_EQ(e.states.back().T_K, 253.15);
    EXPECT_DOUBLE_EQ(e.states.back().P_Pa, 20.0);
    // Isobaric leg: constant pressure, 1 K per minute.
    EXPECT_DOUBLE_EQ(e.states[30].P_Pa, 101325.0);
    EXPECT_NEAR(e.states[30].T_K, 293.15 - 30.0, 1e-9);
    // Log-scaled pressure: the midpoint of the isothermal leg is the geometric mean.
    EXPECT_NEAR(e.states[65].P_Pa, std::sqrt(101325.0 * 10.0), 1e-6);
    EXPECT_DOUBLE_EQ(e.states[65].T_K, 233.15);
    for (std::size_t i = 1; i < e.states.size(); ++i)
        EXPECT_GT(e.states[i].time_s, e.states[i - 1].time_s);
}

TEST(PlannedPath, TextFormMatchesJson) {
    const ExpandedPlan a = expandPlan(parsePlanJson(kJson));
    const ExpandedPlan b = expandPlan(parsePlan(kText));
    ASSERT_EQ(a.states.size(), b.states.size());
    for (std::size_t i = 0; i < a.states.size(); ++i) {
        EXPECT_DOUBLE_EQ(a.states[i].time_s, b.states[i].time_s);
        EXPECT_DOUBLE_EQ(a.states[i].T_K, b.states[i].T_K);
        EXPECT_DOUBLE_EQ(a.states[i].P_Pa, b.states[i].P_Pa);
    }
}

TEST(PlannedPath, RoundTripsThroughJson) {
    const Plan p = parsePlanJson(kJson);
    const Plan q = parsePlanJson(planToJson(p));
    const ExpandedPlan a = expandPlan(p), b = expandPlan(q);
    ASSERT_EQ(a.states.size(), b.states.size());
    EXPECT_DOUBLE_EQ(a.states.back().time_s, b.states.back().time_s);
    EXPECT_DOUBLE_EQ(a.states[65].P_Pa, b.states[65].P_Pa);
}

TEST(PlannedPath, CoarserResolutionKeepsStepEnds) {
    const ExpandedPlan e = expandPlan(parsePlanJson(kJson), 7 * 60.0);
    for (const StepSpan &s : e.spans) EXPECT_DOUBLE_EQ(e.states[s.lastIndex].time_s, s.end_s);
    EXPECT_EQ(e.states.size(), 1u + 9u + 2u + 1u + 9u);  // ceil(60/7), ceil(10/7), 1, ceil(60/7)
}

void expectInputError(const std::string &text, long row, const std::string &fieldName) {
    try {
        parsePlan(text, "plan.txt");
        ADD_FAILURE() << "no error for: " << text;
    } catch (const InputError &e) {
        EXPECT_EQ(e.file(), "plan.txt");
        EXPECT_EQ(e.row(), row) << e.what();
        EXPECT_EQ(e.field(), fieldName) << e.what();
    }
}

TEST(PlannedPath, BadInputNamesLineAndField) {
    expectInputError("start T=20degC P=1atm\nhold duration=1h\nisobaric T=-40 rate=1K/min\n", 3,
                     "T");
    expectInputError("start T=20degC P=1atm\nwobble duration=1h\n", 2, "step");
    expectInputError("start T=20degC P=1atm\nisobaric T=-40degC\n", 2, "rate");
    expectInputError("start T=20degC P=1atm\nisobaric T=-40degC rate=1K/min duration=1h\n", 2,
                     "rate");
    expectInputError("start T=20degC P=1atm\nisothermal P=-5Pa duration=1h\n", 2, "P");
    expectInputError("start T=20degC P=1atm\nhold duration=1h speed=3\n", 2, "speed");
    expectInputError("start T=20degC P=1atm\nhold duration=-1h\n", 2, "duration");
    expectInputError("start T=20degC\nhold duration=1h\n", 1, "start");
    expectInputError(
        R"({"format": "phasewright-plan", "version": 1, "start": {"T": "1 K", "P": "1 Pa"},
                        "steps": [{"step": "hold", "duration": "1 h"}, {"step": "ramp", "T": "2 K", "duration": "1 h"}]})",
        2, "T");
    expectInputError(R"({"format": "other", "version": 1})", 0, "format");
    expectInputError("{ not json", 0, "");
}

TEST(PlannedPath, ZeroRateWithAChangeThrows) {
    Plan p = parsePlanJson(kJson);
    p.steps[0].rateT_K_s = 0.0;
    EXPECT_THROW(expandPlan(p), DomainError);
}

}  // namespace
}  // namespace pw::run
