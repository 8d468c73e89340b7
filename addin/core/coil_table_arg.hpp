// Reading a coil table from a sheet range (UNO-free, fuzzable).
#pragma once

#include "cells.hpp"
#include "coilwright/coil_table.hpp"

namespace coilwright::sheet {

// Six columns: inner radius, outer radius, length, centre z, turns, current. Rows that are
// entirely blank are skipped; anything else that is not six numbers is a DomainError naming
// the row (counted from 1 at the top of the range).
CoilTable read_coil_table(const Arg& table);

}  // namespace coilwright::sheet
