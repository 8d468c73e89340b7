// Gauss-Legendre quadrature: rules of any order up to 20 on [0, 1] (gauss_rule), and analytic
// integrands integrated with the node count chosen from how far the nearest complex
// singularity lies from the interval (gauss_legendre).
//
// For f analytic inside the Bernstein ellipse with foci at the interval ends and parameter rho
// (the sum of its half-axes over the half-width), the n-point Gauss-Legendre error falls like
// rho^(-2n) (L. N. Trefethen, Approximation Theory and Approximation Practice, SIAM 2013,
// ch. 19). gauss_legendre uses Boost.Math's precomputed rules (7, 10, 15, 20, 25, 30 points);
// gauss_rule builds its rules once by Newton's method (gauss_legendre.cpp).
#pragma once

#include <algorithm>
#include <array>
#include <boost/math/quadrature/gauss.hpp>
#include <cmath>
#include <complex>
#include <cstddef>

namespace coilwright::internal {

inline constexpr int kMaxGaussOrder = 20;

struct GaussRule {
    int n = 0;
    std::array<double, kMaxGaussOrder> x{};  // nodes in (0, 1)
    std::array<double, kMaxGaussOrder> w{};  // weights, summing to 1
};

// The n-point rule, 1 <= n <= kMaxGaussOrder.
const GaussRule& gauss_rule(int n);


// Bernstein parameter rho >= 1 of the ellipse through `pole` for the interval
// [centre - half_width, centre + half_width]: with the foci at the ends, the ellipse through w
// has semi-major axis A = (|w - 1| + |w + 1|) / 2 and rho = A + sqrt(A^2 - 1). The semi-axis
// alone orders poles as rho does (one square root less per pole where only the nearest counts).
inline double bernstein_semi_axis(double centre, double half_width, std::complex<double> pole) {
    const double x = (pole.real() - centre) / half_width, y = std::fabs(pole.imag() / half_width);
    if (!(std::fabs(x) < 1e150 && y < 1e150)) return 1e150;  // far away (and no overflow below)
    return 0.5 * (std::sqrt((x - 1.0) * (x - 1.0) + y * y) + std::sqrt((x + 1.0) * (x + 1.0) + y * y));
}
inline double bernstein_rho_of_axis(double A) { return A >= 1e150 ? 1e150 : A + std::sqrt((A - 1.0) * (A + 1.0)); }
inline double bernstein_rho(double centre, double half_width, std::complex<double> pole) {
    return bernstein_rho_of_axis(bernstein_semi_axis(centre, half_width, pole));
}

// Points needed for rho^(-2n) <= 1e-20: the margin below double precision absorbs the growth
// of the integrand towards the singularity (measured for the loop field: see the tests).
inline int gauss_points_for(double rho, double exponent = 23.0) {
    if (!(rho > 1.0)) return 1000;
    return static_cast<int>(std::ceil(exponent / std::log(rho)));
}

template <unsigned N, class F>
auto apply_gauss_rule(F& f, double centre, double half_width) {
    using Rule = boost::math::quadrature::gauss<double, N>;
    const auto& x = Rule::abscissa();
    const auto& w = Rule::weights();
    decltype(f(centre)) sum{};
    std::size_t i = 0;
    if constexpr (N % 2 == 1) {
        sum += w[0] * f(centre);  // odd rules list the centre node first
        i = 1;
    }
    for (; i < x.size(); ++i) {
        sum += w[i] * f(centre + half_width * x[i]);
        sum += w[i] * f(centre - half_width * x[i]);
    }
    return half_width * sum;
}

// Integrates f over [centre - half_width, centre + half_width] with the smallest precomputed
// rule of at least `points` points (at most 30). f returns double or FieldRZ.
template <class F>
auto gauss_legendre(F&& f, double centre, double half_width, int points) {
    if (points <= 7) return apply_gauss_rule<7>(f, centre, half_width);
    if (points <= 10) return apply_gauss_rule<10>(f, centre, half_width);
    if (points <= 15) return apply_gauss_rule<15>(f, centre, half_width);
    if (points <= 20) return apply_gauss_rule<20>(f, centre, half_width);
    if (points <= 25) return apply_gauss_rule<25>(f, centre, half_width);
    return apply_gauss_rule<30>(f, centre, half_width);
}

// A Gauss-Legendre rule of at least `points` points as pairs of nodes +-offset[k] about the
// centre of [-1, 1] with a shared weight, and the centre with its weight when the count is odd
// (0 otherwise): for kernels that take many nodes in one call, and maps that compute a pair of
// nodes for the price of one. Exactly `points` from 7 to kMaxGaussOrder (never fewer than 7, as
// gauss_legendre), else the 25- or 30-point rule. Weights sum to 2.
inline constexpr int kMaxGaussNodes = 30;
struct SymmetricGaussRule {
    int pairs = 0;
    std::array<double, kMaxGaussNodes / 2> offset{}, weight{};
    double centre_weight = 0.0;
};
const SymmetricGaussRule& symmetric_gauss_rule(int points);

}  // namespace coilwright::internal
