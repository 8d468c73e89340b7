// A ready three-axis rig: three orthogonal pairs, each at its flattest spacing, nested.
#include <cmath>

#include "numerics/checks.hpp"
#include "coilwright/design/pair_spacing.hpp"
#include "coilwright/field/rect.hpp"
#include "coilwright/sets.hpp"

namespace coilwright {

using namespace internal;

namespace {
// Each pair is this much smaller than the one around it (x outermost, then y, then z): the
// coils of neighbouring pairs then stay 5 % of the size apart, room for the windings.
constexpr double kNesting = 0.9;
}  // namespace

std::vector<SetCoil> rig3_coils(double size, double turns, double current, SetShape shape) {
    check::positive(size, "size");
    check::non_negative(turns, "turns");
    check::finite(current, "current");
    std::vector<SetCoil> rows;
    double extent = size;  // diameter (circles) or side (squares) of this pair
    for (int axis = 0; axis < 3; ++axis, extent *= kNesting) {
        // Flattest spacing: the radius for circles (Helmholtz), rect_pair_spacing for squares.
        const double spacing = shape == SetShape::Circle ? 0.5 * extent : rect_pair_spacing(extent, extent);
        for (double side : {-0.5, 0.5}) {
            SetCoil c;
            c.shape = shape;
            c.centre = Eigen::Vector3d::Zero();
            c.centre[axis] = side * spacing;
            c.axis = Eigen::Vector3d::Zero();
            c.axis[axis] = 1.0;
            c.size = shape == SetShape::Circle ? 0.5 * extent : extent;
            c.height = shape == SetShape::Circle ? 0.0 : extent;
            c.turns = turns;
            c.current = current;
            c.circuit = axis + 1.0;
            rows.push_back(c);
        }
    }
    return rows;
}

}  // namespace coilwright
