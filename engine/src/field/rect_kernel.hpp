// The rectangle field kernel in scaled units, shared by the rectangle field and the pair spacing.
#pragma once

#include <Eigen/Core>

namespace coilwright::internal {

// The closed-form evaluation in scaled units, exposed for tests: half-width a, half-height b
// and point p in units of the half-diagonal s (a^2 + b^2 = 1); field in units of mu0 I / (4 pi s).
Eigen::Vector3d rect_field_scaled(double a, double b, const Eigen::Vector3d& p);

}  // namespace coilwright::internal
