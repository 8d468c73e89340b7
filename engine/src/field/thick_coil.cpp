// Thick coil: the thin-sheet field of solenoid.cpp integrated over the winding radius.
//
// A winding of uniform current density J is a stack of coaxial current sheets, the one of
// radius a carrying J da per unit length, so B = mu0 J * integral_{a1}^{a2} S(a) da with S the
// sheet field in units of mu0 n I. Seen as a function of a, S is analytic except where the point
// touches a sheet's rim (a = +-r +- i zeta, zeta the axial distance to an end plane) and, for a
// point between the end planes, a jump of Bz at a = r (the point crosses that sheet): the
// radial quadrature (radial_quadrature.hpp) splits there and maps each piece so that points
// near the winding's corners cost a bounded number of extra segments.
// On the axis the integral has the closed form used for the field factor of D. B. Montgomery,
// Solenoid Magnet Design (Wiley, 1969), written with log1p so that it keeps its digits far away:
//   Bz = mu0 J / 2 * [F(z + h) - F(z - h)],  F(zeta) = zeta ln((a2 + s2) / (a1 + s1)),
//   s_i = sqrt(a_i^2 + zeta^2).
#include "coilwright/field/thick_coil.hpp"
#include "coilwright/field/solenoid.hpp"

#include <cmath>

#include "field/sheet_kernel.hpp"
#include "field/thick_kernel.hpp"
#include "numerics/checks.hpp"
#include "coilwright/constants.hpp"
#include "coilwright/errors.hpp"
#include "numerics/radial_quadrature.hpp"

namespace coilwright {

using namespace internal;

void validate(const ThickCoilSpec& coil) {
    check::radial_extent(coil.inner_radius, coil.outer_radius);
    check::positive(coil.length, "length");
    check::turns_and_current(coil.turns, coil.current);
}

namespace internal {

namespace {

// On the axis the closed form is used while its own cancellation stays below this factor.
constexpr double kAxisMaxLoss = 256.0;
// Gauss points per segment: ceil(kRadialExponent / ln rho), exactly (no rounding up to a stored
// rule). At 17 a winding a thousandth of its radius thick lost 1.2e-12 of |B| within 1e-11 of a
// corner; at 18 the quadrature's share there is below the kernel's own 6e-13 (mpmath, 40 digits).
constexpr double kRadialExponent = 18.0;
constexpr double kCornerExponent = 20.0;  // the route by ends near a corner (thick_corner.cpp)

// zeta ln((a2 + s2) / (a1 + s1)) with the ratio's excess over 1 formed without cancellation.
double axis_term(double a1, double a2, double zeta) {
    if (zeta == 0.0) return 0.0;
    const double s1 = std::hypot(a1, zeta), s2 = std::hypot(a2, zeta);
    const double excess = (a2 - a1) * (1.0 + (a2 + a1) / (s2 + s1)) / (a1 + s1);
    return zeta * std::log1p(excess);
}

}  // namespace

FieldRZ thick_field_per_density(double a1, double a2, double h, double z, double r, Components want) {
    const double sign = z < 0.0 ? -1.0 : 1.0;
    z = std::fabs(z);
    if (r == 0.0) {
        if (want == Components::Radial) return {};
        const double t1 = axis_term(a1, a2, z + h);
        const double t2 = z < h ? -axis_term(a1, a2, h - z) : axis_term(a1, a2, z - h);
        const double diff = t1 - t2;
        if (z < h || std::fabs(t1) <= kAxisMaxLoss * std::fabs(diff)) return {0.5 * diff, 0.0};
        // Far out on the axis the two ends cancel: integrate the sheets instead (below).
    }
    if (near_a_winding_corner(a1, a2, h, z, r)) {
        const FieldRZ f = thick_field_by_ends(a1, a2, h, z, r, want, kCornerExponent);
        return {f.bz, sign * f.br};
    }
    const double beyond = z - h;  // exact where it matters (z close to h)
    // The sheets of one quadrature segment in one call (their end terms run in packs).
    const auto sheets = [&](const double* a, const double* a_minus_r, int n, FieldRZ* out) {
        SheetPoint points[kMaxGaussNodes];
        for (int i = 0; i < n; ++i) {
            const double per_a = 1.0 / a[i];  // one division instead of five (each product within an ulp)
            points[i] = SheetPoint{z * per_a, r * per_a, a_minus_r[i] * per_a, h * per_a, beyond * per_a};
        }
        sheet_fields_normalized(points, n, kThickSheetMaxLoss, want, out);
    };
    const RadialSingularities sing{r, {std::fabs(z - h), z + h}, 2};
    const FieldRZ f = integrate_over_radius(sheets, a1, a2, sing, {kRadialExponent});
    return {f.bz, sign * f.br};
}

}  // namespace internal

FieldRZ thick_coil_field(const ThickCoilSpec& coil, double z, double r, Components want) {
    validate(coil);
    check::finite(z, "z");
    check::non_negative(r, "r");
    if (coil.outer_radius == coil.inner_radius)
        return solenoid_field({coil.inner_radius, coil.length, coil.turns, coil.current}, z, r, want);
    const double a1 = coil.inner_radius, a2 = coil.outer_radius, h = 0.5 * coil.length;
    if (!std::isfinite(z / a1) || !std::isfinite(r / a1) || !std::isfinite(h / a1))
        raise_domain_error("the point or the length is too large compared with the inner radius");
    // Current density times mu0; the radial integral carries the unit of length.
    const double mu0_j = kMu0 * coil.turns * coil.current / ((a2 - a1) * coil.length);
    const FieldRZ unit = internal::thick_field_per_density(a1, a2, h, z, r, want);
    const FieldRZ f = mu0_j * unit;
    check::finite_result(f.bz, "Bz");
    check::finite_result(f.br, "Br");
    return f;
}

}  // namespace coilwright
