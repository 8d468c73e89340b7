// Array formulas through the batch path give, element by element, what one call per element
// gives: the same values bit for bit and the same error cells.
#include <gtest/gtest.h>

#include <cmath>
#include <cstdint>
#include <cstring>
#include <random>
#include <string>

#include "coilwright/errors.hpp"
#include "coilwright/field.hpp"
#include "core/catalogue.hpp"
#include "core/evaluate.hpp"

using namespace coilwright;
using namespace coilwright::sheet;

namespace {

std::uint64_t bits(double x) {
    std::uint64_t b;
    std::memcpy(&b, &x, sizeof b);
    return b;
}

std::size_t index_of(const char* name) {
    const int i = function_index(name);
    EXPECT_GE(i, 0) << name;
    return static_cast<std::size_t>(i);
}

// Checks every element of an array call against scalar calls with that element's cells.
void expect_same_as_one_by_one(const char* name, const std::vector<Arg>& args) {
    const CallResult all = evaluate(index_of(name), args);
    ASSERT_EQ(all.error, CellError::None) << all.message;
    ASSERT_TRUE(all.is_array);
    for (std::size_t r = 0; r < all.rows; ++r)
        for (std::size_t c = 0; c < all.cols; ++c) {
            Cell five[5];
            for (int k = 0; k < 5; ++k) {
                const Arg& a = args[static_cast<std::size_t>(k)];
                if (a.form == Arg::Form::Missing) continue;
                five[k] = a.form == Arg::Form::Array ? a.at(a.rows == 1 ? 0 : r, a.cols == 1 ? 0 : c) : a.value;
            }
            const bool r_missing = args[4].form == Arg::Form::Missing;
            std::vector<Arg> scalar_args;
            for (int k = 0; k < 5; ++k)
                scalar_args.push_back(k == 4 && r_missing ? Arg::missing() : Arg::scalar(five[k]));
            const CallResult one = evaluate(index_of(name), scalar_args);
            const std::size_t at = r * all.cols + c;
            if (one.error != CellError::None) {
                EXPECT_EQ(all.errors[at], one.error) << name << " element " << r << "," << c;
            } else {
                EXPECT_EQ(all.errors[at], CellError::None) << name << " element " << r << "," << c;
                EXPECT_EQ(bits(all.values[at]), bits(one.values[0])) << name << " element " << r << "," << c;
            }
        }
}

Arg column(const std::vector<Cell>& cells) { return Arg::array(cells.size(), 1, cells); }
Arg row(const std::vector<Cell>& cells) { return Arg::array(1, cells.size(), cells); }

// Points around a loop of radius 0.2 (more than one chunk of the batch), with bad cells,
// points on the wire, negative r and non-finite values among them.
std::vector<Cell> z_cells(std::size_t n, std::uint64_t seed) {
    std::mt19937_64 rng(seed);
    std::uniform_real_distribution<double> u(-0.6, 0.6);
    std::vector<Cell> out;
    for (std::size_t i = 0; i < n; ++i) out.push_back(Cell::of(u(rng)));
    out[3] = Cell::of_text("x");
    out[700] = Cell{};
    out[1500] = Cell::of(0.0);
    out[2000] = Cell::of(HUGE_VAL);
    return out;
}
std::vector<Cell> r_cells(std::size_t n, std::uint64_t seed) {
    std::mt19937_64 rng(seed);
    std::uniform_real_distribution<double> u(0.0, 0.6);
    std::vector<Cell> out;
    for (std::size_t i = 0; i < n; ++i) out.push_back(Cell::of(u(rng)));
    out[1500] = Cell::of(0.2);  // with z = 0: on the wire
    out[1501] = Cell::of(-0.1);
    out[1800] = Cell::of_text("0.1");
    return out;
}

}  // namespace

TEST(EvaluateBatch, ColumnsOfPointsMatchOneCallPerPoint) {
    const std::size_t n = 2500;
    for (const char* name : {"LOOP_BZ", "LOOP_BR", "LOOP_B"})
        expect_same_as_one_by_one(name, {Arg::number(0.2), Arg::number(30), Arg::number(-1.5), column(z_cells(n, 1)),
                                         column(r_cells(n, 2))});
    // r left out (on the axis) where it may be.
    expect_same_as_one_by_one("LOOP_BZ",
                              {Arg::number(0.2), Arg::number(30), Arg::number(2), column(z_cells(n, 3)), Arg::missing()});
}

TEST(EvaluateBatch, GridsAndVaryingLoopsMatchOneCallPerPoint) {
    // z down a column, r along a row: a field map.
    std::vector<Cell> zs = z_cells(2100, 4), rs = r_cells(2100, 5);
    zs.resize(60);
    rs.resize(45);
    rs[7] = Cell::of_text("bad");
    expect_same_as_one_by_one("LOOP_BR", {Arg::number(0.2), Arg::number(1), Arg::number(1), column(zs), row(rs)});
    // A radius that changes from element to element takes the element path.
    std::vector<Cell> radii;
    for (std::size_t i = 0; i < 60; ++i) radii.push_back(Cell::of(0.1 + 0.01 * static_cast<double>(i)));
    radii[5] = Cell::of(-1.0);
    expect_same_as_one_by_one("LOOP_B", {column(radii), Arg::number(10), Arg::number(1), column(zs), row(rs)});
    // A bad loop makes every element an error.
    const CallResult bad =
        evaluate(index_of("LOOP_BZ"), std::vector<Arg>{Arg::number(0.2), Arg::number(-3), Arg::number(1), column(zs),
                                                       Arg::missing()});
    ASSERT_EQ(bad.error, CellError::None);
    for (CellError e : bad.errors) EXPECT_EQ(e, CellError::IllegalArgument);
}

TEST(EvaluateBatch, ValuesAreTheEnginesValues) {
    const CallResult r = evaluate(index_of("LOOP_BZ"), std::vector<Arg>{Arg::number(0.1), Arg::number(10),
                                                                         Arg::number(2), column({Cell::of(0.03)}),
                                                                         column({Cell::of(0.04)})});
    ASSERT_EQ(r.errors[0], CellError::None);
    EXPECT_EQ(bits(r.values[0]), bits(loop_field({0.1, 10, 2}, 0.03, 0.04).bz));
}
