// SKIN_DEPTH, *_RAC_RATIO, COIL_C_SELF, COIL_SRF, COIL_Z, COIL_PHASE, COIL_VOLTAGE_AC, RESONANCE_*.
#include "coilwright/ac.hpp"
#include "../core/registry.hpp"

namespace coilwright::sheet {

template <> Implementation implement<fn::SKIN_DEPTH>() {
    return numeric<fn::SKIN_DEPTH>(
        [](const fn::SKIN_DEPTH::Args& a) { return skin_depth(a.frequency, a.material, a.temperature); });
}

template <> Implementation implement<fn::WIRE_RAC_RATIO>() {
    return numeric<fn::WIRE_RAC_RATIO>([](const fn::WIRE_RAC_RATIO::Args& a) {
        return wire_rac_ratio(a.bareDiameter, a.frequency, a.material, a.temperature);
    });
}

template <> Implementation implement<fn::COIL_RAC_RATIO>() {
    return numeric<fn::COIL_RAC_RATIO>([](const fn::COIL_RAC_RATIO::Args& a) {
        return coil_rac_ratio(a.bareDiameter, a.insulatedDiameter, a.frequency, a.layers, a.strands, a.material,
                              a.temperature);
    });
}

template <> Implementation implement<fn::COIL_C_SELF>() {
    return numeric<fn::COIL_C_SELF>([](const fn::COIL_C_SELF::Args& a) {
        return coil_self_capacitance(a.innerRadius, a.length, a.turns, a.layers, a.bareDiameter, a.insulatedDiameter,
                                     a.permittivity);
    });
}

template <> Implementation implement<fn::COIL_SRF>() {
    return numeric<fn::COIL_SRF>([](const fn::COIL_SRF::Args& a) { return coil_srf(a.inductance, a.selfCapacitance); });
}

template <> Implementation implement<fn::COIL_Z>() {
    return numeric<fn::COIL_Z>([](const fn::COIL_Z::Args& a) {
        return coil_impedance(a.resistance, a.inductance, a.frequency, a.selfCapacitance).magnitude;
    });
}

template <> Implementation implement<fn::COIL_PHASE>() {
    return numeric<fn::COIL_PHASE>([](const fn::COIL_PHASE::Args& a) {
        return coil_impedance(a.resistance, a.inductance, a.frequency, a.selfCapacitance).phase;
    });
}

template <> Implementation implement<fn::COIL_VOLTAGE_AC>() {
    return numeric<fn::COIL_VOLTAGE_AC>([](const fn::COIL_VOLTAGE_AC::Args& a) {
        return coil_voltage_ac(a.resistance, a.inductance, a.frequency, a.current);
    });
}

template <> Implementation implement<fn::RESONANCE_C>() {
    return numeric<fn::RESONANCE_C>(
        [](const fn::RESONANCE_C::Args& a) { return resonance_capacitance(a.inductance, a.frequency); });
}

template <> Implementation implement<fn::RESONANCE_CAP_VOLTAGE>() {
    return numeric<fn::RESONANCE_CAP_VOLTAGE>([](const fn::RESONANCE_CAP_VOLTAGE::Args& a) {
        return resonance_cap_voltage(a.current, a.inductance, a.frequency);
    });
}

}  // namespace coilwright::sheet
