// AWG_DIAMETER and WIRE_*: round wire sizes, materials, resistance and mass.
#include "coilwright/wire.hpp"
#include "../core/registry.hpp"

namespace coilwright::sheet {

template <> Implementation implement<fn::AWG_DIAMETER>() {
    return numeric<fn::AWG_DIAMETER>([](const fn::AWG_DIAMETER::Args& a) { return awg_diameter(a.gauge); });
}

template <> Implementation implement<fn::WIRE_AREA>() {
    return numeric<fn::WIRE_AREA>([](const fn::WIRE_AREA::Args& a) { return wire_area(a.bareDiameter); });
}

template <> Implementation implement<fn::WIRE_RESISTIVITY>() {
    return numeric<fn::WIRE_RESISTIVITY>(
        [](const fn::WIRE_RESISTIVITY::Args& a) { return resistivity(a.material, a.temperature); });
}

template <> Implementation implement<fn::WIRE_RESISTANCE>() {
    return numeric<fn::WIRE_RESISTANCE>([](const fn::WIRE_RESISTANCE::Args& a) {
        return wire_resistance(a.bareDiameter, a.length, a.material, a.temperature);
    });
}

template <> Implementation implement<fn::WIRE_RESISTANCE_PER_M>() {
    return numeric<fn::WIRE_RESISTANCE_PER_M>([](const fn::WIRE_RESISTANCE_PER_M::Args& a) {
        return wire_resistance(a.bareDiameter, 1.0, a.material, a.temperature);
    });
}

template <> Implementation implement<fn::WIRE_MASS>() {
    return numeric<fn::WIRE_MASS>(
        [](const fn::WIRE_MASS::Args& a) { return wire_mass(a.bareDiameter, a.length, a.material); });
}

template <> Implementation implement<fn::WIRE_DIAMETER_FOR_CURRENT>() {
    return numeric<fn::WIRE_DIAMETER_FOR_CURRENT>([](const fn::WIRE_DIAMETER_FOR_CURRENT::Args& a) {
        return wire_diameter_for_current(a.current, a.currentDensity);
    });
}

}  // namespace coilwright::sheet
