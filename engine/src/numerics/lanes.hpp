// Lanes: the same floating-point code run on one point (ScalarLanes) or on a pack of kPackWidth
// points at once (PackLanes). Private to the engine.
//
// A pack is a compiler vector type where the compiler has vector extensions (GCC, Clang) and a
// plain array of doubles with element-wise operators where it does not (MSVC, clang-cl), or
// when COILWRIGHT_SCALAR_LANES is defined (to test the fallback here). Both perform the same
// IEEE operations in the same order on every lane, and the engine is compiled without
// contraction to fused multiply-adds (-ffp-contract=off), so both give the same bits.
// Fused multiply-adds are used only where asked for, through FusedPackLanes::mul_add (std::fma
// on each lane in the array form, one instruction on the vector type): the same bits again.
#pragma once

#include <cmath>
#include <cstdint>
#include <cstring>

#if !defined(COILWRIGHT_SCALAR_LANES) && (defined(__GNUC__) || defined(__clang__)) && !defined(_MSC_VER)
#define COILWRIGHT_VECTOR_LANES 1
#define COILWRIGHT_LANES_NAMESPACE vector_lanes
#else
#define COILWRIGHT_LANES_NAMESPACE scalar_lanes
#endif
#if defined(COILWRIGHT_VECTOR_LANES) && defined(__SSE2__)
#include <emmintrin.h>
#endif

#if defined(_MSC_VER) && !defined(__clang__)
#define COILWRIGHT_LANE_INLINE __forceinline
#else
#define COILWRIGHT_LANE_INLINE [[gnu::always_inline]] inline
#endif

// Unrolls the loop that follows n times (where the compiler takes the hint).
#if defined(__GNUC__) || defined(__clang__)
#define COILWRIGHT_PRAGMA(x) _Pragma(#x)
#define COILWRIGHT_UNROLL(n) COILWRIGHT_PRAGMA(GCC unroll n)
#else
#define COILWRIGHT_UNROLL(n)
#endif

namespace coilwright::internal {

// Points per pack: four doubles, one AVX register or two SSE2 registers.
inline constexpr int kPackWidth = 4;

// Lane operations for one point.
struct ScalarLanes {
    using V = double;
    using M = bool;
    COILWRIGHT_LANE_INLINE static V splat(double x) { return x; }
    COILWRIGHT_LANE_INLINE static V sqrt(V x) { return std::sqrt(x); }
    COILWRIGHT_LANE_INLINE static V abs(V x) { return std::fabs(x); }
    COILWRIGHT_LANE_INLINE static V mul_add(V a, V b, V c) { return a * b + c; }
    COILWRIGHT_LANE_INLINE static V select(M m, V a, V b) { return m ? a : b; }
    COILWRIGHT_LANE_INLINE static M negate(M m) { return !m; }
    COILWRIGHT_LANE_INLINE static M less(V x, V y) { return x < y; }
    COILWRIGHT_LANE_INLINE static M less_equal(V x, V y) { return x <= y; }
    COILWRIGHT_LANE_INLINE static bool any(M m) { return m; }
    COILWRIGHT_LANE_INLINE static bool all(M m) { return m; }
};

// ScalarLanes with a fused mul_add (one rounding, std::fma): one point as FusedPackLanes
// computes each lane, for code compiled for processors with FMA.
struct FusedScalarLanes : ScalarLanes {
    COILWRIGHT_LANE_INLINE static V mul_add(V a, V b, V c) { return std::fma(a, b, c); }
};

#ifdef COILWRIGHT_VECTOR_LANES

using Pack = double __attribute__((vector_size(kPackWidth * sizeof(double))));
using PackMask = decltype(Pack{} < Pack{});  // per lane all ones (true) or zero

COILWRIGHT_LANE_INLINE Pack pack_select(PackMask m, Pack a, Pack b) { return m ? a : b; }
COILWRIGHT_LANE_INLINE Pack pack_abs(Pack x) {  // clears the sign bit, as std::fabs
    return (Pack)((PackMask)x & ~(PackMask{} + static_cast<long long>(0x8000000000000000ULL)));
}
// One bit per lane (bit i set where lane i of the mask is set).
COILWRIGHT_LANE_INLINE unsigned pack_lane_bits(PackMask m) {
#if defined(__SSE2__)
    static_assert(sizeof(PackMask) % 16 == 0);
    unsigned bits = 0;  // movmskpd on each 128-bit half: two lanes per instruction
    for (unsigned h = 0; h < sizeof(PackMask) / 16; ++h) {
        __m128d half;
        std::memcpy(&half, reinterpret_cast<const char*>(&m) + 16 * h, 16);
        bits |= static_cast<unsigned>(_mm_movemask_pd(half)) << (2 * h);
    }
    return bits;
#else
    unsigned bits = 0;
    for (int i = 0; i < kPackWidth; ++i) bits |= (m[i] != 0 ? 1u : 0u) << i;
    return bits;
#endif
}

#else  // plain arrays with element-wise operators

struct PackMask {
    std::int64_t lane[kPackWidth];
    COILWRIGHT_LANE_INLINE std::int64_t operator[](int i) const { return lane[i]; }
    COILWRIGHT_LANE_INLINE friend PackMask operator&(PackMask a, PackMask b) {
        for (int i = 0; i < kPackWidth; ++i) a.lane[i] &= b.lane[i];
        return a;
    }
    COILWRIGHT_LANE_INLINE friend PackMask operator|(PackMask a, PackMask b) {
        for (int i = 0; i < kPackWidth; ++i) a.lane[i] |= b.lane[i];
        return a;
    }
    COILWRIGHT_LANE_INLINE friend PackMask operator~(PackMask a) {
        for (int i = 0; i < kPackWidth; ++i) a.lane[i] = ~a.lane[i];
        return a;
    }
};

struct Pack {
    double lane[kPackWidth];
    COILWRIGHT_LANE_INLINE double operator[](int i) const { return lane[i]; }
    COILWRIGHT_LANE_INLINE double& operator[](int i) { return lane[i]; }
};

template <class Op>
COILWRIGHT_LANE_INLINE Pack pack_map(Pack a, Pack b, Op op) {
    Pack out;
    for (int i = 0; i < kPackWidth; ++i) out.lane[i] = op(a.lane[i], b.lane[i]);
    return out;
}
COILWRIGHT_LANE_INLINE Pack pack_splat(double x) {
    Pack out;
    for (int i = 0; i < kPackWidth; ++i) out.lane[i] = x;
    return out;
}
#define COILWRIGHT_PACK_OPERATOR(op)                                                                          \
    COILWRIGHT_LANE_INLINE Pack operator op(Pack a, Pack b) {                                                \
        return pack_map(a, b, [](double x, double y) { return x op y; });                                     \
    }                                                                                                         \
    COILWRIGHT_LANE_INLINE Pack operator op(Pack a, double b) { return a op pack_splat(b); }                 \
    COILWRIGHT_LANE_INLINE Pack operator op(double a, Pack b) { return pack_splat(a) op b; }                 \
    COILWRIGHT_LANE_INLINE Pack& operator op##=(Pack& a, Pack b) { return a = a op b; }                      \
    COILWRIGHT_LANE_INLINE Pack& operator op##=(Pack& a, double b) { return a = a op b; }
COILWRIGHT_PACK_OPERATOR(+)
COILWRIGHT_PACK_OPERATOR(-)
COILWRIGHT_PACK_OPERATOR(*)
COILWRIGHT_PACK_OPERATOR(/)
#undef COILWRIGHT_PACK_OPERATOR
COILWRIGHT_LANE_INLINE Pack operator-(Pack a) {
    for (int i = 0; i < kPackWidth; ++i) a.lane[i] = -a.lane[i];
    return a;
}
#define COILWRIGHT_PACK_COMPARISON(op)                                                                        \
    COILWRIGHT_LANE_INLINE PackMask operator op(Pack a, Pack b) {                                            \
        PackMask m;                                                                                           \
        for (int i = 0; i < kPackWidth; ++i) m.lane[i] = a.lane[i] op b.lane[i] ? -1 : 0;                    \
        return m;                                                                                             \
    }                                                                                                         \
    COILWRIGHT_LANE_INLINE PackMask operator op(Pack a, double b) { return a op pack_splat(b); }
COILWRIGHT_PACK_COMPARISON(<)
COILWRIGHT_PACK_COMPARISON(<=)
COILWRIGHT_PACK_COMPARISON(>)
COILWRIGHT_PACK_COMPARISON(>=)
#undef COILWRIGHT_PACK_COMPARISON

COILWRIGHT_LANE_INLINE Pack pack_select(PackMask m, Pack a, Pack b) {
    for (int i = 0; i < kPackWidth; ++i) a.lane[i] = m.lane[i] ? a.lane[i] : b.lane[i];
    return a;
}
COILWRIGHT_LANE_INLINE Pack pack_abs(Pack x) {
    for (int i = 0; i < kPackWidth; ++i) x.lane[i] = std::fabs(x.lane[i]);
    return x;
}
COILWRIGHT_LANE_INLINE unsigned pack_lane_bits(PackMask m) {
    unsigned bits = 0;
    for (int i = 0; i < kPackWidth; ++i) bits |= (m.lane[i] != 0 ? 1u : 0u) << i;
    return bits;
}

#endif

// Lane operations for a pack of kPackWidth points (element-wise arithmetic and comparisons on
// Pack; select instead of ?:, so that both forms of Pack serve).
struct PackLanes {
    using V = Pack;
    using M = PackMask;
    static constexpr int kWidth = kPackWidth;
    COILWRIGHT_LANE_INLINE static V splat(double x) {
        V out{};
        return out + x;
    }
    COILWRIGHT_LANE_INLINE static V sqrt(V x) {
        V out{};
        for (int i = 0; i < kWidth; ++i) out[i] = std::sqrt(x[i]);  // one packed instruction with -fno-math-errno
        return out;
    }
    COILWRIGHT_LANE_INLINE static V abs(V x) { return pack_abs(x); }
    COILWRIGHT_LANE_INLINE static V mul_add(V a, V b, V c) { return a * b + c; }
    COILWRIGHT_LANE_INLINE static V select(M m, V a, V b) { return pack_select(m, a, b); }
    COILWRIGHT_LANE_INLINE static M negate(M m) { return ~m; }
    COILWRIGHT_LANE_INLINE static M less(V x, V y) { return x < y; }
    COILWRIGHT_LANE_INLINE static M less_equal(V x, V y) { return x <= y; }
    COILWRIGHT_LANE_INLINE static unsigned lane_bits(M m) { return pack_lane_bits(m); }
    COILWRIGHT_LANE_INLINE static bool any(M m) { return lane_bits(m) != 0; }
    COILWRIGHT_LANE_INLINE static bool all(M m) { return lane_bits(m) == (1u << kWidth) - 1; }
    COILWRIGHT_LANE_INLINE static V load(const double* p) {
        V v;
        std::memcpy(&v, p, sizeof v);
        return v;
    }
    COILWRIGHT_LANE_INLINE static void store(double* p, V v) { std::memcpy(p, &v, sizeof v); }
};

// PackLanes whose mul_add is fused (one rounding): for code compiled for processors with FMA
// (gnu::target("avx2,fma")), where it is one instruction. The array form uses std::fma, which
// rounds the same way, so the two forms still agree bit for bit.
struct FusedPackLanes : PackLanes {
    COILWRIGHT_LANE_INLINE static V mul_add(V a, V b, V c) {
        V out{};
        for (int i = 0; i < kWidth; ++i) out[i] = std::fma(a[i], b[i], c[i]);  // one vfmadd where inlined with FMA
        return out;
    }
};

#ifdef COILWRIGHT_VECTOR_LANES
// Eight lanes, one AVX-512 register: only for code compiled for such processors
// (gnu::target("avx512f,avx512dq,fma")), with the fused mul_add of FusedPackLanes, so each lane
// computes what FusedPackLanes and FusedScalarLanes compute, bit for bit.
using Pack8 = double __attribute__((vector_size(8 * sizeof(double))));
using Pack8Mask = decltype(Pack8{} < Pack8{});

struct FusedPack8Lanes {
    using V = Pack8;
    using M = Pack8Mask;
    static constexpr int kWidth = 8;
    COILWRIGHT_LANE_INLINE static V splat(double x) { return V{} + x; }
    COILWRIGHT_LANE_INLINE static V sqrt(V x) {
        V out{};
        for (int i = 0; i < kWidth; ++i) out[i] = std::sqrt(x[i]);  // one packed instruction with -fno-math-errno
        return out;
    }
    COILWRIGHT_LANE_INLINE static V abs(V x) {
        return (V)((M)x & ~(M{} + static_cast<long long>(0x8000000000000000ULL)));
    }
    COILWRIGHT_LANE_INLINE static V mul_add(V a, V b, V c) {
        V out{};
        for (int i = 0; i < kWidth; ++i) out[i] = std::fma(a[i], b[i], c[i]);  // one vfmadd where inlined with FMA
        return out;
    }
    COILWRIGHT_LANE_INLINE static V select(M m, V a, V b) { return (V)(((M)a & m) | ((M)b & ~m)); }
    COILWRIGHT_LANE_INLINE static M negate(M m) { return ~m; }
    // Comparisons by arithmetic on the difference's bits: GCC lowers a comparison of 512-bit
    // vectors in a function compiled for processors without AVX-512 (as these always-inline
    // helpers are, before they are inlined into the AVX-512 copy) to one lane at a time, but not
    // subtractions, shifts and logic. For finite or infinite x and y the rounded x - y is
    // negative exactly when x < y, zero exactly when x == y (finite), and NaN when either is NaN:
    // so these are x < y and x <= y bit for bit, except that inf <= inf comes out false (not
    // met in the kernel, which compares with finite bounds).
    COILWRIGHT_LANE_INLINE static M negative_bits(M d) { return d >> 63; }
    COILWRIGHT_LANE_INLINE static M zero_bits(M magnitude) { return (magnitude - 1) >> 63; }
    COILWRIGHT_LANE_INLINE static M number_bits(M magnitude) {
        return (magnitude - static_cast<long long>(0x7ff0000000000001ULL)) >> 63;
    }
    COILWRIGHT_LANE_INLINE static M less(V x, V y) {
        const M d = (M)(x - y), magnitude = d & static_cast<long long>(0x7fffffffffffffffULL);
        return negative_bits(d) & ~zero_bits(magnitude) & number_bits(magnitude);
    }
    COILWRIGHT_LANE_INLINE static M less_equal(V x, V y) {
        const M d = (M)(x - y), magnitude = d & static_cast<long long>(0x7fffffffffffffffULL);
        return (negative_bits(d) | zero_bits(magnitude)) & number_bits(magnitude);
    }
    // Through the two four-lane halves: OR (any) or AND (all), then the four-lane sign-bit test.
    COILWRIGHT_LANE_INLINE static void halves(M m, PackMask& low, PackMask& high) {
        std::memcpy(&low, &m, sizeof low);
        std::memcpy(&high, reinterpret_cast<const char*>(&m) + sizeof low, sizeof high);
    }
    COILWRIGHT_LANE_INLINE static bool any(M m) {
        PackMask low, high;
        halves(m, low, high);
        return pack_lane_bits(low | high) != 0;
    }
    COILWRIGHT_LANE_INLINE static bool all(M m) {
        PackMask low, high;
        halves(m, low, high);
        return pack_lane_bits(low & high) == (1u << kPackWidth) - 1;
    }
    COILWRIGHT_LANE_INLINE static V load(const double* p) {
        V v;
        std::memcpy(&v, p, sizeof v);
        return v;
    }
    COILWRIGHT_LANE_INLINE static void store(double* p, V v) { std::memcpy(p, &v, sizeof v); }
};
#endif

}  // namespace coilwright::internal
