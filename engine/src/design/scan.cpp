#include "design/scan.hpp"

#include <algorithm>
#include <cmath>
#include <limits>

#include "numerics/policy.hpp"
#include "numerics/roots.hpp"

namespace coilwright::internal {

namespace {

// Bisection steps that reach the resolution of a double from any bracket.
constexpr int kMaxBisections = 2100;
// An outward scan's steps grow with the distance travelled (axial_scan_step), so a few
// thousand reach any distance; a fixed-step scan is bounded by its caller's max_distance.
constexpr int kMaxScanSteps = 1'000'000;

// The furthest winding feature from the origin (m).
double largest_extent(const CoilTable& table) {
    double extent = 0.0;
    for (const CoilRow& row : table.rows())
        extent = std::max({extent, std::fabs(row.centre_z) + row.length / 2, row.outer_radius});
    return extent;
}

}  // namespace

void check_tolerance(double tolerance) {
    if (!(tolerance > 0.0 && tolerance < 1.0))
        raise_domain_error("tolerance must be a fraction between 0 and 1 (e.g. 0.001 for 0.1 %)");
}

double smallest_radius(const CoilTable& table) {
    double a = std::numeric_limits<double>::infinity();
    for (const CoilRow& row : table.rows()) a = std::min(a, row.inner_radius);
    return a;
}

double axial_search_limit(const CoilTable& table, double z0) {
    return 1000.0 * (largest_extent(table) + std::fabs(z0));
}

double axial_scan_step(const CoilTable& table, double z, double travelled) {
    // Near the windings the on-axis field varies on the scale of the smallest radius; far away
    // on the scale of the distance itself. Growing with the distance travelled bounds the
    // number of steps by about 64 ln(range / smallest radius).
    const double near_step = smallest_radius(table) / 256.0;
    double distance = std::numeric_limits<double>::infinity();
    for (const CoilRow& row : table.rows())
        distance = std::min(distance, std::max(0.0, std::fabs(z - row.centre_z) - row.length / 2));
    return std::max({near_step, distance / 64.0, travelled / 64.0});
}

double first_crossing(const std::function<double(double)>& ratio, double tolerance,
                      const std::function<double(double)>& step, double max_distance) {
    const auto excess = [&](double s) { return std::fabs(ratio(s) - 1.0) - tolerance; };
    double lo = 0.0;
    for (StepBudget budget(kMaxScanSteps, "the outward scan"); lo < max_distance; budget.step()) {
        const double hi = lo + step(lo);
        if (!(hi > lo)) raise_no_convergence("the outward scan stalled (its step vanished)");
        const double at_hi = excess(hi);
        if (at_hi > 0.0) {
            // The first crossing lies in (lo, hi]: refine it. Bisection when hi is a singular
            // point (infinite excess), TOMS 748 otherwise.
            if (!std::isfinite(at_hi)) {
                double a = lo, b = hi;
                for (StepBudget bisect(kMaxBisections, "bisection");
                     b - a > 4 * std::numeric_limits<double>::epsilon() * b; bisect.step()) {
                    const double mid = (a + b) / 2;
                    if (mid <= a || mid >= b) break;  // the bracket is as narrow as doubles allow
                    (excess(mid) > 0.0 ? b : a) = mid;
                }
                return (a + b) / 2;
            }
            return bracketed_root(excess, lo, hi, excess(lo), at_hi, "the uniform-region edge search");
        }
        lo = hi;
    }
    raise_no_convergence("the field stays within the tolerance as far as the search goes");
}

}  // namespace coilwright::internal
