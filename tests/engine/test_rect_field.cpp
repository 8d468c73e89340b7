// The rectangular loop and pair against textbook formulas and physical laws.
#include <gtest/gtest.h>

#include <boost/math/quadrature/gauss_kronrod.hpp>
#include <cmath>
#include <cstdio>

#include "coilwright/constants.hpp"
#include "coilwright/errors.hpp"
#include "coilwright/field.hpp"
#include "coilwright/design.hpp"
#include "field/rect_kernel.hpp"
#include "test_support.hpp"

using namespace coilwright;
using coilwright::test::rel;
using coilwright::test::derivative;
using Eigen::Vector3d;

namespace {
const RectSpec kRect{0.6, 0.4, 25, 1.2};  // an oblong calibration coil: 0.6 m x 0.4 m, 25 turns, 1.2 A

// On-axis closed form, summed side by side (each side: mu0 I / (4 pi d) (cos a1 - cos a2),
// projected on z): Bz = mu0 N I w h / (4 pi sqrt(w^2/4 + h^2/4 + z^2))
//                       * (1/(w^2/4 + z^2) + 1/(h^2/4 + z^2)).
double on_axis(const RectSpec& r, double z) {
    const double A = r.width * r.width / 4, B = r.height * r.height / 4;
    return kMu0 * r.turns * r.current * r.width * r.height / (4 * kPi * std::sqrt(A + B + z * z)) *
           (1 / (A + z * z) + 1 / (B + z * z));
}

}  // namespace

TEST(RectField, SquareCentreIsTwoRootTwoMu0NIOverPiS) {
    // Textbook: the centre of a square loop of side s has B = 2 sqrt(2) mu0 I / (pi s)
    // (e.g. Griffiths, Introduction to Electrodynamics, the square-loop Biot-Savart problem;
    // problem number not quoted, from memory). N turns multiply it.
    for (double s : {1e-3, 0.25, 1.0, 30.0}) {
        const RectSpec sq{s, s, 7, -0.8};
        const double expected = 2 * std::sqrt(2.0) * kMu0 * 7 * -0.8 / (kPi * s);
        const Vector3d b = rect_field(sq, {0, 0, 0});
        EXPECT_LT(rel(b.z(), expected), 2e-15) << s;
        EXPECT_EQ(b.x(), 0.0);
        EXPECT_EQ(b.y(), 0.0);
    }
}

TEST(RectField, OnAxisClosedForm) {
    double worst = 0;
    for (double z : {-40.0, -2.0, -0.3, -1e-4, 0.0, 0.01, 0.2, 0.5, 1.0, 1.5, 3.0, 100.0, 1e4}) {
        const Vector3d b = rect_field(kRect, {0, 0, z});
        const double err = rel(b.z(), on_axis(kRect, z));
        EXPECT_LT(err, 4e-15) << z;
        worst = std::max(worst, err);
        EXPECT_EQ(b.x(), 0.0) << z;  // exactly zero by symmetry
        EXPECT_EQ(b.y(), 0.0) << z;
    }
    std::printf("rect on-axis: worst relative error %.2e\n", worst);
}

TEST(RectField, DipoleFarField) {
    // Far away the loop is a dipole m = N I w h along z (Jackson, Classical Electrodynamics, 5.6):
    // B = mu0 / (4 pi R^3) (3 (m.n) n - m). The relative deviation falls like (size / R)^2.
    const double m = kRect.turns * kRect.current * kRect.width * kRect.height;
    for (double R : {50.0, 1e3, 1e5, 1e25, 1e35, 1e90})
        for (Vector3d n : {Vector3d(0, 0, 1), Vector3d(1, 0, 0), Vector3d(0.48, 0.64, 0.6), Vector3d(-0.6, 0.0, -0.8)}) {
            const Vector3d b = rect_field(kRect, R * n);
            const double c = kMu0 * m / (4 * kPi * R * R * R);
            const Vector3d dip = c * (3 * n.z() * n - Vector3d(0, 0, 1));
            for (int k = 0; k < 3; ++k)  // (components: a squared norm would underflow at 1e90)
                EXPECT_LE(std::fabs(b[k] - dip[k]), (4 * std::pow(0.6 / R, 2) + 4e-15) * c) << R << " " << n.transpose();
        }
}

TEST(RectField, ClosedFormMeetsThePointDipoleWhereItTakesOver) {
    // Beyond 1e30 half-diagonals the field is evaluated as a point dipole; just before, the
    // closed form must already equal it (the dipole correction is ~ 1e-60 there).
    for (double ratio : {1.0, 0.3, 1e-3})
        for (Vector3d n : {Vector3d(1, 0, 0), Vector3d(0, 0, 1), Vector3d(0.6, 0.48, 0.64)}) {
            const double a = 1 / std::hypot(1.0, ratio), b = ratio * a, R = 0.99e30;
            const Vector3d closed = internal::rect_field_scaled(a, b, R * n);
            const Vector3d dip = 4 * a * b * (3 * n.z() * n - Vector3d(0, 0, 1)) / (R * R * R);
            for (int k = 0; k < 3; ++k)
                EXPECT_NEAR(closed[k], dip[k], 4e-15 * dip.norm()) << ratio << " " << n.transpose();
        }
}

TEST(RectField, DivergenceAndCurlVanishAwayFromTheWire) {
    // div B = 0 and curl B = 0 outside currents (Maxwell); central differences, h = 1e-4.
    const double h = 1e-4;
    for (Vector3d p : {Vector3d(0.1, 0.05, 0.1), Vector3d(0.35, -0.1, 0.02), Vector3d(-0.2, 0.3, -0.25),
                       Vector3d(1.0, 0.8, 0.5)}) {
        auto comp = [&](int k, int axis, double t) {
            Vector3d q = p;
            q[axis] = t;
            return rect_field(kRect, q)[k];
        };
        auto d = [&](int k, int axis) { return derivative([&](double t) { return comp(k, axis, t); }, p[axis], h); };
        const double scale = rect_field(kRect, p).norm() / 0.3;
        const double div = d(0, 0) + d(1, 1) + d(2, 2);
        const Vector3d curl(d(2, 1) - d(1, 2), d(0, 2) - d(2, 0), d(1, 0) - d(0, 1));
        EXPECT_LT(std::fabs(div), 1e-8 * scale) << p.transpose();
        EXPECT_LT(curl.norm(), 1e-8 * scale) << p.transpose();
    }
}

TEST(RectField, AmperesLawAroundASide) {
    // The circulation of B around a small circle about a side is mu0 N I (Ampere's law); a path
    // that links no current gives zero. The side y = -h/2 carries +x current; circle in the
    // plane x = x0 about (y, z) = (-h/2, 0).
    const double enclosed = kMu0 * kRect.turns * kRect.current;
    auto circulation = [&](double x0, double yc, double zc, double rho) {
        auto integrand = [&](double t) {
            const double y = yc + rho * std::cos(t), z = zc + rho * std::sin(t);
            const Vector3d b = rect_field(kRect, {x0, y, z});
            return rho * (-b.y() * std::sin(t) + b.z() * std::cos(t));  // B . dl, dl = rho (-sin, cos)
        };
        return boost::math::quadrature::gauss_kronrod<double, 61>::integrate(integrand, 0.0, 2 * kPi, 15, 1e-14);
    };
    // The path runs from +y toward +z: counter-clockwise about +x, the current's direction.
    for (double rho : {1e-3, 0.02, 0.1})
        EXPECT_LT(std::fabs(circulation(0.05, -0.2, 0.0, rho) - enclosed), 1e-11 * enclosed) << rho;
    EXPECT_LT(std::fabs(circulation(0.05, 0.0, 0.0, 0.05)), 1e-12 * enclosed);  // links nothing
}

TEST(RectField, SymmetryLinearityAndScaling) {
    for (Vector3d p : {Vector3d(0.1, 0.05, 0.2), Vector3d(0.45, -0.3, 0.1), Vector3d(-2.0, 1.0, 3.0)}) {
        const Vector3d b = rect_field(kRect, p);
        const Vector3d mz = rect_field(kRect, {p.x(), p.y(), -p.z()});
        EXPECT_EQ(mz.z(), b.z());  // mirror in the loop plane: Bz even, Bx and By odd
        EXPECT_EQ(mz.x(), -b.x());
        EXPECT_EQ(mz.y(), -b.y());
        const Vector3d mx = rect_field(kRect, {-p.x(), p.y(), p.z()});
        EXPECT_EQ(mx.x(), -b.x());  // mirror in x = 0
        EXPECT_EQ(mx.y(), b.y());
        EXPECT_EQ(mx.z(), b.z());
        const Vector3d my = rect_field(kRect, {p.x(), -p.y(), p.z()});
        EXPECT_EQ(my.y(), -b.y());
        EXPECT_EQ(my.z(), b.z());
        // Swapping width and height is a quarter turn about z.
        const Vector3d turned = rect_field({kRect.height, kRect.width, kRect.turns, kRect.current}, {-p.y(), p.x(), p.z()});
        EXPECT_LT((turned - Vector3d(-b.y(), b.x(), b.z())).norm(), 2e-15 * b.norm());
        // Linear in N I; B scales as 1/length when all lengths scale together.
        EXPECT_EQ(rect_field({kRect.width, kRect.height, kRect.turns, -kRect.current}, p), -b);
        const Vector3d big = rect_field({8 * kRect.width, 8 * kRect.height, kRect.turns, kRect.current}, 8 * p);
        EXPECT_LT((8 * big - b).norm(), 4e-15 * b.norm());
    }
}

TEST(RectField, PointOnASideIsAnErrorNearbyIsNot) {
    EXPECT_THROW(rect_field(kRect, {0.1, -0.2, 0}), SingularPointError);    // on a side
    EXPECT_THROW(rect_field(kRect, {0.3, 0.2, 0}), SingularPointError);     // a corner
    EXPECT_THROW(rect_field(kRect, {-0.3, 0.0, 0}), SingularPointError);
    EXPECT_NO_THROW(rect_field(kRect, {0.1, -0.2 * (1 + 1e-12), 0}));
    EXPECT_NO_THROW(rect_field(kRect, {0.1, -0.2, 1e-13}));
    // On the line of a side beyond its end the field is finite (and that side adds nothing).
    EXPECT_NO_THROW(rect_field(kRect, {0.5, -0.2, 0}));
}

TEST(RectField, BadArgumentsAreErrors) {
    const double nan = std::nan(""), inf = HUGE_VAL;
    EXPECT_THROW(rect_field({0, 1, 1, 1}, {0, 0, 0}), DomainError);
    EXPECT_THROW(rect_field({1, -1, 1, 1}, {0, 0, 0}), DomainError);
    EXPECT_THROW(rect_field({1, 1, -1, 1}, {0, 0, 0}), DomainError);
    EXPECT_THROW(rect_field({1, 1, 1, nan}, {0, 0, 0}), DomainError);
    EXPECT_THROW(rect_field({inf, 1, 1, 1}, {0, 0, 0}), DomainError);
    EXPECT_THROW(rect_field(kRect, {nan, 0, 0}), DomainError);
    EXPECT_THROW(rect_field(kRect, {0, 0, inf}), DomainError);
    EXPECT_EQ(rect_field({1, 1, 0, 1}, {0.1, 0.2, 0.3}), Vector3d::Zero());
    EXPECT_THROW(rect_pair_field(kRect, 0.0, {0, 0, 0}), DomainError);
    EXPECT_THROW(rect_pair_spacing(-1, 1), DomainError);
}

TEST(RectField, ExtremeButValidInputsStayFiniteOrFail) {
    for (double scale : {1e-300, 1e-30, 1.0, 1e30, 1e300})
        for (double c : {0.0, 1e-300, 0.3, 1e30, 1e300}) {
            try {
                const Vector3d b = rect_field({scale, 0.5 * scale, 1, 1}, {c, -0.5 * c, 0.7 * c});
                EXPECT_TRUE(b.allFinite()) << scale << " " << c;
            } catch (const DomainError&) {
            }
        }
}

TEST(RectPair, FieldIsTheSumOfTwoLoops) {
    const double D = 0.3;
    for (Vector3d p : {Vector3d(0, 0, 0), Vector3d(0.1, -0.05, 0.07), Vector3d(0.5, 0.4, -0.6)}) {
        const Vector3d want = rect_field(kRect, p - Vector3d(0, 0, D / 2)) + rect_field(kRect, p + Vector3d(0, 0, D / 2));
        EXPECT_EQ(rect_pair_field(kRect, D, p), want);
    }
    EXPECT_THROW(rect_pair_field(kRect, D, {0.3, 0.0, 0.15}), SingularPointError);  // on the upper loop
}

TEST(RectPair, SpacingOfASquarePair) {
    // 0.5445 s for a square of side s: from memory (the square Helmholtz spacing of
    // A. H. Firester, "Design of square Helmholtz coil systems", Rev. Sci. Instrum. 37, 1264
    // (1966); also M. E. Rudd and J. R. Craig, Rev. Sci. Instrum. 39, 1372 (1968)). Our own
    // mpmath computation (tests/reference/rect_pair_spacing.csv) gives 0.544505643...
    for (double s : {0.01, 1.0, 2.5})
        EXPECT_NEAR(rect_pair_spacing(s, s) / s, 0.5445, 5e-5) << s;
}

TEST(RectPair, SpacingZeroesTheSecondDerivativeAndTendsToTheWireLimit) {
    for (auto [w, h] : {std::pair{1.0, 1.0}, {0.6, 0.4}, {1.0, 0.05}}) {
        const RectSpec r{w, h, 1, 1};
        const double D = rect_pair_spacing(w, h);
        const auto bz = [&](double z) { return rect_pair_field(r, D, {0, 0, z}).z(); };
        // Second difference at the centre, step 1e-2 of the size: only the fourth-order term is left.
        const double step = 1e-2 * std::min(w, h);
        const double second = (bz(step) - 2 * bz(0) + bz(-step)) / (step * step);
        const double other = (rect_pair_field(r, 1.05 * D, {0, 0, step}).z() - rect_pair_field(r, 1.05 * D, {0, 0, 0}).z());
        EXPECT_LT(std::fabs(second) * step * step, 1e-6 * bz(0)) << w << " " << h;
        EXPECT_GT(std::fabs(other), 1e-5 * bz(0));  // a wrong spacing leaves a visible curvature
    }
    // Very long rectangles: the long sides act as two pairs of infinite wires a distance h
    // apart, whose on-axis field h / (h^2/4 + z^2) has its inflection at z = h / (2 sqrt 3), so
    // D -> h / sqrt(3) (our derivation; the non-monotonic approach to this limit is described in
    // Rev. Sci. Instrum. 91, 116103 (2020)).
    EXPECT_NEAR(rect_pair_spacing(1e4, 1.0), 1 / std::sqrt(3.0), 1e-4);
    EXPECT_NEAR(rect_pair_spacing(1.0, 1e4), 1 / std::sqrt(3.0), 1e-4);
    EXPECT_GT(rect_pair_spacing(1.0, 2.0), rect_pair_spacing(1.0, 1e3));  // the maximum lies between
    // Just inside and beyond the aspect ratio (1e4) where the limit is returned directly: no step.
    EXPECT_NEAR(rect_pair_spacing(1.0, 0.99e-4) / 0.99e-4, 1 / std::sqrt(3.0), 2e-16 * 4);
    EXPECT_NEAR(rect_pair_spacing(1.0, 1.01e-4) / 1.01e-4, 1 / std::sqrt(3.0), 2e-16 * 4);
    for (double r : {1e-10, 1e-100, 1e-300}) EXPECT_EQ(rect_pair_spacing(1.0, r), r / std::sqrt(3.0)) << r;
}
