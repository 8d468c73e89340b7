// The thick-winding field kernel in units of mu0 J, shared by the thick-coil field and the
// table field.
#pragma once

#include "coilwright/field/field_rz.hpp"

namespace coilwright::internal {

// The loss to cancellation a sheet of a thick winding may accept before it integrates along its
// length instead (about 1e-14 at most: well inside the 1e-12 aimed at); the route by ends uses
// the end terms' forms of the same limit.
inline constexpr double kThickSheetMaxLoss = 256.0;

// Integral over the winding radius a in [a1, a2] of the thin-sheet field (sheet_kernel.hpp) of
// half-length h: the field in units of mu0 J (so in metres). Unchecked.
FieldRZ thick_field_per_density(double a1, double a2, double h, double z, double r,
                                Components want = Components::Both);

// The same near a corner of the winding (near_a_winding_corner), integrated end plane by end plane
// (thick_corner.cpp); `exponent` sets the Gauss points as for the general route.
bool near_a_winding_corner(double a1, double a2, double h, double z, double r);
FieldRZ thick_field_by_ends(double a1, double a2, double h, double z, double r, Components want, double exponent);

}  // namespace coilwright::internal
