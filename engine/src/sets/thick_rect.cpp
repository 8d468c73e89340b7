// Field of a thick rectangular winding: N turns spread uniformly over a cross-section of
// depth D (across the sides) and breadth W (along the axis). The turn at offset s from the
// mean turn, t along the axis, is a rectangle of width w + 2s and height h + 2s (sharp,
// mitred corners) in the plane z = t.
//
// Far from the winding (farther than its cross-section's size) the closed-form filament field
// (rect.hpp, free of cancellation far away) is averaged over (s, t) by adaptive Gauss-Legendre
// cubature. Nearer, and inside, the average over t is done in closed form: each side of a turn
// swept along the axis is a flat strip, whose field follows from the straight-segment field
// B = mu0/(4 pi) (y n - zeta q) / (y^2 + zeta^2) sum_ends +-X / R by the two integrals
//   int y X / ((y^2 + zeta^2) R) dzeta = atan(X zeta / (y R)),
//   int zeta X / ((y^2 + zeta^2) R) dzeta = (1/2) ln((R - X) / (R + X)),   R^2 = X^2 + y^2 + zeta^2
// (X the signed distance along the side to an end, y the in-plane distance from the side's
// line, zeta the height above it). The remaining integral over s has at most a logarithmic
// singularity at the turn through the point; it is split there and graded (s = s* + d u^3).
// D = 0 is a rectangular current sheet (the strips alone), W = 0 a flat rectangular spiral;
// their own surface is singular (the field jumps across it) and is an error, as for the
// coaxial sheet and spiral.
#include <algorithm>
#include <cmath>

#include "box_cubature.hpp"
#include "coil_kernels.hpp"
#include "coilwright/constants.hpp"
#include "coilwright/errors.hpp"
#include "coilwright/field/rect.hpp"
#include "numerics/policy.hpp"

namespace coilwright::internal {

namespace {

constexpr int kOrder = 8;
constexpr double kRelTol = 1e-13;
constexpr double kFallbackTol = 1e-10;  // accepted only when the budget of splits is spent
constexpr int kMaxSplits = 3000;

// atan(a / b), continuous through b = 0 from either side's limit (0 when a = 0 too).
double atan_ratio(double a, double b) {
    if (b > 0.0) return std::atan2(a, b);
    if (b < 0.0) return std::atan2(-a, -b);
    return a > 0.0 ? kHalfPi : a < 0.0 ? -kHalfPi : 0.0;
}

// ln((R - X) / (R + X)) without cancellation; rho2 = y^2 + zeta^2 = R^2 - X^2.
double log_ratio(double x, double r, double rho2) {
    return x > 0.0 ? std::log(rho2 / ((r + x) * (r + x))) : std::log((r - x) * (r - x) / rho2);
}

// The two primitives of a strip at height zeta, summed over its ends (X1 = -xi, X2 = L - xi).
void strip_primitives(double xi, double len, double y, double zeta, double& along_n, double& along_q) {
    along_n = along_q = 0.0;
    const double rho2 = y * y + zeta * zeta;
    for (const double sign : {-1.0, 1.0}) {
        const double x = sign < 0.0 ? -xi : len - xi;
        const double r = std::sqrt(x * x + rho2);
        along_n += sign * atan_ratio(x * zeta, y * r);
        along_q += sign * 0.5 * log_ratio(x, r, rho2);
    }
}

// Field of the turn at offset s swept over the breadth (unit total current spread uniformly
// over t in [-W/2, W/2]), in units of mu0 / (4 pi), local coordinates.
Eigen::Vector3d swept_turn(double hu, double hv, double breadth, const Eigen::Vector3d& p) {
    // Sides in the sense of the current: start A, direction e, q = n x e, length.
    struct Side {
        double ax, ay, ex, ey, qx, qy, len;
    };
    const Side sides[4] = {{-hu, -hv, 1, 0, 0, 1, 2 * hu},
                           {hu, -hv, 0, 1, -1, 0, 2 * hv},
                           {hu, hv, -1, 0, 0, -1, 2 * hu},
                           {-hu, hv, 0, -1, 1, 0, 2 * hv}};
    const double za = p.z() - 0.5 * breadth, zb = p.z() + 0.5 * breadth;  // zeta over the strip
    Eigen::Vector3d b = Eigen::Vector3d::Zero();
    for (const Side& s : sides) {
        const double dx = p.x() - s.ax, dy = p.y() - s.ay;
        const double xi = dx * s.ex + dy * s.ey, y = dx * s.qx + dy * s.qy;
        double na, qa, nb, qb;
        strip_primitives(xi, s.len, y, za, na, qa);
        strip_primitives(xi, s.len, y, zb, nb, qb);
        const double bn = (nb - na) / breadth, bq = -(qb - qa) / breadth;
        b += Eigen::Vector3d(bq * s.qx, bq * s.qy, bn);
    }
    return b;
}

}  // namespace

Eigen::Vector3d thick_rect_field_local(const SetCoil& coil, const Eigen::Vector3d& p) {
    const double w = coil.size, h = coil.height, D = coil.depth, W = coil.breadth;
    // The turn whose perimeter passes over the point: offsets from the mean turn's sides.
    const double s_star = std::max(std::fabs(p.x()) - 0.5 * w, std::fabs(p.y()) - 0.5 * h);
    const double t_star = p.z();
    const bool on_span_s = std::fabs(s_star) <= 0.5 * D, on_span_t = std::fabs(t_star) <= 0.5 * W;
    if (D == 0.0 && s_star == 0.0 && on_span_t)
        raise_singular_point("the point lies on the rectangular current sheet (the field jumps across it)");
    if (W == 0.0 && t_star == 0.0 && on_span_s)
        raise_singular_point("the point lies on the flat rectangular winding (the field jumps across it)");
    const Interval s_range{-0.5 * D, 0.5 * D}, t_range{-0.5 * W, 0.5 * W};
    const double s_c = std::clamp(s_star, s_range.lo, s_range.hi), t_c = std::clamp(t_star, t_range.lo, t_range.hi);
    const double gap = std::hypot(s_star - s_c, t_star - t_c), extent = std::max(D, W);
    const double scale = coil.turns * coil.current;

    if (W == 0.0 || gap > 2.0 * extent) {
        // Far away (or a flat winding): the filament field averaged over (s, t).
        auto unit_turn = [&](double s, double t) {
            return rect_field({w + 2.0 * s, h + 2.0 * s, 1.0, 1.0}, {p.x(), p.y(), p.z() - t});
        };
        BoxCubature<decltype(unit_turn)> cubature(unit_turn, kOrder);
        const CubatureResult r = cubature.integrate(s_range, t_range, s_star, t_star, kRelTol, kFallbackTol, kMaxSplits);
        const double area = (D == 0.0 ? 1.0 : D) * (W == 0.0 ? 1.0 : W);
        return (scale / area) * r.integral;
    }
    const double unit = kMu0 / (4.0 * kPi);
    if (D == 0.0) return (scale * unit) * swept_turn(0.5 * w, 0.5 * h, W, p);
    // Near or inside: strips in closed form, the offsets s by graded adaptive Gauss-Legendre on
    // each side of s_c: s = s_c + (end - s_c) u^3.
    Eigen::Vector3d integral = Eigen::Vector3d::Zero();
    for (const double end : {s_range.lo, s_range.hi}) {
        const double span = end - s_c;
        if (span == 0.0) continue;
        auto graded = [&](double u, double) {
            const double s = s_c + span * u * u * u;
            return (3.0 * u * u * swept_turn(0.5 * w + s, 0.5 * h + s, W, p)).eval();
        };
        BoxCubature<decltype(graded)> cubature(graded, kOrder);
        integral += std::fabs(span) * cubature.integrate({0.0, 1.0}, {0.0, 0.0}, 0.0, 0.0, kRelTol, kFallbackTol, kMaxSplits)
                                         .integral;
    }
    return (scale * unit / D) * integral;
}

}  // namespace coilwright::internal
