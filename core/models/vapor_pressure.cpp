#include "core/models/vapor_pressure.h"

#include <cmath>
#include <limits>

namespace pw {

WagnerModel::WagnerModel(double T_ref, double P_ref, std::vector<double> a,
                         std::vector<double> exponents)
    : CurveModel("wagner"),
      Tref_(T_ref),
      lnPref_(std::log(P_ref)),
      a_(std::move(a)),
      powers_(std::move(exponents)) {
    findDomain(TRange{0.05 * T_ref, T_ref}, T_ref, "a");
}

LnPressure WagnerModel::lnPressure(double T) const {
    const double tau = 1.0 - T / Tref_;
    if (!(tau >= 0.0)) return {std::numeric_limits<double>::quiet_NaN(), 0.0};
    const SumValue s = powers_.sum(a_, tau);
    const double r = Tref_ / T;
    // d/dT [r S(τ)] = −r S / T − S'(τ) / T   (dr/dT = −r/T, dτ/dT = −1/T_ref)
    return {lnPref_ + r * s.value, -(r * s.value + s.deriv) / T};
}

namespace {
std::vector<double> minusOne(std::vector<double> b) {
    for (double &x : b) x -= 1.0;
    return b;
}
}  // namespace

IapwsSublimationModel::IapwsSublimationModel(double T_ref, double P_ref, std::vector<double> a,
                                             std::vector<double> b)
    : CurveModel("iapws-sublimation"),
      Tref_(T_ref),
      lnPref_(std::log(P_ref)),
      a_(std::move(a)),
      powers_(minusOne(std::move(b))) {
    findDomain(TRange{0.05 * T_ref, 1.5 * T_ref}, T_ref, "a");
}

LnPressure IapwsSublimationModel::lnPressure(double T) const {
    // (T_ref/T) Σ a θ^b = Σ a θ^(b−1)
    const SumValue s = powers_.sum(a_, T / Tref_);
    return {lnPref_ + s.value, s.deriv / Tref_};
}

AntoineModel::AntoineModel(const char *form, const AntoineCoefficients &c)
    : CurveModel(form),
      c_(c),
      lnBase_(std::log(c.base)),
      lnPascalPerUnit_(std::log(pascalPer(c.pUnit))) {
    tOffset_ = fromKelvin(0.0, c.tUnit);
    tScale_ = fromKelvin(1.0, c.tUnit) - tOffset_;
    // Defined where t + C > 0 (and t > 0 when F ≠ 0); 1 K above that, up to 2000 K beyond.
    double tMin = -c.C;
    if (c.F != 0.0) tMin = std::max(tMin, 0.0);
    const double Tpole = (tMin - tOffset_) / tScale_;
    const double lo = std::max(Tpole + 1.0, 1.0);
    findDomain(TRange{lo, lo + 2000.0}, std::numeric_limits<double>::quiet_NaN(), "B");
}

LnPressure AntoineModel::lnPressure(double T) const {
    const double t = tScale_ * T + tOffset_;
    const double u = t + c_.C;
    if (!(u > 0.0)) return {std::numeric_limits<double>::quiet_NaN(), 0.0};
    double logp = c_.A - c_.B / u + c_.D * t + c_.E * t * t;
    double dlogp = c_.B / (u * u) + c_.D + 2.0 * c_.E * t;
    if (c_.F != 0.0) {
        if (!(t > 0.0)) return {std::numeric_limits<double>::quiet_NaN(), 0.0};
        logp += c_.F * std::log(t) / lnBase_;
        dlogp += c_.F / (t * lnBase_);
    }
    return {lnBase_ * logp + lnPascalPerUnit_, lnBase_ * dlogp * tScale_};
}

ClausiusClapeyronModel::ClausiusClapeyronModel(double T_ref, double P_ref, double dH_J_mol)
    : CurveModel("clausius-clapeyron"),
      Tref_(T_ref),
      lnPref_(std::log(P_ref)),
      dHoverR_(dH_J_mol / kGasConstant) {
    findDomain(TRange{0.05 * T_ref, 10.0 * T_ref}, T_ref, "dH_J_mol");
}

LnPressure ClausiusClapeyronModel::lnPressure(double T) const {
    return {lnPref_ - dHoverR_ * (1.0 / T - 1.0 / Tref_), dHoverR_ / (T * T)};
}

}  // namespace pw
