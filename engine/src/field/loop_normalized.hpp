// The loop field kernel in normalised units, shared by the loop, sheet and mutual-inductance code.
#pragma once

#include "coilwright/field/field_rz.hpp"

namespace coilwright::internal {

// Unchecked kernel in units of the loop radius for a unit current and one turn, field in
// units of mu0 / radius. `one_minus_r` = 1 - r_n must be passed exactly (computed as
// (radius - r) / radius) so that points near the wire keep their precision.
FieldRZ loop_field_normalized(double z_n, double r_n, double one_minus_r);

}  // namespace coilwright::internal
