// STACK_DBZDZ, STACK_UNIFORM_R, STACK_UNIFORM_SPHERE, STACK_SCALE_FOR_BZ, STACK_SCALE_FOR_GRADIENT.
#include <memory>

#include "coilwright/coil_stack.hpp"
#include "coilwright/regions.hpp"
#include "../core/coil_table_arg.hpp"
#include "../core/registry.hpp"

namespace coilwright::sheet {

namespace {

// A function of (table; numbers...): the table is read once per call; the work estimate is
// `evaluations` field points of the whole table per element.
template <class F>
Implementation on_table(const char* name, F per_element, double evaluations) {
    return {name, [per_element, evaluations](std::span<const Arg* const> tables) {
                auto table = std::make_shared<const CoilTable>(read_coil_table(*tables[0]));
                double per_point = 0;
                for (const CoilRow& row : table->rows()) per_point += row_cost(row);
                return Prepared{[table, per_element](const double* a) { return per_element(*table, a); },
                                evaluations * per_point, {}, {}, {}};
            }};
}

}  // namespace

std::vector<Implementation> region_functions() {
    return {
        on_table("STACK_DBZDZ", [](const CoilTable& t, const double* a) { return stack_gradient(t, a[0], a[1]); }, 4),
        on_table("STACK_UNIFORM_R",
                 [](const CoilTable& t, const double* a) { return radial_uniform_extent(t, a[0], a[1]); }, 3000),
        on_table("STACK_UNIFORM_SPHERE",
                 [](const CoilTable& t, const double* a) { return spherical_uniform_radius(t, a[0], a[1]); }, 100000),
        on_table("STACK_SCALE_FOR_BZ",
                 [](const CoilTable& t, const double* a) { return scale_for_field(t, a[0], a[1], a[2]); }, 1),
        on_table("STACK_SCALE_FOR_GRADIENT",
                 [](const CoilTable& t, const double* a) { return scale_for_gradient(t, a[0], a[1], a[2]); }, 4),
    };
}

}  // namespace coilwright::sheet
