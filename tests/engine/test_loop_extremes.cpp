// Inputs at the edges of double precision, found by fuzzing (tests/fuzz/): each must end
// quickly with a documented error, never hang or return a non-finite number.
#include <gtest/gtest.h>

#include <cmath>
#include <limits>
#include <numbers>

#include "numerics/bulirsch_cel.hpp"
#include "coilwright/errors.hpp"
#include "coilwright/field.hpp"

using namespace coilwright;
using coilwright::internal::cel;

TEST(LoopExtremes, PointWhoseDistanceFromTheWireUnderflowsIsSingularNotAHang) {
    // alpha / beta = (1e-300 / 2e23) / 2 rounds to 0: the Gauss iteration used to spin forever,
    // freezing Calc on =LOOP_BZ(2E23;1;1;1E-300;2E23).
    // (A hang here would be caught by ctest's time limit; the test asserts the error.)
    EXPECT_THROW(loop_field({2e23, 1, 1}, 1e-300, 2e23), SingularPointError);
    EXPECT_THROW(loop_field({1.0 - 1e-16, 4, 4}, std::numeric_limits<double>::denorm_min(), 1.0 - 1e-16),
                 SingularPointError);
}

TEST(LoopExtremes, VeryCloseToTheWireIsStillComputed) {
    // 1e-100 radii from the wire: finite and like an infinite straight wire, B = mu0 I / (2 pi d)
    // (Ampere's law), to leading order. (Closer than about 1e-154 radii the kernel's 1/kc^2
    // overflows and the point counts as on the filament.)
    const double a = 1.0, d = 1e-100;
    const FieldRZ f = loop_field({a, 1, 1}, d, a);
    ASSERT_TRUE(std::isfinite(f.bz) && std::isfinite(f.br));
    const double straight_wire = 1.25663706127e-6 / (2 * std::numbers::pi * d);  // CODATA 2022 mu0
    EXPECT_NEAR(f.magnitude() / straight_wire, 1.0, 1e-12);
}

TEST(LoopExtremes, PointsBeyondDoubleRangeInRadiiAreErrors) {
    EXPECT_THROW(loop_field({0.1, 1, 1}, 1e308, 0), DomainError);
    EXPECT_THROW(loop_field({1e-300, 1, 1}, 0, 1e10), DomainError);
    // Far but representable: the field underflows to an exact zero or stays tiny and finite.
    const FieldRZ far = loop_field({0.1, 1, 1}, 1e200, 0);
    EXPECT_TRUE(std::isfinite(far.bz));
    EXPECT_THROW(loop_field({1.0, 1, 1}, 1e-300, 1.0), SingularPointError);
}

TEST(LoopExtremes, FieldScaleThatUnderflowsIsAnError) {
    // mu0 N I / a = 2.5e-313 for a = 1e308 m: Br used to come out as a silent 0.
    EXPECT_THROW(loop_field({1e308, 10, 2}, 0.05, 0.02), DomainError);
    EXPECT_THROW(loop_field({1e308, 10, 2}, 0, 0), DomainError);
    // No current: an exact zero, not an error.
    EXPECT_EQ(loop_field({1e308, 10, 0}, 0.05, 0.02).bz, 0.0);
}

TEST(LoopExtremes, CelIterationIsBoundedOutsideItsDomain) {
    // kc = 0 (or NaN) is outside cel's domain; it must be an error instead of spinning forever.
    EXPECT_THROW(cel(0.0, 1.0, 1.0, 1.0), DomainError);
    EXPECT_THROW(cel(std::nan(""), 1.0, 1.0, 1.0), DomainError);
    // The smallest positive kc is inside it and converges within the bound.
    EXPECT_TRUE(std::isfinite(cel(std::numeric_limits<double>::denorm_min(), 1.0, 1.0, 1.0)));
}
