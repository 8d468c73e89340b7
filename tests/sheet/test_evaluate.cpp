// The UNO-free call layer: argument checking, broadcasting and error cells.
#include <gtest/gtest.h>

#include <cmath>

#include "coilwright/field.hpp"
#include "core/catalogue.hpp"
#include "core/evaluate.hpp"

using namespace coilwright;
using namespace coilwright::sheet;

namespace {
std::size_t index_of(const char* name) {
    const int i = function_index(name);
    EXPECT_GE(i, 0) << name;
    return static_cast<std::size_t>(i);
}
Arg column(std::vector<double> v) {
    std::vector<Cell> cells;
    for (double x : v) cells.push_back(Cell::of(x));
    return Arg::array(v.size(), 1, cells);
}
Arg row(std::vector<double> v) {
    std::vector<Cell> cells;
    for (double x : v) cells.push_back(Cell::of(x));
    return Arg::array(1, v.size(), cells);
}
CallResult call(const char* name, std::vector<Arg> args) { return evaluate(index_of(name), args); }
}  // namespace

TEST(Evaluate, ScalarCallGivesOneValue) {
    const auto r = call("LOOP_BZ", {Arg::number(0.1), Arg::number(10), Arg::number(2), Arg::number(0.0), Arg::missing()});
    ASSERT_EQ(r.error, CellError::None) << r.message;
    EXPECT_FALSE(r.is_array);
    EXPECT_EQ(r.values[0], loop_field({0.1, 10, 2}, 0, 0).bz);
}

TEST(Evaluate, ColumnTimesRowGivesAGrid) {
    const auto r = call("LOOP_BR", {Arg::number(0.1), Arg::number(1), Arg::number(1), column({0.0, 0.05, 0.1}),
                                    row({0.01, 0.02})});
    ASSERT_EQ(r.error, CellError::None) << r.message;
    ASSERT_TRUE(r.is_array);
    ASSERT_EQ(r.rows, 3u);
    ASSERT_EQ(r.cols, 2u);
    EXPECT_EQ(r.values[2 * 2 + 1], loop_field({0.1, 1, 1}, 0.1, 0.02).br);
}

TEST(Evaluate, MismatchedRangesAreAnError) {
    const auto r = call("LOOP_BZ", {Arg::number(0.1), Arg::number(1), Arg::number(1), column({0, 1, 2}), column({0, 1})});
    EXPECT_EQ(r.error, CellError::IllegalArgument);
    EXPECT_NE(r.message.find("does not match"), std::string::npos);
}

TEST(Evaluate, BadElementsBecomeErrorCellsAndTheRestIsComputed) {
    std::vector<Cell> zs = {Cell::of(0.0), Cell::of_text("x"), Cell{}, Cell::of(0.0)};
    const auto r = call("LOOP_BZ", {Arg::number(0.1), Arg::number(1), Arg::number(1), Arg::array(4, 1, zs),
                                    column({0.0, 0.0, 0.0, 0.1})});  // last point is on the wire
    ASSERT_EQ(r.error, CellError::None);
    EXPECT_EQ(r.errors[0], CellError::None);
    EXPECT_EQ(r.errors[1], CellError::IllegalArgument);
    EXPECT_EQ(r.errors[2], CellError::IllegalArgument);
    EXPECT_EQ(r.errors[3], CellError::IllegalArgument);
    EXPECT_GT(r.values[0], 0.0);
}

TEST(Evaluate, ScalarErrorsFailTheWholeCall) {
    EXPECT_EQ(call("LOOP_BZ", {Arg::number(-1), Arg::number(1), Arg::number(1), Arg::number(0), Arg::missing()}).error,
              CellError::IllegalArgument);
    EXPECT_EQ(call("LOOP_BZ", {Arg::number(1), Arg::number(1), Arg::number(1), Arg::number(0), Arg::number(1)}).error,
              CellError::IllegalArgument);  // on the filament
    const auto text = call("LOOP_BZ", {Arg::scalar(Cell::of_text("0.1")), Arg::number(1), Arg::number(1),
                                       Arg::number(0), Arg::missing()});
    EXPECT_EQ(text.error, CellError::IllegalArgument);
    EXPECT_NE(text.message.find("text"), std::string::npos);
}

TEST(Evaluate, RequiredArgumentsMustBeGiven) {
    const auto r = call("LOOP_BR", {Arg::number(1), Arg::number(1), Arg::number(1), Arg::number(0), Arg::missing()});
    EXPECT_EQ(r.error, CellError::IllegalArgument);
    EXPECT_NE(r.message.find("r is required"), std::string::npos);
    EXPECT_EQ(call("LOOP_BZ", {Arg::number(1), Arg::missing(), Arg::number(1), Arg::number(0), Arg::missing()}).error,
              CellError::IllegalArgument);
}

TEST(Evaluate, HugeResultsAreRefusedNotComputed) {
    std::vector<double> many(3000, 0.5);
    const auto r = call("LOOP_BZ", {Arg::number(1), Arg::number(1), Arg::number(1), column(many), row(many)});
    EXPECT_EQ(r.error, CellError::IllegalArgument);  // 9 million cells
}

// An array call that runs past its deadline is ended with an error that says so, whatever its
// work estimate allowed; within the deadline the same call is computed.
TEST(Evaluate, ArrayCallsEndAtTheirDeadline) {
    std::vector<Cell> z;
    for (int i = 0; i < 200000; ++i) z.push_back(Cell::of(1e-6 * i));
    const std::vector<Arg> args = {Arg::number(0.1), Arg::number(10), Arg::number(2), Arg::array(z.size(), 1, z),
                                   Arg::number(0.05)};
    const auto index = static_cast<std::size_t>(function_index("LOOP_BZ"));
    const CallResult late = evaluate_within(index, args, 1e-9);
    EXPECT_EQ(late.error, CellError::IllegalArgument);
    EXPECT_NE(late.message.find("would take more than"), std::string::npos) << late.message;
    const CallResult in_time = evaluate_within(index, args, 60.0);
    EXPECT_EQ(in_time.error, CellError::None);
    EXPECT_EQ(in_time.values.size(), z.size());
}
