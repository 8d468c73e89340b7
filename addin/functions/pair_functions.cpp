// HELMHOLTZ_B0, PAIR_*, GRADPAIR_*: pairs of identical coaxial coils.
#include "coilwright/design.hpp"
#include "../core/registry.hpp"

namespace coilwright::sheet {

std::vector<Implementation> pair_functions() {
    // Arguments as in idl/functions/45_pair.toml; a coil shape is (inner, outer, length).
    return {
        numeric("HELMHOLTZ_B0", [](const double* a) { return helmholtz_centre_field(a[0], a[1], a[2]); }),
        numeric("PAIR_SPACING", [](const double* a) { return flat_pair_spacing({a[0], a[1], a[2]}); }, 500.0),
        numeric("PAIR_B0", [](const double* a) { return pair_centre_field({a[0], a[1], a[2]}, a[3], a[4], a[5]); }),
        numeric("GRADPAIR_SPACING", [](const double* a) { return gradient_pair_spacing({a[0], a[1], a[2]}); }, 500.0),
        numeric("GRADPAIR_GRADIENT",
                [](const double* a) { return gradient_pair_gradient({a[0], a[1], a[2]}, a[3], a[4], a[5]); }),
    };
}

}  // namespace coilwright::sheet
