// SOLENOID_* : thin current-sheet solenoid.
#include "coilwright/field.hpp"
#include "../core/registry.hpp"

namespace coilwright::sheet {

namespace {

template <class Fn, class Pick>
Implementation solenoid_component(Components want, Pick pick) {
    return numeric<Fn>(
        [want, pick](const typename Fn::Args& a) {
            return pick(solenoid_field({a.radius, a.length, a.turns, a.current}, a.z, a.r, want));
        },
        work::kSolenoidField);
}

}  // namespace

template <> Implementation implement<fn::SOLENOID_BZ>() {
    return solenoid_component<fn::SOLENOID_BZ>(Components::Axial, [](const FieldRZ& f) { return f.bz; });
}
template <> Implementation implement<fn::SOLENOID_BR>() {
    return solenoid_component<fn::SOLENOID_BR>(Components::Radial, [](const FieldRZ& f) { return f.br; });
}
template <> Implementation implement<fn::SOLENOID_B>() {
    return solenoid_component<fn::SOLENOID_B>(Components::Both, [](const FieldRZ& f) { return f.magnitude(); });
}

}  // namespace coilwright::sheet
