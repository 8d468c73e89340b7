// The thin current-sheet solenoid against textbook formulas, physical laws and the loop.
#include <gtest/gtest.h>

#include <boost/math/quadrature/gauss_kronrod.hpp>
#include <cmath>
#include <cstdio>

#include "coilwright/constants.hpp"
#include "coilwright/errors.hpp"
#include "coilwright/field.hpp"
#include "test_support.hpp"

using namespace coilwright;
using coilwright::test::rel;
using coilwright::test::derivative;

namespace {
const SolenoidSpec kCoil{0.05, 0.2, 500, 2.0};  // 50 mm radius, 200 mm long, 500 turns, 2 A
double mu0_n_i(const SolenoidSpec& s) { return kMu0 * s.turns / s.length * s.current; }

// Textbook on-axis field of a finite solenoid (Griffiths, Introduction to Electrodynamics,
// problem 5.11; any EM text): mu0 n I / 2 * (cos a1 - cos a2), written with the end distances.
double on_axis_textbook(const SolenoidSpec& s, double z) {
    const double h = s.length / 2, a = s.radius;
    return mu0_n_i(s) / 2 * ((z + h) / std::sqrt((z + h) * (z + h) + a * a) - (z - h) / std::sqrt((z - h) * (z - h) + a * a));
}
}  // namespace

TEST(SolenoidField, OnAxisMatchesTheTextbookFormula) {
    double worst = 0;
    for (double z : {0.0, 0.03, -0.07, 0.0999, 0.1, 0.1001, 0.13, -0.25}) {
        const FieldRZ f = solenoid_field(kCoil, z, 0.0);
        EXPECT_EQ(f.br, 0.0);
        worst = std::max(worst, rel(f.bz, on_axis_textbook(kCoil, z)));
    }
    std::printf("solenoid on axis vs textbook formula: worst relative difference %.2e\n", worst);
    EXPECT_LT(worst, 2e-15);
}

TEST(SolenoidField, LongSolenoidTendsToMu0NI) {
    // Inside an infinitely long solenoid B = mu0 n I (Ampere's law; Griffiths ex. 5.9). For
    // length L = 2e4 radii the centre field differs from it by about 2 (a / L)^2 = 5e-9.
    const SolenoidSpec s{0.01, 200.0, 1e6, 0.5};
    for (double r : {0.0, 0.003, 0.0099}) {
        const double b = solenoid_field(s, 0.0, r).bz;
        EXPECT_LT(rel(b, mu0_n_i(s)), 1e-8) << r;
        EXPECT_GT(b, 0.0);
    }
    // Outside, the field is that of the two pole disks at the ends (the sheet is a uniformly
    // magnetised rod, M = n I, with pole density M . n on the end faces: Jackson sec. 5.9):
    // in the mid-plane Bz = -mu0 n I a^2 h / (2 d^3), d^2 = h^2 + r^2, tiny next to mu0 n I.
    const double h = s.length / 2, d = std::hypot(h, 0.02);
    const double poles = -mu0_n_i(s) * s.radius * s.radius * h / (2 * d * d * d);
    EXPECT_LT(rel(solenoid_field(s, 0.0, 0.02).bz, poles), 1e-6);
}

TEST(SolenoidField, SheetJumpIsMu0K) {
    // Across a surface current K the tangential field jumps by mu0 K and the normal component is
    // continuous (Griffiths sec. 5.4.2; Jackson sec. 5.9): here K = n I, tangential = Bz.
    const double a = kCoil.radius, eps = 1e-9 * a;
    for (double z : {0.0, 0.05, -0.0999}) {
        const FieldRZ in = solenoid_field(kCoil, z, a - eps), out = solenoid_field(kCoil, z, a + eps);
        EXPECT_LT(rel(in.bz - out.bz, mu0_n_i(kCoil)), 1e-6) << z;
        EXPECT_LT(std::fabs(in.br - out.br), 1e-6 * mu0_n_i(kCoil)) << z;
    }
}

TEST(SolenoidField, VanishingLengthBecomesALoop) {
    // N turns on a sheet of length L -> 0 are N coincident loops; the difference is O((L/d)^2).
    const double a = 0.1, length = 1e-7;
    for (double z : {0.0, 0.05, -0.3})
        for (double r : {0.0, 0.02, 0.12, 0.5}) {
            const FieldRZ s = solenoid_field({a, length, 7, 3.0}, z, r), l = loop_field({a, 7, 3.0}, z, r);
            const double scale = l.magnitude();
            EXPECT_LT(std::fabs(s.bz - l.bz), 1e-11 * scale) << z << " " << r;
            EXPECT_LT(std::fabs(s.br - l.br), 1e-11 * scale) << z << " " << r;
        }
}

TEST(SolenoidField, TwoHalvesMakeTheWhole) {
    // Superposition: two sheets of half the length and half the turns, end to end, are the sheet.
    const SolenoidSpec half{kCoil.radius, kCoil.length / 2, kCoil.turns / 2, kCoil.current};
    const double q = kCoil.length / 4;
    for (double z : {0.0, 0.02, 0.11, -0.4, 3.0})
        for (double r : {0.0, 0.01, 0.049, 0.051, 0.2}) {
            const FieldRZ whole = solenoid_field(kCoil, z, r);
            FieldRZ parts = solenoid_field(half, z - q, r);
            parts += solenoid_field(half, z + q, r);
            const double scale = whole.magnitude();
            EXPECT_LT(std::fabs(whole.bz - parts.bz), 4e-15 * scale) << z << " " << r;
            EXPECT_LT(std::fabs(whole.br - parts.br), 4e-15 * scale) << z << " " << r;
        }
}

TEST(SolenoidField, DivergenceAndCurlVanishAwayFromTheSheet) {
    // div B = (1/r) d(r Br)/dr + dBz/dz = 0, (curl B)_phi = dBr/dz - dBz/dr = 0 (Maxwell).
    const double h = 2e-5;
    for (double z : {0.0, 0.06, 0.12, -0.3})
        for (double r : {0.02, 0.045, 0.06, 0.15}) {
            const double scale = solenoid_field(kCoil, z, r).magnitude() / kCoil.radius + 1e-3 * mu0_n_i(kCoil);
            const double div = derivative([&](double rr) { return rr * solenoid_field(kCoil, z, rr).br; }, r, h) / r +
                               derivative([&](double zz) { return solenoid_field(kCoil, zz, r).bz; }, z, h);
            const double curl = derivative([&](double zz) { return solenoid_field(kCoil, zz, r).br; }, z, h) -
                                derivative([&](double rr) { return solenoid_field(kCoil, z, rr).bz; }, r, h);
            EXPECT_LT(std::fabs(div), 1e-7 * scale) << z << " " << r;
            EXPECT_LT(std::fabs(curl), 1e-7 * scale) << z << " " << r;
        }
}

TEST(SolenoidField, AmperesLawAroundTheSheet) {
    // The circulation of B around a circle of radius rho about a point of the sheet equals
    // mu0 times the current through it: n I * 2 rho (Ampere's law). The path crosses the sheet
    // at two points where Bz jumps: the integral is split there.
    const double a = kCoil.radius;
    for (double z0 : {0.0, 0.07}) {
        for (double rho : {1e-4, 0.01}) {
            auto integrand = [&](double t) {
                const FieldRZ f = solenoid_field(kCoil, z0 + rho * std::sin(t), a + rho * std::cos(t));
                return rho * (-f.br * std::sin(t) + f.bz * std::cos(t));
            };
            using GK = boost::math::quadrature::gauss_kronrod<double, 61>;
            const double c = GK::integrate(integrand, -kHalfPi, kHalfPi, 10, 1e-14) +
                             GK::integrate(integrand, kHalfPi, 3 * kHalfPi, 10, 1e-14);
            // The path runs from +r towards +z, clockwise about the current (+phi): -mu0 n I 2 rho.
            EXPECT_LT(rel(-c, mu0_n_i(kCoil) * 2 * rho), 1e-10) << z0 << " " << rho;
        }
    }
}

TEST(SolenoidField, DipoleFarField) {
    // Far away the sheet is a dipole m = N I pi a^2 (Jackson sec. 5.6); the relative deviation
    // falls like (size / R)^2.
    const double m = kCoil.turns * kCoil.current * kPi * kCoil.radius * kCoil.radius;
    for (double R : {30.0, 300.0, 3e4})
        for (double theta : {0.2, 1.1, 2.5}) {
            const double z = R * std::cos(theta), r = R * std::sin(theta);
            const double c = kMu0 * m / (4 * kPi * R * R * R);
            const FieldRZ f = solenoid_field(kCoil, z, r);
            const double tol = 2 * std::pow(kCoil.length / R, 2);
            EXPECT_LT(std::fabs(f.bz - c * (3 * std::cos(theta) * std::cos(theta) - 1)), tol * c) << R << " " << theta;
            EXPECT_LT(std::fabs(f.br - c * 3 * std::sin(theta) * std::cos(theta)), tol * c) << R << " " << theta;
        }
}

TEST(SolenoidField, SymmetryLinearityAndScaling) {
    for (double z : {0.03, 0.15})
        for (double r : {0.01, 0.07}) {
            const FieldRZ up = solenoid_field(kCoil, z, r), down = solenoid_field(kCoil, -z, r);
            EXPECT_EQ(up.bz, down.bz);
            EXPECT_EQ(up.br, -down.br);
            EXPECT_EQ(solenoid_field({kCoil.radius, kCoil.length, kCoil.turns, -kCoil.current}, z, r).bz, -up.bz);
            const FieldRZ big = solenoid_field({8 * kCoil.radius, 8 * kCoil.length, kCoil.turns, kCoil.current}, 8 * z, 8 * r);
            EXPECT_LT(rel(8 * big.bz, up.bz), 4e-15);
            EXPECT_LT(rel(8 * big.br, up.br), 4e-15);
        }
    EXPECT_EQ(solenoid_field(kCoil, 0.0, 0.03).br, 0.0);  // mid-plane
}

TEST(SolenoidField, PointsOnTheSheetAreErrors) {
    const double a = kCoil.radius, h = kCoil.length / 2;
    EXPECT_THROW(solenoid_field(kCoil, 0.0, a), SingularPointError);
    EXPECT_THROW(solenoid_field(kCoil, -0.09, a), SingularPointError);
    EXPECT_THROW(solenoid_field(kCoil, h, a), SingularPointError);   // the rims
    EXPECT_THROW(solenoid_field(kCoil, -h, a), SingularPointError);
    EXPECT_NO_THROW(solenoid_field(kCoil, h * (1 + 1e-12), a));        // just beyond an end
    EXPECT_NO_THROW(solenoid_field(kCoil, 0.0, a * (1 + 1e-15)));
    EXPECT_NO_THROW(solenoid_field(kCoil, 0.0, a * (1 - 1e-15)));
}

TEST(SolenoidField, BadArgumentsAreErrors) {
    const double nan = std::nan(""), inf = HUGE_VAL;
    EXPECT_THROW(solenoid_field({0.0, 1, 1, 1}, 0, 0), DomainError);
    EXPECT_THROW(solenoid_field({-1.0, 1, 1, 1}, 0, 0), DomainError);
    EXPECT_THROW(solenoid_field({1.0, 0.0, 1, 1}, 0, 0), DomainError);
    EXPECT_THROW(solenoid_field({1.0, -2.0, 1, 1}, 0, 0), DomainError);
    EXPECT_THROW(solenoid_field({1.0, inf, 1, 1}, 0, 0), DomainError);
    EXPECT_THROW(solenoid_field({1.0, 1, -1, 1}, 0, 0), DomainError);
    EXPECT_THROW(solenoid_field({1.0, 1, 1, nan}, 0, 0), DomainError);
    EXPECT_THROW(solenoid_field(kCoil, nan, 0), DomainError);
    EXPECT_THROW(solenoid_field(kCoil, 0, -1e-3), DomainError);
    EXPECT_EQ(solenoid_field({1.0, 1, 0, 1}, 0.2, 0.3).bz, 0.0);
}

TEST(SolenoidField, ExtremeButValidInputsStayFiniteOrFail) {
    for (double length : {1e-300, 1e-12, 1.0, 1e12, 1e300})
        for (double z : {0.0, 1e-300, 0.3, 1e30, 1e300})
            for (double r : {0.0, 1e-300, 0.5, 1.5, 1e30, 1e300}) {
                try {
                    const FieldRZ f = solenoid_field({1.0, length, 10, 1.0}, z, r);
                    EXPECT_TRUE(std::isfinite(f.bz) && std::isfinite(f.br)) << length << " " << z << " " << r;
                } catch (const DomainError&) {
                }
            }
}
