// The batch loop field gives exactly what loop_field gives, point by point, in both copies of
// its code (baseline x86-64, and AVX2 with FMA against loop_field computed the same way), and
// NaN exactly where loop_field throws; the two copies agree to a few units in the last place;
// and the batch compiled on plain arrays instead of compiler vector types (the portable
// layer's fallback, numerics/lanes.hpp) gives the same bits as the engine's.
#include <gtest/gtest.h>

#include <algorithm>
#include <cmath>
#include <cstdint>
#include <cstring>
#include <limits>
#include <random>
#include <vector>

#include "coilwright/errors.hpp"
#include "coilwright/field.hpp"
#include "field/loop_batch_code.hpp"
#include "field/loop_kernel.hpp"

using namespace coilwright;
using internal::BatchCode;

namespace {

std::uint64_t bits(double x) {
    std::uint64_t b;
    std::memcpy(&b, &x, sizeof b);
    return b;
}

struct Points {
    std::vector<double> z, r;
    void add(double zz, double rr) {
        z.push_back(zz);
        r.push_back(rr);
    }
};

// Ordinary, near-axis, near-wire, far and extreme points, in loop radii; a count that is not a
// multiple of any block size.
Points hard_and_random_points(double a) {
    Points p;
    std::mt19937_64 rng(7);
    std::uniform_real_distribution<double> u(0.0, 1.0);
    for (int i = 0; i < 3001; ++i) {
        switch (i % 5) {
            case 0: p.add((6 * u(rng) - 3) * a, 3 * u(rng) * a); break;                      // around the loop
            case 1: p.add((4 * u(rng) - 2) * a, std::pow(10.0, -12 * u(rng)) * a); break;    // near the axis
            case 2: {                                                                         // near the wire
                const double d = std::pow(10.0, -14 * u(rng)) * a, t = 6.283185307179586 * u(rng);
                p.add(d * std::sin(t), a + d * std::cos(t));
                break;
            }
            case 3: p.add(std::pow(10.0, 8 * u(rng)) * a * (u(rng) < 0.5 ? -1 : 1), std::pow(10.0, 8 * u(rng)) * a); break;
            default: p.add((u(rng) - 0.5) * 1e-300, u(rng) * 1e-300); break;                // the centre, tiny
        }
    }
    // Outside the fast kernel's range (it hands them to the careful path) and in error.
    const double nan = std::numeric_limits<double>::quiet_NaN(), inf = HUGE_VAL;
    for (double zz : {1e60 * a, -1e200, 1e-130 * a, 0.0}) p.add(zz, a);          // far away; 1e-130 radii off the wire; on it
    for (double rr : {1e55 * a, 1e300, a * (1 + 1e-120)}) p.add(0.5 * a, rr);
    p.add(nan, 0.1);
    p.add(0.1, nan);
    p.add(inf, 0.1);
    p.add(0.1, -inf);
    p.add(0.1, -1e-3);
    p.add(0.1, inf);
    p.add(-0.0, 0.0);
    return p;
}

std::vector<BatchCode> codes() {
    std::vector<BatchCode> out{BatchCode::Baseline};
    const BatchCode best = internal::best_batch_code();
    if (best == BatchCode::Avx2Fma || best == BatchCode::Avx512) out.push_back(BatchCode::Avx2Fma);
    if (best == BatchCode::Avx512) out.push_back(BatchCode::Avx512);
    return out;
}

const char* name(BatchCode c) {
    return c == BatchCode::Avx512 ? "AVX-512" : c == BatchCode::Avx2Fma ? "AVX2+FMA" : "baseline";
}

}  // namespace

TEST(LoopBatch, EqualsLoopFieldBitForBitOrIsNaNWhereItThrows) {
    for (const LoopSpec loop : {LoopSpec{0.25, 40, 1.5}, LoopSpec{1.0, 1, -1}, LoopSpec{3e-5, 7, 0.2},
                                LoopSpec{1.0, 0, 1}, LoopSpec{0.1, 1e10, 1e300}}) {
        const Points p = hard_and_random_points(loop.radius);
        const std::size_t n = p.z.size();
        for (BatchCode code : codes()) {
            std::vector<double> bz(n), br(n);
            const std::size_t failed =
                internal::loop_field_batch_using(code, loop, 0.0, p.z.data(), p.r.data(), n, bz.data(), br.data(), false);
            std::size_t throws = 0;
            for (std::size_t i = 0; i < n; ++i) {
                try {
                    const FieldRZ f = internal::loop_field_with(code, loop, p.z[i], p.r[i]);
                    ASSERT_EQ(bits(bz[i]), bits(f.bz)) << name(code) << " z=" << p.z[i] << " r=" << p.r[i];
                    ASSERT_EQ(bits(br[i]), bits(f.br)) << name(code) << " z=" << p.z[i] << " r=" << p.r[i];
                } catch (const DomainError&) {
                    ++throws;
                    EXPECT_TRUE(std::isnan(bz[i]) && std::isnan(br[i])) << name(code) << " z=" << p.z[i];
                }
            }
            EXPECT_EQ(failed, throws) << name(code);
            EXPECT_GE(throws, 7u);  // the bad points above (and, for the huge current, overflows)
        }
    }
}

TEST(LoopBatch, TheDefaultEntryPointsUseTheSameCode) {
    const LoopSpec loop{0.2, 10, 3};
    const Points p = hard_and_random_points(loop.radius);
    const std::size_t n = p.z.size();
    std::vector<double> bz(n), br(n), bz_ref(n), br_ref(n);
    loop_field_batch(loop, p.z.data(), p.r.data(), n, bz.data(), br.data());
    internal::loop_field_batch_using(internal::best_batch_code(), loop, 0.0, p.z.data(), p.r.data(), n, bz_ref.data(),
                                     br_ref.data(), false);
    for (std::size_t i = 0; i < n; ++i) {
        EXPECT_EQ(bits(bz[i]), bits(bz_ref[i]));
        EXPECT_EQ(bits(br[i]), bits(br_ref[i]));
        try {
            const FieldRZ f = loop_field(loop, p.z[i], p.r[i]);  // a cell and an array formula agree
            EXPECT_EQ(bits(bz[i]), bits(f.bz));
            EXPECT_EQ(bits(br[i]), bits(f.br));
        } catch (const DomainError&) {
            EXPECT_TRUE(std::isnan(bz[i]));
        }
    }
}

TEST(LoopBatch, TheFusedCopyAgreesWithTheBaselineToRounding) {
    if (internal::best_batch_code() == BatchCode::Baseline) GTEST_SKIP() << "the processor has no AVX2 and FMA";
    // Relative to |B| at the point: the fused products change roundings only. Each copy is held
    // to 5e-15 of mpmath in test_loop_reference.cpp; apart they are at most 2.1e-15 of |B|, far
    // from the loop (1e4 to 1e8 radii; at two such points mpmath's closed form at 50 digits
    // puts the fused copy the nearer, both within 1e-15 of it).
    for (const LoopSpec loop : {LoopSpec{0.25, 40, 1.5}, LoopSpec{3e-5, 7, 0.2}}) {
        const Points p = hard_and_random_points(loop.radius);
        const std::size_t n = p.z.size();
        std::vector<double> bz(n), br(n), bz_fused(n), br_fused(n);
        internal::loop_field_batch_using(BatchCode::Baseline, loop, 0.0, p.z.data(), p.r.data(), n, bz.data(),
                                         br.data(), false);
        internal::loop_field_batch_using(BatchCode::Avx2Fma, loop, 0.0, p.z.data(), p.r.data(), n, bz_fused.data(),
                                         br_fused.data(), false);
        double worst = 0.0;
        std::size_t worst_at = 0;
        for (std::size_t i = 0; i < n; ++i) {
            if (std::isnan(bz[i])) {
                EXPECT_TRUE(std::isnan(bz_fused[i]) && std::isnan(br_fused[i]));
                continue;
            }
            const double size = std::hypot(bz[i], br[i]);
            const double gap = std::max(std::fabs(bz_fused[i] - bz[i]), std::fabs(br_fused[i] - br[i])) / size;
            if (gap > worst) {
                worst = gap;
                worst_at = i;
            }
        }
        EXPECT_LE(worst, 4e-15) << loop.radius << " at z/a = " << p.z[worst_at] / loop.radius
                                << ", r/a = " << p.r[worst_at] / loop.radius;
    }
}

TEST(LoopBatch, EightLanesGiveTheBitsOfFour) {
    // The AVX-512 copy runs the fused arithmetic of the AVX2 copy on eight lanes: the same bits,
    // also where blocks end part-way (counts not a multiple of the block) and points are bad.
    if (internal::best_batch_code() != BatchCode::Avx512) GTEST_SKIP() << "the processor has no AVX-512";
    const LoopSpec loop{0.2, 30, 1.25};
    Points p = hard_and_random_points(loop.radius);
    std::mt19937_64 rng(5);
    std::uniform_real_distribution<double> u(0.0, 1.0);
    for (int i = 0; i < 100003; ++i) p.add((6 * u(rng) - 3) * loop.radius, 3 * u(rng) * loop.radius);
    const std::size_t n = p.z.size();
    for (bool add : {false, true}) {
        std::vector<double> bz8(n, 0.5), br8(n, -0.5), bz4(n, 0.5), br4(n, -0.5);
        const std::size_t failed8 = internal::loop_field_batch_using(BatchCode::Avx512, loop, 0.01, p.z.data(),
                                                                     p.r.data(), n, bz8.data(), br8.data(), add);
        const std::size_t failed4 = internal::loop_field_batch_using(BatchCode::Avx2Fma, loop, 0.01, p.z.data(),
                                                                     p.r.data(), n, bz4.data(), br4.data(), add);
        EXPECT_EQ(failed8, failed4);
        std::size_t differ = 0;
        for (std::size_t i = 0; i < n; ++i)
            if (bits(bz8[i]) != bits(bz4[i]) || bits(br8[i]) != bits(br4[i])) ++differ;
        EXPECT_EQ(differ, 0u) << (add ? "adding" : "storing");
    }
}

#ifdef COILWRIGHT_VECTOR_LANES
TEST(LoopBatch, EightLaneComparisonsAreTheOperators) {
    // The eight-lane copy compares by the bits of the difference (lanes.hpp): the same answers as
    // < and <= on zeros of both signs, subnormals, neighbours, huge values, infinities and NaN
    // (inf <= inf aside: false there, as documented).
    const double inf = HUGE_VAL, nan = std::numeric_limits<double>::quiet_NaN();
    std::vector<double> v{0.0, -0.0, 1.0, -1.0, 4.9e-324, -4.9e-324, 2.2250738585072014e-308, 1e308, -1e308,
                          std::numeric_limits<double>::max(), inf, -inf, nan, -nan, 1.0 + 2.220446049250313e-16,
                          1.0 - 1.1102230246251565e-16, 3.0, 3.0000000000000004, 1e-100};
    std::mt19937_64 rng(3);
    std::uniform_real_distribution<double> u(-1.0, 1.0);
    for (int i = 0; i < 200; ++i) v.push_back(u(rng) * std::pow(10.0, 300 * u(rng)));
    using L = internal::FusedPack8Lanes;
    std::size_t wrong = 0;
    for (double x : v)
        for (double y : v) {
            const L::V vx = L::splat(x), vy = L::splat(y);
            const L::M lt = L::less(vx, vy), le = L::less_equal(vx, vy);
            for (int j = 0; j < L::kWidth; ++j) {
                if ((lt[j] != 0) != (x < y)) ++wrong;
                const bool expected_le = (std::isinf(x) && x == y) ? false : (x <= y);
                if ((le[j] != 0) != expected_le) ++wrong;
                if (lt[j] != 0 && lt[j] != -1) ++wrong;  // all ones or all zeros, as a mask
            }
        }
    EXPECT_EQ(wrong, 0u);
}
#endif

TEST(LoopBatch, AddingLoopsIsTheSumOfMovedLoops) {
    // A Helmholtz pair as two moved loops: each point gets loop_field(z - centre) added.
    const LoopSpec loop{0.3, 25, 2};
    const Points p = hard_and_random_points(loop.radius);
    const std::size_t n = p.z.size();
    for (BatchCode code : codes()) {
        std::vector<double> bz(n, 0.0), br(n, 0.0);
        for (double centre : {-0.15, 0.15})
            internal::loop_field_batch_using(code, loop, centre, p.z.data(), p.r.data(), n, bz.data(), br.data(), true);
        for (std::size_t i = 0; i < n; ++i) {
            try {
                const FieldRZ lower = internal::loop_field_with(code, loop, p.z[i] + 0.15, p.r[i]);
                const FieldRZ upper = internal::loop_field_with(code, loop, p.z[i] - 0.15, p.r[i]);
                ASSERT_EQ(bits(bz[i]), bits(0.0 + lower.bz + upper.bz)) << name(code) << " z=" << p.z[i];
                ASSERT_EQ(bits(br[i]), bits(0.0 + lower.br + upper.br)) << name(code) << " z=" << p.z[i];
            } catch (const DomainError&) {
                EXPECT_TRUE(std::isnan(bz[i]) && std::isnan(br[i])) << name(code) << " z=" << p.z[i];
            }
        }
    }
}

TEST(LoopBatch, ABadLoopIsAnErrorAndNothingIsWritten) {
    const double z[] = {0.1}, r[] = {0.0};
    double bz[] = {7.0}, br[] = {7.0};
    EXPECT_THROW(loop_field_batch({0.0, 1, 1}, z, r, 1, bz, br), DomainError);
    EXPECT_THROW(loop_field_batch({1.0, -1, 1}, z, r, 1, bz, br), DomainError);
    EXPECT_THROW(add_loop_field_batch({1.0, 1, 1}, std::nan(""), z, r, 1, bz, br), DomainError);
    EXPECT_EQ(bz[0], 7.0);
    EXPECT_EQ(loop_field_batch({1.0, 1, 1}, z, r, 0, bz, br), 0u);  // no points: nothing to do
}

#ifdef COILWRIGHT_TEST_SCALAR_LANES_TWIN
// scalar_lanes: loop_batch_blocks.cpp compiled a second time with COILWRIGHT_SCALAR_LANES
// (tests/engine/CMakeLists.txt).
TEST(LoopBatch, PlainArrayLanesGiveTheBitsOfVectorLanes) {
    // The hard points and a million points around the loop, in both copies of the code, storing
    // and adding: the fallback for compilers without vector types must not change a bit.
    const LoopSpec loop{0.2, 30, 1.25};
    Points p = hard_and_random_points(loop.radius);
    std::mt19937_64 rng(11);
    std::uniform_real_distribution<double> u(0.0, 1.0);
    for (int i = 0; i < 1000000; ++i) p.add((6 * u(rng) - 3) * loop.radius, 3 * u(rng) * loop.radius);
    const std::size_t n = p.z.size();
    for (BatchCode code : codes())
        for (bool add : {false, true}) {
            std::vector<double> bz(n, 0.5), br(n, -0.5), bz_plain(n, 0.5), br_plain(n, -0.5);
            const std::size_t failed = internal::vector_lanes::loop_field_batch_using(
                code, loop, 0.01, p.z.data(), p.r.data(), n, bz.data(), br.data(), add);
            const std::size_t failed_plain = internal::scalar_lanes::loop_field_batch_using(
                code, loop, 0.01, p.z.data(), p.r.data(), n, bz_plain.data(), br_plain.data(), add);
            EXPECT_EQ(failed, failed_plain);
            EXPECT_GE(failed, 6u);  // the non-finite and negative points
            std::size_t differ = 0;
            for (std::size_t i = 0; i < n; ++i)
                differ += bits(bz[i]) != bits(bz_plain[i]) || bits(br[i]) != bits(br_plain[i]);
            EXPECT_EQ(differ, 0u) << name(code) << (add ? " adding" : " storing");
        }
}
#endif

TEST(LoopKernel, TailCoefficientsAreTheHypergeometricSeries) {
    // F(u) = 2F1(1/2, 3/2; 2; u) and G(u) = 2F1(1/2, 1/2; 2; u) (DLMF 15.2.1): the ratio of terms
    // k+1 and k is (a + k)(b + k) / ((c + k)(k + 1)). The kernel's constants are exact fractions;
    // these products round, hence the tolerance of a few units in the last place.
    double f = 1.0, g = 1.0;
    for (int k = 0; k < internal::kTailTerms; ++k) {
        EXPECT_NEAR(internal::kTailF[k], f, 1e-15 * f) << k;
        EXPECT_NEAR(internal::kTailG[k], g, 1e-15 * g) << k;
        f *= (0.5 + k) * (1.5 + k) / ((2.0 + k) * (k + 1.0));
        g *= (0.5 + k) * (0.5 + k) / ((2.0 + k) * (k + 1.0));
    }
}
