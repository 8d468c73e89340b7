// Spacing of a rectangle pair with zero second axial derivative at the centre.
//
// On the axis a single rectangle of half sides a, b (in half-diagonals, a^2 + b^2 = 1) gives
//   Bz(z) ~ F(z) = (1/(a^2 + z^2) + 1/(b^2 + z^2)) / sqrt(1 + z^2)
// (sum of the four sides; the centre value is the textbook 2 sqrt(2) mu0 I / (pi s) for a
// square). A pair at +-D/2 has Bz''(0) = 2 F''(D/2), so D = 2 z* where z* is the inflection
// point of F. Differentiating g = p^(-1/2) q^(-1), p = 1 + z^2, q = c + z^2, twice gives
//   g'' p^(5/2) q^3 = -p q^2 + 3 z^2 q^2 + 4 z^2 p q - 2 p^2 q + 8 z^2 p^2,
// negative at z = 0 and ~ 12 z^6 for large z, so the root is bracketed and found by TOMS 748
// (Alefeld, Potra and Shi, ACM TOMS 21, 1995, as implemented in Boost.Math). The inflection
// lies between 0 and twice the shorter half side (0.39 and 1.41 half-diagonals for a square).
// Very long rectangles act as two pairs of infinite wires a short side h apart, whose spacing
// is h / sqrt(3); the relative difference falls like 1.3 (short/long)^4 (measured against
// mpmath), so beyond an aspect ratio of 1e4 that limit is returned directly.
#include <algorithm>
#include <cmath>

#include "numerics/checks.hpp"
#include "numerics/roots.hpp"
#include "coilwright/errors.hpp"
#include "coilwright/field/rect.hpp"

namespace coilwright {

using namespace internal;

namespace {

// F''(z) times the positive factor p^(5/2).
double curvature(double a2, double b2, double z) {
    const double z2 = z * z, p = 1.0 + z2;
    const auto term = [&](double c) {
        const double q = c + z2;
        const double poly = -p * q * q + 3.0 * z2 * q * q + 4.0 * z2 * p * q - 2.0 * p * p * q + 8.0 * z2 * p * p;
        return poly / (q * q * q);
    };
    return term(a2) + term(b2);
}

}  // namespace

double rect_pair_spacing(double width, double height) {
    check::positive(width, "width");
    check::positive(height, "height");
    const double shorter = std::min(width, height), longer = std::max(width, height);
    if (shorter < 1e-4 * longer) return shorter / std::sqrt(3.0);
    const double hw = 0.5 * width, hh = 0.5 * height;
    const double s = std::hypot(hw, hh);
    const double a = hw / s, b = hh / s;
    const double a2 = a * a, b2 = b * b;
    const auto f = [&](double z) { return curvature(a2, b2, z); };

    double lo = 0.0, hi = 2.0 * std::min(a, b);
    double f_lo = f(lo), f_hi = f(hi);
    for (int i = 0; i < 60 && f_hi <= 0.0; ++i) {
        lo = hi;
        f_lo = f_hi;
        hi *= 2.0;
        f_hi = f(hi);
    }
    if (!(f_lo < 0.0 && f_hi > 0.0)) raise_no_convergence("rectangle pair spacing: no sign change of d2Bz/dz2 found");
    const double z = bracketed_root(f, lo, hi, f_lo, f_hi, "the rectangle pair-spacing root", 53);
    return check::finite_result(2.0 * z * s, "spacing");
}

}  // namespace coilwright
