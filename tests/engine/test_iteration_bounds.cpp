// Every iterative loop of the engine ends: inputs that once made a loop spin for ever now
// return or raise one of the engine's own errors (numerics/policy.hpp).
#include <gtest/gtest.h>

#include <cmath>
#include <limits>

#include "coilwright/field.hpp"
#include "numerics/bulirsch_cel.hpp"
#include "numerics/policy.hpp"

using namespace coilwright;

namespace {

// Passes when f returns a finite value or throws DomainError / ConvergenceError; any other
// exception type fails the test (only the engine's own errors may leave it).
template <class F>
void ends_with_engine_outcome(F&& f) {
    try {
        const double v = f();
        EXPECT_TRUE(std::isfinite(v));
    } catch (const DomainError&) {
    } catch (const ConvergenceError&) {
    }
}

}  // namespace

TEST(IterationBounds, SolenoidWhoseModulusUnderflowsEnds) {
    // Found in real Calc: =SOLENOID_BZ(1E308;2;1;1;1+2^-51;1E308) froze LibreOffice (the
    // sheet kernel's copy of the cel iteration had no step cap and kc underflowed to 0).
    ends_with_engine_outcome([] { return solenoid_field({1e308, 2, 1, 1}, 1 + std::ldexp(1.0, -51), 1e308).bz; });
    ends_with_engine_outcome([] { return solenoid_field({1e308, 2, 1, 1}, 1 + std::ldexp(1.0, -51), 1e308).br; });
}

TEST(IterationBounds, CelRefusesAZeroModulusAndCapsItsSteps) {
    using internal::CelLoop;
    EXPECT_THROW((CelLoop<1>::after_first_step(0.0, {1.0}, {1.0}).finish()), SingularPointError);
    EXPECT_THROW((CelLoop<1>::after_first_step(std::numeric_limits<double>::quiet_NaN(), {1.0}, {1.0}).finish()),
                 SingularPointError);
    // A state whose modulus collapses to 0 after one step (e underflowed) never meets the
    // convergence test: the step budget ends it.
    auto collapsing = CelLoop<1>::after_first_step(0.5, {1.0}, {1.0});
    collapsing.e = 0.0;
    EXPECT_THROW(collapsing.finish(), ConvergenceError);
}

TEST(IterationBounds, StepBudgetRaisesConvergenceErrorNamingTheMethod) {
    internal::StepBudget budget(3, "the test loop");
    budget.step();
    budget.step();
    budget.step();
    try {
        budget.step();
        FAIL() << "the fourth step must raise";
    } catch (const ConvergenceError& e) {
        EXPECT_NE(std::string(e.what()).find("the test loop"), std::string::npos);
    }
}
