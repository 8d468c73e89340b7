// STACK_SENSITIVITY: tolerance analysis of a coil table.
#include <cmath>
#include <string>

#include "coilwright/errors.hpp"
#include "coilwright/design.hpp"
#include "../core/table_binding.hpp"

namespace coilwright::sheet {

namespace {

// The catalogue's choices, in order: radius, inner, outer, length, position, turns, current.
constexpr CoilParameter kParameters[] = {CoilParameter::Radius, CoilParameter::Inner,    CoilParameter::Outer,
                                         CoilParameter::Length, CoilParameter::Position, CoilParameter::Turns,
                                         CoilParameter::Current};

// The table index of the row the user numbers `label` (1 = top row of the range).
std::size_t index_of_label(const CoilTable& table, double label) {
    for (std::size_t i = 0; i < table.size(); ++i)
        if (static_cast<double>(table.label(i)) == label) return i;
    throw DomainError("row " + std::to_string(label) + " is not a coil row of the table (blank, or outside it)");
}

}  // namespace

std::vector<Implementation> sensitivity_functions() {
    return {on_coil_table(
        "STACK_SENSITIVITY",
        // Arguments after the table: row, parameter, quantity, z0, tolerance.
        [](const CoilTable& table, const double* a) {
            const std::size_t index = index_of_label(table, a[0]);
            const CoilParameter parameter = kParameters[static_cast<std::size_t>(a[1])];
            return a[2] == 0.0 ? field_sensitivity(table, index, parameter, a[3])
                               : uniform_length_sensitivity(table, index, parameter, a[3], a[4]);
        },
        // A uniform-region sensitivity runs about five region searches.
        [](const CoilTable& table) { return 15000.0 * static_cast<double>(table.size()); })};
}

}  // namespace coilwright::sheet
