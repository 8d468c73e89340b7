// Mutual inductance and axial force between coaxial circular windings.
#pragma once

#include "coilwright/coil_table.hpp"

namespace coilwright {

// Mutual inductance (H) of two coaxial circular filaments of radii a and b (m) whose planes
// are `distance` (m) apart: Maxwell's formula, evaluated without cancellation (see
// loop_mutual.cpp). Throws DomainError for bad arguments and SingularPointError when the
// filaments coincide (equal radii at distance 0).
double loop_mutual_inductance(double a, double b, double distance);

// dM/d(distance) (H/m) of the same pair: the axial force on filament b is I_a I_b times this
// (negative: filaments carrying currents in the same sense attract).
double loop_mutual_inductance_slope(double a, double b, double distance);

// Mutual inductance per pair of turns (H) between two coaxial windings whose centres are
// `distance` (m) apart along the axis (winding 2 minus winding 1), for one turn each: the
// average of Maxwell's filament formula over both cross-sections. Multiply by N1 N2.
// The windings may touch or overlap (co-wound); only coincident filaments (a loop on a loop,
// or a loop on the end circle of a sheet of its radius) are singular.
double coil_mutual_inductance(const CoilSection& w1, const CoilSection& w2, double distance);

// d/d(distance) of coil_mutual_inductance (H/m): the axial force on winding 2 is
// N1 N2 I1 I2 times this.
double coil_mutual_inductance_slope(const CoilSection& w1, const CoilSection& w2, double distance);

// Mutual inductance (H) of two coaxial windings with turns1 and turns2 turns.
double coil_mutual_inductance(const CoilSection& w1, double turns1, const CoilSection& w2, double turns2,
                              double distance);

// Coupling coefficient M / sqrt(L1 L2) of two coaxial loops of round wire (radius and wire
// diameter each; the coefficient does not depend on the turns).
double loop_coupling(double radius1, double wire_diameter1, double radius2, double wire_diameter2, double distance);

// Coupling coefficient of two coaxial windings with area (a loop has no self-inductance without
// its wire diameter: DomainError naming it, use loop_coupling).
double coil_coupling(const CoilSection& w1, const CoilSection& w2, double distance);

// Axial force (N, positive towards +z) on loop 2 from loop 1, loop 2 lying `distance` along +z:
// N1 N2 I1 I2 dM/d(distance).
double loop_axial_force(double radius1, double turns1, double current1, double radius2, double turns2, double current2,
                        double distance);

// The same for two coaxial windings.
double coil_axial_force(const CoilSection& w1, double turns1, double current1, const CoilSection& w2, double turns2,
                        double current2, double distance);

}  // namespace coilwright
