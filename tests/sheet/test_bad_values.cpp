// Values at the edges of double precision: never a silent number that has lost its digits.
#include <gtest/gtest.h>

#include <cmath>
#include <limits>

#include "core/catalogue.hpp"
#include "core/evaluate.hpp"

using namespace coilwright::sheet;

namespace {
constexpr double kSubnormal = 1e-310;  // below DBL_MIN = 2.2e-308

CallResult loop(const char* name, double radius, double turns, double current, double z, double r) {
    const int i = function_index(name);
    EXPECT_GE(i, 0);
    const Arg args[] = {Arg::number(radius), Arg::number(turns), Arg::number(current), Arg::number(z), Arg::number(r)};
    return evaluate(static_cast<std::size_t>(i), args);
}
}  // namespace

TEST(BadValues, SubnormalArgumentsAreRefused) {
    // A subnormal radius gave 1.256637061270004e305 (3e-15 off the exact value) before.
    const auto radius = loop("LOOP_BZ", kSubnormal, 10, 2, 0, 0);
    EXPECT_EQ(radius.error, CellError::IllegalArgument);
    EXPECT_NE(radius.message.find("radius is a subnormal"), std::string::npos) << radius.message;
    for (int k = 0; k < 5; ++k) {
        double a[] = {0.1, 10, 2, 0.05, 0.02};
        a[k] = k == 2 ? -kSubnormal : kSubnormal;
        EXPECT_EQ(loop("LOOP_BZ", a[0], a[1], a[2], a[3], a[4]).error, CellError::IllegalArgument) << "argument " << k;
    }
}

TEST(BadValues, ResultsThatUnderflowAreErrors) {
    // Radius 1e308: the centre field mu0 N I / (2a) is about 1.3e-312, a subnormal with a few digits left.
    const auto r = loop("LOOP_BZ", 1e308, 10, 2, 0.05, 0.02);
    EXPECT_EQ(r.error, CellError::IllegalArgument);
    EXPECT_NE(r.message.find("underflows"), std::string::npos) << r.message;
    // Br near the axis is proportional to r: r = 1e-300 m still gives a normal number ...
    const auto near_axis = loop("LOOP_BR", 0.1, 10, 2, 0.05, 1e-300);
    ASSERT_EQ(near_axis.error, CellError::None) << near_axis.message;
    EXPECT_GE(std::fabs(near_axis.values[0]), std::numeric_limits<double>::min());
    // ... and exact zeros (on the axis) stay numbers.
    const auto on_axis = loop("LOOP_BR", 0.1, 10, 2, 0.05, 0);
    ASSERT_EQ(on_axis.error, CellError::None);
    EXPECT_EQ(on_axis.values[0], 0.0);
}

TEST(BadValues, NonFiniteArgumentsAreRefused) {
    const double specials[] = {std::numeric_limits<double>::infinity(), -std::numeric_limits<double>::infinity(),
                               std::numeric_limits<double>::quiet_NaN()};
    for (double bad : specials)
        for (int k = 0; k < 5; ++k) {
            double a[] = {0.1, 10, 2, 0.05, 0.02};
            a[k] = bad;
            EXPECT_EQ(loop("LOOP_B", a[0], a[1], a[2], a[3], a[4]).error, CellError::IllegalArgument)
                << "argument " << k << " = " << bad;
        }
}

TEST(BadValues, ArrayElementsWithSubnormalsAreErrorCellsOnly) {
    const int i = function_index("LOOP_BZ");
    ASSERT_GE(i, 0);
    const Arg z = Arg::array(3, 1, {Cell::of(0.0), Cell::of(kSubnormal), Cell::of(0.01)});
    const Arg args[] = {Arg::number(0.1), Arg::number(1), Arg::number(1), z, Arg::missing()};
    const auto r = evaluate(static_cast<std::size_t>(i), args);
    ASSERT_EQ(r.error, CellError::None) << r.message;
    EXPECT_EQ(r.errors[0], CellError::None);
    EXPECT_EQ(r.errors[1], CellError::IllegalArgument);
    EXPECT_EQ(r.errors[2], CellError::None);
}
