// The thin-loop field kernel, written once for one point (double) and for packs of points (the
// lanes of numerics/lanes.hpp), so that the batch and the single-point functions perform the
// very same floating-point operations and agree to the last bit. Private to the engine.
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
//   U = (b0 + a0 em) D,   W = 2 r (b1 + a1 em)
// (b + a em becoming b F(u) + a em G(u) once the steps left are summed, see kTailGap):
// two divisions per point (kc and the last line) and one square root per Gauss step. Every
// quantity is a sum or product of positive numbers except U + (1 - r) W, which cancels only
// where Bz itself changes sign. Method: M. Ortner, P. Leitner, F. Slanovc, Magnetism 3(1) (2023)
// 11-31; R. Bulirsch, Numer. Math. 13 (1969) 305-315; the arrangement is our own.
#pragma once

#include <cstddef>

#include "numerics/bulirsch_cel.hpp"
#include "numerics/lanes.hpp"

namespace coilwright::internal {

// The kernel works in loop radii on points with |z|, r below kKernelReach and alpha^2 above
// kKernelNearest^2, so no intermediate over- or underflows; loop_field takes the few points
// outside (farther than 1e50 radii, closer to the wire than 1e-100 radii) the careful way.
inline constexpr double kKernelReach = 1e50;
inline constexpr double kKernelNearest2 = 1e-200;
// Gauss steps the kernel may take: kc >= 1e-100 needs fewer than 15; the cap (the scalar
// iteration's, bulirsch_cel.hpp) only bounds the work.
inline constexpr int kMaxGaussSteps = kCelMaxSteps;

// The kernel takes at least one Gauss step after the hand-made first one and stops once the
// two means g and qc agree to kTailGap (relative); it sums the steps left in closed form
// (finish()). With em = g + qc and u = ((g - qc) / em)^2, each further step maps u to
// ((1 - s) / (1 + s))^2, s = sqrt(1 - u), and the iteration's limit is
// (b F(u) + a em G(u)) / (em (em + em)) in place of (b + a em) / (em (em + em)), with
//   F(u) = sum c_k^2 (2k + 1) / (k + 1) u^k = 2F1(1/2, 3/2; 2; u),
//   G(u) = sum c_k^2 / (k + 1) u^k = 2F1(1/2, 1/2; 2; u),   c_k = binom(2k, k) / 4^k
// (Gauss's hypergeometric series, DLMF 15.2.1). Our own derivation: the power series that the
// step's recurrence leaves invariant, solved order by order in exact fractions (they match
// these closed forms term by term). At the gap 0.4, u <= (0.4 / 1.6)^2 = 1/16 and the terms
// left out (from k = 14: 0.043 u^14 in F) add up to less than 1e-18. After the one step 99 %
// of the points of a coil's working volume have converged: about three of the four Gauss steps
// (and their square roots) that a gap of 1e-9 would take are saved.
inline constexpr double kTailGap = 0.4;
inline constexpr int kTailTerms = 14;  // k = 0 ... 13; the coefficients are exact in binary
inline constexpr double kTailF[kTailTerms] = {1.0,
                                              3.0 / 8,
                                              15.0 / 64,
                                              175.0 / 1024,
                                              2205.0 / 16384,
                                              14553.0 / 131072,
                                              99099.0 / 1048576,
                                              2760615.0 / 33554432,
                                              78217425.0 / 1073741824,
                                              561427295.0 / 8589934592,
                                              4072899831.0 / 68719476736,
                                              59612442981.0 / 1099511627776,
                                              878901402925.0 / 17592186044416,
                                              6519323593125.0 / 140737488355328};
inline constexpr double kTailG[kTailTerms] = {1.0,
                                              1.0 / 8,
                                              3.0 / 64,
                                              25.0 / 1024,
                                              245.0 / 16384,
                                              1323.0 / 131072,
                                              7623.0 / 1048576,
                                              184041.0 / 33554432,
                                              4601025.0 / 1073741824,
                                              29548805.0 / 8589934592,
                                              193947611.0 / 68719476736,
                                              2591845347.0 / 1099511627776,
                                              35156056117.0 / 17592186044416,
                                              241456429375.0 / 140737488355328};

// The kernel's state for one point or one pack of points, in three stages: start (geometry and
// the first Gauss step, done by hand), step (one more Gauss step, only in lanes still active)
// and finish (the field). Single points and packs run the same stages, so they agree bitwise:
// start, step<true> once (every point takes it), step while active, finish.
// Products followed by a sum go through L::mul_add: fused only in the Fused lanes (AVX2+FMA copy).
template <class L>
struct KernelState {
    using V = typename L::V;
    // Kept for finish(): z, 1 - r, 2 r (loop radii), beta^3 and D = alpha^2 (1 + kc).
    V z_n, one_minus_r, two_r, beta3, d;
    // Bulirsch's qc, em, g (his e is qc g); the two integrands' a and b, stored multiplied by t.
    V qc, em, g, a0, b0, a1, b1, t;

    // Only for points inside the kernel's range (in_kernel_range).
    COILWRIGHT_LANE_INLINE static KernelState start(V z, V r, V omr) {
        KernelState s;
        const V one_plus_r = 1.0 + r;
        const V z2 = z * z;
        const V alpha2 = L::mul_add(omr, omr, z2);
        const V beta2 = L::mul_add(one_plus_r, one_plus_r, z2);
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
        s.a0 = L::splat(1.0);
        s.b0 = L::splat(2.0);
        s.a1 = 1.0 + kc;
        s.b1 = 2.0 * kc;
        s.t = L::splat(1.0);
        return s;
    }

    // Lanes whose iteration has not converged yet.
    COILWRIGHT_LANE_INLINE typename L::M active() const { return L::less(g * kTailGap, L::abs(g - qc)); }

    // One Gauss step in the lanes of `m` (the others keep their state); in every lane when
    // kEveryLane (no per-lane selects while no lane has converged). Bulirsch's step is
    //   a' = a + b / p,  b' = 2 (b + a e' / p),  p' = p + e' / p,  e' = qc' em;
    // here p = em throughout (both start at 1 + kc, and then p' = em + qc' = em'), so e' / p
    // is qc'. The division by em is carried in t instead of done: a and b are stored times t.
    template <bool kEveryLane = false>
    COILWRIGHT_LANE_INLINE void step(typename L::M m) {
        const V qc_next = 2.0 * L::sqrt(qc * g);  // e = qc g, formed when needed
        const V two_em = em + em;
        const V a0_next = L::mul_add(a0, em, b0), b0_next = two_em * L::mul_add(a0, qc_next, b0);
        const V a1_next = L::mul_add(a1, em, b1), b1_next = two_em * L::mul_add(a1, qc_next, b1);
        const V t_next = t * em, em_next = em + qc_next;
        if constexpr (kEveryLane) {
            qc = qc_next;
            a0 = a0_next;
            b0 = b0_next;
            a1 = a1_next;
            b1 = b1_next;
            t = t_next;
            g = em;
            em = em_next;
        } else {
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

    // Bz and Br, times `scale`, for n states side by side (the packs of a block, or one point).
    // Bulirsch's result (pi/2) (b + a em) / (em (em + p)) with p = em, after the Gauss steps not
    // taken (see kTailGap): with u = ((g - qc) / em)^2 (em = g + qc) the iteration's limit is
    // (b F(u) + a em G(u)) / (em (em + em)). The polynomials take each term for all states in
    // turn, so that their chains of multiply-adds overlap.
    template <std::size_t N>
    COILWRIGHT_LANE_INLINE static void finish(const KernelState (&s)[N], double scale, V (&bz)[N], V (&br)[N]) {
        V inverse[N], u[N], f[N], g_u[N];
        for (std::size_t k = 0; k < N; ++k) {
            const V scaled_t = s[k].beta3 * s[k].d * s[k].t;
            inverse[k] = 1.0 / (scaled_t * (2.0 * s[k].em * s[k].em));
            // 1 / em^2 without a second division (em >= 1, so it is finite where the inverse is).
            const V gap = s[k].g - s[k].qc;
            u[k] = gap * gap * (inverse[k] * (scaled_t * 2.0));
            f[k] = L::splat(kTailF[kTailTerms - 1]);
            g_u[k] = L::splat(kTailG[kTailTerms - 1]);
        }
        // In groups of up to four states, whose twelve polynomial values fit in registers.
        constexpr std::size_t kGroup = N < 4 ? N : 4;
        static_assert(N % kGroup == 0);
        for (std::size_t k0 = 0; k0 < N; k0 += kGroup) {
            V fg[kGroup], gg[kGroup], ug[kGroup];
            COILWRIGHT_UNROLL(4)
            for (std::size_t k = 0; k < kGroup; ++k) {
                fg[k] = f[k0 + k];
                gg[k] = g_u[k0 + k];
                ug[k] = u[k0 + k];
            }
            for (int j = kTailTerms - 2; j >= 0; --j) {
                const V cf = L::splat(kTailF[j]), cg = L::splat(kTailG[j]);
                COILWRIGHT_UNROLL(4)
                for (std::size_t k = 0; k < kGroup; ++k) {
                    fg[k] = L::mul_add(fg[k], ug[k], cf);
                    gg[k] = L::mul_add(gg[k], ug[k], cg);
                }
            }
            COILWRIGHT_UNROLL(4)
            for (std::size_t k = 0; k < kGroup; ++k) {
                f[k0 + k] = fg[k];
                g_u[k0 + k] = gg[k];
            }
        }
        for (std::size_t k = 0; k < N; ++k) {
            const KernelState& t = s[k];
            const V axial = L::mul_add(t.a0 * t.em, g_u[k], t.b0 * f[k]) * t.d;
            const V w = t.two_r * L::mul_add(t.a1 * t.em, g_u[k], t.b1 * f[k]);
            const V factor = scale * inverse[k];
            bz[k] = L::mul_add(t.one_minus_r, w, axial) * factor;
            br[k] = t.z_n * w * factor;
        }
    }
};

// Whether the kernel may be used at this point (false for NaN and infinities too).
template <class L>
COILWRIGHT_LANE_INLINE auto in_kernel_range(typename L::V z_n, typename L::V r_n, typename L::V one_minus_r) {
    const typename L::V z2 = z_n * z_n;
    const auto reach = L::splat(kKernelReach);
    // Each test into its own mask first: all four are taken (no branch), as bits for packs.
    const auto near_in_z = L::less(L::abs(z_n), reach), not_negative = L::less_equal(L::splat(0.0), r_n);
    const auto near_in_r = L::less(r_n, reach), off_the_wire = L::less(L::splat(kKernelNearest2), one_minus_r * one_minus_r + z2);
    return near_in_z & not_negative & near_in_r & off_the_wire;
}

}  // namespace coilwright::internal
