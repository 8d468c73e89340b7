// The loop field at many points: packs of points go through the same kernel as loop_field
// (loop_kernel.hpp) in compiler vector types; where the processor has AVX2 a second copy of
// the code uses it (selected when the library loads), the baseline copy runs on any x86-64.
// Results are identical either way: the same IEEE operations in the same order, no fused
// multiply-add (the engine is built with -ffp-contract=off).
#include "coilwright/loop_batch.hpp"

#include <cmath>
#include <limits>

#include "coilwright/checks.hpp"
#include "coilwright/constants.hpp"
#include "coilwright/errors.hpp"
#include "loop_kernel.hpp"

namespace coilwright {

namespace {

constexpr int kLanes = 4;
using Pack = double __attribute__((vector_size(kLanes * sizeof(double))));
using PackMask = decltype(Pack{} < Pack{});  // per-lane all-ones or zero
using Lanes = detail::PackLanes<Pack, PackMask, kLanes>;

// The careful single-point path for the points the kernel leaves out (and those in error).
bool single_point(const LoopSpec& loop, double z, double r, double& bz, double& br) {
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

#if defined(__x86_64__) && defined(__GNUC__) && !defined(__clang__)
#define COILWRIGHT_CLONES __attribute__((target_clones("avx2", "default"), flatten))
#else
#define COILWRIGHT_CLONES __attribute__((flatten))
#endif

// Points go through the kernel in blocks of kPacks packs; within a block the packs take their
// Gauss steps side by side, so the processor overlaps their long chains of square roots and
// divisions instead of waiting for each in turn.
constexpr std::size_t kPacks = 8;
constexpr std::size_t kBlock = kPacks * kLanes;
using State = detail::KernelState<Lanes>;

// Field at z[i] - centre_z, r[i] for one block of `count` <= kBlock points; stores (add =
// false) or adds (add = true) into bz, br. Returns the number of points in error.
COILWRIGHT_CLONES
std::size_t run_block(const LoopSpec& loop, double inv_a, double scale, double centre_z, const double* z,
                      const double* r, std::size_t count, double* bz, double* br, bool add) {
    const double a = loop.radius;
    double zs[kBlock], rs[kBlock];
    if (count == kBlock) {
        for (std::size_t i = 0; i < kBlock; ++i) {
            zs[i] = z[i] - centre_z;
            rs[i] = r[i];
        }
    } else {
        for (std::size_t i = 0; i < kBlock; ++i) {  // a short block is padded with the centre
            zs[i] = i < count ? z[i] - centre_z : 0.0;
            rs[i] = i < count ? r[i] : 0.0;
        }
    }
    State state[kPacks];
    PackMask in_range[kPacks];
    const Pack zero{};
    for (std::size_t k = 0; k < kPacks; ++k) {
        Pack zp, rp;
        __builtin_memcpy(&zp, zs + k * kLanes, sizeof zp);
        __builtin_memcpy(&rp, rs + k * kLanes, sizeof rp);
        const Pack z_n = zp * inv_a, r_n = rp * inv_a, omr = (a - rp) * inv_a;
        const PackMask ok = detail::in_kernel_range<Lanes>(z_n, r_n, omr);
        in_range[k] = ok;
        // Lanes outside the range compute the centre instead (and are redone one by one).
        state[k] = State::start(ok ? z_n : zero, ok ? r_n : zero, ok ? omr : zero + 1.0);
    }
    bool converged = false;
    for (int steps = 0; steps < detail::kMaxGaussSteps; ++steps) {
        bool any = false;
        for (std::size_t k = 0; k < kPacks; ++k) {
            const PackMask m = state[k].active();
            if (!Lanes::any(m)) continue;
            any = true;
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
                if (!single_point(loop, zs[i], rs[i], vz, vr)) ++failed;
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

std::size_t run(const LoopSpec& loop, double centre_z, const double* z, const double* r, std::size_t n, double* bz,
                double* br, bool add) {
    const double inv_a = 1.0 / loop.radius;
    const double scale = kMu0 * loop.turns * loop.current / loop.radius;
    std::size_t failed = 0;
    for (std::size_t start = 0; start < n; start += kBlock) {
        const std::size_t count = n - start < kBlock ? n - start : kBlock;
        failed += run_block(loop, inv_a, scale, centre_z, z + start, r + start, count, bz + start, br + start, add);
    }
    return failed;
}

}  // namespace

std::size_t loop_field_batch(const LoopSpec& loop, const double* z, const double* r, std::size_t n, double* bz,
                             double* br) {
    validate(loop);
    return run(loop, 0.0, z, r, n, bz, br, false);
}

std::size_t add_loop_field_batch(const LoopSpec& loop, double centre_z, const double* z, const double* r,
                                 std::size_t n, double* bz, double* br) {
    validate(loop);
    check::finite(centre_z, "centre z");
    return run(loop, centre_z, z, r, n, bz, br, true);
}

}  // namespace coilwright
