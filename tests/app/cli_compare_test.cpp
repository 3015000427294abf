// phasewright-cli compare, run in-process through pw::cli::run(): the JSON layout (each
// substance's values under its id, fixed points as in `info`), the text table, units and bad
// input. Expected values and their sources are those of tests/core/library and
// tests/core/compare_test.cpp; each check names its source.
#include <gtest/gtest.h>

#include <nlohmann/json.hpp>
#include <sstream>

#include "app/cli/cli.h"

namespace pw::cli {
namespace {

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

TEST(CliCompare, WaterAndHeavyWaterJsonUnderTheirIds) {
    const auto r = run({"compare", "--substance", "water", "--substance", "D2O", "--T", "300",
                        "--P", "10", "--json"});
    ASSERT_EQ(r.code, kExitOk) << r.err;
    const auto j = nlohmann::json::parse(r.out);
    EXPECT_EQ(j["a"], "water");
    EXPECT_EQ(j["b"], "heavy-water");
    // Fixed points as in `info`: IAPWS R6-95 for water, IAPWS R16-17 for heavy water.
    EXPECT_NEAR(j["water"]["triple_point"]["T_K"].get<double>(), 273.16, 1e-9);
    EXPECT_NEAR(j["water"]["triple_point"]["P_Pa"].get<double>(), 611.657, 0.001);
    EXPECT_NEAR(j["water"]["critical_point"]["T_K"].get<double>(), 647.096, 1e-6);
    EXPECT_NEAR(j["water"]["critical_point"]["P_Pa"].get<double>(), 22.064e6, 1.0);
    EXPECT_NEAR(j["heavy-water"]["triple_point"]["T_K"].get<double>(), 276.969, 1e-3);
    EXPECT_NEAR(j["heavy-water"]["critical_point"]["T_K"].get<double>(), 643.847, 1e-3);
    // Normal boiling points 373.124 K (IAPWS R6-95) and 374.549 K (Herrig et al. 2018, from
    // memory), the difference within the two tolerances.
    EXPECT_NEAR(j["water"]["normal_boiling_point_K"].get<double>(), 373.124, 0.002);
    EXPECT_NEAR(j["heavy-water"]["normal_boiling_point_K"].get<double>(), 374.549, 0.01);
    EXPECT_NEAR(j["differences_b_minus_a"]["normal_boiling_point_K"].get<double>(), 1.425, 0.012);
    // Water has the higher vapor pressure at 300 K: 3536.8 Pa by IAPWS-95 (python3-iapws,
    // checked in tests/core/compare_test.cpp), so it is the more volatile.
    EXPECT_NEAR(j["water"]["vapor_pressure_at_T_Pa"].get<double>() / 3536.8, 1.0, 1e-4);
    EXPECT_EQ(j["more_volatile_at_T"], "water");
    EXPECT_EQ(j["water"]["notes"]["saturation_temperature_at_P_K"],
              "sublimation (over the solid)");  // 10 Pa is below 611.657 Pa (IAPWS R6-95)
    EXPECT_EQ(j["water"]["solid_denser_than_liquid"], false);  // ice floats (common practice)
    EXPECT_EQ(j["conditions"]["T_K"], 300.0);
}

TEST(CliCompare, CarbonDioxideAndNitrogenWithUnits) {
    // -23.15 degC = 250 K; 1 atm = 1.01325 bar (exact by definition).
    const auto r = run({"compare", "--substance", "CO2", "--substance", "nitrogen", "--T", "-23.15",
                        "--t-unit", "degC", "--P", "1.01325", "--p-unit", "bar", "--json"});
    ASSERT_EQ(r.code, kExitOk) << r.err;
    const auto j = nlohmann::json::parse(r.out);
    const auto &co2 = j["carbon-dioxide"];
    const auto &n2 = j["nitrogen"];
    // Span & Wagner 1996 and Span et al. 2000 fixed points.
    EXPECT_NEAR(co2["triple_point"]["P_Pa"].get<double>() / 0.51795e6, 1.0, 1e-4);
    EXPECT_NEAR(co2["critical_point"]["T_K"].get<double>(), 304.1282, 1e-4);
    EXPECT_NEAR(n2["triple_point"]["T_K"].get<double>(), 63.151, 1e-3);
    EXPECT_NEAR(n2["critical_point"]["P_Pa"].get<double>() / 3.3958e6, 1.0, 1e-4);
    EXPECT_TRUE(co2["normal_boiling_point_K"].is_null());  // liquid CO2 needs > 0.518 MPa
    EXPECT_NEAR(co2["saturation_temperature_at_P_K"].get<double>(), 194.686, 0.01);  // S&W 1996
    EXPECT_NEAR(n2["saturation_temperature_at_P_K"].get<double>(), 77.355, 0.005);   // Span 2000
    EXPECT_TRUE(n2["vapor_pressure_at_T_Pa"].is_null());  // 250 K > Tc = 126.192 K (Span 2000)
    EXPECT_EQ(n2["notes"]["vapor_pressure_at_T_Pa"], "T above Tc");
    EXPECT_EQ(j["more_volatile_at_T"], "nitrogen");
    EXPECT_TRUE(j["differences_b_minus_a"]["vapor_pressure_at_T_Pa"].is_null());
}

TEST(CliCompare, TextTableInTheChosenUnits) {
    const auto r = run({"compare", "--substance", "CO2", "--substance", "N2", "--t-unit", "degC",
                        "--p-unit", "MPa"});
    ASSERT_EQ(r.code, kExitOk) << r.err;
    // Critical temperatures 304.1282 K = 30.9782 degC (Span & Wagner 1996) and 126.192 K =
    // -146.958 degC (Span et al. 2000), difference -177.936 K.
    EXPECT_NE(r.out.find("30.9782 degC"), std::string::npos) << r.out;
    EXPECT_NE(r.out.find("-146.958 degC"), std::string::npos) << r.out;
    EXPECT_NE(r.out.find("-177.9 K"), std::string::npos) << r.out;
    // Critical pressure 7.3773 MPa (Span & Wagner 1996).
    EXPECT_NE(r.out.find("7.3773 MPa"), std::string::npos) << r.out;
    EXPECT_NE(r.out.find("Caution:"), std::string::npos);
    // No --T: no vapor-pressure row and no volatility verdict.
    EXPECT_EQ(r.out.find("Vapor pressure at"), std::string::npos);
    EXPECT_EQ(r.out.find("More volatile"), std::string::npos);
}

TEST(CliCompare, WaterListsItsOtherTriplePoints) {
    const auto r = run({"compare", "--substance", "water", "--substance", "D2O"});
    ASSERT_EQ(r.code, kExitOk) << r.err;
    EXPECT_NE(r.out.find("Other triple points:"), std::string::npos) << r.out;
    EXPECT_NE(r.out.find("ice III"), std::string::npos) << r.out;  // IAPWS R14-08 Ih-III-liquid
}

TEST(CliCompare, BadInputIsRefusedWithNothingOnStdout) {
    auto r = run({"compare", "--substance", "water"});
    EXPECT_EQ(r.code, kExitUsage);
    EXPECT_NE(r.err.find("two substances"), std::string::npos) << r.err;
    EXPECT_TRUE(r.out.empty());
    r = run({"compare", "--substance", "water", "--substance", "no-such-stuff"});
    EXPECT_EQ(r.code, kExitBadInput);
    EXPECT_TRUE(r.out.empty());
    r = run({"compare", "--substance", "water", "--substance", "CO2", "--T", "-300", "--t-unit",
             "degC"});
    EXPECT_EQ(r.code, kExitBadInput);  // below absolute zero
    EXPECT_NE(r.err.find("temperature"), std::string::npos) << r.err;
    r = run({"compare", "--substance", "water", "--substance", "CO2", "--p-unit", "furlongs"});
    EXPECT_EQ(r.code, kExitBadInput);
    EXPECT_NE(r.err.find("furlongs"), std::string::npos) << r.err;
}

}  // namespace
}  // namespace pw::cli
