// Column and unit guessing for run logs (see run_log.h).
#include <algorithm>
#include <cctype>
#include <charconv>

#include "core/csv/columns.h"
#include "core/errors.h"
#include "core/run/quantity.h"
#include "core/run/run_log.h"

namespace pw::run {
namespace {

std::string lower(std::string_view s) {
    std::string out(s);
    for (char &c : out) c = static_cast<char>(std::tolower(static_cast<unsigned char>(c)));
    return out;
}

std::vector<std::string> tokens(std::string_view name) {
    std::vector<std::string> out;
    std::string cur;
    for (const char c : lower(name)) {
        if (std::isalnum(static_cast<unsigned char>(c))) {
            cur += c;
        } else if (!cur.empty()) {
            out.push_back(cur);
            cur.clear();
        }
    }
    if (!cur.empty()) out.push_back(cur);
    return out;
}

bool has(const std::vector<std::string> &toks, std::initializer_list<const char *> words) {
    return std::any_of(toks.begin(), toks.end(), [&words](const std::string &t) {
        return std::any_of(words.begin(), words.end(), [&t](const char *w) { return t == w; });
    });
}

template <typename F>
bool parses(F f) {
    try {
        f();
        return true;
    } catch (const Error &) {
        return false;
    }
}

bool isTimeUnit(const std::string &u) {
    return !u.empty() && parses([&] { secondsPer(u); });
}
bool isTempUnit(const std::string &u) {
    return !u.empty() && parses([&] { parseTemperatureUnit(u); });
}
// Pressure unit, possibly gauge ("barg", "psig"): {is a pressure unit, is gauge}.
std::pair<bool, bool> pressureUnitKind(const std::string &u) {
    if (u.empty()) return {false, false};
    if (parses([&] { parsePressureUnit(u); })) return {true, false};
    if (u.size() > 1 && (u.back() == 'g' || u.back() == 'G') &&
        parses([&] { parsePressureUnit(std::string_view(u).substr(0, u.size() - 1)); }))
        return {true, true};
    return {false, false};
}

struct Column {
    std::string cell, name, unit;
    std::vector<std::string> toks;
};

// A bracket unit that is none of time, temperature and pressure: the column is still found
// by its name, and the unknown unit is then reported naming the column.
bool unknownUnit(const std::string &u) {
    return !u.empty() && !isTimeUnit(u) && !isTempUnit(u) && !pressureUnitKind(u).first;
}

int timeScore(const Column &c) {
    if (isTimeUnit(c.unit)) return 5;
    if (!c.unit.empty() && !unknownUnit(c.unit)) return 0;
    if (has(c.toks, {"time", "timestamp", "datetime", "date", "elapsed", "clock"})) return 4;
    return c.name == "t" ? 2 : 0;
}

int temperatureScore(const Column &c) {
    int s = 0;
    if (isTempUnit(c.unit))
        s = 3;
    else if ((c.unit.empty() || unknownUnit(c.unit)) && has(c.toks, {"t", "temp", "temperature"}))
        s = 2;
    else
        return 0;
    if (has(c.toks, {"product"})) s += 3;
    if (has(c.toks, {"sample", "probe", "vessel", "autoclave"})) s += 1;
    if (has(c.toks, {"shelf", "jacket", "inlet", "outlet"})) s -= 1;
    if (has(c.toks, {"condenser", "ambient", "set", "setpoint", "sp"})) s -= 2;
    return std::max(s, 1);
}

int pressureScore(const Column &c) {
    int s = 0;
    if (pressureUnitKind(c.unit).first)
        s = 3;
    else if ((c.unit.empty() || unknownUnit(c.unit)) && has(c.toks, {"p", "pressure", "press"}))
        s = 2;
    else
        return 0;
    if (has(c.toks, {"chamber", "vessel", "autoclave", "capacitance", "cm"})) s += 2;
    if (has(c.toks, {"pirani"})) s -= 2;
    if (has(c.toks, {"condenser", "set", "setpoint", "sp"})) s -= 2;
    return std::max(s, 1);
}

std::size_t findNamed(const std::vector<Column> &cols, const std::string &want,
                      const std::string &file) {
    for (std::size_t i = 0; i < cols.size(); ++i)
        if (cols[i].cell == want) return i;
    const std::string w = lower(want);
    for (std::size_t i = 0; i < cols.size(); ++i)
        if (lower(cols[i].cell) == w || lower(cols[i].name) == w) return i;
    std::string list;
    for (const auto &c : cols) list += (list.empty() ? "'" : ", '") + c.cell + "'";
    throw InputError(file, 1, want, "no such column (columns: " + list + ")");
}

// Best-scoring column not in `taken`; notes the alternatives.
std::size_t pick(const std::vector<Column> &cols, int (*score)(const Column &), const char *what,
                 const std::vector<std::size_t> &taken, RunLogLayout &layout,
                 const std::string &file) {
    std::size_t best = cols.size();
    int bestScore = 0;
    std::string others;
    for (std::size_t i = 0; i < cols.size(); ++i) {
        if (std::find(taken.begin(), taken.end(), i) != taken.end()) continue;
        const int s = score(cols[i]);
        if (s <= 0) continue;
        if (s > bestScore) {
            if (best < cols.size())
                others += (others.empty() ? "'" : ", '") + cols[best].cell + "'";
            best = i;
            bestScore = s;
        } else {
            others += (others.empty() ? "'" : ", '") + cols[i].cell + "'";
        }
    }
    if (best == cols.size())
        throw InputError(file, 1, "",
                         std::string("no ") + what +
                             " column found; name it in the header (e.g. 'product_T [degC]', "
                             "'chamber_P [Pa]', 'time [s]') or choose it explicitly");
    if (!others.empty())
        layout.notes.push_back(std::string(what) + " column '" + cols[best].cell +
                               "' chosen over " + others);
    return best;
}

}  // namespace

RunLogLayout guessLayout(const std::vector<std::string> &header,
                         std::span<const std::string_view> firstRow, const RunLogOptions &opt,
                         const std::string &file) {
    RunLogLayout L;
    L.header = header;
    std::vector<Column> cols;
    for (const auto &cell : header) {
        auto h = csv::splitHeader(cell);
        cols.push_back({cell, h.name, h.unit, tokens(h.name)});
    }
    std::vector<std::size_t> taken;
    const auto choose = [&](const std::string &named, int (*score)(const Column &),
                            const char *what) {
        const std::size_t i =
            named.empty() ? pick(cols, score, what, taken, L, file) : findNamed(cols, named, file);
        taken.push_back(i);
        return i;
    };
    L.timeColumn = choose(opt.timeColumn, timeScore, "time");
    L.temperatureColumn = choose(opt.temperatureColumn, temperatureScore, "temperature");
    L.pressureColumn = choose(opt.pressureColumn, pressureScore, "pressure");
    const Column &tc = cols[L.timeColumn], &Tc = cols[L.temperatureColumn],
                 &Pc = cols[L.pressureColumn];
    try {
        if (opt.temperatureUnit)
            L.temperatureUnit = *opt.temperatureUnit;
        else if (!Tc.unit.empty())
            L.temperatureUnit = parseTemperatureUnit(Tc.unit);
        else
            L.notes.push_back("no temperature unit in '" + Tc.cell + "': taken as K");
    } catch (const Error &e) {
        throw InputError(file, 1, Tc.cell, e.what());
    }
    const auto [isP, isGauge] = pressureUnitKind(Pc.unit);
    if (opt.pressureUnit)
        L.pressureUnit = *opt.pressureUnit;
    else if (isP)
        L.pressureUnit =
            parsePressureUnit(isGauge ? Pc.unit.substr(0, Pc.unit.size() - 1) : Pc.unit);
    else if (!Pc.unit.empty())
        throw InputError(file, 1, Pc.cell, "unknown pressure unit '" + Pc.unit + "'");
    else
        L.notes.push_back("no pressure unit in '" + Pc.cell + "': taken as Pa");
    L.gauge = opt.gauge.value_or(isGauge);
    L.barometric_Pa = opt.barometric_Pa;
    if (L.gauge)
        L.notes.push_back("gauge pressure: " + std::to_string(L.barometric_Pa) + " Pa added");
    const std::string_view firstTimeCell =
        L.timeColumn < firstRow.size() ? firstRow[L.timeColumn] : std::string_view();
    double probe = 0.0;
    const bool numeric = !csv::parseNumber(firstTimeCell, opt.csv.decimalComma, probe).has_value();
    L.timeFormat = opt.timeFormat != TimeFormat::Auto
                       ? opt.timeFormat
                       : (numeric ? TimeFormat::Number : TimeFormat::Iso8601);
    if (L.timeFormat == TimeFormat::Iso8601 && !csv::parseIsoTime(firstTimeCell))
        throw InputError(
            file, 2, tc.cell,
            "'" + std::string(firstTimeCell) + "' is neither a number nor an ISO 8601 time");
    if (L.timeFormat == TimeFormat::Number) {
        if (opt.timeUnit_s)
            L.timeUnit_s = *opt.timeUnit_s;
        else if (isTimeUnit(tc.unit))
            L.timeUnit_s = secondsPer(tc.unit);
        else if (!tc.unit.empty())
            throw InputError(file, 1, tc.cell,
                             "unknown time unit '" + tc.unit + "' (accepted: s, min, h, d)");
        else
            L.notes.push_back("no time unit in '" + tc.cell + "': taken as seconds");
    }
    return L;
}

}  // namespace pw::run
