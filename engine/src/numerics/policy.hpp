// The engine's one error policy: every error leaves the engine through one of these calls, and
// every iterative loop runs under a StepBudget, so no loop can spin for ever and nothing but
// the engine's own error types (errors.hpp) escapes it. (The manner of Boost.Math's
// raise_error policies and its checked series counts.)
#pragma once

#include <string>

#include "coilwright/errors.hpp"

namespace coilwright::internal {

// An argument outside its domain.
[[noreturn]] inline void raise_domain_error(const std::string& message) { throw DomainError(message); }

// A point where the field is singular, or a result that is not representable.
[[noreturn]] inline void raise_singular_point(const std::string& message) { throw SingularPointError(message); }

// An iterative method that did not reach its tolerance, or a search that found nothing.
[[noreturn]] inline void raise_no_convergence(const std::string& message) { throw ConvergenceError(message); }

// The step count of one iterative loop: `for (StepBudget budget(64, "what"); cond; budget.step())`.
// step() raises ConvergenceError naming the method once max_steps steps have been taken.
class StepBudget {
public:
    constexpr StepBudget(int max_steps, const char* method) : left_(max_steps), method_(method) {}
    void step() {
        if (--left_ < 0) raise_no_convergence(std::string(method_) + " did not converge");
    }
    int left() const { return left_; }

private:
    int left_;
    const char* method_;
};

}  // namespace coilwright::internal
