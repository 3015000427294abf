// Writing a fit into a substance file: new file, merge, provenance, atomic write, nothing
// written on error.
#include <gtest/gtest.h>

#include <cmath>
#include <filesystem>
#include <fstream>

#include "core/errors.h"
#include "core/fit/fit_output.h"
#include "core/phase_diagram.h"
#include "core/substance_io.h"
#include "tests/core/fit/fit_test_util.h"

namespace pw::fit {
namespace {

namespace fs = std::filesystem;

// Span & Wagner (1996) eq. (3.13), as in fit_recovery_test.cpp.
double pCO2(double T) {
    return test::wagner(T, 304.1282, 7.3773e6, {-7.0602087, 1.9391218, -1.6463597, -3.2995634},
                        {1.0, 1.5, 2.0, 4.0});
}

class FitOutput : public ::testing::Test {
protected:
    void SetUp() override {
        dir_ = fs::path(PW_BINARY_DIR) / "fit_output_test" /
               ::testing::UnitTest::GetInstance()->current_test_info()->name();
        fs::remove_all(dir_);
        fs::create_directories(dir_);
        request_.model = "wagner";
        request_.Tc_K = 304.1282;
        request_.Pc_Pa = 7.3773e6;
        result_ = fitBoundary(test::sample(pCO2, 220.0, 300.0, 20, 1e-3), request_);
    }
    fs::path dir_;
    FitRequest request_;
    FitResult result_;
    FitProvenance provenance_{"/lab/runs/co2 vp.csv", "2026-12-02"};
};

TEST_F(FitOutput, NewSubstanceRoundTripsAndRecordsTheSource) {
    const auto s = substanceFromFit(result_, request_, "My CO2 sample", provenance_);
    EXPECT_EQ(s.id, "my-co2-sample");
    const auto path = (dir_ / "co2.json").string();
    writeSubstanceChecked(s, path);
    const auto back = readSubstanceFile(path);
    ASSERT_TRUE(back.substance.has_value()) << (back.issues.empty() ? "" : back.issues[0].text());
    const auto &b = back.substance->boundaries.at(0);
    EXPECT_EQ(b.spec.form, "wagner");
    EXPECT_DOUBLE_EQ(b.validity.min_K, 220.0);
    EXPECT_DOUBLE_EQ(b.validity.max_K, 300.0);
    ASSERT_TRUE(b.model);
    EXPECT_NEAR(b.model->pressure(260.0) / result_.pressure(260.0), 1.0, 1e-12);
    const auto &src = back.substance->sources.at(b.sourceKey);
    EXPECT_EQ(b.sourceKey, "fit-co2-vp-2026-12-02");
    EXPECT_NE(src.authors.find("co2 vp.csv"), std::string::npos);
    EXPECT_NE(src.title.find("2026-12-02"), std::string::npos);
    EXPECT_EQ(src.note.rfind("fitted by phasewright-cli fit", 0), 0u);
    EXPECT_EQ(src.year, 2026);
    ASSERT_TRUE(back.substance->critical.has_value());
    EXPECT_DOUBLE_EQ(back.substance->critical->T_K, 304.1282);
    // Usable as a phase diagram (what --substance FILE.json does in every command).
    PhaseDiagram diagram(*back.substance);
    ASSERT_NE(diagram.vaporization(), nullptr);
    // Span & Wagner (1996): about 5.73 MPa at 293.15 K; the fit is to 0.1 % noisy data.
    EXPECT_NEAR(diagram.vaporization()->model->pressure(293.15) / pCO2(293.15), 1.0, 2e-3);
}

TEST_F(FitOutput, MergeAddsThenReplacesTheSameKind) {
    auto s = substanceFromFit(result_, request_, "co2", provenance_);
    FitRequest sub;
    sub.kind = BoundaryKind::Sublimation;
    sub.model = "clausius-clapeyron";
    const auto subFit = fitBoundary(
        test::sample([](double T) { return std::exp(22.0 - 3200.0 / T); }, 180.0, 215.0, 8), sub);
    EXPECT_NE(mergeFit(s, subFit, {"sub.csv", "2026-12-02"}).find("added a sublimation"),
              std::string::npos);
    ASSERT_EQ(s.boundaries.size(), 2u);
    const auto what = mergeFit(s, result_, provenance_);
    EXPECT_NE(what.find("replaced the vaporization boundary"), std::string::npos) << what;
    ASSERT_EQ(s.boundaries.size(), 2u);
    // Both fits of the same file on the same day keep their own source entries.
    EXPECT_EQ(s.boundaries[0].sourceKey, "fit-co2-vp-2026-12-02-2");
    EXPECT_EQ(s.sources.count("fit-co2-vp-2026-12-02"), 1u);
    const auto path = (dir_ / "merged.json").string();
    writeSubstanceChecked(s, path);
    EXPECT_TRUE(readSubstanceFile(path).substance.has_value());
}

TEST_F(FitOutput, InvalidSubstanceWritesNothing) {
    auto s = substanceFromFit(result_, request_, "co2", provenance_);
    s.boundaries[0].validity = {300.0, 250.0};  // T_min above T_max: refused on read-back
    const auto path = dir_ / "bad.json";
    EXPECT_THROW(writeSubstanceChecked(s, path.string()), Error);
    EXPECT_FALSE(fs::exists(path));
    EXPECT_TRUE(fs::is_empty(dir_));  // no temporary file left behind
}

TEST_F(FitOutput, AtomicWriteReplacesWholeOrNothing) {
    const auto path = (dir_ / "f.json").string();
    writeFileAtomically(path, "old");
    writeFileAtomically(path, "new content");
    std::ifstream in(path);
    std::string text((std::istreambuf_iterator<char>(in)), {});
    EXPECT_EQ(text, "new content");
    EXPECT_THROW(writeFileAtomically((dir_ / "missing" / "f.json").string(), "x"), Error);
    EXPECT_EQ(std::distance(fs::directory_iterator(dir_), fs::directory_iterator()), 1);
}

TEST_F(FitOutput, SubstanceIdFromName) {
    EXPECT_EQ(substanceId("  tert-Butanol (lab 3) "), "tert-butanol-lab-3");
    EXPECT_THROW(substanceId("!!!"), Error);
}

TEST_F(FitOutput, ReportJsonHasStatisticsAndNullForMissing) {
    const auto text = fitReportJson(result_);
    EXPECT_NE(text.find("\"rms_dev_pct\""), std::string::npos);
    EXPECT_NE(text.find("\"covariance\""), std::string::npos);
    EXPECT_NE(text.find("\"model\": \"wagner\""), std::string::npos);
}

}  // namespace
}  // namespace pw::fit
