// Field of a thin circular loop in a form without cancellation.
//
// With alpha and beta the shortest and longest distances from the field point to the loop in
// its meridian plane, kc = alpha / beta and k^2 = 1 - kc^2 = 4 a r / beta^2, the Biot-Savart
// integrals reduce (substituting theta = pi - 2t) to
//   Bz = mu0 I a / (pi beta^3) * integral ((a + r) cos^2 t + (a - r) sin^2 t) / D^3 dt
//   Br = mu0 I a z / (pi beta^3) * integral (sin^2 t - cos^2 t) / D^3 dt,
// with D = sqrt(cos^2 t + kc^2 sin^2 t), i.e. Bulirsch's cel(kc, kc^2, ., .).
// The radial integral vanishes like k^2 near the axis and in the far field; after the first
// Gauss step its state is k^2 * (1/kc^2, 2/(kc (1+kc))), so k^2 is factored out exactly and
// the rest of the iteration is all-positive. Writing Bz = 2aP + (a - r) * (radial integral)
// with P = cel(kc, kc^2, 1, 0) removes the far-field cancellation of (a + r) against (a - r).
// Method: M. Ortner, P. Leitner, F. Slanovc, Magnetism 3(1) (2023) 11-31, with Bulirsch's
// cel (Numer. Math. 13, 1969); the algebra above is our own arrangement of it.
#include "coilwright/field/loop.hpp"

#include <cmath>
#include <limits>

#include "field/loop_normalized.hpp"
#include "numerics/bulirsch_cel.hpp"
#include "numerics/checks.hpp"
#include "coilwright/constants.hpp"
#include "coilwright/errors.hpp"
#include "field/loop_batch_code.hpp"
#include "field/loop_kernel.hpp"
#include "numerics/cpu_features.hpp"

namespace coilwright {

using namespace internal;

void validate(const LoopSpec& loop) {
    check::positive(loop.radius, "radius");
    check::turns_and_current(loop.turns, loop.current);
}

namespace internal {

FieldRZ loop_field_normalized(double z_n, double r_n, double one_minus_r) {
    const double alpha = std::hypot(one_minus_r, z_n);
    const double beta = std::hypot(1.0 + r_n, z_n);
    const double kc = alpha / beta;
    // kc = 0 also when alpha / beta underflows (a point within 1e-323 radii of the wire, e.g.
    // radius 2e23 m, z = 1e-300 m, r = radius): the Gauss iteration from kc = 0 never ends.
    if (!(kc > 0.0)) raise_singular_point("the point lies on the current filament");
    const double k2 = (4.0 * r_n / beta) / beta;

    // State after the first Gauss step of cel(kc, kc^2, 1, 0) [index 0] and of
    // cel(kc, kc^2, -1, 1) / k^2 [index 1]; p = sqrt(kc^2) = kc on entry.
    const auto [P, C2] =
        CelLoop<2>::after_first_step(kc, {1.0, 1.0 / (kc * kc)}, {2.0, 2.0 / (kc * (1.0 + kc))}).finish();

    const double pref = 1.0 / (kPi * beta * beta * beta);
    const double radial = k2 * C2;  // integral (sin^2 - cos^2) / D^3, positive
    return {pref * (2.0 * P + one_minus_r * radial), pref * z_n * radial};
}

namespace {

// The fast kernel on one point inside its range, on the lanes L.
template <class L>
COILWRIGHT_LANE_INLINE FieldRZ kernel_point(double scale, double z_n, double r_n, double one_minus_r) {
    using State = internal::KernelState<L>;
    State s[1] = {State::start(z_n, r_n, one_minus_r)};
    s[0].template step<true>(true);
    for (StepBudget budget(kMaxGaussSteps, "the elliptic integral (Bulirsch's cel)"); s[0].active(); budget.step())
        s[0].template step<true>(true);
    double bz[1], br[1];
    State::finish(s, scale, bz, br);
    return {bz[0], br[0]};
}

FieldRZ kernel_point_baseline(double scale, double z_n, double r_n, double one_minus_r) {
    return kernel_point<ScalarLanes>(scale, z_n, r_n, one_minus_r);
}

#ifdef COILWRIGHT_HAVE_AVX2_FMA_CODE
// Each lane of the batch's AVX2 and FMA copy, bit for bit.
[[gnu::target("avx2,fma")]] FieldRZ kernel_point_fused(double scale, double z_n, double r_n, double one_minus_r) {
    return kernel_point<FusedScalarLanes>(scale, z_n, r_n, one_minus_r);
}
#endif

}  // namespace

FieldRZ loop_field_with(BatchCode code, const LoopSpec& loop, double z, double r) {
    validate(loop);
    check::finite(z, "z");
    check::non_negative(r, "r");
    const double a = loop.radius;
    const double scale = kMu0 * loop.turns * loop.current / a;
    // A prefactor in the subnormal range (radius 1e308 m, say) has lost its digits before the
    // field is formed; Br would come out as a silent 0 and Bz as a subnormal.
    if (scale != 0.0 && std::fabs(scale) < std::numeric_limits<double>::min())
        raise_domain_error("the field underflows below 2.2e-308 T: the radius is too large for the ampere-turns");
    // The fast kernel (shared with loop_field_batch, bit for bit) covers every point but those
    // farther than 1e50 radii or nearer the wire than 1e-100 radii, which take the long way.
    const double inv_a = 1.0 / a;
    const double z_n = z * inv_a, r_n = r * inv_a, one_minus_r = (a - r) * inv_a;
    if (!std::isfinite(z_n) || !std::isfinite(r_n))
        raise_domain_error("the point is more than 1e308 radii from the loop, beyond double precision");
    FieldRZ f;
    if (internal::in_kernel_range<ScalarLanes>(z_n, r_n, one_minus_r)) {
#ifdef COILWRIGHT_HAVE_AVX2_FMA_CODE
        if ((code == BatchCode::Avx2Fma || code == BatchCode::Avx512) && processor_has_avx2_fma())
            f = kernel_point_fused(scale, z_n, r_n, one_minus_r);
        else
#endif
            f = kernel_point_baseline(scale, z_n, r_n, one_minus_r);
    } else {
        f = scale * internal::loop_field_normalized(z / a, r / a, (a - r) / a);
    }
    check::finite_result(f.bz, "Bz");
    check::finite_result(f.br, "Br");
    return f;
}

}  // namespace internal

FieldRZ loop_field(const LoopSpec& loop, double z, double r) {
    return internal::loop_field_with(internal::best_batch_code(), loop, z, r);
}

}  // namespace coilwright
