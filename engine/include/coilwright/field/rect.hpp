// Rectangular loop of N coincident thin turns, and a pair of such loops, anywhere in space.
#pragma once

#include <Eigen/Core>

namespace coilwright {

// N coincident thin turns on a rectangle centred at the origin in the plane z = 0, sides
// parallel to x (width) and y (height). Positive current flows counter-clockwise seen from +z
// (along +x on the side y = -height/2), so the field at the centre points along +z.
struct RectSpec {
    double width;    // m, > 0 (extent along x)
    double height;   // m, > 0 (extent along y)
    double turns;    // >= 0
    double current;  // A, any sign
};

// Validates a rectangle description; throws DomainError naming the bad argument.
void validate(const RectSpec& rect);

// Field (T) at `point` (m). Throws DomainError for bad arguments and SingularPointError on a
// side (the filament itself). Accuracy about 1e-15 relative per component (see README).
Eigen::Vector3d rect_field(const RectSpec& rect, const Eigen::Vector3d& point);

// Two identical rectangles at z = -spacing/2 and z = +spacing/2 carrying the same current.
Eigen::Vector3d rect_pair_field(const RectSpec& rect, double spacing, const Eigen::Vector3d& point);


namespace internal {
// The closed-form evaluation in scaled units, exposed for tests: half-width a, half-height b
// and point p in units of the half-diagonal s (a^2 + b^2 = 1); field in units of mu0 I / (4 pi s).
Eigen::Vector3d rect_field_scaled(double a, double b, const Eigen::Vector3d& p);
}  // namespace internal

}  // namespace coilwright
