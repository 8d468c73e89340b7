// The lumped model of a winding at a frequency: R + jwL in parallel with its self-capacitance.
#pragma once

#include <complex>

namespace coilwright::internal {

// Checks R, L, f, C (all >= 0, finite) and that f is at or below the self-resonance when L and
// C are both > 0 (DomainError with the resonance in the message otherwise).
void check_lumped(double resistance, double inductance, double frequency, double self_capacitance);

// 1 - w^2 L C + jwRC: the divider between the series branch and the capacitance.
std::complex<double> capacitive_divider(double resistance, double inductance, double frequency,
                                        double self_capacitance);

}  // namespace coilwright::internal
