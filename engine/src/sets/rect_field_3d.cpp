// Field of a thin rectangular coil of a set: the closed form of rect.hpp in its own frame.
#include "coil_kernels.hpp"
#include "coilwright/rect.hpp"

namespace coilwright::sets_detail {

Eigen::Vector3d rect_field_local(const SetCoil& coil, const Eigen::Vector3d& local) {
    if (coil.thick()) return thick_rect_field_local(coil, local);
    return rect_field({coil.size, coil.height, coil.turns, coil.current}, local);
}

}  // namespace coilwright::sets_detail
