// CALL_CHECK: why a call of a catalogue function fails, in words (UNO-free, fuzzable).
#pragma once

#include <span>
#include <string>

#include "cells.hpp"

namespace coilwright::sheet {

// args[0]: the function's name as text; args[1..]: its arguments as the failing cell gave them.
// Returns "OK: <result>" or the cell error and its reason ("Err:502: radius must be ..."); for
// an array call, the first element that fails and how many do.
std::string explain_call(std::span<const Arg* const> args);

}  // namespace coilwright::sheet
