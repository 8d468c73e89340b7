// Outward scans for the first point where a ratio leaves its tolerance, shared by the
// uniform-region, pair-spacing and sensitivity searches.
#pragma once

#include <functional>

#include "coilwright/coil_table.hpp"

namespace coilwright::internal {

// Throws DomainError unless 0 < tolerance < 1.
void check_tolerance(double tolerance);

// The smallest inner radius of the table's rows.
double smallest_radius(const CoilTable& table);

// Largest h such that |f(s) - 1| <= tolerance for every s in [0, h], for a smooth f with
// f(0) = 1, scanning outward with steps no longer than step(s) and refining the first crossing
// by bracketing (Boost.Math TOMS 748). Throws ConvergenceError when no crossing is found
// before max_distance.
double first_crossing(const std::function<double(double)>& ratio, double tolerance,
                      const std::function<double(double)>& step, double max_distance);

// A step length that resolves the on-axis field of the table at z, having travelled
// `travelled` from the start of the scan. Steps grow in proportion to the distance from the
// windings and from the start, so a scan takes at most a few thousand steps whatever the
// proportions of the coils.
double axial_scan_step(const CoilTable& table, double z, double travelled);

// How far an axial scan around z0 may go before it gives up: a thousand times the table's
// extent.
double axial_search_limit(const CoilTable& table, double z0);

}  // namespace coilwright::internal
