// WINDING_*: layer windings of round wire in a rectangular winding window.
#include "coilwright/wire.hpp"
#include "../core/registry.hpp"

namespace coilwright::sheet {

std::vector<Implementation> winding_functions() {
    // Argument order as in idl/functions/70_winding.toml; "packing" arrives as its choice value.
    return {
        numeric("WINDING_LAYERS", [](const double* a) { return winding_layers(a[0], a[1], packing_from_index(a[2])); }),
        numeric("WINDING_TURNS_PER_LAYER", [](const double* a) { return winding_turns_per_layer(a[0], a[1]); }),
        numeric("WINDING_TURNS",
                [](const double* a) { return winding_turns(a[0], a[1], a[2], packing_from_index(a[3])); }),
        numeric("WINDING_BUILD",
                [](const double* a) { return winding_build(a[0], a[1], a[2], packing_from_index(a[3])); }),
        numeric("WINDING_WIRE_LENGTH",
                [](const double* a) { return winding_wire_length(a[0], a[1], a[2], a[3], packing_from_index(a[4])); }),
        numeric("WINDING_FILL", [](const double* a) { return winding_fill(a[0], a[1], a[2], a[3]); }),
        numeric("WINDING_MEAN_TURN", [](const double* a) { return winding_mean_turn(a[0], a[1]); }),
        numeric("WINDING_MEAN_TURN_RECT", [](const double* a) { return winding_mean_turn_rect(a[0], a[1], a[2]); }),
    };
}

}  // namespace coilwright::sheet
