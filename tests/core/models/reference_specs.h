#pragma once
// Model specs and substances built from published equations, for the tests. Each coefficient
// set names its source; the check values in the tests confirm them.
#include <string>
#include <vector>

#include "core/model_spec.h"
#include "core/substance.h"

namespace pw::testdata {

inline ModelSpec spec(std::string form, std::map<std::string, double> scalars,
                      std::map<std::string, std::vector<double>> arrays = {},
                      PressureUnit pUnit = PressureUnit::Pa) {
    ModelSpec s;
    s.form = std::move(form);
    s.scalars = std::move(scalars);
    s.arrays = std::move(arrays);
    s.pUnit = pUnit;
    return s;
}

// IAPWS R14-08(2011), Revised Release on the Pressure along the Melting and Sublimation
// Curves of Ordinary Water Substance, eq. (6): sublimation of ice Ih, 50 K to 273.16 K.
// Coefficients from memory, confirmed by the release's check value (Table 4).
inline ModelSpec waterSublimation() {
    return spec("iapws-sublimation", {{"T_ref", 273.16}, {"P_ref", 611.657}},
                {{"a", {-0.212144006e2, 0.273203819e2, -0.610598130e1}},
                 {"b", {0.333333333e-2, 0.120666667e1, 0.170333333e1}}});
}

// IAPWS R14-08(2011) eq. (1): melting of ice Ih, 251.165 K to 273.16 K (from memory).
inline ModelSpec waterMeltingIh() {
    return spec("iapws-melting", {{"T_ref", 273.16}, {"P_ref", 611.657}},
                {{"a", {0.119539337e7, 0.808183159e5, 0.333826860e4}},
                 {"b", {0.300000e1, 0.257500e2, 0.103750e3}}});
}

// IAPWS R14-08(2011) eqs. (2)-(4): ice III (251.165-256.164 K), V (256.164-273.31 K),
// VI (273.31-355 K); pressures in MPa (from memory).
inline ModelSpec waterMeltingIII() {
    return spec("iapws-melting", {{"T_ref", 251.165}, {"P_ref", 208.566}},
                {{"a", {-0.299948}}, {"b", {60.0}}}, PressureUnit::MPa);
}
inline ModelSpec waterMeltingV() {
    return spec("iapws-melting", {{"T_ref", 256.164}, {"P_ref", 350.100}},
                {{"a", {-1.18721}}, {"b", {8.0}}}, PressureUnit::MPa);
}
inline ModelSpec waterMeltingVI() {
    return spec("iapws-melting", {{"T_ref", 273.31}, {"P_ref", 632.400}},
                {{"a", {-1.07476}}, {"b", {4.6}}}, PressureUnit::MPa);
}

// IAPWS R14-08(2011) eq. (5): ice VII, 355-715 K, logarithmic form (from memory).
inline ModelSpec waterMeltingVII() {
    ModelSpec s = spec("iapws-melting", {{"T_ref", 355.0}, {"P_ref", 2216.000}},
                       {{"a", {0.173683e1, -0.544606e-1, 0.806106e-7}}, {"b", {-1.0, 5.0, 22.0}}},
                       PressureUnit::MPa);
    s.flags["log"] = true;
    return s;
}

// IAPWS SR1-86(1992) / W. Wagner, A. Pruss, J. Phys. Chem. Ref. Data 22, 783 (1993),
// eq. (2.5): saturation pressure, 273.16 K to 647.096 K (coefficients from memory, confirmed
// against IAPWS-95 by tests/core/models/water_vs_iapws95.py).
inline ModelSpec waterVaporization() {
    return spec("wagner", {{"T_ref", 647.096}, {"P_ref", 22.064}},
                {{"a", {-7.85951783, 1.84408259, -11.7866497, 22.6807411, -15.9618719, 1.80122502}},
                 {"exponents", {1.0, 1.5, 3.0, 3.5, 4.0, 7.5}}},
                PressureUnit::MPa);
}

// R. Span, W. Wagner, J. Phys. Chem. Ref. Data 25, 1509 (1996): CO2 auxiliary equations,
// eq. (3.13) vapor pressure, eq. (3.12) sublimation pressure, eq. (3.10) melting pressure
// (coefficients from memory; eq. 3.13 as printed in docs/substance-format.md).
inline ModelSpec co2Vaporization() {
    return spec("wagner", {{"T_ref", 304.1282}, {"P_ref", 7.3773}},
                {{"a", {-7.0602087, 1.9391218, -1.6463597, -3.2995634}},
                 {"exponents", {1.0, 1.5, 2.0, 4.0}}},
                PressureUnit::MPa);
}
inline ModelSpec co2Sublimation() {
    return spec("wagner", {{"T_ref", 216.592}, {"P_ref", 0.51795}},
                {{"a", {-14.740846, 2.4327015, -5.3061778}}, {"exponents", {1.0, 1.9, 2.9}}},
                PressureUnit::MPa);
}
inline ModelSpec co2Melting() {
    return spec("melting-polynomial", {{"T_ref", 216.592}, {"P_ref", 0.51795}},
                {{"a", {1955.5390, 2055.4593}}, {"exponents", {1.0, 2.0}}}, PressureUnit::MPa);
}

inline Boundary boundary(BoundaryKind kind, std::string solid, ModelSpec s, double Tmin,
                         double Tmax) {
    Boundary b;
    b.kind = kind;
    b.solidForm = std::move(solid);
    b.model = makeModel(s);
    b.spec = std::move(s);
    b.validity = TRange{Tmin, Tmax};
    return b;
}

// Water: IAPWS R14-08 triple point 273.16 K / 611.657 Pa; critical point 647.096 K /
// 22.064 MPa (IAPWS R6-95). Fusion at the triple point: ΔH = 6007 J/mol, ΔV = −1.634e-6
// m³/mol (handbook values, from memory).
inline Substance water() {
    Substance w;
    w.id = "water";
    w.name = "Water";
    w.formula = "H2O";
    w.aliases = {"R-718"};
    w.triplePoints.push_back(FixedPoint{273.16, 611.657, {"ice Ih", "liquid", "vapor"}, "", {}});
    w.critical = FixedPoint{647.096, 22.064e6, {}, "", {}};
    w.dHfusTriple_J_mol = 6007.0;
    w.dVfusTriple_m3_mol = -1.634e-6;
    using K = BoundaryKind;
    w.boundaries.push_back(boundary(K::Vaporization, "", waterVaporization(), 273.16, 647.096));
    w.boundaries.push_back(boundary(K::Sublimation, "ice Ih", waterSublimation(), 50.0, 273.16));
    // Deliberately not in pressure order: PhaseDiagram sorts them.
    w.boundaries.push_back(boundary(K::Melting, "ice V", waterMeltingV(), 256.164, 273.31));
    w.boundaries.push_back(boundary(K::Melting, "ice Ih", waterMeltingIh(), 251.165, 273.16));
    w.boundaries.push_back(boundary(K::Melting, "ice III", waterMeltingIII(), 251.165, 256.164));
    w.boundaries.push_back(boundary(K::Melting, "ice VI", waterMeltingVI(), 273.31, 355.0));
    w.boundaries.push_back(boundary(K::Melting, "ice VII", waterMeltingVII(), 355.0, 715.0));
    return w;
}

// Carbon dioxide: Span & Wagner (1996) triple point 216.592 K / 0.51795 MPa, critical point
// 304.1282 K / 7.3773 MPa. Validity ranges of the auxiliary equations from memory.
inline Substance carbonDioxide() {
    Substance c;
    c.id = "carbon-dioxide";
    c.name = "Carbon dioxide";
    c.formula = "CO2";
    c.triplePoints.push_back(FixedPoint{216.592, 0.51795e6, {"solid", "liquid", "vapor"}, "", {}});
    c.critical = FixedPoint{304.1282, 7.3773e6, {}, "", {}};
    using K = BoundaryKind;
    c.boundaries.push_back(boundary(K::Vaporization, "", co2Vaporization(), 216.592, 304.1282));
    c.boundaries.push_back(boundary(K::Sublimation, "", co2Sublimation(), 150.0, 216.592));
    c.boundaries.push_back(boundary(K::Melting, "", co2Melting(), 216.592, 327.0));
    return c;
}

}  // namespace pw::testdata
