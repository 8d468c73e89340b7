// WINDING_*: layer windings of round wire in a rectangular winding window.
#include "coilwright/wire.hpp"
#include "../core/registry.hpp"

namespace coilwright::sheet {

template <> Implementation implement<fn::WINDING_LAYERS>() {
    return numeric<fn::WINDING_LAYERS>([](const fn::WINDING_LAYERS::Args& a) {
        return winding_layers(a.build, a.insulatedDiameter, a.packing);
    });
}

template <> Implementation implement<fn::WINDING_TURNS_PER_LAYER>() {
    return numeric<fn::WINDING_TURNS_PER_LAYER>([](const fn::WINDING_TURNS_PER_LAYER::Args& a) {
        return winding_turns_per_layer(a.length, a.insulatedDiameter);
    });
}

template <> Implementation implement<fn::WINDING_TURNS>() {
    return numeric<fn::WINDING_TURNS>([](const fn::WINDING_TURNS::Args& a) {
        return winding_turns(a.build, a.length, a.insulatedDiameter, a.packing);
    });
}

template <> Implementation implement<fn::WINDING_BUILD>() {
    return numeric<fn::WINDING_BUILD>([](const fn::WINDING_BUILD::Args& a) {
        return winding_build(a.turns, a.length, a.insulatedDiameter, a.packing);
    });
}

template <> Implementation implement<fn::WINDING_WIRE_LENGTH>() {
    return numeric<fn::WINDING_WIRE_LENGTH>([](const fn::WINDING_WIRE_LENGTH::Args& a) {
        return winding_wire_length(a.innerRadius, a.length, a.insulatedDiameter, a.turns, a.packing);
    });
}

template <> Implementation implement<fn::WINDING_FILL>() {
    return numeric<fn::WINDING_FILL>(
        [](const fn::WINDING_FILL::Args& a) { return winding_fill(a.turns, a.bareDiameter, a.build, a.length); });
}

template <> Implementation implement<fn::WINDING_MEAN_TURN>() {
    return numeric<fn::WINDING_MEAN_TURN>(
        [](const fn::WINDING_MEAN_TURN::Args& a) { return winding_mean_turn(a.innerRadius, a.outerRadius); });
}

template <> Implementation implement<fn::WINDING_MEAN_TURN_RECT>() {
    return numeric<fn::WINDING_MEAN_TURN_RECT>([](const fn::WINDING_MEAN_TURN_RECT::Args& a) {
        return winding_mean_turn_rect(a.innerWidth, a.innerHeight, a.build);
    });
}

}  // namespace coilwright::sheet
