#include "evaluate.hpp"

#include <cmath>
#include <exception>
#include <string>
#include <vector>

#include "catalogue.hpp"
#include "coilwright/errors.hpp"
#include "coilwright/wire.hpp"
#include "registry.hpp"

namespace coilwright::sheet {

namespace {

struct ElementOutcome {
    double value = 0.0;
    CellError error = CellError::None;
    std::string message;
};

// Converts one cell of a numeric argument; returns false with a message when it is not a number.
bool to_number(const Cell& cell, const ArgSpec& spec, double& out, std::string& message) {
    switch (cell.kind) {
        case CellKind::Number:
            out = cell.number;
            return true;
        case CellKind::Empty:
            message = std::string(spec.name) + " is blank";
            return false;
        case CellKind::Text:
            if (spec.kind == ArgKind::Gauge) {
                try {
                    out = parse_awg_gauge(cell.text);
                    return true;
                } catch (const std::exception& e) {
                    message = std::string(spec.name) + ": " + e.what();
                    return false;
                }
            }
            message = std::string(spec.name) + " is text where a number is needed";
            return false;
    }
    return false;
}

ElementOutcome run(const ElementFn& fn, const double* numbers) {
    ElementOutcome out;
    try {
        out.value = fn(numbers);
        if (!std::isfinite(out.value)) {
            out.error = CellError::IllegalArgument;
            out.message = "the result is not a finite number";
        }
    } catch (const ConvergenceError& e) {
        out.error = CellError::NoConvergence;
        out.message = e.what();
    } catch (const std::invalid_argument& e) {  // DomainError, SingularPointError
        out.error = CellError::IllegalArgument;
        out.message = e.what();
    } catch (const std::exception& e) {
        out.error = CellError::NoValue;
        out.message = e.what();
    }
    return out;
}

std::string shape_text(std::size_t rows, std::size_t cols) {
    return std::to_string(rows) + "x" + std::to_string(cols);
}

}  // namespace

CallResult evaluate(std::size_t function_index, std::span<const Arg> args) {
    const auto specs = function_specs();
    if (function_index >= specs.size()) return CallResult::failure(CellError::NoValue, "unknown function");
    const FunctionSpec& spec = specs[function_index];
    const Implementation& impl = implementations()[function_index];
    if (!impl.prepare) return CallResult::failure(CellError::NoValue, std::string(spec.name) + " is not available");
    if (args.size() != spec.arg_count)
        return CallResult::failure(CellError::IllegalArgument, "wrong number of arguments");

    // Sort the arguments into tables (passed whole) and numbers (broadcast element-wise).
    std::vector<const Arg*> tables;
    std::vector<const Arg*> numbers;
    std::vector<const ArgSpec*> number_specs;
    std::vector<Arg> defaults;
    defaults.reserve(spec.arg_count);
    bool any_array = false;
    std::size_t rows = 1, cols = 1;
    for (std::size_t i = 0; i < spec.arg_count; ++i) {
        const ArgSpec& as = spec.args[i];
        const Arg* arg = &args[i];
        if (arg->form == Arg::Form::Missing) {
            if (!as.optional)
                return CallResult::failure(CellError::IllegalArgument, std::string(as.name) + " is required");
            if (as.kind == ArgKind::Table) {
                tables.push_back(arg);
                continue;
            }
            defaults.push_back(Arg::number(as.default_value));
            arg = &defaults.back();
        }
        if (as.kind == ArgKind::Table) {
            tables.push_back(arg);
            continue;
        }
        if (arg->form == Arg::Form::Array) {
            if (arg->rows == 0 || arg->cols == 0)
                return CallResult::failure(CellError::IllegalArgument, std::string(as.name) + " is an empty range");
            any_array = true;
            for (auto [extent, mine] : {std::pair{&rows, arg->rows}, std::pair{&cols, arg->cols}}) {
                if (mine == 1 || mine == *extent) continue;
                if (*extent != 1)
                    return CallResult::failure(
                        CellError::IllegalArgument,
                        std::string(as.name) + " has " + shape_text(arg->rows, arg->cols) +
                            " cells, which does not match the other ranges (" + shape_text(rows, cols) +
                            "); use ranges of one shape, or a single row or column to span a grid");
                *extent = mine;
            }
        }
        numbers.push_back(arg);
        number_specs.push_back(&as);
    }

    const std::size_t count = rows * cols;
    if (count > kMaxResultCells)
        return CallResult::failure(CellError::IllegalArgument,
                                   "the result would have " + std::to_string(count) + " cells; the limit is " +
                                       std::to_string(kMaxResultCells));

    Prepared prepared;
    try {
        prepared = impl.prepare(tables);
    } catch (const ConvergenceError& e) {
        return CallResult::failure(CellError::NoConvergence, e.what());
    } catch (const std::invalid_argument& e) {
        return CallResult::failure(CellError::IllegalArgument, e.what());
    } catch (const std::exception& e) {
        return CallResult::failure(CellError::NoValue, e.what());
    }
    if (spec.text_result) {
        CallResult text;
        text.is_text = true;
        text.text = std::move(prepared.text);
        return text;
    }
    if (prepared.cost * static_cast<double>(count) > kMaxWorkPerCall)
        return CallResult::failure(CellError::IllegalArgument,
                                   "this call asks for too much work for one formula; split the range");

    CallResult result;
    result.is_array = any_array;
    result.rows = rows;
    result.cols = cols;
    result.values.assign(count, 0.0);
    result.errors.assign(count, CellError::None);

    std::vector<double> element(numbers.size());
    std::string message;
    for (std::size_t r = 0; r < rows; ++r) {
        for (std::size_t c = 0; c < cols; ++c) {
            const std::size_t at = r * cols + c;
            bool ok = true;
            for (std::size_t k = 0; k < numbers.size() && ok; ++k) {
                const Arg& a = *numbers[k];
                const Cell& cell = a.form == Arg::Form::Array
                                       ? a.at(a.rows == 1 ? 0 : r, a.cols == 1 ? 0 : c)
                                       : a.cells[0];
                ok = to_number(cell, *number_specs[k], element[k], message);
            }
            if (!ok) {
                result.errors[at] = CellError::IllegalArgument;
                if (!any_array) return CallResult::failure(CellError::IllegalArgument, message);
                continue;
            }
            ElementOutcome o = run(prepared.fn, element.data());
            if (o.error != CellError::None) {
                if (!any_array) return CallResult::failure(o.error, o.message);
                result.errors[at] = o.error;
                continue;
            }
            result.values[at] = o.value;
        }
    }
    return result;
}

}  // namespace coilwright::sheet
