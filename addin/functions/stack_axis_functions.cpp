// STACK_DNBZ, STACK_UNIFORM_Z, STACK_LINEAR_Z: the axis of a coil table.
#include <cmath>

#include "coilwright/field.hpp"
#include "coilwright/errors.hpp"
#include "coilwright/design.hpp"
#include "../core/table_binding.hpp"

namespace coilwright::sheet {

namespace {

// The axis functions' work grows with the number of rows.
template <class F>
Implementation on_table(const char* name, F per_element, double cost_per_row) {
    return on_coil_table(name, per_element,
                         [cost_per_row](const CoilTable& t) { return cost_per_row * static_cast<double>(t.size()); });
}

int whole_order(double v) {
    if (!(v >= 0 && v <= kMaxAxialOrder && v == std::floor(v)))
        throw DomainError("order must be a whole number from 0 to " + std::to_string(kMaxAxialOrder));
    return static_cast<int>(v);
}

}  // namespace

std::vector<Implementation> stack_axis_functions() {
    return {
        on_table("STACK_DNBZ",
                 [](const CoilTable& t, const double* a) {
                     const int n = whole_order(a[0]);
                     return axial_derivatives(t, a[1], n)[static_cast<std::size_t>(n)];
                 }, 1.0),
        // A region search evaluates the axial field a few thousand times.
        on_table("STACK_UNIFORM_Z",
                 [](const CoilTable& t, const double* a) { return axial_uniform_half_length(t, a[0], a[1]); }, 3000.0),
        on_table("STACK_LINEAR_Z",
                 [](const CoilTable& t, const double* a) { return axial_linear_half_length(t, a[0], a[1]); }, 3000.0),
    };
}

}  // namespace coilwright::sheet
