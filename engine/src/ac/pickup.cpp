// Pickup (search) coils: induced EMF, effective area, sensitivity and noise.
#include <cmath>
#include <complex>

#include "ac/lumped.hpp"
#include "coilwright/ac.hpp"
#include "numerics/checks.hpp"
#include "coilwright/constants.hpp"
#include "coilwright/errors.hpp"

namespace coilwright {

using namespace internal;

namespace {

double absolute_temperature(double temperature_c) {
    check::finite(temperature_c, "temperature");
    if (!(temperature_c > -kZeroCelsius)) throw DomainError("temperature must be above absolute zero (-273.15 C)");
    return temperature_c + kZeroCelsius;
}

}  // namespace

double pickup_emf(double turns, double area, double frequency, double field) {
    check::non_negative(turns, "turns");
    check::non_negative(area, "area");
    check::non_negative(frequency, "frequency");
    check::non_negative(field, "field amplitude");
    return check::finite_result(2.0 * kPi * frequency * turns * area * field, "EMF");
}

double pickup_area(double inner_radius, double outer_radius, double length, double turns) {
    check::radial_extent(inner_radius, outer_radius);
    check::non_negative(length, "length");
    check::non_negative(turns, "turns");
    const double mean_square =
        (inner_radius * inner_radius + inner_radius * outer_radius + outer_radius * outer_radius) / 3.0;
    return check::finite_result(turns * kPi * mean_square, "area");
}

double pickup_sensitivity(double turns, double area, double frequency, double resistance, double inductance,
                          double self_capacitance) {
    check::non_negative(turns, "turns");
    check::non_negative(area, "area");
    internal::check_lumped(resistance, inductance, frequency, self_capacitance);
    const double divider = std::abs(internal::capacitive_divider(resistance, inductance, frequency, self_capacitance));
    if (divider == 0.0)
        throw SingularPointError("the sensitivity of a lossless coil is infinite at its self-resonance");
    return check::finite_result(2.0 * kPi * frequency * turns * area / divider, "sensitivity");
}

double johnson_noise(double resistance, double temperature_c, double bandwidth) {
    check::non_negative(resistance, "resistance");
    const double t = absolute_temperature(temperature_c);
    check::positive(bandwidth, "bandwidth");
    return check::finite_result(std::sqrt(4.0 * kBoltzmann * t * resistance * bandwidth), "noise voltage");
}

double pickup_nef(double turns, double area, double frequency, double resistance, double temperature_c,
                  double inductance, double self_capacitance, double amplifier_noise) {
    check::positive(turns, "turns");
    check::positive(area, "area");
    if (!(std::isfinite(frequency) && frequency > 0.0))
        throw DomainError("frequency must be a finite number > 0 (a pickup coil sees no field at 0 Hz)");
    const double t = absolute_temperature(temperature_c);
    check::non_negative(amplifier_noise, "amplifier noise");
    internal::check_lumped(resistance, inductance, frequency, self_capacitance);
    const double divider = std::abs(internal::capacitive_divider(resistance, inductance, frequency, self_capacitance));
    // The coil's own noise passes the same divider as its EMF; the amplifier's does not:
    // NEF = sqrt(4kTR + (e_a |divider|)^2) / (w N A).
    const double thermal = 4.0 * kBoltzmann * t * resistance;
    const double amplifier = amplifier_noise * divider;
    const double noise = std::sqrt(thermal + amplifier * amplifier);
    return check::finite_result(noise / (2.0 * kPi * frequency * turns * area), "noise-equivalent field");
}

}  // namespace coilwright
