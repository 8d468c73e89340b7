// Kelvin functions of order 0 and the skin-effect resistance ratio of a round wire, against
// mpmath (tests/reference/kelvin.csv, made by generate_kelvin_reference.py at 50 digits from
// mpmath's ber/bei and, independently, from its complex Bessel J of x e^{3 pi i/4}).
#include <gtest/gtest.h>

#include <algorithm>
#include <cmath>
#include <cstdio>

#include "ac/kelvin.hpp"
#include "coilwright/errors.hpp"
#include "reference_csv.hpp"

using namespace coilwright;
using coilwright::internal::kelvin0;
using coilwright::internal::round_wire_resistance_ratio;

namespace {

// The reference is scaled by e^{-x/sqrt2}; so are the engine's values beyond the series
// (log_scale > 0, the exponent itself then rounded, the values not), those of the series not.
double rescale(double value, double log_scale, double x) {
    return log_scale > 0.0 ? value : value * std::exp(-x / std::sqrt(2.0));
}

}  // namespace

TEST(Kelvin, AgreesWithMpmathTo1em13OfTheModulus) {
    // Source: mpmath ber, bei, J0, J1 (50 digits), tests/reference/kelvin.csv.
    const auto rows = reference::read_reference("kelvin.csv");
    ASSERT_GE(rows.size(), 40u);
    double worst = 0.0, worst_x = 0.0;
    for (const auto& row : rows) {
        const double x = row.num(0);
        const internal::Kelvin0 k = kelvin0(x);
        const double got[4] = {rescale(k.ber, k.log_scale, x), rescale(k.bei, k.log_scale, x),
                               rescale(k.dber, k.log_scale, x), rescale(k.dbei, k.log_scale, x)};
        const double value_modulus = std::hypot(row.num(1), row.num(2));
        const double derivative_modulus = std::hypot(row.num(3), row.num(4));
        for (int i = 0; i < 4; ++i) {
            // ber and bei have zeros: errors are measured against the modulus |ber + i bei|
            // (and |ber' + i bei'|), the size of the complex function they are parts of.
            const double modulus = i < 2 ? value_modulus : derivative_modulus;
            const double err = std::fabs(got[i] - row.num(1 + i)) / modulus;
            if (err > worst) worst = err, worst_x = x;
            EXPECT_LT(err, 1e-13) << "x = " << x << " function " << i;
        }
    }
    std::printf("Kelvin functions: worst error %.2e of the modulus (x = %g)\n", worst, worst_x);
}

TEST(Kelvin, ResistanceRatioAgreesWithMpmathTo1em12) {
    // Source: mpmath, Re[(q/2) J0(q)/J1(q)] = (x/2)(ber bei' - bei ber')/(ber'^2 + bei'^2).
    const auto rows = reference::read_reference("kelvin.csv");
    double worst = 0.0, worst_x = 0.0;
    for (const auto& row : rows) {
        const double x = row.num(0);
        const double err = std::fabs(round_wire_resistance_ratio(x) / row.num(5) - 1.0);
        if (err > worst) worst = err, worst_x = x;
        EXPECT_LT(err, 1e-12) << "x = " << x;
    }
    std::printf("R_ac/R_dc: worst relative error %.2e (x = %g)\n", worst, worst_x);
    EXPECT_LT(worst, 1e-13);
}

TEST(Kelvin, SmallArgumentLimits) {
    // A&S 9.9.10: ber x = 1 - x^4/64 + ..., bei x = x^2/4 - x^6/2304 + ... (next terms < 1e-25).
    const double x = 1e-3;
    const internal::Kelvin0 k = kelvin0(x);
    EXPECT_DOUBLE_EQ(k.ber, 1.0 - std::pow(x, 4) / 64.0);
    EXPECT_DOUBLE_EQ(k.bei, x * x / 4.0 - std::pow(x, 6) / 2304.0);
    EXPECT_DOUBLE_EQ(k.dber, -std::pow(x, 3) / 16.0);             // d/dx of the series
    EXPECT_DOUBLE_EQ(k.dbei, x / 2.0 - 6.0 * std::pow(x, 5) / 2304.0);
    const internal::Kelvin0 zero = kelvin0(0.0);
    EXPECT_EQ(zero.ber, 1.0);
    EXPECT_EQ(zero.bei, 0.0);
    EXPECT_EQ(zero.dber, 0.0);
    EXPECT_EQ(zero.dbei, 0.0);
}

TEST(Kelvin, LowFrequencyLimitOfTheRatio) {
    // The ratio's series 1 + x^4/192 (= 1 + (a/delta)^4/48) - c x^8, from the ascending series;
    // the mpmath values of kelvin.csv put c near 2.17e-5 (bounded here by 3e-5).
    for (double x : {0.0, 1e-8, 1e-4, 2e-3, 0.01, 0.05, 0.1}) {
        const double expected = 1.0 + std::pow(x, 4) / 192.0;
        EXPECT_NEAR(round_wire_resistance_ratio(x), expected, 4e-16 + 3e-5 * std::pow(x, 8)) << x;
    }
    EXPECT_EQ(round_wire_resistance_ratio(0.0), 1.0);
}

TEST(Kelvin, HighFrequencyLimitOfTheRatio) {
    // From Hankel's expansions (DLMF 10.17.3) of J0/J1: R/R0 = a/(2 delta) + 1/4 + 3 delta/(32 a)
    // + O((delta/a)^2), a/delta = x/sqrt2. The remainder must shrink like (delta/a)^2.
    for (double x : {100.0, 1000.0, 1e4, 1e6}) {
        const double a_over_delta = x / std::sqrt(2.0);
        const double leading = a_over_delta / 2.0 + 0.25 + 3.0 / (32.0 * a_over_delta);
        const double remainder = std::fabs(round_wire_resistance_ratio(x) - leading);
        EXPECT_LT(remainder, 0.1 / (a_over_delta * a_over_delta) + 1e-15 * leading) << x;
    }
    // Far beyond a thousand skin depths the ratio stays finite and keeps its slope.
    EXPECT_NEAR(round_wire_resistance_ratio(1e12) / (1e12 / std::sqrt(8.0)), 1.0, 1e-12);
}

TEST(Kelvin, ContinuousWhereTheMethodChanges) {
    // Power series below kKelvinSeriesLimit, Hankel's expansion above: both at the limit agree.
    const double x = internal::kKelvinSeriesLimit;
    const double below = round_wire_resistance_ratio(x);
    const double above = round_wire_resistance_ratio(std::nextafter(x, 100.0));
    EXPECT_NEAR(above / below, 1.0, 1e-14);
    const internal::Kelvin0 s = kelvin0(x), a = kelvin0(std::nextafter(x, 100.0));
    const double scale = std::exp(s.log_scale - a.log_scale);
    EXPECT_NEAR(a.ber, s.ber * scale, 1e-14 * std::hypot(a.ber, a.bei));
    EXPECT_NEAR(a.dbei, s.dbei * scale, 1e-14 * std::hypot(a.dber, a.dbei));
}

TEST(Kelvin, RejectsBadArguments) {
    EXPECT_THROW(kelvin0(-1.0), DomainError);
    EXPECT_THROW(kelvin0(std::nan("")), DomainError);
    EXPECT_THROW(kelvin0(INFINITY), DomainError);
    EXPECT_THROW(round_wire_resistance_ratio(-1e-9), DomainError);
}
