// The flat spiral (pancake) winding against its on-axis closed form, the sheet boundary
// condition and its limits.
#include <gtest/gtest.h>

#include <cmath>
#include <cstdio>

#include "coilwright/constants.hpp"
#include "coilwright/errors.hpp"
#include "coilwright/field.hpp"
#include "test_support.hpp"

using namespace coilwright;
using coilwright::test::rel;

namespace {
const FlatSpiralSpec kSpiral{0.02, 0.06, 30, 1.5};  // 20..60 mm, 30 turns, 1.5 A
double mu0_k(const FlatSpiralSpec& s) { return kMu0 * s.turns * s.current / (s.outer_radius - s.inner_radius); }
}  // namespace

TEST(FlatSpiralField, OnAxisClosedForm) {
    // The on-axis loop field mu0 I a^2 / (2 (a^2 + z^2)^(3/2)) (Griffiths ex. 5.6) integrated over
    // the radius with N / (a2 - a1) turns per metre: mu0 K / 2 [asinh(a / |z|) - a / sqrt(a^2 + z^2)].
    // Evaluated in long double: far away the two terms of G nearly cancel.
    double worst = 0;
    for (double z : {1e-4, 0.01, -0.03, 0.2, 5.0}) {
        const auto G = [&](long double a) {
            const long double zz = std::fabs(z);
            return std::asinh(a / zz) - a / std::sqrt(a * a + zz * zz);
        };
        const double expected = static_cast<double>(
            mu0_k(kSpiral) / 2 * (G(kSpiral.outer_radius) - G(kSpiral.inner_radius)));
        const FieldRZ f = flat_spiral_field(kSpiral, z, 0.0);
        EXPECT_EQ(f.br, 0.0);
        worst = std::max(worst, rel(f.bz, expected));
    }
    // In the plane, at the centre: mu0 K ln(a2 / a1) / 2.
    worst = std::max(worst, rel(flat_spiral_field(kSpiral, 0.0, 0.0).bz,
                                mu0_k(kSpiral) / 2 * std::log(kSpiral.outer_radius / kSpiral.inner_radius)));
    std::printf("flat spiral on axis vs closed form: worst relative difference %.2e\n", worst);
    EXPECT_LT(worst, 5e-15);
}

TEST(FlatSpiralField, RadialFieldJumpsByMu0KAcrossTheWinding) {
    // Across the sheet the tangential component jumps by mu0 K x n, the normal one (Bz) is
    // continuous (Griffiths sec. 5.4.2): with K along +phi, Br is +mu0 K / 2 above, -mu0 K / 2 below.
    const double eps = 1e-10;
    for (double r : {0.025, 0.04, 0.059}) {
        const FieldRZ above = flat_spiral_field(kSpiral, eps, r), below = flat_spiral_field(kSpiral, -eps, r);
        EXPECT_LT(rel(above.br - below.br, mu0_k(kSpiral)), 1e-7) << r;
        EXPECT_LT(std::fabs(above.bz - below.bz), 1e-7 * std::fabs(above.bz)) << r;
    }
}

TEST(FlatSpiralField, NarrowSpiralBecomesLoops) {
    const double a = 0.05, w = 1e-7;
    for (double z : {0.0, 0.01, -0.2})
        for (double r : {0.0, 0.03, 0.07}) {
            const FieldRZ s = flat_spiral_field({a - w / 2, a + w / 2, 9, 2.0}, z, r), l = loop_field({a, 9, 2.0}, z, r);
            EXPECT_LT(std::fabs(s.bz - l.bz), 1e-10 * l.magnitude()) << z << " " << r;
            EXPECT_LT(std::fabs(s.br - l.br), 1e-10 * l.magnitude()) << z << " " << r;
        }
    const FieldRZ same = flat_spiral_field({a, a, 9, 2.0}, 0.01, 0.03), loop = loop_field({a, 9, 2.0}, 0.01, 0.03);
    EXPECT_EQ(same.bz, loop.bz);
}

TEST(FlatSpiralField, TwoRingsMakeTheWhole) {
    const double am = 0.035, a1 = kSpiral.inner_radius, a2 = kSpiral.outer_radius;
    const double n_in = kSpiral.turns * (am - a1) / (a2 - a1);
    for (double z : {0.001, 0.02, -0.5})
        for (double r : {0.0, 0.03, 0.035, 0.05, 0.1}) {
            const FieldRZ whole = flat_spiral_field(kSpiral, z, r);
            FieldRZ parts = flat_spiral_field({a1, am, n_in, kSpiral.current}, z, r);
            parts += flat_spiral_field({am, a2, kSpiral.turns - n_in, kSpiral.current}, z, r);
            EXPECT_LT(std::fabs(whole.bz - parts.bz), 1e-12 * whole.magnitude()) << z << " " << r;
            EXPECT_LT(std::fabs(whole.br - parts.br), 1e-12 * whole.magnitude()) << z << " " << r;
        }
}

TEST(FlatSpiralField, DipoleFarField) {
    const double a1 = kSpiral.inner_radius, a2 = kSpiral.outer_radius;
    const double m = kSpiral.turns * kSpiral.current * kPi * (a1 * a1 + a1 * a2 + a2 * a2) / 3;
    for (double R : {10.0, 1000.0})
        for (double theta : {0.4, 1.5, 2.8}) {
            const double z = R * std::cos(theta), r = R * std::sin(theta);
            const double c = kMu0 * m / (4 * kPi * R * R * R);
            const FieldRZ f = flat_spiral_field(kSpiral, z, r);
            const double tol = 4 * std::pow(a2 / R, 2);
            EXPECT_LT(std::fabs(f.bz - c * (3 * std::cos(theta) * std::cos(theta) - 1)), tol * c) << R;
            EXPECT_LT(std::fabs(f.br - c * 3 * std::sin(theta) * std::cos(theta)), tol * c) << R;
        }
}

TEST(FlatSpiralField, PointsOnTheWindingAreErrorsTheRestIsFinite) {
    EXPECT_THROW(flat_spiral_field(kSpiral, 0.0, 0.04), SingularPointError);
    EXPECT_THROW(flat_spiral_field(kSpiral, 0.0, kSpiral.inner_radius), SingularPointError);
    EXPECT_THROW(flat_spiral_field(kSpiral, 0.0, kSpiral.outer_radius), SingularPointError);
    for (double r : {0.0, 0.01, 0.0199999, 0.0600001, 0.2}) EXPECT_TRUE(std::isfinite(flat_spiral_field(kSpiral, 0.0, r).bz));
    EXPECT_EQ(flat_spiral_field(kSpiral, 0.0, 0.1).br, 0.0);  // in the plane, outside: Br = 0
    EXPECT_THROW(flat_spiral_field({0.06, 0.02, 30, 1.5}, 0.1, 0.0), DomainError);
    EXPECT_THROW(flat_spiral_field({0.0, 0.02, 30, 1.5}, 0.1, 0.0), DomainError);
    EXPECT_THROW(flat_spiral_field(kSpiral, 0.1, -0.01), DomainError);
}

TEST(FlatSpiralField, ExtremeButValidInputsStayFiniteOrFail) {
    for (double w : {1e-12, 0.5, 1e6})
        for (double z : {0.0, 1e-300, 0.3, 1e30, 1e300})
            for (double r : {0.0, 0.5, 1.2, 1e30, 1e300}) {
                try {
                    const FieldRZ f = flat_spiral_field({1.0, 1.0 + w, 10, 1.0}, z, r);
                    EXPECT_TRUE(std::isfinite(f.bz) && std::isfinite(f.br)) << w << " " << z << " " << r;
                } catch (const DomainError&) {
                }
            }
}
