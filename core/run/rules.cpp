#include "core/run/rules.h"

#include <algorithm>
#include <nlohmann/json.hpp>
#include <sstream>

#include "core/errors.h"
#include "core/run/json_file.h"
#include "core/run/quantity.h"

namespace pw::run {
namespace {

using nlohmann::json;

constexpr RuleCheck kAllChecks[] = {RuleCheck::NoTransition,  RuleCheck::SublimationDP,
                                    RuleCheck::SublimationDT, RuleCheck::Temperature,
                                    RuleCheck::Pressure,      RuleCheck::Supercritical};
constexpr Transition kAllTransitions[] = {Transition::Melting,
                                          Transition::Freezing,
                                          Transition::Vaporization,
                                          Transition::Condensation,
                                          Transition::Sublimation,
                                          Transition::Deposition,
                                          Transition::EnterSupercritical,
                                          Transition::LeaveSupercritical,
                                          Transition::SolidSolid};

Transition parseTransition(const std::string &s, const std::string &file, long row) {
    for (const auto t : kAllTransitions)
        if (s == toString(t)) return t;
    std::string accepted;
    for (const auto t : kAllTransitions)
        accepted += (accepted.empty() ? "" : ", ") + std::string(toString(t));
    throw InputError(file, row, "transitions",
                     "unknown transition '" + s + "' (accepted: " + accepted + ")");
}

double bound(const json &obj, const char *key, RuleCheck check, const std::string &file, long row) {
    const auto it = obj.find(key);
    if (it == obj.end()) return kNaN;
    if (!it->is_string())
        throw InputError(file, row, key, "expected a string with a unit, e.g. \"-5 Pa\"");
    const std::string text = it->get<std::string>();
    try {
        switch (check) {
            case RuleCheck::SublimationDP:
                return parsePressureDifference(text);
            case RuleCheck::SublimationDT:
                return parseTemperatureDifference(text);
            case RuleCheck::Temperature:
                return parseTemperature(text);
            case RuleCheck::Pressure:
                return parsePressure(text);
            default:
                throw InputError(file, row, key, "this check takes no bounds");
        }
    } catch (const InputError &) {
        throw;
    } catch (const Error &e) {
        throw InputError(file, row, key, e.what());
    }
}

double windowEdge(const json &obj, const char *key, const std::string &file, long row) {
    const auto it = obj.find(key);
    if (it == obj.end()) return kNaN;
    try {
        if (!it->is_string()) throw Error("expected a duration since the start, e.g. \"4 h\"");
        return parseDuration(it->get<std::string>());
    } catch (const Error &e) {
        throw InputError(file, row, key, e.what());
    }
}

Rule parseRule(const json &obj, const std::string &file, long row) {
    if (!obj.is_object()) throw InputError(file, row, "", "each rule must be an object");
    for (const auto &[key, v] : obj.items()) {
        static const char *allowed[] = {"id",  "description", "check", "transitions",
                                        "min", "max",         "from",  "to"};
        if (std::none_of(std::begin(allowed), std::end(allowed),
                         [&k = key](const char *a) { return k == a; }))
            throw InputError(file, row, key, "unknown field");
    }
    Rule r;
    r.id = obj.value("id", "rule " + std::to_string(row));
    r.description = obj.value("description", std::string());
    const std::string check = obj.value("check", std::string());
    const auto found = std::find_if(std::begin(kAllChecks), std::end(kAllChecks),
                                    [&check](RuleCheck c) { return check == toString(c); });
    if (found == std::end(kAllChecks))
        throw InputError(file, row, "check",
                         "unknown check '" + check +
                             "' (accepted: no_transition, sublimation_dP, sublimation_dT, "
                             "temperature, pressure, supercritical)");
    r.check = *found;
    if (r.check == RuleCheck::NoTransition) {
        const json list = obj.value("transitions", json::array());
        if (!list.is_array() || list.empty())
            throw InputError(file, row, "transitions",
                             "list the forbidden transitions, e.g. [\"melting\"]");
        for (const auto &t : list)
            r.transitions.push_back(
                parseTransition(t.is_string() ? t.get<std::string>() : t.dump(), file, row));
    } else if (obj.contains("transitions")) {
        throw InputError(file, row, "transitions", "only a no_transition check takes transitions");
    }
    if (r.check != RuleCheck::NoTransition && r.check != RuleCheck::Supercritical) {
        r.min = bound(obj, "min", r.check, file, row);
        r.max = bound(obj, "max", r.check, file, row);
        if (std::isnan(r.min) && std::isnan(r.max))
            throw InputError(file, row, "max", "give a bound: \"min\", \"max\" or both");
        if (r.min > r.max) throw InputError(file, row, "min", "is above max");
    } else if (obj.contains("min") || obj.contains("max")) {
        throw InputError(file, row, obj.contains("min") ? "min" : "max",
                         "this check takes no bounds");
    }
    r.from_s = windowEdge(obj, "from", file, row);
    r.to_s = windowEdge(obj, "to", file, row);
    if (r.from_s > r.to_s) throw InputError(file, row, "from", "is after 'to'");
    return r;
}

}  // namespace

std::string_view toString(RuleCheck check) {
    switch (check) {
        case RuleCheck::NoTransition:
            return "no_transition";
        case RuleCheck::SublimationDP:
            return "sublimation_dP";
        case RuleCheck::SublimationDT:
            return "sublimation_dT";
        case RuleCheck::Temperature:
            return "temperature";
        case RuleCheck::Pressure:
            return "pressure";
        case RuleCheck::Supercritical:
            return "supercritical";
    }
    return "temperature";
}

std::string_view toString(Verdict v) {
    switch (v) {
        case Verdict::Pass:
            return "pass";
        case Verdict::Fail:
            return "fail";
        case Verdict::NoData:
            return "no_data";
    }
    return "no_data";
}

RuleSet parseRulesJson(std::string_view content, const std::string &file) {
    const json doc = parseJsonText(content, file);
    return withJsonErrors(file, [&] {
        if (!doc.is_object() || doc.value("format", std::string()) != "phasewright-rules")
            throw InputError(file, 0, "format", "expected \"phasewright-rules\"");
        if (doc.value("version", 0) != 1)
            throw InputError(file, 0, "version", "only version 1 is supported");
        RuleSet set;
        set.name = doc.value("name", std::string());
        set.substance = doc.value("substance", std::string());
        const json rules = doc.value("rules", json::array());
        if (!rules.is_array() || rules.empty())
            throw InputError(file, 0, "rules", "a rule file needs at least one rule");
        for (std::size_t i = 0; i < rules.size(); ++i)
            set.rules.push_back(parseRule(rules[i], file, static_cast<long>(i + 1)));
        return set;
    });
}

RuleSet readRulesFile(const std::string &path) { return parseRulesJson(readTextFile(path), path); }

bool allPassed(const std::vector<RuleVerdict> &verdicts) {
    return std::all_of(verdicts.begin(), verdicts.end(),
                       [](const RuleVerdict &v) { return v.verdict == Verdict::Pass; });
}

}  // namespace pw::run
