// COIL_HOTSPOT_RISE, COIL_TEMPERATURE_AT_TIME, COIL_PULSE_TEMPERATURE_RISE: winding temperatures
// inside the winding and over time.
#include "coilwright/wire.hpp"
#include "../core/registry.hpp"

namespace coilwright::sheet {

template <> Implementation implement<fn::COIL_HOTSPOT_RISE>() {
    return numeric<fn::COIL_HOTSPOT_RISE>([](const fn::COIL_HOTSPOT_RISE::Args& a) {
        return winding_hotspot_rise(a.innerRadius, a.outerRadius, a.length, a.power, a.conductivity, a.cooled);
    });
}

template <> Implementation implement<fn::COIL_TEMPERATURE_AT_TIME>() {
    return numeric<fn::COIL_TEMPERATURE_AT_TIME>([](const fn::COIL_TEMPERATURE_AT_TIME::Args& a) {
        return coil_temperature_at_time(a.resistance, a.current, a.area, a.heatCapacity, a.time, a.ambient,
                                        a.heatTransfer, a.material);
    });
}

template <> Implementation implement<fn::COIL_PULSE_TEMPERATURE_RISE>() {
    return numeric<fn::COIL_PULSE_TEMPERATURE_RISE>([](const fn::COIL_PULSE_TEMPERATURE_RISE::Args& a) {
        return pulse_temperature_rise(a.resistance, a.current, a.time, a.heatCapacity, a.temperature, a.material);
    });
}

}  // namespace coilwright::sheet
