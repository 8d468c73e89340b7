// Field of coil sets: the coaxial functions on a shared axis, invariance under rotation,
// Biot-Savart references at 40 digits (mpmath), div B = 0 and curl B = 0, errors.
#include <gtest/gtest.h>

#include <cmath>
#include <random>

#include "../reference_csv.hpp"
#include "coilwright/field/table_field.hpp"
#include "coilwright/constants.hpp"
#include "coilwright/errors.hpp"
#include "coilwright/field/rect.hpp"
#include "coilwright/sets.hpp"
#include "set_test_support.hpp"

using namespace coilwright;
using namespace coilwright::set_test;

namespace {

const Eigen::Vector3d kZ = Eigen::Vector3d::UnitZ();

// A mixed set on the z axis and the same coils as a coaxial coil table (coil_stack.hpp).
struct CoaxialPair {
    std::vector<SetCoil> set;
    CoilTable table;
};

CoaxialPair coaxial_example() {
    std::vector<SetCoil> s;
    s.push_back(circle({0, 0, -0.05}, kZ, 0.1, 20, 1.5));
    s.push_back(circle({0, 0, 0.05}, {0, 0, 3}, 0.1, 20, 1.5));  // axis of any length
    SetCoil thick = circle({0, 0, 0.2}, kZ, 0.12, 200, -0.7);
    thick.depth = 0.02;
    thick.breadth = 0.03;
    s.push_back(thick);
    SetCoil sheet = circle({0, 0, -0.3}, kZ, 0.05, 100, 2.0);
    sheet.breadth = 0.1;
    s.push_back(sheet);
    SetCoil spiral = circle({0, 0, 0.4}, kZ, 0.08, 30, 1.0);
    spiral.depth = 0.04;
    s.push_back(spiral);
    CoilTable t({{0.1, 0.1, 0, -0.05, 20, 1.5},
                 {0.1, 0.1, 0, 0.05, 20, 1.5},
                 {0.11, 0.13, 0.03, 0.2, 200, -0.7},
                 {0.05, 0.05, 0.1, -0.3, 100, 2.0},
                 {0.06, 0.1, 0, 0.4, 30, 1.0}});
    return {s, t};
}

}  // namespace

// A set whose coils share the z axis is a coaxial coil table: table_field (STACK_*) gives Bz
// and Br at r = hypot(x, y), to 1e-14.
TEST(SetField, CoaxialSetEqualsCoilTable) {
    const CoaxialPair ex = coaxial_example();
    const CoilSet set(ex.set);
    double worst = 0.0;
    for (const Eigen::Vector3d& p : {Eigen::Vector3d(0, 0, 0), Eigen::Vector3d(0.03, -0.04, 0.01),
                                    Eigen::Vector3d(0.2, 0.1, -0.1), Eigen::Vector3d(-0.001, 0.002, 0.5),
                                    Eigen::Vector3d(0.11, 0.05, 0.2), Eigen::Vector3d(3, -4, 12)}) {
        const double r = std::hypot(p.x(), p.y());
        const FieldRZ f = table_field(ex.table, p.z(), r);
        const Eigen::Vector3d expected = r == 0 ? Eigen::Vector3d(0, 0, f.bz)
                                                : Eigen::Vector3d(f.br * p.x() / r, f.br * p.y() / r, f.bz);
        worst = std::max(worst, rel(set_field(set, p), expected));
    }
    EXPECT_LT(worst, 1e-14);
}

// A rectangle with its axis along z and roll 0 is the RECT_* rectangle (rect.hpp), moved.
TEST(SetField, RectOnZAxisEqualsRectField) {
    const CoilSet set({rect({0.1, -0.2, 0.3}, kZ, 0.4, 0.25, 0, 12, 0.8)});
    for (const Eigen::Vector3d& p : {Eigen::Vector3d(0.1, -0.2, 0.3), Eigen::Vector3d(0.2, 0.0, 0.35),
                                    Eigen::Vector3d(-1, 2, 3), Eigen::Vector3d(0.3, -0.2, 0.3)}) {
        const Eigen::Vector3d expected = rect_field({0.4, 0.25, 12, 0.8}, p - Eigen::Vector3d(0.1, -0.2, 0.3));
        EXPECT_LT(rel(set_field(set, p), expected), 1e-14) << p.transpose();
    }
    // Roll 90: the width runs along y, like RECT with width and height swapped.
    const CoilSet turned({rect({0, 0, 0}, kZ, 0.4, 0.25, 90, 12, 0.8)});
    const Eigen::Vector3d p(0.05, 0.3, 0.1);
    const Eigen::Vector3d swapped = rect_field({0.25, 0.4, 12, 0.8}, {p.x(), p.y(), p.z()});
    EXPECT_LT(rel(set_field(turned, p), swapped), 1e-14);
}

// Turning the whole set and the points leaves |B| unchanged and turns B with them, to 1e-14.
TEST(SetField, RotationInvariance) {
    std::vector<SetCoil> coils = {circle({0.1, 0.0, -0.2}, {1, 2, 3}, 0.15, 10, 1.0),
                                  rect({-0.1, 0.2, 0.1}, {-1, 0.5, 0.2}, 0.3, 0.2, 17, 5, -2.0),
                                  circle({0.0, -0.3, 0.2}, {0, 1, 0}, 0.1, 4, 0.5)};
    std::mt19937_64 rng(12);
    std::uniform_real_distribution<double> uni(-0.6, 0.6);
    double worst = 0.0;
    for (int trial = 0; trial < 5; ++trial) {
        const Eigen::Matrix3d rot =
            Eigen::Quaterniond(Eigen::Vector4d(uni(rng), uni(rng), uni(rng), uni(rng)).normalized()).toRotationMatrix();
        std::vector<SetCoil> turned;
        for (const auto& c : coils) turned.push_back(rotated(c, rot));
        const CoilSet a(coils), b(turned);
        for (int k = 0; k < 20; ++k) {
            const Eigen::Vector3d p(uni(rng), uni(rng), uni(rng));
            const Eigen::Vector3d ba = set_field(a, p), bb = set_field(b, rot * p);
            worst = std::max(worst, rel(rot * ba, bb));
            EXPECT_NEAR(ba.norm(), bb.norm(), 1e-14 * ba.norm());
        }
    }
    EXPECT_LT(worst, 1e-14);
}

namespace {

// Distance from p to the coil's filament, from its local coordinates.
double wire_distance(const SetCoil& c, const Eigen::Vector3d& p) {
    const Eigen::Vector3d l = coil_frame(c.axis, c.roll_deg, c.centre).to_local(p);
    if (c.shape == SetShape::Circle) return std::hypot(c.size - std::hypot(l.x(), l.y()), l.z());
    const double hw = c.size / 2, hh = c.height / 2;
    const double dx = std::max(std::fabs(l.x()) - hw, 0.0), dy = std::max(std::fabs(l.y()) - hh, 0.0);
    const double to_x_sides = std::hypot(std::hypot(dx, std::fabs(std::fabs(l.y()) - hh)), l.z());
    const double to_y_sides = std::hypot(std::hypot(std::fabs(std::fabs(l.x()) - hw), dy), l.z());
    return std::min(to_x_sides, to_y_sides);
}

}  // namespace

// Against mpmath: Biot-Savart line-integral quadrature at 40 digits, checked by the closed form
// at 60/80 digits (tests/reference/generate_set_reference.py), near the wire and far away.
// 1e-12 relative; near a wire of a tilted coil the rounding of the point's coordinates in the
// coil's frame (a few ulps of the distance from the origin, L) bounds any double computation to
// about eps L / distance: there the bound is 4e-15 L / distance.
TEST(SetField, MpmathReference) {
    const auto rows = reference::read_reference("set_field.csv");
    ASSERT_GE(rows.size(), 20u);
    double worst = 0.0, worst_far = 0.0;
    for (const auto& row : rows) {
        SetCoil c;
        c.shape = row.cells[1] == "circle" ? SetShape::Circle : SetShape::Rect;
        c.centre = {row.num(2), row.num(3), row.num(4)};
        c.axis = {row.num(5), row.num(6), row.num(7)};
        c.size = row.num(8);
        c.height = row.num(9);
        c.roll_deg = row.num(10);
        c.turns = row.num(11);
        c.current = row.num(12);
        const CoilSet set({c});
        const Eigen::Vector3d p(row.num(13), row.num(14), row.num(15)), expected(row.num(16), row.num(17), row.num(18));
        const double e = rel(set_field(set, p), expected);
        const double extent = std::max({p.norm(), c.centre.norm(), c.size});
        const double bound = std::max(1e-12, 4e-15 * extent / wire_distance(c, p));
        worst = std::max(worst, e / bound * 1e-12);
        EXPECT_LT(e, bound) << row.cells[0];
        if (bound == 1e-12) worst_far = std::max(worst_far, e);
    }
    std::printf("set_field.csv: worst relative error %.2e where 1e-12 applies; near a wire at most %.2f of the "
                "rounding bound (%zu points)\n", worst_far, worst * 1e12, rows.size());
}

// div B = 0 and curl B = 0 off the wires (fourth-order central differences).
TEST(SetField, DivergenceAndCurlVanish) {
    std::vector<SetCoil> coils = {circle({0.1, 0.0, -0.2}, {1, 2, 3}, 0.15, 10, 1.0),
                                  rect({-0.1, 0.2, 0.1}, {-1, 0.5, 0.2}, 0.3, 0.2, 17, 5, -2.0)};
    SetCoil thick = circle({0.3, 0.3, 0.3}, {0, 1, 1}, 0.1, 50, 1.0);
    thick.depth = 0.02;
    thick.breadth = 0.02;
    coils.push_back(thick);
    const CoilSet set(coils);
    const double h = 1e-3;
    for (const Eigen::Vector3d& p : {Eigen::Vector3d(0.0, 0.0, 0.0), Eigen::Vector3d(0.2, -0.1, 0.05)}) {
        Eigen::Matrix3d j;  // j(i, k) = dB_i / dx_k
        for (int k = 0; k < 3; ++k) {
            Eigen::Vector3d e = Eigen::Vector3d::Zero();
            e[k] = h;
            j.col(k) = (8.0 * (set_field(set, p + e) - set_field(set, p - e)) -
                        (set_field(set, p + 2 * e) - set_field(set, p - 2 * e))) /
                       (12.0 * h);
        }
        const double scale = j.norm();
        EXPECT_LT(std::fabs(j.trace()), 1e-8 * scale);
        const Eigen::Vector3d curl(j(2, 1) - j(1, 2), j(0, 2) - j(2, 0), j(1, 0) - j(0, 1));
        EXPECT_LT(curl.norm(), 1e-8 * scale);
    }
}

// Inside a thick rectangular winding curl B = mu0 J (Ampere's law in differential form), with
// J = N I / (depth x breadth) along the side: the cubature is right inside the winding too.
TEST(SetField, ThickRectCurlInsideWinding) {
    SetCoil c = rect({0, 0, 0}, kZ, 0.4, 0.3, 0, 100, 2.0);
    c.depth = 0.04;
    c.breadth = 0.03;
    const CoilSet set({c});
    const Eigen::Vector3d p(0.05, -0.15 - 0.007, 0.004);  // inside the bottom side (current along +x)
    const double h = 2e-4;
    Eigen::Matrix3d j;
    for (int k = 0; k < 3; ++k) {
        Eigen::Vector3d e = Eigen::Vector3d::Zero();
        e[k] = h;
        j.col(k) = (8.0 * (set_field(set, p + e) - set_field(set, p - e)) - (set_field(set, p + 2 * e) - set_field(set, p - 2 * e))) /
                   (12.0 * h);
    }
    const Eigen::Vector3d curl(j(2, 1) - j(1, 2), j(0, 2) - j(2, 0), j(1, 0) - j(0, 1));
    const double mu0_j = kMu0 * 100 * 2.0 / (0.04 * 0.03);
    EXPECT_NEAR(curl.x(), mu0_j, 1e-6 * mu0_j);
    EXPECT_NEAR(curl.y(), 0.0, 1e-6 * mu0_j);
    EXPECT_NEAR(curl.z(), 0.0, 1e-6 * mu0_j);
    EXPECT_NEAR(j.trace(), 0.0, 1e-6 * mu0_j);
}

// Two independent evaluations of a thick rectangular winding agree: near it, flat strips in
// closed form integrated over the depth; the same winding cut into 400 thinner windings (20 x 20,
// each evaluated from twice its cross-section away by the plain filament cubature where the
// point is outside it) summed. Points inside, on the surface, next to it and at the corners.
TEST(SetField, ThickRectTwoMethodsAgree) {
    SetCoil c = rect({0, 0, 0}, kZ, 0.4, 0.3, 0, 100, 2.0);
    c.depth = 0.04;
    c.breadth = 0.03;
    const CoilSet whole({c});
    for (const Eigen::Vector3d& p : {Eigen::Vector3d(0.05, -0.2, 0.0), Eigen::Vector3d(0.05, -0.171, 0.0),
                                     Eigen::Vector3d(0.22, 0.17, 0.0), Eigen::Vector3d(0.0, 0.0, 0.0),
                                     Eigen::Vector3d(0.05, -0.15, 0.0151), Eigen::Vector3d(0.3, -0.1, 0.05)}) {
        Eigen::Vector3d sum = Eigen::Vector3d::Zero();
        const int n = 20;
        for (int i = 0; i < n; ++i)
            for (int j = 0; j < n; ++j) {
                SetCoil piece = c;
                const double s = (i + 0.5) / n * c.depth - 0.5 * c.depth, t = (j + 0.5) / n * c.breadth - 0.5 * c.breadth;
                piece.size = c.size + 2 * s;
                piece.height = c.height + 2 * s;
                piece.centre = {0, 0, t};
                piece.depth = c.depth / n;
                piece.breadth = c.breadth / n;
                piece.turns = c.turns / (n * n);
                sum += set_field(CoilSet({piece}), p);
            }
        EXPECT_LT(rel(set_field(whole, p), sum), 1e-12) << p.transpose();
    }
}

// A thick rectangular winding of small cross-section tends to its mean turn (the filament),
// and far away both are the same dipole: relative difference of order (depth / distance)^2.
TEST(SetField, ThickRectTendsToFilament) {
    SetCoil thin = rect({0, 0, 0}, {0, 1, 1}, 0.4, 0.3, 10, 100, 2.0);
    SetCoil thick = thin;
    thick.depth = 1e-3;
    thick.breadth = 1e-3;
    const Eigen::Vector3d p(0.05, 0.04, -0.03);
    EXPECT_LT(rel(set_field(CoilSet({thick}), p), set_field(CoilSet({thin}), p)), 1e-5);
}

// Points on a filament are errors naming the row, not huge numbers; so are bad rows.
TEST(SetField, Errors) {
    const CoilSet set({circle({0, 0, 0}, kZ, 0.1, 1, 1), rect({0, 0, 1}, kZ, 0.2, 0.2, 0, 1, 1)});
    try {
        set_field(set, {0.1, 0, 0});
        FAIL();
    } catch (const SingularPointError& e) {
        EXPECT_NE(std::string(e.what()).find("row 1"), std::string::npos) << e.what();
    }
    EXPECT_THROW(set_field(set, {0.1, 0.0, 1.0}), SingularPointError);  // on a side of row 2
    EXPECT_THROW(set_field(set, {0.1, 0.1, 1.0}), SingularPointError);  // a corner
    EXPECT_THROW(set_field(set, {NAN, 0, 0}), DomainError);
    // A tilted circle: a point typed on its wire is on it within the rounding of the frame.
    const CoilSet tilted({circle({0, 0, 0}, {1, 1, 1}, 0.1, 1, 1)});
    EXPECT_THROW(set_field(tilted, {0.1 / std::sqrt(2.0), -0.1 / std::sqrt(2.0), 0.0}), SingularPointError);
    EXPECT_NO_THROW(set_field(tilted, {0.1 / std::sqrt(2.0) * (1 + 1e-12), -0.1 / std::sqrt(2.0), 0.0}));
    const CoilSet tilted_rect({rect({0, 0, 0}, {1, 1, 1}, 0.2, 0.1, 0, 1, 1)});
    const CoilFrame fr = coil_frame({1, 1, 1}, 0, {0, 0, 0});
    EXPECT_THROW(set_field(tilted_rect, fr.to_global({0.1, 0.01, 0.0})), SingularPointError);
    try {
        CoilSet bad({circle({0, 0, 0}, {0, 0, 0}, 0.1, 1, 1)});
        FAIL();
    } catch (const DomainError& e) {
        EXPECT_NE(std::string(e.what()).find("row 1: the axis is the zero vector"), std::string::npos) << e.what();
    }
    EXPECT_THROW(CoilSet({circle({0, 0, 0}, kZ, -0.1, 1, 1)}), DomainError);
    EXPECT_THROW(CoilSet({rect({0, 0, 0}, kZ, 0.1, 0.0, 0, 1, 1)}), DomainError);
    SetCoil with_height = circle({0, 0, 0}, kZ, 0.1, 1, 1);
    with_height.height = 0.2;
    EXPECT_THROW(CoilSet({with_height}), DomainError);
    SetCoil deep = circle({0, 0, 0}, kZ, 0.1, 1, 1);
    deep.depth = 0.2;
    EXPECT_THROW(CoilSet({deep}), DomainError);
    SetCoil a = circle({0, 0, 0}, kZ, 0.1, 1, 1), b = circle({0, 0, 1}, kZ, 0.1, 1, 2);
    a.circuit = b.circuit = 1.0;
    try {
        CoilSet series({a, b});
        FAIL();
    } catch (const DomainError& e) {
        EXPECT_NE(std::string(e.what()).find("row 2: circuit 1 is in series"), std::string::npos) << e.what();
    }
    SetCoil fractional = a;
    fractional.circuit = 1.5;
    EXPECT_THROW(CoilSet({fractional}), DomainError);
    // A thin rectangular sheet and a flat rectangular spiral are singular on their own surface.
    SetCoil sheet = rect({0, 0, 0}, kZ, 0.2, 0.2, 0, 10, 1);
    sheet.breadth = 0.05;
    EXPECT_THROW(set_field(CoilSet({sheet}), {0.1, 0.0, 0.01}), SingularPointError);
    EXPECT_NO_THROW(set_field(CoilSet({sheet}), {0.09, 0.0, 0.01}));
}

// The batch gives set_field's values bit for bit, and NaN exactly where set_field throws.
TEST(SetField, BatchMatchesSinglePoints) {
    SetCoil thick = rect({0, 0.3, 0}, {1, 0, 0}, 0.3, 0.3, 0, 10, 1);
    thick.depth = 0.02;
    thick.breadth = 0.02;
    const CoilSet set({circle({0, 0, 0}, kZ, 0.1, 1, 1), circle({0.1, 0, 0.05}, {1, 1, 0}, 0.2, 3, -1),
                       rect({0, 0, 1}, {0, 1, 1}, 0.2, 0.3, 30, 1, 1), thick});
    std::vector<double> x, y, z;
    std::mt19937_64 rng(3);
    std::uniform_real_distribution<double> uni(-0.5, 0.5);
    for (int i = 0; i < 600; ++i) {
        x.push_back(uni(rng));
        y.push_back(uni(rng));
        z.push_back(uni(rng));
    }
    x.push_back(0.1), y.push_back(0.0), z.push_back(0.0);  // on row 1
    x.push_back(NAN), y.push_back(0.0), z.push_back(0.0);
    std::vector<double> bx(x.size()), by(x.size()), bz(x.size());
    const std::size_t bad = set_field_batch(set, x.data(), y.data(), z.data(), x.size(), bx.data(), by.data(), bz.data());
    EXPECT_EQ(bad, 2u);
    for (std::size_t i = 0; i < x.size(); ++i) {
        if (std::isnan(bx[i])) {
            EXPECT_ANY_THROW(set_field(set, {x[i], y[i], z[i]}));
            continue;
        }
        const Eigen::Vector3d b = set_field(set, {x[i], y[i], z[i]});
        EXPECT_EQ(b.x(), bx[i]);
        EXPECT_EQ(b.y(), by[i]);
        EXPECT_EQ(b.z(), bz[i]);
    }
}
