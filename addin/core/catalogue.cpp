#include "catalogue.hpp"

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

}  // namespace coilwright::sheet
