#pragma once
// Small least-squares engine for the boundary fits: Levenberg–Marquardt with analytic
// Jacobians (each step solved by QR of the augmented system, never by normal equations),
// and the statistics of the solution (covariance, standard errors, condition number).
#include <Eigen/Dense>
#include <functional>

namespace pw::fit {

// Fills the residual vector r (n) and, when J is not null, its Jacobian dr/dx (n x p).
// Returns false when x lies outside the model's domain (the step is then rejected).
using ResidualFunction =
    std::function<bool(const Eigen::VectorXd &x, Eigen::VectorXd &r, Eigen::MatrixXd *J)>;

struct LmOptions {
    int maxIterations = 500;
    double stepTolerance = 1e-15;      // relative size of the step that counts as converged
    double gradientTolerance = 1e-30;  // |J^T r|_inf that counts as converged
};

struct LmResult {
    Eigen::VectorXd x;
    Eigen::VectorXd r;
    Eigen::MatrixXd J;
    int iterations = 0;
    bool converged = false;
};

// Throws DomainError when the start point itself is outside the model's domain.
LmResult levenbergMarquardt(const ResidualFunction &f, const Eigen::VectorXd &x0,
                            const LmOptions &options = {});

struct LsqStatistics {
    Eigen::MatrixXd covariance;  // s^2 (J^T J)^-1, s^2 = r.r / (n - p); zero when n == p
    Eigen::VectorXd stdErrors;
    double conditionNumber = 0.0;  // of J with unit-norm columns (scale-free)
    int rank = 0;
};

LsqStatistics lsqStatistics(const Eigen::MatrixXd &J, const Eigen::VectorXd &r);

// Linear weighted least squares min |A x - b| by column-pivoting QR (rank-revealing).
Eigen::VectorXd solveLinearLsq(const Eigen::MatrixXd &A, const Eigen::VectorXd &b);

}  // namespace pw::fit
