#include "core/models/corresponding_states.h"

#include <array>
#include <cmath>
#include <limits>

namespace pw {

namespace {

// Ambrose–Walton: f_k = (c1 τ + c2 τ^1.5 + c3 τ^2.5 + c4 τ^5) / T_r, τ = 1 − T_r.
constexpr std::array<std::array<double, 4>, 3> kAmbroseWalton{{
    {-5.97616, 1.29874, -0.60394, -1.06841},
    {-5.03365, 1.11505, -5.41217, -7.46628},
    {-0.64771, 2.41539, -4.26979, 3.25259},
}};

}  // namespace

CorrespondingStatesModel::CorrespondingStatesModel(CorrespondingStates kind, double T_c, double P_c,
                                                   double omega)
    : CurveModel(kind == CorrespondingStates::LeeKesler ? "lee-kesler" : "ambrose-walton"),
      kind_(kind),
      Tc_(T_c),
      lnPc_(std::log(P_c)),
      omega_(omega) {
    findDomain(TRange{0.05 * T_c, T_c}, T_c, "omega");
}

LnPressure CorrespondingStatesModel::lnPressure(double T) const {
    const double Tr = T / Tc_;
    const LnPressure r =
        kind_ == CorrespondingStates::LeeKesler ? leeKesler(Tr) : ambroseWalton(Tr);
    return {lnPc_ + r.lnp, r.slope / Tc_};
}

// Returns ln p_r and d(ln p_r)/dT_r.
LnPressure CorrespondingStatesModel::leeKesler(double Tr) const {
    const double lnTr = std::log(Tr);
    const double Tr6 = std::pow(Tr, 6);
    const double f0 = 5.92714 - 6.09648 / Tr - 1.28862 * lnTr + 0.169347 * Tr6;
    const double f1 = 15.2518 - 15.6875 / Tr - 13.4721 * lnTr + 0.43577 * Tr6;
    const double d0 = 6.09648 / (Tr * Tr) - 1.28862 / Tr + 6.0 * 0.169347 * Tr6 / Tr;
    const double d1 = 15.6875 / (Tr * Tr) - 13.4721 / Tr + 6.0 * 0.43577 * Tr6 / Tr;
    return {f0 + omega_ * f1, d0 + omega_ * d1};
}

LnPressure CorrespondingStatesModel::ambroseWalton(double Tr) const {
    const double tau = 1.0 - Tr;
    if (!(tau >= 0.0)) return {std::numeric_limits<double>::quiet_NaN(), 0.0};
    const double s = std::sqrt(tau);
    const std::array<double, 4> v{tau, tau * s, tau * tau * s, tau * tau * tau * tau * tau};
    const std::array<double, 4> dv{1.0, 1.5 * s, 2.5 * tau * s, 5.0 * tau * tau * tau * tau};
    const std::array<double, 3> w{1.0, omega_, omega_ * omega_};
    double num = 0.0, dnum = 0.0;  // Σ_k w_k Σ_j c_kj τ^e_j and its τ-derivative
    for (std::size_t k = 0; k < 3; ++k) {
        for (std::size_t j = 0; j < 4; ++j) {
            num += w[k] * kAmbroseWalton[k][j] * v[j];
            dnum += w[k] * kAmbroseWalton[k][j] * dv[j];
        }
    }
    // d/dT_r (num/T_r) = −dnum/T_r − num/T_r²
    return {num / Tr, -dnum / Tr - num / (Tr * Tr)};
}

}  // namespace pw
