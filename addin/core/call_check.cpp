#include "call_check.hpp"

#include <algorithm>
#include <cctype>
#include <charconv>
#include <string_view>
#include <vector>

#include "catalogue.hpp"
#include "evaluate.hpp"

namespace coilwright::sheet {

namespace {

constexpr std::string_view kSavedPrefix = "ORG.COILWRIGHT.FUNCTIONS.";
constexpr std::string_view kArrayTwinSuffix = "_ARRAY";

std::string upper_trimmed(std::string_view text) {
    while (!text.empty() && std::isspace(static_cast<unsigned char>(text.front()))) text.remove_prefix(1);
    while (!text.empty() && std::isspace(static_cast<unsigned char>(text.back()))) text.remove_suffix(1);
    std::string out(text);
    for (char& c : out) c = static_cast<char>(std::toupper(static_cast<unsigned char>(c)));
    return out;
}

// The catalogue index of a name as a user may write it: any case, the saved form's prefix, or
// an array twin's name. -1 for none.
int index_of(std::string name) {
    if (name.starts_with(kSavedPrefix)) name.erase(0, kSavedPrefix.size());
    int index = function_index(name);
    if (index < 0 && name.ends_with(kArrayTwinSuffix))
        index = function_index(std::string_view(name).substr(0, name.size() - kArrayTwinSuffix.size()));
    return index;
}

std::string error_text(CellError error) {
    switch (error) {
        case CellError::None: return "OK";
        case CellError::IllegalArgument: return "Err:502";
        case CellError::NoConvergence: return "Err:523";
        case CellError::NoValue: return "#VALUE!";
    }
    return "error";
}

std::string number_text(double v) {
    char buffer[40];
    const auto end = std::to_chars(buffer, buffer + sizeof buffer, v, std::chars_format::general, 15).ptr;
    return std::string(buffer, end);
}

// The arguments of element (r, c) of an array call: each range replaced by the cell that
// element uses (a row or a column spans the other direction).
std::vector<Arg> element_call(const std::vector<Arg>& call, const FunctionSpec& spec, std::size_t r, std::size_t c) {
    std::vector<Arg> element = call;
    for (std::size_t k = 0; k < spec.arg_count; ++k) {
        const Arg& a = call[k];
        const bool whole = spec.args[k].kind == ArgKind::Table || spec.args[k].kind == ArgKind::Raw;
        if (whole || a.form != Arg::Form::Array) continue;
        element[k] = Arg::scalar(a.at(a.rows == 1 ? 0 : r, a.cols == 1 ? 0 : c));
    }
    return element;
}

std::string explain_array(const CallResult& result, const std::vector<Arg>& call, std::size_t index) {
    const std::size_t count = result.rows * result.cols;
    const auto failing = static_cast<std::size_t>(
        std::count_if(result.errors.begin(), result.errors.end(), [](CellError e) { return e != CellError::None; }));
    const std::string shape = std::to_string(result.rows) + " x " + std::to_string(result.cols);
    if (failing == 0) return "OK: " + shape + " values";
    const auto first = static_cast<std::size_t>(
        std::find_if(result.errors.begin(), result.errors.end(), [](CellError e) { return e != CellError::None; }) -
        result.errors.begin());
    const std::size_t r = first / result.cols, c = first % result.cols;
    const FunctionSpec& spec = function_specs()[index];
    const CallResult one = evaluate(index, element_call(call, spec, r, c));
    // A shaped result (a matrix) cannot be taken apart element by element: its own entry speaks.
    const std::string reason = one.error != CellError::None ? one.message : "this entry of the result cannot be computed";
    return error_text(result.errors[first]) + ": element (row " + std::to_string(r + 1) + ", column " +
           std::to_string(c + 1) + ") of " + shape + ": " + reason + " (" + std::to_string(failing) + " of " +
           std::to_string(count) + (failing == 1 ? " element fails)" : " elements fail)");
}

}  // namespace

std::string explain_call(std::span<const Arg* const> args) {
    const Arg& name_arg = *args[0];
    if (name_arg.form != Arg::Form::Scalar || name_arg.value.kind != CellKind::Text)
        return "function must be the name of a Coilwright function as text, e.g. \"LOOP_BZ\"";
    const std::string name = upper_trimmed(name_arg.value.text);
    const int found = index_of(name);
    if (found < 0) return "no Coilwright function is named \"" + name + "\"";
    const auto index = static_cast<std::size_t>(found);
    const FunctionSpec& spec = function_specs()[index];
    if (std::string_view(spec.name) == "CALL_CHECK") return "CALL_CHECK explains the calls of the other functions";

    std::size_t given = 0;  // up to the last argument given
    for (std::size_t k = 1; k < args.size(); ++k)
        if (args[k]->form != Arg::Form::Missing) given = k;
    if (given > spec.arg_count)
        return std::string(spec.name) + " takes at most " + std::to_string(spec.arg_count) +
               (spec.arg_count == 1 ? " argument; " : " arguments; ") + std::to_string(given) + " were given";
    std::vector<Arg> call(spec.arg_count);
    for (std::size_t k = 0; k < spec.arg_count && k + 1 < args.size(); ++k) call[k] = *args[k + 1];

    const CallResult result = evaluate(index, call);
    if (result.error != CellError::None) return error_text(result.error) + ": " + result.message;
    if (result.is_text) return "OK: " + result.text;
    if (!result.is_array) return "OK: " + number_text(result.values.at(0));
    return explain_array(result, call, index);
}

}  // namespace coilwright::sheet
