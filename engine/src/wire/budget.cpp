#include "coilwright/wire/budget.hpp"

#include <cmath>
#include <string>

#include "numerics/checks.hpp"
#include "wire/temperature_checks.hpp"
#include "coilwright/constants.hpp"
#include "coilwright/errors.hpp"

namespace coilwright {

using namespace internal;

namespace {

void check_cooling(double area, double h, double ambient_c) {
    check::positive(area, "cooling area");
    check::positive(h, "heat-transfer coefficient");
    check_conductor_temperature(ambient_c, "ambient temperature");
}

HotState settle(double r20, double rise, double ambient_c, Conductor c) {
    const double t = ambient_c + rise;
    if (!(t <= kMaxConductorTemperature))
        raise_domain_error("the winding would settle above 400 C, far beyond every insulation class: reduce the load");
    return {t, check::finite_result(r20 * (1.0 + conductor_data(c).temp_coefficient * (t - 20.0)), "the hot resistance")};
}

}  // namespace

double coil_resistance(double turns, double mean_turn, double diameter, Conductor c, double temperature_c) {
    check::non_negative(turns, "turns");
    check::positive(mean_turn, "mean turn");
    return wire_resistance(diameter, turns * mean_turn, c, temperature_c);
}

double coil_voltage(double resistance, double current) {
    check::non_negative(resistance, "resistance");
    check::finite(current, "current");
    return check::finite_result(resistance * current, "voltage");
}

double coil_power(double resistance, double current) {
    check::non_negative(resistance, "resistance");
    check::finite(current, "current");
    return check::finite_result(resistance * current * current, "power");
}

double coil_current_density(double current, double diameter) {
    check::finite(current, "current");
    return check::finite_result(std::fabs(current) / wire_area(diameter), "current density");
}

double coil_cooling_area(double inner_radius, double outer_radius, double length) {
    check::radial_extent(inner_radius, outer_radius);
    check::non_negative(length, "length");
    const double ends = 2.0 * kPi * (outer_radius - inner_radius) * (outer_radius + inner_radius);
    return check::finite_result(2.0 * kPi * outer_radius * length + ends, "cooling area");
}

double coil_cooling_area_rect(double inner_width, double inner_height, double build, double length) {
    check::positive(inner_width, "inner width");
    check::positive(inner_height, "inner height");
    check::positive(build, "build");
    check::non_negative(length, "length");
    const double perimeter = 2.0 * (inner_width + inner_height);
    const double outer = (perimeter + 2.0 * kPi * build) * length;
    const double ends = 2.0 * (perimeter * build + kPi * build * build);
    return check::finite_result(outer + ends, "cooling area");
}

double coil_temperature_rise(double power, double area, double h) {
    check::non_negative(power, "power");
    check::positive(area, "cooling area");
    check::positive(h, "heat-transfer coefficient");
    return check::finite_result(power / (h * area), "temperature rise");
}

HotState hot_state_at_current(double r20, double current, double area, double ambient_c, double h, Conductor c) {
    check::positive(r20, "resistance at 20 C");
    check::finite(current, "current");
    check_cooling(area, h, ambient_c);
    const double alpha = conductor_data(c).temp_coefficient;
    const double k = current * current * r20 / (h * area);  // K: rise per unit of R / R20
    if (!std::isfinite(k) || alpha * k >= 1.0)
        raise_domain_error("thermal runaway: at this current the resistance, and with it the heating, grows faster "
                          "than the cooling; there is no steady temperature");
    const double rise = k * (1.0 + alpha * (ambient_c - 20.0)) / (1.0 - alpha * k);
    return settle(r20, rise, ambient_c, c);
}

HotState hot_state_at_voltage(double r20, double voltage, double area, double ambient_c, double h, Conductor c) {
    check::positive(r20, "resistance at 20 C");
    check::finite(voltage, "voltage");
    check_cooling(area, h, ambient_c);
    const double alpha = conductor_data(c).temp_coefficient;
    const double ra = 1.0 + alpha * (ambient_c - 20.0);                // R(Ta) / R20
    const double q = (voltage / r20) * voltage / (h * area);           // K
    if (!std::isfinite(q)) raise_domain_error("the voltage is too large for this winding");
    // alpha rise^2 + ra rise - q = 0, positive root written without cancellation.
    const double rise = 2.0 * q / (ra + std::sqrt(ra * ra + 4.0 * alpha * q));
    return settle(r20, rise, ambient_c, c);
}

double coil_max_current(double r20, double area, double max_temperature_c, double ambient_c, double h, Conductor c) {
    check::positive(r20, "resistance at 20 C");
    check_cooling(area, h, ambient_c);
    check_conductor_temperature(max_temperature_c, "maximum temperature");
    if (!(max_temperature_c > ambient_c)) raise_domain_error("maximum temperature must be above the ambient temperature");
    const double r_max = r20 * (1.0 + conductor_data(c).temp_coefficient * (max_temperature_c - 20.0));
    return check::finite_result(std::sqrt(h * area * (max_temperature_c - ambient_c) / r_max), "current");
}

double insulation_class_limit(double thermal_class) {
    // IEC 60085 thermal classes (C).
    for (double k : {90.0, 105.0, 120.0, 130.0, 155.0, 180.0, 200.0, 220.0, 250.0})
        if (thermal_class == k) return k;
    raise_domain_error("thermal class must be an IEC 60085 class: 90 (Y), 105 (A), 120 (E), 130 (B), 155 (F), "
                      "180 (H), 200 (N), 220 (R) or 250");
}

double insulation_margin(double thermal_class, double temperature_c, double hot_spot_allowance) {
    const double limit = insulation_class_limit(thermal_class);
    check::finite(temperature_c, "temperature");
    check::non_negative(hot_spot_allowance, "hot-spot allowance");
    return check::finite_result(limit - temperature_c - hot_spot_allowance, "margin");
}

double coil_energy(double inductance, double current) {
    check::non_negative(inductance, "inductance");
    check::finite(current, "current");
    return check::finite_result(0.5 * inductance * current * current, "energy");
}

double coil_time_constant(double inductance, double resistance) {
    check::non_negative(inductance, "inductance");
    check::positive(resistance, "resistance");
    return check::finite_result(inductance / resistance, "time constant");
}

}  // namespace coilwright
