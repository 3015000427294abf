#pragma once
// Fitting a phase-boundary equation to measurements (docs/fitting.md). The result carries the
// ModelSpec (evaluate it with makeModel), the parameters with standard errors and covariance,
// the residuals, summary statistics, a leave-one-out check and warnings.
//
// Typical use (CLI, desktop dialog):
//   auto data = pw::fit::readFitCsvFile(path);
//   pw::fit::FitRequest req{.kind = pw::BoundaryKind::Vaporization, .model = "wagner",
//                           .Tc_K = 647.096, .Pc_Pa = 22.064e6};
//   pw::fit::FitResult r = pw::fit::fitBoundary(data, req);
#include <Eigen/Dense>
#include <limits>
#include <memory>
#include <optional>
#include <string>
#include <vector>

#include "core/boundary_model.h"
#include "core/fit/fit_data.h"
#include "core/fit/fit_forms.h"
#include "core/model_spec.h"
#include "core/substance.h"

namespace pw::fit {

enum class ResidualKind {
    Relative,  // residuals in ln p: every point counts by its relative error (default)
    Absolute,  // residuals in p (Pa): high-pressure points dominate
};

struct FitRequest {
    BoundaryKind kind = BoundaryKind::Vaporization;
    // "clausius-clapeyron", "antoine", "wagner", "iapws-sublimation", "simon-glatzel",
    // "melting-polynomial" (see availableModels()).
    std::string model;
    double Tc_K = kNaN;  // critical point: the reference of "wagner" for vaporization
    double Pc_Pa = kNaN;
    double Tt_K = kNaN;  // triple point: reference of the sublimation and melting forms
    double Pt_Pa = kNaN;
    // "wagner": exponent set "1-1.5-3-6" (default), "1-1.5-2.5-5" or an explicit list;
    // "iapws-sublimation": the b_i (required); "melting-polynomial": the e_i (default "1,2,3").
    std::string exponents;
    ResidualKind residuals = ResidualKind::Relative;
    bool crossValidate = true;  // leave-one-out refits
};

struct FitParameter {
    std::string name;  // "A", "B", "C", "a1"...
    std::string unit;  // "", "K", "Pa"
    double value = kNaN;
    double stdError = kNaN;  // NaN when there are no degrees of freedom
};

struct FitResidual {
    long row = 0;
    double T_K = kNaN;
    double P_Pa = kNaN;     // measured
    double Pfit_Pa = kNaN;  // the fitted equation at T_K
    double dev_Pa = kNaN;   // P_Pa - Pfit_Pa
    double dev_pct = kNaN;  // 100 (P_Pa - Pfit_Pa) / P_Pa
    double loo_pct = kNaN;  // same, from the fit without this point (leave-one-out)
    double weight = 1.0;
};

struct FitResult {
    BoundaryKind kind = BoundaryKind::Vaporization;
    ModelSpec spec;  // form and parameters in K and Pa; makeModel(spec) evaluates it
    std::vector<FitParameter> parameters;
    Eigen::MatrixXd covariance;  // of the parameters, in the order of `parameters`
    std::vector<FitResidual> residuals;
    std::size_t points = 0;
    long degreesOfFreedom = 0;
    double rms_pct = kNaN;  // root mean square of dev_pct
    double maxAbs_pct = kNaN;
    double rms_Pa = kNaN;
    double maxAbs_Pa = kNaN;
    double looRms_pct = kNaN;  // RMS of loo_pct; much above rms_pct means over-fitting
    TRange validity;           // the data's temperature span
    double conditionNumber = kNaN;
    int iterations = 0;
    // Clausius–Clapeyron forms: dH = R B with its standard error (J/mol).
    std::optional<double> dH_J_mol;
    std::optional<double> dHStdError_J_mol;
    std::vector<std::string> warnings;

    // The fitted equation at T (Pa), evaluated by the fitting form itself (no makeModel).
    double pressure(double T_K) const;

    std::shared_ptr<const FitForm> form;  // the form that was fitted
    Eigen::VectorXd x;                    // its parameter values
};

// The model names offered for a boundary kind.
std::vector<std::string> availableModels(BoundaryKind kind);

// Validates the data (validateFitData and the form's own checks) and the request, fits, and
// evaluates. Throws InputError for bad data (naming the row), pw::Error for a bad request
// (unknown model, missing or non-positive reference point...) or a failed fit.
FitResult fitBoundary(const FitData &data, const FitRequest &request);

}  // namespace pw::fit
