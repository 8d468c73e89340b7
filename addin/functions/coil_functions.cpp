// COIL_* : thick winding of rectangular cross-section, uniform current density.
#include "coilwright/field.hpp"
#include "../core/registry.hpp"

namespace coilwright::sheet {

std::vector<Implementation> coil_functions() {
    // Argument order as in idl/functions/30_coil.toml: inner radius, outer radius, length,
    // turns, current, z, r. Cost in loop-field evaluations per element: typically 20 to 60,
    // up to a few hundred next to the winding's corners (see README).
    constexpr double kCost = 100.0;
    auto field = [](const double* a, Components want) {
        return thick_coil_field({a[0], a[1], a[2], a[3], a[4]}, a[5], a[6], want);
    };
    return {
        numeric("COIL_BZ", [field](const double* a) { return field(a, Components::Axial).bz; }, kCost),
        numeric("COIL_BR", [field](const double* a) { return field(a, Components::Radial).br; }, kCost),
        numeric("COIL_B", [field](const double* a) { return field(a, Components::Both).magnitude(); }, kCost),
    };
}

}  // namespace coilwright::sheet
