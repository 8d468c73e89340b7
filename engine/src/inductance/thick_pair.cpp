// One angle integral for two coaxial windings of rectangular cross-section.
//
// M = mu0 / (w1 w2 h1 h2) integral_0^pi T(phi) dphi, T the 16-corner sum of the closed-form
// primitive (rectangular_primitive.hpp) over the radial end points (x in {a1, b1}, y in
// {a2, b2}) and the four axial offsets d -+ (h1 + h2)/2, d -+ (h2 - h1)/2; the slope dM/dd uses
// the primitive once instead of twice over u at the same corners.
//
// T depends on cos(phi) only, analytic except where R = 0 for some pair of points of the two
// cross-sections: cos(phi) = 1 + ((x - y)^2 + u^2) / (2 x y) >= 1. When the cross-sections keep
// a gap g (radial and axial gaps combined), that is at cos(phi) >= cosh(delta),
// delta = acosh(1 + g^2 / (2 b1 b2)), and the midpoint rule in phi (Gauss-Chebyshev in
// cos(phi)) converges like exp(-2 n delta) (Trefethen, Approximation Theory and Approximation
// Practice, SIAM 2013, ch. 19): n = 16 / delta nodes while that is at most 32. Nearer, and when
// the cross-sections touch or overlap (T then has a weak singularity at phi = 0 itself, like
// phi or phi^2 log phi), graded Gauss-Legendre (graded_rule below).
//
// The corner sums cancel: the primitive is of the size of the largest length to the fifth
// power, the result of the product of the four extents. The same quadrature sums the absolute
// values of the corner terms; their ratio to the result bounds the digits lost (measured: the
// relative error is about 1e-16 times that ratio), and above kMaxLoss the result is refused.
#include "inductance/thick_pair.hpp"

#include <algorithm>
#include <array>
#include <boost/math/quadrature/gauss.hpp>
#include <cmath>
#include <limits>
#include <type_traits>
#include <utility>

#include "coilwright/constants.hpp"
#include "inductance/corner_sums.hpp"
#include "inductance/rectangular_primitive.hpp"
#include "numerics/gauss_legendre.hpp"

namespace coilwright::internal {

namespace {

// Loss allowed to the corner sums in double: about 1e-16 times this is the accuracy kept
// (measured: 9e-13 at worst on 300 random pairs).
constexpr double kMaxLoss = 8000.0;
constexpr double kLongDoubleGain = static_cast<double>(std::numeric_limits<double>::epsilon() /
                                                       std::numeric_limits<long double>::epsilon());
// Gauss orders ceil(kOrderExponent / ln rho): rho^(-2n) <= 1e-15.
constexpr double kOrderExponent = 16.0;
// Each graded interval is [r phi, phi]: with the pole at 0, rho = 3 and 15 points for r = 1/4.
constexpr double kLevelRatio = 0.25;
constexpr int kMaxLevels = 40;
// Touching or overlapping: phi = phi_K v^3 with 30-point Gauss-Legendre in v on [0, phi_K],
// phi_K up to this many times the smallest nonzero corner pole.
constexpr int kSingularOrder = 30;
constexpr double kSingularReach = 8.0;
constexpr int kMaxMidpointNodes = 32;

template <class Real>
struct Corner {
    Real x, y, u;
    double weight;
};

// The 16 corners, merged where they coincide (a winding with itself: 6 distinct terms), with
// u >= 0 (the primitive is even in u for the mutual inductance, odd for the slope).
template <class Real>
struct Corners {
    std::array<Corner<Real>, 16> list{};
    int count = 0;

    void add(Real x, Real y, Real u, double weight, int k) {
        if (u < 0) {
            u = -u;
            if (k == 1) weight = -weight;
        }
        if (x > y) std::swap(x, y);  // the primitive is symmetric in x <-> y
        for (int i = 0; i < count; ++i) {
            if (list[i].x == x && list[i].y == y && list[i].u == u) {
                list[i].weight += weight;
                return;
            }
        }
        list[count++] = {x, y, u, weight};
    }

    void drop_cancelled() {
        int kept = 0;
        for (int i = 0; i < count; ++i)
            if (list[i].weight != 0.0) list[kept++] = list[i];
        count = kept;
    }
};

template <class Real>
struct Sums {
    Real value = 0, magnitude = 0;
};

template <class Real>
void add_angle(const Corners<Real>& corners, int k, double phi, double weight, Sums<Real>& sums) {
    const AngleValues<Real> a = AngleValues<Real>::of(phi);
    Real t = 0, m = 0;
    if constexpr (std::is_same_v<Real, double>) {
        std::array<double, 16> x{}, y{}, u{}, w{};
        for (int i = 0; i < corners.count; ++i) {
            x[i] = corners.list[i].x;
            y[i] = corners.list[i].y;
            u[i] = corners.list[i].u;
            w[i] = corners.list[i].weight;
        }
        const CornerSum sum = corner_sum(a, x.data(), y.data(), u.data(), w.data(), corners.count, k);
        t = sum.value;
        m = sum.magnitude;
    } else {
        for (int i = 0; i < corners.count; ++i) {
            const Corner<Real>& q = corners.list[i];
            const Real term = q.weight * rectangular_primitive(a, q.x, q.y, q.u, k);
            t += term;
            m += std::fabs(term);
        }
    }
    sums.value += weight * a.c * t;
    sums.magnitude += weight * std::fabs(a.c) * m;
}

// Where each corner term alone is singular: R = 0 at phi = i delta,
// cosh(delta) = 1 + ((x - y)^2 + u^2) / (2 x y) (acosh(1 + t) formed as log1p for small t).
template <class Real>
double corner_pole(const Corner<Real>& q) {
    const double x = static_cast<double>(q.x), y = static_cast<double>(q.y), u = static_cast<double>(q.u);
    const double t = ((y - x) * (y - x) + u * u) / (2.0 * x * y);
    return std::log1p(t + std::sqrt(t * (t + 2.0)));
}

// Gauss-Legendre on intervals [phi / 4, phi] towards phi = 0, each with the order that the
// Bernstein ellipse through the nearest pole asks for (the cut's start i delta, and every
// corner's own pole, where the cut's density has a kink). With a gap, down to twice delta, and
// plain Gauss-Legendre on the rest. When the cross-sections touch or overlap, down to the
// smallest nonzero corner pole times kSingularReach; on the rest T is singular at phi = 0
// itself and phi = phi_K v^3 smooths it. Measured on 300 random pairs against the cubature:
// 8.5e-13 at worst (a flat winding with itself, where the corner sums lose most), 42 angles per
// call on average.
template <class Real>
void graded_rule(const Corners<Real>& corners, int k, double gap_pole, Sums<Real>& sums) {
    const bool singular_at_zero = gap_pole == 0.0;
    std::array<double, 16> poles{};
    double smallest = kPi;
    for (int i = 0; i < corners.count; ++i) {
        poles[i] = corner_pole(corners.list[i]);
        if (poles[i] > 0.0) smallest = std::min(smallest, poles[i]);
    }
    const auto order_for = [&](double lo, double hi) {
        double rho = bernstein_rho(0.5 * (lo + hi), 0.5 * (hi - lo), {0.0, gap_pole});
        for (int i = 0; i < corners.count; ++i)
            if (poles[i] > 0.0) rho = std::min(rho, bernstein_rho(0.5 * (lo + hi), 0.5 * (hi - lo), {0.0, poles[i]}));
        return std::clamp(gauss_points_for(rho, kOrderExponent), 4, kMaxGaussOrder);
    };
    const double floor = singular_at_zero ? kSingularReach * smallest : 2.0 * gap_pole;
    double hi = kPi;
    for (int level = 0; level < kMaxLevels && hi > floor; ++level) {
        const double lo = kLevelRatio * hi;
        const GaussRule& g = gauss_rule(order_for(lo, hi));
        for (int j = 0; j < g.n; ++j) add_angle(corners, k, lo + (hi - lo) * g.x[j], (hi - lo) * g.w[j], sums);
        hi = lo;
    }
    if (singular_at_zero) {
        using Rule = boost::math::quadrature::gauss<double, kSingularOrder>;
        const auto& x = Rule::abscissa();
        const auto& w = Rule::weights();
        for (std::size_t j = 0; j < x.size(); ++j) {
            for (const double side : {-1.0, 1.0}) {
                const double v = 0.5 * (1.0 + side * x[j]);  // a node on [0, 1]
                add_angle(corners, k, hi * v * v * v, 1.5 * hi * v * v * w[j], sums);
            }
        }
        return;
    }
    const GaussRule& g = gauss_rule(order_for(0.0, hi));
    for (int j = 0; j < g.n; ++j) add_angle(corners, k, hi * g.x[j], hi * g.w[j], sums);
}

}  // namespace

namespace {

// The integral in the arithmetic Real; its result and the digits lost to cancellation (the
// ratio of the sum of magnitudes to the result).
template <class Real>
std::pair<double, double> angle_integral(const CoilSection& w1, const CoilSection& w2, double distance, int k) {
    const Real a1 = w1.inner_radius, b1 = w1.outer_radius, h1 = w1.length;
    const Real a2 = w2.inner_radius, b2 = w2.outer_radius, h2 = w2.length;
    const Real d = distance, reach = (h1 + h2) / 2, shift = (h2 - h1) / 2;

    Corners<Real> corners;
    const std::array<Real, 2> xs{b1, a1}, ys{b2, a2};
    const std::array<Real, 4> us{d + reach, d + shift, d - shift, d - reach};
    const std::array<double, 4> u_signs{1.0, -1.0, -1.0, 1.0};
    for (int i = 0; i < 2; ++i)
        for (int j = 0; j < 2; ++j)
            for (int m = 0; m < 4; ++m) corners.add(xs[i], ys[j], us[m], (i == j ? 1.0 : -1.0) * u_signs[m], k);
    corners.drop_cancelled();
    if (corners.count == 0) return {0.0, 1.0};  // e.g. the slope of a winding on itself

    const double radial_gap = std::max(0.0, std::max(w1.inner_radius, w2.inner_radius) -
                                                std::min(w1.outer_radius, w2.outer_radius));
    const double axial_gap = std::max(0.0, std::fabs(distance) - 0.5 * (w1.length + w2.length));
    const double gap2 = radial_gap * radial_gap + axial_gap * axial_gap;
    const double delta = gap2 > 0.0 ? std::acosh(1.0 + gap2 / (2.0 * w1.outer_radius * w2.outer_radius)) : 0.0;
    const int midpoint_nodes = delta > 0.0 ? static_cast<int>(std::ceil(16.5 / delta)) : kMaxMidpointNodes + 1;

    Sums<Real> sums;
    if (midpoint_nodes <= kMaxMidpointNodes) {
        const int n = std::max(midpoint_nodes, 8);
        for (int j = 0; j < n; ++j) add_angle(corners, k, kPi * (j + 0.5) / n, kPi / n, sums);
    } else {
        graded_rule(corners, k, delta, sums);
    }
    const Real scale = kMu0 / ((b1 - a1) * (b2 - a2) * h1 * h2);
    return {static_cast<double>(scale * sums.value), static_cast<double>(sums.magnitude / std::fabs(sums.value))};
}

}  // namespace

AngleIntegral thick_pair_angle_integral(const CoilSection& w1, const CoilSection& w2, double distance,
                                        PairQuantity quantity, AnglePrecision precision) {
    const int k = quantity == PairQuantity::Mutual ? 2 : 1;
    if (precision == AnglePrecision::Double) {
        const auto [value, loss] = angle_integral<double>(w1, w2, distance, k);
        if (loss <= kMaxLoss) return {value, false};
        return {std::nullopt, loss <= kMaxLoss * kLongDoubleGain};
    }
    // Long double carries 11 more bits (x87 extended precision on x86-64, the add-in's target):
    // the same loss costs 2048 times less, at about ten times the time.
    const auto [precise, precise_loss] = angle_integral<long double>(w1, w2, distance, k);
    if (precise_loss <= kMaxLoss * kLongDoubleGain) return {precise, false};
    return {};
}

}  // namespace coilwright::internal
