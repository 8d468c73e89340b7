// What each catalogue function computes: the bridge from spreadsheet arguments to the engine.
#pragma once

#include <functional>
#include <span>
#include <string>
#include <vector>

#include "cells.hpp"

namespace coilwright::sheet {

// Evaluates one element from the numeric arguments (table arguments left out), in catalogue
// order, after broadcasting. Throws the engine's errors for bad values.
using ElementFn = std::function<double(const double* numbers)>;

struct Prepared {
    ElementFn fn;
    double cost = 1.0;  // work per element in units of one loop-field evaluation
    std::string text;   // the result of a function that returns text (no ElementFn then)
};

// Builds the element function once per call from the table arguments (may throw).
using PrepareFn = std::function<Prepared(std::span<const Arg* const> tables)>;

struct Implementation {
    const char* name;
    PrepareFn prepare;
};

// A function whose arguments are all numbers.
Implementation numeric(const char* name, ElementFn fn, double cost = 1.0);

// A function returning one text value from its table arguments (returns = "text").
using TextFn = std::function<std::string(std::span<const Arg* const> tables)>;
Implementation text_result(const char* name, TextFn fn);

// Every implementation, ordered like function_specs(); an entry whose prepare is empty has
// no implementation (a unit test makes sure there is none).
const std::vector<Implementation>& implementations();

// Everything the functions/*.cpp files contribute, in no particular order.
std::vector<Implementation> contributed_implementations();

}  // namespace coilwright::sheet
