// The argument specifications of every function, generated from idl/functions/*.toml.
// Indexed like the methods of the UNO interface.
#pragma once

#include <cstddef>
#include <span>
#include <string>
#include <string_view>

namespace coilwright::sheet {

// Table and Raw arguments reach the implementation whole (a coil table; any value or range);
// the others are numbers, broadcast element by element.
enum class ArgKind { Number, Gauge, Choice, Table, Raw };

// One accepted text of a "choice" argument (lower case) and the number it converts to.
struct Choice {
    const char* text;
    double value;
    bool primary;  // false for an alias
};

struct ArgSpec {
    const char* name;
    ArgKind kind;
    bool optional;
    double default_value;
    // Choice arguments only: the accepted texts, whether a number equal to one of their
    // values is accepted too, and the default as text.
    const Choice* choices = nullptr;
    std::size_t choice_count = 0;
    bool accepts_numbers = false;
    const char* default_text = nullptr;
    // Table arguments only: the widths a range may have (a coil table 6, a coil set 12 to 15).
    std::size_t min_columns = 0, max_columns = 0;
};

// A choice argument's value for a text (trimmed, case-insensitive) or a number; false when it
// names none of the choices.
bool choice_from_text(const ArgSpec& spec, std::string_view text, double& value);
bool choice_from_number(const ArgSpec& spec, double number, double& value);
// "copper, aluminium" (the primary texts), for messages.
std::string choice_list(const ArgSpec& spec);

struct FunctionSpec {
    const char* name;
    const ArgSpec* args;
    std::size_t arg_count;
    bool text_result = false;  // returns = "text" in the catalogue: one text value
};

std::span<const FunctionSpec> function_specs();

// The UNO service (and implementation) name, fixed forever: saved workbooks contain it.
const char* addin_service_name();

// Index of a function by name, or -1.
int function_index(std::string_view name);

}  // namespace coilwright::sheet
