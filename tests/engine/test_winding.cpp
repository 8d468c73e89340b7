// Layer winding counts, build, wire length and fill against hand counts of the stated model.
#include <gtest/gtest.h>

#include <cmath>

#include "coilwright/constants.hpp"
#include "coilwright/errors.hpp"
#include "coilwright/wire.hpp"
#include "test_support.hpp"

using namespace coilwright;
using coilwright::test::rel;

namespace {
constexpr auto kSq = Packing::Square;
constexpr auto kHex = Packing::Hexagonal;
}  // namespace

TEST(Winding, SquarePackingCountsByHand) {
    // 1 mm wire in a 5 mm x 10 mm window: 5 layers of 10 turns.
    EXPECT_EQ(winding_layers(5e-3, 1e-3, kSq), 5);
    EXPECT_EQ(winding_turns_per_layer(10e-3, 1e-3), 10);
    EXPECT_EQ(winding_turns(5e-3, 10e-3, 1e-3, kSq), 50);
    // Exact fits count despite binary rounding (0.1 / 0.001 is not exactly 100 in floating point).
    EXPECT_EQ(winding_turns_per_layer(0.1, 0.001), 100);
    EXPECT_EQ(winding_turns_per_layer(0.3, 0.1), 3);
    EXPECT_EQ(winding_turns_per_layer(0.0999, 0.001), 99);
    EXPECT_EQ(winding_layers(0.9e-3, 1e-3, kSq), 0);
}

TEST(Winding, HexagonalPackingCountsByHand) {
    // Layer pitch d sqrt(3)/2: 5 mm of build holds 1 + floor(4 / 0.866) = 5 layers of 1 mm wire.
    EXPECT_EQ(winding_layers(5e-3, 1e-3, kHex), 5);
    EXPECT_EQ(winding_layers(1e-3 + 2 * std::sqrt(3.0) / 2 * 1e-3, 1e-3, kHex), 3);  // exactly 3
    // Odd layers hold 10 turns, even layers (in the grooves) 9 when the window is 10 mm long:
    // 3 x 10 + 2 x 9 = 48. A 10.5 mm window gives 10 in every layer: 50.
    EXPECT_EQ(winding_turns(5e-3, 10e-3, 1e-3, kHex), 48);
    EXPECT_EQ(winding_turns(5e-3, 10.5e-3, 1e-3, kHex), 50);
    // Hexagonal fits more layers than square when the build is deep: 10 mm -> 11 layers vs 10.
    EXPECT_EQ(winding_layers(10e-3, 1e-3, kHex), 11);
}

TEST(Winding, BuildAndWireLengthByHand) {
    // 25 turns of 1 mm wire, 10 mm long, on a 10 mm radius former, square packing:
    // 10 turns at centre radius 10.5 mm, 10 at 11.5 mm, 5 at 12.5 mm; build 3 mm.
    EXPECT_LT(rel(winding_build(25, 10e-3, 1e-3, kSq), 3e-3), 1e-15);
    EXPECT_LT(rel(winding_wire_length(10e-3, 10e-3, 1e-3, 25, kSq), 2 * kPi * (10 * 10.5 + 10 * 11.5 + 5 * 12.5) * 1e-3),
              1e-14);
    // Hexagonal: 10 + 9 + 6 turns at 10.5, 10.5 + 0.866, 10.5 + 1.732 mm; build 1 + 2 x 0.866 mm.
    const double p = std::sqrt(3.0) / 2;
    EXPECT_LT(rel(winding_build(25, 10e-3, 1e-3, kHex), (1 + 2 * p) * 1e-3), 1e-15);
    EXPECT_LT(rel(winding_wire_length(10e-3, 10e-3, 1e-3, 25, kHex),
                  2 * kPi * (10 * 10.5 + 9 * (10.5 + p) + 6 * (10.5 + 2 * p)) * 1e-3),
              1e-14);
    EXPECT_EQ(winding_build(0, 10e-3, 1e-3, kHex), 0.0);
    EXPECT_EQ(winding_wire_length(10e-3, 10e-3, 1e-3, 0, kSq), 0.0);
}

TEST(Winding, ClosedFormWireLengthEqualsLayerByLayerSum) {
    for (Packing packing : {kSq, kHex})
        for (double n : {1.0, 10.0, 19.0, 20.0, 21.0, 389.0, 12345.0}) {
            const double d = 0.8e-3, len = 15.3e-3, ri = 20e-3;
            const double pitch = packing == kSq ? d : d * std::sqrt(3.0) / 2;
            double left = n, sum = 0;
            for (int layer = 1; left > 0; ++layer) {
                const double in_layer = (layer % 2 == 1 || packing == kSq) ? std::floor(len / d) : std::floor(len / d - 0.5);
                const double here = std::min(left, in_layer);
                sum += here * 2 * kPi * (ri + d / 2 + (layer - 1) * pitch);
                left -= here;
            }
            EXPECT_LT(rel(winding_wire_length(ri, len, d, n, packing), sum), 1e-13) << n;
            // The build from winding_build holds the turns, and one layer less does not.
            const double build = winding_build(n, len, d, packing);
            EXPECT_GE(winding_turns(build, len, d, packing), n);
            EXPECT_LT(winding_turns(build - 0.5 * pitch, len, d, packing), n);
        }
}

TEST(Winding, FillAndMeanTurn) {
    // 50 turns of 0.9 mm bare wire in 5 mm x 10 mm: 50 * pi * 0.81 / 4 / 50.
    EXPECT_LT(rel(winding_fill(50, 0.9e-3, 5e-3, 10e-3), kPi * 0.81 / 4), 1e-15);
    EXPECT_THROW(winding_fill(100, 1e-3, 5e-3, 10e-3), DomainError);  // fill 1.57: impossible
    EXPECT_LT(rel(winding_mean_turn(0.1, 0.12), kPi * 0.22), 1e-15);
    // Sharp-cornered rectangular former 0.5 x 0.3 m, 20 mm build: 2 (0.8) + pi 0.02.
    EXPECT_LT(rel(winding_mean_turn_rect(0.5, 0.3, 0.02), 1.6 + kPi * 0.02), 1e-15);
    // It is the mean over the build of the turn length at distance t, 2 (w + h) + 2 pi t.
    EXPECT_LT(rel(winding_mean_turn_rect(0.5, 0.3, 0.0), 1.6), 1e-15);
}

TEST(Winding, BadArgumentsAreErrors) {
    EXPECT_THROW(winding_layers(-1e-3, 1e-3, kSq), DomainError);
    EXPECT_THROW(winding_layers(1e-3, 0.0, kSq), DomainError);
    EXPECT_THROW(winding_turns(1.0, 1.0, 1e-12, kSq), DomainError);  // 1e12 turns per layer: units
    EXPECT_THROW(winding_build(2.5, 10e-3, 1e-3, kSq), DomainError);  // not a whole number
    EXPECT_THROW(winding_build(-1, 10e-3, 1e-3, kSq), DomainError);
    EXPECT_THROW(winding_build(5, 0.5e-3, 1e-3, kSq), DomainError);   // wire longer than the window
    EXPECT_THROW(winding_build(5, 1.2e-3, 1e-3, kHex), DomainError);  // no groove for layer 2
    EXPECT_THROW(winding_wire_length(0.0, 10e-3, 1e-3, 5, kSq), DomainError);
    EXPECT_THROW(winding_mean_turn(0.2, 0.1), DomainError);
    EXPECT_THROW(winding_mean_turn_rect(0.2, -0.1, 0.0), DomainError);
    EXPECT_THROW(winding_layers(5e-3, 1e-3, static_cast<Packing>(2)), DomainError);
}
