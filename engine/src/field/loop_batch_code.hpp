// Which machine code the loop batch runs (chosen at run time), and a batch forced to one of them
// (for tests and benchmarks).
#pragma once

#include <cstddef>

#include "coilwright/field/loop.hpp"

namespace coilwright::internal {

// The copies of the batch code: Baseline runs on any x86-64 processor (SSE2), Avx2 where the
// processor has AVX2. They give identical results; loop_field_batch uses the best available.
enum class BatchCode { Baseline, Avx2 };
BatchCode best_batch_code();

// loop_field_batch (add = false, centre_z = 0) and add_loop_field_batch (add = true) with the
// given copy of the code (Avx2 falls back to Baseline where the processor lacks AVX2).
std::size_t loop_field_batch_using(BatchCode code, const LoopSpec& loop, double centre_z, const double* z,
                                   const double* r, std::size_t n, double* bz, double* br, bool add);

}  // namespace coilwright::internal
