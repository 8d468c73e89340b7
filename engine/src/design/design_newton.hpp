// A damped Newton method for small square systems F(x) = 0 (the design equations): Jacobian by
// central differences, steps halved until |F| decreases, every loop under a StepBudget.
#pragma once

#include <functional>
#include <vector>

namespace coilwright::internal {

using Residuals = std::function<std::vector<double>(const std::vector<double>& x)>;
// Whether x is an admissible point (positions inside their range, ...): steps that leave the
// admissible set are halved like steps that do not decrease |F|.
using Admissible = std::function<bool(const std::vector<double>& x)>;

// Solves F(x) = 0 from x0 until max |F| <= target (or no step improves it, or a step below 1e-11
// does not halve it: the rounding floor); returns x and
// sets `residual` to max |F| there. Raises ConvergenceError when the step budget runs out or the
// Jacobian is singular.
std::vector<double> damped_newton(const Residuals& f, const Admissible& admissible, std::vector<double> x0,
                                  double target, double& residual);

}  // namespace coilwright::internal
