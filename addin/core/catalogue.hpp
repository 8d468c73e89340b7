// The argument specifications of every function, generated from idl/functions/*.toml.
// Indexed like the methods of the UNO interface.
#pragma once

#include <cstddef>
#include <span>
#include <string_view>

namespace coilwright::sheet {

enum class ArgKind { Number, Gauge, Table };

struct ArgSpec {
    const char* name;
    ArgKind kind;
    bool optional;
    double default_value;
};

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
