// Skin depth and the round-wire R_ac/R_dc through the public functions.
#include <gtest/gtest.h>

#include <cmath>

#include "ac/kelvin.hpp"
#include "coilwright/ac.hpp"
#include "coilwright/errors.hpp"
#include "reference_csv.hpp"

using namespace coilwright;

namespace {
// IEC 60028: annealed copper 1/58 ohm mm^2/m at 20 C, 0.00393 /K. CODATA 2022 mu0.
constexpr double kCopperRho20 = 1e-6 / 58.0;
constexpr double kMu0Codata2022 = 1.25663706127e-6;
constexpr double kPiLiteral = 3.14159265358979323846;
}  // namespace

TEST(SkinDepth, IsItsFormulaWithTheIecResistivity) {
    // delta = sqrt(rho / (pi f mu0)), rho from IEC 60028 at 20 C and at 80 C.
    for (double f : {1e-3, 50.0, 1e3, 1e6, 1e9}) {
        EXPECT_NEAR(skin_depth(f, Conductor::Copper, 20.0) / std::sqrt(kCopperRho20 / (kPiLiteral * f * kMu0Codata2022)),
                    1.0, 1e-15);
        const double rho80 = kCopperRho20 * (1.0 + 0.00393 * 60.0);
        EXPECT_NEAR(skin_depth(f, Conductor::Copper, 80.0) / std::sqrt(rho80 / (kPiLiteral * f * kMu0Codata2022)), 1.0,
                    1e-15);
    }
    // Common practice (from memory): copper at 20 C, about 9.3 mm at 50 Hz and 66 um at 1 MHz.
    EXPECT_NEAR(skin_depth(50.0, Conductor::Copper, 20.0), 9.35e-3, 0.01e-3);
    EXPECT_NEAR(skin_depth(1e6, Conductor::Copper, 20.0), 66.1e-6, 0.1e-6);
    // Aluminium (IEC 60889, 0.028264 ohm mm^2/m) is the more resistive: a deeper skin.
    EXPECT_NEAR(skin_depth(1e3, Conductor::Aluminium, 20.0) / skin_depth(1e3, Conductor::Copper, 20.0),
                std::sqrt(0.028264e-6 / kCopperRho20), 1e-15);
}

TEST(SkinDepth, RejectsBadArguments) {
    EXPECT_THROW(skin_depth(0.0, Conductor::Copper, 20.0), DomainError);
    EXPECT_THROW(skin_depth(-50.0, Conductor::Copper, 20.0), DomainError);
    EXPECT_THROW(skin_depth(INFINITY, Conductor::Copper, 20.0), DomainError);
    EXPECT_THROW(skin_depth(50.0, Conductor::Copper, 401.0), DomainError);
}

TEST(WireRacRatio, UsesTheKelvinSolutionAtXEqualsDOverSqrt2Delta) {
    for (double d : {1e-4, 1e-3, 5e-3})
        for (double f : {50.0, 1e3, 1e5, 1e7}) {
            const double x = d / (std::sqrt(2.0) * skin_depth(f, Conductor::Copper, 20.0));
            EXPECT_NEAR(wire_rac_ratio(d, f, Conductor::Copper, 20.0) / internal::round_wire_resistance_ratio(x), 1.0, 1e-14);
        }
}

TEST(WireRacRatio, AgreesWithMpmathThroughTheSkinDepth) {
    // Source: mpmath (kelvin.csv). A wire whose d / (sqrt2 delta) equals a reference x.
    const auto rows = reference::read_reference("kelvin.csv");
    const double f = 1e5;
    const double delta = skin_depth(f, Conductor::Copper, 20.0);
    for (const auto& row : rows) {
        const double x = row.num(0);
        const double d = x * std::sqrt(2.0) * delta;
        EXPECT_NEAR(wire_rac_ratio(d, f, Conductor::Copper, 20.0) / row.num(5), 1.0, 1e-12) << x;
    }
}

TEST(WireRacRatio, DcAndLimits) {
    EXPECT_EQ(wire_rac_ratio(1e-3, 0.0, Conductor::Copper, 20.0), 1.0);
    // 1 mm copper at 50 Hz: (a/delta)^4/48 of excess, 5e-7 (low-frequency limit).
    const double a_over_delta = 0.5e-3 / skin_depth(50.0, Conductor::Copper, 20.0);
    EXPECT_NEAR(wire_rac_ratio(1e-3, 50.0, Conductor::Copper, 20.0) - 1.0, std::pow(a_over_delta, 4) / 48.0, 1e-12);
    // A diameter of a thousand skin depths: a/(2 delta) + 1/4 + 3 delta/(32 a) (high-frequency limit).
    const double delta = skin_depth(1e6, Conductor::Copper, 20.0);
    const double big = 500.0;
    EXPECT_NEAR(wire_rac_ratio(2.0 * big * delta, 1e6, Conductor::Copper, 20.0), big / 2.0 + 0.25 + 3.0 / (32.0 * big),
                1e-6);
    // A hot wire is more resistive, so its skin is deeper and its ratio lower.
    EXPECT_LT(wire_rac_ratio(2e-3, 1e4, Conductor::Copper, 100.0), wire_rac_ratio(2e-3, 1e4, Conductor::Copper, 20.0));
}

TEST(WireRacRatio, RejectsBadArguments) {
    EXPECT_THROW(wire_rac_ratio(0.0, 50.0, Conductor::Copper, 20.0), DomainError);
    EXPECT_THROW(wire_rac_ratio(1e-3, -1.0, Conductor::Copper, 20.0), DomainError);
    EXPECT_THROW(wire_rac_ratio(1e-3, NAN, Conductor::Copper, 20.0), DomainError);
    EXPECT_THROW(wire_rac_ratio(1e-3, 50.0, Conductor::Copper, -101.0), DomainError);
    EXPECT_THROW(wire_rac_ratio(1e300, 1e300, Conductor::Copper, 20.0), DomainError);  // x overflows
}
