#pragma once
// Corresponding-states vapor-pressure estimates from T_c, p_c and the acentric factor ω, for
// substances without measured vapor-pressure data (B. E. Poling, J. M. Prausnitz,
// J. P. O'Connell, The Properties of Gases and Liquids, 5th ed., McGraw-Hill 2001, §7-4;
// coefficients from memory, checked in tests/core/models against the acentric-factor
// definition p(0.7 T_c) = p_c 10^−(1+ω)).
#include "core/models/curve.h"

namespace pw {

enum class CorrespondingStates { LeeKesler, AmbroseWalton };

// ln p_r = f0(T_r) + ω f1(T_r) [+ ω² f2(T_r) for Ambrose–Walton].
class CorrespondingStatesModel final : public CurveModel {
public:
    CorrespondingStatesModel(CorrespondingStates kind, double T_c, double P_c, double omega);
    LnPressure lnPressure(double T) const override;

private:
    LnPressure leeKesler(double Tr) const;
    LnPressure ambroseWalton(double Tr) const;

    CorrespondingStates kind_;
    double Tc_, lnPc_, omega_;
};

}  // namespace pw
