// Run logs: column and unit guessing, time formats, bad cells, progress and cancel.
#include "core/run/run_log.h"

#include <gtest/gtest.h>

#include <sstream>

namespace pw::run {
namespace {

RunLog read(const std::string &text, const RunLogOptions &opt = {}) {
    std::istringstream in(text);
    return readRunLog(in, "run.csv", opt);
}

TEST(RunLog, PrefersProductAndChamberColumns) {
    const RunLog log = read(
        "time [min],shelf_T [degC],product_T [degC],pirani_P [mTorr],chamber_P [mTorr]\n"
        "0,-40,-45,200,100\n"
        "1.5,-39,-44,210,100\n");
    EXPECT_EQ(log.layout.timeColumn, 0u);
    EXPECT_EQ(log.layout.temperatureColumn, 2u);
    EXPECT_EQ(log.layout.pressureColumn, 4u);
    EXPECT_FALSE(log.layout.notes.empty());
    ASSERT_EQ(log.states.size(), 2u);
    EXPECT_DOUBLE_EQ(log.states[1].time_s, 90.0);
    EXPECT_DOUBLE_EQ(log.states[0].T_K, 228.15);
    // 100 mTorr = 0.1 * 101325/760 Pa (definition of the torr).
    EXPECT_NEAR(log.states[0].P_Pa, 13.33223684, 1e-7);
}

TEST(RunLog, IsoTimestampsCountFromTheFirstRow) {
    const RunLog log = read(
        "timestamp;T [K];P [Pa]\n"
        "2026-03-14T23:59:30Z;250;10\n"
        "2026-03-15T00:00:30Z;251;10\n"
        "2026-03-15T01:00:30+01:00;252;10\n");
    EXPECT_EQ(log.layout.timeFormat, TimeFormat::Iso8601);
    EXPECT_EQ(log.startTimestamp, "2026-03-14T23:59:30Z");
    ASSERT_EQ(log.states.size(), 3u);
    EXPECT_DOUBLE_EQ(log.states[1].time_s, 60.0);
    EXPECT_DOUBLE_EQ(log.states[2].time_s, 60.0);
}

TEST(RunLog, GaugePressureGetsTheBarometricPressure) {
    const RunLog log = read("t [s],vessel_T [degC],vessel_P [barg]\n0,40,99\n");
    EXPECT_TRUE(log.layout.gauge);
    // 1 bar = 1e5 Pa; standard atmosphere 101325 Pa (CGPM 1954).
    EXPECT_DOUBLE_EQ(log.states[0].P_Pa, 99e5 + 101325.0);
}

TEST(RunLog, ExplicitColumnsAndUnitsOverrideTheGuess) {
    RunLogOptions opt;
    opt.temperatureColumn = "shelf_T";
    opt.pressureColumn = "pirani_P [mTorr]";
    opt.pressureUnit = PressureUnit::Pa;
    opt.timeUnit_s = 3600.0;
    const RunLog log = read(
        "time,shelf_T [degC],product_T [degC],pirani_P [mTorr]\n0,-40,-45,20\n2,-40,-45,20\n", opt);
    EXPECT_EQ(log.layout.temperatureColumn, 1u);
    EXPECT_DOUBLE_EQ(log.states[0].T_K, 233.15);
    EXPECT_DOUBLE_EQ(log.states[0].P_Pa, 20.0);
    EXPECT_DOUBLE_EQ(log.states[1].time_s, 7200.0);
}

void expectBad(const std::string &text, long row, const std::string &field,
               const RunLogOptions &opt = {}) {
    try {
        read(text, opt);
        ADD_FAILURE() << "no error for:\n" << text;
    } catch (const InputError &e) {
        EXPECT_EQ(e.file(), "run.csv");
        EXPECT_EQ(e.row(), row) << e.what();
        EXPECT_EQ(e.field(), field) << e.what();
    }
}

TEST(RunLog, EveryBadCellNamesFileRowAndColumn) {
    const std::string head = "time [s],T [degC],P [Pa]\n";
    expectBad(head + "0,20,100\n1,abc,100\n", 3, "T [degC]");
    expectBad(head + "0,20,100\n1,20,\n", 3, "P [Pa]");
    expectBad(head + "0,20,100\nx,20,100\n", 3, "time [s]");
    expectBad(head + "0,20,100\n1,-300,100\n", 3, "T [degC]");
    expectBad(head + "0,20,100\n1,20,-1\n", 3, "P [Pa]");
    expectBad(head + "10,20,100\n5,20,100\n", 3, "time [s]");
    expectBad("timestamp,T [K],P [Pa]\n2026-03-14T08:00:00Z,250,10\n2026-03-14 8h,250,10\n", 3,
              "timestamp");
    expectBad("time [fortnight],T [K],P [Pa]\n0,250,10\n", 1, "time [fortnight]");
    expectBad("time [s],T [K],P [hPascal]\n0,250,10\n", 1, "P [hPascal]");
    expectBad("time [s],T [K]\n0,250\n", 1, "");
    expectBad(head, 2, "");
    RunLogOptions named;
    named.pressureColumn = "chamber";
    expectBad(head + "0,20,100\n", 1, "chamber", named);
}

TEST(RunLog, ARunawayTimestampCellIsShownCut) {
    const std::string junk(1 << 20, 'x');  // a logger that lost its line ends
    try {
        read("timestamp,T [K],P [Pa]\n2026-03-14T08:00:00Z,250,10\n" + junk + ",250,10\n");
        FAIL() << "no error";
    } catch (const InputError &e) {
        const std::string what = e.what();
        EXPECT_LT(what.size(), 300u);
        EXPECT_NE(what.find("(1048576 bytes)"), std::string::npos) << what;
    }
}

TEST(RunLog, ReportsProgressAndHonoursCancel) {
    std::string text = "time [s],T [K],P [Pa]\n";
    for (int i = 0; i < 50000; ++i) text += std::to_string(i) + ",250,10\n";
    std::vector<double> seen;
    {
        std::istringstream in(text);
        const RunLog log = readRunLog(
            in, "big.csv", {}, [&seen](double f) { seen.push_back(f); }, nullptr, text.size());
        EXPECT_EQ(log.states.size(), 50000u);
    }
    ASSERT_GE(seen.size(), 2u);
    EXPECT_DOUBLE_EQ(seen.back(), 1.0);
    EXPECT_TRUE(std::is_sorted(seen.begin(), seen.end()));
    std::atomic<bool> cancel{true};
    std::istringstream in(text);
    EXPECT_THROW(readRunLog(in, "big.csv", {}, {}, &cancel, text.size()), Cancelled);
}

TEST(RunLog, ReadsTheFileInTheDataFolder) {
    const RunLog log =
        readRunLogFile(std::string(PW_SOURCE_DIR) + "/tests/core/run/data/small-run.csv");
    ASSERT_EQ(log.states.size(), 5u);
    EXPECT_EQ(log.layout.header[log.layout.temperatureColumn], "product_T [degC]");
    EXPECT_DOUBLE_EQ(log.states[4].time_s, 120.0);
    EXPECT_THROW(
        readRunLogFile(std::string(PW_SOURCE_DIR) + "/tests/core/run/data/no-such-file.csv"),
        InputError);
}

TEST(RunLog, PreviewShowsTheGuessAndTheFirstRows) {
    const RunLogPreview p =
        previewRunLogFile(std::string(PW_SOURCE_DIR) + "/tests/core/run/data/small-run.csv", {}, 3);
    ASSERT_EQ(p.rows.size(), 3u);
    EXPECT_EQ(p.rows[0][0], "2026-03-14T08:00:00Z");
    EXPECT_EQ(p.layout.timeFormat, TimeFormat::Iso8601);
    EXPECT_EQ(p.layout.temperatureUnit, TemperatureUnit::Celsius);
    EXPECT_EQ(p.layout.pressureUnit, PressureUnit::mTorr);
    EXPECT_EQ(p.layout.header[p.layout.pressureColumn], "chamber_P [mTorr]");
}

}  // namespace
}  // namespace pw::run
