#pragma once
// Vapor-pressure (and sublimation-pressure) equation forms. Arguments in K and Pa unless
// stated; the Antoine forms keep the units they were published in (docs/models.md).
#include <vector>

#include "core/models/curve.h"
#include "core/units.h"

namespace pw {

// ln(p/P_ref) = (T_ref/T) Σ a_i τ^e_i, τ = 1 − T/T_ref (Wagner-type; also CO2-type sublimation).
class WagnerModel final : public CurveModel {
public:
    WagnerModel(double T_ref, double P_ref, std::vector<double> a, std::vector<double> exponents);
    LnPressure lnPressure(double T) const override;

private:
    double Tref_, lnPref_;
    std::vector<double> a_;
    PowerSet powers_;
};

// ln(p/P_ref) = (T_ref/T) Σ a_i θ^b_i, θ = T/T_ref (IAPWS R14-08 sublimation form).
class IapwsSublimationModel final : public CurveModel {
public:
    IapwsSublimationModel(double T_ref, double P_ref, std::vector<double> a, std::vector<double> b);
    LnPressure lnPressure(double T) const override;

private:
    double Tref_, lnPref_;
    std::vector<double> a_;
    PowerSet powers_;  // exponents b_i − 1
};

// Coefficients of log_base p = A − B/(t + C) + D t + E t² + F log_base t, with t and p in
// the published units.
struct AntoineCoefficients {
    double base = 10.0;  // 10 or e
    double A = 0.0, B = 0.0, C = 0.0, D = 0.0, E = 0.0, F = 0.0;
    TemperatureUnit tUnit = TemperatureUnit::Kelvin;
    PressureUnit pUnit = PressureUnit::Pa;
};

// "antoine" (D = E = F = 0) and "antoine-extended".
class AntoineModel final : public CurveModel {
public:
    AntoineModel(const char *form, const AntoineCoefficients &c);
    LnPressure lnPressure(double T) const override;

private:
    AntoineCoefficients c_;
    double lnBase_, lnPascalPerUnit_;
    double tScale_, tOffset_;  // t = tScale_ * T + tOffset_
};

// ln(p/P_ref) = −(ΔH/R)(1/T − 1/T_ref).
class ClausiusClapeyronModel final : public CurveModel {
public:
    ClausiusClapeyronModel(double T_ref, double P_ref, double dH_J_mol);
    LnPressure lnPressure(double T) const override;

private:
    double Tref_, lnPref_, dHoverR_;
};

}  // namespace pw
