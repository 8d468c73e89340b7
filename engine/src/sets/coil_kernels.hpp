// Field kernels of one coil of a set in its own frame, shared by the single-point and batch
// paths so that both give the same bits.
#pragma once

#include <Eigen/Core>
#include <cmath>

#include "coilwright/constants.hpp"
#include "coilwright/sets.hpp"

namespace coilwright::internal {

// Distance from the axis of a point with local coordinates (lx, ly); the plain square root is
// exact enough and fast, hypot takes over only where the squares would overflow or underflow.
inline double axis_distance(double lx, double ly) {
    const double r = std::sqrt(lx * lx + ly * ly);
    if (std::isfinite(r) && (r > 1e-150 || (lx == 0.0 && ly == 0.0))) return r;
    return std::hypot(lx, ly);
}

// The global vector of local components (bu, bv, bn) in `frame`, in one fixed order of
// operations.
inline Eigen::Vector3d to_global(const CoilFrame& f, double bu, double bv, double bn) {
    return {f.u.x() * bu + f.v.x() * bv + f.n.x() * bn, f.u.y() * bu + f.v.y() * bv + f.n.y() * bn,
            f.u.z() * bu + f.v.z() * bv + f.n.z() * bn};
}

// Local field of a circle from its axial and radial components at (lx, ly) with r = |(lx, ly)|.
inline Eigen::Vector3d circle_local(double lx, double ly, double r, double bz, double br) {
    const double s = r == 0.0 ? 0.0 : br / r;  // branch-free, so the batch loops vectorise
    return {s * lx, s * ly, bz};
}

// True when the frame's axes are coordinate axes (up to sign): local coordinates are then exact
// but for the subtraction of the centre, as in the coaxial functions.
inline bool axis_aligned(const CoilFrame& f) {
    const auto unit = [](const Eigen::Vector3d& a) {
        int ones = 0;
        for (int k = 0; k < 3; ++k) {
            if (std::fabs(a[k]) == 1.0) ++ones;
            else if (a[k] != 0.0) return false;
        }
        return ones == 1;
    };
    return unit(f.u) && unit(f.v) && unit(f.n);
}

// Distance from a local point to a thin coil's wire (the circle, or the rectangle's perimeter).
inline double wire_distance(const SetCoil& c, double lx, double ly, double lz, double r) {
    if (c.shape == SetShape::Circle) return std::hypot(c.size - r, lz);
    const double ax = std::fabs(lx) - 0.5 * c.size, ay = std::fabs(ly) - 0.5 * c.height;
    const double in_plane = ax <= 0.0 && ay <= 0.0 ? std::min(-ax, -ay) : std::hypot(std::max(ax, 0.0), std::max(ay, 0.0));
    return std::hypot(in_plane, lz);
}

// In a tilted frame the local coordinates carry the rounding of the rotation, a few units in
// the last place of the coordinates involved: a point that close to the wire is on it (its
// field would be a number without a single correct digit).
inline double rounding_radius(const SetCoil& c, const Eigen::Vector3d& point) {
    return 1e-15 * (point.cwiseAbs().maxCoeff() + c.centre.cwiseAbs().maxCoeff() + c.size + c.height);
}

// The field of one coil at a local point (u, v, n coordinates relative to its centre), in
// local components. Throws SingularPointError on a filament or sheet.
Eigen::Vector3d circle_field_local(const SetCoil& coil, const Eigen::Vector3d& local);
Eigen::Vector3d rect_field_local(const SetCoil& coil, const Eigen::Vector3d& local);

// mu0 N I / (4 pi) of a rectangle, and the squared reach of the rectangle kernel (rect_kernel.hpp).
inline double rect_scale(const SetCoil& c) { return kMu0 * c.turns * c.current / (4.0 * kPi); }
double rect_kernel_reach2(const SetCoil& coil);

// Thick rectangular winding: the filament field averaged over the cross-section.
Eigen::Vector3d thick_rect_field_local(const SetCoil& coil, const Eigen::Vector3d& local);

}  // namespace coilwright::internal
