// Pieces of the set inductance, exposed for tests.
#pragma once

#include "coilwright/sets.hpp"
#include "filament.hpp"

namespace coilwright::internal {

// Points per direction over a thick winding's cross-section for mutual inductance and force.
inline constexpr int kCrossSectionOrder = 4;

// Mutual inductance (H) of two filaments per pair of turns (Neumann, as a line integral of A).
double filament_mutual(const Filament& a, const Filament& b);

// The general path of coil_mutual_inductance (no coaxial shortcut), N1 N2 included.
double general_mutual(const SetCoil& a, const CoilFrame& fa, const SetCoil& b, const CoilFrame& fb);

double parallel_partial(double length, double distance);
double rect_inductance_gmd(double width, double height, double gmd);
double rectangle_gmd(double b, double c);

}  // namespace coilwright::internal
