// Maxwell's mutual inductance of two coaxial circles without cancellation.
//
// The classical form M = mu0 sqrt(ab) [(2/k - k) K(k) - (2/k) E(k)], k^2 = 4ab / beta^2,
// beta^2 = (a + b)^2 + d^2 (J. C. Maxwell, A Treatise on Electricity and Magnetism, 1873,
// art. 701), loses all its digits far apart, where M ~ mu0 pi a^2 b^2 / (2 d^3) is the small
// difference of two O(1) terms. With D = sqrt(cos^2 t + kc^2 sin^2 t) and kc^2 = 1 - k^2,
//   (2 - k^2) K - 2E = k^2 integral (sin^2 t - cos^2 t) / D dt = k^2 cel(kc, 1, -1, 1),
// and after the first Gauss step of Bulirsch's iteration by hand that cel's state is
// a = 0, b = 2 (1 - kc) = k^2 * 2 / (1 + kc): the second factor k^2 comes out exactly and the
// rest of the iteration adds positive numbers only (the device of M. Ortner, P. Leitner,
// F. Slanovc, Magnetism 3(1), 2023, for the loop field, applied here to M). So
//   M = mu0 beta k^4 C / 2,  C = cel(kc, 1, -1, 1) / k^2 -> pi/16 far away,
// accurate to a few ulps from touching circles to the far field.
// The slope dM/dd is -2 pi b Br / I of loop a's field at loop b (force = I_a I_b dM/dd),
// from the stable loop-field kernel.
#include <algorithm>
#include <cmath>

#include "field/loop_normalized.hpp"
#include "numerics/bulirsch_cel.hpp"
#include "numerics/checks.hpp"
#include "coilwright/constants.hpp"
#include "coilwright/errors.hpp"
#include "coilwright/field/loop.hpp"
#include "coilwright/inductance/mutual.hpp"
#include "inductance/filament_kernels.hpp"

namespace coilwright {

using namespace internal;

namespace internal {

double filament_mutual(double r1, double r2, double diff, double u) {
    const double alpha = std::hypot(diff, u);
    if (alpha == 0.0) raise_singular_point("the two circles coincide: their mutual inductance is infinite");
    // Order the radii so that M(a, b) and M(b, a) are bitwise equal.
    const double lo = std::min(r1, r2), hi = std::max(r1, r2);
    const double beta = std::hypot(lo + hi, u);
    const double kc = alpha / beta;
    const double k2 = 4.0 * (lo / beta) * (hi / beta);
    const double c = CelLoop<1>::after_first_step(kc, {0.0}, {2.0 / (1.0 + kc)}).finish()[0];
    return kMu0 * beta * (k2 * k2) * c * 0.5;
}

double filament_mutual_slope(double r1, double r2, double diff, double u) {
    // Loop r1 is the source, r2 the field point: Br(u, r2) in units of mu0 I / r1.
    const FieldRZ unit = loop_field_normalized(u / r1, r2 / r1, diff / r1);
    return -2.0 * kPi * r2 * (kMu0 / r1) * unit.br;
}

}  // namespace internal

namespace {
void check_pair(double a, double b, double distance) {
    check::positive(a, "radius 1");
    check::positive(b, "radius 2");
    check::finite(distance, "distance");
}
}  // namespace

double loop_mutual_inductance(double a, double b, double distance) {
    check_pair(a, b, distance);
    return check::finite_result(internal::filament_mutual(a, b, a - b, std::fabs(distance)), "the mutual inductance");
}

double loop_mutual_inductance_slope(double a, double b, double distance) {
    check_pair(a, b, distance);
    if (a == b && distance == 0.0)
        raise_singular_point("the two circles coincide: the force between them is undefined");
    return check::finite_result(internal::filament_mutual_slope(a, b, a - b, distance), "dM/dz");
}

}  // namespace coilwright
