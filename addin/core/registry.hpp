// What each catalogue function computes: the bridge from spreadsheet arguments to the engine.
#pragma once

#include <cstddef>
#include <functional>
#include <span>
#include <string>
#include <vector>

#include "cells.hpp"

namespace coilwright::sheet {

// Evaluates one element from the numeric arguments (table arguments left out), in catalogue
// order, after broadcasting. Throws the engine's errors for bad values.
using ElementFn = std::function<double(const double* numbers)>;

// Optionally evaluates many elements at once (an array formula): columns[k][i] is the k-th
// numeric argument of element i, as fn would receive it. Returns false to leave the elements
// to fn. Otherwise writes out[i] for every i < n: a finite value equal to what fn returns, bit
// for bit, or NaN where it has no answer; those elements are then evaluated with fn, one by
// one, which gives each its value or its error. Allocation-free per element, vectorisable.
using BatchFn = std::function<bool(const double* const* columns, std::size_t n, double* out)>;
// Computes a whole result whose shape the function decides (e.g. an n x n matrix from a
// table), from the numeric arguments, which must then be single values. Per-cell problems go
// in CallResult::errors; throwing fails the whole call.
using ShapedFn = std::function<CallResult(const double* numbers)>;

struct Prepared {
    ElementFn fn;
    double cost = 1.0;  // work per element in units of one loop-field evaluation
    BatchFn batch;      // when set, array formulas go through it first
    ShapedFn shaped;    // when set, used instead of fn: no broadcasting, one result of its own shape
    std::string text;   // the result of a function that returns text (no ElementFn then)
};

// Builds the element function once per call from the table arguments (may throw).
using PrepareFn = std::function<Prepared(std::span<const Arg* const> tables)>;

struct Implementation {
    const char* name;
    PrepareFn prepare;
    // For a function of numbers only (numeric()): its element function and cost, so that a
    // cell of plain numbers can skip preparing (evaluate_plain). Empty for the others.
    ElementFn plain = {};
    double plain_cost = 0.0;
};

// A function whose arguments are all numbers; `batch` (optional) computes arrays faster.
Implementation numeric(const char* name, ElementFn fn, double cost = 1.0, BatchFn batch = {});

// A function returning one text value from its table arguments (returns = "text").
using TextFn = std::function<std::string(std::span<const Arg* const> tables)>;
Implementation text_result(const char* name, TextFn fn);

// Every implementation, ordered like function_specs(); an entry whose prepare is empty has
// no implementation (a unit test makes sure there is none).
const std::vector<Implementation>& implementations();

// Everything the functions/*.cpp files contribute, in no particular order.
std::vector<Implementation> contributed_implementations();

}  // namespace coilwright::sheet
