#include "core/fit/fit.h"

#include <fmt/format.h>
#include <algorithm>
#include <cmath>

#include "core/errors.h"
#include "core/fit/lsq.h"

namespace pw::fit {
namespace {

constexpr double kIllConditioned = 1e5;  // scaled condition number above which a warning is given

Reference reference(double T, double P, const char *what, const std::string &model) {
    if (!(std::isfinite(T) && T > 0.0 && std::isfinite(P) && P > 0.0)) {
        throw Error(
            fmt::format("model '{}' needs the {} temperature and pressure (positive, "
                        "in K and Pa)",
                        model, what));
    }
    return {T, P};
}

std::vector<double> exponentsOr(const std::string &text, const char *fallback) {
    return parseExponents(text.empty() ? std::string(fallback) : text);
}

std::unique_ptr<FitForm> makeForm(const FitRequest &rq, const FitData &data) {
    const auto &m = rq.model;
    const auto models = availableModels(rq.kind);
    if (std::find(models.begin(), models.end(), m) == models.end()) {
        std::string list;
        for (const auto &x : models) list += (list.empty() ? "" : ", ") + x;
        throw Error(fmt::format("model '{}' is not offered for a {} boundary (choose one of: {})",
                                m, toString(rq.kind), list));
    }
    if (m == "clausius-clapeyron") {
        double sum = 0.0;
        for (const auto &p : data.points) sum += 1.0 / p.T_K;
        return makeClausiusClapeyronForm(static_cast<double>(data.points.size()) / sum);
    }
    if (m == "antoine") return makeAntoineForm();
    if (m == "wagner") {
        const bool vap = rq.kind == BoundaryKind::Vaporization;
        const auto ref = vap ? reference(rq.Tc_K, rq.Pc_Pa, "critical", m)
                             : reference(rq.Tt_K, rq.Pt_Pa, "triple-point", m);
        return makeWagnerForm(ref, exponentsOr(rq.exponents, "1-1.5-3-6"));
    }
    if (m == "iapws-sublimation") {
        if (rq.exponents.empty()) {
            throw Error(
                "model 'iapws-sublimation' needs its exponents b_i (e.g. --exponents "
                "0.00333,1.20667,1.70333)");
        }
        return makeIapwsSublimationForm(reference(rq.Tt_K, rq.Pt_Pa, "triple-point", m),
                                        parseExponents(rq.exponents));
    }
    const auto ref = reference(rq.Tt_K, rq.Pt_Pa, "triple-point", m);
    if (m == "simon-glatzel") return makeSimonGlatzelForm(ref);
    return makeMeltingPolynomialForm(ref, exponentsOr(rq.exponents, "1,2,3"));
}

// Residuals r_i = sqrt(w_i) (y_i - model_i) with y = ln p (relative) or p (absolute).
ResidualFunction residualFunction(const FitForm &form, const std::vector<FitPoint> &points,
                                  ResidualKind kind) {
    return
        [&form, &points, kind](const Eigen::VectorXd &x, Eigen::VectorXd &r, Eigen::MatrixXd *J) {
            const auto n = static_cast<Eigen::Index>(points.size());
            r.resize(n);
            if (J) J->resize(n, x.size());
            Eigen::VectorXd grad(x.size());
            for (Eigen::Index i = 0; i < n; ++i) {
                const auto &pt = points[static_cast<std::size_t>(i)];
                const double sw = std::sqrt(pt.weight);
                const double lnp = form.lnP(pt.T_K, x, grad);
                if (!std::isfinite(lnp)) return false;
                if (kind == ResidualKind::Relative) {
                    r[i] = sw * (std::log(pt.P_Pa) - lnp);
                    if (J) J->row(i) = -sw * grad.transpose();
                } else {
                    const double p = std::exp(lnp);
                    r[i] = sw * (pt.P_Pa - p);
                    if (J) J->row(i) = -sw * p * grad.transpose();
                }
            }
            return true;
        };
}

LmResult solve(const FitForm &form, const std::vector<FitPoint> &points, ResidualKind kind,
               const Eigen::VectorXd &x0) {
    return levenbergMarquardt(residualFunction(form, points, kind), x0);
}

double evaluate(const FitForm &form, const Eigen::VectorXd &x, double T) {
    Eigen::VectorXd grad(x.size());
    return std::exp(form.lnP(T, x, grad));
}

double rms(const std::vector<double> &v) {
    double s = 0.0;
    for (const double x : v) s += x * x;
    return std::sqrt(s / static_cast<double>(v.size()));
}

// Leave-one-out: refit without each point (from the full solution) and predict it.
void crossValidate(FitResult &res, const FitForm &form, const std::vector<FitPoint> &points,
                   ResidualKind kind) {
    if (points.size() <= form.parameterCount()) return;
    std::vector<double> loo;
    for (std::size_t i = 0; i < points.size(); ++i) {
        std::vector<FitPoint> rest = points;
        rest.erase(rest.begin() + static_cast<std::ptrdiff_t>(i));
        try {
            const auto s = solve(form, rest, kind, res.x);
            const double p = evaluate(form, s.x, points[i].T_K);
            res.residuals[i].loo_pct = 100.0 * (points[i].P_Pa - p) / points[i].P_Pa;
            loo.push_back(res.residuals[i].loo_pct);
        } catch (const DomainError &) {
            // This subset cannot be fitted; leave its entry NaN.
        }
    }
    if (loo.empty()) return;
    res.looRms_pct = rms(loo);
    if (res.looRms_pct > 3.0 * res.rms_pct && res.looRms_pct > 1e-6) {
        res.warnings.push_back(fmt::format(
            "possible over-fitting: leave-one-out RMS deviation {:.3g} % is more than 3x the "
            "fit's {:.3g} %; use a form with fewer parameters or more data",
            res.looRms_pct, res.rms_pct));
    }
}

void addStatistics(FitResult &res, const FitForm &form, const std::vector<FitPoint> &points) {
    std::vector<double> pct;
    double sumPa = 0.0;
    res.maxAbs_pct = 0.0;
    res.maxAbs_Pa = 0.0;
    for (const auto &pt : points) {
        FitResidual r;
        r.row = pt.row;
        r.T_K = pt.T_K;
        r.P_Pa = pt.P_Pa;
        r.weight = pt.weight;
        r.Pfit_Pa = evaluate(form, res.x, pt.T_K);
        r.dev_Pa = pt.P_Pa - r.Pfit_Pa;
        r.dev_pct = 100.0 * r.dev_Pa / pt.P_Pa;
        pct.push_back(r.dev_pct);
        sumPa += r.dev_Pa * r.dev_Pa;
        res.maxAbs_pct = std::max(res.maxAbs_pct, std::abs(r.dev_pct));
        res.maxAbs_Pa = std::max(res.maxAbs_Pa, std::abs(r.dev_Pa));
        res.residuals.push_back(r);
    }
    res.rms_pct = rms(pct);
    res.rms_Pa = std::sqrt(sumPa / static_cast<double>(points.size()));
}

void addWarnings(FitResult &res, const FitRequest &rq) {
    if (res.degreesOfFreedom == 0) {
        res.warnings.push_back(
            "exactly determined: as many points as parameters, so the curve passes through "
            "every point and no standard errors or over-fitting check can be given");
    }
    if (res.conditionNumber > kIllConditioned) {
        res.warnings.push_back(fmt::format(
            "ill-conditioned fit (condition number {:.3g}): the parameters are strongly "
            "correlated and poorly determined individually; widen the temperature range or "
            "use fewer parameters",
            res.conditionNumber));
    }
    const auto ends = [&](double T, const char *what) {
        if (std::isfinite(T) && !res.validity.contains(T)) {
            res.warnings.push_back(fmt::format(
                "the data span {:.6g}-{:.6g} K does not reach the {} ({:.6g} K): the curve is "
                "valid only over the data span and flagged as extrapolated beyond it",
                res.validity.min_K, res.validity.max_K, what, T));
        }
    };
    if (rq.kind == BoundaryKind::Vaporization) ends(rq.Tc_K, "critical temperature");
    if (rq.kind != BoundaryKind::SolidSolid) ends(rq.Tt_K, "triple-point temperature");
}

}  // namespace

double FitResult::pressure(double T_K) const { return evaluate(*form, x, T_K); }

std::vector<std::string> availableModels(BoundaryKind kind) {
    switch (kind) {
        case BoundaryKind::Vaporization:
            return {"clausius-clapeyron", "antoine", "wagner"};
        case BoundaryKind::Sublimation:
            return {"clausius-clapeyron", "iapws-sublimation", "wagner", "antoine"};
        case BoundaryKind::Melting:
            return {"simon-glatzel", "melting-polynomial"};
        case BoundaryKind::SolidSolid:
            break;
    }
    return {};
}

FitResult fitBoundary(const FitData &data, const FitRequest &request) {
    validateFitData(data, 0);
    std::shared_ptr<const FitForm> form = makeForm(request, data);
    validateFitData(data, form->parameterCount());
    form->checkPoints(data);
    auto points = data.points;
    std::sort(points.begin(), points.end(),
              [](const FitPoint &a, const FitPoint &b) { return a.T_K < b.T_K; });

    FitResult res;
    res.kind = request.kind;
    res.form = form;
    const auto lm = solve(*form, points, request.residuals, form->start(points));
    if (!lm.converged) {
        throw Error(fmt::format("the {} fit did not converge in {} iterations", form->name(),
                                lm.iterations));
    }
    res.x = lm.x;
    res.iterations = lm.iterations;
    res.spec = form->spec(lm.x);
    res.points = points.size();
    res.degreesOfFreedom = static_cast<long>(points.size() - form->parameterCount());
    const auto st = lsqStatistics(lm.J, lm.r);
    if (st.rank < static_cast<int>(form->parameterCount())) {
        throw Error(
            fmt::format("the {} parameters cannot all be determined from these data "
                        "(rank {} of {})",
                        form->name(), st.rank, form->parameterCount()));
    }
    res.covariance = st.covariance;
    res.conditionNumber = st.conditionNumber;
    const auto names = form->parameterNames();
    const auto units = form->parameterUnits();
    for (std::size_t i = 0; i < names.size(); ++i) {
        const auto k = static_cast<Eigen::Index>(i);
        res.parameters.push_back({names[i], units[i], lm.x[k], st.stdErrors[k]});
    }
    if (form->name() == "clausius-clapeyron") {
        res.dH_J_mol = kGasConstant * lm.x[1];
        res.dHStdError_J_mol = kGasConstant * st.stdErrors[1];
    }
    res.validity = {points.front().T_K, points.back().T_K};
    addStatistics(res, *form, points);
    addWarnings(res, request);
    if (request.crossValidate) crossValidate(res, *form, points, request.residuals);
    return res;
}

}  // namespace pw::fit
