// COIL_* budget functions and INSULATION_*: resistance, power, temperature, class, energy.
#include "coilwright/wire.hpp"
#include "../core/registry.hpp"

namespace coilwright::sheet {

namespace {

template <class Fn, class Pick>
Implementation hot_at_current(Pick pick) {
    return numeric<Fn>([pick](const typename Fn::Args& a) {
        return pick(hot_state_at_current(a.resistance, a.current, a.area, a.ambient, a.heatTransfer, a.material));
    });
}

template <class Fn, class Pick>
Implementation hot_at_voltage(Pick pick) {
    return numeric<Fn>([pick](const typename Fn::Args& a) {
        return pick(hot_state_at_voltage(a.resistance, a.voltage, a.area, a.ambient, a.heatTransfer, a.material));
    });
}

const auto kTemperature = [](const HotState& s) { return s.temperature; };
const auto kResistance = [](const HotState& s) { return s.resistance; };

}  // namespace

template <> Implementation implement<fn::COIL_RESISTANCE>() {
    return numeric<fn::COIL_RESISTANCE>([](const fn::COIL_RESISTANCE::Args& a) {
        return coil_resistance(a.turns, a.meanTurn, a.bareDiameter, a.material, a.temperature);
    });
}

template <> Implementation implement<fn::COIL_VOLTAGE>() {
    return numeric<fn::COIL_VOLTAGE>([](const fn::COIL_VOLTAGE::Args& a) { return coil_voltage(a.resistance, a.current); });
}

template <> Implementation implement<fn::COIL_POWER>() {
    return numeric<fn::COIL_POWER>([](const fn::COIL_POWER::Args& a) { return coil_power(a.resistance, a.current); });
}

template <> Implementation implement<fn::COIL_CURRENT_DENSITY>() {
    return numeric<fn::COIL_CURRENT_DENSITY>(
        [](const fn::COIL_CURRENT_DENSITY::Args& a) { return coil_current_density(a.current, a.bareDiameter); });
}

template <> Implementation implement<fn::COIL_COOLING_AREA>() {
    return numeric<fn::COIL_COOLING_AREA>([](const fn::COIL_COOLING_AREA::Args& a) {
        return coil_cooling_area(a.innerRadius, a.outerRadius, a.length);
    });
}

template <> Implementation implement<fn::COIL_COOLING_AREA_RECT>() {
    return numeric<fn::COIL_COOLING_AREA_RECT>([](const fn::COIL_COOLING_AREA_RECT::Args& a) {
        return coil_cooling_area_rect(a.innerWidth, a.innerHeight, a.build, a.length);
    });
}

template <> Implementation implement<fn::COIL_TEMPERATURE_RISE>() {
    return numeric<fn::COIL_TEMPERATURE_RISE>([](const fn::COIL_TEMPERATURE_RISE::Args& a) {
        return coil_temperature_rise(a.power, a.area, a.heatTransfer);
    });
}

template <> Implementation implement<fn::COIL_HOT_TEMPERATURE>() {
    return hot_at_current<fn::COIL_HOT_TEMPERATURE>(kTemperature);
}
template <> Implementation implement<fn::COIL_HOT_RESISTANCE>() {
    return hot_at_current<fn::COIL_HOT_RESISTANCE>(kResistance);
}
template <> Implementation implement<fn::COIL_HOT_TEMPERATURE_AT_VOLTAGE>() {
    return hot_at_voltage<fn::COIL_HOT_TEMPERATURE_AT_VOLTAGE>(kTemperature);
}
template <> Implementation implement<fn::COIL_HOT_RESISTANCE_AT_VOLTAGE>() {
    return hot_at_voltage<fn::COIL_HOT_RESISTANCE_AT_VOLTAGE>(kResistance);
}

template <> Implementation implement<fn::COIL_MAX_CURRENT>() {
    return numeric<fn::COIL_MAX_CURRENT>([](const fn::COIL_MAX_CURRENT::Args& a) {
        return coil_max_current(a.resistance, a.area, a.maxTemperature, a.ambient, a.heatTransfer, a.material);
    });
}

template <> Implementation implement<fn::INSULATION_CLASS_LIMIT>() {
    return numeric<fn::INSULATION_CLASS_LIMIT>(
        [](const fn::INSULATION_CLASS_LIMIT::Args& a) { return insulation_class_limit(a.thermalClass); });
}

template <> Implementation implement<fn::INSULATION_MARGIN>() {
    return numeric<fn::INSULATION_MARGIN>([](const fn::INSULATION_MARGIN::Args& a) {
        return insulation_margin(a.thermalClass, a.temperature, a.hotSpot);
    });
}

template <> Implementation implement<fn::COIL_ENERGY>() {
    return numeric<fn::COIL_ENERGY>([](const fn::COIL_ENERGY::Args& a) { return coil_energy(a.inductance, a.current); });
}

template <> Implementation implement<fn::COIL_TIME_CONSTANT>() {
    return numeric<fn::COIL_TIME_CONSTANT>(
        [](const fn::COIL_TIME_CONSTANT::Args& a) { return coil_time_constant(a.inductance, a.resistance); });
}

}  // namespace coilwright::sheet
