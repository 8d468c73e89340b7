#include "design/design_newton.hpp"

#include <algorithm>
#include <cmath>

#include <Eigen/Dense>

#include "numerics/policy.hpp"

namespace coilwright::internal {

namespace {

// Below this |F| a step that does not halve it means the rounding floor is reached.
constexpr double kFloorCheck = 1e-11;

double max_abs(const std::vector<double>& v) {
    double m = 0.0;
    for (double e : v) m = std::max(m, std::isfinite(e) ? std::fabs(e) : HUGE_VAL);
    return m;
}

}  // namespace

std::vector<double> damped_newton(const Residuals& f, const Admissible& admissible, std::vector<double> x,
                                  double target, double& residual) {
    const std::size_t m = x.size();
    std::vector<double> fx = f(x);
    residual = max_abs(fx);
    for (StepBudget budget(60, "the design's Newton iteration"); residual > target; budget.step()) {
        Eigen::MatrixXd jac(static_cast<Eigen::Index>(fx.size()), static_cast<Eigen::Index>(m));
        for (std::size_t j = 0; j < m; ++j) {
            // Central differences: truncation h^2 ~ 1e-12 against rounding 1e-16 / h ~ 1e-10.
            const double h = 1e-6 * std::max(1.0, std::fabs(x[j]));
            std::vector<double> up = x, down = x;
            up[j] += h;
            down[j] -= h;
            const std::vector<double> fu = f(up), fd = f(down);
            for (std::size_t i = 0; i < fx.size(); ++i)
                jac(static_cast<Eigen::Index>(i), static_cast<Eigen::Index>(j)) = (fu[i] - fd[i]) / (2.0 * h);
        }
        Eigen::VectorXd rhs(static_cast<Eigen::Index>(fx.size()));
        for (std::size_t i = 0; i < fx.size(); ++i) rhs(static_cast<Eigen::Index>(i)) = -fx[i];
        const Eigen::ColPivHouseholderQR<Eigen::MatrixXd> qr(jac);
        if (qr.rank() < static_cast<Eigen::Index>(m)) raise_no_convergence("the design equations are singular here");
        const Eigen::VectorXd dx = qr.solve(rhs);
        double scale = 1.0;
        bool improved = false, stalled = false;
        for (StepBudget halving(40, "the design's step halving"); !improved; halving.step()) {
            std::vector<double> trial = x;
            for (std::size_t j = 0; j < m; ++j) trial[j] += scale * dx(static_cast<Eigen::Index>(j));
            if (admissible(trial)) {
                std::vector<double> ft = f(trial);
                const double r = max_abs(ft);
                if (r < residual) {
                    // Near the rounding floor steps only shuffle the last digits: stop there.
                    if (r > 0.5 * residual && r < kFloorCheck) stalled = true;
                    x = std::move(trial);
                    fx = std::move(ft);
                    residual = r;
                    improved = true;
                    break;
                }
            }
            scale *= 0.5;
            if (scale < 1e-12) return x;  // no step improves |F|: at the rounding floor (or stuck)
        }
        if (stalled) return x;
    }
    return x;
}

}  // namespace coilwright::internal
