// Field of a thin current-sheet solenoid, arranged so that no step loses digits.
//
// With the sheet radius as the unit of length and mu0 n I as the unit of field, the sheet is the
// loop field integrated along its length, so with u = z - z' running over [z - h, z + h]:
//   Bz = G(z + h) - G(z - h),   G(zeta) = integral_0^zeta Bz_loop(s) ds    (odd in zeta)
//   Br = A(|z - h|) - A(z + h), A(zeta) = -integral Br_loop ds             (even in zeta)
// N. Derby and S. Olbert (Am. J. Phys. 78, 229, 2010) give both with Bulirsch's cel:
//   G = zeta / (pi (1 + r) beta) * cel(kc, gamma^2, 1, gamma),  A = -cel(kc, 1, 1, -1) / (pi beta)
// with beta^2 = (1 + r)^2 + zeta^2, alpha^2 = (1 - r)^2 + zeta^2, kc = alpha / beta,
// k^2 = 4 r / beta^2 and gamma = (1 - r) / (1 + r). In the magnetic-charge picture of the sheet
// (a uniformly magnetised cylinder), G = 1/2 - W inside the radius and G = -W outside, where
// W = Omega / (4 pi) and Omega is the solid angle of the end disk seen from the point.
// Those forms cancel in four places; each is replaced by an all-positive one:
//  1. A vanishes like k^2 (near the axis, far away). Bulirsch's first Gauss step on
//     cel(kc, 1, 1, -1) gives a = 0, b = -2 k^2 / (1 + kc): k^2 is factored out exactly.
//  2. Outside the radius (gamma = -g < 0) the cel integrand changes sign. After the first Gauss
//     step by hand the state is a = -(1 - g) / g, b = 2 (kc - g) / g; with
//     kc - g = 4 r zeta^2 / (beta^2 (1 + r)^2 (kc + g)) exact, W is a combination of two
//     all-positive integrals X, Y sharing one iteration. That combination still cancels as
//     kc -> 1 (far along the axis direction, loss ~ 1 / k^2); there W is summed directly:
//  3. Omega = zeta * integral_0^{2 pi} dphi / (R (s R + s^2 - r cos phi)), s^2 = r^2 + zeta^2,
//     R^2 = 1 + s^2 - 2 r cos phi: the radial integral over the disk done in closed form and
//     rationalised so that every term is positive (valid for s^2 > r). The integrand is periodic
//     and analytic in the strip |Im phi| < acosh((1 + s^2) / (2 r)), so the trapezoidal rule
//     converges geometrically (L. N. Trefethen, J. A. C. Weideman, SIAM Review 56, 385, 2014).
//     The same sum gives the small W = 1/2 - G beyond the ends inside the radius.
//  4. Far from the sheet, relative to its length, the two end terms nearly cancel; the loss is
//     measured, and above `max_loss` the loop field (stable everywhere) is integrated along the
//     sheet by Gauss-Legendre, with the node count set by the Bernstein ellipse through the
//     nearest singularity z' = z +- i |1 - r|. Br is odd in u, so for |z| < h only
//     [h - |z|, h + |z|] remains, which keeps Br relative near the mid-plane as well.
// Near a rim the field changes on the scale of the distance to it, so 1 - r and |z| - h are formed
// from the unscaled inputs (SheetPoint), where they are exact, before anything else.
// The algebra of 2 and 3 is our own arrangement; tests check every branch against mpmath.
#include "coilwright/field/solenoid.hpp"

#include <algorithm>
#include <cmath>
#include <complex>

#include "field/sheet_end_terms.hpp"
#include "field/sheet_kernel.hpp"
#include "field/loop_normalized.hpp"
#include "numerics/checks.hpp"
#include "coilwright/constants.hpp"
#include "coilwright/errors.hpp"
#include "numerics/gauss_legendre.hpp"
#include "coilwright/field/loop.hpp"

namespace coilwright {

using namespace internal;

void validate(const SolenoidSpec& solenoid) {
    check::positive(solenoid.radius, "radius");
    check::positive(solenoid.length, "length");
    check::turns_and_current(solenoid.turns, solenoid.current);
}

namespace internal {

namespace {

// W for r <= 1 is 1/2 - G while G <= 3/8 (loss at most a factor 4), else the direct sum.
constexpr double kInsideLimit = 0.375;
// Gauss-Legendre replaces the closed form only where it converges quickly.
constexpr double kMinQuadratureRho = 3.0;
// Where centre / half-width of the integration interval exceeds this times max_loss, the closed
// form would lose more than max_loss (its loss is about centre / (2 half-width)): skip it.
constexpr double kDirectQuadratureLoss = 4.0;

// W for r <= 1 given G there.
double disk_from_inside(double zeta, double r, double inside) {
    return inside <= kInsideLimit ? 0.5 - inside : disk_part_by_sum(zeta, r);
}

// A difference of two end terms; the loss is max(|terms|) / |difference|.
struct Difference {
    double value, loss;
};
Difference difference(double first, double second) {
    const double v = first - second;
    const double big = std::max(std::fabs(first), std::fabs(second));
    return {v, v == 0.0 ? HUGE_VAL : big / std::fabs(v)};
}

// The loop field integrated over u in [centre - half_width, centre + half_width].
FieldRZ integrate_loop(double centre, double half_width, double r, double one_minus_r) {
    const double rho = bernstein_rho(centre, half_width, {0.0, std::fabs(one_minus_r)});
    const auto loop = [&](double u) { return loop_field_normalized(u, r, one_minus_r); };
    return gauss_legendre(loop, centre, half_width, gauss_points_for(rho));
}

}  // namespace

namespace {

// What one sheet needs before and after its end terms: the decisions of sheet_field_normalized
// that do not depend on them, kept so that many sheets can share one call for the end terms.
struct SheetPlan {
    double sign, z, r, one_minus_r, h;
    bool between, inside_radius, want_bz, want_br;
    double br_centre, br_half;
    bool bz_quadrature, br_quadrature, closed_bz, closed_br;
    double zeta_near, zeta_far;
    std::complex<double> pole;
};

// Fills `s` in place (the plans of a batch live in an array: building each in a temporary and
// copying it stalled on the copy of its flags).
void plan_sheet(const SheetPoint& p, double max_loss, Components want, SheetPlan& s) {
    s.sign = p.z < 0.0 ? -1.0 : 1.0;  // Bz is even in z, Br odd
    s.z = std::fabs(p.z);
    s.r = p.r;
    s.one_minus_r = p.one_minus_r;
    s.h = p.h;
    const double beyond = p.beyond_end;  // |z| - h, exact
    if (s.one_minus_r == 0.0 && beyond <= 0.0) raise_singular_point("the point lies on the current sheet");
    s.pole = {0.0, std::fabs(s.one_minus_r)};
    s.inside_radius = s.one_minus_r >= 0.0;

    // Bz integrates Bz_loop over u in [z - h, z + h]; Br the odd Br_loop, of which only
    // [|z - h|, z + h] survives. Both use the end terms at zeta = |z - h| and z + h. The
    // cancellation between them grows like centre / (2 half-width) of those intervals (away
    // from a zero of the field): far beyond that the closed form is not even tried.
    s.between = beyond < 0.0;
    s.want_bz = want != Components::Radial;
    s.want_br = want != Components::Axial && s.z > 0.0 && s.r > 0.0;
    s.br_centre = s.between ? s.h : s.z;
    s.br_half = s.between ? s.z : s.h;
    const double direct_ratio = 1.0 / (kDirectQuadratureLoss * max_loss);
    s.bz_quadrature = s.want_bz && !s.between && s.h < direct_ratio * s.z;
    s.br_quadrature = s.want_br && s.br_half < direct_ratio * s.br_centre;
    s.closed_bz = s.want_bz && !s.bz_quadrature;
    s.closed_br = s.want_br && !s.br_quadrature;
    s.zeta_near = std::fabs(beyond);
    s.zeta_far = s.z + s.h;
}

bool needs_end_terms(const SheetPlan& s) { return s.closed_bz || s.closed_br; }

void set_request(EndTermRequest& q, const SheetPlan& s, double zeta) {
    q.zeta = zeta;
    q.r = s.r;
    q.one_minus_r = s.one_minus_r;
    q.want_axial = s.closed_bz;
    q.want_vector = s.closed_br;
}

FieldRZ finish_sheet(const SheetPlan& s, const EndTerms& near, const EndTerms& far, double max_loss) {
    bool bz_quadrature = s.bz_quadrature, br_quadrature = s.br_quadrature;
    const auto quadrature_pays = [&](double centre, double half) {
        return bernstein_rho(centre, half, s.pole) > kMinQuadratureRho;
    };
    double bz = 0.0, br = 0.0;
    if (s.closed_bz) {
        if (s.between) {
            // Between the end planes: two terms of one sign, nothing cancels.
            bz = s.inside_radius ? near.axial + far.axial : -(near.axial + far.axial);
        } else {
            // Beyond an end: the difference of the end terms, in whichever form is smaller.
            Difference d{};
            if (!s.inside_radius) {
                d = difference(near.axial, far.axial);
            } else if (far.axial <= 0.5 - near.axial) {
                d = difference(far.axial, near.axial);
            } else {
                d = difference(disk_from_inside(s.zeta_near, s.r, near.axial), disk_from_inside(s.zeta_far, s.r, far.axial));
            }
            bz = d.value;
            bz_quadrature = d.loss > max_loss && quadrature_pays(s.z, s.h);
        }
    }
    if (s.closed_br) {
        const Difference d = difference(near.vector, far.vector);
        br = d.value;
        br_quadrature = d.loss > max_loss && quadrature_pays(s.br_centre, s.br_half);
    }
    // Where the ends cancel, the loop field integrated along the sheet instead.
    if (s.want_bz && bz_quadrature) {
        const FieldRZ whole = integrate_loop(s.z, s.h, s.r, s.one_minus_r);
        bz = whole.bz;
        if (s.want_br && br_quadrature && !s.between) {
            br = whole.br;
            br_quadrature = false;
        }
    }
    if (s.want_br && br_quadrature) br = integrate_loop(s.br_centre, s.br_half, s.r, s.one_minus_r).br;
    return {bz, s.sign * br};
}

}  // namespace

FieldRZ sheet_field_normalized(const SheetPoint& p, double max_loss, Components want) {
    SheetPlan s;
    plan_sheet(p, max_loss, want, s);
    EndTerms near, far;
    if (needs_end_terms(s)) {
        const double min_split_k2 = min_split_k2_for(max_loss);
        EndTermRequest q;
        set_request(q, s, s.zeta_near);
        near = end_terms(q, min_split_k2);
        set_request(q, s, s.zeta_far);
        far = end_terms(q, min_split_k2);
    }
    return finish_sheet(s, near, far, max_loss);
}

void sheet_fields_normalized(const SheetPoint* p, int count, double max_loss, Components want, FieldRZ* out) {
    // Near terms first, then far ones: neighbours in the request list have similar moduli, so a
    // pack's lanes take similar numbers of Gauss steps.
    SheetPlan plans[kMaxSheetBatch];
    EndTermRequest requests[2 * kMaxSheetBatch];
    EndTerms terms[2 * kMaxSheetBatch];
    for (int first = 0; first < count; first += kMaxSheetBatch) {
        const int n = std::min(kMaxSheetBatch, count - first);
        int asked = 0;
        int slot[kMaxSheetBatch];
        for (int i = 0; i < n; ++i) {
            plan_sheet(p[first + i], max_loss, want, plans[i]);
            slot[i] = needs_end_terms(plans[i]) ? asked++ : -1;
        }
        for (int i = 0; i < n; ++i)
            if (slot[i] >= 0) {
                set_request(requests[slot[i]], plans[i], plans[i].zeta_near);
                set_request(requests[asked + slot[i]], plans[i], plans[i].zeta_far);
            }
        end_terms(requests, 2 * asked, min_split_k2_for(max_loss), terms);
        for (int i = 0; i < n; ++i) {
            const EndTerms none{};
            const bool has = slot[i] >= 0;
            out[first + i] = finish_sheet(plans[i], has ? terms[slot[i]] : none, has ? terms[asked + slot[i]] : none, max_loss);
        }
    }
}

}  // namespace internal

FieldRZ solenoid_field(const SolenoidSpec& solenoid, double z, double r, Components want) {
    validate(solenoid);
    check::finite(z, "z");
    check::non_negative(r, "r");
    const double a = solenoid.radius;
    const double z_n = z / a, r_n = r / a, h_n = 0.5 * solenoid.length / a;
    if (!std::isfinite(z_n) || !std::isfinite(r_n) || !std::isfinite(h_n))
        raise_domain_error("the point or the length is too large compared with the radius");
    const FieldRZ unit = internal::sheet_field_normalized(internal::SheetPoint::of(z, r, a, 0.5 * solenoid.length), 4.0, want);
    const double scale = kMu0 * (solenoid.turns / solenoid.length) * solenoid.current;
    const FieldRZ f = scale * unit;
    check::finite_result(f.bz, "Bz");
    check::finite_result(f.br, "Br");
    return f;
}

}  // namespace coilwright
