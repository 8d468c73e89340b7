// Inverse design: the factor by which every current of a coil table (or every turn count) must
// be multiplied to reach a target. The field is linear in the ampere-turns.
#pragma once

#include "coilwright/coil_table.hpp"

namespace coilwright {

// The factor that makes Bz at (z, r) equal the target (T).
double scale_for_field(const CoilTable& table, double target, double z, double r);

// The factor that makes the axial gradient dBz/dz at (z, r) equal the target (T/m).
double scale_for_gradient(const CoilTable& table, double target, double z, double r);

}  // namespace coilwright
