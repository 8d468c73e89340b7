// COIL_* budget functions and INSULATION_*: resistance, power, temperature, class, energy.
#include "coilwright/wire.hpp"
#include "../core/registry.hpp"

namespace coilwright::sheet {

std::vector<Implementation> budget_functions() {
    // Argument order as in idl/functions/80_budget.toml; "material" arrives as its choice value,
    // "thermal_class" as the class temperature.
    auto at_current = [](const double* a) {
        return hot_state_at_current(a[0], a[1], a[2], a[3], a[4], conductor_from_index(a[5]));
    };
    auto at_voltage = [](const double* a) {
        return hot_state_at_voltage(a[0], a[1], a[2], a[3], a[4], conductor_from_index(a[5]));
    };
    return {
        numeric("COIL_RESISTANCE",
                [](const double* a) { return coil_resistance(a[0], a[1], a[2], conductor_from_index(a[3]), a[4]); }),
        numeric("COIL_VOLTAGE", [](const double* a) { return coil_voltage(a[0], a[1]); }),
        numeric("COIL_POWER", [](const double* a) { return coil_power(a[0], a[1]); }),
        numeric("COIL_CURRENT_DENSITY", [](const double* a) { return coil_current_density(a[0], a[1]); }),
        numeric("COIL_COOLING_AREA", [](const double* a) { return coil_cooling_area(a[0], a[1], a[2]); }),
        numeric("COIL_COOLING_AREA_RECT",
                [](const double* a) { return coil_cooling_area_rect(a[0], a[1], a[2], a[3]); }),
        numeric("COIL_TEMPERATURE_RISE", [](const double* a) { return coil_temperature_rise(a[0], a[1], a[2]); }),
        numeric("COIL_HOT_TEMPERATURE", [at_current](const double* a) { return at_current(a).temperature; }),
        numeric("COIL_HOT_RESISTANCE", [at_current](const double* a) { return at_current(a).resistance; }),
        numeric("COIL_HOT_TEMPERATURE_AT_VOLTAGE", [at_voltage](const double* a) { return at_voltage(a).temperature; }),
        numeric("COIL_HOT_RESISTANCE_AT_VOLTAGE", [at_voltage](const double* a) { return at_voltage(a).resistance; }),
        numeric("COIL_MAX_CURRENT", [](const double* a) {
            return coil_max_current(a[0], a[1], a[2], a[3], a[4], conductor_from_index(a[5]));
        }),
        numeric("INSULATION_CLASS_LIMIT", [](const double* a) { return insulation_class_limit(a[0]); }),
        numeric("INSULATION_MARGIN", [](const double* a) { return insulation_margin(a[0], a[1], a[2]); }),
        numeric("COIL_ENERGY", [](const double* a) { return coil_energy(a[0], a[1]); }),
        numeric("COIL_TIME_CONSTANT", [](const double* a) { return coil_time_constant(a[0], a[1]); }),
    };
}

}  // namespace coilwright::sheet
