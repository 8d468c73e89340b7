#include "numerics/cpu_features.hpp"

namespace coilwright::internal {

bool processor_has_avx2_fma() {
#ifdef COILWRIGHT_HAVE_AVX2_FMA_CODE
    static const bool has = [] {
        __builtin_cpu_init();  // harmless if already done; needed if called before constructors ran
        return __builtin_cpu_supports("avx2") != 0 && __builtin_cpu_supports("fma") != 0;
    }();
    return has;
#else
    return false;
#endif
}

bool processor_has_avx512() {
#ifdef COILWRIGHT_HAVE_AVX512_CODE
    static const bool has = [] {
        __builtin_cpu_init();
        return processor_has_avx2_fma() && __builtin_cpu_supports("avx512f") != 0 &&
               __builtin_cpu_supports("avx512dq") != 0;
    }();
    return has;
#else
    return false;
#endif
}

}  // namespace coilwright::internal
