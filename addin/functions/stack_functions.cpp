// STACK_* : a table of coaxial coils, read once per call.
#include <string>

#include "coilwright/field.hpp"
#include "coilwright/errors.hpp"
#include "../core/coil_table_arg.hpp"
#include "../core/table_binding.hpp"

namespace coilwright::sheet {

namespace {

// The sum of the rows' fields at (z, r), the arguments after the table (idl/functions/40_stack.toml).
Implementation stack_component(const char* name, double (*pick)(const FieldRZ&)) {
    return on_coil_table(
        name, [pick](const CoilTable& t, const double* a) { return pick(table_field(t, a[0], a[1])); },
        field_point_cost);
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
        stack_component("STACK_BZ", [](const FieldRZ& f) { return f.bz; }),
        stack_component("STACK_BR", [](const FieldRZ& f) { return f.br; }),
        stack_component("STACK_B", [](const FieldRZ& f) { return f.magnitude(); }),
        text_result("STACK_CHECK", check_table),
    };
}

}  // namespace coilwright::sheet
