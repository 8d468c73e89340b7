// On-axis field and its derivatives (Taylor jets) against references and textbook results.
#include <gtest/gtest.h>

#include <boost/math/quadrature/gauss_kronrod.hpp>
#include <cmath>
#include <cstdio>

#include "coilwright/field.hpp"
#include "coilwright/constants.hpp"
#include "coilwright/errors.hpp"
#include "reference_csv.hpp"
#include "test_support.hpp"

using namespace coilwright;
using coilwright::test::rel;

namespace {
CoilTable one(double inner, double outer, double length, double centre = 0.0, double turns = 1.0,
              double current = 1.0) {
    return CoilTable({{inner, outer, length, centre, turns, current}});
}
}  // namespace

TEST(Axial, DerivativesAgreeWithMpmathReference) {
    // tests/reference/axial_derivatives.csv: mpmath differentiation of the loop field integrated
    // over each winding (independent of the closed forms used here).
    const auto rows = reference::read_reference("axial_derivatives.csv");
    ASSERT_GE(rows.size(), 10u);
    double worst = 0.0;
    for (const auto& row : rows) {
        const CoilTable table = one(row.num(1), row.num(2), row.num(3));
        const auto d = axial_derivatives(table, row.num(4), 8);
        // Scale of the k-th derivative: B0 / a^k, so near-zero values are judged fairly.
        const double scale = std::fabs(row.num(5));
        for (int k = 0; k <= 8; ++k) {
            const double want = row.num(5 + static_cast<std::size_t>(k));
            const double unit = scale / std::pow(row.num(1), k);
            const double err = std::fabs(d[static_cast<std::size_t>(k)] - want) / std::max(std::fabs(want), unit);
            EXPECT_LT(err, 1e-11) << row.cells[0] << " z=" << row.num(4) << " k=" << k;
            worst = std::max(worst, err);
        }
    }
    std::printf("axial derivatives up to order 8: worst relative error %.2e\n", worst);
}

TEST(Axial, LoopCentreDerivativesFromTheBinomialSeries) {
    // (a^2+z^2)^(-3/2) = a^-3 sum_k binom(-3/2, k) (z/a)^(2k): the even derivatives at the centre
    // are (2k)! binom(-3/2, k) a^(-3-2k) mu0 N I a^2 / 2; the odd ones vanish.
    const double a = 0.3, k0 = kMu0 * 7 * 2.5 * a * a / 2;
    const auto d = axial_derivatives(one(a, a, 0, 0, 7, 2.5), 0.0, 12);
    double binom = 1.0, fact = 1.0;
    for (int k = 0; 2 * k <= 12; ++k) {
        if (k > 0) {
            binom *= (-1.5 - (k - 1)) / k;
            fact *= (2 * k - 1) * (2 * k);
        }
        const double want = fact * binom * std::pow(a, -3 - 2 * k) * k0;
        EXPECT_LT(rel(d[static_cast<std::size_t>(2 * k)], want), 1e-13) << 2 * k;
        if (2 * k + 1 <= 12) {
            EXPECT_EQ(d[static_cast<std::size_t>(2 * k + 1)], 0.0);
        }
    }
}

TEST(Axial, ClosedFormsEqualTheLoopFieldSummedOverTheWinding) {
    // Superposition with the independent off-axis loop kernel (engine/src/loop.cpp) on the axis:
    // Gauss-Kronrod over the winding's radius and length (Boost.Math).
    using boost::math::quadrature::gauss_kronrod;
    const double a1 = 0.1, a2 = 0.16, len = 0.08;
    for (double z : {0.0, 0.03, 0.2}) {
        const auto sheet = [&](double a) {
            return gauss_kronrod<double, 61>::integrate(
                [&](double t) { return loop_field({a, 1, 1}, z - t, 0).bz; }, -len / 2, len / 2, 4, 1e-14);
        };
        const double thick = gauss_kronrod<double, 61>::integrate(sheet, a1, a2, 4, 1e-14) / ((a2 - a1) * len);
        EXPECT_LT(rel(axial_field(one(a1, a2, len), z), thick), 1e-13) << z;
        const double spiral = gauss_kronrod<double, 61>::integrate(
            [&](double a) { return loop_field({a, 1, 1}, z, 0).bz; }, a1, a2, 4, 1e-14) / (a2 - a1);
        EXPECT_LT(rel(axial_field(one(a1, a2, 0), z), spiral), 1e-13) << z;
    }
}

TEST(Axial, MontgomeryFieldFactorAtTheCentre) {
    // D. B. Montgomery, Solenoid Magnet Design (1969): B0 = mu0 J a1 F(alpha, beta) with
    // alpha = a2/a1, beta = L/(2 a1), F = beta ln((alpha + sqrt(alpha^2+beta^2)) / (1 + sqrt(1+beta^2))),
    // J the current density N I / ((a2-a1) L).
    const double a1 = 0.05, a2 = 0.11, len = 0.2, turns = 800, current = 3;
    const double alpha = a2 / a1, beta = len / (2 * a1);
    const double F = beta * std::log((alpha + std::hypot(alpha, beta)) / (1 + std::hypot(1.0, beta)));
    const double J = turns * current / ((a2 - a1) * len);
    EXPECT_LT(rel(axial_field(one(a1, a2, len, 0, turns, current), 0.0), kMu0 * J * a1 * F), 1e-14);
}

TEST(Axial, FiniteAndLongSolenoid) {
    // Finite solenoid on the axis: mu0 n I (cos t1 - cos t2) / 2 (any EM text), and the long
    // solenoid limit mu0 n I at its centre.
    const double a = 0.02, len = 0.5, n = 1000 / len, current = 0.7;
    for (double z : {0.0, 0.1, 0.25, 0.4}) {
        const double c1 = (z + len / 2) / std::hypot(a, z + len / 2), c2 = (z - len / 2) / std::hypot(a, z - len / 2);
        EXPECT_LT(rel(axial_field(one(a, a, len, 0, 1000, current), z), kMu0 * n * current * (c1 - c2) / 2), 1e-14);
    }
    const double very_long = 2000 * a;
    EXPECT_LT(rel(axial_field(one(a, a, very_long, 0, 1e6, 1.0), 0.0), kMu0 * 1e6 / very_long), 1e-6);
}

TEST(Axial, StackIsTheSumOfItsRows) {
    const CoilTable table({{0.1, 0.1, 0, -0.05, 10, 1}, {0.1, 0.12, 0.03, 0.05, 20, -0.5}, {0.04, 0.04, 0.2, 0, 5, 2}});
    for (double z : {-0.2, 0.0, 0.07}) {
        const auto all = axial_derivatives(table, z, 6);
        for (int k = 0; k <= 6; ++k) {
            double sum = 0;
            for (const auto& row : table.rows()) sum += axial_derivatives(CoilTable({row}), z, 6)[static_cast<std::size_t>(k)];
            EXPECT_NEAR(all[static_cast<std::size_t>(k)], sum, 1e-13 * std::fabs(sum) + 1e-300);
        }
    }
}

TEST(Axial, OrderOutOfRangeIsAnError) {
    EXPECT_THROW(axial_derivatives(one(0.1, 0.1, 0), 0, 13), DomainError);
    EXPECT_THROW(axial_derivatives(one(0.1, 0.1, 0), 0, -1), DomainError);
    EXPECT_THROW(axial_derivatives(one(0.1, 0.1, 0), std::nan(""), 2), DomainError);
}
