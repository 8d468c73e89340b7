// COIL_BZ, COIL_BR, COIL_B: thick winding of rectangular cross-section, uniform current density.
#include "coilwright/field.hpp"
#include "../core/registry.hpp"

namespace coilwright::sheet {

namespace {

template <class Fn, class Pick>
Implementation coil_component(Components want, Pick pick) {
    return numeric<Fn>(
        [want, pick](const typename Fn::Args& a) {
            return pick(thick_coil_field({a.innerRadius, a.outerRadius, a.length, a.turns, a.current}, a.z, a.r, want));
        },
        work::kThickField);
}

}  // namespace

template <> Implementation implement<fn::COIL_BZ>() {
    return coil_component<fn::COIL_BZ>(Components::Axial, [](const FieldRZ& f) { return f.bz; });
}
template <> Implementation implement<fn::COIL_BR>() {
    return coil_component<fn::COIL_BR>(Components::Radial, [](const FieldRZ& f) { return f.br; });
}
template <> Implementation implement<fn::COIL_B>() {
    return coil_component<fn::COIL_B>(Components::Both, [](const FieldRZ& f) { return f.magnitude(); });
}

}  // namespace coilwright::sheet
