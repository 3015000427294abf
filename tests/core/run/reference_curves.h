#pragma once
// Boundary equations written out in the tests, independent of the substance files, to place
// known crossings on synthetic paths.
#include <cmath>
#include <memory>

#include "core/errors.h"
#include "core/library.h"
#include "core/model_spec.h"
#include "core/phase_diagram.h"

namespace pw::run::testref {

// Ice Ih sublimation pressure, IAPWS R14-08(2011) eq. (6), coefficients from its Table 2;
// Tt = 273.16 K, pt = 611.657 Pa.
inline double iceSublimationPa(double T) {
    const double th = T / 273.16;
    const double s = -0.212144006e2 * std::pow(th, 0.333333333e-2) +
                     0.273203819e2 * std::pow(th, 0.120666667e1) +
                     -0.610598130e1 * std::pow(th, 0.170333333e1);
    return 611.657 * std::exp(s / th);
}

// CO2 vapor pressure, Span & Wagner (1996), J. Phys. Chem. Ref. Data 25, eq. (3.13) with the
// coefficients of its Table 3; Tc = 304.1282 K, pc = 7.3773 MPa.
inline double co2VaporPa(double T) {
    const double tau = 1.0 - T / 304.1282;
    const double s = -7.0602087 * tau + 1.9391218 * std::pow(tau, 1.5) + -1.6463597 * tau * tau +
                     -3.2995634 * std::pow(tau, 4.0);
    return 7.3773e6 * std::exp(304.1282 / T * s);
}

// Root of f (increasing or decreasing) on [lo, hi] by bisection.
template <typename F>
double bisect(F f, double lo, double hi) {
    const bool rising = f(hi) > f(lo);
    for (int i = 0; i < 200; ++i) {
        const double mid = 0.5 * (lo + hi);
        ((f(mid) > 0.0) == rising ? hi : lo) = mid;
    }
    return 0.5 * (lo + hi);
}

inline Boundary boundary(BoundaryKind kind, const std::string &solid, const std::string &form,
                         double Tref, double Pref, std::vector<double> a, const char *expName,
                         std::vector<double> e, double Tmin, double Tmax) {
    Boundary b;
    b.kind = kind;
    b.solidForm = solid;
    b.spec.form = form;
    b.spec.scalars = {{"T_ref", Tref}, {"P_ref", Pref}};
    b.spec.arrays = {{"a", std::move(a)}, {expName, std::move(e)}};
    b.model = makeModel(b.spec);
    b.validity = {Tmin, Tmax};
    return b;
}

// Water from IAPWS releases, built in the test: SR1-86 (Wagner & Pruss 1993) vapor pressure,
// R14-08 ice Ih sublimation and melting; triple point 273.16 K / 611.657 Pa (R14-08),
// critical point 647.096 K / 22.064 MPa (IAPWS-95). Ice Ih only (enough below 200 MPa).
inline Substance testWater() {
    Substance s;
    s.id = "water";
    s.name = "water (test copy)";
    s.triplePoints.push_back({273.16, 611.657, {"ice Ih", "liquid", "vapor"}, "", {}});
    s.critical = FixedPoint{647.096, 22.064e6, {}, "", {}};
    s.boundaries.push_back(
        boundary(BoundaryKind::Vaporization, "", "wagner", 647.096, 22.064e6,
                 {-7.85951783, 1.84408259, -11.7866497, 22.6807411, -15.9618719, 1.80122502},
                 "exponents", {1.0, 1.5, 3.0, 3.5, 4.0, 7.5}, 273.16, 647.096));
    s.boundaries.push_back(boundary(BoundaryKind::Sublimation, "ice Ih", "iapws-sublimation",
                                    273.16, 611.657,
                                    {-0.212144006e2, 0.273203819e2, -0.610598130e1}, "b",
                                    {0.333333333e-2, 0.120666667e1, 0.170333333e1}, 50.0, 273.16));
    s.boundaries.push_back(boundary(BoundaryKind::Melting, "ice Ih", "iapws-melting", 273.16,
                                    611.657, {0.119539337e7, 0.808183159e5, 0.333826860e4}, "b",
                                    {0.300000e1, 0.257500e2, 0.103750e3}, 251.165, 273.16));
    return s;
}

// CO2 from Span & Wagner (1996): vapor pressure eq. (3.13), sublimation eq. (3.12), melting
// eq. (3.10); triple point 216.592 K / 0.51795 MPa, critical point 304.1282 K / 7.3773 MPa.
inline Substance testCo2() {
    Substance s;
    s.id = "carbon-dioxide";
    s.name = "carbon dioxide (test copy)";
    s.triplePoints.push_back({216.592, 0.51795e6, {"solid", "liquid", "vapor"}, "", {}});
    s.critical = FixedPoint{304.1282, 7.3773e6, {}, "", {}};
    s.boundaries.push_back(boundary(BoundaryKind::Vaporization, "", "wagner", 304.1282, 7.3773e6,
                                    {-7.0602087, 1.9391218, -1.6463597, -3.2995634}, "exponents",
                                    {1.0, 1.5, 2.0, 4.0}, 216.592, 304.1282));
    s.boundaries.push_back(boundary(BoundaryKind::Sublimation, "", "wagner", 216.592, 0.51795e6,
                                    {-14.740846, 2.4327015, -5.3061778}, "exponents",
                                    {1.0, 1.9, 2.9}, 154.0, 216.592));
    s.boundaries.push_back(boundary(BoundaryKind::Melting, "", "melting-polynomial", 216.592,
                                    0.51795e6, {1955.5390, 2055.4593}, "exponents", {1.0, 2.0},
                                    216.592, 327.0));
    return s;
}

// The bundled substance; while the bundled file is refused (work in progress elsewhere), the
// test copy above with the same published equations.
inline std::shared_ptr<const PhaseDiagram> diagramFor(const std::string &id) {
    try {
        return SubstanceLibrary::bundled().find(id);
    } catch (const Error &) {
        return std::make_shared<const PhaseDiagram>(id == "water" ? testWater() : testCo2());
    }
}

}  // namespace pw::run::testref
