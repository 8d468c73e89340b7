// STACK_* : a table of coaxial coils, read once per call.
#include <memory>
#include <string>

#include "coilwright/coil_stack.hpp"
#include "coilwright/errors.hpp"
#include "../core/coil_table_arg.hpp"
#include "../core/registry.hpp"

namespace coilwright::sheet {

namespace {

// Parses the table argument once; the element function evaluates the sum of the rows at (z, r).
PrepareFn stack_component(double (*pick)(const FieldRZ&)) {
    return [pick](std::span<const Arg* const> tables) {
        auto table = std::make_shared<const CoilTable>(read_coil_table(*tables[0]));
        double cost = 0.0;
        for (const CoilRow& row : table->rows()) cost += row_cost(row);
        // Arguments after the table, as in idl/functions/40_stack.toml: z, r.
        ElementFn fn = [table, pick](const double* a) { return pick(stack_field(*table, a[0], a[1])); };
        return Prepared{std::move(fn), cost, {}};
    };
}

const char* kind_name(CoilRow::Kind kind, bool plural) {
    switch (kind) {
        case CoilRow::Kind::Loop: return plural ? "loops" : "loop";
        case CoilRow::Kind::ThinSolenoid: return plural ? "thin solenoids" : "thin solenoid";
        case CoilRow::Kind::FlatSpiral: return plural ? "flat spirals" : "flat spiral";
        case CoilRow::Kind::Thick: return plural ? "thick coils" : "thick coil";
    }
    return "";
}

// "OK: 3 coils (2 loops, 1 thick coil)", or the reader's message for the first bad row. A
// single value instead of a range is no table to explain: an error cell, like any bad argument.
std::string check_table(std::span<const Arg* const> tables) {
    if (tables[0]->form == Arg::Form::Scalar)
        throw DomainError("coils must be a range (or an inline array) of 6 columns");
    try {
        const CoilTable table = read_coil_table(*tables[0]);
        const CoilRow::Kind kinds[] = {CoilRow::Kind::Loop, CoilRow::Kind::ThinSolenoid, CoilRow::Kind::FlatSpiral,
                                       CoilRow::Kind::Thick};
        std::string detail;
        for (CoilRow::Kind kind : kinds) {
            std::size_t n = 0;
            for (const CoilRow& row : table.rows()) n += row.kind() == kind ? 1 : 0;
            if (n == 0) continue;
            detail += (detail.empty() ? "" : ", ") + std::to_string(n) + " " + kind_name(kind, n != 1);
        }
        const std::size_t n = table.size();
        return "OK: " + std::to_string(n) + (n == 1 ? " coil (" : " coils (") + detail + ")";
    } catch (const DomainError& e) {
        return e.what();
    }
}

}  // namespace

std::vector<Implementation> stack_functions() {
    return {
        {"STACK_BZ", stack_component([](const FieldRZ& f) { return f.bz; })},
        {"STACK_BR", stack_component([](const FieldRZ& f) { return f.br; })},
        {"STACK_B", stack_component([](const FieldRZ& f) { return f.magnitude(); })},
        text_result("STACK_CHECK", check_table),
    };
}

}  // namespace coilwright::sheet
