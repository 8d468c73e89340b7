// The field of a layer winding as the sum of its real turns, each a circular loop through the
// wire's centre, and how far the uniform-current-density model (thick_coil_field) is from it.
//
// Conventions (so that anyone can rebuild the turns): wire of overall diameter d wound on a
// former of radius `inner`, coil centred at z = 0. Layer j = 0, 1, ... lies at radius
// inner + d/2 + j p, p = d (square packing) or d sqrt(3)/2 (hexagonal). Square packing: every
// layer holds n turns at z = (k - (n - 1)/2) d, k = 0..n-1. Hexagonal: the even layers
// (j = 0, 2, ...) as square; the odd ones lie in the grooves, n - 1 turns at
// z = (k - (n - 2)/2) d, k = 0..n-2.
#pragma once

#include <vector>

#include "coilwright/field/field_rz.hpp"
#include "coilwright/field/thick_coil.hpp"
#include "coilwright/wire/winding.hpp"

namespace coilwright {

struct LayerWinding {
    double inner_radius;     // m, radius of the former, > 0
    double wire_diameter;    // m, overall (insulated) diameter, the pitch, > 0
    double turns_per_layer;  // whole number >= 1 (the full layers)
    double layers;           // whole number >= 1
    double current;          // A per turn, any sign
    Packing packing = Packing::Square;
};

// Turns the summed fields accept (turns per layer times layers): a field point costs one loop
// field per turn.
inline constexpr double kMaxRealTurns = 1e5;

// Throws DomainError naming the bad value (also above kMaxRealTurns).
void validate(const LayerWinding& winding);

// One turn: its loop radius and axial position.
struct TurnPosition {
    double radius;
    double z;
};
// Every turn, layer by layer from the inside, each layer from -z to +z.
std::vector<TurnPosition> winding_turn_positions(const LayerWinding& winding);
// Turns of layer j (0-based) and the total.
double layer_turns(const LayerWinding& winding, int layer);
double winding_total_turns(const LayerWinding& winding);

// Bz and Br of all turns at (z, r). SingularPointError on a wire's centre line.
FieldRZ real_turns_field(const LayerWinding& winding, double z, double r);

// The azimuthal field of the helices. Each layer advances one wire diameter per turn, so it
// carries the current I along the axis over its length, layer 0 towards +z, layer 1 towards -z
// and so on; an odd number of layers leaves a net axial current I. Model: inside a layer's radius
// its axial current adds nothing (Ampere's law for a cylindrical sheet); outside, it acts as a
// straight current of its length on the axis (Biot-Savart for a segment):
// mu0 s I / (4 pi r) [(z + L/2)/sqrt((z + L/2)^2 + r^2) - (z - L/2)/sqrt((z - L/2)^2 + r^2)],
// s = +1, -1, ... by layer, which in the middle of a long coil is mu0 I_net / (2 pi r) outside
// the winding. On a layer's radius it counts half. Leads and the return path are not modelled.
// Positive along +phi (right-handed about +z).
double real_turns_bphi(const LayerWinding& winding, double z, double r);

// The uniform-current-density coil the turns make: inner radius = former, outer = former +
// d + (layers - 1) p (the radial build, as winding_build), length n d, all turns.
ThickCoilSpec smooth_winding(const LayerWinding& winding);

// |B_turns - B_smooth| / |B_smooth| at (z, r) (Bz and Br together): where the smooth model can be
// trusted. In the far field it tends to the relative difference of the dipole moments (about
// d^2 / (12 r_mean^2) for square packing: a turn's pi a^2 against the mean of pi a^2 over its
// cell). SingularPointError where the smooth field vanishes or on a wire's centre line.
double real_turns_model_error(const LayerWinding& winding, double z, double r);

}  // namespace coilwright
