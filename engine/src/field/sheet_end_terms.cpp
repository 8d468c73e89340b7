// End terms of the thin-sheet field (items 1 to 3 of solenoid.cpp), one at a time or in packs.
#include "field/sheet_end_terms.hpp"

#include <algorithm>
#include <array>
#include <cmath>

#include "coilwright/constants.hpp"
#include "numerics/bulirsch_cel.hpp"
#include "numerics/cpu_features.hpp"
#include "numerics/lanes.hpp"
#include "numerics/policy.hpp"

namespace coilwright::internal {

namespace {

// The trapezoidal sum uses N >= this / strip width points (error ~ exp(-N width)).
constexpr double kTrapezoidExponent = 40.0;
constexpr double kInvPi = 1.0 / kPi;
// norm2 takes the plain square root between these magnitudes (hypot outside them).
constexpr double kPlainNormMin = 1e-150, kPlainNormMax = 1e150;

// sqrt(x^2 + y^2) without the cost of glibc's hypot (a third of the kernel's time); hypot only
// where the squares could overflow or underflow.
inline double norm2(double x, double y) {
    const double m = std::max(std::fabs(x), std::fabs(y));
    if (m < kPlainNormMax && m > kPlainNormMin) return std::sqrt(x * x + y * y);
    return std::hypot(x, y);
}

template <int N>
const std::array<double, N / 2 + 1>& half_period_cosines() {
    static const std::array<double, N / 2 + 1> table = [] {
        std::array<double, N / 2 + 1> t{};
        for (int j = 0; j <= N / 2; ++j) t[static_cast<std::size_t>(j)] = std::cos(2.0 * kPi * j / N);
        return t;
    }();
    return table;
}

// Trapezoidal sum of item 3 with N points per period (even integrand: half a period), all
// lengths scaled by 1 / s (= t) so that nothing overflows for far points.
template <int N>
double solid_angle_sum(double zeta_over_s, double r_over_s, double t) {
    const auto& cosines = half_period_cosines<N>();
    double sum = 0.0;
    for (int j = 0; j <= N / 2; ++j) {
        const double rc = r_over_s * (cosines[static_cast<std::size_t>(j)] * t);
        const double rr = std::sqrt(t * t + 1.0 - 2.0 * rc);  // R / s
        const double f = 1.0 / (rr * (rr + 1.0 - rc));
        sum += (j == 0 || j == N / 2) ? f : 2.0 * f;
    }
    return zeta_over_s * (t * t) * sum / (2.0 * N);
}

struct EndGeometry {
    double beta, kc, zeta_over_beta, k2;
};

EndGeometry end_geometry(double zeta, double r, double one_minus_r) {
    const double alpha = norm2(one_minus_r, zeta);
    const double beta = norm2(1.0 + r, zeta);
    if (alpha == 0.0) raise_singular_point("the point lies on the rim of the current sheet");
    return {beta, alpha / beta, zeta / beta, (4.0 * r / beta) / beta};
}

// -cel(kc, 1, 1, -1) / k^2 of item 1: after the first step a = 0, b = 2 / (1 + kc), p = 1 + kc.
template <std::size_t N>
void set_vector(CelLoop<N>& c, std::size_t i, double kc) {
    c.p[i] = 1.0 + kc;
    c.a[i] = 0.0;
    c.b[i] = 2.0 / (1.0 + kc);
}

EndTerms one_end(double zeta, double r, double one_minus_r, bool want_axial, bool want_vector, double min_split_k2) {
    want_vector = want_vector && r > 0.0;
    if (zeta == 0.0) want_axial = false;  // G(0) = 0, and W(0) = 0 outside the radius
    EndTerms out;
    if (!want_axial && !want_vector) return out;
    const EndGeometry e = end_geometry(zeta, r, one_minus_r);
    const double kc = e.kc;
    const double prefactor = e.zeta_over_beta * kInvPi / (1.0 + r);
    const double vector_scale = e.k2 * kInvPi / e.beta;

    if (want_axial && one_minus_r > 0.0) {
        // G = prefactor * cel(kc, g^2, 1, g), g = gamma > 0, first Gauss step by hand from
        // p = g, a = 1, b / p = 1: every term stays positive.
        const double g = one_minus_r / (1.0 + r);
        auto c = CelLoop<2>::after_first_step(kc);
        c.p[0] = g + kc / g;
        c.a[0] = 1.0 + 1.0 / g;
        c.b[0] = 2.0 * (1.0 + kc / g);
        set_vector(c, 1, kc);
        const auto v = c.finish();
        out.axial = prefactor * v[0];
        if (want_vector) out.vector = vector_scale * v[1];
        return out;
    }
    if (want_axial && one_minus_r == 0.0) {
        // r = 1: the limit gamma -> 0+ of the Derby-Olbert form, G = 1/4 + kc K(kc) / (2 pi);
        // K = cel(kc, 1, 1, 1) after its first step shares p = 1 + kc with A.
        auto c = CelLoop<2>::after_first_step(kc);
        c.p[0] = 1.0 + kc;
        c.a[0] = 2.0;
        c.b[0] = 2.0 * (1.0 + kc);
        set_vector(c, 1, kc);
        const auto v = c.finish();
        out.axial = 0.25 + kc * v[0] * (0.5 * kInvPi);
        if (want_vector) out.vector = vector_scale * v[1];
        return out;
    }
    if (want_axial && e.k2 >= min_split_k2) {
        // W for r > 1 by the split form of item 2: X and Y share p = g + kc / g.
        const double g = -one_minus_r / (1.0 + r);  // -gamma > 0
        const double delta = 2.0 / (1.0 + r);       // 1 - g, exact
        const double kc_minus_g = ((4.0 * r / (1.0 + r)) * (e.zeta_over_beta * e.zeta_over_beta) / (1.0 + r)) / (kc + g);
        auto c = CelLoop<3>::after_first_step(kc);
        c.p[0] = c.p[1] = g + kc / g;
        c.a[0] = 1.0;
        c.b[1] = 1.0;
        set_vector(c, 2, kc);
        const auto v = c.finish();
        out.axial = prefactor * (delta * v[0] - 2.0 * kc_minus_g * v[1]) / g;
        if (want_vector) out.vector = vector_scale * v[2];
        return out;
    }
    if (want_axial) out.axial = disk_part_by_sum(zeta, r);  // r > 1, far along the axis direction
    if (want_vector) {
        auto c = CelLoop<1>::after_first_step(kc);
        set_vector(c, 0, kc);
        out.vector = vector_scale * c.finish()[0];
    }
    return out;
}

void end_terms_one_by_one(const EndTermRequest* q, int count, double min_split_k2, EndTerms* out) {
    for (int i = 0; i < count; ++i) out[i] = end_terms(q[i], min_split_k2);
}

#if defined(COILWRIGHT_HAVE_AVX2_FMA_CODE) && defined(COILWRIGHT_VECTOR_LANES)
#define COILWRIGHT_END_TERM_PACKS 1

// The forms one_end takes, as far as packs run them: the cel iteration with two integrands
// (G and A, inside the radius), three (X, Y and A, outside it) or one (A alone).
enum class EndForm { Nothing, Inside, Outside, VectorOnly, Scalar };

EndForm end_form_of(const EndTermRequest& q) {
    const bool want_vector = q.want_vector && q.r > 0.0, want_axial = q.want_axial && q.zeta != 0.0;
    if (!want_axial && !want_vector) return EndForm::Nothing;
    // Packs take the plain square roots of norm2 only.
    const double m_alpha = std::max(std::fabs(q.one_minus_r), q.zeta), m_beta = std::max(1.0 + q.r, q.zeta);
    if (!(m_alpha > kPlainNormMin && m_alpha < kPlainNormMax && m_beta > kPlainNormMin && m_beta < kPlainNormMax))
        return EndForm::Scalar;
    if (!want_axial) return EndForm::VectorOnly;
    if (q.one_minus_r > 0.0) return EndForm::Inside;
    if (q.one_minus_r < 0.0) return EndForm::Outside;  // if every lane has k^2 >= min_split_k2
    return EndForm::Scalar;                             // r = 1
}

// CelLoop<N>::finish on a pack of lanes L (four with AVX2, eight with AVX-512): lanes that have
// converged keep their state while the others step, so each lane ends with the bits of the
// scalar loop. With kSharedP the first two integrands start with one p (X and Y of the outside
// form), which then stays equal: one division serves both, as it gives the same bits as two.
template <class L, int N, bool kSharedP = false>
struct CelPack {
    using V = typename L::V;
    V qc, em, g, e;
    V p[N], a[N], b[N];
    typename L::M active;

    COILWRIGHT_LANE_INLINE void after_first_step(V kc) {
        qc = kc;
        em = 1.0 + kc;
        g = L::splat(1.0);
        e = kc;
    }

    COILWRIGHT_LANE_INLINE void set_vector(int i, V kc) {
        p[i] = 1.0 + kc;
        a[i] = V{};
        b[i] = 2.0 / (1.0 + kc);
    }

    COILWRIGHT_LANE_INLINE void begin() {
        if (!L::all(L::less(V{}, qc))) raise_singular_point("the point is too close to a current filament to be represented");
        active = L::less(g * kCelTolerance, L::abs(g - qc));
    }
    COILWRIGHT_LANE_INLINE bool running() const { return L::any(active); }

    COILWRIGHT_LANE_INLINE void step() {
        const V qc_next = 2.0 * L::sqrt(e);
        const V e_next = qc_next * em;
        V inv_p_shared{};
        for (int i = 0; i < N; ++i) {
            if (!(kSharedP && i == 1)) inv_p_shared = 1.0 / p[i];
            const V inv_p = inv_p_shared;
            const V ge = e_next * inv_p;
            const V f = a[i];
            a[i] = L::select(active, a[i] + b[i] * inv_p, a[i]);
            b[i] = L::select(active, 2.0 * (b[i] + f * ge), b[i]);
            p[i] = L::select(active, p[i] + ge, p[i]);
        }
        qc = L::select(active, qc_next, qc);
        e = L::select(active, e_next, e);
        g = L::select(active, em, g);
        em = L::select(active, em + qc_next, em);
        active = L::less(g * kCelTolerance, L::abs(g - qc));
    }

    COILWRIGHT_LANE_INLINE void results(V out[N]) const {
        for (int i = 0; i < N; ++i) out[i] = kHalfPi * (b[i] + a[i] * em) / (em * (em + p[i]));
    }
};

// K packs iterated in one loop: the iteration is a chain of square roots and divisions, so the
// processor overlaps independent chains.
template <int K, class Cel>
COILWRIGHT_LANE_INLINE void finish_together(Cel (&c)[K]) {
    bool running = false;
    for (int k = 0; k < K; ++k) {
        c[k].begin();
        running = running || c[k].running();
    }
    for (StepBudget budget(kCelMaxSteps, "the elliptic integral (Bulirsch's cel)"); running; budget.step()) {
        running = false;
        for (int k = 0; k < K; ++k)
            if (c[k].running()) {
                c[k].step();
                running = running || c[k].running();
            }
    }
}

// K packs of requests of one form (lanes past `count` repeat the first); false where the outside
// form does not apply to every lane (the caller then takes them one at a time). The arithmetic
// is one_end's, operation for operation (no fused multiply-adds: the engine is compiled without
// contraction).
template <class L, int K>
COILWRIGHT_LANE_INLINE bool packs_of_a_form(const EndTermRequest* q, int count, EndForm form, double min_split_k2,
                                            EndTerms* out) {
    using V = typename L::V;
    constexpr int W = L::kWidth;
    V kc[K], prefactor[K], vector_scale[K], one_plus_r[K], r[K], omr[K], zeta_over_beta[K];
    for (int k = 0; k < K; ++k) {
        V zeta{};
        for (int j = 0; j < W; ++j) {
            const int i = k * W + j;
            const EndTermRequest& l = q[i < count ? i : 0];
            zeta[j] = l.zeta;
            r[k][j] = l.r;
            omr[k][j] = l.one_minus_r;
        }
        one_plus_r[k] = 1.0 + r[k];
        const V alpha = L::sqrt(omr[k] * omr[k] + zeta * zeta);
        const V beta = L::sqrt(one_plus_r[k] * one_plus_r[k] + zeta * zeta);
        kc[k] = alpha / beta;
        zeta_over_beta[k] = zeta / beta;
        const V k2 = (4.0 * r[k] / beta) / beta;
        if (form == EndForm::Outside && !L::all(L::less_equal(L::splat(min_split_k2), k2))) return false;
        prefactor[k] = zeta_over_beta[k] * kInvPi / one_plus_r[k];
        vector_scale[k] = k2 * kInvPi / beta;
    }
    V axial[K]{}, vector[K]{};
    if (form == EndForm::Inside) {
        CelPack<L, 2> c[K]{};
        for (int k = 0; k < K; ++k) {
            const V g = omr[k] / one_plus_r[k];
            c[k].after_first_step(kc[k]);
            c[k].p[0] = g + kc[k] / g;
            c[k].a[0] = 1.0 + 1.0 / g;
            c[k].b[0] = 2.0 * (1.0 + kc[k] / g);
            c[k].set_vector(1, kc[k]);
        }
        finish_together(c);
        for (int k = 0; k < K; ++k) {
            V v[2];
            c[k].results(v);
            axial[k] = prefactor[k] * v[0];
            vector[k] = vector_scale[k] * v[1];
        }
    } else if (form == EndForm::Outside) {
        CelPack<L, 3, true> c[K]{};
        V g[K], kc_minus_g[K];
        for (int k = 0; k < K; ++k) {
            g[k] = -omr[k] / one_plus_r[k];
            kc_minus_g[k] = ((4.0 * r[k] / one_plus_r[k]) * (zeta_over_beta[k] * zeta_over_beta[k]) / one_plus_r[k]) / (kc[k] + g[k]);
            c[k].after_first_step(kc[k]);
            c[k].p[0] = c[k].p[1] = g[k] + kc[k] / g[k];
            c[k].a[0] = L::splat(1.0);
            c[k].b[1] = L::splat(1.0);
            c[k].set_vector(2, kc[k]);
        }
        finish_together(c);
        for (int k = 0; k < K; ++k) {
            V v[3];
            c[k].results(v);
            const V delta = 2.0 / one_plus_r[k];
            axial[k] = prefactor[k] * (delta * v[0] - 2.0 * kc_minus_g[k] * v[1]) / g[k];
            vector[k] = vector_scale[k] * v[2];
        }
    } else {
        CelPack<L, 1> c[K]{};
        for (int k = 0; k < K; ++k) {
            c[k].after_first_step(kc[k]);
            c[k].set_vector(0, kc[k]);
        }
        finish_together(c);
        for (int k = 0; k < K; ++k) {
            V v[1];
            c[k].results(v);
            vector[k] = vector_scale[k] * v[0];
        }
    }
    for (int i = 0; i < count && i < K * W; ++i) {
        const int k = i / W, j = i % W;
        out[i] = EndTerms{};
        if (form != EndForm::VectorOnly) out[i].axial = axial[k][j];
        if (q[i].want_vector && q[i].r > 0.0) out[i].vector = vector[k][j];
    }
    return true;
}

// Runs of requests of one form in packs: eight at a time (two four-lane packs in the AVX2 copy,
// one eight-lane pack in the AVX-512 copy), then four, then one by one.
template <class Wide, int kWideCount>
COILWRIGHT_LANE_INLINE void end_term_packs(const EndTermRequest* q, int count, double min_split_k2, EndTerms* out) {
    constexpr int kWide = Wide::kWidth * kWideCount;
    for (int first = 0; first < count;) {
        const int left = std::min(kWide, count - first);
        const EndForm form = end_form_of(q[first]);
        int same = 1;
        while (same < left && end_form_of(q[first + same]) == form) ++same;
        const bool packable = form == EndForm::Inside || form == EndForm::Outside || form == EndForm::VectorOnly;
        // Lanes pay from two requests on; a short run of one form leaves the rest for the next.
        if (packable && same > kWide / 2 &&
            packs_of_a_form<Wide, kWideCount>(q + first, same, form, min_split_k2, out + first)) {
            first += same;
            continue;
        }
        const int four = std::min(same, kPackWidth);
        if (packable && four >= 2 && packs_of_a_form<PackLanes, 1>(q + first, four, form, min_split_k2, out + first)) {
            first += four;
            continue;
        }
        out[first] = end_terms(q[first], min_split_k2);
        ++first;
    }
}

[[gnu::target("avx2"), gnu::flatten]] void end_terms_in_packs(const EndTermRequest* q, int count, double min_split_k2,
                                                              EndTerms* out) {
    end_term_packs<PackLanes, 2>(q, count, min_split_k2, out);
}

#ifdef COILWRIGHT_HAVE_AVX512_CODE
#define COILWRIGHT_END_TERM_AVX512 1
[[gnu::target("avx512f,avx512dq"), gnu::flatten]] void end_terms_in_wide_packs(const EndTermRequest* q, int count,
                                                                              double min_split_k2, EndTerms* out) {
    end_term_packs<FusedPack8Lanes, 1>(q, count, min_split_k2, out);  // its mul_add is not used here
}
#endif
#endif

}  // namespace

EndTerms end_terms(const EndTermRequest& q, double min_split_k2) {
    return one_end(q.zeta, q.r, q.one_minus_r, q.want_axial, q.want_vector, min_split_k2);
}

void end_terms_using(EndTermCode code, const EndTermRequest* q, int count, double min_split_k2, EndTerms* out) {
#ifdef COILWRIGHT_END_TERM_PACKS
#ifdef COILWRIGHT_END_TERM_AVX512
    static const bool wide = processor_has_avx512();
    if (code == EndTermCode::Packs && wide) return end_terms_in_wide_packs(q, count, min_split_k2, out);
#endif
    static const bool packs = processor_has_avx2_fma();
    if (code != EndTermCode::OneByOne && packs) return end_terms_in_packs(q, count, min_split_k2, out);
#endif
    (void)code;
    end_terms_one_by_one(q, count, min_split_k2, out);
}

void end_terms(const EndTermRequest* q, int count, double min_split_k2, EndTerms* out) {
    end_terms_using(EndTermCode::Packs, q, count, min_split_k2, out);
}

// W = Omega / (4 pi) by the direct sum; needs r^2 + zeta^2 > r (true wherever it is used).
double disk_part_by_sum(double zeta, double r) {
    if (r == 0.0) {
        const double R = norm2(1.0, zeta);
        return 0.5 / (R * (R + zeta));  // on the axis: (1 - zeta / R) / 2 without cancellation
    }
    const double s = norm2(r, zeta);
    const double t = 1.0 / s;
    const double strip = std::acosh(0.5 * (s / r) * (s + t));  // acosh((1 + s^2) / (2 r))
    const double needed = kTrapezoidExponent / strip;
    const double zs = zeta * t, rs = r * t;
    if (needed <= 4) return solid_angle_sum<4>(zs, rs, t);
    if (needed <= 8) return solid_angle_sum<8>(zs, rs, t);
    if (needed <= 12) return solid_angle_sum<12>(zs, rs, t);
    if (needed <= 16) return solid_angle_sum<16>(zs, rs, t);
    if (needed <= 24) return solid_angle_sum<24>(zs, rs, t);
    if (needed <= 32) return solid_angle_sum<32>(zs, rs, t);
    if (needed <= 48) return solid_angle_sum<48>(zs, rs, t);
    return solid_angle_sum<64>(zs, rs, t);  // not reached for the k^2 and G limits above
}

}  // namespace coilwright::internal
