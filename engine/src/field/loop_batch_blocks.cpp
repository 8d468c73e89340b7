// The loop field at many points: packs of points go through the same kernel as loop_field
// (loop_kernel.hpp) on the lanes of numerics/lanes.hpp. The baseline copy of the code runs on
// any x86-64 (SSE2) and gives loop_field's bits; a second copy, for processors with AVX2 and
// FMA (checked at run time, so the extension stays portable), fuses the kernel's
// products-plus-sums, as loop_field does on such processors. Both copies keep every lane's own
// number of Gauss steps, so a point's result never depends on its neighbours in a pack.
//
// This file is compiled once for the engine and, for the test of the portable layer, a second
// time with COILWRIGHT_SCALAR_LANES (plain arrays instead of vector types): the namespace
// (vector_lanes or scalar_lanes, loop_batch_code.hpp) keeps the two apart.
#include <cmath>
#include <limits>

#include "coilwright/constants.hpp"
#include "coilwright/errors.hpp"
#include "field/loop_batch_code.hpp"
#include "field/loop_kernel.hpp"
#include "numerics/checks.hpp"
#include "numerics/cpu_features.hpp"

namespace coilwright::internal::COILWRIGHT_LANES_NAMESPACE {

namespace {

// The careful single-point path for the points the kernel leaves out (and those in error).
[[gnu::noinline]] bool single_point(BatchCode code, const LoopSpec& loop, double z, double r, double& bz,
                                    double& br) {
    try {
        const FieldRZ f = loop_field_with(code, loop, z, r);
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
// divisions instead of waiting for each in turn: kPacks times the lanes of the copy, 32 points
// with four lanes, 64 with eight (block_for).
constexpr std::size_t kPacks = 8;

// Field at z[i] - centre_z, r[i] for one block of `count` <= kPacks * L::kWidth points; stores (add =
// false) or adds (add = true) into bz, br. Returns the number of points in error. Compiled
// once per instruction set by the wrappers below; `code` names the copy (for the points done
// one by one).
template <class L>
COILWRIGHT_LANE_INLINE std::size_t block(BatchCode code, const LoopSpec& loop, double inv_a, double scale,
                                         double centre_z, const double* z, const double* r, std::size_t count,
                                         double* bz, double* br, bool add) {
    using V = typename L::V;
    using M = typename L::M;
    using State = KernelState<L>;
    constexpr std::size_t kLanes = static_cast<std::size_t>(L::kWidth);
    const double a = loop.radius;
    State state[kPacks];
    M in_range[kPacks];
    const V zero = L::splat(0.0), one = L::splat(1.0);
    for (std::size_t k = 0; k < kPacks; ++k) {
        const std::size_t first = k * kLanes;
        V zp = zero, rp = zero;  // lanes past the end compute the centre
        if (first + kLanes <= count) {
            zp = L::load(z + first);
            rp = L::load(r + first);
        } else {
            for (std::size_t j = 0; first + j < count; ++j) {
                zp[j] = z[first + j];
                rp[j] = r[first + j];
            }
        }
        zp -= centre_z;
        const V z_n = zp * inv_a, r_n = rp * inv_a, omr = (a - rp) * inv_a;
        const M ok = in_kernel_range<L>(z_n, r_n, omr);
        in_range[k] = ok;
        // Lanes outside the range compute the centre instead (and are redone one by one).
        if (L::all(ok))
            state[k] = State::start(z_n, r_n, omr);
        else
            state[k] = State::start(L::select(ok, z_n, zero), L::select(ok, r_n, zero), L::select(ok, omr, one));
    }
    // Each stage runs over all packs before the next, so that the processor overlaps the packs'
    // long chains of square roots, divisions and polynomials. Every point takes one Gauss step;
    // after it few lanes (1 % of a coil's working volume) are still active, and the packs that
    // have none skip the further steps.
    for (std::size_t k = 0; k < kPacks; ++k) state[k].template step<true>(M{});
    M active[kPacks];
    M any_lane = active[0] = state[0].active();
    for (std::size_t k = 1; k < kPacks; ++k) any_lane = any_lane | (active[k] = state[k].active());
    bool converged = true;
    for (int steps = 0; L::any(any_lane); ++steps) {
        if (steps == kMaxGaussSteps) {  // a safeguard (the range converges within 15): one by one then
            converged = false;
            break;
        }
        any_lane = M{};
        for (std::size_t k = 0; k < kPacks; ++k) {
            if (!L::any(active[k])) continue;
            state[k].step(active[k]);
            any_lane = any_lane | (active[k] = state[k].active());
        }
    }
    V field_z[kPacks], field_r[kPacks];
    State::finish(state, scale, field_z, field_r);
    std::size_t failed = 0;
    const V huge = L::splat(std::numeric_limits<double>::max());
    for (std::size_t k = 0; k < kPacks; ++k) {
        V fz = field_z[k], fr = field_r[k];
        const std::size_t first = k * kLanes;
        // Lanes to redo one by one: outside the kernel's range, or a result that is not finite.
        const M redo = L::negate(in_range[k] & L::less_equal(L::abs(fz), huge) & L::less_equal(L::abs(fr), huge));
        if (converged && first + kLanes <= count && !L::any(redo)) {
            if (add) {
                fz = L::load(bz + first) + fz;
                fr = L::load(br + first) + fr;
            }
            L::store(bz + first, fz);
            L::store(br + first, fr);
            continue;
        }
        for (std::size_t j = 0; j < kLanes && first + j < count; ++j) {
            const std::size_t i = first + j;
            double vz = fz[j], vr = fr[j];
            if (redo[j] || !converged) {
                if (!single_point(code, loop, z[i] - centre_z, r[i], vz, vr)) ++failed;
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
// A copy of the block code and how many points it takes at a time.
struct BlockCode {
    BlockFn run;
    std::size_t points;
};

#if defined(__GNUC__) || defined(__clang__)
#define COILWRIGHT_FLATTEN [[gnu::flatten]]
#else
#define COILWRIGHT_FLATTEN
#endif

COILWRIGHT_FLATTEN std::size_t block_baseline(const LoopSpec& loop, double inv_a, double scale, double centre_z,
                                              const double* z, const double* r, std::size_t count, double* bz,
                                              double* br, bool add) {
    return block<PackLanes>(BatchCode::Baseline, loop, inv_a, scale, centre_z, z, r, count, bz, br, add);
}

#ifdef COILWRIGHT_HAVE_AVX2_FMA_CODE
[[gnu::target("avx2,fma"), gnu::flatten]] std::size_t block_avx2_fma(const LoopSpec& loop, double inv_a,
                                                                     double scale, double centre_z, const double* z,
                                                                     const double* r, std::size_t count, double* bz,
                                                                     double* br, bool add) {
    return block<FusedPackLanes>(BatchCode::Avx2Fma, loop, inv_a, scale, centre_z, z, r, count, bz, br, add);
}
#endif

#if defined(COILWRIGHT_HAVE_AVX512_CODE) && defined(COILWRIGHT_VECTOR_LANES)
#define COILWRIGHT_LOOP_BATCH_AVX512 1
[[gnu::target("avx512f,avx512dq,fma"), gnu::flatten]] std::size_t block_avx512(
    const LoopSpec& loop, double inv_a, double scale, double centre_z, const double* z, const double* r,
    std::size_t count, double* bz, double* br, bool add) {
    return block<FusedPack8Lanes>(BatchCode::Avx512, loop, inv_a, scale, centre_z, z, r, count, bz, br, add);
}
#endif

BlockCode block_for(BatchCode code) {
#ifdef COILWRIGHT_LOOP_BATCH_AVX512
    if (code == BatchCode::Avx512 && processor_has_avx512()) return {block_avx512, kPacks * 8};
#endif
#ifdef COILWRIGHT_HAVE_AVX2_FMA_CODE
    if ((code == BatchCode::Avx2Fma || code == BatchCode::Avx512) && processor_has_avx2_fma())
        return {block_avx2_fma, kPacks * kPackWidth};
#endif
    (void)code;
    return {block_baseline, kPacks * kPackWidth};
}

}  // namespace

BatchCode best_batch_code() {
#ifdef COILWRIGHT_LOOP_BATCH_AVX512
    if (processor_has_avx512()) return BatchCode::Avx512;
#endif
    return processor_has_avx2_fma() ? BatchCode::Avx2Fma : BatchCode::Baseline;
}

std::size_t loop_field_batch_using(BatchCode code, const LoopSpec& loop, double centre_z, const double* z,
                                   const double* r, std::size_t n, double* bz, double* br, bool add) {
    validate(loop);
    check::finite(centre_z, "centre z");
    const BlockCode block_code = block_for(code);
    const std::size_t block_points = block_code.points;
    const double inv_a = 1.0 / loop.radius;
    const double scale = kMu0 * loop.turns * loop.current / loop.radius;
    std::size_t failed = 0;
    for (std::size_t start = 0; start < n; start += block_points) {
        const std::size_t count = n - start < block_points ? n - start : block_points;
        failed += block_code.run(loop, inv_a, scale, centre_z, z + start, r + start, count, bz + start, br + start, add);
    }
    return failed;
}

}  // namespace coilwright::internal::COILWRIGHT_LANES_NAMESPACE
