// What one misplaced or missing turn of a layer winding (field/real_turns.hpp) does to the
// centre field and to the axial uniform region.
#pragma once

#include "coilwright/design/sensitivity.hpp"
#include "coilwright/field/real_turns.hpp"

namespace coilwright {

// Turns of a winding whose uniform region turn_sensitivity may search (the search sums every
// turn at a few thousand points).
inline constexpr double kMaxSearchTurns = 5000;

// The change of a quantity when turn `turn` (1-based, from -z) of layer `layer` (1-based, from
// the inside) is changed: parameter Position moves it along the axis by `displacement` (m),
// Radius moves it outward by `displacement` (m), Turns removes it (displacement unused); the
// other parameters are a DomainError. Quantity Field: Bz(z0, 0) after minus before (T);
// Uniform: the axial uniform half-length about z0 (axial_uniform_half_length) after minus
// before (m), which needs at most kMaxSearchTurns turns.
double turn_sensitivity(const LayerWinding& winding, double layer, double turn, CoilParameter parameter,
                        double displacement, SensitivityQuantity quantity, double z0, double tolerance);

}  // namespace coilwright
