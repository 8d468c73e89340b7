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
// The algebra of 2 and 3 is our own arrangement; tests check every branch against mpmath.
#include "coilwright/solenoid.hpp"

#include <array>
#include <cmath>
#include <complex>

#include "coilwright/bulirsch_cel.hpp"
#include "coilwright/checks.hpp"
#include "coilwright/constants.hpp"
#include "coilwright/errors.hpp"
#include "coilwright/gauss_legendre.hpp"
#include "coilwright/loop.hpp"

namespace coilwright {

void validate(const SolenoidSpec& solenoid) {
    check::positive(solenoid.radius, "radius");
    check::positive(solenoid.length, "length");
    check::non_negative(solenoid.turns, "turns");
    check::finite(solenoid.current, "current");
}

namespace detail {

namespace {

// Below this k^2 the split form of W (item 2) loses more than a few ulps; the direct sum is used.
constexpr double kSplitMinK2 = 0.7;
// The trapezoidal sum uses N >= this / strip width points (error ~ exp(-N width)).
constexpr double kTrapezoidExponent = 40.0;
// W for r <= 1 is 1/2 - G while G <= 3/8 (loss at most a factor 4), else the direct sum.
constexpr double kInsideLimit = 0.375;
// Gauss-Legendre replaces the closed form only where it converges quickly.
constexpr double kMinQuadratureRho = 3.0;
// Beyond this rho the closed form would lose more than the usual max_loss anyway: skip it.
constexpr double kDirectQuadratureRho = 64.0;

constexpr double kInvPi = 1.0 / kPi;

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
        const double R = std::hypot(1.0, zeta);
        return 0.5 / (R * (R + zeta));  // on the axis: (1 - zeta / R) / 2 without cancellation
    }
    const double s = std::hypot(r, zeta);
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
    const double alpha = std::hypot(one_minus_r, zeta);
    const double beta = std::hypot(1.0 + r, zeta);
    if (alpha == 0.0) throw SingularPointError("the point lies on the rim of the current sheet");
    return {beta, alpha / beta, zeta / beta, (4.0 * r / beta) / beta};
}

// G for r <= 1 (item 2's positive case): cel(kc, g^2, 1, g) with g = gamma > 0.
double inside_term(double zeta, double r, double one_minus_r) {
    if (zeta == 0.0) return 0.0;
    const EndGeometry e = end_geometry(zeta, r, one_minus_r);
    if (one_minus_r == 0.0) {
        // r = 1: the limit gamma -> 0+ of the Derby-Olbert form, 1/4 + kc K(kc) / (2 pi).
        return 0.25 + e.kc * cel(e.kc, 1.0, 1.0, 1.0) * (0.5 * kInvPi);
    }
    // First Gauss step by hand from p = g, a = 1, b / p = 1: every term stays positive.
    const double g = one_minus_r / (1.0 + r);
    CelLoop<1> s{};
    s.qc = e.kc;
    s.p = g + e.kc / g;
    s.g = 1.0;
    s.em = 1.0 + e.kc;
    s.e = e.kc;
    s.a = {1.0 + 1.0 / g};
    s.b = {2.0 * (1.0 + e.kc / g)};
    return e.zeta_over_beta * kInvPi / (1.0 + r) * s.finish()[0];
}

// W for r > 1 by the split form of item 2 (requires k^2 not small).
double disk_term_outside_split(double r, double one_minus_r, const EndGeometry& e) {
    const double g = -one_minus_r / (1.0 + r);  // -gamma > 0
    const double delta = 2.0 / (1.0 + r);       // 1 - g, exact
    const double kc = e.kc;
    const double kc_minus_g = ((4.0 * r / (1.0 + r)) * (e.zeta_over_beta * e.zeta_over_beta) / (1.0 + r)) / (kc + g);
    CelLoop<2> s{};
    s.qc = kc;
    s.p = g + kc / g;
    s.g = 1.0;
    s.em = 1.0 + kc;
    s.e = kc;
    s.a = {1.0, 0.0};
    s.b = {0.0, 1.0};
    const auto [X, Y] = s.finish();
    return e.zeta_over_beta * kInvPi / (1.0 + r) * (delta * X - 2.0 * kc_minus_g * Y) / g;
}

// W for r <= 1 given G there.
double disk_term_inside(double zeta, double r, double inside) {
    return inside <= kInsideLimit ? 0.5 - inside : disk_part_by_sum(zeta, r);
}

double disk_term(double zeta, double r, double one_minus_r) {
    if (zeta == 0.0) return one_minus_r > 0.0 ? 0.5 : (one_minus_r < 0.0 ? 0.0 : 0.25);
    if (one_minus_r >= 0.0) return disk_term_inside(zeta, r, inside_term(zeta, r, one_minus_r));
    const EndGeometry e = end_geometry(zeta, r, one_minus_r);
    if (e.k2 < kSplitMinK2) return disk_part_by_sum(zeta, r);
    return disk_term_outside_split(r, one_minus_r, e);
}

double vector_term(double zeta, double r, double one_minus_r) {
    if (r == 0.0) return 0.0;
    const EndGeometry e = end_geometry(zeta, r, one_minus_r);
    // -cel(kc, 1, 1, -1) / k^2 after the first Gauss step: a = 0, b = 2 / (1 + kc).
    CelLoop<1> s{};
    s.qc = e.kc;
    s.p = 1.0 + e.kc;
    s.g = 1.0;
    s.em = 1.0 + e.kc;
    s.e = e.kc;
    s.a = {0.0};
    s.b = {2.0 / (1.0 + e.kc)};
    return e.k2 * s.finish()[0] * kInvPi / e.beta;
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

// Bz between the end planes: two terms of one sign, nothing cancels.
double bz_between_ends(double z, double r, double one_minus_r, double h) {
    if (one_minus_r > 0.0) return inside_term(h + z, r, one_minus_r) + inside_term(h - z, r, one_minus_r);
    return -(disk_term(h + z, r, one_minus_r) + disk_term(h - z, r, one_minus_r));
}

// Bz beyond an end (z >= h): the difference of the end terms, in whichever form is smaller.
Difference bz_beyond_ends(double z, double r, double one_minus_r, double h) {
    const double near_end = z - h, far_end = z + h;
    if (one_minus_r > 0.0) {
        const double g1 = inside_term(near_end, r, one_minus_r), g2 = inside_term(far_end, r, one_minus_r);
        if (g2 <= 0.5 - g1) return difference(g2, g1);
        return difference(disk_term_inside(near_end, r, g1), disk_term_inside(far_end, r, g2));
    }
    return difference(disk_term(near_end, r, one_minus_r), disk_term(far_end, r, one_minus_r));
}

// The loop field integrated over u in [centre - half_width, centre + half_width].
FieldRZ integrate_loop(double centre, double half_width, double r, double one_minus_r) {
    const double rho = bernstein_rho(centre, half_width, {0.0, std::fabs(one_minus_r)});
    const auto loop = [&](double u) { return loop_field_normalized(u, r, one_minus_r); };
    return gauss_legendre(loop, centre, half_width, gauss_points_for(rho));
}

}  // namespace

double inside_part(double zeta, double r, double one_minus_r) { return inside_term(zeta, r, one_minus_r); }
double disk_part(double zeta, double r, double one_minus_r) { return disk_term(zeta, r, one_minus_r); }
double vector_part(double zeta, double r, double one_minus_r) { return vector_term(zeta, r, one_minus_r); }

FieldRZ sheet_field_normalized(double z, double r, double one_minus_r, double h, double max_loss, Components want) {
    const double sign = z < 0.0 ? -1.0 : 1.0;  // Bz is even in z, Br odd
    z = std::fabs(z);
    if (one_minus_r == 0.0 && z <= h) throw SingularPointError("the point lies on the current sheet");
    const std::complex<double> pole{0.0, std::fabs(one_minus_r)};

    // Gauss-Legendre over the whole sheet, shared by Bz and Br beyond the ends.
    bool have_whole = false;
    FieldRZ whole{};
    const auto whole_sheet = [&] {
        if (!have_whole) whole = integrate_loop(z, h, r, one_minus_r);
        have_whole = true;
        return whole;
    };

    double bz = 0.0;
    if (want != Components::Radial) {
        if (z < h) {
            bz = bz_between_ends(z, r, one_minus_r, h);
        } else {
            const double rho = bernstein_rho(z, h, pole);
            bool quadrature = rho >= kDirectQuadratureRho;
            if (!quadrature) {
                const Difference d = bz_beyond_ends(z, r, one_minus_r, h);
                bz = d.value;
                quadrature = d.loss > max_loss && rho > kMinQuadratureRho;
            }
            if (quadrature) bz = whole_sheet().bz;
        }
    }

    double br = 0.0;  // exactly zero on the axis and in the mid-plane (symmetry)
    if (want != Components::Axial && z > 0.0 && r > 0.0) {
        // Br integrates the odd Br_loop over [z - h, z + h]; what survives is [lo, hi].
        const double centre = z < h ? h : z, half_width = z < h ? z : h;
        const double rho = bernstein_rho(centre, half_width, pole);
        bool quadrature = rho >= kDirectQuadratureRho;
        if (!quadrature) {
            const Difference d = difference(vector_term(centre - half_width, r, one_minus_r),
                                            vector_term(centre + half_width, r, one_minus_r));
            br = d.value;
            quadrature = d.loss > max_loss && rho > kMinQuadratureRho;
        }
        if (quadrature) br = z < h ? integrate_loop(centre, half_width, r, one_minus_r).br : whole_sheet().br;
    }
    return {bz, sign * br};
}

}  // namespace detail

FieldRZ solenoid_field(const SolenoidSpec& solenoid, double z, double r) {
    validate(solenoid);
    check::finite(z, "z");
    check::non_negative(r, "r");
    const double a = solenoid.radius;
    const double z_n = z / a, r_n = r / a, h_n = 0.5 * solenoid.length / a;
    if (!std::isfinite(z_n) || !std::isfinite(r_n) || !std::isfinite(h_n))
        throw DomainError("the point or the length is too large compared with the radius");
    const FieldRZ unit = detail::sheet_field_normalized(z_n, r_n, (a - r) / a, h_n);
    const double scale = kMu0 * (solenoid.turns / solenoid.length) * solenoid.current;
    const FieldRZ f = scale * unit;
    check::finite_result(f.bz, "Bz");
    check::finite_result(f.br, "Br");
    return f;
}

}  // namespace coilwright
