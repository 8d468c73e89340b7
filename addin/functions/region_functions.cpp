// STACK_DBZDZ, STACK_UNIFORM_R, STACK_UNIFORM_SPHERE, STACK_SCALE_FOR_BZ, STACK_SCALE_FOR_GRADIENT.
#include "coilwright/field.hpp"
#include "coilwright/design.hpp"
#include "../core/table_binding.hpp"

namespace coilwright::sheet {

namespace {

// `evaluations` field points of the whole table per element.
template <class F>
Implementation on_table(const char* name, F per_element, double evaluations) {
    return on_coil_table(name, per_element, [evaluations](const CoilTable& t) { return evaluations * field_point_cost(t); });
}

}  // namespace

std::vector<Implementation> region_functions() {
    return {
        on_table("STACK_DBZDZ", [](const CoilTable& t, const double* a) { return table_gradient(t, a[0], a[1]); }, 4),
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
