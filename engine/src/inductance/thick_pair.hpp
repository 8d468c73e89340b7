// Mutual inductance and its axial slope for two coaxial windings that both have area and
// length, by one angle integral of closed-form inner integrals (internal; see thick_pair.cpp).
#pragma once

#include <optional>

#include "coilwright/coil_table.hpp"

namespace coilwright::internal {

enum class PairQuantity {
    Mutual,  // M per turn pair (H)
    Slope,   // dM/d(distance) (H/m)
};

// For windings with inner < outer and length > 0 (lengths in units of the larger outer radius,
// as coil_inductance.cpp passes them). Returns nothing when the corner sums of the closed form
// would cancel too many digits for an accuracy of about 1e-13 (windings thin or long compared
// with their distance to the axis, or far apart): the caller then integrates numerically.
std::optional<double> thick_pair_angle_integral(const CoilSection& w1, const CoilSection& w2, double distance,
                                                PairQuantity quantity);

}  // namespace coilwright::internal
