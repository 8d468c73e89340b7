// AWG_DIAMETER and WIRE_*: round wire sizes, materials, resistance and mass.
#include "coilwright/wire.hpp"
#include "../core/registry.hpp"

namespace coilwright::sheet {

std::vector<Implementation> wire_functions() {
    // Argument order as in idl/functions/60_wire.toml; "material" arrives as its choice value.
    return {
        numeric("AWG_DIAMETER", [](const double* a) { return awg_diameter(a[0]); }),
        numeric("WIRE_AREA", [](const double* a) { return wire_area(a[0]); }),
        numeric("WIRE_RESISTIVITY", [](const double* a) { return resistivity(conductor_from_index(a[0]), a[1]); }),
        numeric("WIRE_RESISTANCE",
                [](const double* a) { return wire_resistance(a[0], a[1], conductor_from_index(a[2]), a[3]); }),
        numeric("WIRE_RESISTANCE_PER_M",
                [](const double* a) { return wire_resistance(a[0], 1.0, conductor_from_index(a[1]), a[2]); }),
        numeric("WIRE_MASS", [](const double* a) { return wire_mass(a[0], a[1], conductor_from_index(a[2])); }),
        numeric("WIRE_DIAMETER_FOR_CURRENT", [](const double* a) { return wire_diameter_for_current(a[0], a[1]); }),
    };
}

}  // namespace coilwright::sheet
