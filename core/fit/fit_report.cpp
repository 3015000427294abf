// fitReportJson: the fit result as JSON (NaN is written as null).
#include <nlohmann/json.hpp>

#include "core/fit/fit_output.h"

namespace pw::fit {
namespace {

nlohmann::json specJson(const ModelSpec &spec) {
    nlohmann::json j;
    j["model"] = spec.form;
    nlohmann::json params = nlohmann::json::object();
    for (const auto &[k, v] : spec.scalars) params[k] = v;
    for (const auto &[k, v] : spec.arrays) params[k] = v;
    for (const auto &[k, v] : spec.strings) params[k] = v;
    for (const auto &[k, v] : spec.flags) params[k] = v;
    j["parameters"] = params;
    j["units"] = {{"T", std::string(symbol(spec.tUnit))}, {"P", std::string(symbol(spec.pUnit))}};
    return j;
}

nlohmann::json residualsJson(const FitResult &r) {
    nlohmann::json rows = nlohmann::json::array();
    for (const auto &x : r.residuals) {
        rows.push_back({{"row", x.row},
                        {"T_K", x.T_K},
                        {"P_Pa", x.P_Pa},
                        {"P_fit_Pa", x.Pfit_Pa},
                        {"dev_Pa", x.dev_Pa},
                        {"dev_pct", x.dev_pct},
                        {"loo_dev_pct", x.loo_pct},
                        {"weight", x.weight}});
    }
    return rows;
}

}  // namespace

std::string fitReportJson(const FitResult &r) {
    nlohmann::json j;
    j["boundary"] = std::string(toString(r.kind));
    j["spec"] = specJson(r.spec);
    nlohmann::json params = nlohmann::json::array();
    for (const auto &p : r.parameters) {
        params.push_back(
            {{"name", p.name}, {"unit", p.unit}, {"value", p.value}, {"std_error", p.stdError}});
    }
    j["parameters"] = params;
    nlohmann::json cov = nlohmann::json::array();
    for (Eigen::Index i = 0; i < r.covariance.rows(); ++i) {
        std::vector<double> row(static_cast<std::size_t>(r.covariance.cols()));
        for (Eigen::Index k = 0; k < r.covariance.cols(); ++k) {
            row[static_cast<std::size_t>(k)] = r.covariance(i, k);
        }
        cov.push_back(row);
    }
    j["covariance"] = cov;
    if (r.dH_J_mol) j["dH_J_mol"] = {{"value", *r.dH_J_mol}, {"std_error", *r.dHStdError_J_mol}};
    j["statistics"] = {{"points", r.points},
                       {"degrees_of_freedom", r.degreesOfFreedom},
                       {"rms_dev_pct", r.rms_pct},
                       {"max_abs_dev_pct", r.maxAbs_pct},
                       {"rms_dev_Pa", r.rms_Pa},
                       {"max_abs_dev_Pa", r.maxAbs_Pa},
                       {"loo_rms_dev_pct", r.looRms_pct},
                       {"condition_number", r.conditionNumber},
                       {"iterations", r.iterations}};
    j["validity"] = {{"T_min", r.validity.min_K}, {"T_max", r.validity.max_K}, {"unit", "K"}};
    j["residuals"] = residualsJson(r);
    j["warnings"] = r.warnings;
    return j.dump(2);
}

}  // namespace pw::fit
