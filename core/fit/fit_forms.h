#pragma once
// The equation forms a boundary fit can use, each as ln p(T; x) with its analytic gradient,
// a starting estimate from the data, and the ModelSpec it produces (forms and parameter names
// as in docs/substance-format.md; every spec is written in K and Pa).
#include <Eigen/Dense>
#include <memory>
#include <string>
#include <vector>

#include "core/fit/fit_data.h"
#include "core/model_spec.h"

namespace pw::fit {

class FitForm {
public:
    virtual ~FitForm() = default;
    virtual std::string name() const = 0;  // the ModelSpec form
    virtual std::vector<std::string> parameterNames() const = 0;
    // Units of each parameter as shown to users ("", "K", "Pa").
    virtual std::vector<std::string> parameterUnits() const = 0;
    // Throws InputError (naming the row) for points the form cannot represent (T >= T_c...).
    virtual void checkPoints(const FitData &data) const;
    // Starting parameters; for forms linear in ln p this is already the least-squares optimum.
    virtual Eigen::VectorXd start(const std::vector<FitPoint> &points) const = 0;
    // ln(p / Pa) at T and d ln p / dx into grad (size p). NaN when x is outside the domain.
    virtual double lnP(double T_K, const Eigen::VectorXd &x, Eigen::VectorXd &grad) const = 0;
    virtual ModelSpec spec(const Eigen::VectorXd &x) const = 0;
    std::size_t parameterCount() const { return parameterNames().size(); }
};

// Reference point of the forms that need one (Wagner: T_c, p_c; IAPWS-type sublimation,
// Simon–Glatzel and melting polynomial: the triple point).
struct Reference {
    double T_K = 0.0;
    double P_Pa = 0.0;
};

// ln p = A - B/T; the spec is written with T_ref = Tref_K (any temperature: the fit uses a
// typical one of the data) and P_ref = p(T_ref), dH = R B.
std::unique_ptr<FitForm> makeClausiusClapeyronForm(double Tref_K);
std::unique_ptr<FitForm> makeAntoineForm();
// ln(p/P_ref) = (T_ref/T) sum a_i tau^e_i, tau = 1 - T/T_ref.
std::unique_ptr<FitForm> makeWagnerForm(Reference ref, std::vector<double> exponents);
// ln(p/P_ref) = (T_ref/T) sum a_i theta^b_i, theta = T/T_ref.
std::unique_ptr<FitForm> makeIapwsSublimationForm(Reference ref, std::vector<double> b);
// p = P_ref + a (theta^c - 1).
std::unique_ptr<FitForm> makeSimonGlatzelForm(Reference ref);
// p / P_ref = 1 + sum a_i (theta - 1)^e_i.
std::unique_ptr<FitForm> makeMeltingPolynomialForm(Reference ref, std::vector<double> exponents);

// "1-1.5-3-6", "1-1.5-2.5-5" or an explicit list "1,1.5,3,6" (also "1-1.5-2-4").
// Throws pw::Error for an empty list, a non-number or a non-positive exponent.
std::vector<double> parseExponents(const std::string &text);

// "a1", "a2", ... "an": the coefficient names of the sum forms.
std::vector<std::string> coefficientNames(std::size_t n);

}  // namespace pw::fit
