// The real turns of a layer winding (field/real_turns.hpp) and one turn's sensitivity.
#include <gtest/gtest.h>

#include <cmath>

#include "coilwright/constants.hpp"
#include "coilwright/design.hpp"
#include "coilwright/errors.hpp"
#include "coilwright/field.hpp"
#include "reference_csv.hpp"
#include "test_support.hpp"

namespace coilwright {
namespace {

using test::rel;

// Against sums of elliptic-integral loop fields in mpmath, turns placed by the stated
// conventions (tests/reference/real_turns.csv, generate_higher_order_reference.py).
TEST(RealTurns, MatchesMpmathLoopSums) {
    const auto rows = reference::read_reference("real_turns.csv");
    ASSERT_EQ(rows.size(), 21u);
    for (const auto& row : rows) {
        const LayerWinding w{row.num(0), row.num(1),
                             row.num(2), row.num(3),
                             1.5,        row.cells[4] == "hexagonal" ? Packing::Hexagonal : Packing::Square};
        const FieldRZ b = real_turns_field(w, row.num(5), row.num(6));
        const double scale = std::hypot(row.num(7), row.num(8));
        EXPECT_LE(std::fabs(b.bz - row.num(7)) / scale, 1e-13) << row.num(5) << " " << row.num(6);
        EXPECT_LE(std::fabs(b.br - row.num(8)) / scale, 1e-13) << row.num(5) << " " << row.num(6);
    }
}

TEST(RealTurns, Conventions) {
    const LayerWinding sq{0.02, 0.001, 4, 2, 1.0, Packing::Square};
    const auto t = winding_turn_positions(sq);
    ASSERT_EQ(t.size(), 8u);
    EXPECT_DOUBLE_EQ(t[0].radius, 0.0205);
    EXPECT_DOUBLE_EQ(t[0].z, -0.0015);
    EXPECT_DOUBLE_EQ(t[4].radius, 0.0215);
    const LayerWinding hex{0.02, 0.001, 4, 3, 1.0, Packing::Hexagonal};
    const auto h = winding_turn_positions(hex);
    ASSERT_EQ(h.size(), 11u);  // 4 + 3 + 4
    EXPECT_DOUBLE_EQ(h[4].z, -0.001);
    EXPECT_NEAR(h[4].radius, 0.0205 + 0.001 * std::sqrt(3.0) / 2, 1e-17);
    EXPECT_EQ(winding_total_turns(hex), 11.0);
}

// Far from the winding the turns and the uniform-density coil (COIL_BZ) agree as their dipole
// moments do: sum pi a_j^2 against the smooth coil's mean of pi a^2 over its build, which differ
// by about d^2 / (12 a^2). For fine wire on a large former that is below 1e-6.
TEST(RealTurns, FarFieldAgreesWithSmoothCoil) {
    const LayerWinding w{0.05, 0.0001, 100, 4, 2.0, Packing::Square};  // d^2/(12 a^2) = 3e-7
    EXPECT_LE(real_turns_model_error(w, 3.0, 0.5), 1e-6);
    EXPECT_LE(real_turns_model_error(w, 0.0, 4.0), 1e-6);
    // Coarse wire: the far-field ratio is the ratio of the moments, computed here directly.
    const LayerWinding coarse{0.01, 0.002, 5, 3, 1.0, Packing::Square};
    double turns_moment = 0.0;
    for (const auto& t : winding_turn_positions(coarse)) turns_moment += t.radius * t.radius;
    const ThickCoilSpec s = smooth_winding(coarse);
    const double a1 = s.inner_radius, a2 = s.outer_radius;
    const double smooth_moment = s.turns * (a2 * a2 + a1 * a2 + a1 * a1) / 3.0;  // mean of a^2 over the build
    const double z = 20.0;
    const double ratio = real_turns_field(coarse, z, 0.0).bz / thick_coil_field(s, z, 0.0).bz;
    EXPECT_NEAR(ratio, turns_moment / smooth_moment, 2e-6);
}

// Ampere's law: in the middle of a long coil with an odd number of layers, outside the winding,
// B_phi = mu0 I / (2 pi r); with an even number the layers' currents cancel; inside the first
// layer nothing.
TEST(RealTurns, AxialCurrentFollowsAmpere) {
    const LayerWinding odd{0.01, 0.001, 2000, 3, 2.0, Packing::Square};  // 2 m long
    const double r = 0.02;
    // The finite length lowers it by 1 - 1/sqrt(1 + (2r/L)^2) = 2e-4 (the segment's ends).
    EXPECT_NEAR(real_turns_bphi(odd, 0.0, r) / (kMu0 * 2.0 / (2 * kPi * r)), 1.0, 2.5e-4);
    const LayerWinding even{0.01, 0.001, 2000, 2, 2.0, Packing::Square};
    EXPECT_LE(std::fabs(real_turns_bphi(even, 0.0, r)), 1e-12 * kMu0 * 2.0 / (2 * kPi * r));
    EXPECT_EQ(real_turns_bphi(odd, 0.3, 0.005), 0.0);
    EXPECT_EQ(real_turns_bphi(odd, 0.3, 0.0), 0.0);
    // Between layer 1 (radius 0.0105) and 2 (0.0115): only the first layer's +I.
    EXPECT_NEAR(real_turns_bphi(odd, 0.0, 0.011) / (kMu0 * 2.0 / (2 * kPi * 0.011)), 1.0, 1e-4);
    // The segment formula's end: at the end plane of a long coil half the infinite value.
    EXPECT_NEAR(real_turns_bphi(odd, 1.0, r) / (kMu0 * 2.0 / (2 * kPi * r)), 0.5, 1e-3);
}

TEST(RealTurns, ModelErrorNearWinding) {
    const LayerWinding w{0.02, 0.001, 20, 4, 1.0, Packing::Square};
    const double centre = real_turns_model_error(w, 0.0, 0.0);
    const double near = real_turns_model_error(w, 0.0, 0.0195);
    EXPECT_LT(centre, 1e-3);
    EXPECT_GT(near, centre);  // the granularity shows next to the turns
}

TEST(RealTurns, BadInputs) {
    const LayerWinding ok{0.02, 0.001, 10, 3, 1.0, Packing::Square};
    EXPECT_THROW(real_turns_field({0.0, 0.001, 10, 3, 1.0}, 0, 0), DomainError);
    EXPECT_THROW(real_turns_field({0.02, 0.001, 10.5, 3, 1.0}, 0, 0), DomainError);
    EXPECT_THROW(real_turns_field({0.02, 0.001, 10, 0, 1.0}, 0, 0), DomainError);
    EXPECT_THROW(real_turns_field({0.02, 0.001, 1000, 1000, 1.0}, 0, 0), DomainError);
    EXPECT_THROW(real_turns_field(ok, 0.0005, 0.0205), SingularPointError);  // a wire's centre
    EXPECT_THROW(real_turns_field(ok, 0, -1), DomainError);
    EXPECT_THROW(real_turns_bphi(ok, NAN, 0.1), DomainError);
    // Found by fuzzing: a layer count of a winding never validated gave -inf.
    EXPECT_THROW(layer_turns({0.02, 0.001, -HUGE_VAL, 3, 1.0}, 0), DomainError);
    EXPECT_THROW(layer_turns(ok, 3), DomainError);
    EXPECT_THROW(layer_turns(ok, -1), DomainError);
    EXPECT_THROW(winding_turn_positions({1e308, 1e308, 10, 3, 1.0}), DomainError);
    EXPECT_THROW(real_turns_field({1.0, 1e306, 1000, 3, 1.0}, 0, 0), DomainError);
    EXPECT_EQ(layer_turns({0.02, 0.001, 10, 3, 1.0, Packing::Hexagonal}, 1), 9.0);
}

// One turn: the field change is that turn's own loop field moved or removed (exact); the
// uniform region shrinks when a turn near the end goes missing.
TEST(TurnSensitivity, FieldAndUniformRegion) {
    const LayerWinding w{0.02, 0.001, 10, 3, 1.5, Packing::Square};
    const double missing = turn_sensitivity(w, 2, 1, CoilParameter::Turns, 0.0, SensitivityQuantity::Field, 0.0, 1e-3);
    // Turn 1 of layer 2: radius 0.0215, z = -0.0045.
    EXPECT_NEAR(missing, -loop_field({0.0215, 1.0, 1.5}, 0.0045, 0.0).bz, 1e-20);
    const double moved =
        turn_sensitivity(w, 1, 10, CoilParameter::Position, 1e-4, SensitivityQuantity::Field, 0.0, 1e-3);
    const double expect =
        loop_field({0.0205, 1.0, 1.5}, -0.0046, 0.0).bz - loop_field({0.0205, 1.0, 1.5}, -0.0045, 0.0).bz;
    EXPECT_NEAR(moved, expect, 1e-12 * std::fabs(expect));
    const double shrink = turn_sensitivity(w, 1, 1, CoilParameter::Turns, 0.0, SensitivityQuantity::Uniform, 0.0, 1e-3);
    EXPECT_LT(shrink, 0.0);
    EXPECT_THROW(turn_sensitivity(w, 4, 1, CoilParameter::Turns, 0, SensitivityQuantity::Field, 0, 1e-3), DomainError);
    EXPECT_THROW(turn_sensitivity(w, 1, 11, CoilParameter::Turns, 0, SensitivityQuantity::Field, 0, 1e-3), DomainError);
    EXPECT_THROW(turn_sensitivity(w, 1, 1, CoilParameter::Length, 0, SensitivityQuantity::Field, 0, 1e-3), DomainError);
    EXPECT_THROW(turn_sensitivity(w, 1, 1, CoilParameter::Radius, -1, SensitivityQuantity::Field, 0, 1e-3),
                 DomainError);
}

}  // namespace
}  // namespace coilwright
