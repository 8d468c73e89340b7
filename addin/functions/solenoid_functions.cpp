// SOLENOID_* : thin current-sheet solenoid.
#include "coilwright/field.hpp"
#include "../core/registry.hpp"

namespace coilwright::sheet {

std::vector<Implementation> solenoid_functions() {
    // Argument order as in idl/functions/20_solenoid.toml: radius, length, turns, current, z, r.
    // Cost in loop-field evaluations per element (measured: about 3 to 8; see README).
    constexpr double kCost = 10.0;
    auto field = [](const double* a, Components want) {
        return solenoid_field({a[0], a[1], a[2], a[3]}, a[4], a[5], want);
    };
    return {
        numeric("SOLENOID_BZ", [field](const double* a) { return field(a, Components::Axial).bz; }, kCost),
        numeric("SOLENOID_BR", [field](const double* a) { return field(a, Components::Radial).br; }, kCost),
        numeric("SOLENOID_B", [field](const double* a) { return field(a, Components::Both).magnitude(); }, kCost),
    };
}

}  // namespace coilwright::sheet
