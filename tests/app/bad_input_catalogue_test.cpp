// A catalogue of bad inputs driven through the command line in-process (pw::cli::run): for
// each, the exit code (cli.h: 1 bad input, 2 usage error), the kind of error and that the
// message names the file, the row and the field, and that no output file (and no temporary
// file) is left behind. Rule: "bad input: clear error naming file, row and field; no partial
// output files; no silent clamping" (the project's brief). The broken substance files are the
// ones of tests/core/io/data/broken, checked through `validate`.
// Physical facts used by the accepted cases (CO2, Span & Wagner 1996, J. Phys. Chem. Ref.
// Data 25, 1509): triple point 216.592 K / 0.51795 MPa, critical point 304.1282 K / 7.3773 MPa.
#include <gtest/gtest.h>
#include <unistd.h>

#include <filesystem>
#include <fstream>
#include <set>
#include <sstream>
#include <string>
#include <vector>

#include "app/cli/cli.h"
#include "core/errors.h"
#include "core/run/run_log.h"

namespace pw::cli {
namespace {

namespace fs = std::filesystem;

struct Result {
    int code;
    std::string out, err;
};

struct Case {
    std::string name;
    std::string input;               // the content of in.csv
    std::vector<std::string> extra;  // options after classify --input in.csv --output out.csv
    int code;
    std::vector<std::string> mustSay;  // each must appear in stderr
};

// Pressure and temperature are plain K and Pa unless the header says otherwise.
std::vector<Case> csvCases() {
    const std::string tenMb(10u << 20, '3');
    return {
        {"empty", "", {}, 1, {"in.csv", "empty"}},
        {"only_blank_lines", "\n\n\r\n", {}, 1, {"in.csv", "empty"}},
        {"missing_pressure_column",
         "T,X\n300,1\n",
         {},
         1,
         {"in.csv", "row 1", "'pressure'", "no pressure column"}},
        {"missing_named_column",
         "T,P\n300,1\n",
         {"--t-col", "temp_K"},
         1,
         {"in.csv", "row 1", "temp_K"}},
        {"non_numeric_cell",
         "T,P\n300,1\n300,abc\n",
         {},
         1,
         {"in.csv", "row 3", "field 'P'", "'abc' is not a number"}},
        {"empty_cell", "T,P\n,1\n", {}, 1, {"in.csv", "row 2", "field 'T'", "missing value"}},
        {"nan", "T,P\nnan,1\n", {}, 1, {"in.csv", "row 2", "field 'T'", "not a finite number"}},
        {"inf", "T,P\n300,inf\n", {}, 1, {"in.csv", "row 2", "field 'P'", "not a finite number"}},
        {"minus_inf",
         "T,P\n300,-inf\n",
         {},
         1,
         {"in.csv", "row 2", "field 'P'", "not a finite number"}},
        {"negative_kelvin",
         "T [K],P\n-5,1\n",
         {},
         1,
         {"in.csv", "row 2", "field 'T [K]'", "not a physical temperature"}},
        {"below_absolute_zero_celsius",
         "T [degC],P\n-300,1\n",
         {},
         1,
         {"in.csv", "row 2", "field 'T [degC]'", "not a physical temperature"}},
        {"zero_kelvin",
         "T,P\n0,1\n",
         {},
         1,
         {"in.csv", "row 2", "field 'T'", "not a physical temperature"}},
        {"zero_pressure",
         "T,P\n300,0\n",
         {},
         1,
         {"in.csv", "row 2", "field 'P'", "not a physical absolute pressure"}},
        {"negative_pressure",
         "T,P [bar]\n300,-0.5\n",
         {},
         1,
         {"in.csv", "row 2", "field 'P [bar]'", "not a physical absolute pressure"}},
        {"unknown_unit_in_header",
         "T [furlong],P\n300,1\n",
         {},
         1,
         {"in.csv", "row 1", "field 'T [furlong]'", "unknown temperature unit 'furlong'"}},
        {"unknown_unit_option",
         "T,P\n300,1\n",
         {"--p-unit", "parsec"},
         1,
         {"in.csv", "row 1", "field 'P'", "unknown pressure unit 'parsec'"}},
        {"unit_option_contradicts_header",
         "T [degC],P\n20,1\n",
         {"--t-unit", "K"},
         1,
         {"in.csv", "row 1", "field 'T [degC]'", "--t-unit"}},
        {"short_row",
         "T,P\n300,1\n300\n",
         {},
         1,
         {"in.csv", "row 3", "1 fields but the header has 2"}},
        {"long_row", "T,P\n300,1,7\n", {}, 1, {"in.csv", "row 2", "3 fields but the header has 2"}},
        {"mixed_separators_row",
         "T,P\n300;1\n",
         {},
         1,
         {"in.csv", "row 2", "1 fields but the header has 2"}},
        {"mixed_separators_cell",
         "T;P\n300,5;1\n",
         {},
         1,
         {"in.csv", "row 2", "field 'T'", "--decimal-comma"}},
        {"decimal_comma_not_declared",
         "T [degC];P [mbar]\n-40,5;0,1\n",
         {},
         1,
         {"in.csv", "row 2", "field 'T [degC]'", "--decimal-comma"}},
        {"decimal_comma_with_comma_separator",
         "T,P\n300,1\n",
         {"--decimal-comma"},
         1,
         {"in.csv", "row 1", "cannot be told apart"}},
        {"decimal_comma_quoted_in_comma_file",
         "T,P\n\"300,5\",1\n",
         {},
         1,
         {"in.csv", "row 2", "field 'T'", "--decimal-comma"}},
        {"decimal_point_in_declared_comma_file",
         "T;P\n300.5;1\n",
         {"--decimal-comma"},
         1,
         {"in.csv", "row 2", "field 'T'", "decimal comma"}},
        {"unclosed_quote",
         "T,P\n\"300,1\n",
         {},
         1,
         {"in.csv", "row 2", "quoted field is not closed"}},
        {"overflow_1e400",
         "T,P\n300,1e400\n",
         {},
         1,
         {"in.csv", "row 2", "field 'P'", "out of range"}},
        {"underflow_1e-400",
         "T,P\n1e-400,1\n",
         {},
         1,
         {"in.csv", "row 2", "field 'T'", "out of range"}},
        {"ten_megabyte_line",
         "T,P\n300," + tenMb + "\n",
         {},
         1,
         {"in.csv", "row 2", "field 'P'", "out of range", "10485760 bytes"}},
        {"binary_junk",
         std::string("\x7f"
                     "ELF\x02\x01\x01\x00\x00\xff\xfe,\x01\n\x00\x00\x9c\n",
                     17),
         {},
         1,
         {"in.csv", "row 1"}},
        {"unknown_separator", "T,P\n300,1\n", {"--separator", "|"}, 2, {"--separator"}},
        {"bad_row_later_keeps_nothing",
         "T,P\n300,1\n301,1\n302,x\n",
         {},
         1,
         {"in.csv", "row 4", "field 'P'"}},
    };
}

class BadInput : public testing::Test {
protected:
    void SetUp() override {
        dir_ = fs::temp_directory_path() /
               ("pw-bad-input-" + std::to_string(::getpid()) + "-" +
                testing::UnitTest::GetInstance()->current_test_info()->name());
        fs::remove_all(dir_);
        fs::create_directories(dir_ / "xdg");
        // An empty user library: only the bundled substances are found.
        setenv("XDG_DATA_HOME", (dir_ / "xdg").c_str(), 1);
        fs::current_path(dir_);
    }
    void TearDown() override {
        fs::current_path(fs::temp_directory_path());
        unsetenv("XDG_DATA_HOME");
        fs::remove_all(dir_);
    }
    void write(const std::string &name, const std::string &text) const {
        std::ofstream(dir_ / name, std::ios::binary) << text;
    }
    std::string read(const std::string &name) const {
        std::ifstream in(dir_ / name, std::ios::binary);
        return {std::istreambuf_iterator<char>(in), std::istreambuf_iterator<char>()};
    }
    // The files in the test folder (the user library folder aside).
    std::set<std::string> files() const {
        std::set<std::string> names;
        for (const auto &e : fs::directory_iterator(dir_))
            if (e.path().filename() != "xdg") names.insert(e.path().filename().string());
        return names;
    }
    static Result run(const std::vector<std::string> &args) {
        std::ostringstream out, err;
        std::istringstream in;
        const int code = pw::cli::run(args, Io{out, err, in});
        return {code, out.str(), err.str()};
    }
    Result classifyFile(const std::string &content, const std::vector<std::string> &extra) {
        write("in.csv", content);
        std::vector<std::string> args{"classify", "--substance", "carbon-dioxide", "--input",
                                      "in.csv",   "--output",    "out.csv"};
        args.insert(args.end(), extra.begin(), extra.end());
        return run(args);
    }
    fs::path dir_;
};

TEST_F(BadInput, CsvCatalogue) {
    const auto cases = csvCases();
    ASSERT_GE(cases.size(), 30u);
    for (const Case &c : cases) {
        SCOPED_TRACE(c.name);
        const Result r = classifyFile(c.input, c.extra);
        EXPECT_EQ(r.code, c.code) << r.err.substr(0, 400);
        for (const auto &s : c.mustSay)
            EXPECT_NE(r.err.find(s), std::string::npos) << s << " in " << r.err.substr(0, 400);
        EXPECT_LT(r.err.size(), 2000u) << "an error message must stay readable";
        EXPECT_TRUE(r.out.empty()) << r.out.substr(0, 200);
        // No output file, no temporary file: only the input is left.
        EXPECT_EQ(files(), std::set<std::string>{"in.csv"});
    }
}

TEST_F(BadInput, FailedRunLeavesAnExistingOutputUntouched) {
    write("out.csv", "previous results\n");
    const Result r = classifyFile("T,P\n300,1\n301,1\n302,-1\n", {});
    EXPECT_EQ(r.code, kExitBadInput);
    EXPECT_NE(r.err.find("in.csv, row 4, field 'P'"), std::string::npos) << r.err;
    EXPECT_EQ(read("out.csv"), "previous results\n");
    EXPECT_EQ(files(), (std::set<std::string>{"in.csv", "out.csv"}));
}

TEST_F(BadInput, MissingInputFileIsNamed) {
    const Result r = run({"classify", "--substance", "carbon-dioxide", "--input", "absent.csv",
                          "--output", "out.csv"});
    EXPECT_EQ(r.code, kExitBadInput);
    EXPECT_NE(r.err.find("absent.csv"), std::string::npos) << r.err;
    EXPECT_TRUE(files().empty());
}

TEST_F(BadInput, OutputIntoAMissingFolderFailsCleanly) {
    write("in.csv", "T,P\n300,1\n");
    const Result r = run({"classify", "--substance", "carbon-dioxide", "--input", "in.csv",
                          "--output", "no/such/folder/out.csv"});
    EXPECT_EQ(r.code, kExitBadInput);
    EXPECT_NE(r.err.find("no/such/folder/out.csv"), std::string::npos) << r.err;
    EXPECT_EQ(files(), std::set<std::string>{"in.csv"});
}

// The three that must be *accepted*: a European logger export with a declared decimal comma,
// a byte-order mark, CRLF line ends. Values are checked, not just the exit code.
TEST_F(BadInput, DeclaredDecimalCommaIsReadCorrectly) {
    // -40,5 degC = 232.65 K, above the CO2 triple point (216.592 K); 0,1 mbar = 10 Pa is far
    // below the triple-point pressure (0.51795 MPa; Span & Wagner 1996): vapor.
    const Result r = classifyFile("T [degC];P [mbar]\r\n-40,5;0,1\r\n", {"--decimal-comma"});
    ASSERT_EQ(r.code, kExitOk) << r.err;
    const std::string out = read("out.csv");
    EXPECT_EQ(out.rfind("T [degC];P [mbar];phase;", 0), 0u) << out;
    EXPECT_NE(out.find("\n-40,5;0,1;vapor;"), std::string::npos) << out;
    // The computed margins follow the file's decimal mark: no '.' anywhere in the data row.
    const std::string row = out.substr(out.find('\n') + 1);
    EXPECT_EQ(row.find('.'), std::string::npos) << row;
    EXPECT_NE(row.find(";sublimation;"), std::string::npos) << row;
}

TEST_F(BadInput, ByteOrderMarkAndCrlfAreAccepted) {
    // 200 K is below the CO2 triple point (216.592 K) and 10 MPa far above its sublimation
    // pressure there (below the triple-point pressure 0.51795 MPa; Span & Wagner 1996): solid.
    // 250 K and 1 kPa (below the triple-point pressure): vapor.
    const Result r = classifyFile("\xEF\xBB\xBFT [K],P [MPa]\r\n200,10\r\n250,0.001\r\n", {});
    ASSERT_EQ(r.code, kExitOk) << r.err;
    const std::string out = read("out.csv");
    EXPECT_EQ(out.find("\xEF\xBB\xBF"), std::string::npos) << "the mark is not copied";
    EXPECT_NE(out.find("200,10,solid"), std::string::npos) << out;
    EXPECT_NE(out.find("250,0.001,vapor"), std::string::npos) << out;
    EXPECT_EQ(out.find('\r'), std::string::npos) << out;
}

// Options: each a usage error (exit 2) or a bad value (exit 1), never a crash or an output.
TEST_F(BadInput, CommandLineCatalogue) {
    write("in.csv", "T,P\n300,1\n");
    struct Opt {
        std::vector<std::string> args;
        int code;
        std::string mustSay;
    };
    const std::vector<Opt> cases = {
        {{"classify", "--substance", "unobtainium", "--T", "300", "--P", "1"}, 1, "unobtainium"},
        {{"classify", "--T", "300", "--P", "1"}, 2, "--substance"},
        {{"classify", "--substance", "carbon-dioxide", "--T", "300"}, 2, "--P"},
        {{"classify", "--substance", "carbon-dioxide"}, 2, "--input"},
        {{"classify", "--substance", "carbon-dioxide", "--input", "in.csv", "--T", "300"},
         2,
         "excludes"},
        {{"classify", "--substance", "carbon-dioxide", "--T", "300", "--P", "1", "--output",
          "out.csv"},
         2,
         "--output"},
        {{"classify", "--substance", "carbon-dioxide", "--T", "warm", "--P", "1"}, 2, "--T"},
        {{"classify", "--substance", "carbon-dioxide", "--T", "300", "--P", "1", "--t-unit",
          "furlong"},
         1,
         "furlong"},
        {{"classify", "--substance", "carbon-dioxide", "--T", "-5", "--P", "1"}, 1, "-5"},
        {{"classify", "--substance", "carbon-dioxide", "--T", "300", "--P", "0"}, 1, "0"},
        {{"classify", "--substance", "carbon-dioxide", "--T", "nan", "--P", "1"}, 1, "nan"},
        {{"classify", "--substance", "carbon-dioxide", "--input", "in.csv", "--on-boundary-K",
          "-1"},
         2,
         "--on-boundary-K"},
        {{"no-such-command"}, 2, "unknown command 'no-such-command'"},
        {{}, 2, "subcommand"},
        {{"validate"}, 2, "FILE"},
        {{"validate", "absent.json"}, 1, "absent.json"},
    };
    for (const Opt &c : cases) {
        std::string joined;
        for (const auto &a : c.args) joined += a + ' ';
        SCOPED_TRACE(joined);
        const Result r = run(c.args);
        EXPECT_EQ(r.code, c.code) << r.err;
        EXPECT_NE(r.err.find(c.mustSay), std::string::npos) << r.err;
        EXPECT_EQ(files(), std::set<std::string>{"in.csv"});
    }
}

// Every broken substance file of the format's test set is refused by `validate` with exit 1,
// each finding as "error: FILE: /json/path: message", and by `classify --substance FILE`.
TEST_F(BadInput, EveryBrokenSubstanceFileIsRefused) {
    const fs::path broken = fs::path(PW_SOURCE_DIR) / "tests/core/io/data/broken";
    std::vector<fs::path> all;
    for (const auto &e : fs::directory_iterator(broken)) all.push_back(e.path());
    ASSERT_GE(all.size(), 30u);
    for (const fs::path &file : all) {
        SCOPED_TRACE(file.filename().string());
        const Result v = run({"validate", file.string()});
        EXPECT_EQ(v.code, kExitBadInput) << v.err;
        EXPECT_NE(v.err.find("error: " + file.string() + ": "), std::string::npos) << v.err;
        EXPECT_NE(v.err.find("invalid"), std::string::npos) << v.err;
        EXPECT_TRUE(v.out.empty()) << v.out;
        const Result c = run({"classify", "--substance", file.string(), "--T", "300", "--P", "1"});
        EXPECT_EQ(c.code, kExitBadInput) << c.err;
        EXPECT_NE(c.err.find(file.filename().string()), std::string::npos) << c.err;
        EXPECT_TRUE(c.out.empty()) << c.out;
        EXPECT_TRUE(files().empty());
    }
}

// Run logs (core/run/run_log.h) read from a file: the error is an InputError that carries the
// file, the row and the column.
TEST_F(BadInput, RunLogCatalogue) {
    struct Log {
        std::string name, text;
        long row;
        std::string field, mustSay;
    };
    const std::vector<Log> cases = {
        {"header_only", "time [s],T [K],P [Pa]\n", 2, "", "no data rows"},
        {"time_backwards", "time [s],T [K],P [Pa]\n10,300,1\n5,300,1\n", 3, "time [s]",
         "backwards"},
        {"bad_timestamp", "timestamp,T [K],P [Pa]\n2026-03-14T08:00:00Z,300,1\nlater,300,1\n", 3,
         "timestamp", "later"},
        {"negative_kelvin", "time,T [K],P [Pa]\n0,-1,1\n", 2, "T [K]", "absolute zero"},
        {"zero_pressure", "time,T [K],P [mTorr]\n0,250,0\n", 2, "P [mTorr]", "0 Pa"},
        {"gauge_below_vacuum", "time,T [degC],P [barg]\n0,20,-1.5\n", 2, "P [barg]", "0 Pa"},
        {"unknown_unit", "time,T [K],P [parsec]\n0,250,1\n", 1, "P [parsec]", "parsec"},
        {"nan_cell", "time,T [K],P [Pa]\n0,nan,1\n", 2, "T [K]", "finite"},
    };
    for (const Log &c : cases) {
        SCOPED_TRACE(c.name);
        write("run.csv", c.text);
        try {
            (void)run::readRunLogFile((dir_ / "run.csv").string());
            ADD_FAILURE() << "accepted";
        } catch (const InputError &e) {
            EXPECT_NE(e.file().find("run.csv"), std::string::npos) << e.what();
            EXPECT_EQ(e.row(), c.row) << e.what();
            EXPECT_EQ(e.field(), c.field) << e.what();
            EXPECT_NE(std::string(e.what()).find(c.mustSay), std::string::npos) << e.what();
        }
    }
}

}  // namespace
}  // namespace pw::cli
