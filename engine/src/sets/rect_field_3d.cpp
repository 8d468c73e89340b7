// Field of a thin rectangular coil of a set: the closed form of rect.hpp in its own frame.
#include <cmath>

#include "coil_kernels.hpp"
#include "coilwright/constants.hpp"
#include "coilwright/errors.hpp"
#include "coilwright/field/rect.hpp"
#include "rect_kernel.hpp"
#include "numerics/policy.hpp"

namespace coilwright::internal {

double rect_kernel_reach2(const SetCoil& coil) {
    const double s2 = 0.25 * (coil.size * coil.size + coil.height * coil.height);
    return kRectKernelReach * kRectKernelReach * s2;
}

Eigen::Vector3d rect_field_local(const SetCoil& coil, const Eigen::Vector3d& local) {
    if (coil.thick()) return thick_rect_field_local(coil, local);
    using K = RectKernel<internal::ScalarLanes>;
    if (!K::within(local.x(), local.y(), local.z(), rect_kernel_reach2(coil)))
        return rect_field({coil.size, coil.height, coil.turns, coil.current}, local);
    double bx, by, bz;
    K::field(local.x(), local.y(), local.z(), 0.5 * coil.size, 0.5 * coil.height, bx, by, bz);
    const double scale = rect_scale(coil);
    const Eigen::Vector3d b(scale * bx, scale * by, scale * bz);
    if (!b.allFinite()) raise_singular_point("the point lies on a side of the rectangle (the current filament)");
    return b;
}

}  // namespace coilwright::internal
