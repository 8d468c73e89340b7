// Bulirsch's general complete elliptic integral
//
//   cel(kc, p, a, b) = integral_0^{pi/2} (a cos^2 t + b sin^2 t)
//                      / ((cos^2 t + p sin^2 t) sqrt(cos^2 t + kc^2 sin^2 t)) dt
//
// computed by Bulirsch's iteration of Gauss transformations: R. Bulirsch, "Numerical
// calculation of elliptic integrals and elliptic functions III", Numer. Math. 13 (1969)
// 305-315. When a, b and p are all positive the iteration only adds positive numbers, so
// it keeps full relative precision. Field kernels exploit this: they perform the first
// Gauss step by hand, factor out the small quantity that would otherwise cancel, and
// continue with CelLoop from an all-positive state (the approach of M. Ortner, P. Leitner,
// F. Slanovc, Magnetism 3(1) (2023) 11-31).
//
// This is the engine's one cel iteration: every caller (loop field, sheet field, mutual
// inductance, Nagaoka's coefficient) runs CelLoop::finish, with its step cap. The vectorised
// loop kernel (src/field/loop_kernel.hpp) runs the same steps on packs of points under the
// same cap and tolerance.
#pragma once

#include <array>
#include <cmath>
#include <cstddef>

#include "coilwright/constants.hpp"
#include "numerics/policy.hpp"

namespace coilwright::internal {

// Relative gap between successive arithmetic and geometric means at which the loop stops.
// The iteration converges quadratically, so the error left is of the order of its square.
inline constexpr double kCelTolerance = 1e-9;
// From kc = 1e-300 the means agree to kCelTolerance within 15 steps; a loop that runs longer
// was started outside the domain (NaN) and must not spin for ever.
inline constexpr int kCelMaxSteps = 40;

// The loop state for N integrands that share the modulus kc; each has its own characteristic
// p and numerators a, b. State names follow Bulirsch's paper: qc the current modulus, em the
// running mean, e = qc * em.
template <std::size_t N>
struct CelLoop {
    double qc;  // complementary modulus of the current stage (> 0)
    double em;  // running arithmetic mean
    double g;   // previous value of em, for the convergence test
    double e;   // qc * em of the previous stage
    std::array<double, N> p;  // square roots of the characteristics of the current stage (> 0)
    std::array<double, N> a, b;

    // Runs the remaining Gauss steps and returns the N integrals. A complementary modulus that
    // underflowed to 0 (a point within 1e-308 of a filament) would never converge: refused.
    std::array<double, N> finish() {
        if (!(qc > 0.0)) raise_singular_point("the point is too close to a current filament to be represented");
        for (StepBudget budget(kCelMaxSteps, "the elliptic integral (Bulirsch's cel)"); std::fabs(g - qc) > g * kCelTolerance;
             budget.step()) {
            qc = 2.0 * std::sqrt(e);
            e = qc * em;
            step();
        }
        std::array<double, N> out{};
        for (std::size_t i = 0; i < N; ++i) out[i] = kHalfPi * (b[i] + a[i] * em) / (em * (em + p[i]));
        return out;
    }

    // One Gauss transformation of the integrands and the means.
    void step() {
        for (std::size_t i = 0; i < N; ++i) {
            const double inv_p = 1.0 / p[i];
            const double ge = e * inv_p;
            const double f = a[i];
            a[i] += b[i] * inv_p;
            b[i] = 2.0 * (b[i] + f * ge);
            p[i] += ge;
        }
        g = em;
        em += qc;
    }

    // The state after a first Gauss step of cel(kc, .) that the caller took by hand; the
    // integrands' p, a and b are set by the caller (see after_first_step for the common case).
    static CelLoop after_first_step(double kc) {
        CelLoop s{};
        s.qc = kc;
        s.em = 1.0 + kc;
        s.g = 1.0;
        s.e = kc;
        return s;
    }

    // The same for N integrands of cel(kc, kc^2, ., .) (p = kc on entry, so that step needs no
    // division: afterwards p = 1 + kc for each); a and b are the results of that step.
    static CelLoop after_first_step(double kc, const std::array<double, N>& a, const std::array<double, N>& b) {
        CelLoop s = after_first_step(kc);
        s.p.fill(1.0 + kc);
        s.a = a;
        s.b = b;
        return s;
    }

    // Starts the loop for cel(kc, p, a, b) with p > 0 and kc != 0 (no hand-made first step).
    static CelLoop start(double kc, double p_char, const std::array<double, N>& a0, const std::array<double, N>& b0) {
        CelLoop s{};
        s.qc = std::fabs(kc);
        s.em = 1.0;
        s.e = s.qc;
        const double p = std::sqrt(p_char);
        for (std::size_t i = 0; i < N; ++i) {
            s.p[i] = p;
            s.a[i] = a0[i];
            s.b[i] = b0[i] / p;
        }
        s.step();
        return s;
    }
};

// General cel for p > 0 and kc != 0. Precision is full when a and b are positive too; mixed
// signs may cancel (the field kernels avoid them as described above).
inline double cel(double kc, double p, double a, double b) { return CelLoop<1>::start(kc, p, {a}, {b}).finish()[0]; }

}  // namespace coilwright::internal
