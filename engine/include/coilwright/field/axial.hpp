// The field on the axis of coaxial coils and its derivatives of any order up to kMaxAxialOrder,
// from closed forms evaluated on Taylor jets (src/field/axial_jet.hpp).
#pragma once

#include <vector>

#include "coilwright/coil_table.hpp"

namespace coilwright {

inline constexpr int kMaxAxialOrder = 12;

// Bz on the axis (T).
double axial_field(const CoilTable& table, double z);

// d^k Bz / dz^k on the axis at z for k = 0..order (T/m^k). order in 0..kMaxAxialOrder.
std::vector<double> axial_derivatives(const CoilTable& table, double z, int order);

}  // namespace coilwright
