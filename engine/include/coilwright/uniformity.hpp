// How far from a point the field of a coil table stays within a tolerance.
#pragma once

#include <functional>

#include "coilwright/coil_table.hpp"

namespace coilwright {

// Largest h such that |f(s) - 1| <= tolerance for every s in [0, h], for a smooth f with
// f(0) = 1, scanning outward with steps no longer than step(s) and refining the first crossing
// by bracketing (Boost.Math TOMS 748). Throws ConvergenceError when no crossing is found
// before max_distance.
double first_crossing(const std::function<double(double)>& ratio, double tolerance,
                      const std::function<double(double)>& step, double max_distance);

// Half-length of the stretch of axis around z0 over which |Bz(z)/Bz(z0) - 1| <= tolerance
// (the smaller of the two directions). 0 < tolerance < 1; Bz(z0) must not be 0.
double axial_uniform_half_length(const CoilTable& table, double tolerance, double z0);

// Half-length of the stretch of axis around z0 over which the gradient dBz/dz stays within
// tolerance of its value at z0 (the linear region of a gradient coil).
double axial_linear_half_length(const CoilTable& table, double tolerance, double z0);

// A step length that resolves the on-axis field of the table at z, having travelled
// `travelled` from the start of the scan. Steps grow in proportion to the distance from the
// windings and from the start, so a scan takes at most a few thousand steps whatever the
// proportions of the coils.
double axial_scan_step(const CoilTable& table, double z, double travelled);

}  // namespace coilwright
