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
#include <utility>

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

struct Node {
    double a, a_minus_r, jacobian;
};

// The plain map a = t (pieces far from r).
struct PlainMap {
    double r;
    Node operator()(double t) const { return {t, t - r, 1.0}; }
    struct About {
        const PlainMap& map;
        double centre;
        std::pair<Node, Node> at_offset(double d) const { return {map(centre + d), map(centre - d)}; }
    };
    About about(double centre) const { return {*this, centre}; }
};

// asinh(x + i y), the principal branch, for locating the kernel's singular points in the mapped
// variable (a quarter of the cost of the library's complex asinh, which was a quarter of the
// quadrature's). Exact forms on the imaginary axis, where the singular points at a = r lie;
// elsewhere log(w + sqrt(w^2 + 1)) for Re w >= 0 (asinh is odd), where nothing cancels but
// 1 + w^2 near w = +-i, which costs digits the Bernstein estimate does not need.
inline std::complex<double> pole_asinh(double x, double y) {
    if (x == 0.0) {
        const double ay = std::fabs(y);
        if (ay <= 1.0) return {0.0, std::asin(y)};
        return {std::acosh(ay), std::copysign(kPi / 2, y)};
    }
    if (x < 0.0) return -pole_asinh(-x, -y);
    const double vr = 1.0 + (x - y) * (x + y), vi = 2.0 * x * y;  // w^2 + 1
    const double m = std::sqrt(vr * vr + vi * vi);
    double sr, si;  // sqrt(w^2 + 1), real part >= 0, formed without cancellation
    if (vr >= 0.0) {
        sr = std::sqrt(0.5 * (m + vr));
        si = vi / (2.0 * sr);
    } else {
        si = std::copysign(std::sqrt(0.5 * (m - vr)), vi);
        sr = vi / (2.0 * si);
    }
    const double qr = x + sr, qi = y + si;  // same signs: no cancellation
    return {0.5 * std::log(qr * qr + qi * qi), std::atan2(qi, qr)};
}

// sinh t and cosh t (t >= 0) from one expm1: half the cost of the two library calls, sinh t to a
// few units in the last place also as t -> 0 (no difference of nearly equal exponentials).
inline std::pair<double, double> sinh_and_cosh(double t) {
    const double grown = std::expm1(t), e = 1.0 + grown;
    return {0.5 * (grown + grown / e), 0.5 * (e + 1.0 / e)};
}

// a = r + orientation s sinh t (t >= 0), with a - r straight from the map, not by subtraction:
// it is never 0 at a node.
struct SinhMap {
    double r, s, orientation;
    Node from(double sinh_t, double cosh_t) const {
        const double offset = orientation * s * sinh_t;
        return {r + offset, offset, s * cosh_t};
    }
    Node operator()(double t) const {
        const auto [sinh_t, cosh_t] = sinh_and_cosh(t);
        return from(sinh_t, cosh_t);
    }
    // Nodes c + d and c - d: exp(c +- d) = exp(c) exp(+-d), products only, so a pair costs one
    // exponential and one division (it was four library calls and four divisions). sinh from
    // exponentials loses up to coth(t) to the difference: below t = 1/2, expm1 instead.
    struct About {
        const SinhMap& map;
        double centre, grown, shrunk;  // exp(centre), exp(-centre)
        Node at(double t, double e, double inverse) const {
            if (t < kSmallT) return map(t);
            return map.from(0.5 * (e - inverse), 0.5 * (e + inverse));
        }
        std::pair<Node, Node> at_offset(double d) const {
            const double ed = std::exp(d), inverse_ed = 1.0 / ed;
            return {at(centre + d, grown * ed, shrunk * inverse_ed), at(centre - d, grown * inverse_ed, shrunk * ed)};
        }
    };
    static constexpr double kSmallT = 0.5;
    About about(double centre) const {
        const double e = std::exp(centre);
        return {*this, centre, e, 1.0 / e};
    }
};

// Recursive Gauss-Legendre in a variable t, with the kernel's singular points mapped to t.
// `at(t)` returns {a, a - r, da/dt}.
template <class Kernel, class Map>
FieldRZ integrate_segment(const Kernel& kernel, const Map& at, double t0, double t1, const std::complex<double>* poles,
                          std::size_t n_poles, const RadialQuadratureOptions& opt, int depth) {
    const double centre = 0.5 * (t0 + t1), half = 0.5 * (t1 - t0);
    double axis = HUGE_VAL;
    for (std::size_t k = 0; k < n_poles; ++k) axis = std::min(axis, bernstein_semi_axis(centre, half, poles[k]));
    const double rho = bernstein_rho_of_axis(axis);
    if (rho < opt.min_rho && depth < opt.max_depth) {
        FieldRZ sum = integrate_segment(kernel, at, t0, centre, poles, n_poles, opt, depth + 1);
        sum += integrate_segment(kernel, at, centre, t1, poles, n_poles, opt, depth + 1);
        return sum;
    }
    const int points = gauss_points_for(rho, opt.exponent);
    if constexpr (std::is_invocable_v<const Kernel&, const double*, const double*, int, FieldRZ*>) {
        // A kernel for many radii at once: all nodes of the segment in one call, the map taking
        // them in pairs about the centre.
        const SymmetricGaussRule& rule = symmetric_gauss_rule(points);
        double w[kMaxGaussNodes], a[kMaxGaussNodes], a_minus_r[kMaxGaussNodes], jacobian[kMaxGaussNodes];
        FieldRZ value[kMaxGaussNodes];
        int n = 0;
        const auto put = [&](const Node& node, double weight) {
            a[n] = node.a;
            a_minus_r[n] = node.a_minus_r;
            jacobian[n] = node.jacobian;
            w[n++] = weight;
        };
        const auto pairs = at.about(centre);
        for (int k = 0; k < rule.pairs; ++k) {
            const auto [right, left] = pairs.at_offset(half * rule.offset[static_cast<std::size_t>(k)]);
            put(right, rule.weight[static_cast<std::size_t>(k)]);
            put(left, rule.weight[static_cast<std::size_t>(k)]);
        }
        if (rule.centre_weight != 0.0) put(at(centre), rule.centre_weight);
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
            total += radial_detail::integrate_segment(kernel, radial_detail::PlainMap{r}, x0, x1, poles, n, opt, 0);
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
                const std::complex<double> t = radial_detail::pole_asinh(orientation * (base - r) / s, orientation * sing.zetas[k] / s);
                // A point on an end plane inside the winding's radii (zeta = 0) touches a rim at
                // a = r, t = 0: an integrable singularity at the end of the piece, inside the
                // sliver a - r < s whose share is below the scale floor. Not a segmenting pole.
                if (!(t0 == 0.0 && t == std::complex<double>(0.0, 0.0))) poles[n++] = t;
                // The images of a point above a = r lie at -Re t, farther from the piece (t >= 0)
                // than t itself: they never decide the node count.
                if (base == r) continue;
                poles[n++] = std::complex<double>(0.0, kPi) - t;
                poles[n++] = std::complex<double>(0.0, -kPi) - t;
            }
        total += radial_detail::integrate_segment(kernel, radial_detail::SinhMap{r, s, orientation}, t0, t1, poles, n, opt, 0);
    }
    return total;
}

}  // namespace coilwright::internal
