// The pack logarithm and arc tangent (numerics/lane_math.hpp) against the C library in long
// double, and the thick-pair corner sums four at a time against one by one
// (inductance/corner_sums.cpp).
#include <gtest/gtest.h>

#include <cmath>
#include <cstdio>
#include <limits>
#include <random>

#include "coilwright/constants.hpp"
#include "inductance/corner_sums.hpp"
#include "numerics/lane_math.hpp"

using namespace coilwright::internal;

namespace {

double ulps(double got, long double exact) {
    const double rounded = static_cast<double>(exact);
    if (got == rounded) return 0.0;
    const double unit = std::nextafter(std::fabs(rounded), HUGE_VAL) - std::fabs(rounded);
    return static_cast<double>(std::fabs(static_cast<long double>(got) - exact) / unit);
}

}  // namespace

TEST(LaneMath, LogarithmAndArcTangentWithinOneUnitInTheLastPlace) {
    std::mt19937_64 rng{20261202};
    std::uniform_real_distribution<double> unit{0.0, 1.0};
    double worst_log = 0, worst_atan = 0;
    for (int i = 0; i < 500000; ++i) {
        Pack x{}, y{};
        for (int j = 0; j < kPackWidth; ++j) {
            x[j] = i % 5 == 0 ? 1.0 + (unit(rng) - 0.5) * 1e-3 : std::exp((unit(rng) - 0.5) * 1400.0);
            y[j] = (unit(rng) - 0.5) * std::exp((unit(rng) - 0.5) * 60.0);
        }
        const Pack lx = lane_log(x), ay = lane_atan(y);
        for (int j = 0; j < kPackWidth; ++j) {
            worst_log = std::max(worst_log, ulps(lx[j], std::log(static_cast<long double>(x[j]))));
            worst_atan = std::max(worst_atan, ulps(ay[j], std::atan(static_cast<long double>(y[j]))));
        }
    }
    EXPECT_LE(worst_log, 1.0);
    EXPECT_LE(worst_atan, 1.0);
    std::printf("pack log: worst %.2f ulp, pack atan: worst %.2f ulp (2,000,000 arguments each)\n", worst_log, worst_atan);
}

TEST(LaneMath, SpecialArguments) {
    const double inf = std::numeric_limits<double>::infinity();
    Pack x{};
    x[0] = 0.0;
    x[1] = 1e-310;  // subnormal: the C library, lane by lane
    x[2] = inf;
    x[3] = 1.0;
    const Pack l = lane_log(x);
    EXPECT_EQ(l[0], -inf);
    EXPECT_EQ(l[1], std::log(1e-310));
    EXPECT_EQ(l[2], inf);
    EXPECT_EQ(l[3], 0.0);
    Pack y{};
    y[0] = inf;
    y[1] = -inf;
    y[2] = std::numeric_limits<double>::quiet_NaN();
    y[3] = 0.0;
    const Pack a = lane_atan(y);
    EXPECT_EQ(a[0], std::atan(inf));
    EXPECT_EQ(a[1], std::atan(-inf));
    EXPECT_TRUE(std::isnan(a[2]));
    EXPECT_EQ(a[3], 0.0);
}

TEST(CornerSums, PacksAreAsAccurateAsOneByOne) {
    // Random corners and angles over the whole range of the primitive's branches (phi near 0 and
    // pi, u = 0, eta and xi of either sign), against the same sums in long double: the pack copy
    // errs no more than the copy with the C library's functions (both lose digits near phi = 0
    // and pi, which the angle integral's loss estimate accounts for): over all sums the worst
    // error at most 1.5 times the other's; each sum's at most 2.5 times the other's plus 1e-13 of
    // the magnitudes (two independent roundings, amplified by the 1/sin^3 terms near 0 and pi,
    // and on Windows the C runtime's own log and atan).
    std::mt19937_64 rng{7};
    std::uniform_real_distribution<double> unit{0.0, 1.0};
    double worst_one = 0, worst_packs = 0;
    for (int trial = 0; trial < 20000; ++trial) {
        const double phi = trial % 7 == 0   ? 1e-6 * unit(rng)
                           : trial % 7 == 1 ? coilwright::kPi - 1e-6 * unit(rng)
                                            : coilwright::kPi * unit(rng);
        const AngleValues<double> angle = AngleValues<double>::of(phi);
        const AngleValues<long double> precise = AngleValues<long double>::of(phi);
        double x[16], y[16], u[16], w[16];
        const int count = 1 + trial % 16;
        for (int i = 0; i < count; ++i) {
            x[i] = 0.05 + unit(rng);
            y[i] = trial % 3 == 0 ? x[i] : 0.05 + unit(rng);
            u[i] = i % 4 == 0 ? 0.0 : 2.0 * unit(rng);
            w[i] = unit(rng) < 0.5 ? -1.0 : 1.0;
        }
        for (const int k : {1, 2}) {
            const CornerSum one = corner_sum_using(CornerCode::OneByOne, angle, x, y, u, w, count, k);
            const CornerSum packs = corner_sum_using(CornerCode::Packs, angle, x, y, u, w, count, k);
            if (one.magnitude == 0.0) {  // e.g. the slope of one corner at u = 0
                EXPECT_EQ(packs.value, 0.0);
                continue;
            }
            long double exact = 0;
            for (int i = 0; i < count; ++i)
                exact += w[i] * rectangular_primitive(precise, static_cast<long double>(x[i]),
                                                      static_cast<long double>(y[i]), static_cast<long double>(u[i]), k);
            const double e_one = static_cast<double>(std::fabs(one.value - exact)) / one.magnitude;
            const double e_packs = static_cast<double>(std::fabs(packs.value - exact)) / one.magnitude;
            EXPECT_LT(e_packs, 2.5 * e_one + 1e-13) << trial << " k " << k << " phi " << phi;
            worst_one = std::max(worst_one, e_one);
            worst_packs = std::max(worst_packs, e_packs);
        }
    }
    EXPECT_LE(worst_packs, 1.5 * worst_one);
    std::printf("corner sums against long double, worst share of the magnitudes: packs %.1e, one by one %.1e\n",
                worst_packs, worst_one);
}
