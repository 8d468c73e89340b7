#include "registry.hpp"

#include <string_view>

#include "catalogue.hpp"

namespace coilwright::sheet {

Implementation numeric(const char* name, ElementFn fn, double cost, BatchFn batch) {
    ElementFn plain = fn;
    return {name,
            [fn = std::move(fn), cost, batch = std::move(batch)](std::span<const Arg* const>) {
                return Prepared{fn, cost, batch, {}, {}};
            },
            std::move(plain), cost};
}

Implementation text_result(const char* name, TextFn fn) {
    return {name, [fn = std::move(fn)](std::span<const Arg* const> tables) {
                Prepared p;
                p.cost = 0.0;
                p.text = fn(tables);
                return p;
            }};
}

// Declares each family's binding function and lists them (kBindings).
#include "bindings.inc"

std::vector<Implementation> contributed_implementations() {
    std::vector<Implementation> all;
    for (Binding binding : kBindings)
        for (auto& impl : binding()) all.push_back(impl);
    return all;
}

const std::vector<Implementation>& implementations() {
    // Built once, read-only afterwards (thread-safe static initialisation).
    static const std::vector<Implementation> ordered = [] {
        const std::vector<Implementation> all = contributed_implementations();
        const auto specs = function_specs();
        std::vector<Implementation> out(specs.size(), Implementation{nullptr, {}, {}, 0.0});
        for (auto& impl : all) {
            const int i = function_index(impl.name);
            if (i >= 0) out[static_cast<std::size_t>(i)] = impl;
        }
        return out;
    }();
    return ordered;
}

}  // namespace coilwright::sheet
