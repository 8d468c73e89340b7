// Which machine code the loop batch runs (chosen at run time), and a batch forced to one of them
// (for tests and benchmarks).
#pragma once

#include <cstddef>

#include "coilwright/field/loop.hpp"
#include "numerics/lanes.hpp"

namespace coilwright::internal {

// The copies of the batch code: Baseline runs on any x86-64 processor (SSE2) and gives
// loop_field's values bit for bit; Avx2Fma, where the processor has AVX2 and FMA, takes the
// kernel's products-plus-sums as fused multiply-adds (loop_field's values to a few units in the
// last place, the same accuracy); Avx512, where the processor has AVX-512 (F and DQ), runs the
// Avx2Fma arithmetic on eight lanes instead of four (its bits exactly). loop_field_batch uses
// the best available.
enum class BatchCode { Baseline, Avx2Fma, Avx512 };

// The batch code is compiled with compiler vector types (namespace vector_lanes) and, where the
// compiler has none or for the test of the portable layer (COILWRIGHT_SCALAR_LANES), with plain
// arrays (namespace scalar_lanes); the two give the same bits. The engine uses one of them.
#define COILWRIGHT_DECLARE_BATCH_CODE                                                                        \
    BatchCode best_batch_code();                                                                             \
    /* loop_field_batch (add = false, centre_z = 0) and add_loop_field_batch (add = true) with the         \
       given copy of the code (each falls back to the next where the processor lacks it). */               \
    std::size_t loop_field_batch_using(BatchCode code, const LoopSpec& loop, double centre_z, const double* z, \
                                       const double* r, std::size_t n, double* bz, double* br, bool add);
namespace vector_lanes {
COILWRIGHT_DECLARE_BATCH_CODE
}
namespace scalar_lanes {
COILWRIGHT_DECLARE_BATCH_CODE
}
#undef COILWRIGHT_DECLARE_BATCH_CODE

#ifdef COILWRIGHT_VECTOR_LANES
namespace engine_lanes = vector_lanes;
#else
namespace engine_lanes = scalar_lanes;
#endif
using engine_lanes::best_batch_code;
using engine_lanes::loop_field_batch_using;

// loop_field computed as the given copy of the batch code computes each point (Avx2Fma and
// Avx512 alike; Baseline where the processor lacks AVX2 and FMA); loop_field uses
// best_batch_code().
FieldRZ loop_field_with(BatchCode code, const LoopSpec& loop, double z, double r);

}  // namespace coilwright::internal
