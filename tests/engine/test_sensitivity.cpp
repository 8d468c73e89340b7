// Tolerance sensitivity of the centre field and of the uniform region.
#include <gtest/gtest.h>

#include <cmath>

#include "coilwright/field.hpp"
#include "coilwright/constants.hpp"
#include "coilwright/errors.hpp"
#include "coilwright/design.hpp"
#include "test_support.hpp"

using namespace coilwright;
using coilwright::test::rel;

TEST(Sensitivity, LoopCentreFieldAgainstTheDerivativeOfTheTextbookFormula) {
    // B(0) = mu0 N I / (2a)  =>  dB/da = -mu0 N I / (2 a^2); dB/dN = mu0 I / (2a); dB/dI = mu0 N / (2a).
    const double a = 0.2, N = 30, I = 1.5;
    const CoilTable t({{a, a, 0, 0, N, I}});
    EXPECT_LT(rel(field_sensitivity(t, 0, CoilParameter::Radius, 0.0), -kMu0 * N * I / (2 * a * a)), 1e-9);
    EXPECT_LT(rel(field_sensitivity(t, 0, CoilParameter::Turns, 0.0), kMu0 * I / (2 * a)), 1e-15);
    EXPECT_LT(rel(field_sensitivity(t, 0, CoilParameter::Current, 0.0), kMu0 * N / (2 * a)), 1e-15);
    // Off the plane, moving the loop by +d is the field at z0 - d: -dB/dz of the textbook on-axis form.
    const double z = 0.07;
    const double dbdz = -1.5 * kMu0 * N * I * a * a * z / std::pow(a * a + z * z, 2.5);
    EXPECT_LT(rel(field_sensitivity(t, 0, CoilParameter::Position, z), -dbdz), 1e-14);
}

TEST(Sensitivity, ThickCoilRadiiAgainstMontgomerysFormula) {
    // Centre field mu0 J a1 F(alpha, beta) (Montgomery 1969) with J = N I / ((a2-a1) L), differentiated
    // here by central differences of that independent closed form.
    const double a1 = 0.05, a2 = 0.08, len = 0.1, N = 500, I = 2;
    const auto b0 = [&](double in, double out) {
        const double alpha = out / in, beta = len / (2 * in);
        const double F = beta * std::log((alpha + std::hypot(alpha, beta)) / (1 + std::hypot(1.0, beta)));
        return kMu0 * N * I / ((out - in) * len) * in * F;
    };
    const double h = 1e-6;
    const CoilTable t({{a1, a2, len, 0, N, I}});
    EXPECT_LT(rel(field_sensitivity(t, 0, CoilParameter::Inner, 0.0), (b0(a1 + h, a2) - b0(a1 - h, a2)) / (2 * h)), 1e-7);
    EXPECT_LT(rel(field_sensitivity(t, 0, CoilParameter::Outer, 0.0), (b0(a1, a2 + h) - b0(a1, a2 - h)) / (2 * h)), 1e-7);
    EXPECT_THROW(field_sensitivity(CoilTable({{a1, a1, len, 0, N, I}}), 0, CoilParameter::Inner, 0.0), DomainError);
}

TEST(Sensitivity, HelmholtzPairSymmetryAndPositionErrors) {
    // In a symmetric Helmholtz pair, moving either coil changes the centre field only at second
    // order (dB/dz = 0 at the centre of each coil's mirror partner cancels): the two position
    // sensitivities are equal and opposite.
    const double R = 0.3;
    const CoilTable pair({{R, R, 0, -R / 2, 50, 1}, {R, R, 0, R / 2, 50, 1}});
    const double s0 = field_sensitivity(pair, 0, CoilParameter::Position, 0.0);
    const double s1 = field_sensitivity(pair, 1, CoilParameter::Position, 0.0);
    EXPECT_NEAR(s0, -s1, 1e-15 * std::fabs(s0));
    // Any position error shrinks the uniform region: the worst-direction rate is negative and the
    // same for both coils; it matches a direct one-sided difference.
    const double tol = 1e-3;
    const double u0 = uniform_length_sensitivity(pair, 0, CoilParameter::Position, 0.0, tol);
    const double u1 = uniform_length_sensitivity(pair, 1, CoilParameter::Position, 0.0, tol);
    EXPECT_LT(u0, 0.0);
    EXPECT_LT(rel(u0, u1), 1e-4);
    const double h = 1e-4;
    const double base = axial_uniform_half_length(pair, tol, 0.0);
    const double direct = std::min(axial_uniform_half_length(perturbed(pair, 0, CoilParameter::Position, h), tol, 0.0) - base,
                                   axial_uniform_half_length(perturbed(pair, 0, CoilParameter::Position, -h), tol, 0.0) - base) / h;
    EXPECT_LT(rel(u0, direct), 0.02);  // the direct estimate is first order in h
}

TEST(Sensitivity, BadRowsAreErrors) {
    const CoilTable t({{0.1, 0.1, 0, 0, 1, 1}});
    EXPECT_THROW(field_sensitivity(t, 1, CoilParameter::Radius, 0.0), DomainError);
    EXPECT_THROW(perturbed(t, 0, CoilParameter::Radius, -0.2), DomainError);  // radius would go negative
}
