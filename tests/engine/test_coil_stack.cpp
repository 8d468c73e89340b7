// A coaxial coil table is the sum of its rows, each of its own kind at its own centre.
#include <gtest/gtest.h>

#include <cmath>
#include <string>

#include "coilwright/field.hpp"
#include "coilwright/constants.hpp"
#include "coilwright/errors.hpp"

using namespace coilwright;

namespace {
// inner, outer, length, centre z, turns, current: one row of each kind.
const CoilTable kTable({{0.10, 0.10, 0.00, -0.05, 20, 1.0},     // loop
                        {0.04, 0.04, 0.12, 0.02, 300, -0.5},    // thin solenoid
                        {0.02, 0.07, 0.00, 0.10, 15, 2.0},      // flat spiral
                        {0.05, 0.06, 0.03, -0.12, 200, 0.75}});  // thick coil
}  // namespace

TEST(CoilStack, KindsFollowTheSheetColumns) {
    EXPECT_EQ(kTable.rows()[0].kind(), CoilRow::Kind::Loop);
    EXPECT_EQ(kTable.rows()[1].kind(), CoilRow::Kind::ThinSolenoid);
    EXPECT_EQ(kTable.rows()[2].kind(), CoilRow::Kind::FlatSpiral);
    EXPECT_EQ(kTable.rows()[3].kind(), CoilRow::Kind::Thick);
    for (const CoilRow& row : kTable.rows()) EXPECT_GE(row_cost(row), 1.0);
}

TEST(CoilStack, FieldIsTheSumOfTheRows) {
    // Superposition, with each row's own model at its own centre.
    for (double z : {0.0, 0.03, -0.2, 1.5})
        for (double r : {0.0, 0.03, 0.055, 0.3}) {
            FieldRZ sum{};
            sum += loop_field({0.10, 20, 1.0}, z + 0.05, r);
            sum += solenoid_field({0.04, 0.12, 300, -0.5}, z - 0.02, r);
            sum += flat_spiral_field({0.02, 0.07, 15, 2.0}, z - 0.10, r);
            sum += thick_coil_field({0.05, 0.06, 0.03, 200, 0.75}, z + 0.12, r);
            const FieldRZ f = table_field(kTable, z, r);
            EXPECT_EQ(f.bz, sum.bz) << z << " " << r;
            EXPECT_EQ(f.br, sum.br) << z << " " << r;
        }
}

TEST(CoilStack, HelmholtzPairCentreFieldAndFlatness) {
    // Two coaxial loops of radius R a distance R apart: B = (4/5)^(3/2) mu0 N I / R at the centre,
    // with the second derivative zero there (H. von Helmholtz's arrangement; any EM text).
    const double R = 0.15, n = 50, i = 2.0;
    const CoilTable pair({{R, R, 0, -R / 2, n, i}, {R, R, 0, R / 2, n, i}});
    const double b0 = std::pow(0.8, 1.5) * kMu0 * n * i / R;
    EXPECT_LT(std::fabs(table_field(pair, 0, 0).bz - b0), 2e-15 * b0);
    // Flatness: the first non-zero term is fourth order, B(z) - B(0) ~ z^4.
    const double d1 = table_field(pair, 0.01 * R, 0).bz - b0, d2 = table_field(pair, 0.02 * R, 0).bz - b0;
    EXPECT_NEAR(d2 / d1, 16.0, 0.1);
}

TEST(CoilStack, SingularPointNamesTheRow) {
    const CoilTable table({{0.10, 0.10, 0.0, 0.0, 1, 1.0}, {0.04, 0.04, 0.12, 0.3, 10, 1.0}}, {3, 7});
    try {
        table_field(table, 0.3, 0.04);  // on the second row's sheet
        FAIL() << "no error";
    } catch (const SingularPointError& e) {
        EXPECT_NE(std::string(e.what()).find("row 7"), std::string::npos) << e.what();
    }
    EXPECT_THROW(table_field(table, 0.0, -0.1), DomainError);
    EXPECT_THROW(table_field(table, std::nan(""), 0.1), DomainError);
}
