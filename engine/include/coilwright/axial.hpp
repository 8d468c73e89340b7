// The field on the axis of coaxial coils and its derivatives of any order up to kMaxAxialOrder,
// from closed forms evaluated on Taylor jets.
#pragma once

#include <vector>

#include "coilwright/coil_table.hpp"
#include "coilwright/taylor.hpp"

namespace coilwright {

inline constexpr int kMaxAxialOrder = 12;
using AxialJet = Jet<kMaxAxialOrder + 1>;

// Bz on the axis of one coil as a jet in z around z0 (coefficients of (z - z0)^k).
// Closed forms: loop mu0 N I a^2 / (2 (a^2+u^2)^(3/2)); thin solenoid
// mu0 N I / (2 L) [u1/sqrt(a^2+u1^2) - u2/sqrt(a^2+u2^2)]; thick winding (uniform current
// density) mu0 N I / (2 L (a2-a1)) [F(u1) - F(u2)], F(u) = u ln((a2+sqrt(a2^2+u^2))/(a1+sqrt(a1^2+u^2)))
// (D. B. Montgomery, Solenoid Magnet Design, 1969, field on the axis of a thick solenoid);
// flat spiral mu0 N I / (2 (a2-a1)) [ln((a2+r2)/(a1+r1)) - a2/r2 + a1/r1], r = sqrt(a^2+u^2).
AxialJet axial_jet(const CoilRow& row, double z0);
AxialJet axial_jet(const CoilTable& table, double z0);

// The same with only the first N coefficients (cheaper when few derivatives are needed);
// instantiated for N = 1, 2, 3, 4 and kMaxAxialOrder + 1.
template <std::size_t N>
Jet<N> axial_jet_n(const CoilRow& row, double z0);
template <std::size_t N>
Jet<N> axial_jet_n(const CoilTable& table, double z0);

// Bz on the axis (T).
double axial_field(const CoilTable& table, double z);

// d^k Bz / dz^k on the axis at z for k = 0..order (T/m^k). order in 0..kMaxAxialOrder.
std::vector<double> axial_derivatives(const CoilTable& table, double z, int order);

}  // namespace coilwright
