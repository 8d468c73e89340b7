// Field of a circular coil of a set, thin or thick, from the coaxial kernels in its own frame.
#include "coil_kernels.hpp"
#include "coilwright/field/table_field.hpp"
#include "coilwright/field/loop.hpp"

namespace coilwright::internal {

Eigen::Vector3d circle_field_local(const SetCoil& coil, const Eigen::Vector3d& local) {
    const double r = axis_distance(local.x(), local.y());
    FieldRZ f;
    if (!coil.thick()) {
        f = loop_field({coil.size, coil.turns, coil.current}, local.z(), r);
    } else {
        // The radius is that of the mean turn: the winding spans radius +/- depth/2 and
        // +/- breadth/2 along the axis (a thin sheet, a flat spiral or a thick coil).
        const double half = 0.5 * coil.depth;
        const CoilRow row{coil.size - half, coil.size + half, coil.breadth, 0.0, coil.turns, coil.current};
        f = row_field(row, local.z(), r);
    }
    return circle_local(local.x(), local.y(), r, f.bz, f.br);
}

}  // namespace coilwright::internal
