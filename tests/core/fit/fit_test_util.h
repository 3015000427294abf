#pragma once
// Helpers for the fit tests: synthetic data from a published equation, optionally with
// multiplicative Gaussian noise from a fixed seed.
#include <cmath>
#include <functional>
#include <random>

#include "core/fit/fit_data.h"

namespace pw::fit::test {

inline FitData sample(const std::function<double(double)> &p, double T0, double T1, int n,
                      double noiseRel = 0.0, unsigned seed = 20261202u) {
    FitData d;
    d.file = "synthetic";
    std::mt19937 rng(seed);
    std::normal_distribution<double> normal(0.0, 1.0);
    for (int i = 0; i < n; ++i) {
        const double T = T0 + (T1 - T0) * i / (n - 1);
        const double noise = noiseRel > 0.0 ? 1.0 + noiseRel * normal(rng) : 1.0;
        d.points.push_back({T, p(T) * noise, 1.0, i + 2});
    }
    return d;
}

// Wagner-type: ln(p/Pr) = (Tr/T) sum a_i tau^e_i.
inline double wagner(double T, double Tr, double Pr, const std::vector<double> &a,
                     const std::vector<double> &e) {
    const double tau = 1.0 - T / Tr;
    double s = 0.0;
    for (std::size_t i = 0; i < a.size(); ++i) s += a[i] * std::pow(tau, e[i]);
    return Pr * std::exp(Tr / T * s);
}

}  // namespace pw::fit::test
