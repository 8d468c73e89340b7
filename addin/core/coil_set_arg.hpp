// Reading a coil-set table (coils anywhere in space) from a sheet range (UNO-free, fuzzable).
#pragma once

#include "cells.hpp"
#include "coilwright/sets.hpp"

namespace coilwright::sheet {

// Columns: shape ("circle" or "rect"), centre x, y, z, axis x, y, z, radius or width, height,
// roll (degrees), turns, current, and optionally circuit, winding depth, winding width (12 to
// 15 columns). Rows that are entirely blank are skipped; a blank optional cell means "none"
// (height and roll of a circle, circuit, thickness). Anything else that is wrong is a
// DomainError naming the row (counted from 1 at the top of the range).
CoilSet read_coil_set(const Arg& table);

// The rows of a coil-set table as it is written in a sheet (for functions returning a set).
CallResult coil_set_result(const std::vector<SetCoil>& coils);

}  // namespace coilwright::sheet
