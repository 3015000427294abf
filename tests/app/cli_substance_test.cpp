// phasewright-cli list / info / validate and the shared --substance resolution, run
// in-process through pw::cli::run(). The user-folder substance is invented test data
// (tests/core/io/data/testium.json: TEST DATA, NOT PHYSICS); expected values for it are
// closed-form consequences of its own equations, worked out beside each check.
#include <gtest/gtest.h>

#include <cmath>
#include <cstdlib>
#include <filesystem>
#include <nlohmann/json.hpp>
#include <sstream>

#include "app/cli/cli.h"

namespace pw::cli {
namespace {

namespace fs = std::filesystem;

const std::string kIoData = std::string(PW_SOURCE_DIR) + "/tests/core/io/data/";

struct Result {
    int code;
    std::string out, err;
};

class CliSubstance : public testing::Test {
protected:
    void SetUp() override {
        home_ = fs::temp_directory_path() /
                ("pw-cli-substance-" + std::to_string(::getpid()) + "-" +
                 testing::UnitTest::GetInstance()->current_test_info()->name());
        fs::remove_all(home_);
        fs::create_directories(home_ / "phasewright" / "substances");
        const char *old = std::getenv("XDG_DATA_HOME");
        hadXdg_ = old != nullptr;
        if (old) oldXdg_ = old;
        setenv("XDG_DATA_HOME", home_.c_str(), 1);
    }
    void TearDown() override {
        if (hadXdg_)
            setenv("XDG_DATA_HOME", oldXdg_.c_str(), 1);
        else
            unsetenv("XDG_DATA_HOME");
        fs::remove_all(home_);
    }
    void install(const std::string &from, const std::string &as) {
        fs::copy_file(kIoData + from, home_ / "phasewright" / "substances" / as);
    }
    static Result run(const std::vector<std::string> &args) {
        std::ostringstream out, err;
        std::istringstream in;
        const int code = pw::cli::run(args, Io{out, err, in});
        return {code, out.str(), err.str()};
    }
    fs::path home_;
    bool hadXdg_ = false;
    std::string oldXdg_;
};

TEST_F(CliSubstance, ListShowsUserSubstanceWithItsSources) {
    install("testium.json", "testium.json");
    const Result r = run({"list"});
    ASSERT_EQ(r.code, kExitOk) << r.err;
    EXPECT_NE(r.out.find("testium"), std::string::npos);
    EXPECT_NE(r.out.find("Phasewright test suite (2026)"), std::string::npos) << r.out;
}

TEST_F(CliSubstance, ListJsonGivesIdNameFormulaAndSourcesForEverySubstance) {
    install("testium.json", "testium.json");
    const Result r = run({"list", "--json"});
    ASSERT_EQ(r.code, kExitOk) << r.err;
    const auto j = nlohmann::json::parse(r.out);
    ASSERT_TRUE(j.is_array());
    bool found = false;
    for (const auto &s : j) {
        EXPECT_TRUE(s.contains("name") && s.contains("formula"));
        EXPECT_FALSE(s.at("sources").empty()) << s.at("id");  // every substance is cited
        if (s.at("id") == "testium") {
            found = true;
            EXPECT_EQ(s.at("formula"), "Ts2");
            EXPECT_EQ(s.at("sources").at(0).at("year"), 2026);
        }
    }
    EXPECT_TRUE(found);
}

TEST_F(CliSubstance, ListNotesARefusedUserFileOnStderr) {
    install("testium.json", "a.json");
    install("testium.json", "b.json");
    const Result r = run({"list"});
    EXPECT_EQ(r.code, kExitOk);
    EXPECT_NE(r.err.find("duplicate id 'testium'"), std::string::npos) << r.err;
}

TEST_F(CliSubstance, ValidateAcceptsAValidFile) {
    const Result r = run({"validate", kIoData + "testium.json"});
    EXPECT_EQ(r.code, kExitOk) << r.err;
    EXPECT_NE(r.out.find("valid: testium"), std::string::npos) << r.out;
    EXPECT_EQ(r.err, "");
}

TEST_F(CliSubstance, ValidateShowsWarningsButAccepts) {
    const Result r = run({"validate", kIoData + "testium-triple-warning.json"});
    EXPECT_EQ(r.code, kExitOk) << r.err;
    EXPECT_NE(r.err.find("warning: " + kIoData + "testium-triple-warning.json: /triple_points/0:"),
              std::string::npos)
        << r.err;
}

TEST_F(CliSubstance, ValidateRefusesABrokenFileWithFilePathAndMessage) {
    const std::string file = kIoData + "broken/unequal-arrays.json";
    const Result r = run({"validate", file});
    EXPECT_EQ(r.code, kExitBadInput);
    EXPECT_NE(r.err.find("error: " + file +
                         ": /boundaries/2/parameters/exponents: has 2 entries "
                         "but 'a' has 3"),
              std::string::npos)
        << r.err;
    EXPECT_EQ(r.out, "");
}

TEST_F(CliSubstance, ValidateSurvivesHostileFiles) {
    for (const char *f : {"binary-junk.json", "deep-nesting-unbalanced.json", "overflow-1e400.json",
                          "empty.json"}) {
        const Result r = run({"validate", kIoData + "broken/" + f});
        EXPECT_EQ(r.code, kExitBadInput) << f;
        EXPECT_NE(r.err.find("error: "), std::string::npos) << f;
    }
}

TEST_F(CliSubstance, ValidateOfSeveralFilesFailsIfAnyIsInvalid) {
    const Result r = run({"validate", kIoData + "testium.json", kIoData + "broken/bad-id.json"});
    EXPECT_EQ(r.code, kExitBadInput);
    EXPECT_NE(r.out.find("valid: testium"), std::string::npos);
    EXPECT_NE(r.err.find("1 of 2 files invalid"), std::string::npos) << r.err;
}

TEST_F(CliSubstance, ValidateWarnsWhenTheIdIsTakenInTheLibrary) {
    install("testium.json", "testium.json");
    const Result r = run({"validate", kIoData + "testium-triple-warning.json"});
    EXPECT_EQ(r.code, kExitOk);
    EXPECT_NE(r.err.find("id 'testium' is already used by"), std::string::npos) << r.err;
}

TEST_F(CliSubstance, ValidateWithoutAFileIsAUsageError) {
    EXPECT_EQ(run({"validate"}).code, kExitUsage);
}

TEST_F(CliSubstance, InfoJsonOfAFileGivesTheFixedAndNormalPoints) {
    const Result r = run({"info", "--substance", kIoData + "testium.json", "--json"});
    ASSERT_EQ(r.code, kExitOk) << r.err;
    const auto j = nlohmann::json::parse(r.out);
    EXPECT_DOUBLE_EQ(j.at("triple_point").at("T_K").get<double>(), 200.0);
    EXPECT_DOUBLE_EQ(j.at("triple_point").at("P_Pa").get<double>(), 1000.0);
    EXPECT_DOUBLE_EQ(j.at("critical_point").at("T_K").get<double>(), 400.0);
    // Clausius-Clapeyron inverted in closed form: 1/T = 1/200 K - R ln(101325/1000) / 20000
    // (R = 8.314462618 J/(mol K), CODATA 2018).
    const double Tb = 1.0 / (1.0 / 200.0 - 8.314462618 * std::log(101.325) / 20000.0);
    EXPECT_NEAR(j.at("normal_boiling_point_K").get<double>(), Tb, 1e-6);
    // Linear Clapeyron melting line: T = 200 K + (101325 - 1000) Pa / (5000 / (200 * 2e-6)).
    EXPECT_NEAR(j.at("normal_melting_point_K").get<double>(), 200.0 + 100325.0 / 1.25e7, 1e-6);
    // The triple point lies below 1 atm, so the 1 atm isobar never meets the sublimation curve.
    EXPECT_TRUE(j.at("normal_sublimation_point_K").is_null());
    // dV(fusion) > 0: positive melt slope, the solid is denser (Clapeyron).
    EXPECT_EQ(j.at("solid_denser_than_liquid"), true);
    EXPECT_NEAR(j.at("implied_enthalpies_J_mol").at("vaporization").get<double>(), 20000.0, 1.0);
    EXPECT_EQ(j.at("boundaries").size(), 3u);
    EXPECT_FALSE(j.at("cautions").empty());
}

TEST_F(CliSubstance, InfoFindsAUserSubstanceByAliasAndWritesText) {
    install("testium.json", "testium.json");
    const Result r = run({"info", "--substance", "tst"});
    ASSERT_EQ(r.code, kExitOk) << r.err;
    EXPECT_NE(r.out.find("Testium (invented test substance) (testium)"), std::string::npos)
        << r.out;
    EXPECT_NE(r.out.find("the solid is denser than its liquid"), std::string::npos) << r.out;
    EXPECT_NE(r.out.find("Normal sublimation:    none"), std::string::npos) << r.out;
    EXPECT_NE(r.out.find("Cautions:"), std::string::npos);
}

TEST_F(CliSubstance, InfoOfAnUnknownSubstanceSuggestsCloseMatches) {
    install("testium.json", "testium.json");
    const Result r = run({"info", "--substance", "testum"});
    EXPECT_EQ(r.code, kExitBadInput);
    EXPECT_NE(r.err.find("did you mean: testium"), std::string::npos) << r.err;
    EXPECT_EQ(r.out, "");
}

TEST_F(CliSubstance, InfoOfABrokenFileListsItsErrors) {
    const Result r = run({"info", "--substance", kIoData + "broken/bad-cas.json"});
    EXPECT_EQ(r.code, kExitBadInput);
    EXPECT_NE(r.err.find("/cas: '7732-18-4' fails the CAS check digit"), std::string::npos)
        << r.err;
}

TEST_F(CliSubstance, InfoWithoutSubstanceIsAUsageError) {
    EXPECT_EQ(run({"info"}).code, kExitUsage);
}

TEST_F(CliSubstance, EverySubcommandHasHelp) {
    for (const char *cmd : {"list", "info", "validate"}) {
        const Result r = run({cmd, "--help"});
        EXPECT_EQ(r.code, kExitOk) << cmd;
        EXPECT_GT(r.out.size(), 200u) << cmd;
        EXPECT_NE(r.out.find("Examples:"), std::string::npos) << cmd;
    }
}

}  // namespace
}  // namespace pw::cli
