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

// Double (fast, four corners at a time where the processor has AVX2), or Extended where double
// would lose too much (long double: x87 extended precision on x86-64, about ten times slower).
enum class AnglePrecision { Double, Extended };

// The value, or nothing when the corner sums would cancel too many digits for an accuracy of
// about 1e-13 in the precision asked; then whether extended precision would keep enough.
struct AngleIntegral {
    std::optional<double> value;
    bool extended_may_help = false;
};

// For windings with inner < outer and length > 0 (lengths in units of the larger outer radius,
// as coil_inductance.cpp passes them). The corner sums of the closed form cancel where windings
// are thin or long compared with their distance to the axis, or far apart: the caller then
// takes another method.
AngleIntegral thick_pair_angle_integral(const CoilSection& w1, const CoilSection& w2, double distance,
                                        PairQuantity quantity, AnglePrecision precision);

}  // namespace coilwright::internal
