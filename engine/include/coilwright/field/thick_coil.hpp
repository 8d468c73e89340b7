// Thick winding of rectangular cross-section with uniform current density, anywhere in space,
// inside the winding included.
#pragma once

#include "coilwright/field/field_rz.hpp"

namespace coilwright {

// N turns filling inner_radius <= a <= outer_radius, |z| <= length / 2 with uniform current
// density J = N I / ((outer - inner) length).
struct ThickCoilSpec {
    double inner_radius;  // m, > 0
    double outer_radius;  // m, >= inner_radius (equal: a thin current sheet)
    double length;        // m, > 0
    double turns;         // >= 0
    double current;       // A, any sign
};

// Field at axial position z (m) and distance r >= 0 (m) from the axis. Inside the winding the
// field is finite and computed. Relative accuracy about 1e-12 (1e-10 guaranteed), relative to
// |B| where a component changes sign. With inner == outer the coil is a thin sheet and a point
// on the sheet is a SingularPointError.
FieldRZ thick_coil_field(const ThickCoilSpec& coil, double z, double r, Components want = Components::Both);

void validate(const ThickCoilSpec& coil);

}  // namespace coilwright
