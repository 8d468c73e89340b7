// Thin current-sheet solenoid (a single-layer winding idealised as a sheet) anywhere in space.
#pragma once

#include "coilwright/field/field_rz.hpp"

namespace coilwright {

// N turns spread evenly over `length` on a cylinder of radius `radius`, centred at z = 0, axis z.
struct SolenoidSpec {
    double radius;   // m, > 0
    double length;   // m, > 0
    double turns;    // >= 0
    double current;  // A, any sign
};

// Field at axial position z (m) and distance r >= 0 (m) from the axis: inside, outside, near the
// ends and close to the sheet. Throws DomainError for bad arguments and SingularPointError for a
// point on the sheet (r == radius, |z| <= length / 2), where Bz jumps and the rims are singular.
// Relative accuracy about 1e-14 per component; near a zero of Bz (outside the winding, beyond
// the ends) Bz is accurate relative to |B| instead.
FieldRZ solenoid_field(const SolenoidSpec& solenoid, double z, double r, Components want = Components::Both);

void validate(const SolenoidSpec& solenoid);

}  // namespace coilwright
