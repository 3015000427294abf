// IAPWS R14-08(2011) melting and sublimation curves of water, against the release's own check
// values (FIELD-NOTES.md lists them; IAPWS R14-08 Tables 3 and 4), and the IAPWS SR1-86
// vaporization curve against IAPWS-95 table values (the full comparison with python3-iapws is
// the CTest water_vaporization_vs_iapws95).
#include <gtest/gtest.h>

#include <cmath>

#include "reference_specs.h"

namespace pw {
namespace {

// |x − expected| within half a unit of the last printed digit.
void expectPrinted(double x, double expected, double lastDigit) {
    EXPECT_LE(std::abs(x - expected), 0.5 * lastDigit) << x << " vs " << expected;
}

TEST(IapwsR14, SublimationCheckValue) {
    // IAPWS R14-08 Table 4: p_subl(230 K) = 8.94735e-6 MPa.
    const auto m = makeModel(testdata::waterSublimation());
    expectPrinted(m->pressure(230.0) / 1e6, 8.94735e-6, 1e-11);
}

TEST(IapwsR14, MeltingCheckValues) {
    // IAPWS R14-08 Table 3: melting pressures of ices Ih, III, V, VI, VII.
    expectPrinted(makeModel(testdata::waterMeltingIh())->pressure(260.0) / 1e6, 138.268, 1e-3);
    expectPrinted(makeModel(testdata::waterMeltingIII())->pressure(254.0) / 1e6, 268.685, 1e-3);
    expectPrinted(makeModel(testdata::waterMeltingV())->pressure(265.0) / 1e6, 479.640, 1e-3);
    expectPrinted(makeModel(testdata::waterMeltingVI())->pressure(320.0) / 1e6, 1356.76, 1e-2);
    expectPrinted(makeModel(testdata::waterMeltingVII())->pressure(550.0) / 1e6, 6308.71, 1e-2);
}

TEST(IapwsR14, FieldNotesFreezeDryingValues) {
    // FIELD-NOTES.md (IAPWS R14-08): ice vapor pressure 12.84 Pa at −40 °C, 103.2 Pa at −20 °C.
    const auto m = makeModel(testdata::waterSublimation());
    expectPrinted(m->pressure(233.15), 12.84, 0.01);
    expectPrinted(m->pressure(253.15), 103.2, 0.1);
}

TEST(IapwsR14, CurvesMeetAtTheTriplePoints) {
    // IAPWS R14-08 Table 1: the triple points where the melting curves meet (ice Ih–III–liquid
    // 251.165 K / 208.566 MPa, III–V–liquid 256.164 K / 350.1 MPa, V–VI–liquid 273.31 K /
    // 632.4 MPa, VI–VII–liquid 355 K / 2216 MPa). The curves reproduce them to about 0.1 %.
    const auto ih = makeModel(testdata::waterMeltingIh());
    const auto iii = makeModel(testdata::waterMeltingIII());
    const auto v = makeModel(testdata::waterMeltingV());
    const auto vi = makeModel(testdata::waterMeltingVI());
    const auto vii = makeModel(testdata::waterMeltingVII());
    EXPECT_NEAR(ih->pressure(251.165) / 208.566e6, 1.0, 1e-3);
    EXPECT_NEAR(iii->pressure(256.164) / 350.1e6, 1.0, 1e-3);
    EXPECT_NEAR(v->pressure(273.31) / 632.4e6, 1.0, 1e-3);
    EXPECT_NEAR(vi->pressure(355.0) / 2216e6, 1.0, 1e-3);
    EXPECT_DOUBLE_EQ(vii->pressure(355.0), 2216e6);
    // Ice Ih melting and sublimation both pass through the triple point 611.657 Pa.
    EXPECT_DOUBLE_EQ(ih->pressure(273.16), 611.657);
    EXPECT_NEAR(makeModel(testdata::waterSublimation())->pressure(273.16), 611.657, 1e-9);
}

TEST(IapwsR14, InverseReturnsTheCheckTemperatures) {
    // IAPWS R14-08 Table 3, read backwards (T at the printed pressure).
    EXPECT_NEAR(makeModel(testdata::waterMeltingIh())->temperature(138.268e6), 260.0, 1e-4);
    EXPECT_NEAR(makeModel(testdata::waterMeltingVII())->temperature(6308.71e6), 550.0, 1e-3);
    EXPECT_NEAR(makeModel(testdata::waterSublimation())->temperature(8.94735), 230.0, 1e-5);
}

TEST(IapwsSr186, SaturationPressureNearIapws95TableValues) {
    // IAPWS R6-95(2018) Table 8, saturation pressures from IAPWS-95 (from memory):
    // 275 K 0.698451167e-3 MPa, 450 K 0.932203564 MPa, 625 K 0.169082693e2 MPa. The auxiliary
    // equation (IAPWS SR1-86 / Wagner & Pruss 1993) agrees within 1e-4 relative.
    const auto m = makeModel(testdata::waterVaporization());
    EXPECT_NEAR(m->pressure(275.0) / 0.698451167e3, 1.0, 1e-4);
    EXPECT_NEAR(m->pressure(450.0) / 0.932203564e6, 1.0, 1e-4);
    EXPECT_NEAR(m->pressure(625.0) / 0.169082693e8, 1.0, 1e-4);
    // And ends at the critical point 647.096 K / 22.064 MPa (IAPWS R6-95) by construction.
    EXPECT_NEAR(m->pressure(647.096) / 22.064e6, 1.0, 1e-14);
}

}  // namespace
}  // namespace pw
