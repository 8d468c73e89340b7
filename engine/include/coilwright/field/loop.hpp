// Thin circular current loop (N coincident turns) anywhere in space.
#pragma once

#include "coilwright/field/field_rz.hpp"

namespace coilwright {

// Geometry of N coincident thin turns of radius `radius` (m) in the plane z = 0, axis z.
struct LoopSpec {
    double radius;   // m, > 0
    double turns;    // >= 0
    double current;  // A, any sign
};

// Field at axial position z (m) and distance r >= 0 (m) from the axis.
// Throws DomainError for bad arguments and SingularPointError on the filament itself.
// Relative accuracy about 1e-15 per component (see README), except close to a zero
// crossing of Bz where only the absolute accuracy (about 1e-16 of the local field scale) holds.
FieldRZ loop_field(const LoopSpec& loop, double z, double r);

// Validates a loop description; throws DomainError naming the bad argument.
void validate(const LoopSpec& loop);

}  // namespace coilwright
