// The thin-loop field kernel, written once for one point (double) and for packs of points
// (compiler vector types), so that the batch and the single-point functions perform the very
// same floating-point operations and agree to the last bit. Private to the engine.
//
// Formulation (see loop.cpp for the cancellation-free integrals it rests on): with lengths in
// loop radii, alpha^2 = (1 - r)^2 + z^2, beta^2 = (1 + r)^2 + z^2 and kc = alpha / beta, the
// first Gauss step of Bulirsch's cel is done by hand and the iteration runs on two integrands
// that share kc: (a0, b0) from (1, 2) for the axial one, (a1, b1) from (1 + kc, 2 kc) for the
// radial one. That is the hand-made state k^2 (1/kc^2, 2/(kc (1 + kc))) times kc^2 (1 + kc) / k^2,
// which removes the divisions from the start; D = alpha^2 (1 + kc) puts the factor back. For
// cel(kc, kc^2, ., .) Bulirsch's p equals em at every step, so the division by p in each step is
// a division by em, which is carried along in t instead of done. At the end
//   Bz = (U + (1 - r) W) / (2 beta^3 D t em^2),   Br = z W / (2 beta^3 D t em^2),
//   U = (b0 + a0 em) D,   W = 2 r (b1 + a1 em):
// two divisions per point (kc and the last line) and one square root per Gauss step. Every
// quantity is a sum or product of positive numbers except U + (1 - r) W, which cancels only
// where Bz itself changes sign. Method: M. Ortner, P. Leitner, F. Slanovc, Magnetism 3(1) (2023)
// 11-31; R. Bulirsch, Numer. Math. 13 (1969) 305-315; the arrangement is our own.
#pragma once

#include <cmath>
#if defined(__SSE2__)
#include <emmintrin.h>
#endif

#include "numerics/bulirsch_cel.hpp"

namespace coilwright::internal {

// The kernel works in loop radii on points with |z|, r below kKernelReach and alpha^2 above
// kKernelNearest^2, so no intermediate over- or underflows; loop_field takes the few points
// outside (farther than 1e50 radii, closer to the wire than 1e-100 radii) the careful way.
inline constexpr double kKernelReach = 1e50;
inline constexpr double kKernelNearest2 = 1e-200;
// Gauss steps the kernel may take: kc >= 1e-100 needs fewer than 15; the cap (the scalar
// iteration's, bulirsch_cel.hpp) only bounds the work.
inline constexpr int kMaxGaussSteps = kCelMaxSteps;

// Lane operations for one point.
struct ScalarLanes {
    using V = double;
    using M = bool;
    [[gnu::always_inline]] static V splat(double x) { return x; }
    [[gnu::always_inline]] static V sqrt(V x) { return std::sqrt(x); }
    [[gnu::always_inline]] static V abs(V x) { return std::fabs(x); }
    [[gnu::always_inline]] static V select(M m, V a, V b) { return m ? a : b; }
    [[gnu::always_inline]] static bool any(M m) { return m; }
    [[gnu::always_inline]] static bool all(M m) { return m; }
};

// Lane operations for a pack of W points in a compiler vector type (GCC and Clang vector
// extensions: element-wise arithmetic and comparisons, ?: as a per-lane select).
template <class Vec, class Mask, int W>
struct PackLanes {
    using V = Vec;
    using M = Mask;
    [[gnu::always_inline]] static V splat(double x) { return V{} + x; }
    [[gnu::always_inline]] static V sqrt(V x) {
        V out;
        for (int i = 0; i < W; ++i) out[i] = std::sqrt(x[i]);  // one packed instruction with -fno-math-errno
        return out;
    }
    [[gnu::always_inline]] static V abs(V x) {  // clears the sign bit, as std::fabs
        return (V)((M)x & ~(M{} + static_cast<long long>(0x8000000000000000ULL)));
    }
    [[gnu::always_inline]] static V select(M m, V a, V b) { return m ? a : b; }
    // One bit per lane (bit i set where lane i of the mask is set).
    [[gnu::always_inline]] static unsigned lane_bits(M m) {
#if defined(__SSE2__)
        static_assert(sizeof(M) % 16 == 0);
        unsigned bits = 0;  // movmskpd on each 128-bit half: two lanes per instruction
        for (unsigned h = 0; h < sizeof(M) / 16; ++h) {
            __m128d half;
            __builtin_memcpy(&half, reinterpret_cast<const char*>(&m) + 16 * h, 16);
            bits |= static_cast<unsigned>(_mm_movemask_pd(half)) << (2 * h);
        }
        return bits;
#else
        unsigned bits = 0;
        for (int i = 0; i < W; ++i) bits |= (m[i] != 0 ? 1u : 0u) << i;
        return bits;
#endif
    }
    [[gnu::always_inline]] static bool any(M m) { return lane_bits(m) != 0; }
    [[gnu::always_inline]] static bool all(M m) { return lane_bits(m) == (1u << W) - 1; }
};

// The kernel's state for one point or one pack of points, in three stages: start (geometry and
// the first Gauss step, done by hand), step (one more Gauss step, only in lanes still active)
// and finish (the field). Single points and packs run the same stages, so they agree bitwise.
template <class L>
struct KernelState {
    using V = typename L::V;
    // Kept for finish(): z, 1 - r, 2 r (loop radii), beta^3 and D = alpha^2 (1 + kc).
    V z_n, one_minus_r, two_r, beta3, d;
    // Bulirsch's qc, em, g, e; the two integrands' a and b, stored multiplied by t.
    V qc, em, g, e, a0, b0, a1, b1, t;

    // Only for points inside the kernel's range (in_kernel_range).
    [[gnu::always_inline]] static KernelState start(V z, V r, V omr) {
        KernelState s;
        const V one_plus_r = 1.0 + r;
        const V z2 = z * z;
        const V alpha2 = omr * omr + z2;
        const V beta2 = one_plus_r * one_plus_r + z2;
        const V beta = L::sqrt(beta2);
        const V kc = L::sqrt(alpha2) / beta;
        s.z_n = z;
        s.one_minus_r = omr;
        s.two_r = 2.0 * r;
        s.beta3 = beta2 * beta;
        s.d = alpha2 * (1.0 + kc);
        s.qc = kc;
        s.em = 1.0 + kc;
        s.g = L::splat(1.0);
        s.e = kc;
        s.a0 = L::splat(1.0);
        s.b0 = L::splat(2.0);
        s.a1 = 1.0 + kc;
        s.b1 = 2.0 * kc;
        s.t = L::splat(1.0);
        return s;
    }

    // Lanes whose iteration has not converged yet.
    [[gnu::always_inline]] typename L::M active() const { return L::abs(g - qc) > g * kCelTolerance; }

    // One Gauss step in the lanes of `m` (the others keep their state); in every lane when
    // kEveryLane (no per-lane selects while no lane has converged). Bulirsch's step is
    //   a' = a + b / p,  b' = 2 (b + a e' / p),  p' = p + e' / p,  e' = qc' em;
    // here p = em throughout (both start at 1 + kc, and then p' = em + qc' = em'), so e' / p
    // is qc'. The division by em is carried in t instead of done: a and b are stored times t.
    template <bool kEveryLane = false>
    [[gnu::always_inline]] void step(typename L::M m) {
        const V qc_next = 2.0 * L::sqrt(e);
        const V two_em = em + em;
        const V a0_next = a0 * em + b0, b0_next = two_em * (b0 + a0 * qc_next);
        const V a1_next = a1 * em + b1, b1_next = two_em * (b1 + a1 * qc_next);
        const V e_next = qc_next * em, t_next = t * em, em_next = em + qc_next;
        if constexpr (kEveryLane) {
            e = e_next;
            qc = qc_next;
            a0 = a0_next;
            b0 = b0_next;
            a1 = a1_next;
            b1 = b1_next;
            t = t_next;
            g = em;
            em = em_next;
        } else {
            e = L::select(m, e_next, e);
            qc = L::select(m, qc_next, qc);
            a0 = L::select(m, a0_next, a0);
            b0 = L::select(m, b0_next, b0);
            a1 = L::select(m, a1_next, a1);
            b1 = L::select(m, b1_next, b1);
            t = L::select(m, t_next, t);
            g = L::select(m, em, g);
            em = L::select(m, em_next, em);
        }
    }

    // Bz and Br, times `scale`. Bulirsch's result (pi/2) (b + a em) / (em (em + p)) with p = em.
    [[gnu::always_inline]] void finish(double scale, V& bz, V& br) const {
        const V u = (b0 + a0 * em) * d;
        const V w = two_r * (b1 + a1 * em);
        const V factor = scale / (beta3 * d * t * (2.0 * em * em));
        bz = (u + one_minus_r * w) * factor;
        br = z_n * w * factor;
    }
};

// Whether the kernel may be used at this point (false for NaN and infinities too).
template <class L>
[[gnu::always_inline]] inline auto in_kernel_range(typename L::V z_n, typename L::V r_n, typename L::V one_minus_r) {
    const typename L::V z2 = z_n * z_n;
    return (L::abs(z_n) < kKernelReach) & (r_n >= 0.0) & (r_n < kKernelReach) &
           (one_minus_r * one_minus_r + z2 > kKernelNearest2);
}

}  // namespace coilwright::internal
