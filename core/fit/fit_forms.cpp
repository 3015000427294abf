#include "core/fit/fit_forms.h"

#include <charconv>
#include <cmath>
#include <numbers>

#include "core/errors.h"
#include "core/fit/lsq.h"
#include "core/units.h"

namespace pw::fit {

void FitForm::checkPoints(const FitData &) const {}

namespace {

// For forms affine in ln p: ln p = c(T) + sum x_j phi_j(T); the weighted least-squares
// solution in ln p, found from c and phi evaluated at x = 0.
Eigen::VectorXd linearStart(const FitForm &form, const std::vector<FitPoint> &points) {
    const auto n = static_cast<Eigen::Index>(points.size());
    const auto p = static_cast<Eigen::Index>(form.parameterCount());
    Eigen::MatrixXd A(n, p);
    Eigen::VectorXd b(n);
    const Eigen::VectorXd zero = Eigen::VectorXd::Zero(p);
    Eigen::VectorXd grad(p);
    for (Eigen::Index i = 0; i < n; ++i) {
        const auto &pt = points[static_cast<std::size_t>(i)];
        const double sw = std::sqrt(pt.weight);
        const double c = form.lnP(pt.T_K, zero, grad);
        A.row(i) = sw * grad.transpose();
        b[i] = sw * (std::log(pt.P_Pa) - c);
    }
    return solveLinearLsq(A, b);
}

class ClausiusClapeyron final : public FitForm {
public:
    explicit ClausiusClapeyron(double Tref) : Tref_(Tref) {}
    std::string name() const override { return "clausius-clapeyron"; }
    std::vector<std::string> parameterNames() const override { return {"A", "B"}; }
    std::vector<std::string> parameterUnits() const override { return {"", "K"}; }
    Eigen::VectorXd start(const std::vector<FitPoint> &points) const override {
        return linearStart(*this, points);
    }
    double lnP(double T, const Eigen::VectorXd &x, Eigen::VectorXd &grad) const override {
        grad[0] = 1.0;
        grad[1] = -1.0 / T;
        return x[0] - x[1] / T;
    }
    ModelSpec spec(const Eigen::VectorXd &x) const override {
        ModelSpec s;
        s.form = name();
        s.scalars["T_ref"] = Tref_;
        s.scalars["P_ref"] = std::exp(x[0] - x[1] / Tref_);
        s.scalars["dH_J_mol"] = kGasConstant * x[1];
        return s;
    }

private:
    double Tref_;
};

class Antoine final : public FitForm {
public:
    std::string name() const override { return "antoine"; }
    std::vector<std::string> parameterNames() const override { return {"A", "B", "C"}; }
    std::vector<std::string> parameterUnits() const override { return {"", "K", "K"}; }
    Eigen::VectorXd start(const std::vector<FitPoint> &points) const override;
    double lnP(double T, const Eigen::VectorXd &x, Eigen::VectorXd &grad) const override {
        const double u = T + x[2];
        if (!(u > 0.0)) return NAN;
        grad[0] = kLn10;
        grad[1] = -kLn10 / u;
        grad[2] = kLn10 * x[1] / (u * u);
        return kLn10 * (x[0] - x[1] / u);
    }
    ModelSpec spec(const Eigen::VectorXd &x) const override {
        ModelSpec s;
        s.form = name();
        s.strings["base"] = "10";
        s.scalars["A"] = x[0];
        s.scalars["B"] = x[1];
        s.scalars["C"] = x[2];
        return s;
    }

private:
    static constexpr double kLn10 = std::numbers::ln10;
};

// Linearised Antoine: y (T + C) = A (T + C) - B with y = log10 p gives
// y T = A T + (A C - B) - C y, linear in A, D = A C - B and C.
Eigen::VectorXd Antoine::start(const std::vector<FitPoint> &points) const {
    const auto n = static_cast<Eigen::Index>(points.size());
    Eigen::MatrixXd M(n, 3);
    Eigen::VectorXd b(n);
    double Tmin = INFINITY;
    for (Eigen::Index i = 0; i < n; ++i) {
        const auto &pt = points[static_cast<std::size_t>(i)];
        const double y = std::log10(pt.P_Pa);
        const double sw = std::sqrt(pt.weight);
        M.row(i) << sw * pt.T_K, sw, -sw * y;
        b[i] = sw * y * pt.T_K;
        Tmin = std::min(Tmin, pt.T_K);
    }
    Eigen::VectorXd x(3);
    if (n >= 3) {
        const Eigen::VectorXd s = solveLinearLsq(M, b);
        x << s[0], s[0] * s[2] - s[1], s[2];
        if (x.allFinite() && x[1] > 0.0 && Tmin + x[2] > 0.0) return x;
    }
    // Fallback: Clausius–Clapeyron (C = 0).
    Eigen::MatrixXd A(n, 2);
    for (Eigen::Index i = 0; i < n; ++i) {
        const auto &pt = points[static_cast<std::size_t>(i)];
        A.row(i) << 1.0, -1.0 / pt.T_K;
        b[i] = std::log10(pt.P_Pa);
    }
    const Eigen::VectorXd s = solveLinearLsq(A, b);
    x << s[0], s[1], 0.0;
    return x;
}

std::string numberText(double v) {
    char buf[32];
    const auto r = std::to_chars(buf, buf + sizeof buf, v);
    return std::string(buf, r.ptr);
}

// Wagner and IAPWS-type sublimation: (T_ref/T) sum a_i f(T)^e_i.
class ReducedSum final : public FitForm {
public:
    ReducedSum(bool wagner, Reference ref, std::vector<double> e)
        : wagner_(wagner), ref_(ref), e_(std::move(e)) {}
    std::string name() const override { return wagner_ ? "wagner" : "iapws-sublimation"; }
    std::vector<std::string> parameterNames() const override { return coefficientNames(e_.size()); }
    std::vector<std::string> parameterUnits() const override {
        return std::vector<std::string>(e_.size(), "");
    }
    void checkPoints(const FitData &data) const override {
        if (!wagner_) return;
        for (const auto &p : data.points) {
            if (p.T_K >= ref_.T_K) {
                throw InputError(data.file, p.row, "T",
                                 "temperature " + numberText(p.T_K) +
                                     " K is not below the reference temperature " +
                                     numberText(ref_.T_K) + " K of the Wagner form");
            }
        }
    }
    Eigen::VectorXd start(const std::vector<FitPoint> &points) const override {
        return linearStart(*this, points);
    }
    double lnP(double T, const Eigen::VectorXd &x, Eigen::VectorXd &grad) const override {
        const double base = wagner_ ? 1.0 - T / ref_.T_K : T / ref_.T_K;
        double sum = 0.0;
        for (std::size_t i = 0; i < e_.size(); ++i) {
            const auto k = static_cast<Eigen::Index>(i);
            grad[k] = ref_.T_K / T * std::pow(base, e_[i]);
            sum += x[k] * grad[k];
        }
        return std::log(ref_.P_Pa) + sum;
    }
    ModelSpec spec(const Eigen::VectorXd &x) const override {
        ModelSpec s;
        s.form = name();
        s.scalars["T_ref"] = ref_.T_K;
        s.scalars["P_ref"] = ref_.P_Pa;
        s.arrays["a"] = std::vector<double>(x.data(), x.data() + x.size());
        s.arrays[wagner_ ? "exponents" : "b"] = e_;
        return s;
    }

private:
    bool wagner_;
    Reference ref_;
    std::vector<double> e_;
};

}  // namespace

std::unique_ptr<FitForm> makeClausiusClapeyronForm(double Tref_K) {
    return std::make_unique<ClausiusClapeyron>(Tref_K);
}
std::unique_ptr<FitForm> makeAntoineForm() { return std::make_unique<Antoine>(); }
std::unique_ptr<FitForm> makeWagnerForm(Reference ref, std::vector<double> exponents) {
    return std::make_unique<ReducedSum>(true, ref, std::move(exponents));
}
std::unique_ptr<FitForm> makeIapwsSublimationForm(Reference ref, std::vector<double> b) {
    return std::make_unique<ReducedSum>(false, ref, std::move(b));
}

std::vector<std::string> coefficientNames(std::size_t n) {
    std::vector<std::string> names;
    for (std::size_t i = 0; i < n; ++i) names.push_back("a" + std::to_string(i + 1));
    return names;
}

std::vector<double> parseExponents(const std::string &text) {
    std::vector<double> e;
    std::size_t start = 0;
    const auto sep = text.find(',') != std::string::npos ? ',' : '-';
    while (start <= text.size()) {
        auto end = text.find(sep, start);
        if (end == std::string::npos) end = text.size();
        std::string item = text.substr(start, end - start);
        while (!item.empty() && item.front() == ' ') item.erase(item.begin());
        while (!item.empty() && item.back() == ' ') item.pop_back();
        double v = 0.0;
        const auto [ptr, ec] = std::from_chars(item.data(), item.data() + item.size(), v);
        if (item.empty() || ec != std::errc() || ptr != item.data() + item.size() ||
            !std::isfinite(v) || v <= 0.0) {
            throw Error("exponent list '" + text + "': '" + item +
                        "' is not a positive number (write e.g. 1-1.5-3-6 or 1,1.5,3,6)");
        }
        e.push_back(v);
        start = end + 1;
    }
    return e;
}

}  // namespace pw::fit
