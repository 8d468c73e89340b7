#include "coilwright/design/uniform_region.hpp"

#include <algorithm>
#include <cmath>
#include <limits>

#include "coilwright/constants.hpp"
#include "coilwright/field/axial.hpp"
#include "coilwright/field/table_field.hpp"
#include "design/scan.hpp"
#include "field/axial_jet.hpp"
#include "numerics/checks.hpp"
#include "numerics/policy.hpp"
#include "numerics/roots.hpp"

namespace coilwright {

using namespace internal;

namespace {

double reference_field(const CoilTable& table, double z0) {
    const double b0 = std::fabs(axial_field(table, z0));
    if (b0 == 0.0) raise_domain_error("the field at the reference point is zero: relative uniformity is undefined");
    return b0;
}

// ||B| / b0 - 1| at a point; a point on a winding counts as infinitely far off.
double deviation(const CoilTable& table, double z, double r, double b0) {
    try {
        return std::fabs(table_field(table, z, r).magnitude() / b0 - 1.0);
    } catch (const SingularPointError&) {
        return std::numeric_limits<double>::infinity();
    }
}

// The smaller of the two half-lengths over which ratio(z0 +- s) stays within the tolerance.
template <class Ratio>
double both_directions(const CoilTable& table, double tolerance, double z0, Ratio ratio_at) {
    const double limit = axial_search_limit(table, z0);
    double half = std::numeric_limits<double>::infinity();
    for (double direction : {+1.0, -1.0}) {
        const auto ratio = [&](double s) { return ratio_at(z0 + direction * s); };
        const auto step = [&](double s) { return axial_scan_step(table, z0 + direction * s, s); };
        half = std::min(half, first_crossing(ratio, tolerance, step, limit));
    }
    return half;
}

}  // namespace

double axial_uniform_half_length(const CoilTable& table, double tolerance, double z0) {
    check_tolerance(tolerance);
    check::finite(z0, "z");
    const double b0 = axial_field(table, z0);
    if (b0 == 0.0) raise_domain_error("the field at the reference point is zero: relative uniformity is undefined");
    return both_directions(table, tolerance, z0, [&](double z) { return axial_field(table, z) / b0; });
}

double axial_linear_half_length(const CoilTable& table, double tolerance, double z0) {
    check_tolerance(tolerance);
    check::finite(z0, "z");
    const auto gradient = [&](double z) { return axial_jet_n<2>(table, z).c[1]; };
    const double g0 = gradient(z0);
    if (g0 == 0.0) raise_domain_error("the gradient at the reference point is zero: linearity is undefined");
    return both_directions(table, tolerance, z0, [&](double z) { return gradient(z) / g0; });
}

double radial_uniform_extent(const CoilTable& table, double tolerance, double z0) {
    check_tolerance(tolerance);
    check::finite(z0, "z");
    const double b0 = reference_field(table, z0);
    const double step = smallest_radius(table) / 256.0;
    // Ratio form for first_crossing: 1 + deviation, so |ratio - 1| = deviation.
    const auto ratio = [&](double s) { return 1.0 + deviation(table, z0, s, b0); };
    return first_crossing(ratio, tolerance, [&](double) { return step; }, 1e3 * smallest_radius(table));
}

double spherical_uniform_radius(const CoilTable& table, double tolerance, double z0) {
    check_tolerance(tolerance);
    check::finite(z0, "z");
    const double b0 = reference_field(table, z0);
    constexpr int kDirections = 64;
    // The worst deviation on the shell of radius s: 64 directions from the +z pole to the -z
    // pole, then Brent's method between the neighbours of the worst one.
    const auto worst_on_shell = [&](double s) {
        const auto dev = [&](double theta) { return deviation(table, z0 + s * std::cos(theta), s * std::sin(theta), b0); };
        int best = 0;
        double worst = -1.0;
        for (int i = 0; i <= kDirections; ++i) {
            const double v = dev(kPi * i / kDirections);
            if (v > worst) {
                worst = v;
                best = i;
            }
        }
        if (!std::isfinite(worst)) return worst;
        const double lo = kPi * std::max(best - 1, 0) / kDirections, hi = kPi * std::min(best + 1, kDirections) / kDirections;
        const auto found = bracketed_minimum([&](double t) { return -dev(t); }, lo, hi, "the worst direction on a shell");
        return std::max(worst, -found.second);
    };
    const double step = smallest_radius(table) / 256.0;
    const auto ratio = [&](double s) { return 1.0 + worst_on_shell(s); };
    return first_crossing(ratio, tolerance, [&](double) { return step; }, 1e3 * smallest_radius(table));
}

}  // namespace coilwright
