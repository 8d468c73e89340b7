#include "coilwright/wire/conductor.hpp"

#include <cmath>
#include <string>

#include "numerics/checks.hpp"
#include "coilwright/constants.hpp"
#include "coilwright/errors.hpp"

namespace coilwright {

using namespace internal;

namespace {
// 1 ohm mm^2 / m = 1e-6 ohm m.
constexpr ConductorData kCopper{"copper", 1e-6 / 58.0, 0.00393, 8890.0};
constexpr ConductorData kAluminium{"aluminium", 0.028264e-6, 0.00403, 2703.0};
}  // namespace

const ConductorData& conductor_data(Conductor c) { return c == Conductor::Copper ? kCopper : kAluminium; }

Conductor conductor_from_index(double index) {
    if (index == 0.0) return Conductor::Copper;
    if (index == 1.0) return Conductor::Aluminium;
    raise_domain_error("material must be copper or aluminium");
}

double resistivity(Conductor c, double temperature_c) {
    check::finite(temperature_c, "temperature");
    if (temperature_c < kMinConductorTemperature || temperature_c > kMaxConductorTemperature)
        raise_domain_error("temperature must lie between -100 and 400 C (the range of the linear resistance law)");
    const ConductorData& d = conductor_data(c);
    return d.resistivity_20 * (1.0 + d.temp_coefficient * (temperature_c - 20.0));
}

double wire_area(double diameter) {
    check::positive(diameter, "diameter");
    return check::finite_result(0.25 * kPi * diameter * diameter, "wire area");
}

double wire_resistance(double diameter, double length, Conductor c, double temperature_c) {
    check::non_negative(length, "length");
    const double area = wire_area(diameter);
    return check::finite_result(resistivity(c, temperature_c) * length / area, "resistance");
}

double wire_mass(double diameter, double length, Conductor c) {
    check::non_negative(length, "length");
    return check::finite_result(conductor_data(c).density * wire_area(diameter) * length, "mass");
}

double wire_diameter_for_current(double current, double current_density) {
    check::finite(current, "current");
    check::positive(current_density, "current density");
    if (current == 0.0) raise_domain_error("current must not be 0 (any wire carries no current)");
    return check::finite_result(std::sqrt(4.0 * std::fabs(current) / (kPi * current_density)), "diameter");
}

}  // namespace coilwright
