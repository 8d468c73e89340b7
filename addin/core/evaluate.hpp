// One spreadsheet call: check the arguments against the catalogue, broadcast ranges,
// evaluate every element and map engine errors to error cells. No UNO here.
#pragma once

#include <cstddef>
#include <span>

#include "cells.hpp"

namespace coilwright::sheet {

// Upper bounds that keep a single cell from hanging LibreOffice.
inline constexpr std::size_t kMaxResultCells = 4'000'000;
inline constexpr double kMaxWorkPerCall = 2.0e8;  // in loop-field evaluations (a few seconds)
// Most arguments a function may have (a test checks the catalogue against it).
inline constexpr std::size_t kMaxArgs = 16;

CallResult evaluate(std::size_t function_index, std::span<const Arg> args);

}  // namespace coilwright::sheet
