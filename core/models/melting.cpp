#include "core/models/melting.h"

#include <cmath>
#include <limits>

namespace pw {

namespace {

LnPressure lnOf(double p, double dpdT) {
    if (!(p > 0.0)) return {std::numeric_limits<double>::quiet_NaN(), 0.0};
    return {std::log(p), dpdT / p};
}

}  // namespace

ClapeyronModel::ClapeyronModel(bool integrated, double T_ref, double P_ref, double dH_J_mol,
                               double dV_m3_mol)
    : CurveModel(integrated ? "clapeyron-integrated" : "clapeyron-linear"),
      integrated_(integrated),
      Tref_(T_ref),
      Pref_(P_ref),
      ratio_(dH_J_mol / dV_m3_mol) {
    findDomain(TRange{0.1 * T_ref, 10.0 * T_ref}, T_ref, "dV_m3_mol");
}

double ClapeyronModel::pressure(double T) const {
    return integrated_ ? Pref_ + ratio_ * std::log(T / Tref_)
                       : Pref_ + ratio_ * (T - Tref_) / Tref_;
}

double ClapeyronModel::dPdT(double T) const { return integrated_ ? ratio_ / T : ratio_ / Tref_; }

LnPressure ClapeyronModel::lnPressure(double T) const { return lnOf(pressure(T), dPdT(T)); }

SimonGlatzelModel::SimonGlatzelModel(double T_ref, double P_ref, double a_Pa, double c)
    : CurveModel("simon-glatzel"), Tref_(T_ref), Pref_(P_ref), a_(a_Pa), c_(c) {
    findDomain(TRange{0.1 * T_ref, 20.0 * T_ref}, T_ref, "c");
}

double SimonGlatzelModel::pressure(double T) const {
    return Pref_ + a_ * (std::pow(T / Tref_, c_) - 1.0);
}

double SimonGlatzelModel::dPdT(double T) const {
    return a_ * c_ * std::pow(T / Tref_, c_ - 1.0) / Tref_;
}

LnPressure SimonGlatzelModel::lnPressure(double T) const { return lnOf(pressure(T), dPdT(T)); }

MeltingSumModel::MeltingSumModel(Kind kind, double T_ref, double P_ref, std::vector<double> a,
                                 std::vector<double> exponents)
    : CurveModel(kind == Kind::Polynomial ? "melting-polynomial" : "iapws-melting"),
      kind_(kind),
      Tref_(T_ref),
      Pref_(P_ref),
      a_(std::move(a)),
      powers_(std::move(exponents)) {
    double lo = 0.5 * T_ref;
    double hi = 3.0 * T_ref;
    if (kind == Kind::Polynomial) {
        // (θ − 1)^e needs θ >= 1 unless every exponent is an integer.
        lo = powers_.allIntegers() ? 0.5 * T_ref : T_ref;
        hi = 20.0 * T_ref;
    }
    findDomain(TRange{lo, hi}, T_ref, "a");
}

SumValue MeltingSumModel::reduced(double T) const {
    const double theta = T / Tref_;
    if (kind_ == Kind::Polynomial) {
        const SumValue s = powers_.sum(a_, theta - 1.0);
        return {1.0 + s.value, s.deriv / Tref_};
    }
    // Σ a (1 − θ^b) = Σ a − Σ a θ^b
    const SumValue s = powers_.sum(a_, theta);
    double sumA = 0.0;
    for (double x : a_) sumA += x;
    const double base = kind_ == Kind::IapwsLog ? 0.0 : 1.0;
    return {base + sumA - s.value, -s.deriv / Tref_};
}

double MeltingSumModel::pressure(double T) const {
    const SumValue r = reduced(T);
    return kind_ == Kind::IapwsLog ? Pref_ * std::exp(r.value) : Pref_ * r.value;
}

double MeltingSumModel::dPdT(double T) const {
    const SumValue r = reduced(T);
    return kind_ == Kind::IapwsLog ? Pref_ * std::exp(r.value) * r.deriv : Pref_ * r.deriv;
}

LnPressure MeltingSumModel::lnPressure(double T) const {
    const SumValue r = reduced(T);
    if (kind_ == Kind::IapwsLog) return {std::log(Pref_) + r.value, r.deriv};
    return lnOf(Pref_ * r.value, Pref_ * r.deriv);
}

}  // namespace pw
