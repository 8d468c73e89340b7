// The corner sums of the thick-pair angle integral at one angle, in double (internal): the
// weighted primitive over the corners and the sum of the terms' magnitudes (thick_pair.cpp).
#pragma once

#include "inductance/rectangular_primitive.hpp"

namespace coilwright::internal {

struct CornerSum {
    double value = 0.0, magnitude = 0.0;
};

// Sum over i < count of w[i] * P_k(x[i], y[i], u[i]) at the angle `a`, and of its magnitudes.
// Where the processor has AVX2 (chosen at run time, so the library stays portable), four
// corners go through the primitive at once on the lanes of a pack (numerics/lane_math.hpp):
// 2.5 times faster than one by one with the C library. Elsewhere one by one.
CornerSum corner_sum(const AngleValues<double>& a, const double* x, const double* y, const double* u,
                     const double* w, int count, int k);

// The same with the copy named (for tests): packs fall back to one by one where the processor
// lacks AVX2 or the build has no pack copy.
enum class CornerCode { OneByOne, Packs };
CornerSum corner_sum_using(CornerCode code, const AngleValues<double>& a, const double* x, const double* y,
                           const double* u, const double* w, int count, int k);

}  // namespace coilwright::internal
