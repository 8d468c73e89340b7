// The local frame of a coil in a set: where its width runs and how its axis points.
#include <Eigen/Geometry>
#include <cmath>

#include "numerics/checks.hpp"
#include "coilwright/constants.hpp"
#include "coilwright/errors.hpp"
#include "coilwright/sets.hpp"

namespace coilwright {

using namespace internal;

namespace {

// cos and sin of an angle in degrees, exact at multiples of 90 degrees (a rig's rolls), so
// that a square turned by 90 degrees has sides exactly along the axes.
void sincos_degrees(double deg, double& c, double& s) {
    const double quarter = deg / 90.0;
    if (quarter == std::nearbyint(quarter) && std::fabs(quarter) < 1e15) {
        const long q = static_cast<long>(std::fmod(quarter, 4.0) + 4.0) % 4;
        const double cs[4] = {1.0, 0.0, -1.0, 0.0}, sn[4] = {0.0, 1.0, 0.0, -1.0};
        c = cs[q];
        s = sn[q];
        return;
    }
    const double rad = std::fmod(deg, 360.0) * (kPi / 180.0);
    c = std::cos(rad);
    s = std::sin(rad);
}

}  // namespace

CoilFrame coil_frame(const Eigen::Vector3d& axis, double roll_deg, const Eigen::Vector3d& centre) {
    const double scale = axis.cwiseAbs().maxCoeff();  // divide first: no overflow in the norm
    if (!(axis.allFinite() && scale > 0.0)) raise_domain_error("the axis must be a finite vector of length > 0");
    if (!centre.allFinite()) raise_domain_error("the centre must be a finite point");
    check::finite(roll_deg, "roll");
    const Eigen::Vector3d a = axis / scale;
    const Eigen::Vector3d n = a / a.norm();
    Eigen::Vector3d u0 = n.cross(Eigen::Vector3d::UnitZ());
    // Parallel to z within 1e-12 rad: the width runs along x, as for the coaxial functions.
    if (u0.norm() <= 1e-12) u0 = Eigen::Vector3d::UnitX();
    else u0 /= u0.norm();
    double c, s;
    sincos_degrees(roll_deg, c, s);
    const Eigen::Vector3d w0 = n.cross(u0);
    const Eigen::Vector3d u = c == 1.0 ? u0 : Eigen::Vector3d(c * u0 + s * w0);
    return {centre, u, n.cross(u), n};
}

}  // namespace coilwright
