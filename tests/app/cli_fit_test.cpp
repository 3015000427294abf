// phasewright-cli fit, driven in-process: report, --output (new file), --into (merge),
// --json, bad data (exit 1, nothing written), and the written file used by other commands.
#include <gtest/gtest.h>

#include <cmath>
#include <filesystem>
#include <fstream>
#include <nlohmann/json.hpp>
#include <sstream>

#include "app/cli/cli.h"

namespace pw::cli {
namespace {

namespace fs = std::filesystem;

struct Run {
    int code = -1;
    std::string out, err;
};

Run run(const std::vector<std::string> &args) {
    std::ostringstream out, err;
    std::istringstream in;
    Run r;
    r.code = pw::cli::run(args, Io{out, err, in});
    r.out = out.str();
    r.err = err.str();
    return r;
}

// CO2 vapor pressure, Span & Wagner (1996) J. Phys. Chem. Ref. Data 25, 1509, eq. (3.13).
double pCO2(double T) {
    const double tau = 1.0 - T / 304.1282;
    const double s = -7.0602087 * tau + 1.9391218 * std::pow(tau, 1.5) - 1.6463597 * tau * tau -
                     3.2995634 * std::pow(tau, 4.0);
    return 7.3773e6 * std::exp(304.1282 / T * s);
}

class CliFit : public ::testing::Test {
protected:
    void SetUp() override {
        dir_ = fs::path(PW_BINARY_DIR) / "cli_fit_test" /
               ::testing::UnitTest::GetInstance()->current_test_info()->name();
        fs::remove_all(dir_);
        fs::create_directories(dir_);
        // Measurements in degC and bar, 0.05 % alternating "noise" (deterministic).
        std::ofstream csv(path("co2.csv"));
        csv << "T [degC],P [bar]\n";
        for (int i = 0; i < 25; ++i) {
            const double T = 218.0 + 3.5 * i;
            const double noise = 1.0 + 5e-4 * ((i % 2) ? 1.0 : -1.0);
            csv << T - 273.15 << ',' << pCO2(T) * noise / 1e5 << '\n';
        }
    }
    std::string path(const std::string &name) const { return (dir_ / name).string(); }
    std::vector<std::string> fitArgs(const std::string &data) const {
        return {"fit",    "--input", data,       "--boundary", "vaporization", "--model",
                "wagner", "--Tc",    "304.1282", "--Pc",       "7.3773e6"};
    }
    fs::path dir_;
};

TEST_F(CliFit, ReportsParametersAndStatistics) {
    const auto r = run(fitArgs(path("co2.csv")));
    ASSERT_EQ(r.code, 0) << r.err;
    EXPECT_NE(r.out.find("a1"), std::string::npos);
    EXPECT_NE(r.out.find("leave-one-out RMS"), std::string::npos);
    EXPECT_NE(r.out.find("291.500000"), std::string::npos) << r.out;  // a residual row, in K
}

TEST_F(CliFit, OutputFileWorksAsSubstanceInOtherCommands) {
    auto args = fitArgs(path("co2.csv"));
    // Triple point 216.592 K / 0.51795 MPa (Span & Wagner 1996), so that classify knows where
    // the vaporization curve starts.
    args.insert(args.end(), {"--Tt", "216.592", "--Pt", "517950", "--name", "CO2 lab", "--output",
                             path("co2-lab.json")});
    const auto r = run(args);
    ASSERT_EQ(r.code, 0) << r.err;
    ASSERT_TRUE(fs::exists(path("co2-lab.json")));
    EXPECT_NE(r.out.find("substance 'co2-lab'"), std::string::npos) << r.out;
    // 280 K at 1 MPa is below the vapor pressure (Span & Wagner 1996 eq. 3.13: about 4.16 MPa):
    // vapor, with dP = 1 MPa - p_sat(280 K) from the fitted curve (0.05 % scatter in the data).
    const auto c = run(
        {"classify", "--substance", path("co2-lab.json"), "--T", "280", "--P", "1e6", "--json"});
    ASSERT_EQ(c.code, 0) << c.err;
    const auto cj = nlohmann::json::parse(c.out);
    EXPECT_EQ(cj.at("phase"), "vapor") << c.out;
    EXPECT_NEAR(cj.at("dP_Pa").get<double>(), 1e6 - pCO2(280.0), 1e-3 * pCO2(280.0)) << c.out;
    const auto b = run({"boundary", "--substance", path("co2-lab.json"), "--T", "280"});
    EXPECT_EQ(b.code, 0) << b.err;
    const auto v = run({"validate", path("co2-lab.json")});
    EXPECT_EQ(v.code, 0) << v.out << v.err;
    // --output never overwrites.
    const auto again = run(args);
    EXPECT_EQ(again.code, 1);
    EXPECT_NE(again.err.find("--into"), std::string::npos) << again.err;
}

TEST_F(CliFit, IntoMergesASecondBoundary) {
    auto args = fitArgs(path("co2.csv"));
    args.insert(args.end(), {"--output", path("s.json")});
    ASSERT_EQ(run(args).code, 0);
    std::ofstream(path("sub.csv")) << "T [K],P [Pa]\n180,1.3e4\n190,3.0e4\n200,6.5e4\n210,1.3e5\n";
    const auto r = run({"fit", "--input", path("sub.csv"), "--boundary", "sublimation", "--model",
                        "clausius-clapeyron", "--into", path("s.json")});
    ASSERT_EQ(r.code, 0) << r.err;
    EXPECT_NE(r.out.find("added a sublimation boundary"), std::string::npos) << r.out;
    std::ifstream in(path("s.json"));
    const auto j = nlohmann::json::parse(in);
    EXPECT_EQ(j.at("boundaries").size(), 2u);
    EXPECT_NE(j.dump().find("fitted by phasewright-cli fit"), std::string::npos);
}

TEST_F(CliFit, JsonReport) {
    auto args = fitArgs(path("co2.csv"));
    args.push_back("--json");
    const auto r = run(args);
    ASSERT_EQ(r.code, 0) << r.err;
    const auto j = nlohmann::json::parse(r.out);
    EXPECT_EQ(j.at("parameters").size(), 4u);
    // The deterministic +/-0.05 % perturbation shows up as the scatter (RMS near 0.05 %).
    EXPECT_NEAR(j.at("statistics").at("rms_dev_pct").get<double>(), 0.05, 0.02);
    EXPECT_TRUE(j.at("written").is_null());
}

TEST_F(CliFit, BadDataIsAnErrorAndWritesNothing) {
    std::ofstream(path("dup.csv")) << "T [K],P [Pa]\n250,1.8e6\n260,2.4e6\n250,1.8e6\n270,3.2e6\n";
    auto args = fitArgs(path("dup.csv"));
    args.insert(args.end(), {"--output", path("never.json")});
    const auto r = run(args);
    EXPECT_EQ(r.code, 1);
    EXPECT_NE(r.err.find("row 4"), std::string::npos) << r.err;
    EXPECT_NE(r.err.find("duplicate temperature"), std::string::npos) << r.err;
    EXPECT_FALSE(fs::exists(path("never.json")));
    std::ofstream(path("neg.csv")) << "T [K],P [Pa]\n250,1.8e6\n260,-2\n270,3.2e6\n";
    const auto n = run({"fit", "--input", path("neg.csv"), "--boundary", "vaporization", "--model",
                        "clausius-clapeyron", "--output", path("never.json")});
    EXPECT_EQ(n.code, 1);
    EXPECT_NE(n.err.find("row 3"), std::string::npos) << n.err;
    EXPECT_FALSE(fs::exists(path("never.json")));
    EXPECT_EQ(std::distance(fs::directory_iterator(dir_), fs::directory_iterator()), 3);
}

TEST_F(CliFit, UsageErrors) {
    EXPECT_EQ(
        run({"fit", "--input", path("co2.csv"), "--boundary", "boiling", "--model", "antoine"})
            .code,
        2);
    auto args = fitArgs(path("co2.csv"));
    args.insert(args.end(), {"--output", path("a.json"), "--into", path("co2.csv")});
    EXPECT_EQ(run(args).code, 2);
}

}  // namespace
}  // namespace pw::cli
