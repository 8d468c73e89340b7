#include "coilwright/regions.hpp"

#include <algorithm>
#include <boost/math/tools/minima.hpp>
#include <cmath>
#include <cstdint>
#include <limits>

#include "coilwright/axial.hpp"
#include "coilwright/checks.hpp"
#include "coilwright/coil_stack.hpp"
#include "coilwright/constants.hpp"
#include "coilwright/errors.hpp"
#include "coilwright/uniformity.hpp"

namespace coilwright {

namespace {

void check_tolerance(double tolerance) {
    if (!(tolerance > 0.0 && tolerance < 1.0))
        throw DomainError("tolerance must be a fraction between 0 and 1 (e.g. 0.001 for 0.1 %)");
}

// Distance in the (r, z) half-plane from the point to the nearest winding cross-section (0
// inside a thick winding's cross-section: then the distance to its boundary).
double distance_to_windings(const CoilTable& table, double z, double r) {
    double best = std::numeric_limits<double>::infinity();
    for (const CoilRow& row : table.rows()) {
        const double z1 = row.centre_z - row.length / 2, z2 = row.centre_z + row.length / 2;
        const double dz = std::max({z1 - z, 0.0, z - z2});
        const double dr = std::max({row.inner_radius - r, 0.0, r - row.outer_radius});
        double d = std::hypot(dz, dr);
        if (d == 0.0)  // inside the cross-section: distance to its edge
            d = std::min({z - z1, z2 - z, r - row.inner_radius, row.outer_radius - r});
        best = std::min(best, d);
    }
    return best;
}

double smallest_radius(const CoilTable& table) {
    double a = std::numeric_limits<double>::infinity();
    for (const CoilRow& row : table.rows()) a = std::min(a, row.inner_radius);
    return a;
}

double reference_field(const CoilTable& table, double z0) {
    const double b0 = std::fabs(axial_field(table, z0));
    if (b0 == 0.0) throw DomainError("the field at the reference point is zero: relative uniformity is undefined");
    return b0;
}

// ||B| / b0 - 1| at a point; a point on a winding counts as infinitely far off.
double deviation(const CoilTable& table, double z, double r, double b0) {
    try {
        return std::fabs(stack_field(table, z, r).magnitude() / b0 - 1.0);
    } catch (const SingularPointError&) {
        return std::numeric_limits<double>::infinity();
    }
}

}  // namespace

double stack_gradient(const CoilTable& table, double z, double r) {
    check::finite(z, "z");
    check::non_negative(r, "r");
    if (r == 0.0) return check::finite_result(axial_jet_n<2>(table, z).c[1], "dBz/dz");
    const double d = distance_to_windings(table, z, r);
    if (d == 0.0) throw SingularPointError("the point lies on a winding");
    const double h = 1e-3 * std::min(d, smallest_radius(table));
    const auto bz = [&](double zz) { return stack_field(table, zz, r).bz; };
    const double d1 = (bz(z + h) - bz(z - h)) / (2 * h);
    const double d2 = (bz(z + h / 2) - bz(z - h / 2)) / h;
    return check::finite_result((4 * d2 - d1) / 3, "dBz/dz");
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
        std::uintmax_t iterations = 60;
        const auto found = boost::math::tools::brent_find_minima([&](double t) { return -dev(t); }, lo, hi, 40, iterations);
        return std::max(worst, -found.second);
    };
    const double step = smallest_radius(table) / 256.0;
    const auto ratio = [&](double s) { return 1.0 + worst_on_shell(s); };
    return first_crossing(ratio, tolerance, [&](double) { return step; }, 1e3 * smallest_radius(table));
}

double scale_for_field(const CoilTable& table, double target, double z, double r) {
    check::finite(target, "target");
    const double b = stack_field(table, z, r).bz;
    if (b == 0.0) throw DomainError("the table gives no axial field at this point: no scale reaches the target");
    return check::finite_result(target / b, "scale");
}

double scale_for_gradient(const CoilTable& table, double target, double z, double r) {
    check::finite(target, "target");
    const double g = stack_gradient(table, z, r);
    if (g == 0.0) throw DomainError("the table gives no axial gradient at this point: no scale reaches the target");
    return check::finite_result(target / g, "scale");
}

}  // namespace coilwright
