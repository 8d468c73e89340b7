// STACK_DBZDZ, STACK_UNIFORM_R, STACK_UNIFORM_SPHERE, STACK_SCALE_FOR_BZ, STACK_SCALE_FOR_GRADIENT.
#include "coilwright/design.hpp"
#include "coilwright/field.hpp"
#include "../core/table_binding.hpp"

namespace coilwright::sheet {

template <> Implementation implement<fn::STACK_DBZDZ>() {
    return on_coil_table<fn::STACK_DBZDZ>(
        [](const CoilTable& t, const fn::STACK_DBZDZ::Args& a) { return table_gradient(t, a.z, a.r); },
        field_points(work::kGradientPoints));
}

template <> Implementation implement<fn::STACK_UNIFORM_R>() {
    return on_coil_table<fn::STACK_UNIFORM_R>(
        [](const CoilTable& t, const fn::STACK_UNIFORM_R::Args& a) {
            return radial_uniform_extent(t, a.tolerance, a.z0);
        },
        field_points(work::kRadialSearchPoints));
}

template <> Implementation implement<fn::STACK_UNIFORM_SPHERE>() {
    return on_coil_table<fn::STACK_UNIFORM_SPHERE>(
        [](const CoilTable& t, const fn::STACK_UNIFORM_SPHERE::Args& a) {
            return spherical_uniform_radius(t, a.tolerance, a.z0);
        },
        field_points(work::kSphereSearchPoints));
}

template <> Implementation implement<fn::STACK_SCALE_FOR_BZ>() {
    return on_coil_table<fn::STACK_SCALE_FOR_BZ>(
        [](const CoilTable& t, const fn::STACK_SCALE_FOR_BZ::Args& a) {
            return scale_for_field(t, a.targetField, a.z, a.r);
        },
        field_points(1));
}

template <> Implementation implement<fn::STACK_SCALE_FOR_GRADIENT>() {
    return on_coil_table<fn::STACK_SCALE_FOR_GRADIENT>(
        [](const CoilTable& t, const fn::STACK_SCALE_FOR_GRADIENT::Args& a) {
            return scale_for_gradient(t, a.targetGradient, a.z, a.r);
        },
        field_points(work::kGradientPoints));
}

}  // namespace coilwright::sheet
