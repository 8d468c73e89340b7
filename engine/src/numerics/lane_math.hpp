// Logarithm and arc tangent, with square root, absolute value, sign and select, on the lanes of
// numerics/lanes.hpp (internal): one value (double or long double: the C library's own
// functions) or a pack of four doubles.
//
// On a pack made of compiler vector types the four lanes go through one branch-free polynomial
// each, the algorithms and coefficients of fdlibm 5.3 (Sun Microsystems, 1993; netlib.org/fdlibm,
// e_log.c and s_atan.c, freely distributable): log reduces x to 2^k (1 + f) with
// sqrt(2)/2 < 1 + f < sqrt(2) and sums an odd series in s = f / (2 + f); atan reduces |x| to one
// of five intervals with a table of atan at 1/2, 1, 3/2 and infinity, then a degree-22 odd
// polynomial. Both stay within one unit in the last place (tests/engine/test_lane_math.cpp:
// 0.73 and 0.84 at worst against long double over 2,000,000 arguments each). A pack holding a
// logarithm's argument outside the normal range (zero, subnormal, infinite, negative, NaN) is
// done lane by lane by the C library; on the array form of a pack every lane calls it.
#pragma once

#include <cfloat>
#include <cmath>

#include "numerics/lanes.hpp"

namespace coilwright::internal {

inline double lane_log(double x) { return std::log(x); }
inline long double lane_log(long double x) { return std::log(x); }
inline double lane_atan(double x) { return std::atan(x); }
inline long double lane_atan(long double x) { return std::atan(x); }
inline double lane_sqrt(double x) { return std::sqrt(x); }
inline long double lane_sqrt(long double x) { return std::sqrt(x); }
inline double lane_abs(double x) { return std::fabs(x); }
inline long double lane_abs(long double x) { return std::fabs(x); }
inline double lane_select(bool m, double a, double b) { return m ? a : b; }
inline long double lane_select(bool m, long double a, long double b) { return m ? a : b; }
inline double lane_copysign(double x, double s) { return std::copysign(x, s); }
inline long double lane_copysign(long double x, long double s) { return std::copysign(x, s); }

COILWRIGHT_LANE_INLINE Pack lane_sqrt(Pack x) { return PackLanes::sqrt(x); }
COILWRIGHT_LANE_INLINE Pack lane_abs(Pack x) { return pack_abs(x); }
COILWRIGHT_LANE_INLINE Pack lane_select(PackMask m, Pack a, Pack b) { return pack_select(m, a, b); }
COILWRIGHT_LANE_INLINE Pack lane_copysign(Pack x, Pack s) {
    const Pack zero{};
    return pack_select(s < zero, zero - pack_abs(x), pack_abs(x));  // -0 counts as positive: not met here
}

namespace lane_math_detail {

template <class F>
COILWRIGHT_LANE_INLINE Pack each_lane(Pack x, F f) {
    Pack out{};
    for (int i = 0; i < kPackWidth; ++i) out[i] = f(x[i]);
    return out;
}

}  // namespace lane_math_detail

#ifdef COILWRIGHT_VECTOR_LANES

COILWRIGHT_LANE_INLINE Pack lane_log(Pack x) {
    using lane_math_detail::each_lane;
    const Pack zero{};
    if (pack_lane_bits(~((x >= zero + DBL_MIN) & (x <= zero + DBL_MAX))) != 0)
        return each_lane(x, [](double v) { return std::log(v); });
    constexpr double ln2_hi = 6.93147180369123816490e-01, ln2_lo = 1.90821492927058770002e-10;
    constexpr double Lg1 = 6.666666666666735130e-01, Lg2 = 3.999999999940941908e-01, Lg3 = 2.857142874366239149e-01,
                     Lg4 = 2.222219843214978396e-01, Lg5 = 1.818357216161805012e-01, Lg6 = 1.531383769920937332e-01,
                     Lg7 = 1.479819860511658591e-01;
    const PackMask bits = (PackMask)x;
    // The biased exponent as a double without an integer conversion (none for packs before
    // AVX-512): its bits below those of 2^52, minus 2^52.
    const Pack biased = (Pack)(((bits >> 52) & 0x7ff) | 0x4330000000000000LL) - 4503599627370496.0;
    Pack m = (Pack)((bits & 0x000fffffffffffffLL) | 0x3ff0000000000000LL);  // [1, 2)
    const PackMask big = m > zero + 1.4142135623730951;
    m = pack_select(big, m * 0.5, m);
    const Pack k = (biased - 1023.0) + pack_select(big, zero + 1.0, zero);
    const Pack f = m - 1.0;
    const Pack hfsq = 0.5 * f * f;
    const Pack s = f / (2.0 + f);
    const Pack z = s * s, w = z * z;
    const Pack t1 = w * (Lg2 + w * (Lg4 + w * Lg6));
    const Pack t2 = z * (Lg1 + w * (Lg3 + w * (Lg5 + w * Lg7)));
    const Pack r = t2 + t1;
    return k * ln2_hi - ((hfsq - (s * (hfsq + r) + k * ln2_lo)) - f);
}

COILWRIGHT_LANE_INLINE Pack lane_atan(Pack x) {
    const Pack zero{};
    constexpr double aT[] = {3.33333333333329318027e-01,  -1.99999999998764832476e-01, 1.42857142725034663711e-01,
                             -1.11111104054623557880e-01, 9.09088713343650656196e-02,  -7.69187620504482999495e-02,
                             6.66107313738753120669e-02,  -5.83357013379057348645e-02, 4.97687799461593236017e-02,
                             -3.65315727442169155270e-02, 1.62858201153657823623e-02};
    const Pack ax = pack_abs(x);
    // The interval: none (|x| < 7/16), then atan(1/2), atan(1), atan(3/2), pi/2 as the base.
    const PackMask in0 = ax < zero + 0.4375, in1 = ax < zero + 0.6875, in2 = ax < zero + 1.1875, in3 = ax < zero + 2.4375;
    const Pack num = pack_select(in0, ax, pack_select(in1, 2.0 * ax - 1.0, pack_select(in2, ax - 1.0, pack_select(in3, ax - 1.5, zero - 1.0))));
    const Pack den = pack_select(in0, zero + 1.0, pack_select(in1, 2.0 + ax, pack_select(in2, ax + 1.0, pack_select(in3, 1.0 + 1.5 * ax, ax))));
    const Pack hi = pack_select(in0, zero, pack_select(in1, zero + 4.63647609000806093515e-01, pack_select(in2, zero + 7.85398163397448278999e-01, pack_select(in3, zero + 9.82793723247329054082e-01, zero + 1.57079632679489655800e+00))));
    const Pack lo = pack_select(in0, zero, pack_select(in1, zero + 2.26987774529616870924e-17, pack_select(in2, zero + 3.06161699786838301793e-17, pack_select(in3, zero + 1.39033110312309984516e-17, zero + 6.12323399573676603587e-17))));
    const Pack t = num / den;
    const Pack z = t * t, w = z * z;
    const Pack s1 = z * (aT[0] + w * (aT[2] + w * (aT[4] + w * (aT[6] + w * (aT[8] + w * aT[10])))));
    const Pack s2 = w * (aT[1] + w * (aT[3] + w * (aT[5] + w * (aT[7] + w * aT[9]))));
    const Pack reduced = pack_select(in0, t - t * (s1 + s2), hi - ((t * (s1 + s2) - lo) - t));
    const Pack out = pack_select(x < zero, zero - reduced, reduced);
    // NaN stays NaN (every comparison above is false for it: the last branch gives NaN too).
    return out;
}

#else

COILWRIGHT_LANE_INLINE Pack lane_log(Pack x) {
    return lane_math_detail::each_lane(x, [](double v) { return std::log(v); });
}
COILWRIGHT_LANE_INLINE Pack lane_atan(Pack x) {
    return lane_math_detail::each_lane(x, [](double v) { return std::atan(v); });
}

#endif

}  // namespace coilwright::internal
