// What one element of each function costs, in loop-field evaluations (one is about 10 ns on
// this project's machines). The call layer refuses a call whose total work exceeds
// kMaxWorkPerCall, so that no cell keeps LibreOffice busy for more than about two seconds.
// Every figure the bindings use lives here; they are measured with bench/field-bench (see
// bench/README.md) and rounded up.
#pragma once

#include "coilwright/coil_table.hpp"
#include "coilwright/sets.hpp"

namespace coilwright::sheet::work {

// The bound per call: about two seconds of work on a loaded two-core machine.
inline constexpr double kMaxWorkPerCall = 2.0e8;
// An array call still running after this many seconds is ended with an error (the estimate
// above can be wrong for elements far costlier than typical ones).
inline constexpr double kMaxSecondsPerCall = 2.0;

inline constexpr double kLoopField = 1.0;
inline constexpr double kSolenoidField = 10.0;
inline constexpr double kFlatSpiralField = 40.0;
// Thick windings: typically 20 to 60, a few hundred next to a winding's corners.
inline constexpr double kThickField = 100.0;
inline constexpr double kRectPairField = 2.0;
// A closed form with a few elementary functions (wire, winding, budget, filament inductance).
inline constexpr double kClosedForm = 1.0;
// Thick-coil self or mutual inductance or force: one angle integral of closed forms, 15-60 us
// (bench/field-bench coil_self, coil_mutual, coil_force), up to 0.3 ms where extended
// precision is needed (thin or distant windings); the cubature that still serves loops, sheets
// and flat spirals, and the thinnest windings, costs 0.1-5 ms (the deadline ends calls that
// meet many such).
inline constexpr double kThickInductance = 1e4;
// One pair of an inductance matrix: the rows of a table are often far apart compared with
// their size (measured: 400 thick rows 5 cm apart took 8.6 s, about 0.1 ms per pair).
inline constexpr double kThickPairInductance = 1e4;
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

// Higher-order designs: a damped Newton solve on axial jets of order 20 (at most 0.4 ms for
// loops, 35 ms for four pairs of windings, which continue through 8 cross-sections; measured on
// a loaded two-core machine). STACK_ORDER: a jet of order 20 per row.
inline constexpr double kLoopDesign = 1e5;
inline constexpr double kWindingDesign = 5e6;
inline constexpr double kOrderJetPerRow = 4.0;
// Real turns: one scalar loop field per turn per point (59 ns, six units: bench real_turns_100),
// up to field/real_turns.hpp's 100000 turns (50 ms per point on a loaded machine). The estimate
// is a winding of about 330 turns; arrays of larger ones end at the call's deadline. TURNS_SENSITIVITY's uniform quantity searches at most
// 5000 turns twice (28 ms).
inline constexpr double kRealTurnsPoint = 2000.0;
inline constexpr double kTurnSensitivity = 3e6;

// Coil sets: a filament rectangle costs two loop fields; a thick rectangle integrates strips in
// closed form over its depth (0.1 ms near the winding, up to 6 ms deep inside: the call
// layer's deadline ends calls that meet many such points). Force and torque integrate the
// other rows' field along a turn (up to 2000 points near another winding, 16 lines for a
// thick row); the uniform sphere searches up to a few hundred shells of 256 directions.
inline constexpr double kRectFilamentField = 2.0;
inline constexpr double kThickRectField = 2e4;
inline constexpr double kForceLinePoints = 16.0 * 2000.0;
inline constexpr double kSetSphereSearchPoints = 2e5;
inline constexpr double kSetInductancePerPair = 2e4;
inline constexpr double kRigDesign = 100.0;

// One field point of the whole table.
double field_point(const CoilTable& table);

// The inductance matrix (and with it series inductance, energy, forces) of a table: a self
// term per row, a mutual term per pair.
double inductance_matrix(const CoilTable& table);

// One field point of the whole coil set.
double set_point(const CoilSet& set);

}  // namespace coilwright::sheet::work
