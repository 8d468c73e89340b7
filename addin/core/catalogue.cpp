#include "catalogue.hpp"

#include <cctype>

namespace coilwright::sheet {

namespace {
#include "catalogue_specs.inc"
}  // namespace

std::span<const FunctionSpec> function_specs() { return kFunctionSpecs; }

const char* addin_service_name() { return kServiceName; }

int function_index(std::string_view name) {
    const auto specs = function_specs();
    for (std::size_t i = 0; i < specs.size(); ++i)
        if (name == specs[i].name) return static_cast<int>(i);
    return -1;
}

bool choice_from_text(const ArgSpec& spec, std::string_view text, double& value) {
    while (!text.empty() && std::isspace(static_cast<unsigned char>(text.front()))) text.remove_prefix(1);
    while (!text.empty() && std::isspace(static_cast<unsigned char>(text.back()))) text.remove_suffix(1);
    std::string lower(text);
    for (char& c : lower) c = static_cast<char>(std::tolower(static_cast<unsigned char>(c)));
    for (std::size_t i = 0; i < spec.choice_count; ++i)
        if (lower == spec.choices[i].text) {
            value = spec.choices[i].value;
            return true;
        }
    return false;
}

bool choice_from_number(const ArgSpec& spec, double number, double& value) {
    if (!spec.accepts_numbers) return false;
    for (std::size_t i = 0; i < spec.choice_count; ++i)
        if (number == spec.choices[i].value) {
            value = number;
            return true;
        }
    return false;
}

std::string choice_list(const ArgSpec& spec) {
    std::string out;
    for (std::size_t i = 0; i < spec.choice_count; ++i) {
        if (!spec.choices[i].primary) continue;
        if (!out.empty()) out += ", ";
        out += spec.choices[i].text;
    }
    return out;
}

}  // namespace coilwright::sheet
