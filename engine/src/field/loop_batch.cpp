// The loop field at many points: packs of points go through the same kernel as loop_field
// (loop_kernel.hpp) in compiler vector types. The baseline copy of the code runs on any
// x86-64 (SSE2); a second copy uses AVX2 where the processor has it (checked at run time, so
// the extension stays portable). Results are identical either way: the same IEEE operations
// in the same order, no fused multiply-add (the engine is built with -ffp-contract=off).
#include "coilwright/field/loop_batch.hpp"

#include <cmath>
#include <limits>

#include "numerics/checks.hpp"
#include "coilwright/constants.hpp"
#include "coilwright/errors.hpp"
#include "field/loop_kernel.hpp"

namespace coilwright {

using namespace internal;

namespace {

constexpr int kLanes = 4;
using Pack = double __attribute__((vector_size(kLanes * sizeof(double))));
using PackMask = decltype(Pack{} < Pack{});  // per-lane all-ones or zero
using Lanes = internal::PackLanes<Pack, PackMask, kLanes>;

// The careful single-point path for the points the kernel leaves out (and those in error).
[[gnu::noinline]] bool single_point(const LoopSpec& loop, double z, double r, double& bz, double& br) {
    try {
        const FieldRZ f = loop_field(loop, z, r);
        bz = f.bz;
        br = f.br;
        return true;
    } catch (const DomainError&) {
    } catch (const ConvergenceError&) {
    }
    bz = br = std::numeric_limits<double>::quiet_NaN();
    return false;
}

// Points go through the kernel in blocks of kPacks packs; within a block the packs take their
// Gauss steps side by side, so the processor overlaps their long chains of square roots and
// divisions instead of waiting for each in turn.
constexpr std::size_t kPacks = 8;
constexpr std::size_t kBlock = kPacks * kLanes;
using State = internal::KernelState<Lanes>;

// Field at z[i] - centre_z, r[i] for one block of `count` <= kBlock points; stores (add =
// false) or adds (add = true) into bz, br. Returns the number of points in error. Compiled
// once per instruction set by the wrappers below.
[[gnu::always_inline]] inline std::size_t block(const LoopSpec& loop, double inv_a, double scale, double centre_z,
                                                const double* z, const double* r, std::size_t count, double* bz,
                                                double* br, bool add) {
    const double a = loop.radius;
    State state[kPacks];
    PackMask in_range[kPacks];
    const Pack zero{};
    for (std::size_t k = 0; k < kPacks; ++k) {
        const std::size_t first = k * kLanes;
        Pack zp = zero, rp = zero;  // lanes past the end compute the centre
        if (first + kLanes <= count) {
            __builtin_memcpy(&zp, z + first, sizeof zp);
            __builtin_memcpy(&rp, r + first, sizeof rp);
        } else {
            for (std::size_t j = 0; first + j < count; ++j) {
                zp[j] = z[first + j];
                rp[j] = r[first + j];
            }
        }
        zp -= centre_z;
        const Pack z_n = zp * inv_a, r_n = rp * inv_a, omr = (a - rp) * inv_a;
        const PackMask ok = internal::in_kernel_range<Lanes>(z_n, r_n, omr);
        in_range[k] = ok;
        // Lanes outside the range compute the centre instead (and are redone one by one).
        state[k] = State::start(ok ? z_n : zero, ok ? r_n : zero, ok ? omr : zero + 1.0);
    }
    bool converged = false;
    for (int steps = 0; steps < internal::kMaxGaussSteps; ++steps) {
        bool any = false;
        for (std::size_t k = 0; k < kPacks; ++k) {
            const PackMask m = state[k].active();
            const unsigned lanes = Lanes::lane_bits(m);
            if (lanes == 0) continue;
            any = true;
            if (lanes == (1u << kLanes) - 1)
                state[k].step<true>(m);  // no lane has converged: no selects
            else
                state[k].step(m);
        }
        if (!any) {
            converged = true;
            break;
        }
    }
    std::size_t failed = 0;
    const Pack huge = zero + std::numeric_limits<double>::max();
    for (std::size_t k = 0; k < kPacks; ++k) {
        Pack fz, fr;
        state[k].finish(scale, fz, fr);
        const std::size_t first = k * kLanes;
        // Lanes to redo one by one: outside the kernel's range, or a result that is not finite.
        const PackMask redo = ~in_range[k] | !(Lanes::abs(fz) <= huge) | !(Lanes::abs(fr) <= huge);
        if (converged && first + kLanes <= count && !Lanes::any(redo)) {
            Pack oz = fz, orr = fr;
            if (add) {
                Pack pz, pr;
                __builtin_memcpy(&pz, bz + first, sizeof pz);
                __builtin_memcpy(&pr, br + first, sizeof pr);
                oz = pz + fz;
                orr = pr + fr;
            }
            __builtin_memcpy(bz + first, &oz, sizeof oz);
            __builtin_memcpy(br + first, &orr, sizeof orr);
            continue;
        }
        for (std::size_t j = 0; j < kLanes && first + j < count; ++j) {
            const std::size_t i = first + j;
            double vz = fz[j], vr = fr[j];
            if (redo[j] || !converged) {
                if (!single_point(loop, z[i] - centre_z, r[i], vz, vr)) ++failed;
            }
            if (add) {
                bz[i] += vz;
                br[i] += vr;
            } else {
                bz[i] = vz;
                br[i] = vr;
            }
        }
    }
    return failed;
}

using BlockFn = std::size_t (*)(const LoopSpec&, double, double, double, const double*, const double*, std::size_t,
                                double*, double*, bool);

[[gnu::flatten]] std::size_t block_baseline(const LoopSpec& loop, double inv_a, double scale, double centre_z,
                                            const double* z, const double* r, std::size_t count, double* bz,
                                            double* br, bool add) {
    return block(loop, inv_a, scale, centre_z, z, r, count, bz, br, add);
}

#if defined(__x86_64__) && defined(__GNUC__)
#define COILWRIGHT_HAVE_AVX2_COPY 1
[[gnu::target("avx2"), gnu::flatten]] std::size_t block_avx2(const LoopSpec& loop, double inv_a, double scale,
                                                             double centre_z, const double* z, const double* r,
                                                             std::size_t count, double* bz, double* br, bool add) {
    return block(loop, inv_a, scale, centre_z, z, r, count, bz, br, add);
}
#endif

bool processor_has_avx2() {
#ifdef COILWRIGHT_HAVE_AVX2_COPY
    static const bool has = [] {
        __builtin_cpu_init();  // harmless if already done; needed if called before constructors ran
        return __builtin_cpu_supports("avx2") != 0;
    }();
    return has;
#else
    return false;
#endif
}

BlockFn block_for(internal::BatchCode code) {
#ifdef COILWRIGHT_HAVE_AVX2_COPY
    if (code == internal::BatchCode::Avx2 && processor_has_avx2()) return block_avx2;
#endif
    return block_baseline;
}

}  // namespace

namespace internal {

BatchCode best_batch_code() { return processor_has_avx2() ? BatchCode::Avx2 : BatchCode::Baseline; }

std::size_t loop_field_batch_using(BatchCode code, const LoopSpec& loop, double centre_z, const double* z,
                                   const double* r, std::size_t n, double* bz, double* br, bool add) {
    validate(loop);
    check::finite(centre_z, "centre z");
    const BlockFn run_block = block_for(code);
    const double inv_a = 1.0 / loop.radius;
    const double scale = kMu0 * loop.turns * loop.current / loop.radius;
    std::size_t failed = 0;
    for (std::size_t start = 0; start < n; start += kBlock) {
        const std::size_t count = n - start < kBlock ? n - start : kBlock;
        failed += run_block(loop, inv_a, scale, centre_z, z + start, r + start, count, bz + start, br + start, add);
    }
    return failed;
}

}  // namespace internal

std::size_t loop_field_batch(const LoopSpec& loop, const double* z, const double* r, std::size_t n, double* bz,
                             double* br) {
    return internal::loop_field_batch_using(internal::best_batch_code(), loop, 0.0, z, r, n, bz, br, false);
}

std::size_t add_loop_field_batch(const LoopSpec& loop, double centre_z, const double* z, const double* r,
                                 std::size_t n, double* bz, double* br) {
    return internal::loop_field_batch_using(internal::best_batch_code(), loop, centre_z, z, r, n, bz, br, true);
}

}  // namespace coilwright
