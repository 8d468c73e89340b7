// Thin-solenoid self-inductance (SOLENOID_L), its radius slope and SOLENOID_PRESSURE against
// mpmath references, Nagaoka's table, Wheeler's formula and the long and short limits.
#include <gtest/gtest.h>

#include <cmath>
#include <cstdio>

#include "coilwright/constants.hpp"
#include "coilwright/errors.hpp"
#include "coilwright/inductance.hpp"
#include "reference_csv.hpp"
#include "test_support.hpp"

using namespace coilwright;
using coilwright::test::rel;

TEST(SolenoidInductance, AgreesWithMpmathFromRibbonToNeedle) {
    // tests/reference/solenoid_inductance.csv: Lorenz/Nagaoka closed form at 120 digits, checked
    // against the sheet double integral of Maxwell's formula; l/a from 1e-8 to 1e7.
    const auto rows = reference::read_reference("solenoid_inductance.csv");
    ASSERT_GT(rows.size(), 12u);
    double worst_l = 0, worst_s = 0;
    for (const auto& row : rows) {
        const double a = row.num(0), l = row.num(1);
        const double el = rel(solenoid_inductance(a, l, 1.0), row.num(2));
        const double es = rel(solenoid_inductance_radius_slope(a, l, 1.0), row.num(3));
        EXPECT_LT(el, 1e-14) << a << " " << l;
        EXPECT_LT(es, 1e-14) << a << " " << l;
        worst_l = std::max(worst_l, el);
        worst_s = std::max(worst_s, es);
    }
    std::printf("SOLENOID_L: worst relative error %.2e; dL/da: %.2e (%zu mpmath points)\n", worst_l, worst_s,
                rows.size());
}

TEST(SolenoidInductance, NagaokaTable1909) {
    // Nagaoka's coefficient against diameter/length, 4 decimals as tabulated by H. Nagaoka (1909)
    // and reprinted by Rosa and Grover (1912). Quoted from memory; confirmed with mpmath
    // (tests/reference/generate_solenoid_inductance_reference.py's closed form).
    const double table[][2] = {{0.1, 0.9588}, {0.2, 0.9201}, {0.5, 0.8181}, {1.0, 0.6884},
                               {2.0, 0.5255}, {5.0, 0.3198}, {10.0, 0.2033}};
    for (const auto& [ratio, k] : table) EXPECT_NEAR(nagaoka_coefficient(ratio), k, 5.1e-5) << ratio;
    EXPECT_LT(std::fabs(nagaoka_coefficient(1e-9) - 1.0), 1e-8);  // long solenoid: k -> 1
}

TEST(SolenoidInductance, WheelerWithinOnePercentForLengthAboveFourTenthsDiameter) {
    // H. A. Wheeler, Proc. IRE 16 (1928): L[uH] = r^2 N^2 / (9 r + 10 l), r and l in inches,
    // stated accurate to about 1% for l > 0.8 r.
    double worst = 0;
    for (double l_over_r : {0.8, 1.0, 2.0, 5.0, 20.0, 100.0}) {
        const double r = 0.05, l = l_over_r * r, n = 100;
        const double ri = r / 0.0254, li = l / 0.0254;
        const double wheeler = 1e-6 * ri * ri * n * n / (9 * ri + 10 * li);
        const double e = rel(solenoid_inductance(r, l, n), wheeler);
        EXPECT_LT(e, 0.012) << l_over_r;
        worst = std::max(worst, e);
    }
    std::printf("SOLENOID_L vs Wheeler (1928) for l >= 0.8 r: worst %.2f%%\n", 100 * worst);
}

TEST(SolenoidInductance, LongAndShortLimits) {
    // Long: L -> mu0 N^2 pi a^2 / l (1 - 8a/(3 pi l) + ...) (Rosa and Grover 1912).
    for (double l : {1e3, 1e5}) {
        const double a = 1.0, infinite = kMu0 * kPi * a * a / l;
        EXPECT_LT(rel(solenoid_inductance(a, l, 1), infinite * (1 - 8 * a / (3 * kPi * l))), 1.0 / (l * l)) << l;
    }
    // Short (a ribbon): L = mu0 N^2 a [ln(8a/l) - 1/2 + (l^2/32a^2)(ln(8a/l) + 1/4)] + O(l^4)
    // (Rosa and Grover 1912, short-coil series; the first two terms also Kirchhoff's ring).
    for (double l : {1e-2, 1e-4, 1e-7}) {
        const double a = 1.0, lg = std::log(8 * a / l);
        const double series = kMu0 * a * (lg - 0.5 + l * l / (32 * a * a) * (lg + 0.25));
        EXPECT_LT(rel(solenoid_inductance(a, l, 1), series), std::max(std::pow(l, 4), 1e-15)) << l;
    }
}

TEST(SolenoidInductance, ScalesWithTurnsSquaredAndSize) {
    const double l1 = solenoid_inductance(0.02, 0.1, 1.0);
    EXPECT_LT(rel(solenoid_inductance(0.02, 0.1, 300.0), 9e4 * l1), 1e-15);
    EXPECT_LT(rel(solenoid_inductance(0.2, 1.0, 1.0), 10 * l1), 1e-15);  // L is homogeneous of degree 1
    EXPECT_EQ(solenoid_inductance(0.02, 0.1, 0.0), 0.0);
}

TEST(SolenoidPressure, TendsToBSquaredOver2Mu0AndMatchesVirtualWork) {
    // Long solenoid: p = B^2 / (2 mu0) with B = mu0 N I / l (any electromagnetism text, e.g.
    // Griffiths, magnetic pressure on a current sheet).
    const double a = 0.01, l = 100.0, n = 1e5, i = 3.0;
    const double b = kMu0 * n * i / l;
    EXPECT_LT(rel(solenoid_mean_pressure(a, l, n, i), b * b / (2 * kMu0)), 1e-3);
    // Definition: (I^2/2) dL/da over the winding area; dL/da checked against finite differences.
    for (double len : {0.01, 0.3, 2.0}) {
        const double h = 1e-4;
        const auto lfun = [&](double x) { return solenoid_inductance(x, len, n); };
        const double d1 = (lfun(a + h * a) - lfun(a - h * a)) / (2 * h * a);
        const double d2 = (lfun(a + h * a / 2) - lfun(a - h * a / 2)) / (h * a);
        const double fd = (4 * d2 - d1) / 3;
        EXPECT_LT(rel(solenoid_inductance_radius_slope(a, len, n), fd), 1e-9) << len;
        EXPECT_LT(rel(solenoid_mean_pressure(a, len, n, i), i * i / 2 * fd / (2 * kPi * a * len)), 1e-9) << len;
    }
    EXPECT_EQ(solenoid_mean_pressure(a, l, n, -i), solenoid_mean_pressure(a, l, n, i));
}

TEST(SolenoidInductance, BadArgumentsAreErrors) {
    EXPECT_THROW(solenoid_inductance(0, 1, 1), DomainError);
    EXPECT_THROW(solenoid_inductance(1, 0, 1), DomainError);
    EXPECT_THROW(solenoid_inductance(1, -1, 1), DomainError);
    EXPECT_THROW(solenoid_inductance(1, 1, -1), DomainError);
    EXPECT_THROW(solenoid_inductance(std::nan(""), 1, 1), DomainError);
    EXPECT_THROW(solenoid_inductance(1, 1, 1e300), DomainError);  // overflows: an error, not inf
    EXPECT_THROW(solenoid_mean_pressure(1, 1, 1, HUGE_VAL), DomainError);
    EXPECT_THROW(nagaoka_coefficient(0), DomainError);
    EXPECT_THROW(solenoid_inductance(1e200, 1e-200, 1), DomainError);  // l/d underflows: no hang
}
