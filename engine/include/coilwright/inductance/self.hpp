// Self-inductance of circular windings, and the magnetic pressure on a solenoid winding.
#pragma once

#include "coilwright/inductance/mutual.hpp"

namespace coilwright {

// Self-inductance (H) of a circular loop of round wire at low frequency (current uniform over
// the wire), N turns filling a round bundle of the given diameter:
//   L = mu0 N^2 a [ (1 + rho^2 / (8 a^2)) ln(8a / rho) - 7/4 + rho^2 / (24 a^2) ],  rho = d / 2.
// The leading terms are Kirchhoff's and Maxwell's thin-ring result (E. B. Rosa and
// F. W. Grover, Bull. Bureau of Standards 8, 1912; F. W. Grover, Inductance Calculations,
// 1946): -2 is the external part, +1/4 the internal inductance mu0 / (8 pi) per metre of wire.
// The rho^2 terms come from averaging Maxwell's series for nearby coaxial circles over the
// wire's cross-section (our derivation, checked by quadrature). Error about
// 0.002 (rho/a)^4 ln(8a/rho) of mu0 a; the diameter must not exceed the radius.
double loop_self_inductance(double radius, double wire_diameter, double turns);

// Self-inductance (H) of a thin solenoid (current sheet) of radius a, length l, N turns:
// L = mu0 N^2 pi a^2 / l * k_N(2a / l) with Nagaoka's coefficient k_N (H. Nagaoka, J. Coll.
// Sci. Tokyo 27, 1909), written in a form without cancellation (solenoid_inductance.cpp).
double solenoid_inductance(double radius, double length, double turns);

// Nagaoka's coefficient k_N as a function of diameter / length.
double nagaoka_coefficient(double diameter_over_length);

// dL/d(radius) of the thin solenoid at fixed length and turns (H/m), in closed form.
double solenoid_inductance_radius_slope(double radius, double length, double turns);

// Mean outward magnetic pressure (Pa) on the winding of a thin solenoid carrying `current`:
// the radial force from virtual work, (I^2 / 2) dL/da, spread over the winding area
// 2 pi a l. It tends to B^2 / (2 mu0) with B = mu0 N I / l for a long solenoid.
double solenoid_mean_pressure(double radius, double length, double turns, double current);

// Self-inductance per turn squared (H) of a winding with area (a loop has none without its
// wire diameter: DomainError). Thin sheets use the closed form above; other windings the
// average of Maxwell's filament formula over the cross-section taken twice.
double coil_self_inductance(const CoilSection& shape);

// Self-inductance (H) of a winding with area and `turns` turns: turns^2 times the above.
double coil_self_inductance(const CoilSection& shape, double turns);

}  // namespace coilwright
