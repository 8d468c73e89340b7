// Windings whose cross-sections keep a gap: one tensor Gauss rule over loop fields
// (engine/src/inductance/separated_sections.cpp) against the engine's refining cubature of
// Maxwell's formula (section_integral.cpp, about 1e-15: test_winding_inductance.cpp), for every
// kind of winding (thick, sheet, flat, loop), gaps along the axis and across it.
#include <gtest/gtest.h>

#include <algorithm>
#include <cmath>
#include <cstdio>
#include <random>

#include "coilwright/inductance.hpp"
#include "inductance/section_integral.hpp"
#include "inductance/separated_sections.hpp"
#include "test_support.hpp"

using namespace coilwright;
using namespace coilwright::internal;
using coilwright::test::rel;

namespace {

constexpr int kEven = 1, kOdd = -1;

struct Pair {
    CoilSection w1, w2;
    double d;
    SectionGap gap() const {
        const double radial = std::max(0.0, std::max(w1.inner_radius, w2.inner_radius) - std::min(w1.outer_radius, w2.outer_radius));
        const double axial = std::max(0.0, std::fabs(d) - 0.5 * (w1.length + w2.length));
        return {std::hypot(radial, axial), radial};
    }
};

// Windings up to radius 1 of each kind; every third pair is nested (a radial gap), the others
// are side by side along the axis with gaps from 1 % to 3 lengths.
struct RandomPairs {
    std::mt19937_64 rng{20261203};
    std::uniform_real_distribution<double> unit{0.0, 1.0};
    CoilSection winding(int kind, double inner) {
        const double build = (kind & 1) ? (0.01 + 0.5 * unit(rng)) * inner : 0.0;
        const double length = (kind & 2) ? 0.01 + unit(rng) : 0.0;
        return {inner, inner + build, length};
    }
    Pair next(int t) {
        const double a1 = 0.1 + 0.8 * unit(rng);
        const CoilSection w1 = winding(t % 4, a1);
        if (t % 3 == 0) {
            const CoilSection w2 = winding((t / 4) % 4, w1.outer_radius * (1.01 + unit(rng)));
            return {w1, w2, (unit(rng) - 0.5) * (w1.length + w2.length)};
        }
        const CoilSection w2 = winding((t / 4) % 4, 0.1 + 0.8 * unit(rng));
        const double reach = 0.5 * (w1.length + w2.length);
        const double gap = (0.01 + 3.0 * unit(rng) * unit(rng)) * std::max(0.05, 2.0 * reach);
        return {w1, w2, (t % 2 ? 1.0 : -1.0) * (reach + gap)};
    }
};

}  // namespace

TEST(SeparatedSections, AgreesWithTheCubature) {
    RandomPairs random;
    double worst[2] = {0, 0};
    int used = 0;
    for (int t = 0; t < 240; ++t) {
        const Pair p = random.next(t);
        for (const FilamentKernel kernel : {FilamentKernel::Mutual, FilamentKernel::Slope}) {
            const bool slope = kernel == FilamentKernel::Slope;
            const OffsetWeights u = winding_offsets(p.w1.length, p.w2.length, p.d, slope ? kOdd : kEven);
            const RadialExtent r1{p.w1.inner_radius, p.w1.outer_radius}, r2{p.w2.inner_radius, p.w2.outer_radius};
            const auto got = average_over_separated_sections(r1, r2, u, kernel, p.gap(), 1'000'000);
            if (!got) continue;  // too close for one rule of at most 20 points a side
            ++used;
            const double ref = average_over_sections(r1, r2, u, kernel);
            if (slope && std::fabs(ref) < 1e-9 * std::fabs(average_over_sections(r1, r2, winding_offsets(p.w1.length, p.w2.length, p.d, kEven), FilamentKernel::Mutual)))
                continue;  // a slope that nearly vanishes (nested windings near their centres): relative error meaningless
            const double e = rel(*got, ref);
            EXPECT_LT(e, 1e-13) << t << (slope ? " slope" : " mutual") << " d " << p.d;
            worst[slope] = std::max(worst[slope], e);
        }
    }
    EXPECT_GT(used, 300);
    std::printf("separated windings: worst relative error %.1e (M), %.1e (dM/dz) over %d rules\n", worst[0], worst[1], used);
}

TEST(SeparatedSections, FartherApartTakesFewerNodes) {
    // Two thick windings along the axis: the rule must be taken (within the work cap) from a gap of
    // a third of the windings' size on, and with a smaller cap as the gap grows.
    const CoilSection w1{0.1, 0.13, 0.1}, w2{0.08, 0.12, 0.05};
    int previous_cap = 1'000'000;
    for (double gap : {0.03, 0.1, 0.3, 1.0}) {
        const Pair p{w1, w2, 0.075 + gap};
        const OffsetWeights u = winding_offsets(w1.length, w2.length, p.d, kEven);
        int cap = 1;
        while (!average_over_separated_sections({0.1, 0.13}, {0.08, 0.12}, u, FilamentKernel::Mutual, p.gap(), cap)) cap *= 2;
        EXPECT_LE(cap, previous_cap) << gap;
        previous_cap = cap;
    }
    EXPECT_LE(previous_cap, 512);
}

TEST(SeparatedSections, TouchingOrOverlappingIsLeftToTheOtherMethods) {
    const OffsetWeights u = winding_offsets(0.1, 0.1, 0.1, kEven);  // axially touching
    EXPECT_FALSE(average_over_separated_sections({0.1, 0.2}, {0.1, 0.2}, u, FilamentKernel::Mutual, {0.0, 0.0}, 1'000'000));
}

TEST(SeparatedSections, TwoLoopsGetMaxwellsFormulaExactly) {
    EXPECT_EQ(coil_mutual_inductance({1, 1, 0}, {0.6, 0.6, 0}, 0.2), loop_mutual_inductance(1, 0.6, 0.2));
    EXPECT_EQ(coil_mutual_inductance_slope({1, 1, 0}, {0.6, 0.6, 0}, -0.2), loop_mutual_inductance_slope(1, 0.6, -0.2));
}

TEST(SeparatedSections, SmallWindingsCloseTogetherKeepTheirDigits) {
    // Windings 1e-3 and 1e-5 of their radius across, that far apart along the axis or across it:
    // M from loop fields by Euler's relation would cancel up to 1e4-fold (errors to 6e-13 measured
    // without the guard); the rule must notice and keep 1e-13 against the cubature.
    for (const double size : {1e-3, 1e-5}) {
        for (const bool nested : {false, true}) {
            const RadialExtent r1{1.0, 1.0 + size};
            const RadialExtent r2{1.0 + (nested ? 1.5 : 0.5) * size, 1.0 + (nested ? 2.5 : 1.5) * size};
            const double d = nested ? 0.3 * size : 2.0 * size;  // lengths `size`
            const OffsetWeights u = winding_offsets(size, size, d, kEven);
            const SectionGap gap = nested ? SectionGap{0.5 * size, 0.5 * size} : SectionGap{size, 0.0};
            const auto got = average_over_separated_sections(r1, r2, u, FilamentKernel::Mutual, gap, 1'000'000);
            ASSERT_TRUE(got.has_value()) << size;
            EXPECT_LT(rel(*got, average_over_sections(r1, r2, u, FilamentKernel::Mutual)), 1e-13) << size << " " << nested;
        }
    }
}

TEST(SeparatedSections, ShortWindingsFarAwayKeepTheirShare) {
    // A winding whose length is below a few units in the last place of the distance: the rounded
    // ends of its offset range misstate the width (a 1e-2 error at 1e-14, M = 0 below 1e-16
    // before the fix). Its M must be the loop's, to the (length / distance)^2 it differs by.
    for (const double ratio : {1e-10, 1e-14, 1e-17}) {
        const double d = 3.0, h = ratio * d;
        EXPECT_LT(rel(coil_mutual_inductance({1, 1, 0}, {0.5, 0.5, h}, d), loop_mutual_inductance(1, 0.5, d)), 1e-13) << ratio;
        EXPECT_LT(rel(coil_mutual_inductance({1, 1, h}, {0.5, 0.5, 2 * h}, d), loop_mutual_inductance(1, 0.5, d)), 1e-13) << ratio;
        EXPECT_LT(rel(coil_mutual_inductance_slope({1, 1, h}, {0.5, 0.5, h}, -d), loop_mutual_inductance_slope(1, 0.5, -d)), 1e-13)
            << ratio;
    }
}
