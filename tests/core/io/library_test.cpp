// SubstanceLibrary: bundled files, the user folder, duplicate ids and look-up.
// The user-folder files are invented test substances (TEST DATA, NOT PHYSICS).
#include <gtest/gtest.h>

#include <cstdlib>
#include <filesystem>
#include <fstream>

#include "core/errors.h"
#include "core/library.h"

namespace pw {
namespace {

namespace fs = std::filesystem;

std::string dataPath(const std::string &name) {
    return std::string(PW_SOURCE_DIR) + "/tests/core/io/data/" + name;
}

class UserFolder : public testing::Test {
protected:
    void SetUp() override {
        dir_ = fs::temp_directory_path() /
               ("pw-library-test-" + std::to_string(::getpid()) + "-" +
                testing::UnitTest::GetInstance()->current_test_info()->name());
        fs::remove_all(dir_);
        fs::create_directories(dir_);
    }
    void TearDown() override { fs::remove_all(dir_); }
    void copy(const std::string &from, const std::string &to) {
        fs::copy_file(dataPath(from), dir_ / to);
    }
    fs::path dir_;
};

bool hasIssue(const SubstanceLibrary &lib, const std::string &fragment) {
    for (const auto &i : lib.issues())
        if (i.text().find(fragment) != std::string::npos) return true;
    return false;
}

std::string issues(const SubstanceLibrary &lib) {
    std::string s;
    for (const auto &i : lib.issues()) s += i.text() + "\n";
    return s;
}

TEST(Library, EveryBundledFileLoadsWithoutErrors) {
    const auto lib = SubstanceLibrary::bundled();
    for (const auto &i : lib.issues()) EXPECT_NE(i.severity, Severity::Error) << i.text();
    EXPECT_GE(lib.all().size(), 1u);
    for (const auto &d : lib.all()) EXPECT_EQ(d->substance().origin.rfind("bundled:", 0), 0u);
}

TEST_F(UserFolder, UserFilesAreAddedInNameOrder) {
    copy("testium.json", "b.json");
    copy("test-units.json", "a.json");
    const auto lib = SubstanceLibrary::withUserFolder(dir_.string());
    const auto bundledCount = SubstanceLibrary::bundled().all().size();
    ASSERT_EQ(lib.all().size(), bundledCount + 2) << issues(lib);
    EXPECT_EQ(lib.all()[bundledCount]->substance().id, "test-units");
    EXPECT_EQ(lib.all()[bundledCount + 1]->substance().id, "testium");
}

TEST_F(UserFolder, DuplicateIdIsRefusedNamingBothFiles) {
    copy("testium.json", "a.json");
    copy("testium.json", "b.json");
    const auto lib = SubstanceLibrary::withUserFolder(dir_.string());
    const std::string a = (dir_ / "a.json").string();
    const std::string b = (dir_ / "b.json").string();
    EXPECT_TRUE(hasIssue(lib, b + ": /id: duplicate id 'testium': already loaded from " + a))
        << issues(lib);
    EXPECT_EQ(lib.find("testium")->substance().origin, a);
}

TEST_F(UserFolder, UserFileNeverReplacesABundledSubstance) {
    const auto bundled = SubstanceLibrary::bundled();
    if (bundled.all().empty()) GTEST_SKIP() << "no bundled substances yet";
    const std::string id = bundled.all()[0]->substance().id;
    std::ifstream in(dataPath("testium.json"));
    std::string text((std::istreambuf_iterator<char>(in)), std::istreambuf_iterator<char>());
    text.replace(text.find("\"testium\""), 9, "\"" + id + "\"");
    std::ofstream(dir_ / "mine.json") << text;
    const auto lib = SubstanceLibrary::withUserFolder(dir_.string());
    EXPECT_TRUE(hasIssue(lib, "duplicate id '" + id + "': already loaded from bundled:"))
        << issues(lib);
    EXPECT_EQ(lib.find(id)->substance().origin.rfind("bundled:", 0), 0u);
}

TEST_F(UserFolder, BrokenUserFileIsSkippedAndTheOthersLoad) {
    copy("broken/bad-cas.json", "bad.json");
    copy("testium.json", "good.json");
    const auto lib = SubstanceLibrary::withUserFolder(dir_.string());
    EXPECT_TRUE(hasIssue(lib, "bad.json: /cas: ")) << issues(lib);
    EXPECT_NO_THROW(lib.find("testium"));
}

TEST_F(UserFolder, MissingFolderGivesTheBundledLibrary) {
    const auto lib = SubstanceLibrary::withUserFolder((dir_ / "absent").string());
    EXPECT_EQ(lib.all().size(), SubstanceLibrary::bundled().all().size());
}

TEST_F(UserFolder, FindByIdAliasFormulaNameAndPathIgnoringCase) {
    copy("testium.json", "t.json");
    const auto lib = SubstanceLibrary::withUserFolder(dir_.string());
    for (const char *key : {"testium", "TESTIUM", " tst ", "ts2", "Test Substance",
                            "testium (invented test substance)"})
        EXPECT_EQ(lib.find(key)->substance().id, "testium") << key;
    EXPECT_EQ(lib.find(dataPath("test-units.json"))->substance().id, "test-units");
}

TEST_F(UserFolder, UnknownKeySuggestsCloseMatches) {
    copy("testium.json", "t.json");
    const auto lib = SubstanceLibrary::withUserFolder(dir_.string());
    try {
        lib.find("testum");
        FAIL() << "expected an error";
    } catch (const Error &e) {
        EXPECT_NE(std::string(e.what()).find("no substance matches 'testum'"), std::string::npos);
        EXPECT_NE(std::string(e.what()).find("did you mean: testium"), std::string::npos)
            << e.what();
    }
}

TEST(Library, BrokenFileGivenAsPathIsRefusedWithItsFindings) {
    const auto lib = SubstanceLibrary::bundled();
    try {
        lib.find(dataPath("broken/bad-cas.json"));
        FAIL() << "expected an error";
    } catch (const Error &e) {
        EXPECT_NE(std::string(e.what()).find("/cas: '7732-18-4' fails the CAS check digit"),
                  std::string::npos)
            << e.what();
    }
}

// Formulas shared by isomers (diethyl ether and tert-butanol are both C4H10O) must not pick
// one silently.
TEST_F(UserFolder, AKeyMatchingSeveralSubstancesIsRefusedNamingThem) {
    copy("testium.json", "t.json");
    std::ifstream in(dataPath("test-units.json"));
    std::string text((std::istreambuf_iterator<char>(in)), std::istreambuf_iterator<char>());
    text.insert(text.find("\"sources\""), "\"formula\": \"Ts2\",\n  ");
    std::ofstream(dir_ / "u.json") << text;
    const auto lib = SubstanceLibrary::withUserFolder(dir_.string());
    try {
        lib.find("TS2");
        FAIL() << "expected an error";
    } catch (const Error &e) {
        EXPECT_NE(std::string(e.what()).find("matches several substances (testium, test-units)"),
                  std::string::npos)
            << e.what();
    }
    EXPECT_EQ(lib.find("testium")->substance().id, "testium");  // the id stays unambiguous
}

TEST(Library, DefaultUserFolderFollowsXdgDataHome) {
    const char *old = std::getenv("XDG_DATA_HOME");
    const std::string saved = old ? old : "";
    setenv("XDG_DATA_HOME", "/tmp/xdg-test", 1);
    EXPECT_EQ(SubstanceLibrary::defaultUserFolder(), "/tmp/xdg-test/phasewright/substances");
    // XDG Base Directory spec: a relative path is invalid and ignored.
    setenv("XDG_DATA_HOME", "relative", 1);
    const std::string home = std::getenv("HOME") ? std::getenv("HOME") : "";
    if (!home.empty()) {
        EXPECT_EQ(SubstanceLibrary::defaultUserFolder(),
                  home + "/.local/share/phasewright/substances");
    }
    if (old)
        setenv("XDG_DATA_HOME", saved.c_str(), 1);
    else
        unsetenv("XDG_DATA_HOME");
}

}  // namespace
}  // namespace pw
