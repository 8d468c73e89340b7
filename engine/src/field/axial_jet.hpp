// Bz on the axis of coaxial coils as a Taylor jet: its value and derivatives at a point.
#pragma once

#include "coilwright/coil_table.hpp"
#include "coilwright/field/axial.hpp"
#include "numerics/taylor.hpp"

namespace coilwright::internal {

using AxialJet = Jet<kMaxAxialOrder + 1>;

// Jets long enough for the higher-order designs (orders 0..20).
inline constexpr std::size_t kDesignJetSize = 21;

// Bz on the axis as a jet in z around z0 (coefficients of (z - z0)^k), with the first N
// coefficients; instantiated for N = 1, 2, 3, 4, kMaxAxialOrder + 1 and kDesignJetSize. Closed forms: loop
// mu0 N I a^2 / (2 (a^2+u^2)^(3/2)); thin solenoid mu0 N I / (2 L) [u1/sqrt(a^2+u1^2) -
// u2/sqrt(a^2+u2^2)]; thick winding (uniform current density) mu0 N I / (2 L (a2-a1))
// [F(u1) - F(u2)], F(u) = u ln((a2+sqrt(a2^2+u^2))/(a1+sqrt(a1^2+u^2))) (D. B. Montgomery,
// Solenoid Magnet Design, 1969, field on the axis of a thick solenoid); flat spiral
// mu0 N I / (2 (a2-a1)) [ln((a2+r2)/(a1+r1)) - a2/r2 + a1/r1], r = sqrt(a^2+u^2).
template <std::size_t N>
Jet<N> axial_jet_n(const CoilRow& row, double z0);
template <std::size_t N>
Jet<N> axial_jet_n(const CoilTable& table, double z0);

inline AxialJet axial_jet(const CoilTable& table, double z0) { return axial_jet_n<kMaxAxialOrder + 1>(table, z0); }

}  // namespace coilwright::internal
