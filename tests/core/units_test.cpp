#include "core/units.h"

#include <gtest/gtest.h>

#include "core/errors.h"

namespace pw {
namespace {

TEST(Units, TemperatureSpellings) {
    EXPECT_EQ(parseTemperatureUnit("K"), TemperatureUnit::Kelvin);
    EXPECT_EQ(parseTemperatureUnit(" degC "), TemperatureUnit::Celsius);
    EXPECT_EQ(parseTemperatureUnit("\u00B0C"), TemperatureUnit::Celsius);
    EXPECT_EQ(parseTemperatureUnit("C"), TemperatureUnit::Celsius);
    EXPECT_EQ(parseTemperatureUnit("degF"), TemperatureUnit::Fahrenheit);
    EXPECT_EQ(parseTemperatureUnit("°F"), TemperatureUnit::Fahrenheit);
    EXPECT_EQ(parseTemperatureUnit("degR"), TemperatureUnit::Rankine);
    EXPECT_THROW(parseTemperatureUnit("kelvins please"), UnitError);
    EXPECT_THROW(parseTemperatureUnit(""), UnitError);
}

TEST(Units, PressureSpellings) {
    EXPECT_EQ(parsePressureUnit("Pa"), PressureUnit::Pa);
    EXPECT_EQ(parsePressureUnit("MPa"), PressureUnit::MPa);
    EXPECT_EQ(parsePressureUnit("mtorr"), PressureUnit::mTorr);
    EXPECT_EQ(parsePressureUnit("\u00B5bar"), PressureUnit::ubar);
    EXPECT_EQ(parsePressureUnit("ubar"), PressureUnit::ubar);
    EXPECT_EQ(parsePressureUnit("psia"), PressureUnit::psi);
    EXPECT_THROW(parsePressureUnit("mPa"), UnitError);   // millipascal: refused, not mistaken
    EXPECT_THROW(parsePressureUnit("psig"), UnitError);  // gauge pressure is not absolute
    try {
        parsePressureUnit("furlongs");
        FAIL();
    } catch (const UnitError &e) {
        EXPECT_NE(std::string(e.what()).find("furlongs"), std::string::npos);
    }
}

// Definitions: 0 degC = 273.15 K (ITS-90 convention), degF/degR by their definitions
// (common practice).
TEST(Units, TemperatureConversions) {
    EXPECT_DOUBLE_EQ(toKelvin(0.0, TemperatureUnit::Celsius), 273.15);
    EXPECT_DOUBLE_EQ(toKelvin(32.0, TemperatureUnit::Fahrenheit), 273.15);
    EXPECT_NEAR(toKelvin(-459.67, TemperatureUnit::Fahrenheit), 0.0, 1e-12);
    EXPECT_DOUBLE_EQ(toKelvin(491.67, TemperatureUnit::Rankine), 273.15);
    for (auto u : {TemperatureUnit::Kelvin, TemperatureUnit::Celsius, TemperatureUnit::Fahrenheit,
                   TemperatureUnit::Rankine})
        EXPECT_NEAR(toKelvin(fromKelvin(216.592, u), u), 216.592, 1e-12);
    EXPECT_DOUBLE_EQ(differenceFromKelvin(10.0, TemperatureUnit::Fahrenheit), 18.0);
}

// 760 mmHg = 1 atm = 101 325 Pa (common practice; the conventional mmHg, 133.322387415 Pa,
// differs from 1/760 atm by 1.4e-7 relative). 1 mTorr = 0.1333 Pa and 1 ubar = 0.1 Pa
// (FIELD-NOTES, common practice).
TEST(Units, PressureConversions) {
    EXPECT_DOUBLE_EQ(toPascal(1.0, PressureUnit::atm), 101325.0);
    EXPECT_NEAR(toPascal(760.0, PressureUnit::mmHg), 101325.0, 101325.0 * 2e-7);
    EXPECT_DOUBLE_EQ(toPascal(760.0, PressureUnit::Torr), 101325.0);
    EXPECT_NEAR(toPascal(1.0, PressureUnit::mTorr), 0.1333, 1e-4);
    EXPECT_DOUBLE_EQ(toPascal(1.0, PressureUnit::ubar), 0.1);
    EXPECT_DOUBLE_EQ(toPascal(1.0, PressureUnit::bar), 1e5);
    EXPECT_NEAR(toPascal(14.6959, PressureUnit::psi), 101325.0, 1.0);
    EXPECT_DOUBLE_EQ(fromPascal(7.3773e6, PressureUnit::MPa), 7.3773);
}

}  // namespace
}  // namespace pw
