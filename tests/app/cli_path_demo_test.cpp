// phasewright-cli path on the bundled demo logs (invented data, resources/demo): the process
// log's columns are found by role, the rule files are checked, and a broken rule exits 3.
#include <gtest/gtest.h>

#include <filesystem>
#include <fstream>
#include <sstream>
#include <string>
#include <vector>

#include "app/cli/cli.h"

namespace {

using pw::cli::Io;

struct Result {
    int code;
    std::string out, err;
};

Result run(const std::vector<std::string> &args) {
    std::ostringstream out, err;
    std::istringstream in;
    const int code = pw::cli::run(args, Io{out, err, in});
    return {code, out.str(), err.str()};
}

std::string demo(const std::string &name) {
    return std::string(PW_SOURCE_DIR) + "/resources/demo/" + name;
}

// Freezing at the IAPWS R14-08 melting temperature at 1 atm (273.1525 K), then sublimation
// at the frost point of 10 Pa (230.96 K, R14-08 sublimation equation); never melting.
TEST(CliPathDemo, FreezeDryingRunPassesItsRules) {
    const auto r = run({"path", "--substance", "water", "--input", demo("freeze-drying-run.csv"),
                        "--rules", demo("freeze-drying-rules.json"), "--json"});
    ASSERT_EQ(r.code, 0) << r.err;
    EXPECT_NE(r.err.find("product_T [degC]"), std::string::npos);  // the column choice is told
    const auto first = r.out.find("\"freezing\"");
    const auto second = r.out.find("\"sublimation\"");
    ASSERT_NE(first, std::string::npos);
    ASSERT_NE(second, std::string::npos);
    EXPECT_LT(first, second);
    EXPECT_EQ(r.out.find("\"melting\""), std::string::npos);
    EXPECT_NE(r.out.find("\"verdicts\""), std::string::npos);
}

// The CO2 run enters the supercritical region and never crosses liquid-vapor
// (Span & Wagner 1996 critical point 304.1282 K / 7.3773 MPa).
TEST(CliPathDemo, Co2RunWritesEventsCsvAndPasses) {
    const auto dir = std::filesystem::temp_directory_path() / "pw_cli_path_demo";
    std::filesystem::create_directories(dir);
    const auto csv = (dir / "events.csv").string();
    std::filesystem::remove(csv);
    const auto r = run({"path", "--substance", "CO2", "--input", demo("co2-drying-run.csv"),
                        "--rules", demo("co2-drying-rules.json"), "--events-csv", csv});
    ASSERT_EQ(r.code, 0) << r.err;
    EXPECT_NE(r.out.find("enter_supercritical"), std::string::npos);
    EXPECT_NE(r.out.find("crosses the liquid-vapor boundary: no"), std::string::npos);
    // Above the triple temperature the sublimation curve has no pressure: "n/a", never "nan".
    EXPECT_NE(r.out.find("closest to sublimation: |dT| = 106.1 K, |dP| = n/a"), std::string::npos)
        << r.out;
    EXPECT_EQ(r.out.find("nan"), std::string::npos);
    std::ifstream in(csv);
    std::string header;
    std::getline(in, header);
    EXPECT_EQ(header.rfind("record,", 0), 0u);
    std::filesystem::remove_all(dir);
}

// The freeze-drying run checked against the CO2 run's rules: the vessel must stay above Tc
// and pc, which a freeze-drying cycle never does -> exit 3, verdicts still printed.
TEST(CliPathDemo, ABrokenRuleExitsThree) {
    const auto r = run({"path", "--substance", "water", "--input", demo("freeze-drying-run.csv"),
                        "--rules", demo("co2-drying-rules.json")});
    EXPECT_EQ(r.code, pw::cli::kExitRulesFailed) << r.err;
    EXPECT_NE(r.out.find("FAIL"), std::string::npos);
}

}  // namespace
