// PICKUP_*: induced EMF, effective area, sensitivity, Johnson noise, noise-equivalent field.
#include "coilwright/ac.hpp"
#include "../core/registry.hpp"

namespace coilwright::sheet {

template <> Implementation implement<fn::PICKUP_EMF>() {
    return numeric<fn::PICKUP_EMF>(
        [](const fn::PICKUP_EMF::Args& a) { return pickup_emf(a.turns, a.area, a.frequency, a.field); });
}

template <> Implementation implement<fn::PICKUP_AREA>() {
    return numeric<fn::PICKUP_AREA>(
        [](const fn::PICKUP_AREA::Args& a) { return pickup_area(a.innerRadius, a.outerRadius, a.length, a.turns); });
}

template <> Implementation implement<fn::PICKUP_SENSITIVITY>() {
    return numeric<fn::PICKUP_SENSITIVITY>([](const fn::PICKUP_SENSITIVITY::Args& a) {
        return pickup_sensitivity(a.turns, a.area, a.frequency, a.resistance, a.inductance, a.selfCapacitance);
    });
}

template <> Implementation implement<fn::PICKUP_NOISE>() {
    return numeric<fn::PICKUP_NOISE>(
        [](const fn::PICKUP_NOISE::Args& a) { return johnson_noise(a.resistance, a.temperature, a.bandwidth); });
}

template <> Implementation implement<fn::PICKUP_NEF>() {
    return numeric<fn::PICKUP_NEF>([](const fn::PICKUP_NEF::Args& a) {
        return pickup_nef(a.turns, a.area, a.frequency, a.resistance, a.temperature, a.inductance, a.selfCapacitance,
                          a.amplifierNoise);
    });
}

}  // namespace coilwright::sheet
