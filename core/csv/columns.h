#pragma once
// Finding the temperature, pressure and time columns of a state file, with their units.
// Units come from header brackets (`T [degC]`, `P [mTorr]`, `time [min]`) or from explicit
// options; with neither, kelvin, pascal and seconds. A bracket and an option that disagree
// are refused, never silently reconciled.
#include <cstddef>
#include <optional>
#include <string>
#include <string_view>
#include <vector>

#include "core/units.h"

namespace pw::csv {

inline constexpr std::size_t kNoColumn = static_cast<std::size_t>(-1);

struct HeaderName {
    std::string name;  // "T"
    std::string unit;  // "degC"; empty without brackets
};
// "T [degC]" -> {"T", "degC"}; "pressure" -> {"pressure", ""}.
HeaderName splitHeader(std::string_view cell);

struct StateColumnOptions {
    std::string tColumn;     // header text or its name part; empty: look for T/temperature
    std::string pColumn;     // empty: look for P/pressure
    std::string timeColumn;  // empty: look for time/timestamp (optional column)
    std::optional<std::string> tUnit, pUnit;
    bool wantTime = false;
};

struct StateColumns {
    std::size_t t = kNoColumn, p = kNoColumn, time = kNoColumn;
    TemperatureUnit tUnit = TemperatureUnit::Kelvin;
    PressureUnit pUnit = PressureUnit::Pa;
    double secondsPerTimeUnit = 1.0;  // numeric time columns: s, min, h, d
};

// Throws pw::InputError (row 1, naming the column) when a column is missing or ambiguous or
// a unit is unknown or contradicts the option.
StateColumns resolveStateColumns(const std::vector<std::string> &header,
                                 const StateColumnOptions &options, const std::string &fileName);

// ISO 8601 date-time "2026-12-02T14:03:07", also with a space instead of 'T', fractional
// seconds and a "Z" or "+01:00" offset. Seconds since 1970-01-01 UTC (no offset: read as UTC).
std::optional<double> parseIsoTime(std::string_view text);

}  // namespace pw::csv
