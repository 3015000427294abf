// writeSubstance(): read -> write -> read gives equal data, and the written text matches a
// reviewed golden file. Test data are invented (TEST DATA, NOT PHYSICS).
#include <gtest/gtest.h>

#include <cstdlib>
#include <fstream>
#include <sstream>

#include "core/substance_io.h"
#include "resources/bundled.h"

namespace pw {
namespace {

std::string dataPath(const std::string &name) {
    return std::string(PW_SOURCE_DIR) + "/tests/core/io/data/" + name;
}

std::string slurp(const std::string &path) {
    std::ifstream in(path, std::ios::binary);
    std::stringstream s;
    s << in.rdbuf();
    return s.str();
}

void expectSameCitation(const Citation &a, const Citation &b) {
    EXPECT_EQ(a.authors, b.authors);
    EXPECT_EQ(a.year, b.year);
    EXPECT_EQ(a.title, b.title);
    EXPECT_EQ(a.publication, b.publication);
    EXPECT_EQ(a.note, b.note);
}

void expectSamePoint(const FixedPoint &a, const FixedPoint &b) {
    EXPECT_EQ(a.T_K, b.T_K);  // exact: full precision is written
    EXPECT_EQ(a.P_Pa, b.P_Pa);
    EXPECT_EQ(a.phases, b.phases);
    EXPECT_EQ(a.sourceKey, b.sourceKey);
}

void expectSameBoundary(const Boundary &a, const Boundary &b) {
    EXPECT_EQ(a.kind, b.kind);
    EXPECT_EQ(a.solidForm, b.solidForm);
    EXPECT_EQ(a.spec.form, b.spec.form);
    EXPECT_EQ(a.spec.scalars, b.spec.scalars);
    EXPECT_EQ(a.spec.arrays, b.spec.arrays);
    EXPECT_EQ(a.spec.strings, b.spec.strings);
    EXPECT_EQ(a.spec.flags, b.spec.flags);
    EXPECT_EQ(a.spec.tUnit, b.spec.tUnit);
    EXPECT_EQ(a.spec.pUnit, b.spec.pUnit);
    EXPECT_EQ(a.validity.min_K, b.validity.min_K);
    EXPECT_EQ(a.validity.max_K, b.validity.max_K);
    if (std::isnan(a.uncertaintyRel)) {
        EXPECT_TRUE(std::isnan(b.uncertaintyRel));
    } else {
        EXPECT_EQ(a.uncertaintyRel, b.uncertaintyRel);
    }
    EXPECT_EQ(a.sourceKey, b.sourceKey);
    EXPECT_EQ(a.note, b.note);
}

void expectSame(const Substance &a, const Substance &b) {
    EXPECT_EQ(a.id, b.id);
    EXPECT_EQ(a.name, b.name);
    EXPECT_EQ(a.formula, b.formula);
    EXPECT_EQ(a.cas, b.cas);
    EXPECT_EQ(a.aliases, b.aliases);
    EXPECT_EQ(std::isnan(a.molarMass_g_mol), std::isnan(b.molarMass_g_mol));
    if (!std::isnan(a.molarMass_g_mol)) {
        EXPECT_EQ(a.molarMass_g_mol, b.molarMass_g_mol);
    }
    if (!std::isnan(a.acentricFactor)) {
        EXPECT_EQ(a.acentricFactor, b.acentricFactor);
    }
    ASSERT_EQ(a.triplePoints.size(), b.triplePoints.size());
    for (std::size_t i = 0; i < a.triplePoints.size(); ++i)
        expectSamePoint(a.triplePoints[i], b.triplePoints[i]);
    ASSERT_EQ(a.critical.has_value(), b.critical.has_value());
    if (a.critical) expectSamePoint(*a.critical, *b.critical);
    ASSERT_EQ(a.boundaries.size(), b.boundaries.size());
    for (std::size_t i = 0; i < a.boundaries.size(); ++i)
        expectSameBoundary(a.boundaries[i], b.boundaries[i]);
    if (!std::isnan(a.dHfusTriple_J_mol)) {
        EXPECT_EQ(a.dHfusTriple_J_mol, b.dHfusTriple_J_mol);
    }
    if (!std::isnan(a.dVfusTriple_m3_mol)) {
        EXPECT_EQ(a.dVfusTriple_m3_mol, b.dVfusTriple_m3_mol);
    }
    EXPECT_EQ(a.fusionSourceKey, b.fusionSourceKey);
    ASSERT_EQ(a.sources.size(), b.sources.size());
    for (const auto &[key, c] : a.sources) expectSameCitation(c, b.sources.at(key));
    EXPECT_EQ(a.hazards, b.hazards);
    EXPECT_EQ(a.notes, b.notes);
}

Substance roundTrip(const Substance &s) {
    const auto again = readSubstance(writeSubstance(s), "written.json");
    for (const auto &i : again.issues)
        if (i.severity == Severity::Error) ADD_FAILURE() << i.text();
    return again.substance.value_or(Substance{});
}

class RoundTrip : public testing::TestWithParam<const char *> {};

TEST_P(RoundTrip, ReadWriteReadGivesEqualData) {
    const auto first = readSubstanceFile(dataPath(GetParam()));
    ASSERT_TRUE(first.substance);
    const Substance second = roundTrip(*first.substance);
    expectSame(*first.substance, second);
    // Writing is stable: the second write is the same text as the first.
    EXPECT_EQ(writeSubstance(*first.substance), writeSubstance(second));
}

INSTANTIATE_TEST_SUITE_P(TestFiles, RoundTrip,
                         testing::Values("testium.json", "test-units.json",
                                         "test-vapor-only.json"));

TEST(RoundTrip, EveryBundledSubstanceSurvivesAWriteAndRead) {
    int count = 0;
    for (const auto &file : bundled::files()) {
        if (!file.path.starts_with("substances/")) continue;
        const auto first = readSubstance(file.content, std::string(file.path));
        if (!first.substance) continue;  // refusals are reported by the library tests
        SCOPED_TRACE(std::string(file.path));
        expectSame(*first.substance, roundTrip(*first.substance));
        ++count;
    }
    EXPECT_GT(count, 0);
}

// Golden file: the written form of testium.json, reviewed by hand. Regenerate with
// PW_UPDATE_GOLDEN=1 after a deliberate format change, and review the diff.
TEST(WriteSubstance, MatchesTheGoldenFile) {
    const auto r = readSubstanceFile(dataPath("testium.json"));
    ASSERT_TRUE(r.substance);
    const std::string written = writeSubstance(*r.substance);
    const std::string golden = dataPath("testium.golden.json");
    if (std::getenv("PW_UPDATE_GOLDEN") != nullptr) std::ofstream(golden) << written;
    EXPECT_EQ(written, slurp(golden));
}

TEST(WriteSubstance, KeepsFullPrecision) {
    auto r = readSubstanceFile(dataPath("testium.json"));
    ASSERT_TRUE(r.substance);
    r.substance->boundaries[0].spec.scalars["dH_J_mol"] = 20000.000000000004;  // 1 ulp above
    const Substance back = roundTrip(*r.substance);
    EXPECT_EQ(back.boundaries.at(0).spec.scalars.at("dH_J_mol"), 20000.000000000004);
}

}  // namespace
}  // namespace pw
