#pragma once
// The bundled demo scenario (resources/demo, invented data): a list of scenarios, each a
// substance id with a run log, a planned path and a rule file, read from the files compiled
// into the binaries (resources/bundled.h).
#include <string>
#include <vector>

#include "core/run/planned_path.h"
#include "core/run/rules.h"
#include "core/run/run_log.h"

namespace pw::run {

struct DemoScenario {
    std::string id;  // "freeze-drying", "co2-drying"
    std::string title;
    std::string substance;  // id in the substance library
    std::string runPath;    // bundled paths, relative to resources/ ("demo/...csv")
    std::string planPath;
    std::string rulesPath;
};

// Parsed from the bundled demo/scenarios.json; throws pw::Error when it is missing or bad.
std::vector<DemoScenario> demoScenarios();
// By id; throws pw::Error listing the ids when absent.
DemoScenario demoScenario(const std::string &id);

// The scenario's files, parsed (the run log read in full).
RunLog readDemoRun(const DemoScenario &scenario);
Plan readDemoPlan(const DemoScenario &scenario);
RuleSet readDemoRules(const DemoScenario &scenario);

}  // namespace pw::run
