#include "coilwright/design/pair_spacing.hpp"

#include <cmath>
#include <cstdint>

#include "coilwright/field/axial.hpp"
#include "field/axial_jet.hpp"
#include "numerics/checks.hpp"
#include "coilwright/constants.hpp"
#include "coilwright/errors.hpp"
#include "design/scan.hpp"
#include "numerics/policy.hpp"
#include "numerics/roots.hpp"

namespace coilwright {

using namespace internal;

namespace {

CoilTable single(const CoilSection& coil, double turns, double current) {
    return CoilTable({{coil.inner_radius, coil.outer_radius, coil.length, 0.0, turns, current}});
}

void validate_shape(const CoilSection& coil) {
    check::radial_extent(coil.inner_radius, coil.outer_radius);
    check::non_negative(coil.length, "length");
}

// The first u > 0 where the k-th axial derivative of one coil's field changes sign, found by
// scanning outward from the centre and refining with TOMS 748.
double first_sign_change(const CoilSection& coil, std::size_t k) {
    const CoilTable table = single(coil, 1.0, 1.0);
    const auto derivative = [&](double u) { return axial_jet_n<4>(table, u).c[k]; };
    const double start = derivative(0.0) == 0.0 ? 1e-9 * coil.inner_radius : 0.0;
    const double sign0 = std::copysign(1.0, derivative(start));
    double lo = start;
    const double limit = 100.0 * (coil.outer_radius + coil.length);
    // Steps grow with the distance travelled (axial_scan_step): a few thousand reach the limit.
    for (StepBudget budget(100'000, "the pair-spacing scan"); lo < limit; budget.step()) {
        const double hi = lo + axial_scan_step(table, lo, lo);
        if (std::copysign(1.0, derivative(hi)) != sign0)
            return bracketed_root(derivative, lo, hi, "the pair-spacing root", 52);
        lo = hi;
    }
    raise_no_convergence("no sign change of the axial derivative found");
}

double checked_spacing(const CoilSection& coil, double half) {
    const double spacing = 2.0 * half;
    if (spacing < coil.length)
        raise_domain_error("the coils would overlap at this spacing: no such pair exists for this shape");
    return spacing;
}

}  // namespace

double flat_pair_spacing(const CoilSection& coil) {
    validate_shape(coil);
    // Bz''(0) of the pair is 2 Bz''(s/2) of one coil (even symmetry).
    return checked_spacing(coil, first_sign_change(coil, 2));
}

double gradient_pair_spacing(const CoilSection& coil) {
    validate_shape(coil);
    // Bz'''(0) of the opposed pair is -2 Bz'''(s/2) of one coil. The first zero of Bz''' beyond
    // the centre (Bz''' is odd, so it vanishes at 0 itself) is the one wanted.
    return checked_spacing(coil, first_sign_change(coil, 3));
}

double pair_centre_field(const CoilSection& coil, double turns, double current, double spacing) {
    validate_shape(coil);
    check::non_negative(spacing, "spacing");
    if (spacing < coil.length) raise_domain_error("the coils overlap: spacing must be >= length");
    return check::finite_result(2.0 * axial_field(single(coil, turns, current), spacing / 2.0), "the centre field");
}

double gradient_pair_gradient(const CoilSection& coil, double turns, double current, double spacing) {
    validate_shape(coil);
    check::non_negative(spacing, "spacing");
    if (spacing < coil.length) raise_domain_error("the coils overlap: spacing must be >= length");
    // B(z) = Bs(z - s/2) - Bs(z + s/2), so B'(0) = Bs'(-s/2) - Bs'(s/2) = -2 Bs'(s/2).
    return check::finite_result(-2.0 * axial_jet_n<2>(single(coil, turns, current), spacing / 2.0).c[1],
                                "the centre gradient");
}

double helmholtz_centre_field(double radius, double turns, double current) {
    check::positive(radius, "radius");
    check::non_negative(turns, "turns");
    check::finite(current, "current");
    return check::finite_result(std::pow(0.8, 1.5) * kMu0 * turns * current / radius, "field");
}

}  // namespace coilwright
