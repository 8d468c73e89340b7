// Inductance and force functions through the UNO-free call layer: catalogue argument order,
// tables, results of their own shape (STACK_LMATRIX, STACK_FZ) and error cells.
#include <gtest/gtest.h>

#include <cmath>

#include "coilwright/inductance.hpp"
#include "core/catalogue.hpp"
#include "core/evaluate.hpp"
#include "call_by_name.hpp"

using namespace coilwright;
using namespace coilwright::sheet;

namespace {
using helpers::call;
Arg n(double v) { return Arg::number(v); }
Arg table(std::vector<std::vector<double>> rows) {
    std::vector<Cell> cells;
    for (auto& r : rows)
        for (double v : r) cells.push_back(Cell::of(v));
    return Arg::array(rows.size(), rows.empty() ? 0 : rows[0].size(), cells);
}
const std::vector<std::vector<double>> kTable = {
    {0.10, 0.12, 0.02, -0.05, 100, 1.0},
    {0.10, 0.12, 0.02, 0.05, 100, -1.0},
    {0.15, 0.15, 0.00, 0.20, 5, 2.0},  // a loop
};
}  // namespace

TEST(InductanceFunctions, ScalarFunctionsFollowTheCatalogueOrder) {
    auto r = call("SOLENOID_L", {n(0.02), n(0.1), n(200)});
    ASSERT_EQ(r.error, CellError::None) << r.message;
    EXPECT_EQ(r.values[0], solenoid_inductance(0.02, 0.1, 200));
    r = call("LOOP_L", {n(0.1), n(1e-3), Arg::missing()});  // turns default 1
    EXPECT_EQ(r.values[0], loop_self_inductance(0.1, 1e-3, 1));
    r = call("COIL_M", {n(0.1), n(0.12), n(0.02), n(100), n(0.05), n(0.07), n(0.01), n(20), n(0.03)});
    ASSERT_EQ(r.error, CellError::None) << r.message;
    EXPECT_EQ(r.values[0], 2000 * coil_mutual_inductance({0.1, 0.12, 0.02}, {0.05, 0.07, 0.01}, 0.03));
    r = call("LOOP_FZ", {n(0.1), n(10), n(2), n(0.12), n(5), n(-1), n(0.04)});
    EXPECT_EQ(r.values[0], (10 * 2.0) * (5 * -1.0) * loop_mutual_inductance_slope(0.1, 0.12, 0.04));
    r = call("COIL_K", {n(0.1), n(0.12), n(0.02), n(0.1), n(0.12), n(0.02), n(0.0)});
    EXPECT_NEAR(r.values[0], 1.0, 1e-13);  // a coil with itself
}

TEST(InductanceFunctions, CoilLBroadcastsOverARange) {
    std::vector<Cell> lengths = {Cell::of(0.01), Cell::of(0.05), Cell::of(-1.0)};
    const auto r = call("COIL_L", {n(0.1), n(0.12), Arg::array(3, 1, lengths), n(50)});
    ASSERT_EQ(r.error, CellError::None);
    ASSERT_TRUE(r.is_array);
    EXPECT_EQ(r.values[1], 2500 * coil_self_inductance({0.1, 0.12, 0.05}));
    EXPECT_EQ(r.errors[2], CellError::IllegalArgument);
    EXPECT_EQ(call("COIL_L", {n(0.1), n(0.12), n(0.02), n(-50)}).error, CellError::IllegalArgument);  // N^2 hides the sign
}

TEST(InductanceFunctions, StackMatrixHasItsOwnShapeAndErrorCells) {
    auto r = call("STACK_LMATRIX", {table(kTable), Arg::missing()});
    ASSERT_EQ(r.error, CellError::None) << r.message;
    ASSERT_TRUE(r.is_array);
    ASSERT_EQ(r.rows, 3u);
    ASSERT_EQ(r.cols, 3u);
    EXPECT_EQ(r.errors[8], CellError::IllegalArgument);  // the loop's self term needs a diameter
    EXPECT_EQ(r.errors[2], CellError::None);
    EXPECT_EQ(r.values[1], r.values[3]);
    r = call("STACK_LMATRIX", {table(kTable), n(1e-3)});
    ASSERT_EQ(r.error, CellError::None);
    EXPECT_EQ(r.errors[8], CellError::None);
    EXPECT_EQ(r.values[8], loop_self_inductance(0.15, 1e-3, 5));
    // The optional number must be a single value here.
    std::vector<Cell> two = {Cell::of(1e-3), Cell::of(2e-3)};
    EXPECT_EQ(call("STACK_LMATRIX", {table(kTable), Arg::array(1, 2, two)}).error, CellError::IllegalArgument);
    EXPECT_EQ(call("STACK_LMATRIX", {table(kTable), n(-1e-3)}).error, CellError::IllegalArgument);
}

TEST(InductanceFunctions, StackForcesAreAColumn) {
    const auto r = call("STACK_FZ", {table(kTable)});
    ASSERT_EQ(r.error, CellError::None) << r.message;
    ASSERT_EQ(r.rows, 3u);
    ASSERT_EQ(r.cols, 1u);
    EXPECT_NEAR(r.values[0] + r.values[1] + r.values[2], 0.0, 1e-12 * std::fabs(r.values[0]));
}

TEST(InductanceFunctions, SeriesInductanceAndEnergy) {
    auto r = call("STACK_L", {table(kTable), Arg::missing()});
    EXPECT_EQ(r.error, CellError::IllegalArgument);  // the loop is in the circuit, no diameter
    EXPECT_NE(r.message.find("row 3"), std::string::npos) << r.message;
    r = call("STACK_L", {table(kTable), n(1e-3)});
    ASSERT_EQ(r.error, CellError::None) << r.message;
    EXPECT_GT(r.values[0], 0);
    r = call("STACK_ENERGY", {table({{0.1, 0.12, 0.02, 0, 100, 2.0}}), Arg::missing()});
    ASSERT_EQ(r.error, CellError::None);
    EXPECT_NEAR(r.values[0], 0.5 * 4 * 1e4 * coil_self_inductance({0.1, 0.12, 0.02}), 1e-15 * r.values[0]);
}

TEST(InductanceFunctions, BadTablesAreErrors) {
    EXPECT_EQ(call("STACK_LMATRIX", {table({{0.1, 0.12, 0.02, 0, 1}}), Arg::missing()}).error,
              CellError::IllegalArgument);  // five columns
    EXPECT_EQ(call("STACK_FZ", {table({{0.1, 0.05, 0.02, 0, 1, 1}})}).error, CellError::IllegalArgument);  // outer < inner
    EXPECT_EQ(call("STACK_L", {Arg::missing(), Arg::missing()}).error, CellError::IllegalArgument);
    std::vector<std::vector<double>> huge(400, {0.1, 0.12, 0.02, 0, 1, 1});
    for (std::size_t i = 0; i < huge.size(); ++i) huge[i][3] = 0.05 * static_cast<double>(i);
    EXPECT_EQ(call("STACK_LMATRIX", {table(huge), Arg::missing()}).error, CellError::IllegalArgument);  // too much work
}
