// libFuzzer harness for the UNO-free call layer: arbitrary arguments (omitted, single values,
// ranges of any small shape with numbers, text and blanks) for every catalogue function, and
// arbitrary ranges read as coil tables. evaluate() must never throw, crash or hang, and what it
// returns must be consistent: finite numbers (zero or normal) wherever no error cell is set,
// a message with every whole-call failure, and only the error codes Calc is given.
#include <cmath>
#include <cstdio>
#include <cstdint>
#include <cstdlib>
#include <cstring>
#include <limits>
#include <vector>

#include "coilwright/errors.hpp"
#include "core/catalogue.hpp"
#include "core/coil_table_arg.hpp"
#include "core/evaluate.hpp"
#include "fuzz_input.hpp"

using namespace coilwright::sheet;
using coilwright::fuzz::FuzzInput;

namespace {

[[noreturn]] void finding(const char* what, const FunctionSpec* spec) {
    std::fprintf(stderr, "call layer: %s (%s)\n", what, spec ? spec->name : "coil table");
    std::abort();
}

Cell make_cell(FuzzInput& in) {
    switch (in.below(8)) {
        case 0: return Cell{};
        case 1: {
            static const char* const kTexts[] = {"1", "0.1", "abc", "1/0", "4/0", "00", "12", " 3 ", "", "-1", "1e3"};
            return in.byte() & 1 ? Cell::of_text(in.text()) : Cell::of_text(kTexts[in.below(std::size(kTexts))]);
        }
        default: return Cell::of(in.number());
    }
}

Arg make_arg(FuzzInput& in) {
    switch (in.below(8)) {
        case 0: return Arg::missing();
        case 1:
        case 2: {
            const std::size_t rows = in.below(9), cols = in.below(9);  // 0 rows or columns included
            std::vector<Cell> cells(rows * cols);
            for (auto& c : cells) c = make_cell(in);
            return Arg::array(rows, cols, std::move(cells));
        }
        default: return Arg::scalar(make_cell(in));
    }
}

bool allowed(CellError e) {
    return e == CellError::IllegalArgument || e == CellError::NoConvergence || e == CellError::NoValue;
}

bool presentable(double v) {
    return std::isfinite(v) && (v == 0.0 || std::fabs(v) >= std::numeric_limits<double>::min());
}

void check(const CallResult& r, const FunctionSpec* spec) {
    if (r.error != CellError::None) {
        if (!allowed(r.error)) finding("unknown whole-call error code", spec);
        if (r.message.empty()) finding("a failure without a message", spec);
        return;
    }
    if (r.is_text) {  // a text result (STACK_CHECK) carries no numbers
        if (r.text.empty()) finding("an empty text result", spec);
        return;
    }
    if (r.values.size() != r.rows * r.cols || r.errors.size() != r.values.size())
        finding("result size does not match its shape", spec);
    if (!r.is_array && (r.rows != 1 || r.cols != 1 || r.errors[0] != CellError::None))
        finding("a scalar result that is not one valid value", spec);
    for (std::size_t i = 0; i < r.values.size(); ++i) {
        if (r.errors[i] == CellError::None ? !presentable(r.values[i]) : !allowed(r.errors[i]))
            finding("a non-finite or subnormal value, or an unknown error code, in a result", spec);
    }
}

// The shortcut for cells of plain numbers: where it answers, evaluate() gave that very number.
void check_plain(std::size_t function, const std::vector<Arg>& args, const CallResult& full, const FunctionSpec* spec) {
    if (args.size() > kMaxArgs) return;
    double numbers[kMaxArgs] = {};
    std::uint32_t omitted = 0;
    for (std::size_t k = 0; k < args.size(); ++k) {
        if (args[k].form == Arg::Form::Missing) {
            omitted |= std::uint32_t{1} << k;
        } else if (args[k].form == Arg::Form::Scalar && args[k].value.kind == CellKind::Number) {
            numbers[k] = args[k].value.number;
        } else {
            return;  // not a plain call
        }
    }
    double out = 0.0;
    if (!evaluate_plain(function, {numbers, args.size()}, omitted, out)) return;
    if (full.error != CellError::None || full.is_array || full.is_text || full.values.size() != 1 ||
        std::memcmp(&out, &full.values[0], sizeof out) != 0)
        finding("the plain-number shortcut disagrees with the full call", spec);
}

}  // namespace

extern "C" int LLVMFuzzerTestOneInput(const std::uint8_t* data, std::size_t size) {
    FuzzInput in(data, size);
    const auto specs = function_specs();
    const std::size_t pick = in.below(specs.size() + 1);
    if (pick == specs.size()) {  // the coil-table reader on its own
        const Arg table = make_arg(in);
        try {
            (void)read_coil_table(table);
        } catch (const coilwright::DomainError&) {
        }
        return 0;
    }
    const FunctionSpec& spec = specs[pick];
    // Mostly the right number of arguments, sometimes one too few or too many.
    std::size_t count = spec.arg_count;
    if (in.below(16) == 0) count = in.byte() & 1 ? count + 1 : (count ? count - 1 : 0);
    std::vector<Arg> args;
    for (std::size_t i = 0; i < count; ++i) args.push_back(make_arg(in));
    const CallResult full = evaluate(pick, args);
    check(full, &spec);
    check_plain(pick, args, full, &spec);
    return 0;
}
