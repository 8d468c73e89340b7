// Flat spiral: the loop field of loop.cpp integrated over the radius of the turns.
//
// B = mu0 N I / (a2 - a1) * integral_{a1}^{a2} L(a) da / a, with L the loop field of radius a in
// units of mu0 I / a. As a function of a the loop field is analytic except where the loop passes
// through the point, a = +-r +- i z, which is what radial_quadrature.hpp needs to know.
#include "coilwright/field/flat_spiral.hpp"

#include <cmath>

#include "field/loop_normalized.hpp"
#include "numerics/checks.hpp"
#include "coilwright/constants.hpp"
#include "coilwright/errors.hpp"
#include "coilwright/field/loop.hpp"
#include "numerics/radial_quadrature.hpp"

namespace coilwright {

using namespace internal;

void validate(const FlatSpiralSpec& spiral) {
    check::radial_extent(spiral.inner_radius, spiral.outer_radius);
    check::turns_and_current(spiral.turns, spiral.current);
}

FieldRZ flat_spiral_field(const FlatSpiralSpec& spiral, double z, double r) {
    validate(spiral);
    check::finite(z, "z");
    check::non_negative(r, "r");
    const double a1 = spiral.inner_radius, a2 = spiral.outer_radius;
    if (a1 == a2) return loop_field({a1, spiral.turns, spiral.current}, z, r);
    if (z == 0.0 && r >= a1 && r <= a2) raise_singular_point("the point lies on the flat winding");
    if (!std::isfinite(z / a1) || !std::isfinite(r / a1))
        raise_domain_error("the point is too far away compared with the inner radius");
    const auto loop = [&](double a, double a_minus_r) {
        return (1.0 / a) * internal::loop_field_normalized(z / a, r / a, a_minus_r / a);
    };
    const FieldRZ unit = internal::integrate_over_radius(loop, a1, a2, {r, {std::fabs(z), 0.0}, 1});
    const FieldRZ f = (kMu0 * spiral.turns * spiral.current / (a2 - a1)) * unit;
    check::finite_result(f.bz, "Bz");
    check::finite_result(f.br, "Br");
    return f;
}

}  // namespace coilwright
