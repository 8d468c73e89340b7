// Ready-made coil tables of the classic coaxial arrangements, usable by every table function.
#pragma once

#include "coilwright/coil_table.hpp"

namespace coilwright {

// Ready-made coil tables (rows as in a sheet: inner, outer, length, centre z, turns, current).

// Two identical coils with equal currents at the flattest spacing (Helmholtz for loops).
CoilTable flat_pair_table(const CoilSection& coil, double turns, double current);

// Two identical coils with opposed currents at the most linear spacing; the coil at +z carries
// +current.
CoilTable gradient_pair_table(const CoilSection& coil, double turns, double current);

// Maxwell's three coils for a uniform field (Treatise on Electricity and Magnetism, 1873,
// art. 715): a centre loop of radius R with `turns`, and two loops of radius R sqrt(4/7) at
// z = +/- R sqrt(3/7) carrying 49/64 of its ampere-turns (as turns x 49/64, same current). The
// 2nd and 4th axial derivatives of Bz vanish at the centre.
CoilTable maxwell_table(double radius, double turns, double current);

}  // namespace coilwright
