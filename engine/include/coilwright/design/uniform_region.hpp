// How far from a point the field of a coil table stays uniform (or its gradient linear) within
// a tolerance: along the axis, across the plane and over a sphere.
#pragma once

#include "coilwright/coil_table.hpp"

namespace coilwright {

// Half-length of the stretch of axis around z0 over which |Bz(z)/Bz(z0) - 1| <= tolerance
// (the smaller of the two directions). 0 < tolerance < 1; Bz(z0) must not be 0.
double axial_uniform_half_length(const CoilTable& table, double tolerance, double z0);

// Half-length of the stretch of axis around z0 over which the gradient dBz/dz stays within
// tolerance of its value at z0 (the linear region of a gradient coil).
double axial_linear_half_length(const CoilTable& table, double tolerance, double z0);

// Largest rho such that ||B(z0, s)| / |B(z0, 0)| - 1| <= tolerance for all 0 <= s <= rho: the
// radial extent of the uniform field in the plane z = z0.
double radial_uniform_extent(const CoilTable& table, double tolerance, double z0);

// Largest radius of a sphere centred on the axis at z0 within which ||B| / |B(z0, 0)| - 1| stays
// at or below the tolerance (checked on each spherical shell, 64 directions refined around the
// worst one).
double spherical_uniform_radius(const CoilTable& table, double tolerance, double z0);

}  // namespace coilwright
