// Impedance and drive voltage of a winding, series resonance.
#include <charconv>
#include <cmath>
#include <complex>
#include <string>

#include "ac/lumped.hpp"
#include "coilwright/ac.hpp"
#include "numerics/checks.hpp"
#include "coilwright/constants.hpp"
#include "coilwright/errors.hpp"

namespace coilwright {

using namespace internal;

namespace internal {

void check_lumped(double resistance, double inductance, double frequency, double self_capacitance) {
    check::non_negative(resistance, "resistance");
    check::non_negative(inductance, "inductance");
    check::non_negative(frequency, "frequency");
    check::non_negative(self_capacitance, "self-capacitance");
    if (inductance > 0.0 && self_capacitance > 0.0) {
        const double srf = 1.0 / (2.0 * kPi * std::sqrt(inductance) * std::sqrt(self_capacitance));
        if (frequency > srf) {
            char number[32];
            const auto end = std::to_chars(number, number + sizeof number, srf, std::chars_format::general, 4).ptr;
            throw DomainError("frequency is above the self-resonance (" + std::string(number, end) +
                              " Hz): there the winding acts as a distributed line that the lumped model does not "
                              "describe");
        }
    }
}

std::complex<double> capacitive_divider(double resistance, double inductance, double frequency,
                                        double self_capacitance) {
    const double w = 2.0 * kPi * frequency;
    // 1 - w^2 L C written with (w sqrt(LC))^2, so large and small factors do not over- or underflow.
    const double wlc = w * std::sqrt(inductance) * std::sqrt(self_capacitance);
    return {1.0 - wlc * wlc, w * resistance * self_capacitance};
}

}  // namespace internal

Impedance coil_impedance(double resistance, double inductance, double frequency, double self_capacitance) {
    internal::check_lumped(resistance, inductance, frequency, self_capacitance);
    const double w = 2.0 * kPi * frequency;
    const std::complex<double> series(resistance, w * inductance);
    const std::complex<double> divider = internal::capacitive_divider(resistance, inductance, frequency, self_capacitance);
    if (divider == 0.0)
        throw SingularPointError("the impedance of a lossless winding is infinite at its self-resonance");
    const std::complex<double> z = series / divider;
    return {check::finite_result(std::abs(z), "impedance"), std::arg(z) * 180.0 / kPi};
}

double coil_voltage_ac(double resistance, double inductance, double frequency, double current) {
    check::non_negative(resistance, "resistance");
    check::non_negative(inductance, "inductance");
    check::non_negative(frequency, "frequency");
    check::finite(current, "current");
    const double reactance = check::finite_result(2.0 * kPi * frequency * inductance, "reactance");
    return check::finite_result(std::fabs(current) * std::hypot(resistance, reactance), "voltage");
}

namespace {

void check_resonance(double inductance, double frequency) {
    if (!(std::isfinite(inductance) && inductance > 0.0))
        throw DomainError("inductance must be a finite number > 0 (the resonance divides by it)");
    if (!(std::isfinite(frequency) && frequency > 0.0))
        throw DomainError("frequency must be a finite number > 0 (no capacitor resonates at 0 Hz)");
}

}  // namespace

double resonance_capacitance(double inductance, double frequency) {
    check_resonance(inductance, frequency);
    const double w = 2.0 * kPi * frequency;
    return check::finite_result(1.0 / (w * w) / inductance, "capacitance");
}

double resonance_cap_voltage(double current, double inductance, double frequency) {
    check::finite(current, "current");
    check_resonance(inductance, frequency);
    return check::finite_result(std::fabs(current) * 2.0 * kPi * frequency * inductance, "capacitor voltage");
}

}  // namespace coilwright
