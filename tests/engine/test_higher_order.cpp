// Higher-order coaxial designs (design/higher_order.hpp) and STACK_ORDER's design_order.
#include <gtest/gtest.h>

#include <algorithm>
#include <cmath>
#include <string>

#include "coilwright/design.hpp"
#include "coilwright/errors.hpp"
#include "field/axial_jet.hpp"
#include "reference_csv.hpp"

namespace coilwright {
namespace {

using internal::axial_jet_n;
using internal::kDesignJetSize;

// Largest nulled Taylor coefficient |c_n| R^n / |c_ref| R^ref of a design (n = first..last step 2).
double worst_nulled(const CoilTable& t, double radius, int ref, int first, int last) {
    const auto jet = axial_jet_n<kDesignJetSize>(t, 0.0);
    const double scale = std::fabs(jet.c[static_cast<std::size_t>(ref)]) * std::pow(radius, ref);
    double worst = 0.0;
    for (int n = first; n <= last; n += 2)
        worst = std::max(worst, std::fabs(jet.c[static_cast<std::size_t>(n)]) * std::pow(radius, n) / scale);
    return worst;
}

struct Case {
    bool gradient;
    DesignConstraint constraint;
    int pairs;
    bool centre;
};

CoilTable make(const Case& c, double radius, double at) {
    return c.gradient
               ? gradient_coils(radius, c.pairs, at, c.constraint)
               : uniform_coils(radius, c.pairs, at, c.constraint, c.centre ? CentreLoop::Loop : CentreLoop::None);
}

std::vector<Case> offered() {
    std::vector<Case> cases;
    for (int p = 1; p <= 4; ++p)
        for (bool centre : {false, true}) {
            cases.push_back({false, DesignConstraint::Sphere, p, centre});
        }
    for (int p = 1; p <= 4; ++p) {
        cases.push_back({false, DesignConstraint::Cylinder, p, false});
        cases.push_back({true, DesignConstraint::Cylinder, p, false});
        cases.push_back({true, DesignConstraint::Sphere, p, false});
    }
    for (int p = 1; p <= 4; ++p) cases.push_back({false, DesignConstraint::Cylinder, p, true});
    return cases;
}

// The promise: every nulled coefficient at most 1e-10 of B0 / R^n (Taylor coefficients, i.e. the
// derivative over n!), and the next one clearly not nulled (STACK_ORDER names it).
TEST(HigherOrder, EveryDesignNullsItsDerivatives) {
    for (const Case& c : offered()) {
        const double radius = 0.37;
        const CoilTable t = make(c, radius, 250.0);
        const int m = 2 * c.pairs - 1 + (c.centre ? 1 : 0);
        const int ref = c.gradient ? 1 : 0, first = c.gradient ? 3 : 2, last = first + 2 * (m - 1);
        const std::string name = std::string(c.gradient ? "gradient " : "uniform ") +
                                 (c.constraint == DesignConstraint::Sphere ? "sphere " : "cylinder ") +
                                 std::to_string(c.pairs) + (c.centre ? " +centre" : "");
        EXPECT_LE(worst_nulled(t, radius, ref, first, last), 1e-10) << name;
        EXPECT_EQ(design_order(t, 0.0), last + 2) << name;
        EXPECT_EQ(t.size(), static_cast<std::size_t>(2 * c.pairs + (c.centre ? 1 : 0))) << name;
    }
}

// Against the designs solved independently in mpmath (tests/reference/higher_order_designs.csv,
// generate_higher_order_reference.py: Gegenbauer series, 40 digits).
TEST(HigherOrder, MatchesMpmathSolutions) {
    const auto rows = reference::read_reference("higher_order_designs.csv");
    ASSERT_GT(rows.size(), 40u);
    for (const auto& row : rows) {
        const Case c{row.cells[0] == "gradient",
                     row.cells[1] == "sphere" ? DesignConstraint::Sphere : DesignConstraint::Cylinder,
                     static_cast<int>(row.num(2)), row.num(3) != 0.0};
        const CoilTable t = make(c, 1.0, 1.0);
        const CoilRow& got = t.rows().at(static_cast<std::size_t>(row.num(4)));
        EXPECT_NEAR(got.centre_z, row.num(5), 1e-12) << row.cells[0] << row.cells[1] << row.cells[2];
        EXPECT_NEAR(got.inner_radius, row.num(6), 1e-12);
        EXPECT_NEAR(got.current, row.num(7), 1e-11);
    }
}

// Published designs. Helmholtz: spacing = radius, and on the sphere the loops at +-R/sqrt(5)
// (radius 2R/sqrt 5). Maxwell's three coils (Treatise, 1873, art. 715) as MAXWELL_COILS.
// Anti-Helmholtz (Maxwell) gradient pair: spacing sqrt(3) R.
TEST(HigherOrder, ReproducesClassicDesigns) {
    const CoilTable h = uniform_coils(0.2, 1, 100.0, DesignConstraint::Cylinder);
    EXPECT_NEAR(h.rows()[1].centre_z - h.rows()[0].centre_z, 0.2, 1e-15);
    const CoilTable hs = uniform_coils(1.0, 1, 100.0, DesignConstraint::Sphere);
    EXPECT_NEAR(hs.rows()[1].centre_z, 1 / std::sqrt(5.0), 1e-15);
    EXPECT_NEAR(hs.rows()[1].inner_radius, 2 / std::sqrt(5.0), 1e-15);
    const CoilTable mx = uniform_coils(0.5, 1, 64.0, DesignConstraint::Sphere, CentreLoop::Loop);
    const CoilTable ref = maxwell_table(0.5, 64.0, 1.0);
    for (std::size_t i = 0; i < 3; ++i) {
        EXPECT_NEAR(mx.rows()[i].centre_z, ref.rows()[i].centre_z, 1e-15);
        EXPECT_NEAR(mx.rows()[i].inner_radius, ref.rows()[i].inner_radius, 1e-15);
        EXPECT_NEAR(mx.rows()[i].current, ref.rows()[i].ampere_turns(), 1e-12);
    }
    const CoilTable g = gradient_coils(0.3, 1, 10.0, DesignConstraint::Cylinder);
    EXPECT_NEAR(g.rows()[1].centre_z - g.rows()[0].centre_z, 0.3 * std::sqrt(3.0), 1e-14);
    EXPECT_EQ(g.rows()[1].current, 10.0);
    EXPECT_EQ(g.rows()[0].current, -10.0);
}

// Four loops of equal radius, 8th order: z = +-0.2432 R and +-0.9407 R, outer/inner ampere-turns
// 2.2604 (the design G. E. Lee-Whiting rounded to 9:4, Chalk River report CRT-673, 1957; values
// from memory, to the four digits recalled).
TEST(HigherOrder, FourLoopCylinderAsRecalled) {
    const CoilTable t = uniform_coils(1.0, 2, 1.0, DesignConstraint::Cylinder);
    EXPECT_NEAR(t.rows()[2].centre_z, 0.2432, 1e-4);
    EXPECT_NEAR(t.rows()[3].centre_z, 0.9407, 1e-4);
    EXPECT_NEAR(t.rows()[3].current, 2.2604, 1e-4);
}

// Sphere designs sit at the Gauss-Lobatto nodes: the zeros of P'_5 for two pairs,
// +-0.28523 15164 80645 and +-0.76505 53239 29465 (Abramowitz and Stegun, table 25.6, n = 6).
TEST(HigherOrder, SphereDesignAtLobattoNodes) {
    const CoilTable t = uniform_coils(1.0, 2, 1.0, DesignConstraint::Sphere);
    EXPECT_NEAR(t.rows()[2].centre_z, 0.285231516480645, 1e-14);
    EXPECT_NEAR(t.rows()[3].centre_z, 0.765055323929465, 1e-14);
    // Gradient sets on the sphere: the nodes of the centre-loop rule (zeros of P'_6 besides 0,
    // +-0.46884 87934 70714 and +-0.83022 38962 78567: table 25.6, n = 7) without the centre.
    const CoilTable g = gradient_coils(1.0, 2, 1.0, DesignConstraint::Sphere);
    EXPECT_NEAR(g.rows()[2].centre_z, 0.468848793470714, 1e-14);
    EXPECT_NEAR(g.rows()[3].centre_z, 0.830223896278567, 1e-14);
}

// The thick versions: one pair is PAIR_SPACING / GRADPAIR_SPACING's pair (found there by a
// different path: the first zero of one coil's derivative, TOMS 748), and every design nulls
// its coefficients.
TEST(HigherOrder, ThickDesigns) {
    const CoilSection s{0.1, 0.12, 0.03};
    const CoilTable one = uniform_thick_coils(s, 1, 50.0);
    EXPECT_NEAR(one.rows()[1].centre_z - one.rows()[0].centre_z, flat_pair_spacing(s), 1e-12);
    const CoilTable grad = gradient_thick_coils(s, 1, 50.0);
    EXPECT_NEAR(grad.rows()[1].centre_z - grad.rows()[0].centre_z, gradient_pair_spacing(s), 1e-12);
    for (int p = 1; p <= 3; ++p) {
        const CoilTable t = uniform_thick_coils(s, p, 50.0);
        EXPECT_LE(worst_nulled(t, 0.11, 0, 2, 4 * p - 2), 1e-10) << p;
        EXPECT_EQ(t.rows()[0].inner_radius, 0.1);
        EXPECT_EQ(t.rows()[0].length, 0.03);
    }
    const CoilTable c = uniform_thick_coils(s, 1, 50.0, CentreLoop::Loop);
    EXPECT_LE(worst_nulled(c, 0.11, 0, 2, 4), 1e-10);
}

TEST(HigherOrder, BadInputs) {
    EXPECT_THROW(uniform_coils(0.0, 1, 1.0, DesignConstraint::Cylinder), DomainError);
    EXPECT_THROW(uniform_coils(1.0, 0, 1.0, DesignConstraint::Cylinder), DomainError);
    EXPECT_THROW(uniform_coils(1.0, 5, 1.0, DesignConstraint::Sphere), DomainError);
    EXPECT_THROW(uniform_coils(1.0, 1, NAN, DesignConstraint::Sphere), DomainError);
    EXPECT_THROW(uniform_coils(1.0, 1, 1.0, static_cast<DesignConstraint>(7)), DomainError);
    // Windings as long as the Helmholtz spacing would overlap.
    EXPECT_THROW(uniform_thick_coils({0.1, 0.12, 0.2}, 2, 1.0), DomainError);
}

TEST(DesignOrder, ClassicValues) {
    EXPECT_EQ(design_order(CoilTable({{0.1, 0.1, 0, 0, 1, 1}}), 0.0), 2);   // one loop
    EXPECT_EQ(design_order(CoilTable({{0.1, 0.1, 0, 0, 1, 1}}), 0.05), 1);  // off centre
    EXPECT_EQ(design_order(flat_pair_table({0.1, 0.1, 0}, 1, 1), 0.0), 4);  // Helmholtz
    EXPECT_EQ(design_order(maxwell_table(0.1, 1, 1), 0.0), 6);
    EXPECT_EQ(design_order(gradient_pair_table({0.1, 0.1, 0}, 1, 1), 0.0), 5);
    // Helmholtz pair moved apart by 1e-4 of the radius: the 2nd derivative is back.
    EXPECT_EQ(design_order(CoilTable({{0.1, 0.1, 0, -0.05001, 1, 1}, {0.1, 0.1, 0, 0.05001, 1, 1}}), 0.0), 2);
    EXPECT_THROW(design_order(CoilTable({{0.1, 0.1, 0, 0, 1, 0}}), 0.0), DomainError);
    EXPECT_THROW(design_order(CoilTable({{0.1, 0.1, 0, 0, 1, 1}}), NAN), DomainError);
}

}  // namespace
}  // namespace coilwright
