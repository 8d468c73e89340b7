// Mutual inductance and axial force between coaxial circular windings.
#pragma once

namespace coilwright {

// Mutual inductance (H) of two coaxial circular filaments of radii a and b (m) whose planes
// are `distance` (m) apart: Maxwell's formula, evaluated without cancellation (see
// loop_mutual.cpp). Throws DomainError for bad arguments and SingularPointError when the
// filaments coincide (equal radii at distance 0).
double loop_mutual_inductance(double a, double b, double distance);

// dM/d(distance) (H/m) of the same pair: the axial force on filament b is I_a I_b times this
// (negative: filaments carrying currents in the same sense attract).
double loop_mutual_inductance_slope(double a, double b, double distance);

// The cross-section of a coaxial winding, centred at z = 0: radial extent inner..outer and
// axial extent length, current spread uniformly over it. inner = outer is a current sheet
// (thin solenoid), length = 0 a flat (pancake) winding, both a loop of coincident turns.
struct WindingShape {
    double inner;   // m, > 0
    double outer;   // m, >= inner
    double length;  // m, >= 0
};

// Throws DomainError naming the bad value; `which` prefixes the message (e.g. "coil 1 ").
void validate(const WindingShape& shape, const char* which = "");

// Mutual inductance per pair of turns (H) between two coaxial windings whose centres are
// `distance` (m) apart along the axis (winding 2 minus winding 1), for one turn each: the
// average of Maxwell's filament formula over both cross-sections. Multiply by N1 N2.
// The windings may touch or overlap (co-wound); only coincident filaments (a loop on a loop,
// or a loop on the end circle of a sheet of its radius) are singular.
double winding_mutual_inductance(const WindingShape& w1, const WindingShape& w2, double distance);

// d/d(distance) of winding_mutual_inductance (H/m): the axial force on winding 2 is
// N1 N2 I1 I2 times this.
double winding_mutual_inductance_slope(const WindingShape& w1, const WindingShape& w2, double distance);

}  // namespace coilwright
