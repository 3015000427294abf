#include "core/run/quantity.h"

#include <array>
#include <cctype>
#include <charconv>
#include <cmath>
#include <utility>

#include "core/errors.h"
#include "core/units.h"

namespace pw::run {
namespace {

std::string_view trim(std::string_view s) {
    while (!s.empty() && std::isspace(static_cast<unsigned char>(s.front()))) s.remove_prefix(1);
    while (!s.empty() && std::isspace(static_cast<unsigned char>(s.back()))) s.remove_suffix(1);
    return s;
}

// "K/min" -> {"K", "min"}; throws when there is no '/'.
std::pair<std::string_view, std::string_view> splitRate(std::string_view unit,
                                                        std::string_view text) {
    const auto slash = unit.rfind('/');
    if (slash == std::string_view::npos)
        throw UnitError("rate '" + std::string(text) + "' needs a unit per time, e.g. 'K/min'");
    return {trim(unit.substr(0, slash)), trim(unit.substr(slash + 1))};
}

}  // namespace

NumberAndUnit splitQuantity(std::string_view text) {
    const std::string_view s = trim(text);
    std::string_view number = s;
    if (!number.empty() && number.front() == '+') number.remove_prefix(1);
    double value = 0.0;
    const auto [end, ec] = std::from_chars(number.data(), number.data() + number.size(), value);
    if (ec != std::errc() || !std::isfinite(value))
        throw Error("'" + std::string(text) + "' is not a number with a unit (e.g. '-45 degC')");
    return {value, std::string(trim(std::string_view(end, number.data() + number.size() - end)))};
}

double parseTemperature(std::string_view text) {
    const auto q = splitQuantity(text);
    if (q.unit.empty())
        throw UnitError("temperature '" + std::string(text) + "' has no unit (e.g. 'degC', 'K')");
    return toKelvin(q.value, parseTemperatureUnit(q.unit));
}

double parseTemperatureDifference(std::string_view text) {
    const auto q = splitQuantity(text);
    if (q.unit.empty())
        throw UnitError("temperature difference '" + std::string(text) + "' has no unit");
    return q.value / differenceFromKelvin(1.0, parseTemperatureUnit(q.unit));
}

double parsePressure(std::string_view text) {
    const auto q = splitQuantity(text);
    if (q.unit.empty())
        throw UnitError("pressure '" + std::string(text) + "' has no unit (e.g. 'Pa', 'mTorr')");
    return toPascal(q.value, parsePressureUnit(q.unit));
}

double parsePressureDifference(std::string_view text) {
    const auto q = splitQuantity(text);
    if (q.unit.empty())
        throw UnitError("pressure difference '" + std::string(text) + "' has no unit");
    return q.value * pascalPer(parsePressureUnit(q.unit));
}

double secondsPer(std::string_view unit) {
    static constexpr std::array<std::pair<std::string_view, double>, 11> table{{
        {"s", 1.0},
        {"sec", 1.0},
        {"second", 1.0},
        {"seconds", 1.0},
        {"min", 60.0},
        {"minute", 60.0},
        {"minutes", 60.0},
        {"h", 3600.0},
        {"hr", 3600.0},
        {"hours", 3600.0},
        {"d", 86400.0},
    }};
    const std::string_view u = trim(unit);
    for (const auto &[name, seconds] : table)
        if (u == name) return seconds;
    throw UnitError("unknown time unit '" + std::string(unit) + "' (accepted: s, min, h, d)");
}

double parseDuration(std::string_view text) {
    const auto q = splitQuantity(text);
    if (q.unit.empty())
        throw UnitError("duration '" + std::string(text) + "' has no unit (e.g. 's', 'min', 'h')");
    return q.value * secondsPer(q.unit);
}

double parseTemperatureRate(std::string_view text) {
    const auto q = splitQuantity(text);
    const auto [tUnit, timeUnit] = splitRate(q.unit, text);
    return q.value / differenceFromKelvin(1.0, parseTemperatureUnit(tUnit)) / secondsPer(timeUnit);
}

double parsePressureRate(std::string_view text) {
    const auto q = splitQuantity(text);
    const auto [pUnit, timeUnit] = splitRate(q.unit, text);
    return q.value * pascalPer(parsePressureUnit(pUnit)) / secondsPer(timeUnit);
}

}  // namespace pw::run
