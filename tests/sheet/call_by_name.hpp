// Test helpers: call a catalogue function by name through the UNO-free call layer.
#pragma once

#include <gtest/gtest.h>

#include <vector>

#include "core/catalogue.hpp"
#include "core/evaluate.hpp"

namespace coilwright::sheet::helpers {

inline CallResult call(const char* name, std::vector<Arg> args) {
    const int i = function_index(name);
    EXPECT_GE(i, 0) << name;
    return evaluate(static_cast<std::size_t>(i), args);
}

inline Arg column(const std::vector<double>& v) {
    std::vector<Cell> cells;
    for (double x : v) cells.push_back(Cell::of(x));
    return Arg::array(v.size(), 1, cells);
}

inline Arg row(const std::vector<double>& v) {
    std::vector<Cell> cells;
    for (double x : v) cells.push_back(Cell::of(x));
    return Arg::array(1, v.size(), cells);
}

}  // namespace coilwright::sheet::helpers
