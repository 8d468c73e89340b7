// SOLENOID_*, COIL_* and STACK_* through the UNO-free call layer: arguments, tables read once,
// error cells, the work bound, and STACK_CHECK's text result.
#include <gtest/gtest.h>

#include <cmath>
#include <string>
#include <vector>

#include "coilwright/field.hpp"
#include "core/catalogue.hpp"
#include "core/evaluate.hpp"
#include "call_by_name.hpp"

using namespace coilwright;
using namespace coilwright::sheet;

namespace {
using helpers::call;
Arg column(std::vector<double> v) {
    std::vector<Cell> cells;
    for (double x : v) cells.push_back(Cell::of(x));
    return Arg::array(v.size(), 1, cells);
}
// A coil table range from rows of cells (Empty cells for blanks).
Arg table(std::vector<std::vector<Cell>> rows) {
    std::vector<Cell> cells;
    for (auto& row : rows)
        for (auto& c : row) cells.push_back(c);
    return Arg::array(rows.size(), rows.empty() ? 0 : rows[0].size(), cells);
}
std::vector<Cell> numbers(std::initializer_list<double> v) {
    std::vector<Cell> out;
    for (double x : v) out.push_back(Cell::of(x));
    return out;
}
const std::vector<Cell> kBlank(6);
}  // namespace

TEST(FieldFunctions, SolenoidAndCoilCallTheEngine) {
    const auto s = call("SOLENOID_BZ", {Arg::number(0.05), Arg::number(0.2), Arg::number(500), Arg::number(2),
                                        Arg::number(0.03), Arg::missing()});
    ASSERT_EQ(s.error, CellError::None) << s.message;
    EXPECT_EQ(s.values[0], solenoid_field({0.05, 0.2, 500, 2}, 0.03, 0.0).bz);
    const auto c = call("COIL_B", {Arg::number(0.05), Arg::number(0.08), Arg::number(0.1), Arg::number(800),
                                   Arg::number(3), Arg::number(0.01), Arg::number(0.06)});
    ASSERT_EQ(c.error, CellError::None) << c.message;
    EXPECT_EQ(c.values[0], thick_coil_field({0.05, 0.08, 0.1, 800, 3}, 0.01, 0.06).magnitude());
    // On the sheet: an error cell; inside a thick winding: a number.
    EXPECT_EQ(call("SOLENOID_BR", {Arg::number(0.05), Arg::number(0.2), Arg::number(500), Arg::number(2),
                                   Arg::number(0.0), Arg::number(0.05)}).error,
              CellError::IllegalArgument);
    EXPECT_EQ(call("COIL_BR", {Arg::number(0.05), Arg::number(0.08), Arg::number(0.1), Arg::number(800),
                               Arg::number(3), Arg::number(0.0), Arg::number(0.07)}).error,
              CellError::None);
}

TEST(FieldFunctions, StackReadsTheTableOnceAndBroadcastsThePoints) {
    const Arg coils = table({numbers({0.1, 0.1, 0, -0.05, 10, 1}), kBlank, numbers({0.05, 0.06, 0.02, 0.05, 100, 2})});
    const auto r = call("STACK_BZ", {coils, column({0.0, 0.02, 0.3}), Arg::missing()});
    ASSERT_EQ(r.error, CellError::None) << r.message;
    ASSERT_TRUE(r.is_array);
    const CoilTable expected({{0.1, 0.1, 0, -0.05, 10, 1}, {0.05, 0.06, 0.02, 0.05, 100, 2}});
    for (std::size_t i = 0; i < 3; ++i) EXPECT_EQ(r.values[i], table_field(expected, std::vector{0.0, 0.02, 0.3}[i], 0.0).bz);
    // A point on a row's sheet is an error cell, the others are computed.
    const Arg sheet = table({numbers({0.1, 0.1, 0.2, 0.0, 10, 1})});
    const auto e = call("STACK_BR", {sheet, column({0.0, 0.5}), Arg::number(0.1)});
    ASSERT_EQ(e.error, CellError::None);
    EXPECT_EQ(e.errors[0], CellError::IllegalArgument);
    EXPECT_EQ(e.errors[1], CellError::None);
}

TEST(FieldFunctions, BadTablesFailTheWholeCallWithTheRowNumber) {
    const Arg bad = table({numbers({0.1, 0.1, 0, 0, 10, 1}), numbers({0.2, 0.1, 0, 0, 10, 1})});
    const auto r = call("STACK_B", {bad, Arg::number(0), Arg::missing()});
    EXPECT_EQ(r.error, CellError::IllegalArgument);
    EXPECT_NE(r.message.find("row 2"), std::string::npos) << r.message;
    const Arg five = Arg::array(1, 5, numbers({0.1, 0.1, 0, 0, 10}));
    EXPECT_EQ(call("STACK_BZ", {five, Arg::number(0), Arg::missing()}).error, CellError::IllegalArgument);
    EXPECT_EQ(call("STACK_BZ", {Arg::missing(), Arg::number(0), Arg::missing()}).error, CellError::IllegalArgument);
}

TEST(FieldFunctions, StackCheckSaysOkOrNamesTheFirstBadRow) {
    const Arg good = table({numbers({0.1, 0.1, 0, -0.05, 10, 1}), numbers({0.1, 0.1, 0, 0.05, 10, 1}),
                            numbers({0.05, 0.06, 0.02, 0, 100, 2})});
    const auto ok = call("STACK_CHECK", {good});
    ASSERT_EQ(ok.error, CellError::None) << ok.message;
    ASSERT_TRUE(ok.is_text);
    EXPECT_EQ(ok.text, "OK: 3 coils (2 loops, 1 thick coil)");
    const auto one = call("STACK_CHECK", {table({numbers({0.1, 0.1, 0.3, 0, 10, 1})})});
    EXPECT_EQ(one.text, "OK: 1 coil (1 thin solenoid)");

    const Arg bad = table({numbers({0.1, 0.1, 0, 0, 10, 1}), kBlank, numbers({0.2, 0.1, 0, 0, 10, 1})});
    EXPECT_EQ(call("STACK_CHECK", {bad}).text, "row 3: outer radius must be >= inner radius");
    std::vector<Cell> text_row = numbers({0.1, 0.1, 0, 0, 10, 1});
    text_row[4] = Cell::of_text("ten");
    EXPECT_EQ(call("STACK_CHECK", {table({text_row})}).text, "row 1: turns is text, not a number");
    EXPECT_EQ(call("STACK_CHECK", {table({kBlank})}).text, "the coil table has no rows");
    EXPECT_NE(call("STACK_CHECK", {Arg::array(1, 4, numbers({1, 1, 0, 0}))}).text.find("6 columns"), std::string::npos);
    // A single value is no table: an error cell, like a missing argument.
    EXPECT_EQ(call("STACK_CHECK", {Arg::scalar(Cell::of_text("A1:F3"))}).error, CellError::IllegalArgument);
    EXPECT_EQ(call("STACK_CHECK", {Arg::number(3)}).error, CellError::IllegalArgument);
    EXPECT_EQ(call("STACK_CHECK", {Arg::missing()}).error, CellError::IllegalArgument);
}

TEST(FieldFunctions, WorkOfOneCallIsBounded) {
    // 400 thick coils at 10,000 points is far beyond what one formula may ask.
    std::vector<std::vector<Cell>> rows(400, numbers({0.05, 0.06, 0.02, 0, 100, 2}));
    std::vector<double> zs(10000, 0.5);
    const auto r = call("STACK_BZ", {table(rows), column(zs), Arg::missing()});
    EXPECT_EQ(r.error, CellError::IllegalArgument);
    EXPECT_NE(r.message.find("too much work"), std::string::npos);
}
