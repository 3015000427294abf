#pragma once
// Quantities written as "number unit" strings in plan and rule files ("-45 degC", "10 Pa",
// "0.5 K/min", "2 h"). The number and the unit may be separated by blanks or not ("10Pa").
// Every function returns SI values inside Phasewright's conventions (K, Pa, s) and throws
// UnitError for an unknown unit and Error for a missing or malformed number.
#include <string>
#include <string_view>

namespace pw::run {

// Absolute temperature -> K ("-45 degC", "228.15 K").
double parseTemperature(std::string_view text);
// Temperature difference -> K ("5 K", "5 degC" = 5 K, "9 degF" = 5 K).
double parseTemperatureDifference(std::string_view text);
// Absolute pressure -> Pa ("10 Pa", "100 mTorr", "6 MPa").
double parsePressure(std::string_view text);
// Pressure difference -> Pa (same units as parsePressure; no offset involved).
double parsePressureDifference(std::string_view text);
// Duration -> s: s, sec, min, h, hr, d ("90 min", "1.5 h").
double parseDuration(std::string_view text);
// Seconds per one duration unit; throws UnitError for an unknown one.
double secondsPer(std::string_view unit);
// Temperature rate -> K/s ("0.5 K/min", "1 degC/h").
double parseTemperatureRate(std::string_view text);
// Pressure rate -> Pa/s ("0.1 MPa/min").
double parsePressureRate(std::string_view text);

// Splits "number unit" into the number and the trimmed unit (the unit may be empty).
struct NumberAndUnit {
    double value = 0.0;
    std::string unit;
};
NumberAndUnit splitQuantity(std::string_view text);

}  // namespace pw::run
