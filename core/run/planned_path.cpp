#include "core/run/planned_path.h"

#include <algorithm>
#include <cmath>
#include <nlohmann/json.hpp>
#include <sstream>

#include "core/errors.h"
#include "core/run/json_file.h"
#include "core/run/quantity.h"

namespace pw::run {
namespace {

using nlohmann::json;

constexpr const char *kFormat = "phasewright-plan";

// Reads one "number unit" field with the given parser; InputError on failure.
template <typename Parser>
double field(const json &obj, const char *key, Parser parse, const std::string &file, long row) {
    const auto it = obj.find(key);
    if (it == obj.end()) return kNaN;
    if (!it->is_string())
        throw InputError(file, row, key, "expected a string with a unit, e.g. \"-45 degC\"");
    try {
        return parse(it->get<std::string>());
    } catch (const Error &e) {
        throw InputError(file, row, key, e.what());
    }
}

StepKind parseKind(const std::string &s, const std::string &file, long row) {
    for (auto k : {StepKind::Isobaric, StepKind::Isothermal, StepKind::Hold, StepKind::Ramp})
        if (s == toString(k)) return k;
    throw InputError(file, row, "step",
                     "unknown step '" + s + "' (accepted: isobaric, isothermal, hold, ramp)");
}

void requireOnly(const json &obj, std::initializer_list<const char *> allowed,
                 const std::string &file, long row) {
    for (const auto &[key, value] : obj.items()) {
        const bool ok = std::any_of(allowed.begin(), allowed.end(),
                                    [&k = key](const char *a) { return k == a; });
        if (!ok) throw InputError(file, row, key, "unknown field");
    }
}

void checkStep(const PlanStep &s, const std::string &file, long row) {
    const bool hasDuration = !std::isnan(s.duration_s);
    const auto need = [&](bool ok, const char *fieldName, const char *what) {
        if (!ok) throw InputError(file, row, fieldName, what);
    };
    if (hasDuration) need(s.duration_s > 0.0, "duration", "must be positive");
    switch (s.kind) {
        case StepKind::Isobaric:
            need(!std::isnan(s.T_K), "T", "an isobaric step needs a target temperature T");
            need(hasDuration != !std::isnan(s.rateT_K_s), "rate",
                 "give exactly one of 'rate' (e.g. \"0.5 K/min\") and 'duration'");
            break;
        case StepKind::Isothermal:
            need(!std::isnan(s.P_Pa), "P", "an isothermal step needs a target pressure P");
            need(hasDuration != !std::isnan(s.rateP_Pa_s), "rate",
                 "give exactly one of 'rate' (e.g. \"0.1 MPa/min\") and 'duration'");
            break;
        case StepKind::Hold:
            need(hasDuration, "duration", "a hold needs a duration");
            break;
        case StepKind::Ramp:
            need(!std::isnan(s.T_K) && !std::isnan(s.P_Pa), "T",
                 "a ramp needs both targets T and P");
            need(hasDuration, "duration", "a ramp needs a duration");
            break;
    }
    if (!std::isnan(s.P_Pa)) need(s.P_Pa > 0.0, "P", "pressure must be above 0 Pa absolute");
    if (!std::isnan(s.T_K)) need(s.T_K > 0.0, "T", "temperature must be above 0 K");
}

PlanStep parseStep(const json &obj, const std::string &file, long row) {
    if (!obj.is_object()) throw InputError(file, row, "step", "each step must be an object");
    requireOnly(obj, {"step", "label", "T", "P", "duration", "rate", "scale"}, file, row);
    const auto kindIt = obj.find("step");
    if (kindIt == obj.end() || !kindIt->is_string())
        throw InputError(file, row, "step", "missing the step kind (\"step\": \"isobaric\"...)");
    PlanStep s;
    s.line = static_cast<int>(row);
    s.kind = parseKind(kindIt->get<std::string>(), file, row);
    if (obj.contains("label")) s.label = obj.at("label").get<std::string>();
    s.T_K = field(obj, "T", parseTemperature, file, row);
    s.P_Pa = field(obj, "P", parsePressure, file, row);
    s.duration_s = field(obj, "duration", parseDuration, file, row);
    if (s.kind == StepKind::Isobaric)
        s.rateT_K_s = field(obj, "rate", parseTemperatureRate, file, row);
    if (s.kind == StepKind::Isothermal)
        s.rateP_Pa_s = field(obj, "rate", parsePressureRate, file, row);
    if ((s.kind == StepKind::Hold || s.kind == StepKind::Ramp) && obj.contains("rate"))
        throw InputError(
            file, row, "rate",
            "a " + std::string(toString(s.kind)) + " step takes a duration, not a rate");
    if (obj.contains("scale")) {
        const std::string sc =
            obj.at("scale").is_string() ? obj.at("scale").get<std::string>() : "";
        if (sc != "linear" && sc != "log")
            throw InputError(file, row, "scale", "expected \"linear\" or \"log\"");
        s.scale = sc == "log" ? PressureScale::Log : PressureScale::Linear;
    }
    checkStep(s, file, row);
    return s;
}

Plan planFromJson(const json &doc, const std::string &file, bool checkHeader,
                  const std::vector<long> &rows) {
    if (!doc.is_object()) throw InputError(file, 0, "", "a plan file must be a JSON object");
    if (checkHeader) {
        if (doc.value("format", std::string()) != kFormat)
            throw InputError(file, 0, "format", std::string("expected \"") + kFormat + "\"");
        if (doc.value("version", 0) != 1)
            throw InputError(file, 0, "version", "only version 1 is supported");
    }
    Plan plan;
    plan.name = doc.value("name", std::string());
    plan.substance = doc.value("substance", std::string());
    const long headRow = rows.empty() ? 0 : rows.front();
    if (doc.contains("resolution")) {
        plan.resolution_s = field(doc, "resolution", parseDuration, file, headRow);
        if (!(plan.resolution_s > 0.0))
            throw InputError(file, headRow, "resolution", "must be positive");
    }
    const auto startIt = doc.find("start");
    if (startIt == doc.end() || !startIt->is_object())
        throw InputError(file, headRow, "start",
                         "missing the start state {\"T\": ..., \"P\": ...}");
    const long startRow = rows.size() > 1 ? rows[1] : 0;
    plan.start.time_s = 0.0;
    plan.start.T_K = field(*startIt, "T", parseTemperature, file, startRow);
    plan.start.P_Pa = field(*startIt, "P", parsePressure, file, startRow);
    if (!(plan.start.T_K > 0.0) || !(plan.start.P_Pa > 0.0))
        throw InputError(file, startRow, "start", "needs T above 0 K and P above 0 Pa");
    const json steps = doc.value("steps", json::array());
    if (!steps.is_array() || steps.empty())
        throw InputError(file, headRow, "steps", "a plan needs at least one step");
    for (std::size_t i = 0; i < steps.size(); ++i) {
        const long row = rows.size() > i + 2 ? rows[i + 2] : static_cast<long>(i + 1);
        plan.steps.push_back(parseStep(steps[i], file, row));
    }
    return plan;
}

// Splits a text line into words; "quoted words" keep their blanks.
std::vector<std::string> words(const std::string &line, const std::string &file, long row) {
    std::vector<std::string> out;
    std::string cur;
    bool quoted = false, any = false;
    for (const char c : line) {
        if (c == '"') {
            quoted = !quoted;
            any = true;
        } else if (!quoted && (c == ' ' || c == '\t')) {
            if (any) out.push_back(cur);
            cur.clear();
            any = false;
        } else {
            cur += c;
            any = true;
        }
    }
    if (quoted) throw InputError(file, row, "", "unbalanced quote");
    if (any) out.push_back(cur);
    return out;
}

}  // namespace

std::string_view toString(StepKind kind) {
    switch (kind) {
        case StepKind::Isobaric:
            return "isobaric";
        case StepKind::Isothermal:
            return "isothermal";
        case StepKind::Hold:
            return "hold";
        case StepKind::Ramp:
            return "ramp";
    }
    return "hold";
}

Plan parsePlanJson(std::string_view content, const std::string &file) {
    const json doc = parseJsonText(content, file);
    return withJsonErrors(file, [&] { return planFromJson(doc, file, true, {}); });
}

Plan parsePlanText(std::string_view content, const std::string &file) {
    json doc = json::object();
    json steps = json::array();
    std::vector<long> rows{0, 0};
    std::istringstream in{std::string(content)};
    std::string line;
    for (long row = 1; std::getline(in, line); ++row) {
        if (const auto hash = line.find('#'); hash != std::string::npos) line.erase(hash);
        const auto w = words(line, file, row);
        if (w.empty()) continue;
        json obj = json::object();
        for (std::size_t i = 1; i < w.size(); ++i) {
            const auto eq = w[i].find('=');
            if (eq == std::string::npos || eq == 0)
                throw InputError(file, row, w[i], "expected key=value");
            obj[w[i].substr(0, eq)] = w[i].substr(eq + 1);
        }
        if (w[0] == "plan") {
            for (const auto &[k, v] : obj.items()) doc[k] = v;
            rows[0] = row;
        } else if (w[0] == "start") {
            doc["start"] = obj;
            rows[1] = row;
        } else {
            obj["step"] = w[0];
            steps.push_back(obj);
            rows.push_back(row);
        }
    }
    doc["steps"] = steps;
    return planFromJson(doc, file, false, rows);
}

Plan parsePlan(std::string_view content, const std::string &file) {
    const auto first = content.find_first_not_of(" \t\r\n");
    if (first != std::string_view::npos && content[first] == '{')
        return parsePlanJson(content, file);
    return parsePlanText(content, file);
}

Plan readPlanFile(const std::string &path) { return parsePlan(readTextFile(path), path); }

}  // namespace pw::run
