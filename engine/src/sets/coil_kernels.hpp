// Field kernels of one coil of a set in its own frame, shared by the single-point and batch
// paths so that both give the same bits.
#pragma once

#include <Eigen/Core>
#include <cmath>

#include "coilwright/sets.hpp"

namespace coilwright::sets_detail {

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
    if (r == 0.0) return {0.0, 0.0, bz};
    const double s = br / r;
    return {s * lx, s * ly, bz};
}

// The field of one coil at a local point (u, v, n coordinates relative to its centre), in
// local components. Throws SingularPointError on a filament or sheet.
Eigen::Vector3d circle_field_local(const SetCoil& coil, const Eigen::Vector3d& local);
Eigen::Vector3d rect_field_local(const SetCoil& coil, const Eigen::Vector3d& local);

// Thick rectangular winding: the filament field averaged over the cross-section.
Eigen::Vector3d thick_rect_field_local(const SetCoil& coil, const Eigen::Vector3d& local);

}  // namespace coilwright::sets_detail
