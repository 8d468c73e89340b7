// Pairs of identical coaxial coils: the spacings that make the field flattest (same currents)
// or the gradient most linear (opposed currents), and what they produce at the centre.
//
// A coil is given as in a coil table: inner radius, outer radius, axial length (inner = outer:
// thin; length 0: loop or flat spiral). Spacing is centre to centre.
#pragma once

namespace coilwright {

struct CoilShape {
    double inner_radius;
    double outer_radius;
    double length;
};

// Spacing at which d^2Bz/dz^2 vanishes at the centre of a pair with equal currents: the
// inflection point of one coil's axial field, doubled. For thin loops it is the radius
// (Helmholtz). Throws DomainError when the coils would have to overlap.
double flat_pair_spacing(const CoilShape& coil);

// Spacing at which d^3Bz/dz^3 vanishes at the centre of a pair with opposed currents (the
// gradient is then linear to fourth order). For thin loops it is sqrt(3) times the radius.
double gradient_pair_spacing(const CoilShape& coil);

// Centre field (T) of the equal-current pair; turns and current per coil.
double pair_centre_field(const CoilShape& coil, double turns, double current, double spacing);

// Centre gradient dBz/dz (T/m) of the opposed pair: the coil at +spacing/2 carries +current,
// the one at -spacing/2 carries -current.
double gradient_pair_gradient(const CoilShape& coil, double turns, double current, double spacing);

// Helmholtz pair of thin loops: (4/5)^(3/2) mu0 N I / R.
double helmholtz_centre_field(double radius, double turns, double current);

}  // namespace coilwright

#include "coilwright/coil_table.hpp"

namespace coilwright {

// Ready-made coil tables (rows as in a sheet: inner, outer, length, centre z, turns, current).

// Two identical coils with equal currents at the flattest spacing (Helmholtz for loops).
CoilTable flat_pair_table(const CoilShape& coil, double turns, double current);

// Two identical coils with opposed currents at the most linear spacing; the coil at +z carries
// +current.
CoilTable gradient_pair_table(const CoilShape& coil, double turns, double current);

// Maxwell's three coils for a uniform field (Treatise on Electricity and Magnetism, 1873,
// art. 715): a centre loop of radius R with `turns`, and two loops of radius R sqrt(4/7) at
// z = +/- R sqrt(3/7) carrying 49/64 of its ampere-turns (as turns x 49/64, same current). The
// 2nd and 4th axial derivatives of Bz vanish at the centre.
CoilTable maxwell_table(double radius, double turns, double current);

}  // namespace coilwright
