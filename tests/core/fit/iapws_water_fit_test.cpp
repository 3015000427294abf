// Acceptance check: Antoine and Wagner fitted to 33 water saturation points computed by
// python3-iapws (IAPWS-95, IAPWS R6-95(2018)) over 280-600 K; the maximum deviations are
// reported (stdout and the test's XML properties) and bounded.
#include <gtest/gtest.h>

#include <cstdio>
#include <iostream>
#include <memory>
#include <sstream>

#include "core/fit/fit.h"

namespace pw::fit {
namespace {

// The reference data: the script's output, read by the fit's CSV reader, or why it failed.
struct Reference {
    FitData data;
    std::string error;
};

// Runs the reference script with Debian's python3 (which has python3-iapws).
Reference runReferenceScript() {
    const std::string cmd = std::string("/usr/bin/python3 ") + PW_SOURCE_DIR +
                            "/tests/core/fit/data/iapws95_water_saturation.py";
    std::unique_ptr<FILE, int (*)(FILE *)> pipe(::popen(cmd.c_str(), "r"), ::pclose);
    if (!pipe) return {{}, "cannot run " + cmd};
    std::string text;
    char buf[4096];
    while (const auto n = std::fread(buf, 1, sizeof buf, pipe.get())) text.append(buf, n);
    try {
        std::istringstream in(text);
        return {readFitCsv(in, "iapws95_water_saturation.py output"), ""};
    } catch (const std::exception &e) {
        return {{}, cmd + " gave no usable data (is python3-iapws installed?): " + e.what()};
    }
}

// Computed once for the three tests (the script takes a few seconds).
const Reference &reference() {
    static const Reference ref = runReferenceScript();
    return ref;
}

class Iapws95WaterFit : public ::testing::Test {
protected:
    void SetUp() override {
        ASSERT_TRUE(reference().error.empty()) << reference().error;
        data_ = &reference().data;
    }
    const FitData *data_ = nullptr;
};

TEST_F(Iapws95WaterFit, ReferenceDataAreThere) {
    ASSERT_EQ(data_->points.size(), 33u) << "python3-iapws did not deliver the reference data";
    // IAPWS-95 at 300 K: p_sat = 3536.8 Pa (Wagner & Pruss 2002, Table 13.1).
    EXPECT_NEAR(data_->points[2].P_Pa, 3536.8, 0.1);
}

TEST_F(Iapws95WaterFit, WagnerWithinFiveHundredthsOfAPercent) {
    ASSERT_GE(data_->points.size(), 30u);
    FitRequest rq;
    rq.model = "wagner";
    rq.Tc_K = 647.096;  // IAPWS R6-95(2018): critical point of water
    rq.Pc_Pa = 22.064e6;
    rq.exponents = "1-1.5-3-6";
    const auto r = fitBoundary(*data_, rq);
    std::cout << "IAPWS-95 water 280-600 K, Wagner 1-1.5-3-6: max |dev| = " << r.maxAbs_pct
              << " %, RMS = " << r.rms_pct << " %, leave-one-out RMS = " << r.looRms_pct << " %\n";
    RecordProperty("wagner_max_dev_pct", std::to_string(r.maxAbs_pct));
    // Acceptance (issue 6): Wagner <= 0.05 %.
    EXPECT_LE(r.maxAbs_pct, 0.05);
}

TEST_F(Iapws95WaterFit, AntoineReported) {
    ASSERT_GE(data_->points.size(), 30u);
    FitRequest rq;
    rq.model = "antoine";
    const auto r = fitBoundary(*data_, rq);
    std::cout << "IAPWS-95 water 280-600 K, Antoine: max |dev| = " << r.maxAbs_pct
              << " %, RMS = " << r.rms_pct << " %, leave-one-out RMS = " << r.looRms_pct << " %\n";
    RecordProperty("antoine_max_dev_pct", std::to_string(r.maxAbs_pct));
    // Three-parameter Antoine over a 320 K span of water is good to a few percent
    // (common practice); it must be clearly worse than the Wagner form here.
    EXPECT_LE(r.maxAbs_pct, 3.0);
    EXPECT_GT(r.maxAbs_pct, 0.05);
}

}  // namespace
}  // namespace pw::fit
