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
// primitive below is our own derivation of that reduction (derivation below): written
// so that it stays regular as phi -> 0 and phi -> pi, where its separate terms grow like
// 1 / sin^3(phi) and must cancel.
//
// Derivation (checked against numerical differentiation at 40 digits with mpmath). With
// c = cos(phi), s = sin(phi), rho^2 = x^2 + y^2 - 2 c x y, R^2 = rho^2 + u^2, eta = y - c x,
// xi = x - c y, L_x = ln(xi + R), L_y = ln(eta + R), A = asinh(u / rho),
// Phi_x = atan(u eta / (s x R)), Phi_y = atan(u xi / (s y R)):
//  - over x: integral x y / R dx = y R + c y^2 L_x, since x / R = (dR/dx + c dR/dy) / s^2;
//  - over y: R^3/3 + (2/3) c x y R + (c/3)(x^3 L_y + y^3 L_x) + c u^2/(3 s^3) B,
//    B = c s R - u (Phi_x + Phi_y): the integral of (x - c y) / ((s^2 y^2 + u^2) R) is
//    atan((s^2 x y + c u^2) / (s u R)) / (s u), which equals pi/2 sign(u) - Phi_x - Phi_y;
//  - over u, once and twice (U1, U2), term by term; the terms with 1/s^2 and 1/s^3 gather into
//    c u^3/(12 s^3) B (once) and c u^4/(60 s^3) B (twice), the logarithms of u cancelling.
// B = O(s^3) as s -> 0 (and as s -> 0 near phi = pi, with Phi_x + Phi_y shifted by pi there, a
// constant the corner sums cancel): it is formed from tan(Phi_x + Phi_y) = u s R / N,
// N = s^2 x y + c u^2, as s^3 R (c x y - u^2) / N + u (z - atan z), z = u s R / N, with
// z - atan z from its series when z is small. Logarithms of sums that may cancel are taken of
// the conjugate: eta + R = (s^2 x^2 + u^2) / (R - eta).
#pragma once

#include <cmath>

#include "coilwright/constants.hpp"
#include "numerics/lane_math.hpp"
#include "numerics/lanes.hpp"

namespace coilwright::internal {

// The angle's trigonometric values, 1 - cos formed without cancellation. Real is double, or
// long double where the corner sums cancel more digits than double can spare.
template <class Real>
struct AngleValues {
    Real c, s, one_minus_c;
    static AngleValues of(Real phi);
};

template <class Real>
inline AngleValues<Real> AngleValues<Real>::of(Real phi) {
    const Real half = std::sin(phi / 2);
    return {std::cos(phi), std::sin(phi), 2 * half * half};
}

namespace rectangular_detail {

// z - atan(z) for |z| <= 1/4 by its alternating series z^3/3 - z^5/5 + ..., 18 terms (the first
// left out is below 1e-23 of the sum), in Horner form so that a pack takes it without branches.
template <class Real, class V>
COILWRIGHT_LANE_INLINE V z_minus_atan_series(V z) {
    constexpr int kTerms = 18;
    const V w = z * z;
    V sum = w * Real(0) + Real((kTerms - 1) % 2 == 0 ? 1 : -1) / Real(2 * (kTerms - 1) + 3);
    for (int j = kTerms - 2; j >= 0; --j) sum = sum * w + Real(j % 2 == 0 ? 1 : -1) / Real(2 * j + 3);
    return z * w * sum;
}

// ln(v + R) for R = sqrt(v^2 + w2): where v < 0 the sum cancels, and the conjugate
// w2 / (R - v) is taken instead.
template <class V>
COILWRIGHT_LANE_INLINE V log_sum(V v, V R, V w2) {
    const V zero{};
    return lane_log(lane_select(v >= zero, v + R, w2 / (R - v)));
}

}  // namespace rectangular_detail

// P_k(x, y, u) with d/dx d/dy (d/du)^k P_k = cos(phi) x y / R: the primitive over both radii
// and k times over the axial offset (k = 2 for the mutual inductance of two windings with
// length, k = 1 for its slope), up to terms that the corner sums cancel: terms independent of
// x or of y, and polynomials of degree < k in u. Even in u for k = 2, odd for k = 1.
// x, y > 0; phi in (0, pi). V is Real, or for Real = double a pack of four corners (Pack,
// numerics/lanes.hpp), whose lanes each get the value the single corner would, to a few units in
// the last place (its logarithms and arc tangents are numerics/lane_math.hpp's).
// Always inlined: the pack copy is compiled inside a function for AVX2 (corner_sums.cpp), and a
// pack must not cross a call between code built for different processors.
template <class Real, class V>
COILWRIGHT_LANE_INLINE V rectangular_primitive(const AngleValues<Real>& a, V x, V y, V u, int k) {
    using rectangular_detail::log_sum;
    using rectangular_detail::z_minus_atan_series;
    const Real c = a.c, s = a.s;
    const V zero{};
    const V rho2 = (x - y) * (x - y) + Real(2) * x * y * a.one_minus_c;
    const V R2 = rho2 + u * u, R = lane_sqrt(R2), rho = lane_sqrt(rho2);
    const V eta = (y - x) + x * a.one_minus_c, xi = (x - y) + y * a.one_minus_c;
    const V sx = s * x, sy = s * y;
    const V Ly = log_sum(eta, R, sx * sx + u * u), Lx = log_sum(xi, R, sy * sy + u * u);
    // At u = 0 the terms below vanish (A, the angles) or are multiplied by a power of u (B).
    const V au = lane_abs(u);
    const V A = lane_copysign(lane_log((au + R) / rho), u);
    const V Px = lane_atan(u * eta / (sx * R));
    const V Py = lane_atan(u * xi / (sy * R));
    const V N = sx * sy + c * u * u;
    const Real side = c < Real(0) ? Real(-1) : Real(1);  // which of Phi_x + Phi_y (mod pi) stays small
    const V z = u * s * R / N;
    const auto near_zero = (side * N > zero) & (lane_abs(z) < zero + Real(0.5));
    // One arc tangent serves both forms: of z near zero, of the quotient otherwise (atan2).
    const V Y = side * u * s * R, X = side * N;
    const V t = lane_atan(lane_select(near_zero, z, Y / X));
    const V z_minus_atan = lane_select(lane_abs(z) <= zero + Real(0.25), z_minus_atan_series<Real>(z), z - t);
    // atan2 = atan(Y / X) +- pi where X < 0, pi added in two parts (its double and the rest).
    const Real pi_rest = Real(1.2246467991473532e-16);
    const V sign_pi = lane_select(Y >= zero, zero + Real(1), zero - Real(1));
    const V quadrant = lane_select(X < zero, sign_pi * Real(kPi), zero);
    const V quadrant_rest = lane_select(X < zero, sign_pi * pi_rest, zero);
    const V B_near = s * s * s * R * (c * x * y - u * u) / N + u * z_minus_atan;
    const V B_far = c * s * R - u * ((t + quadrant) + quadrant_rest);
    const V B = lane_select(u == zero, zero, lane_select(near_zero, B_near, B_far));

    const V x3 = x * x * x, y3 = y * y * y;
    const V cubes = x3 * eta + y3 * xi;  // x^3 eta + y^3 xi
    const V quartic_angles = x * x3 * Px + y * y3 * Py;
    const Real s3 = s * s * s;
    if (k == 2) {
        const V uA_R = u * A - R;
        const V U2R3 = R2 * R2 * R / Real(20) + rho2 * R2 * R / Real(8) + Real(3) * rho2 * rho2 / Real(8) * uA_R;
        const V U2R = R2 * R / Real(6) + Real(0.5) * rho2 * uA_R;
        const V U2Ly = Real(0.5) * (u * u - sx * sx) * Ly + eta * u * A - Real(0.5) * eta * R - sx * u * Px;
        const V U2Lx = Real(0.5) * (u * u - sy * sy) * Lx + xi * u * A - Real(0.5) * xi * R - sy * u * Py;
        const V rest = -(c / Real(3)) * (Real(-0.25) * u * (x * y * (u * R - rho2 * A) - cubes * A + s * quartic_angles) +
                                         (1 / Real(5)) * (Real(2) * x * y * (R2 * R / Real(3) - rho2 * R) - cubes * R -
                                                          s * s * (x * x3 * x * Ly + y * y3 * y * Lx)));
        return U2R3 / Real(3) + (Real(2) / 3) * c * x * y * U2R + (c / Real(3)) * (x3 * U2Ly + y3 * U2Lx) +
               c * (u * u) * (u * u) / (Real(60) * s3) * B + rest;
    }
    // k == 1
    const V U1R3 = u * R2 * R / Real(4) + Real(3) * rho2 / Real(8) * (u * R + rho2 * A);
    const V U1R = Real(0.5) * (u * R + rho2 * A);
    const V U1Ly = u * Ly + eta * A - sx * Px, U1Lx = u * Lx + xi * A - sy * Py;
    return U1R3 / Real(3) + (Real(2) / 3) * c * x * y * U1R + (c / Real(3)) * (x3 * U1Ly + y3 * U1Lx) +
           c * u * u * u / (Real(12) * s3) * B +
           (c / Real(12)) * (x * y * (u * R - rho2 * A) - cubes * A + s * quartic_angles);
}

}  // namespace coilwright::internal
