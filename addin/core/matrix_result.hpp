// A whole result of its own shape (an inductance matrix, a column of forces) from an engine
// matrix whose entries may each carry a problem: those entries become their own error cells.
#pragma once

#include "cells.hpp"
#include "coilwright/inductance.hpp"

namespace coilwright::sheet {

CallResult matrix_call_result(const MatrixWithProblems& m);

}  // namespace coilwright::sheet
