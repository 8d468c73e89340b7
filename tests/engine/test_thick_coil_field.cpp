// The thick coil (uniform current density, rectangular cross-section) against the closed form
// on the axis, physical laws inside and outside the winding, and its limits.
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
// 50..80 mm radius, 100 mm long, 800 turns of 3 A.
const ThickCoilSpec kCoil{0.05, 0.08, 0.1, 800, 3.0};
double mu0_j(const ThickCoilSpec& c) {
    return kMu0 * c.turns * c.current / ((c.outer_radius - c.inner_radius) * c.length);
}
}  // namespace

TEST(ThickCoilField, CentreFieldIsMontgomerysFieldFactor) {
    // D. B. Montgomery, Solenoid Magnet Design (1969), ch. 1: B0 = mu0 J a1 F(alpha, beta) with
    // alpha = a2 / a1, beta = L / (2 a1), F = beta ln((alpha + sqrt(alpha^2 + beta^2)) / (1 + sqrt(1 + beta^2))).
    for (const ThickCoilSpec& c : {kCoil, ThickCoilSpec{1.0, 3.0, 0.02, 10, 1.0}, ThickCoilSpec{0.2, 0.2002, 5.0, 1e4, 1.0}}) {
        // Evaluated in long double: for a thin wall the ratio in the logarithm is close to 1.
        const long double alpha = static_cast<long double>(c.outer_radius) / c.inner_radius;
        const long double beta = static_cast<long double>(c.length) / (2 * c.inner_radius);
        const long double F = beta * std::log((alpha + std::sqrt(alpha * alpha + beta * beta)) / (1 + std::sqrt(1 + beta * beta)));
        const double b0 = static_cast<double>(static_cast<long double>(mu0_j(c)) * c.inner_radius * F);
        EXPECT_LT(rel(thick_coil_field(c, 0.0, 0.0).bz, b0), 1e-13);
        // The general off-axis quadrature agrees with it just off the axis.
        EXPECT_LT(rel(thick_coil_field(c, 0.0, 1e-9 * c.inner_radius).bz, b0), 1e-12);
    }
}

TEST(ThickCoilField, ThinWallBecomesASheet) {
    // A winding of wall thickness t -> 0 is a current sheet at its mean radius; the difference
    // is O((t / d)^2) with d the distance to the wall.
    const double a = 0.05, t = 1e-7;
    const ThickCoilSpec thick{a - t / 2, a + t / 2, 0.2, 500, 2.0};
    const SolenoidSpec sheet{a, 0.2, 500, 2.0};
    for (double z : {0.0, 0.06, 0.15, -0.4})
        for (double r : {0.0, 0.02, 0.045, 0.06, 0.3}) {
            const FieldRZ f = thick_coil_field(thick, z, r), g = solenoid_field(sheet, z, r);
            EXPECT_LT(std::fabs(f.bz - g.bz), 1e-10 * g.magnitude()) << z << " " << r;
            EXPECT_LT(std::fabs(f.br - g.br), 1e-10 * g.magnitude()) << z << " " << r;
        }
}

TEST(ThickCoilField, PartsMakeTheWhole) {
    // Superposition: split the winding at a radius and at a length, turns in proportion to area.
    const double am = 0.065, a1 = kCoil.inner_radius, a2 = kCoil.outer_radius;
    const double n_in = kCoil.turns * (am - a1) / (a2 - a1);
    const ThickCoilSpec inner{a1, am, kCoil.length, n_in, kCoil.current};
    const ThickCoilSpec outer{am, a2, kCoil.length, kCoil.turns - n_in, kCoil.current};
    const ThickCoilSpec half{a1, a2, kCoil.length / 2, kCoil.turns / 2, kCoil.current};
    const double q = kCoil.length / 4;
    double worst = 0;
    for (double z : {0.0, 0.02, 0.05, 0.07, -0.3})
        for (double r : {0.0, 0.03, 0.05, 0.06, 0.065, 0.0799, 0.12}) {
            const FieldRZ whole = thick_coil_field(kCoil, z, r);
            FieldRZ radial = thick_coil_field(inner, z, r);
            radial += thick_coil_field(outer, z, r);
            FieldRZ axial = thick_coil_field(half, z - q, r);
            axial += thick_coil_field(half, z + q, r);
            const double scale = whole.magnitude();
            worst = std::max({worst, std::fabs(whole.bz - radial.bz) / scale, std::fabs(whole.br - radial.br) / scale,
                              std::fabs(whole.bz - axial.bz) / scale, std::fabs(whole.br - axial.br) / scale});
        }
    std::printf("thick coil superposition: worst difference %.2e of |B|\n", worst);
    EXPECT_LT(worst, 1e-12);
}

TEST(ThickCoilField, CurlIsMu0JInsideAndZeroOutsideDivergenceZeroEverywhere) {
    // Ampere-Maxwell in differential form: (curl B)_phi = dBr/dz - dBz/dr = mu0 J_phi, which is
    // mu0 J inside the winding and 0 elsewhere; div B = 0 everywhere.
    const double h = 1e-5;
    for (double z : {0.0, 0.03, 0.045, 0.08})
        for (double r : {0.03, 0.055, 0.07, 0.1}) {
            const bool inside = std::fabs(z) < kCoil.length / 2 && r > kCoil.inner_radius && r < kCoil.outer_radius;
            const double curl = derivative([&](double zz) { return thick_coil_field(kCoil, zz, r).br; }, z, h) -
                                derivative([&](double rr) { return thick_coil_field(kCoil, z, rr).bz; }, r, h);
            const double div = derivative([&](double rr) { return rr * thick_coil_field(kCoil, z, rr).br; }, r, h) / r +
                               derivative([&](double zz) { return thick_coil_field(kCoil, zz, r).bz; }, z, h);
            const double expected = inside ? mu0_j(kCoil) : 0.0;
            EXPECT_LT(std::fabs(curl - expected), 1e-6 * mu0_j(kCoil)) << z << " " << r;
            EXPECT_LT(std::fabs(div), 1e-6 * mu0_j(kCoil)) << z << " " << r;
        }
}

TEST(ThickCoilField, AmperesLawThroughTheWinding) {
    // Circulation around a circle of radius rho inside the winding = mu0 J pi rho^2; a circle
    // around the whole cross-section encloses mu0 N I.
    using GK = boost::math::quadrature::gauss_kronrod<double, 61>;
    const auto circulation = [](double zc, double rc, double rho) {
        auto integrand = [&](double t) {
            const FieldRZ f = thick_coil_field(kCoil, zc + rho * std::sin(t), rc + rho * std::cos(t));
            return rho * (-f.br * std::sin(t) + f.bz * std::cos(t));
        };
        return GK::integrate(integrand, 0.0, 2 * kPi, 12, 1e-13);
    };
    // The path turns from +r towards +z: clockwise about +phi, hence the minus sign.
    const double rho = 0.01;
    EXPECT_LT(rel(-circulation(0.01, 0.065, rho), mu0_j(kCoil) * kPi * rho * rho), 1e-9);
    EXPECT_LT(rel(-circulation(0.0, 0.065, 0.06), kMu0 * kCoil.turns * kCoil.current), 1e-9);
}

TEST(ThickCoilField, DipoleFarField) {
    // m = N I pi (a1^2 + a1 a2 + a2^2) / 3 (the mean of pi a^2 over the winding; Jackson 5.6).
    const double a1 = kCoil.inner_radius, a2 = kCoil.outer_radius;
    const double m = kCoil.turns * kCoil.current * kPi * (a1 * a1 + a1 * a2 + a2 * a2) / 3;
    for (double R : {20.0, 2000.0})
        for (double theta : {0.3, 1.2, 2.6}) {
            const double z = R * std::cos(theta), r = R * std::sin(theta);
            const double c = kMu0 * m / (4 * kPi * R * R * R);
            const FieldRZ f = thick_coil_field(kCoil, z, r);
            const double tol = 4 * std::pow(kCoil.length / R, 2);
            EXPECT_LT(std::fabs(f.bz - c * (3 * std::cos(theta) * std::cos(theta) - 1)), tol * c) << R;
            EXPECT_LT(std::fabs(f.br - c * 3 * std::sin(theta) * std::cos(theta)), tol * c) << R;
        }
}

TEST(ThickCoilField, FiniteEverywhereIncludingFacesAndCorners) {
    const double a1 = kCoil.inner_radius, a2 = kCoil.outer_radius, h = kCoil.length / 2;
    for (double z : {0.0, h, -h, h * (1 - 1e-12), h * (1 + 1e-12)})
        for (double r : {a1, a2, 0.5 * (a1 + a2), a1 * (1 + 1e-13), a2 * (1 - 1e-13)}) {
            const FieldRZ f = thick_coil_field(kCoil, z, r);
            EXPECT_TRUE(std::isfinite(f.bz) && std::isfinite(f.br)) << z << " " << r;
            EXPECT_LT(f.magnitude(), mu0_j(kCoil) * (a2 - a1) * 2) << z << " " << r;
        }
    // The field is continuous across the winding's surfaces (no surface current).
    const FieldRZ in = thick_coil_field(kCoil, 0.01, a2 * (1 - 1e-10)), out = thick_coil_field(kCoil, 0.01, a2 * (1 + 1e-10));
    EXPECT_LT(std::fabs(in.bz - out.bz), 1e-8 * in.magnitude());
}

TEST(ThickCoilField, EqualRadiiIsTheSheet) {
    const FieldRZ a = thick_coil_field({0.05, 0.05, 0.2, 500, 2.0}, 0.03, 0.02);
    const FieldRZ b = solenoid_field({0.05, 0.2, 500, 2.0}, 0.03, 0.02);
    EXPECT_EQ(a.bz, b.bz);
    EXPECT_EQ(a.br, b.br);
    EXPECT_THROW(thick_coil_field({0.05, 0.05, 0.2, 500, 2.0}, 0.0, 0.05), SingularPointError);
}

TEST(ThickCoilField, SymmetryAndLinearity) {
    for (double z : {0.02, 0.3})
        for (double r : {0.01, 0.06, 0.2}) {
            const FieldRZ up = thick_coil_field(kCoil, z, r), down = thick_coil_field(kCoil, -z, r);
            EXPECT_EQ(up.bz, down.bz);
            EXPECT_EQ(up.br, -down.br);
            const ThickCoilSpec reversed{kCoil.inner_radius, kCoil.outer_radius, kCoil.length, kCoil.turns, -kCoil.current};
            EXPECT_EQ(thick_coil_field(reversed, z, r).bz, -up.bz);
        }
    EXPECT_EQ(thick_coil_field(kCoil, 0.0, 0.06).br, 0.0);
}

TEST(ThickCoilField, BadArgumentsAreErrors) {
    const double nan = std::nan("");
    EXPECT_THROW(thick_coil_field({0.0, 0.1, 0.1, 1, 1}, 0, 0), DomainError);
    EXPECT_THROW(thick_coil_field({0.1, 0.05, 0.1, 1, 1}, 0, 0), DomainError);  // outer < inner
    EXPECT_THROW(thick_coil_field({0.05, 0.1, 0.0, 1, 1}, 0, 0), DomainError);
    EXPECT_THROW(thick_coil_field({0.05, 0.1, 0.1, -1, 1}, 0, 0), DomainError);
    EXPECT_THROW(thick_coil_field({0.05, 0.1, 0.1, 1, nan}, 0, 0), DomainError);
    EXPECT_THROW(thick_coil_field(kCoil, 0, -1.0), DomainError);
    EXPECT_THROW(thick_coil_field(kCoil, HUGE_VAL, 0), DomainError);
}

TEST(ThickCoilField, ExtremeButValidInputsStayFiniteOrFail) {
    for (double t : {1e-12, 0.5, 1e6})
        for (double length : {1e-12, 1.0, 1e8})
            for (double z : {0.0, 0.3, 1e30, 1e300})
                for (double r : {0.0, 1.2, 1e30, 1e300}) {
                    try {
                        const FieldRZ f = thick_coil_field({1.0, 1.0 + t, length, 10, 1.0}, z, r);
                        EXPECT_TRUE(std::isfinite(f.bz) && std::isfinite(f.br)) << t << " " << length << " " << z << " " << r;
                    } catch (const DomainError&) {
                    }
                }
}
