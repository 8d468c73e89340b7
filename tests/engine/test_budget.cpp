// Electrical and thermal budget: hand calculations of the stated models, IEC 60085 classes.
#include <gtest/gtest.h>

#include <cmath>

#include "coilwright/wire.hpp"
#include "coilwright/constants.hpp"
#include "coilwright/errors.hpp"
#include "test_support.hpp"

using namespace coilwright;
using coilwright::test::rel;

namespace {
constexpr auto kCu = Conductor::Copper;
}  // namespace

TEST(Budget, ResistanceVoltagePowerCurrentDensity) {
    // 200 turns of 0.5 m mean turn in 1 mm copper at 20 C: 100 m * (1/58 ohm mm^2/m) / (pi/4 mm^2).
    const double r = coil_resistance(200, 0.5, 1e-3, kCu, 20.0);
    EXPECT_LT(rel(r, 100.0 / 58.0 / (kPi / 4)), 1e-15);
    EXPECT_LT(rel(coil_resistance(200, 0.5, 1e-3, kCu, 80.0), r * (1 + 0.00393 * 60)), 1e-15);  // IEC 60028
    EXPECT_EQ(coil_voltage(2.0, 3.0), 6.0);
    EXPECT_EQ(coil_voltage(2.0, -3.0), -6.0);
    EXPECT_EQ(coil_power(2.0, -3.0), 18.0);
    EXPECT_LT(rel(coil_current_density(-2.0, 1e-3), 2.0 / (kPi / 4 * 1e-6)), 1e-15);
}

TEST(Budget, CoolingAreaAndRise) {
    // Outer cylinder 2 pi 0.1 * 0.05 plus two annuli pi (0.1^2 - 0.08^2) each.
    EXPECT_LT(rel(coil_cooling_area(0.08, 0.1, 0.05), 2 * kPi * 0.1 * 0.05 + 2 * kPi * (0.01 - 0.0064)), 1e-15);
    EXPECT_EQ(coil_temperature_rise(20.0, 0.5, 10.0), 4.0);
    // Rectangular former 1 m x 0.5 m, 10 mm build, 20 mm long: outer (3 + 2 pi 0.01) 0.02,
    // ends 2 (3 * 0.01 + pi 0.01^2). The end face is the integral over the build of the turn
    // length 2 (w + h) + 2 pi t (WINDING_MEAN_TURN_RECT's model).
    EXPECT_LT(rel(coil_cooling_area_rect(1.0, 0.5, 0.01, 0.02), (3 + 2 * kPi * 0.01) * 0.02 + 2 * (0.03 + kPi * 1e-4)), 1e-15);
    EXPECT_THROW(coil_cooling_area_rect(1.0, 0.5, 0.0, 0.02), DomainError);
}

TEST(Budget, HotStateAtCurrentMatchesAHandCalculation) {
    // Hand calculation: R20 = 2 ohm copper, 3 A, A = 0.05 m^2, h = 10 W/(m^2 K), Ta = 25 C.
    //   k = I^2 R20 / (h A) = 9 * 2 / 0.5 = 36 K;  R(Ta)/R20 = 1 + 0.00393 * 5 = 1.01965
    //   rise = 36 * 1.01965 / (1 - 0.00393 * 36) = 36.7074 / 0.85852 = 42.7566 K -> T = 67.7566 C
    //   R = 2 (1 + 0.00393 * 47.7566) = 2.375367 ohm; check: I^2 R = 21.378 W = h A rise.
    const HotState s = hot_state_at_current(2.0, 3.0, 0.05, 25.0, 10.0, kCu);
    EXPECT_NEAR(s.temperature, 67.7566, 1e-4);
    EXPECT_NEAR(s.resistance, 2.375367, 1e-6);
    EXPECT_LT(rel(9.0 * s.resistance, 10.0 * 0.05 * (s.temperature - 25.0)), 1e-14);  // heat balance
    // The same by fixed-point iteration T <- Ta + I^2 R(T) / (h A) (converges: alpha k < 1).
    double t = 25.0;
    for (int i = 0; i < 200; ++i) t = 25.0 + 9.0 * 2.0 * (1 + 0.00393 * (t - 20.0)) / 0.5;
    EXPECT_LT(rel(s.temperature, t), 1e-13);
}

TEST(Budget, ThermalRunawayIsAnError) {
    // alpha k >= 1 when I^2 >= h A / (alpha R20) = 0.5 / (0.00393 * 2): I >= 7.976 A.
    EXPECT_THROW(hot_state_at_current(2.0, 8.0, 0.05, 25.0, 10.0, kCu), DomainError);
    // Just below it a steady state exists on paper, but above 400 C: also an error, not a number.
    EXPECT_THROW(hot_state_at_current(2.0, 7.9, 0.05, 25.0, 10.0, kCu), DomainError);
    EXPECT_NO_THROW(hot_state_at_current(2.0, 5.0, 0.05, 25.0, 10.0, kCu));
}

TEST(Budget, HotStateAtVoltageMatchesAHandCalculation) {
    // 6 V on R20 = 2 ohm, same cooling: q = V^2 / (R20 h A) = 36 K; rise solves
    // 0.00393 x^2 + 1.01965 x - 36 = 0: x = 2 * 36 / (1.01965 + sqrt(1.01965^2 + 4 * 0.00393 * 36))
    //   = 72 / (1.01965 + 1.2671251) = 31.48539 K.
    const HotState s = hot_state_at_voltage(2.0, 6.0, 0.05, 25.0, 10.0, kCu);
    EXPECT_NEAR(s.temperature - 25.0, 31.48539, 1e-5);
    EXPECT_LT(rel(36.0 / s.resistance, 0.5 * (s.temperature - 25.0)), 1e-14);  // heat balance V^2/R = h A rise
    // Constant voltage never runs away: a huge voltage settles (here above 400 C: an error).
    EXPECT_THROW(hot_state_at_voltage(2.0, 1e3, 0.05, 25.0, 10.0, kCu), DomainError);
}

TEST(Budget, MaxCurrentReachesExactlyTheLimit) {
    // Class F (155 C) less a 10 K hot-spot allowance: 145 C. R(145) = 2 (1 + 0.00393 * 125) = 2.9825;
    // I = sqrt(0.5 * 120 / 2.9825) = 4.48523 A.
    const double i = coil_max_current(2.0, 0.05, 145.0, 25.0, 10.0, kCu);
    EXPECT_NEAR(i, 4.48523, 1e-5);
    EXPECT_NEAR(hot_state_at_current(2.0, i, 0.05, 25.0, 10.0, kCu).temperature, 145.0, 1e-10);
    EXPECT_THROW(coil_max_current(2.0, 0.05, 20.0, 25.0, 10.0, kCu), DomainError);
}

TEST(Budget, InsulationClassesOfIec60085) {
    // IEC 60085 thermal classes: 90 (Y), 105 (A), 120 (E), 130 (B), 155 (F), 180 (H), 200 (N),
    // 220 (R), 250: the table of IEC 60085:2007 as adopted identically by TCVN 8086:2009 (the
    // classes, their letters, and above 250 steps of 25).
    for (double k : {90.0, 105.0, 120.0, 130.0, 155.0, 180.0, 200.0, 220.0, 250.0}) EXPECT_EQ(insulation_class_limit(k), k);
    for (double k : {0.0, 100.0, 150.0, 275.0, 155.5}) EXPECT_THROW(insulation_class_limit(k), DomainError);
    EXPECT_EQ(insulation_margin(155.0, 120.0, 10.0), 25.0);
    EXPECT_EQ(insulation_margin(130.0, 125.0, 10.0), -5.0);  // overheated: negative
    EXPECT_THROW(insulation_margin(130.0, 100.0, -1.0), DomainError);
}

TEST(Budget, EnergyAndTimeConstant) {
    EXPECT_LT(rel(coil_energy(0.05, 3.0), 0.225), 1e-15);  // L I^2 / 2
    EXPECT_EQ(coil_energy(0.05, -3.0), coil_energy(0.05, 3.0));
    EXPECT_LT(rel(coil_time_constant(0.05, 2.0), 0.025), 1e-15);  // L / R
    EXPECT_THROW(coil_time_constant(0.05, 0.0), DomainError);
    EXPECT_THROW(coil_energy(-1.0, 1.0), DomainError);
}

TEST(Budget, BadArgumentsAreErrors) {
    EXPECT_THROW(coil_resistance(-1, 0.5, 1e-3, kCu, 20), DomainError);
    EXPECT_THROW(coil_resistance(10, 0.0, 1e-3, kCu, 20), DomainError);
    EXPECT_THROW(coil_cooling_area(0.1, 0.08, 0.05), DomainError);
    EXPECT_THROW(coil_temperature_rise(-1, 0.5, 10), DomainError);
    EXPECT_THROW(coil_temperature_rise(1, 0.5, 0), DomainError);
    EXPECT_THROW(hot_state_at_current(0.0, 1, 0.05, 25, 10, kCu), DomainError);
    EXPECT_THROW(hot_state_at_current(2.0, 1, 0.05, -150, 10, kCu), DomainError);
    EXPECT_THROW(hot_state_at_current(2.0, 1e200, 0.05, 25, 10, kCu), DomainError);
    EXPECT_THROW(coil_power(-1, 1), DomainError);
}
