// Pair geometry: Helmholtz, gradient (anti-Helmholtz) pairs, Maxwell's three-coil arrangement.
#include <gtest/gtest.h>

#include <cmath>

#include "coilwright/field.hpp"
#include "coilwright/constants.hpp"
#include "coilwright/errors.hpp"
#include "coilwright/design.hpp"
#include "test_support.hpp"

using namespace coilwright;
using coilwright::test::rel;

TEST(Pairs, HelmholtzSpacingIsTheRadius) {
    // Helmholtz condition for thin loops: spacing = R makes d^2B/dz^2 vanish at the centre.
    EXPECT_LT(rel(flat_pair_spacing({0.25, 0.25, 0.0}), 0.25), 1e-14);
    EXPECT_LT(rel(flat_pair_spacing({3.0, 3.0, 0.0}), 3.0), 1e-14);
}

TEST(Pairs, HelmholtzCentreFieldAndVanishingSecondDerivative) {
    // (4/5)^(3/2) mu0 N I / R (textbook Helmholtz result); d^2Bz/dz^2 = 0 at the centre.
    const double R = 0.4, N = 50, I = 1.2;
    const double b0 = std::pow(0.8, 1.5) * kMu0 * N * I / R;
    EXPECT_LT(rel(helmholtz_centre_field(R, N, I), b0), 1e-15);
    EXPECT_LT(rel(pair_centre_field({R, R, 0}, N, I, R), b0), 1e-14);
    const CoilTable pair({{R, R, 0, -R / 2, N, I}, {R, R, 0, R / 2, N, I}});
    const auto d = axial_derivatives(pair, 0.0, 4);
    EXPECT_LT(std::fabs(d[2]) * R * R / b0, 1e-14);
    // The first surviving term: d^4B/dz^4 = -(144/125) 4! B0 / R^4 (expansion of the Helmholtz
    // pair's axial field, B(z) = B0 (1 - 144/125 (z/R)^4 + ...): textbook, e.g. Jackson problem 5.7).
    EXPECT_LT(rel(d[4], -144.0 / 125.0 * 24 * b0 / std::pow(R, 4)), 1e-12);
}

TEST(Pairs, ThickPairSpacingZeroesTheSecondDerivative) {
    const CoilSection coil{0.2, 0.24, 0.03};
    const double s = flat_pair_spacing(coil);
    const CoilTable pair({{0.2, 0.24, 0.03, -s / 2, 1, 1}, {0.2, 0.24, 0.03, s / 2, 1, 1}});
    const auto d = axial_derivatives(pair, 0.0, 2);
    EXPECT_LT(std::fabs(d[2]) * 0.22 * 0.22 / d[0], 1e-12);
    EXPECT_GT(s, 0.03);
}

TEST(Pairs, GradientPairOfLoops) {
    // Opposed loops: the spacing sqrt(3) R zeroes the third derivative (Maxwell's gradient pair;
    // quoted from memory, confirmed by the vanishing derivative below). Gradient at the centre:
    // G = 3 mu0 N I R^2 (s/2) / (R^2 + s^2/4)^(5/2) (derivative of the loop's axial field).
    const double R = 0.1, N = 30, I = 4;
    const double s = gradient_pair_spacing({R, R, 0});
    EXPECT_LT(rel(s, std::sqrt(3.0) * R), 1e-14);
    const double G = 3 * kMu0 * N * I * R * R * (s / 2) / std::pow(R * R + s * s / 4, 2.5);
    EXPECT_LT(rel(gradient_pair_gradient({R, R, 0}, N, I, s), G), 1e-14);
    const CoilTable pair({{R, R, 0, -s / 2, N, -I}, {R, R, 0, s / 2, N, I}});
    const auto d = axial_derivatives(pair, 0.0, 3);
    EXPECT_LT(rel(d[1], G), 1e-14);
    EXPECT_LT(std::fabs(d[3]) * R * R / G, 1e-13);
}

TEST(Pairs, MaxwellThreeCoilArrangement) {
    // Maxwell's three coils (Treatise, 1873, art. 715): centre coil radius R; outer coils of radius
    // R sqrt(4/7) at z = +/- R sqrt(3/7) with 49/64 of the centre coil's ampere-turns. Quoted from
    // memory; the vanishing 2nd and 4th derivatives below confirm it.
    const double R = 0.5, NI = 100;
    const double r2 = R * std::sqrt(4.0 / 7.0), z2 = R * std::sqrt(3.0 / 7.0);
    const CoilTable maxwell({{R, R, 0, 0, NI, 1}, {r2, r2, 0, -z2, NI * 49 / 64, 1}, {r2, r2, 0, z2, NI * 49 / 64, 1}});
    const auto d = axial_derivatives(maxwell, 0.0, 6);
    EXPECT_LT(std::fabs(d[2]) * R * R / d[0], 1e-13);
    EXPECT_LT(std::fabs(d[4]) * std::pow(R, 4) / d[0], 1e-12);
    EXPECT_GT(std::fabs(d[6]) * std::pow(R, 6) / d[0], 1e-3);  // the first term it leaves
}

TEST(Pairs, ImpossibleOrBadPairsAreErrors) {
    // Long solenoids: the flattest spacing puts them just beyond end to end, never overlapping.
    EXPECT_GT(flat_pair_spacing({0.01, 0.01, 1.0}), 1.0);
    EXPECT_THROW(flat_pair_spacing({0.0, 0.1, 0.0}), DomainError);
    EXPECT_THROW(flat_pair_spacing({0.2, 0.1, 0.0}), DomainError);
    EXPECT_THROW(pair_centre_field({0.1, 0.1, 0.05}, 1, 1, 0.01), DomainError);
    EXPECT_THROW(helmholtz_centre_field(-1, 1, 1), DomainError);
}

TEST(Uniformity, HelmholtzAxialRegionMatchesADirectSearchWithTheLoopKernel) {
    // Independent path: bisection on |B/B0 - 1| = tol using the off-axis loop kernel on the axis.
    const double R = 0.3;
    const CoilTable pair({{R, R, 0, -R / 2, 1, 1}, {R, R, 0, R / 2, 1, 1}});
    const auto b = [&](double z) { return loop_field({R, 1, 1}, z - R / 2, 0).bz + loop_field({R, 1, 1}, z + R / 2, 0).bz; };
    for (double tol : {1e-4, 1e-3, 1e-2}) {
        double lo = 0, hi = R;  // deviation grows monotonically from the centre to R here
        for (int i = 0; i < 200; ++i) {
            const double mid = (lo + hi) / 2;
            (std::fabs(b(mid) / b(0) - 1) > tol ? hi : lo) = mid;
        }
        EXPECT_LT(rel(axial_uniform_half_length(pair, tol, 0.0), lo), 1e-10) << tol;
        // Leading-order estimate R (125 tol / 144)^(1/4) from the expansion above: within 5 %.
        EXPECT_LT(rel(lo, R * std::pow(125 * tol / 144, 0.25)), 0.05) << tol;
    }
}

TEST(Uniformity, GradientLinearRegionOfAMaxwellGradientPair) {
    const double R = 0.1, s = std::sqrt(3.0) * R;
    const CoilTable pair({{R, R, 0, -s / 2, 1, -1}, {R, R, 0, s / 2, 1, 1}});
    const double h = axial_linear_half_length(pair, 0.01, 0.0);
    // Check the definition directly: within h the gradient stays within 1 %, just beyond it not.
    const auto g = [&](double z) { return axial_derivatives(pair, z, 1)[1]; };
    for (double f : {0.25, 0.5, 0.9, 0.999}) EXPECT_LE(std::fabs(g(f * h) / g(0) - 1), 0.01 + 1e-12);
    EXPECT_GT(std::fabs(g(1.001 * h) / g(0) - 1), 0.01);
    EXPECT_GT(h, 0.1 * R);
}

TEST(Uniformity, BadTolerancesAndZeroFieldsAreErrors) {
    const CoilTable loop({{0.1, 0.1, 0, 0, 1, 1}});
    EXPECT_THROW(axial_uniform_half_length(loop, 0.0, 0.0), DomainError);
    EXPECT_THROW(axial_uniform_half_length(loop, 1.0, 0.0), DomainError);
    EXPECT_THROW(axial_linear_half_length(loop, 0.01, 0.0), DomainError);  // gradient 0 at the centre
    const CoilTable opposed({{0.1, 0.1, 0, -0.05, 1, 1}, {0.1, 0.1, 0, 0.05, 1, -1}});
    EXPECT_THROW(axial_uniform_half_length(opposed, 0.01, 0.0), DomainError);  // B = 0 at the centre
}

TEST(Pairs, ReadyMadeTablesHaveTheirDefiningProperties) {
    // Helmholtz and gradient tables from their spacings; Maxwell's table zeroes the 2nd and 4th
    // derivatives (Maxwell, Treatise, art. 715, quoted from memory and confirmed here).
    const CoilSection loop{0.2, 0.2, 0};
    const CoilTable h = flat_pair_table(loop, 10, 2);
    EXPECT_LT(rel(h.rows()[1].centre_z - h.rows()[0].centre_z, 0.2), 1e-14);
    EXPECT_LT(rel(axial_field(h, 0), std::pow(0.8, 1.5) * kMu0 * 10 * 2 / 0.2), 1e-14);
    const CoilTable g = gradient_pair_table({0.1, 0.12, 0.02}, 50, 3);
    EXPECT_LT(std::fabs(axial_derivatives(g, 0, 3)[3]) * 0.01 / axial_derivatives(g, 0, 1)[1], 1e-12);
    EXPECT_GT(axial_derivatives(g, 0, 1)[1], 0.0);  // +current at +z: positive gradient
    const CoilTable m = maxwell_table(0.5, 64, 1);
    const auto d = axial_derivatives(m, 0, 4);
    EXPECT_EQ(m.rows()[0].turns, 49.0);
    EXPECT_LT(std::fabs(d[2]) * 0.25 / d[0], 1e-13);
    EXPECT_LT(std::fabs(d[4]) * 0.0625 / d[0], 1e-12);
    EXPECT_THROW(maxwell_table(0, 1, 1), DomainError);
}
