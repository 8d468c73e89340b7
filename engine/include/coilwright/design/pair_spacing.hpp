// Pairs of identical coaxial coils: the spacings that make the field flattest (same currents)
// or the gradient most linear (opposed currents), and what they produce at the centre.
//
// A coil is given as in a coil table: inner radius, outer radius, axial length (inner = outer:
// thin; length 0: loop or flat spiral). Spacing is centre to centre.
#pragma once

#include "coilwright/coil_table.hpp"

namespace coilwright {

// Spacing at which d^2Bz/dz^2 vanishes at the centre of a pair with equal currents: the
// inflection point of one coil's axial field, doubled. For thin loops it is the radius
// (Helmholtz). Throws DomainError when the coils would have to overlap.
double flat_pair_spacing(const CoilSection& coil);

// Spacing at which d^3Bz/dz^3 vanishes at the centre of a pair with opposed currents (the
// gradient is then linear to fourth order). For thin loops it is sqrt(3) times the radius.
double gradient_pair_spacing(const CoilSection& coil);

// Centre field (T) of the equal-current pair; turns and current per coil.
double pair_centre_field(const CoilSection& coil, double turns, double current, double spacing);

// Centre gradient dBz/dz (T/m) of the opposed pair: the coil at +spacing/2 carries +current,
// the one at -spacing/2 carries -current.
double gradient_pair_gradient(const CoilSection& coil, double turns, double current, double spacing);

// Helmholtz pair of thin loops: (4/5)^(3/2) mu0 N I / R.
double helmholtz_centre_field(double radius, double turns, double current);

// Spacing (m) of a rectangle pair at which d^2 Bz / dz^2 vanishes at the centre (the
// rectangular counterpart of the Helmholtz spacing): twice the inflection point of the
// single rectangle's on-axis field, found by bracketing and TOMS 748 root finding.
double rect_pair_spacing(double width, double height);

}  // namespace coilwright
