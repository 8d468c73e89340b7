// One spreadsheet call: check the arguments against the catalogue, broadcast ranges,
// evaluate every element and map engine errors to error cells. No UNO here.
#pragma once

#include <cstddef>
#include <cstdint>
#include <span>

#include "cells.hpp"

namespace coilwright::sheet {

// Upper bounds that keep a single cell from hanging LibreOffice.
inline constexpr std::size_t kMaxResultCells = 4'000'000;
// Most arguments a function may have (a test checks the catalogue against it).
inline constexpr std::size_t kMaxArgs = 16;

CallResult evaluate(std::size_t function_index, std::span<const Arg> args);

// The same with an array call ended (an error cell) once it runs longer than max_seconds;
// evaluate() allows work::kMaxSecondsPerCall.
CallResult evaluate_within(std::size_t function_index, std::span<const Arg> args, double max_seconds);

// The common cell of a function of numbers: every argument a single number or omitted (bit k
// of `omitted` set: argument k left out). Returns true and the result in `out` when the call
// succeeds with one finite number; returns false when it cannot decide (a table, a choice or a
// range is involved, or anything fails), and evaluate() must then handle the call in full, with
// its messages. When it returns true, `out` is what evaluate() gives, bit for bit (tested).
bool evaluate_plain(std::size_t function_index, std::span<const double> numbers, std::uint32_t omitted,
                    double& out) noexcept;

}  // namespace coilwright::sheet
