// Tolerance analysis of a coil table: how the centre field and the uniform region move per unit
// error in one row's dimension, position, turns or current. Tells a designer which dimension to
// hold tight.
#pragma once

#include <cstddef>

#include "coilwright/coil_table.hpp"

namespace coilwright {

enum class CoilParameter {
    Radius,    // inner and outer radius together (the only radius of a thin row), m
    Inner,     // inner radius alone (thick rows), m
    Outer,     // outer radius alone (thick rows), m
    Length,    // axial length, m (a loop grows into a short solenoid)
    Position,  // centre z, m
    Turns,     // per turn
    Current,   // per ampere
};

// d Bz(z0) / d parameter of row `index` (0-based), Bz on the axis. T per m, per turn or per A.
// Exact for turns, current and position; central differences with Richardson extrapolation for
// the others (about 1e-9 relative).
double field_sensitivity(const CoilTable& table, std::size_t index, CoilParameter parameter, double z0);

// Rate of change of the axial uniform half-length (see axial_uniform_half_length) per unit error
// of the parameter, in the direction of the error that shrinks the region most: a negative
// number (m per m, m per turn, m per A); 0 when neither direction shrinks it. At a symmetric
// design the half-length has a kink, which this one-sided measure handles.
double uniform_length_sensitivity(const CoilTable& table, std::size_t index, CoilParameter parameter,
                                  double z0, double tolerance);

// The table with one parameter of one row moved by delta (validated).
CoilTable perturbed(const CoilTable& table, std::size_t index, CoilParameter parameter, double delta);

}  // namespace coilwright
