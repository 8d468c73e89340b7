// Off the axis: the axial gradient anywhere and the radial and spherical extents of a uniform
// field around a point of the axis.
#pragma once

#include "coilwright/coil_table.hpp"

namespace coilwright {

// dBz/dz at (z, r). On the axis: exact (closed forms on Taylor jets). Off the axis: central
// differences of the field with Richardson extrapolation, with a step of 1e-3 of the distance
// to the nearest winding (about 1e-10 relative; less accurate right at a winding's edge, where
// the field's derivatives jump).
double stack_gradient(const CoilTable& table, double z, double r);

// Largest rho such that ||B(z0, s)| / |B(z0, 0)| - 1| <= tolerance for all 0 <= s <= rho: the
// radial extent of the uniform field in the plane z = z0.
double radial_uniform_extent(const CoilTable& table, double tolerance, double z0);

// Largest radius of a sphere centred on the axis at z0 within which ||B| / |B(z0, 0)| - 1| stays
// at or below the tolerance (checked on each spherical shell, 64 directions refined around the
// worst one).
double spherical_uniform_radius(const CoilTable& table, double tolerance, double z0);

// Inverse design: the factor by which every current of the table (or every turn count) must be
// multiplied so that Bz at (z, r) equals the target. The field is linear in the ampere-turns.
double scale_for_field(const CoilTable& table, double target, double z, double r);

// The same for a target axial gradient dBz/dz at (z, r).
double scale_for_gradient(const CoilTable& table, double target, double z, double r);

}  // namespace coilwright
