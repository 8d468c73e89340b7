// STACK_SENSITIVITY: tolerance analysis of a coil table.
#include <string>

#include "coilwright/design.hpp"
#include "coilwright/errors.hpp"
#include "../core/table_binding.hpp"

namespace coilwright::sheet {

namespace {

// The table index of the row the user numbers `label` (1 = top row of the range).
std::size_t index_of_label(const CoilTable& table, double label) {
    for (std::size_t i = 0; i < table.size(); ++i)
        if (static_cast<double>(table.label(i)) == label) return i;
    throw DomainError("row " + std::to_string(label) + " is not a coil row of the table (blank, or outside it)");
}

}  // namespace

template <> Implementation implement<fn::STACK_SENSITIVITY>() {
    return on_coil_table<fn::STACK_SENSITIVITY>(
        [](const CoilTable& table, const fn::STACK_SENSITIVITY::Args& a) {
            return sensitivity(table, index_of_label(table, a.row), a.parameter, a.quantity, a.z0, a.tolerance);
        },
        per_row(work::kSensitivityPerRow));
}

}  // namespace coilwright::sheet
