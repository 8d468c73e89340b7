// The one route from the engine's errors to cell errors. Every path of the call layer (an
// element, a whole call, a shaped result, one entry of a matrix) maps through these, so an
// engine error shows as the same cell error whichever path met it.
#pragma once

#include <string>

#include "cells.hpp"
#include "coilwright/errors.hpp"

namespace coilwright::sheet {

struct CellFailure {
    CellError error;
    std::string message;
};

// The failure for the exception being handled; call only inside a catch block.
// ConvergenceError: Err:523; DomainError (and SingularPointError): Err:502; anything else
// (out of memory, a fault of the call layer itself): #VALUE!.
CellFailure current_failure();

// The cell error of an engine error kept as data (None for no problem).
CellError cell_error_of(Problem::Kind kind);

// Runs `work`; returns true, or false with `failure` set from what it threw.
template <class F>
bool run_guarded(F&& work, CellFailure& failure) {
    try {
        work();
        return true;
    } catch (...) {
        failure = current_failure();
        return false;
    }
}

}  // namespace coilwright::sheet
