// Field of a coil set: each coil in its own frame, the sum over the rows; and the same for
// many points at once, with the loop rows through the vectorised loop kernel.
#include <algorithm>
#include <cmath>
#include <limits>
#include <string>

#include "coil_kernels.hpp"
#include "numerics/checks.hpp"
#include "coilwright/field/table_field.hpp"
#include "coilwright/errors.hpp"
#include "coilwright/field/loop_batch.hpp"
#include "coilwright/sets.hpp"
#include "rect_kernel.hpp"

namespace coilwright {

using namespace internal;

using internal::to_global;

namespace {

constexpr int kLanes = internal::kPackWidth;
using internal::Pack;
using internal::PackMask;
using Lanes = internal::PackLanes;

// Adds the field of a thin rectangle at m local points (padded to whole packs) to the totals,
// through the rectangle kernel in packs; points beyond its reach, and points of a tilted coil
// within rounding of the wire, take coil_field's path one by one, as set_field does.
void add_rect_chunk(const SetCoil& coil, const CoilFrame& f, bool tilted, const double* x, const double* y,
                    const double* z, const double* lx, const double* ly, const double* lz, std::size_t m, double* bx,
                    double* by, double* bz) {
    constexpr double kNaN = std::numeric_limits<double>::quiet_NaN();
    using K = internal::RectKernel<Lanes>;
    const double reach2 = internal::rect_kernel_reach2(coil), scale = internal::rect_scale(coil);
    const double hw = 0.5 * coil.size, hh = 0.5 * coil.height;
    for (std::size_t k0 = 0; k0 < m; k0 += kLanes) {
        Pack px, py, pz;
        for (int l = 0; l < kLanes; ++l) {
            const std::size_t k = k0 + static_cast<std::size_t>(l) < m ? k0 + static_cast<std::size_t>(l) : k0;
            px[l] = lx[k];
            py[l] = ly[k];
            pz[l] = lz[k];
        }
        Pack fx, fy, fz;
        K::field(px, py, pz, hw, hh, fx, fy, fz);
        const PackMask inside = K::within(px, py, pz, reach2);
        for (int l = 0; l < kLanes && k0 + static_cast<std::size_t>(l) < m; ++l) {
            const std::size_t k = k0 + static_cast<std::size_t>(l);
            Eigen::Vector3d b;
            if (inside[l] == 0 || tilted) {
                try {
                    b = coil_field(coil, f, {x[k], y[k], z[k]});
                } catch (const std::exception&) {
                    b.setConstant(kNaN);
                }
            } else {
                const Eigen::Vector3d bl(scale * fx[l], scale * fy[l], scale * fz[l]);
                b = bl.allFinite() ? to_global(f, bl.x(), bl.y(), bl.z()) : Eigen::Vector3d::Constant(kNaN);
            }
            bx[k] = bx[k] + b.x();
            by[k] = by[k] + b.y();
            bz[k] = bz[k] + b.z();
        }
    }
}

}  // namespace

namespace {

void check_point(const Eigen::Vector3d& p) {
    check::finite(p.x(), "x");
    check::finite(p.y(), "y");
    check::finite(p.z(), "z");
}

}  // namespace

Eigen::Vector3d coil_field(const SetCoil& coil, const CoilFrame& frame, const Eigen::Vector3d& point) {
    check_point(point);
    const Eigen::Vector3d local = frame.to_local(point);
    if (!coil.thick() && !internal::axis_aligned(frame) &&
        internal::wire_distance(coil, local.x(), local.y(), local.z(),
                                   internal::axis_distance(local.x(), local.y())) <=
            internal::rounding_radius(coil, point))
        raise_singular_point("the point lies on the current filament (within the rounding of the tilted coil's frame)");
    const Eigen::Vector3d b = coil.shape == SetShape::Circle ? internal::circle_field_local(coil, local)
                                                             : internal::rect_field_local(coil, local);
    const Eigen::Vector3d global = to_global(frame, b.x(), b.y(), b.z());
    for (int k = 0; k < 3; ++k) check::finite_result(global[k], "B");
    return global;
}

Eigen::Vector3d set_field(const CoilSet& set, const Eigen::Vector3d& point) {
    check_point(point);
    Eigen::Vector3d total = Eigen::Vector3d::Zero();
    for (std::size_t i = 0; i < set.size(); ++i) {
        try {
            const Eigen::Vector3d b = coil_field(set.coil(i), set.frame(i), point);
            total = {total.x() + b.x(), total.y() + b.y(), total.z() + b.z()};
        } catch (const SingularPointError& e) {
            raise_singular_point("row " + std::to_string(set.label(i)) + ": " + e.what());
        } catch (const DomainError& e) {
            raise_domain_error("row " + std::to_string(set.label(i)) + ": " + e.what());
        }
    }
    check::finite_result(total.x(), "Bx");
    check::finite_result(total.y(), "By");
    check::finite_result(total.z(), "Bz");
    return total;
}

std::size_t set_field_batch(const CoilSet& set, const double* x, const double* y, const double* z, std::size_t n,
                            double* bx, double* by, double* bz) {
    constexpr double kNaN = std::numeric_limits<double>::quiet_NaN();
    constexpr std::size_t kChunk = 256;  // local coordinates of a chunk stay in the first-level cache
    double lx[kChunk], ly[kChunk], lz[kChunk], r[kChunk], fz[kChunk], fr[kChunk];
    std::fill(bx, bx + n, 0.0);
    std::fill(by, by + n, 0.0);
    std::fill(bz, bz + n, 0.0);
    for (std::size_t i = 0; i < set.size(); ++i) {
        const SetCoil& coil = set.coil(i);
        const CoilFrame& f = set.frame(i);
        const bool loop = coil.shape == SetShape::Circle && !coil.thick();
        const bool tilted = !internal::axis_aligned(f);
        const bool thin_rect = coil.shape == SetShape::Rect && !coil.thick();
        for (std::size_t start = 0; start < n; start += kChunk) {
            const std::size_t m = std::min(kChunk, n - start);
            if (loop) {
                const double cx = f.centre.x(), cy = f.centre.y(), cz = f.centre.z();
                const double ux = f.u.x(), uy = f.u.y(), uz = f.u.z(), vx = f.v.x(), vy = f.v.y(), vz = f.v.z();
                const double nx = f.n.x(), ny = f.n.y(), nz = f.n.z();
                // Plain loops over arrays (they vectorise), in CoilFrame::to_local's order.
                for (std::size_t k = 0; k < m; ++k) {
                    const double dx = x[start + k] - cx, dy = y[start + k] - cy, dz = z[start + k] - cz;
                    lx[k] = dx * ux + dy * uy + dz * uz;
                    ly[k] = dx * vx + dy * vy + dz * vz;
                    lz[k] = dx * nx + dy * ny + dz * nz;
                    r[k] = std::sqrt(lx[k] * lx[k] + ly[k] * ly[k]);
                }
                for (std::size_t k = 0; k < m; ++k)  // axis_distance's careful cases, rarely taken
                    if (!(std::isfinite(r[k]) && (r[k] > 1e-150 || (lx[k] == 0.0 && ly[k] == 0.0))))
                        r[k] = internal::axis_distance(lx[k], ly[k]);
                try {
                    loop_field_batch({coil.size, coil.turns, coil.current}, lz, r, m, fz, fr);
                } catch (const std::exception&) {  // an invalid loop: every point is an error
                    std::fill(fz, fz + m, kNaN);
                    std::fill(fr, fr + m, kNaN);
                }
                if (tilted)  // as in coil_field: within rounding of the wire is on it
                    for (std::size_t k = 0; k < m; ++k) {
                        const Eigen::Vector3d p(x[start + k], y[start + k], z[start + k]);
                        if (internal::wire_distance(coil, lx[k], ly[k], lz[k], r[k]) <=
                            internal::rounding_radius(coil, p))
                            fz[k] = fr[k] = kNaN;
                    }
                for (std::size_t k = 0; k < m; ++k) {  // circle_local and to_global, written out
                    const double s = r[k] == 0.0 ? 0.0 : fr[k] / r[k];
                    const double bu = s * lx[k], bv = s * ly[k], bn = fz[k];
                    bx[start + k] = bx[start + k] + ((ux * bu + vx * bv) + nx * bn);
                    by[start + k] = by[start + k] + ((uy * bu + vy * bv) + ny * bn);
                    bz[start + k] = bz[start + k] + ((uz * bu + vz * bv) + nz * bn);
                }
            } else if (thin_rect) {
                for (std::size_t k = 0; k < m; ++k) {
                    const Eigen::Vector3d local = f.to_local({x[start + k], y[start + k], z[start + k]});
                    lx[k] = local.x();
                    ly[k] = local.y();
                    lz[k] = local.z();
                }
                add_rect_chunk(coil, f, tilted, x + start, y + start, z + start, lx, ly, lz, m, bx + start, by + start,
                               bz + start);
            } else {
                for (std::size_t k = 0; k < m; ++k) {
                    const std::size_t at = start + k;
                    Eigen::Vector3d b;
                    try {
                        b = coil_field(coil, f, {x[at], y[at], z[at]});
                    } catch (const std::exception&) {
                        b.setConstant(kNaN);
                    }
                    bx[at] = bx[at] + b.x();
                    by[at] = by[at] + b.y();
                    bz[at] = bz[at] + b.z();
                }
            }
        }
    }
    std::size_t bad = 0;
    for (std::size_t k = 0; k < n; ++k) {
        if (std::isfinite(x[k]) && std::isfinite(y[k]) && std::isfinite(z[k]) && std::isfinite(bx[k]) &&
            std::isfinite(by[k]) && std::isfinite(bz[k]))
            continue;
        bx[k] = by[k] = bz[k] = kNaN;
        ++bad;
    }
    return bad;
}

}  // namespace coilwright
