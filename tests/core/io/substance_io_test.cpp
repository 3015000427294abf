// Reading and validating substance files (docs/substance-format.md). The files in data/ are
// invented test substances: TEST DATA, NOT PHYSICS. Expected values are the file's own
// numbers after unit conversion (unit definitions: 1 bar = 1e5 Pa, 1 kPa = 1e3 Pa, T/K =
// t/degC + 273.15, all exact by definition, SI Brochure 9th ed.).
#include <gtest/gtest.h>

#include <algorithm>
#include <fstream>
#include <sstream>
#include <string>

#include "core/substance_io.h"

namespace pw {
namespace {

std::string dataPath(const std::string &name) {
    return std::string(PW_SOURCE_DIR) + "/tests/core/io/data/" + name;
}

std::string allIssues(const SubstanceReadResult &r) {
    std::string s;
    for (const auto &i : r.issues) s += i.text() + "\n";
    return s;
}

bool hasIssue(const SubstanceReadResult &r, Severity severity, const std::string &path,
              const std::string &fragment) {
    return std::any_of(r.issues.begin(), r.issues.end(), [&](const ValidationIssue &i) {
        return i.severity == severity && i.jsonPath == path &&
               i.message.find(fragment) != std::string::npos;
    });
}

TEST(SubstanceRead, ValidTestFileLoadsWithItsValues) {
    const auto r = readSubstanceFile(dataPath("testium.json"));
    ASSERT_TRUE(r.substance) << allIssues(r);
    EXPECT_TRUE(r.issues.empty()) << allIssues(r);
    const Substance &s = *r.substance;
    EXPECT_EQ(s.id, "testium");
    EXPECT_EQ(s.formula, "Ts2");
    EXPECT_EQ(s.cas, "7732-18-5");
    EXPECT_EQ(s.aliases, (std::vector<std::string>{"TST", "test substance"}));
    EXPECT_DOUBLE_EQ(s.molarMass_g_mol, 50.0);
    ASSERT_EQ(s.triplePoints.size(), 1u);
    EXPECT_DOUBLE_EQ(s.triplePoints[0].T_K, 200.0);
    EXPECT_DOUBLE_EQ(s.triplePoints[0].P_Pa, 1000.0);
    EXPECT_EQ(s.triplePoints[0].source.authors, "Phasewright test suite");
    ASSERT_TRUE(s.critical);
    EXPECT_NEAR(s.critical->P_Pa, 408960.1637877032, 1e-6);  // 408.96... kPa in the file
    EXPECT_DOUBLE_EQ(s.dHfusTriple_J_mol, 5000.0);
    EXPECT_DOUBLE_EQ(s.dVfusTriple_m3_mol, 2e-6);
    ASSERT_EQ(s.boundaries.size(), 3u);
    EXPECT_EQ(s.boundaries[0].kind, BoundaryKind::Vaporization);
    EXPECT_EQ(s.boundaries[0].spec.pUnit, PressureUnit::kPa);
    EXPECT_DOUBLE_EQ(s.boundaries[0].uncertaintyRel, 0.01);
    EXPECT_EQ(s.boundaries[1].validity.min_K, 150.0);
    ASSERT_TRUE(s.boundaries[0].model);
    // The vaporization curve meets the triple point: P_ref = 1 kPa at T_ref = 200 K.
    EXPECT_NEAR(s.boundaries[0].model->pressure(200.0), 1000.0, 1e-9);
    EXPECT_EQ(s.hazards.size(), 1u);
    EXPECT_EQ(s.origin, dataPath("testium.json"));
}

TEST(SubstanceRead, UnitsOfFixedPointsAndValidityAreConverted) {
    const auto r = readSubstanceFile(dataPath("test-units.json"));
    ASSERT_TRUE(r.substance) << allIssues(r);
    const Substance &s = *r.substance;
    EXPECT_NEAR(s.triplePoints[0].T_K, 200.0, 1e-12);            // -73.15 degC
    EXPECT_NEAR(s.triplePoints[0].P_Pa, 1000.0, 1e-9);           // 0.01 bar
    EXPECT_NEAR(s.boundaries[0].validity.min_K, 193.15, 1e-12);  // -80 degC
    EXPECT_NEAR(s.boundaries[0].validity.max_K, 373.15, 1e-12);  // 100 degC
    EXPECT_EQ(s.boundaries[0].spec.tUnit, TemperatureUnit::Celsius);
    EXPECT_EQ(s.boundaries[1].spec.flags.at("log"), false);
}

TEST(SubstanceRead, FileWithOnlyAVaporPressureCurveIsAccepted) {
    const auto r = readSubstanceFile(dataPath("test-vapor-only.json"));
    ASSERT_TRUE(r.substance) << allIssues(r);
    EXPECT_TRUE(r.substance->triplePoints.empty());
    EXPECT_EQ(r.substance->boundaries[0].spec.strings.at("exponent_set"), "1-1.5-3-6");
}

TEST(SubstanceRead, SmallTriplePointMismatchIsAWarningAndTheFileIsKept) {
    // P_t = 1005 Pa against curves through 1000 Pa: 0.5 %, between 0.1 % and 2 %.
    const auto r = readSubstanceFile(dataPath("testium-triple-warning.json"));
    ASSERT_TRUE(r.substance) << allIssues(r);
    EXPECT_TRUE(hasIssue(r, Severity::Warning, "/triple_points/0", "off the vaporization curve"))
        << allIssues(r);
    EXPECT_TRUE(hasIssue(r, Severity::Warning, "/triple_points/0", "off the sublimation curve"))
        << allIssues(r);
}

TEST(SubstanceRead, UnknownKeyIsAWarning) {
    std::ifstream in(dataPath("testium.json"));
    std::stringstream text;
    text << in.rdbuf();
    std::string json = text.str();
    json.insert(json.find("\"notes\""), "\"colour\": \"blue\",\n  ");
    const auto r = readSubstance(json, "inline.json");
    ASSERT_TRUE(r.substance) << allIssues(r);
    EXPECT_TRUE(hasIssue(r, Severity::Warning, "/colour", "unknown key 'colour'"));
}

struct BrokenCase {
    const char *file;
    const char *path;
    const char *fragment;
};

class BrokenFile : public testing::TestWithParam<BrokenCase> {};

TEST_P(BrokenFile, IsRefusedWithItsSpecificMessage) {
    const BrokenCase c = GetParam();
    const std::string file = dataPath(std::string("broken/") + c.file);
    const auto r = readSubstanceFile(file);
    EXPECT_FALSE(r.substance);
    EXPECT_TRUE(hasIssue(r, Severity::Error, c.path, c.fragment))
        << "expected at '" << c.path << "': " << c.fragment << "\ngot:\n"
        << allIssues(r);
    for (const auto &i : r.issues) EXPECT_EQ(i.file, file);
}

INSTANTIATE_TEST_SUITE_P(
    Catalogue, BrokenFile,
    testing::Values(
        BrokenCase{"malformed.json", "",
                   "malformed JSON at line 4, column 6: syntax error while parsing object"},
        BrokenCase{"empty.json", "", "malformed JSON at line 1, column 1"},
        BrokenCase{"binary-junk.json", "", "malformed JSON at line 1"},
        BrokenCase{"nul-in-string.json", "", "malformed JSON"},
        BrokenCase{"invalid-utf8.json", "", "malformed JSON"},
        BrokenCase{"nan-literal.json", "", "malformed JSON"},
        BrokenCase{"overflow-1e400.json", "", "'1e400' does not fit a double"},
        BrokenCase{"deep-nesting.json", "", "nesting too deep at line 1, column 74"},
        BrokenCase{"deep-nesting-unbalanced.json", "", "more than 64 levels"},
        BrokenCase{"top-level-array.json", "", "expected a JSON object at the top level"},
        BrokenCase{"wrong-format.json", "/format", "expected \"phasewright-substance\""},
        BrokenCase{"wrong-version.json", "/version", "format version 2 is not supported"},
        BrokenCase{"missing-id.json", "/id", "missing required key 'id'"},
        BrokenCase{"wrong-type.json", "/molar_mass_g_mol", "expected a number, found a string"},
        BrokenCase{"bad-id.json", "/id", "'Test_ium' is not a valid id"},
        BrokenCase{"bad-cas.json", "/cas", "fails the CAS check digit"},
        BrokenCase{"bad-cas-form.json", "/cas", "expected the form NNNNNNN-NN-N"},
        BrokenCase{"bad-year.json", "/sources/invented/year", "26 is not a plausible year"},
        BrokenCase{"huge-temperature.json", "/triple_points/0/T", "is not plausible"},
        BrokenCase{"unknown-unit.json", "/boundaries/0/units/P", "unknown pressure unit 'kPascal'"},
        BrokenCase{"unknown-model.json", "/boundaries/0/model",
                   "unknown model 'clausius-clapeyronn'; expected one of: wagner"},
        BrokenCase{"unknown-kind.json", "/boundaries/0/kind", "unknown kind 'evaporation'"},
        BrokenCase{"unknown-parameter.json", "/boundaries/0/parameters/dS",
                   "unknown parameter 'dS' for model 'clausius-clapeyron'"},
        BrokenCase{"missing-parameter.json", "/boundaries/0/parameters/P_ref",
                   "missing parameter 'P_ref'"},
        BrokenCase{"unequal-arrays.json", "/boundaries/2/parameters/exponents",
                   "has 2 entries but 'a' has 3"},
        BrokenCase{"empty-array.json", "/boundaries/2/parameters/a", "found an empty array"},
        BrokenCase{"missing-validity.json", "/boundaries/0/validity",
                   "missing required key 'validity'"},
        BrokenCase{"inverted-range.json", "/boundaries/1/validity", "inverted or empty range"},
        BrokenCase{"zero-range.json", "/boundaries/1/validity/T_min", "expected T_min above 0 K"},
        BrokenCase{"unknown-source.json", "/boundaries/1/source",
                   "unknown source key 'invented-2'"},
        BrokenCase{"triple-off.json", "/triple_points/0", "off the vaporization curve"},
        BrokenCase{"critical-off.json", "/critical_point", "off the vaporization curve"},
        BrokenCase{"non-monotonic.json", "/boundaries/0", "is not monotonic"},
        BrokenCase{"nan-curve.json", "/boundaries/0", "inside its validity range"}),
    [](const testing::TestParamInfo<BrokenCase> &param) {
        std::string name = param.param.file;
        name = name.substr(0, name.find('.'));
        std::replace(name.begin(), name.end(), '-', '_');
        return name;
    });

TEST(SubstanceRead, FileOverFourMebibytesIsRefusedUnread) {
    const std::string text(4u * 1024u * 1024u + 1u, ' ');
    const auto r = readSubstance(text, "big.json");
    EXPECT_FALSE(r.substance);
    EXPECT_TRUE(hasIssue(r, Severity::Error, "", "file too large: 4194305 bytes")) << allIssues(r);
}

TEST(SubstanceRead, MissingFileIsReportedByName) {
    const auto r = readSubstanceFile(dataPath("no-such-file.json"));
    EXPECT_FALSE(r.substance);
    ASSERT_FALSE(r.issues.empty());
    EXPECT_NE(r.issues[0].text().find("no-such-file.json"), std::string::npos);
    EXPECT_NE(r.issues[0].message.find("does not exist"), std::string::npos);
}

TEST(SubstanceRead, IssueTextNamesFilePathAndMessage) {
    const auto r = readSubstanceFile(dataPath("broken/bad-cas.json"));
    ASSERT_FALSE(r.issues.empty());
    EXPECT_EQ(r.issues[0].text(), dataPath("broken/bad-cas.json") +
                                      ": /cas: '7732-18-4' fails the CAS check digit; check the "
                                      "number");
}

// Truncations and byte flips of a valid file: never a crash, and a refused file always says
// why (hostile-input catalogue, issue 4).
TEST(SubstanceRead, MutatedFilesNeverCrashAndRefusalsCarryAnError) {
    std::ifstream in(dataPath("testium.json"));
    std::stringstream text;
    text << in.rdbuf();
    const std::string good = text.str();
    unsigned state = 12345u;
    int refused = 0;
    for (int round = 0; round < 400; ++round) {
        std::string t = good;
        state = state * 1103515245u + 12345u;
        const std::size_t at = (state >> 8) % t.size();
        if (round % 2 == 0)
            t.resize(at);
        else
            t[at] = static_cast<char>((state >> 16) & 0xff);
        const auto r = readSubstance(t, "mutated.json");
        if (!r.substance) {
            ++refused;
            EXPECT_TRUE(std::any_of(r.issues.begin(), r.issues.end(),
                                    [](const auto &i) { return i.severity == Severity::Error; }));
        }
    }
    EXPECT_GE(refused, 200);  // every truncation is refused
}

}  // namespace
}  // namespace pw
