// phasewright-cli classify / boundary / path, run in-process through pw::cli::run(): point
// and file classification, units from header brackets, bad rows (no output file by default,
// --skip-bad reports and counts), JSON shapes and exit codes.
#include <gtest/gtest.h>
#include <unistd.h>

#include <algorithm>
#include <filesystem>
#include <fstream>
#include <nlohmann/json.hpp>
#include <sstream>

#include "app/cli/cli.h"

namespace pw::cli {
namespace {

namespace fs = std::filesystem;

struct Result {
    int code;
    std::string out, err;
};

Result runCli(const std::vector<std::string> &args, const std::string &input = "") {
    std::ostringstream out, err;
    std::istringstream in(input);
    const int code = run(args, Io{out, err, in});
    return {code, out.str(), err.str()};
}

class CliClassify : public testing::Test {
protected:
    void SetUp() override {
        dir_ = fs::temp_directory_path() / ("pw-cli-classify-" + std::to_string(::getpid()));
        fs::remove_all(dir_);
        fs::create_directories(dir_);
    }
    void TearDown() override { fs::remove_all(dir_); }
    std::string file(const std::string &name, const std::string &text) {
        const fs::path p = dir_ / name;
        std::ofstream(p, std::ios::binary) << text;
        return p.string();
    }
    std::size_t filesInDir() const {
        return static_cast<std::size_t>(std::distance(fs::directory_iterator(dir_), {}));
    }
    fs::path dir_;
};

TEST_F(CliClassify, SinglePointJson) {
    // -40 °C at 10 Pa: ice sublimes; R14-08 p_sub(233.15 K) = 12.8412 Pa (python3-iapws).
    const Result r = runCli({"classify", "--substance", "water", "--T", "-40", "--t-unit", "degC",
                             "--P", "10", "--json"});
    ASSERT_EQ(r.code, kExitOk) << r.err;
    const auto j = nlohmann::json::parse(r.out);
    EXPECT_EQ(j["phase"], "vapor");
    EXPECT_EQ(j["nearest_boundary"], "sublimation (ice Ih)");
    EXPECT_NEAR(j["dP_Pa"].get<double>(), 10.0 - 12.841171771034436, 1e-6);
}

TEST_F(CliClassify, FileWithBracketUnitsFromStdin) {
    // CO2 (Span & Wagner 1996): 15 °C at 60 bar is liquid, 40 °C at 100 bar supercritical.
    const Result r = runCli({"classify", "--substance", "co2", "--input", "-"},
                            "T [degC];P [bar]\n15;60\n40;100\n");
    ASSERT_EQ(r.code, kExitOk) << r.err;
    EXPECT_NE(r.out.find("T [degC];P [bar];phase;solid_form;nearest_boundary;dT_K;dP_Pa;"
                         "on_boundary;flags\n"),
              std::string::npos);
    EXPECT_NE(r.out.find("15;60;liquid;"), std::string::npos);
    EXPECT_NE(r.out.find("40;100;supercritical;;critical point;9.02"), std::string::npos);
}

// The margin fields of the one data row of a classify CSV output.
std::pair<std::string, std::string> marginTexts(const std::string &csv) {
    std::istringstream lines(csv);
    std::string header, row;
    std::getline(lines, header);
    std::getline(lines, row);
    std::vector<std::string> cells;
    std::istringstream fields(row);
    for (std::string cell; std::getline(fields, cell, ',');) cells.push_back(cell);
    return {cells.at(5), cells.at(6)};  // T, P, phase, solid_form, nearest_boundary, dT, dP
}

TEST_F(CliClassify, MarginsWithTwelveDigitsByDefaultAndExactWithSeventeen) {
    // 250.123 K at 20.5 Pa: vapor below the ice sublimation curve (about 77 Pa there), with
    // margins that are long decimals. 12 significant digits by default; --digits 17 reads
    // back to the very double the single-point classification gives.
    const std::string input = "T,P\n250.123,20.5\n";
    const Result byDefault = runCli({"classify", "--substance", "water", "--input", "-"}, input);
    ASSERT_EQ(byDefault.code, kExitOk) << byDefault.err;
    const auto [dT12, dP12] = marginTexts(byDefault.out);
    const auto significant = [](std::string s) {
        s.erase(std::remove_if(s.begin(), s.end(), [](char c) { return c < '0' || c > '9'; }),
                s.end());
        return s.substr(s.find_first_not_of('0')).size();
    };
    EXPECT_LE(significant(dT12), 12u) << dT12;
    EXPECT_LE(significant(dP12), 12u) << dP12;
    const Result exact =
        runCli({"classify", "--substance", "water", "--input", "-", "--digits", "17"}, input);
    ASSERT_EQ(exact.code, kExitOk) << exact.err;
    const auto [dT17, dP17] = marginTexts(exact.out);
    EXPECT_NEAR(std::stod(dT17), std::stod(dT12), 1e-9);
    EXPECT_NEAR(std::stod(dP17), std::stod(dP12), 1e-9);
    const Result json =
        runCli({"classify", "--substance", "water", "--T", "250.123", "--P", "20.5", "--json"});
    const auto j = nlohmann::json::parse(json.out);
    EXPECT_EQ(std::stod(dT17), j["dT_K"].get<double>());  // bit for bit
    EXPECT_EQ(std::stod(dP17), j["dP_Pa"].get<double>());
    EXPECT_EQ(
        runCli({"classify", "--substance", "water", "--input", "-", "--digits", "18"}, input).code,
        kExitUsage);
    EXPECT_EQ(
        runCli({"classify", "--substance", "water", "--input", "-", "--digits", "0"}, input).code,
        kExitUsage);
}

TEST_F(CliClassify, LabelsWithTheSeparatorAreQuoted) {
    // A user's substance whose solid form carries the separator: its rows take the checked
    // path of the writer (RFC 4180 quoting), not the unquoted one of the bundled labels.
    std::ifstream bundled(std::string(PW_SOURCE_DIR) + "/resources/substances/water.json");
    std::string json((std::istreambuf_iterator<char>(bundled)), {});
    for (std::size_t at = json.find("\"ice Ih\""); at != std::string::npos;
         at = json.find("\"ice Ih\"", at))
        json.replace(at, 8, "\"ice I,h\"");
    const std::string substance = file("water-comma.json", json);
    const Result r =
        runCli({"classify", "--substance", substance, "--input", "-"}, "T,P\n250,10\n250,1000\n");
    ASSERT_EQ(r.code, kExitOk) << r.err;
    EXPECT_NE(r.out.find("250,10,vapor,,\"sublimation (ice I,h)\","), std::string::npos) << r.out;
    EXPECT_NE(r.out.find("250,1000,solid,\"ice I,h\",\"melting (ice I,h)\","), std::string::npos)
        << r.out;
}

TEST_F(CliClassify, BadRowFailsAndLeavesNoFile) {
    const std::string in = file("in.csv", "T,P\n300,1e5\n300,abc\n");
    const std::string out = (dir_ / "out.csv").string();
    const Result r = runCli({"classify", "--substance", "water", "--input", in, "--output", out});
    EXPECT_EQ(r.code, kExitBadInput);
    EXPECT_NE(r.err.find("row 3"), std::string::npos);
    EXPECT_NE(r.err.find("'P'"), std::string::npos);
    EXPECT_FALSE(fs::exists(out));
    EXPECT_EQ(filesInDir(), 1u);  // no temporary file left behind
}

TEST_F(CliClassify, SkipBadWritesGoodRowsAndCounts) {
    const std::string in = file("in.csv", "T,P\n300,1e5\n300,abc\n-5,1e5\n250,1e5\n");
    const std::string out = (dir_ / "out.csv").string();
    const Result r =
        runCli({"classify", "--substance", "water", "--input", in, "--output", out, "--skip-bad"});
    ASSERT_EQ(r.code, kExitOk) << r.err;
    EXPECT_NE(r.err.find("2 bad rows skipped"), std::string::npos);
    std::ifstream f(out);
    std::string line;
    int lines = 0;
    while (std::getline(f, line)) ++lines;
    EXPECT_EQ(lines, 3);  // header + 2 good rows
}

// Rows travel in blocks of 4096 through worker threads; the output and the messages must not
// depend on the number of threads. 20 000 water states with a bad row every 3 000 rows.
TEST_F(CliClassify, ThreadsGiveTheSameOutputAndMessages) {
    std::string text = "T [K],P [Pa]\n";
    for (int i = 0; i < 20000; ++i) {
        if (i % 3000 == 1500) {
            text += "300,broken\n";
            continue;
        }
        text += std::to_string(200.0 + 0.025 * i) + "," + std::to_string(1.0 + 50.0 * i) + "\n";
    }
    const std::string in = file("many.csv", text);
    std::vector<std::string> outputs, messages;
    for (const char *threads : {"1", "2", "5"}) {
        const Result r = runCli({"classify", "--substance", "water", "--input", in, "--skip-bad",
                                 "--threads", threads});
        ASSERT_EQ(r.code, kExitOk) << r.err;
        outputs.push_back(r.out);
        messages.push_back(r.err);
    }
    EXPECT_EQ(std::count(outputs[0].begin(), outputs[0].end(), '\n'), 1 + 20000 - 7);
    EXPECT_NE(messages[0].find("row 1502"),
              std::string::npos);  // data row 1500: line 1502 (the header is row 1)
    EXPECT_NE(messages[0].find("7 bad rows skipped"), std::string::npos);
    for (std::size_t k = 1; k < outputs.size(); ++k) {
        EXPECT_EQ(outputs[k], outputs[0]) << "threads differ";
        EXPECT_EQ(messages[k], messages[0]);
    }
}

TEST_F(CliClassify, BadRowAfterManyBlocksLeavesNoFile) {
    std::string text = "T,P\n";
    for (int i = 0; i < 30000; ++i) text += "300,1e5\n";
    text += "300,-2\n";
    const std::string in = file("late.csv", text);
    const std::string out = (dir_ / "out.csv").string();
    const Result r = runCli(
        {"classify", "--substance", "water", "--input", in, "--output", out, "--threads", "3"});
    EXPECT_EQ(r.code, kExitBadInput);
    EXPECT_NE(r.err.find("row 30002"), std::string::npos) << r.err;
    EXPECT_FALSE(fs::exists(out));
    EXPECT_EQ(filesInDir(), 1u);
}

// 1e308 kPa is a finite number but overflows on conversion to Pa: refused, naming the column.
TEST_F(CliClassify, OverflowAfterUnitConversionIsABadRow) {
    const std::string in = file("big.csv", "T,P [kPa]\n300,100\n300,1e308\n");
    const Result r = runCli({"classify", "--substance", "water", "--input", in});
    EXPECT_EQ(r.code, kExitBadInput);
    EXPECT_NE(r.err.find("row 3, field 'P [kPa]'"), std::string::npos) << r.err;
    EXPECT_NE(r.err.find("out of range"), std::string::npos) << r.err;
}

TEST_F(CliClassify, HeaderOnlyIsAnErrorWithNoOutput) {
    const std::string in = file("empty.csv", "T,P\n");
    const std::string out = (dir_ / "out.csv").string();
    const Result r = runCli({"classify", "--substance", "water", "--input", in, "--output", out});
    EXPECT_EQ(r.code, kExitBadInput);
    EXPECT_NE(r.err.find("no data rows"), std::string::npos) << r.err;
    EXPECT_FALSE(fs::exists(out));
}

TEST_F(CliClassify, BoundaryJsonAtPressure) {
    // 1 atm on water: melting at 273.1525 K (R14-08) and boiling at 373.1243 K (SR1-86),
    // python3-iapws inverted with brentq.
    const Result r =
        runCli({"boundary", "--substance", "water", "--P", "1", "--p-unit", "atm", "--json"});
    ASSERT_EQ(r.code, kExitOk) << r.err;
    const auto j = nlohmann::json::parse(r.out);
    bool melt = false, vap = false;
    for (const auto &b : j["boundaries"]) {
        if (b["kind"] == "melting" && b.value("solid_form", "") == "ice Ih") {
            melt = true;
            EXPECT_NEAR(b["T_K"].get<double>(), 273.1525190797695, 1e-6);
        }
        if (b["kind"] == "vaporization") {
            vap = true;
            EXPECT_NEAR(b["T_K"].get<double>(), 373.1242958054116, 1e-5);
            EXPECT_EQ(b["phases"], nlohmann::json({"liquid", "vapor"}));
        }
    }
    EXPECT_TRUE(melt);
    EXPECT_TRUE(vap);
}

TEST_F(CliClassify, PathJsonForSupercriticalDrying) {
    const std::string in = file("run.csv",
                                "time [min],T [degC],P [MPa]\n0,15,6\n10,15,10\n20,40,10\n"
                                "30,40,0.1\n");
    const Result r = runCli({"path", "--substance", "co2", "--input", in, "--json"});
    ASSERT_EQ(r.code, kExitOk) << r.err;
    const auto j = nlohmann::json::parse(r.out);
    ASSERT_EQ(j["events"].size(), 2u);
    EXPECT_EQ(j["events"][0]["transition"], "enter_supercritical");
    // Tc = 304.1282 K (Span & Wagner 1996): 15 -> 40 °C over 600 s on the second leg.
    EXPECT_NEAR(j["events"][0]["time"].get<double>(), 600.0 + 600.0 * (304.1282 - 288.15) / 25.0,
                1e-3);
    EXPECT_EQ(j["events"][1]["transition"], "leave_supercritical");
    EXPECT_EQ(j["summary"]["crosses_liquid_vapor"], false);
}

TEST_F(CliClassify, UsageErrors) {
    EXPECT_EQ(runCli({"classify", "--substance", "water", "--T", "300"}).code, kExitUsage);
    EXPECT_EQ(runCli({"boundary", "--substance", "water", "--T", "300", "--P", "1"}).code,
              kExitUsage);
    EXPECT_EQ(runCli({"classify", "--substance", "water", "--T", "0", "--P", "1"}).code,
              kExitBadInput);
    const Result text = runCli({"classify", "--substance", "water", "--T", "300", "--P", "1"});
    ASSERT_EQ(text.code, kExitOk);
    // 300 K is above the triple temperature: the sublimation curve has no pressure there.
    EXPECT_NE(text.out.find("dP = n/a"), std::string::npos) << text.out;
    EXPECT_EQ(text.out.find("nan"), std::string::npos);
    EXPECT_EQ(runCli({"classify", "--substance", "water", "--T", "300", "--P", "1",
                      "--on-boundary-K", "-1"})
                  .code,
              kExitUsage);
    const Result unknown = runCli({"clasify", "--substance", "water"});
    EXPECT_EQ(unknown.code, kExitUsage);
    EXPECT_NE(unknown.err.find("unknown command 'clasify'"), std::string::npos) << unknown.err;
    EXPECT_NE(unknown.err.find("classify"), std::string::npos);
}

}  // namespace
}  // namespace pw::cli
