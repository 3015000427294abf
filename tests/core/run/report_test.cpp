// Events + verdicts CSV and the atomic write.
#include "core/run/report.h"

#include <gtest/gtest.h>

#include <unistd.h>
#include <filesystem>
#include <fstream>
#include <sstream>

#include "core/errors.h"

namespace pw::run {
namespace {

PathResult oneEvent() {
    PathResult r;
    PathEvent e;
    e.index = 7;
    e.time_s = 195.5;
    e.T_K = 230.96;
    e.P_Pa = 10.0;
    e.transition = Transition::Sublimation;
    e.from = Phase::Solid;
    e.to = Phase::Vapor;
    e.detail = "ice Ih -> vapor";
    r.events.push_back(e);
    return r;
}

std::vector<RuleVerdict> twoVerdicts() {
    RuleVerdict pass;
    pass.ruleId = "no-melting";
    pass.verdict = Verdict::Pass;
    pass.detail = "no forbidden transition";
    RuleVerdict fail;
    fail.ruleId = "cap";
    fail.verdict = Verdict::Fail;
    fail.firstViolation_s = 100.0;
    fail.index = 4;
    fail.T_K = 260.0;
    fail.P_Pa = 10.0;
    fail.detail = "T = 262 K above the maximum 260 K, \"collapse\"";
    return {pass, fail};
}

TEST(RunReport, OneTableOfEventsAndVerdicts) {
    const std::string csv = eventsAndVerdictsCsv(oneEvent(), twoVerdicts());
    std::istringstream in(csv);
    std::string line;
    std::vector<std::string> lines;
    while (std::getline(in, line)) lines.push_back(line);
    ASSERT_EQ(lines.size(), 4u);
    EXPECT_EQ(lines[0], "record,id,result,time_s,index,T_K,P_Pa,from,to,detail");
    EXPECT_EQ(lines[1], "event,sublimation,,195.5,7,230.96,10,solid,vapor,ice Ih -> vapor");
    EXPECT_EQ(lines[2], "rule,no-melting,pass,,,,,,,no forbidden transition");
    EXPECT_EQ(
        lines[3],
        "rule,cap,fail,100,4,260,10,,,\"T = 262 K above the maximum 260 K, \"\"collapse\"\"\"");
}

TEST(RunReport, WritesAtomicallyAndLeavesNothingOnFailure) {
    namespace fs = std::filesystem;
    const fs::path dir =
        fs::temp_directory_path() / ("pw-run-report-" + std::to_string(::getpid()));
    fs::create_directories(dir);
    const std::string path = (dir / "events.csv").string();
    writeEventsAndVerdictsCsv(path, oneEvent(), twoVerdicts());
    std::ifstream in(path);
    std::stringstream ss;
    ss << in.rdbuf();
    EXPECT_EQ(ss.str(), eventsAndVerdictsCsv(oneEvent(), twoVerdicts()));
    EXPECT_EQ(std::distance(fs::directory_iterator(dir), fs::directory_iterator()), 1);
    // Into a folder that does not exist: an error, and no file appears.
    const std::string bad = (dir / "missing" / "events.csv").string();
    EXPECT_THROW(writeEventsAndVerdictsCsv(bad, oneEvent(), {}), Error);
    EXPECT_FALSE(fs::exists(bad));
    fs::remove_all(dir);
}

}  // namespace
}  // namespace pw::run
