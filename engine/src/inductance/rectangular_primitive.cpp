// The closed-form primitive of cos(phi) x y / R over both radii and the axial offset.
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
#include "inductance/rectangular_primitive.hpp"

#include <cmath>

namespace coilwright::internal {

template <class Real>
AngleValues<Real> AngleValues<Real>::of(Real phi) {
    const Real half = std::sin(phi / 2);
    return {std::cos(phi), std::sin(phi), 2 * half * half};
}

namespace {

// z - atan(z) without cancellation for small z (alternating series, |z| <= 0.25: 25 terms at
// most for full precision).
template <class Real>
Real z_minus_atan(Real z) {
    if (std::fabs(z) > 0.25) return z - std::atan(z);
    const Real z2 = z * z;
    Real power = z * z2, sum = 0;
    for (int k = 1; k < 40; ++k) {
        const Real term = power / (2 * k + 1);
        sum += (k % 2 != 0) ? term : -term;
        if (std::fabs(term) <= Real(1e-21) * std::fabs(sum)) break;
        power *= z2;
    }
    return sum;
}

// ln(v + R) for R = sqrt(v^2 + w2), w2 = R^2 - v^2 >= 0.
template <class Real>
Real log_sum(Real v, Real R, Real w2) { return v >= 0 ? std::log(v + R) : std::log(w2 / (R - v)); }

}  // namespace

template <class Real>
Real rectangular_primitive(const AngleValues<Real>& a, Real x, Real y, Real u, int k) {
    const Real c = a.c, s = a.s;
    const Real rho2 = (x - y) * (x - y) + 2.0 * x * y * a.one_minus_c;
    const Real R2 = rho2 + u * u, R = std::sqrt(R2), rho = std::sqrt(rho2);
    const Real eta = (y - x) + x * a.one_minus_c, xi = (x - y) + y * a.one_minus_c;
    const Real sx = s * x, sy = s * y;
    const Real Ly = log_sum(eta, R, sx * sx + u * u), Lx = log_sum(xi, R, sy * sy + u * u);
    Real A = 0, Px = 0, Py = 0, B = 0;
    if (u != 0.0) {
        const Real au = std::fabs(u);
        A = std::copysign(std::log((au + R) / rho), u);
        Px = std::atan(u * eta / (sx * R));
        Py = std::atan(u * xi / (sy * R));
        const Real N = sx * sy + c * u * u;
        const Real side = c < 0.0 ? -1.0 : 1.0;  // which of Phi_x + Phi_y (mod pi) stays small
        const Real z = u * s * R / N;
        if (side * N > 0.0 && std::fabs(z) < 0.5)
            B = s * s * s * R * (c * x * y - u * u) / N + u * z_minus_atan(z);
        else
            B = c * s * R - u * std::atan2(side * u * s * R, side * N);
    }
    const Real x3 = x * x * x, y3 = y * y * y;
    const Real cubes = x3 * eta + y3 * xi;       // x^3 eta + y^3 xi
    const Real quartic_angles = x * x3 * Px + y * y3 * Py;
    const Real s3 = s * s * s;
    if (k == 2) {
        const Real uA_R = u * A - R;
        const Real U2R3 = R2 * R2 * R / 20.0 + rho2 * R2 * R / 8.0 + 3.0 * rho2 * rho2 / 8.0 * uA_R;
        const Real U2R = R2 * R / 6.0 + 0.5 * rho2 * uA_R;
        const Real U2Ly = 0.5 * (u * u - sx * sx) * Ly + eta * u * A - 0.5 * eta * R - sx * u * Px;
        const Real U2Lx = 0.5 * (u * u - sy * sy) * Lx + xi * u * A - 0.5 * xi * R - sy * u * Py;
        const Real rest = -(c / 3.0) * (-0.25 * u * (x * y * (u * R - rho2 * A) - cubes * A + s * quartic_angles) +
                                           (1 / Real(5)) * (2.0 * x * y * (R2 * R / 3.0 - rho2 * R) - cubes * R -
                                                  s * s * (x * x3 * x * Ly + y * y3 * y * Lx)));
        return U2R3 / 3.0 + (Real(2) / 3) * c * x * y * U2R + (c / 3.0) * (x3 * U2Ly + y3 * U2Lx) +
               c * (u * u) * (u * u) / (60.0 * s3) * B + rest;
    }
    {  // k == 1
        const Real U1R3 = u * R2 * R / 4.0 + 3.0 * rho2 / 8.0 * (u * R + rho2 * A);
        const Real U1R = 0.5 * (u * R + rho2 * A);
        const Real U1Ly = u * Ly + eta * A - sx * Px, U1Lx = u * Lx + xi * A - sy * Py;
        return U1R3 / 3.0 + (Real(2) / 3) * c * x * y * U1R + (c / 3.0) * (x3 * U1Ly + y3 * U1Lx) +
               c * u * u * u / (12.0 * s3) * B + (c / 12.0) * (x * y * (u * R - rho2 * A) - cubes * A + s * quartic_angles);
    }
}

template struct AngleValues<double>;
template struct AngleValues<long double>;
template double rectangular_primitive(const AngleValues<double>&, double, double, double, int);
template long double rectangular_primitive(const AngleValues<long double>&, long double, long double, long double, int);

}  // namespace coilwright::internal
