// SKIN_DEPTH, *_RAC_RATIO, COIL_C_SELF, COIL_SRF, COIL_Z, COIL_PHASE, COIL_VOLTAGE_AC, RESONANCE_*.
#include "coilwright/ac.hpp"
#include "coilwright/wire.hpp"
#include "../core/registry.hpp"

namespace coilwright::sheet {

std::vector<Implementation> ac_functions() {
    // Argument order as in idl/functions/75_ac.toml; "material" arrives as its choice value.
    return {
        numeric("SKIN_DEPTH", [](const double* a) { return skin_depth(a[0], conductor_from_index(a[1]), a[2]); }),
        numeric("WIRE_RAC_RATIO",
                [](const double* a) { return wire_rac_ratio(a[0], a[1], conductor_from_index(a[2]), a[3]); }),
        numeric("COIL_RAC_RATIO",
                [](const double* a) {
                    return coil_rac_ratio(a[0], a[1], a[2], a[3], a[4], conductor_from_index(a[5]), a[6]);
                }),
        numeric("COIL_C_SELF",
                [](const double* a) { return coil_self_capacitance(a[0], a[1], a[2], a[3], a[4], a[5], a[6]); }),
        numeric("COIL_SRF", [](const double* a) { return coil_srf(a[0], a[1]); }),
        numeric("COIL_Z", [](const double* a) { return coil_impedance(a[0], a[1], a[2], a[3]).magnitude; }),
        numeric("COIL_PHASE", [](const double* a) { return coil_impedance(a[0], a[1], a[2], a[3]).phase; }),
        numeric("COIL_VOLTAGE_AC", [](const double* a) { return coil_voltage_ac(a[0], a[1], a[2], a[3]); }),
        numeric("RESONANCE_C", [](const double* a) { return resonance_capacitance(a[0], a[1]); }),
        numeric("RESONANCE_CAP_VOLTAGE", [](const double* a) { return resonance_cap_voltage(a[0], a[1], a[2]); }),
    };
}

}  // namespace coilwright::sheet
