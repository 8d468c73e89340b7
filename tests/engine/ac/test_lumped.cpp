// Lumped impedance R + jwL parallel C, drive voltage, series resonance.
#include <gtest/gtest.h>

#include <cmath>
#include <complex>

#include "coilwright/ac.hpp"
#include "coilwright/errors.hpp"

using namespace coilwright;

namespace {
constexpr double kPiLit = 3.14159265358979323846;
}

TEST(CoilImpedance, IsTheAdmittanceSumOfItsBranches) {
    // Independent form: Y = 1 / (R + jwL) + jwC, Z = 1 / Y.
    const double r = 12.0, l = 8e-3, c = 150e-12;
    for (double f : {0.0, 10.0, 1e3, 1e5, 1.2e5, 1.4e5}) {
        const double w = 2.0 * kPiLit * f;
        const std::complex<double> z = 1.0 / (1.0 / std::complex<double>(r, w * l) + std::complex<double>(0.0, w * c));
        const Impedance got = coil_impedance(r, l, f, c);
        EXPECT_NEAR(got.magnitude / std::abs(z), 1.0, 1e-14) << f;
        EXPECT_NEAR(got.phase, std::arg(z) * 180.0 / kPiLit, 1e-12) << f;
    }
    // Without a capacitance: |R + jwL| and atan(wL/R); at 0 Hz the resistance, phase 0.
    EXPECT_DOUBLE_EQ(coil_impedance(3.0, 1e-3, 0.0, 0.0).magnitude, 3.0);
    EXPECT_EQ(coil_impedance(3.0, 1e-3, 0.0, 0.0).phase, 0.0);
    EXPECT_NEAR(coil_impedance(3.0, 4.0 / (2.0 * kPiLit * 50.0), 50.0, 0.0).magnitude, 5.0, 1e-14);
    EXPECT_NEAR(coil_impedance(1.0, 1.0 / (2.0 * kPiLit * 50.0), 50.0, 0.0).phase, 45.0, 1e-12);
}

TEST(CoilImpedance, AboveTheSelfResonanceIsAnError) {
    const double l = 8e-3, c = 150e-12;
    const double srf = coil_srf(l, c);
    EXPECT_NO_THROW(coil_impedance(12.0, l, srf * (1.0 - 1e-12), c));
    EXPECT_THROW(coil_impedance(12.0, l, srf * 1.01, c), DomainError);
    EXPECT_THROW(coil_impedance(0.0, l, srf, c), DomainError);  // lossless: infinite at resonance
    // At resonance the impedance of R + jwL || C is about L / (R C) (Q >> 1), resistive.
    const double r = 1.0;
    const Impedance at = coil_impedance(r, l, 1.0 / (2.0 * kPiLit * std::sqrt(l * c)) * (1.0 - 1e-15), c);
    EXPECT_NEAR(at.magnitude / (l / (r * c)), 1.0, 1e-4);
    EXPECT_THROW(coil_impedance(-1.0, l, 1e3, c), DomainError);
    EXPECT_THROW(coil_impedance(1.0, l, -1e3, c), DomainError);
    EXPECT_THROW(coil_impedance(1.0, -l, 1e3, c), DomainError);
}

TEST(CoilVoltageAc, IsCurrentTimesSeriesImpedance) {
    const double r = 2.0, l = 5e-3, f = 1e3, i = 3.0;
    const double w = 2.0 * kPiLit * f;
    EXPECT_NEAR(coil_voltage_ac(r, l, f, i) / (i * std::sqrt(r * r + w * l * w * l)), 1.0, 1e-15);
    EXPECT_DOUBLE_EQ(coil_voltage_ac(r, l, f, -i), coil_voltage_ac(r, l, f, i));  // an amplitude
    EXPECT_DOUBLE_EQ(coil_voltage_ac(r, l, 0.0, i), r * i);                        // DC: I R
    EXPECT_THROW(coil_voltage_ac(r, l, -1.0, i), DomainError);
}

TEST(Resonance, CapacitorAndItsVoltage) {
    const double l = 12e-3, f = 1e3, i = 2.5;
    const double c = resonance_capacitance(l, f);
    const double w = 2.0 * kPiLit * f;
    EXPECT_NEAR(w * w * l * c, 1.0, 1e-15);             // w^2 L C = 1
    EXPECT_NEAR(coil_srf(l, c) / f, 1.0, 1e-15);         // the same resonance
    EXPECT_NEAR(resonance_cap_voltage(i, l, f) / (i / (w * c)), 1.0, 1e-15);  // I / (w C) = I w L
    EXPECT_THROW(resonance_capacitance(0.0, f), DomainError);  // zero inductance divides
    EXPECT_THROW(resonance_capacitance(l, 0.0), DomainError);
    EXPECT_THROW(resonance_capacitance(l, -f), DomainError);
    EXPECT_THROW(resonance_cap_voltage(i, 0.0, f), DomainError);
    EXPECT_THROW(resonance_cap_voltage(i, l, -f), DomainError);
}
