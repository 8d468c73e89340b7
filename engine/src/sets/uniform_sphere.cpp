// Radius of the largest sphere around a point within which the field vector stays within a
// tolerance of its value at the centre: |B - B0| / |B0| <= tolerance.
//
// On each shell the worst deviation is taken over 256 directions spread evenly over the
// sphere (a Fibonacci lattice), then refined around the worst by Brent's method along two
// great circles through it; the shells are scanned outward and the first crossing refined by
// TOMS 748 (uniformity.hpp's first_crossing).
#include <Eigen/Geometry>
#include <algorithm>
#include <boost/math/tools/minima.hpp>
#include <cmath>
#include <cstdint>
#include <limits>

#include "numerics/checks.hpp"
#include "coilwright/constants.hpp"
#include "coilwright/errors.hpp"
#include "coilwright/sets.hpp"
#include "design/scan.hpp"

namespace coilwright {

using namespace internal;

namespace {

constexpr int kDirections = 256;

// The smallest dimension of any coil: the scale of the field's variation.
double smallest_dimension(const CoilSet& set) {
    double d = std::numeric_limits<double>::infinity();
    for (const SetCoil& c : set.coils()) d = std::min({d, c.size, c.shape == SetShape::Rect ? c.height : d});
    return d;
}

}  // namespace

double set_uniform_sphere(const CoilSet& set, double tolerance, const Eigen::Vector3d& centre) {
    if (!(tolerance > 0.0 && tolerance < 1.0))
        raise_domain_error("tolerance must be a fraction between 0 and 1 (e.g. 0.001 for 0.1 %)");
    const Eigen::Vector3d b0 = set_field(set, centre);
    const double scale = b0.norm();
    if (scale == 0.0) raise_domain_error("the field at the centre is zero: relative uniformity is undefined");
    const auto deviation = [&](const Eigen::Vector3d& p) {
        try {
            return (set_field(set, p) - b0).norm() / scale;
        } catch (const SingularPointError&) {
            return std::numeric_limits<double>::infinity();  // a winding inside the sphere
        }
    };
    // Fibonacci lattice of unit directions.
    std::vector<Eigen::Vector3d> dirs;
    const double golden = kPi * (3.0 - std::sqrt(5.0));
    for (int i = 0; i < kDirections; ++i) {
        const double zc = 1.0 - (2.0 * i + 1.0) / kDirections, rho = std::sqrt(1.0 - zc * zc);
        dirs.emplace_back(rho * std::cos(golden * i), rho * std::sin(golden * i), zc);
    }
    const double spacing = std::sqrt(4.0 * kPi / kDirections);  // angle between neighbours
    const auto worst_on_shell = [&](double s) {
        double worst = -1.0;
        Eigen::Vector3d at = dirs[0];
        for (const Eigen::Vector3d& d : dirs) {
            const double v = deviation(centre + s * d);
            if (v > worst) {
                worst = v;
                at = d;
            }
        }
        if (!std::isfinite(worst)) return worst;
        // Two great circles through the worst direction, each searched within one spacing.
        Eigen::Vector3d e1 = at.unitOrthogonal(), e2 = at.cross(e1);
        for (const Eigen::Vector3d& e : {e1, e2}) {
            const auto along = [&](double a) { return -deviation(centre + s * (std::cos(a) * at + std::sin(a) * e)); };
            std::uintmax_t iterations = 40;
            const auto found = boost::math::tools::brent_find_minima(along, -spacing, spacing, 30, iterations);
            if (-found.second > worst) {
                worst = -found.second;
                at = std::cos(found.first) * at + std::sin(found.first) * e;
            }
        }
        return worst;
    };
    const double size = smallest_dimension(set);
    // Steps of 1/256 of the smallest coil, growing with the radius (1/64 of it), so a scan out
    // to 1000 sizes takes at most about a thousand shells.
    const double step = size / 256.0;
    return first_crossing([&](double s) { return 1.0 + worst_on_shell(s); }, tolerance,
                          [&](double s) { return std::max(step, s / 64.0); }, 1e3 * size);
}

}  // namespace coilwright
