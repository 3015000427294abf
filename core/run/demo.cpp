#include "core/run/demo.h"

#include <nlohmann/json.hpp>
#include <sstream>

#include "core/errors.h"
#include "resources/bundled.h"

namespace pw::run {
namespace {

std::string_view bundledOrThrow(const std::string &path) {
    const std::string_view content = bundled::file(path);
    if (content.empty()) throw Error("bundled file '" + path + "' is missing from this build");
    return content;
}

}  // namespace

std::vector<DemoScenario> demoScenarios() {
    const std::string path = "demo/scenarios.json";
    const auto doc = nlohmann::json::parse(bundledOrThrow(path), nullptr, false);
    if (doc.is_discarded() || !doc.contains("scenarios") || !doc.at("scenarios").is_array())
        throw InputError("bundled:" + path, 0, "scenarios", "not a demo scenario list");
    std::vector<DemoScenario> out;
    for (const auto &s : doc.at("scenarios")) {
        if (!s.is_object()) throw InputError("bundled:" + path, 0, "scenarios", "expected objects");
        out.push_back({s.value("id", ""), s.value("title", ""), s.value("substance", ""),
                       s.value("run", ""), s.value("plan", ""), s.value("rules", "")});
    }
    return out;
}

DemoScenario demoScenario(const std::string &id) {
    std::string ids;
    for (const auto &s : demoScenarios()) {
        if (s.id == id) return s;
        ids += (ids.empty() ? "" : ", ") + s.id;
    }
    throw Error("no demo scenario '" + id + "' (available: " + ids + ")");
}

RunLog readDemoRun(const DemoScenario &scenario) {
    std::istringstream in{std::string(bundledOrThrow(scenario.runPath))};
    return readRunLog(in, "bundled:" + scenario.runPath);
}

Plan readDemoPlan(const DemoScenario &scenario) {
    return parsePlan(bundledOrThrow(scenario.planPath), "bundled:" + scenario.planPath);
}

RuleSet readDemoRules(const DemoScenario &scenario) {
    return parseRulesJson(bundledOrThrow(scenario.rulesPath), "bundled:" + scenario.rulesPath);
}

}  // namespace pw::run
