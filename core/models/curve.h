#pragma once
// Common base of the equation forms in core/models/: every form gives ln p and d(ln p)/dT
// in one evaluation (the inverse solver needs both), and finds its own domain (the
// temperatures around its reference point where it is finite and monotonic).
#include <string>
#include <string_view>
#include <vector>

#include "core/boundary_model.h"

namespace pw {

// ln p (p in Pa) and its derivative d(ln p)/dT (1/K) at one temperature.
struct LnPressure {
    double lnp = 0.0;
    double slope = 0.0;
};

class CurveModel : public BoundaryModel {
public:
    // ln p and d(ln p)/dT; NaN outside the equation's definition.
    virtual LnPressure lnPressure(double T) const = 0;

    double pressure(double T) const override;
    double dPdT(double T) const override;
    std::string_view form() const override { return form_; }
    TRange domain() const override { return domain_; }

protected:
    explicit CurveModel(std::string form) : form_(std::move(form)) {}
    // Sets the domain to the part of `candidate` around `anchor` (a temperature inside it)
    // where ln p is finite and d(ln p)/dT keeps the sign it has at the anchor, checked on a
    // fine grid. An anchor of NaN takes the longest such run. Throws ModelSpecError (naming
    // `parameter`) when nothing is left. Call it at the end of the final class's constructor.
    void findDomain(TRange candidate, double anchor, const std::string &parameter);

private:
    std::string form_;
    TRange domain_;
};

// Σ a_i x^e_i and its derivative d/dx.
struct SumValue {
    double value = 0.0;
    double deriv = 0.0;
};

// x^e for a fixed set of exponents, fast where the exponent is a multiple of 1/4 (integer
// powers of x^(1/4) by repeated squaring) and by exp(e ln x) otherwise. Negative x is allowed
// only when every exponent is an integer.
class PowerSet {
public:
    PowerSet() = default;
    explicit PowerSet(std::vector<double> exponents);
    // Σ a_i x^e_i and its derivative; a.size() == size().
    SumValue sum(const std::vector<double> &a, double x) const;
    std::size_t size() const { return exponents_.size(); }
    const std::vector<double> &exponents() const { return exponents_; }
    bool allIntegers() const { return allIntegers_; }

private:
    std::vector<double> exponents_;
    std::vector<int> quarters_;  // e * 4 when integral and |e| <= 256, else kNoQuarter
    bool allIntegers_ = true;
    bool needRoot_ = false;  // some exponent is a multiple of 1/4 but not an integer
    bool needLog_ = false;   // some exponent is not a multiple of 1/4
};

}  // namespace pw
