// Integration over the winding radius a of a field kernel (thin sheet or loop of radius a).
//
// Seen as a function of a, the field at a point (z, r) of a coaxial loop or sheet of radius a
// is analytic except where the point touches a rim: at a = r +- i zeta (zeta the axial distance
// to the rim) and at a = -r +- i zeta; for a sheet, Bz also jumps at a = r when the point lies
// between the end planes. So the interval is split at a = r, and each piece is mapped with
//   a = r +- s sinh(t),  s = the smallest zeta,
// (when r is within a piece width of the piece) which puts the nearest singularity at t = i pi / 2
// whatever s is: a point close to a corner of
// the winding costs a few more segments, not a divergent number of nodes. Each segment then
// gets Gauss-Legendre with the node count set by the Bernstein ellipse through the nearest
// mapped singularity (see gauss_legendre.hpp); segments are halved until that ellipse is wide
// enough. The segment count is bounded, so the work of one point is bounded.
#pragma once

#include <algorithm>
#include <array>
#include <cmath>
#include <complex>
#include <cstddef>
#include <type_traits>

#include "coilwright/constants.hpp"
#include "coilwright/field/field_rz.hpp"
#include "numerics/gauss_legendre.hpp"

namespace coilwright::internal {

// Where the kernel is singular in the complex a plane: a = +-r + i zeta for each zeta listed.
struct RadialSingularities {
    double r;                       // distance of the field point from the axis (>= 0)
    std::array<double, 2> zetas;    // axial distances from the point to the rims (>= 0)
    std::size_t count;              // how many zetas are used (1 or 2)
};

struct RadialQuadratureOptions {
    double exponent = 17.0;    // points per segment: ceil(exponent / ln rho)
    double min_rho = 2.0;      // segments are halved until the ellipse parameter reaches this
    int max_depth = 12;        // at most 2^12 segments per piece (never reached in practice)
    double scale_floor = 1e-15;  // relative floor of s (a point on an end plane has zeta = 0)
};

namespace radial_detail {

// Recursive Gauss-Legendre in a variable t, with the kernel's singular points mapped to t.
// `at(t)` returns {a, a - r, da/dt}.
template <class Kernel, class Map>
FieldRZ integrate_segment(const Kernel& kernel, const Map& at, double t0, double t1, const std::complex<double>* poles,
                          std::size_t n_poles, const RadialQuadratureOptions& opt, int depth) {
    const double centre = 0.5 * (t0 + t1), half = 0.5 * (t1 - t0);
    double rho = HUGE_VAL;
    for (std::size_t k = 0; k < n_poles; ++k) rho = std::min(rho, bernstein_rho(centre, half, poles[k]));
    if (rho < opt.min_rho && depth < opt.max_depth) {
        FieldRZ sum = integrate_segment(kernel, at, t0, centre, poles, n_poles, opt, depth + 1);
        sum += integrate_segment(kernel, at, centre, t1, poles, n_poles, opt, depth + 1);
        return sum;
    }
    const int points = gauss_points_for(rho, opt.exponent);
    if constexpr (std::is_invocable_v<const Kernel&, const double*, const double*, int, FieldRZ*>) {
        // A kernel for many radii at once: all nodes of the segment in one call, added in the
        // order and with the operations of gauss_legendre (the same bits as node by node).
        double t[kMaxGaussNodes], w[kMaxGaussNodes], a[kMaxGaussNodes], a_minus_r[kMaxGaussNodes], jacobian[kMaxGaussNodes];
        FieldRZ value[kMaxGaussNodes];
        const int n = gauss_legendre_nodes(centre, half, points, t, w);
        for (int i = 0; i < n; ++i) {
            const auto node = at(t[i]);
            a[i] = node.a;
            a_minus_r[i] = node.a_minus_r;
            jacobian[i] = node.jacobian;
        }
        kernel(a, a_minus_r, n, value);
        FieldRZ sum{};
        for (int i = 0; i < n; ++i) sum += w[i] * (jacobian[i] * value[i]);
        return half * sum;
    } else {
        const auto mapped = [&](double t) {
            const auto [a, a_minus_r, jacobian] = at(t);
            return jacobian * kernel(a, a_minus_r);
        };
        return gauss_legendre(mapped, centre, half, points);
    }
}

struct Node {
    double a, a_minus_r, jacobian;
};

}  // namespace radial_detail

// Integral over a in [a1, a2] (0 < a1 < a2) of kernel(a, a - r) -> FieldRZ, or of a kernel that
// takes n radii at once: kernel(const double* a, const double* a_minus_r, int n, FieldRZ* out).
template <class Kernel>
FieldRZ integrate_over_radius(const Kernel& kernel, double a1, double a2, const RadialSingularities& sing,
                              const RadialQuadratureOptions& opt = {}) {
    using radial_detail::Node;
    const double r = sing.r;
    double zeta_min = sing.zetas[0];
    for (std::size_t k = 1; k < sing.count; ++k) zeta_min = std::min(zeta_min, sing.zetas[k]);
    const double s = std::max(zeta_min, opt.scale_floor * std::max(a2, r));

    FieldRZ total{};
    const double cuts[3] = {a1, std::clamp(r, a1, a2), a2};
    for (int piece = 0; piece < 2; ++piece) {
        const double x0 = cuts[piece], x1 = cuts[piece + 1];
        if (!(x1 > x0)) continue;
        const double width = x1 - x0, gap = std::max(x0 - r, r - x1);  // gap >= 0: r outside or at an end
        std::complex<double> poles[12];
        std::size_t n = 0;
        if (gap > width) {
            // Far from r compared with its width: plain Gauss-Legendre in a (the sinh map would
            // lose digits to a = r +- s sinh t cancelling), poles +-r + i zeta.
            for (std::size_t k = 0; k < sing.count; ++k)
                for (double base : {r, -r}) poles[n++] = {base, sing.zetas[k]};
            const auto at = [&](double a) { return Node{a, a - r, 1.0}; };
            total += radial_detail::integrate_segment(kernel, at, x0, x1, poles, n, opt, 0);
            continue;
        }
        // Right of r: a = r + s sinh t; left of r: a = r - s sinh t; t >= 0 on the piece.
        const double orientation = x0 >= r ? 1.0 : -1.0;
        double t0 = std::asinh(orientation * (x0 - r) / s), t1 = std::asinh(orientation * (x1 - r) / s);
        if (t0 > t1) std::swap(t0, t1);
        // A kernel singular point sigma appears at every t with s sinh t = orientation (sigma - r):
        // t_p and i pi - t_p, modulo 2 pi i. With the conjugate points (mirror images, same
        // Bernstein parameter) that leaves t_p, i pi - t_p and -i pi - t_p in the strip that
        // matters.
        for (std::size_t k = 0; k < sing.count; ++k)
            for (double base : {r, -r}) {
                const std::complex<double> t = std::asinh(orientation * (std::complex<double>(base, sing.zetas[k]) - r) / s);
                // A point on an end plane inside the winding's radii (zeta = 0) touches a rim at
                // a = r, t = 0: an integrable singularity at the end of the piece, inside the
                // sliver a - r < s whose share is below the scale floor. Not a segmenting pole.
                if (!(t0 == 0.0 && t == std::complex<double>(0.0, 0.0))) poles[n++] = t;
                poles[n++] = std::complex<double>(0.0, kPi) - t;
                poles[n++] = std::complex<double>(0.0, -kPi) - t;
            }
        const auto at = [&](double t) {
            // a - r straight from the map, not by subtraction: it is never 0 at a node.
            const double offset = orientation * s * std::sinh(t);
            return Node{r + offset, offset, s * std::cosh(t)};
        };
        total += radial_detail::integrate_segment(kernel, at, t0, t1, poles, n, opt, 0);
    }
    return total;
}

}  // namespace coilwright::internal
