// Closed-form inner integrals of Neumann's formula for two coaxial windings of rectangular
// cross-section (internal).
//
// Neumann's double line integral for two coaxial circles of radii x and y at axial offset u is
// mu0 x y integral_0^pi cos(phi) / R dphi, R^2 = x^2 + y^2 - 2 x y cos(phi) + u^2. Averaged over
// two rectangular cross-sections (uniform current density) the four integrals over x, y and the
// two axial positions can be done in closed form for each angle, which leaves one integral over
// phi: the route of S. Babic and C. Akyel, "New analytic-numerical solutions for the mutual
// inductance of two coaxial circular coils with rectangular cross section in air", IEEE Trans.
// Magn. 42(6), 2006, 1661-1669 (and, for the axial force, S. Babic, C. Akyel, "Magnetic force
// calculation between thin coaxial circular coils in air", IEEE Trans. Magn. 44(4), 2008). The
// primitive below is our own derivation of that reduction (rectangular_primitive.cpp): written
// so that it stays regular as phi -> 0 and phi -> pi, where its separate terms grow like
// 1 / sin^3(phi) and must cancel.
#pragma once

namespace coilwright::internal {

// The angle's trigonometric values, 1 - cos formed without cancellation. Real is double, or
// long double where the corner sums cancel more digits than double can spare.
template <class Real>
struct AngleValues {
    Real c, s, one_minus_c;
    static AngleValues of(Real phi);
};

// P_k(x, y, u) with d/dx d/dy (d/du)^k P_k = cos(phi) x y / R: the primitive over both radii
// and k times over the axial offset (k = 2 for the mutual inductance of two windings with
// length, k = 1 for its slope), up to terms that the corner sums cancel: terms independent of
// x or of y, and polynomials of degree < k in u. Even in u for k = 2, odd for k = 1.
// x, y > 0; phi in (0, pi).
template <class Real>
Real rectangular_primitive(const AngleValues<Real>& a, Real x, Real y, Real u, int k);

}  // namespace coilwright::internal
