// The public batch entry points: the best copy of the batch code for this processor
// (loop_batch_blocks.cpp).
#include "coilwright/field/loop_batch.hpp"

#include "field/loop_batch_code.hpp"

namespace coilwright {

std::size_t loop_field_batch(const LoopSpec& loop, const double* z, const double* r, std::size_t n, double* bz,
                             double* br) {
    return internal::loop_field_batch_using(internal::best_batch_code(), loop, 0.0, z, r, n, bz, br, false);
}

std::size_t add_loop_field_batch(const LoopSpec& loop, double centre_z, const double* z, const double* r,
                                 std::size_t n, double* bz, double* br) {
    return internal::loop_field_batch_using(internal::best_batch_code(), loop, centre_z, z, r, n, bz, br, true);
}

}  // namespace coilwright
