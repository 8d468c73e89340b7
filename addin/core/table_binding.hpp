// Binding of a function whose first argument is a coil table and whose others are numbers: the
// table is read once per call and shared by every element of an array formula.
#pragma once

#include <memory>
#include <span>

#include "coil_table_arg.hpp"
#include "coilwright/coil_table.hpp"
#include "registry.hpp"

namespace coilwright::sheet {

// per_element(table, const Fn::Args&) gives one element; cost_of(table) its work in loop-field
// evaluations (the call layer refuses calls whose total work is too large).
template <class Fn, class F, class Cost>
Implementation on_coil_table(F per_element, Cost cost_of) {
    static_assert(Fn::whole_count == 1, "on_coil_table() is for functions with one table argument");
    return prepared<Fn>([per_element, cost_of](std::span<const Arg* const> tables) {
        auto table = std::make_shared<const CoilTable>(read_coil_table(*tables[0]));
        const double cost = cost_of(*table);
        return Prepared{[table, per_element](const double* a) { return per_element(*table, Fn::Args::from(a)); }, cost,
                        {}, {}, {}};
    });
}

// `points` field points of the whole table per element.
inline auto field_points(double points) {
    return [points](const CoilTable& t) { return points * work::field_point(t); };
}

// `per_row` evaluations for each row of the table per element.
inline auto per_row(double per_row) {
    return [per_row](const CoilTable& t) { return per_row * static_cast<double>(t.size()); };
}

}  // namespace coilwright::sheet
