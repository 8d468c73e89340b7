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

#include <array>
#include <cmath>
#include <complex>

#include "field/sheet_kernel.hpp"
#include "field/loop_normalized.hpp"
#include "numerics/bulirsch_cel.hpp"
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

// The split form of W (item 2) loses about a factor 10 / k^2 (measured); below this k^2 the direct
// sum is used for full precision. Callers that accept a loss L use min(kSplitMinK2, 10 / L).
constexpr double kSplitMinK2 = 0.7;
// The trapezoidal sum uses N >= this / strip width points (error ~ exp(-N width)).
constexpr double kTrapezoidExponent = 40.0;
// W for r <= 1 is 1/2 - G while G <= 3/8 (loss at most a factor 4), else the direct sum.
constexpr double kInsideLimit = 0.375;
// Gauss-Legendre replaces the closed form only where it converges quickly.
constexpr double kMinQuadratureRho = 3.0;
// Where centre / half-width of the integration interval exceeds this times max_loss, the closed
// form would lose more than max_loss (its loss is about centre / (2 half-width)): skip it.
constexpr double kDirectQuadratureLoss = 4.0;

constexpr double kInvPi = 1.0 / kPi;

// sqrt(x^2 + y^2) without the cost of glibc's hypot (a third of the kernel's time); hypot only
// where the squares could overflow or underflow.
inline double norm2(double x, double y) {
    const double m = std::max(std::fabs(x), std::fabs(y));
    if (m < 1e150 && m > 1e-150) return std::sqrt(x * x + y * y);
    return std::hypot(x, y);
}

template <int N>
const std::array<double, N / 2 + 1>& half_period_cosines() {
    static const std::array<double, N / 2 + 1> table = [] {
        std::array<double, N / 2 + 1> t{};
        for (int j = 0; j <= N / 2; ++j) t[static_cast<std::size_t>(j)] = std::cos(2.0 * kPi * j / N);
        return t;
    }();
    return table;
}

// Trapezoidal sum of item 3 with N points per period (even integrand: half a period), all
// lengths scaled by 1 / s (= t) so that nothing overflows for far points.
template <int N>
double solid_angle_sum(double zeta_over_s, double r_over_s, double t) {
    const auto& cosines = half_period_cosines<N>();
    double sum = 0.0;
    for (int j = 0; j <= N / 2; ++j) {
        const double rc = r_over_s * (cosines[static_cast<std::size_t>(j)] * t);
        const double rr = std::sqrt(t * t + 1.0 - 2.0 * rc);  // R / s
        const double f = 1.0 / (rr * (rr + 1.0 - rc));
        sum += (j == 0 || j == N / 2) ? f : 2.0 * f;
    }
    return zeta_over_s * (t * t) * sum / (2.0 * N);
}

// W = Omega / (4 pi) by the direct sum; needs r^2 + zeta^2 > r (true wherever it is used).
double disk_part_by_sum(double zeta, double r) {
    if (r == 0.0) {
        const double R = norm2(1.0, zeta);
        return 0.5 / (R * (R + zeta));  // on the axis: (1 - zeta / R) / 2 without cancellation
    }
    const double s = norm2(r, zeta);
    const double t = 1.0 / s;
    const double strip = std::acosh(0.5 * (s / r) * (s + t));  // acosh((1 + s^2) / (2 r))
    const double needed = kTrapezoidExponent / strip;
    const double zs = zeta * t, rs = r * t;
    if (needed <= 4) return solid_angle_sum<4>(zs, rs, t);
    if (needed <= 8) return solid_angle_sum<8>(zs, rs, t);
    if (needed <= 12) return solid_angle_sum<12>(zs, rs, t);
    if (needed <= 16) return solid_angle_sum<16>(zs, rs, t);
    if (needed <= 24) return solid_angle_sum<24>(zs, rs, t);
    if (needed <= 32) return solid_angle_sum<32>(zs, rs, t);
    if (needed <= 48) return solid_angle_sum<48>(zs, rs, t);
    return solid_angle_sum<64>(zs, rs, t);  // not reached for the k^2 and G limits above
}

struct EndGeometry {
    double beta, kc, zeta_over_beta, k2;
};

EndGeometry end_geometry(double zeta, double r, double one_minus_r) {
    const double alpha = norm2(one_minus_r, zeta);
    const double beta = norm2(1.0 + r, zeta);
    if (alpha == 0.0) raise_singular_point("the point lies on the rim of the current sheet");
    return {beta, alpha / beta, zeta / beta, (4.0 * r / beta) / beta};
}

// -cel(kc, 1, 1, -1) / k^2 of item 1: after the first step a = 0, b = 2 / (1 + kc), p = 1 + kc.
template <std::size_t N>
void set_vector(CelLoop<N>& c, std::size_t i, double kc) {
    c.p[i] = 1.0 + kc;
    c.a[i] = 0.0;
    c.b[i] = 2.0 / (1.0 + kc);
}

// The two end terms at axial distance zeta >= 0 from one end of the unit sheet:
//   axial  = G (the sheet's own field) for r <= 1, W = Omega / (4 pi) for r > 1;
//   vector = A, with Br = A(lo) - A(hi).
struct EndTerms {
    double axial = 0.0, vector = 0.0;
};

EndTerms end_terms(double zeta, double r, double one_minus_r, bool want_axial, bool want_vector,
                   double min_split_k2) {
    want_vector = want_vector && r > 0.0;
    if (zeta == 0.0) want_axial = false;  // G(0) = 0, and W(0) = 0 outside the radius
    EndTerms out;
    if (!want_axial && !want_vector) return out;
    const EndGeometry e = end_geometry(zeta, r, one_minus_r);
    const double kc = e.kc;
    const double prefactor = e.zeta_over_beta * kInvPi / (1.0 + r);
    const double vector_scale = e.k2 * kInvPi / e.beta;

    if (want_axial && one_minus_r > 0.0) {
        // G = prefactor * cel(kc, g^2, 1, g), g = gamma > 0, first Gauss step by hand from
        // p = g, a = 1, b / p = 1: every term stays positive.
        const double g = one_minus_r / (1.0 + r);
        auto c = CelLoop<2>::after_first_step(kc);
        c.p[0] = g + kc / g;
        c.a[0] = 1.0 + 1.0 / g;
        c.b[0] = 2.0 * (1.0 + kc / g);
        set_vector(c, 1, kc);
        const auto v = c.finish();
        out.axial = prefactor * v[0];
        if (want_vector) out.vector = vector_scale * v[1];
        return out;
    }
    if (want_axial && one_minus_r == 0.0) {
        // r = 1: the limit gamma -> 0+ of the Derby-Olbert form, G = 1/4 + kc K(kc) / (2 pi);
        // K = cel(kc, 1, 1, 1) after its first step shares p = 1 + kc with A.
        auto c = CelLoop<2>::after_first_step(kc);
        c.p[0] = 1.0 + kc;
        c.a[0] = 2.0;
        c.b[0] = 2.0 * (1.0 + kc);
        set_vector(c, 1, kc);
        const auto v = c.finish();
        out.axial = 0.25 + kc * v[0] * (0.5 * kInvPi);
        if (want_vector) out.vector = vector_scale * v[1];
        return out;
    }
    if (want_axial && e.k2 >= min_split_k2) {
        // W for r > 1 by the split form of item 2: X and Y share p = g + kc / g.
        const double g = -one_minus_r / (1.0 + r);  // -gamma > 0
        const double delta = 2.0 / (1.0 + r);       // 1 - g, exact
        const double kc_minus_g = ((4.0 * r / (1.0 + r)) * (e.zeta_over_beta * e.zeta_over_beta) / (1.0 + r)) / (kc + g);
        auto c = CelLoop<3>::after_first_step(kc);
        c.p[0] = c.p[1] = g + kc / g;
        c.a[0] = 1.0;
        c.b[1] = 1.0;
        set_vector(c, 2, kc);
        const auto v = c.finish();
        out.axial = prefactor * (delta * v[0] - 2.0 * kc_minus_g * v[1]) / g;
        if (want_vector) out.vector = vector_scale * v[2];
        return out;
    }
    if (want_axial) out.axial = disk_part_by_sum(zeta, r);  // r > 1, far along the axis direction
    if (want_vector) {
        auto c = CelLoop<1>::after_first_step(kc);
        set_vector(c, 0, kc);
        out.vector = vector_scale * c.finish()[0];
    }
    return out;
}

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

FieldRZ sheet_field_normalized(const SheetPoint& p, double max_loss, Components want) {
    const double sign = p.z < 0.0 ? -1.0 : 1.0;  // Bz is even in z, Br odd
    const double z = std::fabs(p.z), r = p.r, one_minus_r = p.one_minus_r, h = p.h;
    const double beyond = p.beyond_end;  // |z| - h, exact
    if (one_minus_r == 0.0 && beyond <= 0.0) raise_singular_point("the point lies on the current sheet");
    const std::complex<double> pole{0.0, std::fabs(one_minus_r)};
    const bool inside_radius = one_minus_r >= 0.0;
    const double min_split_k2 = std::min(kSplitMinK2, 10.0 / max_loss);

    // Bz integrates Bz_loop over u in [z - h, z + h]; Br the odd Br_loop, of which only
    // [|z - h|, z + h] survives. Both use the end terms at zeta = |z - h| and z + h. The
    // cancellation between them grows like centre / (2 half-width) of those intervals (away
    // from a zero of the field): far beyond that the closed form is not even tried.
    const bool between = beyond < 0.0;
    const bool want_bz = want != Components::Radial, want_br = want != Components::Axial && z > 0.0 && r > 0.0;
    const double br_centre = between ? h : z, br_half = between ? z : h;
    const double direct_ratio = 1.0 / (kDirectQuadratureLoss * max_loss);
    bool bz_quadrature = want_bz && !between && h < direct_ratio * z;
    bool br_quadrature = want_br && br_half < direct_ratio * br_centre;
    const auto quadrature_pays = [&](double centre, double half) {
        return bernstein_rho(centre, half, pole) > kMinQuadratureRho;
    };

    double bz = 0.0, br = 0.0;
    const bool closed_bz = want_bz && !bz_quadrature, closed_br = want_br && !br_quadrature;
    if (closed_bz || closed_br) {
        const double zeta_near = std::fabs(beyond), zeta_far = z + h;
        const EndTerms near = end_terms(zeta_near, r, one_minus_r, closed_bz, closed_br, min_split_k2);
        const EndTerms far = end_terms(zeta_far, r, one_minus_r, closed_bz, closed_br, min_split_k2);
        if (closed_bz) {
            if (between) {
                // Between the end planes: two terms of one sign, nothing cancels.
                bz = inside_radius ? near.axial + far.axial : -(near.axial + far.axial);
            } else {
                // Beyond an end: the difference of the end terms, in whichever form is smaller.
                Difference d{};
                if (!inside_radius) {
                    d = difference(near.axial, far.axial);
                } else if (far.axial <= 0.5 - near.axial) {
                    d = difference(far.axial, near.axial);
                } else {
                    d = difference(disk_from_inside(zeta_near, r, near.axial), disk_from_inside(zeta_far, r, far.axial));
                }
                bz = d.value;
                bz_quadrature = d.loss > max_loss && quadrature_pays(z, h);
            }
        }
        if (closed_br) {
            const Difference d = difference(near.vector, far.vector);
            br = d.value;
            br_quadrature = d.loss > max_loss && quadrature_pays(br_centre, br_half);
        }
    }
    // Where the ends cancel, the loop field integrated along the sheet instead.
    if (want_bz && bz_quadrature) {
        const FieldRZ whole = integrate_loop(z, h, r, one_minus_r);
        bz = whole.bz;
        if (want_br && br_quadrature && !between) {
            br = whole.br;
            br_quadrature = false;
        }
    }
    if (want_br && br_quadrature) br = integrate_loop(br_centre, br_half, r, one_minus_r).br;
    return {bz, sign * br};
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
