// The pieces of the radial quadrature: the rules listed in pairs, the mapped singular points and
// the nodes mapped in pairs.
#include <gtest/gtest.h>

#include <cmath>
#include <complex>
#include <random>

#include "coilwright/constants.hpp"
#include "numerics/gauss_legendre.hpp"
#include "numerics/radial_quadrature.hpp"

using namespace coilwright;
using namespace coilwright::internal;

TEST(RadialQuadrature, SymmetricRulesIntegratePolynomialsOfDegreeTwoNMinusOneExactly) {
    // An n-point Gauss-Legendre rule is exact for degree 2n - 1 (any numerical analysis text,
    // e.g. Abramowitz and Stegun 25.4.29): over [-1, 1], x^k integrates to 2 / (k + 1) for even k.
    for (int points : {1, 7, 8, 12, 13, 19, 20, 21, 25, 26, 30}) {
        const SymmetricGaussRule& rule = symmetric_gauss_rule(points);
        const int n = 2 * rule.pairs + (rule.centre_weight != 0.0 ? 1 : 0);
        EXPECT_GE(n, std::max(points, 7)) << points;
        for (int k = 0; k <= 2 * n - 1; k += 2) {
            double sum = rule.centre_weight * (k == 0 ? 1.0 : 0.0);
            for (int j = 0; j < rule.pairs; ++j)
                sum += 2.0 * rule.weight[static_cast<std::size_t>(j)] * std::pow(rule.offset[static_cast<std::size_t>(j)], k);
            EXPECT_NEAR(sum, 2.0 / (k + 1), 1e-14) << points << " points, x^" << k;
        }
    }
}

TEST(RadialQuadrature, MappedSingularPointsAreThePrincipalAsinh) {
    // Checked by the definition, sinh(t) = w with sinh(a + ib) = sinh a cos b + i cosh a sin b,
    // and the principal branch (|Im t| <= pi/2, Re t of the sign of Re w), not against a C
    // library's complex asinh: the Windows runtime's is off by tens for large arguments.
    std::mt19937_64 rng(4);
    std::uniform_real_distribution<double> u(-1.0, 1.0);
    double worst = 0.0;
    int off_branch = 0;
    for (int i = 0; i < 200000; ++i) {
        const double x = i % 5 == 0 ? 0.0 : std::copysign(std::pow(10.0, 16 * u(rng)), u(rng));
        const double y = std::copysign(std::pow(10.0, 16 * u(rng)), u(rng));
        const std::complex<double> t = radial_detail::pole_asinh(x, y);
        const std::complex<double> w{std::sinh(t.real()) * std::cos(t.imag()), std::cosh(t.real()) * std::sin(t.imag())};
        worst = std::max(worst, std::abs(w - std::complex<double>(x, y)) / std::max(1.0, std::abs(std::complex<double>(x, y))));
        if (std::fabs(t.imag()) > kPi / 2 + 1e-15 || (x != 0.0 && t.real() * x < 0.0)) ++off_branch;
    }
    EXPECT_LT(worst, 1e-13);
    EXPECT_EQ(off_branch, 0);
}

TEST(RadialQuadrature, NodesMappedInPairsAreTheNodesMappedOneByOne) {
    // Products of exponentials round a few times and sinh from them loses up to coth(1/2) = 2.2:
    // a few units in the last place (measured up to 4), which only moves a node, with its
    // Jacobian, by that much.
    const radial_detail::SinhMap map{1.0, 1e-4, -1.0};
    for (double centre : {0.3, 1.0, 4.0, 12.0})
        for (double d : {0.0, 0.01, 0.2, 0.29, 0.9 * centre}) {
            const auto [right, left] = map.about(centre).at_offset(d);
            for (const auto& [node, t] : {std::pair{right, centre + d}, std::pair{left, centre - d}}) {
                const radial_detail::Node one = map(t);
                EXPECT_NEAR(node.a_minus_r, one.a_minus_r, 2e-15 * std::fabs(one.a_minus_r) + 1e-300) << centre << " " << d;
                EXPECT_NEAR(node.jacobian, one.jacobian, 2e-15 * one.jacobian) << centre << " " << d;
                EXPECT_EQ(node.a, map.r + node.a_minus_r);
            }
        }
}
