// STACK_DNBZ, STACK_UNIFORM_Z, STACK_LINEAR_Z: the axis of a coil table.
#include <cmath>
#include <string>

#include "coilwright/design.hpp"
#include "coilwright/errors.hpp"
#include "coilwright/field.hpp"
#include "../core/table_binding.hpp"

namespace coilwright::sheet {

namespace {

int whole_order(double v) {
    if (!(v >= 0 && v <= kMaxAxialOrder && v == std::floor(v)))
        throw DomainError("order must be a whole number from 0 to " + std::to_string(kMaxAxialOrder));
    return static_cast<int>(v);
}

}  // namespace

template <> Implementation implement<fn::STACK_DNBZ>() {
    return on_coil_table<fn::STACK_DNBZ>(
        [](const CoilTable& t, const fn::STACK_DNBZ::Args& a) {
            const int n = whole_order(a.order);
            return axial_derivatives(t, a.z, n)[static_cast<std::size_t>(n)];
        },
        per_row(work::kAxialJetPerRow));
}

template <> Implementation implement<fn::STACK_UNIFORM_Z>() {
    return on_coil_table<fn::STACK_UNIFORM_Z>(
        [](const CoilTable& t, const fn::STACK_UNIFORM_Z::Args& a) {
            return axial_uniform_half_length(t, a.tolerance, a.z0);
        },
        per_row(work::kAxialSearchPerRow));
}

template <> Implementation implement<fn::STACK_LINEAR_Z>() {
    return on_coil_table<fn::STACK_LINEAR_Z>(
        [](const CoilTable& t, const fn::STACK_LINEAR_Z::Args& a) {
            return axial_linear_half_length(t, a.tolerance, a.z0);
        },
        per_row(work::kAxialSearchPerRow));
}

}  // namespace coilwright::sheet
