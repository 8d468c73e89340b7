// Binding of a function whose first argument is a coil table and whose others are numbers: the
// table is read once per call and shared by every element of an array formula.
#pragma once

#include <memory>
#include <span>

#include "coil_table_arg.hpp"
#include "coilwright/field.hpp"
#include "registry.hpp"

namespace coilwright::sheet {

// per_element(table, numbers) gives one element; cost_of(table) its work in loop-field
// evaluations (the call layer refuses calls whose total work is too large).
template <class F, class Cost>
Implementation on_coil_table(const char* name, F per_element, Cost cost_of) {
    return {name, [per_element, cost_of](std::span<const Arg* const> tables) {
                auto table = std::make_shared<const CoilTable>(read_coil_table(*tables[0]));
                const double cost = cost_of(*table);
                return Prepared{[table, per_element](const double* a) { return per_element(*table, a); }, cost, {},
                                {}, {}};
            }};
}

// The work of one field point of the whole table.
inline double field_point_cost(const CoilTable& table) {
    double cost = 0.0;
    for (const CoilRow& row : table.rows()) cost += row_cost(row);
    return cost;
}

}  // namespace coilwright::sheet
