// What each catalogue function computes: the bridge from spreadsheet arguments to the engine.
//
// Every function of the catalogue has a tag fn::NAME (generated: function_args.hpp) with its
// index, its name and Args, the struct of its arguments by name. Its family's file in
// addin/functions/ defines implement<fn::NAME>(); the generated binding table lists them in
// catalogue order, so a function without an implementation does not link and an
// implementation of a name the catalogue lacks does not compile.
#pragma once

#include <cstddef>
#include <functional>
#include <span>
#include <string>
#include <vector>

#include "cells.hpp"
#include "function_args.hpp"
#include "work_costs.hpp"

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
    double cost = work::kLoopField;  // work per element in loop-field evaluations
    BatchFn batch;                   // when set, array formulas go through it first
    ShapedFn shaped;                 // when set, used instead of fn: no broadcasting, one result of its own shape
    std::string text;                // the result of a function that returns text (no ElementFn then)
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

// The implementation of catalogue function Fn; defined once per function in addin/functions/.
template <class Fn>
Implementation implement();
using ImplementFn = Implementation (*)();

// A function whose arguments are all numbers: f(const Fn::Args&) gives one element; `batch`
// (optional) computes arrays faster.
template <class Fn, class F>
Implementation numeric(F f, double cost = work::kLoopField, BatchFn batch = {}) {
    static_assert(Fn::whole_count == 0, "numeric() is for functions whose arguments are all numbers");
    ElementFn fn = [f](const double* a) { return f(Fn::Args::from(a)); };
    ElementFn plain = fn;
    return {Fn::name,
            [fn = std::move(fn), cost, batch = std::move(batch)](std::span<const Arg* const>) {
                return Prepared{fn, cost, batch, {}, {}};
            },
            std::move(plain), cost};
}

// A function returning one text value from its table arguments (returns = "text").
template <class Fn>
Implementation text_result(std::function<std::string(std::span<const Arg* const> tables)> f) {
    return {Fn::name, [f = std::move(f)](std::span<const Arg* const> tables) {
                Prepared p;
                p.cost = 0.0;
                p.text = f(tables);
                return p;
            }};
}

// A function that prepares its own call (a result of its own shape, a table read once).
template <class Fn>
Implementation prepared(PrepareFn prepare) {
    return {Fn::name, std::move(prepare)};
}

// Every implementation, ordered like function_specs() (the generated binding table).
const std::vector<Implementation>& implementations();

}  // namespace coilwright::sheet
