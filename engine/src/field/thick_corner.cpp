// Thick-coil field near a corner of the winding, end plane by end plane.
//
// The general route (thick_coil.cpp) integrates whole sheets over the radius: at each node the
// two end terms of the sheet (solenoid.cpp) and the checks that choose a form without
// cancellation. Near a corner nothing cancels, so the integral is split by ends instead:
//   Bz = integral over a of [+-T(zeta_near, a)] + integral of [T(zeta_far, a)],
//   Br = integral of A(zeta_near, a) - integral of A(zeta_far, a),
// with T = G inside the sheet's radius (a >= r) and -W outside it, the near term entering with +
// between the end planes and - beyond them (see sheet_field_normalized). The near integral
// carries the corner's singular points (a = r +- i zeta_near) and takes the graded nodes; the far
// one is smooth on each side of a = r and takes a handful. Half the end terms of the general
// route, and no per-sheet checks.
// Where it is used (near_a_winding_corner): windings at least a quarter as long as they are deep,
// within a quarter of the smallest of build, length and inner radius of a corner, where the two
// integrals are at most a few times the field (1.5e-14 of |B| at worst against mpmath next to
// corners, where whole sheets reach 2e-15; tests check the route against whole sheets over
// random windings and points). The near integral takes more points per segment than
// the general route (exponent 20 instead of 18): without the far end's singular points its
// segments are fewer, and the margin they gave the general route had to be put back (9e-12 of
// |B| at exponent 18 next to a small winding's corner, 2e-13 at 20, against mpmath).
#include <algorithm>
#include <cmath>

#include "field/sheet_end_terms.hpp"
#include "field/thick_kernel.hpp"
#include "numerics/radial_quadrature.hpp"

namespace coilwright::internal {

namespace {

constexpr double kCornerReach = 0.25;
constexpr double kMinLengthOverBuild = 0.25;

}  // namespace

bool near_a_winding_corner(double a1, double a2, double h, double z, double r) {
    // A winding much flatter than it is deep sees its two end planes from nearly the same place:
    // there the two integrals are large and nearly equal (1e-10 lost at a length of 1e-6 of the
    // build), so it keeps the general route.
    if (2.0 * h < kMinLengthOverBuild * (a2 - a1)) return false;
    const double reach = kCornerReach * std::min({a2 - a1, 2.0 * h, a1});
    const double axial = std::fabs(std::fabs(z) - h);
    const double radial = std::min(std::fabs(r - a1), std::fabs(r - a2));
    return axial <= reach && radial <= reach;
}

FieldRZ thick_field_by_ends(double a1, double a2, double h, double z, double r, Components want, double exponent) {
    const double sign = z < 0.0 ? -1.0 : 1.0;
    z = std::fabs(z);
    const double beyond = z - h;  // exact where it matters (z close to h)
    const bool between = beyond < 0.0;
    const bool want_bz = want != Components::Radial, want_br = want != Components::Axial && z > 0.0 && r > 0.0;
    // One end's share: zeta its distance, inside / outside the weights of G and W in Bz, vector
    // the weight of A in Br.
    const auto end_share = [&](double zeta, double inside, double outside, double vector) {
        const auto terms = [&](const double* a, const double* a_minus_r, int n, FieldRZ* out) {
            EndTermRequest q[kMaxGaussNodes];
            EndTerms t[kMaxGaussNodes];
            for (int i = 0; i < n; ++i) {
                const double per_a = 1.0 / a[i];
                q[i] = {zeta * per_a, r * per_a, a_minus_r[i] * per_a, want_bz, want_br};
            }
            end_terms(q, n, min_split_k2_for(kThickSheetMaxLoss), t);
            for (int i = 0; i < n; ++i)
                out[i] = {(a_minus_r[i] >= 0.0 ? inside : outside) * t[i].axial, vector * t[i].vector};
        };
        return integrate_over_radius(terms, a1, a2, {r, {zeta, 0.0}, 1}, {exponent});
    };
    const FieldRZ near = end_share(std::fabs(beyond), between ? 1.0 : -1.0, between ? -1.0 : 1.0, 1.0);
    const FieldRZ far = end_share(z + h, 1.0, -1.0, -1.0);
    return {near.bz + far.bz, sign * (near.br + far.br)};
}

}  // namespace coilwright::internal
