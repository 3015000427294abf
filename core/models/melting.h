#pragma once
// Melting-curve equation forms (docs/models.md). Arguments in K and Pa.
#include <vector>

#include "core/models/curve.h"

namespace pw {

// "clapeyron-linear": p = P_ref + ΔH/(T_ref ΔV) (T − T_ref);
// "clapeyron-integrated": p = P_ref + (ΔH/ΔV) ln(T/T_ref).
class ClapeyronModel final : public CurveModel {
public:
    ClapeyronModel(bool integrated, double T_ref, double P_ref, double dH_J_mol, double dV_m3_mol);
    double pressure(double T) const override;
    double dPdT(double T) const override;
    LnPressure lnPressure(double T) const override;

private:
    bool integrated_;
    double Tref_, Pref_, ratio_;  // ratio_ = ΔH/ΔV (Pa)
};

// "simon-glatzel": p = P_ref + a (θ^c − 1), θ = T/T_ref.
class SimonGlatzelModel final : public CurveModel {
public:
    SimonGlatzelModel(double T_ref, double P_ref, double a_Pa, double c);
    double pressure(double T) const override;
    double dPdT(double T) const override;
    LnPressure lnPressure(double T) const override;

private:
    double Tref_, Pref_, a_, c_;
};

// "melting-polynomial": p/P_ref = 1 + Σ a_i (θ − 1)^e_i.
// "iapws-melting": p/P_ref = 1 + Σ a_i (1 − θ^b_i), or with `log`:
// ln(p/P_ref) = Σ a_i (1 − θ^b_i)  (IAPWS R14-08, ice VII).
class MeltingSumModel final : public CurveModel {
public:
    enum class Kind { Polynomial, Iapws, IapwsLog };
    MeltingSumModel(Kind kind, double T_ref, double P_ref, std::vector<double> a,
                    std::vector<double> exponents);
    double pressure(double T) const override;
    double dPdT(double T) const override;
    LnPressure lnPressure(double T) const override;

private:
    // p/P_ref (or ln(p/P_ref) for IapwsLog) and its T-derivative.
    SumValue reduced(double T) const;

    Kind kind_;
    double Tref_, Pref_;
    std::vector<double> a_;
    PowerSet powers_;
};

}  // namespace pw
