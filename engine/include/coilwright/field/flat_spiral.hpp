// Flat (pancake) spiral winding: turns spread evenly over the radius in one plane.
#pragma once

#include "coilwright/field/field_rz.hpp"

namespace coilwright {

// N turns with radii spread evenly over [inner_radius, outer_radius] in the plane z = 0, axis z
// (a flat annular current sheet of surface current density N I / (outer - inner)).
struct FlatSpiralSpec {
    double inner_radius;  // m, > 0
    double outer_radius;  // m, >= inner_radius (equal: N coincident loops)
    double turns;         // >= 0
    double current;       // A, any sign
};

// Field at axial distance z (m) from the winding's plane and distance r >= 0 (m) from the axis.
// A point on the winding (z == 0, inner <= r <= outer) is a SingularPointError: Br jumps
// there and the edges are singular. Relative accuracy about 1e-12.
FieldRZ flat_spiral_field(const FlatSpiralSpec& spiral, double z, double r);

void validate(const FlatSpiralSpec& spiral);

}  // namespace coilwright
