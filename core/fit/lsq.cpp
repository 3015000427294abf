#include "core/fit/lsq.h"

#include <algorithm>
#include <cmath>

#include "core/errors.h"

namespace pw::fit {
namespace {

// Marquardt's scaling: the damping acts on each parameter in proportion to its column norm.
Eigen::VectorXd columnScale(const Eigen::MatrixXd &J) {
    Eigen::VectorXd d = J.colwise().norm().transpose();
    for (Eigen::Index i = 0; i < d.size(); ++i) {
        if (!(d[i] > 0.0)) d[i] = 1.0;
    }
    return d;
}

// Solves min |J h + r|^2 + mu |D h|^2 via QR of [J; sqrt(mu) D].
Eigen::VectorXd dampedStep(const Eigen::MatrixXd &J, const Eigen::VectorXd &r,
                           const Eigen::VectorXd &d, double mu) {
    const auto n = J.rows();
    const auto p = J.cols();
    Eigen::MatrixXd A(n + p, p);
    A.topRows(n) = J;
    A.bottomRows(p) = (std::sqrt(mu) * d).asDiagonal();
    Eigen::VectorXd b = Eigen::VectorXd::Zero(n + p);
    b.head(n) = -r;
    return A.colPivHouseholderQr().solve(b);
}

}  // namespace

LmResult levenbergMarquardt(const ResidualFunction &f, const Eigen::VectorXd &x0,
                            const LmOptions &options) {
    LmResult s;
    s.x = x0;
    if (!f(s.x, s.r, &s.J) || !s.r.allFinite() || !s.J.allFinite()) {
        throw DomainError("the starting values of the fit are outside the model's domain");
    }
    double cost = s.r.squaredNorm();
    double mu = 1e-3;
    Eigen::VectorXd rNew;
    Eigen::MatrixXd JNew;
    for (s.iterations = 0; s.iterations < options.maxIterations; ++s.iterations) {
        const Eigen::VectorXd g = s.J.transpose() * s.r;
        if (g.lpNorm<Eigen::Infinity>() <= options.gradientTolerance || cost == 0.0) {
            s.converged = true;
            break;
        }
        const Eigen::VectorXd d = columnScale(s.J);
        const Eigen::VectorXd h = dampedStep(s.J, s.r, d, mu);
        const double scaledStep = (d.asDiagonal() * h).norm();
        const double scaledX = (d.asDiagonal() * s.x).norm();
        if (scaledStep <= options.stepTolerance * (scaledX + options.stepTolerance)) {
            s.converged = true;
            break;
        }
        const Eigen::VectorXd xNew = s.x + h;
        const bool ok = f(xNew, rNew, &JNew) && rNew.allFinite() && JNew.allFinite();
        const double costNew = ok ? rNew.squaredNorm() : INFINITY;
        if (costNew < cost) {
            // Converged when the cost no longer falls measurably.
            const bool flat = cost - costNew <= 1e-14 * cost;
            s.x = xNew;
            s.r = rNew;
            s.J = JNew;
            cost = costNew;
            mu = std::max(mu / 10.0, 1e-20);
            if (flat) {
                s.converged = true;
                break;
            }
        } else {
            mu *= 10.0;
            if (mu > 1e12) {
                s.converged = true;  // no descent direction left: at a minimum to precision
                break;
            }
        }
    }
    return s;
}

LsqStatistics lsqStatistics(const Eigen::MatrixXd &J, const Eigen::VectorXd &r) {
    LsqStatistics st;
    const auto n = J.rows();
    const auto p = J.cols();
    const Eigen::VectorXd d = columnScale(J);
    const Eigen::MatrixXd Js = J * d.cwiseInverse().asDiagonal();
    Eigen::JacobiSVD<Eigen::MatrixXd> svd(Js, Eigen::ComputeThinV);
    const Eigen::VectorXd sv = svd.singularValues();
    st.conditionNumber = sv[p - 1] > 0.0 ? sv[0] / sv[p - 1] : INFINITY;
    st.rank = static_cast<int>((sv.array() > sv[0] * 1e-14).count());
    st.covariance = Eigen::MatrixXd::Zero(p, p);
    st.stdErrors = Eigen::VectorXd::Constant(p, NAN);
    if (n > p && st.rank == p) {
        const double s2 = r.squaredNorm() / static_cast<double>(n - p);
        const Eigen::MatrixXd V = svd.matrixV();
        const Eigen::MatrixXd VsInv = V * sv.cwiseInverse().asDiagonal();
        const Eigen::MatrixXd covScaled = s2 * VsInv * VsInv.transpose();
        st.covariance = d.cwiseInverse().asDiagonal() * covScaled * d.cwiseInverse().asDiagonal();
        st.stdErrors = st.covariance.diagonal().cwiseSqrt();
    }
    return st;
}

Eigen::VectorXd solveLinearLsq(const Eigen::MatrixXd &A, const Eigen::VectorXd &b) {
    const Eigen::VectorXd d = columnScale(A);
    const Eigen::MatrixXd As = A * d.cwiseInverse().asDiagonal();
    const Eigen::VectorXd y = As.colPivHouseholderQr().solve(b);
    return d.cwiseInverse().asDiagonal() * y;
}

}  // namespace pw::fit
