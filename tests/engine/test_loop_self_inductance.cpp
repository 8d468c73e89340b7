// Self-inductance of a ring of round wire (LOOP_L) against direct quadrature and the classical
// thin-ring formula.
#include <gtest/gtest.h>

#include <cmath>
#include <cstdio>

#include "coilwright/constants.hpp"
#include "coilwright/errors.hpp"
#include "coilwright/inductance.hpp"
#include "reference_csv.hpp"

using namespace coilwright;

TEST(LoopSelfInductance, AgreesWithQuadratureWithinTheStatedTruncation) {
    // tests/reference/ring_inductance.csv: Maxwell's formula averaged over the wire's
    // cross-section by direct quadrature (scipy, 2e-9). The formula's error is the next term,
    // about (rho/a)^4 (0.002 ln(8a/rho) - 0.0036) of mu0 a (fitted to these points).
    const auto rows = reference::read_reference("ring_inductance.csv");
    ASSERT_EQ(rows.size(), 5u);
    for (const auto& row : rows) {
        const double d = row.num(0), ref = row.num(1);
        const double rho = d / 2;
        const double got = loop_self_inductance(1.0, d, 1.0) / kMu0;
        const double bound = std::pow(rho, 4) * (0.003 * std::log(8 / rho) + 0.004) + 3e-9 * ref;
        EXPECT_LT(std::fabs(got - ref), bound) << d;
        std::printf("LOOP_L at wire diameter %.2f radius: relative error %.1e\n", d, std::fabs(got - ref) / ref);
    }
}

TEST(LoopSelfInductance, ClassicalThinRingFormula) {
    // Rosa and Grover (1912), Grover (1946): L = mu0 a (ln(8a/rho) - 7/4) for rho << a, the
    // -7/4 being -2 (external) + 1/4 (internal inductance mu0/(8 pi) per metre of wire).
    for (double rho : {1e-3, 1e-5}) {
        const double classical = kMu0 * 0.5 * (std::log(8 * 0.5 / rho) - 1.75);
        EXPECT_LT(std::fabs(loop_self_inductance(0.5, 2 * rho, 1) - classical) / classical, rho * rho * 20) << rho;
    }
    EXPECT_DOUBLE_EQ(loop_self_inductance(0.5, 1e-3, 7), 49 * loop_self_inductance(0.5, 1e-3, 1));
}

TEST(LoopSelfInductance, BadArgumentsAreErrors) {
    EXPECT_THROW(loop_self_inductance(0, 1e-3, 1), DomainError);
    EXPECT_THROW(loop_self_inductance(1, 0, 1), DomainError);
    EXPECT_THROW(loop_self_inductance(1, 1.01, 1), DomainError);  // wire thicker than the radius
    EXPECT_THROW(loop_self_inductance(1, 1e-3, -1), DomainError);
    EXPECT_NO_THROW(loop_self_inductance(1, 1.0, 1));
}
