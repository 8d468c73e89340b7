// Inductance of coils anywhere in space: the coaxial results on a shared axis, reciprocity,
// Neumann's double integral in mpmath, Grover's closed forms for parallel squares, the square
// loop of round wire, Maxwell's geometric mean distance of a square.
#include <gtest/gtest.h>

#include <Eigen/Cholesky>
#include <cmath>

#include "../../../engine/src/sets/inductance_detail.hpp"
#include "../reference_csv.hpp"
#include "coilwright/constants.hpp"
#include "coilwright/errors.hpp"
#include "coilwright/inductance/mutual.hpp"
#include "coilwright/inductance/self.hpp"
#include "coilwright/sets.hpp"
#include "coilwright/inductance/table.hpp"
#include "set_test_support.hpp"

using namespace coilwright;
using namespace coilwright::set_test;
using coilwright::internal::general_mutual;

namespace {
const Eigen::Vector3d kZ = Eigen::Vector3d::UnitZ();

double general(const SetCoil& a, const SetCoil& b) {
    return general_mutual(a, coil_frame(a.axis, a.roll_deg, a.centre), b, coil_frame(b.axis, b.roll_deg, b.centre));
}
double mutual(const SetCoil& a, const SetCoil& b) {
    return coil_mutual_inductance(a, coil_frame(a.axis, a.roll_deg, a.centre), b, coil_frame(b.axis, b.roll_deg, b.centre));
}
}  // namespace

// The general line integral (Babic et al. 2010 for circles) on coaxial circles equals Maxwell's
// formula (loop_mutual_inductance, itself checked against mpmath), near and far.
TEST(SetInductance, GeneralPathEqualsMaxwellOnCoaxialCircles) {
    for (double d : {0.001, 0.02, 0.1, 1.0, 30.0}) {
        const SetCoil a = circle({0, 0, 0}, kZ, 0.1, 3, 1), b = circle({0, 0, d}, kZ, 0.07, 5, 1);
        const double maxwell = 15 * loop_mutual_inductance(0.1, 0.07, d);
        EXPECT_NEAR(general(a, b), maxwell, 1e-12 * std::fabs(maxwell)) << d;
        EXPECT_NEAR(mutual(a, b), maxwell, 1e-15 * std::fabs(maxwell)) << d;
    }
    // Opposed axes: the same magnitude, opposite sign.
    const SetCoil a = circle({0, 0, 0}, kZ, 0.1, 1, 1), b = circle({0, 0, 0.05}, -kZ, 0.1, 1, 1);
    EXPECT_NEAR(general(a, b), -loop_mutual_inductance(0.1, 0.1, 0.05), 1e-12 * loop_mutual_inductance(0.1, 0.1, 0.05));
}

// Neumann's double integral in mpmath at 30 digits, checked by the potential form at 40
// (tests/reference/generate_set_reference.py): tilted, offset, perpendicular, mixed pairs.
TEST(SetInductance, MpmathNeumannReference) {
    const auto rows = reference::read_reference("set_mutual.csv");
    ASSERT_GE(rows.size(), 5u);
    const auto coil_at = [](const reference::CsvRow& row, std::size_t k) {
        SetCoil c;
        c.shape = row.cells[k] == "circle" ? SetShape::Circle : SetShape::Rect;
        c.centre = {row.num(k + 1), row.num(k + 2), row.num(k + 3)};
        c.axis = {row.num(k + 4), row.num(k + 5), row.num(k + 6)};
        c.size = row.num(k + 7);
        c.height = row.num(k + 8);
        c.roll_deg = row.num(k + 9);
        c.turns = 1;
        c.current = 1;
        return c;
    };
    double worst = 0.0;
    for (const auto& row : rows) {
        const SetCoil a = coil_at(row, 1), b = coil_at(row, 11);
        const double expected = row.num(21);
        const double e1 = std::fabs(mutual(a, b) / expected - 1), e2 = std::fabs(mutual(b, a) / expected - 1);
        worst = std::max({worst, e1, e2});
        EXPECT_LT(e1, 1e-12) << row.cells[0];
        EXPECT_LT(e2, 1e-12) << row.cells[0];  // reciprocity: the other filament as the source
    }
    std::printf("set_mutual.csv: worst relative error %.2e\n", worst);
}

// Two circles with a common centre whose axes meet at an angle theta (radii a < A): the series
// in zonal harmonics M = (mu0 pi a^2 / A) sum_j C(-3/2, j) P_2j(0) (a/A)^2j P_2j+1(cos theta) /
// (2j + 2) (J. C. Maxwell, A Treatise on Electricity and Magnetism, 1873, art. 697, quoted from
// memory; rederived here from the big circle's on-axis field B = mu0 A^2 / (2 (A^2 + z^2)^3/2),
// its interior harmonics and their flux through the small circle's disk).
TEST(SetInductance, MaxwellSeriesForConcentricInclinedCircles) {
    const double big = 0.2, small = 0.05, x = small / big;
    for (double theta_deg : {0.0, 30.0, 60.0, 90.0, 135.0}) {
        const double theta = theta_deg * kPi / 180.0, c = std::cos(theta);
        double sum = 0.0, binom = 1.0, p_even_at_0 = 1.0, xpow = 1.0;
        for (int j = 0; j < 40; ++j) {
            const int n = 2 * j + 1;
            // P_n(cos theta) by the three-term recurrence.
            double p0 = 1.0, p1 = c;
            for (int k = 1; k < n; ++k) {
                const double p2 = ((2.0 * k + 1.0) * c * p1 - k * p0) / (k + 1.0);
                p0 = p1;
                p1 = p2;
            }
            sum += binom * p_even_at_0 * xpow * p1 / (2.0 * j + 2.0);
            binom *= (-1.5 - j) / (j + 1.0);                          // C(-3/2, j + 1)
            p_even_at_0 *= -(2.0 * j + 1.0) / (2.0 * j + 2.0);        // P_2j+2(0)
            xpow *= x * x;
        }
        const double maxwell = kMu0 * kPi * small * small / big * sum;
        const SetCoil a = circle({0, 0, 0}, kZ, big, 1, 1);
        const SetCoil b = circle({0, 0, 0}, {std::sin(theta), 0, std::cos(theta)}, small, 1, 1);
        const double m = mutual(a, b);
        if (theta_deg == 90.0) {
            EXPECT_LT(std::fabs(m), 1e-15 * kMu0 * small) << "perpendicular: no coupling";
        } else {
            EXPECT_NEAR(m, maxwell, 1e-13 * std::fabs(maxwell)) << theta_deg;
        }
    }
}

// Two equal parallel coaxial squares of side a at distance d: M = (2 mu0 / pi) [a asinh(a/d)
// - a asinh(a / sqrt(a^2 + d^2)) - 2 sqrt(a^2 + d^2) + sqrt(2a^2 + d^2) + d] (F. W. Grover,
// Inductance Calculations, 1946, ch. 16: parallel sides' partial mutual inductances).
TEST(SetInductance, GroverParallelSquares) {
    // (Beyond d = a the closed form itself cancels: its terms are of order a, M of order a^4/d^3.)
    for (double d : {0.01, 0.2, 0.5}) {
        const double a = 0.5;
        const double sq = std::sqrt(a * a + d * d);
        const double grover = 2.0 * kMu0 / kPi *
                              (a * std::asinh(a / d) - a * std::asinh(a / sq) - 2.0 * sq + std::sqrt(2 * a * a + d * d) + d);
        const SetCoil s1 = rect({0, 0, 0}, kZ, a, a, 0, 1, 1), s2 = rect({0, 0, d}, kZ, a, a, 0, 1, 1);
        EXPECT_NEAR(mutual(s1, s2), grover, 1e-12 * grover) << d;
    }
}

// A square loop of side a, round wire of radius rho, low frequency: our formula less the
// internal inductance (mu0/8pi per metre of wire) is (2 mu0 a / pi) [ln(a/rho) - 0.774], the
// classical high-frequency result for thin wire (C. R. Paul, Inductance: Loop and Partial,
// Wiley 2010, quoted from memory; the constant is 2 - ln 2 + asinh 1 - sqrt 2 = 0.77401).
TEST(SetInductance, SquareLoopOfRoundWire) {
    const double a = 0.5, d = 1e-4, rho = d / 2;
    const double l = coil_self_inductance(rect({0, 0, 0}, kZ, a, a, 0, 1, 1), d);
    const double external = l - kMu0 / (8 * kPi) * 4 * a;
    const double constant = std::log(a / rho) - external / (2 * kMu0 * a / kPi);
    EXPECT_NEAR(constant, 0.774, 5e-4);
    // N turns: N^2 times.
    EXPECT_NEAR(coil_self_inductance(rect({0, 0, 0}, kZ, a, a, 0, 7, 1), d), 49 * l, 1e-14 * 49 * l);
    // A circle of round wire is LOOP_L.
    EXPECT_EQ(coil_self_inductance(circle({0, 0, 0}, kZ, 0.1, 3, 1), 0.001), loop_self_inductance(0.1, 0.001, 3));
}

// Maxwell's geometric mean distance of a square from itself: 0.44705 times the side (Maxwell,
// Treatise, art. 692; Grover 1946, Table 1, quoted from memory); a line: l e^(-3/2).
TEST(SetInductance, GeometricMeanDistance) {
    EXPECT_NEAR(internal::rectangle_gmd(1.0, 1.0), 0.44705, 1e-5);
    EXPECT_NEAR(internal::rectangle_gmd(2.0, 0.0), 2.0 * std::exp(-1.5), 1e-15);
    // A thin strip tends to the line.
    EXPECT_NEAR(internal::rectangle_gmd(1.0, 1e-6), std::exp(-1.5), 1e-5);
}

// Thick windings off a shared axis use 4 x 4 Gauss-Legendre filaments per cross-section; on
// coaxial windings that is compared here with the exact average (COIL_M's method).
TEST(SetInductance, ThickWindingsAveraged) {
    SetCoil a = circle({0, 0, 0}, kZ, 0.1, 100, 1), b = circle({0, 0, 0.1}, kZ, 0.1, 100, 1);
    a.depth = b.depth = 0.01;
    a.breadth = b.breadth = 0.01;
    const double exact = mutual(a, b);
    const double averaged = general(a, b);
    EXPECT_NEAR(averaged, exact, 1e-9 * exact);
}

// The inductance matrix of a coaxial set equals STACK_LMATRIX's (stack_inductance.hpp), and
// per circuit it is the polarity-weighted sum; it is symmetric positive definite.
TEST(SetInductance, MatrixPerCircuit) {
    SetCoil a = circle({0, 0, -0.05}, kZ, 0.1, 10, 1), b = circle({0, 0, 0.05}, kZ, 0.1, 10, -1);
    const CoilSet rows({a, b});
    const Eigen::MatrixXd l = set_inductance_matrix(rows, 0.002);
    const MatrixWithProblems stack = inductance_matrix(CoilTable({{0.1, 0.1, 0, -0.05, 10, 1}, {0.1, 0.1, 0, 0.05, 10, -1}}), 0.002);
    // Each row its own circuit: the polarities are +1 and -1, so the off-diagonal flips sign.
    EXPECT_NEAR(l(0, 0), stack.values(0, 0), 1e-15 * l(0, 0));
    EXPECT_NEAR(l(0, 1), -stack.values(0, 1), 1e-15 * l(0, 0));
    a.circuit = b.circuit = 1.0;
    const Eigen::MatrixXd series = set_inductance_matrix(CoilSet({a, b}), 0.002);
    ASSERT_EQ(series.rows(), 1);
    const double expected = stack.values(0, 0) + stack.values(1, 1) - 2 * stack.values(0, 1);  // opposed: gradient pair
    EXPECT_NEAR(series(0, 0), expected, 1e-14 * expected);
    const CoilSet rig(rig3_coils(1.0, 20, 1.0, SetShape::Rect));
    const Eigen::MatrixXd lr = set_inductance_matrix(rig, 0.002);
    EXPECT_LT((lr - lr.transpose()).norm(), 1e-15 * lr.norm());
    EXPECT_EQ(Eigen::LLT<Eigen::MatrixXd>(lr).info(), Eigen::Success);
    // The three orthogonal axes of a rig are uncoupled by symmetry.
    EXPECT_LT(std::fabs(lr(0, 1)), 1e-12 * lr(0, 0));
    EXPECT_LT(std::fabs(lr(0, 2)), 1e-12 * lr(0, 0));
}

TEST(SetInductance, Errors) {
    EXPECT_THROW(coil_self_inductance(rect({0, 0, 0}, kZ, 0.1, 0.1, 0, 1, 1), 0.0), DomainError);
    EXPECT_THROW(coil_self_inductance(rect({0, 0, 0}, kZ, 0.1, 0.1, 0, 1, 1), 0.06), DomainError);
    EXPECT_THROW(coil_self_inductance(circle({0, 0, 0}, kZ, 0.1, 1, 1), 0.2), DomainError);
}
