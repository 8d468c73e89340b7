// What one element of each function costs, in loop-field evaluations (one is about 10 ns on
// this project's machines). The call layer refuses a call whose total work exceeds
// kMaxWorkPerCall, so that no cell keeps LibreOffice busy for more than about two seconds.
// Every figure the bindings use lives here; they are measured with bench/field-bench (see
// bench/README.md) and rounded up.
#pragma once

#include "coilwright/coil_table.hpp"

namespace coilwright::sheet::work {

// The bound per call: about two seconds of work on a loaded two-core machine.
inline constexpr double kMaxWorkPerCall = 2.0e8;

inline constexpr double kLoopField = 1.0;
inline constexpr double kSolenoidField = 10.0;
inline constexpr double kFlatSpiralField = 40.0;
// Thick windings: typically 20 to 60, a few hundred next to a winding's corners.
inline constexpr double kThickField = 100.0;
inline constexpr double kRectPairField = 2.0;
// A closed form with a few elementary functions (wire, winding, budget, filament inductance).
inline constexpr double kClosedForm = 1.0;
// Thick-coil self or mutual inductance or force (cubature over both cross-sections).
inline constexpr double kThickInductance = 5e4;
// A pair-spacing search along the axis, and the rectangle pair's.
inline constexpr double kPairSpacingSearch = 500.0;
inline constexpr double kRectPairSpacingSearch = 20.0;
// Per row of a table: an axial jet; an axial uniform-region search; a sensitivity of the
// uniform region (about five searches).
inline constexpr double kAxialJetPerRow = 1.0;
inline constexpr double kAxialSearchPerRow = 3000.0;
inline constexpr double kSensitivityPerRow = 15000.0;
// Field points of the whole table per element: gradient (finite differences), radial and
// spherical uniform-region searches.
inline constexpr double kGradientPoints = 4.0;
inline constexpr double kRadialSearchPoints = 3000.0;
inline constexpr double kSphereSearchPoints = 100000.0;

// One field point of the whole table.
double field_point(const CoilTable& table);

// The inductance matrix (and with it series inductance, energy, forces) of a table: a self
// term per row, a mutual term per pair.
double inductance_matrix(const CoilTable& table);

}  // namespace coilwright::sheet::work
