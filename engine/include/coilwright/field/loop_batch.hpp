// The thin-loop field at many points in one call, for array formulas, field maps and stacks.
#pragma once

#include <cstddef>

#include "coilwright/field/loop.hpp"

namespace coilwright {

// Field of `loop` at the n points (z[i], r[i]), written to bz[i] and br[i]. Every finite
// result is bit-for-bit the value loop_field(loop, z[i], r[i]) returns. A point where
// loop_field would throw (z not finite, r negative or not finite, on the filament, result
// not finite) gets NaN in both outputs instead; ask loop_field for its error. Returns the
// number of such points. Throws DomainError when `loop` itself is invalid. No allocation.
std::size_t loop_field_batch(const LoopSpec& loop, const double* z, const double* r, std::size_t n, double* bz,
                             double* br);

// Adds the field of `loop` moved to the axial position centre_z (the point z[i] sees the loop
// at z[i] - centre_z) to bz[i] and br[i]. Points where loop_field would throw make bz[i] and
// br[i] NaN. Returns the number of such points.
std::size_t add_loop_field_batch(const LoopSpec& loop, double centre_z, const double* z, const double* r,
                                 std::size_t n, double* bz, double* br);

namespace internal {

// The copies of the batch code: Baseline runs on any x86-64 processor (SSE2), Avx2 where the
// processor has AVX2. They give identical results; loop_field_batch uses the best available.
enum class BatchCode { Baseline, Avx2 };
BatchCode best_batch_code();

// loop_field_batch (add = false, centre_z = 0) and add_loop_field_batch (add = true) with the
// given copy of the code (Avx2 falls back to Baseline where the processor lacks AVX2).
std::size_t loop_field_batch_using(BatchCode code, const LoopSpec& loop, double centre_z, const double* z,
                                   const double* r, std::size_t n, double* bz, double* br, bool add);

}  // namespace internal

}  // namespace coilwright
