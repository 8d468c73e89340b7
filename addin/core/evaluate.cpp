#include "evaluate.hpp"

#include <algorithm>
#include <chrono>
#include <charconv>
#include <cmath>
#include <exception>
#include <limits>
#include <optional>
#include <string>
#include <vector>

#include "catalogue.hpp"
#include "error_route.hpp"
#include "coilwright/wire.hpp"
#include "fixed_vector.hpp"
#include "registry.hpp"

namespace coilwright::sheet {

namespace {

// Ends an array call that runs past work::kMaxSecondsPerCall although its work estimate let it
// start (elements far costlier than their estimate, a slow or loaded machine): checked every
// few elements, so a cell never keeps LibreOffice much longer than that.
class Deadline {
public:
    explicit Deadline(double seconds)
        : seconds_(seconds),
          end_(std::chrono::steady_clock::now() +
               std::chrono::duration_cast<std::chrono::steady_clock::duration>(std::chrono::duration<double>(seconds))) {}
    // True once the time is up; asks the clock only on every 16th call.
    bool passed() { return (++calls_ & 15u) == 0 && passed_now(); }
    bool passed_now() const { return std::chrono::steady_clock::now() > end_; }
    double seconds() const { return seconds_; }

private:
    double seconds_;
    std::chrono::steady_clock::time_point end_;
    unsigned calls_ = 0;
};

CallResult too_slow(const Deadline& deadline, std::size_t done, std::size_t count) {
    char seconds[32];
    char* end = std::to_chars(seconds, seconds + sizeof seconds, deadline.seconds()).ptr;
    return CallResult::failure(CellError::IllegalArgument,
                               "this call would take more than " + std::string(seconds, static_cast<std::size_t>(end - seconds)) + " s (" +
                                   std::to_string(done) + " of " + std::to_string(count) +
                                   " elements were done by then): split the range or ask for fewer points");
}

struct ElementOutcome {
    double value = 0.0;
    CellError error = CellError::None;
    std::string message;
};

// Nonzero and below 2.2e-308 in magnitude: a number that has lost digits.
bool is_subnormal(double v) { return v != 0.0 && std::fabs(v) < std::numeric_limits<double>::min(); }

// The first control character of a text (C0, DEL or C1, as UTF-8), or -1. Such a text is
// nothing a user means (CHAR(0) and friends come from formulas or pasted binary data): it is
// refused rather than read up to the character or matched around it.
int control_character(const std::string& text) {
    for (std::size_t i = 0; i < text.size(); ++i) {
        const auto byte = static_cast<unsigned char>(text[i]);
        if (byte < 0x20 || byte == 0x7F) return byte;
        if (byte == 0xC2 && i + 1 < text.size()) {
            const auto next = static_cast<unsigned char>(text[i + 1]);
            if (next >= 0x80 && next <= 0x9F) return next;  // U+0080..U+009F
        }
    }
    return -1;
}

// Converts one cell of a numeric argument; returns false with a message when it is not a number.
// Every text argument passes here, so this is the one place that refuses control characters.
bool to_number(const Cell& cell, const ArgSpec& spec, double& out, std::string& message) {
    switch (cell.kind) {
        case CellKind::Number:
            if (spec.kind == ArgKind::Choice) {
                if (choice_from_number(spec, cell.number, out)) return true;
                message = std::string(spec.name) + " must be one of: " + choice_list(spec);
                return false;
            }
            // A subnormal value (below 2.2e-308, reachable only through an expression) carries
            // fewer digits than any result promises; no argument has a sensible value there.
            if (is_subnormal(cell.number)) {
                message = std::string(spec.name) + " is a subnormal number (magnitude below 2.2e-308)";
                return false;
            }
            out = cell.number;
            return true;
        case CellKind::Empty:
            message = std::string(spec.name) + " is blank";
            return false;
        case CellKind::Text:
            if (const int code = control_character(cell.text); code >= 0) {
                message = std::string(spec.name) + " contains a control character (code " + std::to_string(code) +
                          ", e.g. from CHAR()): not a valid text";
                return false;
            }
            if (spec.kind == ArgKind::Gauge) {
                try {
                    out = parse_awg_gauge(cell.text);
                    return true;
                } catch (const std::exception& e) {
                    message = std::string(spec.name) + ": " + e.what();
                    return false;
                }
            }
            if (spec.kind == ArgKind::Choice) {
                if (choice_from_text(spec, cell.text, out)) return true;
                message = std::string(spec.name) + " \"" + cell.text + "\" is not one of: " + choice_list(spec);
                return false;
            }
            message = std::string(spec.name) + " is text where a number is needed";
            return false;
    }
    return false;
}

ElementOutcome run(const ElementFn& fn, const double* numbers) {
    ElementOutcome out;
    CellFailure failure;
    if (!run_guarded([&] { out.value = fn(numbers); }, failure)) {
        out.error = failure.error;
        out.message = std::move(failure.message);
    } else if (!std::isfinite(out.value)) {
        out.error = CellError::IllegalArgument;
        out.message = "the result is not a finite number";
    } else if (is_subnormal(out.value)) {
        // Underflow into the subnormal range loses relative precision: an error, like overflow.
        out.error = CellError::IllegalArgument;
        out.message = "the result underflows (magnitude below 2.2e-308)";
    }
    return out;
}

// The cell of a numeric argument that element (r, c) of the result uses (broadcasting).
const Cell& cell_of_element(const Arg& a, std::size_t r, std::size_t c) {
    return a.form == Arg::Form::Array ? a.at(a.rows == 1 ? 0 : r, a.cols == 1 ? 0 : c) : a.value;
}

// An array formula of a function with a batch: the elements' numbers are gathered in chunks
// and handed to the batch; the elements it leaves (NaN) are evaluated one by one with fn, and
// elements with a bad argument cell are errors, exactly as in the element loop of evaluate().
// Returns false when the deadline passed (result unfinished).
bool evaluate_in_batches(const Prepared& prepared, std::span<const Arg* const> numbers,
                         std::span<const ArgSpec* const> number_specs, CallResult& result, Deadline& deadline,
                         std::size_t& done) {
    constexpr std::size_t kChunk = 1024;
    const std::size_t count = result.rows * result.cols, n_args = numbers.size();
    std::vector<double> storage(n_args * kChunk + kChunk);  // the columns, then the batch's output
    std::vector<unsigned char> good(kChunk);
    const double* columns[kMaxArgs];
    for (std::size_t k = 0; k < n_args; ++k) columns[k] = storage.data() + k * kChunk;
    double* const out = storage.data() + n_args * kChunk;
    std::string message;
    std::size_t r = 0, c = 0;  // of the element at `start`
    for (std::size_t start = 0; start < count; start += kChunk) {
        if (deadline.passed_now()) {  // once per chunk: a batch computes a chunk in microseconds
            done = start;
            return false;
        }
        const std::size_t m = std::min(kChunk, count - start);
        for (std::size_t i = 0; i < m; ++i) {
            bool ok = true;
            for (std::size_t k = 0; k < n_args; ++k) {
                const Cell& cell = cell_of_element(*numbers[k], r, c);
                double v;
                if (cell.kind == CellKind::Number && number_specs[k]->kind == ArgKind::Number &&
                    !is_subnormal(cell.number)) {
                    v = cell.number;  // the usual case, as to_number does it
                } else if (!to_number(cell, *number_specs[k], v, message)) {
                    ok = false;
                    v = std::numeric_limits<double>::quiet_NaN();
                }
                storage[k * kChunk + i] = v;
            }
            good[i] = ok;
            if (++c == result.cols) {
                c = 0;
                ++r;
            }
        }
        const bool handled = prepared.batch(columns, m, out);
        for (std::size_t i = 0; i < m; ++i) {
            const std::size_t at = start + i;
            if (!good[i]) {
                result.errors[at] = CellError::IllegalArgument;
                continue;
            }
            if (handled && std::isfinite(out[i]) && !is_subnormal(out[i])) {
                result.values[at] = out[i];
                continue;
            }
            if (deadline.passed()) {
                done = at;
                return false;
            }
            double element[kMaxArgs];
            for (std::size_t k = 0; k < n_args; ++k) element[k] = columns[k][i];
            const ElementOutcome o = run(prepared.fn, element);
            if (o.error != CellError::None)
                result.errors[at] = o.error;
            else
                result.values[at] = o.value;
        }
    }
    done = count;
    return true;
}

std::string shape_text(std::size_t rows, std::size_t cols) {
    return std::to_string(rows) + "x" + std::to_string(cols);
}

// Runs `work`; an error it throws becomes the whole call's failure (error_route.hpp).
template <class F>
std::optional<CallResult> guarded(F&& work) {
    CellFailure failure;
    if (run_guarded(std::forward<F>(work), failure)) return std::nullopt;
    return CallResult::failure(failure.error, std::move(failure.message));
}

// A function that returns its own shape (Prepared::shaped): numeric arguments are single values.
CallResult evaluate_shaped(const Prepared& prepared, std::span<const Arg* const> numbers,
                           std::span<const ArgSpec* const> number_specs, bool any_array, const char* name) {
    if (any_array)
        return CallResult::failure(CellError::IllegalArgument,
                                   std::string(name) + " takes single values, not ranges, besides its table");
    std::vector<double> values(numbers.size());
    std::string message;
    for (std::size_t k = 0; k < numbers.size(); ++k)
        if (!to_number(cell_of_element(*numbers[k], 0, 0), *number_specs[k], values[k], message))
            return CallResult::failure(CellError::IllegalArgument, message);
    CallResult result;
    if (auto failure = guarded([&] { result = prepared.shaped(values.data()); })) return *failure;
    if (result.error != CellError::None) return result;
    const std::size_t count = result.rows * result.cols;
    if (count == 0 || count > kMaxResultCells || result.values.size() != count || result.errors.size() != count)
        return CallResult::failure(CellError::NoValue, std::string(name) + " produced a malformed result");
    result.is_array = true;
    for (std::size_t i = 0; i < count; ++i)  // no non-finite number reaches a cell
        if (result.errors[i] == CellError::None && (!std::isfinite(result.values[i]) || is_subnormal(result.values[i])))
            result.errors[i] = CellError::IllegalArgument;
    return result;
}

}  // namespace

CallResult evaluate(std::size_t function_index, std::span<const Arg> args) {
    return evaluate_within(function_index, args, work::kMaxSecondsPerCall);
}

CallResult evaluate_within(std::size_t function_index, std::span<const Arg> args, double max_seconds) {
    Deadline deadline(max_seconds);
    const auto specs = function_specs();
    if (function_index >= specs.size()) return CallResult::failure(CellError::NoValue, "unknown function");
    const FunctionSpec& spec = specs[function_index];
    const Implementation& impl = implementations()[function_index];
    if (!impl.prepare) return CallResult::failure(CellError::NoValue, std::string(spec.name) + " is not available");
    if (args.size() != spec.arg_count)
        return CallResult::failure(CellError::IllegalArgument, "wrong number of arguments");

    if (spec.arg_count > kMaxArgs) return CallResult::failure(CellError::NoValue, "too many arguments");

    // Sort the arguments into tables (passed whole) and numbers (broadcast element-wise).
    // Fixed capacity on the stack: a call allocates nothing but its result.
    FixedVector<const Arg*, kMaxArgs> tables;
    FixedVector<const Arg*, kMaxArgs> numbers;
    FixedVector<const ArgSpec*, kMaxArgs> number_specs;
    FixedVector<Arg, kMaxArgs> defaults;
    bool any_array = false;
    std::size_t rows = 1, cols = 1;
    for (std::size_t i = 0; i < spec.arg_count; ++i) {
        const ArgSpec& as = spec.args[i];
        const Arg* arg = &args[i];
        if (arg->form == Arg::Form::Missing) {
            if (!as.optional)
                return CallResult::failure(CellError::IllegalArgument, std::string(as.name) + " is required");
            if (as.kind == ArgKind::Table || as.kind == ArgKind::Raw) {
                tables.push_back(arg);
                continue;
            }
            defaults.push_back(as.kind == ArgKind::Choice ? Arg::scalar(Cell::of_text(as.default_text))
                                                          : Arg::number(as.default_value));
            arg = &defaults.back();
        }
        if (as.kind == ArgKind::Table || as.kind == ArgKind::Raw) {
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
    if (auto failure = guarded([&] { prepared = impl.prepare(std::span<const Arg* const>(tables.data(), tables.size())); }))
        return *failure;
    if (spec.text_result) {
        CallResult text;
        text.is_text = true;
        text.text = std::move(prepared.text);
        return text;
    }
    if (prepared.cost * static_cast<double>(count) > work::kMaxWorkPerCall)
        return CallResult::failure(CellError::IllegalArgument,
                                   "this call asks for too much work for one formula; split the range");

    if (prepared.shaped)
        return evaluate_shaped(prepared, std::span<const Arg* const>(numbers.data(), numbers.size()),
                               std::span<const ArgSpec* const>(number_specs.data(), number_specs.size()), any_array,
                               spec.name);

    CallResult result;
    result.is_array = any_array;
    result.rows = rows;
    result.cols = cols;
    result.values.assign(count, 0.0);
    result.errors.assign(count, CellError::None);

    if (any_array && prepared.batch) {
        std::size_t done = 0;
        if (!evaluate_in_batches(prepared, {numbers.data(), numbers.size()},
                                 {number_specs.data(), number_specs.size()}, result, deadline, done))
            return too_slow(deadline, done, count);
        return result;
    }

    double element[kMaxArgs];
    std::string message;
    for (std::size_t r = 0; r < rows; ++r) {
        for (std::size_t c = 0; c < cols; ++c) {
            const std::size_t at = r * cols + c;
            bool ok = true;
            for (std::size_t k = 0; k < numbers.size() && ok; ++k) {
                const Arg& a = *numbers[k];
                ok = to_number(cell_of_element(a, r, c), *number_specs[k], element[k], message);
            }
            if (!ok) {
                result.errors[at] = CellError::IllegalArgument;
                if (!any_array) return CallResult::failure(CellError::IllegalArgument, message);
                continue;
            }
            if (any_array && deadline.passed()) return too_slow(deadline, at, count);
            ElementOutcome o = run(prepared.fn, element);
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

bool evaluate_plain(std::size_t function_index, std::span<const double> numbers, std::uint32_t omitted,
                    double& out) noexcept {
    // No allocation and no copies: this runs once per formula cell, the case a recalculation of
    // a large sheet is made of. Each check mirrors evaluate(); anything else is left to it.
    const auto specs = function_specs();
    if (function_index >= specs.size()) return false;
    const FunctionSpec& spec = specs[function_index];
    const Implementation& impl = implementations()[function_index];
    if (!impl.plain || spec.text_result || numbers.size() != spec.arg_count || spec.arg_count > kMaxArgs ||
        impl.plain_cost > work::kMaxWorkPerCall)
        return false;
    double element[kMaxArgs];
    for (std::size_t k = 0; k < spec.arg_count; ++k) {
        const ArgSpec& as = spec.args[k];
        if (as.kind != ArgKind::Number) return false;
        if (omitted >> k & 1u) {
            if (!as.optional) return false;
            element[k] = as.default_value;
        } else {
            if (is_subnormal(numbers[k])) return false;
            element[k] = numbers[k];
        }
    }
    try {
        out = impl.plain(element);
    } catch (...) {
        return false;
    }
    return std::isfinite(out) && !is_subnormal(out);
}

}  // namespace coilwright::sheet
