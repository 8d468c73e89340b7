// Mutual inductance of coaxial circles (LOOP_M) and its slope (LOOP_FZ) against mpmath
// references and physical limits.
#include <gtest/gtest.h>

#include <cmath>
#include <cstdio>

#include "coilwright/constants.hpp"
#include "coilwright/errors.hpp"
#include "coilwright/field.hpp"
#include "coilwright/inductance.hpp"
#include "reference_csv.hpp"
#include "test_support.hpp"

using namespace coilwright;
using coilwright::test::rel;

TEST(LoopMutual, AgreesWithMpmathMaxwellAndNeumann) {
    // tests/reference/loop_mutual.csv: Maxwell's closed form at 80 digits checked against
    // Neumann's integral at 40 digits (mpmath); slopes by mpmath.diff.
    const auto rows = reference::read_reference("loop_mutual.csv");
    ASSERT_GT(rows.size(), 30u);
    double worst_m = 0, worst_s = 0;
    for (const auto& row : rows) {
        const double a = row.num(1), b = row.num(2), d = row.num(3), m_ref = row.num(4), s_ref = row.num(5);
        const double m = loop_mutual_inductance(a, b, d);
        const double em = rel(m, m_ref);
        EXPECT_LT(em, 5e-15) << row.cells[0] << " " << a << " " << b << " " << d;
        worst_m = std::max(worst_m, em);
        if (a == b && d == 0) continue;
        const double s = loop_mutual_inductance_slope(a, b, d);
        if (s_ref == 0.0) {
            EXPECT_EQ(s, 0.0);
        } else {
            const double es = rel(s, s_ref);
            EXPECT_LT(es, 5e-15) << row.cells[0] << " " << a << " " << b << " " << d;
            worst_s = std::max(worst_s, es);
        }
    }
    std::printf("LOOP_M: worst relative error %.2e; dM/dz: %.2e (%zu mpmath points)\n", worst_m, worst_s, rows.size());
}

TEST(LoopMutual, ReciprocityIsExact) {
    // M12 = M21 (Neumann's formula is symmetric): bitwise, since the radii are ordered first.
    for (double d : {0.0, 0.2, -3.0})
        for (double b : {0.1, 0.7, 5.0}) {
            EXPECT_EQ(loop_mutual_inductance(1.3, b, d), loop_mutual_inductance(b, 1.3, d));
            EXPECT_EQ(loop_mutual_inductance(1.3, b, d), loop_mutual_inductance(1.3, b, -d));
        }
}

TEST(LoopMutual, FarApartIsTheDipoleLimit) {
    // Two dipoles m = pi a^2, pi b^2 on a common axis: M = mu0 pi a^2 b^2 / (2 d^3) (1 + O((a/d)^2))
    // (Jackson, Classical Electrodynamics, 5.6; Grover 1946). Naive Maxwell loses every digit here.
    for (double d : {1e3, 1e5, 1e7}) {
        const double dipole = kMu0 * kPi * 0.5 * 0.5 * 2.0 * 2.0 / (2 * d * d * d);
        EXPECT_LT(rel(loop_mutual_inductance(0.5, 2.0, d), dipole), 10 * std::pow(2.5 / d, 2)) << d;
    }
}

TEST(LoopMutual, CloseCirclesFollowTheLogarithm) {
    // Equal radii a at distance d << a: M = mu0 a [ln(8a/d) - 2] + O(d^2 ln d / a)
    // (Maxwell's series; Rosa and Grover 1912; Grover 1946).
    const double a = 0.3;
    for (double d : {1e-3, 1e-6, 1e-9}) {
        const double asymptotic = kMu0 * a * (std::log(8 * a / d) - 2);
        EXPECT_LT(rel(loop_mutual_inductance(a, a, d), asymptotic), 3 * std::pow(d / a, 2) * std::log(8 * a / d)) << d;
    }
}

TEST(LoopMutual, SlopeEqualsFiniteDifferencesOfM) {
    // Energy consistency: the force I1 I2 dM/dz from the loop's radial field equals the
    // derivative of M computed independently (central differences, Richardson extrapolation).
    double worst = 0;
    for (double b : {0.4, 1.0, 1.7})
        for (double d : {0.05, 0.3, 1.2, -0.8, 6.0}) {
            const double h = 2e-3 * std::hypot(1.0 - b, d);  // small against the distance to the wire
            const auto m = [&](double x) { return loop_mutual_inductance(1.0, b, x); };
            const double d1 = (m(d + h) - m(d - h)) / (2 * h), d2 = (m(d + h / 2) - m(d - h / 2)) / h;
            const double fd = (4 * d2 - d1) / 3;
            const double e = rel(loop_mutual_inductance_slope(1.0, b, d), fd);
            EXPECT_LT(e, 1e-9) << b << " " << d;
            worst = std::max(worst, e);
        }
    std::printf("LOOP_FZ vs finite differences of LOOP_M: worst %.1e\n", worst);
    // Attraction for currents in the same sense: dM/dz < 0 above, > 0 below.
    EXPECT_LT(loop_mutual_inductance_slope(1.0, 1.2, 0.5), 0.0);
    EXPECT_GT(loop_mutual_inductance_slope(1.0, 1.2, -0.5), 0.0);
    EXPECT_EQ(loop_mutual_inductance_slope(1.0, 1.2, 0.0), 0.0);
}

TEST(LoopMutual, BadArgumentsAndCoincidenceAreErrors) {
    EXPECT_THROW(loop_mutual_inductance(0.0, 1, 1), DomainError);
    EXPECT_THROW(loop_mutual_inductance(1, -1, 1), DomainError);
    EXPECT_THROW(loop_mutual_inductance(1, 1, std::nan("")), DomainError);
    EXPECT_THROW(loop_mutual_inductance(1, 1, HUGE_VAL), DomainError);
    EXPECT_THROW(loop_mutual_inductance(1, 1, 0.0), SingularPointError);
    EXPECT_THROW(loop_mutual_inductance_slope(1, 1, 0.0), SingularPointError);
    EXPECT_NO_THROW(loop_mutual_inductance(1, 1 + 1e-15, 0.0));
    EXPECT_GT(loop_mutual_inductance(1e-300, 1e-300, 1e-300), 0.0);  // tiny but finite
}

TEST(LoopMutual, UnderflowingModulusIsAnErrorNotAHang) {
    // 4.9e-324 (the smallest double) makes kc = alpha / beta underflow to 0, where Bulirsch's
    // iteration would never end. Found by the bad-input lists; it also affected the loop field.
    EXPECT_THROW(loop_mutual_inductance(1, 1, 4.9e-324), SingularPointError);
    EXPECT_THROW(loop_field({1, 1, 1}, 4.9e-324, 1.0), SingularPointError);
    EXPECT_GT(loop_mutual_inductance(1, 1, 1e-300), 0.0);
}
