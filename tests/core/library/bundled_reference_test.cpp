// The bundled substance files checked against values from outside the project: the source
// papers' own fixed points, IAPWS check values, handbook boiling points and python3-iapws
// (Debian's package, run with /usr/bin/python3 as a reference library). Every check names its
// source beside it.
#include <gtest/gtest.h>

#include <cmath>
#include <cstdio>
#include <memory>
#include <optional>
#include <set>
#include <sstream>
#include <string>
#include <string_view>
#include <vector>

#include "core/library.h"
#include "core/substance_io.h"
#include "resources/bundled.h"

namespace {

const std::set<std::string> kReferenceIds{"water", "heavy-water", "carbon-dioxide", "nitrogen",
                                          "argon", "methane",     "oxygen"};

// The boundary of `kind` and `solidForm` in a diagram; throws when absent.
const pw::Boundary &boundary(const pw::PhaseDiagram &d, pw::BoundaryKind kind,
                             std::string_view solidForm = {}) {
    for (const auto &b : d.substance().boundaries)
        if (b.kind == kind && (solidForm.empty() || b.solidForm == solidForm)) return b;
    throw std::runtime_error("no such boundary in " + d.substance().id + ": " +
                             std::string(solidForm));
}

double pressure(const pw::PhaseDiagram &d, pw::BoundaryKind kind, double T,
                std::string_view solidForm = {}) {
    return boundary(d, kind, solidForm).model->pressure(T);
}

// Pitzer's definition: omega = -log10(p_vap(0.7 Tc) / pc) - 1.
double acentricFromCurve(const pw::PhaseDiagram &d) {
    const auto *cp = d.criticalPoint();
    if (cp == nullptr) throw std::runtime_error("no critical point");
    const double p = d.vaporization()->model->pressure(0.7 * cp->T_K);
    return -std::log10(p / cp->P_Pa) - 1.0;
}

// Runs each expression with python3-iapws in one interpreter and returns the printed numbers
// (MPa for pressures).
std::vector<double> iapws(const std::vector<std::string> &exprs) {
    std::string script = "import iapws._iapws as I; from iapws import IAPWS95, D2O";
    for (const auto &e : exprs) script += "; print(repr(" + e + "))";
    const std::string cmd = "/usr/bin/python3 -c \"" + script + "\" 2>&1";
    struct Closer {
        void operator()(FILE *f) const { pclose(f); }
    };
    std::unique_ptr<FILE, Closer> pipe(popen(cmd.c_str(), "r"));
    if (!pipe) throw std::runtime_error("cannot run /usr/bin/python3");
    std::string out;
    char buf[256];
    while (std::fgets(buf, sizeof buf, pipe.get()) != nullptr) out += buf;
    std::vector<double> values;
    std::istringstream lines(out);
    for (std::string line; std::getline(lines, line);) {
        try {
            values.push_back(std::stod(line));
        } catch (const std::exception &) {
            break;
        }
    }
    if (values.size() != exprs.size())
        throw std::runtime_error("python3-iapws (Debian package) failed: " + out);
    return values;
}

std::string num(double x) { return std::to_string(x); }

}  // namespace

// The bundled library, built once for the whole suite (building it validates every file).
class BundledReference : public ::testing::Test {
protected:
    static void SetUpTestSuite() { library_.emplace(pw::SubstanceLibrary::bundled()); }
    static void TearDownTestSuite() { library_.reset(); }
    static std::shared_ptr<const pw::PhaseDiagram> diagram(std::string_view key) {
        return library_->find(key);
    }
    static double normalBoilingPoint(std::string_view key) {
        const auto nbp = diagram(key)->normalBoilingPoint();
        if (!nbp) throw std::runtime_error("no normal boiling point for " + std::string(key));
        return *nbp;
    }
    static inline std::optional<pw::SubstanceLibrary> library_;
};

// ---------------------------------------------------------------------------------------------
// Every bundled file loads and validates with no error.

TEST_F(BundledReference, EveryBundledSubstanceFileValidatesWithoutErrors) {
    int count = 0;
    for (const auto &file : pw::bundled::files()) {
        if (!file.path.starts_with("substances/") || !file.path.ends_with(".json")) continue;
        ++count;
        const auto result = pw::readSubstance(file.content, std::string(file.path));
        for (const auto &issue : result.issues)
            EXPECT_NE(issue.severity, pw::Severity::Error) << issue.text();
        EXPECT_TRUE(result.substance.has_value()) << file.path;
        // The seven reference-equation files are also free of warnings: their fixed points lie
        // on their curves within 0.1 % (docs/substance-format.md, Validation).
        if (result.substance && kReferenceIds.contains(result.substance->id)) {
            EXPECT_TRUE(result.issues.empty()) << file.path << ": " << result.issues.front().text();
        }
    }
    EXPECT_GE(count, 7);
}

TEST_F(BundledReference, LibraryHoldsTheSevenSubstancesFoundByFormula) {
    const auto lib = pw::SubstanceLibrary::bundled();
    for (const auto &issue : lib.issues())
        EXPECT_NE(issue.severity, pw::Severity::Error) << issue.text();
    // Ids from issue 4; formulas as aliases (common practice).
    const std::pair<const char *, const char *> expected[] = {
        {"water", "H2O"}, {"heavy-water", "D2O"}, {"carbon-dioxide", "CO2"}, {"nitrogen", "N2"},
        {"argon", "Ar"},  {"methane", "CH4"},     {"oxygen", "O2"}};
    for (const auto &[id, formula] : expected) {
        ASSERT_NO_THROW((void)lib.find(id)) << id;
        EXPECT_EQ(lib.find(formula)->substance().id, id) << formula;
    }
}

// ---------------------------------------------------------------------------------------------
// Water

TEST_F(BundledReference, WaterMeltingAndSublimationReproduceR14CheckValues) {
    const auto d = diagram("water");
    using K = pw::BoundaryKind;
    // IAPWS R14-08(2011), table of check values for computer-program verification.
    EXPECT_NEAR(pressure(*d, K::Sublimation, 230.0, "ice Ih"), 8.94735e-6 * 1e6, 1e-5 * 8.94735);
    EXPECT_NEAR(pressure(*d, K::Melting, 260.0, "ice Ih") / 1e6, 138.268, 0.001);
    EXPECT_NEAR(pressure(*d, K::Melting, 254.0, "ice III") / 1e6, 268.685, 0.001);
    EXPECT_NEAR(pressure(*d, K::Melting, 265.0, "ice V") / 1e6, 479.640, 0.001);
    EXPECT_NEAR(pressure(*d, K::Melting, 320.0, "ice VI") / 1e6, 1356.76, 0.01);
    EXPECT_NEAR(pressure(*d, K::Melting, 550.0, "ice VII") / 1e6, 6308.71, 0.01);
}

TEST_F(BundledReference, WaterFreezeDryingSublimationPressures) {
    const auto d = diagram("water");
    // IAPWS R14-08 sublimation pressure at -40 degC and -20 degC (FIELD-NOTES values,
    // 4 significant digits): 12.84 Pa and 103.2 Pa.
    EXPECT_NEAR(d->sublimationPressure(233.15)->value, 12.84, 0.005);
    EXPECT_NEAR(d->sublimationPressure(253.15)->value, 103.2, 0.05);
}

TEST_F(BundledReference, WaterVaporCurveBoilsAt373124K) {
    const auto d = diagram("water");
    // Normal boiling point of water on ITS-90: 373.124 K (IAPWS R6-95; Wagner & Pruss 2002).
    EXPECT_NEAR(normalBoilingPoint("water"), 373.124, 0.002);
    // Triple-point pressure 611.657 Pa (IAPWS R6-95) reproduced by the vapor curve.
    EXPECT_NEAR(d->vaporizationPressure(273.16)->value, 611.657, 0.01);
}

TEST_F(BundledReference, WaterAgreesWithPythonIapws) {
    const auto d = diagram("water");
    const std::vector<double> vapT{300.0, 400.0, 500.0, 600.0};
    const std::vector<double> subT{150.0, 200.0, 233.55, 250.0, 273.0};
    std::vector<std::string> exprs;
    for (double T : vapT) exprs.push_back("IAPWS95(T=" + num(T) + ", x=0).P");
    for (double T : subT) exprs.push_back("I._Sublimation_Pressure(" + num(T) + ")");
    const auto ref = iapws(exprs);
    // IAPWS-95 saturation pressure (python3-iapws): the SR1-86 auxiliary equation agrees
    // within 0.01 %.
    for (std::size_t i = 0; i < vapT.size(); ++i)
        EXPECT_NEAR(d->vaporizationPressure(vapT[i])->value / (ref[i] * 1e6), 1.0, 1e-4) << vapT[i];
    // R14-08 sublimation pressure as implemented independently by python3-iapws.
    for (std::size_t i = 0; i < subT.size(); ++i) {
        const double pRef = ref[vapT.size() + i] * 1e6;
        EXPECT_NEAR(d->sublimationPressure(subT[i])->value / pRef, 1.0, 1e-9) << subT[i];
        // Frost point (the inverse): that pressure must come back as the same temperature.
        EXPECT_NEAR(d->sublimationTemperature(pRef)->value, subT[i], 1e-6) << subT[i];
    }
}

TEST_F(BundledReference, WaterIceFloatsOnItsLiquid) {
    const auto d = diagram("water");
    // Ice Ih is less dense than liquid water, so the melting line falls (common practice).
    EXPECT_EQ(d->meltSlopeSign(), -1);
    EXPECT_EQ(d->solidDenserThanLiquid(), false);
    // Normal melting point 273.152519 K at 101.325 kPa from R14-08 ice Ih line (about
    // 273.1525 K; IAPWS R14-08 / Wagner et al. 2011).
    EXPECT_NEAR(d->normalMeltingPoint().value_or(0.0), 273.1525, 0.0002);
}

// ---------------------------------------------------------------------------------------------
// Heavy water

TEST_F(BundledReference, HeavyWaterBoilingAndTriplePoint) {
    const auto d = diagram("D2O");
    // Normal boiling point 374.549 K (Herrig et al. 2018, J. Phys. Chem. Ref. Data 47, 043102;
    // from memory); the ancillary equation is stated good to about 0.1 % in pressure.
    EXPECT_NEAR(normalBoilingPoint("heavy-water"), 374.549, 0.01);
    // Triple-point pressure 661.59 Pa (IAPWS R16-17) reproduced by the vapor curve within 0.1 %.
    EXPECT_NEAR(d->vaporizationPressure(276.969)->value / 661.59, 1.0, 1e-3);
}

TEST_F(BundledReference, HeavyWaterAgreesWithPythonIapws) {
    const auto d = diagram("heavy-water");
    using K = pw::BoundaryKind;
    const std::vector<double> vapT{300.0, 400.0, 500.0, 600.0};
    const std::vector<double> subT{220.0, 250.0, 275.0};
    const struct {
        double T;
        const char *form;
        const char *arg;
    } melt[] = {{260.0, "ice Ih", "Ih"},
                {256.0, "ice III", "III"},
                {265.0, "ice V", "V"},
                {290.0, "ice VI", "VI"}};
    std::vector<std::string> exprs;
    for (double T : vapT) exprs.push_back("D2O(T=" + num(T) + ", x=0).P");
    for (double T : subT) exprs.push_back("I._D2O_Sublimation_Pressure(" + num(T) + ")");
    for (const auto &m : melt)
        exprs.push_back("I._D2O_Melting_Pressure(" + num(m.T) + ", '" + m.arg + "')");
    const auto ref = iapws(exprs);
    std::size_t k = 0;
    // Saturation pressure from the IAPWS R16-17 equation of state (python3-iapws D2O class):
    // the ancillary equation of Herrig et al. (2018) agrees within 0.1 %.
    for (double T : vapT)
        EXPECT_NEAR(d->vaporizationPressure(T)->value / (ref[k++] * 1e6), 1.0, 1e-3) << T;
    // Herrig et al. (2018) sublimation and melting equations as implemented by python3-iapws.
    for (double T : subT)
        EXPECT_NEAR(d->sublimationPressure(T)->value / (ref[k++] * 1e6), 1.0, 1e-9) << T;
    for (const auto &m : melt)
        EXPECT_NEAR(pressure(*d, K::Melting, m.T, m.form) / (ref[k++] * 1e6), 1.0, 1e-9) << m.form;
}

TEST_F(BundledReference, HeavyWaterIceIhLineMeetsTheIceIIITriplePoint) {
    const auto d = diagram("heavy-water");
    using K = pw::BoundaryKind;
    // The ice Ih curve meets the Ih-III-liquid triple point, 222.41 MPa at 254.415 K
    // (Herrig et al. 2018), within 0.01 %.
    EXPECT_NEAR(pressure(*d, K::Melting, 254.415, "ice Ih") / 222.41e6, 1.0, 1e-4);
}

// ---------------------------------------------------------------------------------------------
// Carbon dioxide

TEST_F(BundledReference, CarbonDioxideSublimesAt194686KAtOneAtmosphere) {
    const auto d = diagram("CO2");
    // Normal sublimation temperature 194.686 K (Span & Wagner 1996, Table of fixed points;
    // handbook value).
    EXPECT_NEAR(d->normalSublimationPoint().value_or(0.0), 194.686, 0.01);
    EXPECT_FALSE(d->normalBoilingPoint().has_value());  // liquid CO2 needs > 0.518 MPa
}

TEST_F(BundledReference, CarbonDioxideTriplePointFromVaporAndSublimationCurves) {
    const auto d = diagram("carbon-dioxide");
    // Triple point 216.592 K / 0.51795 MPa (Span & Wagner 1996): the vapor-pressure equation
    // (3.13) reproduces the pressure within 0.01 %.
    EXPECT_NEAR(d->vaporizationPressure(216.592)->value / 0.51795e6, 1.0, 1e-4);
    // Solid CO2 sinks in its liquid: the melting line rises (common practice).
    EXPECT_EQ(d->meltSlopeSign(), 1);
    EXPECT_EQ(d->solidDenserThanLiquid(), true);
    // Melting pressure near 800 MPa at 327 K, the upper end of eq. (3.10) (Span & Wagner 1996).
    EXPECT_NEAR(d->meltingPressure(327.0)->value / 1e6, 793.5, 1.0);
}

// ---------------------------------------------------------------------------------------------
// Cryogens

TEST_F(BundledReference, NitrogenBoilingAndTriplePoint) {
    const auto d = diagram("N2");
    // Normal boiling point 77.355 K (Span et al. 2000; handbook value).
    EXPECT_NEAR(normalBoilingPoint("nitrogen"), 77.355, 0.005);
    // Triple-point pressure 12.5198 kPa (Span et al. 2000) from the vapor curve within 0.05 %.
    EXPECT_NEAR(d->vaporizationPressure(63.151)->value / 12519.8, 1.0, 5e-4);
    EXPECT_EQ(d->solidDenserThanLiquid(), true);  // solid N2 sinks (common practice)
}

TEST_F(BundledReference, ArgonBoilingAndTriplePoint) {
    const auto d = diagram("Ar");
    // Normal boiling point 87.302 K (Tegeler et al. 1999; handbook value).
    EXPECT_NEAR(normalBoilingPoint("argon"), 87.302, 0.005);
    // Triple-point pressure 68.891 kPa (Tegeler et al. 1999) from the vapor curve within 0.05 %.
    EXPECT_NEAR(d->vaporizationPressure(83.8058)->value / 68891.0, 1.0, 5e-4);
    EXPECT_EQ(d->solidDenserThanLiquid(), true);
}

TEST_F(BundledReference, MethaneBoilingAndTriplePoint) {
    const auto d = diagram("CH4");
    // Normal boiling point 111.667 K (Setzmann & Wagner 1991; handbook value).
    EXPECT_NEAR(normalBoilingPoint("methane"), 111.667, 0.005);
    // Triple-point pressure 11.696 kPa (Setzmann & Wagner 1991) from the vapor curve, 0.05 %.
    EXPECT_NEAR(d->vaporizationPressure(90.6941)->value / 11696.0, 1.0, 5e-4);
    EXPECT_EQ(d->solidDenserThanLiquid(), true);
}

TEST_F(BundledReference, OxygenBoilingAndTriplePoint) {
    const auto d = diagram("O2");
    // Normal boiling point 90.188 K (Stewart, Jacobsen & Wagner 1991; handbooks: 90.19 K).
    EXPECT_NEAR(normalBoilingPoint("oxygen"), 90.188, 0.01);
    // Triple-point pressure 146.33 Pa (Schmidt & Wagner 1985) from the vapor curve within 0.1 %.
    EXPECT_NEAR(d->vaporizationPressure(54.361)->value / 146.33, 1.0, 1e-3);
    // No melting line is bundled for oxygen (see the file's notes).
    EXPECT_TRUE(d->melting().empty());
}

// ---------------------------------------------------------------------------------------------
// Acentric factors: the cited value agrees with Pitzer's definition applied to the bundled
// vapor curve (Pitzer 1955; values from Poling, Prausnitz & O'Connell 2001, Appendix A).

TEST_F(BundledReference, AcentricFactorsAgreeWithTheVaporCurves) {
    for (const char *id :
         {"water", "heavy-water", "carbon-dioxide", "nitrogen", "argon", "methane", "oxygen"}) {
        const auto d = diagram(id);
        EXPECT_NEAR(acentricFromCurve(*d), d->substance().acentricFactor, 0.003) << id;
    }
}
