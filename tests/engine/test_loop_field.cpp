// The loop field against textbook formulas and physical laws.
#include <gtest/gtest.h>

#include <boost/math/quadrature/gauss_kronrod.hpp>
#include <boost/math/special_functions/ellint_1.hpp>
#include <boost/math/special_functions/ellint_2.hpp>
#include <cmath>

#include "coilwright/constants.hpp"
#include "coilwright/errors.hpp"
#include "coilwright/field.hpp"
#include "test_support.hpp"

using namespace coilwright;
using coilwright::test::rel;
using coilwright::test::derivative;

namespace {
const LoopSpec kLoop{0.25, 40, 1.5};  // a demo coil: 0.25 m, 40 turns, 1.5 A
}  // namespace

TEST(LoopField, CentreFieldIsMu0NIOver2a) {
    // Griffiths, Introduction to Electrodynamics, Biot-Savart example of the loop; Jackson 5.5.
    const double expected = kMu0 * kLoop.turns * kLoop.current / (2 * kLoop.radius);
    EXPECT_LT(rel(loop_field(kLoop, 0, 0).bz, expected), 1e-15);
    EXPECT_EQ(loop_field(kLoop, 0, 0).br, 0.0);
}

TEST(LoopField, OnAxisFormula) {
    // Textbook on-axis field (Griffiths; Jackson 5.5): B = mu0 N I a^2 / (2 (a^2 + z^2)^(3/2)).
    const double a = kLoop.radius;
    for (double z : {-10.0, -0.3, -1e-3, 0.0, 0.05, 0.25, 1.0, 250.0}) {
        const double expected = kMu0 * kLoop.turns * kLoop.current * a * a / (2 * std::pow(a * a + z * z, 1.5));
        const FieldRZ f = loop_field(kLoop, z, 0.0);
        EXPECT_LT(rel(f.bz, expected), 2e-15) << z;
        EXPECT_EQ(f.br, 0.0);
    }
}

TEST(LoopField, AgreesWithSmytheEllipticFormWhereItIsWellConditioned) {
    // Classical closed form (W. R. Smythe, Static and Dynamic Electricity, 1950) with Boost.Math
    // ellint_1/ellint_2, at points where its cancellation costs no more than a few ulps.
    const double a = 1.0;
    for (double z : {-0.8, -0.2, 0.1, 0.6})
        for (double r : {0.4, 0.9, 1.1, 1.7}) {
            const double alpha2 = a * a + r * r + z * z - 2 * a * r, beta2 = alpha2 + 4 * a * r;
            const double beta = std::sqrt(beta2), k = std::sqrt(1 - alpha2 / beta2);
            const double K = boost::math::ellint_1(k), E = boost::math::ellint_2(k);
            const double c = kMu0 / kPi;
            const double bz = c / (2 * alpha2 * beta) * ((a * a - r * r - z * z) * E + alpha2 * K);
            const double br = c * z / (2 * alpha2 * beta * r) * ((a * a + r * r + z * z) * E - alpha2 * K);
            const FieldRZ f = loop_field({a, 1, 1}, z, r);
            EXPECT_LT(std::fabs(f.bz - bz), 2e-14 * f.magnitude()) << z << " " << r;
            EXPECT_LT(std::fabs(f.br - br), 2e-14 * f.magnitude()) << z << " " << r;
        }
}

TEST(LoopField, SymmetryLinearityAndScaling) {
    for (double z : {0.1, 0.7})
        for (double r : {0.05, 0.3, 0.6}) {
            const FieldRZ up = loop_field(kLoop, z, r), down = loop_field(kLoop, -z, r);
            EXPECT_EQ(up.bz, down.bz);   // mirror symmetry in the loop plane
            EXPECT_EQ(up.br, -down.br);
            const FieldRZ rev = loop_field({kLoop.radius, kLoop.turns, -kLoop.current}, z, r);
            EXPECT_EQ(rev.bz, -up.bz);   // linear in the current
            const FieldRZ doubled = loop_field({kLoop.radius, 2 * kLoop.turns, kLoop.current}, z, r);
            EXPECT_LT(rel(doubled.bz, 2 * up.bz), 1e-15);
            // B scales as 1/length when every length scales together.
            const FieldRZ big = loop_field({8 * kLoop.radius, kLoop.turns, kLoop.current}, 8 * z, 8 * r);
            EXPECT_LT(rel(8 * big.bz, up.bz), 4e-15);
            EXPECT_LT(rel(8 * big.br, up.br), 4e-15);
        }
}

namespace {
// Central differences with Richardson extrapolation (error O(h^4)).
}  // namespace

TEST(LoopField, DivergenceAndCurlVanishAwayFromTheWire) {
    // div B = (1/r) d(r Br)/dr + dBz/dz = 0 and (curl B)_phi = dBr/dz - dBz/dr = 0 (Maxwell).
    const double h = 1e-4;
    for (double z : {-0.4, 0.05, 0.3})
        for (double r : {0.1, 0.2, 0.45}) {
            const double scale = loop_field(kLoop, z, r).magnitude() / kLoop.radius;
            const double div = derivative([&](double rr) { return rr * loop_field(kLoop, z, rr).br; }, r, h) / r +
                               derivative([&](double zz) { return loop_field(kLoop, zz, r).bz; }, z, h);
            const double curl = derivative([&](double zz) { return loop_field(kLoop, zz, r).br; }, z, h) -
                                derivative([&](double rr) { return loop_field(kLoop, z, rr).bz; }, r, h);
            EXPECT_LT(std::fabs(div), 1e-8 * scale) << z << " " << r;
            EXPECT_LT(std::fabs(curl), 1e-8 * scale) << z << " " << r;
        }
}

TEST(LoopField, AmperesLawAroundTheWire) {
    // The line integral of B around a closed path equals mu0 times the enclosed current
    // (Ampere's law): N I when the path links the wire, zero otherwise.
    const auto circulation = [](double zc, double rc, double rho) {
        auto integrand = [&](double t) {
            const double z = zc + rho * std::sin(t), r = rc + rho * std::cos(t);
            const FieldRZ f = loop_field(kLoop, z, r);
            return rho * (-f.br * std::sin(t) + f.bz * std::cos(t));  // B . dl in the (r, z) plane
        };
        return boost::math::quadrature::gauss_kronrod<double, 61>::integrate(integrand, 0.0, 2 * kPi, 15, 1e-14);
    };
    const double enclosed = kMu0 * kLoop.turns * kLoop.current;
    // The path turns from +r toward +z, which is clockwise about the current's direction
    // (+phi = z x r), so the integral is -mu0 N I.
    for (double rho : {1e-3, 0.02, 0.1})
        EXPECT_LT(std::fabs(circulation(0.0, kLoop.radius, rho) + enclosed), 1e-11 * enclosed) << rho;
    EXPECT_LT(std::fabs(circulation(0.2, 0.1, 0.05)), 1e-13 * enclosed);  // links no current
}

TEST(LoopField, DipoleFarField) {
    // Far away the loop is a dipole m = N I pi a^2 (Jackson 5.6):
    //   Bz = mu0 m (3 cos^2 - 1) / (4 pi R^3),  Br = mu0 m 3 sin cos / (4 pi R^3).
    // The relative deviation falls like (a/R)^2.
    const double m = kLoop.turns * kLoop.current * kPi * kLoop.radius * kLoop.radius;
    for (double R : {100.0, 1000.0, 1e5})
        for (double theta : {0.3, 1.0, 2.2}) {
            const double z = R * std::cos(theta), r = R * std::sin(theta);
            const double c = kMu0 * m / (4 * kPi * R * R * R);
            const double bz = c * (3 * std::cos(theta) * std::cos(theta) - 1);
            const double br = c * 3 * std::sin(theta) * std::cos(theta);
            const FieldRZ f = loop_field(kLoop, z, r);
            const double tol = 4 * std::pow(kLoop.radius / R, 2);
            EXPECT_LT(std::fabs(f.bz - bz), tol * c) << R << " " << theta;
            EXPECT_LT(std::fabs(f.br - br), tol * c) << R << " " << theta;
        }
}

TEST(LoopField, PointOnTheFilamentIsAnError) {
    EXPECT_THROW(loop_field(kLoop, 0.0, kLoop.radius), SingularPointError);
    EXPECT_NO_THROW(loop_field(kLoop, 0.0, kLoop.radius * (1 + 1e-12)));
    EXPECT_NO_THROW(loop_field(kLoop, 1e-13, kLoop.radius));
}

TEST(LoopField, BadArgumentsAreErrors) {
    const double nan = std::nan("");
    const double inf = HUGE_VAL;
    EXPECT_THROW(loop_field({0.0, 1, 1}, 0, 0), DomainError);
    EXPECT_THROW(loop_field({-1.0, 1, 1}, 0, 0), DomainError);
    EXPECT_THROW(loop_field({nan, 1, 1}, 0, 0), DomainError);
    EXPECT_THROW(loop_field({inf, 1, 1}, 0, 0), DomainError);
    EXPECT_THROW(loop_field({1.0, -1, 1}, 0, 0), DomainError);
    EXPECT_THROW(loop_field({1.0, 1, nan}, 0, 0), DomainError);
    EXPECT_THROW(loop_field(kLoop, nan, 0), DomainError);
    EXPECT_THROW(loop_field(kLoop, 0, -1e-3), DomainError);
    EXPECT_THROW(loop_field(kLoop, 0, inf), DomainError);
    EXPECT_EQ(loop_field({1.0, 0, 1}, 0.2, 0.3).bz, 0.0);  // zero turns: no field, not an error
}

TEST(LoopField, ExtremeButValidInputsStayFiniteOrFail) {
    // Results are finite numbers or errors; never inf or NaN.
    for (double z : {1e-300, 1e-30, 1e30, 1e150, 1e300})
        for (double r : {0.0, 1e-300, 0.25, 1e30, 1e300}) {
            try {
                const FieldRZ f = loop_field(kLoop, z, r);
                EXPECT_TRUE(std::isfinite(f.bz) && std::isfinite(f.br)) << z << " " << r;
            } catch (const DomainError&) {
            }
        }
}
