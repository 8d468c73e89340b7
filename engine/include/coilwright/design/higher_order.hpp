// Coaxial designs beyond Helmholtz and Maxwell: several symmetric pairs of loops (or of equal
// windings) whose positions and ampere-turn ratios null every axial derivative of Bz at the
// centre up to the highest order their free parameters allow, and the order a table reaches.
//
// A uniform design with p pairs has p positions and p - 1 ratios (one more of each with a centre
// loop): it nulls the even derivatives of order 2 .. 4p - 2 (4p with a centre loop), so the axial
// field departs from B0 as z^(4p) (z^(4p+2)). A gradient design (opposed pairs) nulls the odd
// derivatives of order 3 .. 4p - 1 above the gradient, so the gradient departs as z^(4p).
// The equations are solved by a damped Newton method from starting points (rounded to three
// digits; src/design/higher_order_seeds.hpp) and each returned design is checked: every nulled
// Taylor coefficient |d^n Bz/dz^n| R^n / (n! |B0|) (gradients: R^(n-1) / |dBz/dz|) is at most
// 1e-11, R the design radius.
#pragma once

#include "coilwright/coil_table.hpp"

namespace coilwright {

// Where the loops of a design lie (the spreadsheet's choice set designConstraint): on a cylinder
// (all radii equal to the given radius) or on a sphere of the given radius.
enum class DesignConstraint { Cylinder = 0, Sphere = 1 };

// Whether a uniform design has a loop at its centre (choice set centreLoop).
enum class CentreLoop { None = 0, Loop = 1 };

inline constexpr int kMaxDesignPairs = 4;

// Uniform design of `pairs` (1..4) symmetric pairs of loops, optionally with a centre loop.
// Rows sorted by z; each row is one turn carrying its ampere-turns as current: the loop nearest
// the centre (the centre loop when there is one) carries `ampere_turns`, the others their ratio
// of it. pairs = 1 without a centre loop is Helmholtz's pair (cylinder: spacing R; sphere: loops
// at z = +-R/sqrt 5); 1 with a centre loop on the sphere is Maxwell's three coils.
CoilTable uniform_coils(double radius, int pairs, double ampere_turns, DesignConstraint constraint,
                        CentreLoop centre = CentreLoop::None);

// Gradient design of `pairs` (1..4) opposed pairs of loops: the loop at +z carries +ampere-turns,
// its mirror the opposite. pairs = 1 on the cylinder is the anti-Helmholtz (Maxwell) pair at
// spacing R sqrt 3.
CoilTable gradient_coils(double radius, int pairs, double ampere_turns, DesignConstraint constraint);

// The same designs with equal windings of the given cross-section instead of loops, centred at
// the positions that null the same derivatives (the several-pair version of the flat and
// gradient pair spacings). Rows: the section, centre z, 1 turn, ampere-turns as current. Found
// by continuation from the loop design at the section's mean radius as the section grows to its
// size. DomainError when the windings would overlap.
CoilTable uniform_thick_coils(const CoilSection& coil, int pairs, double ampere_turns,
                              CentreLoop centre = CentreLoop::None);
CoilTable gradient_thick_coils(const CoilSection& coil, int pairs, double ampere_turns);

// The order of a table at z0: with m the lowest order whose Taylor coefficient of Bz on the axis
// does not vanish (0 for a uniform design, 1 for a gradient one), the next order n > m whose
// coefficient does not vanish. A coefficient vanishes when |c_n| rho^n <= 1e-8 max_k |c_k| rho^k
// (k = 0..20), rho the distance from the point to the nearest winding (the radius of convergence
// of the axial series). Helmholtz: 4; anti-Helmholtz: 3 is nulled, so 5. DomainError when the
// field and its derivatives all vanish, or none but one vanish up to order 20.
int design_order(const CoilTable& table, double z0);

inline constexpr int kMaxDesignOrder = 20;

}  // namespace coilwright
