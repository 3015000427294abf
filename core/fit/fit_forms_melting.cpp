// Melting-line forms: Simon–Glatzel and the melting polynomial, fitted by Levenberg–Marquardt
// in ln p after a linear start.
#include <cmath>
#include <limits>

#include "core/errors.h"
#include "core/fit/fit_forms.h"
#include "core/fit/lsq.h"

namespace pw::fit {
namespace {

// p = P_ref + a (theta^c - 1), parameters (a [Pa], c).
class SimonGlatzel final : public FitForm {
public:
    explicit SimonGlatzel(Reference ref) : ref_(ref) {}
    std::string name() const override { return "simon-glatzel"; }
    std::vector<std::string> parameterNames() const override { return {"a", "c"}; }
    std::vector<std::string> parameterUnits() const override { return {"Pa", ""}; }
    Eigen::VectorXd start(const std::vector<FitPoint> &points) const override;
    double lnP(double T, const Eigen::VectorXd &x, Eigen::VectorXd &grad) const override {
        const double theta = T / ref_.T_K;
        const double tc = std::pow(theta, x[1]);
        const double p = ref_.P_Pa + x[0] * (tc - 1.0);
        if (!(p > 0.0)) return NAN;
        grad[0] = (tc - 1.0) / p;
        grad[1] = x[0] * tc * std::log(theta) / p;
        return std::log(p);
    }
    ModelSpec spec(const Eigen::VectorXd &x) const override {
        ModelSpec s;
        s.form = name();
        s.scalars["T_ref"] = ref_.T_K;
        s.scalars["P_ref"] = ref_.P_Pa;
        s.scalars["a"] = x[0];
        s.scalars["c"] = x[1];
        return s;
    }

private:
    Reference ref_;
};

// For each trial c on a log grid, a is linear: minimise sum w ((p - P_ref - a phi) / p)^2;
// keep the pair with the smallest relative residual.
Eigen::VectorXd SimonGlatzel::start(const std::vector<FitPoint> &points) const {
    Eigen::VectorXd best(2);
    best << 0.0, 1.0;
    double bestCost = std::numeric_limits<double>::infinity();
    for (int k = 0; k <= 120; ++k) {
        const double c = std::pow(10.0, -1.0 + 3.5 * k / 120.0);  // 0.1 ... 316
        double num = 0.0;
        double den = 0.0;
        for (const auto &p : points) {
            const double phi = (std::pow(p.T_K / ref_.T_K, c) - 1.0) / p.P_Pa;
            num += p.weight * phi * (p.P_Pa - ref_.P_Pa) / p.P_Pa;
            den += p.weight * phi * phi;
        }
        if (!(den > 0.0)) continue;
        const double a = num / den;
        double cost = 0.0;
        for (const auto &p : points) {
            const double model = ref_.P_Pa + a * (std::pow(p.T_K / ref_.T_K, c) - 1.0);
            cost += model > 0.0 ? p.weight * std::pow(std::log(p.P_Pa / model), 2)
                                : std::numeric_limits<double>::infinity();
        }
        if (cost < bestCost) {
            bestCost = cost;
            best << a, c;
        }
    }
    return best;
}

// p / P_ref = 1 + sum a_i (theta - 1)^e_i.
class MeltingPolynomial final : public FitForm {
public:
    MeltingPolynomial(Reference ref, std::vector<double> e) : ref_(ref), e_(std::move(e)) {}
    std::string name() const override { return "melting-polynomial"; }
    std::vector<std::string> parameterNames() const override { return coefficientNames(e_.size()); }
    std::vector<std::string> parameterUnits() const override {
        return std::vector<std::string>(e_.size(), "");
    }
    void checkPoints(const FitData &data) const override {
        for (const double e : e_) {
            if (e == std::floor(e)) continue;
            for (const auto &p : data.points) {
                if (p.T_K < ref_.T_K) {
                    throw InputError(data.file, p.row, "T",
                                     "below the reference temperature, a non-integer exponent "
                                     "of (T/T_ref - 1) is undefined; use integer exponents");
                }
            }
        }
    }
    Eigen::VectorXd start(const std::vector<FitPoint> &points) const override {
        const auto n = static_cast<Eigen::Index>(points.size());
        const auto m = static_cast<Eigen::Index>(e_.size());
        Eigen::MatrixXd A(n, m);
        Eigen::VectorXd b(n);
        for (Eigen::Index i = 0; i < n; ++i) {
            const auto &p = points[static_cast<std::size_t>(i)];
            const double s = std::sqrt(p.weight) * ref_.P_Pa / p.P_Pa;  // relative residuals
            for (Eigen::Index j = 0; j < m; ++j) {
                A(i, j) = s * std::pow(p.T_K / ref_.T_K - 1.0, e_[static_cast<std::size_t>(j)]);
            }
            b[i] = s * (p.P_Pa / ref_.P_Pa - 1.0);
        }
        return solveLinearLsq(A, b);
    }
    double lnP(double T, const Eigen::VectorXd &x, Eigen::VectorXd &grad) const override {
        const double d = T / ref_.T_K - 1.0;
        double q = 1.0;
        for (std::size_t i = 0; i < e_.size(); ++i) {
            const auto k = static_cast<Eigen::Index>(i);
            grad[k] = std::pow(d, e_[i]);
            q += x[k] * grad[k];
        }
        if (!(q > 0.0)) return NAN;
        grad /= q;
        return std::log(ref_.P_Pa * q);
    }
    ModelSpec spec(const Eigen::VectorXd &x) const override {
        ModelSpec s;
        s.form = name();
        s.scalars["T_ref"] = ref_.T_K;
        s.scalars["P_ref"] = ref_.P_Pa;
        s.arrays["a"] = std::vector<double>(x.data(), x.data() + x.size());
        s.arrays["exponents"] = e_;
        return s;
    }

private:
    Reference ref_;
    std::vector<double> e_;
};

}  // namespace

std::unique_ptr<FitForm> makeSimonGlatzelForm(Reference ref) {
    return std::make_unique<SimonGlatzel>(ref);
}
std::unique_ptr<FitForm> makeMeltingPolynomialForm(Reference ref, std::vector<double> exponents) {
    return std::make_unique<MeltingPolynomial>(ref, std::move(exponents));
}

}  // namespace pw::fit
