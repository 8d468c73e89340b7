// Coil-table inductance matrix (STACK_LMATRIX), series inductance (STACK_L), energy
// (STACK_ENERGY) and forces (STACK_FZ).
#include <gtest/gtest.h>

#include <Eigen/Cholesky>
#include <Eigen/Eigenvalues>
#include <cmath>

#include "coilwright/errors.hpp"
#include "coilwright/inductance.hpp"
#include "test_support.hpp"

using namespace coilwright;
using coilwright::test::rel;

namespace {

// A gradient-coil-like table: thick pair, a sheet, a flat spiral, a loop, stacked segments.
CoilTable demo_table() {
    return CoilTable({
        {0.10, 0.12, 0.02, -0.05, 100, 1.0},
        {0.10, 0.12, 0.02, 0.05, 100, -1.0},
        {0.06, 0.06, 0.20, 0.00, 300, 0.5},
        {0.03, 0.08, 0.00, 0.12, 40, 2.0},
        {0.15, 0.15, 0.00, -0.20, 5, 1.5},
        {0.20, 0.23, 0.05, 0.30, 60, 1.0},
        {0.20, 0.23, 0.05, 0.35, 60, 1.0},  // touches the row above
    });
}
}  // namespace

TEST(StackInductance, MatrixIsSymmetricPositiveDefiniteAndMatchesThePairs) {
    const CoilTable table = demo_table();
    const MatrixWithProblems m = inductance_matrix(table, 1e-3);
    const Eigen::Index n = m.values.rows();
    ASSERT_EQ(n, 7);
    for (Eigen::Index i = 0; i < n; ++i)
        for (Eigen::Index j = 0; j < n; ++j) {
            ASSERT_TRUE(m.valid(i, j)) << m.problems[static_cast<std::size_t>(i * n + j)].message;
            EXPECT_EQ(m.values(i, j), m.values(j, i));  // reciprocity, M12 = M21
        }
    // Entries are the pairwise functions.
    const auto& r = table.rows();
    EXPECT_EQ(m.values(0, 1), 100.0 * 100.0 * coil_mutual_inductance({0.10, 0.12, 0.02}, {0.10, 0.12, 0.02}, 0.1));
    EXPECT_LT(rel(m.values(2, 2), solenoid_inductance(0.06, 0.20, 300)), 1e-15);
    EXPECT_EQ(m.values(4, 4), loop_self_inductance(0.15, 1e-3, 5));
    EXPECT_EQ(m.values(3, 4), 40.0 * 5.0 * coil_mutual_inductance({0.03, 0.08, 0}, {0.15, 0.15, 0}, r[4].centre_z - r[3].centre_z));
    // Magnetic energy (1/2) I^T L I > 0 for every current vector: positive definite.
    const Eigen::LLT<Eigen::MatrixXd> llt(m.values);
    EXPECT_EQ(llt.info(), Eigen::Success);
    const Eigen::SelfAdjointEigenSolver<Eigen::MatrixXd> eig(m.values);
    EXPECT_GT(eig.eigenvalues().minCoeff(), 0.0);
    // |k_ij| < 1 for every pair.
    for (Eigen::Index i = 0; i < n; ++i)
        for (Eigen::Index j = 0; j < i; ++j)
            EXPECT_LT(std::fabs(m.values(i, j)) / std::sqrt(m.values(i, i) * m.values(j, j)), 1.0);
}

TEST(StackInductance, LoopsWithoutWireDiameterAreErrorCellsOnlyOnTheirDiagonal) {
    const MatrixWithProblems m = inductance_matrix(demo_table(), std::nullopt);
    for (Eigen::Index i = 0; i < 7; ++i)
        for (Eigen::Index j = 0; j < 7; ++j) EXPECT_EQ(m.valid(i, j), !(i == 4 && j == 4)) << i << " " << j;
    EXPECT_TRUE(std::isnan(m.values(4, 4)));
    EXPECT_NE(m.problems[4 * 7 + 4].message.find("row 5"), std::string::npos);
}

TEST(StackInductance, CoincidentLoopsAreErrorCells) {
    const CoilTable t({{0.1, 0.1, 0, 0, 10, 1}, {0.1, 0.1, 0, 0, 5, 1}, {0.2, 0.2, 0, 0.1, 5, 1}});
    const MatrixWithProblems m = inductance_matrix(t, 1e-3);
    EXPECT_FALSE(m.valid(0, 1));
    EXPECT_FALSE(m.valid(1, 0));
    EXPECT_TRUE(m.valid(0, 2));
    EXPECT_THROW(series_inductance(t, 1e-3), DomainError);
    const MatrixWithProblems f = axial_forces(t);
    EXPECT_FALSE(f.valid(0, 0));
    EXPECT_FALSE(f.valid(1, 0));
    EXPECT_TRUE(f.valid(2, 0));
}

TEST(StackInductance, SeriesInductanceAndEnergyAreQuadraticForms) {
    const CoilTable table = demo_table();
    const MatrixWithProblems m = inductance_matrix(table, 1e-3);
    Eigen::VectorXd s(7), current(7);
    for (int i = 0; i < 7; ++i) {
        current[i] = table.rows()[static_cast<std::size_t>(i)].current;
        s[i] = current[i] > 0 ? 1 : -1;
    }
    EXPECT_LT(rel(series_inductance(table, 1e-3), s.dot(m.values * s)), 1e-14);
    EXPECT_LT(rel(stored_energy(table, 1e-3), 0.5 * current.dot(m.values * current)), 1e-14);
    // An anti-series pair (Maxwell or anti-Helmholtz gradient pair) has L1 + L2 - 2M.
    const CoilTable pair({{0.1, 0.12, 0.02, -0.05, 100, 1}, {0.1, 0.12, 0.02, 0.05, 100, -1}});
    const double l = 1e4 * coil_self_inductance({0.1, 0.12, 0.02});
    const double mm = 1e4 * coil_mutual_inductance({0.1, 0.12, 0.02}, {0.1, 0.12, 0.02}, 0.1);
    EXPECT_LT(rel(series_inductance(pair, std::nullopt), 2 * l - 2 * mm), 1e-14);
    // Rows with current 0 are not in the circuit, and a loop row without a diameter is then harmless.
    const CoilTable with_idle({{0.1, 0.12, 0.02, 0, 100, 1}, {0.15, 0.15, 0, 0.2, 5, 0}});
    EXPECT_LT(rel(series_inductance(with_idle, std::nullopt), l), 1e-15);
    EXPECT_THROW(series_inductance(CoilTable({{0.1, 0.1, 0.1, 0, 1, 0}}), std::nullopt), DomainError);
}

TEST(StackInductance, ForcesBalanceAndMatchThePairs) {
    const CoilTable table = demo_table();
    const MatrixWithProblems f = axial_forces(table);
    double sum = 0, scale = 0;
    for (Eigen::Index i = 0; i < 7; ++i) {
        ASSERT_TRUE(f.valid(i, 0)) << f.problems[static_cast<std::size_t>(i)].message;
        sum += f.values(i, 0);
        scale += std::fabs(f.values(i, 0));
    }
    EXPECT_LT(std::fabs(sum), 1e-13 * scale);  // Newton's third law: internal forces cancel
    // A two-row table gives the pair force on row 2 and its opposite on row 1.
    const CoilTable pair({{0.1, 0.12, 0.02, -0.05, 100, 1}, {0.1, 0.12, 0.02, 0.05, 100, 1}});
    const MatrixWithProblems fp = axial_forces(pair);
    const double expected = 1e4 * coil_mutual_inductance_slope({0.1, 0.12, 0.02}, {0.1, 0.12, 0.02}, 0.1);
    EXPECT_EQ(fp.values(1, 0), expected);
    EXPECT_EQ(fp.values(0, 0), -expected);
    EXPECT_LT(fp.values(1, 0), 0);  // like currents attract: row 2 is pulled towards -z
    // The force is also the derivative of the energy with respect to the row's position.
    const auto energy_at = [&](double z) {
        return stored_energy(CoilTable({{0.1, 0.12, 0.02, -0.05, 100, 1}, {0.1, 0.12, 0.02, z, 100, 1}}), std::nullopt);
    };
    const double h = 1e-4;
    const double d1 = (energy_at(0.05 + h) - energy_at(0.05 - h)) / (2 * h);
    const double d2 = (energy_at(0.05 + h / 2) - energy_at(0.05 - h / 2)) / h;
    EXPECT_LT(rel(fp.values(1, 0), (4 * d2 - d1) / 3), 1e-7);
}
