// The axial gradient dBz/dz of a coil table anywhere.
#pragma once

#include "coilwright/coil_table.hpp"

namespace coilwright {

// dBz/dz at (z, r) (T/m). On the axis: exact (closed forms on Taylor jets). Off the axis:
// central differences of the field with Richardson extrapolation, with a step of 1e-3 of the
// distance to the nearest winding (about 1e-10 relative; less accurate right at a winding's
// edge, where the field's derivatives jump).
double table_gradient(const CoilTable& table, double z, double r);

}  // namespace coilwright
