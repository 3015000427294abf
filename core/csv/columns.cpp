#include "core/csv/columns.h"

#include <fmt/format.h>

#include <algorithm>
#include <array>
#include <cctype>
#include <charconv>
#include <chrono>

#include "core/errors.h"

namespace pw::csv {
namespace {

std::string_view trim(std::string_view s) {
    while (!s.empty() && std::isspace(static_cast<unsigned char>(s.front()))) s.remove_prefix(1);
    while (!s.empty() && std::isspace(static_cast<unsigned char>(s.back()))) s.remove_suffix(1);
    return s;
}

std::string lower(std::string_view s) {
    std::string r(s);
    for (char &c : r) c = static_cast<char>(std::tolower(static_cast<unsigned char>(c)));
    return r;
}

std::string listColumns(const std::vector<std::string> &header) {
    std::string s;
    for (const auto &h : header) s += (s.empty() ? "'" : ", '") + h + "'";
    return s;
}

// The column named `wanted` (whole header text or its name part, case-insensitive), or the
// single column whose name part is one of `defaults`.
std::size_t findColumn(const std::vector<std::string> &header, const std::string &wanted,
                       std::initializer_list<std::string_view> defaults, const char *what,
                       const char *option, bool required, const std::string &file) {
    std::vector<std::size_t> hits;
    for (std::size_t i = 0; i < header.size(); ++i) {
        const std::string whole = lower(header[i]), name = lower(splitHeader(header[i]).name);
        if (!wanted.empty()) {
            if (whole == lower(wanted) || name == lower(wanted)) hits.push_back(i);
        } else if (std::find(defaults.begin(), defaults.end(), name) != defaults.end()) {
            hits.push_back(i);
        }
    }
    if (hits.size() == 1) return hits.front();
    if (hits.empty() && !required && wanted.empty()) return kNoColumn;
    const std::string field = wanted.empty() ? std::string(what) : wanted;
    if (hits.empty())
        throw InputError(file, 1, field,
                         fmt::format("no {} column (columns: {}); name it with {}", what,
                                     listColumns(header), option));
    throw InputError(file, 1, field,
                     fmt::format("{} columns match: {}; choose one with {}", hits.size(),
                                 listColumns(header), option));
}

std::string unitFor(const std::string &header, const std::optional<std::string> &option,
                    const char *optionName, const std::string &file, bool sameUnit) {
    const std::string bracket = splitHeader(header).unit;
    if (option && !bracket.empty() && !sameUnit)
        throw InputError(
            file, 1, header,
            fmt::format("the header says [{}] but {} {} was given", bracket, optionName, *option));
    if (option) return *option;
    return bracket;
}

double secondsPer(const std::string &unit, const std::string &header, const std::string &file) {
    const std::string u = lower(trim(unit));
    if (u.empty() || u == "s" || u == "sec") return 1.0;
    if (u == "ms") return 1e-3;
    if (u == "min") return 60.0;
    if (u == "h") return 3600.0;
    if (u == "d") return 86400.0;
    throw InputError(file, 1, header,
                     fmt::format("unknown time unit '{}' (accepted: s, ms, min, h, d)", unit));
}

}  // namespace

HeaderName splitHeader(std::string_view cell) {
    cell = trim(cell);
    const auto open = cell.rfind('[');
    if (open == std::string_view::npos || cell.back() != ']') return {std::string(cell), ""};
    return {std::string(trim(cell.substr(0, open))),
            std::string(trim(cell.substr(open + 1, cell.size() - open - 2)))};
}

StateColumns resolveStateColumns(const std::vector<std::string> &header,
                                 const StateColumnOptions &options, const std::string &fileName) {
    StateColumns c;
    c.t = findColumn(header, options.tColumn, {"t", "temperature", "temp"}, "temperature",
                     "--t-col", true, fileName);
    c.p = findColumn(header, options.pColumn, {"p", "pressure"}, "pressure", "--p-col", true,
                     fileName);
    const std::string &tHead = header[c.t], &pHead = header[c.p];
    // A bracket that names the same unit as the option is no conflict.
    auto sameT = [&] {
        const std::string b = splitHeader(tHead).unit;
        return b.empty() || !options.tUnit ||
               parseTemperatureUnit(b) == parseTemperatureUnit(*options.tUnit);
    };
    auto sameP = [&] {
        const std::string b = splitHeader(pHead).unit;
        return b.empty() || !options.pUnit ||
               parsePressureUnit(b) == parsePressureUnit(*options.pUnit);
    };
    // A unit error names the column it belongs to (the header cell).
    try {
        const std::string tu = unitFor(tHead, options.tUnit, "--t-unit", fileName, sameT());
        if (!tu.empty()) c.tUnit = parseTemperatureUnit(tu);
    } catch (const UnitError &e) {
        throw InputError(fileName, 1, tHead, e.what());
    }
    try {
        const std::string pu = unitFor(pHead, options.pUnit, "--p-unit", fileName, sameP());
        if (!pu.empty()) c.pUnit = parsePressureUnit(pu);
    } catch (const UnitError &e) {
        throw InputError(fileName, 1, pHead, e.what());
    }
    if (options.wantTime) {
        c.time = findColumn(header, options.timeColumn, {"time", "timestamp", "datetime", "date"},
                            "time", "--time-col", false, fileName);
        if (c.time != kNoColumn)
            c.secondsPerTimeUnit =
                secondsPer(splitHeader(header[c.time]).unit, header[c.time], fileName);
    }
    return c;
}

namespace {

bool readInt(std::string_view &s, std::size_t digits, int &out) {
    if (s.size() < digits) return false;
    const auto [p, ec] = std::from_chars(s.data(), s.data() + digits, out);
    if (ec != std::errc() || p != s.data() + digits) return false;
    s.remove_prefix(digits);
    return true;
}

bool expect(std::string_view &s, char c) {
    if (s.empty() || s.front() != c) return false;
    s.remove_prefix(1);
    return true;
}

}  // namespace

std::optional<double> parseIsoTime(std::string_view text) {
    std::string_view s = trim(text);
    int y = 0, mo = 0, d = 0, h = 0, mi = 0, sec = 0;
    if (!readInt(s, 4, y) || !expect(s, '-') || !readInt(s, 2, mo) || !expect(s, '-') ||
        !readInt(s, 2, d))
        return std::nullopt;
    if (s.empty() || (s.front() != 'T' && s.front() != ' ')) return std::nullopt;
    s.remove_prefix(1);
    if (!readInt(s, 2, h) || !expect(s, ':') || !readInt(s, 2, mi) || !expect(s, ':') ||
        !readInt(s, 2, sec))
        return std::nullopt;
    if (mo < 1 || mo > 12 || d < 1 || d > 31 || h > 23 || mi > 59 || sec > 60) return std::nullopt;
    double frac = 0.0;
    if (!s.empty() && (s.front() == '.' || s.front() == ',')) {
        std::size_t n = 1;
        while (n < s.size() && std::isdigit(static_cast<unsigned char>(s[n]))) ++n;
        std::string digits = "0." + std::string(s.substr(1, n - 1));
        std::from_chars(digits.data(), digits.data() + digits.size(), frac);
        s.remove_prefix(n);
    }
    double offset = 0.0;
    if (!s.empty() && (s.front() == 'Z' || s.front() == 'z')) {
        s.remove_prefix(1);
    } else if (!s.empty() && (s.front() == '+' || s.front() == '-')) {
        const double sign = s.front() == '-' ? -1.0 : 1.0;
        s.remove_prefix(1);
        int oh = 0, om = 0;
        if (!readInt(s, 2, oh)) return std::nullopt;
        expect(s, ':');
        if (!s.empty() && !readInt(s, 2, om)) return std::nullopt;
        offset = sign * (oh * 3600.0 + om * 60.0);
    }
    if (!s.empty()) return std::nullopt;
    const std::chrono::year_month_day date{std::chrono::year{y},
                                           std::chrono::month{static_cast<unsigned>(mo)},
                                           std::chrono::day{static_cast<unsigned>(d)}};
    if (!date.ok()) return std::nullopt;
    const long days = std::chrono::sys_days{date}.time_since_epoch().count();
    return static_cast<double>(days) * 86400.0 + h * 3600.0 + mi * 60.0 + sec + frac - offset;
}

}  // namespace pw::csv
