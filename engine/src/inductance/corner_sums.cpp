// Corner sums one by one or four at a time (see corner_sums.hpp). The pack copy is compiled for
// AVX2 with every call inlined (flatten), so no vector crosses a call between code built for
// different processors; it takes and returns plain doubles.
#include "inductance/corner_sums.hpp"

#include <cmath>
#include <cstring>

#include "numerics/cpu_features.hpp"
#include "numerics/lanes.hpp"

namespace coilwright::internal {

namespace {

CornerSum one_by_one(const AngleValues<double>& a, const double* x, const double* y, const double* u,
                     const double* w, int count, int k) {
    CornerSum sum;
    for (int i = 0; i < count; ++i) {
        const double term = w[i] * rectangular_primitive(a, x[i], y[i], u[i], k);
        sum.value += term;
        sum.magnitude += std::fabs(term);
    }
    return sum;
}

#if defined(COILWRIGHT_HAVE_AVX2_FMA_CODE) && defined(COILWRIGHT_VECTOR_LANES)
#define COILWRIGHT_CORNER_PACKS 1
// Four corners a pack; a short last pack repeats the first corner with weight 0. Written for
// the default processor and inlined into in_packs below: the calls that pass packs stay
// between functions of one target (clang refuses a pack argument across targets).
COILWRIGHT_LANE_INLINE CornerSum four_at_a_time(const AngleValues<double>& a, const double* x, const double* y,
                                                const double* u, const double* w, int count, int k) {
    CornerSum sum;
    for (int first = 0; first < count; first += kPackWidth) {
        Pack px{}, py{}, pu{}, pw{};
        for (int j = 0; j < kPackWidth; ++j) {
            const bool real = first + j < count;
            const int i = real ? first + j : 0;
            px[j] = x[i];
            py[j] = y[i];
            pu[j] = u[i];
            pw[j] = real ? w[i] : 0.0;
        }
        const Pack terms = pw * rectangular_primitive(a, px, py, pu, k);
        for (int j = 0; j < kPackWidth; ++j) {
            sum.value += terms[j];
            sum.magnitude += std::fabs(terms[j]);
        }
    }
    return sum;
}

[[gnu::target("avx2"), gnu::flatten]] CornerSum in_packs(const AngleValues<double>& a, const double* x,
                                                         const double* y, const double* u, const double* w,
                                                         int count, int k) {
    return four_at_a_time(a, x, y, u, w, count, k);
}
#endif

}  // namespace

CornerSum corner_sum_using(CornerCode code, const AngleValues<double>& a, const double* x, const double* y,
                           const double* u, const double* w, int count, int k) {
#ifdef COILWRIGHT_CORNER_PACKS
    static const bool packs = processor_has_avx2_fma();
    if (code == CornerCode::Packs && packs) return in_packs(a, x, y, u, w, count, k);
#endif
    (void)code;
    return one_by_one(a, x, y, u, w, count, k);
}

CornerSum corner_sum(const AngleValues<double>& a, const double* x, const double* y, const double* u,
                     const double* w, int count, int k) {
    return corner_sum_using(CornerCode::Packs, a, x, y, u, w, count, k);
}

}  // namespace coilwright::internal
