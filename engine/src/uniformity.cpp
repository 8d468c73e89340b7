#include "coilwright/uniformity.hpp"

#include <algorithm>
#include <boost/math/tools/roots.hpp>
#include <cmath>
#include <cstdint>
#include <limits>

#include "coilwright/axial.hpp"
#include "coilwright/checks.hpp"
#include "coilwright/errors.hpp"

namespace coilwright {

namespace {

void check_tolerance(double tolerance) {
    if (!(tolerance > 0.0 && tolerance < 1.0))
        throw DomainError("tolerance must be a fraction between 0 and 1 (e.g. 0.001 for 0.1 %)");
}

// Distance from z to the nearest winding edge along the axis direction, and the table's scale.
struct TableScale {
    double smallest_radius = std::numeric_limits<double>::infinity();
    double largest_extent = 0.0;  // furthest winding feature from the origin, m
};

TableScale scale_of(const CoilTable& table) {
    TableScale s;
    for (const CoilRow& row : table.rows()) {
        s.smallest_radius = std::min(s.smallest_radius, row.inner_radius);
        s.largest_extent = std::max({s.largest_extent, std::fabs(row.centre_z) + row.length / 2, row.outer_radius});
    }
    return s;
}

double search_limit(const CoilTable& table, double z0) {
    const TableScale s = scale_of(table);
    return 1000.0 * (s.largest_extent + std::fabs(z0));
}

}  // namespace

double axial_scan_step(const CoilTable& table, double z, double travelled) {
    // Near the windings the on-axis field varies on the scale of the smallest radius; far away
    // on the scale of the distance itself. Growing with the distance travelled bounds the
    // number of steps by about 64 ln(range / smallest radius).
    const TableScale s = scale_of(table);
    const double near_step = s.smallest_radius / 256.0;
    double distance = std::numeric_limits<double>::infinity();
    for (const CoilRow& row : table.rows())
        distance = std::min(distance, std::max(0.0, std::fabs(z - row.centre_z) - row.length / 2));
    return std::max({near_step, distance / 64.0, travelled / 64.0});
}

double first_crossing(const std::function<double(double)>& ratio, double tolerance,
                      const std::function<double(double)>& step, double max_distance) {
    const auto excess = [&](double s) { return std::fabs(ratio(s) - 1.0) - tolerance; };
    double lo = 0.0;
    while (lo < max_distance) {
        const double hi = lo + step(lo);
        const double at_hi = excess(hi);
        if (at_hi > 0.0) {
            // The first crossing lies in (lo, hi]: refine it. Bisection when hi is a singular
            // point (infinite excess), TOMS 748 otherwise.
            if (!std::isfinite(at_hi)) {
                double a = lo, b = hi;
                for (int i = 0; i < 200 && b - a > 4 * std::numeric_limits<double>::epsilon() * b; ++i) {
                    const double mid = (a + b) / 2;
                    (excess(mid) > 0.0 ? b : a) = mid;
                }
                return (a + b) / 2;
            }
            std::uintmax_t iterations = 100;
            const auto [a, b] = boost::math::tools::toms748_solve(
                excess, lo, hi, boost::math::tools::eps_tolerance<double>(50), iterations);
            return (a + b) / 2.0;
        }
        lo = hi;
    }
    throw ConvergenceError("the field stays within the tolerance as far as the search goes");
}

double axial_uniform_half_length(const CoilTable& table, double tolerance, double z0) {
    check_tolerance(tolerance);
    check::finite(z0, "z");
    const double b0 = axial_field(table, z0);
    if (b0 == 0.0) throw DomainError("the field at the reference point is zero: relative uniformity is undefined");
    const double limit = search_limit(table, z0);
    double half = std::numeric_limits<double>::infinity();
    for (double direction : {+1.0, -1.0}) {
        const auto ratio = [&](double s) { return axial_field(table, z0 + direction * s) / b0; };
        const auto step = [&](double s) { return axial_scan_step(table, z0 + direction * s, s); };
        half = std::min(half, first_crossing(ratio, tolerance, step, limit));
    }
    return half;
}

double axial_linear_half_length(const CoilTable& table, double tolerance, double z0) {
    check_tolerance(tolerance);
    check::finite(z0, "z");
    const auto gradient = [&](double z) { return axial_jet_n<2>(table, z).c[1]; };
    const double g0 = gradient(z0);
    if (g0 == 0.0) throw DomainError("the gradient at the reference point is zero: linearity is undefined");
    const double limit = search_limit(table, z0);
    double half = std::numeric_limits<double>::infinity();
    for (double direction : {+1.0, -1.0}) {
        const auto ratio = [&](double s) { return gradient(z0 + direction * s) / g0; };
        const auto step = [&](double s) { return axial_scan_step(table, z0 + direction * s, s); };
        half = std::min(half, first_crossing(ratio, tolerance, step, limit));
    }
    return half;
}

}  // namespace coilwright
