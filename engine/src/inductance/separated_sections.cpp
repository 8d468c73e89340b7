// One tensor Gauss-Legendre rule over two cross-sections that keep a gap.
//
// Where the kernel is singular. Maxwell's M(r1, r2, u) is mu0 r1 r2 times the integral over phi
// of cos(phi) / R, R^2 = r1^2 + r2^2 - 2 r1 r2 cos(phi) + u^2, analytic wherever no R vanishes.
// With r2 and u real and in their ranges, R = 0 puts r1 at r2 cos(phi) +- i sqrt(r2^2 sin^2(phi)
// + u^2), whose distance from any real r1 is the distance of two points of the two circles: at
// least the gap between the cross-sections. So every singularity lies at least `gap.total` from
// a radial extent, in any direction; the Bernstein ellipse through a point that far beyond an end
// of the segment is the smallest such, and sets the order. In u, R = 0 at u = +- i t with
// t in [|r1 - r2|, r1 + r2], t >= gap.radial: the pole i gap.radial sets the order of each offset
// piece (pieces lie on u >= 0). Derivatives of M in u have the same singular set.
//
// Orders: the n-point Gauss-Legendre error falls like rho^(-2n) (L. N. Trefethen, Approximation
// Theory and Approximation Practice, SIAM 2013, ch. 19); the kernel grows on the ellipse towards
// a singularity, so the target carries the margin the section cubature measured for it
// (section_integral.cpp): rho^(-2n) <= 1e-18.
#include "inductance/separated_sections.hpp"

#include <algorithm>
#include <array>
#include <cmath>
#include <vector>

#include "coilwright/constants.hpp"
#include "coilwright/field/loop_batch.hpp"
#include "inductance/filament_kernels.hpp"
#include "numerics/gauss_legendre.hpp"

namespace coilwright::internal {

namespace {

constexpr double kSeparatedOrderExponent = 20.8;  // ln(1e18) / 2
constexpr int kMinOrder = 2;
constexpr std::size_t kMaxOffsetNodes = OffsetWeights{}.pieces.size() * kMaxGaussOrder + OffsetWeights{}.points.size();

struct Nodes {
    std::array<double, kMaxOffsetNodes> at{}, weight{};
    int count = 0;
    void add(double x, double w) {
        at[count] = x;
        weight[count++] = w;
    }
};

// The order for an interval with the ellipse parameter rho, or 0 when above kMaxGaussOrder.
int order_for(double rho) {
    const int n = std::max(gauss_points_for(rho, kSeparatedOrderExponent), kMinOrder);
    return n <= kMaxGaussOrder ? n : 0;
}

// A radial extent's nodes with weights averaging over it; false when it would need too many.
bool radial_nodes(RadialExtent r, double gap, Nodes& nodes) {
    if (r.lo == r.hi) {
        nodes.add(r.lo, 1.0);
        return true;
    }
    const double centre = 0.5 * (r.lo + r.hi), half = 0.5 * (r.hi - r.lo);
    const int n = order_for(bernstein_rho(centre, half, {r.hi + gap, 0.0}));
    if (n == 0) return false;
    const GaussRule& g = gauss_rule(n);
    for (int j = 0; j < n; ++j) nodes.add(r.lo + (r.hi - r.lo) * g.x[j], g.w[j]);
    return true;
}

bool offset_nodes(const OffsetWeights& u, double radial_gap, Nodes& nodes) {
    for (int i = 0; i < u.piece_count; ++i) {
        const OffsetWeights::Piece& p = u.pieces[i];
        const double centre = 0.5 * (p.lo + p.hi), half = 0.5 * (p.hi - p.lo);
        const int n = order_for(bernstein_rho(centre, half, {0.0, radial_gap}));
        if (n == 0) return false;
        const GaussRule& g = gauss_rule(n);
        for (int j = 0; j < n; ++j) {
            const double weight = p.w_lo + (p.w_hi - p.w_lo) * g.x[j];  // the piece's linear weight
            nodes.add(p.lo + (p.hi - p.lo) * g.x[j], (p.hi - p.lo) * g.w[j] * weight);
        }
    }
    for (int i = 0; i < u.point_count; ++i) nodes.add(u.points[i].u, u.points[i].mass);
    return true;
}

// Few nodes (two loops, a loop and a short winding): Maxwell's formula itself, so that two loops
// get loop_mutual_inductance's value bit for bit.
constexpr long kScalarUpTo = 8;

double filament_sum(const Nodes& x, const Nodes& y, const Nodes& offsets, FilamentKernel kernel) {
    const auto f = kernel == FilamentKernel::Mutual ? filament_mutual : filament_mutual_slope;
    double sum = 0.0;
    for (int i = 0; i < x.count; ++i)
        for (int j = 0; j < y.count; ++j)
            for (int m = 0; m < offsets.count; ++m)
                sum += x.weight[i] * y.weight[j] * offsets.weight[m] * f(x.at[i], y.at[j], x.at[i] - y.at[j], offsets.at[m]);
    return sum;
}

// Loop fields at the nodes, a pack of points per loop radius through the vectorised batch kernel
// (coilwright/field/loop_batch.hpp), several times cheaper per value than one filament formula.
// With B the field per ampere of the loop of radius x at (z = u, r = y):
//   dM/du = -2 pi y Br,  dM/dy = 2 pi y Bz (the flux through the circle y grows by its rim),
// and M, homogeneous of degree 1 in (x, y, u), is x dM/dx + y dM/dy + u dM/du (Euler), where by
// symmetry dM/dx = 2 pi x Bz' with Bz' the field of the loop y at (u, x). Far apart the three
// terms cancel sevenfold (1/2 + 1/2 - 3/4 of their magnitudes 7/4); near filaments of a large
// radius a at a gap g, like (a / g) / ln(a / g): the magnitudes are summed too, and where they
// would cost more than kMaxEulerLoss, Maxwell's formula is evaluated at the nodes instead.
constexpr double kMaxEulerLoss = 64.0;

struct Sum {
    double value = 0.0, magnitude = 0.0;
};

class NodeFields {
public:
    explicit NodeFields(const Nodes& offsets) : offsets_(offsets) {}

    // Adds, over radii rho_j (weights w_j) and offsets u, w_source w_j w_u times the terms
    // `terms(rho_j, u, bz, br)` (two numbers) of the field of the loop of radius `source` at
    // (u, rho_j). False when a field value is not finite.
    template <class Terms>
    bool add(double source, double source_weight, const Nodes& radii, Terms terms, Sum& sum) {
        const std::size_t n = static_cast<std::size_t>(radii.count) * offsets_.count;
        z_.resize(n);
        r_.resize(n);
        bz_.resize(n);
        br_.resize(n);
        for (int j = 0; j < radii.count; ++j)
            for (int m = 0; m < offsets_.count; ++m) {
                z_[j * offsets_.count + m] = offsets_.at[m];
                r_[j * offsets_.count + m] = radii.at[j];
            }
        if (loop_field_batch({source, 1.0, 1.0}, z_.data(), r_.data(), n, bz_.data(), br_.data()) != 0) return false;
        for (int j = 0; j < radii.count; ++j) {
            for (int m = 0; m < offsets_.count; ++m) {
                const std::size_t i = j * offsets_.count + m;
                const double w = source_weight * radii.weight[j] * offsets_.weight[m];
                const auto [first, second] = terms(radii.at[j], offsets_.at[m], bz_[i], br_[i]);
                sum.value += w * (first + second);
                sum.magnitude += std::fabs(w) * (std::fabs(first) + std::fabs(second));
            }
        }
        return std::isfinite(sum.magnitude);
    }

private:
    const Nodes& offsets_;
    std::vector<double> z_, r_, bz_, br_;
};

using Terms = std::array<double, 2>;

// The rule with loop fields; nothing when a value is not finite.
std::optional<Sum> field_sum(const Nodes& x, const Nodes& y, const Nodes& offsets, FilamentKernel kernel) {
    NodeFields fields(offsets);
    Sum sum;
    for (int i = 0; i < x.count; ++i) {
        const bool ok = kernel == FilamentKernel::Slope
                            ? fields.add(x.at[i], x.weight[i], y,
                                         [](double rho, double, double, double br) { return Terms{-rho * br, 0.0}; }, sum)
                            : fields.add(x.at[i], x.weight[i], y,
                                         [](double rho, double v, double bz, double br) {
                                             return Terms{rho * rho * bz, -rho * v * br};
                                         },
                                         sum);
        if (!ok) return std::nullopt;
    }
    if (kernel == FilamentKernel::Mutual) {
        for (int j = 0; j < y.count; ++j) {  // the x dM/dx term: loops y at the radii x
            if (!fields.add(y.at[j], y.weight[j], x,
                            [](double rho, double, double bz, double) { return Terms{rho * rho * bz, 0.0}; }, sum))
                return std::nullopt;
        }
    }
    sum.value *= 2.0 * kPi;
    sum.magnitude *= 2.0 * kPi;
    return sum;
}

}  // namespace

std::optional<double> average_over_separated_sections(RadialExtent r1, RadialExtent r2, const OffsetWeights& u,
                                                      FilamentKernel kernel, SectionGap gap, int max_evaluations) {
    if (!(gap.total > 0.0)) return std::nullopt;
    Nodes x, y, offsets;
    if (!radial_nodes(r1, gap.total, x) || !radial_nodes(r2, gap.total, y) || !offset_nodes(u, gap.radial, offsets))
        return std::nullopt;
    const long evaluations = static_cast<long>(x.count) * y.count * offsets.count;
    if (evaluations > max_evaluations) return std::nullopt;
    if (evaluations <= kScalarUpTo) return filament_sum(x, y, offsets, kernel);
    const std::optional<Sum> fast = field_sum(x, y, offsets, kernel);
    if (!fast) return std::nullopt;
    if (kernel == FilamentKernel::Mutual && fast->magnitude > kMaxEulerLoss * std::fabs(fast->value))
        return filament_sum(x, y, offsets, kernel);
    return fast->value;
}

}  // namespace coilwright::internal
