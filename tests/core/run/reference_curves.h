#pragma once
// Boundary equations written out in the tests, independent of the substance files, to place
// known crossings on synthetic paths.
#include <cmath>

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

}  // namespace pw::run::testref
