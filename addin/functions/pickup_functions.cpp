// PICKUP_*: induced EMF, effective area, sensitivity, Johnson noise, noise-equivalent field.
#include "coilwright/ac.hpp"
#include "../core/registry.hpp"

namespace coilwright::sheet {

std::vector<Implementation> pickup_functions() {
    // Argument order as in idl/functions/76_pickup.toml.
    return {
        numeric("PICKUP_EMF", [](const double* a) { return pickup_emf(a[0], a[1], a[2], a[3]); }),
        numeric("PICKUP_AREA", [](const double* a) { return pickup_area(a[0], a[1], a[2], a[3]); }),
        numeric("PICKUP_SENSITIVITY",
                [](const double* a) { return pickup_sensitivity(a[0], a[1], a[2], a[3], a[4], a[5]); }),
        numeric("PICKUP_NOISE", [](const double* a) { return johnson_noise(a[0], a[1], a[2]); }),
        numeric("PICKUP_NEF",
                [](const double* a) { return pickup_nef(a[0], a[1], a[2], a[3], a[4], a[5], a[6], a[7]); }),
    };
}

}  // namespace coilwright::sheet
