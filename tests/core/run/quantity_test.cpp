// Quantity strings of plan and rule files.
#include "core/run/quantity.h"

#include <gtest/gtest.h>

#include "core/errors.h"

namespace pw::run {
namespace {

TEST(RunQuantity, TemperaturesPressuresAndDurations) {
    // 0 degC = 273.15 K exactly (SI Brochure, 9th ed., 2019, section 2.3.1).
    EXPECT_DOUBLE_EQ(parseTemperature("-45 degC"), 228.15);
    EXPECT_DOUBLE_EQ(parseTemperature("-45degC"), 228.15);
    // 1 Torr = 101325/760 Pa (definition of the torr).
    EXPECT_NEAR(parsePressure("100 mTorr"), 13.3322368, 1e-6);
    EXPECT_DOUBLE_EQ(parsePressure("6 MPa"), 6e6);
    EXPECT_DOUBLE_EQ(parseDuration("1.5 h"), 5400.0);
    EXPECT_DOUBLE_EQ(parseDuration("90 min"), 5400.0);
}

TEST(RunQuantity, DifferencesCarryNoOffset) {
    EXPECT_DOUBLE_EQ(parseTemperatureDifference("5 degC"), 5.0);
    // 1 degF difference = 5/9 K (definition of the Fahrenheit scale).
    EXPECT_NEAR(parseTemperatureDifference("9 degF"), 5.0, 1e-12);
    EXPECT_DOUBLE_EQ(parsePressureDifference("-5 Pa"), -5.0);
    EXPECT_DOUBLE_EQ(parsePressureDifference("-0.1 bar"), -1e4);
}

TEST(RunQuantity, Rates) {
    EXPECT_NEAR(parseTemperatureRate("0.5 K/min"), 0.5 / 60.0, 1e-15);
    EXPECT_NEAR(parseTemperatureRate("1 degC/h"), 1.0 / 3600.0, 1e-15);
    EXPECT_NEAR(parsePressureRate("0.5 bar/min"), 5e4 / 60.0, 1e-9);
}

TEST(RunQuantity, RefusesMissingOrUnknownUnits) {
    EXPECT_THROW(parseTemperature("-45"), UnitError);
    EXPECT_THROW(parsePressure("10 furlongs"), UnitError);
    EXPECT_THROW(parseDuration("2 fortnights"), UnitError);
    EXPECT_THROW(parseTemperatureRate("0.5 K"), UnitError);
    EXPECT_THROW(parseTemperature("cold"), Error);
    EXPECT_THROW(parseTemperature("nan K"), Error);
}

}  // namespace
}  // namespace pw::run
